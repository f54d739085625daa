//! AISC 360-16 F10 (single angles, principal-axis bending), LRFD, against
//! values worked by hand (Python, from the leg dimensions alone) for
//! invented equal-leg angles without fillets, F_y = 50 ksi, E = 29 000 ksi.
//!
//! Source: ANSI/AISC 360-16, *Specification for Structural Steel
//! Buildings*, American Institute of Steel Construction, Chicago, 2016:
//! F1(a) (phi_b = 0.90) and Eq. F1-1 (C_b); F10.1 Eq. F10-1 (M_n = 1.5
//! M_y); F10.2 Eqs. F10-2, F10-3 and F10-4 (lateral-torsional buckling
//! about the major principal axis, C_b at most 1.5, beta_w = 0 for equal
//! legs); F10.3 Eqs. F10-6 to F10-8 (leg local buckling); Table B4.1b case
//! 12 (0.54 and 0.91 sqrt(E/F_y)). Equations recalled from memory of the
//! 2016 edition (their continuity at both limits was verified by hand:
//! F10-6 gives 1.50 M_y at 0.54 and 0.865 F_y S_c against F10-8's 0.857 at
//! 0.91).
//!
//! Hand working: the angles are two rectangles (no root or toe radius), so
//! A, I_y, I_z, I_yz and the principal values are exact sums; the major
//! principal axis of an equal angle is the bisector through the heel, its
//! farthest points the toes at b/sqrt(2); the minor axis' farthest point is
//! the toe corner or the heel. Units: 1 in = 25.4 mm, 1 ksi = 6.894757 MPa.
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
    assert_close(step_value(&r, "M_cr"), 75.0923, HAND, "M_cr, Eq. F10-4");
    assert_close(step_value(&r, "M_n,LTB"), 23.8576, HAND, "M_n, Eq. F10-2");
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
    // L6x6x5/16: b/t = 19.2, noncompact: F_y S_c (2.43 - 1.72 (b/t)
    // sqrt(F_y/E)) = 13.6970 kNm (F10-6).
    let r = strutline_core::check_member(&angle(
        (6.0, 6.0, 0.3125),
        10.0,
        json!({"m_minor_span_knm": 5}),
    ))
    .unwrap();
    assert_close(
        r.bending.unwrap().minor.resistance_knm,
        0.9 * 13.6970,
        HAND,
        "phi_b M_n, Eq. F10-6",
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

#[test]
fn what_is_not_worked_is_refused_by_key() {
    // Unequal legs about the major axis without restraint: beta_w needed.
    let e = strutline_core::check_member(&angle(
        (6.0, 4.0, 0.5),
        10.0,
        json!({"m_major_span_knm": 5}),
    ))
    .unwrap_err()
    .to_string();
    assert!(e.contains("m_major_a_knm") && e.contains("beta_w"), "{e}");
    // ... but restrained it is yielding and leg buckling.
    assert!(strutline_core::check_member(&angle(
        (6.0, 4.0, 0.5),
        10.0,
        json!({"m_major_span_knm": 5, "lt_restrained": true})
    ))
    .is_ok());
    // Both principal axes: H2-1 is not worked.
    let e = strutline_core::check_member(&angle(
        L4,
        10.0,
        json!({"m_major_span_knm": 5, "m_minor_span_knm": 1}),
    ))
    .unwrap_err()
    .to_string();
    assert!(e.contains("m_minor_a_knm") && e.contains("H2-1"), "{e}");
    // Other codes: still refused, naming the moment key.
    for method in ["en1993-1-1", "csa-s16"] {
        let mut m = angle(L4, 10.0, json!({"m_major_span_knm": 5}));
        m.method = strutline_core::method::Method::from_key(method).unwrap();
        let e = strutline_core::check_member(&m).unwrap_err().to_string();
        assert!(e.contains("m_major_span_knm") && e.contains("angle"), "{e}");
    }
}
