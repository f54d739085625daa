// Browser tests that what the page shows belongs to the member shown, as
// it stands now, registered by run.mjs: `register(test, helpers)`. A chart
// never keeps another member's point or an earlier value's under a member
// that is not checked.

import assert from "node:assert/strict";
import { join } from "node:path";
import { setField, waitForText } from "./lib.mjs";

const LANDSCAPE = { viewport: { width: 1180, height: 820 }, hasTouch: true, deviceScaleFactor: 1 };
const PORTRAIT = { viewport: { width: 820, height: 1180 }, isMobile: true, hasTouch: true, deviceScaleFactor: 1 };

/** A canvas as drawn: what it is marked as (`data-chart`), the buckled
 * shapes of the column drawing (`data-shapes`) and the share of its pixels
 * painted at all (a chart fills its background; a blank one holds a line
 * of words). */
async function canvasState(page, selector) {
  return page.evaluate((selector) => {
    const c = document.querySelector(selector);
    if (!c || c.width === 0 || c.height === 0) return null;
    const d = c.getContext("2d").getImageData(0, 0, c.width, c.height).data;
    let painted = 0;
    for (let i = 3; i < d.length; i += 4) if (d[i] > 0) painted += 1;
    return { chart: c.dataset.chart ?? null, shapes: c.dataset.shapes ?? null, painted: painted / (d.length / 4) };
  }, selector);
}

/** Waits until the result's chart is drawn as `chart` ("none": blank). */
async function chartIs(page, chart) {
  await page.waitForFunction((want) => {
    const d = document.querySelector("canvas#envelope")?.dataset.chart;
    return want === "none" ? d === "none" : d !== undefined && d !== "none";
  }, chart, { timeout: 10_000 });
}

export function register(test, { withApp, open, OUT }) {
  test("chart-only-of-the-member-shown", async () => {
    await withApp("chart-only-of-the-member-shown", async (page, log) => {
      await open(page);
      const first = page.locator(`[data-testid=member-row][data-id="C1"]`).first();
      await first.click();
      await chartIs(page, "drawn");
      const drawn = await canvasState(page, "canvas#envelope");
      assert.ok(drawn.painted > 0.5, `a chart fills its canvas: ${JSON.stringify(drawn)}`);

      // A new member asks for its load: no chart, no other member's point.
      await page.locator("[data-testid=add-member]").first().click();
      await page.locator("[data-testid=verdict]", { hasText: "fix input" }).first().waitFor({ timeout: 10_000 });
      await chartIs(page, "none");
      const blank = await canvasState(page, "canvas#envelope");
      assert.ok(blank.painted < 0.1, `the new member's canvas is blank but for its words: ${JSON.stringify(blank)}`);
      await page.screenshot({ path: join(OUT, "chart-new-member-blank.png") });

      // The member's own unreadable value: not the previous keystroke's point.
      await first.click();
      await chartIs(page, "drawn");
      await setField(page, page, "axial_kn", "2000");
      await chartIs(page, "drawn");
      await setField(page, page, "axial_kn", "abc");
      await page.locator("[data-testid=verdict]", { hasText: "fix input" }).first().waitFor({ timeout: 10_000 });
      await chartIs(page, "none");
      assert.ok((await canvasState(page, "canvas#envelope")).painted < 0.1);
      await setField(page, page, "axial_kn", "300");
      await chartIs(page, "drawn");

      // The column-model panel: a length that cannot be read is not
      // analysed, and nothing of the kept value is drawn.
      await page.locator("[data-testid=cm-toggle]").click();
      await page.waitForFunction(() => document.querySelector("[data-testid=cm-canvas]")?.dataset.shapes === "2", null, { timeout: 10_000 });
      await page.locator("#cm-seg-0-length").fill("abc");
      await page.locator("[data-testid=cm-refused]", { hasText: "Not analysed" }).waitFor({ timeout: 10_000 });
      const model = await canvasState(page, "[data-testid=cm-canvas]");
      assert.equal(model.shapes, "0", "no buckled shape while the length cannot be read");
      assert.equal(model.chart, "none");
      assert.equal(await page.locator("[data-testid=cm-result]").textContent().then((t) => /α_cr/.test(t)), false);
      assert.deepEqual(log.errors, []);
    }, LANDSCAPE);
  });

  // A column in a frame: G at its ends is the engineer's to give. Until
  // both are typed the member needs input, naming the field; no k is shown.
  test("frame-asks-for-g", async () => {
    await withApp("frame-asks-for-g", async (page, log) => {
      await open(page);
      await page.locator(`[data-testid=member-row][data-id="C1"]`).first().click();
      await page.locator("[data-testid=result-utilisation]").first().waitFor({ timeout: 10_000 });
      await page.locator('select[name="restraint_major"]').selectOption("frame");
      const verdict = page.locator("[data-testid=verdict]").first();
      await page.locator("[data-testid=verdict]", { hasText: "fix input" }).first().waitFor({ timeout: 10_000 });
      assert.match(await verdict.textContent(), /frame_major\.g_a: give G at end A/);
      assert.equal(await page.locator('[name="frame_major.g_a"]').inputValue(), "", "G at end A is not filled in for the engineer");
      assert.equal(await page.locator('[name="frame_major.g_b"]').inputValue(), "");
      assert.doesNotMatch(await page.locator("[data-testid=frame_major-k]").textContent(), /k = /);
      const row = page.locator(`[data-testid=member-row][data-id="C1"]`).first();
      assert.match(await row.textContent(), /fix input/);

      // One G typed: still asking, now for the other.
      await page.locator('[name="frame_major.g_a"]').fill("10");
      await page.locator("[data-testid=verdict]", { hasText: "frame_major.g_b" }).first().waitFor({ timeout: 10_000 });
      assert.match(await verdict.textContent(), /fix input/);

      // Both typed: checked, with the k they give (pinned base G = 10 and
      // G = 1 at the top of a sway frame: k about 1.9, common practice).
      await page.locator('[name="frame_major.g_b"]').fill("1");
      await page.locator("[data-testid=verdict]", { hasNotText: "fix input" }).first().waitFor({ timeout: 10_000 });
      const k = Number((await page.locator("[data-testid=frame_major-k]").textContent()).match(/k = ([\d.]+)/)[1]);
      assert.ok(k > 1.8 && k < 2.0, `k for G 10 and 1, sway: ${k}`);
      assert.deepEqual(log.errors, []);
    }, LANDSCAPE);
  });

  // Upright, the verdict is docked at the foot under whatever is in view:
  // it names the member it belongs to.
  test("docked-verdict-names-its-member", async () => {
    await withApp("docked-verdict-names-its-member", async (page, log) => {
      await open(page);
      for (const id of ["C1", "P1"]) {
        await page.locator(`[data-testid=member-row][data-id="${id}"] .row-main`).first().tap();
        const name = page.locator("[data-testid=verdict] [data-testid=verdict-member]").first();
        await waitForText(name, (t) => t.trim() === id);
        const box = await name.boundingBox();
        assert.ok(box && box.y >= 0 && box.y + box.height <= 1180, `the docked verdict's member name is on screen: ${JSON.stringify(box)}`);
        assert.match(await page.locator("[data-testid=verdict] .verdict-status").first().textContent(), new RegExp(`^${id} [✓✗]`));
      }
      await page.screenshot({ path: join(OUT, "docked-verdict-820x1180.png") });
      assert.deepEqual(log.errors, []);
    }, PORTRAIT);
  });

  // The column-model panel: no made-up load for a member whose design load
  // is not given (N_cr, not alpha_cr); each segment's buckling length named
  // by its segment, the governing one said; alpha_cr < 1 remarked on.
  test("column-model-says-what-it-shows", async () => {
    await withApp("column-model-says-what-it-shows", async (page, log) => {
      await open(page);
      await page.locator("[data-testid=add-member]").first().click();
      await page.locator("[data-testid=verdict]", { hasText: "fix input" }).first().waitFor({ timeout: 10_000 });
      await page.locator("[data-testid=cm-toggle]").click();
      const result = page.locator("[data-testid=cm-result]").first();
      await waitForText(result, (t) => /N_cr = /.test(t));
      let t = await result.textContent();
      assert.match(t, /design load N_Ed is not given/, t);
      assert.doesNotMatch(t, /α_cr = /, t);
      assert.match(t, /N_cr = [\d.,]+ kN \(a load at end B\)/, t);

      // The load given: alpha_cr on it.
      await setField(page, page, "axial_kn", "50");
      await waitForText(result, (x) => /α_cr = /.test(x));
      t = await result.textContent();
      assert.doesNotMatch(t, /not given/, t);
      assert.doesNotMatch(t, /< 1 about/, t);

      // Two segments: each one's buckling length by its number, and which governs.
      await page.locator("[data-testid=cm-add-segment]").click();
      await waitForText(result, (x) => /buckling lengths by segment from end A: 1 .*, 2 /.test(x));
      await waitForText(result, (x) => /Segment [12] of 2 governs the check/.test(x));

      // A load past the elastic critical load: said in the panel.
      await setField(page, page, "axial_kn", "50000");
      await waitForText(result, (x) => /α_cr = [\d.,]+ < 1 about the (major|minor) axis/.test(x));
      await page.screenshot({ path: join(OUT, "column-model-says-what-it-shows.png") });
      assert.deepEqual(log.errors, []);
    }, LANDSCAPE);
  });
}
