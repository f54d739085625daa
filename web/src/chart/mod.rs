//! The capacity envelope chart: its data (pure, tested on the host) and
//! its drawing on a canvas with plotters.

pub mod data;
pub mod envelope;
