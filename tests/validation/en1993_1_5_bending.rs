//! EN 1993-1-1 Class 4 bending through the effective section of EN 1993-1-5,
//! against values worked independently from the plate dimensions
//! (tests/validation/bending_review/rederive.py, numpy from PyPI).
//!
//! Sources: EN 1993-1-5:2006 (+AC:2009), *Eurocode 3: Design of steel
//! structures, Part 1-5: Plated structural elements*: 4.3, 4.4(2) (lambda_p
//! = (b_bar/t)/(28.4 eps sqrt(k_sigma))), Eq. 4.2 (internal parts, rho =
//! (lambda_p - 0.055 (3 + psi))/lambda_p^2 beyond 0.5 + sqrt(0.085 - 0.055
//! psi)), Eq. 4.3 (outstands, (lambda_p - 0.188)/lambda_p^2 beyond 0.748),
//! Table 4.1 (k_sigma = 7.81 - 6.29 psi + 9.78 psi^2 for 0 > psi > -1; b_e1
//! = 0.4 b_eff, b_e2 = 0.6 b_eff of b_c = b_bar/(1 - psi)), Table 4.2
//! (k_sigma = 0.43), 4.4(3) (the web's psi from the section with the
//! effective compression flange: one step). EN 1993-1-1:2005 6.2.5(2) Eq.
//! 6.15 (M_c,Rd = W_eff,min f_y / gamma_M0), 6.3.2.1 (W_y = W_eff,y),
//! 6.3.2.3 (lambda_LT,0 = 0.4, beta = 0.75, welded h/b > 2: curve d).
//! Tables 4.1 and 4.2 recalled from memory.
//!
//! Sections of plates (no root radius, sharp corners), so the gross
//! properties are exact rectangle sums in both the engine and the script.
//! Tolerance SCRIPT = 1e-5 (the script's 8 printed figures, the same
//! rectangles).

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_validation::{assert_close, member_with, step_value};

/// Same rectangles: the script's printed figures.
const SCRIPT: f64 = 1e-5;

fn member(section: serde_json::Value, extra: serde_json::Value) -> strutline_core::Member {
    let base = json!({
        "id": "G1", "section": section,
        "material": {"fy_mpa": 355, "e_mpa": 210000, "g_mpa": 81000},
        "length_mm": 3000, "axial_kn": 0, "method": "en1993-1-1"
    });
    member_with(base, extra)
}

fn girder() -> serde_json::Value {
    json!({"kind": "i", "depth_mm": 600, "width_mm": 200, "flange_mm": 8, "web_mm": 4,
        "make": "welded"})
}

fn rhs() -> serde_json::Value {
    json!({"kind": "rhs", "depth_mm": 300, "width_mm": 200, "wall_mm": 4,
        "outer_radius_mm": 0, "inner_radius_mm": 0})
}

#[test]
fn slender_welded_girder_effective_modulus() {
    // 600 x 200 x 8 x 4, f_y 355: flange c/t = 12.25 > 14 eps = 11.39 and
    // web c/t = 146 > 124 eps = 100.9: Class 4.
    let r = strutline_core::check_member(&member(
        girder(),
        json!({"m_major_a_knm": 300, "m_major_b_knm": 300, "lt_restrained": true}),
    ))
    .unwrap();
    // Flange: lambda_p = 0.80847, rho = 0.949277 (Eq. 4.3).
    assert_close(
        step_value(&r, "lambda_p,f"),
        0.80847,
        1e-4,
        "lambda_p, 4.4(2)",
    );
    assert_close(step_value(&r, "rho_f"), 0.949277, SCRIPT, "rho, Eq. 4.3");
    // Web with the effective flange: psi = -0.970879, k_sigma = 23.1355,
    // lambda_p = 1.31364, rho = 0.696573.
    assert_close(step_value(&r, "psi_w"), -0.970879, SCRIPT, "psi, 4.4(3)");
    assert_close(
        step_value(&r, "k_sigma,w"),
        23.1355,
        SCRIPT,
        "k_sigma, Table 4.1",
    );
    assert_close(step_value(&r, "rho_w"), 0.696573, SCRIPT, "rho, Eq. 4.2");
    // W_eff,min = 1 038 809.8 mm3 (gross W_el 1 155 935), M_c,Rd = 368.77748 kNm.
    assert_close(step_value(&r, "W_eff"), 1_038_809.8, SCRIPT, "W_eff,min");
    assert_close(step_value(&r, "I_eff"), 3.2849772e8, SCRIPT, "I_eff");
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        368.77748,
        SCRIPT,
        "M_c,Rd, Eq. 6.15",
    );
}

#[test]
fn slender_welded_girder_lateral_torsional_buckling_with_w_eff() {
    // L = 3000, uniform moment: M_cr = 738.11817 kNm, lambda_LT =
    // sqrt(W_eff f_y / M_cr) = 0.706837, chi_LT = 0.754639 (curve d, 6.3.2.3).
    let r = strutline_core::check_member(&member(
        girder(),
        json!({"m_major_a_knm": 200, "m_major_b_knm": 200}),
    ))
    .unwrap();
    assert_close(
        step_value(&r, "M_cr"),
        738.11817,
        SCRIPT,
        "M_cr, uniform moment",
    );
    assert_close(
        step_value(&r, "lambda_bar_LT"),
        0.706837,
        SCRIPT,
        "lambda_LT, Eq. 6.56",
    );
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        278.29405,
        SCRIPT,
        "M_b,Rd, Eq. 6.55",
    );
}

#[test]
fn slender_rhs_about_either_axis() {
    // 300 x 200 x 4 (sharp), f_y 355, about the major axis: the 200 flange,
    // b_bar/t = 47, lambda_p = 1.01702, rho = 0.770566; the webs stay fully
    // effective (rho 1 at lambda_p 0.669943, psi -0.910005).
    let r = strutline_core::check_member(&member(
        rhs(),
        json!({"m_major_a_knm": 50, "lt_restrained": true}),
    ))
    .unwrap();
    assert_close(
        step_value(&r, "rho_f"),
        0.770566,
        SCRIPT,
        "rho, Eq. 4.2, psi = 1",
    );
    assert_close(step_value(&r, "rho_w"), 1.0, 0.0, "web fully effective");
    assert_close(step_value(&r, "W_eff"), 304_199.54, SCRIPT, "W_eff,min");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        107.99084,
        SCRIPT,
        "M_c,Rd, Eq. 6.15",
    );
    // About the minor axis the 300 wall is the compression flange: b_bar/t =
    // 72, rho = 0.551218; W_eff,min = 192 082.29 mm3, M_c,Rd = 68.189213 kNm.
    let r = strutline_core::check_member(&member(rhs(), json!({"m_minor_a_knm": 20}))).unwrap();
    assert_close(
        r.bending.unwrap().minor.resistance_knm,
        68.189213,
        SCRIPT,
        "M_c,Rd about the minor axis",
    );
}

#[test]
fn class_4_sections_not_covered_are_refused_by_key() {
    // A slender channel: no effective section worked for it.
    let channel = json!({"kind": "channel", "depth_mm": 600, "width_mm": 100,
        "flange_mm": 6, "web_mm": 4});
    let e = strutline_core::check_member(&member(channel, json!({"m_major_a_knm": 10})))
        .unwrap_err()
        .to_string();
    assert!(e.contains("m_major_a_knm") && e.contains("Class 4"), "{e}");
}

#[test]
fn the_beam_column_check_takes_the_same_w_eff() {
    // EN 1993-1-1 Table 6.7 / 6.2.2.5: W_eff of the section under the moment
    // alone; with axial load the interaction reads the bending check's.
    let r = strutline_core::check_member(&member(
        girder(),
        json!({"axial_kn": 50, "m_major_a_knm": 100, "m_major_b_knm": 100,
            "lt_restrained": true}),
    ))
    .unwrap();
    let w = r
        .trace
        .iter()
        .find(|s| s.symbol == "W_eff,y")
        .map(|s| s.value)
        .expect("W_eff,y in the interaction's working");
    assert_close(w, 1_038_809.8, SCRIPT, "W_eff,y, Table 6.7");
}
