// Browser test of the moment diagram the editor draws (issue 16), registered
// by run.mjs: `register(test, helpers)`; run alone with `cargo xtask
// browser-test --only moment-diagram-sign`. Moments are typed into the
// editor's fields (end A, end B and span, about each axis); the drawn
// diagram is read back from the SVG itself (the polygon's heights against
// the axis line) and from the figure's data attributes, and both are held
// to the diagram the test works out on its own from the typed values,
// M(s) = M_a + (M_b - M_a) s + M_span 4 s (1 - s). The result must show the
// bending side (the bending table: the largest moment and a resistance per
// axis). Then end B's moment is flipped, as a sign slip would: the drawing
// must change from single to double curvature, and the result with it (a
// larger elastic critical moment under the moment gradient). The test
// fails if the diagram were drawn with the wrong sign (upside down, or an
// end's sign lost), since each drawn point's side of the line is checked.

import assert from "node:assert/strict";
import { join } from "node:path";
import { memberFields, setField, settled } from "./lib.mjs";

// An invented member: a wind post of a made-up rowing-club boat store, a
// rolled I of custom steel, EN 1993-1-1, 6 m between lateral restraints so
// lateral-torsional buckling is worked (C1 reflects the diagram).
const POST = {
  id: "RB-4",
  section: { kind: "i", depth_mm: 240, width_mm: 120, flange_mm: 9.8, web_mm: 6.2, root_radius_mm: 15 },
  material: { fy_mpa: 275, e_mpa: 210000 },
  length_mm: 6000,
  axial_kn: 0,
  method: "en1993-1-1",
};

// The moments typed, kNm: major axis end moments (no span load, so C1
// follows the end-moment ratio), minor axis end moments and a uniform
// span load.
const MAJOR = { a: 40, b: 25, span: 0 };
const MINOR = { a: 2, b: 3, span: 1.5 };

/** The diagram the test expects at s in [0, 1], from the typed values. */
function moment(m, s) {
  return m.a + (m.b - m.a) * s + m.span * 4 * s * (1 - s);
}

/** The largest |M(s)|, sampled finely. */
function largest(m) {
  let peak = 0;
  for (let i = 0; i <= 10_000; i++) peak = Math.max(peak, Math.abs(moment(m, i / 10_000)));
  return peak;
}

/** What is drawn for one axis: the figure's attributes, its caption and
 * the polygon's points with the axis line's height. */
async function drawn(page, axis) {
  return page.evaluate((axis) => {
    const fig = document.querySelector(`form.editor figure.moment-diagram[data-axis="${axis}"]`);
    if (!fig) return null;
    const line = fig.querySelector("svg line");
    const points = fig
      .querySelector("svg polygon")
      .getAttribute("points")
      .trim()
      .split(/\s+/)
      .map((p) => p.split(",").map(Number));
    return {
      curvature: fig.dataset.curvature,
      sign: fig.dataset.sign,
      changes: Number(fig.dataset.signChanges),
      caption: fig.querySelector("figcaption")?.textContent ?? "",
      mid: Number(line.getAttribute("y1")),
      x0: Number(line.getAttribute("x1")),
      x1: Number(line.getAttribute("x2")),
      points,
    };
  }, axis);
}

/** Fails unless every drawn point lies on the side of the axis line that
 * the typed moments give (positive drawn up: a smaller SVG y), and the
 * figure's words and attributes say the same curvature. */
function agrees(d, m, what) {
  assert.ok(d, `${what}: a diagram is drawn`);
  // The first and last points close the polygon on the axis line; the
  // samples lie between them.
  const samples = d.points.slice(1, -1);
  assert.ok(samples.length >= 10, `${what}: ${samples.length} samples`);
  const peak = largest(m);
  let above = false;
  let below = false;
  for (const [x, y] of samples) {
    const s = (x - d.x0) / (d.x1 - d.x0);
    const v = moment(m, s);
    // Points within 1 % of the peak of the line are not judged (rounding).
    if (Math.abs(v) < 0.01 * peak) continue;
    const up = y < d.mid;
    assert.equal(up, v > 0, `${what}: at s = ${s.toFixed(3)} M = ${v.toFixed(2)} kNm is drawn ${up ? "above" : "below"} the line (y ${y}, line ${d.mid})`);
    above ||= v > 0;
    below ||= v < 0;
  }
  // End A and end B: the drawn heights against the typed end moments.
  const [, ya] = samples[0];
  const [, yb] = samples[samples.length - 1];
  if (m.a !== 0) assert.equal(ya < d.mid, m.a > 0, `${what}: end A drawn on the side of M_a = ${m.a}`);
  if (m.b !== 0) assert.equal(yb < d.mid, m.b > 0, `${what}: end B drawn on the side of M_b = ${m.b}`);
  const expected = above && below ? "double" : "single";
  assert.equal(d.curvature, expected, `${what}: data-curvature`);
  assert.equal(d.sign, above && below ? "both" : above ? "positive" : "negative", `${what}: data-sign`);
  assert.ok(d.caption.includes(`${expected} curvature`), `${what}: caption "${d.caption}"`);
  if (expected === "single") assert.equal(d.changes, 0, `${what}: no sign change`);
  else assert.ok(d.changes >= 1, `${what}: ${d.changes} sign changes`);
}

/** The bending table of the result: per axis the largest moment, the
 * resistance and the elastic critical moment (null for a dash). */
async function bendingSide(page) {
  // The table is in the working, built after the frame.
  await settled(page);
  return page.evaluate(() => {
    const table = document.querySelector("[data-testid=bending]");
    if (!table) return null;
    const num = (t) => {
      const s = (t ?? "").trim().replace(/\s/g, "").replace(",", ".");
      return s === "—" || s === "" ? null : Number(s);
    };
    const out = {};
    for (const row of table.querySelectorAll("tbody tr")) {
      const cells = [...row.querySelectorAll("td")].map((c) => c.textContent);
      out[row.querySelector("th").textContent.trim()] = { m_ed: num(cells[0]), m_rd: num(cells[1]), m_cr: num(cells[2]) };
    }
    return out;
  });
}

export function register(test, { withApp, open, OUT }) {
  test("moment-diagram-sign", async () => {
    await withApp("moment-diagram-sign", async (page) => {
      await open(page);
      await page.locator("[data-testid=add-member]").first().click();
      const fold = page.locator("form.editor details.bending-input").first();
      if (!(await fold.evaluate((d) => d.open))) await fold.locator("summary").click();
      for (const [name, value] of memberFields(POST)) await setField(page, page, name, value);
      // The moment fields, per axis: end A, end B, span.
      for (const [axis, m] of [["major", MAJOR], ["minor", MINOR]]) {
        await setField(page, page, `m_${axis}_a_knm`, m.a);
        await setField(page, page, `m_${axis}_b_knm`, m.b);
        await setField(page, page, `m_${axis}_span_knm`, m.span);
      }
      await page.locator(`[data-testid=member-row][data-id="${POST.id}"]`).first().waitFor({ state: "visible", timeout: 10_000 });
      await page.locator('form.editor figure.moment-diagram[data-axis="minor"]').waitFor({ timeout: 10_000 });
      await page.locator("[data-testid=bending]").first().waitFor({ timeout: 10_000 });

      const major = await drawn(page, "major");
      agrees(major, MAJOR, "major as typed");
      assert.equal(major.curvature, "single", "40 and 25 kNm at the ends: single curvature");
      agrees(await drawn(page, "minor"), MINOR, "minor as typed");

      // The result shows the bending side, about each axis.
      const first = await bendingSide(page);
      assert.ok(first && first.major && first.minor, `bending table: ${JSON.stringify(first)}`);
      assert.ok(Math.abs(first.major.m_ed - largest(MAJOR)) < 0.05, `major M_Ed, the largest of M(s): ${first.major.m_ed}`);
      assert.ok(Math.abs(first.minor.m_ed - largest(MINOR)) < 0.05, `minor M_Ed ${first.minor.m_ed} vs ${largest(MINOR)}`);
      assert.ok(first.major.m_rd > 0 && first.minor.m_rd > 0, JSON.stringify(first));
      assert.ok(first.major.m_cr > 0, `lateral-torsional buckling worked: ${JSON.stringify(first.major)}`);
      await page.screenshot({ path: join(OUT, "moment-diagram-single.png") });

      // A sign slip: end B's moment flipped. The drawing turns to double
      // curvature, and the result follows the new diagram.
      const mCrCell = "[data-testid=bending] tbody tr:first-child td:nth-child(4)";
      const mCrBefore = await page.locator(mCrCell).first().textContent();
      const slipped = { ...MAJOR, b: -MAJOR.b };
      await setField(page, page, "m_major_b_knm", slipped.b);
      await page.waitForFunction(
        () => document.querySelector('form.editor figure.moment-diagram[data-axis="major"]')?.dataset.curvature === "double",
        null,
        { timeout: 10_000 },
      );
      const flipped = await drawn(page, "major");
      agrees(flipped, slipped, "major with end B flipped");
      assert.equal(flipped.curvature, "double");
      assert.notDeepEqual(flipped.points, major.points, "the drawing changed");
      agrees(await drawn(page, "minor"), MINOR, "minor unchanged");
      // The result follows: the major row's M_cr is redrawn.
      await page.waitForFunction(
        ([cell, before]) => {
          const t = document.querySelector(cell)?.textContent;
          return t && t !== before;
        },
        [mCrCell, mCrBefore],
        { timeout: 10_000 },
      );
      const second = await bendingSide(page);
      assert.ok(Math.abs(second.major.m_ed - largest(slipped)) < 0.05, `major M_Ed after the flip: ${second.major.m_ed}`);
      assert.ok(second.major.m_cr > first.major.m_cr, `M_cr rises under the moment gradient: ${first.major.m_cr} -> ${second.major.m_cr}`);
      await page.screenshot({ path: join(OUT, "moment-diagram-double.png") });
    });
  });
}
