//! Parallel-flange channels and tees with root radius r (flange tips
//! square: the member file has no toe radius for these).
//!
//! Channel reference position: web on the left with its back on y = 0,
//! flanges of width b (from the back of the web) at z = 0 and z = h
//! pointing to +y. Tee reference position: flange of width b at the top
//! (z from h - tf to h), stem centred, its tip at z = 0. Bending about y
//! is the "major" geometric axis of both (for a wide shallow tee I_z may
//! be the larger; see the principal-axis rule in the parent module).
//! Area, centroid, second and plastic moduli are exact; the plastic
//! neutral axis of the unsymmetric direction (channel about z, tee about
//! y) is found by Newton's method on exactly clipped parts.
//!
//! Channel torsion constant: I_t = 2 K1 + K2 + 2 α D⁴ with the flanges as
//! rectangles b x tf with two free ends, K1 = b tf³ [1/3 - 0.21 (tf/b)(1 -
//! tf⁴/(12 b⁴))], the web between the flanges K2 = (h - 2tf) tw³/3, and at
//! each web-flange corner Roark's L-junction term (Young & Budynas,
//! Roark's Formulas for Stress and Strain, 7th ed., Table 10.7 case 7):
//! α = (t_min/t_max)(0.07 + 0.076 r/t_max), D = 2 [tf + tw + 3r - √(2 (2r + tf)(2r + tw))].
//!
//! Channel shear centre and warping constant: thin-walled open section on
//! centre lines b' = b - tw/2, h' = h - tf (e.g. Timoshenko & Gere, Theory
//! of Elastic Stability; AISC Design Guide 9): the shear centre lies on
//! the web side away from the flanges at e = 3 b'² tf / (6 b' tf + h' tw)
//! from the web centre line, and I_w = tf b'³ h'² (3 b' tf + 2 h' tw) /
//! (12 (6 b' tf + h' tw)).
//!
//! Tee torsion constant: the flange and stem rectangles of Roark Table
//! 10.7 case 8 (T section), K1 = b tf³ [1/3 - 0.21 (tf/b)(1 - tf⁴/(12 b⁴))]
//! and K2 = c tw³ [1/3 - 0.105 (tw/c)(1 - tw⁴/(192 c⁴))] with c = h - tf,
//! plus one web-flange junction term α D⁴ with the coefficients of El
//! Darwish & Johnston (1965) as printed in AISC Design Guide 9 for rolled
//! I shapes:
//! α = -0.042 + 0.2204 tw/tf + 0.1355 r/tf - 0.0865 r tw/tf² - 0.0725 tw²/tf²,
//! D = ((tf + r)² + tw (r + tw/4))/(2r + tf). (Roark's
//! own α = (t_min/t_max)(0.15 + 0.1 r/tf) came out 5 % above a
//! finite-element solution for a 150x100x10x8 r10 tee; this one is within
//! 0.2 % for both reference tees.)
//!
//! Tee warping constant: AISC Design Guide 9, I_w = tf³ b³/144 + tw³ h'³/36
//! with h' = h - tf/2; shear centre at the intersection of the flange and
//! stem centre lines.

use std::f64::consts::PI;

use super::{dim, geometry, radius, Bending, Raw, SEGMENTS_PER_QUARTER};
use crate::error::Result;
use crate::section::geometry::{Axis, Parts, Poly};
use crate::section::Flanged;

struct Dims {
    h: f64,
    b: f64,
    tf: f64,
    tw: f64,
    r: f64,
}

fn common(s: &Flanged) -> Result<Dims> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let tf = dim("flange_mm", s.flange_mm)?;
    let tw = dim("web_mm", s.web_mm)?;
    let r = radius("root_radius_mm", s.root_radius_mm)?;
    if tw >= b {
        return Err(geometry(
            "web_mm",
            format!("web thickness {tw} mm must be less than the flange width {b} mm"),
        ));
    }
    Ok(Dims { h, b, tf, tw, r })
}

fn channel_dims(s: &Flanged) -> Result<Dims> {
    let d = common(s)?;
    let Dims { h, b, tf, tw, r } = d;
    if 2.0 * tf >= h {
        return Err(geometry(
            "flange_mm",
            format!(
                "flange thickness {tf} mm must be less than half the depth ({} mm)",
                h / 2.0
            ),
        ));
    }
    if tw + r > b {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r} mm does not fit on the flange: r <= {} mm",
                b - tw
            ),
        ));
    }
    if 2.0 * (tf + r) > h {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r} mm does not fit between the flanges: r <= {} mm",
                (h - 2.0 * tf) / 2.0
            ),
        ));
    }
    Ok(d)
}

fn tee_dims(s: &Flanged) -> Result<Dims> {
    let d = common(s)?;
    let Dims { h, b, tf, tw, r } = d;
    if tf >= h {
        return Err(geometry(
            "flange_mm",
            format!("flange thickness {tf} mm must be less than the depth {h} mm"),
        ));
    }
    if tw + 2.0 * r > b {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r} mm does not fit on the flange: r <= {} mm",
                (b - tw) / 2.0
            ),
        ));
    }
    if tf + r > h {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r} mm does not fit on the stem: r <= {} mm",
                h - tf
            ),
        ));
    }
    Ok(d)
}

pub(super) fn channel(s: &Flanged) -> Result<Raw> {
    let Dims { h, b, tf, tw, r } = channel_dims(s)?;
    let mut p = Parts::new();
    p.rect(0.0, tw, 0.0, h, 1.0);
    p.rect(tw, b, 0.0, tf, 1.0);
    p.rect(tw, b, h - tf, h, 1.0);
    p.spandrel(tw, tf, r, 1.0, 1.0, 1.0);
    p.spandrel(tw, h - tf, r, 1.0, -1.0, 1.0);

    let k1 = super::roark_rect(b, tf);
    let k2 = (h - 2.0 * tf) * tw.powi(3) / 3.0;
    let (tmin, tmax) = (tf.min(tw), tf.max(tw));
    let alpha = (tmin / tmax) * (0.07 + 0.076 * r / tmax);
    let dd = 2.0 * (tf + tw + 3.0 * r - (2.0 * (2.0 * r + tf) * (2.0 * r + tw)).sqrt());
    let torsion = 2.0 * k1 + k2 + 2.0 * alpha * dd.max(0.0).powi(4);

    let (bc, hc) = (b - tw / 2.0, h - tf);
    let den = 6.0 * bc * tf + hc * tw;
    let e = 3.0 * bc * bc * tf / den;
    let warping = tf * bc.powi(3) * hc * hc * (3.0 * bc * tf + 2.0 * hc * tw) / (12.0 * den);

    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(h / 2.0)),
            w_pl_z: p.plastic_modulus(Axis::Z, None),
        },
        torsion,
        warping,
        shear_centre: (tw / 2.0 - e, h / 2.0),
    })
}

pub(super) fn tee(s: &Flanged) -> Result<Raw> {
    let Dims { h, b, tf, tw, r } = tee_dims(s)?;
    let (yl, yr) = ((b - tw) / 2.0, (b + tw) / 2.0);
    let mut p = Parts::new();
    p.rect(0.0, b, h - tf, h, 1.0);
    p.rect(yl, yr, 0.0, h - tf, 1.0);
    p.spandrel(yl, h - tf, r, -1.0, -1.0, 1.0);
    p.spandrel(yr, h - tf, r, 1.0, -1.0, 1.0);

    let k1 = super::roark_rect(b, tf);
    let c = h - tf;
    let k2 =
        c * tw.powi(3) * (1.0 / 3.0 - 0.105 * (tw / c) * (1.0 - tw.powi(4) / (192.0 * c.powi(4))));
    let alpha = -0.042 + 0.2204 * tw / tf + 0.1355 * r / tf
        - 0.0865 * r * tw / (tf * tf)
        - 0.0725 * tw * tw / (tf * tf);
    let dd = ((tf + r).powi(2) + tw * (r + tw / 4.0)) / (2.0 * r + tf);
    let torsion = k1 + k2 + alpha.max(0.0) * dd.powi(4);
    let warping = tf.powi(3) * b.powi(3) / 144.0 + tw.powi(3) * (h - tf / 2.0).powi(3) / 36.0;

    Ok(Raw {
        m: p.moments(),
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, None),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(b / 2.0)),
        },
        torsion,
        warping,
        shear_centre: (b / 2.0, h - tf / 2.0),
    })
}

pub(super) fn channel_outline(s: &Flanged) -> Result<(Poly, Option<Poly>)> {
    let Dims { h, b, tf, tw, r } = channel_dims(s)?;
    let n = SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    o.push(0.0, 0.0);
    o.push(b, 0.0);
    o.push(b, tf);
    o.arc(tw + r, tf + r, r, 1.5 * PI, PI, n);
    o.arc(tw + r, h - tf - r, r, PI, 0.5 * PI, n);
    o.push(b, h - tf);
    o.push(b, h);
    o.push(0.0, h);
    Ok((o, None))
}

pub(super) fn tee_outline(s: &Flanged) -> Result<(Poly, Option<Poly>)> {
    let Dims { h, b, tf, tw, r } = tee_dims(s)?;
    let (yl, yr) = ((b - tw) / 2.0, (b + tw) / 2.0);
    let n = SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    o.push(yl, 0.0);
    o.push(yr, 0.0);
    o.arc(yr + r, h - tf - r, r, PI, 0.5 * PI, n);
    o.push(b, h - tf);
    o.push(b, h);
    o.push(0.0, h);
    o.push(0.0, h - tf);
    o.arc(yl - r, h - tf - r, r, 0.5 * PI, 0.0, n);
    Ok((o, None))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::SectionSpec;

    fn close(a: f64, b: f64, tol: f64) {
        assert!(((a - b) / b).abs() <= tol, "{a} vs {b}");
    }

    fn f(h: f64, b: f64, tf: f64, tw: f64, r: f64) -> Flanged {
        Flanged {
            depth_mm: h,
            width_mm: b,
            flange_mm: tf,
            web_mm: tw,
            root_radius_mm: r,
        }
    }

    #[test]
    fn sharp_channel_centroid_and_shear_centre() {
        let (h, b, tf, tw) = (200.0f64, 90.0f64, 14.0f64, 7.0f64);
        let p = super::super::properties(&SectionSpec::Channel(f(h, b, tf, tw, 0.0))).unwrap();
        let (aw, af) = (h * tw, (b - tw) * tf);
        let yc = (aw * tw / 2.0 + 2.0 * af * (tw + (b - tw) / 2.0)) / (aw + 2.0 * af);
        close(p.centroid_y_mm, yc, 1e-13);
        close(p.centroid_z_mm, h / 2.0, 1e-13);
        // The shear centre lies behind the web, on the axis of symmetry.
        let (bc, hc) = (b - tw / 2.0, h - tf);
        let e = 3.0 * bc * bc * tf / (6.0 * bc * tf + hc * tw);
        // Major axis is y: the shear centre offset is along y (major direction).
        close(-p.shear_centre_major_mm, yc - (tw / 2.0 - e), 1e-12);
        assert!(p.shear_centre_minor_mm.abs() < 1e-9);
    }

    #[test]
    fn sharp_tee_centroid() {
        let (h, b, tf, tw) = (150.0f64, 100.0f64, 10.0f64, 8.0f64);
        let p = super::super::properties(&SectionSpec::Tee(f(h, b, tf, tw, 0.0))).unwrap();
        let (af, aw) = (b * tf, (h - tf) * tw);
        let zc = (af * (h - tf / 2.0) + aw * (h - tf) / 2.0) / (af + aw);
        close(p.centroid_z_mm, zc, 1e-13);
        // I_y by parts.
        let iy = b * tf.powi(3) / 12.0
            + af * (h - tf / 2.0 - zc).powi(2)
            + tw * (h - tf).powi(3) / 12.0
            + aw * ((h - tf) / 2.0 - zc).powi(2);
        close(p.i_y_mm4, iy, 1e-12);
    }

    #[test]
    fn root_radius_adds_two_spandrels() {
        for spec in [
            SectionSpec::Channel as fn(Flanged) -> SectionSpec,
            SectionSpec::Tee,
        ] {
            let sharp = super::super::properties(&spec(f(200.0, 90.0, 14.0, 7.0, 0.0))).unwrap();
            let round = super::super::properties(&spec(f(200.0, 90.0, 14.0, 7.0, 12.0))).unwrap();
            close(
                round.area_mm2 - sharp.area_mm2,
                2.0 * (1.0 - PI / 4.0) * 144.0,
                1e-10,
            );
        }
    }
}
