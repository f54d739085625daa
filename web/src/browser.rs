//! The browser glue: local storage, the clock, downloads, the service
//! worker and the theme class. Thin: every decision is made elsewhere.

use wasm_bindgen::closure::Closure;
use wasm_bindgen::{JsCast, JsValue};
use web_sys::js_sys;

/// The page's local storage, when the browser lets us have it.
pub fn storage() -> Option<web_sys::Storage> {
    web_sys::window()?.local_storage().ok().flatten()
}

/// Milliseconds since the epoch (`Date.now()`).
pub fn now_ms() -> f64 {
    js_sys::Date::now()
}

/// A high-resolution clock, ms (`performance.now()`; 0 when absent).
pub fn precise_ms() -> f64 {
    web_sys::window()
        .and_then(|w| w.performance())
        .map_or(0.0, |p| p.now())
}

/// Leaves the duration of the last list re-check where the benchmarks read
/// it: `window.strutlineRecheck = {ms, fresh}` (`fresh`: members worked
/// afresh rather than reused).
pub fn note_recheck(ms: f64, fresh: usize) {
    note_timing("strutlineRecheck", "fresh", ms, fresh);
}

/// Records a timing on `window[key]` as `{ms, <what>: n}` for the
/// benchmarks (the sizing of a list: `strutlineSizing`, `members`).
pub fn note_timing(key: &str, what: &str, ms: f64, n: usize) {
    if let Some(w) = web_sys::window() {
        let o = js_sys::Object::new();
        let _ = js_sys::Reflect::set(&o, &"ms".into(), &ms.into());
        let _ = js_sys::Reflect::set(&o, &what.into(), &(n as f64).into());
        let _ = js_sys::Reflect::set(&w, &key.into(), &o);
    }
}

#[wasm_bindgen::prelude::wasm_bindgen]
extern "C" {
    /// The page's `Storage`, seen through this one method.
    type TextStore;
    /// `Storage.getItem`, the value left a JS string (`null` when absent).
    #[wasm_bindgen(method, catch, js_name = getItem)]
    fn get_item_js(this: &TextStore, key: &str) -> Result<JsValue, JsValue>;
    /// The page's `TextEncoder`.
    type Utf8Encoder;
    #[wasm_bindgen(constructor, js_class = "TextEncoder")]
    fn new() -> Utf8Encoder;
    /// `TextEncoder.encode` of a JS string: its UTF-8 bytes.
    #[wasm_bindgen(method, js_name = encode)]
    fn encode_js(this: &Utf8Encoder, text: &JsValue) -> js_sys::Uint8Array;
}

/// Reads a key ("" never stands for absent). The text crosses into the
/// module as UTF-8 made by the browser's own `TextEncoder` and one copy:
/// the glue's `String` return walks a stored workspace (186 kB for 1,000
/// members) a character at a time in JS that has not warmed up yet: 5-8 ms
/// alone in a fresh page against 0.7-1.7 ms this way (bench/first-frame.md).
pub fn get(key: &str) -> Option<String> {
    let text = storage()?
        .unchecked_ref::<TextStore>()
        .get_item_js(key)
        .ok()?;
    if !text.is_string() {
        return None;
    }
    String::from_utf8(Utf8Encoder::new().encode_js(&text).to_vec()).ok()
}

/// Writes a key; the error says why it failed (a full quota, mostly).
pub fn set(key: &str, value: &str) -> Result<(), String> {
    let s = storage().ok_or("local storage is not available in this browser")?;
    s.set_item(key, value).map_err(|e| {
        let name = js_sys::Reflect::get(&e, &JsValue::from_str("name"))
            .ok()
            .and_then(|v| v.as_string())
            .unwrap_or_default();
        if name.contains("Quota") {
            "the browser's storage for this app is full".to_string()
        } else if name.is_empty() {
            "the browser refused to store the data".to_string()
        } else {
            format!("the browser refused to store the data ({name})")
        }
    })
}

/// Removes a key.
pub fn remove(key: &str) {
    if let Some(s) = storage() {
        let _ = s.remove_item(key);
    }
}

/// Offers `text` as a file download named `filename`.
pub fn download(filename: &str, text: &str, mime: &str) -> Result<(), String> {
    // The browser's own words when it gives them as text (its error
    // objects are not formatted: that would ship a JS value formatter).
    let err = |e: JsValue| match e.as_string() {
        Some(m) => format!("download failed: {m}"),
        None => "download failed: the browser refused to make the file".to_string(),
    };
    let parts = js_sys::Array::of1(&JsValue::from_str(text));
    let opts = web_sys::BlobPropertyBag::new();
    opts.set_type(mime);
    let blob = web_sys::Blob::new_with_str_sequence_and_options(&parts, &opts).map_err(err)?;
    let url = web_sys::Url::create_object_url_with_blob(&blob).map_err(err)?;
    let doc = web_sys::window()
        .and_then(|w| w.document())
        .ok_or("download failed: no document")?;
    let a: web_sys::HtmlAnchorElement = doc
        .create_element("a")
        .map_err(err)?
        .dyn_into()
        .map_err(|_| "download failed: no anchor".to_string())?;
    a.set_href(&url);
    a.set_download(filename);
    a.set_class_name("offscreen");
    if let Some(body) = doc.body() {
        let _ = body.append_child(&a);
        a.click();
        let _ = body.remove_child(&a);
    }
    let revoke = Closure::once_into_js(move || {
        let _ = web_sys::Url::revoke_object_url(&url);
    });
    if let Some(w) = web_sys::window() {
        let _ =
            w.set_timeout_with_callback_and_timeout_and_arguments_0(revoke.unchecked_ref(), 2000);
    }
    Ok(())
}

/// Lays the page out now (reads `<body>`'s height). A block put in by a
/// task after a frame is laid out in that task: left to the next frame,
/// its layout fell into the frame of the next edit when that came first
/// (a trace of beam-column edits: some 35 ms of the working's layout in the
/// next edit's frame under the benchmark's pace of edits).
pub fn lay_out_now() {
    if let Some(body) = web_sys::window()
        .and_then(|w| w.document())
        .and_then(|d| d.body())
    {
        let _ = body.offset_height();
    }
}

/// Shows the warnings of the result's `head` whole while the head fits the
/// pane it is in (the wide layout, where the head does not scroll and its
/// pane clips): all of them first, then one more from the last marked
/// `cut` (not displayed, `style.css`) at a time until the head's foot is
/// within the pane's; the `.warnings-more` fold, which shows the full list
/// in place of the chart, is then shown closed, saying how many are left out
/// in the words of `words(more, total)`. Nothing is cut where the head's
/// warnings are not displayed (the docked head).
pub fn fit_warnings(head: &web_sys::HtmlElement, words: &dyn Fn(usize, usize) -> String) {
    use wasm_bindgen::JsCast;
    let (Some(list), Some(fold), Some(pane)) = (
        head.query_selector(".warnings").ok().flatten(),
        head.query_selector(".warnings-more").ok().flatten(),
        head.parent_element(),
    ) else {
        return;
    };
    let items = list.get_elements_by_tag_name("li");
    let total = items.length();
    for i in 0..total {
        if let Some(li) = items.item(i) {
            let _ = li.class_list().remove_1("cut");
        }
    }
    let _ = fold.remove_attribute("open");
    let _ = fold.set_attribute("hidden", "");
    let shown_at_all = list
        .dyn_ref::<web_sys::HtmlElement>()
        .is_some_and(|l| l.offset_height() > 0);
    if !shown_at_all {
        return;
    }
    let room = pane.get_bounding_client_rect().bottom();
    let foot = || head.get_bounding_client_rect().bottom();
    let mut shown = total;
    while shown > 0 && foot() > room + 0.5 {
        shown -= 1;
        if let Some(li) = items.item(shown) {
            let _ = li.class_list().add_1("cut");
        }
        let _ = fold.remove_attribute("hidden");
        if let Ok(Some(w)) = fold.query_selector(".when-closed") {
            w.set_text_content(Some(&words((total - shown) as usize, total as usize)));
        }
    }
}

/// Sets or clears a class on `<body>`.
pub fn body_class(class: &str, on: bool) {
    if let Some(body) = web_sys::window()
        .and_then(|w| w.document())
        .and_then(|d| d.body())
    {
        let _ = body.class_list().toggle_with_force(class, on);
    }
}

/// Sets a length custom property (`name`, in px) on the root element,
/// through its style object.
pub fn set_root_px(name: &str, px: f64) {
    let root = web_sys::window()
        .and_then(|w| w.document())
        .and_then(|d| d.document_element())
        .and_then(|e| wasm_bindgen::JsCast::dyn_into::<web_sys::HtmlElement>(e).ok());
    if let Some(r) = root {
        let _ = r
            .style()
            .set_property(name, &format!("{}px", px.max(0.0).round()));
    }
}

/// Scrolls the focused text field or select, if any, just into view (the
/// page's scroll padding keeps it clear of the docked result).
pub fn reveal_focused_field() {
    let el = web_sys::window()
        .and_then(|w| w.document())
        .and_then(|d| d.active_element());
    if let Some(el) = el {
        if matches!(el.tag_name().as_str(), "INPUT" | "SELECT" | "TEXTAREA") {
            let o = web_sys::ScrollIntoViewOptions::new();
            o.set_block(web_sys::ScrollLogicalPosition::Nearest);
            el.scroll_into_view_with_scroll_into_view_options(&o);
        }
    }
}

/// Puts `rule` (an `@page` rule) at the end of the app's style sheet in
/// place of the one put there before, or takes that one away (`None`).
/// Through the style sheet's object model: the page's policy refuses
/// inline style, not this.
pub fn set_page_rule(rule: Option<&str>) {
    let Some(doc) = web_sys::window().and_then(|w| w.document()) else {
        return;
    };
    let sheets = doc.style_sheets();
    for i in 0..sheets.length() {
        let Some(sheet) = sheets
            .item(i)
            .and_then(|s| wasm_bindgen::JsCast::dyn_into::<web_sys::CssStyleSheet>(s).ok())
        else {
            continue;
        };
        if !sheet
            .href()
            .ok()
            .flatten()
            .is_some_and(|h| h.ends_with("style.css"))
        {
            continue;
        }
        let Ok(rules) = sheet.css_rules() else { return };
        let n = rules.length();
        // The app's rule is marked by being last and an @page rule with
        // margin boxes; style.css's own @page rule has none.
        if let Some(last) = n.checked_sub(1).and_then(|j| rules.item(j)) {
            if last.css_text().contains("@top-left") {
                let _ = sheet.delete_rule(n - 1);
            }
        }
        if let Some(r) = rule {
            let n = sheet.css_rules().map(|r| r.length()).unwrap_or(0);
            let _ = sheet.insert_rule_with_index(r, n);
        }
        return;
    }
}

/// The window's height in CSS pixels (800 when unknown).
pub fn inner_height() -> f64 {
    css_px(web_sys::window().and_then(|w| w.inner_height().ok()))
}

/// The window's width in CSS pixels (800 when unknown).
pub fn inner_width() -> f64 {
    css_px(web_sys::window().and_then(|w| w.inner_width().ok()))
}

/// A length the window gave, or 800 when it gave none.
fn css_px(v: Option<JsValue>) -> f64 {
    v.and_then(|v| v.as_f64())
        .filter(|h| h.is_finite() && *h > 0.0)
        .unwrap_or(800.0)
}

/// The device pixel ratio (1 when unknown).
pub fn device_pixel_ratio() -> f64 {
    web_sys::window()
        .map(|w| w.device_pixel_ratio())
        .filter(|r| r.is_finite() && *r > 0.0)
        .unwrap_or(1.0)
}

/// Sizes a canvas's bitmap to its CSS size times the device pixel ratio
/// (only when that changed: resizing reallocates the bitmap) and returns
/// the ratio, for a chart drawn in device pixels. The CSS size is read
/// (`clientWidth`, which forces a layout of the page mid-script) only when
/// `resized`, the app's count of window resizes and layout changes, moved
/// since it was last read for this canvas, and kept on the element
/// (`data-css-size`) in between: a redraw after an edit then costs no
/// layout of its own (a profile of 20 column-model edits had 25 ms an edit
/// in these reads, `bench/column-model.md`).
pub fn fit_canvas(el: &web_sys::HtmlCanvasElement, resized: u64) -> f64 {
    let dpr = device_pixel_ratio();
    let kept = el.get_attribute("data-css-size").and_then(|t| {
        let mut it = t.split(',').map(str::parse::<f64>);
        match (it.next(), it.next(), it.next()) {
            (Some(Ok(g)), Some(Ok(w)), Some(Ok(h))) if g == resized as f64 => Some((w, h)),
            _ => None,
        }
    });
    let (w, h) = kept.unwrap_or_else(|| {
        let w = f64::from(el.client_width().max(1));
        let h = f64::from(el.client_height().max(1));
        let _ = el.set_attribute("data-css-size", &format!("{resized},{w},{h}"));
        (w, h)
    });
    let (bw, bh) = ((w * dpr).round() as u32, (h * dpr).round() as u32);
    if el.width() != bw {
        el.set_width(bw);
    }
    if el.height() != bh {
        el.set_height(bh);
    }
    dpr
}

/// Registers `./sw.js` when the browser has service workers (the app does
/// it after its first frame: the worker's install fetches every file of
/// `dist/`, which competed with that frame), and calls
/// `update_ready` when a new worker is installed and waiting while an old
/// one controls the page (or when the worker posts `{"type":
/// "update-ready"}`).
pub fn register_service_worker(update_ready: impl Fn() + Clone + 'static) {
    let Some(window) = web_sys::window() else {
        return;
    };
    let nav = window.navigator();
    let has = js_sys::Reflect::has(&nav, &JsValue::from_str("serviceWorker")).unwrap_or(false);
    if !has {
        return;
    }
    let container = nav.service_worker();

    // A message from the worker.
    let ready = update_ready.clone();
    let on_message =
        Closure::<dyn Fn(web_sys::MessageEvent)>::new(move |e: web_sys::MessageEvent| {
            let data = e.data();
            let kind = js_sys::Reflect::get(&data, &JsValue::from_str("type"))
                .ok()
                .and_then(|v| v.as_string())
                .or_else(|| data.as_string())
                .unwrap_or_default();
            if kind == "update-ready" {
                ready();
            }
        });
    let _ =
        container.add_event_listener_with_callback("message", on_message.as_ref().unchecked_ref());
    on_message.forget();

    // Reload once the new worker has taken over, if the person asked for it.
    let on_change = Closure::<dyn Fn()>::new(move || {
        if RELOAD_ASKED.with(std::cell::Cell::get) {
            if let Some(w) = web_sys::window() {
                let _ = w.location().reload();
            }
        }
    });
    let _ = container
        .add_event_listener_with_callback("controllerchange", on_change.as_ref().unchecked_ref());
    on_change.forget();

    let promise = container.register("./sw.js");
    let controlled = container.clone();
    let on_registered = Closure::once(move |reg: JsValue| {
        let Ok(reg) = reg.dyn_into::<web_sys::ServiceWorkerRegistration>() else {
            return;
        };
        if reg.waiting().is_some() && controlled.controller().is_some() {
            update_ready();
        }
        let reg2 = reg.clone();
        let on_found = Closure::<dyn Fn()>::new(move || {
            if let Some(installing) = reg2.installing() {
                let worker = installing.clone();
                let c = controlled.clone();
                let ready = update_ready.clone();
                let on_state = Closure::<dyn Fn()>::new(move || {
                    if worker.state() == web_sys::ServiceWorkerState::Installed
                        && c.controller().is_some()
                    {
                        ready();
                    }
                });
                installing.set_onstatechange(Some(on_state.as_ref().unchecked_ref()));
                on_state.forget();
            }
        });
        reg.set_onupdatefound(Some(on_found.as_ref().unchecked_ref()));
        // Registered after the first frame: a worker the browser found on
        // its own check at navigation may already be installing.
        if reg.installing().is_some() {
            let _ = on_found
                .as_ref()
                .unchecked_ref::<js_sys::Function>()
                .call0(&JsValue::NULL);
        }
        on_found.forget();
    });
    let on_failed = Closure::once(move |_e: JsValue| {});
    let _ = promise.then2(&on_registered, &on_failed);
    on_registered.forget();
    on_failed.forget();
}

thread_local! {
    static RELOAD_ASKED: std::cell::Cell<bool> = const { std::cell::Cell::new(false) };
}

/// Asks the waiting worker to take over, then reloads (at once when there
/// is no worker to wait for, and in any case after two seconds).
pub fn apply_update() {
    RELOAD_ASKED.with(|c| c.set(true));
    let Some(window) = web_sys::window() else {
        return;
    };
    let reload = || {
        if let Some(w) = web_sys::window() {
            let _ = w.location().reload();
        }
    };
    let nav = window.navigator();
    let has = js_sys::Reflect::has(&nav, &JsValue::from_str("serviceWorker")).unwrap_or(false);
    if !has {
        reload();
        return;
    }
    let promise = nav.service_worker().get_registration();
    let then = Closure::once(move |reg: JsValue| {
        let waiting = reg
            .dyn_into::<web_sys::ServiceWorkerRegistration>()
            .ok()
            .and_then(|r| r.waiting());
        match waiting {
            Some(w) => {
                let msg = js_sys::Object::new();
                let _ = js_sys::Reflect::set(
                    &msg,
                    &JsValue::from_str("type"),
                    &JsValue::from_str("skip-waiting"),
                );
                let _ = w.post_message(&msg);
                let fallback = Closure::once_into_js(move || {
                    if let Some(w) = web_sys::window() {
                        let _ = w.location().reload();
                    }
                });
                if let Some(win) = web_sys::window() {
                    let _ = win.set_timeout_with_callback_and_timeout_and_arguments_0(
                        fallback.unchecked_ref(),
                        2000,
                    );
                }
            }
            None => {
                if let Some(w) = web_sys::window() {
                    let _ = w.location().reload();
                }
            }
        }
    });
    let _ = promise.then(&then);
    then.forget();
}
