//! EN 1995-1-1:2004 (+A1:2008) combined bending and axial compression of
//! solid and glued laminated timber: 6.2.4 (6.19, 6.20), 6.3.2 (6.23,
//! 6.24) and 6.3.3 (6.35).
//!
//! With sigma_c,0,d = N / A, sigma_m,y,d = M_y / W_y and sigma_m,z,d =
//! M_z / W_z (y the major principal axis, the largest moment along the
//! member about each axis, which may be at different points: conservative):
//!
//! - 6.3.2(2): where lambda_rel,y <= 0.3 and lambda_rel,z <= 0.3 only the
//!   cross-section is checked, 6.2.4 (6.19) (sigma_c,0,d / f_c,0,d)^2 +
//!   sigma_m,y,d / f_m,y,d + k_m sigma_m,z,d / f_m,z,d <= 1 and (6.20) with
//!   k_m on the first moment term instead;
//! - 6.3.2(3): in all other cases (6.23) sigma_c,0,d / (k_c,y f_c,0,d) +
//!   sigma_m,y,d / f_m,y,d + k_m sigma_m,z,d / f_m,z,d <= 1 and (6.24) with
//!   k_c,z and k_m on the first moment term. Only one pair is worked: the
//!   other pair can only be larger when the axial term alone is over 1
//!   (then (sigma/f)^2 > sigma/(k_c f) needs sigma/f > 1/k_c >= 1), where
//!   the axial check fails the member already.
//! - 6.1.6(2): k_m = 0.7 for rectangular sections, 1.0 for others.
//! - 6.3.3(6): (6.35) (sigma_m,d / (k_crit f_m,d))^2 + sigma_c,d / (k_c,z
//!   f_c,0,d) <= 1 with a major-axis moment where lateral-torsional
//!   buckling applies (a rectangle bent about its major axis, not held
//!   laterally): worked wherever the bending side computed k_crit, also at
//!   k_crit = 1 (6.3.3(3) asks for the check of M_y with N_c for such a
//!   member, and at k_crit = 1 the squared term still exceeds k_m
//!   sigma_m/f_m above 0.7: the lower resistance). (6.35) has no minor-axis
//!   term; with a minor-axis moment sigma_m,z,d / f_m,z,d is added to it
//!   (conservative; EN 1995-1-1 gives no rule for that case), with a
//!   warning.
//!
//! k_c,y, k_c,z and lambda_rel come from the axial modes (6.3.2, Eqs. 6.21
//! to 6.28), f_c,0,d, k_mod and gamma_M from [`crate::method::en1995`],
//! f_m,d (with k_h) and k_crit from [`crate::bending::en1995`]. The
//! moments are first-order: the deflection's effect is in k_c (6.3.2(3)
//! "stresses which will be increased due to deflection"), whatever
//! `amplify_moments` says; with `amplify_moments: false` the given moments
//! already include it, which k_c then counts again (conservative). The
//! clause numbers are recalled from memory.

use super::{Check, Context};
use crate::bending::en1995::strengths;
use crate::bending::Axis;
use crate::error::Result;
use crate::method::common::{require_timber, warn_once_text};
use crate::method::en1995::design_strength;
use crate::outcome::{Mode, Warning};
use crate::section::SectionSpec;
use crate::trace::{held_symbol, put, step, sym, symbol, Scope, Trace};

const KEY: &str = "en1995-1-1";

/// The parts of the equations, each a ratio of stress to strength.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Terms {
    /// sigma_c,0,d / f_c,0,d.
    pub axial: f64,
    /// sigma_m,y,d / f_m,y,d.
    pub major: f64,
    /// sigma_m,z,d / f_m,z,d.
    pub minor: f64,
    /// k_m (6.1.6(2)).
    pub k_m: f64,
    /// k_c,y and k_c,z (6.3.2).
    pub k_c: (f64, f64),
    /// lambda_rel,y and lambda_rel,z (Eqs. 6.21, 6.22).
    pub lambda_rel: (f64, f64),
    /// k_crit where lateral-torsional buckling applies (6.3.3).
    pub k_crit: Option<f64>,
}

impl Terms {
    /// Whether 6.3.2(2) leaves only the cross-section check (both relative
    /// slendernesses at most 0.3).
    pub fn stocky(&self) -> bool {
        self.lambda_rel.0 <= 0.3 && self.lambda_rel.1 <= 0.3
    }

    /// The equations worked, by name, in order.
    pub fn equations(&self) -> Vec<Check> {
        let mut out = Vec::with_capacity(3);
        let (a, y, z, km) = (self.axial, self.major, self.minor, self.k_m);
        if self.stocky() {
            out.push(Check {
                check: "6.19",
                utilisation: a * a + y + km * z,
            });
            out.push(Check {
                check: "6.20",
                utilisation: a * a + km * y + z,
            });
        } else {
            out.push(Check {
                check: "6.23",
                utilisation: a / self.k_c.0 + y + km * z,
            });
            out.push(Check {
                check: "6.24",
                utilisation: a / self.k_c.1 + km * y + z,
            });
        }
        if let (Some(k), true) = (self.k_crit, y > 0.0) {
            let m = y / k;
            out.push(Check {
                check: "6.35",
                utilisation: m * m + a / self.k_c.1 + z,
            });
        }
        out
    }
}

/// The interaction equations of a timber member with axial load and a
/// moment.
pub fn check(
    ctx: &Context<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    let input = ctx.input;
    let t = require_timber(input, KEY)?;
    let (fc0d, _, _, _) = design_strength(input, t.kind, t.fc0k_mpa);
    let p = &input.section.props;
    let s = Scope::Interaction;
    let sigma_c = input.member.axial_kn * 1000.0 / p.area_mm2;
    // The bending check's f_m,d about each axis (worked there from the
    // same strengths; worked here only if it was not kept).
    let (fmyd, fmzd) = match (
        ctx.bending.major.kept.strength_mpa(),
        ctx.bending.minor.kept.strength_mpa(),
    ) {
        (Some(y), Some(z)) => (y, z),
        _ => {
            let st = strengths(input)?;
            (st.f_md(Axis::Major), st.f_md(Axis::Minor))
        }
    };
    let sigma_my = ctx.bending.major.demand_knm * 1e6 / p.w_el_major_mm3;
    let sigma_mz = ctx.bending.minor.demand_knm * 1e6 / p.w_el_minor_mm3;
    let rect = matches!(input.section.spec, SectionSpec::Rect(_));
    // The governing mode stands in for a missing axis (never the case: both
    // axes are always worked), the lower k_c.
    let (y, z) = (
        ctx.mode(Mode::Major).unwrap_or(ctx.governing),
        ctx.mode(Mode::Minor).unwrap_or(ctx.governing),
    );
    let major_lt = ctx.bending.major.critical_knm.is_some();
    let terms = Terms {
        axial: sigma_c / fc0d,
        major: ratio(sigma_my, fmyd),
        minor: ratio(sigma_mz, fmzd),
        k_m: if rect { 0.7 } else { 1.0 },
        k_c: (y.reduction, z.reduction),
        lambda_rel: (y.relative_slenderness, z.relative_slenderness),
        k_crit: major_lt.then_some(ctx.bending.major.reduction),
    };
    let checks = terms.equations();
    if trace.is_on() {
        step!(
            trace,
            s,
            "sigma_c,0,d",
            "design compressive stress N_Ed / A",
            sigma_c,
            "MPa",
            "EN 1995-1-1 6.2.4"
        );
        step!(
            trace,
            s,
            "f_c,0,d",
            "design compressive strength k_mod f_c,0,k / gamma_M",
            fc0d,
            "MPa",
            "EN 1995-1-1 Eq. 2.14"
        );
        step!(
            trace,
            s,
            "sigma_m,y,d",
            "design bending stress about the major axis M_y,Ed / W_y (largest moment)",
            sigma_my,
            "MPa",
            "EN 1995-1-1 6.1.6"
        );
        step!(
            trace,
            s,
            "f_m,y,d",
            "design bending strength k_mod k_h f_m,k / gamma_M, major axis",
            fmyd,
            "MPa",
            "EN 1995-1-1 2.4.1, 3.2/3.3"
        );
        step!(
            trace,
            s,
            "sigma_m,z,d",
            "design bending stress about the minor axis M_z,Ed / W_z (largest moment)",
            sigma_mz,
            "MPa",
            "EN 1995-1-1 6.1.6"
        );
        step!(
            trace,
            s,
            "f_m,z,d",
            "design bending strength k_mod k_h f_m,k / gamma_M, minor axis",
            fmzd,
            "MPa",
            "EN 1995-1-1 2.4.1, 3.2/3.3"
        );
        if rect {
            step!(
                trace,
                s,
                "k_m",
                "redistribution factor, rectangular section",
                terms.k_m,
                "-",
                "EN 1995-1-1 6.1.6(2)"
            );
        } else {
            step!(
                trace,
                s,
                "k_m",
                "redistribution factor, other sections",
                terms.k_m,
                "-",
                "EN 1995-1-1 6.1.6(2)"
            );
        }
        step!(
            trace,
            s,
            "lambda_rel,y",
            "relative slenderness, major axis",
            terms.lambda_rel.0,
            "-",
            "EN 1995-1-1 Eq. 6.21"
        );
        step!(
            trace,
            s,
            "lambda_rel,z",
            "relative slenderness, minor axis",
            terms.lambda_rel.1,
            "-",
            "EN 1995-1-1 Eq. 6.22"
        );
        step!(
            trace,
            s,
            "k_c,y",
            "instability factor, major axis",
            terms.k_c.0,
            "-",
            "EN 1995-1-1 Eq. 6.25"
        );
        step!(
            trace,
            s,
            "k_c,z",
            "instability factor, minor axis",
            terms.k_c.1,
            "-",
            "EN 1995-1-1 Eq. 6.26"
        );
        if input.member.amplify_moments {
            step!(
                trace,
                s,
                "amplify_moments",
                "moments taken as first-order: the effect of deflection is in k_c of (6.23), \
                 (6.24), no separate amplification",
                1.0,
                "-",
                "EN 1995-1-1 6.3.2(3)"
            );
        } else {
            step!(
                trace,
                s,
                "amplify_moments",
                "moments given with second-order effects: (6.23), (6.24) contain the effect of \
                 deflection in k_c and count it again (conservative)",
                0.0,
                "-",
                "EN 1995-1-1 6.3.2(3)"
            );
        }
        if terms.stocky() {
            step!(
                trace,
                s,
                "lambda_rel <= 0.3",
                "both relative slendernesses at most 0.3: the cross-section check (6.19), (6.20) \
                 alone",
                terms.lambda_rel.0.max(terms.lambda_rel.1),
                "-",
                "EN 1995-1-1 6.3.2(2)"
            );
        } else {
            step!(
                trace,
                s,
                "lambda_rel > 0.3",
                "a relative slenderness over 0.3: (6.23), (6.24) (the cross-section equations \
                 (6.19), (6.20) could only be larger with the axial term alone over 1)",
                terms.lambda_rel.0.max(terms.lambda_rel.1),
                "-",
                "EN 1995-1-1 6.3.2(3)"
            );
        }
        if let Some(k) = terms.k_crit {
            step!(
                trace,
                s,
                "k_crit",
                "reduction for lateral-torsional buckling, major axis",
                k,
                "-",
                "EN 1995-1-1 Eq. 6.34"
            );
        }
    }
    for c in &checks {
        // Symbol, label and clause as literals (no run-time look-up of
        // held texts each check); the symbol is the check's name.
        let eq_6_35 = || match c.check {
            "6.35" => symbol!("6.35", "-"),
            other => held_symbol(other, "-"),
        };
        let (symbol, label, clause) = match c.check {
            "6.19" => (
                symbol!("6.19", "-"),
                sym!("(sigma_c,0,d/f_c,0,d)^2 + sigma_m,y,d/f_m,y,d + k_m sigma_m,z,d/f_m,z,d"),
                sym!("EN 1995-1-1 6.2.4 Eq. 6.19"),
            ),
            "6.20" => (
                symbol!("6.20", "-"),
                sym!("(sigma_c,0,d/f_c,0,d)^2 + k_m sigma_m,y,d/f_m,y,d + sigma_m,z,d/f_m,z,d"),
                sym!("EN 1995-1-1 6.2.4 Eq. 6.20"),
            ),
            "6.23" => (
                symbol!("6.23", "-"),
                sym!("sigma_c,0,d/(k_c,y f_c,0,d) + sigma_m,y,d/f_m,y,d + k_m sigma_m,z,d/f_m,z,d"),
                sym!("EN 1995-1-1 6.3.2 Eq. 6.23"),
            ),
            "6.24" => (
                symbol!("6.24", "-"),
                sym!("sigma_c,0,d/(k_c,z f_c,0,d) + k_m sigma_m,y,d/f_m,y,d + sigma_m,z,d/f_m,z,d"),
                sym!("EN 1995-1-1 6.3.2 Eq. 6.24"),
            ),
            _ if terms.minor > 0.0 => (
                eq_6_35(),
                sym!(
                    "(sigma_m,y,d/(k_crit f_m,y,d))^2 + sigma_c,0,d/(k_c,z f_c,0,d) + \
                     sigma_m,z,d/f_m,z,d (minor-axis term added, conservative)"
                ),
                sym!("EN 1995-1-1 6.3.3 Eq. 6.35"),
            ),
            _ => (
                eq_6_35(),
                sym!("(sigma_m,y,d/(k_crit f_m,y,d))^2 + sigma_c,0,d/(k_c,z f_c,0,d)"),
                sym!("EN 1995-1-1 6.3.3 Eq. 6.35"),
            ),
        };
        put(trace, s, symbol, label, c.utilisation, clause);
    }
    if terms.k_crit.is_some() && terms.major > 0.0 && terms.minor > 0.0 {
        warn_once_text(
            warnings,
            "en1995-6-35-biaxial",
            "EN 1995-1-1 (6.35) has no minor-axis term; with a minor-axis moment the term \
             sigma_m,z,d / f_m,z,d is added to it (conservative, no rule of the code)",
        );
    }
    Ok(Some(checks))
}

/// stress / strength, 0 for no stress.
fn ratio(stress: f64, strength: f64) -> f64 {
    if stress == 0.0 {
        0.0
    } else {
        stress / strength
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn terms(lambda: (f64, f64), k_crit: Option<f64>, major: f64) -> Terms {
        Terms {
            axial: 0.5,
            major,
            minor: 0.2,
            k_m: 0.7,
            k_c: (0.8, 0.4),
            lambda_rel: lambda,
            k_crit,
        }
    }

    fn names(t: &Terms) -> Vec<&'static str> {
        t.equations().iter().map(|c| c.check).collect()
    }

    #[test]
    fn the_pair_follows_6_3_2_2() {
        assert_eq!(names(&terms((0.3, 0.3), None, 0.3)), ["6.19", "6.20"]);
        assert_eq!(names(&terms((0.3, 0.31), None, 0.3)), ["6.23", "6.24"]);
        assert_eq!(names(&terms((0.31, 0.2), None, 0.3)), ["6.23", "6.24"]);
        let e = terms((0.2, 0.2), None, 0.3).equations();
        assert_eq!(e[0].utilisation, 0.25 + 0.3 + 0.7 * 0.2);
        assert_eq!(e[1].utilisation, 0.25 + 0.7 * 0.3 + 0.2);
        let e = terms((1.0, 2.0), None, 0.3).equations();
        assert_eq!(e[0].utilisation, 0.5 / 0.8 + 0.3 + 0.7 * 0.2);
        assert_eq!(e[1].utilisation, 0.5 / 0.4 + 0.7 * 0.3 + 0.2);
    }

    #[test]
    fn lateral_torsional_equation_needs_k_crit_and_a_major_moment() {
        assert_eq!(
            names(&terms((1.0, 2.0), Some(0.5), 0.3)),
            ["6.23", "6.24", "6.35"]
        );
        assert_eq!(names(&terms((1.0, 2.0), Some(0.5), 0.0)), ["6.23", "6.24"]);
        let e = terms((1.0, 2.0), Some(0.5), 0.3).equations();
        assert_eq!(e[2].utilisation, 0.6 * 0.6 + 0.5 / 0.4 + 0.2);
    }
}
