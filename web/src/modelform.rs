//! The column-model panel's edits of a member's `buckling_model`, plain
//! Rust tested on the host: a model to start from, segments added by
//! splitting the last and removed by merging into a neighbour (so the
//! lengths always add up to the member's), the three ways a support or
//! brace holds (held, free, a spring), and a segment's section as text.

use strutline_core::buckling::model::{BucklingModel, End, Ends, Segment};
use strutline_core::buckling::{Fixity, Support};
use strutline_core::section::{CatalogueRef, SectionSpec};
use strutline_core::units::UnitSystem;

/// A model to start from: pinned at both ends about both axes, one
/// segment (the member), the member's `axial_kn` at end B.
pub fn start() -> BucklingModel {
    let end = End {
        major: Support::PINNED,
        minor: Support::PINNED,
    };
    BucklingModel {
        segments: Vec::new(),
        ends: Ends { a: end, b: end },
        restraints: Vec::new(),
        axial_loads: Vec::new(),
        distributed_kn_per_m: 0.0,
    }
}

/// The segments as shown: the model's, or the member whole when it has
/// none.
pub fn segments(model: &BucklingModel, length_mm: f64) -> Vec<Segment> {
    if model.segments.is_empty() {
        vec![Segment {
            length_mm,
            section: None,
        }]
    } else {
        model.segments.clone()
    }
}

/// Adds a segment by splitting the last one in two halves (the new one
/// takes the last one's section), so the total stays the member's length.
pub fn add_segment(model: &mut BucklingModel, length_mm: f64) {
    let mut segs = segments(model, length_mm);
    if let Some(last) = segs.last_mut() {
        last.length_mm /= 2.0;
        let copy = last.clone();
        segs.push(copy);
    }
    model.segments = segs;
}

/// Removes segment `i`, its length going to the one before it (or after
/// it, for the first); one segment left becomes the member whole.
pub fn remove_segment(model: &mut BucklingModel, i: usize) {
    if i >= model.segments.len() || model.segments.len() < 2 {
        return;
    }
    let gone = model.segments.remove(i);
    let into = if i == 0 { 0 } else { i - 1 };
    if let Some(s) = model.segments.get_mut(into) {
        s.length_mm += gone.length_mm;
    }
    if model.segments.len() == 1 && model.segments.iter().all(|s| s.section.is_none()) {
        model.segments.clear();
    }
}

/// How a degree of freedom is held, as a select value.
pub fn hold_value(f: Fixity) -> &'static str {
    match f {
        Fixity::Fixed => "held",
        Fixity::Free => "free",
        Fixity::Spring(_) => "spring",
    }
}

/// The fixity of a select value, keeping a spring's stiffness (`spring`
/// starts from `start_kn` when it was not a spring).
pub fn hold_of(value: &str, was: Fixity, start: f64) -> Fixity {
    match value {
        "held" => Fixity::Fixed,
        "free" => Fixity::Free,
        _ => match was {
            Fixity::Spring(k) => Fixity::Spring(k),
            _ => Fixity::Spring(start),
        },
    }
}

/// A segment's section as the panel shows it: the catalogue designation
/// (empty: the member's section), and a note for a section typed out in
/// the file (kept until a designation is typed), in the units shown.
pub fn section_text(system: UnitSystem, s: &Segment) -> (String, Option<String>) {
    match &s.section {
        None => (String::new(), None),
        Some(SectionSpec::Catalogue(c)) => (c.designation.clone(), None),
        Some(other) => (
            String::new(),
            Some(format!(
                "its own section: {}",
                crate::units_view::section_text(system, other)
            )),
        ),
    }
}

/// The section of a typed designation: `None` (the member's) when empty.
pub fn section_of(text: &str) -> Option<SectionSpec> {
    let t = text.trim();
    (!t.is_empty()).then(|| {
        SectionSpec::Catalogue(CatalogueRef {
            designation: t.to_string(),
        })
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    fn total(m: &BucklingModel, l: f64) -> f64 {
        segments(m, l).iter().map(|s| s.length_mm).sum()
    }

    #[test]
    fn segments_always_add_up() {
        let mut m = start();
        add_segment(&mut m, 6000.0);
        assert_eq!(m.segments.len(), 2);
        assert_eq!(total(&m, 6000.0), 6000.0);
        m.segments[1].section = section_of(" HE 200 B ");
        add_segment(&mut m, 6000.0);
        assert_eq!(
            m.segments.iter().map(|s| s.length_mm).collect::<Vec<_>>(),
            vec![3000.0, 1500.0, 1500.0]
        );
        assert_eq!(section_text(UnitSystem::Si, &m.segments[2]).0, "HE 200 B");
        remove_segment(&mut m, 0);
        assert_eq!(m.segments[0].length_mm, 4500.0);
        assert_eq!(total(&m, 6000.0), 6000.0);
        remove_segment(&mut m, 1);
        // One segment with its own section stays a segment.
        assert_eq!(m.segments.len(), 1);
        m.segments[0].section = None;
        add_segment(&mut m, 6000.0);
        remove_segment(&mut m, 1);
        assert!(m.segments.is_empty());
        remove_segment(&mut m, 5);
    }

    /// A segment's section typed out in the file is named in the units
    /// shown (1 in = 25.4 mm exactly: 200 mm = 7.874 in).
    #[test]
    fn a_typed_out_segment_section_follows_the_units() {
        use strutline_core::section::Rect;
        let seg = Segment {
            length_mm: 3000.0,
            section: Some(SectionSpec::Rect(Rect {
                depth_mm: 200.0,
                width_mm: 100.0,
            })),
        };
        let (_, si) = section_text(UnitSystem::Si, &seg);
        let (_, us) = section_text(UnitSystem::Us, &seg);
        assert_eq!(si.as_deref(), Some("its own section: rect 200x100"));
        let us = us.unwrap();
        assert!(
            us.contains("7.874") && us.ends_with(" in") && !us.contains("mm"),
            "{us}"
        );
    }

    #[test]
    fn holds_keep_a_spring() {
        assert_eq!(hold_of("held", Fixity::Spring(3.0), 1.0), Fixity::Fixed);
        assert_eq!(
            hold_of("spring", Fixity::Spring(3.0), 1.0),
            Fixity::Spring(3.0)
        );
        assert_eq!(hold_of("spring", Fixity::Free, 1.0), Fixity::Spring(1.0));
        for f in [Fixity::Fixed, Fixity::Free, Fixity::Spring(2.0)] {
            assert_eq!(hold_of(hold_value(f), f, 9.0), f);
        }
        assert_eq!(section_of("  "), None);
    }
}
