//! `strutline check` with bending (member file version 3): bad bending
//! input exits with status 2 and a message naming the member and the
//! field; a member file with moments reports the bending side in JSON.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::process::Command;

const BIN: &str = env!("CARGO_BIN_EXE_strutline");

fn file_with(member: &str, name: &str) -> std::path::PathBuf {
    let text = format!(
        r#"{{"format": "strutline.members", "version": 3, "title": "bending", "members": [{member}]}}"#
    );
    let path = std::env::temp_dir().join(format!(
        "strutline-bending-{}-{name}.json",
        std::process::id()
    ));
    std::fs::write(&path, text).unwrap();
    path
}

fn run(args: &[&str]) -> (Option<i32>, String, String) {
    let out = Command::new(BIN).args(args).output().unwrap();
    (
        out.status.code(),
        String::from_utf8_lossy(&out.stdout).into_owned(),
        String::from_utf8_lossy(&out.stderr).into_owned(),
    )
}

const BASE: &str = r#""section": {"kind": "catalogue", "designation": "IPE 300"},
    "material": {"grade": "S355"}, "length_mm": 6000, "axial_kn": 0"#;

#[test]
fn bad_bending_input_exits_2_naming_member_and_field() {
    let cases = [
        (
            format!(
                r#"{{"id": "B1", {BASE}, "method": "en1993-1-1", "m_major_span_knm": 50, "span_load_major": "triangle"}}"#
            ),
            "span_load_major",
        ),
        (
            format!(r#"{{"id": "B1", {BASE}, "method": "euler", "m_major_b_knm": 50}}"#),
            "m_major_b_knm",
        ),
        (
            format!(r#"{{"id": "B1", {BASE}, "method": "en1993-1-1", "m_minor_a_knm": 2e12}}"#),
            "m_minor_a_knm",
        ),
        (
            format!(
                r#"{{"id": "B1", {BASE}, "method": "en1993-1-1", "m_major_a_knm": 5, "k_lt": -1}}"#
            ),
            "k_lt",
        ),
    ];
    for (i, (member, field)) in cases.iter().enumerate() {
        let path = file_with(member, &i.to_string());
        let (code, _, err) = run(&["check", path.to_str().unwrap()]);
        let _ = std::fs::remove_file(&path);
        assert_eq!(code, Some(2), "{field}: {err}");
        assert!(err.contains("B1") && err.contains(field), "{field}: {err}");
    }
}

#[test]
fn a_non_finite_moment_in_csv_exits_2_naming_row_and_column() {
    let path = std::env::temp_dir().join(format!("strutline-bending-{}.csv", std::process::id()));
    std::fs::write(
        &path,
        "id,kind,designation,grade,length_mm,axial_kn,method,m_minor_a_knm\n\
         B3,catalogue,IPE 300,S355,6000,0,en1993-1-1,1e400\n",
    )
    .unwrap();
    let (code, _, err) = run(&["check", path.to_str().unwrap()]);
    let _ = std::fs::remove_file(&path);
    assert_eq!(code, Some(2), "{err}");
    assert!(err.contains("m_minor_a_knm"), "{err}");
}

#[test]
fn json_reports_the_bending_side() {
    let member =
        format!(r#"{{"id": "B2", {BASE}, "method": "aisc360-lrfd", "m_major_span_knm": 60}}"#);
    let path = file_with(&member, "json");
    let (code, out, err) = run(&["check", "--json", path.to_str().unwrap()]);
    let _ = std::fs::remove_file(&path);
    assert_eq!(code, Some(0), "{err}");
    let v: serde_json::Value = serde_json::from_str(&out).unwrap();
    let r = &v["results"][0];
    assert_eq!(r["governing_check"], "bending-major");
    let major = r["bending"]["major"].as_object().unwrap();
    let mut keys: Vec<&str> = major.keys().map(String::as_str).collect();
    keys.sort_unstable();
    assert_eq!(
        keys,
        [
            "critical_knm",
            "moment_factor",
            "reduction",
            "resistance_knm"
        ]
    );
    assert!(r["bending"]["minor"]["critical_knm"].is_null());
    let util = r["utilisation"].as_f64().unwrap();
    let res = major["resistance_knm"].as_f64().unwrap();
    assert!((util - 60.0 / res).abs() < 1e-12);
}
