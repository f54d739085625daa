//! The `strutline` command line: check a member file, print an envelope,
//! list catalogue sections, size members, convert between JSON and CSV.
//!
//! Exit status: 0 when every member is within capacity (or the command
//! succeeded), 1 when any member is over capacity, 2 when the input is
//! invalid or the command line is wrong (the message on stderr names the
//! member id and the field).
//!
//! Output goes through [`emit`]: when the reader closes the pipe early
//! (`strutline envelope ... | head -1`) the command stops writing and ends
//! quietly with the status it would have had otherwise (0, or 1 for a check
//! with a member over capacity); any other write error is status 2.

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
            note(&format!("strutline: {message}"));
            2
        }
    };
    std::process::exit(code);
}

fn run(args: &[String]) -> Result<i32, String> {
    let Some((command, rest)) = args.split_first() else {
        emit(&format!("{USAGE}\n"))?;
        return Ok(2);
    };
    match command.as_str() {
        "check" => check::run(rest),
        "envelope" => envelope::run(rest),
        "sections" => sections::run(rest),
        "size" => size::run(rest),
        "convert" => convert::run(rest),
        "help" | "--help" | "-h" => {
            emit(&format!("{USAGE}\n"))?;
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

/// Writes `text` to standard output through its lock; a closed pipe
/// (`| head`) is not an error: the rest is dropped.
pub fn emit(text: &str) -> Result<(), String> {
    use std::io::Write;
    let mut out = std::io::stdout().lock();
    match out.write_all(text.as_bytes()).and_then(|()| out.flush()) {
        Ok(()) => Ok(()),
        Err(e) if e.kind() == std::io::ErrorKind::BrokenPipe => Ok(()),
        Err(e) => Err(format!("cannot write the output: {e}")),
    }
}

/// Writes a line to standard error; a closed stderr is ignored (there is
/// nowhere left to say so).
pub fn note(line: &str) {
    use std::io::Write;
    let mut err = std::io::stderr().lock();
    let _ = err
        .write_all(line.as_bytes())
        .and_then(|()| err.write_all(b"\n"));
}

/// The arguments that are neither one of `flags` (each takes a value)
/// nor such a value: the switches and paths, for the caller to match.
pub fn others<'a>(args: &'a [String], flags: &'a [&str]) -> impl Iterator<Item = &'a str> + 'a {
    let mut skip = false;
    args.iter().filter_map(move |a| {
        if std::mem::take(&mut skip) {
            return None;
        }
        skip = flags.contains(&a.as_str());
        (!skip).then_some(a.as_str())
    })
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
