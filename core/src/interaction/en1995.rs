//! EN 1995-1-1 6.2.4 (6.19, 6.20), 6.3.2 (6.23, 6.24) and 6.3.3 (6.35).

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
