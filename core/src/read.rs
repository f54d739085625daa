//! What the JSON readers share ([`crate::file`] reads a file whole,
//! `crate::stream` one member at a time): a value reader that notices a key
//! given twice, and plain words for a material that matches none of its
//! forms.
//!
//! A key given twice is ambiguous (which value did the engineer mean?), so
//! both readers refuse it wherever it is: at the top of the file, in a
//! member, or deeper (`section`, `material`, `buckling_model`...).
//! `serde_json::Value` keeps the last of the two silently, so the
//! whole-file reader reads through [`value`] instead, which builds the same
//! value and reports the first key given twice with where it is. Finding it
//! costs one map insertion per key, as building a `Value` does anyway.

use std::cell::RefCell;
use std::fmt;

use serde::de::{self, DeserializeSeed, MapAccess, SeqAccess, Visitor};
use serde_json::{Map, Value};

use crate::member::schema::{self, Form, Key};

/// One step of the way to a key: a key of an object or a place in a list.
#[derive(Debug, Clone, PartialEq, Eq)]
enum Step {
    Key(String),
    At(usize),
}

/// The first key given twice in one object, and where that object is.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct Repeat {
    /// The key given twice.
    pub key: String,
    /// The steps from the top to its object, the innermost first while
    /// reading (each enclosing object or list adds its step as it finishes
    /// the value), reversed when reading ends.
    steps: Vec<Step>,
    /// The depth of the outermost step named so far.
    at: usize,
}

impl Repeat {
    /// `key` given twice at the top of the file.
    pub fn top(key: &str) -> Repeat {
        Repeat {
            key: key.to_string(),
            steps: Vec::new(),
            at: 0,
        }
    }

    /// The same repeat, read in the value of the top-level key `key`.
    pub fn under(mut self, key: &str) -> Repeat {
        self.steps.insert(0, Step::Key(key.to_string()));
        self
    }

    /// The index in `members` of the member it is in, when it is in one.
    pub fn member(&self) -> Option<usize> {
        match self.steps.as_slice() {
            [Step::Key(k), Step::At(i), ..] if k == "members" => Some(*i),
            _ => None,
        }
    }

    /// The path of its object, skipping the first `skip` steps, as
    /// `serde_path_to_error` writes a path (`buckling_model.restraints[1]`).
    fn path(&self, skip: usize) -> String {
        let mut path = String::new();
        for step in self.steps.iter().skip(skip) {
            match step {
                Step::Key(k) if path.is_empty() => path.push_str(k),
                Step::Key(k) => {
                    path.push('.');
                    path.push_str(k);
                }
                Step::At(i) => path.push_str(&format!("[{i}]")),
            }
        }
        path
    }

    /// The refusal's words, with the path from the top of the file, or
    /// from the member when it is in one (the caller names the member).
    pub fn message(&self) -> String {
        let skip = if self.member().is_some() { 2 } else { 0 };
        let said = twice(&self.key);
        match self.path(skip) {
            p if p.is_empty() => said,
            p => format!("{p}: {said}"),
        }
    }
}

/// The words for a key given twice; serde's derive says "duplicate field
/// `k`", which [`plain`] turns into these, so both readers say the same.
fn twice(key: &str) -> String {
    format!("the key `{key}` is given twice; give each key once")
}

/// Reads JSON text into a value as `serde_json::from_str::<Value>` does,
/// and also gives the first key given twice in any object, if there is one.
pub fn value(text: &str) -> serde_json::Result<(Value, Option<Repeat>)> {
    let found = RefCell::new(None);
    let mut de = serde_json::Deserializer::from_str(text);
    let v = Strict {
        found: &found,
        depth: 0,
    }
    .deserialize(&mut de)?;
    de.end()?;
    let mut repeat: Option<Repeat> = found.into_inner();
    if let Some(r) = repeat.as_mut() {
        r.steps.reverse();
    }
    Ok((v, repeat))
}

/// A value at `depth` (0 the top), noting the first key given twice.
#[derive(Clone, Copy)]
struct Strict<'r> {
    found: &'r RefCell<Option<Repeat>>,
    depth: usize,
}

impl Strict<'_> {
    fn inner(self) -> Self {
        Strict {
            depth: self.depth + 1,
            ..self
        }
    }

    /// A value at `depth + 1` was read under `step`: if the repeat found
    /// so far is in it and not yet placed in this value, place it.
    fn name(self, step: impl FnOnce() -> Step) {
        if let Some(r) = self.found.borrow_mut().as_mut() {
            if r.at == self.depth + 1 {
                r.steps.push(step());
                r.at = self.depth;
            }
        }
    }
}

impl<'de> DeserializeSeed<'de> for Strict<'_> {
    type Value = Value;
    fn deserialize<D: de::Deserializer<'de>>(self, d: D) -> Result<Value, D::Error> {
        d.deserialize_any(self)
    }
}

impl<'de> Visitor<'de> for Strict<'_> {
    type Value = Value;

    fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("any JSON value")
    }

    fn visit_bool<E>(self, v: bool) -> Result<Value, E> {
        Ok(Value::Bool(v))
    }

    fn visit_i64<E>(self, v: i64) -> Result<Value, E> {
        Ok(Value::Number(v.into()))
    }

    fn visit_u64<E>(self, v: u64) -> Result<Value, E> {
        Ok(Value::Number(v.into()))
    }

    fn visit_f64<E>(self, v: f64) -> Result<Value, E> {
        Ok(serde_json::Number::from_f64(v).map_or(Value::Null, Value::Number))
    }

    fn visit_str<E>(self, v: &str) -> Result<Value, E> {
        Ok(Value::String(v.to_string()))
    }

    fn visit_string<E>(self, v: String) -> Result<Value, E> {
        Ok(Value::String(v))
    }

    fn visit_none<E>(self) -> Result<Value, E> {
        Ok(Value::Null)
    }

    fn visit_unit<E>(self) -> Result<Value, E> {
        Ok(Value::Null)
    }

    fn visit_some<D: de::Deserializer<'de>>(self, d: D) -> Result<Value, D::Error> {
        self.deserialize(d)
    }

    fn visit_seq<A: SeqAccess<'de>>(self, mut seq: A) -> Result<Value, A::Error> {
        let mut list = Vec::with_capacity(seq.size_hint().unwrap_or(0));
        while let Some(v) = seq.next_element_seed(self.inner())? {
            let at = list.len();
            self.name(|| Step::At(at));
            list.push(v);
        }
        Ok(Value::Array(list))
    }

    fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<Value, A::Error> {
        let mut object = Map::new();
        while let Some(key) = map.next_key::<String>()? {
            let v = map.next_value_seed(self.inner())?;
            self.name(|| Step::Key(key.clone()));
            match object.entry(key) {
                serde_json::map::Entry::Vacant(e) => {
                    e.insert(v);
                }
                serde_json::map::Entry::Occupied(mut e) => {
                    let mut found = self.found.borrow_mut();
                    if found.is_none() {
                        *found = Some(Repeat {
                            key: e.key().clone(),
                            steps: Vec::new(),
                            at: self.depth,
                        });
                    }
                    e.insert(v);
                }
            }
        }
        Ok(Value::Object(object))
    }
}

/// serde's message at `path` of a member made plain where serde words it
/// poorly: a key given twice, a value that is not the object its key holds
/// (serde names the Rust type), a material that matches none of its forms
/// (described from the member's value `raw`).
pub fn plain(raw: &Value, path: &str, message: String) -> String {
    if let Some(key) = message
        .strip_prefix("duplicate field `")
        .and_then(|m| m.split_once('`'))
        .map(|(key, _)| key)
    {
        return twice(key);
    }
    if let Some(key) = message
        .strip_prefix("unknown field `")
        .and_then(|m| m.split_once('`'))
        .map(|(key, _)| key)
    {
        return unknown(key, path);
    }
    // A value that is not the object a key holds: serde names the Rust type.
    for (said, wanted) in [
        (", expected struct ", "an object of its keys"),
        (
            ", expected internally tagged enum ",
            "an object with a `kind` and that kind's keys",
        ),
    ] {
        if let Some((head, _)) = message.split_once(said) {
            let found = match head.strip_prefix("invalid type: ") {
                Some(found) => found_in_words(found),
                None => "a list".to_string(),
            };
            return format!("expected {wanted}, found {found}");
        }
    }
    // A value of another type than the key's: serde names the Rust type
    // ("invalid type: string \"4200 mm\", expected f64").
    if let Some((found, expected)) = message
        .strip_prefix("invalid type: ")
        .and_then(|m| m.rsplit_once(", expected "))
    {
        if let Some(wanted) = wanted(expected) {
            return format!("expected {wanted}, found {}", found_in_words(found));
        }
    }
    if message.starts_with("data did not match any variant of untagged enum MaterialSpec") {
        // The only untagged enum of the member file; the browser build
        // tracks no path, so the key is named here.
        let refusal = material_refusal(raw.get("material"));
        return match path {
            "" => format!("material: {refusal}"),
            _ => refusal,
        };
    }
    message
}

/// What a key of the member file holds, in words, for serde's name of the
/// Rust type that reads it; `None` for a type the member file's words do
/// not name (left as serde says it).
fn wanted(rust: &str) -> Option<&'static str> {
    match rust {
        "f64" | "f32" => Some("a number"),
        "u8" | "u16" | "u32" | "u64" | "usize" | "i8" | "i16" | "i32" | "i64" => {
            Some("a whole number")
        }
        "a boolean" => Some("true or false"),
        "a string" => Some("text"),
        _ => None,
    }
}

/// serde's description of the value found (`string "4200 mm"`, ``boolean
/// `true` ``, `map`) in words: `the text "4200 mm"`, `true`, `an object`.
fn found_in_words(found: &str) -> String {
    let quoted = |s: &str| {
        s.strip_prefix('`')
            .and_then(|s| s.strip_suffix('`'))
            .unwrap_or(s)
            .to_string()
    };
    if let Some(text) = found.strip_prefix("string ") {
        return format!("the text {text}");
    }
    for (said, words) in [
        ("boolean ", ""),
        ("integer ", "the number "),
        ("floating point ", "the number "),
    ] {
        if let Some(v) = found.strip_prefix(said) {
            return format!("{words}{}", quoted(v));
        }
    }
    match found {
        "map" => "an object".into(),
        "sequence" => "a list".into(),
        other => other.into(),
    }
}

/// Where in `text` a member's fault lies, found afresh by reading `text`
/// (a member's JSON, or a whole member file's, read as `T`) from text:
/// serde_json's line and column (1-based) of the fault, where the first
/// fault it meets is the one reading the member's parsed value `raw` met,
/// whose words (path and all, as [`crate::file::member_from_value`] gives
/// them) are `said`; the path is taken after `prefix` (`members[3]` when
/// `text` is the whole file, "" when it is the member). `None` where
/// reading the text meets another fault or none. Only on the way to an
/// error, and only natively (the browser's reader tracks no path).
#[cfg(not(target_arch = "wasm32"))]
pub fn fault_at<T: serde::de::DeserializeOwned>(
    text: &str,
    raw: &Value,
    said: &str,
    prefix: &str,
) -> Option<(usize, usize)> {
    let mut track = serde_path_to_error::Track::new();
    let mut de = serde_json::Deserializer::from_str(text);
    let e = T::deserialize(serde_path_to_error::Deserializer::new(&mut de, &mut track)).err()?;
    let full = track.path().to_string();
    let path = full.strip_prefix(prefix)?;
    let path = path.strip_prefix('.').unwrap_or(path);
    let inner = e.to_string();
    let inner = match inner.rsplit_once(" at line ") {
        Some((head, _)) if e.line() > 0 => head.to_string(),
        _ => inner,
    };
    let inner = plain(raw, path, inner);
    let words = if path.is_empty() {
        inner
    } else {
        format!("{path}: {inner}")
    };
    (words == said && e.line() > 0).then(|| onto_value(text, (e.line(), e.column())))
}

/// serde_json places a list or object of the wrong type just before it
/// (on the blank or the colon before it): the place moved onto the value,
/// within its line. Columns count bytes, as serde_json's do.
#[cfg(not(target_arch = "wasm32"))]
fn onto_value(text: &str, (line, column): (usize, usize)) -> (usize, usize) {
    let line_start: usize = text
        .split_inclusive('\n')
        .take(line.saturating_sub(1))
        .map(str::len)
        .sum();
    let at = line_start + column.saturating_sub(1);
    let skipped = text
        .as_bytes()
        .get(at..)
        .unwrap_or_default()
        .iter()
        .take_while(|b| matches!(b, b' ' | b'\t' | b':'))
        .count();
    let moved = text
        .as_bytes()
        .get(at + skipped)
        .is_some_and(|b| *b != b'\n' && *b != b'\r');
    if moved {
        (line, column + skipped)
    } else {
        (line, column)
    }
}

/// A member's fault (`error`, from [`crate::file::member_from_value`]: the
/// member named, then words without a place) given the line and column
/// `find` finds for its words ([`fault_at`]), when it finds them.
#[cfg(not(target_arch = "wasm32"))]
pub fn placed(
    error: crate::error::Error,
    find: impl FnOnce(&str) -> Option<(usize, usize)>,
) -> crate::error::Error {
    use crate::error::Error;
    let Error::InMember { id, source } = error else {
        return error;
    };
    match *source {
        Error::Syntax {
            line: 0, message, ..
        } => match find(&message) {
            Some((line, column)) => Error::Syntax {
                line,
                column,
                message,
            },
            None => Error::Syntax {
                line: 0,
                column: 0,
                message,
            },
        }
        .in_member(&id),
        other => other.in_member(&id),
    }
}

/// The message of a number given as text: the words [`plain`] gives serde's
/// "invalid type: string ..., expected f64".
pub fn number_as_text(token: &str) -> String {
    format!("expected a number, found the text \"{token}\"")
}

/// A key that is not one of the member's (or, inside a member key, of that
/// key's): named, with the nearest member key when one is close.
fn unknown(key: &str, _path: &str) -> String {
    let nearest = schema::MEMBER
        .iter()
        .map(|k| k.key)
        .map(|name| {
            (
                crate::names::edit_distance(key.as_bytes(), name.as_bytes()),
                name,
            )
        })
        .min();
    let hint = match nearest {
        Some((d, name)) if d <= 2 => {
            format!("; did you mean `{name}`?")
        }
        _ => String::new(),
    };
    format!("`{key}` is not a key of this member file{hint} (a key that is not read would leave its default in force)")
}

/// Why `material` (the member's `"material"`, `None` when absent) matches
/// none of the forms of [`schema::MATERIAL`], and what those forms are.
pub fn material_refusal(material: Option<&Value>) -> String {
    let forms = forms_in_words();
    let Some(Value::Object(given)) = material else {
        let found = material.map_or_else(|| "nothing".to_string(), found);
        return format!("expected one of the accepted forms, {forms}; found {found}");
    };
    if given.is_empty() {
        return format!("it gives no key; give one of the accepted forms, {forms}");
    }
    let form_of = |key: &str| schema::MATERIAL.iter().find(|f| f.key(key).is_some());
    let used: Vec<&Form> = schema::MATERIAL
        .iter()
        .filter(|f| given.keys().any(|k| f.key(k).is_some()))
        .collect();
    let strange: Vec<&str> = given
        .keys()
        .map(String::as_str)
        .filter(|k| form_of(k).is_none())
        .collect();
    let mut said = Vec::new();
    match used.as_slice() {
        [] => said.push(format!(
            "none of its keys ({}) belongs to a form",
            quoted(&strange)
        )),
        [form] => {
            let missing: Vec<&str> = form
                .keys
                .iter()
                .filter(|k| k.required() && !given.contains_key(k.key))
                .map(|k| k.key)
                .collect();
            if !missing.is_empty() {
                said.push(format!(
                    "as {} it lacks {}",
                    form_words(form),
                    quoted(&missing)
                ));
            }
            if !strange.is_empty() {
                let is = if strange.len() == 1 { "is" } else { "are" };
                said.push(format!(
                    "{} {is} not a key of {}",
                    quoted(&strange),
                    form_words(form)
                ));
            }
            for key in form.keys {
                if let Some(wrong) = given.get(key.key).and_then(|v| wrong_value(key, v)) {
                    said.push(wrong);
                }
            }
        }
        several => {
            let parts: Vec<String> = several
                .iter()
                .map(|form| {
                    let keys: Vec<&str> = form
                        .keys
                        .iter()
                        .filter(|k| given.contains_key(k.key))
                        .map(|k| k.key)
                        .collect();
                    format!("{} ({})", form_words(form), quoted(&keys))
                })
                .collect();
            said.push(format!(
                "it mixes the keys of {}; give one form",
                joined(&parts, "and")
            ));
            if !strange.is_empty() {
                said.push(format!("{} belongs to no form", quoted(&strange)));
            }
        }
    }
    if said.is_empty() {
        said.push("it matches none of the forms".to_string());
    }
    format!("{}; the accepted forms are {forms}", said.join("; "))
}

/// What is wrong with the value `v` of the material key `key`, if anything.
fn wrong_value(key: &Key, v: &Value) -> Option<String> {
    if v.is_null() && !key.required() {
        return None;
    }
    let (fits, wanted) = match key.value {
        schema::Value::Number(_) => (v.is_number(), "a number".to_string()),
        schema::Value::Whole => (v.is_u64(), "a whole number".to_string()),
        schema::Value::Bool => (v.is_boolean(), "true or false".to_string()),
        schema::Value::Name => (
            v.as_str().is_some_and(|s| key.option(s).is_some()),
            key.names_in_words(),
        ),
        _ => (v.is_string(), "text".to_string()),
    };
    (!fits).then(|| format!("`{}` must be {wanted}, found {}", key.key, found(v)))
}

/// A value as the refusal shows what was found.
fn found(v: &Value) -> String {
    match v {
        Value::Object(_) => "an object".to_string(),
        Value::Array(_) => "a list".to_string(),
        other => other.to_string(),
    }
}

/// "a grade by name", "a custom timber", "a custom steel".
fn form_words(form: &Form) -> String {
    match form.name {
        "grade" => "a grade by name".to_string(),
        other => format!("a custom {other}"),
    }
}

/// Every form with its keys: "a grade by name (`grade`), a custom timber
/// (`fc0k_mpa`, ..., `timber`: solid or glulam) or a custom steel (...)".
fn forms_in_words() -> String {
    let forms: Vec<String> = schema::MATERIAL
        .iter()
        .map(|form| {
            let keys: Vec<String> = form
                .keys
                .iter()
                .map(|k| {
                    let optional = if k.required() { "" } else { "optional " };
                    match k.value {
                        schema::Value::Name => {
                            format!("{optional}`{}`: {}", k.key, k.names_in_words())
                        }
                        _ => format!("{optional}`{}`", k.key),
                    }
                })
                .collect();
            format!("{} ({})", form_words(form), keys.join(", "))
        })
        .collect();
    joined(&forms, "or")
}

/// Keys in backquotes: "`a`, `b` and `c`".
fn quoted(keys: &[&str]) -> String {
    let keys: Vec<String> = keys.iter().map(|k| format!("`{k}`")).collect();
    joined(&keys, "and")
}

/// "a, b and c" (or "a, b or c").
fn joined(items: &[String], last: &str) -> String {
    match items.split_last() {
        Some((end, rest)) if !rest.is_empty() => format!("{} {last} {end}", rest.join(", ")),
        Some((end, _)) => end.clone(),
        None => String::new(),
    }
}

#[cfg(test)]
mod tests;
