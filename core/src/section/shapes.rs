//! Properties of each parametric shape (PLACEHOLDER: only rect, round and
//! given until the sections work lands).

use std::f64::consts::PI;

use super::{Properties, SectionSpec};
use crate::error::{positive, Error, Result};

/// Steel density for mass per metre, kg/m3 (common practice, EN 1991-1-1 Table A.4 gives 77 kN/m3 ~ 7850 kg/m3).
pub const STEEL_DENSITY: f64 = 7850.0;

fn finish(mut p: Properties) -> Properties {
    p.i_major_mm4 = p.i_y_mm4.max(p.i_z_mm4);
    p.i_minor_mm4 = p.i_y_mm4.min(p.i_z_mm4);
    p.r_major_mm = (p.i_major_mm4 / p.area_mm2).sqrt();
    p.r_minor_mm = (p.i_minor_mm4 / p.area_mm2).sqrt();
    p.mass_kg_per_m = p.area_mm2 * 1e-6 * STEEL_DENSITY;
    p
}

/// Validates and computes.
pub fn properties(spec: &SectionSpec) -> Result<Properties> {
    match spec {
        SectionSpec::Rect(s) => {
            let h = positive("depth_mm", s.depth_mm)?;
            let b = positive("width_mm", s.width_mm)?;
            Ok(finish(Properties {
                area_mm2: b * h,
                i_y_mm4: b * h.powi(3) / 12.0,
                i_z_mm4: h * b.powi(3) / 12.0,
                ..Properties::default()
            }))
        }
        SectionSpec::Round(s) => {
            let d = positive("diameter_mm", s.diameter_mm)?;
            let i = PI * d.powi(4) / 64.0;
            Ok(finish(Properties {
                area_mm2: PI * d * d / 4.0,
                i_y_mm4: i,
                i_z_mm4: i,
                ..Properties::default()
            }))
        }
        SectionSpec::Given(s) => Ok(finish(Properties {
            area_mm2: positive("area_mm2", s.area_mm2)?,
            i_y_mm4: positive("i_major_mm4", s.i_major_mm4)?,
            i_z_mm4: positive("i_minor_mm4", s.i_minor_mm4)?,
            torsion_mm4: s.torsion_mm4.unwrap_or(0.0),
            warping_mm6: s.warping_mm6.unwrap_or(0.0),
            ..Properties::default()
        })),
        _ => Err(Error::Geometry {
            field: "kind",
            reason: "this shape is not available yet".into(),
        }),
    }
}

/// A short description.
pub fn describe(spec: &SectionSpec) -> String {
    match spec {
        SectionSpec::Rect(s) => format!("rect {}x{}", s.depth_mm, s.width_mm),
        SectionSpec::Round(s) => format!("round {}", s.diameter_mm),
        SectionSpec::Catalogue(c) => c.designation.clone(),
        _ => "section".into(),
    }
}
