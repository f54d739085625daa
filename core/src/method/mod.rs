//! Compression design methods, one module each.
//!
//! Every method works one flexural-buckling axis at a time through
//! [`axis`]: given the member, a buckling length and the axis, it returns
//! the mode's critical load, slenderness, reduction and design resistance,
//! and appends its working to the trace. The check ([`crate::check`]), the
//! envelope ([`crate::envelope`]) and the reverse solves all call it, so the
//! chart and the number can never disagree.

use crate::error::Result;
use crate::material::Material;
use crate::member::Member;
pub use crate::member::Method;
use crate::outcome::{Mode, ModeResult, Warning};
use crate::section::Section;
use crate::trace::Trace;

pub mod aisc360;
pub mod common;
pub mod csa_s16;
pub mod en1993;
pub mod en1995;
pub mod euler;
pub mod perry;
pub mod secant;

/// Everything a method needs for one member, resolved once.
#[derive(Debug, Clone, Copy)]
pub struct Input<'a> {
    /// The member as written (options such as `gamma_m1`, `bow_mm`, curves).
    pub member: &'a Member,
    /// Its section with properties.
    pub section: &'a Section,
    /// Its material, with the yield strength for the section's thickness.
    pub material: &'a Material,
}

/// The material as `method` reads it. A code states the moduli of
/// structural steel it designs with, whatever standard the grade comes
/// from: CSA S16-19 E = 200 000 MPa and G = 77 000 MPa (clause 2, its
/// symbols; recalled from memory, and common practice in Canada), AISC
/// 360-16 E = 29 000 ksi and G = 11 200 ksi (its Symbols, used in E3 and
/// E4). So a grade given by name is read with the code's moduli (an EN
/// grade's 210 000 / 81 000 MPa under AISC or CSA would overstate the
/// elastic buckling loads by some 5 %); a custom material keeps the E and
/// G it gives. EN 1993-1-1 and the other methods read the grade's own.
pub fn material_for(method: Method, material: &Material) -> std::borrow::Cow<'_, Material> {
    use crate::material::{Steel, E_ASTM, E_CSA, G_ASTM, G_CSA};
    let (e_mpa, g_mpa) = match method {
        Method::CsaS16 => (E_CSA, G_CSA),
        Method::AiscLrfd | Method::AiscAsd => (E_ASTM, G_ASTM),
        _ => return std::borrow::Cow::Borrowed(material),
    };
    match material {
        Material::Steel(s) if s.name != "custom" && (s.e_mpa != e_mpa || s.g_mpa != g_mpa) => {
            std::borrow::Cow::Owned(Material::Steel(Steel { e_mpa, g_mpa, ..*s }))
        }
        _ => std::borrow::Cow::Borrowed(material),
    }
}

/// Works one flexural-buckling axis (`Mode::Major` or `Mode::Minor`) at
/// buckling length `lcr_mm`, appending the working to `trace`.
pub fn axis(
    method: Method,
    input: &Input<'_>,
    mode: Mode,
    lcr_mm: f64,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<ModeResult> {
    match method {
        Method::En1993 => en1993::axis(input, mode, lcr_mm, trace, warnings),
        Method::AiscLrfd => {
            aisc360::axis(input, mode, lcr_mm, aisc360::Basis::Lrfd, trace, warnings)
        }
        Method::AiscAsd => aisc360::axis(input, mode, lcr_mm, aisc360::Basis::Asd, trace, warnings),
        Method::CsaS16 => csa_s16::axis(input, mode, lcr_mm, trace, warnings),
        Method::En1995 => en1995::axis(input, mode, lcr_mm, trace, warnings),
        Method::PerryRobertson => perry::axis(input, mode, lcr_mm, trace, warnings),
        Method::Secant => secant::axis(input, mode, lcr_mm, trace, warnings),
        Method::Euler => euler::axis(input, mode, lcr_mm, trace, warnings),
    }
}

/// Member-level working that precedes the axes (squash load, partial
/// factors, material values) and the method's applicability: refuses a
/// timber method on steel and the reverse.
pub fn prelude(
    method: Method,
    input: &Input<'_>,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<()> {
    match method {
        Method::En1993 => en1993::prelude(input, trace, warnings),
        Method::AiscLrfd => aisc360::prelude(input, aisc360::Basis::Lrfd, trace, warnings),
        Method::AiscAsd => aisc360::prelude(input, aisc360::Basis::Asd, trace, warnings),
        Method::CsaS16 => csa_s16::prelude(input, trace, warnings),
        Method::En1995 => en1995::prelude(input, trace, warnings),
        Method::PerryRobertson => perry::prelude(input, trace, warnings),
        Method::Secant => secant::prelude(input, trace, warnings),
        Method::Euler => euler::prelude(input, trace, warnings),
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::material::{self, MaterialSpec, Product, Stock, E_ASTM, E_CSA, G_ASTM, G_CSA};

    fn grade(name: &str) -> Material {
        let spec = MaterialSpec::Grade {
            grade: name.to_string(),
        };
        let stock = Stock {
            thickness_mm: 10.0,
            product: Product::Other,
        };
        material::resolve(&spec, stock).unwrap()
    }

    fn moduli(m: &Material) -> (f64, f64) {
        match m {
            Material::Steel(s) => (s.e_mpa, s.g_mpa),
            Material::Timber(_) => (f64::NAN, f64::NAN),
        }
    }

    /// Each code's own moduli for a named grade (CSA S16-19 clause 2;
    /// AISC 360-16 Symbols), the grade's own under EN 1993-1-1.
    #[test]
    fn a_code_reads_a_named_grade_with_its_own_moduli() {
        for name in ["S355", "A992", "350W"] {
            let m = grade(name);
            assert_eq!(
                moduli(&material_for(Method::CsaS16, &m)),
                (E_CSA, G_CSA),
                "{name}"
            );
            for aisc in [Method::AiscLrfd, Method::AiscAsd] {
                assert_eq!(moduli(&material_for(aisc, &m)), (E_ASTM, G_ASTM), "{name}");
            }
            assert_eq!(
                moduli(&material_for(Method::En1993, &m)),
                moduli(&m),
                "{name}"
            );
        }
        let custom = material::resolve(
            &MaterialSpec::Custom {
                fy_mpa: 300.0,
                e_mpa: 205_000.0,
                g_mpa: Some(79_000.0),
            },
            Stock {
                thickness_mm: 10.0,
                product: Product::Other,
            },
        )
        .unwrap();
        assert_eq!(
            moduli(&material_for(Method::AiscLrfd, &custom)),
            (205_000.0, 79_000.0)
        );
    }
}
