//! The capacity envelope of a member: failure stress against slenderness.
//!
//! Euler's hyperbola sigma_cr = pi^2 E / lambda^2, the strength plateau
//! f_y, and the design stress of the member's own method, sampled by
//! running the method at the buckling length lambda * i. The chart and the
//! check can therefore never disagree.

use serde::Serialize;

use crate::check::{Mode, Prepared, Warning};
use crate::error::Result;
use crate::method::{self, Method};
use crate::trace::Trace;

/// One sample of the envelope.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Point {
    /// Slenderness L_cr / i.
    pub slenderness: f64,
    /// Euler critical stress, MPa.
    pub euler_mpa: f64,
    /// Strength plateau (f_y or f_c,0,k), MPa.
    pub yield_mpa: f64,
    /// Design stress N_Rd / A of the method, MPa.
    pub design_mpa: f64,
}

/// Samples the envelope of `prepared` for `method` about `mode`'s axis
/// from slenderness `from` to `to` in `steps` intervals (`steps + 1` points).
pub fn sample(
    prepared: &Prepared,
    method: Method,
    mode: Mode,
    from: f64,
    to: f64,
    steps: usize,
) -> Result<Vec<Point>> {
    let input = prepared.input();
    let p = &input.section.props;
    let r = match mode {
        Mode::Major => p.r_major_mm,
        _ => p.r_minor_mm,
    };
    let (f, e) = input.material.strength_and_modulus();
    let steps = steps.max(1);
    let from = from.max(1e-3);
    let mut out = Vec::with_capacity(steps + 1);
    let mut scratch = Trace::with_capacity(16);
    let mut warnings: Vec<Warning> = Vec::new();
    for k in 0..=steps {
        let lambda = from + (to - from) * (k as f64) / (steps as f64);
        scratch.clear();
        warnings.clear();
        let res = method::axis(
            method,
            &input,
            mode,
            lambda * r,
            &mut scratch,
            &mut warnings,
        )?;
        out.push(Point {
            slenderness: lambda,
            euler_mpa: std::f64::consts::PI.powi(2) * e / (lambda * lambda),
            yield_mpa: f,
            design_mpa: res.resistance_kn * 1000.0 / p.area_mm2,
        });
    }
    Ok(out)
}
