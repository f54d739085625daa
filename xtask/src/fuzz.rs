//! `cargo xtask fuzz [--seconds N]`: runs the fuzz targets of `fuzz/`
//! (the JSON and the CSV member-file readers, each followed by the check
//! of every member they accept) for a bounded time each.
//!
//! cargo-fuzz drives libFuzzer, which needs unstable compiler flags; on the
//! project's stable toolchain they are enabled with `RUSTC_BOOTSTRAP=1`
//! for this command only; LeakSanitizer reads `fuzz/lsan.supp` (the
//! engine's interned texts, kept on purpose). cargo-fuzz is installed when missing. Anything
//! found is written by libFuzzer under `fuzz/artifacts/<target>/`; turn it
//! into a regression test in `core/tests/` before fixing it.

use anyhow::Result;

use crate::util;

/// The fuzz targets, with the seed folder of each.
const TARGETS: [&str; 3] = ["member_file", "member_csv", "member_stream"];

/// Runs each target for the given time.
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &["--seconds"], &[])?;
    let seconds: u64 = match util::flag_value(args, "--seconds")? {
        Some(v) => v
            .parse()
            .map_err(|_| anyhow::anyhow!("--seconds: expected a whole number, got {v:?}"))?,
        None => 60,
    };
    if !util::on_path("cargo-fuzz") {
        let home_bin = std::env::var_os("HOME")
            .map(|h| std::path::PathBuf::from(h).join(".cargo/bin/cargo-fuzz"));
        if !home_bin.is_some_and(|p| p.is_file()) {
            util::run(util::cargo().args(["install", "cargo-fuzz"]))?;
        }
    }
    let fuzz_dir = util::root().join("fuzz");
    for target in TARGETS {
        let corpus = fuzz_dir.join("corpus").join(target);
        std::fs::create_dir_all(&corpus)?;
        util::run(
            util::cargo()
                .current_dir(&fuzz_dir)
                .env("RUSTC_BOOTSTRAP", "1")
                // The engine's interned texts (trace::held) are kept for the
                // life of the program by design: suppressed, nothing else.
                .env(
                    "LSAN_OPTIONS",
                    format!("suppressions={}", fuzz_dir.join("lsan.supp").display()),
                )
                .args(["fuzz", "run", target])
                .arg(&corpus)
                .arg(fuzz_dir.join("seeds").join(target))
                .arg("--")
                .arg(format!("-max_total_time={seconds}")),
        )?;
    }
    eprintln!(
        "xtask fuzz: no crash in {} targets x {seconds} s",
        TARGETS.len()
    );
    Ok(())
}
