//! Torsional and flexural-torsional buckling: elastic critical loads
//! against closed forms of thin-walled beam theory, and the design modes
//! of the check.
//!
//! Sources:
//! - S. P. Timoshenko and J. M. Gere, *Theory of Elastic Stability*, 2nd
//!   ed., McGraw-Hill, New York, 1961, chapter 5 "Torsional buckling",
//!   §5.2-5.3: N_T = (G I_t + pi^2 E I_w / L^2) / i_0^2 about the shear
//!   centre; a cruciform of four thin outstands b x t has I_w = 0 and a
//!   torsional critical stress G t^2 / b^2 independent of the length; the
//!   singly symmetric case reduces to a quadratic and the general case to
//!   the cubic of the three coupled modes (recalled from memory).
//! - AISC 360-16, *Specification for Structural Steel Buildings*, American
//!   Institute of Steel Construction, Chicago, 2016, section E4, Eq. E4-2
//!   (doubly symmetric), E4-3 with H (singly symmetric) and E4-4 (general
//!   cubic) (recalled from memory).
//! - EN 1993-1-3:2006, *Eurocode 3 - Design of steel structures - Part
//!   1-3: Cold-formed members and sheeting*, CEN, Brussels, 6.2.3(5) and
//!   (7): N_cr,T and N_cr,TF = N_cr,y / (2 beta) [1 + N_cr,T/N_cr,y -
//!   sqrt((1 - N_cr,T/N_cr,y)^2 + 4 (y_0/i_0)^2 N_cr,T/N_cr,y)] with
//!   beta = 1 - (y_0/i_0)^2 (recalled from memory).
//! - EN 1993-1-1:2005, *Eurocode 3 - Part 1-1*, CEN, Brussels, 6.3.1.2
//!   (chi, Eq. 6.49), 6.3.1.4 (lambda_T = sqrt(A f_y / N_cr), curve of the
//!   z axis), Table 6.1 (alpha) and Table 6.2 (L-sections curve b; U-, T-
//!   and solid sections curve c).
//! - CSA S16-19, *Design of steel structures*, CSA Group, Toronto, 2019,
//!   13.3.1 and 13.3.2 (phi = 0.90, n = 1.34) (recalled from memory).
//! - Cardano's trigonometric solution of a cubic with three real roots
//!   (F. Viete, 1615; any algebra text): an algorithm independent of the
//!   engine's bracketed Newton-bisection, used to check its root.
//!
//! Units: N, mm, MPa unless a name says kN.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::f64::consts::PI;

use strutline_core::check::{check_member, Mode};
use strutline_core::material::MaterialSpec;
use strutline_core::member::Member;
use strutline_core::method::Method;
use strutline_core::section::{Angle, Flanged, Given, IMake, IShape, SectionSpec};
use strutline_core::stability::torsional::{
    critical, flexural_torsional_general, flexural_torsional_single, polar_radius_sq, torsional_n,
    Inputs, Symmetry,
};
use strutline_validation::assert_close;

/// Closed forms evaluated in floating point: only rounding separates them.
const ROUNDING: f64 = 1e-12;
/// The engine's root finder stops at a relative bracket of 1e-13.
const ROOT: f64 = 1e-10;

const E: f64 = 210_000.0;
const G: f64 = 81_000.0;

/// A thin cruciform of four outstands b x t meeting at the centre
/// (Timoshenko & Gere 5.3): A = 4 b t, I_y = I_z = t (2b)^3 / 12 (the thin
/// idealisation), I_t = 4 b t^3 / 3, I_w = 0.
fn cruciform(b: f64, t: f64) -> (f64, f64, f64) {
    (
        4.0 * b * t,
        t * (2.0 * b).powi(3) / 12.0,
        4.0 * b * t.powi(3) / 3.0,
    )
}

#[test]
fn cruciform_torsional_stress_is_g_t2_over_b2_at_every_length() {
    let (b, t) = (100.0, 8.0);
    let (a, i, it) = cruciform(b, t);
    // Timoshenko & Gere 5.3: sigma_cr = G I_t / I_p = G t^2 / b^2 for the thin cruciform.
    let expected = G * t * t / (b * b); // 518.4 MPa
    assert_close(
        G * it / (2.0 * i),
        expected,
        ROUNDING,
        "G I_t / I_p equals G t^2/b^2",
    );
    for l in [500.0, 1000.0, 3000.0, 10_000.0] {
        let c = critical(&Inputs {
            area_mm2: a,
            i_major_mm4: i,
            i_minor_mm4: i,
            torsion_mm4: it,
            warping_mm6: 0.0,
            sc_major_mm: 0.0,
            sc_minor_mm: 0.0,
            e_mpa: E,
            g_mpa: G,
            l_major_mm: l,
            l_minor_mm: l,
            l_torsion_mm: l,
        });
        assert_eq!(c.symmetry, Symmetry::Double);
        assert_close(
            c.n_torsional / a,
            expected,
            ROUNDING,
            "Timoshenko & Gere 5.3 cruciform sigma_cr,T",
        );
        assert_eq!(c.n_twist, c.n_torsional, "doubly symmetric: no coupling");
    }
}

#[test]
fn cruciform_as_typed_properties_governs_torsionally_in_the_check() {
    let (b, t) = (100.0, 5.0);
    let (a, i, it) = cruciform(b, t);
    // Short member, L = 1000 mm: sigma_cr,T = G t^2/b^2 = 202.5 MPa, N_cr,T =
    // 202.5 x 2000 mm2 = 405 kN, below N_pl = A f_y = 710 kN and far below
    // N_cr,z = pi^2 E I / L^2 = 6,909 kN (I = 5 x 200^3 / 12).
    let member = Member::new(
        "X1",
        SectionSpec::Given(Given {
            area_mm2: a,
            i_major_mm4: i,
            i_minor_mm4: i,
            torsion_mm4: Some(it),
            warping_mm6: Some(0.0),
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        }),
        MaterialSpec::Custom {
            fy_mpa: 355.0,
            e_mpa: E,
            g_mpa: Some(G),
        },
        1000.0,
        100.0,
        Method::Euler,
    );
    let r = check_member(&member).unwrap();
    let tor = r
        .modes
        .iter()
        .find(|m| m.mode == Mode::Torsional)
        .expect("torsional mode");
    assert_close(
        tor.critical_kn,
        G * t * t / (b * b) * a / 1000.0,
        ROUNDING,
        "N_cr,T kN (Timoshenko & Gere 5.3)",
    );
    // Equivalent slenderness pi sqrt(E A / N_cr) = pi sqrt(E / sigma_cr).
    assert_close(
        tor.slenderness,
        PI * (E / (G * t * t / (b * b))).sqrt(),
        ROUNDING,
        "equivalent slenderness",
    );
    // Euler method: resistance = min(N_cr,T, A f_y) = N_cr,T = 405 kN, and it governs.
    assert_close(tor.resistance_kn, 405.0, ROUNDING, "min(N_cr,T, N_pl), kN");
    assert_eq!(r.governing, Mode::Torsional);
    assert!(!r.warnings.iter().any(|w| w.code == "torsional-not-checked"));
    assert!(r.trace.iter().any(|s| s.symbol == "N_cr,T"));
    // Long member, L = 6000 mm: N_cr,z = 6,909 / 36 = 191.9 kN < N_cr,T =
    // 405 kN, so the torsional mode cannot govern: traced, not listed.
    let long = Member {
        length_mm: 6000.0,
        ..member
    };
    let r = check_member(&long).unwrap();
    assert!(r.modes.iter().all(|m| m.mode != Mode::Torsional));
    assert!(r.trace.iter().any(|s| s.symbol == "N_cr,T"));
}

#[test]
fn thin_equal_angle_torsion_about_the_heel() {
    // Thin equal angle b x t, heel at the shear centre (Timoshenko & Gere 5.3):
    // A = 2bt, principal I_u = t b^3/3 (axis of symmetry), I_v = t b^3/12,
    // shear centre on the axis of symmetry at b sqrt(2)/4 from the centroid,
    // i_0^2 = b^2/3, I_t = 2 b t^3/3, I_w = 0  =>  sigma_cr,T = G t^2/b^2.
    let (b, t): (f64, f64) = (90.0, 6.0);
    let a = 2.0 * b * t;
    let (iu, iv) = (t * b.powi(3) / 3.0, t * b.powi(3) / 12.0);
    let u0 = b * 2f64.sqrt() / 4.0;
    let i0sq = polar_radius_sq(a, iu, iv, u0, 0.0);
    assert_close(i0sq, b * b / 3.0, ROUNDING, "i_0^2 = b^2/3");
    let nt = torsional_n(G, 2.0 * b * t.powi(3) / 3.0, E, 0.0, 2500.0, i0sq);
    assert_close(
        nt / a,
        G * t * t / (b * b),
        ROUNDING,
        "sigma_cr,T = G t^2/b^2",
    );
    let c = critical(&Inputs {
        area_mm2: a,
        i_major_mm4: iu,
        i_minor_mm4: iv,
        torsion_mm4: 2.0 * b * t.powi(3) / 3.0,
        warping_mm6: 0.0,
        sc_major_mm: u0,
        sc_minor_mm: 0.0,
        e_mpa: E,
        g_mpa: G,
        l_major_mm: 2500.0,
        l_minor_mm: 2500.0,
        l_torsion_mm: 2500.0,
    });
    assert_eq!(c.symmetry, Symmetry::SingleMajor);
    // The coupled load lies below both the torsional and the major-axis load.
    assert!(c.n_twist < c.n_torsional && c.n_twist < c.n_major);
}

/// EN 1993-1-3 6.2.3(7) written as in the standard (an independent form of the quadratic).
fn en_tf(n_y: f64, n_t: f64, y0: f64, i0: f64) -> f64 {
    let beta = 1.0 - (y0 / i0).powi(2);
    let r = n_t / n_y;
    n_y / (2.0 * beta) * (1.0 + r - ((1.0 - r).powi(2) + 4.0 * (y0 / i0).powi(2) * r).sqrt())
}

/// AISC 360-16 E4-3 written as in the specification, in stresses.
fn aisc_e4_3(fey: f64, fez: f64, h: f64) -> f64 {
    (fey + fez) / (2.0 * h) * (1.0 - (1.0 - 4.0 * fey * fez * h / (fey + fez).powi(2)).sqrt())
}

#[test]
fn singly_symmetric_quadratic_matches_en_1993_1_3_and_aisc_e4_3() {
    // A tee-like set of values: A = 4000 mm2, i_0 = 60 mm, y_0 = 30 mm.
    let (a, i0, y0): (f64, f64, f64) = (4000.0, 60.0, 30.0);
    for &(n_y, n_t) in &[(900e3, 600e3), (400e3, 1500e3), (1e6, 1e6)] {
        let ours = flexural_torsional_single(n_y, n_t, (y0 / i0).powi(2));
        assert_close(ours, en_tf(n_y, n_t, y0, i0), 1e-12, "EN 1993-1-3 6.2.3(7)");
        let h = 1.0 - (y0 / i0).powi(2);
        assert_close(
            ours / a,
            aisc_e4_3(n_y / a, n_t / a, h),
            1e-12,
            "AISC 360-16 Eq. E4-3",
        );
    }
}

#[test]
fn flexural_torsional_reduces_to_flexural_with_the_shear_centre_at_the_centroid() {
    // Offsets zero: the cubic factors into the three uncoupled loads (AISC E4-4 with x0 = y0 = 0).
    for &(na, nb, nt) in &[
        (800.0, 300.0, 500.0),
        (200.0, 900.0, 150.0),
        (700.0, 700.0, 900.0),
    ] {
        let n = flexural_torsional_general(na, nb, nt, 0.0, 0.0);
        assert_close(n, na.min(nb).min(nt), ROOT, "min(N_a, N_b, N_T)");
    }
    // And continuously: a vanishing offset gives back the smaller uncoupled load.
    let q = flexural_torsional_single(500.0, 800.0, 1e-12);
    assert_close(q, 500.0, 1e-9, "y_0 -> 0");
}

/// The smallest root of the cubic by Cardano-Viete (three real roots).
fn cardano_smallest(na: f64, nb: f64, nt: f64, pa: f64, pb: f64) -> f64 {
    // Expand f(N) = (N-na)(N-nb)(N-nt) - N^2 (N-nb) pa - N^2 (N-na) pb.
    let a3 = 1.0 - pa - pb;
    let a2 = -(na + nb + nt) + nb * pa + na * pb;
    let a1 = na * nb + na * nt + nb * nt;
    let a0 = -na * nb * nt;
    let (b, c, d) = (a2 / a3, a1 / a3, a0 / a3);
    let p = c - b * b / 3.0;
    let q = 2.0 * b.powi(3) / 27.0 - b * c / 3.0 + d;
    let m = 2.0 * (-p / 3.0).sqrt();
    let theta = (3.0 * q / (p * m)).acos() / 3.0;
    (0..3)
        .map(|k| m * (theta - 2.0 * PI * f64::from(k) / 3.0).cos() - b / 3.0)
        .fold(f64::INFINITY, f64::min)
}

#[test]
fn asymmetric_cubic_root_matches_cardano() {
    // Unequal-angle-like values (loads in kN): coupling both ways.
    let cases = [
        (1500.0, 420.0, 610.0, 0.30, 0.08),
        (900.0, 850.0, 300.0, 0.45, 0.20),
        (260.0, 2400.0, 900.0, 0.05, 0.55),
    ];
    for &(na, nb, nt, pa, pb) in &cases {
        let ours = flexural_torsional_general(na, nb, nt, pa, pb);
        let reference = cardano_smallest(na, nb, nt, pa, pb);
        assert_close(
            ours,
            reference,
            1e-9,
            "AISC E4-4 smallest root (Cardano-Viete)",
        );
        assert!(ours > 0.0 && ours <= na.min(nb).min(nt));
    }
}

/// A small deterministic generator for the property sweeps (xorshift64).
struct Rng(u64);
impl Rng {
    fn next(&mut self) -> f64 {
        self.0 ^= self.0 << 13;
        self.0 ^= self.0 >> 7;
        self.0 ^= self.0 << 17;
        (self.0 >> 11) as f64 / (1u64 << 53) as f64
    }
    fn range(&mut self, lo: f64, hi: f64) -> f64 {
        lo + (hi - lo) * self.next()
    }
}

#[test]
fn warping_restraint_never_lowers_the_twisting_critical_load() {
    // Property (Timoshenko & Gere 5.2: N_T grows with I_w / L_T^2, and the
    // coupled root grows with N_T): a shorter torsional length or a larger
    // warping constant never lowers N_cr,T or N_cr,TF.
    let mut rng = Rng(0x9e37_79b9_7f4a_7c15);
    for _ in 0..2000 {
        let a = rng.range(500.0, 20_000.0);
        let i_major = rng.range(1e6, 5e8);
        let i_minor = i_major * rng.range(0.05, 1.0);
        let base = Inputs {
            area_mm2: a,
            i_major_mm4: i_major,
            i_minor_mm4: i_minor,
            torsion_mm4: rng.range(1e3, 2e6),
            warping_mm6: rng.range(0.0, 1e12),
            sc_major_mm: rng.range(-80.0, 80.0),
            sc_minor_mm: if rng.next() < 0.5 {
                0.0
            } else {
                rng.range(-60.0, 60.0)
            },
            e_mpa: E,
            g_mpa: G,
            l_major_mm: rng.range(500.0, 12_000.0),
            l_minor_mm: rng.range(500.0, 12_000.0),
            l_torsion_mm: rng.range(500.0, 12_000.0),
        };
        let c0 = critical(&base);
        let shorter = critical(&Inputs {
            l_torsion_mm: base.l_torsion_mm * rng.range(0.2, 1.0),
            ..base
        });
        let stiffer = critical(&Inputs {
            warping_mm6: base.warping_mm6 * rng.range(1.0, 10.0) + 1e9,
            ..base
        });
        for c in [shorter, stiffer] {
            assert!(c.n_torsional >= c0.n_torsional * (1.0 - 1e-12));
            assert!(
                c.n_twist >= c0.n_twist * (1.0 - 1e-9),
                "{:?} {} < {}",
                base,
                c.n_twist,
                c0.n_twist
            );
        }
        // The coupled root never exceeds any uncoupled load it couples with.
        assert!(c0.n_twist <= c0.n_torsional * (1.0 + 1e-12));
    }
}

fn steel(fy: f64, e: f64, g: f64) -> MaterialSpec {
    MaterialSpec::Custom {
        fy_mpa: fy,
        e_mpa: e,
        g_mpa: Some(g),
    }
}

fn strut(section: SectionSpec, material: MaterialSpec, method: Method, length: f64) -> Member {
    Member::new("F1", section, material, length, 50.0, method)
}

/// EN 1993-1-1 Eq. 6.49 with the imperfection factor of Table 6.1.
fn en_chi(lambda: f64, alpha: f64) -> f64 {
    if lambda <= 0.2 {
        return 1.0;
    }
    let phi = 0.5 * (1.0 + alpha * (lambda - 0.2) + lambda * lambda);
    (1.0 / (phi + (phi * phi - lambda * lambda).sqrt())).min(1.0)
}

/// AISC 360-16 Eq. E3-2 / E3-3.
fn aisc_fcr(fy: f64, fe: f64) -> f64 {
    if fy / fe <= 2.25 {
        0.658f64.powf(fy / fe) * fy
    } else {
        0.877 * fe
    }
}

fn channel() -> SectionSpec {
    SectionSpec::Channel(Flanged {
        depth_mm: 200.0,
        width_mm: 75.0,
        flange_mm: 12.5,
        web_mm: 8.5,
        root_radius_mm: 12.0,
    })
}

fn tee() -> SectionSpec {
    SectionSpec::Tee(Flanged {
        depth_mm: 150.0,
        width_mm: 150.0,
        flange_mm: 14.0,
        web_mm: 12.0,
        root_radius_mm: 10.0,
    })
}

fn angle(h: f64, b: f64, t: f64) -> SectionSpec {
    SectionSpec::Angle(Angle {
        depth_mm: h,
        width_mm: b,
        thickness_mm: t,
        root_radius_mm: 12.0,
        toe_radius_mm: 6.0,
    })
}

#[test]
fn singly_symmetric_shapes_couple_twist_with_the_axis_of_symmetry() {
    // The check's N_cr,TF equals EN 1993-1-3 6.2.3(7) evaluated in this
    // test from the section's own properties with the axis of symmetry as
    // y: the channel (symmetric about its major axis), the tee (about its
    // minor axis here, b = h = 150) and the equal angle (about its major axis u).
    let l = 2500.0;
    let cases = [
        (channel(), true),
        (tee(), false),
        (angle(100.0, 100.0, 12.0), true),
    ];
    for (spec, about_major) in cases {
        let p = spec.build().unwrap().props;
        let (i_s, y0) = if about_major {
            (p.i_major_mm4, p.shear_centre_major_mm)
        } else {
            (p.i_minor_mm4, p.shear_centre_minor_mm)
        };
        let other = if about_major {
            p.shear_centre_minor_mm
        } else {
            p.shear_centre_major_mm
        };
        assert!(
            other.abs() < 1e-6 * y0.abs(),
            "one offset only: {y0} {other}"
        );
        let i0 = ((p.i_major_mm4 + p.i_minor_mm4) / p.area_mm2 + y0 * y0).sqrt();
        let n_y = PI * PI * E * i_s / (l * l);
        let n_t = (G * p.torsion_mm4 + PI * PI * E * p.warping_mm6 / (l * l)) / (i0 * i0);
        let expected = en_tf(n_y, n_t, y0, i0) / 1000.0;
        let r = check_member(&strut(spec.clone(), steel(355.0, E, G), Method::En1993, l)).unwrap();
        let ft = r
            .modes
            .iter()
            .find(|m| m.mode == Mode::FlexuralTorsional)
            .expect("FT mode");
        assert_close(
            ft.critical_kn,
            expected,
            1e-10,
            "N_cr,TF kN, EN 1993-1-3 6.2.3(7)",
        );
        assert!(!r.warnings.iter().any(|w| w.code == "torsional-not-checked"));
        // EN 1993-1-1 6.3.1.4: lambda_T = sqrt(A f_y / N_cr,TF) (Class 1-3 here), the z-axis
        // curve of Table 6.2: c (alpha 0.49) for U and T, b (0.34) for L.
        let alpha = if matches!(spec, SectionSpec::Angle(_)) {
            0.34
        } else {
            0.49
        };
        let lt = (p.area_mm2 * 355.0 / (expected * 1000.0)).sqrt();
        assert_close(
            ft.relative_slenderness,
            lt,
            1e-10,
            "lambda_T, EN 1993-1-1 6.3.1.4",
        );
        let nb = en_chi(lt, alpha) * p.area_mm2 * 355.0 / 1000.0;
        assert_close(
            ft.resistance_kn,
            nb,
            1e-10,
            "N_b,Rd of the FT mode, kN (Eq. 6.47, 6.49)",
        );
        assert!(r.trace.iter().any(|s| s.symbol == "N_cr,TF"));
    }
}

#[test]
fn unequal_angle_root_matches_cardano_from_its_properties() {
    let spec = angle(150.0, 90.0, 15.0);
    let p = spec.build().unwrap().props;
    assert!(p.shear_centre_major_mm.abs() > 1.0 && p.shear_centre_minor_mm.abs() > 1.0);
    let l = 3000.0;
    let i0sq = (p.i_major_mm4 + p.i_minor_mm4) / p.area_mm2
        + p.shear_centre_major_mm.powi(2)
        + p.shear_centre_minor_mm.powi(2);
    let na = PI * PI * E * p.i_major_mm4 / (l * l);
    let nb = PI * PI * E * p.i_minor_mm4 / (l * l);
    let nt = (G * p.torsion_mm4 + PI * PI * E * p.warping_mm6 / (l * l)) / i0sq;
    let expected = cardano_smallest(
        na,
        nb,
        nt,
        p.shear_centre_major_mm.powi(2) / i0sq,
        p.shear_centre_minor_mm.powi(2) / i0sq,
    );
    let r = check_member(&strut(spec, steel(355.0, E, G), Method::En1993, l)).unwrap();
    let ft = r
        .modes
        .iter()
        .find(|m| m.mode == Mode::FlexuralTorsional)
        .expect("FT mode");
    assert_close(
        ft.critical_kn * 1000.0,
        expected,
        1e-9,
        "N_cr,TF of the unequal angle, AISC E4-4 cubic (Cardano)",
    );
    assert!(ft.critical_kn * 1000.0 < nb, "below the minor-axis load");
}

#[test]
fn aisc_and_csa_feed_the_twisting_f_e_into_their_column_curves() {
    // AISC 360-16 E4: F_cr from E3-2/E3-3 with F_e = N_cr,TF / A_g; phi_c = 0.90 (E1).
    let (fy, e, g) = (345.0, 200_000.0, 77_200.0);
    let r = check_member(&strut(channel(), steel(fy, e, g), Method::AiscLrfd, 2500.0)).unwrap();
    let a = r.section.area_mm2;
    let ft = r
        .modes
        .iter()
        .find(|m| m.mode == Mode::FlexuralTorsional)
        .unwrap();
    let fe = ft.critical_kn * 1000.0 / a;
    assert_close(
        ft.resistance_kn,
        0.9 * aisc_fcr(fy, fe) * a / 1000.0,
        1e-10,
        "phi_c F_cr A_g (E3-2 via E4)",
    );
    // CSA S16-19 13.3.2: lambda = sqrt(F_y/F_e), C_r = 0.9 A F_y (1 + lambda^2n)^(-1/n), n = 1.34.
    let (fy, e, g) = (350.0, 200_000.0, 77_000.0);
    let r = check_member(&strut(channel(), steel(fy, e, g), Method::CsaS16, 2500.0)).unwrap();
    let a = r.section.area_mm2;
    let ft = r
        .modes
        .iter()
        .find(|m| m.mode == Mode::FlexuralTorsional)
        .unwrap();
    let lambda = (fy / (ft.critical_kn * 1000.0 / a)).sqrt();
    let cr = 0.9 * a * fy * (1.0 + lambda.powf(2.0 * 1.34)).powf(-1.0 / 1.34) / 1000.0;
    assert_close(ft.resistance_kn, cr, 1e-10, "C_r, CSA S16-19 13.3.1/13.3.2");
}

#[test]
fn i_section_with_a_long_torsional_length_buckles_torsionally() {
    // A rolled I braced laterally at close centres (L_cr,z = 1 m) but free to
    // twist over 8 m: N_cr,T < N_cr,z, so the torsional mode is listed and
    // governs; its N_cr,T = (G I_t + pi^2 E I_w / L_T^2) / i_0^2 (EN 1993-1-3 6.2.3(5)).
    let spec = SectionSpec::I(IShape {
        depth_mm: 300.0,
        width_mm: 150.0,
        flange_mm: 10.7,
        web_mm: 7.1,
        root_radius_mm: 15.0,
        make: IMake::Rolled,
    });
    let p = spec.build().unwrap().props;
    let mut m = strut(spec, steel(355.0, E, G), Method::En1993, 8000.0);
    m.lcr_minor_mm = Some(1000.0);
    m.lcr_major_mm = Some(1000.0);
    let r = check_member(&m).unwrap();
    let t = r
        .modes
        .iter()
        .find(|m| m.mode == Mode::Torsional)
        .expect("torsional mode");
    let i0sq = (p.i_major_mm4 + p.i_minor_mm4) / p.area_mm2;
    let n_t = (G * p.torsion_mm4 + PI * PI * E * p.warping_mm6 / 64e6) / i0sq / 1000.0;
    assert_close(t.critical_kn, n_t, 1e-12, "N_cr,T kN");
    assert_eq!(t.buckling_length_mm, 8000.0);
    assert_eq!(r.governing, Mode::Torsional);
}
