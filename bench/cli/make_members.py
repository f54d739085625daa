"""Writes an invented member file of N members of mixed shapes and methods
for the command-line benchmark (bench/cli/run.sh).

usage: python3 make_members.py N OUT.json

Every member is a plausible column or strut of an invented depot job: rolled
and welded I sections, hot-finished and cold-formed hollow sections, glulam
and solid timber posts, solid rounds and typed properties, under every
method; each within the scope of its method, so every one checks."""

import json
import sys


def member(i):
    f = i % 7
    k = i % 8
    base = {"id": f"D{i}", "length_mm": 2500 + 50 * f, "axial_kn": 150 + 10 * f}
    if k == 0:
        base.update(section={"kind": "i", "depth_mm": 200 + 10 * f, "width_mm": 200,
                             "flange_mm": 15, "web_mm": 9, "root_radius_mm": 18, "make": "rolled"},
                    material={"grade": "S355"}, method="en1993-1-1")
    elif k == 1:
        base.update(section={"kind": "rhs", "depth_mm": 150, "width_mm": 100 + 5 * f,
                             "wall_mm": 8, "outer_radius_mm": 12, "make": "hot-finished"},
                    material={"grade": "S355H"}, method="en1993-1-1")
    elif k == 2:
        base.update(section={"kind": "chs", "diameter_mm": 168.3, "wall_mm": 8 + 0.5 * f,
                             "make": "cold-formed"},
                    material={"fy_mpa": 345, "e_mpa": 200000}, method="aisc360-lrfd")
    elif k == 3:
        base.update(section={"kind": "i", "depth_mm": 310, "width_mm": 305, "flange_mm": 15 + f,
                             "web_mm": 9.9, "root_radius_mm": 15.2, "make": "rolled"},
                    material={"grade": "A992"}, method="aisc360-asd")
    elif k == 4:
        base.update(section={"kind": "rhs", "depth_mm": 203.2, "width_mm": 203.2, "wall_mm": 12.7,
                             "outer_radius_mm": 25, "make": "cold-formed"},
                    material={"grade": "350W"}, method="csa-s16")
    elif k == 5:
        base.update(section={"kind": "rect", "depth_mm": 200 + 10 * f, "width_mm": 140},
                    material={"grade": "GL28h"}, method="en1995-1-1")
    elif k == 6:
        base.update(section={"kind": "round", "diameter_mm": 60 + f},
                    material={"fy_mpa": 355, "e_mpa": 210000}, method="perry-robertson",
                    length_mm=1500 + 50 * f, axial_kn=100 + 5 * f)
    else:
        base.update(section={"kind": "given", "area_mm2": 5000 + 100 * f,
                             "i_major_mm4": 4.0e7, "i_minor_mm4": 1.5e7},
                    material={"fy_mpa": 355, "e_mpa": 210000},
                    method="secant" if f % 2 else "euler")
    return base


def main():
    n, out = int(sys.argv[1]), sys.argv[2]
    with open(out, "w") as fh:
        fh.write('{"format": "strutline.members", "version": 2, '
                 '"title": "Invented depot, generated list", "members": [\n')
        for i in range(n):
            if i:
                fh.write(",\n")
            fh.write(json.dumps(member(i)))
        fh.write("\n]}\n")


if __name__ == "__main__":
    main()
