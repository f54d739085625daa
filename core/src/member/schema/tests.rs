use super::*;
use crate::buckling::chart::Frame;
use crate::material::{MaterialSpec, TimberKind};
use crate::member::{
    AngleConnection, Curve, InteractionAnnex, Leg, LoadDuration, LoadLevel, Member, Method,
    SpanLoad, Truss,
};
use crate::section::{Rect, SectionSpec};
use serde_json::{json, Map, Value as Json};

/// A member with every field set away from its default (a struct literal,
/// so a new field fails to compile here until it is given a value).
fn specimen() -> Member {
    let model = json!({
        "ends": {
            "a": {"major": {"translation": "fixed", "rotation": "free"},
                  "minor": {"translation": "fixed", "rotation": "free"}},
            "b": {"major": {"translation": "fixed", "rotation": "free"},
                  "minor": {"translation": "fixed", "rotation": "free"}}
        }
    });
    Member {
        id: "S1".into(),
        note: Some("specimen".into()),
        section: SectionSpec::Rect(Rect {
            depth_mm: 100.0,
            width_mm: 50.0,
        }),
        material: MaterialSpec::Grade {
            grade: "S355".into(),
        },
        length_mm: 3000.0,
        k_major: 0.7,
        k_minor: 0.8,
        k_torsion: 0.9,
        lcr_major_mm: Some(2000.0),
        lcr_minor_mm: Some(2100.0),
        lcr_torsion_mm: Some(2200.0),
        axial_kn: 100.0,
        method: Method::En1993,
        gamma_m1: Some(1.1),
        curve_major: Some(Curve::A),
        curve_minor: Some(Curve::C),
        bow_mm: Some(3.0),
        eccentricity_mm: Some(4.0),
        service_class: Some(2),
        load_duration: Some(LoadDuration::Short),
        csa_n: Some(2.24),
        angle_connection: Some(AngleConnection {
            leg: Leg::Short,
            truss: Truss::Space,
        }),
        frame_major: Some(Frame {
            sway: true,
            g_a: 1.0,
            g_b: 2.0,
        }),
        frame_minor: Some(Frame {
            sway: false,
            g_a: 3.0,
            g_b: 4.0,
        }),
        buckling_model: Some(serde_json::from_value(model).unwrap()),
        m_major_a_knm: 1.0,
        m_major_b_knm: 2.0,
        m_major_span_knm: 3.0,
        span_load_major: SpanLoad::Point,
        m_minor_a_knm: 4.0,
        m_minor_b_knm: 5.0,
        m_minor_span_knm: 6.0,
        span_load_minor: SpanLoad::Point,
        k_lt: 0.5,
        lcr_lt_mm: Some(1500.0),
        lt_restrained: true,
        load_level: LoadLevel::TensionFlange,
        amplify_moments: false,
        amplification_length_major_mm: Some(2300.0),
        amplification_length_minor_mm: Some(2400.0),
        interaction_annex: Some(InteractionAnnex::A),
    }
}

fn written(m: &Member) -> Map<String, Json> {
    match serde_json::to_value(m).unwrap() {
        Json::Object(o) => o,
        other => panic!("{other}"),
    }
}

fn read(v: Json) -> Result<Member, String> {
    serde_json::from_value(v).map_err(|e| e.to_string())
}

/// The value an option's name stands for in the member file.
fn option_value(key: &Key, name: &str) -> Json {
    match key.value {
        Value::Bool => json!(name == "true"),
        Value::Whole => json!(name.parse::<u64>().unwrap()),
        Value::Number(_) => json!(name.parse::<f64>().unwrap()),
        _ => json!(name),
    }
}

/// The member-file value of a described default, where it has one.
fn default_value(key: &Key) -> Option<Json> {
    match key.default {
        Default::Zero => Some(json!(0.0)),
        Default::One => Some(json!(1.0)),
        Default::Name(n) => Some(json!(n)),
        Default::Bool(b) => Some(json!(b)),
        Default::Required | Default::Absent(_) => None,
    }
}

#[test]
fn serde_types_match_the_description() {
    let full = written(&specimen());
    // Every key the type writes is described, and every described key is
    // written when every field is set.
    for key in full.keys() {
        assert!(
            member_key(key).is_some(),
            "the serde type Member writes \"{key}\", which member::schema::MEMBER does not \
             describe"
        );
    }
    for key in MEMBER {
        assert!(
            full.contains_key(key.key),
            "member::schema::MEMBER describes \"{}\", which the serde type Member does not write",
            key.key
        );
        if let Value::Number(_) = key.value {
            let q = key.unit();
            assert!(
                key.key.starts_with("k_")
                    || key.key == "gamma_m1"
                    || key.key == "csa_n"
                    || q.is_some(),
                "{}: a number key carries its unit in its suffix",
                key.key
            );
        }
    }
    assert_eq!(read(Json::Object(full.clone())).unwrap(), specimen());

    // The required keys alone are enough; every other key is then left
    // out when written, and giving its described default changes nothing.
    let least: Map<String, Json> = MEMBER
        .iter()
        .filter(|k| k.required())
        .map(|k| (k.key.to_string(), full[k.key].clone()))
        .collect();
    let base = read(Json::Object(least.clone()))
        .unwrap_or_else(|e| panic!("a member of the required keys only: {e}"));
    let again = written(&base);
    for key in MEMBER.iter().filter(|k| !k.required()) {
        assert!(
            !again.contains_key(key.key),
            "\"{}\" is written when absent; its default is not the serde type's",
            key.key
        );
        if let Some(v) = default_value(key) {
            let mut with = least.clone();
            with.insert(key.key.into(), v.clone());
            assert_eq!(
                read(Json::Object(with)).unwrap(),
                base,
                "\"{}\": the described default {v} is not the serde type's default",
                key.key
            );
        }
    }
    // Each required key is required.
    for key in MEMBER.iter().filter(|k| k.required()) {
        let mut without = least.clone();
        without.remove(key.key);
        let err = read(Json::Object(without)).unwrap_err();
        assert!(err.contains(key.key), "without \"{}\": {err}", key.key);
    }
    // Every option is read, and a name not among them is refused.
    for key in MEMBER {
        check_options(key, |k, v| {
            let mut with = least.clone();
            with.insert(k.into(), v);
            read(Json::Object(with))
        });
        if let Value::Group { prefix, keys } = key.value {
            let group = full[key.key].as_object().unwrap().clone();
            for inner in keys {
                let name = inner.in_group(prefix);
                assert!(
                    inner.key.starts_with(prefix) && group.contains_key(name),
                    "\"{}\" describes \"{}\", which the serde type does not write as \"{name}\"",
                    key.key,
                    inner.key
                );
                check_options(inner, |_, v| {
                    let mut g = group.clone();
                    g.insert(name.into(), v);
                    let mut with = least.clone();
                    with.insert(key.key.into(), Json::Object(g));
                    read(Json::Object(with))
                });
            }
            for k in group.keys() {
                assert!(
                    keys.iter().any(|i| i.in_group(prefix) == k),
                    "\"{}\".\"{k}\" is not described",
                    key.key
                );
            }
        }
    }
    // The methods are the serde type's.
    let methods: Vec<&str> = Method::ALL.iter().map(|m| m.key()).collect();
    for m in &methods {
        let mut with = least.clone();
        with.insert("method".into(), json!(m));
        assert!(read(Json::Object(with)).is_ok(), "{m}");
    }
}

fn check_options(key: &Key, read_with: impl Fn(&str, Json) -> Result<Member, String>) {
    for o in key.options {
        let v = option_value(key, o.name);
        if let Err(e) = read_with(key.key, v.clone()) {
            panic!("\"{}\": the described option {v} is refused: {e}", key.key);
        }
    }
    if let Default::Name(n) = key.default {
        assert!(
            key.option(n).is_some(),
            "{}: the default is an option",
            key.key
        );
    }
    if key.value == Value::Name {
        assert!(
            read_with(key.key, json!("made-up")).is_err(),
            "\"{}\" reads a name that is not described",
            key.key
        );
        // And every name the type takes is described: the error lists them.
        let err = read_with(key.key, json!("made-up")).unwrap_err();
        for o in key.options {
            assert!(err.contains(&format!("`{}`", o.name)), "{}: {err}", key.key);
        }
        let listed = err.matches('`').count() / 2;
        assert_eq!(
            listed,
            key.options.len() + 1,
            "\"{}\": the serde type takes names that are not described: {err}",
            key.key
        );
    }
    if key.value == Value::Bool {
        let names: Vec<&str> = key.names().collect();
        assert_eq!(names.len(), 2, "{}", key.key);
        assert!(
            names.contains(&"true") && names.contains(&"false"),
            "{}",
            key.key
        );
    }
}

#[test]
fn material_types_match_the_description() {
    fn sample(key: &Key) -> Json {
        match key.value {
            Value::Number(_) => json!(7.5),
            Value::Text => json!("S355"),
            _ => json!(key.options.last().unwrap().name),
        }
    }
    for (i, form) in MATERIAL.iter().enumerate() {
        let full: Map<String, Json> = form
            .keys
            .iter()
            .map(|k| (k.key.to_string(), sample(k)))
            .collect();
        let spec: MaterialSpec = serde_json::from_value(Json::Object(full.clone()))
            .unwrap_or_else(|e| panic!("material form \"{}\" with every key: {e}", form.name));
        let variant = match spec {
            MaterialSpec::Grade { .. } => 0,
            MaterialSpec::Timber { .. } => 1,
            MaterialSpec::Custom { .. } => 2,
        };
        assert_eq!(
            variant, i,
            "member::schema::MATERIAL's order against MaterialSpec's"
        );
        let back = serde_json::to_value(&spec).unwrap();
        let back = back.as_object().unwrap();
        for key in back.keys() {
            assert!(
                form.key(key).is_some(),
                "material form \"{}\": the serde type writes \"{key}\", which \
                 member::schema::MATERIAL does not describe",
                form.name
            );
        }
        for key in form.keys {
            assert!(
                back.contains_key(key.key),
                "material form \"{}\": member::schema::MATERIAL describes \"{}\", which the \
                 serde type does not write",
                form.name,
                key.key
            );
        }
        let least: Map<String, Json> = full
            .iter()
            .filter(|(k, _)| form.key(k).is_some_and(Key::required))
            .map(|(k, v)| (k.clone(), v.clone()))
            .collect();
        let spec: MaterialSpec = serde_json::from_value(Json::Object(least)).unwrap();
        let back = serde_json::to_value(&spec).unwrap();
        for key in form.keys.iter().filter(|k| !k.required()) {
            assert!(back.get(key.key).is_none(), "{}", key.key);
        }
    }
    // The timber choice is the serde type's.
    let timber = material_key("timber").unwrap();
    let kinds: Vec<Json> = [TimberKind::Solid, TimberKind::Glulam]
        .iter()
        .map(|k| serde_json::to_value(k).unwrap())
        .collect();
    let names: Vec<Json> = timber.names().map(|n| json!(n)).collect();
    assert_eq!(kinds, names);
}

#[test]
fn keys_are_described_once() {
    let mut seen: Vec<&str> = Vec::new();
    for key in MEMBER
        .iter()
        .chain(MATERIAL.iter().flat_map(|f| f.keys.iter()))
    {
        assert!(
            !seen.contains(&key.key),
            "\"{}\" is described twice",
            key.key
        );
        seen.push(key.key);
        assert!(
            !key.label.is_empty() && !key.meaning.is_empty(),
            "{}",
            key.key
        );
    }
    // Group columns do not clash with other keys.
    let (outer, leg) = grouped("angle_leg").unwrap();
    assert_eq!(
        (outer.key, leg.in_group("angle")),
        ("angle_connection", "leg")
    );
    assert!(any_key("angle_truss").is_some());
    assert!(grouped("angle").is_none());
}
