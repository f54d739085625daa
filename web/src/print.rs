//! The calc sheet: a printable calculation of the open list: a summary
//! table, then one page for each member with its inputs, the result, every
//! step of the working with its clause, the warnings, and the caution.
//!
//! Shown on screen as a preview and printed by the browser (`@media print`
//! in `style.css` hides everything else and breaks the page between members).

use std::sync::Arc;

use leptos::prelude::*;
use serde_json::Value;
use strutline_core::units::{self, UnitSystem};
use strutline_core::{Member, CAUTION};
use web_sys::js_sys;

use crate::checks::Checked;
use crate::numtext::{for_input, working};
use crate::status::{status_text, utilisation_text};
use crate::units_view::{self, result_text};

/// The member's inputs as (member-file key, value with unit), in the
/// member file's order, shown in `system`'s units.
pub fn inputs(system: UnitSystem, m: &Member) -> Vec<(String, String)> {
    let mut out = Vec::new();
    if let Ok(v) = serde_json::to_value(m) {
        flatten(system, &v, &mut out);
    }
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
fn today() -> String {
    let s: String = js_sys::Date::new_0().to_iso_string().into();
    s.chars().take(10).collect()
}

/// The sheet: `title` of the list, its checks, the chart image of the
/// selected member (id, data URL) and the view of one member's result.
#[component]
pub fn CalcSheet(
    title: String,
    checks: Vec<Arc<Checked>>,
    chart: Option<(String, String)>,
    body: fn(&Checked) -> AnyView,
    close: Callback<()>,
) -> impl IntoView {
    let sys = units_view::current();
    let date = today();
    let head = format!("{title} · {date}");
    let rows = checks
        .iter()
        .map(|c| {
            let rd = c
                .outcome
                .as_ref()
                .map_or("—".into(), |r| result_text(sys, "kN", r.resistance_kn, 1));
            view! {
                <tr>
                    <th scope="row">{c.member.id.clone()}</th>
                    <td>{c.member.section.describe()}</td>
                    <td>{result_text(sys, "kN", c.member.axial_kn, 1)}</td>
                    <td>{rd}</td>
                    <td>{utilisation_text(&c.outcome)}</td>
                    <td>{status_text(&c.outcome)}</td>
                </tr>
            }
        })
        .collect::<Vec<_>>();
    let pages = checks
        .iter()
        .map(|c| {
            let img = chart
                .as_ref()
                .filter(|(id, _)| *id == c.member.id)
                .map(|(_, url)| view! { <img class="sheet-chart" src=url.clone() alt="Capacity envelope" /> });
            let (l, lu) = units_view::shown(sys, "mm", c.member.length_mm, true);
            view! {
                <section class="sheet-page" data-testid="sheet-page">
                    <h2>{format!("Member {}", c.member.id)}</h2>
                    <p class="sheet-meta">{format!("{head} · L = {} {lu}", working(l))}</p>
                    <h3>"Inputs"</h3>
                    <dl class="sheet-inputs">
                        {inputs(sys, &c.member).into_iter().map(|(k, v)| view! { <dt>{k}</dt><dd>{v}</dd> }).collect::<Vec<_>>()}
                    </dl>
                    {body(c)}
                    {img}
                    <p class="caution">"⚠ " {CAUTION}</p>
                </section>
            }
        })
        .collect::<Vec<_>>();
    view! {
        <div class="calc-sheet" data-testid="calc-sheet">
            <div class="button-row screen-only">
                <button type="button" data-testid="print" on:click=move |_| {
                    if let Some(w) = web_sys::window() { let _ = w.print(); }
                }>"⎙ Print"</button>
                <button type="button" on:click=move |_| close.run(())>"Close the sheet"</button>
            </div>
            <section class="sheet-page">
                <h2>"Calculation: " {title.clone()}</h2>
                <p class="sheet-meta">{format!("{date} · {} members", checks.len())}</p>
                <table class="sheet-summary">
                    <thead><tr><th>"member"</th><th>"section"</th><th>"N_Ed"</th><th>"N_Rd"</th><th>"utilisation"</th><th>"status"</th></tr></thead>
                    <tbody>{rows}</tbody>
                </table>
                <p class="caution">"⚠ " {CAUTION}</p>
            </section>
            {pages}
        </div>
    }
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
