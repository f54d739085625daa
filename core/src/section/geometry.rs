//! Building blocks for exact section properties.
//!
//! A section is composed, with signs, from two primitives whose integrals
//! are known in closed form: axis-parallel rectangles and quarter discs.
//! A fillet (the "spandrel" between two faces meeting at a right angle and
//! a circular arc of radius r tangent to both) is a square r x r minus a
//! quarter disc; a rounded corner is a square minus a spandrel; a hollow
//! corner is an outer rounded corner minus an inner one, with independent
//! radii (so non-concentric corners are exact too).
//!
//! Coordinates: `y` horizontal (along the width), `z` vertical (along the
//! depth), in mm, origin wherever the caller puts it (the shape modules
//! use the bottom-left corner of the bounding box). [`Moments`] holds the
//! integrals about that origin; the parallel-axis theorem turns them into
//! centroidal second moments.
//!
//! Everything here works on fixed-size arrays on the stack: nothing
//! allocates, so the property computation can sit in a hot loop.
//!
//! Plastic moduli use exact clipping of the primitives by an axis-parallel
//! line (a quarter disc cut by a chord has closed-form area and first
//! moment). For lines at any angle (angle sections about their principal
//! axes) [`Poly`] integrates over a polygon of the outline, clipped by a
//! half-plane with Green's theorem. The equal-area line is found by a
//! safeguarded Newton iteration whose derivative is the width of the
//! section along the line.

use std::f64::consts::PI;

use crate::roots::{newton_bisect, Stop};

/// Integrals of a plane region about the origin: A, ∫y, ∫z, ∫y², ∫z², ∫yz.
#[derive(Debug, Clone, Copy, Default, PartialEq)]
pub struct Moments {
    /// Area, mm2.
    pub a: f64,
    /// ∫ y dA, mm3.
    pub sy: f64,
    /// ∫ z dA, mm3.
    pub sz: f64,
    /// ∫ y² dA, mm4.
    pub yy: f64,
    /// ∫ z² dA, mm4.
    pub zz: f64,
    /// ∫ y z dA, mm4.
    pub yz: f64,
}

impl Moments {
    /// `self + sign * other`.
    pub fn add(self, o: Moments, sign: f64) -> Moments {
        Moments {
            a: self.a + sign * o.a,
            sy: self.sy + sign * o.sy,
            sz: self.sz + sign * o.sz,
            yy: self.yy + sign * o.yy,
            zz: self.zz + sign * o.zz,
            yz: self.yz + sign * o.yz,
        }
    }

    /// Centroid (y, z).
    pub fn centroid(&self) -> (f64, f64) {
        (self.sy / self.a, self.sz / self.a)
    }

    /// Centroidal second moments (I_y = ∫z'², I_z = ∫y'², I_yz = ∫y'z').
    pub fn centroidal(&self) -> (f64, f64, f64) {
        let (yc, zc) = self.centroid();
        (
            self.zz - self.a * zc * zc,
            self.yy - self.a * yc * yc,
            self.yz - self.a * yc * zc,
        )
    }
}

/// A primitive region.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Prim {
    /// The rectangle [y0, y1] x [z0, z1] (y0 <= y1, z0 <= z1).
    Rect {
        /// Left edge.
        y0: f64,
        /// Right edge.
        y1: f64,
        /// Bottom edge.
        z0: f64,
        /// Top edge.
        z1: f64,
    },
    /// A quarter disc of radius `r` centred at (cy, cz), lying in the
    /// quadrant given by the signs `qy`, `qz` (each +1 or -1).
    QuarterDisc {
        /// Centre y.
        cy: f64,
        /// Centre z.
        cz: f64,
        /// Radius.
        r: f64,
        /// +1: the disc lies at y >= cy; -1: at y <= cy.
        qy: f64,
        /// +1: the disc lies at z >= cz; -1: at z <= cz.
        qz: f64,
    },
}

/// Area and first moment ∫z dA of the part of a quarter disc (centre
/// height `cz`, radius `r`, side `qz`) lying at z <= c.
fn quarter_disc_below(cz: f64, r: f64, qz: f64, c: f64) -> (f64, f64) {
    if r <= 0.0 {
        return (0.0, 0.0);
    }
    // Local coordinate t = qz (z - cz) in [0, r], width sqrt(r² - t²):
    // from 0 to x, area = (x s + r² asin(x/r))/2 and ∫t dA = (r³ - s³)/3
    // with s = sqrt(r² - x²). The trigonometry runs only when the line
    // actually cuts the disc.
    let full_a = PI * r * r / 4.0;
    let full_m = r * r * r / 3.0;
    let part = |x: f64| -> (f64, f64) {
        if x <= 0.0 {
            (0.0, 0.0)
        } else if x >= r {
            (full_a, full_m)
        } else {
            let s = (r * r - x * x).sqrt();
            (
                0.5 * (x * s + r * r * (x / r).asin()),
                (r * r * r - s * s * s) / 3.0,
            )
        }
    };
    let (a, m) = if qz > 0.0 {
        part(c - cz)
    } else {
        let (a0, m0) = part(cz - c);
        (full_a - a0, full_m - m0)
    };
    (a, cz * a + qz * m)
}

impl Prim {
    /// Integrals about the origin.
    pub fn moments(&self) -> Moments {
        match *self {
            Prim::Rect { y0, y1, z0, z1 } => {
                let (w, h) = (y1 - y0, z1 - z0);
                let a = w * h;
                let (yc, zc) = (0.5 * (y0 + y1), 0.5 * (z0 + z1));
                Moments {
                    a,
                    sy: a * yc,
                    sz: a * zc,
                    yy: a * (yc * yc + w * w / 12.0),
                    zz: a * (zc * zc + h * h / 12.0),
                    yz: a * yc * zc,
                }
            }
            Prim::QuarterDisc { cy, cz, r, qy, qz } => {
                let a = PI * r * r / 4.0;
                let d = 4.0 * r / (3.0 * PI);
                // About the centre: ∫y'² = ∫z'² = π r⁴ / 16, ∫y'z' = qy qz r⁴ / 8.
                let i0 = PI * r.powi(4) / 16.0;
                let p0 = qy * qz * r.powi(4) / 8.0;
                let (fy, fz) = (qy * d * a, qz * d * a);
                Moments {
                    a,
                    sy: cy * a + fy,
                    sz: cz * a + fz,
                    yy: i0 + 2.0 * cy * fy + cy * cy * a,
                    zz: i0 + 2.0 * cz * fz + cz * cz * a,
                    yz: p0 + cy * fz + cz * fy + cy * cz * a,
                }
            }
        }
    }

    /// Area and ∫z dA (cheaper than [`Prim::moments`]).
    pub fn area_and_first(&self) -> (f64, f64) {
        match *self {
            Prim::Rect { y0, y1, z0, z1 } => {
                let a = (y1 - y0) * (z1 - z0);
                (a, a * 0.5 * (z0 + z1))
            }
            Prim::QuarterDisc { cz, r, qz, .. } => {
                let a = PI * r * r / 4.0;
                (a, cz * a + qz * r * r * r / 3.0)
            }
        }
    }

    /// The same primitive with y and z exchanged.
    pub fn swapped(&self) -> Prim {
        match *self {
            Prim::Rect { y0, y1, z0, z1 } => Prim::Rect {
                y0: z0,
                y1: z1,
                z0: y0,
                z1: y1,
            },
            Prim::QuarterDisc { cy, cz, r, qy, qz } => Prim::QuarterDisc {
                cy: cz,
                cz: cy,
                r,
                qy: qz,
                qz: qy,
            },
        }
    }

    /// Area and ∫z dA of the part at z <= c.
    pub fn below(&self, c: f64) -> (f64, f64) {
        match *self {
            Prim::Rect { y0, y1, z0, z1 } => {
                let top = c.clamp(z0, z1);
                let a = (y1 - y0) * (top - z0);
                (a, a * 0.5 * (z0 + top))
            }
            Prim::QuarterDisc { cz, r, qz, .. } => quarter_disc_below(cz, r, qz, c),
        }
    }

    /// Width of the primitive along the line z = c.
    pub fn width_at(&self, c: f64) -> f64 {
        match *self {
            Prim::Rect { y0, y1, z0, z1 } => {
                if c > z0 && c < z1 {
                    y1 - y0
                } else {
                    0.0
                }
            }
            Prim::QuarterDisc { cz, r, qz, .. } => {
                let t = qz * (c - cz);
                if t > 0.0 && t < r {
                    (r * r - t * t).sqrt()
                } else {
                    0.0
                }
            }
        }
    }

    /// Extent in z.
    pub fn z_range(&self) -> (f64, f64) {
        match *self {
            Prim::Rect { z0, z1, .. } => (z0, z1),
            Prim::QuarterDisc { cz, r, qz, .. } => {
                if qz > 0.0 {
                    (cz, cz + r)
                } else {
                    (cz - r, cz)
                }
            }
        }
    }
}

/// The axis a plastic neutral line runs parallel to.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Axis {
    /// A line z = c (bending about y).
    Y,
    /// A line y = c (bending about z).
    Z,
}

const PARTS: usize = 24;

/// A signed sum of primitives, on the stack.
#[derive(Debug, Clone, Copy)]
pub struct Parts {
    items: [(Prim, f64); PARTS],
    n: usize,
}

impl Default for Parts {
    fn default() -> Self {
        Self::new()
    }
}

impl Parts {
    /// No parts.
    pub fn new() -> Parts {
        Parts {
            items: [(
                Prim::Rect {
                    y0: 0.0,
                    y1: 0.0,
                    z0: 0.0,
                    z1: 0.0,
                },
                0.0,
            ); PARTS],
            n: 0,
        }
    }

    fn push(&mut self, p: Prim, sign: f64) {
        if let Some(slot) = self.items.get_mut(self.n) {
            *slot = (p, sign);
            self.n += 1;
        }
    }

    fn iter(&self) -> impl Iterator<Item = &(Prim, f64)> {
        self.items.iter().take(self.n)
    }

    /// Adds the rectangle [y0, y1] x [z0, z1].
    pub fn rect(&mut self, y0: f64, y1: f64, z0: f64, z1: f64, sign: f64) {
        self.push(Prim::Rect { y0, y1, z0, z1 }, sign);
    }

    /// Adds a quarter disc.
    pub fn quarter_disc(&mut self, cy: f64, cz: f64, r: f64, qy: f64, qz: f64, sign: f64) {
        if r > 0.0 {
            self.push(Prim::QuarterDisc { cy, cz, r, qy, qz }, sign);
        }
    }

    /// Adds (sign +1) or removes (-1) the spandrel of radius `r` in the
    /// right-angled corner at (y, z) whose faces run towards +qy and +qz:
    /// the square [y, y + qy r] x [z, z + qz r] less the quarter disc
    /// centred at the far corner of that square.
    pub fn spandrel(&mut self, y: f64, z: f64, r: f64, qy: f64, qz: f64, sign: f64) {
        if r <= 0.0 {
            return;
        }
        let (y1, z1) = (y + qy * r, z + qz * r);
        self.rect(y.min(y1), y.max(y1), z.min(z1), z.max(z1), sign);
        self.quarter_disc(y1, z1, r, -qy, -qz, -sign);
    }

    /// Integrals about the origin.
    pub fn moments(&self) -> Moments {
        self.iter()
            .fold(Moments::default(), |m, (p, s)| m.add(p.moments(), *s))
    }

    fn oriented(p: &Prim, axis: Axis) -> Prim {
        match axis {
            Axis::Y => *p,
            Axis::Z => p.swapped(),
        }
    }

    /// Net area on the low side of the line (z <= c for `Axis::Y`, y <= c for `Axis::Z`).
    pub fn area_below(&self, axis: Axis, c: f64) -> f64 {
        self.iter()
            .map(|(p, s)| s * Self::oriented(p, axis).below(c).0)
            .sum()
    }

    /// ∫ |d| dA where d is the distance from the line (z = c or y = c).
    pub fn abs_moment(&self, axis: Axis, c: f64) -> f64 {
        self.iter()
            .map(|(p, s)| {
                let q = Self::oriented(p, axis);
                let (a, first) = q.area_and_first();
                let (ab, qb) = q.below(c);
                let above = (first - qb) - c * (a - ab);
                let below = c * ab - qb;
                s * (above + below)
            })
            .sum()
    }

    /// Extent across the line direction.
    pub fn range(&self, axis: Axis) -> (f64, f64) {
        self.iter()
            .map(|(p, _)| Self::oriented(p, axis).z_range())
            .fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), (a, b)| {
                (lo.min(a), hi.max(b))
            })
    }

    /// Net area on the low side of the line and the net width along it.
    fn area_below_and_width(&self, axis: Axis, c: f64) -> (f64, f64) {
        self.iter().fold((0.0, 0.0), |(a, w), (p, s)| {
            let q = Self::oriented(p, axis);
            (a + s * q.below(c).0, w + s * q.width_at(c))
        })
    }

    /// Plastic modulus for bending about `axis`: ∫|d| dA about the
    /// equal-area line. `symmetric_at` gives the line when the section is
    /// symmetric about it (no search); otherwise Newton's method on the
    /// area below the line (whose derivative is the width along it),
    /// safeguarded by bisection, starting from the centroid.
    pub fn plastic_modulus(&self, axis: Axis, symmetric_at: Option<f64>) -> f64 {
        let c = match symmetric_at {
            Some(c) => c,
            None => {
                let m = self.moments();
                let half = 0.5 * m.a;
                let (lo, hi) = self.range(axis);
                let start = match axis {
                    Axis::Y => m.sz / m.a,
                    Axis::Z => m.sy / m.a,
                };
                newton_bisect(
                    |c| {
                        let (a, w) = self.area_below_and_width(axis, c);
                        (a - half, w)
                    },
                    lo,
                    hi,
                    start,
                    Stop::on_value(1e-12 * half),
                )
            }
        };
        self.abs_moment(axis, c)
    }
}

const POLY: usize = 64;

/// A closed polygon (last point joins the first), on the stack.
/// Counter-clockwise for a solid outline, clockwise for a hole.
#[derive(Debug, Clone, Copy)]
pub struct Poly {
    pts: [(f64, f64); POLY],
    n: usize,
    /// The arcs drawn with [`Poly::arc`]: (centre y, centre z, r, a0, a1).
    arcs: [(f64, f64, f64, f64, f64); ARCS],
    n_arcs: usize,
}

const ARCS: usize = 8;

impl Default for Poly {
    fn default() -> Self {
        Self::new()
    }
}

impl Poly {
    /// No points.
    pub fn new() -> Poly {
        Poly {
            pts: [(0.0, 0.0); POLY],
            n: 0,
            arcs: [(0.0, 0.0, 0.0, 0.0, 0.0); ARCS],
            n_arcs: 0,
        }
    }

    /// Appends a vertex (skipping a repeat of the previous one).
    pub fn push(&mut self, y: f64, z: f64) {
        if let Some(&(py, pz)) = self.points().last() {
            if (py - y).abs() < 1e-12 && (pz - z).abs() < 1e-12 {
                return;
            }
        }
        if let Some(slot) = self.pts.get_mut(self.n) {
            *slot = (y, z);
            self.n += 1;
        }
    }

    /// Appends an arc of radius `r` about (cy, cz) from angle `a0` to `a1`
    /// (radians from +y towards +z) in `segs` chords; a zero radius adds
    /// the centre only.
    pub fn arc(&mut self, cy: f64, cz: f64, r: f64, a0: f64, a1: f64, segs: usize) {
        if r <= 0.0 {
            self.push(cy, cz);
            return;
        }
        if let Some(slot) = self.arcs.get_mut(self.n_arcs) {
            *slot = (cy, cz, r, a0, a1);
            self.n_arcs += 1;
        }
        let segs = segs.max(1);
        if let Some(()) = self.quarter_arc(cy, cz, r, a0, a1, segs) {
            return;
        }
        // Rotate the radius vector step by step: two sin_cos per arc.
        let (ds, dc) = crate::trig::sin_cos((a1 - a0) / segs as f64);
        let (mut s, mut c) = crate::trig::sin_cos(a0);
        for _ in 0..=segs {
            self.push(cy + r * c, cz + r * s);
            (c, s) = (c * dc - s * ds, s * dc + c * ds);
        }
    }

    /// A quarter arc from a multiple of π/2 in 8 chords, from a table of
    /// cos(kπ/16) (exact end points, no trigonometry); `None` for any
    /// other arc.
    fn quarter_arc(
        &mut self,
        cy: f64,
        cz: f64,
        r: f64,
        a0: f64,
        a1: f64,
        segs: usize,
    ) -> Option<()> {
        const COS: [f64; 9] = [
            1.0,
            0.980_785_280_403_230_4,
            0.923_879_532_511_286_7,
            0.831_469_612_302_545_2,
            std::f64::consts::FRAC_1_SQRT_2,
            0.555_570_233_019_602_2,
            0.382_683_432_365_089_8,
            0.195_090_322_016_128_25,
            0.0,
        ];
        let q = a0 / (0.5 * PI);
        let sweep = (a1 - a0) / (0.5 * PI);
        if segs != 8 || (q - q.round()).abs() > 1e-12 || ((sweep.abs() - 1.0).abs() > 1e-12) {
            return None;
        }
        let dir = sweep.signum();
        let quadrant = (q.round() as i64).rem_euclid(4);
        for k in 0..=8usize {
            let c = *COS.get(k)?;
            let s = dir * *COS.get(8 - k)?;
            let (x, y) = match quadrant {
                0 => (c, s),
                1 => (-s, c),
                2 => (-c, -s),
                _ => (s, -c),
            };
            self.push(cy + r * x, cz + r * y);
        }
        Some(())
    }

    /// The vertices.
    pub fn points(&self) -> &[(f64, f64)] {
        self.pts.get(..self.n).unwrap_or(&[])
    }

    /// Reverses the direction (a solid outline becomes a hole).
    pub fn reverse(&mut self) {
        if let Some(pts) = self.pts.get_mut(..self.n) {
            pts.reverse();
        }
    }

    /// Moves every vertex by (dy, dz).
    pub fn shift(&mut self, dy: f64, dz: f64) {
        let n = self.n;
        for p in self.pts.iter_mut().take(n) {
            p.0 += dy;
            p.1 += dz;
        }
        let n_arcs = self.n_arcs;
        for a in self.arcs.iter_mut().take(n_arcs) {
            a.0 += dy;
            a.1 += dz;
        }
    }

    /// Largest |t| (t = -y sinθ + z cosθ) over the outline: the vertices
    /// and, exactly, the recorded arcs (whose farthest point may lie
    /// between two vertices).
    pub fn extreme_t(&self, sin: f64, cos: f64) -> f64 {
        let theta = sin.atan2(cos);
        let mut far = self
            .points()
            .iter()
            .fold(0.0f64, |m, (y, z)| m.max((-y * sin + z * cos).abs()));
        for &(cy, cz, r, a0, a1) in self.arcs.iter().take(self.n_arcs) {
            // On the arc t(φ) = t_c + r sin(φ - θ): extremes at φ = θ ± π/2.
            let tc = -cy * sin + cz * cos;
            let (lo, hi) = (a0.min(a1), a0.max(a1));
            for (phi, t) in [(theta + 0.5 * PI, tc + r), (theta - 0.5 * PI, tc - r)] {
                let turns = ((phi - lo) / (2.0 * PI)).floor();
                if phi - 2.0 * PI * turns <= hi {
                    far = far.max(t.abs());
                }
            }
        }
        far
    }

    fn edges(&self) -> impl Iterator<Item = ((f64, f64), (f64, f64))> + '_ {
        let pts = self.points();
        let n = pts.len();
        (0..n).filter_map(move |i| Some((*pts.get(i)?, *pts.get((i + 1) % n)?)))
    }

    /// Signed area (positive counter-clockwise).
    pub fn area(&self) -> f64 {
        0.5 * self
            .edges()
            .map(|((y0, z0), (y1, z1))| y0 * z1 - y1 * z0)
            .sum::<f64>()
    }

    /// The vertices in rotated coordinates (s, t) = (y cosθ + z sinθ,
    /// -y sinθ + z cosθ): s along the direction θ, t normal to it.
    fn rotated(&self, sin: f64, cos: f64) -> ([(f64, f64); POLY], usize) {
        let mut st = [(0.0, 0.0); POLY];
        for (o, (y, z)) in st.iter_mut().zip(self.points()) {
            *o = (y * cos + z * sin, -y * sin + z * cos);
        }
        (st, self.n)
    }

    /// For the line t = c, with t = -y sinθ + z cosθ the distance normal
    /// to the direction θ: (area where t >= c, ∫(t - c) dA there, area
    /// where t <= c, ∫(t - c) dA there). Green's theorem over the edges
    /// clipped to each side; the closing pieces along the line contribute
    /// nothing because t - c vanishes on it.
    pub fn split(&self, sin: f64, cos: f64, c: f64) -> (f64, f64, f64, f64) {
        let (st, n) = self.rotated(sin, cos);
        let s = split_rotated(st.get(..n).unwrap_or(&[]), c);
        (s.0, s.1, s.2, s.3)
    }

    /// Range of t = -y sinθ + z cosθ over the vertices.
    pub fn t_range(&self, sin: f64, cos: f64) -> (f64, f64) {
        self.points()
            .iter()
            .map(|(y, z)| -y * sin + z * cos)
            .fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), t| {
                (lo.min(t), hi.max(t))
            })
    }

    /// Bending about an axis through the origin at angle θ: (plastic
    /// modulus, largest distance of the outline from the axis, arcs exact). The
    /// equal-area line parallel to the axis is found by
    /// [`crate::roots::newton_bisect`] starting at the origin (put the centroid
    /// there); `area` is the polygon's own area.
    pub fn bending(&self, theta: f64, area: f64) -> (f64, f64) {
        let (sin, cos) = crate::trig::sin_cos(theta);
        let (st, n) = self.rotated(sin, cos);
        let st = st.get(..n).unwrap_or(&[]);
        let half = 0.5 * area;
        let (lo, hi) = st
            .iter()
            .fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), &(_, t)| {
                (lo.min(t), hi.max(t))
            });
        // The modulus is stationary at the equal-area line, so a line
        // 1e-10 A off changes it by far less than that.
        let c = newton_bisect(
            |c| {
                let (a_hi, chord) = area_above_and_chord(st, c);
                (half - a_hi, chord)
            },
            lo,
            hi,
            0.0,
            Stop::on_value(1e-10 * half.abs()),
        );
        let (_, m_hi, _, m_lo, _) = split_rotated(st, c);
        (m_hi - m_lo, self.extreme_t(sin, cos))
    }

    /// ∫ t (s² + t²) dA over the polygon in the rotated coordinates (s, t)
    /// of [`Poly::split`] (s along the direction θ, t normal to it), mm⁵:
    /// the integral of the monosymmetry property of a section bent about
    /// the axis at θ (put the centroid at the origin). Exact for the
    /// polygon by Green's theorem: over an edge from (s0, t0) to (s1, t1)
    /// with c = s0 t1 - s1 t0, ∫ s² t dA gains c (3 s0² t0 + s0² t1 + 2 s0
    /// s1 t0 + 2 s0 s1 t1 + s1² t0 + 3 s1² t1) / 60 and ∫ t³ dA gains
    /// c (t0³ + t0² t1 + t0 t1² + t1³) / 20 (the polygon-moment formulas,
    /// e.g. Steger, "On the calculation of arbitrary moments of polygons",
    /// 1996, recalled from memory; checked on rectangles in the tests).
    pub fn wagner(&self, sin: f64, cos: f64) -> f64 {
        let (st, n) = self.rotated(sin, cos);
        let st = st.get(..n).unwrap_or(&[]);
        let (mut s2t, mut t3) = (0.0, 0.0);
        for (&(s0, t0), &(s1, t1)) in closed_edges(st) {
            let c = s0 * t1 - s1 * t0;
            s2t += c
                * (3.0 * s0 * s0 * t0
                    + s0 * s0 * t1
                    + 2.0 * s0 * s1 * t0
                    + 2.0 * s0 * s1 * t1
                    + s1 * s1 * t0
                    + 3.0 * s1 * s1 * t1)
                / 60.0;
            t3 += c * (t0 * t0 * t0 + t0 * t0 * t1 + t0 * t1 * t1 + t1 * t1 * t1) / 20.0;
        }
        s2t + t3
    }

    /// Plastic modulus for bending about an axis through the origin at angle θ.
    pub fn plastic_modulus(&self, theta: f64) -> f64 {
        self.bending(theta, self.area()).0
    }
}

/// The edges of a closed polygon as pairs of consecutive vertices.
fn closed_edges(st: &[(f64, f64)]) -> impl Iterator<Item = (&(f64, f64), &(f64, f64))> {
    st.iter().zip(st.iter().skip(1).chain(st.first()))
}

/// Area at t >= c and the chord length along t = c (the cheap part of
/// [`split_rotated`], for the root search).
fn area_above_and_chord(st: &[(f64, f64)], c: f64) -> (f64, f64) {
    let (mut a_hi, mut chord) = (0.0, 0.0);
    for (&(s0, t0), &(s1, t1)) in closed_edges(st) {
        let (t0, t1) = (t0 - c, t1 - c);
        match (t0 >= 0.0, t1 >= 0.0) {
            (true, true) => a_hi -= 0.5 * (t0 + t1) * (s1 - s0),
            (false, false) => {}
            (up0, _) => {
                let sx = s0 + t0 / (t0 - t1) * (s1 - s0);
                if up0 {
                    a_hi -= 0.5 * t0 * (sx - s0);
                    chord -= sx;
                } else {
                    a_hi -= 0.5 * t1 * (s1 - sx);
                    chord += sx;
                }
            }
        }
    }
    (a_hi, chord)
}

/// [`Poly::split`] on rotated vertices, plus the chord length along the line.
fn split_rotated(st: &[(f64, f64)], c: f64) -> (f64, f64, f64, f64, f64) {
    let (mut a_hi, mut m_hi, mut a_lo, mut m_lo, mut chord) = (0.0, 0.0, 0.0, 0.0, 0.0);
    // Integrals of -t ds and -t²/2 ds along a straight piece.
    let piece = |sa: f64, ta: f64, sb: f64, tb: f64| {
        let ds = sb - sa;
        (
            -0.5 * (ta + tb) * ds,
            -ds * (ta * ta + ta * tb + tb * tb) / 6.0,
        )
    };
    for (&(s0, t0), &(s1, t1)) in closed_edges(st) {
        let (t0, t1) = (t0 - c, t1 - c);
        let mut add = |hi: bool, (a, m): (f64, f64)| {
            if hi {
                a_hi += a;
                m_hi += m;
            } else {
                a_lo += a;
                m_lo += m;
            }
        };
        if (t0 >= 0.0) == (t1 >= 0.0) {
            add(t0 >= 0.0, piece(s0, t0, s1, t1));
        } else {
            let lam = t0 / (t0 - t1);
            let sx = s0 + lam * (s1 - s0);
            add(t0 >= 0.0, piece(s0, t0, sx, 0.0));
            add(t1 >= 0.0, piece(sx, 0.0, s1, t1));
            // Counter-clockwise: the boundary crosses upwards on the
            // right end of each chord and downwards on its left end.
            chord += if t1 >= 0.0 { sx } else { -sx };
        }
    }
    (a_hi, m_hi, a_lo, m_lo, chord)
}

#[cfg(test)]
mod tests {
    #![allow(clippy::disallowed_methods)]
    // The standard library's functions are the reference here.
    use super::*;

    fn close(a: f64, b: f64, tol: f64) {
        assert!(
            (a - b).abs() <= tol * b.abs().max(1.0),
            "{a} vs {b} (tol {tol})"
        );
    }

    #[test]
    fn wagner_integral_of_rectangles() {
        // [0, a] x [0, b]: ∫ (y² z + z³) dA = a³ b² / 6 + a b⁴ / 4.
        let (a, b) = (30.0f64, 50.0f64);
        let mut p = Poly::new();
        for (y, z) in [(0.0, 0.0), (a, 0.0), (a, b), (0.0, b)] {
            p.push(y, z);
        }
        close(
            p.wagner(0.0, 1.0),
            a.powi(3) * b * b / 6.0 + a * b.powi(4) / 4.0,
            1e-13,
        );
        // Centred, it vanishes by symmetry about every axis through the
        // centre; turned by 90° (t = -y) the rectangle [0, a] x [0, b] gives
        // -∫ (z² y + y³) dA = -(b³ a² / 6 + b a⁴ / 4).
        close(
            p.wagner(1.0, 0.0),
            -(b.powi(3) * a * a / 6.0 + b * a.powi(4) / 4.0),
            1e-13,
        );
        p.shift(-a / 2.0, -b / 2.0);
        let (sin, cos) = (0.3f64.sin(), 0.3f64.cos());
        assert!(p.wagner(sin, cos).abs() < 1e-6 * a * b.powi(4));
    }

    #[test]
    fn rectangle_closed_forms() {
        let m = Prim::Rect {
            y0: 0.0,
            y1: 40.0,
            z0: 0.0,
            z1: 100.0,
        }
        .moments();
        close(m.a, 4000.0, 1e-15);
        let (iy, iz, iyz) = m.centroidal();
        close(iy, 40.0 * 1e6 / 12.0, 1e-12);
        close(iz, 100.0 * 64000.0 / 12.0, 1e-12);
        close(iyz, 0.0, 1e-12);
    }

    #[test]
    fn four_quarter_discs_make_a_disc() {
        let mut p = Parts::new();
        for (qy, qz) in [(1.0, 1.0), (-1.0, 1.0), (-1.0, -1.0), (1.0, -1.0)] {
            p.quarter_disc(5.0, -3.0, 10.0, qy, qz, 1.0);
        }
        let m = p.moments();
        close(m.a, PI * 100.0, 1e-14);
        let (yc, zc) = m.centroid();
        close(yc, 5.0, 1e-13);
        close(zc, -3.0, 1e-13);
        let (iy, iz, iyz) = m.centroidal();
        close(iy, PI * 1e4 / 4.0, 1e-12);
        close(iz, PI * 1e4 / 4.0, 1e-12);
        assert!(iyz.abs() < 1e-9);
        // Plastic modulus of a disc: d³/6.
        close(p.plastic_modulus(Axis::Y, None), 8000.0 / 6.0, 1e-9);
        close(p.plastic_modulus(Axis::Z, Some(5.0)), 8000.0 / 6.0, 1e-12);
    }

    #[test]
    fn quarter_disc_product_moment_sign() {
        // In the +y +z quadrant about its own corner, ∫yz = r⁴/8.
        let m = Prim::QuarterDisc {
            cy: 0.0,
            cz: 0.0,
            r: 2.0,
            qy: 1.0,
            qz: 1.0,
        }
        .moments();
        close(m.yz, 2.0, 1e-15);
        let m2 = Prim::QuarterDisc {
            cy: 0.0,
            cz: 0.0,
            r: 2.0,
            qy: -1.0,
            qz: 1.0,
        }
        .moments();
        close(m2.yz, -2.0, 1e-15);
    }

    #[test]
    fn spandrel_area_and_centroid() {
        let mut p = Parts::new();
        p.spandrel(0.0, 0.0, 10.0, 1.0, 1.0, 1.0);
        let m = p.moments();
        close(m.a, 100.0 * (1.0 - PI / 4.0), 1e-13);
        // Centroid of a spandrel: r (10 - 3π) / (12 - 3π) from the corner
        // (a standard result for the area between a square and a quarter circle).
        let d = 10.0 * (10.0 - 3.0 * PI) / (12.0 - 3.0 * PI);
        let (yc, zc) = m.centroid();
        close(yc, d, 1e-12);
        close(zc, d, 1e-12);
    }

    #[test]
    fn clipped_quarter_disc_halves() {
        let q = Prim::QuarterDisc {
            cy: 0.0,
            cz: 0.0,
            r: 1.0,
            qy: 1.0,
            qz: -1.0,
        };
        let (a, m) = q.below(0.0);
        close(a, PI / 4.0, 1e-14);
        close(m, -1.0 / 3.0, 1e-14);
        let (a, _) = q.below(-1.0);
        close(a, 0.0, 1e-14);
        // Half height: segment area by the closed form.
        let (a, _) = q.below(-0.5);
        let t = 0.5f64;
        let exact = PI / 4.0 - 0.5 * (t * (1.0 - t * t).sqrt() + t.asin());
        close(a, exact, 1e-14);
    }

    #[test]
    fn polygon_square_plastic_and_split() {
        let mut p = Poly::new();
        for (y, z) in [(0.0, 0.0), (2.0, 0.0), (2.0, 4.0), (0.0, 4.0)] {
            p.push(y, z);
        }
        close(p.area(), 8.0, 1e-15);
        // b h² / 4 = 2 * 16 / 4
        close(p.plastic_modulus(0.0), 8.0, 1e-10);
        close(p.plastic_modulus(std::f64::consts::FRAC_PI_2), 4.0, 1e-10);
        let (ah, mh, al, ml) = p.split(0.0, 1.0, 1.0);
        close(ah, 6.0, 1e-14);
        close(mh, 9.0, 1e-14);
        close(al, 2.0, 1e-14);
        close(ml, -1.0, 1e-14);
    }

    #[test]
    fn cheap_area_and_chord_agree_with_split() {
        let mut p = Poly::new();
        p.push(0.0, 0.0);
        p.push(5.0, 0.0);
        p.arc(5.0, 3.0, 2.0, -0.5 * PI, 0.5 * PI, 8);
        p.push(1.0, 5.0);
        p.arc(1.0, 3.0, 1.0, 0.5 * PI, 1.5 * PI, 8);
        p.push(0.0, 2.0);
        for theta in [0.0f64, 0.3, 1.2, 2.5] {
            let (st, n) = p.rotated(theta.sin(), theta.cos());
            for c in [-3.0, -0.5, 0.7, 2.2, 4.0] {
                let full = split_rotated(&st[..n], c);
                let cheap = area_above_and_chord(&st[..n], c);
                close(cheap.0, full.0, 1e-12);
                close(cheap.1, full.4, 1e-12);
                close(full.0 + full.2, p.area(), 1e-12);
            }
        }
    }

    #[test]
    fn table_arcs_match_trigonometry() {
        for (a0, a1) in [
            (0.0, 0.5 * PI),
            (1.5 * PI, PI),
            (-0.5 * PI, 0.0),
            (PI, 1.5 * PI),
        ] {
            let mut p = Poly::new();
            p.arc(1.0, 2.0, 3.0, a0, a1, 8);
            assert_eq!(p.points().len(), 9);
            for (k, &(y, z)) in p.points().iter().enumerate() {
                let a = a0 + (a1 - a0) * k as f64 / 8.0;
                assert!((y - 1.0 - 3.0 * a.cos()).abs() < 1e-14, "{a0} {a1} {k}");
                assert!((z - 2.0 - 3.0 * a.sin()).abs() < 1e-14, "{a0} {a1} {k}");
            }
        }
    }

    #[test]
    fn extreme_distance_uses_the_arc_not_its_chords() {
        // A quarter disc of radius 1 about the origin, drawn with 8 chords
        // (vertices every π/16). In the direction 45° + π/32, halfway
        // between two vertices, the arc reaches 1 but the vertices only
        // cos(π/32).
        let mut p = Poly::new();
        p.push(0.0, 0.0);
        p.arc(0.0, 0.0, 1.0, 0.0, 0.5 * PI, 8);
        let theta = 0.25 * PI + PI / 32.0 - 0.5 * PI; // normal direction at 45° + π/32
        let (s, c) = theta.sin_cos();
        close(p.extreme_t(s, c), 1.0, 1e-15);
        let vertices = p
            .points()
            .iter()
            .fold(0.0f64, |m, (y, z)| m.max((-y * s + z * c).abs()));
        assert!(vertices < 1.0 - 1e-3);
        // Shifting moves the arcs too.
        p.shift(2.0, 0.0);
        let (s, c) = (0.0f64.sin(), 0.0f64.cos());
        close(p.extreme_t(s, c), 1.0, 1e-15);
    }

    #[test]
    fn chord_length_of_a_square() {
        let mut p = Poly::new();
        for (y, z) in [(0.0, 0.0), (2.0, 0.0), (2.0, 4.0), (0.0, 4.0)] {
            p.push(y, z);
        }
        let (st, n) = p.rotated(0.0, 1.0);
        let r = split_rotated(&st[..n], 1.0);
        close(r.4, 2.0, 1e-15);
        let (st, n) = p.rotated(1.0, 0.0);
        // Rotated by 90°: t = -y, the chord at y = 1 is the height 4.
        let r = split_rotated(&st[..n], -1.0);
        close(r.4, 4.0, 1e-15);
    }
}
