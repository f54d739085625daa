//! Reading a decimal number from text, correctly rounded, without the
//! standard library's float parser.
//!
//! `str::parse::<f64>` brings its own tables (about 11 KB of powers of
//! five) and code into the browser's wasm, next to serde_json's reader,
//! which the member file needs anyway and which (with its `float_roundtrip`
//! feature) also rounds correctly. [`parse`] therefore puts the text in
//! JSON's number form and lets serde_json read it. It accepts what
//! `str::parse::<f64>` accepts for finite decimal text: an optional sign,
//! digits with an optional point (".5" and "5." included, leading zeros
//! too) and an optional exponent; it refuses "inf", "NaN", hexadecimal and
//! anything else, and a value too large for an `f64`. The tests check it
//! against `str::parse` over many generated texts.

/// The number written in `text`, or `None` when it is not a finite
/// decimal number.
pub fn parse(text: &str) -> Option<f64> {
    let (negative, t) = if let Some(rest) = text.strip_prefix('-') {
        (true, rest)
    } else {
        (false, text.strip_prefix('+').unwrap_or(text))
    };
    let (mantissa, exponent) = match t.find(['e', 'E']) {
        Some(i) => (t.get(..i)?, Some(t.get(i + 1..)?)),
        None => (t, None),
    };
    let (whole, fraction) = mantissa.split_once('.').unwrap_or((mantissa, ""));
    let digits = |s: &str| s.bytes().all(|b| b.is_ascii_digit());
    if (whole.is_empty() && fraction.is_empty()) || !digits(whole) || !digits(fraction) {
        return None;
    }
    let whole = whole.trim_start_matches('0');
    let mut json = String::with_capacity(text.len() + 2);
    if negative {
        json.push('-');
    }
    json.push_str(if whole.is_empty() { "0" } else { whole });
    if !fraction.is_empty() {
        json.push('.');
        json.push_str(fraction);
    }
    if let Some(e) = exponent {
        let unsigned = e.strip_prefix(['+', '-']).unwrap_or(e);
        if unsigned.is_empty() || !digits(unsigned) {
            return None;
        }
        json.push('e');
        json.push_str(e);
    }
    let v = serde_json::from_str::<f64>(&json)
        .ok()
        .filter(|v| v.is_finite())?;
    // serde_json reads "-0" as an integer, which has no sign of zero.
    Some(if negative && v == 0.0 { -0.0 } else { v })
}

#[cfg(test)]
mod tests {
    use super::*;
    use proptest::prelude::*;

    /// What the standard parser gives for finite decimal text.
    fn std_parse(t: &str) -> Option<f64> {
        t.parse::<f64>().ok().filter(|v| v.is_finite())
    }

    #[test]
    fn reads_as_the_standard_parser_does() {
        for t in [
            "0",
            "-0",
            "+1",
            "007",
            "1.",
            ".5",
            "-.5",
            "5.e3",
            "1e5",
            "1E-5",
            "1e+5",
            "26.0",
            "449.5",
            "12.670",
            "0.93",
            "2.2250738585072014e-308",
            "4.9e-324",
            "1.7976931348623157e308",
            "0.1",
            "0.30000000000000004",
            "123456789012345678901234567890",
            "9007199254740993",
            "1e400",
            "-1e400",
            "1e-400",
        ] {
            let got = parse(t);
            let want = std_parse(t);
            assert_eq!(
                got.map(f64::to_bits),
                want.map(f64::to_bits),
                "{t}: {got:?} against {want:?}"
            );
        }
        for bad in [
            "", "+", "-", ".", "e5", "1e", "1e+", "--1", "+-1", "-+1", "1.2.3", "1,5", "inf",
            "NaN", "infinity", "0x10", "1 2", " 1", "1_000", "١",
        ] {
            assert_eq!(parse(bad), None, "{bad:?}");
        }
    }

    proptest! {
        #[test]
        fn agrees_with_the_standard_parser(
            sign in prop::sample::select(vec!["", "-", "+"]),
            whole in "[0-9]{0,20}",
            point in any::<bool>(),
            fraction in "[0-9]{0,20}",
            exp in prop::option::of(("[eE]", prop::sample::select(vec!["", "+", "-"]), 0u32..330)),
        ) {
            let mut t = format!("{sign}{whole}");
            if point {
                t.push('.');
                t.push_str(&fraction);
            }
            if let Some((e, s, n)) = exp {
                t.push_str(&format!("{e}{s}{n}"));
            }
            let want = std_parse(&t);
            prop_assert_eq!(parse(&t).map(f64::to_bits), want.map(f64::to_bits), "{}", t);
        }

        #[test]
        fn reads_back_every_shortest_text(v in any::<f64>().prop_filter("finite", |v| v.is_finite())) {
            for t in [format!("{v}"), format!("{v:e}"), format!("{v:?}")] {
                prop_assert_eq!(parse(&t).map(f64::to_bits), Some(v.to_bits()), "{}", t);
            }
        }
    }
}
