//! The member list pane: the lists of the workspace, the summary, the
//! list tools and the rows.

use super::*;

#[component]
pub(super) fn ListPanel(ctx: Ctx) -> impl IntoView {
    let titles = Memo::new(move |_| {
        ctx.ws
            .with(|w| w.lists.iter().map(|l| l.title.clone()).collect::<Vec<_>>())
    });
    let active = Memo::new(move |_| ctx.ws.with(|w| w.active));
    let summary = Memo::new(move |_| {
        ctx.checks.with(|c| {
            let mut n = [0usize; 4];
            for k in c.0.iter() {
                match Standing::of(&k.outcome) {
                    Standing::Holds => n[0] += 1,
                    Standing::Exceeds => n[1] += 1,
                    Standing::NeedsInput => n[2] += 1,
                    Standing::Waiting => n[3] += 1,
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
            <details class="list-fold" data-testid="list-rename">
                <summary>"Rename or delete this list"</summary>
            // Made afresh when another list opens, also when the open list's
            // index stays the same (the list at it deleted or put back):
            // every such change selects a member, which moves `generation`.
            {made_afresh(Signal::derive(move || key_of(&(active.get(), ctx.generation.get()))), Arc::new(move || {
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
                <button type="button" data-testid="delete-list" on:click=move |_| {
                    let mut gone = None;
                    ctx.ws.update(|w| {
                        let a = w.active;
                        gone = listops::delete_list(&mut w.lists, a);
                        w.active = a.min(w.lists.len().saturating_sub(1));
                    });
                    if let Some(d) = gone {
                        let at = d.index;
                        if ctx.drafts.with_untracked(|k| !k.is_empty()) {
                            ctx.drafts.update(|k| k.list_removed(at));
                        }
                        ctx.undo.set(Some(Undo::List(d)));
                        ctx.select(0);
                    }
                } disabled=move || titles.with(|t| t.len() <= 1)>"Delete list"</button>
            </div>
            </details>
        </div>
        <p class="list-summary" role="status">
            {move || {
                let (total, n) = summary.get();
                let mut s = format!("{total} members · {} ✓ hold · {} ✗ exceed · {} ✎ need input", n[0], n[1], n[2]);
                if n[3] > 0 {
                    s.push_str(&format!(" · {} … being checked", n[3]));
                }
                s
            }}
        </p>
        <div class="button-row list-adds">
            <button type="button" class="add-member" data-testid="add-member" on:click=move |_| {
                if let Some(i) = ctx.with_members(|ms| listops::add(ms, &demo::new_member())) {
                    // Its design load is the engineer's to give: until then it
                    // needs input, never "holds" on a made-up load.
                    let list = ctx.ws.with_untracked(|w| w.active);
                    let id = ctx.ws.with_untracked(|w| {
                        w.active_list().and_then(|l| l.members.get(i)).map(|m| m.id.clone())
                    });
                    if let Some(id) = id {
                        ctx.drafts.update(|d| d.set(list, &id, "axial_kn", "", demo::NEW_MEMBER_ASKS));
                    }
                    ctx.select(i);
                }
            }>"+ Add member"</button>
            <button type="button" data-testid="new-list" on:click=move |_| {
                ctx.ws.update(|w| {
                    let title = listops::free_title(&w.lists, "New job");
                    w.lists.push(strutline_core::file::MemberFile::new(title));
                    w.active = w.lists.len() - 1;
                });
                ctx.select(0);
            }>"+ New list"</button>
        </div>
        <listbar::ListBar ctx=ctx tools=tools />
        <Rows ctx=ctx tools=tools selected_id=selected_id />
    }
}

/// The rows of the list, in their own scrolling box, built only for the
/// part in view ([`listops::window`]): the first frame of a list of any
/// length builds a screenful of rows, and the rows beyond each edge of the
/// view ([`listops::OVERSCAN`]) follow once it is on screen. The rows not built are stood in for
/// by the list's padding (set through the style object, which the page's
/// policy allows), so the scroll bar is the whole list's. Arrow keys move
/// from row to row, building the next one when needed.
#[component]
fn Rows(ctx: Ctx, tools: RwSignal<ListTools>, selected_id: Memo<Option<String>>) -> impl IntoView {
    let shown =
        Memo::new(move |_| tools.with(|t| ctx.checks.with(|c| Checks(Arc::new(t.shown(&c.0))))));
    let scroller = NodeRef::<leptos::html::Div>::new();
    let list = NodeRef::<leptos::html::Ol>::new();
    let scroll_top = RwSignal::new(0.0f64);
    // Until the box is laid out, the most of it that can be in view.
    let view_px = RwSignal::new(listops::first_view_px(
        browser::inner_width(),
        browser::inner_height(),
    ));
    // No rows beyond the view before the first frame.
    let overscan = move || {
        if ctx.painted.get() {
            listops::OVERSCAN
        } else {
            0
        }
    };
    let range = Memo::new(move |_| {
        let n = shown.with(|s| s.0.len());
        let (a, b) = listops::window(scroll_top.get(), view_px.get(), n, overscan());
        (a, b, n)
    });
    // The box's height, when laid out and whenever the window changes.
    Effect::new(move |_| {
        ctx.resize.track();
        if !ctx.painted.get() {
            return;
        }
        if let Some(el) = scroller.get() {
            let h = f64::from(el.client_height());
            if h > 0.0 {
                view_px.set(h);
            }
        }
    });
    Effect::new(move |_| {
        let (a, b, n) = range.get();
        if let Some(el) = list.get() {
            let style = web_sys::HtmlElement::style(&el);
            let px = |rows: usize| format!("{}px", rows as f64 * listops::ROW_PITCH_PX);
            let _ = style.set_property("padding-top", &px(a));
            let _ = style.set_property("padding-bottom", &px(n - b));
        }
    });
    // The selected member is brought into view when it is chosen
    // elsewhere (added, copied, moved, picked in another way).
    Effect::new(move |_| {
        let Some(id) = selected_id.get() else { return };
        // Its scroll position needs the layout: not before the first frame.
        if !ctx.painted.get() {
            return;
        }
        let Some(at) = shown.with_untracked(|s| s.0.iter().position(|c| c.member.id == id)) else {
            return;
        };
        reveal(scroller, scroll_top, view_px.get_untracked(), at);
    });
    // The rows read the list and the scroll position themselves, not
    // through `range`: an effect that reads a memo (`range`) and also that
    // memo's own source (`shown`) is not rerun when the memo's value stays
    // the same (an edit that keeps the list's length), so a renamed or
    // re-checked row kept its old text until the next scroll.
    let rows = move || {
        let (top, px, over) = (scroll_top.get(), view_px.get(), overscan());
        shown.with(|s| {
            let (a, b) = listops::window(top, px, s.0.len(), over);
            s.0.get(a..b).map(<[_]>::to_vec).unwrap_or_default()
        })
    };
    view! {
        <div class="member-scroll" data-testid="member-scroll" node_ref=scroller
            on:scroll=move |_| {
                if let Some(el) = scroller.get_untracked() {
                    scroll_top.set(f64::from(el.scroll_top()));
                }
            }
            on:keydown=move |e: ev::KeyboardEvent| {
                let step: isize = match e.key().as_str() {
                    "ArrowDown" => 1,
                    "ArrowUp" => -1,
                    _ => return,
                };
                let Some(id) = row_id_of(&e) else { return };
                let next = shown.with_untracked(|s| {
                    let at = s.0.iter().position(|c| c.member.id == id)?;
                    let j = at.checked_add_signed(step)?;
                    s.0.get(j).map(|c| (j, c.member.id.clone()))
                });
                let Some((j, next_id)) = next else { return };
                e.prevent_default();
                reveal(scroller, scroll_top, view_px.get_untracked(), j);
                // Focus the row once it is built (the next frame at most).
                request_animation_frame(move || focus_row(list, &next_id));
            }
        >
            <ol class="member-list" node_ref=list aria-label="Members"
                on:click=move |e: ev::MouseEvent| row_clicked(ctx, tools, selected_id, &e)>
                <For
                    each=rows
                    key=|c| (c.member.id.clone(), Arc::as_ptr(c) as usize)
                    children=move |c| view! { <MemberRow checked=c selected_id=selected_id tools=tools /> }
                />
            </ol>
        </div>
    }
}

/// Scrolls the list's box so that row `at` is in view (no scroll when it
/// already is), and notes the new position at once.
fn reveal(
    scroller: NodeRef<leptos::html::Div>,
    scroll_top: RwSignal<f64>,
    view_px: f64,
    at: usize,
) {
    let Some(el) = scroller.get_untracked() else {
        return;
    };
    let top = at as f64 * listops::ROW_PITCH_PX;
    let now = f64::from(el.scroll_top());
    let to = if top < now {
        top
    } else if top + listops::ROW_PITCH_PX > now + view_px {
        top + listops::ROW_PITCH_PX - view_px
    } else {
        return;
    };
    el.set_scroll_top(to.max(0.0).round() as i32);
    scroll_top.set(f64::from(el.scroll_top()));
}

/// Answers a click in the list's rows: the pick box (its `data-act`)
/// picks the member, anywhere else selects it. One handler for every row,
/// so that a row is built with no listener of its own.
fn row_clicked(
    ctx: Ctx,
    tools: RwSignal<ListTools>,
    selected_id: Memo<Option<String>>,
    e: &ev::MouseEvent,
) {
    let Some(id) = row_id_of(e) else { return };
    if super::picker_panel::action(e).is_some_and(|(act, _)| act == "pick") {
        tools.update(|t| t.toggle(&id));
        return;
    }
    if let Some(i) = ctx.index_of(&id) {
        if ctx.selected.get_untracked() != i
            || selected_id.with_untracked(|s| s.as_deref() != Some(id.as_str()))
        {
            ctx.select(i);
        }
    }
}

/// The id of the row an event came from.
fn row_id_of(e: &web_sys::Event) -> Option<String> {
    let t: web_sys::Element = wasm_bindgen::JsCast::dyn_into(e.target()?).ok()?;
    t.closest("[data-testid=member-row]")
        .ok()??
        .get_attribute("data-id")
}

/// Focuses the main button of the row with `id`, if it is built.
fn focus_row(list: NodeRef<leptos::html::Ol>, id: &str) {
    let Some(ol) = list.get_untracked() else {
        return;
    };
    let rows = ol.children();
    for i in 0..rows.length() {
        let Some(li) = rows.item(i) else { continue };
        if li.get_attribute("data-id").as_deref() == Some(id) {
            if let Ok(Some(b)) = li.query_selector(".row-main") {
                if let Ok(b) = wasm_bindgen::JsCast::dyn_into::<web_sys::HtmlElement>(b) {
                    let _ = b.focus();
                }
            }
            return;
        }
    }
}

#[component]
pub(super) fn MemberRow(
    checked: Arc<Checked>,
    selected_id: Memo<Option<String>>,
    tools: RwSignal<ListTools>,
) -> impl IntoView {
    let m = &checked.member;
    let id = m.id.clone();
    let standing = Standing::of(&checked.outcome);
    let status = status_text(&checked.outcome);
    let util = utilisation_text(&checked.outcome);
    // In the units shown: a toggle rewrites the text of the rows in view.
    let (section, length_mm, axial_kn, method) =
        (m.section.clone(), m.length_mm, m.axial_kn, m.method.key());
    let detail = move || {
        let system = crate::units_view::current();
        format!(
            "{} · L {} · N {} · {method}",
            crate::units_view::section_text(system, &section),
            crate::units_view::plain_text(system, "mm", length_mm, true),
            crate::units_view::plain_text(system, "kN", axial_kn, false),
        )
    };
    let id_sel = id.clone();
    let is_selected =
        Memo::new(move |_| selected_id.with(|s| s.as_deref() == Some(id_sel.as_str())));
    let i6 = id.clone();
    view! {
        <li
            class="member-row"
            class:selected=move || is_selected.get()
            data-testid="member-row"
            data-id=id.clone()
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
        </li>
    }
}

/// What can be done to one member of the list, shown with the member being
/// edited rather than on every row, so that the rows stay one touch target
/// high and a tablet's list pane shows more of them.
#[derive(Clone, Copy)]
enum RowAct {
    Up,
    Down,
    Copy,
    Delete,
}

impl RowAct {
    const ALL: [RowAct; 4] = [RowAct::Up, RowAct::Down, RowAct::Copy, RowAct::Delete];

    /// The button's text.
    fn label(self) -> &'static str {
        match self {
            RowAct::Up => "↑ Up",
            RowAct::Down => "↓ Down",
            RowAct::Copy => "Copy",
            RowAct::Delete => "Delete",
        }
    }

    /// The button's accessible name for member `id`.
    fn name(self, id: &str) -> String {
        match self {
            RowAct::Up => format!("Move {id} up"),
            RowAct::Down => format!("Move {id} down"),
            RowAct::Copy => format!("Copy {id}"),
            RowAct::Delete => format!("Delete {id}"),
        }
    }

    fn test_id(self) -> &'static str {
        match self {
            RowAct::Up => "move-member-up",
            RowAct::Down => "move-member-down",
            RowAct::Copy => "duplicate-member",
            RowAct::Delete => "delete-member",
        }
    }

    /// Does it to member `id` of the active list and selects where it went
    /// (a deletion can be undone).
    fn run(self, ctx: Ctx, id: &str) {
        let Some(i) = ctx.index_of(id) else { return };
        let to = match self {
            RowAct::Up => ctx.with_members(|ms| listops::move_up(ms, i)).flatten(),
            RowAct::Down => ctx.with_members(|ms| listops::move_down(ms, i)).flatten(),
            RowAct::Copy => ctx.with_members(|ms| listops::duplicate(ms, i)).flatten(),
            RowAct::Delete => {
                let list = ctx.ws.with_untracked(|w| w.active);
                let Some(Some(d)) = ctx.with_members(|ms| listops::delete(ms, i)) else {
                    return;
                };
                ctx.undo.set(Some(Undo::Member {
                    list,
                    deleted: Box::new(d),
                }));
                let len = ctx
                    .ws
                    .with_untracked(|w| w.active_list().map_or(0, |l| l.members.len()));
                Some(i.min(len.saturating_sub(1)))
            }
        };
        if let Some(j) = to {
            ctx.select(j);
        }
    }
}

/// The buttons acting on member `id` (the one being edited): move it up or
/// down the list, copy it, delete it.
#[component]
pub(super) fn MemberActions(ctx: Ctx, id: Memo<String>) -> impl IntoView {
    view! {
        <div class="member-actions" role="group" aria-label="This member in the list">
            {RowAct::ALL.into_iter().map(|act| {
                let name = move || act.name(&id.get());
                view! {
                    <button type="button" data-testid=act.test_id() aria-label=name
                        on:click=move |_| act.run(ctx, &id.get_untracked())>{act.label()}</button>
                }
            }).collect::<Vec<_>>()}
        </div>
    }
}
