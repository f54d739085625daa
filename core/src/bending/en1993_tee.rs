//! EN 1993-1-1:2005 bending of a tee in its plane of symmetry (about the
//! axis parallel to the flange, the geometric y-y), as the trade usually
//! treats it; a warning says what is assumed. Bending about the tee's axis
//! of symmetry is the general case of [`super::en1993`] (its flange
//! outstands classified, no monosymmetry).
//!
//! Sign: see [`super::tee`]; each sign has its own class, modulus and
//! critical moment, and the sign with the larger demand over resistance
//! governs (with no moment, the lower of the two is the reported capacity).
//!
//! Classes, Table 5.2 (sheet 2, outstand flanges; the stem of a tee as an
//! outstand, c = h - t_f - r; the flange c = (b - t_w - 2r)/2):
//! - flange compressed: the flange under uniform compression, 9/10/14 eps;
//!   the stem, its tip in tension, only where part of it is compressed:
//!   Classes 1/2 9 eps/(alpha sqrt(alpha)), 10 eps/(alpha sqrt(alpha)) with
//!   alpha the compressed part of c at the plastic moment, Class 3
//!   21 eps sqrt(k_sigma) with psi = sigma_tip / sigma_root of the elastic
//!   stresses and k_sigma of EN 1993-1-5 Table 4.2 for the supported edge
//!   most compressed: 0.578/(psi + 0.34) for 1 >= psi >= 0, 1.7 - 5 psi +
//!   17.1 psi^2 for 0 >= psi >= -1 (psi below -1 taken as -1, the smaller
//!   k_sigma);
//! - stem compressed (tip in compression): 9 eps/alpha, 10 eps/alpha, 21
//!   eps sqrt(k_sigma) with psi = sigma_root / sigma_tip and k_sigma =
//!   0.57 - 0.21 psi + 0.07 psi^2 (1 >= psi >= -3; below -3 taken as -3,
//!   the smaller k_sigma); the flange too, at 9/10/14 eps, where the
//!   elastic neutral axis lies in it.
//!
//! EN 1993-1-5 Table 4.2 is recalled from memory; a Ritz solution of the
//! outstand plate (tests/validation/bending_review/rederive.py) agrees within
//! 1 % at psi = 1, 0.5, 0, -1 and lies above the table elsewhere. Class 4 in a sign that
//! carries a moment is refused, naming the moment key (the effective
//! section of a tee is not worked).
//!
//! Lateral-torsional buckling, 6.3.2.2 with curve d (Table 6.4, "other
//! cross-sections"), when the axis is the major principal one and the
//! compression flange is not held: M_cr by the three-factor formula for
//! monosymmetric sections of ENV 1993-1-1:1992 Annex F (Eq. F.2; EN
//! 1993-1-1 gives no M_cr), C1 pi^2 E I_z / (k L)^2 {sqrt[k^2 I_w/I_z + (k
//! L)^2 G I_t / (pi^2 E I_z) + (C2 z_g - C3 z_j)^2] - (C2 z_g - C3 z_j)},
//! z_j of [`super::tee::Tee`] signed towards the compressed side:
//! - the stem compressed anywhere along the member (the diagram negative or
//!   reversing): the worse case, uniform moment with the stem compressed,
//!   C1 = C3 = 1 (exact for uniform moment), for both signs;
//! - the flange compressed throughout: uniform moment C1 = C3 = 1 (exact);
//!   end moments, the larger of M_cr with C1 = C3 = 1 and with C1 of the
//!   diagram ([`super::c_factors`]) and C3 = 0; transverse load, C1 and C2
//!   of ENV Annex F Table F.1.2 with C3 = 0 (the Wagner term not credited:
//!   the published C3 with the doubly symmetric C1 overstated M_cr of tees
//!   by up to 0.5 %, and uniform moment by up to 50 % under transverse load,
//!   against an energy solution);
//! - a load below the shear centre is not credited (z_g = 0), one above it
//!   is (z_g to the compressed face).
//!
//! Each of these was checked against a Rayleigh-Ritz energy solution on
//! four tees and fourteen diagrams with the three load levels
//! (tests/validation/bending_review/rederive.py): never above it.
//! M_b,Rd = chi_LT W_y f_y / gamma_M1 <= M_c,Rd.

use super::en1993::{curve_d_chi, gamma_m1, limits, Part};
use super::tee::{self, Tee};
use super::{moments, push_diagram, signed_extremes, Axis, AxisBending, CSource, Shape};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::LoadLevel;
use crate::method::common::warn_once_text;
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::Flanged;
use crate::trace::{step, Scope, Trace};

const KEY: &str = "en1993-1-1";

/// k_sigma of EN 1993-1-5 Table 4.2, the free edge most compressed, psi =
/// sigma_supported / sigma_free (recalled from memory), psi held to -3..=1.
pub fn k_sigma_tip_compressed(psi: f64) -> f64 {
    let psi = psi.clamp(-3.0, 1.0);
    0.57 - 0.21 * psi + 0.07 * psi * psi
}

/// k_sigma of EN 1993-1-5 Table 4.2, the supported edge most compressed,
/// psi = sigma_free / sigma_supported (recalled from memory), psi held to -1..=1.
pub fn k_sigma_root_compressed(psi: f64) -> f64 {
    let psi = psi.clamp(-1.0, 1.0);
    if psi >= 0.0 {
        0.578 / (psi + 0.34)
    } else {
        1.7 - 5.0 * psi + 17.1 * psi * psi
    }
}

/// The class of an outstand by Table 5.2 sheet 2 with a stress gradient:
/// alpha the compressed share at the plastic moment, k_sigma for Class 3.
pub fn outstand_class(ratio: f64, eps: f64, alpha: f64, k_sigma: f64, tip_compressed: bool) -> u8 {
    let alpha = alpha.clamp(1e-9, 1.0);
    let f = if tip_compressed {
        alpha
    } else {
        alpha * alpha.sqrt()
    };
    if ratio <= 9.0 * eps / f {
        1
    } else if ratio <= 10.0 * eps / f {
        2
    } else if ratio <= 21.0 * eps * k_sigma.sqrt() {
        3
    } else {
        4
    }
}

fn uniform_outstand(ratio: f64, eps: f64) -> u8 {
    let [l1, l2, l3] = limits(Part::Outstand, eps);
    if ratio <= l1 {
        1
    } else if ratio <= l2 {
        2
    } else if ratio <= l3 {
        3
    } else {
        4
    }
}

/// The classes with the flange compressed and with the stem compressed.
fn classes(g: &Tee, eps: f64, s: Scope, trace: &mut Trace) -> (u8, u8) {
    let fl = g.flange_c / g.tf;
    let stem = g.stem_c / g.tw;
    step!(
        trace,
        s,
        "c/t_f",
        "flange outstand, uniform compression (limits 9/10/14 eps)",
        fl,
        "-",
        "EN 1993-1-1 Table 5.2 (sheet 2)"
    );
    step!(
        trace,
        s,
        "c/t_w",
        "stem as an outstand, c = h - t_f - r",
        stem,
        "-",
        "EN 1993-1-1 Table 5.2 (sheet 2)"
    );
    // Flange compressed.
    let mut pos = uniform_outstand(fl, eps);
    if g.zc < g.stem_c {
        // The stem's root is compressed, its tip in tension.
        let alpha = ((g.stem_c - g.z_pna) / g.stem_c).max(0.0);
        let psi = -g.zc / (g.stem_c - g.zc);
        let k = k_sigma_root_compressed(psi);
        step!(
            trace,
            s,
            "psi+",
            "flange compressed: stem stress ratio sigma_tip / sigma_root (tip in tension)",
            psi,
            "-",
            "EN 1993-1-5 4.4, Table 4.2"
        );
        step!(
            trace,
            s,
            "k_sigma+",
            "buckling factor, supported edge most compressed",
            k,
            "-",
            "EN 1993-1-5 Table 4.2 (recalled from memory)"
        );
        let c = if alpha > 0.0 {
            outstand_class(stem, eps, alpha, k, false)
        } else {
            // Wholly in tension at the plastic moment: Classes 1 and 2
            // need no compressed part; Class 3 by the elastic stresses.
            if stem <= 21.0 * eps * k.sqrt() {
                1
            } else {
                4
            }
        };
        pos = pos.max(c);
    }
    step!(
        trace,
        s,
        "class+",
        "class with the flange compressed (stem in tension)",
        f64::from(pos),
        "-",
        "EN 1993-1-1 5.5.2, Table 5.2"
    );
    // Stem compressed (tip in compression).
    let alpha = (g.z_pna.min(g.stem_c) / g.stem_c).clamp(0.0, 1.0);
    let psi = (g.zc - g.stem_c) / g.zc;
    let k = k_sigma_tip_compressed(psi);
    step!(
        trace,
        s,
        "alpha-",
        "stem compressed: compressed share of c at the plastic moment",
        alpha,
        "-",
        "EN 1993-1-1 Table 5.2 (sheet 2)"
    );
    step!(
        trace,
        s,
        "psi-",
        "stem compressed: stress ratio sigma_root / sigma_tip",
        psi,
        "-",
        "EN 1993-1-5 4.4, Table 4.2"
    );
    step!(
        trace,
        s,
        "k_sigma-",
        "buckling factor, free edge most compressed, 0.57 - 0.21 psi + 0.07 psi^2",
        k,
        "-",
        "EN 1993-1-5 Table 4.2 (recalled from memory)"
    );
    let mut neg = outstand_class(stem, eps, alpha, k, true);
    if g.zc > g.h - g.tf {
        neg = neg.max(uniform_outstand(fl, eps));
    }
    step!(
        trace,
        s,
        "class-",
        "class with the stem compressed",
        f64::from(neg),
        "-",
        "EN 1993-1-1 5.5.2, Table 5.2"
    );
    (pos, neg)
}

/// One sign's working: class, modulus, M_c,Rd, and with lateral-torsional
/// buckling M_cr, chi_LT and M_b,Rd.
struct Side {
    resistance: f64,
    mcr: Option<f64>,
    chi: f64,
}

#[allow(clippy::too_many_arguments)]
fn side(
    input: &Input<'_>,
    steel: &Steel,
    axis: Axis,
    class: u8,
    mcr_nmm: Option<f64>,
    sign: &'static str,
    trace: &mut Trace,
) -> Result<Side> {
    let s = axis.scope();
    let plastic = class <= 2;
    let w = super::modulus(input, axis, plastic)?;
    let fy = steel.fy_mpa;
    let mc = w * fy / 1e6;
    let plus = sign == "+";
    // The working's symbols are literals: one step per sign.
    macro_rules! signed {
        ($pos:literal, $neg:literal, $($rest:tt)*) => {
            if plus {
                step!(trace, s, $pos, $($rest)*)
            } else {
                step!(trace, s, $neg, $($rest)*)
            }
        };
    }
    signed!(
        "W+",
        "W-",
        "modulus for this sign: W_pl for Class 1 or 2, W_el,min for Class 3",
        w,
        "mm3",
        "EN 1993-1-1 6.2.5(2)"
    );
    signed!(
        "M_c,Rd+",
        "M_c,Rd-",
        "cross-section resistance W f_y / gamma_M0, gamma_M0 = 1.0",
        mc,
        "kNm",
        "EN 1993-1-1 Eq. 6.13/6.14"
    );
    let Some(mcr) = mcr_nmm.map(|v| v / 1e6) else {
        return Ok(Side {
            resistance: mc,
            mcr: None,
            chi: 1.0,
        });
    };
    signed!(
        "M_cr+",
        "M_cr-",
        "elastic critical moment, monosymmetric three-factor formula",
        mcr,
        "kNm",
        "ENV 1993-1-1:1992 Annex F Eq. F.2 (EN 1993-1-1 gives none)"
    );
    let lambda = (mc / mcr).sqrt();
    signed!(
        "lambda_bar_LT+",
        "lambda_bar_LT-",
        "relative slenderness sqrt(W_y f_y / M_cr)",
        lambda,
        "-",
        "EN 1993-1-1 Eq. 6.56"
    );
    let chi = curve_d_chi(lambda);
    signed!(
        "chi_LT+",
        "chi_LT-",
        "reduction factor, general case, curve d (alpha_LT = 0.76)",
        chi,
        "-",
        "EN 1993-1-1 6.3.2.2, Table 6.4"
    );
    let mb = (chi * mc / gamma_m1(input)).min(mc);
    signed!(
        "M_b,Rd+",
        "M_b,Rd-",
        "buckling resistance moment chi_LT W_y f_y / gamma_M1 <= M_c,Rd",
        mb,
        "kNm",
        "EN 1993-1-1 Eq. 6.55"
    );
    Ok(Side {
        resistance: mb,
        mcr: Some(mcr),
        chi,
    })
}

/// A tee bent in its plane of symmetry under EN 1993-1-1.
pub(super) fn axis(
    input: &Input<'_>,
    steel: &Steel,
    t: &Flanged,
    axis: Axis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    let demand = push_diagram(trace, axis, &m);
    let (pos, neg) = signed_extremes(&m);
    if demand != 0.0 {
        tee::warn_sign(warnings);
    }
    let p = &input.section.props;
    let g = Tee::new(t, p);
    let eps = (235.0 / steel.fy_mpa).sqrt();
    let (class_pos, class_neg) = classes(&g, eps, s, trace);
    for (class, load, negative) in [(class_pos, pos, false), (class_neg, neg, true)] {
        if class == 4 && load > 0.0 {
            return Err(Error::NotApplicable {
                method: KEY,
                reason: format!(
                    "{}: the tee is Class 4 with its {} compressed; the effective section of a tee \
                     in bending (EN 1993-1-5) is not worked here: choose a stockier section",
                    tee::key_of(input, axis, negative),
                    if negative { "stem" } else { "flange" }
                ),
            });
        }
    }
    if class_pos == 4 && class_neg == 4 {
        return Err(Error::NotApplicable {
            method: KEY,
            reason: format!(
                "{}: the tee is Class 4 with either its flange or its stem compressed; its \
                 effective section in bending (EN 1993-1-5) is not worked here",
                tee::key_of(input, axis, false)
            ),
        });
    }
    let lt = axis == Axis::Major && !input.member.lt_restrained;
    let (mcr_pos, mcr_neg, c1_used) = if lt {
        let (a, b, c) = critical_moments(input, steel, &g, &m, neg > 0.0, s, trace, warnings)?;
        (Some(a), Some(b), Some(c))
    } else {
        if axis == Axis::Major {
            step!(
                trace,
                s,
                "chi_LT",
                "no lateral-torsional buckling: compression flange held continuously (lt_restrained)",
                1.0,
                "-",
                "EN 1993-1-1 6.3.2.1"
            );
        } else {
            step!(
                trace,
                s,
                "chi_LT",
                "no lateral-torsional buckling: bending about the minor principal axis",
                1.0,
                "-",
                "common practice"
            );
        }
        (None, None, None)
    };
    let plus = (class_pos < 4)
        .then(|| side(input, steel, axis, class_pos, mcr_pos, "+", trace))
        .transpose()?;
    let minus = (class_neg < 4)
        .then(|| side(input, steel, axis, class_neg, mcr_neg, "-", trace))
        .transpose()?;
    // The sign that governs: the larger demand over its resistance; with
    // no moment, the smaller resistance (the capacity either way up).
    let chosen = match (&plus, &minus) {
        (Some(a), Some(b)) => {
            if pos == 0.0 && neg == 0.0 {
                if a.resistance <= b.resistance {
                    (a, pos)
                } else {
                    (b, neg)
                }
            } else if pos / a.resistance >= neg / b.resistance {
                (a, pos)
            } else {
                (b, neg)
            }
        }
        (Some(a), None) => (a, pos),
        (None, Some(b)) => (b, neg),
        (None, None) => {
            return Err(Error::NotApplicable {
                method: KEY,
                reason: format!(
                    "{}: the tee is Class 4 either way up",
                    tee::key_of(input, axis, false)
                ),
            })
        }
    };
    let (side, demand_sign) = chosen;
    Ok(AxisBending {
        resistance_knm: side.resistance,
        critical_knm: side.mcr,
        reduction: side.chi,
        moment_factor: side.mcr.and(c1_used),
        demand_knm: if demand == 0.0 { 0.0 } else { demand_sign },
        // A sign that is Class 4 has no resistance here (a moment of that
        // sign was refused above): 0, so nothing can read it as a capacity.
        kept: super::Kept::None,
        by_sign: Some(super::BySign {
            positive_knm: plus.as_ref().map_or(0.0, |a| a.resistance),
            negative_knm: minus.as_ref().map_or(0.0, |b| b.resistance),
        }),
    })
}

/// M_cr (N mm) with the flange compressed and with the stem compressed, and
/// the C1 of the one that governs the member's moment, by the rule of the
/// module's documentation.
#[allow(clippy::too_many_arguments)]
fn critical_moments(
    input: &Input<'_>,
    steel: &Steel,
    g: &Tee,
    m: &crate::member::Moments,
    stem_compressed: bool,
    s: Scope,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<(f64, f64, f64)> {
    let p = &input.section.props;
    let l = input.member.lt_length_mm()?;
    let k = if input.member.lcr_lt_mm.is_some() {
        1.0
    } else {
        input.member.k_lt
    };
    let c = super::en1993::moment_factors(input, m, warnings);
    warn_once_text(
        warnings,
        "tee-ltb-assumed",
        "bending: EN 1993-1-1 gives no elastic critical moment for a tee; M_cr is worked by the \
         three-factor formula for monosymmetric sections (ENV 1993-1-1 Annex F) with z_j of the \
         plates: where the stem is compressed anywhere, uniform moment with the stem compressed \
         (C1 = C3 = 1) for both signs; with the flange compressed, the Wagner term is credited \
         under uniform moment and end moments only, not under transverse load, and a load below \
         the shear centre is not credited; curve d of 6.3.2.2",
    );
    step!(
        trace,
        s,
        "z_j",
        "monosymmetry: z_s - (1/2I_y) int z (y^2 + z^2) dA, flange compressed (plates)",
        g.z_j,
        "mm",
        "ENV 1993-1-1:1992 Annex F, F.1.2"
    );
    step!(
        trace,
        s,
        "L_LT",
        "length between lateral-torsional restraints (k_lt L or lcr_lt_mm)",
        l,
        "mm",
        "member file"
    );
    let span = m.span_knm != 0.0;
    let destabilising = span && input.member.load_level == LoadLevel::CompressionFlange;
    let f = |c1: f64, c2: f64, c3: f64, zg: f64, zj: f64| {
        super::m_cr_mono(
            steel.e_mpa,
            steel.g_mpa,
            p.i_minor_mm4,
            p.torsion_mm4,
            p.warping_mm6,
            l,
            k,
            [c1, c2, c3],
            zg,
            zj,
        )
    };
    // Stem compressed: uniform moment, C1 = C3 = 1.
    let c2_stem = if span { c.c2 } else { 0.0 };
    let zg_stem = if destabilising { g.sc_to_stem_tip } else { 0.0 };
    let mcr_stem = f(1.0, c2_stem, 1.0, zg_stem, -g.z_j);
    if stem_compressed {
        step!(trace, s, "C1", "stem compressed somewhere along the member: uniform moment with the stem compressed, C1 = C3 = 1, for both signs (the worse case)", 1.0, "-", "ENV 1993-1-1 Annex F (uniform moment exact); conservative reading");
        if zg_stem != 0.0 {
            step!(
                trace,
                s,
                "z_g",
                "load on the compressed side: the stem tip, above the shear centre",
                zg_stem,
                "mm",
                "load_level"
            );
        }
        return Ok((mcr_stem, mcr_stem, 1.0));
    }
    // Flange compressed throughout.
    let uniform = f(1.0, 0.0, 1.0, 0.0, g.z_j);
    let (mcr, c1) = if span {
        let zg = if destabilising {
            g.sc_to_flange_face
        } else {
            0.0
        };
        super::push_c_factors(trace, &c, zg);
        step!(
            trace,
            s,
            "C3",
            "transverse load: the Wagner term not credited (C3 = 0)",
            0.0,
            "-",
            "conservative reading of ENV 1993-1-1 Annex F Table F.1.2"
        );
        (f(c.c1, c.c2, 0.0, zg, g.z_j), c.c1)
    } else if let (CSource::Linear, Shape::Linear { .. }) = (c.source, super::shape(m)) {
        let linear = f(c.c1, 0.0, 0.0, 0.0, g.z_j);
        super::push_c_factors(trace, &c, 0.0);
        step!(
            trace,
            s,
            "C3",
            "end moments: the larger of M_cr with C1 = C3 = 1 and with C1 of the diagram, C3 = 0",
            if linear > uniform { 0.0 } else { 1.0 },
            "-",
            "ENV 1993-1-1 Annex F; conservative reading"
        );
        if linear > uniform {
            (linear, c.c1)
        } else {
            (uniform, 1.0)
        }
    } else {
        step!(
            trace,
            s,
            "C1",
            "uniform moment (or the segment's diagram not known): C1 = C3 = 1",
            1.0,
            "-",
            "ENV 1993-1-1 Annex F (uniform moment exact)"
        );
        (uniform, 1.0)
    };
    Ok((mcr, mcr_stem, c1))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn k_sigma_of_table_4_2() {
        // Uniform compression 0.43 either way; free edge most compressed,
        // psi = 0: 0.57, psi = -1: 0.85; supported edge, psi = 0: 1.70,
        // psi = -1: 23.8 (EN 1993-1-5 Table 4.2, recalled from memory).
        let close = |a: f64, b: f64| (a - b).abs() < 1e-3;
        assert!(close(k_sigma_tip_compressed(1.0), 0.43));
        assert!(close(k_sigma_tip_compressed(0.0), 0.57));
        assert!(close(k_sigma_tip_compressed(-1.0), 0.85));
        assert!(close(k_sigma_root_compressed(1.0), 0.578 / 1.34));
        assert!(close(k_sigma_root_compressed(0.0), 1.70));
        assert!(close(k_sigma_root_compressed(-1.0), 23.8));
        assert!(close(k_sigma_root_compressed(-5.0), 23.8));
    }

    #[test]
    fn outstand_classes_follow_alpha() {
        // c/t 15.4, eps 1, tip compressed, alpha 1, k_sigma 0.623: Class 3
        // (16.57 limit); tip in tension with alpha 0.5 the Class 1 limit is
        // 9 / (0.5 sqrt 0.5) = 25.5.
        assert_eq!(outstand_class(15.4167, 1.0, 1.0, 0.622868, true), 3);
        assert_eq!(outstand_class(25.0, 1.0, 0.5, 23.8, false), 1);
        assert_eq!(outstand_class(40.0, 1.0, 1.0, 0.43, true), 4);
    }
}
