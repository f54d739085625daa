//! Warnings on inputs the check takes as given but which are likely not
//! what the engineer meant: an effective-length factor that is the
//! theoretical value of an ideal end condition ([`warn_theoretical_k`]), a
//! member shorter than its section is deep ([`warn_short_length`]).
//! Each is a warning, never a refusal: the value may be justified.

use crate::buckling::ends;
use crate::member::Member;
use crate::outcome::{Arg, Warning};
use crate::section::Section;
use crate::units::Quantity;

/// The warning's text with its numbers: `{}` the key, the factor, the end
/// condition in words and the design factor ([`fixed_text`] is it written
/// out for each case the check meets, which costs nothing while checking).
const TEMPLATE: &str = "{} = {} is the theoretical factor of a column {}; ideal end fixity is \
                        not reached in practice, and the recommended design value is K = {} \
                        (AISC 360-16 Commentary Table C-A-7.1): use it unless an analysis of \
                        the real ends justifies the smaller factor";

/// [`TEMPLATE`] written out, for the key (`k_major`, `k_minor`) and the
/// end condition's key ("ff", "fp": the cases
/// [`ends::theoretical_below_design`] can name); held equal to the template
/// rendered with [`ends::END_CONDITIONS`]'s values by a unit test.
fn fixed_text(key: &str, case: &str) -> Option<&'static str> {
    macro_rules! text {
        ($key:literal, $k:literal, $words:literal, $design:literal) => {
            concat!(
                $key,
                " = ",
                $k,
                " is the theoretical factor of a column ",
                $words,
                "; ideal end fixity is not reached in practice, and the recommended design \
                 value is K = ",
                $design,
                " (AISC 360-16 Commentary Table C-A-7.1): use it unless an analysis of the \
                 real ends justifies the smaller factor"
            )
        };
    }
    Some(match (key, case) {
        ("k_major", "ff") => text!("k_major", "0.5", "fixed at both ends", "0.65"),
        ("k_minor", "ff") => text!("k_minor", "0.5", "fixed at both ends", "0.65"),
        ("k_major", "fp") => text!(
            "k_major",
            "0.7",
            "fixed at one end and pinned at the other",
            "0.8"
        ),
        ("k_minor", "fp") => text!(
            "k_minor",
            "0.7",
            "fixed at one end and pinned at the other",
            "0.8"
        ),
        _ => return None,
    })
}

/// Warns, per axis, where the buckling length comes from `k_major` /
/// `k_minor` (no typed length, no frame) and the factor is the theoretical
/// value of a classic end condition below its recommended design value
/// ([`ends::theoretical_below_design`]): fixed at both ends 0.5 (design
/// 0.65), fixed and pinned 0.7 (design 0.8). A fixed text: nothing is
/// formatted or allocated while checking.
#[inline]
pub fn warn_theoretical_k(m: &Member, warnings: &mut Vec<Warning>) {
    for (k, used, key, code) in [
        (
            m.k_major,
            m.lcr_major_mm.is_none() && m.frame_major.is_none(),
            "k_major",
            "k-theoretical-major",
        ),
        (
            m.k_minor,
            m.lcr_minor_mm.is_none() && m.frame_minor.is_none(),
            "k_minor",
            "k-theoretical-minor",
        ),
    ] {
        // Most factors are 1: one comparison and on.
        if k == 1.0 || !used {
            continue;
        }
        if let Some(c) = ends::theoretical_below_design(k) {
            warnings.push(match fixed_text(key, c.key) {
                Some(text) => Warning::new(code, text),
                None => Warning::with_args(
                    code,
                    TEMPLATE,
                    &[
                        Arg::Word(key),
                        Arg::figure(k, Quantity::Dimensionless, Warning::AS_GIVEN),
                        Arg::Word(c.words),
                        Arg::figure(c.design, Quantity::Dimensionless, Warning::AS_GIVEN),
                    ],
                ),
            });
        }
    }
}

/// Warns where the member's length is below the section's largest overall
/// dimension (depth, width or diameter; for typed properties 2 i_major,
/// the depth no section with that radius of gyration can be shallower
/// than, as i <= h/2 with all the area at the extreme fibres). Such a
/// "column" is a squat block, not a strut: most often a length typed in
/// metres or with a thousands mark read as a decimal ("4.000" as 4 mm).
/// Stocky pieces (a bearing block, a short stub) are legitimate, so the
/// check goes on; the rule is the section's own size because a real
/// column is many times longer than deep, and L below the depth is below
/// anything the buckling codes were written for (L/i below 2 to 3.5).
#[inline]
pub fn warn_short_length(m: &Member, section: &Section, warnings: &mut Vec<Warning>) {
    let (size, what) = match section.spec.largest_dimension_mm() {
        Some(d) => (d, "the section's largest dimension"),
        None => (
            2.0 * section.props.r_major_mm,
            "twice the section's major radius of gyration, which no section's depth is below",
        ),
    };
    if m.length_mm < size {
        warnings.push(Warning::with_args(
            "length-below-section",
            "length_mm = {} is shorter than the section is deep ({}: {}): check the units \
             (a length in metres, or a thousands mark read as a decimal point?)",
            &[
                Arg::figure(m.length_mm, Quantity::Span, Warning::AS_GIVEN),
                Arg::figure(size, Quantity::Length, Warning::AS_GIVEN),
                Arg::Word(what),
            ],
        ));
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::check::check_member;
    use crate::material::MaterialSpec;
    use crate::method::Method;
    use crate::section::{CatalogueRef, SectionSpec};

    /// Each written-out text is the template rendered with the table's
    /// values, and every case the check can name has one.
    #[test]
    fn fixed_texts_are_the_rendered_template() {
        for c in &ends::END_CONDITIONS {
            if ends::theoretical_below_design(c.theoretical) != Some(c) {
                continue;
            }
            for key in ["k_major", "k_minor"] {
                let rendered = Warning::with_args(
                    "x",
                    TEMPLATE,
                    &[
                        Arg::Word(key),
                        Arg::figure(c.theoretical, Quantity::Dimensionless, Warning::AS_GIVEN),
                        Arg::Word(c.words),
                        Arg::figure(c.design, Quantity::Dimensionless, Warning::AS_GIVEN),
                    ],
                );
                assert_eq!(
                    fixed_text(key, c.key),
                    Some(&*rendered.message()),
                    "{key} {}",
                    c.key
                );
            }
        }
    }

    fn column(method: Method) -> Member {
        Member::new(
            "C3",
            SectionSpec::Catalogue(CatalogueRef {
                designation: "HE 200 B".into(),
            }),
            MaterialSpec::Grade {
                grade: "S355".into(),
            },
            5000.0,
            500.0,
            method,
        )
    }

    fn codes(m: &Member) -> Vec<&'static str> {
        check_member(m)
            .unwrap()
            .warnings
            .iter()
            .map(|w| w.code)
            .filter(|c| c.starts_with("k-theoretical"))
            .collect()
    }

    /// K = 0.5 (both ends fixed, ideal) raises the resistance above the
    /// design value's, K = 0.65 (AISC 360-16 Commentary Table C-A-7.1,
    /// recalled): the result says so, naming the key and the design value.
    #[test]
    fn a_theoretical_factor_warns_with_the_design_value() {
        for method in [Method::CsaS16, Method::En1993, Method::Euler] {
            let mut m = column(method);
            m.k_minor = 0.5;
            m.k_major = 0.7;
            assert_eq!(
                codes(&m),
                ["k-theoretical-major", "k-theoretical-minor"],
                "{method:?}"
            );
            let r = check_member(&m).unwrap();
            let minor = r
                .warnings
                .iter()
                .find(|w| w.code == "k-theoretical-minor")
                .unwrap()
                .message();
            assert!(
                minor.starts_with(
                    "k_minor = 0.5 is the theoretical factor of a column fixed at both ends"
                ) && minor.contains("K = 0.65"),
                "{minor}"
            );
        }
        // Design values, 1 and a typed length or frame: no warning.
        let mut m = column(Method::CsaS16);
        m.k_minor = 0.65;
        m.k_major = 0.8;
        assert!(codes(&m).is_empty());
        m.k_minor = 0.5;
        m.lcr_minor_mm = Some(2500.0);
        assert!(codes(&m).is_empty());
    }

    /// "4.000" read as 4 mm on an HE 200 B (200 x 200): the result says
    /// the length is below the section's depth (review N1, N16); 200 mm
    /// and longer say nothing. Typed properties: below 2 i_major.
    #[test]
    fn a_length_below_the_section_warns() {
        let short = |m: &Member| {
            check_member(m)
                .unwrap()
                .warnings
                .iter()
                .find(|w| w.code == "length-below-section")
                .map(|w| w.message().into_owned())
        };
        let mut m = column(Method::En1993);
        for l in [1.0, 4.0, 199.0] {
            m.length_mm = l;
            let text = short(&m).unwrap();
            assert!(
                text.starts_with(&format!(
                    "length_mm = {l} mm is shorter than the section is deep (200 mm"
                )),
                "{text}"
            );
        }
        for l in [200.0, 3500.0] {
            m.length_mm = l;
            assert_eq!(short(&m), None, "{l}");
        }
        // Typed properties: A = 1e4 mm2, I_major = 1e8 mm4, i = 100 mm.
        m.section = serde_json::from_value(serde_json::json!({"kind": "given",
            "area_mm2": 1e4, "i_major_mm4": 1e8, "i_minor_mm4": 5e7}))
        .unwrap();
        m.length_mm = 150.0;
        assert!(short(&m).unwrap().contains("(200 mm: twice"));
        m.length_mm = 250.0;
        assert_eq!(short(&m), None);
    }
}
