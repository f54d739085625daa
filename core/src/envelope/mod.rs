//! The capacity envelope of a member: failure stress against slenderness.
//!
//! Euler's hyperbola sigma_cr = pi^2 E / lambda^2, the strength plateau
//! f_y, and the design stress of the member's own method, sampled by
//! running the whole check at the buckling length lambda * i. The chart and
//! the check can therefore never disagree.

pub mod interaction;

use serde::Serialize;

use crate::check::{self, Mode, Prepared};
use crate::error::Result;
use crate::member::{MAX_LENGTH_MM, MIN_LENGTH_MM};
use crate::method::{Input, Method};

/// One sample of the envelope.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Point {
    /// Slenderness L_cr / i.
    pub slenderness: f64,
    /// Euler critical stress, MPa.
    pub euler_mpa: f64,
    /// Strength plateau (f_y or f_c,0,k), MPa.
    pub yield_mpa: f64,
    /// Design stress N_Rd / A of the method, MPa.
    pub design_mpa: f64,
}

/// Samples the envelope of `prepared` for `method` about `mode`'s axis
/// from slenderness `from` to `to` in `steps` intervals (`steps + 1` points).
///
/// Each sample runs the whole check ([`check::Scratch::check`], without
/// working, one scratch for them all) with that axis's buckling length set
/// to `lambda * i`, so a Class 4 effective area, the AISC E7 reduction and
/// every other part of the check shape the curve exactly as they shape the
/// member's own result. Buckling lengths are
/// kept within the member file's range (1 mm to 10 km).
pub fn sample(
    prepared: &Prepared,
    method: Method,
    mode: Mode,
    from: f64,
    to: f64,
    steps: usize,
) -> Result<Vec<Point>> {
    let section = &prepared.section;
    let p = &section.props;
    let r = match mode {
        Mode::Major => p.r_major_mm,
        _ => p.r_minor_mm,
    };
    let (f, e) = crate::method::material_for(method, &prepared.material).strength_and_modulus();
    let steps = steps.max(1);
    let from = from.max(0.0);
    let mut probe = prepared.member.clone();
    // An AISC E5 angle's mode is E3 at its effective slenderness, which
    // ignores lcr: the curve is E3 itself, and the mode lies on it.
    probe.angle_connection = None;
    // The curve is the method's resistance at a buckling length set
    // directly: a frame or a buckling model of the member (which give the
    // member's own length, and which the check refuses together with a
    // set length) play no part in it.
    probe.frame_major = None;
    probe.frame_minor = None;
    probe.buckling_model = None;
    let mut out = Vec::with_capacity(steps + 1);
    // One scratch for every sample: no result allocated for each.
    let mut scratch = check::Scratch::new(check::Working::Skipped);
    for k in 0..=steps {
        let lambda = from + (to - from) * (k as f64) / (steps as f64);
        let lcr = (lambda * r).clamp(MIN_LENGTH_MM, MAX_LENGTH_MM);
        match mode {
            Mode::Major => probe.lcr_major_mm = Some(lcr),
            _ => probe.lcr_minor_mm = Some(lcr),
        }
        let input = Input {
            member: &probe,
            section,
            material: &prepared.material,
        };
        let result = scratch.check(&input, method)?;
        let axis = result
            .modes
            .iter()
            .find(|x| x.mode == mode)
            .map_or(result.resistance_kn, |x| x.resistance_kn);
        let lambda_used = lcr / r;
        out.push(Point {
            slenderness: lambda_used,
            euler_mpa: std::f64::consts::PI.powi(2) * e / (lambda_used * lambda_used),
            yield_mpa: f,
            design_mpa: axis * 1000.0 / p.area_mm2,
        });
    }
    Ok(out)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::file;

    #[test]
    fn frames_and_buckling_models_sample_the_sections_curve() {
        // The worked example's W2 (frame_major) and K1 (buckling_model):
        // the envelope is the method's curve for the member's section at
        // set buckling lengths, as for the same member without them.
        let f = file::parse(include_str!("../../../examples/tarnbeck-crane-hall.json")).unwrap();
        for m in &f.members {
            let mut plain = m.clone();
            plain.frame_major = None;
            plain.frame_minor = None;
            plain.buckling_model = None;
            for mode in [Mode::Major, Mode::Minor] {
                let p = Prepared::new(m).unwrap();
                let got = sample(&p, p.member.method, mode, 0.0, 200.0, 20).unwrap();
                let q = Prepared::new(&plain).unwrap();
                let want = sample(&q, q.member.method, mode, 0.0, 200.0, 20).unwrap();
                assert_eq!(got, want, "{} {mode:?}", m.id);
            }
        }
    }

    #[test]
    fn the_curve_passes_through_the_members_own_resistance() {
        let text = include_str!("../../../examples/depot-mezzanine.json");
        let mut f = file::parse(text).unwrap();
        // A Class 4 square hollow section (c/t = 71 > 42 eps = 34) under EN 1993-1-1 and AISC:
        // its effective area must shape the curve as it shapes the check.
        for method in ["en1993-1-1", "aisc360-lrfd"] {
            let slender = format!(
                r#"{{"id": "S-{method}", "section": {{"kind": "rhs", "depth_mm": 300, "width_mm": 300,
                "wall_mm": 4, "outer_radius_mm": 8, "make": "cold-formed"}},
                "material": {{"grade": "S355"}}, "length_mm": 4000, "axial_kn": 500,
                "method": "{method}"}}"#
            );
            f.members.push(serde_json::from_str(&slender).unwrap());
        }
        for m in &f.members {
            let prepared = Prepared::new(m).unwrap();
            let own = prepared.check().unwrap();
            for axis in [Mode::Major, Mode::Minor] {
                let mode = own.modes.iter().find(|x| x.mode == axis).unwrap();
                let lambda = mode.slenderness;
                let pts = sample(&prepared, m.method, axis, lambda, lambda, 1).unwrap();
                let design = pts[0].design_mpa * prepared.section.props.area_mm2 / 1000.0;
                assert!(
                    (design - mode.resistance_kn).abs() <= 1e-9 * mode.resistance_kn,
                    "{} {axis:?}: curve {design} kN vs check {} kN",
                    m.id,
                    mode.resistance_kn
                );
            }
        }
    }
}
