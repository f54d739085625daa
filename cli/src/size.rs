//! `strutline size FILE --series NAME [--family i|rhs|chs] [--limit U]
//! [--json]`: for every member of a member file, the lightest section of
//! the series whose utilisation with the member's own method is at most
//! the limit (default 1.0), and the next lighter section with why it fails,
//! then the caution (a `"caution"` key with `--json`), as `check` gives it.
//!
//! Exit status 0 when every member was sized (whether or not a section
//! was found); 2 for a file that cannot be read or a wrong command line.

use serde_json::{json, Value};

use crate::sections::put;
use strutline_core::sizing::{Refusal, Rejected, Sizer, SizingResult};
use strutline_core::CAUTION;

/// `strutline size`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file (.json or .csv)
    #[arg(value_name = "FILE")]
    pub path: String,
    #[command(flatten)]
    pub candidates: crate::sections::Candidates,
    /// The largest utilisation a proposal may have
    #[arg(long, value_name = "U", default_value_t = 1.0, value_parser = crate::positive, allow_negative_numbers = true)]
    pub limit: f64,
    /// Write the proposals as JSON instead of a table
    #[arg(long)]
    pub json: bool,
}

fn rejected_json(r: &Rejected<'_>) -> Value {
    match &r.why {
        Refusal::Exceeds {
            utilisation,
            governing_check,
            ..
        } => json!({
            "designation": r.entry.designation,
            "mass_kg_per_m": r.entry.mass_kg_per_m,
            "utilisation": utilisation,
            "governing": governing_check,
        }),
        Refusal::Error(e) => json!({
            "designation": r.entry.designation,
            "mass_kg_per_m": r.entry.mass_kg_per_m,
            "error": e.to_string(),
        }),
    }
}

fn result_json(r: &SizingResult<'_>) -> Value {
    let mut v = json!({
        "id": r.member_id,
        "checked": r.checked,
        "designation": Value::Null,
        "next_lighter": r.next_lighter.as_ref().map_or(Value::Null, rejected_json),
    });
    if let Some(c) = &r.chosen {
        put(&mut v, "designation", json!(c.entry.designation));
        put(&mut v, "mass_kg_per_m", json!(c.entry.mass_kg_per_m));
        put(&mut v, "utilisation", json!(c.utilisation));
        put(&mut v, "governing", json!(c.governing_check));
    }
    if let Some(p) = &r.problem {
        put(&mut v, "problem", json!(p.to_string()));
    }
    v
}

fn why(r: &Rejected<'_>) -> String {
    match &r.why {
        Refusal::Exceeds {
            utilisation,
            governing_check,
            ..
        } => format!(
            "{} ({:.1} kg/m) at {utilisation:.3}, {governing_check}",
            r.entry.designation, r.entry.mass_kg_per_m,
        ),
        Refusal::Error(e) => format!("{} refused: {e}", r.entry.designation),
    }
}

fn table(results: &[SizingResult<'_>]) -> String {
    let id_w = results
        .iter()
        .map(|r| r.member_id.chars().count())
        .max()
        .unwrap_or(0)
        .max("member".len());
    let name_w = results
        .iter()
        .filter_map(|r| r.chosen.as_ref().map(|c| c.entry.designation.len()))
        .max()
        .unwrap_or(0)
        .max("proposal".len());
    let mut out = format!(
        "{:<id_w$}  {:<name_w$}  {:>7}  {:>11}  {:<18}  next lighter\n",
        "member", "proposal", "kg/m", "utilisation", "governing"
    );
    for r in results {
        if let Some(p) = &r.problem {
            out.push_str(&format!("{:<id_w$}  not sized: {p}\n", r.member_id));
            continue;
        }
        let next = r.next_lighter.as_ref().map_or_else(|| "-".to_string(), why);
        match &r.chosen {
            Some(c) => out.push_str(&format!(
                "{:<id_w$}  {:<name_w$}  {:>7.1}  {:>11.3}  {:<18}  {next}\n",
                r.member_id,
                c.entry.designation,
                c.entry.mass_kg_per_m,
                c.utilisation,
                c.governing_check
            )),
            None => out.push_str(&format!(
                "{:<id_w$}  {:<name_w$}  {:>7}  {:>11}  {:<18}  heaviest: {next}\n",
                r.member_id, "none", "-", "-", "-"
            )),
        }
    }
    out
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let (path, limit, json_out) = (&args.path, args.limit, args.json);
    let (series, family) = (
        args.candidates.series.as_deref(),
        args.candidates.family.as_deref(),
    );
    if series.is_none() && family.is_none() {
        return Err(format!(
            "size: name the candidates with --series NAME (or --family i|rhs|chs); known series: {}",
            crate::sections::known_series()
        ));
    }
    let selection = match crate::sections::select(series, family) {
        Ok(s) => s,
        Err(message) => {
            crate::note(&format!("strutline: {message}"));
            return Ok(2);
        }
    };
    let file = crate::read_members(path)?;
    let sizer = Sizer::new(&selection.entries);
    let results = sizer.size_all(&file.members, limit);
    if json_out {
        let doc = json!({
            "series": selection.label,
            "limit": limit,
            "candidates": sizer.len(),
            "proposals": results.iter().map(result_json).collect::<Vec<_>>(),
            "caution": CAUTION,
        });
        let mut text = serde_json::to_string_pretty(&doc).map_err(|e| e.to_string())?;
        text.push('\n');
        crate::emit(&text)?;
    } else {
        let text = format!(
            "{} members against {} ({} sections), utilisation limit {limit}\n{}\n{CAUTION}\n",
            results.len(),
            selection.label,
            sizer.len(),
            table(&results)
        );
        crate::emit(&text)?;
    }
    Ok(0)
}

#[cfg(test)]
mod tests {
    use super::*;
    use strutline_core::catalogue;

    const FILE: &str = r#"{"format": "strutline.members", "version": 1, "title": "Test shed",
      "members": [
        {"id": "P1", "section": {"kind": "catalogue", "designation": "HE 200 B"},
         "material": {"fy_mpa": 355, "e_mpa": 210000}, "length_mm": 4000, "axial_kn": 700,
         "method": "en1993-1-1"},
        {"id": "P2", "section": {"kind": "catalogue", "designation": "HE 200 B"},
         "material": {"fy_mpa": 355, "e_mpa": 210000}, "length_mm": 4000, "axial_kn": 1e6,
         "method": "en1993-1-1"}
      ]}"#;

    #[test]
    fn proposals_in_json_and_table() {
        let file = strutline_core::file::parse(FILE).unwrap();
        let heb: Vec<_> = catalogue::find_series("HE B")
            .unwrap()
            .entries()
            .iter()
            .collect();
        let results = Sizer::new(&heb).size_all(&file.members, 0.9);
        let p1 = result_json(&results[0]);
        assert_eq!(p1["id"], "P1");
        assert!(p1["utilisation"].as_f64().unwrap() <= 0.9);
        let next = &p1["next_lighter"];
        assert!(next["utilisation"].as_f64().unwrap() > 0.9, "{p1}");
        let p2 = result_json(&results[1]);
        assert!(p2["designation"].is_null());
        assert_eq!(p2["next_lighter"]["designation"], "HE 1000 B");
        let text = table(&results);
        assert!(text.lines().nth(2).unwrap().contains("none"), "{text}");
        assert!(text.contains(p1["designation"].as_str().unwrap()));
    }

    #[test]
    fn run_reads_a_file_and_checks_its_arguments() {
        let path = std::env::temp_dir().join(format!("strutline-size-{}.json", std::process::id()));
        std::fs::write(&path, FILE).unwrap();
        let p = path.to_str().unwrap();
        let args = |path: &str, series: Option<&str>, family: Option<&str>, json| Args {
            path: path.into(),
            candidates: crate::sections::Candidates {
                series: series.map(Into::into),
                family: family.map(Into::into),
            },
            limit: 0.9,
            json,
        };
        assert_eq!(run(&args(p, Some("heb"), None, false)), Ok(0));
        assert_eq!(run(&args(p, None, Some("i"), true)), Ok(0));
        assert_eq!(run(&args(p, Some("no such"), None, false)), Ok(2));
        assert!(run(&args(p, None, None, false)).is_err());
        assert!(run(&args("/nonexistent/members.json", Some("heb"), None, false)).is_err());
        std::fs::remove_file(&path).unwrap();
    }
}
