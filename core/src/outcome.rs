//! The outcome types every method and limit state returns: the mode
//! checked, its result and the cautions attached to a result.

use std::borrow::Cow;

use serde::Serialize;

/// A buckling mode or limit state.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Mode {
    /// Flexural buckling about the major principal axis.
    Major,
    /// Flexural buckling about the minor principal axis.
    Minor,
    /// Torsional buckling.
    Torsional,
    /// Flexural-torsional buckling.
    FlexuralTorsional,
    /// Cross-section resistance.
    Section,
}

impl Mode {
    /// Its name in results.
    pub fn key(self) -> &'static str {
        match self {
            Mode::Major => "major",
            Mode::Minor => "minor",
            Mode::Torsional => "torsional",
            Mode::FlexuralTorsional => "flexural-torsional",
            Mode::Section => "section",
        }
    }
}

/// The result of one mode.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct ModeResult {
    /// Which mode.
    pub mode: Mode,
    /// Buckling length L_cr, mm.
    pub buckling_length_mm: f64,
    /// Geometric slenderness L_cr / r (for torsional modes, the equivalent
    /// slenderness that gives the same elastic critical stress).
    pub slenderness: f64,
    /// Elastic critical load N_cr, kN (0 for the section mode, which has none).
    pub critical_kn: f64,
    /// Relative (non-dimensional) slenderness as the method defines it.
    pub relative_slenderness: f64,
    /// Reduction factor (chi, Fcr/Fy, k_c, ...), within (0, 1].
    pub reduction: f64,
    /// Design resistance of this mode with the method's factors, kN.
    pub resistance_kn: f64,
}

/// A caution attached to a result.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Warning {
    /// Stable short code, for scripts ("torsional-not-checked").
    pub code: &'static str,
    /// The message in words: most are fixed texts, kept without
    /// allocating; those with the member's numbers are formatted.
    pub message: Cow<'static, str>,
}

impl Warning {
    /// A warning with a code and a message.
    pub fn new(code: &'static str, message: impl Into<Cow<'static, str>>) -> Warning {
        Warning {
            code,
            message: message.into(),
        }
    }
}
