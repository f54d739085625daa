//! The list tools above the member list: order, filters, picking, and the
//! change form for the picked members. A child of the app module so it
//! shares its state; the controls are HTML text from
//! [`crate::toolbar::tools_html`], answered by one delegated input handler
//! and one delegated click handler, and all the logic is in
//! [`crate::listops::ListTools`]. Applying a change sets `Undo::Edit`.

use leptos::prelude::*;

use super::picker_panel::action;
use super::{Ctx, Undo};
use crate::listops::ListTools;
use crate::toolbar::{status_html, tools_html};

type Tools = (Ctx, RwSignal<ListTools>);

/// Takes a control's value; only the order and filters re-render the list.
fn typed((_, tools): Tools, e: &leptos::ev::Event) {
    let name = event_target::<web_sys::Element>(e).get_attribute("name");
    let v = event_target_value(e);
    if let Some(name) = name {
        tools.update(|t| {
            t.set(&name, &v);
        });
    }
}

/// Answers a button of the bar or of the change form.
fn clicked((ctx, tools): Tools, e: &leptos::ev::MouseEvent) {
    let Some((act, _)) = action(e) else {
        return;
    };
    match act.as_str() {
        "pick-shown" => ctx
            .checks
            .with_untracked(|c| tools.update(|t| t.pick_shown(&c.0))),
        "clear-picks" => tools.update(|t| t.picks.clear()),
        "apply" => {
            let list = ctx.ws.with_untracked(|w| w.active);
            let done = tools.with(|t| ctx.with_members(|ms| t.apply(ms)));
            match done {
                Some(Ok((before, what))) => {
                    tools.update(|t| t.message = None);
                    ctx.undo.set(Some(Undo::Edit { list, what, before }));
                    ctx.select(ctx.selected.get_untracked());
                }
                Some(Err(msg)) => tools.update(|t| t.message = Some(msg)),
                None => {}
            }
        }
        _ => {}
    }
}

/// The bar and the change form, folded until opened (the tally below
/// them stays in view, so a filter that hides rows is always said), and
/// the tally.
#[component]
pub(super) fn ListBar(ctx: Ctx, tools: RwSignal<ListTools>) -> impl IntoView {
    let p: Tools = (ctx, tools);
    let (bar, form) = tools_html();
    view! {
        <details class="list-tools-fold" data-testid="list-tools-fold">
            <summary>"Order, filter and pick"</summary>
            <div class="list-tools"
                on:input=move |e| typed(p, &e) on:click=move |e| clicked(p, &e) inner_html=bar.into_string() + form.as_str()></div>
        </details>
        <p class="list-summary" role="status" inner_html=move || tools.with(|t| ctx.checks.with(|c| status_html(t, &c.0).into_string()))></p>
    }
}
