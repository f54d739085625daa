//! `strutline envelope FILE --member ID`: the member's capacity envelope
//! as CSV: slenderness, Euler stress, yield stress and the design stress
//! of the member's method about each axis; with `--interaction`, its
//! interaction curves (compression against the largest moment about each
//! axis, the other axis' moment held: core's `envelope::interaction`).
//! The CSV is data: the caution goes to standard error beside it
//! ([`crate::caution_beside_data`]).

use strutline_core::check::{Mode, Prepared};
use strutline_core::envelope::{self, interaction};

/// `strutline envelope`'s options.
#[derive(Debug, clap::Args)]
pub struct Args {
    /// The member file (.json or .csv)
    #[arg(value_name = "FILE")]
    pub path: String,
    /// The id of the member whose envelope is printed
    #[arg(long, value_name = "ID")]
    pub member: String,
    /// The largest slenderness sampled
    #[arg(long, value_name = "L", default_value_t = 250.0, value_parser = crate::positive, allow_negative_numbers = true)]
    pub to: f64,
    /// The number of intervals sampled (steps + 1 points)
    #[arg(long, value_name = "N", default_value_t = 125,
          value_parser = clap::value_parser!(u32).range(1..=100_000))]
    pub steps: u32,
    /// Print the interaction curves instead (axis, axial_kn, moment_knm,
    /// utilisation; the other axis' moment held at its design value)
    #[arg(long)]
    pub interaction: bool,
}

/// Runs the subcommand.
pub fn run(args: &Args) -> Result<i32, String> {
    let (path, id, to, steps) = (&args.path, &args.member, args.to, args.steps as usize);
    let file = crate::read_members(path)?;
    let member = file
        .member(id)
        .ok_or_else(|| format!("{path}: no member with id \"{id}\""))?;
    let prepared = Prepared::new(member).map_err(|e| format!("{path}: {e}"))?;
    let method = member.method;
    if args.interaction {
        let curves = interaction::curves(&prepared, method).map_err(|e| format!("{path}: {e}"))?;
        let mut text = String::from("axis,axial_kn,moment_knm,utilisation\n");
        for c in &curves {
            for p in &c.points {
                text.push_str(&format!(
                    "{},{:.3},{:.3},{:.6}\n",
                    c.axis, p.axial_kn, p.moment_knm, p.utilisation
                ));
            }
        }
        crate::emit(&text)?;
        crate::caution_beside_data();
        return Ok(0);
    }
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
    crate::caution_beside_data();
    Ok(0)
}
