//! Elastic critical moment for lateral-torsional buckling against its
//! closed form, and EN 1993-1-1 6.3.2.3 worked by hand from catalogue
//! properties.
//!
//! Sources:
//! - S. P. Timoshenko and J. M. Gere, *Theory of Elastic Stability*, 2nd
//!   ed., McGraw-Hill, New York, 1961, §6.2 "Lateral buckling of simply
//!   supported I-beams in pure bending": M_cr = pi/L sqrt(E I_z G I_t)
//!   sqrt(1 + pi^2 E I_w / (L^2 G I_t)), ends simply supported laterally
//!   and free to warp (recalled from memory). The engine's three-factor
//!   formula with C1 = 1, C2 = 0, k = k_w = 1 must equal it exactly (the
//!   same algebra; tolerance EXACT covers rounding only).
//! - EN 1993-1-1:2005, *Eurocode 3: Design of steel structures - Part 1-1*,
//!   CEN, Brussels, 6.3.2.2 (Eq. 6.56), 6.3.2.3 (Eqs. 6.57, 6.58, lambda_LT,0
//!   = 0.4, beta = 0.75), Table 6.5 (rolled I, h/b <= 2: curve b, alpha_LT =
//!   0.34 from Table 6.3), Table 6.6 (k_c = 1 for uniform moment).
//! - ArcelorMittal, *Sections and Merchant Bars* catalogue, IPE 300: I_z =
//!   603.8 cm4, I_t = 20.12 cm4, I_w = 125.9 x 10^3 cm6, W_pl,y = 628.4 cm3
//!   (recalled from memory). The engine computes its own properties from
//!   the dimensions (h 300, b 150, t_w 7.1, t_f 10.7, r 15 mm), which differ
//!   from the catalogue's by up to about 1% (I_w and I_t most): tolerance
//!   CATALOGUE.
//!
//! Units: N, mm, MPa; moments in kNm where a name says so.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use serde_json::json;
use strutline_core::check::Prepared;
use strutline_validation::{assert_close, member_from_json};

/// Rounding only: the same formula evaluated in a different order.
const EXACT: f64 = 1e-12;
/// Engine properties from dimensions against catalogue values, and the
/// hand calculation's rounding of E and G.
const CATALOGUE: f64 = 0.02;

fn beam(
    section: serde_json::Value,
    length: f64,
    extra: serde_json::Value,
) -> strutline_core::Member {
    let mut m = json!({
        "id": "LT1", "section": section,
        "material": {"fy_mpa": 355, "e_mpa": 210000, "g_mpa": 81000},
        "length_mm": length, "axial_kn": 0, "method": "en1993-1-1",
        "m_major_a_knm": 10, "m_major_b_knm": 10
    });
    if let (Some(o), Some(e)) = (m.as_object_mut(), extra.as_object()) {
        for (k, v) in e {
            o.insert(k.clone(), v.clone());
        }
    }
    member_from_json(m)
}

#[test]
fn uniform_moment_m_cr_is_the_closed_form() {
    let pi = std::f64::consts::PI;
    let sections = [
        json!({"kind": "i", "depth_mm": 300, "width_mm": 150, "flange_mm": 10.7, "web_mm": 7.1, "root_radius_mm": 15, "make": "rolled"}),
        json!({"kind": "i", "depth_mm": 600, "width_mm": 200, "flange_mm": 14, "web_mm": 9, "make": "welded"}),
        json!({"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 15, "web_mm": 9, "root_radius_mm": 18}),
    ];
    for s in sections {
        for length in [1500.0, 4000.0, 9000.0, 20000.0] {
            let m = beam(s.clone(), length, json!({}));
            let p = Prepared::new(&m).unwrap();
            let r = p.check().unwrap();
            let b = r.bending.unwrap();
            let pr = &p.section.props;
            let (e, g) = (210_000.0, 81_000.0);
            // Timoshenko & Gere §6.2.
            let closed = pi / length
                * (e * pr.i_minor_mm4 * g * pr.torsion_mm4).sqrt()
                * (1.0 + pi * pi * e * pr.warping_mm6 / (length * length * g * pr.torsion_mm4))
                    .sqrt()
                / 1e6;
            assert_close(
                b.major.critical_knm.unwrap(),
                closed,
                EXACT,
                "M_cr, uniform moment, Timoshenko & Gere 6.2",
            );
            assert_eq!(b.major.moment_factor, Some(1.0));
        }
    }
}

#[test]
fn ipe_300_s355_en_6_3_2_3_by_hand() {
    // IPE 300, L = 6 m, uniform moment, S355 (f_y = 355 MPa for t_f <= 16 mm).
    let (iz, it, iw, wpl) = (603.8e4, 20.12e4, 125.9e9, 628.4e3);
    let (e, g, fy, l) = (210_000.0, 81_000.0, 355.0, 6000.0);
    let pi = std::f64::consts::PI;
    // M_cr, closed form (C1 = 1).
    let mcr = pi * pi * e * iz / (l * l) * (iw / iz + l * l * g * it / (pi * pi * e * iz)).sqrt();
    // Eq. 6.56, 6.3.2.3 with curve b (alpha_LT = 0.34), lambda_0 = 0.4, beta = 0.75.
    let lam = (wpl * fy / mcr).sqrt();
    let phi = 0.5 * (1.0 + 0.34 * (lam - 0.4) + 0.75 * lam * lam);
    let chi = (1.0 / (phi + (phi * phi - 0.75 * lam * lam).sqrt()))
        .min(1.0)
        .min(1.0 / (lam * lam));
    // k_c = 1: f = 1 - 0.5 (1 - 1)(...) = 1, chi_mod = chi.
    let mb = chi * wpl * fy / 1e6; // gamma_M1 = 1.0
    let m = beam(
        json!({"kind": "i", "depth_mm": 300, "width_mm": 150, "flange_mm": 10.7, "web_mm": 7.1, "root_radius_mm": 15, "make": "rolled"}),
        l,
        json!({}),
    );
    let r = strutline_core::check_member(&m).unwrap();
    let b = r.bending.unwrap();
    assert_close(
        b.major.critical_knm.unwrap(),
        mcr / 1e6,
        CATALOGUE,
        "M_cr IPE 300, L = 6 m",
    );
    assert_close(
        b.major.reduction,
        chi,
        CATALOGUE,
        "chi_LT, EN 1993-1-1 Eq. 6.57",
    );
    assert_close(
        b.major.resistance_knm,
        mb,
        CATALOGUE,
        "M_b,Rd, EN 1993-1-1 Eq. 6.55",
    );
    // Minor axis: Class 1, W_pl,z f_y (catalogue W_pl,z = 125.2 cm3, recalled).
    assert_close(
        b.minor.resistance_knm,
        125.2e3 * fy / 1e6,
        CATALOGUE,
        "M_c,z,Rd, EN 1993-1-1 6.2.5",
    );
    assert_eq!(b.minor.critical_knm, None);
    // Continuously restrained: the plastic moment, Eq. 6.13.
    let held = beam(
        json!({"kind": "i", "depth_mm": 300, "width_mm": 150, "flange_mm": 10.7, "web_mm": 7.1, "root_radius_mm": 15, "make": "rolled"}),
        l,
        json!({"lt_restrained": true}),
    );
    let rb = strutline_core::check_member(&held)
        .unwrap()
        .bending
        .unwrap();
    assert_close(
        rb.major.resistance_knm,
        wpl * fy / 1e6,
        CATALOGUE,
        "M_pl,Rd, EN 1993-1-1 Eq. 6.13",
    );
    assert_eq!((rb.major.critical_knm, rb.major.reduction), (None, 1.0));
}

#[test]
fn destabilising_load_lowers_m_cr_and_stabilising_raises_it() {
    // ENV 1993-1-1 Annex F: with C2 z_g > 0 the root shrinks (load above the
    // shear centre); the engine must order the three load levels so.
    let s = json!({"kind": "i", "depth_mm": 400, "width_mm": 180, "flange_mm": 13.5, "web_mm": 8.6, "root_radius_mm": 21});
    let at = |level: &str| {
        let m = beam(
            s.clone(),
            7000.0,
            json!({"m_major_a_knm": 0, "m_major_b_knm": 0, "m_major_span_knm": 100, "load_level": level}),
        );
        strutline_core::check_member(&m)
            .unwrap()
            .bending
            .unwrap()
            .major
            .critical_knm
            .unwrap()
    };
    let (top, centre, bottom) = (
        at("compression-flange"),
        at("shear-centre"),
        at("tension-flange"),
    );
    assert!(top < centre && centre < bottom, "{top} {centre} {bottom}");
}
