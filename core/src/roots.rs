//! The engine's one root finder: the root of a function that changes sign
//! from negative to positive across a bracket, by Newton steps kept inside
//! the shrinking bracket (bisection wherever a step would leave it or the
//! slope is not positive). Every solver of a continuous equation in core
//! uses it: the equal-area line of a section (`section::geometry`), the
//! alignment-chart equations (`buckling::chart`), the general
//! flexural-torsional cubic (`stability::torsional`), the secant formula
//! (`method::secant`) and the reach of a check (`check::reach`). Where only
//! a yes or no is known (the longest length that passes, `solve`; the
//! count of eigenvalues below a load, `buckling::column`), [`edge`] bisects
//! to the edge.
//!
//! Hand-written rather than taken from a crate: the general-purpose root
//! crates (`roots`, `argmin`) offer Newton without a bracket or a bracket
//! without the derivative each of these equations has in closed form, and
//! the safeguarded combination is the dozen lines below. It is tested
//! against closed-form roots in this module.

/// When [`newton_bisect`] stops.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Stop {
    /// |f(x)| at or below this: x is the root.
    pub f: f64,
    /// A Newton step at or below this (in x): the stepped point, kept in
    /// the bracket, is the root (0: not used).
    pub step: f64,
    /// The bracket narrower than this times |lo| + |hi|: the last point is
    /// the root.
    pub bracket: f64,
}

impl Stop {
    /// Stop on |f| <= `f` or a bracket collapsed to rounding.
    pub const fn on_value(f: f64) -> Stop {
        Stop {
            f,
            step: 0.0,
            bracket: 1e-14,
        }
    }
}

/// The root of `f` on [lo, hi], where f(lo) <= 0 <= f(hi); `f` gives the
/// value and the slope. Newton steps from `start` (clamped into the
/// bracket; the mid-point when not finite), each replaced by a bisection
/// when it would leave the shrinking bracket or the slope is not positive.
/// At most 200 evaluations; the last point when none of `stop` is met.
pub fn newton_bisect<F: FnMut(f64) -> (f64, f64)>(
    mut f: F,
    lo: f64,
    hi: f64,
    start: f64,
    stop: Stop,
) -> f64 {
    let (mut lo, mut hi) = (lo, hi);
    let mut x = if start.is_finite() {
        start.clamp(lo, hi)
    } else {
        0.5 * (lo + hi)
    };
    for _ in 0..200 {
        let (fx, dfx) = f(x);
        if fx.abs() <= stop.f {
            return x;
        }
        if fx < 0.0 {
            lo = x;
        } else {
            hi = x;
        }
        let step = fx / dfx;
        let newton = x - step;
        if newton.is_finite() && step.abs() <= stop.step {
            // Newton converges quadratically: a step this small leaves an
            // error far smaller still.
            return newton.clamp(lo, hi);
        }
        if hi - lo <= stop.bracket * (hi.abs() + lo.abs()) {
            return x;
        }
        x = if dfx > 0.0 && newton > lo && newton < hi {
            newton
        } else {
            0.5 * (lo + hi)
        };
    }
    x
}

/// The edge of a property that holds at `lo` and fails at `hi`, where
/// only a yes or no is known (a check that passes or fails, a count of
/// eigenvalues that is zero or not): bisection at `mid(lo, hi)` (the
/// arithmetic or the geometric mean) until `done(lo, hi)` or the mid-point
/// no longer lies strictly inside. Returns the last bracket: the property
/// holds at its lower end and fails at its upper end.
pub fn edge(
    lo: f64,
    hi: f64,
    mid: impl Fn(f64, f64) -> f64,
    done: impl Fn(f64, f64) -> bool,
    mut holds: impl FnMut(f64) -> bool,
) -> (f64, f64) {
    let (mut lo, mut hi) = (lo, hi);
    for _ in 0..200 {
        if done(lo, hi) {
            break;
        }
        let m = mid(lo, hi);
        if !(m > lo && m < hi) {
            break;
        }
        if holds(m) {
            lo = m;
        } else {
            hi = m;
        }
    }
    (lo, hi)
}

#[cfg(test)]
mod tests {
    use super::*;

    fn close(got: f64, want: f64, tol: f64) {
        assert!((got - want).abs() <= tol, "{got} against {want}");
    }

    #[test]
    fn closed_form_roots() {
        // A line: one Newton step.
        close(
            newton_bisect(|x| (x - 3.0, 1.0), 0.0, 10.0, 9.0, Stop::on_value(1e-14)),
            3.0,
            1e-12,
        );
        // The cube root of 2 (x^3 - 2 = 0), from a start with zero slope.
        close(
            newton_bisect(
                |x| (x * x * x - 2.0, 3.0 * x * x),
                0.0,
                2.0,
                0.0,
                Stop::on_value(1e-14),
            ),
            2f64.cbrt(),
            1e-12,
        );
        // cos x = x (the Dottie number, 0.739085133215160...), with the
        // step criterion only.
        let mut calls = 0;
        let r = newton_bisect(
            |x| {
                calls += 1;
                (x - crate::trig::cos(x), 1.0 + crate::trig::sin(x))
            },
            0.0,
            1.0,
            0.5,
            Stop {
                f: 0.0,
                step: 1e-15,
                bracket: 1e-16,
            },
        );
        close(r, 0.739_085_133_215_160_6, 1e-15);
        assert!(calls < 10, "{calls} evaluations");
        // ln x = 1 at x = e: a slope that falls, a start far off.
        close(
            newton_bisect(
                |x| (x.ln() - 1.0, 1.0 / x),
                0.1,
                100.0,
                100.0,
                Stop::on_value(1e-15),
            ),
            std::f64::consts::E,
            1e-14,
        );
    }

    #[test]
    fn edges_of_a_yes_or_no() {
        // x^2 <= 2 holds up to sqrt 2: arithmetic means.
        let mut calls = 0;
        let (lo, hi) = edge(
            0.0,
            2.0,
            |a, b| 0.5 * (a + b),
            |a, b| b - a <= 1e-13,
            |x| {
                calls += 1;
                x * x <= 2.0
            },
        );
        assert!(lo * lo <= 2.0 && hi * hi > 2.0);
        close(lo, std::f64::consts::SQRT_2, 1e-13);
        assert!(calls <= 45, "{calls}");
        // Geometric means over six orders of magnitude: 10^x <= 1234.5.
        let (lo, hi) = edge(
            1.0,
            1e6,
            |a, b| (a * b).sqrt(),
            |a, b| b / a - 1.0 <= 1e-12,
            |x| x <= 1234.5,
        );
        assert!(lo <= 1234.5 && hi > 1234.5);
        close(lo, 1234.5, 1234.5 * 1e-12);
    }

    #[test]
    fn bisects_where_newton_cannot_go() {
        // A zero slope at the start, a flat triple root: bisection finds it.
        close(
            newton_bisect(
                |x| (x.powi(3), 3.0 * x * x),
                -1.0,
                3.0,
                1e-300,
                Stop::on_value(1e-14),
            ),
            0.0,
            1e-4,
        );
        // No slope at all (0): pure bisection of a step function's edge.
        let r = newton_bisect(
            |x| (if x < 0.3 { -1.0 } else { 1.0 }, 0.0),
            0.0,
            1.0,
            f64::NAN,
            Stop::on_value(0.0),
        );
        close(r, 0.3, 1e-13);
    }
}
