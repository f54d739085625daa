//! PLACEHOLDER: delegates to Euler until this method lands.

use crate::check::{Mode, ModeResult, Warning};
use crate::error::Result;
use crate::method::{euler, Input};
use crate::trace::Trace;


/// Member-level working.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    euler::prelude(input, trace, warnings)
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    euler::axis(input, mode, lcr_mm, trace, warnings)
}
