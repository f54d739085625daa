//! What the calc sheet needs besides the result: the member's inputs as an
//! engineer writes them (symbol, value with its unit, meaning, in the
//! order of the working), the running header and footer of every printed
//! page, and today's date. The sheet itself is built as text by
//! [`crate::report::sheet_html`], shown on screen as a preview and printed
//! by the browser (`@media print` in `style.css` hides everything else and
//! breaks the page between members).

use serde_json::Value;
use strutline_core::file::{json_value, SheetHeader};
use strutline_core::member::schema::{self, Value as Holds};
use strutline_core::method::Method;
use strutline_core::units::{self, UnitSystem};
use strutline_core::{Member, CAUTION};
use web_sys::js_sys;

use crate::fields;

/// The section's keys as the sheet gives them: (key, symbol, meaning).
/// The member's and the material's come from core's one description of
/// their keys (`strutline_core::member::schema`).
const SECTION_INPUTS: &[(&str, &str, &str)] = &[
    ("kind", "", "section shape"),
    ("designation", "", "catalogue designation"),
    ("make", "", "made"),
    ("depth_mm", "h", "depth"),
    ("width_mm", "b", "width"),
    ("diameter_mm", "D", "outside diameter"),
    ("flange_mm", "t_f", "flange thickness"),
    ("web_mm", "t_w", "web thickness"),
    ("wall_mm", "t", "wall thickness"),
    ("thickness_mm", "t", "leg thickness"),
    ("root_radius_mm", "r", "root radius"),
    ("toe_radius_mm", "r_2", "toe radius"),
    ("outer_radius_mm", "r_o", "outer corner radius"),
    ("inner_radius_mm", "r_i", "inner corner radius"),
    ("area_mm2", "A", "cross-section area"),
    ("i_major_mm4", "I_y", "second moment of area, major axis"),
    ("i_minor_mm4", "I_z", "second moment of area, minor axis"),
    ("torsion_mm4", "I_t", "torsion constant"),
    ("warping_mm6", "I_w", "warping constant"),
    (
        "w_el_major_mm3",
        "W_el,y",
        "elastic section modulus, major axis",
    ),
    (
        "w_el_minor_mm3",
        "W_el,z",
        "elastic section modulus, minor axis",
    ),
    (
        "w_pl_major_mm3",
        "W_pl,y",
        "plastic section modulus, major axis",
    ),
    (
        "w_pl_minor_mm3",
        "W_pl,z",
        "plastic section modulus, minor axis",
    ),
];

/// Every input key the sheet knows, in the order of the working (the order
/// of `member::schema::MEMBER`): the method and its factors, the member's
/// lengths and loads, the section, the material. (key, symbol, meaning);
/// the symbol is empty where the trade has none. A group's keys are named
/// by their CSV column (`angle_leg`).
pub fn input_table() -> Vec<(&'static str, &'static str, &'static str)> {
    let mut out = Vec::with_capacity(96);
    for d in schema::MEMBER {
        match d.value {
            Holds::Section => out.extend_from_slice(SECTION_INPUTS),
            Holds::Material => out.extend(
                schema::MATERIAL
                    .iter()
                    .flat_map(|f| f.keys)
                    .map(|k| (k.key, k.symbol, k.meaning)),
            ),
            Holds::Group { keys, .. } => {
                out.extend(keys.iter().map(|k| (k.key, k.symbol, k.meaning)));
            }
            _ => out.push((d.key, d.symbol, d.meaning)),
        }
    }
    out
}

/// One input line of the sheet: `f_c,0,k = 21 MPa  compressive strength
/// parallel to grain`.
#[derive(Debug, Clone, PartialEq)]
pub struct InputLine {
    /// The standard's symbol ("" where there is none).
    pub symbol: &'static str,
    /// The value with its unit, in the sheet's units.
    pub value: String,
    /// What it is, in words.
    pub meaning: String,
}

/// The member's inputs as sheet lines in the order of [`input_table`], values
/// in `system`'s units. The id and note head the page instead. A key the
/// table does not know yet (added to the member file later) still prints,
/// by the editor's label for it, never by its key.
pub fn inputs(system: UnitSystem, m: &Member) -> Vec<InputLine> {
    let mut found: Vec<(String, Value)> = Vec::new();
    if let Some(v) = json_value(m) {
        flatten(&v, &mut found);
    }
    let table = input_table();
    let mut out = Vec::new();
    for (key, symbol, meaning) in &table {
        if matches!(*key, "id" | "note") {
            continue;
        }
        if let Some((_, v)) = found.iter().find(|(k, _)| k == key) {
            out.push(line(system, key, symbol, meaning.to_string(), v));
        }
    }
    for (key, v) in &found {
        if !table.iter().any(|(k, ..)| k == key) && !matches!(key.as_str(), "id" | "note") {
            out.push(line(system, key, "", unknown_meaning(key), v));
        }
    }
    out
}

/// The keys and values of a member's JSON form, nested objects opened (a
/// group's keys named by their CSV column, `angle_leg`).
fn flatten(v: &Value, out: &mut Vec<(String, Value)>) {
    let Some(obj) = v.as_object() else {
        return;
    };
    for (k, v) in obj {
        let prefix = match schema::member_key(k).map(|d| d.value) {
            Some(Holds::Group { prefix, .. }) => Some(prefix),
            // A structure (the buckling model) has its own part of the
            // sheet (`modelsheet`), not input lines.
            Some(Holds::Structure) => continue,
            _ => None,
        };
        match (v, prefix) {
            (Value::Object(inner), Some(prefix)) => {
                for (k2, v2) in inner {
                    out.push((format!("{prefix}_{k2}"), v2.clone()));
                }
            }
            (Value::Object(_), None) => flatten(v, out),
            (Value::Null, _) => {}
            _ => out.push((k.clone(), v.clone())),
        }
    }
}

/// A message of the engine with every member-file key it names given as
/// the sheet gives that input: its symbol, or its meaning where it has
/// none ("gamma_m1 is not used" becomes "γ_M1 is not used"); a key of
/// choices followed by one of its values, by the value's words too
/// ("amplify_moments false" becomes "moments given: already second-order,
/// not amplified").
pub fn speak(message: &str) -> String {
    let table = input_table();
    let word_len = |s: &str, also: &[char]| {
        s.find(|c: char| !(c.is_ascii_alphanumeric() || c == '_' || also.contains(&c)))
            .unwrap_or(s.len())
    };
    let mut out = String::with_capacity(message.len());
    let mut rest = message;
    while let Some(c) = rest.chars().next() {
        let len = word_len(rest, &[]);
        if len == 0 {
            out.push(c);
            rest = &rest[c.len_utf8()..];
            continue;
        }
        let (word, after) = rest.split_at(len);
        rest = after;
        // Keys of one word ("method", "timber") are words too: left alone.
        let Some((_, sym, meaning)) = table.iter().find(|(k, ..)| k.contains('_') && *k == word)
        else {
            out.push_str(word);
            continue;
        };
        let value = after
            .strip_prefix(' ')
            .map(|v| &v[..word_len(v, &['-'])])
            .and_then(|v| Some((v, option_words(word, v)?)));
        match value {
            Some((v, words)) => {
                out.push_str(meaning);
                out.push_str(": ");
                out.push_str(words);
                rest = &after[1 + v.len()..];
            }
            None => out.push_str(if sym.is_empty() { meaning } else { sym }),
        }
    }
    out
}

/// The words of one of a key's values where the key takes a choice
/// (`amplify_moments` `false`: "already second-order, not amplified"),
/// from core's description of the key.
fn option_words(key: &str, value: &str) -> Option<&'static str> {
    schema::any_key(key)
        .and_then(|d| d.option(value))
        .map(|o| o.words)
}

/// The words for a key the table does not know: the editor's label, else
/// the key's words without its unit.
fn unknown_meaning(key: &str) -> String {
    if let Some(f) = fields::any_field(key) {
        return f.label.to_string();
    }
    let words: Vec<&str> = key
        .split('_')
        .filter(|w| {
            !matches!(
                *w,
                "mm" | "mm2" | "mm3" | "mm4" | "mm6" | "kn" | "knm" | "mpa"
            )
        })
        .collect();
    words.join(" ")
}

fn line(
    system: UnitSystem,
    key: &str,
    symbol: &'static str,
    meaning: String,
    v: &Value,
) -> InputLine {
    let value = match v {
        Value::Number(n) => {
            let x = n.as_f64().unwrap_or(f64::NAN);
            let (d, u) = match system {
                UnitSystem::Si => (x, fields::stored_unit(key)),
                UnitSystem::Us => units::key_to_display(system, key, x),
            };
            let shown = units::format_display(d, 5);
            if u.is_empty() {
                shown
            } else {
                format!("{shown} {u}")
            }
        }
        Value::String(s) if key == "method" => {
            Method::from_key(s).map_or_else(|| s.clone(), |m| m.title().to_string())
        }
        Value::String(s) if key == "kind" => fields::KINDS
            .iter()
            .find(|(k, _)| k == s)
            .map_or_else(|| s.clone(), |(_, words)| (*words).to_string()),
        Value::String(s) => option_words(key, s).map_or_else(|| s.clone(), str::to_string),
        Value::Bool(b) => {
            let name = if *b { "true" } else { "false" };
            option_words(key, name).unwrap_or(name).to_string()
        }
        other => other.to_string(),
    };
    InputLine {
        symbol,
        value,
        meaning,
    }
}

/// Text as a CSS string literal (quoted; `"`, `\` and line breaks escaped).
fn css_string(s: &str) -> String {
    let mut out = String::from("\"");
    for c in s.chars() {
        match c {
            '"' => out.push_str("\\\""),
            '\\' => out.push_str("\\\\"),
            '\n' | '\r' => out.push_str("\\A "),
            c if c.is_control() => {}
            c => out.push(c),
        }
    }
    out.push('"');
    out
}

/// The `@page` rule that gives every printed page of the sheet its header
/// (title and job reference at the left; prepared, checked, date and
/// revision at the right), the caution at the foot and "page 3 of 12".
/// Put in the page's style sheet through its object model while the sheet
/// is open (the page's policy allows no inline style).
pub fn page_rule(title: &str, h: &SheetHeader) -> String {
    let or_dash = |s: &str| {
        if s.trim().is_empty() {
            "—".to_string()
        } else {
            s.trim().to_string()
        }
    };
    let left = format!("{}\njob {}", or_dash(title), or_dash(&h.job));
    let right = format!(
        "prepared {} · checked {}\ndate {} · revision {}",
        or_dash(&h.prepared_by),
        or_dash(&h.checked_by),
        or_dash(&h.date),
        or_dash(&h.revision)
    );
    format!(
        "@page {{ \
         @top-left {{ content: {}; white-space: pre; font: 8pt sans-serif; vertical-align: bottom; }} \
         @top-right {{ content: {}; white-space: pre; text-align: right; font: 8pt sans-serif; vertical-align: bottom; }} \
         @bottom-left {{ content: {}; font: 7pt sans-serif; vertical-align: top; }} \
         @bottom-right {{ content: \"page \" counter(page) \" of \" counter(pages); width: 30mm; white-space: nowrap; font: 8pt sans-serif; vertical-align: top; }} }}",
        css_string(&left),
        css_string(&right),
        css_string(&format!("⚠ {CAUTION}")),
    )
}

/// Today's date, ISO 8601.
pub fn today() -> String {
    let s: String = js_sys::Date::new_0().to_iso_string().into();
    s.chars().take(10).collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::demo_lists;
    use strutline_core::material::MaterialSpec;

    fn get<'a>(v: &'a [InputLine], symbol: &str) -> &'a str {
        &v.iter().find(|l| l.symbol == symbol).unwrap().value
    }

    #[test]
    fn inputs_by_symbol_and_meaning_in_both_systems() {
        let m = demo_lists()[0].members[0].clone();
        let si = inputs(UnitSystem::Si, &m);
        assert_eq!(
            get(&si, "L"),
            format!("{} mm", units::format_display(m.length_mm, 5))
        );
        assert_eq!(get(&si, "h"), "140 mm");
        let us = inputs(UnitSystem::Us, &m);
        // 2800 mm / 304.8 mm per ft (exact) = 9.1864 ft; 140 mm / 25.4 = 5.5118 in.
        assert_eq!(get(&us, "L"), "9.1864 ft");
        assert_eq!(get(&us, "h"), "5.5118 in");
        // Never a file key, in either system.
        for l in si.iter().chain(&us) {
            assert!(
                !l.meaning.contains('_') && !l.value.contains("_mm"),
                "{l:?}"
            );
        }
    }

    #[test]
    fn timber_reads_as_an_engineer_writes_it() {
        let mut m = demo_lists()[0].members[0].clone();
        m.material = MaterialSpec::Timber {
            fc0k_mpa: 21.0,
            e005_mpa: 7400.0,
            e0mean_mpa: 11000.0,
            timber: strutline_core::material::TimberKind::Solid,
        };
        let si = inputs(UnitSystem::Si, &m);
        let f = si.iter().find(|l| l.symbol == "f_c,0,k").unwrap();
        assert_eq!(f.value, "21 MPa");
        assert_eq!(f.meaning, "compressive strength parallel to grain");
        // In the order of the working: load before section before material.
        let at = |s: &str| si.iter().position(|l| l.symbol == s).unwrap();
        assert!(at("L") < at("N_Ed") && at("N_Ed") < at("h") && at("h") < at("f_c,0,k"));
    }

    #[test]
    fn every_key_of_every_editor_field_has_a_symbol_or_words() {
        // A key added to the editor (or the member file) without a line
        // here fails, naming it.
        for (k, _) in fields::KINDS {
            for f in fields::section_fields(k) {
                assert!(
                    input_table().iter().any(|(key, ..)| *key == f.key),
                    "{} has no sheet line",
                    f.key
                );
            }
        }
        for list in demo_lists() {
            for m in &list.members {
                let mut found = Vec::new();
                flatten(&json_value(m).unwrap(), &mut found);
                for (k, _) in found {
                    assert!(
                        matches!(k.as_str(), "id" | "note")
                            || input_table().iter().any(|(key, ..)| *key == k),
                        "{k} has no sheet line"
                    );
                }
            }
        }
        assert_eq!(unknown_meaning("moment_top_knm"), "moment top");
    }

    #[test]
    fn engine_messages_speak_in_symbols() {
        assert_eq!(
            speak("gamma_m1 is not used by AISC 360; phi_c applies"),
            "γ_M1 is not used by AISC 360; phi_c applies"
        );
        assert_eq!(speak("lcr_major_mm: must be > 0"), "L_cr,y: must be > 0");
        assert_eq!(speak("method (timber)"), "method (timber)");
        // A key of choices with its value: both in words, never "... false".
        assert_eq!(
            speak("not applied (amplify_moments false): the moments given"),
            "not applied (moments given: already second-order, not amplified): the moments given"
        );
        assert_eq!(
            speak("applied (amplify_moments true)"),
            "applied (moments given: first-order, amplified by the check where the code leaves \
             it to the designer)"
        );
        assert_eq!(
            speak("load_level compression-flange."),
            "level of the transverse load on the depth: the compression flange (destabilising)."
        );
        // Not a value of the key: the key alone is spoken.
        assert_eq!(speak("lcr_major_mm given"), "L_cr,y given");
    }

    #[test]
    fn a_choice_reads_in_words_not_as_its_value() {
        let mut m = demo_lists()[0].members[0].clone();
        m.amplify_moments = false;
        m.lt_restrained = true;
        m.interaction_annex = Some(strutline_core::member::InteractionAnnex::A);
        let si = inputs(UnitSystem::Si, &m);
        let line = |meaning: &str| {
            si.iter()
                .find(|l| l.meaning == meaning)
                .unwrap_or_else(|| panic!("no line {meaning:?} in {si:?}"))
                .value
                .clone()
        };
        assert_eq!(line("moments given"), "already second-order, not amplified");
        // What lt_restrained assumes, in plain words: the flange held
        // against lateral movement and twist over the whole length, so no
        // lateral-torsional buckling is worked; or held at the restraints.
        let flange = "restraint of the compression flange against lateral movement and twist";
        assert_eq!(
            line(flange),
            "over the whole length, so no lateral-torsional buckling is worked"
        );
        // Not restrained is the default, which the sheet leaves out; its
        // words where a message names it (speak):
        assert_eq!(
            option_words("lt_restrained", "false"),
            Some(
                "only at the lateral-torsional restraints, so lateral-torsional buckling is \
                 worked between them"
            )
        );
        assert_eq!(
            line("EN 1993-1-1 interaction factors"),
            "Annex A (Method 1)"
        );
        for l in &si {
            assert!(!matches!(l.value.as_str(), "true" | "false"), "{l:?}");
        }
    }

    #[test]
    fn the_page_rule_carries_the_header_page_numbers_and_caution() {
        let h = SheetHeader {
            job: "J-204".into(),
            prepared_by: "R. \"Ray\" Amsel".into(),
            checked_by: String::new(),
            date: "2026-12-04".into(),
            revision: "B".into(),
        };
        let r = page_rule("Depot \\ hall", &h);
        assert!(r.contains("\"Depot \\\\ hall\\A job J-204\""), "{r}");
        assert!(
            r.contains("prepared R. \\\"Ray\\\" Amsel · checked —\\A date 2026-12-04 · revision B"),
            "{r}"
        );
        assert!(r.contains("counter(page) \" of \" counter(pages)"));
        assert!(r.contains(CAUTION));
    }
}
