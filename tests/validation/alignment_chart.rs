//! Reference: AISC 360-16, Specification for Structural Steel Buildings,
//! Commentary on Appendix 7, Section 7.2 (American Institute of Steel
//! Construction, Chicago, 2016): Eq. C-A-7-1 (sidesway inhibited) and
//! Eq. C-A-7-2 (sidesway uninhibited), the equations behind the alignment
//! charts (Fig. C-A-7.1 and C-A-7.2), and Table C-A-7.1, the theoretical
//! k of the idealised end conditions. The chart readings below are
//! recalled from memory to the two figures a chart can be read to.
//!
//! The chart assumes, among other things, beams bent in single curvature
//! in a braced frame and in double curvature in a sway frame, so a beam's
//! far end adds 2 EI/L (braced) or 6 EI/L (sway) to the joint's
//! rotational stiffness (common practice, the chart's derivation); with
//! G = (EI/L)_column / sum (EI/L)_beams a column's end spring is
//! 2 (EI/L)_c / G or 6 (EI/L)_c / G. The last two tests run the
//! finite-element analysis on those springs and compare it with the root
//! of the chart equations: two independent solutions of the same problem.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::f64::consts::PI;

use strutline_core::buckling::chart::{k_factor, Frame, FrameKey};
use strutline_core::buckling::column::{analyse, Column};
use strutline_core::buckling::{Axis, Fixity, Support};
use strutline_validation::assert_close;

/// Root finding to machine precision.
const ROOT: f64 = 1e-10;
/// The analysis converges to 1e-6 between meshes (see elastic_stability).
const FE: f64 = 2e-6;

fn k(sway: bool, g_a: f64, g_b: f64) -> f64 {
    k_factor(&Frame { sway, g_a, g_b }, FrameKey::Major).unwrap()
}

/// Table C-A-7.1, theoretical k: both ends fixed 0.5; fixed and pinned
/// 0.7 (0.6992, tan x = x); both pinned 1.0; fixed and sliding (sway,
/// rotation fixed) 1.0; fixed and free (flagpole) 2.0; pinned and
/// sliding 2.0. As G: fixed 0, pinned infinite.
#[test]
fn table_c_a_7_1_theoretical_values() {
    let inf = f64::INFINITY;
    assert_close(k(false, 0.0, 0.0), 0.5, ROOT, "fixed-fixed");
    assert_close(
        k(false, 0.0, inf),
        PI / 4.493_409_457_909_064,
        ROOT,
        "fixed-pinned",
    );
    assert_close(
        k(false, 0.0, inf),
        0.7,
        0.05 / 0.7,
        "fixed-pinned, 0.7 as printed",
    );
    assert_close(k(false, inf, inf), 1.0, ROOT, "pinned-pinned");
    assert_close(k(true, 0.0, 0.0), 1.0, ROOT, "fixed-sliding");
    assert_close(k(true, 0.0, inf), 2.0, ROOT, "flagpole");
    assert_close(k(true, inf, 0.0), 2.0, ROOT, "pinned-sliding");
}

/// Chart readings (recalled from memory, to the half-unit of the second
/// figure): G_A = G_B = 1 gives k = 0.77 braced and 1.32 sway; G_A = G_B
/// = 10, sway, about 3.0.
#[test]
fn chart_readings() {
    assert!((k(false, 1.0, 1.0) - 0.77).abs() <= 0.005);
    assert!((k(true, 1.0, 1.0) - 1.32).abs() <= 0.005);
    assert!((k(true, 10.0, 10.0) - 3.0).abs() <= 0.05);
    // Symmetric in the ends, and monotonic in G.
    assert_close(k(true, 0.3, 4.0), k(true, 4.0, 0.3), ROOT, "symmetric");
    let mut last = 0.0;
    for g in [0.0, 0.1, 0.5, 1.0, 2.0, 5.0, 20.0, 100.0] {
        let kk = k(false, g, g);
        assert!(kk > last);
        last = kk;
    }
}

const EI: f64 = 3.0e12;
const L: f64 = 4000.0;

/// A column of the chart: end springs from G, loaded at the top.
fn chart_column(sway: bool, g_a: f64, g_b: f64) -> Column {
    let per_g = if sway { 6.0 } else { 2.0 } * EI / L / 1e6; // kN m/rad
    let spring = |g: f64| {
        if g == 0.0 {
            Fixity::Fixed
        } else {
            Fixity::Spring(per_g / g)
        }
    };
    let a = Support {
        translation: Fixity::Fixed,
        rotation: spring(g_a),
    };
    let b = Support {
        translation: if sway { Fixity::Free } else { Fixity::Fixed },
        rotation: spring(g_b),
    };
    Column::uniform(Axis::Major, L, EI, a, b, 1.0)
}

/// k from the analysis: N_cr = pi^2 EI / (k L)^2.
fn fe_k(c: &Column) -> f64 {
    let n = analyse(c).unwrap().critical_kn * 1000.0;
    PI * (EI / n).sqrt() / L
}

#[test]
fn chart_equations_equal_the_analysis_with_end_springs() {
    for (sway, what) in [
        (false, "braced: Eq. C-A-7-1 vs analysis"),
        (true, "sway: Eq. C-A-7-2 vs analysis"),
    ] {
        for (g_a, g_b) in [(0.0, 1.0), (0.5, 0.5), (1.0, 1.0), (1.0, 10.0), (3.0, 0.2)] {
            assert_close(
                fe_k(&chart_column(sway, g_a, g_b)),
                k(sway, g_a, g_b),
                FE,
                what,
            );
        }
    }
}
