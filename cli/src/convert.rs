//! `strutline convert IN OUT [--take-valid] [--units si|us]`: converts a
//! member file between JSON and CSV, choosing each format by the file's
//! extension (`.json` or `.csv`; an input of another extension is
//! recognised by its content). `--units us` writes a CSV output with US
//! customary columns (`length_ft`, `depth_in`, `axial_kip`, `fy_ksi`, ...);
//! the default writes the member file's SI keys, which round-trip exactly.
//!
//! Exit status: 0 when every member was converted; 2 when the input has
//! problems, each printed on stderr with its line and column. Nothing is
//! written when there are problems, unless `--take-valid` is given: then
//! the valid members are written and the status is still 2, so scripts
//! notice the rows left out. The output is written to a temporary file
//! beside OUT and renamed into place, so OUT is never left half written.

use std::path::Path;

use strutline_core::csv::{self, Format};
use strutline_core::file;
use strutline_core::units::UnitSystem;

/// The units of a CSV output's columns.
#[derive(Debug, Clone, Copy, PartialEq, Eq, clap::ValueEnum)]
pub enum Units {
    /// The member file's SI keys (length_mm, axial_kn, ...), which round-trip exactly
    Si,
    /// US customary columns (length_ft, depth_in, axial_kip, fy_ksi, ...)
    Us,
}

/// `strutline convert`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file to read (.json or .csv; another extension is recognised by its content)
    #[arg(value_name = "IN")]
    pub input: String,
    /// The file to write; .json or .csv sets its format
    #[arg(value_name = "OUT")]
    pub output: String,
    /// Write the valid members even when some rows have problems (the exit status is still 2)
    #[arg(long)]
    pub take_valid: bool,
    /// The units of a CSV output's columns
    #[arg(long, value_enum, default_value_t = Units::Si)]
    pub units: Units,
}

fn output_format(path: &str) -> Result<Format, String> {
    let ext = Path::new(path)
        .extension()
        .and_then(|e| e.to_str())
        .map(str::to_ascii_lowercase);
    match ext.as_deref() {
        Some("json") => Ok(Format::Json),
        Some("csv") => Ok(Format::Csv),
        _ => Err(format!(
            "{path}: the output must end in .json or .csv, which sets its format"
        )),
    }
}

fn write_atomically(path: &str, text: &str) -> Result<(), String> {
    let target = Path::new(path);
    let name = target
        .file_name()
        .and_then(|n| n.to_str())
        .unwrap_or("members");
    let temp = target.with_file_name(format!(".{name}.strutline-tmp"));
    std::fs::write(&temp, text).map_err(|e| format!("{path}: cannot write: {e}"))?;
    std::fs::rename(&temp, target).map_err(|e| {
        let _ = std::fs::remove_file(&temp);
        format!("{path}: cannot write: {e}")
    })
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let (input, output, take_valid) = (args.input.as_str(), args.output.as_str(), args.take_valid);
    let system = match args.units {
        Units::Si => UnitSystem::Si,
        Units::Us => UnitSystem::Us,
    };
    let out_format = output_format(output)?;
    let text = std::fs::read_to_string(input).map_err(|e| format!("{input}: cannot read: {e}"))?;
    let (members, problems) = match csv::detect_format(input, &text) {
        Format::Json => match file::parse(&text) {
            Ok(f) => (f, Vec::new()),
            Err(e) => {
                crate::note(&format!("{input}: {e}\nnothing written"));
                return Ok(2);
            }
        },
        Format::Csv => {
            let (f, problems) = csv::read_csv_lenient(input, &text);
            (f, problems)
        }
    };
    for p in &problems {
        crate::note(&format!("{input}: {p}"));
    }
    if !problems.is_empty() && !take_valid {
        crate::note(&format!(
            "{input}: {} problem{}; nothing written (fix them, or give --take-valid to write the {} valid member{})",
            problems.len(),
            if problems.len() == 1 { "" } else { "s" },
            members.members.len(),
            if members.members.len() == 1 { "" } else { "s" },
        ));
        return Ok(2);
    }
    let body = match out_format {
        Format::Json => members.to_json(),
        Format::Csv => {
            if let Some(lost) = csv::left_out(&members) {
                crate::note(&format!("{output}: {lost}"));
            }
            csv::to_csv_in(&members, system)
        }
    };
    write_atomically(output, &body)?;
    crate::emit(&format!(
        "{output}: {} member{} written\n",
        members.members.len(),
        if members.members.len() == 1 { "" } else { "s" }
    ))?;
    Ok(if problems.is_empty() { 0 } else { 2 })
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;

    const GOOD: &str = "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\n\
                        P1,rect,100,50,235,210000,2000,10,euler\n";
    const BAD_ROW: &str = "P2,rect,100,,235,210000,2000,10,euler\n";

    fn dir(name: &str) -> std::path::PathBuf {
        let d =
            std::env::temp_dir().join(format!("strutline-convert-{name}-{}", std::process::id()));
        let _ = std::fs::remove_dir_all(&d);
        std::fs::create_dir_all(&d).unwrap();
        d
    }

    fn s(p: &std::path::Path) -> String {
        p.to_str().unwrap().to_string()
    }

    /// Runs `strutline convert ARGS` as parsed from a command line.
    fn run(args: &[String]) -> Result<i32, String> {
        let argv = std::iter::once("convert").chain(args.iter().map(String::as_str));
        let words: Vec<&str> = argv.collect();
        match crate::tests::parse(&words) {
            Ok(crate::Command::Convert(a)) => super::run(&a),
            Ok(other) => Err(format!("not convert: {other:?}")),
            Err(e) => Err(e.to_string()),
        }
    }

    #[test]
    fn csv_to_json_and_back() {
        let d = dir("round");
        let csv_in = d.join("in.csv");
        std::fs::write(&csv_in, GOOD).unwrap();
        let json = d.join("out.json");
        assert_eq!(run(&[s(&csv_in), s(&json)]).unwrap(), 0);
        let f = file::parse(&std::fs::read_to_string(&json).unwrap()).unwrap();
        assert_eq!(f.title, "in");
        assert_eq!(f.members[0].id, "P1");
        let csv_out = d.join("again.csv");
        assert_eq!(run(&[s(&json), s(&csv_out)]).unwrap(), 0);
        let again = csv::parse_csv(&std::fs::read_to_string(&csv_out).unwrap());
        assert_eq!(again.members, f.members);
        let _ = std::fs::remove_dir_all(&d);
    }

    #[test]
    fn problems_write_nothing_unless_take_valid() {
        let d = dir("problems");
        let csv_in = d.join("in.csv");
        std::fs::write(&csv_in, format!("{GOOD}{BAD_ROW}")).unwrap();
        let json = d.join("out.json");
        assert_eq!(run(&[s(&csv_in), s(&json)]).unwrap(), 2);
        assert!(!json.exists());
        assert_eq!(
            run(&[s(&csv_in), s(&json), "--take-valid".into()]).unwrap(),
            2
        );
        let f = file::parse(&std::fs::read_to_string(&json).unwrap()).unwrap();
        assert_eq!(f.members.len(), 1);
        let _ = std::fs::remove_dir_all(&d);
    }

    #[test]
    fn us_columns_on_request() {
        let d = dir("us");
        let csv_in = d.join("in.csv");
        std::fs::write(&csv_in, GOOD).unwrap();
        let out = d.join("us.csv");
        let args = [s(&csv_in), s(&out), "--units".into(), "us".into()];
        assert_eq!(run(&args).unwrap(), 0);
        let text = std::fs::read_to_string(&out).unwrap();
        assert!(
            text.starts_with("id,kind,depth_in,width_in,fy_ksi,e_ksi,method,length_ft,axial_kip"),
            "{text}"
        );
        let back = csv::parse_csv(&text);
        assert!(back.problems.is_empty());
        assert!((back.members[0].length_mm - 2000.0).abs() < 1e-9);
        assert!(run(&[s(&csv_in), s(&out), "--units".into(), "imperial".into()]).is_err());
        let _ = std::fs::remove_dir_all(&d);
    }

    #[test]
    fn usage_errors() {
        assert!(run(&[]).is_err());
        assert!(run(&["a.csv".into(), "b.txt".into()])
            .unwrap_err()
            .contains(".json or .csv"));
        assert!(run(&["a.csv".into(), "b.json".into(), "--bogus".into()]).is_err());
        assert!(run(&["/nonexistent/a.csv".into(), "b.json".into()])
            .unwrap_err()
            .contains("cannot read"));
        let broken = dir("broken").join("x.json");
        std::fs::write(&broken, "{").unwrap();
        assert_eq!(run(&[s(&broken), "y.csv".into()]).unwrap(), 2);
    }
}
