//! Reading a member file one member at a time (natively; the command line
//! uses it for lists of any length).
//!
//! [`members`] reads the JSON member file from any [`std::io::Read`]
//! (core itself opens no file: the caller hands it the reader) and gives
//! each member to the caller as soon as it is read, so memory does not grow
//! with the length of the list, apart from the ids kept to refuse a
//! repeated one ([`SeenIds`]: a 64-bit hash and the id's bytes each). Every error names the member (its id, or its position when
//! it has none) and the field, a number out of a double's range included
//! (`member "C3": length_mm: number out of range`); a broken file is
//! reported with its line and column.
//!
//! The reader needs `format` and `version` before `members`, as
//! [`MemberFile::to_json`](crate::file::MemberFile::to_json) writes them; a
//! file that lists its members first is reported as [`Stop::MembersFirst`]
//! so the caller can read it whole with [`crate::file::parse`] instead.
//!
//! Every version this build reads has the same member keys (version 2 only
//! added an optional one), so members are read as the current version; a
//! future version that changes a member's keys migrates each member here.

use std::fmt;
use std::io::Read;

use serde::de::{self, DeserializeSeed, MapAccess, SeqAccess, Visitor};
use serde_json::value::RawValue;

use crate::error::Error;
use crate::file::{SheetHeader, FORMAT, VERSION};
use crate::ids::SeenIds;
use crate::member::Member;

/// What is known of the file when a member is handed over.
#[derive(Debug, Clone, PartialEq, Eq, Default)]
pub struct Head {
    /// The list's title ("" when the file has none, or gives it after the members).
    pub title: String,
    /// The file's version, as written.
    pub version: u64,
    /// Members read so far, this one included.
    pub count: usize,
}

/// Why reading stopped.
#[derive(Debug)]
pub enum Stop<X> {
    /// The file is not a valid member file; the error names the member and
    /// the field, or the line and column.
    Bad(Error),
    /// The caller's function returned this.
    Caller(X),
    /// The file gives its members before `format` and `version`; nothing was
    /// handed over. Read it whole with [`crate::file::parse`].
    MembersFirst,
}

impl<X: fmt::Display> fmt::Display for Stop<X> {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Stop::Bad(e) => e.fmt(f),
            Stop::Caller(x) => x.fmt(f),
            Stop::MembersFirst => {
                f.write_str("the file lists its \"members\" before its \"format\" and \"version\"")
            }
        }
    }
}

/// Reads the member file from `reader`, handing each member, in order, to
/// `each` with what is known of the file so far. Returns what was read of
/// the head (title, version, member count) once the whole file is read and
/// found valid.
///
/// Ids are checked as the members come: a repeated id stops the reading
/// with [`Error::DuplicateId`] naming it, after the members before it were
/// handed over, so a caller that writes as it goes must mark its output
/// incomplete when reading stops.
pub fn members<R, F, X>(mut reader: R, each: F) -> Result<Head, Stop<X>>
where
    R: Read,
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    // A UTF-8 byte-order mark at the start is dropped.
    let mut start = Vec::with_capacity(3);
    if let Err(e) = (&mut reader).take(3).read_to_end(&mut start) {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: format!("it cannot be read: {e}"),
        }));
    }
    if start == [0xEF, 0xBB, 0xBF] {
        start.clear();
    }
    let reader = std::io::Cursor::new(start).chain(reader);
    let mut state = State {
        head: Head::default(),
        format_seen: false,
        members_seen: false,
        ids: SeenIds::new(),
        stop: None,
        each,
    };
    let mut de =
        serde_json::Deserializer::from_reader(std::io::BufReader::with_capacity(1 << 16, reader));
    let read = FileSeed(&mut state)
        .deserialize(&mut de)
        .and_then(|()| de.end());
    if let Some(stop) = state.stop.take() {
        return Err(stop);
    }
    if let Err(e) = read {
        return Err(Stop::Bad(syntax(&e)));
    }
    if !state.format_seen {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no \"format\" key".into(),
        }));
    }
    if state.head.version == 0 {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no whole-number \"version\" key".into(),
        }));
    }
    if !state.members_seen {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no \"members\" list".into(),
        }));
    }
    Ok(state.head)
}

/// A member from its JSON text; `index` (0-based) names it when it has no id.
/// Errors name the member and the field's path, a number too large for a
/// double included.
pub fn member_from_str(raw: &str, index: usize) -> Result<Member, Error> {
    if let Ok(m) = serde_json::from_str::<Member>(raw) {
        return Ok(m);
    }
    // The slow road, only for a bad member: read it as the whole-file
    // reader does, so both name the same member, field and fault.
    if let Ok((value, repeat)) = crate::read::value(raw) {
        if let Some(repeat) = repeat {
            let name = crate::file::member_name(Some(&value), index);
            return Err(Error::Syntax {
                line: 0,
                column: 0,
                message: repeat.message(),
            }
            .in_member(&name));
        }
        crate::file::member_from_value(&value, index)?;
    }
    // A number out of a double's range stops the value reader: where, and
    // which member.
    let mut track = serde_path_to_error::Track::new();
    let mut de = serde_json::Deserializer::from_str(raw);
    let outcome = <Member as serde::Deserialize>::deserialize(
        serde_path_to_error::Deserializer::new(&mut de, &mut track),
    );
    // The id alone, skipping every other value unparsed (so a number out
    // of range elsewhere does not hide it).
    #[derive(serde::Deserialize)]
    struct IdOnly {
        id: Option<String>,
    }
    let name = serde_json::from_str::<IdOnly>(raw)
        .ok()
        .and_then(|v| v.id)
        .unwrap_or_else(|| format!("#{}", index + 1));
    let message = match outcome {
        Ok(_) => "unreadable member".to_string(),
        Err(e) => {
            let path = track.path().to_string();
            let inner = without_position(&e);
            if path.is_empty() || path == "." {
                inner
            } else {
                format!("{path}: {inner}")
            }
        }
    };
    Err(Error::Syntax {
        line: 0,
        column: 0,
        message,
    }
    .in_member(&name))
}

/// serde_json's message without its " at line L column C" (which counts
/// within the member's own text, not the file's).
fn without_position(e: &serde_json::Error) -> String {
    let text = e.to_string();
    match text.rsplit_once(" at line ") {
        Some((head, _)) if e.line() > 0 => head.to_string(),
        _ => text,
    }
}

fn syntax(e: &serde_json::Error) -> Error {
    Error::Syntax {
        line: e.line(),
        column: e.column(),
        message: without_position(e),
    }
}

struct State<F, X> {
    head: Head,
    format_seen: bool,
    members_seen: bool,
    ids: SeenIds,
    stop: Option<Stop<X>>,
    each: F,
}

impl<F, X> State<F, X>
where
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    fn bad<E: de::Error>(&mut self, e: Error) -> E {
        self.stop = Some(Stop::Bad(e));
        E::custom("stopped")
    }
}

struct FileSeed<'s, F, X>(&'s mut State<F, X>);

impl<'de, F, X> DeserializeSeed<'de> for FileSeed<'_, F, X>
where
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    type Value = ();
    fn deserialize<D: de::Deserializer<'de>>(self, d: D) -> Result<(), D::Error> {
        d.deserialize_any(self)
    }
}

impl<'de, F, X> Visitor<'de> for FileSeed<'_, F, X>
where
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    type Value = ();

    fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("a member file (a JSON object)")
    }

    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<(), A::Error> {
        let state = self.0;
        // The top-level keys read so far (a handful), to refuse one given
        // twice as the whole-file reader does.
        let mut keys: Vec<String> = Vec::new();
        while let Some(key) = map.next_key::<String>()? {
            if keys.contains(&key) {
                return Err(state.bad(Error::Syntax {
                    line: 0,
                    column: 0,
                    message: crate::read::Repeat::top(&key).message(),
                }));
            }
            keys.push(key.clone());
            match key.as_str() {
                "format" => {
                    let value: serde_json::Value = map.next_value()?;
                    match value.as_str() {
                        Some(FORMAT) => state.format_seen = true,
                        Some(other) => {
                            let reason = format!("its \"format\" is \"{other}\"");
                            return Err(state.bad(Error::NotMemberFile { reason }));
                        }
                        None => {
                            let reason = "its \"format\" is not text".to_string();
                            return Err(state.bad(Error::NotMemberFile { reason }));
                        }
                    }
                }
                "version" => {
                    let value: serde_json::Value = map.next_value()?;
                    let Some(version) = value.as_u64() else {
                        let reason = "it has no whole-number \"version\" key".to_string();
                        return Err(state.bad(Error::NotMemberFile { reason }));
                    };
                    if version == 0 || version > VERSION {
                        return Err(state.bad(Error::UnsupportedVersion {
                            found: version,
                            newest: VERSION,
                        }));
                    }
                    state.head.version = version;
                }
                "title" => {
                    let value: serde_json::Value = map.next_value()?;
                    state.head.title = match value {
                        serde_json::Value::Null => String::new(),
                        serde_json::Value::String(s) => s,
                        _ => {
                            return Err(state.bad(Error::Syntax {
                                line: 0,
                                column: 0,
                                message: "title: expected text".into(),
                            }))
                        }
                    };
                }
                "members" => {
                    if !state.format_seen || state.head.version == 0 {
                        state.stop = Some(Stop::MembersFirst);
                        return Err(de::Error::custom("stopped"));
                    }
                    state.members_seen = true;
                    map.next_value_seed(MembersSeed(&mut *state))?;
                }
                other => {
                    // The sheet's header and keys this reader does not use:
                    // checked as the whole-file reader checks them.
                    let raw: Box<RawValue> = map.next_value()?;
                    let (value, repeat) =
                        crate::read::value(raw.get()).map_err(de::Error::custom)?;
                    if let Some(repeat) = repeat {
                        return Err(state.bad(Error::Syntax {
                            line: 0,
                            column: 0,
                            message: repeat.under(other).message(),
                        }));
                    }
                    if other == "sheet" && !value.is_null() {
                        if let Err(e) = serde_json::from_value::<SheetHeader>(value) {
                            return Err(state.bad(Error::Syntax {
                                line: 0,
                                column: 0,
                                message: format!("sheet: {e}"),
                            }));
                        }
                    }
                }
            }
        }
        Ok(())
    }
}

struct MembersSeed<'s, F, X>(&'s mut State<F, X>);

impl<'de, F, X> DeserializeSeed<'de> for MembersSeed<'_, F, X>
where
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    type Value = ();
    fn deserialize<D: de::Deserializer<'de>>(self, d: D) -> Result<(), D::Error> {
        d.deserialize_seq(self)
    }
}

impl<'de, F, X> Visitor<'de> for MembersSeed<'_, F, X>
where
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    type Value = ();

    fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("the \"members\" list")
    }

    fn visit_seq<A: SeqAccess<'de>>(self, mut seq: A) -> Result<(), A::Error> {
        let state = self.0;
        while let Some(raw) = seq.next_element::<Box<RawValue>>()? {
            let index = state.head.count;
            let member = match member_from_str(raw.get(), index) {
                Ok(m) => m,
                Err(e) => return Err(state.bad(e)),
            };
            if !state.ids.insert(&member.id) {
                let e = Error::DuplicateId {
                    id: member.id.clone(),
                }
                .in_member(&format!("#{}", index + 1));
                return Err(state.bad(e));
            }
            state.head.count += 1;
            if let Err(x) = (state.each)(&state.head, member) {
                state.stop = Some(Stop::Caller(x));
                return Err(de::Error::custom("stopped"));
            }
        }
        Ok(())
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

    fn member(id: &str) -> String {
        format!(
            r#"{{"id": "{id}", "section": {{"kind": "rect", "depth_mm": 100, "width_mm": 50}},
            "material": {{"fy_mpa": 235, "e_mpa": 210000}}, "length_mm": 2000, "axial_kn": 10,
            "method": "euler"}}"#
        )
    }

    fn file(members: &[String]) -> String {
        format!(
            "{{\"format\": \"strutline.members\", \"version\": 2, \"title\": \"t\", \"members\": [{}]}}",
            members.join(",\n")
        )
    }

    fn ids(text: &str) -> (Vec<String>, Result<Head, Stop<&'static str>>) {
        let mut seen = Vec::new();
        let out = members(text.as_bytes(), |_, m| {
            seen.push(m.id);
            Ok::<(), &'static str>(())
        });
        (seen, out)
    }

    fn many(n: usize) -> Vec<String> {
        (0..n).map(|i| member(&format!("C{i}"))).collect()
    }

    #[test]
    fn reads_every_member_in_order_as_the_whole_file_reader_does() {
        let text = file(&many(50));
        let (seen, head) = ids(&text);
        let head = head.unwrap();
        assert_eq!(
            (head.title.as_str(), head.version, head.count),
            ("t", 2, 50)
        );
        let whole = crate::file::parse(&text).unwrap();
        let mut streamed = Vec::new();
        members(text.as_bytes(), |_, m| {
            streamed.push(m);
            Ok::<(), ()>(())
        })
        .unwrap();
        assert_eq!(streamed, whole.members);
        assert_eq!(seen.len(), 50);
        // A byte-order mark and a version-1 file read the same.
        let v1 = format!(
            "\u{feff}{}",
            text.replace("\"version\": 2", "\"version\": 1")
        );
        assert_eq!(ids(&v1).0, seen);
    }

    #[test]
    fn a_number_out_of_range_names_the_member_and_the_field() {
        let mut list = many(5);
        list[3] = list[3].replace("\"length_mm\": 2000", "\"length_mm\": 1e400");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 3);
        let Err(Stop::Bad(e)) = out else {
            panic!("{out:?}")
        };
        let text = e.to_string();
        assert!(
            text.contains("\"C3\"") && text.contains("length_mm: number out of range"),
            "{text}"
        );
    }

    #[test]
    fn wrong_type_midway_names_member_and_field() {
        let mut list = many(2000);
        list[1500] = list[1500].replace("\"depth_mm\": 100", "\"depth_mm\": \"deep\"");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 1500);
        let text = out.unwrap_err().to_string();
        assert!(
            text.contains("\"C1500\"") && text.contains("section") && text.contains("\"deep\""),
            "{text}"
        );
        // The same words as the whole-file reader's.
        let whole = crate::file::parse(&file(&list)).unwrap_err().to_string();
        assert_eq!(text, whole);
        // No id: named by position.
        let mut list = many(3);
        list[2] = list[2].replace("\"id\": \"C2\", ", "");
        let text = ids(&file(&list)).1.unwrap_err().to_string();
        assert!(text.contains("#3") && text.contains("id"), "{text}");
    }

    #[test]
    fn a_duplicate_id_far_down_is_reported_with_the_member() {
        let mut list = many(5000);
        list[4321] = member("C17");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 4321);
        let text = out.unwrap_err().to_string();
        assert!(text.contains("#4322") && text.contains("\"C17\""), "{text}");
    }

    #[test]
    fn a_truncated_file_is_reported_with_its_line() {
        let text = file(&many(100));
        let cut = &text[..text.len() * 2 / 3];
        let (seen, out) = ids(cut);
        assert!(seen.len() < 100);
        let Err(Stop::Bad(Error::Syntax { line, .. })) = out else {
            panic!("{out:?}")
        };
        assert!(line > 1);
        // Cut at the very end: every member read, the file still refused.
        let (seen, out) = ids(&text[..text.len() - 1]);
        assert_eq!(seen.len(), 100);
        assert!(matches!(out, Err(Stop::Bad(_))));
    }

    #[test]
    fn head_problems_and_order() {
        assert!(matches!(
            ids("{\"format\": \"other\", \"version\": 2, \"members\": []}").1,
            Err(Stop::Bad(Error::NotMemberFile { .. }))
        ));
        assert!(matches!(
            ids("{\"format\": \"strutline.members\", \"version\": 9, \"members\": []}").1,
            Err(Stop::Bad(Error::UnsupportedVersion { .. }))
        ));
        assert!(matches!(
            ids("{\"format\": \"strutline.members\", \"version\": 2}").1,
            Err(Stop::Bad(Error::NotMemberFile { .. }))
        ));
        assert!(matches!(
            ids("[1, 2]").1,
            Err(Stop::Bad(Error::Syntax { .. }))
        ));
        let first = format!(
            "{{\"members\": [{}], \"format\": \"strutline.members\", \"version\": 2}}",
            member("A")
        );
        let (seen, out) = ids(&first);
        assert!(seen.is_empty() && matches!(out, Err(Stop::MembersFirst)));
        assert!(crate::file::parse(&first).is_ok());
    }

    #[test]
    fn the_caller_can_stop_the_reading() {
        let text = file(&many(10));
        let mut n = 0;
        let out = members(text.as_bytes(), |_, _| {
            n += 1;
            if n == 4 {
                Err("enough")
            } else {
                Ok(())
            }
        });
        assert!(matches!(out, Err(Stop::Caller("enough"))));
        assert_eq!(n, 4);
    }
}
