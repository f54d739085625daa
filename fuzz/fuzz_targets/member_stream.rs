//! Fuzz target: the streaming member-file reader (`stream::members`) on any
//! bytes. Nothing may panic, and it agrees with the whole-file reader: what
//! the stream accepts, `file::parse` accepts with the same members; what
//! the whole-file reader refuses, the stream refuses too.
#![no_main]

use libfuzzer_sys::fuzz_target;
use strutline_core::stream::{self, Stop};

fuzz_target!(|data: &[u8]| {
    let mut streamed = Vec::new();
    let outcome = stream::members(data, |_, m| {
        streamed.push(m);
        Ok::<(), ()>(())
    });
    let whole = std::str::from_utf8(data)
        .ok()
        .map(strutline_core::file::parse);
    match outcome {
        Ok(head) => {
            assert_eq!(head.count, streamed.len());
            if let Some(Ok(file)) = &whole {
                assert_eq!(file.members, streamed);
            }
        }
        Err(Stop::MembersFirst) => assert!(streamed.is_empty()),
        Err(Stop::Bad(e)) => {
            assert!(!e.to_string().is_empty());
            if let Some(Ok(file)) = &whole {
                panic!(
                    "stream refused a file the whole reader took ({} members): {e}",
                    file.members.len()
                );
            }
        }
        Err(Stop::Caller(())) => unreachable!(),
    }
});
