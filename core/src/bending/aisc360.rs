//! AISC 360-16 Chapter F: design flexural strength, LRFD (phi_b = 0.90,
//! F1(a)) and ASD (Omega_b = 1.67, F1(b)).
//!
//! - I sections and channels, major axis: F2 (compact web and flanges) and
//!   F3 (noncompact or slender flanges, compact web); for I sections a
//!   noncompact web F4 and a slender web F5 (a_w <= 10, h/t_w <= 260;
//!   beyond, refused), a channel's noncompact web refused. Lateral-torsional buckling by
//!   Eqs. F2-2 to F2-8 with c = 1 for I (F2-8a) and c = h_o/2 sqrt(I_y/C_w)
//!   for channels (F2-8b); C_b by Eq. F1-1 from the moment diagram.
//! - I sections and channels, minor axis: F6.
//! - Rectangular HSS: F7 (flange and web local buckling, a slender flange
//!   by the effective width of F7-3/F7-4 and a slender web by F7.3(c), in
//!   `aisc360_hss`; lateral-torsional buckling F7.4).
//! - Round HSS: F8 (D/t up to 0.45 E/F_y).
//! - Rectangular bars and rounds: F11.
//! - Given sections: yielding, F_y S (the class is not known: the elastic
//!   modulus, with a warning that local buckling is not checked);
//!   lateral-torsional buckling needs the shape, so a major-axis moment on
//!   a given section is refused unless `lt_restrained`.
//!
//! Slenderness limits of Table B4.1b (members subject to flexure): I and
//! channel flanges lambda_p = 0.38 sqrt(E/F_y), lambda_r = 1.0 sqrt(E/F_y)
//! (b = b_f/2 for I, b_f for channels); webs 3.76 and 5.70 sqrt(E/F_y)
//! (h = d - 2(t_f + r) rolled, d - 2 t_f welded); HSS flanges 1.12 and
//! 1.40 sqrt(E/F_y), webs 2.42 and 5.70 sqrt(E/F_y) (b and h the flat
//! widths, taken as B - 3t and H - 3t); round HSS 0.07 E/F_y and 0.31 E/F_y.
//!
//! C_b is taken as 1.0 (conservative, AISC 360-16 F1) where the moment
//! diagram over the unbraced segment is not the member's (`lcr_lt_mm` or a
//! `k_lt` other than 1), and where the load acts on the compression flange
//! (the Commentary to F1 notes the lower strength of top-flange loading;
//! C_b = 1.0 is the choice here, said in a warning).

use super::{c_b, diagram_is_segment, moments, push_diagram, Axis, AxisBending, Bending};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::LoadLevel;
use crate::method::common::{require_steel, warn_once_text};
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::{IMake, SectionSpec};
use crate::trace::{step, Scope, Trace};

pub use crate::method::aisc360::Basis;

/// phi_b (AISC 360-16 F1(a)).
pub const PHI_B: f64 = 0.90;
/// Omega_b (AISC 360-16 F1(b)).
pub const OMEGA_B: f64 = 1.67;

fn key(basis: Basis) -> &'static str {
    match basis {
        Basis::Lrfd => "aisc360-lrfd",
        Basis::Asd => "aisc360-asd",
    }
}

/// Checks both axes.
pub fn check(
    input: &Input<'_>,
    basis: Basis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Bending> {
    let steel = require_steel(input, key(basis))?;
    if let SectionSpec::Tee(_) = &input.section.spec {
        return super::aisc360_tee::check(input, steel, basis, trace, warnings);
    }
    if let SectionSpec::Angle(_) = &input.section.spec {
        return super::aisc360_angle::check(input, steel, basis, trace, warnings);
    }
    let cb = moment_factor(input, trace, warnings);
    Ok(Bending {
        major: axis(input, steel, basis, Axis::Major, cb, trace, warnings)?,
        minor: axis(input, steel, basis, Axis::Minor, cb, trace, warnings)?,
    })
}

/// C_b of Eq. F1-1 for the major-axis diagram, or 1.0 where it may not be used.
fn moment_factor(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> f64 {
    let m = input.member.moments_major();
    let s = Scope::BendingMajor;
    if !diagram_is_segment(input) {
        step!(trace, s, "C_b", "taken as 1.0: the unbraced length is not the member length, so its diagram is not known", 1.0, "-", "AISC 360-16 F1 (C_b = 1.0 is always permitted)");
        return 1.0;
    }
    if input.member.load_level == LoadLevel::CompressionFlange && m.span_knm != 0.0 {
        warn_once_text(
            warnings,
            "cb-top-flange",
            "bending: the load acts on the compression flange; C_b is taken as 1.0 (AISC 360-16 \
             Commentary F1 notes the lower strength of top-flange loading)",
        );
        step!(
            trace,
            s,
            "C_b",
            "taken as 1.0: load on the compression flange",
            1.0,
            "-",
            "AISC 360-16 Commentary F1 (conservative)"
        );
        return 1.0;
    }
    let cb = c_b(&m);
    step!(trace, s, "C_b", "lateral-torsional buckling modification factor 12.5 M_max / (2.5 M_max + 3 M_A + 4 M_B + 3 M_C)", cb, "-", "AISC 360-16 Eq. F1-1");
    cb
}

/// lambda_p, lambda_r interpolation of F3-1 / F6-2 / F7-2-like rules:
/// M_p - (M_p - M_low)(lambda - lambda_p)/(lambda_r - lambda_p).
pub(super) fn between(mp: f64, low: f64, lambda: f64, lp: f64, lr: f64) -> f64 {
    mp - (mp - low) * (lambda - lp) / (lr - lp)
}

/// Lateral-torsional buckling strength over the three ranges of unbraced
/// length that F2, F7 and (in stress, S_x = 1) F5 share: M_p up to L_p, the line from M_p to
/// 0.7 F_y S_x (times C_b, at most M_p) up to L_r, the elastic M_cr (at most
/// M_p) beyond.
#[allow(clippy::too_many_arguments)]
fn ltb_ranges(lb: f64, lp: f64, lr: f64, mp: f64, fy: f64, sx: f64, cb: f64, mcr: f64) -> f64 {
    if lb <= lp {
        mp
    } else if lb <= lr {
        (cb * between(mp, 0.7 * fy * sx, lb, lp, lr)).min(mp)
    } else {
        mcr.min(mp)
    }
}

/// L_r of Eqs. F2-6 and F4-8: 1.95 r E / F_L sqrt(jc + sqrt(jc^2 + 6.76
/// (F_L/E)^2)), r = r_ts (F2) or r_t (F4), jc = J c / (S_x h_o).
fn l_r(r: f64, e: f64, fl: f64, jc: f64) -> f64 {
    1.95 * r * e / fl * (jc + (jc * jc + 6.76 * (fl / e).powi(2)).sqrt()).sqrt()
}

/// F_cr of Eqs. F2-4 and F4-5: C_b pi^2 E / (L_b/r)^2 sqrt(1 + 0.078 jc
/// (L_b/r)^2), `ratio` = L_b / r.
fn f_cr_elastic(cb: f64, e: f64, ratio: f64, jc: f64) -> f64 {
    cb * std::f64::consts::PI.powi(2) * e / (ratio * ratio)
        * (1.0 + 0.078 * jc * ratio * ratio).sqrt()
}

/// Compression flange local buckling of Eqs. F3-1, F3-2 (F4-13, F4-14
/// with `top` = R_pc M_yc): the line from `top` at lambda_pf to 0.7 F_y S_x
/// at lambda_rf, then 0.9 E k_c S_x / lambda^2, N mm.
fn flange_local(
    top: f64,
    (e, fy): (f64, f64),
    sx: f64,
    kc: f64,
    (lf, lpf, lrf): (f64, f64, f64),
) -> f64 {
    if lf <= lrf {
        between(top, 0.7 * fy * sx, lf, lpf, lrf)
    } else {
        0.9 * e * kc * sx / (lf * lf)
    }
}

fn slender(basis: Basis, reason: String) -> Error {
    Error::NotApplicable {
        method: key(basis),
        reason,
    }
}

/// The plates of a doubly symmetric I section, mm: depth, flange width and
/// thickness, web thickness, web height h (h_c = h_p = h).
struct Girder {
    d: f64,
    bf: f64,
    tf: f64,
    tw: f64,
    h: f64,
}

/// Major-axis strength of a doubly symmetric I section with a noncompact
/// web (F4) or a slender web (F5): (M_n N mm, M_cr N mm where
/// lateral-torsional buckling applies, M_n,LTB / M_p, whether C_b was used).
///
/// F4 (lambda_pw < h/t_w <= lambda_rw = 5.70 sqrt(E/F_y)): R_pc (F4-9b)
/// with M_p = F_y Z_x <= 1.6 F_y S_x; compression flange yielding R_pc M_yc
/// (F4-1); lateral-torsional buckling with r_t (F4-11), L_p = 1.1 r_t
/// sqrt(E/F_y) (F4-7), L_r (F4-8), F_L = 0.7 F_y (F4-6a, S_xt = S_xc),
/// F_cr (F4-5) and Eqs. F4-2, F4-3; flange local buckling F4-13, F4-14.
/// F5 (h/t_w > lambda_rw, a_w <= 10, h/t_w <= 260, unstiffened): R_pg
/// (F5-6); M_n = R_pg F_y S_xc (F5-1), R_pg F_cr S_xc for lateral-torsional
/// buckling (F5-2 to F5-5: L_r = pi r_t sqrt(E / 0.7 F_y)) and for flange
/// local buckling (F5-7 to F5-9). Tension flange yielding (F4.4, F5.4)
/// does not govern a doubly symmetric section (S_xt = S_xc). Equations
/// recalled from memory of the 2016 Specification.
fn f4_f5(
    input: &Input<'_>,
    basis: Basis,
    g: &Girder,
    (e, fy): (f64, f64),
    (lt, lb, cb): (bool, f64, f64),
    trace: &mut Trace,
) -> Result<(f64, Option<f64>, f64, bool)> {
    let s = Scope::BendingMajor;
    let p = &input.section.props;
    let root = (e / fy).sqrt();
    let (sx, zx) = (p.w_el_major_mm3, p.w_pl_major_mm3);
    let lw = g.h / g.tw;
    let (lpw, lrw) = (3.76 * root, 5.70 * root);
    let lf = g.bf / (2.0 * g.tf);
    let (lpf, lrf) = (0.38 * root, 1.0 * root);
    let kc = (4.0 / lw.sqrt()).clamp(0.35, 0.76);
    let myc = fy * sx;
    let mp = (fy * zx).min(1.6 * myc);
    let aw = g.h * g.tw / (g.bf * g.tf);
    let rt = g.bf / (12.0 * (1.0 + aw / 6.0)).sqrt();
    let pi2 = std::f64::consts::PI.powi(2);
    step!(
        trace,
        s,
        "a_w",
        "web to compression flange area h_c t_w / (b_fc t_fc)",
        aw,
        "-",
        "AISC 360-16 Eq. F4-12"
    );
    step!(trace, s, "r_t", "radius of gyration of the compression flange and a sixth of the web, b_fc / sqrt(12 (1 + a_w/6))", rt, "mm", "AISC 360-16 Eq. F4-11");
    // F4-7 and F5.2: L_p = 1.1 r_t sqrt(E/F_y).
    let lp = 1.1 * rt * root;
    if lt {
        super::push_unbraced_length(trace, s, lb);
        step!(
            trace,
            s,
            "L_p",
            "1.1 r_t sqrt(E/F_y)",
            lp,
            "mm",
            "AISC 360-16 Eq. F4-7"
        );
    }
    if lw <= lrw {
        let ratio = mp / myc;
        let rpc = (ratio - (ratio - 1.0) * (lw - lpw) / (lrw - lpw)).min(ratio);
        step!(
            trace,
            s,
            "M_yc",
            "yield moment of the compression flange F_y S_xc",
            myc / 1e6,
            "kNm",
            "AISC 360-16 F4.1"
        );
        step!(
            trace,
            s,
            "R_pc",
            "web plastification factor, noncompact web",
            rpc,
            "-",
            "AISC 360-16 Eq. F4-9b"
        );
        let cfy = rpc * myc;
        step!(
            trace,
            s,
            "M_n,CFY",
            "compression flange yielding R_pc M_yc",
            cfy / 1e6,
            "kNm",
            "AISC 360-16 Eq. F4-1"
        );
        let fl = 0.7 * fy;
        let mut mn = cfy;
        if lf > lpf {
            // F4-13, F4-14: F3-1, F3-2 with R_pc M_yc for M_p (F_L = 0.7 F_y).
            let flb = flange_local(cfy, (e, fy), sx, kc, (lf, lpf, lrf));
            step!(
                trace,
                s,
                "M_n,FLB",
                "compression flange local buckling",
                flb / 1e6,
                "kNm",
                "AISC 360-16 Eq. F4-13 / F4-14"
            );
            mn = mn.min(flb);
        }
        if !lt {
            step!(
                trace,
                s,
                "M_n",
                "nominal flexural strength, continuously braced, noncompact web",
                mn / 1e6,
                "kNm",
                "AISC 360-16 F4.1, F4.3"
            );
            return Ok((mn, None, 1.0, false));
        }
        let j = p.torsion_mm4;
        let ho = g.d - g.tf;
        let jr = j / (sx * ho);
        let lr = l_r(rt, e, fl, jr);
        step!(
            trace,
            s,
            "L_r",
            "limiting unbraced length for inelastic lateral-torsional buckling, F_L = 0.7 F_y",
            lr,
            "mm",
            "AISC 360-16 Eq. F4-8, F4-6a"
        );
        let x = lb / rt;
        let mcr = f_cr_elastic(cb, e, x, jr) * sx;
        step!(
            trace,
            s,
            "M_cr",
            "elastic critical moment F_cr S_xc",
            mcr / 1e6,
            "kNm",
            "AISC 360-16 Eq. F4-5"
        );
        // F4-2, F4-3: the ranges of F2 with R_pc M_yc for M_p (F_L = 0.7 F_y).
        let ltb = ltb_ranges(lb, lp, lr, cfy, fy, sx, cb, mcr);
        step!(
            trace,
            s,
            "M_n,LTB",
            "lateral-torsional buckling",
            ltb / 1e6,
            "kNm",
            "AISC 360-16 Eq. F4-2, F4-3"
        );
        return Ok((mn.min(ltb), Some(mcr), ltb / (fy * zx), true));
    }
    if aw > 10.0 || lw > 260.0 {
        return Err(slender(
            basis,
            format!(
                "m_major_a_knm: the slender web (h/t_w = {lw:.1}, a_w = {aw:.2}) is beyond AISC 360-16 F5 \
                 as implemented here (a_w <= 10, F5.2; h/t_w <= 260 for a web without stiffeners, F13.2)"
            ),
        ));
    }
    let rpg = (1.0 - aw / (1200.0 + 300.0 * aw) * (lw - 5.7 * root)).min(1.0);
    step!(
        trace,
        s,
        "R_pg",
        "bending strength reduction factor of a slender web",
        rpg,
        "-",
        "AISC 360-16 Eq. F5-6"
    );
    let cfy = rpg * fy * sx;
    step!(
        trace,
        s,
        "M_n,CFY",
        "compression flange yielding R_pg F_y S_xc",
        cfy / 1e6,
        "kNm",
        "AISC 360-16 Eq. F5-1"
    );
    let f_flb = if lf <= lpf {
        fy
    } else if lf <= lrf {
        between(fy, 0.7 * fy, lf, lpf, lrf)
    } else {
        0.9 * e * kc / (lf * lf)
    };
    let mut mn = cfy;
    if lf > lpf {
        let flb = rpg * f_flb * sx;
        step!(
            trace,
            s,
            "M_n,FLB",
            "compression flange local buckling R_pg F_cr S_xc",
            flb / 1e6,
            "kNm",
            "AISC 360-16 Eq. F5-7 to F5-9"
        );
        mn = mn.min(flb);
    }
    if !lt {
        step!(
            trace,
            s,
            "M_n",
            "nominal flexural strength, continuously braced, slender web",
            mn / 1e6,
            "kNm",
            "AISC 360-16 F5.1, F5.3"
        );
        return Ok((mn, None, 1.0, false));
    }
    let lr = std::f64::consts::PI * rt * (e / (0.7 * fy)).sqrt();
    step!(
        trace,
        s,
        "L_r",
        "pi r_t sqrt(E / 0.7 F_y)",
        lr,
        "mm",
        "AISC 360-16 Eq. F5-5"
    );
    let x = lb / rt;
    let f_el = cb * pi2 * e / (x * x);
    let mcr = f_el * sx;
    step!(
        trace,
        s,
        "M_cr",
        "elastic critical moment C_b pi^2 E / (L_b/r_t)^2 S_xc",
        mcr / 1e6,
        "kNm",
        "AISC 360-16 Eq. F5-4"
    );
    // F5-2 and F5-3: the three ranges of F2 in stress (S_x = 1).
    let f_ltb = ltb_ranges(lb, lp, lr, fy, fy, 1.0, cb, f_el);
    let ltb = rpg * f_ltb * sx;
    step!(
        trace,
        s,
        "M_n,LTB",
        "lateral-torsional buckling R_pg F_cr S_xc",
        ltb / 1e6,
        "kNm",
        "AISC 360-16 Eq. F5-2 to F5-4"
    );
    Ok((mn.min(ltb), Some(mcr), ltb / (fy * zx), true))
}

#[allow(clippy::too_many_arguments)]
fn axis(
    input: &Input<'_>,
    steel: &Steel,
    basis: Basis,
    axis: Axis,
    cb: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    let demand = push_diagram(trace, axis, &m);
    let (e, fy) = (steel.e_mpa, steel.fy_mpa);
    let root = (e / fy).sqrt();
    let p = &input.section.props;
    let swapped = p.principal_angle_rad != 0.0;
    let major = axis == Axis::Major;
    let (sx, zx) = if major {
        (p.w_el_major_mm3, p.w_pl_major_mm3)
    } else {
        (p.w_el_minor_mm3, p.w_pl_minor_mm3)
    };
    let lt = major && !input.member.lt_restrained;
    let lb = input.member.lt_length_mm()?;
    // (M_n in N mm, the elastic critical moment in N mm where LTB applies, Mn/Mp of LTB)
    let (mn, mcr, reduction, cb_used): (f64, Option<f64>, f64, bool) = match &input.section.spec {
        SectionSpec::I(_) | SectionSpec::Channel(_) => {
            let (d, bf, tf, tw, r, channel, welded) = match &input.section.spec {
                SectionSpec::I(i) => (
                    i.depth_mm,
                    i.width_mm,
                    i.flange_mm,
                    i.web_mm,
                    i.root_radius_mm,
                    false,
                    i.make != IMake::Rolled, // unstated: welded, the larger h (conservative)
                ),
                SectionSpec::Channel(c) => (
                    c.depth_mm,
                    c.width_mm,
                    c.flange_mm,
                    c.web_mm,
                    c.root_radius_mm,
                    true,
                    false,
                ),
                _ => (0.0, 0.0, 0.0, 0.0, 0.0, false, false),
            };
            let b = if channel { bf } else { bf / 2.0 };
            let lf = b / tf;
            let (lpf, lrf) = (0.38 * root, 1.0 * root);
            step!(
                trace,
                s,
                "b/t_f",
                "flange slenderness (b = b_f/2 for I, b_f for channels)",
                lf,
                "-",
                "AISC 360-16 Table B4.1b cases 10, 13"
            );
            step!(
                trace,
                s,
                "lambda_pf",
                "compact flange limit 0.38 sqrt(E/F_y)",
                lpf,
                "-",
                "AISC 360-16 Table B4.1b"
            );
            step!(
                trace,
                s,
                "lambda_rf",
                "noncompact flange limit 1.0 sqrt(E/F_y)",
                lrf,
                "-",
                "AISC 360-16 Table B4.1b"
            );
            if major {
                let h = if welded {
                    d - 2.0 * tf
                } else {
                    d - 2.0 * (tf + r)
                };
                let lw = h / tw;
                step!(
                    trace,
                    s,
                    "h/t_w",
                    "web slenderness (compact limit 3.76 sqrt(E/F_y))",
                    lw,
                    "-",
                    "AISC 360-16 Table B4.1b case 15"
                );
                if lw > 3.76 * root {
                    if channel {
                        return Err(slender(basis, format!(
                            "m_major_a_knm: the channel's web is noncompact or slender in flexure (h/t_w = {lw:.1} > 3.76 sqrt(E/F_y) = {:.1}); AISC 360-16 F4 and F5 cover I-shaped members only",
                            3.76 * root
                        )));
                    }
                    let g = Girder { d, bf, tf, tw, h };
                    f4_f5(input, basis, &g, (e, fy), (lt, lb, cb), trace)?
                } else {
                    let mp = fy * zx;
                    step!(
                        trace,
                        s,
                        "M_p",
                        "plastic moment F_y Z_x",
                        mp / 1e6,
                        "kNm",
                        "AISC 360-16 Eq. F2-1"
                    );
                    // Flange local buckling, F3-1 / F3-2.
                    let mut mn = mp;
                    if lf > lpf {
                        let kc = (4.0 / (h / tw).sqrt()).clamp(0.35, 0.76);
                        let flb = flange_local(mp, (e, fy), sx, kc, (lf, lpf, lrf));
                        step!(
                            trace,
                            s,
                            "M_n,FLB",
                            "compression flange local buckling",
                            flb / 1e6,
                            "kNm",
                            "AISC 360-16 Eq. F3-1 / F3-2"
                        );
                        mn = mn.min(flb);
                    }
                    if !lt {
                        step!(trace, s, "M_n", "nominal flexural strength, continuously braced (no lateral-torsional buckling)", mn / 1e6, "kNm", "AISC 360-16 F2.1, F3.2");
                        (mn, None, 1.0, false)
                    } else {
                        let (iy, cw, j) = (p.i_minor_mm4, p.warping_mm6, p.torsion_mm4);
                        let ho = d - tf;
                        let c = if channel {
                            ho / 2.0 * (iy / cw).sqrt()
                        } else {
                            1.0
                        };
                        let rts = ((iy * cw).sqrt() / sx).sqrt();
                        let ry = p.r_minor_mm;
                        let lp = 1.76 * ry * root;
                        let jc = j * c / (sx * ho);
                        let lr = l_r(rts, e, 0.7 * fy, jc);
                        super::push_unbraced_length(trace, s, lb);
                        if channel {
                            step!(
                                trace,
                                s,
                                "c",
                                "h_o/2 sqrt(I_y / C_w), channel",
                                c,
                                "-",
                                "AISC 360-16 Eq. F2-8b"
                            );
                        }
                        step!(
                            trace,
                            s,
                            "r_ts",
                            "effective radius of gyration sqrt(sqrt(I_y C_w) / S_x)",
                            rts,
                            "mm",
                            "AISC 360-16 Eq. F2-7"
                        );
                        step!(
                            trace,
                            s,
                            "L_p",
                            "limiting length for yielding 1.76 r_y sqrt(E/F_y)",
                            lp,
                            "mm",
                            "AISC 360-16 Eq. F2-5"
                        );
                        step!(
                            trace,
                            s,
                            "L_r",
                            "limiting length for inelastic lateral-torsional buckling",
                            lr,
                            "mm",
                            "AISC 360-16 Eq. F2-6"
                        );
                        let ratio = lb / rts;
                        let fcr = f_cr_elastic(cb, e, ratio, jc);
                        let mcr = fcr * sx;
                        step!(
                            trace,
                            s,
                            "M_cr",
                            "elastic critical moment F_cr S_x",
                            mcr / 1e6,
                            "kNm",
                            "AISC 360-16 Eq. F2-4"
                        );
                        let ltb = ltb_ranges(lb, lp, lr, mp, fy, sx, cb, mcr);
                        step!(
                            trace,
                            s,
                            "M_n,LTB",
                            "lateral-torsional buckling",
                            ltb / 1e6,
                            "kNm",
                            "AISC 360-16 Eq. F2-1 to F2-3"
                        );
                        if channel {
                            warn_once_text(warnings, "channel-load-through-web", "bending: the channel is assumed loaded through its shear centre or braced against twist; a load through the web twists it, which is not checked");
                        }
                        (mn.min(ltb), Some(mcr), ltb / mp, true)
                    }
                }
            } else {
                // F6: minor axis.
                let (sy, zy) = (sx, zx);
                let mp = (fy * zy).min(1.6 * fy * sy);
                step!(
                    trace,
                    s,
                    "M_p",
                    "plastic moment F_y Z_y <= 1.6 F_y S_y",
                    mp / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F6-1"
                );
                let mn = if lf <= lpf {
                    mp
                } else if lf <= lrf {
                    between(mp, 0.7 * fy * sy, lf, lpf, lrf)
                } else {
                    0.69 * e / (lf * lf) * sy
                };
                step!(trace, s, "M_n", "nominal flexural strength about the minor axis (yielding, flange local buckling)", mn / 1e6, "kNm", "AISC 360-16 Eq. F6-1 to F6-4");
                (mn, None, 1.0, false)
            }
        }
        SectionSpec::Rhs(r) => {
            let t = r.wall_mm;
            let (hh, bb) = if major != swapped {
                (r.depth_mm, r.width_mm)
            } else {
                (r.width_mm, r.depth_mm)
            };
            let (lf, lw) = ((bb - 3.0 * t) / t, (hh - 3.0 * t) / t);
            step!(
                trace,
                s,
                "b/t",
                "flange (compression wall) slenderness, b = B - 3t",
                lf,
                "-",
                "AISC 360-16 Table B4.1b case 17"
            );
            step!(
                trace,
                s,
                "h/t",
                "web slenderness, h = H - 3t",
                lw,
                "-",
                "AISC 360-16 Table B4.1b case 19"
            );
            warn_once_text(warnings, "hss-design-wall", "bending: the wall of a typed hollow section is used as its design wall thickness (the catalogue applies 0.93 t_nom to ERW HSS, AISC 360-16 B4.2)");
            let mp = fy * zx;
            step!(
                trace,
                s,
                "M_p",
                "plastic moment F_y Z",
                mp / 1e6,
                "kNm",
                "AISC 360-16 Eq. F7-1"
            );
            let mut mn = mp;
            let i_axis = if major { p.i_major_mm4 } else { p.i_minor_mm4 };
            if lf > 1.40 * root {
                let flb = super::aisc360_hss::slender_flange(
                    (e, fy),
                    (i_axis, p.area_mm2, hh, t, bb - 3.0 * t),
                    s,
                    trace,
                );
                mn = mn.min(flb);
            } else if lf > 1.12 * root {
                let flb = (mp - (mp - fy * sx) * (3.57 * lf / root - 4.0)).min(mp);
                step!(
                    trace,
                    s,
                    "M_n,FLB",
                    "flange local buckling, noncompact flange",
                    flb / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F7-2"
                );
                mn = mn.min(flb);
            }
            if lw > 5.70 * root {
                let wlb = super::aisc360_hss::slender_web(
                    (e, fy),
                    (sx, hh - 3.0 * t, bb - 3.0 * t, t),
                    s,
                    trace,
                );
                mn = mn.min(wlb);
            } else if lw > 2.42 * root {
                let wlb = (mp - (mp - fy * sx) * (0.305 * lw / root - 0.738)).min(mp);
                step!(
                    trace,
                    s,
                    "M_n,WLB",
                    "web local buckling, noncompact web",
                    wlb / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F7-6"
                );
                mn = mn.min(wlb);
            }
            if lt {
                let (j, a) = (p.torsion_mm4, p.area_mm2);
                let ry = p.r_minor_mm;
                let sja = (j * a).sqrt();
                let lp = 0.13 * e * ry * sja / mp;
                let lr = 2.0 * e * ry * sja / (0.7 * fy * sx);
                step!(trace, s, "L_b", "unbraced length", lb, "mm", "member file");
                step!(
                    trace,
                    s,
                    "L_p",
                    "0.13 E r_y sqrt(J A_g) / M_p",
                    lp,
                    "mm",
                    "AISC 360-16 Eq. F7-12"
                );
                step!(
                    trace,
                    s,
                    "L_r",
                    "2 E r_y sqrt(J A_g) / (0.7 F_y S_x)",
                    lr,
                    "mm",
                    "AISC 360-16 Eq. F7-13"
                );
                let mcr = 2.0 * e * cb * sja / (lb / ry);
                step!(
                    trace,
                    s,
                    "M_cr",
                    "elastic lateral-torsional buckling 2 E C_b sqrt(J A_g) / (L_b / r_y)",
                    mcr / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F7-11"
                );
                let ltb = ltb_ranges(lb, lp, lr, mp, fy, sx, cb, mcr);
                step!(
                    trace,
                    s,
                    "M_n,LTB",
                    "lateral-torsional buckling",
                    ltb / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F7-10, F7-11"
                );
                (mn.min(ltb), Some(mcr), ltb / mp, true)
            } else {
                (mn, None, 1.0, false)
            }
        }
        SectionSpec::Chs(c) => {
            let dt = c.diameter_mm / c.wall_mm;
            step!(
                trace,
                s,
                "D/t",
                "diameter-to-thickness ratio",
                dt,
                "-",
                "AISC 360-16 Table B4.1b case 20"
            );
            if dt > 0.45 * e / fy {
                return Err(slender(
                    basis,
                    format!(
                        "m_{}_a_knm: D/t = {dt:.1} is above 0.45 E/F_y, outside AISC 360-16 F8",
                        if major { "major" } else { "minor" }
                    ),
                ));
            }
            let mn = if dt <= 0.07 * e / fy {
                fy * zx
            } else if dt <= 0.31 * e / fy {
                (0.021 * e / dt + fy) * sx
            } else {
                0.33 * e / dt * sx
            };
            step!(
                trace,
                s,
                "M_n",
                "nominal flexural strength of a round HSS (yielding, local buckling)",
                mn / 1e6,
                "kNm",
                "AISC 360-16 Eq. F8-1 to F8-4"
            );
            (mn, None, 1.0, false)
        }
        SectionSpec::Rect(r) => {
            let my = fy * sx;
            let mp = (fy * zx).min(1.6 * my);
            step!(
                trace,
                s,
                "M_p",
                "F_y Z <= 1.6 F_y S",
                mp / 1e6,
                "kNm",
                "AISC 360-16 Eq. F11-1"
            );
            let (d, t) = if swapped {
                (r.width_mm, r.depth_mm)
            } else {
                (r.depth_mm, r.width_mm)
            };
            if lt && d > t {
                let x = lb * d / (t * t);
                step!(
                    trace,
                    s,
                    "L_b d/t^2",
                    "slenderness of a rectangular bar",
                    x,
                    "mm^-1·mm2",
                    "AISC 360-16 F11.2"
                );
                let mcr = 1.9 * e * cb / x * sx;
                step!(
                    trace,
                    s,
                    "M_cr",
                    "F_cr S_x, F_cr = 1.9 E C_b / (L_b d / t^2)",
                    mcr / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F11-4"
                );
                let mn = if x <= 0.08 * e / fy {
                    mp
                } else if x <= 1.9 * e / fy {
                    (cb * (1.52 - 0.274 * x * fy / e) * my).min(mp)
                } else {
                    mcr.min(mp)
                };
                step!(
                    trace,
                    s,
                    "M_n",
                    "nominal flexural strength, lateral-torsional buckling",
                    mn / 1e6,
                    "kNm",
                    "AISC 360-16 Eq. F11-2, F11-3"
                );
                (mn, Some(mcr), mn / mp, true)
            } else {
                (mp, None, 1.0, false)
            }
        }
        SectionSpec::Round(_) => {
            let mp = (fy * zx).min(1.6 * fy * sx);
            step!(
                trace,
                s,
                "M_n",
                "F_y Z <= 1.6 F_y S",
                mp / 1e6,
                "kNm",
                "AISC 360-16 Eq. F11-1"
            );
            (mp, None, 1.0, false)
        }
        SectionSpec::Given(_) => {
            let w = super::given_modulus(input, axis, false)?.unwrap_or(0.0);
            if lt {
                return Err(Error::Geometry {
                    field: "lt_restrained",
                    reason: "lateral-torsional buckling under AISC 360-16 Chapter F needs the section's shape; describe the section by its dimensions, or set lt_restrained if the compression flange is held continuously".into(),
                });
            }
            warn_once_text(warnings, "given-local-buckling", "bending: the given section's local buckling is not checked; its strength is taken as F_y S (first yield)");
            let mn = fy * w;
            step!(
                trace,
                s,
                "M_n",
                "first yield F_y S of a given section",
                mn / 1e6,
                "kNm",
                "AISC 360-16 F1 (yielding, elastic modulus: conservative)"
            );
            (mn, None, 1.0, false)
        }
        _ => {
            return Err(slender(
                basis,
                "bending of this section is not covered".into(),
            ));
        }
    };
    let design = available(basis, mn, s, trace);
    Ok(AxisBending {
        resistance_knm: design,
        critical_knm: mcr.map(|v| v / 1e6),
        reduction: reduction.min(1.0),
        moment_factor: if cb_used { Some(cb) } else { None },
        demand_knm: demand,
        kept: super::Kept::None,
        by_sign: None,
    })
}

/// The available flexural strength of a nominal one (N mm), kNm: phi_b M_n
/// (LRFD, F1(a)) or M_n / Omega_b (ASD, F1(b)), with its working.
pub(super) fn available(basis: Basis, mn: f64, s: Scope, trace: &mut Trace) -> f64 {
    match basis {
        Basis::Lrfd => {
            let v = PHI_B * mn / 1e6;
            step!(
                trace,
                s,
                "phi_b M_n",
                "design flexural strength, phi_b = 0.90",
                v,
                "kNm",
                "AISC 360-16 F1(a)"
            );
            v
        }
        Basis::Asd => {
            let v = mn / OMEGA_B / 1e6;
            step!(
                trace,
                s,
                "M_n/Omega_b",
                "allowable flexural strength, Omega_b = 1.67",
                v,
                "kNm",
                "AISC 360-16 F1(b)"
            );
            v
        }
    }
}
