//! CSA S16-19 13.3.1: axial compressive resistance of doubly symmetric
//! members (flexural buckling).
//!
//! C_r = phi A F_y (1 + lambda^(2n))^(-1/n), lambda = sqrt(F_y / F_e),
//! F_e = pi^2 E / (K L / r)^2, phi = 0.90 (13.1). n = 1.34 for most
//! members, 2.24 for hot-formed or stress-relieved hollow sections (class
//! H); `csa_n` overrides. A hollow section whose make the member file does
//! not give is read as cold-formed (n = 1.34, the lower resistance), and
//! the result says so. 10.4.2.1: "the slenderness ratio of a compression
//! member shall not exceed 200": a member beyond it does not satisfy the
//! standard ([`over_slenderness_limit`], [`crate::check::CheckResult::passes`]
//! is false), whatever its load; C_r is still worked and shown.
//!
//! A single angle is checked as loaded through its centroid; the effective
//! slenderness S16 gives for angles connected by one leg (13.3.3 in
//! S16-19, numbering recalled from memory) is not applied, and the result
//! says so.

use crate::error::Result;
use crate::member::CSA_N_DEFAULT;
use crate::method::euler::{
    basics, hollow_make_unstated, is_hot_finished_hollow, push_geometry, push_material,
    require_steel, warn_once, warn_once_text,
};
use crate::method::Input;
use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::SectionSpec;
use crate::trace::{step, sym, Scope, Sym, Trace};

const KEY: &str = "csa-s16";

/// phi for structural steel (CSA S16-19 13.1(a)).
pub const PHI: f64 = 0.90;
/// n for hot-formed or stress-relieved hollow sections, class H (13.3.1).
pub const N_CLASS_H: f64 = 2.24;

/// The largest slenderness ratio of a compression member, CSA S16-19 10.4.2.1.
pub const MAX_SLENDERNESS: f64 = 200.0;

/// Whether a flexural mode's KL/r exceeds 10.4.2.1's 200.
pub fn over_slenderness_limit(modes: &[ModeResult]) -> bool {
    modes
        .iter()
        .any(|m| matches!(m.mode, Mode::Major | Mode::Minor) && m.slenderness > MAX_SLENDERNESS)
}

/// The reduction (1 + lambda^(2n))^(-1/n), computed as
/// lambda^-2 (1 + lambda^(-2n))^(-1/n) above lambda = 1 so that it never
/// underflows to zero.
pub fn reduction(lambda: f64, n: f64) -> f64 {
    let r = if lambda <= 1.0 {
        (1.0 + lambda.powf(2.0 * n)).powf(-1.0 / n)
    } else {
        lambda.powi(-2) * (1.0 + lambda.powf(-2.0 * n)).powf(-1.0 / n)
    };
    if r.is_finite() {
        r.clamp(f64::MIN_POSITIVE, 1.0)
    } else {
        f64::MIN_POSITIVE
    }
}

/// The exponent n with the label saying where it came from.
fn exponent(input: &Input<'_>) -> (f64, Sym) {
    match input.member.csa_n {
        Some(n) => (n, sym!("exponent n (given)")),
        None if is_hot_finished_hollow(input) => (
            N_CLASS_H,
            sym!("exponent n, 2.24 for a class H hollow section (default)"),
        ),
        None if hollow_make_unstated(input) => (
            CSA_N_DEFAULT,
            sym!("exponent n, 1.34: the hollow section's make is not given, so not class H"),
        ),
        None => (
            CSA_N_DEFAULT,
            sym!("exponent n, 1.34 for this section (default)"),
        ),
    }
}

/// Member-level working.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    require_steel(input, KEY)?;
    push_material(input, trace, warnings);
    step!(
        trace,
        Scope::Member,
        "phi",
        "resistance factor for structural steel",
        PHI,
        "-",
        "CSA S16-19 13.1(a)",
    );
    let (n, label) = exponent(input);
    step!(
        trace,
        Scope::Member,
        "n",
        label,
        n,
        "-",
        "CSA S16-19 13.3.1",
    );
    if input.member.gamma_m1.is_some() {
        warn_once_text(
            warnings,
            "factor-ignored",
            "gamma_m1 is not used by CSA S16; phi = 0.90 of 13.1 applies",
        );
    }
    if input.member.csa_n.is_none() && hollow_make_unstated(input) {
        warn_once_text(
            warnings,
            "make-assumed",
            "make not given: the hollow section is taken as cold-formed, n = 1.34 of CSA S16-19 \
             13.3.1 (2.24 is for class H, hot-formed or stress-relieved), the lower resistance; \
             give make (hot-finished or cold-formed) if it is known",
        );
    }
    if matches!(input.section.spec, SectionSpec::Angle(_)) {
        warn_once_text(
            warnings,
            "angle-centroid-loading",
            "the angle is checked as loaded through its centroid (CSA S16-19 13.3.1, 13.3.2); the \
             effective slenderness S16 gives for a single angle connected by one leg is not \
             applied: check the end connections by hand",
        );
    }
    Ok(())
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    require_steel(input, KEY)?;
    let b = basics(input, mode, lcr_mm)?;
    let (n, _) = exponent(input);
    let fe = b.sigma_e_mpa;
    let lambda = (b.f_mpa / fe).sqrt();
    let red = reduction(lambda, n);
    let c_r = PHI * b.n_pl_kn * red;
    push_geometry(trace, &b, sym!("CSA S16-19 13.3.1"));
    step!(
        trace,
        b.scope,
        "F_e",
        "elastic buckling stress pi^2 E / (KL/r)^2",
        fe,
        "MPa",
        "CSA S16-19 13.3.1",
    );
    step!(
        trace,
        b.scope,
        "lambda",
        "sqrt(F_y / F_e)",
        lambda,
        "-",
        "CSA S16-19 13.3.1",
    );
    step!(
        trace,
        b.scope,
        "(1+lambda^2n)^-1/n",
        "reduction",
        red,
        "-",
        "CSA S16-19 13.3.1",
    );
    step!(
        trace,
        b.scope,
        "C_r",
        "factored compressive resistance phi A F_y (1 + lambda^2n)^(-1/n)",
        c_r,
        "kN",
        "CSA S16-19 13.3.1",
    );
    if b.slenderness > MAX_SLENDERNESS {
        step!(
            trace,
            b.scope,
            "KL/r,max",
            "largest slenderness ratio of a compression member: exceeded, the member does not satisfy the standard",
            MAX_SLENDERNESS,
            "-",
            "CSA S16-19 10.4.2.1",
        );
        warn_once(warnings, "slenderness-over-200", || {
            format!(
                "KL/r = {:.0} exceeds 200: CSA S16-19 10.4.2.1 does not allow a compression member \
                 this slender, so the member does not satisfy the standard whatever its load \
                 (C_r of 13.3.1 is shown for information)",
                b.slenderness
            )
        });
    }
    Ok(ModeResult {
        mode,
        buckling_length_mm: b.lcr_mm,
        slenderness: b.slenderness,
        critical_kn: b.n_cr_kn,
        relative_slenderness: lambda,
        reduction: red,
        resistance_kn: c_r,
    })
}

#[cfg(test)]
mod tests {

    use super::*;

    /// An I-section member of `material` checked by `method`: the E line
    /// of its working (value, clause) and the result.
    fn modulus(material: serde_json::Value, method: &str) -> (f64, String, crate::CheckResult) {
        let m: crate::Member = serde_json::from_value(serde_json::json!({
            "id": "E1", "method": method, "length_mm": 3000, "axial_kn": 100,
            "section": {"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 12,
                        "web_mm": 8, "root_radius_mm": 10},
            "material": material}))
        .unwrap();
        let r = crate::check_member(&m).unwrap();
        let e = r.trace.iter().find(|s| s.symbol == "E").unwrap();
        (e.value, e.clause.to_string(), r)
    }

    #[test]
    fn a_steel_grade_is_read_with_csa_s16s_modulus() {
        // CSA S16-19 clause 2: E = 200 000 MPa, whatever standard the grade
        // comes from (an ASTM grade's 29 000 ksi = 199 948 MPa, an EN
        // grade's 210 000 MPa); a custom material keeps its own E.
        for grade in ["A992", "S355", "350W"] {
            let (e, clause, r) = modulus(serde_json::json!({"grade": grade}), "csa-s16");
            assert_eq!(e, 200_000.0, "{grade}");
            assert_eq!(r.modulus_mpa, 200_000.0, "{grade}");
            assert_eq!(clause, "CSA S16-19 clause 2 (E = 200 000 MPa)", "{grade}");
        }
        let (e, clause, _) = modulus(serde_json::json!({"grade": "A992"}), "aisc360-lrfd");
        assert_eq!(
            (e, clause.as_str()),
            (crate::material::E_ASTM, "AISC 360-16 (E = 29 000 ksi)")
        );
        // AISC 360-16 likewise reads any named grade with its 29 000 ksi
        // (Symbols, E3): an EN grade's 210 000 MPa would overstate F_e by 5 %.
        for grade in ["S355", "350W"] {
            let (e, clause, r) = modulus(serde_json::json!({"grade": grade}), "aisc360-asd");
            assert_eq!(
                (e, clause.as_str()),
                (crate::material::E_ASTM, "AISC 360-16 (E = 29 000 ksi)"),
                "{grade}"
            );
            assert_eq!(r.modulus_mpa, crate::material::E_ASTM, "{grade}");
        }
        let (e, clause, _) = modulus(serde_json::json!({"grade": "S355"}), "en1993-1-1");
        assert_eq!((e, clause.as_str()), (210_000.0, "EN 1993-1-1 3.2.6(1)"));
        let own = serde_json::json!({"fy_mpa": 345, "e_mpa": 210000, "g_mpa": 81000});
        let (e, clause, _) = modulus(own, "csa-s16");
        assert_eq!((e, clause.as_str()), (210_000.0, "custom material"));
        // The whole check reads it: the A992 member is the member of a custom
        // steel with A992's f_y and G and E = 200 000 MPa, bit for bit.
        let (_, _, a992) = modulus(serde_json::json!({"grade": "A992"}), "csa-s16");
        let custom = serde_json::json!({"fy_mpa": a992.strength_mpa, "e_mpa": 200000,
                                        "g_mpa": crate::material::G_ASTM});
        let (_, _, same) = modulus(custom, "csa-s16");
        assert_eq!(a992.resistance_kn, same.resistance_kn);
        assert_eq!(a992.modes, same.modes);
    }

    #[test]
    fn both_forms_agree() {
        for &n in &[1.34, 2.24] {
            for &l in &[0.5, 1.0, 1.5, 3.0] {
                let direct: f64 = (1.0 + f64::powf(l, 2.0 * n)).powf(-1.0 / n);
                assert!((reduction(l, n) - direct).abs() < 1e-14, "{n} {l}");
            }
        }
        // lambda = 1: 2^(-1/n).
        assert!((reduction(1.0, 1.34) - 2f64.powf(-1.0 / 1.34)).abs() < 1e-15);
        assert!(reduction(1e30, 1.34) > 0.0);
    }
}
