//! Splitting CSV text into records: the separator, quotes, line ends.

use super::*;

#[derive(Debug, Clone, Default)]
pub(super) struct Field {
    pub(super) text: String,
    pub(super) quoted: bool,
}

#[derive(Debug, Clone)]
pub(super) struct Record {
    pub(super) line: usize,
    pub(super) fields: Vec<Field>,
}

impl Record {
    pub(super) fn is_blank(&self) -> bool {
        self.fields
            .iter()
            .all(|f| !f.quoted && f.text.trim().is_empty())
    }
}

/// The separator, from a `sep=` line or the header line, and the text
/// after a `sep=` line (with the line count it skipped).
pub(super) fn detect_separator(text: &str) -> (char, &str, usize) {
    let mut skipped = 0;
    let mut body = text;
    // Leading blank lines.
    loop {
        let trimmed = body.trim_start_matches([' ', '\t']);
        if let Some(r) = trimmed
            .strip_prefix("\r\n")
            .or_else(|| trimmed.strip_prefix('\n'))
        {
            body = r;
            skipped += 1;
        } else {
            break;
        }
    }
    let first_line = body.split(['\n', '\r']).next().unwrap_or("");
    let lower = first_line
        .trim_start_matches(' ')
        .trim_end_matches(' ')
        .to_ascii_lowercase();
    if let Some(rest) = lower.strip_prefix("sep=") {
        let sep = match rest {
            "," => Some(','),
            ";" => Some(';'),
            "\t" | "\\t" | "tab" => Some('\t'),
            _ => None,
        };
        if let Some(sep) = sep {
            let after = body.get(first_line.len()..).unwrap_or("");
            let after = after
                .strip_prefix("\r\n")
                .or_else(|| after.strip_prefix('\n'))
                .or_else(|| after.strip_prefix('\r'))
                .unwrap_or(after);
            return (sep, after, skipped + 1);
        }
    }
    // Count candidate separators outside quotes in the header line.
    let (mut commas, mut semis, mut tabs) = (0usize, 0usize, 0usize);
    let mut in_quotes = false;
    for c in body.chars() {
        match c {
            '"' => in_quotes = !in_quotes,
            '\n' | '\r' if !in_quotes => break,
            ',' if !in_quotes => commas += 1,
            ';' if !in_quotes => semis += 1,
            '\t' if !in_quotes => tabs += 1,
            _ => {}
        }
    }
    let sep = if semis > commas && semis >= tabs {
        ';'
    } else if tabs > commas && tabs > semis {
        '\t'
    } else {
        ','
    };
    (sep, text, 0)
}

/// Splits text into records. Stops with a problem after `limit` records.
pub(super) fn tokenize(
    text: &str,
    sep: char,
    first_line: usize,
    limit: usize,
) -> (Vec<Record>, Vec<RowProblem>) {
    let mut records = Vec::new();
    let mut problems = Vec::new();
    let mut fields: Vec<Field> = Vec::new();
    let mut field = Field::default();
    let mut in_quotes = false;
    let mut after_quote = false;
    let mut line = first_line;
    let mut record_line = first_line;
    let mut chars = text.chars().peekable();
    let mut non_blank = 0usize;
    while let Some(c) = chars.next() {
        if in_quotes {
            if c == '"' {
                if chars.peek() == Some(&'"') {
                    chars.next();
                    field.text.push('"');
                } else {
                    in_quotes = false;
                    after_quote = true;
                }
            } else {
                if c == '\n' || (c == '\r' && chars.peek() != Some(&'\n')) {
                    line += 1;
                }
                field.text.push(c);
            }
            continue;
        }
        if c == sep {
            fields.push(finish_field(std::mem::take(&mut field)));
            after_quote = false;
        } else if c == '\n' || c == '\r' {
            if c == '\r' && chars.peek() == Some(&'\n') {
                chars.next();
            }
            fields.push(finish_field(std::mem::take(&mut field)));
            after_quote = false;
            let record = Record {
                line: record_line,
                fields: std::mem::take(&mut fields),
            };
            if !record.is_blank() {
                non_blank += 1;
                if non_blank > limit {
                    problems.push(too_many_rows(limit - 1));
                    return (records, problems);
                }
                records.push(record);
            }
            line += 1;
            record_line = line;
        } else if c == '"' && !field.quoted && field.text.trim().is_empty() {
            field.text.clear();
            field.quoted = true;
            in_quotes = true;
        } else if after_quote {
            if !c.is_whitespace() {
                field.text.push(c);
            }
        } else {
            field.text.push(c);
        }
    }
    if in_quotes {
        problems.push(problem(
            record_line,
            "",
            "a closing quote \" for every opening one",
            "a quoted field is never closed, so this row and everything after it was not read",
        ));
        return (records, problems);
    }
    fields.push(finish_field(field));
    let record = Record {
        line: record_line,
        fields,
    };
    if !record.is_blank() {
        non_blank += 1;
        if non_blank > limit {
            problems.push(too_many_rows(limit - 1));
            return (records, problems);
        }
        records.push(record);
    }
    (records, problems)
}

pub(super) fn too_many_rows(max_rows: usize) -> RowProblem {
    problem(
        0,
        "",
        format!("at most {max_rows} member rows"),
        format!("the file has more than {max_rows} rows; split it into smaller files"),
    )
}

pub(super) fn finish_field(mut f: Field) -> Field {
    if !f.quoted {
        f.text = f.text.trim().to_string();
    }
    f
}
