//! The small hasher of the engine's own maps (the catalogue's designation
//! index and the section-properties memo): FNV-1a over bytes, and a word at
//! a time for `u64`s, so the memo's eight-word keys hash in eight steps.
//! The maps are never keyed by outside input an attacker controls in a way
//! that matters (the catalogue is built in; the memo is capped), so a
//! simple fast hash is enough.

use std::hash::Hasher;

/// FNV-1a state (0 until the first write).
#[derive(Default)]
pub(crate) struct Fnv(u64);

impl Fnv {
    fn state(&self) -> u64 {
        if self.0 == 0 {
            0xcbf2_9ce4_8422_2325
        } else {
            self.0
        }
    }
}

impl Hasher for Fnv {
    fn finish(&self) -> u64 {
        self.0
    }
    fn write(&mut self, bytes: &[u8]) {
        let mut h = self.state();
        for b in bytes {
            h ^= u64::from(*b);
            h = h.wrapping_mul(0x0100_0000_01b3);
        }
        self.0 = h;
    }
    fn write_u64(&mut self, v: u64) {
        self.0 = (self.state() ^ v)
            .wrapping_mul(0x0100_0000_01b3)
            .rotate_left(29);
    }
}
