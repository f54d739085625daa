//! `cargo xtask dist`: builds the web app into `dist/`.
//!
//! Steps: make sure the wasm32 target is installed, build `strutline-web`
//! with the `wasm-release` profile, generate the JS bindings with the
//! wasm-bindgen library (`--target web`) and tidy their whitespace and
//! comments, shrink the wasm with `wasm-opt` where one is installed (the
//! smallest gzipped result that keeps the module's exported tables wins),
//! copy the shell (index.html, boot.js, style.css, manifest), draw the
//! icons, then write `sw.js` with a cache name stamped from a SHA-256 over
//! every other shipped file and the list of files to precache. Finally
//! each file is gzipped beside itself by zopfli (`F.gz`, where smaller; the
//! server sends it to browsers that take gzip), and the total of the bytes
//! sent is printed and checked against the size budget.

use std::path::{Path, PathBuf};

use anyhow::{bail, Context, Result};
use sha2::{Digest, Sha256};

use crate::util;

/// The size budget: 350 KB gzipped, summed over every file in `dist/` as
/// it is sent (its `.gz` where one was written).
pub const BUDGET_GZ_BYTES: usize = 350 * 1024;

/// The wasm target.
const TARGET: &str = "wasm32-unknown-unknown";

/// Base name of the bindings (`strutline_web.js`, `strutline_web_bg.wasm`).
const OUT_NAME: &str = "strutline_web";

/// Lines of `web/static/sw.js` that the build replaces.
const SW_CACHE_LINE: &str = "const CACHE_NAME = \"strutline-dev\";";
const SW_FILES_LINE: &str = "const PRECACHE = [];";

/// What a build produced.
#[derive(Debug, Clone)]
pub struct Built {
    /// The `dist/` directory.
    pub dir: PathBuf,
    /// Every shipped file with its raw size and the bytes sent (its `.gz`
    /// where one was written), sorted by path.
    pub files: Vec<(String, usize, usize)>,
    /// Sum of the bytes sent: each file's `.gz` (zopfli) where one was
    /// written, else the file itself. The budget counts this.
    pub gz_total: usize,
    /// Sum of the sizes gzipped by flate2 at its best level, about what a
    /// host that compresses on the fly sends (printed for comparison).
    pub flate_total: usize,
    /// The stamped cache name written into `sw.js`.
    pub cache_name: String,
}

/// `cargo xtask dist [--no-wasm-opt] [--keep-names]`.
///
/// `--keep-names` is for size work: it builds into `target/names` with the
/// symbol names kept through wasm-bindgen and wasm-opt and writes
/// `dist-names/` instead of `dist/`, so `twiggy top
/// dist-names/strutline_web_bg.wasm` can say where the bytes go (the names
/// add to the size, so the budget is not checked there).
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &[], &["--no-wasm-opt", "--keep-names"])?;
    let use_wasm_opt = !args.iter().any(|a| a == "--no-wasm-opt");
    if args.iter().any(|a| a == "--keep-names") {
        let built = build_with(&util::root().join("dist-names"), use_wasm_opt, true)?;
        report(&built);
        println!("names kept: twiggy top -n 40 dist-names/{OUT_NAME}_bg.wasm");
        return Ok(());
    }
    let built = build(use_wasm_opt)?;
    report(&built);
    check_budget(&built)
}

/// Prints the per-file sizes and the total.
pub fn report(built: &Built) {
    println!("dist/ ({}):", built.cache_name);
    for (path, raw, gz) in &built.files {
        println!("  {path:<32} {raw:>9} B  {gz:>8} B gz");
    }
    println!(
        "  total gzipped: {} B ({:.1} KB) of a {} B ({} KB) budget (each file as sent, \
         its zopfli .gz where smaller; by flate2 -9 on the fly, as some hosts \
         would: {} B)",
        built.gz_total,
        built.gz_total as f64 / 1024.0,
        BUDGET_GZ_BYTES,
        BUDGET_GZ_BYTES / 1024,
        built.flate_total
    );
}

/// Fails when the gzipped total is over the budget.
pub fn check_budget(built: &Built) -> Result<()> {
    if built.gz_total > BUDGET_GZ_BYTES {
        bail!(
            "dist/ is {} B gzipped, over the {} B budget by {} B",
            built.gz_total,
            BUDGET_GZ_BYTES,
            built.gz_total - BUDGET_GZ_BYTES
        );
    }
    Ok(())
}

/// Builds everything into `dist/` and returns what was shipped.
pub fn build(use_wasm_opt: bool) -> Result<Built> {
    build_into(&util::root().join("dist"), use_wasm_opt)
}

/// Builds everything into `dist` (emptied first) and returns what was
/// shipped. The browser tests build into a directory of their own, so a
/// `cargo xtask dist` run at the same time cannot pull files from under
/// them.
pub fn build_into(dist: &Path, use_wasm_opt: bool) -> Result<Built> {
    build_with(dist, use_wasm_opt, false)
}

/// [`build_into`], with the symbol names kept for size analysis when
/// `keep_names` (a build of its own under `target/names`).
fn build_with(dist: &Path, use_wasm_opt: bool, keep_names: bool) -> Result<Built> {
    let root = util::root();
    ensure_target()?;
    let mut cargo = util::cargo();
    if keep_names {
        cargo
            .env("CARGO_PROFILE_WASM_RELEASE_STRIP", "false")
            .env("CARGO_PROFILE_WASM_RELEASE_DEBUG", "false")
            .env("CARGO_TARGET_DIR", root.join("target/names"));
    }
    util::run(cargo.args([
        "build",
        "-p",
        "strutline-web",
        "--target",
        TARGET,
        "--profile",
        "wasm-release",
    ]))?;
    let target_dir = if keep_names {
        root.join("target/names")
    } else {
        std::env::var_os("CARGO_TARGET_DIR")
            .map(PathBuf::from)
            .map(|p| if p.is_absolute() { p } else { root.join(p) })
            .unwrap_or_else(|| root.join("target"))
    };
    let wasm_in = target_dir
        .join(TARGET)
        .join("wasm-release")
        .join("strutline_web.wasm");
    if !wasm_in.is_file() {
        bail!("the build left no {}", wasm_in.display());
    }

    if dist.exists() {
        std::fs::remove_dir_all(dist).with_context(|| format!("clearing {}", dist.display()))?;
    }
    std::fs::create_dir_all(dist)?;

    let mut bindgen = wasm_bindgen_cli_support::Bindgen::new();
    bindgen
        .input_path(&wasm_in)
        .out_name(OUT_NAME)
        .web(true)
        .map_err(|e| anyhow::anyhow!("wasm-bindgen: {e}"))?
        .typescript(false)
        // The library leaves out the default wasm URL that the CLI writes.
        .omit_default_module_path(false)
        .remove_name_section(!keep_names)
        .remove_producers_section(true)
        .generate(dist)
        .map_err(|e| anyhow::anyhow!("wasm-bindgen: {e}"))?;

    let glue = dist.join(format!("{OUT_NAME}.js"));
    let text = std::fs::read_to_string(&glue)?;
    std::fs::write(&glue, tidy_glue(&text))?;

    let wasm_out = dist.join(format!("{OUT_NAME}_bg.wasm"));
    if use_wasm_opt {
        optimise(&wasm_out, keep_names)?;
        if !keep_names {
            minify_names(&wasm_out, &glue)?;
        }
    } else {
        eprintln!("xtask: wasm-opt skipped (--no-wasm-opt)");
    }

    copy(&root.join("index.html"), &dist.join("index.html"))?;
    copy(&root.join("web/static/boot.js"), &dist.join("boot.js"))?;
    if !keep_names {
        minify_js(&glue);
        minify_js(&dist.join("boot.js"));
    }
    copy(
        &root.join("web/static/manifest.webmanifest"),
        &dist.join("manifest.webmanifest"),
    )?;
    let style = root.join("web/style.css");
    if style.is_file() {
        let css = std::fs::read_to_string(&style)?;
        std::fs::write(dist.join("style.css"), tidy_css(&css))?;
    } else {
        eprintln!("xtask: WARNING: web/style.css is missing; dist/ has no style.css");
    }
    for size in [192u32, 512] {
        let png = icon_png(size)?;
        std::fs::write(dist.join(format!("icon-{size}.png")), png)?;
    }

    // Everything but the worker is precached and hashed into the cache name.
    let shipped = util::files_under(dist)?;
    let mut hasher = Sha256::new();
    for rel in &shipped {
        let bytes = std::fs::read(dist.join(rel))?;
        hasher.update(rel.as_bytes());
        hasher.update([0u8]);
        hasher.update((bytes.len() as u64).to_le_bytes());
        hasher.update(&bytes);
    }
    let digest = hasher.finalize();
    let hex: String = digest.iter().take(6).map(|b| format!("{b:02x}")).collect();
    let cache_name = format!("strutline-{hex}");
    let sw = service_worker(&root.join("web/static/sw.js"), &cache_name, &shipped)?;
    // sw.js stays as written: it is small, and its stamped cache name is
    // read back by the update test and by people looking at a deployment.
    std::fs::write(dist.join("sw.js"), sw)?;

    // Each file is also written gzipped beside itself (`F.gz`, by zopfli)
    // when that is smaller, for a server that sends precompressed files
    // (as `cargo xtask serve` does); those are the bytes the budget counts.
    let mut files = Vec::new();
    let (mut gz_total, mut flate_total) = (0, 0);
    for rel in util::files_under(dist)? {
        let bytes = std::fs::read(dist.join(&rel))?;
        let gz = util::zopfli_gzip(&bytes)?;
        let sent = if gz.len() < bytes.len() {
            std::fs::write(dist.join(format!("{rel}.gz")), &gz)?;
            gz.len()
        } else {
            bytes.len()
        };
        gz_total += sent;
        flate_total += util::gzip_len(&bytes)?;
        files.push((rel, bytes.len(), sent));
    }
    Ok(Built {
        dir: dist.to_path_buf(),
        files,
        gz_total,
        flate_total,
        cache_name,
    })
}

/// The style sheet without its comments and the white space CSS does not
/// need (the rules themselves are left as written).
pub fn tidy_css(css: &str) -> String {
    let mut out = String::with_capacity(css.len());
    let mut rest = css;
    while let Some(i) = rest.find("/*") {
        out.push_str(rest.get(..i).unwrap_or_default());
        rest = match rest.get(i + 2..).and_then(|r| r.find("*/").map(|j| (r, j))) {
            Some((r, j)) => r.get(j + 2..).unwrap_or_default(),
            None => "",
        };
    }
    out.push_str(rest);
    // Runs of white space become one space, and none is kept next to
    // `{`, `}`, `;` or `,` (where CSS never needs it; `:` is left alone, as
    // a space before it can be a descendant combinator).
    let mut tidy = String::with_capacity(out.len());
    for word in out.split_whitespace() {
        let glued = tidy.ends_with(['{', '}', ';', ',']) || word.starts_with(['{', '}', ';', ',']);
        if !tidy.is_empty() && !glued {
            tidy.push(' ');
        }
        tidy.push_str(word);
    }
    tidy
}

fn copy(from: &Path, to: &Path) -> Result<()> {
    std::fs::copy(from, to)
        .with_context(|| format!("copying {} to {}", from.display(), to.display()))?;
    Ok(())
}

/// Installs the wasm32 target through rustup when it is missing.
fn ensure_target() -> Result<()> {
    let installed =
        util::output(std::process::Command::new("rustup").args(["target", "list", "--installed"]));
    match installed {
        Ok(list) if list.lines().any(|l| l.trim() == TARGET) => Ok(()),
        Ok(_) => util::run(std::process::Command::new("rustup").args(["target", "add", TARGET])),
        Err(e) => {
            eprintln!(
                "xtask: could not ask rustup for installed targets ({e}); trying the build anyway"
            );
            Ok(())
        }
    }
}

/// The wasm-opt levels tried, in order. The levels from -O2 up reorder
/// functions by use and inline, which makes the module smaller raw but
/// larger gzipped (measured: -Oz 358 KB against -O1 334 KB gzipped), so the
/// third choice is -O1 with the passes that shrink without reordering:
/// dead-argument elimination and code folding.
const WASM_OPT_LEVELS: [&[&str]; 3] = [
    &["-Oz"],
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
const WASM_FEATURES: [&str; 6] = [
    "--enable-bulk-memory",
    "--enable-nontrapping-float-to-int",
    "--enable-reference-types",
    "--enable-multivalue",
    "--enable-sign-ext",
    "--enable-mutable-globals",
];

/// The wasm-opt programs to try: binaryen from the npm registry when the
/// node project of the browser tests has it installed (pinned there by its
/// lock file), otherwise the one on PATH (Debian's).
fn wasm_opt_programs() -> Vec<PathBuf> {
    let npm = util::root().join("tests/browser/node_modules/.bin/wasm-opt");
    if npm.is_file() && util::on_path("node") {
        // Debian's 108 is only a fallback: its output is always refused
        // (see `optimise`), so trying it as well only costs time.
        return vec![npm];
    }
    if util::on_path("wasm-opt") {
        return vec![PathBuf::from("wasm-opt")];
    }
    Vec::new()
}

/// Runs each wasm-opt of [`wasm_opt_programs`] at each of
/// [`WASM_OPT_LEVELS`] and keeps whichever module is smallest gzipped, the
/// one wasm-bindgen wrote included: the budget counts gzipped bytes, and
/// binaryen's `-Oz` can make rustc's already size-optimised module
/// compress worse (its function reordering breaks up similar code), where
/// the lighter `-O1` still shrinks it. An output whose exported tables
/// changed their element type is refused: Debian's binaryen 108 moves the
/// export of wasm-bindgen's externref table onto the function table, and
/// the page then fails to start. A wasm-opt that fails is skipped with a
/// warning.
fn optimise(wasm: &Path, keep_names: bool) -> Result<()> {
    let programs = wasm_opt_programs();
    if programs.is_empty() {
        eprintln!("xtask: note: no wasm-opt found; the wasm is not shrunk further");
        return Ok(());
    }
    let original_bytes = std::fs::read(wasm)?;
    let original = util::gzip_len(&original_bytes)?;
    let tables = exported_tables(&original_bytes)
        .with_context(|| format!("reading the tables of {}", wasm.display()))?;
    let mut best: Option<(usize, PathBuf, String)> = None;
    let mut n = 0;
    for program in &programs {
        for level in WASM_OPT_LEVELS {
            n += 1;
            let out = wasm.with_extension(format!("opt{n}.wasm"));
            let name = format!("{} {}", program.display(), level.join(" "));
            let result = util::run(
                std::process::Command::new(program)
                    .args(level.iter())
                    .args(WASM_FEATURES)
                    .args(keep_names.then_some("-g"))
                    .arg(wasm)
                    .arg("-o")
                    .arg(&out),
            );
            if let Err(e) = result {
                let _ = std::fs::remove_file(&out);
                eprintln!("xtask: WARNING: {name} failed: {e:#}");
                continue;
            }
            let bytes = std::fs::read(&out)?;
            match exported_tables(&bytes) {
                Ok(t) if t == tables => {}
                Ok(t) => {
                    let _ = std::fs::remove_file(&out);
                    eprintln!(
                        "xtask: WARNING: {name} changed the exported tables ({} -> {}); its output is not used",
                        show_tables(&tables),
                        show_tables(&t)
                    );
                    continue;
                }
                Err(e) => {
                    let _ = std::fs::remove_file(&out);
                    eprintln!("xtask: WARNING: {name} wrote a module that cannot be read ({e:#}); not used");
                    continue;
                }
            }
            let gz = util::gzip_len(&bytes)?;
            eprintln!("xtask: {name}: {original} B -> {gz} B gzipped");
            if best.as_ref().is_none_or(|(b, _, _)| gz < *b) {
                if let Some((_, old, _)) = best.take() {
                    let _ = std::fs::remove_file(old);
                }
                best = Some((gz, out, name));
            } else {
                let _ = std::fs::remove_file(&out);
            }
        }
    }
    match best {
        Some((gz, path, name)) if gz < original => {
            std::fs::rename(&path, wasm)?;
            eprintln!("xtask: kept the output of {name} ({gz} B gzipped)");
        }
        Some((_, path, _)) => {
            let _ = std::fs::remove_file(path);
            eprintln!("xtask: kept the module as wasm-bindgen wrote it ({original} B gzipped, the smallest)");
        }
        None => {
            eprintln!("xtask: kept the module as wasm-bindgen wrote it (no usable wasm-opt output)")
        }
    }
    Ok(())
}

/// Minifies a script in place with terser from the npm registry (pinned in
/// `tests/browser/package.json`), as an ES module: about 1.3 KB gzipped
/// off the glue. Without terser, or when it fails, the script is left as
/// it was, with a note.
fn minify_js(path: &Path) {
    let terser = util::root().join("tests/browser/node_modules/.bin/terser");
    if !terser.is_file() || !util::on_path("node") {
        eprintln!(
            "xtask: note: terser is not installed (npm ci in tests/browser); scripts not minified"
        );
        return;
    }
    let out = path.with_extension("min.js");
    let mut cmd = std::process::Command::new(&terser);
    cmd.arg(path)
        .args(["--module", "--compress", "--mangle", "-o"])
        .arg(&out);
    match util::output(&mut cmd).and_then(|_| Ok(std::fs::rename(&out, path)?)) {
        Ok(()) => {}
        Err(e) => {
            let _ = std::fs::remove_file(&out);
            eprintln!("xtask: WARNING: {} not minified: {e:#}", path.display());
        }
    }
}

/// Shortens the names of the module's imports and exports (wasm-bindgen's
/// are long: `__wbg_set_onstatechange_2a692cb0b458d64d`) with binaryen's
/// `--minify-imports-and-exports`, and renames them to match in the JS glue:
/// an import is a key `NAME:` at the start of a line of the glue's import
/// object, an export is read as `wasm.NAME`. Measured: about 3 KB smaller
/// gzipped. Every import must be found exactly once in the glue and every
/// export at least once; if not (a new wasm-bindgen may write its glue
/// differently), both files are left as they were, with a warning, and the
/// browser tests still run on working files.
fn minify_names(wasm: &Path, glue: &Path) -> Result<()> {
    let Some(program) = wasm_opt_programs().into_iter().next() else {
        return Ok(());
    };
    let out = wasm.with_extension("min.wasm");
    let map = util::output(
        std::process::Command::new(&program)
            .arg("--minify-imports-and-exports")
            .args(WASM_FEATURES)
            .arg(wasm)
            .arg("-o")
            .arg(&out),
    );
    let renamed = map.and_then(|map| {
        let text = std::fs::read_to_string(glue)?;
        rename_in_glue(&text, &map)
    });
    match renamed {
        Ok(text) => {
            std::fs::rename(&out, wasm)?;
            std::fs::write(glue, text)?;
            eprintln!("xtask: import and export names minified");
        }
        Err(e) => {
            let _ = std::fs::remove_file(&out);
            eprintln!("xtask: WARNING: names not minified: {e:#}");
        }
    }
    Ok(())
}

/// The glue with the names of binaryen's mapping (`{"imports": [[module,
/// old, new], ...], "exports": [[old, new], ...]}`) put in.
fn rename_in_glue(glue: &str, map: &str) -> Result<String> {
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

fn show_tables(tables: &[(String, u8)]) -> String {
    let kinds: Vec<String> = tables
        .iter()
        .map(|(name, ty)| match ty {
            0x70 => format!("{name}: funcref"),
            0x6f => format!("{name}: externref"),
            other => format!("{name}: type 0x{other:02x}"),
        })
        .collect();
    kinds.join(", ")
}

/// The exported tables of a wasm module: (export name, element type byte:
/// 0x70 funcref, 0x6f externref), sorted by name. Reads only the import,
/// table and export sections.
pub fn exported_tables(bytes: &[u8]) -> Result<Vec<(String, u8)>> {
    struct Reader<'a> {
        bytes: &'a [u8],
        at: usize,
    }
    impl Reader<'_> {
        fn byte(&mut self) -> Result<u8> {
            let b = *self
                .bytes
                .get(self.at)
                .ok_or_else(|| anyhow::anyhow!("the module ends early"))?;
            self.at += 1;
            Ok(b)
        }
        fn leb(&mut self) -> Result<u64> {
            let mut value = 0u64;
            for shift in (0..64).step_by(7) {
                let b = self.byte()?;
                value |= u64::from(b & 0x7f) << shift;
                if b & 0x80 == 0 {
                    return Ok(value);
                }
            }
            bail!("a number in the module is too long")
        }
        fn name(&mut self) -> Result<String> {
            let n = usize::try_from(self.leb()?)?;
            let s = self
                .bytes
                .get(self.at..self.at + n)
                .ok_or_else(|| anyhow::anyhow!("the module ends early"))?;
            self.at += n;
            Ok(String::from_utf8_lossy(s).into_owned())
        }
        fn limits(&mut self) -> Result<()> {
            let flags = self.byte()?;
            self.leb()?;
            if flags & 1 != 0 {
                self.leb()?;
            }
            Ok(())
        }
    }
    if bytes.get(..4) != Some(b"\0asm".as_slice()) {
        bail!("not a wasm module");
    }
    let mut r = Reader { bytes, at: 8 };
    let mut table_types: Vec<u8> = Vec::new();
    let mut exports: Vec<(String, u64)> = Vec::new();
    while r.at < bytes.len() {
        let id = r.byte()?;
        let size = r.leb()?;
        let end = r.at + usize::try_from(size)?;
        match id {
            2 => {
                for _ in 0..r.leb()? {
                    r.name()?;
                    r.name()?;
                    match r.byte()? {
                        0 => {
                            r.leb()?;
                        }
                        1 => {
                            table_types.push(r.byte()?);
                            r.limits()?;
                        }
                        2 => r.limits()?,
                        3 => {
                            r.byte()?;
                            r.byte()?;
                        }
                        4 => {
                            r.byte()?;
                            r.leb()?;
                        }
                        k => bail!("unknown import kind {k}"),
                    }
                }
            }
            4 => {
                for _ in 0..r.leb()? {
                    table_types.push(r.byte()?);
                    r.limits()?;
                }
            }
            7 => {
                for _ in 0..r.leb()? {
                    let name = r.name()?;
                    let kind = r.byte()?;
                    let index = r.leb()?;
                    if kind == 1 {
                        exports.push((name, index));
                    }
                }
            }
            _ => {}
        }
        r.at = end;
        if r.at > bytes.len() {
            bail!("a section runs past the end of the module");
        }
    }
    let mut out = Vec::with_capacity(exports.len());
    for (name, index) in exports {
        let ty = usize::try_from(index)
            .ok()
            .and_then(|i| table_types.get(i))
            .copied()
            .ok_or_else(|| anyhow::anyhow!("export {name} names a table that does not exist"))?;
        out.push((name, ty));
    }
    out.sort();
    Ok(out)
}

/// Drops the indentation, the blank lines and the whole-line `//`
/// comments of wasm-bindgen's JS glue (about a tenth of its gzipped size).
/// Only when no line could be inside a multi-line string: every line has
/// an even number of backticks and none ends in a backslash; otherwise the
/// text is returned as it is.
pub fn tidy_glue(js: &str) -> String {
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

/// Fills the worker template with the cache name and the precache list.
fn service_worker(template: &Path, cache_name: &str, shipped: &[String]) -> Result<String> {
    let text = std::fs::read_to_string(template)
        .with_context(|| format!("reading {}", template.display()))?;
    if !text.contains(SW_CACHE_LINE) || !text.contains(SW_FILES_LINE) {
        bail!(
            "{} must contain the lines `{SW_CACHE_LINE}` and `{SW_FILES_LINE}`",
            template.display()
        );
    }
    let mut list = String::from("const PRECACHE = [\n  \"./\",\n");
    for rel in shipped {
        list.push_str(&format!("  \"./{}\",\n", js_escape(rel)));
    }
    list.push_str("];");
    // Whole-line comments are for the source, not the browser.
    let text: String = text
        .lines()
        .filter(|l| !l.trim_start().starts_with("//"))
        .flat_map(|l| [l, "\n"])
        .collect();
    Ok(text
        .replace(
            SW_CACHE_LINE,
            &format!("const CACHE_NAME = \"{cache_name}\";"),
        )
        .replace(SW_FILES_LINE, &list))
}

fn js_escape(s: &str) -> String {
    s.replace('\\', "\\\\").replace('"', "\\\"")
}

// ---------------------------------------------------------------------------
// Icons: a bowed strut between two plates on a slate ground, drawn with
// 4x4 supersampling and written as a minimal PNG. The ground is full-bleed
// and the figure stays inside the central circle of radius 0.4, so the
// same picture serves as a maskable icon.

const GROUND: [f64; 3] = [29.0, 59.0, 79.0];
const STRUT: [f64; 3] = [232.0, 163.0, 61.0];
const AXIS: [f64; 3] = [244.0, 241.0, 234.0];

/// The colour of the figure at unit coordinates (x, y), y downwards.
fn figure(x: f64, y: f64) -> [f64; 3] {
    let (top, bottom) = (0.25, 0.75);
    let plate_half_width = 0.17;
    let plate_thickness = 0.045;
    let on_plate = (x - 0.5).abs() <= plate_half_width
        && ((y >= top - plate_thickness && y <= top)
            || (y >= bottom && y <= bottom + plate_thickness));
    if on_plate {
        return STRUT;
    }
    if y > top && y < bottom {
        let t = (y - top) / (bottom - top);
        let centre = 0.5 + 0.075 * (std::f64::consts::PI * t).sin();
        if (x - centre).abs() <= 0.042 {
            return STRUT;
        }
        // The straight line the strut left: a dashed pale axis.
        let dash = ((y - top) / 0.04).floor() as i64 % 2 == 0;
        if dash && (x - 0.5).abs() <= 0.008 {
            return AXIS;
        }
    }
    GROUND
}

/// RGB pixels of the icon at `size` x `size`.
fn icon_pixels(size: u32) -> Vec<u8> {
    const SS: u32 = 4;
    let n = f64::from(size);
    let mut out = Vec::with_capacity((size * size * 3) as usize);
    for py in 0..size {
        for px in 0..size {
            let mut acc = [0.0f64; 3];
            for sy in 0..SS {
                for sx in 0..SS {
                    let x = (f64::from(px) + (f64::from(sx) + 0.5) / f64::from(SS)) / n;
                    let y = (f64::from(py) + (f64::from(sy) + 0.5) / f64::from(SS)) / n;
                    let c = figure(x, y);
                    for (a, v) in acc.iter_mut().zip(c) {
                        *a += v;
                    }
                }
            }
            for a in acc {
                out.push((a / f64::from(SS * SS)).round().clamp(0.0, 255.0) as u8);
            }
        }
    }
    out
}

/// The icon as PNG bytes (8-bit RGB, no interlace).
pub fn icon_png(size: u32) -> Result<Vec<u8>> {
    use std::io::Write;
    let pixels = icon_pixels(size);
    // The icon is drawn in a few flat colours: an indexed PNG with the
    // fewest bits per pixel that holds them is about a third of the RGB
    // one (RGB remains for more than 256 colours).
    let mut palette: Vec<[u8; 3]> = Vec::new();
    let mut index = Vec::with_capacity(pixels.len() / 3);
    for px in pixels.chunks(3) {
        let at = |k: usize| px.get(k).copied().unwrap_or(0);
        let c = [at(0), at(1), at(2)];
        let i = match palette.iter().position(|p| *p == c) {
            Some(i) => i,
            None => {
                palette.push(c);
                palette.len() - 1
            }
        };
        index.push(i);
    }
    let indexed = palette.len() <= 256;
    let depth: usize = match palette.len() {
        0..=2 => 1,
        3..=4 => 2,
        5..=16 => 4,
        _ => 8,
    };
    let mut raw = Vec::with_capacity(pixels.len() + size as usize);
    if indexed {
        for line in index.chunks(size as usize) {
            raw.push(0u8); // filter: none
            let mut byte = 0u8;
            let mut used = 0;
            for &i in line {
                byte |= (i as u8) << (8 - depth - used);
                used += depth;
                if used == 8 {
                    raw.push(byte);
                    byte = 0;
                    used = 0;
                }
            }
            if used > 0 {
                raw.push(byte);
            }
        }
    } else {
        for line in pixels.chunks((size * 3) as usize) {
            raw.push(0u8); // filter: none
            raw.extend_from_slice(line);
        }
    }
    let mut z = flate2::write::ZlibEncoder::new(Vec::new(), flate2::Compression::best());
    z.write_all(&raw)?;
    let idat = z.finish()?;

    let mut ihdr = Vec::with_capacity(13);
    ihdr.extend_from_slice(&size.to_be_bytes());
    ihdr.extend_from_slice(&size.to_be_bytes());
    if indexed {
        // depth, palette colour, deflate, filter 0, no interlace
        ihdr.extend_from_slice(&[depth as u8, 3, 0, 0, 0]);
    } else {
        ihdr.extend_from_slice(&[8, 2, 0, 0, 0]); // depth 8, RGB
    }

    let mut png = vec![0x89, b'P', b'N', b'G', 0x0d, 0x0a, 0x1a, 0x0a];
    chunk(&mut png, b"IHDR", &ihdr);
    if indexed {
        chunk(&mut png, b"PLTE", &palette.concat());
    }
    chunk(&mut png, b"IDAT", &idat);
    chunk(&mut png, b"IEND", &[]);
    Ok(png)
}

fn chunk(png: &mut Vec<u8>, kind: &[u8; 4], data: &[u8]) {
    png.extend_from_slice(&(data.len() as u32).to_be_bytes());
    png.extend_from_slice(kind);
    png.extend_from_slice(data);
    let mut crc = Crc32::new();
    crc.update(kind);
    crc.update(data);
    png.extend_from_slice(&crc.finish().to_be_bytes());
}

/// CRC-32 (ISO-HDLC, reflected polynomial 0xEDB88320) as PNG requires.
struct Crc32(u32);

impl Crc32 {
    fn new() -> Crc32 {
        Crc32(0xffff_ffff)
    }

    fn update(&mut self, bytes: &[u8]) {
        for &b in bytes {
            self.0 ^= u32::from(b);
            for _ in 0..8 {
                let mask = (self.0 & 1).wrapping_neg();
                self.0 = (self.0 >> 1) ^ (0xedb8_8320 & mask);
            }
        }
    }

    fn finish(&self) -> u32 {
        self.0 ^ 0xffff_ffff
    }
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;

    #[test]
    fn crc32_matches_the_standard_check_value() {
        // The CRC-32/ISO-HDLC check value for "123456789" is 0xCBF43926
        // (the catalogue value every CRC-32 implementation is tested with).
        let mut c = Crc32::new();
        c.update(b"123456789");
        assert_eq!(c.finish(), 0xcbf4_3926);
    }

    #[test]
    fn icon_is_a_png_of_the_asked_size() {
        let png = icon_png(192).unwrap();
        assert_eq!(&png[..8], &[0x89, b'P', b'N', b'G', 0x0d, 0x0a, 0x1a, 0x0a]);
        assert_eq!(&png[12..16], b"IHDR");
        assert_eq!(u32::from_be_bytes(png[16..20].try_into().unwrap()), 192);
        assert_eq!(u32::from_be_bytes(png[20..24].try_into().unwrap()), 192);
        assert_eq!(&png[png.len() - 8..png.len() - 4], b"IEND");
    }

    #[test]
    fn css_loses_comments_and_needless_space_only() {
        let css =
            "/* a */\n.x {\n  color: red; /* b\n c */\n}\n\n@media print {\n  .y { a: b; }\n}\n";
        assert_eq!(tidy_css(css), ".x{color: red;}@media print{.y{a: b;}}");
        assert_eq!(tidy_css("a { b: c; } /* open"), "a{b: c;}");
        assert_eq!(
            tidy_css("a :hover, b > c { d: rgba(0, 0, 0) }"),
            "a :hover,b > c{d: rgba(0,0,0)}"
        );
    }

    #[test]
    fn icon_is_indexed_and_its_rows_inflate_to_the_image() {
        use std::io::Read;
        let png = icon_png(192).unwrap();
        let find = |kind: &[u8]| png.windows(4).position(|w| w == kind).unwrap();
        let ihdr = find(b"IHDR") + 4;
        let (depth, colour) = (png[ihdr + 8], png[ihdr + 9]);
        assert_eq!(colour, 3, "palette colour");
        let plte = find(b"PLTE");
        let n = u32::from_be_bytes(png[plte - 4..plte].try_into().unwrap()) as usize;
        assert!(
            n.is_multiple_of(3) && n / 3 <= 1 << depth,
            "{} colours for depth {depth}",
            n / 3
        );
        let idat = find(b"IDAT");
        let len = u32::from_be_bytes(png[idat - 4..idat].try_into().unwrap()) as usize;
        let mut raw = Vec::new();
        flate2::read::ZlibDecoder::new(&png[idat + 4..idat + 4 + len])
            .read_to_end(&mut raw)
            .unwrap();
        let row = 1 + (192 * depth as usize).div_ceil(8);
        assert_eq!(raw.len(), 192 * row);
    }

    #[test]
    fn icon_corners_are_ground_and_centre_is_figure() {
        let px = icon_pixels(64);
        let at = |x: usize, y: usize| &px[(y * 64 + x) * 3..(y * 64 + x) * 3 + 3];
        assert_eq!(at(0, 0), &[29, 59, 79]);
        assert_eq!(at(63, 63), &[29, 59, 79]);
        // Mid-height the strut is bowed right of the centre line.
        let mid = at(37, 32);
        assert_eq!(mid, &[232, 163, 61]);
    }

    /// A module with a function table and an externref table, exporting
    /// the externref one as wasm-bindgen does (hand-assembled from the
    /// binary format: magic, version, table section, export section).
    fn two_tables(export_index: u8) -> Vec<u8> {
        let mut m = b"\0asm\x01\0\0\0".to_vec();
        m.extend([4, 7, 2, 0x70, 0, 1, 0x6f, 0, 4]);
        m.extend([7, 8, 1, 4, b'r', b'e', b'f', b's', 1]);
        m.push(export_index);
        m
    }

    #[test]
    fn exported_tables_follow_the_index() {
        assert_eq!(
            exported_tables(&two_tables(1)).unwrap(),
            vec![("refs".to_string(), 0x6f)]
        );
        assert_eq!(
            exported_tables(&two_tables(0)).unwrap(),
            vec![("refs".to_string(), 0x70)]
        );
        assert!(exported_tables(&two_tables(2)).is_err());
        assert!(exported_tables(b"\0asm\x01\0\0\0\x04\x09").is_err());
        assert!(exported_tables(b"nope").is_err());
    }

    #[test]
    fn glue_is_tidied_only_when_safe() {
        let js = "function f() {\n    // a note\n\n    return `${x}`;\n}\n";
        assert_eq!(tidy_glue(js), "function f() {\nreturn `${x}`;\n}\n");
        let multi = "const s = `one\n    // not a comment\n`;\n";
        assert_eq!(tidy_glue(multi), multi);
        let cont = "const s = 'a\\\n    b';\n";
        assert_eq!(tidy_glue(cont), cont);
    }

    #[test]
    fn worker_template_gets_name_and_files() {
        let dir = std::env::temp_dir().join(format!("xtask-sw-{}", std::process::id()));
        std::fs::create_dir_all(&dir).unwrap();
        let t = dir.join("sw.js");
        std::fs::write(&t, format!("{SW_CACHE_LINE}\n{SW_FILES_LINE}\n")).unwrap();
        let out = service_worker(&t, "strutline-abc", &["a.js".into(), "b/c.wasm".into()]).unwrap();
        assert!(out.contains("const CACHE_NAME = \"strutline-abc\";"));
        assert!(
            out.contains("\"./\",")
                && out.contains("\"./a.js\",")
                && out.contains("\"./b/c.wasm\",")
        );
        std::fs::write(&t, "nothing").unwrap();
        assert!(service_worker(&t, "x", &[]).is_err());
        std::fs::remove_dir_all(&dir).unwrap();
    }
}
