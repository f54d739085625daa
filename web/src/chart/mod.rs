//! The charts: the capacity envelope (its data, pure and tested on the
//! host, and its drawing on a canvas with plotters) and a beam-column's
//! interaction chart.

pub mod data;
pub mod envelope;
pub mod interaction;
