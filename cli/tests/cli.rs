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
        assert_eq!(stderr, "", "{args:?}");
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
