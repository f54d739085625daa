//! The helpers every method shares: the per-axis basics (area, I, r,
//! strength, modulus, N_pl, N_cr), the trace lines every method starts
//! with, the extreme-fibre distance, the material checks and the
//! once-only warnings.

use std::f64::consts::PI;

use crate::error::{all_positive, positive, Error, Result};
use crate::material::{Material, Steel, Timber};
use crate::method::Input;
use crate::outcome::{Arg, Mode, ModeResult, Warning};
use crate::section::{Family, SectionSpec};
use crate::trace::{step, sym, Scope, Sym, Trace};
use crate::units::Quantity;

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

/// The quantities every method starts an axis from.
#[derive(Debug, Clone, Copy)]
pub struct Basics {
    /// Trace scope of the axis.
    pub scope: Scope,
    /// Buckling length, mm.
    pub lcr_mm: f64,
    /// Area, mm2.
    pub a_mm2: f64,
    /// Second moment about the axis, mm4.
    pub i_mm4: f64,
    /// Radius of gyration about the axis, mm.
    pub r_mm: f64,
    /// Strength (f_y or f_c,0,k), MPa.
    pub f_mpa: f64,
    /// Modulus for buckling (E or E_0,05), MPa.
    pub e_mpa: f64,
    /// Slenderness L_cr / r.
    pub slenderness: f64,
    /// Squash load A f, kN.
    pub n_pl_kn: f64,
    /// Elastic critical load pi^2 E I / L_cr^2, kN (gross section).
    pub n_cr_kn: f64,
    /// Euler stress pi^2 E / (L_cr / r)^2, MPa.
    pub sigma_e_mpa: f64,
}

impl Basics {
    /// The mode result of a first-principles method whose failure stress
    /// is `stress_mpa` (mean stress N/A) and design resistance
    /// `resistance_kn`: the reduction is the stress over the strength and
    /// the relative slenderness sqrt(f / sigma_E).
    pub fn stress_mode(&self, mode: Mode, stress_mpa: f64, resistance_kn: f64) -> ModeResult {
        ModeResult {
            mode,
            buckling_length_mm: self.lcr_mm,
            slenderness: self.slenderness,
            critical_kn: self.n_cr_kn,
            relative_slenderness: (self.f_mpa / self.sigma_e_mpa).sqrt(),
            reduction: (stress_mpa / self.f_mpa).clamp(f64::MIN_POSITIVE, 1.0),
            resistance_kn,
        }
    }
}

/// Checks the inputs of an axis and works its basics (no trace, no allocation).
#[inline]
pub fn basics(input: &Input<'_>, mode: Mode, lcr_mm: f64) -> Result<Basics> {
    let (f, e) = input.material.strength_and_modulus();
    let a = input.section.props.area_mm2;
    let (i, r) = axis_props(input, mode);
    // The usual case first, every value tested at once: the smallest above
    // zero and the sum finite (no NaN, no infinity; a sum that overflows
    // takes the steps below, which pass it). The steps name the first
    // value that is not finite and above zero.
    if all_positive([lcr_mm, f, e, a, i, r]) {
        return Ok(basics_of(mode, lcr_mm, a, i, r, f, e));
    }
    let lcr = positive("lcr_mm", lcr_mm)?;
    let f = positive("strength", f)?;
    let e = positive("modulus", e)?;
    let a = positive("area_mm2", a)?;
    let i = positive(
        match mode {
            Mode::Major => "i_major_mm4",
            _ => "i_minor_mm4",
        },
        i,
    )?;
    let r = positive(
        match mode {
            Mode::Major => "r_major_mm",
            _ => "r_minor_mm",
        },
        r,
    )?;
    Ok(basics_of(mode, lcr, a, i, r, f, e))
}

/// [`basics`] of values already checked.
#[inline]
fn basics_of(mode: Mode, lcr: f64, a: f64, i: f64, r: f64, f: f64, e: f64) -> Basics {
    let slenderness = lcr / r;
    let sigma_e = PI * PI * e / (slenderness * slenderness);
    Basics {
        scope: scope_of(mode),
        lcr_mm: lcr,
        a_mm2: a,
        i_mm4: i,
        r_mm: r,
        f_mpa: f,
        e_mpa: e,
        slenderness,
        n_pl_kn: a * f / 1000.0,
        // From I, not sigma_E A: when the check substitutes an effective
        // area (EN 1993-1-1 6.3.1.1(3), Class 4), N_cr stays that of the
        // gross section, as Eq. 6.51 wants.
        n_cr_kn: euler_n(e, i, lcr) / 1000.0,
        sigma_e_mpa: sigma_e,
    }
}

/// Pushes the geometry lines every method starts an axis with.
#[inline]
pub fn push_geometry(trace: &mut Trace, b: &Basics, clause: Sym) {
    step!(
        trace,
        b.scope,
        "L_cr",
        "buckling length",
        b.lcr_mm,
        "mm",
        "input",
    );
    step!(
        trace,
        b.scope,
        "i",
        "radius of gyration",
        b.r_mm,
        "mm",
        "section",
    );
    step!(
        trace,
        b.scope,
        "L_cr/i",
        "slenderness",
        b.slenderness,
        "-",
        clause,
    );
}

/// Whether a warning with `code` is already in the list.
pub fn has_warning(warnings: &[Warning], code: &str) -> bool {
    warnings.iter().any(|w| w.code == code)
}

/// Adds a warning unless one with the same code is there already; the
/// message is only built when it is added.
pub fn warn_once(
    warnings: &mut Vec<Warning>,
    code: &'static str,
    message: impl FnOnce() -> String,
) {
    if !has_warning(warnings, code) {
        warnings.push(Warning::new(code, message()));
    }
}

/// [`warn_once`] of a warning made by `make` (one with arguments,
/// [`Warning::with_args`]), made only when its code is new.
pub fn warn_once_with(
    warnings: &mut Vec<Warning>,
    code: &'static str,
    make: impl FnOnce() -> Warning,
) {
    if !has_warning(warnings, code) {
        warnings.push(make());
    }
}

/// [`warn_once`] with a fixed text, kept without allocating.
pub fn warn_once_text(warnings: &mut Vec<Warning>, code: &'static str, message: &'static str) {
    if !has_warning(warnings, code) {
        warnings.push(Warning::new(code, message));
    }
}

/// The steel of the input, or `NotApplicable` for timber.
pub fn require_steel<'a>(input: &Input<'a>, method: &'static str) -> Result<&'a Steel> {
    match input.material {
        Material::Steel(s) => Ok(s),
        Material::Timber(t) => Err(Error::NotApplicable {
            method,
            reason: format!(
                "it is a steel design method and the material is timber ({}); use \"en1995-1-1\" \
                 for timber, or give a steel grade",
                t.name
            ),
        }),
    }
}

/// The timber of the input, or `NotApplicable` for steel.
pub fn require_timber<'a>(input: &Input<'a>, method: &'static str) -> Result<&'a Timber> {
    match input.material {
        Material::Timber(t) => Ok(t),
        Material::Steel(s) => Err(Error::NotApplicable {
            method,
            reason: format!(
                "it is a timber design method and the material is steel ({}); use a steel method \
                 such as \"en1993-1-1\", or give a timber class such as \"C24\"",
                s.name
            ),
        }),
    }
}

/// Distance from the centroidal axis to the extreme fibre, mm: I / W_el
/// when the section gives W_el, otherwise from the dimensions, and for
/// typed properties sqrt(3) r (the ratio of a solid rectangle), with a
/// warning.
pub fn extreme_fibre_mm(input: &Input<'_>, mode: Mode, warnings: &mut Vec<Warning>) -> f64 {
    let p = &input.section.props;
    let (i, r) = axis_props(input, mode);
    let w = match mode {
        Mode::Major => p.w_el_major_mm3,
        _ => p.w_el_minor_mm3,
    };
    if all_positive([w]) && all_positive([i]) {
        return i / w;
    }
    let major = matches!(mode, Mode::Major);
    let half = |a: f64, b: f64| {
        if major {
            a.max(b) / 2.0
        } else {
            a.min(b) / 2.0
        }
    };
    let from_dims = match &input.section.spec {
        SectionSpec::Rect(s) => Some(half(s.depth_mm, s.width_mm)),
        SectionSpec::Rhs(s) => Some(half(s.depth_mm, s.width_mm)),
        SectionSpec::Round(s) => Some(s.diameter_mm / 2.0),
        SectionSpec::Chs(s) => Some(s.diameter_mm / 2.0),
        SectionSpec::I(s) => Some(if major {
            s.depth_mm / 2.0
        } else {
            s.width_mm / 2.0
        }),
        _ => None,
    };
    match from_dims {
        Some(c) if c.is_finite() && c > 0.0 => c,
        _ => {
            warn_once_text(
                warnings,
                "extreme-fibre-assumed",
                "the section does not give its elastic modulus, so the extreme-fibre distance is \
                 taken as sqrt(3) i (a solid rectangle); the bow or eccentricity effect may be \
                 under- or over-stated",
            );
            3f64.sqrt() * r
        }
    }
}

/// The strength symbol and label for the material.
pub fn strength_label(material: &Material) -> (&'static str, &'static str) {
    match material {
        Material::Steel(_) => ("f_y", "yield strength"),
        Material::Timber(_) => (
            "f_c,0,k",
            "characteristic compressive strength parallel to grain",
        ),
    }
}

/// Where a steel's modulus comes from.
fn modulus_source(s: &Steel) -> Sym {
    // A grade's 200 000 MPa is CSA S16-19's (a CSA grade's own, or any
    // grade read by CSA S16-19) and its 29 000 ksi AISC 360-16's (an ASTM
    // grade's own, or any grade read by AISC 360-16): `method::material_for`.
    if s.name == "custom" {
        sym!("custom material")
    } else if s.e_mpa == crate::material::E_CSA {
        sym!("CSA S16-19 clause 2 (E = 200 000 MPa)")
    } else if s.e_mpa == crate::material::E_ASTM {
        sym!("AISC 360-16 (E = 29 000 ksi)")
    } else if s.standard.starts_with("EN") {
        sym!("EN 1993-1-1 3.2.6(1)")
    } else {
        sym!("the grade's standard")
    }
}

/// Pushes the material and section lines of a prelude: thickness (steel
/// grades), strength, modulus, area and squash load; and warns when a
/// graded steel's thickness is unknown.
pub fn push_material(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) {
    let (f, e) = input.material.strength_and_modulus();
    let a = input.section.props.area_mm2;
    match input.material {
        Material::Steel(s) => {
            if s.name != "custom" {
                let standard = s.standard;
                step!(
                    trace,
                    Scope::Member,
                    "t",
                    "governing thickness for f_y",
                    s.thickness_mm,
                    "mm",
                    standard,
                );
                step!(
                    trace,
                    Scope::Member,
                    "f_y",
                    "yield strength for that thickness",
                    f,
                    "MPa",
                    standard,
                );
                if s.thickness_mm <= 0.0 && s.band_up_to_mm.is_finite() {
                    warn_once_with(warnings, "thickness-unknown", || {
                        Warning::with_args(
                            "thickness-unknown",
                            "the section does not tell its plate thickness, so f_y = {} of {} \
                             for t <= {} is used; give a custom fy_mpa if the section is thicker",
                            &[
                                Arg::figure(f, Quantity::Stress, Warning::AS_GIVEN),
                                Arg::Word(s.name),
                                Arg::figure(s.band_up_to_mm, Quantity::Length, Warning::AS_GIVEN),
                            ],
                        )
                    });
                }
            } else {
                step!(
                    trace,
                    Scope::Member,
                    "f_y",
                    "yield strength",
                    f,
                    "MPa",
                    "custom material",
                );
            }
            step!(
                trace,
                Scope::Member,
                "E",
                "modulus of elasticity",
                e,
                "MPa",
                modulus_source(s),
            );
            if s.name.starts_with("A500")
                && !matches!(input.section.family, Family::Chs | Family::Rhs)
            {
                warn_once_with(warnings, "a500-shape-unknown", || {
                    Warning::with_args(
                        "a500-shape-unknown",
                        "ASTM A500 sets F_y by the hollow section's shape (round or shaped); this \
                         section is neither, so the lower, round value F_y = {} is used",
                        &[Arg::figure(f, Quantity::Stress, 0)],
                    )
                });
            }
        }
        Material::Timber(t) => {
            let standard = t.standard;
            step!(
                trace,
                Scope::Member,
                "f_c,0,k",
                "characteristic compressive strength parallel to grain",
                f,
                "MPa",
                standard,
            );
            step!(
                trace,
                Scope::Member,
                "E_0,05",
                "fifth-percentile modulus",
                e,
                "MPa",
                standard,
            );
        }
    }
    step!(trace, Scope::Member, "A", "gross area", a, "mm2", "section");
    step!(
        trace,
        Scope::Member,
        "N_pl",
        "squash load A f",
        a * f / 1000.0,
        "kN",
        "N_pl = A f",
    );
}

/// The optional factor of the first-principles methods and its trace line.
pub fn push_optional_factor(input: &Input<'_>, trace: &mut Trace) -> f64 {
    match input.member.gamma_m1 {
        Some(g) => {
            step!(
                trace,
                Scope::Member,
                "gamma",
                "factor on the resistance (given)",
                g,
                "-",
                "input gamma_m1",
            );
            g
        }
        None => {
            step!(
                trace,
                Scope::Member,
                "gamma",
                "factor on the resistance (none given: 1)",
                1.0,
                "-",
                "input gamma_m1",
            );
            1.0
        }
    }
}

/// Warns once that a first-principles method runs on timber without the
/// timber code's modification and partial factors.
pub fn warn_timber_first_principles(input: &Input<'_>, warnings: &mut Vec<Warning>) {
    if let Material::Timber(_) = input.material {
        warn_once_text(warnings, "timber-first-principles", "a first-principles method on timber uses f_c,0,k and E_0,05 as they are, without k_mod \
             or gamma_M; use \"en1995-1-1\" for a design check");
    }
}

/// The divisor of the default initial bow (Perry-Robertson) and load
/// eccentricity (secant) when the member gives none: e = L_cr / 200, the
/// equivalent bow e_0/L of EN 1993-1-1 Table 5.1 for buckling curve c in an
/// elastic analysis (the table's elastic column: a0 1/350, a 1/300, b
/// 1/250, c 1/200, d 1/150; recalled from memory). A fabrication tolerance
/// (about L/1000, EN 1090-2, recalled) is far smaller than the imperfection
/// the codes' buckling curves build in, so it would give a resistance above
/// theirs; the open choice is read on the safe side and the result says so
/// (`imperfection-default`).
pub const DEFAULT_IMPERFECTION_DIVISOR: f64 = 200.0;

/// Member-level warnings of every first-principles method (Euler,
/// Perry-Robertson, secant): the result is an estimate, not a design
/// code's resistance (`first-principles-estimate`); Euler's is an upper
/// bound (`euler-upper-bound`); Perry-Robertson's and the secant's default
/// imperfection, when the member gives none (`imperfection-default`). Fixed
/// texts: nothing is formatted or allocated for the texts themselves.
pub fn warn_first_principles(
    method: crate::member::Method,
    input: &Input<'_>,
    warnings: &mut Vec<Warning>,
) {
    use crate::member::Method;
    // Perry-Robertson and the secant formula share their wording, told
    // apart by the words in front and the key.
    macro_rules! estimate {
        ($what:literal) => {
            concat!(
                $what,
                " no partial or resistance factor is applied unless gamma_m1 is given. The design \
                 resistance is what a code method gives (en1993-1-1, aisc360-lrfd, aisc360-asd, \
                 csa-s16, en1995-1-1)"
            )
        };
    }
    macro_rules! default_imperfection {
        ($key:literal, $what:literal) => {
            concat!(
                $key,
                " is not given, so ",
                $what,
                " is taken as L_cr / 200, the equivalent bow of EN 1993-1-1 Table 5.1 for buckling \
                 curve c in an elastic analysis (1/350 to 1/150 from curve a0 to d); a fabrication \
                 tolerance (about L/1000) is far smaller than the imperfection the codes' buckling \
                 curves build in and would overstate the resistance. Give ",
                $key,
                " for another value"
            )
        };
    }
    let (estimate, default) = match method {
        Method::Euler => (
            "Euler's critical load capped at the squash load is an upper bound, not a design \
             resistance: it is the load of a perfectly straight, centrally loaded elastic member \
             without imperfection or residual stress, and no partial or resistance factor is \
             applied unless gamma_m1 is given; real members fail below it. The design resistance \
             is what a code method gives (en1993-1-1, aisc360-lrfd, aisc360-asd, csa-s16, \
             en1995-1-1)",
            None,
        ),
        Method::PerryRobertson => (
            estimate!(
                "Perry-Robertson is a first-principles estimate (first yield of a bowed, pin-ended \
                 strut), not a design-code resistance:"
            ),
            input
                .member
                .bow_mm
                .is_none()
                .then_some(default_imperfection!("bow_mm", "the initial bow")),
        ),
        Method::Secant => (
            estimate!(
                "the secant formula is a first-principles estimate (first yield of an \
                 eccentrically loaded, pin-ended strut), not a design-code resistance:"
            ),
            input
                .member
                .eccentricity_mm
                .is_none()
                .then_some(default_imperfection!(
                    "eccentricity_mm",
                    "the load's eccentricity"
                )),
        ),
        _ => return,
    };
    let code = if method == Method::Euler {
        "euler-upper-bound"
    } else {
        "first-principles-estimate"
    };
    warn_once_text(warnings, code, estimate);
    if let Some(text) = default {
        warn_once_text(warnings, "imperfection-default", text);
    }
}

/// Whether the section is a hot-finished hollow section (Table 6.2, S16 class H).
pub fn is_hot_finished_hollow(input: &Input<'_>) -> bool {
    use crate::section::HollowMake;
    match &input.section.spec {
        SectionSpec::Rhs(s) => s.make == HollowMake::HotFinished,
        SectionSpec::Chs(s) => s.make == HollowMake::HotFinished,
        _ => false,
    }
}

/// Whether the section is a hollow section whose make the member file does
/// not give (read as cold-formed: the lower resistance).
pub fn hollow_make_unstated(input: &Input<'_>) -> bool {
    use crate::section::HollowMake;
    match &input.section.spec {
        SectionSpec::Rhs(s) => s.make == HollowMake::Unstated,
        SectionSpec::Chs(s) => s.make == HollowMake::Unstated,
        _ => false,
    }
}

/// Whether the section family is a hollow one.
pub fn is_hollow(input: &Input<'_>) -> bool {
    matches!(input.section.family, Family::Rhs | Family::Chs)
}

/// Euler load `pi^2 E I / L^2`, N (E in MPa, I in mm4, L in mm): the one
/// definition the methods, the twisting modes and the beam-column
/// amplifications (B1's P_e1, U_1's C_e) share.
pub fn euler_n(e_mpa: f64, i_mm4: f64, l_mm: f64) -> f64 {
    PI * PI * e_mpa * i_mm4 / (l_mm * l_mm)
}
