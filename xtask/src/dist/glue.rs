//! wasm-bindgen's JS glue: white space and comments tidied, the names
//! that [`super::wasm_opt::minify_names`] shortened put in, and scripts
//! minified by terser (the build's own, see [`super::tools`]).

use std::path::Path;
use std::process::Command;

use anyhow::{bail, Context, Result};

use crate::util;

/// Drops the indentation, the blank lines and the whole-line `//`
/// comments of wasm-bindgen's JS glue (about a tenth of its gzipped size).
/// Only when no line could be inside a multi-line string: every line has
/// an even number of backticks and none ends in a backslash; otherwise the
/// text is returned as it is.
pub fn tidy(js: &str) -> String {
    let safe = js
        .lines()
        .all(|l| l.matches('`').count() % 2 == 0 && !l.trim_end().ends_with('\\'));
    if !safe {
        return js.to_string();
    }
    let mut out = String::with_capacity(js.len());
    for line in js.lines() {
        let t = line.trim();
        if t.is_empty() || t.starts_with("//") {
            continue;
        }
        out.push_str(t);
        out.push('\n');
    }
    out
}

/// The glue with the names of binaryen's mapping (`{"imports": [[module,
/// old, new], ...], "exports": [[old, new], ...]}`) put in.
pub fn rename(glue: &str, map: &str) -> Result<String> {
    let start = map
        .find('{')
        .ok_or_else(|| anyhow::anyhow!("wasm-opt printed no mapping"))?;
    let map: serde_json::Value = serde_json::from_str(map.get(start..).unwrap_or_default())
        .context("reading wasm-opt's mapping")?;
    let pairs = |key: &str, from: usize| -> Result<Vec<(String, String)>> {
        map.get(key)
            .and_then(|v| v.as_array())
            .ok_or_else(|| anyhow::anyhow!("the mapping has no {key}"))?
            .iter()
            .map(|row| {
                let s = |i: usize| row.get(i).and_then(|v| v.as_str()).map(str::to_string);
                s(from)
                    .zip(s(from + 1))
                    .ok_or_else(|| anyhow::anyhow!("a row of {key} is not [.., old, new]"))
            })
            .collect()
    };
    let mut text = glue.to_string();
    for (old, new) in pairs("imports", 1)? {
        let key = format!("\n{old}:");
        let at = text.matches(&key).count();
        if at != 1 {
            bail!("import {old} is found {at} times in the glue, not once");
        }
        text = text.replace(&key, &format!("\n{new}:"));
    }
    for (old, new) in pairs("exports", 0)? {
        let pattern = format!("wasm.{old}");
        let mut out = String::with_capacity(text.len());
        let mut rest = text.as_str();
        let mut found = 0;
        while let Some(i) = rest.find(&pattern) {
            let after = rest.get(i + pattern.len()..).unwrap_or_default();
            let whole =
                !after.starts_with(|c: char| c.is_ascii_alphanumeric() || c == '_' || c == '$');
            out.push_str(rest.get(..i).unwrap_or_default());
            if whole {
                out.push_str("wasm.");
                out.push_str(&new);
                found += 1;
            } else {
                out.push_str(&pattern);
            }
            rest = after;
        }
        out.push_str(rest);
        if found == 0 && !old.starts_with("_WASM_SPLIT_MARKER") {
            // An export the glue never reads is harmless; say so once.
            eprintln!("xtask: note: export {old} is not read by the glue");
        }
        text = out;
    }
    Ok(text)
}

/// Minifies a script in place with terser, as an ES module: about 1.3 KB
/// gzipped off the glue. A failure is an error: the shipped build is
/// always the minified one.
pub fn minify(terser: &Path, path: &Path) -> Result<()> {
    let out = path.with_extension("min.js");
    let result = util::output(
        Command::new(terser)
            .arg(path)
            .args(["--module", "--compress", "--mangle", "-o"])
            .arg(&out),
    )
    .and_then(|_| Ok(std::fs::rename(&out, path)?));
    if result.is_err() {
        let _ = std::fs::remove_file(&out);
    }
    result.with_context(|| format!("minifying {} with terser", path.display()))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn glue_is_tidied_only_when_safe() {
        let js = "function f() {\n    // a note\n\n    return `${x}`;\n}\n";
        assert_eq!(tidy(js), "function f() {\nreturn `${x}`;\n}\n");
        let multi = "const s = `one\n    // not a comment\n`;\n";
        assert_eq!(tidy(multi), multi);
        let cont = "const s = 'a\\\n    b';\n";
        assert_eq!(tidy(cont), cont);
    }

    #[test]
    fn names_are_put_in_where_the_glue_uses_them() {
        let glue = "const imports = {\n__wbg_log_1a2b: function(a) {},\n};\nwasm.__wbindgen_start();\nwasm.__wbindgen_start_x;\n";
        let map = "noise\n{\"imports\": [[\"wbg\", \"__wbg_log_1a2b\", \"a\"]], \"exports\": [[\"__wbindgen_start\", \"b\"]]}";
        let out = rename(glue, map).unwrap();
        assert_eq!(
            out,
            "const imports = {\na: function(a) {},\n};\nwasm.b();\nwasm.__wbindgen_start_x;\n"
        );
        // An import the glue does not have exactly once is refused.
        let twice = format!("{glue}\n__wbg_log_1a2b: 1,\n");
        assert!(rename(&twice, map).is_err());
        assert!(rename(glue, "no mapping").is_err());
    }
}
