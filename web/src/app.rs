//! The components: a thin layer over the view-logic modules. State lives
//! in a few signals held by [`Ctx`]; every list operation, parse and
//! format is delegated to the plain modules.

use std::sync::Arc;

use leptos::ev;
use leptos::prelude::*;
use strutline_core::method::Method;
use strutline_core::units::UnitSystem;
use strutline_core::{Member, CAUTION};

use crate::browser;
use crate::chart;
use crate::checks::{Checked, Checker};
use crate::demo;
use crate::fields::{self, Choice, Field, MaterialMode};
use crate::listops::{self, Deleted, DeletedList, ListTools};
use crate::numtext::{for_input, working};
use crate::report;
use crate::restraint::Restraint;
use crate::status::{status_text, utilisation_text, Standing};
use crate::units_view::step_text;
use crate::workspace::{decode, encode, peek_revision, Workspace, KEY, UNREADABLE_PREFIX};

#[path = "panels.rs"]
mod panels;

#[path = "listbar.rs"]
mod listbar;

/// Storage key of the theme preference.
const THEME_KEY: &str = "strutline.v1.theme";

/// Something deleted that can be put back.
#[derive(Debug, Clone)]
enum Undo {
    Member {
        list: usize,
        deleted: Box<Deleted>,
    },
    List(DeletedList),
    /// Members changed together (sections picked for a list): the list's
    /// members as they were.
    Edit {
        list: usize,
        what: String,
        before: Vec<Member>,
    },
}

/// Stored data that could not be read.
#[derive(Debug, Clone)]
struct Problem {
    reason: String,
    aside: Option<String>,
    raw: String,
}

/// The checks of the active list, compared by identity.
#[derive(Debug, Clone)]
struct Checks(Arc<Vec<Arc<Checked>>>);

impl PartialEq for Checks {
    fn eq(&self, other: &Self) -> bool {
        Arc::ptr_eq(&self.0, &other.0)
    }
}

/// The app's state.
#[derive(Clone, Copy)]
struct Ctx {
    ws: RwSignal<Workspace>,
    selected: RwSignal<usize>,
    generation: RwSignal<u64>,
    undo: RwSignal<Option<Undo>>,
    checks: Memo<Checks>,
    high_contrast: RwSignal<bool>,
    perry: RwSignal<bool>,
    /// Whether the chart also draws the other methods that apply.
    compare: RwSignal<bool>,
    problem: RwSignal<Option<Problem>>,
    save_problem: RwSignal<Option<String>>,
    other_tab: RwSignal<Option<String>>,
    update_ready: RwSignal<bool>,
    resize: RwSignal<u64>,
    loaded_rev: StoredValue<u64>,
    overwrite_ok: StoredValue<bool>,
    save_pending: StoredValue<bool>,
    /// The units shown and typed (the stored values stay SI).
    units: RwSignal<UnitSystem>,
    /// The calc sheet when open: the chart image of the member it was
    /// opened from (id, PNG data URL), if there was one.
    sheet: RwSignal<Option<Option<(String, String, String)>>>,
}

impl Ctx {
    /// The selected member, without tracking.
    fn current(&self) -> Option<Member> {
        let sel = self.selected.get_untracked();
        self.ws
            .with_untracked(|w| w.active_list().and_then(|l| l.members.get(sel)).cloned())
    }

    /// Replaces the selected member.
    fn commit(&self, m: Member) {
        let sel = self.selected.get_untracked();
        self.ws.update(|w| {
            if let Some(slot) = w.active_list_mut().and_then(|l| l.members.get_mut(sel)) {
                *slot = m;
            }
        });
    }

    /// Selects member `i` and rebuilds the editor.
    fn select(&self, i: usize) {
        self.selected.set(i);
        self.generation.update(|g| *g += 1);
    }

    /// Index of a member id in the active list.
    fn index_of(&self, id: &str) -> Option<usize> {
        self.ws.with_untracked(|w| {
            w.active_list()
                .and_then(|l| l.members.iter().position(|m| m.id == id))
        })
    }

    /// Applies a list operation to the active list's members.
    fn with_members<R>(&self, f: impl FnOnce(&mut Vec<Member>) -> R) -> Option<R> {
        let mut out = None;
        self.ws.update(|w| {
            if let Some(l) = w.active_list_mut() {
                out = Some(f(&mut l.members));
            }
        });
        out
    }
}

/// A view made afresh whenever `key` changes. A plain reactive block would
/// patch the old inputs in place, and an input the person has typed in keeps
/// its text whatever its `value` attribute says; a new key makes new inputs.
/// One function for every such block, so the keyed list is compiled once.
fn made_afresh(key: Signal<u64>, make: Arc<dyn Fn() -> AnyView + Send + Sync>) -> impl IntoView {
    view! { <For each=move || std::iter::once(key.get()) key=|k| *k children=move |_| make() /> }
}

/// A key for [`made_afresh`] from any hashable value.
fn key_of<T: std::hash::Hash>(t: &T) -> u64 {
    use std::hash::Hasher;
    let mut h = rustc_hash::FxHasher::default();
    t.hash(&mut h);
    h.finish()
}

fn set_problem(ctx: Ctx, raw: String, reason: String) {
    let aside = format!("{UNREADABLE_PREFIX}{}", browser::now_ms() as u64);
    let aside = browser::set(&aside, &raw).ok().map(|()| aside);
    ctx.problem.set(Some(Problem { reason, aside, raw }));
}

/// Milliseconds a save waits for more changes: typing into a field saves
/// once, not on every key; leaving the page saves at once.
const SAVE_DELAY_MS: u64 = 250;

fn schedule_save(ctx: Ctx) {
    if ctx.save_pending.get_value() {
        return;
    }
    ctx.save_pending.set_value(true);
    set_timeout(
        move || {
            if ctx.save_pending.get_value() {
                do_save(ctx);
            }
        },
        std::time::Duration::from_millis(SAVE_DELAY_MS),
    );
}

/// Saves now if a save is waiting (the page is being hidden or left).
fn flush_save(ctx: Ctx) {
    if ctx.save_pending.get_value() {
        do_save(ctx);
    }
}

fn do_save(ctx: Ctx) {
    ctx.save_pending.set_value(false);
    if ctx.problem.with_untracked(Option::is_some) || ctx.other_tab.with_untracked(Option::is_some)
    {
        return;
    }
    let mine = ctx.loaded_rev.get_value();
    if let Some(text) = browser::get(KEY) {
        match peek_revision(&text) {
            Some(r) if r != mine => {
                ctx.other_tab.set(Some(text));
                return;
            }
            Some(_) => {}
            None if ctx.overwrite_ok.get_value() => {}
            None => {
                let reason = decode(&text)
                    .err()
                    .unwrap_or_else(|| "it has no revision".into());
                set_problem(ctx, text, reason);
                return;
            }
        }
    }
    let next = mine + 1;
    ctx.ws.update_untracked(|w| w.revision = next);
    let text = ctx.ws.with_untracked(encode);
    match browser::set(KEY, &text) {
        Ok(()) => {
            ctx.loaded_rev.set_value(next);
            ctx.overwrite_ok.set_value(false);
            if ctx.save_problem.with_untracked(Option::is_some) {
                ctx.save_problem.set(None);
            }
        }
        Err(e) => {
            ctx.ws.update_untracked(|w| w.revision = mine);
            ctx.save_problem.set(Some(format!(
                "Not saved: {e}. Your change stays on screen and saving is tried again on the next change; \
                 free some space or download the list to keep it."
            )));
        }
    }
}

/// The app.
#[component]
pub fn App() -> impl IntoView {
    let (initial, rev, fresh, problem) = match browser::get(KEY) {
        None => (Workspace::new(demo::demo_lists()), 0, true, None),
        Some(text) => match decode(&text) {
            Ok(w) => {
                let r = w.revision;
                (w, r, false, None)
            }
            Err(reason) => (
                Workspace::new(demo::demo_lists()),
                0,
                false,
                Some((text, reason)),
            ),
        },
    };
    let ws = RwSignal::new(initial);
    let checker = StoredValue::new(Checker::new());
    let checks = Memo::new(move |_| {
        let out = ws.with(|w| {
            let members = w.active_list().map(|l| l.members.as_slice()).unwrap_or(&[]);
            let mut got = Vec::new();
            let mut fresh = 0;
            let t0 = browser::precise_ms();
            checker.update_value(|c| (got, fresh) = c.refresh(members));
            browser::note_recheck(browser::precise_ms() - t0, fresh);
            got
        });
        Checks(Arc::new(out))
    });
    let high_contrast = RwSignal::new(browser::get(THEME_KEY).as_deref() == Some("high-contrast"));
    let ctx = Ctx {
        ws,
        selected: RwSignal::new(0),
        generation: RwSignal::new(0),
        undo: RwSignal::new(None),
        checks,
        high_contrast,
        perry: RwSignal::new(false),
        compare: RwSignal::new(false),
        problem: RwSignal::new(None),
        save_problem: RwSignal::new(None),
        other_tab: RwSignal::new(None),
        update_ready: RwSignal::new(false),
        resize: RwSignal::new(0),
        loaded_rev: StoredValue::new(rev),
        overwrite_ok: StoredValue::new(false),
        save_pending: StoredValue::new(false),
        units: RwSignal::new(crate::units_view::load()),
        sheet: RwSignal::new(None),
    };
    provide_context(ctx.units);
    if let Some((raw, reason)) = problem {
        set_problem(ctx, raw, reason);
    }

    Effect::new(move |prev: Option<()>| {
        ws.track();
        if prev.is_some() || fresh {
            schedule_save(ctx);
        }
    });
    Effect::new(move |_| {
        let on = high_contrast.get();
        browser::body_class("high-contrast", on);
        let _ = browser::set(THEME_KEY, if on { "high-contrast" } else { "standard" });
    });
    let storage_listener = window_event_listener(ev::storage, move |e| {
        if e.key().as_deref() != Some(KEY) {
            return;
        }
        if let Some(text) = e.new_value() {
            if peek_revision(&text) != Some(ctx.loaded_rev.get_value()) {
                ctx.other_tab.set(Some(text));
            }
        }
    });
    let resize_listener =
        window_event_listener(ev::resize, move |_| ctx.resize.update(|n| *n += 1));
    let hide_listener = window_event_listener_untyped("pagehide", move |_| flush_save(ctx));
    let visibility_listener =
        window_event_listener_untyped("visibilitychange", move |_| flush_save(ctx));
    let orient_listener =
        window_event_listener_untyped("orientationchange", move |_| ctx.resize.update(|n| *n += 1));
    on_cleanup(move || {
        storage_listener.remove();
        resize_listener.remove();
        orient_listener.remove();
        hide_listener.remove();
        visibility_listener.remove();
    });
    browser::register_service_worker(move || ctx.update_ready.set(true));
    let active_list = Memo::new(move |_| ws.with(|w| w.active));

    view! {
        <div class="app">
            <header class="topbar">
                <h1 class="brand">"Strutline"</h1>
                <p class="tagline">"compression members, checked as you type"</p>
                <button
                    type="button"
                    class="theme-toggle"
                    data-testid="contrast-toggle"
                    aria-pressed=move || if high_contrast.get() { "true" } else { "false" }
                    on:click=move |_| high_contrast.update(|v| *v = !*v)
                >
                    {move || if high_contrast.get() { "◐ Standard theme" } else { "◑ High contrast (outdoors)" }}
                </button>
            </header>
            <Banners ctx=ctx />
            <div class="tools screen-only">
                <button type="button" data-testid="units-toggle" on:click=move |_| {
                    let next = if ctx.units.get_untracked() == UnitSystem::Si { UnitSystem::Us } else { UnitSystem::Si };
                    ctx.units.set(next);
                    let _ = browser::set(crate::units_view::KEY, crate::units_view::stored_text(next));
                    ctx.generation.update(|g| *g += 1);
                }>{move || if ctx.units.get() == UnitSystem::Si { "Units: SI (kN, mm, MPa) · show US" } else { "Units: US (kip, in, ft, ksi) · show SI" }}</button>
                <button type="button" data-testid="open-sheet" on:click=move |_| ctx.sheet.set(Some(chart_image(ctx)))>"Calc sheet of this list"</button>
            </div>
            {move || ctx.sheet.get().map(|img| view! { <CalcSheet ctx=ctx chart=img /> })}
            <main class="panes" class:screen-only=move || ctx.sheet.with(Option::is_some)>
                <section class="pane pane-list" aria-labelledby="h-list">
                    <ListPanel ctx=ctx />
                    <crate::exchange::Exchange ws=ws units=ctx.units select=Callback::new(move |i| ctx.select(i)) />
                </section>
                <section class="pane pane-editor" aria-labelledby="h-editor">
                    {made_afresh(Signal::derive(move || key_of(&(ctx.generation.get(), active_list.get()))), Arc::new(move || {
                        view! { <Editor ctx=ctx /> }
                    }.into_any()))}
                    <panels::SectionPicker ctx=ctx />
                </section>
                <section class="pane pane-results" aria-labelledby="h-results">
                    <Results ctx=ctx />
                </section>
            </main>
        </div>
    }
}

/// A button of a banner.
pub(crate) struct Action {
    label: &'static str,
    testid: &'static str,
    quiet: bool,
    run: Callback<()>,
}

pub(crate) fn act(
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
pub(crate) fn banner(
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

fn undo_now(ctx: Ctx) {
    let Some(u) = ctx.undo.get_untracked() else {
        return;
    };
    ctx.undo.set(None);
    match u {
        Undo::Member { list, deleted } => {
            let mut at = None;
            ctx.ws.update(|w| {
                w.active = list.min(w.lists.len().saturating_sub(1));
                if let Some(l) = w.active_list_mut() {
                    at = Some(listops::undo_delete(&mut l.members, *deleted));
                }
            });
            ctx.select(at.unwrap_or(0));
        }
        Undo::List(d) => {
            ctx.ws.update(|w| {
                let at = listops::undo_delete_list(&mut w.lists, d);
                w.active = at;
            });
            ctx.select(0);
        }
        Undo::Edit { list, before, .. } => {
            ctx.ws.update(|w| {
                if let Some(l) = w.lists.get_mut(list) {
                    l.members = before;
                    w.active = list;
                }
            });
            ctx.select(ctx.selected.get_untracked());
        }
    }
}

fn load_theirs(ctx: Ctx, theirs: &str) {
    match decode(theirs) {
        Ok(w) => {
            ctx.loaded_rev.set_value(w.revision);
            ctx.other_tab.set(None);
            ctx.ws.set(w);
            ctx.undo.set(None);
            ctx.select(0);
        }
        Err(reason) => {
            ctx.other_tab.set(None);
            set_problem(ctx, theirs.to_string(), reason);
        }
    }
}

fn keep_mine(ctx: Ctx, theirs: &str) {
    let mine = ctx.loaded_rev.get_value();
    ctx.loaded_rev
        .set_value(peek_revision(theirs).unwrap_or(mine));
    ctx.overwrite_ok.set_value(true);
    ctx.other_tab.set(None);
    schedule_save(ctx);
}

fn download_workspace(ctx: Ctx) {
    let name = format!("strutline-workspace-{}.json", browser::now_ms() as u64);
    let text = ctx.ws.with_untracked(encode);
    let _ = browser::download(&name, &text, "application/json");
}

fn discard_unreadable(ctx: Ctx, aside: Option<&str>) {
    if let Some(k) = aside {
        browser::remove(k);
    }
    ctx.overwrite_ok.set_value(true);
    ctx.problem.set(None);
    schedule_save(ctx);
}

#[component]
fn Banners(ctx: Ctx) -> impl IntoView {
    let update = move || {
        ctx.update_ready.get().then(|| {
            banner(
                "update-ready",
                "banner-info",
                false,
                vec!["↻ A new version of Strutline is ready.".into()],
                vec![
                    act("Reload to update", "", false, browser::apply_update),
                    act("Later", "", true, move || ctx.update_ready.set(false)),
                ],
            )
        })
    };
    let problem = move || {
        ctx.problem.get().map(|p| {
            let where_kept = match &p.aside {
                Some(k) => format!("It is left untouched, with a copy under the storage key \"{k}\"."),
                None => "It is left untouched (a spare copy could not be stored).".to_string(),
            };
            let raw = p.raw.clone();
            let aside = p.aside.clone();
            banner(
                "storage-problem",
                "banner-problem",
                true,
                vec![
                    format!("⚠ The saved workspace could not be read: {}", p.reason),
                    format!("{where_kept} You are looking at the demo list; nothing is saved until you decide."),
                ],
                vec![
                    act("Download the unreadable copy", "download-unreadable", false, move || {
                        let name = format!("strutline-unreadable-{}.json", browser::now_ms() as u64);
                        let _ = browser::download(&name, &raw, "application/json");
                    }),
                    act("Discard the unreadable copy and save from now on", "discard-unreadable", false, move || {
                        discard_unreadable(ctx, aside.as_deref())
                    }),
                ],
            )
        })
    };
    let save = move || {
        ctx.save_problem.get().map(|msg| {
            banner(
                "save-problem",
                "banner-problem",
                true,
                vec![format!("⚠ {msg}")],
                vec![act("Download the workspace", "", false, move || {
                    download_workspace(ctx)
                })],
            )
        })
    };
    let other = move || {
        ctx.other_tab.get().map(|theirs| {
            let t1 = theirs.clone();
            banner(
                "other-tab",
                "banner-info",
                true,
                vec!["⇄ This workspace was changed in another tab or window. Which version do you want to keep?".into()],
                vec![
                    act("Load theirs", "load-theirs", false, move || load_theirs(ctx, &t1)),
                    act("Keep mine (and save it)", "keep-mine", false, move || keep_mine(ctx, &theirs)),
                ],
            )
        })
    };
    let undo = move || {
        ctx.undo.get().map(|u| {
            let what = match &u {
                Undo::Member { deleted, .. } => {
                    format!("Member \"{}\" deleted.", deleted.member.id)
                }
                Undo::List(d) => format!("List \"{}\" deleted.", d.list.title),
                Undo::Edit { what, .. } => what.clone(),
            };
            banner(
                "undo-bar",
                "banner-undo",
                false,
                vec![what],
                vec![
                    act("↶ Undo", "undo", false, move || undo_now(ctx)),
                    act("Dismiss", "", true, move || ctx.undo.set(None)),
                ],
            )
        })
    };
    view! { <div class="banners" aria-live="polite">{update}{problem}{save}{other}{undo}</div> }
}

#[component]
fn ListPanel(ctx: Ctx) -> impl IntoView {
    let titles = Memo::new(move |_| {
        ctx.ws
            .with(|w| w.lists.iter().map(|l| l.title.clone()).collect::<Vec<_>>())
    });
    let active = Memo::new(move |_| ctx.ws.with(|w| w.active));
    let summary = Memo::new(move |_| {
        ctx.checks.with(|c| {
            let mut n = [0usize; 3];
            for k in c.0.iter() {
                match Standing::of(&k.outcome) {
                    Standing::Holds => n[0] += 1,
                    Standing::Exceeds => n[1] += 1,
                    Standing::NeedsInput => n[2] += 1,
                }
            }
            (c.0.len(), n)
        })
    });
    let title_error = RwSignal::new(None::<String>);
    let tools = RwSignal::new(ListTools::default());
    let selected_id = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map(|m| m.id.clone())
        })
    });
    view! {
        <h2 id="h-list" class="pane-title">"Member lists"</h2>
        <div class="list-bar">
            <div class="field">
                <label for="list-select">"List (one per job)"</label>
                <select
                    id="list-select"
                    name="list"
                    data-testid="list-select"
                    prop:value=move || active.get().to_string()
                    on:change=move |e| {
                        if let Ok(i) = event_target_value(&e).parse::<usize>() {
                            // Picks are ids of the list they were made in.
                            tools.update(|t| t.picks.clear());
                            ctx.ws.update(|w| w.active = i.min(w.lists.len().saturating_sub(1)));
                            ctx.select(0);
                        }
                    }
                >
                    {move || titles.get().into_iter().enumerate().map(|(i, t)| {
                        let label = if t.is_empty() { format!("(untitled list {})", i + 1) } else { t };
                        view! { <option value=i.to_string() selected=move || active.get() == i>{label}</option> }
                    }.into_any()).collect::<Vec<_>>()}
                </select>
            </div>
            {made_afresh(Signal::derive(move || key_of(&active.get())), Arc::new(move || {
                let title = ctx.ws.with_untracked(|w| w.active_list().map(|l| l.title.clone()).unwrap_or_default());
                view! {
                    <div class="field">
                        <label for="list-title">"Name of this list"</label>
                        <input
                            id="list-title"
                            name="title"
                            type="text"
                            autocomplete="off"
                            value=title
                            on:input=move |e| {
                                let t = event_target_value(&e);
                                if t.trim().is_empty() {
                                    title_error.set(Some("title: give the list a name".into()));
                                    return;
                                }
                                title_error.set(None);
                                ctx.ws.update(|w| if let Some(l) = w.active_list_mut() { l.title = t.trim().to_string(); });
                            }
                        />
                        {move || title_error.get().map(|m| view! { <p class="field-error" data-testid="field-error">{m}</p> })}
                    </div>
                }
            }.into_any()))}
            <div class="button-row">
                <button type="button" data-testid="new-list" on:click=move |_| {
                    ctx.ws.update(|w| {
                        let title = listops::free_title(&w.lists, "New job");
                        w.lists.push(strutline_core::file::MemberFile::new(title));
                        w.active = w.lists.len() - 1;
                    });
                    ctx.select(0);
                }>"+ New list"</button>
                <button type="button" data-testid="delete-list" on:click=move |_| {
                    let mut gone = None;
                    ctx.ws.update(|w| {
                        let a = w.active;
                        gone = listops::delete_list(&mut w.lists, a);
                        w.active = a.min(w.lists.len().saturating_sub(1));
                    });
                    if let Some(d) = gone {
                        ctx.undo.set(Some(Undo::List(d)));
                        ctx.select(0);
                    }
                } disabled=move || titles.with(|t| t.len() <= 1)>"Delete list"</button>
            </div>
        </div>
        <p class="list-summary" role="status">
            {move || {
                let (total, n) = summary.get();
                format!("{total} members · {} ✓ hold · {} ✗ exceed · {} ✎ need input", n[0], n[1], n[2])
            }}
        </p>
        <button type="button" class="add-member" data-testid="add-member" on:click=move |_| {
            if let Some(i) = ctx.with_members(|ms| listops::add(ms, &demo::new_member())) {
                ctx.select(i);
            }
        }>"+ Add member"</button>
        <listbar::ListBar ctx=ctx tools=tools />
        <ol class="member-list">
            <For
                each=move || tools.with(|t| ctx.checks.with(|c| t.shown(&c.0)))
                key=|c| (c.member.id.clone(), Arc::as_ptr(c) as usize)
                children=move |c| view! { <MemberRow ctx=ctx checked=c selected_id=selected_id tools=tools /> }
            />
        </ol>
    }
}

#[component]
fn MemberRow(
    ctx: Ctx,
    checked: Arc<Checked>,
    selected_id: Memo<Option<String>>,
    tools: RwSignal<ListTools>,
) -> impl IntoView {
    let m = &checked.member;
    let id = m.id.clone();
    let standing = Standing::of(&checked.outcome);
    let status = status_text(&checked.outcome);
    let util = utilisation_text(&checked.outcome);
    let detail = format!(
        "{} · L {} mm · N {} kN · {}",
        m.section.describe(),
        for_input(m.length_mm),
        for_input(m.axial_kn),
        m.method.key()
    );
    let id_sel = id.clone();
    let is_selected =
        Memo::new(move |_| selected_id.with(|s| s.as_deref() == Some(id_sel.as_str())));
    let (i1, i2, i3, i4, i5) = (id.clone(), id.clone(), id.clone(), id.clone(), id.clone());
    let i6 = id.clone();
    view! {
        <li
            class="member-row"
            class:selected=move || is_selected.get()
            data-testid="member-row"
            data-id=id.clone()
            on:click=move |e: ev::MouseEvent| {
                // The pick box answers here, so the row is not selected.
                if panels::action(&e).is_some_and(|(act, _)| act == "pick") {
                    tools.update(|t| t.toggle(&i1));
                    return;
                }
                if let Some(i) = ctx.index_of(&i1) {
                    if ctx.selected.get_untracked() != i || !is_selected.get_untracked() {
                        ctx.select(i);
                    }
                }
            }
        >
            <input type="checkbox" class="row-pick" data-testid="member-pick" data-act="pick" data-v=""
                aria-label=format!("Pick {id}") prop:checked=move || tools.with(|t| t.is_picked(&i6)) />
            <button
                type="button"
                class="row-main"
                aria-current=move || if is_selected.get() { "true" } else { "false" }
            >
                <span class="row-id">{id.clone()}</span>
                <span class=format!("row-status {}", standing.class()) data-testid="member-status">{status}</span>
                <span class="row-util" data-testid="member-utilisation">{util}</span>
                <span class="row-detail">{detail}</span>
            </button>
            <div class="row-actions">
                <button type="button" aria-label=format!("Move {id} up")  on:click=move |e: ev::MouseEvent| {
                    e.stop_propagation();
                    if let Some(i) = ctx.index_of(&i2) {
                        if let Some(Some(j)) = ctx.with_members(|ms| listops::move_up(ms, i)) { ctx.select(j); }
                    }
                }>"↑"</button>
                <button type="button" aria-label=format!("Move {id} down")  on:click=move |e: ev::MouseEvent| {
                    e.stop_propagation();
                    if let Some(i) = ctx.index_of(&i3) {
                        if let Some(Some(j)) = ctx.with_members(|ms| listops::move_down(ms, i)) { ctx.select(j); }
                    }
                }>"↓"</button>
                <button type="button" data-testid="duplicate-member" aria-label=format!("Copy {id}")  on:click=move |e: ev::MouseEvent| {
                    e.stop_propagation();
                    if let Some(i) = ctx.index_of(&i4) {
                        if let Some(Some(j)) = ctx.with_members(|ms| listops::duplicate(ms, i)) { ctx.select(j); }
                    }
                }>"Copy"</button>
                <button type="button" data-testid="delete-member" aria-label=format!("Delete {id}")  on:click=move |e: ev::MouseEvent| {
                    e.stop_propagation();
                    if let Some(i) = ctx.index_of(&i5) {
                        let list = ctx.ws.with_untracked(|w| w.active);
                        if let Some(Some(d)) = ctx.with_members(|ms| listops::delete(ms, i)) {
                            ctx.undo.set(Some(Undo::Member { list, deleted: Box::new(d) }));
                            let len = ctx.ws.with_untracked(|w| w.active_list().map_or(0, |l| l.members.len()));
                            ctx.select(i.min(len.saturating_sub(1)));
                        }
                    }
                }>"Delete"</button>
            </div>
        </li>
    }
}

/// A text field of the editor: label, input named by its member-file key,
/// unit and the message of what is wrong while the person types.
#[component]
fn NumField(
    ctx: Ctx,
    field: Field,
    #[prop(optional)] after: Option<Callback<Member>>,
) -> impl IntoView {
    let initial = ctx
        .current()
        .map(|m| fields::read(&m, field.place, field.key))
        .unwrap_or_default();
    let sys = ctx.units.get_untracked();
    let initial = crate::units_view::to_field(sys, field.key, &initial);
    let error = RwSignal::new(None::<String>);
    let input_id = format!("f-{}", field.key);
    let err_id = format!("e-{}", field.key);
    let numeric = !matches!(field.rule, fields::Rule::Text | fields::Rule::OptText);
    let err_id2 = err_id.clone();
    view! {
        <div class="field" class:has-error=move || error.with(Option::is_some)>
            <label for=input_id.clone()>{field.label} <code class="key">{field.key}</code></label>
            <div class="input-row">
                <input
                    type="text"
                    id=input_id.clone()
                    name=field.key
                    inputmode=if numeric { "decimal" } else { "text" }
                    autocomplete="off"
                    spellcheck="false"
                    list=if field.key == "grade" { Some("grades") } else { None }
                    value=initial
                    aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                    aria-describedby=move || error.with(Option::is_some).then(|| err_id2.clone())
                    on:input=move |e| {
                        let text = crate::units_view::from_field(sys, field.key, &event_target_value(&e));
                        let Some(m) = ctx.current() else { return; };
                        match fields::apply(&m, &field, &text) {
                            Ok(new) => match fields::engine_objection(&new, field.key) {
                                Some(msg) => error.set(Some(msg)),
                                None => {
                                    error.set(None);
                                    ctx.commit(new.clone());
                                    if let Some(cb) = after { cb.run(new); }
                                }
                            },
                            Err(msg) => error.set(Some(msg)),
                        }
                    }
                />
                {(!field.unit.is_empty()).then(|| view! { <span class="unit">{crate::units_view::field_unit(sys, field.key, field.unit)}</span> })}
            </div>
            {move || error.get().map(|msg| view! {
                <p class="field-error" data-testid="field-error" id=err_id.clone()>"✎ " {msg}</p>
            })}
        </div>
    }
}

/// A select of options (value "" restores the engine's default).
#[component]
fn ChoiceField(ctx: Ctx, choice: Choice) -> impl IntoView {
    let current = ctx
        .current()
        .map(|m| fields::read(&m, choice.place, choice.key))
        .unwrap_or_default();
    let input_id = format!("f-{}", choice.key);
    let error = RwSignal::new(None::<String>);
    let c2 = choice.clone();
    view! {
        <div class="field">
            <label for=input_id.clone()>{choice.label} <code class="key">{choice.key}</code></label>
            <select id=input_id name=choice.key on:change=move |e| {
                let v = event_target_value(&e);
                let Some(m) = ctx.current() else { return; };
                match fields::apply_choice(&m, &c2, &v) {
                    Ok(new) => { error.set(None); ctx.commit(new); }
                    Err(msg) => error.set(Some(msg)),
                }
            }>
                {choice.options.iter().map(|(v, label)| {
                    let sel = current == *v || (current.is_empty() && v.is_empty());
                    view! { <option value=*v selected=sel>{*label}</option> }
                }.into_any()).collect::<Vec<_>>()}
            </select>
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

#[component]
fn IdField(ctx: Ctx) -> impl IntoView {
    let initial = ctx.current().map(|m| m.id).unwrap_or_default();
    let error = RwSignal::new(None::<String>);
    view! {
        <div class="field" class:has-error=move || error.with(Option::is_some)>
            <label for="f-id">"member id (rename here)" <code class="key">"id"</code></label>
            <input type="text" id="f-id" name="id" autocomplete="off" spellcheck="false" value=initial
                aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                on:input=move |e| {
                    let text = event_target_value(&e);
                    let sel = ctx.selected.get_untracked();
                    match ctx.with_members(|ms| listops::rename(ms, sel, &text)) {
                        Some(Ok(())) => error.set(None),
                        Some(Err(r)) => error.set(Some(r.message())),
                        None => {}
                    }
                } />
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

#[component]
fn AxisRestraint(ctx: Ctx, major: bool) -> impl IntoView {
    let (kf, lf, name, title) = if major {
        (
            fields::K_MAJOR,
            fields::LCR_MAJOR,
            "restraint_major",
            "end conditions, major axis",
        )
    } else {
        (
            fields::K_MINOR,
            fields::LCR_MINOR,
            "restraint_minor",
            "end conditions, minor axis",
        )
    };
    let (k, lcr) = ctx
        .current()
        .map(|m| {
            if major {
                (m.k_major, m.lcr_major_mm)
            } else {
                (m.k_minor, m.lcr_minor_mm)
            }
        })
        .unwrap_or((1.0, None));
    let restraint = RwSignal::new(Restraint::infer(k, lcr));
    let generation = RwSignal::new(0u32);
    let is_length = Memo::new(move |_| restraint.get() == Restraint::Length);
    let after = Callback::new(move |m: Member| {
        let k = if major { m.k_major } else { m.k_minor };
        if let Some(f) = restraint.get_untracked().factor() {
            if (f - k).abs() > 1e-12 {
                restraint.set(Restraint::Factor);
            }
        }
    });
    let select_id = format!("f-{name}");
    view! {
        <div class="axis-restraint">
            <div class="field">
                <label for=select_id.clone()>{title}</label>
                <select id=select_id name=name prop:value=move || restraint.get().value() on:change=move |e| {
                    let r = Restraint::from_value(&event_target_value(&e));
                    restraint.set(r);
                    let Some(mut m) = ctx.current() else { return; };
                    let (kk, ll) = if major { (&mut m.k_major, &mut m.lcr_major_mm) } else { (&mut m.k_minor, &mut m.lcr_minor_mm) };
                    match r {
                        Restraint::Length => {
                            if ll.is_none() {
                                *ll = Some(*kk * m.length_mm);
                            }
                        }
                        other => {
                            if let Some(f) = other.factor() {
                                *kk = f;
                            }
                            *ll = None;
                        }
                    }
                    ctx.commit(m);
                    generation.update(|g| *g += 1);
                }>
                    {Restraint::all().into_iter().map(|r| view! {
                        <option value=r.value() selected=move || restraint.get_untracked() == r>{r.label()}</option>
                    }.into_any()).collect::<Vec<_>>()}
                </select>
            </div>
            {made_afresh(Signal::derive(move || key_of(&(generation.get(), is_length.get()))), Arc::new(move || {let length = is_length.get_untracked(); if length {
                    view! { <NumField ctx=ctx field=lf /> }.into_any()
                } else {
                    view! { <NumField ctx=ctx field=kf after=after /> }.into_any()
                }
            }.into_any()))}
        </div>
    }
}

#[component]
fn Editor(ctx: Ctx) -> impl IntoView {
    let Some(member) = ctx.current() else {
        return view! {
            <h2 id="h-editor" class="pane-title">"Member"</h2>
            <p class="empty">"This list has no members yet. Use “+ Add member” to start one."</p>
        }
        .into_any();
    };
    let kind = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or("rect", |m| fields::kind_of(&m.section))
        })
    });
    let mat_mode = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or(MaterialMode::Steel, |m| MaterialMode::of(&m.material))
        })
    });
    let method = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or(Method::Euler, |m| m.method)
        })
    });
    let title = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map(|m| m.id.clone())
                .unwrap_or_default()
        })
    });
    let initial_kind = fields::kind_of(&member.section);
    let initial_mode = MaterialMode::of(&member.material);
    let initial_method = member.method;
    view! {
        <h2 id="h-editor" class="pane-title">"Member " <span class="editing-id">{move || title.get()}</span></h2>
        <form class="editor" on:submit=|e| e.prevent_default() autocomplete="off">
            <fieldset>
                <legend>"Identity"</legend>
                <IdField ctx=ctx />
                <NumField ctx=ctx field=fields::NOTE />
            </fieldset>
            <fieldset>
                <legend>"Section"</legend>
                <div class="field">
                    <label for="f-kind">"shape" <code class="key">"kind"</code></label>
                    <select id="f-kind" name="kind" on:change=move |e| {
                        let k = event_target_value(&e);
                        if let Some(mut m) = ctx.current() {
                            m.section = fields::section_of_kind(&k, &m.section);
                            ctx.commit(m);
                        }
                    }>
                        {fields::KINDS.iter().map(|(k, label)| view! {
                            <option value=*k selected=*k == initial_kind>{*label}</option>
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                {made_afresh(Signal::derive(move || key_of(&kind.get())), Arc::new(move || {let k = kind.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::section_fields(k).iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::section_choices(k).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
            <fieldset>
                <legend>"Material"</legend>
                <div class="field">
                    <label for="f-material_mode">"material given as"</label>
                    <select id="f-material_mode" name="material_mode" on:change=move |e| {
                        let mode = MaterialMode::from_value(&event_target_value(&e));
                        if let Some(mut m) = ctx.current() {
                            m.material = mode.default_spec();
                            ctx.commit(m);
                        }
                    }>
                        {[MaterialMode::Grade, MaterialMode::Steel, MaterialMode::Timber].into_iter().map(|mm| {
                            let label = match mm {
                                MaterialMode::Grade => "a named grade or strength class",
                                MaterialMode::Steel => "custom steel values",
                                MaterialMode::Timber => "custom timber values",
                            };
                            view! { <option value=mm.value() selected=mm == initial_mode>{label}</option> }
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                <datalist id="grades">
                    {fields::GRADE_SUGGESTIONS.iter().map(|g| view! { <option value=*g></option> }.into_any()).collect::<Vec<_>>()}
                </datalist>
                {made_afresh(Signal::derive(move || key_of(&mat_mode.get())), Arc::new(move || {let mode = mat_mode.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::material_fields(mode).iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::material_choices(mode).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
            <fieldset>
                <legend>"Length and restraint"</legend>
                <NumField ctx=ctx field=fields::MEMBER_FIELDS[0] />
                <AxisRestraint ctx=ctx major=true />
                <AxisRestraint ctx=ctx major=false />
            </fieldset>
            <fieldset>
                <legend>"Design load"</legend>
                <NumField ctx=ctx field=fields::MEMBER_FIELDS[1] />
                <details class="bending-input" open=ctx.current().is_some_and(|m| m.has_moments())>
                    <summary>"Moments and lateral restraint"</summary>
                    <div class="field-grid">
                        {fields::BENDING_FIELDS.iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                        {fields::bending_choices().into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                    </div>
                    <div inner_html=move || {
                        let sel = ctx.selected.get();
                        let sys = ctx.units.get();
                        ctx.checks.with(|c| c.0.get(sel).map(|c| crate::diagram::svg(&c.member, sys))).unwrap_or_default()
                    }></div>
                </details>
            </fieldset>
            <fieldset>
                <legend>"Method"</legend>
                <div class="field">
                    <label for="f-method">"design method" <code class="key">"method"</code></label>
                    <select id="f-method" name="method" on:change=move |e| {
                        if let Some(me) = Method::from_key(&event_target_value(&e)) {
                            if let Some(mut m) = ctx.current() {
                                m.method = me;
                                ctx.commit(m);
                            }
                        }
                    }>
                        {Method::ALL.iter().map(|me| view! {
                            <option value=me.key() selected=*me == initial_method>{me.title()}</option>
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                {made_afresh(Signal::derive(move || key_of(&method.get())), Arc::new(move || {let me = method.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::option_fields(me).into_iter().map(|f| view! { <NumField ctx=ctx field=f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::method_choices(me).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
        </form>
    }
    .into_any()
}

#[component]
fn Results(ctx: Ctx) -> impl IntoView {
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
            Some(c) => report::verdict_html(&c, units.get()),
        }></div>
        <Chart ctx=ctx current=current />
        <div class="working-block" inner_html=move || {
            let sys = units.get();
            current.get().map(|c| {
                let mut h = crate::sectionview::of_checked(&c);
                if let Ok(r) = &c.outcome {
                    h.push_str(&report::working_html(r, sys));
                }
                if let Some(p) = &c.prepared {
                    h.push_str(&report::whatif_html(p, sys));
                }
                h
            }).unwrap_or_default()
        }></div>
    }
}

/// The selected member's id and its chart as a PNG data URL.
fn chart_image(ctx: Ctx) -> Option<(String, String, String)> {
    let id = ctx.current()?.id;
    let el = document().get_element_by_id("envelope")?;
    let c: web_sys::HtmlCanvasElement = wasm_bindgen::JsCast::dyn_into(el).ok()?;
    // The legend's items as drawn (the app's own markup, texts escaped).
    let legend = document()
        .query_selector(".chart-legend")
        .ok()
        .flatten()
        .map(|l| l.inner_html())
        .unwrap_or_default();
    Some((id, c.to_data_url().ok()?, legend))
}

/// The calc sheet of the open list, built as text by
/// [`report::sheet_html`], with buttons to print it and to close it.
#[component]
fn CalcSheet(ctx: Ctx, chart: Option<(String, String, String)>) -> impl IntoView {
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
            .map(|(id, url, legend)| (id.as_str(), url.as_str(), legend.as_str())),
        ctx.units.get_untracked(),
    );
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
fn legend_html(perry: bool, others: Option<&[(Method, chart::data::Curve)]>) -> String {
    let mut h = String::from(
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
            h.push_str(&format!(
                "<li><span class=\"sw sw-perry{}\"></span>Perry-Robertson, bow L_cr/{bow}</li>",
                i + 1
            ));
        }
    }
    match others {
        Some([]) => h.push_str("<li>no other method applies to this member</li>"),
        Some(list) => {
            h.push_str("<li>other methods, each the lower of its two axis curves:</li>");
            for (m, c) in list {
                h.push_str("<li data-method=\"");
                h.push_str(m.key());
                h.push_str("\"><span class=\"sw sw-m sw-m");
                h.push(char::from(b'0' + *m as u8));
                h.push_str("\"></span>");
                h.push_str(&report::esc(&c.label));
                h.push_str("</li>");
            }
        }
        None => {}
    }
    h
}

#[component]
fn Chart(ctx: Ctx, current: Memo<Option<Arc<Checked>>>) -> impl IntoView {
    let canvas = NodeRef::<leptos::html::Canvas>::new();
    let note = RwSignal::new(None::<String>);
    let described = RwSignal::new(String::new());
    let legend = RwSignal::new(String::new());
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
            <ul class="chart-legend" aria-label="Chart legend" inner_html=move || legend.get()></ul>
            <p class="chart-description">{move || described.get()}</p>
            {move || note.get().map(|n| view! { <p class="chart-note">{n}</p> })}
        </div>
    }
}
