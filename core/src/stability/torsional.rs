//! Elastic critical loads of a pin-ended compression member for flexural,
//! torsional and flexural-torsional buckling (thin-walled open sections,
//! Vlasov theory with the shear centre as the axis of twist).
//!
//! With `a` and `b` the principal axes through the centroid, `a0` and `b0`
//! the shear-centre coordinates measured along them, and
//! `i0^2 = i_a^2 + i_b^2 + a0^2 + b0^2` the polar radius of gyration about
//! the shear centre:
//!
//! - flexural: `N_a = pi^2 E I_a / L_a^2`, `N_b = pi^2 E I_b / L_b^2`;
//! - torsional: `N_T = (G I_t + pi^2 E I_w / L_T^2) / i0^2`
//!   (EN 1993-1-3 6.2.3(5), AISC 360-16 Eq. E4-7 for F_ez in load form;
//!   E4-9 was its number in the 2010 edition; recalled from memory);
//! - flexural-torsional, the smallest root of
//!   `f(N) = (N - N_a)(N - N_b)(N - N_T) - N^2 (N - N_b) a0^2/i0^2 - N^2 (N - N_a) b0^2/i0^2`
//!   (AISC 360-16 Eq. E4-4 multiplied by A^3). An offset along an axis
//!   couples twist with bending about that same axis: twisting about a
//!   shear centre on the `a` axis moves the centroid across `a`.
//!
//! With one offset zero the cubic factors into the uncoupled flexural load
//! and the quadratic of EN 1993-1-3 6.2.3(7) / AISC Eq. E4-3, which is
//! solved in closed form ([`flexural_torsional_single`]). The general case
//! is solved by a bracketed Newton-bisection ([`flexural_torsional_general`]).
//!
//! Why the bracket `(0, N_min]` with `N_min = min(N_a, N_b, N_T)` holds and
//! holds only the smallest root: the three roots are the eigenvalues of the
//! pencil `K - N G` with `K = diag(N_a, N_b, i0^2 N_T)` and
//! `G = [[1, 0, -b0], [0, 1, a0], [-b0, a0, i0^2]]` (displacements u_a, u_b
//! and twist), both symmetric positive definite (`det G = i0^2 - a0^2 - b0^2 > 0`).
//! The smallest eigenvalue is at most the Rayleigh quotient of each unit
//! vector, i.e. at most `N_a`, `N_b` and `N_T`; by Cauchy interlacing on the
//! two flexural coordinates the second eigenvalue is at least
//! `min(N_a, N_b) >= N_min`. Directly: `f(0) = -N_a N_b N_T < 0` and
//! `f(N_min) >= 0` (e.g. `f(N_a) = N_a^2 (N_b - N_a) a0^2 / i0^2`), so
//! exactly one sign change lies in `(0, N_min]`, at the smallest root.

use crate::method::common::euler_n;
use crate::roots::{newton_bisect, Stop};
use std::f64::consts::PI;

/// Polar radius of gyration about the shear centre squared,
/// `i0^2 = (I_a + I_b)/A + a0^2 + b0^2`, mm2.
pub fn polar_radius_sq(area_mm2: f64, i_a_mm4: f64, i_b_mm4: f64, a0_mm: f64, b0_mm: f64) -> f64 {
    (i_a_mm4 + i_b_mm4) / area_mm2 + a0_mm * a0_mm + b0_mm * b0_mm
}

/// Torsional buckling load `N_T = (G I_t + pi^2 E I_w / L_T^2) / i0^2`, N.
pub fn torsional_n(
    g_mpa: f64,
    it_mm4: f64,
    e_mpa: f64,
    iw_mm6: f64,
    lt_mm: f64,
    i0_sq_mm2: f64,
) -> f64 {
    (g_mpa * it_mm4 + PI * PI * e_mpa * iw_mm6 / (lt_mm * lt_mm)) / i0_sq_mm2
}

/// Flexural-torsional load of a singly symmetric section: the smaller root
/// of `beta N^2 - (N_s + N_T) N + N_s N_T = 0` with `beta = 1 - c0^2/i0^2`,
/// where `N_s` is the flexural load about the axis of symmetry (the axis
/// that carries the shear centre offset `c0`). Written as
/// `2 N_s N_T / ((N_s + N_T) + sqrt((N_s + N_T)^2 - 4 beta N_s N_T))`,
/// which has no cancellation when the offset is small.
pub fn flexural_torsional_single(n_s: f64, n_t: f64, c0_sq_over_i0_sq: f64) -> f64 {
    let beta = 1.0 - c0_sq_over_i0_sq;
    let sum = n_s + n_t;
    let disc = (sum * sum - 4.0 * beta * n_s * n_t).max(0.0);
    let den = sum + disc.sqrt();
    if den > 0.0 {
        2.0 * n_s * n_t / den
    } else {
        0.0
    }
}

/// The flexural-torsional cubic `f(N)` of the module docs and its slope.
fn cubic(n: f64, n_a: f64, n_b: f64, n_t: f64, pa: f64, pb: f64) -> (f64, f64) {
    let (da, db, dt) = (n - n_a, n - n_b, n - n_t);
    let f = da * db * dt - n * n * db * pa - n * n * da * pb;
    let df =
        db * dt + da * dt + da * db - (2.0 * n * db + n * n) * pa - (2.0 * n * da + n * n) * pb;
    (f, df)
}

/// Flexural-torsional load of a section with no symmetry: the smallest
/// positive root of the cubic, found in the bracket `(0, N_min]` (see the
/// module docs) by Newton steps kept inside the bracket, falling back to
/// bisection, started from the lower singly symmetric root. `pa = a0^2/i0^2` couples with `n_a`, `pb = b0^2/i0^2` with `n_b`.
/// Returns 0 when any load is not positive.
pub fn flexural_torsional_general(n_a: f64, n_b: f64, n_t: f64, pa: f64, pb: f64) -> f64 {
    let n_min = n_a.min(n_b).min(n_t);
    if !crate::error::all_positive([n_min]) {
        return 0.0;
    }
    let (f_hi, _) = cubic(n_min, n_a, n_b, n_t, pa, pb);
    if f_hi <= 0.0 {
        // f(N_min) = 0 up to rounding: N_min is the root.
        return n_min;
    }
    // Start from the lower of the two singly symmetric roots: each couples
    // one axis only and lies close to the full root, so a few Newton steps
    // finish (the bracket keeps every step safe whatever the start).
    let start =
        flexural_torsional_single(n_a, n_t, pa).min(flexural_torsional_single(n_b, n_t, pb));
    let start = if start > 0.0 && start < n_min {
        start
    } else {
        0.5 * n_min
    };
    newton_bisect(
        |x| cubic(x, n_a, n_b, n_t, pa, pb),
        0.0,
        n_min,
        start,
        Stop {
            f: 0.0,
            step: 1e-12 * n_min,
            bracket: 1e-13,
        },
    )
}

/// How the shear centre sits relative to the centroid.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Symmetry {
    /// Shear centre at the centroid (doubly symmetric, point symmetric).
    Double,
    /// Shear centre on the major principal axis (offset along it).
    SingleMajor,
    /// Shear centre on the minor principal axis (offset along it).
    SingleMinor,
    /// Offsets along both principal axes.
    None,
}

/// Inputs for the elastic critical loads, in N, mm and MPa.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Inputs {
    /// Area A, mm2.
    pub area_mm2: f64,
    /// Major principal second moment, mm4.
    pub i_major_mm4: f64,
    /// Minor principal second moment, mm4.
    pub i_minor_mm4: f64,
    /// St Venant torsion constant, mm4.
    pub torsion_mm4: f64,
    /// Warping constant, mm6.
    pub warping_mm6: f64,
    /// Shear-centre coordinate along the major principal axis, mm.
    pub sc_major_mm: f64,
    /// Shear-centre coordinate along the minor principal axis, mm.
    pub sc_minor_mm: f64,
    /// Young's modulus, MPa.
    pub e_mpa: f64,
    /// Shear modulus, MPa.
    pub g_mpa: f64,
    /// Buckling length about the major axis, mm.
    pub l_major_mm: f64,
    /// Buckling length about the minor axis, mm.
    pub l_minor_mm: f64,
    /// Torsional buckling length, mm.
    pub l_torsion_mm: f64,
}

/// The elastic critical loads, N.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Critical {
    /// Flexural about the major axis.
    pub n_major: f64,
    /// Flexural about the minor axis.
    pub n_minor: f64,
    /// Pure torsional (about the shear centre).
    pub n_torsional: f64,
    /// The lowest load of a mode that involves twist: `n_torsional` for a
    /// doubly symmetric section, the flexural-torsional root otherwise.
    pub n_twist: f64,
    /// Polar radius of gyration about the shear centre squared, mm2.
    pub i0_sq_mm2: f64,
    /// The symmetry that decided the formula.
    pub symmetry: Symmetry,
}

/// An offset counts as zero below this fraction of the polar radius of
/// gyration (rounding noise of a property calculation, not geometry).
const OFFSET_TOL: f64 = 1e-9;

/// Computes every elastic critical load of the member.
pub fn critical(x: &Inputs) -> Critical {
    let n_major = euler_n(x.e_mpa, x.i_major_mm4, x.l_major_mm);
    let n_minor = euler_n(x.e_mpa, x.i_minor_mm4, x.l_minor_mm);
    let i0_sq = polar_radius_sq(
        x.area_mm2,
        x.i_major_mm4,
        x.i_minor_mm4,
        x.sc_major_mm,
        x.sc_minor_mm,
    );
    let n_t = torsional_n(
        x.g_mpa,
        x.torsion_mm4,
        x.e_mpa,
        x.warping_mm6,
        x.l_torsion_mm,
        i0_sq,
    );
    let tol = OFFSET_TOL * i0_sq.sqrt();
    let has_a = x.sc_major_mm.abs() > tol;
    let has_b = x.sc_minor_mm.abs() > tol;
    let pa = x.sc_major_mm * x.sc_major_mm / i0_sq;
    let pb = x.sc_minor_mm * x.sc_minor_mm / i0_sq;
    let (symmetry, n_twist) = match (has_a, has_b) {
        (false, false) => (Symmetry::Double, n_t),
        (true, false) => (
            Symmetry::SingleMajor,
            flexural_torsional_single(n_major, n_t, pa),
        ),
        (false, true) => (
            Symmetry::SingleMinor,
            flexural_torsional_single(n_minor, n_t, pb),
        ),
        (true, true) => (
            Symmetry::None,
            flexural_torsional_general(n_major, n_minor, n_t, pa, pb),
        ),
    };
    Critical {
        n_major,
        n_minor,
        n_torsional: n_t,
        n_twist,
        i0_sq_mm2: i0_sq,
        symmetry,
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn cubic_matches_quadratic_when_one_offset_is_zero() {
        // With b0 = 0 the cubic factors into (N - N_b) times the quadratic.
        for &(na, nb, nt, p) in &[
            (1000.0, 400.0, 700.0, 0.3),
            (300.0, 900.0, 250.0, 0.6),
            (50.0, 60.0, 5000.0, 0.1),
        ] {
            let q = flexural_torsional_single(na, nt, p);
            let c = flexural_torsional_general(na, nb, nt, p, 0.0);
            let expect = q.min(nb);
            assert!((c - expect).abs() <= 1e-9 * expect, "{c} vs {expect}");
        }
    }

    #[test]
    fn general_root_is_a_root_and_below_every_uncoupled_load() {
        let (na, nb, nt, pa, pb) = (1200.0, 500.0, 450.0, 0.25, 0.15);
        let n = flexural_torsional_general(na, nb, nt, pa, pb);
        let (f, _) = cubic(n, na, nb, nt, pa, pb);
        assert!(f.abs() <= 1e-6 * na * nb * nt, "residual {f}");
        assert!(n > 0.0 && n < nt && n < nb);
    }

    #[test]
    fn zero_offsets_give_the_uncoupled_loads() {
        let x = Inputs {
            area_mm2: 5000.0,
            i_major_mm4: 5e7,
            i_minor_mm4: 2e7,
            torsion_mm4: 3e5,
            warping_mm6: 2e11,
            sc_major_mm: 0.0,
            sc_minor_mm: 0.0,
            e_mpa: 210_000.0,
            g_mpa: 81_000.0,
            l_major_mm: 4000.0,
            l_minor_mm: 4000.0,
            l_torsion_mm: 4000.0,
        };
        let c = critical(&x);
        assert_eq!(c.symmetry, Symmetry::Double);
        assert_eq!(c.n_twist, c.n_torsional);
    }

    #[test]
    fn degenerate_inputs_neither_panic_nor_return_a_negative_load() {
        let vals = [
            0.0,
            1e-300,
            1e-6,
            1.0,
            1e6,
            1e300,
            f64::INFINITY,
            f64::NAN,
            -1.0,
        ];
        for &a in &vals {
            for &b in &vals {
                for &p in &[0.0, 0.3, 0.99, 1.5, -0.2, f64::NAN] {
                    let n = flexural_torsional_general(a, b, 1e3, p, 0.1);
                    assert!(
                        n.is_nan() || n >= 0.0 || a < 0.0 || b < 0.0,
                        "{a} {b} {p} -> {n}"
                    );
                    let q = flexural_torsional_single(a, b, p);
                    assert!(
                        q.is_nan() || q >= 0.0 || a < 0.0 || b < 0.0 || p > 1.0,
                        "{a} {b} {p} -> {q}"
                    );
                }
            }
        }
    }
}
