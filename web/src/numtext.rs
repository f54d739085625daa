//! Numbers as people type them: a decimal comma or a decimal point, spaces
//! as thousands separators; and numbers as the app shows them.

/// Why a piece of text is not a usable number. The message names the
/// member-file field, the way the engine's errors do.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum NumError {
    /// Nothing typed where a value is required.
    Empty,
    /// Not a number by the rules of core's reader.
    NotNumber,
    /// A number that reads two ways (`1,234`); core's message says how to
    /// type either.
    Ambiguous(String),
}

impl NumError {
    /// The message shown beside the field.
    pub fn message(&self, field: &str) -> String {
        match self {
            NumError::Empty => format!("{field}: enter a value"),
            NumError::NotNumber => {
                format!(
                    "{field}: must be a number (digits, with a point or a comma as decimal mark)"
                )
            }
            NumError::Ambiguous(why) => format!("{field}: {why}"),
        }
    }
}

/// Reads a number typed into a field: core's one reader of typed numbers
/// ([`strutline_core::csv::parse_field`]: a single `,` or `.` is the
/// decimal mark; with both, the last is; spaces group thousands).
pub fn parse_number(text: &str) -> Result<f64, NumError> {
    if text.trim().is_empty() {
        return Err(NumError::Empty);
    }
    strutline_core::csv::parse_field(text).map_err(|e| {
        if e.contains("could be") {
            NumError::Ambiguous(e)
        } else {
            NumError::NotNumber
        }
    })
}

/// Reads an optional number: empty text is `None`.
pub fn parse_optional(text: &str) -> Result<Option<f64>, NumError> {
    if text.trim().is_empty() {
        Ok(None)
    } else {
        parse_number(text).map(Some)
    }
}

/// A number for a text field: as short as exact, no trailing zeros.
pub fn for_input(v: f64) -> String {
    if v.is_finite() {
        let s = format!("{v}");
        if s == "-0" {
            "0".into()
        } else {
            s
        }
    } else {
        String::new()
    }
}

/// A number with a fixed count of decimals ("0.734"); not-finite reads "—".
pub fn fixed(v: f64, decimals: usize) -> String {
    if v.is_finite() {
        format!("{v:.decimals$}")
    } else {
        "—".into()
    }
}

/// A utilisation to three decimals, in words where it has no finite value
/// (core's `outcome::utilisation_text`, the one text the command line
/// writes too: "beyond N_cr", never the dash that means "not checked").
pub fn utilisation(v: f64) -> String {
    strutline_core::outcome::utilisation_text(v, 3).into_owned()
}

/// A value of the working, with about four significant figures; very large
/// or very small magnitudes in powers of ten ("1.234e6").
pub fn working(v: f64) -> String {
    if !v.is_finite() {
        return "—".into();
    }
    let a = v.abs();
    if a == 0.0 {
        return "0".into();
    }
    if !(1e-3..1e6).contains(&a) {
        let exp = a.log10().floor() as i32;
        let mant = v / 10f64.powi(exp);
        // Rounding can carry the mantissa to 10.
        let (mant, exp) = if mant.abs() >= 9.9995 {
            (mant / 10.0, exp + 1)
        } else {
            (mant, exp)
        };
        return format!("{mant:.3}e{exp}");
    }
    let digits = 3 - a.log10().floor() as i32;
    let decimals = digits.clamp(0, 6) as usize;
    let s = format!("{v:.decimals$}");
    if s.contains('.') {
        s.trim_end_matches('0').trim_end_matches('.').to_string()
    } else {
        s
    }
}

/// How far below its section's size a geometric value is taken for zero:
/// one part in 10^9 (a double carries some 16 figures, so what the
/// section's arithmetic leaves of a true zero, such as the shear centre of
/// a doubly symmetric I at -1.4e-14 mm, lies many orders below this, and
/// no section's real offset or property does).
pub const ZERO_PART: f64 = 1e-9;

/// A value of a geometric unit (`mm`, `mm2`, ..., `mm6`) as it is shown:
/// 0 where its size is below [`ZERO_PART`] of the section's own size
/// `size_mm` raised to the unit's power (mm⁴ against size⁴); any other
/// unit, or a section with no size, as it is.
pub fn nought(v: f64, unit: &str, size_mm: f64) -> f64 {
    let power = match unit {
        "mm" => 1,
        "mm2" => 2,
        "mm3" => 3,
        "mm4" => 4,
        "mm6" => 6,
        _ => return v,
    };
    if size_mm.is_finite() && size_mm > 0.0 && v.abs() < ZERO_PART * size_mm.powi(power) {
        0.0
    } else {
        v
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn reads_comma_and_point() {
        assert_eq!(parse_number("12.5"), Ok(12.5));
        assert_eq!(parse_number("12,5"), Ok(12.5));
        assert_eq!(parse_number(" 3 000 "), Ok(3000.0));
        assert_eq!(parse_number("-0,25"), Ok(-0.25));
        assert_eq!(parse_number("1e3"), Ok(1000.0));
        assert_eq!(parse_number(",5"), Ok(0.5));
        // A single mark is the decimal mark, followed by three digits too.
        // Ambiguous (1234 or 1.234?): refused, naming both ways to type it.
        match parse_number("1,234") {
            Err(NumError::Ambiguous(why)) => {
                assert!(why.contains("1234") && why.contains("1.234"), "{why}")
            }
            other => panic!("1,234 must be refused as ambiguous, got {other:?}"),
        }
        assert_eq!(parse_number("12,5"), Ok(12.5));
        assert_eq!(parse_number("1.234"), Ok(1.234));
        assert_eq!(parse_number("120,5"), Ok(120.5));
        assert_eq!(parse_number("0,65"), Ok(0.65));
    }

    #[test]
    fn refuses_what_is_not_a_number() {
        assert_eq!(parse_number(""), Err(NumError::Empty));
        assert_eq!(parse_number("   "), Err(NumError::Empty));
        assert_eq!(parse_number("abc"), Err(NumError::NotNumber));
        assert_eq!(parse_number("inf"), Err(NumError::NotNumber));
        assert_eq!(parse_number("NaN"), Err(NumError::NotNumber));
        assert_eq!(parse_number("1,2,3"), Err(NumError::NotNumber));
        // Both marks: the last is the decimal mark (core's rule 1).
        assert_eq!(parse_number("1.234,5"), Ok(1234.5));
        assert_eq!(parse_number("1,234.5"), Ok(1234.5));
        assert_eq!(parse_number("12mm"), Err(NumError::NotNumber));
        assert_eq!(parse_number("."), Err(NumError::NotNumber));
        assert_eq!(parse_number("1e999"), Err(NumError::NotNumber));
    }

    #[test]
    fn messages_name_the_field() {
        assert_eq!(
            NumError::NotNumber.message("depth_mm"),
            "depth_mm: must be a number (digits, with a point or a comma as decimal mark)"
        );
        assert!(NumError::Empty
            .message("length_mm")
            .starts_with("length_mm:"));
    }

    #[test]
    fn optional_empty_is_none() {
        assert_eq!(parse_optional(""), Ok(None));
        assert_eq!(parse_optional("2,5"), Ok(Some(2.5)));
        assert_eq!(parse_optional("x"), Err(NumError::NotNumber));
    }

    #[test]
    fn rounding_left_of_a_zero_is_shown_as_zero() {
        // A 200 mm I (A = 7808 mm², size about 88 mm): its shear centre
        // offset as worked, -1.4e-14 mm, is 0; a real 0.5 mm offset is not.
        let size = 7808f64.sqrt();
        assert_eq!(nought(-1.4e-14, "mm", size), 0.0);
        assert_eq!(working(nought(-1.4e-14, "mm", size)), "0");
        assert_eq!(nought(0.5, "mm", size), 0.5);
        assert_eq!(nought(-2.842e-14, "mm", 140.0), 0.0);
        // By the unit's power: 1e-3 mm⁴ is 1.7e-11 of 88⁴ = 6.1e7 mm⁴,
        // nothing; 1e-3 mm is 1.1e-5 of 88 mm, a length to show.
        assert_eq!(nought(1e-3, "mm4", size), 0.0);
        assert_eq!(nought(1e-3, "mm", size), 1e-3);
        // Not a length unit, or no size: as it is.
        assert_eq!(nought(1e-14, "kN", size), 1e-14);
        assert_eq!(nought(1e-14, "mm", 0.0), 1e-14);
        assert_eq!(nought(1e-14, "mm", f64::NAN), 1e-14);
    }

    #[test]
    fn formats() {
        assert_eq!(for_input(300.0), "300");
        assert_eq!(for_input(0.65), "0.65");
        assert_eq!(for_input(-0.0), "0");
        assert_eq!(fixed(0.7344, 3), "0.734");
        assert_eq!(fixed(1.0, 3), "1.000");
        assert_eq!(fixed(f64::INFINITY, 3), "—");
        assert_eq!(working(1234.567), "1235");
        assert_eq!(working(12.3456), "12.35");
        assert_eq!(working(0.73449), "0.7345");
        assert_eq!(working(0.5), "0.5");
        assert_eq!(working(210000.0), "210000");
        assert_eq!(working(8.5e7), "8.500e7");
        assert_eq!(working(9.99999e6), "1.000e7");
        assert_eq!(working(2.5e-5), "2.500e-5");
        assert_eq!(working(0.0), "0");
    }
}
