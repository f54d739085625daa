//! Reverse questions about one member, answered by the engine itself for
//! the member's section, material and a chosen method:
//!
//! - [`longest_length`]: the longest length at which the member still
//!   carries its design load;
//! - [`largest_load`]: the largest design load it carries at its length
//!   (its design resistance; with moments, the largest compression carried
//!   with the moments held, [`crate::check::reach`]), with the governing
//!   mode and check.
//!
//! # How lengths are scaled
//!
//! A trial length is the member's `length_mm` times a factor `s`. The
//! effective-length factors `k_major`, `k_minor`, `k_torsion` are kept, so
//! each buckling length scales with `s` too; buckling lengths given
//! directly (`lcr_major_mm`, ...) are scaled by the same `s`, so the
//! member keeps its proportions (a brace restrained at mid-length stays
//! restrained at mid-length). A `buckling_model` is scaled with it: its
//! segments' lengths and the positions of its braces and loads (its
//! springs, supports and loads are kept); where its alpha_cr then falls
//! exactly as a power of the length (no springs, and loads at points only
//! or along the length only: `buckling::column::Column::length_power`),
//! the trials scale the member's own analysis instead of analysing again. An explicit `bow_mm` or `eccentricity_mm` is
//! kept as given; when absent, the methods' defaults (length / 1000)
//! follow the trial length.
//!
//! # The solve
//!
//! Design resistance does not increase with length, so the utilisation
//! `N_Ed / N_Rd(s)` rises with `s`. The solve brackets the length where it
//! reaches 1 (doubling or halving `s` from the member's own length) and
//! bisects the bracket geometrically until its ends differ by less than
//! one part in 10^10, then reports the end that still carries the load:
//! its utilisation is 1 to far better than 0.1 % wherever the resistance
//! is continuous in length. Lengths at which the method refuses to work
//! (outside its range) count as "not carried", and the answer then says
//! so.

use serde::Serialize;

use crate::check::{CheckResult, Mode, Prepared, Working};
use crate::error::{Error, Result};
use crate::member::Member;
use crate::method::Method;

/// The shortest length the member file accepts, mm (for the system length
/// and every buckling length): trials never go below it.
pub const SHORTEST_MM: f64 = crate::member::MIN_LENGTH_MM;

/// The longest length the member file accepts, mm (10 km): a load carried
/// there is carried at any length a member can have.
pub const LONGEST_MM: f64 = crate::member::MAX_LENGTH_MM;

/// Ends of the bracket closer than this relative gap end the bisection.
const GAP: f64 = 1e-10;

/// What sets the longest length.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "by", rename_all = "kebab-case")]
pub enum LengthLimit {
    /// The design load: a little longer and the utilisation exceeds 1.
    Load,
    /// The method's range: a little longer and the method refuses the
    /// member (e.g. a slenderness limit); the message says why.
    MethodRange {
        /// The method's words.
        reason: String,
    },
}

/// The longest length found.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct LongestLength {
    /// The method used.
    pub method: Method,
    /// The longest system length that carries the load, mm.
    pub length_mm: f64,
    /// That length over the member's own length.
    pub scale: f64,
    /// Major-axis buckling length at the answer, mm.
    pub lcr_major_mm: f64,
    /// Minor-axis buckling length at the answer, mm.
    pub lcr_minor_mm: f64,
    /// Torsional buckling length at the answer, mm.
    pub lcr_torsion_mm: f64,
    /// Utilisation at the answer (at most 1).
    pub utilisation: f64,
    /// Design resistance at the answer, kN.
    pub resistance_kn: f64,
    /// The governing mode at the answer.
    pub governing: Mode,
    /// What governs at the answer: the axial mode's key or, with moments,
    /// the check that reaches 1 (an interaction equation, say).
    pub governing_check: &'static str,
    /// What sets the length.
    pub limit: LengthLimit,
}

/// The answer to "how long can it be?".
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "answer", rename_all = "kebab-case")]
pub enum LengthAnswer {
    /// A longest length exists.
    Found(LongestLength),
    /// Even the shortest member (its shortest length at [`SHORTEST_MM`])
    /// does not carry the load: the
    /// section or material is too weak whatever the length.
    NoLength {
        /// The method used.
        method: Method,
        /// Design resistance of the shortest trial member, kN.
        resistance_kn: f64,
        /// Its governing mode.
        governing: Mode,
    },
    /// The load is carried up to the longest member the file accepts
    /// (its longest length at [`LONGEST_MM`]), for example a zero load.
    AnyLength {
        /// The method used.
        method: Method,
        /// The longest length tried, mm.
        tried_mm: f64,
    },
}

/// The largest load at the member's own length.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct LargestLoad {
    /// The method used.
    pub method: Method,
    /// The largest design load carried (the design resistance), kN.
    pub load_kn: f64,
    /// The governing mode.
    pub governing: Mode,
    /// What governs at that load: the axial mode's key or, with moments,
    /// the check that reaches 1 (an interaction equation, say).
    pub governing_check: &'static str,
    /// The utilisation under the member's own design load.
    pub utilisation: f64,
    /// Resistance minus the design load the check took (with a buckling
    /// model, the governing segment's force), kN (negative when over).
    pub reserve_kn: f64,
}

/// One trial: the utilisation and the check, or why the method refused.
enum Trial {
    Ran(Box<CheckResult>),
    Refused(Error),
}

fn inner(e: Error) -> Error {
    match e {
        Error::InMember { source, .. } => inner(*source),
        other => other,
    }
}

struct Trials<'a> {
    base: &'a Prepared,
    work: Prepared,
    method: Method,
    /// A buckling model's analyses at the member's own length, scaled to
    /// each trial where that is exact instead of analysed again.
    lengthwise: Option<crate::check::buckle::Lengthwise>,
}

/// The member with its length, given buckling lengths and buckling
/// model's lengths and positions times `s`.
pub fn scaled(member: &Member, s: f64) -> Member {
    let mut m = member.clone();
    m.length_mm = member.length_mm * s;
    m.lcr_major_mm = member.lcr_major_mm.map(|l| l * s);
    m.lcr_minor_mm = member.lcr_minor_mm.map(|l| l * s);
    m.lcr_torsion_mm = member.lcr_torsion_mm.map(|l| l * s);
    if let Some(model) = m.buckling_model.as_mut() {
        for seg in &mut model.segments {
            seg.length_mm *= s;
        }
        for r in &mut model.restraints {
            r.at_mm *= s;
        }
        for p in &mut model.axial_loads {
            p.at_mm *= s;
        }
    }
    m
}

impl Trials<'_> {
    fn at(&mut self, s: f64) -> Trial {
        self.work.member = scaled(&self.base.member, s);
        let checked = match &self.lengthwise {
            Some(base) => {
                crate::check::buckle::check_lengthened(&self.work.input(), self.method, base, s)
            }
            None => self.work.check_as(self.method, Working::Skipped),
        };
        match checked {
            Ok(r) => Trial::Ran(Box::new(r)),
            Err(e) => Trial::Refused(inner(e)),
        }
    }
}

fn carries(t: &Trial) -> bool {
    match t {
        Trial::Ran(r) => r.passes,
        Trial::Refused(_) => false,
    }
}

/// Finds the longest length at which `prepared` carries its design load
/// under `method` (see the module documentation for how lengths scale).
///
/// Errors: the member's own length must check with this method (so a
/// method that does not apply, such as a timber method for steel, is
/// refused with its reason).
pub fn longest_length(prepared: &Prepared, method: Method) -> Result<LengthAnswer> {
    let own = prepared.check_as(method, Working::Skipped)?;
    let lengths = prepared.member.buckling_lengths()?;
    let all = [
        lengths.major_mm,
        lengths.minor_mm,
        lengths.torsion_mm,
        prepared.member.length_mm,
    ];
    let longest_own = all.iter().copied().fold(f64::MIN, f64::max);
    let shortest_own = all.iter().copied().fold(f64::MAX, f64::min);
    let mut trials = Trials {
        base: prepared,
        work: prepared.clone(),
        method,
        lengthwise: crate::check::buckle::lengthwise(&prepared.input()),
    };
    // Keep every trial length inside the member file's range, with a
    // margin of rounding so the end trials are accepted.
    let s_min = (SHORTEST_MM / shortest_own * (1.0 + 1e-12)).min(1.0);
    let s_max = (LONGEST_MM / longest_own * (1.0 - 1e-12)).max(1.0);
    // (lo, trial at lo) carries; (hi, trial at hi) does not.
    let (lo, lo_trial, hi, hi_trial) = if own.passes {
        let mut lo: f64 = 1.0;
        let mut lo_trial = Trial::Ran(Box::new(own));
        loop {
            if lo >= s_max {
                return Ok(LengthAnswer::AnyLength {
                    method,
                    tried_mm: prepared.member.length_mm * lo,
                });
            }
            let hi = (lo * 2.0).min(s_max);
            let t = trials.at(hi);
            if carries(&t) {
                lo = hi;
                lo_trial = t;
            } else {
                break (lo, lo_trial, hi, t);
            }
        }
    } else {
        let mut hi = 1.0;
        let mut hi_trial = Trial::Ran(Box::new(own));
        let mut lo: f64 = 0.5;
        loop {
            let lo_c = lo.max(s_min);
            let t = trials.at(lo_c);
            if carries(&t) {
                break (lo_c, t, hi, hi_trial);
            }
            if lo_c <= s_min {
                return Ok(match t {
                    Trial::Ran(r) => LengthAnswer::NoLength {
                        method,
                        resistance_kn: r.resistance_kn,
                        governing: r.governing,
                    },
                    Trial::Refused(e) => return Err(e),
                });
            }
            hi = lo_c;
            hi_trial = t;
            lo = lo_c / 2.0;
        }
    };
    let (mut lo_trial, mut hi_trial) = (lo_trial, hi_trial);
    let (lo, _) = crate::roots::edge(
        lo,
        hi,
        |a, b| (a * b).sqrt(),
        |a, b| b / a - 1.0 <= GAP,
        |mid| {
            let t = trials.at(mid);
            let yes = carries(&t);
            if yes {
                lo_trial = t;
            } else {
                hi_trial = t;
            }
            yes
        },
    );
    let Trial::Ran(r) = lo_trial else {
        // `lo` always holds a trial that ran and carried the load.
        return Err(Error::Geometry {
            field: "length_mm",
            reason: "the length search lost its bracket; check the member's inputs".into(),
        });
    };
    let limit = match hi_trial {
        Trial::Refused(e) => LengthLimit::MethodRange {
            reason: e.to_string(),
        },
        // Beyond a code's slenderness limit (CSA S16-19 10.4.2.1) the
        // member fails whatever its load: that limit ends the range.
        Trial::Ran(r) => match r.limit_exceeded() {
            Some(reason) => LengthLimit::MethodRange {
                reason: reason.to_string(),
            },
            None => LengthLimit::Load,
        },
    };
    let at = scaled(&prepared.member, lo).buckling_lengths()?;
    Ok(LengthAnswer::Found(LongestLength {
        method,
        length_mm: prepared.member.length_mm * lo,
        scale: lo,
        lcr_major_mm: at.major_mm,
        lcr_minor_mm: at.minor_mm,
        lcr_torsion_mm: at.torsion_mm,
        utilisation: r.utilisation,
        resistance_kn: r.resistance_kn,
        governing: r.governing,
        governing_check: r.governing_check,
        limit,
    }))
}

/// The largest design load `prepared` carries at its own length under
/// `method`: its design resistance, with the governing mode; for a member
/// with moments, the largest compression at which the check (every
/// interaction equation) still gives a utilisation of at most 1, the
/// moments held as given.
pub fn largest_load(prepared: &Prepared, method: Method) -> Result<LargestLoad> {
    let r = prepared.check_as(method, Working::Skipped)?;
    // A member beyond a code's slenderness limit (CSA S16-19 10.4.2.1)
    // carries no load under that code, whatever its resistance.
    let (load_kn, governing, governing_check) = if !r.within_limits() {
        (0.0, r.governing, r.governing.key())
    } else if prepared.member.has_moments() {
        let work = std::cell::RefCell::new(prepared.clone());
        let at = |n: f64| {
            let mut w = work.try_borrow_mut().ok()?;
            w.member.axial_kn = n;
            w.check_as(method, Working::Skipped).ok()
        };
        let reach = crate::check::reach::largest(
            |n| at(n).map(|r| r.utilisation),
            r.resistance_kn.max(1e-3),
            crate::member::MAX_AXIAL_KN,
        );
        let n = reach.value();
        match at(n) {
            Some(there) => (n, there.governing, there.governing_check),
            None => (n, r.governing, r.governing_check),
        }
    } else {
        (r.resistance_kn, r.governing, r.governing.key())
    };
    Ok(LargestLoad {
        method,
        load_kn,
        governing,
        governing_check,
        utilisation: r.utilisation,
        // The N_Ed the check took: with a buckling model, the governing
        // segment's force, whose resistance `load_kn` is.
        reserve_kn: load_kn - r.axial_kn,
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::material::MaterialSpec;
    use crate::section::{Given, Rect, Round, SectionSpec};

    fn member(section: SectionSpec, axial_kn: f64, method: Method) -> Member {
        Member::new(
            "S1",
            section,
            MaterialSpec::Custom {
                fy_mpa: 275.0,
                e_mpa: 205_000.0,
                g_mpa: None,
            },
            2500.0,
            axial_kn,
            method,
        )
    }

    fn rect() -> SectionSpec {
        SectionSpec::Rect(Rect {
            depth_mm: 120.0,
            width_mm: 80.0,
        })
    }

    fn found(a: LengthAnswer) -> LongestLength {
        match a {
            LengthAnswer::Found(f) => f,
            other => panic!("expected a length, got {other:?}"),
        }
    }

    /// The utilisation at the longest length is 1 within 0.1 %, and 0.1 %
    /// longer the member fails.
    fn assert_at_capacity(p: &Prepared, method: Method, f: &LongestLength) {
        assert!(f.utilisation <= 1.0, "{f:?}");
        // At the load's limit the utilisation is 1; a code's slenderness
        // limit (CSA S16-19 10.4.2.1) can end the range before it.
        if f.limit == LengthLimit::Load {
            assert!((f.utilisation - 1.0).abs() <= 1e-3, "{f:?}");
        }
        let mut longer = p.clone();
        longer.member.length_mm = f.length_mm * 1.001;
        longer.member.lcr_major_mm = p.member.lcr_major_mm.map(|l| l * f.scale * 1.001);
        longer.member.lcr_minor_mm = p.member.lcr_minor_mm.map(|l| l * f.scale * 1.001);
        longer.member.lcr_torsion_mm = p.member.lcr_torsion_mm.map(|l| l * f.scale * 1.001);
        assert!(!longer.check_with(method).unwrap().passes);
        // Rechecking the member at the reported length reproduces the answer.
        let mut at = p.clone();
        at.member.length_mm = f.length_mm;
        at.member.lcr_major_mm = p.member.lcr_major_mm.map(|l| l * f.scale);
        at.member.lcr_minor_mm = p.member.lcr_minor_mm.map(|l| l * f.scale);
        at.member.lcr_torsion_mm = p.member.lcr_torsion_mm.map(|l| l * f.scale);
        let again = at.check_with(method).unwrap();
        assert!((again.utilisation - f.utilisation).abs() <= 1e-12);
        assert_eq!(again.governing, f.governing);
    }

    #[test]
    fn a_model_that_scales_exactly_is_not_analysed_per_trial_and_gives_the_same_length() {
        // K1 of the worked example without its springs and its load along
        // the length: point loads only, so every trial scales the member's
        // own analysis (alpha_cr / s^2). The member rechecked at the length
        // found, with its analysis run afresh, is at the same utilisation.
        let f =
            crate::file::parse(include_str!("../../examples/tarnbeck-crane-hall.json")).unwrap();
        let mut k1 = f.members[0].clone();
        if let Some(model) = k1.buckling_model.as_mut() {
            model.ends.b.major.translation = crate::buckling::Fixity::Fixed;
            model.restraints[0].translation = crate::buckling::Fixity::Fixed;
            model.distributed_kn_per_m = 0.0;
        }
        let p = Prepared::new(&k1).unwrap();
        assert!(crate::check::buckle::lengthwise(&p.input()).is_some());
        let found = match longest_length(&p, k1.method).unwrap() {
            LengthAnswer::Found(f) => f,
            other => panic!("{other:?}"),
        };
        let again = Prepared::new(&scaled(&k1, found.scale))
            .unwrap()
            .check_with(k1.method)
            .unwrap();
        assert!(
            (again.utilisation - found.utilisation).abs() <= 1e-9,
            "{} {}",
            again.utilisation,
            found.utilisation
        );
        assert!((found.utilisation - 1.0).abs() <= 1e-3, "{found:?}");
        // The largest load's reserve is against the governing segment's
        // force, the N_Ed its resistance is for.
        let own = p.check_with(k1.method).unwrap();
        let l = largest_load(&p, k1.method).unwrap();
        assert!(own.segment.is_some());
        assert_eq!(l.reserve_kn, l.load_kn - own.axial_kn);
        // With its springs back, neither axis scales exactly.
        let p = Prepared::new(&f.members[0]).unwrap();
        assert!(crate::check::buckle::lengthwise(&p.input()).is_none());
    }

    #[test]
    fn a_buckling_model_scales_with_the_member() {
        // The worked example's K1: two segments, a brace at 3000 mm and
        // loads at 6000 and 9000 mm of a 9000 mm column.
        let f =
            crate::file::parse(include_str!("../../examples/tarnbeck-crane-hall.json")).unwrap();
        let k1 = &f.members[0];
        let half = scaled(k1, 0.5);
        let model = half.buckling_model.as_ref().unwrap();
        assert_eq!(half.length_mm, 4500.0);
        assert_eq!(
            model
                .segments
                .iter()
                .map(|s| s.length_mm)
                .collect::<Vec<_>>(),
            vec![3000.0, 1500.0]
        );
        assert_eq!(model.restraints[0].at_mm, 1500.0);
        assert_eq!(
            model
                .axial_loads
                .iter()
                .map(|p| p.at_mm)
                .collect::<Vec<_>>(),
            vec![3000.0, 4500.0]
        );
        // It still analyses (unscaled, the segments would not add up and
        // the loads would lie beyond the member), and a shorter column
        // buckles at a higher load.
        let a = crate::check::buckle::buckle(k1).unwrap().unwrap();
        let b = crate::check::buckle::buckle(&half).unwrap().unwrap();
        assert!(b.minor.load_factor > a.minor.load_factor);
        let p = Prepared::new(k1).unwrap();
        assert!(longest_length(&p, k1.method).is_ok());
    }

    #[test]
    fn longest_length_puts_utilisation_at_one_from_above_and_below() {
        // Every method, steel methods on a custom steel and the timber method
        // on a custom timber; loads below and above the resistance at the
        // member's own length, so the bracket is found both ways.
        let mut found_count = 0;
        for method in Method::ALL {
            for load in [20.0, 300.0, 1500.0] {
                let mut m = member(rect(), load, method);
                if method.is_timber() {
                    m.material = MaterialSpec::Timber {
                        fc0k_mpa: 21.0,
                        e005_mpa: 7400.0,
                        e0mean_mpa: 11_000.0,
                        timber: crate::material::TimberKind::Solid,
                    };
                }
                let p = Prepared::new(&m).unwrap();
                let own = p.check_with(method).unwrap();
                match longest_length(&p, method).unwrap() {
                    LengthAnswer::Found(f) => {
                        assert_at_capacity(&p, method, &f);
                        // Longer than its own length exactly when it passes now.
                        assert_eq!(f.scale >= 1.0, own.utilisation <= 1.0, "{method:?} {load}");
                        found_count += 1;
                    }
                    LengthAnswer::NoLength { resistance_kn, .. } => {
                        assert!(resistance_kn < load, "{method:?} {load}");
                    }
                    LengthAnswer::AnyLength { .. } => panic!("{method:?} {load}: any length"),
                }
            }
        }
        assert!(found_count >= 2 * Method::ALL.len(), "{found_count}");
    }

    #[test]
    fn euler_longest_length_matches_closed_form() {
        // Euler: pi^2 E I_min / L^2 = N  =>  L = pi sqrt(E I_min / N).
        let p = Prepared::new(&member(rect(), 200.0, Method::Euler)).unwrap();
        let f = found(longest_length(&p, Method::Euler).unwrap());
        let i_min = 120.0 * 80.0_f64.powi(3) / 12.0;
        let expected = std::f64::consts::PI * (205_000.0 * i_min / 200_000.0).sqrt();
        assert!(
            ((f.length_mm - expected) / expected).abs() < 1e-6,
            "{} vs {expected}",
            f.length_mm
        );
        assert_eq!(f.governing, Mode::Minor);
        assert_eq!(f.limit, LengthLimit::Load);
        assert_at_capacity(&p, Method::Euler, &f);
    }

    #[test]
    fn given_buckling_lengths_scale_with_the_length() {
        let mut m = member(
            SectionSpec::Given(Given {
                area_mm2: 4000.0,
                i_major_mm4: 4.0e7,
                i_minor_mm4: 1.0e7,
                torsion_mm4: None,
                warping_mm6: None,
                w_el_major_mm3: None,
                w_el_minor_mm3: None,
                w_pl_major_mm3: None,
                w_pl_minor_mm3: None,
            }),
            400.0,
            Method::Euler,
        );
        m.lcr_minor_mm = Some(1250.0); // restrained at mid-length about the minor axis
        let p = Prepared::new(&m).unwrap();
        let f = found(longest_length(&p, Method::Euler).unwrap());
        assert!((f.lcr_minor_mm / f.length_mm - 0.5).abs() < 1e-12);
        assert_at_capacity(&p, Method::Euler, &f);
        // Major: L^2 = pi^2 E 4e7 / N; minor: (L/2)^2 = pi^2 E 1e7 / N: both
        // give the same L, so the answer is that L.
        let expected = std::f64::consts::PI * (205_000.0_f64 * 4.0e7 / 400_000.0).sqrt();
        assert!(((f.length_mm - expected) / expected).abs() < 1e-6);
    }

    #[test]
    fn too_strong_a_load_and_no_load() {
        let p = Prepared::new(&member(
            SectionSpec::Round(Round { diameter_mm: 20.0 }),
            1000.0,
            Method::Euler,
        ))
        .unwrap();
        match longest_length(&p, Method::Euler).unwrap() {
            LengthAnswer::NoLength { resistance_kn, .. } => {
                // Squash load A f_y = pi 10^2 x 275 N = 86.4 kN.
                assert!((resistance_kn - std::f64::consts::PI * 100.0 * 0.275).abs() < 1e-9);
            }
            other => panic!("{other:?}"),
        }
        let p = Prepared::new(&member(rect(), 0.0, Method::Euler)).unwrap();
        match longest_length(&p, Method::Euler).unwrap() {
            // Tried up to the member file's longest length (10 km), not beyond.
            LengthAnswer::AnyLength { tried_mm, .. } => {
                assert!(
                    tried_mm <= LONGEST_MM && tried_mm > 0.999_999 * LONGEST_MM,
                    "{tried_mm}"
                )
            }
            other => panic!("{other:?}"),
        }
    }

    #[test]
    fn largest_load_is_the_resistance_with_its_mode() {
        let p = Prepared::new(&member(rect(), 100.0, Method::Euler)).unwrap();
        let l = largest_load(&p, Method::Euler).unwrap();
        let r = p.check_with(Method::Euler).unwrap();
        assert_eq!(l.load_kn, r.resistance_kn);
        assert_eq!(l.governing, r.governing);
        assert!((l.reserve_kn - (r.resistance_kn - 100.0)).abs() < 1e-12);
        // At that load the member is exactly at capacity.
        let mut at = p.clone();
        at.member.axial_kn = l.load_kn;
        assert!((at.check_with(Method::Euler).unwrap().utilisation - 1.0).abs() < 1e-12);
    }

    #[test]
    fn largest_load_under_moments_holds_the_moments_and_is_at_capacity() {
        let mut m = member(rect(), 100.0, Method::En1993);
        m.m_major_a_knm = 4.0;
        m.m_major_b_knm = 4.0;
        let p = Prepared::new(&m).unwrap();
        let l = largest_load(&p, Method::En1993).unwrap();
        let r = p.check_with(Method::En1993).unwrap();
        // Less than the axial resistance alone, and exactly at capacity.
        assert!(l.load_kn < r.resistance_kn, "{l:?}");
        let mut at = p.clone();
        at.member.axial_kn = l.load_kn;
        let there = at.check_with(Method::En1993).unwrap();
        assert!(
            (there.utilisation - 1.0).abs() <= crate::check::reach::TOL,
            "{there:?}"
        );
        assert_eq!(l.governing_check, there.governing_check);
    }

    #[test]
    fn a_method_that_does_not_apply_is_refused_with_its_reason() {
        let p = Prepared::new(&member(rect(), 100.0, Method::Euler)).unwrap();
        let e = longest_length(&p, Method::En1995).unwrap_err();
        assert!(e.to_string().contains("en1995"), "{e}");
    }
}
