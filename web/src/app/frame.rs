//! The ends of a column in a frame about one axis (member key
//! `frame_major` / `frame_minor`): sway or braced, G at each end, the k
//! they give shown as the person types, and a helper that works out G at
//! an end from the members meeting there. The wording and the sums are
//! [`crate::framing`]'s; this is the view.

use super::*;
use crate::framing::{self, EndKind, JointForm, FAR_ENDS};
use crate::numtext::parse_number;
use crate::units_view::field_unit;
use strutline_core::buckling::chart::{Frame, Stiffness};

/// The axis' frame of a member.
fn frame_of(m: &Member, major: bool) -> Option<Frame> {
    if major {
        m.frame_major
    } else {
        m.frame_minor
    }
}

/// The member with the axis' frame changed by `f`.
fn with_frame(ctx: Ctx, major: bool, f: impl FnOnce(&mut Frame)) {
    let Some(mut m) = ctx.current() else { return };
    let slot = if major {
        &mut m.frame_major
    } else {
        &mut m.frame_minor
    };
    let mut frame = slot.unwrap_or(Frame {
        sway: true,
        g_a: 1.0,
        g_b: 1.0,
    });
    f(&mut frame);
    *slot = Some(frame);
    ctx.commit(m);
}

/// One G field.
#[component]
fn GField(ctx: Ctx, major: bool, end_b: bool) -> impl IntoView {
    let axis = if major { "frame_major" } else { "frame_minor" };
    let g = if end_b { "g_b" } else { "g_a" };
    let id = format!("f-{axis}-{g}");
    let key = format!("{axis}.{g}");
    let value =
        ctx.current()
            .and_then(|m| frame_of(&m, major))
            .map(|f| if end_b { f.g_b } else { f.g_a });
    // Text that cannot be read: the member's draft, its result withdrawn
    // and G from before the edit put back (the editor's rule, Drafted).
    let (rule, initial) = ctx.drafted(key, value, || value.map(for_input).unwrap_or_default());
    let error = rule.error;
    // G set through this box last.
    let last = StoredValue::new(value);
    let unread = move |typed: &str, why: String| {
        rule.unread(typed, why, last.get_value(), |before| {
            if let Some(b) = before {
                last.set_value(Some(b));
                with_frame(ctx, major, |f| if end_b { f.g_b = b } else { f.g_a = b });
            }
        });
    };
    let label = if end_b {
        "G at end B (top)"
    } else {
        "G at end A (foot)"
    };
    view! {
        <div class="field" class:has-error=move || error.with(Option::is_some)>
            <label for=id.clone()>{label} <code class="key">{format!("{axis}.{g}")}</code></label>
            <input type="text" id=id name=format!("{axis}.{g}") inputmode="decimal" autocomplete="off" spellcheck="false" value=initial
                aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                on:focus=move |_| rule.enter(last.get_value())
                on:input=move |e| {
                    let typed = event_target_value(&e);
                    match parse_number(&typed) {
                        Ok(v) if v >= 0.0 => {
                            rule.read();
                            last.set_value(Some(v));
                            with_frame(ctx, major, |f| if end_b { f.g_b = v } else { f.g_a = v });
                        }
                        Ok(_) => unread(&typed, format!("{axis}.{g}: G must be zero or more")),
                        Err(er) => unread(&typed, er.message(&format!("{axis}.{g}"))),
                    }
                } />
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

/// A pair of inputs (I, length) of the G helper for member `which` of
/// the form ([`JointForm::member_mut`]).
#[component]
fn MemberInputs(
    label: &'static str,
    id: String,
    which: usize,
    form: RwSignal<JointForm>,
) -> impl IntoView {
    let sys = crate::units_view::now();
    view! {
        <div class="g-member">
            <span class="g-member-name">{label}</span>
            <label for=format!("{id}-i")>"I"</label>
            <input type="text" id=format!("{id}-i") inputmode="decimal" autocomplete="off"
                on:input=move |e| {
                    let v = event_target_value(&e);
                    form.update(|f| if let Some(t) = f.member_mut(which) { t.i = v; });
                } />
            <span class="unit">{field_unit(sys, "i_major_mm4", "mm⁴")}</span>
            <label for=format!("{id}-l")>"L"</label>
            <input type="text" id=format!("{id}-l") inputmode="decimal" autocomplete="off"
                on:input=move |e| {
                    let v = event_target_value(&e);
                    form.update(|f| if let Some(t) = f.member_mut(which) { t.length = v; });
                } />
            <span class="unit">{field_unit(sys, "length_mm", "mm")}</span>
        </div>
    }
}

/// The far-end select of beam `n`.
#[component]
fn FarEndSelect(n: usize, id: String, form: RwSignal<JointForm>) -> impl IntoView {
    view! {
        <div class="field g-far">
            <label for=id.clone()>{format!("beam {}, its far end", n + 1)}</label>
            <select id=id on:change=move |e| {
                let v = event_target_value(&e);
                form.update(|f| if let Some(b) = f.beams.get_mut(n) { b.1 = v; });
            }>
                {FAR_ENDS.iter().map(|(v, label)| view! { <option value=*v>{*label}</option> }).collect::<Vec<_>>()}
            </select>
        </div>
    }
}

/// The frame ends of one axis.
#[component]
pub(super) fn FrameEnds(ctx: Ctx, major: bool) -> impl IntoView {
    let axis = if major { "frame_major" } else { "frame_minor" };
    let fields_made = RwSignal::new(0u32);
    let frame = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .and_then(|m| frame_of(m, major).map(|f| (f, m.length_mm)))
        })
    });
    let k_line = move || {
        let sys = ctx.units.get();
        // No k from a G not given (or not readable).
        ctx.drafts.track();
        if framing::g_keys(major)
            .iter()
            .any(|k| ctx.draft(k).is_some())
        {
            return Some("k follows once G is given at both ends.".to_string());
        }
        frame
            .get()
            .map(|(f, length)| framing::k_text(&f, major, length, sys))
    };
    let sway_now = ctx
        .current()
        .and_then(|m| frame_of(&m, major))
        .is_none_or(|f| f.sway);
    let sway_id = format!("f-{axis}-sway");
    // The G helper.
    let form = RwSignal::new(JointForm::default());
    let end_b = RwSignal::new(false);
    let own = move || {
        let sel = ctx.selected.get();
        ctx.checks.with(|c| {
            c.0.get(sel).and_then(|c| {
                c.prepared.as_ref().map(|p| Stiffness {
                    i_mm4: if major {
                        p.section.props.i_major_mm4
                    } else {
                        p.section.props.i_minor_mm4
                    },
                    length_mm: p.member.length_mm,
                })
            })
        })
    };
    let field = move || match (major, end_b.get()) {
        (true, false) => "frame_major.g_a",
        (true, true) => "frame_major.g_b",
        (false, false) => "frame_minor.g_a",
        (false, true) => "frame_minor.g_b",
    };
    let worked = Memo::new(move |_| {
        let sys = ctx.units.get();
        let sway = frame.get().is_none_or(|(f, _)| f.sway);
        match own() {
            Some(own) => form.with(|f| framing::work_out(f, own, sway, field(), sys)),
            None => Err("the column's own section is not valid yet; its I is needed".into()),
        }
    });
    let p = format!("g-{axis}");
    let member = move |label: &'static str, id: String, which: usize| {
        view! { <MemberInputs label=label id=id which=which form=form /> }
    };
    view! {
        <div class="frame-ends" data-testid=format!("{axis}-ends")>
            <div class="field">
                <label for=sway_id.clone()>"the frame's sidesway" <code class="key">{format!("{axis}.sway")}</code></label>
                <select id=sway_id name=format!("{axis}.sway") on:change=move |e| {
                    let sway = event_target_value(&e) == "true";
                    with_frame(ctx, major, |f| f.sway = sway);
                }>
                    <option value="true" selected=sway_now>"free to sway (sidesway uninhibited)"</option>
                    <option value="false" selected=!sway_now>"braced (sidesway inhibited)"</option>
                </select>
            </div>
            {made_afresh(Signal::derive(move || u64::from(fields_made.get())), Arc::new(move || view! {
                <div class="field-grid">
                    <GField ctx=ctx major=major end_b=false />
                    <GField ctx=ctx major=major end_b=true />
                </div>
            }.into_any()))}
            <p class="frame-k" data-testid=format!("{axis}-k") aria-live="polite">{k_line}</p>
            <details class="g-helper">
                <summary>"Work out G from the members at an end"</summary>
                <p class="hint">"G = Σ(EI/L) of the columns over Σ(m·EI/L) of the beams meeting at the joint, "
                    "all of one E. This column counts with its own I and length; give the others."</p>
                <div class="field-grid">
                    <div class="field">
                        <label for=format!("{p}-end")>"end"</label>
                        <select id=format!("{p}-end") on:change=move |e| end_b.set(event_target_value(&e) == "b")>
                            <option value="a">"A (foot)"</option>
                            <option value="b">"B (top)"</option>
                        </select>
                    </div>
                    <div class="field">
                        <label for=format!("{p}-kind")>"the end is"</label>
                        <select id=format!("{p}-kind") on:change=move |e| {
                            let k = EndKind::from_value(&event_target_value(&e));
                            form.update(|f| f.kind = k);
                        }>
                            {EndKind::ALL.into_iter().map(|k| view! { <option value=k.value()>{k.label()}</option> }).collect::<Vec<_>>()}
                        </select>
                    </div>
                </div>
                <div class="g-members" hidden=move || form.with(|f| f.kind != EndKind::Joint)>
                    {member("other column", format!("{p}-col"), 0)}
                    {member("beam 1", format!("{p}-b1"), 1)}
                    <FarEndSelect n=0 id=format!("{p}-b1-far") form=form />
                    {member("beam 2", format!("{p}-b2"), 2)}
                    <FarEndSelect n=1 id=format!("{p}-b2-far") form=form />
                </div>
                <div class="g-working" data-testid=format!("{p}-working")>
                    {move || match worked.get() {
                        Ok((_, lines)) => lines.into_iter().map(|l| view! { <p>{l}</p> }).collect::<Vec<_>>().into_any(),
                        Err(msg) => view! { <p class="field-error">"✎ " {msg}</p> }.into_any(),
                    }}
                </div>
                <button type="button" data-testid=format!("{p}-use") disabled=move || worked.with(Result::is_err)
                    on:click=move |_| {
                        if let Ok((g, _)) = worked.get_untracked() {
                            let b = end_b.get_untracked();
                            let [ga, gb] = framing::g_keys(major);
                            ctx.drop_draft(if b { &gb } else { &ga });
                            with_frame(ctx, major, |f| if b { f.g_b = g } else { f.g_a = g });
                            fields_made.update(|n| *n += 1);
                        }
                    }>
                    {move || if end_b.get() { "Use this G for end B" } else { "Use this G for end A" }}
                </button>
            </details>
        </div>
    }
}
