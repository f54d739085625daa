//! End conditions and their effective-length factors.
//!
//! The six classic cases with the theoretical factor (the distance between
//! points of contraflexure of the ideal buckled shape) and the value design
//! guides usually recommend, which allows for end fixity that is never
//! perfect. Values as commonly tabulated in design guides (common
//! practice); recalled from memory of the table in the Commentary to
//! AISC 360-16, Appendix 7 (Table C-A-7.1, "recommended design value when
//! ideal conditions are approximated").

/// One classic end condition.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EndCondition {
    /// Stable key for the select option.
    pub key: &'static str,
    /// In words.
    pub label: &'static str,
    /// Theoretical factor.
    pub theoretical: f64,
    /// Usual design factor.
    pub design: f64,
}

/// The six classic end conditions.
pub const END_CONDITIONS: [EndCondition; 6] = [
    EndCondition {
        key: "pp",
        label: "pinned – pinned",
        theoretical: 1.0,
        design: 1.0,
    },
    EndCondition {
        key: "ff",
        label: "fixed – fixed",
        theoretical: 0.5,
        design: 0.65,
    },
    EndCondition {
        key: "fp",
        label: "fixed – pinned",
        theoretical: 0.7,
        design: 0.8,
    },
    EndCondition {
        key: "fo",
        label: "fixed – free (cantilever)",
        theoretical: 2.0,
        design: 2.1,
    },
    EndCondition {
        key: "fsf",
        label: "fixed – fixed, ends sway",
        theoretical: 1.0,
        design: 1.2,
    },
    EndCondition {
        key: "psf",
        label: "pinned – fixed, ends sway",
        theoretical: 2.0,
        design: 2.0,
    },
];

/// How the buckling length about one axis is set.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Restraint {
    /// A classic case with its design factor.
    Design(usize),
    /// A classic case with its theoretical factor.
    Theory(usize),
    /// A factor typed by the person.
    Factor,
    /// The buckling length typed directly.
    Length,
    /// A column in a frame: k from G at its ends (member key
    /// `frame_major` / `frame_minor`).
    Frame,
}

impl Restraint {
    /// The select option value ("d:ff", "t:ff", "factor", "length").
    pub fn value(self) -> String {
        match self {
            Restraint::Design(i) => format!("d:{}", END_CONDITIONS.get(i).map_or("", |c| c.key)),
            Restraint::Theory(i) => format!("t:{}", END_CONDITIONS.get(i).map_or("", |c| c.key)),
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
        } else if let Some(key) = v.strip_prefix("t:") {
            find(key).map_or(Restraint::Factor, Restraint::Theory)
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
            Restraint::Theory(i) => END_CONDITIONS.get(i).map(|c| c.theoretical),
            _ => None,
        }
    }

    /// Every choice, in the order of the select.
    pub fn all() -> Vec<Restraint> {
        let mut out = Vec::with_capacity(15);
        for i in 0..END_CONDITIONS.len() {
            out.push(Restraint::Design(i));
            out.push(Restraint::Theory(i));
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
            Restraint::Theory(i) => END_CONDITIONS.get(i).map_or_else(String::new, |c| {
                format!("{}: theoretical K = {}", c.label, c.theoretical)
            }),
            Restraint::Factor => "typed factor K".into(),
            Restraint::Length => "typed buckling length L_cr".into(),
            Restraint::Frame => "column in a frame: k from G at its ends".into(),
        }
    }

    /// The choice that shows a member's axis: a frame, else a given
    /// length, else the first classic case whose design (then theoretical)
    /// factor equals the factor, else a typed factor.
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
        if let Some(i) = END_CONDITIONS.iter().position(|c| close(c.theoretical)) {
            return Restraint::Theory(i);
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
        assert_eq!(Restraint::infer(0.5, None, false), Restraint::Theory(1));
        assert_eq!(Restraint::infer(0.7, None, false), Restraint::Theory(2));
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
