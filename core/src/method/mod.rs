//! Compression design methods, one module each.
//!
//! Every method works one flexural-buckling axis at a time through
//! [`axis`]: given the member, a buckling length and the axis, it returns
//! the mode's critical load, slenderness, reduction and design resistance,
//! and appends its working to the trace. The check ([`crate::check`]), the
//! envelope ([`crate::envelope`]) and the reverse solves all call it, so the
//! chart and the number can never disagree.

use crate::error::Result;
use crate::material::Material;
use crate::member::Member;
pub use crate::member::Method;
use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::Section;
use crate::trace::Trace;

pub mod aisc360;
pub mod common;
pub mod csa_s16;
pub mod en1993;
pub mod en1995;
pub mod euler;
pub mod perry;
pub mod secant;

/// Everything a method needs for one member, resolved once.
#[derive(Debug, Clone, Copy)]
pub struct Input<'a> {
    /// The member as written (options such as `gamma_m1`, `bow_mm`, curves).
    pub member: &'a Member,
    /// Its section with properties.
    pub section: &'a Section,
    /// Its material, with the yield strength for the section's thickness.
    pub material: &'a Material,
}

/// The material as `method` reads it. CSA S16-19 takes E = 200 000 MPa
/// for structural steel (clause 2, its symbols; recalled from memory, and
/// common practice in Canada) whatever standard the grade comes from, so a
/// grade given by name (an ASTM grade's 29 000 ksi, an EN grade's 210 000
/// MPa) is read with it; a custom material keeps the E it gives.
pub fn material_for(method: Method, material: &Material) -> std::borrow::Cow<'_, Material> {
    use crate::material::{Steel, E_CSA};
    match (method, material) {
        (Method::CsaS16, Material::Steel(s)) if s.name != "custom" && s.e_mpa != E_CSA => {
            std::borrow::Cow::Owned(Material::Steel(Steel { e_mpa: E_CSA, ..*s }))
        }
        _ => std::borrow::Cow::Borrowed(material),
    }
}

/// Works one flexural-buckling axis (`Mode::Major` or `Mode::Minor`) at
/// buckling length `lcr_mm`, appending the working to `trace`.
pub fn axis(
    method: Method,
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    match method {
        Method::En1993 => en1993::axis(input, mode, lcr_mm, trace, warnings),
        Method::AiscLrfd => {
            aisc360::axis(input, mode, lcr_mm, aisc360::Basis::Lrfd, trace, warnings)
        }
        Method::AiscAsd => aisc360::axis(input, mode, lcr_mm, aisc360::Basis::Asd, trace, warnings),
        Method::CsaS16 => csa_s16::axis(input, mode, lcr_mm, trace, warnings),
        Method::En1995 => en1995::axis(input, mode, lcr_mm, trace, warnings),
        Method::PerryRobertson => perry::axis(input, mode, lcr_mm, trace, warnings),
        Method::Secant => secant::axis(input, mode, lcr_mm, trace, warnings),
        Method::Euler => euler::axis(input, mode, lcr_mm, trace, warnings),
    }
}

/// Member-level working that precedes the axes (squash load, partial
/// factors, material values) and the method's applicability: refuses a
/// timber method on steel and the reverse.
pub fn prelude(
    method: Method,
    input: &Input<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<()> {
    match method {
        Method::En1993 => en1993::prelude(input, trace, warnings),
        Method::AiscLrfd => aisc360::prelude(input, aisc360::Basis::Lrfd, trace, warnings),
        Method::AiscAsd => aisc360::prelude(input, aisc360::Basis::Asd, trace, warnings),
        Method::CsaS16 => csa_s16::prelude(input, trace, warnings),
        Method::En1995 => en1995::prelude(input, trace, warnings),
        Method::PerryRobertson => perry::prelude(input, trace, warnings),
        Method::Secant => secant::prelude(input, trace, warnings),
        Method::Euler => euler::prelude(input, trace, warnings),
    }
}
