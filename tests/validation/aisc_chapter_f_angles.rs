//! AISC 360-16 F10 (single angles, principal-axis bending), LRFD, against
//! values worked by hand (Python, from the leg dimensions alone) for
//! invented equal- and unequal-leg angles without fillets, F_y = 50 ksi,
//! E = 29 000 ksi; beta_w also against the Commentary's table.
//!
//! Source: ANSI/AISC 360-16, *Specification for Structural Steel
//! Buildings*, American Institute of Steel Construction, Chicago, 2016:
//! F1(a) (phi_b = 0.90) and Eq. F1-1 (C_b); F10.1 Eq. F10-1 (M_n = 1.5
//! M_y); F10.2 Eqs. F10-2, F10-3 and F10-4 (lateral-torsional buckling
//! about the major principal axis, C_b at most 1.5, beta_w = 0 for equal
//! legs, positive with the short leg's toe compressed, negative with the
//! long leg's and wherever the long leg is compressed anywhere along the
//! unbraced length); F10.3 Eqs. F10-6 to F10-8 (leg local buckling, S_c to
//! the toe in compression); Table B4.1b case 12 (0.54 and 0.91
//! sqrt(E/F_y)); Commentary to F10: beta_w = (1/I_w) int z (w^2 + z^2) dA -
//! 2 z_0 and Table C-F10.1 (beta_w of unequal-leg angles: L8x4 5.48 in,
//! L6x4 3.14 in, L5x3 2.99 in; recalled from memory, tolerance TABLE). Equations recalled from memory of the
//! 2016 edition (their continuity at both limits was verified by hand:
//! F10-6 gives 1.50 M_y at 0.54 and 0.865 F_y S_c against F10-8's 0.857 at
//! 0.91).
//!
//! Hand working: the angles are two rectangles (no root or toe radius), so
//! A, I_y, I_z, I_yz and the principal values are exact sums; the major
//! principal axis of an equal angle is the bisector through the heel, its
//! farthest points the toes at b/sqrt(2); the minor axis' farthest point is
//! the toe corner or the heel. Unequal legs: the same two rectangles,
//! every integral (I_w, I_z, int z (w^2 + z^2) dA) by 2 x 2 Gauss points
//! per rectangle (exact for these polynomials), a way independent of the
//! engine's Green's-theorem sums over the outline; the script is
//! `tests/validation/hand/f10_angles.py`. Sign convention of the member file
//! (heel at the lower left, leg depth_mm upright): a positive major-axis
//! moment compresses the toe of the leg depth_mm, a positive minor-axis
//! moment both toes. Units: 1 in = 25.4 mm, 1 ksi = 6.894757 MPa.
//! Tolerance HAND = 1e-3 (hand values printed to 4 decimals).

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
/// Hand values printed to 4 decimals; exact rectangle sums.
const HAND: f64 = 1e-3;
/// The Commentary's table is printed to 0.01 in and tabulates the rolled
/// angles (with fillets, usual thickness); ours are sharp: 1 %.
const TABLE: f64 = 0.01;

fn angle(
    (h, b, t): (f64, f64, f64),
    length_ft: f64,
    extra: serde_json::Value,
) -> strutline_core::Member {
    let base = json!({
        "id": "L1", "section": {"kind": "angle", "depth_mm": h * IN, "width_mm": b * IN,
            "thickness_mm": t * IN},
        "material": {"fy_mpa": 50.0 * KSI, "e_mpa": 29000.0 * KSI, "g_mpa": 11200.0 * KSI},
        "length_mm": length_ft * 12.0 * IN, "axial_kn": 0, "method": "aisc360-lrfd"
    });
    member_with(base, extra)
}

const L4: (f64, f64, f64) = (4.0, 4.0, 0.5);

#[test]
fn equal_angle_major_axis_inelastic_ltb() {
    let r = strutline_core::check_member(&angle(
        L4,
        6.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10}),
    ))
    .unwrap();
    // M_y = F_y S_w = 17.6325 kNm; M_cr = 9 E A r_z t C_b / (8 L_b) =
    // 75.0923 kNm (F10-4, C_b = 1); M_y/M_cr < 1: M_n = (1.92 - 1.17
    // sqrt(M_y/M_cr)) M_y = 23.8576 kNm (F10-2) < 1.5 M_y = 26.4487.
    assert_close(step_value(&r, "M_y"), 17.6325, HAND, "M_y");
    assert_close(step_value(&r, "M_cr (+)"), 75.0923, HAND, "M_cr, Eq. F10-4");
    assert_close(
        step_value(&r, "beta_w (+)"),
        0.0,
        HAND,
        "beta_w, equal legs",
    );
    assert_close(step_value(&r, "M_n,LTB+"), 23.8576, HAND, "M_n, Eq. F10-2");
    let b = r.bending.unwrap();
    assert_close(b.major.resistance_knm, 21.4719, HAND, "phi_b M_n");
    assert_eq!(b.major.moment_factor, Some(1.0));
}

#[test]
fn equal_angle_major_axis_elastic_ltb_with_c_b_capped() {
    // L_b = 20 ft, one end moment: C_b of F1-1 = 1.67, capped at 1.5 (F10.2):
    // M_cr = 33.7915 kNm, M_y/M_cr <= 1, M_n = 18.9521 kNm.
    let r = strutline_core::check_member(&angle(L4, 20.0, json!({"m_major_a_knm": 10}))).unwrap();
    assert_close(step_value(&r, "C_b"), 1.5, HAND, "C_b <= 1.5");
    let b = r.bending.unwrap();
    assert_close(
        b.major.critical_knm.unwrap(),
        33.7915,
        HAND,
        "M_cr, C_b 1.5",
    );
    assert_close(b.major.resistance_knm, 17.0569, HAND, "phi_b M_n");
    // Uniform moment at 20 ft: M_cr = 22.5277 kNm (C_b = 1); still
    // M_y/M_cr < 1: M_n = 15.6029 kNm (F10-2).
    let u = strutline_core::check_member(&angle(
        L4,
        20.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10}),
    ))
    .unwrap();
    assert_close(
        u.bending.unwrap().major.resistance_knm,
        14.0426,
        HAND,
        "phi_b M_n, C_b 1",
    );
}

#[test]
fn minor_axis_is_yielding_and_leg_buckling_only() {
    // L4x4x1/2 about z: compact legs (b/t = 8 < 13.00): 1.5 M_y = 11.6199 kNm.
    let r = strutline_core::check_member(&angle(L4, 10.0, json!({"m_minor_span_knm": 5}))).unwrap();
    let b = r.bending.unwrap();
    assert!(b.minor.critical_knm.is_none());
    assert_close(b.minor.resistance_knm, 0.9 * 11.6199, HAND, "phi_b 1.5 M_y");
    // L6x6x5/16, b/t = 19.2, noncompact. A positive moment compresses both
    // toes: F10-6 with S_c to the toe (its inner corner, the farther from
    // the minor axis), F_y S_c (2.43 - 1.72 (b/t) sqrt(F_y/E)) = 14.3733
    // kNm. A negative one compresses the heel, no toe: 1.5 M_y = 19.4054 kNm
    // (M_y with the heel, the farthest point).
    let l6 = (6.0, 6.0, 0.3125);
    let r = strutline_core::check_member(&angle(l6, 10.0, json!({"m_minor_span_knm": 5}))).unwrap();
    assert_close(
        r.bending.unwrap().minor.resistance_knm,
        0.9 * 14.3733,
        HAND,
        "phi_b M_n, Eq. F10-6, toes compressed",
    );
    let r =
        strutline_core::check_member(&angle(l6, 10.0, json!({"m_minor_span_knm": -5}))).unwrap();
    assert_close(
        r.bending.unwrap().minor.resistance_knm,
        0.9 * 19.4054,
        HAND,
        "phi_b 1.5 M_y, heel compressed (F10.3 does not apply)",
    );
}

#[test]
fn slender_leg_continuously_restrained() {
    // L8x8x5/16: b/t = 25.6 > 21.92: F_cr = 0.71 E / (b/t)^2, M_n = F_cr S_c
    // = 31.5569 kNm (F10-7, F10-8); no lateral-torsional buckling.
    let r = strutline_core::check_member(&angle(
        (8.0, 8.0, 0.3125),
        10.0,
        json!({"m_major_span_knm": 10, "lt_restrained": true}),
    ))
    .unwrap();
    let b = r.bending.unwrap();
    assert!(b.major.critical_knm.is_none());
    assert_close(
        b.major.resistance_knm,
        0.9 * 31.5569,
        HAND,
        "phi_b M_n, Eq. F10-7",
    );
}

const L6X4: (f64, f64, f64) = (6.0, 4.0, 0.5);

#[test]
// 3.14 in is the table's beta_w of an L6x4, not an approximation of pi.
#[allow(clippy::approx_constant)]
fn beta_w_from_the_geometry_matches_the_commentary_table() {
    // Hand (Gauss points): L6x4x1/2 3.1273 in = 79.435 mm; the Commentary's
    // Table C-F10.1 (recalled): 3.14 in. L8x4x1/2 5.5017 in (5.48), L5x3x3/8
    // 2.9788 in (2.99).
    let beta = |dims, ft| {
        let r = strutline_core::check_member(&angle(
            dims,
            ft,
            json!({"m_major_a_knm": 1, "m_major_b_knm": 1}),
        ))
        .unwrap();
        step_value(&r, "|beta_w|")
    };
    assert_close(beta(L6X4, 10.0), 3.1273 * IN, HAND, "beta_w L6x4x1/2, hand");
    assert_close(
        beta(L6X4, 10.0),
        3.14 * IN,
        TABLE,
        "beta_w L6x4, Table C-F10.1",
    );
    assert_close(
        beta((8.0, 4.0, 0.5), 10.0),
        5.5017 * IN,
        HAND,
        "beta_w L8x4x1/2, hand",
    );
    assert_close(
        beta((8.0, 4.0, 0.5), 10.0),
        5.48 * IN,
        TABLE,
        "beta_w L8x4, Table C-F10.1",
    );
    assert_close(
        beta((5.0, 3.0, 0.375), 10.0),
        2.9788 * IN,
        HAND,
        "beta_w L5x3x3/8, hand",
    );
    assert_close(
        beta((5.0, 3.0, 0.375), 10.0),
        2.99 * IN,
        TABLE,
        "beta_w L5x3, Table C-F10.1",
    );
    // The same angle turned (long leg along y): the same magnitude.
    assert_close(
        beta((4.0, 6.0, 0.5), 10.0),
        3.1273 * IN,
        HAND,
        "beta_w turned",
    );
}

#[test]
fn unequal_leg_lateral_torsional_buckling_by_the_compressed_toe() {
    // L6x4x1/2 (leg depth_mm the long one), L_b = 10 ft, uniform moment
    // (C_b = 1), M_y = F_y S_w = 27.8575 kNm.
    let uniform = |m: f64| {
        strutline_core::check_member(&angle(
            L6X4,
            10.0,
            json!({"m_major_a_knm": m, "m_major_b_knm": m}),
        ))
        .unwrap()
    };
    // Positive: the long leg's toe compressed, beta_w = -3.1273 in: M_cr =
    // 52.0425 kNm, M_n = 29.6402 kNm (F10-2), phi_b M_n = 26.6761 kNm.
    let r = uniform(10.0);
    assert_close(step_value(&r, "M_y"), 27.8575, HAND, "M_y");
    assert_close(
        step_value(&r, "beta_w (+)"),
        -3.1273 * IN,
        HAND,
        "beta_w, long leg compressed",
    );
    assert_close(step_value(&r, "M_cr (+)"), 52.0425, HAND, "M_cr, Eq. F10-4");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        26.6761,
        HAND,
        "phi_b M_n, long leg's toe compressed",
    );
    assert_close(
        b.major.critical_knm.unwrap(),
        52.0425,
        HAND,
        "reported M_cr",
    );
    // Negative: the short leg's toe compressed, beta_w = +3.1273 in: M_cr =
    // 77.3520 kNm, M_n = 33.9266 kNm, phi_b M_n = 30.5340 kNm: higher.
    let r = uniform(-10.0);
    assert_close(
        step_value(&r, "beta_w (-)"),
        3.1273 * IN,
        HAND,
        "beta_w, short leg compressed",
    );
    assert_close(step_value(&r, "M_cr (-)"), 77.3520, HAND, "M_cr, Eq. F10-4");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        30.5340,
        HAND,
        "phi_b M_n, short leg's toe compressed",
    );
    // The same angle turned (leg depth_mm the short one): a positive moment
    // compresses the short leg: 30.5340 kNm again.
    let r = strutline_core::check_member(&angle(
        (4.0, 6.0, 0.5),
        10.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": 10}),
    ))
    .unwrap();
    assert_close(
        step_value(&r, "beta_w (+)"),
        3.1273 * IN,
        HAND,
        "beta_w, turned",
    );
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        30.5340,
        HAND,
        "phi_b M_n, turned",
    );
}

#[test]
fn a_reversing_moment_takes_the_negative_beta_w_for_both_signs() {
    // End moments 10 and -5 kNm: the long leg's toe is compressed near end
    // A, the short leg's near end B; F10.2(b)(1): negative beta_w over the
    // unbraced length. C_b of F1-1 = 1.92, capped at 1.5: M_cr = 78.0637 kNm,
    // M_n = 34.0160 kNm, phi_b M_n = 30.6144 kNm for either sign.
    let r = strutline_core::check_member(&angle(
        L6X4,
        10.0,
        json!({"m_major_a_knm": 10, "m_major_b_knm": -5}),
    ))
    .unwrap();
    assert_close(step_value(&r, "C_b"), 1.5, HAND, "C_b <= 1.5");
    assert_close(
        step_value(&r, "beta_w (+)"),
        -3.1273 * IN,
        HAND,
        "beta_w, + side",
    );
    assert_close(
        step_value(&r, "beta_w (-)"),
        -3.1273 * IN,
        HAND,
        "beta_w, - side",
    );
    assert_close(
        step_value(&r, "M_cr (-)"),
        78.0637,
        HAND,
        "M_cr, negative beta_w",
    );
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        30.6144,
        HAND,
        "phi_b M_n",
    );
    // Only the short leg compressed (negative moments throughout): the
    // positive value stands.
    let r = strutline_core::check_member(&angle(
        L6X4,
        10.0,
        json!({"m_major_a_knm": -10, "m_major_b_knm": -5}),
    ))
    .unwrap();
    assert!(step_value(&r, "beta_w (-)") > 0.0);
}

#[test]
fn what_is_not_worked_is_refused_by_key() {
    // Other codes: still refused, naming the moment key.
    for method in ["en1993-1-1", "csa-s16"] {
        let mut m = angle(L4, 10.0, json!({"m_major_span_knm": 5}));
        m.method = strutline_core::method::Method::from_key(method).unwrap();
        let e = strutline_core::check_member(&m).unwrap_err().to_string();
        assert!(e.contains("m_major_span_knm") && e.contains("angle"), "{e}");
    }
    // The sign convention is said on every angle with a moment.
    let r =
        strutline_core::check_member(&angle(L6X4, 10.0, json!({"m_major_span_knm": 5}))).unwrap();
    assert!(r.warnings.iter().any(|w| w.code == "angle-moment-sign"));
}
