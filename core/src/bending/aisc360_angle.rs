//! AISC 360-16 F10: single angles bent about their principal axes (the
//! member file's `major` and `minor` are the principal axes w and z of an
//! angle), LRFD and ASD. Equations recalled from memory of the 2016
//! Specification.
//!
//! - Yielding: M_n = 1.5 M_y (F10-1), M_y = F_y S with the smaller elastic
//!   modulus about the axis (first yield).
//! - Lateral-torsional buckling, major principal axis, unless
//!   `lt_restrained`: M_cr of F10-4 with beta_w = 0, which is exact for an
//!   equal-leg angle (symmetric about its major principal axis); C_b of Eq.
//!   F1-1 at most 1.5 (1.0 where the segment's diagram is not known or the
//!   load acts on the compression side); M_n by F10-2 (M_y/M_cr <= 1) or
//!   F10-3. An unequal-leg angle needs beta_w of the Commentary, which is
//!   not worked here: refused unless `lt_restrained`.
//! - Minor principal axis: yielding and leg local buckling only (F10 User
//!   Note).
//! - Leg local buckling (F10.3): b/t of the leg in compression against
//!   0.54 and 0.91 sqrt(E/F_y) (Table B4.1b case 12), F10-6 (noncompact),
//!   F10-7 and F10-8 (slender), S_c the modulus to the toe in compression.
//!   The member file does not tell which toe is compressed, so the longer
//!   leg and the smaller modulus are taken (conservative, said in the
//!   working).
//! - Moments about the legs (geometric axes) must be resolved into the
//!   principal axes by the person; the geometric-axis rules of F10.2(2)
//!   (equal-leg angles, Eqs. F10-5a, F10-5b) are not applied (the
//!   principal-axis route is the one F10 permits for every angle).
//! - An angle bent about both principal axes combines by H2-1 (stresses at
//!   the worst point), which is not worked here: refused.

use super::aisc360::{available, Basis};
use super::{c_b, diagram_is_segment, moments, push_diagram, Axis, AxisBending, Bending};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::LoadLevel;
use crate::method::Input;
use crate::section::{Angle, SectionSpec};
use crate::trace::{step, Trace};

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
) -> Result<Bending> {
    let SectionSpec::Angle(a) = &input.section.spec else {
        return Err(refuse(basis, "AISC 360-16 F10 needs an angle".into()));
    };
    let m = input.member;
    if !m.moments_major().is_zero() && !m.moments_minor().is_zero() {
        return Err(refuse(
            basis,
            "m_minor_a_knm: a single angle bent about both principal axes combines by AISC \
             360-16 H2-1 (the stresses at the worst point of the section), which is not worked \
             here; check this member by hand"
                .into(),
        ));
    }
    Ok(Bending {
        major: axis(input, a, steel, basis, Axis::Major, trace)?,
        minor: axis(input, a, steel, basis, Axis::Minor, trace)?,
    })
}

/// M_cr of Eq. F10-4 with beta_w = 0, N mm: 9 E A r_z t C_b / (8 L_b)
/// [sqrt(1 + (4.4 beta_w r_z / (L_b t))^2) + 4.4 beta_w r_z / (L_b t)].
pub fn m_cr_equal_leg(e: f64, area: f64, r_z: f64, t: f64, cb: f64, lb: f64) -> f64 {
    9.0 * e * area * r_z * t * cb / (8.0 * lb)
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
    let demand = push_diagram(trace, axis, &m);
    let (e, fy) = (steel.e_mpa, steel.fy_mpa);
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
    let yielding = 1.5 * my;
    step!(
        trace,
        s,
        "M_n,Y",
        "yielding 1.5 M_y",
        yielding / 1e6,
        "kNm",
        "AISC 360-16 Eq. F10-1"
    );
    let t = a.thickness_mm;
    let bt = a.depth_mm.max(a.width_mm) / t;
    step!(trace, s, "b/t", "leg slenderness, the longer leg taken as compressed (the member file does not tell which toe is): limits 0.54 and 0.91 sqrt(E/F_y)", bt, "-", "AISC 360-16 Table B4.1b case 12");
    let llb = leg_local(bt, e, fy, sx);
    step!(
        trace,
        s,
        "M_n,LLB",
        "leg local buckling, S_c the smaller modulus (conservative)",
        llb / 1e6,
        "kNm",
        "AISC 360-16 Eq. F10-6 to F10-8"
    );
    let mut mn = yielding.min(llb);
    let mut mcr = None;
    let mut cb_used = None;
    let mut reduction = 1.0;
    if major && !input.member.lt_restrained {
        if (a.depth_mm - a.width_mm).abs() > 1e-9 * a.depth_mm {
            return Err(refuse(
                basis,
                "m_major_a_knm: lateral-torsional buckling of an unequal-leg angle about its \
                 major principal axis needs beta_w (AISC 360-16 F10.2, Commentary), which is not \
                 worked here; set lt_restrained if it is held continuously, or check it by hand"
                    .into(),
            ));
        }
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
            "AISC 360-16 F10.2(1), Eq. F1-1"
        );
        super::push_unbraced_length(trace, s, lb);
        let v = m_cr_equal_leg(e, p.area_mm2, p.r_minor_mm, t, cb, lb);
        step!(
            trace,
            s,
            "M_cr",
            "9 E A r_z t C_b / (8 L_b), beta_w = 0 (equal legs)",
            v / 1e6,
            "kNm",
            "AISC 360-16 Eq. F10-4"
        );
        let l = ltb(my, v);
        step!(
            trace,
            s,
            "M_n,LTB",
            "lateral-torsional buckling",
            l / 1e6,
            "kNm",
            "AISC 360-16 Eq. F10-2, F10-3"
        );
        mn = mn.min(l);
        mcr = Some(v / 1e6);
        cb_used = Some(cb);
        reduction = l / yielding;
    }
    step!(
        trace,
        s,
        "M_n",
        "nominal flexural strength of the single angle",
        mn / 1e6,
        "kNm",
        "AISC 360-16 F10"
    );
    Ok(AxisBending {
        resistance_knm: available(basis, mn, s, trace),
        critical_knm: mcr,
        reduction: reduction.min(1.0),
        moment_factor: cb_used,
        demand_knm: demand,
    })
}
