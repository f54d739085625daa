use super::*;
use crate::file;

/// What both readers say of `text`: the whole-file reader's refusal and
/// the stream's (native builds only), which must be the same.
fn refusal(text: &str) -> String {
    let whole = file::parse(text).unwrap_err().to_string();
    let streamed = crate::stream::members(text.as_bytes(), |_, _| Ok::<(), ()>(()));
    let Err(crate::stream::Stop::Bad(e)) = streamed else {
        panic!("the stream took what the whole-file reader refused ({whole}): {streamed:?}")
    };
    assert_eq!(e.to_string(), whole, "the two readers say the same");
    whole
}

/// A refusal without the line and column of the member's fault: the words,
/// which these tests hold (`a_members_fault_is_told_with_its_line_and_column`
/// holds the place).
fn words(said: String) -> String {
    let Some((member, rest)) = said.split_once(": line ") else {
        return said;
    };
    match rest.split_once(": ") {
        Some((place, words)) if place.contains(", column ") => format!("{member}: {words}"),
        _ => said,
    }
}

fn with_member(member: &str) -> String {
    format!(
        "{{\"format\": \"strutline.members\", \"version\": 3, \"title\": \"t\", \"members\": [\
         {{\"id\": \"Q1\", \"section\": {{\"kind\": \"rect\", \"depth_mm\": 100, \"width_mm\": 50}}, \
         \"material\": {{\"grade\": \"S355\"}}, \"length_mm\": 2000, \"axial_kn\": 10, \
         \"method\": \"euler\"}},\n{member}]}}"
    )
}

const REST: &str = "\"length_mm\": 2000, \"axial_kn\": 10, \"method\": \"euler\"";
const RECT: &str = "\"section\": {\"kind\": \"rect\", \"depth_mm\": 100, \"width_mm\": 50}";

/// The input on which the `member_stream` fuzz target stopped (bench/fuzz.md):
/// the stream refused member "K1" for its repeated `note` (and `section`,
/// `material`, `length_mm`) while the whole-file reader kept the last of each.
const FUZZ_REPEATED_NOTE: &str = r#"{
  "format": "strutline.members",
  "version": 1,
  "membetitle": "Tarnbeck Vale bus depot: wash-bay canopy, proposed slimmer columns (invented example)",
  "members": [
    {
      "id": "K1",
      "note": "as drawn",
      "section": {"kind": "catalogue", "designation": "HE 160 B"},
      "material": {"grade": "S355"},
      "length_mm": 4200,
      "k_major": 1.0,
"note": "bracing strut, cold-formed square hollow section",
      "section": {"kind": "catalogue", "designation": "SHS 80x80x4"},
      "material": {"grade": "S355H"},
      "lengthterial": {"grade": "S355H"},
      "length_mm": 3800,
      "axial_kn": 90,
      "method": "en1993-1-1"
    }
  ]
}"#;

#[test]
fn the_fuzzers_repeated_note_is_refused_by_both_readers() {
    let e = refusal(FUZZ_REPEATED_NOTE);
    assert_eq!(
        e,
        "member \"K1\": the key `note` is given twice; give each key once"
    );
    // Its smallest form.
    let e = refusal(&with_member(&format!(
        "{{\"id\": \"K1\", \"note\": \"a\", {RECT}, \"material\": {{\"grade\": \"S355\"}}, \
         \"note\": \"b\", {REST}}}"
    )));
    assert_eq!(
        e,
        "member \"K1\": the key `note` is given twice; give each key once"
    );
}

#[test]
fn a_key_given_twice_is_refused_at_any_depth_with_its_path() {
    let cases = [
        (
            format!(
                "{{\"id\": \"K2\", \"section\": {{\"kind\": \"rect\", \"depth_mm\": 100, \
                 \"depth_mm\": 50, \"width_mm\": 50}}, \"material\": {{\"grade\": \"S355\"}}, {REST}}}"
            ),
            "member \"K2\": section: the key `depth_mm` is given twice",
        ),
        (
            format!(
                "{{\"id\": \"K3\", {RECT}, \"material\": {{\"grade\": \"S355\", \"grade\": \"S235\"}}, {REST}}}"
            ),
            "member \"K3\": material: the key `grade` is given twice",
        ),
        (
            // Deeper, in a list; and the id comes after the repeat.
            format!(
                "{{{RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}, \"buckling_model\": \
                 {{\"ends\": {{\"a\": {{\"major\": {{\"translation\": \"fixed\", \"rotation\": \"free\"}}, \
                 \"minor\": {{\"translation\": \"fixed\", \"rotation\": \"free\"}}}}, \
                 \"b\": {{\"major\": {{\"translation\": \"fixed\", \"rotation\": \"free\"}}, \
                 \"minor\": {{\"translation\": \"fixed\", \"rotation\": \"free\"}}}}}}, \
                 \"restraints\": [{{\"at_mm\": 500, \"axis\": \"minor\", \"translation\": \"fixed\"}}, \
                 {{\"at_mm\": 900, \"at_mm\": 1000, \"axis\": \"minor\", \"translation\": \"fixed\"}}]}}, \
                 \"id\": \"K4\"}}"
            ),
            "member \"K4\": buckling_model.restraints[1]: the key `at_mm` is given twice",
        ),
        (
            // No id: the member's place in the list.
            format!("{{{RECT}, {RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}}}"),
            "member \"#2\": the key `section` is given twice",
        ),
    ];
    for (member, said) in cases {
        let e = refusal(&with_member(&member));
        assert!(e.starts_with(said), "{e}");
    }
}

#[test]
fn a_key_given_twice_at_the_top_of_the_file_is_refused_by_both_readers() {
    let text = with_member(&format!(
        "{{\"id\": \"K5\", {RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}}}"
    ));
    assert!(file::parse(&text).is_ok());
    let twice = text.replacen(
        "\"title\": \"t\",",
        "\"title\": \"t\", \"title\": \"u\",",
        1,
    );
    assert_eq!(
        refusal(&twice),
        "the key `title` is given twice; give each key once"
    );
    let sheet = text.replacen(
        "\"title\": \"t\",",
        "\"title\": \"t\", \"sheet\": {\"job\": \"J-1\", \"job\": \"J-2\"},",
        1,
    );
    assert_eq!(
        refusal(&sheet),
        "sheet: the key `job` is given twice; give each key once"
    );
    // A second list of members (the whole-file reader kept the last one).
    let lists = text.replacen("]}", "], \"members\": []}", 1);
    assert!(refusal(&lists).contains("the key `members` is given twice"));
    // The stream now checks the sheet's header as the whole-file reader does.
    let misspelt = text.replacen(
        "\"title\": \"t\",",
        "\"title\": \"t\", \"sheet\": {\"jbo\": \"J-1\"},",
        1,
    );
    assert!(refusal(&misspelt).contains("jbo"));
}

#[test]
fn the_value_reader_reads_as_serde_json_does() {
    let text = include_str!("../../../examples/tarnbeck-crane-hall.json");
    let (v, repeat) = value(text).unwrap();
    assert_eq!(repeat, None);
    assert_eq!(v, serde_json::from_str::<Value>(text).unwrap());
    let odd = r#"{"a": [1, -2, 3.5, 1e300, -0.0, true, null, "x\u00e9"], "b": {}, "c": []}"#;
    assert_eq!(
        value(odd).unwrap().0,
        serde_json::from_str::<Value>(odd).unwrap()
    );
    // Its errors are serde_json's, with the line and column.
    let e = value("{\"a\": 1e400}").unwrap_err();
    assert!(e.to_string().starts_with("number out of range"), "{e}");
    assert!(value("{\"a\": 1} x").is_err());
    // Only the first repeat is kept, with its place.
    let (_, repeat) = value(r#"{"x": [{"y": 1}, {"z": {"q": 1, "q": 2}}], "x": 3}"#).unwrap();
    assert_eq!(
        repeat.unwrap().message(),
        "x[1].z: the key `q` is given twice; give each key once"
    );
}

fn material(m: &str) -> String {
    words(refusal(&with_member(&format!(
        "{{\"id\": \"K6\", {RECT}, \"material\": {m}, {REST}}}"
    ))))
}

#[test]
fn a_material_of_no_form_says_what_the_forms_are_and_what_is_wrong() {
    let forms = "the accepted forms are a grade by name (`grade`), a custom timber (`fc0k_mpa`, \
                 `e005_mpa`, `e0mean_mpa`, `timber`: solid or glulam) or a custom steel (`fy_mpa`, \
                 `e_mpa`, optional `g_mpa`)";
    let e = material(r#"{"timber": "solid", "class": "C24"}"#);
    assert_eq!(
        e,
        format!(
            "member \"K6\": material: as a custom timber it lacks `fc0k_mpa`, `e005_mpa` and \
             `e0mean_mpa`; `class` is not a key of a custom timber; {forms}"
        )
    );
    let e = material(r#"{"fy_mpa": 235}"#);
    assert!(
        e.contains("material: as a custom steel it lacks `e_mpa`;"),
        "{e}"
    );
    let e = material(r#"{"grade": 355}"#);
    assert!(
        e.contains("material: `grade` must be text, found 355;"),
        "{e}"
    );
    let e = material(
        r#"{"fc0k_mpa": 21, "e005_mpa": 7400, "e0mean_mpa": 11000, "timber": "softwood"}"#,
    );
    assert!(
        e.contains("`timber` must be solid or glulam, found \"softwood\""),
        "{e}"
    );
    let e = material(r#"{"fy_mpa": "235", "e_mpa": 210000}"#);
    assert!(
        e.contains("`fy_mpa` must be a number, found \"235\""),
        "{e}"
    );
    let e = material(r#""S355""#);
    assert!(
        e.contains("material: expected one of the accepted forms, a grade by name")
            && e.ends_with("found \"S355\""),
        "{e}"
    );
    let e = material("{}");
    assert!(e.contains("material: it gives no key;"), "{e}");
    let e = material(r#"{"strength": 235}"#);
    assert!(
        e.contains("none of its keys (`strength`) belongs to a form"),
        "{e}"
    );
}

#[test]
fn a_material_mixing_forms_is_refused_as_the_csv_reader_refuses_it() {
    // These were taken before: the grade (or the steel's values) was used
    // and the other keys dropped without a word.
    let e = material(r#"{"grade": "S355", "fy_mpa": 235}"#);
    assert!(
        e.contains(
            "material: it mixes the keys of a grade by name (`grade`) and a custom steel \
             (`fy_mpa`); give one form"
        ),
        "{e}"
    );
    let e = material(r#"{"fy_mpa": 235, "e_mpa": 210000, "timber": "solid"}"#);
    assert!(
        e.contains(
            "it mixes the keys of a custom timber (`timber`) and a custom steel (`fy_mpa` and \
             `e_mpa`)"
        ),
        "{e}"
    );
    let e = material(r#"{"fy_mpa": 235, "e_mpa": 210000, "grde": "S355"}"#);
    assert!(e.contains("`grde` is not a key of a custom steel"), "{e}");
    // Every form, exactly, still reads.
    for m in [
        r#"{"grade": "S355"}"#,
        r#"{"fy_mpa": 235, "e_mpa": 210000}"#,
        r#"{"fy_mpa": 235, "e_mpa": 210000, "g_mpa": 81000}"#,
        r#"{"fy_mpa": 235, "e_mpa": 210000, "g_mpa": null}"#,
        r#"{"fc0k_mpa": 21, "e005_mpa": 7400, "e0mean_mpa": 11000, "timber": "glulam"}"#,
    ] {
        let text = with_member(&format!(
            "{{\"id\": \"K7\", {RECT}, \"material\": {m}, {REST}}}"
        ));
        assert!(file::parse(&text).is_ok(), "{m}");
    }
}

#[test]
fn the_browser_build_names_the_material_without_a_path() {
    let raw: Value = serde_json::from_str(r#"{"material": {"fy_mpa": 1}}"#).unwrap();
    let said = plain(
        &raw,
        "",
        "data did not match any variant of untagged enum MaterialSpec".into(),
    );
    assert!(
        said.starts_with("material: as a custom steel it lacks `e_mpa`"),
        "{said}"
    );
    assert_eq!(plain(&raw, "x", "other words".into()), "other words");
}

#[test]
fn a_value_that_is_not_its_keys_object_is_named_without_rust_types() {
    for (extra, said) in [
        (
            "\"frame_major\": 1.2",
            "frame_major: expected an object of its keys, found the number 1.2",
        ),
        (
            "\"angle_connection\": \"long\"",
            "angle_connection: expected an object of its keys, found the text \"long\"",
        ),
        (
            "\"buckling_model\": []",
            "buckling_model: expected an object of its keys, found a list",
        ),
    ] {
        let e = words(refusal(&with_member(&format!(
            "{{\"id\": \"K8\", {RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}, {extra}}}"
        ))));
        assert_eq!(e, format!("member \"K8\": {said}"));
    }
    let e = words(refusal(&with_member(&format!(
        "{{\"id\": \"K9\", \"section\": \"HE 200 B\", \"material\": {{\"grade\": \"S355\"}}, {REST}}}"
    ))));
    assert_eq!(
        e,
        "member \"K9\": section: expected an object with a `kind` and that kind's keys, found \
         the text \"HE 200 B\""
    );
}

#[test]
fn a_value_of_another_type_is_named_in_words_not_rust_types() {
    for (member, said) in [
        (
            format!("{RECT}, \"material\": {{\"grade\": \"S355\"}}, \"length_mm\": \"4200 mm\", \"axial_kn\": 10, \"method\": \"euler\""),
            "length_mm: expected a number, found the text \"4200 mm\"",
        ),
        (
            format!("{RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}, \"lt_restrained\": \"yes\""),
            "lt_restrained: expected true or false, found the text \"yes\"",
        ),
        (
            format!("{RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}, \"note\": 5"),
            "note: expected text, found the number 5",
        ),
        (
            format!("{RECT}, \"material\": {{\"grade\": \"S355\"}}, \"length_mm\": 2000, \"axial_kn\": true, \"method\": \"euler\""),
            "axial_kn: expected a number, found true",
        ),
        (
            format!("{RECT}, \"material\": {{\"grade\": \"S355\"}}, {REST}, \"k_major\": [1]"),
            "k_major: expected a number, found a list",
        ),
    ] {
        let e = words(refusal(&with_member(&format!("{{\"id\": \"K3\", {member}}}"))));
        assert_eq!(e, format!("member \"K3\": {said}"));
        assert!(!e.contains("f64") && !e.contains("invalid type"), "{e}");
    }
}

/// The line and column (1-based) of a refusal's place: "member ...: line
/// L, column C: ...".
fn place(said: &str) -> Option<(usize, usize)> {
    let (_, rest) = said.split_once(": line ")?;
    let (place, _) = rest.split_once(": ")?;
    let (line, column) = place.split_once(", column ")?;
    Some((line.parse().ok()?, column.parse().ok()?))
}

/// Where `value` stands in `text`: its line, and the columns of its first
/// and last character (1-based).
fn span(text: &str, value: &str) -> (usize, usize, usize) {
    let at = text.find(value).unwrap();
    let line_start = text[..at].rfind('\n').map_or(0, |i| i + 1);
    let line = text[..at].matches('\n').count() + 1;
    let first = text[line_start..at].chars().count() + 1;
    (line, first, first + value.chars().count() - 1)
}

#[test]
fn a_members_fault_is_told_with_its_line_and_column() {
    // A value of the wrong type, as the other faults of the JSON are told:
    // by both readers (refusal holds them to one answer), at the value.
    for (member, value) in [
        (
            "\"length_mm\": \"4200 mm\", \"axial_kn\": 10, \"method\": \"euler\"".to_string(),
            "\"4200 mm\"",
        ),
        (
            "\"length_mm\": 2000, \"axial_kn\": true, \"method\": \"euler\"".to_string(),
            "true",
        ),
        (format!("{REST}, \"k_major\": [1]"), "[1]"),
        (format!("{REST}, \"frame_major\": 1.25"), "1.25"),
    ] {
        let text = with_member(&format!(
            "{{\"id\": \"K3\", \"section\": {{\"kind\": \"rect\", \"depth_mm\": 100, \
             \"width_mm\": 50}}, \"material\": {{\"grade\": \"S355\"}},\n  {member}}}"
        ));
        let said = refusal(&text);
        let (line, first, last) = span(&text, value);
        let (l, c) = place(&said).unwrap_or_else(|| panic!("no place: {said}"));
        assert_eq!(l, line, "{said}");
        assert!(
            first <= c && c <= last,
            "column {c} not within {first}..={last}: {said}"
        );
        assert!(said.starts_with("member \"K3\": line "), "{said}");
    }
    // Deep in a file the stream reads a buffer at a time (2,000 members
    // before the bad one, some 400 KB): the place is the file's, not the
    // member's own text's.
    let good = "{\"id\": \"G\", \"section\": {\"kind\": \"rect\", \"depth_mm\": 100, \
                \"width_mm\": 50},\n \"material\": {\"grade\": \"S355\"}, \"length_mm\": 2000, \
                \"axial_kn\": 10, \"method\": \"euler\", \"note\": \"padding padding padding \
                padding padding padding padding padding padding padding padding\"}";
    let mut members: Vec<String> = (0..2000)
        .map(|i| good.replace("\"G\"", &format!("\"G{i}\"")))
        .collect();
    members.push(format!(
        "{{\"id\": \"K4\", {RECT},\n \"material\": {{\"grade\": \"S355\"}}, \"length_mm\": 2000, \
         \"axial_kn\": \"9 kN\", \"method\": \"euler\"}}"
    ));
    let text = format!(
        "{{\"format\": \"strutline.members\", \"version\": 3,\n\"members\": [\n{}\n]}}",
        members.join(",\n")
    );
    let said = refusal(&text);
    let (line, first, last) = span(&text, "\"9 kN\"");
    assert!(line > 4000, "{line}");
    let (l, c) = place(&said).unwrap_or_else(|| panic!("no place: {said}"));
    assert_eq!(l, line, "{said}");
    assert!(
        first <= c && c <= last,
        "column {c} not within {first}..={last}: {said}"
    );
    assert!(
        said.ends_with("axial_kn: expected a number, found the text \"9 kN\""),
        "{said}"
    );
}
