//! Materials: steel grades by their product standards (yield strength by
//! thickness), timber strength classes, and custom materials.
//!
//! A named grade is looked up forgivingly: case, spaces, dots and hyphens
//! are ignored, so "s355 j2", "S355J2" and "S355" all resolve to S355 of
//! EN 10025-2, and "G40.21-350W" to CSA G40.21 350W. The quality suffix
//! (JR, J0, J2, K2, N, NL, M, ML) does not change the yield strength and
//! is accepted and dropped; a trailing "H" selects the hollow-section
//! standards (EN 10210-1 for hot-finished, EN 10219-1 for cold-formed
//! sections, chosen by the section's make).
//!
//! Every tabulated value below carries its source. Values marked
//! "recalled from memory" were written from the engineer's knowledge of
//! the standard, not copied from a copy of it at hand; check them against
//! the standard before relying on them.

use serde::{Deserialize, Serialize};

use crate::error::{positive, Error, Result};
use crate::names;
use crate::section::HollowMake;
use crate::trace::Sym;

/// Solid (sawn) timber or glued laminated timber: sets beta_c and gamma_M.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "lowercase")]
pub enum TimberKind {
    /// Solid timber (EN 338).
    Solid,
    /// Glued laminated timber (EN 14080).
    Glulam,
}

/// A material as written in the member file.
///
/// Read as serde's `untagged, deny_unknown_fields` derive reads it (the
/// first form whose keys and values all fit, in the order below; else
/// serde's untagged message, which `read` turns into the refusal naming the
/// forms), by [`untagged`] without buffering the value as serde `Content`
/// first (some 3,800 instructions a member on the command line's reading
/// thread); a unit test holds the two readers to the same answer.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(untagged)]
pub enum MaterialSpec {
    /// A named grade or strength class ("S355", "A992", "C24", "GL28h").
    Grade {
        /// The grade's name.
        grade: String,
    },
    /// A custom timber.
    Timber {
        /// Characteristic compressive strength parallel to grain f_c,0,k, MPa.
        fc0k_mpa: f64,
        /// Fifth-percentile modulus E_0,05, MPa.
        e005_mpa: f64,
        /// Mean modulus E_0,mean, MPa.
        e0mean_mpa: f64,
        /// Solid or glued laminated.
        timber: TimberKind,
    },
    /// A custom steel or other elastic-plastic material.
    Custom {
        /// Yield strength f_y, MPa.
        fy_mpa: f64,
        /// Young's modulus E, MPa.
        e_mpa: f64,
        /// Shear modulus G, MPa (default E / 2.6).
        #[serde(default, skip_serializing_if = "Option::is_none")]
        g_mpa: Option<f64>,
    },
}

impl<'de> Deserialize<'de> for MaterialSpec {
    fn deserialize<D: serde::Deserializer<'de>>(d: D) -> std::result::Result<Self, D::Error> {
        d.deserialize_any(untagged::Reader)
    }
}

/// [`MaterialSpec`]'s reader: each value read as a [`untagged::Given`]
/// (a number, a text, null or anything else, which no form takes), then the
/// forms tried in their order as the derive tries them, on a map (each
/// key once, no other key); a list or a plain value fits no form.
mod untagged {
    use std::fmt;

    use serde::de::{self, IgnoredAny, MapAccess, SeqAccess, Visitor};
    use serde::Deserialize;

    use super::{MaterialSpec, TimberKind};

    /// serde's message when no form of an untagged enum fits.
    const NONE_FITS: &str = "data did not match any variant of untagged enum MaterialSpec";

    /// A value as a form's field can take it.
    #[derive(Debug, Clone, PartialEq)]
    pub enum Given {
        Number(f64),
        Text(String),
        Null,
        Other,
    }

    impl<'de> Deserialize<'de> for Given {
        fn deserialize<D: serde::Deserializer<'de>>(d: D) -> Result<Given, D::Error> {
            d.deserialize_any(GivenReader)
        }
    }

    struct GivenReader;

    impl<'de> Visitor<'de> for GivenReader {
        type Value = Given;
        fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
            f.write_str("any value")
        }
        fn visit_bool<E>(self, _: bool) -> Result<Given, E> {
            Ok(Given::Other)
        }
        fn visit_i64<E>(self, v: i64) -> Result<Given, E> {
            Ok(Given::Number(v as f64))
        }
        fn visit_u64<E>(self, v: u64) -> Result<Given, E> {
            Ok(Given::Number(v as f64))
        }
        fn visit_f64<E>(self, v: f64) -> Result<Given, E> {
            Ok(Given::Number(v))
        }
        fn visit_str<E>(self, v: &str) -> Result<Given, E> {
            Ok(Given::Text(v.to_string()))
        }
        fn visit_string<E>(self, v: String) -> Result<Given, E> {
            Ok(Given::Text(v))
        }
        fn visit_unit<E>(self) -> Result<Given, E> {
            Ok(Given::Null)
        }
        fn visit_none<E>(self) -> Result<Given, E> {
            Ok(Given::Null)
        }
        fn visit_some<D: serde::Deserializer<'de>>(self, d: D) -> Result<Given, D::Error> {
            Given::deserialize(d)
        }
        fn visit_seq<A: SeqAccess<'de>>(self, mut seq: A) -> Result<Given, A::Error> {
            while seq.next_element::<IgnoredAny>()?.is_some() {}
            Ok(Given::Other)
        }
        fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<Given, A::Error> {
            while map.next_entry::<IgnoredAny, IgnoredAny>()?.is_some() {}
            Ok(Given::Other)
        }
    }

    /// The keys of the three forms.
    const GRADE: [&str; 1] = ["grade"];
    const TIMBER: [&str; 4] = ["fc0k_mpa", "e005_mpa", "e0mean_mpa", "timber"];
    const CUSTOM: [&str; 3] = ["fy_mpa", "e_mpa", "g_mpa"];

    fn number(v: Option<&Given>) -> Option<f64> {
        match v? {
            Given::Number(x) => Some(*x),
            _ => None,
        }
    }

    fn timber(v: Option<&Given>) -> Option<TimberKind> {
        match v? {
            Given::Text(t) if t == "solid" => Some(TimberKind::Solid),
            Given::Text(t) if t == "glulam" => Some(TimberKind::Glulam),
            _ => None,
        }
    }

    /// The first form that takes the `given` keys (each once) and values;
    /// `None` when none does.
    fn fit(given: &[(&str, Given)]) -> Option<MaterialSpec> {
        let only = |keys: &[&str]| given.iter().all(|(k, _)| keys.contains(k));
        let get = |key: &str| given.iter().find(|(k, _)| *k == key).map(|(_, v)| v);
        if only(&GRADE) {
            if let Some(Given::Text(grade)) = get("grade") {
                return Some(MaterialSpec::Grade {
                    grade: grade.clone(),
                });
            }
        }
        if only(&TIMBER) {
            if let (Some(fc0k_mpa), Some(e005_mpa), Some(e0mean_mpa), Some(timber)) = (
                number(get("fc0k_mpa")),
                number(get("e005_mpa")),
                number(get("e0mean_mpa")),
                timber(get("timber")),
            ) {
                return Some(MaterialSpec::Timber {
                    fc0k_mpa,
                    e005_mpa,
                    e0mean_mpa,
                    timber,
                });
            }
        }
        if only(&CUSTOM) {
            let g_mpa = match get("g_mpa") {
                None | Some(Given::Null) => Some(None),
                Some(Given::Number(g)) => Some(Some(*g)),
                Some(_) => None,
            };
            if let (Some(fy_mpa), Some(e_mpa), Some(g_mpa)) =
                (number(get("fy_mpa")), number(get("e_mpa")), g_mpa)
            {
                return Some(MaterialSpec::Custom {
                    fy_mpa,
                    e_mpa,
                    g_mpa,
                });
            }
        }
        None
    }

    pub struct Reader;

    impl<'de> Visitor<'de> for Reader {
        type Value = MaterialSpec;

        fn expecting(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
            f.write_str("a material")
        }

        fn visit_map<A: MapAccess<'de>>(self, mut map: A) -> Result<MaterialSpec, A::Error> {
            // A key given twice or a key of no form fits no form (the
            // rest of the map is still read, as the derive reads it whole
            // before trying a form).
            let mut given: Vec<(&str, Given)> = Vec::with_capacity(4);
            let mut fits = true;
            while let Some(key) = map.next_key::<std::borrow::Cow<'_, str>>()? {
                let value = map.next_value::<Given>()?;
                let known = GRADE
                    .iter()
                    .chain(&TIMBER)
                    .chain(&CUSTOM)
                    .find(|k| **k == key.as_ref());
                match known {
                    Some(k) if !given.iter().any(|(g, _)| g == k) => given.push((k, value)),
                    _ => fits = false,
                }
            }
            match fit(&given).filter(|_| fits) {
                Some(m) => Ok(m),
                None => Err(de::Error::custom(NONE_FITS)),
            }
        }

        fn visit_seq<A: SeqAccess<'de>>(self, mut seq: A) -> Result<MaterialSpec, A::Error> {
            // The derive takes no form from a list (its items are read, as
            // it reads them before trying the forms).
            while seq.next_element::<Given>()?.is_some() {}
            Err(de::Error::custom(NONE_FITS))
        }

        fn visit_bool<E: de::Error>(self, _: bool) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_i64<E: de::Error>(self, _: i64) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_u64<E: de::Error>(self, _: u64) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_f64<E: de::Error>(self, _: f64) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_str<E: de::Error>(self, _: &str) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_unit<E: de::Error>(self) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
        fn visit_none<E: de::Error>(self) -> Result<MaterialSpec, E> {
            Err(E::custom(NONE_FITS))
        }
    }
}

/// A resolved steel (or custom elastic-plastic) material.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Steel {
    /// Grade name ("S355", "S355H", "A992", "custom").
    pub name: &'static str,
    /// Standard the values come from (a [`Sym`]: it is also the clause of
    /// the working's material lines).
    pub standard: Sym,
    /// Yield strength for the section's governing thickness, MPa.
    pub fy_mpa: f64,
    /// Young's modulus, MPa.
    pub e_mpa: f64,
    /// Shear modulus, MPa.
    pub g_mpa: f64,
    /// The governing thickness the yield strength was read at, mm (0 when
    /// the section does not tell it, e.g. given properties: the thinnest
    /// band was used).
    pub thickness_mm: f64,
    /// Upper limit of the thickness band used, mm (infinite when the grade
    /// does not vary with thickness).
    pub band_up_to_mm: f64,
}

/// A resolved timber.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Timber {
    /// Class name ("C24", "custom").
    pub name: &'static str,
    /// Standard the values come from (a [`Sym`]: it is also the clause of
    /// the working's material lines).
    pub standard: Sym,
    /// Solid or glulam.
    pub kind: TimberKind,
    /// f_c,0,k, MPa.
    pub fc0k_mpa: f64,
    /// E_0,05, MPa.
    pub e005_mpa: f64,
    /// E_0,mean, MPa.
    pub e0mean_mpa: f64,
    /// G_mean, MPa (custom timber: E_0,mean / 16, the ratio of the EN 338
    /// softwood classes, common practice).
    pub g_mean_mpa: f64,
}

/// A material ready for a method.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub enum Material {
    /// Steel or a custom elastic-plastic material.
    Steel(Steel),
    /// Timber.
    Timber(Timber),
}

impl Material {
    /// The strength that caps a stocky member (f_y or f_c,0,k) and the
    /// modulus for buckling (E or E_0,05), MPa.
    pub fn strength_and_modulus(&self) -> (f64, f64) {
        match self {
            Material::Steel(s) => (s.fy_mpa, s.e_mpa),
            Material::Timber(t) => (t.fc0k_mpa, t.e005_mpa),
        }
    }
}

/// 1 ksi in MPa: [`crate::units::MPA_PER_KSI`], worked from the exact
/// definitions of the inch and the pound-force (NIST SP 811 Appendix B
/// gives 6.894757 MPa to seven digits).
pub const KSI: f64 = crate::units::MPA_PER_KSI;

/// E for EN grades, MPa (EN 1993-1-1:2005 3.2.6(1)).
pub const E_EN: f64 = 210_000.0;
/// G for EN grades, MPa (EN 1993-1-1:2005 3.2.6(1), G ~ 81 000 MPa).
pub const G_EN: f64 = 81_000.0;
/// E for ASTM grades, MPa: 29 000 ksi (AISC 360-16 Symbols and E3).
pub const E_ASTM: f64 = 29_000.0 * KSI;
/// G for ASTM grades, MPa: 11 200 ksi (AISC 360-16 Symbols; 77 200 MPa).
pub const G_ASTM: f64 = 11_200.0 * KSI;
/// E for CSA grades, MPa (CSA S16-19 clause 2, E = 200 000 MPa).
pub const E_CSA: f64 = 200_000.0;
/// G for CSA grades, MPa (CSA S16-19 clause 2, G = 77 000 MPa).
pub const G_CSA: f64 = 77_000.0;

/// A steel grade: yield strength by governing thickness.
struct SteelGrade {
    name: &'static str,
    standard: Sym,
    /// (thickness up to and including, mm; f_y, MPa), thinnest first.
    bands: &'static [(f64, f64)],
    e: f64,
    g: f64,
    /// The thickness range covered, for the error message.
    covers: &'static str,
}

/// A timber class.
struct TimberClass {
    name: &'static str,
    standard: Sym,
    kind: TimberKind,
    fc0k: f64,
    e0mean: f64,
    e005: f64,
    gmean: f64,
}

// The grade and class tables: `data/materials/steel.csv` and `timber.csv`
// (each value with its source there), turned into constants by build.rs.
include!(concat!(env!("OUT_DIR"), "/materials.rs"));

/// The grade names this build knows, as offered in suggestions and lists.
pub const KNOWN_GRADES: [&str; 27] = [
    "S235",
    "S275",
    "S355",
    "S420",
    "S460",
    "S420M",
    "S460M",
    "S235H",
    "S275H",
    "S355H",
    "S420H",
    "S460H",
    "A992",
    "A36",
    "A500 Grade B",
    "A500 Grade C",
    "350W",
    "300W",
    "C16",
    "C24",
    "C30",
    "GL24h",
    "GL28h",
    "GL32h",
    "GL24c",
    "GL28c",
    "GL32c",
];

/// What a grade name resolves to before the section is known.
enum Found {
    Steel(&'static SteelGrade),
    /// EN hollow grade: hot-finished and cold-formed tables.
    Hollow(&'static SteelGrade, &'static SteelGrade),
    /// ASTM A500: round, shaped and unknown-shape tables.
    A500(
        &'static SteelGrade,
        &'static SteelGrade,
        &'static SteelGrade,
    ),
    Timber(&'static TimberClass),
}

/// A grade name normalised on the stack (upper case, letters and digits
/// only), so the lookup in the check's hot path allocates nothing; read as
/// bytes (the name's letters and digits are ASCII, so no UTF-8 check).
struct Key {
    buf: [u8; 24],
    len: usize,
}

impl Key {
    /// `None` when the name has more than 24 letters and digits (no grade has).
    fn new(name: &str) -> Option<Key> {
        // The count kept in a local, not the field: stored once at the end
        // instead of at every letter.
        let (mut buf, mut len) = ([0; 24], 0);
        for b in name.bytes().filter(u8::is_ascii_alphanumeric) {
            *buf.get_mut(len)? = b.to_ascii_uppercase();
            len += 1;
        }
        Some(Key { buf, len })
    }

    fn as_bytes(&self) -> &[u8] {
        self.buf.get(..self.len).unwrap_or(&[])
    }
}

/// Whether a table's `name` normalises to `key`: the tables' names are
/// letters and digits only (a unit test holds them so), so that is the
/// name equal to the key but for case (its length compared first).
fn same_name(name: &str, key: &[u8]) -> bool {
    name.as_bytes().eq_ignore_ascii_case(key)
}

fn find(name: &str) -> Option<Found> {
    let key = Key::new(name)?;
    let n = key.as_bytes();
    // Timber classes (EN 338 "C..", EN 14080 "GL..").
    if n.starts_with(b"C") || n.starts_with(b"G") {
        if let Some(t) = TIMBER.iter().find(|t| same_name(t.name, n)) {
            return Some(Found::Timber(t));
        }
    }
    // ASTM.
    let astm = n.strip_prefix(b"ASTM").unwrap_or(n);
    match astm {
        b"A992" | b"A992M" => return Some(Found::Steel(&A992)),
        b"A36" | b"A36M" => return Some(Found::Steel(&A36)),
        b"A500C" | b"A500GRC" | b"A500GRADEC" => {
            return Some(Found::A500(&A500C_ROUND, &A500C_SHAPED, &A500C_UNKNOWN))
        }
        b"A500B" | b"A500GRB" | b"A500GRADEB" => {
            return Some(Found::A500(&A500B_ROUND, &A500B_SHAPED, &A500B_UNKNOWN))
        }
        _ => {}
    }
    // CSA G40.21 (the W grades; "350WT" toughness variants as well).
    let csa = n.strip_prefix(b"CSA").unwrap_or(n);
    let csa = csa.strip_prefix(b"G4021").unwrap_or(csa);
    match csa {
        b"350W" | b"350WT" => return Some(Found::Steel(&G40_350W)),
        b"300W" | b"300WT" => return Some(Found::Steel(&G40_300W)),
        _ => {}
    }
    // EN: S + strength + optional quality + optional H.
    let rest = n.strip_prefix(b"S")?;
    let strength = rest.get(..3)?;
    let suffix = rest.get(3..)?;
    let (quality, hollow) = match suffix.strip_suffix(b"H") {
        Some(q) => (q, true),
        None => (suffix, false),
    };
    let non_alloy: [&[u8]; 5] = [b"", b"JR", b"J0", b"J2", b"K2"];
    let fine: [&[u8]; 5] = [b"", b"N", b"NL", b"M", b"ML"];
    let fine_m = quality == b"M" || quality == b"ML";
    let found = match (strength, hollow) {
        (b"235", false) if non_alloy.contains(&quality) => Found::Steel(&S235),
        (b"275", false) if non_alloy.contains(&quality) => Found::Steel(&S275),
        (b"355", false) if non_alloy.contains(&quality) => Found::Steel(&S355),
        (b"420", false) if fine_m => Found::Steel(&S420M),
        (b"460", false) if fine_m => Found::Steel(&S460M),
        (b"420", false) if fine.contains(&quality) => Found::Steel(&S420N),
        (b"460", false) if fine.contains(&quality) => Found::Steel(&S460N),
        (b"235", true) if non_alloy.contains(&quality) => Found::Hollow(&S235H_HOT, &S235H_COLD),
        (b"275", true) if non_alloy.contains(&quality) => Found::Hollow(&S275H_HOT, &S275H_COLD),
        (b"355", true) if non_alloy.contains(&quality) => Found::Hollow(&S355H_HOT, &S355H_COLD),
        (b"420", true) if fine.contains(&quality) => Found::Hollow(&S420H_HOT, &S420H_COLD),
        (b"460", true) if fine.contains(&quality) => Found::Hollow(&S460H_HOT, &S460H_COLD),
        _ => return None,
    };
    Some(found)
}

/// Known grade names nearest to `grade`, nearest first (at most four).
pub fn suggestions(grade: &str) -> Vec<String> {
    let n = names::alnum_upper(grade);
    let mut scored: Vec<(usize, &str)> = KNOWN_GRADES
        .iter()
        .map(|k| {
            let kn = names::alnum_upper(k);
            let d = names::edit_distance(n.as_bytes(), kn.as_bytes());
            // A shared prefix of two or more characters counts as close.
            let prefix =
                !n.is_empty() && n.len() >= 2 && (kn.starts_with(&n) || n.starts_with(&kn));
            (if prefix { d.min(1) } else { d }, *k)
        })
        .filter(|(d, k)| *d <= 2.max(names::alnum_upper(k).len() / 2))
        .collect();
    scored.sort_by_key(|(d, _)| *d);
    scored
        .into_iter()
        .take(4)
        .map(|(_, k)| k.to_string())
        .collect()
}

fn steel_at(grade: &SteelGrade, thickness_mm: f64) -> Result<Steel> {
    // A section that does not tell its thickness (given properties) is read
    // in the thinnest band; the methods warn about it.
    let t = if crate::error::all_positive([thickness_mm]) {
        thickness_mm
    } else {
        0.0
    };
    // The error built only when there is no band (`ok_or` built and
    // dropped one for every lookup).
    let Some(band) = grade.bands.iter().find(|(up_to, _)| t <= *up_to) else {
        return Err(Error::OutOfRange {
            field: "material",
            value: t,
            expected: grade.covers,
        });
    };
    Ok(Steel {
        name: grade.name,
        standard: grade.standard,
        fy_mpa: band.1,
        e_mpa: grade.e,
        g_mpa: grade.g,
        thickness_mm: t,
        band_up_to_mm: band.0,
    })
}

/// What a material needs to know of its section: the governing thickness
/// (a grade's yield strength falls with it) and the product (the hollow
/// grades have a table per make, ASTM A500 one for round and one for
/// shaped sections). [`crate::member::stock`] reads it off a built section.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Stock {
    /// The governing thickness, mm; 0 where the section does not tell it
    /// (given properties: the thinnest band is used and the methods warn).
    pub thickness_mm: f64,
    /// What the section is.
    pub product: Product,
}

/// The kind of product a grade's tables tell apart.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Product {
    /// A circular hollow section, of its make.
    RoundHollow(HollowMake),
    /// A square or rectangular hollow section, of its make.
    ShapedHollow(HollowMake),
    /// Any other section.
    Other,
}

impl Product {
    fn hollow_make(self) -> Option<HollowMake> {
        match self {
            Product::RoundHollow(m) | Product::ShapedHollow(m) => Some(m),
            Product::Other => None,
        }
    }
}

/// Resolves a material for a section's stock (the yield strength falls
/// with the governing thickness where the standard says so).
pub fn resolve(spec: &MaterialSpec, stock: Stock) -> Result<Material> {
    match spec {
        MaterialSpec::Grade { grade } => {
            let t = stock.thickness_mm;
            match find(grade) {
                Some(Found::Steel(g)) => Ok(Material::Steel(steel_at(g, t)?)),
                Some(Found::Hollow(hot, cold)) => match stock.product.hollow_make() {
                    Some(HollowMake::ColdFormed) => Ok(Material::Steel(steel_at(cold, t)?)),
                    // Make not given: cold-formed (the lower resistance, see
                    // `section::HollowMake`), whose EN 10219-1 table stops at a
                    // 40 mm wall; a thicker wall can only be hot-finished.
                    Some(HollowMake::Unstated) => Ok(Material::Steel(
                        steel_at(cold, t).or_else(|_| steel_at(hot, t))?,
                    )),
                    _ => Ok(Material::Steel(steel_at(hot, t)?)),
                },
                Some(Found::A500(round, shaped, unknown)) => {
                    let g = match stock.product {
                        Product::RoundHollow(_) => round,
                        Product::ShapedHollow(_) => shaped,
                        Product::Other => unknown,
                    };
                    Ok(Material::Steel(steel_at(g, t)?))
                }
                Some(Found::Timber(c)) => Ok(Material::Timber(Timber {
                    name: c.name,
                    standard: c.standard,
                    kind: c.kind,
                    fc0k_mpa: c.fc0k,
                    e005_mpa: c.e005,
                    e0mean_mpa: c.e0mean,
                    g_mean_mpa: c.gmean,
                })),
                None => Err(Error::UnknownGrade {
                    grade: grade.clone(),
                    suggestions: suggestions(grade),
                }),
            }
        }
        MaterialSpec::Custom {
            fy_mpa,
            e_mpa,
            g_mpa,
        } => {
            let e = positive("e_mpa", *e_mpa)?;
            Ok(Material::Steel(Steel {
                name: "custom",
                standard: crate::trace::sym!("custom"),
                fy_mpa: positive("fy_mpa", *fy_mpa)?,
                e_mpa: e,
                g_mpa: match g_mpa {
                    Some(g) => positive("g_mpa", *g)?,
                    None => e / 2.6,
                },
                thickness_mm: stock.thickness_mm.max(0.0),
                band_up_to_mm: f64::INFINITY,
            }))
        }
        MaterialSpec::Timber {
            fc0k_mpa,
            e005_mpa,
            e0mean_mpa,
            timber,
        } => {
            let e0mean = positive("e0mean_mpa", *e0mean_mpa)?;
            let e005 = positive("e005_mpa", *e005_mpa)?;
            if e005 > e0mean {
                return Err(Error::Geometry {
                    field: "e005_mpa",
                    reason: format!(
                        "the fifth-percentile modulus ({e005} MPa) cannot exceed the mean modulus \
                         e0mean_mpa ({e0mean} MPa)"
                    ),
                });
            }
            Ok(Material::Timber(Timber {
                name: "custom",
                standard: crate::trace::sym!("custom"),
                kind: *timber,
                fc0k_mpa: positive("fc0k_mpa", *fc0k_mpa)?,
                e005_mpa: e005,
                e0mean_mpa: e0mean,
                g_mean_mpa: e0mean / 16.0,
            }))
        }
    }
}

#[cfg(test)]
mod tests {

    use super::*;

    /// The derive the hand-written reader replaces, as it was.
    #[derive(Debug, Deserialize)]
    #[serde(untagged, deny_unknown_fields)]
    enum Derived {
        Grade {
            grade: String,
        },
        Timber {
            fc0k_mpa: f64,
            e005_mpa: f64,
            e0mean_mpa: f64,
            timber: TimberKind,
        },
        Custom {
            fy_mpa: f64,
            e_mpa: f64,
            #[serde(default)]
            g_mpa: Option<f64>,
        },
    }

    impl From<Derived> for MaterialSpec {
        fn from(d: Derived) -> MaterialSpec {
            match d {
                Derived::Grade { grade } => MaterialSpec::Grade { grade },
                Derived::Timber {
                    fc0k_mpa,
                    e005_mpa,
                    e0mean_mpa,
                    timber,
                } => MaterialSpec::Timber {
                    fc0k_mpa,
                    e005_mpa,
                    e0mean_mpa,
                    timber,
                },
                Derived::Custom {
                    fy_mpa,
                    e_mpa,
                    g_mpa,
                } => MaterialSpec::Custom {
                    fy_mpa,
                    e_mpa,
                    g_mpa,
                },
            }
        }
    }

    /// Both readers on `text`, from text and from a `serde_json::Value`
    /// (the whole-file reader's road): the same material or the same
    /// message.
    fn same_as_the_derive(text: &str) -> bool {
        // serde_json places an error raised inside its reading at a line
        // and column (the derive raises its own after reading): the
        // readers of the member file drop the place of a member's fault.
        let unplaced = |e: serde_json::Error| {
            let text = e.to_string();
            match text.rsplit_once(" at line ") {
                Some((head, _)) if e.line() > 0 => head.to_string(),
                _ => text,
            }
        };
        let ours = serde_json::from_str::<MaterialSpec>(text).map_err(unplaced);
        let derived = serde_json::from_str::<Derived>(text)
            .map(MaterialSpec::from)
            .map_err(|e| unplaced(e).replace("enum Derived", "enum MaterialSpec"));
        assert_eq!(ours, derived, "{text}");
        if let Ok(value) = serde_json::from_str::<serde_json::Value>(text) {
            let ours =
                serde_json::from_value::<MaterialSpec>(value.clone()).map_err(|e| e.to_string());
            let derived = serde_json::from_value::<Derived>(value)
                .map(MaterialSpec::from)
                .map_err(|e| e.to_string().replace("enum Derived", "enum MaterialSpec"));
            assert_eq!(ours, derived, "{text} as a value");
        }
        ours.is_ok()
    }

    /// `same_name` compares a table's name with a normalised key but for
    /// case, which is the normalised comparison only for names of letters
    /// and digits; and every timber class is found by its name, in any case
    /// and with spaces or dashes.
    #[test]
    fn timber_names_are_letters_and_digits_and_found() {
        for t in &TIMBER {
            assert!(
                t.name.bytes().all(|b| b.is_ascii_alphanumeric()),
                "{}",
                t.name
            );
            for spelling in [
                t.name.to_string(),
                t.name.to_lowercase(),
                format!(" {}-", t.name.to_uppercase()),
            ] {
                assert!(
                    matches!(find(&spelling), Some(Found::Timber(c)) if c.name == t.name),
                    "{spelling}"
                );
            }
        }
        assert!(find("GL28").is_none() && find("GL28hh").is_none());
    }

    #[test]
    fn the_material_reader_answers_as_the_untagged_derive() {
        let keys = [
            "grade",
            "fc0k_mpa",
            "e005_mpa",
            "e0mean_mpa",
            "timber",
            "fy_mpa",
            "e_mpa",
            "g_mpa",
            "colour",
        ];
        let values = [
            "355",
            "-2",
            "210000.5",
            "\"S355\"",
            "\"solid\"",
            "\"glulam\"",
            "null",
            "true",
            "[1]",
            "{}",
            "1e400",
        ];
        // Every form with every value in each place, every key added to or
        // taken from each form, lists in a form's order and not.
        let forms: [&[&str]; 4] = [
            &["grade"],
            &["fc0k_mpa", "e005_mpa", "e0mean_mpa", "timber"],
            &["fy_mpa", "e_mpa"],
            &["fy_mpa", "e_mpa", "g_mpa"],
        ];
        let good = |k: &str| match k {
            "grade" => "\"S355\"",
            "timber" => "\"glulam\"",
            _ => "24",
        };
        let (mut read, mut refused) = (0, 0);
        let mut count = |ok: bool| if ok { read += 1 } else { refused += 1 };
        for form in forms {
            let entries: Vec<String> = form
                .iter()
                .map(|k| format!("\"{k}\": {}", good(k)))
                .collect();
            count(same_as_the_derive(&format!("{{{}}}", entries.join(", "))));
            let items: Vec<&str> = form.iter().map(|k| good(k)).collect();
            count(same_as_the_derive(&format!("[{}]", items.join(", "))));
            for (i, key) in form.iter().enumerate() {
                for v in values {
                    let mut e = entries.clone();
                    e[i] = format!("\"{key}\": {v}");
                    count(same_as_the_derive(&format!("{{{}}}", e.join(", "))));
                    let mut it = items.clone();
                    it[i] = v;
                    count(same_as_the_derive(&format!("[{}]", it.join(", "))));
                }
                let mut e = entries.clone();
                e.remove(i);
                count(same_as_the_derive(&format!("{{{}}}", e.join(", "))));
                let mut e = entries.clone();
                e.push(format!("\"{key}\": {}", good(key)));
                count(same_as_the_derive(&format!("{{{}}}", e.join(", "))));
            }
            for key in keys {
                let mut e = entries.clone();
                e.push(format!("\"{key}\": {}", good(key)));
                count(same_as_the_derive(&format!("{{{}}}", e.join(", "))));
                let mut it = items.clone();
                it.push(good(key));
                count(same_as_the_derive(&format!("[{}]", it.join(", "))));
            }
        }
        for other in [
            "{}",
            "[]",
            "\"S355\"",
            "355",
            "null",
            "true",
            "[[1]]",
            "{\"grade\": \"S355\", \"grade\": \"S275\"}",
        ] {
            count(same_as_the_derive(other));
        }
        assert!(read > 20 && refused > 100, "{read} read, {refused} refused");
    }
    use crate::section::{Given, Rect, Round, Section, SectionSpec};

    fn rect(t: f64) -> Section {
        SectionSpec::Rect(Rect {
            depth_mm: 400.0,
            width_mm: t,
        })
        .build()
        .unwrap()
    }

    fn grade(g: &str, section: &Section) -> Result<Material> {
        resolve(
            &MaterialSpec::Grade {
                grade: g.to_string(),
            },
            crate::member::stock(section),
        )
    }

    fn fy(g: &str, t: f64) -> f64 {
        match grade(g, &rect(t)).unwrap() {
            Material::Steel(s) => s.fy_mpa,
            Material::Timber(_) => panic!("steel expected"),
        }
    }

    #[test]
    fn en10025_2_thickness_steps() {
        // EN 10025-2:2019 Table 7, S355 (recalled from memory).
        assert_eq!(fy("S355", 16.0), 355.0);
        assert_eq!(fy("S355", 16.1), 345.0);
        assert_eq!(fy("S355", 40.0), 345.0);
        assert_eq!(fy("S355", 63.0), 335.0);
        assert_eq!(fy("S355", 80.0), 325.0);
        assert_eq!(fy("S355", 100.0), 315.0);
        assert_eq!(fy("S355", 150.0), 295.0);
        assert_eq!(fy("S235", 20.0), 225.0);
        assert_eq!(fy("S275", 50.0), 255.0);
        assert!(matches!(
            grade("S355", &rect(300.0)),
            Err(Error::OutOfRange {
                field: "material",
                ..
            })
        ));
    }

    #[test]
    fn forgiving_names() {
        assert_eq!(fy("s355 j2", 10.0), 355.0);
        assert_eq!(fy("S355-K2", 10.0), 355.0);
        assert_eq!(fy("S460NL", 10.0), 460.0);
        assert_eq!(fy("S460M", 110.0), 385.0);
        assert_eq!(fy("S460", 110.0), 380.0);
        assert_eq!(fy("S355J2H", 10.0), 355.0);
        assert_eq!(fy("G40.21-350W", 10.0), 350.0);
        assert_eq!(fy("CSA G40.21 350W", 70.0), 320.0);
        assert!((fy("astm a992", 10.0) - 344.737_85).abs() < 1e-4);
        assert!((fy("A36", 10.0) - 248.211_25).abs() < 1e-4);
    }

    #[test]
    fn a500_by_family() {
        let round = SectionSpec::Round(Round { diameter_mm: 50.0 })
            .build()
            .unwrap();
        match grade("A500 Grade C", &round).unwrap() {
            Material::Steel(s) => assert!((s.fy_mpa - 46.0 * KSI).abs() < 1e-9),
            Material::Timber(_) => panic!(),
        }
    }

    #[test]
    fn hollow_grades_by_make() {
        use crate::section::Rhs;
        let rhs = |t: f64, make: HollowMake| {
            SectionSpec::Rhs(Rhs {
                depth_mm: 400.0,
                width_mm: 400.0,
                wall_mm: t,
                outer_radius_mm: 0.0,
                inner_radius_mm: None,
                make,
            })
            .build()
            .unwrap()
        };
        let fy_of = |g: &str, s: &Section| match grade(g, s).unwrap() {
            Material::Steel(s) => (s.fy_mpa, s.standard),
            Material::Timber(_) => panic!(),
        };
        // EN 10219-1 (cold-formed): 16 < t <= 40 gives 345 MPa; nothing above 40 mm.
        let (f, std) = fy_of("S355H", &rhs(20.0, HollowMake::ColdFormed));
        assert_eq!(f, 345.0);
        assert!(std.starts_with("EN 10219-1"));
        assert!(matches!(
            grade("S355J2H", &rhs(45.0, HollowMake::ColdFormed)),
            Err(Error::OutOfRange {
                field: "material",
                ..
            })
        ));
        // EN 10210-1 (hot-finished): 40 < t <= 63 gives 335 MPa.
        let (f, std) = fy_of("S355J2H", &rhs(45.0, HollowMake::HotFinished));
        assert_eq!(f, 335.0);
        assert!(std.starts_with("EN 10210-1"));
        // A500 Grade C shaped: 50 ksi.
        let (f, _) = fy_of("A500 Gr. C", &rhs(10.0, HollowMake::ColdFormed));
        assert!((f - 50.0 * KSI).abs() < 1e-9);
    }

    #[test]
    fn timber_classes() {
        match grade("gl28H", &rect(100.0)).unwrap() {
            Material::Timber(t) => {
                assert_eq!(t.name, "GL28h");
                assert_eq!(t.kind, TimberKind::Glulam);
                assert_eq!(t.fc0k_mpa, 28.0);
                assert_eq!(t.e005_mpa, 10_500.0);
            }
            Material::Steel(_) => panic!(),
        }
        match grade("C24", &rect(100.0)).unwrap() {
            Material::Timber(t) => {
                assert_eq!(
                    (t.fc0k_mpa, t.e0mean_mpa, t.e005_mpa, t.g_mean_mpa),
                    (21.0, 11_000.0, 7_400.0, 690.0)
                );
            }
            Material::Steel(_) => panic!(),
        }
    }

    #[test]
    fn unknown_grade_suggests() {
        let given = SectionSpec::Given(Given {
            area_mm2: 1000.0,
            i_major_mm4: 1e6,
            i_minor_mm4: 1e5,
            torsion_mm4: None,
            warping_mm6: None,
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        })
        .build()
        .unwrap();
        match grade("S356", &given) {
            Err(Error::UnknownGrade { suggestions, .. }) => {
                assert_eq!(suggestions.first().map(String::as_str), Some("S355"));
            }
            other => panic!("{other:?}"),
        }
        match grade("GL30h", &given) {
            Err(Error::UnknownGrade { suggestions, .. }) => {
                assert!(suggestions.iter().any(|s| s == "GL32h" || s == "GL28h"));
            }
            other => panic!("{other:?}"),
        }
        match grade("zzzzzzzzzzzz", &given) {
            Err(Error::UnknownGrade { suggestions, .. }) => assert!(suggestions.is_empty()),
            other => panic!("{other:?}"),
        }
        // A given section has no thickness: the thinnest band is read.
        match grade("S355", &given).unwrap() {
            Material::Steel(s) => {
                assert_eq!(s.fy_mpa, 355.0);
                assert_eq!(s.thickness_mm, 0.0);
            }
            Material::Timber(_) => panic!(),
        }
    }

    #[test]
    fn suggestions_are_near() {
        let s = suggestions("350");
        assert_eq!(s.first().map(String::as_str), Some("350W"), "{s:?}");
        let s = suggestions("gl 24");
        assert!(
            s.len() >= 2 && s.iter().take(2).all(|g| g.starts_with("GL24")),
            "{s:?}"
        );
        let s = suggestions("A37");
        assert_eq!(s.first().map(String::as_str), Some("A36"), "{s:?}");
        assert!(suggestions("").is_empty());
    }

    proptest::proptest! {
        /// Any text and any thickness resolve or give a typed error; never a panic.
        #[test]
        fn any_name_any_thickness(name in ".{0,24}", t in -10.0f64..1000.0) {
            let section = rect(t.abs().max(0.1));
            match grade(&name, &section) {
                Ok(Material::Steel(s)) => proptest::prop_assert!(s.fy_mpa > 0.0 && s.e_mpa > 0.0),
                Ok(Material::Timber(t)) => proptest::prop_assert!(t.fc0k_mpa > 0.0),
                Err(Error::UnknownGrade { suggestions, .. }) => proptest::prop_assert!(suggestions.len() <= 4),
                Err(Error::OutOfRange { field, .. }) => proptest::prop_assert_eq!(field, "material"),
                Err(other) => proptest::prop_assert!(false, "{other:?}"),
            }
        }
    }

    #[test]
    fn custom_timber_checks_moduli() {
        let r = resolve(
            &MaterialSpec::Timber {
                fc0k_mpa: 20.0,
                e005_mpa: 12_000.0,
                e0mean_mpa: 10_000.0,
                timber: TimberKind::Solid,
            },
            crate::member::stock(&rect(100.0)),
        );
        assert!(matches!(
            r,
            Err(Error::Geometry {
                field: "e005_mpa",
                ..
            })
        ));
    }
}
