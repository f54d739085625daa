//! Draws the capacity envelope on a canvas with plotters: failure stress
//! against slenderness, Euler's hyperbola, the strength plateau, the
//! method's design curve about each axis with the region within capacity
//! shaded, the optional Perry-Robertson family, the optional curves of the
//! other methods that apply and the member's markers.
//!
//! The canvas is drawn in device pixels (its width and height are its CSS
//! size times the device pixel ratio, set by the caller) with every length
//! and font scaled by that ratio, so lines and text stay crisp.

use plotters::coord::Shift;
use plotters::element::{Circle, PathElement, Polygon, Rectangle, Text};
use plotters::prelude::{DrawingArea, DrawingBackend};
use plotters::style::text_anchor::{HPos, Pos, VPos};
use plotters::style::{Color, FontTransform, IntoFont, RGBAColor, RGBColor};
use strutline_core::check::Mode;
use strutline_core::units;
use web_sys::HtmlCanvasElement;

use super::data::{dashes, lower, tick_step, ChartData, Frame};
use super::labels::{self, Boxes, Measure, TextBox, Tick, Ticks};
use crate::numtext::working;

/// Colours of one theme.
pub(super) struct Palette {
    pub(super) background: RGBColor,
    pub(super) ink: RGBColor,
    pub(super) grid: RGBColor,
    pub(super) major: RGBColor,
    pub(super) minor: RGBColor,
    pub(super) euler: RGBColor,
    pub(super) plateau: RGBColor,
    pub(super) shade: RGBAColor,
    pub(super) perry: [RGBColor; 3],
    pub(super) applied: RGBColor,
}

/// Colour of each method's curve when compared, in `Method::ALL` order:
/// one set for both themes, each at least 4.5:1 against white, so the
/// high-contrast theme needs no set of its own.
pub(super) const METHOD_COLOUR: [RGBColor; 8] = [
    RGBColor(0, 120, 120),
    RGBColor(170, 30, 130),
    RGBColor(110, 110, 0),
    RGBColor(200, 30, 30),
    RGBColor(120, 70, 20),
    RGBColor(95, 50, 180),
    RGBColor(30, 130, 30),
    RGBColor(60, 75, 95),
];

/// Dash and gap (CSS px) of each method's curve when compared, in
/// `Method::ALL` order; the legend's swatches (style.css `.sw-m0` to
/// `.sw-m7`) draw the same colour and pattern, so a curve is told by its
/// dash as well as its colour.
pub(super) const METHOD_DASH: [(f64, f64); 8] = [
    (14.0, 4.0),
    (6.0, 3.0),
    (2.0, 4.0),
    (18.0, 4.0),
    (9.0, 9.0),
    (3.0, 8.0),
    (5.0, 2.0),
    (24.0, 6.0),
];

pub(super) fn palette(high_contrast: bool) -> Palette {
    if high_contrast {
        Palette {
            background: RGBColor(255, 255, 255),
            ink: RGBColor(0, 0, 0),
            grid: RGBColor(150, 150, 150),
            major: RGBColor(0, 0, 160),
            minor: RGBColor(0, 0, 0),
            euler: RGBColor(120, 0, 0),
            plateau: RGBColor(0, 0, 0),
            shade: RGBColor(0, 90, 200).mix(0.18),
            perry: [
                RGBColor(90, 0, 110),
                RGBColor(0, 90, 0),
                RGBColor(110, 60, 0),
            ],
            applied: RGBColor(0, 0, 0),
        }
    } else {
        Palette {
            background: RGBColor(252, 251, 247),
            ink: RGBColor(28, 34, 43),
            grid: RGBColor(214, 211, 202),
            major: RGBColor(25, 95, 170),
            minor: RGBColor(160, 60, 20),
            euler: RGBColor(110, 110, 110),
            plateau: RGBColor(70, 70, 70),
            shade: RGBColor(40, 130, 110).mix(0.16),
            perry: [
                RGBColor(120, 70, 150),
                RGBColor(40, 130, 90),
                RGBColor(170, 120, 20),
            ],
            applied: RGBColor(20, 20, 20),
        }
    }
}

/// A drawing error in words. The canvas's own error object is not
/// formatted (that would ship a JS value formatter for a message no one
/// can act on); the chart simply says it could not draw.
pub(super) fn err<E>(_: E) -> String {
    "chart: the canvas could not be drawn on (try reloading the page)".to_string()
}

/// Draws `data` on `canvas` (already sized to CSS size x `dpr`) and records
/// on the canvas element for tests the number of curves drawn
/// (`data-curves`: design, Perry-Robertson and other methods) and the
/// governing marker: `data-marker-slenderness`, `data-marker-stress-mpa`
/// and `data-marker-px` ("x,y" in CSS pixels within the canvas). The stress axis is labelled in
/// MPa, or in ksi when `us` (the curves are the same; only the tick values
/// and the unit change). Every box it writes a title or label in is
/// recorded as `data-text-boxes`, every marker it keeps them clear of as
/// `data-mark-boxes` ([`Boxes::record_on`]).
pub fn draw(
    canvas: &HtmlCanvasElement,
    data: &ChartData,
    dpr: f64,
    high_contrast: bool,
    us: bool,
) -> Result<(), String> {
    let px = super::on_canvas(canvas, dpr, |root, text| {
        draw_on(root, data, dpr, &palette(high_contrast), us, text)
    })?;
    let set = |k: &str, v: String| canvas.set_attribute(k, &v).map_err(err);
    let curves = data.design.len() + data.perry.len() + data.others.len();
    set("data-curves", curves.to_string())?;
    if let Some((m_lambda, m_stress, (x, y))) = px {
        set("data-marker-slenderness", format!("{m_lambda:.2}"))?;
        set("data-marker-stress-mpa", format!("{m_stress:.2}"))?;
        set(
            "data-marker-px",
            format!("{:.1},{:.1}", f64::from(x) / dpr, f64::from(y) / dpr),
        )?;
    }
    Ok(())
}

type Governing = Option<(f64, f64, (i32, i32))>;

/// Draws the chart on `root`; `text` measures text and collects the box
/// of every title and label written.
fn draw_on<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    data: &ChartData,
    dpr: f64,
    pal: &Palette,
    us: bool,
    text: (Measure, &mut Boxes),
) -> Result<Governing, String>
where
    DB::ErrorType: 'static,
{
    let (measure, boxes) = text;
    let s = |v: f64| (v * dpr).round().max(1.0) as u32;
    let si = |v: f64| (v * dpr).round() as i32;
    let font = |size: f64| ("sans-serif", size * dpr).into_font().color(&pal.ink);
    root.fill(&pal.background).map_err(err)?;
    let (w, h) = root.dim_in_pixel();
    let narrow = f64::from(w) / dpr < 480.0;
    let frame = Frame {
        left: (if narrow { 52.0 } else { 64.0 }) * dpr,
        top: 12.0 * dpr,
        right: f64::from(w) - 18.0 * dpr,
        bottom: f64::from(h) - 48.0 * dpr,
        x_max: data.x_max,
        y_max: data.y_max,
    };
    let px = |x: f64, y: f64| frame.px(x, y);
    let line = |pts: Vec<(i32, i32)>, c: RGBColor, width: f64| {
        PathElement::new(pts, c.stroke_width(s(width)))
    };
    let path = |pts: &[(f64, f64)]| pts.iter().map(|&(x, y)| px(x, y)).collect::<Vec<_>>();
    let label_px = if narrow { 11.0 } else { 13.0 } * dpr;
    let label = font(label_px / dpr);

    // Grid, ticks and their values.
    let xs = tick_step(data.x_max, if narrow { 5.0 } else { 10.0 });
    // Stress ticks at round values of the unit shown.
    let per_mpa = if us { units::mpa_to_ksi(1.0) } else { 1.0 };
    let ys = tick_step(data.y_max * per_mpa, 8.0) / per_mpa;
    // Written once the marks are known (Ticks::write).
    let mut ticks = Ticks::default();
    let mut k = 0.0;
    while k * xs <= data.x_max + 1e-9 {
        let x = k * xs;
        root.draw(&line(vec![px(x, 0.0), px(x, data.y_max)], pal.grid, 1.0))
            .map_err(err)?;
        ticks.add(Tick::Below, format!("{x:.0}"), px(x, 0.0), si(5.0));
        k += 1.0;
    }
    let mut k = 0.0;
    while k * ys <= data.y_max + 1e-9 {
        let y = k * ys;
        root.draw(&line(vec![px(0.0, y), px(data.x_max, y)], pal.grid, 1.0))
            .map_err(err)?;
        ticks.add(Tick::Left, working(y * per_mpa), px(0.0, y), si(6.0));
        k += 1.0;
    }
    root.draw(&line(
        vec![px(0.0, data.y_max), px(0.0, 0.0), px(data.x_max, 0.0)],
        pal.ink,
        1.5,
    ))
    .map_err(err)?;
    let title_px = if narrow { 12.0 } else { 14.0 } * dpr;
    let title = font(title_px / dpr);
    let (cx, _) = px(data.x_max / 2.0, 0.0);
    let across = "slenderness L_cr / i  (–)";
    root.draw(&Text::new(
        across,
        (cx, h as i32 - si(6.0)),
        title.clone().pos(Pos::new(HPos::Center, VPos::Bottom)),
    ))
    .map_err(err)?;
    let lh = labels::line_height(title_px);
    boxes.text.push(TextBox::centred(
        f64::from(cx),
        f64::from(h) - 6.0 * dpr - lh / 2.0,
        measure(across, title_px),
        lh,
    ));
    let (_, cy) = px(0.0, data.y_max / 2.0);
    let up = if us {
        "failure stress N / A  (ksi)"
    } else {
        "failure stress N / A  (MPa)"
    };
    root.draw(&Text::new(
        up,
        (si(4.0), cy),
        title
            .transform(FontTransform::Rotate270)
            .pos(Pos::new(HPos::Center, VPos::Top)),
    ))
    .map_err(err)?;
    // Turned a quarter: as wide as a line is high, as tall as it is long.
    boxes.text.push(TextBox::centred(
        4.0 * dpr + lh / 2.0,
        f64::from(cy),
        lh,
        measure(up, title_px),
    ));

    // The region within capacity: below the lower of the two design curves.
    let within: Vec<(f64, f64)> = match (data.design.first(), data.design.get(1)) {
        (Some((_, a)), Some((_, b))) => lower(&a.points, &b.points),
        (Some((_, a)), None) => a.points.clone(),
        _ => Vec::new(),
    };
    if let (Some(first), Some(last)) = (within.first(), within.last()) {
        let mut area = vec![px(first.0, 0.0)];
        area.extend(path(&within));
        area.push(px(last.0, 0.0));
        root.draw(&Polygon::new(area, pal.shade.filled()))
            .map_err(err)?;
    }

    let dashed =
        |pts: Vec<(i32, i32)>, on: f64, off: f64, c: RGBColor, width: f64| -> Result<(), String> {
            for d in dashes(&pts, on * dpr, off * dpr) {
                root.draw(&line(d, c, width)).map_err(err)?;
            }
            Ok(())
        };
    dashed(
        path(&[(0.0, data.yield_mpa), (data.x_max, data.yield_mpa)]),
        8.0,
        5.0,
        pal.plateau,
        1.5,
    )?;
    dashed(path(&data.euler), 2.0, 3.0, pal.euler, 1.5)?;
    for (i, curve) in data.perry.iter().enumerate() {
        let c = pal.perry.get(i).copied().unwrap_or(pal.ink);
        root.draw(&line(path(&curve.points), c, 1.0)).map_err(err)?;
    }
    // Other methods under the member's own curves, thinner, each in its
    // own colour and dash.
    for (method, curve) in &data.others {
        let i = *method as usize;
        let c = METHOD_COLOUR.get(i).copied().unwrap_or(pal.ink);
        let (on, off) = METHOD_DASH.get(i).copied().unwrap_or((4.0, 4.0));
        dashed(path(&curve.points), on, off, c, 1.75)?;
    }
    for (mode, curve) in &data.design {
        if *mode == Mode::Major {
            root.draw(&line(path(&curve.points), pal.major, 2.5))
                .map_err(err)?;
        } else {
            dashed(path(&curve.points), 10.0, 5.0, pal.minor, 2.5)?;
        }
    }

    // Markers: applied stress (filled dot, larger for the governing mode)
    // and the mode's resistance (open square), joined by a line; every
    // marker first, then the labels, each placed clear of the marks, of
    // the labels before it and of the plot's edges.
    let mut governing = None;
    let mut order: Vec<&super::data::Marker> = data.markers.iter().collect();
    order.sort_by_key(|m| !m.governing);
    let mut marks: Vec<TextBox> = Vec::with_capacity(2 * order.len());
    let mut dots = Vec::with_capacity(order.len());
    for m in &order {
        let c = match m.mode {
            Mode::Major => pal.major,
            Mode::Minor => pal.minor,
            _ => pal.ink,
        };
        let (ax, ay) = px(m.slenderness, m.applied_mpa);
        let (rx, ry) = px(m.slenderness, m.resistance_mpa);
        root.draw(&line(vec![(ax, ay), (rx, ry)], c, 1.0))
            .map_err(err)?;
        let half = si(5.0);
        root.draw(&Rectangle::new(
            [(rx - half, ry - half), (rx + half, ry + half)],
            c.stroke_width(s(2.0)),
        ))
        .map_err(err)?;
        let r = s(if m.governing { 7.0 } else { 5.0 });
        root.draw(&Circle::new((ax, ay), r, pal.applied.filled()))
            .map_err(err)?;
        root.draw(&Circle::new(
            (ax, ay),
            r + s(2.0),
            pal.background.stroke_width(s(1.5)),
        ))
        .map_err(err)?;
        let ring = f64::from(r + s(2.0)) * 2.0;
        marks.push(TextBox::centred(f64::from(ax), f64::from(ay), ring, ring));
        let side = f64::from(half * 2 + si(2.0));
        marks.push(TextBox::centred(f64::from(rx), f64::from(ry), side, side));
        dots.push((ax, ay, r));
        if m.governing {
            governing = Some((m.slenderness, m.applied_mpa, (ax, ay)));
        }
    }
    let plot = TextBox {
        x: frame.left,
        y: 0.0,
        w: f64::from(w) - frame.left,
        h: frame.bottom,
    };
    let label_px = 12.0 * dpr;
    let mut placed: Vec<TextBox> = Vec::with_capacity(order.len());
    for (m, &(ax, ay, r)) in order.iter().zip(&dots) {
        let name = match m.mode {
            Mode::Major => "major axis",
            Mode::Minor => "minor axis",
            Mode::Torsional => "torsional",
            Mode::FlexuralTorsional => "flexural-torsional",
            Mode::Section => "cross-section",
        };
        let name = match m.axis {
            Some(axis) => format!("{name} {axis}"),
            None => name.to_string(),
        };
        let tag = if m.governing {
            format!("{name} · governs")
        } else {
            name
        };
        // Measured with the canvas's own measureText (plotters' own
        // measuring needs a styled element, which the page's style-src
        // policy refuses); a little room either side.
        let tw = measure(&tag, label_px) + 4.0 * dpr;
        let th = labels::line_height(label_px);
        let gap = f64::from(r) + 5.0 * dpr;
        let (ax, ay) = (f64::from(ax), f64::from(ay));
        // Right of the dot, left of it, just over it, just under it, then
        // right or left stepping down, then up.
        let mut candidates = Vec::with_capacity(28);
        let over = f64::from(r) + 3.0 * dpr + th / 2.0;
        candidates.push(TextBox::centred(ax + gap + tw / 2.0, ay, tw, th));
        candidates.push(TextBox::centred(ax - gap - tw / 2.0, ay, tw, th));
        candidates.push(TextBox::centred(ax, ay - over, tw, th));
        candidates.push(TextBox::centred(ax, ay + over, tw, th));
        for k in [1, 2, 3, 4, 5, 6, -1, -2, -3, -4, -5, -6] {
            let y = ay + f64::from(k) * (th + 3.0 * dpr);
            candidates.push(TextBox::centred(ax + gap + tw / 2.0, y, tw, th));
            candidates.push(TextBox::centred(ax - gap - tw / 2.0, y, tw, th));
        }
        let taken: Vec<TextBox> = marks.iter().chain(placed.iter()).copied().collect();
        let Some(b) = labels::place(&candidates, &taken, &plot) else {
            continue;
        };
        placed.push(b);
        // A label moved away from its dot is tied to it by a thin line,
        // from the dot's ring to the label's nearest edge.
        let (nx, ny) = (ax.clamp(b.x, b.x + b.w), ay.clamp(b.y, b.y + b.h));
        let far = (nx - ax).hypot(ny - ay);
        let ring = f64::from(r) + 2.0 * dpr;
        if far > gap + 2.0 * dpr {
            let (ux, uy) = ((nx - ax) / far, (ny - ay) / far);
            let from = (ax + ux * ring, ay + uy * ring);
            root.draw(&line(
                vec![
                    (from.0.round() as i32, from.1.round() as i32),
                    (nx.round() as i32, ny.round() as i32),
                ],
                pal.ink,
                1.0,
            ))
            .map_err(err)?;
        }
        // On a patch of the background, so curves passing under the label
        // (many when methods are compared) do not cut through its text.
        let (x0, y0) = (b.x.round() as i32, b.y.round() as i32);
        root.draw(&Rectangle::new(
            [(x0, y0), (x0 + b.w.round() as i32, y0 + b.h.round() as i32)],
            pal.background.mix(0.85).filled(),
        ))
        .map_err(err)?;
        let style = font(12.0).pos(Pos::new(HPos::Center, VPos::Center));
        let centre = (
            (b.x + b.w / 2.0).round() as i32,
            (b.y + b.h / 2.0).round() as i32,
        );
        root.draw(&Text::new(tag, centre, style)).map_err(err)?;
    }
    boxes.text.extend(placed);
    boxes.marks.extend(marks);
    ticks.write(root, &label, label_px, (measure, &mut *boxes))?;
    if governing.is_none() {
        if let Some(g) = data.governing() {
            governing = Some((
                g.slenderness,
                g.applied_mpa,
                px(g.slenderness, g.applied_mpa),
            ));
        }
    }
    Ok(governing)
}
