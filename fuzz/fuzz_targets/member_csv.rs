//! Fuzz target: the CSV member-file reader, then the check of every row it
//! takes. Nothing may panic.
#![no_main]

use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    if let Ok(text) = std::str::from_utf8(data) {
        let import = strutline_core::csv::parse_csv(text);
        for m in &import.members {
            if let Ok(r) = strutline_core::check_member(m) {
                assert!(r.utilisation.is_finite());
            }
        }
    }
});
