//! Reading a member file for the commands: JSON one member at a time
//! ([`strutline_core::stream`]), CSV a block of rows at a time, so memory
//! does not grow with the length of the list; members handed over in
//! blocks, for the caller to check in parallel.

use std::fs::File;

use strutline_core::csv::{self, Format};
use strutline_core::file;
use strutline_core::stream::{self, Stop};
use strutline_core::Member;

/// Members handed over at a time: enough to keep every core busy, few
/// enough that a block's results stay small.
pub const BLOCK: usize = 4096;

/// The format of the file at `path`: by its extension, else by its first
/// character.
pub fn format_of(path: &str) -> Result<Format, String> {
    use std::io::Read;
    let mut start = [0u8; 64];
    let mut file = File::open(path).map_err(|e| format!("{path}: cannot read: {e}"))?;
    let n = file
        .read(&mut start)
        .map_err(|e| format!("{path}: cannot read: {e}"))?;
    let head = String::from_utf8_lossy(start.get(..n).unwrap_or_default());
    Ok(csv::detect_format(path, &head))
}

/// What a reader does with CSV rows that have problems (a bad JSON member
/// always stops it).
pub enum OnProblems<'a> {
    /// Stop with an error listing them (with the rest of their block's).
    Stop,
    /// Leave the rows out and add their problems here, each naming its line.
    Skip(&'a mut Vec<String>),
}

/// Reads the member file at `path`, handing its members to `block` a block
/// at a time, in order, with the file's title. Returns the title and the
/// number of members once the whole file was read and found valid; an
/// error names the file and the member or the line. `block` may stop the
/// reading with an error of its own.
///
/// The file is read on a thread of its own, a block or two ahead of
/// `block`, so reading and checking overlap. A block's vector goes back to
/// the reader once `block` is done with it (whatever `block` left in it is
/// dropped), to hold the next block: a member is some 700 bytes, and a
/// fresh vector for each block (2.9 MB) was fresh pages to fault in. With
/// `check`'s texts kept from block to block, `check --json` of 100,000
/// members took 4,400-5,900 page faults instead of 8,200-10,300 (`perf
/// stat`; bench/cli.md).
pub fn members(
    path: &str,
    block: impl FnMut(&str, &mut Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    members_with(path, OnProblems::Stop, block)
}

/// [`members`], with a choice of what to do with CSV rows that have problems.
pub fn members_with(
    path: &str,
    on_problems: OnProblems<'_>,
    mut block: impl FnMut(&str, &mut Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let (tx, rx) = std::sync::mpsc::sync_channel::<(String, Vec<Member>)>(2);
    // At most a few vectors wait to be used again (a CSV file whose rows
    // come in blocks of another length, say, takes none): the rest are dropped.
    let (back, spare) = std::sync::mpsc::sync_channel::<Vec<Member>>(4);
    std::thread::scope(|s| {
        let reader = s.spawn(move || {
            let fresh = || {
                spare
                    .try_recv()
                    .unwrap_or_else(|_| Vec::with_capacity(BLOCK))
            };
            read_blocks(path, on_problems, fresh, |title, b| {
                tx.send((title.to_string(), b))
                    .map_err(|_| String::from("stopped"))
            })
        });
        let mut failed = None;
        for (title, mut b) in rx.iter() {
            if let Err(e) = block(&title, &mut b) {
                failed = Some(e);
                break;
            }
            b.clear();
            // When the reader has finished or has enough, the vector is dropped.
            let _ = back.try_send(b);
        }
        drop(rx);
        let read = reader
            .join()
            .unwrap_or_else(|_| Err(format!("{path}: the reader stopped unexpectedly")));
        match failed {
            Some(e) => Err(e),
            None => read,
        }
    })
}

/// [`members`] on the calling thread; `fresh` gives an empty vector for
/// the next block of a JSON file.
fn read_blocks(
    path: &str,
    on_problems: OnProblems<'_>,
    mut fresh: impl FnMut() -> Vec<Member>,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let open = || File::open(path).map_err(|e| format!("{path}: cannot read: {e}"));
    match format_of(path)? {
        Format::Json => {
            let mut pending: Vec<Member> = fresh();
            let mut title = String::new();
            let read = stream::members(open()?, |head, m| {
                pending.push(m);
                if pending.len() == BLOCK {
                    title.clone_from(&head.title);
                    block(&head.title, std::mem::replace(&mut pending, fresh()))?;
                }
                Ok::<(), String>(())
            });
            match read {
                Ok(head) => {
                    if !pending.is_empty() {
                        block(&head.title, pending)?;
                    }
                    Ok((head.title, head.count))
                }
                Err(Stop::Caller(message)) => Err(message),
                Err(Stop::Bad(e)) => Err(format!("{path}: {e}")),
                Err(Stop::MembersFirst) => whole(path, on_problems, block),
            }
        }
        Format::Csv => csv_blocks(path, on_problems, fresh, block),
    }
}

/// Reads a CSV file a block of rows at a time: the header (with any blank
/// lines and `sep=` line before it) is read once and put before each block,
/// which the engine's CSV reader reads as a file of its own; line numbers
/// are the file's. A tab-separated file, whose decimal mark may be set by a
/// number far down the file, is read whole.
fn csv_blocks(
    path: &str,
    mut on_problems: OnProblems<'_>,
    mut fresh: impl FnMut() -> Vec<Member>,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    use std::io::BufRead;
    let cannot = |e: std::io::Error| format!("{path}: cannot read: {e}");
    let mut reader = std::io::BufReader::with_capacity(1 << 16, File::open(path).map_err(cannot)?);
    // One record: lines up to a line end outside quotes.
    let mut record = |into: &mut String| -> Result<usize, String> {
        let mut lines = 0;
        let mut quotes = 0usize;
        loop {
            let start = into.len();
            let n = reader.read_line(into).map_err(cannot)?;
            if n == 0 {
                return Ok(lines);
            }
            lines += 1;
            quotes += into.get(start..).unwrap_or("").matches('"').count();
            if quotes.is_multiple_of(2) {
                return Ok(lines);
            }
        }
    };
    let mut head = String::new();
    loop {
        let start = head.len();
        if record(&mut head)? == 0 {
            break;
        }
        let text = head
            .get(start..)
            .unwrap_or("")
            .trim_start_matches('\u{feff}');
        let blank = text.trim_matches([' ', '\t', '\r', '\n']).is_empty();
        let sep_line = text
            .trim_start_matches(' ')
            .to_ascii_lowercase()
            .starts_with("sep=");
        if !blank && !sep_line {
            break;
        }
    }
    if !head.ends_with('\n') {
        head.push('\n');
    }
    if csv::separator(&head) == '\t' {
        return whole(path, on_problems, block);
    }
    let head_lines = head.matches('\n').count();
    let title = csv::title_from_path(path);
    let mut ids = strutline_core::ids::SeenIds::new();
    let mut next_line = head_lines + 1;
    let mut count = 0usize;
    let mut text = String::with_capacity(head.len() + BLOCK * 128);
    loop {
        text.clear();
        text.push_str(&head);
        let first_line = next_line;
        let mut rows = 0;
        while rows < BLOCK {
            let n = record(&mut text)?;
            if n == 0 {
                break;
            }
            next_line += n;
            rows += 1;
        }
        if rows == 0 && count > 0 {
            break;
        }
        let import = csv::parse_csv(&text);
        // The block's lines as the file's; the header's problems once.
        let file_line = |l: usize| {
            if l > head_lines {
                l - head_lines - 1 + first_line
            } else {
                l
            }
        };
        let mut problems: Vec<String> = import
            .problems
            .iter()
            .filter(|p| count == 0 || p.line > head_lines)
            .map(|p| {
                let mut p = p.clone();
                p.line = file_line(p.line);
                p.to_string()
            })
            .collect();
        // A row whose id an earlier block used is a problem, left out.
        let mut members = fresh();
        members.reserve(import.members.len());
        for (m, line) in import.members.into_iter().zip(&import.member_lines) {
            if ids.insert(&m.id) {
                members.push(m);
            } else {
                problems.push(format!(
                    "line {}, column id: id \"{}\" is already used by an earlier row; give each member its own id (expected an id no other row uses)",
                    file_line(*line),
                    m.id
                ));
            }
        }
        if let (false, OnProblems::Skip(all)) = (problems.is_empty(), &mut on_problems) {
            all.append(&mut problems);
        }
        if !problems.is_empty() {
            let mut message = format!(
                "{path}: {} problem{} in the CSV file (read up to line {}):",
                problems.len(),
                if problems.len() == 1 { "" } else { "s" },
                next_line.saturating_sub(1)
            );
            for p in &problems {
                message.push_str("\n  ");
                message.push_str(p);
            }
            return Err(message);
        }
        count += members.len();
        if !members.is_empty() {
            block(&title, members)?;
        }
        if rows < BLOCK {
            break;
        }
    }
    Ok((title, count))
}

/// Reads the whole file at once (a JSON file whose members come before its
/// format and version) and hands its members over in blocks.
fn whole(
    path: &str,
    on_problems: OnProblems<'_>,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let file = match on_problems {
        OnProblems::Stop => crate::read_members(path)?,
        OnProblems::Skip(all) => {
            let text =
                std::fs::read_to_string(path).map_err(|e| format!("{path}: cannot read: {e}"))?;
            match csv::detect_format(path, &text) {
                Format::Json => file::parse(&text).map_err(|e| format!("{path}: {e}"))?,
                Format::Csv => {
                    let (f, problems) = csv::read_csv_lenient(path, &text);
                    all.extend(problems.iter().map(ToString::to_string));
                    f
                }
            }
        }
    };
    let count = file.members.len();
    let mut members = file.members.into_iter();
    loop {
        let next: Vec<Member> = members.by_ref().take(BLOCK).collect();
        if next.is_empty() {
            break;
        }
        block(&file.title, next)?;
    }
    Ok((file.title, count))
}
