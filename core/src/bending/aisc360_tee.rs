//! AISC 360-16 F9: tees loaded in the plane of symmetry (bending about the
//! axis parallel to the flange, AISC's x-x; the section's geometric y-y),
//! LRFD and ASD. Equations recalled from memory of the 2016 Specification.
//!
//! Sign: a positive moment about y-y compresses the flange (the tee drawn
//! in its reference position, flange up, under a sagging moment) and puts
//! the stem in tension; a negative one compresses the stem. Each sign is
//! checked against its own strength; a warning says how the sign is read.
//!
//! - Stem in tension (positive moment): yielding M_p = F_y Z_x <= 1.6 M_y
//!   (F9-2), M_y = F_y S_x (F9-3, S_x the smaller modulus, to the stem tip);
//!   lateral-torsional buckling L_p = 1.76 r_y sqrt(E/F_y) (F9-8), L_r
//!   (F9-9), the line from M_p to M_y (F9-6), M_cr beyond L_r (F9-7,
//!   F9-10 with B = +2.3 (d/L_b) sqrt(I_y/J), F9-11); flange local buckling
//!   (F9-14, F9-15) with lambda = b_f / 2t_f, lambda_pf = 0.38 sqrt(E/F_y),
//!   lambda_rf = 1.0 sqrt(E/F_y) (Table B4.1b case 10) and S_xc to the
//!   flange.
//! - Stem in compression (negative moment): yielding M_p = M_y (F9-4);
//!   lateral-torsional buckling M_n = M_cr <= M_y (F9-13, B = -2.3 (d/L_b)
//!   sqrt(I_y/J), F9-12); stem local buckling M_n = F_cr S_x (F9-16 to
//!   F9-19) with d/t_w against 0.84 and 1.52 sqrt(E/F_y).
//! - Where the stem is in compression anywhere along the member (the
//!   diagram changes sign or is negative), the lateral-torsional buckling
//!   of F9.2(b) governs both signs, as F9.2(b) requires (taken over the
//!   whole member: conservative where the unbraced length is shorter).
//! - C_b is not applied (1.0): F9 has none in its equations.
//! - Bending about the axis of symmetry (z-z) is not covered by F9; the
//!   rules of F6 (yielding F_y Z <= 1.6 F_y S, flange local buckling of
//!   Eqs. F6-2 to F6-4) are applied to the flange it acts on, as the flange
//!   of an I bent about its minor axis, with a warning saying so.

use super::aisc360::{available, between, Basis};
use super::{moments, push_diagram, signed_extremes, Axis, AxisBending, Bending};
use crate::error::Result;
use crate::material::Steel;
use crate::method::common::warn_once_text;
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::{Flanged, SectionSpec};
use crate::trace::{step, Scope, Trace};

/// Checks both axes of a tee.
pub(super) fn check(
    input: &Input<'_>,
    steel: &Steel,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Bending> {
    let SectionSpec::Tee(t) = &input.section.spec else {
        return Err(crate::error::Error::Geometry {
            field: "section",
            reason: "AISC 360-16 F9 needs a tee".into(),
        });
    };
    let side = |axis: Axis, trace: &mut Trace, warnings: &mut Vec<Warning>| {
        if input.section.axis_name(axis == Axis::Major) == Some("y-y") {
            in_plane(input, t, steel, basis, axis, trace, warnings)
        } else {
            symmetry_axis(input, t, steel, basis, axis, trace, warnings)
        }
    };
    Ok(Bending {
        major: side(Axis::Major, trace, warnings)?,
        minor: side(Axis::Minor, trace, warnings)?,
    })
}

/// F_cr of tee stem local buckling, Eqs. F9-17 to F9-19, MPa.
pub fn stem_f_cr(d_over_tw: f64, e: f64, fy: f64) -> f64 {
    let root = (e / fy).sqrt();
    if d_over_tw <= 0.84 * root {
        fy
    } else if d_over_tw <= 1.52 * root {
        (1.43 - 0.515 * d_over_tw / root) * fy
    } else {
        1.52 * e / (d_over_tw * d_over_tw)
    }
}

/// M_cr of Eq. F9-10, N mm: 1.95 E / L_b sqrt(I_y J) (B + sqrt(1 + B^2)),
/// B = +-2.3 (d / L_b) sqrt(I_y / J) (F9-11, F9-12: minus with the stem in
/// compression).
pub fn m_cr(e: f64, iy: f64, j: f64, d: f64, lb: f64, stem_compressed: bool) -> f64 {
    let b = 2.3 * d / lb * (iy / j).sqrt();
    let b = if stem_compressed { -b } else { b };
    1.95 * e / lb * (iy * j).sqrt() * (b + (1.0 + b * b).sqrt())
}

/// L_r of Eq. F9-9, mm: 1.95 (E/F_y) sqrt(I_y J)/S_x sqrt(2.36 (F_y/E) d S_x / J + 1).
pub fn l_r(e: f64, fy: f64, iy: f64, j: f64, sx: f64, d: f64) -> f64 {
    1.95 * (e / fy) * (iy * j).sqrt() / sx * (2.36 * (fy / e) * d * sx / j + 1.0).sqrt()
}

/// The flange's outstand slenderness lambda = b_f / 2 t_f with its limits
/// of Table B4.1b case 10, pushed to the working.
fn flange_slenderness(t: &Flanged, root: f64, s: Scope, trace: &mut Trace) -> (f64, f64, f64) {
    let lf = t.width_mm / (2.0 * t.flange_mm);
    let (lpf, lrf) = (0.38 * root, 1.0 * root);
    step!(
        trace,
        s,
        "b_f/2t_f",
        "flange slenderness; compact up to 0.38 sqrt(E/F_y), noncompact up to 1.0 sqrt(E/F_y)",
        lf,
        "-",
        "AISC 360-16 Table B4.1b case 10"
    );
    (lf, lpf, lrf)
}

#[allow(clippy::too_many_arguments)]
fn in_plane(
    input: &Input<'_>,
    t: &Flanged,
    steel: &Steel,
    basis: Basis,
    axis: Axis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    push_diagram(trace, axis, &m);
    let (pos, neg) = signed_extremes(&m);
    let (e, fy) = (steel.e_mpa, steel.fy_mpa);
    let root = (e / fy).sqrt();
    let p = &input.section.props;
    let d = t.depth_mm;
    // Geometric y-y through the centroid; the stem tip is at z = 0.
    let i_x = p.i_y_mm4;
    let zc = p.centroid_z_mm;
    let (s_xc, s_xt) = (i_x / (d - zc), i_x / zc);
    let sx = s_xc.min(s_xt);
    let zx = if axis == Axis::Major {
        p.w_pl_major_mm3
    } else {
        p.w_pl_minor_mm3
    };
    // AISC's I_y is about the axis of symmetry (the section's z-z).
    let (iy, j) = (p.i_z_mm4, p.torsion_mm4);
    let ry = (iy / p.area_mm2).sqrt();
    if pos != 0.0 || neg != 0.0 {
        super::tee::warn_sign(warnings);
    }
    let my = fy * sx;
    step!(
        trace,
        s,
        "S_xc",
        "elastic modulus to the flange",
        s_xc,
        "mm3",
        "section"
    );
    step!(
        trace,
        s,
        "S_x",
        "elastic modulus to the stem tip (the smaller)",
        sx,
        "mm3",
        "section"
    );
    step!(
        trace,
        s,
        "M_y",
        "yield moment F_y S_x",
        my / 1e6,
        "kNm",
        "AISC 360-16 Eq. F9-3"
    );
    let mp = (fy * zx).min(1.6 * my);
    step!(
        trace,
        s,
        "M_p",
        "plastic moment F_y Z_x <= 1.6 M_y, stem in tension",
        mp / 1e6,
        "kNm",
        "AISC 360-16 Eq. F9-2"
    );
    // Flange local buckling (flange in compression).
    let (lf, lpf, lrf) = flange_slenderness(t, root, s, trace);
    let flb = if lf <= lpf {
        mp
    } else if lf <= lrf {
        between(mp, 0.7 * fy * s_xc, lf, lpf, lrf).min(1.6 * my)
    } else {
        0.7 * e * s_xc / (lf * lf)
    };
    if lf > lpf {
        step!(
            trace,
            s,
            "M_n,FLB",
            "flange local buckling, flange in compression",
            flb / 1e6,
            "kNm",
            "AISC 360-16 Eq. F9-14 / F9-15"
        );
    }
    // Stem local buckling (stem in compression).
    let dt = d / t.web_mm;
    let fcr = stem_f_cr(dt, e, fy);
    let slb = fcr * s_xt;
    step!(
        trace,
        s,
        "d/t_w",
        "stem slenderness; limits 0.84 and 1.52 sqrt(E/F_y)",
        dt,
        "-",
        "AISC 360-16 Table B4.1b case 14"
    );
    step!(
        trace,
        s,
        "M_n,SLB",
        "stem local buckling F_cr S_x, stem in compression",
        slb / 1e6,
        "kNm",
        "AISC 360-16 Eq. F9-16 to F9-19"
    );
    let lt = !input.member.lt_restrained;
    // (strength, stem in tension; strength, stem in compression; M_cr; LTB reduction)
    let (ltb_t, ltb_c, mcr, reduction) = if lt {
        let lb = input.member.lt_length_mm()?;
        let stem_compressed = neg > 0.0;
        super::push_unbraced_length(trace, s, lb);
        let mcr = m_cr(e, iy, j, d, lb, stem_compressed);
        if stem_compressed {
            step!(trace, s, "M_cr", "elastic lateral-torsional buckling, stem in compression somewhere along the member: B = -2.3 (d/L_b) sqrt(I_y/J)", mcr / 1e6, "kNm", "AISC 360-16 Eq. F9-10, F9-12");
            let ltb = mcr.min(my);
            step!(
                trace,
                s,
                "M_n,LTB",
                "lateral-torsional buckling M_cr <= M_y (governs both signs)",
                ltb / 1e6,
                "kNm",
                "AISC 360-16 Eq. F9-13"
            );
            (ltb, ltb, Some(mcr), ltb / mp)
        } else {
            let lp = 1.76 * ry * root;
            let lr = l_r(e, fy, iy, j, sx, d);
            step!(
                trace,
                s,
                "L_p",
                "1.76 r_y sqrt(E/F_y)",
                lp,
                "mm",
                "AISC 360-16 Eq. F9-8"
            );
            step!(
                trace,
                s,
                "L_r",
                "limiting length for inelastic lateral-torsional buckling",
                lr,
                "mm",
                "AISC 360-16 Eq. F9-9"
            );
            step!(
                trace,
                s,
                "M_cr",
                "elastic lateral-torsional buckling, stem in tension: B = +2.3 (d/L_b) sqrt(I_y/J)",
                mcr / 1e6,
                "kNm",
                "AISC 360-16 Eq. F9-10, F9-11"
            );
            let ltb = if lb <= lp {
                mp
            } else if lb <= lr {
                between(mp, my, lb, lp, lr)
            } else {
                mcr.min(mp)
            };
            step!(
                trace,
                s,
                "M_n,LTB",
                "lateral-torsional buckling, stem in tension",
                ltb / 1e6,
                "kNm",
                "AISC 360-16 Eq. F9-6, F9-7"
            );
            // Were a negative moment present the stem-in-compression case
            // would apply; with none, the compressed-stem strength is the
            // capacity reported for that sign.
            let ltb_c = m_cr(e, iy, j, d, lb, true).min(my);
            (ltb, ltb_c, Some(mcr), ltb / mp)
        }
    } else {
        (mp, my, None, 1.0)
    };
    let mn_t = mp.min(flb).min(ltb_t);
    let mn_c = my.min(slb).min(ltb_c);
    step!(
        trace,
        s,
        "M_n+",
        "nominal strength, flange in compression (stem in tension)",
        mn_t / 1e6,
        "kNm",
        "AISC 360-16 F9"
    );
    step!(
        trace,
        s,
        "M_n-",
        "nominal strength, stem in compression",
        mn_c / 1e6,
        "kNm",
        "AISC 360-16 F9"
    );
    let r_t = available(basis, mn_t, s, trace);
    let r_c = available(basis, mn_c, s, trace);
    // The sign that governs: the larger demand over its strength; with no
    // moment, the smaller strength (the capacity either way up).
    let (resistance, demand) = if pos == 0.0 && neg == 0.0 {
        (r_t.min(r_c), 0.0)
    } else if pos / r_t >= neg / r_c {
        (r_t, pos)
    } else {
        (r_c, neg)
    };
    Ok(AxisBending {
        resistance_knm: resistance,
        critical_knm: mcr.map(|v| v / 1e6),
        reduction: reduction.min(1.0),
        moment_factor: None,
        demand_knm: demand,
        kept: super::Kept::None,
        by_sign: Some(super::BySign {
            positive_knm: r_t,
            negative_knm: r_c,
        }),
    })
}

/// Bending about the tee's axis of symmetry: F6 applied to its flange.
#[allow(clippy::too_many_arguments)]
fn symmetry_axis(
    input: &Input<'_>,
    t: &Flanged,
    steel: &Steel,
    basis: Basis,
    axis: Axis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    let demand = push_diagram(trace, axis, &m);
    if demand != 0.0 {
        warn_once_text(
            warnings,
            "tee-symmetry-axis-f6",
            "bending: AISC 360-16 F9 covers a tee bent in its plane of symmetry only; about its \
             axis of symmetry the rules of F6 (an I bent about its minor axis) are applied to its \
             flange, an assumption to verify",
        );
    }
    let (e, fy) = (steel.e_mpa, steel.fy_mpa);
    let root = (e / fy).sqrt();
    let p = &input.section.props;
    let (sy, zy) = if axis == Axis::Major {
        (p.w_el_major_mm3, p.w_pl_major_mm3)
    } else {
        (p.w_el_minor_mm3, p.w_pl_minor_mm3)
    };
    let mp = (fy * zy).min(1.6 * fy * sy);
    step!(
        trace,
        s,
        "M_p",
        "F_y Z_y <= 1.6 F_y S_y (F6 applied to the tee's flange)",
        mp / 1e6,
        "kNm",
        "AISC 360-16 Eq. F6-1 (assumed)"
    );
    let (lf, lpf, lrf) = flange_slenderness(t, root, s, trace);
    let mn = if lf <= lpf {
        mp
    } else if lf <= lrf {
        between(mp, 0.7 * fy * sy, lf, lpf, lrf)
    } else {
        0.69 * e / (lf * lf) * sy
    };
    step!(
        trace,
        s,
        "M_n",
        "yielding, flange local buckling about the axis of symmetry",
        mn / 1e6,
        "kNm",
        "AISC 360-16 Eq. F6-1 to F6-4 (assumed)"
    );
    Ok(AxisBending {
        resistance_knm: available(basis, mn, s, trace),
        critical_knm: None,
        reduction: 1.0,
        moment_factor: None,
        demand_knm: demand,
        kept: super::Kept::None,
        by_sign: None,
    })
}
