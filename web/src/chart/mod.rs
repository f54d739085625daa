//! The charts, each with its data worked out without drawing (tested on
//! the host) and a `draw(...) -> Result` on a canvas with plotters: the
//! capacity envelope (`data`, `envelope`), a beam-column's interaction
//! chart (`interaction`) and the column of a buckling model with its
//! buckled shapes (`column`).

pub mod column;
pub mod data;
pub mod envelope;
pub mod interaction;
