//! CSA S16-19 13.8: members subject to axial compression and bending.
//!
//! Text recalled from memory of the standard (S16-14 and S16-19 read alike
//! here), not checked against a copy at hand:
//!
//! - 13.8.2, Class 1 and 2 I-shaped members: C_f/C_r + 0.85 U_1x
//!   M_fx/M_rx + beta U_1y M_fy/M_ry <= 1.0, examined for (a), (b) and (c) below. In
//!   addition M_fx/M_rx + M_fy/M_ry <= 1.0 (M_rx of 13.6, M_ry of 13.5),
//!   reported as the check "13.8.2".
//!   - (a) cross-sectional strength: C_r of 13.3.1 with lambda = 0 (phi A
//!     F_y), M_r of 13.5, beta = 0.6, U_1 not less than 1.0 (the clause
//!     says "applicable only to members in braced frames"; it is worked
//!     for every member here, which can only add a check);
//!   - (b) overall member strength: C_r of 13.3.1, for uniaxial strong-axis
//!     bending C_rx (in-plane buckling length), otherwise the lowest
//!     axial resistance checked; M_r of 13.5; beta = 0.6 + 0.4 lambda_y
//!     <= 0.85; U_1 of 13.8.4;
//!   - (c) lateral-torsional buckling strength: C_r the lowest axial
//!     resistance checked; M_rx of 13.6 (the bending result, with
//!     omega_2); M_ry of 13.5; beta as (b); U_1x not less than 1.0.
//! - 13.8.3, all other members (and I-shapes of Class 3 under the combined
//!   load): C_f/C_r + U_1x M_fx/M_rx + U_1y M_fy/M_ry <= 1.0 with the same
//!   (a), (b), (c) (no 0.85, no beta), and the same closing criterion,
//!   reported as "13.8.3". For uniaxial strong-axis bending, (c) with the
//!   lowest C_r and U_1x >= 1.0 is never below (b) with C_rx, so the C_r
//!   read for (b) cannot lower the member's utilisation.
//! - 13.8.4: U_1 = omega_1 / (1 - C_f/C_e), C_e = pi^2 E I / L^2 about the
//!   axis of bending. L is the laterally unbraced length (K = 1; the member
//!   length, or a buckling model's longest stretch between fixed braces),
//!   or the member's buckling length about that axis where it is longer
//!   and no frame is given (the member file does not say the member is
//!   braced: the lower C_e is taken, said in the working); a frame's k is
//!   not used ([`super::own_length`]). A shorter buckling length is raised
//!   to L with the warning `amplification-length-major` / `-minor`. With `amplify_moments` false the moments given
//!   include the member's second-order effects: the amplification 1/(1 -
//!   C_f/C_e) is left out and U_1 = omega_1 (the equivalent-moment factor
//!   stays; where the clause sets U_1 >= 1.0 it is 1.0). The sway
//!   amplification U_2 of the frame (8.4) is outside the member check.
//! - 13.8.5: omega_1 = 0.6 - 0.4 kappa >= 0.4 without transverse load
//!   (kappa = M_small/M_large, positive in double curvature: in the member
//!   file's convention kappa = -psi); 1.0 with distributed load; 0.85 with
//!   a concentrated load at mid-length, but not below the end moments'
//!   value where end moments act as well (the safe side: the clause gives
//!   0.85 whatever the end moments).
//! - Classes under the combined load, Table 2: flanges as in bending; webs
//!   Class 1 h/w <= 1100/sqrt(F_y) (1 - 0.39 C_f/(phi C_y)), Class 2
//!   1700/sqrt(F_y) (1 - 0.61 C_f/(phi C_y)), Class 3 1900/sqrt(F_y)
//!   (1 - 0.65 C_f/(phi C_y)), C_y = A F_y (h = d - 2 t_f for I and
//!   channels; (h - 4t)/t of the larger wall for rectangular HSS). The
//!   member's class is the worst of both axes and the web; a section of
//!   Class 3 takes M_r with S (13.5(b), 13.6(b) with M_y); Class 4 is
//!   refused (13.5(c) is not implemented).
//!
//! M_fx, M_fy are the largest moments along the member about each axis.

use super::{own_length, ratio, warn_given, warn_raised, Check, Context, OwnBasis};
use crate::bending::csa_s16::{class_of, classify, unsupported, PHI};
use crate::bending::{given_modulus, moments, shape, Axis, Shape};
use crate::error::{Error, Result};
use crate::member::{Moments, SpanLoad};
use crate::method::common::{require_steel, warn_once_text, warn_once_with};
use crate::outcome::{Arg, Mode, Warning};
use crate::section::{Family, SectionSpec};
use crate::trace::{put, step, sym, symbol, Scope, Sym, Symbol, Trace};
use crate::units::Quantity;

const KEY: &str = "csa-s16";
const S: Scope = Scope::Interaction;

/// omega_1 of 13.8.5 and, without transverse load, kappa (positive in
/// double curvature).
pub fn omega_1(m: &Moments) -> (f64, Option<f64>) {
    let ends = |psi: f64| (0.6 + 0.4 * psi).max(0.4);
    match shape(m) {
        Shape::Linear { psi } => (ends(psi), Some(crate::bending::reverse_ratio(psi))),
        Shape::Span(SpanLoad::Uniform) | Shape::None => (1.0, None),
        Shape::Span(SpanLoad::Point) => (0.85, None),
        Shape::Combined => match m.span_load {
            SpanLoad::Uniform => (1.0, None),
            SpanLoad::Point => {
                let end_only = Moments {
                    span_knm: 0.0,
                    ..*m
                };
                let w = match shape(&end_only) {
                    Shape::Linear { psi } => ends(psi),
                    _ => 0.0,
                };
                (w.max(0.85), None)
            }
        },
    }
}

/// U_1 of 13.8.4, `None` where C_f >= C_e (no finite amplification).
pub fn u_1(omega_1: f64, c_f: f64, c_e: f64) -> Option<f64> {
    if c_f >= c_e {
        None
    } else {
        Some(omega_1 / (1.0 - c_f / c_e))
    }
}

struct Names {
    m_f: Symbol,
    kappa: Symbol,
    omega: Symbol,
    l: Symbol,
    c_e: Symbol,
    u1: Symbol,
    m_r5: Symbol,
    m_r6: Symbol,
}

fn names(axis: Axis) -> Names {
    match axis {
        Axis::Major => Names {
            m_f: symbol!("M_fx", "kNm"),
            kappa: symbol!("kappa_x", "-"),
            omega: symbol!("omega_1x", "-"),
            l: symbol!("L_x", "mm"),
            c_e: symbol!("C_ex", "kN"),
            u1: symbol!("U_1x", "-"),
            m_r5: symbol!("M_rx (13.5)", "kNm"),
            m_r6: symbol!("M_rx (13.6)", "kNm"),
        },
        Axis::Minor => Names {
            m_f: symbol!("M_fy", "kNm"),
            kappa: symbol!("kappa_y", "-"),
            omega: symbol!("omega_1y", "-"),
            l: symbol!("L_y", "mm"),
            c_e: symbol!("C_ey", "kN"),
            u1: symbol!("U_1y", "-"),
            m_r5: symbol!("M_ry (13.5)", "kNm"),
            m_r6: symbol!("M_ry (13.6)", "kNm"),
        },
    }
}

/// One axis: the moment, U_1 (infinite where C_f >= C_e) and the
/// resistances of 13.5 and 13.6, kNm.
struct AxisTerms {
    m_f: f64,
    u1: f64,
    m_r5: f64,
    m_r6: f64,
}

#[allow(clippy::too_many_arguments)]
fn axis_terms(
    ctx: &Context<'_>,
    axis: Axis,
    class: u8,
    fy: f64,
    e: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisTerms> {
    let n = names(axis);
    let input = ctx.input;
    let p = &input.section.props;
    let (i, sx, zx, bending) = match axis {
        Axis::Major => (
            p.i_major_mm4,
            p.w_el_major_mm3,
            p.w_pl_major_mm3,
            &ctx.bending.major,
        ),
        Axis::Minor => (
            p.i_minor_mm4,
            p.w_el_minor_mm3,
            p.w_pl_minor_mm3,
            &ctx.bending.minor,
        ),
    };
    let diagram = moments(input, axis);
    let m_f = diagram.max_abs_knm();
    // 13.5: phi Z F_y (Class 1, 2) or phi S F_y (Class 3, a given section).
    let w = match given_modulus(input, axis, false)? {
        Some(w) => w,
        None if class <= 2 => zx,
        None => sx,
    };
    let m_y_or_p = w * fy;
    let m_r5 = PHI * m_y_or_p / 1e6;
    put(
        trace,
        S,
        n.m_r5,
        if class <= 2 {
            sym!("factored moment resistance phi Z F_y, laterally supported (Class 1 or 2 under the combined load)")
        } else {
            sym!("factored moment resistance phi S F_y, laterally supported (Class 3 under the combined load)")
        },
        m_r5,
        sym!("CSA S16-19 13.5"),
    );
    let m_r6 = match bending.critical_knm {
        Some(mu) => {
            let v = unsupported(m_y_or_p, mu * 1e6) / 1e6;
            put(
                trace,
                S,
                n.m_r6,
                sym!("factored moment resistance, laterally unsupported, from M_u of the bending side (with omega_2)"),
                v,
                sym!("CSA S16-19 13.6(a)/(b)"),
            );
            v
        }
        None => m_r5,
    };
    if m_f == 0.0 {
        return Ok(AxisTerms {
            m_f,
            u1: 1.0,
            m_r5,
            m_r6,
        });
    }
    put(
        trace,
        S,
        n.m_f,
        sym!("largest factored moment along the member"),
        m_f,
        sym!("member file"),
    );
    let (omega, kappa) = omega_1(&diagram);
    match kappa {
        Some(k) => {
            put(
                trace,
                S,
                n.kappa,
                sym!("ratio of the smaller to the larger end moment, positive in double curvature"),
                k,
                sym!("CSA S16-19 13.8.5(a)"),
            );
            put(
                trace,
                S,
                n.omega,
                sym!("equivalent uniform moment factor 0.6 - 0.4 kappa >= 0.4, no transverse load"),
                omega,
                sym!("CSA S16-19 13.8.5(a)"),
            );
        }
        None => match diagram.span_load {
            SpanLoad::Uniform => put(
                trace,
                S,
                n.omega,
                sym!("equivalent uniform moment factor, distributed load between the supports"),
                omega,
                sym!("CSA S16-19 13.8.5(b)"),
            ),
            SpanLoad::Point => put(
                trace,
                S,
                n.omega,
                sym!("equivalent uniform moment factor, concentrated load at mid-length: 0.85, or the end moments' 0.6 - 0.4 kappa where larger (conservative)"),
                omega,
                sym!("CSA S16-19 13.8.5(c)"),
            ),
        },
    }
    if !input.member.amplify_moments {
        put(
            trace,
            S,
            n.u1,
            sym!("omega_1 alone: amplification 1/(1 - C_f/C_e) not applied (amplify_moments false, the moments given include the member's second-order effects)"),
            omega,
            sym!("CSA S16-19 13.8.4 (member file)"),
        );
        return Ok(AxisTerms {
            m_f,
            u1: omega,
            m_r5,
            m_r6,
        });
    }
    let own = own_length(ctx, axis);
    let l = own.mm;
    let c_e = crate::method::common::euler_n(e, i, l) / 1000.0;
    put(
        trace,
        S,
        n.l,
        match own.basis {
            OwnBasis::Buckling => sym!("length for C_e: the member's buckling length about this axis, not shorter than the laterally unbraced length (K = 1; a longer length may be a sway mode: the lower C_e, conservative)"),
            OwnBasis::Frame { sway: false } => sym!("length for C_e: the laterally unbraced length, K = 1 (the braced frame's k is for the compression check)"),
            OwnBasis::Frame { sway: true } => sym!("length for C_e: the laterally unbraced length, K = 1 (the sway frame's k is for the compression check; sway is U_2's, outside the member check)"),
            OwnBasis::Raised => sym!("length for C_e: the laterally unbraced length, K = 1, longer than the buckling length about this axis (the safe side)"),
            OwnBasis::Given => sym!("length for C_e: as given from the engineer's analysis (amplification length), which must justify it; for U_1 only, not for the compression resistance"),
        },
        l,
        sym!("CSA S16-19 13.8.4"),
    );
    let said = ("U_1", "L", "CSA S16-19 13.8.4");
    warn_raised(warnings, axis, &own, said);
    warn_given(warnings, axis, &own, said);
    put(
        trace,
        S,
        n.c_e,
        sym!("Euler buckling strength pi^2 E I / L^2"),
        c_e,
        sym!("CSA S16-19 13.8.4"),
    );
    let c_f = input.member.axial_kn;
    let u1 = match u_1(omega, c_f, c_e) {
        Some(u) => {
            put(
                trace,
                S,
                n.u1,
                sym!("amplification of the member's moments omega_1 / (1 - C_f/C_e), applied (amplify_moments true)"),
                u,
                sym!("CSA S16-19 13.8.4"),
            );
            u
        }
        None => {
            put(
                trace,
                S,
                n.u1,
                sym!("no finite value: C_f >= C_e, the member buckles in the plane of bending under the axial load alone"),
                f64::INFINITY,
                sym!("CSA S16-19 13.8.4"),
            );
            warn_once_with(warnings, "u1-unbounded", || {
                Warning::with_args(
                    "u1-unbounded",
                    "axial_kn: C_f = {} reaches the Euler load in the plane of bending \
                     C_e = {} (CSA S16-19 13.8.4), so the moments have no finite \
                     amplification U_1 and the member fails; choose a stiffer section or a \
                     shorter member",
                    &[
                        Arg::figure(c_f, Quantity::Force, 1),
                        Arg::figure(c_e, Quantity::Force, 1),
                    ],
                )
            });
            f64::INFINITY
        }
    };
    Ok(AxisTerms {
        m_f,
        u1,
        m_r5,
        m_r6,
    })
}

/// A moment term U M_f / M_r, 0 without a moment (even where U is infinite).
fn term(u: f64, m_f: f64, m_r: f64) -> f64 {
    if m_f == 0.0 {
        0.0
    } else {
        u * ratio(m_f, m_r)
    }
}

/// The web's class under the combined load (Table 2), `None` where the
/// section has no web in the sense of the table.
fn web_class(ctx: &Context<'_>, fy: f64, c_ratio: f64, trace: &mut Trace) -> Option<u8> {
    let h_w = match &ctx.input.section.spec {
        SectionSpec::I(i) => (i.depth_mm - 2.0 * i.flange_mm) / i.web_mm,
        SectionSpec::Channel(c) => (c.depth_mm - 2.0 * c.flange_mm) / c.web_mm,
        SectionSpec::Rhs(r) => (r.depth_mm.max(r.width_mm) - 4.0 * r.wall_mm) / r.wall_mm,
        _ => return None,
    };
    let r = c_ratio.min(1.0);
    let rf = fy.sqrt();
    let limits = [
        1100.0 / rf * (1.0 - 0.39 * r),
        1700.0 / rf * (1.0 - 0.61 * r),
        1900.0 / rf * (1.0 - 0.65 * r),
    ];
    step!(
        trace,
        S,
        "h/w",
        "web ratio under the combined load (the larger wall of a rectangular HSS)",
        h_w,
        "-",
        "CSA S16-19 Table 2 (recalled from memory)"
    );
    step!(
        trace,
        S,
        "h/w (Class 2)",
        "Class 2 limit 1700/sqrt(F_y) (1 - 0.61 C_f/(phi C_y))",
        limits[1],
        "-",
        "CSA S16-19 Table 2 (recalled from memory)"
    );
    step!(
        trace,
        S,
        "h/w (Class 3)",
        "Class 3 limit 1900/sqrt(F_y) (1 - 0.65 C_f/(phi C_y))",
        limits[2],
        "-",
        "CSA S16-19 Table 2 (recalled from memory)"
    );
    Some(class_of(h_w, limits))
}

/// The three equations' names, and the closing criterion's.
const NAMES_I: [&str; 4] = ["13.8.2(a)", "13.8.2(b)", "13.8.2(c)", "13.8.2"];
const NAMES_OTHER: [&str; 4] = ["13.8.3(a)", "13.8.3(b)", "13.8.3(c)", "13.8.3"];

fn push_equation(trace: &mut Trace, i_shaped: bool, which: usize, u: f64) {
    let (symbol, label, clause): (Symbol, Sym, Sym) = match (i_shaped, which) {
        (true, 0) => (
            symbol!("13.8.2(a)", "-"),
            sym!("cross-sectional strength C_f/C_r + 0.85 U_1x M_fx/M_rx + beta U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.2(a)"),
        ),
        (true, 1) => (
            symbol!("13.8.2(b)", "-"),
            sym!("overall member strength C_f/C_r + 0.85 U_1x M_fx/M_rx + beta U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.2(b)"),
        ),
        (true, 2) => (
            symbol!("13.8.2(c)", "-"),
            sym!("lateral-torsional buckling strength C_f/C_r + 0.85 U_1x M_fx/M_rx + beta U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.2(c)"),
        ),
        (true, _) => (
            symbol!("13.8.2", "-"),
            sym!("in addition M_fx/M_rx + M_fy/M_ry (M_rx of 13.6, M_ry of 13.5)"),
            sym!("CSA S16-19 13.8.2 (recalled from memory)"),
        ),
        (false, 0) => (
            symbol!("13.8.3(a)", "-"),
            sym!("cross-sectional strength C_f/C_r + U_1x M_fx/M_rx + U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.3(a)"),
        ),
        (false, 1) => (
            symbol!("13.8.3(b)", "-"),
            sym!("overall member strength C_f/C_r + U_1x M_fx/M_rx + U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.3(b)"),
        ),
        (false, 2) => (
            symbol!("13.8.3(c)", "-"),
            sym!("lateral-torsional buckling strength C_f/C_r + U_1x M_fx/M_rx + U_1y M_fy/M_ry"),
            sym!("CSA S16-19 13.8.3(c)"),
        ),
        (false, _) => (
            symbol!("13.8.3", "-"),
            sym!("in addition M_fx/M_rx + M_fy/M_ry (M_rx of 13.6, M_ry of 13.5)"),
            sym!("CSA S16-19 13.8.3 (recalled from memory)"),
        ),
    };
    put(trace, S, symbol, label, u, clause);
}

/// The interaction equations.
pub fn check(
    ctx: &Context<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    let input = ctx.input;
    let steel = require_steel(input, KEY)?;
    let (fy, e) = (steel.fy_mpa, steel.e_mpa);
    let c_f = input.member.axial_kn;
    let area = input.section.props.area_mm2;
    let c_y = area * fy / 1000.0;
    let c_ratio = c_f / (PHI * c_y);
    step!(
        trace,
        S,
        "C_f",
        "factored compressive force",
        c_f,
        "kN",
        "member file"
    );
    step!(
        trace,
        S,
        "C_f/(phi C_y)",
        "axial ratio for the web's class, C_y = A F_y",
        c_ratio,
        "-",
        "CSA S16-19 Table 2"
    );
    // The class under the combined load: the worse of both axes in
    // bending (Table 2) and of the web under the axial load.
    // The bending check's classes (the same Table 2 reading).
    let in_bending = |axis: Axis, b: &crate::bending::AxisBending| {
        b.kept
            .class()
            .unwrap_or_else(|| classify(input, fy, axis, &mut Trace::off()))
    };
    let bending_class = in_bending(Axis::Major, &ctx.bending.major)
        .max(in_bending(Axis::Minor, &ctx.bending.minor));
    let class = web_class(ctx, fy, c_ratio, trace).map_or(bending_class, |w| w.max(bending_class));
    step!(
        trace,
        S,
        "class",
        "class under compression and bending: the worst of the flanges, the web and both axes",
        f64::from(class),
        "-",
        "CSA S16-19 11.2, Table 2"
    );
    if class == 4 {
        return Err(Error::NotApplicable {
            method: KEY,
            reason: "axial_kn with moments: the section is Class 4 under compression and bending \
                     (CSA S16-19 Table 2); 13.5(c) and 13.3.4 for Class 4 are not implemented: \
                     choose a stockier section"
                .into(),
        });
    }
    let i_shaped = input.section.family == Family::I && class <= 2;
    warn_once_text(
        warnings,
        "sway-not-amplified",
        if input.member.amplify_moments {
            "beam-column: the member's own second-order effect (U_1 of CSA S16-19 13.8.4) is \
             worked here; the frame's sway effect (P-Delta, U_2 of 8.4) is not: the moments \
             given must include it"
        } else {
            "beam-column: the moments given are taken as already second-order, as stated: \
             neither the member's own amplification (the factor 1/(1 - C_f/C_e) of U_1, CSA \
             S16-19 13.8.4) nor the frame's sway effect (P-Delta, U_2 of 8.4) is worked here: the \
             moments given must include both"
        },
    );
    let x = axis_terms(ctx, Axis::Major, class, fy, e, trace, warnings)?;
    let y = axis_terms(ctx, Axis::Minor, class, fy, e, trace, warnings)?;
    // C_r: (a) lambda = 0; (b) C_rx for uniaxial strong-axis bending, else
    // the lowest; (c) the lowest of every mode checked.
    let c_r0 = PHI * c_y;
    let c_r_min = ctx.governing.resistance_kn;
    let c_rx = ctx.mode(Mode::Major).map_or(c_r_min, |m| m.resistance_kn);
    let c_rb = if y.m_f == 0.0 { c_rx } else { c_r_min };
    step!(
        trace,
        S,
        "C_r (a)",
        "phi A F_y: C_r of 13.3.1 with lambda = 0, cross-sectional strength",
        c_r0,
        "kN",
        "CSA S16-19 13.8.2(a), 13.8.3(a)"
    );
    if y.m_f == 0.0 {
        step!(
            trace,
            S,
            "C_r (b)",
            "C_rx: uniaxial strong-axis bending, the in-plane (major-axis) buckling length",
            c_rb,
            "kN",
            "CSA S16-19 13.8.2(b), 13.8.3(b) (recalled from memory)"
        );
    } else {
        step!(
            trace,
            S,
            "C_r (b)",
            "the lowest axial resistance checked: bending about the minor axis",
            c_rb,
            "kN",
            "CSA S16-19 13.8.2(b), 13.8.3(b)"
        );
    }
    step!(
        trace,
        S,
        "C_r (c)",
        "the lowest axial resistance checked (both axes and the twisting mode)",
        c_r_min,
        "kN",
        "CSA S16-19 13.8.2(c), 13.8.3(c)"
    );
    let (kx, beta_a, beta) = if i_shaped {
        let lambda_y = ctx.mode(Mode::Minor).map(|m| m.relative_slenderness);
        let beta = lambda_y.map_or(0.85, |l| (0.6 + 0.4 * l).min(0.85));
        if let Some(l) = lambda_y {
            step!(
                trace,
                S,
                "lambda_y",
                "minor-axis slenderness parameter sqrt(F_y / F_e)",
                l,
                "-",
                "CSA S16-19 13.3.1"
            );
        }
        step!(
            trace,
            S,
            "beta (a)",
            "0.6 for the cross-sectional strength (0.6 + 0.4 lambda with lambda = 0)",
            0.6,
            "-",
            "CSA S16-19 13.8.2(a) (recalled from memory)"
        );
        step!(
            trace,
            S,
            "beta",
            "0.6 + 0.4 lambda_y <= 0.85",
            beta,
            "-",
            "CSA S16-19 13.8.2(b), (c)"
        );
        (0.85, 0.6, beta)
    } else {
        (1.0, 1.0, 1.0)
    };
    let floor = |u: f64| u.max(1.0);
    // (a) takes U_1x and U_1y, (c) U_1x, not less than 1.0; (b) as worked.
    // Where that changes a value, the working shows the value used.
    if x.m_f != 0.0 && x.u1 < 1.0 {
        put(
            trace,
            S,
            symbol!("U_1x in (a), (c)", "-"),
            sym!("U_1x as (a) and (c) take it: not less than 1.0 ((b) takes the value above)"),
            1.0,
            if i_shaped {
                sym!("CSA S16-19 13.8.2(a), (c)")
            } else {
                sym!("CSA S16-19 13.8.3(a), (c)")
            },
        );
    }
    if y.m_f != 0.0 && y.u1 < 1.0 {
        put(
            trace,
            S,
            symbol!("U_1y in (a)", "-"),
            sym!("U_1y as (a) takes it: not less than 1.0 ((b) and (c) take the value above)"),
            1.0,
            if i_shaped {
                sym!("CSA S16-19 13.8.2(a)")
            } else {
                sym!("CSA S16-19 13.8.3(a)")
            },
        );
    }
    let axial = |c_r: f64| ratio(c_f, c_r);
    let eqs = [
        axial(c_r0)
            + kx * term(floor(x.u1), x.m_f, x.m_r5)
            + beta_a * term(floor(y.u1), y.m_f, y.m_r5),
        axial(c_rb) + kx * term(x.u1, x.m_f, x.m_r5) + beta * term(y.u1, y.m_f, y.m_r5),
        axial(c_r_min) + kx * term(floor(x.u1), x.m_f, x.m_r6) + beta * term(y.u1, y.m_f, y.m_r5),
        ratio(x.m_f, x.m_r6) + ratio(y.m_f, y.m_r5),
    ];
    let names = if i_shaped { NAMES_I } else { NAMES_OTHER };
    let mut checks = Vec::with_capacity(4);
    for (k, (&u, &name)) in eqs.iter().zip(names.iter()).enumerate() {
        push_equation(trace, i_shaped, k, u);
        checks.push(Check {
            check: name,
            utilisation: u,
        });
    }
    Ok(Some(checks))
}

#[cfg(test)]
mod tests {
    use super::*;

    fn mo(a: f64, b: f64, span: f64, load: SpanLoad) -> Moments {
        Moments {
            a_knm: a,
            b_knm: b,
            span_knm: span,
            span_load: load,
        }
    }

    #[test]
    fn omega_1_follows_13_8_5() {
        // Single curvature, equal ends: kappa = -1, omega_1 = 1.0.
        assert_eq!(
            omega_1(&mo(10.0, 10.0, 0.0, SpanLoad::Uniform)),
            (1.0, Some(-1.0))
        );
        // Double curvature, equal ends: 0.6 - 0.4 = 0.2, floored at 0.4.
        assert_eq!(
            omega_1(&mo(10.0, -10.0, 0.0, SpanLoad::Uniform)),
            (0.4, Some(1.0))
        );
        // One end zero: 0.6.
        assert_eq!(omega_1(&mo(0.0, 7.0, 0.0, SpanLoad::Uniform)).0, 0.6);
        assert_eq!(omega_1(&mo(0.0, 0.0, 7.0, SpanLoad::Uniform)).0, 1.0);
        assert_eq!(omega_1(&mo(0.0, 0.0, 7.0, SpanLoad::Point)).0, 0.85);
        // Point load with equal single-curvature end moments: not below 1.0.
        assert_eq!(omega_1(&mo(5.0, 5.0, 2.0, SpanLoad::Point)).0, 1.0);
        assert_eq!(omega_1(&mo(5.0, -5.0, 2.0, SpanLoad::Point)).0, 0.85);
    }

    /// The working shows the U_1 each equation uses (review N26: RHS
    /// 203x152x8 350W, 600 kN, 40 / 20 kNm single curvature printed U_1x
    /// 0.95 while (a) and (c) use 1.0, 13.8.3's "not less than 1.0").
    #[test]
    fn the_working_shows_the_u_1_each_equation_uses() {
        let member = |n: f64| -> crate::member::Member {
            serde_json::from_value(serde_json::json!({
                "id": "R1",
                "section": {"kind": "rhs", "depth_mm": 203, "width_mm": 152, "wall_mm": 8},
                "material": {"grade": "350W"}, "length_mm": 3000, "axial_kn": n,
                "m_major_a_knm": 40, "m_major_b_knm": 20, "method": "csa-s16"
            }))
            .unwrap()
        };
        let steps = |n: f64| {
            let r = crate::check::check_member(&member(n)).unwrap();
            let u1 = r
                .trace
                .iter()
                .find(|s| s.symbol == "U_1x")
                .map(|s| s.value)
                .unwrap();
            let used: Vec<f64> = r
                .trace
                .iter()
                .filter(|s| s.symbol == "U_1x in (a), (c)")
                .map(|s| s.value)
                .collect();
            (u1, used)
        };
        let (u1, used) = steps(600.0);
        assert!(u1 < 1.0, "{u1}");
        assert_eq!(used, [1.0]);
        // Where U_1x is 1.0 or more every equation takes it as worked.
        let (u1, used) = steps(2000.0);
        assert!(u1 >= 1.0, "{u1}");
        assert!(used.is_empty());
    }

    #[test]
    fn u_1_refuses_beyond_c_e() {
        assert_eq!(u_1(0.4, 0.0, 100.0), Some(0.4));
        assert!((u_1(1.0, 50.0, 100.0).unwrap() - 2.0).abs() < 1e-15);
        assert_eq!(u_1(1.0, 100.0, 100.0), None);
    }
}
