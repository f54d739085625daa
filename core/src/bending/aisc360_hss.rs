//! AISC 360-16 F7 for rectangular HSS with slender walls: the effective
//! section modulus of a slender compression flange (F7-3, F7-4) and the
//! strength with a slender web (F7.3(c), Eqs. F7-7 to F7-9 with R_pg of
//! Eq. F5-6). Equations recalled from memory of the 2016 Specification.

use crate::trace::{step, Scope, Trace};

/// Effective width of a slender HSS flange, Eq. F7-4, mm: b_e = 1.92 t
/// sqrt(E/F_y) [1 - 0.38 / (b/t) sqrt(E/F_y)] <= b.
pub fn effective_width(b: f64, t: f64, e: f64, fy: f64) -> f64 {
    let root = (e / fy).sqrt();
    (1.92 * t * root * (1.0 - 0.38 / (b / t) * root)).min(b)
}

/// The effective section modulus S_e with the compression flange's flat
/// width b reduced to b_e (the strip b - b_e of thickness t taken out at
/// the flange's mid-thickness), mm3, divided by the distance from the
/// shifted neutral axis to the farther fibre, the tension face (first
/// yield, the smaller modulus: conservative).
/// `i` and `area` are the gross section's about the bending axis, `depth`
/// the wall-to-wall depth H.
pub fn effective_modulus(i: f64, area: f64, depth: f64, t: f64, b: f64, be: f64) -> f64 {
    let w = b - be;
    let d0 = depth / 2.0 - t / 2.0;
    let a_e = area - w * t;
    let shift = w * t * d0 / a_e;
    let i_e = i - w * t.powi(3) / 12.0 - w * t * d0 * d0 - a_e * shift * shift;
    i_e / (depth / 2.0 + shift)
}

/// Slender flange, Eq. F7-3: M_n = F_y S_e, N mm, with its working.
pub fn slender_flange(
    (e, fy): (f64, f64),
    (i, area, depth, t, b): (f64, f64, f64, f64, f64),
    s: Scope,
    trace: &mut Trace,
) -> f64 {
    let be = effective_width(b, t, e, fy);
    step!(
        trace,
        s,
        "b_e",
        "effective width of the slender compression flange",
        be,
        "mm",
        "AISC 360-16 Eq. F7-4"
    );
    let se = effective_modulus(i, area, depth, t, b, be);
    step!(
        trace,
        s,
        "S_e",
        "effective section modulus, to the tension face (conservative)",
        se,
        "mm3",
        "AISC 360-16 F7.2(c)"
    );
    let mn = fy * se;
    step!(
        trace,
        s,
        "M_n,FLB",
        "flange local buckling, slender flange F_y S_e",
        mn / 1e6,
        "kNm",
        "AISC 360-16 Eq. F7-3"
    );
    mn
}

/// Slender web, F7.3(c): the smaller of R_pg F_y S (F7-7) and R_pg F_cr S
/// with F_cr = 0.9 E k_c / (b/t)^2, k_c = 4.0 (F7-8, F7-9); R_pg of Eq.
/// F5-6 with a_w = 2 h t / (b t) (both walls of the box), N mm.
pub fn slender_web(
    (e, fy): (f64, f64),
    (sx, h, b, t): (f64, f64, f64, f64),
    s: Scope,
    trace: &mut Trace,
) -> f64 {
    let root = (e / fy).sqrt();
    let aw = (2.0 * h * t / (b * t)).min(10.0);
    let rpg = (1.0 - aw / (1200.0 + 300.0 * aw) * (h / t - 5.7 * root)).min(1.0);
    step!(
        trace,
        s,
        "a_w",
        "2 h t_w / (b t_f), at most 10",
        aw,
        "-",
        "AISC 360-16 F7.3(c)"
    );
    step!(
        trace,
        s,
        "R_pg",
        "bending strength reduction factor of a slender web",
        rpg,
        "-",
        "AISC 360-16 Eq. F5-6"
    );
    let bt = b / t;
    let fcr = (0.9 * e * 4.0 / (bt * bt)).min(fy);
    let mn = rpg * fcr * sx;
    step!(
        trace,
        s,
        "M_n,WLB",
        "slender web: R_pg F_cr S, F_cr = 0.9 E k_c / (b/t)^2 <= F_y, k_c = 4.0",
        mn / 1e6,
        "kNm",
        "AISC 360-16 Eq. F7-7 to F7-9"
    );
    mn
}
