//! Cross-sections: the parametric shapes of the member file and their
//! properties.
//!
//! Axes: `y` and `z` are the geometric axes, with depth running along the
//! web (bending about `y` loads the web in its plane; for an I, y-y is
//! parallel to the flanges, as EN 1993-1-1 Table 6.2 names it). `major`
//! and `minor` are the principal axes, major the stiffer: y for the usual
//! shapes, z for one wider than deep ([`Section::major_is_z`]). For angles
//! the principal axes are `u` (major) and `v` (minor). Every property is computed from the dimensions, with root and
//! corner radii as true circular arcs.

use serde::{Deserialize, Serialize};

use crate::error::Result;

mod cache;
pub mod geometry;
pub mod outline;
pub mod plates;
pub mod read;
pub mod schema;
pub mod shapes;

/// How an I/H section was made: it selects the EN 1993-1-1 buckling curve
/// (and the AISC 360-16 Table B4.1a case of the flanges).
///
/// A member file that does not say (`make` absent) gets [`IMake::Unstated`]:
/// each method then takes the make that gives the lower resistance and says
/// so on the result (see [`crate::method::make`]). `Unstated` is never
/// written to a file (the key is left out), nor read from one.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize, Default)]
#[serde(rename_all = "kebab-case")]
pub enum IMake {
    /// Hot-rolled, with root radii.
    Rolled,
    /// Welded from plates, no radii.
    Welded,
    /// Not given: the lower-resistance make is taken.
    #[default]
    #[serde(skip)]
    Unstated,
}

impl IMake {
    /// Whether the member file left the make out.
    pub fn is_unstated(&self) -> bool {
        *self == IMake::Unstated
    }
}

/// How a hollow section was made.
///
/// Absent in the member file: [`HollowMake::Unstated`], read as cold-formed
/// (the lower resistance, see [`crate::method::make`]).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize, Default)]
#[serde(rename_all = "kebab-case")]
pub enum HollowMake {
    /// Hot-finished (EN 10210, or seamless).
    HotFinished,
    /// Cold-formed (EN 10219, ASTM A500 electric-resistance-welded).
    ColdFormed,
    /// Not given: the lower-resistance make is taken.
    #[default]
    #[serde(skip)]
    Unstated,
}

impl HollowMake {
    /// Whether the member file left the make out.
    pub fn is_unstated(&self) -> bool {
        *self == HollowMake::Unstated
    }
}

/// A doubly symmetric I or H section.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct IShape {
    /// Overall depth h along the web.
    pub depth_mm: f64,
    /// Flange width b.
    pub width_mm: f64,
    /// Flange thickness t_f.
    pub flange_mm: f64,
    /// Web thickness t_w.
    pub web_mm: f64,
    /// Root radius r between web and flange (0 for welded).
    #[serde(default)]
    pub root_radius_mm: f64,
    /// Rolled or welded; absent: not stated.
    #[serde(default, skip_serializing_if = "IMake::is_unstated")]
    pub make: IMake,
}

/// A rectangular or square hollow section.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Rhs {
    /// Overall depth h (major-axis bending loads the sides of length h).
    pub depth_mm: f64,
    /// Overall width b.
    pub width_mm: f64,
    /// Wall thickness t.
    pub wall_mm: f64,
    /// Outer corner radius r_o.
    #[serde(default)]
    pub outer_radius_mm: f64,
    /// Inner corner radius r_i; when absent, max(r_o - t, 0).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub inner_radius_mm: Option<f64>,
    /// Hot-finished or cold-formed; absent: not stated.
    #[serde(default, skip_serializing_if = "HollowMake::is_unstated")]
    pub make: HollowMake,
}

/// A circular hollow section.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Chs {
    /// Outside diameter D.
    pub diameter_mm: f64,
    /// Wall thickness t.
    pub wall_mm: f64,
    /// Hot-finished or cold-formed; absent: not stated.
    #[serde(default, skip_serializing_if = "HollowMake::is_unstated")]
    pub make: HollowMake,
}

/// An equal or unequal angle; `depth_mm` is the longer (or equal) leg.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Angle {
    /// Length of the first leg h.
    pub depth_mm: f64,
    /// Length of the second leg b.
    pub width_mm: f64,
    /// Leg thickness t.
    pub thickness_mm: f64,
    /// Root radius r1.
    #[serde(default)]
    pub root_radius_mm: f64,
    /// Toe radius r2.
    #[serde(default)]
    pub toe_radius_mm: f64,
}

/// A parallel-flange channel or a tee: web of thickness `web_mm` and one
/// (tee) or two (channel) flanges of thickness `flange_mm`.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Flanged {
    /// Overall depth h (channel: back to back of flanges along the web; tee: flange top to stem tip).
    pub depth_mm: f64,
    /// Flange width b (channel: from the back of the web to the flange tip).
    pub width_mm: f64,
    /// Flange thickness t_f.
    pub flange_mm: f64,
    /// Web (stem) thickness t_w.
    pub web_mm: f64,
    /// Root radius r.
    #[serde(default)]
    pub root_radius_mm: f64,
}

/// A solid rectangle (steel plate or timber).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Rect {
    /// Depth h (major axis bending).
    pub depth_mm: f64,
    /// Width b.
    pub width_mm: f64,
}

/// A solid round bar.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Round {
    /// Diameter d.
    pub diameter_mm: f64,
}

/// A section whose properties the person types.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Given {
    /// Area A.
    pub area_mm2: f64,
    /// Second moment about the major axis.
    pub i_major_mm4: f64,
    /// Second moment about the minor axis.
    pub i_minor_mm4: f64,
    /// St Venant torsion constant (optional).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub torsion_mm4: Option<f64>,
    /// Warping constant (optional).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub warping_mm6: Option<f64>,
    /// Elastic modulus about the major axis (optional; version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub w_el_major_mm3: Option<f64>,
    /// Elastic modulus about the minor axis (optional; version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub w_el_minor_mm3: Option<f64>,
    /// Plastic modulus about the major axis (optional; version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub w_pl_major_mm3: Option<f64>,
    /// Plastic modulus about the minor axis (optional; version 3).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub w_pl_minor_mm3: Option<f64>,
}

/// The section kinds, once: [`SectionSpec`] (written by serde's internally
/// tagged derive), the same derive kept for reading as `read::Tagged`, the
/// kind's name alone as `read::Kind`, and the reading of a kind's keys
/// (see [`read`]).
macro_rules! section_kinds {
    ($($(#[$doc:meta])* $variant:ident($ty:ty),)*) => {
        /// A section as written in the member file, selected by `"kind"`; its keys,
        /// units and defaults are described once in [`schema`]. Written by serde's
        /// internally tagged derive; read by [`read`], which answers as that derive
        /// without buffering the section when `kind` is its first key.
        #[derive(Debug, Clone, PartialEq, Serialize)]
        #[serde(tag = "kind", rename_all = "kebab-case")]
        pub enum SectionSpec {
            $($(#[$doc])* $variant($ty),)*
        }

        pub(crate) mod kinds {
            use serde::Deserialize;

            use super::*;

            /// serde's internally tagged derive of [`SectionSpec`], as it was:
            /// the reading of a section whose `kind` is not its first key.
            #[derive(Deserialize)]
            #[serde(
                tag = "kind",
                rename_all = "kebab-case",
                expecting = "internally tagged enum SectionSpec"
            )]
            pub enum Tagged {
                $($variant($ty),)*
            }

            impl From<Tagged> for SectionSpec {
                fn from(t: Tagged) -> SectionSpec {
                    match t {
                        $(Tagged::$variant(x) => SectionSpec::$variant(x),)*
                    }
                }
            }

            /// The value of `kind`, read as the derive reads its tag.
            #[derive(Deserialize)]
            #[serde(variant_identifier, rename_all = "kebab-case")]
            pub enum Kind {
                $($variant,)*
            }

            impl Kind {
                /// The section of this kind from the rest of its keys.
                pub fn section<'de, D: serde::Deserializer<'de>>(
                    self,
                    rest: D,
                ) -> std::result::Result<SectionSpec, D::Error> {
                    match self {
                        $(Kind::$variant => <$ty>::deserialize(rest).map(SectionSpec::$variant),)*
                    }
                }
            }
        }
    };
}

section_kinds! {
    /// Doubly symmetric I/H.
    I(IShape),
    /// Rectangular or square hollow.
    Rhs(Rhs),
    /// Circular hollow.
    Chs(Chs),
    /// Equal or unequal angle.
    Angle(Angle),
    /// Parallel-flange channel.
    Channel(Flanged),
    /// Tee.
    Tee(Flanged),
    /// Solid rectangle.
    Rect(Rect),
    /// Solid round.
    Round(Round),
    /// Typed properties.
    Given(Given),
    /// An entry of the built-in catalogue of standard sections, by designation.
    Catalogue(CatalogueRef),
}

/// A reference to a catalogue entry; the member file keeps the designation.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct CatalogueRef {
    /// The designation as written ("HE 200 B", "SHS 100x100x5", "W10x49").
    pub designation: String,
}

/// The family of a section, as the design codes distinguish them.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Family {
    /// I/H.
    I,
    /// Rectangular hollow.
    Rhs,
    /// Circular hollow.
    Chs,
    /// Angle.
    Angle,
    /// Channel.
    Channel,
    /// Tee.
    Tee,
    /// Solid rectangle.
    Rect,
    /// Solid round.
    Round,
    /// Given properties.
    Given,
}

/// Properties of a cross-section. Lengths in mm.
///
/// The reference point for positions is the centroid. `y`/`z` are the
/// geometric axes (y along the width, bending about y is major-axis
/// bending for I, RHS, channel, tee); `major`/`minor` are the principal
/// axes (for all shapes but the angle they coincide with y and z).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Default)]
pub struct Properties {
    /// Area A, mm2.
    pub area_mm2: f64,
    /// Second moment about the geometric y axis through the centroid, mm4.
    pub i_y_mm4: f64,
    /// Second moment about the geometric z axis through the centroid, mm4.
    pub i_z_mm4: f64,
    /// Product moment about the centroidal geometric axes, mm4 (zero for symmetric shapes).
    pub i_yz_mm4: f64,
    /// Major principal second moment, mm4.
    pub i_major_mm4: f64,
    /// Minor principal second moment, mm4.
    pub i_minor_mm4: f64,
    /// Angle from the geometric y axis to the major principal axis, radians: for shapes symmetric
    /// about y or z, 0 when I_y >= I_z and π/2 otherwise (an RHS wider than deep, a wide tee); for
    /// angles ½ atan2(-2 I_yz, I_y - I_z) (see [`shapes`]).
    pub principal_angle_rad: f64,
    /// Radius of gyration about the major principal axis, mm.
    pub r_major_mm: f64,
    /// Radius of gyration about the minor principal axis, mm.
    pub r_minor_mm: f64,
    /// Elastic modulus about the major axis (smallest, extreme fibre), mm3.
    pub w_el_major_mm3: f64,
    /// Elastic modulus about the minor axis, mm3.
    pub w_el_minor_mm3: f64,
    /// Plastic modulus about the major axis, mm3.
    pub w_pl_major_mm3: f64,
    /// Plastic modulus about the minor axis, mm3.
    pub w_pl_minor_mm3: f64,
    /// St Venant torsion constant I_t, mm4.
    pub torsion_mm4: f64,
    /// Warping constant I_w, mm6.
    pub warping_mm6: f64,
    /// Shear centre position relative to the centroid along the major principal axis direction, mm.
    pub shear_centre_major_mm: f64,
    /// Shear centre position relative to the centroid along the minor principal axis direction, mm.
    pub shear_centre_minor_mm: f64,
    /// Centroid position from the section's reference corner/edge along y, mm (see each shape's docs).
    pub centroid_y_mm: f64,
    /// Centroid position from the section's reference corner/edge along z, mm.
    pub centroid_z_mm: f64,
    /// Mass per metre for steel density 7850 kg/m3, kg/m (common practice).
    pub mass_kg_per_m: f64,
}

/// A checked section: its spec, its family and its properties.
#[derive(Debug, Clone, PartialEq)]
pub struct Section {
    /// The dimensions as given.
    pub spec: SectionSpec,
    /// Its family.
    pub family: Family,
    /// Its properties.
    pub props: Properties,
    /// The catalogue designation when it came from the catalogue.
    pub designation: Option<&'static str>,
}

impl Section {
    /// The thickest plate, mm (see [`SectionSpec::governing_thickness_mm`]);
    /// a built section always has dimensions, or 0 for given properties.
    pub fn governing_thickness_mm(&self) -> f64 {
        self.spec.governing_thickness_mm().unwrap_or(0.0)
    }

    /// Whether the section is a channel.
    pub fn spec_is_channel(&self) -> bool {
        matches!(self.spec, SectionSpec::Channel(_))
    }

    /// Whether the principal major axis is the geometric z-z axis (parallel
    /// to the depth, the web of an I): a section stiffer about it than about
    /// y-y, such as an I wider than deep (principal angle 90°).
    pub fn major_is_z(&self) -> bool {
        (self.props.principal_angle_rad - std::f64::consts::FRAC_PI_2).abs() < 1e-9
    }

    /// The geometric axis the principal major (`major` true) or minor axis
    /// is, as the codes' tables name it: "y-y" (parallel to the width, the
    /// flanges of an I) or "z-z" (parallel to the depth, the web). `None`
    /// for angles (principal axes u-u, v-v) and typed properties.
    pub fn axis_name(&self, major: bool) -> Option<&'static str> {
        if matches!(self.family, Family::Angle | Family::Given) {
            return None;
        }
        Some(if major != self.major_is_z() {
            "y-y"
        } else {
            "z-z"
        })
    }
}

impl SectionSpec {
    /// The section's family; `None` for a catalogue reference, whose
    /// family the catalogue knows (`catalogue::family`).
    pub fn family(&self) -> Option<Family> {
        Some(match self {
            SectionSpec::I(_) => Family::I,
            SectionSpec::Rhs(_) => Family::Rhs,
            SectionSpec::Chs(_) => Family::Chs,
            SectionSpec::Angle(_) => Family::Angle,
            SectionSpec::Channel(_) => Family::Channel,
            SectionSpec::Tee(_) => Family::Tee,
            SectionSpec::Rect(_) => Family::Rect,
            SectionSpec::Round(_) => Family::Round,
            SectionSpec::Given(_) => Family::Given,
            SectionSpec::Catalogue(_) => return None,
        })
    }

    /// The thickest plate of the section, mm: the thickness that sets the
    /// yield strength in the material standards (0 for given sections,
    /// which do not tell it); `None` for a catalogue reference, which is
    /// resolved first (a built [`Section`]'s spec never is one).
    pub fn governing_thickness_mm(&self) -> Option<f64> {
        Some(match self {
            SectionSpec::I(s) => s.flange_mm.max(s.web_mm),
            SectionSpec::Rhs(s) => s.wall_mm,
            SectionSpec::Chs(s) => s.wall_mm,
            SectionSpec::Angle(s) => s.thickness_mm,
            SectionSpec::Channel(s) | SectionSpec::Tee(s) => s.flange_mm.max(s.web_mm),
            SectionSpec::Rect(s) => s.depth_mm.min(s.width_mm),
            SectionSpec::Round(s) => s.diameter_mm,
            SectionSpec::Given(_) => 0.0,
            SectionSpec::Catalogue(_) => return None,
        })
    }

    /// Validates the dimensions and computes the properties. A catalogue
    /// reference is an error here: the catalogue builds it
    /// (`catalogue::build`), which the check does when it prepares a member.
    #[inline]
    pub fn build(&self) -> Result<Section> {
        let mut section = self.unfilled()?;
        cache::fill(self, &mut section.props)?;
        Ok(section)
    }

    /// [`SectionSpec::build`] into `slot`, borrowed back: the section is
    /// written where the caller keeps it, not returned and then moved
    /// there (a 300-byte copy fewer in a check from the member as written).
    #[inline]
    pub fn build_in<'s>(&self, slot: &'s mut Option<Section>) -> Result<&'s Section> {
        let section = slot.insert(self.unfilled()?);
        cache::fill(self, &mut section.props)?;
        Ok(section)
    }

    /// The section of this spec with its properties still to be filled.
    #[inline(always)]
    fn unfilled(&self) -> Result<Section> {
        let Some(family) = self.family() else {
            return Err(crate::error::Error::Geometry {
                field: "designation",
                reason: "a catalogue reference has no dimensions of its own; it is resolved \
                         through the catalogue"
                    .into(),
            });
        };
        Ok(Section {
            spec: self.clone(),
            family,
            props: Properties::default(),
            designation: None,
        })
    }

    /// A short human description, e.g. "I 300x300x19x11 r27".
    pub fn describe(&self) -> String {
        shapes::describe(self)
    }

    /// [`SectionSpec::describe`] with the numbers written by `number` and
    /// `length_unit` after the dimensions ([`shapes::describe_in`]): the
    /// app's text in the units it shows.
    pub fn describe_in(
        &self,
        number: &dyn Fn(f64, crate::units::Quantity) -> String,
        length_unit: &str,
    ) -> String {
        shapes::describe_in(self, number, length_unit)
    }
}
