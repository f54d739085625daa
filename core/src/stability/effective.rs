//! Effective areas of slender (Class 4) sections in axial compression.
//!
//! EN 1993-1-5:2006 4.4, uniform compression (psi = 1): plate slenderness
//! `lambda_p = (b_bar/t) / (28.4 eps sqrt(k_sigma))` with k_sigma = 4.0 for
//! internal parts (Table 4.1) and 0.43 for outstands (Table 4.2);
//! `rho = (lambda_p - 0.055 (3 + psi)) / lambda_p^2 <= 1` for internal parts
//! when lambda_p > 0.673 (Eq. 4.2) and `rho = (lambda_p - 0.188) / lambda_p^2 <= 1`
//! for outstands when lambda_p > 0.748 (Eq. 4.3). The effective width
//! `rho b_bar` is applied to Class 4 elements only; the ineffective strip
//! `(1 - rho) b_bar t` comes off the gross area.
//!
//! AISC 360-16 E7: for an element with `lambda > lambda_r sqrt(F_y/F_cr)`,
//! `F_el = (c2 lambda_r / lambda)^2 F_y` (E7-5) and
//! `b_e = b (1 - c1 sqrt(F_el/F_cr)) sqrt(F_el/F_cr)` (E7-3), with c1, c2
//! from Table E7.1; round HSS with `0.11 E/F_y < D/t < 0.45 E/F_y` use
//! `A_e = (0.038 E / (F_y D/t) + 2/3) A_g` (E7-7), capped at A_g.
//!
//! [`of_check`] gives back the effective widths a finished check used, for
//! drawing them ([`super::ineffective::ineffective`]).

use super::classify::{self, Classified, Element, Kind, Part};
use crate::material::Material;
use crate::method::{Input, Method};
use crate::outcome::{Mode, ModeResult};

/// EN 1993-1-5 4.4 plate slenderness for uniform compression.
pub fn en_lambda_p(b_bar_mm: f64, t_mm: f64, epsilon: f64, k_sigma: f64) -> f64 {
    (b_bar_mm / t_mm) / (28.4 * epsilon * k_sigma.sqrt())
}

/// EN 1993-1-5 buckling factor for psi = 1: 4.0 internal (Table 4.1), 0.43 outstand (Table 4.2).
pub fn en_k_sigma(kind: Kind) -> f64 {
    match kind {
        Kind::Internal => 4.0,
        _ => 0.43,
    }
}

/// EN 1993-1-5 Eq. 4.2 (internal, psi = 1) and Eq. 4.3 (outstand).
pub fn en_rho(kind: Kind, lambda_p: f64) -> f64 {
    match kind {
        Kind::Internal => {
            if lambda_p <= 0.673 {
                1.0
            } else {
                ((lambda_p - 0.055 * 4.0) / (lambda_p * lambda_p)).min(1.0)
            }
        }
        Kind::Outstand => {
            if lambda_p <= 0.748 {
                1.0
            } else {
                ((lambda_p - 0.188) / (lambda_p * lambda_p)).min(1.0)
            }
        }
        Kind::Tube | Kind::Rule => 1.0,
    }
}

/// One element's effective width.
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct Reduced {
    /// Plate slenderness (EN lambda_p; AISC lambda / (lambda_r sqrt(F_y/F_cr))).
    pub slenderness: f64,
    /// rho (EN) or b_e / b (AISC).
    pub rho: f64,
    /// Effective width, mm (for an angle leg, the effective part of its flat outstand c).
    pub effective_mm: f64,
    /// Area taken off, mm2 (all `count` elements).
    pub removed_mm2: f64,
}

/// The effective area and each element's reduction (same order as the classification).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Effective {
    /// Effective area, mm2.
    pub area_mm2: f64,
    /// Per element, `None` when it is not reduced.
    pub reduced: [Option<Reduced>; 4],
}

/// Whether an element takes an EN effective width: Class 4 elements, and
/// angle legs of a Class 4 angle (the angle rules are whole-section rules).
fn en_reduces(section_class: u8, e: &Element) -> bool {
    if e.kind == Kind::Rule || e.kind == Kind::Tube || section_class < 4 {
        return false;
    }
    e.class >= 4 || matches!(e.part, Part::AngleLongLeg | Part::AngleShortLeg)
}

/// EN 1993-1-5 4.4 effective area of a classified section (gross area for
/// Class 1 to 3). For an angle, b_bar is the longer leg h for both legs
/// (4.4(2)) and the strip taken off a leg is capped at its flat length
/// beyond the other leg.
pub fn en_area(c: &Classified, gross_mm2: f64) -> Effective {
    let mut out = Effective {
        area_mm2: gross_mm2,
        reduced: [None; 4],
    };
    for (slot, e) in out.reduced.iter_mut().zip(c.elements()) {
        if !en_reduces(c.class, e) {
            continue;
        }
        let lp = en_lambda_p(
            e.eff_width_mm,
            e.thickness_mm,
            c.epsilon,
            en_k_sigma(e.kind),
        );
        let rho = en_rho(e.kind, lp);
        let strip = (1.0 - rho) * e.eff_width_mm;
        let angle = matches!(e.part, Part::AngleLongLeg | Part::AngleShortLeg);
        let (strip, effective) = if angle {
            // The strip comes off the flat outstand c of the leg.
            let s = strip.min(e.width_mm);
            (s, e.width_mm - s)
        } else {
            (strip, rho * e.eff_width_mm)
        };
        let removed = f64::from(e.count) * strip * e.thickness_mm;
        *slot = Some(Reduced {
            slenderness: lp,
            rho,
            effective_mm: effective,
            removed_mm2: removed,
        });
    }
    let removed: f64 = out.reduced.iter().flatten().map(|r| r.removed_mm2).sum();
    out.area_mm2 = (gross_mm2 - removed).max(0.0);
    out
}

/// AISC 360-16 Table E7.1 (c1, c2) for an element.
pub fn aisc_c1_c2(e: &Element) -> (f64, f64) {
    match e.part {
        Part::RhsDepthWall | Part::RhsWidthWall => (0.20, 1.38),
        _ if e.kind == Kind::Internal => (0.18, 1.31),
        _ => (0.22, 1.49),
    }
}

/// AISC 360-16 E7-3 effective width of one element at critical stress `fcr`.
pub fn aisc_effective_width(
    b: f64,
    lambda: f64,
    lambda_r: f64,
    c1: f64,
    c2: f64,
    fy: f64,
    fcr: f64,
) -> f64 {
    if fcr <= 0.0 || lambda <= lambda_r * (fy / fcr).sqrt() {
        return b;
    }
    let fel = (c2 * lambda_r / lambda).powi(2) * fy;
    let s = (fel / fcr).sqrt();
    (b * (1.0 - c1 * s) * s).clamp(0.0, b)
}

/// AISC 360-16 E7-7 effective area of a round HSS (capped at A_g).
pub fn aisc_round_area(gross_mm2: f64, d_over_t: f64, e_mpa: f64, fy_mpa: f64) -> f64 {
    ((0.038 * e_mpa / (fy_mpa * d_over_t) + 2.0 / 3.0) * gross_mm2).min(gross_mm2)
}

/// AISC 360-16 E7 effective area at critical stress `fcr_mpa` (gross area when nonslender).
pub fn aisc_area(
    c: &Classified,
    gross_mm2: f64,
    fy_mpa: f64,
    e_mpa: f64,
    fcr_mpa: f64,
) -> Effective {
    let mut out = Effective {
        area_mm2: gross_mm2,
        reduced: [None; 4],
    };
    let mut round: Option<f64> = None;
    for (slot, e) in out.reduced.iter_mut().zip(c.elements()) {
        if e.class < 4 {
            continue;
        }
        if e.kind == Kind::Tube {
            let ae = aisc_round_area(gross_mm2, e.ratio, e_mpa, fy_mpa);
            round = Some(ae);
            *slot = Some(Reduced {
                slenderness: e.ratio / e.limit_slender,
                rho: ae / gross_mm2,
                effective_mm: e.width_mm,
                removed_mm2: gross_mm2 - ae,
            });
            continue;
        }
        let (c1, c2) = aisc_c1_c2(e);
        let be = aisc_effective_width(
            e.width_mm,
            e.ratio,
            e.limit_slender,
            c1,
            c2,
            fy_mpa,
            fcr_mpa,
        );
        let b = e.width_mm;
        *slot = Some(Reduced {
            slenderness: if fcr_mpa > 0.0 {
                e.ratio / (e.limit_slender * (fy_mpa / fcr_mpa).sqrt())
            } else {
                0.0
            },
            rho: if b > 0.0 { be / b } else { 1.0 },
            effective_mm: be,
            removed_mm2: f64::from(e.count) * (b - be) * e.thickness_mm,
        });
    }
    out.area_mm2 = match round {
        Some(ae) => ae,
        None => {
            let removed: f64 = out.reduced.iter().flatten().map(|r| r.removed_mm2).sum();
            (gross_mm2 - removed).max(0.0)
        }
    };
    out
}

/// The classification and effective widths behind a check by `method`
/// (from `input`) whose modes were `modes`, `governing` governing, worked by
/// the same functions as the check: EN 1993-1-1 [`en_area`], AISC 360-16
/// [`aisc_area`] at the governing mode's F_cr = reduction x F_y. `None` when
/// the section is not slender, is not steel, or the method takes no
/// effective area. `crate::check::CheckResult::effective` passes a result's.
pub fn of_check(
    input: &Input<'_>,
    method: Method,
    modes: &[ModeResult],
    governing: Mode,
) -> Option<(Classified, Effective)> {
    let Material::Steel(s) = input.material else {
        return None;
    };
    let code = super::table_of(method)?;
    let c = classify::classify(code, &input.section.spec, s.fy_mpa, s.e_mpa)?;
    if !c.is_slender() {
        return None;
    }
    let a = input.section.props.area_mm2;
    let eff = match method {
        Method::En1993 => en_area(&c, a),
        Method::AiscLrfd | Method::AiscAsd => {
            let g = modes.iter().find(|m| m.mode == governing)?;
            aisc_area(&c, a, s.fy_mpa, s.e_mpa, g.reduction * s.fy_mpa)
        }
        _ => return None,
    };
    Some((c, eff))
}
