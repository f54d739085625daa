//! Memoised checks: each member is prepared and checked once per change;
//! a list re-check reuses every result whose member is unchanged.

use std::collections::HashMap;
use std::sync::Arc;

use strutline_core::check::Prepared;
use strutline_core::{CheckResult, Error, Member};

/// A member with its prepared form and its check.
#[derive(Debug, Clone, PartialEq)]
pub struct Checked {
    /// The member as checked.
    pub member: Member,
    /// Section and material resolved, when they are valid.
    pub prepared: Option<Prepared>,
    /// The outcome.
    pub outcome: Result<CheckResult, Error>,
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
                    outcome,
                }
            }
            Err(e) => Checked {
                member: member.clone(),
                prepared: None,
                outcome: Err(e),
            },
        }
    }
}

/// Results remembered by member id.
#[derive(Debug, Default)]
pub struct Checker {
    cache: HashMap<String, Arc<Checked>>,
}

impl Checker {
    /// An empty memory.
    pub fn new() -> Checker {
        Checker::default()
    }

    /// The checks of `members`, in order, and how many were worked afresh.
    pub fn refresh(&mut self, members: &[Member]) -> (Vec<Arc<Checked>>, usize) {
        let mut old = std::mem::take(&mut self.cache);
        let mut fresh = 0usize;
        let mut out = Vec::with_capacity(members.len());
        for m in members {
            let c = match old.remove(&m.id) {
                Some(c) if c.member == *m => c,
                _ => {
                    fresh += 1;
                    Arc::new(Checked::new(m))
                }
            };
            self.cache.insert(m.id.clone(), Arc::clone(&c));
            out.push(c);
        }
        (out, fresh)
    }
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;
    use crate::demo::sample_member;

    #[test]
    fn rechecks_only_changed_members() {
        let mut ms: Vec<Member> = (0..50).map(|i| sample_member(&format!("M{i}"))).collect();
        let mut c = Checker::new();
        let (first, n) = c.refresh(&ms);
        assert_eq!(n, 50);
        assert_eq!(first.len(), 50);
        ms[7].axial_kn = 999.0;
        ms.swap(1, 2);
        let (second, n) = c.refresh(&ms);
        assert_eq!(n, 1, "only the edited member is worked again");
        assert_eq!(second[7].outcome.as_ref().unwrap().id, "M7");
        assert!(Arc::ptr_eq(&second[1], &first[2]));
        let u7 = second[7].outcome.as_ref().unwrap().utilisation;
        let fresh = strutline_core::check_member(&ms[7]).unwrap().utilisation;
        assert_eq!(u7, fresh);
    }

    #[test]
    fn invalid_member_keeps_its_error() {
        let mut m = sample_member("X");
        m.length_mm = 0.0;
        let c = Checked::new(&m);
        assert!(c.prepared.is_none());
        assert_eq!(c.outcome.unwrap_err().field(), Some("length_mm"));
    }
}
