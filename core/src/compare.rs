//! The same member under every design method side by side: resistance,
//! utilisation and governing mode for each method that applies, and the
//! method's own reason for each that does not (a timber method for steel,
//! a steel method for timber, a shape a method does not cover).
//!
//! Each row is the engine's ordinary check with another method
//! ([`Prepared::check_with`]), so it can never disagree with checking the
//! member under that method directly.

use serde::Serialize;

use crate::check::{Mode, Prepared, Warning};
use crate::error::{Error, Result};
use crate::member::Member;
use crate::method::Method;

/// The outcome of one method.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "outcome", rename_all = "kebab-case")]
pub enum Outcome {
    /// The method applies and was worked.
    Checked {
        /// Design resistance, kN.
        resistance_kn: f64,
        /// Design load over design resistance.
        utilisation: f64,
        /// Whether the utilisation is at most 1.
        passes: bool,
        /// The governing mode.
        governing: Mode,
        /// What sets the utilisation: the axial mode's key, a bending
        /// check or an interaction equation (`CheckResult::governing_check`).
        governing_check: &'static str,
        /// The method's cautions for this member.
        warnings: Vec<Warning>,
    },
    /// The method does not apply to this member.
    NotApplicable {
        /// Why, in the method's words.
        reason: String,
    },
    /// The method applies in principle but refused this member's values
    /// (e.g. a value outside the method's range).
    Refused {
        /// The message, naming the field.
        message: String,
    },
}

/// One method's row of the comparison.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Comparison {
    /// The method.
    pub method: Method,
    /// Its title.
    pub title: &'static str,
    /// Whether it is the member's own method.
    pub own: bool,
    /// What it gives.
    pub outcome: Outcome,
}

impl Comparison {
    /// The utilisation when the method applies.
    pub fn utilisation(&self) -> Option<f64> {
        match &self.outcome {
            Outcome::Checked { utilisation, .. } => Some(*utilisation),
            _ => None,
        }
    }
}

fn inner(e: Error) -> Error {
    match e {
        Error::InMember { source, .. } => inner(*source),
        other => other,
    }
}

/// Works `prepared` under every method, in [`Method::ALL`] order.
pub fn compare(prepared: &Prepared) -> Vec<Comparison> {
    Method::ALL
        .into_iter()
        .map(|method| {
            let outcome = match prepared.check_as(method, crate::check::Working::Skipped) {
                Ok(r) => Outcome::Checked {
                    resistance_kn: r.resistance_kn,
                    utilisation: r.utilisation,
                    passes: r.passes,
                    governing: r.governing,
                    governing_check: r.governing_check,
                    warnings: r.warnings,
                },
                Err(e) => match inner(e) {
                    Error::NotApplicable { reason, .. } => Outcome::NotApplicable { reason },
                    other => Outcome::Refused {
                        message: other.to_string(),
                    },
                },
            };
            Comparison {
                method,
                title: method.title(),
                own: method == prepared.member.method,
                outcome,
            }
        })
        .collect()
}

/// Prepares `member` (section built, material resolved) and compares it.
/// Errors are those of the member itself (its section or material), which
/// no method could work with.
pub fn compare_member(member: &Member) -> Result<Vec<Comparison>> {
    Ok(compare(&Prepared::new(member)?))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::material::{MaterialSpec, TimberKind};
    use crate::section::{Rect, SectionSpec};

    fn member(material: MaterialSpec, method: Method) -> Member {
        Member::new(
            "K7",
            SectionSpec::Rect(Rect {
                depth_mm: 140.0,
                width_mm: 90.0,
            }),
            material,
            2700.0,
            40.0,
            method,
        )
    }

    fn steel() -> MaterialSpec {
        MaterialSpec::Custom {
            fy_mpa: 235.0,
            e_mpa: 210_000.0,
            g_mpa: None,
        }
    }

    fn timber() -> MaterialSpec {
        MaterialSpec::Timber {
            fc0k_mpa: 21.0,
            e005_mpa: 7400.0,
            e0mean_mpa: 11_000.0,
            timber: TimberKind::Solid,
        }
    }

    #[test]
    fn every_method_has_a_row_that_agrees_with_its_own_check() {
        let m = member(steel(), Method::Euler);
        let p = Prepared::new(&m).unwrap();
        let rows = compare(&p);
        assert_eq!(rows.len(), Method::ALL.len());
        for row in &rows {
            assert_eq!(row.own, row.method == Method::Euler);
            assert_eq!(row.title, row.method.title());
            if let Outcome::Checked {
                resistance_kn,
                utilisation,
                governing,
                ..
            } = &row.outcome
            {
                let direct = p.check_with(row.method).unwrap();
                assert_eq!(*resistance_kn, direct.resistance_kn);
                assert_eq!(*utilisation, direct.utilisation);
                assert_eq!(*governing, direct.governing);
                assert!(*resistance_kn > 0.0);
            }
        }
        let euler = rows.iter().find(|r| r.method == Method::Euler).unwrap();
        assert!(euler.utilisation().is_some());
    }

    #[test]
    fn timber_method_does_not_apply_to_steel_and_the_reverse() {
        let rows = compare_member(&member(steel(), Method::Euler)).unwrap();
        let t = rows.iter().find(|r| r.method == Method::En1995).unwrap();
        match &t.outcome {
            Outcome::NotApplicable { reason } => assert!(!reason.is_empty()),
            other => panic!("timber method on steel: {other:?}"),
        }
        let rows = compare_member(&member(timber(), Method::En1995)).unwrap();
        let t = rows.iter().find(|r| r.method == Method::En1995).unwrap();
        assert!(t.own && t.utilisation().is_some(), "{t:?}");
        let s = rows.iter().find(|r| r.method == Method::En1993).unwrap();
        assert!(
            matches!(s.outcome, Outcome::NotApplicable { .. }),
            "steel method on timber: {s:?}"
        );
    }

    #[test]
    fn a_member_no_method_can_work_is_an_error() {
        let mut m = member(steel(), Method::Euler);
        m.section = SectionSpec::Rect(Rect {
            depth_mm: -1.0,
            width_mm: 90.0,
        });
        let e = compare_member(&m).unwrap_err();
        assert_eq!(e.field(), Some("depth_mm"));
    }
}
