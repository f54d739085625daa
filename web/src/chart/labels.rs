//! Where the charts' words go: titles wrapped to the room they have, and
//! labels placed clear of each other, of the marks they name and of the
//! canvas's edges. Plain Rust, tested on the host; the drawing measures
//! its text with the canvas's own `measureText` ([`Measure`]), the host
//! tests with [`super::data::text_box`]'s estimate.
//!
//! Every box a chart writes text in (titles, labels and the axes' tick
//! numbers, [`Tick`]) is recorded on its canvas as `data-text-boxes`
//! ([`record`]), so a browser test can see that none overlaps another or
//! leaves the canvas.

/// The width in device px of a line of text at a font size in device px.
pub type Measure<'a> = &'a dyn Fn(&str, f64) -> f64;

/// The line height of text at `size_px` (1.2 em, as [`super::data::text_box`]).
pub fn line_height(size_px: f64) -> f64 {
    1.2 * size_px
}

/// A rectangle in device px: left, top, width, height.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TextBox {
    pub x: f64,
    pub y: f64,
    pub w: f64,
    pub h: f64,
}

impl TextBox {
    /// The box `w` x `h` centred on (`cx`, `cy`).
    pub fn centred(cx: f64, cy: f64, w: f64, h: f64) -> TextBox {
        TextBox {
            x: cx - w / 2.0,
            y: cy - h / 2.0,
            w,
            h,
        }
    }

    /// Whether the two boxes share any area (touching edges do not).
    pub fn overlaps(&self, o: &TextBox) -> bool {
        self.x < o.x + o.w && o.x < self.x + self.w && self.y < o.y + o.h && o.y < self.y + self.h
    }

    /// Whether the box lies wholly inside `outer`.
    pub fn within(&self, outer: &TextBox) -> bool {
        self.x >= outer.x
            && self.y >= outer.y
            && self.x + self.w <= outer.x + outer.w
            && self.y + self.h <= outer.y + outer.h
    }

    /// The area shared with `o`.
    fn shared(&self, o: &TextBox) -> f64 {
        let w = (self.x + self.w).min(o.x + o.w) - self.x.max(o.x);
        let h = (self.y + self.h).min(o.y + o.h) - self.y.max(o.y);
        w.max(0.0) * h.max(0.0)
    }
}

/// `parts` (read in order, joined by `sep`) as lines no wider than
/// `width`: as many whole parts on a line as fit, a part too wide alone
/// broken at its spaces. A single word wider than `width` stays whole on
/// its own line (the caller then takes a smaller font: [`fit`]).
pub fn wrap(parts: &[&str], sep: &str, width: f64, size_px: f64, measure: Measure) -> Vec<String> {
    let fits = |t: &str| measure(t, size_px) <= width;
    let mut lines: Vec<String> = Vec::new();
    let mut line = String::new();
    for part in parts.iter().filter(|p| !p.is_empty()) {
        let joined = if line.is_empty() {
            (*part).to_string()
        } else {
            format!("{line}{sep}{part}")
        };
        if fits(&joined) {
            line = joined;
            continue;
        }
        if !line.is_empty() {
            lines.push(std::mem::take(&mut line));
        }
        if fits(part) {
            line = (*part).to_string();
            continue;
        }
        // The part alone is too wide: word by word.
        for word in part.split(' ').filter(|w| !w.is_empty()) {
            let joined = if line.is_empty() {
                word.to_string()
            } else {
                format!("{line} {word}")
            };
            if fits(&joined) || line.is_empty() {
                line = joined;
            } else {
                lines.push(std::mem::replace(&mut line, word.to_string()));
            }
        }
    }
    if !line.is_empty() {
        lines.push(line);
    }
    lines
}

/// Lines of text and the font size (device px) they fit at.
pub type Fitted = (Vec<String>, f64);

/// [`wrap`] at `size_px`, or at a smaller size (down to two thirds) where
/// a word is wider than `width` at that size; the lines and the size
/// taken. Every line fits unless a word is too wide even at two thirds.
pub fn fit(parts: &[&str], sep: &str, width: f64, size_px: f64, measure: Measure) -> Fitted {
    let mut size = size_px;
    loop {
        let lines = wrap(parts, sep, width, size, measure);
        let widest = lines.iter().map(|l| measure(l, size)).fold(0.0, f64::max);
        if widest <= width || size <= size_px * 2.0 / 3.0 {
            return (lines, size);
        }
        size = (size * 0.9).max(size_px * 2.0 / 3.0);
    }
}

/// The first of `candidates` that lies inside `bounds` and overlaps none
/// of `taken`; failing that, the one inside `bounds` (if any) that shares
/// the least area with `taken`; failing that, the first.
pub fn place(candidates: &[TextBox], taken: &[TextBox], bounds: &TextBox) -> Option<TextBox> {
    let clash = |b: &TextBox| taken.iter().map(|t| b.shared(t)).sum::<f64>();
    if let Some(b) = candidates
        .iter()
        .find(|b| b.within(bounds) && !taken.iter().any(|t| b.overlaps(t)))
    {
        return Some(*b);
    }
    candidates
        .iter()
        .filter(|b| b.within(bounds))
        .min_by(|a, b| clash(a).total_cmp(&clash(b)))
        .or(candidates.first())
        .copied()
}

/// Where a tick's number stands from its point on an axis.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Tick {
    /// Centred under the point (the axis across), `gap` device px below.
    Below,
    /// Right-aligned left of the point, `gap` device px off, centred on it
    /// (the axis up).
    Left,
}

impl Tick {
    /// The box of a number `w` device px wide at `size_px`, for a tick at
    /// (`x`, `y`) with its number `gap` device px off.
    pub fn text_box(self, (x, y): (f64, f64), gap: f64, w: f64, size_px: f64) -> TextBox {
        let h = line_height(size_px);
        match self {
            Tick::Below => TextBox {
                x: x - w / 2.0,
                y: y + gap,
                w,
                h,
            },
            Tick::Left => TextBox {
                x: x - gap - w,
                y: y - h / 2.0,
                w,
                h,
            },
        }
    }
}

/// The axes' tick numbers of a chart: gathered while its grid is drawn
/// (`add`), written once its marks are known (`write`), where a number
/// whose box would cover a mark (the member's point on an axis) is left
/// out: its grid line stays, and the numbers beside it give the scale.
#[derive(Debug, Clone, Default)]
pub struct Ticks(Vec<TickNumber>);

/// One tick's number: where it stands from its point, the number, the
/// point (device px) and how far off it is written (device px).
#[derive(Debug, Clone, PartialEq)]
pub struct TickNumber {
    pub side: Tick,
    pub number: String,
    pub at: (i32, i32),
    pub gap: i32,
}

impl Ticks {
    /// The number for the tick at `at` (device px), `gap` device px off.
    pub fn add(&mut self, side: Tick, number: String, at: (i32, i32), gap: i32) {
        self.0.push(TickNumber {
            side,
            number,
            at,
            gap,
        });
    }

    /// The numbers to write, each with its box for a font of `size_px`:
    /// all but those whose box would cover one of `marks`.
    pub fn kept(
        self,
        measure: Measure,
        size_px: f64,
        marks: &[TextBox],
    ) -> Vec<(TickNumber, TextBox)> {
        self.0
            .into_iter()
            .filter_map(|t| {
                let b = t.side.text_box(
                    (f64::from(t.at.0), f64::from(t.at.1)),
                    f64::from(t.gap),
                    measure(&t.number, size_px),
                    size_px,
                );
                (!marks.iter().any(|m| m.overlaps(&b))).then_some((t, b))
            })
            .collect()
    }

    /// Writes the numbers [`Ticks::kept`] keeps clear of `boxes.marks` with
    /// `style`, whose font is `size_px`, and records their boxes in
    /// `boxes.text`.
    pub fn write<DB: plotters::prelude::DrawingBackend>(
        self,
        root: &plotters::prelude::DrawingArea<DB, plotters::coord::Shift>,
        style: &plotters::style::TextStyle,
        size_px: f64,
        text: (Measure, &mut Boxes),
    ) -> Result<(), String>
    where
        DB::ErrorType: 'static,
    {
        use plotters::style::text_anchor::{HPos, Pos, VPos};
        let (measure, boxes) = text;
        for (
            TickNumber {
                side,
                number,
                at,
                gap,
            },
            b,
        ) in self.kept(measure, size_px, &boxes.marks)
        {
            boxes.text.push(b);
            let (pos, anchor) = match side {
                Tick::Below => (Pos::new(HPos::Center, VPos::Top), (at.0, at.1 + gap)),
                Tick::Left => (Pos::new(HPos::Right, VPos::Center), (at.0 - gap, at.1)),
            };
            root.draw(&plotters::element::Text::new(
                number,
                anchor,
                style.clone().pos(pos),
            ))
            .map_err(super::envelope::err)?;
        }
        Ok(())
    }
}

/// What a chart wrote where, device px: the box of every title and label
/// (`text`), and of every mark a label must keep clear of (`marks`: the
/// member's dots and squares).
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Boxes {
    pub text: Vec<TextBox>,
    pub marks: Vec<TextBox>,
}

impl Boxes {
    /// Records both on `canvas` for tests: `data-text-boxes` and
    /// `data-mark-boxes` ([`record`]).
    pub fn record_on(&self, canvas: &web_sys::HtmlCanvasElement, dpr: f64) -> Result<(), String> {
        for (k, b) in [
            ("data-text-boxes", &self.text),
            ("data-mark-boxes", &self.marks),
        ] {
            canvas
                .set_attribute(k, &record(b, dpr))
                .map_err(super::envelope::err)?;
        }
        Ok(())
    }
}

/// The width of text as `canvas` draws it (its 2D context's
/// `measureText`, in the font plotters sets: "<size>px sans-serif"); the
/// estimate of [`super::data::text_box`] where the canvas cannot measure.
pub fn canvas_measure(canvas: &web_sys::HtmlCanvasElement) -> impl Fn(&str, f64) -> f64 {
    use wasm_bindgen::JsCast;
    let context = canvas
        .get_context("2d")
        .ok()
        .flatten()
        .and_then(|c| c.dyn_into::<web_sys::CanvasRenderingContext2d>().ok());
    move |t: &str, px: f64| {
        context
            .as_ref()
            .and_then(|g| {
                g.set_font(&format!("{px}px sans-serif"));
                g.measure_text(t).ok()
            })
            .map_or_else(|| super::data::text_box(t, px).0, |m| m.width())
    }
}

/// The boxes as the canvas records them: "x,y,w,h" in CSS px, one decimal,
/// separated by ";".
pub fn record(boxes: &[TextBox], dpr: f64) -> String {
    boxes
        .iter()
        .map(|b| {
            format!(
                "{:.1},{:.1},{:.1},{:.1}",
                b.x / dpr,
                b.y / dpr,
                b.w / dpr,
                b.h / dpr
            )
        })
        .collect::<Vec<_>>()
        .join(";")
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::chart::data::text_box;

    fn estimate(t: &str, px: f64) -> f64 {
        text_box(t, px).0
    }

    #[test]
    fn a_title_wraps_at_its_parts_then_its_words() {
        let parts = ["minor axis (uniform M assumed)", "M major held 123.4 kN·m"];
        // Wide enough for all: one line, as written.
        let one = wrap(&parts, " · ", 1000.0, 12.0, &estimate);
        assert_eq!(
            one,
            vec!["minor axis (uniform M assumed) · M major held 123.4 kN·m"]
        );
        // 30 characters at 12 px (0.56 em each) is 201.6 px: each part on a line.
        let two = wrap(&parts, " · ", 202.0, 12.0, &estimate);
        assert_eq!(
            two,
            vec!["minor axis (uniform M assumed)", "M major held 123.4 kN·m"]
        );
        // Narrower: the first part broken at its spaces, every line fits.
        let narrow = wrap(&parts, " · ", 150.0, 12.0, &estimate);
        assert_eq!(
            narrow,
            vec![
                "minor axis (uniform M",
                "assumed)",
                "M major held 123.4",
                "kN·m"
            ]
        );
        assert!(narrow.iter().all(|l| estimate(l, 12.0) <= 150.0));
        // Nothing is lost.
        assert_eq!(narrow.join(" "), parts.join(" "));
    }

    #[test]
    fn a_word_too_wide_takes_a_smaller_font() {
        // "compression" is 11 characters: 73.9 px at 12 px, 61.6 px at 10 px.
        let (lines, size) = fit(&["compression"], " ", 65.0, 12.0, &estimate);
        assert_eq!(lines, vec!["compression"]);
        assert!(
            size < 12.0 && estimate("compression", size) <= 65.0,
            "{size}"
        );
        // It fits: the size is kept.
        let (_, size) = fit(&["compression"], " ", 80.0, 12.0, &estimate);
        assert_eq!(size, 12.0);
    }

    #[test]
    fn a_label_goes_where_it_is_clear_and_inside() {
        let bounds = TextBox {
            x: 0.0,
            y: 0.0,
            w: 100.0,
            h: 50.0,
        };
        let dot = TextBox::centred(90.0, 40.0, 10.0, 10.0);
        let right = TextBox {
            x: 96.0,
            y: 34.0,
            w: 30.0,
            h: 12.0,
        };
        let left = TextBox {
            x: 55.0,
            y: 34.0,
            w: 30.0,
            h: 12.0,
        };
        let over = TextBox {
            x: 75.0,
            y: 34.0,
            w: 30.0,
            h: 12.0,
        };
        // Right leaves the canvas; over covers the dot; left is clear.
        assert!(!right.within(&bounds));
        assert!(over.overlaps(&dot) && !left.overlaps(&dot));
        assert_eq!(place(&[right, over, left], &[dot], &bounds), Some(left));
        // Nothing clear: the one inside with the least overlap.
        let a = TextBox {
            x: 80.0,
            y: 34.0,
            w: 15.0,
            h: 12.0,
        };
        assert_eq!(place(&[right, over, a], &[dot, left], &bounds), Some(a));
        assert_eq!(place(&[], &[dot], &bounds), None);
    }

    #[test]
    fn a_tick_number_is_boxed_where_it_is_written_and_labels_keep_off_it() {
        // Under its point across, left of it up, a line (1.2 em) high.
        let below = Tick::Below.text_box((100.0, 200.0), 5.0, 20.0, 10.0);
        assert_eq!(
            below,
            TextBox {
                x: 90.0,
                y: 205.0,
                w: 20.0,
                h: 12.0
            }
        );
        let left = Tick::Left.text_box((100.0, 200.0), 6.0, 30.0, 10.0);
        assert_eq!(
            left,
            TextBox {
                x: 64.0,
                y: 194.0,
                w: 30.0,
                h: 12.0
            }
        );
        // A number that would cover the member's mark (its point on the
        // axis) is left out; the others are kept with their boxes.
        let mut ticks = Ticks::default();
        ticks.add(Tick::Left, "100".into(), (100, 200), 6);
        ticks.add(Tick::Left, "200".into(), (100, 150), 6);
        ticks.add(Tick::Below, "0".into(), (100, 250), 5);
        let mark = TextBox::centred(100.0, 150.0, 16.0, 16.0);
        let kept = ticks.kept(&estimate, 10.0, &[mark]);
        let numbers: Vec<&str> = kept.iter().map(|(t, _)| t.number.as_str()).collect();
        assert_eq!(numbers, ["100", "0"]);
        assert!(kept.iter().all(|(_, b)| !b.overlaps(&mark)));
        assert_eq!(kept[0].1.x + kept[0].1.w, 94.0);
        // A label placed after the ticks takes the place clear of them.
        let bounds = TextBox::centred(200.0, 200.0, 400.0, 400.0);
        let on_number = TextBox::centred(100.0, 210.0, 24.0, 12.0);
        let clear = TextBox::centred(100.0, 180.0, 24.0, 12.0);
        assert!(on_number.overlaps(&below));
        assert_eq!(
            place(&[on_number, clear], &[below, left], &bounds),
            Some(clear)
        );
    }

    #[test]
    fn boxes_are_recorded_in_css_px() {
        let b = [
            TextBox {
                x: 10.0,
                y: 20.0,
                w: 30.0,
                h: 40.0,
            },
            TextBox {
                x: 0.0,
                y: 1.0,
                w: 2.0,
                h: 3.0,
            },
        ];
        assert_eq!(record(&b, 2.0), "5.0,10.0,15.0,20.0;0.0,0.5,1.0,1.5");
        // Touching edges are not an overlap.
        assert!(!b[0].overlaps(&TextBox {
            x: 40.0,
            y: 20.0,
            w: 5.0,
            h: 5.0
        }));
    }
}
