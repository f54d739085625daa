//! The editor's fields, generic over every section kind, material and
//! method: which fields a member shows, what each field holds as text, and
//! how a typed text becomes a new member (or a message beside the field).
//!
//! Fields are addressed by their member-file key and edited through the
//! member's JSON form, so every kind the engine knows is edited the same
//! way and the keys on screen are the keys in the file.

use serde_json::{Map, Value};
use strutline_core::check::Prepared;
use strutline_core::material::MaterialSpec;
use strutline_core::member::schema::{self, Default as Absent, Key, Sign, Value as Holds};
use strutline_core::method::Method;
use strutline_core::section::SectionSpec;
use strutline_core::{Error, Member};

use crate::numtext::{for_input, parse_number, NumError};

/// Where in the member a field sits.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Place {
    /// On the member itself.
    Member,
    /// In `section`.
    Section,
    /// In `material`.
    Material,
}

/// What a field accepts.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Rule {
    /// A number greater than zero, required.
    Positive,
    /// A number of zero or more, required.
    NonNegative,
    /// Empty (the default) or a number greater than zero.
    OptPositive,
    /// Empty (the default) or a number of zero or more.
    OptNonNegative,
    /// Empty (0, the default) or any number, negative too (a design moment).
    OptNumber,
    /// Text, required.
    Text,
    /// Text, optional (empty removes the key).
    OptText,
}

/// One text field of the editor.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct Field {
    /// The member-file key, also the input's `name`.
    pub key: &'static str,
    /// The label.
    pub label: &'static str,
    /// Unit shown after the field ("" for none).
    pub unit: &'static str,
    /// Where it sits.
    pub place: Place,
    /// What it accepts.
    pub rule: Rule,
}

const fn f(
    key: &'static str,
    label: &'static str,
    unit: &'static str,
    place: Place,
    rule: Rule,
) -> Field {
    Field {
        key,
        label,
        unit,
        place,
        rule,
    }
}

use Place::{Material as Mat, Member as Mem, Section as Sec};
use Rule::{NonNegative, OptNonNegative, OptNumber, OptPositive, OptText, Positive, Text};

/// The section kinds, member-file key and words.
pub const KINDS: [(&str, &str); 10] = [
    ("i", "I / H section"),
    ("rhs", "rectangular hollow (RHS/SHS)"),
    ("chs", "circular hollow (CHS)"),
    ("angle", "angle"),
    ("channel", "channel"),
    ("tee", "tee"),
    ("rect", "solid rectangle"),
    ("round", "solid round"),
    ("given", "typed properties"),
    ("catalogue", "catalogue designation"),
];

const I_FIELDS: [Field; 5] = [
    f("depth_mm", "depth h", "mm", Sec, Positive),
    f("width_mm", "flange width b", "mm", Sec, Positive),
    f("flange_mm", "flange thickness t_f", "mm", Sec, Positive),
    f("web_mm", "web thickness t_w", "mm", Sec, Positive),
    f("root_radius_mm", "root radius r", "mm", Sec, OptNonNegative),
];
const RHS_FIELDS: [Field; 5] = [
    f("depth_mm", "depth h", "mm", Sec, Positive),
    f("width_mm", "width b", "mm", Sec, Positive),
    f("wall_mm", "wall t", "mm", Sec, Positive),
    f(
        "outer_radius_mm",
        "outer corner radius r_o",
        "mm",
        Sec,
        OptNonNegative,
    ),
    f(
        "inner_radius_mm",
        "inner corner radius r_i (empty: r_o − t)",
        "mm",
        Sec,
        OptNonNegative,
    ),
];
const CHS_FIELDS: [Field; 2] = [
    f("diameter_mm", "outside diameter D", "mm", Sec, Positive),
    f("wall_mm", "wall t", "mm", Sec, Positive),
];
const ANGLE_FIELDS: [Field; 5] = [
    f("depth_mm", "long leg h", "mm", Sec, Positive),
    f("width_mm", "short leg b", "mm", Sec, Positive),
    f("thickness_mm", "thickness t", "mm", Sec, Positive),
    f(
        "root_radius_mm",
        "root radius r1",
        "mm",
        Sec,
        OptNonNegative,
    ),
    f("toe_radius_mm", "toe radius r2", "mm", Sec, OptNonNegative),
];
const FLANGED_FIELDS: [Field; 5] = [
    f("depth_mm", "depth h", "mm", Sec, Positive),
    f("width_mm", "flange width b", "mm", Sec, Positive),
    f("flange_mm", "flange thickness t_f", "mm", Sec, Positive),
    f("web_mm", "web thickness t_w", "mm", Sec, Positive),
    f("root_radius_mm", "root radius r", "mm", Sec, OptNonNegative),
];
const RECT_FIELDS: [Field; 2] = [
    f("depth_mm", "depth h", "mm", Sec, Positive),
    f("width_mm", "width b", "mm", Sec, Positive),
];
const ROUND_FIELDS: [Field; 1] = [f("diameter_mm", "diameter d", "mm", Sec, Positive)];
const GIVEN_FIELDS: [Field; 9] = [
    f("area_mm2", "area A", "mm²", Sec, Positive),
    f(
        "i_major_mm4",
        "second moment, major axis",
        "mm⁴",
        Sec,
        Positive,
    ),
    f(
        "i_minor_mm4",
        "second moment, minor axis",
        "mm⁴",
        Sec,
        Positive,
    ),
    f(
        "torsion_mm4",
        "torsion constant I_t (optional)",
        "mm⁴",
        Sec,
        OptPositive,
    ),
    f(
        "warping_mm6",
        "warping constant I_w (optional)",
        "mm⁶",
        Sec,
        OptPositive,
    ),
    f(
        "w_el_major_mm3",
        "elastic modulus W_el, major axis (optional)",
        "mm³",
        Sec,
        OptPositive,
    ),
    f(
        "w_el_minor_mm3",
        "elastic modulus W_el, minor axis (optional)",
        "mm³",
        Sec,
        OptPositive,
    ),
    f(
        "w_pl_major_mm3",
        "plastic modulus W_pl, major axis (optional)",
        "mm³",
        Sec,
        OptPositive,
    ),
    f(
        "w_pl_minor_mm3",
        "plastic modulus W_pl, minor axis (optional)",
        "mm³",
        Sec,
        OptPositive,
    ),
];
const CATALOGUE_FIELDS: [Field; 1] = [f("designation", "designation", "", Sec, Text)];

/// The dimension fields of a section kind.
pub fn section_fields(kind: &str) -> &'static [Field] {
    match kind {
        "i" => &I_FIELDS,
        "rhs" => &RHS_FIELDS,
        "chs" => &CHS_FIELDS,
        "angle" => &ANGLE_FIELDS,
        "channel" | "tee" => &FLANGED_FIELDS,
        "rect" => &RECT_FIELDS,
        "round" => &ROUND_FIELDS,
        "given" => &GIVEN_FIELDS,
        "catalogue" => &CATALOGUE_FIELDS,
        _ => &[],
    }
}

/// The editor's field of a member-file key, wherever it sits.
pub fn any_field(key: &str) -> Option<Field> {
    KINDS
        .iter()
        .flat_map(|(k, _)| section_fields(k).iter().copied())
        .find(|f| f.key == key)
        .or_else(|| {
            let d = schema::member_key(key)
                .map(|d| (d, Mem))
                .or_else(|| schema::material_key(key).map(|d| (d, Mat)))?;
            (d.0.options.is_empty()).then(|| field_of(d.0, d.1))
        })
}

// The member's and material's fields are made from core's one description
// of their keys (`strutline_core::member::schema`): label, unit (by the
// key's suffix) and what the field accepts. The constants below are
// evaluated by the compiler, so a key that is not described stops the
// build ("evaluation of constant value failed").

/// Whether two texts are the same (usable in constants).
const fn same(a: &[u8], b: &[u8]) -> bool {
    a.len() == b.len() && ends_with(a, b)
}

/// Whether `s` ends with `suffix` (usable in constants).
const fn ends_with(s: &[u8], suffix: &[u8]) -> bool {
    let (mut s, mut suffix) = (s, suffix);
    loop {
        match (s.split_last(), suffix.split_last()) {
            (_, None) => return true,
            (Some((x, rs)), Some((y, rf))) if *x == *y => {
                s = rs;
                suffix = rf;
            }
            _ => return false,
        }
    }
}

/// The stored (member-file, SI) unit of a key, from its suffix.
pub const fn stored_unit(key: &str) -> &'static str {
    let k = key.as_bytes();
    if ends_with(k, b"_mm") {
        "mm"
    } else if ends_with(k, b"_mm2") {
        "mm²"
    } else if ends_with(k, b"_mm3") {
        "mm³"
    } else if ends_with(k, b"_mm4") {
        "mm⁴"
    } else if ends_with(k, b"_mm6") {
        "mm⁶"
    } else if ends_with(k, b"_kn") {
        "kN"
    } else if ends_with(k, b"_knm") {
        "kN·m"
    } else if ends_with(k, b"_mpa") {
        "MPa"
    } else {
        ""
    }
}

/// What a field of a described key accepts.
const fn rule_of(d: &Key) -> Rule {
    let required = matches!(d.default, Absent::Required | Absent::One);
    match (d.value, required) {
        (Holds::Number(Sign::Positive), true) => Positive,
        (Holds::Number(_), true) => NonNegative,
        (Holds::Number(Sign::Positive), false) => OptPositive,
        (Holds::Number(Sign::NonNegative), false) => OptNonNegative,
        (Holds::Number(Sign::Any), false) => OptNumber,
        (_, true) => Text,
        (_, false) => OptText,
    }
}

/// The field of a described key.
const fn field_of(d: &'static Key, place: Place) -> Field {
    f(d.key, d.label, stored_unit(d.key), place, rule_of(d))
}

/// The described member key named `key`; a key that is not described
/// stops the build where this is evaluated in a constant.
const fn described(key: &str) -> &'static Key {
    let mut rest = schema::MEMBER;
    while let Some((d, tail)) = rest.split_first() {
        if same(d.key.as_bytes(), key.as_bytes()) {
            return d;
        }
        rest = tail;
    }
    // Only ever evaluated in constants: an undescribed key is a build error.
    #[allow(clippy::panic)]
    {
        panic!("a member key the editor shows is not described in member::schema")
    }
}

/// The editor's field of a described member key.
const fn member_field(key: &str) -> Field {
    field_of(described(key), Mem)
}

/// The member's own numeric fields.
pub const MEMBER_FIELDS: [Field; 2] = [member_field("length_mm"), member_field("axial_kn")];

/// The bending keys of member file version 3: end and span moments per
/// axis (as values of the bending-moment diagram: the same sign at both
/// ends is single curvature), and the length between lateral-torsional
/// restraints.
pub const BENDING_FIELDS: [Field; 8] = [
    member_field("m_major_a_knm"),
    member_field("m_major_b_knm"),
    member_field("m_major_span_knm"),
    member_field("m_minor_a_knm"),
    member_field("m_minor_b_knm"),
    member_field("m_minor_span_knm"),
    member_field("k_lt"),
    member_field("lcr_lt_mm"),
];

/// The bending choices' keys: span load shapes, lateral restraint, load
/// level, the moments' order and the interaction annex.
pub const BENDING_CHOICES: [&str; 6] = [
    "span_load_major",
    "span_load_minor",
    "lt_restrained",
    "load_level",
    "amplify_moments",
    "interaction_annex",
];

/// The bending choices.
pub fn bending_choices() -> Vec<Choice> {
    BENDING_CHOICES
        .iter()
        .filter_map(|k| member_choice(k))
        .collect()
}

/// The member's free-text note.
pub const NOTE: Field = member_field("note");

/// Effective-length factor and buckling length of each axis.
pub const K_MAJOR: Field = member_field("k_major");
/// Minor-axis factor.
pub const K_MINOR: Field = member_field("k_minor");
/// Major-axis buckling length.
pub const LCR_MAJOR: Field = member_field("lcr_major_mm");
/// Minor-axis buckling length.
pub const LCR_MINOR: Field = member_field("lcr_minor_mm");

/// The described member keys the editor shows in a control of its own
/// (id, method, section kind, material mode) or does not edit (the
/// editor keeps them as they are in the file).
pub const NOT_EDITED: [&str; 10] = [
    "id",
    "method",
    "section",
    "material",
    "k_torsion",
    "lcr_torsion_mm",
    "angle_connection",
    "frame_major",
    "frame_minor",
    "buckling_model",
];

/// The select of a described key with options: "" first (the key left
/// out, in the words of what that means) unless the key is required, then
/// the other options in the description's order.
pub fn choice_of(d: &'static Key, place: Place) -> Choice {
    let mut options: Vec<(&'static str, &'static str)> = Vec::new();
    let default = match d.default {
        Absent::Absent(words) => {
            options.push(("", words));
            None
        }
        Absent::Name(name) => Some(name),
        Absent::Bool(true) => Some("true"),
        Absent::Bool(false) => Some("false"),
        Absent::Required | Absent::Zero | Absent::One => None,
    };
    if let Some(name) = default {
        options.push(("", d.option(name).map_or(name, |o| o.words)));
    }
    options.extend(
        d.options
            .iter()
            .filter(|o| Some(o.name) != default)
            .map(|o| (o.name, o.words)),
    );
    Choice {
        key: d.key,
        label: d.label,
        place,
        options,
    }
}

/// The select of a described member key.
pub fn member_choice(key: &str) -> Option<Choice> {
    schema::member_key(key)
        .filter(|d| !d.options.is_empty())
        .map(|d| choice_of(d, Mem))
}

/// How the material is given.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum MaterialMode {
    /// A named grade or strength class.
    Grade,
    /// Custom steel values.
    Steel,
    /// Custom timber values.
    Timber,
}

impl MaterialMode {
    /// Of a material.
    pub fn of(m: &MaterialSpec) -> MaterialMode {
        match m {
            MaterialSpec::Grade { .. } => MaterialMode::Grade,
            MaterialSpec::Custom { .. } => MaterialMode::Steel,
            MaterialSpec::Timber { .. } => MaterialMode::Timber,
        }
    }

    /// Select value.
    pub fn value(self) -> &'static str {
        match self {
            MaterialMode::Grade => "grade",
            MaterialMode::Steel => "steel",
            MaterialMode::Timber => "timber",
        }
    }

    /// From a select value.
    pub fn from_value(v: &str) -> MaterialMode {
        match v {
            "grade" => MaterialMode::Grade,
            "timber" => MaterialMode::Timber,
            _ => MaterialMode::Steel,
        }
    }

    /// A starting material of this kind.
    pub fn default_spec(self) -> MaterialSpec {
        match self {
            MaterialMode::Grade => MaterialSpec::Grade {
                grade: "S355".into(),
            },
            MaterialMode::Steel => MaterialSpec::Custom {
                fy_mpa: 355.0,
                e_mpa: 210_000.0,
                g_mpa: None,
            },
            MaterialMode::Timber => MaterialSpec::Timber {
                fc0k_mpa: 21.0,
                e005_mpa: 7400.0,
                e0mean_mpa: 11000.0,
                timber: strutline_core::material::TimberKind::Solid,
            },
        }
    }
}

/// The material form of a mode in core's description.
fn form(mode: MaterialMode) -> Option<&'static schema::Form> {
    schema::material_form(mode.value())
}

/// The material fields of a mode (its described keys without options).
pub fn material_fields(mode: MaterialMode) -> Vec<Field> {
    form(mode)
        .map_or(&[][..], |f| f.keys)
        .iter()
        .filter(|d| d.options.is_empty())
        .map(|d| field_of(d, Mat))
        .collect()
}

/// Grade names offered in the grade field's list (the engine decides
/// which it knows).
pub const GRADE_SUGGESTIONS: [&str; 14] = [
    "S235",
    "S275",
    "S355",
    "S460",
    "A36",
    "A992",
    "A500 Gr C",
    "350W",
    "C16",
    "C24",
    "C30",
    "GL24h",
    "GL28h",
    "GL32h",
];

/// The keys of a method's options, in the order the editor shows them.
pub fn method_keys(method: Method) -> &'static [&'static str] {
    match method {
        Method::En1993 => &["gamma_m1", "curve_major", "curve_minor"],
        Method::PerryRobertson => &["gamma_m1", "bow_mm"],
        Method::Secant => &["gamma_m1", "eccentricity_mm"],
        Method::Euler => &["gamma_m1"],
        Method::En1995 => &["service_class", "load_duration"],
        // The length of the member's own moment amplification from the
        // engineer's analysis: only these codes' beam-column checks use it.
        Method::CsaS16 => &[
            "csa_n",
            "amplification_length_major_mm",
            "amplification_length_minor_mm",
        ],
        Method::AiscLrfd | Method::AiscAsd => &[
            "amplification_length_major_mm",
            "amplification_length_minor_mm",
        ],
    }
}

/// A method's typed options.
pub fn option_fields(method: Method) -> Vec<Field> {
    method_keys(method)
        .iter()
        .filter_map(|k| schema::member_key(k))
        .filter(|d| d.options.is_empty())
        .map(|d| match (method, d.key) {
            // The first-principles methods take γ as a factor on the resistance.
            (Method::Euler, "gamma_m1") => Field {
                label: "factor on resistance (empty: 1.0)",
                ..field_of(d, Mem)
            },
            _ => field_of(d, Mem),
        })
        .collect()
}

/// A select of the editor: its key, words and options (value, words);
/// the value "" removes the key so the engine's default applies.
#[derive(Debug, Clone, PartialEq)]
pub struct Choice {
    /// Member-file key, also the select's `name`.
    pub key: &'static str,
    /// Label.
    pub label: &'static str,
    /// Where it sits.
    pub place: Place,
    /// Options.
    pub options: Vec<(&'static str, &'static str)>,
}

/// The choices of a section kind (how it was made). "" leaves the make
/// out: the engine takes the make of lower resistance and says so.
pub fn section_choices(kind: &str) -> Vec<Choice> {
    match kind {
        "i" => vec![Choice {
            key: "make",
            label: "made",
            place: Sec,
            options: vec![
                ("", "not known: the lower-resistance make is taken"),
                ("rolled", "hot-rolled"),
                ("welded", "welded from plates"),
            ],
        }],
        "rhs" | "chs" => vec![Choice {
            key: "make",
            label: "made",
            place: Sec,
            options: vec![
                ("", "not known: taken as cold-formed (lower resistance)"),
                ("hot-finished", "hot-finished"),
                ("cold-formed", "cold-formed"),
            ],
        }],
        _ => Vec::new(),
    }
}

/// The choices of a material mode.
pub fn material_choices(mode: MaterialMode) -> Vec<Choice> {
    form(mode)
        .map_or(&[][..], |f| f.keys)
        .iter()
        .filter(|d| !d.options.is_empty())
        .map(|d| choice_of(d, Mat))
        .collect()
}

/// The choices of a method.
pub fn method_choices(method: Method) -> Vec<Choice> {
    method_keys(method)
        .iter()
        .filter_map(|k| member_choice(k))
        .collect()
}

/// The member-file key of a section's kind ("i", "rhs", ...), from core's
/// one description of the kinds (`section::schema`).
pub fn kind_of(spec: &SectionSpec) -> &'static str {
    spec.kind()
}

fn default_json(kind: &str) -> Value {
    let text = match kind {
        "i" => {
            r#"{"kind":"i","depth_mm":200,"width_mm":200,"flange_mm":15,"web_mm":9,"root_radius_mm":18}"#
        }
        "rhs" => r#"{"kind":"rhs","depth_mm":150,"width_mm":100,"wall_mm":6,"outer_radius_mm":9}"#,
        "chs" => r#"{"kind":"chs","diameter_mm":114.3,"wall_mm":5}"#,
        "angle" => {
            r#"{"kind":"angle","depth_mm":80,"width_mm":80,"thickness_mm":8,"root_radius_mm":10,"toe_radius_mm":5}"#
        }
        "channel" => {
            r#"{"kind":"channel","depth_mm":200,"width_mm":80,"flange_mm":12,"web_mm":7,"root_radius_mm":12}"#
        }
        "tee" => {
            r#"{"kind":"tee","depth_mm":150,"width_mm":150,"flange_mm":12,"web_mm":8,"root_radius_mm":10}"#
        }
        "round" => r#"{"kind":"round","diameter_mm":40}"#,
        "given" => {
            r#"{"kind":"given","area_mm2":2850,"i_major_mm4":9200000,"i_minor_mm4":3100000}"#
        }
        "catalogue" => r#"{"kind":"catalogue","designation":"HE 200 B"}"#,
        _ => r#"{"kind":"rect","depth_mm":100,"width_mm":60}"#,
    };
    serde_json::from_str(text).unwrap_or(Value::Null)
}

/// A section of `kind`, keeping the overall sizes of `from` that the new
/// kind also has (depth, width, diameter).
pub fn section_of_kind(kind: &str, from: &SectionSpec) -> SectionSpec {
    let mut new = default_json(kind);
    let old = as_value(from);
    if let (Some(n), Some(o)) = (new.as_object_mut(), old.as_object()) {
        for key in ["depth_mm", "width_mm", "diameter_mm"] {
            if n.contains_key(key) {
                if let Some(v) = o.get(key) {
                    n.insert(key.into(), v.clone());
                }
            }
        }
    }
    section_from_value(new).unwrap_or_else(|| from.clone())
}

/// Any serialisable value as a JSON value, through the member file's
/// writer and reader ([`strutline_core::file::json_value`]).
fn as_value<T: serde::Serialize>(x: &T) -> Value {
    strutline_core::file::json_value(x).unwrap_or(Value::Null)
}

/// A member from its JSON value, through the member file's own reader.
fn member_from(v: &Value) -> Result<Member, Error> {
    strutline_core::file::member_from_value(v, 0)
}

/// A section from its JSON value, read as part of a throwaway member so
/// that the member file's reader is the only one.
fn section_from_value(section: Value) -> Option<SectionSpec> {
    let probe = serde_json::json!({
        "id": "probe",
        "section": section,
        "material": {"fy_mpa": 1, "e_mpa": 1},
        "length_mm": 1,
        "axial_kn": 0,
        "method": "euler"
    });
    member_from(&probe).ok().map(|m| m.section)
}

fn place_of(obj: &Value, place: Place) -> Option<&Map<String, Value>> {
    match place {
        Place::Member => obj.as_object(),
        Place::Section => obj.get("section").and_then(Value::as_object),
        Place::Material => obj.get("material").and_then(Value::as_object),
    }
}

fn place_of_mut(obj: &mut Value, place: Place) -> Option<&mut Map<String, Value>> {
    match place {
        Place::Member => obj.as_object_mut(),
        Place::Section => obj.get_mut("section").and_then(Value::as_object_mut),
        Place::Material => obj.get_mut("material").and_then(Value::as_object_mut),
    }
}

/// The text a field shows for a member ("" for an absent option).
pub fn read(member: &Member, place: Place, key: &str) -> String {
    let v = as_value(member);
    match place_of(&v, place).and_then(|o| o.get(key)) {
        Some(Value::Number(n)) => n.as_f64().map(for_input).unwrap_or_default(),
        Some(Value::String(s)) => s.clone(),
        Some(Value::Bool(b)) => b.to_string(),
        // Defaults that serde leaves out of the file (k = 1).
        _ => schema::member_key(key)
            .and_then(Key::default_text)
            .unwrap_or_default()
            .into(),
    }
}

fn set(member: &Member, place: Place, key: &str, value: Option<Value>) -> Result<Member, String> {
    let mut v = as_value(member);
    let obj = place_of_mut(&mut v, place).ok_or_else(|| format!("{key}: cannot be set here"))?;
    match value {
        Some(x) => {
            obj.insert(key.to_string(), x);
        }
        None => {
            obj.remove(key);
        }
    }
    member_from(&v).map_err(|e| format!("{key}: {}", error_text(&e)))
}

fn number(v: f64) -> Value {
    serde_json::Number::from_f64(v).map_or(Value::Null, Value::Number)
}

/// The member with `text` typed into `field`, or the message beside the
/// field. The engine then has its say through [`engine_objection`].
pub fn apply(member: &Member, field: &Field, text: &str) -> Result<Member, String> {
    let key = field.key;
    let value = match field.rule {
        Rule::Text => {
            let t = text.trim();
            if t.is_empty() {
                return Err(NumError::Empty.message(key));
            }
            Some(Value::String(t.to_string()))
        }
        Rule::OptText => {
            let t = text.trim();
            (!t.is_empty()).then(|| Value::String(t.to_string()))
        }
        Rule::Positive | Rule::NonNegative => {
            let x = parse_number(text).map_err(|e| e.message(key))?;
            check_sign(key, x, field.rule)?;
            Some(number(x))
        }
        Rule::OptPositive | Rule::OptNonNegative | Rule::OptNumber => {
            if text.trim().is_empty() {
                None
            } else {
                let x = parse_number(text).map_err(|e| e.message(key))?;
                check_sign(key, x, field.rule)?;
                Some(number(x))
            }
        }
    };
    set(member, field.place, key, value)
}

fn check_sign(key: &str, x: f64, rule: Rule) -> Result<(), String> {
    match rule {
        Rule::Positive | Rule::OptPositive if x <= 0.0 => {
            Err(format!("{key}: must be a number greater than zero"))
        }
        Rule::NonNegative | Rule::OptNonNegative if x < 0.0 => {
            Err(format!("{key}: must be zero or more"))
        }
        _ => Ok(()),
    }
}

/// The member with option `value` chosen in a select ("" removes the key).
pub fn apply_choice(member: &Member, choice: &Choice, value: &str) -> Result<Member, String> {
    let v = if value.is_empty() {
        None
    } else {
        let holds = schema::member_key(choice.key)
            .or_else(|| schema::material_key(choice.key))
            .map(|d| d.value);
        match holds {
            Some(Holds::Bool) => Some(Value::Bool(value == "true")),
            Some(Holds::Whole) => {
                let n: u64 = value.trim().parse().map_err(|_| {
                    format!("{}: expected a whole number such as 1, 2 or 3", choice.key)
                })?;
                Some(Value::from(n))
            }
            Some(Holds::Number(_)) => Some(number(
                parse_number(value).map_err(|e| e.message(choice.key))?,
            )),
            _ => Some(Value::String(value.to_string())),
        }
    };
    set(member, choice.place, choice.key, v)
}

fn innermost(e: &Error) -> &Error {
    match e {
        Error::InMember { source, .. } => innermost(source),
        other => other,
    }
}

/// The engine's message about `key`, when checking `member` fails because
/// of that field (the message names the field, e.g. "depth_mm: ...").
pub fn engine_objection(member: &Member, key: &str) -> Option<String> {
    let e = match Prepared::new(member).and_then(|p| p.check()) {
        Ok(_) => return None,
        Err(e) => e,
    };
    let field = e.field()?;
    let same = field == key || (field == "material" && matches!(key, "grade"));
    same.then(|| innermost(&e).to_string())
}

/// The engine's error in words without the member prefix.
pub fn error_text(e: &Error) -> String {
    innermost(e).to_string()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;

    fn field(key: &str) -> Field {
        section_fields("rect")
            .iter()
            .chain(MEMBER_FIELDS.iter())
            .chain(material_fields(MaterialMode::Steel).iter())
            .copied()
            .chain([K_MAJOR, LCR_MINOR])
            .find(|f| f.key == key)
            .unwrap()
    }

    /// The editor edits exactly the keys of core's one description of the
    /// section kinds (`strutline_core::section::schema`), with the rule its
    /// default implies, and offers every kind in the same order.
    #[test]
    fn editor_fields_match_the_section_schema() {
        use strutline_core::section::schema::{self, Default as Absent, Value as Holds};
        let listed: Vec<&str> = KINDS.iter().map(|(k, _)| *k).collect();
        let described: Vec<&str> = schema::kind_names().collect();
        assert_eq!(
            listed, described,
            "fields::KINDS against section::schema::KINDS"
        );
        for kind in &schema::KINDS {
            let fields = section_fields(kind.name);
            let choices = section_choices(kind.name);
            for key in kind.keys {
                match key.value {
                    Holds::Choice(options) => {
                        let choice =
                            choices
                                .iter()
                                .find(|c| c.key == key.key)
                                .unwrap_or_else(|| {
                                    panic!(
                                        "kind \"{}\": no editor choice for \"{}\"",
                                        kind.name, key.key
                                    )
                                });
                        let offered: Vec<&str> = choice.options.iter().map(|(v, _)| *v).collect();
                        // A key that may be absent is offered as "" first.
                        let mut expected: Vec<&str> = Vec::new();
                        if key.default == Absent::Absent {
                            expected.push("");
                        }
                        expected.extend_from_slice(options);
                        assert_eq!(offered, expected, "{} {}", kind.name, key.key);
                    }
                    Holds::Number | Holds::Text => {
                        let field = fields.iter().find(|f| f.key == key.key).unwrap_or_else(|| {
                            panic!(
                                "kind \"{}\": no editor field for \"{}\"",
                                kind.name, key.key
                            )
                        });
                        let optional = matches!(
                            field.rule,
                            Rule::OptNonNegative | Rule::OptPositive | Rule::OptText
                        );
                        assert_eq!(optional, key.default != Absent::Required, "{}", key.key);
                    }
                }
            }
            for key in fields
                .iter()
                .map(|f| f.key)
                .chain(choices.iter().map(|c| c.key))
            {
                assert!(
                    kind.key(key).is_some(),
                    "the editor shows \"{key}\" for kind \"{}\", which section::schema does not describe",
                    kind.name
                );
            }
        }
    }

    /// Every member and material key of core's one description
    /// (`strutline_core::member::schema`) is a field or a choice of the
    /// editor, or is listed in `NOT_EDITED`; every key the editor shows is
    /// described.
    #[test]
    fn editor_fields_match_the_member_schema() {
        let mut shown: Vec<(&str, bool)> = [NOTE, K_MAJOR, K_MINOR, LCR_MAJOR, LCR_MINOR]
            .iter()
            .chain(MEMBER_FIELDS.iter())
            .chain(BENDING_FIELDS.iter())
            .map(|f| (f.key, false))
            .collect();
        shown.extend(bending_choices().iter().map(|c| (c.key, true)));
        for m in Method::ALL {
            shown.extend(option_fields(m).iter().map(|f| (f.key, false)));
            shown.extend(method_choices(m).iter().map(|c| (c.key, true)));
            for k in method_keys(m) {
                assert!(
                    shown.iter().any(|(s, _)| s == k),
                    "fields::method_keys names \"{k}\", which member::schema does not describe"
                );
            }
        }
        for k in BENDING_CHOICES {
            assert!(
                shown.iter().any(|(s, _)| *s == k),
                "fields::BENDING_CHOICES names \"{k}\", which member::schema does not describe"
            );
        }
        for d in schema::MEMBER {
            let here = shown.iter().find(|(k, _)| *k == d.key);
            match here {
                Some((_, is_choice)) => assert_eq!(
                    *is_choice,
                    !d.options.is_empty(),
                    "\"{}\": a choice exactly when described with options",
                    d.key
                ),
                None => assert!(
                    NOT_EDITED.contains(&d.key),
                    "member key \"{}\" is described in member::schema, but the editor \
                     (web/src/fields.rs) neither shows it nor lists it in NOT_EDITED",
                    d.key
                ),
            }
        }
        for k in NOT_EDITED {
            assert!(
                schema::member_key(k).is_some(),
                "NOT_EDITED: {k} is not described"
            );
        }
        for mode in [
            MaterialMode::Grade,
            MaterialMode::Steel,
            MaterialMode::Timber,
        ] {
            let form = schema::material_form(mode.value()).unwrap();
            let keys: Vec<&str> = material_fields(mode)
                .iter()
                .map(|f| f.key)
                .chain(material_choices(mode).iter().map(|c| c.key))
                .collect();
            let described: Vec<&str> = form.keys.iter().map(|k| k.key).collect();
            let mut sorted = keys.clone();
            sorted.sort_unstable();
            let mut want = described.clone();
            want.sort_unstable();
            assert_eq!(sorted, want, "material mode {}", mode.value());
            // A material the mode starts with writes exactly the form's keys.
            let start = serde_json::to_value(mode.default_spec()).unwrap();
            for key in start.as_object().unwrap().keys() {
                assert!(
                    form.key(key).is_some(),
                    "{} starts with {key}",
                    mode.value()
                );
            }
        }
        // The choices offer "" first (the default) and every described option.
        let annex = member_choice("interaction_annex").unwrap();
        assert_eq!(
            annex.options,
            vec![
                ("", "the larger of Annex A and Annex B"),
                ("A", "Annex A (Method 1)"),
                ("B", "Annex B (Method 2)")
            ]
        );
        let curve = member_choice("curve_major").unwrap();
        assert_eq!(curve.options.len(), 6);
        assert_eq!(curve.options[0], ("", "by EN 1993-1-1 Table 6.2"));
    }

    #[test]
    fn every_kind_has_fields_that_read_back() {
        let base = sample_member("A");
        for (kind, _) in KINDS {
            let mut m = base.clone();
            m.section = section_of_kind(kind, &base.section);
            assert_eq!(kind_of(&m.section), kind);
            for fld in section_fields(kind) {
                let text = read(&m, fld.place, fld.key);
                if matches!(fld.rule, Rule::Positive | Rule::Text) {
                    assert!(!text.is_empty(), "{kind} {}", fld.key);
                }
                // Writing back what was read gives the same member.
                if !text.is_empty() {
                    assert_eq!(apply(&m, fld, &text).unwrap(), m, "{kind} {}", fld.key);
                }
            }
        }
    }

    #[test]
    fn switching_kind_keeps_overall_sizes() {
        let base = sample_member("A");
        let s = section_of_kind("i", &base.section);
        let v = serde_json::to_value(&s).unwrap();
        assert_eq!(v["depth_mm"], 100.0);
        assert_eq!(v["width_mm"], 60.0);
        assert_eq!(v["flange_mm"], 15.0);
    }

    #[test]
    fn typed_text_sets_the_member() {
        let m = sample_member("A");
        let m2 = apply(&m, &field("depth_mm"), "120,5").unwrap();
        assert_eq!(
            m2.section,
            SectionSpec::Rect(strutline_core::section::Rect {
                depth_mm: 120.5,
                width_mm: 60.0
            })
        );
        let m3 = apply(&m, &field("length_mm"), "3 200").unwrap();
        assert_eq!(m3.length_mm, 3200.0);
        let m4 = apply(&m, &field("lcr_minor_mm"), "1800").unwrap();
        assert_eq!(m4.lcr_minor_mm, Some(1800.0));
        let m5 = apply(&m4, &field("lcr_minor_mm"), " ").unwrap();
        assert_eq!(m5.lcr_minor_mm, None);
        let m6 = apply(&m, &field("k_major"), "0.65").unwrap();
        assert_eq!(m6.k_major, 0.65);
        assert_eq!(read(&m6, Place::Member, "k_major"), "0.65");
        assert_eq!(read(&m, Place::Member, "k_major"), "1");
        let m7 = apply(&m, &field("fy_mpa"), "460").unwrap();
        assert_eq!(read(&m7, Place::Material, "fy_mpa"), "460");
    }

    #[test]
    fn bad_text_gives_message_naming_the_field() {
        let m = sample_member("A");
        assert_eq!(
            apply(&m, &field("depth_mm"), "0").unwrap_err(),
            "depth_mm: must be a number greater than zero"
        );
        assert_eq!(
            apply(&m, &field("depth_mm"), "abc").unwrap_err(),
            "depth_mm: must be a number (digits, with a point or a comma as decimal mark)"
        );
        assert_eq!(
            apply(&m, &field("axial_kn"), "-5").unwrap_err(),
            "axial_kn: must be zero or more"
        );
        assert_eq!(
            apply(&m, &field("length_mm"), "").unwrap_err(),
            "length_mm: enter a value"
        );
        assert!(apply(&m, &field("axial_kn"), "0").is_ok());
    }

    #[test]
    fn choices_set_and_clear_options() {
        let m = sample_member("A");
        let c = &method_choices(Method::En1993)[1];
        let m2 = apply_choice(&m, c, "c").unwrap();
        assert_eq!(m2.curve_minor, Some(strutline_core::member::Curve::C));
        assert_eq!(apply_choice(&m2, c, "").unwrap().curve_minor, None);
        let sc = &method_choices(Method::En1995)[0];
        assert_eq!(apply_choice(&m, sc, "3").unwrap().service_class, Some(3));
        let n = &method_choices(Method::CsaS16)[0];
        assert_eq!(apply_choice(&m, n, "2.24").unwrap().csa_n, Some(2.24));
        let mut i = m.clone();
        i.section = section_of_kind("i", &m.section);
        let make = &section_choices("i")[0];
        let welded = apply_choice(&i, make, "welded").unwrap();
        assert!(
            matches!(welded.section, SectionSpec::I(ref s) if s.make == strutline_core::section::IMake::Welded)
        );
        // The first option leaves the make out: not known, shown as such.
        assert_eq!(make.options[0].0, "");
        let unknown = apply_choice(&welded, make, "").unwrap();
        assert!(matches!(unknown.section, SectionSpec::I(ref s) if s.make.is_unstated()));
        assert_eq!(read(&unknown, Sec, "make"), "");
    }

    #[test]
    fn engine_objection_names_only_its_field() {
        let mut m = sample_member("A");
        assert_eq!(engine_objection(&m, "length_mm"), None);
        m.gamma_m1 = Some(9.0);
        let msg = engine_objection(&m, "gamma_m1").unwrap();
        assert!(msg.starts_with("gamma_m1:"), "{msg}");
        assert_eq!(engine_objection(&m, "length_mm"), None);
    }

    #[test]
    fn material_modes() {
        for mode in [
            MaterialMode::Grade,
            MaterialMode::Steel,
            MaterialMode::Timber,
        ] {
            assert_eq!(MaterialMode::from_value(mode.value()), mode);
            assert_eq!(MaterialMode::of(&mode.default_spec()), mode);
            let mut m = sample_member("A");
            m.material = mode.default_spec();
            for fld in material_fields(mode) {
                let t = read(&m, fld.place, fld.key);
                if !t.is_empty() {
                    assert_eq!(apply(&m, &fld, &t).unwrap(), m);
                }
            }
        }
    }
    #[test]
    fn default_grade_and_catalogue_resolve_in_the_engine() {
        // The starting values the editor offers must check as they are.
        let mut m = sample_member("A");
        m.material = MaterialMode::Grade.default_spec();
        assert!(
            strutline_core::check_member(&m).is_ok(),
            "{:?}",
            strutline_core::check_member(&m).err()
        );
        m.material = MaterialMode::Steel.default_spec();
        for (kind, _) in KINDS {
            m.section = section_of_kind(kind, &sample_member("A").section);
            let r = strutline_core::check_member(&m);
            assert!(r.is_ok(), "{kind}: {:?}", r.err());
        }
    }
    #[test]
    fn note_is_optional_text() {
        let m = sample_member("A");
        let with = apply(&m, &NOTE, " stair post ").unwrap();
        assert_eq!(with.note.as_deref(), Some("stair post"));
        assert_eq!(apply(&with, &NOTE, "  ").unwrap().note, None);
    }

    #[test]
    fn the_amplification_length_is_edited_only_where_a_method_uses_it() {
        for m in Method::ALL {
            let keys: Vec<&str> = option_fields(m).iter().map(|f| f.key).collect();
            let uses = matches!(m, Method::AiscLrfd | Method::AiscAsd | Method::CsaS16);
            for k in [
                "amplification_length_major_mm",
                "amplification_length_minor_mm",
            ] {
                assert_eq!(keys.contains(&k), uses, "{} shows {k}: {keys:?}", m.key());
            }
        }
    }
}
