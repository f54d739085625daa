//! `strutline check FILE [--json]`: checks every member and prints a table
//! or JSON.

use strutline_core::check::{CheckResult, Prepared};
use strutline_core::CAUTION;

/// `strutline check`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file (.json, or .csv one member a row)
    #[arg(value_name = "FILE")]
    pub path: String,
    /// Write the results as JSON instead of a table
    #[arg(long)]
    pub json: bool,
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let json = args.json;
    let path = &args.path;
    let file = crate::read_members(path)?;
    let mut results = Vec::with_capacity(file.members.len());
    for member in &file.members {
        let result = Prepared::new(member)
            .and_then(|p| p.check())
            .map_err(|e| format!("{path}: {e}"))?;
        results.push(result);
    }
    let all_pass = results.iter().all(|r| r.passes);
    if json {
        let out = serde_json::json!({ "results": results, "caution": CAUTION });
        let mut text = serde_json::to_string_pretty(&out).map_err(|e| e.to_string())?;
        text.push('\n');
        crate::emit(&text)?;
    } else {
        crate::emit(&table(&file.title, &file.members, &results))?;
    }
    Ok(if all_pass { 0 } else { 1 })
}

fn table(title: &str, members: &[strutline_core::Member], results: &[CheckResult]) -> String {
    let mut rows: Vec<[String; 8]> = vec![[
        "id".into(),
        "section".into(),
        "method".into(),
        "N_Ed kN".into(),
        "N_Rd kN".into(),
        "util".into(),
        "governs".into(),
        "status".into(),
    ]];
    for (m, r) in members.iter().zip(results) {
        rows.push([
            r.id.clone(),
            m.section.describe(),
            r.method.key().to_string(),
            format!("{:.1}", m.axial_kn),
            format!("{:.1}", r.resistance_kn),
            format!("{:.3}", r.utilisation),
            r.governing_check.to_string(),
            if r.passes { "ok".into() } else { "OVER".into() },
        ]);
    }
    let mut widths = [0usize; 8];
    for row in &rows {
        for (w, cell) in widths.iter_mut().zip(row.iter()) {
            *w = (*w).max(cell.chars().count());
        }
    }
    let mut out = String::new();
    if !title.is_empty() {
        out.push_str(title);
        out.push('\n');
    }
    for row in &rows {
        let mut line = String::new();
        for (i, (cell, w)) in row.iter().zip(widths.iter()).enumerate() {
            let pad = w.saturating_sub(cell.chars().count());
            // Numbers right-aligned, text left-aligned.
            if (3..=5).contains(&i) {
                line.push_str(&" ".repeat(pad));
                line.push_str(cell);
            } else {
                line.push_str(cell);
                line.push_str(&" ".repeat(pad));
            }
            line.push_str("  ");
        }
        out.push_str(line.trim_end());
        out.push('\n');
    }
    for r in results {
        for w in &r.warnings {
            out.push_str(&format!("warning {}: {}\n", r.id, w.message));
        }
    }
    out.push_str(&format!("\n{CAUTION}\n"));
    out
}
