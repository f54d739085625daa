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
