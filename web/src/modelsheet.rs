//! The calc sheet's part on buckling lengths from the real member: a
//! column in a frame (per axis: sway or braced, G_A, G_B and the k the
//! alignment-chart equations give, with k·L), and a buckling model (its
//! segments with their sections, end supports about each axis, braces,
//! axial loads and the line load, the column drawn to scale with its
//! buckled shape about each axis by the column-model panel's own drawing
//! ([`crate::chart::column`], as a PNG), alpha_cr, the element count and the
//! convergence of each axis, and the buckling lengths it implies). The
//! engineering is core's; this module only words it.

use strutline_core::buckling::model::{BucklingModel, RestraintAxis};
use strutline_core::buckling::{chart, Fixity};
use strutline_core::check::buckle::MemberBuckle;
use strutline_core::units::{self, UnitSystem};
use strutline_core::{CheckResult, Member};

use crate::chart::column::{of_member, png};
use crate::html;
use crate::html::Html;
use crate::numtext::fixed;
use crate::units_view::{result_text, section_text, span_text};

/// Width and height of the drawing on the sheet, CSS px.
const DRAWING: (u32, u32) = (560, 420);

/// How a degree of freedom is held, in words, a spring's stiffness in the
/// units of `key` (`spring_kn_per_mm`, `spring_knm_per_rad`).
pub fn hold_words(f: Fixity, key: &str, sys: UnitSystem) -> String {
    match f {
        Fixity::Fixed => "held".into(),
        Fixity::Free => "free".into(),
        Fixity::Spring(k) => {
            let (v, u) = units::key_to_display(sys, key, k);
            format!("spring {} {u}", units::format_display(v, 4))
        }
    }
}

/// The part of the sheet for `m` (empty when it has neither frame keys
/// nor a model); `result` is its check, for the governing segment.
pub fn html(m: &Member, result: Option<&CheckResult>, sys: UnitSystem) -> Html {
    let mut h = Html::new();
    frames(&mut h, m, sys);
    if let Some(model) = &m.buckling_model {
        model_html(&mut h, m, model, result, sys);
    }
    h
}

fn frames(h: &mut Html, m: &Member, sys: UnitSystem) {
    let axes = [
        ("major", m.frame_major, chart::FrameKey::Major),
        ("minor", m.frame_minor, chart::FrameKey::Minor),
    ];
    if axes.iter().all(|(_, f, _)| f.is_none()) {
        return;
    }
    h.lit(
        "<h3>Column in a frame</h3><div class=\"table-wrap\"><table class=\"sheet-model\" \
         data-testid=\"sheet-frames\"><caption>k from the alignment-chart equations \
         (AISC 360-16 Commentary C-A-7), solved exactly</caption><thead><tr>\
         <th scope=\"col\">axis</th><th scope=\"col\">frame</th><th scope=\"col\">G_A</th>\
         <th scope=\"col\">G_B</th><th scope=\"col\">k</th><th scope=\"col\">L_cr = k·L</th>\
         </tr></thead><tbody>",
    );
    for (name, frame, which) in axes {
        let Some(f) = frame else { continue };
        let (k, l) = match chart::k_factor(&f, which) {
            Ok(k) => (fixed(k, 3), span_text(sys, k * m.length_mm)),
            Err(e) => (crate::fields::error_text(&e), "—".into()),
        };
        html!(
            h,
            "<tr><th scope=\"row\">{}</th><td>{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td>\
             <td class=\"num\">{}</td><td class=\"num\">{}</td></tr>",
            name,
            if f.sway {
                "sway (sidesway uninhibited)"
            } else {
                "braced (sidesway inhibited)"
            },
            units::format_display(f.g_a, 4),
            units::format_display(f.g_b, 4),
            k,
            l
        );
    }
    h.lit("</tbody></table></div>");
}

fn table_head(h: &mut Html, testid: &'static str, caption: &'static str, cols: &[&str]) {
    html!(
        h,
        "<div class=\"table-wrap\"><table class=\"sheet-model\" data-testid=\"{}\"><caption>{}</caption><thead><tr>",
        testid,
        caption
    );
    for c in cols {
        html!(h, "<th scope=\"col\">{}</th>", *c);
    }
    h.lit("</tr></thead><tbody>");
}

fn model_html(
    h: &mut Html,
    m: &Member,
    model: &BucklingModel,
    result: Option<&CheckResult>,
    sys: UnitSystem,
) {
    h.lit("<h3>Elastic buckling model</h3>");
    // Segments.
    table_head(
        h,
        "sheet-model-segments",
        "Segments, end A (foot) to end B (top)",
        &["segment", "from end A", "to", "section"],
    );
    let mut from = 0.0;
    for (i, s) in crate::modelform::segments(model, m.length_mm)
        .iter()
        .enumerate()
    {
        let section = match &s.section {
            None => format!("the member's: {}", section_text(sys, &m.section)),
            Some(spec) => section_text(sys, spec),
        };
        html!(
            h,
            "<tr><th scope=\"row\">{}</th><td class=\"num\">{}</td><td class=\"num\">{}</td><td>{}</td></tr>",
            i + 1,
            span_text(sys, from),
            span_text(sys, from + s.length_mm),
            section
        );
        from += s.length_mm;
    }
    h.lit("</tbody></table></div>");
    // End supports.
    table_head(
        h,
        "sheet-model-ends",
        "End supports",
        &["end", "axis", "sideways", "turning"],
    );
    for (end, e) in [("A (foot)", model.ends.a), ("B (top)", model.ends.b)] {
        for (axis, s) in [("major", e.major), ("minor", e.minor)] {
            html!(
                h,
                "<tr><th scope=\"row\">{}</th><td>{}</td><td>{}</td><td>{}</td></tr>",
                end,
                axis,
                hold_words(s.translation, "spring_kn_per_mm", sys),
                hold_words(s.rotation, "spring_knm_per_rad", sys)
            );
        }
    }
    h.lit("</tbody></table></div>");
    if !model.restraints.is_empty() {
        table_head(
            h,
            "sheet-model-braces",
            "Braces along the column",
            &["brace", "from end A", "holds", "sideways"],
        );
        for (i, r) in model.restraints.iter().enumerate() {
            html!(
                h,
                "<tr><th scope=\"row\">{}</th><td class=\"num\">{}</td><td>{}</td><td>{}</td></tr>",
                i + 1,
                span_text(sys, r.at_mm),
                match r.axis {
                    RestraintAxis::Major => "major-axis buckling",
                    RestraintAxis::Minor => "minor-axis buckling",
                    RestraintAxis::Both => "both axes",
                },
                hold_words(r.translation, "spring_kn_per_mm", sys)
            );
        }
        h.lit("</tbody></table></div>");
    }
    table_head(
        h,
        "sheet-model-loads",
        "Axial loads (compression, carried to end A)",
        &["load", "from end A", "compression"],
    );
    if !model.carries_own_loads() {
        html!(
            h,
            "<tr><th scope=\"row\">N_Ed</th><td class=\"num\">{}</td><td class=\"num\">{}</td></tr>",
            span_text(sys, m.length_mm),
            result_text(sys, "kN", m.axial_kn, 1)
        );
    }
    for (i, p) in model.axial_loads.iter().enumerate() {
        html!(
            h,
            "<tr><th scope=\"row\">{}</th><td class=\"num\">{}</td><td class=\"num\">{}</td></tr>",
            i + 1,
            span_text(sys, p.at_mm),
            result_text(sys, "kN", p.axial_kn, 1)
        );
    }
    if model.distributed_kn_per_m != 0.0 {
        let (v, u) = units::key_to_display(sys, "distributed_kn_per_m", model.distributed_kn_per_m);
        html!(
            h,
            "<tr><th scope=\"row\">q</th><td>along the length</td><td class=\"num\">{} {}</td></tr>",
            units::format_display(v, 4),
            u
        );
    }
    h.lit("</tbody></table></div>");
    // The drawing and the analysis.
    // An unchecked member's load may stand in for one not given: none drawn.
    let Some(a) = of_member(m, sys, result.is_some()) else {
        return;
    };
    h.lit("<figure class=\"sheet-column\" data-testid=\"sheet-column\">");
    match png(&a.sketch, DRAWING.0, DRAWING.1, 2.0) {
        Ok((url, shapes)) => html!(
            h,
            "<img src=\"{}\" width=\"{}\" height=\"{}\" data-shapes=\"{}\" \
             alt=\"The column to scale about each axis with its supports, braces, loads and buckled shape\">",
            url,
            DRAWING.0,
            DRAWING.1,
            shapes
        ),
        Err(e) => html!(h, "<p class=\"verdict-error\">{}</p>", e),
    }
    h.lit("<figcaption>The column to scale along its length (widths by the fourth root of I), its buckled shape about each axis, largest deflection drawn alike.</figcaption></figure>");
    match &a.result {
        Ok(b) => analysis(h, b, result, sys),
        Err(e) => html!(
            h,
            "<p class=\"verdict-error\" data-testid=\"sheet-model-refused\">{}</p>",
            e
        ),
    }
}

fn analysis(h: &mut Html, b: &MemberBuckle, result: Option<&CheckResult>, sys: UnitSystem) {
    table_head(
        h,
        "sheet-model-analysis",
        "Elastic critical load analysis (beam finite elements with geometric stiffness)",
        &[
            "axis",
            "α_cr",
            "N_cr",
            "elements",
            "α_cr, half as many",
            "change",
            "L_cr of each segment from end A",
        ],
    );
    for (name, x) in [("major", &b.major), ("minor", &b.minor)] {
        let change = if x.load_factor != 0.0 {
            ((x.load_factor - x.load_factor_half) / x.load_factor).abs()
        } else {
            0.0
        };
        let lengths: Vec<String> = x
            .segments
            .iter()
            .map(|s| {
                s.buckling_length_mm
                    .map_or_else(|| "— (not compressed)".into(), |l| span_text(sys, l))
            })
            .collect();
        html!(
            h,
            "<tr><th scope=\"row\">{}</th><td class=\"num\">{}</td><td class=\"num\">{}</td>\
             <td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td><td>{}</td></tr>",
            name,
            fixed(x.load_factor, 4),
            result_text(sys, "kN", x.critical_kn, 1),
            x.elements,
            fixed(x.load_factor_half, 4),
            format!("{change:.1e}"),
            lengths.join(", ")
        );
    }
    h.lit("</tbody></table></div>");
    html!(
        h,
        "<p class=\"hint\">Converged when α_cr changes by at most {} from half as many elements. \
         N_cr is α_cr times the largest compression of the load pattern; each segment's L_cr is \
         π·√(E·I / (α_cr·N)) with its own E·I and largest compression N, and the check takes each \
         segment at its own force and these lengths.",
        format!("{:.0e}", strutline_core::buckling::column::CONVERGED)
    );
    if let Some(s) = result.and_then(|r| r.segment.map(|s| (r, s))) {
        html!(
            h,
            " Segment {} of {} governs, at N_Ed = {}.",
            s.1.index,
            s.1.count,
            result_text(sys, "kN", s.0.axial_kn, 1)
        );
    }
    h.lit("</p>");
}

#[cfg(test)]
mod tests {
    use super::*;

    use crate::chart::column::tests::stepped_column as crane_column;

    #[test]
    fn the_model_is_printed_with_its_drawing_and_analysis() {
        let m = crane_column();
        let r = strutline_core::check_member(&m).unwrap();
        let b = strutline_core::check::buckle::buckle(&m).unwrap().unwrap();
        let h = html(&m, Some(&r), UnitSystem::Si).into_string();
        for id in [
            "sheet-model-segments",
            "sheet-model-ends",
            "sheet-model-braces",
            "sheet-model-loads",
            "sheet-column",
            "sheet-model-analysis",
        ] {
            assert!(h.contains(&format!("data-testid=\"{id}\"")), "{id}: {h}");
        }
        // The engine's alpha_cr and elements, per axis.
        for x in [&b.major, &b.minor] {
            assert!(h.contains(&format!(
                "<td class=\"num\">{}</td>",
                fixed(x.load_factor, 4)
            )));
            assert!(h.contains(&format!("<td class=\"num\">{}</td>", x.elements)));
        }
        // The drawing inline, the governing segment named.
        // The drawing's place (the PNG is drawn only in a browser).
        assert!(h.contains("drawn only in a browser"), "{h}");
        let s = r.segment.unwrap();
        assert!(
            h.contains(&format!("Segment {} of {} governs", s.index, s.count)),
            "{h}"
        );
        // The minor-axis brace as a spring, in kN/mm; in US units in kip/in.
        let spring = match m.buckling_model.as_ref().unwrap().restraints[0].translation {
            Fixity::Spring(k) => k,
            other => panic!("{other:?}"),
        };
        assert!(
            h.contains(&format!(
                "spring {} kN/mm",
                units::format_display(spring, 4)
            )),
            "{h}"
        );
        let us = html(&m, Some(&r), UnitSystem::Us).into_string();
        let kip_in = spring / units::KN_PER_MM_PER_KIP_PER_IN;
        assert!(
            us.contains(&format!(
                "spring {} kip/in",
                units::format_display(kip_in, 4)
            )),
            "{us}"
        );
        assert!(!us.contains("kN"), "{us}");
    }

    #[test]
    fn frames_print_g_and_k_and_nothing_prints_without_either() {
        let mut m = crane_column();
        m.buckling_model = None;
        assert!(html(&m, None, UnitSystem::Si).is_empty());
        m.frame_major = Some(chart::Frame {
            sway: true,
            g_a: 1.0,
            g_b: 1.0,
        });
        let h = html(&m, None, UnitSystem::Si).into_string();
        // Sway frame, G_A = G_B = 1: k = 1.3173 (the alignment-chart
        // equation's root, as core's reference tests give it).
        let k = chart::k_factor(&m.frame_major.unwrap(), chart::FrameKey::Major).unwrap();
        assert!((k - 1.317_275).abs() < 1e-5, "{k}");
        assert!(
            h.contains("sway (sidesway uninhibited)") && h.contains(&fixed(k, 3)),
            "{h}"
        );
        assert!(!h.contains("<th scope=\"row\">minor</th>"));
    }

    #[test]
    fn holds_in_words() {
        assert_eq!(
            hold_words(Fixity::Fixed, "spring_kn_per_mm", UnitSystem::Us),
            "held"
        );
        assert_eq!(
            hold_words(Fixity::Free, "spring_kn_per_mm", UnitSystem::Si),
            "free"
        );
        assert_eq!(
            hold_words(Fixity::Spring(2000.0), "spring_knm_per_rad", UnitSystem::Si),
            "spring 2000 kN·m/rad"
        );
        // 1355.817948 kN·m/rad = 1000 kip·ft/rad.
        assert_eq!(
            hold_words(
                Fixity::Spring(1_355.817_948_331_400_4),
                "spring_knm_per_rad",
                UnitSystem::Us
            ),
            "spring 1000 kip·ft/rad"
        );
    }
}
