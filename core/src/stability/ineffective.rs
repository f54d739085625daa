//! The strips of a slender section that its effective widths leave out,
//! for drawing them over the section's outline
//! ([`crate::section::outline::outline`], same coordinates).

use super::classify::{Classified, Kind, Part};
use super::effective::Effective;
use crate::section::outline::resolved;
use crate::section::shapes;
use crate::section::SectionSpec;

/// The ineffective strips of a slender section under uniform compression,
/// as rectangles (counter-clockwise, origin at the centroid like
/// [`outline`](crate::section::outline::outline)), one per reduced element, from the effective widths `eff`
/// the check computed for the classification `c`
/// ([`crate::stability::effective::of_check`]). Each strip is the element's
/// width less its effective width, `c - b_eff`, across the plate thickness:
/// in the middle of an internal element (EN 1993-1-5 Table 4.1, psi = 1:
/// `b_e1 = b_e2 = b_eff/2` at the supported edges) and at the free tip of an
/// outstand (Table 4.2: effective from the supported edge). AISC 360-16 E7
/// gives widths only; they are placed the same way (common practice for
/// drawing). Tubes (AISC E7-7 scales the whole area) and sections without
/// dimensions give none.
pub fn ineffective(spec: &SectionSpec, c: &Classified, eff: &Effective) -> Vec<Vec<(f64, f64)>> {
    let mut out = Vec::new();
    let Some(spec) = resolved(spec) else {
        return out;
    };
    let Ok(props) = shapes::properties(spec) else {
        return out;
    };
    let (yc, zc) = (props.centroid_y_mm, props.centroid_z_mm);
    let mut rect = |y0: f64, y1: f64, z0: f64, z1: f64| {
        let (y0, y1, z0, z1) = (y0 - yc, y1 - yc, z0 - zc, z1 - zc);
        out.push(vec![(y0, z0), (y1, z0), (y1, z1), (y0, z1)]);
    };
    for (e, r) in c.elements().iter().zip(eff.reduced.iter()) {
        let Some(r) = r else { continue };
        let s = (e.width_mm - r.effective_mm).max(0.0);
        if s <= 0.0 || matches!(e.kind, Kind::Tube | Kind::Rule) {
            continue;
        }
        let t = e.thickness_mm;
        // Reference position of each shape: see [`crate::section::shapes`].
        match (spec, e.part) {
            (SectionSpec::I(d), Part::IFlange) => {
                let (b, h, tf) = (d.width_mm, d.depth_mm, d.flange_mm);
                for z0 in [0.0, h - tf] {
                    rect(0.0, s, z0, z0 + tf);
                    rect(b - s, b, z0, z0 + tf);
                }
            }
            (SectionSpec::I(d), Part::IWeb) => {
                let (b, h) = (d.width_mm, d.depth_mm);
                rect((b - t) / 2.0, (b + t) / 2.0, (h - s) / 2.0, (h + s) / 2.0);
            }
            (SectionSpec::Rhs(d), Part::RhsDepthWall) => {
                let (b, h) = (d.width_mm, d.depth_mm);
                for y0 in [0.0, b - t] {
                    rect(y0, y0 + t, (h - s) / 2.0, (h + s) / 2.0);
                }
            }
            (SectionSpec::Rhs(d), Part::RhsWidthWall) => {
                let (b, h) = (d.width_mm, d.depth_mm);
                for z0 in [0.0, h - t] {
                    rect((b - s) / 2.0, (b + s) / 2.0, z0, z0 + t);
                }
            }
            (SectionSpec::Channel(d), Part::ChannelWeb) => {
                let h = d.depth_mm;
                rect(0.0, t, (h - s) / 2.0, (h + s) / 2.0);
            }
            (SectionSpec::Channel(d), Part::ChannelFlange) => {
                let (b, h) = (d.width_mm, d.depth_mm);
                for z0 in [0.0, h - t] {
                    rect(b - s, b, z0, z0 + t);
                }
            }
            (SectionSpec::Tee(d), Part::TeeFlange) => {
                let (b, h) = (d.width_mm, d.depth_mm);
                rect(0.0, s, h - t, h);
                rect(b - s, b, h - t, h);
            }
            (SectionSpec::Tee(d), Part::TeeStem) => {
                let b = d.width_mm;
                rect((b - t) / 2.0, (b + t) / 2.0, 0.0, s);
            }
            (SectionSpec::Angle(d), Part::AngleLongLeg | Part::AngleShortLeg) => {
                // The long leg is the one of length max(depth, width); the
                // leg of length `depth_mm` runs up +z from the heel.
                let (h, b) = (d.depth_mm, d.width_mm);
                if (e.part == Part::AngleLongLeg) == (h >= b) {
                    rect(0.0, t, h - s, h);
                } else {
                    rect(b - s, b, 0.0, t);
                }
            }
            _ => {}
        }
    }
    out
}
