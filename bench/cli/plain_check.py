"""The plain-Python side of the command-line benchmark (bench/cli/run.sh):
reads a member file, evaluates the flexural-buckling formulas of each
member's method about both axes, and writes JSON results with id,
resistance and utilisation, as a script in a nightly job might.

usage: python3 plain_check.py MEMBERS.json > results.json

The formulas are the textbook forms of each method's flexural-buckling
check (written here from the standards' equations, as recalled; no fillets
or corner radii in the section properties, no classification, torsional
modes or warnings), so its figures are close to the engine's but not equal:
it is a yardstick of speed, not a reference."""

import json
import math
import sys

GRADES = {"S355": (355.0, 210000.0), "S355H": (355.0, 210000.0),
          "A992": (345.0, 200000.0), "350W": (350.0, 200000.0)}
TIMBER = {"GL28h": (28.0, 10400.0, 1.25)}  # f_c,0,k, E_0,05, gamma_M


def props(s):
    k = s["kind"]
    if k == "i":
        h, b, tf, tw = s["depth_mm"], s["width_mm"], s["flange_mm"], s["web_mm"]
        hw = h - 2 * tf
        a = 2 * b * tf + hw * tw
        iy = (b * h ** 3 - (b - tw) * hw ** 3) / 12
        iz = (2 * tf * b ** 3 + hw * tw ** 3) / 12
    elif k == "rhs":
        h, b, t = s["depth_mm"], s["width_mm"], s["wall_mm"]
        a = h * b - (h - 2 * t) * (b - 2 * t)
        iy = (b * h ** 3 - (b - 2 * t) * (h - 2 * t) ** 3) / 12
        iz = (h * b ** 3 - (h - 2 * t) * (b - 2 * t) ** 3) / 12
    elif k == "chs":
        d, t = s["diameter_mm"], s["wall_mm"]
        a = math.pi / 4 * (d ** 2 - (d - 2 * t) ** 2)
        iy = iz = math.pi / 64 * (d ** 4 - (d - 2 * t) ** 4)
    elif k == "rect":
        h, b = s["depth_mm"], s["width_mm"]
        a, iy, iz = h * b, b * h ** 3 / 12, h * b ** 3 / 12
    elif k == "round":
        d = s["diameter_mm"]
        a, iy = math.pi * d * d / 4, math.pi * d ** 4 / 64
        iz = iy
    else:
        a, iy, iz = s["area_mm2"], s["i_major_mm4"], s["i_minor_mm4"]
    return a, iy, iz


def en1993(a, r, l, fy, e, alpha):
    lam = l / r * math.sqrt(fy / e) / math.pi
    phi = 0.5 * (1 + alpha * (lam - 0.2) + lam * lam)
    chi = min(1.0, 1 / (phi + math.sqrt(max(phi * phi - lam * lam, 0.0))))
    return chi * a * fy / 1.0


def aisc(a, r, l, fy, e, factor):
    fe = math.pi ** 2 * e / (l / r) ** 2
    fcr = 0.658 ** (fy / fe) * fy if fy / fe <= 2.25 else 0.877 * fe
    return factor * fcr * a


def csa(a, r, l, fy, e, n):
    lam = l / r * math.sqrt(fy / (math.pi ** 2 * e))
    return 0.9 * a * fy * (1 + lam ** (2 * n)) ** (-1 / n)


def en1995(a, r, l, fc, e005, gm, beta):
    lrel = l / r / math.pi * math.sqrt(fc / e005)
    k = 0.5 * (1 + beta * (lrel - 0.3) + lrel * lrel)
    kc = min(1.0, 1 / (k + math.sqrt(k * k - lrel * lrel)))
    return kc * 0.8 * fc / gm * a


def perry(a, r, l, fy, e):
    se = math.pi ** 2 * e / (l / r) ** 2
    eta = (l / 1000) * (math.sqrt(3) * r) / (r * r)
    b = fy + (1 + eta) * se
    return 2 * fy * se / (b + math.sqrt(b * b - 4 * fy * se)) * a


def secant(a, r, l, fy, e):
    ecr2 = (l / 1000) * math.sqrt(3) * r / (r * r)
    lo, hi = 0.0, min(fy, math.pi ** 2 * e / (l / r) ** 2)
    for _ in range(60):
        s = 0.5 * (lo + hi)
        arg = l / (2 * r) * math.sqrt(s / e)
        peak = s * (1 + ecr2 / math.cos(arg)) if arg < math.pi / 2 else math.inf
        lo, hi = (s, hi) if peak <= fy else (lo, s)
    return lo * a


def resistance(m):
    a, iy, iz = props(m["section"])
    l = m["length_mm"]
    meth = m["method"]
    mat = m["material"]
    if "grade" in mat and mat["grade"] in TIMBER:
        fc, e005, gm = TIMBER[mat["grade"]]
        return min(en1995(a, math.sqrt(i / a), l, fc, e005, gm, 0.1) for i in (iy, iz)) / 1000
    fy, e = GRADES[mat["grade"]] if "grade" in mat else (mat["fy_mpa"], mat["e_mpa"])
    kind = m["section"]["kind"]
    out = []
    for axis, i in (("y", iy), ("z", iz)):
        r = math.sqrt(i / a)
        if meth == "en1993-1-1":
            if kind == "i":
                alpha = 0.21 if axis == "y" else 0.34
            else:
                alpha = 0.21 if m["section"].get("make") == "hot-finished" else 0.49
            out.append(en1993(a, r, l, fy, e, alpha) / 1000)
        elif meth == "aisc360-lrfd":
            out.append(aisc(a, r, l, fy, e, 0.9) / 1000)
        elif meth == "aisc360-asd":
            out.append(aisc(a, r, l, fy, e, 1 / 1.67) / 1000)
        elif meth == "csa-s16":
            out.append(csa(a, r, l, fy, e, 1.34) / 1000)
        elif meth == "perry-robertson":
            out.append(perry(a, r, l, fy, e) / 1000)
        elif meth == "secant":
            out.append(secant(a, r, l, fy, e) / 1000)
        else:
            out.append(min(math.pi ** 2 * e * i / l ** 2, a * fy) / 1000)
    return min(out)


def main():
    with open(sys.argv[1]) as fh:
        members = json.load(fh)["members"]
    results = []
    for m in members:
        n_rd = resistance(m)
        results.append({"id": m["id"], "resistance_kn": n_rd,
                        "utilisation": m["axial_kn"] / n_rd})
    json.dump({"results": results}, sys.stdout)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
