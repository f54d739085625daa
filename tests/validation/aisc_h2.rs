//! AISC 360-16 H2 (Eq. H2-1) for single angles and tees under axial load and
//! bending about the principal axes, LRFD, against values worked by hand.
//!
//! Source: ANSI/AISC 360-16, *Specification for Structural Steel
//! Buildings*, American Institute of Steel Construction, Chicago, 2016: H2
//! (Eq. H2-1, f_ra/F_ca + f_rbw/F_cbw + f_rbz/F_cbz <= 1.0, evaluated at the
//! critical points of the section with the sense of each flexural stress;
//! the section modulus for the specific location); H2 may be used for any
//! shape (its opening text); F10 sends a single angle with axial load or
//! with moments about both principal axes to H2; Appendix 8.2.1 (B1 =
//! C_m / (1 - alpha P_r/P_e1), Eqs. A-8-3 to A-8-5). Text recalled from
//! memory of the 2016 edition.
//!
//! Hand working: the flexural strengths of the angle are this suite's hand
//! values of F10 (`aisc_chapter_f_angles.rs`, script
//! `tests/validation/hand/f10_angles.py`: L6x4x1/2 without fillets, F_y =
//! 50 ksi, 10 ft, uniform moments: phi_b M_n = 26.6761 kNm with the long
//! leg's toe compressed (positive major-axis moment), 12.6952 kNm about the
//! minor axis either way; P_e1 = 1774.680 kN (w) and 317.643 kN (z)); the
//! tee's come from its own result (F9 is checked in
//! `aisc_chapter_f_tees.rs`); P_c is the result's Chapter E strength (checked
//! in `aisc360.rs`, `aisc_e5.rs`). What is worked here by hand is the
//! combination: at a point the flexural term is f_rb/F_cb with S to that
//! point in both, i.e. +-M_r/M_c, + where the moment compresses the point.
//! The points, in principal coordinates (u, v) from the hand script: toe of
//! the leg depth_mm (0.714, 4.070) in, heel (-1.704, -1.421) in, toe of the
//! leg width_mm (1.957, -3.033) in (the sign convention: a positive major
//! moment compresses v > 0, a positive minor moment u > 0).
//! Tolerance HAND = 1e-3 (hand strengths printed to 4 decimals).

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_validation::{assert_close, member_with, step_value};

const IN: f64 = 25.4;
const KSI: f64 = 6.894757;
/// Hand strengths printed to 4 decimals.
const HAND: f64 = 1e-3;

/// phi_b M_n of the L6x4x1/2 at 10 ft, kNm (hand, F10).
const MCW_POS: f64 = 26.6761;
const MCZ: f64 = 12.6952;
/// P_e1 about w and z at 10 ft, kN (hand).
const PE_W: f64 = 1774.680;
const PE_Z: f64 = 317.643;

fn l6x4(axial_kn: f64, extra: serde_json::Value) -> strutline_core::CheckResult {
    let base = json!({
        "id": "A1", "section": {"kind": "angle", "depth_mm": 6.0 * IN, "width_mm": 4.0 * IN,
            "thickness_mm": 0.5 * IN},
        "material": {"fy_mpa": 50.0 * KSI, "e_mpa": 29000.0 * KSI, "g_mpa": 11200.0 * KSI},
        "length_mm": 120.0 * IN, "axial_kn": axial_kn, "method": "aisc360-lrfd"
    });
    strutline_core::check_member(&member_with(base, extra)).unwrap()
}

fn h2(r: &strutline_core::CheckResult) -> f64 {
    let c = r
        .interaction
        .iter()
        .find(|c| c.check == "H2-1")
        .expect("H2-1 worked");
    assert_eq!(r.interaction.len(), 1, "H2-1 alone: {:?}", r.interaction);
    c.utilisation
}

#[test]
fn angle_axial_and_both_moments_compressing_one_toe() {
    // P_r = 50 kN, M_w = +10 kNm, M_z = +2 kNm uniform, B1 not applied: the
    // toe of the leg depth_mm is compressed by both: 50/P_c + 10/26.6761 +
    // 2/12.6952.
    let r = l6x4(
        50.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": 2, "m_minor_b_knm": 2,
               "amplify_moments": false}),
    );
    let pc = step_value(&r, "P_c");
    let expect = 50.0 / pc + 10.0 / MCW_POS + 2.0 / MCZ;
    assert_close(h2(&r), expect, HAND, "H2-1 at the toe of the leg depth_mm");
    assert_close(
        step_value(&r, "H2-1 at the toe of the leg depth_mm"),
        expect,
        HAND,
        "that point's line",
    );
    // The heel: both moments relieve it: 50/P_c - 10/26.6761 - 2/12.6952.
    assert_close(
        step_value(&r, "H2-1 at the heel"),
        50.0 / pc - 10.0 / MCW_POS - 2.0 / MCZ,
        HAND,
        "H2-1 at the heel",
    );
    assert_eq!(r.governing_check, "H2-1");
    // ASD: the same point with M_n / Omega_b (M_n+ = 29.6402 kNm, M_nz =
    // 14.1057 kNm, hand; Omega_b = 1.67) and P_c = P_n / Omega_c.
    let r = l6x4(
        50.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": 2, "m_minor_b_knm": 2,
               "amplify_moments": false, "method": "aisc360-asd"}),
    );
    let pc = step_value(&r, "P_c");
    assert_close(
        h2(&r),
        50.0 / pc + 10.0 / (29.6402 / 1.67) + 2.0 / (14.1057 / 1.67),
        HAND,
        "H2-1, ASD",
    );
}

#[test]
fn signs_respected_a_minor_moment_that_relieves_the_toe() {
    // M_z = -2 kNm compresses the heel: at the toe of the leg depth_mm
    // 50/P_c + 10/26.6761 - 2/12.6952; at the heel 50/P_c - 10/26.6761 +
    // 2/12.6952; the toe governs, below the plain sum.
    let r = l6x4(
        50.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": -2, "m_minor_b_knm": -2,
               "amplify_moments": false}),
    );
    let pc = step_value(&r, "P_c");
    assert_close(
        h2(&r),
        50.0 / pc + 10.0 / MCW_POS - 2.0 / MCZ,
        HAND,
        "H2-1, signs respected",
    );
    assert!(h2(&r) < 50.0 / pc + 10.0 / MCW_POS + 2.0 / MCZ);
    // A minor diagram that changes sign along the member: the worse sign
    // at each point, so the toe again has + 2/12.6952... with the largest
    // moment of each sign (2 and 1 kNm).
    let r = l6x4(
        50.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": 2, "m_minor_b_knm": -1,
               "amplify_moments": false}),
    );
    let pc = step_value(&r, "P_c");
    assert_close(
        h2(&r),
        50.0 / pc + 10.0 / MCW_POS + 2.0 / MCZ,
        HAND,
        "H2-1, reversing minor",
    );
}

#[test]
fn a_relieving_moment_counts_where_it_acts_along_the_member() {
    // M_w from a uniform span load alone (10 kNm at mid-length, zero at the
    // ends), M_z = -2 kNm at end A falling to 0 at end B: the relief at the
    // toe of the leg depth_mm is full only where M_w is nil. The largest
    // along the member, by a fine sampling here (100 001 sections) against
    // the engine's exact search over the pieces of the diagrams: toe (+, +)
    // P/P_c + M_w(s)/M_cw - |M_z(s)|/M_cz, heel (-, -) P/P_c - M_w(s)/M_cw
    // + |M_z(s)|/M_cz, toe of the leg width_mm (-, +) both relieving.
    let r = l6x4(
        50.0,
        json!({"m_major_span_knm": 10, "m_minor_a_knm": -2, "amplify_moments": false}),
    );
    let b = r.bending.unwrap();
    let (mcw, mcz) = (b.major.resistance_knm, b.minor.resistance_knm);
    let axial = 50.0 / step_value(&r, "P_c");
    let mut worst = f64::NEG_INFINITY;
    for i in 0..=100_000 {
        let s = f64::from(i) / 100_000.0;
        let (w, z) = (10.0 * 4.0 * s * (1.0 - s), 2.0 * (1.0 - s));
        let toe = axial + w / mcw - z / mcz;
        let heel = axial - w / mcw + z / mcz;
        worst = worst.max(toe).max(heel);
    }
    assert_close(h2(&r), worst, 1e-6, "H2-1 along the member");
    // Taking each axis' extreme at one section would give the toe 10/M_cw -
    // 2/M_cz: less, and wrong (the relief is not there at mid-length).
    assert!(h2(&r) > axial + 10.0 / mcw - 2.0 / mcz + 1e-3);
}

#[test]
fn amplified_by_b1_about_each_principal_axis() {
    // amplify_moments (default): C_m = 1.0 (uniform moment, M_1/M_2 = -1),
    // B1w = 1/(1 - 50/1774.680), B1z = 1/(1 - 50/317.643).
    let r = l6x4(
        50.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": 2, "m_minor_b_knm": 2}),
    );
    let (b1w, b1z) = (1.0 / (1.0 - 50.0 / PE_W), 1.0 / (1.0 - 50.0 / PE_Z));
    assert_close(step_value(&r, "B1x"), b1w, HAND, "B1 about w");
    assert_close(step_value(&r, "B1y"), b1z, HAND, "B1 about z");
    let pc = step_value(&r, "P_c");
    assert_close(
        h2(&r),
        50.0 / pc + b1w * 10.0 / MCW_POS + b1z * 2.0 / MCZ,
        HAND,
        "H2-1 amplified",
    );
}

#[test]
fn p_e1_reached_fails_whatever_the_signs() {
    // 1800 kN > P_e1w = 1774.680 kN and P_e1z: neither B1 has a finite
    // value; with moments of a sense that would put +inf and -inf at the same
    // point (w positive, z negative), H2-1 is still infinite.
    let r = l6x4(
        1800.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": -2, "m_minor_b_knm": -2}),
    );
    assert!(h2(&r).is_infinite() && h2(&r) > 0.0, "{}", h2(&r));
    assert!(!r.passes);
}

#[test]
fn a_beam_angle_bent_about_both_principal_axes() {
    // No axial load (F10: moments about both principal axes go to H2):
    // 10/26.6761 + 2/12.6952 at the toe of the leg depth_mm.
    let r = l6x4(
        0.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10, "m_minor_a_knm": 2, "m_minor_b_knm": 2}),
    );
    assert_close(h2(&r), 10.0 / MCW_POS + 2.0 / MCZ, HAND, "H2-1, P_r = 0");
    assert_close(
        r.utilisation,
        10.0 / MCW_POS + 2.0 / MCZ,
        HAND,
        "the member's utilisation",
    );
}

fn tee(axial_kn: f64, extra: serde_json::Value) -> strutline_core::CheckResult {
    // An invented welded tee, 250 deep, flange 150 x 14, stem 9 mm, F_y 345
    // MPa, 3 m long.
    let base = json!({
        "id": "T1", "section": {"kind": "tee", "depth_mm": 250, "width_mm": 150,
            "flange_mm": 14, "web_mm": 9},
        "material": {"fy_mpa": 345, "e_mpa": 200000},
        "length_mm": 3000, "axial_kn": axial_kn, "method": "aisc360-lrfd",
        "amplify_moments": false
    });
    strutline_core::check_member(&member_with(base, extra)).unwrap()
}

#[test]
fn tee_flange_or_stem_in_compression() {
    // Flange compressed (positive in-plane moment) with a moment about the
    // axis of symmetry: a flange tip takes both: P/P_c + M/M_c+ + M_z/M_cz.
    let r = tee(
        100.0,
        json!({"m_major_a_knm": 8, "m_major_b_knm": 8, "m_minor_a_knm": 1.5, "m_minor_b_knm": 1.5}),
    );
    let b = r.bending.unwrap();
    let pc = step_value(&r, "P_c");
    let expect = 100.0 / pc + 8.0 / b.major.resistance_knm + 1.5 / b.minor.resistance_knm;
    assert_close(h2(&r), expect, HAND, "H2-1 at a flange tip");
    // The stem tip (on the axis of symmetry): P/P_c - M/M_c+.
    assert_close(
        step_value(&r, "H2-1 at the stem tip"),
        100.0 / pc - 8.0 / b.major.resistance_knm,
        HAND,
        "H2-1 at the stem tip",
    );
    // Stem compressed (negative in-plane moment): its own, lower strength
    // (F9.2(b), F9.4(b)); the stem tip P/P_c + M/M_c-, a flange tip P/P_c -
    // M/M_c- + M_z/M_cz: the larger governs.
    let r = tee(
        100.0,
        json!({"m_major_a_knm": -8, "m_major_b_knm": -8, "m_minor_a_knm": 1.5, "m_minor_b_knm": 1.5}),
    );
    let b = r.bending.unwrap();
    let pc = step_value(&r, "P_c");
    let stem = 100.0 / pc + 8.0 / b.major.resistance_knm;
    let flange = 100.0 / pc - 8.0 / b.major.resistance_knm + 1.5 / b.minor.resistance_knm;
    assert_close(
        step_value(&r, "H2-1 at the stem tip"),
        stem,
        HAND,
        "stem tip",
    );
    assert_close(h2(&r), stem.max(flange), HAND, "H2-1, stem compressed");
}

#[test]
fn h2_between_the_worst_term_and_the_plain_sum() {
    // Signs respected, H2-1 is never above the plain sum of the ratios
    // (every term compressing one point), and the member's utilisation never
    // below the axial or either bending ratio alone (checked beside H2-1).
    for (mw, mz) in [
        (10.0, 2.0),
        (-10.0, 2.0),
        (10.0, -2.0),
        (-6.0, -3.0),
        (0.0, 4.0),
    ] {
        let r = l6x4(
            30.0,
            json!({"m_major_a_knm": mw, "m_major_b_knm": mw, "m_minor_a_knm": mz,
                   "m_minor_b_knm": mz, "amplify_moments": false}),
        );
        let b = r.bending.unwrap();
        let pc = step_value(&r, "P_c");
        let (uw, uz) = (b.major.utilisation(), b.minor.utilisation());
        let sum = 30.0 / pc + uw + uz;
        assert!(h2(&r) <= sum + 1e-12, "({mw}, {mz}): {} > {sum}", h2(&r));
        assert!(h2(&r) >= 30.0 / pc + uw.max(uz) - uw.min(uz) - 1e-12);
        for alone in [30.0 / pc, uw, uz, h2(&r)] {
            assert!(r.utilisation >= alone - 1e-12, "({mw}, {mz})");
        }
    }
}
