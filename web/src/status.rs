//! The status of a member in words and a symbol, so that it never depends
//! on colour alone.

use strutline_core::{CheckResult, Error};

use crate::numtext::fixed;

/// Where a member stands.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Standing {
    /// The design load is within the resistance.
    Holds,
    /// The design load exceeds the resistance.
    Exceeds,
    /// The input cannot be checked.
    NeedsInput,
}

impl Standing {
    /// Of a check outcome.
    pub fn of(outcome: &Result<CheckResult, Error>) -> Standing {
        match outcome {
            Ok(r) if r.passes => Standing::Holds,
            Ok(_) => Standing::Exceeds,
            Err(_) => Standing::NeedsInput,
        }
    }

    /// The symbol.
    pub fn symbol(self) -> &'static str {
        match self {
            Standing::Holds => "✓",
            Standing::Exceeds => "✗",
            Standing::NeedsInput => "✎",
        }
    }

    /// The word.
    pub fn word(self) -> &'static str {
        match self {
            Standing::Holds => "holds",
            Standing::Exceeds => "exceeds",
            Standing::NeedsInput => "fix input",
        }
    }

    /// The CSS class (the colour only repeats what the words say).
    pub fn class(self) -> &'static str {
        match self {
            Standing::Holds => "st-holds",
            Standing::Exceeds => "st-exceeds",
            Standing::NeedsInput => "st-input",
        }
    }
}

/// The utilisation to three decimals, or "—" when there is none.
pub fn utilisation_text(outcome: &Result<CheckResult, Error>) -> String {
    match outcome {
        Ok(r) => fixed(r.utilisation, 3),
        Err(_) => "—".into(),
    }
}

/// The status line of a member: "✓ holds", "✗ exceeds", "✎ fix input".
pub fn status_text(outcome: &Result<CheckResult, Error>) -> String {
    let s = Standing::of(outcome);
    format!("{} {}", s.symbol(), s.word())
}

/// The governing mode in words, with the axis.
pub fn governing_text(r: &CheckResult) -> String {
    use strutline_core::Mode;
    match r.governing_check {
        "bending-major" => return "bending, major axis".into(),
        "bending-minor" => return "bending, minor axis".into(),
        "combined-not-checked" => {
            return "axial load with moments: interaction not checked, not passed".into()
        }
        _ => {}
    }
    match r.governing {
        Mode::Major => "flexural buckling, major axis".into(),
        Mode::Minor => "flexural buckling, minor axis".into(),
        Mode::Torsional => "torsional buckling".into(),
        Mode::FlexuralTorsional => "flexural-torsional buckling".into(),
        Mode::Section => "cross-section resistance".into(),
    }
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
    use crate::demo;

    #[test]
    fn words_and_symbols() {
        let mut m = demo::sample_member("T1");
        m.axial_kn = 1.0;
        let ok = strutline_core::check_member(&m);
        assert_eq!(Standing::of(&ok), Standing::Holds);
        assert_eq!(status_text(&ok), "✓ holds");
        let u = ok.as_ref().unwrap().utilisation;
        assert_eq!(utilisation_text(&ok), format!("{u:.3}"));
        m.axial_kn = 1e6;
        let over = strutline_core::check_member(&m);
        assert_eq!(status_text(&over), "✗ exceeds");
        m.length_mm = -1.0;
        let bad = strutline_core::check_member(&m);
        assert_eq!(status_text(&bad), "✎ fix input");
        assert_eq!(utilisation_text(&bad), "—");
    }
}
