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
//! `space`, needing `angle_leg`); `frame_major`'s and `frame_minor`'s keys
//! take the prefix `frame_major_` / `frame_minor_` (`frame_major_sway`,
//! `frame_major_g_a`, `frame_major_g_b`: all three or none). Header names are read without regard to case,
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
//! primes ′ ″ and the words `ft`/`in` are accepted as well). A converted
//! value within 1 part in 10^9 of a whole thousandth of its SI unit is
//! read as that thousandth, so the writer ([`to_csv_in`]) gives each US
//! cell the fewest figures that read back to the stored value exactly
//! (ten at most for a value given to the thousandth: 4000 mm is
//! 13.12335958 ft, not 13.123359580052493).
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
//! 5. What a person types into one field ([`parse_field`], [`parse_typed`],
//!    every number field of the app) has no file to set a convention: a
//!    single point is the decimal mark (`1.234` is 1.234), a single comma
//!    too unless exactly three digits follow it (`12,5` is 12.5), and
//!    `1,234` is refused as ambiguous (1234 or 1.234? under-reading a load
//!    a thousand times is the unsafe side), naming both ways to type it;
//!    rules 1 to 3 hold as for a file (`1,234.5` is 1234.5).
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
//! JSON -> CSV -> JSON keeps every member exactly, except `buckling_model`,
//! which a row does not carry ([`left_out`] says which members lose it).

mod keys;
mod lex;
mod number;
mod read;
#[cfg(test)]
mod tests;
mod write;

use std::fmt;

use serde::Serialize;

use crate::file::{self, MemberFile};
use crate::member::Member;

pub use number::{parse_field, parse_typed};
pub use read::{parse_csv, parse_csv_within};
pub use write::{cells, left_out, not_in_csv, to_csv, to_csv_in, uncarried, Layout};

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
    lex::detect_separator(text.strip_prefix('\u{feff}').unwrap_or(text)).0
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
