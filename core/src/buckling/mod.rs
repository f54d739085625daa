//! Buckling lengths from the real member: the effective-length factor of
//! a column in a frame from the alignment-chart equations ([`chart`]), and
//! a finite-element elastic critical load analysis of a column with steps,
//! end springs, intermediate braces and axial loads along it
//! ([`column`]), on a banded solver of its own ([`band`]), remembered per
//! thread ([`memo`]).
//!
//! Nothing here knows about screens or files beyond the member-file types
//! it reads; every refusal is a typed [`crate::Error`] naming the key.

pub mod band;
pub mod chart;
pub mod column;
pub mod ends;
pub mod memo;
pub mod model;

use serde::de::{self, Deserializer, Visitor};
use serde::{Deserialize, Serialize, Serializer};

/// The two flexural axes of a column.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Axis {
    /// The major principal axis.
    Major,
    /// The minor principal axis.
    Minor,
}

impl Axis {
    /// Its name in the member file.
    pub fn key(self) -> &'static str {
        match self {
            Axis::Major => "major",
            Axis::Minor => "minor",
        }
    }
}

/// How a degree of freedom is held: `"fixed"`, `"free"`, or a spring of
/// the given stiffness (a number: kN/mm for a translation, kN m/rad for a
/// rotation).
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Fixity {
    /// Held rigidly.
    Fixed,
    /// Not held.
    Free,
    /// Held by a spring of this stiffness.
    Spring(f64),
}

impl Serialize for Fixity {
    fn serialize<S: Serializer>(&self, s: S) -> std::result::Result<S::Ok, S::Error> {
        match self {
            Fixity::Fixed => s.serialize_str("fixed"),
            Fixity::Free => s.serialize_str("free"),
            Fixity::Spring(k) => s.serialize_f64(*k),
        }
    }
}

struct FixityVisitor;

impl Visitor<'_> for FixityVisitor {
    type Value = Fixity;

    fn expecting(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str("\"fixed\", \"free\" or a spring stiffness (a number)")
    }

    fn visit_str<E: de::Error>(self, v: &str) -> std::result::Result<Fixity, E> {
        match v {
            "fixed" => Ok(Fixity::Fixed),
            "free" => Ok(Fixity::Free),
            _ => Err(E::invalid_value(de::Unexpected::Str(v), &self)),
        }
    }

    fn visit_f64<E: de::Error>(self, v: f64) -> std::result::Result<Fixity, E> {
        Ok(Fixity::Spring(v))
    }

    fn visit_i64<E: de::Error>(self, v: i64) -> std::result::Result<Fixity, E> {
        Ok(Fixity::Spring(v as f64))
    }

    fn visit_u64<E: de::Error>(self, v: u64) -> std::result::Result<Fixity, E> {
        Ok(Fixity::Spring(v as f64))
    }
}

impl<'de> Deserialize<'de> for Fixity {
    fn deserialize<D: Deserializer<'de>>(d: D) -> std::result::Result<Fixity, D::Error> {
        d.deserialize_any(FixityVisitor)
    }
}

/// An end support about one axis.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Support {
    /// Sideways movement: fixed, free or a spring in kN/mm.
    pub translation: Fixity,
    /// Rotation: fixed, free or a spring in kN m/rad.
    pub rotation: Fixity,
}

impl Support {
    /// Held sideways, free to turn.
    pub const PINNED: Support = Support {
        translation: Fixity::Fixed,
        rotation: Fixity::Free,
    };
    /// Held sideways and against turning.
    pub const FIXED: Support = Support {
        translation: Fixity::Fixed,
        rotation: Fixity::Fixed,
    };
    /// Free to move and turn.
    pub const FREE: Support = Support {
        translation: Fixity::Free,
        rotation: Fixity::Free,
    };
    /// Free to move sideways, held against turning.
    pub const SLIDING: Support = Support {
        translation: Fixity::Free,
        rotation: Fixity::Fixed,
    };
}
