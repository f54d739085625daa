//! Reading a [`SectionSpec`]: as serde's internally tagged derive reads it
//! (the same section, or the same refusal), without buffering the section
//! first when its first key is `kind`, as the member files written by
//! `strutline convert` and the app have it.
//!
//! The derive reads every key and value of the section into serde's
//! `Content` before it knows the kind, then reads the kind's keys from that
//! copy: some 3,900 instructions a member on the command line's reading
//! thread (callgrind, `bench/cli.md`). Here, when `kind` comes first, its
//! value is read as the derive reads the tag ([`Kind`]) and the rest of the
//! section goes straight to the kind's own deserializer ([`Kind::section`]),
//! a second `kind` refused as the derive refuses it; any other section
//! (`kind` later, none, an empty map, a list) is handed to the derive
//! itself ([`Tagged`]), with the first key read put back in front.
//!
//! The same section comes out either way, from text and from a parsed
//! `serde_json::Value`, and the same refusal, in the same words, from a
//! parsed value: the road of every refusal the project shows (the
//! whole-file reader, the CSV reader, the stream's reader of a bad member;
//! the app's stored lists). From text a refusal may be worded otherwise:
//! the derive, having read the section whole first, names a fault of its
//! JSON (a number out of range, say) before a wrong value that comes
//! earlier, and it reads a kind's keys from its copy, where serde_json
//! reading them from the text has words of its own (`"make": 5` is
//! "expected value" from the text, "invalid type: integer `5`, expected
//! string or map" from the copy). The stream names a member whose text has
//! such a fault by reading it [`in_derived_order`], by the derive alone.
//! The unit tests `the_section_reader_answers_as_the_tagged_derive` and
//! `changed_sections_read_as_the_derive_reads_them` hold the two readers to
//! this.

use std::cell::Cell;
use std::fmt;

use serde::de::value::{
    BorrowedStrDeserializer, MapAccessDeserializer, SeqAccessDeserializer, StringDeserializer,
};
use serde::de::{self, DeserializeSeed, MapAccess, SeqAccess, Visitor};
use serde::{Deserialize, Deserializer};

use super::kinds::{Kind, Tagged};
use super::SectionSpec;

thread_local! {
    /// Sections are read by the derive alone (see [`in_derived_order`]).
    static DERIVED_ORDER: Cell<bool> = const { Cell::new(false) };
}

/// Runs `f` with every section read by serde's derive alone, which names
/// the faults of a section read from text in the derive's order (a fault of
/// JSON syntax first). For the message of a member that has such a fault.
pub fn in_derived_order<T>(f: impl FnOnce() -> T) -> T {
    let was = DERIVED_ORDER.with(|d| d.replace(true));
    let out = f();
    DERIVED_ORDER.with(|d| d.set(was));
    out
}

/// What the derive says a section is when it is neither a map nor a list.
const EXPECTING: &str = "internally tagged enum SectionSpec";

impl<'de> Deserialize<'de> for SectionSpec {
    fn deserialize<D: Deserializer<'de>>(d: D) -> Result<SectionSpec, D::Error> {
        if DERIVED_ORDER.with(Cell::get) {
            return Tagged::deserialize(d).map(SectionSpec::from);
        }
        d.deserialize_any(KindFirst)
    }
}

/// A key of the section: `kind`, or another as given.
enum Key<'de> {
    Kind,
    Borrowed(&'de str),
    Owned(String),
}

impl<'de> Key<'de> {
    /// Hands the key to `seed` (a struct's field reader) as a text.
    fn to<S: DeserializeSeed<'de>, E: de::Error>(self, seed: S) -> Result<S::Value, E> {
        match self {
            Key::Kind => seed.deserialize(BorrowedStrDeserializer::new("kind")),
            Key::Borrowed(k) => seed.deserialize(BorrowedStrDeserializer::new(k)),
            Key::Owned(k) => seed.deserialize(StringDeserializer::new(k)),
        }
    }
}

/// Reads a key (JSON keys are text), telling `kind` from the others
/// without copying a borrowed key.
struct KeySeed;

impl<'de> DeserializeSeed<'de> for KeySeed {
    type Value = Key<'de>;
    fn deserialize<D: Deserializer<'de>>(self, d: D) -> Result<Key<'de>, D::Error> {
        d.deserialize_str(self)
    }
}

impl<'de> Visitor<'de> for KeySeed {
    type Value = Key<'de>;
    fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("a key")
    }
    fn visit_borrowed_str<E>(self, k: &'de str) -> Result<Key<'de>, E> {
        Ok(if k == "kind" {
            Key::Kind
        } else {
            Key::Borrowed(k)
        })
    }
    fn visit_str<E>(self, k: &str) -> Result<Key<'de>, E> {
        Ok(if k == "kind" {
            Key::Kind
        } else {
            Key::Owned(k.to_string())
        })
    }
    fn visit_string<E>(self, k: String) -> Result<Key<'de>, E> {
        Ok(if k == "kind" {
            Key::Kind
        } else {
            Key::Owned(k)
        })
    }
}

/// The section's reader.
struct KindFirst;

impl<'de> Visitor<'de> for KindFirst {
    type Value = SectionSpec;

    fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(EXPECTING)
    }

    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<SectionSpec, A::Error> {
        match map.next_key_seed(KeySeed)? {
            Some(Key::Kind) => {
                let kind: Kind = map.next_value()?;
                kind.section(MapAccessDeserializer::new(Rest(map)))
            }
            first => Tagged::deserialize(MapAccessDeserializer::new(Prepend { first, map }))
                .map(SectionSpec::from),
        }
    }

    fn visit_seq<A: SeqAccess<'de>>(self, seq: A) -> Result<SectionSpec, A::Error> {
        Tagged::deserialize(SeqAccessDeserializer::new(seq)).map(SectionSpec::from)
    }
}

/// The keys after `kind`, for the kind's deserializer: a second `kind` is
/// refused as the derive refuses it.
struct Rest<A>(A);

impl<'de, A: MapAccess<'de>> MapAccess<'de> for Rest<A> {
    type Error = A::Error;

    fn next_key_seed<S: DeserializeSeed<'de>>(
        &mut self,
        seed: S,
    ) -> Result<Option<S::Value>, A::Error> {
        match self.0.next_key_seed(KeySeed)? {
            None => Ok(None),
            Some(Key::Kind) => Err(de::Error::duplicate_field("kind")),
            Some(key) => key.to(seed).map(Some),
        }
    }

    fn next_value_seed<S: DeserializeSeed<'de>>(&mut self, seed: S) -> Result<S::Value, A::Error> {
        self.0.next_value_seed(seed)
    }

    fn size_hint(&self) -> Option<usize> {
        self.0.size_hint()
    }
}

/// The map with the key read first put back in front, for the derive.
struct Prepend<'de, A> {
    first: Option<Key<'de>>,
    map: A,
}

impl<'de, A: MapAccess<'de>> MapAccess<'de> for Prepend<'de, A> {
    type Error = A::Error;

    fn next_key_seed<S: DeserializeSeed<'de>>(
        &mut self,
        seed: S,
    ) -> Result<Option<S::Value>, A::Error> {
        match self.first.take() {
            Some(key) => key.to(seed).map(Some),
            None => self.map.next_key_seed(seed),
        }
    }

    fn next_value_seed<S: DeserializeSeed<'de>>(&mut self, seed: S) -> Result<S::Value, A::Error> {
        self.map.next_value_seed(seed)
    }

    fn size_hint(&self) -> Option<usize> {
        self.map
            .size_hint()
            .map(|n| n + usize::from(self.first.is_some()))
    }
}

#[cfg(test)]
mod tests {

    use proptest::prelude::*;

    use super::*;
    use crate::section::schema::{self, Value as Holds};

    /// serde's internally tagged derive, as `SectionSpec` had it before
    /// this reader: the reference.
    mod before {
        use serde::{Deserialize, Serialize};

        use crate::section::{Angle, CatalogueRef, Chs, Flanged, Given, IShape, Rect, Rhs, Round};

        #[derive(Debug, Serialize, Deserialize)]
        #[serde(tag = "kind", rename_all = "kebab-case")]
        pub enum SectionSpec {
            I(IShape),
            Rhs(Rhs),
            Chs(Chs),
            Angle(Angle),
            Channel(Flanged),
            Tee(Flanged),
            Rect(Rect),
            Round(Round),
            Given(Given),
            Catalogue(CatalogueRef),
        }
    }

    /// A section of the reference as the current type (both write the same JSON).
    fn now(s: before::SectionSpec) -> SectionSpec {
        serde_json::from_value(serde_json::to_value(s).unwrap()).unwrap()
    }

    /// serde_json's message without its " at line L column C".
    fn unplaced(e: serde_json::Error) -> String {
        let text = e.to_string();
        match text.rsplit_once(" at line ") {
            Some((head, _)) if e.line() > 0 => head.to_string(),
            _ => text,
        }
    }

    /// A section as entries (key and value as JSON text).
    type Entries = Vec<(String, String)>;

    fn text(entries: &Entries) -> String {
        let inner: Vec<String> = entries.iter().map(|(k, v)| format!("{k}: {v}")).collect();
        format!("{{{}}}", inner.join(", "))
    }

    /// Both readers on `text`: from text, the same section or both refused
    /// (in the derived order, the same words); from a parsed value, owned
    /// and borrowed, the same section or the same words. Whether it was read.
    fn same_as_the_derive(text: &str) -> bool {
        let ours = serde_json::from_str::<SectionSpec>(text).map_err(unplaced);
        let derived = serde_json::from_str::<before::SectionSpec>(text)
            .map(now)
            .map_err(unplaced);
        assert_eq!(
            ours.is_ok(),
            derived.is_ok(),
            "{text}: {ours:?} {derived:?}"
        );
        assert_eq!(ours.as_ref().ok(), derived.as_ref().ok(), "{text}");
        let ordered =
            in_derived_order(|| serde_json::from_str::<SectionSpec>(text).map_err(unplaced));
        assert_eq!(ordered, derived, "{text} in the derived order");
        if let Ok(value) = serde_json::from_str::<serde_json::Value>(text) {
            let ours = SectionSpec::deserialize(&value).map_err(|e| e.to_string());
            let derived = before::SectionSpec::deserialize(&value)
                .map(now)
                .map_err(|e| e.to_string());
            assert_eq!(ours, derived, "{text} as a borrowed value");
            let ours =
                serde_json::from_value::<SectionSpec>(value.clone()).map_err(|e| e.to_string());
            let derived = serde_json::from_value::<before::SectionSpec>(value)
                .map(now)
                .map_err(|e| e.to_string());
            assert_eq!(ours, derived, "{text} as a value");
        }
        derived.is_ok()
    }

    /// Values a key may be given: numbers, texts of the choices and a
    /// designation, a number out of range, null, yes/no, a list, maps.
    const VALUES: [&str; 16] = [
        "120",
        "0",
        "-3",
        "2.5e1",
        "1e400",
        "\"rolled\"",
        "\"welded\"",
        "\"cold-formed\"",
        "\"HE 200 B\"",
        "\"rect\"",
        "null",
        "true",
        "[1, 2]",
        "{\"rolled\": null}",
        "{}",
        "\"r\\u0065ct\"",
    ];

    /// Every key of every kind, `kind` itself (also escaped) and keys of no kind.
    fn keys() -> Vec<String> {
        let mut keys: Vec<String> = schema::KINDS
            .iter()
            .flat_map(|k| k.keys.iter().map(|key| format!("\"{}\"", key.key)))
            .collect();
        keys.sort();
        keys.dedup();
        keys.extend(["\"kind\"", "\"k\\u0069nd\"", "\"colour\"", "\"Kind\""].map(String::from));
        keys
    }

    /// The kind's keys with good values: the required ones, and the others
    /// where `optional` says so (by position).
    fn good(kind: &schema::Kind, optional: &[bool]) -> Entries {
        let mut entries = vec![("\"kind\"".to_string(), format!("\"{}\"", kind.name))];
        for (i, key) in kind.keys.iter().enumerate() {
            if key.required() || optional.get(i).copied().unwrap_or(false) {
                let value = match key.value {
                    Holds::Number => "120".to_string(),
                    Holds::Text => "\"HE 200 B\"".to_string(),
                    Holds::Choice(names) => format!("\"{}\"", names.last().unwrap()),
                };
                entries.push((format!("\"{}\"", key.key), value));
            }
        }
        entries
    }

    /// Each section, `kind` first and last, and each with one key taken out,
    /// each value put in each key's place, each key added with each value
    /// and given twice, each text as `kind`; and values that are no map.
    #[test]
    fn the_section_reader_answers_as_the_tagged_derive() {
        let keys = keys();
        let (mut read, mut refused) = (0, 0);
        let mut count = |entries: &Entries| {
            for last in [false, true] {
                let mut e = entries.clone();
                if last {
                    e.rotate_left(1);
                }
                if same_as_the_derive(&text(&e)) {
                    read += 1;
                } else {
                    refused += 1;
                }
            }
        };
        for kind in &schema::KINDS {
            let all = vec![true; kind.keys.len()];
            for entries in [good(kind, &[]), good(kind, &all)] {
                count(&entries);
                for i in 0..entries.len() {
                    let mut e = entries.clone();
                    e.remove(i);
                    count(&e);
                    let mut e = entries.clone();
                    e.push(entries[i].clone());
                    count(&e);
                    for v in VALUES {
                        let mut e = entries.clone();
                        e[i].1 = v.to_string();
                        count(&e);
                    }
                }
                for key in &keys {
                    for v in VALUES {
                        let mut e = entries.clone();
                        e.push((key.clone(), v.to_string()));
                        count(&e);
                        let mut e = entries.clone();
                        e.insert(1, (key.clone(), v.to_string()));
                        count(&e);
                    }
                }
            }
        }
        for other in [
            "{}",
            "[]",
            "[\"rect\", 100, 50]",
            "[\"rect\", {\"depth_mm\": 100, \"width_mm\": 50}]",
            "[3]",
            "\"rect\"",
            "120",
            "-1",
            "1.5",
            "null",
            "true",
            "{\"kind\": \"rect\"}",
            "{\"kind\": \"rect\", \"depth_mm\": 1, \"width_mm\": 2, \"kind\": \"rect\"}",
        ] {
            if same_as_the_derive(other) {
                read += 1;
            } else {
                refused += 1;
            }
        }
        assert!(
            read > 500 && refused > 5_000,
            "{read} read, {refused} refused"
        );
    }

    proptest! {
        #![proptest_config(ProptestConfig::with_cases(2_000))]

        /// Sections changed in up to five places at once (a key taken out,
        /// added, given again, given another value; `kind` moved): the two
        /// readers agree.
        #[test]
        fn changed_sections_read_as_the_derive_reads_them(
            kind in 0usize..schema::KINDS.len(),
            optional in proptest::collection::vec(any::<bool>(), 9),
            changes in proptest::collection::vec((0u8..4, 0usize..64, 0usize..VALUES.len()), 0..5),
            kind_at in 0usize..12,
        ) {
            let keys = keys();
            let mut e = good(&schema::KINDS[kind], &optional);
            for (what, at, v) in changes {
                let i = at % e.len().max(1);
                match what {
                    0 if !e.is_empty() => { e.remove(i); }
                    1 => e.insert(i.min(e.len()), (keys[at % keys.len()].clone(), VALUES[v].to_string())),
                    2 if !e.is_empty() => { let again = e[i].clone(); e.push(again); }
                    _ if !e.is_empty() => e[i].1 = VALUES[v].to_string(),
                    _ => {}
                }
            }
            if let Some(k) = e.iter().position(|(k, _)| k == "\"kind\"") {
                let entry = e.remove(k);
                e.insert(kind_at.min(e.len()), entry);
            }
            same_as_the_derive(&text(&e));
        }
    }
}
