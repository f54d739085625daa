//! Solid rectangles and round bars (exact), and sections given by their
//! properties.
//!
//! Rect reference position: [0, b] x [0, h]; round: [0, d] x [0, d].
//! Rect torsion constant: the exact series of Timoshenko & Goodier
//! ([`super::rect_torsion`]). Rect warping constant: taken as 0, as is
//! common practice for solid sections (torsional buckling of a solid bar
//! is governed by I_t; a finite-element warping analysis of a 100 x 40
//! bar gives I_w ≈ 2.3e8 mm6, which adds under 0.1 % to its torsional
//! resistance at any practical length).
//! Round: I_t = π d⁴/32, I_w = 0 (exact).
//!
//! Given: the typed area and second moments; r = √(I/A); the torsion and
//! warping constants when typed (else 0); the elastic and plastic moduli
//! when typed (member file version 3), else 0 (unknown: a moment that needs
//! one is refused naming the key); centroid and shear centre coincide.

use std::f64::consts::PI;

use super::{dim, Bending, Raw};
use crate::error::{Error, Result};
use crate::section::geometry::{Axis, Parts, Poly};
use crate::section::{Given, Properties, Rect, Round};

pub(super) fn rect(s: &Rect) -> Result<Raw> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let mut p = Parts::new();
    p.rect(0.0, b, 0.0, h, 1.0);
    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(h / 2.0)),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(b / 2.0)),
        },
        torsion: super::rect_torsion(h, b),
        warping: 0.0,
        shear_centre: (b / 2.0, h / 2.0),
    })
}

pub(super) fn round(s: &Round) -> Result<Raw> {
    let d = dim("diameter_mm", s.diameter_mm)?;
    let mut p = Parts::new();
    super::hollow::disc(&mut p, d / 2.0, d / 2.0, 1.0);
    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, d, 0.0, d),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(d / 2.0)),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(d / 2.0)),
        },
        torsion: PI * d.powi(4) / 32.0,
        warping: 0.0,
        shear_centre: (d / 2.0, d / 2.0),
    })
}

fn optional(field: &'static str, v: Option<f64>) -> Result<f64> {
    match v {
        None => Ok(0.0),
        Some(x) if x.is_finite() && x >= 0.0 => Ok(x),
        Some(x) => Err(Error::Geometry {
            field,
            reason: format!("must be a number of zero or more when given (got {x})"),
        }),
    }
}

/// A typed property at least `least`: below it the number is a typing slip
/// (the smallest structural sections have areas of tens of mm2), and the
/// arithmetic that follows would lose every digit.
fn at_least(field: &'static str, value: f64, least: f64, expected: &'static str) -> Result<f64> {
    let v = crate::error::positive(field, value)?;
    if v < least {
        return Err(Error::OutOfRange {
            field,
            value: v,
            expected,
        });
    }
    Ok(v)
}

pub(super) fn given(s: &Given) -> Result<Properties> {
    let a = at_least("area_mm2", s.area_mm2, 1.0, "an area of at least 1 mm2")?;
    let i_major = at_least(
        "i_major_mm4",
        s.i_major_mm4,
        1.0,
        "a second moment of at least 1 mm4",
    )?;
    let i_minor = at_least(
        "i_minor_mm4",
        s.i_minor_mm4,
        1.0,
        "a second moment of at least 1 mm4",
    )?;
    if i_minor > i_major {
        return Err(Error::Geometry {
            field: "i_minor_mm4",
            reason: format!(
                "the minor-axis second moment {i_minor} mm4 must not exceed the major {i_major} mm4; \
                 swap them"
            ),
        });
    }
    Ok(Properties {
        area_mm2: a,
        i_y_mm4: i_major,
        i_z_mm4: i_minor,
        i_major_mm4: i_major,
        i_minor_mm4: i_minor,
        r_major_mm: (i_major / a).sqrt(),
        r_minor_mm: (i_minor / a).sqrt(),
        torsion_mm4: optional("torsion_mm4", s.torsion_mm4)?,
        warping_mm6: optional("warping_mm6", s.warping_mm6)?,
        w_el_major_mm3: optional("w_el_major_mm3", s.w_el_major_mm3)?,
        w_el_minor_mm3: optional("w_el_minor_mm3", s.w_el_minor_mm3)?,
        w_pl_major_mm3: optional("w_pl_major_mm3", s.w_pl_major_mm3)?,
        w_pl_minor_mm3: optional("w_pl_minor_mm3", s.w_pl_minor_mm3)?,
        mass_kg_per_m: a * 1e-6 * super::STEEL_DENSITY,
        ..Properties::default()
    })
}

pub(super) fn rect_outline(s: &Rect) -> Result<(Poly, Option<Poly>)> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let mut o = Poly::new();
    o.push(0.0, 0.0);
    o.push(b, 0.0);
    o.push(b, h);
    o.push(0.0, h);
    Ok((o, None))
}

pub(super) fn round_outline(s: &Round) -> Result<(Poly, Option<Poly>)> {
    let d = dim("diameter_mm", s.diameter_mm)?;
    Ok((super::hollow::circle(d / 2.0, d / 2.0, false), None))
}

#[cfg(test)]
mod tests {
    use super::super::rect_torsion;

    #[test]
    fn rect_torsion_limits() {
        // Square: J = 0.1406 a⁴ (Timoshenko & Goodier, k1 = 0.141 for a/b = 1).
        assert!((rect_torsion(10.0, 10.0) / 1e4 - 0.1406).abs() < 2e-4);
        // Very thin strip: J -> a c³/3 (1 - 0.630 c/a).
        let (a, c) = (1000.0f64, 1.0f64);
        let thin = a * c.powi(3) / 3.0 * (1.0 - 0.630 * c / a);
        assert!((rect_torsion(a, c) - thin).abs() / thin < 1e-4);
        // Symmetric in its arguments.
        assert_eq!(rect_torsion(40.0, 100.0), rect_torsion(100.0, 40.0));
    }
}
