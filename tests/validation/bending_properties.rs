//! Properties every bending rule must have, whatever the numbers: the
//! resistance never rises as the length between lateral restraints grows,
//! never exceeds the plastic moment, and the moment factors stay within
//! their published bounds; and bad bending input is refused by name.
//!
//! Sources of the bounds:
//! - AISC 360-16 Eq. F1-1: C_b = 12.5 M_max / (2.5 M_max + 3 M_A + 4 M_B +
//!   3 M_C) >= 1 for any diagram (each quarter-point moment is at most
//!   M_max), 1 for uniform moment.
//! - CSA S16-19 13.6(a): 1 <= omega_2 <= 2.5 (recalled from memory).
//! - ENV 1993-1-1:1992 Annex F: for linear diagrams 1 <= C1 <= 2.70, C1 = 1
//!   at uniform moment (recalled from memory).
//! - EN 1993-1-1:2005 6.2.5, 6.3.2; AISC 360-16 F2; CSA S16-19 13.5, 13.6;
//!   EN 1995-1-1 6.1.6, 6.3.3: M_Rd <= W_pl f_y / gamma (plastic moment) and
//!   chi_LT, M_n/M_p, k_crit within (0, 1].
//!
//! Tolerance NONE: these are inequalities, checked with a margin of
//! 1e-12 relative for rounding.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_core::bending::{c_b, c_factors, omega_2};
use strutline_core::member::{Moments, SpanLoad};
use strutline_core::Error;
use strutline_validation::member_from_json;

const ROUNDING: f64 = 1e-12;

fn member(
    section: serde_json::Value,
    material: serde_json::Value,
    method: &str,
    l: f64,
    extra: serde_json::Value,
) -> strutline_core::Member {
    let mut m = json!({
        "id": "P1", "section": section, "material": material,
        "length_mm": l, "axial_kn": 0, "method": method,
        "m_major_a_knm": 20, "m_major_b_knm": -5, "m_major_span_knm": 30, "m_minor_a_knm": 2
    });
    if let (Some(o), Some(e)) = (m.as_object_mut(), extra.as_object()) {
        for (k, v) in e {
            o.insert(k.clone(), v.clone());
        }
    }
    member_from_json(m)
}

/// (section, material, method, keys added to the member).
type Case = (
    serde_json::Value,
    serde_json::Value,
    &'static str,
    serde_json::Value,
);

fn cases() -> Vec<Case> {
    let steel = json!({"grade": "S355"});
    let ipe = json!({"kind": "catalogue", "designation": "IPE 300"});
    let heb = json!({"kind": "catalogue", "designation": "HE 200 B"});
    let welded = json!({"kind": "i", "depth_mm": 500, "width_mm": 200, "flange_mm": 16, "web_mm": 10, "make": "welded"});
    let rhs = json!({"kind": "rhs", "depth_mm": 200, "width_mm": 100, "wall_mm": 8, "outer_radius_mm": 16});
    let channel = json!({"kind": "channel", "depth_mm": 200, "width_mm": 75, "flange_mm": 11.5, "web_mm": 8.5, "root_radius_mm": 11.5});
    let rect = json!({"kind": "rect", "depth_mm": 120, "width_mm": 20});
    let glulam = json!({"grade": "GL28h"});
    let c24 = json!({"grade": "C24"});
    let timber = json!({"kind": "rect", "depth_mm": 360, "width_mm": 90});
    let mut v = Vec::new();
    for method in ["en1993-1-1", "aisc360-lrfd", "aisc360-asd", "csa-s16"] {
        for s in [&ipe, &heb, &welded, &rhs, &channel, &rect] {
            v.push((s.clone(), steel.clone(), method, json!({})));
        }
    }
    // Tees under AISC 360-16 F9 (the diagram of `member` changes sign, so
    // the stem is in compression somewhere: F9.2(b)).
    let tee = json!({"kind": "tee", "depth_mm": 230, "width_mm": 190, "flange_mm": 14.5, "web_mm": 9, "root_radius_mm": 10});
    // A tee takes its major-axis moment alone: moments about both axes
    // combine by AISC 360-16 H2, which is refused for tees.
    let major_only = json!({"m_minor_a_knm": 0});
    for method in ["aisc360-lrfd", "aisc360-asd"] {
        v.push((tee.clone(), steel.clone(), method, major_only.clone()));
    }
    // EN 1993-1-1 refuses that tee's stem in compression (Class 4): a
    // stockier tee takes the reversing diagram.
    let stocky =
        json!({"kind": "tee", "depth_mm": 150, "width_mm": 200, "flange_mm": 15, "web_mm": 14});
    v.push((stocky, steel.clone(), "en1993-1-1", major_only.clone()));
    // Tees under EN 1993-1-1 and CSA S16-19 with the flange compressed all
    // along (CSA refuses a compressed stem), about either axis.
    let flange_compressed = json!({"m_major_b_knm": 5, "m_minor_a_knm": 0});
    for method in ["en1993-1-1", "csa-s16"] {
        v.push((
            tee.clone(),
            steel.clone(),
            method,
            flange_compressed.clone(),
        ));
    }
    // Class 4 in bending under EN 1993-1-1 (the effective section of EN
    // 1993-1-5): a slender welded girder and a slender sharp RHS.
    let girder = json!({"kind": "i", "depth_mm": 600, "width_mm": 200, "flange_mm": 8, "web_mm": 4, "make": "welded"});
    let thin_rhs = json!({"kind": "rhs", "depth_mm": 300, "width_mm": 200, "wall_mm": 4, "outer_radius_mm": 0, "inner_radius_mm": 0});
    for s in [girder, thin_rhs] {
        v.push((s, steel.clone(), "en1993-1-1", json!({})));
    }
    v.push((timber.clone(), glulam, "en1995-1-1", json!({})));
    v.push((timber, c24, "en1995-1-1", json!({})));
    v
}

#[test]
fn resistance_never_rises_with_the_unbraced_length_nor_exceeds_the_plastic_moment() {
    for (section, material, method, extra) in cases() {
        let mut previous = f64::INFINITY;
        for l in [
            500.0, 1000.0, 2000.0, 3000.0, 4500.0, 6000.0, 8000.0, 12000.0, 20000.0,
        ] {
            let m = member(section.clone(), material.clone(), method, l, extra.clone());
            let p = strutline_core::check::Prepared::new(&m).unwrap();
            let r = p
                .check()
                .unwrap_or_else(|e| panic!("{method} {section}: {e}"));
            let b = r.bending.unwrap();
            let mr = b.major.resistance_knm;
            assert!(
                mr > 0.0 && mr <= previous * (1.0 + ROUNDING),
                "{method} {section} L = {l}: {mr} after {previous}"
            );
            previous = mr;
            let fy = r.strength_mpa;
            let props = p.section.props;
            if method != "en1995-1-1" {
                // The plastic moment W_pl f_y (no factor is below 1 in these codes' defaults).
                let mp = props.w_pl_major_mm3 * fy / 1e6;
                assert!(
                    mr <= mp * (1.0 + ROUNDING),
                    "{method} {section}: {mr} > M_p {mp}"
                );
                let mpz = props.w_pl_minor_mm3 * fy / 1e6;
                assert!(b.minor.resistance_knm <= mpz * (1.0 + ROUNDING));
            }
            for a in [b.major, b.minor] {
                assert!(
                    a.reduction > 0.0 && a.reduction <= 1.0,
                    "{method}: reduction {}",
                    a.reduction
                );
            }
        }
    }
}

#[test]
fn moment_factors_stay_within_their_published_bounds() {
    let loads = [SpanLoad::Uniform, SpanLoad::Point];
    let values = [-3.0, -1.0, -0.5, 0.0, 0.25, 1.0, 2.0];
    for a in values {
        for b in values {
            for span in values {
                for load in loads {
                    let m = Moments {
                        a_knm: a,
                        b_knm: b,
                        span_knm: span,
                        span_load: load,
                    };
                    if m.is_zero() {
                        continue;
                    }
                    let cb = c_b(&m);
                    assert!((1.0 - ROUNDING..=5.0).contains(&cb), "C_b {cb} for {m:?}");
                    let w2 = omega_2(&m);
                    assert!(
                        (1.0 - ROUNDING..=2.5).contains(&w2),
                        "omega_2 {w2} for {m:?}"
                    );
                    let c = c_factors(&m, true);
                    assert!((1.0..=2.70).contains(&c.c1), "C1 {} for {m:?}", c.c1);
                }
            }
        }
    }
    // Uniform moment: every factor is exactly 1.
    let u = Moments {
        a_knm: 7.0,
        b_knm: 7.0,
        span_knm: 0.0,
        span_load: SpanLoad::Uniform,
    };
    assert_eq!(
        (c_b(&u), omega_2(&u), c_factors(&u, true).c1),
        (1.0, 1.0, 1.0)
    );
}

fn refusal(m: &strutline_core::Member) -> Error {
    match strutline_core::check::Prepared::new(m).and_then(|p| p.check()) {
        Err(e) => e,
        Ok(r) => panic!("expected a refusal, got utilisation {}", r.utilisation),
    }
}

#[test]
fn bad_bending_input_is_refused_naming_member_and_field() {
    let steel = json!({"grade": "S355"});
    let ipe = json!({"kind": "catalogue", "designation": "IPE 300"});
    // A moment on a method without a bending rule names the key.
    for method in ["euler", "perry-robertson", "secant"] {
        let e = refusal(&member(
            ipe.clone(),
            steel.clone(),
            method,
            3000.0,
            json!({}),
        ));
        let text = e.to_string();
        assert!(
            text.contains("P1") && text.contains("m_major_a_knm"),
            "{text}"
        );
    }
    // Non-finite moments (a CSV or a script can make them) name the field.
    let mut m = member(ipe.clone(), steel.clone(), "en1993-1-1", 3000.0, json!({}));
    m.m_minor_span_knm = f64::NAN;
    let e = refusal(&m);
    assert_eq!(e.field(), Some("m_minor_span_knm"));
    assert!(e.to_string().contains("P1"));
    // An unknown span load type is a read error naming the key.
    let bad = json!({"id": "P2", "section": ipe, "material": steel, "length_mm": 3000,
        "axial_kn": 0, "method": "en1993-1-1", "span_load_major": "triangle"});
    let e = strutline_core::file::member_from_value(&bad, 0)
        .unwrap_err()
        .to_string();
    assert!(e.contains("P2") && e.contains("span_load_major"), "{e}");
    // A given section without the modulus the moment needs names it.
    let given = json!({"kind": "given", "area_mm2": 5380, "i_major_mm4": 8.36e7, "i_minor_mm4": 6.04e6, "torsion_mm4": 2.0e5, "warping_mm6": 1.26e11});
    let e = refusal(&member(
        given,
        json!({"grade": "S355"}),
        "en1993-1-1",
        3000.0,
        json!({}),
    ));
    assert_eq!(e.field(), Some("w_el_major_mm3"), "{e}");
    // Angles are refused with a message under EN 1993-1-1 and CSA S16;
    // under AISC 360-16 the moments about both principal axes combine by
    // H2-1 (aisc_chapter_f_angles and aisc_h2 have the values).
    let angle = json!({"kind": "angle", "depth_mm": 100, "width_mm": 100, "thickness_mm": 10});
    let r = strutline_core::check_member(&member(
        angle.clone(),
        json!({"grade": "S355"}),
        "aisc360-lrfd",
        2000.0,
        json!({}),
    ))
    .unwrap();
    assert!(
        r.interaction.iter().any(|c| c.check == "H2-1"),
        "{:?}",
        r.interaction
    );
    for method in ["en1993-1-1", "csa-s16"] {
        let e = refusal(&member(
            angle.clone(),
            json!({"grade": "S355"}),
            method,
            2000.0,
            json!({}),
        ));
        assert!(e.to_string().contains("angle"), "{e}");
    }
}

#[test]
fn a_beam_column_is_never_passed_silently() {
    let m = member(
        json!({"kind": "catalogue", "designation": "HE 200 B"}),
        json!({"grade": "S355"}),
        "en1993-1-1",
        3000.0,
        json!({"axial_kn": 10, "m_major_a_knm": 1, "m_major_b_knm": 1, "m_major_span_knm": 0, "m_minor_a_knm": 0}),
    );
    // EN 1993-1-1 now works its interaction (6.2.9, 6.61, 6.62): the member
    // is judged on them, never on bending or compression alone.
    let r = strutline_core::check_member(&m).unwrap();
    assert_eq!(r.interaction.len(), 3);
    assert!(r.interaction.iter().all(|c| r.utilisation >= c.utilisation));
    assert_eq!(
        r.passes,
        r.interaction.iter().all(|c| c.utilisation <= 1.0) && r.utilisation <= 1.0
    );
    assert!(!r
        .warnings
        .iter()
        .any(|w| w.code == "interaction-not-checked"));
    // The same member without axial load is a beam and passes on bending.
    let beam = member(
        json!({"kind": "catalogue", "designation": "HE 200 B"}),
        json!({"grade": "S355"}),
        "en1993-1-1",
        3000.0,
        json!({"m_major_a_knm": 1, "m_major_b_knm": 1, "m_major_span_knm": 0, "m_minor_a_knm": 0}),
    );
    let r = strutline_core::check_member(&beam).unwrap();
    assert!(r.passes && r.governing_check == "bending-major");
    let b = r.bending.unwrap();
    assert!((r.utilisation - 1.0 / b.major.resistance_knm).abs() < 1e-12);
}
