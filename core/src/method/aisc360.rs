//! AISC 360-16 Chapter E3: flexural buckling of members without slender
//! elements.
//!
//! F_e = pi^2 E / (L_c / r)^2 (Eq. E3-4); F_cr = 0.658^(F_y / F_e) F_y when
//! L_c / r <= 4.71 sqrt(E / F_y), i.e. F_y / F_e <= 2.25 (Eq. E3-2), else
//! F_cr = 0.877 F_e (Eq. E3-3); P_n = F_cr A_g (Eq. E3-1). LRFD gives
//! phi_c P_n with phi_c = 0.90, ASD P_n / Omega_c with Omega_c = 1.67
//! (E1). A caution is raised when L_c / r exceeds 200 (user note to E2).
//!
//! E5, a single angle loaded at its ends through one leg ([`e5`]): the
//! eccentricity is neglected and the angle checked by E3 (and E7) at an
//! effective slenderness, with L the length between work points and r_a
//! the radius of gyration about the geometric axis parallel to the
//! connected leg. E5(a), individual members and webs of planar trusses:
//! L_c/r = 72 + 0.75 L/r_a for L/r_a <= 80 (Eq. E5-1), else
//! 32 + 1.25 L/r_a (Eq. E5-2). E5(b), webs of box or space trusses:
//! 60 + 0.8 L/r_a for L/r_a <= 75 (Eq. E5-3), else 45 + L/r_a (Eq. E5-4).
//! An unequal angle connected through its shorter leg adds
//! 4[(b_l/b_s)^2 - 1] (a) or 6[(b_l/b_s)^2 - 1] (b), but not below
//! 0.95 L/r_z (a) or 0.82 L/r_z (b). E5 covers angles with L_c/r <= 200
//! and a leg ratio b_l/b_s under 1.7 (beyond, Chapter H); others are
//! refused, as Chapter H is not implemented. Whether 1.7 itself is in
//! for an angle connected through its longer leg is not certain from
//! memory (one recollection of E5(c) says "greater than 1.7"), so it is
//! refused too: the safe side. Flexural-torsional buckling (E4) need not
//! be considered when b/t <= 0.71 sqrt(E/F_y) ([`e5_twist`]); otherwise the concentric
//! E4 mode is kept. The E5 text is recalled from memory of the 2016
//! edition (not checked against a copy here), including: the 200 limit
//! taken on the final value, the 1.7 limits, and the 0.71 sqrt(E/F_y)
//! exemption; the validation file works each branch by hand.

use crate::error::{Error, Result};
use crate::member::{AngleConnection, Leg, Truss};
use crate::method::euler::{
    basics, push_geometry, push_material, require_steel, warn_once, warn_once_text,
};
use crate::method::{Input, Method};
use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::SectionSpec;
use crate::trace::{held, push, step, sym, Scope, Trace};

/// LRFD or ASD.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Basis {
    /// Load and resistance factor design, phi_c = 0.90.
    Lrfd,
    /// Allowable strength design, Omega_c = 1.67.
    Asd,
}

/// phi_c (AISC 360-16 E1(a)).
pub const PHI_C: f64 = 0.90;
/// Omega_c (AISC 360-16 E1(b)).
pub const OMEGA_C: f64 = 1.67;

fn key(basis: Basis) -> &'static str {
    match basis {
        Basis::Lrfd => "aisc360-lrfd",
        Basis::Asd => "aisc360-asd",
    }
}

/// The divisor applied to P_n: 1 / phi_c (LRFD) or Omega_c (ASD).
fn divisor(basis: Basis) -> f64 {
    match basis {
        Basis::Lrfd => 1.0 / PHI_C,
        Basis::Asd => OMEGA_C,
    }
}

/// F_cr of E3-2 / E3-3 for yield stress `fy` and elastic buckling stress `fe`.
pub fn f_cr(fy: f64, fe: f64) -> f64 {
    let ratio = fy / fe;
    let f = if ratio <= 2.25 {
        0.658f64.powf(ratio) * fy
    } else {
        0.877 * fe
    };
    if f.is_finite() {
        f.min(fy)
    } else {
        0.0
    }
}

/// Member-level working.
pub fn prelude(
    input: &Input<'_>,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<()> {
    require_steel(input, key(basis))?;
    push_material(input, trace, warnings);
    match basis {
        Basis::Lrfd => step!(
            trace,
            Scope::Member,
            "phi_c",
            "resistance factor for compression (LRFD)",
            PHI_C,
            "-",
            "AISC 360-16 E1(a)",
        ),
        Basis::Asd => step!(
            trace,
            Scope::Member,
            "Omega_c",
            "safety factor for compression (ASD)",
            OMEGA_C,
            "-",
            "AISC 360-16 E1(b)",
        ),
    }
    if input.member.gamma_m1.is_some() {
        warn_once_text(
            warnings,
            "factor-ignored",
            "gamma_m1 is not used by AISC 360; phi_c or Omega_c of E1 applies",
        );
    }
    match &input.section.spec {
        SectionSpec::I(s) if s.make.is_unstated() => {
            warn_once_text(
                warnings,
                "make-assumed",
                "make not given: the I section is taken as welded, the more slender reading of \
                 AISC 360-16 Table B4.1a (flanges by case 2 with k_c, web h = d - 2t_f), the lower \
                 resistance; give make (rolled or welded) if it is known",
            );
        }
        // B4.2: the design wall of an ERW HSS is 0.93 t_nom. The catalogue
        // applies it; a typed wall is used as it is, and the result says so.
        SectionSpec::Rhs(_) | SectionSpec::Chs(_) if input.section.designation.is_none() => {
            warn_once_text(
                warnings,
                "wall-as-design-thickness",
                "wall_mm is taken as the design wall thickness; for electric-resistance-welded \
                 HSS, AISC 360-16 B4.2 takes 0.93 t_nom: type 0.93 x the nominal wall if so",
            );
        }
        _ => {}
    }
    Ok(())
}

/// Works one axis.
pub fn axis(
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    require_steel(input, key(basis))?;
    let b = basics(input, mode, lcr_mm)?;
    let fe = b.sigma_e_mpa;
    let fcr = f_cr(b.f_mpa, fe);
    let pn = fcr * b.a_mm2 / 1000.0;
    let design = pn / divisor(basis);
    let limit = 4.71 * (b.e_mpa / b.f_mpa).sqrt();
    push_geometry(trace, &b, sym!("AISC 360-16 E2"));
    step!(
        trace,
        b.scope,
        "4.71 sqrt(E/F_y)",
        "limit of inelastic buckling (E3-2)",
        limit,
        "-",
        "AISC 360-16 E3(a)",
    );
    step!(
        trace,
        b.scope,
        "F_e",
        "elastic buckling stress pi^2 E / (L_c/r)^2",
        fe,
        "MPa",
        "AISC 360-16 Eq. E3-4",
    );
    // The branch is chosen on F_y / F_e <= 2.25, as f_cr does (E3(a) gives
    // both forms; they differ only in the third figure of the limit).
    if b.f_mpa / fe <= 2.25 {
        step!(
            trace,
            b.scope,
            "F_cr",
            "critical stress 0.658^(F_y/F_e) F_y",
            fcr,
            "MPa",
            "AISC 360-16 Eq. E3-2",
        );
    } else {
        step!(
            trace,
            b.scope,
            "F_cr",
            "critical stress 0.877 F_e",
            fcr,
            "MPa",
            "AISC 360-16 Eq. E3-3",
        );
    }
    step!(
        trace,
        b.scope,
        "P_n",
        "nominal strength F_cr A_g",
        pn,
        "kN",
        "AISC 360-16 Eq. E3-1",
    );
    match basis {
        Basis::Lrfd => step!(
            trace,
            b.scope,
            "phi_c P_n",
            "design strength (LRFD)",
            design,
            "kN",
            "AISC 360-16 E1(a)",
        ),
        Basis::Asd => step!(
            trace,
            b.scope,
            "P_n/Omega_c",
            "allowable strength (ASD)",
            design,
            "kN",
            "AISC 360-16 E1(b)",
        ),
    }
    if b.slenderness > 200.0 {
        warn_once(warnings, "slenderness-over-200", || {
            format!(
                "L_c/r = {:.0} exceeds 200, the limit the user note to AISC 360-16 E2 recommends",
                b.slenderness
            )
        });
    }
    Ok(ModeResult {
        mode,
        buckling_length_mm: b.lcr_mm,
        slenderness: b.slenderness,
        critical_kn: b.n_cr_kn,
        relative_slenderness: (b.f_mpa / fe).sqrt(),
        reduction: (fcr / b.f_mpa).clamp(f64::MIN_POSITIVE, 1.0),
        resistance_kn: design,
    })
}

/// The connection and basis E5 uses: `Some` for an angle under AISC with
/// `angle_connection`; else `None`, warning when the key is given.
pub fn e5_connection(
    method: Method,
    input: &Input<'_>,
    warnings: &mut Vec<Warning>,
) -> Option<(AngleConnection, Basis)> {
    let c = input.member.angle_connection?;
    let basis = match (method, &input.section.spec) {
        (Method::AiscLrfd, SectionSpec::Angle(_)) => Some(Basis::Lrfd),
        (Method::AiscAsd, SectionSpec::Angle(_)) => Some(Basis::Asd),
        _ => None,
    };
    if let Some(b) = basis {
        return Some((c, b));
    }
    warnings.push(Warning::new(
        "angle-connection-ignored",
        "angle_connection applies to angles under AISC 360 only (E5); ignored",
    ));
    None
}

/// AISC 360-16 E5: the single angle connected through one leg, worked as
/// the minor-axis mode by E3 at the effective slenderness (module docs).
pub fn e5(
    input: &Input<'_>,
    c: AngleConnection,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    // Outside E5: Chapter H, which is not implemented.
    let beyond = |what: &str, v: f64, limit: f64| Error::NotApplicable {
        method: key(basis),
        reason: format!(
            "angle_connection: {what} = {v:.2} is beyond the AISC 360-16 E5 limit {limit} \
             (Chapter H, not covered)"
        ),
    };
    let SectionSpec::Angle(s) = &input.section.spec else {
        return Err(Error::NotApplicable {
            method: key(basis),
            reason: "angle_connection needs an angle".into(),
        });
    };
    let p = &input.section.props;
    let l = input.member.length_mm;
    let (bl, bs) = (s.depth_mm.max(s.width_mm), s.depth_mm.min(s.width_mm));
    let ratio = bl / bs;
    let short = c.leg == Leg::Short && ratio > 1.0;
    if ratio >= 1.7 {
        return Err(beyond("leg ratio b_l/b_s", ratio, 1.7));
    }
    // The depth leg lies along z, so the axis parallel to it is z.
    let i_a = if (c.leg == Leg::Long) == (s.depth_mm >= s.width_mm) {
        p.i_z_mm4
    } else {
        p.i_y_mm4
    };
    let r_a = (i_a / p.area_mm2).sqrt();
    let r_z = p.r_minor_mm;
    let x = l / r_a;
    let planar = c.truss == Truss::Planar;
    let sc = Scope::Minor;
    let (sub, mut lc_r, label, eq) = match (planar, x <= if planar { 80.0 } else { 75.0 }) {
        (true, true) => (
            "AISC 360-16 E5(a)",
            72.0 + 0.75 * x,
            "72 + 0.75 L/r_a",
            "AISC 360-16 Eq. E5-1",
        ),
        (true, false) => (
            "AISC 360-16 E5(a)",
            32.0 + 1.25 * x,
            "32 + 1.25 L/r_a",
            "AISC 360-16 Eq. E5-2",
        ),
        (false, true) => (
            "AISC 360-16 E5(b)",
            60.0 + 0.8 * x,
            "60 + 0.8 L/r_a",
            "AISC 360-16 Eq. E5-3",
        ),
        (false, false) => (
            "AISC 360-16 E5(b)",
            45.0 + x,
            "45 + L/r_a",
            "AISC 360-16 Eq. E5-4",
        ),
    };
    push(trace, sc, "L", "length between work points", l, "mm", sub);
    push(trace, sc, "b_l/b_s", "long over short leg", ratio, "-", sub);
    push(
        trace,
        sc,
        "r_a",
        "r about the geometric axis parallel to the connected leg",
        r_a,
        "mm",
        sub,
    );
    push(
        trace,
        sc,
        "L/r_a",
        "slenderness about that axis",
        x,
        "-",
        sub,
    );
    push(trace, sc, "L_c/r", label, lc_r, "-", eq);
    if short {
        let (f, k, add_label, floor_label) = if planar {
            (
                4.0,
                0.95,
                "shorter leg connected: + 4[(b_l/b_s)^2 - 1]",
                "lower bound 0.95 L/r_z",
            )
        } else {
            (
                6.0,
                0.82,
                "shorter leg connected: + 6[(b_l/b_s)^2 - 1]",
                "lower bound 0.82 L/r_z",
            )
        };
        let add = f * (ratio * ratio - 1.0);
        let floor = k * l / r_z;
        push(trace, sc, "dL_c/r", add_label, add, "-", sub);
        push(
            trace,
            sc,
            "r_z",
            "r about the minor principal axis",
            r_z,
            "mm",
            sub,
        );
        push(trace, sc, "L_c/r,min", floor_label, floor, "-", sub);
        lc_r = (lc_r + add).max(floor);
        push(
            trace,
            sc,
            "L_c/r",
            "effective slenderness used",
            lc_r,
            "-",
            sub,
        );
    }
    if lc_r.is_nan() || lc_r > 200.0 {
        return Err(beyond("L_c/r", lc_r, 200.0));
    }
    warnings.push(Warning::new(
        "e5-conditions",
        "confirm what AISC 360-16 E5 assumes: both ends loaded through the same leg, welded \
         or with 2+ bolts; no transverse load; adjacent truss webs on the same side. \
         L = length_mm (k, lcr unused)",
    ));
    let start = trace.len();
    let r = axis(input, Mode::Minor, lc_r * r_z, basis, trace, warnings)?;
    if let Some(st) = trace.iter_mut().skip(start).find(|st| st.symbol == "L_cr") {
        st.label = held("equivalent length (L_c/r) r_z entering E3");
        st.clause = held(sub);
    }
    Ok(r)
}

/// Whether E4 flexural-torsional buckling is still checked for an E5
/// angle: not when b/t <= 0.71 sqrt(E/F_y), b the longer leg (E5).
pub fn e5_twist(input: &Input<'_>, trace: &mut Trace) -> bool {
    let SectionSpec::Angle(s) = &input.section.spec else {
        return true;
    };
    let (fy, e) = input.material.strength_and_modulus();
    let bt = s.depth_mm.max(s.width_mm) / s.thickness_mm;
    let limit = 0.71 * (e / fy).sqrt();
    let sc = Scope::FlexuralTorsional;
    step!(
        trace,
        sc,
        "b/t",
        "longer leg over thickness",
        bt,
        "-",
        "AISC 360-16 E5",
    );
    step!(
        trace,
        sc,
        "0.71 sqrt(E/F_y)",
        "at or below it flexural-torsional buckling need not be considered",
        limit,
        "-",
        "AISC 360-16 E5",
    );
    bt > limit
}

#[cfg(test)]
mod tests {

    use super::*;

    #[test]
    fn branches_meet_at_2_25() {
        // At F_y/F_e = 2.25 both equations give 0.658^2.25 F_y ~ 0.390 F_y
        // and 0.877 F_e = 0.390 F_y: the curve is continuous (to 3 digits).
        let fy = 345.0;
        let fe = fy / 2.25;
        let a = 0.658f64.powf(2.25) * fy;
        let b = 0.877 * fe;
        assert!((a - b).abs() / a < 2e-3);
        assert!((f_cr(fy, fe) - a).abs() < 1e-9);
        assert_eq!(f_cr(fy, 1e12), fy.min(0.658f64.powf(fy / 1e12) * fy));
    }

    fn member(section: serde_json::Value, method: &str, conn: bool) -> crate::Member {
        let mut v = serde_json::json!({"id": "A1", "section": section,
            "material": {"fy_mpa": 345, "e_mpa": 200000}, "length_mm": 2000,
            "axial_kn": 50, "method": method});
        if conn {
            v["angle_connection"] = serde_json::json!({"leg": "long"});
        }
        serde_json::from_value(v).unwrap()
    }

    fn angle(b: f64, t: f64) -> serde_json::Value {
        serde_json::json!({"kind": "angle", "depth_mm": b, "width_mm": b, "thickness_mm": t})
    }

    fn codes(r: &crate::CheckResult) -> Vec<&'static str> {
        r.warnings.iter().map(|w| w.code).collect()
    }

    #[test]
    fn connection_is_ignored_with_a_warning_off_aisc_or_off_angles() {
        let rhs =
            serde_json::json!({"kind": "rhs", "depth_mm": 100, "width_mm": 100, "wall_mm": 5});
        for (section, method) in [
            (rhs, "aisc360-lrfd"),
            (angle(100.0, 10.0), "en1993-1-1"),
            (angle(100.0, 10.0), "csa-s16"),
        ] {
            let with = crate::check_member(&member(section.clone(), method, true)).unwrap();
            let without = crate::check_member(&member(section, method, false)).unwrap();
            assert!(
                codes(&with).contains(&"angle-connection-ignored"),
                "{method}"
            );
            assert!(!codes(&without).contains(&"angle-connection-ignored"));
            assert_eq!(with.resistance_kn, without.resistance_kn, "{method}");
            assert_eq!(with.trace, without.trace, "{method}");
        }
    }

    #[test]
    fn e5_replaces_the_centroid_warning_and_asks_for_its_conditions() {
        let with = crate::check_member(&member(angle(100.0, 10.0), "aisc360-lrfd", true)).unwrap();
        let without =
            crate::check_member(&member(angle(100.0, 10.0), "aisc360-lrfd", false)).unwrap();
        assert_eq!(codes(&with), ["e5-conditions"]);
        assert_eq!(codes(&without), ["angle-e5-not-applied"]);
        // The eccentric connection costs capacity here.
        assert!(with.resistance_kn < without.resistance_kn);
    }

    #[test]
    fn e4_is_waived_only_up_to_b_over_t_of_0_71_sqrt_e_over_fy() {
        // 0.71 sqrt(200000/345) = 17.09: b/t = 10 waives E4, b/t = 20 keeps it.
        let r = crate::check_member(&member(angle(100.0, 10.0), "aisc360-lrfd", true)).unwrap();
        assert!(r.modes.iter().all(|m| m.mode != Mode::FlexuralTorsional));
        let bt = r
            .trace
            .iter()
            .find(|s| s.symbol == "b/t" && s.clause == "AISC 360-16 E5")
            .unwrap();
        assert_eq!((bt.value, bt.scope), (10.0, Scope::FlexuralTorsional));
        let r = crate::check_member(&member(angle(100.0, 5.0), "aisc360-lrfd", true)).unwrap();
        assert!(r.modes.iter().any(|m| m.mode == Mode::FlexuralTorsional));
        // b/t = 20 > 0.45 sqrt(E/F_y) = 10.8: E7 reduces the E5 mode too.
        let minor = r.modes.iter().find(|m| m.mode == Mode::Minor).unwrap();
        let pn = r
            .trace
            .iter()
            .find(|s| s.scope == Scope::Minor && s.clause == "AISC 360-16 E1(a)")
            .unwrap()
            .value;
        assert!(
            minor.resistance_kn < pn * 0.999,
            "{} vs {pn}",
            minor.resistance_kn
        );
        assert!(r
            .trace
            .iter()
            .any(|s| s.scope == Scope::Minor && s.clause == "AISC 360-16 Eq. E7-1"));
    }

    #[test]
    fn refusals_are_typed_and_name_the_key() {
        let mut m = member(
            serde_json::json!({"kind": "angle", "depth_mm": 200, "width_mm": 100, "thickness_mm": 12}),
            "aisc360-asd",
            true,
        );
        let e = crate::check_member(&m).unwrap_err();
        assert_eq!(e.field(), Some("method"));
        assert!(
            e.to_string()
                .contains("angle_connection: leg ratio b_l/b_s = 2.00"),
            "{e}"
        );
        m.section = serde_json::from_value(angle(100.0, 10.0)).unwrap();
        m.length_mm = 6000.0;
        let e = crate::check_member(&m).unwrap_err().to_string();
        assert!(
            e.contains("angle_connection: L_c/r") && e.contains("limit 200"),
            "{e}"
        );
    }
}
