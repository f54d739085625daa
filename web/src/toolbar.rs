//! The markup of the list tools above the member list: the bar (order,
//! filters, picking), the change form for the picked members and the
//! tally. Their logic is [`crate::listops::ListTools`]'s; the controls are
//! told apart by `name` and their buttons by `data-act`, answered by the
//! list bar's delegated handlers (`app/listbar.rs`).

use std::sync::Arc;

use strutline_core::material::KNOWN_GRADES;
use strutline_core::method::Method;

use crate::checks::Checked;
use crate::html;
use crate::html::Html;
use crate::listops::ListTools;

/// Adds a labelled select of `opts` (value, text) to `out`.
fn select_html(out: &mut Html, name: &str, label: &str, opts: &[(&str, &str)]) {
    html!(
        out,
        "<label class=\"field\">{}<select name=\"{}\">",
        label,
        name
    );
    for (v, l) in opts {
        html!(out, "<option value=\"{}\">{}</option>", v, l);
    }
    out.lit("</select></label>");
}

/// The bar above the list (order, filters, picking) and the change form
/// for the picked members.
pub fn tools_html() -> (Html, Html) {
    let leave = ("", "(leave as is)");
    let mut methods = vec![("", "all")];
    methods.extend(Method::ALL.iter().map(|m| (m.key(), m.title())));
    let mut bar = Html::from_lit("<div class=\"field-grid\">");
    select_html(
        &mut bar,
        "list_order",
        "order",
        &[
            ("", "as entered"),
            ("util-down", "utilisation, high to low"),
            ("util-up", "utilisation, low to high"),
            ("id", "id"),
        ],
    );
    select_html(
        &mut bar,
        "list_status",
        "status",
        &[
            ("", "all"),
            ("holds", "✓ holds"),
            ("exceeds", "✗ exceeds"),
            ("input", "✎ needs input"),
        ],
    );
    select_html(&mut bar, "list_method", "method", &methods);
    bar.lit(
        "<label class=\"field\">find<input type=\"search\" name=\"list_text\" autocomplete=\"off\" \
         spellcheck=\"false\" placeholder=\"id, note or section\"></label></div><div class=\"button-row\">\
         <button type=\"button\" data-act=\"pick-shown\" data-v=\"\">Pick all shown</button>\
         <button type=\"button\" data-act=\"clear-picks\" data-v=\"\">Clear picks</button></div>",
    );
    let mut form = Html::from_lit(
        "<details class=\"list-change\" data-testid=\"list-change\"><summary>Change the picked members</summary>\
         <div class=\"field-grid\">",
    );
    let mut grades = vec![leave];
    grades.extend(KNOWN_GRADES.iter().map(|g| (*g, *g)));
    select_html(&mut form, "change_grade", "grade", &grades);
    if let Some(first) = methods.first_mut() {
        *first = leave;
    }
    select_html(&mut form, "change_method", "method", &methods);
    for (name, axis) in [("change_k_major", "major"), ("change_k_minor", "minor")] {
        html!(
            form,
            "<label class=\"field\">factor K, {} axis<input type=\"text\" name=\"{}\" inputmode=\"decimal\" \
             autocomplete=\"off\" placeholder=\"(leave as is)\"></label>",
            axis,
            name
        );
    }
    form.lit(
        "</div><p class=\"hint\">A factor K replaces a buckling length typed for that axis.</p>\
         <button type=\"button\" data-testid=\"apply-change\" data-act=\"apply\" data-v=\"\">Apply to the picked members</button></details>",
    );
    (bar, form)
}

/// The tally and, after a refused change, why.
pub fn status_html(t: &ListTools, checks: &[Arc<Checked>]) -> Html {
    let mut h = Html::new();
    html!(
        h,
        "<span data-testid=\"list-tally\">{}</span>",
        t.tally(checks)
    );
    if let Some(m) = &t.message {
        html!(
            h,
            "<span class=\"field-error\" data-testid=\"field-error\" role=\"alert\">✎ {}</span>",
            m
        );
    }
    h
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;
    use crate::listops::CHANGE_KEYS;

    #[test]
    fn the_bar_offers_every_choice() {
        let (bar, form) = tools_html();
        let (bar, form) = (bar.into_string(), form.into_string());
        for m in Method::ALL {
            assert!(bar.contains(&format!("value=\"{}\"", m.key())), "{m:?}");
            assert!(form.contains(&format!("value=\"{}\"", m.key())), "{m:?}");
        }
        for g in KNOWN_GRADES {
            assert!(
                form.contains(&format!("<option value=\"{g}\">{g}</option>")),
                "{g}"
            );
        }
        for name in ["list_order", "list_status", "list_method", "list_text"] {
            assert!(bar.contains(&format!("name=\"{name}\"")), "{name}");
        }
        for name in CHANGE_KEYS {
            assert!(form.contains(&format!("name=\"{name}\"")), "{name}");
        }
        let mut t = ListTools::default();
        for (name, v) in [
            ("change_grade", "A36"),
            ("change_method", "euler"),
            ("change_k_major", "2"),
            ("change_k_minor", "3"),
        ] {
            t.set(name, v);
        }
        assert_eq!(t.change, ["A36", "euler", "2", "3"]);
    }

    #[test]
    fn the_tally_and_a_refusal_as_text() {
        let cs: Vec<_> = ["C1", "C2"]
            .iter()
            .map(|i| Arc::new(Checked::new(&sample_member(i))))
            .collect();
        let mut t = ListTools::default();
        t.toggle("C2");
        t.message = Some("k_major: <b>".into());
        assert_eq!(
            status_html(&t, &cs).as_str(),
            "<span data-testid=\"list-tally\">Showing 2 of 2 · 1 picked</span><span \
             class=\"field-error\" data-testid=\"field-error\" role=\"alert\">✎ k_major: &lt;b&gt;</span>"
        );
    }
}
