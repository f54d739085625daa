//! EN 1993-1-1:2005 bending: cross-section resistance 6.2.5 by class and
//! lateral-torsional buckling 6.3.2.
//!
//! Classification in bending, Table 5.2 (epsilon = sqrt(235/f_y)): a web or
//! wall in bending (internal part) 72/83/124 eps, an internal part in
//! compression (the compression flange of an RHS) 33/38/42 eps, an outstand
//! flange 9/10/14 eps (also for minor-axis bending, where Table 5.2 allows
//! more with the stress distribution: the uniform-compression limits are the
//! conservative choice), a circular tube 50/70/90 eps^2; solid sections are
//! Class 1. Widths as the compression check measures them (flat widths; RHS
//! walls h - 3t, b - 3t). M_c,Rd = W f_y / gamma_M0 (6.13-6.15) with W_pl
//! for Classes 1 and 2, W_el for Class 3, W_eff,min for Class 4 (the
//! effective section of EN 1993-1-5 4.4 for doubly symmetric I and
//! rectangular hollow sections, [`super::en1993_effective`]; other Class 4
//! sections refused). gamma_M0 = 1.0 (recommended, 6.1(1) Note 2B). A tee
//! bent in its plane of symmetry is [`super::en1993_tee`]'s.
//!
//! Lateral-torsional buckling about the major axis (the axis parallel to
//! the flanges, picked by the geometry: the section's major principal axis
//! is that axis, or the section is refused before this): M_cr from the
//! three-factor formula ([`super::m_cr`]) with k = k_lt, k_w = 1, C1 and C2
//! from [`super::c_factors`]; lambda_bar_LT = sqrt(W_y f_y / M_cr) (6.56).
//! Rolled and welded I sections use 6.3.2.3 (lambda_bar_LT,0 = 0.4, beta =
//! 0.75, Table 6.5 curves: rolled h/b <= 2 b, > 2 c; welded h/b <= 2 c, > 2
//! d; the modification f = 1 - 0.5 (1 - k_c)[1 - 2(lambda_bar_LT - 0.8)^2]
//! with k_c of Table 6.6); every other section 6.3.2.2 with curve d of
//! Table 6.4 ("other cross-sections"). A channel is treated as the trade
//! usually treats it, with the doubly symmetric formula and the channel's
//! own I_t and I_w, ignoring the offset of its shear centre (a warning says
//! so); rectangular hollow and solid rectangles work their M_cr the same way
//! (I_w about zero), and rarely govern; circular sections do not buckle
//! laterally. M_b,Rd = chi_LT W_y f_y / gamma_M1 (6.55). Minor-axis bending
//! has no lateral-torsional buckling.

use super::{
    c_factors, diagram_is_segment, m_cr, moments, push_c_factors, push_diagram, z_g, Axis,
    AxisBending, Bending, CSource, Shape,
};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::SpanLoad;
use crate::method::common::{require_steel, warn_once_text};
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::{IMake, SectionSpec};
use crate::trace::{step, Trace};

const KEY: &str = "en1993-1-1";

/// Checks both axes.
pub fn check(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<Bending> {
    let steel = require_steel(input, KEY)?;
    Ok(Bending {
        major: axis(input, steel, Axis::Major, trace, warnings)?,
        minor: axis(input, steel, Axis::Minor, trace, warnings)?,
    })
}

/// The web-to-flange geometry of the section about an axis: the depth used
/// for the load level and Table 6.5, and the parts Table 5.2 classifies.
struct Parts {
    /// (c, t, limits multiplier kind) of each classified part.
    items: [(f64, f64, Part); 2],
    count: usize,
}

#[derive(Clone, Copy, PartialEq)]
pub(super) enum Part {
    WebBending,
    InternalCompression,
    Outstand,
    Tube,
}

/// Table 5.2 limits of Classes 1, 2, 3 for a part.
pub(super) fn limits(part: Part, eps: f64) -> [f64; 3] {
    match part {
        Part::WebBending => [72.0 * eps, 83.0 * eps, 124.0 * eps],
        Part::InternalCompression => [33.0 * eps, 38.0 * eps, 42.0 * eps],
        Part::Outstand => [9.0 * eps, 10.0 * eps, 14.0 * eps],
        Part::Tube => [50.0 * eps * eps, 70.0 * eps * eps, 90.0 * eps * eps],
    }
}

fn parts(spec: &SectionSpec, axis: Axis, swapped: bool) -> Parts {
    let none = (0.0, 1.0, Part::Outstand);
    let p = |items: [(f64, f64, Part); 2], count| Parts { items, count };
    match (spec, axis) {
        (SectionSpec::I(s), Axis::Major) => p(
            [
                (
                    (s.width_mm - s.web_mm - 2.0 * s.root_radius_mm) / 2.0,
                    s.flange_mm,
                    Part::Outstand,
                ),
                (
                    s.depth_mm - 2.0 * s.flange_mm - 2.0 * s.root_radius_mm,
                    s.web_mm,
                    Part::WebBending,
                ),
            ],
            2,
        ),
        (SectionSpec::I(s), Axis::Minor) => p(
            [
                (
                    (s.width_mm - s.web_mm - 2.0 * s.root_radius_mm) / 2.0,
                    s.flange_mm,
                    Part::Outstand,
                ),
                none,
            ],
            1,
        ),
        (SectionSpec::Channel(s), Axis::Major) => p(
            [
                (
                    s.width_mm - s.web_mm - s.root_radius_mm,
                    s.flange_mm,
                    Part::Outstand,
                ),
                (
                    s.depth_mm - 2.0 * s.flange_mm - 2.0 * s.root_radius_mm,
                    s.web_mm,
                    Part::WebBending,
                ),
            ],
            2,
        ),
        (SectionSpec::Channel(s), Axis::Minor) => p(
            [
                (
                    s.width_mm - s.web_mm - s.root_radius_mm,
                    s.flange_mm,
                    Part::Outstand,
                ),
                none,
            ],
            1,
        ),
        (SectionSpec::Rhs(s), _) => {
            // The walls along the bending depth are webs; the others flanges.
            let (h, b) = if (axis == Axis::Major) != swapped {
                (s.depth_mm, s.width_mm)
            } else {
                (s.width_mm, s.depth_mm)
            };
            p(
                [
                    (b - 3.0 * s.wall_mm, s.wall_mm, Part::InternalCompression),
                    (h - 3.0 * s.wall_mm, s.wall_mm, Part::WebBending),
                ],
                2,
            )
        }
        (SectionSpec::Chs(s), _) => p([(s.diameter_mm, s.wall_mm, Part::Tube), none], 1),
        // A tee bent about its axis of symmetry (in its plane it is
        // `en1993_tee`'s): the flange outstands, uniform compression.
        (SectionSpec::Tee(s), _) => p(
            [
                (
                    (s.width_mm - s.web_mm - 2.0 * s.root_radius_mm) / 2.0,
                    s.flange_mm,
                    Part::Outstand,
                ),
                none,
            ],
            1,
        ),
        _ => p([none, none], 0),
    }
}

/// The section's class in bending about `axis` (1 for solid sections;
/// for a given section, 3: its class is not known, so the elastic modulus).
fn classify(input: &Input<'_>, steel: &Steel, axis: Axis, trace: &mut Trace) -> u8 {
    let s = axis.scope();
    let eps = (235.0 / steel.fy_mpa).sqrt();
    let swapped = input.section.props.principal_angle_rad != 0.0;
    if let SectionSpec::Given(_) = input.section.spec {
        step!(
            trace,
            s,
            "class",
            "class of a given section not known: Class 3 taken (elastic modulus)",
            3.0,
            "-",
            "conservative choice"
        );
        return 3;
    }
    let ps = parts(&input.section.spec, axis, swapped);
    let mut class = 1u8;
    for (c, t, part) in ps.items.iter().take(ps.count) {
        let ratio = c / t;
        let [l1, l2, l3] = limits(*part, eps);
        let k = if ratio <= l1 {
            1
        } else if ratio <= l2 {
            2
        } else if ratio <= l3 {
            3
        } else {
            4
        };
        match part {
            Part::WebBending => step!(
                trace,
                s,
                "c/t",
                "web in bending: width-to-thickness ratio (limits 72/83/124 eps)",
                ratio,
                "-",
                "EN 1993-1-1 Table 5.2"
            ),
            Part::InternalCompression => step!(
                trace,
                s,
                "c/t",
                "compression flange, internal: width-to-thickness ratio (limits 33/38/42 eps)",
                ratio,
                "-",
                "EN 1993-1-1 Table 5.2"
            ),
            Part::Outstand => step!(
                trace,
                s,
                "c/t",
                "flange outstand in compression: ratio (limits 9/10/14 eps, uniform compression)",
                ratio,
                "-",
                "EN 1993-1-1 Table 5.2"
            ),
            Part::Tube => step!(
                trace,
                s,
                "d/t",
                "tube wall: diameter-to-thickness ratio (limits 50/70/90 eps^2)",
                ratio,
                "-",
                "EN 1993-1-1 Table 5.2"
            ),
        }
        class = class.max(k);
    }
    step!(
        trace,
        s,
        "class",
        "cross-section class in bending",
        f64::from(class),
        "-",
        "EN 1993-1-1 5.5.2"
    );
    class
}

/// The section's class in bending alone about `axis` (Table 5.2, as
/// [`check`] works it, without the working): the beam-column interaction
/// reads it beside the class in compression.
pub fn class_in_bending(input: &Input<'_>, steel: &Steel, axis: Axis) -> u8 {
    classify(input, steel, axis, &mut Trace::off())
}

/// W_eff,min about `axis` of a section that is Class 4 in bending alone
/// (EN 1993-1-5 4.4, as [`check`] works it, without the working): the
/// beam-column interaction reads it.
pub fn effective_modulus(input: &Input<'_>, steel: &Steel, axis: Axis) -> Result<f64> {
    super::en1993_effective::w_eff(input, steel, axis, &mut Trace::off())
}

/// gamma_M1: the member's, or the recommended 1.0.
pub(super) fn gamma_m1(input: &Input<'_>) -> f64 {
    input.member.gamma_m1.unwrap_or(1.0)
}

/// The section's depth across the bending axis, mm (for the load level and h/b).
pub(super) fn depth_width(spec: &SectionSpec, swapped: bool) -> (f64, f64) {
    let (h, b) = match spec {
        SectionSpec::I(s) => (s.depth_mm, s.width_mm),
        SectionSpec::Channel(s) | SectionSpec::Tee(s) => (s.depth_mm, s.width_mm),
        SectionSpec::Rhs(s) => (s.depth_mm, s.width_mm),
        SectionSpec::Rect(s) => (s.depth_mm, s.width_mm),
        SectionSpec::Chs(s) => (s.diameter_mm, s.diameter_mm),
        SectionSpec::Round(s) => (s.diameter_mm, s.diameter_mm),
        SectionSpec::Angle(s) => (s.depth_mm, s.width_mm),
        SectionSpec::Given(_) | SectionSpec::Catalogue(_) => (0.0, 0.0),
    };
    if swapped {
        (b, h)
    } else {
        (h, b)
    }
}

/// C1 and C2 for the member's diagram over its unbraced length
/// ([`c_factors`]), with C1 held to the lowest tabulated value when the ends
/// are restrained against lateral rotation (k_lt < 1) under span load.
pub(super) fn moment_factors(
    input: &Input<'_>,
    m: &crate::member::Moments,
    warnings: &mut Vec<Warning>,
) -> super::CFactors {
    let c = c_factors(m, diagram_is_segment(input));
    if input.member.lcr_lt_mm.is_none() && input.member.k_lt < 1.0 && m.span_knm != 0.0 {
        // With ends restrained against lateral rotation (k < 1) and load in
        // the span, C1 falls below 1 (ENV 1993-1-1:1992 Table F.1.2, k = 0.5:
        // 0.972 for a uniform load, 0.712 for a uniform load between fixed
        // ends, recalled from memory): the lowest value is taken.
        if input.member.k_lt < 0.5 {
            warn_once_text(
                warnings,
                "c1-below-table",
                "bending: k_lt is below 0.5, beyond the moment-factor tables (k = 1 and 0.5); \
                 C1 is taken as their lowest value, 0.712, which may still overstate M_cr: \
                 check the elastic critical moment by analysis",
            );
        }
        return super::CFactors {
            c1: c.c1.min(super::C1_RESTRAINED_SPAN),
            c2: c.c2,
            source: super::CSource::RestrainedSpan,
        };
    }
    c
}

/// chi_LT of 6.3.2.2 (general case) with curve d, alpha_LT = 0.76.
pub(super) fn curve_d_chi(lambda: f64) -> f64 {
    let phi = 0.5 * (1.0 + 0.76 * (lambda - 0.2) + lambda * lambda);
    (1.0 / (phi + (phi * phi - lambda * lambda).max(0.0).sqrt())).min(1.0)
}

fn axis(
    input: &Input<'_>,
    steel: &Steel,
    axis: Axis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    if let SectionSpec::Tee(t) = &input.section.spec {
        if super::tee::in_plane(input, axis == Axis::Major) {
            return super::en1993_tee::axis(input, steel, t, axis, trace, warnings);
        }
    }
    let s = axis.scope();
    let m = moments(input, axis);
    let demand = push_diagram(trace, axis, &m);
    let class = classify(input, steel, axis, trace);
    let p = &input.section.props;
    let plastic = class <= 2;
    let w = if class == 4 {
        super::en1993_effective::w_eff(input, steel, axis, trace)?
    } else {
        super::modulus(input, axis, plastic)?
    };
    if class == 4 {
        step!(
            trace,
            s,
            "W_eff",
            "effective section modulus W_eff,min (Class 4, EN 1993-1-5 4.4)",
            w,
            "mm3",
            "EN 1993-1-1 6.2.5(2), Eq. 6.15"
        );
    } else if plastic {
        step!(
            trace,
            s,
            "W_pl",
            "plastic section modulus (Class 1 or 2)",
            w,
            "mm3",
            "EN 1993-1-1 6.2.5(2), Eq. 6.13"
        );
    } else {
        step!(
            trace,
            s,
            "W_el",
            "elastic section modulus (Class 3)",
            w,
            "mm3",
            "EN 1993-1-1 6.2.5(2), Eq. 6.14"
        );
    }
    let fy = steel.fy_mpa;
    let m_rk = w * fy / 1e6;
    step!(
        trace,
        s,
        "M_c,Rd",
        "cross-section bending resistance W f_y / gamma_M0, gamma_M0 = 1.0",
        m_rk,
        "kNm",
        "EN 1993-1-1 6.2.5, Eq. 6.13-6.15"
    );
    let lt_applies = axis == Axis::Major
        && !input.member.lt_restrained
        && !matches!(
            input.section.spec,
            SectionSpec::Chs(_) | SectionSpec::Round(_)
        );
    if !lt_applies {
        if axis == Axis::Major {
            if input.member.lt_restrained {
                step!(trace, s, "chi_LT", "no lateral-torsional buckling: compression flange held continuously (lt_restrained)", 1.0, "-", "EN 1993-1-1 6.3.2.1");
            } else {
                step!(
                    trace,
                    s,
                    "chi_LT",
                    "no lateral-torsional buckling: circular section",
                    1.0,
                    "-",
                    "EN 1993-1-1 6.3.2.1"
                );
            }
        }
        return Ok(AxisBending {
            resistance_knm: m_rk,
            critical_knm: None,
            reduction: 1.0,
            moment_factor: None,
            demand_knm: demand,
            kept: super::Kept::Class(class),
            by_sign: None,
        });
    }
    // Lateral-torsional buckling about the major axis.
    let l_lt = input.member.lt_length_mm()?;
    let segment = diagram_is_segment(input);
    let c = moment_factors(input, &m, warnings);
    let swapped = p.principal_angle_rad != 0.0;
    let (h, b) = depth_width(&input.section.spec, swapped);
    let zg = if m.span_knm != 0.0 {
        z_g(input.member.load_level, h)
    } else {
        0.0
    };
    let (i_t, i_w) = (p.torsion_mm4, p.warping_mm6);
    if i_t <= 0.0 && i_w <= 0.0 {
        return Err(Error::Geometry {
            field: "torsion_mm4",
            reason: "lateral-torsional buckling needs the section's torsion constant (and warping \
                     constant where it has one); enter torsion_mm4, or set lt_restrained if the \
                     compression flange is held continuously"
                .into(),
        });
    }
    let k = if input.member.lcr_lt_mm.is_some() {
        1.0
    } else {
        input.member.k_lt
    };
    step!(
        trace,
        s,
        "L_LT",
        "length between lateral-torsional restraints (k_lt L or lcr_lt_mm)",
        l_lt,
        "mm",
        "member file"
    );
    push_c_factors(trace, &c, zg);
    if let SectionSpec::Tee(_) = input.section.spec {
        warn_once_text(
            warnings,
            "tee-symmetry-axis-ltb",
            "bending: the tee is bent about its axis of symmetry, its major principal axis; its \
             elastic critical moment is worked with the doubly symmetric formula (z_j = 0 by \
             symmetry), its own I_t and I_w, and curve d: common practice, to verify",
        );
    }
    if input.section.spec_is_channel() {
        warn_once_text(
            warnings,
            "channel-ltb-assumed",
            "bending: the channel's elastic critical moment is worked with the doubly symmetric \
             formula and its own I_t and I_w, ignoring the offset of its shear centre (common \
             practice for channels loaded through the shear centre); a load applied through the \
             web twists the channel, which is not checked",
        );
    }
    // k_lt is the factor on the length already in L_LT; the formula's k on
    // I_w stays k_lt (k_w = 1).
    let mcr = m_cr(
        steel.e_mpa,
        steel.g_mpa,
        p.i_minor_mm4,
        i_t,
        i_w,
        l_lt,
        k,
        c,
        zg,
    ) / 1e6;
    step!(
        trace,
        s,
        "M_cr",
        "elastic critical moment, three-factor formula, k = k_lt, k_w = 1",
        mcr,
        "kNm",
        "EN 1993-1-1 6.3.2.2(2); formula of ENV 1993-1-1 Annex F"
    );
    let lambda = (m_rk / mcr).sqrt();
    step!(
        trace,
        s,
        "lambda_bar_LT",
        "relative slenderness sqrt(W_y f_y / M_cr)",
        lambda,
        "-",
        "EN 1993-1-1 Eq. 6.56"
    );
    let hb = if b > 0.0 { h / b } else { 0.0 };
    let (rolled_or_welded_i, curve_alpha) = match &input.section.spec {
        SectionSpec::I(i) => {
            let (rolled, deep) = (i.make == IMake::Rolled, hb > 2.0);
            let alpha = match (rolled, deep) {
                (true, false) => 0.34,
                (true, true) | (false, false) => 0.49,
                (false, true) => 0.76,
            };
            match (rolled, deep) {
                (true, false) => step!(
                    trace,
                    s,
                    "alpha_LT",
                    "imperfection factor: rolled I, h/b <= 2, curve b",
                    alpha,
                    "-",
                    "EN 1993-1-1 Table 6.5, Table 6.3"
                ),
                (true, true) => step!(
                    trace,
                    s,
                    "alpha_LT",
                    "imperfection factor: rolled I, h/b > 2, curve c",
                    alpha,
                    "-",
                    "EN 1993-1-1 Table 6.5, Table 6.3"
                ),
                (false, false) => step!(
                    trace,
                    s,
                    "alpha_LT",
                    "imperfection factor: welded I, h/b <= 2, curve c",
                    alpha,
                    "-",
                    "EN 1993-1-1 Table 6.5, Table 6.3"
                ),
                (false, true) => step!(
                    trace,
                    s,
                    "alpha_LT",
                    "imperfection factor: welded I, h/b > 2, curve d",
                    alpha,
                    "-",
                    "EN 1993-1-1 Table 6.5, Table 6.3"
                ),
            }
            (true, alpha)
        }
        _ => {
            step!(
                trace,
                s,
                "alpha_LT",
                "imperfection factor: other cross-section, curve d",
                0.76,
                "-",
                "EN 1993-1-1 Table 6.4, Table 6.3"
            );
            (false, 0.76)
        }
    };
    let (chi, f) = if rolled_or_welded_i {
        let (l0, beta) = (0.4, 0.75);
        let phi = 0.5 * (1.0 + curve_alpha * (lambda - l0) + beta * lambda * lambda);
        let chi = (1.0 / (phi + (phi * phi - beta * lambda * lambda).max(0.0).sqrt()))
            .min(1.0)
            .min(1.0 / (lambda * lambda));
        step!(
            trace,
            s,
            "Phi_LT",
            "0.5 [1 + alpha_LT (lambda_bar_LT - 0.4) + 0.75 lambda_bar_LT^2]",
            phi,
            "-",
            "EN 1993-1-1 6.3.2.3(1), recommended lambda_bar_LT,0 = 0.4, beta = 0.75"
        );
        step!(
            trace,
            s,
            "chi_LT",
            "reduction factor, rolled or equivalent welded sections",
            chi,
            "-",
            "EN 1993-1-1 Eq. 6.57"
        );
        let kc = if segment {
            match super::shape(&m) {
                Shape::None => 1.0,
                Shape::Linear { psi } => 1.0 / (1.33 - 0.33 * psi),
                Shape::Span(SpanLoad::Uniform) => 0.94,
                Shape::Span(SpanLoad::Point) => 0.90,
                Shape::Combined => 1.0,
            }
        } else {
            1.0
        };
        if c.source == CSource::Conservative {
            step!(trace, s, "k_c", "correction factor taken as 1.0 (conservative): combined diagram or restrained length other than the member length", kc, "-", "EN 1993-1-1 Table 6.6 (no row for this diagram)");
        } else {
            step!(
                trace,
                s,
                "k_c",
                "correction factor for the moment distribution",
                kc,
                "-",
                "EN 1993-1-1 Table 6.6"
            );
        }
        let f = (1.0 - 0.5 * (1.0 - kc) * (1.0 - 2.0 * (lambda - 0.8) * (lambda - 0.8))).min(1.0);
        step!(
            trace,
            s,
            "f",
            "modification factor 1 - 0.5 (1 - k_c)[1 - 2 (lambda_bar_LT - 0.8)^2] <= 1",
            f,
            "-",
            "EN 1993-1-1 Eq. 6.58"
        );
        let chi_mod = (chi / f).min(1.0).min(1.0 / (lambda * lambda));
        step!(
            trace,
            s,
            "chi_LT,mod",
            "modified reduction factor chi_LT / f <= 1, <= 1/lambda_bar_LT^2",
            chi_mod,
            "-",
            "EN 1993-1-1 Eq. 6.58"
        );
        (chi_mod, f)
    } else {
        // Not an I section: curve d (curve_alpha is 0.76 here).
        let phi = 0.5 * (1.0 + curve_alpha * (lambda - 0.2) + lambda * lambda);
        let chi = curve_d_chi(lambda);
        step!(
            trace,
            s,
            "Phi_LT",
            "0.5 [1 + alpha_LT (lambda_bar_LT - 0.2) + lambda_bar_LT^2]",
            phi,
            "-",
            "EN 1993-1-1 6.3.2.2(1)"
        );
        step!(
            trace,
            s,
            "chi_LT",
            "reduction factor, general case",
            chi,
            "-",
            "EN 1993-1-1 Eq. 6.56"
        );
        (chi, 1.0)
    };
    let _ = f;
    let g1 = gamma_m1(input);
    step!(
        trace,
        s,
        "gamma_M1",
        "partial factor (gamma_m1, or the recommended 1.0)",
        g1,
        "-",
        "EN 1993-1-1 6.1(1) Note 2B"
    );
    let mb = (chi * m_rk / g1).min(m_rk);
    step!(
        trace,
        s,
        "M_b,Rd",
        "buckling resistance moment chi_LT W_y f_y / gamma_M1 (not above M_c,Rd)",
        mb,
        "kNm",
        "EN 1993-1-1 Eq. 6.55"
    );
    Ok(AxisBending {
        resistance_knm: mb,
        critical_knm: Some(mcr),
        reduction: chi,
        moment_factor: Some(c.c1),
        demand_knm: demand,
        kept: super::Kept::Class(class),
        by_sign: None,
    })
}
