//! The member-file key `buckling_model` (version 3): its types. The
//! analysis of a member with it is `crate::check::buckle` (it needs the
//! member and the check, which sit above this module).

use serde::{Deserialize, Serialize};

use super::{Axis, Fixity, Support};
use crate::section::SectionSpec;

/// A length of the column from end A towards end B.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Segment {
    /// Its length, mm.
    pub length_mm: f64,
    /// Its section (default: the member's).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub section: Option<SectionSpec>,
}

/// An end's supports about each axis.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct End {
    /// About the major axis.
    pub major: Support,
    /// About the minor axis.
    pub minor: Support,
}

/// The two ends.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Ends {
    /// End A (x = 0, where the loads are carried to).
    pub a: End,
    /// End B (x = length_mm).
    pub b: End,
}

/// Which axis a restraint holds.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum RestraintAxis {
    /// Major-axis buckling only.
    Major,
    /// Minor-axis buckling only.
    Minor,
    /// Both.
    Both,
}

impl RestraintAxis {
    /// Whether it holds the column about `axis`.
    pub fn holds(self, axis: Axis) -> bool {
        matches!(
            (self, axis),
            (RestraintAxis::Both, _)
                | (RestraintAxis::Major, Axis::Major)
                | (RestraintAxis::Minor, Axis::Minor)
        )
    }
}

/// A brace along the member.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Restraint {
    /// Distance from end A, mm.
    pub at_mm: f64,
    /// The axis it holds.
    pub axis: RestraintAxis,
    /// `"fixed"` or a spring stiffness, kN/mm.
    pub translation: Fixity,
}

/// A point axial load.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct AxialLoad {
    /// Distance from end A, mm.
    pub at_mm: f64,
    /// Compression, kN.
    pub axial_kn: f64,
}

fn is_zero(v: &f64) -> bool {
    *v == 0.0
}

/// The member key `buckling_model`.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct BucklingModel {
    /// The segments from end A to end B; empty: one segment, the member.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub segments: Vec<Segment>,
    /// The end supports.
    pub ends: Ends,
    /// Braces along the member.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub restraints: Vec<Restraint>,
    /// Point axial loads; without any (and no distributed load) the
    /// pattern is the member's `axial_kn` at end B.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub axial_loads: Vec<AxialLoad>,
    /// A distributed axial load, kN/m (self-weight, for example).
    #[serde(default, skip_serializing_if = "is_zero")]
    pub distributed_kn_per_m: f64,
}

impl BucklingModel {
    /// Whether the model gives its own load pattern (point loads or a
    /// distributed load); without one, the pattern is the member's
    /// `axial_kn` at end B.
    pub fn carries_own_loads(&self) -> bool {
        !self.axial_loads.is_empty() || self.distributed_kn_per_m != 0.0
    }
}
