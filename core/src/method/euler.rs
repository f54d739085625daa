//! Euler's elastic critical load with the squash load as the cap: the
//! idealised envelope of a perfect, straight, centrally loaded column.
//!
//! N_cr = pi^2 E I / L_cr^2 (Euler 1744; closed form, any structural
//! mechanics text), N_pl = A f_y, resistance min(N_cr, N_pl) / gamma.

use std::f64::consts::PI;

use crate::check::{Mode, ModeResult, Warning};
use crate::error::Result;
use crate::method::Input;
use crate::trace::{push, Scope, Trace};

/// Scope of the trace for an axis mode.
pub fn scope_of(mode: Mode) -> Scope {
    match mode {
        Mode::Major => Scope::Major,
        Mode::Minor => Scope::Minor,
        Mode::Torsional => Scope::Torsional,
        Mode::FlexuralTorsional => Scope::FlexuralTorsional,
        Mode::Section => Scope::Section,
    }
}

/// Second moment and radius of gyration of the section about a mode's axis.
pub fn axis_props(input: &Input<'_>, mode: Mode) -> (f64, f64) {
    let p = &input.section.props;
    match mode {
        Mode::Major => (p.i_major_mm4, p.r_major_mm),
        _ => (p.i_minor_mm4, p.r_minor_mm),
    }
}

/// Member-level working: squash load and the optional factor.
pub fn prelude(input: &Input<'_>, trace: &mut Trace, _warnings: &mut Vec<Warning>) -> Result<()> {
    let (f, _) = input.material.strength_and_modulus();
    let a = input.section.props.area_mm2;
    push(trace, Scope::Member, "A", "gross area", a, "mm2", "section");
    push(trace, Scope::Member, "f_y", "yield strength", f, "MPa", "material");
    push(trace, Scope::Member, "N_pl", "squash load A f_y", a * f / 1000.0, "kN", "N_pl = A f_y");
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
    let scope = scope_of(mode);
    let (f, e) = input.material.strength_and_modulus();
    let a = input.section.props.area_mm2;
    let (i, r) = axis_props(input, mode);
    let gamma = input.member.gamma_m1.unwrap_or(1.0);
    let n_pl = a * f / 1000.0;
    let n_cr = PI * PI * e * i / (lcr_mm * lcr_mm) / 1000.0;
    let slenderness = lcr_mm / r;
    let lambda_rel = (n_pl / n_cr).sqrt();
    let n_fail = n_cr.min(n_pl);
    let resistance = n_fail / gamma;
    push(trace, scope, "L_cr", "buckling length", lcr_mm, "mm", "input");
    push(trace, scope, "L_cr/i", "slenderness", slenderness, "-", "L_cr / i");
    push(trace, scope, "N_cr", "Euler critical load", n_cr, "kN", "N_cr = pi^2 E I / L_cr^2");
    push(trace, scope, "N_R", "resistance min(N_cr, N_pl)/gamma", resistance, "kN", "idealised envelope");
    Ok(ModeResult {
        mode,
        buckling_length_mm: lcr_mm,
        slenderness,
        critical_kn: n_cr,
        relative_slenderness: lambda_rel,
        reduction: n_fail / n_pl,
        resistance_kn: resistance,
    })
}
