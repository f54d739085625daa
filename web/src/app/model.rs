//! The column-model panel: the member described as it stands (segments
//! with their sections, end supports about each axis, braces, axial loads
//! at levels and along the length) for the engine's elastic buckling
//! analysis (member key `buckling_model`), with the column drawn beside it
//! and its buckled shape about each axis redrawn after every edit
//! ([`crate::chart::column`]). The edits are [`crate::modelform`]'s.

use super::*;
use crate::chart::column::{of_member, Sketch};
use crate::modelform::{self, hold_of, hold_value};
use crate::numtext::{fixed, parse_number};
use crate::units_view::{field_unit, from_field, result_text, span_text, to_field};
use strutline_core::buckling::model::{AxialLoad, BucklingModel, Restraint, RestraintAxis};
use strutline_core::buckling::{Axis, Fixity, Support};
use strutline_core::catalogue;
use strutline_core::check::SegmentOf;

/// The unit of a translational spring, named as the member file's
/// description of `buckling_model` names it.
const TRANSLATION: &str = "spring_kn_per_mm";
/// The unit of a rotational spring.
const ROTATION: &str = "spring_knm_per_rad";

/// Changes the selected member's model.
fn edit(ctx: Ctx, f: impl FnOnce(&mut BucklingModel, f64)) {
    let Some(mut m) = ctx.current() else { return };
    let length = m.length_mm;
    if let Some(model) = m.buckling_model.as_mut() {
        f(model, length);
        ctx.commit(m);
    }
}

/// What a number field accepts.
#[derive(Clone, Copy, PartialEq)]
enum Accepts {
    Positive,
    NonNegative,
}

/// A number field of the panel: `key` gives the unit conversion through
/// the app's one unit system by its suffix (a member-file key such as
/// `length_mm`, `axial_kn` or `distributed_kn_per_m`, or the names
/// of a spring, `spring_kn_per_mm` and `spring_knm_per_rad`), `unit` the
/// SI unit shown; `path` the value's place in the member file
/// (`buckling_model.segments[0].length_mm`), which names a text that cannot
/// be read: it is kept as the member's draft ([`crate::drafts`]), the
/// member's result withdrawn and the value from before the edit put back,
/// as in the editor's own fields.
#[component]
fn ModelNum(
    ctx: Ctx,
    id: String,
    path: String,
    label: String,
    key: &'static str,
    unit: &'static str,
    initial: f64,
    accepts: Accepts,
    set: Callback<f64>,
) -> impl IntoView {
    let sys = crate::units_view::now();
    let (rule, shown) = ctx.drafted(path, initial, || to_field(sys, key, &for_input(initial)));
    let error = rule.error;
    // The value set through this box last.
    let last = StoredValue::new(initial);
    let label2 = label.clone();
    let unread = move |typed: &str, why: String| {
        rule.unread(typed, why, last.get_value(), |before| {
            last.set_value(before);
            set.run(before);
        });
    };
    view! {
        <div class="field cm-num" class:has-error=move || error.with(Option::is_some)>
            <label for=id.clone()>{label}</label>
            <div class="input-row">
                <input type="text" id=id inputmode="decimal" autocomplete="off" spellcheck="false" value=shown
                    aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                    on:focus=move |_| rule.enter(last.get_value())
                    on:input=move |e| {
                        let typed = event_target_value(&e);
                        let text = from_field(sys, key, &typed);
                        match parse_number(&text) {
                            Ok(v) if accepts == Accepts::Positive && v <= 0.0 => unread(&typed, format!("{label2}: must be greater than zero")),
                            Ok(v) if v < 0.0 => unread(&typed, format!("{label2}: must be zero or more")),
                            Ok(v) => {
                                rule.read();
                                last.set_value(v);
                                set.run(v);
                            }
                            Err(er) => unread(&typed, er.message(&label2)),
                        }
                    } />
                <span class="unit">{if key.is_empty() { unit } else { field_unit(sys, key, unit) }}</span>
            </div>
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

/// Held, free or a spring, with the stiffness when a spring (`key` and
/// `unit` as [`ModelNum`]'s).
#[component]
fn HoldField(
    ctx: Ctx,
    id: String,
    path: String,
    label: String,
    key: &'static str,
    unit: &'static str,
    initial: Fixity,
    free_allowed: bool,
    set: Callback<Fixity>,
    rebuild: RwSignal<u32>,
) -> impl IntoView {
    let value = hold_value(initial);
    let spring = match initial {
        Fixity::Spring(k) => Some(k),
        _ => None,
    };
    let sid = format!("{id}-k");
    view! {
        <div class="cm-hold">
            <div class="field">
                <label for=id.clone()>{label.clone()}</label>
                <select id=id on:change=move |e| {
                    set.run(hold_of(&event_target_value(&e), initial, 1.0));
                    rebuild.update(|n| *n += 1);
                }>
                    <option value="held" selected=value == "held">"held"</option>
                    {free_allowed.then(|| view! { <option value="free" selected=value == "free">"free"</option> })}
                    <option value="spring" selected=value == "spring">"a spring"</option>
                </select>
            </div>
            {spring.map(|k| view! {
                <ModelNum ctx=ctx id=sid path=path.clone() label=format!("{label}, stiffness") key=key unit=unit initial=k
                    accepts=Accepts::Positive set=Callback::new(move |v| set.run(Fixity::Spring(v))) />
            })}
        </div>
    }
}

/// The analysis of the selected member's model, what is drawn and the
/// panel's lines.
#[derive(Clone, PartialEq)]
struct Analysed {
    /// None while the member holds text that cannot be read: nothing of
    /// its value from before that edit is drawn.
    sketch: Option<Sketch>,
    /// One line an axis: alpha_cr, N_cr, L_cr, elements and convergence.
    lines: Vec<String>,
    refused: Option<String>,
}

/// The panel's analysis of `m`. `unread`, the message of a field of the
/// member that cannot be read ([`crate::drafts`]) other than its design
/// load, withholds it: the member keeps its value from before that edit,
/// which is not the input shown, so neither the column nor its buckling is
/// drawn. `load_given`: whether the design load is the engineer's (a new
/// member's stands in until typed): where the model has no loads of its
/// own, none is drawn and N_cr is given instead of alpha_cr. `governs`:
/// the segment whose check governs, as the result names it.
fn analyse(
    m: &Member,
    sys: UnitSystem,
    unread: Option<String>,
    load_given: bool,
    governs: Option<SegmentOf>,
) -> Option<Analysed> {
    let model = m.buckling_model.as_ref()?;
    if let Some(why) = unread {
        return Some(Analysed {
            sketch: None,
            lines: Vec::new(),
            refused: Some(format!("Not analysed until the input can be read: {why}")),
        });
    }
    let pattern = model.carries_own_loads() || (load_given && m.axial_kn > 0.0);
    let a = of_member(m, sys, load_given)?;
    let mut lines = Vec::new();
    if let Ok(b) = &a.result {
        for (name, x) in [("major", &b.major), ("minor", &b.minor)] {
            let critical = if pattern {
                format!(
                    "α_cr = {}, N_cr = {}",
                    fixed(x.load_factor, 3),
                    result_text(sys, "kN", x.critical_kn, 0)
                )
            } else {
                format!(
                    "N_cr = {} (a load at end B)",
                    result_text(sys, "kN", x.critical_kn, 0)
                )
            };
            // Each segment's own buckling length where there are several:
            // the result's modes take the governing segment's.
            let lengths = match x.segments.as_slice() {
                [_, _, ..] => format!(
                    "buckling lengths by segment from end A: {}",
                    x.segments
                        .iter()
                        .enumerate()
                        .map(|(i, s)| format!(
                            "{} {}",
                            i + 1,
                            s.buckling_length_mm.map_or_else(
                                || "— (not compressed)".to_string(),
                                |l| span_text(sys, l)
                            )
                        ))
                        .collect::<Vec<_>>()
                        .join(", ")
                ),
                _ => format!("buckling length {}", span_text(sys, x.buckling_length_mm)),
            };
            lines.push(format!(
                "{name} axis: {critical}, {lengths} ({} elements; α_cr {} with half as many)",
                x.elements,
                if x.load_factor != 0.0 {
                    format!("{:+.1e}", x.load_factor_half / x.load_factor - 1.0)
                } else {
                    "—".to_string()
                }
            ));
        }
        if let Some(s) = governs.filter(|s| s.count > 1) {
            lines.push(format!(
                "Segment {} of {} governs the check: the result's modes table gives its buckling lengths.",
                s.index, s.count
            ));
        }
        if !pattern {
            lines.push(
                "The design load N_Ed is not given: no load is drawn, and α_cr (the factor on the \
                 design load at which the column buckles) follows once it is."
                    .to_string(),
            );
        } else {
            for (name, x) in [("major", &b.major), ("minor", &b.minor)] {
                if x.load_factor < 1.0 {
                    lines.push(format!(
                        "⚠ α_cr = {} < 1 about the {name} axis: the column buckles elastically under \
                         less than its design load, so it cannot carry it whatever its strength.",
                        fixed(x.load_factor, 3)
                    ));
                }
            }
        }
    }
    Some(Analysed {
        sketch: Some(a.sketch),
        lines,
        refused: a.result.err(),
    })
}

/// One end's supports about both axes.
#[component]
fn EndRows(ctx: Ctx, end_b: bool, rebuild: RwSignal<u32>) -> impl IntoView {
    let model = ctx.current().and_then(|m| m.buckling_model);
    let end = model.map(|md| if end_b { md.ends.b } else { md.ends.a });
    let name = if end_b { "B (top)" } else { "A (foot)" };
    let tag = if end_b { "b" } else { "a" };
    [Axis::Major, Axis::Minor]
        .into_iter()
        .map(|axis| {
            let sup = end.map_or(Support::PINNED, |e| match axis {
                Axis::Major => e.major,
                Axis::Minor => e.minor,
            });
            let set_sup = move |f: &dyn Fn(&mut Support)| {
                edit(ctx, |md, _| {
                    let e = if end_b { &mut md.ends.b } else { &mut md.ends.a };
                    let s = match axis {
                        Axis::Major => &mut e.major,
                        Axis::Minor => &mut e.minor,
                    };
                    f(s);
                });
            };
            let id = format!("cm-end-{tag}-{}", axis.key());
            view! {
                <div class="cm-row" data-testid=id.clone()>
                    <span class="cm-row-name">{format!("end {name}, {} axis", axis.key())}</span>
                    <HoldField ctx=ctx id=format!("{id}-move") path=format!("buckling_model.ends.{tag}.{}.translation", axis.key()) label="sideways".into() key=TRANSLATION unit="kN/mm" initial=sup.translation
                        free_allowed=true rebuild=rebuild
                        set=Callback::new(move |f| set_sup(&|s: &mut Support| s.translation = f)) />
                    <HoldField ctx=ctx id=format!("{id}-turn") path=format!("buckling_model.ends.{tag}.{}.rotation", axis.key()) label="turning".into() key=ROTATION unit="kN·m/rad" initial=sup.rotation
                        free_allowed=true rebuild=rebuild
                        set=Callback::new(move |f| set_sup(&|s: &mut Support| s.rotation = f)) />
                </div>
            }
        })
        .collect::<Vec<_>>()
}

/// The inputs of the model (made afresh when rows come or go).
#[component]
fn ModelInputs(ctx: Ctx, rebuild: RwSignal<u32>) -> impl IntoView {
    let Some(m) = ctx.current() else {
        return ().into_any();
    };
    let Some(model) = m.buckling_model.clone() else {
        return ().into_any();
    };
    let length = m.length_mm;
    let segs = modelform::segments(&model, length);
    let n_segs = segs.len();
    let bump = move || rebuild.update(|n| *n += 1);
    let seg_rows = segs
        .iter()
        .enumerate()
        .map(|(i, s)| {
            let (designation, note) = modelform::section_text(crate::units_view::now(), s);
            let sec_id = format!("cm-seg-{i}-section");
            view! {
                <div class="cm-row" data-testid=format!("cm-seg-{i}")>
                    <span class="cm-row-name">{format!("segment {}", i + 1)}</span>
                    <ModelNum ctx=ctx id=format!("cm-seg-{i}-length") path=format!("buckling_model.segments[{i}].length_mm") label="length".into() key="length_mm" unit="mm"
                        initial=s.length_mm accepts=Accepts::Positive
                        set=Callback::new(move |v| edit(ctx, |md, l| {
                            if md.segments.is_empty() { md.segments = modelform::segments(md, l); }
                            if let Some(seg) = md.segments.get_mut(i) { seg.length_mm = v; }
                        })) />
                    <div class="field">
                        <label for=sec_id.clone()>"section (catalogue; empty: the member's)"</label>
                        <input type="text" id=sec_id list="cm-designations" autocomplete="off" spellcheck="false" value=designation
                            on:input=move |e| {
                                let spec = modelform::section_of(&event_target_value(&e));
                                edit(ctx, |md, l| {
                                    if md.segments.is_empty() { md.segments = modelform::segments(md, l); }
                                    if let Some(seg) = md.segments.get_mut(i) { seg.section = spec; }
                                });
                            } />
                        {note.map(|n| view! { <p class="hint">{n}</p> })}
                    </div>
                    {(n_segs > 1).then(|| view! {
                        <button type="button" class="quiet" data-testid=format!("cm-seg-{i}-remove")
                            aria-label=format!("remove segment {}", i + 1)
                            on:click=move |_| { edit(ctx, |md, _| modelform::remove_segment(md, i)); bump(); }>"✕"</button>
                    })}
                </div>
            }
        })
        .collect::<Vec<_>>();
    let brace_rows = model
        .restraints
        .iter()
        .enumerate()
        .map(|(i, r)| {
            let axis_id = format!("cm-brace-{i}-axis");
            let current = r.axis;
            view! {
                <div class="cm-row" data-testid=format!("cm-brace-{i}")>
                    <span class="cm-row-name">{format!("brace {}", i + 1)}</span>
                    <ModelNum ctx=ctx id=format!("cm-brace-{i}-at") path=format!("buckling_model.restraints[{i}].at_mm") label="from end A".into() key="length_mm" unit="mm"
                        initial=r.at_mm accepts=Accepts::NonNegative
                        set=Callback::new(move |v| edit(ctx, |md, _| if let Some(b) = md.restraints.get_mut(i) { b.at_mm = v; })) />
                    <div class="field">
                        <label for=axis_id.clone()>"holds"</label>
                        <select id=axis_id on:change=move |e| {
                            let a = match event_target_value(&e).as_str() {
                                "major" => RestraintAxis::Major,
                                "minor" => RestraintAxis::Minor,
                                _ => RestraintAxis::Both,
                            };
                            edit(ctx, |md, _| if let Some(b) = md.restraints.get_mut(i) { b.axis = a; });
                            bump();
                        }>
                            <option value="minor" selected=current == RestraintAxis::Minor>"minor axis buckling"</option>
                            <option value="major" selected=current == RestraintAxis::Major>"major axis buckling"</option>
                            <option value="both" selected=current == RestraintAxis::Both>"both axes"</option>
                        </select>
                    </div>
                    <HoldField ctx=ctx id=format!("cm-brace-{i}-hold") path=format!("buckling_model.restraints[{i}].translation") label="sideways".into() key=TRANSLATION unit="kN/mm" initial=r.translation
                        free_allowed=false rebuild=rebuild
                        set=Callback::new(move |f| edit(ctx, |md, _| if let Some(b) = md.restraints.get_mut(i) { b.translation = f; })) />
                    <button type="button" class="quiet" aria-label=format!("remove brace {}", i + 1)
                        on:click=move |_| { edit(ctx, |md, _| { if i < md.restraints.len() { md.restraints.remove(i); } }); bump(); }>"✕"</button>
                </div>
            }
        })
        .collect::<Vec<_>>();
    let load_rows = model
        .axial_loads
        .iter()
        .enumerate()
        .map(|(i, p)| {
            view! {
                <div class="cm-row" data-testid=format!("cm-load-{i}")>
                    <span class="cm-row-name">{format!("load {}", i + 1)}</span>
                    <ModelNum ctx=ctx id=format!("cm-load-{i}-at") path=format!("buckling_model.axial_loads[{i}].at_mm") label="at, from end A".into() key="length_mm" unit="mm"
                        initial=p.at_mm accepts=Accepts::NonNegative
                        set=Callback::new(move |v| edit(ctx, |md, _| if let Some(q) = md.axial_loads.get_mut(i) { q.at_mm = v; })) />
                    <ModelNum ctx=ctx id=format!("cm-load-{i}-kn") path=format!("buckling_model.axial_loads[{i}].axial_kn") label="compression".into() key="axial_kn" unit="kN"
                        initial=p.axial_kn accepts=Accepts::NonNegative
                        set=Callback::new(move |v| edit(ctx, |md, _| if let Some(q) = md.axial_loads.get_mut(i) { q.axial_kn = v; })) />
                    <button type="button" class="quiet" aria-label=format!("remove load {}", i + 1)
                        on:click=move |_| { edit(ctx, |md, _| { if i < md.axial_loads.len() { md.axial_loads.remove(i); } }); bump(); }>"✕"</button>
                </div>
            }
        })
        .collect::<Vec<_>>();
    view! {
        <datalist id="cm-designations">
            {catalogue::entries().iter().map(|e| view! { <option value=e.designation></option> }).collect::<Vec<_>>()}
        </datalist>
        <h3 class="cm-head">"Segments, end A (foot) to end B (top)"</h3>
        {seg_rows}
        <button type="button" data-testid="cm-add-segment" on:click=move |_| { edit(ctx, modelform::add_segment); bump(); }>
            "+ Segment (splits the last in two)"</button>
        <h3 class="cm-head">"End supports"</h3>
        <EndRows ctx=ctx end_b=false rebuild=rebuild />
        <EndRows ctx=ctx end_b=true rebuild=rebuild />
        <h3 class="cm-head">"Braces along the column"</h3>
        {brace_rows}
        <button type="button" data-testid="cm-add-brace" on:click=move |_| {
            edit(ctx, |md, l| md.restraints.push(Restraint { at_mm: l / 2.0, axis: RestraintAxis::Minor, translation: Fixity::Fixed }));
            bump();
        }>"+ Brace (at mid-length, to start)"</button>
        <h3 class="cm-head">"Axial loads"</h3>
        <p class="hint">"Compression, carried down to end A. With no load at a level and none along the length, the member's design load acts at end B; once any is given, only the loads given here make the pattern."</p>
        {load_rows}
        <button type="button" data-testid="cm-add-load" on:click=move |_| {
            edit(ctx, |md, l| {
                let kn = ctx.current().map_or(0.0, |m| m.axial_kn.max(0.0));
                md.axial_loads.push(AxialLoad { at_mm: l, axial_kn: kn });
            });
            bump();
        }>"+ Load at a level"</button>
        <ModelNum ctx=ctx id="cm-distributed".into() path="buckling_model.distributed_kn_per_m".into() label="along the length (self-weight, say)".into() key="distributed_kn_per_m" unit="kN/m"
            initial=model.distributed_kn_per_m accepts=Accepts::NonNegative
            set=Callback::new(move |v| edit(ctx, |md, _| md.distributed_kn_per_m = v)) />
    }
    .into_any()
}

/// The panel.
#[component]
pub(super) fn ColumnModel(ctx: Ctx) -> impl IntoView {
    let has_model = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .is_some_and(|m| m.buckling_model.is_some())
        })
    });
    let rebuild = RwSignal::new(0u32);
    let analysed = Memo::new(move |_| {
        let sel = ctx.selected.get();
        let sys = ctx.units.get();
        ctx.ws.with(|w| {
            let m = w.active_list().and_then(|l| l.members.get(sel))?;
            // A design load not yet given (a new member's) is drawn as
            // none; any other field that cannot be read withholds the lot.
            let (unread, load_given) = ctx.drafts.with(|d| {
                let mut of = d.of(w.active, &m.id);
                let load = |k: &str| k == "axial_kn";
                let all: Vec<_> = of.by_ref().collect();
                (
                    all.iter()
                        .find(|d| !load(&d.key))
                        .map(|draft| fields::error_text(&draft.error())),
                    !all.iter().any(|d| load(&d.key)),
                )
            });
            let governs = ctx.checks.with(|c| {
                c.0.get(sel)
                    .and_then(|c| c.result())
                    .and_then(|r| r.segment)
            });
            analyse(m, sys, unread, load_given, governs)
        })
    });
    let canvas = NodeRef::<leptos::html::Canvas>::new();
    let note = RwSignal::new(None::<String>);
    let drawn = RwSignal::new(0u32);
    Effect::new(move |_| {
        let a = analysed.get();
        let hc = ctx.high_contrast.get();
        let resized = ctx.resize.get();
        let (Some(el), Some(a)) = (canvas.get(), a) else {
            return;
        };
        let dpr = browser::fit_canvas(&el, resized);
        match &a.sketch {
            Some(sketch) => {
                let _ = el.remove_attribute("data-chart");
                match chart::column::draw(&el, sketch, dpr, hc) {
                    Ok(()) => note.set(None),
                    Err(e) => note.set(Some(e)),
                }
            }
            None => {
                chart::blank(&el, "Not analysed: see below.", dpr, hc);
                let _ = el.set_attribute("data-shapes", "0");
                note.set(None);
            }
        }
        let n = drawn.get_untracked() + 1;
        drawn.set(n);
        let _ = el.set_attribute("data-drawn", &n.to_string());
    });
    let toggle = move |_| {
        let Some(mut m) = ctx.current() else { return };
        if m.buckling_model.is_some() {
            m.buckling_model = None;
        } else {
            // The model gives both flexural buckling lengths: the axes' own
            // factors, lengths and frames go (the engine refuses both).
            m.k_major = 1.0;
            m.k_minor = 1.0;
            m.lcr_major_mm = None;
            m.lcr_minor_mm = None;
            m.frame_major = None;
            m.frame_minor = None;
            m.buckling_model = Some(modelform::start());
        }
        ctx.commit(m);
        // The editor's end conditions change with it.
        ctx.select(ctx.selected.get_untracked());
    };
    view! {
        <fieldset class="column-model" data-testid="column-model">
            <legend>"Column model (elastic buckling analysis)"</legend>
            <p class="hint">{move || if has_model.get() {
                "The buckling lengths about both axes come from an analysis of the column described here."
            } else {
                "Describe the column as it stands (steps, end supports, braces, loads at levels) and the buckling lengths come from an analysis of it instead of a factor K."
            }}</p>
            <button type="button" data-testid="cm-toggle" aria-pressed=move || if has_model.get() { "true" } else { "false" } on:click=toggle>
                {move || if has_model.get() { "Remove the column model" } else { "Describe the column" }}
            </button>
            <Show when=move || has_model.get()>
                <div class="cm-body">
                    <div class="cm-drawing">
                        <canvas class="column-sketch" data-testid="cm-canvas" node_ref=canvas role="img"
                            aria-label="The column to scale about each axis, its supports, braces and loads, and its buckled shape"></canvas>
                        {move || note.get().map(|n| view! { <p class="field-error">{n}</p> })}
                        <div class="cm-result" data-testid="cm-result" aria-live="polite">
                            {move || analysed.get().map(|a| match a.refused {
                                Some(r) => view! { <p class="field-error" data-testid="cm-refused">"✎ " {r}</p> }.into_any(),
                                None => a.lines.into_iter().map(|l| view! { <p>{l}</p> }).collect::<Vec<_>>().into_any(),
                            })}
                        </div>
                    </div>
                    <div class="cm-inputs">
                        {made_afresh(Signal::derive(move || u64::from(rebuild.get())), Arc::new(move || view! {
                            <ModelInputs ctx=ctx rebuild=rebuild />
                        }.into_any()))}
                    </div>
                </div>
            </Show>
        </fieldset>
    }
}
