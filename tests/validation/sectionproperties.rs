//! Section properties against the open-source finite-element library
//! `sectionproperties` 3.10.2 (R. van Leeuwen et al., PyPI package
//! `sectionproperties`, https://pypi.org/project/sectionproperties/,
//! geometric, plastic and warping analyses of arbitrary cross-sections on
//! a quadratic triangular mesh).
//!
//! The reference values were computed by
//! `tests/validation/sectionproperties/generate.py` with the library's
//! own steel-section builders (`i_section`, `rectangular_hollow_section`,
//! `circular_hollow_section`, `angle_section`, `channel_section`,
//! `tee_section`, `rectangular_section`) and committed as `values.json`,
//! so this test needs no Python. Each case carries the member-file spec we
//! rebuild it from. All dimensions are invented test cases in mm.
//!
//! Tolerances (relative unless stated), with their reasons:
//! - `GEOMETRIC` 2e-4 for area, centroid, second moments, principal values
//!   and elastic moduli: both sides are exact for the same shape; the
//!   library draws arcs as 32-point polygons (512 for the CHS) whose
//!   chords change these by under 1e-4.
//! - `PLASTIC` 1e-3 for plastic moduli: ours are exact (or, for angles,
//!   from an 8-chord-per-quarter outline); the library's come from its
//!   polygon and an iterative neutral-axis search.
//! - Torsion constant I_t and warping constant I_w: our values are the
//!   published approximations named in `core/src/section/shapes/*.rs`; the
//!   library's come from a finite-element solution of the warping
//!   function. The per-family tolerance is stated in [`approximations`]
//!   next to the formula it covers.
//! - Shear centre: within 1.5 % of the largest overall dimension (2.5 %
//!   for angles), since our open-section values are the centre-line
//!   (thin-walled) positions.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::Value;
use strutline_core::section::{shapes, Properties, SectionSpec};

const VALUES: &str = include_str!("sectionproperties/values.json");

/// Exact geometry on both sides; arcs as fine polygons in the library.
const GEOMETRIC: f64 = 2e-4;
/// Plastic moduli: exact here, polygon and iterative search in the library.
const PLASTIC: f64 = 1e-3;
/// Shear-centre position, as a fraction of the largest overall dimension.
const SHEAR_CENTRE: f64 = 0.015;
/// The same for angles: the centre-line intersection (t/2, t/2) is the
/// position design practice uses, but for thick unequal legs the FE shear
/// centre lies up to 2 % of the long leg further along it (4.1 mm for the
/// 200x100x15 angle).
const SHEAR_CENTRE_ANGLE: f64 = 0.025;

/// Tolerances on (I_t, I_w) for each family, with the formula they cover.
fn approximations(spec: &SectionSpec) -> (f64, f64, &'static str) {
    match spec {
        // El Darwish & Johnston (AISC DG9 form) for I_t; I_z (h - tf)²/4
        // for I_w, which ignores the web and sits 2-3 % above the FE value.
        SectionSpec::I(_) => (0.02, 0.04, "El Darwish & Johnston; Iz (h - tf)^2 / 4"),
        // EN 10219-2 Annex B for I_t (a thin-walled Bredt formula, within
        // about 2 % for t/b <= 0.08). The thin-walled box formula for I_w
        // ignores wall thickness and corners: 1-3 % low for b/h = 2 but
        // 19 % low for the 150x100x8 tube. A closed section's warping
        // constant is of no practical weight: for that tube
        // √(E I_w / (G I_t)) = 13 mm, so beyond 1 m length the warping term
        // changes its torsional buckling load by under 0.02 %.
        SectionSpec::Rhs(_) => (0.03, 0.25, "EN 10219-2 Annex B; thin-walled box"),
        // Exact closed forms (the FE mesh converges to 0.1 %); I_w = 0.
        SectionSpec::Chs(_) => (2e-3, 0.0, "exact"),
        // Roark's L section for I_t; DG9's thin-walled I_w, which neglects
        // the fillets and overestimates by up to 10 % for thick legs.
        SectionSpec::Angle(_) => (0.05, 0.10, "Roark Table 10.7 L; DG9 t^3 (b'^3 + h'^3)/36"),
        // Flanges and web with Roark's L-junction terms for I_t; the
        // thin-walled centre-line I_w.
        SectionSpec::Channel(_) => (0.05, 0.05, "Roark L-junctions; thin-walled Iw"),
        // Roark's T rectangles with El Darwish & Johnston's junction term
        // for I_t (0.2 % here, allow for other proportions); DG9's
        // thin-walled I_w (1-3 % here).
        SectionSpec::Tee(_) => (0.03, 0.05, "Roark T + El Darwish junction; DG9 Iw"),
        // Exact: I_t = π d⁴/32, no warping.
        SectionSpec::Round(_) => (2e-3, 0.0, "exact"),
        // Exact series for I_t; I_w is taken as 0 for solids (not compared).
        SectionSpec::Rect(_) => (2e-3, f64::NAN, "Timoshenko & Goodier series"),
        _ => (f64::NAN, f64::NAN, "not compared"),
    }
}

fn rel(actual: f64, expected: f64) -> f64 {
    if expected == 0.0 {
        actual.abs()
    } else {
        ((actual - expected) / expected).abs()
    }
}

struct Checker {
    name: String,
    failures: Vec<String>,
}

impl Checker {
    fn check(&mut self, what: &str, actual: f64, expected: f64, tol: f64) {
        let r = rel(actual, expected);
        println!(
            "{:<58} {:<16} ours {:>14.6e} ref {:>14.6e} rel {:>9.2e} tol {:.1e}",
            self.name, what, actual, expected, r, tol
        );
        if r.is_nan() || r > tol {
            self.failures.push(format!(
                "{}: {what}: ours {actual}, sectionproperties {expected}, relative {r:.3e} > {tol:.1e}",
                self.name
            ));
        }
    }

    fn check_abs(&mut self, what: &str, actual: f64, expected: f64, tol: f64) {
        let d = (actual - expected).abs();
        println!(
            "{:<58} {:<16} ours {:>14.6} ref {:>14.6} diff {:>9.3} tol {:.3}",
            self.name, what, actual, expected, d, tol
        );
        if d.is_nan() || d > tol {
            self.failures.push(format!(
                "{}: {what}: ours {actual}, sectionproperties {expected}, |diff| {d:.4} > {tol:.4} mm",
                self.name
            ));
        }
    }
}

fn num(case: &Value, key: &str) -> f64 {
    case[key]
        .as_f64()
        .unwrap_or_else(|| panic!("{key} missing in values.json"))
}

/// The property about the geometric axis y or z: for shapes symmetric
/// about y or z the principal axes are y and z in some order.
fn about_y_z(p: &Properties) -> ((f64, f64), (f64, f64)) {
    if p.principal_angle_rad == 0.0 {
        (
            (p.w_el_major_mm3, p.w_pl_major_mm3),
            (p.w_el_minor_mm3, p.w_pl_minor_mm3),
        )
    } else {
        (
            (p.w_el_minor_mm3, p.w_pl_minor_mm3),
            (p.w_el_major_mm3, p.w_pl_major_mm3),
        )
    }
}

#[test]
fn every_case_matches_sectionproperties() {
    let doc: Value = serde_json::from_str(VALUES).unwrap();
    assert_eq!(doc["library"], "sectionproperties");
    assert_eq!(doc["version"], "3.10.2");
    let cases = doc["cases"].as_array().unwrap();
    assert!(cases.len() >= 10, "expected at least 10 reference cases");
    let mut all_failures = Vec::new();
    for case in cases {
        let spec: SectionSpec = serde_json::from_value(case["spec"].clone()).unwrap();
        let p = shapes::properties(&spec).unwrap();
        let mut c = Checker {
            name: case["name"].as_str().unwrap().to_string(),
            failures: Vec::new(),
        };
        let size = p_size(&spec);
        c.check("area", p.area_mm2, num(case, "area_mm2"), GEOMETRIC);
        c.check_abs(
            "centroid y",
            p.centroid_y_mm,
            num(case, "centroid_y_mm"),
            GEOMETRIC * size,
        );
        c.check_abs(
            "centroid z",
            p.centroid_z_mm,
            num(case, "centroid_z_mm"),
            GEOMETRIC * size,
        );
        c.check("I_y", p.i_y_mm4, num(case, "i_y_mm4"), GEOMETRIC);
        c.check("I_z", p.i_z_mm4, num(case, "i_z_mm4"), GEOMETRIC);
        let i_scale = (p.i_y_mm4 * p.i_z_mm4).sqrt();
        c.check_abs(
            "I_yz / sqrt(IyIz)",
            p.i_yz_mm4 / i_scale,
            num(case, "i_yz_mm4") / i_scale,
            GEOMETRIC,
        );
        c.check("I_major", p.i_major_mm4, num(case, "i_11_mm4"), GEOMETRIC);
        c.check("I_minor", p.i_minor_mm4, num(case, "i_22_mm4"), GEOMETRIC);
        // The library's 11 axis is the major one; angles are equal modulo π.
        let phi = num(case, "phi_deg").to_radians();
        let d = (p.principal_angle_rad - phi).rem_euclid(std::f64::consts::PI);
        let d = d.min(std::f64::consts::PI - d);
        if p.i_major_mm4 > p.i_minor_mm4 * (1.0 + 1e-9) {
            c.check_abs("principal angle", d, 0.0, 1e-4);
        }
        if let SectionSpec::Angle(_) = spec {
            c.check(
                "W_el major",
                p.w_el_major_mm3,
                num(case, "w_el_11_mm3"),
                GEOMETRIC,
            );
            c.check(
                "W_el minor",
                p.w_el_minor_mm3,
                num(case, "w_el_22_mm3"),
                GEOMETRIC,
            );
            c.check(
                "W_pl major",
                p.w_pl_major_mm3,
                num(case, "w_pl_11_mm3"),
                PLASTIC,
            );
            c.check(
                "W_pl minor",
                p.w_pl_minor_mm3,
                num(case, "w_pl_22_mm3"),
                PLASTIC,
            );
        } else {
            let ((wel_y, wpl_y), (wel_z, wpl_z)) = about_y_z(&p);
            c.check("W_el y", wel_y, num(case, "w_el_y_mm3"), GEOMETRIC);
            c.check("W_el z", wel_z, num(case, "w_el_z_mm3"), GEOMETRIC);
            c.check("W_pl y", wpl_y, num(case, "w_pl_y_mm3"), PLASTIC);
            c.check("W_pl z", wpl_z, num(case, "w_pl_z_mm3"), PLASTIC);
        }
        let (it_tol, iw_tol, _formula) = approximations(&spec);
        if it_tol.is_finite() {
            c.check("I_t", p.torsion_mm4, num(case, "torsion_mm4"), it_tol);
        }
        if iw_tol.is_finite() {
            if iw_tol == 0.0 {
                // Closed tube: no warping; the library's value is round-off.
                assert_eq!(p.warping_mm6, 0.0);
                assert!(num(case, "warping_mm6").abs() < 1e-6 * p.torsion_mm4);
            } else if matches!(&spec, SectionSpec::Rhs(r) if r.depth_mm == r.width_mm) {
                // Square tube: the thin-walled I_w is 0; the FE value comes
                // from the wall thickness alone. Its warping length
                // √(E I_w / (G I_t)) (E/G = 2.6) must be negligible, under
                // 2 % of the side.
                assert_eq!(p.warping_mm6, 0.0);
                let side = p_size(&spec);
                let length = (2.6 * num(case, "warping_mm6") / num(case, "torsion_mm4")).sqrt();
                c.check_abs("I_w length", length, 0.0, 0.02 * side);
            } else {
                c.check("I_w", p.warping_mm6, num(case, "warping_mm6"), iw_tol);
            }
        }
        // Shear centre: rebuild its position from the principal components.
        let (s, co) = p.principal_angle_rad.sin_cos();
        let (du, dv) = (p.shear_centre_major_mm, p.shear_centre_minor_mm);
        let sc_y = p.centroid_y_mm + du * co - dv * s;
        let sc_z = p.centroid_z_mm + du * s + dv * co;
        let sc_tol = if matches!(spec, SectionSpec::Angle(_)) {
            SHEAR_CENTRE_ANGLE
        } else {
            SHEAR_CENTRE
        };
        c.check_abs(
            "shear centre y",
            sc_y,
            num(case, "shear_centre_y_mm"),
            sc_tol * size,
        );
        c.check_abs(
            "shear centre z",
            sc_z,
            num(case, "shear_centre_z_mm"),
            sc_tol * size,
        );
        all_failures.extend(c.failures);
    }
    assert!(
        all_failures.is_empty(),
        "{} mismatches:\n{}",
        all_failures.len(),
        all_failures.join("\n")
    );
}

/// Largest overall dimension, mm (scale for position tolerances).
fn p_size(spec: &SectionSpec) -> f64 {
    match spec {
        SectionSpec::I(s) => s.depth_mm.max(s.width_mm),
        SectionSpec::Rhs(s) => s.depth_mm.max(s.width_mm),
        SectionSpec::Chs(s) => s.diameter_mm,
        SectionSpec::Angle(s) => s.depth_mm.max(s.width_mm),
        SectionSpec::Channel(s) | SectionSpec::Tee(s) => s.depth_mm.max(s.width_mm),
        SectionSpec::Rect(s) => s.depth_mm.max(s.width_mm),
        SectionSpec::Round(s) => s.diameter_mm,
        _ => 1.0,
    }
}

/// `properties` runs once per member check in a hot loop: it must not
/// touch the heap. Counted with the `allocation-counter` crate (0.8), which
/// wraps the global allocator for this test binary.
#[test]
fn properties_make_no_heap_allocation() {
    let doc: Value = serde_json::from_str(VALUES).unwrap();
    let specs: Vec<SectionSpec> = doc["cases"]
        .as_array()
        .unwrap()
        .iter()
        .map(|c| serde_json::from_value(c["spec"].clone()).unwrap())
        .collect();
    let mut sum = 0.0;
    let info = allocation_counter::measure(|| {
        for spec in &specs {
            sum += shapes::properties(spec).map(|p| p.area_mm2).unwrap_or(0.0);
        }
    });
    assert!(sum > 0.0);
    assert_eq!(info.count_total, 0, "properties() allocated");
    // The counter is live: describing a section builds a String.
    let info = allocation_counter::measure(|| {
        std::hint::black_box(shapes::describe(&specs[0]));
    });
    assert!(info.count_total > 0, "allocation counter saw nothing");
}
