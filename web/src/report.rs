//! The result, its working and the calc sheet as HTML text.
//!
//! These parts only show values, so they are built as text and set as one
//! element's content: the app then carries one small view for each of
//! them rather than compiled code for every row and cell. Everything that
//! comes from the person or a file (ids, notes, designations) goes through
//! [`esc`], so imported text is shown as text, never read as markup.
//! Values are shown in the chosen unit system ([`crate::units_view`]); the
//! engine's values stay as computed.

use std::fmt::Write;

use strutline_core::check::Prepared;
use strutline_core::compare::{self, Outcome};
use strutline_core::solve::{self, LengthAnswer, LengthLimit};
use strutline_core::trace::Scope;
use strutline_core::units::UnitSystem;
use strutline_core::{CheckResult, CAUTION};

use crate::checks::Checked;
use crate::fields;
use crate::numtext::{fixed, working};
use crate::status::{governing_text, status_text, utilisation_text, Standing};
use crate::units_view::{result_text, step_text};

/// Text made safe for HTML content and quoted attributes.
pub fn esc(s: &str) -> String {
    let mut out = String::with_capacity(s.len());
    for c in s.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&#39;"),
            c => out.push(c),
        }
    }
    out
}

/// The heading of a part of the working.
pub fn scope_title(s: Scope) -> &'static str {
    match s {
        Scope::Member => "Member",
        Scope::Section => "Cross-section",
        Scope::Major => "Major axis",
        Scope::Minor => "Minor axis",
        Scope::Torsional => "Torsional",
        Scope::FlexuralTorsional => "Flexural-torsional",
        Scope::BendingMajor => "Bending, major axis",
        Scope::BendingMinor => "Bending, minor axis",
    }
}

/// The parts of the working in the order they are shown.
const SCOPES: [Scope; 8] = [
    Scope::Member,
    Scope::Section,
    Scope::Major,
    Scope::Minor,
    Scope::Torsional,
    Scope::FlexuralTorsional,
    Scope::BendingMajor,
    Scope::BendingMinor,
];

/// The verdict of one member: status, utilisation, resistance, load,
/// governing mode and method, then its warnings; or what stops the check.
pub fn verdict_html(c: &Checked, sys: UnitSystem) -> String {
    let standing = Standing::of(&c.outcome);
    let mut h = format!(
        "<div class=\"verdict {}\" role=\"status\"><p class=\"verdict-status\">{}</p>",
        standing.class(),
        status_text(&c.outcome)
    );
    let dash = "<span data-testid=\"result-utilisation\">—</span>";
    match &c.outcome {
        Err(e) => {
            let _ = write!(
                h,
                "<p class=\"verdict-error\">{}</p><dl class=\"verdict-numbers\">\
                 <dt>utilisation</dt><dd>{dash}</dd>\
                 <dt>resistance</dt><dd><span data-testid=\"result-resistance\">—</span></dd>\
                 <dt>governs</dt><dd data-testid=\"result-governing\">—</dd></dl></div>",
                esc(&fields::error_text(e))
            );
        }
        Ok(r) => {
            let rd_text = result_text(sys, "kN", r.resistance_kn, 1);
            let (rd, ru) = split_unit(&rd_text);
            let _ = write!(
                h,
                "<dl class=\"verdict-numbers\">\
                 <dt>utilisation {}</dt><dd><span data-testid=\"result-utilisation\">{}</span></dd>\
                 <dt>resistance N_Rd</dt><dd><span data-testid=\"result-resistance\">{rd}</span> {ru}</dd>\
                 <dt>design load N_Ed</dt><dd>{}</dd>\
                 <dt>governs</dt><dd data-testid=\"result-governing\">{}</dd>\
                 <dt>method</dt><dd>{}</dd></dl></div>",
                if r.bending.is_some() {
                    "(largest)"
                } else {
                    "N_Ed / N_Rd"
                },
                fixed(r.utilisation, 3),
                result_text(sys, "kN", c.member.axial_kn, 1),
                governing_text(r),
                r.method.title(),
            );
            if let Some(b) = &r.bending {
                h.push_str(&bending_html(b, sys));
            }
            h.push_str(&warnings_html(r));
        }
    }
    h
}

/// The bending side of a result: per axis the largest design moment, the
/// design resistance, the elastic critical moment, the reduction and the
/// moment factor (a dash where none applies).
pub fn bending_html(b: &strutline_core::bending::Bending, sys: UnitSystem) -> String {
    let mut h = format!(
        "<div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Bending\">\
         <table class=\"modes\" data-testid=\"bending\"><caption>Bending</caption><thead><tr>\
         <th scope=\"col\">axis</th><th scope=\"col\">M_Ed ({u})</th><th scope=\"col\">M_Rd ({u})</th>\
         <th scope=\"col\">M_cr ({u})</th><th scope=\"col\">reduction</th>\
         <th scope=\"col\">moment factor</th><th scope=\"col\">utilisation</th></tr></thead><tbody>",
        u = head_unit(sys, "kNm"),
    );
    for (name, a) in [("major", &b.major), ("minor", &b.minor)] {
        let _ = write!(
            h,
            "<tr><th scope=\"row\">{name}</th>{}{}{}<td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td></tr>",
            cell(sys, "kNm", a.demand_knm),
            cell(sys, "kNm", a.resistance_knm),
            a.critical_knm
                .map(|v| cell(sys, "kNm", v))
                .unwrap_or_else(|| "<td class=\"num\">—</td>".into()),
            working(a.reduction),
            a.moment_factor.map(working).unwrap_or_else(|| "—".into()),
            fixed(a.utilisation(), 3),
        );
    }
    h.push_str("</tbody></table></div>");
    h
}

/// "12.3 kN" as ("12.3", "kN").
fn split_unit(s: &str) -> (&str, &str) {
    s.split_once(' ').unwrap_or((s, ""))
}

/// The warnings of a result as a list (empty text when there are none).
pub fn warnings_html(r: &CheckResult) -> String {
    if r.warnings.is_empty() {
        return String::new();
    }
    let mut h = String::from("<ul class=\"warnings\" data-testid=\"warnings\">");
    for w in &r.warnings {
        let _ = write!(h, "<li>⚠ {} <code>{}</code></li>", esc(&w.message), w.code);
    }
    h.push_str("</ul>");
    h
}

/// A table cell with a value converted for display, unit in the header.
fn cell(sys: UnitSystem, unit: &'static str, v: f64) -> String {
    let t = step_text(sys, unit, v);
    format!("<td class=\"num\">{}</td>", split_unit(&t).0)
}

/// The unit a column of the modes table is headed with.
fn head_unit(sys: UnitSystem, unit: &'static str) -> &'static str {
    crate::units_view::shown(sys, unit, 1.0, false).1
}

/// Every mode checked, the governing one marked, then each part of the
/// working with its symbol, meaning, value and unit, and clause.
pub fn working_html(r: &CheckResult, sys: UnitSystem) -> String {
    let mut h = format!(
        "<div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Modes checked\">\
         <table class=\"modes\"><caption>Modes checked</caption><thead><tr>\
         <th scope=\"col\">mode</th><th scope=\"col\">L_cr ({})</th><th scope=\"col\">L_cr/i</th>\
         <th scope=\"col\">N_cr ({})</th><th scope=\"col\">λ̄</th><th scope=\"col\">reduction</th>\
         <th scope=\"col\">N_Rd ({})</th></tr></thead><tbody>",
        head_unit(sys, "mm"),
        head_unit(sys, "kN"),
        head_unit(sys, "kN"),
    );
    for m in &r.modes {
        let gov = m.mode == r.governing;
        let _ = write!(
            h,
            "<tr{}><th scope=\"row\">{}{}</th>{}<td class=\"num\">{}</td>{}<td class=\"num\">{}</td><td class=\"num\">{}</td>{}</tr>",
            if gov { " class=\"governs\"" } else { "" },
            m.mode.key(),
            if gov { " ◀ governs" } else { "" },
            cell(sys, "mm", m.buckling_length_mm),
            working(m.slenderness),
            cell(sys, "kN", m.critical_kn),
            working(m.relative_slenderness),
            working(m.reduction),
            cell(sys, "kN", m.resistance_kn),
        );
    }
    h.push_str("</tbody></table></div><h3 class=\"sub-title\">Working</h3>");
    for s in SCOPES {
        let mut rows = String::new();
        for st in r.trace.iter().filter(|t| t.scope == s) {
            let _ = write!(
                rows,
                "<tr><th scope=\"row\"><code>{}</code></th><td>{}</td><td class=\"num\">{}</td><td class=\"clause\">{}</td></tr>",
                esc(st.symbol.as_str()),
                esc(st.label.as_str()),
                step_text(sys, st.unit(), st.value),
                esc(st.clause.as_str()),
            );
        }
        if rows.is_empty() {
            continue;
        }
        let title = scope_title(s);
        let _ = write!(
            h,
            "<details class=\"working\" open><summary>{title}</summary>\
             <div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Working: {title}\"><table>\
             <thead><tr><th scope=\"col\">symbol</th><th scope=\"col\">meaning</th><th scope=\"col\">value</th>\
             <th scope=\"col\">from</th></tr></thead><tbody>{rows}</tbody></table></div></details>"
        );
    }
    h
}

/// What-if answers for the member: every method side by side (resistance,
/// utilisation, governing mode, or why it does not apply), the longest
/// buckling length that still carries the design load and the largest
/// load at the member's own length, all worked by the engine
/// ([`strutline_core::compare`], [`strutline_core::solve`]).
pub fn whatif_html(p: &Prepared, sys: UnitSystem) -> String {
    let mut h = String::from(
        "<details class=\"whatif\" data-testid=\"whatif\" open><summary>What if</summary>\
         <div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Every method\">\
         <table class=\"compare\"><caption>Every method</caption><thead><tr>\
         <th scope=\"col\">method</th><th scope=\"col\">N_Rd</th><th scope=\"col\">utilisation</th>\
         <th scope=\"col\">governs</th></tr></thead><tbody>",
    );
    for c in compare::compare(p) {
        let mark = if c.own { " class=\"governs\"" } else { "" };
        let _ = match &c.outcome {
            Outcome::Checked {
                resistance_kn,
                utilisation,
                governing,
                ..
            } => write!(
                h,
                "<tr{mark}><th scope=\"row\">{}{}</th><td class=\"num\">{}</td><td class=\"num\">{}</td><td>{}</td></tr>",
                c.title,
                if c.own { " (this member's)" } else { "" },
                result_text(sys, "kN", *resistance_kn, 1),
                fixed(*utilisation, 3),
                governing.key(),
            ),
            Outcome::NotApplicable { reason } | Outcome::Refused { message: reason } => write!(
                h,
                "<tr{mark}><th scope=\"row\">{}</th><td colspan=\"3\">does not apply: {}</td></tr>",
                c.title,
                esc(reason)
            ),
        };
    }
    h.push_str(
        "</tbody></table></div><p class=\"hint\">Every method is given this member's N_Ed: a \
         factored load for the limit-state methods, while AISC ASD expects a service load, so \
         compare resistances rather than utilisations across the two.</p><ul class=\"reverse\">",
    );
    let method = p.member.method;
    let _ = match solve::longest_length(p, method) {
        Ok(LengthAnswer::Found(f)) => write!(
            h,
            "<li data-testid=\"longest-length\">Longest length that still carries N_Ed: <b>{}</b> \
             (L_cr scaled alike: {} / {}; utilisation {}, governs {}{})</li>",
            span_text(sys, f.length_mm),
            span_text(sys, f.lcr_major_mm),
            span_text(sys, f.lcr_minor_mm),
            fixed(f.utilisation, 3),
            f.governing.key(),
            match &f.limit {
                LengthLimit::Load => String::new(),
                LengthLimit::MethodRange { reason } => format!("; the method's range ends there: {}", esc(reason)),
            }
        ),
        Ok(LengthAnswer::NoLength { .. }) => write!(
            h,
            "<li data-testid=\"longest-length\">No length carries N_Ed: the section or material \
             is too weak at any length.</li>"
        ),
        Ok(LengthAnswer::AnyLength { tried_mm, .. }) => write!(
            h,
            "<li data-testid=\"longest-length\">N_Ed is carried up to the longest length tried, {}.</li>",
            span_text(sys, tried_mm)
        ),
        Err(e) => write!(h, "<li>Longest length: {}</li>", esc(&fields::error_text(&e))),
    };
    if let Ok(l) = solve::largest_load(p, method) {
        let _ = write!(
            h,
            "<li data-testid=\"largest-load\">Largest load at this length: <b>{}</b> (governs {}; reserve {})</li>",
            result_text(sys, "kN", l.load_kn, 1),
            l.governing.key(),
            result_text(sys, "kN", l.reserve_kn, 1),
        );
    }
    h.push_str("</ul></details>");
    h
}

/// A member length in the display units (mm in SI, ft in US).
fn span_text(sys: UnitSystem, mm: f64) -> String {
    let (v, u) = crate::units_view::shown(sys, "mm", mm, true);
    format!("{} {u}", working(v))
}

/// The section properties a result reports, as a definition list.
fn properties_html(r: &CheckResult, sys: UnitSystem) -> String {
    let p = &r.section;
    let rows: [(&str, &'static str, f64); 7] = [
        ("A", "mm2", p.area_mm2),
        ("I major", "mm4", p.i_major_mm4),
        ("I minor", "mm4", p.i_minor_mm4),
        ("i major", "mm", p.r_major_mm),
        ("i minor", "mm", p.r_minor_mm),
        ("I_t", "mm4", p.torsion_mm4),
        ("I_w", "mm6", p.warping_mm6),
    ];
    let mut h = String::from("<dl class=\"sheet-props\">");
    for (name, unit, v) in rows {
        let _ = write!(h, "<dt>{name}</dt><dd>{}</dd>", step_text(sys, unit, v));
    }
    let _ = write!(
        h,
        "<dt>f</dt><dd>{}</dd><dt>E</dt><dd>{}</dd></dl>",
        step_text(sys, "MPa", r.strength_mpa),
        step_text(sys, "MPa", r.modulus_mpa)
    );
    h
}

/// The calc sheet of a list: a summary page, then a page for each member
/// with its inputs, section properties, verdict, modes and working,
/// warnings, the envelope of the member it was opened from (`chart`: id,
/// image URL, and the legend's items as the app drew them, its own
/// markup with every text escaped) and the caution on every page.
pub fn sheet_html(
    title: &str,
    date: &str,
    checks: &[std::sync::Arc<Checked>],
    chart: Option<(&str, &str, &str)>,
    sys: UnitSystem,
) -> String {
    let title = esc(title);
    let caution = format!("<p class=\"caution\">⚠ {CAUTION}</p>");
    let mut h = format!(
        "<section class=\"sheet-page\" data-testid=\"sheet-summary\"><h2>Calculation: {title}</h2>\
         <p class=\"sheet-meta\">{date} · {} members · {}</p>\
         <table class=\"sheet-summary\"><thead><tr><th scope=\"col\">member</th><th scope=\"col\">section</th>\
         <th scope=\"col\">method</th><th scope=\"col\">N_Ed</th><th scope=\"col\">N_Rd</th>\
         <th scope=\"col\">utilisation</th><th scope=\"col\">status</th></tr></thead><tbody>",
        checks.len(),
        sys_name(sys),
    );
    for c in checks {
        let rd = c
            .outcome
            .as_ref()
            .map_or("—".into(), |r| result_text(sys, "kN", r.resistance_kn, 1));
        let _ = write!(
            h,
            "<tr><th scope=\"row\">{}</th><td>{}</td><td>{}</td><td class=\"num\">{}</td><td class=\"num\">{rd}</td>\
             <td class=\"num\">{}</td><td>{}</td></tr>",
            esc(&c.member.id),
            esc(&c.member.section.describe()),
            c.member.method.title(),
            result_text(sys, "kN", c.member.axial_kn, 1),
            utilisation_text(&c.outcome),
            status_text(&c.outcome),
        );
    }
    let _ = write!(h, "</tbody></table>{caution}</section>");
    for c in checks {
        let id = esc(&c.member.id);
        let _ = write!(
            h,
            "<section class=\"sheet-page\" data-testid=\"sheet-page\"><h2>Member {id}</h2>\
             <p class=\"sheet-meta\">{title} · {date} · {}</p><h3>Inputs</h3><dl class=\"sheet-inputs\">",
            esc(&c.member.section.describe())
        );
        for (k, v) in crate::print::inputs(sys, &c.member) {
            let _ = write!(h, "<dt>{}</dt><dd>{}</dd>", esc(&k), esc(&v));
        }
        h.push_str("</dl>");
        if let Ok(r) = &c.outcome {
            h.push_str("<h3>Section and material</h3>");
            h.push_str(&properties_html(r, sys));
        }
        h.push_str(&crate::sectionview::of_checked(c));
        h.push_str("<h3>Result</h3>");
        h.push_str(&verdict_html(c, sys));
        if let Ok(r) = &c.outcome {
            h.push_str(&working_html(r, sys));
        }
        if let Some((_, url, legend)) = chart.filter(|(cid, ..)| *cid == c.member.id) {
            let _ = write!(
                h,
                "<img class=\"sheet-chart\" src=\"{}\" alt=\"Capacity envelope of member {id}\">\
                 <ul class=\"chart-legend sheet-legend\">{legend}</ul>",
                esc(url)
            );
        }
        let _ = write!(h, "{caution}</section>");
    }
    h
}

/// The unit system in words, for the sheet.
fn sys_name(sys: UnitSystem) -> &'static str {
    match sys {
        UnitSystem::Si => "SI units (kN, mm, MPa)",
        UnitSystem::Us => "US customary units (kip, in, ft, ksi)",
    }
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;
    use crate::demo;
    use std::sync::Arc;

    fn checked(id: &str) -> Checked {
        Checked::new(&demo::sample_member(id))
    }

    #[test]
    fn escapes_markup() {
        assert_eq!(esc("<b a=\"x\">&'"), "&lt;b a=&quot;x&quot;&gt;&amp;&#39;");
    }

    #[test]
    fn verdict_shows_the_engine_figures() {
        let c = checked("C1");
        let r = c.outcome.as_ref().unwrap();
        let h = verdict_html(&c, UnitSystem::Si);
        assert!(h.contains(&format!(
            "<span data-testid=\"result-utilisation\">{:.3}</span>",
            r.utilisation
        )));
        assert!(h.contains(&format!("{:.1}</span> kN", r.resistance_kn)));
        // 1 kip = 4.4482216152605 kN exactly (the pound-force by definition).
        let us = verdict_html(&c, UnitSystem::Us);
        let kip = r.resistance_kn / 4.448_221_615_260_5;
        let shown: f64 = us
            .split("result-resistance\">")
            .nth(1)
            .unwrap()
            .split('<')
            .next()
            .unwrap()
            .parse()
            .unwrap();
        // Shown to four significant figures.
        assert!((shown - kip).abs() <= kip.abs() * 5e-4, "{shown} vs {kip}");
        assert!(us.contains("</span> kip"));
    }

    #[test]
    fn verdict_shows_the_bending_side() {
        let mut m = demo::sample_member("B1");
        m.axial_kn = 0.0;
        m.method = strutline_core::method::Method::En1993;
        m.m_major_span_knm = 1.5;
        let c = Checked::new(&m);
        let r = c.outcome.as_ref().unwrap();
        let b = r.bending.unwrap();
        let h = verdict_html(&c, UnitSystem::Si);
        assert!(h.contains("data-testid=\"bending\""), "{h}");
        assert!(h.contains("bending, major axis"), "{h}");
        assert!(h.contains(&format!(
            "<td class=\"num\">{}</td>",
            fixed(b.major.utilisation(), 3)
        )));
        let w = working_html(r, UnitSystem::Si);
        assert!(
            w.contains("Bending, major axis") && w.contains("M_b,Rd"),
            "{w}"
        );
    }

    #[test]
    fn input_errors_are_text_not_markup() {
        let mut m = demo::sample_member("<img src=x>");
        m.length_mm = -1.0;
        let c = Checked::new(&m);
        let h = verdict_html(&c, UnitSystem::Si);
        assert!(h.contains("fix input"));
        assert!(!h.contains("<img"));
        let sheet = sheet_html(
            "<script>",
            "2026-12-01",
            &[Arc::new(c)],
            None,
            UnitSystem::Si,
        );
        assert!(!sheet.contains("<script>") && !sheet.contains("<img src=x>"));
        assert!(sheet.contains("&lt;img src=x&gt;"));
    }

    #[test]
    fn working_marks_the_governing_mode_and_every_step() {
        let c = checked("C2");
        let r = c.outcome.as_ref().unwrap();
        let h = working_html(r, UnitSystem::Si);
        assert_eq!(h.matches("◀ governs").count(), 1);
        assert_eq!(
            h.matches("<tr><th scope=\"row\"><code>").count(),
            r.trace.len()
        );
        assert_eq!(
            h.matches("<tr").count(),
            r.trace.len() + r.modes.len() + 1 + groups(r)
        );
    }

    fn groups(r: &CheckResult) -> usize {
        SCOPES
            .iter()
            .filter(|s| r.trace.iter().any(|t| t.scope == **s))
            .count()
    }

    #[test]
    fn whatif_compares_every_method_and_solves_both_ways() {
        let c = checked("W1");
        let p = c.prepared.as_ref().unwrap();
        let h = whatif_html(p, UnitSystem::Si);
        assert_eq!(
            h.matches("<tr").count(),
            strutline_core::method::Method::ALL.len() + 1,
            "a row per method and the header"
        );
        assert_eq!(h.matches("(this member's)").count(), 1);
        let longest = match solve::longest_length(p, p.member.method).unwrap() {
            LengthAnswer::Found(f) => f.length_mm,
            other => panic!("{other:?}"),
        };
        assert!(
            h.contains(&format!("<b>{} mm</b>", working(longest))),
            "{h}"
        );
        let largest = solve::largest_load(p, p.member.method).unwrap();
        assert!(h.contains(&format!("<b>{:.1} kN</b>", largest.load_kn)));
        assert!((largest.load_kn - c.outcome.as_ref().unwrap().resistance_kn).abs() < 1e-9);
    }

    #[test]
    fn sheet_has_a_page_per_member_and_the_caution_on_each() {
        let cs: Vec<_> = ["A1", "A2", "A3"]
            .iter()
            .map(|i| Arc::new(checked(i)))
            .collect();
        let h = sheet_html(
            "Depot",
            "2026-12-01",
            &cs,
            Some(("A2", "data:image/png;base64,AA", "<li>Euler</li>")),
            UnitSystem::Si,
        );
        assert_eq!(h.matches("data-testid=\"sheet-page\"").count(), 3);
        assert_eq!(h.matches(CAUTION).count(), 4);
        assert_eq!(h.matches("<img class=\"sheet-chart\"").count(), 1);
        assert_eq!(
            h.matches("<li>Euler</li>").count(),
            1,
            "the legend beside the chart"
        );
        assert!(h.contains("Member A2"));
    }
}
