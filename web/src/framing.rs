//! The editor's column-in-a-frame helpers, plain Rust tested on the host:
//! the text of the k that the ends give (live, as the person types G), and
//! the working out of G at one end from the members meeting there. The
//! engineering (k from the alignment-chart equations, the far-end factors,
//! G from the sums) is core's `buckling::chart`; this module only reads
//! what was typed and words the result.

use strutline_core::buckling::chart::{
    self, Beam, FarEnd, Frame, FrameKey, JointG, Stiffness, G_FIXED_BASE, G_PINNED_BASE,
};
use strutline_core::units::UnitSystem;

use crate::numtext::{fixed, parse_number, working};
use crate::units_view::{from_field, span_text};

/// The frame key of an axis.
pub fn key(major: bool) -> FrameKey {
    if major {
        FrameKey::Major
    } else {
        FrameKey::Minor
    }
}

/// "k = 1.234, buckling length k L = 6.66 m" for a frame, or the engine's
/// refusal in words.
pub fn k_text(frame: &Frame, major: bool, length_mm: f64, sys: UnitSystem) -> String {
    match chart::k_factor(frame, key(major)) {
        Ok(k) => format!(
            "k = {} ({} frame), buckling length k·L = {}",
            fixed(k, 3),
            if frame.sway { "sway" } else { "braced" },
            // A member length: ft in US units, as the member's length.
            span_text(sys, k * length_mm)
        ),
        Err(e) => crate::fields::error_text(&e),
    }
}

/// What an end of the column is, for the G helper.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum EndKind {
    /// A joint with beams: G from the sums.
    Joint,
    /// A base without beams, pinned: G = 10.
    PinnedBase,
    /// A base without beams, fixed: G = 1.0.
    FixedBase,
}

impl EndKind {
    /// Every kind, in the order of the select.
    pub const ALL: [EndKind; 3] = [EndKind::Joint, EndKind::PinnedBase, EndKind::FixedBase];

    /// The select value.
    pub fn value(self) -> &'static str {
        match self {
            EndKind::Joint => "joint",
            EndKind::PinnedBase => "pinned-base",
            EndKind::FixedBase => "fixed-base",
        }
    }

    /// From the select value.
    pub fn from_value(v: &str) -> EndKind {
        EndKind::ALL
            .into_iter()
            .find(|k| k.value() == v)
            .unwrap_or(EndKind::Joint)
    }

    /// The option text.
    pub fn label(self) -> &'static str {
        match self {
            EndKind::Joint => "a joint with beams (G from the members)",
            EndKind::PinnedBase => "a pinned base without beams (G = 10)",
            EndKind::FixedBase => "a fixed base without beams (G = 1.0)",
        }
    }
}

/// The far-end choices of a beam: select value, words.
pub const FAR_ENDS: [(&str, &str); 3] = [
    ("charted", "continuous, as the chart assumes (× 1)"),
    ("pinned", "pinned at its far end"),
    ("fixed", "fixed at its far end"),
];

/// The far end of a select value.
pub fn far_end(v: &str) -> FarEnd {
    match v {
        "pinned" => FarEnd::Pinned,
        "fixed" => FarEnd::Fixed,
        _ => FarEnd::AsCharted,
    }
}

/// What was typed for one member at the joint: I and length, as text in
/// the display units.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Typed {
    /// I about the axis of bending in the frame's plane.
    pub i: String,
    /// Its length.
    pub length: String,
}

/// The G helper's inputs for one end.
#[derive(Debug, Clone, PartialEq)]
pub struct JointForm {
    /// What the end is.
    pub kind: EndKind,
    /// The other column at the joint (empty: none).
    pub other_column: Typed,
    /// Up to two beams, with the select value of their far ends.
    pub beams: [(Typed, String); 2],
}

impl Default for JointForm {
    fn default() -> JointForm {
        JointForm {
            kind: EndKind::Joint,
            other_column: Typed::default(),
            beams: [
                (Typed::default(), "charted".into()),
                (Typed::default(), "charted".into()),
            ],
        }
    }
}

impl JointForm {
    /// The typed member `which`: 0 the other column, 1 and 2 the beams.
    pub fn member_mut(&mut self, which: usize) -> Option<&mut Typed> {
        match which {
            0 => Some(&mut self.other_column),
            n => self.beams.get_mut(n - 1).map(|b| &mut b.0),
        }
    }
}

/// A typed member, `None` when both its fields are empty.
fn stiffness(t: &Typed, what: &str, sys: UnitSystem) -> Result<Option<Stiffness>, String> {
    if t.i.trim().is_empty() && t.length.trim().is_empty() {
        return Ok(None);
    }
    let read = |text: &str, key: &str, name: &str| {
        parse_number(&from_field(sys, key, text)).map_err(|e| e.message(&format!("{what}, {name}")))
    };
    Ok(Some(Stiffness {
        i_mm4: read(&t.i, "i_major_mm4", "I")?,
        length_mm: read(&t.length, "length_mm", "length")?,
    }))
}

/// G at the end from the form: the value and the working in words, or
/// what is wrong. `own` is the checked column itself (its I about the
/// axis and its length); `field` names the G in errors.
pub fn work_out(
    form: &JointForm,
    own: Stiffness,
    sway: bool,
    field: &'static str,
    sys: UnitSystem,
) -> Result<(f64, Vec<String>), String> {
    match form.kind {
        EndKind::PinnedBase => {
            return Ok((
                G_PINNED_BASE,
                vec![format!(
                    "pinned base: G = {G_PINNED_BASE} (AISC 360-16 Commentary, Appendix 7, 7.2: a pin is never frictionless; recalled from memory)"
                )],
            ))
        }
        EndKind::FixedBase => {
            return Ok((
                G_FIXED_BASE,
                vec![format!(
                    "fixed base: G = {} (AISC 360-16 Commentary, Appendix 7, 7.2: no base is perfectly rigid; recalled from memory)",
                    fixed(G_FIXED_BASE, 1)
                )],
            ))
        }
        EndKind::Joint => {}
    }
    let mut columns = vec![own];
    if let Some(c) = stiffness(&form.other_column, "other column", sys)? {
        columns.push(c);
    }
    let mut beams = Vec::new();
    for (n, (t, far)) in form.beams.iter().enumerate() {
        if let Some(s) = stiffness(t, &format!("beam {}", n + 1), sys)? {
            beams.push(Beam {
                member: s,
                far_end: far_end(far),
            });
        }
    }
    let JointG {
        columns: c,
        beams: b,
        g,
    } = chart::joint_g(&columns, &beams, sway, field).map_err(|e| crate::fields::error_text(&e))?;
    let frame = if sway { "sway" } else { "braced" };
    let mut lines = Vec::new();
    for (n, s) in columns.iter().enumerate() {
        lines.push(format!(
            "{}: I/L = {} / {} = {} mm³",
            if n == 0 {
                "this column"
            } else {
                "other column"
            },
            working(s.i_mm4),
            working(s.length_mm),
            working(s.i_mm4 / s.length_mm)
        ));
    }
    for (n, beam) in beams.iter().enumerate() {
        let m = beam.far_end.factor(sway);
        let why = match beam.far_end {
            FarEnd::AsCharted => "far end as the chart assumes".to_string(),
            FarEnd::Pinned => format!("far end pinned, {frame} frame"),
            FarEnd::Fixed => format!("far end fixed, {frame} frame"),
        };
        lines.push(format!(
            "beam {}: m I/L = {} × {} / {} = {} mm³ ({why})",
            n + 1,
            working(m),
            working(beam.member.i_mm4),
            working(beam.member.length_mm),
            working(m * beam.member.i_mm4 / beam.member.length_mm)
        ));
    }
    lines.push(format!(
        "G = Σ(I/L) columns / Σ(m I/L) beams = {} / {} = {} (one E throughout, so E cancels)",
        working(c),
        working(b),
        fixed(g, 3)
    ));
    lines.push(
        "far-end factors m: AISC 360-16 Commentary, Appendix 7, 7.2 (braced: pinned 1.5, fixed 2.0; \
         sway: pinned 0.5, fixed 2/3); recalled from memory, common practice"
            .into(),
    );
    Ok((g, lines))
}

#[cfg(test)]
mod tests {
    use super::*;

    const OWN: Stiffness = Stiffness {
        i_mm4: 1.0e8,
        length_mm: 4000.0,
    };

    fn typed(i: &str, l: &str) -> Typed {
        Typed {
            i: i.into(),
            length: l.into(),
        }
    }

    #[test]
    fn g_from_typed_members_with_far_end_factors() {
        let mut form = JointForm {
            other_column: typed("1e8", "4000"),
            ..JointForm::default()
        };
        form.beams[0] = (typed("2e8", "8000"), "pinned".into());
        form.beams[1] = (typed("2,0e8", "8000"), "charted".into());
        let (g, lines) = work_out(&form, OWN, true, "frame_major.g_a", UnitSystem::Si).unwrap();
        // 50,000 / (0.5 x 25,000 + 25,000) = 1.333...
        assert!((g - 50_000.0 / 37_500.0).abs() < 1e-12, "{g}");
        assert!(
            lines
                .iter()
                .any(|l| l.contains("far end pinned, sway frame")),
            "{lines:?}"
        );
        assert!(lines.iter().any(|l| l.starts_with("G = ")), "{lines:?}");
        // Braced, the same beam pinned counts 1.5.
        let (g, _) = work_out(&form, OWN, false, "f", UnitSystem::Si).unwrap();
        assert!((g - 50_000.0 / 62_500.0).abs() < 1e-12, "{g}");
    }

    #[test]
    fn bases_and_bad_input() {
        let mut form = JointForm {
            kind: EndKind::PinnedBase,
            ..JointForm::default()
        };
        assert_eq!(
            work_out(&form, OWN, true, "f", UnitSystem::Si).unwrap().0,
            10.0
        );
        form.kind = EndKind::FixedBase;
        assert_eq!(
            work_out(&form, OWN, true, "f", UnitSystem::Si).unwrap().0,
            1.0
        );
        form.kind = EndKind::Joint;
        // No beam: refused, naming the key.
        let e = work_out(&form, OWN, true, "frame_minor.g_b", UnitSystem::Si).unwrap_err();
        assert!(e.contains("frame_minor.g_b") && e.contains("beam"), "{e}");
        form.beams[0].0 = typed("lots", "8000");
        let e = work_out(&form, OWN, true, "f", UnitSystem::Si).unwrap_err();
        assert!(e.contains("beam 1, I"), "{e}");
        form.member_mut(2).unwrap().i = "x".into();
        assert_eq!(form.beams[1].0.i, "x");
        assert!(form.member_mut(3).is_none());
        for k in EndKind::ALL {
            assert_eq!(EndKind::from_value(k.value()), k);
        }
    }

    #[test]
    fn k_text_says_k_and_length_or_the_refusal() {
        let f = Frame {
            sway: true,
            g_a: 0.0,
            g_b: 0.0,
        };
        let t = k_text(&f, true, 5000.0, UnitSystem::Si);
        assert!(
            t.starts_with("k = 1.000 (sway frame)") && t.contains("5000 mm"),
            "{t}"
        );
        let bad = Frame {
            sway: true,
            g_a: -1.0,
            g_b: 1.0,
        };
        assert!(k_text(&bad, false, 5000.0, UnitSystem::Si).contains("frame_minor.g_a"));
    }
}
