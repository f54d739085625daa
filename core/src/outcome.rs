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

/// The words every front end writes for a utilisation that has no finite
/// value (the command line's table, the app's verdict, list rows, working
/// and calc sheet; the JSON keeps `null`). The engine's utilisation is not
/// finite only where a capacity is zero: an axial load at or beyond an
/// elastic critical load, where the amplification of the beam-column
/// equations (EN 1993-1-1 Annex A/B, AISC 360-16 B1, CSA S16-19 U_1) has no
/// finite value. A dash would read as "not checked".
pub const BEYOND_CRITICAL: &str = "beyond N_cr";

/// A utilisation as every front end writes it: to `decimals` places, or
/// [`BEYOND_CRITICAL`] where it is infinite ("not a number" for NaN, which
/// the engine never gives).
pub fn utilisation_text(utilisation: f64, decimals: usize) -> Cow<'static, str> {
    if utilisation.is_finite() {
        Cow::Owned(format!("{utilisation:.decimals$}"))
    } else if utilisation.is_nan() {
        Cow::Borrowed("not a number")
    } else {
        Cow::Borrowed(BEYOND_CRITICAL)
    }
}

/// A caution attached to a result.
///
/// Its message is a text with, where it gives the member's numbers or
/// words, the arguments kept apart from it (`{}` in the text for each, in
/// order): a number with a unit stays typed ([`Arg::Figure`]: value in the
/// engine's unit and its [`Quantity`]), so nothing is formatted while
/// checking, and a front end shows it in its unit system through
/// [`Warning::text`], the one function that renders it. [`Warning::message`]
/// is the text in the engine's own units (mm, kN, MPa, kNm, as the member
/// file stores them): what the JSON of results gives (`{"code",
/// "message"}`, stable for scripts) and what the command line prints.
#[derive(Debug, Clone, PartialEq)]
pub struct Warning {
    /// Stable short code, for scripts ("torsional-not-checked").
    pub code: &'static str,
    /// The text: the whole message without arguments (most are fixed
    /// texts, kept without allocating), else its template.
    text: Cow<'static, str>,
    /// The arguments of the template, in order (empty, and not allocated,
    /// for a message without them).
    args: Box<[Arg]>,
}

/// An argument of a warning's message ([`Warning::with_args`]).
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Arg {
    /// A number: its value in the engine's unit of `quantity` (mm, kN,
    /// MPa, kNm; a ratio is [`Quantity::Dimensionless`]) and the decimals
    /// it is written with in those units ([`Warning::AS_GIVEN`]: as `{}`
    /// writes it).
    Figure {
        /// The value.
        value: f64,
        /// Its kind, which sets its unit in each system.
        quantity: Quantity,
        /// Decimals in the engine's units.
        decimals: usize,
    },
    /// A word: a member-file key, an axis, a clause.
    Word(&'static str),
}

impl Arg {
    /// A number with a unit, written with `decimals` in the engine's units.
    pub fn figure(value: f64, quantity: Quantity, decimals: usize) -> Arg {
        Arg::Figure {
            value,
            quantity,
            decimals,
        }
    }
}

impl Serialize for Warning {
    fn serialize<S: serde::Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        use serde::ser::SerializeStruct;
        let mut st = s.serialize_struct("Warning", 2)?;
        st.serialize_field("code", self.code)?;
        st.serialize_field("message", &*self.message())?;
        st.end()
    }
}

impl Warning {
    /// The decimals of a figure written as `{}` writes it (the shortest
    /// text that reads back as the value), in [`Arg::Figure`].
    pub const AS_GIVEN: usize = usize::MAX;

    /// A warning with a code and a message without arguments.
    pub fn new(code: &'static str, message: impl Into<Cow<'static, str>>) -> Warning {
        Warning {
            code,
            text: message.into(),
            args: Box::default(),
        }
    }

    /// A warning whose message has the member's numbers or words:
    /// `template` with `{}` standing for each of `args` in turn. Nothing is
    /// formatted here (one small allocation for the arguments); a marker
    /// without an argument stays as it is, an argument without a marker is
    /// left out.
    pub fn with_args(code: &'static str, template: &'static str, args: &[Arg]) -> Warning {
        Warning {
            code,
            text: Cow::Borrowed(template),
            args: Box::from(args),
        }
    }

    /// The message in the engine's units (what the JSON gives): the text
    /// itself, borrowed, without arguments.
    pub fn message(&self) -> Cow<'_, str> {
        self.render(None)
    }

    /// The message without arguments, borrowed; `None` for one with
    /// arguments (use [`Warning::message`]).
    pub fn fixed(&self) -> Option<&str> {
        self.args.is_empty().then_some(&*self.text)
    }

    /// The message in `system`'s units: in SI the engine's units (as
    /// [`Warning::message`]); in US customary each number with a unit in
    /// its display unit (kip, in, ft, ksi, kip·ft) to four significant
    /// figures. Borrowed for a message without arguments.
    pub fn text(&self, system: UnitSystem) -> Cow<'_, str> {
        self.render(Some(system).filter(|s| *s != UnitSystem::Si))
    }

    /// The one rendering: `None` in the engine's units.
    fn render(&self, system: Option<UnitSystem>) -> Cow<'_, str> {
        use std::fmt::Write;
        if self.args.is_empty() {
            return Cow::Borrowed(&self.text);
        }
        let mut out = String::with_capacity(self.text.len() + 12 * self.args.len());
        let mut rest: &str = &self.text;
        let mut args = self.args.iter();
        while let Some(i) = rest.find('{') {
            let (before, after) = rest.split_at(i);
            out.push_str(before);
            let Some(tail) = after.strip_prefix(MARK) else {
                out.push('{');
                rest = after.get(1..).unwrap_or("");
                continue;
            };
            rest = tail;
            // Writing to a String cannot fail.
            let _ = match args.next() {
                None => write!(out, "{MARK}"),
                Some(Arg::Word(w)) => write!(out, "{w}"),
                Some(&Arg::Figure {
                    value,
                    quantity,
                    decimals,
                }) => match (system, units::us_unit(quantity)) {
                    (Some(sys), Some(_)) => write!(
                        out,
                        "{} {}",
                        units::format_display(units::to_display(sys, quantity, value), 4),
                        units::display_unit(sys, quantity)
                    ),
                    _ => {
                        if decimals == Warning::AS_GIVEN {
                            let _ = write!(out, "{value}");
                        } else {
                            let _ = write!(out, "{value:.decimals$}");
                        }
                        let unit = quantity.engine_unit();
                        if unit.is_empty() {
                            Ok(())
                        } else {
                            write!(out, " {unit}")
                        }
                    }
                },
            };
        }
        out.push_str(rest);
        Cow::Owned(out)
    }
}

/// The marker of an argument in a warning's template.
const MARK: &str = "{}";

#[cfg(test)]
mod tests {
    use super::*;

    /// An infinite utilisation is words, not a dash or "inf" (review N4).
    #[test]
    fn a_utilisation_beyond_the_critical_load_is_words() {
        assert_eq!(utilisation_text(0.6334, 3), "0.633");
        assert_eq!(utilisation_text(f64::INFINITY, 3), "beyond N_cr");
        assert_eq!(utilisation_text(f64::NAN, 3), "not a number");
        // HE 200 B S355, 4 m, N_Ed = 3114 kN with end moments 50 / -25 kNm:
        // N_Ed / N_cr,z = 1.2, the Annex B factors have no finite value.
        let m: crate::member::Member = serde_json::from_value(serde_json::json!({
            "id": "C1", "section": {"kind": "catalogue", "designation": "HE 200 B"},
            "material": {"grade": "S355"}, "length_mm": 4000, "axial_kn": 3114,
            "m_major_a_knm": 50, "m_major_b_knm": -25, "method": "en1993-1-1"
        }))
        .unwrap();
        let r = crate::check::check_member(&m).unwrap();
        assert!(!r.passes);
        assert_eq!(utilisation_text(r.utilisation, 3), BEYOND_CRITICAL);
    }

    #[test]
    fn a_force_reads_in_kn_in_si_and_in_kip_in_us() {
        // 1 kip = 4.4482216152605 kN exactly (NIST SP 811, 2008, App. B),
        // so 444.8 kN is 100.0 kip to four figures and 2845.3 kN 639.7 kip.
        let w = Warning::with_args(
            "b1-unbounded",
            "{}: alpha P_r = {} reaches P_e1 = {} here",
            &[
                Arg::Word("axial_kn"),
                Arg::figure(444.822, Quantity::Force, 1),
                Arg::figure(2845.31, Quantity::Force, 1),
            ],
        );
        let si = "axial_kn: alpha P_r = 444.8 kN reaches P_e1 = 2845.3 kN here";
        assert_eq!(w.message(), si);
        assert_eq!(w.text(UnitSystem::Si), si);
        assert_eq!(
            w.text(UnitSystem::Us),
            "axial_kn: alpha P_r = 100 kip reaches P_e1 = 639.7 kip here"
        );
        assert_eq!(w.fixed(), None);
        // The JSON is the code and the engine-unit message.
        assert_eq!(
            serde_json::to_string(&w).unwrap(),
            format!(r#"{{"code":"b1-unbounded","message":"{si}"}}"#)
        );
    }

    #[test]
    fn lengths_stresses_ratios_and_texts_without_arguments() {
        // A member length in ft (3048 mm = 10 ft exactly), a section
        // thickness in in (25.4 mm = 1 in), a stress in ksi (345 MPa =
        // 50.04 ksi: 1 ksi = 6.894757 MPa); a ratio as written.
        let w = Warning::with_args(
            "x",
            "L = {}, t = {}, f_y = {}, N/N_cr = {}; {} left, {a} kept",
            &[
                Arg::figure(3048.0, Quantity::Span, 0),
                Arg::figure(25.4, Quantity::Length, Warning::AS_GIVEN),
                Arg::figure(345.0, Quantity::Stress, 0),
                Arg::figure(0.98765, Quantity::Dimensionless, 3),
            ],
        );
        assert_eq!(
            w.message(),
            "L = 3048 mm, t = 25.4 mm, f_y = 345 MPa, N/N_cr = 0.988; {} left, {a} kept"
        );
        assert_eq!(
            w.text(UnitSystem::Us),
            "L = 10 ft, t = 1 in, f_y = 50.04 ksi, N/N_cr = 0.988; {} left, {a} kept"
        );
        let fixed = Warning::new("make-assumed", "a fixed text, 5 mm as written");
        assert!(matches!(fixed.message(), Cow::Borrowed(_)));
        assert!(matches!(fixed.text(UnitSystem::Us), Cow::Borrowed(_)));
        assert_eq!(fixed.fixed(), Some("a fixed text, 5 mm as written"));
        // More arguments than markers: the extra one is left out.
        let w = Warning::with_args(
            "x",
            "N = {}",
            &[
                Arg::figure(1.0, Quantity::Force, 0),
                Arg::figure(2.0, Quantity::Force, 0),
            ],
        );
        assert_eq!(w.message(), "N = 1 kN");
    }
}
