//! The member file: `{"format": "strutline.members", "version": 3,
//! "title": ..., "members": [...]}`.
//!
//! Reading goes text -> JSON value -> (migration to the current version)
//! -> typed members, so a file of any earlier version is lifted step by
//! step to the current one, and every error names the member and the
//! field. Writing always produces the current version.

use serde::{Deserialize, Serialize};
use serde_json::Value;

use crate::error::{Error, Result};
use crate::member::Member;

/// The value of the `"format"` key.
pub const FORMAT: &str = "strutline.members";

/// The version this build writes; it reads every version from 1 to this.
///
/// Version 2 added the optional member key `angle_connection` (AISC 360-16
/// E5); a version-1 file reads as it was written. Version 3 added the
/// optional bending keys (`m_major_a_knm`, ..., `span_load_major`, `k_lt`,
/// `lcr_lt_mm`, `lt_restrained`, `load_level`, the interaction keys
/// `amplify_moments` and `interaction_annex`, and the given section's
/// `w_el_*_mm3`, `w_pl_*_mm3`), the buckling keys `frame_major`,
/// `frame_minor` and `buckling_model`, and the optional top-level `sheet`
/// (the calc sheet's header); a version-2 file carries none of them. A
/// version-3 file without `interaction_annex` reads unchanged but is now
/// checked against both EN 1993-1-1 annexes (the larger utilisation of each
/// equation) where earlier builds took Annex B: the format is the same, so
/// there is no new version and no migration (docs/member-file.md).
pub const VERSION: u64 = 3;

/// A list of members with a title.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct MemberFile {
    /// Always [`FORMAT`].
    pub format: String,
    /// Always [`VERSION`] once read.
    pub version: u64,
    /// The list's title (e.g. the job name).
    #[serde(default)]
    pub title: String,
    /// The lines of the calc sheet's header, entered once for the list
    /// (optional; written only when one is filled in).
    #[serde(default, skip_serializing_if = "SheetHeader::is_empty")]
    pub sheet: SheetHeader,
    /// The members, in order.
    pub members: Vec<Member>,
}

/// The header every printed page of a list's calc sheet carries, beside
/// the list's title: the member file's optional top-level `"sheet"`
/// object. Every key is optional text; unknown keys are refused, so a
/// misspelt one is not silently lost.
#[derive(Debug, Clone, Default, PartialEq, Eq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct SheetHeader {
    /// The job or project reference.
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub job: String,
    /// Who prepared the calculation.
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub prepared_by: String,
    /// Who checked it.
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub checked_by: String,
    /// Its date, as the person writes it (e.g. 2026-12-04).
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub date: String,
    /// Its revision (e.g. "A", "P2").
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub revision: String,
}

impl SheetHeader {
    /// Whether nothing is filled in.
    pub fn is_empty(&self) -> bool {
        [
            &self.job,
            &self.prepared_by,
            &self.checked_by,
            &self.date,
            &self.revision,
        ]
        .iter()
        .all(|s| s.trim().is_empty())
    }
}

impl MemberFile {
    /// An empty list with a title.
    pub fn new(title: impl Into<String>) -> MemberFile {
        MemberFile {
            format: FORMAT.to_string(),
            version: VERSION,
            title: title.into(),
            sheet: SheetHeader::default(),
            members: Vec::new(),
        }
    }

    /// The file as pretty JSON in the current version.
    pub fn to_json(&self) -> String {
        let mut copy = self.clone();
        copy.format = FORMAT.to_string();
        copy.version = VERSION;
        serde_json::to_string_pretty(&copy).unwrap_or_else(|_| String::from("{}"))
    }

    /// Looks a member up by id.
    pub fn member(&self, id: &str) -> Option<&Member> {
        self.members.iter().find(|m| m.id == id)
    }
}

fn syntax(e: &serde_json::Error) -> Error {
    Error::Syntax {
        line: e.line(),
        column: e.column(),
        message: json_message(e),
    }
}

/// The words for a JSON text that stops inside a value.
pub(crate) const ENDS_EARLY: &str = "the file ends before this value is closed: is it cut short?";

/// What went wrong in a JSON text, in words, without serde_json's own
/// " at line L column C" (the error carries its place): a text that stops
/// inside a value says that the file ends early, as a cut-short download or
/// copy does, rather than the parser's "EOF while parsing ...".
pub(crate) fn json_message(e: &serde_json::Error) -> String {
    if e.is_eof() {
        return ENDS_EARLY.to_string();
    }
    let text = e.to_string();
    match text.rsplit_once(" at line ") {
        Some((head, _)) if e.line() > 0 => head.to_string(),
        _ => text,
    }
}

/// A number too large for a double (`"length_mm": 1e400`) stops the JSON
/// reader before any member is known; this finds the number at the error's
/// position, reads the file again with it as text, and reports it with the
/// member and the field as every other bad value is reported. `None` when
/// the error is another one.
fn out_of_range(text: &str, e: &serde_json::Error) -> Option<Error> {
    if !e.to_string().starts_with("number out of range") {
        return None;
    }
    let line_start: usize = text
        .split_inclusive('\n')
        .take(e.line().saturating_sub(1))
        .map(str::len)
        .sum();
    let at = (line_start + e.column()).min(text.len());
    let number = |c: char| c.is_ascii_digit() || matches!(c, '.' | 'e' | 'E' | '+' | '-');
    let head = text.get(..at)?;
    let start = head.trim_end_matches(number).len();
    let end = at + text.get(at..)?.len() - text.get(at..)?.trim_start_matches(number).len();
    let token = text.get(start..end)?;
    if token.is_empty() {
        return None;
    }
    let quoted = format!("{}\"{token}\"{}", text.get(..start)?, text.get(end..)?);
    let found = parse_once(&quoted, false).err()?;
    // The member's error now says the field holds text; say what it holds.
    let said = crate::read::number_as_text(token);
    let message = found.to_string();
    message.contains(&said).then(|| {
        let rewrite = |inner: &str| inner.replace(&said, &format!("number out of range: {token}"));
        match found {
            Error::InMember { id, source } => match *source {
                Error::Syntax { message, .. } => Error::Syntax {
                    line: e.line(),
                    column: e.column(),
                    message: rewrite(&message),
                }
                .in_member(&id),
                other => other.in_member(&id),
            },
            other => other,
        }
    })
}

/// The refusal of a key given twice, naming the member it is in (by its id,
/// or its position when it has none).
fn repeated(file: &Value, repeat: &crate::read::Repeat) -> Error {
    let error = Error::Syntax {
        line: 0,
        column: 0,
        message: repeat.message(),
    };
    match repeat.member() {
        Some(index) => error.in_member(&member_name(
            file.get("members").and_then(|m| m.get(index)),
            index,
        )),
        None => error,
    }
}

/// A member's name in errors: its id, or its position (`#3`) when it has
/// none.
pub fn member_name(raw: Option<&Value>, index: usize) -> String {
    raw.and_then(|m| m.get("id"))
        .and_then(Value::as_str)
        .map(str::to_string)
        .unwrap_or_else(|| format!("#{}", index + 1))
}

/// Whether a member file of `version` reads into the current types as it
/// stands: every migration from it ([`migrate`]) changes nothing but the
/// `"version"` number (each later version only added optional keys), so
/// such a file is read as it stands ([`from_parsed`]), without copying its
/// value to migrate. A migration that changes more
/// must take its versions out of this; the test
/// `versions_read_as_current_migrate_by_the_number_alone` fails until it does.
pub fn reads_as_current(version: u64) -> bool {
    (1..=VERSION).contains(&version)
}

/// Lifts a file of `version` to the next version; each version adds one arm.
fn migrate(mut value: Value, version: u64) -> Result<Value> {
    // 1 -> 2: version 2 only adds an optional key, so a version-1 file is
    // version 2 as it stands.
    if version == 1 {
        if let Some(o) = value.as_object_mut() {
            o.insert("version".into(), Value::from(2u64));
        }
    }
    // 2 -> 3: version 3 only adds optional keys (moments default to 0), so
    // a version-2 file is version 3 as it stands.
    if version == 2 {
        if let Some(o) = value.as_object_mut() {
            o.insert("version".into(), Value::from(3u64));
        }
    }
    Ok(value)
}

/// Reads a member file from JSON text.
pub fn parse(text: &str) -> Result<MemberFile> {
    parse_once(text, true)
}

/// [`parse`]; `name_range` lets a number out of range be looked for once
/// (see [`out_of_range`]), not again in the text read a second time.
fn parse_once(text: &str, name_range: bool) -> Result<MemberFile> {
    let text = text.trim_start_matches('\u{feff}');
    let (value, repeat) = match crate::read::value(text) {
        Ok(read) => read,
        Err(e) => {
            let named = name_range.then(|| out_of_range(text, &e)).flatten();
            return Err(named.unwrap_or_else(|| syntax(&e)));
        }
    };
    if let Some(repeat) = repeat {
        header(&value)?;
        return Err(repeated(&value, &repeat));
    }
    from_parsed_text(&value, Some(text))
}

/// The format and version of a member file's JSON (its version).
fn header(value: &Value) -> Result<u64> {
    let obj = value.as_object().ok_or_else(|| Error::NotMemberFile {
        reason: "the top level is not a JSON object".into(),
    })?;
    match obj.get("format").and_then(Value::as_str) {
        Some(FORMAT) => {}
        Some(other) => {
            return Err(Error::NotMemberFile {
                reason: format!("its \"format\" is \"{other}\""),
            })
        }
        None => {
            return Err(Error::NotMemberFile {
                reason: "it has no \"format\" key".into(),
            })
        }
    }
    let version =
        obj.get("version")
            .and_then(Value::as_u64)
            .ok_or_else(|| Error::NotMemberFile {
                reason: "it has no whole-number \"version\" key".into(),
            })?;
    if version == 0 || version > VERSION {
        return Err(Error::UnsupportedVersion {
            found: version,
            newest: VERSION,
        });
    }
    Ok(version)
}

/// A member file from JSON already parsed (a list inside the browser's
/// stored workspace, which the app wrote itself): [`parse`] without
/// reading text again; older versions migrate the same way. A key
/// repeated in the text is not seen here (the parsed value kept one).
pub fn from_value(value: Value) -> Result<MemberFile> {
    from_parsed(&value)
}

/// [`from_value`] of a value the caller keeps, to free when it suits it
/// (the app frees its stored workspace's after the first frame). A version
/// that reads as the current one ([`reads_as_current`]) is read as it
/// stands; an older one is migrated on a copy.
pub fn from_parsed(value: &Value) -> Result<MemberFile> {
    from_parsed_text(value, None)
}

/// [`from_parsed`] of a value parsed from `text`, where there is one: a
/// member's fault is then told with its line and column in the text
/// ([`placed_in_file`]).
fn from_parsed_text(value: &Value, text: Option<&str>) -> Result<MemberFile> {
    let version = header(value)?;
    if reads_as_current(version) {
        return read_current(value, text);
    }
    let mut owned = value.clone();
    let mut v = version;
    while v < VERSION {
        owned = migrate(owned, v)?;
        v += 1;
    }
    read_current(&owned, None)
}

/// The members, title and sheet of a member file's value in the current
/// version, parsed from `text` where there is one.
fn read_current(value: &Value, text: Option<&str>) -> Result<MemberFile> {
    let obj = value.as_object().ok_or_else(|| Error::NotMemberFile {
        reason: "the top level is not a JSON object".into(),
    })?;
    let title = match obj.get("title") {
        None | Some(Value::Null) => String::new(),
        Some(Value::String(s)) => s.clone(),
        Some(_) => {
            return Err(Error::Syntax {
                line: 0,
                column: 0,
                message: "title: expected text".into(),
            })
        }
    };
    let sheet = match obj.get("sheet") {
        None | Some(Value::Null) => SheetHeader::default(),
        Some(v) => serde_json::from_value(v.clone()).map_err(|e| Error::Syntax {
            line: 0,
            column: 0,
            message: format!("sheet: {e}"),
        })?,
    };
    let raw_members = match obj.get("members") {
        Some(Value::Array(a)) => a,
        _ => {
            return Err(Error::NotMemberFile {
                reason: "it has no \"members\" list".into(),
            })
        }
    };
    let mut members = Vec::with_capacity(raw_members.len());
    for (index, raw) in raw_members.iter().enumerate() {
        members
            .push(member_from_value(raw, index).map_err(|e| placed_in_file(e, text, raw, index))?);
    }
    check_unique_ids(&members)?;
    Ok(MemberFile {
        format: FORMAT.to_string(),
        version: VERSION,
        title,
        sheet,
        members,
    })
}

/// A member from a JSON value; `index` (0-based) names it when it has no id.
///
/// Natively the error names the field's path (`section.depth_mm: ...`). In
/// the browser build the path tracking is left out to keep the app within
/// its download budget; the message still names the member and what was
/// wrong, and serde's own words name a missing or unknown field.
pub fn member_from_value(raw: &Value, index: usize) -> Result<Member> {
    let outcome = deserialize_member(raw).map_err(|(path, inner)| {
        if path.is_empty() || path == "." {
            inner
        } else {
            format!("{path}: {inner}")
        }
    });
    outcome.map_err(|message| {
        Error::Syntax {
            line: 0,
            column: 0,
            message,
        }
        // Named only on failure: a long list is read without a copy of
        // every id.
        .in_member(&member_name(Some(raw), index))
    })
}

/// The fault `e` of member `index` (its parsed value `raw`) with its line
/// and column in the file's `text`, natively, where reading the text meets
/// the same fault ([`crate::read::fault_at`]); as it is otherwise.
fn placed_in_file(e: Error, text: Option<&str>, raw: &Value, index: usize) -> Error {
    #[cfg(not(target_arch = "wasm32"))]
    if let Some(text) = text {
        /// The file's members, the rest of the file passed over.
        #[derive(serde::Deserialize)]
        struct Listed {
            #[allow(dead_code)]
            members: Vec<Member>,
        }
        let prefix = format!("members[{index}]");
        return crate::read::placed(e, |said| {
            crate::read::fault_at::<Listed>(text, raw, said, &prefix)
        });
    }
    let _ = (text, raw, index);
    e
}

/// A value of the member file's types (a member, a section, ...) as JSON,
/// or `None` if it cannot be written (the file's types always can).
/// Written as text by the same pretty writer as [`MemberFile::to_json`]
/// and read back, rather than through `serde_json::to_value`: the app
/// already carries that writer and the reader, and another serializer of
/// every type would add several kilobytes to the wasm. The values are the
/// same (numbers round-trip exactly with `float_roundtrip`).
pub fn json_value<T: Serialize>(x: &T) -> Option<Value> {
    serde_json::from_str(&serde_json::to_string_pretty(x).ok()?).ok()
}

/// Deserialises a member, giving on failure the path of the field at fault
/// (natively; empty in the browser build) and serde's message, made plain
/// where serde words it poorly ([`crate::read::plain`]: a material of no
/// accepted form says which forms there are and what it lacks or has too
/// many).
pub fn deserialize_member(raw: &Value) -> std::result::Result<Member, (String, String)> {
    #[cfg(not(target_arch = "wasm32"))]
    let outcome = serde_path_to_error::deserialize::<_, Member>(raw).map_err(|e| {
        let path = e.path().to_string();
        (path, e.into_inner().to_string())
    });
    #[cfg(target_arch = "wasm32")]
    let outcome = <Member as serde::Deserialize>::deserialize(raw)
        .map_err(|e| (String::new(), e.to_string()));
    outcome.map_err(|(path, message)| {
        let message = crate::read::plain(raw, &path, message);
        (path, message)
    })
}

/// Refuses a list in which two members share an id.
pub fn check_unique_ids(members: &[Member]) -> Result<()> {
    let mut seen = crate::ids::SeenIds::with_capacity(members.len(), 8 * members.len());
    for m in members {
        if !seen.insert(&m.id) {
            return Err(Error::DuplicateId { id: m.id.clone() });
        }
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    const ONE: &str = r#"{"format": "strutline.members", "version": 1, "title": "t",
      "members": [{"id": "P1", "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
      "material": {"fy_mpa": 235, "e_mpa": 210000}, "length_mm": 2000, "axial_kn": 10,
      "method": "euler"}]}"#;

    #[test]
    fn versions_read_as_current_migrate_by_the_number_alone() {
        for text in [
            include_str!("../../tests/fixtures/stored/member-file-v1.json"),
            include_str!("../../tests/fixtures/stored/member-file-v2.json"),
            ONE,
        ] {
            let base: Value = serde_json::from_str(text).unwrap();
            for v in (1..VERSION).filter(|v| reads_as_current(*v)) {
                let mut at = base.clone();
                at["version"] = Value::from(v);
                let mut next = at.clone();
                next["version"] = Value::from(v + 1);
                assert_eq!(
                    migrate(at, v).unwrap(),
                    next,
                    "the migration from version {v} changes more than the number: \
                     take {v} out of reads_as_current"
                );
            }
            // Read as it stands, the same file as migrated step by step.
            let v = header(&base).unwrap();
            assert!(reads_as_current(v));
            let mut migrated = base.clone();
            for at in v..VERSION {
                migrated = migrate(migrated, at).unwrap();
            }
            assert_eq!(
                read_current(&migrated, None).unwrap(),
                from_parsed(&base).unwrap()
            );
        }
        assert!(!reads_as_current(0) && !reads_as_current(VERSION + 1));
    }

    #[test]
    fn reads_and_writes_round_trip() {
        let f = parse(ONE).unwrap();
        assert_eq!(f.members.len(), 1);
        assert_eq!(f.members[0].k_minor, 1.0);
        let again = parse(&f.to_json()).unwrap();
        assert_eq!(f, again);
    }

    #[test]
    fn a_parsed_value_reads_as_its_text_does() {
        let v: Value = serde_json::from_str(ONE).unwrap();
        assert_eq!(from_value(v).unwrap(), parse(ONE).unwrap());
        // The same refusals: a duplicate id names the member.
        let two = ONE.replace("}]}", "}, {\"id\": \"P1\", \"section\": {\"kind\": \"round\", \"diameter_mm\": 20}, \"material\": {\"fy_mpa\": 235, \"e_mpa\": 210000}, \"length_mm\": 900, \"axial_kn\": 1, \"method\": \"euler\"}]}");
        let v: Value = serde_json::from_str(&two).unwrap();
        assert_eq!(from_value(v).unwrap_err(), parse(&two).unwrap_err());
        assert!(matches!(parse(&two), Err(Error::DuplicateId { .. })));
    }

    #[test]
    fn the_sheet_header_is_optional_kept_and_checked() {
        // Files without it (every earlier one) read with an empty header
        // and are written without the key.
        let f = parse(ONE).unwrap();
        assert!(f.sheet.is_empty());
        assert!(!f.to_json().contains("\"sheet\""));
        let with = ONE.replace(
            "\"title\": \"t\",",
            "\"title\": \"t\", \"sheet\": {\"job\": \"J-204\", \"prepared_by\": \"R. Amsel\", \
             \"checked_by\": \"T. Okafor\", \"date\": \"2026-12-04\", \"revision\": \"B\"},",
        );
        let f = parse(&with).unwrap();
        assert_eq!(
            f.sheet,
            SheetHeader {
                job: "J-204".into(),
                prepared_by: "R. Amsel".into(),
                checked_by: "T. Okafor".into(),
                date: "2026-12-04".into(),
                revision: "B".into(),
            }
        );
        assert_eq!(parse(&f.to_json()).unwrap(), f, "written and read back");
        let partial = ONE.replace(
            "\"title\": \"t\",",
            "\"title\": \"t\", \"sheet\": {\"revision\": \"C\"},",
        );
        assert_eq!(parse(&partial).unwrap().sheet.revision, "C");
        let misspelt = ONE.replace(
            "\"title\": \"t\",",
            "\"title\": \"t\", \"sheet\": {\"checkd_by\": \"X\"},",
        );
        let e = parse(&misspelt).unwrap_err().to_string();
        assert!(e.contains("sheet") && e.contains("checkd_by"), "{e}");
    }

    #[test]
    fn refuses_future_version_naming_supported() {
        let text = ONE.replace("\"version\": 1", "\"version\": 9");
        let e = parse(&text).unwrap_err();
        assert_eq!(
            e,
            Error::UnsupportedVersion {
                found: 9,
                newest: VERSION
            }
        );
        assert!(e.to_string().contains("versions 1 to 3"));
    }

    #[test]
    fn version_1_lifts_and_version_2_keeps_the_angle_connection() {
        let f = parse(ONE).unwrap();
        assert_eq!((f.version, f.members[0].angle_connection), (3, None));
        assert_eq!(migrate(parse_value(ONE), 1).unwrap()["version"], 2);
        let two = ONE.replace("\"version\": 1", "\"version\": 2").replace(
            "\"method\": \"euler\"",
            "\"method\": \"euler\", \"angle_connection\": {\"leg\": \"short\", \"truss\": \"space\"}",
        );
        let c = parse(&two).unwrap().members[0].angle_connection.unwrap();
        assert_eq!(
            (c.leg, c.truss),
            (crate::member::Leg::Short, crate::member::Truss::Space)
        );
        let f = parse(&two).unwrap();
        assert_eq!(parse(&f.to_json()).unwrap(), f);
        let bad = two.replace("\"short\"", "\"middle\"");
        let e = parse(&bad).unwrap_err().to_string();
        assert!(e.contains("angle_connection"), "{e}");
    }

    #[test]
    fn version_2_lifts_and_version_3_keeps_the_bending_keys() {
        let two = ONE.replace("\"version\": 1", "\"version\": 2");
        assert_eq!(migrate(parse_value(&two), 2).unwrap()["version"], 3);
        let f = parse(&two).unwrap();
        assert!(!f.members[0].has_moments());
        let three = ONE.replace("\"version\": 1", "\"version\": 3").replace(
            "\"method\": \"euler\"",
            "\"method\": \"euler\", \"m_major_a_knm\": 12.5, \"m_major_b_knm\": -4, \
             \"m_minor_span_knm\": 2, \"span_load_minor\": \"point\", \"k_lt\": 0.7, \
             \"lt_restrained\": true, \"load_level\": \"compression-flange\"",
        );
        let f = parse(&three).unwrap();
        let m = &f.members[0];
        assert_eq!(
            (m.m_major_a_knm, m.m_major_b_knm, m.m_minor_span_knm),
            (12.5, -4.0, 2.0)
        );
        assert_eq!(m.span_load_minor, crate::member::SpanLoad::Point);
        assert_eq!(m.load_level, crate::member::LoadLevel::CompressionFlange);
        assert!(m.lt_restrained && m.k_lt == 0.7);
        assert_eq!(parse(&f.to_json()).unwrap(), f);
        let bad = three.replace("\"point\"", "\"triangle\"");
        let e = parse(&bad).unwrap_err().to_string();
        assert!(e.contains("P1") && e.contains("span_load_minor"), "{e}");
    }

    #[test]
    fn json_value_is_to_value() {
        let f = parse(include_str!("../../examples/depot-mezzanine.json")).unwrap();
        for m in &f.members {
            assert_eq!(json_value(m), Some(serde_json::to_value(m).unwrap()));
        }
    }

    fn parse_value(text: &str) -> Value {
        serde_json::from_str(text).unwrap()
    }

    #[test]
    fn names_member_and_field_on_wrong_type() {
        let text = ONE.replace("\"length_mm\": 2000", "\"length_mm\": \"long\"");
        let e = parse(&text).unwrap_err().to_string();
        assert!(e.contains("P1") && e.contains("length_mm"), "{e}");
    }

    #[test]
    fn a_number_out_of_range_names_member_and_field() {
        let text = ONE.replace("\"length_mm\": 2000", "\"length_mm\": 1e400");
        let e = parse(&text).unwrap_err().to_string();
        assert!(
            e.contains("\"P1\"") && e.contains("length_mm: number out of range: 1e400"),
            "{e}"
        );
        let text = ONE.replace("\"width_mm\": 50", "\"width_mm\": -2.5E+999");
        let e = parse(&text).unwrap_err().to_string();
        assert!(e.contains("\"P1\"") && e.contains("-2.5E+999"), "{e}");
        // Outside any member: the reader's own words.
        let e = parse("{\"format\": \"strutline.members\", \"version\": 1e999}").unwrap_err();
        assert!(e.to_string().contains("out of range"), "{e}");
    }

    #[test]
    fn refuses_other_json_and_duplicates() {
        assert!(matches!(
            parse("{\"a\":1}"),
            Err(Error::NotMemberFile { .. })
        ));
        assert!(matches!(parse("[1,2"), Err(Error::Syntax { .. })));
        let dup = ONE.replace("]}", ",{\"id\": \"P1\", \"section\": {\"kind\": \"round\", \"diameter_mm\": 20}, \"material\": {\"fy_mpa\": 235, \"e_mpa\": 210000}, \"length_mm\": 1, \"axial_kn\": 1, \"method\": \"euler\"}]}");
        assert_eq!(
            parse(&dup).unwrap_err(),
            Error::DuplicateId { id: "P1".into() }
        );
    }
}
