//! Strutline in the browser: the member list, the editor, the results with
//! their working, and the capacity envelope chart.
//!
//! The modules that hold view logic (number parsing and formatting, status
//! text, list operations, the editor's fields, the workspace encoding, the
//! memoised checks) are plain Rust tested on the host; the components and
//! the browser glue (storage, service worker, downloads, canvas) are thin.

pub mod browser;
pub mod chart;
pub mod checks;
pub mod demo;
pub mod fields;
pub mod listops;
pub mod numtext;
pub mod restraint;
pub mod status;
pub mod workspace;
