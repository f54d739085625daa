//! Reading the member file's two choice-of-shape objects, `section` (picked
//! by its `"kind"`) and `material` (picked by its keys), by hand.
//!
//! Natively `SectionSpec` and `MaterialSpec` derive `Deserialize` (an
//! internally tagged and an untagged enum). Serde compiles those through a
//! buffered "content" form, which came to about 28 KB of the browser's
//! wasm; the browser build therefore reads them here instead: the object is
//! taken as a `serde_json::Value`, the tag (or the keys) chooses the shape,
//! and that shape's own derived reader does the rest. The rules are the
//! derived ones: `"kind"` is required and must be a known kind (the same
//! messages), and a material tries a grade, then custom timber, then a
//! custom elastic-plastic material, in that order. The tests check that
//! both readers agree on every input they are given, good and bad.

use serde::de::{Deserialize, Error as _};
use serde_json::Value;

use crate::material::{MaterialSpec, TimberKind};
use crate::section::SectionSpec;

/// The kinds of section, as written in the member file.
pub const KINDS: [&str; 10] = [
    "i",
    "rhs",
    "chs",
    "angle",
    "channel",
    "tee",
    "rect",
    "round",
    "given",
    "catalogue",
];

/// A section from its member-file object.
pub fn section(v: Value) -> Result<SectionSpec, serde_json::Error> {
    let Value::Object(mut map) = v else {
        return Err(serde_json::Error::custom(format!(
            "invalid type: {}, expected internally tagged enum SectionSpec",
            unexpected(&v)
        )));
    };
    let kind = match map.remove("kind") {
        Some(Value::String(k)) => k,
        Some(other) => {
            return Err(serde_json::Error::custom(format!(
                "invalid type: {}, expected variant identifier",
                unexpected(&other)
            )))
        }
        None => return Err(serde_json::Error::missing_field("kind")),
    };
    let rest = Value::Object(map);
    Ok(match kind.as_str() {
        "i" => SectionSpec::I(Deserialize::deserialize(rest)?),
        "rhs" => SectionSpec::Rhs(Deserialize::deserialize(rest)?),
        "chs" => SectionSpec::Chs(Deserialize::deserialize(rest)?),
        "angle" => SectionSpec::Angle(Deserialize::deserialize(rest)?),
        "channel" => SectionSpec::Channel(Deserialize::deserialize(rest)?),
        "tee" => SectionSpec::Tee(Deserialize::deserialize(rest)?),
        "rect" => SectionSpec::Rect(Deserialize::deserialize(rest)?),
        "round" => SectionSpec::Round(Deserialize::deserialize(rest)?),
        "given" => SectionSpec::Given(Deserialize::deserialize(rest)?),
        "catalogue" => SectionSpec::Catalogue(Deserialize::deserialize(rest)?),
        other => return Err(serde_json::Error::unknown_variant(other, &KINDS)),
    })
}

/// The fields of a custom timber.
#[derive(serde::Deserialize)]
struct Timber {
    fc0k_mpa: f64,
    e005_mpa: f64,
    e0mean_mpa: f64,
    timber: TimberKind,
}

/// The fields of a custom elastic-plastic material.
#[derive(serde::Deserialize)]
struct Custom {
    fy_mpa: f64,
    e_mpa: f64,
    #[serde(default)]
    g_mpa: Option<f64>,
}

/// The field of a named grade.
#[derive(serde::Deserialize)]
struct Grade {
    grade: String,
}

/// A material from its member-file object: the first of grade, custom
/// timber and custom material whose fields it has.
pub fn material(v: Value) -> Result<MaterialSpec, serde_json::Error> {
    if let Ok(Grade { grade }) = Grade::deserialize(&v) {
        return Ok(MaterialSpec::Grade { grade });
    }
    if let Ok(t) = Timber::deserialize(&v) {
        return Ok(MaterialSpec::Timber {
            fc0k_mpa: t.fc0k_mpa,
            e005_mpa: t.e005_mpa,
            e0mean_mpa: t.e0mean_mpa,
            timber: t.timber,
        });
    }
    if let Ok(c) = Custom::deserialize(&v) {
        return Ok(MaterialSpec::Custom {
            fy_mpa: c.fy_mpa,
            e_mpa: c.e_mpa,
            g_mpa: c.g_mpa,
        });
    }
    Err(serde_json::Error::custom(
        "data did not match any variant of untagged enum MaterialSpec",
    ))
}

/// Serde's words for what a value is ("a string", "a sequence", ...).
fn unexpected(v: &Value) -> String {
    match v {
        Value::Null => "null".into(),
        Value::Bool(b) => format!("boolean `{b}`"),
        Value::Number(n) => format!("number {n}"),
        Value::String(s) => format!("string {s:?}"),
        Value::Array(_) => "sequence".into(),
        Value::Object(_) => "map".into(),
    }
}

#[cfg(all(test, not(target_arch = "wasm32")))]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;
    use serde_json::json;

    /// Both readers on one input: both succeed with the same value, or
    /// both fail.
    fn agree_section(v: Value) {
        let derived = serde_json::from_value::<SectionSpec>(v.clone());
        let by_hand = section(v.clone());
        match (&derived, &by_hand) {
            (Ok(a), Ok(b)) => assert_eq!(a, b, "{v}"),
            (Err(_), Err(_)) => {}
            _ => panic!("{v}: derived {derived:?}, by hand {by_hand:?}"),
        }
    }

    fn agree_material(v: Value) {
        let derived = serde_json::from_value::<MaterialSpec>(v.clone());
        let by_hand = material(v.clone());
        match (&derived, &by_hand) {
            (Ok(a), Ok(b)) => assert_eq!(a, b, "{v}"),
            (Err(_), Err(_)) => {}
            _ => panic!("{v}: derived {derived:?}, by hand {by_hand:?}"),
        }
    }

    #[test]
    fn sections_read_as_the_derived_reader_reads_them() {
        let good = [
            json!({"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 15, "web_mm": 9, "root_radius_mm": 18}),
            json!({"kind": "i", "depth_mm": 600, "width_mm": 400, "flange_mm": 12, "web_mm": 6, "make": "welded"}),
            json!({"kind": "rhs", "depth_mm": 150, "width_mm": 100, "wall_mm": 6, "outer_radius_mm": 9, "make": "hot-finished"}),
            json!({"kind": "chs", "diameter_mm": 168.3, "wall_mm": 6}),
            json!({"kind": "angle", "depth_mm": 100, "width_mm": 75, "thickness_mm": 8, "root_radius_mm": 10, "toe_radius_mm": 5}),
            json!({"kind": "channel", "depth_mm": 200, "width_mm": 75, "flange_mm": 12.5, "web_mm": 8.5, "root_radius_mm": 12}),
            json!({"kind": "tee", "depth_mm": 100, "width_mm": 100, "flange_mm": 10, "web_mm": 8, "root_radius_mm": 8}),
            json!({"kind": "rect", "depth_mm": 100, "width_mm": 60}),
            json!({"kind": "round", "diameter_mm": 40}),
            json!({"kind": "given", "area_mm2": 2850, "i_major_mm4": 9.2e6, "i_minor_mm4": 3.1e6}),
            json!({"kind": "catalogue", "designation": "HE 200 B"}),
        ];
        for v in good {
            assert!(section(v.clone()).is_ok(), "{v}");
            agree_section(v);
        }
        let bad = [
            json!({"depth_mm": 100, "width_mm": 60}),
            json!({"kind": "hexagon", "depth_mm": 100}),
            json!({"kind": 3, "depth_mm": 100}),
            json!({"kind": "rect", "depth_mm": "deep", "width_mm": 60}),
            json!({"kind": "rect", "depth_mm": 100}),
            json!({"kind": "rect", "depth_mm": 100, "width_mm": 60, "colour": "red"}),
            json!({"kind": "catalogue", "designation": "HE 200 B", "kind2": 1}),
            json!("rect"),
            json!([1, 2]),
            json!(null),
        ];
        for v in bad {
            assert!(section(v.clone()).is_err(), "{v}");
            agree_section(v);
        }
        let e = section(json!({"kind": "hexagon"})).unwrap_err().to_string();
        let d = serde_json::from_value::<SectionSpec>(json!({"kind": "hexagon"}))
            .unwrap_err()
            .to_string();
        assert_eq!(e, d, "the unknown-kind message names the kinds as before");
        assert_eq!(
            section(json!({"width_mm": 1})).unwrap_err().to_string(),
            serde_json::from_value::<SectionSpec>(json!({"width_mm": 1}))
                .unwrap_err()
                .to_string()
        );
    }

    #[test]
    fn every_example_and_catalogue_section_reads_alike() {
        for file in ["depot-mezzanine.json", "yard-canopy-over.json"] {
            let path = format!("{}/../examples/{file}", env!("CARGO_MANIFEST_DIR"));
            let v: Value = serde_json::from_str(&std::fs::read_to_string(path).unwrap()).unwrap();
            for m in v["members"].as_array().unwrap() {
                agree_section(m["section"].clone());
                agree_material(m["material"].clone());
            }
        }
        for e in crate::catalogue::entries() {
            agree_section(serde_json::to_value(&e.spec).unwrap());
        }
    }

    #[test]
    fn materials_read_as_the_derived_reader_reads_them() {
        let cases = [
            json!({"grade": "S355"}),
            json!({"grade": "S355", "fy_mpa": 300}),
            json!({"fc0k_mpa": 24, "e005_mpa": 8000, "e0mean_mpa": 12000, "timber": "glulam"}),
            json!({"fc0k_mpa": 24, "e005_mpa": 8000, "e0mean_mpa": 12000, "timber": "bamboo"}),
            json!({"fc0k_mpa": 24, "e005_mpa": 8000}),
            json!({"fy_mpa": 275, "e_mpa": 210000}),
            json!({"fy_mpa": 275, "e_mpa": 210000, "g_mpa": 81000}),
            json!({"fy_mpa": "high", "e_mpa": 210000}),
            json!({"grade": 355}),
            json!({}),
            json!("S355"),
            json!(null),
        ];
        for v in cases {
            agree_material(v);
        }
    }
}
