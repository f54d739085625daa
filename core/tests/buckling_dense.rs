//! The banded Sturm-count solver of `buckling::column` against a dense
//! generalised symmetric eigen-solution by nalgebra (a well-kept
//! general-purpose crate) on the same matrices: the lowest alpha_cr must
//! agree, whatever the supports, springs, steps and loads.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

mod common;

use common::dense::{dense_alpha, model};
use strutline_core::buckling::column::solve;
use strutline_core::buckling::{Fixity, Support};

fn agree(c: &strutline_core::buckling::column::Column, what: &str) {
    for n in [3, 17, 60] {
        let banded = solve(c, n).unwrap().load_factor;
        let dense = dense_alpha(c, n).unwrap();
        assert!(
            ((banded - dense) / dense).abs() < 1e-9,
            "{what}, {n} elements: banded {banded}, dense {dense}"
        );
    }
}

#[test]
fn banded_and_dense_solvers_agree() {
    let m = model();
    agree(&m, "crane column");
    let mut c = m.clone();
    c.a = Support::PINNED;
    c.b = Support {
        translation: Fixity::Spring(0.05),
        rotation: Fixity::Spring(300.0),
    };
    agree(&c, "springs at both ends");
    let mut c = m.clone();
    c.braces[0].translation = Fixity::Fixed;
    c.loads.clear();
    agree(&c, "rigid brace, own weight only");
    let mut c = m;
    c.b = Support::FREE;
    c.braces.clear();
    agree(&c, "stepped cantilever");
}
