//! EN 1993-1-1 Class 4 bending: the effective section modulus W_eff,min of
//! 6.2.5(2) (Eq. 6.15) and 6.3.2.1 (W_y = W_eff,y), by the effective widths
//! of EN 1993-1-5:2006 4.4, for the doubly symmetric I (either axis) and the
//! rectangular hollow section (either axis). Other Class 4 sections are
//! refused naming the moment key.
//!
//! One step, as EN 1993-1-5 4.4(3) sets it out (common practice, no
//! iteration): the compression flange's effective width first (uniform
//! compression, psi = 1), then the web's with psi from the stresses of the
//! section with that effective flange and the gross web; W_eff,min is the
//! effective second moment over the larger distance from its centroid to
//! an extreme fibre. The strips taken off come off the gross properties
//! (the root fillets and corners stay in).
//!
//! - plate slenderness lambda_p = (b_bar/t) / (28.4 eps sqrt(k_sigma)),
//!   4.4(2);
//! - internal parts (Table 4.1): k_sigma = 4.0 (psi = 1), 8.2/(1.05 + psi)
//!   (1 > psi > 0), 7.81 - 6.29 psi + 9.78 psi^2 (0 >= psi > -1), 23.9
//!   (psi = -1), 5.98 (1 - psi)^2 (-1 > psi >= -3); rho = (lambda_p - 0.055
//!   (3 + psi)) / lambda_p^2 <= 1 beyond lambda_p = 0.5 + sqrt(0.085 - 0.055
//!   psi) (Eq. 4.2 as corrected by AC:2009); for psi < 0 the compressed
//!   width b_c = b_bar/(1 - psi), b_eff = rho b_c, b_e1 = 0.4 b_eff next to
//!   the flange and b_e2 = 0.6 b_eff next to the neutral axis; for psi >= 0,
//!   b_e1 = 2 b_eff/(5 - psi); for a flange (psi = 1) half at each edge;
//! - outstands (Table 4.2): k_sigma = 0.43 (uniform compression, taken also
//!   for the flanges of an I bent about its minor axis, whose tips are the
//!   most compressed: the conservative value), rho = (lambda_p - 0.188) /
//!   lambda_p^2 <= 1 beyond 0.748 (Eq. 4.3), the strip off the tip.
//!
//! Widths as the classification measures them: rolled outstands and webs
//! between the root radii, RHS walls b - 3t and h - 3t (the web's flat
//! taken symmetric about mid-depth). Tables 4.1 and 4.2 are recalled from
//! memory.

use super::Axis;
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::method::Input;
use crate::section::SectionSpec;
use crate::trace::{step, Scope, Trace};

/// k_sigma of an internal part, EN 1993-1-5 Table 4.1 (psi held to -3..=1).
pub fn k_sigma_internal(psi: f64) -> f64 {
    let psi = psi.clamp(-3.0, 1.0);
    if psi >= 1.0 {
        4.0
    } else if psi > 0.0 {
        8.2 / (1.05 + psi)
    } else if psi > -1.0 {
        7.81 - 6.29 * psi + 9.78 * psi * psi
    } else if psi == -1.0 {
        23.9
    } else {
        5.98 * (1.0 - psi) * (1.0 - psi)
    }
}

/// rho of an internal part, EN 1993-1-5 Eq. 4.2 (AC:2009 limit).
pub fn rho_internal(lambda_p: f64, psi: f64) -> f64 {
    if lambda_p <= 0.5 + (0.085 - 0.055 * psi).sqrt() {
        1.0
    } else {
        ((lambda_p - 0.055 * (3.0 + psi)) / (lambda_p * lambda_p)).min(1.0)
    }
}

/// rho of an outstand, EN 1993-1-5 Eq. 4.3.
pub fn rho_outstand(lambda_p: f64) -> f64 {
    if lambda_p <= 0.748 {
        1.0
    } else {
        ((lambda_p - 0.188) / (lambda_p * lambda_p)).min(1.0)
    }
}

/// lambda_p of EN 1993-1-5 4.4(2).
pub fn lambda_p(b_bar: f64, t: f64, eps: f64, k_sigma: f64) -> f64 {
    (b_bar / t) / (28.4 * eps * k_sigma.sqrt())
}

/// A strip taken off: area, position of its centre from the gross
/// centroid (towards the compressed side), and its own second moment.
#[derive(Clone, Copy, Default)]
struct Hole {
    area: f64,
    at: f64,
    own: f64,
}

/// The gross section about the bending axis with the strips taken off.
struct Cut {
    area: f64,
    inertia: f64,
    half_depth: f64,
    holes: [Hole; 4],
    count: usize,
}

impl Cut {
    fn push(&mut self, h: Hole, times: usize) {
        for _ in 0..times {
            if let Some(slot) = self.holes.get_mut(self.count) {
                *slot = h;
                self.count += 1;
            }
        }
    }

    fn holes(&self) -> &[Hole] {
        self.holes.get(..self.count).unwrap_or(&[])
    }

    /// (effective area, centroid shift towards compression, I_eff).
    fn effective(&self) -> (f64, f64, f64) {
        let a = self.area - self.holes().iter().map(|h| h.area).sum::<f64>();
        let shift = -self.holes().iter().map(|h| h.area * h.at).sum::<f64>() / a;
        let i0 = self.inertia
            - self
                .holes()
                .iter()
                .map(|h| h.own + h.area * h.at * h.at)
                .sum::<f64>();
        (a, shift, i0 - a * shift * shift)
    }
}

fn refuse(axis: Axis, what: &str) -> Error {
    Error::NotApplicable {
        method: "en1993-1-1",
        reason: format!(
            "{}: the section is Class 4 in bending about the {} axis; {what}: choose a stockier \
             section or check it by hand",
            match axis {
                Axis::Major => "m_major_a_knm",
                Axis::Minor => "m_minor_a_knm",
            },
            match axis {
                Axis::Major => "major",
                Axis::Minor => "minor",
            }
        ),
    }
}

/// The web(s) in bending between `top` and `-top` (positions from the
/// gross centroid), compressed at `top`, given the neutral axis `na` of the
/// section with its effective flange: the strip taken off each web.
fn web(top: f64, na: f64, t: f64, eps: f64, s: Scope, trace: &mut Trace) -> Option<Hole> {
    let b_bar = 2.0 * top;
    let psi = ((-top - na) / (top - na)).max(-3.0);
    let k = k_sigma_internal(psi);
    let lp = lambda_p(b_bar, t, eps, k);
    let rho = rho_internal(lp, psi);
    step!(
        trace,
        s,
        "psi_w",
        "web stress ratio with the effective compression flange",
        psi,
        "-",
        "EN 1993-1-5 4.4(3)"
    );
    step!(
        trace,
        s,
        "k_sigma,w",
        "web buckling factor",
        k,
        "-",
        "EN 1993-1-5 Table 4.1 (recalled from memory)"
    );
    step!(
        trace,
        s,
        "lambda_p,w",
        "web plate slenderness (b_bar/t) / (28.4 eps sqrt(k_sigma))",
        lp,
        "-",
        "EN 1993-1-5 4.4(2)"
    );
    step!(
        trace,
        s,
        "rho_w",
        "web reduction factor",
        rho,
        "-",
        "EN 1993-1-5 Eq. 4.2"
    );
    if rho >= 1.0 {
        return None;
    }
    let b_c = if psi < 0.0 {
        b_bar / (1.0 - psi)
    } else {
        b_bar
    };
    let b_eff = rho * b_c;
    let b_e1 = if psi < 0.0 {
        0.4 * b_eff
    } else {
        2.0 * b_eff / (5.0 - psi)
    };
    let gap = b_c - b_eff;
    step!(
        trace,
        s,
        "b_eff,w",
        "effective part of the compressed web, b_e1 next to the flange and b_e2",
        b_eff,
        "mm",
        "EN 1993-1-5 Table 4.1"
    );
    Some(Hole {
        area: gap * t,
        at: top - b_e1 - gap / 2.0,
        own: t * gap.powi(3) / 12.0,
    })
}

/// W_eff,min about `axis` of a Class 4 I or RHS, mm3, with its working.
pub(super) fn w_eff(
    input: &Input<'_>,
    steel: &Steel,
    axis: Axis,
    trace: &mut Trace,
) -> Result<f64> {
    let s = axis.scope();
    let p = &input.section.props;
    let eps = (235.0 / steel.fy_mpa).sqrt();
    let swapped = p.principal_angle_rad != 0.0;
    let geometric_y = (axis == Axis::Major) != swapped;
    let inertia = match axis {
        Axis::Major => p.i_major_mm4,
        Axis::Minor => p.i_minor_mm4,
    };
    let mut cut = Cut {
        area: p.area_mm2,
        inertia,
        half_depth: 0.0,
        holes: [Hole::default(); 4],
        count: 0,
    };
    let mut webs: Option<(f64, f64, usize)> = None;
    match &input.section.spec {
        SectionSpec::I(i) => {
            let c = (i.width_mm - i.web_mm - 2.0 * i.root_radius_mm) / 2.0;
            let lp = lambda_p(c, i.flange_mm, eps, 0.43);
            let rho = rho_outstand(lp);
            step!(
                trace,
                s,
                "lambda_p,f",
                "flange outstand plate slenderness, k_sigma = 0.43 (uniform compression)",
                lp,
                "-",
                "EN 1993-1-5 4.4(2), Table 4.2"
            );
            step!(
                trace,
                s,
                "rho_f",
                "flange outstand reduction factor",
                rho,
                "-",
                "EN 1993-1-5 Eq. 4.3"
            );
            let strip = (1.0 - rho) * c;
            if geometric_y {
                cut.half_depth = i.depth_mm / 2.0;
                let tf = i.flange_mm;
                cut.push(
                    Hole {
                        area: strip * tf,
                        at: cut.half_depth - tf / 2.0,
                        own: strip * tf.powi(3) / 12.0,
                    },
                    2,
                );
                webs = Some((
                    i.depth_mm / 2.0 - i.flange_mm - i.root_radius_mm,
                    i.web_mm,
                    1,
                ));
            } else {
                // About the web's axis: the compressed tips of both flanges.
                cut.half_depth = i.width_mm / 2.0;
                let tf = i.flange_mm;
                cut.push(
                    Hole {
                        area: strip * tf,
                        at: cut.half_depth - strip / 2.0,
                        own: tf * strip.powi(3) / 12.0,
                    },
                    2,
                );
            }
        }
        SectionSpec::Rhs(r) => {
            let t = r.wall_mm;
            let (h, b) = if geometric_y {
                (r.depth_mm, r.width_mm)
            } else {
                (r.width_mm, r.depth_mm)
            };
            cut.half_depth = h / 2.0;
            let b_bar = b - 3.0 * t;
            let lp = lambda_p(b_bar, t, eps, 4.0);
            let rho = rho_internal(lp, 1.0);
            step!(
                trace,
                s,
                "lambda_p,f",
                "compression flange plate slenderness, internal, k_sigma = 4.0",
                lp,
                "-",
                "EN 1993-1-5 4.4(2), Table 4.1"
            );
            step!(
                trace,
                s,
                "rho_f",
                "compression flange reduction factor",
                rho,
                "-",
                "EN 1993-1-5 Eq. 4.2"
            );
            let gap = (1.0 - rho) * b_bar;
            cut.push(
                Hole {
                    area: gap * t,
                    at: h / 2.0 - t / 2.0,
                    own: gap * t.powi(3) / 12.0,
                },
                1,
            );
            webs = Some((h / 2.0 - 1.5 * t, t, 2));
        }
        SectionSpec::Chs(_) => {
            return Err(refuse(
                axis,
                "the effective section of EN 1993-1-6 (circular tubes) is not worked here",
            ))
        }
        _ => {
            return Err(refuse(
                axis,
                "the effective section in bending (EN 1993-1-5 4.4) is worked here for doubly \
                 symmetric I and rectangular hollow sections only",
            ))
        }
    }
    if let Some((top, t, count)) = webs {
        let (_, na, _) = cut.effective();
        if let Some(h) = web(top, na, t, eps, s, trace) {
            cut.push(h, count);
        }
    }
    let (a, shift, i_eff) = cut.effective();
    let far = cut.half_depth + shift.abs();
    let w = i_eff / far;
    step!(
        trace,
        s,
        "A_eff,M",
        "effective area under the moment alone",
        a,
        "mm2",
        "EN 1993-1-5 4.3, 4.4"
    );
    step!(
        trace,
        s,
        "e_M",
        "shift of the effective centroid away from the compressed side",
        -shift,
        "mm",
        "EN 1993-1-5 4.3"
    );
    step!(
        trace,
        s,
        "I_eff",
        "effective second moment about the shifted axis",
        i_eff,
        "mm4",
        "EN 1993-1-5 4.3"
    );
    Ok(w)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn table_4_1_at_its_points() {
        // EN 1993-1-5 Table 4.1: 4.0 (psi 1), 7.81 (0), 23.9 (-1), 5.98 x 16
        // = 95.68 (-3).
        let close = |a: f64, b: f64| (a - b).abs() < 0.02;
        assert!(close(k_sigma_internal(1.0), 4.0));
        assert!(close(k_sigma_internal(0.0), 7.81));
        assert!(close(k_sigma_internal(-1.0), 23.9));
        assert!(close(k_sigma_internal(-0.999_999), 23.88));
        assert!(close(k_sigma_internal(-3.0), 95.68));
        // Eq. 4.2 limits: 0.673 at psi = 1, 0.874 at psi = -1.
        assert_eq!(rho_internal(0.673, 1.0), 1.0);
        assert!(rho_internal(0.68, 1.0) < 1.0);
        assert_eq!(rho_internal(0.87, -1.0), 1.0);
        assert!(rho_internal(0.88, -1.0) < 1.0);
    }
}
