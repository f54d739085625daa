//! The status of a member in words and a symbol, so that it never depends
//! on colour alone.

use strutline_core::{CheckResult, Error};

use crate::numtext::utilisation;

/// Where a member stands.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Standing {
    /// The design load is within the resistance.
    Holds,
    /// The design load exceeds the resistance.
    Exceeds,
    /// The input cannot be checked.
    NeedsInput,
    /// Not checked yet (a long list is checked in slices after its first
    /// frame).
    Waiting,
}

impl Standing {
    /// Of a check outcome (`None`: not worked yet).
    pub fn of(outcome: &Option<Result<CheckResult, Error>>) -> Standing {
        match outcome {
            Some(Ok(r)) if r.passes => Standing::Holds,
            Some(Ok(_)) => Standing::Exceeds,
            Some(Err(_)) => Standing::NeedsInput,
            None => Standing::Waiting,
        }
    }

    /// The symbol.
    pub fn symbol(self) -> &'static str {
        match self {
            Standing::Holds => "✓",
            Standing::Exceeds => "✗",
            Standing::NeedsInput => "✎",
            Standing::Waiting => "…",
        }
    }

    /// The word.
    pub fn word(self) -> &'static str {
        match self {
            Standing::Holds => "holds",
            Standing::Exceeds => "exceeds",
            Standing::NeedsInput => "fix input",
            Standing::Waiting => "being checked",
        }
    }

    /// The CSS class (the colour only repeats what the words say).
    pub fn class(self) -> &'static str {
        match self {
            Standing::Holds => "st-holds",
            Standing::Exceeds => "st-exceeds",
            Standing::NeedsInput => "st-input",
            Standing::Waiting => "st-waiting",
        }
    }
}

/// The utilisation to three decimals, "—" when there is none, "…" while
/// it is not worked yet.
pub fn utilisation_text(outcome: &Option<Result<CheckResult, Error>>) -> String {
    match outcome {
        Some(Ok(r)) => utilisation(r.utilisation),
        Some(Err(_)) => "—".into(),
        None => "…".into(),
    }
}

/// The status line of a member: "✓ holds", "✗ exceeds", "✎ fix input".
pub fn status_text(outcome: &Option<Result<CheckResult, Error>>) -> String {
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
        name if r.interaction.iter().any(|c| c.check == name) => {
            return format!("interaction, {}", equation_name(name));
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

/// An interaction check's name as the code cites it: a clause
/// ("6.2.9", "13.8.2(b)") or an equation ("(6.61)", "H1-1a").
pub fn equation_name(name: &str) -> String {
    if name == "secant" {
        "the secant formula".into()
    } else if name.starts_with('H') {
        format!("equation {name}")
    } else if name.contains('(') || name.matches('.').count() >= 2 {
        format!("clause {name}")
    } else {
        format!("equation ({name})")
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo;

    #[test]
    fn words_and_symbols() {
        let mut m = demo::sample_member("T1");
        m.axial_kn = 1.0;
        let ok = Some(strutline_core::check_member(&m));
        assert_eq!(Standing::of(&ok), Standing::Holds);
        assert_eq!(status_text(&ok), "✓ holds");
        let u = ok.as_ref().unwrap().as_ref().unwrap().utilisation;
        assert_eq!(utilisation_text(&ok), format!("{u:.3}"));
        m.axial_kn = 1e6;
        let over = Some(strutline_core::check_member(&m));
        assert_eq!(status_text(&over), "✗ exceeds");
        m.length_mm = -1.0;
        let bad = Some(strutline_core::check_member(&m));
        assert_eq!(status_text(&bad), "✎ fix input");
        assert_eq!(utilisation_text(&bad), "—");
        // Not worked yet: said so, with no value.
        assert_eq!(Standing::of(&None), Standing::Waiting);
        assert_eq!(status_text(&None), "… being checked");
        assert_eq!(utilisation_text(&None), "…");
        // No finite utilisation (N_Ed = 1.2 N_cr,z with moments): in words,
        // not the dash of "fix input" (review N4).
        let beyond: strutline_core::Member = serde_json::from_value(serde_json::json!({
            "id": "C1", "section": {"kind": "catalogue", "designation": "HE 200 B"},
            "material": {"grade": "S355"}, "length_mm": 4000, "axial_kn": 3114,
            "m_major_a_knm": 50, "m_major_b_knm": -25, "method": "en1993-1-1"
        }))
        .unwrap();
        let beyond = Some(strutline_core::check_member(&beyond));
        assert_eq!(status_text(&beyond), "✗ exceeds");
        assert_eq!(utilisation_text(&beyond), "beyond N_cr");
    }

    #[test]
    fn each_codes_interaction_names_read_as_the_code_cites_them() {
        // The names are the issue's: EN 1993-1-1 6.2.9 (clause), (6.61)
        // and (6.62) (equations); AISC 360-16 H1-1a; CSA S16-19 13.8.2(b)
        // (clause); EN 1995-1-1 (6.23) (equation).
        assert_eq!(equation_name("6.2.9"), "clause 6.2.9");
        assert_eq!(equation_name("6.61"), "equation (6.61)");
        assert_eq!(equation_name("H1-1a"), "equation H1-1a");
        assert_eq!(equation_name("H2-1"), "equation H2-1");
        assert_eq!(equation_name("13.8.2(b)"), "clause 13.8.2(b)");
        assert_eq!(equation_name("6.23"), "equation (6.23)");
        assert_eq!(equation_name("secant"), "the secant formula");
        // And the verdict names it when an interaction check governs.
        let mut m = demo::sample_member("T2");
        m.method = strutline_core::method::Method::En1993;
        m.m_major_a_knm = 5.0;
        let mut r = strutline_core::check_member(&m).unwrap();
        r.interaction = vec![strutline_core::interaction::Check {
            check: "6.62",
            utilisation: 0.8,
        }];
        r.governing_check = "6.62";
        assert_eq!(governing_text(&r), "interaction, equation (6.62)");
    }
}
