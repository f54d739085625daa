//! Reference: R. D. Cook, D. S. Malkus, M. E. Plesha and R. J. Witt,
//! Concepts and Applications of Finite Element Analysis, 4th ed., Wiley,
//! 2002, chapter 18 (buckling; recalled from memory): the two-node beam
//! element with cubic deflection and its consistent geometric stiffness
//! N/(30 h) [36, 3h, -36, 3h; 3h, 4h^2, -3h, -h^2; ...] give critical
//! loads from above (a Rayleigh-Ritz bound) that converge as h^4.
//!
//! Worked by hand here: one element on a pin-ended bar leaves the two end
//! rotations; the symmetric bending mode theta_A = -theta_B gives (4 - 2)
//! EI/L = (4 + 1) P L / 30, so P = 12 EI/L^2 (21.6% above pi^2).

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::f64::consts::PI;

use strutline_core::buckling::column::{analyse, solve, Column, CONVERGED};
use strutline_core::buckling::{Axis, Support};
use strutline_validation::assert_close;

/// Closed forms and hand values in floating point.
const EXACT: f64 = 1e-9;

const EI: f64 = 1.0e12;
const L: f64 = 3000.0;

fn pinned() -> Column {
    Column::uniform(Axis::Major, L, EI, Support::PINNED, Support::PINNED, 1.0)
}

/// alpha_cr over pi^2 EI/L^2 (1 kN pattern).
fn ratio(elements: usize) -> f64 {
    solve(&pinned(), elements).unwrap().load_factor * 1000.0 / (PI * PI * EI / (L * L))
}

#[test]
fn one_element_gives_12_ei_over_l2() {
    assert_close(ratio(1) * PI * PI, 12.0, EXACT, "one element, by hand");
}

#[test]
fn converges_from_above_as_h_to_the_fourth() {
    let mut last_error = f64::INFINITY;
    for n in [1, 2, 4, 8, 16, 32] {
        let error = ratio(n) - 1.0;
        assert!(error > 0.0, "{n} elements: an upper bound");
        if n > 2 {
            // Halving h divides the error by about 2^4 = 16 (from 1 to 2
            // elements by 28.7, before the asymptotic rate).
            let reduction = last_error / error;
            assert!(
                (14.0..=18.0).contains(&reduction),
                "{n} elements: error fell by {reduction}"
            );
        }
        last_error = error;
    }
    // By 32 elements the error is 1.3e-7 (0.05% at 4 elements over 16^3).
    assert!(last_error < 2e-7, "{last_error}");
}

#[test]
fn analyse_refines_until_converged_and_says_so() {
    let b = analyse(&pinned()).unwrap();
    let change = (b.load_factor - b.load_factor_half).abs() / b.load_factor;
    assert!(change <= CONVERGED, "{change}");
    assert!(b.elements >= 80);
    assert_close(
        b.load_factor * 1000.0,
        PI * PI * EI / (L * L),
        1e-7,
        "Euler",
    );
}
