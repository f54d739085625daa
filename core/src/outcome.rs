//! The outcome types every method and limit state returns: the mode
//! checked, its result and the cautions attached to a result.

use std::borrow::Cow;

use serde::Serialize;

use crate::units::{self, Quantity, UnitSystem};

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
///
/// `message` is the text in the engine's own units (mm, kN, MPa, kNm, as
/// the member file stores them): what the JSON of results gives (`code`
/// and `message`, stable for scripts), what the command line prints.
/// The numbers with a unit in it are kept typed as well (`figures`), so a
/// front end shows the message in its unit system through
/// [`Warning::text`], the one function that renders it.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Warning {
    /// Stable short code, for scripts ("torsional-not-checked").
    pub code: &'static str,
    /// The message in words with its numbers in the engine's units: most
    /// are fixed texts, kept without allocating; those with the member's
    /// numbers are formatted.
    pub message: Cow<'static, str>,
    /// The numbers of `message` that have a unit, in order (empty, and not
    /// allocated, for a message without them). Not in the JSON.
    #[serde(skip)]
    pub figures: Box<[Figure]>,
}

/// A number with a unit in a warning's message: its value in the engine's
/// unit of its quantity and where its text stands in the message.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Figure {
    /// The value in the engine's unit of `quantity` (mm, kN, MPa, kNm).
    pub value: f64,
    /// Its kind, which sets its unit in each system.
    pub quantity: Quantity,
    /// Byte range of its text ("3500 mm") in the message.
    at: u32,
    len: u32,
}

/// The marker of a figure in a template of [`Warning::with_figures`].
const MARK: &str = "{}";

impl Warning {
    /// The decimals of a figure written as `{}` writes it (the shortest
    /// text that reads back as the value), in [`Warning::with_figures`].
    pub const AS_GIVEN: usize = usize::MAX;

    /// A warning with a code and a message without numbers in units.
    pub fn new(code: &'static str, message: impl Into<Cow<'static, str>>) -> Warning {
        Warning {
            code,
            message: message.into(),
            figures: Box::default(),
        }
    }

    /// A warning whose message has numbers with units: `template` with
    /// `{}` standing for each of `figures` in turn, each (value in the
    /// engine's unit, quantity, decimals written in the engine's units).
    /// The message reads as `format!` with `{:.decimals$} unit` would
    /// write it (so its JSON text is unchanged from such a message); a
    /// marker without a figure stays as it is, a figure without a marker
    /// is left out.
    pub fn with_figures(
        code: &'static str,
        template: &str,
        figures: &[(f64, Quantity, usize)],
    ) -> Warning {
        use std::fmt::Write;
        let mut message = String::with_capacity(template.len() + 12 * figures.len());
        let mut kept = Vec::with_capacity(figures.len());
        let mut rest = template;
        let mut given = figures.iter();
        while let Some(i) = rest.find(MARK) {
            let (before, after) = rest.split_at(i);
            message.push_str(before);
            rest = after.get(MARK.len()..).unwrap_or("");
            match given.next() {
                Some(&(value, quantity, decimals)) => {
                    let at = message.len();
                    // Writing to a String cannot fail.
                    let _ = if decimals == Warning::AS_GIVEN {
                        write!(message, "{value}")
                    } else {
                        write!(message, "{value:.decimals$}")
                    };
                    let unit = quantity.engine_unit();
                    if !unit.is_empty() {
                        message.push(' ');
                        message.push_str(unit);
                    }
                    kept.push(Figure {
                        value,
                        quantity,
                        at: u32::try_from(at).unwrap_or(u32::MAX),
                        len: u32::try_from(message.len() - at).unwrap_or(0),
                    });
                }
                None => message.push_str(MARK),
            }
        }
        message.push_str(rest);
        Warning {
            code,
            message: Cow::Owned(message),
            figures: kept.into_boxed_slice(),
        }
    }

    /// The message in `system`'s units: the message itself in SI (the
    /// engine's units, nothing formatted) and for a message without
    /// figures; otherwise each figure in the system's display unit (US
    /// customary to four significant figures: kip, in, ft, ksi, kip·ft).
    pub fn text(&self, system: UnitSystem) -> Cow<'_, str> {
        if system == UnitSystem::Si || self.figures.is_empty() {
            return Cow::Borrowed(&self.message);
        }
        let m: &str = &self.message;
        let mut out = String::with_capacity(m.len() + 8 * self.figures.len());
        let mut from = 0;
        for f in self.figures.iter() {
            let (at, end) = (f.at as usize, f.at as usize + f.len as usize);
            let (Some(before), Some(_)) = (m.get(from..at), m.get(at..end)) else {
                // A figure that does not fit the message (not made by
                // `with_figures`): the message as it stands.
                return Cow::Borrowed(m);
            };
            out.push_str(before);
            out.push_str(&units::format_display(
                units::to_display(system, f.quantity, f.value),
                4,
            ));
            let unit = units::display_unit(system, f.quantity);
            if !unit.is_empty() {
                out.push(' ');
                out.push_str(unit);
            }
            from = end;
        }
        out.push_str(m.get(from..).unwrap_or(""));
        Cow::Owned(out)
    }
}

#[cfg(test)]
mod tests {
    #![allow(clippy::unwrap_used, clippy::indexing_slicing)]
    use super::*;

    #[test]
    fn a_force_reads_in_kn_in_si_and_in_kip_in_us() {
        // 1 kip = 4.4482216152605 kN exactly (NIST SP 811, 2008, App. B),
        // so 444.8 kN is 100.0 kip to four figures and 2845.3 kN 639.7 kip.
        let w = Warning::with_figures(
            "b1-unbounded",
            "axial_kn: alpha P_r = {} reaches P_e1 = {} here",
            &[(444.822, Quantity::Force, 1), (2845.31, Quantity::Force, 1)],
        );
        assert_eq!(
            w.message,
            "axial_kn: alpha P_r = 444.8 kN reaches P_e1 = 2845.3 kN here"
        );
        assert_eq!(w.text(UnitSystem::Si), w.message);
        assert!(matches!(w.text(UnitSystem::Si), Cow::Borrowed(_)));
        assert_eq!(
            w.text(UnitSystem::Us),
            "axial_kn: alpha P_r = 100 kip reaches P_e1 = 639.7 kip here"
        );
        // The JSON is the code and the engine-unit message, as before.
        assert_eq!(
            serde_json::to_string(&w).unwrap(),
            r#"{"code":"b1-unbounded","message":"axial_kn: alpha P_r = 444.8 kN reaches P_e1 = 2845.3 kN here"}"#
        );
    }

    #[test]
    fn lengths_stresses_and_texts_without_figures() {
        // A member length in ft (3048 mm = 10 ft exactly), a section
        // thickness in in (25.4 mm = 1 in), a stress in ksi (345 MPa =
        // 50.04 ksi: 1 ksi = 6.894757 MPa).
        let w = Warning::with_figures(
            "x",
            "L = {}, t = {}, f_y = {}; {} left",
            &[
                (3048.0, Quantity::Span, 0),
                (25.4, Quantity::Length, 1),
                (345.0, Quantity::Stress, 0),
            ],
        );
        assert_eq!(
            w.message,
            "L = 3048 mm, t = 25.4 mm, f_y = 345 MPa; {} left"
        );
        assert_eq!(
            w.text(UnitSystem::Us),
            "L = 10 ft, t = 1 in, f_y = 50.04 ksi; {} left"
        );
        let fixed = Warning::new("make-assumed", "a fixed text, 5 mm as written");
        assert!(matches!(fixed.message, Cow::Borrowed(_)));
        assert!(fixed.figures.is_empty());
        assert!(matches!(fixed.text(UnitSystem::Us), Cow::Borrowed(_)));
        // More figures than markers: the extra one is left out.
        let w = Warning::with_figures(
            "x",
            "N = {}",
            &[(1.0, Quantity::Force, 0), (2.0, Quantity::Force, 0)],
        );
        assert_eq!(w.message, "N = 1 kN");
        assert_eq!(w.figures.len(), 1);
    }
}
