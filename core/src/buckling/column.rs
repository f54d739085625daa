//! Elastic critical load of a column about one axis by finite elements.
//!
//! The column runs from end A (x = 0) to end B (x = L). It is cut into
//! two-node beam elements with cubic (Hermite) deflection, two unknowns a
//! node (deflection w and rotation theta). Each element has the elastic
//! stiffness EI/h^3 [12, 6h, -12, 6h; ...] and the geometric stiffness
//! integral of N(x) (dN_i/dx)(dN_j/dx) dx, integrated exactly for an axial
//! force N varying linearly along the element by three-point Gauss
//! quadrature (the integrand is a polynomial of degree 5); for constant
//! N it is the familiar N/(30 h) [36, 3h, -36, 3h; ...] (common practice,
//! e.g. R. D. Cook, D. S. Malkus, M. E. Plesha, R. J. Witt, Concepts and
//! Applications of Finite Element Analysis, 4th ed., Wiley 2002, ch. 18).
//!
//! The axial force comes from the load pattern carried to end A: a point
//! load at `at_mm` compresses everything below it, the distributed load q
//! gives q (L - x). The critical load factor alpha_cr is the lowest
//! positive alpha with (K - alpha K_g) phi = 0.
//!
//! How it is found, so that it is certain to be the lowest: the number of
//! eigenvalues below a trial alpha equals the number of negative pivots
//! of K - alpha K_g (Sylvester's law of inertia, the Sturm-sequence
//! property; K is positive definite once the column is held). A Rayleigh
//! quotient after a few inverse iterations gives an upper bound; the
//! count brackets alpha_cr and bisection narrows the bracket to 1e-13;
//! inverse iteration at the bracket's lower end (where K - alpha K_g is
//! still positive definite, so its factorisation is stable) gives the
//! mode, whose Rayleigh quotient and residual are checked against the
//! bracket. Compressive loads only (tension is refused), so K_g is
//! positive semi-definite and every eigenvalue alpha is positive.
//!
//! [`analyse`] refines the mesh, doubling from 40 elements, until alpha_cr
//! changes by no more than 1e-6 (relative) and reports both values.

use serde::Serialize;

use super::band::Band;
use super::{Axis, Fixity, Support};
use crate::error::{Error, Result};

/// A length of column with one bending stiffness.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Part {
    /// Its length, mm.
    pub length_mm: f64,
    /// E I about the axis analysed, N mm2.
    pub ei_nmm2: f64,
}

/// A brace along the column (member key `restraints[index]`).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Brace {
    /// Its place in the model's `restraints` list (names it in errors).
    pub index: usize,
    /// Distance from end A, mm.
    pub at_mm: f64,
    /// Fixed, or a spring in kN/mm.
    pub translation: Fixity,
}

/// A point axial load (member key `axial_loads[index]`).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Load {
    /// Its place in the model's `axial_loads` list.
    pub index: usize,
    /// Distance from end A, mm.
    pub at_mm: f64,
    /// Compression, kN (at least 0).
    pub axial_kn: f64,
}

/// A column about one axis, as the analysis sees it.
#[derive(Debug, Clone, PartialEq)]
pub struct Column {
    /// Which axis (names it in errors and the working).
    pub axis: Axis,
    /// The member's length, mm.
    pub length_mm: f64,
    /// The segments from end A to end B (`segments`).
    pub parts: Vec<Part>,
    /// End A's support about this axis.
    pub a: Support,
    /// End B's support about this axis.
    pub b: Support,
    /// The braces acting about this axis.
    pub braces: Vec<Brace>,
    /// Point loads.
    pub loads: Vec<Load>,
    /// Distributed axial load, kN/m (= N/mm), at least 0.
    pub distributed_kn_per_m: f64,
}

/// One segment's share of the result.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SegmentBuckle {
    /// The largest compression in the segment under the pattern, kN.
    pub axial_kn: f64,
    /// alpha_cr times that compression, kN.
    pub critical_kn: f64,
    /// pi sqrt(E I / critical_kn) with the segment's own E I, mm; none
    /// for a segment the pattern does not compress.
    pub buckling_length_mm: Option<f64>,
}

/// The elastic critical load of a column about one axis.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Buckle {
    /// alpha_cr: the factor on the load pattern at which the column buckles.
    pub load_factor: f64,
    /// alpha_cr times the largest compression of the pattern, kN.
    pub critical_kn: f64,
    /// pi sqrt(E I / N_cr) of the most compressed segment, mm.
    pub buckling_length_mm: f64,
    /// The buckled shape: [x_mm, deflection] at every node, the largest
    /// deflection 1.
    pub mode: Vec<[f64; 2]>,
    /// The number of elements of the answer.
    pub elements: usize,
    /// alpha_cr with half as many elements (the convergence shown).
    pub load_factor_half: f64,
    /// Each segment, in order from end A.
    pub segments: Vec<SegmentBuckle>,
}

impl Buckle {
    /// This result for the same column with every length and position
    /// times `s` (stiffnesses, supports and loads kept), whose
    /// [`Column::length_power`] is `Some(power)`: alpha_cr / s^power, the
    /// critical forces / s^2, the buckling lengths and the shape's
    /// positions times s, a distributed load's forces times s (power 3).
    /// The discrete problem scales the same way (the mesh is by fractions
    /// of the length), so this is the analysis of the longer column to the
    /// bisection's tolerance.
    pub fn lengthened(&self, s: f64, power: i32) -> Buckle {
        let fall = s.powi(power);
        let force = if power == 3 { s } else { 1.0 };
        let critical = s * s;
        Buckle {
            load_factor: self.load_factor / fall,
            critical_kn: self.critical_kn / critical,
            buckling_length_mm: self.buckling_length_mm * s,
            mode: self.mode.iter().map(|[x, d]| [x * s, *d]).collect(),
            elements: self.elements,
            load_factor_half: self.load_factor_half / fall,
            segments: self
                .segments
                .iter()
                .map(|g| SegmentBuckle {
                    axial_kn: g.axial_kn * force,
                    critical_kn: g.critical_kn / critical,
                    buckling_length_mm: g.buckling_length_mm.map(|l| l * s),
                })
                .collect(),
        }
    }
}

/// The relative change of alpha_cr between meshes at which [`analyse`] stops.
pub const CONVERGED: f64 = 1e-6;
/// The first mesh of [`analyse`].
pub const FIRST_ELEMENTS: usize = 40;
/// The finest mesh [`analyse`] tries.
pub const MAX_ELEMENTS: usize = 2560;

fn key_error(key: String, reason: impl Into<String>) -> Error {
    Error::Key {
        key,
        reason: reason.into(),
    }
}

fn end_key(end: char, axis: Axis, what: &str) -> String {
    format!("buckling_model.ends.{end}.{}.{what}", axis.key())
}

/// A spring stiffness must be finite and at least zero.
fn spring_ok(f: Fixity, key: impl FnOnce() -> String) -> Result<()> {
    if let Fixity::Spring(k) = f {
        if !(k.is_finite() && k >= 0.0) {
            return Err(key_error(
                key(),
                format!("a spring stiffness must be a finite number of at least 0 (got {k})"),
            ));
        }
    }
    Ok(())
}

/// Whether a translation is held (fixed or a spring stiffer than 0).
fn holds(f: Fixity) -> bool {
    match f {
        Fixity::Fixed => true,
        Fixity::Free => false,
        Fixity::Spring(k) => k > 0.0,
    }
}

impl Column {
    /// A prismatic column of one stiffness, supported at its ends and
    /// loaded by `top_kn` at end B, with no braces.
    pub fn uniform(
        axis: Axis,
        length_mm: f64,
        ei_nmm2: f64,
        a: Support,
        b: Support,
        top_kn: f64,
    ) -> Column {
        Column {
            axis,
            length_mm,
            parts: vec![Part { length_mm, ei_nmm2 }],
            a,
            b,
            braces: vec![],
            loads: vec![Load {
                index: 0,
                at_mm: length_mm,
                axial_kn: top_kn,
            }],
            distributed_kn_per_m: 0.0,
        }
    }

    /// The power of the length scale by which alpha_cr falls when every
    /// length and position of the column is multiplied by `s`, its bending
    /// stiffnesses, supports and loads kept, where that is exact: with
    /// point loads only, alpha_cr / s^2 (the elastic stiffness goes as
    /// EI / L^3, the geometric as N / L); with a load along the length
    /// only, alpha_cr / s^3 (its forces grow with s). `None` with a spring
    /// (its stiffness does not scale with the length) or with both kinds of
    /// load (their ratio changes with the length).
    pub fn length_power(&self) -> Option<i32> {
        let sprung = |f: Fixity| matches!(f, Fixity::Spring(k) if k != 0.0);
        let ends = [self.a, self.b]
            .iter()
            .any(|s| sprung(s.translation) || sprung(s.rotation));
        if ends || self.braces.iter().any(|b| sprung(b.translation)) {
            return None;
        }
        let points = self.loads.iter().any(|l| l.axial_kn != 0.0);
        let along = self.distributed_kn_per_m != 0.0;
        match (points, along) {
            (true, false) => Some(2),
            (false, true) => Some(3),
            _ => None,
        }
    }

    /// Checks every key; the errors name them as in the member file.
    pub fn validate(&self) -> Result<()> {
        let l = self.length_mm;
        if !(l.is_finite() && l > 0.0) {
            return Err(Error::NotPositive {
                field: "length_mm",
                value: l,
            });
        }
        if self.parts.is_empty() {
            return Err(key_error(
                "buckling_model.segments".into(),
                "give at least one segment",
            ));
        }
        let mut total = 0.0;
        for (i, p) in self.parts.iter().enumerate() {
            if !(p.length_mm.is_finite() && p.length_mm > 0.0) {
                return Err(key_error(
                    format!("buckling_model.segments[{i}].length_mm"),
                    format!("must be a length greater than 0 (got {})", p.length_mm),
                ));
            }
            if !(p.ei_nmm2.is_finite() && p.ei_nmm2 > 0.0) {
                return Err(key_error(
                    format!("buckling_model.segments[{i}].section"),
                    format!(
                        "its bending stiffness E I about the {} axis is not positive",
                        self.axis.key()
                    ),
                ));
            }
            total += p.length_mm;
        }
        if (total - l).abs() > 1e-6 * l {
            return Err(key_error(
                "buckling_model.segments".into(),
                format!(
                    "the segments add up to {total} mm but the member is {l} mm long (length_mm); \
                     make their lengths add up to it"
                ),
            ));
        }
        for (end, s) in [('a', &self.a), ('b', &self.b)] {
            spring_ok(s.translation, || end_key(end, self.axis, "translation"))?;
            spring_ok(s.rotation, || end_key(end, self.axis, "rotation"))?;
        }
        for b in &self.braces {
            if !(b.at_mm.is_finite() && (0.0..=l).contains(&b.at_mm)) {
                return Err(key_error(
                    format!("buckling_model.restraints[{}].at_mm", b.index),
                    format!(
                        "{} mm is outside the member (0 to {l} mm from end A)",
                        b.at_mm
                    ),
                ));
            }
            let key = || format!("buckling_model.restraints[{}].translation", b.index);
            if b.translation == Fixity::Free {
                return Err(key_error(
                    key(),
                    "a restraint is \"fixed\" or a spring stiffness in kN/mm; a free one holds nothing",
                ));
            }
            spring_ok(b.translation, key)?;
        }
        for p in &self.loads {
            if !(p.at_mm.is_finite() && (0.0..=l).contains(&p.at_mm)) {
                return Err(key_error(
                    format!("buckling_model.axial_loads[{}].at_mm", p.index),
                    format!(
                        "{} mm is outside the member (0 to {l} mm from end A)",
                        p.at_mm
                    ),
                ));
            }
            if !(p.axial_kn.is_finite() && p.axial_kn >= 0.0) {
                return Err(key_error(
                    format!("buckling_model.axial_loads[{}].axial_kn", p.index),
                    format!(
                        "must be a compression of at least 0 kN (got {}); tension is not analysed",
                        p.axial_kn
                    ),
                ));
            }
        }
        let q = self.distributed_kn_per_m;
        if !(q.is_finite() && q >= 0.0) {
            return Err(key_error(
                "buckling_model.distributed_kn_per_m".into(),
                format!("must be a compression of at least 0 kN/m (got {q})"),
            ));
        }
        let pushes = self.loads.iter().any(|p| p.axial_kn > 0.0 && p.at_mm > 0.0) || q > 0.0;
        if !pushes {
            return Err(key_error(
                "buckling_model.axial_loads".into(),
                "the load pattern compresses no part of the column, so it cannot buckle under it",
            ));
        }
        let held = holds(self.a.translation)
            || holds(self.b.translation)
            || self.braces.iter().any(|b| holds(b.translation));
        if !held {
            return Err(key_error(
                "buckling_model.ends".into(),
                format!(
                    "nothing holds the column sideways about the {} axis (a mechanism): fix or \
                     spring a translation at an end, or add a restraint",
                    self.axis.key()
                ),
            ));
        }
        Ok(())
    }
}

/// The mesh and matrices of one element count.
struct Model {
    /// Node positions, mm.
    x: Vec<f64>,
    /// For each of the 2 x nodes unknowns, its row in the matrices (None: fixed).
    row: Vec<Option<usize>>,
    k: Band,
    kg: Band,
    /// Largest compression of each segment, N.
    seg_max_n: Vec<f64>,
}

/// The places that must be nodes: the ends, the segment joints, the
/// braces and the loads, in order, without near-repeats.
fn key_points(c: &Column) -> Vec<f64> {
    let l = c.length_mm;
    let mut pts = vec![0.0, l];
    let mut acc = 0.0;
    for p in &c.parts {
        acc += p.length_mm;
        pts.push(acc.min(l));
    }
    pts.extend(c.braces.iter().map(|b| b.at_mm));
    pts.extend(c.loads.iter().map(|p| p.at_mm));
    pts.sort_by(f64::total_cmp);
    let tol = 1e-9 * l;
    let mut out: Vec<f64> = Vec::with_capacity(pts.len());
    for p in pts {
        match out.last() {
            Some(&last) if p - last <= tol => {}
            _ => out.push(p),
        }
    }
    // The last point is L itself (a joint a rounding short of it merges).
    if let Some(last) = out.last_mut() {
        *last = l;
    }
    out
}

/// The index of the segment holding position `x` (the last one at L).
fn part_at(c: &Column, x: f64) -> usize {
    let mut acc = 0.0;
    for (i, p) in c.parts.iter().enumerate() {
        acc += p.length_mm;
        if x < acc {
            return i;
        }
    }
    c.parts.len().saturating_sub(1)
}

/// The node nearest to `x` (every key point is a node).
fn node_at(xs: &[f64], x: f64) -> usize {
    let i = xs.partition_point(|&v| v < x);
    match (i.checked_sub(1).and_then(|j| xs.get(j)), xs.get(i)) {
        (Some(&lo), Some(&hi)) if x - lo < hi - x => i - 1,
        (Some(_), None) => i - 1,
        _ => i,
    }
}

const GAUSS: [(f64, f64); 3] = [
    (0.112_701_665_379_258_3, 5.0 / 18.0),
    (0.5, 8.0 / 18.0),
    (0.887_298_334_620_741_7, 5.0 / 18.0),
];

/// Elastic and geometric stiffness of one element of length h, stiffness
/// ei, axial force n0 at its start and n1 at its end (compression positive).
fn element(h: f64, ei: f64, n0: f64, n1: f64) -> ([[f64; 4]; 4], [[f64; 4]; 4]) {
    let c = ei / (h * h * h);
    let (h2, h6, h4) = (2.0 * h * h, 6.0 * h, 4.0 * h * h);
    let ke = [
        [12.0 * c, h6 * c, -12.0 * c, h6 * c],
        [h6 * c, h4 * c, -h6 * c, h2 * c],
        [-12.0 * c, -h6 * c, 12.0 * c, -h6 * c],
        [h6 * c, h2 * c, -h6 * c, h4 * c],
    ];
    let mut kg = [[0.0; 4]; 4];
    for (xi, w) in GAUSS {
        let n = n0 + (n1 - n0) * xi;
        let s = 6.0 * (xi * xi - xi) / h;
        let d = [
            s,
            1.0 - 4.0 * xi + 3.0 * xi * xi,
            -s,
            3.0 * xi * xi - 2.0 * xi,
        ];
        for (row, di) in kg.iter_mut().zip(d) {
            for (v, dj) in row.iter_mut().zip(d) {
                *v += w * h * n * di * dj;
            }
        }
    }
    (ke, kg)
}

impl Model {
    fn new(c: &Column, elements: usize) -> Model {
        let l = c.length_mm;
        let keys = key_points(c);
        let mut x = Vec::with_capacity(elements + keys.len() + 1);
        for pair in keys.windows(2) {
            if let [x0, x1] = *pair {
                let m = ((elements as f64) * (x1 - x0) / l).round().max(1.0) as usize;
                for j in 0..m {
                    x.push(x0 + (x1 - x0) * j as f64 / m as f64);
                }
            }
        }
        x.push(l);
        let nodes = x.len();
        // Which unknowns are held rigidly.
        let mut fixed = vec![false; 2 * nodes];
        let mut hold = |i: usize| {
            if let Some(f) = fixed.get_mut(i) {
                *f = true;
            }
        };
        let last = nodes - 1;
        if c.a.translation == Fixity::Fixed {
            hold(0);
        }
        if c.a.rotation == Fixity::Fixed {
            hold(1);
        }
        if c.b.translation == Fixity::Fixed {
            hold(2 * last);
        }
        if c.b.rotation == Fixity::Fixed {
            hold(2 * last + 1);
        }
        for b in &c.braces {
            if b.translation == Fixity::Fixed {
                hold(2 * node_at(&x, b.at_mm));
            }
        }
        let mut next = 0;
        let row: Vec<Option<usize>> = fixed
            .iter()
            .map(|&f| {
                (!f).then(|| {
                    next += 1;
                    next - 1
                })
            })
            .collect();
        let mut k = Band::zeros(next);
        let mut kg = Band::zeros(next);
        let tol = 1e-9 * l;
        let q = c.distributed_kn_per_m; // kN/m = N/mm
        let mut seg_max_n = vec![0.0_f64; c.parts.len()];
        for (e, pair) in x.windows(2).enumerate() {
            let [x0, x1] = *pair else { continue };
            let part = part_at(c, 0.5 * (x0 + x1));
            let ei = c.parts.get(part).map_or(0.0, |p| p.ei_nmm2);
            let above: f64 = c
                .loads
                .iter()
                .filter(|p| p.at_mm >= x1 - tol)
                .map(|p| 1000.0 * p.axial_kn)
                .sum();
            let (n0, n1) = (above + q * (l - x0), above + q * (l - x1));
            if let Some(m) = seg_max_n.get_mut(part) {
                *m = m.max(n0);
            }
            let (ke, kge) = element(x1 - x0, ei, n0, n1);
            let dofs = [2 * e, 2 * e + 1, 2 * e + 2, 2 * e + 3];
            for ((&p, kr), gr) in dofs.iter().zip(&ke).zip(&kge) {
                let Some(Some(rp)) = row.get(p) else { continue };
                for ((&q, &kv), &gv) in dofs.iter().zip(kr).zip(gr) {
                    let Some(Some(rq)) = row.get(q) else { continue };
                    if rq >= rp {
                        k.add(*rp, *rq, kv);
                        kg.add(*rp, *rq, gv);
                    }
                }
            }
        }
        // Springs: kN/mm = 1e3 N/mm; kN m/rad = 1e6 N mm/rad.
        let mut spring = |dof: usize, f: Fixity, scale: f64| {
            if let (Fixity::Spring(s), Some(Some(r))) = (f, row.get(dof)) {
                k.add(*r, *r, s * scale);
            }
        };
        spring(0, c.a.translation, 1e3);
        spring(1, c.a.rotation, 1e6);
        spring(2 * last, c.b.translation, 1e3);
        spring(2 * last + 1, c.b.rotation, 1e6);
        for b in &c.braces {
            spring(2 * node_at(&x, b.at_mm), b.translation, 1e3);
        }
        Model {
            x,
            row,
            k,
            kg,
            seg_max_n,
        }
    }
}

/// A fixed-mesh solution: alpha_cr and the mode.
#[derive(Debug, Clone, PartialEq)]
pub struct Solution {
    /// alpha_cr.
    pub load_factor: f64,
    /// [x_mm, deflection] at every node, the largest deflection 1.
    pub mode: Vec<[f64; 2]>,
    /// The number of elements.
    pub elements: usize,
    /// The largest compression of each segment, kN.
    pub segment_kn: Vec<f64>,
}

/// The elastic and geometric stiffness matrices of about `elements`
/// elements, fixed unknowns removed (for cross-checks and benchmarks of
/// other solvers against [`solve`]). Validates first.
pub fn matrices(c: &Column, elements: usize) -> Result<(Band, Band)> {
    c.validate()?;
    let m = Model::new(c, elements.max(1));
    Ok((m.k, m.kg))
}

/// The number of eigenvalues of (K, K_g) below `s`.
fn below(k: &Band, kg: &Band, s: f64) -> usize {
    k.shifted(s, kg).factor().negatives
}

fn normalise(v: &mut [f64]) {
    let m = v.iter().fold(0.0_f64, |a, x| a.max(x.abs()));
    if m > 0.0 {
        v.iter_mut().for_each(|x| *x /= m);
    }
}

fn no_answer(axis: Axis, why: String) -> Error {
    key_error(
        "buckling_model".into(),
        format!(
            "the analysis about the {} axis found no critical load: {why}",
            axis.key()
        ),
    )
}

/// alpha_cr and the mode with about `elements` elements (every key point
/// is a node, so there may be a few more). Validates first.
pub fn solve(c: &Column, elements: usize) -> Result<Solution> {
    c.validate()?;
    let m = Model::new(c, elements.max(1));
    let Model { k, kg, .. } = &m;
    let kf = k.factor();
    if kf.negatives > 0 || kf.weakest <= 1e-12 {
        return Err(key_error(
            "buckling_model.ends".into(),
            format!(
                "the supports and restraints about the {} axis leave the column free to move as \
                 a rigid body (a mechanism): fix or spring a rotation, or hold a second point sideways",
                c.axis.key()
            ),
        ));
    }
    // Upper bound: the Rayleigh quotient after inverse iterations from a
    // generic start (no symmetry, so no mode is missed by it).
    let mut v: Vec<f64> = (0..k.len())
        .map(|r| 1.0 + 0.5 * crate::trig::sin(0.7 * r as f64 + 0.3))
        .collect();
    for _ in 0..4 {
        v = kf.solve(&kg.mul(&v));
        normalise(&mut v);
    }
    let (vk, vg) = (k.quadratic(&v), kg.quadratic(&v));
    if !(vg > 0.0 && vk > 0.0) {
        return Err(no_answer(
            c.axis,
            "the load pattern does not bend the column".into(),
        ));
    }
    let mut hi = vk / vg * (1.0 + 1e-9);
    let mut tries = 0;
    while below(k, kg, hi) == 0 {
        hi *= 2.0;
        tries += 1;
        if tries > 60 || !hi.is_finite() {
            return Err(no_answer(
                c.axis,
                "no eigenvalue below 2^60 times the estimate".into(),
            ));
        }
    }
    let mut lo = 0.5 * hi;
    tries = 0;
    while below(k, kg, lo) > 0 {
        lo *= 0.5;
        tries += 1;
        if tries > 200 {
            return Err(no_answer(
                c.axis,
                "no eigenvalue-free interval above zero".into(),
            ));
        }
    }
    let (lo, hi) = crate::roots::edge(
        lo,
        hi,
        |a, b| 0.5 * (a + b),
        |a, b| b - a <= 1e-13 * b,
        |mid| below(k, kg, mid) == 0,
    );
    // The mode by inverse iteration at lo (K - lo K_g positive definite).
    let shifted = k.shifted(lo, kg).factor();
    for _ in 0..6 {
        v = shifted.solve(&kg.mul(&v));
        normalise(&mut v);
    }
    let (vk, vg) = (k.quadratic(&v), kg.quadratic(&v));
    let rq = vk / vg;
    let kv = k.mul(&v);
    let gv = kg.mul(&v);
    let residual = kv
        .iter()
        .zip(&gv)
        .map(|(a, b)| (a - rq * b).powi(2))
        .sum::<f64>()
        .sqrt()
        / kv.iter().map(|a| a * a).sum::<f64>().sqrt();
    let alpha = 0.5 * (lo + hi);
    if !(rq.is_finite() && (rq - alpha).abs() <= 1e-6 * alpha && residual <= 1e-6) {
        return Err(no_answer(
            c.axis,
            format!(
                "the mode did not converge (Rayleigh quotient {rq}, bracket {lo} to {hi}, \
                 residual {residual})"
            ),
        ));
    }
    let mut w: Vec<f64> = (0..m.x.len())
        .map(|j| match m.row.get(2 * j) {
            Some(Some(r)) => v.get(*r).copied().unwrap_or(0.0),
            _ => 0.0,
        })
        .collect();
    normalise(&mut w);
    let peak = w
        .iter()
        .copied()
        .fold(0.0_f64, |a, b| if b.abs() > a.abs() { b } else { a });
    if peak < 0.0 {
        w.iter_mut().for_each(|x| *x = -*x);
    }
    Ok(Solution {
        load_factor: alpha,
        mode: m.x.iter().zip(&w).map(|(&x, &y)| [x, y]).collect(),
        elements: m.x.len() - 1,
        segment_kn: m.seg_max_n.iter().map(|n| n / 1000.0).collect(),
    })
}

/// alpha_cr with a mesh refined until it has converged (see the module
/// documentation), the mode and each segment's critical force and
/// buckling length.
pub fn analyse(c: &Column) -> Result<Buckle> {
    let mut previous = solve(c, FIRST_ELEMENTS)?;
    let mut n = FIRST_ELEMENTS;
    loop {
        n *= 2;
        let next = solve(c, n)?;
        let change = (next.load_factor - previous.load_factor).abs() / next.load_factor;
        if change <= CONVERGED {
            return Ok(finish(c, next, previous.load_factor));
        }
        if n >= MAX_ELEMENTS {
            return Err(no_answer(
                c.axis,
                format!(
                    "alpha_cr still changes by {change:.1e} between {} and {} elements",
                    previous.elements, next.elements
                ),
            ));
        }
        previous = next;
    }
}

/// The result of a solution, with each segment's share.
pub fn finish(c: &Column, s: Solution, load_factor_half: f64) -> Buckle {
    let alpha = s.load_factor;
    let segments: Vec<SegmentBuckle> = c
        .parts
        .iter()
        .zip(&s.segment_kn)
        .map(|(p, &n)| SegmentBuckle {
            axial_kn: n,
            critical_kn: alpha * n,
            buckling_length_mm: (n > 0.0)
                .then(|| std::f64::consts::PI * (p.ei_nmm2 / (alpha * n * 1000.0)).sqrt()),
        })
        .collect();
    let top = segments
        .iter()
        .copied()
        .reduce(|a, b| if b.axial_kn > a.axial_kn { b } else { a });
    Buckle {
        load_factor: alpha,
        critical_kn: top.map_or(0.0, |t| t.critical_kn),
        buckling_length_mm: top
            .and_then(|t| t.buckling_length_mm)
            .unwrap_or(f64::INFINITY),
        mode: s.mode,
        elements: s.elements,
        load_factor_half,
        segments,
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use std::f64::consts::PI;

    const EI: f64 = 2.0e12;
    const L: f64 = 4000.0;

    pub fn column(a: Support, b: Support) -> Column {
        Column::uniform(Axis::Major, L, EI, a, b, 1.0)
    }

    /// EI/L^2 in kN.
    fn unit() -> f64 {
        EI / (L * L) / 1000.0
    }

    #[test]
    fn a_longer_column_is_the_shorter_scaled_where_that_is_exact() {
        // A stepped column, fixed foot and pinned top, a rigid brace at a
        // third: with point loads (power 2) and with a load along the
        // length only (power 3), the analysis of the column 1.37 times as
        // long equals the shorter's result scaled.
        let base = |loads: Vec<Load>, q: f64, s: f64| Column {
            axis: Axis::Minor,
            length_mm: 6000.0 * s,
            parts: vec![
                Part {
                    length_mm: 4000.0 * s,
                    ei_nmm2: 3.0 * EI,
                },
                Part {
                    length_mm: 2000.0 * s,
                    ei_nmm2: EI,
                },
            ],
            a: Support::FIXED,
            b: Support::PINNED,
            braces: vec![Brace {
                index: 0,
                at_mm: 2000.0 * s,
                translation: Fixity::Fixed,
            }],
            loads: loads
                .iter()
                .map(|l| Load {
                    at_mm: l.at_mm * s,
                    ..*l
                })
                .collect(),
            distributed_kn_per_m: q,
        };
        let points = vec![
            Load {
                index: 0,
                at_mm: 4000.0,
                axial_kn: 300.0,
            },
            Load {
                index: 1,
                at_mm: 6000.0,
                axial_kn: 100.0,
            },
        ];
        let s = 1.37;
        for (loads, q, power) in [(points.clone(), 0.0, 2), (vec![], 2.5, 3)] {
            let short = base(loads.clone(), q, 1.0);
            assert_eq!(short.length_power(), Some(power));
            let want = analyse(&base(loads, q, s)).unwrap();
            let got = analyse(&short).unwrap().lengthened(s, power);
            let close = |a: f64, b: f64| (a - b).abs() <= 1e-9 * b.abs();
            assert!(
                close(got.load_factor, want.load_factor),
                "{} {}",
                got.load_factor,
                want.load_factor
            );
            assert!(close(got.critical_kn, want.critical_kn));
            assert!(close(got.buckling_length_mm, want.buckling_length_mm));
            assert_eq!(got.elements, want.elements);
            for (g, w) in got.segments.iter().zip(&want.segments) {
                assert!(close(g.axial_kn, w.axial_kn) && close(g.critical_kn, w.critical_kn));
                assert!(close(
                    g.buckling_length_mm.unwrap(),
                    w.buckling_length_mm.unwrap()
                ));
            }
            for (g, w) in got.mode.iter().zip(&want.mode) {
                assert!(
                    close(g[0], w[0]) && (g[1].abs() - w[1].abs()).abs() < 1e-6,
                    "{g:?} {w:?}"
                );
            }
        }
        // Not exact, so not offered: a spring, or both kinds of load.
        let mut sprung = base(points.clone(), 0.0, 1.0);
        sprung.b.rotation = Fixity::Spring(50.0);
        assert_eq!(sprung.length_power(), None);
        let mut braced = base(points.clone(), 0.0, 1.0);
        braced.braces[0].translation = Fixity::Spring(5.0);
        assert_eq!(braced.length_power(), None);
        assert_eq!(base(points, 1.0, 1.0).length_power(), None);
    }

    #[test]
    fn one_and_two_elements_give_the_textbook_values() {
        // One Hermite element, pinned-pinned: 12 EI/L^2 exactly; two
        // elements: 9.9438 EI/L^2 (common practice, worked by hand).
        let c = column(Support::PINNED, Support::PINNED);
        let one = solve(&c, 1).unwrap();
        assert_eq!(one.elements, 1);
        assert!(
            (one.load_factor / unit() - 12.0).abs() < 1e-9,
            "{}",
            one.load_factor / unit()
        );
        let two = solve(&c, 2).unwrap().load_factor / unit();
        assert!((two - 9.9438).abs() < 1e-4, "{two}");
    }

    #[test]
    fn pinned_column_converges_to_euler() {
        let c = column(Support::PINNED, Support::PINNED);
        let b = analyse(&c).unwrap();
        assert!((b.load_factor / unit() - PI * PI).abs() < 1e-6 * PI * PI);
        assert!((b.buckling_length_mm - L).abs() < 1e-3);
        // The mode is a half sine with its peak 1 at mid-height.
        let mid = b
            .mode
            .iter()
            .find(|p| (p[0] - L / 2.0).abs() < 1e-6)
            .unwrap();
        assert!((mid[1] - 1.0).abs() < 1e-9);
        for p in &b.mode {
            assert!(
                (p[1] - crate::trig::sin(PI * p[0] / L)).abs() < 1e-6,
                "{p:?}"
            );
        }
    }

    #[test]
    fn mechanisms_and_bad_keys_are_refused_by_name() {
        let key = |c: &Column| solve(c, 10).unwrap_err().key().unwrap().to_string();
        assert_eq!(
            key(&column(Support::FREE, Support::FREE)),
            "buckling_model.ends"
        );
        // Held sideways at one point only and nowhere against turning.
        assert_eq!(
            key(&column(Support::PINNED, Support::FREE)),
            "buckling_model.ends"
        );
        let mut c = column(Support::PINNED, Support::PINNED);
        c.parts[0].length_mm = 3000.0;
        assert_eq!(key(&c), "buckling_model.segments");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.braces.push(Brace {
            index: 0,
            at_mm: L + 1.0,
            translation: Fixity::Fixed,
        });
        assert_eq!(key(&c), "buckling_model.restraints[0].at_mm");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.a.rotation = Fixity::Spring(-1.0);
        assert_eq!(key(&c), "buckling_model.ends.a.major.rotation");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.b.translation = Fixity::Spring(f64::NAN);
        assert_eq!(key(&c), "buckling_model.ends.b.major.translation");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.loads[0].axial_kn = -5.0;
        assert_eq!(key(&c), "buckling_model.axial_loads[0].axial_kn");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.loads[0].axial_kn = 0.0;
        assert_eq!(key(&c), "buckling_model.axial_loads");
        let mut c = column(Support::PINNED, Support::PINNED);
        c.distributed_kn_per_m = f64::INFINITY;
        assert_eq!(key(&c), "buckling_model.distributed_kn_per_m");
    }
}
