//! Saving the workspace to the browser's storage: a save waits for more
//! typing, then checks that no other tab has saved meanwhile and that the
//! stored text is readable ([`decide`], pure and host-tested) before it
//! writes; the choices offered when another tab saved or storage is
//! unreadable.

use super::*;

pub(super) fn set_problem(ctx: Ctx, raw: String, reason: String) {
    let aside = format!("{UNREADABLE_PREFIX}{}", browser::now_ms() as u64);
    let aside = browser::set(&aside, &raw).ok().map(|()| aside);
    ctx.problem.set(Some(Problem { reason, aside, raw }));
}

/// Milliseconds a save waits for more changes: typing into a field saves
/// once, not on every key; leaving the page saves at once.
pub(super) const SAVE_DELAY_MS: u64 = 250;

pub(super) fn schedule_save(ctx: Ctx) {
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
pub(super) fn flush_save(ctx: Ctx) {
    if ctx.save_pending.get_value() {
        do_save(ctx);
    }
}

/// What a save does, decided from what is known before writing.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum SaveStep {
    /// Nothing: a problem or another tab's save waits for the person.
    Wait,
    /// Write the workspace as the next revision.
    Write,
    /// Another tab saved meanwhile: ask which to keep.
    OtherTab,
    /// The stored text cannot be read (the reason): keep it aside, ask.
    Unreadable(String),
}

/// The save-conflict decision. `waiting`: a problem or another tab's
/// save is already shown; `stored`: the text in storage now; `mine`: the
/// revision this tab loaded or last wrote; `overwrite_ok`: the person
/// chose to replace what is stored.
pub fn decide(waiting: bool, stored: Option<&str>, mine: u64, overwrite_ok: bool) -> SaveStep {
    if waiting {
        return SaveStep::Wait;
    }
    let Some(text) = stored else {
        return SaveStep::Write;
    };
    match peek_revision(text) {
        Some(r) if r != mine => SaveStep::OtherTab,
        Some(_) => SaveStep::Write,
        None if overwrite_ok => SaveStep::Write,
        None => SaveStep::Unreadable(
            decode(text)
                .err()
                .unwrap_or_else(|| "it has no revision".into()),
        ),
    }
}

pub(super) fn do_save(ctx: Ctx) {
    ctx.save_pending.set_value(false);
    let waiting = ctx.problem.with_untracked(Option::is_some)
        || ctx.other_tab.with_untracked(Option::is_some);
    let mine = ctx.loaded_rev.get_value();
    let stored = if waiting { None } else { browser::get(KEY) };
    match decide(
        waiting,
        stored.as_deref(),
        mine,
        ctx.overwrite_ok.get_value(),
    ) {
        SaveStep::Wait => return,
        SaveStep::Write => {}
        SaveStep::OtherTab => {
            ctx.other_tab.set(stored);
            return;
        }
        SaveStep::Unreadable(reason) => {
            set_problem(ctx, stored.unwrap_or_default(), reason);
            return;
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

pub(super) fn load_theirs(ctx: Ctx, theirs: &str) {
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

pub(super) fn keep_mine(ctx: Ctx, theirs: &str) {
    let mine = ctx.loaded_rev.get_value();
    ctx.loaded_rev
        .set_value(peek_revision(theirs).unwrap_or(mine));
    ctx.overwrite_ok.set_value(true);
    ctx.other_tab.set(None);
    schedule_save(ctx);
}

pub(super) fn download_workspace(ctx: Ctx) {
    let name = format!("strutline-workspace-{}.json", browser::now_ms() as u64);
    let text = ctx.ws.with_untracked(encode);
    let _ = browser::download(&name, &text, "application/json");
}

pub(super) fn discard_unreadable(ctx: Ctx, aside: Option<&str>) {
    if let Some(k) = aside {
        browser::remove(k);
    }
    ctx.overwrite_ok.set_value(true);
    ctx.problem.set(None);
    schedule_save(ctx);
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::demo_lists;

    fn stored(revision: u64) -> String {
        let mut w = Workspace::new(demo_lists());
        w.revision = revision;
        encode(&w)
    }

    #[test]
    fn writes_over_its_own_revision_or_nothing() {
        assert_eq!(decide(false, None, 0, false), SaveStep::Write);
        assert_eq!(decide(false, Some(&stored(4)), 4, false), SaveStep::Write);
    }

    #[test]
    fn another_tabs_revision_is_not_overwritten() {
        assert_eq!(
            decide(false, Some(&stored(5)), 4, false),
            SaveStep::OtherTab
        );
        assert_eq!(
            decide(false, Some(&stored(5)), 4, true),
            SaveStep::OtherTab,
            "overwrite_ok is for unreadable text only; keep-mine adopts their revision first"
        );
    }

    #[test]
    fn unreadable_text_is_kept_unless_the_person_chose_to_replace_it() {
        match decide(false, Some("{broken"), 3, false) {
            SaveStep::Unreadable(reason) => assert!(reason.contains("not valid JSON"), "{reason}"),
            other => panic!("{other:?}"),
        }
        assert_eq!(
            decide(false, Some("{\"todo\":[]}"), 3, false),
            SaveStep::Unreadable("the saved data has no \"format\" key".into())
        );
        assert_eq!(decide(false, Some("{broken"), 3, true), SaveStep::Write);
    }

    #[test]
    fn waits_while_a_question_is_open() {
        assert_eq!(decide(true, Some("{broken"), 0, false), SaveStep::Wait);
        assert_eq!(decide(true, None, 0, false), SaveStep::Wait);
    }
}
