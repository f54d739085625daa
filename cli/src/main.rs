//! The `strutline` command line: check a member file, print an envelope,
//! list catalogue sections, size members, convert between JSON and CSV,
//! analyse buckling models.
//!
//! The commands and their options are declared once, as the types below
//! (`clap`'s derive), and the help text is generated from them: `strutline
//! help`, `strutline --help` and `strutline COMMAND --help`. A new command
//! is a new variant of [`Command`] with its own `Args` type and module.
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

use clap::{CommandFactory, FromArgMatches, Parser, Subcommand};

mod buckle;
mod check;
mod convert;
mod envelope;
mod input;
mod sections;
mod size;

/// Checks of compression members (columns, struts, bracing).
#[derive(Debug, Parser)]
#[command(name = "strutline", version, arg_required_else_help = true)]
struct Cli {
    #[command(subcommand)]
    command: Command,
}

/// The commands, one module each.
#[derive(Debug, Subcommand)]
enum Command {
    /// Check every member of a member file (.json or .csv)
    Check(check::Args),
    /// Print a member's capacity envelope as CSV (the caution on stderr)
    Envelope(envelope::Args),
    /// List catalogue sections with their properties
    Sections(sections::Args),
    /// Propose the lightest section of a series for each member
    Size(size::Args),
    /// Convert a member file between JSON and CSV
    Convert(convert::Args),
    /// Find the elastic critical load of each member with a buckling_model
    Buckle(buckle::Args),
}

fn main() {
    // The known series are named under the help of the commands that take
    // `--series`; they come from the catalogue, so they are added here.
    let series = format!("known series: {}", sections::known_series());
    let command = cli()
        .mut_subcommand("sections", |c| c.after_help(series.clone()))
        .mut_subcommand("size", |c| c.after_help(series.clone()));
    let cli = command
        .try_get_matches()
        .and_then(|m| Cli::from_arg_matches(&m))
        .unwrap_or_else(|e| e.exit());
    let code = match run(cli.command) {
        Ok(code) => code,
        Err(message) => {
            note(&format!("strutline: {message}"));
            2
        }
    };
    std::process::exit(code);
}

/// The declared command line with its closing words: the exit statuses and
/// the caution (core's one text of it).
fn cli() -> clap::Command {
    Cli::command().after_help(format!(
        "exit status: 0 all within capacity, 1 some member over capacity, 2 invalid input\n\n{}",
        strutline_core::CAUTION
    ))
}

/// The caution, on standard error, for a command whose standard output is
/// data that prose would spoil (`envelope`'s CSV): seen at the terminal
/// beside the results, and not written into the file they go to.
pub fn caution_beside_data() {
    note(&format!("strutline: {}", strutline_core::CAUTION));
}

fn run(command: Command) -> Result<i32, String> {
    match command {
        Command::Check(a) => check::run(&a),
        Command::Envelope(a) => envelope::run(&a),
        Command::Sections(a) => sections::run(&a),
        Command::Size(a) => size::run(&a),
        Command::Convert(a) => convert::run(&a),
        Command::Buckle(a) => buckle::run(&a),
    }
}

/// Reads a member file (JSON, or CSV by extension or content).
pub fn read_members(path: &str) -> Result<strutline_core::file::MemberFile, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("{path}: cannot read: {e}"))?;
    strutline_core::csv::read_any(path, &text)
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

/// A number greater than zero and finite, for `--to` and `--limit`.
pub fn positive(text: &str) -> Result<f64, String> {
    text.trim()
        .parse::<f64>()
        .ok()
        .filter(|v| v.is_finite() && *v > 0.0)
        .ok_or_else(|| format!("\"{text}\" is not a number greater than zero"))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_declared_command_line_is_consistent() {
        Cli::command().debug_assert();
    }

    /// Parses a command line as the program does.
    pub fn parse(args: &[&str]) -> Result<Command, clap::Error> {
        Cli::try_parse_from(std::iter::once("strutline").chain(args.iter().copied()))
            .map(|c| c.command)
    }

    #[test]
    fn options_are_read_into_their_types() {
        let Command::Envelope(e) = parse(&["envelope", "f.json", "--member", "C1"]).unwrap() else {
            panic!("not envelope")
        };
        assert_eq!((e.member.as_str(), e.to, e.steps), ("C1", 250.0, 125));
        assert!(parse(&["envelope", "f.json", "--member", "C1", "--to", "-3"]).is_err());
        assert!(parse(&["envelope", "f.json", "--member", "C1", "--steps", "0"]).is_err());
        assert!(parse(&["envelope", "f.json"]).is_err());
        assert!(parse(&["check"]).is_err());
        assert!(parse(&["check", "a.json", "--bogus"]).is_err());
        assert!(parse(&["convert", "a.csv", "b.json", "--units", "imperial"]).is_err());
        assert!(parse(&["size", "a.json", "--series", "heb", "--limit", "-1"]).is_err());
        assert!(parse(&["frobnicate"]).is_err());
    }

    #[test]
    fn help_is_generated_and_lists_every_command() {
        let help = cli().render_long_help().to_string();
        for c in ["check", "envelope", "sections", "size", "convert", "help"] {
            assert!(help.contains(c), "{c} missing from\n{help}");
        }
        assert!(help.contains(strutline_core::CAUTION), "{help}");
        let e = parse(&["check", "--help"]).unwrap_err();
        assert_eq!(e.kind(), clap::error::ErrorKind::DisplayHelp);
        assert_eq!(e.exit_code(), 0);
    }
}
