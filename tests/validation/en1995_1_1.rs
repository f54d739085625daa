//! Reference: EN 1995-1-1:2004 + A1:2008, Eurocode 5: Design of timber
//! structures — Part 1-1: General — Common rules and rules for buildings
//! (CEN, Brussels), clause 6.3.2 (columns subjected to compression, Eqs.
//! 6.21-6.29), Table 3.1 (k_mod), Table 2.3 (recommended gamma_M), with
//! the strength classes of EN 338:2016 Table 1 (C24: f_c,0,k = 21 MPa,
//! E_0,05 = 7400 MPa) and EN 14080:2013 Table 5 (GL24h: f_c,0,g,k = 24
//! MPa, E_0,g,05 = 9600 MPa). The class values are recalled from memory.
//!
//! The columns are invented and worked by hand (arithmetic checked on a
//! calculator).

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_core::{check_member, Member, Mode};
use strutline_validation::assert_close;

/// Hand working to five or six significant figures.
const HAND: f64 = 5e-5;

fn column(depth: f64, width: f64, grade: &str, length: f64) -> Member {
    serde_json::from_value(json!({
        "id": "T1",
        "section": {"kind": "rect", "depth_mm": depth, "width_mm": width},
        "material": {"grade": grade},
        "length_mm": length,
        "axial_kn": 40.0,
        "method": "en1995-1-1"
    }))
    .unwrap()
}

#[test]
fn c24_column_worked_by_hand() {
    // 150 x 100 C24, 3.0 m pinned, service class 1, medium-term (defaults).
    // f_c,0,d = k_mod f_c,0,k / gamma_M = 0.8 x 21 / 1.3 = 12.9231 MPa
    //   (Table 3.1 solid timber SC1 medium 0.8; Table 2.3 solid 1.3).
    // Minor: i = 100 / sqrt(12) = 28.8675 mm, lambda = 3000 / 28.8675 = 103.923;
    //   lambda_rel = 103.923 / pi x sqrt(21 / 7400) = 1.76220 (Eq. 6.22);
    //   k = 0.5 [1 + 0.2 (1.76220 - 0.3) + 1.76220^2] = 2.19889 (Eq. 6.28);
    //   k_c = 1 / (2.19889 + sqrt(2.19889^2 - 1.76220^2)) = 0.284566 (Eq. 6.26);
    //   N_Rd = 0.284566 x 12.9231 x 15 000 = 55 162 N = 55.162 kN.
    let r = check_member(&column(150.0, 100.0, "C24", 3000.0)).unwrap();
    let minor = r.modes.iter().find(|m| m.mode == Mode::Minor).unwrap();
    assert_close(minor.relative_slenderness, 1.76220, HAND, "lambda_rel,z");
    assert_close(minor.reduction, 0.284566, HAND, "k_c,z");
    assert_close(minor.resistance_kn, 55.162, HAND, "N_Rd,z");
    let fc0d = r.trace.iter().find(|s| s.symbol == "f_c,0,d").unwrap();
    assert_close(fc0d.value, 12.9231, HAND, "f_c,0,d");
    assert_eq!(r.governing, Mode::Minor);
    assert!(r.passes, "N_Ed = 40 kN < 55.2 kN");
}

#[test]
fn glulam_beta_c_worked_by_hand() {
    // 200 x 140 GL24h, 4.0 m pinned, defaults SC1 medium.
    // f_c,0,d = 0.8 x 24 / 1.25 = 15.36 MPa (Table 2.3 glulam 1.25).
    // Minor: i = 140 / sqrt(12) = 40.4145 mm, lambda = 98.9743;
    //   lambda_rel = 98.9743 / pi x sqrt(24 / 9600) = 1.57523;
    //   beta_c = 0.1 (Eq. 6.29, glued laminated timber);
    //   k = 0.5 [1 + 0.1 (1.27523) + 1.57523^2] = 1.80441;
    //   k_c = 1 / (1.80441 + sqrt(1.80441^2 - 1.57523^2)) = 0.372501;
    //   N_Rd = 0.372501 x 15.36 x 28 000 = 160 205 N = 160.205 kN.
    let r = check_member(&column(200.0, 140.0, "GL24h", 4000.0)).unwrap();
    let minor = r.modes.iter().find(|m| m.mode == Mode::Minor).unwrap();
    assert_close(minor.relative_slenderness, 1.57523, HAND, "lambda_rel,z");
    assert_close(minor.reduction, 0.372501, HAND, "k_c,z glulam");
    assert_close(minor.resistance_kn, 160.205, HAND, "N_Rd,z glulam");
    let beta = r.trace.iter().find(|s| s.symbol == "beta_c").unwrap();
    assert_eq!(beta.value, 0.1);
}

#[test]
fn stocky_plateau_and_k_mod() {
    // lambda_rel <= 0.3: k_c = 1 (6.3.2(2)). 150 x 150 C24 at 0.5 m:
    // lambda = 500 / 43.30 = 11.55, lambda_rel = 0.196.
    // Short-term load, service class 3: k_mod = 0.70 (Table 3.1), so
    // N_Rd = 0.70 x 21 / 1.3 x 22 500 = 254.42 kN.
    let mut m = column(150.0, 150.0, "C24", 500.0);
    m.service_class = Some(3);
    m.load_duration = serde_json::from_value(json!("short")).unwrap();
    let r = check_member(&m).unwrap();
    for mode in &r.modes {
        assert_eq!(mode.reduction, 1.0);
    }
    assert_close(
        r.resistance_kn,
        254.423,
        HAND,
        "N_Rd stocky, k_mod SC3 short",
    );
}

#[test]
fn refuses_steel() {
    let e = check_member(&column(150.0, 100.0, "S355", 3000.0)).unwrap_err();
    assert_eq!(e.field(), Some("method"));
}

#[test]
fn defaults_of_table_3_1_are_said() {
    // Table 3.1 (solid timber): service classes 1 and 2, medium-term: k_mod = 0.80;
    // permanent, service class 3: 0.50. The member file's defaults (service
    // class 1, medium-term) are not the lowest, so the result names them.
    let r = check_member(&column(150.0, 100.0, "C24", 3000.0)).unwrap();
    let w = r
        .warnings
        .iter()
        .find(|w| w.code == "timber-defaults-assumed")
        .unwrap();
    assert!(
        w.message().contains("0.80") && w.message().contains("medium-term"),
        "{}",
        w.message()
    );
    // Both given: nothing assumed.
    let mut m = column(150.0, 100.0, "C24", 3000.0);
    m.service_class = Some(1);
    m.load_duration = serde_json::from_value(json!("medium")).unwrap();
    let r = check_member(&m).unwrap();
    assert!(r
        .warnings
        .iter()
        .all(|w| w.code != "timber-defaults-assumed"));
}
