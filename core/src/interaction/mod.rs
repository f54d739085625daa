//! Members under compression and bending (beam-columns): the interaction
//! equations of each design method, one module per code.
//!
//! A member with an axial load and a moment (member file version 3) is
//! checked against every interaction equation its code gives; each
//! equation worked is one [`Check`] (`"interaction"` in results), named by
//! its clause or equation number exactly as the issue and the outside
//! scripts expect (`"6.61"`, `"H1-1a"`, `"13.8.2(b)"`, `"6.23"`, ...). The
//! utilisation of an equation is its left-hand side where its right-hand
//! side is 1. Every interaction factor, amplification and moment factor is
//! written to the working ([`Scope::Interaction`]) with its clause.
//!
//! A method's module returns `Ok(None)` while its equations are not
//! implemented; the check then does not pass the member and says so
//! (`interaction-not-checked`). A shape or case its code gives no rule for
//! is a typed error naming the key, never a silent pass.
//!
//! [`Scope::Interaction`]: crate::trace::Scope::Interaction

use serde::Serialize;

use crate::bending::Bending;
use crate::buckling::chart::FrameKey;
use crate::error::{Error, Result};
use crate::member::{BucklingLengths, Unbraced};
use crate::method::{Input, Method};
use crate::outcome::{Arg, ModeResult, Warning};
use crate::section::Family;
use crate::stability::Assessment;
use crate::trace::Trace;
use crate::units::Quantity;

pub mod aisc360;
pub mod csa_s16;
pub mod en1993;
pub mod en1995;
pub mod secant;

/// One interaction equation worked, as results report it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Check {
    /// The equation's name: its clause or number in the code
    /// (`"6.2.9"`, `"6.61"`, `"6.62"`, `"H1-1a"`, `"H1-1b"`, `"H2-1"`,
    /// `"13.8.2(a)"`, ..., `"6.19"`, `"6.23"`, `"6.35"`, `"secant"`).
    pub check: &'static str,
    /// Its left-hand side (its right-hand side being 1).
    pub utilisation: f64,
}

/// What every method's interaction needs: the member, its axial side
/// (every mode checked and the governing one), its bending side and the
/// cross-section assessment.
#[derive(Debug, Clone, Copy)]
pub struct Context<'a> {
    /// The method.
    pub method: Method,
    /// The member, section and material (the gross section; a Class 4
    /// section's effective area is in `assessment`).
    pub input: &'a Input<'a>,
    /// The member's buckling lengths.
    pub lengths: &'a BucklingLengths,
    /// Its laterally unbraced lengths (a buckling model's segment: the
    /// model's, bounded by its braces).
    pub unbraced: Unbraced,
    /// Every axial mode checked (major, minor, the twisting mode, the
    /// cross-section mode), as in the result.
    pub modes: &'a [ModeResult],
    /// The governing (lowest) axial mode.
    pub governing: &'a ModeResult,
    /// The bending side, both axes.
    pub bending: &'a Bending,
    /// The cross-section classification and effective area.
    pub assessment: &'a Assessment<'a>,
}

impl Context<'_> {
    /// The axial mode `mode` of this result, if it was checked.
    pub fn mode(&self, mode: crate::outcome::Mode) -> Option<&ModeResult> {
        self.modes.iter().find(|m| m.mode == mode)
    }
}

/// The interaction equations of the member's method, `None` where the
/// method's equations are not implemented (the check then refuses to pass
/// the member). Called only for a member with both an axial load and a
/// moment.
pub fn check(
    ctx: &Context<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<Option<Vec<Check>>> {
    if matches!(ctx.method, Method::En1993 | Method::CsaS16)
        && matches!(ctx.input.section.family, Family::Tee | Family::Angle)
    {
        // The bending of a tee is worked under these codes, but their
        // beam-column rules (6.3.3; 13.8) are not set up for a monosymmetric
        // section whose resistance depends on the sign of the moment.
        let m = ctx.input.member;
        let (key, what) = if m.axial_kn > 0.0 {
            ("axial_kn", "axial load with moments")
        } else {
            (
                [
                    ("m_minor_a_knm", m.m_minor_a_knm),
                    ("m_minor_b_knm", m.m_minor_b_knm),
                    ("m_minor_span_knm", m.m_minor_span_knm),
                ]
                .iter()
                .find(|(_, v)| *v != 0.0)
                .map_or("m_minor_a_knm", |(k, _)| *k),
                "moments about both axes",
            )
        };
        return Err(Error::NotApplicable {
            method: ctx.method.key(),
            reason: format!(
                "{key}: {what}: the combined check of a tee or an angle is not worked under this \
                 code (its interaction rules are for doubly symmetric members; the tee's bending \
                 resistance depends on the moment's sign); check this member by hand"
            ),
        });
    }
    match ctx.method {
        Method::En1993 => en1993::check(ctx, trace, warnings),
        Method::AiscLrfd | Method::AiscAsd => aisc360::check(ctx, trace, warnings),
        Method::CsaS16 => csa_s16::check(ctx, trace, warnings),
        Method::En1995 => en1995::check(ctx, trace, warnings),
        // The secant method takes equal end moments as the load's
        // eccentricity (no bending side: its check is `secant::check`);
        // euler and perry-robertson refuse any moment in `bending::check`.
        Method::Euler | Method::PerryRobertson | Method::Secant => Ok(None),
    }
}

/// Where the length of a member's own moment amplification came from
/// ([`own_length`]).
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum OwnBasis {
    /// The buckling length, not shorter than the unbraced length (k >= 1
    /// or a length at least the unbraced one): kept, since the member file
    /// does not say whether a longer length is a sway mode (the lower
    /// elastic load, the safe side).
    Buckling,
    /// A column in a frame (alignment chart, `frame_major`/`frame_minor`):
    /// the unbraced length, K1 = 1, whatever k the chart gives; the frame's
    /// sway (`sway` true) is the frame analysis' amplification (B2, U_2),
    /// outside the member check.
    Frame {
        /// Sidesway uninhibited.
        sway: bool,
    },
    /// The buckling length is shorter than the unbraced length (k < 1, a
    /// shorter `lcr_*_mm`, or a buckling model's end restraints): raised to
    /// the unbraced length, since the member file cannot say that an
    /// analysis justifies less.
    Raised,
    /// Given by the engineer (`amplification_length_major_mm` /
    /// `_minor_mm`), from an analysis the member file does not hold: used
    /// as given, shorter or longer than the unbraced length, with the
    /// warning `amplification-length-given-major`/`-minor` ([`warn_given`]).
    Given,
}

/// The length of a member's own moment amplification about one axis
/// (AISC 360-16 Appendix 8.2.1's L_c1, CSA S16-19 13.8.4's L).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OwnLength {
    /// The length used, mm.
    pub mm: f64,
    /// The member's buckling length about the axis, mm.
    pub buckling_mm: f64,
    /// The laterally unbraced length about the axis, mm
    /// ([`crate::member::Member::unbraced`]).
    pub unbraced_mm: f64,
    /// The member-file key that set the buckling length (`k_major`,
    /// `lcr_major_mm`, `frame_major`, `buckling_model`, ...).
    pub field: &'static str,
    /// Why.
    pub basis: OwnBasis,
}

impl OwnLength {
    /// Whether the buckling length was shorter than the length used (the
    /// member's k < 1 changed the value), which the result warns of.
    pub fn raised(&self) -> bool {
        self.basis != OwnBasis::Given && self.mm > self.buckling_mm * (1.0 + ANALYSIS_TOLERANCE)
    }
}

/// Relative difference below which a buckling length is the unbraced
/// length itself ([`own_length`]): well above the analysis' convergence
/// (alpha_cr to 1e-6, the length to half that), well below any k an
/// engineer would give.
const ANALYSIS_TOLERANCE: f64 = 1e-5;

/// The length for the member's own second-order moment amplification about
/// `axis`: both codes compute it with no lateral translation of the ends,
/// K = 1 over the laterally unbraced length (AISC 360-16 Appendix 8.2.1:
/// "unless analysis justifies a smaller value"). A length the engineer
/// gives from such an analysis (`amplification_length_*_mm`) is used as
/// given ([`OwnBasis::Given`]). Otherwise a shorter buckling length is
/// raised to the unbraced one ([`OwnBasis::Raised`]), a frame's k is not
/// used ([`OwnBasis::Frame`]), and a longer buckling length without a
/// frame is kept ([`OwnBasis::Buckling`]).
pub fn own_length(ctx: &Context<'_>, axis: crate::bending::Axis) -> OwnLength {
    use crate::bending::Axis;
    let m = ctx.input.member;
    let (keys, buckling_mm, unbraced_mm, frame, lcr, given) = match axis {
        Axis::Major => (
            FrameKey::Major,
            ctx.lengths.major_mm,
            ctx.unbraced.major_mm,
            m.frame_major,
            m.lcr_major_mm,
            m.amplification_length_major_mm,
        ),
        Axis::Minor => (
            FrameKey::Minor,
            ctx.lengths.minor_mm,
            ctx.unbraced.minor_mm,
            m.frame_minor,
            m.lcr_minor_mm,
            m.amplification_length_minor_mm,
        ),
    };
    if let Some(mm) = given {
        return OwnLength {
            mm,
            buckling_mm,
            unbraced_mm,
            field: keys.amplification_key(),
            basis: OwnBasis::Given,
        };
    }
    let model = ctx.unbraced.from_model;
    let field = if model {
        "buckling_model"
    } else if frame.is_some() {
        keys.key()
    } else if lcr.is_some() {
        keys.lcr_key()
    } else {
        keys.k_key()
    };
    let (mm, basis) = match frame {
        Some(f) if !model => (unbraced_mm, OwnBasis::Frame { sway: f.sway }),
        // A buckling model's length between fixed braces comes out of the
        // analysis a few parts in a million short (the finite elements
        // overestimate the critical load slightly): that is the braced
        // length itself, taken without a warning.
        _ if buckling_mm >= unbraced_mm * (1.0 - ANALYSIS_TOLERANCE) => {
            (buckling_mm.max(unbraced_mm), OwnBasis::Buckling)
        }
        _ => (unbraced_mm, OwnBasis::Raised),
    };
    OwnLength {
        mm,
        buckling_mm,
        unbraced_mm,
        field,
        basis,
    }
}

/// Says on the result that the member's own moment amplification about
/// `axis` took a longer length than its buckling length ([`OwnLength::raised`]):
/// `what` names the amplifier (`"B1"`, `"U_1"`), `symbol` the length
/// (`"L_c1"`, `"L"`) and `clause` the rule. Once per axis.
pub fn warn_raised(
    warnings: &mut Vec<Warning>,
    axis: crate::bending::Axis,
    own: &OwnLength,
    (what, symbol, clause): (&'static str, &'static str, &'static str),
) {
    use crate::bending::Axis;
    if !own.raised() {
        return;
    }
    let (code, name) = match axis {
        Axis::Major => ("amplification-length-major", "major"),
        Axis::Minor => ("amplification-length-minor", "minor"),
    };
    crate::method::common::warn_once_with(warnings, code, || {
        Warning::with_args(
            code,
            "{}: the buckling length about the {} axis, {}, is shorter than the laterally \
             unbraced length, {}; the member's own moment amplification {} takes {} = {} (K = \
             1, no lateral translation of the ends: {} allows a smaller value only where \
             analysis justifies it, which the member file does not say), a larger {} than the \
             buckling length gives. Braces that shorten the unbraced length belong in \
             buckling_model; moments that already include the member's second-order effects \
             take amplify_moments false",
            &[
                Arg::Word(own.field),
                Arg::Word(name),
                Arg::figure(own.buckling_mm, Quantity::Span, 0),
                Arg::figure(own.unbraced_mm, Quantity::Span, 0),
                Arg::Word(what),
                Arg::Word(symbol),
                Arg::figure(own.mm, Quantity::Span, 0),
                Arg::Word(clause),
                Arg::Word(what),
            ],
        )
    });
}

/// The warning code of a length given for the member's own moment
/// amplification about `axis` and used ([`warn_given`]).
pub fn given_code(axis: crate::bending::Axis) -> &'static str {
    match axis {
        crate::bending::Axis::Major => "amplification-length-given-major",
        crate::bending::Axis::Minor => "amplification-length-given-minor",
    }
}

/// Says on the result that the member's own moment amplification about
/// `axis` took the length the engineer gave ([`OwnBasis::Given`]), which
/// rests on an analysis the member file does not hold: `what` names the
/// amplifier (`"B1"`, `"U_1"`), `symbol` the length (`"L_c1"`, `"L"`) and
/// `clause` the rule. Once per axis.
pub fn warn_given(
    warnings: &mut Vec<Warning>,
    axis: crate::bending::Axis,
    own: &OwnLength,
    (what, symbol, clause): (&'static str, &'static str, &'static str),
) {
    if own.basis != OwnBasis::Given {
        return;
    }
    let code = given_code(axis);
    crate::method::common::warn_once_with(warnings, code, || {
        Warning::with_args(
            code,
            "{}: the member's own moment amplification {} takes {} = {} from the engineer's \
             analysis, as given, where the laterally unbraced length with K = 1 is {} ({} \
             allows a smaller value only where analysis justifies it): that analysis must \
             justify it and be kept with this check. It is used for {} only, not for the \
             compression resistance",
            &[
                Arg::Word(own.field),
                Arg::Word(what),
                Arg::Word(symbol),
                Arg::figure(own.mm, Quantity::Span, 0),
                Arg::figure(own.unbraced_mm, Quantity::Span, 0),
                Arg::Word(clause),
                Arg::Word(what),
            ],
        )
    });
}

/// Says on the result that a length given for the member's own moment
/// amplification (`amplification_length_*_mm`) was not used: no check of
/// this member took it ([`warn_given`] said nothing for its axis), since
/// the method works the member's second-order effect its own way (EN
/// 1993-1-1, EN 1995-1-1) or has no moment about that axis to amplify
/// (none given, no axial load, or `amplify_moments` false). Never silent.
pub fn warn_unused_lengths(
    member: &crate::member::Member,
    method: Method,
    warnings: &mut Vec<Warning>,
) {
    use crate::bending::Axis;
    for (axis, key, given) in [
        (
            Axis::Major,
            FrameKey::Major,
            member.amplification_length_major_mm,
        ),
        (
            Axis::Minor,
            FrameKey::Minor,
            member.amplification_length_minor_mm,
        ),
    ] {
        if given.is_none() || warnings.iter().any(|w| w.code == given_code(axis)) {
            continue;
        }
        let code = match axis {
            Axis::Major => "amplification-length-unused-major",
            Axis::Minor => "amplification-length-unused-minor",
        };
        let why = if matches!(method, Method::AiscLrfd | Method::AiscAsd | Method::CsaS16) {
            "no moment about this axis is amplified here (none given, no axial load, or \
             amplify_moments false)"
        } else {
            "this method has no such length: its interaction works the member's second-order \
             effect in its own factors"
        };
        crate::method::common::warn_once_with(warnings, code, || {
            Warning::with_args(
                code,
                "{}: not used under {}: the length is for the member's own moment \
                 amplification of AISC 360-16 (Appendix 8.2.1, L_c1) and CSA S16-19 (13.8.4, \
                 L) only, and {}",
                &[
                    Arg::Word(key.amplification_key()),
                    Arg::Word(method.key()),
                    Arg::Word(why),
                ],
            )
        });
    }
}

/// Demand over capacity: 0 without demand, infinite without capacity.
pub fn ratio(demand: f64, capacity: f64) -> f64 {
    if demand == 0.0 {
        0.0
    } else if capacity > 0.0 {
        demand / capacity
    } else {
        f64::INFINITY
    }
}

/// The largest check, `None` for none.
pub fn governing(checks: &[Check]) -> Option<Check> {
    checks
        .iter()
        .copied()
        .max_by(|a, b| a.utilisation.total_cmp(&b.utilisation))
}
