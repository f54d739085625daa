//! AISC 360-16 H1.1 (Eqs. H1-1a, H1-1b) for doubly and singly symmetric
//! members, H2-1 for a given section (its symmetry is not known), with B1
//! of Appendix 8.2.1; LRFD and ASD.
//!
//! - P_r is the member's `axial_kn`; P_c the governing available axial
//!   strength of Chapter E (phi_c P_n or P_n / Omega_c: the lowest of every
//!   mode checked, flexural about both axes and the twisting mode).
//! - M_cx, M_cy are the available flexural strengths of Chapter F, the
//!   bending result's resistances (with lateral-torsional buckling and C_b).
//! - M_rx, M_ry: the largest first-order moment along the member about each
//!   axis, M_nt (member file), times B1 of Appendix 8.2.1 when
//!   `amplify_moments` is true: B1 = C_m / (1 - alpha P_r / P_e1) >= 1
//!   (Eq. A-8-3), alpha = 1.00 (LRFD) or 1.60 (ASD), P_e1 = pi^2 EI* /
//!   L_c1^2 (Eq. A-8-5) with EI* = EI (the effective-length method: the
//!   member's buckling lengths are given, so the stiffness is not reduced)
//!   and L_c1 the effective length with no lateral translation of the ends,
//!   K1 = 1 over the laterally unbraced length unless analysis justifies a
//!   smaller value, which the member file cannot say
//!   ([`super::own_length`]): a shorter buckling length (k < 1, a shorter
//!   `lcr_*_mm`, a buckling model's end restraints) is raised to the
//!   unbraced length, with the warning `amplification-length-major` /
//!   `-minor`; a frame's k is not used (sway is B2's); a longer buckling
//!   length without a frame is kept (maybe a sway mode: the safe side); a
//!   buckling model's fixed braces shorten the unbraced length; C_m = 0.6 -
//!   0.4 M_1/M_2 (Eq. A-8-4) without transverse load, M_1/M_2 positive in
//!   reverse curvature (in the member file's convention M_1/M_2 = -M_small /
//!   M_large, the signed end moments), and C_m = 1.0 with transverse load
//!   (Appendix 8.2.1(b), the conservative value the clause permits). With
//!   `amplify_moments` false the moments given already include the member's
//!   second-order effects and B1 is not applied. B2 (Appendix 8.2.2, sway)
//!   belongs to the frame analysis and is outside the member check: the
//!   moments given must include it. Taking the largest moment about each
//!   axis, wherever along the member it acts, is conservative.
//! - P_e1 <= alpha P_r: the member buckles in the plane of bending under the
//!   axial load alone; B1 has no finite value and the equation's
//!   utilisation is infinite (the member fails, and a warning says why).
//! - H1-1a when P_r / P_c >= 0.2: P_r/P_c + 8/9 (M_rx/M_cx + M_ry/M_cy);
//!   H1-1b otherwise: P_r/(2 P_c) + (M_rx/M_cx + M_ry/M_cy).
//! - H2-1 (a given section, whose symmetry the member file does not tell):
//!   f_ra/F_ca + f_rbw/F_cbw + f_rbz/F_cbz with every term positive (the
//!   worst point of the section); a given section's flexural strength is
//!   F_y S (first yield), so each stress ratio equals the force ratio,
//!   P_r/P_c + M_rw/M_cw + M_rz/M_cz, never below H1-1a or H1-1b (the
//!   conservative choice for an unknown section).
//! - Single angles and tees: H2-1 at the critical points about the
//!   principal axes (an angle's toes and heel, a tee's flange tips and stem
//!   tip), each flexural term +-M_r/M_c with the strength of the sign of
//!   moment that acts (the section modulus to the point in f_rb and F_cb
//!   alike, as the Specification words it), + where it compresses the
//!   point; both axes' moments at the same section, the largest along the
//!   member found exactly, B1 on the compressing terms only; the largest
//!   point governs. F10 sends an angle with axial load
//!   or biaxial moments to H2; for a tee I_yc/I_y lies outside H1.1's 0.1
//!   to 0.9, and H2 may be used for any shape.
//!
//! Eq. numbers and text recalled from memory of the 2016 Specification.

use super::{own_length, ratio, warn_given, warn_raised, Check, Context, OwnBasis};
use crate::bending::aisc360_angle as angle;
use crate::bending::{moments, shape, Axis, AxisBending, Shape};
use crate::error::Result;
use crate::member::{Method, Moments, SpanLoad};
use crate::method::common::{require_steel, warn_once_text, warn_once_with};
use crate::outcome::{Arg, Warning};
use crate::section::{Family, SectionSpec};
use crate::trace::{push, put, step, sym, symbol, Scope, Sym, Symbol, Trace};
use crate::units::Quantity;

/// alpha of Appendix 8.2.1: 1.00 (LRFD).
pub const ALPHA_LRFD: f64 = 1.0;
/// alpha of Appendix 8.2.1: 1.60 (ASD).
pub const ALPHA_ASD: f64 = 1.6;

const S: Scope = Scope::Interaction;

/// The per-axis symbols of the working.
struct Names {
    m_nt: Symbol,
    ratio: Symbol,
    c_m: Symbol,
    l_c1: Symbol,
    p_e1: Symbol,
    b1: Symbol,
    m_r: Symbol,
    m_c: Symbol,
}

fn names(axis: Axis) -> Names {
    match axis {
        Axis::Major => Names {
            m_nt: symbol!("M_ntx", "kNm"),
            ratio: symbol!("M_1/M_2 (x)", "-"),
            c_m: symbol!("C_mx", "-"),
            l_c1: symbol!("L_c1x", "mm"),
            p_e1: symbol!("P_e1x", "kN"),
            b1: symbol!("B1x", "-"),
            m_r: symbol!("M_rx", "kNm"),
            m_c: symbol!("M_cx", "kNm"),
        },
        Axis::Minor => Names {
            m_nt: symbol!("M_nty", "kNm"),
            ratio: symbol!("M_1/M_2 (y)", "-"),
            c_m: symbol!("C_my", "-"),
            l_c1: symbol!("L_c1y", "mm"),
            p_e1: symbol!("P_e1y", "kN"),
            b1: symbol!("B1y", "-"),
            m_r: symbol!("M_ry", "kNm"),
            m_c: symbol!("M_cy", "kNm"),
        },
    }
}

/// C_m of Appendix 8.2.1 for a moment diagram, with M_1/M_2 (positive in
/// reverse curvature) where end moments alone act; `None` for M_1/M_2
/// with transverse load (C_m = 1.0).
pub fn c_m(m: &crate::member::Moments) -> (f64, Option<f64>) {
    match shape(m) {
        // The file's psi = M_small / M_large is positive in single
        // curvature; M_1/M_2 of Eq. A-8-4 is positive in reverse curvature.
        Shape::Linear { psi } => (0.6 + 0.4 * psi, Some(crate::bending::reverse_ratio(psi))),
        Shape::Span(_) | Shape::Combined => (1.0, None),
        Shape::None => (1.0, None),
    }
}

/// B1 of Eq. A-8-3, `None` where P_e1 <= alpha P_r (no finite amplification).
pub fn b1(c_m: f64, alpha: f64, p_r: f64, p_e1: f64) -> Option<f64> {
    if p_e1 <= alpha * p_r {
        None
    } else {
        Some((c_m / (1.0 - alpha * p_r / p_e1)).max(1.0))
    }
}

/// The required flexural strength about `axis`, kNm (infinite where B1 has
/// no finite value), with its working.
fn required(
    ctx: &Context<'_>,
    axis: Axis,
    alpha: f64,
    e_mpa: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> f64 {
    let n = names(axis);
    let input = ctx.input;
    let diagram = moments(input, axis);
    let m_nt = diagram.max_abs_knm();
    if m_nt == 0.0 {
        return 0.0;
    }
    put(
        trace,
        S,
        n.m_nt,
        sym!("largest first-order moment along the member (no lateral translation)"),
        m_nt,
        sym!("member file; AISC 360-16 Appendix 8.2"),
    );
    if !input.member.amplify_moments {
        put(
            trace,
            S,
            n.b1,
            sym!("not applied (amplify_moments false): the moments given include the member's second-order effects"),
            1.0,
            sym!("AISC 360-16 Appendix 8.2.1 (member file)"),
        );
        put(
            trace,
            S,
            n.m_r,
            sym!("required flexural strength, the moment given"),
            m_nt,
            sym!("AISC 360-16 H1.1"),
        );
        return m_nt;
    }
    let (cm, ratio) = c_m(&diagram);
    match ratio {
        Some(r) => {
            put(
                trace,
                S,
                n.ratio,
                sym!("ratio of the smaller to the larger end moment, positive in reverse curvature"),
                r,
                sym!("AISC 360-16 Appendix 8.2.1(a)"),
            );
            put(
                trace,
                S,
                n.c_m,
                sym!("equivalent uniform moment factor 0.6 - 0.4 M_1/M_2, no transverse load"),
                cm,
                sym!("AISC 360-16 Eq. A-8-4"),
            );
        }
        None => put(
            trace,
            S,
            n.c_m,
            sym!("equivalent uniform moment factor with transverse load between the ends (the conservative value)"),
            cm,
            sym!("AISC 360-16 Appendix 8.2.1(b)"),
        ),
    }
    let p = &input.section.props;
    let i = match axis {
        Axis::Major => p.i_major_mm4,
        Axis::Minor => p.i_minor_mm4,
    };
    let own = own_length(ctx, axis);
    let l = own.mm;
    let p_e1 = crate::method::common::euler_n(e_mpa, i, l) / 1000.0;
    put(
        trace,
        S,
        n.l_c1,
        match own.basis {
            OwnBasis::Buckling => sym!("effective length in the plane of bending, no lateral translation of the ends: the member's buckling length about this axis, not shorter than the laterally unbraced length (K1 >= 1)"),
            OwnBasis::Frame { sway: false } => sym!("effective length in the plane of bending: the laterally unbraced length, K1 = 1 (the braced frame's k is for the compression check; a smaller L_c1 needs an analysis that justifies it)"),
            OwnBasis::Frame { sway: true } => sym!("effective length in the plane of bending: the laterally unbraced length, K1 = 1, no lateral translation of the ends (the sway frame's k is for the compression check; sway is B2's, outside the member check)"),
            OwnBasis::Raised => sym!("effective length in the plane of bending: the laterally unbraced length, K1 = 1, longer than the buckling length about this axis (a smaller L_c1 needs an analysis that justifies it; the safe side)"),
            OwnBasis::Given => sym!("effective length in the plane of bending, no lateral translation of the ends: as given from the engineer's analysis (amplification length), which must justify it; for B1 only, not for the compression strength"),
        },
        l,
        sym!("AISC 360-16 Appendix 8.2.1"),
    );
    let said = ("B1", "L_c1", "AISC 360-16 Appendix 8.2.1");
    warn_raised(warnings, axis, &own, said);
    warn_given(warnings, axis, &own, said);
    put(
        trace,
        S,
        n.p_e1,
        sym!("elastic critical buckling strength pi^2 EI / L_c1^2, EI unreduced (effective-length method)"),
        p_e1,
        sym!("AISC 360-16 Eq. A-8-5"),
    );
    let p_r = input.member.axial_kn;
    let Some(b) = b1(cm, alpha, p_r, p_e1) else {
        put(
            trace,
            S,
            n.b1,
            sym!("no finite value: P_e1 <= alpha P_r, the member buckles in the plane of bending under the axial load alone"),
            f64::INFINITY,
            sym!("AISC 360-16 Eq. A-8-3"),
        );
        warn_once_with(warnings, "b1-unbounded", || {
            Warning::with_args(
                "b1-unbounded",
                "axial_kn: alpha P_r = {} reaches the elastic buckling load in the plane of \
                 bending P_e1 = {} (AISC 360-16 Appendix 8.2.1), so the moments have no \
                 finite amplification B1 and the member fails; choose a stiffer section or a \
                 shorter buckling length",
                &[
                    Arg::figure(alpha * p_r, Quantity::Force, 1),
                    Arg::figure(p_e1, Quantity::Force, 1),
                ],
            )
        });
        return f64::INFINITY;
    };
    put(
        trace,
        S,
        n.b1,
        sym!("member moment amplifier C_m / (1 - alpha P_r / P_e1) >= 1, applied (amplify_moments true)"),
        b,
        sym!("AISC 360-16 Eq. A-8-3"),
    );
    let m_r = b * m_nt;
    put(
        trace,
        S,
        n.m_r,
        sym!(
            "required flexural strength B1 M_nt (B2 M_lt of the frame is outside the member check)"
        ),
        m_r,
        sym!("AISC 360-16 Eq. A-8-1"),
    );
    m_r
}

fn capacity(trace: &mut Trace, axis: Axis, b: &AxisBending, basis_lrfd: bool) -> f64 {
    let label: Sym = if basis_lrfd {
        sym!("available flexural strength phi_b M_n (Chapter F, with lateral-torsional buckling)")
    } else {
        sym!("available flexural strength M_n / Omega_b (Chapter F, with lateral-torsional buckling)")
    };
    put(
        trace,
        S,
        names(axis).m_c,
        label,
        b.resistance_knm,
        sym!("AISC 360-16 H1.1, Chapter F"),
    );
    b.resistance_knm
}

/// A critical point of a single angle or a tee for H2-1: its name in the
/// working and its principal coordinates (u, v) from the centroid, mm (u
/// along the major principal axis, v along the minor principal direction).
type Point = (&'static str, (f64, f64));

/// The critical points of the section where H2-1 is worked: a single
/// angle's two toes and heel, a tee's two flange tips and stem tip; `None`
/// for the shapes H1.1 covers.
fn critical_points(input: &crate::method::Input<'_>) -> Option<[Point; 3]> {
    let p = &input.section.props;
    match &input.section.spec {
        SectionSpec::Angle(a) => {
            let pts = angle::points(a, p);
            Some([
                ("H2-1 at the toe of the leg depth_mm", pts.toe_h[0]),
                ("H2-1 at the heel", pts.heel),
                ("H2-1 at the toe of the leg width_mm", pts.toe_b[0]),
            ])
        }
        SectionSpec::Tee(t) => {
            let (sin, cos) = crate::trig::sin_cos(p.principal_angle_rad);
            let uv = |y: f64, z: f64| {
                let (dy, dz) = (y - p.centroid_y_mm, z - p.centroid_z_mm);
                (dy * cos + dz * sin, -dy * sin + dz * cos)
            };
            Some([
                ("H2-1 at one flange tip", uv(0.0, t.depth_mm)),
                ("H2-1 at the other flange tip", uv(t.width_mm, t.depth_mm)),
                ("H2-1 at the stem tip", uv(0.5 * t.width_mm, 0.0)),
            ])
        }
        _ => None,
    }
}

/// The side of the axis of bending a point is on: +1 where a positive
/// moment compresses it, -1 where it puts it in tension, 0 on the axis
/// (within 1e-9 of the section's size).
fn side_of(d: f64, size: f64) -> f64 {
    if d.abs() <= 1e-9 * size {
        0.0
    } else {
        d.signum()
    }
}

/// A moment diagram on one half of the member (s in [0, 0.5] or [0.5, 1])
/// as the polynomial p0 + p1 s + p2 s^2, kNm (the member file's M(x) with a
/// uniform span load is one parabola, with a point load two lines).
fn half_poly(m: &Moments, second: bool) -> [f64; 3] {
    let (a, b, c) = (m.a_knm, m.b_knm, m.span_knm);
    match (m.span_load, second) {
        (SpanLoad::Uniform, _) => [a, b - a + 4.0 * c, -4.0 * c],
        (SpanLoad::Point, false) => [a, b - a + 2.0 * c, 0.0],
        (SpanLoad::Point, true) => [a + 2.0 * c, b - a - 2.0 * c, 0.0],
    }
}

/// Up to 12 places along the member (no allocation in the check).
#[derive(Default)]
struct Places {
    s: [f64; 12],
    n: usize,
}

impl Places {
    fn push(&mut self, v: f64) {
        if let Some(slot) = self.s.get_mut(self.n) {
            *slot = v;
            self.n += 1;
        }
    }

    fn sorted(&mut self) -> &[f64] {
        let v = self.s.get_mut(..self.n).unwrap_or(&mut []);
        v.sort_by(f64::total_cmp);
        v
    }
}

/// Pushes the roots of p0 + p1 s + p2 s^2 that lie strictly within (lo, hi).
fn roots_within(p: [f64; 3], lo: f64, hi: f64, out: &mut Places) {
    let [p0, p1, p2] = p;
    let mut keep = |s: f64| {
        if s.is_finite() && s > lo && s < hi {
            out.push(s);
        }
    };
    if p2 == 0.0 {
        if p1 != 0.0 {
            keep(-p0 / p1);
        }
        return;
    }
    let disc = p1 * p1 - 4.0 * p2 * p0;
    if disc >= 0.0 {
        let r = disc.sqrt();
        keep((-p1 + r) / (2.0 * p2));
        keep((-p1 - r) / (2.0 * p2));
    }
}

/// One axis' flexural term of H2-1 at a point on `side` (+1 where a
/// positive moment compresses it, -1 where it stretches it, 0 on the axis)
/// for the moment `m` there, kNm: side M / M_c of that sign of moment,
/// times B1 (`amp`) where it compresses the point; a relieving term is not
/// amplified (the smaller relief, conservative).
fn flexural_term(b: &AxisBending, side: f64, amp: f64, m: f64) -> f64 {
    if side == 0.0 || m == 0.0 {
        return 0.0;
    }
    let t = side * ratio(m.abs(), b.resistance_for(m > 0.0)) * m.signum();
    if t > 0.0 {
        t * amp
    } else {
        t
    }
}

/// H2-1 at each critical point, along the member, the largest returned.
/// At a point the flexural term about an axis is f_rb/F_cb with the
/// section modulus S to that point in both (the Specification's wording),
/// so it is +-M_r/M_c of the sign of moment acting at that section, + where
/// it compresses the point, 0 on the axis. The two axes' moments are taken
/// together at each section x of the member, so a relieving moment counts
/// only as large as it is where the other acts; the largest is found
/// exactly: on each piece between the ends, mid-length and the zeros of
/// either diagram the sum is one quadratic in x, so its largest value is at
/// a piece's end or its stationary point.
fn h2_at_points(
    ctx: &Context<'_>,
    points: &[Point; 3],
    axial: f64,
    (m_rx, m_ry): (f64, f64),
    trace: &mut Trace,
) -> f64 {
    if !(m_rx.is_finite() && m_ry.is_finite()) {
        // B1 without a finite value: the member fails (a warning says why);
        // no point may offset an infinite term by another.
        step!(
            trace,
            S,
            "H2-1",
            "no finite value: the moments have no finite amplification B1",
            f64::INFINITY,
            "-",
            "AISC 360-16 Eq. H2-1, Eq. A-8-3"
        );
        return f64::INFINITY;
    }
    let input = ctx.input;
    let (mw, mz) = (moments(input, Axis::Major), moments(input, Axis::Minor));
    let amp = |m: &Moments, m_r: f64| {
        let m_nt = m.max_abs_knm();
        if m_nt == 0.0 {
            1.0
        } else {
            m_r / m_nt
        }
    };
    let (amp_w, amp_z) = (amp(&mw, m_rx), amp(&mz, m_ry));
    let (bw, bz) = (&ctx.bending.major, &ctx.bending.minor);
    // Where the pieces meet: the ends, mid-length, the zeros of each diagram.
    let mut places = Places::default();
    for s in [0.0, 0.5, 1.0] {
        places.push(s);
    }
    for m in [&mw, &mz] {
        roots_within(half_poly(m, false), 0.0, 0.5, &mut places);
        roots_within(half_poly(m, true), 0.5, 1.0, &mut places);
    }
    let cuts = places.sorted();
    let size = input.section.props.r_major_mm.max(1.0);
    step!(
        trace,
        S,
        "f_ra/F_ca",
        "required over available axial stress, P_r/A over P_c/A, the same at every point (compression positive)",
        axial,
        "-",
        "AISC 360-16 Eq. H2-1"
    );
    let mut worst = f64::NEG_INFINITY;
    for &(name, pt) in points {
        let side_w = side_of(angle::towards_compression(Axis::Major, pt), size);
        let side_z = side_of(angle::towards_compression(Axis::Minor, pt), size);
        let at = |s: f64| {
            axial
                + flexural_term(bw, side_w, amp_w, mw.at(s))
                + flexural_term(bz, side_z, amp_z, mz.at(s))
        };
        let mut best = f64::NEG_INFINITY;
        for pair in cuts.windows(2) {
            let &[lo, hi] = pair else { continue };
            best = best.max(at(lo)).max(at(hi));
            // Within the piece each term is k M(s), k fixed: the slope of
            // the sum is zero where k_w M_w'(s) + k_z M_z'(s) = 0.
            let mid = 0.5 * (lo + hi);
            let second = mid > 0.5;
            let k = |b: &AxisBending, side: f64, amp: f64, m: &Moments| {
                let v = m.at(mid);
                if v == 0.0 {
                    0.0
                } else {
                    flexural_term(b, side, amp, v) / v
                }
            };
            let (kw, kz) = (k(bw, side_w, amp_w, &mw), k(bz, side_z, amp_z, &mz));
            let (pw, pz) = (half_poly(&mw, second), half_poly(&mz, second));
            let slope = [
                kw * pw[1] + kz * pz[1],
                2.0 * (kw * pw[2] + kz * pz[2]),
                0.0,
            ];
            let mut flat = Places::default();
            roots_within(slope, lo, hi, &mut flat);
            for &s in flat.sorted() {
                best = best.max(at(s));
            }
        }
        push(
            trace,
            S,
            name,
            "f_ra/F_ca + f_rbw/F_cbw + f_rbz/F_cbz at this point, the largest along the member: each flexural term +-M_r/M_c (S to the point in both stresses) of the moment at that section, + where it compresses the point (times B1), - where it relieves it",
            best,
            "-",
            "AISC 360-16 Eq. H2-1",
        );
        worst = worst.max(best);
    }
    step!(
        trace,
        S,
        "H2-1",
        "the largest over the critical points (the toes and the heel of an angle, the flange tips and the stem tip of a tee) and along the member, principal axes",
        worst,
        "-",
        "AISC 360-16 Eq. H2-1"
    );
    worst
}

/// The interaction equations.
pub fn check(
    ctx: &Context<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    let key = ctx.method.key();
    let lrfd = match ctx.method {
        Method::AiscLrfd => true,
        Method::AiscAsd => false,
        _ => return Ok(None),
    };
    let input = ctx.input;
    let steel = require_steel(input, key)?;
    let family = input.section.family;
    let alpha = if lrfd { ALPHA_LRFD } else { ALPHA_ASD };
    let p_r = input.member.axial_kn;
    let p_c = ctx.governing.resistance_kn;
    step!(
        trace,
        S,
        "P_r",
        "required axial strength",
        p_r,
        "kN",
        "member file"
    );
    if lrfd {
        step!(
            trace,
            S,
            "P_c",
            "available axial strength phi_c P_n, the governing mode of Chapter E",
            p_c,
            "kN",
            "AISC 360-16 H1.1"
        );
    } else {
        step!(
            trace,
            S,
            "P_c",
            "available axial strength P_n / Omega_c, the governing mode of Chapter E",
            p_c,
            "kN",
            "AISC 360-16 H1.1"
        );
    }
    if input.member.amplify_moments {
        step!(
            trace,
            S,
            "alpha",
            "1.00 (LRFD) or 1.60 (ASD)",
            alpha,
            "-",
            "AISC 360-16 Appendix 8.2.1"
        );
    }
    step!(
        trace,
        S,
        "B2",
        "sway amplifier taken as 1 here: B2 M_lt (Appendix 8.2.2) belongs to the frame analysis; the moments given must include it",
        1.0,
        "-",
        "AISC 360-16 Appendix 8.2.2 (outside the member check)"
    );
    warn_once_text(
        warnings,
        "sway-not-amplified",
        if input.member.amplify_moments {
            "beam-column: the member's own second-order effect (B1 of AISC 360-16 Appendix \
             8.2.1) is worked here; the frame's sway effect (P-Delta, B2 of Appendix 8.2.2) is \
             not: the moments given must include it"
        } else {
            "beam-column: the moments given are taken as already second-order, as stated: \
             neither the member's own effect (B1 of AISC 360-16 Appendix 8.2.1, taken as 1) nor \
             the frame's sway effect (P-Delta, B2 of Appendix 8.2.2) is worked here: the moments \
             given must include both"
        },
    );
    let e = steel.e_mpa;
    let m_rx = required(ctx, Axis::Major, alpha, e, trace, warnings);
    let m_ry = required(ctx, Axis::Minor, alpha, e, trace, warnings);
    let m_cx = capacity(trace, Axis::Major, &ctx.bending.major, lrfd);
    let m_cy = capacity(trace, Axis::Minor, &ctx.bending.minor, lrfd);
    let axial = ratio(p_r, p_c);
    let bend = ratio(m_rx, m_cx) + ratio(m_ry, m_cy);
    step!(
        trace,
        S,
        "P_r/P_c",
        "axial ratio (0.2 divides H1-1a from H1-1b)",
        axial,
        "-",
        "AISC 360-16 H1.1"
    );
    if let Some(points) = critical_points(input) {
        let u = h2_at_points(ctx, &points, axial, (m_rx, m_ry), trace);
        return Ok(Some(vec![Check {
            check: "H2-1",
            utilisation: u,
        }]));
    }
    if family == Family::Given {
        let u = axial + bend;
        warn_once_text(
            warnings,
            "given-h2",
            "beam-column: the given section's symmetry is not known, so AISC 360-16 H2-1 is used \
             with every stress ratio taken positive (the worst point of the section); this is \
             never below H1-1a or H1-1b",
        );
        step!(
            trace,
            S,
            "H2-1",
            "f_ra/F_ca + f_rbw/F_cbw + f_rbz/F_cbz = P_r/P_c + M_rx/M_cx + M_ry/M_cy (S-based strengths, every term positive)",
            u,
            "-",
            "AISC 360-16 Eq. H2-1"
        );
        return Ok(Some(vec![Check {
            check: "H2-1",
            utilisation: u,
        }]));
    }
    let (name, u) = if axial >= 0.2 {
        let u = axial + 8.0 / 9.0 * bend;
        step!(
            trace,
            S,
            "H1-1a",
            "P_r/P_c + 8/9 (M_rx/M_cx + M_ry/M_cy), P_r/P_c >= 0.2",
            u,
            "-",
            "AISC 360-16 Eq. H1-1a"
        );
        ("H1-1a", u)
    } else {
        let u = axial / 2.0 + bend;
        step!(
            trace,
            S,
            "H1-1b",
            "P_r/(2 P_c) + (M_rx/M_cx + M_ry/M_cy), P_r/P_c < 0.2",
            u,
            "-",
            "AISC 360-16 Eq. H1-1b"
        );
        ("H1-1b", u)
    };
    Ok(Some(vec![Check {
        check: name,
        utilisation: u,
    }]))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::member::{Moments, SpanLoad};

    fn mo(a: f64, b: f64, span: f64) -> Moments {
        Moments {
            a_knm: a,
            b_knm: b,
            span_knm: span,
            span_load: SpanLoad::Uniform,
        }
    }

    /// One end moment zero: M_1/M_2 is 0, never -0 (review N26: the ASD
    /// working read "-0.0").
    #[test]
    fn a_zero_end_moment_gives_a_ratio_of_plain_zero() {
        let m = crate::member::Moments {
            a_knm: 30.0,
            b_knm: 0.0,
            ..Default::default()
        };
        let (cm, ratio) = c_m(&m);
        assert_eq!(cm, 0.6);
        let ratio = ratio.unwrap();
        assert!(ratio == 0.0 && ratio.is_sign_positive(), "{ratio}");
        assert!(format!("{ratio}") == "0");
    }

    #[test]
    fn c_m_follows_eq_a_8_4() {
        // Single curvature, equal ends: M1/M2 = -1, C_m = 1.0.
        assert_eq!(c_m(&mo(10.0, 10.0, 0.0)), (1.0, Some(-1.0)));
        // Reverse curvature, equal ends: M1/M2 = +1, C_m = 0.2.
        let (cm, r) = c_m(&mo(10.0, -10.0, 0.0));
        assert!((cm - 0.2).abs() < 1e-15 && r == Some(1.0));
        // One end zero: C_m = 0.6.
        assert_eq!(c_m(&mo(0.0, 8.0, 0.0)).0, 0.6);
        // Transverse load: 1.0.
        assert_eq!(c_m(&mo(5.0, -5.0, 3.0)), (1.0, None));
    }

    /// The text of a warning of an I-shaped beam-column checked by
    /// `method`, its moments amplified by the check or not.
    fn sway_warning(method: &str, amplify: bool) -> String {
        let m: crate::Member = serde_json::from_value(serde_json::json!({
            "id": "B1", "method": method, "length_mm": 4200, "axial_kn": 400,
            "section": {"kind": "i", "depth_mm": 250, "width_mm": 250, "flange_mm": 14,
                        "web_mm": 9, "root_radius_mm": 12},
            "material": {"fy_mpa": 345, "e_mpa": 200000},
            "m_major_a_knm": 60, "m_major_b_knm": 30, "amplify_moments": amplify}))
        .unwrap();
        let r = crate::check_member(&m).unwrap();
        let w = r.warnings.iter().find(|w| w.code == "sway-not-amplified");
        w.unwrap().message().to_string()
    }

    #[test]
    fn the_sway_warning_says_whether_the_members_own_effect_was_worked() {
        // AISC's B1 and CSA's U_1 (csa_s16.rs) alike: worked, or with
        // amplify_moments false not worked, and the warning says which.
        for (method, worked, not_worked) in [
            (
                "aisc360-lrfd",
                "(B1 of AISC 360-16 Appendix 8.2.1) is worked here",
                "neither the member's own effect (B1 of AISC 360-16 Appendix 8.2.1, taken as 1)",
            ),
            (
                "aisc360-asd",
                "(B1 of AISC 360-16 Appendix 8.2.1) is worked here",
                "neither the member's own effect (B1 of AISC 360-16 Appendix 8.2.1, taken as 1)",
            ),
            (
                "csa-s16",
                "(U_1 of CSA S16-19 13.8.4) is worked here",
                "neither the member's own amplification (the factor 1/(1 - C_f/C_e) of U_1",
            ),
        ] {
            let said = sway_warning(method, true);
            assert!(said.contains(worked), "{method}: {said}");
            let said = sway_warning(method, false);
            assert!(said.contains(not_worked), "{method}: {said}");
            assert!(!said.contains("is worked here;"), "{method}: {said}");
            assert!(said.contains("must include both"), "{method}: {said}");
        }
    }

    #[test]
    fn b1_is_at_least_one_and_refuses_beyond_p_e1() {
        assert_eq!(b1(0.2, 1.0, 10.0, 1000.0), Some(1.0));
        let b = b1(1.0, 1.0, 500.0, 1000.0).unwrap();
        assert!((b - 2.0).abs() < 1e-15);
        assert_eq!(b1(1.0, 1.6, 625.0, 1000.0), None);
        assert_eq!(b1(1.0, 1.0, 1000.0, 1000.0), None);
    }
}
