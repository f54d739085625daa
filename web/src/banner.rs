//! One banner (lines of text and buttons) for every message bar of the
//! app: the app's own banners and the import report of
//! [`crate::exchange`] both build theirs here, so neither imports the
//! other.

use leptos::prelude::*;

/// A button of a banner.
pub struct Action {
    label: &'static str,
    testid: &'static str,
    quiet: bool,
    run: Callback<()>,
}

pub fn act(
    label: &'static str,
    testid: &'static str,
    quiet: bool,
    run: impl Fn() + Send + Sync + 'static,
) -> Action {
    Action {
        label,
        testid,
        quiet,
        run: Callback::new(move |()| run()),
    }
}

/// One banner: its lines of text and its buttons. Every banner goes
/// through this one view, so each costs only its words and actions.
pub fn banner(
    testid: &'static str,
    class: &'static str,
    alert: bool,
    lines: Vec<String>,
    actions: Vec<Action>,
) -> AnyView {
    view! {
        <div class=format!("banner {class}") data-testid=testid role=if alert { "alert" } else { "status" }>
            {lines.into_iter().map(|l| view! { <p>{l}</p> }).collect::<Vec<_>>()}
            <div class="banner-actions">
                {actions.into_iter().map(|a| {
                    let run = a.run;
                    view! {
                        <button type="button" class:quiet=a.quiet data-testid=(!a.testid.is_empty()).then_some(a.testid)
                            on:click=move |_| run.run(())>{a.label}</button>
                    }
                }).collect::<Vec<_>>()}
            </div>
        </div>
    }
    .into_any()
}
