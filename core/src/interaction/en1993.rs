//! EN 1993-1-1 6.3.3 (6.61), (6.62) with the factors of Annex A or B, and 6.2.9.

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
