//! EN 1995-1-1:2004 bending of solid and glued laminated timber: 6.1.6
//! (sigma_m,d <= f_m,d) with the size factor k_h of 3.2 (solid, depth under
//! 150 mm: k_h = min((150/h)^0.2, 1.3)) and 3.3 (glulam, depth under 600
//! mm: k_h = min((600/h)^0.1, 1.1)), and lateral-torsional stability 6.3.3
//! for rectangles bent about the major axis.
//!
//! f_m,k is the class number of EN 338 (C and D classes) and EN 14080 (GL
//! classes): C24 has f_m,k = 24 MPa, GL28h f_m,g,k = 28 MPa (how the classes
//! are named: fact of the trade). A custom timber has no bending strength
//! key and is refused. f_m,d = k_mod k_h f_m,k / gamma_M (2.4.1, k_mod Table
//! 3.1, gamma_M Table 2.3 or `gamma_m1`).
//!
//! sigma_m,crit: solid softwood from Eq. 6.32, 0.78 b^2 E_0,05 / (h l_ef);
//! glulam from Eq. 6.31, pi sqrt(E_0,05 I_z G_0,05 I_tor) / (l_ef W_y) with
//! G_0,05 = G_mean E_0,05 / E_0,mean (common practice: the fifth percentile
//! in the same ratio as the modulus) and I_tor of the rectangle. l_ef from
//! Table 6.1 for a simply supported span: constant moment 1.0 l, uniform
//! load 0.9 l, point load at mid-span 0.8 l; other diagrams, or a restrained
//! length other than the member length, 1.0 l (conservative); +2h for load on
//! the compression edge, -0.5h on the tension edge. lambda_rel,m =
//! sqrt(f_m,k / sigma_m,crit) (6.30); k_crit 1 up to 0.75, 1.56 - 0.75
//! lambda up to 1.4, 1/lambda^2 beyond (6.34). Round timber: 6.1.6 only.

use super::{diagram_is_segment, moments, push_diagram, shape, Axis, AxisBending, Bending, Shape};
use crate::error::{Error, Result};
use crate::material::{Material, Timber, TimberKind};
use crate::member::{LoadLevel, SpanLoad};
use crate::method::en1995::design_strength;
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::SectionSpec;
use crate::trace::{step, Trace};

const KEY: &str = "en1995-1-1";

/// f_m,k from the class name (C24 -> 24, GL28h -> 28), MPa.
pub fn f_mk(name: &str) -> Option<f64> {
    // The leading digits read in place, without a copy or a substring
    // searcher: this runs in every timber check with a moment, twice with
    // axial load (callgrind: some 800 instructions each time before).
    let mut rest = name;
    while let Some(r) = rest.strip_prefix("GL") {
        rest = r;
    }
    let rest = rest.trim_start_matches(['C', 'D']);
    let end = rest
        .bytes()
        .position(|b| !b.is_ascii_digit())
        .unwrap_or(rest.len());
    let digits = rest.get(..end)?;
    let value = if (1..=15).contains(&end) {
        // Exact: an integer below 10^15 is a float as it stands, the value
        // parse::<f64> gives.
        digits
            .bytes()
            .fold(0u64, |v, b| v * 10 + u64::from(b - b'0')) as f64
    } else {
        digits.parse::<f64>().ok()?
    };
    Some(value).filter(|v| *v > 0.0)
}

/// The design bending strengths of a timber member about both axes, with
/// their factors: what the bending check (6.1.6, 6.3.3) and the
/// interaction (6.2.4, 6.3.2, 6.3.3) both use.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Strengths {
    /// The timber.
    pub timber: Timber,
    /// f_m,k, MPa (the class number).
    pub f_mk: f64,
    /// k_mod (Table 3.1).
    pub k_mod: f64,
    /// gamma_M (Table 2.3, or `gamma_m1`).
    pub gamma_m: f64,
    /// The depth in the plane of bending about the major axis, mm.
    pub h_major_mm: f64,
    /// The width for bending about the major axis, mm.
    pub b_major_mm: f64,
    /// The size factor k_h about the major and the minor axis, worked once
    /// ([`size_factor`]): both the bending check and the interaction read it.
    pub k_h: [f64; 2],
}

/// The size factor k_h of timber of `kind` at the depth `h` in the plane of
/// bending, mm (3.2 Eq. 3.1 solid, 3.3 Eq. 3.2 glulam).
pub fn size_factor(kind: TimberKind, h: f64) -> f64 {
    match kind {
        TimberKind::Solid if h < 150.0 => (150.0 / h).powf(0.2).min(1.3),
        TimberKind::Glulam if h < 600.0 => (600.0 / h).powf(0.1).min(1.1),
        _ => 1.0,
    }
}

impl Strengths {
    /// (h, b) for bending about `axis`, mm: the depth in the plane of
    /// bending and the width.
    pub fn dims(&self, axis: Axis) -> (f64, f64) {
        match axis {
            Axis::Major => (self.h_major_mm, self.b_major_mm),
            Axis::Minor => (self.b_major_mm, self.h_major_mm),
        }
    }

    /// The size factor k_h for bending about `axis` (3.2 Eq. 3.1 solid,
    /// 3.3 Eq. 3.2 glulam).
    pub fn k_h(&self, axis: Axis) -> f64 {
        match axis {
            Axis::Major => self.k_h[0],
            Axis::Minor => self.k_h[1],
        }
    }

    /// f_m,d = k_mod k_h f_m,k / gamma_M about `axis`, MPa (2.4.1 Eq. 2.14).
    pub fn f_md(&self, axis: Axis) -> f64 {
        self.k_mod * self.k_h(axis) * self.f_mk / self.gamma_m
    }
}

/// The design bending strengths of the member: refuses steel, a custom
/// timber (no f_m,k) and sections other than rectangles and rounds.
pub fn strengths(input: &Input<'_>) -> Result<Strengths> {
    let Material::Timber(t) = input.material else {
        return Err(Error::NotApplicable {
            method: KEY,
            reason: "it is a timber design method and the material is steel; use a steel method"
                .into(),
        });
    };
    let fmk = f_mk(t.name).ok_or_else(|| Error::NotApplicable {
        method: KEY,
        reason: "material: bending needs f_m,k; a custom timber has no bending strength key, so give a strength class (C24, GL28h, ...)".into(),
    })?;
    let (h_major, b_major) = match &input.section.spec {
        SectionSpec::Rect(r) => {
            if input.section.props.principal_angle_rad != 0.0 {
                (r.width_mm, r.depth_mm)
            } else {
                (r.depth_mm, r.width_mm)
            }
        }
        SectionSpec::Round(r) => (r.diameter_mm, r.diameter_mm),
        _ => {
            return Err(Error::NotApplicable {
                method: KEY,
                reason: "bending under EN 1995-1-1 is implemented for solid and glued laminated rectangles and rounds only".into(),
            })
        }
    };
    let (_, km, g, _) = design_strength(input, t.kind, t.fc0k_mpa);
    Ok(Strengths {
        timber: *t,
        f_mk: fmk,
        k_mod: km,
        gamma_m: g,
        h_major_mm: h_major,
        b_major_mm: b_major,
        k_h: [size_factor(t.kind, h_major), size_factor(t.kind, b_major)],
    })
}

/// Checks both axes.
pub fn check(
    input: &Input<'_>,
    trace: &mut Trace,
    _warnings: &mut Vec<Warning>,
) -> Result<Bending> {
    let st = strengths(input)?;
    let t = &st.timber;
    let fmk = st.f_mk;
    let one = |axis: Axis, trace: &mut Trace| -> Result<AxisBending> {
        let s = axis.scope();
        let (h, b) = st.dims(axis);
        let m = moments(input, axis);
        let demand = push_diagram(trace, axis, &m);
        step!(
            trace,
            s,
            "f_m,k",
            "characteristic bending strength (the class number)",
            fmk,
            "MPa",
            "EN 338 / EN 14080 class"
        );
        let kh = st.k_h(axis);
        match t.kind {
            TimberKind::Solid => step!(
                trace,
                s,
                "k_h",
                "size factor, solid timber: min((150/h)^0.2, 1.3) for h < 150 mm",
                kh,
                "-",
                "EN 1995-1-1 Eq. 3.1"
            ),
            TimberKind::Glulam => step!(
                trace,
                s,
                "k_h",
                "size factor, glulam: min((600/h)^0.1, 1.1) for h < 600 mm",
                kh,
                "-",
                "EN 1995-1-1 Eq. 3.2"
            ),
        }
        let fmd = st.f_md(axis);
        step!(
            trace,
            s,
            "f_m,d",
            "design bending strength k_mod k_h f_m,k / gamma_M",
            fmd,
            "MPa",
            "EN 1995-1-1 2.4.1, Eq. 2.14"
        );
        let p = &input.section.props;
        let w = match axis {
            Axis::Major => p.w_el_major_mm3,
            Axis::Minor => p.w_el_minor_mm3,
        };
        let m_rd = fmd * w / 1e6;
        step!(
            trace,
            s,
            "M_Rd",
            "f_m,d W",
            m_rd,
            "kNm",
            "EN 1995-1-1 6.1.6"
        );
        let lt = axis == Axis::Major
            && !input.member.lt_restrained
            && matches!(input.section.spec, SectionSpec::Rect(_))
            && h > b;
        if !lt {
            return Ok(AxisBending {
                resistance_knm: m_rd,
                critical_knm: None,
                reduction: 1.0,
                moment_factor: None,
                demand_knm: demand,
                kept: super::Kept::Strength(fmd),
                by_sign: None,
            });
        }
        let l = input.member.lt_length_mm()?;
        let factor = if diagram_is_segment(input) {
            match shape(&m) {
                Shape::Span(SpanLoad::Uniform) => 0.9,
                Shape::Span(SpanLoad::Point) => 0.8,
                _ => 1.0,
            }
        } else {
            1.0
        };
        step!(
            trace,
            s,
            "l_ef/l",
            "effective length ratio for the diagram (other diagrams 1.0, conservative)",
            factor,
            "-",
            "EN 1995-1-1 Table 6.1"
        );
        let edge = if m.span_knm != 0.0 {
            match input.member.load_level {
                LoadLevel::ShearCentre => 0.0,
                LoadLevel::CompressionFlange => 2.0 * h,
                LoadLevel::TensionFlange => -0.5 * h,
            }
        } else {
            0.0
        };
        let lef = factor * l + edge;
        step!(
            trace,
            s,
            "l_ef",
            "effective length (+2h load on the compression edge, -0.5h on the tension edge)",
            lef,
            "mm",
            "EN 1995-1-1 Table 6.1"
        );
        let sigma_crit = match t.kind {
            TimberKind::Solid => {
                let v = 0.78 * b * b * t.e005_mpa / (h * lef);
                step!(
                    trace,
                    s,
                    "sigma_m,crit",
                    "critical bending stress 0.78 b^2 E_0,05 / (h l_ef), solid softwood",
                    v,
                    "MPa",
                    "EN 1995-1-1 Eq. 6.32"
                );
                v
            }
            TimberKind::Glulam => {
                let g05 = t.g_mean_mpa * t.e005_mpa / t.e0mean_mpa;
                step!(
                    trace,
                    s,
                    "G_0,05",
                    "G_mean E_0,05 / E_0,mean (common practice)",
                    g05,
                    "MPa",
                    "EN 1995-1-1 6.3.3(2)"
                );
                let v = std::f64::consts::PI
                    * (t.e005_mpa * p.i_minor_mm4 * g05 * p.torsion_mm4).sqrt()
                    / (lef * w);
                step!(
                    trace,
                    s,
                    "sigma_m,crit",
                    "critical bending stress pi sqrt(E_0,05 I_z G_0,05 I_tor) / (l_ef W_y), glulam",
                    v,
                    "MPa",
                    "EN 1995-1-1 Eq. 6.31"
                );
                v
            }
        };
        let lambda = (fmk / sigma_crit).sqrt();
        step!(
            trace,
            s,
            "lambda_rel,m",
            "relative slenderness for bending sqrt(f_m,k / sigma_m,crit)",
            lambda,
            "-",
            "EN 1995-1-1 Eq. 6.30"
        );
        let kcrit = if lambda <= 0.75 {
            1.0
        } else if lambda <= 1.4 {
            1.56 - 0.75 * lambda
        } else {
            1.0 / (lambda * lambda)
        };
        step!(
            trace,
            s,
            "k_crit",
            "reduction for lateral-torsional buckling",
            kcrit,
            "-",
            "EN 1995-1-1 Eq. 6.34"
        );
        let mrd = kcrit * m_rd;
        step!(
            trace,
            s,
            "M_b,Rd",
            "k_crit f_m,d W",
            mrd,
            "kNm",
            "EN 1995-1-1 Eq. 6.33"
        );
        Ok(AxisBending {
            resistance_knm: mrd,
            critical_knm: Some(sigma_crit * w / 1e6),
            reduction: kcrit,
            moment_factor: None,
            demand_knm: demand,
            kept: super::Kept::Strength(fmd),
            by_sign: None,
        })
    };
    Ok(Bending {
        major: one(Axis::Major, trace)?,
        minor: one(Axis::Minor, trace)?,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn f_mk_is_the_class_number() {
        // EN 338 / EN 14080 class names (fact of the trade).
        assert_eq!(f_mk("C24"), Some(24.0));
        assert_eq!(f_mk("D30"), Some(30.0));
        assert_eq!(f_mk("GL28h"), Some(28.0));
        assert_eq!(f_mk("GL24c"), Some(24.0));
        assert_eq!(f_mk("C"), None);
        assert_eq!(f_mk("GL"), None);
        assert_eq!(f_mk("custom"), None);
        assert_eq!(f_mk("C0"), None);
        assert_eq!(f_mk("GLGL30"), Some(30.0));
        assert_eq!(f_mk("C024x"), Some(24.0));
        // Beyond the integer fast path, the float parser's value.
        assert_eq!(f_mk("C12345678901234567890"), Some(12345678901234567890.0));
    }

    #[test]
    fn size_factor_follows_eqs_3_1_and_3_2() {
        assert_eq!(size_factor(TimberKind::Solid, 150.0), 1.0);
        assert_eq!(size_factor(TimberKind::Solid, 10.0), 1.3);
        assert_eq!(size_factor(TimberKind::Solid, 100.0), 1.5f64.powf(0.2));
        assert_eq!(size_factor(TimberKind::Glulam, 600.0), 1.0);
        assert_eq!(size_factor(TimberKind::Glulam, 300.0), 2.0f64.powf(0.1));
        assert_eq!(size_factor(TimberKind::Glulam, 10.0), 1.1);
    }
}
