//! The sizing benchmark's list (`benches/sizing.rs`), shared with the
//! instruction-count harness `examples/check_loop.rs` (its `sizing` list).

#![allow(clippy::panic, clippy::indexing_slicing)]

use strutline_core::catalogue::{self, Entry};
use strutline_core::member::Member;
use strutline_core::section::Family;

/// Members in the list.
pub const MEMBERS: usize = 1_000;
/// Candidate sections.
pub const CANDIDATES: usize = 300;

pub fn candidates() -> Vec<&'static Entry> {
    let mut c = catalogue::family_entries(Family::I);
    c.extend(catalogue::family_entries(Family::Rhs));
    c.truncate(CANDIDATES);
    c
}

pub fn members() -> Vec<Member> {
    let methods = ["en1993-1-1", "aisc360-lrfd", "csa-s16", "euler"];
    (0..MEMBERS)
        .map(|i| {
            let text = format!(
                r#"{{"id": "C{i}", "section": {{"kind": "catalogue", "designation": "HE 200 B"}},
                    "material": {{"grade": "{}"}}, "length_mm": {}, "axial_kn": {},
                    "method": "{}"}}"#,
                if i % 2 == 0 { "S355" } else { "S275" },
                2000.0 + 500.0 * (i % 13) as f64,
                100.0 + 37.0 * (i % 97) as f64,
                methods[i % methods.len()]
            );
            serde_json::from_str(&text).unwrap_or_else(|e| panic!("bench member {i}: {e}"))
        })
        .collect()
}

/// The members with moments: major-axis end moments M and -M/2 (M from 20
/// to 140 kNm) and a uniform minor-axis moment of M/10; the steel methods
/// whose interaction the issue asks for.
pub fn beam_columns() -> Vec<Member> {
    let methods = [
        strutline_core::method::Method::En1993,
        strutline_core::method::Method::AiscLrfd,
        strutline_core::method::Method::CsaS16,
    ];
    members()
        .into_iter()
        .enumerate()
        .map(|(i, mut m)| {
            let mx = 20.0 + 10.0 * (i % 13) as f64;
            m.method = methods[i % methods.len()];
            m.m_major_a_knm = mx;
            m.m_major_b_knm = -0.5 * mx;
            m.m_minor_a_knm = mx / 10.0;
            m.m_minor_b_knm = mx / 10.0;
            m
        })
        .collect()
}
