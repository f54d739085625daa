//! PLACEHOLDER: delegates to Euler until this method lands.

use crate::check::{Mode, ModeResult, Warning};
use crate::error::Result;
use crate::method::{euler, Input};
use crate::trace::Trace;

/// LRFD or ASD.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Basis {
    /// Load and resistance factor design, phi_c = 0.90.
    Lrfd,
    /// Allowable strength design, Omega_c = 1.67.
    Asd,
}

/// Member-level working.
pub fn prelude(input: &Input<'_>, _basis: Basis, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    euler::prelude(input, trace, warnings)
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    _basis: Basis, 
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    euler::axis(input, mode, lcr_mm, trace, warnings)
}
