//! AISC 360-16 F10: single angles bent about their principal axes (the
//! member file's `major` and `minor` are the principal axes w and z of an
//! angle), LRFD and ASD. Equations recalled from memory of the 2016
//! Specification.
//!
//! Sign (the member file's convention for angles, said in a warning): the
//! angle drawn in its reference position (heel at the lower left, the leg
//! `depth_mm` upright, the leg `width_mm` to the right), a positive moment
//! about the major principal axis compresses the toe of the leg
//! `depth_mm`, a negative one the toe of the leg `width_mm`; a positive
//! moment about the minor principal axis compresses both toes (the heel in
//! tension), a negative one the heel. Each sign is checked against its own
//! strength, and the sign with the larger demand over strength governs.
//!
//! - Yielding: M_n = 1.5 M_y (F10-1), M_y = F_y S with the smaller elastic
//!   modulus about the axis (first yield, either sign).
//! - Lateral-torsional buckling, major principal axis, unless
//!   `lt_restrained`: M_cr of F10-4 with beta_w, C_b of Eq. F1-1 at most
//!   1.5 (1.0 where the segment's diagram is not known or the load acts on
//!   the compression side); M_n by F10-2 (M_y/M_cr <= 1) or F10-3. beta_w
//!   is worked from the section's own outline by the Commentary's formula
//!   (`section::shapes::angle_beta_w`), zero for equal legs, positive with
//!   the short leg's toe in compression and negative with the long leg's;
//!   where the long leg is in compression anywhere along the member (the
//!   diagram compresses it, or changes sign), the negative value is used
//!   for both signs, as F10.2(b)(1) requires (taken over the whole member:
//!   conservative where the unbraced length is shorter).
//! - Minor principal axis: yielding and leg local buckling only (F10 User
//!   Note).
//! - Leg local buckling (F10.3), for each leg whose toe the sign
//!   compresses: b/t of that leg against 0.54 and 0.91 sqrt(E/F_y) (Table
//!   B4.1b case 12), F10-6 (noncompact), F10-7 and F10-8 (slender), S_c the
//!   modulus to that toe (its corners taken sharp: a toe radius would only
//!   bring the corner nearer the axis). A sign that compresses no toe (the
//!   heel about the minor axis) has no leg local buckling.
//! - Moments about the legs (geometric axes) are not taken: the member file
//!   holds moments about the principal axes, the route F10 permits for
//!   every angle; the geometric-axis rules of F10.2(b)(2) (equal legs,
//!   Eqs. F10-5a and F10-5b, with or without restraint at the point of
//!   largest moment) and the geometric-axis design of continuously
//!   restrained angles are not applied (said in the working).
//! - Moments about both principal axes, and a moment with axial load,
//!   combine by H2-1 in `interaction::aisc360` (stresses at the toes and
//!   the heel), with each sign's strength of this module ([`BySign`]).

use super::aisc360::{available, Basis};
use super::{
    c_b, diagram_is_segment, moments, push_diagram, signed_extremes, Axis, AxisBending, Bending,
    BySign,
};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::LoadLevel;
use crate::method::common::warn_once_text;
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::{Angle, Properties, SectionSpec};
use crate::trace::{push, step, Trace};

/// The points of a single angle its checks look at, in principal
/// coordinates from the centroid, mm: (u, v), u along the major principal
/// axis, v along the minor principal direction (the major turned by +90°;
/// v > 0 on the side of the toe of the leg `depth_mm`). Corners sharp.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Points {
    /// The heel (the outer corner where the legs meet).
    pub heel: (f64, f64),
    /// The toe of the leg `depth_mm`: its outer and inner corner.
    pub toe_h: [(f64, f64); 2],
    /// The toe of the leg `width_mm`: its outer and inner corner.
    pub toe_b: [(f64, f64); 2],
}

/// The heel and toes of an angle in principal coordinates.
pub fn points(a: &Angle, p: &Properties) -> Points {
    let (sin, cos) = crate::trig::sin_cos(p.principal_angle_rad);
    let uv = |y: f64, z: f64| {
        let (dy, dz) = (y - p.centroid_y_mm, z - p.centroid_z_mm);
        (dy * cos + dz * sin, -dy * sin + dz * cos)
    };
    let (h, b, t) = (a.depth_mm, a.width_mm, a.thickness_mm);
    Points {
        heel: uv(0.0, 0.0),
        toe_h: [uv(0.0, h), uv(t, h)],
        toe_b: [uv(b, 0.0), uv(b, t)],
    }
}

/// The distance from the axis of bending of a point, positive on the side
/// a positive moment compresses: v about the major axis, u about the minor.
pub fn towards_compression(axis: Axis, (u, v): (f64, f64)) -> f64 {
    match axis {
        Axis::Major => v,
        Axis::Minor => u,
    }
}

fn refuse(basis: Basis, reason: String) -> Error {
    Error::NotApplicable {
        method: match basis {
            Basis::Lrfd => "aisc360-lrfd",
            Basis::Asd => "aisc360-asd",
        },
        reason,
    }
}

/// Checks both principal axes of a single angle.
pub(super) fn check(
    input: &Input<'_>,
    steel: &Steel,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Bending> {
    let SectionSpec::Angle(a) = &input.section.spec else {
        return Err(refuse(basis, "AISC 360-16 F10 needs an angle".into()));
    };
    let m = input.member;
    if !m.moments_major().is_zero() || !m.moments_minor().is_zero() {
        warn_once_text(warnings, "angle-moment-sign", "bending: for a single angle (heel at the lower left, leg depth_mm upright) a positive \
             moment about the major principal axis is read as compressing the toe of the leg \
             depth_mm, a negative one the toe of the leg width_mm; a positive moment about the \
             minor principal axis compresses both toes (heel in tension), a negative one the heel \
             (AISC 360-16 F10); check the sign of the moments. Moments are about the principal \
             axes: the geometric-axis rules of F10 are not applied");
    }
    Ok(Bending {
        major: axis(input, a, steel, basis, Axis::Major, trace)?,
        minor: axis(input, a, steel, basis, Axis::Minor, trace)?,
    })
}

/// M_cr of Eq. F10-4, N mm: 9 E A r_z t C_b / (8 L_b) [sqrt(1 + (4.4
/// beta_w r_z / (L_b t))^2) + 4.4 beta_w r_z / (L_b t)].
#[allow(clippy::too_many_arguments)]
pub fn m_cr(e: f64, area: f64, r_z: f64, t: f64, cb: f64, lb: f64, beta_w: f64) -> f64 {
    let k = 4.4 * beta_w * r_z / (lb * t);
    9.0 * e * area * r_z * t * cb / (8.0 * lb) * ((1.0 + k * k).sqrt() + k)
}

/// M_n of lateral-torsional buckling, Eqs. F10-2 and F10-3, N mm.
pub fn ltb(my: f64, mcr: f64) -> f64 {
    if my <= mcr {
        ((1.92 - 1.17 * (my / mcr).sqrt()) * my).min(1.5 * my)
    } else {
        (0.92 - 0.17 * mcr / my) * mcr
    }
}

/// M_n of leg local buckling, Eqs. F10-6 to F10-8, N mm (1.5 M_y where the
/// leg is compact, the yielding limit).
pub fn leg_local(bt: f64, e: f64, fy: f64, sc: f64) -> f64 {
    let root = (e / fy).sqrt();
    if bt <= 0.54 * root {
        1.5 * fy * sc
    } else if bt <= 0.91 * root {
        fy * sc * (2.43 - 1.72 * bt / root)
    } else {
        0.71 * e / (bt * bt) * sc
    }
}

/// The lateral-torsional buckling of one sign: M_cr and M_n.
struct Ltb {
    m_cr: f64,
    m_n: f64,
}

/// What one sign of moment about one axis gives, N mm.
struct Side {
    m_n: f64,
    ltb: Option<Ltb>,
}

#[allow(clippy::too_many_arguments)]
fn side(
    input: &Input<'_>,
    a: &Angle,
    steel: &Steel,
    axis: Axis,
    positive: bool,
    lt: Option<(f64, f64, f64, bool)>,
    my: f64,
    trace: &mut Trace,
) -> Side {
    let s = axis.scope();
    let p = &input.section.props;
    let (e, fy) = (steel.e_mpa, steel.fy_mpa);
    let t = a.thickness_mm;
    let pts = points(a, p);
    let sign = if positive { 1.0 } else { -1.0 };
    let i = match axis {
        Axis::Major => p.i_major_mm4,
        Axis::Minor => p.i_minor_mm4,
    };
    let mut m_n = 1.5 * my;
    // Leg local buckling of each leg whose toe this sign compresses.
    for (leg, toe, long) in [
        (a.depth_mm, pts.toe_h, a.depth_mm >= a.width_mm),
        (a.width_mm, pts.toe_b, a.width_mm >= a.depth_mm),
    ] {
        let far = toe
            .iter()
            .map(|&c| sign * towards_compression(axis, c))
            .fold(0.0f64, f64::max);
        if far <= 0.0 {
            continue;
        }
        let bt = leg / t;
        let sc = i / far;
        let llb = leg_local(bt, e, fy, sc);
        let (sym_bt, sym_sc, sym_m) = match (positive, long) {
            (true, true) => (
                "b/t (+, long leg)",
                "S_c (+, long leg)",
                "M_n,LLB+ (long leg)",
            ),
            (true, false) => (
                "b/t (+, short leg)",
                "S_c (+, short leg)",
                "M_n,LLB+ (short leg)",
            ),
            (false, true) => (
                "b/t (-, long leg)",
                "S_c (-, long leg)",
                "M_n,LLB- (long leg)",
            ),
            (false, false) => (
                "b/t (-, short leg)",
                "S_c (-, short leg)",
                "M_n,LLB- (short leg)",
            ),
        };
        push(
            trace,
            s,
            sym_bt,
            "slenderness of the leg whose toe this sign compresses: limits 0.54 and 0.91 sqrt(E/F_y)",
            bt,
            "-",
            "AISC 360-16 Table B4.1b case 12",
        );
        push(
            trace,
            s,
            sym_sc,
            "elastic modulus to that toe (its corner taken sharp)",
            sc,
            "mm3",
            "AISC 360-16 F10.3",
        );
        push(
            trace,
            s,
            sym_m,
            "leg local buckling",
            llb / 1e6,
            "kNm",
            "AISC 360-16 Eq. F10-6 to F10-8",
        );
        m_n = m_n.min(llb);
    }
    let mut out_ltb = None;
    if let Some((cb, lb, beta_abs, long_compressed_somewhere)) = lt {
        // This sign compresses the toe of the leg depth_mm (positive) or
        // width_mm (negative); beta_w is positive with the short leg's toe
        // in compression.
        let short_compressed = if positive {
            a.depth_mm < a.width_mm
        } else {
            a.width_mm < a.depth_mm
        };
        let beta_w = if beta_abs == 0.0 {
            0.0
        } else if short_compressed && !long_compressed_somewhere {
            beta_abs
        } else {
            -beta_abs
        };
        let v = m_cr(e, p.area_mm2, p.r_minor_mm, t, cb, lb, beta_w);
        let l = ltb(my, v);
        let (sym_b, sym_cr, sym_m) = if positive {
            ("beta_w (+)", "M_cr (+)", "M_n,LTB+")
        } else {
            ("beta_w (-)", "M_cr (-)", "M_n,LTB-")
        };
        push(
            trace,
            s,
            sym_b,
            "beta_w for this sign: + with the short leg's toe compressed, - with the long leg's (or where the long leg is compressed anywhere along the member), 0 for equal legs",
            beta_w,
            "mm",
            "AISC 360-16 F10.2(b)(1)",
        );
        push(
            trace,
            s,
            sym_cr,
            "9 E A r_z t C_b / (8 L_b) [sqrt(1 + (4.4 beta_w r_z / (L_b t))^2) + 4.4 beta_w r_z / (L_b t)]",
            v / 1e6,
            "kNm",
            "AISC 360-16 Eq. F10-4",
        );
        push(
            trace,
            s,
            sym_m,
            "lateral-torsional buckling",
            l / 1e6,
            "kNm",
            "AISC 360-16 Eq. F10-2, F10-3",
        );
        m_n = m_n.min(l);
        out_ltb = Some(Ltb { m_cr: v, m_n: l });
    }
    Side { m_n, ltb: out_ltb }
}

fn axis(
    input: &Input<'_>,
    a: &Angle,
    steel: &Steel,
    basis: Basis,
    axis: Axis,
    trace: &mut Trace,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    push_diagram(trace, axis, &m);
    let (pos, neg) = signed_extremes(&m);
    let fy = steel.fy_mpa;
    let p = &input.section.props;
    let major = axis == Axis::Major;
    let sx = if major {
        p.w_el_major_mm3
    } else {
        p.w_el_minor_mm3
    };
    let my = fy * sx;
    step!(
        trace,
        s,
        "M_y",
        "yield moment F_y S (smallest modulus about the principal axis)",
        my / 1e6,
        "kNm",
        "AISC 360-16 F10.1"
    );
    step!(
        trace,
        s,
        "M_n,Y",
        "yielding 1.5 M_y",
        1.5 * my / 1e6,
        "kNm",
        "AISC 360-16 Eq. F10-1"
    );
    let mut lt = None;
    let mut cb_used = None;
    if major && !input.member.lt_restrained {
        let lb = input.member.lt_length_mm()?;
        let top = input.member.load_level == LoadLevel::CompressionFlange && m.span_knm != 0.0;
        let cb = if diagram_is_segment(input) && !top {
            c_b(&m).min(1.5)
        } else {
            1.0
        };
        step!(
            trace,
            s,
            "C_b",
            "F1-1 at most 1.5 (1.0 where the segment's diagram is not known or the load acts on the compression side)",
            cb,
            "-",
            "AISC 360-16 F10.2(b)(1), Eq. F1-1"
        );
        super::push_unbraced_length(trace, s, lb);
        let equal = (a.depth_mm - a.width_mm).abs() <= 1e-9 * a.depth_mm.max(a.width_mm);
        let beta_abs = if equal {
            0.0
        } else {
            crate::section::shapes::angle_beta_w(a, p)?.abs()
        };
        step!(
            trace,
            s,
            "|beta_w|",
            "monosymmetry property (1/I_w) int z (w^2 + z^2) dA - 2 z_0 over the section's outline (0 for equal legs)",
            beta_abs,
            "mm",
            "AISC 360-16 Commentary F10 (formula recalled from memory)"
        );
        // Which toe a sign compresses: positive the leg depth_mm's.
        let long_is_h = a.depth_mm > a.width_mm;
        let long_compressed_somewhere = !equal && if long_is_h { pos > 0.0 } else { neg > 0.0 };
        cb_used = Some(cb);
        lt = Some((cb, lb, beta_abs, long_compressed_somewhere));
    }
    let plus = side(input, a, steel, axis, true, lt, my, trace);
    let minus = side(input, a, steel, axis, false, lt, my, trace);
    step!(
        trace,
        s,
        "M_n+",
        "nominal flexural strength, positive moment",
        plus.m_n / 1e6,
        "kNm",
        "AISC 360-16 F10"
    );
    step!(
        trace,
        s,
        "M_n-",
        "nominal flexural strength, negative moment",
        minus.m_n / 1e6,
        "kNm",
        "AISC 360-16 F10"
    );
    let r_plus = available(basis, plus.m_n, s, trace);
    let r_minus = available(basis, minus.m_n, s, trace);
    // The sign that governs: the larger demand over its strength; with no
    // moment, the smaller strength (the capacity either way up).
    let plus_governs = if pos == 0.0 && neg == 0.0 {
        r_plus <= r_minus
    } else {
        pos / r_plus >= neg / r_minus
    };
    let (resistance, demand, governing) = if plus_governs {
        (r_plus, pos, &plus)
    } else {
        (r_minus, neg, &minus)
    };
    let (critical, reduction) = match &governing.ltb {
        Some(l) => (Some(l.m_cr / 1e6), l.m_n / (1.5 * my)),
        None => (None, 1.0),
    };
    Ok(AxisBending {
        resistance_knm: resistance,
        critical_knm: critical,
        reduction: reduction.min(1.0),
        moment_factor: cb_used,
        demand_knm: demand,
        kept: super::Kept::None,
        by_sign: Some(BySign {
            positive_knm: r_plus,
            negative_knm: r_minus,
        }),
    })
}
