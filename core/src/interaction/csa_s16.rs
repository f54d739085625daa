//! CSA S16-19 13.8.2 (a), (b), (c) and 13.8.3, with U_1 of 13.8.4 and omega_1 of 13.8.5.

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
