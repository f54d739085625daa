//! Equal and unequal angles with root radius r1 and toe radius r2.
//!
//! Reference position: heel at the origin, the leg of length h
//! (`depth_mm`) along +z with its outer face on y = 0, the leg of length
//! b (`width_mm`) along +y with its outer face on z = 0; both legs of
//! thickness t. The root fillet joins the inner faces; the toe radius
//! rounds the inner corner at each leg's tip.
//!
//! Area, centroid, I_y, I_z, I_yz and so the principal values are exact.
//! Elastic moduli about the principal axes divide by the farthest point
//! of the outline (the heel or a toe). Plastic moduli about the principal
//! axes integrate over the outline polygon (arcs in 8 chords per quarter)
//! about the equal-area line parallel to each axis, found by Newton's method;
//! the chords change them by well under 0.1 %.
//!
//! Torsion constant: Young & Budynas, Roark's Formulas for Stress and
//! Strain (7th ed., 2002), Table 10.7 case 7 (L section):
//! K = K1 + K2 + α D⁴ with K1 = a t³ [1/3 - 0.21 (t/a)(1 - t⁴/(12 a⁴))]
//! for the longer leg a, K2 = c t³ [1/3 - 0.105 (t/c)(1 - t⁴/(192 c⁴))]
//! for the other leg from the face of the first (c = shorter leg - t),
//! α = 0.07 + 0.076 r1/t and D = 2 [2t + 3 r1 - √(2 (2 r1 + t)²)], the
//! diameter of the largest circle inscribed at the corner. Toe radii are
//! neglected in it.
//!
//! Warping constant: thin-walled formula of AISC Design Guide 9 (Seaburg &
//! Carter, 1997), I_w = t³ (b'³ + h'³)/36 with b' = b - t/2, h' = h - t/2
//! (the centre-line model alone would give 0).
//!
//! Shear centre: at the intersection of the leg centre lines, (t/2, t/2).

use std::f64::consts::PI;

use super::{dim, geometry, radius, Bending, Raw, SEGMENTS_PER_QUARTER};
use crate::error::Result;
use crate::section::geometry::{Parts, Poly};
use crate::section::Angle;

struct Dims {
    h: f64,
    b: f64,
    t: f64,
    r1: f64,
    r2: f64,
}

fn dims(s: &Angle) -> Result<Dims> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let t = dim("thickness_mm", s.thickness_mm)?;
    let r1 = radius("root_radius_mm", s.root_radius_mm)?;
    let r2 = radius("toe_radius_mm", s.toe_radius_mm)?;
    let leg = h.min(b);
    if t >= leg {
        return Err(geometry(
            "thickness_mm",
            format!("leg thickness {t} mm must be less than the shorter leg ({leg} mm)"),
        ));
    }
    if r2 > t {
        return Err(geometry(
            "toe_radius_mm",
            format!("toe radius {r2} mm must not exceed the leg thickness {t} mm"),
        ));
    }
    if t + r1 + r2 > leg {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r1} mm does not fit: thickness + root radius + toe radius must not \
                 exceed the shorter leg ({leg} mm), so r1 <= {} mm",
                leg - t - r2
            ),
        ));
    }
    Ok(Dims { h, b, t, r1, r2 })
}

fn polygon(d: &Dims) -> Poly {
    let Dims { h, b, t, r1, r2 } = *d;
    let n = SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    o.push(0.0, 0.0);
    o.push(b, 0.0);
    o.arc(b - r2, t - r2, r2, 0.0, 0.5 * PI, n);
    o.arc(t + r1, t + r1, r1, 1.5 * PI, PI, n);
    o.arc(t - r2, h - r2, r2, 0.0, 0.5 * PI, n);
    o.push(0.0, h);
    o
}

pub(super) fn raw(s: &Angle) -> Result<Raw> {
    let d = dims(s)?;
    let Dims { h, b, t, r1, r2 } = d;
    let mut p = Parts::new();
    p.rect(0.0, b, 0.0, t, 1.0);
    p.rect(0.0, t, t, h, 1.0);
    p.spandrel(t, t, r1, 1.0, 1.0, 1.0);
    p.spandrel(b, t, r2, -1.0, -1.0, -1.0);
    p.spandrel(t, h, r2, -1.0, -1.0, -1.0);

    let (long, short) = (h.max(b), h.min(b));
    let k1 = super::roark_rect(long, t);
    let c = short - t;
    let k2 =
        c * t.powi(3) * (1.0 / 3.0 - 0.105 * (t / c) * (1.0 - t.powi(4) / (192.0 * c.powi(4))));
    let alpha = 0.07 + 0.076 * r1 / t;
    let dd = 2.0 * (2.0 * t + 3.0 * r1 - (2.0 * (2.0 * r1 + t).powi(2)).sqrt());
    let torsion = k1 + k2 + alpha * dd.powi(4);
    let (bc, hc) = (b - t / 2.0, h - t / 2.0);

    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Principal(polygon(&d)),
        torsion,
        warping: t.powi(3) * (bc.powi(3) + hc.powi(3)) / 36.0,
        shear_centre: (t / 2.0, t / 2.0),
    })
}

pub(super) fn outline(s: &Angle) -> Result<Poly> {
    Ok(polygon(&dims(s)?))
}

#[cfg(test)]
mod tests {
    #![allow(clippy::disallowed_methods)]
    // The standard library's functions are the reference here.
    use super::*;
    use crate::section::SectionSpec;

    fn close(a: f64, b: f64, tol: f64) {
        assert!(((a - b) / b).abs() <= tol, "{a} vs {b}");
    }

    fn props(h: f64, b: f64, t: f64, r1: f64, r2: f64) -> crate::section::Properties {
        super::super::properties(&SectionSpec::Angle(Angle {
            depth_mm: h,
            width_mm: b,
            thickness_mm: t,
            root_radius_mm: r1,
            toe_radius_mm: r2,
        }))
        .unwrap()
    }

    #[test]
    fn sharp_unequal_angle_closed_forms() {
        // Two rectangles: leg b x t along y and t x (h - t) along z.
        let (h, b, t) = (150.0f64, 90.0f64, 10.0f64);
        let p = props(h, b, t, 0.0, 0.0);
        let (a1, a2) = (b * t, t * (h - t));
        let a = a1 + a2;
        close(p.area_mm2, a, 1e-14);
        let yc = (a1 * b / 2.0 + a2 * t / 2.0) / a;
        let zc = (a1 * t / 2.0 + a2 * (t + (h - t) / 2.0)) / a;
        close(p.centroid_y_mm, yc, 1e-13);
        close(p.centroid_z_mm, zc, 1e-13);
        let iy = b * t.powi(3) / 12.0
            + a1 * (t / 2.0 - zc).powi(2)
            + t * (h - t).powi(3) / 12.0
            + a2 * (t + (h - t) / 2.0 - zc).powi(2);
        close(p.i_y_mm4, iy, 1e-12);
        let iyz =
            a1 * (b / 2.0 - yc) * (t / 2.0 - zc) + a2 * (t / 2.0 - yc) * (t + (h - t) / 2.0 - zc);
        close(p.i_yz_mm4, iyz, 1e-12);
        assert!(p.i_yz_mm4 < 0.0);
        // Principal angle: tan 2θ = -2 I_yz / (I_y - I_z).
        close(
            (2.0 * p.principal_angle_rad).tan(),
            -2.0 * p.i_yz_mm4 / (p.i_y_mm4 - p.i_z_mm4),
            1e-10,
        );
    }

    #[test]
    fn toe_radius_removes_two_spandrels() {
        let with = props(100.0, 100.0, 10.0, 12.0, 6.0);
        let without = props(100.0, 100.0, 10.0, 12.0, 0.0);
        close(
            without.area_mm2 - with.area_mm2,
            2.0 * (1.0 - PI / 4.0) * 36.0,
            1e-10,
        );
    }

    #[test]
    fn equal_angle_shear_centre_on_the_symmetry_axis() {
        let p = props(100.0, 100.0, 10.0, 12.0, 6.0);
        // The shear centre (t/2, t/2) lies on the symmetry (major) axis.
        assert!(p.shear_centre_minor_mm.abs() < 1e-9);
        let e = 2f64.sqrt() * (p.centroid_y_mm - 5.0);
        close(-p.shear_centre_major_mm, e, 1e-12);
    }
}
