//! Shared helpers for the reference tests under `validation/`: tolerances
//! with their reasons, and an assertion that reports source and clause.

/// Asserts that `actual` is within relative `tol` of `expected`, naming
/// the source of the expected value in the failure message.
#[track_caller]
pub fn assert_close(actual: f64, expected: f64, tol: f64, what: &str) {
    let rel = if expected == 0.0 {
        actual.abs()
    } else {
        ((actual - expected) / expected).abs()
    };
    assert!(
        rel <= tol,
        "{what}: got {actual}, expected {expected} (relative difference {rel:.4e} > tolerance {tol:.1e})"
    );
}

/// A member from its member-file JSON (version-3 keys allowed), for the
/// bending references. A member that does not read is the test's own bug,
/// so it panics with the reason.
#[allow(clippy::panic)]
pub fn member_from_json(value: serde_json::Value) -> strutline_core::Member {
    strutline_core::file::member_from_value(&value, 0)
        .unwrap_or_else(|e| panic!("a reference member must read: {e}"))
}

/// [`member_from_json`] of `base` with the keys of `extra` added (or
/// replaced): one reference member varied key by key.
pub fn member_with(base: serde_json::Value, extra: serde_json::Value) -> strutline_core::Member {
    member_from_json(with_keys(base, extra))
}

/// A member-file object with the keys of `extra` added (or replaced).
pub fn with_keys(mut base: serde_json::Value, extra: serde_json::Value) -> serde_json::Value {
    if let (Some(o), Some(e)) = (base.as_object_mut(), extra.as_object()) {
        for (k, v) in e {
            o.insert(k.clone(), v.clone());
        }
    }
    base
}

/// The value of the first step of the working with this symbol. A missing
/// step is the test's own finding, so it panics naming the symbol.
#[allow(clippy::panic)]
pub fn step_value(r: &strutline_core::CheckResult, symbol: &str) -> f64 {
    r.trace
        .iter()
        .find(|s| s.symbol == symbol)
        .map(|s| s.value)
        .unwrap_or_else(|| panic!("no step {symbol} in the working"))
}
