//! One description of the section kinds of the member file: each kind's
//! name, its keys, their units and their defaults.
//!
//! The serde types of [`super`] read and write the member file; everything
//! else that lists section keys reads this description instead of keeping a
//! list of its own: the CSV reader's columns and per-kind checks
//! ([`crate::csv`]), the editor's fields (`web/src/fields.rs`, checked by
//! its tests) and the kind names ([`SectionSpec::kind`]). The section memo
//! (`cache.rs`) destructures every spec without `..`, so a new field fails
//! to compile there. The tests of this module check the description against
//! the serde types both ways: every described key is read and written, a
//! required key is required, an optional key takes its described default,
//! and a key the types write that is not described fails
//! `serde_types_match_the_description` with its name. See DEVELOPERS.md,
//! "How to add a section key".

use super::SectionSpec;
use crate::units::Quantity;

/// What a key holds.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Value {
    /// A number in the key's unit ([`Key::unit`]).
    Number,
    /// Free text.
    Text,
    /// One of a fixed list of names (the first is the default).
    Choice(&'static [&'static str]),
}

/// What an absent key means.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Default {
    /// The key must be given.
    Required,
    /// Absent means 0.
    Zero,
    /// Absent means "not given" (the engine works it out or goes without).
    Absent,
    /// Absent means this choice.
    Choice(&'static str),
}

/// One key of a section kind.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Key {
    /// The member-file key (its suffix carries the unit).
    pub key: &'static str,
    /// What it holds.
    pub value: Value,
    /// What an absent key means.
    pub default: Default,
}

impl Key {
    /// The quantity of a number key (from the unit suffix of its name).
    pub fn unit(&self) -> Option<Quantity> {
        match self.value {
            Value::Number => Quantity::of_key(self.key),
            _ => None,
        }
    }

    /// Whether every section of its kind must give it.
    pub fn required(&self) -> bool {
        self.default == Default::Required
    }
}

/// A section kind: its member-file name and its keys.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Kind {
    /// The value of `"kind"`.
    pub name: &'static str,
    /// Its keys, in the order the editor shows them.
    pub keys: &'static [Key],
}

impl Kind {
    /// The key named `key` of this kind.
    pub fn key(&self, key: &str) -> Option<&'static Key> {
        self.keys.iter().find(|k| k.key == key)
    }
}

const fn number(key: &'static str, default: Default) -> Key {
    Key {
        key,
        value: Value::Number,
        default,
    }
}

const R: Default = Default::Required;
const ZERO: Default = Default::Zero;
const ABSENT: Default = Default::Absent;

const I_MAKES: &[&str] = &["rolled", "welded"];
const HOLLOW_MAKES: &[&str] = &["hot-finished", "cold-formed"];

const fn make(options: &'static [&'static str]) -> Key {
    // Absent: not stated; each method takes the make that gives the lower
    // resistance and says so (crate::method::make).
    Key {
        key: "make",
        value: Value::Choice(options),
        default: Default::Absent,
    }
}

const FLANGED: &[Key] = &[
    number("depth_mm", R),
    number("width_mm", R),
    number("flange_mm", R),
    number("web_mm", R),
    number("root_radius_mm", ZERO),
];

const I: Kind = Kind {
    name: "i",
    keys: &[
        number("depth_mm", R),
        number("width_mm", R),
        number("flange_mm", R),
        number("web_mm", R),
        number("root_radius_mm", ZERO),
        make(I_MAKES),
    ],
};
const RHS: Kind = Kind {
    name: "rhs",
    keys: &[
        number("depth_mm", R),
        number("width_mm", R),
        number("wall_mm", R),
        number("outer_radius_mm", ZERO),
        number("inner_radius_mm", ABSENT),
        make(HOLLOW_MAKES),
    ],
};
const CHS: Kind = Kind {
    name: "chs",
    keys: &[
        number("diameter_mm", R),
        number("wall_mm", R),
        make(HOLLOW_MAKES),
    ],
};
const ANGLE: Kind = Kind {
    name: "angle",
    keys: &[
        number("depth_mm", R),
        number("width_mm", R),
        number("thickness_mm", R),
        number("root_radius_mm", ZERO),
        number("toe_radius_mm", ZERO),
    ],
};
const CHANNEL: Kind = Kind {
    name: "channel",
    keys: FLANGED,
};
const TEE: Kind = Kind {
    name: "tee",
    keys: FLANGED,
};
const RECT: Kind = Kind {
    name: "rect",
    keys: &[number("depth_mm", R), number("width_mm", R)],
};
const ROUND: Kind = Kind {
    name: "round",
    keys: &[number("diameter_mm", R)],
};
const GIVEN: Kind = Kind {
    name: "given",
    keys: &[
        number("area_mm2", R),
        number("i_major_mm4", R),
        number("i_minor_mm4", R),
        number("torsion_mm4", ABSENT),
        number("warping_mm6", ABSENT),
        number("w_el_major_mm3", ABSENT),
        number("w_el_minor_mm3", ABSENT),
        number("w_pl_major_mm3", ABSENT),
        number("w_pl_minor_mm3", ABSENT),
    ],
};
const CATALOGUE: Kind = Kind {
    name: "catalogue",
    keys: &[Key {
        key: "designation",
        value: Value::Text,
        default: Default::Required,
    }],
};

/// Every section kind, in the order of [`SectionSpec`]'s variants.
pub const KINDS: [Kind; 10] = [
    I, RHS, CHS, ANGLE, CHANNEL, TEE, RECT, ROUND, GIVEN, CATALOGUE,
];

/// The kind named `name`.
pub fn kind(name: &str) -> Option<&'static Kind> {
    KINDS.iter().find(|k| k.name == name)
}

/// The kind names, in order ("i", "rhs", ...).
pub fn kind_names() -> impl Iterator<Item = &'static str> {
    KINDS.iter().map(|k| k.name)
}

impl SectionSpec {
    /// The member-file name of the spec's kind ("i", "rhs", ...).
    pub fn kind(&self) -> &'static str {
        self.kind_spec().name
    }

    /// The description of the spec's kind.
    pub fn kind_spec(&self) -> &'static Kind {
        match self {
            SectionSpec::I(_) => &I,
            SectionSpec::Rhs(_) => &RHS,
            SectionSpec::Chs(_) => &CHS,
            SectionSpec::Angle(_) => &ANGLE,
            SectionSpec::Channel(_) => &CHANNEL,
            SectionSpec::Tee(_) => &TEE,
            SectionSpec::Rect(_) => &RECT,
            SectionSpec::Round(_) => &ROUND,
            SectionSpec::Given(_) => &GIVEN,
            SectionSpec::Catalogue(_) => &CATALOGUE,
        }
    }
}

#[cfg(test)]
mod tests {

    use super::*;
    use crate::section::{
        Angle, CatalogueRef, Chs, Flanged, Given, HollowMake, IMake, IShape, Rect, Rhs, Round,
    };
    use serde_json::{json, Map, Value as Json};

    /// One spec of every kind with every field set (struct literals, so a
    /// new field fails to compile here until it is given a value).
    fn specimens() -> Vec<SectionSpec> {
        let flanged = Flanged {
            depth_mm: 200.0,
            width_mm: 80.0,
            flange_mm: 11.0,
            web_mm: 7.0,
            root_radius_mm: 9.0,
        };
        vec![
            SectionSpec::I(IShape {
                depth_mm: 300.0,
                width_mm: 300.0,
                flange_mm: 19.0,
                web_mm: 11.0,
                root_radius_mm: 27.0,
                make: IMake::Welded,
            }),
            SectionSpec::Rhs(Rhs {
                depth_mm: 200.0,
                width_mm: 100.0,
                wall_mm: 6.0,
                outer_radius_mm: 12.0,
                inner_radius_mm: Some(6.0),
                make: HollowMake::ColdFormed,
            }),
            SectionSpec::Chs(Chs {
                diameter_mm: 168.3,
                wall_mm: 8.0,
                make: HollowMake::ColdFormed,
            }),
            SectionSpec::Angle(Angle {
                depth_mm: 100.0,
                width_mm: 75.0,
                thickness_mm: 8.0,
                root_radius_mm: 10.0,
                toe_radius_mm: 4.8,
            }),
            SectionSpec::Channel(flanged.clone()),
            SectionSpec::Tee(flanged),
            SectionSpec::Rect(Rect {
                depth_mm: 195.0,
                width_mm: 95.0,
            }),
            SectionSpec::Round(Round { diameter_mm: 220.0 }),
            SectionSpec::Given(Given {
                area_mm2: 7808.0,
                i_major_mm4: 1.2591e8,
                i_minor_mm4: 4.073e7,
                torsion_mm4: Some(595_700.0),
                warping_mm6: Some(1.709e12),
                w_el_major_mm3: Some(1.0e6),
                w_el_minor_mm3: Some(3.0e5),
                w_pl_major_mm3: Some(1.1e6),
                w_pl_minor_mm3: Some(4.0e5),
            }),
            SectionSpec::Catalogue(CatalogueRef {
                designation: "HE 200 B".into(),
            }),
        ]
    }

    /// A sample value of a described key.
    fn sample(key: &Key) -> Json {
        match key.value {
            Value::Number => json!(7.5),
            Value::Text => json!("HE 200 B"),
            Value::Choice(options) => json!(options[options.len() - 1]),
        }
    }

    fn object(kind: &Kind, keep: impl Fn(&Key) -> bool) -> Json {
        let mut map = Map::new();
        map.insert("kind".into(), json!(kind.name));
        for key in kind.keys.iter().filter(|k| keep(k)) {
            map.insert(key.key.into(), sample(key));
        }
        Json::Object(map)
    }

    #[test]
    fn one_kind_per_variant_in_order() {
        let specimens = specimens();
        assert_eq!(specimens.len(), KINDS.len());
        for (spec, kind) in specimens.iter().zip(KINDS.iter()) {
            assert_eq!(spec.kind(), kind.name);
            let written = serde_json::to_value(spec).unwrap();
            assert_eq!(
                written["kind"],
                json!(kind.name),
                "the serde tag of {spec:?}"
            );
        }
        let mut names: Vec<&str> = kind_names().collect();
        names.dedup();
        assert_eq!(names.len(), KINDS.len(), "kind names are unique");
    }

    #[test]
    fn serde_types_match_the_description() {
        for spec in specimens() {
            let kind = spec.kind_spec();
            // Every key the types write is described, and every described
            // key is written when the spec sets every field.
            let written = serde_json::to_value(&spec).unwrap();
            let written = written.as_object().unwrap();
            for key in written.keys().filter(|k| *k != "kind") {
                assert!(
                    kind.key(key).is_some(),
                    "section kind \"{}\": the serde type writes \"{key}\", which \
                     section::schema::KINDS does not describe",
                    kind.name
                );
            }
            for key in kind.keys {
                assert!(
                    written.contains_key(key.key),
                    "section kind \"{}\": section::schema::KINDS describes \"{}\", which the \
                     serde type does not write",
                    kind.name,
                    key.key
                );
                if let Some(q) = key.unit() {
                    assert_ne!(q, Quantity::Dimensionless, "{}", key.key);
                }
                if key.value == Value::Number {
                    assert!(
                        key.unit().is_some(),
                        "{}: a number key carries its unit",
                        key.key
                    );
                }
            }
        }
        for kind in &KINDS {
            // Every described key is read (the types deny unknown keys).
            let full: SectionSpec = serde_json::from_value(object(kind, |_| true))
                .unwrap_or_else(|e| panic!("kind \"{}\" with every key: {e}", kind.name));
            assert_eq!(full.kind(), kind.name);
            // The required keys alone are enough, and the optional ones
            // take their described defaults.
            let least: SectionSpec = serde_json::from_value(object(kind, Key::required))
                .unwrap_or_else(|e| panic!("kind \"{}\" with its required keys: {e}", kind.name));
            let written = serde_json::to_value(&least).unwrap();
            for key in kind.keys {
                let got = written.get(key.key);
                match key.default {
                    Default::Required => assert!(got.is_some()),
                    Default::Zero => assert_eq!(got, Some(&json!(0.0)), "{}", key.key),
                    Default::Absent => assert_eq!(got, None, "{}", key.key),
                    Default::Choice(c) => assert_eq!(got, Some(&json!(c)), "{}", key.key),
                }
                if let (Value::Choice(options), Default::Choice(c)) = (key.value, key.default) {
                    assert_eq!(
                        options.first(),
                        Some(&c),
                        "{}: the default is first",
                        key.key
                    );
                }
            }
            // Each required key is required.
            for key in kind.keys.iter().filter(|k| k.required()) {
                let without = object(kind, |k| k.required() && k.key != key.key);
                let err = serde_json::from_value::<SectionSpec>(without).unwrap_err();
                assert!(
                    err.to_string().contains(key.key),
                    "kind \"{}\" without \"{}\": {err}",
                    kind.name,
                    key.key
                );
            }
            // A made-up key is refused.
            let mut extra = object(kind, |_| true);
            extra["made_up_mm"] = json!(1.0);
            assert!(serde_json::from_value::<SectionSpec>(extra).is_err());
        }
    }

    #[test]
    fn unknown_kind_lists_every_described_kind() {
        let err = serde_json::from_value::<SectionSpec>(json!({"kind": "lip"})).unwrap_err();
        for name in kind_names() {
            assert!(err.to_string().contains(&format!("`{name}`")), "{err}");
        }
    }
}
