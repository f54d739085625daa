//! The member file's keys as CSV columns: their group, their kind of
//! cell, the keys each row needs and the keys of each section kind.

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(super) enum Group {
    Member,
    Section,
    Material,
    /// `angle_connection`'s keys, written with the prefix `angle_`.
    Angle,
    /// `frame_major`'s and `frame_minor`'s keys, written with the prefix
    /// `frame_major_` or `frame_minor_` ([`FRAMES`]).
    Frame,
}

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(super) enum Kind {
    /// Free text, kept as written.
    Text,
    /// A name from a fixed list, read without regard to case.
    Name,
    /// A number.
    Number,
    /// A whole number.
    Whole,
    /// Yes or no (`true`/`false`, `yes`/`no`, `1`/`0`).
    Bool,
}

#[derive(Debug)]
pub(super) struct KeyInfo {
    pub(super) key: &'static str,
    pub(super) group: Group,
    pub(super) kind: Kind,
}

pub(super) const fn k(key: &'static str, group: Group, kind: Kind) -> KeyInfo {
    KeyInfo { key, group, kind }
}

/// Every key, in the order [`super::to_csv`] writes them.
pub(super) const KEYS: &[KeyInfo] = &[
    k("id", Group::Member, Kind::Text),
    k("note", Group::Member, Kind::Text),
    k("kind", Group::Section, Kind::Name),
    k("designation", Group::Section, Kind::Text),
    k("depth_mm", Group::Section, Kind::Number),
    k("width_mm", Group::Section, Kind::Number),
    k("flange_mm", Group::Section, Kind::Number),
    k("web_mm", Group::Section, Kind::Number),
    k("thickness_mm", Group::Section, Kind::Number),
    k("wall_mm", Group::Section, Kind::Number),
    k("diameter_mm", Group::Section, Kind::Number),
    k("root_radius_mm", Group::Section, Kind::Number),
    k("toe_radius_mm", Group::Section, Kind::Number),
    k("outer_radius_mm", Group::Section, Kind::Number),
    k("inner_radius_mm", Group::Section, Kind::Number),
    k("make", Group::Section, Kind::Name),
    k("area_mm2", Group::Section, Kind::Number),
    k("i_major_mm4", Group::Section, Kind::Number),
    k("i_minor_mm4", Group::Section, Kind::Number),
    k("torsion_mm4", Group::Section, Kind::Number),
    k("warping_mm6", Group::Section, Kind::Number),
    k("w_el_major_mm3", Group::Section, Kind::Number),
    k("w_el_minor_mm3", Group::Section, Kind::Number),
    k("w_pl_major_mm3", Group::Section, Kind::Number),
    k("w_pl_minor_mm3", Group::Section, Kind::Number),
    k("grade", Group::Material, Kind::Text),
    k("fy_mpa", Group::Material, Kind::Number),
    k("e_mpa", Group::Material, Kind::Number),
    k("g_mpa", Group::Material, Kind::Number),
    k("fc0k_mpa", Group::Material, Kind::Number),
    k("e005_mpa", Group::Material, Kind::Number),
    k("e0mean_mpa", Group::Material, Kind::Number),
    k("timber", Group::Material, Kind::Name),
    k("length_mm", Group::Member, Kind::Number),
    k("k_major", Group::Member, Kind::Number),
    k("k_minor", Group::Member, Kind::Number),
    k("k_torsion", Group::Member, Kind::Number),
    k("lcr_major_mm", Group::Member, Kind::Number),
    k("lcr_minor_mm", Group::Member, Kind::Number),
    k("lcr_torsion_mm", Group::Member, Kind::Number),
    k("frame_major_sway", Group::Frame, Kind::Bool),
    k("frame_major_g_a", Group::Frame, Kind::Number),
    k("frame_major_g_b", Group::Frame, Kind::Number),
    k("frame_minor_sway", Group::Frame, Kind::Bool),
    k("frame_minor_g_a", Group::Frame, Kind::Number),
    k("frame_minor_g_b", Group::Frame, Kind::Number),
    k("axial_kn", Group::Member, Kind::Number),
    k("method", Group::Member, Kind::Name),
    k("gamma_m1", Group::Member, Kind::Number),
    k("curve_major", Group::Member, Kind::Name),
    k("curve_minor", Group::Member, Kind::Name),
    k("bow_mm", Group::Member, Kind::Number),
    k("eccentricity_mm", Group::Member, Kind::Number),
    k("service_class", Group::Member, Kind::Whole),
    k("load_duration", Group::Member, Kind::Name),
    k("csa_n", Group::Member, Kind::Number),
    k("angle_leg", Group::Angle, Kind::Name),
    k("angle_truss", Group::Angle, Kind::Name),
    k("m_major_a_knm", Group::Member, Kind::Number),
    k("m_major_b_knm", Group::Member, Kind::Number),
    k("m_major_span_knm", Group::Member, Kind::Number),
    k("span_load_major", Group::Member, Kind::Name),
    k("m_minor_a_knm", Group::Member, Kind::Number),
    k("m_minor_b_knm", Group::Member, Kind::Number),
    k("m_minor_span_knm", Group::Member, Kind::Number),
    k("span_load_minor", Group::Member, Kind::Name),
    k("k_lt", Group::Member, Kind::Number),
    k("lcr_lt_mm", Group::Member, Kind::Number),
    k("lt_restrained", Group::Member, Kind::Bool),
    k("load_level", Group::Member, Kind::Name),
    k("amplify_moments", Group::Member, Kind::Bool),
    k("interaction_annex", Group::Member, Kind::Name),
];

/// The member keys whose objects are flattened into [`Group::Frame`]
/// columns `<key>_<inner key>`, and the inner keys, all of which a frame
/// needs.
pub(super) const FRAMES: [&str; 2] = ["frame_major", "frame_minor"];
pub(super) const FRAME_KEYS: [&str; 3] = ["sway", "g_a", "g_b"];

/// The frame key and inner key of a [`Group::Frame`] column
/// (`frame_major_g_a` -> `("frame_major", "g_a")`).
pub(super) fn frame_parts(column: &str) -> Option<(&'static str, &str)> {
    FRAMES.iter().find_map(|f| {
        column
            .strip_prefix(f)
            .and_then(|r| r.strip_prefix('_'))
            .map(|inner| (*f, inner))
    })
}

/// Keys every row needs (the material and section needs are per row).
pub(super) const REQUIRED: &[&str] = &["id", "kind", "length_mm", "axial_kn", "method"];

pub(super) fn key_info(key: &str) -> Option<&'static KeyInfo> {
    KEYS.iter().find(|i| i.key == key)
}

pub(super) const TIMBER_KEYS: [&str; 4] = ["fc0k_mpa", "e005_mpa", "e0mean_mpa", "timber"];
pub(super) const CUSTOM_KEYS: [&str; 3] = ["fy_mpa", "e_mpa", "g_mpa"];
