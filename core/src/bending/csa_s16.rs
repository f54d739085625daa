//! CSA S16-19 bending: 13.5 (laterally supported members) and 13.6
//! (laterally unsupported members), phi = 0.90.
//!
//! Classes in flexure, Table 2 (F_y in MPa; recalled from memory of the
//! standard): I and channel flanges b/t (b = b_f/2 for I, b_f for channels)
//! 145, 170, 200 / sqrt(F_y) for Classes 1, 2, 3; webs h/w (h = d - 2 t_f)
//! 1100, 1700, 1900 / sqrt(F_y) (no axial load); rectangular HSS flanges
//! (b - 4t)/t 420, 525, 670 / sqrt(F_y), webs as I webs; circular HSS D/t
//! 13 000, 18 000, 66 000 / F_y; tee flanges b_f/2t_f as I flanges, the
//! stem (flange compressed, plastic neutral axis in the stem) held to Table
//! 1's 340 / sqrt(F_y) and the section to Class 3 (Table 2 has no tee stem
//! in flexure); solid sections Class 1. Class 4 is refused.
//!
//! Tees bent in their plane of symmetry (sign: [`super::tee`]): the flange
//! compressed by 13.6(e), M_u = omega_2 pi^2 E I_y / (2 L^2) [beta_x +
//! sqrt(beta_x^2 + 4 (G J L^2 / (pi^2 E I_y) + C_w / I_y))], beta_x = 2 z_j
//! from its definition (recalled from memory); a negative moment (stem
//! compressed) is refused naming its key.
//! M_r = phi Z F_y (Classes 1, 2) or phi S F_y (Class 3), 13.5.
//!
//! 13.6(a), doubly symmetric Class 1 and 2 (13.6(b) Class 3 with M_y for
//! M_p): M_u = omega_2 pi / L sqrt(E I_y G J + (pi E / L)^2 I_y C_w); M_r =
//! 1.15 phi M_p (1 - 0.28 M_p / M_u) <= phi M_p when M_u > 0.67 M_p, else
//! phi M_u. omega_2 = 4 M_max / sqrt(M_max^2 + 4 M_a^2 + 7 M_b^2 + 4 M_c^2)
//! <= 2.5 from the diagram; 1.0 where the diagram over the unbraced length
//! is not the member's. With the load on the compression flange omega_2 =
//! 1.0 and the unbraced length is taken 1.2 L (the standard's treatment of
//! destabilising load in 13.6, recalled from memory; said in a warning). Channels are worked with the same formula and their own J and
//! C_w (a warning says so); rectangular HSS and solid rectangles too (C_w
//! about zero, rarely governs); circular sections do not buckle laterally.
//! A given section: F_y S with its class unknown, refused for
//! lateral-torsional buckling unless `lt_restrained`.

use super::{
    diagram_is_segment, moments, omega_2, push_diagram, signed_extremes, Axis, AxisBending, Bending,
};
use crate::error::{Error, Result};
use crate::material::Steel;
use crate::member::LoadLevel;
use crate::method::common::{require_steel, warn_once_text};
use crate::method::Input;
use crate::outcome::Warning;
use crate::section::SectionSpec;
use crate::trace::{step, Trace};

const KEY: &str = "csa-s16";
/// phi of CSA S16-19 13.1.
pub const PHI: f64 = 0.90;

/// Checks both axes.
pub fn check(input: &Input<'_>, trace: &mut Trace, warnings: &mut Vec<Warning>) -> Result<Bending> {
    let steel = require_steel(input, KEY)?;
    Ok(Bending {
        major: axis(input, steel, Axis::Major, trace, warnings)?,
        minor: axis(input, steel, Axis::Minor, trace, warnings)?,
    })
}

/// The class (1 to 4) of a ratio against the Class 1, 2 and 3 limits.
pub fn class_of(ratio: f64, limits: [f64; 3]) -> u8 {
    if ratio <= limits[0] {
        1
    } else if ratio <= limits[1] {
        2
    } else if ratio <= limits[2] {
        3
    } else {
        4
    }
}

/// The class in bending about `axis` by Table 2 (no axial load), with its working.
pub fn classify(input: &Input<'_>, fy: f64, axis: Axis, trace: &mut Trace) -> u8 {
    let s = axis.scope();
    let rf = fy.sqrt();
    let swapped = input.section.props.principal_angle_rad != 0.0;
    let major = axis == Axis::Major;
    let flange = [145.0 / rf, 170.0 / rf, 200.0 / rf];
    let web = [1100.0 / rf, 1700.0 / rf, 1900.0 / rf];
    let class = match &input.section.spec {
        SectionSpec::I(_) | SectionSpec::Channel(_) => {
            let (d, b, tf, tw) = match &input.section.spec {
                SectionSpec::I(i) => (i.depth_mm, i.width_mm / 2.0, i.flange_mm, i.web_mm),
                SectionSpec::Channel(c) => (c.depth_mm, c.width_mm, c.flange_mm, c.web_mm),
                _ => (0.0, 0.0, 1.0, 1.0),
            };
            let f = b / tf;
            step!(
                trace,
                s,
                "b/t",
                "flange width-to-thickness ratio (Class 1/2/3: 145/170/200 / sqrt(F_y))",
                f,
                "-",
                "CSA S16-19 Table 2 (recalled from memory)"
            );
            let mut c = class_of(f, flange);
            if major {
                let w = (d - 2.0 * tf) / tw;
                step!(
                    trace,
                    s,
                    "h/w",
                    "web ratio (Class 1/2/3: 1100/1700/1900 / sqrt(F_y))",
                    w,
                    "-",
                    "CSA S16-19 Table 2 (recalled from memory)"
                );
                c = c.max(class_of(w, web));
            }
            c
        }
        SectionSpec::Rhs(r) => {
            let t = r.wall_mm;
            let (h, b) = if major != swapped {
                (r.depth_mm, r.width_mm)
            } else {
                (r.width_mm, r.depth_mm)
            };
            let f = (b - 4.0 * t) / t;
            let w = (h - 4.0 * t) / t;
            step!(
                trace,
                s,
                "b/t",
                "HSS flange ratio (b - 4t)/t (Class 1/2/3: 420/525/670 / sqrt(F_y))",
                f,
                "-",
                "CSA S16-19 Table 2 (recalled from memory)"
            );
            step!(
                trace,
                s,
                "h/w",
                "HSS web ratio (h - 4t)/t (1100/1700/1900 / sqrt(F_y))",
                w,
                "-",
                "CSA S16-19 Table 2 (recalled from memory)"
            );
            class_of(f, [420.0 / rf, 525.0 / rf, 670.0 / rf]).max(class_of(w, web))
        }
        SectionSpec::Chs(c) => {
            let dt = c.diameter_mm / c.wall_mm;
            step!(
                trace,
                s,
                "D/t",
                "circular HSS ratio (Class 1/2/3: 13000/18000/66000 / F_y)",
                dt,
                "-",
                "CSA S16-19 Table 2 (recalled from memory)"
            );
            class_of(dt, [13_000.0 / fy, 18_000.0 / fy, 66_000.0 / fy])
        }
        SectionSpec::Tee(t) => {
            let f = t.width_mm / (2.0 * t.flange_mm);
            step!(
                trace,
                s,
                "b/t",
                "tee flange ratio b_f/2t_f (Class 1/2/3: 145/170/200 / sqrt(F_y))",
                f,
                "-",
                "CSA S16-19 Table 2 (recalled from memory)"
            );
            let mut c = class_of(f, flange);
            let g = super::tee::Tee::new(t, &input.section.props);
            if super::tee::in_plane(input, major) && g.pna_in_stem() {
                // Flange compressed (a compressed stem is refused): part of
                // the stem is compressed at the plastic moment; Table 2 has
                // no tee stem in flexure, so the stem is held to Table 1's
                // 340 / sqrt(F_y) on d/t_w and the section to Class 3.
                let w = t.depth_mm / t.web_mm;
                step!(
                    trace,
                    s,
                    "d/t_w",
                    "tee stem partly compressed (plastic neutral axis in the stem): Table 1 limit \
                     340 / sqrt(F_y), Class 3 at best",
                    w,
                    "-",
                    "CSA S16-19 Table 1 (recalled from memory); conservative reading"
                );
                c = c.max(if w <= 340.0 / rf { 3 } else { 4 });
            }
            c
        }
        SectionSpec::Given(_) => 3,
        _ => 1,
    };
    step!(
        trace,
        s,
        "class",
        "class in bending (a given section: 3, its class not known)",
        f64::from(class),
        "-",
        "CSA S16-19 11.2"
    );
    class
}

/// M_r of 13.6(a) (or (b) with M_y for M_p), N mm: 1.15 phi M_p (1 - 0.28
/// M_p / M_u) <= phi M_p when M_u > 0.67 M_p, else phi M_u.
pub fn unsupported(mp: f64, mu: f64) -> f64 {
    if mu > 0.67 * mp {
        (1.15 * PHI * mp * (1.0 - 0.28 * mp / mu)).min(PHI * mp)
    } else {
        PHI * mu
    }
}

fn axis(
    input: &Input<'_>,
    steel: &Steel,
    axis: Axis,
    trace: &mut Trace,
    warnings: &mut Vec<Warning>,
) -> Result<AxisBending> {
    let s = axis.scope();
    let m = moments(input, axis);
    let demand = push_diagram(trace, axis, &m);
    let (e, fy, g) = (steel.e_mpa, steel.fy_mpa, steel.g_mpa);
    let major = axis == Axis::Major;
    let tee = match &input.section.spec {
        SectionSpec::Tee(t) if super::tee::in_plane(input, major) => {
            Some(super::tee::Tee::new(t, &input.section.props))
        }
        _ => None,
    };
    if tee.is_some() {
        let (pos, neg) = signed_extremes(&m);
        if neg > 0.0 {
            return Err(Error::NotApplicable {
                method: KEY,
                reason: format!(
                    "{}: a negative moment compresses the tee's stem; CSA S16-19 gives no rule \
                     here for a tee stem compressed in flexure (Table 2 has no stem limit in \
                     flexure; 13.6(e) is worked with the flange compressed only): check this \
                     member by hand",
                    super::tee::key_of(input, axis, true)
                ),
            });
        }
        if pos > 0.0 {
            super::tee::warn_sign(warnings);
        }
    }
    let class = classify(input, fy, axis, trace);
    if class == 4 {
        return Err(Error::NotApplicable {
            method: KEY,
            reason: format!(
                "m_{}_a_knm: the section is Class 4 in bending; CSA S16-19 13.5(c) is not implemented: choose a stockier section",
                if major { "major" } else { "minor" }
            ),
        });
    }
    let p = &input.section.props;
    let (sx, zx) = if major {
        (p.w_el_major_mm3, p.w_pl_major_mm3)
    } else {
        (p.w_el_minor_mm3, p.w_pl_minor_mm3)
    };
    let (w, plastic) = match super::given_modulus(input, axis, false)? {
        Some(w) => (w, false),
        None if class <= 2 => (zx, true),
        None => (sx, false),
    };
    if plastic {
        step!(
            trace,
            s,
            "Z",
            "plastic modulus (Class 1 or 2)",
            w,
            "mm3",
            "CSA S16-19 13.5(a)"
        );
    } else {
        step!(
            trace,
            s,
            "S",
            "elastic modulus (Class 3)",
            w,
            "mm3",
            "CSA S16-19 13.5(b)"
        );
    }
    let mp = w * fy;
    let mr_section = PHI * mp / 1e6;
    step!(
        trace,
        s,
        "M_r",
        "phi Z F_y or phi S F_y, phi = 0.90",
        mr_section,
        "kNm",
        "CSA S16-19 13.5"
    );
    let lt = major
        && !input.member.lt_restrained
        && !matches!(
            input.section.spec,
            SectionSpec::Chs(_) | SectionSpec::Round(_)
        );
    if !lt {
        return Ok(AxisBending {
            resistance_knm: mr_section,
            critical_knm: None,
            reduction: 1.0,
            moment_factor: None,
            demand_knm: demand,
            kept: super::Kept::Class(class),
            by_sign: None,
        });
    }
    if let SectionSpec::Given(_) = input.section.spec {
        return Err(Error::Geometry {
            field: "lt_restrained",
            reason: "lateral-torsional buckling under CSA S16-19 13.6 needs the section's shape; describe the section by its dimensions, or set lt_restrained if the compression flange is held continuously".into(),
        });
    }
    if input.section.spec_is_channel() {
        warn_once_text(warnings, "channel-ltb-assumed", "bending: the channel's critical moment is worked with the doubly symmetric formula and its own J and C_w, ignoring the offset of its shear centre (common practice for channels loaded through the shear centre); a load through the web twists it, which is not checked");
    }
    let mut l = input.member.lt_length_mm()?;
    let destabilising =
        input.member.load_level == LoadLevel::CompressionFlange && m.span_knm != 0.0;
    let w2 = if destabilising {
        l *= 1.2;
        warn_once_text(warnings, "csa-top-flange", "bending: the load acts on the compression flange; omega_2 = 1.0 and the unbraced length is taken 1.2 L (CSA S16-19 13.6, recalled from memory)");
        step!(
            trace,
            s,
            "omega_2",
            "taken as 1.0: load on the compression flange",
            1.0,
            "-",
            "CSA S16-19 13.6 (recalled from memory)"
        );
        1.0
    } else if !diagram_is_segment(input) {
        step!(
            trace,
            s,
            "omega_2",
            "taken as 1.0: the unbraced length is not the member length",
            1.0,
            "-",
            "CSA S16-19 13.6 (omega_2 = 1.0 conservative)"
        );
        1.0
    } else {
        let w2 = omega_2(&m);
        step!(
            trace,
            s,
            "omega_2",
            "4 M_max / sqrt(M_max^2 + 4 M_a^2 + 7 M_b^2 + 4 M_c^2) <= 2.5",
            w2,
            "-",
            "CSA S16-19 13.6(a)"
        );
        w2
    };
    step!(trace, s, "L", "unbraced length", l, "mm", "member file");
    let pi = std::f64::consts::PI;
    let (iy, j, cw) = (p.i_minor_mm4, p.torsion_mm4, p.warping_mm6);
    let mu = if let Some(t) = tee {
        // 13.6(e), monosymmetric: beta_x from its definition, 2 z_j with
        // the flange compressed; omega_3 = omega_2 in single curvature (a
        // compressed stem was refused above).
        let beta = 2.0 * t.z_j;
        step!(
            trace,
            s,
            "beta_x",
            "monosymmetry 2 z_j, flange compressed (the integral, plates)",
            beta,
            "mm",
            "CSA S16-19 13.6(e) (recalled from memory)"
        );
        let mu = w2 * pi * pi * e * iy / (2.0 * l * l)
            * (beta + (beta * beta + 4.0 * (g * j * l * l / (pi * pi * e * iy) + cw / iy)).sqrt());
        step!(
            trace,
            s,
            "M_u",
            "critical elastic moment omega_2 pi^2 E I_y / (2 L^2) [beta_x + sqrt(beta_x^2 + \
             4 (G J L^2 / (pi^2 E I_y) + C_w / I_y))]",
            mu / 1e6,
            "kNm",
            "CSA S16-19 13.6(e) (recalled from memory)"
        );
        warn_once_text(
            warnings,
            "tee-ltb-assumed",
            "bending: the tee's critical moment is worked by CSA S16-19 13.6(e) for monosymmetric \
             sections with beta_x from its definition (2 z_j of the flange and stem plates) and \
             the flange compressed; a compressed stem is refused",
        );
        mu
    } else {
        let mu = w2 * pi / l * (e * iy * g * j + (pi * e / l).powi(2) * iy * cw).sqrt();
        step!(
            trace,
            s,
            "M_u",
            "critical elastic moment omega_2 pi/L sqrt(E I_y G J + (pi E/L)^2 I_y C_w)",
            mu / 1e6,
            "kNm",
            "CSA S16-19 13.6(a)"
        );
        mu
    };
    let mr = unsupported(mp, mu);
    step!(
        trace,
        s,
        "M_r",
        "factored moment resistance, laterally unsupported",
        mr / 1e6,
        "kNm",
        "CSA S16-19 13.6(a)/(b)"
    );
    Ok(AxisBending {
        resistance_knm: mr / 1e6,
        critical_knm: Some(mu / 1e6),
        reduction: mr / (PHI * mp),
        moment_factor: Some(w2),
        demand_knm: demand,
        kept: super::Kept::Class(class),
        by_sign: None,
    })
}
