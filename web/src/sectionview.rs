//! The section view: the cross-section drawn to scale as SVG text, with its
//! centroid, shear centre, principal axes and, for a slender (Class 4)
//! section, the parts its effective widths leave out hatched.
//!
//! The drawing is built as a string (no view tree) and mounted with
//! `inner_html`. Its `viewBox` is in mm, so it stays to scale at any size;
//! the section's `z` axis points up, SVG's down, so `z` is negated. The
//! colours come from the `sv-*` classes of `style.css` (with a
//! high-contrast variant); the zones are told apart by a pattern of
//! diagonal lines, not by colour alone.

use strutline_core::check::Prepared;
use strutline_core::method::Method;
use strutline_core::section::outline::outline;
use strutline_core::stability::ineffective::ineffective;
use strutline_core::units::{self, Quantity, UnitSystem};
use strutline_core::CheckResult;

use crate::checks::Checked;
use crate::html;
use crate::html::Html;
use crate::numtext::working;
use crate::units_view::{section_text, step_text};

/// Polygons in mm, origin at the centroid, `y` right and `z` up.
type Polys = Vec<Vec<(f64, f64)>>;

/// The view of a checked member (empty when the member did not resolve).
pub fn of_checked(c: &Checked, sys: UnitSystem) -> Html {
    match &c.prepared {
        Some(p) => match governing_segment(p, c.result()) {
            // A buckling model whose governing segment has its own
            // section: the result's properties and check are that
            // segment's, so the drawing is too, and says so.
            Some((seg, count, q)) => {
                let mut h = svg(&q, c.result(), sys);
                html!(
                    h,
                    "<p class=\"sv-note\" data-testid=\"section-view-segment\">Drawn: the \
                     section of segment {} of {} of the buckling model, which governs.</p>",
                    seg,
                    count
                );
                h
            }
            None => svg(p, c.result(), sys),
        },
        None => Html::new(),
    }
}

/// The governing segment of a buckling model (1 at end A), the model's
/// segment count and the member prepared with that segment's own section,
/// where it has one; `None` otherwise (the member's section governs).
fn governing_segment(p: &Prepared, r: Option<&CheckResult>) -> Option<(usize, usize, Prepared)> {
    let seg = r?.segment?;
    let model = p.member.buckling_model.as_ref()?;
    let spec = model
        .segments
        .get(seg.index.checked_sub(1)?)?
        .section
        .clone()?;
    let mut m = p.member.clone();
    m.section = spec;
    let q = Prepared::new(&m).ok()?;
    Some((seg.index, seg.count, q))
}

/// Appends polygons as SVG path data, one decimal of a mm.
fn path(out: &mut Html, polys: &Polys) {
    for p in polys {
        for (i, (y, z)) in p.iter().enumerate() {
            html!(out, "{}{:.1} {:.1}", if i == 0 { 'M' } else { 'L' }, y, -z);
        }
        out.lit("Z");
    }
}

/// How far a ray from the origin along (c, s) runs inside the box.
fn reach(c: f64, s: f64, lo: (f64, f64), hi: (f64, f64)) -> f64 {
    let f = |d: f64, lo: f64, hi: f64| {
        if d > 1e-12 {
            hi / d
        } else if d < -1e-12 {
            lo / d
        } else {
            f64::INFINITY
        }
    };
    f(c, lo.0, hi.0).min(f(s, lo.1, hi.1))
}

/// A round length near `x`: 1, 2 or 5 times a power of ten.
fn nice(x: f64) -> f64 {
    let p = 10f64.powf(x.log10().floor());
    let f = x / p;
    p * if f >= 5.0 {
        5.0
    } else if f >= 2.0 {
        2.0
    } else {
        1.0
    }
}

/// The drawing of a prepared member; `result` (its check) supplies the
/// effective widths of a slender section. Typed sections give a short note.
/// Its name, area and scale bar are in `sys`'s units (the bar a round
/// number of inches in US units).
pub fn svg(p: &Prepared, result: Option<&CheckResult>, sys: UnitSystem) -> Html {
    let spec = &p.section.spec;
    let polys = outline(spec);
    if polys.is_empty() {
        return Html::from_lit(
            "<p class=\"sv-none\" data-testid=\"section-view\">The section is given by its \
             properties and cannot be drawn.</p>",
        );
    }
    let zones = result
        .and_then(|r| r.effective(&p.input()))
        .map(|(c, e)| ineffective(spec, &c, &e))
        .unwrap_or_default();
    let props = &p.section.props;
    let (mut y0, mut y1, mut z0, mut z1) = (f64::MAX, f64::MIN, f64::MAX, f64::MIN);
    for &(y, z) in polys.iter().flatten() {
        (y0, y1, z0, z1) = (y0.min(y), y1.max(y), z0.min(z), z1.max(z));
    }
    let d = (y1 - y0).max(z1 - z0).max(1e-3);
    let m = 0.08 * d;
    let fs = 0.045 * d;
    let row = 1.6 * fs;
    let (lo, hi) = ((y0 - m, z0 - m), (y1 + m, z1 + m));
    let rows = 4 + usize::from(!zones.is_empty());
    let width = (hi.0 - lo.0).max(26.0 * fs);
    let left = 0.5 * (y0 + y1) - 0.5 * width;
    let (top, bottom) = (-hi.1, -lo.1);
    let height = bottom - top + rows as f64 * row + 0.5 * m;
    let name = p
        .section
        .designation
        .map_or_else(|| section_text(sys, spec), str::to_string);
    let code = match result.map(|r| r.method) {
        Some(Method::AiscLrfd | Method::AiscAsd) => "AISC 360-16 E7",
        _ => "EN 1993-1-5 4.4",
    };
    let mut s = Html::new();
    html!(
        s,
        "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"sv\" data-testid=\"section-view\" \
         role=\"img\" viewBox=\"{:.1} {:.1} {:.1} {:.1}\" font-size=\"{:.1}\" \
         stroke-width=\"{:.3}\" \
         aria-label=\"Cross-section {}, A = {}, drawn to scale with centroid, shear centre \
         and principal axes; {}\">",
        left,
        top,
        width,
        height,
        fs,
        d / 250.0,
        name,
        step_text(sys, "mm2", props.area_mm2),
        if zones.is_empty() {
            "no ineffective parts shown"
        } else {
            "ineffective parts of the slender section hatched"
        }
    );
    // Hatch spacing in whole mm: the id carries it, so two views of the
    // same spacing can share one pattern.
    let k = (d / 60.0).round().max(1.0);
    let hatch = format!("sv-hatch-{k}");
    html!(
        s,
        "<defs><pattern id=\"{}\" patternUnits=\"userSpaceOnUse\" width=\"{}\" \
         height=\"{}\" patternTransform=\"rotate(45)\"><line class=\"sv-hatch\" x1=\"0\" \
         y1=\"0\" x2=\"0\" y2=\"{}\" stroke-width=\"{:.2}\"/></pattern></defs>\
         <path class=\"sv-outline\" fill-rule=\"evenodd\" d=\"",
        hatch,
        k,
        k,
        k,
        k / 3.0
    );
    path(&mut s, &polys);
    s.lit("\"/>");
    if !zones.is_empty() {
        html!(s, "<path class=\"sv-zone\" fill=\"url(#{})\" d=\"", hatch);
        path(&mut s, &zones);
        s.lit("\"/>");
    }
    // Principal axes through the centroid, clipped to the drawing's box.
    let (sin, cos) = strutline_core::trig::sin_cos(props.principal_angle_rad);
    let r = 0.025 * d;
    for (c, sn, dashed) in [(cos, sin, false), (-sin, cos, true)] {
        let (a, b) = (reach(c, sn, lo, hi), reach(-c, -sn, lo, hi));
        s.lit("<line class=\"sv-axis\"");
        if dashed {
            html!(s, " stroke-dasharray=\"{:.1} {:.1}\"", 2.0 * r, r);
        }
        html!(
            s,
            " x1=\"{:.1}\" y1=\"{:.1}\" x2=\"{:.1}\" y2=\"{:.1}\"/>",
            -b * c,
            b * sn,
            a * c,
            -a * sn
        );
    }
    let centroid = |s: &mut Html, x: f64, y: f64| {
        html!(
            s,
            "<g class=\"sv-centroid\"><circle cx=\"{:.1}\" cy=\"{:.1}\" r=\"{:.1}\"/>\
             <path d=\"M{:.1} {:.1}H{:.1}M{:.1} {:.1}V{:.1}\"/></g>",
            x,
            y,
            r,
            x - 1.5 * r,
            y,
            x + 1.5 * r,
            x,
            y - 1.5 * r,
            y + 1.5 * r
        );
    };
    let diamond = |s: &mut Html, x: f64, y: f64| {
        html!(
            s,
            "<path class=\"sv-shear\" d=\"M{:.1} {:.1}m0 {:.1}l{:.1} {:.1}l{:.1} {:.1}l{:.1} {:.1}z\"/>",
            x,
            y,
            -r,
            r,
            r,
            -r,
            r,
            -r,
            -r
        );
    };
    centroid(&mut s, 0.0, 0.0);
    let (ea, eb) = (props.shear_centre_major_mm, props.shear_centre_minor_mm);
    let sc = (ea * cos - eb * sin, ea * sin + eb * cos);
    let apart = sc.0.hypot(sc.1) > 0.005 * d;
    if apart {
        diamond(&mut s, sc.0, -sc.1);
    }
    // Scale bar, then the legend rows, each with its mark.
    let x = left + 0.5 * m;
    let tx = x + 2.0 * fs;
    let mut y = bottom + 0.5 * row;
    // A round length in the units shown: mm, or inches (25.4 mm each).
    let per_mm = units::to_display(sys, Quantity::Length, 1.0);
    let shown = nice(0.3 * width * per_mm);
    let bar = shown / per_mm;
    html!(
        s,
        "<path class=\"sv-scale\" d=\"M{:.1} {:.1}v{:.1}h{:.1}v{:.1}\"/>\
         <text x=\"{:.1}\" y=\"{:.1}\" data-testid=\"section-scale\">{} {}</text>",
        x,
        y - 0.4 * fs,
        0.4 * fs,
        bar,
        -0.4 * fs,
        x + bar + 0.5 * fs,
        y + 0.35 * fs,
        working(shown),
        units::display_unit(sys, Quantity::Length)
    );
    let mut line = |s: &mut Html, text: &str| {
        y += row;
        html!(
            s,
            "<text x=\"{:.1}\" y=\"{:.1}\">{}</text>",
            tx,
            y + 0.35 * fs,
            text
        );
        y
    };
    let cy = line(&mut s, "centroid");
    centroid(&mut s, x + 0.6 * fs, cy);
    if apart {
        let cy = line(&mut s, "shear centre");
        diamond(&mut s, x + 0.6 * fs, cy);
    } else {
        line(&mut s, "shear centre at the centroid");
    }
    let cy = line(&mut s, "principal axes (dashed: minor)");
    html!(
        s,
        "<line class=\"sv-axis\" x1=\"{:.1}\" y1=\"{:.1}\" x2=\"{:.1}\" y2=\"{:.1}\"/>",
        x,
        cy,
        x + 1.4 * fs,
        cy
    );
    if !zones.is_empty() {
        let cy = line(&mut s, &format!("ineffective parts ({code})"));
        html!(
            s,
            "<rect class=\"sv-zone\" fill=\"url(#{})\" x=\"{:.1}\" y=\"{:.1}\" \
             width=\"{:.1}\" height=\"{:.1}\"/>",
            hatch,
            x,
            cy - 0.5 * fs,
            1.4 * fs,
            fs
        );
    }
    s.lit("</svg>");
    s
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::demo::{member, steel};
    use strutline_core::section::{Angle, Given, IMake, IShape, SectionSpec};

    #[test]
    fn a_governing_segment_with_its_own_section_is_the_one_drawn() {
        // The worked example's K1: its lower segment (the member's section)
        // governs, so the member's section is drawn without a note; with a
        // much lighter upper segment, that segment governs and its section
        // is drawn, said under the drawing.
        let f =
            strutline_core::file::parse(include_str!("../../examples/tarnbeck-crane-hall.json"))
                .unwrap();
        let k1 = f.members.iter().find(|m| m.id == "K1").unwrap().clone();
        let c = Checked::new(&k1);
        assert_eq!(c.result().unwrap().segment.unwrap().index, 1);
        let own = of_checked(&c, UnitSystem::Si).into_string();
        assert!(!own.contains("section-view-segment"), "{own}");

        let mut light = k1.clone();
        let model = light.buckling_model.as_mut().unwrap();
        model.segments[1].section = Some(
            serde_json::from_str(
                r#"{"kind": "i", "depth_mm": 100, "width_mm": 100, "flange_mm": 8,
                    "web_mm": 6, "root_radius_mm": 12, "make": "rolled"}"#,
            )
            .unwrap(),
        );
        let c = Checked::new(&light);
        let seg = c.result().unwrap().segment.unwrap();
        assert_eq!((seg.index, seg.count), (2, 2));
        let drawn = of_checked(&c, UnitSystem::Si).into_string();
        assert!(drawn.contains("segment 2 of 2"), "{drawn}");
        // Not the member's own section's drawing.
        let first_path = |s: &str| {
            s[s.find(" d=\"").unwrap()..]
                .split('"')
                .nth(1)
                .unwrap()
                .to_owned()
        };
        assert_ne!(first_path(&drawn), first_path(&own));
    }

    fn view(spec: SectionSpec, fy: f64) -> (Prepared, String) {
        let m = member("S1", spec, steel(fy), 3000.0, 100.0, Method::En1993);
        let c = Checked::new(&m);
        let out = of_checked(&c, UnitSystem::Si).into_string();
        (c.prepared.unwrap(), out)
    }

    /// The leading numbers of attribute `name` of the first element after `after`.
    fn attr(svg: &str, after: &str, name: &str) -> Vec<f64> {
        let at = svg.find(after).unwrap() + after.len();
        let rest = &svg[at..];
        let from = rest.find(&format!("{name}=\"")).unwrap() + name.len() + 2;
        let value = rest[from..].trim_start_matches('M');
        let end = value
            .find(|c: char| !(c.is_ascii_digit() || c == '.' || c == '-' || c == ' '))
            .unwrap();
        value[..end]
            .split(' ')
            .filter(|t| !t.is_empty())
            .map(|t| t.parse().unwrap())
            .collect()
    }

    fn welded(h: f64, b: f64, tf: f64, tw: f64) -> SectionSpec {
        SectionSpec::I(IShape {
            depth_mm: h,
            width_mm: b,
            flange_mm: tf,
            web_mm: tw,
            root_radius_mm: 0.0,
            make: IMake::Welded,
        })
    }

    #[test]
    fn view_box_encloses_the_outline() {
        let spec = SectionSpec::Angle(Angle {
            depth_mm: 150.0,
            width_mm: 90.0,
            thickness_mm: 10.0,
            root_radius_mm: 12.0,
            toe_radius_mm: 6.0,
        });
        let (p, s) = view(spec, 355.0);
        assert!(s.starts_with("<svg") && s.ends_with("</svg>"));
        assert!(s.contains("role=\"img\"") && s.contains("fill-rule=\"evenodd\""));
        let vb = attr(&s, "<svg", "viewBox");
        assert_eq!(vb.len(), 4);
        for (y, z) in outline(&p.section.spec).into_iter().flatten() {
            assert!(y >= vb[0] && y <= vb[0] + vb[2], "y {y} outside {vb:?}");
            assert!(-z >= vb[1] && -z <= vb[1] + vb[3], "z {z} outside {vb:?}");
        }
        assert!(s.contains(" mm</text>"), "a scale bar with its length");
    }

    #[test]
    fn us_units_name_the_section_and_scale_it_in_inches() {
        let m = member(
            "S1",
            welded(300.0, 300.0, 20.0, 12.0),
            steel(355.0),
            3000.0,
            100.0,
            Method::En1993,
        );
        let c = Checked::new(&m);
        let si = of_checked(&c, UnitSystem::Si).into_string();
        let us = of_checked(&c, UnitSystem::Us).into_string();
        // 0.3 of the drawing's 351 mm width (26 letters of 0.045 x 300 mm)
        // is 105 mm: a 100 mm bar; 4.1 in rounds down to a 2 in bar, 50.8 mm
        // long in the drawing's mm.
        assert!(si.contains(">100 mm</text>"), "{si}");
        assert!(us.contains(">2 in</text>"), "{us}");
        let bar = |svg: &str| -> f64 {
            let d = svg.split("class=\"sv-scale\" d=\"").nth(1).unwrap();
            d.split('h')
                .nth(1)
                .unwrap()
                .split('v')
                .next()
                .unwrap()
                .parse()
                .unwrap()
        };
        assert!((bar(&si) - 100.0).abs() < 0.05, "{}", bar(&si));
        assert!((bar(&us) - 2.0 * 25.4).abs() < 0.05, "{}", bar(&us));
        assert!(!us.contains(" mm"), "{us}");
        // Its name in inches (300 mm = 11.811 in).
        assert!(us.contains("Cross-section I 11.811x11.811x"), "{us}");
        assert!(us.contains(" in²"), "the area in square inches: {us}");
    }

    #[test]
    fn class_4_member_has_zones_and_class_1_none() {
        // Welded I 600 x 400 x 12 x 6 in S355: c/t = 16.4 (flange) > 14 eps and
        // 96 (web) > 42 eps, Class 4 (EN 1993-1-1 Table 5.2).
        let (_, slender) = view(welded(600.0, 400.0, 12.0, 6.0), 355.0);
        assert!(slender.contains("<path class=\"sv-zone\""));
        let d = &slender[slender.find("class=\"sv-zone\"").unwrap()..];
        let d = &d[..d.find("/>").unwrap()];
        assert_eq!(d.matches('Z').count(), 5, "four flange tips and the web");
        assert!(slender.contains("ineffective parts (EN 1993-1-5 4.4)"));
        assert!(slender.contains("hatched\""));
        // Welded I 300 x 300 x 20 x 12 in S235: c/t = 7.2 and 21.7, Class 1.
        let (_, stocky) = view(welded(300.0, 300.0, 20.0, 12.0), 235.0);
        assert!(!stocky.contains("sv-zone"));
        assert!(stocky.contains("no ineffective parts shown"));
        // A doubly symmetric I: the shear centre is the centroid.
        assert!(!stocky.contains("class=\"sv-shear\""));
    }

    #[test]
    fn angle_shear_centre_marker_sits_at_the_heel() {
        let (h, b, t) = (150.0, 90.0, 10.0);
        let spec = SectionSpec::Angle(Angle {
            depth_mm: h,
            width_mm: b,
            thickness_mm: t,
            root_radius_mm: 12.0,
            toe_radius_mm: 6.0,
        });
        let (p, s) = view(spec, 355.0);
        let props = p.section.props;
        let at = attr(&s, "class=\"sv-shear\"", "d");
        // The legs' mid-lines meet at (t/2, t/2) from the heel corner (the
        // usual thin-walled idealisation, common practice); SVG z is down.
        let (y, z) = (t / 2.0 - props.centroid_y_mm, t / 2.0 - props.centroid_z_mm);
        let (sy, sz) = (at[0], -at[1]);
        assert!((sy - y).hypot(sz - z) < 0.01 * h, "{sy} {sz} vs {y} {z}");
    }

    #[test]
    fn hostile_designation_is_escaped_and_given_is_not_drawn() {
        let (mut p, _) = view(welded(300.0, 300.0, 20.0, 12.0), 235.0);
        p.section.designation = Some("<script>\"x\" & 'y'</script>");
        let s = svg(&p, None, UnitSystem::Si).into_string();
        assert!(!s.contains("<script>"));
        assert!(s.contains("&lt;script&gt;&quot;x&quot; &amp; &#39;y&#39;&lt;/script&gt;"));
        let given = SectionSpec::Given(Given {
            area_mm2: 1000.0,
            i_major_mm4: 1e6,
            i_minor_mm4: 5e5,
            torsion_mm4: None,
            warping_mm6: None,
            w_el_major_mm3: None,
            w_el_minor_mm3: None,
            w_pl_major_mm3: None,
            w_pl_minor_mm3: None,
        });
        let (_, s) = view(given, 235.0);
        assert!(s.starts_with("<p") && s.contains("given by its properties"));
    }
}
