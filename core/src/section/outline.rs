//! Outlines of sections for drawing them to scale.
//!
//! [`outline`] returns closed polygons in mm with the origin at the
//! centroid, `y` to the right and `z` up (the axes of
//! [`super::shapes`]): first the outer boundary (counter-clockwise), then
//! any hole (clockwise). The last point joins the first; it is not
//! repeated. Arcs are approximated by [`super::shapes::SEGMENTS_PER_QUARTER`]
//! chords per quarter circle. Sections without dimensions (typed
//! properties) and invalid dimensions give no polygons.
//! A catalogue reference gives none: the caller passes the resolved
//! section's spec (`Section::spec`).
//!
//! `crate::stability::ineffective` draws, in the same coordinates, the
//! strips of a slender section that its effective widths leave out.

use super::{shapes, SectionSpec};

/// The spec when it has dimensions (not a catalogue reference).
pub(crate) fn resolved(spec: &SectionSpec) -> Option<&SectionSpec> {
    match spec {
        SectionSpec::Catalogue(_) => None,
        s => Some(s),
    }
}

/// The polygons of the section, origin at the centroid.
pub fn outline(spec: &SectionSpec) -> Vec<Vec<(f64, f64)>> {
    let Some(spec) = resolved(spec) else {
        return Vec::new();
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
    use super::*;
    use crate::check::{check_member, CheckResult};
    use crate::material::MaterialSpec;
    use crate::member::Member;
    use crate::method::Method;
    use crate::section::{Angle, Given, IMake, IShape, Rhs};
    use crate::stability::ineffective::ineffective;

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
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        });
        assert!(outline(&given).is_empty());
    }

    fn member(section: SectionSpec, fy_mpa: f64, method: Method) -> Member {
        Member {
            section,
            material: MaterialSpec::Custom {
                fy_mpa,
                e_mpa: 210_000.0,
                g_mpa: Some(81_000.0),
            },
            length_mm: 3000.0,
            ..crate::method::euler::tests::member(method, "S355")
        }
    }

    /// Checks `m` and hands its input and result to `f`.
    fn checked<R>(m: &Member, f: impl FnOnce(&crate::method::Input<'_>, &CheckResult) -> R) -> R {
        let r = check_member(m).unwrap();
        let section = m.section.build().unwrap();
        let material =
            crate::material::resolve(&m.material, crate::member::stock(&section)).unwrap();
        let input = crate::method::Input {
            member: m,
            section: &section,
            material: &material,
        };
        f(&input, &r)
    }

    /// The zones of a member as the check found them, and A - A_eff, with
    /// A_eff as the check's working shows it (for AISC, one of the modes'
    /// A_e: the governing one's).
    fn zones_and_removed(m: &Member) -> (Vec<Vec<(f64, f64)>>, f64) {
        checked(m, |input, r| {
            let (c, eff) = r.effective(input).unwrap();
            assert!(
                r.trace
                    .iter()
                    .any(|s| s.symbol.as_str() == "A_eff" && (s.value - eff.area_mm2).abs() < 1e-9),
                "the same A_eff as the check"
            );
            (
                ineffective(&m.section, &c, &eff),
                input.section.props.area_mm2 - eff.area_mm2,
            )
        })
    }

    /// The zones are the flat strips c - b_eff by t that the check takes
    /// off, so they agree to rounding here; 0.5 % would allow a strip
    /// running into a corner or fillet (common practice for drawing).
    const ZONE_AREA: f64 = 5e-3;

    fn zone_area(zones: &[Vec<(f64, f64)>]) -> f64 {
        zones.iter().map(|z| area(z)).sum()
    }

    /// EN 1993-1-1's class of `spec` in compression (E = 210 000 MPa), the
    /// zones of its EN 1993-1-5 effective area and A - A_eff, worked
    /// without the check.
    fn en_zones(spec: &SectionSpec, fy_mpa: f64) -> (u8, Vec<Vec<(f64, f64)>>, f64) {
        let section = spec.build().unwrap();
        let c = crate::stability::classify::classify(
            crate::stability::classify::Code::En1993,
            spec,
            fy_mpa,
            210_000.0,
        )
        .unwrap();
        let eff = crate::stability::effective::en_area(&c, section.props.area_mm2);
        (
            c.class,
            ineffective(spec, &c, &eff),
            section.props.area_mm2 - eff.area_mm2,
        )
    }

    #[test]
    fn class_1_section_has_no_zones() {
        // HE 200 B dimensions in S235: c/t = 5.2 (flange), 14.9 (web): Class 1
        // (EN 1993-1-1 Table 5.2: 9 eps and 33 eps with eps = 1).
        let spec = SectionSpec::I(IShape {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 9.0,
            root_radius_mm: 18.0,
            make: IMake::Rolled,
        });
        let m = member(spec.clone(), 235.0, Method::En1993);
        assert!(checked(&m, |input, r| r.effective(input).is_none()));
        let (class, zones, _) = en_zones(&spec, 235.0);
        assert_eq!(class, 1);
        assert!(zones.is_empty());
    }

    #[test]
    fn slender_welded_i_zones_remove_a_minus_a_eff() {
        // Welded I 600 x 400 x 12 x 6, S355: A = 13056 mm2, A_eff = 8844.69 mm2
        // worked by hand with EN 1993-1-5 Eq. 4.2 and 4.3 in
        // tests/validation/local_buckling.rs.
        let spec = SectionSpec::I(IShape {
            depth_mm: 600.0,
            width_mm: 400.0,
            flange_mm: 12.0,
            web_mm: 6.0,
            root_radius_mm: 0.0,
            make: IMake::Welded,
        });
        let (zones, removed) = zones_and_removed(&member(spec, 355.0, Method::En1993));
        assert!((removed - (13056.0 - 8844.69)).abs() < 0.05);
        assert_eq!(zones.len(), 5, "four flange tips and the web middle");
        assert!((zone_area(&zones) - removed).abs() / removed < ZONE_AREA);
        let web = &zones[4];
        // Table 4.1: the web's strip is in the middle (centred on the centroid).
        assert!((web[0].1 + web[2].1).abs() < 1e-9 && (web[0].0 + web[1].0).abs() < 1e-9);
        // Table 4.2: each flange strip reaches the free tip, |y| = b/2.
        for z in &zones[..4] {
            let reach = z.iter().map(|p| p.0.abs()).fold(0.0, f64::max);
            assert!((reach - 200.0).abs() < 1e-9);
        }
    }

    #[test]
    fn slender_shs_zones_remove_a_minus_a_eff() {
        // SHS 300 x 300 x 6, S355: c = 282 mm, c/t = 47 > 42 eps = 34.17 (Class 4);
        // b_eff = 217.30 mm per wall (EN 1993-1-5 Eq. 4.2, by hand in
        // tests/validation/local_buckling.rs), removed 4 x 64.70 x 6 = 1552.8 mm2.
        let spec = SectionSpec::Rhs(Rhs {
            depth_mm: 300.0,
            width_mm: 300.0,
            wall_mm: 6.0,
            outer_radius_mm: 12.0,
            inner_radius_mm: None,
            make: Default::default(),
        });
        let (zones, removed) = zones_and_removed(&member(spec.clone(), 355.0, Method::En1993));
        assert!((removed - 4.0 * (282.0 - 217.2997) * 6.0).abs() < 0.01);
        assert_eq!(zones.len(), 4);
        assert!((zone_area(&zones) - removed).abs() / removed < ZONE_AREA);
        for z in &zones {
            // Each strip is centred on its wall: its middle lies on an axis.
            let (my, mz) = ((z[0].0 + z[2].0) / 2.0, (z[0].1 + z[2].1) / 2.0);
            assert!(my.abs() < 1e-9 || mz.abs() < 1e-9);
        }
        // AISC 360-16 E7: the same placement, with the widths at the governing F_cr.
        let (zones, removed) = zones_and_removed(&member(spec, 355.0, Method::AiscLrfd));
        assert_eq!(zones.len(), 4);
        assert!(removed > 0.0 && (zone_area(&zones) - removed).abs() / removed < ZONE_AREA);
    }

    #[test]
    fn slender_angle_zones_sit_at_the_leg_tips() {
        // L 200 x 200 x 10, S355: h/t = 20 > 15 eps = 12.2, Class 4 (EN 1993-1-1 Table 5.2).
        let spec = SectionSpec::Angle(Angle {
            depth_mm: 200.0,
            width_mm: 200.0,
            thickness_mm: 10.0,
            root_radius_mm: 15.0,
            toe_radius_mm: 0.0,
        });
        // EN 1993-1-1 refuses the member (its effective centroid shifts:
        // N_Ed e_N is not worked), so the zones are drawn from the
        // classification and EN 1993-1-5 area directly.
        let m = member(spec.clone(), 355.0, Method::En1993);
        assert!(check_member(&m).is_err());
        let (_, zones, removed) = en_zones(&spec, 355.0);
        assert_eq!(zones.len(), 2);
        assert!((zone_area(&zones) - removed).abs() / removed < ZONE_AREA);
        let p = spec.build().unwrap().props;
        let top = 200.0 - p.centroid_z_mm;
        let right = 200.0 - p.centroid_y_mm;
        assert!(zones[0].iter().any(|q| (q.1 - top).abs() < 1e-9));
        assert!(zones[1].iter().any(|q| (q.0 - right).abs() < 1e-9));
    }
}
