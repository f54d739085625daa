//! The banners above the panes: an update ready, unreadable storage, a
//! failed save, another tab's save, and undo.

use super::save::{discard_unreadable, download_workspace, keep_mine, load_theirs};
use super::*;
use crate::banner::{act, banner};

pub(super) fn undo_now(ctx: Ctx) {
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
            let mut back = None;
            ctx.ws.update(|w| {
                let at = listops::undo_delete_list(&mut w.lists, d);
                w.active = at;
                back = Some(at);
            });
            if let Some(at) = back {
                if ctx.drafts.with_untracked(|k| !k.is_empty()) {
                    ctx.drafts.update(|k| k.list_inserted(at));
                }
            }
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

#[component]
pub(super) fn Banners(ctx: Ctx) -> impl IntoView {
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
