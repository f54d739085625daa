//! The units the person sees and types in: SI (as stored) or US customary.
//!
//! A display preference only, kept under its own storage key: the member
//! file keeps its SI values whatever is shown, and rounding is applied to
//! the text on screen, never to a stored value. In SI the app shows the
//! member file's own units (mm, kN, MPa); in US customary the engine's
//! exact factors ([`strutline_core::units`]) convert for display and back.

use leptos::prelude::*;
use strutline_core::units::{self, Quantity, UnitSystem};

use crate::browser;
use crate::numtext::{parse_number, working};

/// The storage key of the preference.
pub const KEY: &str = "strutline.v1.units";

/// The stored preference (SI when none).
pub fn load() -> UnitSystem {
    if browser::get(KEY).as_deref() == Some("us") {
        UnitSystem::Us
    } else {
        UnitSystem::Si
    }
}

/// The preference as stored.
pub fn stored_text(s: UnitSystem) -> &'static str {
    match s {
        UnitSystem::Si => "si",
        UnitSystem::Us => "us",
    }
}

/// The unit system shown, from the app's context (SI outside the app).
pub fn current() -> UnitSystem {
    use_context::<RwSignal<UnitSystem>>().map_or(UnitSystem::Si, |s| s.get())
}

/// The unit system shown, without tracking (for views made afresh).
pub fn now() -> UnitSystem {
    use_context::<RwSignal<UnitSystem>>().map_or(UnitSystem::Si, |s| s.get_untracked())
}

/// The quantity of an engine unit ("mm", "kN", ...); spans are "mm" too.
fn of_unit(unit: &str, span: bool) -> Option<Quantity> {
    match Quantity::of_unit(unit)? {
        Quantity::Length if span => Some(Quantity::Span),
        q => Some(q),
    }
}

/// A stored value given in engine unit `unit`, converted for display:
/// (value, unit). SI is shown as stored; `span` shows US lengths in ft.
pub fn shown(system: UnitSystem, unit: &'static str, v: f64, span: bool) -> (f64, &'static str) {
    match (system, of_unit(unit, span)) {
        (UnitSystem::Us, Some(q)) => (
            units::to_display(system, q, v),
            units::display_unit(system, q),
        ),
        _ => (v, if unit == "-" { "" } else { unit }),
    }
}

/// A value of the working with its unit ("12.3 kip").
pub fn step_text(system: UnitSystem, unit: &'static str, v: f64) -> String {
    let (v, u) = shown(system, unit, v, false);
    if u.is_empty() {
        working(v)
    } else {
        format!("{} {u}", working(v))
    }
}

/// A result with `decimals` in SI, three significant figures more in US.
pub fn result_text(system: UnitSystem, unit: &'static str, v: f64, decimals: usize) -> String {
    let (d, u) = shown(system, unit, v, false);
    let n = match system {
        UnitSystem::Si => crate::numtext::fixed(d, decimals),
        UnitSystem::Us => units::format_display(d, 4),
    };
    format!("{n} {u}")
}

/// A stored value in short, with its unit: to five significant figures in
/// SI (a value typed as 2800 or 95 reads as typed; one converted from US
/// units, 266.89329691563 kN, reads 266.89 kN), in US units converted, to
/// four. `span` shows a US length in ft. For one-line summaries such as
/// the list's rows; the editor shows the stored value itself.
pub fn plain_text(system: UnitSystem, unit: &'static str, v: f64, span: bool) -> String {
    let (d, u) = shown(system, unit, v, span);
    let n = match system {
        UnitSystem::Si => units::format_display(d, 5),
        UnitSystem::Us => units::format_display(d, 4),
    };
    format!("{n} {u}")
}

/// Decimals of a section dimension shown in inches: three, the
/// thousandth of an inch to which US steel tables give a section's
/// dimensions (common practice, e.g. a web 0.355 in thick).
const INCH_DECIMALS: usize = 3;

/// A section's short description in the units shown: SI as the engine
/// writes it (mm, no unit); US with its dimensions in inches to the
/// thousandth (trailing zeros dropped) followed by "in", a given section's
/// area and second moments in in² and in⁴ to four significant figures. A
/// catalogue designation is its name in either (a W-shape keeps its
/// name). For the list's rows.
pub fn section_text(system: UnitSystem, spec: &strutline_core::section::SectionSpec) -> String {
    if system == UnitSystem::Si {
        return spec.describe();
    }
    let number = |v: f64, q: Quantity| {
        let d = units::to_display(system, q, v);
        match q {
            Quantity::Length => {
                let t = format!("{d:.INCH_DECIMALS$}");
                let t = t.trim_end_matches('0').trim_end_matches('.');
                if t == "-0" {
                    "0".to_string()
                } else {
                    t.to_string()
                }
            }
            _ => format!(
                "{} {}",
                units::format_display(d, 4),
                units::display_unit(system, q)
            ),
        }
    };
    let unit = format!(" {}", units::display_unit(system, Quantity::Length));
    spec.describe_in(&number, &unit)
}

/// A member length or position in the display units (mm in SI, ft in US),
/// to the working's figures.
pub fn span_text(system: UnitSystem, mm: f64) -> String {
    let (v, u) = shown(system, "mm", mm, true);
    format!("{} {u}", working(v))
}

/// The unit of an editor field with member-file key `key`.
pub fn field_unit(system: UnitSystem, key: &str, si_unit: &'static str) -> &'static str {
    match (system, Quantity::of_key(key)) {
        (UnitSystem::Us, Some(q)) if q != Quantity::Dimensionless => units::display_unit(system, q),
        _ => si_unit,
    }
}

/// The name a field's key goes by in the units shown: the member file's
/// key in SI, the US column's (`length_ft`, `axial_kip`) in US units, as
/// the CSV with US columns names it.
pub fn field_key(system: UnitSystem, key: &'static str) -> std::borrow::Cow<'static, str> {
    let us = (system == UnitSystem::Us)
        .then(|| Quantity::of_key(key).and_then(units::us_unit))
        .flatten()
        .and_then(|u| units::si_key_to_us(key, u));
    us.map_or(std::borrow::Cow::Borrowed(key), std::borrow::Cow::Owned)
}

/// The text a field shows for the stored text `si` of key `key`.
pub fn to_field(system: UnitSystem, key: &str, si: &str) -> String {
    let Some(q) = Quantity::of_key(key).filter(|_| system == UnitSystem::Us) else {
        return si.to_string();
    };
    // The field shows the stored value converted and rounded; only a field
    // the person edits is converted back (exactly, from what is typed), so
    // the stored value stays as it was until then.
    match parse_number(si) {
        Ok(v) => field_figure(q, units::key_to_display(system, key, v).0),
        Err(_) => si.to_string(),
    }
}

/// The decimals a field shows a quantity with in US units: the resolution
/// US practice writes it to (common practice, recalled from memory of US
/// steel tables and load tables, not from one source): section dimensions
/// to the thousandth of an inch (as [`INCH_DECIMALS`]), member lengths to
/// the thousandth of a foot (0.3 mm), areas to 0.001 in², moduli to
/// 0.01 in³, second moments to 0.1 in⁴, forces to 0.1 kip, stresses to
/// 0.1 ksi, moments to 0.1 kip·ft, a spring to 0.01 kip/in or 0.1
/// kip·ft/rad, a line load to 0.001 kip/ft (1 lb/ft).
fn field_decimals(q: Quantity) -> usize {
    match q {
        Quantity::Length | Quantity::Span | Quantity::Area | Quantity::LineLoad => INCH_DECIMALS,
        Quantity::Modulus | Quantity::Stiffness => 2,
        Quantity::SecondMoment
        | Quantity::Force
        | Quantity::Stress
        | Quantity::Moment
        | Quantity::RotationalStiffness => 1,
        Quantity::Warping => 0,
        // Shown as stored (to_field does not convert it).
        Quantity::Dimensionless => 6,
    }
}

/// A converted value as a field shows it in US units: to the quantity's
/// decimals ([`field_decimals`]), or to three significant figures where
/// that shows more (a small value: 2 kN is 0.45 kip, not 0.4), without
/// trailing zeros.
fn field_figure(q: Quantity, v: f64) -> String {
    if !v.is_finite() || v == 0.0 {
        return units::format_display(v, 3);
    }
    // Three significant figures need 2 - floor(log10|v|) decimals.
    let small = 2 - v.abs().log10().floor().clamp(-15.0, 15.0) as i64;
    let decimals = (field_decimals(q) as i64).max(small).clamp(0, 17) as usize;
    units::fixed_trimmed(v, decimals)
}

/// What the person typed in the display unit, as text in the stored unit
/// (left as typed when it is not a number, so the field's own check
/// reports it).
pub fn from_field(system: UnitSystem, key: &str, typed: &str) -> String {
    if system == UnitSystem::Si || Quantity::of_key(key).is_none() || typed.trim().is_empty() {
        return typed.to_string();
    }
    // Core's one reader of what a person types for a key in a unit
    // system: in US units a length may also be feet and inches (`13'-6"`),
    // as the CSV reader takes it.
    match strutline_core::csv::parse_typed(typed, key, system) {
        Ok(v) => format!("{v:?}"),
        Err(_) => typed.to_string(),
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use UnitSystem::{Si, Us};

    #[test]
    fn a_field_key_goes_by_its_us_column_in_us_units() {
        assert_eq!(field_key(Si, "length_mm"), "length_mm");
        assert_eq!(field_key(Us, "length_mm"), "length_ft");
        assert_eq!(field_key(Us, "axial_kn"), "axial_kip");
        assert_eq!(field_key(Us, "depth_mm"), "depth_in");
        assert_eq!(field_key(Us, "m_major_a_knm"), "m_major_a_kipft");
        // A member length, shown in ft as the member's own length is.
        assert_eq!(
            field_key(Us, "amplification_length_major_mm"),
            "amplification_length_major_ft"
        );
        assert_eq!(field_key(Us, "k_major"), "k_major");
        assert_eq!(field_key(Us, "note"), "note");
    }

    #[test]
    fn a_section_reads_in_the_units_shown() {
        use strutline_core::section::{CatalogueRef, Given, IShape, Rhs, SectionSpec};
        // 1 in = 25.4 mm exactly (NIST SP 811, 2008, App. B): 200 mm =
        // 7.874 in, 15 mm = 0.591 in, 9 mm = 0.354 in, 18 mm = 0.709 in,
        // each to the thousandth.
        let i = SectionSpec::I(IShape {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 9.0,
            root_radius_mm: 18.0,
            make: Default::default(),
        });
        assert_eq!(section_text(Si, &i), "I 200x200x15x9 r18");
        assert_eq!(section_text(Us, &i), "I 7.874x7.874x0.591x0.354 in r0.709");
        assert!(!section_text(Us, &i).contains("mm"));
        // Typed in inches, it reads as typed: 6 x 4 x 1/4 in.
        let rhs = SectionSpec::Rhs(Rhs {
            depth_mm: 6.0 * 25.4,
            width_mm: 4.0 * 25.4,
            wall_mm: 0.25 * 25.4,
            outer_radius_mm: 0.0,
            inner_radius_mm: None,
            make: Default::default(),
        });
        assert_eq!(section_text(Us, &rhs), "RHS 6x4x0.25 in");
        // A given section's area and second moments: 2850 mm² = 4.418 in²
        // (645.16 mm² a square inch), 9.2e6 mm⁴ = 22.1 in⁴ and 3.1e6 mm⁴ =
        // 7.448 in⁴ (416,231.4256 mm⁴ an in⁴), four significant figures.
        let given = SectionSpec::Given(Given {
            area_mm2: 2850.0,
            i_major_mm4: 9_200_000.0,
            i_minor_mm4: 3_100_000.0,
            torsion_mm4: None,
            warping_mm6: None,
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        });
        assert_eq!(
            section_text(Us, &given),
            "given A=4.418 in² I=22.1 in⁴/7.448 in⁴"
        );
        // A catalogue designation is its name in either system.
        let w = SectionSpec::Catalogue(CatalogueRef {
            designation: "W10X49".into(),
        });
        assert_eq!(section_text(Us, &w), "W10X49");
        assert_eq!(section_text(Si, &w), "W10X49");
    }

    #[test]
    fn si_is_shown_as_stored() {
        assert_eq!(shown(Si, "kN", 123.4, false), (123.4, "kN"));
        assert_eq!(shown(Si, "-", 0.5, false), (0.5, ""));
        assert_eq!(to_field(Si, "length_mm", "2800"), "2800");
        assert_eq!(from_field(Si, "axial_kn", "12,5"), "12,5");
        assert_eq!(field_unit(Si, "axial_kn", "kN"), "kN");
    }

    #[test]
    fn us_conversion_uses_exact_factors() {
        // 1 kip = 4.4482216152605 kN (NIST SP 811, 2008, App. B: 1 lbf =
        // 4.448 221 615 260 5 N), so 444.82216152605 kN is 100 kip.
        let (v, u) = shown(Us, "kN", 444.822_161_526_05, false);
        assert_eq!(u, "kip");
        assert!((v - 100.0).abs() < 1e-9, "{v}");
        assert_eq!(result_text(Us, "kN", 444.822_161_526_05, 1), "100 kip");
        // 1 ksi = 6.894 757 293 168 MPa (same source): 355 MPa = 51.49 ksi.
        assert_eq!(result_text(Us, "MPa", 355.0, 1), "51.49 ksi");
        // 1 ft = 304.8 mm exactly; a span of 3048 mm is 10 ft.
        assert_eq!(shown(Us, "mm", 3048.0, true), (10.0, "ft"));
        assert_eq!(shown(Us, "mm", 25.4, false), (1.0, "in"));
        assert_eq!(step_text(Us, "-", 0.5), "0.5");
    }

    #[test]
    fn summaries_follow_the_units() {
        assert_eq!(plain_text(Si, "mm", 3600.0, true), "3600 mm");
        assert_eq!(plain_text(Si, "kN", 820.0, false), "820 kN");
        // 3600 mm / 304.8 = 11.811 ft; 820 kN / 4.4482216152605 = 184.34 kip.
        assert_eq!(plain_text(Us, "mm", 3600.0, true), "11.81 ft");
        assert_eq!(plain_text(Us, "kN", 820.0, false), "184.3 kip");
        // In short: five significant figures in SI, so a load converted
        // from US units does not show its float tail.
        assert_eq!(plain_text(Si, "kN", 95.0, false), "95 kN");
        assert_eq!(plain_text(Si, "kN", 266.89329691563, false), "266.89 kN");
        assert_eq!(plain_text(Si, "mm", 4114.8, true), "4114.8 mm");
        assert_eq!(plain_text(Si, "mm", 12345.6, true), "12346 mm");
        assert_eq!(plain_text(Us, "kN", 266.89329691563, false), "60 kip");
    }

    #[test]
    fn us_fields_show_a_figure_to_the_trades_resolution() {
        // A 32 mm plate is 1.259842... in (1 in = 25.4 mm exactly, NIST SP
        // 811, 2008, App. B): shown to the thousandth, 1.26 (not 1.25984).
        assert_eq!(to_field(Us, "flange_mm", "32"), "1.26");
        // 9 mm = 0.35433 in: 0.354, as a steel table gives a web.
        assert_eq!(to_field(Us, "web_mm", "9"), "0.354");
        // 4200 mm = 13.779528 ft: to the thousandth of a foot.
        assert_eq!(to_field(Us, "length_mm", "4200"), "13.78");
        assert_eq!(to_field(Us, "length_mm", "4210"), "13.812");
        // 150 kN = 33.7213 kip (1 kip = 4.4482216152605 kN, same source):
        // to 0.1 kip; 2 kN = 0.4496 kip keeps three significant figures.
        assert_eq!(to_field(Us, "axial_kn", "150"), "33.7");
        assert_eq!(to_field(Us, "axial_kn", "2"), "0.45");
        // 355 MPa = 51.4884 ksi (1 ksi = 6.894757293168 MPa): 51.5.
        assert_eq!(to_field(Us, "fy_mpa", "355"), "51.5");
        // 1.5 kN/m = 0.102782 kip/ft (14.593903 kN/m a kip/ft): 0.103.
        assert_eq!(to_field(Us, "distributed_kn_per_m", "1.5"), "0.103");
        assert_eq!(to_field(Us, "axial_kn", "0"), "0");
        // Exact values stay exact: 10 ft, 1/4 in.
        assert_eq!(to_field(Us, "length_mm", "3048"), "10");
        assert_eq!(to_field(Us, "wall_mm", "6.35"), "0.25");
        // The figure shown is rounded, so it does not read back to the
        // stored value: 1.26 in is 32.004 mm. The field writes only what
        // is typed (NumField and ModelNum on input), never what it shows;
        // the browser test units-switch-converts-both-ways holds that the
        // stored member stays as it was when US fields are shown and
        // entered without typing.
        let back: f64 = from_field(Us, "flange_mm", "1.26").parse().unwrap();
        assert!((back - 32.004).abs() < 1e-9, "{back}");
    }

    #[test]
    fn fields_convert_both_ways() {
        assert_eq!(field_unit(Us, "length_mm", "mm"), "ft");
        assert_eq!(field_unit(Us, "depth_mm", "mm"), "in");
        assert_eq!(field_unit(Us, "k_minor", ""), "");
        assert_eq!(to_field(Us, "length_mm", "3048"), "10");
        assert_eq!(to_field(Us, "axial_kn", ""), "");
        assert_eq!(to_field(Us, "k_minor", "0.7"), "0.7");
        let back: f64 = from_field(Us, "length_mm", "10").parse().unwrap();
        assert!((back - 3048.0).abs() < 1e-9);
        let back: f64 = from_field(Us, "fy_mpa", "50").parse().unwrap();
        assert!((back - 344.737_864_658_4).abs() < 1e-6, "{back}");
        assert_eq!(from_field(Us, "axial_kn", "lots"), "lots");
        assert_eq!(from_field(Us, "id", "C1"), "C1");
        // Feet and inches, as the CSV reader takes them: 13 ft 6 in =
        // 162 in = 4114.8 mm (1 in = 25.4 mm exactly, NIST SP 811 App. B);
        // a section's 6 1/2 in depth = 165.1 mm.
        let back: f64 = from_field(Us, "length_mm", "13'-6\"").parse().unwrap();
        assert!((back - 4114.8).abs() < 1e-9, "{back}");
        let back: f64 = from_field(Us, "depth_mm", "6 1/2\"").parse().unwrap();
        assert!((back - 165.1).abs() < 1e-9, "{back}");
        // Not in SI: there the text goes to the field's own reader as typed.
        assert_eq!(from_field(Si, "length_mm", "13'-6\""), "13'-6\"");
    }
}
