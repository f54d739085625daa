//! Strutline's engine: section properties, materials, compression design
//! methods and the member file.
//!
//! The engine is pure: it does no IO, touches no clock, and never panics on
//! any input. Every fallible step returns [`Error`], whose message names the
//! field that is wrong and how to put it right. The same code runs natively
//! (the `strutline` command line, the tests, the benchmarks) and in the
//! browser as WebAssembly.
//!
//! Results are a checking aid for compression members, to be verified
//! against the governing code, its national annex and the judgement of a
//! licensed engineer.

pub mod bending;
pub mod buckling;
pub mod catalogue;
pub mod check;
pub mod compare;
pub mod csv;
pub mod decimal;
pub mod envelope;
pub mod error;
pub mod file;
pub mod ids;
pub mod interaction;
pub mod material;
pub mod member;
pub mod method;
pub mod names;
pub mod outcome;
pub mod read;
pub mod roots;
pub mod section;
pub mod sizing;
pub mod solve;
pub mod stability;
#[cfg(not(target_arch = "wasm32"))]
pub mod stream;
pub mod trace;
pub mod trig;
pub mod units;

pub use check::{check_member, CheckResult};
pub use error::Error;
pub use member::Member;
pub use outcome::{Mode, ModeResult, Warning};

/// The caution shown beside every result, in every front end.
pub const CAUTION: &str =
    "Strutline is a checking aid for compression members. Verify every result \
against the governing design code, its national annex and the judgement of a licensed engineer.";
