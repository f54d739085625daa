//! The working of a check: each intermediate value with its symbol, meaning,
//! unit and the clause or equation it comes from.
//!
//! A check writes some forty lines of working, so a line is kept small: its
//! four texts are [`Sym`]s, one pointer each (natively) to a static `&str`. Write lines
//! with [`step!`](crate::trace::step), which takes the texts as literals (or
//! as [`Sym`]s chosen at run time); [`push`] takes plain `&'static str`s for
//! text that only exists as such.

#[cfg(not(target_arch = "wasm32"))]
use std::cell::RefCell;
use std::fmt;
use std::ops::Deref;

use serde::{Serialize, Serializer};

/// Which part of the check a step belongs to.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "kebab-case")]
pub enum Scope {
    /// Applies to the whole member (squash load, partial factors, ...).
    Member,
    /// Flexural buckling about the major (strong) axis.
    Major,
    /// Flexural buckling about the minor (weak) axis.
    Minor,
    /// Torsional buckling.
    Torsional,
    /// Flexural-torsional buckling.
    FlexuralTorsional,
    /// Cross-section resistance (classification, effective area).
    Section,
}

/// A static text of the working; reads as a `str`.
///
/// Natively it is one pointer, to a static `&str` (a string literal's,
/// through [`sym!`](crate::trace::sym) or [`step!`](crate::trace::step)),
/// which makes a step 48 bytes instead of 80. In the browser build a `&str`
/// is already 8 bytes, so there it is the `&str` itself and the module
/// carries no table of pointers.
#[derive(Clone, Copy, PartialEq, Eq)]
pub struct Sym(
    #[cfg(not(target_arch = "wasm32"))] &'static &'static str,
    #[cfg(target_arch = "wasm32")] &'static str,
);

impl Sym {
    /// The text as a `&str`.
    #[inline]
    pub fn as_str(self) -> &'static str {
        self.0
    }
}

impl Deref for Sym {
    type Target = str;
    fn deref(&self) -> &str {
        self.as_str()
    }
}

impl From<&'static &'static str> for Sym {
    // Always inlined: in the browser build the literal's `&str` is then
    // used directly and no static holder is kept for it.
    #[inline(always)]
    fn from(s: &'static &'static str) -> Sym {
        Sym(s)
    }
}

impl From<&Sym> for Sym {
    fn from(s: &Sym) -> Sym {
        *s
    }
}

impl fmt::Debug for Sym {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        fmt::Debug::fmt(self.as_str(), f)
    }
}

impl fmt::Display for Sym {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.as_str())
    }
}

impl PartialEq<str> for Sym {
    fn eq(&self, other: &str) -> bool {
        self.as_str() == other
    }
}

impl PartialEq<&str> for Sym {
    fn eq(&self, other: &&str) -> bool {
        self.as_str() == *other
    }
}

impl Serialize for Sym {
    fn serialize<S: Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        s.serialize_str(self.as_str())
    }
}

#[cfg(not(target_arch = "wasm32"))]
thread_local! {
    static HELD: RefCell<Vec<&'static &'static str>> = const { RefCell::new(Vec::new()) };
}

/// A [`Sym`] for a `&'static str` known only at run time (a material
/// standard). Natively each distinct text is boxed once, the first time it
/// is asked for, and kept for the life of the program (the engine's texts
/// are a fixed set, so this stays a few dozen entries).
pub fn held(s: &'static str) -> Sym {
    #[cfg(target_arch = "wasm32")]
    return Sym(s);
    #[cfg(not(target_arch = "wasm32"))]
    {
        let held = HELD.with(|h| {
            let mut h = h.try_borrow_mut().ok()?;
            if let Some(p) = h.iter().copied().find(|p| std::ptr::eq(**p, s)) {
                return Some(p);
            }
            let p: &'static &'static str = Box::leak(Box::new(s));
            h.push(p);
            Some(p)
        });
        Sym(held.unwrap_or_else(|| Box::leak(Box::new(s))))
    }
}

/// One line of the working.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Step {
    /// Part of the check this belongs to.
    pub scope: Scope,
    /// The standard's symbol, plain text (e.g. "lambda_bar", "chi", "N_b,Rd").
    pub symbol: Sym,
    /// What the value is, in words.
    pub label: Sym,
    /// The value in `unit`.
    pub value: f64,
    /// Unit ("mm", "mm2", "mm4", "MPa", "kN", "-" for dimensionless).
    pub unit: Sym,
    /// Where it comes from: clause, equation or table ("EN 1993-1-1 Eq. 6.49").
    pub clause: Sym,
}

/// The working, in order.
pub type Trace = Vec<Step>;

/// Appends a step: `step!(trace, scope, symbol, label, value, unit, clause)`,
/// each text a string literal (or constant) or a [`Sym`], so method modules
/// read like a hand calculation.
macro_rules! step {
    ($trace:expr, $scope:expr, $symbol:expr, $label:expr, $value:expr, $unit:expr, $clause:expr $(,)?) => {
        $crate::trace::put(
            $trace,
            $scope,
            $crate::trace::Sym::from(&$symbol),
            $crate::trace::Sym::from(&$label),
            $value,
            $crate::trace::Sym::from(&$unit),
            $crate::trace::Sym::from(&$clause),
        )
    };
}
pub(crate) use step;

/// Appends a step (what [`step!`] calls: one call per line of working keeps
/// the browser build small; native builds inline it).
#[inline]
pub fn put(
    trace: &mut Trace,
    scope: Scope,
    symbol: Sym,
    label: Sym,
    value: f64,
    unit: Sym,
    clause: Sym,
) {
    trace.push(Step {
        scope,
        symbol,
        label,
        value,
        unit,
        clause,
    });
}

/// A [`Sym`] from a string literal: `sym!("text")`.
macro_rules! sym {
    ($s:expr) => {
        $crate::trace::Sym::from(&$s)
    };
}
pub(crate) use sym;

/// Appends a step whose texts are plain `&'static str`s (see [`held`]);
/// [`step!`] is the cheaper way for literal text.
pub fn push(
    trace: &mut Trace,
    scope: Scope,
    symbol: &'static str,
    label: &'static str,
    value: f64,
    unit: &'static str,
    clause: &'static str,
) {
    put(
        trace,
        scope,
        held(symbol),
        held(label),
        value,
        held(unit),
        held(clause),
    );
}

#[cfg(test)]
mod tests {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::*;

    #[test]
    fn a_step_reads_and_serialises_as_plain_text() {
        let mut t = Trace::new();
        step!(
            &mut t,
            Scope::Major,
            "chi",
            "reduction factor",
            0.5,
            "-",
            "Eq. 6.49"
        );
        let clause: &'static str = "EN 1993-1-1 Table 6.2";
        push(
            &mut t,
            Scope::Minor,
            "alpha",
            "imperfection",
            0.34,
            "-",
            clause,
        );
        assert_eq!(t[0].symbol, "chi");
        assert!(t[0].label.contains("reduction"));
        assert_eq!(t[1].clause.as_str(), clause);
        assert_eq!(format!("{:?}", t[0].unit), "\"-\"");
        let json = serde_json::to_string(&t[1]).unwrap();
        assert_eq!(
            json,
            r#"{"scope":"minor","symbol":"alpha","label":"imperfection","value":0.34,"unit":"-","clause":"EN 1993-1-1 Table 6.2"}"#
        );
    }

    #[test]
    fn run_time_text_is_held_once() {
        let s: &'static str = "EN 10025-2:2019 Table 7";
        let a = held(s);
        let b = held(s);
        assert!(std::ptr::eq(a.0, b.0));
        assert_eq!(a, "EN 10025-2:2019 Table 7");
    }
}
