//! Reading a member file for the commands: JSON one member at a time
//! ([`strutline_core::stream`]), CSV a block of rows at a time, so memory
//! does not grow with the length of the list; members handed over in
//! blocks, for the caller to check in parallel.

use std::fs::File;

use strutline_core::csv::{self, Format};
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

/// Reads the member file at `path`, handing its members to `block` a block
/// at a time, in order, with the file's title. Returns the title and the
/// number of members once the whole file was read and found valid; an
/// error names the file and the member or the line. `block` may stop the
/// reading with an error of its own.
///
/// The file is read on a thread of its own, a block or two ahead of
/// `block`, so reading and checking overlap.
pub fn members(
    path: &str,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let (tx, rx) = std::sync::mpsc::sync_channel::<(String, Vec<Member>)>(2);
    std::thread::scope(|s| {
        let reader = s.spawn(move || {
            read_blocks(path, |title, b| {
                tx.send((title.to_string(), b))
                    .map_err(|_| String::from("stopped"))
            })
        });
        let mut failed = None;
        for (title, b) in rx.iter() {
            if let Err(e) = block(&title, b) {
                failed = Some(e);
                break;
            }
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

/// [`members`] on the calling thread.
fn read_blocks(
    path: &str,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let open = || File::open(path).map_err(|e| format!("{path}: cannot read: {e}"));
    match format_of(path)? {
        Format::Json => {
            let mut pending: Vec<Member> = Vec::with_capacity(BLOCK);
            let mut title = String::new();
            let read = stream::members(open()?, |head, m| {
                pending.push(m);
                if pending.len() == BLOCK {
                    title.clone_from(&head.title);
                    block(&head.title, std::mem::take(&mut pending))?;
                    pending.reserve(BLOCK);
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
                Err(Stop::MembersFirst) => whole(path, block),
            }
        }
        Format::Csv => whole(path, block),
    }
}

/// Reads the whole file at once (a JSON file whose members come before its
/// format and version) and hands its members over in blocks.
fn whole(
    path: &str,
    mut block: impl FnMut(&str, Vec<Member>) -> Result<(), String>,
) -> Result<(String, usize), String> {
    let file = crate::read_members(path)?;
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
