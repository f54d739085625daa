//! The editor of the selected member: every field by its member-file key,
//! made afresh when the member, its kind, material or method changes.

use super::frame::FrameEnds;
use super::model::ColumnModel;
use super::*;
use strutline_core::buckling::chart::Frame;

/// A text field of the editor: label, input named by its member-file key,
/// unit and the message of what is wrong while the person types.
///
/// Text that cannot be read is kept as a draft ([`crate::drafts`]): the
/// member's result is withdrawn while it stands, and the member keeps the
/// value it had when the field was entered (a half-typed "3," read as 3 on
/// the way to "3,5m" is put back), so no value the person did not finish is
/// checked or saved. The draft's text comes back in the box when the member
/// is opened again.
#[component]
pub(super) fn NumField(
    ctx: Ctx,
    field: Field,
    #[prop(optional)] after: Option<Callback<Member>>,
) -> impl IntoView {
    let stored = ctx
        .current()
        .map(|m| fields::read(&m, field.place, field.key))
        .unwrap_or_default();
    let sys = ctx.units.get_untracked();
    // The member's value when the field was entered: put back when what is
    // typed cannot be read.
    let (rule, initial) = ctx.drafted(field.key.to_string(), stored.clone(), || {
        crate::units_view::to_field(sys, field.key, &stored)
    });
    let error = rule.error;
    let now = move || {
        ctx.current()
            .map(|m| fields::read(&m, field.place, field.key))
            .unwrap_or_default()
    };
    let unread = move |typed: &str, msg: String| {
        rule.unread(typed, msg, now(), |before| {
            let Some(m) = ctx.current() else { return };
            if let Ok(back) = fields::apply(&m, &field, &before) {
                ctx.commit(back);
            }
        });
    };
    let input_id = format!("f-{}", field.key);
    let err_id = format!("e-{}", field.key);
    let numeric = !matches!(field.rule, fields::Rule::Text | fields::Rule::OptText);
    let err_id2 = err_id.clone();
    view! {
        <div class="field" class:has-error=move || error.with(Option::is_some)>
            <label for=input_id.clone()>{field.label} <code class="key">{crate::units_view::field_key(sys, field.key)}</code></label>
            <div class="input-row">
                <input
                    type="text"
                    id=input_id.clone()
                    name=field.key
                    inputmode=if numeric { "decimal" } else { "text" }
                    autocomplete="off"
                    spellcheck="false"
                    list=if field.key == "grade" { Some("grades") } else { None }
                    value=initial
                    aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                    aria-describedby=move || error.with(Option::is_some).then(|| err_id2.clone())
                    on:focus=move |_| if ctx.current().is_some() { rule.enter(now()) }
                    on:input=move |e| {
                        let typed = event_target_value(&e);
                        let text = crate::units_view::from_field(sys, field.key, &typed);
                        let Some(m) = ctx.current() else { return; };
                        match fields::apply(&m, &field, &text) {
                            Ok(new) => match fields::engine_objection(&new, field.key) {
                                Some(msg) => unread(&typed, msg),
                                None => {
                                    rule.read();
                                    ctx.commit(new.clone());
                                    if let Some(cb) = after { cb.run(new); }
                                }
                            },
                            Err(msg) => unread(&typed, msg),
                        }
                    }
                />
                {(!field.unit.is_empty()).then(|| view! { <span class="unit">{crate::units_view::field_unit(sys, field.key, field.unit)}</span> })}
            </div>
            {move || error.get().map(|msg| view! {
                <p class="field-error" data-testid="field-error" id=err_id.clone()>"✎ " {msg}</p>
            })}
        </div>
    }
}

/// A select of options (value "" restores the engine's default).
#[component]
pub(super) fn ChoiceField(ctx: Ctx, choice: Choice) -> impl IntoView {
    let current = ctx
        .current()
        .map(|m| fields::read(&m, choice.place, choice.key))
        .unwrap_or_default();
    let input_id = format!("f-{}", choice.key);
    let error = RwSignal::new(None::<String>);
    let c2 = choice.clone();
    view! {
        <div class="field">
            <label for=input_id.clone()>{choice.label} <code class="key">{choice.key}</code></label>
            <select id=input_id name=choice.key on:change=move |e| {
                let v = event_target_value(&e);
                let Some(m) = ctx.current() else { return; };
                match fields::apply_choice(&m, &c2, &v) {
                    Ok(new) => { error.set(None); ctx.commit(new); }
                    Err(msg) => error.set(Some(msg)),
                }
            }>
                {choice.options.iter().map(|(v, label)| {
                    let sel = current == *v || (current.is_empty() && v.is_empty());
                    view! { <option value=*v selected=sel>{*label}</option> }
                }.into_any()).collect::<Vec<_>>()}
            </select>
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

#[component]
pub(super) fn IdField(ctx: Ctx) -> impl IntoView {
    let initial = ctx.current().map(|m| m.id).unwrap_or_default();
    let error = RwSignal::new(None::<String>);
    view! {
        <div class="field" class:has-error=move || error.with(Option::is_some)>
            <label for="f-id">"member id (rename here)" <code class="key">"id"</code></label>
            <input type="text" id="f-id" name="id" autocomplete="off" spellcheck="false" value=initial
                aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                on:input=move |e| {
                    let text = event_target_value(&e);
                    let sel = ctx.selected.get_untracked();
                    let old = ctx.current().map(|m| m.id).unwrap_or_default();
                    match ctx.with_members(|ms| listops::rename(ms, sel, &text)) {
                        Some(Ok(())) => {
                            error.set(None);
                            let list = ctx.ws.with_untracked(|w| w.active);
                            if ctx.drafts.with_untracked(|d| d.first(list, &old).is_some()) {
                                ctx.drafts.update(|d| d.rename(list, &old, text.trim()));
                            }
                        }
                        Some(Err(r)) => error.set(Some(r.message())),
                        None => {}
                    }
                } />
            {move || error.get().map(|msg| view! { <p class="field-error" data-testid="field-error">"✎ " {msg}</p> })}
        </div>
    }
}

#[component]
pub(super) fn AxisRestraint(ctx: Ctx, major: bool) -> impl IntoView {
    let (kf, lf, name, title) = if major {
        (
            fields::K_MAJOR,
            fields::LCR_MAJOR,
            "restraint_major",
            "end conditions, major axis",
        )
    } else {
        (
            fields::K_MINOR,
            fields::LCR_MINOR,
            "restraint_minor",
            "end conditions, minor axis",
        )
    };
    let (k, lcr, framed) = ctx
        .current()
        .map(|m| {
            if major {
                (m.k_major, m.lcr_major_mm, m.frame_major.is_some())
            } else {
                (m.k_minor, m.lcr_minor_mm, m.frame_minor.is_some())
            }
        })
        .unwrap_or((1.0, None, false));
    let restraint = RwSignal::new(Restraint::infer(k, lcr, framed));
    let generation = RwSignal::new(0u32);
    // What the block under the select shows: 0 the factor, 1 the length, 2 the frame.
    let shows = Memo::new(move |_| match restraint.get() {
        Restraint::Length => 1u8,
        Restraint::Frame => 2,
        _ => 0,
    });
    let after = Callback::new(move |m: Member| {
        let k = if major { m.k_major } else { m.k_minor };
        if let Some(f) = restraint.get_untracked().factor() {
            if (f - k).abs() > 1e-12 {
                restraint.set(Restraint::Factor);
            }
        }
    });
    let select_id = format!("f-{name}");
    view! {
        <div class="axis-restraint">
            <div class="field">
                <label for=select_id.clone()>{title}</label>
                <select id=select_id name=name prop:value=move || restraint.get().value() on:change=move |e| {
                    let r = Restraint::from_value(&event_target_value(&e));
                    restraint.set(r);
                    let Some(mut m) = ctx.current() else { return; };
                    let mut asks = false;
                    let (kk, ll, ff) = if major {
                        (&mut m.k_major, &mut m.lcr_major_mm, &mut m.frame_major)
                    } else {
                        (&mut m.k_minor, &mut m.lcr_minor_mm, &mut m.frame_minor)
                    };
                    match r {
                        Restraint::Length => {
                            if ll.is_none() {
                                *ll = Some(*kk * m.length_mm);
                            }
                            *ff = None;
                        }
                        Restraint::Frame => {
                            // The frame gives k: the axis' own k and length go
                            // (the engine refuses both together). G at each
                            // end is the engineer's to give: until both are
                            // typed the member needs input (the sway frame
                            // held meanwhile is never checked).
                            *kk = 1.0;
                            *ll = None;
                            if ff.is_none() {
                                *ff = Some(Frame { sway: true, g_a: 1.0, g_b: 1.0 });
                                asks = true;
                            }
                        }
                        other => {
                            if let Some(f) = other.factor() {
                                *kk = f;
                            }
                            *ll = None;
                            *ff = None;
                        }
                    }
                    ctx.commit(m);
                    for (end_b, key) in [false, true].into_iter().zip(crate::framing::g_keys(major)) {
                        if asks {
                            ctx.keep_draft(&key, "", &crate::framing::g_asks(&key, end_b));
                        } else if r != Restraint::Frame {
                            ctx.drop_draft(&key);
                        }
                    }
                    generation.update(|g| *g += 1);
                }>
                    {Restraint::all().into_iter().map(|r| view! {
                        <option value=r.value() selected=move || restraint.get_untracked() == r>{r.label()}</option>
                    }.into_any()).collect::<Vec<_>>()}
                </select>
            </div>
            {made_afresh(Signal::derive(move || key_of(&(generation.get(), shows.get()))), Arc::new(move || match shows.get_untracked() {
                1 => view! { <NumField ctx=ctx field=lf /> }.into_any(),
                2 => view! { <FrameEnds ctx=ctx major=major /> }.into_any(),
                _ => view! { <NumField ctx=ctx field=kf after=after /> }.into_any(),
            }))}
        </div>
    }
}

#[component]
pub(super) fn Editor(ctx: Ctx) -> impl IntoView {
    let Some(member) = ctx.current() else {
        return view! {
            <h2 id="h-editor" class="pane-title">"Member"</h2>
            <p class="empty">"This list has no members yet. Use “+ Add member” to start one."</p>
        }
        .into_any();
    };
    let kind = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or("rect", |m| fields::kind_of(&m.section))
        })
    });
    let mat_mode = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or(MaterialMode::Steel, |m| MaterialMode::of(&m.material))
        })
    });
    let method = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map_or(Method::Euler, |m| m.method)
        })
    });
    let title = Memo::new(move |_| {
        let sel = ctx.selected.get();
        ctx.ws.with(|w| {
            w.active_list()
                .and_then(|l| l.members.get(sel))
                .map(|m| m.id.clone())
                .unwrap_or_default()
        })
    });
    let initial_kind = fields::kind_of(&member.section);
    let initial_mode = MaterialMode::of(&member.material);
    let initial_method = member.method;
    let modelled = member.buckling_model.is_some();
    view! {
        <h2 id="h-editor" class="pane-title">"Member " <span class="editing-id">{move || title.get()}</span></h2>
        <super::list::MemberActions ctx=ctx id=title />
        <form class="editor" on:submit=|e| e.prevent_default() autocomplete="off">
            <fieldset>
                <legend>"Identity"</legend>
                <IdField ctx=ctx />
                <NumField ctx=ctx field=fields::NOTE />
            </fieldset>
            <fieldset>
                <legend>"Section"</legend>
                <div class="field">
                    <label for="f-kind">"shape" <code class="key">"kind"</code></label>
                    <select id="f-kind" name="kind" on:change=move |e| {
                        let k = event_target_value(&e);
                        if let Some(mut m) = ctx.current() {
                            m.section = fields::section_of_kind(&k, &m.section);
                            ctx.commit(m);
                        }
                    }>
                        {fields::KINDS.iter().map(|(k, label)| view! {
                            <option value=*k selected=*k == initial_kind>{*label}</option>
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                {made_afresh(Signal::derive(move || key_of(&kind.get())), Arc::new(move || {let k = kind.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::section_fields(k).iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::section_choices(k).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
            <fieldset>
                <legend>"Material"</legend>
                <div class="field">
                    <label for="f-material_mode">"material given as"</label>
                    <select id="f-material_mode" name="material_mode" on:change=move |e| {
                        let mode = MaterialMode::from_value(&event_target_value(&e));
                        if let Some(mut m) = ctx.current() {
                            m.material = mode.default_spec();
                            ctx.commit(m);
                        }
                    }>
                        {[MaterialMode::Grade, MaterialMode::Steel, MaterialMode::Timber].into_iter().map(|mm| {
                            let label = match mm {
                                MaterialMode::Grade => "a named grade or strength class",
                                MaterialMode::Steel => "custom steel values",
                                MaterialMode::Timber => "custom timber values",
                            };
                            view! { <option value=mm.value() selected=mm == initial_mode>{label}</option> }
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                <datalist id="grades">
                    {fields::GRADE_SUGGESTIONS.iter().map(|g| view! { <option value=*g></option> }.into_any()).collect::<Vec<_>>()}
                </datalist>
                {made_afresh(Signal::derive(move || key_of(&mat_mode.get())), Arc::new(move || {let mode = mat_mode.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::material_fields(mode).iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::material_choices(mode).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
            <fieldset>
                <legend>"Length and restraint"</legend>
                <NumField ctx=ctx field=fields::MEMBER_FIELDS[0] />
                {if modelled {
                    view! { <p class="hint" data-testid="restraint-by-model">"The flexural buckling lengths come from the column model below."</p> }.into_any()
                } else {
                    view! {
                        <AxisRestraint ctx=ctx major=true />
                        <AxisRestraint ctx=ctx major=false />
                    }.into_any()
                }}
            </fieldset>
            <ColumnModel ctx=ctx />
            <fieldset>
                <legend>"Design load"</legend>
                <NumField ctx=ctx field=fields::MEMBER_FIELDS[1] />
                <details class="bending-input" open=ctx.current().is_some_and(|m| m.has_moments())>
                    <summary>"Moments and lateral restraint"</summary>
                    <div class="field-grid">
                        {fields::BENDING_FIELDS.iter().map(|f| view! { <NumField ctx=ctx field=*f /> }.into_any()).collect::<Vec<_>>()}
                        {fields::bending_choices().into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                    </div>
                    <div inner_html=move || {
                        let sel = ctx.selected.get();
                        let sys = ctx.units.get();
                        ctx.checks.with(|c| c.0.get(sel).map(|c| crate::diagram::svg(&c.member, sys).into_string())).unwrap_or_default()
                    }></div>
                </details>
            </fieldset>
            <fieldset>
                <legend>"Method"</legend>
                <div class="field">
                    <label for="f-method">"design method" <code class="key">"method"</code></label>
                    <select id="f-method" name="method" on:change=move |e| {
                        if let Some(me) = Method::from_key(&event_target_value(&e)) {
                            if let Some(mut m) = ctx.current() {
                                m.method = me;
                                ctx.commit(m);
                            }
                        }
                    }>
                        {Method::ALL.iter().map(|me| view! {
                            <option value=me.key() selected=*me == initial_method>{me.title()}</option>
                        }.into_any()).collect::<Vec<_>>()}
                    </select>
                </div>
                {made_afresh(Signal::derive(move || key_of(&method.get())), Arc::new(move || {let me = method.get_untracked();
                    view! {
                        <div class="field-grid">
                            {fields::option_fields(me).into_iter().map(|f| view! { <NumField ctx=ctx field=f /> }.into_any()).collect::<Vec<_>>()}
                            {fields::method_choices(me).into_iter().map(|c| view! { <ChoiceField ctx=ctx choice=c /> }.into_any()).collect::<Vec<_>>()}
                        </div>
                    }
                }.into_any()))}
            </fieldset>
        </form>
    }
    .into_any()
}
