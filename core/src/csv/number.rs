//! Number cells: decimal point or comma, thousands groups, feet and
//! inches (the rules are in the documentation of [`super`]).

use crate::units::{self, Quantity, UnitSystem};

/// The decimal mark a file uses for the ambiguous `1,234` / `1.234`.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(super) enum Mark {
    Point,
    Comma,
    /// What a person types into one field, with no file to set a
    /// convention: a single point is the decimal mark (`1.234` is 1.234);
    /// a single comma followed by exactly three digits (`1,234`) is
    /// refused as ambiguous (1234 with a thousands comma, or 1.234 with a
    /// decimal comma: reading a load 1,000 times too small is the unsafe
    /// side); any other single comma is the decimal mark (`12,5`).
    Single,
}

pub(super) fn is_group_space(c: char) -> bool {
    c == ' ' || c == '\u{a0}' || c == '\u{202f}' || c == '\u{2009}'
}

/// Which decimal mark a number cell shows unambiguously (rules 1 and 3).
pub(super) fn decides(text: &str) -> Option<Mark> {
    let t = text.trim();
    let last_dot = t.rfind('.');
    let last_comma = t.rfind(',');
    match (last_dot, last_comma) {
        (Some(d), Some(c)) => Some(if d > c { Mark::Point } else { Mark::Comma }),
        (Some(_), None) if t.matches('.').count() == 1 => single_decides(t, '.'),
        (None, Some(_)) if t.matches(',').count() == 1 => single_decides(t, ','),
        _ => None,
    }
    .filter(|_| t.chars().any(|c| c.is_ascii_digit()))
}

pub(super) fn single_decides(t: &str, mark: char) -> Option<Mark> {
    let (before, after) = t.split_once(mark)?;
    let after_digits = after.chars().take_while(|c| c.is_ascii_digit()).count();
    let before_digits: String = before.chars().filter(|c| c.is_ascii_digit()).collect();
    let decimal = after_digits != 3 || before_digits.is_empty() || before_digits.starts_with('0');
    if decimal {
        Some(if mark == '.' {
            Mark::Point
        } else {
            Mark::Comma
        })
    } else {
        None
    }
}

/// Parses a number cell by the rules in the module documentation.
pub(super) fn parse_number(raw: &str, file_mark: Mark) -> Result<f64, String> {
    let t = raw.trim();
    if t.is_empty() {
        return Err("the cell is empty".into());
    }
    let mut chars = t.chars().peekable();
    let mut sign = "";
    match chars.peek() {
        Some('-') | Some('−') => {
            sign = "-";
            chars.next();
        }
        Some('+') => {
            chars.next();
        }
        _ => {}
    }
    let rest: String = chars.collect();
    let (mantissa, exponent) = match rest.find(['e', 'E']) {
        Some(at) => {
            let (m, e) = rest.split_at(at);
            (m.to_string(), Some(e.get(1..).unwrap_or("").to_string()))
        }
        None => (rest, None),
    };
    let not_number = || format!("\"{t}\" is not a number");
    if mantissa
        .chars()
        .any(|c| !(c.is_ascii_digit() || c == '.' || c == ',' || is_group_space(c)))
    {
        return Err(not_number());
    }
    let dots = mantissa.matches('.').count();
    let commas = mantissa.matches(',').count();
    let has_space = mantissa.trim().chars().any(is_group_space);
    // Decide the decimal mark of this cell (None: no decimal part).
    let decimal: Option<char> = if dots > 0 && commas > 0 {
        let d = mantissa.rfind('.').unwrap_or(0);
        let c = mantissa.rfind(',').unwrap_or(0);
        let m = if d > c { '.' } else { ',' };
        if mantissa.matches(m).count() > 1 {
            return Err(format!(
                "\"{t}\" has more than one decimal mark '{m}' after the thousands separators"
            ));
        }
        Some(m)
    } else if dots + commas == 0 {
        None
    } else {
        let m = if dots > 0 { '.' } else { ',' };
        if dots + commas > 1 {
            None // rule 2: repeated mark groups thousands
        } else if has_space {
            Some(m) // spaces group thousands, so the single mark is decimal
        } else {
            match single_decides(&mantissa, m) {
                Some(_) => Some(m),
                None => {
                    let file_decimal = match file_mark {
                        Mark::Point => '.',
                        Mark::Comma => ',',
                        Mark::Single if m == ',' => {
                            return Err(format!(
                                "\"{t}\" could be a number with a thousands comma or with a \
                                 decimal comma; type it without the comma ({}) or with a \
                                 decimal point ({})",
                                mantissa.replace(',', ""),
                                mantissa.replace(',', ".")
                            ));
                        }
                        Mark::Single => m,
                    };
                    if m == file_decimal {
                        Some(m)
                    } else {
                        None
                    }
                }
            }
        }
    };
    let (int_part, frac_part) = match decimal {
        Some(m) => match mantissa.rsplit_once(m) {
            Some((a, b)) => (a.to_string(), b.to_string()),
            None => (mantissa.clone(), String::new()),
        },
        None => (mantissa.clone(), String::new()),
    };
    if !frac_part.chars().all(|c| c.is_ascii_digit()) {
        return Err(format!("\"{t}\": only digits may follow the decimal mark"));
    }
    // The integer part: digits, optionally in groups of three.
    let int_part = int_part.trim();
    let groups: Vec<&str> = int_part
        .split(|c: char| c == '.' || c == ',' || is_group_space(c))
        .collect();
    if groups.len() > 1 {
        let ok_first = groups
            .first()
            .map(|g| (1..=3).contains(&g.len()) && !g.starts_with('0'))
            .unwrap_or(false);
        let ok_rest = groups.iter().skip(1).all(|g| g.len() == 3);
        let one_separator = {
            let mut seps = int_part.chars().filter(|c| !c.is_ascii_digit()).map(|c| {
                if is_group_space(c) {
                    ' '
                } else {
                    c
                }
            });
            let first = seps.next();
            seps.all(|c| Some(c) == first)
        };
        if !(ok_first && ok_rest && one_separator) {
            return Err(format!(
                "\"{t}\": thousands must be grouped in threes (e.g. 1,234.5 or 1.234,5 or 1 234,5)"
            ));
        }
    }
    let digits: String = groups.concat();
    if digits.is_empty() && frac_part.is_empty() {
        return Err(not_number());
    }
    let mut normal = format!(
        "{sign}{}.{}",
        if digits.is_empty() { "0" } else { &digits },
        if frac_part.is_empty() {
            "0"
        } else {
            &frac_part
        }
    );
    if let Some(e) = exponent {
        let e = e.trim();
        let body = e.strip_prefix(['+', '-']).unwrap_or(e);
        if body.is_empty() || !body.chars().all(|c| c.is_ascii_digit()) {
            return Err(format!(
                "\"{t}\": the exponent after 'e' must be a whole number"
            ));
        }
        normal.push('e');
        normal.push_str(e);
    }
    // Through serde_json's reader: the wasm then carries one float parser.
    let v = crate::decimal::parse(&normal).ok_or_else(not_number)?;
    if v.is_finite() {
        Ok(v)
    } else {
        Err(format!("\"{t}\" is too large"))
    }
}

/// Feet-and-inches text in millimetres; `None` when the text has no foot or
/// inch mark (then it is a plain number in the column's unit).
pub(super) fn parse_feet_inches(raw: &str, mark: Mark) -> Option<Result<f64, String>> {
    // ASCII case only: the marks and words matched are ASCII or caseless.
    let mut t = raw.trim().to_ascii_lowercase();
    for (from, to) in [
        ("′", "'"),
        ("’", "'"),
        ("″", "\""),
        ("”", "\""),
        ("''", "\""),
        ("feet", "'"),
        ("foot", "'"),
        ("ft", "'"),
        ("inches", "\""),
        ("inch", "\""),
        ("in", "\""),
    ] {
        t = t.replace(from, to);
    }
    if !t.contains('\'') && !t.contains('"') {
        return None;
    }
    Some(feet_inches_inner(raw.trim(), &t, mark))
}

pub(super) fn feet_inches_inner(raw: &str, t: &str, mark: Mark) -> Result<f64, String> {
    let bad = || {
        format!("\"{raw}\" is not a length in feet and inches (write e.g. 13'-6\" or 13' 6-1/2\")")
    };
    let (feet, rest) = match t.split_once('\'') {
        Some((f, r)) => (parse_number(f, mark).map_err(|_| bad())?, r.trim()),
        None => (0.0, t.trim()),
    };
    let rest = rest.strip_prefix('-').unwrap_or(rest).trim();
    let inches = if rest.is_empty() {
        0.0
    } else {
        let body = rest.strip_suffix('"').unwrap_or(rest).trim();
        if body.contains('"') || body.contains('\'') || body.is_empty() {
            return Err(bad());
        }
        parse_inches(body, mark).ok_or_else(bad)?
    };
    if feet < 0.0 || inches < 0.0 {
        return Err(bad());
    }
    Ok(units::ft_to_mm(feet) + units::in_to_mm(inches))
}

/// "6", "6.5", "6-1/2", "6 1/2", "1/2".
pub(super) fn parse_inches(body: &str, mark: Mark) -> Option<f64> {
    let Some((left, den)) = body.rsplit_once('/') else {
        return parse_number(body, mark).ok();
    };
    let den: u64 = den.trim().parse().ok()?;
    let (whole, num) = match left.trim().rsplit_once(['-', ' ']) {
        Some((w, n)) => (parse_number(w, mark).ok()?, n.trim()),
        None => (0.0, left.trim()),
    };
    let num: u64 = num.parse().ok()?;
    if den == 0 {
        return None;
    }
    Some(whole + num as f64 / den as f64)
}

/// Reads a number a person typed into one field (rule 5 of [`super`]: a
/// single mark is the decimal mark; both marks, repeated marks and spaces
/// group thousands as in a file). The app reads every number field with it.
pub fn parse_field(text: &str) -> Result<f64, String> {
    parse_number(text, Mark::Single)
}

/// Reads a number a person typed for member-file key `key` in the display
/// unit of `system` (see [`units::display_unit`]; SI member lengths are
/// shown in metres) and returns the value to store, in the key's own unit.
/// The number forms of [`parse_field`] are accepted. In US units, lengths
/// may also be typed in feet and inches (`13'-6"`, `6 1/2"`), whatever the
/// unit shown.
pub fn parse_typed(text: &str, key: &str, system: UnitSystem) -> Result<f64, String> {
    let mark = Mark::Single;
    let q = Quantity::of_key(key).unwrap_or(Quantity::Dimensionless);
    if system == UnitSystem::Us && matches!(q, Quantity::Span | Quantity::Length) {
        if let Some(mm) = parse_feet_inches(text, mark) {
            return mm;
        }
    }
    parse_number(text, mark).map(|v| units::from_display(system, q, v))
}
