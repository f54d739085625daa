//! AISC 360-16 F7 with slender walls (rectangular HSS), LRFD, against
//! values worked by hand (Python, from the wall dimensions alone) for
//! invented square-cornered boxes, F_y = 50 ksi, E = 29 000 ksi.
//!
//! Source: ANSI/AISC 360-16, *Specification for Structural Steel
//! Buildings*, American Institute of Steel Construction, Chicago, 2016:
//! F1(a) (phi_b = 0.90); F7.1 Eq. F7-1 (M_p = F_y Z); F7.2(c) Eqs. F7-3
//! (M_n = F_y S_e) and F7-4 (b_e = 1.92 t sqrt(E/F_y) [1 - 0.38/(b/t)
//! sqrt(E/F_y)] <= b); F7.3(c) Eqs. F7-7 to F7-9 (slender web: R_pg F_y S
//! and R_pg F_cr S with F_cr = 0.9 E k_c/(b/t)^2, k_c = 4.0) with R_pg of
//! Eq. F5-6 and a_w = 2 h t_w/(b t_f); Table B4.1b cases 17 and 19 (1.40
//! and 5.70 sqrt(E/F_y)); B4.1b(d): b and h the flat widths, taken as B -
//! 3t and H - 3t. Equations recalled from memory of the 2016 edition.
//!
//! Hand working: A, I and Z of the square-cornered box are closed forms;
//! S_e takes out the strip (b - b_e) x t at the compression flange's
//! mid-thickness, shifts the neutral axis, and divides by the distance to
//! the tension face (the engine's stated, conservative reading of "the
//! effective section modulus"). Units: 1 in = 25.4 mm, 1 ksi = 6.894757
//! MPa. Tolerance HAND = 1e-3 (hand values printed to 4 decimals).

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
/// Hand values printed to 4 decimals; closed forms.
const HAND: f64 = 1e-3;

fn hss((h, b, t): (f64, f64, f64), extra: serde_json::Value) -> strutline_core::Member {
    let base = json!({
        "id": "B1", "section": {"kind": "rhs", "depth_mm": h * IN, "width_mm": b * IN,
            "wall_mm": t * IN, "outer_radius_mm": 0},
        "material": {"fy_mpa": 50.0 * KSI, "e_mpa": 29000.0 * KSI, "g_mpa": 11200.0 * KSI},
        "length_mm": 3000, "axial_kn": 0, "method": "aisc360-lrfd", "lt_restrained": true
    });
    member_with(base, extra)
}

#[test]
fn slender_flange_uses_the_effective_width() {
    // 10 x 10 x 3/16 in: b/t = h/t = 50.33 > 1.40 sqrt(E/F_y) = 33.72
    // (flange slender), < 2.42 sqrt(E/F_y) = 58.28 (web compact).
    let r =
        strutline_core::check_member(&hss((10.0, 10.0, 0.1875), json!({"m_major_span_knm": 50})))
            .unwrap();
    // b_e = 180.1769 mm (F7-4); S_e = 329 773.7 mm3; M_n = F_y S_e = 113.6855 kNm (F7-3).
    assert_close(step_value(&r, "b_e"), 180.1769, HAND, "b_e, Eq. F7-4");
    assert_close(step_value(&r, "S_e"), 329_773.68, HAND, "S_e, F7.2(c)");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        102.3169,
        HAND,
        "phi_b F_y S_e, Eq. F7-3",
    );
}

#[test]
fn slender_web_uses_r_pg() {
    // 24 x 8 x 1/8 in about the major axis: h/t = 189 > 5.70 sqrt(E/F_y) =
    // 137.27, b/t = 61 (slender flange too). a_w = 6.1967, R_pg = 0.8952
    // (F5-6); F_cr = 0.9 E 4 / 61^2 = 193.4 MPa; R_pg F_cr S = 133.4036 kNm
    // (F7-8, F7-9), below F_y S_e = 231.528 kNm (F7-3), so the web governs:
    // phi M_n = 120.0632 kNm.
    let r = strutline_core::check_member(&hss((24.0, 8.0, 0.125), json!({"m_major_span_knm": 50})))
        .unwrap();
    assert_close(step_value(&r, "R_pg"), 0.8952, HAND, "R_pg, Eq. F5-6");
    assert_close(step_value(&r, "M_n,WLB"), 133.4036, HAND, "M_n, Eq. F7-8");
    assert_close(step_value(&r, "M_n,FLB"), 231.528, HAND, "M_n, Eq. F7-3");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        120.0632,
        HAND,
        "phi_b M_n, slender web",
    );
}
