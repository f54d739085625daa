//! A member as written in the member file: section, material, length and
//! restraint, design load, method and the method's options.

use serde::{Deserialize, Serialize};

pub mod schema;

use crate::buckling::chart::{self, Frame, FrameKey};
use crate::buckling::model::BucklingModel;
use crate::error::{all_positive, non_negative, positive, Error, Result};
use crate::material::{MaterialSpec, Product, Stock};
use crate::section::{Section, SectionSpec};

/// EN 1993-1-1 buckling curves (Table 6.1).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Curve {
    /// a0, alpha = 0.13.
    A0,
    /// a, alpha = 0.21.
    A,
    /// b, alpha = 0.34.
    B,
    /// c, alpha = 0.49.
    C,
    /// d, alpha = 0.76.
    D,
}

impl Curve {
    /// Every curve, stiffest first.
    pub const ALL: [Curve; 5] = [Curve::A0, Curve::A, Curve::B, Curve::C, Curve::D];

    /// Imperfection factor alpha, EN 1993-1-1 Table 6.1.
    pub fn alpha(self) -> f64 {
        match self {
            Curve::A0 => 0.13,
            Curve::A => 0.21,
            Curve::B => 0.34,
            Curve::C => 0.49,
            Curve::D => 0.76,
        }
    }

    /// Its name as in the standard.
    pub fn name(self) -> &'static str {
        match self {
            Curve::A0 => "a0",
            Curve::A => "a",
            Curve::B => "b",
            Curve::C => "c",
            Curve::D => "d",
        }
    }
}

/// Load-duration classes of EN 1995-1-1 2.3.1.2.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum LoadDuration {
    /// Permanent (more than 10 years).
    Permanent,
    /// Long-term (6 months to 10 years).
    Long,
    /// Medium-term (1 week to 6 months).
    Medium,
    /// Short-term (less than a week).
    Short,
    /// Instantaneous.
    Instantaneous,
}

/// Which leg of a single angle its end connections load (AISC 360-16 E5).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum Leg {
    /// The longer leg (either leg of an equal angle).
    Long,
    /// The shorter leg.
    Short,
}

/// The kind of member E5 distinguishes.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize, Default)]
#[serde(rename_all = "lowercase")]
pub enum Truss {
    /// E5(a): an individual member, or a web member of a planar truss
    /// with adjacent web members on the same side of the gusset or chord.
    #[default]
    Planar,
    /// E5(b): a web member of a box or space truss with adjacent web
    /// members on the same side of the gusset or chord.
    Space,
}

/// A single angle loaded at its ends through one leg (member file
/// version 2, key `angle_connection`). Absent: loaded through the centroid.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct AngleConnection {
    /// The connected leg.
    pub leg: Leg,
    /// E5(a) or E5(b); default planar.
    #[serde(default)]
    pub truss: Truss,
}

/// The shape of the moment caused by transverse load between the ends
/// (member file version 3, keys `span_load_major`, `span_load_minor`).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize, Default)]
#[serde(rename_all = "lowercase")]
pub enum SpanLoad {
    /// A uniformly distributed load: shape 4 s (1 - s), s = x / L.
    #[default]
    Uniform,
    /// A point load at mid-length: shape 1 - |2 s - 1|.
    Point,
}

impl SpanLoad {
    /// The member-file name.
    pub fn key(self) -> &'static str {
        match self {
            SpanLoad::Uniform => "uniform",
            SpanLoad::Point => "point",
        }
    }

    /// The span moment's shape at s = x / L, 1 at mid-length, 0 at the ends.
    pub fn shape(self, s: f64) -> f64 {
        match self {
            SpanLoad::Uniform => 4.0 * s * (1.0 - s),
            SpanLoad::Point => 1.0 - (2.0 * s - 1.0).abs(),
        }
    }
}

/// Where transverse load acts on the section's depth (member file version
/// 3, key `load_level`): it raises or lowers the elastic critical moment.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize, Default)]
#[serde(rename_all = "kebab-case")]
pub enum LoadLevel {
    /// At the shear centre (neutral).
    #[default]
    ShearCentre,
    /// On the compression flange (destabilising).
    CompressionFlange,
    /// On the tension flange (stabilising).
    TensionFlange,
}

impl LoadLevel {
    /// The member-file name.
    pub fn key(self) -> &'static str {
        match self {
            LoadLevel::ShearCentre => "shear-centre",
            LoadLevel::CompressionFlange => "compression-flange",
            LoadLevel::TensionFlange => "tension-flange",
        }
    }
}

/// Which annex of EN 1993-1-1 gives the interaction factors k_ij of
/// 6.3.3(4) (member file version 3, key `interaction_annex`). The key
/// absent (`Member::interaction_annex` is `None`) leaves the choice open:
/// both annexes are worked and the larger utilisation of each equation is
/// taken, said on the result (`interaction-annex-open`).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
pub enum InteractionAnnex {
    /// Annex A (Method 1).
    A,
    /// Annex B (Method 2).
    B,
}

impl InteractionAnnex {
    /// The member-file name.
    pub fn key(self) -> &'static str {
        match self {
            InteractionAnnex::A => "A",
            InteractionAnnex::B => "B",
        }
    }
}

/// The design moments about one axis (member file version 3): the values of
/// the bending-moment diagram at end A (x = 0) and end B (x = L), and the
/// moment at mid-length from transverse load measured from the straight line
/// joining them. M(x) = M_a + (M_b - M_a) s + M_span shape(s), s = x / L.
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct Moments {
    /// M_a, kNm.
    pub a_knm: f64,
    /// M_b, kNm.
    pub b_knm: f64,
    /// M_span, kNm.
    pub span_knm: f64,
    /// The span moment's shape.
    pub span_load: SpanLoad,
}

impl Moments {
    /// Whether every moment is zero.
    pub fn is_zero(&self) -> bool {
        self.a_knm == 0.0 && self.b_knm == 0.0 && self.span_knm == 0.0
    }

    /// M(s) at s = x / L, kNm.
    pub fn at(&self, s: f64) -> f64 {
        self.a_knm + (self.b_knm - self.a_knm) * s + self.span_knm * self.span_load.shape(s)
    }

    /// The largest |M(x)| along the member, kNm: at an end, at mid-length,
    /// or (uniform load) at the stationary point of the parabola.
    pub fn max_abs_knm(&self) -> f64 {
        let mut m = self
            .a_knm
            .abs()
            .max(self.b_knm.abs())
            .max(self.at(0.5).abs());
        if self.span_load == SpanLoad::Uniform && self.span_knm != 0.0 {
            // dM/ds = (M_b - M_a) + 4 M_span (1 - 2 s) = 0.
            let s = 0.5 + (self.b_knm - self.a_knm) / (8.0 * self.span_knm);
            if s > 0.0 && s < 1.0 {
                m = m.max(self.at(s).abs());
            }
        }
        m
    }
}

/// CSA S16-19 13.3.1 exponent n: 1.34 for most members, 2.24 for
/// hot-finished hollow sections and stress-relieved welded sections.
pub const CSA_N_DEFAULT: f64 = 1.34;

fn one() -> f64 {
    1.0
}

fn is_one(v: &f64) -> bool {
    *v == 1.0
}

fn is_zero(v: &f64) -> bool {
    *v == 0.0
}

fn yes() -> bool {
    true
}

fn is_true(v: &bool) -> bool {
    *v
}

fn is_false(v: &bool) -> bool {
    !*v
}

fn is_default<T: Default + PartialEq>(v: &T) -> bool {
    *v == T::default()
}

/// One compression member. A key that is not one of the member's is
/// refused (a misspelt `k_minro` silently dropped would leave its default:
/// the unsafe side), with the nearest key named ([`crate::read::plain`]).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Member {
    /// Unique id within the list (e.g. "C12").
    pub id: String,
    /// Free text.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub note: Option<String>,
    /// The cross-section.
    pub section: SectionSpec,
    /// The material.
    pub material: MaterialSpec,
    /// System length between restraints, mm.
    pub length_mm: f64,
    /// Effective-length factor for major-axis buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_major: f64,
    /// Effective-length factor for minor-axis buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_minor: f64,
    /// Effective-length factor for torsional buckling.
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_torsion: f64,
    /// Major-axis buckling length given directly, mm (wins over k_major).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_major_mm: Option<f64>,
    /// Minor-axis buckling length given directly, mm (wins over k_minor).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_minor_mm: Option<f64>,
    /// Torsional buckling length given directly, mm (wins over k_torsion).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_torsion_mm: Option<f64>,
    /// Design compression, kN (>= 0).
    pub axial_kn: f64,
    /// Design method.
    pub method: Method,
    /// Partial factor gamma_M1 (EN 1993; default 1.0); for the
    /// first-principles methods an optional factor on the resistance.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub gamma_m1: Option<f64>,
    /// EN 1993 buckling curve for the major axis, overriding Table 6.2.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub curve_major: Option<Curve>,
    /// EN 1993 buckling curve for the minor axis, overriding Table 6.2.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub curve_minor: Option<Curve>,
    /// Perry-Robertson initial bow amplitude, mm (default length/1000).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bow_mm: Option<f64>,
    /// Secant formula load eccentricity, mm (default length/1000).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub eccentricity_mm: Option<f64>,
    /// EN 1995 service class 1, 2 or 3 (default 1).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub service_class: Option<u8>,
    /// EN 1995 load-duration class (default medium).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub load_duration: Option<LoadDuration>,
    /// CSA S16 exponent n (1.34 or 2.24; default by section make).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub csa_n: Option<f64>,
    /// A single angle connected through one leg (AISC 360-16 E5; version 2).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub angle_connection: Option<AngleConnection>,
    /// A column in a frame, major axis: k from the alignment-chart
    /// equations (version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub frame_major: Option<Frame>,
    /// A column in a frame, minor axis (version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub frame_minor: Option<Frame>,
    /// A general elastic buckling model: the flexural buckling lengths
    /// come from its critical load analysis (version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub buckling_model: Option<BucklingModel>,
    /// Design moment about the major axis at end A (x = 0), kNm (version 3).
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_major_a_knm: f64,
    /// Design moment about the major axis at end B (x = L), kNm.
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_major_b_knm: f64,
    /// Major-axis moment at mid-length from transverse load, measured from
    /// the line joining the end moments, kNm.
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_major_span_knm: f64,
    /// The shape of the major-axis span moment.
    #[serde(default, skip_serializing_if = "is_default")]
    pub span_load_major: SpanLoad,
    /// Design moment about the minor axis at end A, kNm.
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_minor_a_knm: f64,
    /// Design moment about the minor axis at end B, kNm.
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_minor_b_knm: f64,
    /// Minor-axis moment at mid-length from transverse load, kNm.
    #[serde(default, skip_serializing_if = "is_zero")]
    pub m_minor_span_knm: f64,
    /// The shape of the minor-axis span moment.
    #[serde(default, skip_serializing_if = "is_default")]
    pub span_load_minor: SpanLoad,
    /// Effective-length factor for lateral-torsional buckling (default 1).
    #[serde(default = "one", skip_serializing_if = "is_one")]
    pub k_lt: f64,
    /// Length between lateral-torsional restraints given directly, mm (wins over k_lt).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub lcr_lt_mm: Option<f64>,
    /// The compression flange is held continuously against lateral movement
    /// and twist: no lateral-torsional buckling.
    #[serde(default, skip_serializing_if = "is_false")]
    pub lt_restrained: bool,
    /// Where transverse load acts on the depth.
    #[serde(default, skip_serializing_if = "is_default")]
    pub load_level: LoadLevel,
    /// The moments given are first-order: the engine applies the member's
    /// second-order amplification where the method leaves it to the
    /// designer (AISC 360-16 Appendix 8.2.1, B1). `false`: the moments
    /// already include the member's second-order effects (version 3).
    #[serde(default = "yes", skip_serializing_if = "is_true")]
    pub amplify_moments: bool,
    /// The length of the member's own moment amplification about the
    /// major axis, mm, from the engineer's analysis (AISC 360-16 Appendix
    /// 8.2.1's L_c1, CSA S16-19 13.8.4's L): in place of the laterally
    /// unbraced length with K = 1, for the amplification only, never for
    /// the compression resistance (`interaction::own_length`). `None`:
    /// the unbraced length.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub amplification_length_major_mm: Option<f64>,
    /// The same about the minor axis.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub amplification_length_minor_mm: Option<f64>,
    /// EN 1993-1-1 interaction factors: Annex A (Method 1) or Annex B
    /// (Method 2) (version 3). `None` (the key absent) leaves the choice
    /// open: both are worked and the larger utilisation of each equation is
    /// taken (the lower resistance), said on the result.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub interaction_annex: Option<InteractionAnnex>,
}

/// What the material needs to know of a built section (its governing
/// thickness and product), for [`crate::material::resolve`].
pub fn stock(section: &Section) -> Stock {
    Stock {
        thickness_mm: section.governing_thickness_mm(),
        product: match &section.spec {
            SectionSpec::Chs(s) => Product::RoundHollow(s.make),
            SectionSpec::Rhs(s) => Product::ShapedHollow(s.make),
            _ => Product::Other,
        },
    }
}

/// The longest length or buckling length accepted, mm (10 km): beyond it
/// a number is a typing slip, not a member.
pub const MAX_LENGTH_MM: f64 = 1.0e7;

/// The shortest length or buckling length accepted, mm.
pub const MIN_LENGTH_MM: f64 = 1.0;

/// The largest design compression accepted, kN.
pub const MAX_AXIAL_KN: f64 = 1.0e7;

fn bounded(field: &'static str, value: f64) -> Result<f64> {
    let v = positive(field, value)?;
    if !(MIN_LENGTH_MM..=MAX_LENGTH_MM).contains(&v) {
        return Err(Error::OutOfRange {
            field,
            value: v,
            expected: "a length from 1 mm to 10,000,000 mm (10 km)",
        });
    }
    Ok(v)
}

/// k about one axis: the alignment-chart k when the member gives a frame
/// (refused together with its k or buckling length), else `k`.
fn framed(frame: Option<Frame>, which: FrameKey, k: f64, lcr: Option<f64>) -> Result<f64> {
    let field = which.k_key();
    let k = positive(field, k)?;
    let Some(f) = frame else {
        return Ok(k);
    };
    if lcr.is_some() || k != 1.0 {
        return Err(Error::Geometry {
            field: which.key(),
            reason: format!(
                "give either {} or the axis' k or buckling length, not both",
                which.key()
            ),
        });
    }
    chart::k_factor(&f, which)
}

/// The largest design moment accepted, kNm.
pub const MAX_MOMENT_KNM: f64 = 1.0e7;

fn moment(field: &'static str, value: f64) -> Result<f64> {
    if !(value.is_finite() && value.abs() <= MAX_MOMENT_KNM) {
        return Err(Error::OutOfRange {
            field,
            value,
            expected: "a finite design moment from -10,000,000 to 10,000,000 kNm",
        });
    }
    Ok(value)
}

/// Buckling lengths of a member, mm.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct BucklingLengths {
    /// About the major axis.
    pub major_mm: f64,
    /// About the minor axis.
    pub minor_mm: f64,
    /// For torsional buckling.
    pub torsion_mm: f64,
}

/// The laterally unbraced lengths of a member, mm ([`Member::unbraced`]):
/// the length of its own moment amplification (K = 1).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Unbraced {
    /// About the major axis.
    pub major_mm: f64,
    /// About the minor axis.
    pub minor_mm: f64,
    /// Whether a `buckling_model` gave the buckling lengths (and its
    /// braces these).
    pub from_model: bool,
}

impl Member {
    /// A member with the keys every member needs and every option at its
    /// member-file default (effective-length factors 1, no buckling
    /// lengths, factors, curves, moments or other options given), as a
    /// member file that gives only those keys reads (checked by a test). Set options on the result.
    pub fn new(
        id: impl Into<String>,
        section: SectionSpec,
        material: MaterialSpec,
        length_mm: f64,
        axial_kn: f64,
        method: Method,
    ) -> Member {
        Member {
            id: id.into(),
            note: None,
            section,
            material,
            length_mm,
            k_major: 1.0,
            k_minor: 1.0,
            k_torsion: 1.0,
            lcr_major_mm: None,
            lcr_minor_mm: None,
            lcr_torsion_mm: None,
            axial_kn,
            method,
            gamma_m1: None,
            curve_major: None,
            curve_minor: None,
            bow_mm: None,
            eccentricity_mm: None,
            service_class: None,
            load_duration: None,
            csa_n: None,
            angle_connection: None,
            frame_major: None,
            frame_minor: None,
            buckling_model: None,
            m_major_a_knm: 0.0,
            m_major_b_knm: 0.0,
            m_major_span_knm: 0.0,
            span_load_major: SpanLoad::default(),
            m_minor_a_knm: 0.0,
            m_minor_b_knm: 0.0,
            m_minor_span_knm: 0.0,
            span_load_minor: SpanLoad::default(),
            k_lt: 1.0,
            lcr_lt_mm: None,
            lt_restrained: false,
            load_level: LoadLevel::default(),
            amplify_moments: true,
            amplification_length_major_mm: None,
            amplification_length_minor_mm: None,
            interaction_annex: None,
        }
    }

    /// The member's section, built: a catalogue designation is resolved
    /// here, once, and an unknown one is [`Error::UnknownDesignation`].
    #[inline]
    pub fn build_section(&self) -> Result<Section> {
        crate::catalogue::build(&self.section)
    }

    /// Checks every scalar field of the member (not the section or material,
    /// which check themselves) and returns its buckling lengths.
    #[inline]
    pub fn buckling_lengths(&self) -> Result<BucklingLengths> {
        // The usual case first, with one test of every value (no frames,
        // every k finite and above zero, every length within the bounds,
        // which are finite and above zero): the same lengths as the steps
        // below, which give the error naming the field otherwise.
        if self.frame_major.is_none() && self.frame_minor.is_none() {
            let length = self.length_mm;
            let lengths = BucklingLengths {
                major_mm: self.lcr_major_mm.unwrap_or(self.k_major * length),
                minor_mm: self.lcr_minor_mm.unwrap_or(self.k_minor * length),
                torsion_mm: self.lcr_torsion_mm.unwrap_or(self.k_torsion * length),
            };
            // The lengths at once: the least and the most within the
            // bounds, and no NaN (which min and max pass over) in the sum.
            let (mut least, mut most, mut sum) = (f64::INFINITY, f64::NEG_INFINITY, 0.0);
            for v in [
                length,
                lengths.major_mm,
                lengths.minor_mm,
                lengths.torsion_mm,
            ] {
                least = least.min(v);
                most = most.max(v);
                sum += v;
            }
            if all_positive([self.k_major, self.k_minor, self.k_torsion])
                && least >= MIN_LENGTH_MM
                && most <= MAX_LENGTH_MM
                && !sum.is_nan()
            {
                return Ok(lengths);
            }
        }
        self.buckling_lengths_stepwise()
    }

    /// [`Member::buckling_lengths`] field by field, each refusal naming its field.
    fn buckling_lengths_stepwise(&self) -> Result<BucklingLengths> {
        let length = bounded("length_mm", self.length_mm)?;
        let k_major = framed(
            self.frame_major,
            FrameKey::Major,
            self.k_major,
            self.lcr_major_mm,
        )?;
        let k_minor = framed(
            self.frame_minor,
            FrameKey::Minor,
            self.k_minor,
            self.lcr_minor_mm,
        )?;
        let k_torsion = positive("k_torsion", self.k_torsion)?;
        let pick = |given: Option<f64>, field: &'static str, k: f64| -> Result<f64> {
            match given {
                Some(v) => bounded(field, v),
                None => Ok(k * length),
            }
        };
        Ok(BucklingLengths {
            major_mm: bounded("k_major", pick(self.lcr_major_mm, "lcr_major_mm", k_major)?)?,
            minor_mm: bounded("k_minor", pick(self.lcr_minor_mm, "lcr_minor_mm", k_minor)?)?,
            torsion_mm: bounded(
                "k_torsion",
                pick(self.lcr_torsion_mm, "lcr_torsion_mm", k_torsion)?,
            )?,
        })
    }

    /// The laterally unbraced lengths about both axes ([`Unbraced`]).
    pub fn unbraced(&self) -> Unbraced {
        Unbraced {
            major_mm: self.unbraced_mm(crate::buckling::Axis::Major),
            minor_mm: self.unbraced_mm(crate::buckling::Axis::Minor),
            from_model: self.buckling_model.is_some(),
        }
    }

    /// The laterally unbraced length about `axis`, mm: the member length,
    /// or with a `buckling_model` the longest stretch between points held
    /// rigidly against translation about that axis (the two ends and every
    /// `fixed` brace that holds it). A spring brace does not shorten it (the
    /// safe reading), nor do the ends' supports: a free end still bounds the
    /// member. The length of a member's own moment amplification (AISC
    /// 360-16 Appendix 8.2.1's L_c1 with K1 = 1, CSA S16-19 13.8.4's L).
    fn unbraced_mm(&self, axis: crate::buckling::Axis) -> f64 {
        let length = self.length_mm;
        let Some(model) = &self.buckling_model else {
            return length;
        };
        let held = || {
            model
                .restraints
                .iter()
                .filter(move |b| {
                    b.axis.holds(axis)
                        && b.translation == crate::buckling::Fixity::Fixed
                        && b.at_mm > 0.0
                        && b.at_mm < length
                })
                .map(|b| b.at_mm)
        };
        // Each stretch runs from a held point (end A or a brace) to the
        // nearest held point beyond it; braces are few, so no sorting.
        std::iter::once(0.0)
            .chain(held())
            .map(|from| {
                let to = held().filter(|&x| x > from).fold(length, f64::min);
                to - from
            })
            .fold(0.0, f64::max)
    }

    /// The moments about the major axis (version 3 keys).
    pub fn moments_major(&self) -> Moments {
        Moments {
            a_knm: self.m_major_a_knm,
            b_knm: self.m_major_b_knm,
            span_knm: self.m_major_span_knm,
            span_load: self.span_load_major,
        }
    }

    /// The moments about the minor axis.
    pub fn moments_minor(&self) -> Moments {
        Moments {
            a_knm: self.m_minor_a_knm,
            b_knm: self.m_minor_b_knm,
            span_knm: self.m_minor_span_knm,
            span_load: self.span_load_minor,
        }
    }

    /// Whether the member carries any design moment.
    #[inline]
    pub fn has_moments(&self) -> bool {
        // Moments::is_zero of both axes, on the fields themselves.
        !(self.m_major_a_knm == 0.0
            && self.m_major_b_knm == 0.0
            && self.m_major_span_knm == 0.0
            && self.m_minor_a_knm == 0.0
            && self.m_minor_b_knm == 0.0
            && self.m_minor_span_knm == 0.0)
    }

    /// The first moment key that is not zero, for messages.
    pub fn first_moment_key(&self) -> Option<&'static str> {
        [
            ("m_major_a_knm", self.m_major_a_knm),
            ("m_major_b_knm", self.m_major_b_knm),
            ("m_major_span_knm", self.m_major_span_knm),
            ("m_minor_a_knm", self.m_minor_a_knm),
            ("m_minor_b_knm", self.m_minor_b_knm),
            ("m_minor_span_knm", self.m_minor_span_knm),
        ]
        .into_iter()
        .find(|(_, v)| *v != 0.0)
        .map(|(k, _)| k)
    }

    /// The length between lateral-torsional restraints, mm: `lcr_lt_mm`, or
    /// `k_lt` times the length.
    pub fn lt_length_mm(&self) -> Result<f64> {
        let k = positive("k_lt", self.k_lt)?;
        match self.lcr_lt_mm {
            Some(v) => bounded("lcr_lt_mm", v),
            None => bounded("k_lt", k * self.length_mm),
        }
    }

    /// Checks the bending keys (finite moments, a positive k_lt, a length
    /// between restraints in range).
    pub fn validate_bending(&self) -> Result<()> {
        // The six moments at once (the largest size within the bound, and
        // no NaN, which max passes over, in the sum); the steps below name
        // the first that is not.
        if !self.moments_within_bound() {
            self.moments_stepwise()?;
        }
        positive("k_lt", self.k_lt)?;
        if let Some(v) = self.lcr_lt_mm {
            bounded("lcr_lt_mm", v)?;
        }
        // Any length within the bounds: a shorter one than the unbraced
        // length is the analysis' (said on the result), a longer one only
        // lowers C_e / P_e1 (the safe side).
        for (key, given) in [
            (FrameKey::Major, self.amplification_length_major_mm),
            (FrameKey::Minor, self.amplification_length_minor_mm),
        ] {
            if let Some(v) = given {
                bounded(key.amplification_key(), v)?;
            }
        }
        Ok(())
    }

    /// The six moments at once: the largest size within the bound, and no
    /// NaN (which `max` passes over) in the sum. `false`: one of them is
    /// not ([`Member::moments_stepwise`] names it).
    #[inline]
    fn moments_within_bound(&self) -> bool {
        let moments = [
            self.m_major_a_knm,
            self.m_major_b_knm,
            self.m_major_span_knm,
            self.m_minor_a_knm,
            self.m_minor_b_knm,
            self.m_minor_span_knm,
        ];
        let (mut most, mut sum) = (0.0_f64, 0.0);
        for m in moments {
            most = most.max(m.abs());
            sum += m;
        }
        most <= MAX_MOMENT_KNM && !sum.is_nan()
    }

    /// The moments one by one, the first out of range named.
    fn moments_stepwise(&self) -> Result<()> {
        moment("m_major_a_knm", self.m_major_a_knm)?;
        moment("m_major_b_knm", self.m_major_b_knm)?;
        moment("m_major_span_knm", self.m_major_span_knm)?;
        moment("m_minor_a_knm", self.m_minor_a_knm)?;
        moment("m_minor_b_knm", self.m_minor_b_knm)?;
        moment("m_minor_span_knm", self.m_minor_span_knm)?;
        Ok(())
    }

    /// Checks the method options that do not depend on the method.
    pub fn validate_options(&self) -> Result<()> {
        if self.options_usual() {
            return Ok(());
        }
        self.options_stepwise()
    }

    /// The usual member's options tested at once: moments within their
    /// bound, `k_lt` finite and above zero, the axial load from 0 to its
    /// bound, none of the optional keys that [`Member::options_stepwise`]
    /// tests given, and an id that starts with a letter or digit. `true`
    /// only where the steps find nothing (a unit test holds the two equal
    /// over the edges of every test); `false` leaves it to the steps, which
    /// name the field.
    #[inline]
    fn options_usual(&self) -> bool {
        self.moments_within_bound()
            && self.k_lt > 0.0
            && self.k_lt < f64::INFINITY
            && self.axial_kn >= 0.0
            && self.axial_kn <= MAX_AXIAL_KN
            && self.lcr_lt_mm.is_none()
            && self.amplification_length_major_mm.is_none()
            && self.amplification_length_minor_mm.is_none()
            && self.gamma_m1.is_none()
            && self.bow_mm.is_none()
            && self.eccentricity_mm.is_none()
            && self.service_class.is_none()
            && self.csa_n.is_none()
            && self.buckling_model.is_none()
            && self
                .id
                .as_bytes()
                .first()
                .is_some_and(u8::is_ascii_alphanumeric)
    }

    /// [`Member::validate_options`] one test at a time, naming the field
    /// of the first that fails.
    fn options_stepwise(&self) -> Result<()> {
        self.validate_bending()?;
        non_negative("axial_kn", self.axial_kn)?;
        if self.axial_kn > MAX_AXIAL_KN {
            return Err(Error::OutOfRange {
                field: "axial_kn",
                value: self.axial_kn,
                expected: "a design compression up to 10,000,000 kN",
            });
        }
        if let Some(g) = self.gamma_m1 {
            // No code here has a material (partial) factor below 1.0
            // (EN 1993-1-1 6.1(1) Note 2B recommends 1.00); below it the
            // resistance would exceed the squash load.
            if !(g.is_finite() && (1.0..=3.0).contains(&g)) {
                return Err(Error::OutOfRange {
                    field: "gamma_m1",
                    value: g,
                    expected:
                        "a partial factor from 1.0 to 3.0 (none of the codes has one below 1.0)",
                });
            }
        }
        if let Some(b) = self.bow_mm {
            non_negative("bow_mm", b)?;
        }
        if let Some(e) = self.eccentricity_mm {
            non_negative("eccentricity_mm", e)?;
        }
        if let Some(sc) = self.service_class {
            if !(1..=3).contains(&sc) {
                return Err(Error::OutOfRange {
                    field: "service_class",
                    value: f64::from(sc),
                    expected: "1, 2 or 3",
                });
            }
        }
        if let Some(n) = self.csa_n {
            if !(n.is_finite() && (1.0..=3.0).contains(&n)) {
                return Err(Error::OutOfRange {
                    field: "csa_n",
                    value: n,
                    expected: "1.34 or 2.24 (CSA S16-19 13.3.1)",
                });
            }
        }
        if self.buckling_model.is_some() {
            let given = [
                ("frame_major", self.frame_major.is_some()),
                ("frame_minor", self.frame_minor.is_some()),
                ("lcr_major_mm", self.lcr_major_mm.is_some()),
                ("lcr_minor_mm", self.lcr_minor_mm.is_some()),
                ("k_major", self.k_major != 1.0),
                ("k_minor", self.k_minor != 1.0),
            ];
            if let Some((field, _)) = given.iter().find(|(_, set)| *set) {
                return Err(Error::Geometry {
                    field,
                    reason:
                        "the buckling_model gives the flexural buckling lengths; remove this key \
                             or the model"
                            .into(),
                });
            }
        }
        // trim().is_empty(), without scanning from both ends: stops at
        // the first character that is not white space.
        if self.id.chars().all(char::is_whitespace) {
            return Err(Error::Geometry {
                field: "id",
                reason: "every member needs an id; give it a short name such as \"C1\"".into(),
            });
        }
        Ok(())
    }
}

/// The design method of a member, as named in the member file.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
pub enum Method {
    /// EN 1993-1-1 6.3.1 flexural buckling.
    #[serde(rename = "en1993-1-1")]
    En1993,
    /// AISC 360-16 chapter E, LRFD (phi_c = 0.90).
    #[serde(rename = "aisc360-lrfd")]
    AiscLrfd,
    /// AISC 360-16 chapter E, ASD (Omega_c = 1.67).
    #[serde(rename = "aisc360-asd")]
    AiscAsd,
    /// CSA S16-19 13.3.
    #[serde(rename = "csa-s16")]
    CsaS16,
    /// EN 1995-1-1 6.3.2 timber columns.
    #[serde(rename = "en1995-1-1")]
    En1995,
    /// Perry-Robertson with an explicit initial bow.
    #[serde(rename = "perry-robertson")]
    PerryRobertson,
    /// Secant formula for an eccentric load, first yield.
    #[serde(rename = "secant")]
    Secant,
    /// Euler's elastic critical load capped by the squash load.
    #[serde(rename = "euler")]
    Euler,
}

impl Method {
    /// Every method, in the order the app lists them.
    pub const ALL: [Method; 8] = [
        Method::En1993,
        Method::AiscLrfd,
        Method::AiscAsd,
        Method::CsaS16,
        Method::En1995,
        Method::PerryRobertson,
        Method::Secant,
        Method::Euler,
    ];

    /// The name used in the member file.
    pub fn key(self) -> &'static str {
        match self {
            Method::En1993 => "en1993-1-1",
            Method::AiscLrfd => "aisc360-lrfd",
            Method::AiscAsd => "aisc360-asd",
            Method::CsaS16 => "csa-s16",
            Method::En1995 => "en1995-1-1",
            Method::PerryRobertson => "perry-robertson",
            Method::Secant => "secant",
            Method::Euler => "euler",
        }
    }

    /// A readable title: the standard and the part of it the method
    /// follows, naming no buckling mode (each method checks every mode it
    /// covers, and the result says which governs).
    pub fn title(self) -> &'static str {
        match self {
            Method::En1993 => "EN 1993-1-1 (6.3.1)",
            Method::AiscLrfd => "AISC 360-16 chapter E, LRFD",
            Method::AiscAsd => "AISC 360-16 chapter E, ASD",
            Method::CsaS16 => "CSA S16-19 13.3",
            Method::En1995 => "EN 1995-1-1 timber column",
            Method::PerryRobertson => "Perry-Robertson, initial bow",
            Method::Secant => "Secant formula, eccentric load",
            Method::Euler => "Euler, capped at squash load",
        }
    }

    /// Parses the member-file name.
    pub fn from_key(key: &str) -> Option<Method> {
        Method::ALL.into_iter().find(|m| m.key() == key)
    }

    /// Whether the method is for timber (true) or for steel and custom elastic materials (false).
    pub fn is_timber(self) -> bool {
        matches!(self, Method::En1995)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// A method's title names the standard, never a buckling mode: a
    /// member checked to EN 1993-1-1 can be governed by torsional
    /// buckling (6.3.1.4), one to AISC 360-16 by E4; the file keys stay.
    #[test]
    fn method_titles_name_no_mode_and_keys_stay() {
        for m in Method::ALL {
            let t = m.title().to_lowercase();
            assert!(!t.contains("flexural") && !t.contains("torsional"), "{t}");
        }
        assert_eq!(Method::En1993.title(), "EN 1993-1-1 (6.3.1)");
        assert_eq!(Method::En1993.key(), "en1993-1-1");
        assert_eq!(Method::AiscLrfd.key(), "aisc360-lrfd");
        assert_eq!(Method::from_key("en1993-1-1"), Some(Method::En1993));
    }

    /// The one-test path of `buckling_lengths` gives what the field-by-field
    /// steps give, value and error, over the edges of every bound (NaN,
    /// infinities, zero, negatives, just inside and outside 1 mm and 10 km).
    #[test]
    fn buckling_lengths_are_those_of_the_steps() {
        let values = [
            f64::NAN,
            f64::INFINITY,
            f64::NEG_INFINITY,
            -1.0,
            0.0,
            1e-9,
            0.5,
            0.999_999,
            1.0,
            2.1,
            3000.0,
            9.999e6,
            1.0e7,
            1.000_001e7,
        ];
        let mut compared = 0;
        for &length in &values {
            for &k in &values {
                for &lcr in &[None, Some(f64::NAN), Some(0.5), Some(2500.0), Some(2.0e7)] {
                    for which in 0..3 {
                        let mut m = round_bar(length);
                        match which {
                            0 => (m.k_major, m.lcr_major_mm) = (k, lcr),
                            1 => (m.k_minor, m.lcr_minor_mm) = (k, lcr),
                            _ => (m.k_torsion, m.lcr_torsion_mm) = (k, lcr),
                        }
                        let (a, b) = (m.buckling_lengths(), m.buckling_lengths_stepwise());
                        assert_eq!(format!("{a:?}"), format!("{b:?}"), "{m:?}");
                        compared += 1;
                    }
                }
            }
        }
        assert_eq!(compared, values.len() * values.len() * 5 * 3);
    }

    /// A 50 mm S355 round bar of `length_mm` under 10 kN (EN 1993-1-1).
    fn round_bar(length_mm: f64) -> Member {
        Member::new(
            "L",
            SectionSpec::Round(crate::section::Round { diameter_mm: 50.0 }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            length_mm,
            10.0,
            Method::En1993,
        )
    }

    /// The moments tested at once refuse what the steps one by one refuse,
    /// naming the same field, over the edges of the bound.
    #[test]
    fn moments_at_once_are_the_moments_one_by_one() {
        let values = [
            0.0,
            -0.0,
            1.5,
            -1.0e7,
            1.0e7,
            1.000_000_1e7,
            -1.000_000_1e7,
            f64::INFINITY,
            f64::NEG_INFINITY,
            f64::NAN,
            f64::MAX,
        ];
        let mut compared = 0;
        for &first in &values {
            for &second in &values {
                for slot in 0..6 {
                    let mut m = round_bar(2000.0);
                    let mut moments = [0.0; 6];
                    moments[slot] = first;
                    moments[(slot + 3) % 6] = second;
                    [
                        m.m_major_a_knm,
                        m.m_major_b_knm,
                        m.m_major_span_knm,
                        m.m_minor_a_knm,
                        m.m_minor_b_knm,
                        m.m_minor_span_knm,
                    ] = moments;
                    let at_once = m.validate_bending();
                    let one_by_one = m.moments_stepwise().and_then(|()| {
                        positive("k_lt", m.k_lt)?;
                        Ok(())
                    });
                    assert_eq!(format!("{at_once:?}"), format!("{one_by_one:?}"), "{m:?}");
                    compared += 1;
                }
            }
        }
        assert_eq!(compared, values.len() * values.len() * 6);
    }

    /// The options tested at once (`options_usual`) never pass what the
    /// steps refuse: `validate_options` is the steps' result, error and
    /// field, over the edges of every test, one field at a time and the
    /// moments two at a time; and the usual member takes the quick path.
    #[test]
    fn options_at_once_are_the_options_one_by_one() {
        let edges = [
            0.0,
            -0.0,
            -1.0,
            0.5,
            1.0,
            1.0e7,
            1.000_000_1e7,
            f64::INFINITY,
            f64::NEG_INFINITY,
            f64::NAN,
            f64::MAX,
        ];
        let optional = |v: f64| [None, Some(v)];
        let mut variants: Vec<Member> = vec![round_bar(2000.0)];
        for &v in &edges {
            let base = round_bar(2000.0);
            let mut put = |f: &dyn Fn(&mut Member)| {
                let mut m = base.clone();
                f(&mut m);
                variants.push(m);
            };
            put(&|m| m.axial_kn = v);
            put(&|m| m.k_lt = v);
            put(&|m| m.m_major_a_knm = v);
            put(&|m| m.m_minor_span_knm = v);
            put(&|m| {
                m.m_major_b_knm = v;
                m.m_minor_a_knm = -v;
            });
            for o in optional(v) {
                put(&|m| m.lcr_lt_mm = o);
                put(&|m| m.amplification_length_major_mm = o);
                put(&|m| m.amplification_length_minor_mm = o);
                put(&|m| m.gamma_m1 = o);
                put(&|m| m.bow_mm = o);
                put(&|m| m.eccentricity_mm = o);
                put(&|m| m.csa_n = o);
            }
        }
        for sc in [0, 1, 3, 4] {
            let mut m = round_bar(2000.0);
            m.service_class = Some(sc);
            variants.push(m);
        }
        for id in ["", " ", "\u{b}", "\u{a0}C1", "C1", "1", " C1", "é"] {
            let mut m = round_bar(2000.0);
            m.id = id.into();
            variants.push(m);
        }
        let (mut quick, mut refused) = (0, 0);
        for m in &variants {
            let at_once = m.validate_options();
            let one_by_one = m.options_stepwise();
            assert_eq!(format!("{at_once:?}"), format!("{one_by_one:?}"), "{m:?}");
            quick += usize::from(m.options_usual());
            refused += usize::from(one_by_one.is_err());
        }
        assert!(round_bar(2000.0).options_usual());
        assert!(
            quick > 10 && refused > 10,
            "{quick} quick, {refused} refused"
        );
    }

    #[test]
    fn the_moment_diagram_is_the_documented_sum() {
        let m = Moments {
            a_knm: 10.0,
            b_knm: -20.0,
            span_knm: 8.0,
            span_load: SpanLoad::Uniform,
        };
        assert_eq!((m.at(0.0), m.at(1.0), m.at(0.5)), (10.0, -20.0, 3.0));
        // Point load: linear to mid-length.
        let p = Moments {
            span_load: SpanLoad::Point,
            ..m
        };
        assert_eq!(p.at(0.25), 10.0 - 7.5 + 4.0);
        // A simply supported beam under uniform load: the peak is the span moment.
        let w = Moments {
            a_knm: 0.0,
            b_knm: 0.0,
            span_knm: 50.0,
            span_load: SpanLoad::Uniform,
        };
        assert_eq!(w.max_abs_knm(), 50.0);
        // End moment plus a uniform load: the parabola's peak lies off mid-length.
        // M(s) = 40 s + 40 s(1 - s)... with M_a = 0, M_b = 40, M_span = 20:
        // M = 40 s + 80 s (1 - s), dM/ds = 40 + 80 - 160 s = 0 at s = 0.75, M = 45.
        let e = Moments {
            a_knm: 0.0,
            b_knm: 40.0,
            span_knm: 20.0,
            span_load: SpanLoad::Uniform,
        };
        assert!((e.max_abs_knm() - 45.0).abs() < 1e-12);
        assert!(Moments::default().is_zero());
    }

    #[test]
    fn new_is_what_a_file_with_only_the_needed_keys_reads() {
        let text = r#"{"id": "N1", "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
            "material": {"grade": "S355"}, "length_mm": 2000, "axial_kn": 10, "method": "euler"}"#;
        let read: Member = serde_json::from_str(text).unwrap();
        let made = Member::new(
            "N1",
            SectionSpec::Rect(crate::section::Rect {
                depth_mm: 100.0,
                width_mm: 50.0,
            }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            2000.0,
            10.0,
            Method::Euler,
        );
        assert_eq!(read, made);
    }

    #[test]
    fn bending_keys_are_validated_by_name() {
        let text = r#"{"id": "B1", "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
            "material": {"fy_mpa": 235, "e_mpa": 210000}, "length_mm": 2000, "axial_kn": 0,
            "method": "en1993-1-1", "m_minor_b_knm": 3}"#;
        let mut m: Member = serde_json::from_str(text).unwrap();
        assert_eq!(m.first_moment_key(), Some("m_minor_b_knm"));
        assert!(m.validate_options().is_ok());
        assert_eq!(m.lt_length_mm().unwrap(), 2000.0);
        m.m_major_span_knm = f64::INFINITY;
        assert_eq!(
            m.validate_options().unwrap_err().field(),
            Some("m_major_span_knm")
        );
        m.m_major_span_knm = 0.0;
        m.k_lt = 0.0;
        assert_eq!(m.validate_options().unwrap_err().field(), Some("k_lt"));
        m.k_lt = 1.0;
        m.lcr_lt_mm = Some(1e9);
        assert_eq!(m.validate_options().unwrap_err().field(), Some("lcr_lt_mm"));
    }
}
