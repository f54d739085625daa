//! SI and US customary units: exact conversion factors, the display unit of
//! each kind of quantity, and conversion of member-file values for display
//! and back.
//!
//! The member file always stores SI values in the units its keys name
//! (`_mm`, `_mm2`, `_mm4`, `_mm6`, `_kn`, `_mpa`, `_knm`). A front end that
//! shows US customary units converts for display with [`to_display`] and
//! converts what the person types back with [`from_display`]; rounding is
//! applied to the displayed text only ([`format_display`]), never to the
//! stored value.
//!
//! Definitions (all exact):
//! - 1 in = 25.4 mm (international yard and pound agreement of 1959:
//!   1 yd = 0.9144 m; NIST SP 811, 2008, Appendix B).
//! - 1 ft = 12 in = 304.8 mm.
//! - 1 lbf = 0.453 592 37 kg x 9.806 65 m/s2 = 4.448 221 615 260 5 N
//!   (1959 agreement for the pound; standard gravity of the 3rd CGPM, 1901).
//! - 1 kip = 1000 lbf; 1 ksi = 1 kip/in2; 1 kip-ft = 1 kip x 1 ft.

use serde::{Deserialize, Serialize};

/// Millimetres in one inch (exact).
pub const MM_PER_IN: f64 = 25.4;
/// Millimetres in one foot (exact: 12 x 25.4).
pub const MM_PER_FT: f64 = 304.8;
/// Square millimetres in one square inch (exact: 25.4^2).
pub const MM2_PER_IN2: f64 = 645.16;
/// mm4 in one in4 (exact: 25.4^4).
pub const MM4_PER_IN4: f64 = 416_231.425_6;
/// mm6 in one in6 (exact: 25.4^6).
pub const MM6_PER_IN6: f64 = 268_535_866.540_096;
/// Newtons in one pound-force (exact: 0.45359237 x 9.80665).
pub const N_PER_LBF: f64 = 4.448_221_615_260_5;
/// Kilonewtons in one kip (exact: 1000 lbf).
pub const KN_PER_KIP: f64 = 4.448_221_615_260_5;
/// kN·m in one kip·ft (exact: 4.4482216152605 kN x 0.3048 m).
pub const KNM_PER_KIPFT: f64 = 1.355_817_948_331_400_4;
/// kN/mm in one kip/in (from the definitions: 4.4482216152605 kN / 25.4 mm).
pub const KN_PER_MM_PER_KIP_PER_IN: f64 = KN_PER_KIP / MM_PER_IN;
/// kN/m in one kip/ft (from the definitions: 4.4482216152605 kN / 0.3048 m).
pub const KN_PER_M_PER_KIP_PER_FT: f64 = KN_PER_KIP / (MM_PER_FT / 1000.0);

/// MPa in one ksi, from the definitions above: 1 ksi = 1 kip/in2 =
/// 4448.2216152605 N / 645.16 mm2 = 6.894757293168... MPa (to the
/// rounding of one division).
pub const MPA_PER_KSI: f64 = KN_PER_KIP * 1000.0 / MM2_PER_IN2;

/// Converts ksi to MPa: 1 ksi = 4448.2216152605 N / 645.16 mm2.
pub fn ksi_to_mpa(ksi: f64) -> f64 {
    ksi * (KN_PER_KIP * 1000.0) / MM2_PER_IN2
}

/// Converts MPa to ksi.
pub fn mpa_to_ksi(mpa: f64) -> f64 {
    mpa * MM2_PER_IN2 / (KN_PER_KIP * 1000.0)
}

/// Converts inches to millimetres.
pub fn in_to_mm(v: f64) -> f64 {
    v * MM_PER_IN
}
/// Converts millimetres to inches.
pub fn mm_to_in(v: f64) -> f64 {
    v / MM_PER_IN
}
/// Converts feet to millimetres.
pub fn ft_to_mm(v: f64) -> f64 {
    v * MM_PER_FT
}
/// Converts millimetres to feet.
pub fn mm_to_ft(v: f64) -> f64 {
    v / MM_PER_FT
}
/// Converts metres to millimetres.
pub fn m_to_mm(v: f64) -> f64 {
    v * 1000.0
}
/// Converts millimetres to metres.
pub fn mm_to_m(v: f64) -> f64 {
    v / 1000.0
}
/// Converts in2 to mm2.
pub fn in2_to_mm2(v: f64) -> f64 {
    v * MM2_PER_IN2
}
/// Converts mm2 to in2.
pub fn mm2_to_in2(v: f64) -> f64 {
    v / MM2_PER_IN2
}
/// Converts in4 to mm4.
pub fn in4_to_mm4(v: f64) -> f64 {
    v * MM4_PER_IN4
}
/// Converts mm4 to in4.
pub fn mm4_to_in4(v: f64) -> f64 {
    v / MM4_PER_IN4
}
/// Converts in6 to mm6.
pub fn in6_to_mm6(v: f64) -> f64 {
    v * MM6_PER_IN6
}
/// Converts mm6 to in6.
pub fn mm6_to_in6(v: f64) -> f64 {
    v / MM6_PER_IN6
}
/// Converts kips to kN.
pub fn kip_to_kn(v: f64) -> f64 {
    v * KN_PER_KIP
}
/// Converts kN to kips.
pub fn kn_to_kip(v: f64) -> f64 {
    v / KN_PER_KIP
}
/// Converts kip·ft to kN·m.
pub fn kipft_to_knm(v: f64) -> f64 {
    v * KNM_PER_KIPFT
}
/// Converts kN·m to kip·ft.
pub fn knm_to_kipft(v: f64) -> f64 {
    v / KNM_PER_KIPFT
}

/// The unit system a front end shows.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Default, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum UnitSystem {
    /// SI, as stored in the member file (mm, kN, MPa).
    #[default]
    Si,
    /// US customary (in, ft, kip, ksi).
    Us,
}

/// The kind of a quantity, which sets its unit in each system.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum Quantity {
    /// Section dimension or small length: mm / in.
    Length,
    /// Member length or span: mm / ft (stored in mm in the member file).
    Span,
    /// Area: mm2 / in2.
    Area,
    /// Section modulus: mm3 / in3.
    Modulus,
    /// Second moment or torsion constant: mm4 / in4.
    SecondMoment,
    /// Warping constant: mm6 / in6.
    Warping,
    /// Force: kN / kip.
    Force,
    /// Stress or modulus of elasticity: MPa / ksi.
    Stress,
    /// Moment: kN·m / kip·ft.
    Moment,
    /// Stiffness of a translational spring: kN/mm / kip/in (key suffix
    /// `_kn_per_mm`).
    Stiffness,
    /// Stiffness of a rotational spring: kN·m/rad / kip·ft/rad (key suffix
    /// `_knm_per_rad`).
    RotationalStiffness,
    /// Force per length along a member: kN/m / kip/ft (key suffix
    /// `_kn_per_m`).
    LineLoad,
    /// No unit (factors, slenderness, utilisation).
    Dimensionless,
}

impl Quantity {
    /// The quantity of a member-file key, from its unit suffix
    /// (`length_mm` is a [`Quantity::Span`]; other `_mm` keys are
    /// [`Quantity::Length`]); `None` for keys without a unit.
    pub fn of_key(key: &str) -> Option<Quantity> {
        let (_, suffix) = split_suffix(key)?;
        Some(match suffix {
            // Lengths of the member and positions along it: the member's
            // length, buckling lengths, the amplification lengths, a
            // buckling model's levels (`at_mm`) and results' buckling lengths.
            SiSuffix::Mm
                if key == "length_mm"
                    || key.starts_with("lcr_")
                    || key.starts_with("amplification_length_")
                    || key == "at_mm"
                    || key == "buckling_length_mm" =>
            {
                Quantity::Span
            }
            SiSuffix::Mm => Quantity::Length,
            SiSuffix::Mm2 => Quantity::Area,
            SiSuffix::Mm3 => Quantity::Modulus,
            SiSuffix::Mm4 => Quantity::SecondMoment,
            SiSuffix::Mm6 => Quantity::Warping,
            SiSuffix::Kn => Quantity::Force,
            SiSuffix::Mpa => Quantity::Stress,
            SiSuffix::Knm => Quantity::Moment,
            SiSuffix::KnPerMm => Quantity::Stiffness,
            SiSuffix::KnmPerRad => Quantity::RotationalStiffness,
            SiSuffix::KnPerM => Quantity::LineLoad,
        })
    }

    /// The quantity of a unit as written in the engine's results and
    /// trace ("mm", "mm2", "mm4", "kN", "MPa", "kNm", "-").
    pub fn of_unit(unit: &str) -> Option<Quantity> {
        Some(match unit {
            "mm" => Quantity::Length,
            "mm2" => Quantity::Area,
            "mm3" => Quantity::Modulus,
            "mm4" => Quantity::SecondMoment,
            "mm6" => Quantity::Warping,
            "kN" => Quantity::Force,
            "MPa" => Quantity::Stress,
            "kNm" | "kN·m" | "kN m" => Quantity::Moment,
            "kN/mm" => Quantity::Stiffness,
            "kNm/rad" | "kN·m/rad" => Quantity::RotationalStiffness,
            "kN/m" => Quantity::LineLoad,
            "-" | "" => Quantity::Dimensionless,
            _ => return None,
        })
    }
}

impl Quantity {
    /// The engine's own unit of the quantity, as its results and working
    /// write it (the member file's unit: mm for every length, kN, MPa,
    /// kNm, ...); [`Quantity::of_unit`] reads it back.
    pub fn engine_unit(self) -> &'static str {
        match self {
            Quantity::Length | Quantity::Span => "mm",
            Quantity::Area => "mm2",
            Quantity::Modulus => "mm3",
            Quantity::SecondMoment => "mm4",
            Quantity::Warping => "mm6",
            Quantity::Force => "kN",
            Quantity::Stress => "MPa",
            Quantity::Moment => "kNm",
            Quantity::Stiffness => "kN/mm",
            Quantity::RotationalStiffness => "kNm/rad",
            Quantity::LineLoad => "kN/m",
            Quantity::Dimensionless => "",
        }
    }
}

/// The SI unit suffixes of member-file keys.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum SiSuffix {
    Mm,
    Mm2,
    Mm3,
    Mm4,
    Mm6,
    Kn,
    Mpa,
    Knm,
    KnPerMm,
    KnmPerRad,
    KnPerM,
}

/// The compound suffixes (a rate: one unit per another), looked for first.
const COMPOUND: [(&str, SiSuffix); 3] = [
    ("_kn_per_mm", SiSuffix::KnPerMm),
    ("_knm_per_rad", SiSuffix::KnmPerRad),
    ("_kn_per_m", SiSuffix::KnPerM),
];

fn split_suffix(key: &str) -> Option<(&str, SiSuffix)> {
    for (tail, s) in COMPOUND {
        if let Some(stem) = key.strip_suffix(tail) {
            return (!stem.is_empty()).then_some((stem, s));
        }
    }
    let (stem, suffix) = key.rsplit_once('_')?;
    let s = match suffix {
        "mm" => SiSuffix::Mm,
        "mm2" => SiSuffix::Mm2,
        "mm3" => SiSuffix::Mm3,
        "mm4" => SiSuffix::Mm4,
        "mm6" => SiSuffix::Mm6,
        "kn" => SiSuffix::Kn,
        "mpa" => SiSuffix::Mpa,
        "knm" => SiSuffix::Knm,
        _ => return None,
    };
    if stem.is_empty() {
        None
    } else {
        Some((stem, s))
    }
}

/// A US customary unit that a member-file key may be written in.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum UsUnit {
    /// Inches, for `_mm` keys.
    In,
    /// Feet, for `_mm` keys.
    Ft,
    /// Square inches, for `_mm2` keys.
    In2,
    /// Cubic inches, for `_mm3` keys.
    In3,
    /// in4, for `_mm4` keys.
    In4,
    /// in6, for `_mm6` keys.
    In6,
    /// Kips, for `_kn` keys.
    Kip,
    /// ksi, for `_mpa` keys.
    Ksi,
    /// kip·ft, for `_knm` keys.
    KipFt,
    /// kip/in, for `_kn_per_mm` keys.
    KipPerIn,
    /// kip·ft/rad, for `_knm_per_rad` keys.
    KipFtPerRad,
    /// kip/ft, for `_kn_per_m` keys.
    KipPerFt,
}

impl UsUnit {
    /// The key suffix ("in", "ft", "in2", ...).
    pub fn suffix(self) -> &'static str {
        match self {
            UsUnit::In => "in",
            UsUnit::Ft => "ft",
            UsUnit::In2 => "in2",
            UsUnit::In3 => "in3",
            UsUnit::In4 => "in4",
            UsUnit::In6 => "in6",
            UsUnit::Kip => "kip",
            UsUnit::Ksi => "ksi",
            UsUnit::KipFt => "kipft",
            UsUnit::KipPerIn => "kip_per_in",
            UsUnit::KipFtPerRad => "kipft_per_rad",
            UsUnit::KipPerFt => "kip_per_ft",
        }
    }

    /// Converts a value in this unit to the SI unit of the key it stands for.
    pub fn to_si(self, v: f64) -> f64 {
        match self {
            UsUnit::In => in_to_mm(v),
            UsUnit::Ft => ft_to_mm(v),
            UsUnit::In2 => in2_to_mm2(v),
            UsUnit::In3 => v * (MM2_PER_IN2 * MM_PER_IN),
            UsUnit::In4 => in4_to_mm4(v),
            UsUnit::In6 => in6_to_mm6(v),
            UsUnit::Kip => kip_to_kn(v),
            UsUnit::Ksi => ksi_to_mpa(v),
            UsUnit::KipFt => kipft_to_knm(v),
            UsUnit::KipPerIn => v * KN_PER_MM_PER_KIP_PER_IN,
            UsUnit::KipFtPerRad => kipft_to_knm(v),
            UsUnit::KipPerFt => v * KN_PER_M_PER_KIP_PER_FT,
        }
    }

    /// Converts an SI value of the key this unit stands for into this unit.
    pub fn from_si(self, v: f64) -> f64 {
        match self {
            UsUnit::In => mm_to_in(v),
            UsUnit::Ft => mm_to_ft(v),
            UsUnit::In2 => mm2_to_in2(v),
            UsUnit::In3 => v / (MM2_PER_IN2 * MM_PER_IN),
            UsUnit::In4 => mm4_to_in4(v),
            UsUnit::In6 => mm6_to_in6(v),
            UsUnit::Kip => kn_to_kip(v),
            UsUnit::Ksi => mpa_to_ksi(v),
            UsUnit::KipFt => knm_to_kipft(v),
            UsUnit::KipPerIn => v / KN_PER_MM_PER_KIP_PER_IN,
            UsUnit::KipFtPerRad => knm_to_kipft(v),
            UsUnit::KipPerFt => v / KN_PER_M_PER_KIP_PER_FT,
        }
    }
}

/// Reads a key written with a US unit suffix ("length_ft", "depth_in",
/// "area_in2", "axial_kip", "fy_ksi") as its member-file key and unit
/// ("length_mm", [`UsUnit::Ft`]). `None` when the key has no US suffix.
pub fn us_key_to_si(key: &str) -> Option<(String, UsUnit)> {
    for (tail, si, unit) in [
        ("_kip_per_in", "kn_per_mm", UsUnit::KipPerIn),
        ("_kipft_per_rad", "knm_per_rad", UsUnit::KipFtPerRad),
        ("_kip_per_ft", "kn_per_m", UsUnit::KipPerFt),
    ] {
        if let Some(stem) = key.strip_suffix(tail) {
            return (!stem.is_empty()).then(|| (format!("{stem}_{si}"), unit));
        }
    }
    let (stem, suffix) = key.rsplit_once('_')?;
    if stem.is_empty() {
        return None;
    }
    let (si, unit) = match suffix {
        "in" => ("mm", UsUnit::In),
        "ft" => ("mm", UsUnit::Ft),
        "in2" => ("mm2", UsUnit::In2),
        "in3" => ("mm3", UsUnit::In3),
        "in4" => ("mm4", UsUnit::In4),
        "in6" => ("mm6", UsUnit::In6),
        "kip" => ("kn", UsUnit::Kip),
        "ksi" => ("mpa", UsUnit::Ksi),
        "kipft" => ("knm", UsUnit::KipFt),
        _ => return None,
    };
    Some((format!("{stem}_{si}"), unit))
}

/// The US form of a member-file key in `unit`, e.g. ("length_mm", Ft) ->
/// "length_ft"; `None` when the unit does not fit the key's suffix.
pub fn si_key_to_us(key: &str, unit: UsUnit) -> Option<String> {
    let (stem, suffix) = split_suffix(key)?;
    let fits = matches!(
        (suffix, unit),
        (SiSuffix::Mm, UsUnit::In | UsUnit::Ft)
            | (SiSuffix::Mm2, UsUnit::In2)
            | (SiSuffix::Mm3, UsUnit::In3)
            | (SiSuffix::Mm4, UsUnit::In4)
            | (SiSuffix::Mm6, UsUnit::In6)
            | (SiSuffix::Kn, UsUnit::Kip)
            | (SiSuffix::Mpa, UsUnit::Ksi)
            | (SiSuffix::Knm, UsUnit::KipFt)
            | (SiSuffix::KnPerMm, UsUnit::KipPerIn)
            | (SiSuffix::KnmPerRad, UsUnit::KipFtPerRad)
            | (SiSuffix::KnPerM, UsUnit::KipPerFt)
    );
    if fits {
        Some(format!("{stem}_{}", unit.suffix()))
    } else {
        None
    }
}

/// The unit a quantity is shown in.
pub fn display_unit(system: UnitSystem, q: Quantity) -> &'static str {
    match (system, q) {
        (UnitSystem::Si, Quantity::Length) => "mm",
        (UnitSystem::Si, Quantity::Span) => "m",
        (UnitSystem::Si, Quantity::Area) => "mm²",
        (UnitSystem::Si, Quantity::Modulus) => "mm³",
        (UnitSystem::Si, Quantity::SecondMoment) => "mm⁴",
        (UnitSystem::Si, Quantity::Warping) => "mm⁶",
        (UnitSystem::Si, Quantity::Force) => "kN",
        (UnitSystem::Si, Quantity::Stress) => "MPa",
        (UnitSystem::Si, Quantity::Moment) => "kN·m",
        (UnitSystem::Si, Quantity::Stiffness) => "kN/mm",
        (UnitSystem::Si, Quantity::RotationalStiffness) => "kN·m/rad",
        (UnitSystem::Si, Quantity::LineLoad) => "kN/m",
        (UnitSystem::Us, Quantity::Length) => "in",
        (UnitSystem::Us, Quantity::Span) => "ft",
        (UnitSystem::Us, Quantity::Area) => "in²",
        (UnitSystem::Us, Quantity::Modulus) => "in³",
        (UnitSystem::Us, Quantity::SecondMoment) => "in⁴",
        (UnitSystem::Us, Quantity::Warping) => "in⁶",
        (UnitSystem::Us, Quantity::Force) => "kip",
        (UnitSystem::Us, Quantity::Stress) => "ksi",
        (UnitSystem::Us, Quantity::Moment) => "kip·ft",
        (UnitSystem::Us, Quantity::Stiffness) => "kip/in",
        (UnitSystem::Us, Quantity::RotationalStiffness) => "kip·ft/rad",
        (UnitSystem::Us, Quantity::LineLoad) => "kip/ft",
        (_, Quantity::Dimensionless) => "",
    }
}

/// The US unit a quantity is shown in (`None` when dimensionless): member
/// lengths in feet, other lengths in inches.
pub fn us_unit(q: Quantity) -> Option<UsUnit> {
    Some(match q {
        Quantity::Length => UsUnit::In,
        Quantity::Span => UsUnit::Ft,
        Quantity::Area => UsUnit::In2,
        Quantity::Modulus => UsUnit::In3,
        Quantity::SecondMoment => UsUnit::In4,
        Quantity::Warping => UsUnit::In6,
        Quantity::Force => UsUnit::Kip,
        Quantity::Stress => UsUnit::Ksi,
        Quantity::Moment => UsUnit::KipFt,
        Quantity::Stiffness => UsUnit::KipPerIn,
        Quantity::RotationalStiffness => UsUnit::KipFtPerRad,
        Quantity::LineLoad => UsUnit::KipPerFt,
        Quantity::Dimensionless => return None,
    })
}

/// Converts a stored (member-file, SI) value of quantity `q` to the
/// display unit of `system`. SI spans are shown in metres.
pub fn to_display(system: UnitSystem, q: Quantity, stored: f64) -> f64 {
    match system {
        UnitSystem::Si if q == Quantity::Span => mm_to_m(stored),
        UnitSystem::Si => stored,
        UnitSystem::Us => match us_unit(q) {
            Some(u) => u.from_si(stored),
            None => stored,
        },
    }
}

/// Converts a value typed in the display unit of `system` back to the
/// member file's SI unit. The inverse of [`to_display`].
pub fn from_display(system: UnitSystem, q: Quantity, shown: f64) -> f64 {
    match system {
        UnitSystem::Si if q == Quantity::Span => m_to_mm(shown),
        UnitSystem::Si => shown,
        UnitSystem::Us => match us_unit(q) {
            Some(u) => u.to_si(shown),
            None => shown,
        },
    }
}

/// Converts a stored value of a member-file key for display, with its
/// display unit; keys without a unit are returned as they are.
pub fn key_to_display(system: UnitSystem, key: &str, stored: f64) -> (f64, &'static str) {
    let q = Quantity::of_key(key).unwrap_or(Quantity::Dimensionless);
    (to_display(system, q, stored), display_unit(system, q))
}

/// Converts a typed value of a member-file key back to the stored unit.
pub fn key_from_display(system: UnitSystem, key: &str, shown: f64) -> f64 {
    let q = Quantity::of_key(key).unwrap_or(Quantity::Dimensionless);
    from_display(system, q, shown)
}

/// Formats a value for display with `significant` significant figures
/// (at least 1, at most 17), without exponent for everyday magnitudes
/// and without trailing zeros. The stored value is never rounded.
pub fn format_display(value: f64, significant: usize) -> String {
    if !value.is_finite() {
        return if value.is_nan() {
            "–".to_string()
        } else if value > 0.0 {
            "∞".to_string()
        } else {
            "-∞".to_string()
        };
    }
    if value == 0.0 {
        return "0".to_string();
    }
    let sig = significant.clamp(1, 17);
    let magnitude = value.abs().log10().floor();
    if !(-5.0..=15.0).contains(&magnitude) {
        return format!("{:.*e}", sig - 1, value);
    }
    // magnitude is within -5..=15, so the cast is exact and small.
    let decimals = (sig as i64 - 1 - magnitude as i64).max(0);
    fixed_trimmed(value, decimals as usize)
}

/// `value` to `decimals` decimals, without trailing zeros (nor a point
/// left alone), a negative zero written "0". The one trimming of shown
/// figures: [`format_display`], the app's US fields and the US CSV cells.
pub fn fixed_trimmed(value: f64, decimals: usize) -> String {
    let text = format!("{value:.decimals$}");
    let text = if text.contains('.') {
        text.trim_end_matches('0').trim_end_matches('.').to_string()
    } else {
        text
    };
    if text == "-0" {
        "0".to_string()
    } else {
        text
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_engine_unit_reads_back_as_its_quantity() {
        for q in ALL_Q {
            let back = Quantity::of_unit(q.engine_unit());
            let want = if q == Quantity::Span {
                Quantity::Length
            } else {
                q
            };
            assert_eq!(back, Some(want), "{q:?}");
        }
    }

    fn rel(a: f64, b: f64) -> f64 {
        if b == 0.0 {
            a.abs()
        } else {
            ((a - b) / b).abs()
        }
    }

    const ALL_Q: [Quantity; 13] = [
        Quantity::Length,
        Quantity::Span,
        Quantity::Area,
        Quantity::Modulus,
        Quantity::SecondMoment,
        Quantity::Warping,
        Quantity::Force,
        Quantity::Stress,
        Quantity::Moment,
        Quantity::Stiffness,
        Quantity::RotationalStiffness,
        Quantity::LineLoad,
        Quantity::Dimensionless,
    ];

    #[test]
    fn round_trips_both_ways_within_1e_12() {
        let values = [
            1e-9, 0.001, 0.5, 1.0, 3.0, 25.4, 304.8, 1234.5678, 6.02e23, 7e-300,
        ];
        for system in [UnitSystem::Si, UnitSystem::Us] {
            for q in ALL_Q {
                for v in values {
                    let there = to_display(system, q, v);
                    let back = from_display(system, q, there);
                    assert!(rel(back, v) <= 1e-12, "{system:?} {q:?} {v}: {back}");
                    let other = from_display(system, q, v);
                    let again = to_display(system, q, other);
                    assert!(rel(again, v) <= 1e-12, "{system:?} {q:?} {v}: {again}");
                }
            }
        }
    }

    #[test]
    fn derived_factors_equal_their_definitions() {
        // Each factor is the exact power or product of the defining ones.
        assert!(rel(MM_PER_FT, 12.0 * MM_PER_IN) <= 1e-15);
        assert!(rel(MM2_PER_IN2, MM_PER_IN * MM_PER_IN) <= 1e-15);
        assert!(rel(MM4_PER_IN4, MM_PER_IN.powi(4)) <= 1e-15);
        assert!(rel(MM6_PER_IN6, MM_PER_IN.powi(6)) <= 1e-15);
        assert!(rel(N_PER_LBF, 0.453_592_37 * 9.806_65) <= 1e-15);
        assert!(rel(KN_PER_KIP, 1000.0 * N_PER_LBF / 1000.0) <= 1e-15);
        assert!(rel(KNM_PER_KIPFT, KN_PER_KIP * 0.3048) <= 1e-15);
        assert!(rel(ksi_to_mpa(1.0), 4_448.221_615_260_5 / 645.16) <= 1e-15);
    }

    #[test]
    fn keys_convert_between_systems() {
        assert_eq!(
            us_key_to_si("length_ft"),
            Some(("length_mm".into(), UsUnit::Ft))
        );
        assert_eq!(
            us_key_to_si("depth_in"),
            Some(("depth_mm".into(), UsUnit::In))
        );
        assert_eq!(
            us_key_to_si("area_in2"),
            Some(("area_mm2".into(), UsUnit::In2))
        );
        assert_eq!(
            us_key_to_si("i_major_in4"),
            Some(("i_major_mm4".into(), UsUnit::In4))
        );
        assert_eq!(
            us_key_to_si("warping_in6"),
            Some(("warping_mm6".into(), UsUnit::In6))
        );
        assert_eq!(
            us_key_to_si("axial_kip"),
            Some(("axial_kn".into(), UsUnit::Kip))
        );
        assert_eq!(us_key_to_si("fy_ksi"), Some(("fy_mpa".into(), UsUnit::Ksi)));
        assert_eq!(
            us_key_to_si("moment_kipft"),
            Some(("moment_knm".into(), UsUnit::KipFt))
        );
        assert_eq!(us_key_to_si("grade"), None);
        assert_eq!(us_key_to_si("_in"), None);
        assert_eq!(
            si_key_to_us("length_mm", UsUnit::Ft).as_deref(),
            Some("length_ft")
        );
        assert_eq!(si_key_to_us("length_mm", UsUnit::Kip), None);
        assert_eq!(si_key_to_us("e_mpa", UsUnit::Ksi).as_deref(), Some("e_ksi"));
        assert_eq!(Quantity::of_key("length_mm"), Some(Quantity::Span));
        assert_eq!(Quantity::of_key("lcr_minor_mm"), Some(Quantity::Span));
        assert_eq!(
            Quantity::of_key("amplification_length_major_mm"),
            Some(Quantity::Span)
        );
        assert_eq!(Quantity::of_key("at_mm"), Some(Quantity::Span));
        assert_eq!(Quantity::of_key("bow_mm"), Some(Quantity::Length));
        assert_eq!(Quantity::of_key("depth_mm"), Some(Quantity::Length));
        assert_eq!(Quantity::of_key("fy_mpa"), Some(Quantity::Stress));
        assert_eq!(Quantity::of_key("k_major"), None);
        assert_eq!(Quantity::of_unit("mm4"), Some(Quantity::SecondMoment));
    }

    #[test]
    fn display_units_and_values() {
        let (v, u) = key_to_display(UnitSystem::Us, "length_mm", 3657.6);
        assert!(rel(v, 12.0) < 1e-15 && u == "ft");
        let (v, u) = key_to_display(UnitSystem::Si, "length_mm", 3657.6);
        assert!(rel(v, 3.6576) < 1e-15 && u == "m");
        let (v, u) = key_to_display(UnitSystem::Us, "fy_mpa", ksi_to_mpa(50.0));
        assert!(rel(v, 50.0) < 1e-14 && u == "ksi");
        assert!(rel(key_from_display(UnitSystem::Us, "depth_mm", 10.0), 254.0) < 1e-15);
        assert_eq!(key_from_display(UnitSystem::Us, "k_major", 0.7), 0.7);
        assert_eq!(display_unit(UnitSystem::Us, Quantity::Moment), "kip·ft");
    }

    #[test]
    fn spring_stiffnesses_and_line_loads() {
        // 1 kip/in = 4.4482216152605 kN / 25.4 mm = 0.175126835246... kN/mm;
        // 1 kip/ft = 4.4482216152605 kN / 0.3048 m = 14.5939029372... kN/m;
        // 1 kip·ft/rad = 1.3558179483314 kN·m/rad (NIST SP 811, 2008, App. B
        // factors for lbf, in and ft, multiplied out).
        assert_eq!(
            Quantity::of_key("spring_kn_per_mm"),
            Some(Quantity::Stiffness)
        );
        assert_eq!(
            Quantity::of_key("spring_knm_per_rad"),
            Some(Quantity::RotationalStiffness)
        );
        assert_eq!(
            Quantity::of_key("distributed_kn_per_m"),
            Some(Quantity::LineLoad)
        );
        assert_eq!(Quantity::of_key("_kn_per_m"), None);
        let (v, u) = key_to_display(UnitSystem::Us, "spring_kn_per_mm", 0.175_126_835_246_476_4);
        assert!(rel(v, 1.0) < 1e-15 && u == "kip/in", "{v} {u}");
        let (v, u) = key_to_display(
            UnitSystem::Us,
            "distributed_kn_per_m",
            14.593_902_937_206_36,
        );
        assert!(rel(v, 1.0) < 1e-14 && u == "kip/ft", "{v} {u}");
        let (v, u) = key_to_display(
            UnitSystem::Us,
            "spring_knm_per_rad",
            1.355_817_948_331_400_4,
        );
        assert!(rel(v, 1.0) < 1e-15 && u == "kip·ft/rad", "{v} {u}");
        assert_eq!(
            key_to_display(UnitSystem::Si, "spring_kn_per_mm", 3.0),
            (3.0, "kN/mm")
        );
        assert_eq!(
            us_key_to_si("distributed_kip_per_ft"),
            Some(("distributed_kn_per_m".into(), UsUnit::KipPerFt))
        );
        assert_eq!(
            si_key_to_us("spring_knm_per_rad", UsUnit::KipFtPerRad).as_deref(),
            Some("spring_kipft_per_rad")
        );
        assert_eq!(si_key_to_us("spring_kn_per_mm", UsUnit::Kip), None);
    }

    #[test]
    fn display_rounding_is_text_only() {
        assert_eq!(format_display(344.737_864_655, 4), "344.7");
        assert_eq!(format_display(0.000_123_456, 3), "0.000123");
        assert_eq!(format_display(1200.0, 3), "1200");
        assert_eq!(format_display(-0.000_000_1, 2), "-1.0e-7");
        assert_eq!(format_display(0.0, 3), "0");
        assert_eq!(format_display(-0.000_04, 1), "-0.00004");
        assert_eq!(format_display(f64::INFINITY, 3), "∞");
    }
}
