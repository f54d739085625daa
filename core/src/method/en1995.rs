//! EN 1995-1-1:2004 6.3.2: columns of solid or glued laminated timber in
//! compression.
//!
//! lambda_rel = (lambda / pi) sqrt(f_c,0,k / E_0,05) (Eqs. 6.21, 6.22),
//! k = 0.5 [1 + beta_c (lambda_rel - 0.3) + lambda_rel^2] (Eqs. 6.27,
//! 6.28), k_c = 1 / (k + sqrt(k^2 - lambda_rel^2)) (Eqs. 6.25, 6.26),
//! beta_c = 0.2 solid, 0.1 glulam (Eq. 6.29); k_c = 1 for lambda_rel <=
//! 0.3 (6.3.2(2)). f_c,0,d = k_mod f_c,0,k / gamma_M (2.4.1 Eq. 2.14) with
//! k_mod from Table 3.1 by service class and load duration and gamma_M
//! from Table 2.3 (recommended values; the national annex may differ).
//! Resistance k_c f_c,0,d A.

use std::f64::consts::PI;

use crate::error::{Error, Result};
use crate::material::TimberKind;
use crate::member::LoadDuration;
use crate::method::euler::{
    basics, push_geometry, push_material, require_timber, warn_once, warn_once_text,
};
use crate::method::Input;
use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::Family;
use crate::trace::{step, sym, Scope, Sym, Trace};

const KEY: &str = "en1995-1-1";

/// k_mod of EN 1995-1-1 Table 3.1 for solid timber (EN 14081-1) and glulam
/// (EN 14080), which share one row: service classes 1 and 2 permanent
/// 0.60, long 0.70, medium 0.80, short 0.90, instantaneous 1.10; service
/// class 3 0.50, 0.55, 0.65, 0.70, 0.90 (recalled from memory).
pub fn k_mod(service_class: u8, duration: LoadDuration) -> f64 {
    let sc3 = service_class >= 3;
    match (duration, sc3) {
        (LoadDuration::Permanent, false) => 0.60,
        (LoadDuration::Long, false) => 0.70,
        (LoadDuration::Medium, false) => 0.80,
        (LoadDuration::Short, false) => 0.90,
        (LoadDuration::Instantaneous, false) => 1.10,
        (LoadDuration::Permanent, true) => 0.50,
        (LoadDuration::Long, true) => 0.55,
        (LoadDuration::Medium, true) => 0.65,
        (LoadDuration::Short, true) => 0.70,
        (LoadDuration::Instantaneous, true) => 0.90,
    }
}

/// gamma_M of EN 1995-1-1 Table 2.3 (recommended values): solid timber 1.3,
/// glued laminated timber 1.25.
pub fn gamma_m(kind: TimberKind) -> f64 {
    match kind {
        TimberKind::Solid => 1.3,
        TimberKind::Glulam => 1.25,
    }
}

/// beta_c of EN 1995-1-1 Eq. 6.29: 0.2 solid, 0.1 glulam.
pub fn beta_c(kind: TimberKind) -> f64 {
    match kind {
        TimberKind::Solid => 0.2,
        TimberKind::Glulam => 0.1,
    }
}

/// k_c of Eqs. 6.25-6.28 (1 for lambda_rel <= 0.3).
pub fn k_c(lambda_rel: f64, beta: f64) -> f64 {
    if lambda_rel.is_nan() || lambda_rel <= 0.3 {
        return 1.0;
    }
    let k = 0.5 * (1.0 + beta * (lambda_rel - 0.3) + lambda_rel * lambda_rel);
    let root = (k * k - lambda_rel * lambda_rel).max(0.0).sqrt();
    let c = 1.0 / (k + root);
    if c.is_finite() {
        c.clamp(f64::MIN_POSITIVE, 1.0)
    } else {
        f64::MIN_POSITIVE
    }
}

fn duration_label(d: LoadDuration, given_sc: bool, given_d: bool) -> Sym {
    match (d, given_sc || given_d) {
        (LoadDuration::Permanent, _) => sym!("modification factor, permanent load"),
        (LoadDuration::Long, _) => sym!("modification factor, long-term load"),
        (LoadDuration::Medium, true) => sym!("modification factor, medium-term load"),
        (LoadDuration::Medium, false) => {
            sym!("modification factor, medium-term load, service class 1 (defaults)")
        }
        (LoadDuration::Short, _) => sym!("modification factor, short-term load"),
        (LoadDuration::Instantaneous, _) => sym!("modification factor, instantaneous load"),
    }
}

/// The design strength f_c,0,d and its factors (k_mod, gamma_M, whether
/// gamma_M was given): k_mod of Table 3.1 for the member's service class
/// and load duration (defaults 1 and medium-term), gamma_M of Table 2.3 or
/// `gamma_m1`. The bending and the interaction of EN 1995-1-1 take k_mod
/// and gamma_M from here.
pub fn design_strength(input: &Input<'_>, kind: TimberKind, fc0k: f64) -> (f64, f64, f64, bool) {
    let sc = input.member.service_class.unwrap_or(1);
    let d = input.member.load_duration.unwrap_or(LoadDuration::Medium);
    let km = k_mod(sc, d);
    let (g, given) = match input.member.gamma_m1 {
        Some(g) => (g, true),
        None => (gamma_m(kind), false),
    };
    (km * fc0k / g, km, g, given)
}

/// The code of the warning that service class or load duration was taken.
const DEFAULTS_CODE: &str = "timber-defaults-assumed";

/// [`defaults_message`] when neither service class nor load duration is
/// given (service class 1, medium-term loading, k_mod 0.80).
const DEFAULTS_TAKEN: &str = "service class 1 and medium-term loading are taken (k_mod = 0.80, \
     EN 1995-1-1 Table 3.1) because the member does not give service_class or load_duration; a \
     longer load duration or service class 3 gives less (down to 0.50): give service_class and \
     load_duration";

/// Why the warning `timber-defaults-assumed` is given: the service class
/// `sc` and load duration `d` taken, their k_mod and which was not given.
fn defaults_message(sc: u8, d: LoadDuration, km: f64, no_class: bool, no_duration: bool) -> String {
    format!(
        "service class {sc} and {} loading are taken (k_mod = {km:.2}, EN 1995-1-1 Table \
         3.1) because the member does not give {}; a longer load duration or service \
         class 3 gives less (down to 0.50): give service_class and load_duration",
        match d {
            LoadDuration::Permanent => "permanent",
            LoadDuration::Long => "long-term",
            LoadDuration::Medium => "medium-term",
            LoadDuration::Short => "short-term",
            LoadDuration::Instantaneous => "instantaneous",
        },
        match (no_class, no_duration) {
            (true, true) => "service_class or load_duration",
            (true, false) => "service_class",
            _ => "load_duration",
        }
    )
}

/// Member-level working.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<()> {
    let t = require_timber(input, KEY)?;
    if !matches!(
        input.section.family,
        Family::Rect | Family::Round | Family::Given
    ) {
        return Err(Error::NotApplicable {
            method: KEY,
            reason: "timber columns are checked for solid rectangular or round sections, or typed \
                     properties; choose \"rect\", \"round\" or \"given\""
                .to_string(),
        });
    }
    push_material(input, trace, warnings);
    let sc = input.member.service_class.unwrap_or(1);
    let d = input.member.load_duration.unwrap_or(LoadDuration::Medium);
    let (fc0d, km, g, given) = design_strength(input, t.kind, t.fc0k_mpa);
    // The defaults are not the lowest k_mod of Table 3.1 (permanent load,
    // service class 3: 0.50): say what was taken.
    let (no_class, no_duration) = (
        input.member.service_class.is_none(),
        input.member.load_duration.is_none(),
    );
    if no_class && no_duration {
        // Both taken (the usual case): the text is fixed, so it is not
        // formatted afresh for every check (a test holds it to the format).
        warn_once_text(warnings, DEFAULTS_CODE, DEFAULTS_TAKEN);
    } else if no_class || no_duration {
        warn_once(warnings, DEFAULTS_CODE, || {
            defaults_message(sc, d, km, no_class, no_duration)
        });
    }
    step!(
        trace,
        Scope::Member,
        "service class",
        "service class (default 1)",
        f64::from(sc),
        "-",
        "EN 1995-1-1 2.3.1.3",
    );
    step!(
        trace,
        Scope::Member,
        "k_mod",
        duration_label(
            d,
            input.member.service_class.is_some(),
            input.member.load_duration.is_some(),
        ),
        km,
        "-",
        "EN 1995-1-1 Table 3.1",
    );
    step!(
        trace,
        Scope::Member,
        "gamma_M",
        match (given, t.kind) {
            (true, _) => sym!("partial factor for the material (given)"),
            (false, TimberKind::Solid) => {
                sym!("partial factor, solid timber (recommended; the national annex may differ)")
            }
            (false, TimberKind::Glulam) => {
                sym!("partial factor, glulam (recommended; the national annex may differ)")
            }
        },
        g,
        "-",
        "EN 1995-1-1 Table 2.3",
    );
    step!(
        trace,
        Scope::Member,
        "f_c,0,d",
        "design compressive strength k_mod f_c,0,k / gamma_M",
        fc0d,
        "MPa",
        "EN 1995-1-1 Eq. 2.14",
    );
    step!(
        trace,
        Scope::Member,
        "beta_c",
        match t.kind {
            TimberKind::Solid => sym!("straightness factor, solid timber"),
            TimberKind::Glulam => sym!("straightness factor, glued laminated timber"),
        },
        beta_c(t.kind),
        "-",
        "EN 1995-1-1 Eq. 6.29",
    );
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
    let t = require_timber(input, KEY)?;
    let b = basics(input, mode, lcr_mm)?;
    let beta = beta_c(t.kind);
    let lambda_rel = b.slenderness / PI * (t.fc0k_mpa / t.e005_mpa).sqrt();
    let k = 0.5 * (1.0 + beta * (lambda_rel - 0.3) + lambda_rel * lambda_rel);
    let kc = k_c(lambda_rel, beta);
    let (fc0d, _, _, _) = design_strength(input, t.kind, t.fc0k_mpa);
    let resistance = kc * fc0d * b.a_mm2 / 1000.0;
    push_geometry(trace, &b, sym!("EN 1995-1-1 6.3.2 (lambda)"));
    step!(
        trace,
        b.scope,
        "lambda_rel",
        "relative slenderness (lambda/pi) sqrt(f_c,0,k / E_0,05)",
        lambda_rel,
        "-",
        "EN 1995-1-1 Eqs. 6.21, 6.22",
    );
    if lambda_rel <= 0.3 {
        step!(
            trace,
            b.scope,
            "k_c",
            "instability factor: lambda_rel <= 0.3",
            kc,
            "-",
            "EN 1995-1-1 6.3.2(2)",
        );
    } else {
        step!(
            trace,
            b.scope,
            "k",
            "0.5 [1 + beta_c (lambda_rel - 0.3) + lambda_rel^2]",
            k,
            "-",
            "EN 1995-1-1 Eqs. 6.27, 6.28",
        );
        step!(
            trace,
            b.scope,
            "k_c",
            "instability factor 1 / (k + sqrt(k^2 - lambda_rel^2))",
            kc,
            "-",
            "EN 1995-1-1 Eqs. 6.25, 6.26",
        );
    }
    step!(
        trace,
        b.scope,
        "N_cr",
        "elastic critical load with E_0,05",
        b.n_cr_kn,
        "kN",
        "pi^2 E_0,05 I / L^2",
    );
    step!(
        trace,
        b.scope,
        "N_Rd",
        "resistance k_c f_c,0,d A",
        resistance,
        "kN",
        "EN 1995-1-1 Eqs. 6.23, 6.24",
    );
    Ok(ModeResult {
        mode,
        buckling_length_mm: b.lcr_mm,
        slenderness: b.slenderness,
        critical_kn: b.n_cr_kn,
        relative_slenderness: lambda_rel,
        reduction: kc,
        resistance_kn: resistance,
    })
}

#[cfg(test)]
mod tests {

    use super::*;
    use crate::check::Prepared;
    use crate::method::euler::tests::member;
    use crate::method::Method;

    #[test]
    fn fixed_defaults_text_is_the_formatted_one() {
        assert_eq!(
            DEFAULTS_TAKEN,
            defaults_message(
                1,
                LoadDuration::Medium,
                k_mod(1, LoadDuration::Medium),
                true,
                true
            )
        );
    }

    #[test]
    fn refuses_steel_and_accepts_timber() {
        let mut t = Trace::new();
        let mut w = Vec::new();
        let p = Prepared::new(&member(Method::En1995, "S355")).unwrap();
        assert!(matches!(
            prelude(&p.input(), &mut t, &mut w),
            Err(Error::NotApplicable {
                method: "en1995-1-1",
                ..
            })
        ));
        let p = Prepared::new(&member(Method::En1995, "C24")).unwrap();
        prelude(&p.input(), &mut t, &mut w).unwrap();
        let r = axis(&p.input(), Mode::Minor, 2000.0, &mut t, &mut w).unwrap();
        assert!(r.reduction > 0.0 && r.reduction < 1.0);
    }

    #[test]
    fn plateau() {
        assert_eq!(k_c(0.3, 0.2), 1.0);
        assert!(k_c(0.31, 0.2) < 1.0);
        assert!(k_c(1.0, 0.1) > k_c(1.0, 0.2));
    }
}
