//! Typed errors of the engine. Every message names what is wrong and says
//! how to put it right; front ends show them as they are.

use std::fmt;

/// Everything that can go wrong in the engine.
#[derive(Debug, Clone, PartialEq)]
pub enum Error {
    /// A dimension or quantity must be a finite number greater than zero.
    NotPositive {
        /// The field, as named in the member file (e.g. "depth_mm").
        field: &'static str,
        /// What was given.
        value: f64,
    },
    /// A quantity must be finite and at least zero (e.g. a design load).
    Negative {
        /// The field, as named in the member file.
        field: &'static str,
        /// What was given.
        value: f64,
    },
    /// A value is outside the range the field accepts.
    OutOfRange {
        /// The field, as named in the member file.
        field: &'static str,
        /// What was given.
        value: f64,
        /// The accepted range, in words ("between 0.5 and 10").
        expected: &'static str,
    },
    /// The dimensions describe a shape that cannot exist.
    Geometry {
        /// The field that has to change.
        field: &'static str,
        /// Why, in words, with the limit.
        reason: String,
    },
    /// A material grade that this build does not know.
    UnknownGrade {
        /// What was asked for.
        grade: String,
        /// Grades that are known, nearest first.
        suggestions: Vec<String>,
    },
    /// A catalogue designation that this build does not know.
    UnknownDesignation {
        /// What was asked for.
        designation: String,
        /// Designations that are known, nearest first.
        suggestions: Vec<String>,
    },
    /// A method that cannot be used with this material or section.
    NotApplicable {
        /// The method's name in the member file.
        method: &'static str,
        /// Why, in words.
        reason: String,
    },
    /// The text is not a member file at all.
    NotMemberFile {
        /// What was found instead.
        reason: String,
    },
    /// A member file of a version this build does not read.
    UnsupportedVersion {
        /// The version in the file.
        found: u64,
        /// The newest version this build reads.
        newest: u64,
    },
    /// The JSON does not parse, or a field has the wrong type.
    Syntax {
        /// Line of the problem (1-based), 0 when unknown.
        line: usize,
        /// Column of the problem (1-based), 0 when unknown.
        column: usize,
        /// The parser's words.
        message: String,
    },
    /// Two members share an id.
    DuplicateId {
        /// The repeated id.
        id: String,
    },
    /// A key inside a structured member-file value (the buckling model,
    /// with its place in a list) is wrong.
    Key {
        /// The key's path, e.g. "buckling_model.restraints[1].at_mm".
        key: String,
        /// Why, in words, and how to put it right.
        reason: String,
    },
    /// An error inside one member of a list.
    InMember {
        /// The member's id (or its position when it has none).
        id: String,
        /// The error itself.
        source: Box<Error>,
    },
}

impl Error {
    /// Wraps this error with the id of the member it belongs to.
    pub fn in_member(self, id: &str) -> Error {
        Error::InMember {
            id: id.to_string(),
            source: Box::new(self),
        }
    }

    /// The full path of the key this error is about: [`Error::field`], or
    /// the path of an [`Error::Key`] ("buckling_model.segments[0].length_mm").
    pub fn key(&self) -> Option<&str> {
        match self {
            Error::Key { key, .. } => Some(key),
            Error::InMember { source, .. } => source.key(),
            other => other.field(),
        }
    }

    /// The member-file field this error is about, when there is one.
    pub fn field(&self) -> Option<&'static str> {
        match self {
            Error::NotPositive { field, .. }
            | Error::Negative { field, .. }
            | Error::OutOfRange { field, .. }
            | Error::Geometry { field, .. } => Some(field),
            Error::UnknownGrade { .. } => Some("material"),
            Error::UnknownDesignation { .. } => Some("designation"),
            Error::NotApplicable { .. } => Some("method"),
            Error::InMember { source, .. } => source.field(),
            _ => None,
        }
    }
}

fn list(items: &[String]) -> String {
    items
        .iter()
        .map(|s| format!("\"{s}\""))
        .collect::<Vec<_>>()
        .join(", ")
}

impl fmt::Display for Error {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Error::NotPositive { field, value } => write!(
                f,
                "{field}: must be a number greater than zero (got {value}); enter a positive value"
            ),
            Error::Negative { field, value } => write!(
                f,
                "{field}: must be zero or more (got {value}); enter compression as a positive number"
            ),
            Error::OutOfRange {
                field,
                value,
                expected,
            } => write!(f, "{field}: {value} is out of range; expected {expected}"),
            Error::Geometry { field, reason } => write!(f, "{field}: {reason}"),
            Error::UnknownGrade { grade, suggestions } => {
                write!(f, "material: unknown grade \"{grade}\"")?;
                if suggestions.is_empty() {
                    write!(f, "; give fy_mpa and e_mpa for a custom material")
                } else {
                    write!(f, "; did you mean {}?", list(suggestions))
                }
            }
            Error::UnknownDesignation {
                designation,
                suggestions,
            } => {
                write!(f, "designation: no catalogue section \"{designation}\"")?;
                if suggestions.is_empty() {
                    write!(f, "; enter the dimensions instead")
                } else {
                    write!(f, "; nearest are {}", list(suggestions))
                }
            }
            Error::NotApplicable { method, reason } => {
                write!(f, "method: \"{method}\" cannot be used here: {reason}")
            }
            Error::NotMemberFile { reason } => write!(
                f,
                "not a Strutline member file ({reason}); expected {{\"format\": \"strutline.members\", \"version\": 1, ...}}"
            ),
            Error::UnsupportedVersion { found, newest } => write!(
                f,
                "member file version {found} is not readable by this build, which reads versions 1 to {newest}; \
                 open it with a newer Strutline"
            ),
            Error::Syntax {
                line,
                column,
                message,
            } => {
                if *line > 0 {
                    write!(f, "line {line}, column {column}: {message}")
                } else {
                    write!(f, "{message}")
                }
            }
            Error::DuplicateId { id } => write!(
                f,
                "id: \"{id}\" is used by more than one member; give each member its own id"
            ),
            Error::Key { key, reason } => write!(f, "{key}: {reason}"),
            Error::InMember { id, source } => write!(f, "member \"{id}\": {source}"),
        }
    }
}

impl std::error::Error for Error {}

/// Result with the engine's [`Error`].
pub type Result<T> = std::result::Result<T, Error>;

/// Checks that `value` is finite and greater than zero.
pub fn positive(field: &'static str, value: f64) -> Result<f64> {
    if value.is_finite() && value > 0.0 {
        Ok(value)
    } else {
        Err(Error::NotPositive { field, value })
    }
}

/// Whether every value is finite and above zero (or, for values so large
/// that their sum overflows, `false`: the caller then tests them one by
/// one with [`positive`], which names the field). Branch-free: the smallest above zero and the sum finite.
#[inline]
pub fn all_positive<const N: usize>(values: [f64; N]) -> bool {
    let (mut least, mut sum) = (f64::INFINITY, 0.0);
    for v in values {
        least = least.min(v);
        sum += v;
    }
    least > 0.0 && sum.is_finite()
}

/// Checks that `value` is finite and at least zero.
pub fn non_negative(field: &'static str, value: f64) -> Result<f64> {
    if value.is_finite() && value >= 0.0 {
        Ok(value)
    } else {
        Err(Error::Negative { field, value })
    }
}
