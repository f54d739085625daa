//! Checks the check benchmark's members in a loop, for instruction counts
//! under callgrind (repeatable on a shared machine, where Criterion's times
//! are not). `bench/engine.md` gives the commands.
//!
//! `check_loop LIST ROUNDS`: LIST is `mixed` (the benchmark's 10,000 mixed
//! members, working kept), `skipped` (the same without working),
//! `prepared` (the same prepared once, checked without working: count
//! inside `check::evaluate`), `brief` (the same as written, without
//! working, checked through one reused `check::Scratch`: count inside
//! `check::check_member_in`), `prepared-brief` (prepared once, through one
//! `Scratch`: count inside `check::Scratch::check`), `moments` (the members with moments;
//! `moments-skipped` the same without working),
//! `plain` (the same members without their moments), `beam-columns`
//! (every one with axial load and moments) or `bending` (the same without
//! axial load), working kept, or `beam-columns-skipped` and
//! `bending-skipped` (the same two without working); or `sizing` (the
//! sizing benchmark's 1,000 members sized against its 300 sections: count
//! inside `strutline_core::sizing::Sizer::size_all`), `sizing-beam-columns`
//! (its beam-columns, the same way); ROUNDS (default 1) times over.
//! The cost of one round is the difference between two ROUNDS counts
//! divided by their difference, which leaves out building the list.

#[path = "../benches/lists/mod.rs"]
mod lists;
#[path = "../benches/lists/sizing.rs"]
mod sizing_lists;

use strutline_core::check::{check_member_as, check_member_in, Prepared, Scratch, Working};
use strutline_core::member::Member;

fn main() {
    let mut args = std::env::args().skip(1);
    let list = args.next().unwrap_or_else(|| "mixed".into());
    let rounds: usize = args.next().and_then(|s| s.parse().ok()).unwrap_or(1);
    if list == "sizing" || list == "sizing-beam-columns" {
        let cands = sizing_lists::candidates();
        let sizer = strutline_core::sizing::Sizer::new(&cands);
        let members = if list == "sizing" {
            sizing_lists::members()
        } else {
            sizing_lists::beam_columns()
        };
        let mut found = 0usize;
        for _ in 0..rounds {
            let sized = sizer.size_all(std::hint::black_box(&members), 0.9);
            found += sized.iter().filter(|r| r.chosen.is_some()).count();
        }
        println!("{list}: {found} sized of {}", rounds * members.len());
        return;
    }
    let (make, working): (fn(usize) -> Member, Working) = match list.as_str() {
        "mixed" => (lists::member, Working::Kept),
        "skipped" | "prepared" | "brief" | "prepared-brief" => (lists::member, Working::Skipped),
        "moments" => (lists::with_moments, Working::Kept),
        "moments-skipped" => (lists::with_moments, Working::Skipped),
        "plain" => (lists::plain, Working::Kept),
        "beam-columns" => (lists::beam_column, Working::Kept),
        "beam-columns-skipped" => (lists::beam_column, Working::Skipped),
        "bending" => (lists::bending_only, Working::Kept),
        "bending-skipped" => (lists::bending_only, Working::Skipped),
        other => {
            eprintln!(
                "unknown list {other}: mixed, skipped, prepared, brief, prepared-brief, moments, \
                 moments-skipped, plain, \
                 beam-columns, beam-columns-skipped, bending, bending-skipped, sizing or \
                 sizing-beam-columns"
            );
            std::process::exit(2);
        }
    };
    let members: Vec<Member> = (0..lists::MEMBERS).map(make).collect();
    let (mut passing, mut refused) = (0usize, 0usize);
    let mut scratch = Scratch::new(working);
    if list == "prepared" || list == "prepared-brief" {
        let prepared: Vec<Prepared> = members
            .iter()
            .filter_map(|m| Prepared::new(m).ok())
            .collect();
        refused += members.len() - prepared.len();
        for _ in 0..rounds {
            for p in &prepared {
                let p = std::hint::black_box(p);
                let passes = if list == "prepared" {
                    p.check_as(p.member.method, working).map(|r| r.passes)
                } else {
                    p.check_in(&mut scratch, p.member.method).map(|r| r.passes)
                };
                match passes {
                    Ok(ok) => passing += usize::from(ok),
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
            let m = std::hint::black_box(m);
            let passes = if list == "brief" {
                check_member_in(m, &mut scratch).map(|r| r.passes)
            } else {
                check_member_as(m, working).map(|r| r.passes)
            };
            match passes {
                Ok(ok) => passing += usize::from(ok),
                Err(_) => refused += 1,
            }
        }
    }
    println!(
        "{list}: {passing} passing, {refused} refused of {}",
        rounds * lists::MEMBERS
    );
}
