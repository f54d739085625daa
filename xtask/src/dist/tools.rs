//! The build's own tools: binaryen's `wasm-opt` and `terser`, from the npm
//! registry at the versions pinned by `xtask/tools/package.json` and its
//! `package-lock.json`.
//!
//! They are installed with `npm ci` into `xtask/tools/node_modules/`
//! (git-ignored) when they are missing or were installed from another lock
//! (a stamp in that folder holds the SHA-256 of the lock it was installed
//! from), and `wasm-opt --version` must name the pinned binaryen release.
//! The npm binaryen is used, not a system one: Debian's binaryen 108 moves
//! the export of wasm-bindgen's externref table onto the function table
//! and the page then fails to start. Node.js and npm are the machine's
//! (installed from Debian when missing and we are root).

use std::path::{Path, PathBuf};
use std::process::Command;

use anyhow::{bail, Context, Result};
use sha2::{Digest, Sha256};

use crate::util;

/// The installed tools.
#[derive(Debug, Clone)]
pub struct Tools {
    /// binaryen's `wasm-opt`.
    pub wasm_opt: PathBuf,
    /// `terser`.
    pub terser: PathBuf,
}

/// The node project of the build's tools.
fn project() -> PathBuf {
    util::root().join("xtask").join("tools")
}

/// The file in `node_modules/` that records which lock was installed.
const STAMP: &str = ".strutline-lock-sha256";

/// Makes sure the pinned tools are installed and returns their paths.
pub fn ensure() -> Result<Tools> {
    let dir = project();
    let lock = std::fs::read(dir.join("package-lock.json"))
        .with_context(|| format!("reading {}", dir.join("package-lock.json").display()))?;
    let want = hex(&Sha256::digest(&lock));
    let modules = dir.join("node_modules");
    let bin = modules.join(".bin");
    let tools = Tools {
        wasm_opt: bin.join("wasm-opt"),
        terser: bin.join("terser"),
    };
    let stamp = std::fs::read_to_string(modules.join(STAMP)).unwrap_or_default();
    let installed = stamp.trim() == want && tools.wasm_opt.is_file() && tools.terser.is_file();
    ensure_node()?;
    if !installed {
        eprintln!("xtask: installing the build's tools (npm ci in xtask/tools)");
        util::run(
            Command::new("npm")
                .current_dir(&dir)
                .args(["ci", "--no-audit", "--no-fund"]),
        )
        .context("installing the build's tools (wasm-opt, terser) with npm ci in xtask/tools")?;
        for tool in [&tools.wasm_opt, &tools.terser] {
            if !tool.is_file() {
                bail!("npm ci in xtask/tools left no {}", tool.display());
            }
        }
        std::fs::write(modules.join(STAMP), format!("{want}\n"))?;
    }
    check_binaryen(&dir, &tools.wasm_opt)?;
    Ok(tools)
}

/// Fails unless `wasm-opt --version` names the binaryen release that the
/// lock pins (npm's binaryen 132.0.0 prints "wasm-opt version 132 ...").
fn check_binaryen(dir: &Path, wasm_opt: &Path) -> Result<()> {
    let pinned = pinned_version(&std::fs::read_to_string(dir.join("package-lock.json"))?)?;
    let major = pinned.split('.').next().unwrap_or(&pinned).to_string();
    let said = util::output(Command::new(wasm_opt).arg("--version"))?;
    if !said.contains(&format!("version {major}")) {
        bail!(
            "{} says {:?}, but the lock pins binaryen {pinned}; delete xtask/tools/node_modules and retry",
            wasm_opt.display(),
            said.trim()
        );
    }
    Ok(())
}

/// The binaryen version a package-lock.json pins.
fn pinned_version(lock: &str) -> Result<String> {
    let lock: serde_json::Value =
        serde_json::from_str(lock).context("reading package-lock.json")?;
    lock.pointer("/packages/node_modules~1binaryen/version")
        .and_then(|v| v.as_str())
        .map(str::to_string)
        .ok_or_else(|| anyhow::anyhow!("package-lock.json pins no binaryen"))
}

/// Node.js and npm, installed from Debian when missing and we are root.
fn ensure_node() -> Result<()> {
    if util::on_path("node") && util::on_path("npm") {
        return Ok(());
    }
    if !util::is_root() {
        bail!(
            "the build needs Node.js and npm to install its tools (wasm-opt, terser); \
             install them (Debian: apt-get install nodejs npm)"
        );
    }
    eprintln!("xtask: node or npm is missing; installing Debian's nodejs and npm");
    util::run(Command::new("apt-get").arg("update"))?;
    util::run(
        Command::new("apt-get")
            .args(["install", "-y", "--no-install-recommends", "nodejs", "npm"])
            .env("DEBIAN_FRONTEND", "noninteractive"),
    )?;
    if !util::on_path("node") || !util::on_path("npm") {
        bail!("installing nodejs and npm left no node or npm on PATH");
    }
    Ok(())
}

fn hex(bytes: &[u8]) -> String {
    bytes.iter().map(|b| format!("{b:02x}")).collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_lock_pins_binaryen_132() {
        let lock = std::fs::read_to_string(project().join("package-lock.json")).unwrap();
        assert_eq!(pinned_version(&lock).unwrap(), "132.0.0");
        assert!(pinned_version("{\"packages\": {}}").is_err());
    }
}
