//! The classic end conditions of a single column and their
//! effective-length factors K: the theoretical factor (the distance
//! between the points of contraflexure of the ideal buckled shape, any
//! stability text) and the value recommended for design, which allows for
//! end fixity that is never perfect in practice. The design values as
//! tabulated in the Commentary to AISC 360-16, Appendix 7, Table C-A-7.1
//! ("recommended design value when ideal conditions are approximated";
//! recalled from memory, and common practice).
//!
//! The member file holds only the factor (`k_major`, `k_minor`), not the
//! end condition, so the check reads a factor that is the theoretical value
//! of a case, below that case's design value and no case's design value
//! (0.5 fixed at both ends, 0.7 fixed and pinned) as that theoretical
//! choice and warns, naming the design value ([`theoretical_below_design`]).
//! A theoretical 1.0 (both ends fixed, sway) and 2.0 (cantilever) are also
//! design values of other cases (pinned at both ends; pinned and fixed,
//! sway) and cannot be told apart from them.

/// One classic end condition.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EndCondition {
    /// Stable key (the app's select option).
    pub key: &'static str,
    /// Short label ("fixed – fixed").
    pub label: &'static str,
    /// In a sentence, after "a column": "fixed at both ends".
    pub words: &'static str,
    /// Theoretical factor.
    pub theoretical: f64,
    /// Recommended design factor.
    pub design: f64,
}

/// The six classic end conditions.
pub const END_CONDITIONS: [EndCondition; 6] = [
    EndCondition {
        key: "pp",
        label: "pinned – pinned",
        words: "pinned at both ends",
        theoretical: 1.0,
        design: 1.0,
    },
    EndCondition {
        key: "ff",
        label: "fixed – fixed",
        words: "fixed at both ends",
        theoretical: 0.5,
        design: 0.65,
    },
    EndCondition {
        key: "fp",
        label: "fixed – pinned",
        words: "fixed at one end and pinned at the other",
        theoretical: 0.7,
        design: 0.8,
    },
    EndCondition {
        key: "fo",
        label: "fixed – free (cantilever)",
        words: "fixed at one end and free at the other (a cantilever)",
        theoretical: 2.0,
        design: 2.1,
    },
    EndCondition {
        key: "fsf",
        label: "fixed – fixed, ends sway",
        words: "fixed at both ends, the ends free to sway",
        theoretical: 1.0,
        design: 1.2,
    },
    EndCondition {
        key: "psf",
        label: "pinned – fixed, ends sway",
        words: "pinned at one end and fixed at the other, the ends free to sway",
        theoretical: 2.0,
        design: 2.0,
    },
];

/// The end condition whose theoretical factor `k` is (to 1e-9), when that
/// is below its recommended design value and `k` is no case's design value:
/// a factor that reads as the ideal case's, which overstates the resistance.
#[inline]
pub fn theoretical_below_design(k: f64) -> Option<&'static EndCondition> {
    let close = |a: f64| (a - k).abs() < 1e-9;
    if END_CONDITIONS.iter().any(|c| close(c.design)) {
        return None;
    }
    END_CONDITIONS
        .iter()
        .find(|c| close(c.theoretical) && c.theoretical < c.design)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_theoretical_values_that_read_as_such() {
        // Theoretical: ideal Euler cases (any stability text); design:
        // AISC 360-16 Commentary Table C-A-7.1 (recalled from memory).
        let ff = theoretical_below_design(0.5).unwrap();
        assert_eq!((ff.key, ff.design), ("ff", 0.65));
        let fp = theoretical_below_design(0.7).unwrap();
        assert_eq!((fp.key, fp.design), ("fp", 0.8));
        // 1.0 and 2.0 are design values of other cases; a design value
        // and any other factor are not theoretical choices.
        for k in [1.0, 2.0, 0.65, 0.8, 2.1, 1.2, 0.6, 0.75] {
            assert_eq!(theoretical_below_design(k), None, "{k}");
        }
    }
}
