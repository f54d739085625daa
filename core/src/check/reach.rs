//! How far one action can go: the largest value of an action (a moment
//! scale, an axial load) at which the check's utilisation is still at most
//! 1, the other actions held. The interaction curve, the largest moment at
//! a load and the largest load under moments ask this question; they share
//! this one answer.
//!
//! The utilisation rises with each action (a property the check keeps), so
//! the answer is the root of `u(x) - 1` on a bracket `[0, hi]` with
//! `u(0) <= 1 < u(hi)`, found by the project's root finder
//! ([`newton_bisect`]: Newton steps, each kept inside the shrinking
//! bracket or replaced by a bisection). The check gives no derivative; the
//! secant through the previous point worked stands in for it (a forward
//! difference of relative step [`STEP`] where that point is too close).
//! Most interaction equations are linear in the moment at a given load, so
//! the first step lands on the root: three checks (no action, the
//! bracket's end, the root) where a forward difference took five.

use crate::roots::{newton_bisect, Stop};

/// The utilisation the answer is worked to: `|u(x) - 1| <= TOL` wherever
/// the utilisation is continuous in the action (at a jump, such as a
/// change of cross-section class, the answer is the jump's place within
/// one part in 10^14).
pub const TOL: f64 = 1e-9;

/// Relative step of the forward difference standing in for the derivative
/// where the secant's two points are closer than this (relative).
const STEP: f64 = 1e-7;

/// The answer.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Reach {
    /// Even with none of this action the check fails (`u(0) > 1`, or the
    /// method refuses the member).
    Nothing,
    /// The largest value carried and the utilisation there (1 within
    /// [`TOL`]).
    Up {
        /// The value.
        x: f64,
        /// The utilisation at it.
        utilisation: f64,
    },
    /// Carried up to `x_max`, the largest value tried.
    Beyond {
        /// The largest value tried.
        x_max: f64,
    },
}

impl Reach {
    /// The value reached: 0 for [`Reach::Nothing`], `x_max` for
    /// [`Reach::Beyond`].
    pub fn value(self) -> f64 {
        match self {
            Reach::Nothing => 0.0,
            Reach::Up { x, .. } => x,
            Reach::Beyond { x_max } => x_max,
        }
    }
}

/// The largest `x` in `[0, x_max]` with `u(x) <= 1`, `u` rising with `x`;
/// `u` returns `None` where the method refuses the member (counted as not
/// carried). `guess` is where the bracket search starts (a value near the
/// answer saves checks; any positive value works).
pub fn largest<U: Fn(f64) -> Option<f64>>(u: U, guess: f64, x_max: f64) -> Reach {
    // Refused (or not a number): not carried. The last few values are
    // kept: the root finder asks again for the bracket's end it starts
    // from, and the answer is checked once more at the end.
    let seen: std::cell::RefCell<[(f64, f64); 4]> =
        std::cell::RefCell::new([(f64::NAN, f64::NAN); 4]);
    let at = |x: f64| {
        if let Ok(s) = seen.try_borrow() {
            if let Some(&(_, v)) = s.iter().find(|(k, _)| k.to_bits() == x.to_bits()) {
                return v;
            }
        }
        let v = u(x).filter(|v| !v.is_nan()).unwrap_or(f64::INFINITY);
        if let Ok(mut s) = seen.try_borrow_mut() {
            s.rotate_right(1);
            if let Some(first) = s.first_mut() {
                *first = (x, v);
            }
        }
        v
    };
    if at(0.0) > 1.0 {
        return Reach::Nothing;
    }
    let mut lo = 0.0;
    let mut hi = if guess.is_finite() && guess > 0.0 {
        guess.min(x_max)
    } else {
        x_max.min(1.0)
    };
    // Bracket: double until the check fails.
    let mut u_hi = at(hi);
    while u_hi <= 1.0 {
        if hi >= x_max {
            return Reach::Beyond { x_max };
        }
        lo = hi;
        hi = (hi * 2.0).min(x_max);
        u_hi = at(hi);
    }
    // The slope is the secant through the previous finite point worked
    // (first the bracket's lower end): a check a step, where a forward
    // difference costs two; on a straight line the first step lands on the
    // root. Where the previous point is too close for a secant, a forward
    // difference of relative step STEP stands in.
    let scale = hi;
    let mut prev = (lo, at(lo));
    let f = |x: f64| {
        let ux = at(x);
        if !ux.is_finite() {
            // Refused or infinite: over, and no slope (bisect).
            return (1.0, 0.0);
        }
        let (px, pu) = prev;
        let slope = if (x - px).abs() > STEP * scale && pu.is_finite() {
            (ux - pu) / (x - px)
        } else {
            let h = STEP * scale;
            (at(x + h) - ux) / h
        };
        prev = (x, ux);
        (ux - 1.0, if slope.is_finite() { slope } else { 0.0 })
    };
    let x = newton_bisect(f, lo, hi, hi, Stop::on_value(TOL));
    let ux = at(x);
    // The root finder may end on the far side of the root by at most TOL
    // in utilisation; where it ends beyond that (on the high side of a
    // jump, its bracket collapsed), the value just below is carried.
    if ux <= 1.0 + TOL {
        return Reach::Up { x, utilisation: ux };
    }
    for back in [1e-13, 1e-11, 1e-9] {
        let y = (x * (1.0 - back)).max(lo);
        let uy = at(y);
        if uy <= 1.0 {
            return Reach::Up {
                x: y,
                utilisation: uy,
            };
        }
    }
    Reach::Up {
        x: lo,
        utilisation: at(lo),
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::cell::Cell;

    #[test]
    fn a_straight_line_is_solved_in_a_few_checks() {
        // u = 0.3 + x / 80: the root is x = 56.
        let calls = Cell::new(0);
        let r = largest(
            |x| {
                calls.set(calls.get() + 1);
                Some(0.3 + x / 80.0)
            },
            10.0,
            1e7,
        );
        match r {
            Reach::Up { x, utilisation } => {
                assert!((x - 56.0).abs() < 1e-6, "{x}");
                assert!((utilisation - 1.0).abs() <= TOL);
            }
            other => panic!("{other:?}"),
        }
        // Bracket (0, 10, 20, 40, 80), then one secant step through (40,
        // 80) onto the root, worked once; the final check and the
        // bracket's ends are not worked twice (nine with a forward
        // difference).
        assert!(calls.get() <= 6, "{} checks", calls.get());
    }

    #[test]
    fn a_kink_a_jump_and_a_refusal() {
        // Kinked (the larger of two lines), root at x = 0.8 on the steep one.
        let r = largest(|x| Some((x / 2.0).max(0.2 + x)), 1.0, 100.0);
        assert!((r.value() - 0.8).abs() < 1e-8, "{r:?}");
        // A jump from 0.5 to 1.5 at x = 3: the answer is at the jump, carried.
        let r = largest(|x| Some(if x < 3.0 { 0.5 } else { 1.5 }), 1.0, 100.0);
        match r {
            Reach::Up { x, utilisation } => {
                assert!((x - 3.0).abs() < 1e-9, "{x}");
                assert!(utilisation <= 1.0);
            }
            other => panic!("{other:?}"),
        }
        // Refused beyond x = 7 and carried below: 7.
        let r = largest(|x| (x < 7.0).then_some(0.1), 1.0, 100.0);
        assert!((r.value() - 7.0).abs() < 1e-9, "{r:?}");
        // Over at zero; carried to the end.
        assert_eq!(largest(|_| Some(1.2), 1.0, 100.0), Reach::Nothing);
        assert_eq!(largest(|_| None, 1.0, 100.0), Reach::Nothing);
        assert_eq!(
            largest(|x| Some(x / 1e9), 1.0, 100.0),
            Reach::Beyond { x_max: 100.0 }
        );
    }
}
