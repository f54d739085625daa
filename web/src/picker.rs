//! View logic of the section picker and of "lightest that works": search
//! over the catalogue as the person types, filters by series and shape,
//! each candidate's utilisation on a copy of the member, and proposals for
//! a whole list applied with a copy kept for undo. Plain Rust, tested on
//! the host; the sizing itself is the engine's ([`strutline_core::sizing`]).

use strutline_core::catalogue::{self, Entry};
use strutline_core::section::Family;
use strutline_core::sizing;
use strutline_core::{check_member, Member};

use crate::html;
use crate::html::Html;
use crate::numtext::{fixed, utilisation};

/// Most candidates listed at once.
pub const MAX_ROWS: usize = 80;

/// The shapes the catalogue holds, with their labels.
pub const SHAPES: [(&str, &str); 3] = [("i", "I/H"), ("rhs", "SHS/RHS"), ("chs", "CHS")];

/// The family of a shape key, `None` for "" or an unknown key.
pub fn family_of(shape: &str) -> Option<Family> {
    match shape {
        "i" => Some(Family::I),
        "rhs" => Some(Family::Rhs),
        "chs" => Some(Family::Chs),
        _ => None,
    }
}

/// Upper case letters and digit groups of a text: "heb200" gives
/// (["HEB"], ["200"]); "203x203" gives ([], ["203", "203"]).
fn tokens(text: &str) -> (Vec<String>, Vec<String>) {
    let key = catalogue::normalise(text, true);
    let key = key.as_ref().map_or("", |k| k.as_str());
    let (mut letters, mut numbers) = (Vec::new(), Vec::new());
    let mut cur = String::new();
    let mut digit = false;
    let flush = |cur: &mut String, digit: bool, l: &mut Vec<String>, n: &mut Vec<String>| {
        if !cur.is_empty() {
            let t = std::mem::take(cur);
            if digit {
                n.push(t);
            } else if t != "X" {
                l.push(t);
            }
        }
    };
    for c in key.chars() {
        let d = c.is_ascii_digit() || c == '.' || c == '/';
        if d != digit {
            flush(&mut cur, digit, &mut letters, &mut numbers);
            digit = d;
        }
        cur.push(c);
    }
    flush(&mut cur, digit, &mut letters, &mut numbers);
    (letters, numbers)
}

/// Whether an entry matches the typed text: every group of letters occurs
/// in its series or designation, and the typed numbers begin the entry's
/// numbers in order ("203x203" finds UC 203x203x46, not UB 203x133x25).
pub fn matches(entry: &Entry, query: &str) -> bool {
    let (ql, qn) = tokens(query);
    let (el, en) = tokens(entry.designation);
    let hay = format!("{}{}", el.concat(), tokens(entry.series).0.concat());
    if !ql.iter().all(|l| hay.contains(l.as_str())) {
        return false;
    }
    qn.len() <= en.len() && qn.iter().zip(&en).all(|(q, e)| e.starts_with(q.as_str()))
}

/// The candidates for the typed text, a series (file stem, "" for all) and
/// a shape ("" for all), in catalogue order.
/// Nothing when neither text nor series is given.
pub fn search(query: &str, series: &str, shape: &str) -> Vec<&'static Entry> {
    let q = query.trim();
    let fam = family_of(shape);
    let in_series = catalogue::find_series(series);
    if q.is_empty() && in_series.is_none() {
        return Vec::new();
    }
    let pool: &[Entry] = in_series.map_or(catalogue::entries(), |s| s.entries());
    let mut out = Vec::new();
    for e in pool {
        if out.len() >= MAX_ROWS {
            break;
        }
        if fam.is_some_and(|f| e.spec.family() != Some(f)) {
            continue;
        }
        if q.is_empty() || matches(e, q) {
            out.push(e);
        }
    }
    out
}

/// The member's utilisation with a catalogue entry in place of its
/// section, worked by the engine on a copy.
pub fn utilisation_with(member: &Member, entry: &Entry) -> Option<f64> {
    check_member(&sizing::with_entry(member, entry))
        .ok()
        .map(|r| r.utilisation)
}

/// The candidates for sizing: the chosen series, else every entry of the
/// chosen shape, else every entry of the member's own shape.
pub fn sizing_pool(member: &Member, series: &str, shape: &str) -> Vec<&'static Entry> {
    if let Some(s) = catalogue::find_series(series) {
        return s.entries().iter().collect();
    }
    let fam = family_of(shape).or_else(|| catalogue::family(&member.section).ok());
    // An unknown designation has no family: no candidates (the check
    // reports the designation).
    fam.map(catalogue::family_entries).unwrap_or_default()
}

/// One member's proposal in words.
#[derive(Debug, Clone, PartialEq)]
pub struct Proposal {
    /// The member's id.
    pub id: String,
    /// The proposed designation, if any candidate passes.
    pub designation: Option<String>,
    /// "0.874 (flexural buckling, minor axis), 61.3 kg/m", or why none.
    pub chosen_text: String,
    /// The next lighter candidate and why it fails.
    pub lighter_text: String,
}

/// The lightest candidate within `limit` for each member, each member from
/// its own pool ([`sizing_pool`]): candidates lightest first (tabulated
/// mass, then area), each checked in full by the engine on a copy of the
/// member (all of them, so no shape of utilisation against mass is
/// assumed and no sort is needed). The same
/// answer as [`strutline_core::sizing::lightest`] (a host test compares
/// them), without its screening, which saves time but not bytes.
pub fn propose(members: &[Member], series: &str, shape: &str, limit: f64) -> Vec<Proposal> {
    members
        .iter()
        .map(|m| {
            let pool = sizing_pool(m, series, shape);
            // Every candidate is checked; the lightest passing one is kept,
            // and the heaviest failing one lighter than it. The loop works
            // with the entry's own dimensions (the section its designation
            // resolves to) and keeps only utilisations; the two texts shown
            // are worked afresh from the designation at the end.
            let mut work = m.clone();
            let mut chosen: Option<&Entry> = None;
            let mut fails: Vec<&Entry> = Vec::new();
            for e in pool.iter().copied() {
                work.section = e.spec.clone();
                // Within the limit as the check passes within 1: every
                // interaction equation worked and met (CheckResult::within).
                if check_member(&work).is_ok_and(|r| r.within(limit)) {
                    if chosen.is_none_or(|c| lighter(e, c)) {
                        chosen = Some(e);
                    }
                } else {
                    fails.push(e);
                }
            }
            let mut next: Option<&Entry> = None;
            for f in fails.iter().copied() {
                let below = chosen.is_none_or(|c| lighter(f, c));
                if below && next.is_none_or(|n| lighter(n, f)) {
                    next = Some(f);
                }
            }
            let text = |e: &Entry| match check_member(&sizing::with_entry(m, e)) {
                Ok(r) => format!("{} ({})", utilisation(r.utilisation), r.governing_check),
                Err(err) => crate::fields::error_text(&err),
            };
            let chosen = chosen.map(|e| (e, text(e)));
            let next = next.map(|e| (e, text(e)));
            let lighter_text = next.as_ref().map_or_else(
                || "— (lightest of the set)".to_string(),
                |(e, t)| format!("{}: {t}", e.designation),
            );
            let chosen_text = match &chosen {
                Some((e, t)) => format!(
                    "{} — {t}, {} kg/m",
                    e.designation,
                    fixed(e.mass_kg_per_m, 1)
                ),
                None if pool.is_empty() => {
                    "none: no catalogue section of this shape; choose a series".into()
                }
                None => format!("none within {}", fixed(limit, 2)),
            };
            Proposal {
                id: m.id.clone(),
                designation: chosen.map(|(e, _)| e.designation.to_string()),
                chosen_text,
                lighter_text,
            }
        })
        .collect()
}

/// Whether `a` comes before `b` lightest first: tabulated mass, then area,
/// then designation.
fn lighter(a: &Entry, b: &Entry) -> bool {
    a.mass_kg_per_m
        .total_cmp(&b.mass_kg_per_m)
        .then(a.area_mm2.total_cmp(&b.area_mm2))
        .then(a.designation.cmp(b.designation))
        .is_lt()
}

/// Sets the section of each member named in `picks` (id, designation) to
/// that catalogue designation; returns the members as they were, for undo,
/// when anything changed.
pub fn apply(members: &mut [Member], picks: &[(String, String)]) -> Option<Vec<Member>> {
    let before = members.to_vec();
    let mut changed = false;
    for (id, d) in picks {
        if let (Some(m), Ok(e)) = (
            members.iter_mut().find(|m| m.id == *id),
            catalogue::resolve(d),
        ) {
            let new = sizing::with_entry(m, e);
            if new != *m {
                *m = new;
                changed = true;
            }
        }
    }
    changed.then_some(before)
}

/// The candidate table: one row per entry with its mass, the member's
/// utilisation with it (engine, on a copy) and a button whose `data-act`
/// is "pick" and `data-v` the designation. Built as text so that the
/// app carries one small view, not one per row.
pub fn rows_html(member: &Member, found: &[&Entry]) -> Html {
    let mut h = Html::from_lit(
        "<table class=\"picker\"><thead><tr><th scope=\"col\">section</th><th scope=\"col\">kg/m</th>\
         <th scope=\"col\">utilisation</th><th></th></tr></thead><tbody>",
    );
    for e in found {
        let d = e.designation;
        // Marked as passing only when the check passes (a beam-column
        // whose interaction is not worked is never passed).
        let (class, shown) = match check_member(&sizing::with_entry(member, e)) {
            Ok(r) if r.passes => ("passes", format!("{} ✓", utilisation(r.utilisation))),
            Ok(r) => ("", format!("{} ✗", utilisation(r.utilisation))),
            Err(_) => ("", "—".into()),
        };
        html!(
            h,
            "<tr data-testid=\"section-candidate\" data-designation=\"{}\" class=\"{}\"><th scope=\"row\">{}</th>\
             <td class=\"num\">{}</td><td class=\"num\">{}</td>\
             <td><button type=\"button\" data-act=\"pick\" data-v=\"{}\">Use</button></td></tr>",
            d,
            class,
            d,
            fixed(e.mass_kg_per_m, 1),
            shown,
            d
        );
    }
    h.lit("</tbody></table>");
    h
}

/// The proposal table, with an "Accept" button per member that has a
/// proposal (`data-act` "accept", `data-v` the id) and "Accept all"
/// (`data-act` "all") when more than one has.
pub fn proposals_html(ps: &[Proposal]) -> Html {
    let mut h = Html::new();
    if ps.is_empty() {
        return h;
    }
    h.lit(
        "<table class=\"proposals\"><thead><tr><th scope=\"col\">member</th>\
         <th scope=\"col\">lightest within the limit</th><th scope=\"col\">next lighter fails</th><th></th></tr></thead><tbody>",
    );
    for p in ps {
        let id = &p.id;
        html!(
            h,
            "<tr data-testid=\"proposal\" data-id=\"{}\"><th scope=\"row\">{}</th>\
             <td data-testid=\"proposal-chosen\">{}</td><td>{}</td><td>",
            id,
            id,
            p.chosen_text,
            p.lighter_text
        );
        if p.designation.is_some() {
            html!(
                h,
                "<button type=\"button\" data-testid=\"accept-proposal\" data-act=\"accept\" data-v=\"{}\">Accept</button>",
                id
            );
        }
        h.lit("</td></tr>");
    }
    h.lit("</tbody></table>");
    let n = ps.iter().filter(|p| p.designation.is_some()).count();
    if n > 1 {
        html!(
            h,
            "<button type=\"button\" data-testid=\"accept-all\" data-act=\"all\" data-v=\"\">Accept all {}</button>",
            n
        );
    }
    h
}

/// The picker's inputs and buttons, as text (their events are answered
/// by the panel's delegated handlers, by `name` and `data-act`).
pub fn form_html() -> Html {
    let opts = |v: &mut Html, items: &mut dyn Iterator<Item = (&str, &str)>| {
        for (k, l) in items {
            html!(v, "<option value=\"{}\">{}</option>", k, l);
        }
    };
    let mut series = Html::new();
    opts(
        &mut series,
        &mut catalogue::series().iter().map(|s| (s.file, s.name)),
    );
    let mut shapes = Html::new();
    opts(&mut shapes, &mut SHAPES.iter().copied());
    let mut h = Html::new();
    html!(
        h,
        "<div class=\"field-grid\">\
         <div class=\"field\"><label for=\"f-section_search\">search</label><input type=\"search\" id=\"f-section_search\" \
         name=\"section_search\" autocomplete=\"off\" spellcheck=\"false\" placeholder=\"heb200, 203x203, shs 100\"></div>\
         <div class=\"field\"><label for=\"f-section_series\">series</label><select id=\"f-section_series\" name=\"section_series\">\
         <option value=\"\">all</option>{}</select></div>\
         <div class=\"field\"><label for=\"f-section_shape\">shape</label><select id=\"f-section_shape\" name=\"section_shape\">\
         <option value=\"\">all</option>{}</select></div>\
         <div class=\"field\"><label for=\"f-util_limit\">utilisation limit</label><input type=\"text\" id=\"f-util_limit\" \
         name=\"util_limit\" inputmode=\"decimal\" value=\"1.0\" autocomplete=\"off\"></div></div>\
         <div class=\"button-row\"><button type=\"button\" data-testid=\"lightest\" data-act=\"one\" data-v=\"\">Lightest that works</button>\
         <button type=\"button\" data-testid=\"lightest-all\" data-act=\"every\" data-v=\"\">… for every member</button></div>",
        series,
        shapes
    );
    h
}

/// A utilisation limit typed by the person: a positive finite number.
pub fn parse_limit(text: &str) -> Option<f64> {
    crate::numtext::parse_number(text).ok().filter(|v| *v > 0.0)
}

/// The (id, designation) pairs to apply for an accept of member `id`, or
/// of every member with a proposal when `id` is `None`.
pub fn picks(ps: &[Proposal], id: Option<&str>) -> Vec<(String, String)> {
    ps.iter()
        .filter(|p| id.is_none_or(|i| i == p.id))
        .filter_map(|p| p.designation.clone().map(|d| (p.id.clone(), d)))
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;
    use strutline_core::method::Method;
    use strutline_core::section::{CatalogueRef, SectionSpec};

    fn names(v: &[&Entry]) -> Vec<&'static str> {
        v.iter().map(|e| e.designation).collect()
    }

    #[test]
    fn forgiving_search() {
        let heb = search("heb200", "", "");
        assert_eq!(heb[0].series, "HE B");
        assert!(heb[0].designation.contains("200"), "{:?}", names(&heb));
        let uc = search("203x203", "", "");
        assert!(!uc.is_empty());
        assert!(
            uc.iter().all(|e| e.designation.contains("203x203")),
            "{:?}",
            names(&uc)
        );
        let shs = search("shs 100", "", "");
        assert!(!shs.is_empty());
        assert!(
            shs.iter().all(|e| e.designation.starts_with("SHS 100")),
            "{:?}",
            names(&shs)
        );
        assert!(search("", "", "").is_empty());
        assert!(search("zzz999", "", "").is_empty());
    }

    #[test]
    fn filters_by_series_and_shape() {
        let all = search("", "heb", "");
        let s = catalogue::find_series("heb").unwrap();
        assert_eq!(all.len(), s.entries().len().min(MAX_ROWS));
        assert!(search("200", "", "chs")
            .iter()
            .all(|e| e.spec.family() == Some(Family::Chs)));
        assert!(search("200", "", "i")
            .iter()
            .all(|e| e.spec.family() == Some(Family::I)));
        assert!(search("shs 100", "", "i").is_empty());
    }

    #[test]
    fn utilisation_is_the_engines_on_a_copy() {
        let m = sample_member("P1");
        let e = catalogue::resolve("HE 200 B").unwrap();
        let u = utilisation_with(&m, e).unwrap();
        let mut copy = m.clone();
        copy.section = SectionSpec::Catalogue(CatalogueRef {
            designation: e.designation.into(),
        });
        assert_eq!(u, check_member(&copy).unwrap().utilisation);
        // Heavier sections of one series carry more: the first and last of HE B.
        let s = catalogue::find_series("heb").unwrap().entries();
        let first = utilisation_with(&m, &s[0]).unwrap();
        let last = utilisation_with(&m, s.last().unwrap()).unwrap();
        assert!(last < first);
    }

    #[test]
    fn an_entry_checks_the_same_by_its_dimensions_and_by_its_designation() {
        // propose() screens with the entry's dimensions and shows the
        // designation's result: the two must agree for every entry.
        let mut m = sample_member("D");
        for method in [Method::En1993, Method::AiscLrfd, Method::CsaS16] {
            m.method = method;
            for e in catalogue::entries() {
                let mut by_dims = m.clone();
                by_dims.section = e.spec.clone();
                let a = check_member(&by_dims).map(|r| r.utilisation.to_bits());
                let b = check_member(&sizing::with_entry(&m, e)).map(|r| r.utilisation.to_bits());
                assert_eq!(a.ok(), b.ok(), "{} under {method:?}", e.designation);
            }
        }
    }

    #[test]
    fn proposals_match_the_engine_and_apply_with_undo() {
        let mut ms = vec![sample_member("A"), sample_member("B")];
        ms[1].axial_kn *= 3.0;
        let ps = propose(&ms, "heb", "", 1.0);
        let pool: Vec<&Entry> = catalogue::find_series("heb")
            .unwrap()
            .entries()
            .iter()
            .collect();
        for (p, m) in ps.iter().zip(&ms) {
            let r = sizing::lightest(m, &pool, 1.0);
            assert_eq!(
                p.designation.as_deref(),
                r.chosen.map(|c| c.entry.designation)
            );
            match &r.next_lighter {
                Some(n) => assert!(
                    p.lighter_text.starts_with(n.entry.designation),
                    "{}",
                    p.lighter_text
                ),
                None => assert!(p.lighter_text.starts_with('—')),
            }
        }
        let picks: Vec<(String, String)> = ps
            .iter()
            .filter_map(|p| p.designation.clone().map(|d| (p.id.clone(), d)))
            .collect();
        assert!(!picks.is_empty());
        let before = apply(&mut ms, &picks).unwrap();
        assert_eq!(before[0], sample_member("A"));
        for (id, d) in &picks {
            let m = ms.iter().find(|m| m.id == *id).unwrap();
            assert_eq!(
                m.section,
                SectionSpec::Catalogue(CatalogueRef {
                    designation: d.clone()
                })
            );
            assert!(check_member(m).unwrap().utilisation <= 1.0);
        }
        assert_eq!(
            apply(&mut ms, &picks),
            None,
            "applying again changes nothing"
        );
    }

    #[test]
    fn tables_as_text() {
        let m = sample_member("<A&\"");
        let found = search("heb22", "", "");
        let h = rows_html(&m, &found).into_string();
        assert_eq!(
            h.matches("data-testid=\"section-candidate\"").count(),
            found.len()
        );
        let u = utilisation_with(&m, found[0]).unwrap();
        assert!(h.contains(&fixed(u, 3)));
        assert!(h.contains("data-act=\"pick\" data-v=\"HE 220 B\""));
        let ps = propose(&[m.clone(), sample_member("B")], "heb", "", 1.0);
        let t = proposals_html(&ps).into_string();
        assert!(
            t.contains("data-id=\"&lt;A&amp;&quot;\""),
            "the id is escaped: {t}"
        );
        assert!(!t.contains("<A&"));
        assert!(t.contains("Accept all 2"));
        assert_eq!(picks(&ps, Some("B")).len(), 1);
        assert_eq!(picks(&ps, None).len(), 2);
        assert!(proposals_html(&[]).is_empty());
        let f = form_html().into_string();
        for name in [
            "section_search",
            "section_series",
            "section_shape",
            "util_limit",
        ] {
            assert!(f.contains(&format!("name=\"{name}\"")), "{name}");
        }
        assert!(f.contains("<option value=\"heb\">HE B</option>"));
        assert_eq!(parse_limit(" 0,9 "), Some(0.9));
        assert_eq!(parse_limit("0"), None);
        assert_eq!(parse_limit("x"), None);
    }

    #[test]
    fn tight_limit_and_empty_pool() {
        let ms = vec![sample_member("A")];
        let p = &propose(&ms, "heb", "", 1e-6)[0];
        assert_eq!(p.designation, None);
        assert!(p.chosen_text.starts_with("none"), "{}", p.chosen_text);
        let mut t = sample_member("T");
        t.section = SectionSpec::Catalogue(CatalogueRef {
            designation: "nope".into(),
        });
        let _ = propose(&[t], "", "", 1.0);
    }
}
