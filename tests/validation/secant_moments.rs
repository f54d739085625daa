//! Reference: the secant formula for a pin-ended strut whose load acts at
//! eccentricity e at both ends (equal end moments M = N e, single
//! curvature): sigma_max = N/A (1 + (e c / r^2) sec((L / 2r) sqrt(N /
//! (E A)))), T. Young (1807), as in S. P. Timoshenko and J. M. Gere, Theory
//! of Elastic Stability, 2nd ed. (McGraw-Hill, 1961), section 1.9. The
//! first-yield load N_R is the N at which sigma_max = f_y.
//!
//! The expected values were worked independently of the engine in a short
//! Python script: sigma_max as written above, N_R by plain bisection on
//! (0, min(A f_y, N_E)) to full double precision. Tolerance CLOSED_FORM:
//! two solutions of the same closed form by different root finders.
//!
//! The member is an invented 120 x 60 mm bar of a custom steel (f_y = 250
//! MPa, E = 200 000 MPa), 2000 mm long, pinned: A = 7200 mm2, r_z = 60 /
//! sqrt(12) = 17.3205 mm, c_z = 30 mm; r_y = 34.6410 mm, c_y = 60 mm.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::{json, Value};
use strutline_core::{check_member, Error, Member, Mode};
use strutline_validation::{assert_close, member_with};

/// Two root finders on the same closed form.
const CLOSED_FORM: f64 = 1e-9;

fn bar(n: f64, extra: Value) -> Member {
    let m = json!({
        "id": "S1",
        "section": {"kind": "rect", "depth_mm": 120.0, "width_mm": 60.0},
        "material": {"fy_mpa": 250.0, "e_mpa": 200000.0},
        "length_mm": 2000.0, "axial_kn": n, "method": "secant"
    });
    member_with(m, extra)
}

#[test]
fn equal_minor_moments_are_the_eccentricity() {
    // N = 100 kN, M_z = 0.3 kNm at both ends, eccentricity_mm = 3:
    // e = 3 + 0.3e6 / 100e3 = 6 mm about the minor axis. Python: N_R =
    // 648.98983085687 kN (sigma = 90.137 MPa, the hand root of
    // first_principles.rs), utilisation 100 / 648.98983 = 0.1540856192892401.
    // The major axis keeps e = 3 mm: N_R,y = 1444.8576762354141 kN.
    let r = check_member(&bar(
        100.0,
        json!({"eccentricity_mm": 3.0, "m_minor_a_knm": 0.3, "m_minor_b_knm": 0.3}),
    ))
    .unwrap();
    let minor = r.modes.iter().find(|m| m.mode == Mode::Minor).unwrap();
    let major = r.modes.iter().find(|m| m.mode == Mode::Major).unwrap();
    assert_close(
        minor.resistance_kn,
        648.98983085687,
        CLOSED_FORM,
        "N_R,z at e = 6 mm",
    );
    assert_close(
        major.resistance_kn,
        1444.8576762354141,
        CLOSED_FORM,
        "N_R,y at e = 3 mm",
    );
    assert_eq!(r.interaction.len(), 1);
    assert_eq!(r.interaction[0].check, "secant");
    assert_close(
        r.interaction[0].utilisation,
        0.1540856192892401,
        CLOSED_FORM,
        "N / N_R,z",
    );
    assert_eq!(r.governing_check, "secant");
    assert!(
        r.bending.is_none(),
        "the moments are the eccentricity, not bending"
    );
    assert!(r.passes);
}

#[test]
fn equal_major_moments_with_a_given_eccentricity() {
    // N = 200 kN, M_y = -1.0 kNm at both ends (the sign does not matter),
    // eccentricity_mm = 2 (L/1000) about each axis, plus 1.0e6 / 200e3
    // = 5 mm about the major axis: e_y = 7 mm. Python: N_R,y =
    // 1185.9762729600523 kN, secant check 200 / 1185.976 =
    // 0.1686374378307117; the minor axis at e = 2 mm, N_R,z =
    // 840.3726509601341 kN, governs the member at 0.2379896582444681.
    let r = check_member(&bar(
        200.0,
        json!({"m_major_a_knm": -1.0, "m_major_b_knm": -1.0, "eccentricity_mm": 2.0}),
    ))
    .unwrap();
    assert_close(
        r.interaction[0].utilisation,
        0.1686374378307117,
        CLOSED_FORM,
        "N / N_R,y",
    );
    assert_close(
        r.utilisation,
        0.2379896582444681,
        CLOSED_FORM,
        "N / N_R,z governs",
    );
    assert_eq!(r.governing_check, "minor");
    assert_eq!(r.governing, Mode::Minor);
}

#[test]
fn equal_major_moments_with_the_default_eccentricity() {
    // As above without eccentricity_mm: the default is L/200 = 10 mm about
    // each axis (EN 1993-1-1:2005 Table 5.1, equivalent bow for curve c in
    // an elastic analysis, 1/200, recalled from memory), plus 5 mm about
    // the major axis: e_y = 15 mm. Python (bisection of the secant
    // condition, 200 halvings): N_R,y = 900.3579977499611 kN, secant check
    // 200 / 900.358 = 0.22213386286322756; the minor axis at e = 10 mm,
    // N_R,z = 544.2944573374937 kN, governs at 0.36744816579307654.
    let r = check_member(&bar(
        200.0,
        json!({"m_major_a_knm": -1.0, "m_major_b_knm": -1.0}),
    ))
    .unwrap();
    assert_close(
        r.interaction[0].utilisation,
        0.22213386286322756,
        CLOSED_FORM,
        "N / N_R,y",
    );
    assert_close(
        r.utilisation,
        0.36744816579307654,
        CLOSED_FORM,
        "N / N_R,z governs",
    );
    assert_eq!(r.governing_check, "minor");
    assert!(r.warnings.iter().any(|w| w.code == "imperfection-default"));
}

#[test]
fn at_the_first_yield_load_the_extreme_fibre_yields() {
    // Closed form back-substituted: at N = N_R (utilisation 1) sigma_max =
    // f_y to the root's precision, about the moment's axis.
    let n = 648.98983085687;
    let r = check_member(&bar(
        n,
        json!({"eccentricity_mm": 0.0, "m_minor_a_knm": 6.0 * n / 1000.0,
               "m_minor_b_knm": 6.0 * n / 1000.0}),
    ))
    .unwrap();
    assert_close(
        r.interaction[0].utilisation,
        1.0,
        CLOSED_FORM,
        "N_R at e = 6 mm",
    );
    let (a, e, c, rz, l, modulus) = (7200.0, 6.0, 30.0, 60.0 / 12f64.sqrt(), 2000.0, 200_000.0);
    let theta: f64 = l / (2.0 * rz) * (n * 1000.0 / (modulus * a)).sqrt();
    #[allow(clippy::disallowed_methods)]
    let sec = 1.0 / theta.cos();
    let sigma_max = n * 1000.0 / a * (1.0 + e * c / (rz * rz) * sec);
    assert_close(sigma_max, 250.0, 1e-8, "sigma_max = f_y at N_R");
}

fn refusal(extra: Value, method: &str, n: f64) -> String {
    let mut m = bar(n, extra);
    m.method = serde_json::from_value(json!(method)).unwrap();
    match check_member(&m) {
        Err(e) => {
            let text = e.to_string();
            assert!(
                matches!(e, Error::InMember { .. } | Error::NotApplicable { .. }),
                "{text}"
            );
            text
        }
        Ok(r) => panic!("{method} with {m:?} must be refused, got {r:?}"),
    }
}

#[test]
fn other_moments_are_refused_naming_the_key() {
    let unequal = refusal(
        json!({"m_major_a_knm": 2.0, "m_major_b_knm": 1.0}),
        "secant",
        100.0,
    );
    assert!(unequal.contains("m_major_a_knm"), "{unequal}");
    let one_end = refusal(json!({"m_major_a_knm": 2.0}), "secant", 100.0);
    assert!(one_end.contains("m_major_b_knm"), "{one_end}");
    let span = refusal(json!({"m_minor_span_knm": 2.0}), "secant", 100.0);
    assert!(span.contains("m_minor_span_knm"), "{span}");
    let both = refusal(
        json!({"m_major_a_knm": 1.0, "m_major_b_knm": 1.0, "m_minor_b_knm": 1.0}),
        "secant",
        100.0,
    );
    assert!(both.contains("m_minor_b_knm"), "{both}");
    let beam = refusal(
        json!({"m_major_a_knm": 1.0, "m_major_b_knm": 1.0}),
        "secant",
        0.0,
    );
    assert!(
        beam.contains("m_major_a_knm") && beam.contains("axial_kn"),
        "{beam}"
    );
    for method in ["euler", "perry-robertson"] {
        let any = refusal(
            json!({"m_major_a_knm": 1.0, "m_major_b_knm": 1.0}),
            method,
            100.0,
        );
        assert!(any.contains("m_major_a_knm"), "{method}: {any}");
    }
}
