//! Operations on a member list and on the lists of a workspace: add,
//! duplicate, rename, delete with undo, reorder. Pure, so they are tested
//! on the host.

use strutline_core::file::MemberFile;
use strutline_core::Member;

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

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
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
}
