//! Throughput of the member check: 10,000 members of mixed shapes and
//! methods, checked from their member-file form (section built, material
//! resolved, both axes worked), with the working kept (as a result shown to
//! a person) and without it (as a batch's summaries, sizing candidates and
//! envelope samples). Run with `cargo xtask bench` (or `cargo bench -p
//! strutline-core --bench check`).

mod lists;

use criterion::{black_box, criterion_group, criterion_main, Criterion, Throughput};
use lists::{beam_column, bending_only, member, plain, with_moments, MEMBERS};
use strutline_core::check::{check_member_as, check_member_in, Prepared, Scratch, Working};
use strutline_core::member::Member;

fn bench(c: &mut Criterion) {
    let beams: Vec<Member> = (0..MEMBERS).map(with_moments).collect();
    for m in &beams {
        if let Err(e) = strutline_core::check_member(m) {
            eprintln!("benchmark member with moments does not check: {e}");
            std::process::exit(1);
        }
    }
    let members: Vec<Member> = (0..MEMBERS).map(member).collect();
    // Every member must check: a benchmark of errors would measure nothing.
    for m in &members {
        if let Err(e) = strutline_core::check_member(m) {
            eprintln!("benchmark member does not check: {e}");
            std::process::exit(1);
        }
    }
    let mut group = c.benchmark_group("check");
    group.throughput(Throughput::Elements(MEMBERS as u64));
    for (name, working) in [
        ("10k_mixed_members", Working::Kept),
        ("10k_mixed_members_without_working", Working::Skipped),
    ] {
        group.bench_function(name, |b| {
            b.iter(|| {
                let mut passing = 0usize;
                for m in &members {
                    if let Ok(r) = check_member_as(black_box(m), working) {
                        passing += usize::from(r.passes);
                    }
                }
                black_box(passing)
            })
        });
    }
    // The same members prepared once (section built, material resolved,
    // options validated), as a list re-check or a repeated check of the
    // same members does: the check itself without its working.
    let prepared: Vec<Prepared> = members
        .iter()
        .filter_map(|m| Prepared::new(m).ok())
        .collect();
    if prepared.len() != members.len() {
        eprintln!("a benchmark member does not prepare");
        std::process::exit(1);
    }
    group.bench_function("10k_mixed_members_prepared_without_working", |b| {
        b.iter(|| {
            let mut passing = 0usize;
            for p in &prepared {
                let p = black_box(p);
                if let Ok(r) = p.check_as(p.member.method, Working::Skipped) {
                    passing += usize::from(r.passes);
                }
            }
            black_box(passing)
        })
    });
    // The batch form: the same checks without working through one reused
    // Scratch (no result allocated), from the member as written and
    // prepared once.
    group.bench_function("10k_mixed_members_brief", |b| {
        let mut scratch = Scratch::new(Working::Skipped);
        b.iter(|| {
            let mut passing = 0usize;
            for m in &members {
                if let Ok(r) = check_member_in(black_box(m), &mut scratch) {
                    passing += usize::from(r.passes);
                }
            }
            black_box(passing)
        })
    });
    group.bench_function("10k_mixed_members_prepared_brief", |b| {
        let mut scratch = Scratch::new(Working::Skipped);
        b.iter(|| {
            let mut passing = 0usize;
            for p in &prepared {
                let p = black_box(p);
                if let Ok(r) = p.check_in(&mut scratch, p.member.method) {
                    passing += usize::from(r.passes);
                }
            }
            black_box(passing)
        })
    });
    // The same members without their moments: the cost of the bending side.
    let plain: Vec<Member> = (0..MEMBERS).map(plain).collect();
    group.bench_function("10k_same_members_without_moments", |b| {
        b.iter(|| {
            let mut passing = 0usize;
            for m in &plain {
                if let Ok(r) = strutline_core::check_member(black_box(m)) {
                    passing += usize::from(r.passes);
                }
            }
            black_box(passing)
        })
    });
    group.bench_function("10k_members_with_moments", |b| {
        b.iter(|| {
            let mut passing = 0usize;
            for m in &beams {
                if let Ok(r) = strutline_core::check_member(black_box(m)) {
                    passing += usize::from(r.passes);
                }
            }
            black_box(passing)
        })
    });
    group.finish();

    // Issue 17's and 16's targets: beam-columns (every interaction
    // equation, both axes, lateral-torsional buckling) and members under
    // bending alone, a million checks a second on one core.
    type Make = fn(usize) -> Member;
    let kinds: [(&str, Make, bool); 2] = [
        ("beam_columns", beam_column, true),
        ("bending_only", bending_only, false),
    ];
    for (kind, make, axial) in kinds {
        let list: Vec<Member> = (0..MEMBERS).map(make).collect();
        for m in &list {
            match strutline_core::check_member(m) {
                Ok(r) if axial && r.interaction.is_empty() => {
                    eprintln!("benchmark beam-column {} works no interaction", m.id);
                    std::process::exit(1);
                }
                Ok(r) if !axial && r.bending.is_none() => {
                    eprintln!("benchmark member {} works no bending", m.id);
                    std::process::exit(1);
                }
                Ok(_) => {}
                Err(e) => {
                    eprintln!("benchmark member {} does not check: {e}", m.id);
                    std::process::exit(1);
                }
            }
        }
        let mut group = c.benchmark_group(kind);
        group.throughput(Throughput::Elements(MEMBERS as u64));
        for (name, working) in [
            ("10k_working_kept", Working::Kept),
            ("10k_without_working", Working::Skipped),
        ] {
            group.bench_function(name, |b| {
                b.iter(|| {
                    let mut passing = 0usize;
                    for m in &list {
                        if let Ok(r) = check_member_as(black_box(m), working) {
                            passing += usize::from(r.passes);
                        }
                    }
                    black_box(passing)
                })
            });
        }
        group.finish();
    }
}

criterion_group!(benches, bench);
criterion_main!(benches);
