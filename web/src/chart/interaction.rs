//! The interaction chart of a beam-column: for each axis, compression
//! against the largest moment along the member, the curve within which the
//! member holds (worked by the engine's own check, [`interaction`]), the
//! region within capacity shaded and the member's point marked, with a
//! short line from the point across to the curve at its load. The two
//! axes are two panels side by side sharing the compression scale, so a
//! glance compares them; the other methods' curves can be drawn over them.
//!
//! What is drawn is worked out first ([`build`], [`describe`]: plain Rust,
//! tested on the host), then drawn by [`draw`] in device pixels, as the
//! envelope chart is.

use plotters::coord::Shift;
use plotters::element::{Circle, PathElement, Polygon, Rectangle, Text};
use plotters::prelude::{DrawingArea, DrawingBackend};
use plotters::style::text_anchor::{HPos, Pos, VPos};
use plotters::style::{Color, FontTransform, IntoFont, RGBColor};
use strutline_core::bending::Axis;
use strutline_core::check::{Prepared, Working};
use strutline_core::compare::{self, Outcome};
use strutline_core::envelope::interaction::{self, Curve, Shape};
use strutline_core::method::Method;
use strutline_core::units::{self, Quantity, UnitSystem};
use strutline_core::{CheckResult, Error};
use web_sys::HtmlCanvasElement;

use super::data::{dashes, tick_step};
use super::envelope::{err, palette, Palette, METHOD_COLOUR, METHOD_DASH};
use super::labels::{self, Boxes, Fitted, Measure, TextBox, Tick, Ticks};
use crate::numtext::working;
use crate::units_view::result_text;

/// Another method compared on a panel: its curve, or why it has none (a
/// refused method is named with its reason and never drawn as a line).
#[derive(Debug, Clone, PartialEq)]
pub enum Compared {
    /// Its interaction curve about the panel's axis.
    Curve(Curve),
    /// The method refuses the member (or the diagram about this axis): the
    /// reason in the app's words.
    Refused(String),
}

impl Compared {
    /// The curve, `None` when refused.
    pub fn curve(&self) -> Option<&Curve> {
        match self {
            Compared::Curve(c) => Some(c),
            Compared::Refused(_) => None,
        }
    }
}

/// One axis' panel.
#[derive(Debug, Clone, PartialEq)]
pub struct Panel {
    /// The member's method's curve about this axis.
    pub curve: Curve,
    /// Every other method that applies (or refuses the member), its curve
    /// about this axis or its refusal (empty unless asked for), in
    /// [`Method::ALL`] order; the same methods in both panels.
    pub others: Vec<(Method, Compared)>,
    /// The largest moment shown, kNm.
    pub m_max: f64,
}

/// Everything the chart draws.
#[derive(Debug, Clone, PartialEq)]
pub struct InteractionData {
    /// The member's method.
    pub method: Method,
    /// Major axis, then minor.
    pub panels: [Panel; 2],
    /// The largest compression shown, kN (shared by both panels).
    pub n_max: f64,
    /// The member's utilisation and what governs it.
    pub utilisation: f64,
    /// What governs, in the verdict's words (an interaction equation by
    /// its number where one governs).
    pub governs: String,
    /// Whether the check passes the member.
    pub passes: bool,
}

/// A round ceiling of `v` for an axis: 1, 2 or 5 times a power of ten
/// steps, at least one step.
fn ceiling(v: f64) -> f64 {
    let step = tick_step(v.max(1e-9), 5.0);
    ((v / step).ceil() * step).max(step)
}

/// The largest moment of a curve's points (at no compression), kNm.
fn widest(c: &Curve) -> f64 {
    c.points.iter().map(|p| p.moment_knm).fold(0.0, f64::max)
}

/// Works both panels for a prepared member and its check (with every
/// other method's curves when `with_others`).
pub fn build(
    prepared: &Prepared,
    result: &CheckResult,
    with_others: bool,
) -> Result<InteractionData, Error> {
    let method = result.method;
    let [major, minor] = interaction::curves(prepared, method)?;
    let mut others: [Vec<(Method, Compared)>; 2] = [Vec::new(), Vec::new()];
    if with_others {
        for row in compare::compare(prepared) {
            if row.own {
                continue;
            }
            match row.outcome {
                Outcome::Checked { .. } => {
                    for (list, axis) in others.iter_mut().zip([Axis::Major, Axis::Minor]) {
                        let one = match interaction::refusal(prepared, row.method, axis) {
                            Some(e) => Compared::Refused(crate::fields::error_text(&e)),
                            None => match interaction::curve(prepared, row.method, axis) {
                                Ok(c) => Compared::Curve(c),
                                Err(e) => Compared::Refused(crate::fields::error_text(&e)),
                            },
                        };
                        list.push((row.method, one));
                    }
                }
                Outcome::Refused { message } => {
                    for list in &mut others {
                        list.push((row.method, Compared::Refused(message.clone())));
                    }
                }
                // Not applicable because of the moments (a method with no
                // bending rule, a diagram the secant method does not take):
                // refused, named with the reason; not applicable to the
                // member at all (a timber method on steel): left out.
                Outcome::NotApplicable { reason } => {
                    let mut plain = prepared.clone();
                    let m = &mut plain.member;
                    (m.m_major_a_knm, m.m_major_b_knm, m.m_major_span_knm) = (0.0, 0.0, 0.0);
                    (m.m_minor_a_knm, m.m_minor_b_knm, m.m_minor_span_knm) = (0.0, 0.0, 0.0);
                    if plain.check_as(row.method, Working::Skipped).is_ok() {
                        for list in &mut others {
                            list.push((row.method, Compared::Refused(reason.clone())));
                        }
                    }
                }
            }
        }
    }
    let n_top = [&major, &minor]
        .into_iter()
        .chain(others.iter().flatten().filter_map(|(_, c)| c.curve()))
        .map(|c| c.top_kn)
        .fold(prepared.member.axial_kn, f64::max);
    let n_max = ceiling(n_top * 1.08);
    let [o_major, o_minor] = others;
    let panel = |curve: Curve, others: Vec<(Method, Compared)>| {
        let m = others
            .iter()
            .filter_map(|(_, c)| c.curve())
            .map(widest)
            .fold(widest(&curve).max(curve.member_moment_knm), f64::max);
        Panel {
            m_max: ceiling(m * 1.08),
            curve,
            others,
        }
    };
    Ok(InteractionData {
        method,
        panels: [panel(major, o_major), panel(minor, o_minor)],
        n_max,
        utilisation: result.utilisation,
        governs: crate::status::governing_text(result),
        passes: result.passes,
    })
}

/// The chart in words, for the canvas's accessible description and for
/// tests: per axis, the curve's moment at the member's load against the
/// member's moment, and where the point lies.
pub fn describe(d: &InteractionData, sys: UnitSystem) -> String {
    let mut out = format!(
        "Interaction, {}: utilisation {}, governs {}.",
        d.method.title(),
        crate::numtext::utilisation(d.utilisation),
        d.governs
    );
    for p in &d.panels {
        let c = &p.curve;
        let load = result_text(sys, "kN", c.member_axial_kn, 1);
        let moment = result_text(sys, "kNm", c.member_moment_knm, 1);
        let curve_at = match c.at_load_knm {
            Some(m) => format!("the curve reaches {}", result_text(sys, "kNm", m, 1)),
            None => "the load alone is beyond the curve".to_string(),
        };
        let place = if c.contains_member() {
            "inside"
        } else {
            "outside"
        };
        out.push_str(&format!(
            " {} axis: at N_Ed {load}, {curve_at}; the member's {moment} is {place} the shaded region",
            c.axis
        ));
        if c.shape == Shape::UniformAssumed {
            out.push_str(" (no moment about this axis: a uniform one is assumed for the curve)");
        }
        if !c.worked {
            out.push_str(" (the method's interaction is not worked: the line is the plain sum, not a code check)");
        }
        for (m, other) in &p.others {
            if let Compared::Refused(why) = other {
                out.push_str(&format!("; {} refused, no curve: {why}", m.title()));
            }
        }
        out.push('.');
    }
    out
}

/// A compared method with its refusals by axis (the axis' name and the
/// reason; empty where both curves are drawn).
pub type Refusals<'a> = (Method, Vec<(&'static str, &'a str)>);

/// The compared methods of `d`, each with its refusals by axis, for the
/// legend.
pub fn compared(d: &InteractionData) -> Vec<Refusals<'_>> {
    let [major, minor] = &d.panels;
    major
        .others
        .iter()
        .zip(&minor.others)
        .map(|((m, a), (_, b))| {
            let refused = [(major.curve.axis, a), (minor.curve.axis, b)]
                .into_iter()
                .filter_map(|(axis, c)| match c {
                    Compared::Refused(why) => Some((axis, why.as_str())),
                    Compared::Curve(_) => None,
                })
                .collect();
            (*m, refused)
        })
        .collect()
}

/// Draws `data` on `canvas` (already sized to CSS size x `dpr`) and
/// records on the element for tests, per axis (`major`, `minor`): whether
/// the member's point is inside (`data-inside-major`), the curve's moment
/// at the member's load in kNm (`data-curve-at-load-major`) and the
/// point's pixel ("x,y" in CSS pixels, `data-point-px-major`). Values are
/// shown in kN and kNm, or kip and kip·ft when `us`. Every box it writes a
/// title or label in is recorded as `data-text-boxes`, the member's marks
/// as `data-mark-boxes` ([`Boxes::record_on`]).
pub fn draw(
    canvas: &HtmlCanvasElement,
    data: &InteractionData,
    dpr: f64,
    high_contrast: bool,
    us: bool,
) -> Result<(), String> {
    let sys = if us { UnitSystem::Us } else { UnitSystem::Si };
    let points = super::on_canvas(canvas, dpr, |root, text| {
        draw_on(root, data, dpr, &palette(high_contrast), sys, text)
    })?;
    let set = |k: &str, v: String| canvas.set_attribute(k, &v).map_err(err);
    set("data-chart", "interaction".into())?;
    for (p, (x, y)) in data.panels.iter().zip(points) {
        let a = p.curve.axis;
        set(
            &format!("data-inside-{a}"),
            p.curve.contains_member().to_string(),
        )?;
        set(
            &format!("data-curve-at-load-{a}"),
            p.curve
                .at_load_knm
                .map_or("none".into(), |m| format!("{m:.3}")),
        )?;
        set(
            &format!("data-point-px-{a}"),
            format!("{:.1},{:.1}", f64::from(x) / dpr, f64::from(y) / dpr),
        )?;
    }
    Ok(())
}

/// The plot rectangle of a panel and its map from (moment kNm,
/// compression kN) to device pixels.
#[derive(Debug, Clone, Copy)]
struct Plot {
    left: f64,
    top: f64,
    right: f64,
    bottom: f64,
    m_max: f64,
    n_max: f64,
}

impl Plot {
    fn px(&self, m: f64, n: f64) -> (i32, i32) {
        let fx = (m / self.m_max).clamp(0.0, 1.0);
        let fy = (n / self.n_max).clamp(0.0, 1.0);
        (
            (self.left + fx * (self.right - self.left)).round() as i32,
            (self.bottom - fy * (self.bottom - self.top)).round() as i32,
        )
    }
}

/// A panel's title in parts, read in order, each kept whole on a line
/// where the room allows: the axis, the moment shape where it is assumed,
/// the other axis' moment.
fn head_parts(c: &Curve, sys: UnitSystem) -> Vec<String> {
    let mut parts = vec![format!("{} axis", c.axis)];
    if c.shape == Shape::UniformAssumed {
        parts.push("uniform M assumed".into());
    }
    parts.push(if c.held_knm > 0.0 {
        format!(
            "{} held {}",
            if c.axis == "major" {
                "M minor"
            } else {
                "M major"
            },
            result_text(sys, "kNm", c.held_knm, 1)
        )
    } else {
        "other axis: no moment".to_string()
    });
    parts
}

/// Draws the chart on `root`; `text` measures text and collects the box
/// of every title and label written and of the member's marks.
fn draw_on<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    data: &InteractionData,
    dpr: f64,
    pal: &Palette,
    sys: UnitSystem,
    text: (Measure, &mut Boxes),
) -> Result<[(i32, i32); 2], String>
where
    DB::ErrorType: 'static,
{
    let (measure, boxes) = text;
    let s = |v: f64| (v * dpr).round().max(1.0) as u32;
    let si = |v: f64| (v * dpr).round() as i32;
    let font = |size: f64| ("sans-serif", size * dpr).into_font().color(&pal.ink);
    root.fill(&pal.background).map_err(err)?;
    let (w, h) = root.dim_in_pixel();
    let narrow = f64::from(w) / dpr < 560.0;
    let label_px = if narrow { 10.0 } else { 12.0 } * dpr;
    let label = font(label_px / dpr);
    let title_px = if narrow { 11.0 } else { 13.0 } * dpr;
    let title = font(title_px / dpr);
    let line = |pts: Vec<(i32, i32)>, c: RGBColor, width: f64| {
        PathElement::new(pts, c.stroke_width(s(width)))
    };
    let dashed =
        |pts: Vec<(i32, i32)>, on: f64, off: f64, c: RGBColor, width: f64| -> Result<(), String> {
            for d in dashes(&pts, on * dpr, off * dpr) {
                root.draw(&line(d, c, width)).map_err(err)?;
            }
            Ok(())
        };
    let force = |kn: f64| units::to_display(sys, Quantity::Force, kn);
    let moment = |knm: f64| units::to_display(sys, Quantity::Moment, knm);
    let force_unit = units::display_unit(sys, Quantity::Force);
    let moment_unit = units::display_unit(sys, Quantity::Moment);

    // The compression title once, at the far left; each panel its own
    // moment scale.
    let (_, cy) = (0, (f64::from(h) / 2.0) as i32);
    let up = format!("compression N  ({force_unit})");
    let lh = labels::line_height(title_px);
    // Turned a quarter: as wide as a line is high, as tall as it is long.
    boxes.text.push(TextBox::centred(
        3.0 * dpr + lh / 2.0,
        f64::from(cy),
        lh,
        measure(&up, title_px),
    ));
    root.draw(&Text::new(
        up,
        (si(3.0), cy),
        title
            .clone()
            .transform(FontTransform::Rotate270)
            .pos(Pos::new(HPos::Center, VPos::Top)),
    ))
    .map_err(err)?;
    let gap = if narrow { 40.0 } else { 52.0 } * dpr;
    let left0 = if narrow { 56.0 } else { 70.0 } * dpr;
    let width = (f64::from(w) - left0 - gap - 14.0 * dpr) / 2.0;
    // Each panel's titles in the room over and under it (the panel and
    // half the gap between the panels), wrapped, the font made smaller
    // only where a word alone is wider; both panels' plots start and end
    // at the same height, below the taller head and above the taller foot.
    let room = width + gap / 2.0;
    let titles: Vec<(Fitted, Fitted)> = data
        .panels
        .iter()
        .map(|p| {
            let c = &p.curve;
            let head = head_parts(c, sys);
            let head: Vec<&str> = head.iter().map(String::as_str).collect();
            let foot = [
                format!("largest |M|, {} axis", c.axis),
                format!("({moment_unit})"),
            ];
            let foot: Vec<&str> = foot.iter().map(String::as_str).collect();
            (
                labels::fit(&head, " · ", room, title_px, measure),
                labels::fit(&foot, "  ", room, title_px, measure),
            )
        })
        .collect();
    let most = |f: fn(&(Fitted, Fitted)) -> f64| titles.iter().map(f).fold(0.0, f64::max);
    let head_h = most(|((l, size), _)| l.len() as f64 * labels::line_height(*size));
    let foot_h = most(|(_, (l, size))| l.len() as f64 * labels::line_height(*size));
    let top = (6.0 * dpr + head_h + 12.0 * dpr).max(34.0 * dpr);
    let bottom = f64::from(h) - (4.0 * dpr + foot_h + 4.0 * dpr + lh + 4.0 * dpr).max(44.0 * dpr);
    let mut marks = [(0, 0); 2];
    let n_step = tick_step(force(data.n_max), if narrow { 4.0 } else { 6.0 });
    // Both panels' numbers, written once the member's marks are known.
    let mut ticks = Ticks::default();
    for (i, panel) in data.panels.iter().enumerate() {
        let c = &panel.curve;
        let left = left0 + (i as f64) * (width + gap);
        let plot = Plot {
            left,
            top,
            right: left + width,
            bottom,
            m_max: panel.m_max,
            n_max: data.n_max,
        };
        let px = |m: f64, n: f64| plot.px(m, n);
        let path = |c: &Curve| {
            c.points
                .iter()
                .map(|p| px(p.moment_knm, p.axial_kn))
                .collect::<Vec<_>>()
        };
        // Grid and ticks, at round values of the unit shown.
        let m_step = tick_step(moment(panel.m_max), if narrow { 3.0 } else { 5.0 });
        let mut k = 0.0;
        while k * m_step <= moment(panel.m_max) * (1.0 + 1e-9) {
            let m = k * m_step / moment(1.0);
            root.draw(&line(vec![px(m, 0.0), px(m, data.n_max)], pal.grid, 1.0))
                .map_err(err)?;
            ticks.add(Tick::Below, working(k * m_step), px(m, 0.0), si(4.0));
            k += 1.0;
        }
        let mut k = 0.0;
        while k * n_step <= force(data.n_max) * (1.0 + 1e-9) {
            let n = k * n_step / force(1.0);
            root.draw(&line(vec![px(0.0, n), px(panel.m_max, n)], pal.grid, 1.0))
                .map_err(err)?;
            ticks.add(Tick::Left, working(k * n_step), px(0.0, n), si(4.0));
            k += 1.0;
        }
        root.draw(&line(
            vec![px(0.0, data.n_max), px(0.0, 0.0), px(panel.m_max, 0.0)],
            pal.ink,
            1.5,
        ))
        .map_err(err)?;
        // Titles: the axis above, the moment below, line by line.
        let (hx, _) = px(panel.m_max / 2.0, 0.0);
        let ((head, head_px), (foot, foot_px)) = titles.get(i).cloned().unwrap_or_default();
        let mut written = |lines: Vec<String>, size: f64, first_y: f64| -> Result<(), String> {
            let lh = labels::line_height(size);
            for (k, l) in lines.into_iter().enumerate() {
                let y = first_y + k as f64 * lh;
                boxes.text.push(TextBox {
                    x: f64::from(hx) - measure(&l, size) / 2.0,
                    y,
                    w: measure(&l, size),
                    h: lh,
                });
                root.draw(&Text::new(
                    l,
                    (hx, y.round() as i32),
                    font(size / dpr).pos(Pos::new(HPos::Center, VPos::Top)),
                ))
                .map_err(err)?;
            }
            Ok(())
        };
        written(head, head_px, 6.0 * dpr)?;
        let foot_y = f64::from(h) - 4.0 * dpr - foot.len() as f64 * labels::line_height(foot_px);
        written(foot, foot_px, foot_y)?;

        // The region within capacity, then the curves.
        if let Some(last) = c.points.last() {
            let mut area = vec![px(0.0, 0.0)];
            area.extend(path(c));
            area.push(px(0.0, last.axial_kn));
            root.draw(&Polygon::new(area, pal.shade.filled()))
                .map_err(err)?;
        }
        // A refused method is in the legend and the description, never a line.
        for (method, other) in panel
            .others
            .iter()
            .filter_map(|(m, o)| Some((m, o.curve()?)))
        {
            let j = *method as usize;
            let colour = METHOD_COLOUR.get(j).copied().unwrap_or(pal.ink);
            let (on, off) = METHOD_DASH.get(j).copied().unwrap_or((4.0, 4.0));
            dashed(path(other), on, off, colour, 1.75)?;
        }
        if c.worked {
            root.draw(&line(path(c), pal.major, 2.5)).map_err(err)?;
        } else {
            // Not a code check: drawn broken, and the description says so.
            dashed(path(c), 10.0, 6.0, pal.major, 2.5)?;
        }

        // The member: its point, and a line across to the curve at its
        // load ending in an open square (the most the curve allows there).
        let (ax, ay) = px(c.member_moment_knm, c.member_axial_kn);
        if let Some(m) = c.at_load_knm {
            let (rx, ry) = px(m, c.member_axial_kn);
            root.draw(&line(vec![(ax, ay), (rx, ry)], pal.ink, 1.0))
                .map_err(err)?;
            let half = si(4.5);
            root.draw(&Rectangle::new(
                [(rx - half, ry - half), (rx + half, ry + half)],
                pal.major.stroke_width(s(2.0)),
            ))
            .map_err(err)?;
        }
        let inside = c.contains_member();
        let r = s(6.0);
        root.draw(&Circle::new((ax, ay), r + s(2.0), pal.background.filled()))
            .map_err(err)?;
        if inside {
            root.draw(&Circle::new((ax, ay), r, pal.applied.filled()))
                .map_err(err)?;
        } else {
            // Outside: a ring with a cross, told apart without colour.
            root.draw(&Circle::new((ax, ay), r, pal.applied.stroke_width(s(2.0))))
                .map_err(err)?;
            let d = si(4.0);
            for seg in [
                vec![(ax - d, ay - d), (ax + d, ay + d)],
                vec![(ax - d, ay + d), (ax + d, ay - d)],
            ] {
                root.draw(&line(seg, pal.applied, 2.0)).map_err(err)?;
            }
        }
        // Within the plain sum is no pass while the method's interaction
        // is not worked: the tag says so rather than "within".
        let tag = match (c.worked, inside) {
            (false, _) => "member · not checked",
            (true, true) => "member · within",
            (true, false) => "member · over",
        };
        let ring = f64::from(r + s(2.0)) * 2.0;
        boxes
            .marks
            .push(TextBox::centred(f64::from(ax), f64::from(ay), ring, ring));
        let label_px = 12.0 * dpr;
        let tw = measure(tag, label_px) + 4.0 * dpr;
        let th = labels::line_height(label_px);
        let (fx, fy) = (f64::from(ax), f64::from(ay));
        let off = 10.0 * dpr + tw / 2.0;
        // Above right of the point, then above left, below right, below
        // left, then further up or down; inside the panel's plot.
        let mut candidates = Vec::with_capacity(12);
        for dy in [-12.0, 12.0, -28.0, 28.0, -44.0, 44.0] {
            candidates.push(TextBox::centred(fx + off, fy + dy * dpr, tw, th));
            candidates.push(TextBox::centred(fx - off, fy + dy * dpr, tw, th));
        }
        let within = TextBox {
            x: plot.left,
            y: plot.top,
            w: plot.right - plot.left,
            h: plot.bottom - plot.top,
        };
        let taken: Vec<TextBox> = boxes
            .marks
            .iter()
            .chain(boxes.text.iter())
            .copied()
            .collect();
        if let Some(b) = labels::place(&candidates, &taken, &within) {
            boxes.text.push(b);
            let (x0, y0) = (b.x.round() as i32, b.y.round() as i32);
            root.draw(&Rectangle::new(
                [(x0, y0), (x0 + b.w.round() as i32, y0 + b.h.round() as i32)],
                pal.background.mix(0.85).filled(),
            ))
            .map_err(err)?;
            root.draw(&Text::new(
                tag,
                (
                    (b.x + b.w / 2.0).round() as i32,
                    (b.y + b.h / 2.0).round() as i32,
                ),
                font(12.0).pos(Pos::new(HPos::Center, VPos::Center)),
            ))
            .map_err(err)?;
        }
        if let Some(slot) = marks.get_mut(i) {
            *slot = (ax, ay);
        }
    }
    ticks.write(root, &label, label_px, (measure, &mut *boxes))?;
    Ok(marks)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::sample_member;

    fn beam_column(axial: f64, m_major: f64) -> Prepared {
        let mut m = sample_member("A");
        m.method = Method::En1993;
        m.axial_kn = axial;
        m.m_major_a_knm = m_major;
        m.m_major_b_knm = 0.5 * m_major;
        Prepared::new(&m).unwrap()
    }

    #[test]
    fn the_chart_holds_the_member_and_says_where_it_is() {
        for (axial, mx) in [(20.0, 1.0), (20.0, 500.0)] {
            let p = beam_column(axial, mx);
            let r = p.check().unwrap();
            let d = build(&p, &r, false).unwrap();
            let major = &d.panels[0].curve;
            // The scales hold the curve and the member.
            assert!(d.n_max >= major.top_kn && d.n_max >= axial, "{d:?}");
            assert!(d.panels[0].m_max >= major.member_moment_knm);
            assert!(d.panels[0].m_max >= widest(major));
            let text = describe(&d, UnitSystem::Si);
            let place = if r.utilisation <= 1.0 {
                "is inside"
            } else {
                "is outside"
            };
            assert!(text.contains("major axis: at N_Ed 20.0 kN"), "{text}");
            assert!(text.contains(place), "{text}");
            assert!(text.contains(&crate::status::governing_text(&r)), "{text}");
            assert_eq!(major.contains_member(), r.utilisation <= 1.0);
            // The minor axis carries no moment here: said so.
            assert!(text.contains("uniform one is assumed"), "{text}");
        }
    }

    #[test]
    fn a_refused_compared_method_is_named_never_drawn() {
        // Equal end moments about the major axis: the secant method takes
        // them (its major curve is drawn) but has no minor curve (moments
        // about both axes); with unequal ones it refuses the member.
        let mut p = beam_column(20.0, 3.0);
        p.member.m_major_b_knm = 3.0;
        let d = build(&p, &p.check().unwrap(), true).unwrap();
        let secant = |panel: &Panel| {
            panel
                .others
                .iter()
                .find(|(m, _)| *m == Method::Secant)
                .map(|(_, c)| c.clone())
                .unwrap()
        };
        assert!(matches!(secant(&d.panels[0]), Compared::Curve(_)));
        let Compared::Refused(why) = secant(&d.panels[1]) else {
            panic!("secant's minor curve drawn: {d:?}");
        };
        assert!(why.contains("m_minor"), "{why}");
        let text = describe(&d, UnitSystem::Si);
        assert!(
            text.contains("minor axis")
                && text.contains("Secant formula, eccentric load refused, no curve"),
            "{text}"
        );
        let c = compared(&d);
        let (_, refused) = c.iter().find(|(m, _)| *m == Method::Secant).unwrap();
        assert_eq!(refused.len(), 1);
        assert_eq!(refused[0].0, "minor");

        // Unequal end moments: refused about both axes, with the reason.
        let p = beam_column(20.0, 3.0);
        let d = build(&p, &p.check().unwrap(), true).unwrap();
        for panel in &d.panels {
            assert!(
                matches!(secant(panel), Compared::Refused(ref w) if !w.is_empty()),
                "{d:?}"
            );
        }
        // No refused method reaches the scales or the lines drawn.
        let c = compared(&d);
        let (_, refused) = c.iter().find(|(m, _)| *m == Method::Secant).unwrap();
        assert_eq!(refused.len(), 2);
    }

    #[test]
    fn us_units_in_the_description() {
        let p = beam_column(20.0, 3.0);
        let d = build(&p, &p.check().unwrap(), false).unwrap();
        let text = describe(&d, UnitSystem::Us);
        assert!(text.contains("kip") && text.contains("kip·ft"), "{text}");
    }
}
