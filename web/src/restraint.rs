//! End conditions and their effective-length factors, as the editor offers
//! them: each classic case with its recommended design factor only (core's
//! `buckling::ends::END_CONDITIONS`, AISC 360-16 Commentary Table C-A-7.1,
//! recalled from memory). The theoretical factors (0.5 fixed at both ends,
//! 0.7 fixed and pinned, 1.0 fixed at both ends with sway, 2.0 cantilever)
//! are not offered: ideal fixity is not reached in practice, and offering
//! them beside the design values invites the higher resistance. A factor
//! typed as such stays possible; the check warns where it is a theoretical
//! value below its case's design value (`k-theoretical-major`/`-minor`).

pub use strutline_core::buckling::ends::{EndCondition, END_CONDITIONS};

/// How the buckling length about one axis is set.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Restraint {
    /// A classic case with its design factor.
    Design(usize),
    /// A factor typed by the person.
    Factor,
    /// The buckling length typed directly.
    Length,
    /// A column in a frame: k from G at its ends (member key
    /// `frame_major` / `frame_minor`).
    Frame,
}

impl Restraint {
    /// The select option value ("d:ff", "factor", "length", "frame").
    pub fn value(self) -> String {
        match self {
            Restraint::Design(i) => format!("d:{}", END_CONDITIONS.get(i).map_or("", |c| c.key)),
            Restraint::Factor => "factor".into(),
            Restraint::Length => "length".into(),
            Restraint::Frame => "frame".into(),
        }
    }

    /// Reads a select option value.
    pub fn from_value(v: &str) -> Restraint {
        let find = |key: &str| END_CONDITIONS.iter().position(|c| c.key == key);
        if let Some(key) = v.strip_prefix("d:") {
            find(key).map_or(Restraint::Factor, Restraint::Design)
        } else if v == "length" {
            Restraint::Length
        } else if v == "frame" {
            Restraint::Frame
        } else {
            Restraint::Factor
        }
    }

    /// The factor of a classic case, if this is one.
    pub fn factor(self) -> Option<f64> {
        match self {
            Restraint::Design(i) => END_CONDITIONS.get(i).map(|c| c.design),
            _ => None,
        }
    }

    /// Every choice, in the order of the select.
    pub fn all() -> Vec<Restraint> {
        let mut out = Vec::with_capacity(END_CONDITIONS.len() + 3);
        for i in 0..END_CONDITIONS.len() {
            out.push(Restraint::Design(i));
        }
        out.push(Restraint::Factor);
        out.push(Restraint::Length);
        out.push(Restraint::Frame);
        out
    }

    /// The option text.
    pub fn label(self) -> String {
        match self {
            Restraint::Design(i) => END_CONDITIONS.get(i).map_or_else(String::new, |c| {
                format!("{}: design K = {}", c.label, c.design)
            }),
            Restraint::Factor => "typed factor K".into(),
            Restraint::Length => "typed buckling length L_cr".into(),
            Restraint::Frame => "column in a frame: k from G at its ends".into(),
        }
    }

    /// The choice that shows a member's axis: a frame, else a given
    /// length, else the first classic case whose design factor equals the
    /// factor, else a typed factor (a theoretical value among them).
    pub fn infer(k: f64, lcr_mm: Option<f64>, framed: bool) -> Restraint {
        if framed {
            return Restraint::Frame;
        }
        if lcr_mm.is_some() {
            return Restraint::Length;
        }
        let close = |a: f64| (a - k).abs() < 1e-9;
        if let Some(i) = END_CONDITIONS.iter().position(|c| close(c.design)) {
            return Restraint::Design(i);
        }
        Restraint::Factor
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn classic_factors() {
        // Theoretical values: ideal Euler cases (any stability text);
        // design values: as commonly tabulated in design guides (common practice).
        let ff = END_CONDITIONS.iter().find(|c| c.key == "ff").unwrap();
        assert_eq!((ff.theoretical, ff.design), (0.5, 0.65));
        let fo = END_CONDITIONS.iter().find(|c| c.key == "fo").unwrap();
        assert_eq!((fo.theoretical, fo.design), (2.0, 2.1));
        let fp = END_CONDITIONS.iter().find(|c| c.key == "fp").unwrap();
        assert_eq!((fp.theoretical, fp.design), (0.7, 0.8));
    }

    /// The list offers design factors only (N12 of the 2026-12-05 review:
    /// a theoretical K = 0.5 chosen from the list raised a CSA resistance
    /// by a third with no remark).
    #[test]
    fn the_list_offers_no_theoretical_factor() {
        let labels: Vec<String> = Restraint::all().iter().map(|r| r.label()).collect();
        assert!(
            labels.iter().all(|l| !l.contains("theoretical")),
            "{labels:?}"
        );
        let factors: Vec<f64> = Restraint::all().iter().filter_map(|r| r.factor()).collect();
        assert_eq!(factors, [1.0, 0.65, 0.8, 2.1, 1.2, 2.0]);
    }

    #[test]
    fn values_round_trip() {
        for r in Restraint::all() {
            assert_eq!(Restraint::from_value(&r.value()), r, "{r:?}");
            assert!(!r.label().is_empty());
        }
        assert_eq!(Restraint::from_value("nonsense"), Restraint::Factor);
    }

    #[test]
    fn infers_from_member() {
        assert_eq!(Restraint::infer(1.0, None, false), Restraint::Design(0));
        assert_eq!(Restraint::infer(0.65, None, false), Restraint::Design(1));
        // A theoretical value is no choice of the list: a typed factor.
        assert_eq!(Restraint::infer(0.5, None, false), Restraint::Factor);
        assert_eq!(Restraint::infer(0.7, None, false), Restraint::Factor);
        assert_eq!(Restraint::infer(2.0, None, false), Restraint::Design(5));
        assert_eq!(Restraint::infer(0.83, None, false), Restraint::Factor);
        assert_eq!(
            Restraint::infer(1.0, Some(2500.0), false),
            Restraint::Length
        );
        assert_eq!(Restraint::Design(1).factor(), Some(0.65));
        assert_eq!(Restraint::Length.factor(), None);
        assert_eq!(Restraint::infer(1.0, None, true), Restraint::Frame);
        assert_eq!(Restraint::Frame.factor(), None);
    }
}
