//! The member lists of the check benchmark (`benches/check.rs`), shared
//! with the instruction-count harness `examples/check_loop.rs` so both
//! measure the same members.

use strutline_core::material::{MaterialSpec, TimberKind};
use strutline_core::member::Member;
use strutline_core::method::Method;
use strutline_core::section::{
    Angle, Chs, Flanged, Given, HollowMake, IMake, IShape, Rect, Rhs, Round, SectionSpec,
};

/// The number of members in the benchmark list.
pub const MEMBERS: usize = 10_000;

/// Member `i` of the mixed list: ten shapes and methods in turn.
pub fn member(i: usize) -> Member {
    let f = (i % 7) as f64;
    let (section, material, method) = match i % 10 {
        0 => (
            SectionSpec::I(IShape {
                depth_mm: 200.0 + 10.0 * f,
                width_mm: 200.0,
                flange_mm: 15.0,
                web_mm: 9.0,
                root_radius_mm: 18.0,
                make: IMake::Rolled,
            }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            Method::En1993,
        ),
        1 => (
            SectionSpec::Rhs(Rhs {
                depth_mm: 150.0,
                width_mm: 100.0 + 5.0 * f,
                wall_mm: 6.0,
                outer_radius_mm: 9.0,
                inner_radius_mm: Some(6.0),
                make: HollowMake::HotFinished,
            }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            Method::En1993,
        ),
        2 => (
            SectionSpec::Chs(Chs {
                diameter_mm: 168.3,
                wall_mm: 6.0 + f * 0.5,
                make: HollowMake::ColdFormed,
            }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            Method::AiscLrfd,
        ),
        3 => (
            SectionSpec::I(IShape {
                depth_mm: 310.0,
                width_mm: 305.0,
                flange_mm: 15.0 + f,
                web_mm: 9.9,
                root_radius_mm: 15.2,
                make: IMake::Rolled,
            }),
            MaterialSpec::Grade {
                grade: "A992".into(),
            },
            Method::AiscAsd,
        ),
        4 => (
            SectionSpec::Rhs(Rhs {
                depth_mm: 203.2,
                width_mm: 203.2,
                wall_mm: 8.0,
                outer_radius_mm: 16.0,
                inner_radius_mm: None,
                make: HollowMake::ColdFormed,
            }),
            MaterialSpec::Grade {
                grade: "350W".into(),
            },
            Method::CsaS16,
        ),
        5 => (
            SectionSpec::Rect(Rect {
                depth_mm: 200.0 + 10.0 * f,
                width_mm: 140.0,
            }),
            MaterialSpec::Grade {
                grade: "GL28h".into(),
            },
            Method::En1995,
        ),
        6 => (
            SectionSpec::Angle(Angle {
                depth_mm: 100.0,
                width_mm: 75.0,
                thickness_mm: 8.0 + f * 0.5,
                root_radius_mm: 10.0,
                toe_radius_mm: 5.0,
            }),
            MaterialSpec::Grade {
                grade: "S275".into(),
            },
            Method::En1993,
        ),
        7 => (
            SectionSpec::Channel(Flanged {
                depth_mm: 200.0,
                width_mm: 75.0,
                flange_mm: 12.5,
                web_mm: 8.5 + f * 0.2,
                root_radius_mm: 12.0,
            }),
            MaterialSpec::Custom {
                fy_mpa: 275.0,
                e_mpa: 210_000.0,
                g_mpa: None,
            },
            Method::PerryRobertson,
        ),
        8 => (
            SectionSpec::Round(Round {
                diameter_mm: 40.0 + f,
            }),
            MaterialSpec::Custom {
                fy_mpa: 355.0,
                e_mpa: 210_000.0,
                g_mpa: None,
            },
            Method::Secant,
        ),
        _ => (
            SectionSpec::Given(Given {
                area_mm2: 5000.0 + 100.0 * f,
                i_major_mm4: 4.0e7,
                i_minor_mm4: 1.5e7,
                torsion_mm4: None,
                warping_mm6: None,
                w_el_major_mm3: None,
                w_el_minor_mm3: None,
                w_pl_major_mm3: None,
                w_pl_minor_mm3: None,
            }),
            MaterialSpec::Timber {
                fc0k_mpa: 24.0,
                e005_mpa: 8000.0,
                e0mean_mpa: 12000.0,
                timber: TimberKind::Solid,
            },
            Method::En1995,
        ),
    };
    Member {
        k_minor: if i.is_multiple_of(3) { 0.7 } else { 1.0 },
        ..Member::new(
            format!("B{i}"),
            section,
            material,
            2500.0 + 50.0 * f,
            150.0 + 10.0 * f,
            method,
        )
    }
}

/// A member with moments (member file version 3): the shapes and methods
/// of [`member`] that have a bending rule (I, RHS, CHS, timber rectangle
/// under EN 1993-1-1, AISC LRFD and ASD, CSA S16, EN 1995-1-1), with end
/// and span moments about both axes; every other one also carries axial
/// load (a beam-column, [`beam_column`]), the rest none ([`bending_only`]).
pub fn with_moments(i: usize) -> Member {
    if i.is_multiple_of(2) {
        bending_only(i)
    } else {
        beam_column(i)
    }
}

/// Member `i` of [`with_moments`]'s shapes and methods with its axial load
/// and moments about both axes: every interaction equation of its method,
/// both axes, and lateral-torsional buckling for the open I sections (not
/// held laterally); EN 1993-1-1 members leave `interaction_annex` open, so
/// both annexes are worked.
pub fn beam_column(i: usize) -> Member {
    let mut m = member((i / 6) * 10 + i % 6);
    let f = (i % 7) as f64;
    m.m_major_a_knm = 20.0 + f;
    m.m_major_b_knm = -10.0;
    m.m_major_span_knm = 30.0;
    m.m_minor_a_knm = 2.0;
    if matches!(m.section, SectionSpec::Rect(_)) {
        m.m_major_a_knm = 2.0 + 0.1 * f;
        m.m_major_b_knm = -1.0;
        m.m_major_span_knm = 3.0;
        m.m_minor_a_knm = 0.2;
    }
    m
}

/// [`beam_column`] without axial load: bending about both axes (and
/// lateral-torsional buckling) alone.
pub fn bending_only(i: usize) -> Member {
    Member {
        axial_kn: 0.0,
        ..beam_column(i)
    }
}

/// The same members as [`with_moments`] without their moments.
pub fn plain(i: usize) -> Member {
    member((i / 6) * 10 + i % 6)
}
