//! Writing members as CSV.

use serde_json::{Map, Value};

use super::keys::*;
use crate::file::{self, MemberFile};
use crate::member::schema as member_schema;
use crate::member::Member;
use crate::units::{self, Quantity, UnitSystem, UsUnit};

pub(super) fn cell_text(v: &Value) -> String {
    match v {
        Value::Null => String::new(),
        Value::Bool(b) => b.to_string(),
        Value::Number(n) => match n.as_f64() {
            Some(f) if n.is_f64() => format!("{f}"),
            _ => n.to_string(),
        },
        Value::String(s) => s.clone(),
        other => other.to_string(),
    }
}

pub(super) fn quote(cell: &str, is_text: bool) -> String {
    let needs = cell.contains([',', '"', '\r', '\n', ';', '\t'])
        || cell.starts_with(char::is_whitespace)
        || cell.ends_with(char::is_whitespace)
        || (is_text && cell.is_empty());
    if needs {
        format!("\"{}\"", cell.replace('"', "\"\""))
    } else {
        cell.to_string()
    }
}

/// The members as CSV with SI keys, `,` separators and CRLF line ends.
/// The title is not kept (a CSV file has none).
pub fn to_csv(file: &MemberFile) -> String {
    to_csv_in(file, UnitSystem::Si)
}

/// The member keys a CSV row does not carry: the structured values of
/// [`member::schema::MEMBER`](crate::member::schema::MEMBER)
/// (`buckling_model`).
pub fn not_in_csv() -> impl Iterator<Item = &'static str> {
    member_schema::MEMBER
        .iter()
        .filter(|k| k.value == member_schema::Value::Structure)
        .map(|k| k.key)
}

/// What [`to_csv`] leaves out of `file`, in words for the person
/// exporting ("member \"K1\": buckling_model"), or `None` when the CSV
/// carries everything. Keep the JSON file for these keys.
pub fn left_out(file: &MemberFile) -> Option<String> {
    let lost = uncarried(file);
    (!lost.is_empty()).then(|| {
        format!(
            "CSV does not carry these keys, which are left out (keep the JSON file for them): {}",
            lost.join("; ")
        )
    })
}

/// Each member of `file` with a key a CSV row does not carry, one entry a
/// member: `member "K1": buckling_model`.
pub fn uncarried(file: &MemberFile) -> Vec<String> {
    file.members
        .iter()
        .filter_map(|m| {
            let written = file::json_value(m)?;
            let keys: Vec<&str> = not_in_csv().filter(|k| written.get(k).is_some()).collect();
            (!keys.is_empty()).then(|| format!("member \"{}\": {}", m.id, keys.join(", ")))
        })
        .collect()
}

/// The US customary column for an SI key: member lengths in feet, other
/// lengths in inches, then in2, in4, in6, kip, ksi, kip-ft.
pub(super) fn us_column(key: &str) -> Option<(String, UsUnit)> {
    let unit = units::us_unit(Quantity::of_key(key)?)?;
    Some((units::si_key_to_us(key, unit)?, unit))
}

/// A member's CSV cells by column key: the member file's keys with the
/// section's and material's flattened, a group's keys (`angle_connection`,
/// `frame_major`, `frame_minor`) as `<prefix>_<key>`, and the keys CSV
/// does not carry ([`left_out`]) dropped, all as `member::schema` says.
pub fn cells(m: &Member) -> Map<String, Value> {
    let mut flat = Map::new();
    if let Some(Value::Object(obj)) = file::json_value(m) {
        for (key, value) in obj {
            match (key.as_str(), value) {
                ("section" | "material", Value::Object(inner)) => {
                    for (k2, v2) in inner {
                        flat.insert(k2, v2);
                    }
                }
                (_, value) => match member_schema::member_key(&key).map(|d| d.value) {
                    // Not carried by CSV; see [`left_out`].
                    Some(member_schema::Value::Structure) => {}
                    Some(member_schema::Value::Group { prefix, .. }) => {
                        if let Value::Object(inner) = value {
                            for (k2, v2) in inner {
                                flat.insert(format!("{prefix}_{k2}"), v2);
                            }
                        }
                    }
                    _ => {
                        flat.insert(key, value);
                    }
                },
            }
        }
    }
    flat
}

/// The columns of a CSV file and their headings in a unit system, from
/// the keys its rows use; writes the header and each row, so a long list
/// can be written a member at a time once its keys are known.
#[derive(Debug, Clone)]
pub struct Layout {
    columns: Vec<String>,
    us: Vec<Option<(String, UsUnit)>>,
}

impl Layout {
    /// The columns for rows that use the keys `used` (each once, in the
    /// order first met): the required ones and the used ones in the order
    /// of the columns (`keys::keys`), then keys this build does not list (a newer member
    /// file) at the end.
    pub fn new(used: &[&str], system: UnitSystem) -> Layout {
        let mut columns: Vec<String> = keys()
            .filter(|i| i.required || used.contains(&i.key))
            .map(|i| i.key.to_string())
            .collect();
        for key in used {
            if key_info(key).is_none() {
                columns.push((*key).to_string());
            }
        }
        let us = columns
            .iter()
            .map(|key| match system {
                UnitSystem::Us => us_column(key),
                UnitSystem::Si => None,
            })
            .collect();
        Layout { columns, us }
    }

    /// The header line (with its CRLF).
    pub fn push_header(&self, out: &mut String) {
        for (i, (key, u)) in self.columns.iter().zip(&self.us).enumerate() {
            if i > 0 {
                out.push(',');
            }
            out.push_str(u.as_ref().map_or(key.as_str(), |(h, _)| h.as_str()));
        }
        out.push_str("\r\n");
    }

    /// One row of [`cells`] (with its CRLF).
    pub fn push_row(&self, row: &Map<String, Value>, out: &mut String) {
        for (i, (key, u)) in self.columns.iter().zip(&self.us).enumerate() {
            if i > 0 {
                out.push(',');
            }
            match (row.get(key), u) {
                (None, _) => {}
                (Some(Value::Number(n)), Some((_, unit))) => match n.as_f64() {
                    Some(f) => out.push_str(&us_cell(*unit, f)),
                    None => out.push_str(&n.to_string()),
                },
                (Some(v), _) => out.push_str(&quote(&cell_text(v), matches!(v, Value::String(_)))),
            }
        }
        out.push_str("\r\n");
    }
}

/// An SI value as a US cell: the decimal of the fewest significant figures
/// (1 to 17) that the reader ([`super::read::number_cell`]) takes back to
/// the very value stored, so the CSV reads as a person writes (13.5 ft,
/// 2.5 kip for values typed in US units; 13.12335958 ft for 4000 mm, ten
/// figures, which the reader takes to the thousandth of a millimetre it
/// lies within a part in 10^9 of) and a US file round-trips exactly; where
/// no decimal of 17 figures does (a value no thousandth is near whose
/// conversion does not come back bit for bit), the shortest decimal of the
/// converted value, within a few parts in 10^16.
pub(super) fn us_cell(unit: UsUnit, si: f64) -> String {
    let v = unit.from_si(si);
    if v.is_finite() && v != 0.0 {
        // Decimals for `n` significant figures: n - 1 - floor(log10 |v|).
        let magnitude = v.abs().log10().floor() as i64;
        for n in 1..=17_i64 {
            let decimals = (n - 1 - magnitude).clamp(0, 40) as usize;
            let text = units::fixed_trimmed(v, decimals);
            let back = super::read::number_cell(&text, Some(unit), super::number::Mark::Point);
            if back.is_ok_and(|b| b == si) {
                return text;
            }
        }
    }
    format!("{v}")
}

/// The members as CSV in a unit system: [`UnitSystem::Si`] writes the
/// member file's own keys and values (exact round trip);
/// [`UnitSystem::Us`] writes each unit key in its US form (`length_ft`,
/// `depth_in`, `axial_kip`, `fy_ksi`, ...) with the value converted and
/// written to the fewest figures that read back to the stored value
/// ([`us_cell`]): exactly, or (where no decimal does) to within a few parts
/// in 10^16 (for values of ordinary magnitude, not subnormal ones).
pub fn to_csv_in(file: &MemberFile, system: UnitSystem) -> String {
    let rows: Vec<Map<String, Value>> = file.members.iter().map(cells).collect();
    // The keys used, in the order first met (a sort would add its code to
    // the wasm).
    let mut used: Vec<&str> = Vec::new();
    for key in rows.iter().flat_map(|r| r.keys()) {
        if !used.contains(&key.as_str()) {
            used.push(key);
        }
    }
    let layout = Layout::new(&used, system);
    let mut out = String::with_capacity(64 * (rows.len() + 1));
    layout.push_header(&mut out);
    for row in &rows {
        layout.push_row(row, &mut out);
    }
    out
}
