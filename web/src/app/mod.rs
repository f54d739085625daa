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
use crate::drafts::{self, Drafts};
use crate::fields::{self, Choice, Field, MaterialMode};
use crate::listops::{self, Deleted, DeletedList, ListTools};
use crate::numtext::{for_input, working};
use crate::report;
use crate::restraint::Restraint;
use crate::status::{status_text, utilisation_text, Standing};
use crate::units_view::step_text;
use crate::workspace::{
    decode, decode_keeping, encode, peek_revision, Workspace, KEY, UNREADABLE_PREFIX,
};

/// Members checked in each later slice, between frames: about 5 ms of the
/// engine's time at the 1,000-member benchmark's 33 µs a member.
const SLICE: usize = 150;

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
    /// For a member with moments, whether the slenderness envelope is
    /// shown instead of the interaction chart.
    slenderness: RwSignal<bool>,
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
    /// The calc sheet when open: the chart of the member it was opened
    /// from, if one was selected.
    sheet: RwSignal<Option<Option<report::SheetChart>>>,
    /// Whether the docked chart is open (narrow and upright screens).
    chart_open: RwSignal<bool>,
    /// Texts in the editor that cannot be read: their members are shown
    /// as needing input, never with an earlier value's result.
    drafts: RwSignal<Drafts>,
    /// Whether the first frame has been drawn. What reads the layout
    /// (the list box's height, the canvas's size) waits for it, so that
    /// `start()` forces no layout and the rows are on screen first.
    painted: RwSignal<bool>,
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

    /// The selected member's draft of `key` ([`crate::drafts`]).
    fn draft(&self, key: &str) -> Option<drafts::Draft> {
        let id = self.current()?.id;
        let list = self.ws.with_untracked(|w| w.active);
        self.drafts
            .with_untracked(|d| d.get(list, &id, key).cloned())
    }

    /// Keeps `typed`, which cannot be read, as the selected member's
    /// draft of `key` (`message` says why): its result is withdrawn.
    fn keep_draft(&self, key: &str, typed: &str, message: &str) {
        let Some(m) = self.current() else { return };
        let list = self.ws.with_untracked(|w| w.active);
        self.drafts
            .update(|d| d.set(list, &m.id, key, typed, message));
    }

    /// Drops the selected member's draft of `key`, if it has one.
    fn drop_draft(&self, key: &str) {
        let Some(m) = self.current() else { return };
        let list = self.ws.with_untracked(|w| w.active);
        if self
            .drafts
            .with_untracked(|d| d.get(list, &m.id, key).is_some())
        {
            self.drafts.update(|d| {
                d.clear(list, &m.id, key);
            });
        }
    }

    /// The draft rule ([`Drafted`]) of the selected member's field `key`,
    /// whose value is `now`, and the text its box starts with: the draft's
    /// text where there is one, else `shown()`.
    fn drafted<T: Send + Sync + 'static>(
        &self,
        key: String,
        now: T,
        shown: impl FnOnce() -> String,
    ) -> (Drafted<T>, String) {
        let draft = self.draft(&key);
        let (text, error) = match draft {
            Some(d) => (d.text, Some(d.message)),
            None => (shown(), None),
        };
        let rule = Drafted {
            ctx: *self,
            key: StoredValue::new(key),
            error: RwSignal::new(error),
            entered: StoredValue::new(now),
        };
        (rule, text)
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

/// The draft rule of one field ([`crate::drafts`]), which the editor's
/// fields, the column-model panel's and the frame's G fields all follow:
/// text that cannot be read is kept as the selected member's draft of the
/// field's key and shown as the field's error, and the value the field had
/// when it was entered is put back, so a half-typed number is never checked
/// or saved; text that reads drops the draft. Made by [`Ctx::drafted`].
struct Drafted<T: Send + Sync + 'static> {
    ctx: Ctx,
    key: StoredValue<String>,
    /// Why the text cannot be read, while it cannot.
    error: RwSignal<Option<String>>,
    /// The value when the field was entered.
    entered: StoredValue<T>,
}

// Copy whatever T is: the fields are handles (a derive would ask T: Copy).
impl<T: Send + Sync + 'static> Clone for Drafted<T> {
    fn clone(&self) -> Self {
        *self
    }
}

impl<T: Send + Sync + 'static> Copy for Drafted<T> {}

impl<T: Clone + PartialEq + Send + Sync + 'static> Drafted<T> {
    /// The field entered with the value `now`: the one to put back, unless
    /// the field's text already cannot be read (then the value from before
    /// that text stays the one).
    fn enter(&self, now: T) {
        if self.error.with_untracked(Option::is_none) {
            self.entered.set_value(now);
        }
    }

    /// `typed` cannot be read (`why`): it is kept as the draft and shown,
    /// and where the value is no longer the one the field was entered with
    /// (`now` differs), that value is handed to `put_back`.
    fn unread(&self, typed: &str, why: String, now: T, put_back: impl FnOnce(T)) {
        self.key.with_value(|k| self.ctx.keep_draft(k, typed, &why));
        self.error.set(Some(why));
        let before = self.entered.get_value();
        if now != before {
            put_back(before);
        }
    }

    /// The text reads: its draft, if any, goes.
    fn read(&self) {
        self.error.set(None);
        self.key.with_value(|k| self.ctx.drop_draft(k));
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

/// Listens to the window: another tab's save, a resize or turn of the
/// screen, focus (the on-screen keyboard), the page hidden or left.
fn listen(ctx: Ctx) {
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
    let resize_listener = window_event_listener(ev::resize, move |_| {
        ctx.resize.update(|n| *n += 1);
        // The on-screen keyboard came or went: the field stays in view.
        browser::reveal_focused_field();
    });
    let focus_listener = window_event_listener(ev::focusin, move |_| {
        // After the on-screen keyboard has had time to come up.
        set_timeout(
            browser::reveal_focused_field,
            std::time::Duration::from_millis(350),
        );
    });
    let hide_listener = window_event_listener_untyped("pagehide", move |_| flush_save(ctx));
    let visibility_listener =
        window_event_listener_untyped("visibilitychange", move |_| flush_save(ctx));
    let orient_listener =
        window_event_listener_untyped("orientationchange", move |_| ctx.resize.update(|n| *n += 1));
    on_cleanup(move || {
        storage_listener.remove();
        resize_listener.remove();
        focus_listener.remove();
        orient_listener.remove();
        hide_listener.remove();
        visibility_listener.remove();
    });
}

mod banners;
mod editor;
mod frame;
mod list;
mod listbar;
mod model;
mod picker_panel;
mod results;
mod save;

use banners::Banners;
use editor::Editor;
use list::ListPanel;
use results::{chart_image, CalcSheet, Results};
use save::{flush_save, schedule_save, set_problem};

/// The app.
#[component]
pub fn App() -> impl IntoView {
    // The parsed text is freed after the first frame, not before it.
    let (initial, rev, fresh, problem, parsed) = match browser::get(KEY) {
        None => (Workspace::new(demo::demo_lists()), 0, true, None, None),
        Some(text) => match decode_keeping(&text) {
            Ok((w, parsed)) => {
                let r = w.revision;
                (w, r, false, None, Some(parsed))
            }
            Err(reason) => (
                Workspace::new(demo::demo_lists()),
                0,
                false,
                Some((text, reason)),
                None,
            ),
        },
    };
    let ws = RwSignal::new(initial);
    let checker = StoredValue::new(Checker::new());
    let selected = RwSignal::new(0usize);
    let painted = RwSignal::new(false);
    // Bumped to check the next slice of a list not checked in full.
    let next_slice = RwSignal::new(0u64);
    // The engine's time and members over the slices since the list was
    // last checked in full (for the benchmarks).
    let pass = StoredValue::new((0.0f64, 0usize));
    let drafts = RwSignal::new(Drafts::decode(browser::get(drafts::KEY).as_deref()));
    let checks = Memo::new(move |prev: Option<&Checks>| {
        next_slice.track();
        let sel = selected.get_untracked();
        let mut out = ws.with(|w| {
            let members = w.active_list().map(|l| l.members.as_slice()).unwrap_or(&[]);
            // The first frame checks the rows it shows (the list opens
            // unfiltered, in its own order, at the top: as many rows as
            // the list's box can show, listops::first_view_px, without the
            // rows beyond the view) and the member selected; the rest
            // follow, a slice between frames.
            let limit = if prev.is_none() {
                let view = listops::first_view_px(browser::inner_width(), browser::inner_height());
                listops::window(0.0, view, members.len(), 0).1
            } else {
                SLICE
            };
            let t0 = browser::precise_ms();
            let r = checker
                .try_update_value(|c| c.refresh(members, Some(sel), limit))
                .unwrap_or_default();
            let (ms, n) = pass.get_value();
            let (ms, n) = (ms + browser::precise_ms() - t0, n + r.fresh);
            if r.waiting == 0 {
                browser::note_recheck(ms, n);
                pass.set_value((0.0, 0));
            } else {
                pass.set_value((ms, n));
            }
            r.checks
        });
        // A member with unreadable text in the editor: its result withdrawn.
        drafts.with(|d| {
            if d.is_empty() {
                return;
            }
            let list = ws.with_untracked(|w| w.active);
            for c in out.iter_mut() {
                if let Some(draft) = d.first(list, &c.member.id) {
                    *c = Arc::new(c.unread(draft.error()));
                }
            }
        });
        Checks(Arc::new(out))
    });
    // After the first frame (a task after its animation frame callbacks);
    // the parsed text in a task of its own after that.
    request_animation_frame(move || {
        set_timeout(move || painted.set(true), std::time::Duration::ZERO);
        set_timeout(move || drop(parsed), std::time::Duration::ZERO);
    });
    // While members wait for their check, one more slice after this frame.
    Effect::new(move |_| {
        if checks.with(|c| c.0.iter().any(|k| k.outcome.is_none())) {
            request_animation_frame(move || {
                set_timeout(
                    move || next_slice.update(|n| *n += 1),
                    std::time::Duration::ZERO,
                )
            });
        }
    });
    let high_contrast = RwSignal::new(browser::get(THEME_KEY).as_deref() == Some("high-contrast"));
    let ctx = Ctx {
        ws,
        selected,
        generation: RwSignal::new(0),
        undo: RwSignal::new(None),
        checks,
        high_contrast,
        perry: RwSignal::new(false),
        compare: RwSignal::new(false),
        slenderness: RwSignal::new(false),
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
        chart_open: RwSignal::new(false),
        drafts,
        painted,
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
    // The drafts kept beside the workspace; a draft whose member is gone
    // (deleted, its list removed) dropped.
    Effect::new(move |prev: Option<()>| {
        let text = drafts.with(|d| (!d.is_empty()).then(|| d.encode()));
        if prev.is_some() {
            match text {
                Some(t) => {
                    let _ = browser::set(drafts::KEY, &t);
                }
                None => browser::remove(drafts::KEY),
            }
        }
    });
    Effect::new(move |_| {
        ws.track();
        if drafts.with_untracked(Drafts::is_empty) {
            return;
        }
        let mut d = drafts.get_untracked();
        let gone = ws.with_untracked(|w| {
            d.prune(|list, id| {
                w.lists
                    .get(list)
                    .is_some_and(|l| l.members.iter().any(|m| m.id == id))
            })
        });
        if gone {
            drafts.set(d);
        }
    });
    // The theme as stored (absent: standard); written when it is changed.
    Effect::new(move |prev: Option<()>| {
        let on = high_contrast.get();
        browser::body_class("high-contrast", on);
        if prev.is_some() {
            let _ = browser::set(THEME_KEY, if on { "high-contrast" } else { "standard" });
        }
    });
    // The page's listeners and the offline copy after the first frame (a
    // task after it), not in start(): there is nothing to save or reveal
    // before the page is seen, another tab's save is still found by the
    // next save (`save::decide` reads the stored revision), and the
    // worker's install fetches every file of dist/ and competed with the
    // first frame (bench/first-frame.md).
    let owner = Owner::current();
    request_animation_frame(move || {
        set_timeout(
            move || {
                browser::register_service_worker(move || ctx.update_ready.set(true));
                match owner {
                    Some(o) => o.with(|| listen(ctx)),
                    None => listen(ctx),
                }
            },
            std::time::Duration::ZERO,
        );
    });
    let active_list = Memo::new(move |_| ws.with(|w| w.active));

    view! {
        <div class="app">
            <header class="topbar">
                <h1 class="brand">"Strutline"</h1>
                <p class="tagline">"compression members, checked as you type"</p>
                <div class="tools screen-only">
                    <button type="button" data-testid="units-toggle" on:click=move |_| {
                        let next = if ctx.units.get_untracked() == UnitSystem::Si { UnitSystem::Us } else { UnitSystem::Si };
                        ctx.units.set(next);
                        let _ = browser::set(crate::units_view::KEY, crate::units_view::stored_text(next));
                        ctx.generation.update(|g| *g += 1);
                    }>{move || if ctx.units.get() == UnitSystem::Si { "Units: SI (kN, mm, MPa) · show US" } else { "Units: US (kip, in, ft, ksi) · show SI" }}</button>
                    <button type="button" data-testid="open-sheet" on:click=move |_| ctx.sheet.set(Some(chart_image(ctx)))>"Calc sheet of this list"</button>
                    <button
                        type="button"
                        class="theme-toggle"
                        data-testid="contrast-toggle"
                        aria-pressed=move || if high_contrast.get() { "true" } else { "false" }
                        on:click=move |_| high_contrast.update(|v| *v = !*v)
                    >
                        {move || if high_contrast.get() { "◐ Standard theme" } else { "◑ High contrast (outdoors)" }}
                    </button>
                </div>
            </header>
            <Banners ctx=ctx />
            {move || ctx.sheet.get().map(|img| view! { <CalcSheet ctx=ctx chart=img /> })}
            <main class="panes" class:chart-open=move || ctx.chart_open.get() class:screen-only=move || ctx.sheet.with(Option::is_some)>
                <section class="pane pane-list" aria-labelledby="h-list">
                    <ListPanel ctx=ctx />
                    // Below the rows: after the first frame, as the editor.
                    <Show when=move || ctx.painted.get()>
                        <crate::exchange::Exchange ws=ws units=ctx.units select=Callback::new(move |i| ctx.select(i)) />
                    </Show>
                </section>
                // The editor and the result come after the first frame,
                // which holds the list's rows (with the caution); until
                // then each pane has its heading.
                <section class="pane pane-editor" aria-labelledby="h-editor">
                    <Show when=move || ctx.painted.get() fallback=|| view! { <h2 id="h-editor" class="pane-title">"Member"</h2> }>
                        {made_afresh(Signal::derive(move || key_of(&(ctx.generation.get(), active_list.get()))), Arc::new(move || {
                            view! { <Editor ctx=ctx /> }
                        }.into_any()))}
                        <picker_panel::SectionPicker ctx=ctx />
                    </Show>
                </section>
                <section class="pane pane-results" aria-labelledby="h-results">
                    <Show when=move || ctx.painted.get() fallback=|| view! {
                        <h2 id="h-results" class="pane-title">"Result"</h2>
                        <p class="caution" data-testid="caution">"⚠ " {CAUTION}</p>
                    }>
                        <Results ctx=ctx />
                    </Show>
                </section>
            </main>
        </div>
    }
}
