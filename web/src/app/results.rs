//! The result pane: caution, verdict, chart, section view, working and
//! "What if"; and the calc sheet.

use super::*;
use crate::html;
use crate::html::Html;

/// The result pane. Its head (the caution, the verdict and the chart's
/// canvas) is what the person watches while typing: beside the editor on
/// a wide screen (held at the top of its pane), docked at the foot of the
/// screen on a narrow or upright one, the chart one tap away. The rest
/// (legend, options, section, working, What if) follows below.
#[component]
pub(super) fn Results(ctx: Ctx) -> impl IntoView {
    let current = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.checks.with(|c| c.0.get(sel).cloned())
    });
    let units = ctx.units;
    // The frame that shows an edit carries the check, the verdict and the
    // chart; the working (with the section view) and What if are built in
    // tasks after it. The working is some 1,100 elements whose parse and
    // layout took most of an edit's frame (bench/web.md); What if's reverse
    // solves check the member many times (a length solve some fifty
    // times, each with a buckling model's analysis where it does not
    // scale exactly). Each keeps its last content, marked busy, until the
    // new one is in.
    let (working, working_busy) = after_frame(current, units, |c, sys| {
        let mut h = Html::new();
        if let Some(r) = c.result() {
            // The docked verdict leaves its warnings here.
            html!(
                h,
                "<div class=\"dock-warnings\" id=\"{}\">{}</div>",
                report::ALL_WARNINGS_ID,
                report::warnings_html(r, sys)
            );
            h.push(&report::checks_html(r, sys));
        }
        h.push(&crate::sectionview::of_checked(c, sys));
        if let Some(r) = c.result() {
            h.push(&report::working_html(r, sys));
        }
        h.into_string()
    });
    let (whatif, whatif_busy) = after_frame(current, units, |c, sys| {
        c.prepared
            .as_ref()
            .map(|p| report::whatif_html(p, sys).into_string())
            .unwrap_or_default()
    });
    view! {
        <h2 id="h-results" class="pane-title">"Result"</h2>
        <Chart ctx=ctx current=current>
        <div class="working-block" data-testid="working-block" aria-busy=move || if working_busy.get() { "true" } else { "false" }
            inner_html=move || working.get()></div>
        <div class="whatif-block" data-testid="whatif-block" aria-busy=move || if whatif_busy.get() { "true" } else { "false" }
            inner_html=move || whatif.get()></div>
        </Chart>
    }
}

/// A block of the result built in a task after the frame that shows a
/// change of the member or the units, so it does not hold up that frame:
/// its HTML (`make` of the member and the units; empty when no member is
/// selected) and whether it is busy (its last content stands, out of date,
/// until the new one is in). A later change before the task runs has its
/// own turn; the task of the earlier one does nothing. The page is laid
/// out in a task after the block is in ([`browser::lay_out_now`]).
fn after_frame(
    current: Memo<Option<Arc<Checked>>>,
    units: RwSignal<UnitSystem>,
    make: fn(&Checked, UnitSystem) -> String,
) -> (RwSignal<String>, RwSignal<bool>) {
    let html = RwSignal::new(String::new());
    let busy = RwSignal::new(false);
    Effect::new(move |_| {
        let c = current.get();
        let sys = units.get();
        busy.set(true);
        request_animation_frame(move || {
            set_timeout(
                move || {
                    let now = current.try_get_untracked().flatten();
                    let same = match (&now, &c) {
                        (Some(a), Some(b)) => Arc::ptr_eq(a, b),
                        (None, None) => true,
                        _ => false,
                    };
                    if !same || units.try_get_untracked() != Some(sys) {
                        return;
                    }
                    html.try_set(c.as_deref().map(|c| make(c, sys)).unwrap_or_default());
                    busy.try_set(false);
                    // Laid out in a task of its own once it is in, not
                    // in the frame of an edit that comes before the next
                    // frame.
                    set_timeout(browser::lay_out_now, std::time::Duration::ZERO);
                },
                std::time::Duration::ZERO,
            )
        });
    });
    (html, busy)
}

/// How the chart is drawn, as the person has set it.
#[derive(Debug, Clone, Copy)]
pub(super) struct Look {
    /// The Perry-Robertson bows on the envelope.
    perry: bool,
    /// Every other method that applies.
    compare: bool,
    high_contrast: bool,
    units: UnitSystem,
    /// The interaction chart rather than the slenderness envelope.
    interaction: bool,
}

impl Look {
    /// As the person has set it, for a member with moments (`beam_column`)
    /// or without: read through `ctx`'s signals, so an effect that calls it
    /// redraws when one changes (wrap it in `untrack` where none should).
    fn of(ctx: Ctx, beam_column: bool) -> Look {
        Look {
            perry: ctx.perry.get(),
            compare: ctx.compare.get(),
            high_contrast: ctx.high_contrast.get(),
            units: ctx.units.get(),
            interaction: shows_interaction(ctx, beam_column),
        }
    }
}

/// Whether the chart is the interaction chart: for a member with moments
/// (`beam_column`) unless the person asked for the slenderness envelope.
fn shows_interaction(ctx: Ctx, beam_column: bool) -> bool {
    beam_column && !ctx.slenderness.get()
}

/// What a drawing gives besides the picture: its legend, a note where it
/// could not be drawn, and its description in words.
pub(super) struct Drawn {
    legend: Html,
    note: Option<String>,
    described: String,
}

/// What the chart is, in words: the canvas's label and the sheet image's
/// text alternative.
fn chart_label(interaction: bool) -> &'static str {
    if interaction {
        "Interaction chart: compression against the largest moment about each axis, the region within capacity shaded and the member's point"
    } else {
        "Failure stress against slenderness: Euler's curve, strength plateau, design curves and the member's markers"
    }
}

/// Draws the chart of `c` on `el` (sized to its CSS size x `dpr`): the
/// interaction chart or the slenderness envelope as `look` says. One path
/// for the screen's canvas and the calc sheet's offscreen one.
pub(super) fn draw_chart(
    el: &web_sys::HtmlCanvasElement,
    c: Option<&Checked>,
    look: Look,
    dpr: f64,
) -> Drawn {
    let Look {
        perry,
        compare: others,
        high_contrast: hc,
        units: sys,
        interaction,
    } = look;
    let us = sys == UnitSystem::Us;
    let Some((p, r)) = c.and_then(|c| c.prepared.as_ref().zip(c.result())) else {
        // Nothing of an earlier drawing (another member's point, the
        // point of a value since replaced) may stay under this verdict.
        let why = match c.map(|c| c.outcome.is_none()) {
            None => "No member selected.",
            Some(true) => "Being checked: the chart follows.",
            Some(false) => "Not checked: no chart until the member's input can be checked.",
        };
        chart::blank(el, why, dpr, hc);
        return Drawn {
            legend: legend_html(perry, None),
            note: Some("The chart appears when the member's input can be checked.".into()),
            described: why.to_string(),
        };
    };
    if interaction {
        return match chart::interaction::build(p, r, others) {
            Ok(d) => {
                let compared = chart::interaction::compared(&d);
                Drawn {
                    legend: interaction_legend_html(others.then_some(compared.as_slice())),
                    note: chart::interaction::draw(el, &d, dpr, hc, us).err(),
                    described: chart::interaction::describe(&d, sys),
                }
            }
            Err(e) => {
                let why = fields::error_text(&e);
                chart::blank(el, &why, dpr, hc);
                Drawn {
                    legend: interaction_legend_html(None),
                    note: Some(why),
                    described: String::new(),
                }
            }
        };
    }
    match chart::data::build(p, r, perry, others) {
        Ok(d) => Drawn {
            legend: legend_html(perry, others.then_some(d.others.as_slice())),
            note: chart::envelope::draw(el, &d, dpr, hc, us)
                .and_then(|()| {
                    el.set_attribute("data-chart", "slenderness")
                        .map_err(|_| "chart: the canvas could not be marked".to_string())
                })
                .err(),
            described: match d.governing() {
                Some(g) => format!(
                    "Governing axis {}: slenderness {}, applied stress {}, design stress {}, plateau {}.",
                    g.mode.key(),
                    working(g.slenderness),
                    step_text(sys, "MPa", g.applied_mpa),
                    step_text(sys, "MPa", g.resistance_mpa),
                    step_text(sys, "MPa", d.yield_mpa)
                ),
                None => String::new(),
            },
        },
        Err(e) => {
            let why = fields::error_text(&e);
            chart::blank(el, &why, dpr, hc);
            Drawn {
                legend: legend_html(perry, None),
                note: Some(why),
                described: String::new(),
            }
        }
    }
}

/// The calc sheet's chart: CSS px, drawn at twice that so it prints sharp.
const SHEET_CHART: (u32, u32) = (720, 450);

/// The chart of the selected member for the calc sheet, drawn afresh on a
/// canvas of its own (so it is there however the screen's chart is folded
/// or sized), as the person has set the chart; or, where none can be
/// drawn, why not.
pub(super) fn chart_image(ctx: Ctx) -> Option<report::SheetChart> {
    let sel = ctx.selected.get_untracked();
    let c = ctx.checks.with_untracked(|c| c.0.get(sel).cloned())?;
    let look = untrack(|| Look::of(ctx, c.member.has_moments()));
    let (width, height) = SHEET_CHART;
    let (legend, image) = match chart::offscreen_canvas(width, height, 2.0) {
        None => (
            Html::new(),
            Err("no canvas could be made (try reloading the page)".to_string()),
        ),
        Some(el) => {
            let drawn = draw_chart(&el, Some(&c), look, 2.0);
            let image = match drawn.note {
                Some(why) => Err(why),
                None => el
                    .to_data_url()
                    .map(|url| report::SheetImage {
                        url,
                        width,
                        height,
                        text_boxes: el.get_attribute("data-text-boxes").unwrap_or_default(),
                        mark_boxes: el.get_attribute("data-mark-boxes").unwrap_or_default(),
                    })
                    .map_err(|_| "the picture could not be read from its canvas".to_string()),
            };
            (drawn.legend, image)
        }
    };
    Some(report::SheetChart {
        id: c.member.id.clone(),
        image,
        legend,
        what: chart_label(look.interaction).to_string(),
    })
}

/// The calc sheet of the open list, built as text by
/// [`report::sheet_html`], with the list's header lines (entered once,
/// stored with the list, printed on every page), and buttons to print it
/// and to close it.
#[component]
pub(super) fn CalcSheet(ctx: Ctx, chart: Option<report::SheetChart>) -> impl IntoView {
    let today = crate::print::today();
    // The list's title and header, the date of today where none is given.
    let header = Memo::new(move |_| {
        ctx.ws.with(|w| {
            w.active_list()
                .map(|l| {
                    let mut h = l.sheet.clone();
                    if h.date.trim().is_empty() {
                        h.date = today.clone();
                    }
                    (l.title.clone(), h)
                })
                .unwrap_or_default()
        })
    });
    let stored = ctx
        .ws
        .with_untracked(|w| w.active_list().map(|l| l.sheet.clone()))
        .unwrap_or_default();
    // The printed pages' header and footer, while the sheet is open.
    Effect::new(move |_| {
        let (title, h) = header.get();
        browser::set_page_rule(Some(&crate::print::page_rule(&title, &h)));
    });
    on_cleanup(|| browser::set_page_rule(None));
    let html = move || {
        let (title, h) = header.get();
        let checks = ctx.checks.get();
        report::sheet_html(
            &title,
            &h,
            &checks.0,
            chart.as_ref(),
            ctx.units.get_untracked(),
        )
        .into_string()
    };
    let field = move |name: &'static str,
                      label: &'static str,
                      value: String,
                      hint: &'static str| {
        view! {
            <div class="field">
                <label for=format!("sheet-{name}")>{label}</label>
                <input type="text" id=format!("sheet-{name}") name=name autocomplete="off" value=value placeholder=hint />
            </div>
        }
    };
    view! {
        <div class="calc-sheet" data-testid="calc-sheet">
            <div class="button-row screen-only">
                <button type="button" data-testid="print" on:click=move |_| {
                    if let Some(w) = web_sys::window() { let _ = w.print(); }
                }>"Print or save as PDF"</button>
                <button type="button" data-testid="close-sheet" on:click=move |_| ctx.sheet.set(None)>"Close the sheet"</button>
            </div>
            <fieldset class="sheet-header-form screen-only" data-testid="sheet-header-form"
                on:input=move |e| {
                    let name = event_target::<web_sys::Element>(&e).get_attribute("name");
                    let v = event_target_value(&e);
                    ctx.ws.update(|w| {
                        if let Some(l) = w.active_list_mut() {
                            let h = &mut l.sheet;
                            match name.as_deref() {
                                Some("sheet_job") => h.job = v,
                                Some("sheet_prepared_by") => h.prepared_by = v,
                                Some("sheet_checked_by") => h.checked_by = v,
                                Some("sheet_date") => h.date = v,
                                Some("sheet_revision") => h.revision = v,
                                _ => {}
                            }
                        }
                    });
                }>
                <legend>"Header of every page (kept with this list)"</legend>
                <div class="field-grid">
                    {field("sheet_job", "job reference", stored.job, "e.g. 24-117")}
                    {field("sheet_prepared_by", "prepared by", stored.prepared_by, "name or initials")}
                    {field("sheet_checked_by", "checked by", stored.checked_by, "name or initials")}
                    {field("sheet_date", "date", stored.date, "today when empty")}
                    {field("sheet_revision", "revision", stored.revision, "e.g. A")}
                </div>
            </fieldset>
            <div inner_html=html></div>
        </div>
    }
}

/// The chart's legend as text: one element for the app to build, not
/// one per item. `others` is `Some` when the other methods are compared:
/// one item each, named by the method's title.
pub(super) fn legend_html(perry: bool, others: Option<&[(Method, chart::data::Curve)]>) -> Html {
    let mut h = Html::from_lit(
        "<li><span class=\"sw sw-shade\"></span>within capacity (shaded)</li>\
         <li><span class=\"sw sw-major\"></span>design curve, major axis (solid)</li>\
         <li><span class=\"sw sw-minor\"></span>design curve, minor axis (dashed)</li>\
         <li><span class=\"sw sw-plateau\"></span>strength plateau f_y or f_c,0,k (dashed)</li>\
         <li><span class=\"sw sw-euler\"></span>Euler π²E / (L_cr/i)² (dotted)</li>\
         <li><span class=\"sym\">●</span>applied stress N_Ed / A (larger dot: governing axis)</li>\
         <li><span class=\"sym\">□</span>resistance N_Rd / A of that axis, on its curve</li>",
    );
    if perry {
        for (i, bow) in ["250", "500", "1000"].iter().enumerate() {
            html!(
                h,
                "<li><span class=\"sw sw-perry{}\"></span>Perry-Robertson, bow L_cr/{}</li>",
                i + 1,
                bow
            );
        }
    }
    match others {
        Some([]) => {
            h.lit("<li>no other method applies to this member</li>");
        }
        Some(list) => {
            h.lit("<li>other methods, each the lower of its two axis curves:</li>");
            for (m, c) in list {
                html!(
                    h,
                    "<li data-method=\"{}\"><span class=\"sw sw-m sw-m{}\"></span>{}</li>",
                    m.key(),
                    *m as u8,
                    c.label
                );
            }
        }
        None => {}
    }
    h
}

/// The interaction chart's legend; `others` as in [`legend_html`], each
/// method with its refusals by axis ([`chart::interaction::compared`]): a
/// refused curve is named "refused" with the reason and has no swatch of a
/// line.
pub(super) fn interaction_legend_html(others: Option<&[chart::interaction::Refusals<'_>]>) -> Html {
    let mut h = Html::from_lit(
        "<li><span class=\"sw sw-shade\"></span>within capacity (shaded): every check of the method at most 1</li>\
         <li><span class=\"sw sw-major\"></span>interaction curve: the largest multiple of the member's moment diagram carried at each compression, the other axis' moment held (broken where the method's interaction is not worked)</li>\
         <li><span class=\"sym\">●</span>the member (N_Ed, largest |M_Ed|); <span class=\"sym\">⊗</span> when over</li>\
         <li><span class=\"sym\">□</span>the curve at the member's N_Ed</li>",
    );
    match others {
        Some([]) => {
            h.lit("<li>no other method applies to this member</li>");
        }
        Some(list) => {
            h.lit("<li>other methods, each its own interaction curve:</li>");
            for (m, refused) in list {
                match refused.as_slice() {
                    [] => html!(
                        h,
                        "<li data-method=\"{}\"><span class=\"sw sw-m sw-m{}\"></span>{}</li>",
                        m.key(),
                        *m as u8,
                        m.title()
                    ),
                    [(_, why), (_, other)] if why == other => html!(
                        h,
                        "<li data-method=\"{}\" data-refused=\"major minor\">{}: refused, no curve ({})</li>",
                        m.key(),
                        m.title(),
                        why
                    ),
                    some => {
                        html!(
                            h,
                            "<li data-method=\"{}\" data-refused=\"{}\">",
                            m.key(),
                            some.iter().map(|(a, _)| *a).collect::<Vec<_>>().join(" ")
                        );
                        if some.len() < 2 {
                            html!(h, "<span class=\"sw sw-m sw-m{}\"></span>", *m as u8);
                        }
                        html!(h, "{}", m.title());
                        for (axis, why) in some {
                            html!(h, "; {} axis refused, no curve ({})", axis, why);
                        }
                        h.lit("</li>");
                    }
                }
            }
        }
        None => {}
    }
    h
}

/// The result's head (caution, verdict, the chart's canvas), then the
/// rest (`children` after the chart's legend and options) in a part that
/// scrolls on its own on a wide screen; the canvas is drawn afresh on every change
/// of the member, the options, the theme, the units or its size.
#[component]
pub(super) fn Chart(
    ctx: Ctx,
    current: Memo<Option<Arc<Checked>>>,
    children: Children,
) -> impl IntoView {
    let canvas = NodeRef::<leptos::html::Canvas>::new();
    let note = RwSignal::new(None::<String>);
    let described = RwSignal::new(String::new());
    let legend = RwSignal::new(Html::new());
    let beam_column = Memo::new(move |_| current.get().is_some_and(|c| c.member.has_moments()));
    let interaction_shown = move || shows_interaction(ctx, beam_column.get());
    Effect::new(move |_| {
        let c = current.get();
        let look = Look::of(ctx, beam_column.get());
        // The canvas's size is read again after a resize or when the
        // docked chart opens or closes.
        let resized = ctx.resize.get() * 2 + u64::from(ctx.chart_open.get());
        // Drawn after the first frame: its size needs the layout.
        if !ctx.painted.get() {
            return;
        }
        let Some(el) = canvas.get() else {
            return;
        };
        let dpr = browser::fit_canvas(&el, resized);
        // What one chart records for tests, cleared before the other draws.
        for a in [
            "data-chart",
            "data-curves",
            "data-marker-slenderness",
            "data-marker-stress-mpa",
            "data-marker-px",
            "data-inside-major",
            "data-inside-minor",
            "data-curve-at-load-major",
            "data-curve-at-load-minor",
            "data-point-px-major",
            "data-point-px-minor",
        ] {
            let _ = el.remove_attribute(a);
        }
        let drawn = draw_chart(&el, c.as_deref(), look, dpr);
        legend.set(drawn.legend);
        note.set(drawn.note);
        described.set(drawn.described);
    });
    // The head's height, for the page to keep a focused field clear of
    // it when it is docked (style.css reads --dock).
    let head = NodeRef::<leptos::html::Div>::new();
    Effect::new(move |_| {
        current.track();
        ctx.chart_open.track();
        ctx.resize.track();
        ctx.units.track();
        if !ctx.painted.get() {
            return;
        }
        request_animation_frame(move || {
            if let Some(el) = head.get_untracked() {
                browser::fit_warnings(&el, &report::more_warnings_text);
                browser::set_root_px("--dock", f64::from(el.offset_height()));
            }
        });
    });
    let units = ctx.units;
    view! {
        <div class="result-head" class:chart-open=move || ctx.chart_open.get() node_ref=head data-testid="result-head">
            <p class="caution" data-testid="caution">"⚠ " {CAUTION}</p>
            <div class="verdict-block" data-testid="verdict" inner_html=move || match current.get() {
                None => "<p class=\"empty\">No member selected.</p>".to_string(),
                Some(c) => report::verdict_html(&c, units.get()).into_string(),
            }></div>
            <button type="button" class="chart-toggle" data-testid="chart-toggle" aria-controls="envelope-frame"
                aria-expanded=move || if ctx.chart_open.get() { "true" } else { "false" }
                on:click=move |_| {
                    ctx.chart_open.update(|o| *o = !*o);
                    // Redraw at the size the canvas now has.
                    request_animation_frame(move || ctx.resize.update(|n| *n += 1));
                }>
                {move || if ctx.chart_open.get() { "▾ Hide the chart" } else { "▴ Show the chart" }}
            </button>
            <div class="canvas-frame" id="envelope-frame">
                <canvas id="envelope" class="envelope" node_ref=canvas role="img"
                    aria-describedby="chart-description"
                    aria-label=move || chart_label(interaction_shown())></canvas>
            </div>
        </div>
        <div class="result-more">
        <div class="chart-block">
            // One handler for both options, told apart by the box's name;
            // the boxes are the only writers of their signals, so they need
            // not follow them.
            <div class="chart-head" on:change=move |e| {
                let on = event_target_checked(&e);
                let name = event_target::<web_sys::Element>(&e).get_attribute("name");
                match name.as_deref() {
                    Some("compare_methods") => ctx.compare.set(on),
                    Some("show_slenderness") => ctx.slenderness.set(on),
                    _ => ctx.perry.set(on),
                }
            }>
                <h3 class="sub-title">{move || if interaction_shown() { "Interaction" } else { "Capacity envelope" }}</h3>
                <label class="check" hidden=move || !beam_column.get()>
                    <input type="checkbox" name="show_slenderness" data-testid="toggle-slenderness"
                        prop:checked=move || ctx.slenderness.get() />
                    " show the slenderness envelope instead"
                </label>
                <label class="check" hidden=interaction_shown>
                    <input type="checkbox" name="show_bows" data-testid="toggle-bows" />
                    {format!(" show Perry-Robertson bows {}", crate::chart::data::bow_family_text())}
                </label>
                <label class="check">
                    <input type="checkbox" name="compare_methods" data-testid="toggle-compare" />
                    " compare every method that applies"
                </label>
            </div>
            <ul class="chart-legend" aria-label="Chart legend" inner_html=move || legend.get().into_string()></ul>
            <p class="chart-description" id="chart-description" data-testid="chart-description">{move || described.get()}</p>
            {move || note.get().map(|n| view! { <p class="chart-note">{n}</p> })}
        </div>
        {children()}
        </div>
    }
}
