//! CSA S16-19 bending of tees with the flange compressed, against values
//! worked independently from the plate dimensions
//! (tests/validation/bending_review/rederive.py).
//!
//! Source: CSA S16-19, *Design of steel structures*, CSA Group, 2019: 13.5
//! (M_r = phi Z F_y, Class 1 and 2), Table 2 (tee flange b/t = b_f/2t_f,
//! 145/170/200 / sqrt(F_y)), 13.6(a) (M_r = 1.15 phi M_p (1 - 0.28 M_p /
//! M_u) <= phi M_p when M_u > 0.67 M_p), 13.6(e) (monosymmetric sections:
//! M_u = omega_3 pi^2 E I_y / (2 L^2) [beta_x + sqrt(beta_x^2 + 4 (G J L^2 /
//! (pi^2 E I_y) + C_w / I_y))], omega_3 = omega_2 in single curvature),
//! phi = 0.90. Recalled from memory of the standard; beta_x from its
//! definition (2 z_j, the integral over the plates), not the standard's
//! approximation for I sections.
//!
//! The tee of tests/validation/en1993_1_1_tees.rs (200 x 200 x 15 x 12 mm
//! plates), F_y = 350 MPa: beta_x = 129.5237 mm, Z = 227 089.5 mm3, Class 1
//! (b/t 6.67 <= 7.75; the plastic neutral axis in the flange). Tolerance
//! SCRIPT = 1e-4 (8 printed figures, the same plates).

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_validation::{assert_close, member_with, step_value};

const SCRIPT: f64 = 1e-4;

fn tee(extra: serde_json::Value) -> strutline_core::Member {
    let base = json!({
        "id": "T1", "section": {"kind": "tee", "depth_mm": 200, "width_mm": 200,
            "flange_mm": 15, "web_mm": 12},
        "material": {"fy_mpa": 350, "e_mpa": 200000, "g_mpa": 77000},
        "length_mm": 12000, "axial_kn": 0, "method": "csa-s16"
    });
    member_with(base, extra)
}

#[test]
fn flange_compressed_long_tee_13_6_e() {
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": 20, "m_major_b_knm": 20,
            "material": {"fy_mpa": 350, "e_mpa": 210000, "g_mpa": 81000}})))
    .unwrap();
    assert_close(step_value(&r, "beta_x"), 129.5237, SCRIPT, "beta_x = 2 z_j");
    // M_u = 71.86581 kNm; phi M_p = 71.533192; M_u > 0.67 M_p: M_r =
    // 1.15 phi M_p (1 - 0.28 M_p / M_u) = 56.788637 kNm.
    assert_close(step_value(&r, "M_u"), 71.86581, SCRIPT, "M_u, 13.6(e)");
    let b = r.bending.unwrap();
    assert_close(b.major.resistance_knm, 56.788637, SCRIPT, "M_r, 13.6(a)");
    assert_close(
        b.major.moment_factor.unwrap(),
        1.0,
        0.0,
        "omega_2, uniform moment",
    );
}

#[test]
fn a_compressed_stem_is_refused_by_key() {
    let e = strutline_core::check_member(&tee(json!({"m_major_a_knm": 10,
        "m_major_b_knm": -5})))
    .unwrap_err()
    .to_string();
    assert!(e.contains("m_major_b_knm") && e.contains("stem"), "{e}");
}
