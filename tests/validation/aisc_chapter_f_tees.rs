//! AISC 360-16 F9 (tees loaded in the plane of symmetry), LRFD, against
//! values worked by hand (Python, from the equations and the plate
//! dimensions alone) for invented tees of ASTM A992-like steel (F_y = 50
//! ksi, E = 29 000 ksi).
//!
//! Source: ANSI/AISC 360-16, *Specification for Structural Steel
//! Buildings*, American Institute of Steel Construction, Chicago, 2016:
//! F1(a) (phi_b = 0.90); F9.1 Eqs. F9-2 to F9-4 (yielding, M_p = F_y Z_x <=
//! 1.6 M_y with the stem in tension, M_y with the stem in compression);
//! F9.2 Eqs. F9-6 to F9-13 (lateral-torsional buckling, L_p = 1.76 r_y
//! sqrt(E/F_y), L_r, M_cr = 1.95 E / L_b sqrt(I_y J) (B + sqrt(1 + B^2)),
//! B = +-2.3 (d/L_b) sqrt(I_y/J)); F9.3 Eqs. F9-14, F9-15 (flange local
//! buckling); F9.4 Eqs. F9-16 to F9-19 (stem local buckling, limits 0.84
//! and 1.52 sqrt(E/F_y)); Table B4.1b cases 10 and 14. Equations recalled
//! from memory of the 2016 edition (the consistency of F9-9 with F9-10 at
//! M_cr = M_y was verified by hand).
//!
//! Hand working: the tees have no root radius, so A, the centroid, I_x,
//! I_y and Z_x are sums of rectangles; J is the Roark Table 10.7 case 8
//! rectangles with the El Darwish & Johnston junction term (the published
//! approximation the engine names), worked separately in Python. Units: 1
//! in = 25.4 mm, 1 ksi = 6.894757 MPa. Tolerance HAND = 1e-3 (the
//! engine's section integration against closed-form sums, rounding of the
//! printed hand values to 4 decimals).

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
/// Hand values rounded to 4 decimals; exact plate sums.
const HAND: f64 = 1e-3;

/// A tee of plates (inches), F_y 50 ksi, with the extra keys.
fn tee(
    (d, bf, tf, tw): (f64, f64, f64, f64),
    length_ft: f64,
    extra: serde_json::Value,
) -> strutline_core::Member {
    let base = json!({
        "id": "T1", "section": {"kind": "tee", "depth_mm": d * IN, "width_mm": bf * IN,
            "flange_mm": tf * IN, "web_mm": tw * IN},
        "material": {"fy_mpa": 50.0 * KSI, "e_mpa": 29000.0 * KSI, "g_mpa": 11200.0 * KSI},
        "length_mm": length_ft * 12.0 * IN, "axial_kn": 0, "method": "aisc360-lrfd"
    });
    member_with(base, extra)
}

const DEEP: (f64, f64, f64, f64) = (9.0, 7.5, 0.57, 0.355);

#[test]
fn braced_tee_stem_in_tension_is_phi_m_p() {
    let r = strutline_core::check_member(&tee(
        DEEP,
        10.0,
        json!({"m_major_span_knm": 40, "lt_restrained": true}),
    ))
    .unwrap();
    // F9-3: M_y = F_y S_x (S_x to the stem tip) = 44.0326 kNm.
    assert_close(step_value(&r, "M_y"), 44.0326, HAND, "M_y, Eq. F9-3");
    // F9-2: M_p = F_y Z_x = 70.4522 kNm (below 1.6 M_y = 70.45: the cap
    // and F_y Z_x agree to 4 digits here).
    assert_close(step_value(&r, "M_p"), 70.4522, HAND, "M_p, Eq. F9-2");
    let b = r.bending.unwrap();
    // phi_b M_n = 0.9 x 70.4522 = 63.4070 kNm, F1(a).
    assert_close(
        b.major.resistance_knm,
        63.4070,
        HAND,
        "phi_b M_n, stem in tension",
    );
    assert!(b.major.critical_knm.is_none());
    assert!(r.warnings.iter().any(|w| w.code == "tee-moment-sign"));
}

#[test]
fn braced_tee_stem_in_compression_is_limited_by_stem_buckling() {
    let r = strutline_core::check_member(&tee(
        DEEP,
        10.0,
        json!({"m_major_span_knm": -30, "lt_restrained": true}),
    ))
    .unwrap();
    // d/t_w = 25.35 between 0.84 and 1.52 sqrt(E/F_y) = 20.23, 36.61:
    // F_cr = (1.43 - 0.515 (d/t_w) sqrt(F_y/E)) F_y (F9-18), M_n = F_cr S_x
    // = 39.0950 kNm (F9-16) < M_y = 44.0326 (F9-4).
    assert_close(
        step_value(&r, "M_n,SLB"),
        39.0950,
        HAND,
        "M_n, Eq. F9-16, F9-18",
    );
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        0.9 * 39.0950,
        HAND,
        "phi_b M_n, stem in compression",
    );
    assert_close(
        b.major.utilisation(),
        30.0 / (0.9 * 39.0950),
        HAND,
        "utilisation",
    );
}

#[test]
fn unbraced_tee_single_curvature_inelastic_ltb() {
    let r =
        strutline_core::check_member(&tee(DEEP, 10.0, json!({"m_major_span_knm": 40}))).unwrap();
    // L_p = 1.76 r_y sqrt(E/F_y) = 1789.13 mm (F9-8); L_r = 15317.3 mm (F9-9).
    assert_close(step_value(&r, "L_p"), 1789.132, HAND, "L_p, Eq. F9-8");
    assert_close(step_value(&r, "L_r"), 15317.31, HAND, "L_r, Eq. F9-9");
    // L_b = 10 ft = 3048 mm: M_n = M_p - (M_p - M_y)(L_b - L_p)/(L_r - L_p)
    // = 67.9938 kNm (F9-6); M_cr (B > 0) = 442.613 kNm (F9-10, F9-11).
    assert_close(step_value(&r, "M_cr"), 442.6126, HAND, "M_cr, Eq. F9-10");
    let b = r.bending.unwrap();
    assert_close(b.major.resistance_knm, 61.1944, HAND, "phi_b M_n, Eq. F9-6");
    assert_close(
        b.major.critical_knm.unwrap(),
        442.6126,
        HAND,
        "critical_knm",
    );
    assert!(b.major.moment_factor.is_none(), "F9 has no C_b");
}

#[test]
fn unbraced_tee_long_span_elastic_ltb() {
    let r =
        strutline_core::check_member(&tee(DEEP, 60.0, json!({"m_major_span_knm": 20}))).unwrap();
    // L_b = 60 ft > L_r: M_n = M_cr = 35.7019 kNm (F9-7, F9-10).
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        0.9 * 35.7019,
        HAND,
        "phi_b M_cr, Eq. F9-7",
    );
}

#[test]
fn double_curvature_puts_the_stem_in_compression() {
    let r = strutline_core::check_member(&tee(
        DEEP,
        10.0,
        json!({"m_major_a_knm": 30, "m_major_b_knm": -30}),
    ))
    .unwrap();
    // The stem is compressed near end B: F9.2(b), B = -2.3 (d/L_b)
    // sqrt(I_y/J), M_cr = 73.9334 kNm (F9-10, F9-12); M_n = M_cr <= M_y =
    // 44.0326 (F9-13), for both signs. Stem local buckling 39.0950 governs
    // the negative side: phi M_n- = 35.1855 against 30 kNm, the positive
    // side 0.9 x 44.0326 = 39.6294 against 30 kNm; the negative governs.
    assert_close(step_value(&r, "M_cr"), 73.9334, HAND, "M_cr, Eq. F9-12");
    assert_close(step_value(&r, "M_n+"), 44.0326, HAND, "M_n+, Eq. F9-13");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        35.1855,
        HAND,
        "phi_b M_n-, governing sign",
    );
}

#[test]
fn wide_tee_bends_in_its_plane_about_the_minor_principal_axis() {
    // b_f = 12 in on d = 6 in: I about the axis of symmetry is the larger,
    // so the plane-of-symmetry axis (y-y) is the minor principal axis.
    // b_f / 2t_f = 27.3 > 1.0 sqrt(E/F_y) = 24.08: slender flange, F9-15:
    // 0.7 E S_xc / lambda^2 = 33.8369 kNm, above M_p = 27.4150 kNm (F9-2).
    let r = strutline_core::check_member(&tee(
        (6.0, 12.0, 0.22, 0.3),
        10.0,
        json!({"m_minor_span_knm": 10, "lt_restrained": true}),
    ))
    .unwrap();
    assert_close(step_value(&r, "M_n,FLB"), 33.8369, HAND, "M_n, Eq. F9-15");
    let b = r.bending.unwrap();
    assert_close(
        b.minor.resistance_knm,
        0.9 * 27.4150,
        HAND,
        "phi_b M_p, wide tee",
    );
}

#[test]
fn slender_stem_elastic_stem_buckling() {
    // d/t_w = 40 > 1.52 sqrt(E/F_y) = 36.61: F_cr = 1.52 E / (d/t_w)^2
    // (F9-19), M_n = F_cr S_x = 21.9792 kNm.
    let r = strutline_core::check_member(&tee(
        (10.0, 8.0, 0.6, 0.25),
        10.0,
        json!({"m_major_a_knm": -10, "m_major_b_knm": -10, "lt_restrained": true}),
    ))
    .unwrap();
    assert_close(step_value(&r, "M_n,SLB"), 21.9792, HAND, "M_n, Eq. F9-19");
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        0.9 * 21.9792,
        HAND,
        "phi_b M_n",
    );
}

#[test]
fn tees_under_the_other_codes() {
    // EN 1993-1-1 and CSA S16-19 work a tee with its flange compressed
    // (tests/validation/en1993_1_1_tees.rs, csa_s16_tees.rs); CSA refuses a
    // compressed stem, naming the key.
    for method in ["en1993-1-1", "csa-s16"] {
        let mut m = tee(DEEP, 10.0, json!({"m_major_span_knm": 10}));
        m.method = strutline_core::method::Method::from_key(method).unwrap();
        assert!(strutline_core::check_member(&m).is_ok(), "{method}");
    }
    let mut m = tee(DEEP, 10.0, json!({"m_major_span_knm": -10}));
    m.method = strutline_core::method::Method::from_key("csa-s16").unwrap();
    let e = strutline_core::check_member(&m).unwrap_err().to_string();
    assert!(e.contains("m_major_span_knm") && e.contains("stem"), "{e}");
}

#[test]
fn a_tee_with_axial_load_is_never_passed_on_bending_alone() {
    // The beam-column of a tee is judged on H2-1 (values in aisc_h2.rs),
    // never on F9 alone: the member's utilisation is at least H2-1's, which
    // is at least the axial ratio plus the bending ratio (one moment, the
    // flange in compression at the flange tips).
    let r = strutline_core::check_member(&tee(
        DEEP,
        10.0,
        json!({"axial_kn": 20, "m_major_span_knm": 5}),
    ))
    .unwrap();
    let h2 = r
        .interaction
        .iter()
        .find(|c| c.check == "H2-1")
        .expect("H2-1 worked");
    let b = r.bending.unwrap();
    let axial = 20.0 / step_value(&r, "P_c");
    assert!(h2.utilisation >= axial + b.major.utilisation() - 1e-12);
    assert!(r.utilisation >= h2.utilisation);
}
