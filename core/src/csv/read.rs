//! Reading the header and the rows into members.

use serde_json::{Map, Value};

use super::keys::*;
use super::lex::*;
use super::number::*;
use super::*;
use crate::file;
use crate::member::schema as member_schema;
use crate::member::Member;
use crate::method::Method;
use crate::section::schema;
use crate::units::{self, UsUnit};

#[derive(Debug, Clone)]
pub(super) struct Column {
    /// The header as written.
    pub(super) header: String,
    /// The member-file key it stands for (`None`: ignored column).
    pub(super) info: Option<KeyInfo>,
    /// The US unit it is written in.
    pub(super) unit: Option<UsUnit>,
}

pub(super) fn normalise_header(h: &str) -> String {
    h.trim()
        .trim_start_matches('\u{feff}')
        .trim()
        .to_ascii_lowercase()
        .chars()
        .map(|c| if c == ' ' || c == '-' { '_' } else { c })
        .collect()
}

pub(super) fn read_header(record: &Record, problems: &mut Vec<RowProblem>) -> Vec<Column> {
    let mut seen: Vec<&'static str> = Vec::new();
    let mut columns = Vec::with_capacity(record.fields.len());
    for f in &record.fields {
        let header = f.text.trim().trim_start_matches('\u{feff}').to_string();
        let name = normalise_header(&header);
        let (info, unit) = if name.is_empty() {
            (None, None)
        } else if let Some(i) = key_info(&name) {
            (Some(i), None)
        } else if let Some((si, u)) = units::us_key_to_si(&name) {
            match key_info(&si) {
                Some(i) => (Some(i), Some(u)),
                None => (None, None),
            }
        } else {
            (None, None)
        };
        if !name.is_empty() && info.is_none() {
            problems.push(problem(
                record.line,
                header.clone(),
                "a member-file key such as id, kind, depth_mm, grade, length_mm, axial_kn, method \
                 (or its US form, e.g. length_ft, fy_ksi)",
                format!("unknown column \"{header}\"; its cells are not read"),
            ));
        }
        let info = match info {
            Some(i) if seen.contains(&i.key) => {
                problems.push(problem(
                    record.line,
                    header.clone(),
                    format!("{} given once", i.key),
                    format!(
                        "column \"{header}\" gives {} a second time; only the first is read",
                        i.key
                    ),
                ));
                None
            }
            other => other,
        };
        if let Some(i) = info {
            seen.push(i.key);
        }
        columns.push(Column { header, info, unit });
    }
    columns
}

pub(super) fn expected_for(info: &KeyInfo, unit: Option<UsUnit>) -> String {
    match info.kind {
        Kind::Text => "text".into(),
        Kind::Name => match info.key {
            _ if info.described.is_some_and(|d| !d.options.is_empty()) => info
                .described
                .map(|d| d.names_in_words())
                .unwrap_or_default(),
            "kind" => {
                let names: Vec<&str> = schema::kind_names().collect();
                match names.split_last() {
                    Some((last, rest)) => {
                        format!("a section kind: {} or {last}", rest.join(", "))
                    }
                    None => "a section kind".into(),
                }
            }
            "method" => format!("a method: {}", Method::ALL.map(Method::key).join(", ")),
            "make" => "rolled or welded (i); hot-finished or cold-formed (rhs, chs)".into(),
            _ => "a name".into(),
        },
        Kind::Whole => "a whole number".into(),
        Kind::Bool => match info.described.filter(|d| !d.options.is_empty()) {
            // "true (sidesway uninhibited) or false (braced)"
            Some(d) => {
                let said: Vec<String> = d
                    .options
                    .iter()
                    .map(|o| format!("{} ({})", o.name, o.words))
                    .collect();
                said.join(" or ")
            }
            None => "true or false".into(),
        },
        Kind::Number => match unit {
            Some(UsUnit::Ft) => "a length in feet, e.g. 13.5 or 13'-6\"".into(),
            Some(UsUnit::In) => "a length in inches, e.g. 6.5 or 6-1/2\"".into(),
            Some(u) => format!("a number in {}", u.suffix()),
            None => match info.key.rsplit_once('_').map(|(_, s)| s) {
                Some("mm") => "a number in mm".into(),
                Some("mm2") => "a number in mm2".into(),
                Some("mm4") => "a number in mm4".into(),
                Some("mm6") => "a number in mm6".into(),
                Some("kn") => "a number in kN".into(),
                Some("mpa") => "a number in MPa".into(),
                Some("mm3") => "a number in mm3".into(),
                Some("knm") => "a number in kNm".into(),
                _ => match info.described {
                    // "G_A, a number of 0 or more (sum of EI/L of ...)"
                    Some(d) => {
                        let sign = match d.value {
                            member_schema::Value::Number(member_schema::Sign::Positive) => {
                                " greater than 0"
                            }
                            member_schema::Value::Number(member_schema::Sign::NonNegative) => {
                                " of 0 or more"
                            }
                            _ => "",
                        };
                        let symbol = if d.symbol.is_empty() {
                            String::new()
                        } else {
                            format!("{}, ", d.symbol)
                        };
                        format!("{symbol}a number{sign} ({})", d.meaning)
                    }
                    None => "a number".into(),
                },
            },
        },
    }
}

/// Reads one cell of a number column into the member file's unit; a US
/// cell's value is converted exactly and then [`to_thousandth`].
pub(super) fn number_cell(text: &str, unit: Option<UsUnit>, mark: Mark) -> Result<f64, String> {
    let read = match unit {
        Some(UsUnit::Ft) => match parse_feet_inches(text, mark) {
            Some(mm) => mm,
            None => parse_number(text, mark).map(units::ft_to_mm),
        },
        Some(UsUnit::In) => match parse_feet_inches(text, mark) {
            Some(mm) => mm,
            None => parse_number(text, mark).map(units::in_to_mm),
        },
        Some(u) => parse_number(text, mark).map(|v| u.to_si(v)),
        None => return parse_number(text, mark),
    };
    read.map(to_thousandth)
}

/// How close (relative) a value converted from US units must be to a whole
/// thousandth of its SI unit to be read as that thousandth.
pub(super) const THOUSANDTH_WITHIN: f64 = 1e-9;

/// A value converted from US units, as the reader takes it: where it lies
/// within 1 part in 10^9 ([`THOUSANDTH_WITHIN`]) of a whole thousandth of
/// its SI unit (0.001 mm, 0.001 kN, 0.001 MPa, ...), that thousandth (the
/// double nearest it, as the SI figure typed would give); as converted
/// otherwise. So an SI value written in US units to ten significant
/// figures ([`super::write`]) reads back as itself, and no value moves by
/// more than 1 part in 10^9.
pub(super) fn to_thousandth(si: f64) -> f64 {
    let k = (si * 1000.0).round();
    // Beyond 2^53 thousandths a double holds no finer step anyway.
    if !k.is_finite() || k.abs() > 9_007_199_254_740_992.0 {
        return si;
    }
    let grid = k / 1000.0;
    if (grid - si).abs() <= THOUSANDTH_WITHIN * si.abs() {
        grid
    } else {
        si
    }
}

pub(super) struct RowContext<'a> {
    pub(super) columns: &'a [Column],
    pub(super) mark: Mark,
}

impl RowContext<'_> {
    /// The header that gives `key` in this file (the key itself when none does).
    pub(super) fn header_of(&self, key: &str) -> String {
        self.columns
            .iter()
            .find(|c| c.info.map(|i| i.key) == Some(key))
            .map(|c| c.header.clone())
            .unwrap_or_else(|| key.to_string())
    }
}

pub(super) fn read_row(record: &Record, ctx: &RowContext<'_>) -> Result<Member, Vec<RowProblem>> {
    let line = record.line;
    let mut problems = Vec::new();
    let mut given: Vec<(KeyInfo, Value)> = Vec::new();
    let mut failed: Vec<&'static str> = Vec::new();
    for (index, field) in record.fields.iter().enumerate() {
        let column = ctx.columns.get(index);
        let empty = !field.quoted && field.text.trim().is_empty();
        let Some(column) = column else {
            if !empty {
                problems.push(problem(
                    line,
                    format!("#{}", index + 1),
                    format!("at most {} cells, as in the header", ctx.columns.len()),
                    format!("cell {} is beyond the last column of the header", index + 1),
                ));
            }
            continue;
        };
        let Some(info) = column.info else {
            if !empty && column.header.trim().is_empty() {
                problems.push(problem(
                    line,
                    format!("#{}", index + 1),
                    "a column name in the header",
                    format!(
                        "cell {} holds a value under a column with no name",
                        index + 1
                    ),
                ));
            }
            continue;
        };
        if empty {
            continue;
        }
        let value = match info.kind {
            Kind::Text => Ok(Value::String(field.text.clone())),
            Kind::Name => {
                // Names are read whatever their case; the member file
                // writes them in lower case, but for the annex letters.
                let t = if info.key == "interaction_annex" {
                    field.text.trim().to_ascii_uppercase()
                } else {
                    field.text.trim().to_ascii_lowercase()
                };
                if t.is_empty() {
                    continue;
                }
                Ok(Value::String(t))
            }
            Kind::Number => {
                if field.text.trim().is_empty() {
                    continue;
                }
                number_cell(&field.text, column.unit, ctx.mark).and_then(|v| {
                    serde_json::Number::from_f64(v)
                        .map(Value::Number)
                        .ok_or_else(|| "not a finite number".to_string())
                })
            }
            Kind::Bool => match field.text.trim().to_ascii_lowercase().as_str() {
                "" => continue,
                "true" | "yes" | "y" | "1" => Ok(Value::Bool(true)),
                "false" | "no" | "n" | "0" => Ok(Value::Bool(false)),
                other => Err(format!("\"{other}\" is not true or false")),
            },
            Kind::Whole => {
                if field.text.trim().is_empty() {
                    continue;
                }
                match parse_number(&field.text, ctx.mark) {
                    Ok(v) if v.fract() == 0.0 && (0.0..=255.0).contains(&v) => {
                        // A whole number from 0 to 255: the cast is exact.
                        Ok(Value::from(v as u64))
                    }
                    Ok(v) => Err(format!("{v} is not a whole number from 0 to 255")),
                    Err(e) => Err(e),
                }
            }
        };
        match value {
            Ok(v) => given.push((info, v)),
            Err(message) => {
                failed.push(info.key);
                problems.push(problem(
                    line,
                    column.header.clone(),
                    expected_for(&info, column.unit),
                    message,
                ));
            }
        }
    }
    let has = |key: &str| given.iter().any(|(i, _)| i.key == key) || failed.contains(&key);
    let get = |key: &str| {
        given
            .iter()
            .find(|(i, _)| i.key == key)
            .and_then(|(_, v)| v.as_str())
    };

    // The member's own required keys (member::schema), and the required
    // keys of a group one of whose keys is given (angle_leg).
    for info in keys() {
        match info.group {
            Group::Member if info.required && !has(info.key) => problems.push(problem(
                line,
                ctx.header_of(info.key),
                expected_for(&info, None),
                format!("{} is missing; every member needs one", info.key),
            )),
            Group::Nested { key, .. }
                if info.described.is_some_and(|d| d.required()) && !has(info.key) =>
            {
                let in_group =
                    |i: &KeyInfo| matches!(i.group, Group::Nested { key: k, .. } if k == key);
                if given.iter().any(|(i, _)| in_group(i)) {
                    let needs: Vec<&str> = keys()
                        .filter(|i| in_group(i) && i.described.is_some_and(|d| d.required()))
                        .map(|i| i.key)
                        .collect();
                    problems.push(problem(
                        line,
                        ctx.header_of(info.key),
                        expected_for(&info, None),
                        format!("{} is missing; {key} needs {}", info.key, in_words(&needs)),
                    ));
                }
            }
            _ => {}
        }
    }

    if let Some(m) = get("method") {
        if Method::from_key(m).is_none() {
            failed.push("method");
            problems.push(problem(
                line,
                ctx.header_of("method"),
                key_info("method")
                    .map(|i| expected_for(&i, None))
                    .unwrap_or_default(),
                format!("unknown method \"{m}\""),
            ));
        }
    }

    // Names from the member file's fixed lists (member::schema, and the
    // section kind's choices in section::schema), read without regard to
    // case and kept as described.
    let kind_name = get("kind").map(str::to_string);
    let mut unknown: Vec<(&'static str, String, Vec<&'static str>)> = Vec::new();
    for (info, value) in given.iter_mut().filter(|(i, _)| i.kind == Kind::Name) {
        let Some(v) = value.as_str() else { continue };
        let allowed: Vec<&'static str> = match (info.described, info.key) {
            (Some(d), _) if !d.options.is_empty() => d.names().collect(),
            // The section kind's choices (section::schema); other kinds
            // have no make, and the section check says so.
            (None, "make") => match kind_name
                .as_deref()
                .and_then(schema::kind)
                .and_then(|k| k.key("make"))
            {
                Some(schema::Key {
                    value: schema::Value::Choice(options),
                    ..
                }) => options.to_vec(),
                _ => continue,
            },
            _ => continue,
        };
        match allowed.iter().find(|a| a.eq_ignore_ascii_case(v)) {
            Some(name) => *value = Value::String((*name).to_string()),
            None => unknown.push((info.key, v.to_string(), allowed)),
        }
    }
    for (key, v, allowed) in unknown {
        failed.push(key);
        problems.push(problem(
            line,
            ctx.header_of(key),
            allowed.join(", "),
            format!("unknown {key} \"{v}\""),
        ));
    }
    let get = |key: &str| {
        given
            .iter()
            .find(|(i, _)| i.key == key)
            .and_then(|(_, v)| v.as_str())
    };

    // The section.
    let present: Vec<KeyInfo> = given
        .iter()
        .map(|(i, _)| *i)
        .chain(failed.iter().filter_map(|k| key_info(k)))
        .collect();
    let in_group = |group: Group| -> Vec<&'static str> {
        present
            .iter()
            .filter(|i| i.key != "kind" && i.group == group)
            .map(|i| i.key)
            .collect()
    };
    let section_given = in_group(Group::Section);
    match get("kind") {
        None if !failed.contains(&"kind") => problems.push(problem(
            line,
            ctx.header_of("kind"),
            key_info("kind")
                .map(|i| expected_for(&i, None))
                .unwrap_or_default(),
            "kind is missing; every member needs a section kind",
        )),
        None => {}
        Some(kind) => match schema::kind(kind) {
            None => {
                failed.push("kind");
                problems.push(problem(
                    line,
                    ctx.header_of("kind"),
                    key_info("kind")
                        .map(|i| expected_for(&i, None))
                        .unwrap_or_default(),
                    format!("unknown section kind \"{kind}\""),
                ));
            }
            Some(described) => {
                let name = described.name;
                for key in described
                    .keys
                    .iter()
                    .filter(|k| k.required())
                    .map(|k| k.key)
                {
                    if !section_given.contains(&key) {
                        problems.push(problem(
                            line,
                            ctx.header_of(key),
                            key_info(key)
                                .map(|i| expected_for(&i, None))
                                .unwrap_or_default(),
                            format!("{key} is missing; a {name} section needs it"),
                        ));
                    }
                }
                for key in &section_given {
                    if described.key(key).is_none() {
                        let takes: Vec<&str> = described.keys.iter().map(|k| k.key).collect();
                        problems.push(problem(
                            line,
                            ctx.header_of(key),
                            format!("an empty cell for a {name} section"),
                            format!(
                                "a {name} section has no {key}; it takes {}",
                                takes.join(", ")
                            ),
                        ));
                    }
                }
            }
        },
    }

    // The material: a grade, a custom steel, or a custom timber (the
    // forms of member::schema::MATERIAL).
    let mat_given = in_group(Group::Material);
    let timber_keys: Vec<&'static str> = form_keys("timber").map(|k| k.key).collect();
    let steel_needs: Vec<&'static str> = form_keys("steel")
        .filter(|k| k.required())
        .map(|k| k.key)
        .collect();
    let any_timber = timber_keys.iter().any(|k| mat_given.contains(k));
    let any_custom = form_keys("steel").any(|k| mat_given.contains(&k.key));
    let has_grade = mat_given.contains(&"grade");
    let conflict = |problems: &mut Vec<RowProblem>, key: &str, why: &str| {
        problems.push(problem(
            line,
            ctx.header_of(key),
            "an empty cell",
            format!("{key} cannot be given together with {why}"),
        ));
    };
    if has_grade {
        for key in mat_given.iter().filter(|k| **k != "grade") {
            conflict(
                &mut problems,
                key,
                "a grade; give the grade or the custom values",
            );
        }
    } else if any_timber {
        let needs = in_words(&timber_keys);
        for &key in &timber_keys {
            if !mat_given.contains(&key) {
                problems.push(problem(
                    line,
                    ctx.header_of(key),
                    key_info(key)
                        .map(|i| expected_for(&i, None))
                        .unwrap_or_default(),
                    format!("{key} is missing; a custom timber needs {needs}"),
                ));
            }
        }
        for key in form_keys("steel").filter(|k| mat_given.contains(&k.key)) {
            conflict(&mut problems, key.key, "the timber values");
        }
    } else if any_custom {
        let needs = in_words(&steel_needs);
        for &key in &steel_needs {
            if !mat_given.contains(&key) {
                problems.push(problem(
                    line,
                    ctx.header_of(key),
                    key_info(key)
                        .map(|i| expected_for(&i, None))
                        .unwrap_or_default(),
                    format!("{key} is missing; a custom material needs {needs}"),
                ));
            }
        }
    } else {
        problems.push(problem(
            line,
            ctx.header_of("grade"),
            "a grade (e.g. S355), or fy_mpa and e_mpa, or fc0k_mpa, e005_mpa, e0mean_mpa and timber",
            "the material is missing",
        ));
    }

    if !problems.is_empty() {
        return Err(problems);
    }

    // Assemble the member-file object and let the member file's own types
    // read it, so the CSV accepts exactly what the JSON accepts.
    let mut member = Map::new();
    let mut section = Map::new();
    let mut material = Map::new();
    let mut nested: Vec<(&'static str, Map<String, Value>)> = Vec::new();
    for (info, value) in given {
        let (target, key) = match info.group {
            Group::Member => (&mut member, info.key),
            Group::Section => (&mut section, info.key),
            Group::Material => (&mut material, info.key),
            Group::Nested { key, prefix } => {
                let at = match nested.iter().position(|(k, _)| *k == key) {
                    Some(at) => at,
                    None => {
                        nested.push((key, Map::new()));
                        nested.len() - 1
                    }
                };
                match nested.get_mut(at) {
                    Some((_, map)) => {
                        (map, info.described.map_or(info.key, |d| d.in_group(prefix)))
                    }
                    None => continue,
                }
            }
        };
        target.insert(key.to_string(), value);
    }
    member.insert("section".into(), Value::Object(section));
    member.insert("material".into(), Value::Object(material));
    for (key, map) in nested {
        member.insert(key.into(), Value::Object(map));
    }
    let value = Value::Object(member);
    file::deserialize_member(&value).map_err(|(path, inner)| {
        let key = missing_field(&inner).unwrap_or_else(|| {
            if let Some((outer, k)) = path.split_once('.') {
                if let Some(member_schema::Value::Group { prefix, .. }) =
                    member_schema::member_key(outer).map(|d| d.value)
                {
                    return format!("{prefix}_{k}");
                }
            }
            path.rsplit('.')
                .next()
                .filter(|s| !s.is_empty() && *s != "section")
                .unwrap_or(if path.starts_with("section") {
                    "kind"
                } else {
                    ""
                })
                .to_string()
        });
        let info = key_info(&key);
        vec![problem(
            line,
            if key.is_empty() {
                String::new()
            } else {
                ctx.header_of(&key)
            },
            info.map(|i| expected_for(&i, None)).unwrap_or_default(),
            inner,
        )]
    })
}

/// Keys as a reader lists them: "a, b and c".
fn in_words(keys: &[&str]) -> String {
    match keys.split_last() {
        Some((last, rest)) if !rest.is_empty() => format!("{} and {last}", rest.join(", ")),
        Some((last, _)) => (*last).to_string(),
        None => String::new(),
    }
}

pub(super) fn missing_field(message: &str) -> Option<String> {
    let rest = message.strip_prefix("missing field `")?;
    Some(rest.split('`').next()?.to_string())
}

/// Reads a CSV member file. See the module documentation for the rules.
pub fn parse_csv(text: &str) -> CsvImport {
    parse_csv_within(text, usize::MAX)
}

/// [`parse_csv`], refusing a file of more than `max_rows` member rows with
/// one problem that says so (a limit an edge may set as its policy).
pub fn parse_csv_within(text: &str, max_rows: usize) -> CsvImport {
    let mut out = CsvImport::default();
    let text = text.strip_prefix('\u{feff}').unwrap_or(text);
    let (sep, body, skipped) = detect_separator(text);
    let (records, problems) = tokenize(body, sep, 1 + skipped, max_rows.saturating_add(1));
    if problems.iter().any(|p| p.line == 0) {
        out.problems = problems;
        return out;
    }
    out.problems = problems;
    let mut records = records.into_iter();
    let Some(header) = records.next() else {
        out.problems.insert(
            0,
            problem(
                0,
                "",
                "a header row naming the columns, then one member a row",
                "the file is empty",
            ),
        );
        return out;
    };
    let rows: Vec<Record> = records.collect();
    let mut header_problems = Vec::new();
    let columns = read_header(&header, &mut header_problems);
    let missing: Vec<&str> = keys()
        .filter(|i| i.required)
        .map(|i| i.key)
        .filter(|key| !columns.iter().any(|c| c.info.map(|i| i.key) == Some(*key)))
        .collect();
    // A column that starts a material: the first key of each form (grade,
    // fc0k_mpa, fy_mpa).
    let has_material = columns.iter().any(|c| {
        c.info.is_some_and(|i| {
            member_schema::MATERIAL
                .iter()
                .any(|f| f.keys.first().map(|k| k.key) == Some(i.key))
        })
    });
    let mut all = header_problems;
    all.append(&mut out.problems);
    out.problems = all;
    out.rows = rows.len();
    if !missing.is_empty() || !has_material {
        let mut needed: Vec<&str> = missing;
        if !has_material {
            needed.push("grade (or fy_mpa and e_mpa, or the timber keys)");
        }
        out.problems.push(problem(
            header.line,
            "",
            "a header with the columns id, kind, length_mm (or length_ft), axial_kn (or axial_kip), method and a material",
            format!(
                "the header has no column for {}; no row can be read without it",
                needed.join(", ")
            ),
        ));
        return out;
    }
    let mark = match sep {
        ';' => Mark::Comma,
        ',' => Mark::Point,
        _ => vote_mark(&rows, &columns).unwrap_or(Mark::Point),
    };
    let ctx = RowContext {
        columns: &columns,
        mark,
    };
    let mut ids = crate::ids::SeenIds::with_capacity(rows.len(), 8 * rows.len());
    for record in &rows {
        match read_row(record, &ctx) {
            Ok(member) => {
                if ids.insert(&member.id) {
                    out.members.push(member);
                    out.member_lines.push(record.line);
                } else {
                    out.problems.push(problem(
                        record.line,
                        ctx.header_of("id"),
                        "an id no other row uses",
                        format!(
                            "id \"{}\" is already used by an earlier row; give each member its own id",
                            member.id
                        ),
                    ));
                }
            }
            Err(mut p) => out.problems.append(&mut p),
        }
    }
    out
}

/// The decimal mark of a tab-separated file: the first number cell that
/// shows it unambiguously.
pub(super) fn vote_mark(rows: &[Record], columns: &[Column]) -> Option<Mark> {
    rows.iter().find_map(|r| {
        r.fields.iter().zip(columns).find_map(|(f, c)| {
            let numeric = c.info.map(|i| i.kind == Kind::Number).unwrap_or(false);
            if numeric && !f.text.contains(['\'', '"']) {
                decides(&f.text)
            } else {
                None
            }
        })
    })
}
