//! `strutline convert IN OUT [--take-valid] [--units si|us] [--accept-loss]`: converts a
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
//!
//! CSV cannot carry a member's structures (`buckling_model`): a list with
//! one is refused (status 2, each member and key named, nothing written)
//! unless `--accept-loss` is given; then the CSV is written without them
//! and each member and key left out is still named on stderr.
//!
//! A list is converted a block of members at a time ([`crate::input`]),
//! so memory does not grow with its length: the input is read twice, once
//! for its problems, its title and the CSV columns its members use, once
//! to write. A JSON file written whole stays the rule where streaming
//! cannot keep everything: JSON to JSON (the calc-sheet header, which the
//! streaming reader passes over) and a JSON file that lists its members
//! before its format and version (read whole by the input module).

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
    /// Write the CSV even though it cannot carry some members' keys (a
    /// buckling_model): they are left out, each named on stderr. Without
    /// it, such a list is refused and nothing is written
    #[arg(long)]
    pub accept_loss: bool,
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
    let temp = temp_beside(target);
    std::fs::write(&temp, text).map_err(|e| format!("{path}: cannot write: {e}"))?;
    std::fs::rename(&temp, target).map_err(|e| {
        let _ = std::fs::remove_file(&temp);
        format!("{path}: cannot write: {e}")
    })
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let (input, output) = (args.input.as_str(), args.output.as_str());
    let system = match args.units {
        Units::Si => UnitSystem::Si,
        Units::Us => UnitSystem::Us,
    };
    let out_format = output_format(output)?;
    if out_format == Format::Csv || crate::input::format_of(input)? == Format::Csv {
        return streamed(args, out_format, system);
    }
    whole(args, out_format, system)
}

/// Prints the input's problems; true when the conversion goes on.
fn report(input: &str, problems: &[String], valid: usize, take_valid: bool) -> bool {
    for p in problems {
        crate::note(&format!("{input}: {p}"));
    }
    if !problems.is_empty() && !take_valid {
        crate::note(&format!(
            "{input}: {} problem{}; nothing written (fix them, or give --take-valid to write the {} valid member{})",
            problems.len(),
            if problems.len() == 1 { "" } else { "s" },
            valid,
            if valid == 1 { "" } else { "s" },
        ));
        return false;
    }
    true
}

/// The conversion a block at a time ([module docs](self)).
fn streamed(args: &Args, out_format: Format, system: UnitSystem) -> Result<i32, String> {
    use crate::input::{members_with, OnProblems};
    use std::io::Write;
    let (input, output) = (args.input.as_str(), args.output.as_str());
    // First pass: problems, title, the keys the rows use, what CSV leaves out.
    let mut problems = Vec::new();
    let mut used: Vec<String> = Vec::new();
    let mut lost: Vec<String> = Vec::new();
    let read = members_with(input, OnProblems::Skip(&mut problems), |_, block| {
        if out_format == Format::Csv {
            for m in block.iter() {
                for key in csv::cells(m).keys() {
                    if !used.contains(key) {
                        used.push(key.clone());
                    }
                }
            }
            let list = file::MemberFile {
                members: std::mem::take(block),
                ..file::MemberFile::new("")
            };
            lost.extend(csv::uncarried(&list));
            *block = list.members;
        }
        Ok(())
    });
    let (title, count) = match read {
        Ok(read) => read,
        Err(e) => {
            crate::note(&format!("{e}\nnothing written"));
            return Ok(2);
        }
    };
    if !report(input, &problems, count, args.take_valid) {
        return Ok(2);
    }
    if !lost.is_empty() && !args.accept_loss {
        for l in &lost {
            crate::note(&format!("{input}: {l}: a CSV row cannot carry it"));
        }
        crate::note(&format!(
            "{output}: nothing written: CSV cannot carry the key{} above, and a member without its \
             buckling_model would be checked as a plain column; keep the JSON file, or give \
             --accept-loss to write the CSV without {}",
            if lost.len() == 1 { "" } else { "s" },
            if lost.len() == 1 { "it" } else { "them" },
        ));
        return Ok(2);
    }
    for l in &lost {
        crate::note(&format!("{output}: {l}: left out (--accept-loss)"));
    }
    // Second pass: write to a file beside OUT, renamed into place at the end.
    let target = Path::new(output);
    let temp = temp_beside(target);
    let cannot = |e: std::io::Error| format!("{output}: cannot write: {e}");
    let mut out =
        std::io::BufWriter::with_capacity(1 << 16, std::fs::File::create(&temp).map_err(cannot)?);
    let used: Vec<&str> = used.iter().map(String::as_str).collect();
    let layout = csv::Layout::new(&used, system);
    let mut text = String::new();
    match out_format {
        Format::Csv => layout.push_header(&mut text),
        Format::Json => json_head(&title, &mut text),
    }
    let mut written = 0usize;
    let mut again = Vec::new();
    let wrote = members_with(input, OnProblems::Skip(&mut again), |_, block| {
        for m in block.iter() {
            match out_format {
                Format::Csv => layout.push_row(&csv::cells(m), &mut text),
                Format::Json => json_member(m, written == 0, &mut text),
            }
            written += 1;
        }
        out.write_all(text.as_bytes()).map_err(cannot)?;
        text.clear();
        Ok(())
    });
    if out_format == Format::Json {
        json_tail(written, &mut text);
    }
    let finished = wrote.and_then(|_| {
        if written != count {
            return Err(format!(
                "{input}: changed while it was converted ({count} members at first, {written} now)"
            ));
        }
        out.write_all(text.as_bytes()).map_err(cannot)?;
        out.into_inner()
            .map_err(|e| cannot(e.into_error()))?
            .sync_all()
            .map_err(cannot)
    });
    if let Err(e) = finished.and_then(|()| std::fs::rename(&temp, target).map_err(cannot)) {
        let _ = std::fs::remove_file(&temp);
        return Err(e);
    }
    crate::emit(&format!(
        "{output}: {written} member{} written\n",
        if written == 1 { "" } else { "s" }
    ))?;
    Ok(if problems.is_empty() { 0 } else { 2 })
}

/// The start of a member file as [`file::MemberFile::to_json`] writes it,
/// up to the members' opening bracket.
fn json_head(title: &str, out: &mut String) {
    let text = |s: &str| serde_json::to_string(s).unwrap_or_else(|_| String::from("\"\""));
    out.push_str(&format!(
        "{{\n  \"format\": {},\n  \"version\": {},\n  \"title\": {},\n  \"members\": [",
        text(file::FORMAT),
        file::VERSION,
        text(title)
    ));
}

/// A member of the list, indented as [`file::MemberFile::to_json`] does.
fn json_member(m: &strutline_core::Member, first: bool, out: &mut String) {
    out.push_str(if first { "\n" } else { ",\n" });
    let body = serde_json::to_string_pretty(m).unwrap_or_else(|_| String::from("{}"));
    for (i, line) in body.lines().enumerate() {
        if i > 0 {
            out.push('\n');
        }
        out.push_str("    ");
        out.push_str(line);
    }
}

/// The end of the member file after `count` members.
fn json_tail(count: usize, out: &mut String) {
    out.push_str(if count == 0 { "]\n}" } else { "\n  ]\n}" });
}

/// The temporary file an output is written to before it is renamed.
fn temp_beside(target: &Path) -> std::path::PathBuf {
    let name = target
        .file_name()
        .and_then(|n| n.to_str())
        .unwrap_or("members");
    target.with_file_name(format!(".{name}.strutline-tmp"))
}

/// The conversion with the whole list read at once (JSON to JSON).
fn whole(args: &Args, out_format: Format, system: UnitSystem) -> Result<i32, String> {
    let (input, output, take_valid) = (args.input.as_str(), args.output.as_str(), args.take_valid);
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
    let problems: Vec<String> = problems.iter().map(ToString::to_string).collect();
    if !report(input, &problems, members.members.len(), take_valid) {
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
        // 2000 mm is 6.561679790026... ft: written to ten figures, which
        // read back as 2000 mm exactly (core's csv::write::us_cell).
        assert!(text.contains(",6.56167979,"), "{text}");
        assert_eq!(back.members[0].length_mm, 2000.0);
        assert!(run(&[s(&csv_in), s(&out), "--units".into(), "imperial".into()]).is_err());
        let _ = std::fs::remove_dir_all(&d);
    }

    /// A CSV of `n` members, the one at `repeat` (if any) with the id of the first.
    fn long_csv(n: usize, repeat: Option<usize>) -> String {
        let mut text =
            String::from("id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\n");
        for i in 0..n {
            let id = if Some(i) == repeat { 0 } else { i };
            text.push_str(&format!(
                "M{id},rect,{},50,235,210000,{},10,euler\n",
                100 + i % 7,
                2000 + i
            ));
        }
        text
    }

    #[test]
    fn a_long_list_is_converted_a_block_at_a_time_as_whole() {
        // More rows than a block (4,096), so the streamed writer crosses blocks.
        let d = dir("long");
        let csv_in = d.join("long.csv");
        std::fs::write(&csv_in, long_csv(9_000, None)).unwrap();
        let json = d.join("long.json");
        assert_eq!(run(&[s(&csv_in), s(&json)]).unwrap(), 0);
        let written = std::fs::read_to_string(&json).unwrap();
        // The same text as the whole list written at once.
        let whole = csv::read_any(&s(&csv_in), &std::fs::read_to_string(&csv_in).unwrap()).unwrap();
        assert_eq!(whole.members.len(), 9_000);
        assert_eq!(written, whole.to_json());
        // And back to CSV: the same text as the whole list's CSV.
        let csv_out = d.join("again.csv");
        assert_eq!(run(&[s(&json), s(&csv_out)]).unwrap(), 0);
        assert_eq!(
            std::fs::read_to_string(&csv_out).unwrap(),
            csv::to_csv(&whole)
        );
        // An empty list too.
        let empty = d.join("empty.csv");
        std::fs::write(&empty, long_csv(0, None)).unwrap();
        let empty_json = d.join("empty.json");
        assert_eq!(run(&[s(&empty), s(&empty_json)]).unwrap(), 0);
        assert_eq!(
            std::fs::read_to_string(&empty_json).unwrap(),
            file::MemberFile::new("empty").to_json()
        );
        let _ = std::fs::remove_dir_all(&d);
    }

    #[test]
    fn a_repeated_id_far_down_writes_nothing_unless_take_valid() {
        let d = dir("repeat");
        let csv_in = d.join("in.csv");
        std::fs::write(&csv_in, long_csv(6_000, Some(5_500))).unwrap();
        let json = d.join("out.json");
        assert_eq!(run(&[s(&csv_in), s(&json)]).unwrap(), 2);
        assert!(!json.exists());
        assert!(!d.join(".out.json.strutline-tmp").exists());
        let args = [s(&csv_in), s(&json), "--take-valid".into()];
        assert_eq!(run(&args).unwrap(), 2);
        let f = file::parse(&std::fs::read_to_string(&json).unwrap()).unwrap();
        assert_eq!(f.members.len(), 5_999);
        assert!(f.members.iter().all(|m| m.length_mm != 7_500.0));
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
