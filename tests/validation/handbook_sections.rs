//! Standard sections against their published tabulated properties.
//!
//! Sources (values recalled from memory of the published tables, not
//! copied from a file; each value sits beside its source below):
//! - EN 10365:2017, Hot rolled steel channels, I and H sections —
//!   Dimensions and masses, with the section properties tabulated in the
//!   European producers' catalogues that follow it: HE 200 B, IPE 300.
//! - SCI P363, Steel Building Design: Design Data (Blue Book), 2013,
//!   universal columns to BS 4-1: UC 203x203x46.
//! - EN 10219-2:2006, Cold formed welded structural hollow sections —
//!   Tolerances, dimensions and sectional properties, Table B.3 (SHS):
//!   SHS 100x100x5, corner radii r_o = 2t, r_i = t (Table B.1 rule for
//!   t <= 6 mm, used for the tabulated properties).
//! - EN 10210-2:2006, Hot finished structural hollow sections, Table B.1
//!   (CHS): CHS 168.3x8.
//! - EN 10056-1:2017, Structural steel equal and unequal leg angles —
//!   Dimensions: L 100x100x10 (r1 = 12, r2 = 6).
//!
//! Tolerances: `TABLE` = 1 % — the tables print three or four significant
//! figures (e.g. 78.1 cm2, 569.6 cm3) and some state rounded dimensions
//! (UC 203x203x46 is tabulated from 203.2 x 203.6 mm with r = 10.2 mm).
//! `TORSION_APPROX` = 1.5 % for I_t of rolled I sections: the tables use
//! their own fillet approximation, ours is El Darwish & Johnston's; the two
//! differ by up to about 1 %. `WARPING` = 2 % for I_w of I sections:
//! the same thin-flange formula I_z (h - tf)²/4, the tables sometimes
//! using I_z of the flanges alone.

#![allow(
    clippy::unwrap_used,
    clippy::expect_used,
    clippy::indexing_slicing,
    clippy::panic
)]

use strutline_core::section::{
    shapes, Angle, Chs, HollowMake, IMake, IShape, Properties, Rhs, SectionSpec,
};
use strutline_validation::assert_close;

/// Rounding of tabulated values (three to four significant figures).
const TABLE: f64 = 0.01;
/// Different fillet approximations in the torsion constant.
const TORSION_APPROX: f64 = 0.015;
/// Thin-flange warping formula, flanges-only I_z in some tables.
const WARPING: f64 = 0.02;

const CM2: f64 = 1e2;
const CM3: f64 = 1e3;
const CM4: f64 = 1e4;
const CM6: f64 = 1e6;

fn i_section(h: f64, b: f64, tw: f64, tf: f64, r: f64) -> Properties {
    shapes::properties(&SectionSpec::I(IShape {
        depth_mm: h,
        width_mm: b,
        flange_mm: tf,
        web_mm: tw,
        root_radius_mm: r,
        make: IMake::Rolled,
    }))
    .unwrap()
}

#[test]
fn he_200_b() {
    // EN 10365 dimensions h = 200, b = 200, tw = 9, tf = 15, r = 18 mm.
    let p = i_section(200.0, 200.0, 9.0, 15.0, 18.0);
    let s = "HE 200 B (EN 10365 / producers' tables)";
    assert_close(p.area_mm2, 78.1 * CM2, TABLE, &format!("{s}: A = 78.1 cm2"));
    assert_close(p.mass_kg_per_m, 61.3, TABLE, &format!("{s}: G = 61.3 kg/m"));
    assert_close(
        p.i_y_mm4,
        5696.0 * CM4,
        TABLE,
        &format!("{s}: Iy = 5696 cm4"),
    );
    assert_close(
        p.w_el_major_mm3,
        569.6 * CM3,
        TABLE,
        &format!("{s}: Wel,y = 569.6 cm3"),
    );
    assert_close(
        p.w_pl_major_mm3,
        642.5 * CM3,
        TABLE,
        &format!("{s}: Wpl,y = 642.5 cm3"),
    );
    assert_close(p.r_major_mm, 85.4, TABLE, &format!("{s}: iy = 8.54 cm"));
    assert_close(
        p.i_z_mm4,
        2003.0 * CM4,
        TABLE,
        &format!("{s}: Iz = 2003 cm4"),
    );
    assert_close(
        p.w_el_minor_mm3,
        200.3 * CM3,
        TABLE,
        &format!("{s}: Wel,z = 200.3 cm3"),
    );
    assert_close(
        p.w_pl_minor_mm3,
        305.8 * CM3,
        TABLE,
        &format!("{s}: Wpl,z = 305.8 cm3"),
    );
    assert_close(p.r_minor_mm, 50.7, TABLE, &format!("{s}: iz = 5.07 cm"));
    assert_close(
        p.torsion_mm4,
        59.28 * CM4,
        TORSION_APPROX,
        &format!("{s}: It = 59.28 cm4"),
    );
    assert_close(
        p.warping_mm6,
        171.1e3 * CM6,
        WARPING,
        &format!("{s}: Iw = 171.1e3 cm6"),
    );
}

#[test]
fn ipe_300() {
    // EN 10365 dimensions h = 300, b = 150, tw = 7.1, tf = 10.7, r = 15 mm.
    let p = i_section(300.0, 150.0, 7.1, 10.7, 15.0);
    let s = "IPE 300 (EN 10365 / producers' tables)";
    assert_close(
        p.area_mm2,
        53.81 * CM2,
        TABLE,
        &format!("{s}: A = 53.81 cm2"),
    );
    assert_close(p.mass_kg_per_m, 42.2, TABLE, &format!("{s}: G = 42.2 kg/m"));
    assert_close(
        p.i_y_mm4,
        8356.0 * CM4,
        TABLE,
        &format!("{s}: Iy = 8356 cm4"),
    );
    assert_close(
        p.w_el_major_mm3,
        557.1 * CM3,
        TABLE,
        &format!("{s}: Wel,y = 557.1 cm3"),
    );
    assert_close(
        p.w_pl_major_mm3,
        628.4 * CM3,
        TABLE,
        &format!("{s}: Wpl,y = 628.4 cm3"),
    );
    assert_close(
        p.i_z_mm4,
        603.8 * CM4,
        TABLE,
        &format!("{s}: Iz = 603.8 cm4"),
    );
    assert_close(
        p.w_el_minor_mm3,
        80.5 * CM3,
        TABLE,
        &format!("{s}: Wel,z = 80.5 cm3"),
    );
    assert_close(
        p.w_pl_minor_mm3,
        125.2 * CM3,
        TABLE,
        &format!("{s}: Wpl,z = 125.2 cm3"),
    );
    assert_close(
        p.torsion_mm4,
        20.12 * CM4,
        TORSION_APPROX,
        &format!("{s}: It = 20.12 cm4"),
    );
    assert_close(
        p.warping_mm6,
        125.9e3 * CM6,
        WARPING,
        &format!("{s}: Iw = 125.9e3 cm6"),
    );
}

#[test]
fn uc_203x203x46() {
    // BS 4-1 dimensions h = 203.2, b = 203.6, tw = 7.2, tf = 11.0, r = 10.2 mm.
    let p = i_section(203.2, 203.6, 7.2, 11.0, 10.2);
    let s = "UC 203x203x46 (SCI P363)";
    assert_close(p.area_mm2, 58.7 * CM2, TABLE, &format!("{s}: A = 58.7 cm2"));
    assert_close(
        p.i_y_mm4,
        4568.0 * CM4,
        TABLE,
        &format!("{s}: Iy = 4568 cm4"),
    );
    assert_close(
        p.i_z_mm4,
        1548.0 * CM4,
        TABLE,
        &format!("{s}: Iz = 1548 cm4"),
    );
    assert_close(
        p.w_el_major_mm3,
        450.0 * CM3,
        TABLE,
        &format!("{s}: Wel,y = 450 cm3"),
    );
    assert_close(
        p.w_el_minor_mm3,
        152.0 * CM3,
        TABLE,
        &format!("{s}: Wel,z = 152 cm3"),
    );
    assert_close(
        p.w_pl_major_mm3,
        497.0 * CM3,
        TABLE,
        &format!("{s}: Wpl,y = 497 cm3"),
    );
    assert_close(
        p.w_pl_minor_mm3,
        231.0 * CM3,
        TABLE,
        &format!("{s}: Wpl,z = 231 cm3"),
    );
    assert_close(p.r_major_mm, 88.2, TABLE, &format!("{s}: iy = 8.82 cm"));
    assert_close(p.r_minor_mm, 51.3, TABLE, &format!("{s}: iz = 5.13 cm"));
    assert_close(
        p.torsion_mm4,
        22.2 * CM4,
        TORSION_APPROX,
        &format!("{s}: It = 22.2 cm4"),
    );
    assert_close(
        p.warping_mm6,
        0.143e6 * CM6,
        WARPING,
        &format!("{s}: Iw = 0.143 dm6"),
    );
}

#[test]
fn shs_100x100x5_cold_formed() {
    let p = shapes::properties(&SectionSpec::Rhs(Rhs {
        depth_mm: 100.0,
        width_mm: 100.0,
        wall_mm: 5.0,
        outer_radius_mm: 10.0,
        inner_radius_mm: None,
        make: HollowMake::ColdFormed,
    }))
    .unwrap();
    let s = "SHS 100x100x5 (EN 10219-2 Table B.3)";
    assert_close(p.area_mm2, 18.4 * CM2, TABLE, &format!("{s}: A = 18.4 cm2"));
    assert_close(p.mass_kg_per_m, 14.4, TABLE, &format!("{s}: M = 14.4 kg/m"));
    assert_close(
        p.i_major_mm4,
        271.0 * CM4,
        TABLE,
        &format!("{s}: I = 271 cm4"),
    );
    assert_close(
        p.i_minor_mm4,
        271.0 * CM4,
        TABLE,
        &format!("{s}: I = 271 cm4"),
    );
    assert_close(p.r_major_mm, 38.4, TABLE, &format!("{s}: i = 3.84 cm"));
    assert_close(
        p.w_el_major_mm3,
        54.2 * CM3,
        TABLE,
        &format!("{s}: Wel = 54.2 cm3"),
    );
    assert_close(
        p.w_pl_major_mm3,
        64.6 * CM3,
        TABLE,
        &format!("{s}: Wpl = 64.6 cm3"),
    );
    // The same Annex B formula as ours, so only table rounding remains.
    assert_close(
        p.torsion_mm4,
        441.0 * CM4,
        TABLE,
        &format!("{s}: It = 441 cm4"),
    );
}

#[test]
fn chs_168_3x8_hot_finished() {
    let p = shapes::properties(&SectionSpec::Chs(Chs {
        diameter_mm: 168.3,
        wall_mm: 8.0,
        make: HollowMake::HotFinished,
    }))
    .unwrap();
    let s = "CHS 168.3x8 (EN 10210-2 Table B.1)";
    assert_close(p.area_mm2, 40.3 * CM2, TABLE, &format!("{s}: A = 40.3 cm2"));
    assert_close(p.mass_kg_per_m, 31.6, TABLE, &format!("{s}: M = 31.6 kg/m"));
    assert_close(
        p.i_major_mm4,
        1297.0 * CM4,
        TABLE,
        &format!("{s}: I = 1297 cm4"),
    );
    assert_close(p.r_major_mm, 56.7, TABLE, &format!("{s}: i = 5.67 cm"));
    assert_close(
        p.w_el_major_mm3,
        154.0 * CM3,
        TABLE,
        &format!("{s}: Wel = 154 cm3"),
    );
    assert_close(
        p.w_pl_major_mm3,
        206.0 * CM3,
        TABLE,
        &format!("{s}: Wpl = 206 cm3"),
    );
    assert_close(
        p.torsion_mm4,
        2595.0 * CM4,
        TABLE,
        &format!("{s}: It = 2595 cm4"),
    );
}

#[test]
fn equal_angle_100x100x10() {
    let p = shapes::properties(&SectionSpec::Angle(Angle {
        depth_mm: 100.0,
        width_mm: 100.0,
        thickness_mm: 10.0,
        root_radius_mm: 12.0,
        toe_radius_mm: 6.0,
    }))
    .unwrap();
    let s = "L 100x100x10 (EN 10056-1)";
    assert_close(p.area_mm2, 19.2 * CM2, TABLE, &format!("{s}: A = 19.2 cm2"));
    assert_close(p.mass_kg_per_m, 15.0, TABLE, &format!("{s}: M = 15.0 kg/m"));
    assert_close(p.centroid_y_mm, 28.2, TABLE, &format!("{s}: e = 2.82 cm"));
    assert_close(
        p.i_y_mm4,
        177.0 * CM4,
        TABLE,
        &format!("{s}: Iy = Iz = 177 cm4"),
    );
    assert_close(
        p.i_major_mm4,
        280.0 * CM4,
        TABLE,
        &format!("{s}: Iu = 280 cm4"),
    );
    assert_close(
        p.i_minor_mm4,
        73.0 * CM4,
        TABLE,
        &format!("{s}: Iv = 73.0 cm4"),
    );
    assert_close(p.r_major_mm, 38.2, TABLE, &format!("{s}: iu = 3.82 cm"));
    assert_close(p.r_minor_mm, 19.5, TABLE, &format!("{s}: iv = 1.95 cm"));
    // Tables give Wel about the leg axes: Iy / (leg - e).
    let wel_y = p.i_y_mm4 / (100.0 - p.centroid_z_mm);
    assert_close(wel_y, 24.6 * CM3, TABLE, &format!("{s}: Wel,y = 24.6 cm3"));
}
