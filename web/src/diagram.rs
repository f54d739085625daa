//! The moment diagram the editor understood, drawn as SVG text (no chart
//! library: a polyline per axis), so a sign slip in the end or span
//! moments is visible before it matters. Values come from the engine's
//! [`Moments::at`]; the drawing only scales them.

use std::fmt::Write as _;

use strutline_core::member::{Member, Moments};
use strutline_core::units::UnitSystem;

use crate::html;
use crate::html::Html;
use crate::units_view::step_text;

/// Points along the member drawn per axis.
const SAMPLES: usize = 40;

/// The SVG of both axes' diagrams (empty when the member has no moment).
pub fn svg(member: &Member, sys: UnitSystem) -> Html {
    let mut h = Html::new();
    if !member.has_moments() {
        return h;
    }
    let axes = [
        ("major", member.moments_major()),
        ("minor", member.moments_minor()),
    ];
    h.lit(
        "<div class=\"moment-diagrams\" data-testid=\"moment-diagram\" role=\"img\" \
         aria-label=\"Bending-moment diagrams as understood\">",
    );
    for (name, m) in axes {
        if m.is_zero() {
            continue;
        }
        one(&mut h, name, &m, sys);
    }
    h.lit("</div>");
    h
}

/// Which side of the axis line the drawn diagram lies on, read from the
/// drawn points themselves (their heights as written into the SVG), so what
/// the page says about the sign is what it shows.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Sense {
    /// Some point is drawn above the line (a positive moment).
    pub above: bool,
    /// Some point is drawn below the line (a negative moment).
    pub below: bool,
    /// How often the drawn line crosses from one side to the other.
    pub changes: usize,
}

impl Sense {
    /// `"single"` (one side only), `"double"` (both sides: the moment
    /// changes sign along the member, bending it in double curvature) or
    /// `"none"` (on the line throughout).
    pub fn curvature(&self) -> &'static str {
        match (self.above, self.below) {
            (true, true) => "double",
            (false, false) => "none",
            _ => "single",
        }
    }

    /// `"positive"`, `"negative"`, `"both"` or `"none"`.
    pub fn sign(&self) -> &'static str {
        match (self.above, self.below) {
            (true, true) => "both",
            (true, false) => "positive",
            (false, true) => "negative",
            (false, false) => "none",
        }
    }
}

/// The sense of drawn heights `ys` (SVG y grows downwards) about `mid`.
pub fn sense(ys: &[f64], mid: f64) -> Sense {
    let mut s = Sense {
        above: false,
        below: false,
        changes: 0,
    };
    let mut last = 0i8;
    for &y in ys {
        let side = if y < mid {
            1
        } else if y > mid {
            -1
        } else {
            0
        };
        if side == 0 {
            continue;
        }
        s.above |= side > 0;
        s.below |= side < 0;
        if last != 0 && side != last {
            s.changes += 1;
        }
        last = side;
    }
    s
}

fn one(h: &mut Html, name: &str, m: &Moments, sys: UnitSystem) {
    let (w, ht, pad) = (300.0, 90.0, 10.0);
    let peak = m.max_abs_knm().max(f64::MIN_POSITIVE);
    let mid = ht / 2.0;
    // The heights as drawn: rounded to the 0.1 written into the SVG.
    let y = |v: f64| ((mid - v / peak * (mid - pad)) * 10.0).round() / 10.0;
    let ys: Vec<f64> = (0..=SAMPLES)
        .map(|i| y(m.at(i as f64 / SAMPLES as f64)))
        .collect();
    // Digits, points, commas and spaces only.
    let mut pts = format!("{pad},{mid} ");
    for (i, yi) in ys.iter().enumerate() {
        let s = i as f64 / SAMPLES as f64;
        let _ = write!(pts, "{:.1},{:.1} ", pad + s * (w - 2.0 * pad), yi);
    }
    let _ = write!(pts, "{},{mid}", w - pad);
    let sense = sense(&ys, mid);
    let words = match sense.curvature() {
        "double" => "double curvature: the moment changes sign along the member",
        "single" if sense.above => "single curvature: positive throughout, drawn above the line",
        "single" => "single curvature: negative throughout, drawn below the line",
        _ => "no moment",
    };
    html!(
        h,
        "<figure class=\"moment-diagram\" data-axis=\"{}\" data-curvature=\"{}\" \
         data-sign=\"{}\" data-sign-changes=\"{}\"><svg viewBox=\"0 0 {} {}\" width=\"100%\" \
         preserveAspectRatio=\"none\"><line x1=\"{}\" y1=\"{}\" x2=\"{}\" y2=\"{}\" \
         stroke=\"currentColor\" stroke-width=\"1\"/><polygon points=\"{}\" \
         fill=\"currentColor\" fill-opacity=\"0.15\" stroke=\"currentColor\" stroke-width=\"1.5\"/>\
         </svg><figcaption>{} axis: M_a {}, M_b {}, largest {}; positive drawn up; {}</figcaption></figure>",
        name,
        sense.curvature(),
        sense.sign(),
        sense.changes,
        w,
        ht,
        pad,
        mid,
        w - pad,
        mid,
        pts,
        name,
        step_text(sys, "kNm", m.a_knm),
        step_text(sys, "kNm", m.b_knm),
        step_text(sys, "kNm", m.max_abs_knm()),
        words
    );
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo;

    #[test]
    fn draws_only_axes_with_moments_and_scales_to_the_peak() {
        let mut m = demo::sample_member("B1");
        assert_eq!(svg(&m, UnitSystem::Si).as_str(), "");
        m.m_major_a_knm = 10.0;
        m.m_major_b_knm = -10.0;
        let h = svg(&m, UnitSystem::Si).into_string();
        assert!(h.contains("major axis") && !h.contains("minor axis"), "{h}");
        // End A at the top edge (pad 10), end B at the bottom (80).
        assert!(h.contains("10.0,10.0 ") && h.contains("290.0,80.0 "), "{h}");
        assert!(
            h.contains("data-curvature=\"double\"") && h.contains("data-sign-changes=\"1\""),
            "{h}"
        );
        m.m_minor_span_knm = 3.0;
        assert!(svg(&m, UnitSystem::Us).as_str().contains("minor axis"));
    }

    #[test]
    fn the_sense_is_read_from_the_drawn_heights() {
        let mut m = demo::sample_member("B2");
        // Both ends sagging: single curvature, drawn above the line.
        m.m_major_a_knm = 10.0;
        m.m_major_b_knm = 4.0;
        let h = svg(&m, UnitSystem::Si).into_string();
        assert!(
            h.contains("data-curvature=\"single\" data-sign=\"positive\" data-sign-changes=\"0\""),
            "{h}"
        );
        assert!(h.contains("single curvature: positive throughout"), "{h}");
        // One end flipped: the line crosses once.
        m.m_major_b_knm = -4.0;
        let h = svg(&m, UnitSystem::Si).into_string();
        assert!(
            h.contains("data-curvature=\"double\" data-sign=\"both\" data-sign-changes=\"1\""),
            "{h}"
        );
        // Hogging ends, sagging span: crosses twice.
        m.m_major_a_knm = -8.0;
        m.m_major_b_knm = -8.0;
        m.m_major_span_knm = 20.0;
        let h = svg(&m, UnitSystem::Si).into_string();
        assert!(h.contains("data-sign-changes=\"2\""), "{h}");
        // Points on the line count for neither side.
        let s = sense(&[45.0, 40.0, 45.0, 50.0], 45.0);
        assert_eq!((s.above, s.below, s.changes), (true, true, 1));
        assert_eq!(sense(&[45.0, 45.0], 45.0).curvature(), "none");
    }
}
