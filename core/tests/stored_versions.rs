//! Every earlier version of the member file still loads: one fixture per
//! version under `tests/fixtures/stored/`, read and checked member by member.
//! A new version adds its predecessor's fixture here, never removes one.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use strutline_core::file;
use strutline_core::section::SectionSpec;

#[test]
fn version_1_fixture_loads_and_checks() {
    let text = include_str!("../../tests/fixtures/stored/member-file-v1.json");
    let f = file::parse(text).unwrap();
    assert_eq!(f.version, file::VERSION);
    assert_eq!(f.members.len(), 11);
    // Every section kind of version 1 is present.
    let kinds: Vec<&str> = f
        .members
        .iter()
        .map(|m| match m.section {
            SectionSpec::I(_) => "i",
            SectionSpec::Rhs(_) => "rhs",
            SectionSpec::Chs(_) => "chs",
            SectionSpec::Angle(_) => "angle",
            SectionSpec::Channel(_) => "channel",
            SectionSpec::Tee(_) => "tee",
            SectionSpec::Rect(_) => "rect",
            SectionSpec::Round(_) => "round",
            SectionSpec::Given(_) => "given",
            SectionSpec::Catalogue(_) => "catalogue",
        })
        .collect();
    for k in [
        "i",
        "rhs",
        "chs",
        "angle",
        "channel",
        "tee",
        "rect",
        "round",
        "given",
        "catalogue",
    ] {
        assert!(kinds.contains(&k), "fixture lacks kind {k}");
    }
    // Options survive as written.
    let fi = f.member("F-I").unwrap();
    assert_eq!(fi.gamma_m1, Some(1.1));
    assert_eq!(fi.k_minor, 0.7);
    let fw = f.member("F-W").unwrap();
    assert_eq!(fw.lcr_minor_mm, Some(2500.0));
    // Every member checks (or is refused with a typed reason), none panics.
    for m in &f.members {
        let r = strutline_core::check_member(m).unwrap_or_else(|e| panic!("{e}"));
        assert!(
            r.utilisation.is_finite() && r.resistance_kn > 0.0,
            "{}",
            m.id
        );
    }
    // Written again, it reads back the same.
    assert_eq!(file::parse(&f.to_json()).unwrap(), f);
}

#[test]
fn version_2_fixture_loads_and_checks() {
    use strutline_core::member::{Leg, Truss};
    let text = include_str!("../../tests/fixtures/stored/member-file-v2.json");
    let f = file::parse(text).unwrap();
    assert_eq!(f.members.len(), 3);
    // Lifted to the current version (3 added the bending keys): no moments.
    assert_eq!(f.version, file::VERSION);
    assert!(f
        .members
        .iter()
        .all(|m| !m.has_moments() && !m.lt_restrained));
    let c = f.member("F-E5B").unwrap().angle_connection.unwrap();
    assert_eq!((c.leg, c.truss), (Leg::Short, Truss::Space));
    // "truss" defaults to planar.
    let c = f.member("F-E5X").unwrap().angle_connection.unwrap();
    assert_eq!((c.leg, c.truss), (Leg::Short, Truss::Planar));
    for m in &f.members {
        let r = strutline_core::check_member(m).unwrap_or_else(|e| panic!("{e}"));
        assert!(
            r.utilisation.is_finite() && r.resistance_kn > 0.0,
            "{}",
            m.id
        );
        let code = if m.id == "F-E5X" {
            "angle-connection-ignored"
        } else {
            "e5-conditions"
        };
        assert!(r.warnings.iter().any(|w| w.code == code), "{}", m.id);
    }
    assert_eq!(file::parse(&f.to_json()).unwrap(), f);
}
