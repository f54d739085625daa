//! One description of the member's own keys and of the material's keys:
//! each key's name (its suffix carries the unit), what it holds (a number
//! and its sign, a whole number, yes or no, text, a name from a list), what
//! an absent key means, the editor's label and the calc sheet's symbol and
//! meaning. The section's keys are described by [`crate::section::schema`].
//!
//! Everything else that lists member or material keys is driven by this
//! description or checked against it by a named test: the serde types
//! ([`Member`](super::Member), [`MaterialSpec`](crate::material::MaterialSpec))
//! by `serde_types_match_the_description` in this module, the CSV columns
//! and the names each column accepts (`crate::csv`, which reads them from
//! here), the editor's fields and choices (`web/src/fields.rs`, which builds
//! them from here; `editor_fields_match_the_member_schema`) and the calc
//! sheet's symbols (`web/src/print.rs`, which reads them from here). See
//! DEVELOPERS.md, "One description of the member file".

use crate::units::Quantity;

/// The sign a number key accepts.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Sign {
    /// Any finite number (a design moment).
    Any,
    /// Zero or more.
    NonNegative,
    /// More than zero.
    Positive,
}

/// What a key holds.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Value {
    /// A number in the key's unit ([`Key::unit`]); the options, if any,
    /// are values the editor offers in a list.
    Number(Sign),
    /// A whole number; the options are the values it may take.
    Whole,
    /// Yes or no; the options give the words of `true` and `false`.
    Bool,
    /// Free text.
    Text,
    /// One of the names of the options.
    Name,
    /// A design method, by [`Method::key`](super::Method::key).
    Method,
    /// The section, described by [`crate::section::schema`].
    Section,
    /// The material, described by [`MATERIAL`].
    Material,
    /// An object of the keys given, each named here by its CSV column
    /// `<prefix>_<key>` (its key in the object is [`Key::in_group`]).
    Group {
        /// The CSV columns' prefix.
        prefix: &'static str,
        /// Its keys.
        keys: &'static [Key],
    },
    /// A structured value that CSV does not carry (the JSON file keeps it).
    Structure,
}

/// What an absent key means.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Default {
    /// The key must be given.
    Required,
    /// Absent means 0.
    Zero,
    /// Absent means 1.
    One,
    /// Absent means "not given": the engine works it out (as said in
    /// words, for the editor's empty choice) or goes without.
    Absent(&'static str),
    /// Absent means this option.
    Name(&'static str),
    /// Absent means this yes or no.
    Bool(bool),
}

/// One value a key may take, with its words.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Opt {
    /// As written in the member file (a name, a number, `true`/`false`).
    pub name: &'static str,
    /// In words, for the editor's list.
    pub words: &'static str,
}

/// One described key.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Key {
    /// The member-file key (its suffix carries the unit).
    pub key: &'static str,
    /// What it holds.
    pub value: Value,
    /// What an absent key means.
    pub default: Default,
    /// The values it may take (names, whole numbers, yes/no) or the
    /// editor offers (numbers), in the order the editor lists them.
    pub options: &'static [Opt],
    /// The editor's label.
    pub label: &'static str,
    /// The calc sheet's symbol ("" where the trade has none).
    pub symbol: &'static str,
    /// The calc sheet's meaning.
    pub meaning: &'static str,
}

impl Key {
    /// The quantity of a number key (from the unit suffix of its name).
    pub fn unit(&self) -> Option<Quantity> {
        match self.value {
            Value::Number(_) => Quantity::of_key(self.key),
            _ => None,
        }
    }

    /// Whether every member must give it.
    pub fn required(&self) -> bool {
        self.default == Default::Required
    }

    /// The option named `name`.
    pub fn option(&self, name: &str) -> Option<&'static Opt> {
        self.options.iter().find(|o| o.name == name)
    }

    /// The names of its options ("a0", "a", ...).
    pub fn names(&self) -> impl Iterator<Item = &'static str> {
        self.options.iter().map(|o| o.name)
    }

    /// The names of its options as a reader expects them: "a, b or c".
    pub fn names_in_words(&self) -> String {
        let names: Vec<&str> = self.names().collect();
        match names.split_last() {
            Some((last, rest)) if !rest.is_empty() => format!("{} or {last}", rest.join(", ")),
            Some((last, _)) => (*last).to_string(),
            None => String::new(),
        }
    }

    /// Its key within a group's object: the column name without
    /// `<prefix>_`.
    pub fn in_group(&self, prefix: &str) -> &'static str {
        let key: &'static str = self.key;
        key.strip_prefix(prefix)
            .and_then(|k| k.strip_prefix('_'))
            .unwrap_or(key)
    }

    /// The text of its default value, for a field that shows it ("1" for
    /// [`Default::One`]); `None` where absent shows as empty.
    pub fn default_text(&self) -> Option<&'static str> {
        match self.default {
            Default::One => Some("1"),
            _ => None,
        }
    }
}

const fn key(
    key: &'static str,
    value: Value,
    default: Default,
    label: &'static str,
    symbol: &'static str,
    meaning: &'static str,
) -> Key {
    Key {
        key,
        value,
        default,
        options: &[],
        label,
        symbol,
        meaning,
    }
}

const fn choice(
    key: &'static str,
    value: Value,
    default: Default,
    options: &'static [Opt],
    label: &'static str,
    meaning: &'static str,
) -> Key {
    Key {
        options,
        ..self::key(key, value, default, label, "", meaning)
    }
}

const fn opt(name: &'static str, words: &'static str) -> Opt {
    Opt { name, words }
}

use self::Default::{Absent, One, Required, Zero};
use Sign::{Any, NonNegative, Positive};

const CURVES: &[Opt] = &[
    opt("a0", "a0"),
    opt("a", "a"),
    opt("b", "b"),
    opt("c", "c"),
    opt("d", "d"),
];
const SPAN_LOADS: &[Opt] = &[
    opt("uniform", "uniform load"),
    opt("point", "point load at mid-length"),
];
const FROM_TABLE: Default = Absent("by EN 1993-1-1 Table 6.2");

/// `angle_connection`'s keys, named by their CSV columns (`angle_leg` is
/// the key `leg` of the object).
pub const ANGLE_CONNECTION: &[Key] = &[
    choice(
        "angle_leg",
        Value::Name,
        Required,
        &[
            opt("long", "the longer leg"),
            opt("short", "the shorter leg"),
        ],
        "angle connected through",
        "angle connected through the leg",
    ),
    choice(
        "angle_truss",
        Value::Name,
        Default::Name("planar"),
        &[
            opt("planar", "individual or planar truss (E5(a))"),
            opt("space", "box or space truss (E5(b))"),
        ],
        "angle member of",
        "angle member of (AISC 360-16 E5)",
    ),
];

const SWAY: &[Opt] = &[opt("true", "sidesway uninhibited"), opt("false", "braced")];

/// `frame_major`'s keys, named by their CSV columns (all three or none).
pub const FRAME_MAJOR: &[Key] = &[
    choice(
        "frame_major_sway",
        Value::Bool,
        Required,
        SWAY,
        "frame, major axis",
        "frame sway, major axis",
    ),
    key(
        "frame_major_g_a",
        Value::Number(NonNegative),
        Required,
        "G at end A, major axis",
        "G_A,y",
        "sum of EI/L of the columns over that of the beams at end A",
    ),
    key(
        "frame_major_g_b",
        Value::Number(NonNegative),
        Required,
        "G at end B, major axis",
        "G_B,y",
        "sum of EI/L of the columns over that of the beams at end B",
    ),
];

/// `frame_minor`'s keys, named by their CSV columns (all three or none).
pub const FRAME_MINOR: &[Key] = &[
    choice(
        "frame_minor_sway",
        Value::Bool,
        Required,
        SWAY,
        "frame, minor axis",
        "frame sway, minor axis",
    ),
    key(
        "frame_minor_g_a",
        Value::Number(NonNegative),
        Required,
        "G at end A, minor axis",
        "G_A,z",
        "sum of EI/L of the columns over that of the beams at end A",
    ),
    key(
        "frame_minor_g_b",
        Value::Number(NonNegative),
        Required,
        "G at end B, minor axis",
        "G_B,z",
        "sum of EI/L of the columns over that of the beams at end B",
    ),
];

/// The member's keys, in the order of the working (the calc sheet's
/// order): the method and its factors, the lengths and loads, then the
/// section and the material.
pub const MEMBER: &[Key] = &[
    key("id", Value::Text, Required, "id", "", "member id"),
    key(
        "note",
        Value::Text,
        Absent(""),
        "note (optional)",
        "",
        "note",
    ),
    key(
        "method",
        Value::Method,
        Required,
        "design method",
        "",
        "design method",
    ),
    key(
        "gamma_m1",
        Value::Number(Positive),
        Absent("1.0"),
        "partial factor γ_M1 (empty: 1.0)",
        "γ_M1",
        "partial factor on member resistance",
    ),
    key(
        "bow_mm",
        Value::Number(NonNegative),
        Absent("L_cr/200"),
        "initial bow e_0 (empty: L_cr/200)",
        "e_0",
        "initial bow",
    ),
    key(
        "eccentricity_mm",
        Value::Number(NonNegative),
        Absent("L_cr/200"),
        "load eccentricity e (empty: L_cr/200)",
        "e",
        "load eccentricity",
    ),
    choice(
        "curve_major",
        Value::Name,
        FROM_TABLE,
        CURVES,
        "buckling curve, major axis",
        "buckling curve, major axis",
    ),
    choice(
        "curve_minor",
        Value::Name,
        FROM_TABLE,
        CURVES,
        "buckling curve, minor axis",
        "buckling curve, minor axis",
    ),
    Key {
        key: "csa_n",
        value: Value::Number(Positive),
        default: Absent("by section make"),
        options: &[
            opt("1.34", "1.34 (most members)"),
            opt("2.24", "2.24 (hot-finished HSS, stress-relieved)"),
        ],
        label: "exponent n",
        symbol: "n",
        meaning: "exponent of the column curve",
    },
    choice(
        "service_class",
        Value::Whole,
        Absent("default (1)"),
        &[opt("1", "1"), opt("2", "2"), opt("3", "3")],
        "service class",
        "service class",
    ),
    choice(
        "load_duration",
        Value::Name,
        Absent("default (medium-term)"),
        &[
            opt("permanent", "permanent"),
            opt("long", "long-term"),
            opt("medium", "medium-term"),
            opt("short", "short-term"),
            opt("instantaneous", "instantaneous"),
        ],
        "load-duration class",
        "load-duration class",
    ),
    key(
        "length_mm",
        Value::Number(Positive),
        Required,
        "system length L",
        "L",
        "system length",
    ),
    key(
        "k_major",
        Value::Number(Positive),
        One,
        "factor K, major axis",
        "K_y",
        "effective-length factor, major axis",
    ),
    key(
        "lcr_major_mm",
        Value::Number(Positive),
        Absent(""),
        "buckling length L_cr, major axis",
        "L_cr,y",
        "buckling length, major axis",
    ),
    key(
        "k_minor",
        Value::Number(Positive),
        One,
        "factor K, minor axis",
        "K_z",
        "effective-length factor, minor axis",
    ),
    key(
        "lcr_minor_mm",
        Value::Number(Positive),
        Absent(""),
        "buckling length L_cr, minor axis",
        "L_cr,z",
        "buckling length, minor axis",
    ),
    key(
        "k_torsion",
        Value::Number(Positive),
        One,
        "factor K, torsional",
        "K_T",
        "effective-length factor, torsional",
    ),
    key(
        "lcr_torsion_mm",
        Value::Number(Positive),
        Absent(""),
        "buckling length L_cr, torsional",
        "L_cr,T",
        "buckling length, torsional",
    ),
    key(
        "frame_major",
        Value::Group {
            prefix: "frame_major",
            keys: FRAME_MAJOR,
        },
        Absent(""),
        "column in a frame, major axis",
        "",
        "column in a frame, major axis (alignment chart)",
    ),
    key(
        "frame_minor",
        Value::Group {
            prefix: "frame_minor",
            keys: FRAME_MINOR,
        },
        Absent(""),
        "column in a frame, minor axis",
        "",
        "column in a frame, minor axis (alignment chart)",
    ),
    key(
        "buckling_model",
        Value::Structure,
        Absent(""),
        "elastic buckling model",
        "",
        "elastic buckling model",
    ),
    key(
        "angle_connection",
        Value::Group {
            prefix: "angle",
            keys: ANGLE_CONNECTION,
        },
        Absent("loaded through the centroid"),
        "angle connected through one leg",
        "",
        "angle connected through",
    ),
    key(
        "k_lt",
        Value::Number(Positive),
        One,
        "factor on L between lateral-torsional restraints",
        "K_LT",
        "effective-length factor, lateral-torsional buckling",
    ),
    key(
        "lcr_lt_mm",
        Value::Number(Positive),
        Absent(""),
        "length between lateral-torsional restraints",
        "L_cr,LT",
        "length between lateral-torsional restraints",
    ),
    choice(
        "lt_restrained",
        Value::Bool,
        Default::Bool(false),
        // What is assumed, in the words an engineer reads at once: the
        // flange held against moving sideways and twisting over the whole
        // length, so no lateral-torsional buckling is worked; or held only
        // at the restraints, and lateral-torsional buckling worked between.
        &[
            opt(
                "true",
                "over the whole length, so no lateral-torsional buckling is worked",
            ),
            opt(
                "false",
                "only at the lateral-torsional restraints, so lateral-torsional buckling is worked between them",
            ),
        ],
        "compression flange restrained",
        "restraint of the compression flange against lateral movement and twist",
    ),
    key(
        "axial_kn",
        Value::Number(NonNegative),
        Required,
        "design compression N_Ed",
        "N_Ed",
        "design compression",
    ),
    key(
        "m_major_a_knm",
        Value::Number(Any),
        Zero,
        "moment at end A, major axis M_a",
        "M_y,Ed,A",
        "design moment, major axis, at end A",
    ),
    key(
        "m_major_b_knm",
        Value::Number(Any),
        Zero,
        "moment at end B, major axis M_b",
        "M_y,Ed,B",
        "design moment, major axis, at end B",
    ),
    key(
        "m_major_span_knm",
        Value::Number(Any),
        Zero,
        "mid-length moment from span load, major axis",
        "M_y,Ed,span",
        "major-axis moment at mid-length from transverse load",
    ),
    choice(
        "span_load_major",
        Value::Name,
        Default::Name("uniform"),
        SPAN_LOADS,
        "span load, major axis",
        "shape of the major-axis span moment",
    ),
    key(
        "m_minor_a_knm",
        Value::Number(Any),
        Zero,
        "moment at end A, minor axis M_a",
        "M_z,Ed,A",
        "design moment, minor axis, at end A",
    ),
    key(
        "m_minor_b_knm",
        Value::Number(Any),
        Zero,
        "moment at end B, minor axis M_b",
        "M_z,Ed,B",
        "design moment, minor axis, at end B",
    ),
    key(
        "m_minor_span_knm",
        Value::Number(Any),
        Zero,
        "mid-length moment from span load, minor axis",
        "M_z,Ed,span",
        "minor-axis moment at mid-length from transverse load",
    ),
    choice(
        "span_load_minor",
        Value::Name,
        Default::Name("uniform"),
        SPAN_LOADS,
        "span load, minor axis",
        "shape of the minor-axis span moment",
    ),
    choice(
        "load_level",
        Value::Name,
        Default::Name("shear-centre"),
        &[
            opt("shear-centre", "the shear centre"),
            opt(
                "compression-flange",
                "the compression flange (destabilising)",
            ),
            opt("tension-flange", "the tension flange"),
        ],
        "span load acts at",
        "level of the transverse load on the depth",
    ),
    choice(
        "amplify_moments",
        Value::Bool,
        Default::Bool(true),
        &[
            opt(
                "true",
                "first-order, amplified by the check where the code leaves it to the designer",
            ),
            opt("false", "already second-order, not amplified"),
        ],
        "moments given are",
        "moments given",
    ),
    key(
        "amplification_length_major_mm",
        Value::Number(Positive),
        Absent("the laterally unbraced length"),
        "amplification length from analysis, major axis",
        "L_amp,y",
        "length of the member's own moment amplification, major axis, from the engineer's analysis (AISC L_c1, CSA 13.8.4 L)",
    ),
    key(
        "amplification_length_minor_mm",
        Value::Number(Positive),
        Absent("the laterally unbraced length"),
        "amplification length from analysis, minor axis",
        "L_amp,z",
        "length of the member's own moment amplification, minor axis, from the engineer's analysis (AISC L_c1, CSA 13.8.4 L)",
    ),
    choice(
        "interaction_annex",
        Value::Name,
        Absent("the larger of Annex A and Annex B"),
        &[
            opt("A", "Annex A (Method 1)"),
            opt("B", "Annex B (Method 2)"),
        ],
        "EN 1993-1-1 interaction factors",
        "EN 1993-1-1 interaction factors",
    ),
    key(
        "section",
        Value::Section,
        Required,
        "section",
        "",
        "section",
    ),
    key(
        "material",
        Value::Material,
        Required,
        "material",
        "",
        "material",
    ),
];

/// One way of giving the material, with its keys.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Form {
    /// Its name ("grade", "steel", "timber").
    pub name: &'static str,
    /// Its keys, in the order the editor shows them.
    pub keys: &'static [Key],
}

impl Form {
    /// The key named `key` of this form.
    pub fn key(&self, key: &str) -> Option<&'static Key> {
        self.keys.iter().find(|k| k.key == key)
    }
}

/// The forms of the material, in the order of
/// [`MaterialSpec`](crate::material::MaterialSpec)'s variants: a named
/// grade, a custom timber, a custom steel.
pub const MATERIAL: [Form; 3] = [
    Form {
        name: "grade",
        keys: &[key(
            "grade",
            Value::Text,
            Required,
            "grade or strength class",
            "",
            "grade or strength class",
        )],
    },
    Form {
        name: "timber",
        keys: &[
            key(
                "fc0k_mpa",
                Value::Number(Positive),
                Required,
                "compressive strength f_c,0,k",
                "f_c,0,k",
                "compressive strength parallel to grain",
            ),
            key(
                "e005_mpa",
                Value::Number(Positive),
                Required,
                "modulus E_0,05",
                "E_0,05",
                "modulus of elasticity parallel to grain, 5 % fractile",
            ),
            key(
                "e0mean_mpa",
                Value::Number(Positive),
                Required,
                "modulus E_0,mean",
                "E_0,mean",
                "mean modulus of elasticity parallel to grain",
            ),
            choice(
                "timber",
                Value::Name,
                Required,
                &[
                    opt("solid", "solid (sawn) timber"),
                    opt("glulam", "glued laminated timber"),
                ],
                "timber product",
                "timber product",
            ),
        ],
    },
    Form {
        name: "steel",
        keys: &[
            key(
                "fy_mpa",
                Value::Number(Positive),
                Required,
                "yield strength f_y",
                "f_y",
                "yield strength",
            ),
            key(
                "e_mpa",
                Value::Number(Positive),
                Required,
                "Young's modulus E",
                "E",
                "modulus of elasticity",
            ),
            key(
                "g_mpa",
                Value::Number(Positive),
                Absent("E/2.6"),
                "shear modulus G (empty: E/2.6)",
                "G",
                "shear modulus",
            ),
        ],
    },
];

/// The material form named `name`.
pub fn material_form(name: &str) -> Option<&'static Form> {
    MATERIAL.iter().find(|f| f.name == name)
}

/// The member key named `key`.
pub fn member_key(key: &str) -> Option<&'static Key> {
    MEMBER.iter().find(|k| k.key == key)
}

/// The material key named `key`, in whichever form has it.
pub fn material_key(key: &str) -> Option<&'static Key> {
    MATERIAL.iter().find_map(|f| f.key(key))
}

/// The described key named `key`: a member key, a material key or a key
/// of a group by its CSV column name (`angle_leg`).
pub fn any_key(key: &str) -> Option<&'static Key> {
    member_key(key)
        .or_else(|| material_key(key))
        .or_else(|| grouped(key).map(|(_, k)| k))
}

/// The group key and the key within it of a CSV column such as
/// `angle_leg`.
pub fn grouped(column: &str) -> Option<(&'static Key, &'static Key)> {
    MEMBER.iter().find_map(|outer| match outer.value {
        Value::Group { keys, .. } => keys.iter().find(|k| k.key == column).map(|k| (outer, k)),
        _ => None,
    })
}

#[cfg(test)]
mod tests;
