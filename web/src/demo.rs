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

/// The member a new row starts as: a design code's method (EN 1993-1-1),
/// never a bare idealisation such as Euler's, so a member left as it
/// started is not checked more kindly than the codes check it. Its design
/// load is a placeholder the app does not check: the row needs input
/// ([`NEW_MEMBER_ASKS`]) until the load is typed.
pub fn new_member() -> Member {
    let mut m = sample_member("M1");
    m.method = Method::En1993;
    m
}

/// What a new member's design load field says until it is filled in.
pub const NEW_MEMBER_ASKS: &str = "axial_kn: enter this member's design load N_Ed";

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

    /// A new member is checked by a design code, which finds less than
    /// Euler's capped load for the same strut (EN 1993-1-1 6.3.1.2: chi < 1
    /// at any slenderness above 0.2), and asks for its load by key.
    #[test]
    fn a_new_member_starts_on_a_design_code() {
        let m = new_member();
        assert_eq!(m.method, Method::En1993);
        let code = strutline_core::check_member(&m).unwrap();
        let mut euler = m.clone();
        euler.method = Method::Euler;
        let ideal = strutline_core::check_member(&euler).unwrap();
        assert!(
            code.resistance_kn < ideal.resistance_kn,
            "EN 1993-1-1 {} kN against Euler {} kN",
            code.resistance_kn,
            ideal.resistance_kn
        );
        assert!(NEW_MEMBER_ASKS.starts_with("axial_kn: "));
    }
}
