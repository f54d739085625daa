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

fn one(h: &mut Html, name: &str, m: &Moments, sys: UnitSystem) {
    let (w, ht, pad) = (300.0, 90.0, 10.0);
    let peak = m.max_abs_knm().max(f64::MIN_POSITIVE);
    let mid = ht / 2.0;
    let y = |v: f64| mid - v / peak * (mid - pad);
    // Digits, points, commas and spaces only.
    let mut pts = format!("{pad},{mid} ");
    for i in 0..=SAMPLES {
        let s = i as f64 / SAMPLES as f64;
        let _ = write!(pts, "{:.1},{:.1} ", pad + s * (w - 2.0 * pad), y(m.at(s)));
    }
    let _ = write!(pts, "{},{mid}", w - pad);
    html!(
        h,
        "<figure class=\"moment-diagram\"><svg viewBox=\"0 0 {} {}\" width=\"100%\" \
         preserveAspectRatio=\"none\"><line x1=\"{}\" y1=\"{}\" x2=\"{}\" y2=\"{}\" \
         stroke=\"currentColor\" stroke-width=\"1\"/><polygon points=\"{}\" \
         fill=\"currentColor\" fill-opacity=\"0.15\" stroke=\"currentColor\" stroke-width=\"1.5\"/>\
         </svg><figcaption>{} axis: M_a {}, M_b {}, largest {}; positive drawn up</figcaption></figure>",
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
        step_text(sys, "kNm", m.max_abs_knm())
    );
}

#[cfg(test)]
mod tests {
    #![allow(clippy::unwrap_used, clippy::indexing_slicing)]
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
        m.m_minor_span_knm = 3.0;
        assert!(svg(&m, UnitSystem::Us).as_str().contains("minor axis"));
    }
}
