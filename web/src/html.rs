//! HTML text that is safe by construction.
//!
//! The read-only views (verdict, working, calc sheet, section view, the
//! picker's and list tools' tables) are built as text and mounted with
//! `inner_html`. An [`Html`] can only grow from three things: the app's own
//! string literals (`&'static str`, [`Html::lit`]), text that is escaped on
//! the way in ([`Html::text`], and every argument of [`html!`](crate::html!)),
//! and other `Html`. So a designation, an id, a note or a message read from
//! a file is always shown as text, never read as markup, without any
//! caller having to remember a function.

use std::fmt::{self, Write};

/// HTML text made only of the app's literals, escaped text and other `Html`.
#[derive(Debug, Clone, Default, PartialEq, Eq)]
pub struct Html(String);

impl Html {
    /// Empty.
    pub fn new() -> Html {
        Html(String::new())
    }

    /// The app's own markup, a string literal.
    pub fn from_lit(s: &'static str) -> Html {
        Html(s.to_string())
    }

    /// Escaped text.
    pub fn from_text(s: &str) -> Html {
        let mut h = Html::new();
        h.text(s);
        h
    }

    /// Appends the app's own markup (a literal).
    pub fn lit(&mut self, s: &'static str) -> &mut Html {
        self.0.push_str(s);
        self
    }

    /// Appends text, escaped.
    pub fn text(&mut self, s: &str) -> &mut Html {
        escape_into(&mut self.0, s);
        self
    }

    /// Appends other HTML.
    pub fn push(&mut self, h: &Html) -> &mut Html {
        self.0.push_str(&h.0);
        self
    }

    /// Whether it is empty.
    pub fn is_empty(&self) -> bool {
        self.0.is_empty()
    }

    /// The markup, to mount.
    pub fn as_str(&self) -> &str {
        &self.0
    }

    /// The markup, to mount.
    pub fn into_string(self) -> String {
        self.0
    }

    /// Appends formatted arguments whose every argument has been wrapped
    /// in [`Esc`] by [`html!`](crate::html!). Not for direct use.
    #[doc(hidden)]
    pub fn write_parts(&mut self, args: fmt::Arguments<'_>) {
        let _ = self.0.write_fmt(args);
    }
}

impl From<Html> for String {
    fn from(h: Html) -> String {
        h.0
    }
}

/// Appends `s` to `out` with `&`, `<`, `>`, `"` and `'` escaped, so it is
/// safe in element content and in quoted attributes.
fn escape_into(out: &mut String, s: &str) {
    for c in s.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&#39;"),
            c => out.push(c),
        }
    }
}

/// A value that can go into [`html!`](crate::html!): text and numbers are
/// escaped (numbers honour a precision such as `{:.1}`), `Html` goes in
/// as it is.
pub trait Piece {
    /// Writes the piece into `out`.
    fn put(&self, out: &mut String, precision: Option<usize>);
}

impl Piece for Html {
    fn put(&self, out: &mut String, _: Option<usize>) {
        out.push_str(&self.0);
    }
}

impl Piece for str {
    fn put(&self, out: &mut String, _: Option<usize>) {
        escape_into(out, self);
    }
}

impl Piece for String {
    fn put(&self, out: &mut String, p: Option<usize>) {
        self.as_str().put(out, p);
    }
}

impl<T: Piece + ?Sized> Piece for &T {
    fn put(&self, out: &mut String, p: Option<usize>) {
        (**self).put(out, p);
    }
}

macro_rules! numeric_piece {
    ($($t:ty),*) => {$(
        impl Piece for $t {
            fn put(&self, out: &mut String, p: Option<usize>) {
                // Digits, sign, point and exponent: nothing to escape.
                let _ = match p {
                    Some(p) => write!(out, "{:.*}", p, self),
                    None => write!(out, "{}", self),
                };
            }
        }
    )*};
}
numeric_piece!(f64, u8, u32, u64, usize, i32, i64, char);

/// A [`Piece`] shown through `{}` in [`html!`](crate::html!).
#[doc(hidden)]
pub struct Esc<'a, T: Piece + ?Sized>(pub &'a T);

impl<T: Piece + ?Sized> fmt::Display for Esc<'_, T> {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        let mut s = String::new();
        self.0.put(&mut s, f.precision());
        f.write_str(&s)
    }
}

/// Appends to an [`Html`] a literal template whose every `{}` argument is
/// escaped (or, for an `Html`, inserted as it is):
/// `html!(h, "<td>{}</td>", id)`. The template is passed on through
/// `concat!`, so the compiler refuses `{name}` captured from the scope:
/// every value that goes in is one of the listed arguments.
#[macro_export]
macro_rules! html {
    ($h:expr, $fmt:literal $(, $arg:expr)* $(,)?) => {
        $h.write_parts(format_args!(concat!($fmt) $(, $crate::html::Esc(&$arg))*))
    };
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn text_is_escaped_literals_and_html_are_not() {
        let mut h = Html::new();
        h.lit("<b>").text("<i a=\"x\">&'").lit("</b>");
        assert_eq!(h.as_str(), "<b>&lt;i a=&quot;x&quot;&gt;&amp;&#39;</b>");
        let inner = Html::from_lit("<br>");
        let mut o = Html::new();
        html!(
            o,
            "<p title=\"{}\">{} {:.2} {}</p>",
            "a\"b",
            inner,
            1.23456,
            String::from("<x>")
        );
        assert_eq!(o.as_str(), "<p title=\"a&quot;b\"><br> 1.23 &lt;x&gt;</p>");
        assert_eq!(Html::from_text("<").into_string(), "&lt;");
    }
}
