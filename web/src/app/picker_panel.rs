//! The section picker and "lightest that works" panel: a thin component
//! over [`crate::picker`], a child of the app module so it shares its
//! state. The tables are built as text by [`crate::picker`] and their
//! buttons answered by one delegated click handler, which keeps the
//! compiled view small.
//!
//! Mounted under the editor; accepting proposals sets `Undo::Edit`.

use leptos::prelude::*;
use strutline_core::catalogue;
use strutline_core::sizing::with_entry;

use super::{Ctx, Undo};
use crate::picker::{self, Proposal};

/// The `data-act` and `data-v` of the button under a click, if any.
pub(super) fn action(e: &leptos::ev::MouseEvent) -> Option<(String, String)> {
    let t: web_sys::Element = wasm_bindgen::JsCast::dyn_into(e.target()?).ok()?;
    let b = t.closest("[data-act]").ok()??;
    Some((b.get_attribute("data-act")?, b.get_attribute("data-v")?))
}

/// What the person has typed and chosen, and the proposals left.
#[derive(Clone, Default)]
struct State {
    query: String,
    series: String,
    shape: String,
    limit: Option<f64>,
    left: Vec<Proposal>,
}

type Picker = (Ctx, RwSignal<State>);

/// Answers a typed search, a chosen series or shape, or a new limit.
fn typed((_, st): Picker, e: &leptos::ev::Event) {
    let name = event_target::<web_sys::Element>(e).get_attribute("name");
    let v = event_target_value(e);
    st.update(|s| match name.as_deref() {
        Some("section_search") => s.query = v,
        Some("section_series") => s.series = v,
        Some("section_shape") => s.shape = v,
        Some("util_limit") => s.limit = picker::parse_limit(&v),
        _ => {}
    });
}

/// Answers a button of the panel.
fn clicked((ctx, st): Picker, e: &leptos::ev::MouseEvent) {
    let Some((act, v)) = action(e) else {
        return;
    };
    match act.as_str() {
        "pick" => {
            if let (Some(m), Ok(en)) = (ctx.current(), catalogue::resolve(&v)) {
                ctx.commit(with_entry(&m, en));
                ctx.select(ctx.selected.get_untracked());
            }
        }
        "accept" | "all" => {
            // Only proposals worked for the members as they are now.
            st.update(|s| keep_current(ctx, &mut s.left));
            let picks = st.with_untracked(|s| {
                picker::picks(&s.left, (act == "accept").then_some(v.as_str()))
            });
            st.update(|s| s.left.retain(|p| !picks.iter().any(|(id, _)| *id == p.id)));
            let list = ctx.ws.with_untracked(|w| w.active);
            if let Some(Some(before)) = ctx.with_members(|ms| picker::apply(ms, &picks)) {
                let what = format!("Section of {} member(s) changed.", picks.len());
                ctx.undo.set(Some(Undo::Edit { list, what, before }));
            }
            ctx.select(ctx.selected.get_untracked());
        }
        "one" | "every" => {
            let ms = if act == "every" {
                ctx.ws
                    .with_untracked(|w| w.active_list().map(|l| l.members.clone()))
                    .unwrap_or_default()
            } else {
                ctx.current().into_iter().collect()
            };
            st.update(|s| {
                let t0 = crate::browser::precise_ms();
                s.left = picker::propose(&ms, &s.series, &s.shape, s.limit.unwrap_or(1.0));
                let spent = crate::browser::precise_ms() - t0;
                crate::browser::note_timing("strutlineSizing", "members", spent, ms.len());
            });
        }
        _ => {}
    }
}

/// Drops the proposals whose member has changed since they were worked
/// ([`picker::current`]).
fn keep_current(ctx: Ctx, left: &mut Vec<Proposal>) {
    let list = ctx.ws.with_untracked(|w| w.active);
    ctx.ws.with_untracked(|w| {
        let members = w.active_list().map(|l| l.members.as_slice()).unwrap_or(&[]);
        ctx.drafts.with_untracked(|d| {
            picker::current(left, members, |id| d.first(list, id).is_some());
        });
    });
}

/// The picker, under the editor.
#[component]
pub(super) fn SectionPicker(ctx: Ctx) -> impl IntoView {
    let p: Picker = (ctx, RwSignal::new(State::default()));
    let st = p.1;
    // A proposal goes as soon as its member changes (an input, a draft),
    // so none worked for other inputs is shown or accepted.
    Effect::new(move |_| {
        ctx.ws.track();
        ctx.drafts.track();
        if st.with_untracked(|s| s.left.is_empty()) {
            return;
        }
        let mut left = st.with_untracked(|s| s.left.clone());
        let before = left.len();
        keep_current(ctx, &mut left);
        if left.len() != before {
            st.update(|s| s.left = left);
        }
    });
    let rows = move || {
        let sel = ctx.selected.get();
        st.with(|s| {
            let found = picker::search(&s.query, &s.series, &s.shape);
            let m = ctx
                .ws
                .with(|w| w.active_list().and_then(|l| l.members.get(sel)).cloned());
            match m {
                Some(m) if !found.is_empty() => picker::rows_html(&m, &found).into_string(),
                _ => "<p class=\"hint\">Type a designation or choose a series.</p>".into(),
            }
        })
    };
    view! {
        <details class="picker-block" open=true on:input=move |e| typed(p, &e) on:click=move |e| clicked(p, &e)>
            <summary>"Pick a catalogue section"</summary>
            <div inner_html=picker::form_html().into_string()></div>
            <div class="table-wrap" inner_html=move || st.with(|s| picker::proposals_html(&s.left).into_string())></div>
            <div class="table-wrap picker-wrap" inner_html=rows></div>
        </details>
    }
}
