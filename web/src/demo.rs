//! The demo lists shown on first start, so the app is never empty. The
//! scenario is invented: a storage loft being added inside an imaginary
//! orchard barn ("Quincebrook barn" is a made-up name), with posts, props
//! and braces of several kinds and methods.

use strutline_core::file::MemberFile;
use strutline_core::material::{MaterialSpec, TimberKind};
use strutline_core::member::LoadDuration;
use strutline_core::method::Method;
use strutline_core::section::{Chs, Given, HollowMake, IMake, IShape, Rect, Round, SectionSpec};
use strutline_core::Member;

/// A custom steel with f_y and E = 210 000 MPa (the usual modulus of
/// structural steel, common practice).
pub fn steel(fy_mpa: f64) -> MaterialSpec {
    MaterialSpec::Custom {
        fy_mpa,
        e_mpa: 210_000.0,
        g_mpa: None,
    }
}

/// A plain member: section, material, length, load and method; every
/// option at its default.
pub fn member(
    id: &str,
    section: SectionSpec,
    material: MaterialSpec,
    length_mm: f64,
    axial_kn: f64,
    method: Method,
) -> Member {
    Member::new(id, section, material, length_mm, axial_kn, method)
}

/// A small steel strut that every build can check (a solid rectangle, a
/// custom steel, Euler): for tests and as the template of a new member.
pub fn sample_member(id: &str) -> Member {
    member(
        id,
        SectionSpec::Rect(Rect {
            depth_mm: 100.0,
            width_mm: 60.0,
        }),
        steel(275.0),
        2500.0,
        150.0,
        Method::Euler,
    )
}

/// The member a new row starts as.
pub fn new_member() -> Member {
    sample_member("M1")
}

/// The demo workspace: one list for the invented barn loft.
pub fn demo_lists() -> Vec<MemberFile> {
    let mut loft = MemberFile::new("Demo — Quincebrook barn loft (invented)");
    let mut post = member(
        "P1",
        SectionSpec::Rect(Rect {
            depth_mm: 140.0,
            width_mm: 140.0,
        }),
        MaterialSpec::Timber {
            fc0k_mpa: 21.0,
            e005_mpa: 7400.0,
            e0mean_mpa: 11000.0,
            timber: TimberKind::Solid,
        },
        2800.0,
        95.0,
        Method::En1995,
    );
    post.service_class = Some(2);
    post.load_duration = Some(LoadDuration::Medium);
    post.note = Some("loft post on the barn floor slab".into());

    let mut column = member(
        "C1",
        SectionSpec::I(IShape {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 9.0,
            root_radius_mm: 18.0,
            make: IMake::Rolled,
        }),
        steel(355.0),
        3600.0,
        820.0,
        Method::En1993,
    );
    column.k_major = 0.8;
    column.lcr_minor_mm = Some(1800.0);
    column.gamma_m1 = Some(1.0);
    column.note = Some("stair trimmer column, braced at mid-height about its minor axis".into());

    let prop = member(
        "S1",
        SectionSpec::Chs(Chs {
            diameter_mm: 114.3,
            wall_mm: 5.0,
            make: HollowMake::HotFinished,
        }),
        steel(355.0),
        4200.0,
        220.0,
        Method::AiscLrfd,
    );

    let mut brace = member(
        "B1",
        SectionSpec::Round(Round { diameter_mm: 32.0 }),
        steel(275.0),
        3100.0,
        11.0,
        Method::PerryRobertson,
    );
    brace.bow_mm = Some(3.1);
    brace.note = Some("diagonal brace bar in the gable".into());

    let mut flat = member(
        "F1",
        SectionSpec::Rect(Rect {
            depth_mm: 120.0,
            width_mm: 25.0,
        }),
        steel(275.0),
        1600.0,
        90.0,
        Method::Secant,
    );
    flat.eccentricity_mm = Some(6.0);

    let given = member(
        "G1",
        SectionSpec::Given(Given {
            area_mm2: 2850.0,
            i_major_mm4: 9.2e6,
            i_minor_mm4: 3.1e6,
            torsion_mm4: None,
            warping_mm6: None,
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        }),
        steel(355.0),
        2700.0,
        640.0,
        Method::Euler,
    );

    loft.members = vec![post, column, prop, brace, flat, given];
    vec![loft]
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn demo_is_a_valid_member_file() {
        let lists = demo_lists();
        assert!(!lists[0].members.is_empty());
        for l in &lists {
            let again = strutline_core::file::parse(&l.to_json()).unwrap();
            assert_eq!(&again, l);
        }
    }

    #[test]
    fn sample_member_checks() {
        let r = strutline_core::check_member(&sample_member("T")).unwrap();
        assert!(r.utilisation > 0.0 && r.utilisation.is_finite());
    }
}
