//! Doubly symmetric I/H sections, rolled (root radius r) or welded (r = 0).
//!
//! Reference position: bounding box [0, b] x [0, h], web vertical and
//! centred, flanges at z = 0 and z = h. Bending about y is major-axis
//! bending. Area, centroid, second and plastic moduli are exact with the
//! four root fillets as quarter-circle spandrels.
//!
//! Torsion constant: El Darwish & Johnston (1965), "Torsion of structural
//! shapes", J. Struct. Div. ASCE 91(ST1), in the form printed in AISC
//! Design Guide 9 (Seaburg & Carter, 1997), Appendix A:
//! I_t = 2 J1 + J2 + 2 α D⁴ with J1 = b tf³ [1/3 - 0.21 (tf/b)(1 - tf⁴/(12 b⁴))],
//! J2 = (h - 2tf) tw³ / 3,
//! α = -0.042 + 0.2204 tw/tf + 0.1355 r/tf - 0.0865 r tw/tf² - 0.0725 tw²/tf²,
//! D = ((tf + r)² + tw (r + tw/4)) / (2r + tf).
//! For HE 200 B it gives 59.7 cm4 against 59.6 cm4 from a finite-element
//! warping analysis (tests/validation/sectionproperties.rs).
//!
//! Warping constant: I_w = I_z (h - tf)² / 4 (flanges as thin plates a
//! distance h - tf apart; common practice, e.g. EN 1993-1-1 background,
//! SCI P363 notes). It neglects the web's own contribution and is a few
//! per cent above the finite-element value for rolled shapes.

use std::f64::consts::PI;

use super::{dim, geometry, radius, Bending, Raw, SEGMENTS_PER_QUARTER};
use crate::error::Result;
use crate::section::geometry::{Axis, Parts, Poly};
use crate::section::IShape;

struct Dims {
    h: f64,
    b: f64,
    tf: f64,
    tw: f64,
    r: f64,
}

fn dims(s: &IShape) -> Result<Dims> {
    let h = dim("depth_mm", s.depth_mm)?;
    let b = dim("width_mm", s.width_mm)?;
    let tf = dim("flange_mm", s.flange_mm)?;
    let tw = dim("web_mm", s.web_mm)?;
    let r = radius("root_radius_mm", s.root_radius_mm)?;
    if 2.0 * tf >= h {
        return Err(geometry(
            "flange_mm",
            format!(
                "flange thickness {tf} mm must be less than half the depth ({} mm)",
                h / 2.0
            ),
        ));
    }
    if tw >= b {
        return Err(geometry(
            "web_mm",
            format!("web thickness {tw} mm must be less than the flange width {b} mm"),
        ));
    }
    if tw + 2.0 * r > b {
        return Err(geometry(
            "root_radius_mm",
            format!(
                "root radius {r} mm does not fit: web + 2 r must not exceed the flange width {b} mm, \
                 so r <= {} mm",
                (b - tw) / 2.0
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
    Ok(Dims { h, b, tf, tw, r })
}

pub(super) fn raw(s: &IShape) -> Result<Raw> {
    let Dims { h, b, tf, tw, r } = dims(s)?;
    let (yl, yr) = ((b - tw) / 2.0, (b + tw) / 2.0);
    let mut p = Parts::new();
    p.rect(0.0, b, 0.0, tf, 1.0);
    p.rect(0.0, b, h - tf, h, 1.0);
    p.rect(yl, yr, tf, h - tf, 1.0);
    p.spandrel(yl, tf, r, -1.0, 1.0, 1.0);
    p.spandrel(yr, tf, r, 1.0, 1.0, 1.0);
    p.spandrel(yl, h - tf, r, -1.0, -1.0, 1.0);
    p.spandrel(yr, h - tf, r, 1.0, -1.0, 1.0);
    let m = p.moments();
    let (_, iz, _) = m.centroidal();

    let j1 =
        b * tf.powi(3) * (1.0 / 3.0 - 0.21 * (tf / b) * (1.0 - tf.powi(4) / (12.0 * b.powi(4))));
    let j2 = (h - 2.0 * tf) * tw.powi(3) / 3.0;
    let alpha = -0.042 + 0.2204 * tw / tf + 0.1355 * r / tf
        - 0.0865 * r * tw / (tf * tf)
        - 0.0725 * tw * tw / (tf * tf);
    let d = ((tf + r).powi(2) + tw * (r + tw / 4.0)) / (2.0 * r + tf);
    let torsion = 2.0 * j1 + j2 + 2.0 * alpha.max(0.0) * d.powi(4);

    Ok(Raw {
        m,
        bbox: (0.0, b, 0.0, h),
        bending: Bending::Geometric {
            w_pl_y: p.plastic_modulus(Axis::Y, Some(h / 2.0)),
            w_pl_z: p.plastic_modulus(Axis::Z, Some(b / 2.0)),
        },
        torsion,
        warping: iz * (h - tf).powi(2) / 4.0,
        shear_centre: (b / 2.0, h / 2.0),
    })
}

pub(super) fn outline(s: &IShape) -> Result<(Poly, Option<Poly>)> {
    let Dims { h, b, tf, tw, r } = dims(s)?;
    let (yl, yr) = ((b - tw) / 2.0, (b + tw) / 2.0);
    let n = SEGMENTS_PER_QUARTER;
    let mut o = Poly::new();
    o.push(0.0, 0.0);
    o.push(b, 0.0);
    o.push(b, tf);
    o.arc(yr + r, tf + r, r, 1.5 * PI, PI, n);
    o.arc(yr + r, h - tf - r, r, PI, 0.5 * PI, n);
    o.push(b, h - tf);
    o.push(b, h);
    o.push(0.0, h);
    o.push(0.0, h - tf);
    o.arc(yl - r, h - tf - r, r, 0.5 * PI, 0.0, n);
    o.arc(yl - r, tf + r, r, 0.0, -0.5 * PI, n);
    o.push(0.0, tf);
    Ok((o, None))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::SectionSpec;

    fn props(h: f64, b: f64, tf: f64, tw: f64, r: f64) -> crate::section::Properties {
        super::super::properties(&SectionSpec::I(IShape {
            depth_mm: h,
            width_mm: b,
            flange_mm: tf,
            web_mm: tw,
            root_radius_mm: r,
            make: Default::default(),
        }))
        .unwrap()
    }

    fn close(a: f64, b: f64, tol: f64) {
        assert!(((a - b) / b).abs() <= tol, "{a} vs {b}");
    }

    /// Closed forms with root fillets as printed in the explanatory notes of
    /// European rolled-section catalogues (recalled; common practice):
    /// A = 2 b tf + (h - 2tf) tw + (4 - π) r²,
    /// W_pl,y = tw h²/4 + (b - tw)(h - tf) tf + (4 - π)/2 r² (h - 2tf) + (3π - 10)/3 r³,
    /// W_pl,z = b² tf/2 + (h - 2tf) tw²/4 + r³ (10/3 - π) + (2 - π/2) tw r².
    #[test]
    fn fillet_closed_forms() {
        for (h, b, tf, tw, r) in [
            (200.0, 200.0, 15.0, 9.0, 18.0),
            (300.0, 150.0, 10.7, 7.1, 15.0),
            (1000.0, 300.0, 31.0, 16.5, 30.0),
        ] {
            let p = props(h, b, tf, tw, r);
            close(
                p.area_mm2,
                2.0 * b * tf + (h - 2.0 * tf) * tw + (4.0 - PI) * r * r,
                1e-13,
            );
            let wply = tw * h * h / 4.0
                + (b - tw) * (h - tf) * tf
                + (4.0 - PI) / 2.0 * r * r * (h - 2.0 * tf)
                + (3.0 * PI - 10.0) / 3.0 * r.powi(3);
            close(p.w_pl_major_mm3, wply, 1e-12);
            let wplz = b * b * tf / 2.0
                + (h - 2.0 * tf) * tw * tw / 4.0
                + r.powi(3) * (10.0 / 3.0 - PI)
                + (2.0 - PI / 2.0) * tw * r * r;
            close(p.w_pl_minor_mm3, wplz, 1e-12);
        }
    }

    #[test]
    fn thin_plate_torsion_limit() {
        // Thin plates, no fillet: I_t -> (2 b tf³ + (h - 2tf) tw³)/3 less
        // the flange end corrections 2 x 0.21 tf⁴, plus a small junction term.
        let (h, b, tf, tw) = (500.0, 250.0, 2.0, 1.0);
        let p = props(h, b, tf, tw, 0.0);
        let thin = (2.0 * b * tf.powi(3) + (h - 2.0 * tf) * tw.powi(3)) / 3.0;
        close(p.torsion_mm4, thin, 5e-3);
    }

    #[test]
    fn outline_has_four_fillet_arcs() {
        let s = IShape {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 9.0,
            root_radius_mm: 18.0,
            make: Default::default(),
        };
        let (o, hole) = outline(&s).unwrap();
        assert!(hole.is_none());
        assert_eq!(o.points().len(), 8 + 4 * 9);
        close(
            o.area(),
            props(200.0, 200.0, 15.0, 9.0, 18.0).area_mm2,
            1e-3,
        );
    }
}
