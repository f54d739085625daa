//! The secant method with moments: equal end moments about one axis are
//! the load's eccentricity e_M = |M| / N, added to that axis's eccentricity
//! in the secant formula itself ([`crate::method::secant`]), so the axial
//! mode about that axis is already the first-yield load at the combined
//! eccentricity. The one check `"secant"` is the design load over that
//! first-yield load; the moments are not counted again as bending.

use super::Check;
use crate::error::Result;
use crate::method::{secant, Input, Method};
use crate::outcome::ModeResult;
use crate::trace::{step, Scope, Trace};

/// The `"secant"` check of a member checked by the secant method with
/// equal end moments, `None` for any other method or a member without
/// moments. `modes` are the member's axial modes.
pub fn check(
    method: Method,
    input: &Input<'_>,
    modes: &[ModeResult],
    trace: &mut Trace,
) -> Result<Option<Check>> {
    if method != Method::Secant {
        return Ok(None);
    }
    let Some((axis, _)) = secant::moment_eccentricity(input.member)? else {
        return Ok(None);
    };
    let n = input.member.axial_kn;
    let resistance = modes
        .iter()
        .find(|m| m.mode == axis)
        .map_or(0.0, |m| m.resistance_kn);
    let utilisation = if resistance > 0.0 {
        n / resistance
    } else {
        f64::INFINITY
    };
    step!(
        trace,
        Scope::Interaction,
        "N_R,e",
        "first-yield load at the eccentricity e + |M| / N, about the moment's axis",
        resistance,
        "kN",
        "secant formula",
    );
    step!(
        trace,
        Scope::Interaction,
        "N_Ed/N_R,e",
        "utilisation: design load over the first-yield load at that eccentricity",
        utilisation,
        "-",
        "secant formula",
    );
    Ok(Some(Check {
        check: "secant",
        utilisation,
    }))
}
