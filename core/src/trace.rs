//! The working of a check: each intermediate value with its symbol, meaning,
//! unit and the clause or equation it comes from.
//!
//! A check writes some forty lines of working, so a line is kept small
//! (natively 40 bytes, was 80): the symbol and its unit are one [`Symbol`],
//! label and clause a [`Sym`] each, every one a single pointer to static
//! text. Write lines with [`step!`](crate::trace::step), which takes the
//! texts as literals (label and clause also as [`Sym`]s chosen at run time);
//! [`push`] takes plain `&'static str`s for text that only exists as such.

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
    /// Bending about the major axis, with lateral-torsional buckling.
    BendingMajor,
    /// Bending about the minor axis.
    BendingMinor,
    /// Compression and bending together (the beam-column interaction).
    Interaction,
}

/// A static text of the working; reads as a `str`.
///
/// Natively it is one pointer, to a static `&str` (a string literal's,
/// through [`sym!`](crate::trace::sym) or [`step!`](crate::trace::step)),
/// which keeps a step small. In the browser build a `&str`
/// is already 8 bytes, so there it is the `&str` itself and the module
/// carries no table of pointers.
#[derive(Clone, Copy, PartialEq, Eq)]
pub struct Sym(
    #[cfg(not(target_arch = "wasm32"))] &'static &'static str,
    #[cfg(target_arch = "wasm32")] &'static str,
);

impl Sym {
    /// A [`Sym`] in a constant (the material tables): `Sym::lit(&"text")`.
    /// (In the browser build the reference is dereferenced by coercion.)
    pub const fn lit(s: &'static &'static str) -> Sym {
        Sym(s)
    }

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

/// A step's symbol together with its unit; reads as the symbol.
///
/// Natively one pointer, to a static pair (a literal pair's, through
/// [`step!`](crate::trace::step)), so symbol and unit cost one word of the
/// step; in the browser build the pair itself.
#[derive(Clone, Copy, PartialEq, Eq)]
pub struct Symbol(
    #[cfg(not(target_arch = "wasm32"))] &'static (&'static str, &'static str),
    #[cfg(target_arch = "wasm32")] (&'static str, &'static str),
);

impl Symbol {
    /// The symbol as a `&str`.
    #[inline]
    pub fn as_str(self) -> &'static str {
        self.0 .0
    }

    /// The unit of the step's value.
    #[inline]
    pub fn unit(self) -> &'static str {
        self.0 .1
    }
}

impl From<&'static (&'static str, &'static str)> for Symbol {
    // Always inlined, as `Sym::from`.
    #[inline(always)]
    fn from(p: &'static (&'static str, &'static str)) -> Symbol {
        #[cfg(not(target_arch = "wasm32"))]
        return Symbol(p);
        #[cfg(target_arch = "wasm32")]
        return Symbol(*p);
    }
}

impl Deref for Symbol {
    type Target = str;
    fn deref(&self) -> &str {
        self.as_str()
    }
}

impl fmt::Debug for Symbol {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        fmt::Debug::fmt(self.as_str(), f)
    }
}

impl fmt::Display for Symbol {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.as_str())
    }
}

impl PartialEq<str> for Symbol {
    fn eq(&self, other: &str) -> bool {
        self.as_str() == other
    }
}

impl PartialEq<&str> for Symbol {
    fn eq(&self, other: &&str) -> bool {
        self.as_str() == *other
    }
}

#[cfg(not(target_arch = "wasm32"))]
thread_local! {
    static PAIRS: RefCell<Vec<&'static (&'static str, &'static str)>> =
        const { RefCell::new(Vec::new()) };
}

/// A [`Symbol`] for a symbol and unit known only at run time, held as
/// [`held`] holds a text.
pub fn held_symbol(symbol: &'static str, unit: &'static str) -> Symbol {
    #[cfg(target_arch = "wasm32")]
    return Symbol((symbol, unit));
    #[cfg(not(target_arch = "wasm32"))]
    {
        let same = |p: &&'static (&'static str, &'static str)| {
            std::ptr::eq(p.0, symbol) && std::ptr::eq(p.1, unit)
        };
        let held = PAIRS.with(|h| {
            let mut h = h.try_borrow_mut().ok()?;
            if let Some(p) = h.iter().copied().find(same) {
                return Some(p);
            }
            let p: &'static (&'static str, &'static str) = Box::leak(Box::new((symbol, unit)));
            h.push(p);
            Some(p)
        });
        Symbol(held.unwrap_or_else(|| Box::leak(Box::new((symbol, unit)))))
    }
}

/// One line of the working. Its unit is kept with its symbol (see
/// [`Symbol`]) and read with [`Step::unit`]; it serialises with the six
/// fields scope, symbol, label, value, unit, clause.
#[derive(Clone, PartialEq)]
pub struct Step {
    /// Part of the check this belongs to.
    pub scope: Scope,
    /// The standard's symbol, plain text (e.g. "lambda_bar", "chi", "N_b,Rd"), with the unit.
    pub symbol: Symbol,
    /// What the value is, in words.
    pub label: Sym,
    /// The value in the step's [`unit`](Step::unit).
    pub value: f64,
    /// Where it comes from: clause, equation or table ("EN 1993-1-1 Eq. 6.49").
    pub clause: Sym,
}

impl Step {
    /// Unit ("mm", "mm2", "mm4", "MPa", "kN", "-" for dimensionless).
    pub fn unit(&self) -> &'static str {
        self.symbol.unit()
    }
}

impl Serialize for Step {
    fn serialize<S: Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        use serde::ser::SerializeStruct;
        let mut st = s.serialize_struct("Step", 6)?;
        st.serialize_field("scope", &self.scope)?;
        st.serialize_field("symbol", self.symbol.as_str())?;
        st.serialize_field("label", &self.label)?;
        st.serialize_field("value", &self.value)?;
        st.serialize_field("unit", self.unit())?;
        st.serialize_field("clause", &self.clause)?;
        st.end()
    }
}

impl fmt::Debug for Step {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.debug_struct("Step")
            .field("scope", &self.scope)
            .field("symbol", &self.symbol)
            .field("label", &self.label)
            .field("value", &self.value)
            .field("unit", &self.unit())
            .field("clause", &self.clause)
            .finish()
    }
}

/// The working, in order: the steps a check wrote, or none when the check
/// was run without its working ([`Trace::off`]).
///
/// Checks whose working nobody reads (a batch's summaries, sizing
/// candidates, envelope samples, the app's list recheck) run with a trace
/// that is off: every step the methods write is dropped at once, nothing is
/// allocated, and the numbers are the same (a property test compares every
/// result with and without working, bit for bit). It reads as a slice of
/// its steps; steps are added only through [`step!`], [`put`] and [`push`].
#[derive(Debug, Clone, PartialEq, Default)]
pub struct Trace {
    steps: Vec<Step>,
    off: bool,
}

impl Trace {
    /// An empty trace that keeps every step.
    pub fn new() -> Trace {
        Trace::default()
    }

    /// An empty trace that keeps every step, with room for `n`.
    pub fn with_capacity(n: usize) -> Trace {
        Trace {
            steps: Vec::with_capacity(n),
            off: false,
        }
    }

    /// A trace that keeps nothing: the check runs without its working.
    pub fn off() -> Trace {
        Trace {
            steps: Vec::new(),
            off: true,
        }
    }

    /// Whether steps are kept. Code that only writes working (and would
    /// compute something for it alone) may skip that when this is false.
    #[inline]
    pub fn is_on(&self) -> bool {
        !self.off
    }

    /// Makes room for `n` more steps when steps are kept.
    pub fn reserve(&mut self, n: usize) {
        if !self.off {
            self.steps.reserve(n);
        }
    }

    /// Removes every step (whether it keeps steps stays as it was).
    pub fn clear(&mut self) {
        self.steps.clear();
    }

    /// Drops every step after the first `n` (the working of a step that was
    /// abandoned, such as an annex that could not be evaluated).
    pub fn truncate(&mut self, n: usize) {
        self.steps.truncate(n);
    }

    /// The steps as a vector.
    pub fn into_steps(self) -> Vec<Step> {
        self.steps
    }
}

impl Deref for Trace {
    type Target = [Step];
    fn deref(&self) -> &[Step] {
        &self.steps
    }
}

impl std::ops::DerefMut for Trace {
    fn deref_mut(&mut self) -> &mut [Step] {
        &mut self.steps
    }
}

impl<'a> IntoIterator for &'a Trace {
    type Item = &'a Step;
    type IntoIter = std::slice::Iter<'a, Step>;
    fn into_iter(self) -> Self::IntoIter {
        self.steps.iter()
    }
}

impl Serialize for Trace {
    fn serialize<S: Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
        self.steps.serialize(s)
    }
}

/// Appends a step: `step!(trace, scope, symbol, label, value, unit, clause)`,
/// the symbol and unit string literals, label and clause each a string
/// literal (or constant) or a [`Sym`], so method modules read like a hand
/// calculation.
#[cfg(not(target_arch = "wasm32"))]
macro_rules! step {
    ($trace:expr, $scope:expr, $symbol:expr, $label:expr, $value:expr, $unit:expr, $clause:expr $(,)?) => {{
        // Natively the arguments are worked only when the working is kept
        // (a value or clause worked for the working alone costs nothing
        // without it); an argument never changes a number of the check.
        let trace: &mut $crate::trace::Trace = $trace;
        if trace.is_on() {
            $crate::trace::put(
                trace,
                $scope,
                $crate::trace::Symbol::from(&($symbol, $unit)),
                $crate::trace::Sym::from(&$label),
                $value,
                $crate::trace::Sym::from(&$clause),
            )
        }
    }};
}
/// The browser build: one call a line, which keeps the module small.
#[cfg(target_arch = "wasm32")]
macro_rules! step {
    ($trace:expr, $scope:expr, $symbol:expr, $label:expr, $value:expr, $unit:expr, $clause:expr $(,)?) => {
        $crate::trace::put(
            $trace,
            $scope,
            $crate::trace::Symbol::from(&($symbol, $unit)),
            $crate::trace::Sym::from(&$label),
            $value,
            $crate::trace::Sym::from(&$clause),
        )
    };
}
pub(crate) use step;

/// Appends a step (what [`step!`] calls: one call per line of working keeps
/// the browser build small; native builds inline it). Nothing when the
/// trace is [off](Trace::off).
#[inline]
pub fn put(trace: &mut Trace, scope: Scope, symbol: Symbol, label: Sym, value: f64, clause: Sym) {
    if trace.off {
        return;
    }
    trace.steps.push(Step {
        scope,
        symbol,
        label,
        value,
        clause,
    });
}

/// A [`Symbol`] from a literal symbol and unit: `symbol!("c/t", "-")`.
macro_rules! symbol {
    ($s:expr, $u:expr) => {
        $crate::trace::Symbol::from(&($s, $u))
    };
}
pub(crate) use symbol;

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
    if trace.off {
        return;
    }
    put(
        trace,
        scope,
        held_symbol(symbol, unit),
        held(label),
        value,
        held(clause),
    );
}

#[cfg(test)]
mod tests {
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
        assert_eq!(t[0].unit(), "-");
        assert!(format!("{:?}", t[0]).contains("unit: \"-\""));
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
        let (p, q) = (held_symbol("t", "mm"), held_symbol("t", "mm"));
        assert!(std::ptr::eq(p.0, q.0));
        assert_eq!((p.as_str(), p.unit()), ("t", "mm"));
    }

    #[test]
    fn a_trace_that_is_off_keeps_nothing() {
        let mut t = Trace::off();
        step!(
            &mut t,
            Scope::Major,
            "chi",
            "reduction factor",
            0.5,
            "-",
            "x"
        );
        push(&mut t, Scope::Minor, "a", "b", 1.0, "-", "c");
        assert!(t.is_empty() && !t.is_on());
        assert_eq!(serde_json::to_string(&t).unwrap(), "[]");
        let mut on = Trace::new();
        step!(
            &mut on,
            Scope::Major,
            "chi",
            "reduction factor",
            0.5,
            "-",
            "x"
        );
        assert_eq!(on.len(), 1);
        assert_eq!(
            serde_json::to_string(&on).unwrap().matches("chi").count(),
            1
        );
    }
}
