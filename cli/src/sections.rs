//! `strutline sections [--series NAME] [--family i|rhs|chs] [--json]`: the
//! catalogue's entries with the properties the engine computes from their
//! dimensions, beside the tabulated mass.
//!
//! Series names are matched forgivingly ("HE B", "heb", "shs-en10210"); an
//! unknown one lists the known series and exits with status 2.

use serde_json::{json, Value};
use strutline_core::catalogue::{self, Entry};
use strutline_core::section::Family;

/// The known series, for messages.
pub fn known_series() -> String {
    catalogue::series()
        .iter()
        .map(|s| format!("\"{}\" ({} sections)", s.name, s.entries().len()))
        .collect::<Vec<_>>()
        .join(", ")
}

/// Parses a family name.
pub fn family(name: &str) -> Option<Family> {
    match name.trim().to_ascii_lowercase().as_str() {
        "i" | "h" | "i/h" => Some(Family::I),
        "rhs" | "shs" | "hss" | "box" => Some(Family::Rhs),
        "chs" | "tube" | "pipe" => Some(Family::Chs),
        _ => None,
    }
}

/// The options that name candidate sections (`sections` and `size`).
#[derive(Debug, Clone, Default, clap::Args)]
pub struct Candidates {
    /// A catalogue series, matched forgivingly ("HE B", "heb", "shs-en10210")
    #[arg(long, value_name = "NAME")]
    pub series: Option<String>,
    /// A family of shapes: i, rhs or chs
    #[arg(long, value_name = "F")]
    pub family: Option<String>,
}

/// `strutline sections`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    #[command(flatten)]
    pub candidates: Candidates,
    /// Write the sections as JSON instead of a table
    #[arg(long)]
    pub json: bool,
}

/// A selection of entries: a label and the entries.
pub struct Selection {
    /// "HE B" or "family rhs".
    pub label: String,
    /// The entries, in catalogue order.
    pub entries: Vec<&'static Entry>,
}

/// Selects entries by series and/or family. `Err` carries the message for
/// an unknown name (the caller exits with 2).
pub fn select(series: Option<&str>, family_name: Option<&str>) -> Result<Selection, String> {
    let fam = match family_name {
        None => None,
        Some(f) => Some(family(f).ok_or_else(|| {
            format!("unknown family \"{f}\"; known families: \"i\", \"rhs\", \"chs\"")
        })?),
    };
    let (label, entries): (String, Vec<&'static Entry>) = match series {
        Some(name) => {
            let s = catalogue::find_series(name).ok_or_else(|| {
                format!(
                    "unknown series \"{name}\"; known series: {}",
                    known_series()
                )
            })?;
            (s.name.to_string(), s.entries().iter().collect())
        }
        None => (
            "all series".to_string(),
            catalogue::entries().iter().collect(),
        ),
    };
    let entries: Vec<&'static Entry> = match fam {
        Some(f) => entries
            .into_iter()
            .filter(|e| e.spec.family() == Some(f))
            .collect(),
        None => entries,
    };
    let label = match (series, family_name) {
        (None, Some(f)) => format!("family {}", f.to_ascii_lowercase()),
        (Some(_), Some(f)) => format!("{label}, family {}", f.to_ascii_lowercase()),
        _ => label,
    };
    Ok(Selection { label, entries })
}

fn family_key(f: Family) -> &'static str {
    match f {
        Family::I => "i",
        Family::Rhs => "rhs",
        Family::Chs => "chs",
        Family::Angle => "angle",
        Family::Channel => "channel",
        Family::Tee => "tee",
        Family::Rect => "rect",
        Family::Round => "round",
        Family::Given => "given",
    }
}

/// Sets `key` of a JSON object (does nothing to another value).
pub fn put(v: &mut Value, key: &str, value: Value) {
    if let Some(map) = v.as_object_mut() {
        map.insert(key.to_string(), value);
    }
}

fn entry_json(e: &Entry) -> Value {
    let mut v = json!({
        "designation": e.designation,
        "series": e.series,
        "family": e.spec.family().map(family_key),
        "tabulated": {
            "area_mm2": e.area_mm2,
            "i_major_mm4": e.i_major_mm4,
            "i_minor_mm4": e.i_minor_mm4,
            "mass_kg_per_m": e.mass_kg_per_m,
        },
    });
    if let Some(t) = e.nominal_wall_mm {
        put(&mut v, "nominal_wall_mm", json!(t));
    }
    match e.spec.build() {
        Ok(s) => {
            let p = s.props;
            put(&mut v, "area_mm2", json!(p.area_mm2));
            put(&mut v, "i_major_mm4", json!(p.i_major_mm4));
            put(&mut v, "i_minor_mm4", json!(p.i_minor_mm4));
            put(&mut v, "r_major_mm", json!(p.r_major_mm));
            put(&mut v, "r_minor_mm", json!(p.r_minor_mm));
            put(&mut v, "mass_kg_per_m", json!(p.mass_kg_per_m));
        }
        Err(err) => put(&mut v, "error", json!(err.to_string())),
    }
    v
}

fn table(entries: &[&Entry]) -> String {
    let name_w = entries
        .iter()
        .map(|e| e.designation.chars().count())
        .max()
        .unwrap_or(0)
        .max("designation".len());
    let series_w = entries
        .iter()
        .map(|e| e.series.len())
        .max()
        .unwrap_or(0)
        .max("series".len());
    let mut out = format!(
        "{:<name_w$}  {:<series_w$}  {:>9}  {:>11}  {:>11}  {:>8}  {:>8}  {:>8}  {:>8}\n",
        "designation", "series", "A", "I major", "I minor", "r major", "r minor", "mass", "table"
    );
    out.push_str(&format!(
        "{:<name_w$}  {:<series_w$}  {:>9}  {:>11}  {:>11}  {:>8}  {:>8}  {:>8}  {:>8}\n",
        "", "", "mm2", "10^6 mm4", "10^6 mm4", "mm", "mm", "kg/m", "kg/m"
    ));
    for e in entries {
        match e.spec.build() {
            Ok(s) => {
                let p = s.props;
                out.push_str(&format!(
                    "{:<name_w$}  {:<series_w$}  {:>9.0}  {:>11.3}  {:>11.3}  {:>8.1}  {:>8.1}  {:>8.1}  {:>8.1}\n",
                    e.designation,
                    e.series,
                    p.area_mm2,
                    p.i_major_mm4 / 1e6,
                    p.i_minor_mm4 / 1e6,
                    p.r_major_mm,
                    p.r_minor_mm,
                    p.mass_kg_per_m,
                    e.mass_kg_per_m
                ));
            }
            Err(err) => out.push_str(&format!(
                "{:<name_w$}  {:<series_w$}  cannot compute: {err}\n",
                e.designation, e.series
            )),
        }
    }
    out
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let json_out = args.json;
    let (series, family_name) = (
        args.candidates.series.as_deref(),
        args.candidates.family.as_deref(),
    );
    let selection = match select(series, family_name) {
        Ok(s) => s,
        Err(message) => {
            crate::note(&format!("strutline: {message}"));
            return Ok(2);
        }
    };
    if json_out {
        let sections: Vec<Value> = selection.entries.iter().map(|e| entry_json(e)).collect();
        let doc = json!({ "sections": sections });
        let mut text = serde_json::to_string_pretty(&doc).map_err(|e| e.to_string())?;
        text.push('\n');
        crate::emit(&text)?;
    } else {
        let mut text = table(&selection.entries);
        if selection
            .entries
            .iter()
            .any(|e| e.nominal_wall_mm.is_some())
        {
            text.push_str(
                "HSS: A, I, r and mass use the design wall t_des = 0.93 t_nom (AISC 360-16 B4.2); \
                 the tabulated weight uses t_nom\n",
            );
        }
        text.push_str(&format!(
            "{} sections ({}); A, I and r computed from the dimensions, \"table\" is the tabulated mass\n",
            selection.entries.len(),
            selection.label
        ));
        crate::emit(&text)?;
    }
    Ok(0)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn selects_series_and_families_forgivingly() {
        assert_eq!(select(Some("heb"), None).unwrap().entries.len(), 24);
        assert_eq!(select(Some("HE B"), None).unwrap().label, "HE B");
        let chs = select(None, Some("CHS")).unwrap();
        assert!(chs
            .entries
            .iter()
            .all(|e| e.spec.family() == Some(Family::Chs)));
        assert_eq!(chs.entries.len(), 11 + 68 + 68);
        let all = select(None, None).unwrap();
        assert_eq!(all.entries.len(), catalogue::entries().len());
        let err = select(Some("HE Q"), None).err().unwrap();
        assert!(
            err.contains("unknown series \"HE Q\"") && err.contains("\"HE B\""),
            "{err}"
        );
        assert!(select(None, Some("zed")).is_err());
    }

    #[test]
    fn table_and_json_carry_computed_and_tabulated_values() {
        let sel = select(Some("IPE"), None).unwrap();
        let text = table(&sel.entries);
        assert_eq!(text.lines().count(), 2 + 18);
        let row = text.lines().find(|l| l.starts_with("IPE 300 ")).unwrap();
        // IPE 300: computed A about 5381 mm2, tabulated mass 42.2 kg/m.
        assert!(row.contains("538"), "{row}");
        assert!(row.trim_end().ends_with("42.2"), "{row}");
        let v = entry_json(catalogue::resolve("IPE 300").unwrap());
        assert_eq!(v["designation"], "IPE 300");
        assert_eq!(v["family"], "i");
        let a = v["area_mm2"].as_f64().unwrap();
        assert!((a / 5380.0 - 1.0).abs() < 0.01, "{a}");
        assert_eq!(v["tabulated"]["mass_kg_per_m"], 42.2);
        assert!(v.get("error").is_none());
    }

    #[test]
    fn run_refuses_unknown_series() {
        let args = |series: &str| Args {
            candidates: Candidates {
                series: Some(series.into()),
                family: None,
            },
            json: false,
        };
        assert_eq!(run(&args("nothing")), Ok(2));
    }
}
