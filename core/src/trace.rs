//! The working of a check: each intermediate value with its symbol, meaning,
//! unit and the clause or equation it comes from.

use serde::Serialize;

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

/// One line of the working.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Step {
    /// Part of the check this belongs to.
    pub scope: Scope,
    /// The standard's symbol, plain text (e.g. "lambda_bar", "chi", "N_b,Rd").
    pub symbol: &'static str,
    /// What the value is, in words.
    pub label: &'static str,
    /// The value in `unit`.
    pub value: f64,
    /// Unit ("mm", "mm2", "mm4", "MPa", "kN", "-" for dimensionless).
    pub unit: &'static str,
    /// Where it comes from: clause, equation or table ("EN 1993-1-1 Eq. 6.49").
    pub clause: &'static str,
}

/// The working, in order.
pub type Trace = Vec<Step>;

/// Appends a step; a small helper so method modules read like a hand calculation.
pub fn push(
    trace: &mut Trace,
    scope: Scope,
    symbol: &'static str,
    label: &'static str,
    value: f64,
    unit: &'static str,
    clause: &'static str,
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
