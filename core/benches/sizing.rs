//! Throughput of sizing: 1,000 members, each sized against the same
//! 300 catalogue sections (every I/H entry, 248, and the first 52 square
//! hollow entries), lightest first until one passes, with the members' own
//! methods. Each iteration sorts and builds the candidates and sizes the
//! whole list; the same for 1,000 beam-columns (the members with end
//! moments about both axes, sized against every interaction equation:
//! group `sizing-beam-columns`); and the designation lookup. Run with
//! `cargo bench -p strutline-core --bench sizing`.

#![allow(clippy::panic, clippy::indexing_slicing)]

#[path = "lists/sizing.rs"]
mod sizing_lists;

use criterion::{black_box, criterion_group, criterion_main, Criterion, Throughput};
use sizing_lists::{beam_columns, candidates, members, CANDIDATES, MEMBERS};
use strutline_core::catalogue;
use strutline_core::sizing::Sizer;

fn bench(c: &mut Criterion) {
    let cands = candidates();
    assert_eq!(cands.len(), CANDIDATES);
    let list = members();
    let checked: usize = Sizer::new(&cands)
        .size_all(&list, 0.9)
        .iter()
        .map(|r| r.checked)
        .sum();
    println!(
        "sizing bench: {MEMBERS} members x {CANDIDATES} candidates, {checked} checks in all ({:.1} per member)",
        checked as f64 / MEMBERS as f64
    );
    let mut group = c.benchmark_group("sizing");
    group.throughput(Throughput::Elements(MEMBERS as u64));
    group.sample_size(20);
    group.bench_function("1000 members x 300 sections", |b| {
        b.iter(|| {
            let sizer = Sizer::new(black_box(&cands));
            black_box(sizer.size_all(black_box(&list), 0.9))
        })
    });
    group.finish();

    let beams = beam_columns();
    let sized = Sizer::new(&cands).size_all(&beams, 0.9);
    let checked: usize = sized.iter().map(|r| r.checked).sum();
    let chosen = sized.iter().filter(|r| r.chosen.is_some()).count();
    println!(
        "sizing bench, beam-columns: {MEMBERS} members x {CANDIDATES} candidates, {checked} checks in all \
         ({:.1} per member), a section found for {chosen}",
        checked as f64 / MEMBERS as f64
    );
    let mut group = c.benchmark_group("sizing-beam-columns");
    group.throughput(Throughput::Elements(MEMBERS as u64));
    group.sample_size(10);
    group.bench_function("1000 beam-columns x 300 sections", |b| {
        b.iter(|| {
            let sizer = Sizer::new(black_box(&cands));
            black_box(sizer.size_all(black_box(&beams), 0.9))
        })
    });
    group.finish();

    // The designation lookup on the check's hot path: normalise into a
    // stack buffer, one hash-map probe.
    let names = [
        "HE 200 B",
        "HEB200",
        "203x203x46 UC",
        "W14x90",
        "SHS 100x100x5",
        "HSS6x6x1/4",
    ];
    let mut group = c.benchmark_group("catalogue");
    group.throughput(Throughput::Elements(names.len() as u64));
    group.bench_function("resolve 6 designations", |b| {
        b.iter(|| {
            for n in names {
                let _ = black_box(catalogue::resolve(black_box(n)));
            }
        })
    });
    // Building a catalogue section: the kept properties against computing
    // them from the dimensions each time.
    group.bench_function("section HE 200 B, kept", |b| {
        b.iter(|| black_box(catalogue::section(black_box("HE 200 B"))))
    });
    let entry = catalogue::resolve("HE 200 B").ok();
    group.bench_function("section HE 200 B, computed", |b| {
        b.iter(|| black_box(entry.map(|e| e.spec.build())))
    });
    group.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
