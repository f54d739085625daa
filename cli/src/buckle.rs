//! `strutline buckle FILE [--json]`: the elastic critical load analysis of
//! every member with a `buckling_model`, about both axes.

use strutline_core::buckling::column::Buckle;
use strutline_core::check::buckle::buckle_all;
use strutline_core::CAUTION;

/// `strutline buckle`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file (.json; the model is not carried by CSV)
    #[arg(value_name = "FILE")]
    pub path: String,
    /// Write the results as JSON (alpha_cr, N_cr, buckling length and the
    /// buckled shape of each axis) instead of a table
    #[arg(long)]
    pub json: bool,
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let path = &args.path;
    let file = crate::read_members(path)?;
    let report = buckle_all(&file.members).map_err(|e| format!("{path}: {e}"))?;
    if args.json {
        let out = serde_json::json!({ "results": report.results, "caution": CAUTION });
        let mut text = serde_json::to_string_pretty(&out).map_err(|e| e.to_string())?;
        text.push('\n');
        crate::emit(&text)?;
        return Ok(0);
    }
    let mut out = String::new();
    if !file.title.is_empty() {
        out.push_str(&file.title);
        out.push('\n');
    }
    if report.results.is_empty() {
        out.push_str("no member has a buckling_model\n");
    }
    out.push_str(&format!(
        "{:<10} {:<6} {:>10} {:>12} {:>12} {:>9}\n",
        "id", "axis", "alpha_cr", "N_cr kN", "L_cr mm", "elements"
    ));
    for r in &report.results {
        for (axis, b) in [("major", &r.major), ("minor", &r.minor)] {
            out.push_str(&row(&r.id, axis, b));
        }
    }
    out.push_str(CAUTION);
    out.push('\n');
    crate::emit(&out)?;
    Ok(0)
}

fn row(id: &str, axis: &str, b: &Buckle) -> String {
    format!(
        "{id:<10} {axis:<6} {:>10.4} {:>12.1} {:>12.0} {:>9}\n",
        b.load_factor, b.critical_kn, b.buckling_length_mm, b.elements
    )
}
