//! EN 1993-1-1 bending of tees, against values worked independently from
//! the plate dimensions (tests/validation/bending_review/rederive.py, numpy
//! and scipy from PyPI: nothing there is read from the engine).
//!
//! Sources: EN 1993-1-1:2005 (+AC:2009), *Eurocode 3: Design of steel
//! structures, Part 1-1*: Table 5.2 sheet 2 (outstand flanges, with alpha
//! and k_sigma), 6.2.5 (Eqs. 6.13, 6.14), 6.3.2.1 (Eq. 6.55), 6.3.2.2 (Eq.
//! 6.56, Table 6.3 and 6.4: curve d, alpha_LT = 0.76). EN 1993-1-5:2006
//! Table 4.2 (k_sigma of outstands: 0.57 - 0.21 psi + 0.07 psi^2 with the
//! free edge most compressed; recalled from memory). ENV 1993-1-1:1992
//! Annex F, Eq. F.2 (the three-factor M_cr of a monosymmetric section, z_j =
//! z_s - (1/2 I_y) int z (y^2 + z^2) dA) and Table F.1.2 (C1 = 1.132, C2 =
//! 0.459 for a uniform load on a simple span; recalled from memory). The
//! closed form for uniform moment, M_cr = P_z [z_j + sqrt(z_j^2 + I_w/I_z +
//! G I_t / P_z)], P_z = pi^2 E I_z / L^2 (Trahair, *Flexural-Torsional
//! Buckling of Structures*, E & FN Spon, 1993, ch. 6, with beta_x = 2 z_j),
//! which the script's Rayleigh-Ritz energy solution reproduces to 1e-8.
//!
//! The tee: 200 x 200 x 15 x 12 mm of plates (no root radius), f_y = 235
//! MPa, E = 210 000 MPa, G = 81 000 MPa, L = 4000 mm, fork ends. Plate sums:
//! A = 5220 mm2, z_c = 149.971 mm from the stem tip, I_y = 19 146 496 mm4,
//! I_z = 10 026 640 mm4, W_el,min = 127 667.76 mm3, W_pl = 227 089.5 mm3,
//! z_j = 64.7619 mm (flange compressed), I_t = 326 810.56 mm4 (Roark's
//! rectangles with the El Darwish & Johnston junction term), I_w =
//! 5.2990e8 mm6 (AISC Design Guide 9). Tolerance SCRIPT = 1e-4: the engine
//! integrates the same plates; the script prints 8 significant figures.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_validation::{assert_close, member_with, step_value};

/// Same plates, same formulas: the script's 8 printed figures.
const SCRIPT: f64 = 1e-4;

fn tee(extra: serde_json::Value) -> strutline_core::Member {
    let base = json!({
        "id": "T1", "section": {"kind": "tee", "depth_mm": 200, "width_mm": 200,
            "flange_mm": 15, "web_mm": 12},
        "material": {"fy_mpa": 235, "e_mpa": 210000, "g_mpa": 81000},
        "length_mm": 4000, "axial_kn": 0, "method": "en1993-1-1"
    });
    member_with(base, extra)
}

#[test]
fn flange_compressed_uniform_moment_is_class_1_with_the_wagner_benefit() {
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": 20, "m_major_b_knm": 20})))
        .unwrap();
    // Table 5.2: flange c/t = 94/15 = 6.27 <= 9 eps; PNA in the flange, the
    // stem wholly in tension: Class 1, W_pl.
    assert_eq!(step_value(&r, "class+"), 1.0);
    assert_close(step_value(&r, "W+"), 227_089.5, SCRIPT, "W_pl, 6.2.5(2)");
    assert_close(
        step_value(&r, "M_c,Rd+"),
        53.366033,
        SCRIPT,
        "M_c,Rd, Eq. 6.13",
    );
    assert_close(step_value(&r, "z_j"), 64.761851, SCRIPT, "z_j, ENV Annex F");
    // Uniform moment: C1 = C3 = 1, exact: M_cr = 287.9455 kNm.
    assert_close(step_value(&r, "M_cr+"), 287.9455, SCRIPT, "M_cr, Eq. F.2");
    assert_close(
        step_value(&r, "chi_LT+"),
        0.828526,
        SCRIPT,
        "chi_LT, curve d",
    );
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        44.215132,
        SCRIPT,
        "M_b,Rd, Eq. 6.55",
    );
    assert_close(
        b.major.critical_knm.unwrap(),
        287.9455,
        SCRIPT,
        "M_cr reported",
    );
    assert!(r.warnings.iter().any(|w| w.code == "tee-moment-sign"));
    assert!(r.warnings.iter().any(|w| w.code == "tee-ltb-assumed"));
}

#[test]
fn stem_compressed_uniform_moment_is_class_3_and_lower() {
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": -10, "m_major_b_knm": -10})))
        .unwrap();
    // Stem tip compressed: c/t = 185/12 = 15.42; psi = (z_c - c)/z_c =
    // -0.23357, k_sigma = 0.6229, Class 3 limit 21 eps sqrt(k_sigma) = 16.57;
    // alpha = 1 so Class 2 ends at 10 eps: Class 3, W_el,min.
    assert_close(step_value(&r, "psi-"), -0.23357, 1e-3, "psi, Table 4.2");
    assert_close(
        step_value(&r, "k_sigma-"),
        0.622868,
        SCRIPT,
        "k_sigma, Table 4.2",
    );
    assert_eq!(step_value(&r, "class-"), 3.0);
    assert_close(step_value(&r, "W-"), 127_667.76, SCRIPT, "W_el,min");
    // z_j changes sign with the stem compressed: M_cr = 119.71539 kNm.
    assert_close(step_value(&r, "M_cr-"), 119.71539, SCRIPT, "M_cr, Eq. F.2");
    let b = r.bending.unwrap();
    assert_close(b.major.resistance_knm, 23.368247, SCRIPT, "M_b,Rd");
    assert_close(
        b.major.utilisation(),
        10.0 / 23.368247,
        SCRIPT,
        "utilisation",
    );
}

#[test]
fn a_reversing_diagram_takes_the_stem_compressed_critical_moment_for_both_signs() {
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": 20, "m_major_b_knm": -10})))
        .unwrap();
    assert_close(
        step_value(&r, "M_cr+"),
        119.71539,
        SCRIPT,
        "M_cr, the worse case",
    );
    assert_close(
        step_value(&r, "M_b,Rd+"),
        35.459076,
        SCRIPT,
        "M_b,Rd, flange compressed",
    );
    assert_close(
        step_value(&r, "M_b,Rd-"),
        23.368247,
        SCRIPT,
        "M_b,Rd, stem compressed",
    );
    // 20 / 35.459 = 0.5640 > 10 / 23.368 = 0.4279: the positive sign governs.
    assert_close(
        r.bending.unwrap().major.utilisation(),
        0.56403049,
        SCRIPT,
        "utilisation",
    );
}

#[test]
fn end_moments_with_the_flange_compressed_take_the_larger_safe_reading() {
    // psi = 0: C1 = 1.88 with C3 = 0 gives 349.05 kNm, above the uniform
    // reading 287.95 (both below the energy solution, 525.39 kNm).
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": 30}))).unwrap();
    assert_close(step_value(&r, "M_cr+"), 349.05028, SCRIPT, "M_cr, Eq. F.2");
    let b = r.bending.unwrap();
    assert_close(b.major.resistance_knm, 45.727184, SCRIPT, "M_b,Rd");
    assert_close(b.major.moment_factor.unwrap(), 1.88, 1e-12, "C1");
}

#[test]
fn uniform_load_on_the_compressed_flange() {
    // C1 = 1.132, C2 = 0.459 (Table F.1.2), C3 = 0, z_g = t_f/2 = 7.5 mm.
    let r = strutline_core::check_member(&tee(
        json!({"m_major_span_knm": 20, "load_level": "compression-flange"}),
    ))
    .unwrap();
    assert_close(step_value(&r, "M_cr+"), 205.17231, SCRIPT, "M_cr, Eq. F.2");
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        41.214793,
        SCRIPT,
        "M_b,Rd",
    );
}

#[test]
fn point_load_hogging_on_the_stem_tip() {
    // The stem compressed: C1 = C3 = 1, C2 = 0.553, z_g = h - t_f/2 = 192.5.
    let r = strutline_core::check_member(&tee(json!({"m_major_span_knm": -10,
        "span_load_major": "point", "load_level": "compression-flange"})))
    .unwrap();
    assert_close(step_value(&r, "M_cr-"), 67.317163, SCRIPT, "M_cr, Eq. F.2");
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        19.936191,
        SCRIPT,
        "M_b,Rd",
    );
}

#[test]
fn short_and_restrained_tees() {
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": -10,
        "m_major_b_knm": -10, "length_mm": 1500})))
    .unwrap();
    assert_close(step_value(&r, "M_cr-"), 180.81598, SCRIPT, "M_cr, L = 1500");
    assert_close(
        r.bending.unwrap().major.resistance_knm,
        25.354926,
        SCRIPT,
        "M_b,Rd",
    );
    let r = strutline_core::check_member(&tee(json!({"m_major_a_knm": -10,
        "m_major_b_knm": -10, "lt_restrained": true})))
    .unwrap();
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        30.001924,
        SCRIPT,
        "M_c,Rd = W_el f_y",
    );
    assert!(b.major.critical_knm.is_none());
}

#[test]
fn about_the_axis_of_symmetry_no_lateral_torsional_buckling() {
    // Minor axis (z-z): flange outstands Class 1; W_pl,z = t_f b^2/4 +
    // (h - t_f) t_w^2/4 = 156 660 mm3, M_c,Rd = 36.8151 kNm; no LTB.
    let r = strutline_core::check_member(&tee(json!({"m_minor_a_knm": 5}))).unwrap();
    let b = r.bending.unwrap();
    assert_close(
        b.minor.resistance_knm,
        156_660.0 * 235.0 / 1e6,
        1e-6,
        "M_c,Rd about z-z",
    );
    assert!(b.minor.critical_knm.is_none());
}

#[test]
fn a_slender_stem_in_compression_is_refused_by_key() {
    // 300 x 200 x 16 x 8, S355: the stem's c/t = 35.5 is Class 4 with its tip
    // compressed; a negative moment is refused naming its key, a positive one
    // is worked (flange compressed).
    let slender = json!({"kind": "tee", "depth_mm": 300, "width_mm": 200,
        "flange_mm": 16, "web_mm": 8});
    let m = tee(
        json!({"section": slender, "material": {"fy_mpa": 355, "e_mpa": 210000,
        "g_mpa": 81000}, "m_major_b_knm": -10}),
    );
    let e = strutline_core::check_member(&m).unwrap_err().to_string();
    assert!(e.contains("m_major_b_knm") && e.contains("Class 4"), "{e}");
    let m = tee(
        json!({"section": slender, "material": {"fy_mpa": 355, "e_mpa": 210000,
        "g_mpa": 81000}, "m_major_b_knm": 10}),
    );
    assert!(strutline_core::check_member(&m).is_ok());
}

#[test]
fn tees_with_axial_load_and_moments_are_refused() {
    let e = strutline_core::check_member(&tee(json!({"axial_kn": 50, "m_major_a_knm": 5})))
        .unwrap_err()
        .to_string();
    assert!(e.contains("axial_kn") && e.contains("tee"), "{e}");
}

#[test]
fn a_wide_tee_about_its_axis_of_symmetry_buckles_laterally_without_monosymmetry() {
    // 100 x 200 x 10 x 8: I_z = 6 670 506.7 > I_y = 1 826 196.1 mm4, so the
    // axis of symmetry (z-z) is the major principal axis. Flange c/t = 9.6:
    // Class 2, W_pl,z = 101 440 mm3, M_c,Rd = 23.8384 kNm; L = 3000, uniform
    // moment, z_j = 0 by symmetry: M_cr = 52.619815 kNm, chi_LT = 0.660861
    // (curve d), M_b,Rd = 15.753863 kNm (rederive.py, wide_tee).
    let wide = json!({"kind": "tee", "depth_mm": 100, "width_mm": 200, "flange_mm": 10,
        "web_mm": 8});
    let r = strutline_core::check_member(&tee(json!({"section": wide, "length_mm": 3000,
        "m_major_a_knm": 10, "m_major_b_knm": 10})))
    .unwrap();
    assert_close(step_value(&r, "M_cr"), 52.619815, SCRIPT, "M_cr, z_j = 0");
    let b = r.bending.unwrap();
    assert_close(
        b.major.resistance_knm,
        15.753863,
        SCRIPT,
        "M_b,Rd, Eq. 6.55",
    );
    assert!(r.warnings.iter().any(|w| w.code == "tee-symmetry-axis-ltb"));
    // Its in-plane axis (y-y) is the minor one: no lateral-torsional
    // buckling, each sign its own class.
    assert!(b.minor.critical_knm.is_none());
}
