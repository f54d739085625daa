//! The effective-length factor k of a column in a frame from the
//! alignment-chart equations, solved exactly by a bracketing root finder
//! (not read off a chart).
//!
//! Source: AISC 360-16 Commentary, Appendix 7, Section 7.2, Eq. C-A-7-1
//! (sidesway inhibited, "braced") and Eq. C-A-7-2 (sidesway uninhibited,
//! "sway"), the equations behind the alignment charts (Julian and Lawrence,
//! 1959; Kavanagh, 1962). With x = pi / k:
//!
//! - braced: (G_A G_B / 4) x^2 + ((G_A + G_B) / 2)(1 - x / tan x)
//!   + 2 tan(x / 2) / x - 1 = 0, k in [0.5, 1];
//! - sway: (G_A G_B x^2 - 36) / (6 (G_A + G_B)) - x / tan x = 0, k >= 1.
//!
//! Both are solved in a form without poles, multiplied through by
//! 4 x sin x and by 6 (G_A + G_B) sin x / x respectively:
//!
//! - braced: G_A G_B x^3 sin x + 2 (G_A + G_B) x (sin x - x cos x)
//!   + 4 (2 - 2 cos x - x sin x) = 0 on [pi, 2 pi];
//! - sway: (G_A G_B x^2 - 36) sin x / x - 6 (G_A + G_B) cos x = 0 on
//!   (0, pi].
//!
//! Each G enters as a ratio p / q (p = G, q = 1 up to G = 1; p = 1,
//! q = 1 / G above; q = 0 for a pinned end, G infinite), so G = 0 (fixed)
//! and G = infinity (pinned) are ordinary values, not limits. A negative
//! or non-finite-and-not-infinite G is refused; a sway column pinned at
//! both ends is a mechanism and is refused.

use serde::{Deserialize, Serialize};

use crate::error::{Error, Result};
use crate::roots::{newton_bisect, Stop};
use crate::trace::{step, Scope, Trace};
use crate::trig::sin_cos;

/// A column in a frame (member keys `frame_major`, `frame_minor`).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Frame {
    /// Sidesway uninhibited (true) or inhibited (false).
    pub sway: bool,
    /// G at end A: sum(EI/L) of the columns over sum(EI/L) of the beams.
    pub g_a: f64,
    /// G at end B.
    pub g_b: f64,
}

/// Which axis a frame belongs to; names its keys in errors and its scope
/// in the working.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum FrameKey {
    /// `frame_major`.
    Major,
    /// `frame_minor`.
    Minor,
}

impl FrameKey {
    /// The member-file key.
    pub fn key(self) -> &'static str {
        match self {
            FrameKey::Major => "frame_major",
            FrameKey::Minor => "frame_minor",
        }
    }

    /// The member-file key of the effective-length factor about this axis.
    pub fn k_key(self) -> &'static str {
        match self {
            FrameKey::Major => "k_major",
            FrameKey::Minor => "k_minor",
        }
    }

    /// The member-file key of the given buckling length about this axis.
    pub fn lcr_key(self) -> &'static str {
        match self {
            FrameKey::Major => "lcr_major_mm",
            FrameKey::Minor => "lcr_minor_mm",
        }
    }

    /// The member-file key of the length of the member's own moment
    /// amplification about this axis, from the engineer's analysis
    /// (AISC 360-16 Appendix 8.2.1's L_c1, CSA S16-19 13.8.4's L).
    pub fn amplification_key(self) -> &'static str {
        match self {
            FrameKey::Major => "amplification_length_major_mm",
            FrameKey::Minor => "amplification_length_minor_mm",
        }
    }

    fn g_key(self, end_b: bool) -> &'static str {
        match (self, end_b) {
            (FrameKey::Major, false) => "frame_major.g_a",
            (FrameKey::Major, true) => "frame_major.g_b",
            (FrameKey::Minor, false) => "frame_minor.g_a",
            (FrameKey::Minor, true) => "frame_minor.g_b",
        }
    }

    fn scope(self) -> Scope {
        match self {
            FrameKey::Major => Scope::Major,
            FrameKey::Minor => Scope::Minor,
        }
    }
}

/// G as the ratio p / q with p, q in [0, 1].
fn ratio(g: f64) -> (f64, f64) {
    if g.is_infinite() {
        (1.0, 0.0)
    } else if g <= 1.0 {
        (g, 1.0)
    } else {
        (1.0, 1.0 / g)
    }
}

fn checked(g: f64, field: &'static str) -> Result<f64> {
    if g >= 0.0 && (g.is_finite() || g == f64::INFINITY) {
        Ok(g)
    } else {
        Err(Error::Negative { field, value: g })
    }
}

/// sin x / x and its derivative, accurate near 0.
fn sinc(x: f64) -> (f64, f64) {
    if x.abs() < 1e-4 {
        let x2 = x * x;
        (1.0 - x2 / 6.0, -x / 3.0)
    } else {
        let (s, c) = sin_cos(x);
        (s / x, (x * c - s) / (x * x))
    }
}

/// k from the alignment-chart equations for `frame`; `which` names the
/// keys in errors. G may be `f64::INFINITY` (a pinned end).
pub fn k_factor(frame: &Frame, which: FrameKey) -> Result<f64> {
    let g_a = checked(frame.g_a, which.g_key(false))?;
    let g_b = checked(frame.g_b, which.g_key(true))?;
    let ((pa, qa), (pb, qb)) = (ratio(g_a), ratio(g_b));
    let (p, s, q) = (pa * pb, pa * qb + qa * pb, qa * qb);
    let pi = std::f64::consts::PI;
    let x = if frame.sway {
        if s == 0.0 && q == 0.0 {
            return Err(Error::Geometry {
                field: which.key(),
                reason: "a sway column pinned at both ends (G_A and G_B infinite) is a mechanism \
                         and cannot carry load; give at least one end a finite G"
                    .into(),
            });
        }
        let g = |x: f64| {
            let (sn, dsn) = sinc(x);
            let (sin, cos) = sin_cos(x);
            let a = p * x * x - 36.0 * q;
            (
                a * sn - 6.0 * s * cos,
                2.0 * p * x * sn + a * dsn + 6.0 * s * sin,
            )
        };
        let lo = 1e-12;
        let scale = 36.0 * q + 6.0 * s;
        newton_bisect(g, lo, pi, 0.5 * pi, Stop::on_value(1e-15 * scale))
    } else {
        if s == 0.0 && q == 0.0 {
            // Both ends pinned: the braced equation reads x^3 sin x = 0.
            pi
        } else {
            // -F, increasing on [pi, 2 pi] from -(2 pi^2 S + 16 Q) to 8 pi^2 S.
            let f = |x: f64| {
                let (sin, cos) = sin_cos(x);
                let x2 = x * x;
                let value = p * x2 * x * sin
                    + 2.0 * s * x * (sin - x * cos)
                    + 4.0 * q * (2.0 - 2.0 * cos - x * sin);
                let slope = p * (3.0 * x2 * sin + x2 * x * cos)
                    + 2.0 * s * (sin - x * cos + x2 * sin)
                    + 4.0 * q * (sin - x * cos);
                (-value, -slope)
            };
            let scale = 2.0 * pi * pi * s + 16.0 * q;
            newton_bisect(f, pi, 2.0 * pi, 1.5 * pi, Stop::on_value(1e-15 * scale))
        }
    };
    let k = pi / x;
    if !(k.is_finite() && k > 0.0) {
        return Err(Error::Geometry {
            field: which.key(),
            reason: format!("the alignment-chart equation gave no usable k (x = {x})"),
        });
    }
    Ok(k)
}

/// [`k_factor`] with its working appended to `trace`.
pub fn work(frame: &Frame, which: FrameKey, trace: &mut Trace) -> Result<f64> {
    let k = k_factor(frame, which)?;
    let scope = which.scope();
    const SOURCE: &str = "AISC 360-16 Commentary App. 7.2";
    step!(
        trace,
        scope,
        "G_A",
        "end A: sum(EI/L) columns / sum(EI/L) beams",
        frame.g_a,
        "-",
        SOURCE
    );
    step!(
        trace,
        scope,
        "G_B",
        "end B: sum(EI/L) columns / sum(EI/L) beams",
        frame.g_b,
        "-",
        SOURCE
    );
    if frame.sway {
        step!(
            trace,
            scope,
            "k",
            "sway frame: root of (G_A G_B (pi/k)^2 - 36) / (6 (G_A + G_B)) = (pi/k) / tan(pi/k)",
            k,
            "-",
            "AISC 360-16 Commentary Eq. C-A-7-2"
        );
    } else {
        step!(
            trace,
            scope,
            "k",
            "braced frame: root of G_A G_B (pi/k)^2 / 4 + (G_A + G_B)/2 (1 - (pi/k)/tan(pi/k)) + 2 tan(pi/2k)/(pi/k) = 1",
            k,
            "-",
            "AISC 360-16 Commentary Eq. C-A-7-1"
        );
    }
    Ok(k)
}

/// How the far end of a beam framing into a joint is held, for the
/// adjustment of its stiffness in G.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum FarEnd {
    /// As the alignment chart assumes (the beam's far end turns like the
    /// near one: single curvature when braced, double curvature in a
    /// sway frame): factor 1.
    AsCharted,
    /// Pinned at its far end.
    Pinned,
    /// Fixed at its far end.
    Fixed,
}

impl FarEnd {
    /// The factor on the beam's I/L in G's denominator (AISC 360-16
    /// Commentary, Appendix 7, Section 7.2, the adjustments for girders
    /// whose far ends differ from the chart's assumptions; recalled from
    /// memory, common practice): braced frame, far end pinned 1.5, fixed
    /// 2.0; sway frame, far end pinned 0.5, fixed 2/3.
    pub fn factor(self, sway: bool) -> f64 {
        match (self, sway) {
            (FarEnd::AsCharted, _) => 1.0,
            (FarEnd::Pinned, false) => 1.5,
            (FarEnd::Fixed, false) => 2.0,
            (FarEnd::Pinned, true) => 0.5,
            (FarEnd::Fixed, true) => 2.0 / 3.0,
        }
    }
}

/// G recommended for a column end at a base without beams (AISC 360-16
/// Commentary, Appendix 7, Section 7.2; recalled from memory): a pinned
/// base is taken as 10 (not infinite, since no pin is frictionless) ...
pub const G_PINNED_BASE: f64 = 10.0;
/// ... and a fixed base as 1.0 (not 0, since no base is perfectly rigid).
pub const G_FIXED_BASE: f64 = 1.0;

/// A member framing into a joint: its second moment about the axis of
/// bending in the frame's plane, mm4, and its length, mm.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Stiffness {
    /// I, mm4.
    pub i_mm4: f64,
    /// Length, mm.
    pub length_mm: f64,
}

/// A beam framing into a joint, with how its far end is held.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Beam {
    /// Its I and length.
    pub member: Stiffness,
    /// Its far end.
    pub far_end: FarEnd,
}

/// G at a joint and its two sums, for the working.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct JointG {
    /// sum(I/L) of the columns, mm3.
    pub columns: f64,
    /// sum(factor I/L) of the beams, mm3.
    pub beams: f64,
    /// G = columns / beams.
    pub g: f64,
}

fn stiffness(m: &Stiffness, field: &'static str) -> Result<f64> {
    for (v, what) in [(m.i_mm4, "I"), (m.length_mm, "length")] {
        if !(v.is_finite() && v > 0.0) {
            return Err(Error::Geometry {
                field,
                reason: format!("{what} must be a number greater than zero (got {v})"),
            });
        }
    }
    Ok(m.i_mm4 / m.length_mm)
}

/// G = sum(EI/L) of the columns over sum(m EI/L) of the beams at a joint,
/// m the far-end factor of each beam ([`FarEnd::factor`]), all of one E
/// (so E cancels). `field` names the frame key's G (`frame_major.g_a`,
/// ...) in errors. Refused: no column, no beam (a base: use
/// [`G_PINNED_BASE`] or [`G_FIXED_BASE`]), a member without a positive
/// finite I or length.
pub fn joint_g(
    columns: &[Stiffness],
    beams: &[Beam],
    sway: bool,
    field: &'static str,
) -> Result<JointG> {
    if columns.is_empty() || beams.is_empty() {
        return Err(Error::Geometry {
            field,
            reason: "G needs at least one column and one beam at the joint; at a base without \
                     beams take G = 10 (pinned) or 1.0 (fixed)"
                .into(),
        });
    }
    let mut c = 0.0;
    for m in columns {
        c += stiffness(m, field)?;
    }
    let mut b = 0.0;
    for beam in beams {
        b += beam.far_end.factor(sway) * stiffness(&beam.member, field)?;
    }
    Ok(JointG {
        columns: c,
        beams: b,
        g: c / b,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    fn k(sway: bool, g_a: f64, g_b: f64) -> f64 {
        k_factor(&Frame { sway, g_a, g_b }, FrameKey::Major).unwrap()
    }

    /// The published equations as printed (with tan), evaluated at k.
    fn printed(sway: bool, g_a: f64, g_b: f64, k: f64) -> f64 {
        let x = std::f64::consts::PI / k;
        if sway {
            (g_a * g_b * x * x - 36.0) / (6.0 * (g_a + g_b)) - x / crate::trig::tan(x)
        } else {
            g_a * g_b / 4.0 * x * x
                + (g_a + g_b) / 2.0 * (1.0 - x / crate::trig::tan(x))
                + 2.0 * crate::trig::tan(x / 2.0) / x
                - 1.0
        }
    }

    #[test]
    fn roots_satisfy_the_printed_equations() {
        for sway in [false, true] {
            for g_a in [0.1, 0.5, 1.0, 2.0, 5.0, 20.0] {
                for g_b in [0.2, 1.0, 3.0, 50.0] {
                    let kk = k(sway, g_a, g_b);
                    let r = printed(sway, g_a, g_b, kk);
                    assert!(
                        r.abs() < 1e-9,
                        "sway {sway}, G {g_a} {g_b}: k {kk}, residual {r}"
                    );
                    if sway {
                        assert!(kk >= 1.0);
                    } else {
                        assert!((0.5..=1.0).contains(&kk));
                    }
                }
            }
        }
    }

    #[test]
    fn limits_fixed_and_pinned() {
        let inf = f64::INFINITY;
        assert!((k(false, 0.0, 0.0) - 0.5).abs() < 1e-12);
        assert!((k(false, inf, inf) - 1.0).abs() < 1e-12);
        assert!((k(true, 0.0, 0.0) - 1.0).abs() < 1e-12);
        assert!((k(true, 0.0, inf) - 2.0).abs() < 1e-12);
        // Fixed-pinned braced: tan x = x, x = 4.493409457909064.
        assert!((k(false, 0.0, inf) - std::f64::consts::PI / 4.493409457909064).abs() < 1e-12);
        // Very large G approaches the pinned values smoothly.
        assert!((k(false, 1e12, 1e12) - 1.0).abs() < 1e-9);
        assert!((k(true, 0.0, 1e12) - 2.0).abs() < 1e-9);
    }

    #[test]
    fn joint_g_sums_and_far_end_factors() {
        let col = Stiffness {
            i_mm4: 1.0e8,
            length_mm: 4000.0,
        };
        let beam = |far_end| Beam {
            member: Stiffness {
                i_mm4: 2.0e8,
                length_mm: 8000.0,
            },
            far_end,
        };
        // Two columns of I/L 25,000 mm3, two beams of 25,000 mm3: G = 1.
        let g = joint_g(&[col, col], &[beam(FarEnd::AsCharted); 2], true, "f").unwrap();
        assert_eq!((g.columns, g.beams, g.g), (50_000.0, 50_000.0, 1.0));
        // Sway, one beam pinned at its far end: 25,000 x 0.5 + 25,000.
        let g = joint_g(
            &[col, col],
            &[beam(FarEnd::Pinned), beam(FarEnd::AsCharted)],
            true,
            "f",
        )
        .unwrap();
        assert!((g.g - 50_000.0 / 37_500.0).abs() < 1e-15);
        // Braced, both fixed at the far end: 2.0 each.
        let g = joint_g(&[col], &[beam(FarEnd::Fixed); 2], false, "f").unwrap();
        assert!((g.g - 0.25).abs() < 1e-15);
        assert_eq!(FarEnd::Pinned.factor(false), 1.5);
        assert!((FarEnd::Fixed.factor(true) - 2.0 / 3.0).abs() < 1e-15);
        let e = joint_g(&[col], &[], true, "frame_major.g_b").unwrap_err();
        assert_eq!(e.field(), Some("frame_major.g_b"));
        let bad = Stiffness {
            i_mm4: 1.0e8,
            length_mm: 0.0,
        };
        assert!(joint_g(&[bad], &[beam(FarEnd::Fixed)], true, "f").is_err());
    }

    #[test]
    fn bad_input_is_refused_naming_the_key() {
        let e = k_factor(
            &Frame {
                sway: true,
                g_a: -1.0,
                g_b: 1.0,
            },
            FrameKey::Minor,
        )
        .unwrap_err();
        assert_eq!(e.field(), Some("frame_minor.g_a"));
        let e = k_factor(
            &Frame {
                sway: false,
                g_a: 1.0,
                g_b: f64::NAN,
            },
            FrameKey::Major,
        )
        .unwrap_err();
        assert_eq!(e.field(), Some("frame_major.g_b"));
        let e = k_factor(
            &Frame {
                sway: true,
                g_a: f64::INFINITY,
                g_b: f64::INFINITY,
            },
            FrameKey::Major,
        )
        .unwrap_err();
        assert_eq!(e.field(), Some("frame_major"));
    }
}
