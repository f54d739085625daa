//! AISC 360-16 Chapter E3: flexural buckling of members without slender
//! elements.
//!
//! F_e = pi^2 E / (L_c / r)^2 (Eq. E3-4); F_cr = 0.658^(F_y / F_e) F_y when
//! L_c / r <= 4.71 sqrt(E / F_y), i.e. F_y / F_e <= 2.25 (Eq. E3-2), else
//! F_cr = 0.877 F_e (Eq. E3-3); P_n = F_cr A_g (Eq. E3-1). LRFD gives
//! phi_c P_n with phi_c = 0.90, ASD P_n / Omega_c with Omega_c = 1.67
//! (E1). A caution is raised when L_c / r exceeds 200 (user note to E2).

use crate::check::{Mode, ModeResult, Warning};
use crate::error::Result;
use crate::method::euler::{basics, push_geometry, push_material, require_steel, warn_once};
use crate::method::Input;
use crate::trace::{push, Scope, Trace};

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
        Basis::Lrfd => push(
            trace,
            Scope::Member,
            "phi_c",
            "resistance factor for compression (LRFD)",
            PHI_C,
            "-",
            "AISC 360-16 E1(a)",
        ),
        Basis::Asd => push(
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
        warn_once(warnings, "factor-ignored", || {
            "gamma_m1 is not used by AISC 360; phi_c or Omega_c of E1 applies".to_string()
        });
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
    push_geometry(trace, &b, "AISC 360-16 E2");
    push(
        trace,
        b.scope,
        "4.71 sqrt(E/F_y)",
        "limit of inelastic buckling (E3-2)",
        limit,
        "-",
        "AISC 360-16 E3(a)",
    );
    push(
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
        push(
            trace,
            b.scope,
            "F_cr",
            "critical stress 0.658^(F_y/F_e) F_y",
            fcr,
            "MPa",
            "AISC 360-16 Eq. E3-2",
        );
    } else {
        push(
            trace,
            b.scope,
            "F_cr",
            "critical stress 0.877 F_e",
            fcr,
            "MPa",
            "AISC 360-16 Eq. E3-3",
        );
    }
    push(
        trace,
        b.scope,
        "P_n",
        "nominal strength F_cr A_g",
        pn,
        "kN",
        "AISC 360-16 Eq. E3-1",
    );
    match basis {
        Basis::Lrfd => push(
            trace,
            b.scope,
            "phi_c P_n",
            "design strength (LRFD)",
            design,
            "kN",
            "AISC 360-16 E1(a)",
        ),
        Basis::Asd => push(
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

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]

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
}
