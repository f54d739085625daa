use super::keys;
use super::number::*;
use super::read::*;
use super::*;
use crate::units::{self, UnitSystem, UsUnit};
use serde_json::Value;
use std::collections::BTreeSet;

#[test]
fn numbers_follow_the_documented_rules() {
    let p = |s: &str, m: Mark| parse_number(s, m);
    // Rule 1.
    assert_eq!(p("1,234.5", Mark::Comma).unwrap(), 1234.5);
    assert_eq!(p("1.234,5", Mark::Point).unwrap(), 1234.5);
    assert_eq!(p("1,234,567.25", Mark::Point).unwrap(), 1_234_567.25);
    // Rule 2.
    assert_eq!(p("1.234.567", Mark::Point).unwrap(), 1_234_567.0);
    assert_eq!(p("1,234,567", Mark::Comma).unwrap(), 1_234_567.0);
    // Rule 3.
    assert_eq!(p("2,5", Mark::Point).unwrap(), 2.5);
    assert_eq!(p("0.125", Mark::Comma).unwrap(), 0.125);
    assert_eq!(p("0,125", Mark::Point).unwrap(), 0.125);
    assert_eq!(p("1,2345", Mark::Point).unwrap(), 1.2345);
    assert_eq!(p(",5", Mark::Point).unwrap(), 0.5);
    // Rule 4.
    assert_eq!(p("1,234", Mark::Point).unwrap(), 1234.0);
    assert_eq!(p("1,234", Mark::Comma).unwrap(), 1.234);
    assert_eq!(p("1.234", Mark::Comma).unwrap(), 1234.0);
    assert_eq!(p("1.234", Mark::Point).unwrap(), 1.234);
    // Spaces, signs, exponents.
    assert_eq!(p("1 234,5", Mark::Point).unwrap(), 1234.5);
    assert_eq!(
        p("1\u{a0}234\u{a0}567,5", Mark::Point).unwrap(),
        1_234_567.5
    );
    assert_eq!(p("12 345", Mark::Point).unwrap(), 12345.0);
    assert_eq!(p("-2.5", Mark::Point).unwrap(), -2.5);
    assert_eq!(p("−2,5", Mark::Point).unwrap(), -2.5);
    assert_eq!(p("+7", Mark::Point).unwrap(), 7.0);
    assert_eq!(p("1.5e3", Mark::Point).unwrap(), 1500.0);
    assert_eq!(p("2,5E-3", Mark::Point).unwrap(), 0.0025);
    assert_eq!(p("  42  ", Mark::Point).unwrap(), 42.0);
    // Refused.
    for bad in [
        "",
        "abc",
        "12 mm",
        "1,23,4",
        "1.2.3,4,5",
        "12,34.5.6",
        "1 23",
        "1e",
        "1e+",
        "e5",
        ".",
        "-",
        "1,,2",
        "1e400",
        "0,123,456",
        "1 234.567.8",
        "1,234 567",
    ] {
        assert!(p(bad, Mark::Point).is_err(), "{bad:?} should be refused");
    }
}

#[test]
fn shortest_display_text_reads_back_exactly() {
    for v in [
        0.1f64,
        1.0 / 3.0,
        2000.0,
        1e-7,
        123_456_789.123_456_79,
        5e-324,
        1.7976931348623157e308,
        -0.0,
        25.4 * 12.0,
        1.234,
    ] {
        let text = format!("{v}");
        assert_eq!(
            parse_number(&text, Mark::Point).unwrap().to_bits(),
            v.to_bits(),
            "{text}"
        );
    }
}

#[test]
fn feet_and_inches() {
    let fi = |s: &str| parse_feet_inches(s, Mark::Point).unwrap().unwrap();
    let mm = |ft: f64, inch: f64| ft * 304.8 + inch * 25.4;
    assert_eq!(fi("13'-6\""), mm(13.0, 6.0));
    assert_eq!(fi("13' 6-1/2\""), mm(13.0, 6.5));
    assert_eq!(fi("13'6\""), mm(13.0, 6.0));
    assert_eq!(fi("13'-6 1/2\""), mm(13.0, 6.5));
    assert_eq!(fi("13'"), mm(13.0, 0.0));
    assert_eq!(fi("13′ 6″"), mm(13.0, 6.0));
    assert_eq!(fi("6 1/2\""), mm(0.0, 6.5));
    assert_eq!(fi("1/2\""), 12.7);
    assert_eq!(fi("3/8 in"), mm(0.0, 0.375));
    assert_eq!(fi("13 ft 6 in"), mm(13.0, 6.0));
    assert_eq!(fi("2,5'"), 762.0);
    assert_eq!(fi("13'-6"), mm(13.0, 6.0));
    assert!((fi("13'-6\"") - 4114.8).abs() <= 4114.8 * 1e-15);
    assert!(parse_feet_inches("13.5", Mark::Point).is_none());
    for bad in ["13'-6\"'", "x'", "6-1/0\"", "'\"", "-2'", "1/\""] {
        assert!(
            parse_feet_inches(bad, Mark::Point)
                .map(|r| r.is_err())
                .unwrap_or(true),
            "{bad:?} should be refused"
        );
    }
    assert_eq!(
        number_cell("13'-6\"", Some(UsUnit::Ft), Mark::Point).unwrap(),
        mm(13.0, 6.0)
    );
    assert_eq!(
        number_cell("13.5", Some(UsUnit::Ft), Mark::Point).unwrap(),
        13.5 * 304.8
    );
    assert_eq!(
        number_cell("1'", Some(UsUnit::In), Mark::Point).unwrap(),
        304.8
    );
    assert_eq!(
        number_cell("0.5", Some(UsUnit::In), Mark::Point).unwrap(),
        12.7
    );
}

#[test]
fn typed_values_come_back_in_stored_units() {
    let t = |text: &str, key: &str, system: UnitSystem| parse_typed(text, key, system);
    assert_eq!(t("3.6", "length_mm", UnitSystem::Si).unwrap(), 3600.0);
    assert_eq!(
        t("13'-6\"", "length_mm", UnitSystem::Us).unwrap(),
        13.0 * 304.8 + 6.0 * 25.4
    );
    assert_eq!(t("12", "length_mm", UnitSystem::Us).unwrap(), 12.0 * 304.8);
    assert_eq!(t("1/2\"", "depth_mm", UnitSystem::Us).unwrap(), 12.7);
    assert_eq!(t("0.5", "depth_mm", UnitSystem::Us).unwrap(), 12.7);
    // Rule 5: in a field a single point is the decimal mark; a single
    // comma too, except before exactly three digits, which is refused as
    // ambiguous (1250 or 1.25?), naming both ways to type it.
    let why = t("1,250", "axial_kn", UnitSystem::Si).unwrap_err();
    assert!(why.contains("1250") && why.contains("1.250"), "{why}");
    assert_eq!(t("12,50", "axial_kn", UnitSystem::Si).unwrap(), 12.5);
    assert_eq!(t("1.250", "axial_kn", UnitSystem::Si).unwrap(), 1.25);
    assert_eq!(t("1,250.5", "axial_kn", UnitSystem::Si).unwrap(), 1250.5);
    assert_eq!(t("1.234,5", "axial_kn", UnitSystem::Si).unwrap(), 1234.5);
    assert_eq!(t("1 250", "axial_kn", UnitSystem::Si).unwrap(), 1250.0);
    assert_eq!(
        t("50", "fy_mpa", UnitSystem::Us).unwrap(),
        units::ksi_to_mpa(50.0)
    );
    assert_eq!(t("0,85", "k_minor", UnitSystem::Us).unwrap(), 0.85);
    assert!(t("13'-6\"", "fy_mpa", UnitSystem::Us).is_err());
    assert!(t("13'-6\"", "length_mm", UnitSystem::Si).is_err());
}

const BASIC: &str = "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\n\
                     P1,rect,100,50,235,210000,2000,10,euler\n";

#[test]
fn reads_a_simple_file() {
    let got = parse_csv(BASIC);
    assert!(got.problems.is_empty(), "{:?}", got.problems);
    let m = &got.members[0];
    assert_eq!(m.id, "P1");
    assert_eq!(m.length_mm, 2000.0);
    assert_eq!(got.member_lines, vec![2]);
    let json = file::parse(
        r#"{"format": "strutline.members", "version": 1, "members": [{"id": "P1",
        "section": {"kind": "rect", "depth_mm": 100, "width_mm": 50},
        "material": {"fy_mpa": 235, "e_mpa": 210000}, "length_mm": 2000,
        "axial_kn": 10, "method": "euler"}]}"#,
    )
    .unwrap();
    assert_eq!(&json.members[0], m);
}

#[test]
fn reads_spreadsheet_exports() {
    // Semicolons, decimal commas, BOM, CRLF, quotes, blank rows, sep= line.
    let text = "\u{feff}Id;Kind;Depth mm;Width_MM;fy_mpa;e_mpa;length_mm;axial_kn;method;note\r\n\
                \"P;1\";rect;100,5;50;235;210.000;2.000,5;10,25;euler;\"a \"\"quoted\"\"\r\nnote\"\r\n\
                ;;;;;;;;;\r\n\r\n";
    let got = parse_csv(text);
    assert!(got.problems.is_empty(), "{:?}", got.problems);
    let m = &got.members[0];
    assert_eq!(m.id, "P;1");
    assert_eq!(m.length_mm, 2000.5);
    assert_eq!(m.axial_kn, 10.25);
    assert_eq!(m.note.as_deref(), Some("a \"quoted\"\r\nnote"));
    if let crate::section::SectionSpec::Rect(r) = &m.section {
        assert_eq!(r.depth_mm, 100.5);
    } else {
        panic!("not rect");
    }
    let tabbed = "sep=\t\nid\tkind\tdiameter_mm\tgrade\tlength_mm\taxial_kn\tmethod\n\
                  R1\tround\t1,234\tS355\t3000\t2,5\teuler\n";
    let got = parse_csv(tabbed);
    assert!(got.problems.is_empty(), "{:?}", got.problems);
    // "2,5" decides the file: decimal comma, so "1,234" is 1.234.
    if let crate::section::SectionSpec::Round(r) = &got.members[0].section {
        assert_eq!(r.diameter_mm, 1.234);
    } else {
        panic!("not round");
    }
    assert_eq!(got.members[0].axial_kn, 2.5);
}

#[test]
fn us_columns_convert_exactly() {
    let text = "id,kind,depth_in,width_in,fy_ksi,e_ksi,length_ft,axial_kip,method,bow_in\n\
                U1,rect,4,2,50,29000,13'-6\",100,euler,1/2\"\n";
    let got = parse_csv(text);
    assert!(got.problems.is_empty(), "{:?}", got.problems);
    let m = &got.members[0];
    assert_eq!(m.length_mm, 13.0 * 304.8 + 6.0 * 25.4);
    assert_eq!(m.axial_kn, 100.0 * units::KN_PER_KIP);
    assert_eq!(m.bow_mm, Some(12.7));
    match &m.material {
        crate::material::MaterialSpec::Custom { fy_mpa, .. } => {
            assert_eq!(*fy_mpa, units::ksi_to_mpa(50.0))
        }
        other => panic!("{other:?}"),
    }
}

#[test]
fn reports_every_problem_with_line_and_column() {
    let text = "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method,colour\n\
                A,rect,100,50,235,210000,2000,10,euler,red\n\
                B,rect,abc,50,235,210000,2000,10,euler,\n\
                C,rect,100,,235,210000,2000,10,eurocode,\n\
                D,box,100,50,235,,2000,1x,euler,\n\
                A,rect,100,50,235,210000,2000,10,euler,\n\
                E,round,100,50,235,210000,2000,10,euler,\n";
    let got = parse_csv(text);
    assert_eq!(got.members.len(), 1);
    assert_eq!(got.members[0].id, "A");
    let find = |line: usize, col: &str| {
        got.problems
            .iter()
            .find(|p| p.line == line && p.column == col)
            .unwrap_or_else(|| panic!("no problem at {line} {col}: {:#?}", got.problems))
    };
    assert!(find(1, "colour").message.contains("unknown column"));
    assert!(find(3, "depth_mm").message.contains("abc"));
    assert!(find(3, "depth_mm").expected.contains("mm"));
    assert!(find(4, "width_mm").message.contains("missing"));
    assert!(find(4, "method").message.contains("eurocode"));
    assert!(find(5, "kind").message.contains("box"));
    assert!(find(5, "axial_kn").message.contains("1x"));
    assert!(find(5, "e_mpa").message.contains("missing"));
    assert!(find(6, "id").message.contains("already used"));
    assert!(find(7, "diameter_mm").message.contains("missing"));
    assert!(find(7, "depth_mm").message.contains("has no depth_mm"));
    let shown = find(3, "depth_mm").to_string();
    assert!(shown.starts_with("line 3, column depth_mm:"), "{shown}");
}

#[test]
fn refuses_rows_over_a_given_limit_and_headless_files() {
    let mut many = String::from("id,kind,diameter_mm,grade,length_mm,axial_kn,method\n");
    for i in 0..=10_000 {
        many.push_str(&format!("{i},round,1,S,1,1,euler\n"));
    }
    // No limit of its own: every row read.
    assert_eq!(parse_csv(&many).rows, 10_001);
    let got = parse_csv_within(&many, 10_000);
    assert!(got.members.is_empty());
    assert!(
        got.problems[0].message.contains("more than 10000 rows"),
        "{:?}",
        got.problems[0]
    );
    assert!(parse_csv("").problems[0].message.contains("empty"));
    let got = parse_csv("id,kind\nA,rect\n");
    assert!(
        got.problems[0]
            .message
            .contains("no column for method, length_mm"),
        "{:?}",
        got.problems
    );
    let got = parse_csv("id,kind,note\nA,rect,\"never closed\n");
    assert!(got
        .problems
        .iter()
        .any(|p| p.message.contains("never closed")));
}

#[test]
fn detects_format_and_reads_any() {
    assert_eq!(detect_format("a/b.CSV", "{"), Format::Csv);
    assert_eq!(detect_format("a.json", "id"), Format::Json);
    assert_eq!(detect_format("members", " {\"format\""), Format::Json);
    assert_eq!(detect_format("members", "id,kind"), Format::Csv);
    assert_eq!(detect_format("dir.v2/members", "id,kind"), Format::Csv);
    let f = read_any("jobs/strut list.csv", BASIC).unwrap();
    assert_eq!(f.title, "strut list");
    assert_eq!(f.members.len(), 1);
    let e = read_any("x.csv", "id,kind,depth_mm,width_mm,fy_mpa,e_mpa,length_mm,axial_kn,method\nP,rect,1,1,1,1,1,zz,euler\n")
        .unwrap_err();
    assert!(e.contains("line 2, column axial_kn"), "{e}");
    let e = read_any("x.json", "{").unwrap_err();
    assert!(e.starts_with("x.json: "), "{e}");
}

#[test]
fn angle_columns_read_and_report_bad_values() {
    use crate::member::{AngleConnection, Leg, Truss};
    let text = "id,kind,depth_mm,width_mm,thickness_mm,grade,length_mm,axial_kn,method,Angle Leg,angle-truss\n\
                A1,angle,100,75,8,A36,1500,60,aisc360-lrfd,Short,SPACE\n\
                A2,angle,100,75,8,A36,1500,60,aisc360-lrfd,long,\n\
                A3,angle,100,75,8,A36,1500,60,aisc360-lrfd,,\n\
                A4,angle,100,75,8,A36,1500,60,aisc360-lrfd,middle,planar\n\
                A5,angle,100,75,8,A36,1500,60,aisc360-lrfd,long,box\n\
                A6,angle,100,75,8,A36,1500,60,aisc360-lrfd,,space\n";
    let got = parse_csv(text);
    let conn = |leg, truss| Some(AngleConnection { leg, truss });
    let read: Vec<_> = got
        .members
        .iter()
        .map(|m| (m.id.as_str(), m.angle_connection))
        .collect();
    assert_eq!(
        read,
        vec![
            ("A1", conn(Leg::Short, Truss::Space)),
            ("A2", conn(Leg::Long, Truss::Planar)),
            ("A3", None),
        ]
    );
    let problems: Vec<(usize, &str, &str)> = got
        .problems
        .iter()
        .map(|p| (p.line, p.column.as_str(), p.expected.as_str()))
        .collect();
    assert_eq!(
        problems,
        vec![
            (5, "Angle Leg", "long, short"),
            (6, "angle-truss", "planar, space"),
            (7, "Angle Leg", "long or short"),
        ],
        "{:#?}",
        got.problems
    );
    assert!(got.problems[0].message.contains("middle"));
    assert!(got.problems[1].message.contains("box"));
    assert!(got.problems[2].message.contains("angle_leg is missing"));
}

#[test]
fn frame_columns_read_and_report_bad_values() {
    use crate::buckling::chart::Frame;
    let head = "id,kind,depth_mm,width_mm,flange_mm,web_mm,grade,length_mm,axial_kn,method,\
                Frame Major Sway,frame-major-g-a,frame_major_g_b,frame_minor_sway,frame_minor_g_a,frame_minor_g_b\n";
    let rows = "F1,i,240,240,17,10,S355,5400,380,en1993-1-1,Yes,\"1,5\",2.4,false,0,10\n\
                F2,i,240,240,17,10,S355,5400,380,en1993-1-1,,,,,,\n\
                F3,i,240,240,17,10,S355,5400,380,en1993-1-1,true,1,,,,\n\
                F4,i,240,240,17,10,S355,5400,380,en1993-1-1,sideways,stiff,1,,,\n\
                F5,i,240,240,17,10,S355,5400,380,en1993-1-1,,,,false,,3\n";
    let got = parse_csv(&format!("{head}{rows}"));
    let read: Vec<_> = got
        .members
        .iter()
        .map(|m| (m.id.as_str(), m.frame_major, m.frame_minor))
        .collect();
    assert_eq!(
        read,
        vec![
            (
                "F1",
                Some(Frame {
                    sway: true,
                    g_a: 1.5,
                    g_b: 2.4
                }),
                Some(Frame {
                    sway: false,
                    g_a: 0.0,
                    g_b: 10.0
                })
            ),
            ("F2", None, None),
        ]
    );
    let problems: Vec<(usize, &str, &str)> = got
        .problems
        .iter()
        .map(|p| (p.line, p.column.as_str(), p.expected.as_str()))
        .collect();
    let g = |end: &str, axis: &str| {
        format!(
            "G_{end},{axis}, a number of 0 or more (sum of EI/L of the columns over that of the \
             beams at end {end})"
        )
    };
    let (gby, gay, gaz) = (g("B", "y"), g("A", "y"), g("A", "z"));
    assert_eq!(
        problems,
        vec![
            (4, "frame_major_g_b", gby.as_str()),
            (
                5,
                "Frame Major Sway",
                "true (sidesway uninhibited) or false (braced)"
            ),
            (5, "frame-major-g-a", gay.as_str()),
            (6, "frame_minor_g_a", gaz.as_str()),
        ],
        "{:#?}",
        got.problems
    );
    assert!(got.problems[0]
        .message
        .contains("frame_major_g_b is missing; frame_major needs frame_major_sway, frame_major_g_a and frame_major_g_b"));
    assert!(got.problems[1].message.contains("sideways"));
    assert!(got.problems[3]
        .message
        .contains("frame_minor_g_a is missing"));
}

#[test]
fn never_panics_on_random_input() {
    let alphabet: Vec<char> =
        "id,kind;rect\tround\"\r\n '-/.0123456789eE+−,\u{feff}sep=length_ft\u{a0}\""
            .chars()
            .collect();
    let header = "id,kind,depth_mm,width_mm,diameter_mm,grade,fy_mpa,e_mpa,length_ft,axial_kip,method,note\n";
    let mut seed: u64 = 0x9e37_79b9_7f4a_7c15;
    let mut next = || {
        seed ^= seed << 13;
        seed ^= seed >> 7;
        seed ^= seed << 17;
        seed
    };
    for round in 0..3000 {
        let len = (next() % 200) as usize;
        let mut s = String::new();
        if round % 2 == 0 {
            s.push_str(header);
        }
        for _ in 0..len {
            s.push(alphabet[(next() % alphabet.len() as u64) as usize]);
        }
        let got = parse_csv(&s);
        assert_eq!(got.members.len(), got.member_lines.len());
        let _ = read_any("f.csv", &s);
        let bytes: Vec<u8> = (0..len).map(|_| (next() & 0xff) as u8).collect();
        let lossy = String::from_utf8_lossy(&bytes);
        let _ = parse_csv(&lossy);
        let _ = parse_feet_inches(&s, Mark::Comma);
    }
}

/// Every section kind, every material form and every member option,
/// with awkward numbers and text.
const EVERY: &str = r#"{"format": "strutline.members", "version": 3, "title": "every key",
  "members": [
    {"id": "I1", "note": "comma, \"quote\"\nnew line", "section": {"kind": "i", "depth_mm": 300.5,
     "width_mm": 300, "flange_mm": 19, "web_mm": 11, "root_radius_mm": 27, "make": "welded"},
     "material": {"grade": "S355"}, "length_mm": 4000.000000001, "k_major": 0.7, "k_minor": 0.85,
     "k_torsion": 0.5, "lcr_major_mm": 3333.3333333333335, "lcr_minor_mm": 0.30000000000000004,
     "lcr_torsion_mm": 1e-7, "axial_kn": 1234567.891, "method": "en1993-1-1", "gamma_m1": 1.1,
     "curve_major": "a0", "curve_minor": "d", "bow_mm": 0, "eccentricity_mm": 12.5,
     "service_class": 3, "load_duration": "instantaneous", "csa_n": 2.24},
    {"id": " R2 ", "note": "", "section": {"kind": "rhs", "depth_mm": 200, "width_mm": 100,
     "wall_mm": 6.3, "outer_radius_mm": 12.6, "inner_radius_mm": 6.3, "make": "cold-formed"},
     "material": {"fy_mpa": 355, "e_mpa": 210000, "g_mpa": 81000}, "length_mm": 3000,
     "axial_kn": 0, "method": "aisc360-lrfd", "curve_minor": "c"},
    {"id": "C3", "section": {"kind": "chs", "diameter_mm": 168.3, "wall_mm": 8, "make": "hot-finished"},
     "material": {"fy_mpa": 275, "e_mpa": 205000}, "length_mm": 5000, "axial_kn": 500,
     "method": "aisc360-asd"},
    {"id": "L4", "section": {"kind": "angle", "depth_mm": 100, "width_mm": 75, "thickness_mm": 8,
     "root_radius_mm": 10, "toe_radius_mm": 4.8}, "material": {"grade": "A36"},
     "length_mm": 2000, "axial_kn": 80, "method": "csa-s16", "csa_n": 1.34},
    {"id": "U5", "section": {"kind": "channel", "depth_mm": 200, "width_mm": 75, "flange_mm": 12.5,
     "web_mm": 8.5, "root_radius_mm": 12}, "material": {"grade": "S275"}, "length_mm": 2500,
     "axial_kn": 100, "method": "perry-robertson", "bow_mm": 2.5},
    {"id": "T6", "section": {"kind": "tee", "depth_mm": 150, "width_mm": 150, "flange_mm": 10,
     "web_mm": 7, "root_radius_mm": 0}, "material": {"grade": "S235"}, "length_mm": 1800,
     "axial_kn": 60, "method": "secant", "eccentricity_mm": 3},
    {"id": "W7", "section": {"kind": "rect", "depth_mm": 195, "width_mm": 95},
     "material": {"fc0k_mpa": 21, "e005_mpa": 7400, "e0mean_mpa": 11000, "timber": "solid"},
     "length_mm": 2700, "axial_kn": 45.5, "method": "en1995-1-1", "service_class": 2,
     "load_duration": "short"},
    {"id": "W8", "section": {"kind": "round", "diameter_mm": 220},
     "material": {"fc0k_mpa": 28, "e005_mpa": 10400, "e0mean_mpa": 12600, "timber": "glulam"},
     "length_mm": 3200, "axial_kn": 120, "method": "en1995-1-1", "load_duration": "permanent"},
    {"id": "G9", "section": {"kind": "given", "area_mm2": 7808, "i_major_mm4": 1.2591e8,
     "i_minor_mm4": 4.073e7, "torsion_mm4": 595700, "warping_mm6": 1.709e12},
     "material": {"fy_mpa": 355, "e_mpa": 210000}, "length_mm": 3500, "axial_kn": 900,
     "method": "euler", "load_duration": "long", "curve_major": "b"},
    {"id": "K10", "section": {"kind": "catalogue", "designation": "HE 200 B"},
     "material": {"grade": "S355"}, "length_mm": 3500, "axial_kn": 900, "method": "en1993-1-1",
     "gamma_m1": 1.0, "curve_major": "a", "load_duration": "medium"},
    {"id": "G11", "section": {"kind": "given", "area_mm2": 5e-324, "i_major_mm4": 1.7976931348623157e308,
     "i_minor_mm4": 0.1}, "material": {"fy_mpa": 1.0e-300, "e_mpa": 210000.00000000003},
     "length_mm": -0.0, "axial_kn": -5, "method": "euler", "k_major": 1.0000000000000002},
    {"id": "L12", "section": {"kind": "angle", "depth_mm": 100, "width_mm": 75, "thickness_mm": 8,
     "root_radius_mm": 10, "toe_radius_mm": 4.8}, "material": {"grade": "A36"},
     "length_mm": 1500, "axial_kn": 60, "method": "aisc360-lrfd",
     "angle_connection": {"leg": "short", "truss": "space"}},
    {"id": "L13", "section": {"kind": "angle", "depth_mm": 80, "width_mm": 80, "thickness_mm": 8},
     "material": {"grade": "S355"}, "length_mm": 1200, "axial_kn": 50, "method": "aisc360-asd",
     "angle_connection": {"leg": "long"}},
    {"id": "B14", "section": {"kind": "given", "area_mm2": 5380, "i_major_mm4": 5.79e7,
     "i_minor_mm4": 4.2e6, "w_el_major_mm3": 4.29e5, "w_el_minor_mm3": 5.84e4,
     "w_pl_major_mm3": 4.84e5, "w_pl_minor_mm3": 9.1e4}, "material": {"grade": "S355"},
     "length_mm": 5400, "axial_kn": 0, "method": "en1993-1-1", "m_major_a_knm": -42.5,
     "m_major_b_knm": 17.25, "m_major_span_knm": 60.75, "span_load_major": "point",
     "m_minor_a_knm": 1.5, "m_minor_b_knm": 1.5, "m_minor_span_knm": -0.125,
     "span_load_minor": "uniform", "k_lt": 0.5, "lcr_lt_mm": 1800, "lt_restrained": true,
     "load_level": "compression-flange", "amplify_moments": false, "interaction_annex": "A",
     "amplification_length_major_mm": 2750.5, "amplification_length_minor_mm": 1800},
    {"id": "F15", "section": {"kind": "i", "depth_mm": 240, "width_mm": 240, "flange_mm": 17,
     "web_mm": 10, "root_radius_mm": 21}, "material": {"grade": "S355"}, "length_mm": 5400,
     "axial_kn": 380, "method": "en1993-1-1",
     "frame_major": {"sway": true, "g_a": 0.30000000000000004, "g_b": 2.4},
     "frame_minor": {"sway": false, "g_a": 0, "g_b": 10}}
  ]}"#;

#[test]
fn json_csv_json_keeps_every_member_exactly() {
    // The CSV side is exact for every f64 (Rust's shortest Display and
    // correctly rounded parse). The JSON side is exact for the values
    // below; serde_json without its `float_roundtrip` feature may misread
    // some long 17-digit values by one unit in the last place, so such
    // values are kept out of the JSON -> JSON comparison.
    let original = file::parse(EVERY).unwrap();
    assert_eq!(original.members.len(), 15);
    let csv_text = to_csv(&original);
    let back = parse_csv(&csv_text);
    assert!(back.problems.is_empty(), "{:#?}\n{csv_text}", back.problems);
    assert_eq!(back.members, original.members, "{csv_text}");
    for (a, b) in back.members.iter().zip(&original.members) {
        assert_eq!(a.length_mm.to_bits(), b.length_mm.to_bits());
    }
    // And on through JSON again, with the title set as the JSON had it.
    let mut again = MemberFile::new("every key");
    again.members = back.members;
    assert_eq!(again.to_json(), original.to_json());
    assert_eq!(file::parse(&again.to_json()).unwrap(), original);
    // CSV -> JSON -> CSV gives the same text.
    assert_eq!(to_csv(&again), csv_text);
    assert!(csv_text.starts_with("id,note,kind,"));
    // angle_connection is two flat columns, not a JSON cell.
    let header = csv_text.lines().next().unwrap();
    assert!(
        header.contains(",frame_minor_g_b,angle_leg,angle_truss,k_lt,"),
        "{header}"
    );
    let b14 = again.members.iter().find(|m| m.id == "B14").unwrap();
    assert!(b14.lt_restrained && b14.m_minor_span_knm == -0.125);
    // The beam-column keys, at their non-default values, both ways; absent
    // (their defaults) on every other member.
    assert!(!b14.amplify_moments);
    assert_eq!(
        b14.interaction_annex,
        Some(crate::member::InteractionAnnex::A),
        "{csv_text}"
    );
    assert_eq!(
        (
            b14.amplification_length_major_mm,
            b14.amplification_length_minor_mm
        ),
        (Some(2750.5), Some(1800.0)),
        "{csv_text}"
    );
    assert!(
        header.contains(
            ",amplify_moments,amplification_length_major_mm,amplification_length_minor_mm,\
             interaction_annex"
        ),
        "{header}"
    );
    assert!(again
        .members
        .iter()
        .filter(|m| m.id != "B14")
        .all(|m| m.amplify_moments
            && m.interaction_annex.is_none()
            && m.amplification_length_major_mm.is_none()
            && m.amplification_length_minor_mm.is_none()));
    assert!(!csv_text.contains('{'), "{csv_text}");
    // The frames are three flat columns each, after the buckling lengths.
    assert!(
        header.contains(
            ",lcr_torsion_mm,frame_major_sway,frame_major_g_a,frame_major_g_b,\
             frame_minor_sway,frame_minor_g_a,frame_minor_g_b,angle_leg,"
        ),
        "{header}"
    );
    let f15 = again.members.iter().find(|m| m.id == "F15").unwrap();
    assert_eq!(
        (f15.frame_major, f15.frame_minor),
        (
            Some(crate::buckling::chart::Frame {
                sway: true,
                g_a: 0.30000000000000004,
                g_b: 2.4
            }),
            Some(crate::buckling::chart::Frame {
                sway: false,
                g_a: 0.0,
                g_b: 10.0
            })
        )
    );
    let l12 = again.members.iter().find(|m| m.id == "L12").unwrap();
    assert_eq!(
        l12.angle_connection,
        Some(crate::member::AngleConnection {
            leg: crate::member::Leg::Short,
            truss: crate::member::Truss::Space
        })
    );
    assert!(csv_text.ends_with("\r\n"));
    // Absent options stay absent; a quoted empty note stays an empty note.
    let r2 = again.members.iter().find(|m| m.id == " R2 ").unwrap();
    assert_eq!(r2.note.as_deref(), Some(""));
    assert_eq!(r2.gamma_m1, None);
    assert_eq!(r2.k_major, 1.0);
}

#[test]
fn us_csv_reads_back_within_rounding() {
    let mut original = file::parse(EVERY).unwrap();
    // G11 holds 5e-324 mm2, a subnormal that no unit conversion keeps.
    original.members.retain(|m| m.id != "G11");
    let text = to_csv_in(&original, UnitSystem::Us);
    let header = text.lines().next().unwrap();
    for col in [
        "length_ft",
        "lcr_minor_ft",
        "depth_in",
        "axial_kip",
        "fy_ksi",
        "area_in2",
    ] {
        assert!(header.split(',').any(|h| h == col), "{col} in {header}");
    }
    assert!(header.split(',').any(|h| h == "k_major"));
    let back = parse_csv(&text);
    assert!(back.problems.is_empty(), "{:#?}", back.problems);
    // Compare through JSON values: every number within a part in 10^9
    // (a value that near a thousandth of its SI unit but not on it, as
    // 4000.000000001 mm here, reads as the thousandth: read::to_thousandth),
    // all else equal; `us_cells_are_short_and_read_back_exactly` holds the
    // exact round trip of the values a person types.
    fn close(a: &Value, b: &Value) -> bool {
        match (a, b) {
            (Value::Number(x), Value::Number(y)) => {
                let (x, y) = (x.as_f64().unwrap(), y.as_f64().unwrap());
                x == y || ((x - y) / y).abs() <= super::read::THOUSANDTH_WITHIN
            }
            (Value::Object(x), Value::Object(y)) => {
                x.len() == y.len() && x.iter().all(|(k, v)| y.get(k).is_some_and(|w| close(v, w)))
            }
            _ => a == b,
        }
    }
    for (a, b) in back.members.iter().zip(&original.members) {
        let (a, b) = (
            serde_json::to_value(a).unwrap(),
            serde_json::to_value(b).unwrap(),
        );
        assert!(close(&a, &b), "{a}\n{b}");
    }
    assert_eq!(back.members.len(), original.members.len());
}

#[test]
fn us_cells_are_short_and_read_back_exactly() {
    use super::write::us_cell;
    // Exact factors (NIST SP 811, 2008, App. B): 1 ft = 304.8 mm, 1 in =
    // 25.4 mm, 1 kip = 4.4482216152605 kN, 1 ksi = 6.894757293168 MPa.
    // Values typed in US units come back as typed; SI values typed to the
    // thousandth in ten figures at most (4000 mm is 13.123359580052... ft;
    // 820 kN is 184.34333334... kip and 355 MPa 51.488396894... ksi, the
    // quotients worked in Python's doubles).
    for (unit, si, cell) in [
        (UsUnit::Ft, 4000.0, "13.12335958"),
        (UsUnit::Ft, 13.5 * 304.8, "13.5"),
        (UsUnit::Ft, 2000.0, "6.56167979"),
        (UsUnit::In, 32.0, "1.25984252"),
        (UsUnit::In, 0.25 * 25.4, "0.25"),
        (UsUnit::Kip, units::kip_to_kn(2.5), "2.5"),
        (UsUnit::Kip, 820.0, "184.3433333"),
        (UsUnit::Ksi, 355.0, "51.4883969"),
        (UsUnit::Ksi, units::ksi_to_mpa(50.0), "50"),
    ] {
        assert_eq!(us_cell(unit, si), cell, "{si} in {unit:?}");
    }
    // Every thousandth of a millimetre, kilonewton or megapascal a person
    // types, over five decades, in each US unit: at most ten significant
    // figures, and read back bit for bit.
    let mut seed: u64 = 0x9e37_79b9_7f4a_7c15;
    for _ in 0..2_000 {
        seed ^= seed << 13;
        seed ^= seed >> 7;
        seed ^= seed << 17;
        let thousandths = (seed % 100_000_000) as f64 + 1.0;
        let si = thousandths / 1000.0;
        for unit in [
            UsUnit::Ft,
            UsUnit::In,
            UsUnit::In2,
            UsUnit::Kip,
            UsUnit::Ksi,
            UsUnit::KipFt,
            UsUnit::KipPerFt,
        ] {
            let cell = us_cell(unit, si);
            let figures = cell.trim_start_matches(['0', '.']).replace('.', "");
            assert!(figures.len() <= 10, "{si} as {cell} {unit:?}");
            let back = super::read::number_cell(&cell, Some(unit), super::number::Mark::Point);
            assert_eq!(back, Ok(si), "{si} as {cell} {unit:?}");
        }
    }
}

#[test]
fn fixtures_read_as_documented() {
    // A spreadsheet export with `sep=;`, BOM, CRLF, decimal commas and point thousands.
    let eu = parse_csv(include_str!(
        "../../../tests/fixtures/csv/workshop-semicolon.csv"
    ));
    assert_eq!(eu.members.len(), 2, "{:#?}", eu.problems);
    let m1 = &eu.members[0];
    assert_eq!(
        (m1.id.as_str(), m1.length_mm, m1.k_minor, m1.axial_kn),
        ("M-01", 3600.0, 0.85, 1250.5)
    );
    assert_eq!(m1.note.as_deref(), Some("Stütze; Achse A"));
    let m2 = &eu.members[1];
    assert_eq!((m2.length_mm, m2.axial_kn), (2750.5, 12.75));
    assert_eq!(eu.member_lines, vec![3, 4]);
    let lines: BTreeSet<(usize, &str)> = eu
        .problems
        .iter()
        .map(|p| (p.line, p.column.as_str()))
        .collect();
    for col in ["area_mm2", "i_major_mm4", "i_minor_mm4", "Axial kN"] {
        assert!(lines.contains(&(5, col)), "{col}: {:#?}", eu.problems);
    }
    // US customary columns with feet and inches.
    let us = parse_csv(include_str!("../../../tests/fixtures/csv/bracing-us.csv"));
    assert!(us.problems.is_empty(), "{:#?}", us.problems);
    let b1 = &us.members[0];
    assert_eq!(b1.length_mm, 13.0 * 304.8 + 6.0 * 25.4);
    assert_eq!(b1.lcr_minor_mm, Some(6.0 * 304.8 + 9.0 * 25.4));
    assert_eq!(b1.bow_mm, Some(0.25 * 25.4));
    assert_eq!(b1.axial_kn, 40.0 * units::KN_PER_KIP);
    assert_eq!(b1.note.as_deref(), Some("brace, bay 2"));
    let b2 = &us.members[1];
    assert_eq!(b2.length_mm, 20.0 * 304.8 + 4.5 * 25.4);
    assert_eq!(b2.axial_kn, 1250.0 * units::KN_PER_KIP);
    assert_eq!(us.members[2].length_mm, 10.5 * 304.8);
    // 0.375 in is 9.525 mm exactly (1 in = 25.4 mm, NIST SP 811, 2008,
    // App. B); the product in doubles is 9.524999999999999, which lies
    // within a part in 10^9 of that thousandth and reads as it.
    assert_eq!(us.members[2].bow_mm, Some(9.525));
    assert_ne!(0.375 * 25.4, 9.525);
    // Tab-separated timber: "35,5" sets the decimal comma for the file.
    let tab = parse_csv(include_str!("../../../tests/fixtures/csv/timber-tab.csv"));
    assert_eq!(tab.members.len(), 1);
    assert_eq!(tab.members[0].axial_kn, 35.5);
    assert_eq!(tab.members[0].service_class, Some(2));
    let cols: Vec<&str> = tab.problems.iter().map(|p| p.column.as_str()).collect();
    assert_eq!(
        cols,
        vec!["service_class", "load_duration"],
        "{:#?}",
        tab.problems
    );
    assert!(tab.problems.iter().all(|p| p.line == 3));
}

#[test]
fn never_panics_on_mutated_valid_files() {
    // Start from valid files and damage them at random places, so the
    // damage reaches the row, section, material and serde stages.
    let seeds = [
        to_csv(&file::parse(EVERY).unwrap()),
        to_csv_in(&file::parse(EVERY).unwrap(), UnitSystem::Us),
        include_str!("../../../tests/fixtures/csv/workshop-semicolon.csv").to_string(),
        include_str!("../../../tests/fixtures/csv/bracing-us.csv").to_string(),
        include_str!("../../../tests/fixtures/csv/timber-tab.csv").to_string(),
    ];
    let alphabet: Vec<char> = ",;\t\"'\r\n -/.,0123456789eEx—″′\u{a0}".chars().collect();
    let mut seed: u64 = 0x0123_4567_89ab_cdef;
    let mut next = || {
        seed ^= seed << 13;
        seed ^= seed >> 7;
        seed ^= seed << 17;
        seed
    };
    let mut valid_rows = 0usize;
    for round in 0..1500 {
        let base = &seeds[round % seeds.len()];
        let mut chars: Vec<char> = base.chars().collect();
        for _ in 0..(1 + next() % 4) {
            let at = (next() as usize) % (chars.len() + 1);
            match next() % 3 {
                0 if at < chars.len() => {
                    chars.remove(at);
                }
                1 if at < chars.len() => {
                    chars[at] = alphabet[(next() as usize) % alphabet.len()];
                }
                _ => chars.insert(at, alphabet[(next() as usize) % alphabet.len()]),
            }
        }
        let text: String = chars.into_iter().collect();
        let got = parse_csv(&text);
        assert_eq!(got.members.len(), got.member_lines.len());
        valid_rows += got.members.len();
        for p in &got.problems {
            assert!(!p.message.is_empty());
            let _ = p.to_string();
        }
        // Whatever was read writes and reads back to the same members.
        let mut f = MemberFile::new("m");
        f.members = got.members;
        let again = parse_csv(&to_csv(&f));
        assert_eq!(again.members, f.members, "{text}");
    }
    // Most damage hits one row, so most rows still read.
    assert!(valid_rows > 1500, "{valid_rows}");
}

mod fuzz {
    #![allow(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::indexing_slicing,
        clippy::panic
    )]
    use super::super::*;
    use proptest::prelude::*;

    proptest! {
        #![proptest_config(ProptestConfig::with_cases(256))]
        #[test]
        fn any_bytes_read_without_panic(bytes in proptest::collection::vec(any::<u8>(), 0..600)) {
            let text = String::from_utf8_lossy(&bytes);
            let got = parse_csv(&text);
            prop_assert_eq!(got.members.len(), got.member_lines.len());
        }
    }
}

#[test]
fn version_3_keys_are_left_out_and_said_so() {
    let f = crate::file::parse(include_str!("../../../examples/tarnbeck-crane-hall.json")).unwrap();
    let text = to_csv(&f);
    for key in not_in_csv() {
        assert!(!text.contains(key), "{key} in {text}");
    }
    let said = left_out(&f).unwrap();
    assert!(
        said.contains("member \"K1\": buckling_model") && !said.contains("W2"),
        "{said}"
    );
    // The rest reads back, W2's frame_major included.
    let back = parse_csv(&text);
    assert!(back.problems.is_empty(), "{:?}", back.problems);
    assert_eq!(back.members.len(), 2);
    assert_eq!(back.members[1].frame_major, f.members[1].frame_major);
    assert!(back.members[1].frame_major.is_some());
    let mut again = crate::file::MemberFile::new("t");
    again.members = back.members;
    assert!(left_out(&again).is_none());
}

/// The CSV columns cover every section key of the one description
/// (`section::schema::KINDS`), each as a section column of the right kind.
#[test]
fn every_described_section_key_is_a_column() {
    use crate::section::schema;
    use keys::{key_info, Group, Kind};
    for described in &schema::KINDS {
        for key in described.keys {
            let info = key_info(key.key).unwrap_or_else(|| {
                panic!(
                    "section kind \"{}\" has key \"{}\", which csv::keys::SECTION_KEYS does not list",
                    described.name, key.key
                )
            });
            assert_eq!(info.group, Group::Section, "{}", key.key);
            let expected = match key.value {
                schema::Value::Number => Kind::Number,
                schema::Value::Text => Kind::Text,
                schema::Value::Choice(_) => Kind::Name,
            };
            assert_eq!(info.kind, expected, "{}", key.key);
        }
    }
    // And no section column that no kind has.
    for info in keys::SECTION_KEYS
        .iter()
        .filter(|i| i.group == Group::Section)
    {
        assert!(
            info.key == "kind" || schema::KINDS.iter().any(|k| k.key(info.key).is_some()),
            "csv::keys::SECTION_KEYS lists section column \"{}\", which no kind describes",
            info.key
        );
    }
}
