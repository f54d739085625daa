//! The built-in catalogue of standard sections.
//!
//! Each series is a plain data file `core/data/<series>.csv`, embedded with
//! `include_str!` (through the copy `build.rs` makes, which leaves the
//! comment lines out of the browser build only) and parsed once (on first
//! use) into static entries. A
//! file opens with a comment block (`#`) naming its source, then
//! directives (`@series`, `@shape`, `@make`, `@units`, `@corners`, `@wall`,
//! `@tokens`, `@aliases`), a header line naming the columns, and one row per section
//! with the nominal dimensions and the tabulated area, second moments and
//! mass per metre in the units the source publishes them in.
//!
//! Designations are resolved forgivingly: case, spaces, `x`/`X`/`×`, the
//! order of the series letters ("HEB200", "HE200B" and "HE 200 B"; "UC
//! 203x203x46" and "203x203x46 UC"), trailing zeros of decimals ("5.0") all
//! match. A designation is normalised into a fixed stack buffer and looked
//! up in a hash map of precomputed keys, so a hit does not allocate. An
//! unknown designation is refused with [`Error::UnknownDesignation`] and up
//! to five nearest designations (edit distance over normalised keys).
//!
//! Adding a series is adding a data file and one line in [`FILES`].

use std::collections::HashMap;
use std::sync::OnceLock;

use crate::error::{Error, Result};
use crate::section::{Chs, Family, HollowMake, IMake, IShape, Rhs, Section, SectionSpec};

/// The data files, in the order they are listed.
const FILES: &[(&str, &str)] = &[
    ("ipe", include_str!(concat!(env!("OUT_DIR"), "/ipe.csv"))),
    ("hea", include_str!(concat!(env!("OUT_DIR"), "/hea.csv"))),
    ("heb", include_str!(concat!(env!("OUT_DIR"), "/heb.csv"))),
    ("hem", include_str!(concat!(env!("OUT_DIR"), "/hem.csv"))),
    ("uc", include_str!(concat!(env!("OUT_DIR"), "/uc.csv"))),
    ("ub", include_str!(concat!(env!("OUT_DIR"), "/ub.csv"))),
    ("w", include_str!(concat!(env!("OUT_DIR"), "/w.csv"))),
    ("hss", include_str!(concat!(env!("OUT_DIR"), "/hss.csv"))),
    (
        "hss-round",
        include_str!(concat!(env!("OUT_DIR"), "/hss-round.csv")),
    ),
    (
        "shs-en10210",
        include_str!(concat!(env!("OUT_DIR"), "/shs-en10210.csv")),
    ),
    (
        "rhs-en10210",
        include_str!(concat!(env!("OUT_DIR"), "/rhs-en10210.csv")),
    ),
    (
        "chs-en10210",
        include_str!(concat!(env!("OUT_DIR"), "/chs-en10210.csv")),
    ),
    (
        "shs-en10219",
        include_str!(concat!(env!("OUT_DIR"), "/shs-en10219.csv")),
    ),
    (
        "chs-en10219",
        include_str!(concat!(env!("OUT_DIR"), "/chs-en10219.csv")),
    ),
];

/// Millimetres per inch (exact by definition).
const MM_PER_IN: f64 = 25.4;
/// Kilograms per metre in one pound per foot: 0.45359237 kg / 0.3048 m.
const KG_M_PER_LB_FT: f64 = 0.453_592_37 / 0.3048;
/// AISC 360-16 B4.2: design wall thickness of electric-resistance-welded
/// HSS as a fraction of the nominal wall.
pub const AISC_ERW_DESIGN_WALL: f64 = 0.93;

/// One catalogue entry.
#[derive(Debug, Clone, PartialEq)]
pub struct Entry {
    /// Series name ("HE B", "UC", "W", "SHS EN 10210").
    pub series: &'static str,
    /// Designation as published.
    pub designation: &'static str,
    /// The dimensional section.
    pub spec: SectionSpec,
    /// Tabulated area, mm2.
    pub area_mm2: f64,
    /// Tabulated major second moment, mm4.
    pub i_major_mm4: f64,
    /// Tabulated minor second moment, mm4.
    pub i_minor_mm4: f64,
    /// Tabulated mass per metre, kg/m.
    pub mass_kg_per_m: f64,
    /// The nominal wall, mm, when the section uses a design wall that
    /// differs from it (AISC 360-16 B4.2: ERW HSS use 0.93 t_nom).
    pub nominal_wall_mm: Option<f64>,
}

/// One series: a data file.
#[derive(Debug, Clone, PartialEq)]
pub struct Series {
    /// Its name ("HE B").
    pub name: &'static str,
    /// The data file's stem ("heb").
    pub file: &'static str,
    /// The shape family of its entries.
    pub family: Family,
    /// The file's header comment: the source and how the values were
    /// obtained (empty in the wasm32 build, whose copy has no comments).
    pub source: String,
    /// Units of the data file as published: "metric" (mm, cm2, cm4, kg/m)
    /// or "imperial" (in, in2, in4, lb/ft).
    pub units: &'static str,
    first: usize,
    end: usize,
}

impl Series {
    /// The entries of the series, in file order.
    pub fn entries(&self) -> &'static [Entry] {
        catalogue().entries.get(self.first..self.end).unwrap_or(&[])
    }
}

type Index = HashMap<Box<str>, usize, rustc_hash::FxBuildHasher>;

struct Catalogue {
    entries: Vec<Entry>,
    series: Vec<Series>,
    index: Index,
    /// Normalised canonical key of each entry, for suggestions.
    keys: Vec<String>,
    problems: Vec<String>,
    /// Each entry's built section, computed on first use.
    built: Vec<OnceLock<Result<Section>>>,
}

fn catalogue() -> &'static Catalogue {
    static CATALOGUE: OnceLock<Catalogue> = OnceLock::new();
    CATALOGUE.get_or_init(load)
}

/// Longest normalised key, bytes.
pub const KEY_CAPACITY: usize = 48;

/// A normalised designation in a fixed buffer (no allocation).
#[derive(Clone, Copy)]
pub struct Key {
    buf: [u8; KEY_CAPACITY],
    len: usize,
}

impl Key {
    /// The key as text.
    pub fn as_str(&self) -> &str {
        let bytes = self.buf.get(..self.len).unwrap_or(&[]);
        std::str::from_utf8(bytes).unwrap_or("")
    }

    fn push(&mut self, b: u8) -> bool {
        match self.buf.get_mut(self.len) {
            Some(slot) => {
                *slot = b;
                self.len += 1;
                true
            }
            None => false,
        }
    }

    fn last(&self) -> Option<u8> {
        self.len
            .checked_sub(1)
            .and_then(|i| self.buf.get(i))
            .copied()
    }

    /// Ends a number: drops trailing zeros of its decimals and a bare point.
    fn end_number(&mut self, point: &mut Option<usize>) {
        if let Some(p) = point.take() {
            while self.len > p + 1 && self.last() == Some(b'0') {
                self.len -= 1;
            }
            if self.len == p + 1 {
                self.len = p;
            }
        }
    }
}

/// Normalises a designation: upper case; spaces, `-` and `_` dropped; `x`,
/// `×` and `*` as `X`; a decimal comma as a point; trailing zeros of
/// decimals dropped ("5.0" as "5", "0.250" as "0.25"). Returns `None` when
/// the text has another character or is longer than [`KEY_CAPACITY`];
/// with `lossy`, such characters are skipped instead.
pub fn normalise(text: &str, lossy: bool) -> Option<Key> {
    let mut key = Key {
        buf: [0; KEY_CAPACITY],
        len: 0,
    };
    let mut point: Option<usize> = None;
    let mut chars = text.chars().peekable();
    while let Some(c) = chars.next() {
        let out = match c {
            '0'..='9' => Some(c as u8),
            'a'..='z' | 'A'..='Z' => Some(c.to_ascii_uppercase() as u8),
            '×' | '*' | '✕' | '⨯' => Some(b'X'),
            '.' | ',' => {
                let digit_before = key.last().is_some_and(|b| b.is_ascii_digit());
                let digit_after = chars.peek().is_some_and(char::is_ascii_digit);
                if digit_after && point.is_none() && (digit_before || c == '.') {
                    Some(b'.')
                } else {
                    None
                }
            }
            '/' => Some(b'/'),
            ' ' | '\t' | '-' | '_' | '\u{a0}' => None,
            _ => {
                if lossy {
                    None
                } else {
                    return None;
                }
            }
        };
        match out {
            Some(b'.') => {
                point = Some(key.len);
                if !key.push(b'.') && !lossy {
                    return None;
                }
            }
            Some(b) => {
                if !b.is_ascii_digit() {
                    key.end_number(&mut point);
                }
                if !key.push(b) {
                    if lossy {
                        break;
                    }
                    return None;
                }
            }
            None => key.end_number(&mut point),
        }
    }
    key.end_number(&mut point);
    Some(key)
}

fn normalised_string(text: &str) -> String {
    normalise(text, true)
        .map(|k| k.as_str().to_string())
        .unwrap_or_default()
}

/// Splits a normalised key into leading letters, the middle (from the first
/// to the last digit) and trailing letters.
fn split_key(key: &str) -> (&str, &str, &str) {
    let start = key.find(|c: char| c.is_ascii_digit() || c == '.');
    let end = key.rfind(|c: char| c.is_ascii_digit());
    match (start, end) {
        (Some(s), Some(e)) if e >= s => (
            key.get(..s).unwrap_or(""),
            key.get(s..=e).unwrap_or(""),
            key.get(e + 1..).unwrap_or(""),
        ),
        _ => (key, "", ""),
    }
}

/// Every spelling of a canonical key: the series letters before, after or
/// on both sides of the numbers, with the series' alternative tokens, and
/// the series' other names (`@aliases`, with `{mid}` standing for the
/// numbers: "IPB{mid}" makes "IPB200" a spelling of "HE 200 B").
fn aliases(key: &str, spellings: &Spellings) -> Vec<String> {
    let tokens = spellings.tokens.as_slice();
    let (lead, mid, trail) = split_key(key);
    let mut out = Vec::new();
    if mid.is_empty() {
        return out;
    }
    let trails: Vec<String> = if tokens.is_empty() {
        vec![trail.to_string()]
    } else {
        tokens.iter().map(|t| normalised_string(t)).collect()
    };
    // A wall written as a fraction of an inch ("1/4") may also be written
    // as a decimal ("0.25", ".25").
    let mut mids = vec![mid.to_string()];
    if let Some((head, frac)) = mid.rsplit_once('X') {
        if let Some((num, den)) = frac.split_once('/') {
            if let (Ok(n), Ok(d)) = (num.parse::<u32>(), den.parse::<u32>()) {
                if d > 0 {
                    let dec = normalised_string(&format!("{:.4}", f64::from(n) / f64::from(d)));
                    mids.push(format!("{head}X{dec}"));
                    if let Some(bare) = dec.strip_prefix('0') {
                        mids.push(format!("{head}X{bare}"));
                    }
                }
            }
        }
    }
    for p in &spellings.patterns {
        let k = normalised_string(&p.replace("{mid}", mid));
        if !k.is_empty() && !out.contains(&k) {
            out.push(k);
        }
    }
    for (t, mid) in trails
        .iter()
        .flat_map(|t| mids.iter().map(move |m| (t.as_str(), m.as_str())))
    {
        for k in [
            format!("{lead}{mid}{t}"),
            format!("{t}{mid}{lead}"),
            format!("{lead}{t}{mid}"),
            format!("{t}{lead}{mid}"),
            format!("{mid}{lead}{t}"),
            format!("{mid}{t}{lead}"),
        ] {
            if !out.contains(&k) {
                out.push(k);
            }
        }
    }
    out
}

/// The parsed directives of a data file.
struct Directives {
    series: &'static str,
    shape: &'static str,
    make: &'static str,
    units: &'static str,
    corners: &'static str,
    wall: &'static str,
    spellings: Spellings,
}

/// Other spellings of a series' designations.
#[derive(Clone, Default)]
struct Spellings {
    /// Alternatives for the trailing letters (`@tokens`).
    tokens: Vec<&'static str>,
    /// Other names with `{mid}` for the numbers (`@aliases`).
    patterns: Vec<&'static str>,
}

fn load() -> Catalogue {
    let mut cat = Catalogue {
        entries: Vec::new(),
        series: Vec::new(),
        index: Index::default(),
        keys: Vec::new(),
        problems: Vec::new(),
        built: Vec::new(),
    };
    let mut tokens_of = Vec::new();
    for (file, text) in FILES {
        let first = cat.entries.len();
        match parse_file(file, text, &mut cat.entries, &mut cat.problems) {
            Some((series, spellings)) => {
                let mut series = series;
                series.first = first;
                series.end = cat.entries.len();
                for _ in first..cat.entries.len() {
                    tokens_of.push(spellings.clone());
                }
                cat.series.push(series);
            }
            None => cat.entries.truncate(first),
        }
    }
    // Canonical keys first, so an alias never shadows a designation.
    for (i, e) in cat.entries.iter().enumerate() {
        let key = normalised_string(e.designation);
        if let Some(&other) = cat.index.get(key.as_str()) {
            let other = cat.entries.get(other).map_or("?", |o| o.designation);
            cat.problems.push(format!(
                "designation \"{}\" ({}) has the same key as \"{other}\"",
                e.designation, e.series
            ));
        } else {
            cat.index.insert(key.clone().into_boxed_str(), i);
        }
        cat.keys.push(key);
    }
    for (i, key) in cat.keys.iter().enumerate() {
        let none = Spellings::default();
        let spellings = tokens_of.get(i).unwrap_or(&none);
        // The designation exactly as published, for a lookup without
        // normalising (the usual case: a member file written by the app).
        let published = cat.entries.get(i).map(|e| e.designation.to_string());
        for alias in published.into_iter().chain(aliases(key, spellings)) {
            match cat.index.get(alias.as_str()) {
                Some(&j) if j != i => {
                    let a = cat.entries.get(i).map_or("?", |e| e.designation);
                    let b = cat.entries.get(j).map_or("?", |e| e.designation);
                    cat.problems.push(format!(
                        "spelling \"{alias}\" of \"{a}\" is taken by \"{b}\""
                    ));
                }
                Some(_) => {}
                None => {
                    cat.index.insert(alias.into_boxed_str(), i);
                }
            }
        }
    }
    cat.built = cat.entries.iter().map(|_| OnceLock::new()).collect();
    cat
}

fn parse_file(
    file: &'static str,
    text: &'static str,
    entries: &mut Vec<Entry>,
    problems: &mut Vec<String>,
) -> Option<(Series, Spellings)> {
    let mut source = String::new();
    let mut d = Directives {
        series: "",
        shape: "",
        make: "",
        units: "",
        corners: "",
        wall: "nominal",
        spellings: Spellings::default(),
    };
    let mut header: Option<Vec<&'static str>> = None;
    for (n, line) in text.lines().enumerate() {
        let line_no = n + 1;
        let line = line.trim();
        if line.is_empty() {
            continue;
        }
        if let Some(comment) = line.strip_prefix('#') {
            if header.is_none() {
                if !source.is_empty() {
                    source.push('\n');
                }
                source.push_str(comment.trim());
            }
            continue;
        }
        if let Some(directive) = line.strip_prefix('@') {
            let (name, value) = directive.split_once(' ').unwrap_or((directive, ""));
            let value = value.trim();
            match name {
                "series" => d.series = value,
                "shape" => d.shape = value,
                "make" => d.make = value,
                "units" => d.units = value,
                "corners" => d.corners = value,
                "wall" => d.wall = value,
                "tokens" => d.spellings.tokens = value.split('|').map(str::trim).collect(),
                "aliases" => {
                    d.spellings.patterns = value.split('|').map(str::trim).collect();
                }
                _ => problems.push(format!(
                    "{file}.csv line {line_no}: unknown directive @{name}"
                )),
            }
            continue;
        }
        let cells: Vec<&'static str> = line.split(',').map(str::trim).collect();
        match &header {
            None => header = Some(cells),
            Some(h) => match parse_row(&d, h, &cells) {
                Ok(entry) => entries.push(entry),
                Err(why) => problems.push(format!("{file}.csv line {line_no}: {why}")),
            },
        }
    }
    let family = match d.shape {
        "i" => Family::I,
        "rhs" => Family::Rhs,
        "chs" => Family::Chs,
        other => {
            problems.push(format!("{file}.csv: unknown @shape \"{other}\""));
            return None;
        }
    };
    if d.series.is_empty() {
        problems.push(format!("{file}.csv: no @series"));
        return None;
    }
    Some((
        Series {
            name: d.series,
            file,
            family,
            source,
            units: d.units,
            first: 0,
            end: 0,
        },
        d.spellings,
    ))
}

fn parse_row(
    d: &Directives,
    header: &[&str],
    cells: &[&'static str],
) -> std::result::Result<Entry, String> {
    if cells.len() != header.len() {
        return Err(format!(
            "{} cells where the header names {}",
            cells.len(),
            header.len()
        ));
    }
    let designation = cells.first().copied().unwrap_or("");
    if designation.is_empty() {
        return Err("no designation".into());
    }
    let num = |name: &str| -> std::result::Result<f64, String> {
        let i = header
            .iter()
            .position(|h| *h == name)
            .ok_or_else(|| format!("{designation}: no column {name}"))?;
        let cell = cells.get(i).copied().unwrap_or("");
        let v: f64 = crate::decimal::parse(cell)
            .ok_or_else(|| format!("{designation}: {name} \"{cell}\" is not a number"))?;
        if v.is_finite() && v > 0.0 {
            Ok(v)
        } else {
            Err(format!("{designation}: {name} must be positive"))
        }
    };
    let has = |name: &str| header.contains(&name);
    // Scale factors from the file's units to mm, mm2, mm4, kg/m.
    let (len, area, inertia, mass) = match d.units {
        "metric" => (1.0, 100.0, 1.0e4, 1.0),
        "imperial" => (
            MM_PER_IN,
            MM_PER_IN * MM_PER_IN,
            MM_PER_IN.powi(4),
            KG_M_PER_LB_FT,
        ),
        other => return Err(format!("unknown @units \"{other}\"")),
    };
    let hollow_make = match d.make {
        "hot-finished" => HollowMake::HotFinished,
        "cold-formed" => HollowMake::ColdFormed,
        _ => HollowMake::HotFinished,
    };
    // The wall the section uses, from the nominal wall.
    let design_wall = |t_nom: f64| -> std::result::Result<(f64, Option<f64>), String> {
        match d.wall {
            "nominal" => Ok((t_nom, None)),
            "aisc-erw" => Ok((AISC_ERW_DESIGN_WALL * t_nom, Some(t_nom))),
            other => Err(format!("unknown @wall \"{other}\"")),
        }
    };
    let (spec, nominal_wall_mm, i_major, i_minor) = match d.shape {
        "i" => {
            let tf = num("tf")?;
            let r = if has("k_des") {
                num("k_des")? - tf
            } else {
                num("r")?
            };
            let spec = SectionSpec::I(IShape {
                depth_mm: num("h")? * len,
                width_mm: num("b")? * len,
                flange_mm: tf * len,
                web_mm: num("tw")? * len,
                root_radius_mm: r.max(0.0) * len,
                make: if d.make == "welded" {
                    IMake::Welded
                } else {
                    IMake::Rolled
                },
            });
            (spec, None, num("I_major")?, num("I_minor")?)
        }
        "rhs" => {
            let t_nom = num("t")? * len;
            let (t, nominal) = design_wall(t_nom)?;
            let (outer, inner) = match d.corners {
                // EN 10210-2: r_o = 1.5 t, r_i = 1.0 t.
                "en10210" => (1.5 * t, t),
                // EN 10219-2: r_o = 2 t (t <= 6), 2.5 t (6 < t <= 10), 3 t; r_i = r_o - t.
                "en10219" => {
                    let k = if t <= 6.0 {
                        2.0
                    } else if t <= 10.0 {
                        2.5
                    } else {
                        3.0
                    };
                    (k * t, (k - 1.0) * t)
                }
                // AISC Manual: outside radius 2 t_des, so inside t_des.
                "aisc" => (2.0 * t, t),
                other => return Err(format!("unknown @corners \"{other}\"")),
            };
            let spec = SectionSpec::Rhs(Rhs {
                depth_mm: num("h")? * len,
                width_mm: num("b")? * len,
                wall_mm: t,
                outer_radius_mm: outer,
                inner_radius_mm: Some(inner),
                make: hollow_make,
            });
            (spec, nominal, num("I_major")?, num("I_minor")?)
        }
        "chs" => {
            let t_nom = num("t")? * len;
            let (t, nominal) = design_wall(t_nom)?;
            let spec = SectionSpec::Chs(Chs {
                diameter_mm: num("D")? * len,
                wall_mm: t,
                make: hollow_make,
            });
            let i = num("I")?;
            (spec, nominal, i, i)
        }
        other => return Err(format!("unknown @shape \"{other}\"")),
    };
    Ok(Entry {
        series: d.series,
        designation,
        spec,
        area_mm2: num("A")? * area,
        i_major_mm4: i_major * inertia,
        i_minor_mm4: i_minor * inertia,
        mass_kg_per_m: num("mass")? * mass,
        nominal_wall_mm,
    })
}

/// The index of the entry a designation names, without allocating.
fn find(designation: &str) -> Option<usize> {
    let cat = catalogue();
    if let Some(&i) = cat.index.get(designation) {
        return Some(i);
    }
    let key = normalise(designation, false)?;
    cat.index.get(key.as_str()).copied()
}

fn unknown(designation: &str) -> Error {
    Error::UnknownDesignation {
        designation: designation.to_string(),
        suggestions: nearest(designation, 5),
    }
}

/// Finds an entry by designation.
pub fn resolve(designation: &str) -> Result<&'static Entry> {
    find(designation)
        .and_then(|i| catalogue().entries.get(i))
        .ok_or_else(|| unknown(designation))
}

/// The built section of a designation (its properties computed from the
/// dimensions once per entry and kept), with the published designation.
/// The same as building the entry's spec, without recomputing.
pub fn section(designation: &str) -> Result<Section> {
    let cat = catalogue();
    let i = find(designation).ok_or_else(|| unknown(designation))?;
    match (cat.entries.get(i), cat.built.get(i)) {
        (Some(entry), Some(slot)) => slot
            .get_or_init(|| {
                entry.spec.build().map(|mut s| {
                    s.designation = Some(entry.designation);
                    s
                })
            })
            .clone(),
        _ => Err(unknown(designation)),
    }
}

/// Builds any section spec: a catalogue reference through [`section`] (an
/// unknown designation is [`Error::UnknownDesignation`]), any other spec
/// from its dimensions.
#[inline]
pub fn build(spec: &SectionSpec) -> Result<Section> {
    match spec {
        SectionSpec::Catalogue(c) => section(&c.designation),
        other => other.build(),
    }
}

/// [`build`] into `slot`, borrowed back ([`SectionSpec::build_in`]).
#[inline]
pub fn build_in<'s>(spec: &SectionSpec, slot: &'s mut Option<Section>) -> Result<&'s Section> {
    match spec {
        SectionSpec::Catalogue(c) => Ok(slot.insert(section(&c.designation)?)),
        other => other.build_in(slot),
    }
}

/// The family of any section spec, resolving a catalogue reference (an
/// unknown designation is [`Error::UnknownDesignation`]).
pub fn family(spec: &SectionSpec) -> Result<Family> {
    match spec {
        SectionSpec::Catalogue(c) => family(&resolve(&c.designation)?.spec),
        other => other.family().ok_or_else(|| unknown("")),
    }
}

/// Up to `n` designations nearest to `designation`, nearest first: the
/// smallest edit distance between normalised keys over every spelling of
/// each entry.
pub fn nearest(designation: &str, n: usize) -> Vec<String> {
    let cat = catalogue();
    let query = normalised_string(designation);
    if query.is_empty() {
        return Vec::new();
    }
    let query_numbers = numbers(&query);
    let mut best: Vec<(usize, usize)> = vec![(usize::MAX, usize::MAX); cat.entries.len()];
    for (key, &i) in &cat.index {
        let dist = crate::names::edit_distance(query.as_bytes(), key.as_bytes());
        if let Some(slot) = best.get_mut(i) {
            if dist < slot.0 {
                *slot = (dist, i);
            }
        }
    }
    // Equal edit distances are ordered by how close the numbers are
    // (sum of |ln(a / b)| over the dimensions), so "W10x50" suggests
    // "W10x54" before "W10x30".
    let closeness = |i: usize| -> f64 {
        let Some(key) = cat.keys.get(i) else {
            return f64::INFINITY;
        };
        let theirs = numbers(key);
        if theirs.len() != query_numbers.len() {
            return f64::INFINITY;
        }
        query_numbers
            .iter()
            .zip(&theirs)
            .map(|(a, b)| (a / b).ln().abs())
            .sum::<f64>()
    };
    let mut ranked: Vec<(usize, f64, usize)> = best
        .into_iter()
        .filter(|&(dist, _)| dist != usize::MAX)
        .map(|(dist, i)| (dist, closeness(i), i))
        .collect();
    ranked.sort_by(|a, b| a.0.cmp(&b.0).then(a.1.total_cmp(&b.1)).then(a.2.cmp(&b.2)));
    ranked
        .into_iter()
        .take(n)
        .filter_map(|(_, _, i)| cat.entries.get(i).map(|e| e.designation.to_string()))
        .collect()
}

/// The positive numbers in a normalised key ("HSS6X6X1/4" gives 6, 6, 1, 4).
fn numbers(key: &str) -> Vec<f64> {
    key.split(|c: char| !(c.is_ascii_digit() || c == '.'))
        .filter_map(crate::decimal::parse)
        .filter(|v| *v > 0.0)
        .collect()
}

/// Every entry, series by series in file order.
pub fn entries() -> &'static [Entry] {
    &catalogue().entries
}

/// Every series.
pub fn series() -> &'static [Series] {
    &catalogue().series
}

/// Problems found while reading the data files (malformed rows, spellings
/// shared by two entries). Empty for a sound build; a test checks it.
pub fn problems() -> &'static [String] {
    &catalogue().problems
}

/// Finds a series by name, forgivingly: "HE B", "heb", "HEB", "shs-en10210",
/// "SHS EN 10210" all match.
pub fn find_series(name: &str) -> Option<&'static Series> {
    let query = normalised_string(name);
    if query.is_empty() {
        return None;
    }
    series()
        .iter()
        .find(|s| normalised_string(s.name) == query || normalised_string(s.file) == query)
}

/// Every entry of a shape family, across series.
pub fn family_entries(family: Family) -> Vec<&'static Entry> {
    entries()
        .iter()
        .filter(|e| e.spec.family() == Some(family))
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn data_files_read_without_problems() {
        assert!(problems().is_empty(), "{:#?}", problems());
        assert_eq!(series().len(), FILES.len());
        for s in series() {
            assert!(!s.entries().is_empty(), "{} has no entries", s.name);
            assert!(s.source.contains("recalled from memory"), "{}", s.name);
        }
    }

    #[test]
    fn normalise_forgives_case_spaces_and_crosses() {
        let n = |s: &str| normalise(s, false).unwrap().as_str().to_string();
        assert_eq!(n("HE 200 B"), "HE200B");
        assert_eq!(n("he200b"), "HE200B");
        assert_eq!(n("203 × 203 × 46 UC"), "203X203X46UC");
        assert_eq!(n("SHS 100x100x5.0"), "SHS100X100X5");
        assert_eq!(n("100*100*6,30 SHS"), "100X100X6.3SHS");
        assert_eq!(n("HSS6.625X0.500"), "HSS6.625X0.5");
        assert_eq!(n("HSS6x6x1/4"), "HSS6X6X1/4");
        assert_eq!(n("CHS 168.30 x 8.00"), "CHS168.3X8");
        assert_eq!(n("CHS 10.05x2"), "CHS10.05X2");
        assert!(normalise("HE 200 B ☃", false).is_none());
        assert!(normalise(&"9".repeat(KEY_CAPACITY + 1), false).is_none());
    }

    #[test]
    fn resolve_accepts_the_usual_spellings() {
        let d = |s: &str| resolve(s).unwrap().designation;
        for s in ["HE 200 B", "HEB200", "HE200B", "heb 200", "HE-200-B"] {
            assert_eq!(d(s), "HE 200 B", "{s}");
        }
        for s in [
            "203x203x46UC",
            "UC 203x203x46",
            "203 X 203 X 46 uc",
            "203×203×46 UC",
        ] {
            assert_eq!(d(s), "203x203x46 UC", "{s}");
        }
        assert_eq!(d("W10X49"), "W10x49");
        assert_eq!(d("w 14 x 730"), "W14x730");
        assert_eq!(d("SHS 100x100x5"), "SHS 100x100x5");
        assert_eq!(d("100x100x5 SHS"), "SHS 100x100x5");
        assert_eq!(d("100x100x5.0 SHS"), "SHS 100x100x5");
        assert_eq!(d("SHS 100x100x5 EN 10210"), "SHS 100x100x5");
        assert_eq!(d("SHS 100x100x5 EN 10219"), "SHS 100x100x5 CF");
        assert_eq!(d("CF SHS 100x100x5"), "SHS 100x100x5 CF");
        assert_eq!(d("HSS6x6x1/4"), "HSS6x6x1/4");
        assert_eq!(d("HSS 6 x 6 x 1/4"), "HSS6x6x1/4");
        assert_eq!(d("HSS6x6x0.25"), "HSS6x6x1/4");
        assert_eq!(d("HSS 6x6x.250"), "HSS6x6x1/4");
        assert_eq!(d("HSS8x8x5/16"), "HSS8x8x5/16");
        assert_eq!(d("HSS8x8x0.3125"), "HSS8x8x5/16");
        assert_eq!(d("HSS16.000x0.500"), "HSS16.000x0.500");
        assert_eq!(d("HSS16x0.5"), "HSS16.000x0.500");
        assert_eq!(d("CHS 168.3x8.0"), "CHS 168.3x8");
        assert_eq!(d("168.3x8 CHS CF"), "CHS 168.3x8 CF");
        assert_eq!(d("RHS 200x100x8"), "RHS 200x100x8");
        assert_eq!(d("200 x 100 x 8.0 RHS"), "RHS 200x100x8");
        assert_eq!(d("IPE 300"), "IPE 300");
        assert_eq!(d("IPB 300"), "HE 300 B");
        assert_eq!(d("IPBl 300"), "HE 300 A");
        assert_eq!(d("IPBv300"), "HE 300 M");
        assert_eq!(d("ipe300"), "IPE 300");
    }

    #[test]
    fn unknown_designation_suggests_nearest() {
        match resolve("HE 210 B") {
            Err(Error::UnknownDesignation {
                designation,
                suggestions,
            }) => {
                assert_eq!(designation, "HE 210 B");
                assert!(!suggestions.is_empty() && suggestions.len() <= 5);
                assert!(
                    suggestions
                        .iter()
                        .any(|s| s == "HE 200 B" || s == "HE 220 B"),
                    "{suggestions:?}"
                );
            }
            other => panic!("expected UnknownDesignation, got {other:?}"),
        }
        match resolve("W10x50") {
            Err(Error::UnknownDesignation { suggestions, .. }) => {
                assert_eq!(suggestions.first().map(String::as_str), Some("W10x54"));
            }
            other => panic!("{other:?}"),
        }
        match resolve("") {
            Err(Error::UnknownDesignation { suggestions, .. }) => assert!(suggestions.is_empty()),
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn units_are_converted_to_mm() {
        let w = resolve("W14x90").unwrap();
        // 26.5 in2 = 26.5 * 645.16 mm2.
        assert!((w.area_mm2 - 26.5 * 645.16).abs() < 1e-6);
        // 90 lb/ft = 133.9 kg/m.
        assert!((w.mass_kg_per_m - 133.93).abs() < 0.01);
        match &w.spec {
            SectionSpec::I(s) => {
                assert!((s.depth_mm - 355.6).abs() < 1e-9);
                assert!((s.root_radius_mm - 0.60 * 25.4).abs() < 1e-9);
            }
            other => panic!("{other:?}"),
        }
        let hss = resolve("HSS6x6x1/4").unwrap();
        assert_eq!(hss.nominal_wall_mm, Some(6.35));
        match &hss.spec {
            SectionSpec::Rhs(s) => {
                assert!((s.wall_mm - 0.93 * 6.35).abs() < 1e-9);
                assert!((s.outer_radius_mm - 2.0 * 0.93 * 6.35).abs() < 1e-9);
            }
            other => panic!("{other:?}"),
        }
        let cf = resolve("SHS 200x200x8 CF").unwrap();
        match &cf.spec {
            SectionSpec::Rhs(s) => {
                assert_eq!(s.outer_radius_mm, 20.0);
                assert_eq!(s.inner_radius_mm, Some(12.0));
            }
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn cached_section_equals_a_fresh_build() {
        for name in [
            "HE 200 B",
            "heb200",
            "W14x90",
            "SHS 100x100x5 CF",
            "HSS6x6x1/4",
        ] {
            let entry = resolve(name).unwrap();
            let mut fresh = entry.spec.build().unwrap();
            fresh.designation = Some(entry.designation);
            assert_eq!(section(name).unwrap(), fresh, "{name}");
            assert_eq!(section(name).unwrap(), fresh, "{name} (cached)");
        }
        assert!(matches!(
            section("HE 201 B"),
            Err(Error::UnknownDesignation { .. })
        ));
    }

    #[test]
    fn series_match_forgivingly() {
        assert_eq!(find_series("HE B").unwrap().name, "HE B");
        assert_eq!(find_series("heb").unwrap().name, "HE B");
        assert_eq!(find_series("shs-en10210").unwrap().name, "SHS EN 10210");
        assert_eq!(find_series("SHS EN 10219").unwrap().name, "SHS EN 10219");
        assert!(find_series("HE Q").is_none());
        assert!(find_series("").is_none());
    }

    proptest::proptest! {
        // Each refusal computes suggestions over every spelling, so the case
        // count is kept modest for the debug-build test run.
        #![proptest_config(proptest::prelude::ProptestConfig::with_cases(64))]

        #[test]
        fn any_text_resolves_or_is_refused_without_panic(text in "\\PC{0,40}") {
            match resolve(&text) {
                Ok(e) => {
                    // A hit is a spelling of that entry: same normalised key
                    // as one of its spellings, so resolving its published
                    // designation gives the same entry.
                    proptest::prop_assert_eq!(resolve(e.designation).ok(), Some(e));
                }
                Err(Error::UnknownDesignation { designation, suggestions }) => {
                    proptest::prop_assert_eq!(designation, text);
                    proptest::prop_assert!(suggestions.len() <= 5);
                }
                Err(other) => proptest::prop_assert!(false, "{other:?}"),
            }
        }

        #[test]
        fn spacing_and_case_never_change_the_entry(i in 0usize..600, upper in proptest::bool::ANY, gaps in 0usize..3) {
            let all = entries();
            let e = &all[i % all.len()];
            // Spaces where one token ends and the next starts (letters
            // against digits), as people type them.
            let mut text = String::new();
            let mut prev: Option<char> = None;
            for c in e.designation.chars() {
                if let Some(p) = prev {
                    if p.is_ascii_digit() != c.is_ascii_digit()
                        && p.is_ascii_alphanumeric()
                        && c.is_ascii_alphanumeric()
                    {
                        text.extend(std::iter::repeat_n(' ', gaps));
                    }
                }
                text.push(c);
                prev = Some(c);
            }
            text = if upper { text.to_uppercase() } else { text.to_lowercase() };
            proptest::prop_assert_eq!(resolve(&text).map(|r| r.designation), Ok(e.designation));
        }
    }
}
