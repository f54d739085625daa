//! `cargo xtask browser-test [--only NAME]`: runs the browser tests in
//! `tests/browser/` against a fresh build of the app.
//!
//! It makes sure Chromium (Debian's `/usr/bin/chromium`) and the node
//! packages are installed, builds the app into a directory of this run's
//! own (so a `cargo xtask dist` at the same time cannot disturb it) and the
//! `strutline` command line (the tests compare the page with it), serves
//! the build from a thread on a free 127.0.0.1 port and runs
//! `node tests/browser/run.mjs --url ... --dist ...`. It fails when a test
//! fails or, after the tests, when the build is over the size budget. It
//! never downloads a browser: playwright-core drives the system one.

use std::path::{Path, PathBuf};
use std::process::Command;

use anyhow::{bail, Result};

use crate::{dist, serve, util};

/// The browser the tests drive.
pub const CHROMIUM: &str = "/usr/bin/chromium";

/// `cargo xtask browser-test [--only NAME] [--no-wasm-opt]`.
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &["--only"], &["--no-wasm-opt"])?;
    let only = util::flag_value(args, "--only")?;
    let prepared = prepare(!args.iter().any(|a| a == "--no-wasm-opt"))?;
    let built = &prepared.built;
    // The tests compare the page with the command line; build it first so
    // each comparison is a quick `cargo run`. A failed build is left for
    // those tests to report, so the others still run.
    if let Err(e) =
        util::run(util::cargo().args(["build", "--release", "-q", "--bin", "strutline"]))
    {
        eprintln!("xtask: WARNING: the command line did not build ({e:#}); the tests that compare with it will fail");
    }
    let server = serve::Server::start(&built.dir, 0)?;
    let url = format!("http://127.0.0.1:{}/", server.port());
    println!("xtask: serving dist/ at {url} for the browser tests");
    let mut cmd = node_script("run.mjs", &url);
    // The update test rewrites sw.js in this run's own build directory;
    // the first-visit test holds what the browser loaded to the budget.
    cmd.arg("--dist")
        .arg(&built.dir)
        .args(["--budget", &dist::BUDGET_BYTES.to_string()]);
    if let Some(name) = &only {
        cmd.args(["--only", name]);
    }
    let mut result = util::run(&mut cmd);
    if only.is_none() {
        // The exchange of member lists: export, import, refusals.
        let exchange = util::run(&mut node_script("exchange.mjs", &url));
        // The unit switch and the printed calc sheet.
        let records = util::run(&mut node_script("records.mjs", &url));
        result = result.and(exchange).and(records);
    }
    server.stop();
    result?;
    // The tests ran on the build either way; over the budget still fails.
    dist::check_budget(built)
}

/// Installs what the browser scripts need and builds the app into a
/// directory of this run's own (`<target>/xtask-browser-dist-<pid>/`,
/// removed when the returned value drops), so that a `cargo xtask dist`
/// run at the same time cannot pull files from under the tests.
pub fn prepare(use_wasm_opt: bool) -> Result<Prepared> {
    ensure_chromium()?;
    ensure_node_modules()?;
    let dir = util::target_dir()?.join(format!("xtask-browser-dist-{}", std::process::id()));
    let built = match dist::build_into(&dir, use_wasm_opt) {
        Ok(b) => b,
        Err(e) => {
            let _ = std::fs::remove_dir_all(&dir);
            return Err(e);
        }
    };
    dist::report(&built);
    if let Err(e) = dist::check_budget(&built) {
        eprintln!(
            "xtask: WARNING: {e:#} (the browser run goes on; `cargo xtask dist` fails on it)"
        );
    }
    Ok(Prepared { built })
}

/// A build in a private directory, removed on drop.
pub struct Prepared {
    /// What was built.
    pub built: dist::Built,
}

impl Drop for Prepared {
    fn drop(&mut self) {
        let _ = std::fs::remove_dir_all(&self.built.dir);
    }
}

/// The directory of the node project.
pub fn tests_dir() -> PathBuf {
    util::root().join("tests").join("browser")
}

/// `node tests/browser/<script> --url <url>` run from the workspace root.
pub fn node_script(script: &str, url: &str) -> Command {
    let mut cmd = Command::new("node");
    cmd.current_dir(util::root())
        .arg(tests_dir().join(script))
        .args(["--url", url])
        .env("STRUTLINE_CHROMIUM", CHROMIUM)
        .env("STRUTLINE_ROOT", util::root());
    if let Some(cargo) = std::env::var_os("CARGO") {
        cmd.env("STRUTLINE_CARGO", cargo);
    }
    cmd
}

/// Installs Debian's Chromium when it is missing and we are root.
fn ensure_chromium() -> Result<()> {
    if Path::new(CHROMIUM).is_file() {
        return Ok(());
    }
    if !util::is_root() {
        bail!("{CHROMIUM} is missing; install Debian's `chromium` package (needs root)");
    }
    eprintln!("xtask: {CHROMIUM} is missing; installing Debian's chromium");
    util::run(Command::new("apt-get").arg("update"))?;
    util::run(
        Command::new("apt-get")
            .args([
                "install",
                "-y",
                "--no-install-recommends",
                "chromium",
                "chromium-driver",
            ])
            .env("DEBIAN_FRONTEND", "noninteractive"),
    )?;
    if !Path::new(CHROMIUM).is_file() {
        bail!("installing chromium left no {CHROMIUM}");
    }
    Ok(())
}

/// Runs `npm ci` (or `npm install` when that fails) in tests/browser when
/// playwright-core or axe-core is not installed there (the build's own
/// tools are installed by `dist`, from `xtask/tools`).
fn ensure_node_modules() -> Result<()> {
    let dir = tests_dir();
    let modules = dir.join("node_modules");
    if ["playwright-core", "axe-core"]
        .iter()
        .all(|m| modules.join(m).is_dir())
    {
        return Ok(());
    }
    if !util::on_path("node") || !util::on_path("npm") {
        bail!("node and npm are needed for the browser tests (Debian: apt-get install nodejs npm)");
    }
    let npm = |sub: &str| {
        let mut c = Command::new("npm");
        c.current_dir(&dir)
            .args([sub, "--no-audit", "--no-fund"])
            // playwright-core downloads nothing itself; make sure of it.
            .env("PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD", "1");
        c
    };
    if util::run(&mut npm("ci")).is_err() {
        eprintln!("xtask: npm ci failed; trying npm install");
        util::run(&mut npm("install"))?;
    }
    Ok(())
}
