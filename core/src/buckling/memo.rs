//! A small per-thread memo of column analyses ([`super::column::analyse`]).
//!
//! The analysis depends only on the column (lengths, bending stiffnesses,
//! supports, braces, loads), not on the design method, the material's
//! strength or the member's moments; yet the app analyses the same column
//! for the column-model panel, the member's check, the check under every
//! other method (What if) and the largest load, and the command line for
//! `check` and `buckle`. The key is the exact bit pattern of every number
//! of the column, so a hit returns exactly what the analysis would (the
//! result is the same bit for bit); errors are not kept (they are cheap and
//! carry text). Measured in `bench/column-model.md`.

use std::cell::RefCell;
use std::collections::HashMap;

use super::column::{analyse as analyse_now, Buckle, Column};
use super::{Axis, Fixity, Support};
use crate::error::Result;

/// Entries kept before the memo starts again (a result holds its buckled
/// shape: some 40 KB at the finest mesh).
const CAP: usize = 32;

thread_local! {
    static MEMO: RefCell<HashMap<Vec<u64>, Buckle, rustc_hash::FxBuildHasher>> =
        const { RefCell::new(HashMap::with_hasher(rustc_hash::FxBuildHasher)) };
}

fn fixity(f: Fixity, key: &mut Vec<u64>) {
    match f {
        Fixity::Fixed => key.extend([1, 0]),
        Fixity::Free => key.extend([2, 0]),
        Fixity::Spring(k) => key.extend([3, k.to_bits()]),
    }
}

fn support(s: Support, key: &mut Vec<u64>) {
    fixity(s.translation, key);
    fixity(s.rotation, key);
}

/// The memo key: every number of the column, exactly. The column is
/// destructured whole (no `..`), so a field added to it fails to compile
/// here until it is part of the key.
fn key(c: &Column) -> Vec<u64> {
    let Column {
        axis,
        length_mm,
        parts,
        a,
        b,
        braces,
        loads,
        distributed_kn_per_m,
    } = c;
    let mut k = Vec::with_capacity(16 + 2 * parts.len() + 4 * braces.len() + 3 * loads.len());
    k.push(match axis {
        Axis::Major => 1,
        Axis::Minor => 2,
    });
    k.push(length_mm.to_bits());
    k.push(distributed_kn_per_m.to_bits());
    support(*a, &mut k);
    support(*b, &mut k);
    k.push(parts.len() as u64);
    for p in parts {
        k.extend([p.length_mm.to_bits(), p.ei_nmm2.to_bits()]);
    }
    k.push(braces.len() as u64);
    for br in braces {
        k.extend([br.index as u64, br.at_mm.to_bits()]);
        fixity(br.translation, &mut k);
    }
    k.push(loads.len() as u64);
    for l in loads {
        k.extend([l.index as u64, l.at_mm.to_bits(), l.axial_kn.to_bits()]);
    }
    k
}

/// [`super::column::analyse`], remembered: the same column gives the same
/// result without a second analysis.
pub fn analyse(c: &Column) -> Result<Buckle> {
    let k = key(c);
    if let Some(hit) = MEMO.with(|m| m.borrow().get(&k).cloned()) {
        return Ok(hit);
    }
    let b = analyse_now(c)?;
    MEMO.with(|m| {
        let mut m = m.borrow_mut();
        if m.len() >= CAP {
            m.clear();
        }
        m.insert(k, b.clone());
    });
    Ok(b)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::buckling::column::Load;

    #[test]
    fn a_hit_is_the_analysis_itself_and_a_changed_number_is_not_a_hit() {
        let c = Column::uniform(
            Axis::Minor,
            5000.0,
            3.0e12,
            Support::FIXED,
            Support::PINNED,
            100.0,
        );
        let direct = analyse_now(&c).unwrap();
        assert_eq!(analyse(&c).unwrap(), direct);
        assert_eq!(analyse(&c).unwrap(), direct);
        // One load moved by a millimetre: another column, another answer.
        let mut moved = c.clone();
        moved.loads = vec![Load {
            index: 0,
            at_mm: 4999.0,
            axial_kn: 100.0,
        }];
        let other = analyse(&moved).unwrap();
        assert_ne!(other, direct);
        assert_eq!(other, analyse_now(&moved).unwrap());
        // A spring of another stiffness is another key.
        let mut sprung = c.clone();
        sprung.b.rotation = Fixity::Spring(1.0);
        let mut stiffer = c.clone();
        stiffer.b.rotation = Fixity::Spring(2.0);
        assert_ne!(key(&sprung), key(&stiffer));
        assert_ne!(key(&c), key(&sprung));
        // Errors are refused as the analysis refuses them, and not kept.
        let mut loose = c.clone();
        loose.a = Support::FREE;
        loose.b = Support::FREE;
        assert_eq!(
            analyse(&loose).unwrap_err().to_string(),
            analyse_now(&loose).unwrap_err().to_string()
        );
    }
}
