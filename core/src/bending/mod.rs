//! Bending resistance and lateral-torsional buckling of a member, about
//! both principal axes, one module per design method.
//!
//! A member with any design moment (member file version 3) gets, for each
//! axis (also an axis without a moment: its capacity), the design bending
//! resistance, the elastic critical moment where lateral-torsional buckling
//! applies, the reduction factor and the moment factor used (C1, C_b,
//! omega_2). The moment diagram is the member file's: M(x) = M_a + (M_b -
//! M_a) x/L + M_span shape(x/L) ([`crate::member::Moments`]).
//!
//! Methods without a bending rule refuse a moment with a typed error naming
//! the moment key: `euler` and `perry-robertson` (flexural buckling only).
//! `secant` takes equal end moments about one axis as the load's
//! eccentricity ([`crate::method::secant::moment_eccentricity`]), so they
//! are not bending there (no bending side), and refuses any other moment.
//! Tees are checked under AISC 360-16 F9 (`aisc360_tee`), EN 1993-1-1
//! (`en1993_tee`, the monosymmetric three-factor M_cr) and CSA S16-19 (13.5,
//! 13.6(e) with beta_x; a compressed stem refused); single angles under
//! AISC 360-16 F10 (`aisc360_angle`) and refused under the other codes. Shear, web bearing, torsion from eccentric load and
//! bolt holes are not checked: a warning says so on every result with a
//! moment.

use serde::Serialize;

use crate::error::{Error, Result};
use crate::member::{LoadLevel, Moments, SpanLoad};
use crate::method::{Input, Method};
use crate::outcome::Warning;
use crate::section::{Family, SectionSpec};
use crate::trace::{step, Scope, Trace};

pub mod aisc360;
pub mod aisc360_angle;
mod aisc360_hss;
mod aisc360_tee;
pub mod csa_s16;
pub mod en1993;
mod en1993_effective;
mod en1993_tee;
pub mod en1995;
mod tee;

/// The bending side of one axis, as `strutline check --json` reports it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct AxisBending {
    /// Design bending resistance (M_b,Rd, phi M_n or M_n / Omega, M_r,
    /// f_m,d W), kNm.
    pub resistance_knm: f64,
    /// Elastic critical moment for lateral-torsional buckling, kNm (none
    /// where it does not apply).
    pub critical_knm: Option<f64>,
    /// Reduction factor for lateral-torsional buckling (1 where it does not apply).
    pub reduction: f64,
    /// The moment factor used (C1, C_b, omega_2), none where none applies.
    pub moment_factor: Option<f64>,
    /// The largest design moment along the member about this axis, kNm.
    #[serde(skip)]
    pub demand_knm: f64,
    /// What the bending check worked that the beam-column interaction
    /// reads again instead of working it afresh ([`Kept`]).
    #[serde(skip)]
    pub kept: Kept,
    /// The design resistance to a positive and to a negative moment, where
    /// they differ (tees in their plane of symmetry, single angles: AISC
    /// 360-16 F9, F10); `None` where the sign does not matter.
    #[serde(skip)]
    pub by_sign: Option<BySign>,
}

/// What the bending check of an axis worked that the beam-column
/// interaction reads again (one value, kept small: a bending result is
/// copied a few times a check).
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub enum Kept {
    /// Nothing.
    #[default]
    None,
    /// The section's class in bending alone about this axis (EN 1993-1-1
    /// Table 5.2, CSA S16-19 Table 2), read beside the class in compression.
    Class(u8),
    /// The design bending strength the resistance is worked from, MPa
    /// (EN 1995-1-1 f_m,d = k_mod k_h f_m,k / gamma_M).
    Strength(f64),
}

impl Kept {
    /// The class, where one was kept.
    pub fn class(self) -> Option<u8> {
        match self {
            Kept::Class(c) => Some(c),
            _ => None,
        }
    }

    /// The design bending strength, MPa, where one was kept.
    pub fn strength_mpa(self) -> Option<f64> {
        match self {
            Kept::Strength(f) => Some(f),
            _ => None,
        }
    }
}

/// A design resistance that depends on the sign of the moment (the member
/// file's sign convention of the shape), kNm.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BySign {
    /// Against a positive moment.
    pub positive_knm: f64,
    /// Against a negative moment.
    pub negative_knm: f64,
}

impl AxisBending {
    /// The design resistance to a moment of the sign given (`positive`).
    pub fn resistance_for(&self, positive: bool) -> f64 {
        match (self.by_sign, positive) {
            (Some(b), true) => b.positive_knm,
            (Some(b), false) => b.negative_knm,
            (None, _) => self.resistance_knm,
        }
    }
}

impl AxisBending {
    /// Demand over resistance (0 without a moment).
    pub fn utilisation(&self) -> f64 {
        if self.demand_knm == 0.0 {
            0.0
        } else if self.resistance_knm > 0.0 {
            self.demand_knm / self.resistance_knm
        } else {
            f64::INFINITY
        }
    }
}

/// The bending side of a member.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Bending {
    /// About the major principal axis.
    pub major: AxisBending,
    /// About the minor principal axis.
    pub minor: AxisBending,
}

/// Which principal axis.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Axis {
    /// The major principal axis (larger second moment).
    Major,
    /// The minor principal axis.
    Minor,
}

impl Axis {
    /// The working's scope for this axis.
    pub fn scope(self) -> Scope {
        match self {
            Axis::Major => Scope::BendingMajor,
            Axis::Minor => Scope::BendingMinor,
        }
    }
}

/// The member's moment diagram about `axis`.
pub fn moments(input: &Input<'_>, axis: Axis) -> Moments {
    match axis {
        Axis::Major => input.member.moments_major(),
        Axis::Minor => input.member.moments_minor(),
    }
}

/// Checks bending when the member carries a moment; `None` when it carries
/// none (a pure compression member keeps its result as before).
pub fn check(
    method: Method,
    input: &Input<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Bending>> {
    let m = input.member;
    if !m.has_moments() {
        return Ok(None);
    }
    // The key named by a refusal (only looked for when one is given).
    let key = || m.first_moment_key().unwrap_or("m_major_a_knm");
    if method == Method::Secant {
        // Equal end moments are the load's eccentricity in the secant
        // formula (counted there, not again as bending); others refused.
        crate::method::secant::moment_eccentricity(m)?;
        return Ok(None);
    }
    refuse_unsupported(method, input, key)?;
    let major_props_geometric = input.section.props.principal_angle_rad == 0.0;
    if matches!(input.section.family, Family::I | Family::Channel) && !major_props_geometric {
        let key = key();
        return Err(Error::NotApplicable {
            method: method.key(),
            reason: format!(
                "{key}: the section's second moment about the web's plane is the larger, so its \
                 major principal axis is not the axis parallel to the flanges; bending of such a \
                 flat I or channel is not covered"
            ),
        });
    }
    warnings.push(Warning::new(
        "bending-limits-not-checked",
        "bending: shear, web bearing under concentrated load, torsion from eccentric load and \
         bolt holes are not checked; check them separately",
    ));
    let bending = match method {
        Method::En1993 => en1993::check(input, trace, warnings)?,
        Method::AiscLrfd => aisc360::check(input, aisc360::Basis::Lrfd, trace, warnings)?,
        Method::AiscAsd => aisc360::check(input, aisc360::Basis::Asd, trace, warnings)?,
        Method::CsaS16 => csa_s16::check(input, trace, warnings)?,
        Method::En1995 => en1995::check(input, trace, warnings)?,
        Method::Euler | Method::PerryRobertson | Method::Secant => {
            return Err(no_rule(method, key()));
        }
    };
    Ok(Some(bending))
}

fn no_rule(method: Method, key: &'static str) -> Error {
    let reason = format!(
        "{key}: this method has no bending rule (it checks flexural buckling under axial load \
         only); set the moments to 0 or use a design code (en1993-1-1, aisc360-lrfd, \
         aisc360-asd, csa-s16, en1995-1-1)"
    );
    Error::NotApplicable {
        method: method.key(),
        reason,
    }
}

fn refuse_unsupported(
    method: Method,
    input: &Input<'_>,
    key: impl Fn() -> &'static str,
) -> Result<()> {
    if matches!(
        method,
        Method::Euler | Method::PerryRobertson | Method::Secant
    ) {
        return Err(no_rule(method, key()));
    }
    let aisc = matches!(method, Method::AiscLrfd | Method::AiscAsd);
    let what = match input.section.family {
        Family::Angle if !aisc => {
            "an angle under this method (EN 1993-1-1 and CSA S16 give no bending rule for \
             angles that is implemented here; AISC 360-16 F10 is)"
        }
        _ => return Ok(()),
    };
    Err(Error::NotApplicable {
        method: method.key(),
        reason: format!("{}: bending of {what}; check this member by hand", key()),
    })
}

/// The typed modulus of a given section, refused naming the missing key.
pub fn given_modulus(input: &Input<'_>, axis: Axis, plastic: bool) -> Result<Option<f64>> {
    let SectionSpec::Given(g) = &input.section.spec else {
        return Ok(None);
    };
    let (value, key) = match (axis, plastic) {
        (Axis::Major, false) => (g.w_el_major_mm3, "w_el_major_mm3"),
        (Axis::Minor, false) => (g.w_el_minor_mm3, "w_el_minor_mm3"),
        (Axis::Major, true) => (g.w_pl_major_mm3, "w_pl_major_mm3"),
        (Axis::Minor, true) => (g.w_pl_minor_mm3, "w_pl_minor_mm3"),
    };
    match value {
        Some(v) if v > 0.0 => Ok(Some(v)),
        _ => Err(Error::Geometry {
            field: key,
            reason: format!(
                "a moment on a given section needs its modulus {key}; enter it (mm3) or \
                 describe the section by its dimensions"
            ),
        }),
    }
}

/// The section modulus about `axis`, plastic or elastic: a given section's
/// typed one (refused naming the key when missing), else the computed one.
pub fn modulus(input: &Input<'_>, axis: Axis, plastic: bool) -> Result<f64> {
    let p = &input.section.props;
    Ok(match given_modulus(input, axis, plastic)? {
        Some(w) => w,
        None => match (axis, plastic) {
            (Axis::Major, true) => p.w_pl_major_mm3,
            (Axis::Major, false) => p.w_el_major_mm3,
            (Axis::Minor, true) => p.w_pl_minor_mm3,
            (Axis::Minor, false) => p.w_el_minor_mm3,
        },
    })
}

/// Whether the length between lateral restraints is the member length, so
/// the member file's moment diagram is the diagram of the unbraced segment.
pub fn diagram_is_segment(input: &Input<'_>) -> bool {
    input.member.lcr_lt_mm.is_none() && input.member.k_lt == 1.0
}

/// The shape of a moment diagram, as the moment-factor tables tell them apart.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Shape {
    /// No moment.
    None,
    /// End moments only: psi = M_small / M_large (-1..=1, positive in single curvature).
    Linear {
        /// The ratio of the end moments.
        psi: f64,
    },
    /// Transverse load only, no end moments.
    Span(SpanLoad),
    /// End moments and transverse load together.
    Combined,
}

/// The end-moment ratio positive in reverse (double) curvature, -psi, as
/// AISC 360-16's M_1/M_2 and CSA S16-19's kappa take it: 0, not -0, for a
/// diagram with one end at zero (so the working never reads "-0.0").
pub fn reverse_ratio(psi: f64) -> f64 {
    if psi == 0.0 {
        0.0
    } else {
        -psi
    }
}

/// Classifies a diagram.
pub fn shape(m: &Moments) -> Shape {
    let ends = m.a_knm != 0.0 || m.b_knm != 0.0;
    match (ends, m.span_knm != 0.0) {
        (false, false) => Shape::None,
        (true, false) => {
            let (large, small) = if m.a_knm.abs() >= m.b_knm.abs() {
                (m.a_knm, m.b_knm)
            } else {
                (m.b_knm, m.a_knm)
            };
            Shape::Linear {
                psi: (small / large).clamp(-1.0, 1.0),
            }
        }
        (false, true) => Shape::Span(m.span_load),
        (true, true) => Shape::Combined,
    }
}

/// The largest positive and the largest negative moment along the member
/// (both >= 0, kNm): at an end, at mid-length, or (uniform load) at the
/// stationary point of the parabola.
pub fn signed_extremes(m: &Moments) -> (f64, f64) {
    let mid = m.at(0.5);
    let vertex = if m.span_load == SpanLoad::Uniform && m.span_knm != 0.0 {
        // dM/ds = (M_b - M_a) + 4 M_span (1 - 2 s) = 0.
        let s = 0.5 + (m.b_knm - m.a_knm) / (8.0 * m.span_knm);
        if s > 0.0 && s < 1.0 {
            m.at(s)
        } else {
            mid
        }
    } else {
        mid
    };
    let (mut hi, mut lo) = (0.0f64, 0.0f64);
    for v in [m.a_knm, m.b_knm, mid, vertex] {
        hi = hi.max(v);
        lo = lo.min(v);
    }
    (hi, -lo)
}

/// AISC 360-16 Eq. F1-1: C_b = 12.5 M_max / (2.5 M_max + 3 M_A + 4 M_B +
/// 3 M_C), absolute values at the quarter points; M_max over the segment.
pub fn c_b(m: &Moments) -> f64 {
    let (ma, mb, mc) = (m.at(0.25).abs(), m.at(0.5).abs(), m.at(0.75).abs());
    let max = m.max_abs_knm();
    if max == 0.0 {
        return 1.0;
    }
    12.5 * max / (2.5 * max + 3.0 * ma + 4.0 * mb + 3.0 * mc)
}

/// CSA S16-19 13.6(a): omega_2 = 4 M_max / sqrt(M_max^2 + 4 M_a^2 + 7 M_b^2 +
/// 4 M_c^2) <= 2.5, M_a, M_b, M_c at the quarter points.
pub fn omega_2(m: &Moments) -> f64 {
    let (ma, mb, mc) = (m.at(0.25), m.at(0.5), m.at(0.75));
    let max = m.max_abs_knm();
    if max == 0.0 {
        return 1.0;
    }
    (4.0 * max / (max * max + 4.0 * ma * ma + 7.0 * mb * mb + 4.0 * mc * mc).sqrt()).min(2.5)
}

/// Moment factors C1 and C2 for the elastic critical moment, k = 1, with
/// the source of the values.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct CFactors {
    /// C1.
    pub c1: f64,
    /// C2 (the load-level factor; 0 without transverse load).
    pub c2: f64,
    /// Which rule gave them.
    pub source: CSource,
}

/// Where C1 and C2 came from.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum CSource {
    /// Uniform moment: C1 = 1 exactly (the closed form).
    Uniform,
    /// End moments: C1 = 1.88 - 1.40 psi + 0.52 psi^2 <= 2.70.
    Linear,
    /// Transverse load alone: ENV 1993-1-1:1992 Annex F Table F.1.2, k = 1.
    Span,
    /// Conservative C1 = 1.0 (combined diagram, or the segment's diagram is not known).
    Conservative,
    /// Span load with ends restrained against lateral rotation (k_lt < 1):
    /// C1 no more than [`C1_RESTRAINED_SPAN`].
    RestrainedSpan,
}

/// The lowest C1 of ENV 1993-1-1:1992 Annex F Table F.1.2 at k = 0.5 (a
/// uniform load between ends fixed in the plane of bending; recalled from
/// memory), taken for any span load when k_lt < 1.
pub const C1_RESTRAINED_SPAN: f64 = 0.712;

/// C1 and C2 for a diagram (k = 1, the diagram over the unbraced segment).
///
/// Sources: end moments, C1 = 1.88 - 1.40 psi + 0.52 psi^2 <= 2.70, the
/// approximation given with ENV 1993-1-1:1992 Annex F (recalled from
/// memory), exact (1.0) at psi = 1; transverse load alone on a simply
/// supported span, ENV 1993-1-1:1992 Annex F Table F.1.2 for k = 1: uniform
/// load C1 = 1.132, C2 = 0.459; point load at mid-span C1 = 1.365, C2 = 0.553
/// (recalled from memory). A diagram with both, or one that is not the
/// segment's (lcr_lt_mm or k_lt given): C1 = 1.0, the uniform-moment value,
/// and C2 of the span load alone for the load level (conservative).
pub fn c_factors(m: &Moments, segment: bool) -> CFactors {
    let span_c2 = match m.span_load {
        SpanLoad::Uniform => 0.459,
        SpanLoad::Point => 0.553,
    };
    let c2_if_span = if m.span_knm != 0.0 { span_c2 } else { 0.0 };
    if !segment {
        return CFactors {
            c1: 1.0,
            c2: c2_if_span,
            source: CSource::Conservative,
        };
    }
    match shape(m) {
        Shape::None => CFactors {
            c1: 1.0,
            c2: 0.0,
            source: CSource::Uniform,
        },
        Shape::Linear { psi: 1.0 } => CFactors {
            c1: 1.0,
            c2: 0.0,
            source: CSource::Uniform,
        },
        Shape::Linear { psi } => CFactors {
            c1: (1.88 - 1.40 * psi + 0.52 * psi * psi).min(2.70),
            c2: 0.0,
            source: CSource::Linear,
        },
        Shape::Span(load) => match load {
            SpanLoad::Uniform => CFactors {
                c1: 1.132,
                c2: 0.459,
                source: CSource::Span,
            },
            SpanLoad::Point => CFactors {
                c1: 1.365,
                c2: 0.553,
                source: CSource::Span,
            },
        },
        Shape::Combined => CFactors {
            c1: 1.0,
            c2: c2_if_span,
            source: CSource::Conservative,
        },
    }
}

/// The distance from the shear centre to the point of load application, mm,
/// positive where it destabilises (on the compression flange): +h/2 on the
/// compression flange, -h/2 on the tension flange, 0 at the shear centre.
pub fn z_g(level: LoadLevel, depth_mm: f64) -> f64 {
    match level {
        LoadLevel::ShearCentre => 0.0,
        LoadLevel::CompressionFlange => depth_mm / 2.0,
        LoadLevel::TensionFlange => -depth_mm / 2.0,
    }
}

/// The elastic critical moment of a doubly symmetric section, N mm, by the
/// three-factor formula (k = k_lt, k_w = 1):
/// M_cr = C1 pi^2 E I_z / (k L)^2 { sqrt[ k^2 I_w / I_z + (k L)^2 G I_t /
/// (pi^2 E I_z) + (C2 z_g)^2 ] - C2 z_g }. With C1 = 1, C2 = 0 and k = 1 it
/// is the closed form for uniform moment, pi/L sqrt(E I_z G I_t) sqrt(1 +
/// pi^2 E I_w / (L^2 G I_t)) (Timoshenko & Gere, Theory of Elastic
/// Stability, 2nd ed., 1961, 6.2).
#[allow(clippy::too_many_arguments)]
pub fn m_cr(
    e: f64,
    g: f64,
    i_z: f64,
    i_t: f64,
    i_w: f64,
    kl_mm: f64,
    k: f64,
    c: CFactors,
    z_g_mm: f64,
) -> f64 {
    m_cr_mono(
        e,
        g,
        i_z,
        i_t,
        i_w,
        kl_mm,
        k,
        [c.c1, c.c2, 0.0],
        z_g_mm,
        0.0,
    )
}

/// The elastic critical moment of a monosymmetric section, N mm, by the
/// three-factor formula of ENV 1993-1-1:1992 Annex F (Eq. F.2), k_w = 1:
/// M_cr = C1 pi^2 E I_z / (k L)^2 { sqrt[ k^2 I_w / I_z + (k L)^2 G I_t /
/// (pi^2 E I_z) + (C2 z_g - C3 z_j)^2 ] - (C2 z_g - C3 z_j) }, `c` = [C1,
/// C2, C3], z_g and z_j positive towards the compressed side (z_j > 0: the
/// larger flange compressed). With C3 = 1, C2 = 0 it is exact for uniform
/// moment (the Wagner term of Trahair, Flexural-Torsional Buckling of
/// Structures, 1993, ch. 6, with beta_x = 2 z_j).
#[allow(clippy::too_many_arguments)]
pub fn m_cr_mono(
    e: f64,
    g: f64,
    i_z: f64,
    i_t: f64,
    i_w: f64,
    kl_mm: f64,
    k: f64,
    c: [f64; 3],
    z_g_mm: f64,
    z_j_mm: f64,
) -> f64 {
    let [c1, c2, c3] = c;
    let pi2 = std::f64::consts::PI * std::f64::consts::PI;
    let euler = pi2 * e * i_z / (kl_mm * kl_mm);
    let a = c2 * z_g_mm - c3 * z_j_mm;
    let root = (k * k * i_w / i_z + kl_mm * kl_mm * g * i_t / (pi2 * e * i_z) + a * a).sqrt();
    c1 * euler * (root - a)
}

/// Pushes the moment diagram's working for an axis: the end moments, the
/// span moment and the largest moment along the member.
pub fn push_diagram(trace: &mut Trace, axis: Axis, m: &Moments) -> f64 {
    let s = axis.scope();
    let max = m.max_abs_knm();
    step!(
        trace,
        s,
        "M_a",
        "design moment at end A (x = 0)",
        m.a_knm,
        "kNm",
        "member file"
    );
    step!(
        trace,
        s,
        "M_b",
        "design moment at end B (x = L)",
        m.b_knm,
        "kNm",
        "member file"
    );
    if m.span_knm != 0.0 {
        match m.span_load {
            SpanLoad::Uniform => step!(
                trace,
                s,
                "M_span",
                "mid-length moment from a uniform load, above the end-moment line",
                m.span_knm,
                "kNm",
                "member file"
            ),
            SpanLoad::Point => step!(
                trace,
                s,
                "M_span",
                "mid-length moment from a point load at mid-length, above the end-moment line",
                m.span_knm,
                "kNm",
                "member file"
            ),
        }
    }
    step!(
        trace,
        s,
        "M_Ed",
        "largest design moment along the member",
        max,
        "kNm",
        "M(x) = M_a + (M_b - M_a) x/L + M_span shape(x/L)"
    );
    max
}

/// Pushes the length between lateral restraints, mm.
pub fn push_unbraced_length(trace: &mut Trace, s: Scope, lb: f64) {
    step!(
        trace,
        s,
        "L_b",
        "unbraced length (k_lt L or lcr_lt_mm)",
        lb,
        "mm",
        "member file"
    );
}

/// Pushes C1 and C2 with their source.
pub fn push_c_factors(trace: &mut Trace, c: &CFactors, z_g_mm: f64) {
    let s = Scope::BendingMajor;
    match c.source {
        CSource::Uniform => step!(
            trace,
            s,
            "C1",
            "moment factor, uniform moment",
            c.c1,
            "-",
            "closed form (Timoshenko & Gere 6.2)"
        ),
        CSource::Linear => step!(
            trace,
            s,
            "C1",
            "moment factor, end moments: 1.88 - 1.40 psi + 0.52 psi^2 <= 2.70",
            c.c1,
            "-",
            "ENV 1993-1-1:1992 Annex F (recalled from memory)"
        ),
        CSource::Span => step!(
            trace,
            s,
            "C1",
            "moment factor, transverse load on a simple span, k = 1",
            c.c1,
            "-",
            "ENV 1993-1-1:1992 Annex F Table F.1.2 (recalled from memory)"
        ),
        CSource::Conservative => step!(
            trace,
            s,
            "C1",
            "moment factor taken as 1.0 (uniform moment, conservative): end moments with \
             transverse load, or a restrained length other than the member length",
            c.c1,
            "-",
            "conservative choice; EN 1993-1-1 gives no C1"
        ),
        CSource::RestrainedSpan => step!(
            trace,
            s,
            "C1",
            "moment factor with load in the span and k_lt < 1: no more than the lowest tabulated              value for k = 0.5 (0.712), conservative",
            c.c1,
            "-",
            "ENV 1993-1-1:1992 Annex F Table F.1.2, k = 0.5 (recalled)"
        ),
    }
    if z_g_mm != 0.0 {
        step!(
            trace,
            s,
            "C2",
            "load-level factor of the transverse load",
            c.c2,
            "-",
            "ENV 1993-1-1:1992 Annex F Table F.1.2 (recalled from memory)"
        );
        step!(
            trace,
            s,
            "z_g",
            "load point above the shear centre (+ destabilising)",
            z_g_mm,
            "mm",
            "load_level"
        );
    }
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
    fn c_b_of_the_standard_diagrams() {
        // AISC 360-16 Commentary Table C-F1.1 / the F1-1 values: uniform
        // moment 1.0, uniform load on a simple span 1.14, point load at
        // mid-span 1.32, end moments in double curvature (psi = -1) 2.27
        // (recalled from memory; the formula gives these to 3 digits).
        let close = |a: f64, b: f64| (a - b).abs() < 5e-3;
        assert!(close(c_b(&mo(10.0, 10.0, 0.0, SpanLoad::Uniform)), 1.0));
        assert!(close(c_b(&mo(0.0, 0.0, 10.0, SpanLoad::Uniform)), 1.136));
        assert!(close(c_b(&mo(0.0, 0.0, 10.0, SpanLoad::Point)), 1.316));
        assert!(close(c_b(&mo(10.0, -10.0, 0.0, SpanLoad::Uniform)), 2.273));
        // One end moment, the other zero: 1.67.
        assert!(close(c_b(&mo(10.0, 0.0, 0.0, SpanLoad::Uniform)), 1.667));
    }

    #[test]
    fn omega_2_of_the_standard_diagrams() {
        let close = |a: f64, b: f64| (a - b).abs() < 5e-3;
        assert!(close(omega_2(&mo(10.0, 10.0, 0.0, SpanLoad::Uniform)), 1.0));
        // Uniform load on a simple span: 4 / sqrt(1 + 4(0.75^2) 2 + 7) = 1.13.
        assert!(close(
            omega_2(&mo(0.0, 0.0, 10.0, SpanLoad::Uniform)),
            4.0 / (1.0f64 + 8.0 * 0.5625 + 7.0).sqrt()
        ));
        // Double curvature: capped at 2.5.
        assert!(omega_2(&mo(10.0, -10.0, 0.0, SpanLoad::Uniform)) <= 2.5);
    }

    #[test]
    fn signed_extremes_find_both_signs() {
        // Single curvature, uniform load: all positive.
        assert_eq!(
            signed_extremes(&mo(0.0, 0.0, 10.0, SpanLoad::Uniform)),
            (10.0, 0.0)
        );
        // Double curvature: +10 at A, -6 at B.
        assert_eq!(
            signed_extremes(&mo(10.0, -6.0, 0.0, SpanLoad::Uniform)),
            (10.0, 6.0)
        );
        // Hogging ends with a sagging span: -8 at the ends, +2 at mid-length
        // (10 above the end line), the parabola's top at s = 0.5.
        assert_eq!(
            signed_extremes(&mo(-8.0, -8.0, 10.0, SpanLoad::Uniform)),
            (2.0, 8.0)
        );
        // Point load: the peak at mid-length.
        let (hi, lo) = signed_extremes(&mo(-4.0, 0.0, 6.0, SpanLoad::Point));
        assert!((hi - 4.0).abs() < 1e-12 && lo == 4.0);
    }

    #[test]
    fn c1_follows_its_sources() {
        let u = c_factors(&mo(5.0, 5.0, 0.0, SpanLoad::Uniform), true);
        assert_eq!((u.c1, u.source), (1.0, CSource::Uniform));
        let l = c_factors(&mo(5.0, 0.0, 0.0, SpanLoad::Uniform), true);
        assert_eq!(l.c1, 1.88);
        let d = c_factors(&mo(5.0, -5.0, 0.0, SpanLoad::Uniform), true);
        assert_eq!(d.c1, 2.70);
        let w = c_factors(&mo(0.0, 0.0, 5.0, SpanLoad::Uniform), true);
        assert_eq!((w.c1, w.c2), (1.132, 0.459));
        let c = c_factors(&mo(1.0, 0.0, 5.0, SpanLoad::Point), true);
        assert_eq!((c.c1, c.c2, c.source), (1.0, 0.553, CSource::Conservative));
        let n = c_factors(&mo(5.0, 0.0, 0.0, SpanLoad::Uniform), false);
        assert_eq!(n.c1, 1.0);
    }
}
