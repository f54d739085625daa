//! The buckling analysis of a member with a `buckling_model`: a column
//! per axis built from the member's segments, sections, material,
//! supports, restraints and loads, analysed by
//! [`crate::buckling::column::analyse`], and the check of such a member
//! segment by segment at the buckling lengths the analysis implies.

use serde::Serialize;

use crate::buckling::column::{Brace, Buckle, Column, Load, Part};
use crate::buckling::memo;
use crate::buckling::model::{BucklingModel, End};
use crate::buckling::Axis;
use crate::check::{CheckResult, Working};
use crate::error::{Error, Result};
use crate::member::Member;
use crate::method::{Input, Method};
use crate::outcome::{Arg, Warning};
use crate::section::Section;
use crate::trace::{put, step, sym, symbol, Scope, Trace};
use crate::units::Quantity;

/// Both axes' analyses of one member (what `strutline buckle` prints).
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct MemberBuckle {
    /// The member's id.
    pub id: String,
    /// About the major axis.
    pub major: Buckle,
    /// About the minor axis.
    pub minor: Buckle,
}

/// The sections of the segments (the member's where a segment has none),
/// built, and the modulus for buckling.
pub struct Resolved {
    /// One section a segment, in order (one for an empty list).
    pub sections: Vec<Section>,
    /// The segment lengths, mm.
    pub lengths: Vec<f64>,
    /// E for buckling, MPa (E_0,05 for timber).
    pub modulus_mpa: f64,
}

/// Builds the segments' sections and the material's modulus; errors name
/// `buckling_model.segments[i].section`.
pub fn resolve(
    member: &Member,
    model: &BucklingModel,
    own: &Section,
    modulus_mpa: f64,
) -> Result<Resolved> {
    if model.segments.is_empty() {
        return Ok(Resolved {
            sections: vec![own.clone()],
            lengths: vec![member.length_mm],
            modulus_mpa,
        });
    }
    let mut sections = Vec::with_capacity(model.segments.len());
    for (i, s) in model.segments.iter().enumerate() {
        sections.push(match &s.section {
            None => own.clone(),
            Some(spec) => crate::catalogue::build(spec).map_err(|e| Error::Key {
                key: format!("buckling_model.segments[{i}].section"),
                reason: e.to_string(),
            })?,
        });
    }
    Ok(Resolved {
        sections,
        lengths: model.segments.iter().map(|s| s.length_mm).collect(),
        modulus_mpa,
    })
}

/// The column about `axis` of a member with a model. Without loads the
/// pattern is `axial_kn` at end B (1 kN when that is 0, so the critical
/// force is still found).
pub fn column(member: &Member, model: &BucklingModel, r: &Resolved, axis: Axis) -> Column {
    let e = r.modulus_mpa;
    let parts = r
        .sections
        .iter()
        .zip(&r.lengths)
        .map(|(s, &l)| Part {
            length_mm: l,
            ei_nmm2: e * match axis {
                Axis::Major => s.props.i_major_mm4,
                Axis::Minor => s.props.i_minor_mm4,
            },
        })
        .collect();
    let pick = |end: &End| match axis {
        Axis::Major => end.major,
        Axis::Minor => end.minor,
    };
    let braces = model
        .restraints
        .iter()
        .enumerate()
        .filter(|(_, b)| b.axis.holds(axis))
        .map(|(index, b)| Brace {
            index,
            at_mm: b.at_mm,
            translation: b.translation,
        })
        .collect();
    let mut loads: Vec<Load> = model
        .axial_loads
        .iter()
        .enumerate()
        .map(|(index, p)| Load {
            index,
            at_mm: p.at_mm,
            axial_kn: p.axial_kn,
        })
        .collect();
    if !model.carries_own_loads() {
        loads.push(Load {
            index: 0,
            at_mm: member.length_mm,
            axial_kn: if member.axial_kn > 0.0 {
                member.axial_kn
            } else {
                1.0
            },
        });
    }
    Column {
        axis,
        length_mm: member.length_mm,
        parts,
        a: pick(&model.ends.a),
        b: pick(&model.ends.b),
        braces,
        loads,
        distributed_kn_per_m: model.distributed_kn_per_m,
    }
}

/// Both axes of a member with a buckling model; `Ok(None)` when the
/// member has none. Errors are wrapped with the member's id.
pub fn buckle(member: &Member) -> Result<Option<MemberBuckle>> {
    let Some(model) = &member.buckling_model else {
        return Ok(None);
    };
    let wrap = |e: Error| e.in_member(&member.id);
    let (section, material) = crate::check::resolve(member)?;
    let r = resolve(member, model, &section, material.strength_and_modulus().1).map_err(wrap)?;
    let major = memo::analyse(&column(member, model, &r, Axis::Major)).map_err(wrap)?;
    let minor = memo::analyse(&column(member, model, &r, Axis::Minor)).map_err(wrap)?;
    Ok(Some(MemberBuckle {
        id: member.id.clone(),
        major,
        minor,
    }))
}

/// The JSON `strutline buckle --json` prints: `{"results": [...]}` for
/// every member with a buckling model, in order.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct BuckleReport {
    /// One entry a member with a model.
    pub results: Vec<MemberBuckle>,
}

/// Analyses every member of a list that has a buckling model.
pub fn buckle_all(members: &[Member]) -> Result<BuckleReport> {
    let mut results = Vec::new();
    for m in members {
        if let Some(b) = buckle(m)? {
            results.push(b);
        }
    }
    Ok(BuckleReport { results })
}

/// The check of a member with a buckling model: both axes analysed, each
/// compressed segment checked by `method` with its own section, its own
/// largest compression and the buckling lengths the analysis implies for
/// it (pi sqrt(E I / (alpha_cr N))); the segment with the highest
/// utilisation governs. The working opens with the analysis.
pub fn check(input: &Input<'_>, method: Method) -> Result<CheckResult> {
    check_as(input, method, Working::Kept)
}

/// [`check`] with or without the working (the segments' checks and the
/// analysis' lines); the numbers are the same either way.
pub fn check_as(input: &Input<'_>, method: Method, working: Working) -> Result<CheckResult> {
    checked(input, method, None, working)
}

/// A member's analyses about both axes at its own length, kept for the
/// trials of the same member at other lengths (`solve::longest_length`):
/// each axis' result with the power by which its alpha_cr falls with the
/// length where that is exact ([`Column::length_power`]).
#[derive(Debug, Clone, PartialEq)]
pub struct Lengthwise {
    major: (Buckle, Option<i32>),
    minor: (Buckle, Option<i32>),
}

/// The analyses of a member with a model, for [`check_lengthened`];
/// `None` without a model, when neither axis scales exactly, or when the
/// member cannot be analysed (the trials then report it as they would).
pub fn lengthwise(input: &Input<'_>) -> Option<Lengthwise> {
    let member = input.member;
    let model = member.buckling_model.as_ref()?;
    let (_, modulus) = input.material.strength_and_modulus();
    let r = resolve(member, model, input.section, modulus).ok()?;
    let axis = |a: Axis| {
        let c = column(member, model, &r, a);
        memo::analyse(&c).ok().map(|b| (b, c.length_power()))
    };
    let (major, minor) = (axis(Axis::Major)?, axis(Axis::Minor)?);
    (major.1.is_some() || minor.1.is_some()).then_some(Lengthwise { major, minor })
}

/// [`check`] of `input`, whose member is the member of `base` with every
/// length times `s` (`solve::scaled`): an axis whose alpha_cr scales
/// exactly takes `base`'s result scaled ([`Buckle::lengthened`]), the
/// other is analysed. The same result as [`check`] to the analysis'
/// tolerance.
pub fn check_lengthened(
    input: &Input<'_>,
    method: Method,
    base: &Lengthwise,
    s: f64,
) -> Result<CheckResult> {
    checked(input, method, Some((base, s)), Working::Kept)
}

/// [`check`], each axis' analysis scaled from `scaled`'s where it scales
/// exactly, else analysed (through the memo).
fn checked(
    input: &Input<'_>,
    method: Method,
    scaled: Option<(&Lengthwise, f64)>,
    working: Working,
) -> Result<CheckResult> {
    let member = input.member;
    let wrap = |e: Error| e.in_member(&member.id);
    let Some(model) = &member.buckling_model else {
        return crate::check::evaluate(input, method, working);
    };
    // The analysis with the modulus the method reads (CSA S16-19's E);
    // a base analysed with another is not scaled from but analysed afresh.
    let material = crate::method::material_for(method, input.material);
    let scaled = scaled.filter(|_| matches!(material, std::borrow::Cow::Borrowed(_)));
    let (_, modulus) = material.strength_and_modulus();
    let r = resolve(member, model, input.section, modulus).map_err(wrap)?;
    let axis = |a: Axis| {
        let from_base = scaled.and_then(|(base, s)| {
            let (b, power) = match a {
                Axis::Major => &base.major,
                Axis::Minor => &base.minor,
            };
            power.map(|p| b.lengthened(s, p))
        });
        match from_base {
            Some(b) => Ok(b),
            None => memo::analyse(&column(member, model, &r, a)).map_err(wrap),
        }
    };
    let major = axis(Axis::Major)?;
    let minor = axis(Axis::Minor)?;
    check_analysed(input, method, model, &r, (&major, &minor), working)
}

/// The check of a member with a model given both axes' analyses.
fn check_analysed(
    input: &Input<'_>,
    method: Method,
    model: &BucklingModel,
    r: &Resolved,
    (major, minor): (&Buckle, &Buckle),
    working: Working,
) -> Result<CheckResult> {
    let member = input.member;
    let wrap = |e: Error| e.in_member(&member.id);
    let mut best: Option<(usize, CheckResult)> = None;
    let mut warnings: Vec<Warning> = Vec::new();
    // The model's braces bound each segment's unbraced length (its own
    // moment amplification), which the segment's member no longer holds.
    let unbraced = member.unbraced();
    for (i, (y, z)) in major.segments.iter().zip(&minor.segments).enumerate() {
        let (Some(ly), Some(lz)) = (y.buckling_length_mm, z.buckling_length_mm) else {
            continue;
        };
        let mut m = member.clone();
        m.buckling_model = None;
        if let Some(Some(spec)) = model.segments.get(i).map(|s| s.section.clone()) {
            m.section = spec;
        }
        m.axial_kn = y.axial_kn;
        m.lcr_major_mm = Some(ly);
        m.lcr_minor_mm = Some(lz);
        let key = |e: Error| {
            Error::Key {
                key: format!("buckling_model.segments[{i}]"),
                reason: e.to_string(),
            }
            .in_member(&member.id)
        };
        let (section, material) = crate::check::resolve(&m).map_err(key)?;
        let seg = Input {
            member: &m,
            section: &section,
            material: &material,
        };
        let result =
            crate::check::evaluate_within(&seg, method, working, Some(unbraced)).map_err(key)?;
        for w in &result.warnings {
            if !warnings.iter().any(|x| x.code == w.code) {
                warnings.push(w.clone());
            }
        }
        if best
            .as_ref()
            .is_none_or(|(_, b)| result.utilisation > b.utilisation)
        {
            best = Some((i, result));
        }
    }
    let Some((governing, mut result)) = best else {
        return Err(wrap(Error::Key {
            key: "buckling_model".into(),
            reason: "no segment is compressed by the load pattern".into(),
        }));
    };
    let mut trace = if result.trace.is_on() {
        Trace::with_capacity(result.trace.len() + 8 + 2 * r.lengths.len())
    } else {
        Trace::off()
    };
    for (scope, b, sym_alpha) in [
        (Scope::Major, major, symbol!("alpha_cr,y", "-")),
        (Scope::Minor, minor, symbol!("alpha_cr,z", "-")),
    ] {
        put(
            &mut trace,
            scope,
            sym_alpha,
            sym!("critical load factor of the load pattern, finite-element analysis (beam elements with geometric stiffness)"),
            b.load_factor,
            sym!("elastic critical load analysis, EN 1993-1-1 5.2.2 / AISC 360-16 App. 7"),
        );
        step!(
            &mut trace,
            scope,
            "n_el",
            "elements of the converged mesh",
            b.elements as f64,
            "-",
            "converged when alpha_cr changes by at most 1e-6 from half as many elements"
        );
        step!(
            &mut trace,
            scope,
            "alpha_cr,half",
            "critical load factor with half as many elements",
            b.load_factor_half,
            "-",
            "convergence"
        );
        for s in &b.segments {
            step!(
                &mut trace,
                scope,
                "L_cr",
                "buckling length of each segment in turn from end A, pi sqrt(EI / (alpha_cr N_Ed))",
                s.buckling_length_mm.unwrap_or(0.0),
                "mm",
                "implied by the analysis"
            );
        }
    }
    step!(
        &mut trace,
        Scope::Member,
        "seg",
        "governing segment, counted from end A",
        (governing + 1) as f64,
        "-",
        "highest utilisation"
    );
    step!(
        &mut trace,
        Scope::Member,
        "N_Ed",
        "design compression of the governing segment (its largest), from the model's loads",
        result.axial_kn,
        "kN",
        "load pattern of the buckling_model"
    );
    for s in std::mem::take(&mut result.trace).into_steps() {
        put(&mut trace, s.scope, s.symbol, s.label, s.value, s.clause);
    }
    result.trace = trace;
    warnings.push(Warning::new(
        "buckling-model",
        format!(
            "flexural buckling lengths from the elastic critical load analysis of the buckling_model \
             ({} and {} elements, alpha_cr = {:.4} major, {:.4} minor); segment {} of {} governs; \
             torsional modes use the member's own buckling length",
            major.elements,
            minor.elements,
            major.load_factor,
            minor.load_factor,
            governing + 1,
            r.lengths.len()
        ),
    ));
    let largest = major
        .segments
        .iter()
        .fold(0.0_f64, |a, s| a.max(s.axial_kn));
    if model.carries_own_loads() && (largest - member.axial_kn).abs() > 1e-9 * largest.max(1.0) {
        warnings.push(Warning::with_args(
            "axial-kn-from-model",
            "each segment is checked at its force from the model's loads (largest {}); \
             the member's axial_kn ({}) is not used",
            &[
                Arg::figure(largest, Quantity::Force, 1),
                Arg::figure(member.axial_kn, Quantity::Force, Warning::AS_GIVEN),
            ],
        ));
    }
    result.warnings = warnings;
    result.id = member.id.clone();
    result.segment = Some(crate::check::SegmentOf {
        index: governing + 1,
        count: r.lengths.len(),
    });
    Ok(result)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::check::Mode;
    use serde_json::json;
    use std::f64::consts::PI;

    /// An invented stair-core post: 7.2 m, HE 200 B-like I section below,
    /// a lighter one above 4.8 m, fixed base, pinned top, a floor at 3.6 m.
    fn post(extra: serde_json::Value) -> Member {
        let mut m = json!({
            "id": "SC-3",
            "section": {"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 15,
                        "web_mm": 9, "root_radius_mm": 18, "make": "rolled"},
            "material": {"grade": "S355"},
            "length_mm": 7200, "axial_kn": 600, "method": "euler"
        });
        for (k, v) in extra.as_object().unwrap() {
            m[k] = v.clone();
        }
        serde_json::from_value(m).unwrap()
    }

    fn model() -> serde_json::Value {
        json!({
            "segments": [
                {"length_mm": 4800},
                {"length_mm": 2400, "section": {"kind": "i", "depth_mm": 160, "width_mm": 160,
                  "flange_mm": 13, "web_mm": 8, "root_radius_mm": 15, "make": "rolled"}}
            ],
            "ends": {"a": {"major": {"translation": "fixed", "rotation": "fixed"},
                           "minor": {"translation": "fixed", "rotation": 2000}},
                     "b": {"major": {"translation": "fixed", "rotation": "free"},
                           "minor": {"translation": 50, "rotation": "free"}}},
            "restraints": [{"at_mm": 3600, "axis": "minor", "translation": "fixed"}],
            "axial_loads": [{"at_mm": 3600, "axial_kn": 250}, {"at_mm": 7200, "axial_kn": 350}],
            "distributed_kn_per_m": 0.6
        })
    }

    #[test]
    fn a_segment_may_name_a_catalogue_section() {
        // The upper segment as a catalogue designation gives the same
        // analysis as the same section typed out (HE 200 B, EN 10365:2017:
        // h 200, b 200, t_w 9, t_f 15, r 18: the dimensions of `post`).
        let typed = post(json!({"buckling_model": {
            "segments": [{"length_mm": 4800},
                         {"length_mm": 2400, "section": {"kind": "i", "depth_mm": 200,
                          "width_mm": 200, "flange_mm": 15, "web_mm": 9, "root_radius_mm": 18,
                          "make": "rolled"}}],
            "ends": {"a": {"major": {"translation": "fixed", "rotation": "fixed"},
                           "minor": {"translation": "fixed", "rotation": "fixed"}},
                     "b": {"major": {"translation": "fixed", "rotation": "free"},
                           "minor": {"translation": "fixed", "rotation": "free"}}}}}));
        let mut named = typed.clone();
        if let Some(model) = named.buckling_model.as_mut() {
            model.segments[1].section = Some(
                serde_json::from_value(json!({"kind": "catalogue", "designation": "HE 200 B"}))
                    .unwrap(),
            );
        }
        let (a, b) = (
            buckle(&typed).unwrap().unwrap(),
            buckle(&named).unwrap().unwrap(),
        );
        let rel = (a.major.load_factor - b.major.load_factor).abs() / a.major.load_factor;
        // The catalogue's tabulated properties against those computed from
        // the dimensions: within the catalogue test's 1%.
        assert!(
            rel < 0.01,
            "{} {}",
            a.major.load_factor,
            b.major.load_factor
        );
        let mut unknown = named.clone();
        if let Some(model) = unknown.buckling_model.as_mut() {
            model.segments[1].section = Some(
                serde_json::from_value(json!({"kind": "catalogue", "designation": "HE 999 Q"}))
                    .unwrap(),
            );
        }
        let e = buckle(&unknown).unwrap_err().to_string();
        assert!(
            e.contains("buckling_model.segments[1].section") && e.contains("HE 999 Q"),
            "{e}"
        );
    }

    #[test]
    fn frame_keys_give_k_from_the_chart_with_working() {
        let m = post(
            json!({"frame_major": {"sway": true, "g_a": 1.0, "g_b": 1.0},
                            "frame_minor": {"sway": false, "g_a": 0.0, "g_b": 0.0}}),
        );
        let r = crate::check_member(&m).unwrap();
        let major = r.modes.iter().find(|x| x.mode == Mode::Major).unwrap();
        let minor = r.modes.iter().find(|x| x.mode == Mode::Minor).unwrap();
        assert!((major.buckling_length_mm / 7200.0 - 1.317_275_102_6).abs() < 1e-9);
        assert!((minor.buckling_length_mm / 7200.0 - 0.5).abs() < 1e-12);
        assert!(r
            .trace
            .iter()
            .any(|s| s.symbol == "k" && s.clause.contains("C-A-7-2")));
        let clash =
            post(json!({"frame_major": {"sway": true, "g_a": 1.0, "g_b": 1.0}, "k_major": 2.0}));
        assert_eq!(
            crate::check_member(&clash).unwrap_err().field(),
            Some("frame_major")
        );
    }

    #[test]
    fn the_model_round_trips_through_the_member_file() {
        let m = post(json!({"buckling_model": model()}));
        let mut f = crate::file::MemberFile::new("t");
        f.members.push(m.clone());
        let text = f.to_json();
        assert!(text.contains("\"version\": 3") && text.contains("\"rotation\": 2000"));
        assert_eq!(crate::file::parse(&text).unwrap().members[0], m);
        // Unknown keys and bad words are refused, naming the path.
        let mut bad = model();
        bad["ends"]["a"]["major"]["translation"] = json!("loose");
        let raw = json!({"id": "X", "section": {"kind": "round", "diameter_mm": 50},
            "material": {"grade": "S355"}, "length_mm": 7200, "axial_kn": 1,
            "method": "euler", "buckling_model": bad});
        let e = crate::file::member_from_value(&raw, 0)
            .unwrap_err()
            .to_string();
        assert!(e.contains("buckling_model.ends.a.major.translation"), "{e}");
    }

    #[test]
    fn buckle_reports_both_axes_in_the_documented_shape() {
        let m = post(json!({"buckling_model": model()}));
        let report = buckle_all(&[m.clone(), post(json!({}))]).unwrap();
        assert_eq!(report.results.len(), 1);
        let v = serde_json::to_value(&report).unwrap();
        let major = &v["results"][0]["major"];
        assert_eq!(v["results"][0]["id"], "SC-3");
        for key in ["load_factor", "critical_kn", "buckling_length_mm"] {
            assert!(major[key].as_f64().unwrap() > 0.0, "{key}");
        }
        let mode = major["mode"].as_array().unwrap();
        let peak = mode
            .iter()
            .map(|p| p[1].as_f64().unwrap().abs())
            .fold(0.0, f64::max);
        assert!((peak - 1.0).abs() < 1e-12);
        // critical_kn is alpha_cr times the largest compression: 250 + 350
        // + 0.6 x 7.2 = 604.32 kN at the base; the buckling length is that
        // of the most compressed (lower) segment.
        let b = &report.results[0].major;
        assert!((b.critical_kn - b.load_factor * 604.32).abs() < 1e-9 * b.critical_kn);
        let (s, _) = crate::check::resolve(&m).unwrap();
        let ei = 210_000.0 * s.props.i_major_mm4;
        assert!((b.buckling_length_mm - PI * (ei / (b.critical_kn * 1000.0)).sqrt()).abs() < 1e-6);
    }

    #[test]
    fn check_uses_the_analysis_segment_by_segment() {
        let m = post(json!({"buckling_model": model(), "axial_kn": 604.32}));
        let b = buckle(&m).unwrap().unwrap();
        let r = crate::check_member(&m).unwrap();
        // Euler: each segment's N_cr is alpha_cr times its own force, so
        // the governing segment's modes carry exactly that.
        let seg: usize = r.trace.iter().find(|s| s.symbol == "seg").unwrap().value as usize - 1;
        let major = r.modes.iter().find(|x| x.mode == Mode::Major).unwrap();
        let minor = r.modes.iter().find(|x| x.mode == Mode::Minor).unwrap();
        let want_y = b.major.load_factor * b.major.segments[seg].axial_kn;
        let want_z = b.minor.load_factor * b.minor.segments[seg].axial_kn;
        assert!(
            (major.critical_kn - want_y).abs() < 1e-6 * want_y,
            "{} {want_y}",
            major.critical_kn
        );
        assert!((minor.critical_kn - want_z).abs() < 1e-6 * want_z);
        // The result names the governing segment and its force, the N_Ed
        // it was checked at.
        assert_eq!(
            r.segment,
            Some(crate::check::SegmentOf {
                index: seg + 1,
                count: 2
            })
        );
        assert_eq!(r.axial_kn, b.major.segments[seg].axial_kn);
        assert!(r.warnings.iter().any(|w| w.code == "buckling-model"));
        assert!(!r.warnings.iter().any(|w| w.code == "axial-kn-from-model"));
        // Each segment checked on its own: the governing one has the
        // highest utilisation of the two.
        for i in 0..2 {
            let mut one = m.clone();
            one.buckling_model = None;
            if let Some(s) = &model_of(&m).segments[i].section {
                one.section = s.clone();
            }
            one.axial_kn = b.major.segments[i].axial_kn;
            one.lcr_major_mm = b.major.segments[i].buckling_length_mm;
            one.lcr_minor_mm = b.minor.segments[i].buckling_length_mm;
            let u = crate::check_member(&one).unwrap().utilisation;
            assert!(u <= r.utilisation * (1.0 + 1e-12));
        }
        // A model refuses a k or frame given beside it.
        let clash = post(json!({"buckling_model": model(), "lcr_minor_mm": 3000}));
        assert_eq!(
            crate::check_member(&clash).unwrap_err().field(),
            Some("lcr_minor_mm")
        );
    }

    fn model_of(m: &Member) -> &BucklingModel {
        m.buckling_model.as_ref().unwrap()
    }
}
