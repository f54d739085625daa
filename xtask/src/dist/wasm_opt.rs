//! Shrinking the module with binaryen's `wasm-opt` (the build's own, see
//! [`super::tools`]): the level that gzips smallest, then shorter import
//! and export names with the JS glue renamed to match.

use std::path::Path;
use std::process::Command;

use anyhow::{bail, Context, Result};
use wasmparser::{ExternalKind, Parser, Payload, RefType, TypeRef};

use super::{glue, size};
use crate::util;

/// The wasm-opt levels tried, in order. Binaryen's `-Os` and `-Oz` make
/// the module smaller raw but larger gzipped, chiefly through their
/// inlining (`inlining-optimizing` copies small functions into their
/// callers) and, less, `local-cse`. Measured on this app's module as
/// wasm-bindgen wrote it (566,474 B gzipped at zlib -9, binaryen 132): `-Oz`
/// 597,827 B, `-Os` 596,636 B; `-Os` without the inlining 553,860 B and
/// without local-cse too 552,061 B (the first choice); skipping
/// reorder-functions, precompute-propagate, the locals' merging and
/// ordering or global simplification did no better. The lighter `-O1`
/// choices came to 559,331 B and 554,893 B.
const LEVELS: [&[&str]; 3] = [
    &[
        "-Os",
        "--skip-pass=inlining-optimizing",
        "--skip-pass=local-cse",
    ],
    &["-O1", "--converge"],
    &[
        "-O1",
        "--converge",
        "--dae-optimizing",
        "--code-folding",
        "-O1",
    ],
];

/// The features the module may use, for wasm-opt.
const FEATURES: [&str; 6] = [
    "--enable-bulk-memory",
    "--enable-nontrapping-float-to-int",
    "--enable-reference-types",
    "--enable-multivalue",
    "--enable-sign-ext",
    "--enable-mutable-globals",
];

/// Runs `wasm_opt` at each of [`LEVELS`] and keeps whichever module is
/// smallest gzipped (as the budget counts, [`size::gzip_len`]), the one
/// wasm-bindgen wrote included: binaryen's full levels can make rustc's
/// already size-optimised module compress worse (their inlining copies
/// similar code apart), where a level without those passes still shrinks
/// it. A wasm-opt run that fails, or whose output changed the element type
/// of an exported table (as Debian's binaryen 108 does to wasm-bindgen's
/// externref table, after which the page fails to start), is an error.
pub fn optimise(wasm_opt: &Path, wasm: &Path, keep_names: bool) -> Result<()> {
    let original_bytes = std::fs::read(wasm)?;
    let original = size::gzip_len(&original_bytes)?;
    let tables = exported_tables(&original_bytes)
        .with_context(|| format!("reading the tables of {}", wasm.display()))?;
    let mut best: Option<(usize, Vec<u8>, String)> = None;
    for (n, level) in LEVELS.iter().enumerate() {
        let out = wasm.with_extension(format!("opt{n}.wasm"));
        let name = format!("wasm-opt {}", level.join(" "));
        let result = util::run(
            Command::new(wasm_opt)
                .args(level.iter())
                .args(FEATURES)
                .args(keep_names.then_some("-g"))
                .arg(wasm)
                .arg("-o")
                .arg(&out),
        );
        let bytes = result.and_then(|()| Ok(std::fs::read(&out)?));
        let _ = std::fs::remove_file(&out);
        let bytes = bytes.with_context(|| format!("{name} failed"))?;
        let after = exported_tables(&bytes)
            .with_context(|| format!("{name} wrote a module that cannot be read"))?;
        if after != tables {
            bail!(
                "{name} changed the exported tables ({} -> {}); is it binaryen 132 from xtask/tools?",
                show_tables(&tables),
                show_tables(&after)
            );
        }
        let gz = size::gzip_len(&bytes)?;
        eprintln!("xtask: {name}: {original} B -> {gz} B gzipped");
        if best.as_ref().is_none_or(|(b, _, _)| gz < *b) {
            best = Some((gz, bytes, name));
        }
    }
    match best {
        Some((gz, bytes, name)) if gz < original => {
            std::fs::write(wasm, bytes)?;
            eprintln!("xtask: kept the output of {name} ({gz} B gzipped)");
        }
        _ => eprintln!(
            "xtask: kept the module as wasm-bindgen wrote it ({original} B gzipped, the smallest)"
        ),
    }
    Ok(())
}

/// Shortens the names of the module's imports and exports (wasm-bindgen's
/// are long: `__wbg_set_onstatechange_2a692cb0b458d64d`) with binaryen's
/// `--minify-imports-and-exports`, and renames them to match in the JS
/// glue ([`glue::rename`]). Measured: about 3 KB smaller gzipped. When the
/// glue cannot be renamed (a new wasm-bindgen may write it differently),
/// the build fails rather than ship a module the glue cannot call.
pub fn minify_names(wasm_opt: &Path, wasm: &Path, glue_path: &Path) -> Result<()> {
    let out = wasm.with_extension("min.wasm");
    let map = util::output(
        Command::new(wasm_opt)
            .arg("--minify-imports-and-exports")
            .args(FEATURES)
            .arg(wasm)
            .arg("-o")
            .arg(&out),
    );
    let renamed = map.and_then(|map| {
        let text = std::fs::read_to_string(glue_path)?;
        glue::rename(&text, &map)
    });
    match renamed {
        Ok(text) => {
            std::fs::rename(&out, wasm)?;
            std::fs::write(glue_path, text)?;
            eprintln!("xtask: import and export names minified");
            Ok(())
        }
        Err(e) => {
            let _ = std::fs::remove_file(&out);
            Err(e.context("minifying the module's import and export names"))
        }
    }
}

fn show_tables(tables: &[(String, RefType)]) -> String {
    let kinds: Vec<String> = tables
        .iter()
        .map(|(name, ty)| format!("{name}: {ty}"))
        .collect();
    kinds.join(", ")
}

/// The exported tables of a wasm module: (export name, element type),
/// sorted by name, read with `wasmparser` (imported tables come first in
/// the table index space, then the module's own).
pub fn exported_tables(bytes: &[u8]) -> Result<Vec<(String, RefType)>> {
    let mut types: Vec<RefType> = Vec::new();
    let mut exports: Vec<(String, u32)> = Vec::new();
    for payload in Parser::new(0).parse_all(bytes) {
        match payload? {
            Payload::ImportSection(reader) => {
                for import in reader.into_imports() {
                    if let TypeRef::Table(t) = import?.ty {
                        types.push(t.element_type);
                    }
                }
            }
            Payload::TableSection(reader) => {
                for table in reader {
                    types.push(table?.ty.element_type);
                }
            }
            Payload::ExportSection(reader) => {
                for export in reader {
                    let export = export?;
                    if export.kind == ExternalKind::Table {
                        exports.push((export.name.to_string(), export.index));
                    }
                }
            }
            _ => {}
        }
    }
    let mut out = Vec::with_capacity(exports.len());
    for (name, index) in exports {
        let ty = usize::try_from(index)
            .ok()
            .and_then(|i| types.get(i))
            .copied()
            .ok_or_else(|| anyhow::anyhow!("export {name} names a table that does not exist"))?;
        out.push((name, ty));
    }
    out.sort_by(|a, b| a.0.cmp(&b.0));
    Ok(out)
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_encoder::{
        ExportKind, ExportSection, ImportSection, Module, RefType as ERefType, TableSection,
        TableType,
    };

    fn table(element_type: ERefType) -> TableType {
        TableType {
            element_type,
            table64: false,
            minimum: 0,
            maximum: None,
            shared: false,
        }
    }

    /// A module with an imported function table, its own externref table
    /// and an export of table `export_index` as "refs", written by
    /// `wasm-encoder`.
    fn module(export_index: u32) -> Vec<u8> {
        let mut imports = ImportSection::new();
        imports.import("env", "funcs", table(ERefType::FUNCREF));
        let mut tables = TableSection::new();
        tables.table(table(ERefType::EXTERNREF));
        let mut exports = ExportSection::new();
        exports.export("refs", ExportKind::Table, export_index);
        let mut m = Module::new();
        m.section(&imports).section(&tables).section(&exports);
        m.finish()
    }

    #[test]
    fn exported_tables_follow_the_index_space() {
        assert_eq!(
            exported_tables(&module(1)).unwrap(),
            vec![("refs".to_string(), RefType::EXTERNREF)]
        );
        assert_eq!(
            exported_tables(&module(0)).unwrap(),
            vec![("refs".to_string(), RefType::FUNCREF)]
        );
        assert!(exported_tables(&module(2)).is_err());
        assert!(exported_tables(b"\0asm\x01\0\0\0\x04\x09").is_err());
        assert!(exported_tables(b"nope").is_err());
        assert_eq!(
            show_tables(&exported_tables(&module(1)).unwrap()),
            "refs: externref"
        );
    }
}
