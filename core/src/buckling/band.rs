//! A symmetric banded matrix of half-bandwidth 3 (a beam's two degrees of
//! freedom a node, node by node) and its LDL^T factorisation without
//! pivoting, which gives both solves and the inertia (the number of
//! negative pivots, Sylvester's law of inertia) the Sturm-sequence count
//! of [`super::column`] needs.
//!
//! Why a solver of our own and not a general crate: a column of n elements
//! has 2n + 2 unknowns but only four entries a row, so the factorisation is
//! O(n) (about 20 flops a row) where a dense one is O(n^3); and the
//! eigenvalue count by inertia, which makes the lowest positive eigenvalue
//! certain, needs the signs of the pivots of an indefinite matrix, which
//! dense symmetric eigen-solvers do not give. The benchmark
//! `core/benches/buckling.rs` times both on the same 200-element model and
//! `bench/RESULTS.md` records the figures.

/// Half-bandwidth plus one: a row holds A(i,i) .. A(i,i+3).
pub const WIDTH: usize = 4;

/// Pivots smaller than this (in absolute value) are replaced by it with
/// their sign, so a shift that lands exactly on an eigenvalue still gives
/// a count (the count is then right for a shift an ulp away).
const TINY: f64 = 1e-300;

/// The upper band of a symmetric matrix: `rows[i][t]` = A(i, i + t).
#[derive(Debug, Clone, PartialEq, Default)]
pub struct Band {
    rows: Vec<[f64; WIDTH]>,
}

impl Band {
    /// An n x n zero matrix.
    pub fn zeros(n: usize) -> Band {
        Band {
            rows: vec![[0.0; WIDTH]; n],
        }
    }

    /// The order n.
    pub fn len(&self) -> usize {
        self.rows.len()
    }

    /// Whether the matrix has no rows.
    pub fn is_empty(&self) -> bool {
        self.rows.is_empty()
    }

    /// Adds `v` to A(p, q) (and so to A(q, p)); entries outside the band
    /// are ignored (the assembly never makes them).
    pub fn add(&mut self, p: usize, q: usize, v: f64) {
        let (i, j) = if p <= q { (p, q) } else { (q, p) };
        if let Some(x) = self.rows.get_mut(i).and_then(|r| r.get_mut(j - i)) {
            *x += v;
        }
    }

    /// A(i, j) (zero outside the band).
    pub fn get(&self, i: usize, j: usize) -> f64 {
        let (i, j) = if i <= j { (i, j) } else { (j, i) };
        self.rows
            .get(i)
            .and_then(|r| r.get(j - i))
            .copied()
            .unwrap_or(0.0)
    }

    /// A(i, i).
    pub fn diagonal(&self, i: usize) -> f64 {
        self.rows.get(i).map_or(0.0, |r| r[0])
    }

    /// `self - s * other` (same order).
    pub fn shifted(&self, s: f64, other: &Band) -> Band {
        Band {
            rows: self
                .rows
                .iter()
                .zip(&other.rows)
                .map(|(a, b)| {
                    let mut r = *a;
                    r.iter_mut().zip(b).for_each(|(x, y)| *x -= s * y);
                    r
                })
                .collect(),
        }
    }

    /// y = A v.
    pub fn mul(&self, v: &[f64]) -> Vec<f64> {
        let mut y = vec![0.0; v.len()];
        for (i, row) in self.rows.iter().enumerate() {
            let vi = v.get(i).copied().unwrap_or(0.0);
            let ahead = v.get(i..).unwrap_or(&[]);
            // Row i of the upper band times v, and its mirror below.
            let mut s = 0.0;
            for (a, x) in row.iter().zip(ahead) {
                s += a * x;
            }
            if let Some(yi) = y.get_mut(i) {
                *yi += s;
            }
            let below = y.get_mut(i + 1..).unwrap_or(&mut []);
            for (yj, a) in below.iter_mut().zip(row.iter().skip(1)) {
                *yj += a * vi;
            }
        }
        y
    }

    /// x^T A x.
    pub fn quadratic(&self, x: &[f64]) -> f64 {
        self.mul(x).iter().zip(x).map(|(a, b)| a * b).sum()
    }

    /// The LDL^T factorisation (no pivoting), with the number of negative
    /// pivots and the smallest pivot relative to its diagonal entry.
    pub fn factor(&self) -> Ldl {
        let mut f = self.rows.clone();
        let mut negatives = 0;
        let mut weakest = f64::INFINITY;
        for i in 0..f.len() {
            let (done, rest) = f.split_at_mut(i + 1);
            let Some(row) = done.last_mut() else {
                continue;
            };
            let diag = self.diagonal(i);
            let mut d = row[0];
            if d.abs() < TINY {
                d = if d < 0.0 { -TINY } else { TINY };
            }
            if d < 0.0 {
                negatives += 1;
            }
            if diag != 0.0 {
                weakest = weakest.min(d / diag.abs());
            }
            let pivot_row = *row;
            // Rows i+1.. i+3 lose l_k times row i: A(i+1+k, i+1+k+t) -=
            // A(i, i+1+k) A(i, i+1+k+t) / d.
            for (k, r) in rest.iter_mut().take(WIDTH - 1).enumerate() {
                let l = pivot_row.get(1 + k).copied().unwrap_or(0.0) / d;
                for (x, a) in r.iter_mut().zip(pivot_row.iter().skip(1 + k)) {
                    *x -= l * a;
                }
            }
            row[0] = d;
            for x in row.iter_mut().skip(1) {
                *x /= d;
            }
        }
        Ldl {
            rows: f,
            negatives,
            weakest,
        }
    }
}

/// A = U^T D U with U unit upper triangular: `rows[i]` = [d_i, U(i,i+1),
/// U(i,i+2), U(i,i+3)].
#[derive(Debug, Clone, PartialEq)]
pub struct Ldl {
    rows: Vec<[f64; WIDTH]>,
    /// The number of negative pivots: the number of negative eigenvalues
    /// of A (Sylvester's law of inertia).
    pub negatives: usize,
    /// The smallest pivot over the absolute value of its diagonal entry:
    /// at or below zero, or tiny, the matrix is not positive definite.
    pub weakest: f64,
}

impl Ldl {
    /// Solves A x = b.
    pub fn solve(&self, b: &[f64]) -> Vec<f64> {
        let mut x = b.to_vec();
        // U^T y = b (unit lower), column by column.
        for (i, row) in self.rows.iter().enumerate() {
            let (done, rest) = x.split_at_mut((i + 1).min(b.len()));
            let yi = done.last().copied().unwrap_or(0.0);
            for (xj, u) in rest.iter_mut().zip(row.iter().skip(1)) {
                *xj -= u * yi;
            }
        }
        // D z = y.
        for (xi, row) in x.iter_mut().zip(&self.rows) {
            *xi /= row[0];
        }
        // U x = z, from the bottom.
        for (i, row) in self.rows.iter().enumerate().rev() {
            let (head, tail) = x.split_at_mut((i + 1).min(b.len()));
            let s: f64 = tail
                .iter()
                .zip(row.iter().skip(1))
                .map(|(a, u)| a * u)
                .sum();
            if let Some(xi) = head.last_mut() {
                *xi -= s;
            }
        }
        x
    }
}

#[cfg(test)]
mod tests {
    #![allow(clippy::needless_range_loop)]
    use super::*;

    /// A symmetric banded test matrix, dense copy alongside.
    fn sample(n: usize, shift: f64) -> (Band, Vec<Vec<f64>>) {
        let mut b = Band::zeros(n);
        let mut dense = vec![vec![0.0; n]; n];
        for i in 0..n {
            for t in 0..WIDTH {
                let j = i + t;
                if j < n {
                    let v = if t == 0 {
                        4.0 + crate::trig::sin(i as f64) - shift
                    } else {
                        1.0 / (1.0 + t as f64 + 0.1 * i as f64)
                    };
                    b.add(i, j, v);
                    dense[i][j] = v;
                    dense[j][i] = v;
                }
            }
        }
        (b, dense)
    }

    #[test]
    fn solves_and_multiplies_like_the_dense_matrix() {
        for shift in [0.0, 3.7] {
            let (b, dense) = sample(9, shift);
            let x: Vec<f64> = (0..9).map(|i| 1.0 + 0.3 * i as f64).collect();
            let y = b.mul(&x);
            for i in 0..9 {
                let want: f64 = (0..9).map(|j| dense[i][j] * x[j]).sum();
                assert!((y[i] - want).abs() < 1e-12, "row {i}");
            }
            let back = b.factor().solve(&y);
            for i in 0..9 {
                assert!((back[i] - x[i]).abs() < 1e-10, "x[{i}] = {}", back[i]);
            }
        }
    }

    #[test]
    fn inertia_counts_negative_eigenvalues() {
        // diag(1, -2, 3, -4) with no coupling: two negative eigenvalues.
        let mut b = Band::zeros(4);
        for (i, v) in [1.0, -2.0, 3.0, -4.0].into_iter().enumerate() {
            b.add(i, i, v);
        }
        let f = b.factor();
        assert_eq!(f.negatives, 2);
        assert!(f.weakest < 0.0);
        // The positive definite sample has none.
        assert_eq!(sample(12, 0.0).0.factor().negatives, 0);
    }
}
