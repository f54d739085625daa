//! The `strutline` command line: check a member file, print an envelope,
//! list catalogue sections, size members, convert between JSON and CSV.
//!
//! Exit status: 0 when every member is within capacity (or the command
//! succeeded), 1 when any member is over capacity, 2 when the input is
//! invalid or the command line is wrong (the message on stderr names the
//! member id and the field).

mod check;
mod convert;
mod envelope;
mod sections;
mod size;

const USAGE: &str = "\
strutline: checks of compression members (columns, struts, bracing)

usage:
  strutline check FILE [--json]                 check every member of a member file (.json or .csv)
  strutline envelope FILE --member ID [--to L] [--steps N]
                                                print the member's capacity envelope as CSV
  strutline sections [--series NAME] [--json]   list catalogue sections with their properties
  strutline size FILE --series NAME [--limit U] [--json]
                                                propose the lightest section of a series per member
  strutline convert IN OUT [--take-valid] [--units si|us]
                                                convert a member file between JSON and CSV
  strutline help                                this text

exit status: 0 all within capacity, 1 some member over capacity, 2 invalid input";

fn main() {
    let args: Vec<String> = std::env::args().skip(1).collect();
    let code = match run(&args) {
        Ok(code) => code,
        Err(message) => {
            eprintln!("strutline: {message}");
            2
        }
    };
    std::process::exit(code);
}

fn run(args: &[String]) -> Result<i32, String> {
    let Some((command, rest)) = args.split_first() else {
        println!("{USAGE}");
        return Ok(2);
    };
    match command.as_str() {
        "check" => check::run(rest),
        "envelope" => envelope::run(rest),
        "sections" => sections::run(rest),
        "size" => size::run(rest),
        "convert" => convert::run(rest),
        "help" | "--help" | "-h" => {
            println!("{USAGE}");
            Ok(0)
        }
        other => Err(format!(
            "unknown command \"{other}\"; run `strutline help` for the commands"
        )),
    }
}

/// Reads a member file (JSON, or CSV by extension when available).
pub fn read_members(path: &str) -> Result<strutline_core::file::MemberFile, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("{path}: cannot read: {e}"))?;
    convert::read_any(path, &text)
}

/// Finds the value after a flag (`--member ID`).
pub fn flag_value<'a>(args: &'a [String], flag: &str) -> Result<Option<&'a str>, String> {
    match args.iter().position(|a| a == flag) {
        None => Ok(None),
        Some(i) => args
            .get(i + 1)
            .map(|s| Some(s.as_str()))
            .ok_or_else(|| format!("{flag} needs a value")),
    }
}
