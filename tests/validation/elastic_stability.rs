//! Reference: S. P. Timoshenko and J. M. Gere, Theory of Elastic
//! Stability, 2nd ed., McGraw-Hill, New York, 1961 (reissued by Dover,
//! 2009), chapter 2, "Elastic buckling of bars and frames". The section
//! numbers below are recalled from memory; the values and equations are
//! the classical closed forms, each re-derived in its test's comment.
//!
//! Every case is run through the finite-element analysis of
//! `strutline_core::buckling::column` (mesh refined until alpha_cr changes
//! by at most 1e-6) and compared with the closed form, or with the root
//! of the book's transcendental equation found here by plain bisection,
//! independently of the engine.
//!
//! Units: lengths mm, E I in N mm2, forces kN.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::f64::consts::PI;

use strutline_core::buckling::column::{analyse, Brace, Buckle, Column, Part};
use strutline_core::buckling::{Axis, Fixity, Support};
use strutline_validation::assert_close;

/// The analysis converges to 1e-6 between meshes and the Hermite element
/// converges as h^4, so its error is below the change; 2e-6 covers both.
const FE: f64 = 2e-6;

/// E I of the test column, N mm2 (a 200 x 200 x 15 x 9 I section's
/// minor axis at E = 210 000 MPa is about this).
const EI: f64 = 4.2e12;
/// Its length, mm.
const L: f64 = 5000.0;

/// E I / L^2, kN.
fn unit() -> f64 {
    EI / (L * L) / 1000.0
}

fn column(a: Support, b: Support) -> Column {
    Column::uniform(Axis::Minor, L, EI, a, b, 100.0)
}

/// The critical force of the pattern over E I / L^2.
fn factor(b: &Buckle) -> f64 {
    b.critical_kn / unit()
}

/// A root of f on [lo, hi] by bisection (f changes sign), independent of
/// the engine's solvers.
fn bisect(f: impl Fn(f64) -> f64, mut lo: f64, mut hi: f64) -> f64 {
    let f_lo = f(lo);
    assert!(f_lo * f(hi) <= 0.0, "no sign change on [{lo}, {hi}]");
    for _ in 0..200 {
        let mid = 0.5 * (lo + hi);
        if (f(mid) < 0.0) == (f_lo < 0.0) {
            lo = mid;
        } else {
            hi = mid;
        }
    }
    0.5 * (lo + hi)
}

/// Section 2.2 (recalled), the four Euler cases: pin-ended pi^2 EI/L^2;
/// fixed base, free top pi^2 EI/(4 L^2); both ends fixed 4 pi^2 EI/L^2;
/// and, with the top free to sway but held against turning, pi^2 EI/L^2.
#[test]
fn the_four_euler_cases() {
    let cases = [
        (Support::PINNED, Support::PINNED, PI * PI, "pinned-pinned"),
        (Support::FIXED, Support::FREE, PI * PI / 4.0, "fixed-free"),
        (Support::FIXED, Support::FIXED, 4.0 * PI * PI, "fixed-fixed"),
        (Support::FIXED, Support::SLIDING, PI * PI, "fixed-sliding"),
    ];
    for (a, b, expected, name) in cases {
        let r = analyse(&column(a, b)).unwrap();
        assert_close(factor(&r), expected, FE, name);
        // The buckling length of each case: L, 2L, L/2, L.
        let k = (expected / (PI * PI)).sqrt().recip();
        assert_close(r.buckling_length_mm, k * L, FE, name);
        assert_close(
            r.load_factor * 100.0,
            r.critical_kn,
            1e-12,
            "N_cr = alpha 100 kN",
        );
    }
}

/// Section 2.2 (recalled): fixed at one end, pinned at the other, the
/// smallest root of tan(kL) = kL, kL = 4.4934, so P_cr = 20.19 EI/L^2
/// (2.046 pi^2). Tolerance: half a unit in the last printed digit.
#[test]
fn fixed_pinned_20_19() {
    let r = analyse(&column(Support::FIXED, Support::PINNED)).unwrap();
    assert_close(
        factor(&r),
        20.19,
        0.005 / 20.19,
        "fixed-pinned, 20.19 EI/L^2",
    );
    let root = bisect(|x| x.tan() - x, 4.0, 4.6);
    assert_close(factor(&r), root * root, FE, "fixed-pinned, tan kL = kL");
    assert_close(
        r.buckling_length_mm,
        0.6992 * L,
        0.00005 / 0.6992,
        "k = 0.6992",
    );
}

/// Section 2.10 (recalled), a vertical bar fixed at the bottom and free
/// at the top buckling under its own weight q per unit length:
/// (q L)_cr = 7.837 EI/L^2 (Greenhill's problem; the root of a Bessel
/// function J_{-1/3}). Tolerance: half a unit in the last printed digit.
#[test]
fn cantilever_under_its_own_weight_7_837() {
    let mut c = column(Support::FIXED, Support::FREE);
    c.loads.clear();
    c.distributed_kn_per_m = 2.0; // kN/m = N/mm
    let r = analyse(&c).unwrap();
    // The largest compression is q L at the base.
    let ql_kn = 2.0 * L / 1000.0;
    assert_close(r.segments[0].axial_kn, ql_kn, 1e-12, "q L at end A");
    assert_close(factor(&r), 7.837, 0.0005 / 7.837, "(qL)_cr = 7.837 EI/L^2");
    // The mode bends the most at the free top.
    assert_close(r.mode.last().unwrap()[1], 1.0, 1e-12, "top deflection 1");
}

/// Section 2.7 (recalled), a pin-ended bar with an elastic support of
/// stiffness k at mid-length. In the symmetric mode the half bar gives
/// k = 16 EI u^3 / (L^3 (u - tan u)) with u = (L/2) sqrt(P/EI) in
/// (pi/2, pi] (derived here: EI w'' + P w = R x, R = k w_mid / 2, w'(L/2)
/// = 0); at u = pi it reaches k = 16 pi^2 EI/L^3, above which the bar
/// buckles in two half-waves at 4 pi^2 EI/L^2 as if rigidly braced.
#[test]
fn pinned_column_with_a_spring_at_mid_height() {
    let threshold = 16.0 * PI * PI * EI / (L * L * L); // N/mm
    let braced = |k_n_per_mm: f64| {
        let mut c = column(Support::PINNED, Support::PINNED);
        c.braces.push(Brace {
            index: 0,
            at_mm: L / 2.0,
            translation: Fixity::Spring(k_n_per_mm / 1000.0),
        });
        factor(&analyse(&c).unwrap())
    };
    for ratio in [1.0, 1.01, 2.0, 100.0] {
        assert_close(
            braced(ratio * threshold),
            4.0 * PI * PI,
            FE,
            "at or above 16 pi^2 EI/L^3: 4 pi^2 EI/L^2",
        );
    }
    for ratio in [0.1, 0.5, 0.9, 0.99] {
        let k = ratio * threshold;
        let u = bisect(
            |u| 16.0 * EI * u.powi(3) - k * L.powi(3) * (u - u.tan()),
            PI / 2.0 + 1e-9,
            PI,
        );
        let expected = 4.0 * u * u;
        let got = braced(k);
        assert_close(got, expected, FE, "below the threshold: symmetric mode");
        assert!(got < 4.0 * PI * PI && got > PI * PI);
    }
    // A rigid brace is the limit.
    let mut c = column(Support::PINNED, Support::PINNED);
    c.braces.push(Brace {
        index: 0,
        at_mm: L / 2.0,
        translation: Fixity::Fixed,
    });
    assert_close(
        factor(&analyse(&c).unwrap()),
        4.0 * PI * PI,
        FE,
        "rigid brace",
    );
}

/// Section 2.4 (recalled), a bar held sideways at both ends with equal
/// rotational springs k_r: in the symmetric mode w = A (cos(mu s) -
/// cos(mu L/2)) and EI w'' = -k_r w' at the ends give tan u = -2u/R with
/// u = mu L/2 and R = k_r L/(EI), so P = 4 u^2 EI/L^2 (R = 0: pinned,
/// R -> infinity: fixed). And a bar fixed sideways at its base with a
/// rotational spring there, free at the top: x tan x = R with x = L
/// sqrt(P/EI).
#[test]
fn rotational_end_springs() {
    for r in [0.5, 2.0, 10.0, 100.0] {
        let k_r = r * EI / L / 1e6; // kN m/rad
        let spring = Support {
            translation: Fixity::Fixed,
            rotation: Fixity::Spring(k_r),
        };
        let u = bisect(|u| u.tan() + 2.0 * u / r, PI / 2.0 + 1e-9, PI - 1e-12);
        let got = factor(&analyse(&column(spring, spring)).unwrap());
        assert_close(got, 4.0 * u * u, FE, "braced, equal end springs");
        let base = Support {
            translation: Fixity::Fixed,
            rotation: Fixity::Spring(k_r),
        };
        let x = bisect(|x| x * x.tan() - r, 1e-9, PI / 2.0 - 1e-12);
        let got = factor(&analyse(&column(base, Support::FREE)).unwrap());
        assert_close(got, x * x, FE, "flagpole on a base spring");
    }
    // R = 2: tan u = -u, u = 2.0288 (the root printed in tables of
    // tan x = -x), P = 16.46 EI/L^2.
    let k_r = 2.0 * EI / L / 1e6;
    let s = Support {
        translation: Fixity::Fixed,
        rotation: Fixity::Spring(k_r),
    };
    assert_close(
        factor(&analyse(&column(s, s)).unwrap()),
        4.0 * 2.028_757_838_110_434_f64.powi(2),
        FE,
        "tan u = -u",
    );
}

/// Section 2.9 (recalled), a stepped bar fixed at the base and free at
/// the top, lower part l2 with I2, upper part l1 with I1, a load P at the
/// top: tan(k1 l1) tan(k2 l2) = k1/k2 with k_i = sqrt(P / (E I_i))
/// (derived here: w = d (1 - cos k2 x) below, w = d + C sin k1 (L - x)
/// above, slope and deflection continuous at the step). The book tabulates
/// m in P_cr = m E I2 / L^2 for several I1/I2 and l2/L; those figures are
/// not recalled reliably, so the equation is solved here instead.
#[test]
fn stepped_cantilever() {
    for (i_ratio, lower) in [(0.25, 0.5), (0.1, 0.6), (0.5, 0.3), (0.01, 0.8)] {
        let (l2, l1) = (lower * L, (1.0 - lower) * L);
        let (ei2, ei1) = (EI, i_ratio * EI);
        let mut c = column(Support::FIXED, Support::FREE);
        c.parts = vec![
            Part {
                length_mm: l2,
                ei_nmm2: ei2,
            },
            Part {
                length_mm: l1,
                ei_nmm2: ei1,
            },
        ];
        // In P (N): tan(k1 l1) tan(k2 l2) - k1/k2, from 0 up to the
        // first pole of either tangent.
        let eq = |p: f64| {
            let (k1, k2) = ((p / ei1).sqrt(), (p / ei2).sqrt());
            (k1 * l1).tan() * (k2 * l2).tan() - k1 / k2
        };
        let pole = (PI / 2.0 / l1).powi(2) * ei1;
        let pole = pole.min((PI / 2.0 / l2).powi(2) * ei2);
        let p = bisect(eq, 1e-6 * pole, pole * (1.0 - 1e-12));
        let r = analyse(&c).unwrap();
        assert_close(r.critical_kn, p / 1000.0, FE, "stepped cantilever");
        // Each segment carries the top load and has its own buckling length.
        let lower_len = r.segments[0].buckling_length_mm.unwrap();
        assert_close(lower_len, PI * (ei2 / p).sqrt(), FE, "lower segment L_cr");
        let upper_len = r.segments[1].buckling_length_mm.unwrap();
        assert_close(upper_len, PI * (ei1 / p).sqrt(), FE, "upper segment L_cr");
    }
}
