//! Draws the capacity envelope on a canvas with plotters: failure stress
//! against slenderness, Euler's hyperbola, the strength plateau, the
//! method's design curve about each axis with the region within capacity
//! shaded, the optional Perry-Robertson family and the member's markers.
//!
//! The canvas is drawn in device pixels (its width and height are its CSS
//! size times the device pixel ratio, set by the caller) with every length
//! and font scaled by that ratio, so lines and text stay crisp.

use plotters::coord::Shift;
use plotters::prelude::*;
use plotters::style::text_anchor::{HPos, Pos, VPos};
use plotters_canvas::CanvasBackend;
use strutline_core::check::Mode;
use web_sys::HtmlCanvasElement;

use super::data::ChartData;

/// Colours of one theme.
struct Palette {
    background: RGBColor,
    ink: RGBColor,
    grid: RGBColor,
    major: RGBColor,
    minor: RGBColor,
    euler: RGBColor,
    plateau: RGBColor,
    shade: RGBAColor,
    perry: [RGBColor; 3],
    applied: RGBColor,
}

fn palette(high_contrast: bool) -> Palette {
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

fn err<E: std::fmt::Debug>(e: E) -> String {
    format!("chart: {e:?}")
}

/// Draws `data` on `canvas` (already sized to CSS size x `dpr`) and records
/// the governing marker on the canvas element for tests:
/// `data-marker-slenderness`, `data-marker-stress-mpa` and `data-marker-px`
/// ("x,y" in CSS pixels within the canvas).
pub fn draw(
    canvas: &HtmlCanvasElement,
    data: &ChartData,
    dpr: f64,
    high_contrast: bool,
) -> Result<(), String> {
    let backend = CanvasBackend::with_canvas_object(canvas.clone())
        .ok_or("chart: the canvas has no 2D context")?;
    let root = backend.into_drawing_area();
    let px = draw_on(&root, data, dpr, &palette(high_contrast))?;
    root.present().map_err(err)?;
    if let Some((m_lambda, m_stress, (x, y))) = px {
        let set = |k: &str, v: String| canvas.set_attribute(k, &v).map_err(err);
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

fn draw_on<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    data: &ChartData,
    dpr: f64,
    pal: &Palette,
) -> Result<Governing, String>
where
    DB::ErrorType: 'static,
{
    let s = |v: f64| (v * dpr).round().max(1.0) as u32;
    let font = |size: f64| ("sans-serif", size * dpr).into_font().color(&pal.ink);
    root.fill(&pal.background).map_err(err)?;
    let (w, _) = root.dim_in_pixel();
    let narrow = f64::from(w) / dpr < 480.0;
    let mut chart = ChartBuilder::on(root)
        .margin(s(10.0))
        .margin_right(s(18.0))
        .x_label_area_size(s(46.0))
        .y_label_area_size(s(if narrow { 52.0 } else { 62.0 }))
        .build_cartesian_2d(0.0..data.x_max, 0.0..data.y_max)
        .map_err(err)?;
    chart
        .configure_mesh()
        .x_desc("slenderness L_cr / i  (–)")
        .y_desc("failure stress N / A  (MPa)")
        .label_style(font(if narrow { 11.0 } else { 13.0 }))
        .axis_desc_style(font(if narrow { 12.0 } else { 14.0 }))
        .bold_line_style(pal.grid.stroke_width(s(1.0)))
        .light_line_style(pal.grid.mix(0.35).stroke_width(s(1.0)))
        .axis_style(pal.ink.stroke_width(s(1.0)))
        .x_labels(if narrow { 5 } else { 10 })
        .y_labels(8)
        .draw()
        .map_err(err)?;

    // The region within capacity: below the lower of the two design curves.
    let lower: Vec<(f64, f64)> = match (data.design.first(), data.design.get(1)) {
        (Some((_, a)), Some((_, b))) => a
            .points
            .iter()
            .zip(b.points.iter())
            .map(|(&(x, ya), &(_, yb))| (x, ya.min(yb)))
            .collect(),
        (Some((_, a)), None) => a.points.clone(),
        _ => Vec::new(),
    };
    chart
        .draw_series(AreaSeries::new(lower, 0.0, pal.shade.filled()))
        .map_err(err)?;

    let plateau = [(0.0, data.yield_mpa), (data.x_max, data.yield_mpa)];
    chart
        .draw_series(DashedLineSeries::new(
            plateau,
            s(8.0),
            s(5.0),
            pal.plateau.stroke_width(s(1.5)),
        ))
        .map_err(err)?;

    if !data.euler.is_empty() {
        let euler = data.euler.clone();
        chart
            .draw_series(DashedLineSeries::new(
                euler,
                s(3.0),
                s(3.0),
                pal.euler.stroke_width(s(1.5)),
            ))
            .map_err(err)?;
    }

    for (i, curve) in data.perry.iter().enumerate() {
        let c = pal.perry.get(i).copied().unwrap_or(pal.ink);
        chart
            .draw_series(LineSeries::new(
                curve.points.iter().copied(),
                c.stroke_width(s(1.0)),
            ))
            .map_err(err)?;
    }

    for (mode, curve) in &data.design {
        let (c, width) = match mode {
            Mode::Major => (pal.major, 2.5),
            _ => (pal.minor, 2.5),
        };
        let style = c.stroke_width(s(width));
        if *mode == Mode::Major {
            chart
                .draw_series(LineSeries::new(curve.points.iter().copied(), style))
                .map_err(err)?;
        } else {
            chart
                .draw_series(DashedLineSeries::new(
                    curve.points.iter().copied(),
                    s(10.0),
                    s(5.0),
                    style,
                ))
                .map_err(err)?;
        }
    }

    // Markers: applied stress (filled dot, larger for the governing mode)
    // and the mode's resistance (open square), joined by a line. Labels sit
    // right of the dot unless that would leave the plot, and stack
    // downwards when two markers are close.
    let mut governing = None;
    let (plot_x, _) = chart.plotting_area().get_pixel_range();
    let mut taken: Vec<(i32, i32)> = Vec::with_capacity(data.markers.len());
    let mut order: Vec<&super::data::Marker> = data.markers.iter().collect();
    order.sort_by_key(|m| !m.governing);
    for m in order {
        let c = match m.mode {
            Mode::Major => pal.major,
            Mode::Minor => pal.minor,
            _ => pal.ink,
        };
        let x = m.slenderness.clamp(0.0, data.x_max);
        let applied = m.applied_mpa.min(data.y_max);
        let res = m.resistance_mpa.min(data.y_max);
        chart
            .draw_series(std::iter::once(PathElement::new(
                [(x, applied), (x, res)],
                c.stroke_width(s(1.0)),
            )))
            .map_err(err)?;
        let (rx, ry) = chart.backend_coord(&(x, res));
        let half = s(5.0) as i32;
        root.draw(&Rectangle::new(
            [(rx - half, ry - half), (rx + half, ry + half)],
            c.stroke_width(s(2.0)),
        ))
        .map_err(err)?;
        let (ax, ay) = chart.backend_coord(&(x, applied));
        let r = s(if m.governing { 7.0 } else { 5.0 });
        root.draw(&Circle::new((ax, ay), r, pal.applied.filled()))
            .map_err(err)?;
        root.draw(&Circle::new(
            (ax, ay),
            r + s(2.0),
            pal.background.stroke_width(s(1.5)),
        ))
        .map_err(err)?;
        let name = match m.mode {
            Mode::Major => "major axis",
            Mode::Minor => "minor axis",
            Mode::Torsional => "torsional",
            Mode::FlexuralTorsional => "flexural-torsional",
            Mode::Section => "cross-section",
        };
        let tag = if m.governing {
            format!("{name} · governs")
        } else {
            name.to_string()
        };
        let probe = font(12.0);
        let (tw, th) = root.estimate_text_size(&tag, &probe).map_err(err)?;
        let gap = r as i32 + s(5.0) as i32;
        let right = ax + gap + tw as i32 <= plot_x.end;
        let (anchor, lx) = if right {
            (HPos::Left, ax + gap)
        } else {
            (HPos::Right, ax - gap)
        };
        let mut ly = ay;
        let step = th as i32 + s(3.0) as i32;
        while taken
            .iter()
            .any(|&(tx, ty)| (tx - lx).abs() < tw as i32 && (ty - ly).abs() < step)
        {
            ly += step;
        }
        taken.push((lx, ly));
        let style = font(12.0).pos(Pos::new(anchor, VPos::Center));
        root.draw(&Text::new(tag, (lx, ly), style)).map_err(err)?;
        if m.governing {
            governing = Some((m.slenderness, m.applied_mpa, (ax, ay)));
        }
    }
    if governing.is_none() {
        if let Some(g) = data.governing() {
            let (ax, ay) = chart.backend_coord(&(
                g.slenderness.clamp(0.0, data.x_max),
                g.applied_mpa.min(data.y_max),
            ));
            governing = Some((g.slenderness, g.applied_mpa, (ax, ay)));
        }
    }

    Ok(governing)
}
