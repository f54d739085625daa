//! The working a person reads is the same text, line for line, as the one
//! recorded in `tests/fixtures/working/golden.txt` (written once from main
//! at 80fb13e, before the engine's working was made cheaper to write).
//!
//! For a fixed set of members (every 37th member of the check benchmark's
//! mixed list and of its list with moments, and every member of the three
//! examples under every method) the whole result with its working is
//! serialised as `strutline check --working --json` writes it (serde_json:
//! every step's scope, symbol, label, value, unit and clause, every warning's
//! message, every number); the fixture keeps each text's length and SHA-256.
//! The app's working table and the calc sheet are written from the same
//! fields, so the same fields give the same page.
//!
//! When a change is meant to alter the working (a new step, a reworded
//! clause), write the fixture afresh with
//! `STRUTLINE_WRITE_WORKING_GOLDEN=1 cargo test -p strutline-core --test working_golden`
//! (the test then fails once, saying so) and say why in the commit.

#![allow(clippy::unwrap_used, clippy::panic)]

#[path = "../benches/lists/mod.rs"]
#[allow(dead_code)]
mod lists;

use sha2::{Digest, Sha256};
use strutline_core::check::{check_member_as, Working};
use strutline_core::member::Member;
use strutline_core::method::Method;

const FIXTURE: &str = concat!(
    env!("CARGO_MANIFEST_DIR"),
    "/../tests/fixtures/working/golden.txt"
);

/// Every 37th member of a list of 10,000: all shapes, methods and load
/// cases the lists cycle through (their periods are all below 37 and
/// prime to it).
const STRIDE: usize = 37;

/// `name<TAB>length<TAB>sha256` of the JSON of `member` checked with its
/// working, or of the refusal's message.
fn line(name: &str, member: &Member) -> String {
    let text = match check_member_as(member, Working::Kept) {
        Ok(r) => serde_json::to_string(&r).unwrap(),
        Err(e) => format!("refused: {e}"),
    };
    let digest = Sha256::digest(text.as_bytes());
    let hex: String = digest.iter().map(|b| format!("{b:02x}")).collect();
    format!("{name}\t{}\t{hex}", text.len())
}

fn lines() -> Vec<String> {
    let mut out = Vec::new();
    let make: fn(usize) -> Member = lists::member;
    let with_moments: fn(usize) -> Member = lists::with_moments;
    for (list, make) in [("mixed", make), ("moments", with_moments)] {
        for i in (0..lists::MEMBERS).step_by(STRIDE) {
            out.push(line(&format!("{list}/{i}"), &make(i)));
        }
    }
    for example in ["depot-mezzanine", "tarnbeck-crane-hall", "yard-canopy-over"] {
        let path = format!("{}/../examples/{example}.json", env!("CARGO_MANIFEST_DIR"));
        let text = std::fs::read_to_string(&path).unwrap();
        let file = strutline_core::file::parse(&text).unwrap();
        for m in &file.members {
            for method in Method::ALL {
                let mut m = m.clone();
                m.method = method;
                out.push(line(&format!("{example}/{}/{}", m.id, method.key()), &m));
            }
        }
    }
    out
}

#[test]
fn the_working_read_is_the_recorded_text() {
    let now = lines();
    if std::env::var_os("STRUTLINE_WRITE_WORKING_GOLDEN").is_some() {
        std::fs::create_dir_all(std::path::Path::new(FIXTURE).parent().unwrap()).unwrap();
        std::fs::write(FIXTURE, now.join("\n") + "\n").unwrap();
        panic!(
            "wrote {} lines to {FIXTURE}; run again without STRUTLINE_WRITE_WORKING_GOLDEN",
            now.len()
        );
    }
    let recorded = std::fs::read_to_string(FIXTURE).unwrap();
    let recorded: Vec<&str> = recorded.lines().collect();
    // 271 + 271 list members and the examples' members under 8 methods.
    assert!(recorded.len() > 600, "{} lines", recorded.len());
    assert_eq!(now.len(), recorded.len(), "the set of members changed");
    let differ: Vec<String> = now
        .iter()
        .zip(&recorded)
        .filter(|(a, b)| a.as_str() != **b)
        .map(|(a, b)| format!("now      {a}\nrecorded {b}"))
        .collect();
    assert!(
        differ.is_empty(),
        "{} of {} results or workings differ from the recorded text:\n{}",
        differ.len(),
        now.len(),
        differ.join("\n")
    );
}
