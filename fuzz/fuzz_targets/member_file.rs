//! Fuzz target: the JSON member-file reader, then the check of every member
//! it accepts. Nothing may panic; every accepted member gives a finite
//! utilisation or a typed error.
#![no_main]

use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    if let Ok(text) = std::str::from_utf8(data) {
        if let Ok(file) = strutline_core::file::parse(text) {
            for m in &file.members {
                if let Ok(r) = strutline_core::check_member(m) {
                    assert!(r.utilisation.is_finite());
                }
            }
        }
    }
});
