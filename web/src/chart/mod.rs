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
