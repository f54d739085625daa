//! Member lists in and out of the app: the open list downloaded as the
//! member file (JSON) or as CSV, and a file read back in.
//!
//! An import never destroys anything. The file is read into an
//! [`Incoming`] first; its problems are shown row by row and field by
//! field; only then does the person open it as a new list or merge its
//! valid members into the open one (ids that clash get a free one).

use leptos::prelude::*;
use strutline_core::check::{check_member_as, Working};
use strutline_core::csv::{self, Format, RowProblem};
use strutline_core::file::{self, MemberFile};

/// The largest file the app reads, bytes (5 MiB): the app's policy (a list
/// held in the page and in browser storage), not the engine's, which reads
/// lists of any length.
pub const MAX_BYTES: usize = 5 * 1024 * 1024;

/// The most CSV member rows the app reads, for the same reason.
pub const MAX_ROWS: usize = 10_000;
use strutline_core::units::UnitSystem;
use strutline_core::Member;
use wasm_bindgen::closure::Closure;
use wasm_bindgen::JsCast;

use crate::banner::{act, banner};
use crate::browser;
use crate::listops;
use crate::workspace::Workspace;

/// A file read but not yet taken in.
#[derive(Debug, Clone, PartialEq)]
pub struct Incoming {
    /// The file's name as the browser gave it.
    pub name: String,
    /// The valid members, titled.
    pub list: MemberFile,
    /// Every problem found (CSV only; a JSON file is all or nothing).
    pub problems: Vec<RowProblem>,
    /// The members read whose values the check refuses (an unknown
    /// catalogue designation, a negative load): the engine's message,
    /// naming the member and the field, as the command line refuses the
    /// same file. They come in marked as needing input if the person takes
    /// them.
    pub refused: Vec<String>,
}

/// The refusal of a file too large to read, by its size in bytes.
pub fn too_big(size: f64) -> Option<String> {
    (size > MAX_BYTES as f64).then(|| {
        format!(
            "The file is {:.1} MB; files over 5 MB are not read.",
            size / 1_048_576.0
        )
    })
}

/// Reads a file's text. A JSON file that cannot be read is refused with
/// the engine's message; a CSV file keeps its valid rows and lists the rest.
pub fn read(name: &str, text: &str) -> Result<Incoming, String> {
    let (list, problems) = match csv::detect_format(name, text) {
        Format::Json => (
            file::parse(text).map_err(|e| format!("{name}: {e}"))?,
            Vec::new(),
        ),
        Format::Csv => {
            let import = csv::parse_csv_within(text, MAX_ROWS);
            let mut list = MemberFile::new(csv::title_from_path(name));
            list.members = import.members;
            (list, import.problems)
        }
    };
    if list.members.is_empty() && problems.is_empty() {
        return Err(format!("{name}: the file holds no members"));
    }
    // The command line's own check of each member (without the working),
    // so the report names what `strutline check` refuses the file for.
    let refused = list
        .members
        .iter()
        .filter_map(|m| check_member_as(m, Working::Skipped).err())
        .map(|e| e.to_string())
        .collect();
    Ok(Incoming {
        name: name.to_string(),
        list,
        problems,
        refused,
    })
}

/// Adds `incoming` to the end of `members`, giving each member whose id
/// is taken a free one. Returns how many were renamed.
pub fn merge(members: &mut Vec<Member>, incoming: &[Member]) -> usize {
    let mut renamed = 0;
    for m in incoming {
        let mut m = m.clone();
        if members.iter().any(|o| o.id == m.id) {
            m.id = listops::free_id(members, &m.id);
            renamed += 1;
        }
        members.push(m);
    }
    renamed
}

/// A file name for a list's title: ASCII letters and digits, other runs
/// of characters become one `-`.
pub fn file_name(title: &str, ext: &str) -> String {
    let mut s = String::new();
    for c in title.trim().chars() {
        // ASCII rules only, so the wasm carries no Unicode case tables.
        if c.is_ascii_alphanumeric() {
            s.push(c.to_ascii_lowercase());
        } else if !s.ends_with('-') && !s.is_empty() {
            s.push('-');
        }
    }
    let s = s.trim_end_matches('-');
    format!("{}.{ext}", if s.is_empty() { "members" } else { s })
}

/// "s" unless there is one.
fn plural(n: usize) -> &'static str {
    if n == 1 {
        ""
    } else {
        "s"
    }
}

/// One line of the import summary.
pub fn summary(inc: &Incoming) -> String {
    let n = inc.list.members.len();
    let p = inc.problems.len() + inc.refused.len();
    if p == 0 {
        format!("{}: {n} member{} read, no problems.", inc.name, plural(n))
    } else {
        format!(
            "{}: {n} member{} read; {p} problem{} (nothing changes until you choose):",
            inc.name,
            plural(n),
            plural(p)
        )
    }
}

/// The report's lines after the summary: each row that could not be read
/// (left out), then each member read whose values the check refuses, and
/// what taking those does.
pub fn problem_lines(inc: &Incoming) -> Vec<String> {
    let mut lines: Vec<String> = inc.problems.iter().map(RowProblem::to_string).collect();
    lines.extend(inc.refused.iter().cloned());
    if !inc.refused.is_empty() {
        lines.push(format!(
            "The member{} the check refuses come{} in marked \u{270e} fix input, to be put right here; \
             nothing is checked with {} value{} until then.",
            plural(inc.refused.len()),
            if inc.refused.len() == 1 { "s" } else { "" },
            if inc.refused.len() == 1 { "that" } else { "those" },
            plural(inc.refused.len())
        ));
    }
    lines
}

/// Downloads the open list as the member file, or as CSV with the columns
/// of `csv_units` (US columns carry `_ft`, `_kip`, ... suffixes). A CSV
/// that would leave keys out ([`csv::left_out`]: a column model, which a
/// row cannot carry) is not written at once: `asks` holds what would be
/// lost until the engineer says to write it without them, as the command
/// line's `convert` wants `--accept-loss`.
fn export(
    ws: RwSignal<Workspace>,
    csv_units: Option<UnitSystem>,
    asks: RwSignal<Option<(String, UnitSystem)>>,
) {
    let Some(l) = ws.with_untracked(|w| w.active_list().cloned()) else {
        return;
    };
    asks.set(None);
    let _ = match csv_units {
        Some(system) => match csv::left_out(&l) {
            Some(lost) => {
                asks.set(Some((lost, system)));
                return;
            }
            None => write_csv(&l, system),
        },
        None => browser::download(
            &file_name(&l.title, "json"),
            &l.to_json(),
            "application/json",
        ),
    };
}

/// Downloads `l` as CSV with the columns of `system`.
fn write_csv(l: &strutline_core::file::MemberFile, system: UnitSystem) -> Result<(), String> {
    browser::download(
        &file_name(&l.title, "csv"),
        &csv::to_csv_in(l, system),
        "text/csv",
    )
}

/// Reads the chosen file of an `<input type=file>` into `out`.
fn pick(e: web_sys::Event, out: RwSignal<Option<Result<Incoming, String>>>) {
    let Some(input) = e
        .target()
        .and_then(|t| t.dyn_into::<web_sys::HtmlInputElement>().ok())
    else {
        return;
    };
    let Some(f) = input.files().and_then(|l| l.get(0)) else {
        return;
    };
    input.set_value("");
    if let Some(msg) = too_big(f.size()) {
        out.set(Some(Err(msg)));
        return;
    }
    let name = f.name();
    let done = Closure::once(move |v: wasm_bindgen::JsValue| {
        let text = v.as_string().unwrap_or_default();
        out.set(Some(read(&name, &text)));
    });
    let failed = Closure::once(move |_: wasm_bindgen::JsValue| {
        out.set(Some(Err("The browser could not read the file.".into())));
    });
    let _ = f.text().then2(&done, &failed);
    done.forget();
    failed.forget();
}

/// Export buttons, the file picker and the pending import (shown as a
/// banner: the summary, one line a problem, and the choices).
#[component]
pub fn Exchange(
    ws: RwSignal<Workspace>,
    units: RwSignal<UnitSystem>,
    select: Callback<usize>,
) -> impl IntoView {
    let pending = RwSignal::new(None::<Result<Incoming, String>>);
    let asks = RwSignal::new(None::<(String, UnitSystem)>);
    let take = move |merge_in: bool| {
        let Some(Ok(inc)) = pending.get_untracked() else {
            return;
        };
        ws.update(|w| {
            if merge_in {
                if let Some(l) = w.active_list_mut() {
                    merge(&mut l.members, &inc.list.members);
                }
            } else {
                let mut l = inc.list;
                l.title = listops::free_title(&w.lists, &l.title);
                w.lists.push(l);
                w.active = w.lists.len() - 1;
            }
        });
        pending.set(None);
        select.run(0);
    };
    let report = move || {
        pending.get().map(|p| {
            let cancel = act("Cancel", "import-cancel", true, move || pending.set(None));
            match p {
                Err(msg) => banner(
                    "import-report",
                    "banner-problem",
                    true,
                    vec![msg],
                    vec![cancel],
                ),
                Ok(inc) => {
                    let mut lines = vec![summary(&inc)];
                    lines.extend(problem_lines(&inc));
                    let mut acts = Vec::new();
                    if !inc.list.members.is_empty() {
                        acts.push(act("Open as a new list", "import-new", false, move || {
                            take(false)
                        }));
                        acts.push(act(
                            "Add to the open list",
                            "import-merge",
                            false,
                            move || take(true),
                        ));
                    }
                    acts.push(cancel);
                    banner("import-report", "banner-info", false, lines, acts)
                }
            }
        })
    };
    let left_out = move || {
        asks.get().map(|(lost, system)| {
            banner(
                "export-note",
                "banner-problem",
                true,
                vec![
                    lost,
                    "Write the CSV without them, or keep the member file (JSON), which carries every key."
                        .to_string(),
                ],
                vec![
                    act("Write the CSV without them", "export-csv-anyway", false, move || {
                        asks.set(None);
                        if let Some(l) = ws.with_untracked(|w| w.active_list().cloned()) {
                            let _ = write_csv(&l, system);
                        }
                    }),
                    act("Cancel", "export-csv-cancel", true, move || asks.set(None)),
                ],
            )
        })
    };
    view! {
        <div class="button-row screen-only">
            <button type="button" data-testid="export-json" on:click=move |_| export(ws, None, asks)>"⤓ Member file"</button>
            <button type="button" data-testid="export-csv" on:click=move |_| export(ws, Some(units.get_untracked()), asks)>
                {move || if units.get() == UnitSystem::Us { "⤓ CSV (US columns)" } else { "⤓ CSV" }}
            </button>
            <label class="file-pick">"⤒ Import "
                <input type="file" accept=".json,.csv,.tsv,.txt,application/json" data-testid="import-file"
                    on:change=move |e| pick(e, pending) />
            </label>
        </div>
        {left_out}
        {report}
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::demo_lists;

    #[test]
    fn json_and_csv_round_trip() {
        let l = demo_lists().remove(0);
        let back = read("a.json", &l.to_json()).unwrap();
        assert_eq!(back.list, l);
        assert!(back.problems.is_empty());
        let back = read("a.csv", &csv::to_csv(&l)).unwrap();
        assert_eq!(back.list.members, l.members);
        assert_eq!(back.list.title, "a");
    }

    #[test]
    fn csv_problems_keep_valid_rows() {
        let mut l = demo_lists().remove(0);
        let p1 = l.members[0].clone();
        l.members = (1..=3)
            .map(|i| Member {
                id: format!("P{i}"),
                note: None,
                ..p1.clone()
            })
            .collect();
        let text = csv::to_csv(&l);
        let mut lines: Vec<String> = text.lines().map(str::to_string).collect();
        let header: Vec<&str> = lines[0].split(',').collect();
        let col = header.iter().position(|h| *h == "axial_kn").unwrap();
        let mut cells: Vec<String> = lines[2].split(',').map(str::to_string).collect();
        cells[col] = "lots".into();
        lines[2] = cells.join(",");
        let inc = read("bad.csv", &lines.join("\n")).unwrap();
        assert_eq!(inc.list.members.len(), l.members.len() - 1);
        assert_eq!(inc.problems.len(), 1);
        let p = &inc.problems[0];
        assert_eq!((p.line, p.column.as_str()), (3, "axial_kn"));
        let s = p.to_string();
        assert!(s.starts_with("line 3, column axial_kn"), "{s}");
        assert!(summary(&inc).contains("1 problem "), "{}", summary(&inc));
    }

    #[test]
    fn us_columns_read_back() {
        let l = demo_lists().remove(0);
        let text = csv::to_csv_in(&l, UnitSystem::Us);
        assert!(text.lines().next().unwrap().contains("axial_kip"), "{text}");
        let back = read("us.csv", &text).unwrap();
        assert!(back.problems.is_empty(), "{:?}", back.problems);
        assert_eq!(back.list.members.len(), l.members.len());
        for (a, b) in back.list.members.iter().zip(&l.members) {
            assert_eq!(a.id, b.id);
            let rel = (a.axial_kn - b.axial_kn).abs() / b.axial_kn.abs().max(1e-9);
            assert!(
                rel < 1e-9,
                "{}: {} kN back as {} kN",
                b.id,
                b.axial_kn,
                a.axial_kn
            );
        }
        assert!(summary(&back).contains("members read, no problems"));
    }

    #[test]
    fn values_the_check_refuses_are_reported_before_anything_changes() {
        // An invented mezzanine list: a designation no catalogue holds and
        // a negative load, both read as CSV values, both refused by the
        // command line's check.
        let text = "id;kind;designation;grade;length_mm;axial_kn;method\n\
                    Z1;catalogue;HE 200 B;S355;3500;400;en1993-1-1\n\
                    Z3;catalogue;HE 999 Q;S355;3500;400;en1993-1-1\n\
                    Z4;catalogue;HE 200 B;S355;3500;-20;en1993-1-1\n";
        let inc = read("mezz.csv", text).unwrap();
        assert!(inc.problems.is_empty(), "{:?}", inc.problems);
        assert_eq!(inc.list.members.len(), 3);
        let s = summary(&inc);
        assert!(!s.contains("no problems"), "{s}");
        assert!(s.contains("2 problems"), "{s}");
        let lines = problem_lines(&inc);
        assert!(
            lines.iter().any(|l| l.contains("\"Z3\"")
                && l.contains("designation")
                && l.contains("HE 999 Q")),
            "{lines:?}"
        );
        assert!(
            lines
                .iter()
                .any(|l| l.contains("\"Z4\"") && l.contains("axial_kn")),
            "{lines:?}"
        );
        // Each message is the command line's for the same member.
        for m in &inc.list.members {
            if let Err(e) = strutline_core::check_member(m) {
                assert!(inc.refused.contains(&e.to_string()), "{e}");
            }
        }
        assert!(lines.last().unwrap().contains("fix input"));
        // The same values in a member file are reported alike.
        let json = read("mezz.json", &inc.list.to_json()).unwrap();
        assert_eq!(json.refused, inc.refused);
    }

    #[test]
    fn summary_counts_in_words() {
        let mut l = demo_lists().remove(0);
        l.members.truncate(1);
        let one = read("one.json", &l.to_json()).unwrap();
        assert_eq!(summary(&one), "one.json: 1 member read, no problems.");
    }

    #[test]
    fn broken_json_and_empty_files_refused() {
        assert!(read("x.json", "{\"format\":").is_err());
        let empty = read("x.csv", "").unwrap();
        assert!(empty.list.members.is_empty());
        assert_eq!(empty.problems[0].line, 0);
        assert!(read(
            "x.json",
            "{\"format\":\"strutline.members\",\"version\":1,\"members\":[]}"
        )
        .unwrap_err()
        .contains("no members"));
    }

    #[test]
    fn merge_renames_clashing_ids() {
        let l = demo_lists().remove(0);
        let mut ms = l.members.clone();
        let n = ms.len();
        assert_eq!(merge(&mut ms, &l.members[..2]), 2);
        assert_eq!(ms.len(), n + 2);
        let mut ids: Vec<_> = ms.iter().map(|m| m.id.clone()).collect();
        ids.sort();
        ids.dedup();
        assert_eq!(ids.len(), n + 2);
        assert_eq!(ms[n].axial_kn, l.members[0].axial_kn);
    }

    #[test]
    fn size_limit_and_names() {
        assert!(too_big(5.0 * 1_048_576.0).is_none());
        assert!(too_big(5.0 * 1_048_576.0 + 1.0).unwrap().contains("5.0 MB"));
        assert_eq!(file_name("Depot — Hall 2", "csv"), "depot-hall-2.csv");
        assert_eq!(file_name("  ", "json"), "members.json");
    }
}
