//! What the codes' tee rules share: the tee's geometry in its plane of
//! symmetry (the stem tip at z = 0, the flange on top), the sign convention
//! of its moments, and the monosymmetry of its section.
//!
//! Sign (every method): a positive moment about the axis parallel to the
//! flange (the geometric y-y) compresses the flange and puts the stem in
//! tension (the tee drawn flange up under a sagging moment); a negative one
//! compresses the stem. A warning says so on every tee with such a moment.
//!
//! z_j = z_s - (1/2 I_y) integral z (y^2 + z^2) dA (ENV 1993-1-1:1992 Annex
//! F, F.1.2; z from the centroid, positive towards the flange), worked
//! exactly over the flange and stem rectangles without the root fillets
//! (the fillets lie next to the shear centre and change it little; common
//! practice for the monosymmetry of rolled shapes); CSA S16-19's beta_x is
//! 2 z_j with the flange compressed.

use super::Axis;
use crate::method::common::warn_once_text;
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::{Flanged, Properties};

/// A tee's geometry for its bending in its plane of symmetry, mm.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(super) struct Tee {
    /// Depth h.
    pub h: f64,
    /// Flange thickness.
    pub tf: f64,
    /// Stem thickness.
    pub tw: f64,
    /// Centroid from the stem tip (the section's, fillets included).
    pub zc: f64,
    /// Flat length of the stem, the tip to the root fillet: h - t_f - r.
    pub stem_c: f64,
    /// Flat outstand of the flange: (b - t_w - 2r)/2.
    pub flange_c: f64,
    /// The plastic neutral axis from the stem tip.
    pub z_pna: f64,
    /// z_j with the flange compressed (positive: the Wagner effect helps).
    pub z_j: f64,
    /// From the shear centre (where the flange and stem centre lines meet)
    /// to the flange's outer face: t_f/2.
    pub sc_to_flange_face: f64,
    /// From the shear centre to the stem tip: h - t_f/2.
    pub sc_to_stem_tip: f64,
}

/// The rectangles' integral of z (y^2 + z^2) dA over y0..y1, z0..z1 (z
/// from the centroid, y from the axis of symmetry).
fn wagner(y0: f64, y1: f64, z0: f64, z1: f64) -> f64 {
    (y1.powi(3) - y0.powi(3)) / 3.0 * (z1 * z1 - z0 * z0) / 2.0
        + (y1 - y0) * (z1.powi(4) - z0.powi(4)) / 4.0
}

impl Tee {
    /// The geometry of a tee from its dimensions and built properties.
    pub fn new(t: &Flanged, p: &Properties) -> Tee {
        let (h, b, tf, tw, r) = (
            t.depth_mm,
            t.width_mm,
            t.flange_mm,
            t.web_mm,
            t.root_radius_mm,
        );
        // z_j of the two plates, about their own centroid.
        let (af, aw) = (b * tf, tw * (h - tf));
        let a = af + aw;
        let zc = (af * (h - tf / 2.0) + aw * (h - tf) / 2.0) / a;
        let iy = b * ((h - zc).powi(3) - (h - tf - zc).powi(3)) / 3.0
            + tw * ((h - tf - zc).powi(3) + zc.powi(3)) / 3.0;
        let integral = wagner(-b / 2.0, b / 2.0, h - tf - zc, h - zc)
            + wagner(-tw / 2.0, tw / 2.0, -zc, h - tf - zc);
        let z_s = h - tf / 2.0 - zc;
        let z_j = z_s - integral / (2.0 * iy);
        // The plastic neutral axis: in the flange when it holds half the
        // area, else in the stem (below the fillets; at the fillets' foot
        // if the half-area line falls among them).
        let half = p.area_mm2 / 2.0;
        let stem_c = h - tf - r;
        let z_pna = if af >= half {
            h - half / b
        } else {
            (half / tw).min(stem_c)
        };
        Tee {
            h,
            tf,
            tw,
            zc: p.centroid_z_mm,
            stem_c,
            flange_c: (b - tw - 2.0 * r) / 2.0,
            z_pna,
            z_j,
            sc_to_flange_face: tf / 2.0,
            sc_to_stem_tip: h - tf / 2.0,
        }
    }

    /// Whether the plastic neutral axis lies in the stem (part of it in
    /// compression at the plastic moment with the flange compressed).
    pub fn pna_in_stem(&self) -> bool {
        self.z_pna < self.h - self.tf
    }
}

/// Whether `major` (true) or the minor principal axis of the input's tee is
/// its geometric y-y, parallel to the flange (bending in the plane of
/// symmetry, where the sign matters).
pub(super) fn in_plane(input: &Input<'_>, major: bool) -> bool {
    input.section.axis_name(major) == Some("y-y")
}

/// Warns how the sign of a tee's moment is read.
pub(super) fn warn_sign(warnings: &mut Vec<Warning>) {
    warn_once_text(
        warnings,
        "tee-moment-sign",
        "bending: a positive moment about the tee's axis parallel to its flange is read as \
         compressing the flange (stem in tension), a negative one as compressing the stem; \
         check the sign of the moments",
    );
}

/// The moment key to name for a sign of this axis: the first key whose
/// value gives that sign.
pub(super) fn key_of(input: &Input<'_>, axis: Axis, negative: bool) -> &'static str {
    let m = super::moments(input, axis);
    let keys = match axis {
        Axis::Major => ["m_major_a_knm", "m_major_b_knm", "m_major_span_knm"],
        Axis::Minor => ["m_minor_a_knm", "m_minor_b_knm", "m_minor_span_knm"],
    };
    let vals = [m.a_knm, m.b_knm, m.span_knm];
    keys.iter()
        .zip(vals)
        .find(|(_, v)| if negative { *v < 0.0 } else { *v > 0.0 })
        .map_or(keys[0], |(k, _)| *k)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::SectionSpec;

    #[test]
    fn z_j_of_a_plate_tee_by_hand() {
        // 200x200x15x12 of plates: A = 5220 mm2, z_c = 149.971 mm from
        // the tip, I_y = 19 146 496 mm4, z_j = 64.7619 mm (the rectangles'
        // integrals worked in tests/validation/bending_review/rederive.py).
        let f = Flanged {
            depth_mm: 200.0,
            width_mm: 200.0,
            flange_mm: 15.0,
            web_mm: 12.0,
            root_radius_mm: 0.0,
        };
        let sec = SectionSpec::Tee(f.clone()).build().unwrap();
        let t = Tee::new(&f, &sec.props);
        assert!((t.z_j - 64.761851).abs() < 1e-4, "{}", t.z_j);
        assert!((t.zc - 149.971).abs() < 1e-3);
        // Half the area is 2610 mm2, under the flange's 3000: the PNA is in
        // the flange, 13.05 mm below its top.
        assert!((t.z_pna - 186.95).abs() < 1e-9 && !t.pna_in_stem());
    }
}
