//! Checking one member: resolve its section and material, classify the
//! cross-section, run the method about both axes and, where they apply,
//! for torsional or flexural-torsional buckling and the cross-section
//! resistance ([`crate::stability`]), pick the governing mode and collect
//! the working.

pub mod buckle;
pub mod reach;

use serde::Serialize;

use crate::bending::{self, Bending};
use crate::error::Result;
use crate::interaction;
use crate::material::Material;
use crate::member::{Member, Unbraced};
use crate::method::{self, Input, Method};
pub use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::{Family, Properties, Section};
use crate::stability;
use crate::trace::Trace;

/// `governing_check` of a member with axial load and moments whose
/// method's interaction equations are not worked: never passed.
pub const NOT_CHECKED: &str = "combined-not-checked";

impl CheckResult {
    /// Whether the result is within a utilisation `limit` as
    /// [`CheckResult::passes`] is within 1: the utilisation at most `limit`,
    /// the code's limits met, and not a beam-column whose interaction was
    /// not worked ([`NOT_CHECKED`]). What the sizing search accepts.
    pub fn within(&self, limit: f64) -> bool {
        self.utilisation <= limit && self.within_limits() && self.governing_check != NOT_CHECKED
    }

    /// Whether the member meets the limits its code sets apart from the
    /// load: CSA S16-19 10.4.2.1 (the slenderness ratio of a compression
    /// member shall not exceed 200). [`CheckResult::passes`] includes it.
    pub fn within_limits(&self) -> bool {
        within_limits(self.method, &self.modes)
    }

    /// Why the member fails a limit of its code whatever its load (the
    /// result's own warning), when it does.
    pub fn limit_exceeded(&self) -> Option<&str> {
        limit_exceeded(self.method, &self.modes, &self.warnings)
    }
}

/// [`CheckResult::within_limits`] of a result's method and modes.
fn within_limits(method: Method, modes: &[ModeResult]) -> bool {
    !(method == Method::CsaS16 && method::csa_s16::over_slenderness_limit(modes))
}

/// [`CheckResult::limit_exceeded`] of a result's method, modes and warnings.
fn limit_exceeded<'w>(
    method: Method,
    modes: &[ModeResult],
    warnings: &'w [Warning],
) -> Option<&'w str> {
    if within_limits(method, modes) {
        return None;
    }
    Some(
        warnings
            .iter()
            .find(|w| w.code == "slenderness-over-200")
            .and_then(Warning::fixed)
            .unwrap_or("a slenderness limit of the code is exceeded"),
    )
}

/// The properties a result reports.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SectionSummary {
    /// A, mm2.
    pub area_mm2: f64,
    /// I about the major principal axis, mm4.
    pub i_major_mm4: f64,
    /// I about the minor principal axis, mm4.
    pub i_minor_mm4: f64,
    /// Radius of gyration, major axis, mm.
    pub r_major_mm: f64,
    /// Radius of gyration, minor axis, mm.
    pub r_minor_mm: f64,
    /// St Venant torsion constant, mm4.
    pub torsion_mm4: f64,
    /// Warping constant, mm6.
    pub warping_mm6: f64,
}

impl From<&Properties> for SectionSummary {
    fn from(p: &Properties) -> Self {
        SectionSummary {
            area_mm2: p.area_mm2,
            i_major_mm4: p.i_major_mm4,
            i_minor_mm4: p.i_minor_mm4,
            r_major_mm: p.r_major_mm,
            r_minor_mm: p.r_minor_mm,
            torsion_mm4: p.torsion_mm4,
            warping_mm6: p.warping_mm6,
        }
    }
}

/// The modes of a check, held inline: a check has at most four (both
/// axes, the twisting mode, the cross-section or refused mode), so a
/// result's modes need no allocation of their own (read as a slice).
pub type Modes = smallvec::SmallVec<[ModeResult; 4]>;

/// Which segment of a buckling model governs: `index` of `count`, counted
/// from 1 at end A.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
pub struct SegmentOf {
    /// The governing segment, 1 at end A.
    pub index: usize,
    /// The model's segments (1 for a model without segments).
    pub count: usize,
}

/// The outcome of checking one member.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct CheckResult {
    /// The member's id.
    pub id: String,
    /// The method used.
    pub method: Method,
    /// Whether the design load is within the resistance (utilisation <= 1).
    pub passes: bool,
    /// Design load over design resistance: the axial utilisation, or with
    /// moments the largest of the axial, bending and interaction
    /// utilisations (under a method whose interaction is not in this build,
    /// the plain sum of the axial and bending ones, and the member does not
    /// pass: see `governing_check`).
    pub utilisation: f64,
    /// What sets the utilisation: `"bending-major"`, `"bending-minor"`, the
    /// governing axial mode's key, an interaction equation's name
    /// (`"6.62"`, `"6.24"`, `"secant"`, ...), or `"combined-not-checked"`
    /// for a member with both axial load and moments under a method whose
    /// interaction is not in this build.
    pub governing_check: &'static str,
    /// Design resistance of the governing mode, kN.
    pub resistance_kn: f64,
    /// The design compression N_Ed the member was checked at, kN: its
    /// `axial_kn`, or with a `buckling_model` the governing segment's
    /// largest compression under the model's loads ([`Self::segment`]).
    pub axial_kn: f64,
    /// With a `buckling_model`: the segment that governs, counted from 1
    /// at end A, of how many (`null` without a model).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub segment: Option<SegmentOf>,
    /// The governing mode.
    pub governing: Mode,
    /// Characteristic squash load A f_y (or A f_c,0,k), kN.
    pub squash_kn: f64,
    /// Strength used: f_y (steel) or f_c,0,k (timber), MPa.
    pub strength_mpa: f64,
    /// Modulus used for buckling, MPa (E, or E_0,05 for timber).
    pub modulus_mpa: f64,
    /// Section properties.
    pub section: SectionSummary,
    /// Every mode checked.
    pub modes: Modes,
    /// The bending side (member file version 3), `null` without moments.
    pub bending: Option<Bending>,
    /// The beam-column interaction equations worked, one entry each
    /// (empty unless the member carries both axial load and a moment).
    pub interaction: Vec<interaction::Check>,
    /// Cautions: limit states not covered, values outside a method's range.
    pub warnings: Vec<Warning>,
    /// The working.
    pub trace: Trace,
}

/// Whether a check writes its working ([`CheckResult::trace`]).
///
/// The numbers are the same either way (a property test compares every
/// result with and without working, bit for bit); without it a check
/// allocates nothing for the working and skips the text look-ups of the
/// working, for the checks nobody reads the working of: a batch's
/// summaries, sizing candidates, envelope samples, reverse solves.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default)]
pub enum Working {
    /// Every step, with its clause (what a result shown to a person needs).
    #[default]
    Kept,
    /// No steps: the result's `trace` is empty.
    Skipped,
}

impl Working {
    /// An empty trace of this kind.
    pub fn trace(self) -> Trace {
        match self {
            Working::Kept => Trace::with_capacity(96),
            Working::Skipped => Trace::off(),
        }
    }

    /// An empty trace of this kind with room for a member's whole working:
    /// a check with moments writes up to some 175 lines (the bending and
    /// interaction working of EN 1993-1-1 Annex A, both axes), one without
    /// up to some 75, so neither grows its trace while it runs.
    pub fn trace_for(self, moments: bool) -> Trace {
        match (self, moments) {
            (Working::Kept, true) => Trace::with_capacity(176),
            _ => self.trace(),
        }
    }
}

impl CheckResult {
    /// The classification and effective widths this result used, for
    /// drawing them (see [`stability::effective::of_check`]).
    pub fn effective(
        &self,
        input: &Input<'_>,
    ) -> Option<(
        stability::classify::Classified,
        stability::effective::Effective,
    )> {
        stability::effective::of_check(input, self.method, &self.modes, self.governing)
    }
}

/// A member ready to check: section built and material resolved once.
#[derive(Debug, Clone, PartialEq)]
pub struct Prepared {
    /// The member as written.
    pub member: Member,
    /// Its section.
    pub section: Section,
    /// Its material.
    pub material: Material,
}

impl Prepared {
    /// Validates the member and resolves its section and material.
    pub fn new(member: &Member) -> Result<Prepared> {
        let (section, material) = resolve(member)?;
        member
            .buckling_lengths()
            .map_err(|e| e.in_member(&member.id))?;
        Ok(Prepared {
            member: member.clone(),
            section,
            material,
        })
    }

    /// The method input.
    pub fn input(&self) -> Input<'_> {
        Input {
            member: &self.member,
            section: &self.section,
            material: &self.material,
        }
    }

    /// Checks the member with its own method.
    pub fn check(&self) -> Result<CheckResult> {
        self.check_with(self.member.method)
    }

    /// Checks the member with another method (for comparing codes).
    pub fn check_with(&self, method: Method) -> Result<CheckResult> {
        run(&self.input(), method)
    }

    /// Checks the member with `method`, with or without its working.
    pub fn check_as(&self, method: Method, working: Working) -> Result<CheckResult> {
        evaluate(&self.input(), method, working)
    }

    /// Checks the member with `method` into `scratch` ([`Scratch::check`]):
    /// the batch form, which allocates nothing once the scratch's lists
    /// have grown.
    pub fn check_in<'s>(&self, scratch: &'s mut Scratch, method: Method) -> Result<Brief<'s>> {
        scratch.check(&self.input(), method)
    }
}

/// Runs `method` on a resolved member: classification (with the EN
/// 1993-1-5 effective area of a Class 4 section, or the AISC E7 effective
/// area per mode), both axes, the twisting mode of open sections, the
/// EN 1993-1-1 cross-section mode, the governing mode, the working. Shared by [`Prepared`] and [`check_member`], which borrows
/// instead of cloning so the hot path allocates only the result.
pub fn run(input: &Input<'_>, method: Method) -> Result<CheckResult> {
    evaluate(input, method, Working::Kept)
}

/// [`run`], with or without the working ([`Working`]); the numbers are the
/// same either way.
pub fn evaluate(input: &Input<'_>, method: Method, working: Working) -> Result<CheckResult> {
    if input.member.buckling_model.is_some() {
        return buckle::check_as(input, method, working);
    }
    evaluate_within(input, method, working, None)
}

/// [`evaluate`] of a member without a buckling model whose laterally
/// unbraced lengths are `unbraced` (a buckling model's segment: the model's
/// braces bound them, [`Member::unbraced`](crate::member::Member::unbraced));
/// `None`: the member's own, worked only where an interaction needs them.
pub(crate) fn evaluate_within(
    input: &Input<'_>,
    method: Method,
    working: Working,
    unbraced: Option<Unbraced>,
) -> Result<CheckResult> {
    // The moments asked only where they size the working's list.
    let mut parts = Scratch::sized(
        working,
        working == Working::Kept && input.member.has_moments(),
    );
    let verdict = work(input, method, &mut parts, unbraced)?;
    // The lists moved field by field, not through a destructured copy of
    // the scratch (one 192-byte copy fewer a check).
    Ok(verdict.with_lists(
        input.member.id.clone(),
        parts.modes,
        parts.bending,
        parts.interaction,
        parts.warnings,
        parts.trace,
    ))
}

/// The numbers of a check without its lists: what [`CheckResult`] holds
/// besides its id, modes, bending, interaction, warnings and working.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Verdict {
    /// [`CheckResult::method`].
    pub method: Method,
    /// [`CheckResult::passes`].
    pub passes: bool,
    /// [`CheckResult::utilisation`].
    pub utilisation: f64,
    /// [`CheckResult::governing_check`].
    pub governing_check: &'static str,
    /// [`CheckResult::resistance_kn`].
    pub resistance_kn: f64,
    /// [`CheckResult::axial_kn`].
    pub axial_kn: f64,
    /// [`CheckResult::segment`].
    pub segment: Option<SegmentOf>,
    /// [`CheckResult::governing`].
    pub governing: Mode,
    /// [`CheckResult::squash_kn`].
    pub squash_kn: f64,
    /// [`CheckResult::strength_mpa`].
    pub strength_mpa: f64,
    /// [`CheckResult::modulus_mpa`].
    pub modulus_mpa: f64,
    /// [`CheckResult::section`].
    pub section: SectionSummary,
}

/// The lists a check fills, kept between checks: a batch checks member
/// after member through one [`Scratch`] with [`Scratch::check`], so once
/// its lists have grown a check allocates nothing (sizing's candidates and
/// the envelope's samples are checked so). The numbers and lists are those
/// of [`evaluate`] (the same code fills them; a property test compares the
/// two bit for bit). `Scratch::default()` keeps the working, as
/// [`Working::default`] does; a batch takes `Scratch::new(Working::Skipped)`.
#[derive(Debug, Clone, Default)]
pub struct Scratch {
    modes: Modes,
    warnings: Vec<Warning>,
    interaction: Vec<interaction::Check>,
    bending: Option<Bending>,
    trace: Trace,
    /// Where the cross-section is classified ([`stability::assess`]),
    /// started afresh by each check.
    classified: stability::classify::Classified,
}

/// A check's outcome borrowed from the [`Scratch`] that worked it: the
/// [`Verdict`] (read through it: `brief.utilisation`) and the lists of a
/// [`CheckResult`], valid until the scratch's next check.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Brief<'a> {
    /// The numbers.
    pub verdict: Verdict,
    /// [`CheckResult::modes`].
    pub modes: &'a [ModeResult],
    /// [`CheckResult::bending`].
    pub bending: Option<&'a Bending>,
    /// [`CheckResult::interaction`].
    pub interaction: &'a [interaction::Check],
    /// [`CheckResult::warnings`].
    pub warnings: &'a [Warning],
    /// [`CheckResult::trace`] (empty unless the scratch keeps the working).
    pub trace: &'a Trace,
}

impl std::ops::Deref for Brief<'_> {
    type Target = Verdict;
    fn deref(&self) -> &Verdict {
        &self.verdict
    }
}

impl Brief<'_> {
    /// [`CheckResult::within`].
    pub fn within(&self, limit: f64) -> bool {
        self.utilisation <= limit && self.within_limits() && self.governing_check != NOT_CHECKED
    }

    /// [`CheckResult::within_limits`].
    pub fn within_limits(&self) -> bool {
        within_limits(self.method, self.modes)
    }

    /// [`CheckResult::limit_exceeded`].
    pub fn limit_exceeded(&self) -> Option<&str> {
        limit_exceeded(self.method, self.modes, self.warnings)
    }

    /// The owned result of the member `id`, as [`evaluate`] gives it.
    pub fn to_result(&self, id: &str) -> CheckResult {
        self.verdict.with_lists(
            id.to_string(),
            Modes::from_slice(self.modes),
            self.bending.copied(),
            self.interaction.to_vec(),
            self.warnings.to_vec(),
            self.trace.clone(),
        )
    }
}

impl Verdict {
    /// The owned result of these numbers with its id and lists.
    fn with_lists(
        self,
        id: String,
        modes: Modes,
        bending: Option<Bending>,
        interaction: Vec<interaction::Check>,
        warnings: Vec<Warning>,
        trace: Trace,
    ) -> CheckResult {
        let v = self;
        CheckResult {
            id,
            method: v.method,
            passes: v.passes,
            utilisation: v.utilisation,
            governing_check: v.governing_check,
            resistance_kn: v.resistance_kn,
            axial_kn: v.axial_kn,
            segment: v.segment,
            governing: v.governing,
            squash_kn: v.squash_kn,
            strength_mpa: v.strength_mpa,
            modulus_mpa: v.modulus_mpa,
            section: v.section,
            modes,
            bending,
            interaction,
            warnings,
            trace,
        }
    }
}

impl Scratch {
    /// Empty lists, with the working kept or not.
    #[inline]
    pub fn new(working: Working) -> Scratch {
        Scratch::sized(working, false)
    }

    /// Empty lists, the trace with room for the working of a member with
    /// or without moments ([`Working::trace_for`]).
    #[inline]
    fn sized(working: Working, moments: bool) -> Scratch {
        Scratch {
            modes: Modes::new(),
            warnings: Vec::new(),
            interaction: Vec::new(),
            bending: None,
            trace: working.trace_for(moments),
            classified: stability::classify::Classified::default(),
        }
    }

    /// Checks a resolved member with `method` (as [`evaluate`] does, with
    /// this scratch's working), writing the lists into this scratch.
    pub fn check(&mut self, input: &Input<'_>, method: Method) -> Result<Brief<'_>> {
        let verdict = if input.member.buckling_model.is_some() {
            // A member with a buckling model is checked segment by segment
            // (check::buckle), which gives a whole result; its lists are
            // moved in here.
            let on = self.trace.is_on();
            let working = if on { Working::Kept } else { Working::Skipped };
            let r = buckle::check_as(input, method, working)?;
            self.modes = r.modes;
            self.warnings = r.warnings;
            self.interaction = r.interaction;
            self.bending = r.bending;
            if on {
                self.trace = r.trace;
            } else {
                self.trace.clear();
            }
            Verdict {
                method: r.method,
                passes: r.passes,
                utilisation: r.utilisation,
                governing_check: r.governing_check,
                resistance_kn: r.resistance_kn,
                axial_kn: r.axial_kn,
                segment: r.segment,
                governing: r.governing,
                squash_kn: r.squash_kn,
                strength_mpa: r.strength_mpa,
                modulus_mpa: r.modulus_mpa,
                section: r.section,
            }
        } else {
            self.modes.clear();
            self.warnings.clear();
            self.interaction.clear();
            self.bending = None;
            self.trace.clear();
            work(input, method, self, None)?
        };
        Ok(Brief {
            verdict,
            modes: &self.modes,
            bending: self.bending.as_ref(),
            interaction: &self.interaction,
            warnings: &self.warnings,
            trace: &self.trace,
        })
    }
}

/// The check of a resolved member without a buckling model, its lists
/// written into `parts` (empty on entry). Inlined into both callers, so
/// [`evaluate`]'s result is written in place as before.
#[inline(always)]
fn work(
    input: &Input<'_>,
    method: Method,
    parts: &mut Scratch,
    unbraced: Option<Unbraced>,
) -> Result<Verdict> {
    let Scratch {
        modes,
        warnings,
        interaction: checks,
        bending: bending_slot,
        trace,
        classified,
    } = parts;
    let material = method::material_for(method, input.material);
    let input = &Input {
        material: &material,
        ..*input
    };
    let m = input.member;
    let wrap = |e: crate::error::Error| e.in_member(&m.id);
    let lengths = m.buckling_lengths().map_err(wrap)?;
    for (frame, which) in [
        (&m.frame_major, crate::buckling::chart::FrameKey::Major),
        (&m.frame_minor, crate::buckling::chart::FrameKey::Minor),
    ] {
        if let Some(f) = frame {
            crate::buckling::chart::work(f, which, trace).map_err(wrap)?;
        }
    }
    method::prelude(method, input, trace, warnings).map_err(wrap)?;
    let assessment = stability::assess(method, input, trace, warnings, classified);
    // EN 1993-1-1 6.3.1.3 / 6.3.1.4 for Class 4: the method's formulas with
    // A_eff in place of A (N_cr from the gross section).
    let effective_section = assessment.en_effective.map(|eff| Section {
        spec: input.section.spec.clone(),
        family: input.section.family,
        props: Properties {
            area_mm2: eff.area_mm2,
            ..input.section.props
        },
        designation: None,
    });
    let axes = match &effective_section {
        Some(section) => Input {
            member: input.member,
            section,
            material: input.material,
        },
        None => *input,
    };
    let mut major = method::axis(
        method,
        &axes,
        Mode::Major,
        lengths.major_mm,
        trace,
        warnings,
    )
    .map_err(wrap)?;
    // Angle branch: AISC 360-16 E5 for an angle connected through one leg
    // replaces the minor-axis mode and may waive the E4 mode.
    let e5 = method::aisc360::e5_connection(method, input, warnings);
    let mut minor = match e5 {
        Some((c, basis)) => method::aisc360::e5(&axes, c, basis, trace, warnings),
        None => method::axis(
            method,
            &axes,
            Mode::Minor,
            lengths.minor_mm,
            trace,
            warnings,
        ),
    }
    .map_err(wrap)?;
    let mut twist = if e5.is_some() && !method::aisc360::e5_twist(input, trace) {
        None
    } else {
        stability::twist_mode(method, input, &axes, &lengths, trace, warnings).map_err(wrap)?
    };
    let aisc = matches!(method, Method::AiscLrfd | Method::AiscAsd);
    if aisc {
        if let Some(c) = assessment.classified.filter(|c| c.is_slender()) {
            stability::aisc_slender(&mut major, c, input, trace);
            stability::aisc_slender(&mut minor, c, input, trace);
            if let Some(t) = twist.as_mut() {
                stability::aisc_slender(t, c, input, trace);
            }
        }
        if input.section.family == Family::Angle && e5.is_none() {
            warnings.push(Warning::new(
                "angle-e5-not-applied",
                "the single angle is checked as loaded through its centroid (AISC 360-16 E3, E4, E7); \
                 the E5 effective slenderness for one-leg connections is not applied (set angle_connection)",
            ));
        }
    }
    modes.push(major);
    modes.push(minor);
    if let Some(t) = twist {
        modes.push(t);
    }
    // A beam (no axial load, some moment) is checked in bending even where
    // the code gives no axial resistance: its axial modes then report 0 kN.
    let moments = m.has_moments();
    let beam = m.axial_kn == 0.0 && moments;
    if assessment.refused && beam {
        modes.push(stability::refused_mode());
    } else if assessment.refused {
        // Outside the code's scope: no number at all, so nothing can pass
        // by accident; the reason is the scope warning's message.
        let reason = warnings
            .iter()
            .find(|w| w.code == "outside-code-scope")
            .map(|w| w.message().into_owned())
            .unwrap_or_else(|| "the section is outside the scope of this code".into());
        return Err(crate::error::Error::NotApplicable {
            method: method.key(),
            reason,
        }
        .in_member(&m.id));
    } else if method == Method::En1993 {
        modes.push(stability::en_section_mode(input, &assessment, trace));
    }
    let governing = modes
        .iter()
        // Lowest resistance governs; on a tie (both axes capped at the squash
        // load, say) the more slender mode is named, as an engineer would.
        // Compared by reference, so only the winner is copied.
        .min_by(|a, b| {
            a.resistance_kn
                .total_cmp(&b.resistance_kn)
                .then_with(|| b.slenderness.total_cmp(&a.slenderness))
        })
        .copied()
        .unwrap_or(major);
    let resistance_kn = governing.resistance_kn;
    let axial = if m.axial_kn == 0.0 {
        0.0
    } else if resistance_kn > 0.0 {
        m.axial_kn / resistance_kn
    } else {
        f64::INFINITY
    };
    // Without moments there is no bending side (bending::check would say
    // so itself, after looking for a moment again); the slot is empty on
    // entry.
    if moments {
        // The bending working: some 20 to 30 lines an axis.
        trace.reserve(64);
        *bending_slot = bending::check(method, input, trace, warnings).map_err(wrap)?;
    }
    let (utilisation, governing_check, passes) = match &*bending_slot {
        // Without moments: the axial check alone (asked first, as the
        // secant check below would find no moment either).
        None if !moments => (axial, governing.mode.key(), axial <= 1.0),
        // The secant method's moments are the load's eccentricity: its one
        // check `secant` (never above the axial utilisation, which it is
        // about the moment's axis).
        None => match interaction::secant::check(method, input, modes, trace).map_err(wrap)? {
            Some(c) => {
                checks.push(c);
                let (u, name) = if c.utilisation >= axial {
                    (c.utilisation, c.check)
                } else {
                    (axial, governing.mode.key())
                };
                (u, name, u <= 1.0)
            }
            None => (axial, governing.mode.key(), axial <= 1.0),
        },
        Some(b) => {
            let (um, un) = (b.major.utilisation(), b.minor.utilisation());
            let (ub, which) = if um >= un {
                (um, "bending-major")
            } else {
                (un, "bending-minor")
            };
            // Biaxial bending without axial load is still a combination
            // of two actions: every code combines it (EN 1993-1-1 6.2.9
            // Eq. 6.41 with n = 0 and 6.3.3; AISC 360-16 H1-1b with P_r =
            // 0; CSA S16-19 13.8 with C_f = 0; EN 1995-1-1 Eqs. 6.11, 6.12,
            // which (6.19), (6.20) become with sigma_c = 0), so its
            // interaction equations are worked; one moment alone is the
            // bending result.
            if m.axial_kn > 0.0 || (um > 0.0 && un > 0.0) {
                let ctx = interaction::Context {
                    method,
                    input,
                    lengths: &lengths,
                    unbraced: unbraced.unwrap_or_else(|| m.unbraced()),
                    modes,
                    governing: &governing,
                    bending: b,
                    assessment: &assessment,
                };
                match interaction::check(&ctx, trace, warnings).map_err(wrap)? {
                    Some(found) => {
                        *checks = found;
                        // The largest of the axial, the bending and every
                        // interaction utilisation governs.
                        let (mut u, mut name) = if axial >= ub {
                            (axial, governing.mode.key())
                        } else {
                            (ub, which)
                        };
                        if let Some(c) = interaction::governing(checks) {
                            if c.utilisation >= u {
                                (u, name) = (c.utilisation, c.check);
                            }
                        }
                        (u, name, u <= 1.0)
                    }
                    None => {
                        // No interaction for this method yet: never pass a
                        // beam-column silently.
                        warnings.push(Warning::new(
                            "interaction-not-checked",
                            "the member carries axial load and moments; the beam-column \
                             interaction of this method is not checked in this build, so the \
                             member is not passed: its utilisation is the plain sum of the axial \
                             and the two bending utilisations, which is not a code check",
                        ));
                        (axial + um + un, NOT_CHECKED, false)
                    }
                }
            } else {
                (ub, which, ub <= 1.0)
            }
        }
    };
    interaction::warn_unused_lengths(m, method, warnings);
    let (strength_mpa, modulus_mpa) = input.material.strength_and_modulus();
    let passes = passes && within_limits(method, modes);
    Ok(Verdict {
        method,
        passes,
        utilisation,
        governing_check,
        resistance_kn,
        axial_kn: m.axial_kn,
        segment: None,
        governing: governing.mode,
        squash_kn: input.section.props.area_mm2 * strength_mpa / 1000.0,
        strength_mpa,
        modulus_mpa,
        section: SectionSummary::from(&input.section.props),
    })
}

/// Validates a member's options and resolves its section and material (its
/// buckling lengths are checked where they are used) without
/// copying the member.
pub fn resolve(member: &Member) -> Result<(Section, Material)> {
    let wrap = |e: crate::error::Error| e.in_member(&member.id);
    member.validate_options().map_err(wrap)?;
    let section = member.build_section().map_err(wrap)?;
    let material =
        crate::material::resolve(&member.material, crate::member::stock(&section)).map_err(wrap)?;
    Ok((section, material))
}

/// Checks one member with its own method.
pub fn check_member(member: &Member) -> Result<CheckResult> {
    check_member_as(member, Working::Kept)
}

/// Checks one member with its own method into `scratch` ([`Scratch::check`]):
/// [`check_member_as`] for a batch, which allocates nothing for the result
/// once the scratch's lists have grown.
pub fn check_member_in<'s>(member: &Member, scratch: &'s mut Scratch) -> Result<Brief<'s>> {
    with_input(member, |input| scratch.check(input, member.method))
}

/// Checks one member with its own method, with or without its working.
pub fn check_member_as(member: &Member, working: Working) -> Result<CheckResult> {
    with_input(member, |input| evaluate(input, member.method, working))
}

/// The steps of [`resolve`] written out for a check from the member as
/// written, then `check` of the member's input: the section is built where
/// it stays (not moved through a returned pair), and section and material
/// are read where they were returned (borrowed from the `Ok`, not moved out
/// of it: a 304-byte and a 240-byte copy fewer a check).
#[inline(always)]
fn with_input<T>(member: &Member, check: impl FnOnce(&Input<'_>) -> Result<T>) -> Result<T> {
    let wrap = |e: crate::error::Error| e.in_member(&member.id);
    member.validate_options().map_err(wrap)?;
    let mut built = None;
    let section = crate::catalogue::build_in(&member.section, &mut built).map_err(wrap)?;
    let resolved = crate::material::resolve(&member.material, crate::member::stock(section));
    let material = match resolved {
        Ok(ref material) => material,
        Err(e) => return Err(wrap(e)),
    };
    check(&Input {
        member,
        section,
        material,
    })
}
