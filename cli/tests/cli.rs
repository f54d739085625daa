//! The `strutline` command line as a process: every subcommand that prints
//! much ends quietly when its reader closes the pipe early
//! (`strutline envelope ... | head -1`), with no panic and the status it
//! would have had otherwise.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use std::io::{BufRead, BufReader};
use std::path::PathBuf;
use std::process::{Command, Stdio};

const BIN: &str = env!("CARGO_BIN_EXE_strutline");

fn example() -> String {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("../examples/depot-mezzanine.json")
        .to_str()
        .unwrap()
        .to_string()
}

/// A member file of `n` copies of the example's first member, so the
/// output is far larger than a pipe's buffer (64 KiB on Linux); and its
/// title, the first line of the check's table.
fn many_members(n: usize) -> (PathBuf, String) {
    let text = std::fs::read_to_string(example()).unwrap();
    let mut v: serde_json::Value = serde_json::from_str(&text).unwrap();
    let first = v["members"][0].clone();
    let members: Vec<serde_json::Value> = (0..n)
        .map(|i| {
            let mut m = first.clone();
            m["id"] = format!("P{i}").into();
            m
        })
        .collect();
    v["members"] = members.into();
    let path = std::env::temp_dir().join(format!("strutline-cli-{}.json", std::process::id()));
    std::fs::write(&path, v.to_string()).unwrap();
    (path, v["title"].as_str().unwrap().to_string())
}

/// Runs `strutline args`, reads its first line, closes the pipe and
/// returns (first line, exit code, stderr).
fn first_line_then_close(args: &[&str]) -> (String, Option<i32>, String) {
    let mut child = Command::new(BIN)
        .args(args)
        .stdout(Stdio::piped())
        .stderr(Stdio::piped())
        .spawn()
        .unwrap();
    let mut line = String::new();
    {
        let mut out = BufReader::new(child.stdout.take().unwrap());
        out.read_line(&mut line).unwrap();
        // Dropping the reader closes the read end of the pipe.
    }
    let done = child.wait_with_output().unwrap();
    (
        line,
        done.status.code(),
        String::from_utf8_lossy(&done.stderr).into_owned(),
    )
}

/// The whole output's size, to show the early close really cuts it short.
fn full_len(args: &[&str]) -> usize {
    Command::new(BIN).args(args).output().unwrap().stdout.len()
}

#[test]
fn a_closed_pipe_ends_every_subcommand_quietly() {
    let (big, title) = many_members(3000);
    let big = big.to_str().unwrap();
    let ex = example();
    // (arguments, first line starts with, exit status without the close)
    // The plain `sections` table (some 66 KB) is barely over a pipe's
    // buffer, so its JSON form stands for it (both go through one writer).
    let cases: [(Vec<&str>, &str, i32); 5] = [
        (
            vec!["envelope", &ex, "--member", "M1", "--steps", "100000"],
            "slenderness,",
            0,
        ),
        (vec!["sections", "--json"], "{", 0),
        (vec!["check", big], &title, 0),
        (vec!["check", big, "--json"], "{", 0),
        (vec!["size", big, "--series", "HE B"], "3000 members", 0),
    ];
    for (args, starts, code) in cases {
        assert!(full_len(&args) > 128 * 1024, "{args:?}: output too short");
        let (line, status, stderr) = first_line_then_close(&args);
        assert!(line.starts_with(starts), "{args:?}: first line {line:?}");
        assert!(!stderr.contains("panicked"), "{args:?}: {stderr}");
        assert_ne!(status, Some(101), "{args:?}: {stderr}");
        assert_eq!(status, Some(code), "{args:?}: {stderr}");
        // Nothing but envelope's caution, which goes to stderr beside its
        // CSV (the reader at the terminal still sees it).
        let said = match args[0] {
            "envelope" => format!("strutline: {}\n", strutline_core::CAUTION),
            _ => String::new(),
        };
        assert_eq!(stderr, said, "{args:?}");
    }
    std::fs::remove_file(big).unwrap();
}

fn root_file(rel: &str) -> String {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("..")
        .join(rel)
        .to_str()
        .unwrap()
        .to_string()
}

/// Runs `strutline args` to the end: (status, stdout, stderr).
fn run(args: &[&str]) -> (Option<i32>, String, String) {
    let out = Command::new(BIN).args(args).output().unwrap();
    (
        out.status.code(),
        String::from_utf8_lossy(&out.stdout).into_owned(),
        String::from_utf8_lossy(&out.stderr).into_owned(),
    )
}

#[test]
fn help_is_generated_for_every_command_and_exits_0() {
    let (code, text, _) = run(&["help"]);
    assert_eq!(code, Some(0));
    for c in ["check", "envelope", "sections", "size", "convert"] {
        assert!(text.contains(&format!("  {c} ")), "{c} missing:\n{text}");
        let (code, text, err) = run(&[c, "--help"]);
        assert_eq!(code, Some(0), "{c} --help: {err}");
        assert!(text.contains("Usage: strutline"), "{c}: {text}");
    }
    let (code, text, _) = run(&["help", "size"]);
    assert_eq!(code, Some(0));
    assert!(
        text.contains("--limit") && text.contains("known series"),
        "{text}"
    );
    // No command: the help, on stderr, status 2 (a script called it wrongly).
    let (code, _, err) = run(&[]);
    assert_eq!(code, Some(2));
    assert!(err.contains("check"), "{err}");
}

/// A member at N_Ed = 1.2 N_cr,z (HE 200 B S355, 4 m, 3114 kN with end
/// moments) has no finite utilisation: the table says so in words, not
/// "inf" (review N4).
#[test]
fn a_utilisation_beyond_the_critical_load_is_written_in_words() {
    let path = std::env::temp_dir().join(format!("strutline-ncr-{}.json", std::process::id()));
    std::fs::write(
        &path,
        r#"{"format":"strutline.members","version":3,"members":[{"id":"C1",
        "section":{"kind":"catalogue","designation":"HE 200 B"},"material":{"grade":"S355"},
        "length_mm":4000,"axial_kn":3114,"m_major_a_knm":50,"m_major_b_knm":-25,
        "method":"en1993-1-1"}]}"#,
    )
    .unwrap();
    let (code, text, err) = run(&["check", path.to_str().unwrap()]);
    std::fs::remove_file(&path).unwrap();
    assert_eq!(code, Some(1), "{err}");
    assert!(
        text.contains("beyond N_cr") && !text.contains("inf"),
        "{text}"
    );
}

#[test]
fn exit_status_says_within_over_or_invalid() {
    let (code, text, _) = run(&["check", &example()]);
    assert_eq!(code, Some(0), "{text}");
    assert!(text.contains("checking aid"), "{text}");
    let (code, text, _) = run(&["check", &root_file("examples/yard-canopy-over.json")]);
    assert_eq!(code, Some(1), "{text}");
    assert!(text.contains("OVER"), "{text}");
    let (code, _, err) = run(&["check", "/nonexistent/members.json"]);
    assert_eq!(code, Some(2));
    assert!(err.contains("cannot read"), "{err}");
    let (code, _, err) = run(&["check", &example(), "--colour"]);
    assert_eq!(code, Some(2));
    assert!(err.contains("--colour"), "{err}");
    let (code, _, err) = run(&["envelope", &example(), "--member", "M1", "--to", "-1"]);
    assert_eq!(code, Some(2));
    assert!(err.contains("--to"), "{err}");
}

#[test]
fn every_command_with_results_gives_the_caution() {
    let caution = strutline_core::CAUTION;
    // size: after the table, and as the JSON's "caution", as check does.
    let (code, out, err) = run(&["size", &example(), "--series", "SHS EN 10210"]);
    assert_eq!(code, Some(0), "{err}");
    assert!(out.trim_end().ends_with(caution), "{out}");
    let (code, out, err) = run(&["size", &example(), "--series", "SHS EN 10210", "--json"]);
    assert_eq!(code, Some(0), "{err}");
    let v: serde_json::Value = serde_json::from_str(&out).unwrap();
    assert_eq!(v["caution"], caution);
    // envelope: the CSV stays data; the caution is on stderr beside it
    // (with --interaction too: envelope_prints_the_interaction_curves...).
    let (code, out, err) = run(&["envelope", &example(), "--member", "M2"]);
    assert_eq!(code, Some(0), "{err}");
    assert!(err.contains(caution), "{err}");
    assert!(!out.contains("checking aid"), "{out}");
}

#[test]
fn envelope_prints_the_interaction_curves_of_a_beam_column() {
    let dir = std::env::temp_dir().join(format!("strutline-cli-ix-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let file = dir.join("post.json");
    std::fs::write(
        &file,
        r#"{"format": "strutline.members", "version": 3, "title": "ferry shed (invented)",
            "members": [{"id": "FS-3", "section": {"kind": "i", "depth_mm": 300, "width_mm": 300,
            "flange_mm": 19, "web_mm": 11, "root_radius_mm": 27}, "material": {"grade": "S355"},
            "length_mm": 4200, "axial_kn": 900, "method": "en1993-1-1",
            "m_major_a_knm": 60, "m_major_b_knm": -30}]}"#,
    )
    .unwrap();
    let path = file.to_str().unwrap();
    let (code, out, err) = run(&["envelope", path, "--member", "FS-3", "--interaction"]);
    assert_eq!(code, Some(0), "{err}");
    assert!(err.contains(strutline_core::CAUTION), "{err}");
    assert!(!out.contains("checking aid"), "{out}");
    let rows: Vec<Vec<&str>> = out
        .lines()
        .skip(1)
        .map(|l| l.split(',').collect())
        .collect();
    assert_eq!(
        out.lines().next(),
        Some("axis,axial_kn,moment_knm,utilisation")
    );
    // 25 points an axis, each at a utilisation of 1, compression rising
    // from 0 and the moment falling to 0.
    for axis in ["major", "minor"] {
        let pts: Vec<_> = rows.iter().filter(|r| r[0] == axis).collect();
        assert_eq!(pts.len(), 25, "{out}");
        assert_eq!(pts[0][1], "0.000");
        assert_eq!(pts[24][2], "0.000");
        for p in &pts {
            let u: f64 = p[3].parse().unwrap();
            assert!((u - 1.0).abs() < 1e-6, "{p:?}");
        }
    }
    std::fs::remove_dir_all(&dir).unwrap();
}

#[test]
fn buckle_prints_both_axes_of_each_model_as_json() {
    let path =
        PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("../examples/tarnbeck-crane-hall.json");
    let out = Command::new(BIN)
        .args(["buckle", path.to_str().unwrap(), "--json"])
        .output()
        .unwrap();
    assert_eq!(out.status.code(), Some(0));
    let v: serde_json::Value = serde_json::from_slice(&out.stdout).unwrap();
    let results = v["results"].as_array().unwrap();
    // Only K1 has a model; W2 uses frame_major.
    assert_eq!(results.len(), 1);
    assert_eq!(results[0]["id"], "K1");
    for axis in ["major", "minor"] {
        let b = &results[0][axis];
        let alpha = b["load_factor"].as_f64().unwrap();
        // The largest compression: 420 + 130 + 1.2 x 9 = 560.8 kN at end A.
        let n_cr = b["critical_kn"].as_f64().unwrap();
        assert!((n_cr - alpha * 560.8).abs() < 1e-9 * n_cr, "{axis}");
        assert!(b["buckling_length_mm"].as_f64().unwrap() > 0.0);
        let mode = b["mode"].as_array().unwrap();
        assert_eq!(mode[0][0].as_f64(), Some(0.0));
        assert_eq!(mode.last().unwrap()[0].as_f64(), Some(9000.0));
    }
    assert!(v["caution"].as_str().unwrap().contains("checking aid"));
}

/// A member file of `n` members made from the example's members in turn,
/// with ids C0, C1, ...; `edit` may change the text of member `i`.
fn list_file(name: &str, n: usize, edit: impl Fn(usize, String) -> String) -> PathBuf {
    let text = std::fs::read_to_string(example()).unwrap();
    let v: serde_json::Value = serde_json::from_str(&text).unwrap();
    let base = v["members"].as_array().unwrap().clone();
    let members: Vec<String> = (0..n)
        .map(|i| {
            let mut m = base[i % base.len()].clone();
            m["id"] = format!("C{i}").into();
            edit(i, m.to_string())
        })
        .collect();
    let body = format!(
        "{{\"format\": \"strutline.members\", \"version\": 2, \"title\": \"long\", \"members\": [\n{}\n]}}",
        members.join(",\n")
    );
    let path = std::env::temp_dir().join(format!("strutline-{name}-{}.json", std::process::id()));
    std::fs::write(&path, body).unwrap();
    path
}

/// A member with a buckling model is checked at its governing segment's
/// compression: the summary says which segment and at what N_Ed, as the
/// full result does.
#[test]
fn the_summary_of_a_modelled_member_names_its_segment_and_its_compression() {
    let hall = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("../examples/tarnbeck-crane-hall.json")
        .to_str()
        .unwrap()
        .to_string();
    let read = |extra: &[&str]| {
        let mut args = vec!["check", hall.as_str(), "--json"];
        args.extend(extra);
        let (code, text, err) = run(&args);
        assert!(matches!(code, Some(0 | 1)), "{err}");
        let doc: serde_json::Value = serde_json::from_str(&text).unwrap();
        doc["results"].as_array().unwrap().clone()
    };
    let (summaries, full) = (read(&[]), read(&["--working"]));
    let k1 = summaries.iter().find(|r| r["id"] == "K1").unwrap();
    let k1_full = full.iter().find(|r| r["id"] == "K1").unwrap();
    assert_eq!(k1["segment"], k1_full["segment"]);
    assert!(k1["segment"]["index"].as_u64().unwrap() >= 1, "{k1}");
    assert_eq!(k1["axial_kn"], k1_full["axial_kn"]);
    assert!(k1["axial_kn"].as_f64().unwrap() > 0.0, "{k1}");
    let w2 = summaries.iter().find(|r| r["id"] == "W2").unwrap();
    assert_eq!(w2["axial_kn"], 380.0);
    assert!(w2.get("segment").is_none(), "{w2}");
}

#[test]
fn json_and_json_lines_carry_each_members_summary_in_order() {
    let path = list_file("order", 9000, |_, m| m);
    let p = path.to_str().unwrap();
    let (code, text, err) = run(&["check", p, "--json"]);
    assert_eq!(code, Some(0), "{err}");
    let doc: serde_json::Value = serde_json::from_str(&text).unwrap();
    let results = doc["results"].as_array().unwrap();
    assert_eq!(results.len(), 9000);
    for (i, r) in results.iter().enumerate() {
        assert_eq!(r["id"], format!("C{i}"));
    }
    let first = &results[0];
    for key in [
        "method",
        "passes",
        "utilisation",
        "resistance_kn",
        "governing",
        "modes",
        "warnings",
    ] {
        assert!(first.get(key).is_some(), "{key} missing: {first}");
    }
    assert!(first.get("trace").is_none());
    // Without a buckling model, checked at the member's own axial_kn.
    let given: serde_json::Value =
        serde_json::from_str(&std::fs::read_to_string(example()).unwrap()).unwrap();
    assert_eq!(
        first["axial_kn"].as_f64(),
        given["members"][0]["axial_kn"].as_f64()
    );
    assert!(first.get("segment").is_none());
    assert!(doc["caution"].as_str().unwrap().contains("checking aid"));
    let (code, lines, _) = run(&["check", p, "--jsonl"]);
    assert_eq!(code, Some(0));
    let lines: Vec<serde_json::Value> = lines
        .lines()
        .map(|l| serde_json::from_str(l).unwrap())
        .collect();
    assert_eq!(lines.len(), 9001);
    assert_eq!(&lines[..9000], results.as_slice());
    assert_eq!(lines[9000]["done"]["members"], 9000);
    // --working adds the working (and everything else of the result).
    let (code, text, _) = run(&["check", &example(), "--json", "--working"]);
    assert_eq!(code, Some(0));
    let doc: serde_json::Value = serde_json::from_str(&text).unwrap();
    assert!(doc["results"][0]["trace"].as_array().unwrap().len() > 5);
    let (code, _, err) = run(&["check", &example(), "--working"]);
    assert_eq!(code, Some(2));
    assert!(err.contains("--working"), "{err}");
    std::fs::remove_file(&path).unwrap();
}

/// Each malformed file: status 2, the message naming what is wrong, and
/// no output that looks complete (no closing caution, `done` line or
/// closed JSON document).
#[test]
fn malformed_lists_are_named_and_never_look_complete() {
    let truncated = list_file("truncated", 6000, |_, m| m);
    let text = std::fs::read_to_string(&truncated).unwrap();
    std::fs::write(&truncated, &text[..text.len() * 3 / 4]).unwrap();
    let wrong_type = list_file("wrongtype", 6000, |i, m| {
        if i == 5000 {
            m.replace("\"axial_kn\":", "\"axial_kn\":\"lots\",\"was\":")
        } else {
            m
        }
    });
    let duplicate = list_file("duplicate", 6000, |i, m| {
        if i == 5800 {
            m.replace("\"C5800\"", "\"C12\"")
        } else {
            m
        }
    });
    let too_big = list_file("range", 6000, |i, m| {
        if i == 4500 {
            m.replace("\"length_mm\":", "\"length_mm\":1e400,\"was\":")
        } else {
            m
        }
    });
    let cases = [
        (&truncated, vec!["line"]),
        // Member i stands on line i + 2 (the head is line 1): the wrong
        // type is told with its place in the file, as a broken file is.
        (
            &wrong_type,
            vec!["\"C5000\"", "line 5002, column ", "axial_kn"],
        ),
        (&duplicate, vec!["#5801", "\"C12\""]),
        (
            &too_big,
            vec!["\"C4500\"", "length_mm: number out of range"],
        ),
    ];
    for (path, words) in cases {
        let p = path.to_str().unwrap();
        for form in [vec![], vec!["--json"], vec!["--jsonl"]] {
            let mut args = vec!["check", p];
            args.extend(form.iter().copied());
            let (code, out, err) = run(&args);
            assert_eq!(code, Some(2), "{args:?}: {err}");
            for w in &words {
                assert!(err.contains(w), "{args:?}: {w} not in {err}");
            }
            assert!(!out.contains("checking aid"), "{args:?} looks complete");
            if form == ["--json"] {
                assert!(serde_json::from_str::<serde_json::Value>(&out).is_err());
            }
            assert!(!out.contains("\"done\""), "{args:?}");
        }
        std::fs::remove_file(path).unwrap();
    }
}

/// A CSV list of `n` round struts, one a row; `row` may change row `i`.
fn csv_file(name: &str, n: usize, row: impl Fn(usize) -> String) -> PathBuf {
    let mut text =
        String::from("sep=;\nid;note;kind;diameter_mm;fy_mpa;e_mpa;length_mm;axial_kn;method\n");
    for i in 0..n {
        text.push_str(&row(i));
    }
    let path = std::env::temp_dir().join(format!("strutline-{name}-{}.csv", std::process::id()));
    std::fs::write(&path, text).unwrap();
    path
}

fn strut(i: usize) -> String {
    format!("R{i};\"strut\nof the lattice\";round;60;355;210000;1800;120,5;perry-robertson\n")
}

#[test]
fn long_csv_lists_are_read_in_blocks_with_the_files_line_numbers() {
    // Each row spans two lines (a quoted line break in the note).
    let good = csv_file("csvgood", 10_000, strut);
    let (code, text, err) = run(&["check", good.to_str().unwrap(), "--jsonl"]);
    assert_eq!(code, Some(0), "{err}");
    let lines: Vec<&str> = text.lines().collect();
    assert_eq!(lines.len(), 10_001);
    assert!(lines[9_999].contains("\"id\":\"R9999\""));
    // The same member as the JSON member file gives (Perry-Robertson with
    // the default bow L/200: 247.30 kN, tests/validation/first_principles.rs).
    let one: serde_json::Value = serde_json::from_str(lines[0]).unwrap();
    assert!(
        (one["resistance_kn"].as_f64().unwrap() - 247.3).abs() < 0.1,
        "{one}"
    );
    // A bad cell and a repeated id far down: named by the file's line.
    let bad = csv_file("csvbad", 10_000, |i| {
        if i == 9_000 {
            strut(i).replace(";60;", ";sixty;")
        } else {
            strut(i)
        }
    });
    let (code, out, err) = run(&["check", bad.to_str().unwrap()]);
    assert_eq!(code, Some(2));
    // Row 9,000 starts on line 3 + 2 * 9,000.
    assert!(err.contains("line 18003, column diameter_mm"), "{err}");
    assert!(!out.contains("checking aid"));
    let dup = csv_file("csvdup", 10_000, |i| {
        if i == 9_500 {
            strut(3)
        } else {
            strut(i)
        }
    });
    let (code, _, err) = run(&["check", dup.to_str().unwrap(), "--json"]);
    assert_eq!(code, Some(2));
    assert!(err.contains("line 19003, column id: id \"R3\""), "{err}");
    for p in [good, bad, dup] {
        std::fs::remove_file(p).unwrap();
    }
}

#[test]
fn convert_to_csv_refuses_to_lose_a_buckling_model_unless_told_to() {
    let hall = root_file("examples/tarnbeck-crane-hall.json");
    let dir = std::env::temp_dir().join(format!("strutline-cli-loss-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let out = dir.join("hall.csv");
    let out_s = out.to_str().unwrap();
    // K1 has a buckling_model, which a CSV row cannot carry: refused.
    let (code, text, err) = run(&["convert", &hall, out_s]);
    assert_eq!(code, Some(2), "{text}{err}");
    assert!(err.contains("member \"K1\": buckling_model"), "{err}");
    assert!(
        err.contains("nothing written") && err.contains("--accept-loss"),
        "{err}"
    );
    assert!(!err.contains("\"W2\""), "{err}");
    assert!(!out.exists());
    // Accepted: written, and still said which member lost what.
    let (code, text, err) = run(&["convert", &hall, out_s, "--accept-loss"]);
    assert_eq!(code, Some(0), "{text}{err}");
    assert!(
        err.contains("member \"K1\": buckling_model: left out"),
        "{err}"
    );
    let csv = std::fs::read_to_string(&out).unwrap();
    assert!(csv.lines().any(|l| l.starts_with("K1,")), "{csv}");
    assert!(!csv.contains("buckling_model"), "{csv}");
    // The option is declared once and its help generated.
    let (_, help, _) = run(&["convert", "--help"]);
    assert!(help.contains("--accept-loss"), "{help}");
    // A list without a structure converts with no option and no note.
    let (code, _, err) = run(&["convert", &example(), out_s]);
    assert_eq!((code, err.as_str()), (Some(0), ""));
    std::fs::remove_dir_all(&dir).unwrap();
}

/// An example's note that names how a hollow section is made agrees with
/// the catalogue section it uses (a cold-formed note on an EN 10210
/// hot-finished designation checks ~20% stronger than it is).
#[test]
fn the_examples_notes_agree_with_their_sections_make() {
    let mut compared = 0;
    for example in ["depot-mezzanine", "tarnbeck-crane-hall", "yard-canopy-over"] {
        let path = root_file(&format!("examples/{example}.json"));
        let file = strutline_core::file::parse(&std::fs::read_to_string(&path).unwrap()).unwrap();
        for m in &file.members {
            let note = m.note.as_deref().unwrap_or_default();
            let said = ["cold-formed", "hot-finished"]
                .into_iter()
                .find(|make| note.contains(make));
            let (Some(said), strutline_core::section::SectionSpec::Catalogue(c)) =
                (said, &m.section)
            else {
                continue;
            };
            let entry = strutline_core::catalogue::resolve(&c.designation).unwrap();
            let spec = strutline_core::file::json_value(&entry.spec).unwrap();
            assert_eq!(
                spec["make"], said,
                "{example}: member {} says {said} but {} is {}",
                m.id, c.designation, spec["make"]
            );
            compared += 1;
        }
    }
    assert!(compared >= 1, "no example note names a make");
}

#[test]
fn the_readable_table_lists_the_warnings_that_decide_first() {
    // An invented loading-dock column, a rolled W under AISC 360-16 with
    // end moments: the engine meets the generic "shear, web bearing ...
    // not checked" note before "B2 ... is not worked", which decides.
    let file = serde_json::json!({
        "format": "strutline.members", "version": 1, "title": "dock",
        "members": [{
            "id": "D1", "section": {"kind": "catalogue", "designation": "W12x65"},
            "material": {"grade": "A992"}, "length_mm": 4267, "axial_kn": 1500,
            "method": "aisc360-lrfd", "m_major_a_knm": 200, "m_major_b_knm": 100
        }]
    });
    let path =
        std::env::temp_dir().join(format!("strutline-cli-order-{}.json", std::process::id()));
    std::fs::write(&path, file.to_string()).unwrap();
    let (_, out, err) = run(&["check", path.to_str().unwrap()]);
    let _ = std::fs::remove_file(&path);
    let line = |code_text: &str| {
        out.lines()
            .position(|l| l.starts_with("warning D1: ") && l.contains(code_text))
            .unwrap_or_else(|| panic!("no warning with {code_text:?}: {out}{err}"))
    };
    assert!(line("B2") < line("web bearing"), "{out}");
}
