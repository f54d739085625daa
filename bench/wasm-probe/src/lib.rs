//! Size probe: how many bytes of wasm the buckling analysis adds (see
//! bench/buckling.md). Build with `bash run.sh` from this directory.

use strutline_core::buckling::column::{analyse, Column};
use strutline_core::buckling::{Axis, Fixity, Support};

fn col(l: f64, ei: f64, r: f64) -> Column {
    let s = Support { translation: Fixity::Fixed, rotation: Fixity::Spring(r) };
    Column::uniform(Axis::Major, l, ei, s, Support::PINNED, 1.0)
}

#[no_mangle]
pub extern "C" fn probe(l: f64, ei: f64, r: f64) -> f64 {
    let mut out = l + ei + r;
    // Every variant validates a column and formats its error (the app
    // already carries error and number formatting), so the differences
    // between variants are the solvers alone.
    if let Err(e) = col(l, ei, r).validate() {
        out += e.to_string().len() as f64;
    }
    #[cfg(feature = "chart")]
    {
        use strutline_core::buckling::chart::{k_factor, Frame, FrameKey};
        out += k_factor(&Frame { sway: r > 1.0, g_a: l, g_b: ei }, FrameKey::Major).unwrap_or(0.0);
    }
    #[cfg(feature = "fe")]
    {
        if let Ok(b) = analyse(&col(l, ei, r)) {
            out += b.load_factor + b.mode.iter().map(|p| p[1]).sum::<f64>();
        }
    }
    #[cfg(feature = "dense")]
    {
        use nalgebra::DMatrix;
        use strutline_core::buckling::column::matrices;
        if let Ok((k, kg)) = matrices(&col(l, ei, r), l as usize) {
            let n = k.len();
            let kd = DMatrix::from_fn(n, n, |i, j| k.get(i, j));
            let gd = DMatrix::from_fn(n, n, |i, j| kg.get(i, j));
            if let Some(ch) = kd.cholesky() {
                if let Some(li) = ch.l().try_inverse() {
                    let c = &li * gd * li.transpose();
                    let e = c.symmetric_eigen();
                    out += e.eigenvalues.max() + e.eigenvectors[(0, 0)];
                }
            }
        }
    }
    let _ = col;
    out
}
