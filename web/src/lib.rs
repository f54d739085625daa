//! Strutline in the browser: the member list, the editor, the results with
//! their working, and the capacity envelope chart.
//!
//! The modules that hold view logic (number parsing and formatting, status
//! text, list operations, the editor's fields, the workspace encoding, the
//! memoised checks) are plain Rust tested on the host; the components and
//! the browser glue (storage, service worker, downloads, canvas) are thin.

pub mod app;
pub mod banner;
pub mod browser;
pub mod chart;
pub mod checks;
pub mod demo;
pub mod diagram;
pub mod drafts;
pub mod exchange;
pub mod fields;
pub mod framing;
pub mod html;
pub mod listops;
pub mod modelform;
pub mod modelsheet;
pub mod numtext;
pub mod picker;
pub mod print;
pub mod report;
pub mod restraint;
pub mod sectionview;
pub mod status;
pub mod toolbar;
pub mod units_view;
pub mod workspace;

/// Mounts the app into the element with id `app`, or into `<body>`.
#[wasm_bindgen::prelude::wasm_bindgen]
pub fn start() {
    console_error_panic_hook::set_once();
    let target = web_sys::window()
        .and_then(|w| w.document())
        .and_then(|d| d.get_element_by_id("app"))
        .and_then(|e| wasm_bindgen::JsCast::dyn_into::<web_sys::HtmlElement>(e).ok());
    match target {
        Some(el) => leptos::mount::mount_to(el, app::App).forget(),
        None => leptos::mount::mount_to_body(app::App),
    }
}
