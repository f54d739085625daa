//! What the envelope chart shows, worked out without any drawing: the
//! curves (from the engine's own methods, so the chart and the number can
//! never disagree), the axis ranges and the member's markers.

use strutline_core::check::{Mode, Prepared};
use strutline_core::compare::{self, Outcome};
use strutline_core::envelope;
use strutline_core::method::{self, Input, Method};
use strutline_core::trace::Trace;
use strutline_core::{CheckResult, Error};

/// Initial bows of the Perry-Robertson family, as fractions L_cr / n: the
/// engine's default when no bow is given (L_cr/200, EN 1993-1-1 Table 5.1's
/// curve c), and two smaller ones down to a fabrication tolerance's size.
pub const BOW_FAMILY: [f64; 3] = [
    strutline_core::method::common::DEFAULT_IMPERFECTION_DIVISOR,
    500.0,
    1000.0,
];

/// The family's bows in words ("L/200, L/500, L/1000"), for its toggle.
pub fn bow_family_text() -> String {
    BOW_FAMILY
        .iter()
        .map(|n| format!("L/{n}"))
        .collect::<Vec<_>>()
        .join(", ")
}

/// Samples per curve.
pub const STEPS: usize = 120;

/// A curve of the chart.
#[derive(Debug, Clone, PartialEq)]
pub struct Curve {
    /// Legend text.
    pub label: String,
    /// (slenderness, stress MPa).
    pub points: Vec<(f64, f64)>,
}

/// A marker of the member about one axis.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Marker {
    /// The mode (axis).
    pub mode: Mode,
    /// L_cr / i.
    pub slenderness: f64,
    /// Applied stress N_Ed / A, MPa.
    pub applied_mpa: f64,
    /// Design stress N_Rd / A of this axis, MPa.
    pub resistance_mpa: f64,
    /// Whether this axis governs.
    pub governing: bool,
    /// The geometric axis of a flexural mode ("y-y", "z-z"), when the
    /// section's shape names one (not for angles or typed properties).
    pub axis: Option<&'static str>,
}

/// Everything the chart draws.
#[derive(Debug, Clone, PartialEq)]
pub struct ChartData {
    /// Method name for the title.
    pub method: &'static str,
    /// Largest slenderness shown.
    pub x_max: f64,
    /// Largest stress shown, MPa.
    pub y_max: f64,
    /// Strength plateau f_y (or f_c,0,k), MPa.
    pub yield_mpa: f64,
    /// Euler's hyperbola, clipped to the chart.
    pub euler: Vec<(f64, f64)>,
    /// The design curve of the member's method, major then minor axis.
    pub design: Vec<(Mode, Curve)>,
    /// The Perry-Robertson family (empty unless asked for).
    pub perry: Vec<Curve>,
    /// Every other method that applies to the member, each by the lower of
    /// its two axis curves (empty unless asked for), in [`Method::ALL`]
    /// order.
    pub others: Vec<(Method, Curve)>,
    /// The member's markers, one per mode checked.
    pub markers: Vec<Marker>,
}

impl ChartData {
    /// The governing marker (or the one of least resistance).
    pub fn governing(&self) -> Option<&Marker> {
        self.markers.iter().find(|m| m.governing).or_else(|| {
            self.markers
                .iter()
                .min_by(|a, b| a.resistance_mpa.total_cmp(&b.resistance_mpa))
        })
    }
}

fn nice_ceiling(v: f64, step: f64) -> f64 {
    ((v / step).ceil() * step).max(step)
}

/// Works the chart for a prepared member and its check, with the
/// Perry-Robertson family when `with_perry` and the other methods' curves
/// when `with_others`.
pub fn build(
    prepared: &Prepared,
    result: &CheckResult,
    with_perry: bool,
    with_others: bool,
) -> Result<ChartData, Error> {
    let area = prepared.section.props.area_mm2;
    let (f, e) = prepared.material.strength_and_modulus();
    let method = result.method;
    let flexural: Vec<_> = result
        .modes
        .iter()
        .filter(|m| matches!(m.mode, Mode::Major | Mode::Minor))
        .copied()
        .collect();
    let furthest = flexural.iter().map(|m| m.slenderness).fold(0.0, f64::max);
    let x_max = nice_ceiling((furthest * 1.25).max(200.0), 50.0).min(1000.0);
    let applied = result_applied_mpa(prepared, area);
    let top = (f * 1.15).max(applied * 1.1);
    let y_max = nice_ceiling(top, if top <= 100.0 { 10.0 } else { 50.0 });

    // Euler: from where it crosses the top of the chart.
    let lambda_top = std::f64::consts::PI * (e / y_max).sqrt();
    let mut euler = Vec::with_capacity(STEPS + 1);
    if lambda_top < x_max {
        for k in 0..=STEPS {
            let l = lambda_top + (x_max - lambda_top) * (k as f64) / (STEPS as f64);
            euler.push((l, std::f64::consts::PI.powi(2) * e / (l * l)));
        }
    }

    let mut design = Vec::with_capacity(2);
    for mode in [Mode::Major, Mode::Minor] {
        let pts = envelope::sample(prepared, method, mode, 0.0, x_max, STEPS)?;
        design.push((
            mode,
            Curve {
                label: format!("{}, {} axis", method.key(), mode.key()),
                points: pts.iter().map(|p| (p.slenderness, p.design_mpa)).collect(),
            },
        ));
    }

    let perry = if with_perry {
        perry_family(prepared, x_max)?
    } else {
        Vec::new()
    };
    let others = if with_others {
        other_methods(prepared, x_max)
    } else {
        Vec::new()
    };

    // Every mode is marked at its slenderness (torsional modes at their
    // equivalent slenderness), so a torsional mode that governs is shown.
    let markers = result
        .modes
        .iter()
        // The cross-section mode has no slenderness: marked only when it governs.
        .filter(|m| m.mode != Mode::Section || m.mode == result.governing)
        .map(|m| Marker {
            mode: m.mode,
            slenderness: m.slenderness,
            applied_mpa: applied,
            resistance_mpa: m.resistance_kn * 1000.0 / area,
            governing: m.mode == result.governing,
            axis: match m.mode {
                Mode::Major => prepared.section.axis_name(true),
                Mode::Minor => prepared.section.axis_name(false),
                _ => None,
            },
        })
        .collect();

    Ok(ChartData {
        method: method.title(),
        x_max,
        y_max,
        yield_mpa: f,
        euler,
        design,
        perry,
        others,
        markers,
    })
}

/// At each slenderness the lower of two curves sampled at the same
/// slenderness steps (the first curve's slenderness is kept).
pub fn lower(a: &[(f64, f64)], b: &[(f64, f64)]) -> Vec<(f64, f64)> {
    a.iter()
        .zip(b)
        .map(|(&(x, ya), &(_, yb))| (x, ya.min(yb)))
        .collect()
}

/// The curve of every method other than the member's own that applies to
/// it ([`compare::compare`] checks it), in [`Method::ALL`] order: at each
/// slenderness the lower of the method's major- and minor-axis design
/// stresses, both axes taken at that slenderness, so it is the method's
/// flexural-buckling curve for this section whichever axis governs. A
/// method that does not apply, or refuses this member, or refuses some
/// slenderness of the range, is left out. AISC 360 ASD's curve is its
/// allowable stress P_n / (Omega_c A), and its label says so.
pub fn other_methods(prepared: &Prepared, x_max: f64) -> Vec<(Method, Curve)> {
    let mut out = Vec::new();
    for row in compare::compare(prepared) {
        if row.own || !matches!(row.outcome, Outcome::Checked { .. }) {
            continue;
        }
        let axis = |mode| envelope::sample(prepared, row.method, mode, 0.0, x_max, STEPS);
        let (Ok(major), Ok(minor)) = (axis(Mode::Major), axis(Mode::Minor)) else {
            continue;
        };
        let stress = |pts: Vec<envelope::Point>| -> Vec<(f64, f64)> {
            pts.iter().map(|p| (p.slenderness, p.design_mpa)).collect()
        };
        let label = if row.method == Method::AiscAsd {
            "AISC 360-16 chapter E, ASD: allowable stress P_n / (Ω_c A)"
        } else {
            row.title
        };
        out.push((
            row.method,
            Curve {
                label: label.to_string(),
                points: lower(&stress(major), &stress(minor)),
            },
        ));
    }
    out
}

fn result_applied_mpa(prepared: &Prepared, area: f64) -> f64 {
    prepared.member.axial_kn * 1000.0 / area
}

/// Perry-Robertson curves for bows L_cr/250, L_cr/500 and L_cr/1000 about
/// the minor axis, each worked by the engine's Perry-Robertson method with
/// a copy of the member whose bow is set at every slenderness.
pub fn perry_family(prepared: &Prepared, x_max: f64) -> Result<Vec<Curve>, Error> {
    let r = prepared.section.props.r_minor_mm;
    let area = prepared.section.props.area_mm2;
    let mut copy = prepared.member.clone();
    let mut trace = Trace::with_capacity(16);
    let mut warnings = Vec::new();
    let mut out = Vec::with_capacity(BOW_FAMILY.len());
    for n in BOW_FAMILY {
        let mut points = Vec::with_capacity(STEPS + 1);
        for k in 0..=STEPS {
            let lambda = (x_max * (k as f64) / (STEPS as f64)).max(1e-3);
            let lcr = lambda * r;
            copy.bow_mm = Some(lcr / n);
            let input = Input {
                member: &copy,
                section: &prepared.section,
                material: &prepared.material,
            };
            trace.clear();
            warnings.clear();
            let res = method::axis(
                Method::PerryRobertson,
                &input,
                Mode::Minor,
                lcr,
                &mut trace,
                &mut warnings,
            )?;
            points.push((lambda, res.resistance_kn * 1000.0 / area));
        }
        out.push(Curve {
            label: format!("Perry-Robertson, bow L_cr/{n}"),
            points,
        });
    }
    Ok(out)
}

/// The plot rectangle in device pixels and the linear map from
/// (slenderness, stress) to pixels.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Frame {
    /// Left edge of the plot, px.
    pub left: f64,
    /// Top edge, px.
    pub top: f64,
    /// Right edge, px.
    pub right: f64,
    /// Bottom edge, px.
    pub bottom: f64,
    /// Slenderness at the right edge.
    pub x_max: f64,
    /// Stress at the top edge, MPa.
    pub y_max: f64,
}

impl Frame {
    /// The pixel of a point (clamped to the plot).
    pub fn px(&self, x: f64, y: f64) -> (i32, i32) {
        let fx = (x / self.x_max).clamp(0.0, 1.0);
        let fy = (y / self.y_max).clamp(0.0, 1.0);
        let px = self.left + fx * (self.right - self.left);
        let py = self.bottom - fy * (self.bottom - self.top);
        (px.round() as i32, py.round() as i32)
    }
}

/// A step of about `max / count` rounded to 1, 2 or 5 times a power of ten.
pub fn tick_step(max: f64, count: f64) -> f64 {
    let raw = (max / count.max(1.0)).max(1e-9);
    let p = 10f64.powf(raw.log10().floor());
    let m = raw / p;
    let nice = if m <= 1.0 {
        1.0
    } else if m <= 2.0 {
        2.0
    } else if m <= 5.0 {
        5.0
    } else {
        10.0
    };
    nice * p
}

/// Splits a polyline into dashes of `on` pixels with gaps of `off`.
pub fn dashes(points: &[(i32, i32)], on: f64, off: f64) -> Vec<Vec<(i32, i32)>> {
    let mut out = Vec::new();
    let mut current: Vec<(i32, i32)> = Vec::new();
    let (on, off) = (on.max(1.0), off.max(1.0));
    let mut drawing = true;
    let mut left = on;
    for pair in points.windows(2) {
        let (a, b) = match pair {
            [a, b] => (*a, *b),
            _ => continue,
        };
        let (ax, ay) = (f64::from(a.0), f64::from(a.1));
        let (dx, dy) = (f64::from(b.0) - ax, f64::from(b.1) - ay);
        let len = (dx * dx + dy * dy).sqrt();
        let mut t = 0.0;
        if drawing && current.is_empty() {
            current.push(a);
        }
        while len - t > left {
            t += left;
            let p = (
                (ax + dx * t / len).round() as i32,
                (ay + dy * t / len).round() as i32,
            );
            if drawing {
                current.push(p);
                out.push(std::mem::take(&mut current));
                left = off;
            } else {
                current.push(p);
                left = on;
            }
            drawing = !drawing;
        }
        left -= len - t;
        if drawing {
            current.push(b);
        }
    }
    if current.len() > 1 {
        out.push(current);
    }
    out
}

/// The rough box of a line of sans-serif text at `size_px`: width from an
/// average advance of 0.56 em per character, height 1.2 em (common
/// practice for proportional fonts; enough to keep labels apart).
pub fn text_box(text: &str, size_px: f64) -> (f64, f64) {
    (text.chars().count() as f64 * 0.56 * size_px, 1.2 * size_px)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;

    #[test]
    fn the_bow_family_starts_at_the_engines_default_bow() {
        // The toggle's words follow the family, whose first bow is the one
        // a Perry-Robertson member without a bow is checked with.
        assert_eq!(bow_family_text(), "L/200, L/500, L/1000");
    }

    #[test]
    fn chart_agrees_with_check() {
        let m = sample_member("A");
        let p = Prepared::new(&m).unwrap();
        let r = p.check().unwrap();
        let d = build(&p, &r, true, false).unwrap();
        let shown = r
            .modes
            .iter()
            .filter(|m| m.mode != Mode::Section || m.mode == r.governing)
            .count();
        assert_eq!(d.markers.len(), shown);
        let g = d.governing().unwrap();
        assert_eq!(g.mode, r.governing);
        // The governing marker's design stress is the check's resistance over A.
        let a = r.section.area_mm2;
        assert!((g.resistance_mpa - r.resistance_kn * 1000.0 / a).abs() < 1e-9);
        assert!((g.applied_mpa - m.axial_kn * 1000.0 / a).abs() < 1e-9);
        assert!(g.slenderness < d.x_max);
        assert!(d.y_max >= d.yield_mpa);
        // Euler stays within the chart and starts at its top.
        assert!(d.euler.iter().all(|&(_, s)| s <= d.y_max + 1e-9));
        assert!((d.euler[0].1 - d.y_max).abs() < 1e-6);
        // Design curves never exceed the plateau and fall with slenderness.
        for (_, c) in &d.design {
            assert_eq!(c.points.len(), STEPS + 1);
            assert!(c.points.iter().all(|&(_, s)| s <= d.yield_mpa + 1e-9));
            assert!(c.points.first().unwrap().1 >= c.points.last().unwrap().1);
        }
        assert_eq!(d.perry.len(), 3);
        let no_family = build(&p, &r, false, false).unwrap();
        assert!(no_family.perry.is_empty());
        assert!(d.others.is_empty() && no_family.others.is_empty());
    }

    /// The other method's curve at slenderness `lambda`, worked as an
    /// ordinary check of a copy of the member with both buckling lengths
    /// set to `lambda` times the axis's radius of gyration.
    fn checked_at(p: &Prepared, method: Method, lambda: f64) -> f64 {
        let props = &p.section.props;
        let mut m = p.member.clone();
        m.method = method;
        m.lcr_major_mm = Some(lambda * props.r_major_mm);
        m.lcr_minor_mm = Some(lambda * props.r_minor_mm);
        let r = Prepared::new(&m).unwrap().check().unwrap();
        let axis = |mode| {
            r.modes
                .iter()
                .find(|x| x.mode == mode)
                .unwrap()
                .resistance_kn
        };
        axis(Mode::Major).min(axis(Mode::Minor)) * 1000.0 / props.area_mm2
    }

    #[test]
    fn other_methods_are_the_engines_own_curves() {
        // A steel member under EN 1993-1-1: every steel method but its own
        // is drawn, the timber method is not.
        let mut m = sample_member("C");
        m.method = Method::En1993;
        let p = Prepared::new(&m).unwrap();
        let r = p.check().unwrap();
        let d = build(&p, &r, false, true).unwrap();
        let drawn: Vec<Method> = d.others.iter().map(|(m, _)| *m).collect();
        assert_eq!(
            drawn,
            [
                Method::AiscLrfd,
                Method::AiscAsd,
                Method::CsaS16,
                Method::PerryRobertson,
                Method::Secant,
                Method::Euler
            ]
        );
        // The member's own curves are drawn as without the comparison.
        assert_eq!(d.design, build(&p, &r, false, false).unwrap().design);
        for (method, c) in &d.others {
            assert_eq!(c.points.len(), STEPS + 1);
            for k in [20, 60, 119] {
                let (lambda, stress) = c.points[k];
                let want = checked_at(&p, *method, lambda);
                assert!(
                    (stress - want).abs() <= 1e-9 * want.max(1.0),
                    "{method:?} at {lambda}: {stress} vs {want}"
                );
            }
            let allowable = c.label.contains("allowable");
            assert_eq!(allowable, *method == Method::AiscAsd, "{}", c.label);
            assert!(c.label.starts_with(method.title()));
        }
        // ASD's allowable stress is LRFD's design stress times
        // 1 / (0.90 x 1.67) at every slenderness.
        let curve = |m: Method| &d.others.iter().find(|(x, _)| *x == m).unwrap().1;
        for (a, l) in curve(Method::AiscAsd)
            .points
            .iter()
            .zip(&curve(Method::AiscLrfd).points)
        {
            assert!((a.1 * 0.90 * 1.67 - l.1).abs() < 1e-9 * l.1.max(1.0));
        }
    }

    #[test]
    fn methods_that_do_not_apply_are_left_out() {
        let list = &crate::demo::demo_lists()[0];
        let post = &list.members[0];
        assert!(
            matches!(
                post.material,
                strutline_core::material::MaterialSpec::Timber { .. }
            ),
            "{post:?}"
        );
        let p = Prepared::new(post).unwrap();
        let r = p.check().unwrap();
        let d = build(&p, &r, false, true).unwrap();
        let rows = compare::compare(&p);
        for (method, _) in &d.others {
            let row = rows.iter().find(|x| x.method == *method).unwrap();
            assert!(matches!(row.outcome, Outcome::Checked { .. }) && !row.own);
        }
        for steel in [
            Method::En1993,
            Method::AiscLrfd,
            Method::AiscAsd,
            Method::CsaS16,
        ] {
            assert!(d.others.iter().all(|(m, _)| *m != steel), "{steel:?}");
        }
        assert!(d.others.iter().all(|(m, _)| *m != post.method));
    }

    #[test]
    fn method_slots_follow_the_method_order() {
        for (i, m) in Method::ALL.into_iter().enumerate() {
            assert_eq!(m as usize, i);
        }
        assert_eq!(
            lower(&[(1.0, 5.0), (2.0, 3.0)], &[(1.1, 4.0), (2.1, 6.0)]),
            [(1.0, 4.0), (2.0, 3.0)]
        );
    }

    #[test]
    fn range_grows_for_slender_members() {
        let mut m = sample_member("A");
        m.length_mm = 12_000.0;
        let p = Prepared::new(&m).unwrap();
        let r = p.check().unwrap();
        let d = build(&p, &r, false, false).unwrap();
        let far = d.markers.iter().map(|k| k.slenderness).fold(0.0, f64::max);
        assert!(d.x_max >= far * 1.2, "{} {}", d.x_max, far);
        assert_eq!(d.x_max % 50.0, 0.0);
    }
    #[test]
    fn frame_maps_corners() {
        let f = Frame {
            left: 50.0,
            top: 10.0,
            right: 450.0,
            bottom: 310.0,
            x_max: 200.0,
            y_max: 400.0,
        };
        assert_eq!(f.px(0.0, 0.0), (50, 310));
        assert_eq!(f.px(200.0, 400.0), (450, 10));
        assert_eq!(f.px(100.0, 200.0), (250, 160));
        assert_eq!(f.px(999.0, -5.0), (450, 310), "clamped to the plot");
    }

    #[test]
    fn ticks_are_round() {
        assert_eq!(tick_step(200.0, 10.0), 20.0);
        assert_eq!(tick_step(400.0, 8.0), 50.0);
        assert_eq!(tick_step(30.0, 8.0), 5.0);
        assert_eq!(tick_step(1000.0, 5.0), 200.0);
    }

    #[test]
    fn dashes_split_a_line() {
        let d = dashes(&[(0, 0), (100, 0)], 10.0, 10.0);
        assert_eq!(d.len(), 5);
        assert_eq!(d[0], vec![(0, 0), (10, 0)]);
        assert_eq!(d[1], vec![(20, 0), (30, 0)]);
        // Dashes carry on across the corners of a polyline.
        let d = dashes(&[(0, 0), (5, 0), (5, 5)], 8.0, 2.0);
        assert_eq!(d[0], vec![(0, 0), (5, 0), (5, 3)]);
    }
    #[test]
    fn text_box_grows_with_text_and_size() {
        let (w1, h1) = text_box("major axis", 12.0);
        let (w2, h2) = text_box("major axis · governs", 24.0);
        assert!((w1 - 10.0 * 0.56 * 12.0).abs() < 1e-9);
        assert!(w2 > 3.0 * w1 && h2 == 2.0 * h1);
    }
}
