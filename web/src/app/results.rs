//! The result pane: caution, verdict, chart, section view, working and
//! "What if"; and the calc sheet.

use super::*;
use crate::html;
use crate::html::Html;

#[component]
pub(super) fn Results(ctx: Ctx) -> impl IntoView {
    let current = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.checks.with(|c| c.0.get(sel).cloned())
    });
    let units = ctx.units;
    view! {
        <h2 id="h-results" class="pane-title">"Result"</h2>
        <p class="caution" data-testid="caution">"⚠ " {CAUTION}</p>
        <div class="verdict-block" inner_html=move || match current.get() {
            None => "<p class=\"empty\">No member selected.</p>".to_string(),
            Some(c) => report::verdict_html(&c, units.get()).into_string(),
        }></div>
        <Chart ctx=ctx current=current />
        <div class="working-block" inner_html=move || {
            let sys = units.get();
            current.get().map(|c| {
                let mut h = crate::sectionview::of_checked(&c);
                if let Ok(r) = &c.outcome {
                    h.push(&report::working_html(r, sys));
                }
                if let Some(p) = &c.prepared {
                    h.push(&report::whatif_html(p, sys));
                }
                h.into_string()
            }).unwrap_or_default()
        }></div>
    }
}

/// The selected member's id, its chart as a PNG data URL and the
/// chart's legend as drawn.
pub(super) fn chart_image(ctx: Ctx) -> Option<(String, String, Html)> {
    let id = ctx.current()?.id;
    let el = document().get_element_by_id("envelope")?;
    let c: web_sys::HtmlCanvasElement = wasm_bindgen::JsCast::dyn_into(el).ok()?;
    Some((id, c.to_data_url().ok()?, ctx.legend.get_untracked()))
}

/// The calc sheet of the open list, built as text by
/// [`report::sheet_html`], with buttons to print it and to close it.
#[component]
pub(super) fn CalcSheet(ctx: Ctx, chart: Option<(String, String, Html)>) -> impl IntoView {
    let title = ctx
        .ws
        .with_untracked(|w| w.active_list().map(|l| l.title.clone()).unwrap_or_default());
    let checks = ctx.checks.get_untracked();
    let html = report::sheet_html(
        &title,
        &crate::print::today(),
        &checks.0,
        chart
            .as_ref()
            .map(|(id, url, legend)| (id.as_str(), url.as_str(), legend)),
        ctx.units.get_untracked(),
    )
    .into_string();
    view! {
        <div class="calc-sheet" data-testid="calc-sheet">
            <div class="button-row screen-only">
                <button type="button" data-testid="print" on:click=move |_| {
                    if let Some(w) = web_sys::window() { let _ = w.print(); }
                }>"Print or save as PDF"</button>
                <button type="button" data-testid="close-sheet" on:click=move |_| ctx.sheet.set(None)>"Close the sheet"</button>
            </div>
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

#[component]
pub(super) fn Chart(ctx: Ctx, current: Memo<Option<Arc<Checked>>>) -> impl IntoView {
    let canvas = NodeRef::<leptos::html::Canvas>::new();
    let note = RwSignal::new(None::<String>);
    let described = RwSignal::new(String::new());
    let legend = ctx.legend;
    Effect::new(move |_| {
        let c = current.get();
        let perry = ctx.perry.get();
        let others = ctx.compare.get();
        let hc = ctx.high_contrast.get();
        let sys = ctx.units.get();
        let us = sys == UnitSystem::Us;
        let _ = ctx.resize.get();
        let Some(el) = canvas.get() else {
            return;
        };
        let dpr = browser::device_pixel_ratio();
        let w = f64::from(el.client_width().max(1));
        let h = f64::from(el.client_height().max(1));
        // Resizing the bitmap reallocates it: only when the size changed.
        let (bw, bh) = ((w * dpr).round() as u32, (h * dpr).round() as u32);
        if el.width() != bw {
            el.set_width(bw);
        }
        if el.height() != bh {
            el.set_height(bh);
        }
        let data = c.as_ref().and_then(|c| match (&c.prepared, &c.outcome) {
            (Some(p), Ok(r)) => Some(chart::data::build(p, r, perry, others)),
            _ => None,
        });
        match data {
            Some(Ok(d)) => {
                legend.set(legend_html(perry, others.then_some(d.others.as_slice())));
                match chart::envelope::draw(&el, &d, dpr, hc, us) {
                    Ok(()) => note.set(None),
                    Err(e) => note.set(Some(e)),
                }
                described.set(match d.governing() {
                    Some(g) => format!(
                        "Governing axis {}: slenderness {}, applied stress {}, design stress {}, plateau {}.",
                        g.mode.key(),
                        working(g.slenderness),
                        step_text(sys, "MPa", g.applied_mpa),
                        step_text(sys, "MPa", g.resistance_mpa),
                        step_text(sys, "MPa", d.yield_mpa)
                    ),
                    None => String::new(),
                });
            }
            Some(Err(e)) => {
                legend.set(legend_html(perry, None));
                note.set(Some(fields::error_text(&e)));
            }
            None => {
                legend.set(legend_html(perry, None));
                for a in [
                    "data-curves",
                    "data-marker-slenderness",
                    "data-marker-stress-mpa",
                    "data-marker-px",
                ] {
                    let _ = el.remove_attribute(a);
                }
                note.set(Some(
                    "The chart appears when the member's input can be checked.".into(),
                ));
                described.set(String::new());
            }
        }
    });
    view! {
        <div class="chart-block">
            // One handler for both options, told apart by the box's name;
            // the boxes are the only writers of their signals, so they need
            // not follow them.
            <div class="chart-head" on:change=move |e| {
                let on = event_target_checked(&e);
                let name = event_target::<web_sys::Element>(&e).get_attribute("name");
                if name.as_deref() == Some("compare_methods") {
                    ctx.compare.set(on);
                } else {
                    ctx.perry.set(on);
                }
            }>
                <h3 class="sub-title">"Capacity envelope"</h3>
                <label class="check">
                    <input type="checkbox" name="show_bows" data-testid="toggle-bows" />
                    " show Perry-Robertson bows L/250, L/500, L/1000"
                </label>
                <label class="check">
                    <input type="checkbox" name="compare_methods" data-testid="toggle-compare" />
                    " compare every method that applies"
                </label>
            </div>
            <div class="canvas-frame">
                <canvas id="envelope" class="envelope" node_ref=canvas role="img"
                    aria-label="Failure stress against slenderness: Euler's curve, strength plateau, design curves and the member's markers"></canvas>
            </div>
            <ul class="chart-legend" aria-label="Chart legend" inner_html=move || legend.get().into_string()></ul>
            <p class="chart-description">{move || described.get()}</p>
            {move || note.get().map(|n| view! { <p class="chart-note">{n}</p> })}
        </div>
    }
}
