//! Members under compression and bending (beam-columns): the interaction
//! equations of each design method, one module per code.
//!
//! A member with an axial load and a moment (member file version 3) is
//! checked against every interaction equation its code gives; each
//! equation worked is one [`Check`] (`"interaction"` in results), named by
//! its clause or equation number exactly as the issue and the outside
//! scripts expect (`"6.61"`, `"H1-1a"`, `"13.8.2(b)"`, `"6.23"`, ...). The
//! utilisation of an equation is its left-hand side where its right-hand
//! side is 1. Every interaction factor, amplification and moment factor is
//! written to the working ([`Scope::Interaction`]) with its clause.
//!
//! A method's module returns `Ok(None)` while its equations are not
//! implemented; the check then does not pass the member and says so
//! (`interaction-not-checked`). A shape or case its code gives no rule for
//! is a typed error naming the key, never a silent pass.
//!
//! [`Scope::Interaction`]: crate::trace::Scope::Interaction

use serde::Serialize;

use crate::bending::Bending;
use crate::error::{Error, Result};
use crate::member::BucklingLengths;
use crate::method::{Input, Method};
use crate::outcome::{ModeResult, Warning};
use crate::section::Family;
use crate::stability::Assessment;
use crate::trace::Trace;

pub mod aisc360;
pub mod csa_s16;
pub mod en1993;
pub mod en1995;
pub mod secant;

/// One interaction equation worked, as results report it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Check {
    /// The equation's name: its clause or number in the code
    /// (`"6.2.9"`, `"6.61"`, `"6.62"`, `"H1-1a"`, `"H1-1b"`, `"H2-1"`,
    /// `"13.8.2(a)"`, ..., `"6.19"`, `"6.23"`, `"6.35"`, `"secant"`).
    pub check: &'static str,
    /// Its left-hand side (its right-hand side being 1).
    pub utilisation: f64,
}

/// What every method's interaction needs: the member, its axial side
/// (every mode checked and the governing one), its bending side and the
/// cross-section assessment.
#[derive(Debug, Clone, Copy)]
pub struct Context<'a> {
    /// The method.
    pub method: Method,
    /// The member, section and material (the gross section; a Class 4
    /// section's effective area is in `assessment`).
    pub input: &'a Input<'a>,
    /// The member's buckling lengths.
    pub lengths: &'a BucklingLengths,
    /// Every axial mode checked (major, minor, the twisting mode, the
    /// cross-section mode), as in the result.
    pub modes: &'a [ModeResult],
    /// The governing (lowest) axial mode.
    pub governing: &'a ModeResult,
    /// The bending side, both axes.
    pub bending: &'a Bending,
    /// The cross-section classification and effective area.
    pub assessment: &'a Assessment<'a>,
}

impl Context<'_> {
    /// The axial mode `mode` of this result, if it was checked.
    pub fn mode(&self, mode: crate::outcome::Mode) -> Option<&ModeResult> {
        self.modes.iter().find(|m| m.mode == mode)
    }
}

/// The interaction equations of the member's method, `None` where the
/// method's equations are not implemented (the check then refuses to pass
/// the member). Called only for a member with both an axial load and a
/// moment.
pub fn check(
    ctx: &Context<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    if matches!(ctx.method, Method::En1993 | Method::CsaS16)
        && matches!(ctx.input.section.family, Family::Tee | Family::Angle)
    {
        // The bending of a tee is worked under these codes, but their
        // beam-column rules (6.3.3; 13.8) are not set up for a monosymmetric
        // section whose resistance depends on the sign of the moment.
        let m = ctx.input.member;
        let (key, what) = if m.axial_kn > 0.0 {
            ("axial_kn", "axial load with moments")
        } else {
            (
                [
                    ("m_minor_a_knm", m.m_minor_a_knm),
                    ("m_minor_b_knm", m.m_minor_b_knm),
                    ("m_minor_span_knm", m.m_minor_span_knm),
                ]
                .iter()
                .find(|(_, v)| *v != 0.0)
                .map_or("m_minor_a_knm", |(k, _)| *k),
                "moments about both axes",
            )
        };
        return Err(Error::NotApplicable {
            method: ctx.method.key(),
            reason: format!(
                "{key}: {what}: the combined check of a tee or an angle is not worked under this \
                 code (its interaction rules are for doubly symmetric members; the tee's bending \
                 resistance depends on the moment's sign); check this member by hand"
            ),
        });
    }
    match ctx.method {
        Method::En1993 => en1993::check(ctx, trace, warnings),
        Method::AiscLrfd | Method::AiscAsd => aisc360::check(ctx, trace, warnings),
        Method::CsaS16 => csa_s16::check(ctx, trace, warnings),
        Method::En1995 => en1995::check(ctx, trace, warnings),
        // The secant method takes equal end moments as the load's
        // eccentricity (no bending side: its check is `secant::check`);
        // euler and perry-robertson refuse any moment in `bending::check`.
        Method::Euler | Method::PerryRobertson | Method::Secant => Ok(None),
    }
}

/// Demand over capacity: 0 without demand, infinite without capacity.
pub fn ratio(demand: f64, capacity: f64) -> f64 {
    if demand == 0.0 {
        0.0
    } else if capacity > 0.0 {
        demand / capacity
    } else {
        f64::INFINITY
    }
}

/// The largest check, `None` for none.
pub fn governing(checks: &[Check]) -> Option<Check> {
    checks
        .iter()
        .copied()
        .max_by(|a, b| a.utilisation.total_cmp(&b.utilisation))
}
