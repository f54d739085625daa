//! The charts, each with its data worked out without drawing (tested on
//! the host) and a `draw(...) -> Result` on a canvas with plotters: the
//! capacity envelope (`data`, `envelope`), a beam-column's interaction
//! chart (`interaction`) and the column of a buckling model with its
//! buckled shapes (`column`).

pub mod column;
pub mod data;
pub mod envelope;
pub mod interaction;
pub mod labels;

use plotters::coord::Shift;
use plotters::prelude::{DrawingArea, IntoDrawingArea};
use plotters_canvas::CanvasBackend;
use web_sys::HtmlCanvasElement;

use labels::{Boxes, Measure};

/// What the envelope and the interaction chart share: `draw_on` draws on
/// `canvas` (already sized to CSS size x `dpr`) with its text measured by
/// the canvas ([`labels::canvas_measure`]) and the box of every word it
/// writes collected; then the drawing is shown and the boxes are recorded
/// on the canvas ([`Boxes::record_on`]). Returns what `draw_on` returns.
pub(crate) fn on_canvas<T>(
    canvas: &HtmlCanvasElement,
    dpr: f64,
    draw_on: impl FnOnce(&DrawingArea<CanvasBackend, Shift>, (Measure, &mut Boxes)) -> Result<T, String>,
) -> Result<T, String> {
    let backend = CanvasBackend::with_canvas_object(canvas.clone())
        .ok_or("chart: the canvas has no 2D context")?;
    let root = backend.into_drawing_area();
    let measure = labels::canvas_measure(canvas);
    let mut boxes = Boxes::default();
    let out = draw_on(&root, (&measure, &mut boxes))?;
    root.present().map_err(envelope::err)?;
    boxes.record_on(canvas, dpr)?;
    Ok(out)
}

/// A canvas that is not in the page, `width` x `height` CSS px drawn at
/// `scale` device px each: what the calc sheet's pictures are drawn on,
/// whatever the screen shows or folds away. Only a browser has one.
pub fn offscreen_canvas(width: u32, height: u32, scale: f64) -> Option<web_sys::HtmlCanvasElement> {
    use wasm_bindgen::JsCast;
    let canvas: web_sys::HtmlCanvasElement = web_sys::window()?
        .document()?
        .create_element("canvas")
        .ok()?
        .dyn_into()
        .ok()?;
    canvas.set_width((f64::from(width) * scale).round() as u32);
    canvas.set_height((f64::from(height) * scale).round() as u32);
    Some(canvas)
}

/// Clears `el` and writes `why` across its middle, wrapped to its width:
/// the chart of a member that has none to show, so no earlier drawing
/// stays on the canvas (another member's, or an earlier value's). Marked `data-chart="none"` (for tests).
pub fn blank(el: &web_sys::HtmlCanvasElement, why: &str, dpr: f64, high_contrast: bool) {
    use wasm_bindgen::JsCast;
    let Some(g) = el
        .get_context("2d")
        .ok()
        .flatten()
        .and_then(|c| c.dyn_into::<web_sys::CanvasRenderingContext2d>().ok())
    else {
        return;
    };
    let (w, h) = (f64::from(el.width()), f64::from(el.height()));
    g.clear_rect(0.0, 0.0, w, h);
    let measure = labels::canvas_measure(el);
    let (lines, px) = labels::fit(&[why], " ", w * 0.8, 14.0 * dpr, &measure);
    g.set_font(&format!("{px}px sans-serif"));
    g.set_fill_style_str(if high_contrast { "#000" } else { "#1c222b" });
    g.set_text_align("center");
    g.set_text_baseline("middle");
    let step = labels::line_height(px);
    let top = h / 2.0 - step * (lines.len() as f64 - 1.0) / 2.0;
    for (i, line) in lines.iter().enumerate() {
        let _ = g.fill_text(line, w / 2.0, top + step * i as f64);
    }
    let _ = el.set_attribute("data-chart", "none");
}
