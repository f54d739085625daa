//! The secant formula: a pin-ended strut loaded at eccentricity e at both
//! ends reaches first yield at the extreme fibre when
//! sigma (1 + (e c / i^2) sec((L_cr / (2 i)) sqrt(sigma / E))) = f_y
//! (Young 1807; closed form in any text on the strength of materials).
//!
//! sigma is found by the root finder ([`crate::roots`]) on (0, min(f_y, sigma_E)): the left side
//! rises monotonically from 0 and is unbounded as sigma -> sigma_E, so the
//! root is bracketed and unique. The eccentricity defaults to L_cr / 200,
//! EN 1993-1-1 Table 5.1's curve c bow
//! ([`euler::DEFAULT_IMPERFECTION_DIVISOR`]; the trace and a warning say
//! so); the resistance is sigma A / gamma with the optional factor
//! gamma_m1, a first-principles estimate (the result says so).
//!
//! Equal end moments about one principal axis (M_a = M_b, no span moment,
//! nothing about the other axis) are the load's eccentricity e_M = |M| / N
//! about that axis ([`moment_eccentricity`]): the first-principles view of
//! a load that is not on the centroid. It is added to the eccentricity of
//! that axis (`eccentricity_mm`, or L_cr / 200), which the formula takes
//! about each axis in turn; the other axis keeps its own. Taking the two in
//! the same direction is the lower resistance (the direction of
//! `eccentricity_mm` is not given). Any other moment diagram, or a moment
//! without axial load, is refused naming the key.

use std::f64::consts::FRAC_PI_2;

use crate::error::{all_positive, Error, Result};
use crate::member::Member;
use crate::method::euler::{basics, extreme_fibre_mm, push_geometry};
use crate::method::{euler, Input};
use crate::outcome::{Mode, ModeResult, Warning};
use crate::roots::{newton_bisect, Stop};
use crate::trace::{step, sym, Trace};

/// The mean stress at first yield, MPa, for strength `f`, modulus `e`,
/// slenderness `lambda` = L_cr / i and eccentricity ratio `ecc` = e c / i^2.
pub fn first_yield_stress(f: f64, e: f64, lambda: f64, ecc: f64) -> f64 {
    solve(f, e, lambda, ecc).0
}

/// The start of the first-yield iteration: the root of the secant condition
/// with sec theta replaced by (1 + psi p) / (1 - p), p = s / sigma_E.
/// Multiplied through by (1 - p): a s^2 - b s + f = 0 with a = (1 - ecc
/// psi) / sigma_E and b = 1 + ecc + f / sigma_E, whose smaller root is taken
/// in the form without cancellation (b^2 - 4 a f >= (1 - f / sigma_E)^2 for
/// psi >= 0).
fn approximate_root(f: f64, sigma_e: f64, ecc: f64, psi: f64) -> f64 {
    let a = (1.0 - ecc * psi) / sigma_e;
    let b = 1.0 + ecc + f / sigma_e;
    2.0 * f / (b + (b * b - 4.0 * a * f).max(0.0).sqrt())
}

/// [`first_yield_stress`] and the number of evaluations of the condition.
fn solve(f: f64, e: f64, lambda: f64, ecc: f64) -> (f64, u32) {
    let mut calls = 0;
    let sigma_e = std::f64::consts::PI.powi(2) * e / (lambda * lambda);
    // The secant condition s (1 + ecc sec theta) = f multiplied through by
    // cos theta, h(s) = s (cos theta + ecc) - f cos theta, has the same root
    // on (0, sigma_E) and stays finite up to sigma_E (theta = pi/2), so a
    // bracketing solver can use it: h(0) = -f < 0, and h > 0 above the root.
    // With t = sin(theta) dtheta/ds, dtheta/ds = theta / (2 s) below pi/2
    // (0 where theta is held at pi/2):
    //   h'  = c + ecc + (f - s) t
    //   h'' = -2 t + (f - s) (c (dtheta/ds)^2 - t / (2 s))
    // and as s -> 0, t tends to lambda^2 / (8 E). The solver takes Halley's
    // step h / (h' - h h'' / (2 h')) (cubic convergence: at most three
    // evaluations from the start below over the test grid, 2.7 on average,
    // where Newton's steps from the bracket's middle took 6.4), by
    // handing it the corrected slope; where that is not a positive number
    // the plain slope h' stands, so each step is Newton's or Halley's and
    // the bracket keeps it safe either way.
    let mut h = |s: f64| -> (f64, f64) {
        calls += 1;
        let s = s.max(0.0);
        let raw = 0.5 * lambda * (s / e).sqrt();
        let theta = raw.min(FRAC_PI_2);
        let (sin, c) = crate::trig::sin_cos(theta);
        let value = s * (c + ecc) - f * c;
        if raw >= FRAC_PI_2 {
            return (value, c + ecc);
        }
        if s <= 0.0 {
            return (value, c + ecc + f * lambda * lambda / (8.0 * e));
        }
        let dtheta = theta / (2.0 * s);
        let t = sin * dtheta;
        let slope = c + ecc + (f - s) * t;
        let curve = -2.0 * t + (f - s) * (c * dtheta * dtheta - t / (2.0 * s));
        let halley = slope - value * curve / (2.0 * slope);
        (
            value,
            if all_positive([halley]) {
                halley
            } else {
                slope
            },
        )
    };
    let hi0 = f.min(sigma_e);
    if !all_positive([hi0]) {
        return (0.0, 0);
    }
    // The root is hi0 itself where h(hi0) <= 0. As cos theta is 0 at
    // sigma_E (to rounding: cos of the f64 nearest pi/2 is 6.1e-17),
    // h(hi0) = hi0 ecc - cos(theta) (f - hi0) is positive whenever hi0 ecc
    // exceeds 1e-15 f, without evaluating it; only a load (nearly) on the
    // centroid is evaluated there.
    if hi0 * ecc <= 1e-15 * f && h(hi0).0 <= 0.0 {
        return (hi0, calls);
    }
    // Started from the root with sec theta replaced by (1 + psi p) / (1 -
    // p), psi = pi^2 / 8 - 1, exact to the first power of p: the series of
    // sec(pi/2 sqrt p) in p has every coefficient between 1 and 4 / pi, so
    // psi = 0 (Perry-Robertson's amplification 1 / (1 - p)) and psi = 4 / pi
    // - 1 bound the root from above and below, and this start lies between.
    let start = approximate_root(f, sigma_e, ecc, START_PSI);
    // h(0) = -f < 0 < h(hi0), and h rises on the bracket (s <= f there).
    let root = newton_bisect(
        &mut h,
        0.0,
        hi0,
        start,
        Stop {
            f: 1e-14 * f,
            step: 1e-15 * hi0,
            bracket: 1e-13,
        },
    );
    (root, calls)
}

/// psi of the start of the first-yield iteration ([`approximate_root`]):
/// pi^2 / 8 - 1, the first-order term of sec(pi/2 sqrt p) less Perry's.
const START_PSI: f64 = std::f64::consts::PI * std::f64::consts::PI / 8.0 - 1.0;

/// The eccentricity that the member's moments give its axial load: `None`
/// without moments, else the axis ([`Mode::Major`] or [`Mode::Minor`]) and
/// e_M = |M| / N, mm, for equal end moments about that axis alone. Any
/// other diagram, moments about both axes and a moment without axial load
/// are refused (`NotApplicable`) naming the key.
pub fn moment_eccentricity(member: &Member) -> Result<Option<(Mode, f64)>> {
    let Some(first) = member.first_moment_key() else {
        return Ok(None);
    };
    let refuse = |key: &str, why: &str| Error::NotApplicable {
        method: "secant",
        reason: format!(
            "{key}: {why}; the secant method takes only equal end moments about one axis \
             (m_AX_a_knm = m_AX_b_knm, no span moment, the other axis 0) as the load's \
             eccentricity e = M / N; use a design code (en1993-1-1, aisc360-lrfd, aisc360-asd, \
             csa-s16, en1995-1-1) for other moments"
        ),
    };
    if member.axial_kn == 0.0 {
        return Err(refuse(
            first,
            "a moment without axial load has no eccentricity to become (axial_kn is 0)",
        ));
    }
    let (major, minor) = (member.moments_major(), member.moments_minor());
    let (mode, m, keys) = match (major.is_zero(), minor.is_zero()) {
        (false, false) => {
            let key = [
                ("m_minor_a_knm", minor.a_knm),
                ("m_minor_b_knm", minor.b_knm),
                ("m_minor_span_knm", minor.span_knm),
            ]
            .into_iter()
            .find(|(_, v)| *v != 0.0)
            .map_or("m_minor_a_knm", |(k, _)| k);
            return Err(refuse(key, "moments about both axes"));
        }
        (false, true) => (
            Mode::Major,
            major,
            ["m_major_a_knm", "m_major_b_knm", "m_major_span_knm"],
        ),
        _ => (
            Mode::Minor,
            minor,
            ["m_minor_a_knm", "m_minor_b_knm", "m_minor_span_knm"],
        ),
    };
    let [key_a, key_b, key_span] = keys;
    if m.span_knm != 0.0 {
        return Err(refuse(key_span, "a moment from load in the span"));
    }
    if m.a_knm != m.b_knm {
        let key = if m.b_knm == 0.0 { key_b } else { key_a };
        return Err(refuse(key, "end moments that are not equal"));
    }
    Ok(Some((mode, m.a_knm.abs() * 1000.0 / member.axial_kn)))
}

/// Member-level working; refuses moments the method does not take.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    moment_eccentricity(input.member)?;
    euler::warn_first_principles(crate::member::Method::Secant, input, warnings);
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
    let ecc_mm = match input.member.eccentricity_mm {
        Some(e) => {
            step!(
                trace,
                b.scope,
                "e",
                "load eccentricity (given)",
                e,
                "mm",
                "input eccentricity_mm",
            );
            e
        }
        None => {
            let e = b.lcr_mm / euler::DEFAULT_IMPERFECTION_DIVISOR;
            step!(
                trace,
                b.scope,
                "e",
                "load eccentricity, none given: L_cr / 200 (EN 1993-1-1 Table 5.1, curve c)",
                e,
                "mm",
                "default L_cr / 200",
            );
            e
        }
    };
    let ecc_mm = match moment_eccentricity(input.member)? {
        Some((axis, e_m)) if axis == mode => {
            step!(
                trace,
                b.scope,
                "e_M",
                "eccentricity of the load from equal end moments |M| / N",
                e_m,
                "mm",
                "secant: M = N e",
            );
            let e = ecc_mm + e_m;
            step!(
                trace,
                b.scope,
                "e",
                "eccentricity about this axis e + e_M (taken in the same direction, the lower \
                 resistance)",
                e,
                "mm",
                "secant: M = N e",
            );
            e
        }
        _ => ecc_mm,
    };
    let c = extreme_fibre_mm(input, mode, warnings);
    let ratio = ecc_mm * c / (b.r_mm * b.r_mm);
    let s = first_yield_stress(b.f_mpa, b.e_mpa, b.slenderness, ratio);
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
        "e c/i^2",
        "eccentricity ratio",
        ratio,
        "-",
        "secant formula",
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
        "sigma_y1",
        "mean stress at first yield, s (1 + e c/i^2 sec(L_cr/(2i) sqrt(s/E))) = f",
        s,
        "MPa",
        "secant formula",
    );
    step!(
        trace,
        b.scope,
        "N_R",
        "first-yield load sigma_y1 A / gamma",
        resistance,
        "kN",
        "secant formula",
    );
    Ok(b.stress_mode(mode, s, resistance))
}

#[cfg(test)]
mod tests {
    // The standard cosine is the reference here.
    #![allow(clippy::disallowed_methods)]

    use super::*;

    /// Plain bisection of the secant condition itself, as the reference.
    fn bisected(f: f64, e: f64, lambda: f64, ecc: f64) -> f64 {
        let sigma_e = std::f64::consts::PI.powi(2) * e / (lambda * lambda);
        let g = |s: f64| {
            let theta = 0.5 * lambda * (s / e).sqrt();
            if theta >= FRAC_PI_2 {
                f64::INFINITY
            } else {
                s * (1.0 + ecc / theta.cos()) - f
            }
        };
        let (mut lo, mut hi) = (0.0, f.min(sigma_e));
        if g(hi) <= 0.0 {
            return hi;
        }
        for _ in 0..300 {
            let mid = 0.5 * (lo + hi);
            if g(mid) <= 0.0 {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        0.5 * (lo + hi)
    }

    #[test]
    fn the_fast_solver_agrees_with_bisection_everywhere() {
        for f in [235.0, 355.0, 690.0] {
            for k in 1..=60 {
                let lambda = 5.0 * f64::from(k);
                for ecc in [0.0, 1e-4, 0.01, 0.1, 0.3, 1.0, 3.0, 10.0] {
                    let a = first_yield_stress(f, 210_000.0, lambda, ecc);
                    let b = bisected(f, 210_000.0, lambda, ecc);
                    assert!(
                        (a - b).abs() <= 1e-9 * b.max(1e-9),
                        "f={f} lambda={lambda} ecc={ecc}: {a} vs {b}"
                    );
                }
            }
        }
    }

    /// The start lies between the two closed-form bounds of the root (psi =
    /// 4/pi - 1 below, Perry-Robertson's psi = 0 above), the root too, and
    /// Halley's steps from it reach the tolerance in at most three
    /// evaluations of the condition, fewer than three on average over the
    /// grid.
    #[test]
    fn the_start_is_bracketed_and_the_iteration_short() {
        let mut most = 0;
        let (mut total, mut roots) = (0, 0);
        for f in [235.0, 355.0, 690.0] {
            let e = 210_000.0;
            for k in 1..=60 {
                let lambda = 5.0 * f64::from(k);
                let sigma_e = std::f64::consts::PI.powi(2) * e / (lambda * lambda);
                for ecc in [1e-4, 0.01, 0.1, 0.3, 1.0, 3.0, 10.0] {
                    let (s, calls) = solve(f, e, lambda, ecc);
                    let below = approximate_root(f, sigma_e, ecc, 4.0 / std::f64::consts::PI - 1.0);
                    let above = approximate_root(f, sigma_e, ecc, 0.0);
                    let start = approximate_root(f, sigma_e, ecc, START_PSI);
                    let slack = 1e-12 * s;
                    assert!(below <= start && start <= above, "{f} {lambda} {ecc}");
                    assert!(
                        below - slack <= s && s <= above + slack,
                        "f={f} lambda={lambda} ecc={ecc}: {below} <= {s} <= {above}"
                    );
                    most = most.max(calls);
                    total += calls;
                    roots += 1;
                }
            }
        }
        assert!(most <= 3, "{most} evaluations");
        assert!(
            f64::from(total) / f64::from(roots) < 3.0,
            "{total} over {roots}"
        );
    }

    #[test]
    fn root_satisfies_the_formula() {
        let (f, e) = (355.0, 210_000.0);
        for &(lambda, ecc) in &[(20.0, 0.1), (100.0, 0.3), (250.0, 1.0), (60.0, 3.0)] {
            let s: f64 = first_yield_stress(f, e, lambda, ecc);
            let back = s * (1.0 + ecc / (0.5 * lambda * (s / e).sqrt()).cos());
            assert!((back - f).abs() < 1e-8 * f, "{lambda} {ecc}: {back}");
        }
    }

    fn moments(json: serde_json::Value) -> Result<Option<(Mode, f64)>> {
        let mut base = serde_json::json!({
            "id": "S1", "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
            "material": {"grade": "S355"}, "length_mm": 2000, "axial_kn": 200,
            "method": "secant"
        });
        for (k, v) in json.as_object().unwrap() {
            base[k] = v.clone();
        }
        moment_eccentricity(&crate::file::member_from_value(&base, 0).unwrap())
    }

    fn refused_key(json: serde_json::Value) -> String {
        match moments(json) {
            Err(Error::NotApplicable { reason, .. }) => reason,
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn equal_end_moments_are_the_eccentricity_and_others_are_refused() {
        use serde_json::json;
        assert_eq!(moments(json!({})).unwrap(), None);
        assert_eq!(
            moments(json!({"m_major_a_knm": -3, "m_major_b_knm": -3})).unwrap(),
            Some((Mode::Major, 15.0))
        );
        assert_eq!(
            moments(json!({"m_minor_a_knm": 1, "m_minor_b_knm": 1})).unwrap(),
            Some((Mode::Minor, 5.0))
        );
        assert!(refused_key(json!({"m_major_a_knm": 3})).starts_with("m_major_b_knm"));
        assert!(refused_key(json!({"m_major_b_knm": 3})).starts_with("m_major_a_knm"));
        assert!(refused_key(json!({"m_minor_span_knm": 3})).starts_with("m_minor_span_knm"));
        assert!(refused_key(
            json!({"m_major_a_knm": 1, "m_major_b_knm": 1, "m_minor_span_knm": 2})
        )
        .starts_with("m_minor_span_knm"));
        assert!(
            refused_key(json!({"m_major_a_knm": 1, "m_major_b_knm": 1, "axial_kn": 0}))
                .starts_with("m_major_a_knm")
        );
    }

    #[test]
    fn zero_eccentricity_is_the_envelope() {
        let (f, e) = (355.0, 210_000.0);
        assert_eq!(first_yield_stress(f, e, 30.0, 0.0), f);
        let se = std::f64::consts::PI.powi(2) * e / 200f64.powi(2);
        assert!((first_yield_stress(f, e, 200.0, 0.0) - se).abs() < 1e-9 * se);
    }
}
