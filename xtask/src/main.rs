//! `cargo xtask`: the project's build tool.
//!
//! Subcommands:
//! - `dist` builds the web app into `dist/` (wasm, bindings, shell, worker);
//! - `serve [--port N]` builds and serves `dist/` on 127.0.0.1;
//! - `browser-test [--only NAME]` builds, serves and runs the browser tests;
//! - `bench-web` builds, serves and measures the app in the browser;
//! - `test` runs every check of the project; `bench` runs the native
//!   benchmarks and `bench-web`, writing `bench/`; `fuzz` runs the fuzz targets.

mod bench;
mod bench_web;
mod browser;
mod dist;
mod fuzz;
mod serve;
mod test;
mod util;

use anyhow::{bail, Result};

const USAGE: &str = "usage: cargo xtask <command> [options]

commands:
  dist                      build the web app into dist/ (fails over the size budget)
  serve [--port N]          build, then serve dist/ at http://127.0.0.1:N/ (default 8080)
  browser-test [--only T]   build, serve on a free port and run tests/browser (T: a test name)
  bench-web                 build, serve and measure the app in the browser; writes bench/web.md
  test                      the project's test suite
  bench                     the engine benchmarks
  fuzz [--seconds N]        fuzz the member-file readers for N seconds each (default 60)";

fn main() {
    let args: Vec<String> = std::env::args().skip(1).collect();
    if let Err(e) = dispatch(&args) {
        eprintln!("xtask: error: {e:#}");
        std::process::exit(1);
    }
}

fn dispatch(args: &[String]) -> Result<()> {
    let (command, rest) = match args.split_first() {
        Some((c, r)) => (c.as_str(), r),
        None => {
            println!("{USAGE}");
            return Ok(());
        }
    };
    match command {
        "dist" => dist::run(rest),
        "serve" => serve::run(rest),
        "browser-test" => browser::run(rest),
        "bench-web" => bench_web::run(rest),
        "test" => test::run(rest),
        "bench" => bench::run(rest),
        "fuzz" => fuzz::run(rest),
        "help" | "--help" | "-h" => {
            println!("{USAGE}");
            Ok(())
        }
        other => bail!("unknown command {other:?}\n\n{USAGE}"),
    }
}
