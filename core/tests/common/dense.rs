//! A dense reference for the buckling analysis (shared by the test
//! `buckling_dense.rs` and the benchmark `benches/buckling.rs`).

#![allow(dead_code)]

use nalgebra::DMatrix;
use strutline_core::buckling::column::{matrices, Brace, Column, Load, Part};
use strutline_core::buckling::{Axis, Fixity, Support};

/// An invented crane-hall column: 9 m, stepped at 6 m, fixed base, pinned
/// top, a spring brace at 3 m, a crane bracket load at the step, a roof
/// load at the top and its own weight.
pub fn model() -> Column {
    Column {
        axis: Axis::Major,
        length_mm: 9000.0,
        parts: vec![
            Part {
                length_mm: 6000.0,
                ei_nmm2: 210_000.0 * 1.2e8,
            },
            Part {
                length_mm: 3000.0,
                ei_nmm2: 210_000.0 * 3.7e7,
            },
        ],
        a: Support::FIXED,
        b: Support::PINNED,
        braces: vec![Brace {
            index: 0,
            at_mm: 3000.0,
            translation: Fixity::Spring(2.0),
        }],
        loads: vec![
            Load {
                index: 0,
                at_mm: 6000.0,
                axial_kn: 400.0,
            },
            Load {
                index: 1,
                at_mm: 9000.0,
                axial_kn: 150.0,
            },
        ],
        distributed_kn_per_m: 1.2,
    }
}

/// alpha_cr by the dense route: the largest eigenvalue mu of
/// L^-1 K_g L^-T (K = L L^T) is 1 / alpha_cr.
pub fn dense_alpha(c: &Column, elements: usize) -> Option<f64> {
    let (k, kg) = matrices(c, elements).ok()?;
    let n = k.len();
    let kd = DMatrix::from_fn(n, n, |i, j| k.get(i, j));
    let gd = DMatrix::from_fn(n, n, |i, j| kg.get(i, j));
    let l = kd.cholesky()?.l();
    let li = l.clone().try_inverse()?;
    let c = &li * gd * li.transpose();
    let mu = c.symmetric_eigenvalues().max();
    Some(1.0 / mu)
}
