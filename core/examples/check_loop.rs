//! Checks the check benchmark's members in a loop, for instruction counts
//! under callgrind (repeatable on a shared machine, where Criterion's times
//! are not). `bench/engine.md` gives the commands.
//!
//! `check_loop LIST ROUNDS`: LIST is `mixed` (the benchmark's 10,000 mixed
//! members, working kept), `skipped` (the same without working),
//! `prepared` (the same prepared once, checked without working: count
//! inside `check::evaluate`), `moments` (the members with moments),
//! `plain` (the same members without their moments), `beam-columns`
//! (every one with axial load and moments) or `bending` (the same without
//! axial load), working kept, or `beam-columns-skipped` and
//! `bending-skipped` (the same two without working); ROUNDS (default 1)
//! times over.
//! The cost of one round is the difference between two ROUNDS counts
//! divided by their difference, which leaves out building the list.

#[path = "../benches/lists/mod.rs"]
mod lists;

use strutline_core::check::{check_member_as, Prepared, Working};
use strutline_core::member::Member;

fn main() {
    let mut args = std::env::args().skip(1);
    let list = args.next().unwrap_or_else(|| "mixed".into());
    let rounds: usize = args.next().and_then(|s| s.parse().ok()).unwrap_or(1);
    let (make, working): (fn(usize) -> Member, Working) = match list.as_str() {
        "mixed" => (lists::member, Working::Kept),
        "skipped" | "prepared" => (lists::member, Working::Skipped),
        "moments" => (lists::with_moments, Working::Kept),
        "plain" => (lists::plain, Working::Kept),
        "beam-columns" => (lists::beam_column, Working::Kept),
        "beam-columns-skipped" => (lists::beam_column, Working::Skipped),
        "bending" => (lists::bending_only, Working::Kept),
        "bending-skipped" => (lists::bending_only, Working::Skipped),
        other => {
            eprintln!(
                "unknown list {other}: mixed, skipped, prepared, moments, plain, beam-columns, beam-columns-skipped, bending or bending-skipped"
            );
            std::process::exit(2);
        }
    };
    let members: Vec<Member> = (0..lists::MEMBERS).map(make).collect();
    let (mut passing, mut refused) = (0usize, 0usize);
    if list == "prepared" {
        let prepared: Vec<Prepared> = members
            .iter()
            .filter_map(|m| Prepared::new(m).ok())
            .collect();
        refused += members.len() - prepared.len();
        for _ in 0..rounds {
            for p in &prepared {
                let p = std::hint::black_box(p);
                match p.check_as(p.member.method, working) {
                    Ok(r) => passing += usize::from(r.passes),
                    Err(_) => refused += 1,
                }
            }
        }
        println!(
            "{list}: {passing} passing, {refused} refused of {}",
            rounds * lists::MEMBERS
        );
        return;
    }
    for _ in 0..rounds {
        for m in &members {
            match check_member_as(std::hint::black_box(m), working) {
                Ok(r) => passing += usize::from(r.passes),
                Err(_) => refused += 1,
            }
        }
    }
    println!(
        "{list}: {passing} passing, {refused} refused of {}",
        rounds * lists::MEMBERS
    );
}
