//! AISC 360-16 H1-1a, H1-1b (and H2-1 where H1 does not apply), with B1 of Appendix 8.2.1.

use super::{Check, Context};
use crate::error::Result;
use crate::outcome::Warning;
use crate::trace::Trace;

/// The interaction equations, `None` while they are not implemented.
pub fn check(
    _ctx: &Context<'_>,
    _trace: &mut Trace,
    _warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    Ok(None)
}
