//! Small helpers shared by the xtask subcommands: the workspace root and
//! target directory, running child processes and a tiny argument reader.

use std::path::{Path, PathBuf};
use std::process::Command;
use std::sync::OnceLock;

use anyhow::{bail, Context, Result};

/// The workspace root (the parent of `xtask/`).
pub fn root() -> PathBuf {
    let manifest = PathBuf::from(env!("CARGO_MANIFEST_DIR"));
    manifest.parent().map(Path::to_path_buf).unwrap_or(manifest)
}

/// Cargo's target directory for this workspace, as `cargo metadata`
/// reports it (so `CARGO_TARGET_DIR`, `build.target-dir` in a cargo
/// config and the default `target/` are all honoured); asked once per run.
pub fn target_dir() -> Result<PathBuf> {
    static DIR: OnceLock<PathBuf> = OnceLock::new();
    if let Some(dir) = DIR.get() {
        return Ok(dir.clone());
    }
    let text = output(cargo().args(["metadata", "--format-version", "1", "--no-deps"]))?;
    let meta: serde_json::Value =
        serde_json::from_str(&text).context("reading the output of `cargo metadata`")?;
    let dir = meta
        .get("target_directory")
        .and_then(|v| v.as_str())
        .map(PathBuf::from)
        .ok_or_else(|| anyhow::anyhow!("`cargo metadata` names no target_directory"))?;
    Ok(DIR.get_or_init(|| dir).clone())
}

/// The `cargo` that runs us (falls back to `cargo` on PATH).
pub fn cargo() -> Command {
    let program = std::env::var_os("CARGO").unwrap_or_else(|| "cargo".into());
    let mut cmd = Command::new(program);
    cmd.current_dir(root());
    cmd
}

/// Runs a command to completion, failing with its description when it
/// cannot start or exits non-zero.
pub fn run(cmd: &mut Command) -> Result<()> {
    let shown = describe(cmd);
    eprintln!("xtask: $ {shown}");
    let status = cmd
        .status()
        .with_context(|| format!("could not start `{shown}`"))?;
    if !status.success() {
        bail!("`{shown}` failed ({status})");
    }
    Ok(())
}

/// Runs a command and returns its standard output as text.
pub fn output(cmd: &mut Command) -> Result<String> {
    let shown = describe(cmd);
    let out = cmd
        .output()
        .with_context(|| format!("could not start `{shown}`"))?;
    if !out.status.success() {
        bail!(
            "`{shown}` failed ({}): {}",
            out.status,
            String::from_utf8_lossy(&out.stderr).trim()
        );
    }
    Ok(String::from_utf8_lossy(&out.stdout).into_owned())
}

/// True when `program` can be found on PATH.
pub fn on_path(program: &str) -> bool {
    std::env::var_os("PATH")
        .map(|paths| std::env::split_paths(&paths).any(|dir| dir.join(program).is_file()))
        .unwrap_or(false)
}

/// True when this process runs as root (uid 0), read from /proc.
pub fn is_root() -> bool {
    std::fs::read_to_string("/proc/self/status")
        .ok()
        .and_then(|s| {
            s.lines()
                .find(|l| l.starts_with("Uid:"))
                .and_then(|l| l.split_whitespace().nth(1).map(|u| u == "0"))
        })
        .unwrap_or(false)
}

fn describe(cmd: &Command) -> String {
    let mut s = cmd.get_program().to_string_lossy().into_owned();
    for a in cmd.get_args() {
        s.push(' ');
        s.push_str(&a.to_string_lossy());
    }
    s
}

/// Every file under `dir`, as paths relative to `dir` with `/`
/// separators, sorted.
pub fn files_under(dir: &Path) -> Result<Vec<String>> {
    fn walk(base: &Path, dir: &Path, out: &mut Vec<String>) -> Result<()> {
        for entry in std::fs::read_dir(dir).with_context(|| format!("reading {}", dir.display()))? {
            let entry = entry?;
            let path = entry.path();
            if entry.file_type()?.is_dir() {
                walk(base, &path, out)?;
            } else {
                let rel = path.strip_prefix(base).unwrap_or(&path);
                let parts: Vec<String> = rel
                    .components()
                    .map(|c| c.as_os_str().to_string_lossy().into_owned())
                    .collect();
                out.push(parts.join("/"));
            }
        }
        Ok(())
    }
    let mut out = Vec::new();
    walk(dir, dir, &mut out)?;
    out.sort();
    Ok(out)
}

/// Reads `--name VALUE` or `--name=VALUE` from `args`.
pub fn flag_value(args: &[String], name: &str) -> Result<Option<String>> {
    let prefix = format!("{name}=");
    let mut iter = args.iter();
    while let Some(a) = iter.next() {
        if a == name {
            return match iter.next() {
                Some(v) => Ok(Some(v.clone())),
                None => bail!("{name} needs a value"),
            };
        }
        if let Some(v) = a.strip_prefix(&prefix) {
            return Ok(Some(v.to_string()));
        }
    }
    Ok(None)
}

/// Fails on any argument not in `known` (flags with values are listed
/// once; their values are skipped).
pub fn check_args(args: &[String], with_value: &[&str], bare: &[&str]) -> Result<()> {
    let mut iter = args.iter();
    while let Some(a) = iter.next() {
        let name = a.split('=').next().unwrap_or(a);
        if with_value.contains(&name) {
            if !a.contains('=') {
                iter.next();
            }
        } else if !bare.contains(&a.as_str()) {
            bail!("unknown option {a:?}");
        }
    }
    Ok(())
}
