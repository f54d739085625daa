//! Materials: steel grades by their product standards (yield strength by
//! thickness), timber strength classes, and custom materials.
//!
//! PLACEHOLDER until the materials work lands: only custom materials resolve.

use serde::{Deserialize, Serialize};

use crate::error::{positive, Error, Result};
use crate::section::Section;

/// Solid (sawn) timber or glued laminated timber: sets beta_c and gamma_M.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum TimberKind {
    /// Solid timber (EN 338).
    Solid,
    /// Glued laminated timber (EN 14080).
    Glulam,
}

/// A material as written in the member file.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(untagged)]
pub enum MaterialSpec {
    /// A named grade or strength class ("S355", "A992", "C24", "GL28h").
    Grade {
        /// The grade's name.
        grade: String,
    },
    /// A custom timber.
    Timber {
        /// Characteristic compressive strength parallel to grain f_c,0,k, MPa.
        fc0k_mpa: f64,
        /// Fifth-percentile modulus E_0,05, MPa.
        e005_mpa: f64,
        /// Mean modulus E_0,mean, MPa.
        e0mean_mpa: f64,
        /// Solid or glued laminated.
        timber: TimberKind,
    },
    /// A custom steel or other elastic-plastic material.
    Custom {
        /// Yield strength f_y, MPa.
        fy_mpa: f64,
        /// Young's modulus E, MPa.
        e_mpa: f64,
        /// Shear modulus G, MPa (default E / 2.6).
        #[serde(default, skip_serializing_if = "Option::is_none")]
        g_mpa: Option<f64>,
    },
}

/// A resolved steel (or custom elastic-plastic) material.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Steel {
    /// Grade name ("S355", "custom").
    pub name: &'static str,
    /// Standard the values come from.
    pub standard: &'static str,
    /// Yield strength for the section's governing thickness, MPa.
    pub fy_mpa: f64,
    /// Young's modulus, MPa.
    pub e_mpa: f64,
    /// Shear modulus, MPa.
    pub g_mpa: f64,
}

/// A resolved timber.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Timber {
    /// Class name ("C24", "custom").
    pub name: &'static str,
    /// Standard the values come from.
    pub standard: &'static str,
    /// Solid or glulam.
    pub kind: TimberKind,
    /// f_c,0,k, MPa.
    pub fc0k_mpa: f64,
    /// E_0,05, MPa.
    pub e005_mpa: f64,
    /// E_0,mean, MPa.
    pub e0mean_mpa: f64,
}

/// A material ready for a method.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub enum Material {
    /// Steel or a custom elastic-plastic material.
    Steel(Steel),
    /// Timber.
    Timber(Timber),
}

impl Material {
    /// The strength that caps a stocky member (f_y or f_c,0,k) and the
    /// modulus for buckling (E or E_0,05), MPa.
    pub fn strength_and_modulus(&self) -> (f64, f64) {
        match self {
            Material::Steel(s) => (s.fy_mpa, s.e_mpa),
            Material::Timber(t) => (t.fc0k_mpa, t.e005_mpa),
        }
    }
}

/// Resolves a material for a section (the yield strength falls with the
/// section's governing thickness where the standard says so).
pub fn resolve(spec: &MaterialSpec, _section: &Section) -> Result<Material> {
    match spec {
        MaterialSpec::Grade { grade } => Err(Error::UnknownGrade {
            grade: grade.clone(),
            suggestions: Vec::new(),
        }),
        MaterialSpec::Custom { fy_mpa, e_mpa, g_mpa } => {
            let e = positive("e_mpa", *e_mpa)?;
            Ok(Material::Steel(Steel {
                name: "custom",
                standard: "custom",
                fy_mpa: positive("fy_mpa", *fy_mpa)?,
                e_mpa: e,
                g_mpa: match g_mpa {
                    Some(g) => positive("g_mpa", *g)?,
                    None => e / 2.6,
                },
            }))
        }
        MaterialSpec::Timber {
            fc0k_mpa,
            e005_mpa,
            e0mean_mpa,
            timber,
        } => Ok(Material::Timber(Timber {
            name: "custom",
            standard: "custom",
            kind: *timber,
            fc0k_mpa: positive("fc0k_mpa", *fc0k_mpa)?,
            e005_mpa: positive("e005_mpa", *e005_mpa)?,
            e0mean_mpa: positive("e0mean_mpa", *e0mean_mpa)?,
        })),
    }
}
