//! Hollow sections: rectangular/square (RHS/SHS) and circular (CHS).
//!
//! RHS reference position: bounding box [0, b] x [0, h]; bending about y
//! loads the sides of length h. Outer corners have radius r_o and inner
//! corners r_i (default max(r_o - t, 0), i.e. concentric; hot-finished
//! tubes often have non-concentric corners, which are exact here since
//! outer and inner corners are composed independently).
//!
//! RHS torsion constant: EN 10219-2:2006 Annex B (the same formula is in
//! EN 10210-2:2006 Annex B): I_t = t³ p/3 + 2 K A_h with
//! p = 2[(b - t) + (h - t)] - 2 R_c (4 - π), A_h = (b - t)(h - t) - R_c² (4 - π),
//! K = 2 A_h t / p and R_c = (r_o + r_i)/2.
//!
//! RHS warping constant: thin-walled closed rectangle of uniform wall on
//! the centre-line dimensions b' = b - t, h' = h - t:
//! I_w = t b'² h'² (b' - h')² / (24 (b' + h')) (Kollbrunner & Basler,
//! Torsion in Structures, 1969, box of constant thickness); zero for a
//! square. It is small and of no practical weight for closed sections.
//!
//! CHS reference position: bounding box [0, D] x [0, D]. Every property is
//! exact: I_t = π (D⁴ - d⁴)/32 and I_w = 0.

use std::f64::consts::{PI, SQRT_2};

use super::{dim, geometry, radius, Bending, Raw, SEGMENTS_PER_QUARTER};
use crate::error::Result;
use crate::section::geometry::{Axis, Parts, Poly};
use crate::section::{Chs, Rhs};

struct RhsDims {
    h: f64,
    b: f64,
    t: f64,
    ro: f64,
    ri: f64,
}

fn rhs_dims(s: &Rhs) -> Result<RhsDims> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let t = dim("wall_mm", s.wall_mm)?;
    let ro = radius("outer_radius_mm", s.outer_radius_mm)?;
    let small = h.min(b);
    if 2.0 * t >= small {
        return Err(geometry(
            "wall_mm",
            format!(
                "wall thickness {t} mm must be less than half the smaller side ({} mm)",
                small / 2.0
            ),
        ));
    }
    if 2.0 * ro > small {
        return Err(geometry(
            "outer_radius_mm",
            format!(
                "outer corner radius {ro} mm must not exceed half the smaller side ({} mm)",
                small / 2.0
            ),
        ));
    }
    let ri = match s.inner_radius_mm {
        Some(v) => radius("inner_radius_mm", v)?,
        None => (ro - t).max(0.0),
    };
    if 2.0 * ri > small - 2.0 * t {
        return Err(geometry(
            "inner_radius_mm",
            format!(
                "inner corner radius {ri} mm must not exceed half the smaller inner side ({} mm)",
                (small - 2.0 * t) / 2.0
            ),
        ));
    }
    // Along the corner diagonal the outer arc is (√2 - 1) r_o from the
    // sharp corner and the inner arc √2 (t + r_i) - r_i: the wall there
    // must keep some thickness.
    if SQRT_2 * (t + ri) - ri <= (SQRT_2 - 1.0) * ro {
        return Err(geometry(
            "inner_radius_mm",
            format!(
                "with outer radius {ro} mm and wall {t} mm the inner corner radius {ri} mm leaves \
                 no wall at the corners; use r_i > {} mm",
                ((SQRT_2 - 1.0) * ro - SQRT_2 * t) / (SQRT_2 - 1.0)
            ),
        ));
    }
    Ok(RhsDims { h, b, t, ro, ri })
}

pub(super) fn rhs(s: &Rhs) -> Result<Raw> {
    let RhsDims { h, b, t, ro, ri } = rhs_dims(s)?;
    let mut p = Parts::new();
    p.rect(0.0, b, 0.0, h, 1.0);
    p.spandrel(0.0, 0.0, ro, 1.0, 1.0, -1.0);
    p.spandrel(b, 0.0, ro, -1.0, 1.0, -1.0);
    p.spandrel(b, h, ro, -1.0, -1.0, -1.0);
    p.spandrel(0.0, h, ro, 1.0, -1.0, -1.0);
    p.rect(t, b - t, t, h - t, -1.0);
    p.spandrel(t, t, ri, 1.0, 1.0, 1.0);
    p.spandrel(b - t, t, ri, -1.0, 1.0, 1.0);
    p.spandrel(b - t, h - t, ri, -1.0, -1.0, 1.0);
    p.spandrel(t, h - t, ri, 1.0, -1.0, 1.0);

    let rc = 0.5 * (ro + ri);
    let perimeter = 2.0 * ((b - t) + (h - t)) - 2.0 * rc * (4.0 - PI);
    let enclosed = (b - t) * (h - t) - rc * rc * (4.0 - PI);
    let k = 2.0 * enclosed * t / perimeter;
    let torsion = t.powi(3) * perimeter / 3.0 + 2.0 * k * enclosed;
    let (bc, hc) = (b - t, h - t);
    let warping = t * bc * bc * hc * hc * (bc - hc).powi(2) / (24.0 * (bc + hc));

    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(h / 2.0)),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(b / 2.0)),
        },
        torsion,
        warping,
        shear_centre: (b / 2.0, h / 2.0),
    })
}

fn rounded_rect(y0: f64, y1: f64, z0: f64, z1: f64, r: f64, hole: bool) -> Poly {
    let n = SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    o.arc(y1 - r, z0 + r, r, -0.5 * PI, 0.0, n);
    o.arc(y1 - r, z1 - r, r, 0.0, 0.5 * PI, n);
    o.arc(y0 + r, z1 - r, r, 0.5 * PI, PI, n);
    o.arc(y0 + r, z0 + r, r, PI, 1.5 * PI, n);
    if hole {
        o.reverse();
    }
    o
}

pub(super) fn rhs_outline(s: &Rhs) -> Result<(Poly, Option<Poly>)> {
    let RhsDims { h, b, t, ro, ri } = rhs_dims(s)?;
    Ok((
        rounded_rect(0.0, b, 0.0, h, ro, false),
        Some(rounded_rect(t, b - t, t, h - t, ri, true)),
    ))
}

fn chs_dims(s: &Chs) -> Result<(f64, f64)> {
    let d = dim("diameter_mm", s.diameter_mm)?;
    let t = dim("wall_mm", s.wall_mm)?;
    if 2.0 * t >= d {
        return Err(geometry(
            "wall_mm",
            format!(
                "wall thickness {t} mm must be less than half the diameter ({} mm); \
                 use a round bar for a solid section",
                d / 2.0
            ),
        ));
    }
    Ok((d, t))
}

/// Adds (sign) a full disc of radius `r` centred at (c, c) as four quarter discs.
pub(super) fn disc(p: &mut Parts, c: f64, r: f64, sign: f64) {
    for (qy, qz) in [(1.0, 1.0), (-1.0, 1.0), (-1.0, -1.0), (1.0, -1.0)] {
        p.quarter_disc(c, c, r, qy, qz, sign);
    }
}

pub(super) fn chs(s: &Chs) -> Result<Raw> {
    let (d, t) = chs_dims(s)?;
    let (ro, ri) = (d / 2.0, d / 2.0 - t);
    let mut p = Parts::new();
    disc(&mut p, ro, ro, 1.0);
    disc(&mut p, ro, ri, -1.0);
    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, d, 0.0, d),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(ro)),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(ro)),
        },
        torsion: PI * (d.powi(4) - (d - 2.0 * t).powi(4)) / 32.0,
        warping: 0.0,
        shear_centre: (ro, ro),
    })
}

/// A circle polygon of radius `r` centred at (c, c).
pub(super) fn circle(c: f64, r: f64, hole: bool) -> Poly {
    let n = 4 * SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    for i in 0..n {
        let a = 2.0 * PI * i as f64 / n as f64;
        let (sa, ca) = crate::trig::sin_cos(a);
        o.push(c + r * ca, c + r * sa);
    }
    if hole {
        o.reverse();
    }
    o
}

pub(super) fn chs_outline(s: &Chs) -> Result<(Poly, Option<Poly>)> {
    let (d, t) = chs_dims(s)?;
    Ok((
        circle(d / 2.0, d / 2.0, false),
        Some(circle(d / 2.0, d / 2.0 - t, true)),
    ))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::SectionSpec;

    fn close(a: f64, b: f64, tol: f64) {
        assert!(((a - b) / b).abs() <= tol, "{a} vs {b}");
    }

    fn rhs_props(h: f64, b: f64, t: f64, ro: f64, ri: Option<f64>) -> crate::section::Properties {
        super::super::properties(&SectionSpec::Rhs(Rhs {
            depth_mm: h,
            width_mm: b,
            wall_mm: t,
            outer_radius_mm: ro,
            inner_radius_mm: ri,
            make: Default::default(),
        }))
        .unwrap()
    }

    #[test]
    fn non_concentric_corner_area() {
        // A = b h - (4 - π) r_o² - [(b - 2t)(h - 2t) - (4 - π) r_i²].
        let (h, b, t, ro, ri) = (150.0, 100.0, 8.0, 12.0, 8.0);
        let p = rhs_props(h, b, t, ro, Some(ri));
        let exact =
            b * h - (4.0 - PI) * ro * ro - ((b - 2.0 * t) * (h - 2.0 * t) - (4.0 - PI) * ri * ri);
        close(p.area_mm2, exact, 1e-13);
    }

    #[test]
    fn square_tube_torsion_and_warping() {
        // Sharp thin square tube: Bredt, I_t = 4 A_h² t / p = t b'³ (+ t³ p / 3).
        let (b, t) = (200.0, 2.0);
        let p = rhs_props(b, b, t, 0.0, None);
        let bc = b - t;
        close(
            p.torsion_mm4,
            t * bc.powi(3) + t.powi(3) * 4.0 * bc / 3.0,
            1e-12,
        );
        assert_eq!(p.warping_mm6, 0.0);
    }

    #[test]
    fn thin_chs_limits() {
        // Thin tube: A -> 2π r t, I -> π r³ t, W_pl -> 4 r² t (r mean radius).
        let (d, t) = (1000.0, 1.0);
        let p = super::super::properties(&SectionSpec::Chs(Chs {
            diameter_mm: d,
            wall_mm: t,
            make: Default::default(),
        }))
        .unwrap();
        let r = (d - t) / 2.0;
        close(p.area_mm2, 2.0 * PI * r * t, 1e-9);
        close(p.i_y_mm4, PI * r.powi(3) * t, 1e-5);
        close(p.w_pl_major_mm3, 4.0 * r * r * t, 1e-5);
    }

    #[test]
    fn rhs_outline_is_outer_and_hole() {
        let s = Rhs {
            depth_mm: 150.0,
            width_mm: 100.0,
            wall_mm: 8.0,
            outer_radius_mm: 12.0,
            inner_radius_mm: Some(8.0),
            make: Default::default(),
        };
        let (o, hole) = rhs_outline(&s).unwrap();
        let hole = hole.unwrap();
        assert!(o.area() > 0.0 && hole.area() < 0.0);
        close(
            o.area() + hole.area(),
            rhs_props(150.0, 100.0, 8.0, 12.0, Some(8.0)).area_mm2,
            2e-3,
        );
    }
}
