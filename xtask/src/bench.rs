//! `cargo xtask bench`: the engine benchmarks (Criterion: member checks a
//! second, sizing, the buckling analysis) and the browser measurements (`bench-web`), written
//! with a description of the machine to `bench/RESULTS.md`, and compared
//! with the figures recorded in `bench/baseline.json`.
//!
//! Timings on a shared machine are noisy, so a figure that has fallen is
//! reported plainly rather than failing the run; the size budget of
//! `dist/` is the one hard limit, and `dist` enforces it.

use std::fmt::Write as _;
use std::path::Path;

use anyhow::{Context, Result};
use serde_json::Value;

use crate::util;

/// A benchmark figure: name, value, unit, whether larger is better, and target.
struct Figure {
    name: &'static str,
    value: f64,
    unit: &'static str,
    higher_is_better: bool,
    target: f64,
}

/// Runs the benchmarks and writes the results file.
pub fn run(args: &[String]) -> Result<()> {
    util::check_args(args, &[], &["--no-browser"])?;
    let browser = !args.iter().any(|a| a == "--no-browser");
    let root = util::root();
    let mut figures = Vec::new();
    let load_at_start = load_average();

    util::run(util::cargo().args([
        "bench",
        "-p",
        "strutline-core",
        "--bench",
        "check",
        "--",
        "--noplot",
    ]))?;
    let ns = criterion_mean_ns(&root.join("target/criterion/check/10k_mixed_members"))?;
    figures.push(Figure {
        name: "member checks per second (10,000 mixed members, one core)",
        value: 10_000.0 / (ns * 1e-9),
        unit: "checks/s",
        higher_is_better: true,
        target: 2_000_000.0,
    });
    // Issue 19: a check without its working (batch summaries, sizing
    // candidates, envelope samples) at 10 M a second on one core; from the
    // member as written (section built, material resolved each time), and
    // from members prepared once (a list re-check, repeated checks).
    for (dir, name) in [
        (
            "10k_mixed_members_without_working",
            "the same without working (from the member as written)",
        ),
        (
            "10k_mixed_members_prepared_without_working",
            "the same without working, members prepared once (section, material)",
        ),
        // The batch form: one check::Scratch reused from member to member,
        // no result allocated (sizing and the envelope check this way).
        (
            "10k_mixed_members_brief",
            "the same without working, through one reused Scratch (from the member as written)",
        ),
        (
            "10k_mixed_members_prepared_brief",
            "the same without working, through one reused Scratch, members prepared once",
        ),
    ] {
        let ns = criterion_mean_ns(&root.join("target/criterion/check").join(dir))?;
        figures.push(Figure {
            name,
            value: 10_000.0 / (ns * 1e-9),
            unit: "checks/s",
            higher_is_better: true,
            target: 10_000_000.0,
        });
    }

    // Issue 17 (a beam-column check: every equation, both axes, LTB) and
    // issue 16 (a member check with moments): a million a second, one core.
    // Same run of the check bench as above.
    for (path, name) in [
        (
            "beam_columns/10k_working_kept",
            "beam-column checks per second (10,000: every interaction equation, both axes, LTB; one core)",
        ),
        (
            "beam_columns/10k_without_working",
            "beam-column checks per second, without working (one core)",
        ),
        (
            "bending_only/10k_working_kept",
            "bending-only checks per second (10,000 members with moments, no axial load; one core)",
        ),
        (
            "bending_only/10k_without_working",
            "bending-only checks per second, without working (one core)",
        ),
    ] {
        let ns = criterion_mean_ns(&root.join("target/criterion").join(path))?;
        figures.push(Figure {
            name,
            value: 10_000.0 / (ns * 1e-9),
            unit: "checks/s",
            higher_is_better: true,
            target: 1_000_000.0,
        });
    }

    if root.join("core/benches/sizing.rs").exists() {
        util::run(util::cargo().args([
            "bench",
            "-p",
            "strutline-core",
            "--bench",
            "sizing",
            "--",
            "--noplot",
        ]))?;
        if let Some(dir) = first_estimate_dir(&root.join("target/criterion"), "sizing") {
            let ns = criterion_mean_ns(&dir)?;
            figures.push(Figure {
                name: "sizing 1,000 members against a 300-section series (native)",
                value: ns * 1e-6,
                unit: "ms",
                higher_is_better: false,
                target: 100.0,
            });
        }
        if let Some(dir) = first_estimate_dir(&root.join("target/criterion"), "sizing-beam-columns")
        {
            let ns = criterion_mean_ns(&dir)?;
            figures.push(Figure {
                name: "sizing 1,000 beam-columns against a 300-section series (native)",
                value: ns * 1e-6,
                unit: "ms",
                higher_is_better: false,
                target: 100.0,
            });
        }
    }

    if root.join("core/benches/buckling.rs").exists() {
        util::run(util::cargo().args([
            "bench",
            "-p",
            "strutline-core",
            "--bench",
            "buckling",
            "--",
            "--noplot",
        ]))?;
        let criterion = root.join("target/criterion/buckling");
        let ns = criterion_mean_ns(&criterion.join("200_elements_banded"))?;
        figures.push(Figure {
            name: "buckling analysis, 200 elements: alpha_cr and mode (native)",
            value: ns * 1e-6,
            unit: "ms",
            higher_is_better: false,
            target: 5.0,
        });
        // For the record of the banded solver's reason: the dense
        // eigenvalues of the same matrices (no target of its own).
        let ns = criterion_mean_ns(&criterion.join("200_elements_dense_nalgebra"))?;
        figures.push(Figure {
            name: "the same, alpha_cr alone by a dense nalgebra eigen-solution (for comparison)",
            value: ns * 1e-6,
            unit: "ms",
            higher_is_better: false,
            target: f64::INFINITY,
        });
    }

    let load_at_end = load_average();
    if browser {
        crate::bench_web::run(&[])?;
    }
    // With --no-browser, the browser figures of the last `bench-web` run
    // (bench/web.md says when and at which load they were measured).
    let web = std::fs::read_to_string(root.join("bench/web.md")).unwrap_or_default();

    let baseline: Value = std::fs::read_to_string(root.join("bench/baseline.json"))
        .ok()
        .and_then(|t| serde_json::from_str(&t).ok())
        .unwrap_or(Value::Null);

    let mut out = String::new();
    writeln!(out, "# Strutline benchmark results\n")?;
    writeln!(
        out,
        "Written by `cargo xtask bench` (reproduce with that command from the repository root).\n"
    )?;
    writeln!(
        out,
        "## Machine\n\n{}\n- load average (1, 5, 15 min) at the start of the engine benchmarks: \
         {load_at_start}; at their end: {load_at_end} (the machine is shared: Criterion's times \
         move with the load)\n",
        machine()
    )?;
    writeln!(out, "## Engine\n")?;
    writeln!(out, "| figure | value | target | recorded | verdict |")?;
    writeln!(out, "|---|---|---|---|---|")?;
    for f in &figures {
        let recorded = baseline.get(f.name).and_then(Value::as_f64);
        let meets = if f.higher_is_better {
            f.value >= f.target
        } else {
            f.value <= f.target
        };
        let fallen = recorded.is_some_and(|r| {
            if f.higher_is_better {
                f.value < 0.8 * r
            } else {
                f.value > 1.25 * r
            }
        });
        let verdict = match (meets, fallen) {
            (true, false) => "meets target",
            (true, true) => "meets target, but FALLEN more than 20% from the recorded figure",
            (false, false) => "MISSES target",
            (false, true) => "MISSES target and FALLEN from the recorded figure",
        };
        if fallen {
            eprintln!(
                "xtask bench: {} has fallen: {:.3} {} (recorded {:.3})",
                f.name,
                f.value,
                f.unit,
                recorded.unwrap_or(0.0)
            );
        }
        writeln!(
            out,
            "| {} | {:.3} {} | {} {} | {} | {} |",
            f.name,
            f.value,
            f.unit,
            if f.higher_is_better { ">=" } else { "<=" },
            f.target,
            recorded.map_or("none".to_string(), |r| format!("{r:.3}")),
            verdict
        )?;
    }
    if !web.is_empty() {
        let source = if browser {
            ""
        } else {
            "(not measured by this run, `--no-browser`: the last `cargo xtask bench-web`'s figures)\n\n"
        };
        writeln!(out, "\n## Browser\n\n{source}{web}")?;
    }
    std::fs::create_dir_all(root.join("bench"))?;
    std::fs::write(root.join("bench/RESULTS.md"), &out)?;
    print!("{out}");
    Ok(())
}

fn criterion_mean_ns(dir: &Path) -> Result<f64> {
    let path = dir.join("new/estimates.json");
    let text =
        std::fs::read_to_string(&path).with_context(|| format!("reading {}", path.display()))?;
    let v: Value = serde_json::from_str(&text)?;
    v.pointer("/mean/point_estimate")
        .and_then(Value::as_f64)
        .with_context(|| format!("no mean in {}", path.display()))
}

/// The first benchmark directory under `criterion/<group>/` that has estimates.
fn first_estimate_dir(criterion: &Path, group: &str) -> Option<std::path::PathBuf> {
    let dir = criterion.join(group);
    let mut entries: Vec<_> = std::fs::read_dir(&dir)
        .ok()?
        .flatten()
        .map(|e| e.path())
        .collect();
    entries.sort();
    entries
        .into_iter()
        .find(|p| p.join("new/estimates.json").exists())
}

/// A description of this machine: CPU model, cores, memory, toolchain.
/// The load average of the last 1, 5 and 15 minutes, as /proc/loadavg gives it.
fn load_average() -> String {
    std::fs::read_to_string("/proc/loadavg")
        .ok()
        .map(|t| t.split_whitespace().take(3).collect::<Vec<_>>().join(", "))
        .unwrap_or_else(|| "unknown".into())
}

pub fn machine() -> String {
    let cpu = std::fs::read_to_string("/proc/cpuinfo")
        .ok()
        .and_then(|t| {
            t.lines()
                .find(|l| l.starts_with("model name"))
                .and_then(|l| l.split(':').nth(1))
                .map(|s| s.trim().to_string())
        })
        .unwrap_or_else(|| "unknown CPU".into());
    let cores = std::thread::available_parallelism().map_or(0, usize::from);
    let mem = std::fs::read_to_string("/proc/meminfo")
        .ok()
        .and_then(|t| {
            t.lines()
                .find(|l| l.starts_with("MemTotal"))
                .map(|l| l.trim_start_matches("MemTotal:").trim().to_string())
        })
        .unwrap_or_default();
    let rustc = util::output(std::process::Command::new("rustc").arg("-V")).unwrap_or_default();
    format!(
        "- CPU: {cpu}\n- cores available: {cores}\n- memory: {mem}\n- toolchain: {}",
        rustc.trim()
    )
}
