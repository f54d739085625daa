//! Memoised checks: each member is prepared and checked once per change;
//! a list re-check reuses every result whose member is unchanged. A long
//! list is checked in slices ([`Checker::refresh`] with a limit): the
//! first frame shows the rows in view checked, the others waiting (shown
//! as such, never with a value), and the rest follow between frames.

use std::sync::Arc;

use rustc_hash::FxHashMap;

use strutline_core::check::Prepared;
use strutline_core::{CheckResult, Error, Member};

/// A member with its prepared form and its check.
#[derive(Debug, Clone, PartialEq)]
pub struct Checked {
    /// The member as checked.
    pub member: Member,
    /// Section and material resolved, when they are valid.
    pub prepared: Option<Prepared>,
    /// The outcome; `None` while the member waits for its check.
    pub outcome: Option<Result<CheckResult, Error>>,
}

impl Checked {
    /// Prepares and checks a member.
    pub fn new(member: &Member) -> Checked {
        match Prepared::new(member) {
            Ok(p) => {
                let outcome = p.check();
                Checked {
                    member: member.clone(),
                    prepared: Some(p),
                    outcome: Some(outcome),
                }
            }
            Err(e) => Checked {
                member: member.clone(),
                prepared: None,
                outcome: Some(Err(e)),
            },
        }
    }

    /// A member not checked yet.
    pub fn waiting(member: &Member) -> Checked {
        Checked {
            member: member.clone(),
            prepared: None,
            outcome: None,
        }
    }

    /// This member while its editor holds text that cannot be read
    /// ([`crate::drafts`]): its result withdrawn, the error says why; the
    /// section and material as prepared stay (the section view and the
    /// frame's G helper need no result).
    pub fn unread(&self, why: Error) -> Checked {
        Checked {
            member: self.member.clone(),
            prepared: self.prepared.clone(),
            outcome: Some(Err(why)),
        }
    }

    /// The check's result, once worked and valid.
    pub fn result(&self) -> Option<&CheckResult> {
        self.outcome.as_ref().and_then(|o| o.as_ref().ok())
    }
}

/// What a [`Checker::refresh`] gave.
#[derive(Debug, Default)]
pub struct Refreshed {
    /// One entry per member, in order.
    pub checks: Vec<Arc<Checked>>,
    /// How many were worked in this call.
    pub fresh: usize,
    /// How many still wait for their check.
    pub waiting: usize,
}

/// Results remembered by member id (hashed by rustc-hash's Fx, not the
/// standard SipHash: every slice of a long list looks up each member, and
/// the ids are the app's own, not an attacker's).
#[derive(Debug, Default)]
pub struct Checker {
    cache: FxHashMap<String, Arc<Checked>>,
}

impl Checker {
    /// An empty memory.
    pub fn new() -> Checker {
        Checker::default()
    }

    /// The checks of `members`, in order. Members unchanged since their
    /// last check keep it; of the others, the one at `urgent` (the member
    /// being edited) and then the first in order are worked, at most
    /// `limit` in all (`usize::MAX`: every one); the rest are
    /// [`Checked::waiting`] until a later call.
    pub fn refresh(
        &mut self,
        members: &[Member],
        urgent: Option<usize>,
        limit: usize,
    ) -> Refreshed {
        let mut old = std::mem::take(&mut self.cache);
        // Sized once: grown entry by entry, a 1,000-member list's map was
        // rehashed some ten times on every slice.
        self.cache.reserve(members.len());
        let mut out = Refreshed {
            checks: Vec::with_capacity(members.len()),
            ..Refreshed::default()
        };
        let mut budget = limit;
        // A member's earlier entry: kept when its check is still good;
        // a waiting one is kept while the member waits (not copied again
        // on every slice).
        let work =
            |m: &Member, before: Option<Arc<Checked>>, out: &mut Refreshed, budget: &mut usize| {
                match before {
                    Some(c) if c.member == *m && c.outcome.is_some() => return c,
                    Some(c) if c.member == *m && *budget == 0 => {
                        out.waiting += 1;
                        return c;
                    }
                    _ => {}
                }
                if *budget == 0 {
                    out.waiting += 1;
                    return Arc::new(Checked::waiting(m));
                }
                *budget -= 1;
                out.fresh += 1;
                Arc::new(Checked::new(m))
            };
        // The earlier entry of an id, with its key (reused, not copied).
        let mut take = |id: &str| {
            old.remove_entry(id)
                .map_or((None, None), |(k, c)| (Some(k), Some(c)))
        };
        let mut first = urgent.and_then(|i| {
            let m = members.get(i)?;
            let mut any = usize::MAX;
            let (key, before) = take(&m.id);
            Some((i, key, work(m, before, &mut out, &mut any)))
        });
        for (i, m) in members.iter().enumerate() {
            let (key, c) = match first.take_if(|(at, _, _)| *at == i) {
                Some((_, key, c)) => (key, c),
                None => {
                    let (key, before) = take(&m.id);
                    (key, work(m, before, &mut out, &mut budget))
                }
            };
            let key = key.unwrap_or_else(|| m.id.clone());
            self.cache.insert(key, Arc::clone(&c));
            out.checks.push(c);
        }
        out
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;

    /// A member with unreadable text: no result, the draft's error, the
    /// prepared section kept.
    #[test]
    fn unread_withdraws_the_result_and_keeps_the_section() {
        let c = Checked::new(&sample_member("U1"));
        assert!(c.result().is_some());
        let mut d = crate::drafts::Drafts::default();
        d.set(0, "U1", "length_mm", "3,5m", "length_mm: must be a number");
        let u = c.unread(d.first(0, "U1").unwrap().error());
        assert!(u.result().is_none());
        assert!(matches!(&u.outcome, Some(Err(e)) if e.key() == Some("length_mm")));
        assert_eq!(u.prepared, c.prepared);
        assert_eq!(u.member, c.member);
    }

    #[test]
    fn rechecks_only_changed_members() {
        let mut ms: Vec<Member> = (0..50).map(|i| sample_member(&format!("M{i}"))).collect();
        let mut c = Checker::new();
        let first = c.refresh(&ms, None, usize::MAX);
        assert_eq!((first.fresh, first.waiting), (50, 0));
        assert_eq!(first.checks.len(), 50);
        ms[7].axial_kn = 999.0;
        ms.swap(1, 2);
        let second = c.refresh(&ms, None, usize::MAX);
        assert_eq!(second.fresh, 1, "only the edited member is worked again");
        assert_eq!(second.checks[7].result().unwrap().id, "M7");
        assert!(Arc::ptr_eq(&second.checks[1], &first.checks[2]));
        let u7 = second.checks[7].result().unwrap().utilisation;
        let fresh = strutline_core::check_member(&ms[7]).unwrap().utilisation;
        assert_eq!(u7, fresh);
    }

    #[test]
    fn a_long_list_is_checked_in_slices_the_urgent_member_first() {
        let ms: Vec<Member> = (0..30).map(|i| sample_member(&format!("M{i}"))).collect();
        let mut c = Checker::new();
        let a = c.refresh(&ms, Some(20), 10);
        assert_eq!((a.fresh, a.waiting), (11, 19));
        // The first ten in order and the urgent one are worked; the rest
        // wait, with no outcome to show.
        for (i, k) in a.checks.iter().enumerate() {
            assert_eq!(k.member.id, format!("M{i}"));
            assert_eq!(k.outcome.is_some(), i < 10 || i == 20, "member {i}");
            if k.outcome.is_none() {
                assert!(k.prepared.is_none() && k.result().is_none());
            }
        }
        let b = c.refresh(&ms, Some(20), 10);
        assert_eq!((b.fresh, b.waiting), (10, 9));
        assert!(
            Arc::ptr_eq(&a.checks[20], &b.checks[20]),
            "kept, not worked again"
        );
        assert!(
            Arc::ptr_eq(&a.checks[25], &b.checks[25]) && b.checks[25].outcome.is_none(),
            "still waiting: the same entry, not a new copy"
        );
        let done = c.refresh(&ms, None, usize::MAX);
        assert_eq!((done.fresh, done.waiting), (9, 0));
        for (k, m) in done.checks.iter().zip(&ms) {
            let u = strutline_core::check_member(m).unwrap().utilisation;
            assert_eq!(k.result().unwrap().utilisation, u);
        }
    }

    #[test]
    fn invalid_member_keeps_its_error() {
        let mut m = sample_member("X");
        m.length_mm = 0.0;
        let c = Checked::new(&m);
        assert!(c.prepared.is_none());
        assert_eq!(c.outcome.unwrap().unwrap_err().field(), Some("length_mm"));
    }
}
