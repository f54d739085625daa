//! The ids of a list read so far, to refuse a repeated one, in little
//! memory for lists of any length.
//!
//! A set of `String`s costs some 60 bytes an id (the string's own
//! allocation, its 24-byte handle, the table's slot): 125 MB of a
//! 1,000,000-member CSV check went to it. [`SeenIds`] keeps 40 bits of a
//! 64-bit hash of each id, in 256 tables of 32-bit fingerprints chosen by
//! the hash's top 8 bits (5 bytes a slot with its control byte, the tables
//! 44% to 88% full: 6 to 12 bytes an id),
//! and the ids' bytes back to back in one buffer (their length and a byte
//! each). The answer is exact: when a fingerprint is already in its table,
//! the buffer is searched for the id itself, so two ids that only share a
//! fingerprint are both accepted. That search runs only for a repeated id
//! (which stops the reading) or a collision of the 40 bits (about one in a
//! list of a million ids, one scan of its 8 MB of ids), so reading stays
//! linear in the list.
//!
//! The 256 tables grow one at a time: one table of a single 64-bit set
//! (before, `FxHashSet<u64>`) held its old 9 MB and its new 19 MB at once
//! while growing past a million ids, which took the 1,000,000-member
//! `convert` over 64 MB; a table here is 1/256th of that.

use std::hash::{BuildHasher, Hasher};

use rustc_hash::{FxBuildHasher, FxHashSet};

/// The length byte that says 4 bytes of length follow.
const LONG: u8 = 255;

/// Tables of fingerprints, chosen by the top bits of an id's hash.
const TABLES: usize = 256;

/// The ids seen so far ([module docs](self)).
#[derive(Debug, Clone)]
pub struct SeenIds {
    /// Of every id's 64-bit hash, the low 32 bits, in the table its top 8
    /// bits choose ([`TABLES`] tables, empty until used).
    hashes: Vec<FxHashSet<u32>>,
    /// Every id: its length (one byte below [`LONG`], else [`LONG`] and 4
    /// bytes, little-endian), then its bytes.
    bytes: Vec<u8>,
    /// Ids added.
    count: usize,
    /// The hash of an id; [`hash`] but for the tests of the exact
    /// re-check, which use a poor one.
    hasher: Option<fn(&str) -> u64>,
}

/// The 64-bit hash of an id: FxHash (rustc-hash, the engine's hasher),
/// spread by a final mix (the finaliser of MurmurHash3's 64-bit variant)
/// so that ids that differ in a late character differ in every bit.
fn hash(id: &str) -> u64 {
    let mut h = FxBuildHasher.build_hasher();
    h.write(id.as_bytes());
    let mut x = h.finish() ^ (id.len() as u64);
    x ^= x >> 33;
    x = x.wrapping_mul(0xff51_afd7_ed55_8ccd);
    x ^= x >> 33;
    x = x.wrapping_mul(0xc4ce_b9fe_1a85_ec53);
    x ^ (x >> 33)
}

impl Default for SeenIds {
    fn default() -> SeenIds {
        SeenIds::new()
    }
}

impl SeenIds {
    /// An empty set.
    pub fn new() -> SeenIds {
        SeenIds::with_capacity(0, 0)
    }

    /// An empty set with room for `n` ids of `bytes` bytes in all.
    pub fn with_capacity(n: usize, bytes: usize) -> SeenIds {
        // Small lists leave the tables empty until used (a table's least
        // allocation is for a few entries).
        let each = if n >= TABLES * 16 {
            n.div_ceil(TABLES)
        } else {
            0
        };
        SeenIds {
            hashes: (0..TABLES)
                .map(|_| FxHashSet::with_capacity_and_hasher(each, FxBuildHasher))
                .collect(),
            bytes: Vec::with_capacity(bytes + n),
            count: 0,
            hasher: None,
        }
    }

    /// Adds `id`; false when it was there already (exactly: the same text).
    pub fn insert(&mut self, id: &str) -> bool {
        let h = self.hasher.map_or_else(|| hash(id), |f| f(id));
        // The top 8 bits choose the table, the low 32 are kept.
        let table = (h >> 56) as usize;
        let fresh = match self.hashes.get_mut(table) {
            Some(t) => t.insert(h as u32),
            None => false,
        };
        if !fresh && self.contains_exactly(id) {
            return false;
        }
        // The length in one byte up to 254; else 255 and 4 bytes. Ids
        // longer than 4 GB do not occur (the readers' fields are far
        // shorter); one would be kept with a cut length and never matched.
        match u8::try_from(id.len()) {
            Ok(n) if n < LONG => self.bytes.push(n),
            _ => {
                self.bytes.push(LONG);
                let len = u32::try_from(id.len()).unwrap_or(u32::MAX);
                self.bytes.extend_from_slice(&len.to_le_bytes());
            }
        }
        self.bytes.extend_from_slice(id.as_bytes());
        self.count += 1;
        true
    }

    /// Ids added.
    pub fn len(&self) -> usize {
        self.count
    }

    /// Whether no id was added.
    pub fn is_empty(&self) -> bool {
        self.count == 0
    }

    /// The id stored at `at` and where the next one starts.
    fn entry(&self, at: usize) -> Option<(&[u8], usize)> {
        let (len, start) = match *self.bytes.get(at)? {
            LONG => {
                let len: [u8; 4] = self.bytes.get(at + 1..at + 5)?.try_into().ok()?;
                (u32::from_le_bytes(len) as usize, at + 5)
            }
            n => (usize::from(n), at + 1),
        };
        Some((self.bytes.get(start..start + len)?, start + len))
    }

    /// Whether `id` is among the stored ids (a search of the buffer).
    fn contains_exactly(&self, id: &str) -> bool {
        let mut at = 0;
        while let Some((stored, next)) = self.entry(at) {
            if stored == id.as_bytes() {
                return true;
            }
            at = next;
        }
        false
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn a_repeated_id_is_refused_and_a_new_one_kept() {
        let mut s = SeenIds::new();
        assert!(s.is_empty());
        for i in 0..10_000 {
            assert!(s.insert(&format!("C{i}")));
        }
        assert!(!s.insert("C9999"));
        assert!(!s.insert("C0"));
        assert!(s.insert("C10000"));
        assert!(s.insert(" C0"), "ids are compared as written");
        assert!(s.insert(""));
        assert!(!s.insert(""));
        let long = "L".repeat(300);
        assert!(s.insert(&long));
        assert!(s.insert(&"L".repeat(254)));
        assert!(s.insert(&"L".repeat(255)));
        assert!(!s.insert(&long));
        assert!(!s.insert(&"L".repeat(255)));
        assert_eq!(s.len(), 10_006);
    }

    #[test]
    fn ids_that_share_a_hash_are_told_apart() {
        // A hash that collides for every id of the same length: the answer
        // must come from the exact re-check alone.
        let mut s = SeenIds {
            hasher: Some(|id: &str| id.len() as u64),
            ..SeenIds::new()
        };
        assert!(s.insert("AB"));
        assert!(s.insert("CD"), "same hash, other id: kept");
        assert!(s.insert("B1-x"));
        assert!(!s.insert("CD"));
        assert!(!s.insert("AB"));
        assert!(s.insert("ab"));
        let (a, b) = ("X".repeat(400), format!("{}Y", "X".repeat(399)));
        assert!(s.insert(&a));
        assert!(
            s.insert(&b),
            "same length, so same hash: told apart past the long length"
        );
        assert!(!s.insert(&a));
        assert!(!s.insert(&b));
        assert_eq!(s.len(), 6);
    }

    #[test]
    fn the_hash_spreads_near_ids() {
        let mut hashes: Vec<u64> = (0..100_000).map(|i| hash(&format!("M{i}"))).collect();
        hashes.sort_unstable();
        hashes.dedup();
        assert_eq!(hashes.len(), 100_000);
        // The 40 bits kept (table and fingerprint) tell these apart too.
        let mut kept: Vec<u64> = hashes.iter().map(|h| h & 0xff00_0000_ffff_ffff).collect();
        kept.sort_unstable();
        kept.dedup();
        assert_eq!(kept.len(), 100_000);
    }

    #[test]
    fn a_million_ids_take_under_13_mb_of_tables() {
        let mut s = SeenIds::new();
        for i in 0..1_000_000 {
            assert!(s.insert(&format!("D{i}")));
        }
        assert!(!s.insert("D999999"));
        assert!(!s.insert("D0"));
        // 5 bytes a slot (fingerprint and control byte); a table's slots
        // are a power of two, its capacity 7/8 of them.
        let table_bytes: usize = s
            .hashes
            .iter()
            .map(|t| (t.capacity() * 8 / 7).next_power_of_two() * 5)
            .sum();
        assert!(table_bytes < 13_000_000, "{table_bytes}");
    }
}
