//! What the calc sheet needs besides the result: the member's inputs in
//! the chosen units and today's date. The sheet itself is built as text by
//! [`crate::report::sheet_html`], shown on screen as a preview and printed
//! by the browser (`@media print` in `style.css` hides everything else and
//! breaks the page between members).

use serde_json::Value;
use strutline_core::units::{self, UnitSystem};
use strutline_core::Member;
use web_sys::js_sys;

use crate::numtext::for_input;

/// The member's inputs as (member-file key, value with unit), in the
/// member file's order, shown in `system`'s units.
pub fn inputs(system: UnitSystem, m: &Member) -> Vec<(String, String)> {
    let mut out = Vec::new();
    // Written once by the member file's pretty writer (`"key": value`)
    // and read back as a value.
    let text = serde_json::to_string_pretty(m).unwrap_or_default();
    if let Ok(v) = serde_json::from_str::<Value>(&text) {
        flatten(system, &v, &mut out);
    }
    // A JSON object's keys come back sorted; put them back in the member
    // file's own order (the order the text has them in).
    out.sort_by_key(|(k, _)| text.find(&format!("\"{k}\":")).unwrap_or(usize::MAX));
    out
}

fn flatten(system: UnitSystem, v: &Value, out: &mut Vec<(String, String)>) {
    let Some(obj) = v.as_object() else {
        return;
    };
    for (k, v) in obj {
        let text = match v {
            Value::Object(_) => {
                flatten(system, v, out);
                continue;
            }
            Value::Null => continue,
            Value::Number(n) => {
                let x = n.as_f64().unwrap_or(f64::NAN);
                let (d, u) = if system == UnitSystem::Si {
                    (x, "")
                } else {
                    units::key_to_display(system, k, x)
                };
                let t = if u.is_empty() {
                    for_input(d)
                } else {
                    format!("{} {u}", units::format_display(d, 5))
                };
                t.trim().to_string()
            }
            Value::String(s) => s.clone(),
            other => other.to_string(),
        };
        out.push((k.clone(), text));
    }
}

/// Today's date, ISO 8601.
pub fn today() -> String {
    let s: String = js_sys::Date::new_0().to_iso_string().into();
    s.chars().take(10).collect()
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;
    use crate::demo::demo_lists;

    fn get<'a>(v: &'a [(String, String)], k: &str) -> &'a str {
        &v.iter().find(|(key, _)| key == k).unwrap().1
    }

    #[test]
    fn inputs_in_both_systems() {
        let m = demo_lists()[0].members[0].clone();
        let si = inputs(UnitSystem::Si, &m);
        assert_eq!(get(&si, "id"), m.id);
        assert_eq!(get(&si, "length_mm"), for_input(m.length_mm));
        assert_eq!(get(&si, "depth_mm"), for_input(140.0));
        assert!(!si.iter().any(|(k, _)| k == "section" || k == "material"));
        let us = inputs(UnitSystem::Us, &m);
        // 2800 mm / 304.8 mm per ft (exact) = 9.1864 ft; 140 mm / 25.4 = 5.5118 in.
        assert_eq!(get(&us, "length_mm"), "9.1864 ft");
        assert_eq!(get(&us, "depth_mm"), "5.5118 in");
        assert_eq!(get(&us, "id"), m.id);
    }
}
