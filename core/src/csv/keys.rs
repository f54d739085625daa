//! The member file's keys as CSV columns: their group, their kind of
//! cell, the keys each row needs and the keys of each section kind.
//!
//! The member's and the material's columns, and the names each accepts,
//! come from [`member::schema`](crate::member::schema); the section's are
//! listed here and checked against
//! [`section::schema`](crate::section::schema) by
//! `every_described_section_key_is_a_column`.

use crate::member::schema::{self, Value};

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(super) enum Group {
    Member,
    Section,
    Material,
    /// The keys of a member key's object (`angle_connection`), written
    /// `<prefix>_<key>` (`angle_leg`).
    Nested {
        /// The member key that holds the object.
        key: &'static str,
        /// The columns' prefix.
        prefix: &'static str,
    },
}

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(super) enum Kind {
    /// Free text, kept as written.
    Text,
    /// A name from a fixed list, read without regard to case.
    Name,
    /// A number.
    Number,
    /// A whole number.
    Whole,
    /// Yes or no (`true`/`false`, `yes`/`no`, `1`/`0`).
    Bool,
}

#[derive(Debug, Clone, Copy)]
pub(super) struct KeyInfo {
    pub(super) key: &'static str,
    pub(super) group: Group,
    pub(super) kind: Kind,
    /// Whether every row needs it.
    pub(super) required: bool,
    /// Its description, for a member or material key.
    pub(super) described: Option<&'static schema::Key>,
}

pub(super) const fn k(key: &'static str, group: Group, kind: Kind) -> KeyInfo {
    KeyInfo {
        key,
        group,
        kind,
        required: false,
        described: None,
    }
}

/// The section's columns, `kind` first.
pub(super) const SECTION_KEYS: &[KeyInfo] = &[
    KeyInfo {
        required: true,
        ..k("kind", Group::Section, Kind::Name)
    },
    k("designation", Group::Section, Kind::Text),
    k("depth_mm", Group::Section, Kind::Number),
    k("width_mm", Group::Section, Kind::Number),
    k("flange_mm", Group::Section, Kind::Number),
    k("web_mm", Group::Section, Kind::Number),
    k("thickness_mm", Group::Section, Kind::Number),
    k("wall_mm", Group::Section, Kind::Number),
    k("diameter_mm", Group::Section, Kind::Number),
    k("root_radius_mm", Group::Section, Kind::Number),
    k("toe_radius_mm", Group::Section, Kind::Number),
    k("outer_radius_mm", Group::Section, Kind::Number),
    k("inner_radius_mm", Group::Section, Kind::Number),
    k("make", Group::Section, Kind::Name),
    k("area_mm2", Group::Section, Kind::Number),
    k("i_major_mm4", Group::Section, Kind::Number),
    k("i_minor_mm4", Group::Section, Kind::Number),
    k("torsion_mm4", Group::Section, Kind::Number),
    k("warping_mm6", Group::Section, Kind::Number),
    k("w_el_major_mm3", Group::Section, Kind::Number),
    k("w_el_minor_mm3", Group::Section, Kind::Number),
    k("w_pl_major_mm3", Group::Section, Kind::Number),
    k("w_pl_minor_mm3", Group::Section, Kind::Number),
];

/// The kind of cell of a described key; `None` for a key that is not one
/// column (the section, the material, a group, a structure).
fn kind_of(value: Value) -> Option<Kind> {
    Some(match value {
        Value::Number(_) => Kind::Number,
        Value::Whole => Kind::Whole,
        Value::Bool => Kind::Bool,
        Value::Text => Kind::Text,
        Value::Name | Value::Method => Kind::Name,
        Value::Section | Value::Material | Value::Group { .. } | Value::Structure => return None,
    })
}

fn described(key: &'static schema::Key, group: Group) -> Option<KeyInfo> {
    Some(KeyInfo {
        key: key.key,
        group,
        kind: kind_of(key.value)?,
        required: group == Group::Member && key.required(),
        described: Some(key),
    })
}

/// A member key's columns: itself, or the keys of its group.
fn member_columns(key: &'static schema::Key) -> impl Iterator<Item = KeyInfo> {
    let (inner, group): (&'static [schema::Key], Group) = match key.value {
        Value::Group { prefix, keys } => (
            keys,
            Group::Nested {
                key: key.key,
                prefix,
            },
        ),
        _ => (std::slice::from_ref(key), Group::Member),
    };
    inner.iter().filter_map(move |k| described(k, group))
}

/// Every column, in the order [`super::to_csv`] writes them: the
/// member's text keys (id, note), the section, the material, then the
/// member's other keys in the order of their description.
pub(super) fn keys() -> impl Iterator<Item = KeyInfo> {
    let text = |k: &&schema::Key| k.value == Value::Text;
    schema::MEMBER
        .iter()
        .filter(text)
        .flat_map(member_columns)
        .chain(SECTION_KEYS.iter().copied())
        .chain(
            schema::MATERIAL
                .iter()
                .flat_map(|f| f.keys.iter())
                .filter_map(|k| described(k, Group::Material)),
        )
        .chain(
            schema::MEMBER
                .iter()
                .filter(move |k| !text(k))
                .flat_map(member_columns),
        )
}

pub(super) fn key_info(key: &str) -> Option<KeyInfo> {
    keys().find(|i| i.key == key)
}

/// The keys of a material form ("timber", "steel").
pub(super) fn form_keys(form: &str) -> impl Iterator<Item = &'static schema::Key> {
    schema::material_form(form)
        .map(|f| f.keys)
        .unwrap_or_default()
        .iter()
}
