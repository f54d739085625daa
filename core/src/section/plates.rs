//! Plate elements of a section for local-buckling classification.
//!
//! Widths are the flat widths c of EN 1993-1-1:2005 Table 5.2:
//! - I/H: web (internal) c = h - 2tf - 2r; flange outstand (four of them)
//!   c = (b - tw - 2r)/2 (sheet 1 and 2).
//! - RHS/SHS: walls (internal) c = h - 3t and b - 3t, the conservative
//!   flat width for hollow sections that goes with Table 5.2 sheet 1 (as
//!   recalled; SCI P363 tabulates c/t of hollow sections the same way).
//!   It does not depend on the corner radius.
//! - CHS: the tube, "width" = outside diameter d, for the d/t limits of sheet 3.
//! - Angles: each leg as an outstand of its full length h or b, as sheet 3
//!   uses h/t and (b + h)/2t for angles.
//! - Channel: web (internal) c = h - 2tf - 2r; flange outstands (two)
//!   c = b - tw - r.
//! - Tee: flange outstands (two) c = (b - tw - 2r)/2; the stem, an
//!   outstand whose flat length is c = h - tf - r (Table 5.2 has no row of
//!   its own for tee stems; the outstand row is the usual reading).
//! - Solid rectangles, round bars and typed sections: no plates (they do
//!   not buckle locally).
//!
//! Invalid dimensions give no plates; the properties computation reports them.

use super::shapes;
use super::SectionSpec;

/// Support of a plate element.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum PlateKind {
    /// Supported along both long edges (a web, an RHS wall).
    Internal,
    /// Supported along one long edge (a flange outstand, an angle leg, a tee stem).
    Outstand,
    /// A circular tube wall.
    Tube,
}

/// One kind of plate element of a section.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Plate {
    /// "web", "flange outstand", "wall", "leg", "stem", "tube".
    pub name: &'static str,
    /// Support.
    pub kind: PlateKind,
    /// Flat width c, mm (see the module docs).
    pub width_mm: f64,
    /// Thickness t, mm.
    pub thickness_mm: f64,
    /// How many such plates the section has.
    pub count: u8,
}

fn plate(
    name: &'static str,
    kind: PlateKind,
    width_mm: f64,
    thickness_mm: f64,
    count: u8,
) -> Plate {
    Plate {
        name,
        kind,
        width_mm: width_mm.max(0.0),
        thickness_mm,
        count,
    }
}

/// The plate elements of the section.
pub fn plates(spec: &SectionSpec) -> Vec<Plate> {
    let Some(spec) = super::outline::resolved(spec) else {
        return Vec::new();
    };
    if shapes::properties(spec).is_err() {
        return Vec::new();
    }
    use PlateKind::{Internal, Outstand, Tube};
    match spec {
        SectionSpec::I(s) => vec![
            plate(
                "web",
                Internal,
                s.depth_mm - 2.0 * s.flange_mm - 2.0 * s.root_radius_mm,
                s.web_mm,
                1,
            ),
            plate(
                "flange outstand",
                Outstand,
                (s.width_mm - s.web_mm - 2.0 * s.root_radius_mm) / 2.0,
                s.flange_mm,
                4,
            ),
        ],
        SectionSpec::Rhs(s) => {
            let t = s.wall_mm;
            if s.depth_mm == s.width_mm {
                vec![plate("wall", Internal, s.depth_mm - 3.0 * t, t, 4)]
            } else {
                vec![
                    plate("wall", Internal, s.depth_mm - 3.0 * t, t, 2),
                    plate("wall", Internal, s.width_mm - 3.0 * t, t, 2),
                ]
            }
        }
        SectionSpec::Chs(s) => vec![plate("tube", Tube, s.diameter_mm, s.wall_mm, 1)],
        SectionSpec::Angle(s) => {
            let t = s.thickness_mm;
            if s.depth_mm == s.width_mm {
                vec![plate("leg", Outstand, s.depth_mm, t, 2)]
            } else {
                vec![
                    plate("leg", Outstand, s.depth_mm, t, 1),
                    plate("leg", Outstand, s.width_mm, t, 1),
                ]
            }
        }
        SectionSpec::Channel(s) => vec![
            plate(
                "web",
                Internal,
                s.depth_mm - 2.0 * s.flange_mm - 2.0 * s.root_radius_mm,
                s.web_mm,
                1,
            ),
            plate(
                "flange outstand",
                Outstand,
                s.width_mm - s.web_mm - s.root_radius_mm,
                s.flange_mm,
                2,
            ),
        ],
        SectionSpec::Tee(s) => vec![
            plate(
                "flange outstand",
                Outstand,
                (s.width_mm - s.web_mm - 2.0 * s.root_radius_mm) / 2.0,
                s.flange_mm,
                2,
            ),
            plate(
                "stem",
                Outstand,
                s.depth_mm - s.flange_mm - s.root_radius_mm,
                s.web_mm,
                1,
            ),
        ],
        SectionSpec::Rect(_)
        | SectionSpec::Round(_)
        | SectionSpec::Given(_)
        | SectionSpec::Catalogue(_) => Vec::new(),
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::{IShape, Rect, Rhs};

    #[test]
    fn hea_like_i_plates() {
        // HE 200 B dimensions: c_web = 200 - 30 - 36 = 134, c_flange = (200 - 9 - 36)/2 = 77.5.
        let p = plates(&SectionSpec::I(IShape {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 9.0,
            root_radius_mm: 18.0,
            make: Default::default(),
        }));
        assert_eq!(p.len(), 2);
        assert_eq!(p[0].kind, PlateKind::Internal);
        assert!((p[0].width_mm - 134.0).abs() < 1e-12);
        assert!((p[1].width_mm - 77.5).abs() < 1e-12);
        assert_eq!(p[1].count, 4);
    }

    #[test]
    fn rhs_walls_and_solids() {
        let p = plates(&SectionSpec::Rhs(Rhs {
            depth_mm: 200.0,
            width_mm: 100.0,
            wall_mm: 8.0,
            outer_radius_mm: 20.0,
            inner_radius_mm: None,
            make: Default::default(),
        }));
        assert_eq!(p.len(), 2);
        assert!((p[0].width_mm - 176.0).abs() < 1e-12);
        assert!((p[1].width_mm - 76.0).abs() < 1e-12);
        assert!(plates(&SectionSpec::Rect(Rect {
            depth_mm: 10.0,
            width_mm: 10.0
        }))
        .is_empty());
        // Impossible geometry: nothing.
        assert!(plates(&SectionSpec::Rhs(Rhs {
            depth_mm: 10.0,
            width_mm: 10.0,
            wall_mm: 8.0,
            outer_radius_mm: 0.0,
            inner_radius_mm: None,
            make: Default::default(),
        }))
        .is_empty());
    }
}
