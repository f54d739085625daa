//! `strutline check FILE [--json | --jsonl] [--working]`: checks every
//! member and prints a table, one JSON document, or JSON Lines.
//!
//! Members are read, checked and written a block at a time
//! ([`crate::input`]), each block checked on every core (`rayon`) and
//! written in input order, so memory does not grow with the length of the
//! list. Without `--working` a check skips its working (the numbers are the
//! same; see `strutline_core::check::Working`).
//!
//! A bad member stops the check with status 2 and a message naming it and
//! the field; what was written before it is left visibly unfinished: the
//! JSON document is not closed, JSON Lines get no closing `done` line, and
//! the table no closing caution.

use std::io::Write;

use rayon::prelude::*;
use serde::Serialize;
use strutline_core::bending::Bending;
use strutline_core::check::{
    check_member_as, CheckResult, ModeResult, SegmentOf, Warning, Working,
};
use strutline_core::interaction;
use strutline_core::method::Method;
use strutline_core::{Member, Mode, CAUTION};

/// `strutline check`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file (.json, or .csv one member a row)
    #[arg(value_name = "FILE")]
    pub path: String,
    /// Write the results as one JSON document, {"results": [...], "caution": ...}
    #[arg(long, conflicts_with = "jsonl")]
    pub json: bool,
    /// Write JSON Lines: one result a line as each is checked, then a closing {"done": ...} line
    #[arg(long)]
    pub jsonl: bool,
    /// With --json or --jsonl, add each member's working step by step (and its section properties)
    #[arg(long)]
    pub working: bool,
}

/// The summary of one member's check, as `--json` writes it: the shape
/// [`write_summary`] writes by hand, and its reference in the test that
/// holds the two equal.
#[derive(Debug, Serialize)]
#[cfg_attr(not(test), allow(dead_code))]
pub struct Summary<'a> {
    /// The member's id.
    pub id: &'a str,
    /// The method used.
    pub method: Method,
    /// Whether the design load is within the resistance.
    pub passes: bool,
    /// Design load over design resistance.
    pub utilisation: f64,
    /// Design resistance of the governing mode, kN.
    pub resistance_kn: f64,
    /// The design compression the member was checked at, kN: its
    /// `axial_kn`, or with a `buckling_model` the governing segment's
    /// (see `CheckResult::axial_kn`).
    pub axial_kn: f64,
    /// With a `buckling_model`: the governing segment, of how many.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub segment: Option<SegmentOf>,
    /// What governs: the governing mode's key, a bending check, or
    /// "combined-not-checked" (see `CheckResult::governing_check`).
    pub governing_check: &'static str,
    /// The governing mode.
    pub governing: Mode,
    /// Every mode checked.
    pub modes: &'a [ModeResult],
    /// The bending side, `null` without moments.
    pub bending: &'a Option<Bending>,
    /// The beam-column interaction equations worked (empty without both
    /// axial load and a moment).
    pub interaction: &'a [interaction::Check],
    /// The result's warnings.
    pub warnings: &'a [Warning],
}

impl<'a> From<&'a CheckResult> for Summary<'a> {
    fn from(r: &'a CheckResult) -> Self {
        Summary {
            id: &r.id,
            method: r.method,
            passes: r.passes,
            utilisation: r.utilisation,
            resistance_kn: r.resistance_kn,
            axial_kn: r.axial_kn,
            segment: r.segment,
            governing_check: r.governing_check,
            governing: r.governing,
            modes: &r.modes,
            bending: &r.bending,
            interaction: &r.interaction,
            warnings: &r.warnings,
        }
    }
}

/// Writes `r`'s [`Summary`] as JSON, byte for byte as
/// `serde_json::to_writer(&Summary::from(r))` does (a test holds them
/// equal): the keys and the names of modes and methods as fixed text, the
/// numbers, the id and the warnings' messages through serde_json. It took
/// about half of a `check --json` run's instructions through serde_json's
/// serializer, most of them escaping the same forty keys for every member.
pub fn write_summary(out: &mut Vec<u8>, r: &CheckResult) -> serde_json::Result<()> {
    fn number(out: &mut Vec<u8>, x: f64) -> serde_json::Result<()> {
        serde_json::to_writer(&mut *out, &x)
    }
    out.extend_from_slice(b"{\"id\":");
    text(out, &r.id)?;
    out.extend_from_slice(b",\"method\":\"");
    out.extend_from_slice(r.method.key().as_bytes());
    out.extend_from_slice(b"\",\"passes\":");
    out.extend_from_slice(if r.passes { b"true" } else { b"false" });
    out.extend_from_slice(b",\"utilisation\":");
    number(out, r.utilisation)?;
    out.extend_from_slice(b",\"resistance_kn\":");
    number(out, r.resistance_kn)?;
    out.extend_from_slice(b",\"axial_kn\":");
    number(out, r.axial_kn)?;
    if let Some(segment) = &r.segment {
        out.extend_from_slice(b",\"segment\":");
        serde_json::to_writer(&mut *out, segment)?;
    }
    out.extend_from_slice(b",\"governing_check\":");
    text(out, r.governing_check)?;
    out.extend_from_slice(b",\"governing\":\"");
    out.extend_from_slice(r.governing.key().as_bytes());
    out.extend_from_slice(b"\",\"modes\":[");
    for (i, m) in r.modes.iter().enumerate() {
        if i > 0 {
            out.push(b',');
        }
        out.extend_from_slice(b"{\"mode\":\"");
        out.extend_from_slice(m.mode.key().as_bytes());
        out.extend_from_slice(b"\",\"buckling_length_mm\":");
        number(out, m.buckling_length_mm)?;
        out.extend_from_slice(b",\"slenderness\":");
        number(out, m.slenderness)?;
        out.extend_from_slice(b",\"critical_kn\":");
        number(out, m.critical_kn)?;
        out.extend_from_slice(b",\"relative_slenderness\":");
        number(out, m.relative_slenderness)?;
        out.extend_from_slice(b",\"reduction\":");
        number(out, m.reduction)?;
        out.extend_from_slice(b",\"resistance_kn\":");
        number(out, m.resistance_kn)?;
        out.push(b'}');
    }
    out.extend_from_slice(b"],\"bending\":");
    serde_json::to_writer(&mut *out, &r.bending)?;
    out.extend_from_slice(b",\"interaction\":");
    serde_json::to_writer(&mut *out, &r.interaction)?;
    out.extend_from_slice(b",\"warnings\":[");
    for (i, w) in r.warnings.iter().enumerate() {
        if i > 0 {
            out.push(b',');
        }
        out.extend_from_slice(b"{\"code\":");
        text(out, w.code)?;
        out.extend_from_slice(b",\"message\":");
        text(out, &w.message())?;
        out.push(b'}');
    }
    out.extend_from_slice(b"]}");
    Ok(())
}

/// `s` as a JSON string, byte for byte as serde_json writes it: between
/// quotes as it stands when it holds nothing serde_json escapes (a quote, a
/// backslash, a control character), else by serde_json. The test looks at
/// 16 bytes at a time without a branch a byte, which the compiler turns
/// into vector instructions; serde_json's writer looks each byte up in its
/// table of escapes (some 1,200 instructions a member, mostly the
/// warnings' messages: callgrind, bench/cli.md).
fn text(out: &mut Vec<u8>, s: &str) -> serde_json::Result<()> {
    let escaped = |b: u8| b < 0x20 || b == b'"' || b == b'\\';
    let plain = s
        .as_bytes()
        .chunks(16)
        .all(|c| !c.iter().fold(false, |any, &b| any | escaped(b)));
    if !plain {
        return serde_json::to_writer(&mut *out, s);
    }
    out.reserve(s.len() + 2);
    out.push(b'"');
    out.extend_from_slice(s.as_bytes());
    out.push(b'"');
    Ok(())
}

#[derive(Clone, Copy, PartialEq, Eq)]
enum Form {
    Table,
    Json,
    Lines,
}

/// The output, written as it comes; a closed pipe stops the writing but
/// not the check, so the exit status is still the whole list's.
struct Out {
    w: std::io::BufWriter<std::io::StdoutLock<'static>>,
    closed: bool,
}

impl Out {
    fn put(&mut self, text: &str) -> Result<(), String> {
        self.put_bytes(text.as_bytes())
    }

    fn put_bytes(&mut self, bytes: &[u8]) -> Result<(), String> {
        if self.closed {
            return Ok(());
        }
        match self.w.write_all(bytes) {
            Ok(()) => Ok(()),
            Err(e) if e.kind() == std::io::ErrorKind::BrokenPipe => {
                self.closed = true;
                Ok(())
            }
            Err(e) => Err(format!("cannot write the output: {e}")),
        }
    }

    fn finish(&mut self) -> Result<(), String> {
        if self.closed {
            return Ok(());
        }
        match self.w.flush() {
            Ok(()) => Ok(()),
            Err(e) if e.kind() == std::io::ErrorKind::BrokenPipe => Ok(()),
            Err(e) => Err(format!("cannot write the output: {e}")),
        }
    }
}

/// One member's text in the chosen form written into `text` (emptied
/// first), and whether it passes, or the message that stops the check.
/// The text is serde_json's (or [`write_summary`]'s) UTF-8, written out as
/// it is.
fn render(m: &Member, form: Form, working: bool, text: &mut Vec<u8>) -> Result<bool, String> {
    let kept = if working && form != Form::Table {
        Working::Kept
    } else {
        Working::Skipped
    };
    let r = check_member_as(m, kept).map_err(|e| e.to_string())?;
    text.clear();
    match form {
        Form::Table => Ok(()),
        _ if working => serde_json::to_writer(&mut *text, &r),
        _ => write_summary(text, &r),
    }
    .map_err(|e| e.to_string())?;
    Ok(r.passes)
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let form = match (args.json, args.jsonl) {
        (true, _) => Form::Json,
        (_, true) => Form::Lines,
        _ => Form::Table,
    };
    if args.working && form == Form::Table {
        return Err("check: --working goes with --json or --jsonl".into());
    }
    let path = &args.path;
    let mut out = Out {
        w: std::io::BufWriter::with_capacity(1 << 16, std::io::stdout().lock()),
        closed: false,
    };
    let mut over = 0usize;
    let mut count = 0usize;
    let mut table = Table::default();
    // A block's texts and outcomes, kept from block to block: one vector a
    // member made on a checking thread and freed on this one made glibc's
    // malloc give its heaps back to the system and take them again (some
    // 26,000 page faults for 100,000 members, `perf stat`; bench/cli.md).
    let mut texts: Vec<Vec<u8>> = Vec::new();
    let mut outcomes: Vec<Result<bool, String>> = Vec::new();
    let read = crate::input::members(path, |title, block| {
        if form != Form::Table {
            if texts.len() < block.len() {
                texts.resize_with(block.len(), || Vec::with_capacity(1024));
            }
            block
                .par_iter()
                .zip(texts.par_iter_mut())
                .map(|(m, text)| render(m, form, args.working, text))
                .collect_into_vec(&mut outcomes);
        }
        match form {
            Form::Table => {
                let results: Vec<Result<CheckResult, String>> = block
                    .par_iter()
                    .map(|m| check_member_as(m, Working::Skipped).map_err(|e| e.to_string()))
                    .collect();
                let mut ok = Vec::with_capacity(results.len());
                for r in results {
                    let r = r.map_err(|e| format!("{path}: {e}"))?;
                    over += usize::from(!r.passes);
                    ok.push(r);
                }
                if count == 0 {
                    table.widths(block, &ok);
                    if !title.is_empty() {
                        out.put(&format!("{title}\n"))?;
                    }
                    out.put(&table.header())?;
                }
                out.put(&table.rows(block, &ok))?;
            }
            Form::Json | Form::Lines => {
                for (i, (outcome, text)) in outcomes.iter().zip(&texts).enumerate() {
                    let passes = *outcome.as_ref().map_err(|e| format!("{path}: {e}"))?;
                    over += usize::from(!passes);
                    let lead = match (form, count + i) {
                        (Form::Json, 0) => "{\"results\": [\n",
                        (Form::Json, _) => ",\n",
                        _ => "",
                    };
                    out.put(lead)?;
                    out.put_bytes(text)?;
                    if form == Form::Lines {
                        out.put("\n")?;
                    }
                }
            }
        }
        count += block.len();
        Ok(())
    });
    if let Err(message) = read {
        // Whatever was written stays visibly unfinished (see the module docs).
        let _ = out.finish();
        return Err(message);
    }
    match form {
        Form::Table => {
            if count == 0 {
                out.put(&table.header())?;
            }
            out.put(&format!("\n{CAUTION}\n"))?;
        }
        Form::Json => {
            if count == 0 {
                out.put("{\"results\": [")?;
            }
            let caution = serde_json::to_string(CAUTION).map_err(|e| e.to_string())?;
            out.put(&format!("\n],\n\"caution\": {caution}\n}}\n"))?;
        }
        Form::Lines => {
            let done = serde_json::json!({
                "done": { "members": count, "over": over, "caution": CAUTION }
            });
            out.put(&format!("{done}\n"))?;
        }
    }
    out.finish()?;
    Ok(if over == 0 { 0 } else { 1 })
}

/// The readable table. Its column widths are set by the first block of
/// members (all of them for a list of up to [`crate::input::BLOCK`]); a
/// longer cell further down pushes its line out rather than holding the
/// whole list. Each block's warnings follow its rows.
#[derive(Default)]
struct Table {
    widths: [usize; 8],
}

const HEADS: [&str; 8] = [
    "id", "section", "method", "N_Ed kN", "N_Rd kN", "util", "governs", "status",
];

fn cells(m: &Member, r: &CheckResult) -> [String; 8] {
    [
        r.id.clone(),
        m.section.describe(),
        r.method.key().to_string(),
        format!("{:.1}", m.axial_kn),
        format!("{:.1}", r.resistance_kn),
        strutline_core::outcome::utilisation_text(r.utilisation, 3).into_owned(),
        r.governing_check.to_string(),
        if r.passes { "ok".into() } else { "OVER".into() },
    ]
}

impl Table {
    fn widths(&mut self, members: &[Member], results: &[CheckResult]) {
        for (w, h) in self.widths.iter_mut().zip(HEADS) {
            *w = h.chars().count();
        }
        for (m, r) in members.iter().zip(results) {
            for (w, cell) in self.widths.iter_mut().zip(cells(m, r).iter()) {
                *w = (*w).max(cell.chars().count());
            }
        }
    }

    fn line(&self, row: &[String; 8], out: &mut String) {
        let mut line = String::new();
        for (i, (cell, w)) in row.iter().zip(self.widths.iter()).enumerate() {
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

    fn header(&self) -> String {
        let mut out = String::new();
        self.line(&HEADS.map(String::from), &mut out);
        out
    }

    fn rows(&self, members: &[Member], results: &[CheckResult]) -> String {
        let mut out = String::new();
        for (m, r) in members.iter().zip(results) {
            self.line(&cells(m, r), &mut out);
        }
        for r in results {
            for w in &r.warnings {
                out.push_str(&format!("warning {}: {}\n", r.id, w.message()));
            }
        }
        out
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// Every member of the examples (moments, interaction, frames, a
    /// buckling model, warnings) under every method, and each with a load
    /// its resistance cannot meet: the hand-written summary is serde_json's
    /// byte for byte.
    #[test]
    fn texts_are_written_as_serde_json_writes_them() {
        let mut all = String::new();
        for c in (0u32..0x80).chain([0xe9, 0x2028, 0x1f600]) {
            all.push(char::from_u32(c).unwrap());
        }
        let mut tried = 0;
        for s in [
            "",
            "C1",
            "flexural-major",
            "a \"quoted\" id",
            "back\\slash",
            "tab\there",
            "Stütze 7 – Achse B",
            &"x".repeat(40),
            &format!("{}\n", "y".repeat(31)),
            &all,
        ] {
            for cut in 0..=s.len() {
                let Some(s) = s.get(cut..) else { continue };
                let mut ours = Vec::new();
                text(&mut ours, s).unwrap();
                assert_eq!(ours, serde_json::to_vec(s).unwrap(), "{s:?}");
                tried += 1;
            }
        }
        assert!(tried > 200, "{tried}");
    }

    #[test]
    fn the_summary_written_by_hand_is_serde_jsons() {
        let mut compared = 0;
        for example in ["depot-mezzanine", "tarnbeck-crane-hall", "yard-canopy-over"] {
            let path = format!("{}/../examples/{example}.json", env!("CARGO_MANIFEST_DIR"));
            let file = crate::read_members(&path).unwrap();
            for m in &file.members {
                for method in Method::ALL {
                    for load in [1.0, 1.0e6] {
                        let mut m = m.clone();
                        m.method = method;
                        m.axial_kn *= load;
                        let Ok(r) = check_member_as(&m, Working::Skipped) else {
                            continue;
                        };
                        let mut by_hand = Vec::new();
                        write_summary(&mut by_hand, &r).unwrap();
                        let reference = serde_json::to_vec(&Summary::from(&r)).unwrap();
                        assert_eq!(
                            String::from_utf8(by_hand).unwrap(),
                            String::from_utf8(reference).unwrap()
                        );
                        compared += 1;
                    }
                }
            }
        }
        assert!(compared > 50, "{compared}");
    }
}
