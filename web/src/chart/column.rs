//! The column of a buckling model drawn to scale, once for each axis:
//! its segments by width, its end supports, braces and axial loads, and
//! the buckled shape the engine's analysis returns
//! (`check::buckle::buckle`), with alpha_cr and the buckling length.
//!
//! [`of_member`] analyses a member's model and works out what is drawn
//! without any drawing ([`sketch`], tested on the host); [`draw_on`] draws
//! it on the panel's canvas ([`draw`], in device pixels like the envelope
//! chart) and, for the calc sheet, on an offscreen canvas turned into a PNG
//! ([`png`]), so the sheet prints the drawing the panel shows. One plotters
//! backend (canvas) only: a second (SVG) cost 6.4 KB of the gzipped dist
//! for the same drawing.

use plotters::coord::Shift;
use plotters::element::{Circle, PathElement, Polygon, Rectangle, Text};
use plotters::prelude::{DrawingArea, DrawingBackend, IntoDrawingArea};
use plotters::style::text_anchor::{HPos, Pos, VPos};
use plotters::style::{Color, IntoFont, RGBColor};
use plotters_canvas::CanvasBackend;
use strutline_core::buckling::column::Buckle;
use strutline_core::buckling::model::BucklingModel;
use strutline_core::buckling::{Axis, Fixity, Support};
use strutline_core::catalogue;
use strutline_core::check::buckle::{buckle, MemberBuckle};
use strutline_core::section::Section;
use strutline_core::units::UnitSystem;
use strutline_core::Member;
use web_sys::HtmlCanvasElement;

use super::data::dashes;
use crate::numtext::fixed;
use crate::units_view::{result_text, span_text};

/// A segment as drawn: from, to (mm from end A) and its width as a
/// fraction of the widest (the fourth root of I about the axis, so a
/// section twice as deep looks about twice as wide).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Piece {
    /// Start, mm from end A.
    pub from_mm: f64,
    /// End, mm from end A.
    pub to_mm: f64,
    /// Width, 0 to 1.
    pub width: f64,
}

/// A brace as drawn.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Hold {
    /// Where, mm from end A.
    pub at_mm: f64,
    /// Rigid (true) or a spring.
    pub rigid: bool,
}

/// One axis as drawn.
#[derive(Debug, Clone, PartialEq)]
pub struct AxisSketch {
    /// Which axis.
    pub axis: Axis,
    /// The segments from end A.
    pub pieces: Vec<Piece>,
    /// End A's and end B's support about this axis.
    pub ends: [Support; 2],
    /// The braces that hold this axis.
    pub holds: Vec<Hold>,
    /// The buckled shape, [x mm, deflection], largest 1 (empty when the
    /// analysis gave no answer).
    pub mode: Vec<[f64; 2]>,
    /// "alpha_cr = 3.21" and "L_cr = 6.12 m", or the refusal.
    pub caption: Vec<String>,
}

/// Everything drawn.
#[derive(Debug, Clone, PartialEq)]
pub struct Sketch {
    /// The member length, mm.
    pub length_mm: f64,
    /// The point loads: mm from end A, and the load in words ("420 kN").
    pub loads: Vec<(f64, String)>,
    /// The distributed load, kN/m.
    pub distributed_kn_per_m: f64,
    /// Major axis, then minor.
    pub axes: [AxisSketch; 2],
}

/// A member's model analysed and what is drawn of it.
#[derive(Debug, Clone, PartialEq)]
pub struct Analysed {
    /// What is drawn.
    pub sketch: Sketch,
    /// The engine's analysis of both axes, or its refusal in words.
    pub result: Result<MemberBuckle, String>,
}

/// The analysis of `m`'s buckling model (`None` without one) by core's
/// [`buckle`] and its sketch, lengths and loads worded in `sys`'s units:
/// what the column-model panel draws and the calc sheet prints.
/// `load_given`: whether the member's design load is the engineer's (a new
/// member's stands in until it is typed); where the model has no loads of
/// its own and it is not, no load is drawn and N_cr is written for alpha_cr.
pub fn of_member(m: &Member, sys: UnitSystem, load_given: bool) -> Option<Analysed> {
    let model = m.buckling_model.as_ref()?;
    let result = match buckle(m) {
        Ok(Some(b)) => Ok(b),
        Ok(None) => Err("no model".to_string()),
        Err(e) => Err(crate::fields::error_text(&e)),
    };
    let own = catalogue::build(&m.section).ok();
    let segs = crate::modelform::segments(model, m.length_mm);
    let built: Vec<Option<Section>> = segs
        .iter()
        .map(|s| match &s.section {
            None => own.clone(),
            Some(spec) => catalogue::build(spec).ok(),
        })
        .collect();
    let pairs: Vec<(f64, Option<&Section>)> = segs
        .iter()
        .zip(&built)
        .map(|(s, b)| (s.length_mm, b.as_ref()))
        .collect();
    let sketch = sketch(
        model,
        m.length_mm,
        (load_given && m.axial_kn > 0.0).then_some(m.axial_kn),
        &pairs,
        &result,
        &|unit, v| match unit {
            "mm" => span_text(sys, v),
            _ => result_text(sys, unit, v, 0),
        },
    );
    Some(Analysed { sketch, result })
}

/// What to draw for a model of a member `length_mm` long carrying
/// `axial_kn` (`None`: no design load given). `sections` are the segments'
/// lengths and sections (one for a model without segments: the member's),
/// `result` the analysis or its refusal in words, `text` words a value in
/// an engine unit (a length in "mm", a force in "kN") in the units shown.
/// Without loads in the model the pattern drawn is the engine's:
/// `axial_kn` at end B; with no design load given none is drawn (no load
/// is made up) and each axis is captioned with N_cr, not alpha_cr, which
/// is a factor on the load.
pub fn sketch(
    model: &BucklingModel,
    length_mm: f64,
    axial_kn: Option<f64>,
    sections: &[(f64, Option<&Section>)],
    result: &Result<MemberBuckle, String>,
    text: &dyn Fn(&'static str, f64) -> String,
) -> Sketch {
    let axis_sketch = |axis: Axis| {
        let i = |s: Option<&Section>| {
            s.map_or(0.0, |s| match axis {
                Axis::Major => s.props.i_major_mm4,
                Axis::Minor => s.props.i_minor_mm4,
            })
            .max(0.0)
            .sqrt()
            .sqrt()
        };
        let widest = sections.iter().map(|(_, s)| i(*s)).fold(0.0_f64, f64::max);
        let mut from = 0.0;
        let pieces = sections
            .iter()
            .map(|&(l, s)| {
                let width = if widest > 0.0 {
                    (i(s) / widest).max(0.3)
                } else {
                    1.0
                };
                let p = Piece {
                    from_mm: from,
                    to_mm: from + l,
                    width,
                };
                from += l;
                p
            })
            .collect();
        let pick = |e: &strutline_core::buckling::model::End| match axis {
            Axis::Major => e.major,
            Axis::Minor => e.minor,
        };
        let holds = model
            .restraints
            .iter()
            .filter(|r| r.axis.holds(axis))
            .map(|r| Hold {
                at_mm: r.at_mm,
                rigid: r.translation == Fixity::Fixed,
            })
            .collect();
        let (mode, caption) = match result {
            Ok(b) => {
                let b: &Buckle = match axis {
                    Axis::Major => &b.major,
                    Axis::Minor => &b.minor,
                };
                let first = if model.carries_own_loads() || axial_kn.is_some() {
                    format!("α_cr = {}", fixed(b.load_factor, 3))
                } else {
                    format!("N_cr = {}", text("kN", b.critical_kn))
                };
                (
                    b.mode.clone(),
                    vec![
                        first,
                        format!("L_cr = {}", text("mm", b.buckling_length_mm)),
                    ],
                )
            }
            Err(e) => (Vec::new(), vec![e.clone()]),
        };
        AxisSketch {
            axis,
            pieces,
            ends: [pick(&model.ends.a), pick(&model.ends.b)],
            holds,
            mode,
            caption,
        }
    };
    Sketch {
        length_mm,
        loads: if !model.carries_own_loads() {
            axial_kn
                .map(|kn| vec![(length_mm, text("kN", kn))])
                .unwrap_or_default()
        } else {
            model
                .axial_loads
                .iter()
                .map(|p| (p.at_mm, text("kN", p.axial_kn)))
                .collect()
        },
        distributed_kn_per_m: model.distributed_kn_per_m,
        axes: [axis_sketch(Axis::Major), axis_sketch(Axis::Minor)],
    }
}

/// Colours of one theme.
struct Palette {
    background: RGBColor,
    ink: RGBColor,
    steel: RGBColor,
    shape: [RGBColor; 2],
    load: RGBColor,
    faint: RGBColor,
}

fn palette(high_contrast: bool) -> Palette {
    if high_contrast {
        Palette {
            background: RGBColor(255, 255, 255),
            ink: RGBColor(0, 0, 0),
            steel: RGBColor(200, 200, 200),
            shape: [RGBColor(0, 0, 160), RGBColor(120, 0, 0)],
            load: RGBColor(0, 0, 0),
            faint: RGBColor(90, 90, 90),
        }
    } else {
        Palette {
            background: RGBColor(252, 251, 247),
            ink: RGBColor(28, 34, 43),
            steel: RGBColor(196, 204, 212),
            shape: [RGBColor(25, 95, 170), RGBColor(160, 60, 20)],
            load: RGBColor(120, 70, 20),
            faint: RGBColor(150, 146, 136),
        }
    }
}

fn err<E>(_: E) -> String {
    "column drawing: the canvas could not be drawn on (try reloading the page)".to_string()
}

/// Draws `sketch` on `canvas` (already sized to CSS size x `dpr`) and
/// records for tests on the canvas element the number of buckled shapes
/// drawn (`data-shapes`) and each shape's largest sideways offset in CSS
/// px (`data-shape-px`, "major,minor").
pub fn draw(
    canvas: &HtmlCanvasElement,
    sketch: &Sketch,
    dpr: f64,
    high_contrast: bool,
) -> Result<(), String> {
    let backend = CanvasBackend::with_canvas_object(canvas.clone())
        .ok_or("column drawing: the canvas has no 2D context")?;
    let root = backend.into_drawing_area();
    let offsets = draw_on(&root, sketch, dpr, &palette(high_contrast))?;
    root.present().map_err(err)?;
    let drawn = offsets.iter().filter(|o| **o > 0.0).count();
    canvas
        .set_attribute("data-shapes", &drawn.to_string())
        .map_err(err)?;
    canvas
        .set_attribute(
            "data-shape-px",
            &format!(
                "{:.1},{:.1}",
                offsets.first().unwrap_or(&0.0) / dpr,
                offsets.get(1).unwrap_or(&0.0) / dpr
            ),
        )
        .map_err(err)?;
    Ok(())
}

/// The sketch as a PNG `data:` URL for the calc sheet, `width` x `height`
/// CSS px drawn at `scale` device px each (so it prints sharp): the panel's
/// drawing ([`draw`]) on an offscreen canvas in the high-contrast colours,
/// which print well. Returns the URL and the number of buckled shapes
/// drawn. Only a browser has a canvas: elsewhere (host tests) an error.
pub fn png(
    sketch: &Sketch,
    width: u32,
    height: u32,
    scale: f64,
) -> Result<(String, usize), String> {
    #[cfg(target_arch = "wasm32")]
    {
        let canvas = super::offscreen_canvas(width, height, scale)
            .ok_or("column drawing: no canvas could be made (try reloading the page)")?;
        draw(&canvas, sketch, scale, true)?;
        let shapes = canvas
            .get_attribute("data-shapes")
            .and_then(|s| s.parse().ok())
            .unwrap_or(0);
        let url = canvas.to_data_url().map_err(err)?;
        Ok((url, shapes))
    }
    #[cfg(not(target_arch = "wasm32"))]
    {
        let _ = (sketch, width, height, scale);
        Err("column drawing: drawn only in a browser".to_string())
    }
}

/// Draws the sketch on `root`: both axes side by side, each with its
/// segments, supports, braces, loads, buckled shape and caption; returns
/// each shape's largest sideways offset in device px.
fn draw_on<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    sk: &Sketch,
    dpr: f64,
    pal: &Palette,
) -> Result<[f64; 2], String>
where
    DB::ErrorType: 'static,
{
    let s = |v: f64| (v * dpr).round().max(1.0) as u32;
    let si = |v: f64| (v * dpr).round() as i32;
    let font = |size: f64| ("sans-serif", size * dpr).into_font().color(&pal.ink);
    root.fill(&pal.background).map_err(err)?;
    let (w, h) = root.dim_in_pixel();
    let (w, h) = (f64::from(w), f64::from(h));
    // Room for the heading and the caption.
    let top = 34.0 * dpr;
    let bottom = h - 52.0 * dpr;
    let height = (bottom - top).max(1.0);
    let l = sk.length_mm.max(1.0);
    let y_of = |x_mm: f64| bottom - x_mm / l * height;
    let mut offsets = [0.0; 2];
    let half = w / 2.0;
    for (n, ax) in sk.axes.iter().enumerate() {
        let left = half * n as f64;
        let cx = left + half * 0.42;
        let max_w = (half * 0.16).min(36.0 * dpr);
        let amp = half * 0.26;
        let colour = pal.shape.get(n).copied().unwrap_or(pal.ink);
        // Heading.
        root.draw(&Text::new(
            match ax.axis {
                Axis::Major => "about the major axis",
                Axis::Minor => "about the minor axis",
            },
            (si(4.0) + left as i32, si(6.0)),
            font(13.0).pos(Pos::new(HPos::Left, VPos::Top)),
        ))
        .map_err(err)?;
        // Segments, to scale along the length, by width across.
        for p in &ax.pieces {
            let half_w = max_w * p.width / 2.0;
            root.draw(&Rectangle::new(
                [
                    ((cx - half_w) as i32, y_of(p.to_mm) as i32),
                    ((cx + half_w) as i32, y_of(p.from_mm) as i32),
                ],
                pal.steel.filled(),
            ))
            .map_err(err)?;
            root.draw(&Rectangle::new(
                [
                    ((cx - half_w) as i32, y_of(p.to_mm) as i32),
                    ((cx + half_w) as i32, y_of(p.from_mm) as i32),
                ],
                pal.faint.stroke_width(s(1.0)),
            ))
            .map_err(err)?;
        }
        // The straight axis, dashed.
        for d in dashes(
            &[(cx as i32, y_of(0.0) as i32), (cx as i32, y_of(l) as i32)],
            6.0 * dpr,
            4.0 * dpr,
        ) {
            root.draw(&PathElement::new(d, pal.faint.stroke_width(s(1.0))))
                .map_err(err)?;
        }
        // Supports at both ends.
        for (end, support) in ax.ends.iter().enumerate() {
            let y = if end == 0 { y_of(0.0) } else { y_of(l) };
            let dir = if end == 0 { 1.0 } else { -1.0 };
            support_symbol(root, pal, dpr, cx, y, dir, *support)?;
        }
        // Braces: a strut to a wall at the left, hatched when rigid, a
        // zigzag when a spring.
        for b in &ax.holds {
            let y = y_of(b.at_mm);
            let x0 = cx - max_w / 2.0 - 4.0 * dpr;
            let x1 = cx - max_w / 2.0 - 34.0 * dpr;
            if b.rigid {
                root.draw(&PathElement::new(
                    vec![(x0 as i32, y as i32), (x1 as i32, y as i32)],
                    pal.ink.stroke_width(s(2.0)),
                ))
                .map_err(err)?;
            } else {
                let mut pts = vec![(x0 as i32, y as i32)];
                for k in 1..8 {
                    let t = f64::from(k) / 8.0;
                    let zig = if k % 2 == 0 { -5.0 } else { 5.0 } * dpr;
                    pts.push(((x0 + (x1 - x0) * t) as i32, (y + zig) as i32));
                }
                pts.push((x1 as i32, y as i32));
                root.draw(&PathElement::new(pts, pal.ink.stroke_width(s(1.5))))
                    .map_err(err)?;
            }
            root.draw(&PathElement::new(
                vec![
                    (x1 as i32, (y - 9.0 * dpr) as i32),
                    (x1 as i32, (y + 9.0 * dpr) as i32),
                ],
                pal.ink.stroke_width(s(2.0)),
            ))
            .map_err(err)?;
            for k in 0..4 {
                let yy = y - 9.0 * dpr + f64::from(k) * 6.0 * dpr;
                root.draw(&PathElement::new(
                    vec![
                        (x1 as i32, yy as i32),
                        ((x1 - 5.0 * dpr) as i32, (yy + 5.0 * dpr) as i32),
                    ],
                    pal.ink.stroke_width(s(1.0)),
                ))
                .map_err(err)?;
            }
        }
        // The buckled shape.
        if ax.mode.len() > 1 {
            let pts: Vec<(i32, i32)> = ax
                .mode
                .iter()
                .map(|[x, d]| ((cx + amp * d) as i32, y_of(*x) as i32))
                .collect();
            if let Some(o) = offsets.get_mut(n) {
                *o = ax
                    .mode
                    .iter()
                    .map(|[_, d]| (amp * d).abs())
                    .fold(0.0, f64::max);
            }
            root.draw(&PathElement::new(pts, colour.stroke_width(s(2.5))))
                .map_err(err)?;
        }
        // Caption.
        for (k, line) in ax.caption.iter().enumerate() {
            root.draw(&Text::new(
                line.clone(),
                (
                    left as i32 + si(4.0),
                    (bottom + (14.0 + 17.0 * k as f64) * dpr) as i32,
                ),
                font(13.0).pos(Pos::new(HPos::Left, VPos::Top)),
            ))
            .map_err(err)?;
        }
    }
    // Axial loads: arrows down onto the column at their levels, on the
    // right of each drawing; the distributed load as small arrows.
    for (n, _) in sk.axes.iter().enumerate() {
        let cx = half * n as f64 + half * 0.42;
        let x = cx + half * 0.3;
        for (at, words) in &sk.loads {
            let y = y_of(*at);
            arrow(root, pal, dpr, x, y)?;
            root.draw(&Text::new(
                words.clone(),
                ((x + 6.0 * dpr) as i32, (y - 14.0 * dpr) as i32),
                font(12.0).pos(Pos::new(HPos::Left, VPos::Center)),
            ))
            .map_err(err)?;
        }
        if sk.distributed_kn_per_m > 0.0 {
            let xs = cx + half * 0.12;
            for k in 1..6 {
                let y = bottom - height * f64::from(k) / 6.0;
                root.draw(&PathElement::new(
                    vec![(xs as i32, (y - 8.0 * dpr) as i32), (xs as i32, y as i32)],
                    pal.load.stroke_width(s(1.0)),
                ))
                .map_err(err)?;
                root.draw(&Polygon::new(
                    vec![
                        (xs as i32, (y + 3.0 * dpr) as i32),
                        ((xs - 3.0 * dpr) as i32, (y - 2.0 * dpr) as i32),
                        ((xs + 3.0 * dpr) as i32, (y - 2.0 * dpr) as i32),
                    ],
                    pal.load.filled(),
                ))
                .map_err(err)?;
            }
        }
    }
    Ok(offsets)
}

/// A downward arrow ending at (x, y).
fn arrow<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    pal: &Palette,
    dpr: f64,
    x: f64,
    y: f64,
) -> Result<(), String>
where
    DB::ErrorType: 'static,
{
    let s = (2.0 * dpr).round().max(1.0) as u32;
    root.draw(&PathElement::new(
        vec![(x as i32, (y - 26.0 * dpr) as i32), (x as i32, y as i32)],
        pal.load.stroke_width(s),
    ))
    .map_err(err)?;
    root.draw(&Polygon::new(
        vec![
            (x as i32, (y + 2.0 * dpr) as i32),
            ((x - 5.0 * dpr) as i32, (y - 7.0 * dpr) as i32),
            ((x + 5.0 * dpr) as i32, (y - 7.0 * dpr) as i32),
        ],
        pal.load.filled(),
    ))
    .map_err(err)
}

/// An end support at (cx, y); `dir` 1 at the foot (drawn below), -1 at
/// the top (drawn above). Held sideways: a triangle; also held against
/// turning: a bar across with hatching; free to move but held against
/// turning: the bar on two rollers; springs: a zigzag sideways, a small
/// arc for turning; free: nothing.
fn support_symbol<DB: DrawingBackend>(
    root: &DrawingArea<DB, Shift>,
    pal: &Palette,
    dpr: f64,
    cx: f64,
    y: f64,
    dir: f64,
    sup: Support,
) -> Result<(), String>
where
    DB::ErrorType: 'static,
{
    let p = |x: f64, yy: f64| (x as i32, yy as i32);
    let thin = pal.ink.stroke_width((1.0 * dpr).round().max(1.0) as u32);
    let thick = pal.ink.stroke_width((2.0 * dpr).round().max(1.0) as u32);
    let d = 14.0 * dpr;
    let rot_held = matches!(sup.rotation, Fixity::Fixed);
    match sup.translation {
        Fixity::Fixed if rot_held => {
            root.draw(&PathElement::new(
                vec![p(cx - 18.0 * dpr, y), p(cx + 18.0 * dpr, y)],
                thick,
            ))
            .map_err(err)?;
            for k in 0..6 {
                let x = cx - 18.0 * dpr + f64::from(k) * 7.0 * dpr;
                root.draw(&PathElement::new(
                    vec![p(x, y), p(x - 6.0 * dpr, y + dir * 7.0 * dpr)],
                    thin,
                ))
                .map_err(err)?;
            }
        }
        Fixity::Fixed => {
            root.draw(&Polygon::new(
                vec![
                    p(cx, y),
                    p(cx - 9.0 * dpr, y + dir * d),
                    p(cx + 9.0 * dpr, y + dir * d),
                ],
                thin,
            ))
            .map_err(err)?;
            root.draw(&PathElement::new(
                vec![
                    p(cx - 9.0 * dpr, y + dir * d),
                    p(cx + 9.0 * dpr, y + dir * d),
                ],
                thin,
            ))
            .map_err(err)?;
            root.draw(&PathElement::new(
                vec![
                    p(cx, y),
                    p(cx - 9.0 * dpr, y + dir * d),
                    p(cx + 9.0 * dpr, y + dir * d),
                    p(cx, y),
                ],
                thin,
            ))
            .map_err(err)?;
        }
        Fixity::Free if rot_held => {
            root.draw(&PathElement::new(
                vec![p(cx - 18.0 * dpr, y), p(cx + 18.0 * dpr, y)],
                thick,
            ))
            .map_err(err)?;
            for x in [cx - 10.0 * dpr, cx + 10.0 * dpr] {
                root.draw(&Circle::new(
                    p(x, y + dir * 5.0 * dpr),
                    (4.0 * dpr) as u32,
                    thin,
                ))
                .map_err(err)?;
            }
        }
        Fixity::Free => {}
        Fixity::Spring(_) => {
            let mut pts = vec![p(cx, y)];
            for k in 1..8 {
                let zig = if k % 2 == 0 { -4.0 } else { 4.0 } * dpr;
                pts.push(p(cx + f64::from(k) * 4.0 * dpr, y + zig));
            }
            pts.push(p(cx + 32.0 * dpr, y));
            root.draw(&PathElement::new(pts, thin)).map_err(err)?;
            root.draw(&PathElement::new(
                vec![
                    p(cx + 32.0 * dpr, y - 8.0 * dpr),
                    p(cx + 32.0 * dpr, y + 8.0 * dpr),
                ],
                thick,
            ))
            .map_err(err)?;
        }
    }
    if let Fixity::Spring(_) = sup.rotation {
        let pts: Vec<(i32, i32)> = (0..=10)
            .map(|k| {
                let a = std::f64::consts::PI * f64::from(k) / 10.0;
                p(
                    cx - 12.0 * dpr * a.cos(),
                    y + dir * 12.0 * dpr * a.sin() * 0.6,
                )
            })
            .collect();
        root.draw(&PathElement::new(pts, thin)).map_err(err)?;
    }
    Ok(())
}

#[cfg(test)]
pub(crate) mod tests {
    use super::*;
    use strutline_core::check::buckle::buckle;

    /// The stepped crane column of the invented example
    /// `examples/tarnbeck-crane-hall.json` (its first member): two
    /// segments, a spring at the top, a minor-axis spring brace, two loads
    /// and a line load. Shared by the sheet's tests.
    pub(crate) fn stepped_column() -> Member {
        let file =
            strutline_core::file::parse(include_str!("../../../examples/tarnbeck-crane-hall.json"))
                .unwrap();
        file.members[0].clone()
    }

    #[test]
    fn sketch_of_the_stepped_column_follows_the_model_and_the_analysis() {
        let m = &stepped_column();
        let model = m.buckling_model.as_ref().unwrap();
        let lower = m.section.build().unwrap();
        let upper = model.segments[1].section.as_ref().unwrap().build().unwrap();
        let result = buckle(m).map(Option::unwrap).map_err(|e| e.to_string());
        let b = result.clone().unwrap();
        let sk = sketch(
            model,
            m.length_mm,
            Some(m.axial_kn),
            &[(6000.0, Some(&lower)), (3000.0, Some(&upper))],
            &result,
            &|unit, v| format!("{v:.0} {unit}"),
        );
        let major = &sk.axes[0];
        assert_eq!(major.pieces.len(), 2);
        assert_eq!(
            (major.pieces[1].from_mm, major.pieces[1].to_mm),
            (6000.0, 9000.0)
        );
        // The lower part is the wider; widths by the fourth root of I.
        assert_eq!(major.pieces[0].width, 1.0);
        let ratio = (upper.props.i_major_mm4 / lower.props.i_major_mm4)
            .sqrt()
            .sqrt();
        assert!((major.pieces[1].width - ratio).abs() < 1e-12);
        // The minor-axis brace is drawn about the minor axis only, as a spring.
        assert!(major.holds.is_empty());
        assert_eq!(
            sk.axes[1].holds,
            vec![Hold {
                at_mm: 3000.0,
                rigid: false
            }]
        );
        // The shape and the captions are the engine's.
        assert_eq!(major.mode, b.major.mode);
        assert_eq!(
            major.caption[0],
            format!("α_cr = {}", fixed(b.major.load_factor, 3))
        );
        assert!(sk.axes[1].caption[1].starts_with("L_cr = "));
        assert_eq!(
            sk.loads,
            vec![
                (6000.0, "420 kN".to_string()),
                (9000.0, "130 kN".to_string())
            ]
        );
        // A refusal is the caption, with no shape.
        let refused = sketch(
            &strutline_core::buckling::model::BucklingModel {
                axial_loads: Vec::new(),
                distributed_kn_per_m: 0.0,
                ..model.clone()
            },
            m.length_mm,
            None,
            &[],
            &Err("no".into()),
            &|unit, v| format!("{v} {unit}"),
        );
        assert!(refused.axes[0].mode.is_empty());
        // Without loads in the model and no design load given, no load is
        // drawn (none is made up).
        assert!(refused.loads.is_empty());
        assert_eq!(refused.axes[0].caption, vec!["no".to_string()]);
    }

    #[test]
    fn no_design_load_draws_no_load_and_captions_n_cr() {
        // The stepped column without its own loads: the engine's pattern
        // is the member's load at end B. Not given, none is drawn, and each
        // axis says N_cr (the same for any load at B), not alpha_cr.
        let mut m = stepped_column();
        if let Some(md) = m.buckling_model.as_mut() {
            md.axial_loads.clear();
            md.distributed_kn_per_m = 0.0;
        }
        let given = of_member(&m, UnitSystem::Si, true).unwrap();
        assert_eq!(given.sketch.loads.len(), 1);
        assert!(given.sketch.axes[0].caption[0].starts_with("α_cr = "));
        let not = of_member(&m, UnitSystem::Si, false).unwrap();
        assert!(not.sketch.loads.is_empty(), "{:?}", not.sketch.loads);
        let b = not.result.clone().unwrap();
        assert_eq!(
            not.sketch.axes[0].caption[0],
            format!(
                "N_cr = {}",
                result_text(UnitSystem::Si, "kN", b.major.critical_kn, 0)
            )
        );
        // N_cr does not hang on the load that stands in for the design load.
        let mut other = m.clone();
        other.axial_kn *= 3.0;
        let b3 = buckle(&other).unwrap().unwrap();
        assert!((b3.major.critical_kn - b.major.critical_kn).abs() < 1e-6 * b.major.critical_kn);
        // A model with loads of its own keeps alpha_cr on them either way.
        let own = of_member(&stepped_column(), UnitSystem::Si, false).unwrap();
        assert!(own.sketch.axes[0].caption[0].starts_with("α_cr = "));
        assert_eq!(own.sketch.loads.len(), 2);
    }

    #[test]
    fn the_sheet_draws_what_the_panel_draws_in_the_units_shown() {
        let m = &stepped_column();
        let a = of_member(m, UnitSystem::Si, true).unwrap();
        let b = a.result.clone().unwrap();
        assert_eq!(a.sketch.axes[0].mode, b.major.mode);
        // The captions and the loads the drawing writes (the drawing itself
        // is checked in the browser, tests/browser/buckling.mjs).
        assert_eq!(
            a.sketch.axes[1].caption[0],
            format!("α_cr = {}", fixed(b.minor.load_factor, 3))
        );
        assert_eq!(a.sketch.loads[0].1, "420 kN");
        // In US units the loads in kip and the lengths in feet: 420 kN /
        // 4.4482216152605 kN per kip = 94.42 kip.
        let us = of_member(m, UnitSystem::Us, true).unwrap();
        assert_eq!(us.sketch.loads[0].1, "94.42 kip");
        assert!(
            us.sketch.axes[1].caption[1].ends_with(" ft"),
            "{:?}",
            us.sketch.axes[1]
        );
        // No model, nothing to draw.
        let mut plain = m.clone();
        plain.buckling_model = None;
        assert!(of_member(&plain, UnitSystem::Si, true).is_none());
    }
}
