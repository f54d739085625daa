//! A small per-thread memo of computed section properties.
//!
//! The members of a list share a handful of sections, and every edit in the
//! app re-checks members whose section did not change, so the properties of
//! a dimensional spec are computed once and then looked up. The key is the
//! exact bit pattern of every dimension, so a hit returns exactly what the
//! computation would; errors are not kept (they are cheap and carry text).
//! Lookups allocate nothing; the memo is cleared when it reaches its cap.

use std::cell::RefCell;
use std::collections::HashMap;
use std::hash::{Hash, Hasher};

use super::{
    Angle, CatalogueRef, Chs, Flanged, Given, HollowMake, IMake, IShape, Properties, Rect, Rhs,
    Round, SectionSpec,
};
use crate::error::Result;

/// Entries kept before the memo starts again.
const CAP: usize = 4096;

/// The bits of an absent optional dimension (a NaN no parser produces).
const NONE: u64 = 0x7ff8_dead_beef_0001;

/// The exact bits of a spec's dimensions, tagged by shape.
#[derive(PartialEq, Eq)]
struct Key([u64; 8]);

impl Hash for Key {
    // Word by word: the derived hash of `[u64; 8]` hands the hasher one
    // 64-byte slice (and its length) instead. Each word's high half is
    // folded into its low half first (x ^ x >> 32, one to one): sections
    // of a list differ in the high mantissa bits of a dimension, and Fx's
    // multiply carries a difference only upward, so without the fold
    // every section of a shape had the same 7-bit tag in the table and a
    // look-up compared some three whole keys, not one.
    fn hash<H: Hasher>(&self, state: &mut H) {
        for w in self.0 {
            state.write_u64(w ^ (w >> 32));
        }
    }
}

thread_local! {
    // Started empty by a constant (no lazy start to test at each look-up).
    static MEMO: RefCell<HashMap<Key, Properties, rustc_hash::FxBuildHasher>> =
        const { RefCell::new(HashMap::with_hasher(rustc_hash::FxBuildHasher)) };
}

fn opt(v: Option<f64>) -> u64 {
    v.map_or(NONE, f64::to_bits)
}

/// The memo key of a dimensional spec; `None` for catalogue references.
/// Every spec is destructured whole (no `..`), so a field added to a shape
/// fails to compile here until it is part of the key.
fn key(spec: &SectionSpec) -> Option<Key> {
    let k = match spec {
        SectionSpec::I(IShape {
            depth_mm,
            width_mm,
            flange_mm,
            web_mm,
            root_radius_mm,
            make,
        }) => [
            1,
            depth_mm.to_bits(),
            width_mm.to_bits(),
            flange_mm.to_bits(),
            web_mm.to_bits(),
            root_radius_mm.to_bits(),
            u64::from(*make == IMake::Welded),
            0,
        ],
        SectionSpec::Rhs(Rhs {
            depth_mm,
            width_mm,
            wall_mm,
            outer_radius_mm,
            inner_radius_mm,
            make,
        }) => [
            2,
            depth_mm.to_bits(),
            width_mm.to_bits(),
            wall_mm.to_bits(),
            outer_radius_mm.to_bits(),
            opt(*inner_radius_mm),
            u64::from(*make == HollowMake::ColdFormed),
            0,
        ],
        SectionSpec::Chs(Chs {
            diameter_mm,
            wall_mm,
            make,
        }) => [
            3,
            diameter_mm.to_bits(),
            wall_mm.to_bits(),
            u64::from(*make == HollowMake::ColdFormed),
            0,
            0,
            0,
            0,
        ],
        SectionSpec::Angle(Angle {
            depth_mm,
            width_mm,
            thickness_mm,
            root_radius_mm,
            toe_radius_mm,
        }) => [
            4,
            depth_mm.to_bits(),
            width_mm.to_bits(),
            thickness_mm.to_bits(),
            root_radius_mm.to_bits(),
            toe_radius_mm.to_bits(),
            0,
            0,
        ],
        SectionSpec::Channel(Flanged {
            depth_mm,
            width_mm,
            flange_mm,
            web_mm,
            root_radius_mm,
        })
        | SectionSpec::Tee(Flanged {
            depth_mm,
            width_mm,
            flange_mm,
            web_mm,
            root_radius_mm,
        }) => [
            if matches!(spec, SectionSpec::Channel(_)) {
                5
            } else {
                6
            },
            depth_mm.to_bits(),
            width_mm.to_bits(),
            flange_mm.to_bits(),
            web_mm.to_bits(),
            root_radius_mm.to_bits(),
            0,
            0,
        ],
        SectionSpec::Rect(Rect { depth_mm, width_mm }) => {
            [7, depth_mm.to_bits(), width_mm.to_bits(), 0, 0, 0, 0, 0]
        }
        SectionSpec::Round(Round { diameter_mm }) => [8, diameter_mm.to_bits(), 0, 0, 0, 0, 0, 0],
        // Typed moduli do not fit the key; a given section is cheap to build.
        SectionSpec::Given(Given {
            w_el_major_mm3,
            w_el_minor_mm3,
            w_pl_major_mm3,
            w_pl_minor_mm3,
            ..
        }) if w_el_major_mm3.is_some()
            || w_el_minor_mm3.is_some()
            || w_pl_major_mm3.is_some()
            || w_pl_minor_mm3.is_some() =>
        {
            return None
        }
        SectionSpec::Given(Given {
            area_mm2,
            i_major_mm4,
            i_minor_mm4,
            torsion_mm4,
            warping_mm6,
            w_el_major_mm3: _,
            w_el_minor_mm3: _,
            w_pl_major_mm3: _,
            w_pl_minor_mm3: _,
        }) => [
            9,
            area_mm2.to_bits(),
            i_major_mm4.to_bits(),
            i_minor_mm4.to_bits(),
            opt(*torsion_mm4),
            opt(*warping_mm6),
            0,
            0,
        ],
        SectionSpec::Catalogue(CatalogueRef { designation: _ }) => return None,
    };
    Some(Key(k))
}

/// Writes the properties of `spec` into `out`, from the memo when it has
/// them (a hit is copied once, straight from the entry).
pub fn fill(spec: &SectionSpec, out: &mut Properties) -> Result<()> {
    let Some(k) = key(spec) else {
        *out = super::shapes::properties(spec)?;
        return Ok(());
    };
    // `try_with` (inlined, where `with` was inlined or not from build to
    // build, some 40 instructions a look-up apart): a memo that cannot be
    // reached (the thread ending) is a miss.
    let hit = MEMO
        .try_with(|m| {
            m.try_borrow()
                .is_ok_and(|m| m.get(&k).map(|p| *out = *p).is_some())
        })
        .unwrap_or(false);
    if hit {
        return Ok(());
    }
    let p = super::shapes::properties(spec)?;
    // Not kept where the memo cannot be reached.
    let _ = MEMO.try_with(|m| {
        if let Ok(mut m) = m.try_borrow_mut() {
            if m.len() >= CAP {
                m.clear();
            }
            // Room for a list's sections at the first entry (the constant
            // start has none).
            if m.capacity() == 0 {
                m.reserve(64);
            }
            m.insert(k, p);
        }
    });
    *out = p;
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::section::{Rect, Rhs};

    fn properties(spec: &SectionSpec) -> Result<Properties> {
        let mut p = Properties::default();
        fill(spec, &mut p)?;
        Ok(p)
    }

    #[test]
    fn a_hit_is_exactly_the_computation() {
        let spec = SectionSpec::Rhs(Rhs {
            depth_mm: 150.0,
            width_mm: 100.0,
            wall_mm: 6.0,
            outer_radius_mm: 9.0,
            inner_radius_mm: Some(6.0),
            make: HollowMake::HotFinished,
        });
        let first = properties(&spec).unwrap();
        let again = properties(&spec).unwrap();
        assert_eq!(first, super::super::shapes::properties(&spec).unwrap());
        assert_eq!(first, again);
    }

    #[test]
    fn different_dimensions_never_share_an_entry() {
        let a = properties(&SectionSpec::Rect(Rect {
            depth_mm: 100.0,
            width_mm: 50.0,
        }))
        .unwrap();
        let b = properties(&SectionSpec::Rect(Rect {
            depth_mm: 50.0,
            width_mm: 100.0,
        }))
        .unwrap();
        assert_ne!(a.i_y_mm4, b.i_y_mm4);
        let bad = properties(&SectionSpec::Rect(Rect {
            depth_mm: -1.0,
            width_mm: 50.0,
        }));
        assert!(bad.is_err());
    }
}
