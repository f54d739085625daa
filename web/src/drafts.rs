//! Texts typed into the editor that cannot be read (yet): "3,5m" in a box
//! in millimetres, a negative load, an emptied length. While a member has
//! one, its last result is withdrawn: the member shows as needing input,
//! with the text and why, never with the figures of an earlier value. The
//! member itself keeps the value it had before that edit (the editor puts
//! it back), so nothing half-typed is ever checked or saved as the member's
//! value, and the typed text is kept here, shown again in its box, until it
//! reads or the person types something else.
//!
//! Kept beside the workspace in storage under [`KEY`] so a reload keeps
//! them too; a draft whose member is gone is dropped ([`Drafts::prune`]).

use serde::{Deserialize, Serialize};
use strutline_core::Error;

/// Storage key of the drafts.
pub const KEY: &str = "strutline.v1.drafts";

/// One unreadable text in one field of one member.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Draft {
    /// The list's position in the workspace.
    pub list: usize,
    /// The member's id.
    pub member: String,
    /// The member-file key of the field.
    pub key: String,
    /// What was typed, as typed.
    pub text: String,
    /// Why it cannot be read, as the field says it.
    pub message: String,
}

impl Draft {
    /// The member's outcome while the draft stands: an error naming the
    /// key, the text and why, and that the member is not checked.
    pub fn error(&self) -> Error {
        let prefix = format!("{}: ", self.key);
        let why = self.message.strip_prefix(&prefix).unwrap_or(&self.message);
        let reason = if self.text.trim().is_empty() {
            format!("{why} (not checked until this field is filled in)")
        } else {
            format!(
                "\u{201c}{}\u{201d} cannot be read: {why} (not checked until it can; \
                 the member keeps its value from before this edit)",
                self.text
            )
        };
        Error::Key {
            key: self.key.clone(),
            reason,
        }
        .in_member(&self.member)
    }
}

/// Every draft of the workspace (usually none or one).
#[derive(Debug, Clone, Default, PartialEq, Serialize, Deserialize)]
pub struct Drafts(Vec<Draft>);

impl Drafts {
    /// Whether there are none.
    pub fn is_empty(&self) -> bool {
        self.0.is_empty()
    }

    /// Sets (or replaces) the draft of one field.
    pub fn set(&mut self, list: usize, member: &str, key: &str, text: &str, message: &str) {
        let d = Draft {
            list,
            member: member.to_string(),
            key: key.to_string(),
            text: text.to_string(),
            message: message.to_string(),
        };
        match self.find(list, member, key).and_then(|i| self.0.get_mut(i)) {
            Some(slot) => *slot = d,
            None => self.0.push(d),
        }
    }

    /// Drops the draft of one field; whether there was one.
    pub fn clear(&mut self, list: usize, member: &str, key: &str) -> bool {
        match self.find(list, member, key) {
            Some(i) => {
                self.0.remove(i);
                true
            }
            None => false,
        }
    }

    /// The draft of one field.
    pub fn get(&self, list: usize, member: &str, key: &str) -> Option<&Draft> {
        self.find(list, member, key).and_then(|i| self.0.get(i))
    }

    /// The first draft of a member (the one its outcome names).
    pub fn first(&self, list: usize, member: &str) -> Option<&Draft> {
        self.0.iter().find(|d| d.list == list && d.member == member)
    }

    /// Every draft of a member.
    pub fn of<'a>(&'a self, list: usize, member: &'a str) -> impl Iterator<Item = &'a Draft> + 'a {
        self.0
            .iter()
            .filter(move |d| d.list == list && d.member == member)
    }

    /// A member renamed: its drafts follow it.
    pub fn rename(&mut self, list: usize, old: &str, new: &str) {
        for d in self
            .0
            .iter_mut()
            .filter(|d| d.list == list && d.member == old)
        {
            d.member = new.to_string();
        }
    }

    /// Drops the drafts whose member no longer exists (`exists(list, id)`);
    /// whether any went.
    pub fn prune(&mut self, exists: impl Fn(usize, &str) -> bool) -> bool {
        let before = self.0.len();
        self.0.retain(|d| exists(d.list, &d.member));
        self.0.len() != before
    }

    /// List `i` deleted: its drafts go, the later lists' follow their list
    /// one place down.
    pub fn list_removed(&mut self, i: usize) {
        self.0.retain(|d| d.list != i);
        for d in self.0.iter_mut().filter(|d| d.list > i) {
            d.list -= 1;
        }
    }

    /// A list put back at `i`: the drafts of the lists from `i` on follow
    /// their list one place up.
    pub fn list_inserted(&mut self, i: usize) {
        for d in self.0.iter_mut().filter(|d| d.list >= i) {
            d.list += 1;
        }
    }

    /// As stored.
    pub fn encode(&self) -> String {
        serde_json::to_string(self).unwrap_or_default()
    }

    /// From storage; unreadable or absent text gives none (a draft is an
    /// unread text, never a value of the member, so none is lost).
    pub fn decode(text: Option<&str>) -> Drafts {
        text.and_then(|t| serde_json::from_str(t).ok())
            .unwrap_or_default()
    }

    fn find(&self, list: usize, member: &str, key: &str) -> Option<usize> {
        self.0
            .iter()
            .position(|d| d.list == list && d.member == member && d.key == key)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_draft_names_member_key_and_text() {
        let mut d = Drafts::default();
        d.set(
            0,
            "C1",
            "length_mm",
            "3,5m",
            "length_mm: must be a number, e.g. 3600",
        );
        let e = d.first(0, "C1").unwrap().error();
        assert_eq!(e.key(), Some("length_mm"));
        let text = e.to_string();
        assert!(
            text.starts_with(
                "member \"C1\": length_mm: \u{201c}3,5m\u{201d} cannot be read: must be a number"
            ),
            "{text}"
        );
        assert!(text.contains("not checked"), "{text}");
        // The key is not said twice.
        assert_eq!(text.matches("length_mm").count(), 1, "{text}");
    }

    #[test]
    fn an_empty_field_asks_to_be_filled() {
        let mut d = Drafts::default();
        d.set(
            0,
            "M2",
            "axial_kn",
            "",
            "axial_kn: enter the design load N_Ed",
        );
        let text = d.first(0, "M2").unwrap().error().to_string();
        assert!(
            text.contains("enter the design load N_Ed (not checked until this field is filled in)"),
            "{text}"
        );
    }

    #[test]
    fn set_replaces_clear_removes_rename_follows_prune_drops() {
        let mut d = Drafts::default();
        d.set(0, "A", "length_mm", "x", "bad");
        d.set(0, "A", "length_mm", "y", "bad");
        d.set(1, "A", "length_mm", "z", "bad");
        assert_eq!(d.get(0, "A", "length_mm").unwrap().text, "y");
        assert_eq!(d.get(1, "A", "length_mm").unwrap().text, "z");
        d.rename(0, "A", "B");
        assert!(d.get(0, "A", "length_mm").is_none());
        assert_eq!(d.get(0, "B", "length_mm").unwrap().text, "y");
        assert!(
            d.get(1, "A", "length_mm").is_some(),
            "another list's member keeps its name"
        );
        assert!(d.prune(|list, id| list == 0 && id == "B"));
        assert!(d.get(1, "A", "length_mm").is_none());
        assert!(!d.prune(|_, _| true));
        assert!(d.clear(0, "B", "length_mm"));
        assert!(!d.clear(0, "B", "length_mm"));
        assert!(d.is_empty());
    }

    #[test]
    fn drafts_follow_their_list_when_a_list_goes_or_comes_back() {
        let mut d = Drafts::default();
        d.set(0, "A", "length_mm", "a", "bad");
        d.set(1, "A", "length_mm", "b", "bad");
        d.set(2, "A", "length_mm", "c", "bad");
        d.list_removed(1);
        assert_eq!(d.get(0, "A", "length_mm").unwrap().text, "a");
        assert_eq!(d.get(1, "A", "length_mm").unwrap().text, "c");
        assert!(d.get(2, "A", "length_mm").is_none());
        d.list_inserted(1);
        assert_eq!(d.get(0, "A", "length_mm").unwrap().text, "a");
        assert!(d.get(1, "A", "length_mm").is_none());
        assert_eq!(d.get(2, "A", "length_mm").unwrap().text, "c");
    }

    #[test]
    fn stored_and_read_back() {
        let mut d = Drafts::default();
        d.set(2, "P1", "axial_kn", "-40", "axial_kn: must be zero or more");
        assert_eq!(Drafts::decode(Some(&d.encode())), d);
        assert!(Drafts::decode(Some("not json")).is_empty());
        assert!(Drafts::decode(None).is_empty());
    }
}
