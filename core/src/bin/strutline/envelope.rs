//! `strutline envelope FILE --member ID`: the member's capacity envelope
//! as CSV: slenderness, Euler stress, yield stress and the design stress
//! of the member's method about each axis.

use strutline_core::check::{Mode, Prepared};
use strutline_core::envelope;

/// Runs the subcommand.
pub fn run(args: &[String]) -> Result<i32, String> {
    let id = crate::flag_value(args, "--member")?
        .ok_or("envelope needs --member ID; e.g. `strutline envelope members.json --member C1`")?;
    let to = match crate::flag_value(args, "--to")? {
        Some(v) => v
            .parse::<f64>()
            .ok()
            .filter(|v| v.is_finite() && *v > 0.0)
            .ok_or("--to: expected a slenderness greater than zero, e.g. 250")?,
        None => 250.0,
    };
    let steps = match crate::flag_value(args, "--steps")? {
        Some(v) => v
            .parse::<usize>()
            .ok()
            .filter(|v| (1..=100_000).contains(v))
            .ok_or("--steps: expected a whole number from 1 to 100000")?,
        None => 125,
    };
    let mut path = None;
    for a in crate::others(args, &["--member", "--to", "--steps"]) {
        if a.starts_with("--") {
            return Err(format!("envelope: unknown option {a}"));
        }
        path = Some(a);
    }
    let path = path.ok_or("envelope needs a FILE")?;
    let file = crate::read_members(path)?;
    let member = file
        .member(id)
        .ok_or_else(|| format!("{path}: no member with id \"{id}\""))?;
    let prepared = Prepared::new(member).map_err(|e| format!("{path}: {e}"))?;
    let method = member.method;
    let major = envelope::sample(&prepared, method, Mode::Major, 0.0, to, steps)
        .map_err(|e| format!("{path}: {e}"))?;
    let minor = envelope::sample(&prepared, method, Mode::Minor, 0.0, to, steps)
        .map_err(|e| format!("{path}: {e}"))?;
    let mut text = String::with_capacity(48 * (major.len() + 1));
    text.push_str("slenderness,euler_mpa,yield_mpa,design_major_mpa,design_minor_mpa\n");
    for (a, b) in major.iter().zip(minor.iter()) {
        text.push_str(&format!(
            "{:.3},{:.3},{:.3},{:.3},{:.3}\n",
            a.slenderness, a.euler_mpa, a.yield_mpa, a.design_mpa, b.design_mpa
        ));
    }
    crate::emit(&text)?;
    Ok(0)
}
