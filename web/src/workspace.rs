//! The workspace as it is kept in the browser's storage: several member
//! lists, the active one, and a revision counter that tells one tab when
//! another has saved.
//!
//! `{"format": "strutline.workspace", "version": 1, "revision": n,
//! "active": i, "lists": [MEMBER FILE, ...]}`; each list is read with
//! [`strutline_core::file::from_parsed`] from the parsed text, so lists of
//! older member-file versions migrate.

use serde_json::{Map, Value};
use strutline_core::file::{self, MemberFile};

/// The storage key of the workspace.
pub const KEY: &str = "strutline.v1.workspace";

/// Prefix of the keys that keep unreadable text aside.
pub const UNREADABLE_PREFIX: &str = "strutline.v1.unreadable.";

/// The value of `"format"`.
pub const FORMAT: &str = "strutline.workspace";

/// The version this build writes and the newest it reads.
pub const VERSION: u64 = 1;

/// Member lists, the active one, and the revision last saved.
#[derive(Debug, Clone, PartialEq)]
pub struct Workspace {
    /// Revision counter: one more on every save.
    pub revision: u64,
    /// Index of the active list.
    pub active: usize,
    /// The lists (at least one).
    pub lists: Vec<MemberFile>,
}

impl Workspace {
    /// A workspace of `lists` (an empty list is added when there is none).
    pub fn new(mut lists: Vec<MemberFile>) -> Workspace {
        if lists.is_empty() {
            lists.push(MemberFile::new("Members"));
        }
        Workspace {
            revision: 0,
            active: 0,
            lists,
        }
    }

    /// The active list.
    pub fn active_list(&self) -> Option<&MemberFile> {
        self.lists.get(self.active)
    }

    /// The active list, to change.
    pub fn active_list_mut(&mut self) -> Option<&mut MemberFile> {
        self.lists.get_mut(self.active)
    }
}

/// The workspace as JSON text ("revision" comes first so that
/// [`peek_revision`] finds it without parsing the whole text).
pub fn encode(ws: &Workspace) -> String {
    // Each list is written by the member file's own writer.
    let mut lists = String::with_capacity(ws.lists.len() * 4096);
    for (i, l) in ws.lists.iter().enumerate() {
        if i > 0 {
            lists.push(',');
        }
        lists.push_str(&l.to_json());
    }
    format!(
        "{{\"revision\":{},\"format\":\"{FORMAT}\",\"version\":{VERSION},\"active\":{},\"lists\":[{lists}]}}",
        ws.revision, ws.active
    )
}

/// The revision of stored text, cheaply: from a leading `"revision"` key
/// as [`encode`] writes it, else by parsing. `None` when there is none.
pub fn peek_revision(text: &str) -> Option<u64> {
    if let Some(rest) = text.trim_start().strip_prefix("{\"revision\":") {
        let digits: String = rest.chars().take_while(char::is_ascii_digit).collect();
        if let Ok(n) = digits.parse() {
            return Some(n);
        }
    }
    let v: Value = serde_json::from_str(text).ok()?;
    v.get("revision").and_then(Value::as_u64)
}

/// The parsed JSON of stored text, kept by [`decode_keeping`] so that the
/// caller frees it when it suits (the app: after its first frame; freeing
/// a 1,000-member list's tree is a good part of reading it).
#[derive(Debug)]
pub struct Parsed {
    _tree: Value,
}

/// Reads stored text. The error says, in words, why it cannot be used.
pub fn decode(text: &str) -> Result<Workspace, String> {
    decode_keeping(text).map(|(ws, _)| ws)
}

/// [`decode`], handing back the parsed text with the workspace.
pub fn decode_keeping(text: &str) -> Result<(Workspace, Parsed), String> {
    let value: Value = serde_json::from_str(text)
        .map_err(|e| format!("the saved workspace is not valid JSON ({e})"))?;
    let obj: &Map<String, Value> = value
        .as_object()
        .ok_or("the saved workspace is not a JSON object")?;
    match obj.get("format").and_then(Value::as_str) {
        Some(FORMAT) => {}
        Some(other) => {
            return Err(format!(
                "the saved data has format \"{other}\", not \"{FORMAT}\""
            ))
        }
        None => return Err("the saved data has no \"format\" key".into()),
    }
    let version = obj
        .get("version")
        .and_then(Value::as_u64)
        .ok_or("the saved workspace has no whole-number \"version\"")?;
    if version == 0 || version > VERSION {
        return Err(format!(
            "the saved workspace is version {version}; this build reads version 1 to {VERSION} \
             (was it saved by a newer Strutline?)"
        ));
    }
    let revision = match obj.get("revision") {
        None => 0,
        Some(v) => v
            .as_u64()
            .ok_or("the saved workspace's \"revision\" is not a whole number")?,
    };
    let active = match obj.get("active") {
        None => 0,
        Some(v) => v
            .as_u64()
            .ok_or("the saved workspace's \"active\" is not a whole number")?
            as usize,
    };
    let raw_lists = match value.get("lists") {
        Some(Value::Array(a)) => a,
        _ => return Err("the saved workspace has no \"lists\" array".into()),
    };
    let mut lists = Vec::with_capacity(raw_lists.len());
    for (i, raw) in raw_lists.iter().enumerate() {
        let title = raw
            .get("title")
            .and_then(Value::as_str)
            .unwrap_or("")
            .to_string();
        // Read from the parsed value: the text is not written and read again.
        let list = file::from_parsed(raw)
            .map_err(|e| format!("list {} (\"{title}\") cannot be read: {e}", i + 1))?;
        lists.push(list);
    }
    let mut ws = Workspace::new(lists);
    ws.revision = revision;
    ws.active = active.min(ws.lists.len().saturating_sub(1));
    Ok((ws, Parsed { _tree: value }))
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::demo_lists;

    #[test]
    fn round_trip() {
        let mut ws = Workspace::new(demo_lists());
        ws.lists.push(MemberFile::new("Second"));
        ws.active = 1;
        ws.revision = 41;
        let text = encode(&ws);
        assert_eq!(peek_revision(&text), Some(41));
        let back = decode(&text).unwrap();
        assert_eq!(back, ws);
        let v: Value = serde_json::from_str(&text).unwrap();
        assert_eq!(v["format"], "strutline.workspace");
        assert_eq!(v["version"], 1);
        assert_eq!(v["lists"][0]["format"], "strutline.members");
    }

    #[test]
    fn peeks_revision_of_other_writers() {
        assert_eq!(peek_revision("{\"format\":\"x\",\"revision\":7}"), Some(7));
        assert_eq!(peek_revision("not json"), None);
        assert_eq!(peek_revision("{\"format\":\"x\"}"), None);
    }

    #[test]
    fn refuses_what_it_cannot_read() {
        let good = encode(&Workspace::new(demo_lists()));
        assert!(decode("{broken").unwrap_err().contains("not valid JSON"));
        assert!(decode("[1]").unwrap_err().contains("not a JSON object"));
        assert!(decode(&good.replace("strutline.workspace", "other.thing"))
            .unwrap_err()
            .contains("\"other.thing\""));
        let future = good.replace("\"version\":1,\"active\"", "\"version\":2,\"active\"");
        assert!(decode(&future).unwrap_err().contains("version 2"));
        // A member inside refused: the whole workspace is refused, naming the list.
        let bad_member = good.replacen("\"length_mm\": 2800.0", "\"length_mm\": \"long\"", 1);
        assert_ne!(bad_member, good);
        let e = decode(&bad_member).unwrap_err();
        assert!(e.contains("list 1") && e.contains("length_mm"), "{e}");
    }

    #[test]
    fn clamps_active_and_fills_empty() {
        let text = format!("{{\"format\":\"{FORMAT}\",\"version\":1,\"active\":9,\"lists\":[]}}");
        let ws = decode(&text).unwrap();
        assert_eq!(ws.lists.len(), 1);
        assert_eq!(ws.active, 0);
        assert_eq!(ws.revision, 0);
    }
}
