//! Compression design methods, one module each.
//!
//! Every method works one flexural-buckling axis at a time through
//! [`axis`]: given the member, a buckling length and the axis, it returns
//! the mode's critical load, slenderness, reduction and design resistance,
//! and appends its working to the trace. The check ([`crate::check`]), the
//! envelope ([`crate::envelope`]) and the reverse solves all call it, so the
//! chart and the number can never disagree.

use serde::{Deserialize, Serialize};

use crate::error::Result;
use crate::material::Material;
use crate::member::Member;
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

/// The design method of a member, as named in the member file.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
pub enum Method {
    /// EN 1993-1-1 6.3.1 flexural buckling.
    #[serde(rename = "en1993-1-1")]
    En1993,
    /// AISC 360-16 chapter E, LRFD (phi_c = 0.90).
    #[serde(rename = "aisc360-lrfd")]
    AiscLrfd,
    /// AISC 360-16 chapter E, ASD (Omega_c = 1.67).
    #[serde(rename = "aisc360-asd")]
    AiscAsd,
    /// CSA S16-19 13.3.
    #[serde(rename = "csa-s16")]
    CsaS16,
    /// EN 1995-1-1 6.3.2 timber columns.
    #[serde(rename = "en1995-1-1")]
    En1995,
    /// Perry-Robertson with an explicit initial bow.
    #[serde(rename = "perry-robertson")]
    PerryRobertson,
    /// Secant formula for an eccentric load, first yield.
    #[serde(rename = "secant")]
    Secant,
    /// Euler's elastic critical load capped by the squash load.
    #[serde(rename = "euler")]
    Euler,
}

impl Method {
    /// Every method, in the order the app lists them.
    pub const ALL: [Method; 8] = [
        Method::En1993,
        Method::AiscLrfd,
        Method::AiscAsd,
        Method::CsaS16,
        Method::En1995,
        Method::PerryRobertson,
        Method::Secant,
        Method::Euler,
    ];

    /// The name used in the member file.
    pub fn key(self) -> &'static str {
        match self {
            Method::En1993 => "en1993-1-1",
            Method::AiscLrfd => "aisc360-lrfd",
            Method::AiscAsd => "aisc360-asd",
            Method::CsaS16 => "csa-s16",
            Method::En1995 => "en1995-1-1",
            Method::PerryRobertson => "perry-robertson",
            Method::Secant => "secant",
            Method::Euler => "euler",
        }
    }

    /// A readable title.
    pub fn title(self) -> &'static str {
        match self {
            Method::En1993 => "EN 1993-1-1 flexural buckling",
            Method::AiscLrfd => "AISC 360-16 E3, LRFD",
            Method::AiscAsd => "AISC 360-16 E3, ASD",
            Method::CsaS16 => "CSA S16-19 13.3",
            Method::En1995 => "EN 1995-1-1 timber column",
            Method::PerryRobertson => "Perry-Robertson, initial bow",
            Method::Secant => "Secant formula, eccentric load",
            Method::Euler => "Euler, capped at squash load",
        }
    }

    /// Parses the member-file name.
    pub fn from_key(key: &str) -> Option<Method> {
        Method::ALL.into_iter().find(|m| m.key() == key)
    }

    /// Whether the method is for timber (true) or for steel and custom elastic materials (false).
    pub fn is_timber(self) -> bool {
        matches!(self, Method::En1995)
    }
}

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
