//! Euler's elastic critical load with the squash load as the cap: the
//! idealised envelope of a perfect, straight, centrally loaded column.
//!
//! N_cr = pi^2 E I / L_cr^2 (Euler 1744; closed form, any structural
//! mechanics text), N_pl = A f_y, resistance min(N_cr, N_pl) / gamma with
//! gamma = `gamma_m1` when given, else 1. An upper bound, not a design
//! resistance: the result says so (`euler-upper-bound`).
//!
//! The helpers every method shares live in [`super::common`]; they are
//! re-exported here so the older paths (`method::euler::basics`, ...) keep
//! working.

pub use super::common::*;
use crate::error::Result;
use crate::method::Input;
use crate::outcome::{Mode, ModeResult, Warning};
use crate::trace::{step, sym, Trace};

/// Member-level working: squash load and the optional factor.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    warn_first_principles(crate::member::Method::Euler, input, warnings);
    shared_prelude(input, trace, warnings)
}

/// The working every first-principles method starts with (material,
/// squash load, the optional factor); each method's `prelude` adds its own
/// warnings ([`warn_first_principles`]) first.
pub fn shared_prelude(
    input: &Input<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<()> {
    warn_timber_first_principles(input, warnings);
    push_material(input, trace, warnings);
    push_optional_factor(input, trace);
    Ok(())
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    trace: &mut Trace,
    _warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    let b = basics(input, mode, lcr_mm)?;
    let gamma = input.member.gamma_m1.unwrap_or(1.0);
    let lambda_rel = (b.n_pl_kn / b.n_cr_kn).sqrt();
    let n_fail = b.n_cr_kn.min(b.n_pl_kn);
    let resistance = n_fail / gamma;
    push_geometry(trace, &b, sym!("L_cr / i"));
    step!(
        trace,
        b.scope,
        "N_cr",
        "Euler critical load",
        b.n_cr_kn,
        "kN",
        "N_cr = pi^2 E I / L_cr^2",
    );
    step!(
        trace,
        b.scope,
        "lambda_bar",
        "relative slenderness sqrt(N_pl / N_cr)",
        lambda_rel,
        "-",
        "sqrt(N_pl / N_cr)",
    );
    step!(
        trace,
        b.scope,
        "N_R",
        "resistance min(N_cr, N_pl) / gamma",
        resistance,
        "kN",
        "idealised envelope",
    );
    Ok(ModeResult {
        mode,
        buckling_length_mm: b.lcr_mm,
        slenderness: b.slenderness,
        critical_kn: b.n_cr_kn,
        relative_slenderness: lambda_rel,
        reduction: n_fail / b.n_pl_kn,
        resistance_kn: resistance,
    })
}

#[cfg(test)]
pub(crate) mod tests {

    use super::*;
    use crate::check::Prepared;
    use crate::material::MaterialSpec;
    use crate::member::Member;
    use crate::method::Method;
    use crate::section::{Rect, SectionSpec};
    use std::f64::consts::PI;

    pub(crate) fn member(method: Method, grade: &str) -> Member {
        Member::new(
            "T1",
            SectionSpec::Rect(Rect {
                depth_mm: 100.0,
                width_mm: 50.0,
            }),
            MaterialSpec::Grade {
                grade: grade.into(),
            },
            2000.0,
            100.0,
            method,
        )
    }

    #[test]
    fn euler_closed_form_and_cap() {
        let p = Prepared::new(&member(Method::Euler, "S355")).unwrap();
        let input = p.input();
        let mut t = Trace::new();
        let mut w = Vec::new();
        // Minor axis: I = 100 * 50^3 / 12 = 1 041 666.7 mm4.
        let r = axis(&input, Mode::Minor, 2000.0, &mut t, &mut w).unwrap();
        let expect =
            PI * PI * 210_000.0 * (100.0 * 50f64.powi(3) / 12.0) / 2000f64.powi(2) / 1000.0;
        assert!((r.critical_kn - expect).abs() < 1e-9 * expect);
        assert!((r.resistance_kn - expect).abs() < 1e-9 * expect);
        // Very short: capped at A f_y (f_y = 345 MPa, t = 50 mm in 40-63 band gives 335).
        let r = axis(&input, Mode::Minor, 10.0, &mut t, &mut w).unwrap();
        assert!((r.resistance_kn - 5000.0 * 335.0 / 1000.0).abs() < 1e-9);
        assert_eq!(r.reduction, 1.0);
        assert!(axis(&input, Mode::Minor, 0.0, &mut t, &mut w).is_err());
        assert!(axis(&input, Mode::Minor, f64::NAN, &mut t, &mut w).is_err());
    }

    /// The first-principles methods pass members the codes fail (a round
    /// 60 bar, 1.8 m, 300 kN: EN 1993-1-1 curve c fails it), so each
    /// result says it is an estimate (Euler: an upper bound), and
    /// Perry-Robertson and the secant formula name their default
    /// imperfection, L_cr / 200, when none is given.
    #[test]
    fn first_principles_results_say_what_they_are() {
        let bar = |method: Method| {
            let mut m = member(method, "S355");
            m.section = SectionSpec::Round(crate::section::Round { diameter_mm: 60.0 });
            m.length_mm = 1800.0;
            m.axial_kn = 300.0;
            m
        };
        let codes = |m: &Member| -> Vec<&'static str> {
            Prepared::new(m)
                .unwrap()
                .check()
                .unwrap()
                .warnings
                .iter()
                .map(|w| w.code)
                .collect()
        };
        assert_eq!(codes(&bar(Method::Euler)), ["euler-upper-bound"]);
        for method in [Method::PerryRobertson, Method::Secant] {
            assert_eq!(
                codes(&bar(method)),
                ["first-principles-estimate", "imperfection-default"],
                "{method:?}"
            );
        }
        // A given imperfection (or a factor) is not a default: the estimate
        // warning stays, the default one goes.
        let mut pr = bar(Method::PerryRobertson);
        pr.bow_mm = Some(1.8);
        pr.gamma_m1 = Some(1.1);
        assert_eq!(codes(&pr), ["first-principles-estimate"]);
        let mut sec = bar(Method::Secant);
        sec.eccentricity_mm = Some(1.8);
        assert_eq!(codes(&sec), ["first-principles-estimate"]);
        // The codes' own methods carry none of these.
        let en = codes(&bar(Method::En1993));
        assert!(en.iter().all(|c| !matches!(
            *c,
            "euler-upper-bound" | "first-principles-estimate" | "imperfection-default"
        )));
    }

    /// The default bow is L_cr / 200 about each axis (EN 1993-1-1 Table
    /// 5.1, curve c, elastic analysis), not the L_cr / 1000 of a
    /// fabrication tolerance: the round 60 bar at 1.8 m has eta = 9 x 30 /
    /// 15^2 = 1.2 and, S355 (f_y 355 MPa, t = 60 mm: 335 MPa for 40 < t <=
    /// 63 in EN 10025-2), a resistance below that of the L/1000 bow.
    #[test]
    fn the_default_bow_is_the_curve_c_bow() {
        let mut m = member(Method::PerryRobertson, "S355");
        m.section = SectionSpec::Round(crate::section::Round { diameter_mm: 60.0 });
        m.length_mm = 1800.0;
        let default = Prepared::new(&m).unwrap().check().unwrap();
        let bows: Vec<f64> = default
            .trace
            .iter()
            .filter(|s| s.symbol == "e_0")
            .map(|s| s.value)
            .collect();
        assert_eq!(bows, [9.0, 9.0]);
        m.bow_mm = Some(9.0);
        let given = Prepared::new(&m).unwrap().check().unwrap();
        assert_eq!(default.resistance_kn, given.resistance_kn);
        m.bow_mm = Some(1.8);
        let small = Prepared::new(&m).unwrap().check().unwrap();
        assert!(default.resistance_kn < small.resistance_kn);
    }

    #[test]
    fn a500_on_a_solid_section_warns() {
        let r = Prepared::new(&member(Method::AiscLrfd, "A500C"))
            .unwrap()
            .check()
            .unwrap();
        assert!(r.warnings.iter().any(|w| w.code == "a500-shape-unknown"));
        assert!((r.strength_mpa - 46.0 * crate::material::KSI).abs() < 1e-9);
    }

    mod every_method {
        use super::*;
        use crate::section::Given;
        use proptest::prelude::*;

        fn methods() -> [Method; 8] {
            Method::ALL
        }

        proptest! {
            #![proptest_config(ProptestConfig::with_cases(256))]

            /// Whatever the numbers, every method returns a finite result
            /// with the reduction in (0, 1] and the resistance within the
            /// squash load over the method's factor, or a typed error; it
            /// never panics.
            #[test]
            fn results_are_bounded(
                area in 1.0f64..1e6,
                i_ratio in 0.01f64..1.0,
                r_major in 1.0f64..500.0,
                lcr in 1e-3f64..1e7,
                bow in 0.0f64..1e3,
                gamma in 1.0f64..3.0,
                timber in any::<bool>(),
                kind in 0usize..3,
            ) {
                let i_major = area * r_major * r_major;
                let mut m = member(Method::Euler, if timber { "GL28h" } else { "S355" });
                m.section = SectionSpec::Given(Given {
                    area_mm2: area,
                    i_major_mm4: i_major,
                    i_minor_mm4: i_major * i_ratio,
                    torsion_mm4: None,
                    warping_mm6: None,
                    w_el_major_mm3: None,
                    w_el_minor_mm3: None,
                    w_pl_major_mm3: None,
                    w_pl_minor_mm3: None,
                });
                match kind {
                    0 => m.bow_mm = Some(bow),
                    1 => m.eccentricity_mm = Some(bow),
                    _ => m.gamma_m1 = Some(gamma),
                }
                let p = Prepared::new(&m).unwrap();
                let input = p.input();
                for method in methods() {
                    let mut t = Trace::new();
                    let mut w = Vec::new();
                    let refused = crate::method::prelude(method, &input, &mut t, &mut w).is_err();
                    let should_refuse = match method {
                        Method::En1993 | Method::AiscLrfd | Method::AiscAsd | Method::CsaS16 => timber,
                        Method::En1995 => !timber,
                        _ => false,
                    };
                    prop_assert_eq!(refused, should_refuse, "{:?}", method);
                    if refused {
                        continue;
                    }
                    for mode in [Mode::Major, Mode::Minor] {
                        let r = crate::method::axis(method, &input, mode, lcr, &mut t, &mut w).unwrap();
                        let (f, _) = input.material.strength_and_modulus();
                        let n_pl = area * f / 1000.0;
                        let factor = match method {
                            Method::AiscLrfd | Method::CsaS16 => 1.0,
                            Method::AiscAsd => 1.67,
                            _ => m.gamma_m1.unwrap_or(1.0),
                        };
                        prop_assert!(r.reduction > 0.0 && r.reduction <= 1.0, "{method:?} {r:?}");
                        prop_assert!(r.resistance_kn.is_finite() && r.resistance_kn > 0.0, "{method:?} {r:?}");
                        prop_assert!(r.resistance_kn <= n_pl / factor * (1.0 + 1e-12), "{method:?} {r:?}");
                        prop_assert!(r.critical_kn.is_finite() && r.relative_slenderness.is_finite());
                        prop_assert!(t.iter().all(|s| !s.value.is_nan()), "{method:?}: NaN in trace");
                    }
                    // No duplicate warnings between the axes.
                    for (k, a) in w.iter().enumerate() {
                        prop_assert!(w.iter().skip(k + 1).all(|b| b.code != a.code), "{method:?}: {w:?}");
                    }
                }
            }
        }
    }
}
