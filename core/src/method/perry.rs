//! Perry-Robertson: a pin-ended strut with an initial sinusoidal bow of
//! amplitude e0 fails when the extreme fibre first yields.
//!
//! With sigma_E = pi^2 E / (L_cr / i)^2 and the imperfection parameter
//! eta = e0 c / i^2 (c the distance from the axis to the extreme fibre),
//! the mean failure stress sigma is the smaller root of
//! (f_y - sigma)(sigma_E - sigma) = eta sigma sigma_E (Perry 1886,
//! Robertson 1925; closed form in any text on the stability of
//! structures). The bow defaults to L_cr / 200, EN 1993-1-1 Table 5.1's
//! curve c bow ([`euler::DEFAULT_IMPERFECTION_DIVISOR`]; the trace and a
//! warning say so); the resistance is sigma A / gamma with the optional
//! factor gamma_m1, a first-principles estimate (the result says so).

use crate::error::Result;
use crate::method::euler::{basics, extreme_fibre_mm, push_geometry};
use crate::method::{euler, Input};
use crate::outcome::{Mode, ModeResult, Warning};
use crate::trace::{step, sym, Trace};

/// The smaller root of (f - s)(s_e - s) = eta s s_e, MPa, computed without
/// cancellation as 2 f s_e / (B + sqrt(B^2 - 4 f s_e)), B = f + (1 + eta) s_e.
pub fn failure_stress(f: f64, sigma_e: f64, eta: f64) -> f64 {
    let b = f + (1.0 + eta) * sigma_e;
    let disc = (b * b - 4.0 * f * sigma_e).max(0.0);
    let s = 2.0 * f * sigma_e / (b + disc.sqrt());
    if s.is_finite() {
        s.min(f).min(sigma_e)
    } else {
        0.0
    }
}

/// Member-level working.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    euler::warn_first_principles(crate::member::Method::PerryRobertson, input, warnings);
    euler::shared_prelude(input, trace, warnings)
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    let b = basics(input, mode, lcr_mm)?;
    let gamma = input.member.gamma_m1.unwrap_or(1.0);
    push_geometry(trace, &b, sym!("L_cr / i"));
    let e0 = match input.member.bow_mm {
        Some(e) => {
            step!(
                trace,
                b.scope,
                "e_0",
                "initial bow amplitude (given)",
                e,
                "mm",
                "input bow_mm",
            );
            e
        }
        None => {
            let e = b.lcr_mm / euler::DEFAULT_IMPERFECTION_DIVISOR;
            step!(
                trace,
                b.scope,
                "e_0",
                "initial bow, none given: L_cr / 200 (EN 1993-1-1 Table 5.1, curve c)",
                e,
                "mm",
                "default L_cr / 200",
            );
            e
        }
    };
    let c = extreme_fibre_mm(input, mode, warnings);
    let eta = e0 * c / (b.r_mm * b.r_mm);
    let s = failure_stress(b.f_mpa, b.sigma_e_mpa, eta);
    let n_fail = s * b.a_mm2 / 1000.0;
    let resistance = n_fail / gamma;
    step!(
        trace,
        b.scope,
        "c",
        "distance to the extreme fibre",
        c,
        "mm",
        "I / W_el",
    );
    step!(
        trace,
        b.scope,
        "eta",
        "imperfection parameter e_0 c / i^2",
        eta,
        "-",
        "Perry-Robertson",
    );
    step!(
        trace,
        b.scope,
        "sigma_E",
        "Euler stress pi^2 E / (L_cr/i)^2",
        b.sigma_e_mpa,
        "MPa",
        "Euler",
    );
    step!(
        trace,
        b.scope,
        "sigma_f",
        "failure stress, smaller root of (f - s)(s_E - s) = eta s s_E",
        s,
        "MPa",
        "Perry-Robertson",
    );
    step!(
        trace,
        b.scope,
        "N_R",
        "resistance sigma_f A / gamma",
        resistance,
        "kN",
        "Perry-Robertson",
    );
    Ok(b.stress_mode(mode, s, resistance))
}

#[cfg(test)]
mod tests {

    use super::*;

    #[test]
    fn root_satisfies_the_quadratic() {
        for &(f, se, eta) in &[
            (355.0, 200.0, 0.3),
            (235.0, 2000.0, 0.05),
            (355.0, 10.0, 2.0),
        ] {
            let s: f64 = failure_stress(f, se, eta);
            let lhs = (f - s) * (se - s);
            let rhs = eta * s * se;
            assert!((lhs - rhs).abs() < 1e-9 * f * se, "{f} {se} {eta}");
            assert!(s > 0.0 && s <= f.min(se));
        }
    }

    #[test]
    fn zero_bow_is_the_envelope() {
        assert_eq!(failure_stress(355.0, 200.0, 0.0), 200.0);
        assert_eq!(failure_stress(355.0, 2000.0, 0.0), 355.0);
    }
}
