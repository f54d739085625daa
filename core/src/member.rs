//! A member as written in the member file: section, material, length and
//! restraint, design load, method and the method's options.

use serde::{Deserialize, Serialize};

use crate::error::{non_negative, positive, Error, Result};
use crate::material::MaterialSpec;
use crate::method::Method;
use crate::section::SectionSpec;

/// EN 1993-1-1 buckling curves (Table 6.1).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Curve {
    /// a0, alpha = 0.13.
    A0,
    /// a, alpha = 0.21.
    A,
    /// b, alpha = 0.34.
    B,
    /// c, alpha = 0.49.
    C,
    /// d, alpha = 0.76.
    D,
}

impl Curve {
    /// Every curve, stiffest first.
    pub const ALL: [Curve; 5] = [Curve::A0, Curve::A, Curve::B, Curve::C, Curve::D];

    /// Imperfection factor alpha, EN 1993-1-1 Table 6.1.
    pub fn alpha(self) -> f64 {
        match self {
            Curve::A0 => 0.13,
            Curve::A => 0.21,
            Curve::B => 0.34,
            Curve::C => 0.49,
            Curve::D => 0.76,
        }
    }

    /// Its name as in the standard.
    pub fn name(self) -> &'static str {
        match self {
            Curve::A0 => "a0",
            Curve::A => "a",
            Curve::B => "b",
            Curve::C => "c",
            Curve::D => "d",
        }
    }
}

/// Load-duration classes of EN 1995-1-1 2.3.1.2.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum LoadDuration {
    /// Permanent (more than 10 years).
    Permanent,
    /// Long-term (6 months to 10 years).
    Long,
    /// Medium-term (1 week to 6 months).
    Medium,
    /// Short-term (less than a week).
    Short,
    /// Instantaneous.
    Instantaneous,
}

/// Which leg of a single angle its end connections load (AISC 360-16 E5).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Leg {
    /// The longer leg (either leg of an equal angle).
    Long,
    /// The shorter leg.
    Short,
}

/// The kind of member E5 distinguishes.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize, Default)]
#[serde(rename_all = "lowercase")]
pub enum Truss {
    /// E5(a): an individual member, or a web member of a planar truss
    /// with adjacent web members on the same side of the gusset or chord.
    #[default]
    Planar,
    /// E5(b): a web member of a box or space truss with adjacent web
    /// members on the same side of the gusset or chord.
    Space,
}

/// A single angle loaded at its ends through one leg (member file
/// version 2, key `angle_connection`). Absent: loaded through the centroid.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct AngleConnection {
    /// The connected leg.
    pub leg: Leg,
    /// E5(a) or E5(b); default planar.
    #[serde(default)]
    pub truss: Truss,
}

/// CSA S16-19 13.3.1 exponent n: 1.34 for most members, 2.24 for
/// hot-finished hollow sections and stress-relieved welded sections.
pub const CSA_N_DEFAULT: f64 = 1.34;

fn one() -> f64 {
    1.0
}

fn is_one(v: &f64) -> bool {
    *v == 1.0
}

/// One compression member.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Member {
    /// Unique id within the list (e.g. "C12").
    pub id: String,
    /// Free text.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub note: Option<String>,
    /// The cross-section.
    pub section: SectionSpec,
    /// The material.
    pub material: MaterialSpec,
    /// System length between restraints, mm.
    pub length_mm: f64,
    /// Effective-length factor for major-axis buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_major: f64,
    /// Effective-length factor for minor-axis buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_minor: f64,
    /// Effective-length factor for torsional buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_torsion: f64,
    /// Major-axis buckling length given directly, mm (wins over k_major).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_major_mm: Option<f64>,
    /// Minor-axis buckling length given directly, mm (wins over k_minor).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_minor_mm: Option<f64>,
    /// Torsional buckling length given directly, mm (wins over k_torsion).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_torsion_mm: Option<f64>,
    /// Design compression, kN (>= 0).
    pub axial_kn: f64,
    /// Design method.
    pub method: Method,
    /// Partial factor gamma_M1 (EN 1993; default 1.0); for the
    /// first-principles methods an optional factor on the resistance.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub gamma_m1: Option<f64>,
    /// EN 1993 buckling curve for the major axis, overriding Table 6.2.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub curve_major: Option<Curve>,
    /// EN 1993 buckling curve for the minor axis, overriding Table 6.2.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub curve_minor: Option<Curve>,
    /// Perry-Robertson initial bow amplitude, mm (default length/1000).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bow_mm: Option<f64>,
    /// Secant formula load eccentricity, mm (default length/1000).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub eccentricity_mm: Option<f64>,
    /// EN 1995 service class 1, 2 or 3 (default 1).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub service_class: Option<u8>,
    /// EN 1995 load-duration class (default medium).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub load_duration: Option<LoadDuration>,
    /// CSA S16 exponent n (1.34 or 2.24; default by section make).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub csa_n: Option<f64>,
    /// A single angle connected through one leg (AISC 360-16 E5; version 2).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub angle_connection: Option<AngleConnection>,
}

/// The longest length or buckling length accepted, mm (10 km): beyond it
/// a number is a typing slip, not a member.
pub const MAX_LENGTH_MM: f64 = 1.0e7;

/// The shortest length or buckling length accepted, mm.
pub const MIN_LENGTH_MM: f64 = 1.0;

/// The largest design compression accepted, kN.
pub const MAX_AXIAL_KN: f64 = 1.0e7;

fn bounded(field: &'static str, value: f64) -> Result<f64> {
    let v = positive(field, value)?;
    if !(MIN_LENGTH_MM..=MAX_LENGTH_MM).contains(&v) {
        return Err(Error::OutOfRange {
            field,
            value: v,
            expected: "a length from 1 mm to 10,000,000 mm (10 km)",
        });
    }
    Ok(v)
}

/// Buckling lengths of a member, mm.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BucklingLengths {
    /// About the major axis.
    pub major_mm: f64,
    /// About the minor axis.
    pub minor_mm: f64,
    /// For torsional buckling.
    pub torsion_mm: f64,
}

impl Member {
    /// Checks every scalar field of the member (not the section or material,
    /// which check themselves) and returns its buckling lengths.
    pub fn buckling_lengths(&self) -> Result<BucklingLengths> {
        let length = bounded("length_mm", self.length_mm)?;
        let k_major = positive("k_major", self.k_major)?;
        let k_minor = positive("k_minor", self.k_minor)?;
        let k_torsion = positive("k_torsion", self.k_torsion)?;
        let pick = |given: Option<f64>, field: &'static str, k: f64| -> Result<f64> {
            match given {
                Some(v) => bounded(field, v),
                None => Ok(k * length),
            }
        };
        Ok(BucklingLengths {
            major_mm: bounded("k_major", pick(self.lcr_major_mm, "lcr_major_mm", k_major)?)?,
            minor_mm: bounded("k_minor", pick(self.lcr_minor_mm, "lcr_minor_mm", k_minor)?)?,
            torsion_mm: bounded(
                "k_torsion",
                pick(self.lcr_torsion_mm, "lcr_torsion_mm", k_torsion)?,
            )?,
        })
    }

    /// Checks the method options that do not depend on the method.
    pub fn validate_options(&self) -> Result<()> {
        non_negative("axial_kn", self.axial_kn)?;
        if self.axial_kn > MAX_AXIAL_KN {
            return Err(Error::OutOfRange {
                field: "axial_kn",
                value: self.axial_kn,
                expected: "a design compression up to 10,000,000 kN",
            });
        }
        if let Some(g) = self.gamma_m1 {
            // No code here has a material (partial) factor below 1.0
            // (EN 1993-1-1 6.1(1) Note 2B recommends 1.00); below it the
            // resistance would exceed the squash load.
            if !(g.is_finite() && (1.0..=3.0).contains(&g)) {
                return Err(Error::OutOfRange {
                    field: "gamma_m1",
                    value: g,
                    expected:
                        "a partial factor from 1.0 to 3.0 (none of the codes has one below 1.0)",
                });
            }
        }
        if let Some(b) = self.bow_mm {
            non_negative("bow_mm", b)?;
        }
        if let Some(e) = self.eccentricity_mm {
            non_negative("eccentricity_mm", e)?;
        }
        if let Some(sc) = self.service_class {
            if !(1..=3).contains(&sc) {
                return Err(Error::OutOfRange {
                    field: "service_class",
                    value: f64::from(sc),
                    expected: "1, 2 or 3",
                });
            }
        }
        if let Some(n) = self.csa_n {
            if !(n.is_finite() && (1.0..=3.0).contains(&n)) {
                return Err(Error::OutOfRange {
                    field: "csa_n",
                    value: n,
                    expected: "1.34 or 2.24 (CSA S16-19 13.3.1)",
                });
            }
        }
        if self.id.trim().is_empty() {
            return Err(Error::Geometry {
                field: "id",
                reason: "every member needs an id; give it a short name such as \"C1\"".into(),
            });
        }
        Ok(())
    }
}
