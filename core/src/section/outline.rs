//! Outlines of sections for drawing them to scale.
//!
//! [`outline`] returns closed polygons in mm with the origin at the
//! centroid, `y` to the right and `z` up (the axes of
//! [`super::shapes`]): first the outer boundary (counter-clockwise), then
//! any hole (clockwise). The last point joins the first; it is not
//! repeated. Arcs are approximated by [`super::shapes::SEGMENTS_PER_QUARTER`]
//! chords per quarter circle. Sections without dimensions (typed
//! properties) and invalid dimensions give no polygons.

use super::{shapes, SectionSpec};

/// The polygons of the section, origin at the centroid.
pub fn outline(spec: &SectionSpec) -> Vec<Vec<(f64, f64)>> {
    let spec = match spec {
        SectionSpec::Catalogue(c) => match crate::catalogue::resolve(&c.designation) {
            Ok(entry) if !matches!(entry.spec, SectionSpec::Catalogue(_)) => &entry.spec,
            _ => return Vec::new(),
        },
        s => s,
    };
    let (Ok(props), Ok((outer, hole))) = (shapes::properties(spec), shapes::polygons(spec)) else {
        return Vec::new();
    };
    let (yc, zc) = (props.centroid_y_mm, props.centroid_z_mm);
    std::iter::once(outer)
        .chain(hole)
        .map(|p| p.points().iter().map(|(y, z)| (y - yc, z - zc)).collect())
        .collect()
}

#[cfg(test)]
mod tests {
    #![allow(clippy::unwrap_used, clippy::expect_used, clippy::indexing_slicing)]
    use super::*;
    use crate::section::{Angle, Given, IShape, Rhs};

    fn area(p: &[(f64, f64)]) -> f64 {
        let n = p.len();
        0.5 * (0..n)
            .map(|i| {
                let (a, b) = (p[i], p[(i + 1) % n]);
                a.0 * b.1 - b.0 * a.1
            })
            .sum::<f64>()
    }

    fn first_moments(p: &[(f64, f64)]) -> (f64, f64) {
        let n = p.len();
        let (mut sy, mut sz) = (0.0, 0.0);
        for i in 0..n {
            let (a, b) = (p[i], p[(i + 1) % n]);
            let cross = a.0 * b.1 - b.0 * a.1;
            sy += (a.0 + b.0) * cross / 6.0;
            sz += (a.1 + b.1) * cross / 6.0;
        }
        (sy, sz)
    }

    #[test]
    fn rhs_has_outer_and_hole_centred() {
        let spec = SectionSpec::Rhs(Rhs {
            depth_mm: 200.0,
            width_mm: 100.0,
            wall_mm: 8.0,
            outer_radius_mm: 20.0,
            inner_radius_mm: None,
            make: Default::default(),
        });
        let polys = outline(&spec);
        assert_eq!(polys.len(), 2);
        assert!(area(&polys[0]) > 0.0);
        assert!(area(&polys[1]) < 0.0);
        let total: f64 = polys.iter().map(|p| area(p)).sum();
        let props = spec.build().unwrap().props;
        assert!((total - props.area_mm2).abs() / props.area_mm2 < 2e-3);
        let ymax = polys[0].iter().map(|p| p.0).fold(f64::MIN, f64::max);
        let zmax = polys[0].iter().map(|p| p.1).fold(f64::MIN, f64::max);
        assert!((ymax - 50.0).abs() < 1e-9 && (zmax - 100.0).abs() < 1e-9);
    }

    #[test]
    fn angle_outline_centroid_is_origin() {
        let spec = SectionSpec::Angle(Angle {
            depth_mm: 150.0,
            width_mm: 90.0,
            thickness_mm: 10.0,
            root_radius_mm: 12.0,
            toe_radius_mm: 6.0,
        });
        let polys = outline(&spec);
        assert_eq!(polys.len(), 1);
        let a = area(&polys[0]);
        let (sy, sz) = first_moments(&polys[0]);
        // The chords move the centroid by a small fraction of a millimetre.
        assert!(
            (sy / a).abs() < 0.05 && (sz / a).abs() < 0.05,
            "{} {}",
            sy / a,
            sz / a
        );
        // Arc segments: 8 chords per quarter on three arcs.
        assert!(polys[0].len() >= 3 * 9);
    }

    #[test]
    fn i_outline_is_symmetric_and_given_has_none() {
        let spec = SectionSpec::I(IShape {
            depth_mm: 300.0,
            width_mm: 150.0,
            flange_mm: 10.7,
            web_mm: 7.1,
            root_radius_mm: 15.0,
            make: Default::default(),
        });
        let p = &outline(&spec)[0];
        let (ymin, ymax) = p.iter().fold((f64::MAX, f64::MIN), |(lo, hi), q| {
            (lo.min(q.0), hi.max(q.0))
        });
        assert!((ymin + 75.0).abs() < 1e-9 && (ymax - 75.0).abs() < 1e-9);
        let given = SectionSpec::Given(Given {
            area_mm2: 1.0,
            i_major_mm4: 1.0,
            i_minor_mm4: 1.0,
            torsion_mm4: None,
            warping_mm6: None,
        });
        assert!(outline(&given).is_empty());
    }
}
