//! `cargo xtask bench-web`: measures the web app in headless Chromium.
//!
//! Builds `dist/`, serves it on a free 127.0.0.1 port and runs
//! `tests/browser/bench.mjs`, which measures first render, the per-edit
//! recheck and redraw, and loading a 1,000-member list, and writes them
//! with the machine description and the gzipped dist size to
//! `bench/web.md` and `bench/web.json`.

use anyhow::Result;

use crate::{browser, dist, serve, util};

/// `cargo xtask bench-web [--no-wasm-opt]`.
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &[], &["--no-wasm-opt"])?;
    let prepared = browser::prepare(!args.iter().any(|a| a == "--no-wasm-opt"))?;
    let built = &prepared.built;
    let server = serve::Server::start(&built.dir, 0)?;
    let url = format!("http://127.0.0.1:{}/", server.port());
    let out_dir = util::root().join("bench");
    std::fs::create_dir_all(&out_dir)?;
    let mut cmd = browser::node_script("bench.mjs", &url);
    cmd.args([
        "--dist-zlib",
        &built.zlib_total.to_string(),
        "--dist-budget",
        &dist::BUDGET_BYTES.to_string(),
        "--dist-sent",
        &built.sent_total.to_string(),
        "--cache-name",
        &built.cache_name,
        "--out",
    ])
    .arg(&out_dir);
    let result = util::run(&mut cmd);
    server.stop();
    result?;
    println!("xtask: wrote bench/web.md and bench/web.json");
    Ok(())
}
