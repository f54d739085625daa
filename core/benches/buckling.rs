//! The elastic critical load analysis of a column (issue 18's target:
//! alpha_cr and the buckled shape of a 200-element model in under 5 ms
//! natively), and, for the record of why the engine has a banded solver
//! of its own, the same eigenvalue by a dense generalised symmetric
//! eigen-solution with nalgebra (Cholesky of K, then the symmetric
//! eigenvalues of L^-1 K_g L^-T) on the same matrices.
//!
//! Run with `cargo xtask bench` (or `cargo bench -p strutline-core --bench buckling`).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use strutline_core::buckling::column::{analyse, solve};

#[path = "../tests/common/dense.rs"]
mod dense;
use dense::{dense_alpha, model};

fn bench(c: &mut Criterion) {
    let m = model();
    let mut g = c.benchmark_group("buckling");
    g.bench_function("200_elements_banded", |b| {
        b.iter(|| solve(black_box(&m), 200))
    });
    g.bench_function("analyse_converged", |b| b.iter(|| analyse(black_box(&m))));
    g.sample_size(10);
    g.bench_function("200_elements_dense_nalgebra", |b| {
        b.iter(|| dense_alpha(black_box(&m), 200))
    });
    g.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
