//! The result, its working and the calc sheet as HTML text.
//!
//! These parts only show values, so they are built as text and set as one
//! element's content: the app then carries one small view for each of
//! them rather than compiled code for every row and cell. Everything that
//! comes from the person or a file (ids, notes, designations) is escaped by
//! [`Html`]'s construction, so imported text is shown as text, never read
//! as markup.
//! Values are shown in the chosen unit system ([`crate::units_view`]); the
//! engine's values stay as computed.

use strutline_core::bending::Axis;
use strutline_core::check::Prepared;
use strutline_core::compare::{self, Outcome};
use strutline_core::envelope::interaction;
use strutline_core::file::SheetHeader;
use strutline_core::solve::{self, LengthAnswer, LengthLimit};
use strutline_core::trace::Scope;
use strutline_core::units::UnitSystem;
use strutline_core::{CheckResult, CAUTION};

use crate::checks::Checked;
use crate::fields;
use crate::html;
use crate::html::Html;
use crate::numtext::{fixed, nought, utilisation, working};
use crate::status::{governing_text, status_text, utilisation_text, Standing};
use crate::units_view::{result_text, span_text, step_text};

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
        Scope::Interaction => "Compression with bending",
    }
}

/// The parts of the working in the order they are shown.
const SCOPES: [Scope; 9] = [
    Scope::Member,
    Scope::Section,
    Scope::Major,
    Scope::Minor,
    Scope::Torsional,
    Scope::FlexuralTorsional,
    Scope::BendingMajor,
    Scope::BendingMinor,
    Scope::Interaction,
];

/// The verdict of one member: status, utilisation, resistance, load,
/// governing mode and method, then its warnings; or what stops the check.
pub fn verdict_html(c: &Checked, sys: UnitSystem) -> Html {
    verdict_in(c, sys, false)
}

/// The verdict, its messages in the app's words (`sheet`: member-file keys
/// the engine names are given as the standard's symbols, as the calc sheet
/// writes its inputs) or as the engine wrote them.
fn verdict_in(c: &Checked, sys: UnitSystem, sheet: bool) -> Html {
    let said = |m: &str| {
        if sheet {
            crate::print::speak(m)
        } else {
            m.to_string()
        }
    };
    let standing = Standing::of(&c.outcome);
    let mut h = Html::new();
    html!(
        h,
        "<div class=\"verdict {}\" role=\"status\"><p class=\"verdict-status\">{}</p>",
        standing.class(),
        status_text(&c.outcome)
    );
    match &c.outcome {
        None => {
            h.lit(
                "<dl class=\"verdict-numbers\">\
                 <dt>utilisation</dt><dd><span data-testid=\"result-utilisation\">…</span></dd>\
                 <dt>governs</dt><dd data-testid=\"result-governing\">…</dd></dl></div>",
            );
        }
        Some(Err(e)) => {
            html!(
                h,
                "<p class=\"verdict-error\">{}</p><dl class=\"verdict-numbers\">\
                 <dt>utilisation</dt><dd><span data-testid=\"result-utilisation\">—</span></dd>\
                 <dt>governs</dt><dd data-testid=\"result-governing\">—</dd>\
                 <dt class=\"v-more\">resistance</dt><dd class=\"v-more\"><span data-testid=\"result-resistance\">—</span></dd></dl></div>",
                said(&fields::error_text(e))
            );
        }
        Some(Ok(r)) => {
            let rd_text = result_text(sys, "kN", r.resistance_kn, 1);
            let (rd, ru) = split_unit(&rd_text);
            html!(
                h,
                "<dl class=\"verdict-numbers\">\
                 <dt>utilisation {}</dt><dd><span data-testid=\"result-utilisation\">{}</span></dd>\
                 <dt>governs</dt><dd data-testid=\"result-governing\">{}</dd>\
                 <dt class=\"v-more\">resistance N_Rd</dt><dd class=\"v-more\"><span data-testid=\"result-resistance\">{}</span> {}</dd>\
                 <dt class=\"v-more\">design load N_Ed</dt><dd class=\"v-more\" data-testid=\"result-load\">{}</dd>\
                 <dt class=\"v-more\">method</dt><dd class=\"v-more\">{}</dd></dl></div>",
                if r.bending.is_some() {
                    "(largest)"
                } else {
                    "N_Ed / N_Rd"
                },
                utilisation(r.utilisation),
                governing_text(r),
                rd,
                ru,
                load_text(r, sys),
                r.method.title(),
            );
            // On the sheet the tables follow the verdict; in the app they
            // open the part under the chart (checks_html), so the verdict
            // and the chart stay in view together.
            if sheet {
                h.push(&checks_html(r, sys));
            }
            h.push(&warnings_in(r, sys, &said));
            // In the app's wide layout the head does not scroll: its
            // warnings are shown whole while the head fits its pane, the
            // rest behind this fold, which, opened, shows the full list
            // under the head in place of the chart (`style.css`;
            // `browser::fit_warnings` marks them and fills in its words).
            if !sheet && !r.warnings.is_empty() {
                h.lit(
                    "<details class=\"warnings-more\" hidden><summary data-testid=\"warnings-more\">\
                     <span class=\"when-closed\"></span><span class=\"when-open\">▴ Hide them: show the chart</span>\
                     </summary></details>",
                );
            }
        }
    }
    h
}

/// The id of the full list of warnings under the result's head.
pub const ALL_WARNINGS_ID: &str = "all-warnings";

/// The words that open every warning in the result's head when it shows
/// only the first of `total`, `more` of them left out.
pub fn more_warnings_text(more: usize, total: usize) -> String {
    format!(
        "▾ {more} more {}: show all {total}",
        if more == 1 { "warning" } else { "warnings" }
    )
}

/// The design load a result was checked at, and for a buckling model the
/// segment whose force it is ("604.3 kN in segment 1 of 2, which
/// governs").
pub fn load_text(r: &CheckResult, sys: UnitSystem) -> String {
    let n = result_text(sys, "kN", r.axial_kn, 1);
    match r.segment {
        Some(s) if s.count > 1 => format!(
            "{n} in segment {} of {} (from end A), which governs; each segment is checked at its own force",
            s.index, s.count
        ),
        Some(_) => format!("{n}, the largest compression of the column model's loads"),
        None => n,
    }
}

/// The tables of the checks beyond compression: bending per axis and the
/// interaction equations (empty for a member without moments).
pub fn checks_html(r: &CheckResult, sys: UnitSystem) -> Html {
    let mut h = Html::new();
    if let Some(b) = &r.bending {
        h.push(&bending_html(b, sys));
    }
    if !r.interaction.is_empty() {
        h.push(&interaction_html(r));
    }
    h
}

/// The bending side of a result: per axis the largest design moment, the
/// design resistance, the elastic critical moment, the reduction and the
/// moment factor (a dash where none applies).
pub fn bending_html(b: &strutline_core::bending::Bending, sys: UnitSystem) -> Html {
    let u = head_unit(sys, "kNm");
    let mut h = Html::new();
    html!(
        h,
        "<div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Bending\">\
         <table class=\"modes\" data-testid=\"bending\"><caption>Bending</caption><thead><tr>\
         <th scope=\"col\">axis</th><th scope=\"col\">M_Ed ({})</th><th scope=\"col\">M_Rd ({})</th>\
         <th scope=\"col\">M_cr ({})</th><th scope=\"col\">reduction</th>\
         <th scope=\"col\">moment factor</th><th scope=\"col\">utilisation</th></tr></thead><tbody>",
        u,
        u,
        u
    );
    for (name, a) in [("major", &b.major), ("minor", &b.minor)] {
        html!(h, "<tr><th scope=\"row\">{}</th>", name);
        cell(&mut h, sys, "kNm", a.demand_knm);
        cell(&mut h, sys, "kNm", a.resistance_knm);
        match a.critical_knm {
            Some(v) => cell(&mut h, sys, "kNm", v),
            None => {
                h.lit("<td class=\"num\">—</td>");
            }
        }
        html!(
            h,
            "<td class=\"num\">{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td></tr>",
            working(a.reduction),
            a.moment_factor.map(working).unwrap_or_else(|| "—".into()),
            utilisation(a.utilisation())
        );
    }
    h.lit("</tbody></table></div>");
    h
}

/// The interaction equations worked, one row each with its utilisation,
/// the governing one marked.
pub fn interaction_html(r: &CheckResult) -> Html {
    let mut h = Html::from_lit(
        "<div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Interaction\">\
         <table class=\"modes\" data-testid=\"interaction\"><caption>Interaction</caption><thead><tr>\
         <th scope=\"col\">check</th><th scope=\"col\">utilisation</th></tr></thead><tbody>",
    );
    for c in &r.interaction {
        let governs = c.check == r.governing_check;
        html!(
            h,
            "<tr{}><th scope=\"row\">{}{}</th><td class=\"num\">{}</td></tr>",
            if governs { " class=\"governs\"" } else { "" },
            crate::status::equation_name(c.check),
            if governs { " (governs)" } else { "" },
            utilisation(c.utilisation)
        );
    }
    h.lit("</tbody></table></div>");
    h
}

/// "12.3 kN" as ("12.3", "kN").
fn split_unit(s: &str) -> (&str, &str) {
    s.split_once(' ').unwrap_or((s, ""))
}

/// The warnings of a result as a list (empty when there are none), their
/// numbers in `sys` (core's `Warning::text`).
pub fn warnings_html(r: &CheckResult, sys: UnitSystem) -> Html {
    warnings_in(r, sys, &|m| m.to_string())
}

fn warnings_in(r: &CheckResult, sys: UnitSystem, said: &dyn Fn(&str) -> String) -> Html {
    let mut h = Html::new();
    if r.warnings.is_empty() {
        return h;
    }
    h.lit("<ul class=\"warnings\" data-testid=\"warnings\" aria-label=\"warnings\">");
    for w in &r.warnings {
        html!(
            h,
            "<li>⚠ {} <code>{}</code></li>",
            said(&w.text(sys)),
            w.code
        );
    }
    h.lit("</ul>");
    h
}

/// A table cell with a value converted for display, unit in the header.
fn cell(h: &mut Html, sys: UnitSystem, unit: &'static str, v: f64) {
    let t = step_text(sys, unit, v);
    html!(h, "<td class=\"num\">{}</td>", split_unit(&t).0);
}

/// The unit a column of the modes table is headed with.
fn head_unit(sys: UnitSystem, unit: &'static str) -> &'static str {
    crate::units_view::shown(sys, unit, 1.0, false).1
}

/// Every mode checked, the governing one marked, then each part of the
/// working with its symbol, meaning, value and unit, and clause.
pub fn working_html(r: &CheckResult, sys: UnitSystem) -> Html {
    working_in(r, sys, &|m| m.to_string())
}

/// The working, its symbols and words passed through `said`.
fn working_in(r: &CheckResult, sys: UnitSystem, said: &dyn Fn(&str) -> String) -> Html {
    let mut h = Html::new();
    html!(
        h,
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
        h.lit(if gov {
            "<tr class=\"governs\">"
        } else {
            "<tr>"
        });
        html!(
            h,
            "<th scope=\"row\">{}{}</th>",
            m.mode.key(),
            if gov { " ◀ governs" } else { "" }
        );
        cell(&mut h, sys, "mm", m.buckling_length_mm);
        html!(h, "<td class=\"num\">{}</td>", working(m.slenderness));
        cell(&mut h, sys, "kN", m.critical_kn);
        html!(
            h,
            "<td class=\"num\">{}</td><td class=\"num\">{}</td>",
            working(m.relative_slenderness),
            working(m.reduction)
        );
        cell(&mut h, sys, "kN", m.resistance_kn);
        h.lit("</tr>");
    }
    h.lit("</tbody></table></div><h3 class=\"sub-title\">Working</h3>");
    // What the section's arithmetic leaves of a zero is shown as 0.
    let size = r.section.area_mm2.sqrt();
    for s in SCOPES {
        let mut rows = Html::new();
        for st in r.trace.iter().filter(|t| t.scope == s) {
            html!(
                rows,
                "<tr><th scope=\"row\"><code>{}</code></th><td>{}</td><td class=\"num\">{}</td><td class=\"clause\">{}</td></tr>",
                said(st.symbol.as_str()),
                said(st.label.as_str()),
                step_text(sys, st.unit(), nought(st.value, st.unit(), size)),
                said(st.clause.as_str()),
            );
        }
        if rows.is_empty() {
            continue;
        }
        let title = scope_title(s);
        html!(
            h,
            "<details class=\"working\" open><summary>{}</summary>\
             <div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Working: {}\"><table>\
             <thead><tr><th scope=\"col\">symbol</th><th scope=\"col\">meaning</th><th scope=\"col\">value</th>\
             <th scope=\"col\">from</th></tr></thead><tbody>{}</tbody></table></div></details>",
            title,
            title,
            rows
        );
    }
    h
}

/// What-if answers for the member: every method side by side (resistance,
/// utilisation, governing mode, or why it does not apply), the longest
/// buckling length that still carries the design load and the largest
/// load at the member's own length, all worked by the engine
/// ([`strutline_core::compare`], [`strutline_core::solve`]).
pub fn whatif_html(p: &Prepared, sys: UnitSystem) -> Html {
    let mut h = Html::from_lit(
        "<details class=\"whatif\" data-testid=\"whatif\" open><summary>What if</summary>\
         <div class=\"table-wrap\" tabindex=\"0\" role=\"region\" aria-label=\"Every method\">\
         <table class=\"compare\"><caption>Every method</caption><thead><tr>\
         <th scope=\"col\">method</th><th scope=\"col\">N_Rd</th><th scope=\"col\">utilisation</th>\
         <th scope=\"col\">governs</th></tr></thead><tbody>",
    );
    for c in compare::compare(p) {
        h.lit(if c.own {
            "<tr class=\"governs\">"
        } else {
            "<tr>"
        });
        match &c.outcome {
            Outcome::Checked {
                resistance_kn,
                utilisation,
                governing_check,
                ..
            } => html!(
                h,
                "<th scope=\"row\">{}{}</th><td class=\"num\">{}</td><td class=\"num\">{}</td><td>{}</td></tr>",
                c.title,
                if c.own { " (this member's)" } else { "" },
                result_text(sys, "kN", *resistance_kn, 1),
                crate::numtext::utilisation(*utilisation),
                governing_check,
            ),
            Outcome::NotApplicable { reason } | Outcome::Refused { message: reason } => html!(
                h,
                "<th scope=\"row\">{}</th><td colspan=\"3\">does not apply: {}</td></tr>",
                c.title,
                reason
            ),
        };
    }
    h.lit(
        "</tbody></table></div><p class=\"hint\">Every method is given this member's N_Ed: a \
         factored load for the limit-state methods, while AISC ASD expects a service load, so \
         compare resistances rather than utilisations across the two.</p><ul class=\"reverse\">",
    );
    let method = p.member.method;
    match solve::longest_length(p, method) {
        Ok(LengthAnswer::Found(f)) => {
            html!(
                h,
                "<li data-testid=\"longest-length\">Longest length that still carries N_Ed: <b>{}</b> \
                 (L_cr scaled alike: {} / {}; utilisation {}, governs {}",
                span_text(sys, f.length_mm),
                span_text(sys, f.lcr_major_mm),
                span_text(sys, f.lcr_minor_mm),
                utilisation(f.utilisation),
                f.governing_check,
            );
            if let LengthLimit::MethodRange { reason } = &f.limit {
                html!(h, "; the method's range ends there: {}", reason);
            }
            h.lit(")</li>");
        }
        Ok(LengthAnswer::NoLength { .. }) => {
            h.lit(
                "<li data-testid=\"longest-length\">No length carries N_Ed: the section or material \
                 is too weak at any length.</li>",
            );
        }
        Ok(LengthAnswer::AnyLength { tried_mm, .. }) => html!(
            h,
            "<li data-testid=\"longest-length\">N_Ed is carried up to the longest length tried, {}.</li>",
            span_text(sys, tried_mm)
        ),
        Err(e) => html!(h, "<li>Longest length: {}</li>", fields::error_text(&e)),
    };
    if let Ok(l) = solve::largest_load(p, method) {
        html!(
            h,
            "<li data-testid=\"largest-load\">Largest load at this length: <b>{}</b> (governs {}; reserve {})</li>",
            result_text(sys, "kN", l.load_kn, 1),
            l.governing_check,
            result_text(sys, "kN", l.reserve_kn, 1),
        );
    }
    // The largest moment about each loaded axis at N_Ed, the member's
    // diagram scaled and the other axis' moment held.
    for (axis, name, m) in [
        (Axis::Major, "major", p.member.moments_major()),
        (Axis::Minor, "minor", p.member.moments_minor()),
    ] {
        if m.is_zero() {
            continue;
        }
        match interaction::largest_moment(p, method, axis) {
            Ok(Some(knm)) => html!(
                h,
                "<li data-testid=\"largest-moment-{}\">Largest {}-axis moment at N_Ed: <b>{}</b> \
                 (this member's diagram scaled by {}; the other axis' moment held)</li>",
                name,
                name,
                result_text(sys, "kNm", knm, 1),
                fixed(knm / m.max_abs_knm(), 3),
            ),
            Ok(None) => html!(
                h,
                "<li data-testid=\"largest-moment-{}\">No {}-axis moment is carried at N_Ed: the load \
                 and the other axis' moment alone exceed the capacity.</li>",
                name,
                name
            ),
            Err(e) => html!(h, "<li>Largest {}-axis moment: {}</li>", name, fields::error_text(&e)),
        }
    }
    h.lit("</ul></details>");
    h
}

/// The section properties a result reports, as a definition list.
fn properties_html(r: &CheckResult, sys: UnitSystem) -> Html {
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
    let mut h = Html::from_lit("<dl class=\"sheet-props\">");
    for (name, unit, v) in rows {
        html!(
            h,
            "<dt>{}</dt><dd>{}</dd>",
            name,
            step_text(sys, unit, nought(v, unit, p.area_mm2.sqrt()))
        );
    }
    html!(
        h,
        "<dt>f</dt><dd>{}</dd><dt>E</dt><dd>{}</dd></dl>",
        step_text(sys, "MPa", r.strength_mpa),
        step_text(sys, "MPa", r.modulus_mpa)
    );
    h
}

/// The chart the calc sheet prints on the page of the member it was opened
/// from.
#[derive(Debug, Clone, PartialEq)]
pub struct SheetChart {
    /// The member's id.
    pub id: String,
    /// The picture, or why none could be drawn (said in words on the
    /// sheet instead).
    pub image: Result<SheetImage, String>,
    /// The legend, as drawn with the picture.
    pub legend: Html,
    /// What the chart is: the picture's text alternative.
    pub what: String,
}

/// A picture for the sheet: a PNG `data:` URL, its size in CSS px, and
/// the boxes of its words and marks as its canvas recorded them
/// (`chart::labels::Boxes`), kept on the image for tests.
#[derive(Debug, Clone, PartialEq)]
pub struct SheetImage {
    pub url: String,
    pub width: u32,
    pub height: u32,
    pub text_boxes: String,
    pub mark_boxes: String,
}

/// The calc sheet of a list: a summary page with the list's title block,
/// then a page for each member with its inputs (symbol, value, meaning, in
/// the order of the working), section properties, verdict, modes and
/// working, warnings, the envelope of the member it was opened from
/// (`chart`: id, image URL, and the legend as the app drew it) and the
/// caution on every page. Printed, every page also carries the header of
/// [`crate::print::page_rule`] and its number.
pub fn sheet_html(
    title: &str,
    header: &SheetHeader,
    checks: &[std::sync::Arc<Checked>],
    chart: Option<&SheetChart>,
    sys: UnitSystem,
) -> Html {
    let mut caution = Html::new();
    html!(caution, "<p class=\"caution\">⚠ {}</p>", CAUTION);
    let dash = |s: &str| {
        if s.trim().is_empty() {
            "—".to_string()
        } else {
            s.trim().to_string()
        }
    };
    let mut h = Html::new();
    html!(
        h,
        "<section class=\"sheet-page\" data-testid=\"sheet-summary\"><h2>Calculation: {}</h2>\
         <dl class=\"sheet-block\" data-testid=\"sheet-block\">\
         <dt>job</dt><dd data-testid=\"sheet-job\">{}</dd><dt>prepared by</dt><dd>{}</dd>\
         <dt>checked by</dt><dd>{}</dd><dt>date</dt><dd>{}</dd><dt>revision</dt><dd>{}</dd>\
         <dt>members</dt><dd>{}</dd><dt>units</dt><dd>{}</dd></dl>\
         <table class=\"sheet-summary\"><thead><tr><th scope=\"col\">member</th><th scope=\"col\">section</th>\
         <th scope=\"col\">method</th><th scope=\"col\">N_Ed</th><th scope=\"col\">N_Rd</th>\
         <th scope=\"col\">utilisation</th><th scope=\"col\">status</th></tr></thead><tbody>",
        dash(title),
        dash(&header.job),
        dash(&header.prepared_by),
        dash(&header.checked_by),
        dash(&header.date),
        dash(&header.revision),
        checks.len(),
        sys_name(sys),
    );
    for c in checks {
        let (ed, rd) = match &c.outcome {
            Some(Ok(r)) => (
                result_text(sys, "kN", r.axial_kn, 1),
                result_text(sys, "kN", r.resistance_kn, 1),
            ),
            Some(Err(_)) => (result_text(sys, "kN", c.member.axial_kn, 1), "—".into()),
            None => (result_text(sys, "kN", c.member.axial_kn, 1), "…".into()),
        };
        html!(
            h,
            "<tr><th scope=\"row\">{}</th><td>{}</td><td>{}</td><td class=\"num\">{}</td><td class=\"num\">{}</td>\
             <td class=\"num\">{}</td><td>{}</td></tr>",
            c.member.id,
            crate::units_view::section_text(sys, &c.member.section),
            c.member.method.title(),
            ed,
            rd,
            utilisation_text(&c.outcome),
            status_text(&c.outcome),
        );
    }
    html!(h, "</tbody></table>{}</section>", caution);
    for c in checks {
        let id = &c.member.id;
        html!(
            h,
            "<section class=\"sheet-page\" data-testid=\"sheet-page\"><h2>Member {}</h2>\
             <p class=\"sheet-meta\">{}{}</p><h3>Inputs</h3>\
             <table class=\"sheet-inputs\" data-testid=\"sheet-inputs\"><tbody>",
            id,
            crate::units_view::section_text(sys, &c.member.section),
            c.member
                .note
                .as_deref()
                .map(|n| format!(" · {n}"))
                .unwrap_or_default()
        );
        for l in crate::print::inputs(sys, &c.member) {
            html!(
                h,
                "<tr><th scope=\"row\">{}</th><td class=\"num\">{}</td><td>{}</td></tr>",
                l.symbol,
                if l.symbol.is_empty() {
                    l.value
                } else {
                    format!("= {}", l.value)
                },
                l.meaning
            );
        }
        h.lit("</tbody></table>");
        // The moment diagrams as understood, beside the inputs they draw;
        // a column in a frame and a buckling model, drawn with its
        // buckled shapes.
        h.push(&crate::diagram::svg(&c.member, sys));
        h.push(&crate::modelsheet::html(&c.member, c.result(), sys));
        if let Some(r) = c.result() {
            // A buckling model's result is its governing segment's: so are
            // the properties, which may not be the section of the inputs.
            match r.segment {
                Some(seg) => html!(
                    h,
                    "<h3 data-testid=\"sheet-properties-segment\">Section and material of segment {} of {} \
                     of the buckling model, which governs</h3>",
                    seg.index,
                    seg.count
                ),
                None => {
                    h.lit("<h3>Section and material</h3>");
                }
            }
            h.push(&properties_html(r, sys));
        }
        h.push(&crate::sectionview::of_checked(c, sys));
        h.lit("<h3>Result</h3>");
        h.push(&verdict_in(c, sys, true));
        if let Some(r) = c.result() {
            h.push(&working_in(r, sys, &crate::print::speak));
        }
        if let Some(chart) = chart.filter(|ch| ch.id == c.member.id) {
            match &chart.image {
                Ok(img) => html!(
                    h,
                    "<img class=\"sheet-chart\" data-testid=\"sheet-chart\" src=\"{}\" \
                     width=\"{}\" height=\"{}\" data-text-boxes=\"{}\" data-mark-boxes=\"{}\" alt=\"Member {}: {}\">\
                     <ul class=\"chart-legend sheet-legend\">{}</ul>",
                    img.url,
                    img.width,
                    img.height,
                    img.text_boxes,
                    img.mark_boxes,
                    id,
                    chart.what,
                    chart.legend
                ),
                // Words, never an empty picture.
                Err(why) => html!(
                    h,
                    "<p class=\"verdict-error\" data-testid=\"sheet-chart-missing\">No chart for member {}: {}</p>",
                    id,
                    why
                ),
            }
        }
        html!(h, "{}</section>", caution);
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
    use super::*;
    use crate::demo;
    use std::sync::Arc;

    fn checked(id: &str) -> Checked {
        Checked::new(&demo::sample_member(id))
    }

    #[test]
    fn the_sheet_names_sections_in_the_units_shown() {
        let cs = vec![Arc::new(checked("A1"))];
        let us =
            sheet_html("Depot", &SheetHeader::default(), &cs, None, UnitSystem::Us).into_string();
        // The sample's 100 x 60 mm bar: 3.937 x 2.362 in, in the summary,
        // under the member's heading and in the section view's label.
        let name = crate::units_view::section_text(UnitSystem::Us, &cs[0].member.section);
        assert!(
            name.ends_with(" in") && name.contains("3.937x2.362"),
            "{name}"
        );
        assert_eq!(us.matches(&name).count(), 3, "{us}");
        assert!(!us.contains("100x60"), "{us}");
        let si =
            sheet_html("Depot", &SheetHeader::default(), &cs, None, UnitSystem::Si).into_string();
        assert!(si.contains("100x60"));
    }

    #[test]
    fn what_is_left_of_a_zero_reads_0_in_the_working() {
        // The demo's I columns: their shear centre offsets (y_0, z_0) come
        // out of the section's arithmetic a few 1e-14 mm off zero.
        let mut tiny = 0;
        for m in demo::demo_lists().iter().flat_map(|l| l.members.iter()) {
            let c = Checked::new(m);
            let Some(r) = c.result() else { continue };
            tiny += r
                .trace
                .iter()
                .filter(|t| t.unit() == "mm" && t.value != 0.0 && t.value.abs() < 1e-9)
                .count();
            for sys in [UnitSystem::Si, UnitSystem::Us] {
                let h = working_html(r, sys).into_string();
                for e in 10..20 {
                    assert!(!h.contains(&format!("e-{e}")), "{}: {h}", m.id);
                }
            }
        }
        assert!(tiny > 0, "no demo member has a rounded zero to show");
    }

    #[test]
    fn verdict_shows_the_engine_figures() {
        let c = checked("C1");
        let r = c.result().unwrap();
        let h = verdict_html(&c, UnitSystem::Si).into_string();
        assert!(h.contains(&format!(
            "<span data-testid=\"result-utilisation\">{:.3}</span>",
            r.utilisation
        )));
        assert!(h.contains(&format!("{:.1}</span> kN", r.resistance_kn)));
        // 1 kip = 4.4482216152605 kN exactly (the pound-force by definition).
        let us = verdict_html(&c, UnitSystem::Us).into_string();
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
    fn the_sheet_says_in_words_whether_the_moments_were_amplified() {
        // An AISC 360-16 beam-column whose moments are given as already
        // second-order: B1 is not applied, and the sheet's inputs, working
        // and warnings say so in words, never "... false" after a meaning.
        let sheet = |amplify: bool| {
            let mut m = demo::sample_member("W1");
            m.method = strutline_core::method::Method::AiscLrfd;
            m.axial_kn = 50.0;
            m.m_major_a_knm = 2.0;
            m.m_major_b_knm = 1.0;
            m.amplify_moments = amplify;
            let c = Checked::new(&m);
            assert!(c.result().is_some());
            sheet_html(
                "",
                &SheetHeader::default(),
                &[Arc::new(c)],
                None,
                UnitSystem::Si,
            )
            .into_string()
        };
        let given = sheet(false);
        assert!(
            given.contains("already second-order, not amplified</td><td>moments given</td>"),
            "{given}"
        );
        assert!(
            given.contains("not applied (moments given: already second-order, not amplified)"),
            "{given}"
        );
        assert!(!given.contains("false"), "{given}");
        assert!(
            given.contains("(B1 of AISC 360-16 Appendix 8.2.1, taken as 1)"),
            "{given}"
        );
        assert!(!given.contains("is worked here;"), "{given}");
        let amplified = sheet(true);
        assert!(
            amplified.contains(
                "first-order, amplified by the check where the code leaves it to the designer"
            ),
            "{amplified}"
        );
        assert!(!amplified.contains("true"), "{amplified}");
        assert!(amplified.contains("is worked here;"), "{amplified}");
    }

    #[test]
    fn the_head_holds_every_warning_whole_and_a_link_to_the_full_list() {
        // An invented single angle under AISC with end moments: four
        // warnings (angle through its centroid, checks left out, the F10
        // sign convention, B2 not worked).
        let mut m = demo::sample_member("L4");
        m.section = strutline_core::section::SectionSpec::Angle(strutline_core::section::Angle {
            depth_mm: 100.0,
            width_mm: 75.0,
            thickness_mm: 8.0,
            root_radius_mm: 0.0,
            toe_radius_mm: 0.0,
        });
        m.method = strutline_core::method::Method::AiscLrfd;
        m.axial_kn = 60.0;
        m.m_major_a_knm = 2.0;
        m.m_major_b_knm = -1.0;
        let c = Checked::new(&m);
        let r = c.result().unwrap();
        let n = r.warnings.len();
        assert!(n >= 3, "{n} warnings");
        // Each warning whole in the head (the browser hides those that do
        // not fit the pane, browser::fit_warnings) and the link to the
        // full list, hidden until then.
        let head = verdict_html(&c, UnitSystem::Si).into_string();
        assert_eq!(head.matches("<li>").count(), n, "{head}");
        for w in &r.warnings {
            let mut t = Html::new();
            t.text(&w.text(UnitSystem::Si));
            assert!(head.contains(t.as_str()), "{head}");
        }
        assert!(head.contains(
            "<details class=\"warnings-more\" hidden><summary data-testid=\"warnings-more\">"
        ));
        assert_eq!(more_warnings_text(1, 4), "▾ 1 more warning: show all 4");
        assert_eq!(more_warnings_text(3, 4), "▾ 3 more warnings: show all 4");
        // The full list and the sheet have them all, the sheet no link.
        assert_eq!(
            warnings_html(r, UnitSystem::Si)
                .into_string()
                .matches("<li>")
                .count(),
            n
        );
        let sheet = sheet_html(
            "",
            &SheetHeader::default(),
            &[Arc::new(c)],
            None,
            UnitSystem::Si,
        )
        .into_string();
        assert_eq!(sheet.matches("<li>⚠").count(), n);
        assert!(!sheet.contains("warnings-more"));
    }

    #[test]
    fn a_warning_reads_in_the_units_shown() {
        // A bar whose compression passes its elastic buckling load in the
        // plane of bending: AISC's B1 has no finite value, and the warning
        // gives alpha P_r = 1000 kN, which is 224.8 kip (1 kip =
        // 4.4482216152605 kN exactly, NIST SP 811, 2008, App. B).
        let mut m = demo::sample_member("W1");
        m.method = strutline_core::method::Method::AiscLrfd;
        m.axial_kn = 1000.0;
        m.m_minor_a_knm = 0.5;
        m.m_minor_b_knm = 0.5;
        let c = Checked::new(&m);
        let r = c.result().unwrap();
        assert!(r.warnings.iter().any(|w| w.code == "b1-unbounded"));
        let item = |h: &str| {
            h.split("<li>")
                .find(|li| li.contains("b1-unbounded"))
                .unwrap()
                .to_string()
        };
        // The full list under the result's head (the head shows the first
        // few, HEAD_WARNINGS) and the calc sheet say it the same way.
        let si = item(&warnings_html(r, UnitSystem::Si).into_string());
        assert!(si.contains("alpha P_r = 1000.0 kN"), "{si}");
        let us = item(&warnings_html(r, UnitSystem::Us).into_string());
        assert!(us.contains("alpha P_r = 224.8 kip"), "{us}");
        assert!(!us.contains(" kN"), "{us}");
        let sheet = sheet_html(
            "",
            &SheetHeader::default(),
            &[Arc::new(c)],
            None,
            UnitSystem::Us,
        )
        .into_string();
        assert!(item(&sheet).contains("224.8 kip"));
    }

    #[test]
    fn verdict_shows_the_bending_side() {
        let mut m = demo::sample_member("B1");
        m.axial_kn = 0.0;
        m.method = strutline_core::method::Method::En1993;
        m.m_major_span_knm = 1.5;
        let c = Checked::new(&m);
        let r = c.result().unwrap();
        let b = r.bending.unwrap();
        let h = verdict_html(&c, UnitSystem::Si).into_string();
        assert!(h.contains("bending, major axis"), "{h}");
        // The table under the chart in the app, after the verdict on the sheet.
        assert!(!h.contains("data-testid=\"bending\""), "{h}");
        let h = checks_html(r, UnitSystem::Si).into_string();
        assert!(h.contains("data-testid=\"bending\""), "{h}");
        assert!(h.contains(&format!(
            "<td class=\"num\">{}</td>",
            fixed(b.major.utilisation(), 3)
        )));
        let w = working_html(r, UnitSystem::Si).into_string();
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
        let h = verdict_html(&c, UnitSystem::Si).into_string();
        assert!(h.contains("fix input"));
        assert!(!h.contains("<img"));
        let sheet = sheet_html(
            "<script>",
            &SheetHeader::default(),
            &[Arc::new(c)],
            None,
            UnitSystem::Si,
        )
        .into_string();
        assert!(!sheet.contains("<script>") && !sheet.contains("<img src=x>"));
        assert!(sheet.contains("&lt;img src=x&gt;"));
    }

    #[test]
    fn working_marks_the_governing_mode_and_every_step() {
        let c = checked("C2");
        let r = c.result().unwrap();
        let h = working_html(r, UnitSystem::Si).into_string();
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
        let h = whatif_html(p, UnitSystem::Si).into_string();
        assert_eq!(
            h.matches("<tr").count(),
            strutline_core::method::Method::ALL.len() + 1,
            "a row per method and the header"
        );
        assert_eq!(h.matches("(this member&#39;s)").count(), 1);
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
        assert!((largest.load_kn - c.result().unwrap().resistance_kn).abs() < 1e-9);
    }

    #[test]
    fn a_beam_column_names_its_equations_its_largest_moment_and_draws_its_diagram() {
        let mut m = demo::sample_member("BC1");
        m.method = strutline_core::method::Method::En1993;
        m.axial_kn = 40.0;
        m.m_major_a_knm = 6.0;
        m.m_major_b_knm = -3.0;
        let c = Checked::new(&m);
        let p = c.prepared.as_ref().unwrap();
        // What if: the largest major-axis moment at N_Ed, as the engine's
        // interaction curve gives it; no minor-axis line (no moment there).
        let h = whatif_html(p, UnitSystem::Si).into_string();
        let most = interaction::largest_moment(p, m.method, Axis::Major)
            .unwrap()
            .unwrap();
        assert!(
            h.contains(&format!("moment at N_Ed: <b>{:.1} kNm</b>", most)),
            "{h}"
        );
        assert!(!h.contains("largest-moment-minor"));
        // The verdict's interaction table names each equation, the
        // governing one marked (entries set here as an equation would).
        let mut r = c.result().cloned().unwrap();
        r.interaction = vec![
            strutline_core::interaction::Check {
                check: "6.61",
                utilisation: 0.4,
            },
            strutline_core::interaction::Check {
                check: "6.62",
                utilisation: 0.7,
            },
        ];
        r.governing_check = "6.62";
        let t = interaction_html(&r).into_string();
        assert!(t.contains("equation (6.62) (governs)"), "{t}");
        assert!(t.contains("equation (6.61)</th>"), "{t}");
        // The calc sheet draws the moment diagram.
        let sheet = sheet_html(
            "Yard",
            &SheetHeader::default(),
            &[Arc::new(c)],
            None,
            UnitSystem::Si,
        )
        .into_string();
        assert!(sheet.contains("data-testid=\"moment-diagram\""), "{sheet}");
    }

    #[test]
    fn a_modelled_member_shows_the_governing_segment_and_its_force() {
        let m = &crate::chart::column::tests::stepped_column();
        let c = Checked::new(m);
        let r = c.result().unwrap();
        let s = r.segment.unwrap();
        // The verdict's N_Ed is the force the governing segment was
        // checked at (the model's loads), not the member's axial_kn.
        let h = verdict_html(&c, UnitSystem::Si).into_string();
        let want = format!(
            "data-testid=\"result-load\">{} in segment {} of {}",
            result_text(UnitSystem::Si, "kN", r.axial_kn, 1),
            s.index,
            s.count
        );
        assert!(h.contains(&want), "{want}: {h}");
        // The working's N_Ed is the same force.
        let n_ed = r.trace.iter().find(|t| t.symbol == "N_Ed").unwrap();
        assert_eq!(n_ed.value, r.axial_kn);
        // The sheet: its summary's N_Ed alike, the model printed with its
        // drawing, and no input line made of the model's inner keys.
        let sheet = sheet_html(
            "Hall",
            &SheetHeader::default(),
            &[Arc::new(c.clone())],
            None,
            UnitSystem::Si,
        )
        .into_string();
        assert!(
            sheet.contains(&format!(
                "<td class=\"num\">{}</td>",
                result_text(UnitSystem::Si, "kN", r.axial_kn, 1)
            )),
            "{sheet}"
        );
        assert!(sheet.contains("data-testid=\"sheet-column\""));
        // Its properties are said to be the governing segment's.
        let heading = format!(
            "Section and material of segment {} of {} of the buckling model, which governs",
            s.index, s.count
        );
        assert!(sheet.contains(&heading), "{heading}");
        for junk in [">translation<", ">segments<", "\"length_mm\""] {
            assert!(!sheet.contains(junk), "{junk}");
        }
    }

    #[test]
    fn a_chart_that_cannot_be_drawn_is_said_in_words_never_an_empty_picture() {
        let cs = vec![Arc::new(checked("A1"))];
        let chart = SheetChart {
            id: "A1".into(),
            image: Err("The chart appears when the member's input can be checked.".into()),
            legend: Html::from_lit("<li>Euler</li>"),
            what: "Failure stress against slenderness".into(),
        };
        let h = sheet_html(
            "Depot",
            &SheetHeader::default(),
            &cs,
            Some(&chart),
            UnitSystem::Si,
        )
        .into_string();
        assert!(!h.contains("<img class=\"sheet-chart\""), "{h}");
        assert!(
            h.contains(
                "No chart for member A1: The chart appears when the member&#39;s input can be checked."
            ),
            "{h}"
        );
    }

    #[test]
    fn sheet_has_a_page_per_member_and_the_caution_on_each() {
        let cs: Vec<_> = ["A1", "A2", "A3"]
            .iter()
            .map(|i| Arc::new(checked(i)))
            .collect();
        let header = SheetHeader {
            job: "J-<204>".into(),
            revision: "B".into(),
            ..SheetHeader::default()
        };
        let h = sheet_html(
            "Depot",
            &header,
            &cs,
            Some(&SheetChart {
                id: "A2".into(),
                image: Ok(SheetImage {
                    url: "data:image/png;base64,AA".into(),
                    width: 720,
                    height: 450,
                    text_boxes: "1.0,2.0,3.0,4.0".into(),
                    mark_boxes: String::new(),
                }),
                legend: Html::from_lit("<li>Euler</li>"),
                what: "Failure stress against slenderness".into(),
            }),
            UnitSystem::Si,
        )
        .into_string();
        assert_eq!(h.matches("data-testid=\"sheet-page\"").count(), 3);
        assert_eq!(h.matches(CAUTION).count(), 4);
        assert_eq!(h.matches("<img class=\"sheet-chart\"").count(), 1);
        assert_eq!(
            h.matches("<li>Euler</li>").count(),
            1,
            "the legend beside the chart"
        );
        assert!(h.contains("width=\"720\" height=\"450\""));
        assert!(h.contains("Member A2"));
        assert!(h.contains("<dd data-testid=\"sheet-job\">J-&lt;204&gt;</dd>"));
        assert!(h.contains("<dt>revision</dt><dd>B</dd><dt>"));
        // Inputs by symbol, never by file key.
        assert!(
            h.contains("<th scope=\"row\">L</th><td class=\"num\">= "),
            "{h}"
        );
        for key in ["length_mm", "axial_kn", "fy_mpa", "depth_mm", "k_major"] {
            assert!(!h.contains(key), "the sheet shows the file key {key}");
        }
    }
}
