//! The engine's layers, machine-checked: every `crate::<module>` path in
//! core's library sources (tests and comments left out) must point to a
//! module of a lower layer than the module it is written in. So the
//! modules cannot import each other in a circle, and each layer can be read
//! knowing only the ones below it. A new module goes into [`LAYERS`]; the
//! test fails for a module that is not there.
#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::panic,
    clippy::indexing_slicing
)]

use std::collections::BTreeMap;
use std::path::{Path, PathBuf};

/// Core's top-level modules, lowest layer first. A module may use only the
/// modules of the layers before its own (not those of its own layer).
const LAYERS: &[(&str, &[&str])] = &[
    (
        "utilities",
        &[
            "error", "units", "decimal", "trig", "names", "trace", "ids", "roots",
        ],
    ),
    ("geometry", &["section"]),
    ("data", &["catalogue", "material"]),
    ("buckling analysis", &["buckling"]),
    ("member", &["member"]),
    ("outcome types", &["outcome"]),
    ("methods", &["method"]),
    ("other limit states", &["stability", "bending"]),
    ("beam-column interaction", &["interaction"]),
    ("the check", &["check"]),
    ("orchestration", &["envelope", "compare", "solve", "sizing"]),
    ("the member file", &["file"]),
    ("other formats", &["csv"]),
    ("reading a member file as a stream", &["stream"]),
];

fn layer_of(module: &str) -> Option<usize> {
    LAYERS.iter().position(|(_, mods)| mods.contains(&module))
}

fn sources(dir: &Path, out: &mut Vec<PathBuf>) {
    for entry in std::fs::read_dir(dir).unwrap() {
        let path = entry.unwrap().path();
        if path.is_dir() {
            // The command line is an edge over the whole library.
            if path.file_name().is_some_and(|n| n == "bin") {
                continue;
            }
            sources(&path, out);
        } else if path.extension().is_some_and(|e| e == "rs") {
            out.push(path);
        }
    }
}

/// The library code of a source file: the test modules (a `#[cfg(test)]`
/// item and everything after it, or a file `tests.rs`) and comments left
/// out.
fn library_code(path: &Path) -> String {
    if path.file_name().is_some_and(|n| n == "tests.rs") {
        return String::new();
    }
    let text = std::fs::read_to_string(path).unwrap();
    let mut code = String::new();
    for line in text.lines() {
        if line.trim_start().starts_with("#[cfg(test)]") {
            break;
        }
        let line = match line.find("//") {
            Some(at) => &line[..at],
            None => line,
        };
        code.push_str(line);
        code.push('\n');
    }
    code
}

/// The `crate::<module>` paths of some code.
fn targets(code: &str) -> Vec<String> {
    let mut out = Vec::new();
    let mut rest = code;
    while let Some(at) = rest.find("crate::") {
        let before = rest[..at].chars().last();
        rest = &rest[at + "crate::".len()..];
        // `strutline_crate::` and the like are not paths into this crate.
        if before.is_some_and(|c| c.is_alphanumeric() || c == '_') {
            continue;
        }
        let name: String = rest
            .chars()
            .take_while(|c| c.is_alphanumeric() || *c == '_')
            .collect();
        if !name.is_empty() {
            out.push(name);
        }
    }
    out
}

/// Every edge between top-level modules: (from, to) -> the files.
fn edges() -> BTreeMap<(String, String), Vec<String>> {
    let root = Path::new(env!("CARGO_MANIFEST_DIR")).join("src");
    let mut files = Vec::new();
    sources(&root, &mut files);
    let mut out: BTreeMap<(String, String), Vec<String>> = BTreeMap::new();
    for path in files {
        let rel = path
            .strip_prefix(&root)
            .unwrap()
            .to_string_lossy()
            .into_owned();
        if rel == "lib.rs" {
            continue;
        }
        let module = rel
            .split('/')
            .next()
            .unwrap()
            .trim_end_matches(".rs")
            .to_string();
        for target in targets(&library_code(&path)) {
            if target != module {
                out.entry((module.clone(), target))
                    .or_default()
                    .push(rel.clone());
            }
        }
        out.entry((module.clone(), module)).or_default();
    }
    out
}

#[test]
fn every_module_uses_only_lower_layers() {
    let mut wrong = Vec::new();
    for ((from, to), files) in edges() {
        let Some(a) = layer_of(&from) else {
            wrong.push(format!(
                "module `{from}` is in no layer; add it to LAYERS in core/tests/layers.rs"
            ));
            continue;
        };
        if from == to {
            continue;
        }
        let Some(b) = layer_of(&to) else {
            wrong.push(format!(
                "`{from}` uses `crate::{to}`, which is in no layer ({files:?})"
            ));
            continue;
        };
        if b >= a {
            wrong.push(format!(
                "`{from}` ({}) uses `{to}` ({}), which is not below it, in {files:?}",
                LAYERS[a].0, LAYERS[b].0
            ));
        }
    }
    wrong.sort();
    wrong.dedup();
    assert!(wrong.is_empty(), "layer violations:\n{}", wrong.join("\n"));
}

/// The checker itself finds an edge and reads paths correctly.
#[test]
fn the_checker_sees_edges() {
    assert_eq!(
        targets("use crate::section::{Section};\nlet x = crate::error::Error;"),
        ["section", "error"]
    );
    assert!(targets("strutline_crate::x").is_empty());
    let edges = edges();
    assert!(edges.contains_key(&("check".into(), "method".into())));
    assert!(edges.contains_key(&("catalogue".into(), "section".into())));
    // Every layer's modules exist in the sources.
    for (_, mods) in LAYERS {
        for m in *mods {
            assert!(
                edges.keys().any(|(from, _)| from == m),
                "LAYERS names `{m}`, which core/src does not have"
            );
        }
    }
}
