"""Reference section properties from the open-source `sectionproperties`
library (R. van Leeuwen, PyPI package `sectionproperties`, version 3.10.2,
finite-element analysis of arbitrary cross-sections: geometric, warping and
plastic analyses).

Run (not needed for the Rust tests, which read the committed JSON):

    python3 -m venv /tmp/spvenv
    /tmp/spvenv/bin/pip install sectionproperties==3.10.2
    /tmp/spvenv/bin/python tests/validation/sectionproperties/generate.py

It writes `values.json` beside this script. Geometry is built with the
library's own steel-section builders (`sectionproperties.pre.library`),
whose circular arcs are polygons of `n_r` points; we use fine arcs so that
the chord error is below 1e-4 of the area. All dimensions are in mm and are
invented test cases (dimensions close to common rolled and hollow sizes).

Axes of the library: x horizontal, y vertical. Our engine calls the
horizontal axis y and the vertical axis z, so the library's Ixx (about the
horizontal axis) is our I_y and its Iyy is our I_z. Each case records the
shape as our member-file spec so the Rust test rebuilds the same geometry.
"""

import importlib.metadata
import json
import math
import os
import sys

import sectionproperties.pre.library.steel_sections as ss
import sectionproperties.pre.library.primitive_sections as ps
from sectionproperties.analysis.section import Section

LIBRARY = "sectionproperties"
VERSION = "3.10.2"
N_R = 32  # points per fillet / corner arc
N_CIRCLE = 512  # points on a full circle

_found = importlib.metadata.version(LIBRARY)
if _found != VERSION:
    sys.exit(f"expected {LIBRARY} {VERSION}, found {_found}")


def cases():
    # name, spec (our member-file JSON), geometry, mesh size (max triangle area, mm2)
    yield ("rolled I 200x200x15x9 r18 (HE 200 B dims)",
           {"kind": "i", "depth_mm": 200, "width_mm": 200, "flange_mm": 15, "web_mm": 9,
            "root_radius_mm": 18},
           ss.i_section(d=200, b=200, t_f=15, t_w=9, r=18, n_r=N_R), 2.0)
    yield ("rolled I 300x150x10.7x7.1 r15 (IPE 300 dims)",
           {"kind": "i", "depth_mm": 300, "width_mm": 150, "flange_mm": 10.7, "web_mm": 7.1,
            "root_radius_mm": 15},
           ss.i_section(d=300, b=150, t_f=10.7, t_w=7.1, r=15, n_r=N_R), 1.5)
    yield ("welded I 400x200x16x8",
           {"kind": "i", "depth_mm": 400, "width_mm": 200, "flange_mm": 16, "web_mm": 8,
            "root_radius_mm": 0, "make": "welded"},
           ss.i_section(d=400, b=200, t_f=16, t_w=8, r=0, n_r=1), 2.0)
    yield ("cold-formed RHS 200x100x8 ro20 ri12",
           {"kind": "rhs", "depth_mm": 200, "width_mm": 100, "wall_mm": 8, "outer_radius_mm": 20,
            "make": "cold-formed"},
           ss.rectangular_hollow_section(d=200, b=100, t=8, r_out=20, n_r=N_R), 1.0)
    yield ("hot-finished RHS 150x100x8 ro12 ri8 (non-concentric corners)",
           {"kind": "rhs", "depth_mm": 150, "width_mm": 100, "wall_mm": 8, "outer_radius_mm": 12,
            "inner_radius_mm": 8},
           ss.rectangular_hollow_section(d=150, b=100, t=8, r_out=12, r_in=8, n_r=N_R), 1.0)
    yield ("cold-formed RHS 100x200x6 ro12 (width > depth)",
           {"kind": "rhs", "depth_mm": 100, "width_mm": 200, "wall_mm": 6, "outer_radius_mm": 12,
            "make": "cold-formed"},
           ss.rectangular_hollow_section(d=100, b=200, t=6, r_out=12, n_r=N_R), 0.8)
    yield ("CHS 168.3x8",
           {"kind": "chs", "diameter_mm": 168.3, "wall_mm": 8},
           ss.circular_hollow_section(d=168.3, t=8, n=N_CIRCLE).shift_section(84.15, 84.15), 1.0)
    yield ("equal angle 100x100x10 r1=12 r2=6",
           {"kind": "angle", "depth_mm": 100, "width_mm": 100, "thickness_mm": 10,
            "root_radius_mm": 12, "toe_radius_mm": 6},
           ss.angle_section(d=100, b=100, t=10, r_r=12, r_t=6, n_r=N_R), 0.8)
    yield ("unequal angle 150x90x10 r1=12 r2=6",
           {"kind": "angle", "depth_mm": 150, "width_mm": 90, "thickness_mm": 10,
            "root_radius_mm": 12, "toe_radius_mm": 6},
           ss.angle_section(d=150, b=90, t=10, r_r=12, r_t=6, n_r=N_R), 0.8)
    yield ("parallel-flange channel 200x90x14x7 r12",
           {"kind": "channel", "depth_mm": 200, "width_mm": 90, "flange_mm": 14, "web_mm": 7,
            "root_radius_mm": 12},
           ss.channel_section(d=200, b=90, t_f=14, t_w=7, r=12, n_r=N_R), 1.0)
    yield ("tee 100x200x15x9 r18 (half of HE 200 B)",
           {"kind": "tee", "depth_mm": 100, "width_mm": 200, "flange_mm": 15, "web_mm": 9,
            "root_radius_mm": 18},
           ss.tee_section(d=100, b=200, t_f=15, t_w=9, r=18, n_r=N_R), 1.0)
    yield ("tee 150x100x10x8 r10",
           {"kind": "tee", "depth_mm": 150, "width_mm": 100, "flange_mm": 10, "web_mm": 8,
            "root_radius_mm": 10},
           ss.tee_section(d=150, b=100, t_f=10, t_w=8, r=10, n_r=N_R), 0.8)
    yield ("cold-formed SHS 100x100x5 ro10 (EN 10219 corner rule)",
           {"kind": "rhs", "depth_mm": 100, "width_mm": 100, "wall_mm": 5, "outer_radius_mm": 10,
            "make": "cold-formed"},
           ss.rectangular_hollow_section(d=100, b=100, t=5, r_out=10, n_r=N_R), 0.5)
    yield ("unequal angle 200x100x15 r1=15 r2=7.5",
           {"kind": "angle", "depth_mm": 200, "width_mm": 100, "thickness_mm": 15,
            "root_radius_mm": 15, "toe_radius_mm": 7.5},
           ss.angle_section(d=200, b=100, t=15, r_r=15, r_t=7.5, n_r=N_R), 1.5)
    yield ("sharp channel 150x75x10x6 (no root radius)",
           {"kind": "channel", "depth_mm": 150, "width_mm": 75, "flange_mm": 10, "web_mm": 6,
            "root_radius_mm": 0},
           ss.channel_section(d=150, b=75, t_f=10, t_w=6, r=0, n_r=1), 0.8)
    yield ("round bar 60",
           {"kind": "round", "diameter_mm": 60},
           ps.circular_section(d=60, n=N_CIRCLE).shift_section(30, 30), 0.8)
    yield ("solid rectangle 100x40",
           {"kind": "rect", "depth_mm": 100, "width_mm": 40},
           ps.rectangular_section(d=100, b=40), 2.0)


def analyse(name, spec, geom, mesh):
    geom.create_mesh(mesh_sizes=[mesh])
    sec = Section(geom)
    sec.calculate_geometric_properties()
    sec.calculate_warping_properties()
    sec.calculate_plastic_properties()
    cx, cy = sec.get_c()
    ixx, iyy, ixy = sec.get_ic()
    i11, i22 = sec.get_ip()
    phi = sec.get_phi()
    x_se, y_se = sec.get_sc()
    zxx_p, zxx_m, zyy_p, zyy_m = sec.get_z()
    z11_p, z11_m, z22_p, z22_m = sec.get_zp()
    sxx, syy = sec.get_s()
    s11, s22 = sec.get_sp()
    n_el = len(sec.mesh["triangles"])
    out = {
        "name": name,
        "spec": spec,
        "mesh_max_area_mm2": mesh,
        "elements": n_el,
        "area_mm2": sec.get_area(),
        "centroid_y_mm": cx,
        "centroid_z_mm": cy,
        "i_y_mm4": ixx,
        "i_z_mm4": iyy,
        "i_yz_mm4": ixy,
        "i_11_mm4": i11,
        "i_22_mm4": i22,
        "phi_deg": phi,
        "w_el_y_mm3": min(zxx_p, zxx_m),
        "w_el_z_mm3": min(zyy_p, zyy_m),
        "w_el_11_mm3": min(z11_p, z11_m),
        "w_el_22_mm3": min(z22_p, z22_m),
        "w_pl_y_mm3": sxx,
        "w_pl_z_mm3": syy,
        "w_pl_11_mm3": s11,
        "w_pl_22_mm3": s22,
        "torsion_mm4": sec.get_j(),
        "warping_mm6": sec.get_gamma(),
        "shear_centre_y_mm": x_se,
        "shear_centre_z_mm": y_se,
    }
    print(f"{name}: {n_el} elements, A={out['area_mm2']:.2f} J={out['torsion_mm4']:.4g} "
          f"Iw={out['warping_mm6']:.4g}", file=sys.stderr)
    return out


def main():
    results = [analyse(*c) for c in cases()]
    doc = {
        "source": f"{LIBRARY} {VERSION} (PyPI), finite-element cross-section analysis",
        "library": LIBRARY,
        "version": VERSION,
        "n_r": N_R,
        "n_circle": N_CIRCLE,
        "axes": "library x (horizontal) -> our y; library y (vertical) -> our z; "
                "positions from the library origin, which is the bottom-left corner "
                "of the bounding box for every builder used here (the CHS, which the "
                "library centres on the origin, is shifted by D/2 in both directions)",
        "cases": results,
    }
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "values.json")
    with open(path, "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()
