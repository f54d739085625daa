//! Member files as CSV, for spreadsheets: one member a row.
//!
//! # Columns
//!
//! The columns are the member file's keys flattened: the member's own keys
//! (`id`, `length_mm`, `axial_kn`, `method`, `k_minor`, `gamma_m1`, ...),
//! the section's keys without a prefix (`kind`, `depth_mm`, `width_mm`,
//! `designation`, ...) and the material's keys likewise (`grade`, or
//! `fy_mpa` and `e_mpa`, or the timber keys `fc0k_mpa`, `e005_mpa`,
//! `e0mean_mpa`, `timber`); `angle_connection`'s keys take the prefix
//! `angle_` (`angle_leg`: `long` or `short`; `angle_truss`: `planar` or
//! `space`, needing `angle_leg`). Header names are read without regard to case,
//! surrounding spaces, or spaces and hyphens in place of underscores. An
//! empty cell means the key is absent (its default applies); a quoted empty
//! cell (`""`) is an empty text.
//!
//! Every key with a unit suffix is also accepted in its US customary form,
//! converted exactly ([`crate::units`]): `_in` or `_ft` for `_mm`, `_in2`,
//! `_in4`, `_in6`, `_kip` for `_kn`, `_ksi` for `_mpa`, `_kipft` for
//! `_knm`. So `length_ft`, `depth_in`, `axial_kip` and `fy_ksi` are columns
//! too. `_ft` and `_in` cells may also be written in feet and inches:
//! `13'-6"`, `13' 6-1/2"`, `13'6"`, `6 1/2"`, `1/2"`, `13'` (typographic
//! primes ′ ″ and the words `ft`/`in` are accepted as well).
//!
//! # Numbers
//!
//! Numbers may use a decimal point or a decimal comma and may group
//! thousands with points, commas or spaces (including no-break spaces).
//! The rule, applied to each cell:
//!
//! 1. When a cell holds both `.` and `,`, the one that comes last is the
//!    decimal mark and the other groups thousands (`1,234.5` and
//!    `1.234,5` are both 1234.5).
//! 2. A mark that occurs more than once groups thousands (`1.234.567`).
//! 3. A single mark not followed by exactly three digits, or after a
//!    leading `0`, is the decimal mark (`2,5`, `0.125`, `1,2345`).
//! 4. A single mark followed by exactly three digits (`1,234`) is read by
//!    the file's convention: with `;` as the separator a comma is the
//!    decimal mark (1.234) and a point groups thousands; with `,` as the
//!    separator a point is the decimal mark and a comma groups thousands
//!    (1234); in a tab-separated file the first number of the file that
//!    rule 1 or 3 decides sets the convention (decimal point when none).
//!
//! Thousands groups must be three digits each after the first group of one
//! to three (not starting with 0); when spaces group the thousands, a single
//! `,` or `.` is the decimal mark (`1 234,567` is 1234.567). A leading
//! `+`, `-` or `−` and an exponent (`1.5e3`) are read; anything else in a
//! number cell (units, words) is a problem.
//!
//! # The file
//!
//! The separator is `,`, `;` or tab, whichever occurs most in the header
//! line (a first line `sep=;` as some spreadsheets write also sets it). A
//! UTF-8 byte-order mark, CRLF or LF line ends, quoted fields with doubled
//! quotes and embedded separators or line breaks, and blank rows (also
//! rows of empty cells) are accepted. The engine sets no limit on a file's
//! size or rows; an edge that needs one (the app's import) applies its own
//! ([`parse_csv_within`]), and the command line reads long files a block of
//! rows at a time ([`separator`] tells how to cut them).
//!
//! Reading never stops at the first problem: every row and every field is
//! checked, and each problem names the line, the column and what was
//! expected, so a front end can show them all and keep the valid rows.
//! A row is read into the member file's own types, so a CSV file accepts
//! exactly what the JSON member file accepts; whether the values make a
//! sound member (positive lengths, a known grade) is left to the check, as
//! for JSON. A CSV file has no title; [`read_any`] takes it from the file
//! name.
//!
//! Writing ([`to_csv`]) uses SI keys, `,` as the separator, CRLF line ends
//! (RFC 4180) and the shortest text that reads back to the same number, so
//! JSON -> CSV -> JSON keeps every member exactly.

use std::fmt;

use serde::Serialize;
use serde_json::{Map, Value};

use crate::file::{self, MemberFile};
use crate::member::Member;
use crate::method::Method;
use crate::units::{self, Quantity, UnitSystem, UsUnit};

/// One problem in a CSV file.
#[derive(Debug, Clone, PartialEq, Eq, Serialize)]
pub struct RowProblem {
    /// The line the row starts on (1-based); 0 for the file as a whole.
    pub line: usize,
    /// The column as written in the header ("" for the file or the row).
    pub column: String,
    /// What the field should hold.
    pub expected: String,
    /// What is wrong, in words.
    pub message: String,
}

impl fmt::Display for RowProblem {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        if self.line > 0 {
            write!(f, "line {}", self.line)?;
        } else {
            write!(f, "file")?;
        }
        if !self.column.is_empty() {
            write!(f, ", column {}", self.column)?;
        }
        write!(f, ": {}", self.message)?;
        if !self.expected.is_empty() {
            write!(f, " (expected {})", self.expected)?;
        }
        Ok(())
    }
}

/// The outcome of reading a CSV file: the valid members and every problem.
#[derive(Debug, Clone, PartialEq, Default, Serialize)]
pub struct CsvImport {
    /// The members of the rows without problems, in file order.
    pub members: Vec<Member>,
    /// The line each member's row starts on, parallel to `members`.
    pub member_lines: Vec<usize>,
    /// Every problem found, in file order.
    pub problems: Vec<RowProblem>,
    /// Data rows read (blank rows not counted).
    pub rows: usize,
}

fn problem(
    line: usize,
    column: impl Into<String>,
    expected: impl Into<String>,
    message: impl Into<String>,
) -> RowProblem {
    RowProblem {
        line,
        column: column.into(),
        expected: expected.into(),
        message: message.into(),
    }
}

// ---------------------------------------------------------------------------
// Keys of the member file.

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Group {
    Member,
    Section,
    Material,
    /// `angle_connection`'s keys, written with the prefix `angle_`.
    Angle,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Kind {
    /// Free text, kept as written.
    Text,
    /// A name from a fixed list, read without regard to case.
    Name,
    /// A number.
    Number,
    /// A whole number.
    Whole,
}

#[derive(Debug)]
struct KeyInfo {
    key: &'static str,
    group: Group,
    kind: Kind,
}

const fn k(key: &'static str, group: Group, kind: Kind) -> KeyInfo {
    KeyInfo { key, group, kind }
}

/// Every key, in the order [`to_csv`] writes them.
const KEYS: &[KeyInfo] = &[
    k("id", Group::Member, Kind::Text),
    k("note", Group::Member, Kind::Text),
    k("kind", Group::Section, Kind::Name),
    k("designation", Group::Section, Kind::Text),
    k("depth_mm", Group::Section, Kind::Number),
    k("width_mm", Group::Section, Kind::Number),
    k("flange_mm", Group::Section, Kind::Number),
    k("web_mm", Group::Section, Kind::Number),
    k("thickness_mm", Group::Section, Kind::Number),
    k("wall_mm", Group::Section, Kind::Number),
    k("diameter_mm", Group::Section, Kind::Number),
    k("root_radius_mm", Group::Section, Kind::Number),
    k("toe_radius_mm", Group::Section, Kind::Number),
    k("outer_radius_mm", Group::Section, Kind::Number),
    k("inner_radius_mm", Group::Section, Kind::Number),
    k("make", Group::Section, Kind::Name),
    k("area_mm2", Group::Section, Kind::Number),
    k("i_major_mm4", Group::Section, Kind::Number),
    k("i_minor_mm4", Group::Section, Kind::Number),
    k("torsion_mm4", Group::Section, Kind::Number),
    k("warping_mm6", Group::Section, Kind::Number),
    k("grade", Group::Material, Kind::Text),
    k("fy_mpa", Group::Material, Kind::Number),
    k("e_mpa", Group::Material, Kind::Number),
    k("g_mpa", Group::Material, Kind::Number),
    k("fc0k_mpa", Group::Material, Kind::Number),
    k("e005_mpa", Group::Material, Kind::Number),
    k("e0mean_mpa", Group::Material, Kind::Number),
    k("timber", Group::Material, Kind::Name),
    k("length_mm", Group::Member, Kind::Number),
    k("k_major", Group::Member, Kind::Number),
    k("k_minor", Group::Member, Kind::Number),
    k("k_torsion", Group::Member, Kind::Number),
    k("lcr_major_mm", Group::Member, Kind::Number),
    k("lcr_minor_mm", Group::Member, Kind::Number),
    k("lcr_torsion_mm", Group::Member, Kind::Number),
    k("axial_kn", Group::Member, Kind::Number),
    k("method", Group::Member, Kind::Name),
    k("gamma_m1", Group::Member, Kind::Number),
    k("curve_major", Group::Member, Kind::Name),
    k("curve_minor", Group::Member, Kind::Name),
    k("bow_mm", Group::Member, Kind::Number),
    k("eccentricity_mm", Group::Member, Kind::Number),
    k("service_class", Group::Member, Kind::Whole),
    k("load_duration", Group::Member, Kind::Name),
    k("csa_n", Group::Member, Kind::Number),
    k("angle_leg", Group::Angle, Kind::Name),
    k("angle_truss", Group::Angle, Kind::Name),
];

/// Keys every row needs (the material and section needs are per row).
const REQUIRED: &[&str] = &["id", "kind", "length_mm", "axial_kn", "method"];

fn key_info(key: &str) -> Option<&'static KeyInfo> {
    KEYS.iter().find(|i| i.key == key)
}

/// Section kinds: (kind, required keys, optional keys).
const KINDS: &[(&str, &[&str], &[&str])] = &[
    (
        "i",
        &["depth_mm", "width_mm", "flange_mm", "web_mm"],
        &["root_radius_mm", "make"],
    ),
    (
        "rhs",
        &["depth_mm", "width_mm", "wall_mm"],
        &["outer_radius_mm", "inner_radius_mm", "make"],
    ),
    ("chs", &["diameter_mm", "wall_mm"], &["make"]),
    (
        "angle",
        &["depth_mm", "width_mm", "thickness_mm"],
        &["root_radius_mm", "toe_radius_mm"],
    ),
    (
        "channel",
        &["depth_mm", "width_mm", "flange_mm", "web_mm"],
        &["root_radius_mm"],
    ),
    (
        "tee",
        &["depth_mm", "width_mm", "flange_mm", "web_mm"],
        &["root_radius_mm"],
    ),
    ("rect", &["depth_mm", "width_mm"], &[]),
    ("round", &["diameter_mm"], &[]),
    (
        "given",
        &["area_mm2", "i_major_mm4", "i_minor_mm4"],
        &["torsion_mm4", "warping_mm6"],
    ),
    ("catalogue", &["designation"], &[]),
];

const TIMBER_KEYS: [&str; 4] = ["fc0k_mpa", "e005_mpa", "e0mean_mpa", "timber"];
const CUSTOM_KEYS: [&str; 3] = ["fy_mpa", "e_mpa", "g_mpa"];

// ---------------------------------------------------------------------------
// Numbers.

/// The decimal mark a file uses for the ambiguous `1,234` / `1.234`.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Mark {
    Point,
    Comma,
}

fn is_group_space(c: char) -> bool {
    c == ' ' || c == '\u{a0}' || c == '\u{202f}' || c == '\u{2009}'
}

/// Which decimal mark a number cell shows unambiguously (rules 1 and 3).
fn decides(text: &str) -> Option<Mark> {
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

fn single_decides(t: &str, mark: char) -> Option<Mark> {
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
fn parse_number(raw: &str, file_mark: Mark) -> Result<f64, String> {
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
fn parse_feet_inches(raw: &str, mark: Mark) -> Option<Result<f64, String>> {
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

fn feet_inches_inner(raw: &str, t: &str, mark: Mark) -> Result<f64, String> {
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
fn parse_inches(body: &str, mark: Mark) -> Option<f64> {
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

/// Reads a number a person typed for member-file key `key` in the display
/// unit of `system` (see [`units::display_unit`]; SI member lengths are
/// shown in metres) and returns the value to store, in the key's own unit.
/// The forgiving number forms of this module are accepted; `decimal_comma`
/// settles the ambiguous `1,234` (rule 4). In US units, lengths may also be
/// typed in feet and inches (`13'-6"`, `6 1/2"`), whatever the unit shown.
pub fn parse_typed(
    text: &str,
    key: &str,
    system: UnitSystem,
    decimal_comma: bool,
) -> Result<f64, String> {
    let mark = if decimal_comma {
        Mark::Comma
    } else {
        Mark::Point
    };
    let q = Quantity::of_key(key).unwrap_or(Quantity::Dimensionless);
    if system == UnitSystem::Us && matches!(q, Quantity::Span | Quantity::Length) {
        if let Some(mm) = parse_feet_inches(text, mark) {
            return mm;
        }
    }
    parse_number(text, mark).map(|v| units::from_display(system, q, v))
}

// ---------------------------------------------------------------------------
// Tokenising.

#[derive(Debug, Clone, Default)]
struct Field {
    text: String,
    quoted: bool,
}

#[derive(Debug, Clone)]
struct Record {
    line: usize,
    fields: Vec<Field>,
}

impl Record {
    fn is_blank(&self) -> bool {
        self.fields
            .iter()
            .all(|f| !f.quoted && f.text.trim().is_empty())
    }
}

/// The separator, from a `sep=` line or the header line, and the text
/// after a `sep=` line (with the line count it skipped).
fn detect_separator(text: &str) -> (char, &str, usize) {
    let mut skipped = 0;
    let mut body = text;
    // Leading blank lines.
    loop {
        let trimmed = body.trim_start_matches([' ', '\t']);
        if let Some(r) = trimmed
            .strip_prefix("\r\n")
            .or_else(|| trimmed.strip_prefix('\n'))
        {
            body = r;
            skipped += 1;
        } else {
            break;
        }
    }
    let first_line = body.split(['\n', '\r']).next().unwrap_or("");
    let lower = first_line
        .trim_start_matches(' ')
        .trim_end_matches(' ')
        .to_ascii_lowercase();
    if let Some(rest) = lower.strip_prefix("sep=") {
        let sep = match rest {
            "," => Some(','),
            ";" => Some(';'),
            "\t" | "\\t" | "tab" => Some('\t'),
            _ => None,
        };
        if let Some(sep) = sep {
            let after = body.get(first_line.len()..).unwrap_or("");
            let after = after
                .strip_prefix("\r\n")
                .or_else(|| after.strip_prefix('\n'))
                .or_else(|| after.strip_prefix('\r'))
                .unwrap_or(after);
            return (sep, after, skipped + 1);
        }
    }
    // Count candidate separators outside quotes in the header line.
    let (mut commas, mut semis, mut tabs) = (0usize, 0usize, 0usize);
    let mut in_quotes = false;
    for c in body.chars() {
        match c {
            '"' => in_quotes = !in_quotes,
            '\n' | '\r' if !in_quotes => break,
            ',' if !in_quotes => commas += 1,
            ';' if !in_quotes => semis += 1,
            '\t' if !in_quotes => tabs += 1,
            _ => {}
        }
    }
    let sep = if semis > commas && semis >= tabs {
        ';'
    } else if tabs > commas && tabs > semis {
        '\t'
    } else {
        ','
    };
    (sep, text, 0)
}

/// Splits text into records. Stops with a problem after `limit` records.
fn tokenize(
    text: &str,
    sep: char,
    first_line: usize,
    limit: usize,
) -> (Vec<Record>, Vec<RowProblem>) {
    let mut records = Vec::new();
    let mut problems = Vec::new();
    let mut fields: Vec<Field> = Vec::new();
    let mut field = Field::default();
    let mut in_quotes = false;
    let mut after_quote = false;
    let mut line = first_line;
    let mut record_line = first_line;
    let mut chars = text.chars().peekable();
    let mut non_blank = 0usize;
    while let Some(c) = chars.next() {
        if in_quotes {
            if c == '"' {
                if chars.peek() == Some(&'"') {
                    chars.next();
                    field.text.push('"');
                } else {
                    in_quotes = false;
                    after_quote = true;
                }
            } else {
                if c == '\n' || (c == '\r' && chars.peek() != Some(&'\n')) {
                    line += 1;
                }
                field.text.push(c);
            }
            continue;
        }
        if c == sep {
            fields.push(finish_field(std::mem::take(&mut field)));
            after_quote = false;
        } else if c == '\n' || c == '\r' {
            if c == '\r' && chars.peek() == Some(&'\n') {
                chars.next();
            }
            fields.push(finish_field(std::mem::take(&mut field)));
            after_quote = false;
            let record = Record {
                line: record_line,
                fields: std::mem::take(&mut fields),
            };
            if !record.is_blank() {
                non_blank += 1;
                if non_blank > limit {
                    problems.push(too_many_rows(limit - 1));
                    return (records, problems);
                }
                records.push(record);
            }
            line += 1;
            record_line = line;
        } else if c == '"' && !field.quoted && field.text.trim().is_empty() {
            field.text.clear();
            field.quoted = true;
            in_quotes = true;
        } else if after_quote {
            if !c.is_whitespace() {
                field.text.push(c);
            }
        } else {
            field.text.push(c);
        }
    }
    if in_quotes {
        problems.push(problem(
            record_line,
            "",
            "a closing quote \" for every opening one",
            "a quoted field is never closed, so this row and everything after it was not read",
        ));
        return (records, problems);
    }
    fields.push(finish_field(field));
    let record = Record {
        line: record_line,
        fields,
    };
    if !record.is_blank() {
        non_blank += 1;
        if non_blank > limit {
            problems.push(too_many_rows(limit - 1));
            return (records, problems);
        }
        records.push(record);
    }
    (records, problems)
}

fn too_many_rows(max_rows: usize) -> RowProblem {
    problem(
        0,
        "",
        format!("at most {max_rows} member rows"),
        format!("the file has more than {max_rows} rows; split it into smaller files"),
    )
}

fn finish_field(mut f: Field) -> Field {
    if !f.quoted {
        f.text = f.text.trim().to_string();
    }
    f
}

// ---------------------------------------------------------------------------
// Header and rows.

#[derive(Debug, Clone)]
struct Column {
    /// The header as written.
    header: String,
    /// The member-file key it stands for (`None`: ignored column).
    info: Option<&'static KeyInfo>,
    /// The US unit it is written in.
    unit: Option<UsUnit>,
}

fn normalise_header(h: &str) -> String {
    h.trim()
        .trim_start_matches('\u{feff}')
        .trim()
        .to_ascii_lowercase()
        .chars()
        .map(|c| if c == ' ' || c == '-' { '_' } else { c })
        .collect()
}

fn read_header(record: &Record, problems: &mut Vec<RowProblem>) -> Vec<Column> {
    let mut seen: Vec<&'static str> = Vec::new();
    let mut columns = Vec::with_capacity(record.fields.len());
    for f in &record.fields {
        let header = f.text.trim().trim_start_matches('\u{feff}').to_string();
        let name = normalise_header(&header);
        let (info, unit) = if name.is_empty() {
            (None, None)
        } else if let Some(i) = key_info(&name) {
            (Some(i), None)
        } else if let Some((si, u)) = units::us_key_to_si(&name) {
            match key_info(&si) {
                Some(i) => (Some(i), Some(u)),
                None => (None, None),
            }
        } else {
            (None, None)
        };
        if !name.is_empty() && info.is_none() {
            problems.push(problem(
                record.line,
                header.clone(),
                "a member-file key such as id, kind, depth_mm, grade, length_mm, axial_kn, method \
                 (or its US form, e.g. length_ft, fy_ksi)",
                format!("unknown column \"{header}\"; its cells are not read"),
            ));
        }
        let info = match info {
            Some(i) if seen.contains(&i.key) => {
                problems.push(problem(
                    record.line,
                    header.clone(),
                    format!("{} given once", i.key),
                    format!(
                        "column \"{header}\" gives {} a second time; only the first is read",
                        i.key
                    ),
                ));
                None
            }
            other => other,
        };
        if let Some(i) = info {
            seen.push(i.key);
        }
        columns.push(Column { header, info, unit });
    }
    columns
}

fn expected_for(info: &KeyInfo, unit: Option<UsUnit>) -> String {
    match info.kind {
        Kind::Text => "text".into(),
        Kind::Name => match info.key {
            "kind" => {
                "a section kind: i, rhs, chs, angle, channel, tee, rect, round, given or catalogue"
                    .into()
            }
            "method" => format!("a method: {}", Method::ALL.map(Method::key).join(", ")),
            "make" => "rolled or welded (i); hot-finished or cold-formed (rhs, chs)".into(),
            "timber" => "solid or glulam".into(),
            "curve_major" | "curve_minor" => "a buckling curve: a0, a, b, c or d".into(),
            "load_duration" => "permanent, long, medium, short or instantaneous".into(),
            "angle_leg" => "long or short".into(),
            "angle_truss" => "planar or space".into(),
            _ => "a name".into(),
        },
        Kind::Whole => "a whole number".into(),
        Kind::Number => match unit {
            Some(UsUnit::Ft) => "a length in feet, e.g. 13.5 or 13'-6\"".into(),
            Some(UsUnit::In) => "a length in inches, e.g. 6.5 or 6-1/2\"".into(),
            Some(u) => format!("a number in {}", u.suffix()),
            None => match info.key.rsplit_once('_').map(|(_, s)| s) {
                Some("mm") => "a number in mm".into(),
                Some("mm2") => "a number in mm2".into(),
                Some("mm4") => "a number in mm4".into(),
                Some("mm6") => "a number in mm6".into(),
                Some("kn") => "a number in kN".into(),
                Some("mpa") => "a number in MPa".into(),
                _ => "a number".into(),
            },
        },
    }
}

/// Reads one cell of a number column into the member file's unit.
fn number_cell(text: &str, unit: Option<UsUnit>, mark: Mark) -> Result<f64, String> {
    match unit {
        Some(UsUnit::Ft) => match parse_feet_inches(text, mark) {
            Some(mm) => mm,
            None => parse_number(text, mark).map(units::ft_to_mm),
        },
        Some(UsUnit::In) => match parse_feet_inches(text, mark) {
            Some(mm) => mm,
            None => parse_number(text, mark).map(units::in_to_mm),
        },
        Some(u) => parse_number(text, mark).map(|v| u.to_si(v)),
        None => parse_number(text, mark),
    }
}

struct RowContext<'a> {
    columns: &'a [Column],
    mark: Mark,
}

impl RowContext<'_> {
    /// The header that gives `key` in this file (the key itself when none does).
    fn header_of(&self, key: &str) -> String {
        self.columns
            .iter()
            .find(|c| c.info.map(|i| i.key) == Some(key))
            .map(|c| c.header.clone())
            .unwrap_or_else(|| key.to_string())
    }
}

fn read_row(record: &Record, ctx: &RowContext<'_>) -> Result<Member, Vec<RowProblem>> {
    let line = record.line;
    let mut problems = Vec::new();
    let mut given: Vec<(&'static KeyInfo, Value)> = Vec::new();
    let mut failed: Vec<&'static str> = Vec::new();
    for (index, field) in record.fields.iter().enumerate() {
        let column = ctx.columns.get(index);
        let empty = !field.quoted && field.text.trim().is_empty();
        let Some(column) = column else {
            if !empty {
                problems.push(problem(
                    line,
                    format!("#{}", index + 1),
                    format!("at most {} cells, as in the header", ctx.columns.len()),
                    format!("cell {} is beyond the last column of the header", index + 1),
                ));
            }
            continue;
        };
        let Some(info) = column.info else {
            if !empty && column.header.trim().is_empty() {
                problems.push(problem(
                    line,
                    format!("#{}", index + 1),
                    "a column name in the header",
                    format!(
                        "cell {} holds a value under a column with no name",
                        index + 1
                    ),
                ));
            }
            continue;
        };
        if empty {
            continue;
        }
        let value = match info.kind {
            Kind::Text => Ok(Value::String(field.text.clone())),
            Kind::Name => {
                let t = field.text.trim().to_ascii_lowercase();
                if t.is_empty() {
                    continue;
                }
                Ok(Value::String(t))
            }
            Kind::Number => {
                if field.text.trim().is_empty() {
                    continue;
                }
                number_cell(&field.text, column.unit, ctx.mark).and_then(|v| {
                    serde_json::Number::from_f64(v)
                        .map(Value::Number)
                        .ok_or_else(|| "not a finite number".to_string())
                })
            }
            Kind::Whole => {
                if field.text.trim().is_empty() {
                    continue;
                }
                match parse_number(&field.text, ctx.mark) {
                    Ok(v) if v.fract() == 0.0 && (0.0..=255.0).contains(&v) => {
                        // A whole number from 0 to 255: the cast is exact.
                        Ok(Value::from(v as u64))
                    }
                    Ok(v) => Err(format!("{v} is not a whole number from 0 to 255")),
                    Err(e) => Err(e),
                }
            }
        };
        match value {
            Ok(v) => given.push((info, v)),
            Err(message) => {
                failed.push(info.key);
                problems.push(problem(
                    line,
                    column.header.clone(),
                    expected_for(info, column.unit),
                    message,
                ));
            }
        }
    }
    let has = |key: &str| given.iter().any(|(i, _)| i.key == key) || failed.contains(&key);
    let get = |key: &str| {
        given
            .iter()
            .find(|(i, _)| i.key == key)
            .and_then(|(_, v)| v.as_str())
    };

    // The member's own required keys.
    for key in ["id", "length_mm", "axial_kn", "method"] {
        if !has(key) {
            let info = key_info(key);
            problems.push(problem(
                line,
                ctx.header_of(key),
                info.map(|i| expected_for(i, None)).unwrap_or_default(),
                format!("{key} is missing; every member needs one"),
            ));
        }
    }
    if has("angle_truss") && !has("angle_leg") {
        problems.push(problem(
            line,
            ctx.header_of("angle_leg"),
            "long or short",
            "angle_leg is missing; angle_truss needs the connected leg",
        ));
    }

    if let Some(m) = get("method") {
        if Method::from_key(m).is_none() {
            failed.push("method");
            problems.push(problem(
                line,
                ctx.header_of("method"),
                key_info("method")
                    .map(|i| expected_for(i, None))
                    .unwrap_or_default(),
                format!("unknown method \"{m}\""),
            ));
        }
    }

    // Names from the member file's fixed lists.
    let kind_name = get("kind");
    for key in [
        "curve_major",
        "curve_minor",
        "load_duration",
        "angle_leg",
        "angle_truss",
        "make",
    ] {
        let Some(v) = get(key) else { continue };
        let allowed: &[&str] = match key {
            "curve_major" | "curve_minor" => &["a0", "a", "b", "c", "d"],
            "load_duration" => &["permanent", "long", "medium", "short", "instantaneous"],
            "angle_leg" => &["long", "short"],
            "angle_truss" => &["planar", "space"],
            _ => match kind_name {
                Some("i") => &["rolled", "welded"],
                Some("rhs" | "chs") => &["hot-finished", "cold-formed"],
                // Other kinds have no make; the section check says so.
                _ => continue,
            },
        };
        if !allowed.contains(&v) {
            failed.push(key);
            problems.push(problem(
                line,
                ctx.header_of(key),
                allowed.join(", "),
                format!("unknown {key} \"{v}\""),
            ));
        }
    }

    // The section.
    let present: Vec<&'static str> = given
        .iter()
        .map(|(i, _)| i.key)
        .chain(failed.iter().copied())
        .collect();
    let in_group = |group: Group| -> Vec<&'static str> {
        present
            .iter()
            .copied()
            .filter(|k| *k != "kind" && key_info(k).map(|i| i.group) == Some(group))
            .collect()
    };
    let section_given = in_group(Group::Section);
    match get("kind") {
        None if !failed.contains(&"kind") => problems.push(problem(
            line,
            ctx.header_of("kind"),
            key_info("kind")
                .map(|i| expected_for(i, None))
                .unwrap_or_default(),
            "kind is missing; every member needs a section kind",
        )),
        None => {}
        Some(kind) => match KINDS.iter().find(|(name, _, _)| *name == kind) {
            None => {
                failed.push("kind");
                problems.push(problem(
                    line,
                    ctx.header_of("kind"),
                    key_info("kind")
                        .map(|i| expected_for(i, None))
                        .unwrap_or_default(),
                    format!("unknown section kind \"{kind}\""),
                ));
            }
            Some((name, required, optional)) => {
                for key in required.iter() {
                    if !section_given.contains(key) {
                        problems.push(problem(
                            line,
                            ctx.header_of(key),
                            key_info(key)
                                .map(|i| expected_for(i, None))
                                .unwrap_or_default(),
                            format!("{key} is missing; a {name} section needs it"),
                        ));
                    }
                }
                for key in &section_given {
                    if !required.contains(key) && !optional.contains(key) {
                        let takes: Vec<&str> =
                            required.iter().chain(optional.iter()).copied().collect();
                        problems.push(problem(
                            line,
                            ctx.header_of(key),
                            format!("an empty cell for a {name} section"),
                            format!(
                                "a {name} section has no {key}; it takes {}",
                                takes.join(", ")
                            ),
                        ));
                    }
                }
            }
        },
    }

    // The material: a grade, a custom steel, or a custom timber.
    let mat_given = in_group(Group::Material);
    let any_timber = TIMBER_KEYS.iter().any(|k| mat_given.contains(k));
    let any_custom = CUSTOM_KEYS.iter().any(|k| mat_given.contains(k));
    let has_grade = mat_given.contains(&"grade");
    let conflict = |problems: &mut Vec<RowProblem>, key: &str, why: &str| {
        problems.push(problem(
            line,
            ctx.header_of(key),
            "an empty cell",
            format!("{key} cannot be given together with {why}"),
        ));
    };
    if has_grade {
        for key in mat_given.iter().filter(|k| **k != "grade") {
            conflict(
                &mut problems,
                key,
                "a grade; give the grade or the custom values",
            );
        }
    } else if any_timber {
        for key in TIMBER_KEYS {
            if !mat_given.contains(&key) {
                problems.push(problem(
                    line,
                    ctx.header_of(key),
                    key_info(key)
                        .map(|i| expected_for(i, None))
                        .unwrap_or_default(),
                    format!("{key} is missing; a custom timber needs fc0k_mpa, e005_mpa, e0mean_mpa and timber"),
                ));
            }
        }
        for key in CUSTOM_KEYS.iter().filter(|k| mat_given.contains(k)) {
            conflict(&mut problems, key, "the timber values");
        }
        if let Some(t) = get("timber") {
            if t != "solid" && t != "glulam" {
                failed.push("timber");
                problems.push(problem(
                    line,
                    ctx.header_of("timber"),
                    "solid or glulam",
                    format!("unknown timber \"{t}\""),
                ));
            }
        }
    } else if any_custom {
        for key in ["fy_mpa", "e_mpa"] {
            if !mat_given.contains(&key) {
                problems.push(problem(
                    line,
                    ctx.header_of(key),
                    key_info(key)
                        .map(|i| expected_for(i, None))
                        .unwrap_or_default(),
                    format!("{key} is missing; a custom material needs fy_mpa and e_mpa"),
                ));
            }
        }
    } else {
        problems.push(problem(
            line,
            ctx.header_of("grade"),
            "a grade (e.g. S355), or fy_mpa and e_mpa, or fc0k_mpa, e005_mpa, e0mean_mpa and timber",
            "the material is missing",
        ));
    }

    if !problems.is_empty() {
        return Err(problems);
    }

    // Assemble the member-file object and let the member file's own types
    // read it, so the CSV accepts exactly what the JSON accepts.
    let mut member = Map::new();
    let mut section = Map::new();
    let mut material = Map::new();
    let mut angle = Map::new();
    for (info, value) in given {
        let (target, key) = match info.group {
            Group::Member => (&mut member, info.key),
            Group::Section => (&mut section, info.key),
            Group::Material => (&mut material, info.key),
            Group::Angle => (
                &mut angle,
                info.key.strip_prefix("angle_").unwrap_or(info.key),
            ),
        };
        target.insert(key.to_string(), value);
    }
    member.insert("section".into(), Value::Object(section));
    member.insert("material".into(), Value::Object(material));
    if !angle.is_empty() {
        member.insert("angle_connection".into(), Value::Object(angle));
    }
    let value = Value::Object(member);
    file::deserialize_member(&value).map_err(|(path, inner)| {
        let key = missing_field(&inner).unwrap_or_else(|| {
            if let Some(k) = path.strip_prefix("angle_connection.") {
                return format!("angle_{k}");
            }
            path.rsplit('.')
                .next()
                .filter(|s| !s.is_empty() && *s != "section")
                .unwrap_or(if path.starts_with("section") {
                    "kind"
                } else {
                    ""
                })
                .to_string()
        });
        let info = key_info(&key);
        vec![problem(
            line,
            if key.is_empty() {
                String::new()
            } else {
                ctx.header_of(&key)
            },
            info.map(|i| expected_for(i, None)).unwrap_or_default(),
            inner,
        )]
    })
}

fn missing_field(message: &str) -> Option<String> {
    let rest = message.strip_prefix("missing field `")?;
    Some(rest.split('`').next()?.to_string())
}

/// Reads a CSV member file. See the module documentation for the rules.
pub fn parse_csv(text: &str) -> CsvImport {
    parse_csv_within(text, usize::MAX)
}

/// [`parse_csv`], refusing a file of more than `max_rows` member rows with
/// one problem that says so (a limit an edge may set as its policy).
pub fn parse_csv_within(text: &str, max_rows: usize) -> CsvImport {
    let mut out = CsvImport::default();
    let text = text.strip_prefix('\u{feff}').unwrap_or(text);
    let (sep, body, skipped) = detect_separator(text);
    let (records, problems) = tokenize(body, sep, 1 + skipped, max_rows.saturating_add(1));
    if problems.iter().any(|p| p.line == 0) {
        out.problems = problems;
        return out;
    }
    out.problems = problems;
    let mut records = records.into_iter();
    let Some(header) = records.next() else {
        out.problems.insert(
            0,
            problem(
                0,
                "",
                "a header row naming the columns, then one member a row",
                "the file is empty",
            ),
        );
        return out;
    };
    let rows: Vec<Record> = records.collect();
    let mut header_problems = Vec::new();
    let columns = read_header(&header, &mut header_problems);
    let missing: Vec<&str> = REQUIRED
        .iter()
        .copied()
        .filter(|key| !columns.iter().any(|c| c.info.map(|i| i.key) == Some(*key)))
        .collect();
    let has_material = columns.iter().any(|c| {
        c.info
            .map(|i| i.key == "grade" || i.key == "fy_mpa" || i.key == "fc0k_mpa")
            .unwrap_or(false)
    });
    let mut all = header_problems;
    all.append(&mut out.problems);
    out.problems = all;
    out.rows = rows.len();
    if !missing.is_empty() || !has_material {
        let mut needed: Vec<&str> = missing;
        if !has_material {
            needed.push("grade (or fy_mpa and e_mpa, or the timber keys)");
        }
        out.problems.push(problem(
            header.line,
            "",
            "a header with the columns id, kind, length_mm (or length_ft), axial_kn (or axial_kip), method and a material",
            format!(
                "the header has no column for {}; no row can be read without it",
                needed.join(", ")
            ),
        ));
        return out;
    }
    let mark = match sep {
        ';' => Mark::Comma,
        ',' => Mark::Point,
        _ => vote_mark(&rows, &columns).unwrap_or(Mark::Point),
    };
    let ctx = RowContext {
        columns: &columns,
        mark,
    };
    for record in &rows {
        match read_row(record, &ctx) {
            Ok(member) => {
                // A linear search: a hash set would add its code to the wasm.
                if !out.members.iter().any(|m| m.id == member.id) {
                    out.members.push(member);
                    out.member_lines.push(record.line);
                } else {
                    out.problems.push(problem(
                        record.line,
                        ctx.header_of("id"),
                        "an id no other row uses",
                        format!(
                            "id \"{}\" is already used by an earlier row; give each member its own id",
                            member.id
                        ),
                    ));
                }
            }
            Err(mut p) => out.problems.append(&mut p),
        }
    }
    out
}

/// The decimal mark of a tab-separated file: the first number cell that
/// shows it unambiguously.
fn vote_mark(rows: &[Record], columns: &[Column]) -> Option<Mark> {
    rows.iter().find_map(|r| {
        r.fields.iter().zip(columns).find_map(|(f, c)| {
            let numeric = c.info.map(|i| i.kind == Kind::Number).unwrap_or(false);
            if numeric && !f.text.contains(['\'', '"']) {
                decides(&f.text)
            } else {
                None
            }
        })
    })
}

// ---------------------------------------------------------------------------
// Writing.

fn cell_text(v: &Value) -> String {
    match v {
        Value::Null => String::new(),
        Value::Bool(b) => b.to_string(),
        Value::Number(n) => match n.as_f64() {
            Some(f) if n.is_f64() => format!("{f}"),
            _ => n.to_string(),
        },
        Value::String(s) => s.clone(),
        other => other.to_string(),
    }
}

fn quote(cell: &str, is_text: bool) -> String {
    let needs = cell.contains([',', '"', '\r', '\n', ';', '\t'])
        || cell.starts_with(char::is_whitespace)
        || cell.ends_with(char::is_whitespace)
        || (is_text && cell.is_empty());
    if needs {
        format!("\"{}\"", cell.replace('"', "\"\""))
    } else {
        cell.to_string()
    }
}

/// The members as CSV with SI keys, `,` separators and CRLF line ends.
/// The title is not kept (a CSV file has none).
pub fn to_csv(file: &MemberFile) -> String {
    to_csv_in(file, UnitSystem::Si)
}

/// The US customary column for an SI key: member lengths in feet, other
/// lengths in inches, then in2, in4, in6, kip, ksi, kip-ft.
fn us_column(key: &str) -> Option<(String, UsUnit)> {
    let unit = match Quantity::of_key(key)? {
        Quantity::Span => UsUnit::Ft,
        Quantity::Length => UsUnit::In,
        Quantity::Area => UsUnit::In2,
        Quantity::Modulus => UsUnit::In3,
        Quantity::SecondMoment => UsUnit::In4,
        Quantity::Warping => UsUnit::In6,
        Quantity::Force => UsUnit::Kip,
        Quantity::Stress => UsUnit::Ksi,
        Quantity::Moment => UsUnit::KipFt,
        Quantity::Dimensionless => return None,
    };
    Some((units::si_key_to_us(key, unit)?, unit))
}

/// The members as CSV in a unit system: [`UnitSystem::Si`] writes the
/// member file's own keys and values (exact round trip);
/// [`UnitSystem::Us`] writes each unit key in its US form (`length_ft`,
/// `depth_in`, `axial_kip`, `fy_ksi`, ...) with the value converted, which
/// reads back to within a few parts in 10^16 of the stored value (for
/// values of ordinary magnitude, not subnormal ones).
pub fn to_csv_in(file: &MemberFile, system: UnitSystem) -> String {
    let rows: Vec<Map<String, Value>> = file
        .members
        .iter()
        .map(|m| {
            let mut flat = Map::new();
            if let Some(Value::Object(obj)) = file::json_value(m) {
                for (key, value) in obj {
                    match (key.as_str(), value) {
                        ("section" | "material", Value::Object(inner)) => {
                            for (k2, v2) in inner {
                                flat.insert(k2, v2);
                            }
                        }
                        ("angle_connection", Value::Object(inner)) => {
                            for (k2, v2) in inner {
                                flat.insert(format!("angle_{k2}"), v2);
                            }
                        }
                        (_, value) => {
                            flat.insert(key, value);
                        }
                    }
                }
            }
            flat
        })
        .collect();
    // The keys used, in the order first met (a sort would add its code to
    // the wasm).
    let mut used: Vec<&str> = Vec::new();
    for key in rows.iter().flat_map(|r| r.keys()) {
        if !used.contains(&key.as_str()) {
            used.push(key);
        }
    }
    let mut columns: Vec<&str> = KEYS
        .iter()
        .map(|i| i.key)
        .filter(|k| REQUIRED.contains(k) || used.contains(k))
        .collect();
    // Keys this build does not list (a newer member file), kept at the end.
    for key in &used {
        if key_info(key).is_none() {
            columns.push(key);
        }
    }
    let us: Vec<Option<(String, UsUnit)>> = columns
        .iter()
        .map(|key| match system {
            UnitSystem::Us => us_column(key),
            UnitSystem::Si => None,
        })
        .collect();
    let mut out = String::with_capacity(64 * (rows.len() + 1));
    for (i, (key, u)) in columns.iter().zip(&us).enumerate() {
        if i > 0 {
            out.push(',');
        }
        out.push_str(u.as_ref().map(|(h, _)| h.as_str()).unwrap_or(key));
    }
    out.push_str("\r\n");
    for row in &rows {
        for (i, (key, u)) in columns.iter().zip(&us).enumerate() {
            if i > 0 {
                out.push(',');
            }
            match (row.get(*key), u) {
                (None, _) => {}
                (Some(Value::Number(n)), Some((_, unit))) => match n.as_f64() {
                    Some(f) => out.push_str(&format!("{}", unit.from_si(f))),
                    None => out.push_str(&n.to_string()),
                },
                (Some(v), _) => out.push_str(&quote(&cell_text(v), matches!(v, Value::String(_)))),
            }
        }
        out.push_str("\r\n");
    }
    out
}

// ---------------------------------------------------------------------------
// Either format.

/// A member-file format.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "lowercase")]
pub enum Format {
    /// The JSON member file.
    Json,
    /// CSV, one member a row.
    Csv,
}

/// The format of a file: by its extension (`.json`; `.csv`, `.tsv`,
/// `.txt`), otherwise by its first character (`{` is JSON).
pub fn detect_format(path_text: &str, contents: &str) -> Format {
    let ext = path_text
        .rsplit_once('.')
        .map(|(_, e)| e.to_ascii_lowercase())
        .filter(|e| !e.contains(['/', '\\']));
    match ext.as_deref() {
        Some("json") => Format::Json,
        Some("csv" | "tsv" | "txt") => Format::Csv,
        _ => {
            let first = contents
                .trim_start_matches('\u{feff}')
                .trim_start()
                .chars()
                .next();
            if first == Some('{') {
                Format::Json
            } else {
                Format::Csv
            }
        }
    }
}

/// The separator a CSV text uses (`,`, `;` or tab), by the rules of the
/// module documentation; with `,` or `;` the decimal mark follows from it,
/// so blocks of rows can be read apart under the same header.
pub fn separator(text: &str) -> char {
    detect_separator(text.strip_prefix('\u{feff}').unwrap_or(text)).0
}

/// The file name without folders and extension, for the title of a CSV file.
pub fn title_from_path(path_text: &str) -> String {
    let name = path_text.rsplit(['/', '\\']).next().unwrap_or(path_text);
    match name.rsplit_once('.') {
        Some((stem, _)) if !stem.is_empty() => stem.to_string(),
        _ => name.to_string(),
    }
}

/// Reads a CSV member file keeping the valid rows: the members (titled
/// from the file name) and the problems.
pub fn read_csv_lenient(path_text: &str, contents: &str) -> (MemberFile, Vec<RowProblem>) {
    let import = parse_csv(contents);
    let mut file = MemberFile::new(title_from_path(path_text));
    file.members = import.members;
    (file, import.problems)
}

/// Reads a member file in either format (CSV by extension or by
/// sniffing). A CSV file with any problem is refused with every problem
/// listed, one a line, each naming the line and the column.
pub fn read_any(path_text: &str, contents: &str) -> Result<MemberFile, String> {
    match detect_format(path_text, contents) {
        Format::Json => file::parse(contents).map_err(|e| format!("{path_text}: {e}")),
        Format::Csv => {
            let (file, problems) = read_csv_lenient(path_text, contents);
            if problems.is_empty() {
                Ok(file)
            } else {
                let mut text = format!(
                    "{path_text}: {} problem{} in the CSV file:",
                    problems.len(),
                    if problems.len() == 1 { "" } else { "s" }
                );
                for p in &problems {
                    text.push_str("\n  ");
                    text.push_str(&p.to_string());
                }
                Err(text)
            }
        }
    }
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;
    use std::collections::BTreeSet;

    #[test]
    fn numbers_follow_the_documented_rules() {
        let p = |s: &str, m: Mark| parse_number(s, m);
        // Rule 1.
        assert_eq!(p("1,234.5", Mark::Comma).unwrap(), 1234.5);
        assert_eq!(p("1.234,5", Mark::Point).unwrap(), 1234.5);
        assert_eq!(p("1,234,567.25", Mark::Point).unwrap(), 1_234_567.25);
        // Rule 2.
        assert_eq!(p("1.234.567", Mark::Point).unwrap(), 1_234_567.0);
        assert_eq!(p("1,234,567", Mark::Comma).unwrap(), 1_234_567.0);
        // Rule 3.
        assert_eq!(p("2,5", Mark::Point).unwrap(), 2.5);
        assert_eq!(p("0.125", Mark::Comma).unwrap(), 0.125);
        assert_eq!(p("0,125", Mark::Point).unwrap(), 0.125);
        assert_eq!(p("1,2345", Mark::Point).unwrap(), 1.2345);
        assert_eq!(p(",5", Mark::Point).unwrap(), 0.5);
        // Rule 4.
        assert_eq!(p("1,234", Mark::Point).unwrap(), 1234.0);
        assert_eq!(p("1,234", Mark::Comma).unwrap(), 1.234);
        assert_eq!(p("1.234", Mark::Comma).unwrap(), 1234.0);
        assert_eq!(p("1.234", Mark::Point).unwrap(), 1.234);
        // Spaces, signs, exponents.
        assert_eq!(p("1 234,5", Mark::Point).unwrap(), 1234.5);
        assert_eq!(
            p("1\u{a0}234\u{a0}567,5", Mark::Point).unwrap(),
            1_234_567.5
        );
        assert_eq!(p("12 345", Mark::Point).unwrap(), 12345.0);
        assert_eq!(p("-2.5", Mark::Point).unwrap(), -2.5);
        assert_eq!(p("−2,5", Mark::Point).unwrap(), -2.5);
        assert_eq!(p("+7", Mark::Point).unwrap(), 7.0);
        assert_eq!(p("1.5e3", Mark::Point).unwrap(), 1500.0);
        assert_eq!(p("2,5E-3", Mark::Point).unwrap(), 0.0025);
        assert_eq!(p("  42  ", Mark::Point).unwrap(), 42.0);
        // Refused.
        for bad in [
            "",
            "abc",
            "12 mm",
            "1,23,4",
            "1.2.3,4,5",
            "12,34.5.6",
            "1 23",
            "1e",
            "1e+",
            "e5",
            ".",
            "-",
            "1,,2",
            "1e400",
            "0,123,456",
            "1 234.567.8",
            "1,234 567",
        ] {
            assert!(p(bad, Mark::Point).is_err(), "{bad:?} should be refused");
        }
    }

    #[test]
    fn shortest_display_text_reads_back_exactly() {
        for v in [
            0.1f64,
            1.0 / 3.0,
            2000.0,
            1e-7,
            123_456_789.123_456_79,
            5e-324,
            1.7976931348623157e308,
            -0.0,
            25.4 * 12.0,
            1.234,
        ] {
            let text = format!("{v}");
            assert_eq!(
                parse_number(&text, Mark::Point).unwrap().to_bits(),
                v.to_bits(),
                "{text}"
            );
        }
    }

    #[test]
    fn feet_and_inches() {
        let fi = |s: &str| parse_feet_inches(s, Mark::Point).unwrap().unwrap();
        let mm = |ft: f64, inch: f64| ft * 304.8 + inch * 25.4;
        assert_eq!(fi("13'-6\""), mm(13.0, 6.0));
        assert_eq!(fi("13' 6-1/2\""), mm(13.0, 6.5));
        assert_eq!(fi("13'6\""), mm(13.0, 6.0));
        assert_eq!(fi("13'-6 1/2\""), mm(13.0, 6.5));
        assert_eq!(fi("13'"), mm(13.0, 0.0));
        assert_eq!(fi("13′ 6″"), mm(13.0, 6.0));
        assert_eq!(fi("6 1/2\""), mm(0.0, 6.5));
        assert_eq!(fi("1/2\""), 12.7);
        assert_eq!(fi("3/8 in"), mm(0.0, 0.375));
        assert_eq!(fi("13 ft 6 in"), mm(13.0, 6.0));
        assert_eq!(fi("2,5'"), 762.0);
        assert_eq!(fi("13'-6"), mm(13.0, 6.0));
        assert!((fi("13'-6\"") - 4114.8).abs() <= 4114.8 * 1e-15);
        assert!(parse_feet_inches("13.5", Mark::Point).is_none());
        for bad in ["13'-6\"'", "x'", "6-1/0\"", "'\"", "-2'", "1/\""] {
            assert!(
                parse_feet_inches(bad, Mark::Point)
                    .map(|r| r.is_err())
                    .unwrap_or(true),
                "{bad:?} should be refused"
            );
        }
        assert_eq!(
            number_cell("13'-6\"", Some(UsUnit::Ft), Mark::Point).unwrap(),
            mm(13.0, 6.0)
        );
        assert_eq!(
            number_cell("13.5", Some(UsUnit::Ft), Mark::Point).unwrap(),
            13.5 * 304.8
        );
        assert_eq!(
            number_cell("1'", Some(UsUnit::In), Mark::Point).unwrap(),
            304.8
        );
        assert_eq!(
            number_cell("0.5", Some(UsUnit::In), Mark::Point).unwrap(),
            12.7
        );
    }

    #[test]
    fn typed_values_come_back_in_stored_units() {
        let t = |text: &str, key: &str, system: UnitSystem| parse_typed(text, key, system, false);
        assert_eq!(t("3.6", "length_mm", UnitSystem::Si).unwrap(), 3600.0);
        assert_eq!(
            t("13'-6\"", "length_mm", UnitSystem::Us).unwrap(),
            13.0 * 304.8 + 6.0 * 25.4
        );
        assert_eq!(t("12", "length_mm", UnitSystem::Us).unwrap(), 12.0 * 304.8);
        assert_eq!(t("1/2\"", "depth_mm", UnitSystem::Us).unwrap(), 12.7);
        assert_eq!(t("0.5", "depth_mm", UnitSystem::Us).unwrap(), 12.7);
        assert_eq!(t("1,250", "axial_kn", UnitSystem::Si).unwrap(), 1250.0);
        assert_eq!(
            parse_typed("1,250", "axial_kn", UnitSystem::Si, true).unwrap(),
            1.25
        );
        assert_eq!(
            t("50", "fy_mpa", UnitSystem::Us).unwrap(),
            units::ksi_to_mpa(50.0)
        );
        assert_eq!(t("0,85", "k_minor", UnitSystem::Us).unwrap(), 0.85);
        assert!(t("13'-6\"", "fy_mpa", UnitSystem::Us).is_err());
        assert!(t("13'-6\"", "length_mm", UnitSystem::Si).is_err());
    }

    const BASIC: &str = "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\n\
                         P1,rect,100,50,235,210000,2000,10,euler\n";

    #[test]
    fn reads_a_simple_file() {
        let got = parse_csv(BASIC);
        assert!(got.problems.is_empty(), "{:?}", got.problems);
        let m = &got.members[0];
        assert_eq!(m.id, "P1");
        assert_eq!(m.length_mm, 2000.0);
        assert_eq!(got.member_lines, vec![2]);
        let json = file::parse(
            r#"{"format": "strutline.members", "version": 1, "members": [{"id": "P1",
            "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
            "material": {"fy_mpa": 235, "e_mpa": 210000}, "length_mm": 2000,
            "axial_kn": 10, "method": "euler"}]}"#,
        )
        .unwrap();
        assert_eq!(&json.members[0], m);
    }

    #[test]
    fn reads_spreadsheet_exports() {
        // Semicolons, decimal commas, BOM, CRLF, quotes, blank rows, sep= line.
        let text = "\u{feff}Id;Kind;Depth mm;Width_MM;fy_mpa;e_mpa;length_mm;axial_kn;method;note\r\n\
                    \"P;1\";rect;100,5;50;235;210.000;2.000,5;10,25;euler;\"a \"\"quoted\"\"\r\nnote\"\r\n\
                    ;;;;;;;;;\r\n\r\n";
        let got = parse_csv(text);
        assert!(got.problems.is_empty(), "{:?}", got.problems);
        let m = &got.members[0];
        assert_eq!(m.id, "P;1");
        assert_eq!(m.length_mm, 2000.5);
        assert_eq!(m.axial_kn, 10.25);
        assert_eq!(m.note.as_deref(), Some("a \"quoted\"\r\nnote"));
        if let crate::section::SectionSpec::Rect(r) = &m.section {
            assert_eq!(r.depth_mm, 100.5);
        } else {
            panic!("not rect");
        }
        let tabbed = "sep=\t\nid\tkind\tdiameter_mm\tgrade\tlength_mm\taxial_kn\tmethod\n\
                      R1\tround\t1,234\tS355\t3000\t2,5\teuler\n";
        let got = parse_csv(tabbed);
        assert!(got.problems.is_empty(), "{:?}", got.problems);
        // "2,5" decides the file: decimal comma, so "1,234" is 1.234.
        if let crate::section::SectionSpec::Round(r) = &got.members[0].section {
            assert_eq!(r.diameter_mm, 1.234);
        } else {
            panic!("not round");
        }
        assert_eq!(got.members[0].axial_kn, 2.5);
    }

    #[test]
    fn us_columns_convert_exactly() {
        let text = "id,kind,depth_in,width_in,fy_ksi,e_ksi,length_ft,axial_kip,method,bow_in\n\
                    U1,rect,4,2,50,29000,13'-6\",100,euler,1/2\"\n";
        let got = parse_csv(text);
        assert!(got.problems.is_empty(), "{:?}", got.problems);
        let m = &got.members[0];
        assert_eq!(m.length_mm, 13.0 * 304.8 + 6.0 * 25.4);
        assert_eq!(m.axial_kn, 100.0 * units::KN_PER_KIP);
        assert_eq!(m.bow_mm, Some(12.7));
        match &m.material {
            crate::material::MaterialSpec::Custom { fy_mpa, .. } => {
                assert_eq!(*fy_mpa, units::ksi_to_mpa(50.0))
            }
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn reports_every_problem_with_line_and_column() {
        let text = "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method,colour\n\
                    A,rect,100,50,235,210000,2000,10,euler,red\n\
                    B,rect,abc,50,235,210000,2000,10,euler,\n\
                    C,rect,100,,235,210000,2000,10,eurocode,\n\
                    D,box,100,50,235,,2000,1x,euler,\n\
                    A,rect,100,50,235,210000,2000,10,euler,\n\
                    E,round,100,50,235,210000,2000,10,euler,\n";
        let got = parse_csv(text);
        assert_eq!(got.members.len(), 1);
        assert_eq!(got.members[0].id, "A");
        let find = |line: usize, col: &str| {
            got.problems
                .iter()
                .find(|p| p.line == line && p.column == col)
                .unwrap_or_else(|| panic!("no problem at {line} {col}: {:#?}", got.problems))
        };
        assert!(find(1, "colour").message.contains("unknown column"));
        assert!(find(3, "depth_mm").message.contains("abc"));
        assert!(find(3, "depth_mm").expected.contains("mm"));
        assert!(find(4, "width_mm").message.contains("missing"));
        assert!(find(4, "method").message.contains("eurocode"));
        assert!(find(5, "kind").message.contains("box"));
        assert!(find(5, "axial_kn").message.contains("1x"));
        assert!(find(5, "e_mpa").message.contains("missing"));
        assert!(find(6, "id").message.contains("already used"));
        assert!(find(7, "diameter_mm").message.contains("missing"));
        assert!(find(7, "depth_mm").message.contains("has no depth_mm"));
        let shown = find(3, "depth_mm").to_string();
        assert!(shown.starts_with("line 3, column depth_mm:"), "{shown}");
    }

    #[test]
    fn refuses_rows_over_a_given_limit_and_headless_files() {
        let mut many = String::from("id,kind,diameter_mm,grade,length_mm,axial_kn,method\n");
        for i in 0..=10_000 {
            many.push_str(&format!("{i},round,1,S,1,1,euler\n"));
        }
        // No limit of its own: every row read.
        assert_eq!(parse_csv(&many).rows, 10_001);
        let got = parse_csv_within(&many, 10_000);
        assert!(got.members.is_empty());
        assert!(
            got.problems[0].message.contains("more than 10000 rows"),
            "{:?}",
            got.problems[0]
        );
        assert!(parse_csv("").problems[0].message.contains("empty"));
        let got = parse_csv("id,kind\nA,rect\n");
        assert!(
            got.problems[0].message.contains("no column for length_mm"),
            "{:?}",
            got.problems
        );
        let got = parse_csv("id,kind,note\nA,rect,\"never closed\n");
        assert!(got
            .problems
            .iter()
            .any(|p| p.message.contains("never closed")));
    }

    #[test]
    fn detects_format_and_reads_any() {
        assert_eq!(detect_format("a/b.CSV", "{"), Format::Csv);
        assert_eq!(detect_format("a.json", "id"), Format::Json);
        assert_eq!(detect_format("members", " {\"format\""), Format::Json);
        assert_eq!(detect_format("members", "id,kind"), Format::Csv);
        assert_eq!(detect_format("dir.v2/members", "id,kind"), Format::Csv);
        let f = read_any("jobs/strut list.csv", BASIC).unwrap();
        assert_eq!(f.title, "strut list");
        assert_eq!(f.members.len(), 1);
        let e = read_any("x.csv", "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\nP,rect,1,1,1,1,1,zz,euler\n")
            .unwrap_err();
        assert!(e.contains("line 2, column axial_kn"), "{e}");
        let e = read_any("x.json", "{").unwrap_err();
        assert!(e.starts_with("x.json: "), "{e}");
    }

    #[test]
    fn angle_columns_read_and_report_bad_values() {
        use crate::member::{AngleConnection, Leg, Truss};
        let text = "id,kind,depth_mm,width_mm,thickness_mm,grade,length_mm,axial_kn,method,Angle Leg,angle-truss\n\
                    A1,angle,100,75,8,A36,1500,60,aisc360-lrfd,Short,SPACE\n\
                    A2,angle,100,75,8,A36,1500,60,aisc360-lrfd,long,\n\
                    A3,angle,100,75,8,A36,1500,60,aisc360-lrfd,,\n\
                    A4,angle,100,75,8,A36,1500,60,aisc360-lrfd,middle,planar\n\
                    A5,angle,100,75,8,A36,1500,60,aisc360-lrfd,long,box\n\
                    A6,angle,100,75,8,A36,1500,60,aisc360-lrfd,,space\n";
        let got = parse_csv(text);
        let conn = |leg, truss| Some(AngleConnection { leg, truss });
        let read: Vec<_> = got
            .members
            .iter()
            .map(|m| (m.id.as_str(), m.angle_connection))
            .collect();
        assert_eq!(
            read,
            vec![
                ("A1", conn(Leg::Short, Truss::Space)),
                ("A2", conn(Leg::Long, Truss::Planar)),
                ("A3", None),
            ]
        );
        let problems: Vec<(usize, &str, &str)> = got
            .problems
            .iter()
            .map(|p| (p.line, p.column.as_str(), p.expected.as_str()))
            .collect();
        assert_eq!(
            problems,
            vec![
                (5, "Angle Leg", "long, short"),
                (6, "angle-truss", "planar, space"),
                (7, "Angle Leg", "long or short"),
            ],
            "{:#?}",
            got.problems
        );
        assert!(got.problems[0].message.contains("middle"));
        assert!(got.problems[1].message.contains("box"));
        assert!(got.problems[2].message.contains("angle_leg is missing"));
    }

    #[test]
    fn never_panics_on_random_input() {
        let alphabet: Vec<char> =
            "id,kind;rect\tround\"\r\n '-/.0123456789eE+−,\u{feff}sep=length_ft\u{a0}\""
                .chars()
                .collect();
        let header = "id,kind,depth_mm,width_mm,diameter_mm,grade,fy_mpa,e_mpa,length_ft,axial_kip,method,note\n";
        let mut seed: u64 = 0x9e37_79b9_7f4a_7c15;
        let mut next = || {
            seed ^= seed << 13;
            seed ^= seed >> 7;
            seed ^= seed << 17;
            seed
        };
        for round in 0..3000 {
            let len = (next() % 200) as usize;
            let mut s = String::new();
            if round % 2 == 0 {
                s.push_str(header);
            }
            for _ in 0..len {
                s.push(alphabet[(next() % alphabet.len() as u64) as usize]);
            }
            let got = parse_csv(&s);
            assert_eq!(got.members.len(), got.member_lines.len());
            let _ = read_any("f.csv", &s);
            let bytes: Vec<u8> = (0..len).map(|_| (next() & 0xff) as u8).collect();
            let lossy = String::from_utf8_lossy(&bytes);
            let _ = parse_csv(&lossy);
            let _ = parse_feet_inches(&s, Mark::Comma);
        }
    }

    /// Every section kind, every material form and every member option,
    /// with awkward numbers and text.
    const EVERY: &str = r#"{"format": "strutline.members", "version": 2, "title": "every key",
      "members": [
        {"id": "I1", "note": "comma, \"quote\"\nnew line", "section": {"kind": "i", "depth_mm": 300.5,
         "width_mm": 300, "flange_mm": 19, "web_mm": 11, "root_radius_mm": 27, "make": "welded"},
         "material": {"grade": "S355"}, "length_mm": 4000.000000001, "k_major": 0.7, "k_minor": 0.85,
         "k_torsion": 0.5, "lcr_major_mm": 3333.3333333333335, "lcr_minor_mm": 0.30000000000000004,
         "lcr_torsion_mm": 1e-7, "axial_kn": 1234567.891, "method": "en1993-1-1", "gamma_m1": 1.1,
         "curve_major": "a0", "curve_minor": "d", "bow_mm": 0, "eccentricity_mm": 12.5,
         "service_class": 3, "load_duration": "instantaneous", "csa_n": 2.24},
        {"id": " R2 ", "note": "", "section": {"kind": "rhs", "depth_mm": 200, "width_mm": 100,
         "wall_mm": 6.3, "outer_radius_mm": 12.6, "inner_radius_mm": 6.3, "make": "cold-formed"},
         "material": {"fy_mpa": 355, "e_mpa": 210000, "g_mpa": 81000}, "length_mm": 3000,
         "axial_kn": 0, "method": "aisc360-lrfd", "curve_minor": "c"},
        {"id": "C3", "section": {"kind": "chs", "diameter_mm": 168.3, "wall_mm": 8, "make": "hot-finished"},
         "material": {"fy_mpa": 275, "e_mpa": 205000}, "length_mm": 5000, "axial_kn": 500,
         "method": "aisc360-asd"},
        {"id": "L4", "section": {"kind": "angle", "depth_mm": 100, "width_mm": 75, "thickness_mm": 8,
         "root_radius_mm": 10, "toe_radius_mm": 4.8}, "material": {"grade": "A36"},
         "length_mm": 2000, "axial_kn": 80, "method": "csa-s16", "csa_n": 1.34},
        {"id": "U5", "section": {"kind": "channel", "depth_mm": 200, "width_mm": 75, "flange_mm": 12.5,
         "web_mm": 8.5, "root_radius_mm": 12}, "material": {"grade": "S275"}, "length_mm": 2500,
         "axial_kn": 100, "method": "perry-robertson", "bow_mm": 2.5},
        {"id": "T6", "section": {"kind": "tee", "depth_mm": 150, "width_mm": 150, "flange_mm": 10,
         "web_mm": 7, "root_radius_mm": 0}, "material": {"grade": "S235"}, "length_mm": 1800,
         "axial_kn": 60, "method": "secant", "eccentricity_mm": 3},
        {"id": "W7", "section": {"kind": "rect", "depth_mm": 195, "width_mm": 95},
         "material": {"fc0k_mpa": 21, "e005_mpa": 7400, "e0mean_mpa": 11000, "timber": "solid"},
         "length_mm": 2700, "axial_kn": 45.5, "method": "en1995-1-1", "service_class": 2,
         "load_duration": "short"},
        {"id": "W8", "section": {"kind": "round", "diameter_mm": 220},
         "material": {"fc0k_mpa": 28, "e005_mpa": 10400, "e0mean_mpa": 12600, "timber": "glulam"},
         "length_mm": 3200, "axial_kn": 120, "method": "en1995-1-1", "load_duration": "permanent"},
        {"id": "G9", "section": {"kind": "given", "area_mm2": 7808, "i_major_mm4": 1.2591e8,
         "i_minor_mm4": 4.073e7, "torsion_mm4": 595700, "warping_mm6": 1.709e12},
         "material": {"fy_mpa": 355, "e_mpa": 210000}, "length_mm": 3500, "axial_kn": 900,
         "method": "euler", "load_duration": "long", "curve_major": "b"},
        {"id": "K10", "section": {"kind": "catalogue", "designation": "HE 200 B"},
         "material": {"grade": "S355"}, "length_mm": 3500, "axial_kn": 900, "method": "en1993-1-1",
         "gamma_m1": 1.0, "curve_major": "a", "load_duration": "medium"},
        {"id": "G11", "section": {"kind": "given", "area_mm2": 5e-324, "i_major_mm4": 1.7976931348623157e308,
         "i_minor_mm4": 0.1}, "material": {"fy_mpa": 1.0e-300, "e_mpa": 210000.00000000003},
         "length_mm": -0.0, "axial_kn": -5, "method": "euler", "k_major": 1.0000000000000002},
        {"id": "L12", "section": {"kind": "angle", "depth_mm": 100, "width_mm": 75, "thickness_mm": 8,
         "root_radius_mm": 10, "toe_radius_mm": 4.8}, "material": {"grade": "A36"},
         "length_mm": 1500, "axial_kn": 60, "method": "aisc360-lrfd",
         "angle_connection": {"leg": "short", "truss": "space"}},
        {"id": "L13", "section": {"kind": "angle", "depth_mm": 80, "width_mm": 80, "thickness_mm": 8},
         "material": {"grade": "S355"}, "length_mm": 1200, "axial_kn": 50, "method": "aisc360-asd",
         "angle_connection": {"leg": "long"}}
      ]}"#;

    #[test]
    fn json_csv_json_keeps_every_member_exactly() {
        // The CSV side is exact for every f64 (Rust's shortest Display and
        // correctly rounded parse). The JSON side is exact for the values
        // below; serde_json without its `float_roundtrip` feature may misread
        // some long 17-digit values by one unit in the last place, so such
        // values are kept out of the JSON -> JSON comparison.
        let original = file::parse(EVERY).unwrap();
        assert_eq!(original.members.len(), 13);
        let csv_text = to_csv(&original);
        let back = parse_csv(&csv_text);
        assert!(back.problems.is_empty(), "{:#?}\n{csv_text}", back.problems);
        assert_eq!(back.members, original.members, "{csv_text}");
        for (a, b) in back.members.iter().zip(&original.members) {
            assert_eq!(a.length_mm.to_bits(), b.length_mm.to_bits());
        }
        // And on through JSON again, with the title set as the JSON had it.
        let mut again = MemberFile::new("every key");
        again.members = back.members;
        assert_eq!(again.to_json(), original.to_json());
        assert_eq!(file::parse(&again.to_json()).unwrap(), original);
        // CSV -> JSON -> CSV gives the same text.
        assert_eq!(to_csv(&again), csv_text);
        assert!(csv_text.starts_with("id,note,kind,"));
        // angle_connection is two flat columns, not a JSON cell.
        let header = csv_text.lines().next().unwrap();
        assert!(header.ends_with(",csa_n,angle_leg,angle_truss"), "{header}");
        assert!(!csv_text.contains('{'), "{csv_text}");
        let l12 = again.members.iter().find(|m| m.id == "L12").unwrap();
        assert_eq!(
            l12.angle_connection,
            Some(crate::member::AngleConnection {
                leg: crate::member::Leg::Short,
                truss: crate::member::Truss::Space
            })
        );
        assert!(csv_text.ends_with("\r\n"));
        // Absent options stay absent; a quoted empty note stays an empty note.
        let r2 = again.members.iter().find(|m| m.id == " R2 ").unwrap();
        assert_eq!(r2.note.as_deref(), Some(""));
        assert_eq!(r2.gamma_m1, None);
        assert_eq!(r2.k_major, 1.0);
    }

    #[test]
    fn us_csv_reads_back_within_rounding() {
        let mut original = file::parse(EVERY).unwrap();
        // G11 holds 5e-324 mm2, a subnormal that no unit conversion keeps.
        original.members.retain(|m| m.id != "G11");
        let text = to_csv_in(&original, UnitSystem::Us);
        let header = text.lines().next().unwrap();
        for col in [
            "length_ft",
            "lcr_minor_ft",
            "depth_in",
            "axial_kip",
            "fy_ksi",
            "area_in2",
        ] {
            assert!(header.split(',').any(|h| h == col), "{col} in {header}");
        }
        assert!(header.split(',').any(|h| h == "k_major"));
        let back = parse_csv(&text);
        assert!(back.problems.is_empty(), "{:#?}", back.problems);
        // Compare through JSON values: every number within 4e-16 relative
        // (two roundings of a conversion), all else equal.
        fn close(a: &Value, b: &Value) -> bool {
            match (a, b) {
                (Value::Number(x), Value::Number(y)) => {
                    let (x, y) = (x.as_f64().unwrap(), y.as_f64().unwrap());
                    x == y || ((x - y) / y).abs() <= 4e-16
                }
                (Value::Object(x), Value::Object(y)) => {
                    x.len() == y.len()
                        && x.iter().all(|(k, v)| y.get(k).is_some_and(|w| close(v, w)))
                }
                _ => a == b,
            }
        }
        for (a, b) in back.members.iter().zip(&original.members) {
            let (a, b) = (
                serde_json::to_value(a).unwrap(),
                serde_json::to_value(b).unwrap(),
            );
            assert!(close(&a, &b), "{a}\n{b}");
        }
        assert_eq!(back.members.len(), original.members.len());
    }

    #[test]
    fn fixtures_read_as_documented() {
        // A spreadsheet export with `sep=;`, BOM, CRLF, decimal commas and point thousands.
        let eu = parse_csv(include_str!(
            "../../tests/fixtures/csv/workshop-semicolon.csv"
        ));
        assert_eq!(eu.members.len(), 2, "{:#?}", eu.problems);
        let m1 = &eu.members[0];
        assert_eq!(
            (m1.id.as_str(), m1.length_mm, m1.k_minor, m1.axial_kn),
            ("M-01", 3600.0, 0.85, 1250.5)
        );
        assert_eq!(m1.note.as_deref(), Some("Stütze; Achse A"));
        let m2 = &eu.members[1];
        assert_eq!((m2.length_mm, m2.axial_kn), (2750.5, 12.75));
        assert_eq!(eu.member_lines, vec![3, 4]);
        let lines: BTreeSet<(usize, &str)> = eu
            .problems
            .iter()
            .map(|p| (p.line, p.column.as_str()))
            .collect();
        for col in ["area_mm2", "i_major_mm4", "i_minor_mm4", "Axial kN"] {
            assert!(lines.contains(&(5, col)), "{col}: {:#?}", eu.problems);
        }
        // US customary columns with feet and inches.
        let us = parse_csv(include_str!("../../tests/fixtures/csv/bracing-us.csv"));
        assert!(us.problems.is_empty(), "{:#?}", us.problems);
        let b1 = &us.members[0];
        assert_eq!(b1.length_mm, 13.0 * 304.8 + 6.0 * 25.4);
        assert_eq!(b1.lcr_minor_mm, Some(6.0 * 304.8 + 9.0 * 25.4));
        assert_eq!(b1.bow_mm, Some(0.25 * 25.4));
        assert_eq!(b1.axial_kn, 40.0 * units::KN_PER_KIP);
        assert_eq!(b1.note.as_deref(), Some("brace, bay 2"));
        let b2 = &us.members[1];
        assert_eq!(b2.length_mm, 20.0 * 304.8 + 4.5 * 25.4);
        assert_eq!(b2.axial_kn, 1250.0 * units::KN_PER_KIP);
        assert_eq!(us.members[2].length_mm, 10.5 * 304.8);
        assert_eq!(us.members[2].bow_mm, Some(0.375 * 25.4));
        // Tab-separated timber: "35,5" sets the decimal comma for the file.
        let tab = parse_csv(include_str!("../../tests/fixtures/csv/timber-tab.csv"));
        assert_eq!(tab.members.len(), 1);
        assert_eq!(tab.members[0].axial_kn, 35.5);
        assert_eq!(tab.members[0].service_class, Some(2));
        let cols: Vec<&str> = tab.problems.iter().map(|p| p.column.as_str()).collect();
        assert_eq!(
            cols,
            vec!["service_class", "load_duration"],
            "{:#?}",
            tab.problems
        );
        assert!(tab.problems.iter().all(|p| p.line == 3));
    }

    #[test]
    fn never_panics_on_mutated_valid_files() {
        // Start from valid files and damage them at random places, so the
        // damage reaches the row, section, material and serde stages.
        let seeds = [
            to_csv(&file::parse(EVERY).unwrap()),
            to_csv_in(&file::parse(EVERY).unwrap(), UnitSystem::Us),
            include_str!("../../tests/fixtures/csv/workshop-semicolon.csv").to_string(),
            include_str!("../../tests/fixtures/csv/bracing-us.csv").to_string(),
            include_str!("../../tests/fixtures/csv/timber-tab.csv").to_string(),
        ];
        let alphabet: Vec<char> = ",;\t\"'\r\n -/.,0123456789eEx—″′\u{a0}".chars().collect();
        let mut seed: u64 = 0x0123_4567_89ab_cdef;
        let mut next = || {
            seed ^= seed << 13;
            seed ^= seed >> 7;
            seed ^= seed << 17;
            seed
        };
        let mut valid_rows = 0usize;
        for round in 0..1500 {
            let base = &seeds[round % seeds.len()];
            let mut chars: Vec<char> = base.chars().collect();
            for _ in 0..(1 + next() % 4) {
                let at = (next() as usize) % (chars.len() + 1);
                match next() % 3 {
                    0 if at < chars.len() => {
                        chars.remove(at);
                    }
                    1 if at < chars.len() => {
                        chars[at] = alphabet[(next() as usize) % alphabet.len()];
                    }
                    _ => chars.insert(at, alphabet[(next() as usize) % alphabet.len()]),
                }
            }
            let text: String = chars.into_iter().collect();
            let got = parse_csv(&text);
            assert_eq!(got.members.len(), got.member_lines.len());
            valid_rows += got.members.len();
            for p in &got.problems {
                assert!(!p.message.is_empty());
                let _ = p.to_string();
            }
            // Whatever was read writes and reads back to the same members.
            let mut f = MemberFile::new("m");
            f.members = got.members;
            let again = parse_csv(&to_csv(&f));
            assert_eq!(again.members, f.members, "{text}");
        }
        // Most damage hits one row, so most rows still read.
        assert!(valid_rows > 1500, "{valid_rows}");
    }

    mod fuzz {
        #![allow(
            clippy::unwrap_used,
            clippy::expect_used,
            clippy::indexing_slicing,
            clippy::panic
        )]
        use super::super::*;
        use proptest::prelude::*;

        proptest! {
            #![proptest_config(ProptestConfig::with_cases(256))]
            #[test]
            fn any_bytes_read_without_panic(bytes in proptest::collection::vec(any::<u8>(), 0..600)) {
                let text = String::from_utf8_lossy(&bytes);
                let got = parse_csv(&text);
                prop_assert_eq!(got.members.len(), got.member_lines.len());
            }
        }
    }
}
