//! Reading a member file one member at a time (natively; the command line
//! uses it for lists of any length).
//!
//! [`members`] reads the JSON member file from any [`std::io::Read`]
//! (core itself opens no file: the caller hands it the reader) and gives
//! each member to the caller as soon as it is read, so memory does not grow
//! with the length of the list, apart from the ids kept to refuse a
//! repeated one ([`SeenIds`]: a 64-bit hash and the id's bytes each). Every error names the member (its id, or its position when
//! it has none) and the field, a number out of a double's range included
//! (`member "C3": length_mm: number out of range`); a broken file is
//! reported with its line and column.
//!
//! The reader needs `format` and `version` before `members`, as
//! [`MemberFile::to_json`](crate::file::MemberFile::to_json) writes them; a
//! file that lists its members first is reported as [`Stop::MembersFirst`]
//! so the caller can read it whole with [`crate::file::parse`] instead.
//!
//! Every version this build reads has the same member keys (version 2 only
//! added an optional one), so members are read as the current version; a
//! future version that changes a member's keys migrates each member here.

use std::fmt;
use std::io::Read;

use crate::error::Error;
use crate::file::{SheetHeader, FORMAT, VERSION};
use crate::ids::SeenIds;
use crate::member::Member;

/// What is known of the file when a member is handed over.
#[derive(Debug, Clone, PartialEq, Eq, Default)]
pub struct Head {
    /// The list's title ("" when the file has none, or gives it after the members).
    pub title: String,
    /// The file's version, as written.
    pub version: u64,
    /// Members read so far, this one included.
    pub count: usize,
}

/// Why reading stopped.
#[derive(Debug)]
pub enum Stop<X> {
    /// The file is not a valid member file; the error names the member and
    /// the field, or the line and column.
    Bad(Error),
    /// The caller's function returned this.
    Caller(X),
    /// The file gives its members before `format` and `version`; nothing was
    /// handed over. Read it whole with [`crate::file::parse`].
    MembersFirst,
}

impl<X: fmt::Display> fmt::Display for Stop<X> {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Stop::Bad(e) => e.fmt(f),
            Stop::Caller(x) => x.fmt(f),
            Stop::MembersFirst => {
                f.write_str("the file lists its \"members\" before its \"format\" and \"version\"")
            }
        }
    }
}

/// Reads the member file from `reader`, handing each member, in order, to
/// `each` with what is known of the file so far. Returns what was read of
/// the head (title, version, member count) once the whole file is read and
/// found valid.
///
/// Ids are checked as the members come: a repeated id stops the reading
/// with [`Error::DuplicateId`] naming it, after the members before it were
/// handed over, so a caller that writes as it goes must mark its output
/// incomplete when reading stops.
///
/// The file is read a buffer at a time by [`Scan`], which finds where each
/// value of the top-level object and each member of `members` ends (a pass
/// over the bytes, minding strings and nesting); each member's text is then
/// read from the buffer by serde_json as a slice ([`member_from_str`]).
/// serde_json reading the whole file from an `io::Read` instead took some
/// 16,000 instructions a member only to capture each member's raw text.
pub fn members<R, F, X>(reader: R, each: F) -> Result<Head, Stop<X>>
where
    R: Read,
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    read_members(Scan::new(reader), each)
}

/// [`members`] from a [`Scan`] (the tests' reads each member by its extent,
/// to hold the two ways of [`Scan::member`] to the same answers).
fn read_members<R, F, X>(mut scan: Scan<R>, mut each: F) -> Result<Head, Stop<X>>
where
    R: Read,
    F: FnMut(&Head, Member) -> Result<(), X>,
{
    let mut head = Head::default();
    let mut format_seen = false;
    let mut members_seen = false;
    let mut ids = SeenIds::new();
    scan.bom().map_err(Stop::Bad)?;
    scan.expect_start(b'{', "a member file (a JSON object)")
        .map_err(Stop::Bad)?;
    // The top-level keys read so far (a handful), to refuse one given
    // twice as the whole-file reader does.
    let mut keys: Vec<String> = Vec::new();
    let mut first = true;
    loop {
        let Some(key) = scan.key(first, b'}').map_err(Stop::Bad)? else {
            break;
        };
        first = false;
        if keys.contains(&key) {
            return Err(Stop::Bad(Error::Syntax {
                line: 0,
                column: 0,
                message: crate::read::Repeat::top(&key).message(),
            }));
        }
        keys.push(key.clone());
        if key == "members" {
            if !format_seen || head.version == 0 {
                return Err(Stop::MembersFirst);
            }
            members_seen = true;
            scan.expect_start(b'[', "the \"members\" list")
                .map_err(Stop::Bad)?;
            let mut first_member = true;
            while scan.next_entry(first_member, b']').map_err(Stop::Bad)? {
                first_member = false;
                let index = head.count;
                let member = scan.member(index).map_err(Stop::Bad)?;
                if !ids.insert(&member.id) {
                    let e = Error::DuplicateId {
                        id: member.id.clone(),
                    }
                    .in_member(&format!("#{}", index + 1));
                    return Err(Stop::Bad(e));
                }
                head.count += 1;
                each(&head, member).map_err(Stop::Caller)?;
            }
        } else {
            let (start, end) = scan.value().map_err(Stop::Bad)?;
            let text = scan.text(start, end).map_err(Stop::Bad)?;
            head_value(&key, text, scan.place(start), &mut head, &mut format_seen)
                .map_err(Stop::Bad)?;
        }
    }
    scan.end().map_err(Stop::Bad)?;
    if !format_seen {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no \"format\" key".into(),
        }));
    }
    if head.version == 0 {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no whole-number \"version\" key".into(),
        }));
    }
    if !members_seen {
        return Err(Stop::Bad(Error::NotMemberFile {
            reason: "it has no \"members\" list".into(),
        }));
    }
    Ok(head)
}

/// A member from its JSON text, which starts at line and column `at` of the
/// file; `index` (0-based) names it when it has no id. Errors name the
/// member and the field's path, a number too large for a double included,
/// and a value of the wrong type (or another fault serde_json meets at a
/// place) its line and column in the file.
pub fn member_from_str(raw: &str, index: usize, at: (usize, usize)) -> Result<Member, Error> {
    if let Ok(m) = serde_json::from_str::<Member>(raw) {
        return Ok(m);
    }
    // The slow road, only for a bad member: read it as the whole-file
    // reader does, so both name the same member, field and fault.
    if let Ok((value, repeat)) = crate::read::value(raw) {
        if let Some(repeat) = repeat {
            let name = crate::file::member_name(Some(&value), index);
            return Err(Error::Syntax {
                line: 0,
                column: 0,
                message: repeat.message(),
            }
            .in_member(&name));
        }
        crate::file::member_from_value(&value, index).map_err(|e| {
            crate::read::placed(e, |said| {
                crate::read::fault_at::<Member>(raw, &value, said, "").map(|p| in_file(at, p))
            })
        })?;
    }
    // A number out of a double's range stops the value reader: where, and
    // which member. Sections are read by serde's derive alone here, which
    // names such a fault before a wrong value earlier in the same section
    // (`section::read`).
    let mut track = serde_path_to_error::Track::new();
    let mut de = serde_json::Deserializer::from_str(raw);
    let outcome = crate::section::read::in_derived_order(|| {
        <Member as serde::Deserialize>::deserialize(serde_path_to_error::Deserializer::new(
            &mut de, &mut track,
        ))
    });
    // The id alone, skipping every other value unparsed (so a number out
    // of range elsewhere does not hide it).
    #[derive(serde::Deserialize)]
    struct IdOnly {
        id: Option<String>,
    }
    let name = serde_json::from_str::<IdOnly>(raw)
        .ok()
        .and_then(|v| v.id)
        .unwrap_or_else(|| format!("#{}", index + 1));
    let message = match outcome {
        Ok(_) => "unreadable member".to_string(),
        Err(e) => {
            let path = track.path().to_string();
            let inner = crate::file::json_message(&e);
            if path.is_empty() || path == "." {
                inner
            } else {
                format!("{path}: {inner}")
            }
        }
    };
    Err(Error::Syntax {
        line: 0,
        column: 0,
        message,
    }
    .in_member(&name))
}

/// One top-level value other than `members`, as its JSON `text` (which
/// starts at line and column `at` of the file).
fn head_value(
    key: &str,
    text: &str,
    at: (usize, usize),
    head: &mut Head,
    format_seen: &mut bool,
) -> Result<(), Error> {
    let value = || serde_json::from_str::<serde_json::Value>(text).map_err(|e| syntax_at(&e, at));
    match key {
        "format" => match value()?.as_str() {
            Some(FORMAT) => *format_seen = true,
            Some(other) => {
                let reason = format!("its \"format\" is \"{other}\"");
                return Err(Error::NotMemberFile { reason });
            }
            None => {
                let reason = "its \"format\" is not text".to_string();
                return Err(Error::NotMemberFile { reason });
            }
        },
        "version" => {
            let Some(version) = value()?.as_u64() else {
                let reason = "it has no whole-number \"version\" key".to_string();
                return Err(Error::NotMemberFile { reason });
            };
            if version == 0 || version > VERSION {
                return Err(Error::UnsupportedVersion {
                    found: version,
                    newest: VERSION,
                });
            }
            head.version = version;
        }
        "title" => {
            head.title = match value()? {
                serde_json::Value::Null => String::new(),
                serde_json::Value::String(s) => s,
                _ => {
                    return Err(Error::Syntax {
                        line: 0,
                        column: 0,
                        message: "title: expected text".into(),
                    })
                }
            };
        }
        other => {
            // The sheet's header and keys this reader does not use:
            // checked as the whole-file reader checks them.
            let (value, repeat) = crate::read::value(text).map_err(|e| syntax_at(&e, at))?;
            if let Some(repeat) = repeat {
                return Err(Error::Syntax {
                    line: 0,
                    column: 0,
                    message: repeat.under(other).message(),
                });
            }
            if other == "sheet" && !value.is_null() {
                if let Err(e) = serde_json::from_value::<SheetHeader>(value) {
                    return Err(Error::Syntax {
                        line: 0,
                        column: 0,
                        message: format!("sheet: {e}"),
                    });
                }
            }
        }
    }
    Ok(())
}

/// serde_json's error in a value that starts at `at` (line, column) of the
/// file, placed in the file.
fn syntax_at(e: &serde_json::Error, at: (usize, usize)) -> Error {
    let (line, column) = in_file(at, (e.line(), e.column()));
    Error::Syntax {
        line,
        column,
        message: crate::file::json_message(e),
    }
}

/// The line and column in the file of `place` (line, column) in a text
/// that starts at `at` (line, column) of the file.
fn in_file(at: (usize, usize), place: (usize, usize)) -> (usize, usize) {
    if place.0 <= 1 {
        (at.0, at.1 + place.1.saturating_sub(1))
    } else {
        (at.0 + place.0 - 1, place.1)
    }
}

/// How many line ends `bytes` holds: counted in byte-wide lanes, 255 bytes
/// at a time, which the compiler turns into vector instructions (counting
/// with `filter().count()` widened each byte to 64 bits: some 4
/// instructions a byte of the file, 5% of a `check --json` run).
fn line_ends(bytes: &[u8]) -> usize {
    bytes
        .chunks(255)
        .map(|c| {
            let n = c
                .iter()
                .fold(0u8, |n, &b| n.wrapping_add(u8::from(b == b'\n')));
            usize::from(n)
        })
        .sum()
}

/// Bytes read from the file at a time.
const CHUNK: usize = 1 << 16;

/// The JSON text of a member file read a buffer at a time: finds where each
/// value ends without reading it (the values themselves are read by
/// serde_json from the buffer), and knows the line and column of every byte
/// for the messages.
struct Scan<R> {
    reader: R,
    /// Bytes read and not yet dropped; `pos` is the next one to look at.
    buf: Vec<u8>,
    pos: usize,
    /// The reader has no more bytes.
    eof: bool,
    /// Lines ended in the bytes dropped from the front of `buf`.
    lines_dropped: usize,
    /// Bytes dropped, and where the line of `buf[0]` starts among them
    /// (byte offsets in the file).
    dropped: usize,
    line_start: usize,
    /// Bytes from a member's start that serde_json is given to read it
    /// from: twice the last member's length, at least [`MIN_WINDOW`].
    window: usize,
    /// Members are read straight from the buffer where they can be (false:
    /// always by their extent, the way every error is found).
    straight: bool,
}

/// The least window of text a member is read from (see [`Scan::member`]).
const MIN_WINDOW: usize = 256;

impl<R: Read> Scan<R> {
    fn new(reader: R) -> Scan<R> {
        Scan {
            reader,
            buf: Vec::with_capacity(CHUNK * 2),
            pos: 0,
            eof: false,
            lines_dropped: 0,
            dropped: 0,
            line_start: 0,
            window: MIN_WINDOW,
            straight: true,
        }
    }

    /// Reads more bytes onto the end of the buffer (indices into it keep
    /// their meaning); false at the end of the file.
    fn more(&mut self) -> Result<bool, Error> {
        if self.eof {
            return Ok(false);
        }
        // Up to a chunk, into the buffer's spare room (not zeroed first).
        let got = (&mut self.reader)
            .take(CHUNK as u64)
            .read_to_end(&mut self.buf)
            .map_err(|e| Error::NotMemberFile {
                reason: format!("it cannot be read: {e}"),
            })?;
        if got == 0 {
            self.eof = true;
        }
        Ok(got > 0)
    }

    /// Drops the bytes before `pos` when they are more than a chunk,
    /// keeping count of their lines.
    fn drop_read(&mut self) {
        if self.pos < CHUNK {
            return;
        }
        let gone = self.buf.get(..self.pos).unwrap_or_default();
        if let Some(last) = gone.iter().rposition(|&b| b == b'\n') {
            self.lines_dropped += line_ends(gone);
            self.line_start = self.dropped + last + 1;
        }
        self.dropped += self.pos;
        self.buf.drain(..self.pos);
        self.pos = 0;
    }

    /// The byte at `i`, reading more when the buffer ends there; `None` at
    /// the end of the file.
    fn byte_at(&mut self, i: usize) -> Result<Option<u8>, Error> {
        while i >= self.buf.len() {
            if !self.more()? {
                return Ok(None);
            }
        }
        Ok(self.buf.get(i).copied())
    }

    /// Line and column (1-based) of the byte at `i` of the buffer.
    fn place(&self, i: usize) -> (usize, usize) {
        let before = self.buf.get(..i).unwrap_or_default();
        let lines = line_ends(before);
        let column = match before.iter().rposition(|&b| b == b'\n') {
            Some(nl) => i - nl,
            None => self.dropped + i - self.line_start + 1,
        };
        (self.lines_dropped + lines + 1, column)
    }

    /// A syntax error at byte `i` of the buffer.
    fn error(&self, i: usize, message: &str) -> Error {
        let (line, column) = self.place(i);
        Error::Syntax {
            line,
            column,
            message: message.to_string(),
        }
    }

    /// The next byte that is not white space, `pos` moved onto it.
    fn next_token(&mut self) -> Result<Option<u8>, Error> {
        loop {
            match self.byte_at(self.pos)? {
                Some(b' ' | b'\t' | b'\n' | b'\r') => self.pos += 1,
                other => return Ok(other),
            }
        }
    }

    /// Drops a UTF-8 byte-order mark at the start.
    fn bom(&mut self) -> Result<(), Error> {
        for i in 0..3 {
            if self.byte_at(i)?.is_none() {
                break;
            }
        }
        if self.buf.starts_with(&[0xEF, 0xBB, 0xBF]) {
            self.pos = 3;
        }
        Ok(())
    }

    /// Steps over `open` (`{` or `[`), which must come next; `what` names
    /// the value expected otherwise.
    fn expect_start(&mut self, open: u8, what: &str) -> Result<(), Error> {
        match self.next_token()? {
            Some(b) if b == open => {
                self.pos += 1;
                Ok(())
            }
            Some(_) => Err(self.error(self.pos, &format!("expected {what}"))),
            None => Err(self.error(self.pos, crate::file::ENDS_EARLY)),
        }
    }

    /// After the opening of an object or list or one of its entries: the
    /// comma before the next entry (true), or the `close` that ends it
    /// (false); `first` when no entry was read yet.
    fn next_entry(&mut self, first: bool, close: u8) -> Result<bool, Error> {
        match self.next_token()? {
            Some(b) if b == close && first => {
                self.pos += 1;
                Ok(false)
            }
            Some(b) if b == close => {
                self.pos += 1;
                Ok(false)
            }
            Some(b',') if !first => {
                self.pos += 1;
                // No entry after the comma is a trailing comma.
                match self.next_token()? {
                    Some(b) if b == close => Err(self.error(self.pos, "trailing comma")),
                    _ => Ok(true),
                }
            }
            Some(b',') => Err(self.error(self.pos, "expected value")),
            Some(_) if first => Ok(true),
            Some(_) => Err(self.error(
                self.pos,
                if close == b'}' {
                    "expected `,` or `}`"
                } else {
                    "expected `,` or `]`"
                },
            )),
            None => Err(self.error(self.pos, crate::file::ENDS_EARLY)),
        }
    }

    /// The next key of the top-level object and the colon after it, or
    /// `None` at its end.
    fn key(&mut self, first: bool, close: u8) -> Result<Option<String>, Error> {
        if !self.next_entry(first, close)? {
            return Ok(None);
        }
        if self.next_token()? != Some(b'"') {
            return Err(self.error(self.pos, "key must be a string"));
        }
        let start = self.pos;
        let end = self.value_end()?;
        let key = serde_json::from_slice::<String>(self.buf.get(start..end).unwrap_or_default())
            .map_err(|e| self.error(start, &crate::file::json_message(&e)))?;
        self.pos = end;
        match self.next_token()? {
            Some(b':') => {
                self.pos += 1;
                Ok(Some(key))
            }
            Some(_) => Err(self.error(self.pos, "expected `:`")),
            None => Err(self.error(self.pos, crate::file::ENDS_EARLY)),
        }
    }

    /// Where the next value starts and ends in the buffer (valid until the
    /// next call that reads).
    fn value(&mut self) -> Result<(usize, usize), Error> {
        self.drop_read();
        if self.next_token()?.is_none() {
            return Err(self.error(self.pos, crate::file::ENDS_EARLY));
        }
        let start = self.pos;
        let end = self.value_end()?;
        if end == start {
            return Err(self.error(start, "expected value"));
        }
        self.pos = end;
        Ok((start, end))
    }

    /// The text of the buffer from `start` to `end`.
    fn text(&self, start: usize, end: usize) -> Result<&str, Error> {
        let bytes = self.buf.get(start..end).unwrap_or_default();
        std::str::from_utf8(bytes).map_err(|_| self.error(start, "invalid unicode code point"))
    }

    /// The member that starts at the next token (after [`Scan::next_entry`]
    /// found one); `index` (0-based) names it when it has no id.
    ///
    /// serde_json reads it straight from the buffer, from a window of
    /// [`Scan::window`] bytes checked to be UTF-8 (so that serde_json need
    /// not check each text it reads again). Only when that fails (a bad
    /// member, or one that goes past the window or the bytes at hand) is
    /// its extent found by [`Scan::value_end`] and its text read by
    /// [`member_from_str`], which gives every error. A member read straight
    /// is the same member: the same deserializer on the same text, which
    /// ends where the extent would (its closing brace). Finding the extent
    /// first took some 3,800 instructions a member (callgrind,
    /// `bench/cli.md`).
    fn member(&mut self, index: usize) -> Result<Member, Error> {
        self.drop_read();
        if self.straight && self.next_token()?.is_some() {
            let to = self.pos.saturating_add(self.window).min(self.buf.len());
            let bytes = self.buf.get(self.pos..to).unwrap_or_default();
            let text = match std::str::from_utf8(bytes) {
                Ok(text) => text,
                Err(e) => std::str::from_utf8(bytes.get(..e.valid_up_to()).unwrap_or_default())
                    .unwrap_or_default(),
            };
            let mut one = serde_json::Deserializer::from_str(text).into_iter::<Member>();
            if let Some(Ok(member)) = one.next() {
                let used = one.byte_offset();
                self.pos += used;
                self.window = (2 * used).max(MIN_WINDOW);
                return Ok(member);
            }
        }
        let (start, end) = self.value()?;
        self.window = (2 * (end - start)).max(MIN_WINDOW);
        member_from_str(self.text(start, end)?, index, self.place(start))
    }

    /// Where the value starting at `pos` ends (one past its last byte):
    /// a string at its closing quote, an object or list where its nesting
    /// closes, a number or word before the next comma, bracket, brace or
    /// white space. Only the extent is found here; the value's own syntax
    /// is serde_json's to check when it reads the text.
    fn value_end(&mut self) -> Result<usize, Error> {
        let mut i = self.pos;
        let Some(first) = self.byte_at(i)? else {
            return Err(self.error(i, crate::file::ENDS_EARLY));
        };
        let mut depth = 0usize;
        let mut in_string = false;
        match first {
            b'"' => in_string = true,
            b'{' | b'[' => depth = 1,
            _ => loop {
                match self.byte_at(i)? {
                    None | Some(b',' | b']' | b'}' | b' ' | b'\t' | b'\n' | b'\r') => return Ok(i),
                    Some(_) => i += 1,
                }
            },
        }
        i += 1;
        loop {
            // The bytes at hand, without a call a byte: in a string, on to
            // its next quote or backslash; outside, on to the next quote or
            // bracket (tight loops over the bytes between).
            let bytes = self.buf.get(i..).unwrap_or_default();
            let mut j = 0;
            loop {
                let rest = bytes.get(j..).unwrap_or_default();
                let found = if in_string {
                    rest.iter().position(|&b| b == b'"' || b == b'\\')
                } else {
                    rest.iter()
                        .position(|&b| matches!(b, b'"' | b'{' | b'[' | b'}' | b']'))
                };
                let Some(k) = found else {
                    j = bytes.len();
                    break;
                };
                j += k;
                let b = bytes.get(j).copied().unwrap_or_default();
                j += 1;
                match b {
                    b'\\' => {
                        // The escaped byte, which may be a quote.
                        if j < bytes.len() {
                            j += 1;
                        } else {
                            // The buffer ends after the backslash.
                            j -= 1;
                            break;
                        }
                    }
                    b'"' => {
                        in_string = !in_string;
                        if !in_string && depth == 0 {
                            return Ok(i + j);
                        }
                    }
                    b'{' | b'[' => depth += 1,
                    _ => {
                        depth -= 1;
                        if depth == 0 {
                            return Ok(i + j);
                        }
                    }
                }
            }
            i += j;
            // Read on: the value goes past the buffer (or a backslash ends it).
            let need = if self.buf.get(i) == Some(&b'\\') {
                i + 1
            } else {
                i
            };
            if self.byte_at(need)?.is_none() {
                return Err(self.error(self.buf.len(), crate::file::ENDS_EARLY));
            }
        }
    }

    /// After the top-level object: nothing but white space.
    fn end(&mut self) -> Result<(), Error> {
        match self.next_token()? {
            None => Ok(()),
            Some(_) => Err(self.error(self.pos, "trailing characters")),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    fn member(id: &str) -> String {
        format!(
            r#"{{"id": "{id}", "section": {{"kind": "rect", "depth_mm": 100, "width_mm": 50}},
            "material": {{"fy_mpa": 235, "e_mpa": 210000}}, "length_mm": 2000, "axial_kn": 10,
            "method": "euler"}}"#
        )
    }

    fn file(members: &[String]) -> String {
        format!(
            "{{\"format\": \"strutline.members\", \"version\": 2, \"title\": \"t\", \"members\": [{}]}}",
            members.join(",\n")
        )
    }

    fn ids(text: &str) -> (Vec<String>, Result<Head, Stop<&'static str>>) {
        let mut seen = Vec::new();
        let out = members(text.as_bytes(), |_, m| {
            seen.push(m.id);
            Ok::<(), &'static str>(())
        });
        (seen, out)
    }

    fn many(n: usize) -> Vec<String> {
        (0..n).map(|i| member(&format!("C{i}"))).collect()
    }

    #[test]
    fn reads_every_member_in_order_as_the_whole_file_reader_does() {
        let text = file(&many(50));
        let (seen, head) = ids(&text);
        let head = head.unwrap();
        assert_eq!(
            (head.title.as_str(), head.version, head.count),
            ("t", 2, 50)
        );
        let whole = crate::file::parse(&text).unwrap();
        let mut streamed = Vec::new();
        members(text.as_bytes(), |_, m| {
            streamed.push(m);
            Ok::<(), ()>(())
        })
        .unwrap();
        assert_eq!(streamed, whole.members);
        assert_eq!(seen.len(), 50);
        // A byte-order mark and a version-1 file read the same.
        let v1 = format!(
            "\u{feff}{}",
            text.replace("\"version\": 2", "\"version\": 1")
        );
        assert_eq!(ids(&v1).0, seen);
    }

    #[test]
    fn a_number_out_of_range_names_the_member_and_the_field() {
        let mut list = many(5);
        list[3] = list[3].replace("\"length_mm\": 2000", "\"length_mm\": 1e400");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 3);
        let Err(Stop::Bad(e)) = out else {
            panic!("{out:?}")
        };
        let text = e.to_string();
        assert!(
            text.contains("\"C3\"") && text.contains("length_mm: number out of range"),
            "{text}"
        );
    }

    #[test]
    fn wrong_type_midway_names_member_and_field() {
        let mut list = many(2000);
        list[1500] = list[1500].replace("\"depth_mm\": 100", "\"depth_mm\": \"deep\"");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 1500);
        let text = out.unwrap_err().to_string();
        assert!(
            text.contains("\"C1500\"") && text.contains("section") && text.contains("\"deep\""),
            "{text}"
        );
        // The same words as the whole-file reader's.
        let whole = crate::file::parse(&file(&list)).unwrap_err().to_string();
        assert_eq!(text, whole);
        // No id: named by position.
        let mut list = many(3);
        list[2] = list[2].replace("\"id\": \"C2\", ", "");
        let text = ids(&file(&list)).1.unwrap_err().to_string();
        assert!(text.contains("#3") && text.contains("id"), "{text}");
    }

    #[test]
    fn a_duplicate_id_far_down_is_reported_with_the_member() {
        let mut list = many(5000);
        list[4321] = member("C17");
        let (seen, out) = ids(&file(&list));
        assert_eq!(seen.len(), 4321);
        let text = out.unwrap_err().to_string();
        assert!(text.contains("#4322") && text.contains("\"C17\""), "{text}");
    }

    #[test]
    fn a_truncated_file_is_reported_with_its_line() {
        let text = file(&many(100));
        let cut = &text[..text.len() * 2 / 3];
        let (seen, out) = ids(cut);
        assert!(seen.len() < 100);
        let Err(Stop::Bad(Error::Syntax { line, message, .. })) = out else {
            panic!("{out:?}")
        };
        assert!(line > 1);
        // Said in words, not as the parser's "EOF while parsing ...".
        assert_eq!(message, crate::file::ENDS_EARLY);
        let whole = crate::file::parse(cut).unwrap_err().to_string();
        assert!(whole.contains(crate::file::ENDS_EARLY), "{whole}");
        // Cut at the very end: every member read, the file still refused.
        let (seen, out) = ids(&text[..text.len() - 1]);
        assert_eq!(seen.len(), 100);
        let Err(Stop::Bad(Error::Syntax { message, .. })) = out else {
            panic!("{out:?}")
        };
        assert_eq!(message, crate::file::ENDS_EARLY);
    }

    #[test]
    fn head_problems_and_order() {
        assert!(matches!(
            ids("{\"format\": \"other\", \"version\": 2, \"members\": []}").1,
            Err(Stop::Bad(Error::NotMemberFile { .. }))
        ));
        assert!(matches!(
            ids("{\"format\": \"strutline.members\", \"version\": 9, \"members\": []}").1,
            Err(Stop::Bad(Error::UnsupportedVersion { .. }))
        ));
        assert!(matches!(
            ids("{\"format\": \"strutline.members\", \"version\": 2}").1,
            Err(Stop::Bad(Error::NotMemberFile { .. }))
        ));
        assert!(matches!(
            ids("[1, 2]").1,
            Err(Stop::Bad(Error::Syntax { .. }))
        ));
        let first = format!(
            "{{\"members\": [{}], \"format\": \"strutline.members\", \"version\": 2}}",
            member("A")
        );
        let (seen, out) = ids(&first);
        assert!(seen.is_empty() && matches!(out, Err(Stop::MembersFirst)));
        assert!(crate::file::parse(&first).is_ok());
    }

    /// A reader that gives at most `n` bytes a call, so values straddle
    /// every possible buffer boundary.
    struct Trickle<'a>(&'a [u8], usize);

    impl Read for Trickle<'_> {
        fn read(&mut self, out: &mut [u8]) -> std::io::Result<usize> {
            let n = self.1.min(out.len()).min(self.0.len());
            out[..n].copy_from_slice(&self.0[..n]);
            self.0 = &self.0[n..];
            Ok(n)
        }
    }

    #[test]
    fn values_across_buffers_and_tricky_strings_read_as_the_whole_file_reader_does() {
        // Notes with quotes, backslashes, brackets and braces inside
        // strings, escaped keys, and enough members that the text spans
        // several buffers.
        let tricky = [
            r#"a \"quoted\" [note] {with} braces"#,
            r#"back\\slash at the end\\"#,
            r#"unicode \u00e9 and \/ and tab\t"#,
            "]}],{[",
        ];
        let list: Vec<String> = (0..1000)
            .map(|i| {
                let note = tricky[i % tricky.len()];
                member(&format!("C{i}")).replacen(
                    "\"id\"",
                    &format!("\"note\": \"{note}\", \"i\\u0064\""),
                    1,
                )
            })
            .collect();
        let text = format!("  \n{}\n  ", file(&list));
        let whole = crate::file::parse(&text).unwrap();
        for step in [1, 7, 4096, 1 << 20] {
            let mut streamed = Vec::new();
            let head = members(Trickle(text.as_bytes(), step), |_, m| {
                streamed.push(m);
                Ok::<(), ()>(())
            })
            .unwrap();
            assert_eq!(head.count, 1000);
            assert_eq!(streamed, whole.members, "read {step} bytes at a time");
        }
    }

    #[test]
    fn broken_structure_is_refused_with_its_line_as_the_whole_file_reader_refuses_it() {
        let good = file(&many(3));
        let broken = [
            good.replacen("},\n{", "}\n{", 1),
            good.replacen("},\n{", "},,\n{", 1),
            good.replacen("}]}", "},]}", 1),
            format!("{good} x"),
            good.replacen("\"members\": [", "\"members\": [,", 1),
            good.replacen("\"title\": \"t\",", "\"title\": \"t\" ", 1),
            good.replacen("\"version\": 2", "\"version\": 2x", 1),
            good.replacen("\"members\": [", "\"members\": {", 1),
            good.replacen("\"title\"", "title", 1),
            good[..good.len() - 2].to_string(),
        ];
        for text in &broken {
            assert!(crate::file::parse(text).is_err(), "{text}");
            let (_, out) = ids(text);
            let Err(Stop::Bad(e)) = out else {
                panic!("took {text}: {out:?}")
            };
            assert!(!e.to_string().is_empty());
        }
        // Where the file breaks is told by line and column.
        let cut = good.replacen("},\n{", "}\n{", 1);
        let at = cut.find("}\n{").unwrap() + 2;
        let line = cut[..at].matches('\n').count() + 1;
        let Err(Stop::Bad(Error::Syntax {
            line: l, column, ..
        })) = ids(&cut).1
        else {
            panic!()
        };
        assert_eq!((l, column), (line, 1), "{cut}");
    }

    /// Members of several kinds and materials, one with its `kind` last,
    /// texts with escapes and letters beyond ASCII, and one note long
    /// enough to cross the reader's buffer.
    fn varied(i: usize, kind: usize) -> String {
        let base = member(&format!("V{i}"));
        match kind % 7 {
            0 => base,
            1 => base.replace(
                r#"{"kind": "rect", "depth_mm": 100, "width_mm": 50}"#,
                r#"{"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 15, "web_mm": 9, "root_radius_mm": 18, "make": "rolled"}"#,
            ),
            2 => base.replace(
                r#"{"kind": "rect", "depth_mm": 100, "width_mm": 50}"#,
                r#"{"depth_mm": 100, "width_mm": 50, "kind": "rect"}"#,
            ),
            3 => base.replace(
                r#"{"kind": "rect", "depth_mm": 100, "width_mm": 50}"#,
                r#"{"kind": "catalogue", "designation": "HE 200 B"}"#,
            ),
            4 => base.replace(
                r#"{"fy_mpa": 235, "e_mpa": 210000}"#,
                r#"{"grade": "GL28h"}"#,
            ),
            5 => base.replacen("\"id\"", "\"note\": \"Stütze \\\"a\\\" \\u00e9 ]}\", \"id\"", 1),
            _ => base.replacen(
                "\"id\"",
                &format!("\"note\": \"{}\", \"id\"", "x".repeat(70_000)),
                1,
            ),
        }
    }

    /// Reads `text` `step` bytes a call both ways (each member straight
    /// from the buffer where it can be, and each by its extent): the same
    /// members and the same outcome, errors to the line and column.
    fn both_ways(text: &[u8], step: usize) {
        let run = |straight: bool| {
            let mut scan = Scan::new(Trickle(text, step));
            scan.straight = straight;
            let mut seen = Vec::new();
            let out = read_members(scan, |_, m| {
                seen.push(m);
                Ok::<(), ()>(())
            });
            let out = match out {
                Ok(head) => format!("{head:?}"),
                Err(Stop::Bad(e)) => format!("{e:?}"),
                Err(Stop::MembersFirst) => "members first".into(),
                Err(Stop::Caller(())) => unreachable!(),
            };
            (seen, out)
        };
        let (straight, by_extent) = (run(true), run(false));
        assert_eq!(straight.1, by_extent.1, "{}", String::from_utf8_lossy(text));
        assert_eq!(straight.0, by_extent.0);
    }

    proptest::proptest! {
        #![proptest_config(proptest::prelude::ProptestConfig::with_cases(150))]

        /// Files of varied members, cut short, with bytes put in, taken
        /// out or changed (quotes, backslashes, brackets, a byte that is
        /// no UTF-8, digits, white space): both ways read the same.
        #[test]
        fn members_read_straight_are_members_read_by_their_extent(
            kinds in proptest::collection::vec(0usize..7, 1..60),
            changes in proptest::collection::vec((0usize..10_000, 0u8..4, 0usize..14), 0..4),
            step in proptest::sample::select(vec![1usize, 7, 4096, 1 << 20]),
        ) {
            let list: Vec<String> = kinds.iter().enumerate().map(|(i, k)| varied(i, *k)).collect();
            let mut bytes = file(&list).into_bytes();
            let put = [b'"', b'\\', b'{', b'}', b'[', b']', b',', b':', 0xff, 0xc3, b'e', b'1', b' ', b'\n'];
            for (at, what, b) in changes {
                let at = at * bytes.len() / 10_000;
                match what {
                    0 => bytes.truncate(at),
                    1 => bytes.insert(at, put[b]),
                    2 if at < bytes.len() => { bytes.remove(at); }
                    _ if at < bytes.len() => bytes[at] = put[b],
                    _ => {}
                }
            }
            both_ways(&bytes, step);
        }
    }

    #[test]
    fn line_ends_are_counted_as_one_by_one() {
        let mut bytes: Vec<u8> = (0..3000u32).map(|i| (i * 7 % 13) as u8).collect();
        bytes.extend(std::iter::repeat_n(b'\n', 700));
        for cut in [0, 1, 254, 255, 256, 1000, 3000, 3255, 3700] {
            let part = &bytes[..cut];
            let one_by_one = part.iter().filter(|&&b| b == b'\n').count();
            assert_eq!(line_ends(part), one_by_one, "{cut}");
        }
        assert_eq!(line_ends(&bytes), 700 + 3000 / 13 + 1);
    }

    #[test]
    fn the_caller_can_stop_the_reading() {
        let text = file(&many(10));
        let mut n = 0;
        let out = members(text.as_bytes(), |_, _| {
            n += 1;
            if n == 4 {
                Err("enough")
            } else {
                Ok(())
            }
        });
        assert!(matches!(out, Err(Stop::Caller("enough"))));
        assert_eq!(n, 4);
    }
}
