//! Operations on a member list and on the lists of a workspace: add,
//! duplicate, rename, delete with undo, reorder; and the list tools: the
//! order and filters of what is shown, the members picked, and one change
//! applied to all of them. Pure, so they are tested on the host; their
//! controls' markup is [`crate::toolbar`]'s.

use std::cmp::Ordering;
use std::sync::Arc;

use strutline_core::file::MemberFile;
use strutline_core::material::{MaterialSpec, KNOWN_GRADES};
use strutline_core::method::Method;
use strutline_core::Member;

use crate::checks::Checked;
use crate::numtext::{for_input, parse_optional};
use crate::status::Standing;

/// An id not used in `members`: `base` itself when free, else `base` with
/// the smallest free suffix "-2", "-3", ...
pub fn free_id(members: &[Member], base: &str) -> String {
    let base = if base.trim().is_empty() {
        "M"
    } else {
        base.trim()
    };
    let taken = |id: &str| members.iter().any(|m| m.id == id);
    if !taken(base) {
        return base.to_string();
    }
    let mut n = 2usize;
    loop {
        let candidate = format!("{base}-{n}");
        if !taken(&candidate) {
            return candidate;
        }
        n += 1;
    }
}

/// A fresh id for a new member: "M<n>" with the smallest n not used,
/// starting from the count of members plus one.
pub fn next_id(members: &[Member]) -> String {
    let mut n = members.len() + 1;
    loop {
        let candidate = format!("M{n}");
        if !members.iter().any(|m| m.id == candidate) {
            return candidate;
        }
        n += 1;
    }
}

/// Appends a member made from `template` with a fresh id; returns its index.
pub fn add(members: &mut Vec<Member>, template: &Member) -> usize {
    let mut m = template.clone();
    m.id = next_id(members);
    members.push(m);
    members.len() - 1
}

/// Inserts a copy of member `i` just after it; returns the copy's index.
pub fn duplicate(members: &mut Vec<Member>, i: usize) -> Option<usize> {
    let mut copy = members.get(i)?.clone();
    copy.id = free_id(members, &copy.id);
    members.insert(i + 1, copy);
    Some(i + 1)
}

/// Why a rename is refused.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum RenameError {
    /// The new id is empty.
    Empty,
    /// Another member has it.
    Taken(String),
    /// No member at that index.
    Missing,
}

impl RenameError {
    /// The message beside the id field.
    pub fn message(&self) -> String {
        match self {
            RenameError::Empty => {
                "id: every member needs an id; give it a short name such as \"C1\"".into()
            }
            RenameError::Taken(id) => {
                format!("id: \"{id}\" is already used in this list; choose another")
            }
            RenameError::Missing => "id: that member is no longer in the list".into(),
        }
    }
}

/// Gives member `i` a new id, unique in the list.
pub fn rename(members: &mut [Member], i: usize, new_id: &str) -> Result<(), RenameError> {
    let new_id = new_id.trim();
    if new_id.is_empty() {
        return Err(RenameError::Empty);
    }
    if members
        .iter()
        .enumerate()
        .any(|(j, m)| j != i && m.id == new_id)
    {
        return Err(RenameError::Taken(new_id.to_string()));
    }
    let m = members.get_mut(i).ok_or(RenameError::Missing)?;
    m.id = new_id.to_string();
    Ok(())
}

/// A deleted member, kept for undo.
#[derive(Debug, Clone, PartialEq)]
pub struct Deleted {
    /// Where it was.
    pub index: usize,
    /// The member.
    pub member: Member,
}

/// Removes member `i`, returning what undo needs.
pub fn delete(members: &mut Vec<Member>, i: usize) -> Option<Deleted> {
    if i >= members.len() {
        return None;
    }
    let member = members.remove(i);
    Some(Deleted { index: i, member })
}

/// Puts a deleted member back where it was (or at the end when the list
/// has shrunk), with a fresh id if its id has been taken meanwhile;
/// returns its index.
pub fn undo_delete(members: &mut Vec<Member>, d: Deleted) -> usize {
    let mut m = d.member;
    m.id = free_id(members, &m.id);
    let at = d.index.min(members.len());
    members.insert(at, m);
    at
}

/// Moves member `i` one place up; returns its new index.
pub fn move_up(members: &mut [Member], i: usize) -> Option<usize> {
    if i == 0 || i >= members.len() {
        return None;
    }
    members.swap(i - 1, i);
    Some(i - 1)
}

/// Moves member `i` one place down; returns its new index.
pub fn move_down(members: &mut [Member], i: usize) -> Option<usize> {
    if i + 1 >= members.len() {
        return None;
    }
    members.swap(i, i + 1);
    Some(i + 1)
}

/// A title not used by another list: `base`, else "base (2)", "base (3)", ...
pub fn free_title(lists: &[MemberFile], base: &str) -> String {
    let base = if base.trim().is_empty() {
        "Untitled list"
    } else {
        base.trim()
    };
    let taken = |t: &str| lists.iter().any(|l| l.title == t);
    if !taken(base) {
        return base.to_string();
    }
    let mut n = 2usize;
    loop {
        let candidate = format!("{base} ({n})");
        if !taken(&candidate) {
            return candidate;
        }
        n += 1;
    }
}

/// A deleted list, kept for undo.
#[derive(Debug, Clone, PartialEq)]
pub struct DeletedList {
    /// Where it was.
    pub index: usize,
    /// The list.
    pub list: MemberFile,
}

/// Removes list `i` unless it is the only one.
pub fn delete_list(lists: &mut Vec<MemberFile>, i: usize) -> Option<DeletedList> {
    if lists.len() <= 1 || i >= lists.len() {
        return None;
    }
    let list = lists.remove(i);
    Some(DeletedList { index: i, list })
}

/// Puts a deleted list back; returns its index.
pub fn undo_delete_list(lists: &mut Vec<MemberFile>, d: DeletedList) -> usize {
    let at = d.index.min(lists.len());
    lists.insert(at, d.list);
    at
}

/// The order the list is shown in; the stored order never changes.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default)]
pub enum Order {
    /// As entered.
    #[default]
    Entered,
    /// Highest utilisation first; members without one last.
    UtilDown,
    /// Lowest utilisation first; members without one last.
    UtilUp,
    /// By id, digits compared as numbers ("C2" before "C10").
    Id,
}

/// The list's order and filters, the members picked, and the change typed
/// for them.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct ListTools {
    /// The order shown.
    pub order: Order,
    /// Only members that stand so.
    pub status: Option<Standing>,
    /// Only members checked by this method.
    pub method: Option<Method>,
    /// Only members whose id, note or section has this text (trimmed and
    /// in ASCII lower case, as [`ListTools::set`] keeps it).
    pub text: String,
    /// Ids of the members picked.
    pub picks: Vec<String>,
    /// The change form: grade, method key, K major, K minor ("" leaves it).
    pub change: [String; 4],
    /// Why the last change was refused.
    pub message: Option<String>,
}

impl ListTools {
    /// Takes the value of a control of the bar or of the change form, by
    /// its name; true when what is shown changes.
    pub fn set(&mut self, name: &str, v: &str) -> bool {
        match name {
            "list_order" => {
                self.order = match v {
                    "util-down" => Order::UtilDown,
                    "util-up" => Order::UtilUp,
                    "id" => Order::Id,
                    _ => Order::Entered,
                }
            }
            "list_status" => {
                self.status = match v {
                    "holds" => Some(Standing::Holds),
                    "exceeds" => Some(Standing::Exceeds),
                    "input" => Some(Standing::NeedsInput),
                    _ => None,
                }
            }
            "list_method" => self.method = Method::from_key(v),
            // Kept as it is matched: trimmed, ASCII case folded.
            "list_text" => self.text = v.trim().to_ascii_lowercase(),
            _ => {
                let slot = CHANGE_KEYS.iter().position(|k| *k == name);
                if let Some(s) = slot.and_then(|i| self.change.get_mut(i)) {
                    *s = v.to_string();
                }
                return false;
            }
        }
        true
    }

    /// Whether member `id` is picked.
    pub fn is_picked(&self, id: &str) -> bool {
        self.picks.iter().any(|p| p == id)
    }

    /// Picks member `id`, or lets it go when it was picked.
    pub fn toggle(&mut self, id: &str) {
        let before = self.picks.len();
        self.picks.retain(|p| p != id);
        if self.picks.len() == before {
            self.picks.push(id.to_string());
        }
    }

    /// Whether a member passes the filters.
    fn keeps(&self, c: &Checked) -> bool {
        let m = &c.member;
        let needle = self.text.as_str();
        let has = |hay: &str| hay.to_ascii_lowercase().contains(needle);
        self.status.is_none_or(|s| s == Standing::of(&c.outcome))
            && self.method.is_none_or(|k| k == m.method)
            && (needle.is_empty()
                || has(&m.id)
                || m.note.as_deref().is_some_and(has)
                || has(&m.section.describe()))
    }

    /// How two members compare in the chosen order.
    fn compare(&self, a: &Checked, b: &Checked) -> Ordering {
        // Not worked yet: no utilisation, so last (and shown as waiting).
        let util = |c: &Checked| c.result().map(|r| r.utilisation);
        match (self.order, util(a), util(b)) {
            (Order::Entered, ..) => Ordering::Equal,
            (Order::Id, ..) => natural(&a.member.id, &b.member.id),
            (Order::UtilDown, Some(x), Some(y)) => y.total_cmp(&x),
            (_, Some(x), Some(y)) => x.total_cmp(&y),
            (_, x, y) => y.is_some().cmp(&x.is_some()),
        }
    }

    /// The members shown, filtered and in the chosen order (equal ones as
    /// entered). A binary insertion sort: lists are short, and it compiles
    /// to far less than the standard sort.
    pub fn shown(&self, checks: &[Arc<Checked>]) -> Vec<Arc<Checked>> {
        let mut out: Vec<Arc<Checked>> = Vec::with_capacity(checks.len());
        for c in checks.iter().filter(|c| self.keeps(c)) {
            // As entered, every pair is equal: each goes last (the search
            // would find the end with some ten comparisons a member).
            let at = if self.order == Order::Entered {
                out.len()
            } else {
                out.partition_point(|x| self.compare(x, c) != Ordering::Greater)
            };
            out.insert(at, Arc::clone(c));
        }
        out
    }

    /// Picks every member shown, keeping the picks already made.
    pub fn pick_shown(&mut self, checks: &[Arc<Checked>]) {
        for c in checks {
            if self.keeps(c) && !self.is_picked(&c.member.id) {
                self.picks.push(c.member.id.clone());
            }
        }
    }

    /// "Showing 4 of 6 · 2 picked (1 not shown)".
    pub fn tally(&self, checks: &[Arc<Checked>]) -> String {
        let (mut shown, mut picked, mut hidden) = (0, 0, 0);
        for c in checks {
            let keep = self.keeps(c);
            let pick = self.is_picked(&c.member.id);
            shown += usize::from(keep);
            picked += usize::from(pick);
            hidden += usize::from(pick && !keep);
        }
        let mut t = String::from("Showing ");
        let parts = [
            (shown, " of "),
            (checks.len(), ""),
            (picked, " picked"),
            (hidden, " not shown)"),
        ];
        for (i, (n, after)) in parts.into_iter().enumerate() {
            match i {
                2 if picked == 0 => break,
                2 => t.push_str(" · "),
                3 if hidden == 0 => break,
                3 => t.push_str(" ("),
                _ => {}
            }
            t.push_str(&n.to_string());
            t.push_str(after);
        }
        t
    }

    /// Applies the change form to the picked members of `members`. Nothing
    /// changes when a value is wrong or nothing is picked; otherwise the
    /// members as they were and the sentence for the undo bar.
    pub fn apply(&self, members: &mut [Member]) -> Result<(Vec<Member>, String), String> {
        let [grade, method, k_major, k_minor] = &self.change;
        let grade = grade.trim();
        if !grade.is_empty() && !KNOWN_GRADES.contains(&grade) {
            return Err("grade: not a grade this app knows; choose one from the list".into());
        }
        let method = match method.trim() {
            "" => None,
            key => Some(
                Method::from_key(key)
                    .ok_or_else(|| String::from("method: not a method this app knows"))?,
            ),
        };
        let factor = |key: &str, text: &str| -> Result<Option<f64>, String> {
            let k = parse_optional(text).map_err(|e| e.message(key))?;
            match k {
                Some(v) if !(v > 0.0 && v.is_finite()) => Err(key.to_string()
                    + ": an effective-length factor must be a number greater than zero"),
                _ => Ok(k),
            }
        };
        let k_major = factor("k_major", k_major)?;
        let k_minor = factor("k_minor", k_minor)?;
        let mut what = String::new();
        let (kx, ky) = (k_major.map(for_input), k_minor.map(for_input));
        let said = [
            ("grade set to ", Some(grade).filter(|g| !g.is_empty())),
            ("method set to ", method.map(Method::title)),
            ("K major set to ", kx.as_deref()),
            ("K minor set to ", ky.as_deref()),
        ];
        for (a, b) in said.iter().filter_map(|(a, b)| Some((a, (*b)?))) {
            if !what.is_empty() {
                what.push_str(", ");
            }
            what.push_str(a);
            what.push_str(b);
        }
        if let Some(c) = what.get_mut(0..1) {
            c.make_ascii_uppercase();
        }
        if what.is_empty() {
            return Err(
                "Nothing to change: choose a grade or a method, or type a factor K.".into(),
            );
        }
        let n = members.iter().filter(|m| self.is_picked(&m.id)).count();
        if n == 0 {
            return Err("No member is picked: tick the box of each member to change.".into());
        }
        let before = members.to_vec();
        // Members whose load changes basis with the method: a service load
        // (AISC ASD) kept for a method that needs the factored load, or
        // the reverse.
        let (mut to_factored, mut to_service) = (0usize, 0usize);
        for m in members.iter().filter(|m| self.is_picked(&m.id)) {
            match method {
                Some(x) if x.takes_service_load() != m.method.takes_service_load() => {
                    if x.takes_service_load() {
                        to_service += 1;
                    } else {
                        to_factored += 1;
                    }
                }
                _ => {}
            }
        }
        for m in members.iter_mut().filter(|m| self.is_picked(&m.id)) {
            if !grade.is_empty() {
                m.material = MaterialSpec::Grade {
                    grade: grade.to_string(),
                };
            }
            if let Some(x) = method {
                m.method = x;
            }
            if let Some(v) = k_major {
                m.k_major = v;
                m.lcr_major_mm = None;
            }
            if let Some(v) = k_minor {
                m.k_minor = v;
                m.lcr_minor_mm = None;
            }
        }
        what.push_str(" for ");
        what.push_str(&n.to_string());
        what.push_str(if n == 1 { " member." } else { " members." });
        what.push_str(&load_basis_note(to_factored, to_service));
        Ok((before, what))
    }
}

/// What the change's sentence adds where a method change crosses load
/// bases ([`Method::takes_service_load`]): the loads were kept, and which
/// load the new method needs. Empty where none crosses.
fn load_basis_note(to_factored: usize, to_service: usize) -> String {
    let mut note = String::new();
    let count = |n: usize| {
        if n == 1 {
            "1 member".to_string()
        } else {
            format!("{n} members")
        }
    };
    if to_factored > 0 {
        note.push_str(&format!(
            " The loads were kept: for {} that left AISC ASD, whose N_Ed and moments are service \
             loads, a limit-state method needs the factored loads; type them.",
            count(to_factored)
        ));
    }
    if to_service > 0 {
        note.push_str(&format!(
            " The loads were kept: for {} now under AISC ASD, which takes service loads, the \
             factored N_Ed and moments of the limit-state method are too large; type the \
             service loads.",
            count(to_service)
        ));
    }
    note
}

/// Height of a member row and the gap after it, in CSS pixels: the rows
/// have a fixed height in `style.css` (`.member-row`, 64 px, and the
/// list's gap, 6 px), so the list can build only the rows in view.
pub const ROW_PITCH_PX: f64 = 70.0;

/// Rows built beyond each edge of the part in view, so a fling or a Tab
/// finds rows already there (from the second frame on: the first frame
/// builds only what is in view, see [`window`]).
pub const OVERSCAN: usize = 8;

/// The rows to build, `first..end` of `n` shown, for a list scrolled by
/// `scroll_top` px with `view_px` of it in view: what is in view and
/// `overscan` rows beyond each edge ([`OVERSCAN`] once the list is on
/// screen, none for its first frame). The rest are stood in for by
/// padding of `first` and `n - end` pitches.
pub fn window(scroll_top: f64, view_px: f64, n: usize, overscan: usize) -> (usize, usize) {
    let top = (scroll_top.max(0.0) / ROW_PITCH_PX).floor();
    let seen = (view_px.max(ROW_PITCH_PX) / ROW_PITCH_PX).ceil() + 1.0;
    // Saturating float-to-int casts: NaN and huge values stay in range.
    let first = (top as usize).saturating_sub(overscan).min(n);
    let end = (top as usize)
        .saturating_add(seen as usize)
        .saturating_add(overscan)
        .min(n);
    (first, end.max(first))
}

/// The most the list's box can be in view before the first layout, for a
/// window `width` by `height` CSS px: style.css makes `.member-scroll`
/// 42vh tall on a narrow or upright screen and max(16rem, 100dvh -
/// 29.5rem) on a wide one lying down (change both together). Taken with room to
/// spare, so that the first frame's rows fill the box whatever the font
/// size or browser: a rem anywhere from 8 to 32 px, a vh up to 200 px more
/// than the window's height (a phone's vh is its largest viewport, with
/// its address bar hidden); never more than the window. What the first
/// frame builds and checks: the box itself is read once it is laid out.
pub fn first_view_px(width: f64, height: f64) -> f64 {
    let wide = width >= 1000.0 && width > height;
    let most = if wide {
        (16.0 * 32.0f64).max(height - 29.5 * 8.0)
    } else {
        0.42 * (height + 200.0)
    };
    most.min(height)
}

/// The names of the change form's controls, in the order of
/// [`ListTools::change`].
pub const CHANGE_KEYS: [&str; 4] = [
    "change_grade",
    "change_method",
    "change_k_major",
    "change_k_minor",
];

/// Digits without their leading zeros.
fn zeroless(d: &[u8]) -> &[u8] {
    d.split_at(d.iter().take_while(|c| **c == b'0').count()).1
}

/// Ids compared with ASCII case ignored and runs of digits as numbers.
pub fn natural(a: &str, b: &str) -> Ordering {
    let (mut x, mut y) = (a.as_bytes(), b.as_bytes());
    loop {
        let (Some(&p), Some(&q)) = (x.first(), y.first()) else {
            return x.len().cmp(&y.len());
        };
        let o = if p.is_ascii_digit() && q.is_ascii_digit() {
            let digits = |s: &[u8]| s.iter().take_while(|c| c.is_ascii_digit()).count();
            let (dx, rx) = x.split_at(digits(x));
            let (dy, ry) = y.split_at(digits(y));
            (x, y) = (rx, ry);
            let (tx, ty) = (zeroless(dx), zeroless(dy));
            tx.len().cmp(&ty.len()).then(tx.cmp(ty))
        } else {
            (x, y) = (x.split_at(1).1, y.split_at(1).1);
            p.to_ascii_lowercase().cmp(&q.to_ascii_lowercase())
        };
        if o != Ordering::Equal {
            return o;
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;

    fn ids(ms: &[Member]) -> Vec<&str> {
        ms.iter().map(|m| m.id.as_str()).collect()
    }

    fn three() -> Vec<Member> {
        vec![sample_member("A"), sample_member("B"), sample_member("C")]
    }

    #[test]
    fn add_gives_fresh_ids() {
        let mut ms = three();
        let t = sample_member("x");
        assert_eq!(add(&mut ms, &t), 3);
        assert_eq!(ms[3].id, "M4");
        ms[0].id = "M5".into();
        add(&mut ms, &t);
        assert_eq!(ms[4].id, "M6");
    }

    #[test]
    fn duplicate_inserts_after_with_unique_id() {
        let mut ms = three();
        assert_eq!(duplicate(&mut ms, 1), Some(2));
        assert_eq!(ids(&ms), ["A", "B", "B-2", "C"]);
        duplicate(&mut ms, 1);
        assert_eq!(ids(&ms), ["A", "B", "B-3", "B-2", "C"]);
        assert_eq!(duplicate(&mut ms, 99), None);
        assert_eq!(ms[2].length_mm, ms[1].length_mm);
    }

    #[test]
    fn rename_refuses_empty_and_taken() {
        let mut ms = three();
        assert_eq!(rename(&mut ms, 0, "  "), Err(RenameError::Empty));
        assert_eq!(rename(&mut ms, 0, "B"), Err(RenameError::Taken("B".into())));
        assert_eq!(rename(&mut ms, 0, " A "), Ok(()));
        assert_eq!(rename(&mut ms, 0, "Z1"), Ok(()));
        assert_eq!(ids(&ms), ["Z1", "B", "C"]);
        assert_eq!(rename(&mut ms, 7, "Q"), Err(RenameError::Missing));
        assert!(RenameError::Taken("B".into()).message().starts_with("id:"));
    }

    #[test]
    fn delete_and_undo_restore_place() {
        let mut ms = three();
        let d = delete(&mut ms, 1).unwrap();
        assert_eq!(ids(&ms), ["A", "C"]);
        assert_eq!(undo_delete(&mut ms, d), 1);
        assert_eq!(ids(&ms), ["A", "B", "C"]);
        // Meanwhile someone took the id and the list shrank.
        let d = delete(&mut ms, 2).unwrap();
        ms[1].id = "C".into();
        delete(&mut ms, 0);
        assert_eq!(undo_delete(&mut ms, d), 1);
        assert_eq!(ids(&ms), ["C", "C-2"]);
        assert_eq!(delete(&mut ms, 5), None);
    }

    #[test]
    fn reorder() {
        let mut ms = three();
        assert_eq!(move_up(&mut ms, 0), None);
        assert_eq!(move_up(&mut ms, 2), Some(1));
        assert_eq!(ids(&ms), ["A", "C", "B"]);
        assert_eq!(move_down(&mut ms, 2), None);
        assert_eq!(move_down(&mut ms, 0), Some(1));
        assert_eq!(ids(&ms), ["C", "A", "B"]);
    }

    #[test]
    fn lists() {
        let mut ls = vec![MemberFile::new("Job"), MemberFile::new("Job (2)")];
        assert_eq!(free_title(&ls, "Job"), "Job (3)");
        assert_eq!(free_title(&ls, "Other"), "Other");
        let d = delete_list(&mut ls, 0).unwrap();
        assert_eq!(ls.len(), 1);
        assert_eq!(delete_list(&mut ls, 0), None, "the last list stays");
        assert_eq!(undo_delete_list(&mut ls, d), 0);
        assert_eq!(ls[0].title, "Job");
    }

    fn checked(ms: &[Member]) -> Vec<Arc<Checked>> {
        ms.iter().map(|m| Arc::new(Checked::new(m))).collect()
    }

    fn shown_ids(t: &ListTools, cs: &[Arc<Checked>]) -> Vec<String> {
        t.shown(cs).iter().map(|c| c.member.id.clone()).collect()
    }

    /// C10 holds lightly, C2 holds heavily, b3 exceeds, X1 needs input.
    fn mixed() -> Vec<Member> {
        let mut a = sample_member("C10");
        a.axial_kn = 10.0;
        let mut b = sample_member("C2");
        b.axial_kn = 100.0;
        b.note = Some("Stair Trimmer".into());
        let mut c = sample_member("b3");
        c.axial_kn = 1e5;
        c.method = Method::En1993;
        let mut d = sample_member("X1");
        d.length_mm = 0.0;
        vec![a, b, c, d]
    }

    #[test]
    fn orders_without_touching_the_list() {
        let ms = mixed();
        let cs = checked(&ms);
        let mut t = ListTools::default();
        assert_eq!(shown_ids(&t, &cs), ["C10", "C2", "b3", "X1"]);
        assert!(t.set("list_order", "util-down"));
        assert_eq!(
            shown_ids(&t, &cs),
            ["b3", "C2", "C10", "X1"],
            "no utilisation goes last"
        );
        t.set("list_order", "util-up");
        assert_eq!(shown_ids(&t, &cs), ["C10", "C2", "b3", "X1"]);
        t.set("list_order", "id");
        assert_eq!(shown_ids(&t, &cs), ["b3", "C2", "C10", "X1"]);
        assert_eq!(
            ids(&ms),
            ["C10", "C2", "b3", "X1"],
            "the stored order stays"
        );
        t.set("list_order", "");
        assert_eq!(t.order, Order::Entered);
    }

    #[test]
    fn natural_order_of_ids() {
        assert_eq!(natural("C2", "C10"), Ordering::Less);
        assert_eq!(natural("c2", "C2"), Ordering::Equal);
        assert_eq!(natural("C02", "C2"), Ordering::Equal);
        assert_eq!(natural("B9", "C1"), Ordering::Less);
        assert_eq!(natural("C1", "C1a"), Ordering::Less);
        assert_eq!(natural("C1-10", "C1-9"), Ordering::Greater);
        assert_eq!(natural("", "A"), Ordering::Less);
    }

    #[test]
    fn filters_by_status_method_and_text() {
        let cs = checked(&mixed());
        let mut t = ListTools::default();
        t.set("list_status", "holds");
        assert_eq!(shown_ids(&t, &cs), ["C10", "C2"]);
        t.set("list_status", "exceeds");
        assert_eq!(shown_ids(&t, &cs), ["b3"]);
        t.set("list_status", "input");
        assert_eq!(shown_ids(&t, &cs), ["X1"]);
        t.set("list_status", "");
        t.set("list_method", "en1993-1-1");
        assert_eq!(shown_ids(&t, &cs), ["b3"]);
        t.set("list_method", "");
        t.set("list_text", " sTAIR ");
        assert_eq!(shown_ids(&t, &cs), ["C2"], "the note, case ignored");
        t.set("list_text", "x1");
        assert_eq!(shown_ids(&t, &cs), ["X1"], "the id");
        let described = cs[0].member.section.describe();
        t.set("list_text", &described.to_ascii_uppercase());
        assert_eq!(shown_ids(&t, &cs).len(), 4, "the section: {described}");
        t.set("list_text", "nothing like it");
        assert!(t.shown(&cs).is_empty());
        assert_eq!(t.tally(&cs), "Showing 0 of 4");
    }

    #[test]
    fn picks() {
        let cs = checked(&mixed());
        let mut t = ListTools::default();
        t.toggle("C2");
        t.toggle("X1");
        t.toggle("X1");
        assert_eq!(t.picks, ["C2"]);
        t.set("list_status", "holds");
        t.pick_shown(&cs);
        assert_eq!(t.picks, ["C2", "C10"], "no id twice");
        t.toggle("b3");
        assert_eq!(t.tally(&cs), "Showing 2 of 4 · 3 picked (1 not shown)");
        t.picks.clear();
        assert_eq!(t.tally(&cs), "Showing 2 of 4");
    }

    #[test]
    fn change_applies_to_the_picked_only_and_undoes() {
        let original = mixed();
        let mut ms = original.clone();
        ms[1].lcr_major_mm = Some(1234.0);
        let original = ms.clone();
        let mut t = ListTools::default();
        t.toggle("C10");
        t.toggle("C2");
        assert!(
            !t.set("change_method", "aisc360-lrfd"),
            "the form does not change what is shown"
        );
        t.set("change_k_major", "0,7");
        let (before, what) = t.apply(&mut ms).unwrap();
        assert_eq!(before, original);
        assert_eq!(
            what,
            "Method set to AISC 360-16 chapter E, LRFD, K major set to 0.7 for 2 members."
        );
        for m in &ms[..2] {
            assert_eq!(
                (m.method, m.k_major, m.lcr_major_mm),
                (Method::AiscLrfd, 0.7, None)
            );
            assert_eq!(m.k_minor, 1.0);
        }
        assert_eq!(ms[2..], original[2..], "members not picked stay");
        ms.clone_from_slice(&before);
        assert_eq!(ms, original);

        t.change = Default::default();
        t.set("change_grade", "S355");
        t.picks = vec!["b3".into()];
        let (_, what) = t.apply(&mut ms).unwrap();
        assert_eq!(what, "Grade set to S355 for 1 member.");
        assert_eq!(
            ms[2].material,
            MaterialSpec::Grade {
                grade: "S355".into()
            }
        );
    }

    /// A method change across load bases says the loads were kept and
    /// which load the new method needs (review N25: AISC ASD's 45 kip
    /// service load went on as a CSA S16 factored load with no note).
    #[test]
    fn a_change_across_load_bases_says_the_load_was_kept() {
        let mut ms = mixed();
        ms[0].method = Method::AiscAsd;
        ms[1].method = Method::En1993;
        let mut t = ListTools::default();
        t.toggle(&ms[0].id.clone());
        t.toggle(&ms[1].id.clone());
        t.set("change_method", "csa-s16");
        let (before, what) = t.apply(&mut ms).unwrap();
        assert!(
            what.ends_with(
                "for 2 members. The loads were kept: for 1 member that left AISC ASD, whose N_Ed \
                 and moments are service loads, a limit-state method needs the factored loads; \
                 type them."
            ),
            "{what}"
        );
        ms.clone_from_slice(&before);
        t.set("change_method", "aisc360-asd");
        let (_, what) = t.apply(&mut ms).unwrap();
        assert!(
            what.contains("for 1 member now under AISC ASD, which takes service loads")
                && !what.contains("left AISC ASD"),
            "{what}"
        );
        // The same basis: nothing added.
        ms.clone_from_slice(&before);
        t.set("change_method", "en1993-1-1");
        let (_, what) = t.apply(&mut ms).unwrap();
        assert!(
            what.contains("left AISC ASD") && !what.contains("now under"),
            "{what}"
        );
        ms[0].method = Method::CsaS16;
        let (_, what) = t.apply(&mut ms).unwrap();
        assert!(!what.contains("loads were kept"), "{what}");
    }

    #[test]
    fn a_bad_change_changes_nothing() {
        let mut ms = mixed();
        let original = ms.clone();
        let mut t = ListTools::default();
        let refused = |t: &ListTools, ms: &mut Vec<Member>| t.apply(ms).unwrap_err();
        assert!(refused(&t, &mut ms).starts_with("Nothing to change"));
        t.set("change_method", "euler");
        assert!(refused(&t, &mut ms).starts_with("No member is picked"));
        t.toggle("C2");
        t.toggle("gone");
        t.set("change_k_minor", "0.8.1");
        assert!(refused(&t, &mut ms).starts_with("k_minor: must be a number"));
        t.set("change_k_minor", "-1");
        assert_eq!(
            refused(&t, &mut ms),
            "k_minor: an effective-length factor must be a number greater than zero"
        );
        t.set("change_k_minor", "0");
        assert!(refused(&t, &mut ms).starts_with("k_minor:"));
        t.set("change_k_minor", "");
        t.set("change_k_major", "1,2.0");
        assert!(refused(&t, &mut ms).starts_with("k_major:"));
        t.set("change_k_major", "");
        t.set("change_grade", "S999");
        assert!(refused(&t, &mut ms).starts_with("grade: not a grade"));
        t.set("change_grade", "");
        t.set("change_method", "guesswork");
        assert!(refused(&t, &mut ms).starts_with("method:"));
        assert_eq!(ms, original);
        t.set("change_method", "euler");
        assert_eq!(
            t.apply(&mut ms).unwrap().1,
            "Method set to Euler, capped at squash load for 1 member."
        );
    }

    #[test]
    fn the_window_holds_what_is_in_view_and_no_more() {
        // 800 px of a 1,000-row list at the top: 11 rows in view (+1
        // partly, +1 for a scroll between rows), 8 more below; the rest
        // stood in for.
        assert_eq!(window(0.0, 800.0, 1000, OVERSCAN), (0, 21));
        // The first frame's view: at least the box style.css gives, at
        // most the window.
        for (w, h) in [
            (1280.0, 900.0),
            (1180.0, 820.0),
            (1920.0, 1080.0),
            (1000.0, 999.0),
        ] {
            let rem_16 = (16.0f64 * 16.0).max(h - 29.5 * 16.0);
            let rem_24 = (16.0f64 * 24.0).max(h - 29.5 * 24.0);
            let v = first_view_px(w, h);
            assert!(v >= rem_16 && v >= rem_24.min(h) && v <= h, "{w}x{h}: {v}");
        }
        for (w, h) in [
            (820.0, 1180.0),
            (390.0, 844.0),
            (999.0, 600.0),
            (600.0, 600.0),
        ] {
            let v = first_view_px(w, h);
            assert!(v >= 0.42 * h && v <= h, "{w}x{h}: {v}");
        }
        assert!(
            window(0.0, first_view_px(1280.0, 900.0), 1000, 0).1 < window(0.0, 900.0, 1000, 0).1
        );
        // The first frame: what is in view, nothing beyond it.
        assert_eq!(window(0.0, 800.0, 1000, 0), (0, 13));
        // Scrolled to row 500: 8 rows above it and below the view.
        let (a, b) = window(500.0 * ROW_PITCH_PX, 800.0, 1000, OVERSCAN);
        assert_eq!((a, b), (492, 521));
        assert!(b - a < 30, "the window does not grow with the list");
        assert_eq!(window(500.0 * ROW_PITCH_PX, 800.0, 1000, 0), (500, 513));
        // The end of the list, short lists, nonsense input.
        assert_eq!(window(1e9, 800.0, 1000, OVERSCAN), (1000, 1000));
        assert_eq!(window(0.0, 800.0, 3, OVERSCAN), (0, 3));
        assert_eq!(window(f64::NAN, f64::NAN, 5, OVERSCAN), (0, 5));
        assert_eq!(window(-50.0, 0.0, 0, 0), (0, 0));
    }
}
