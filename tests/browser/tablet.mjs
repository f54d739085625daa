// Browser tests of the tablet workspace (issue 20), registered by run.mjs:
// `register(test, helpers)`. On a landscape tablet (1180 x 820) the member
// being edited, its verdict and its chart are in view together while any
// field is typed in; upright (820 x 1180) and on a phone the compact
// verdict stays in view and the chart is one tap away; every control is
// finger-sized and number fields ask for the numeric keyboard. Each test
// leaves a screenshot in tests/browser/out/ to look at.

import assert from "node:assert/strict";
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { memberFile, pictureInks, seedStorage, STORAGE_KEY, workspaceText } from "./lib.mjs";

// A member-file key as the file writes it: words joined by "_", most
// ending in their unit (length_mm, fc0k_mpa, k_major, gamma_m1).
const FILE_KEY = /\b(?:[a-z0-9]+_)+(?:mm|mm2|mm3|mm4|mm6|kn|knm|mpa|major|minor|torsion|m1|class|duration|connection|restrained|level|lt|n)\b/;

const LANDSCAPE = { viewport: { width: 1180, height: 820 }, hasTouch: true, deviceScaleFactor: 1 };
const PORTRAIT = { viewport: { width: 820, height: 1180 }, isMobile: true, hasTouch: true, deviceScaleFactor: 1 };
const PHONE = { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 1 };

/** Where an element is, and whether it lies wholly inside the viewport. */
async function placed(page, selector) {
  return page.evaluate((sel) => {
    const el = document.querySelector(sel);
    if (!el) return null;
    const r = el.getBoundingClientRect();
    const inside =
      r.width > 0 && r.height > 0 && r.top >= -0.5 && r.left >= -0.5 &&
      r.bottom <= window.innerHeight + 0.5 && r.right <= window.innerWidth + 0.5;
    // The element on top at its centre is it or inside it (not covered).
    const top = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
    const onTop = Boolean(top && (top === el || el.contains(top)));
    return { top: r.top, bottom: r.bottom, left: r.left, right: r.right, inside, onTop };
  }, selector);
}

/** The chart's marker and the verdict's figures, to see them change. */
async function shown(page) {
  return page.evaluate(() => ({
    util: document.querySelector("[data-testid=result-utilisation]")?.textContent?.trim() ?? null,
    governs: document.querySelector("[data-testid=result-governing]")?.textContent?.trim() ?? null,
    marker: ((d) => (d ? `${d.markerPx} ${d.markerStressMpa} ${d.markerSlenderness}` : null))(
      document.querySelector("canvas#envelope")?.dataset,
    ),
  }));
}

/** Types `value` into the field `name` as a person would (focus, select
 * all, type), and waits until the verdict and the chart's marker both
 * show a new result. Returns the results before and after. */
async function typeAndWatch(page, name, value) {
  const field = page.locator(`form.editor [name="${name}"]`).first();
  await field.tap().catch(() => field.click());
  await field.focus();
  const before = await shown(page);
  // Select the whole text (a key chord after a tap did not always take on
  // the emulated phone: the value was then typed in front of the old one,
  // which the verdict used to hide by keeping the last readable result).
  await field.selectText();
  const whole = await field.evaluate((el) => el.selectionStart === 0 && el.selectionEnd === el.value.length);
  assert.ok(whole, `the text of ${name} is not wholly selected before typing`);
  await page.keyboard.type(String(value));
  await page.waitForFunction(
    (b) => {
      const u = document.querySelector("[data-testid=result-utilisation]")?.textContent?.trim();
      const d = document.querySelector("canvas#envelope")?.dataset;
      const m = d ? `${d.markerPx} ${d.markerStressMpa} ${d.markerSlenderness}` : null;
      return u !== b.util && m !== b.marker;
    },
    before,
    { timeout: 10_000 },
  );
  // The frame after the change, as the person sees it.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  const after = await shown(page);
  const focused = await page.evaluate(() => document.activeElement?.getAttribute("name"));
  assert.equal(focused, name, `the field ${name} keeps the focus while typing`);
  return { before, after };
}

/** Fails unless the verdict, the canvas and the focused field are all in
 * the viewport and none is covered. */
async function allInView(page, name, what) {
  const verdict = await placed(page, "[data-testid=verdict] .verdict");
  const canvas = await placed(page, "canvas#envelope");
  const field = await placed(page, `form.editor [name="${name}"]`);
  assert.ok(verdict?.inside && verdict.onTop, `${what}: the verdict is not wholly in view: ${JSON.stringify(verdict)}`);
  assert.ok(canvas?.inside && canvas.onTop, `${what}: the chart is not wholly in view: ${JSON.stringify(canvas)}`);
  assert.ok(field?.inside && field.onTop, `${what}: the field ${name} is not in view or is covered: ${JSON.stringify(field)}`);
}

/** The warnings of the result's head that a person would see cut: each
 * visible line item must lie wholly inside every box around it that
 * clips (up to the head) and inside the viewport, and no list may hold
 * more than its box shows. Returns what is cut (empty when nothing is). */
async function clippedWarnings(page) {
  return page.evaluate(() => {
    const cut = [];
    const head = document.querySelector("[data-testid=result-head]");
    if (!head) return ["no result head"];
    const within = (r, b) => r.top >= b.top - 0.5 && r.bottom <= b.bottom + 0.5 && r.left >= b.left - 0.5 && r.right <= b.right + 0.5;
    for (const list of head.querySelectorAll(".warnings")) {
      if (list.getClientRects().length === 0) continue;
      if (list.scrollHeight > list.clientHeight + 1) {
        cut.push(`the list holds ${list.scrollHeight} px in a box of ${list.clientHeight} px`);
      }
      for (const li of list.querySelectorAll("li")) {
        const r = li.getBoundingClientRect();
        if (r.height === 0) continue;
        const what = li.textContent.trim().slice(0, 50);
        for (let el = li.parentElement; el; el = el.parentElement) {
          const s = getComputedStyle(el);
          if (s.overflowY !== "visible" && !within(r, el.getBoundingClientRect())) {
            cut.push(`"${what}" is cut by ${el.tagName.toLowerCase()}.${el.className}`);
          }
          if (el === head) break;
        }
        if (!within(r, { top: 0, left: 0, bottom: window.innerHeight, right: window.innerWidth })) {
          cut.push(`"${what}" runs past the screen`);
        }
      }
    }
    return cut;
  });
}

// An invented member with four warnings: a single angle of a made-up
// orchard gate truss, checked to AISC 360-16 through its centroid with
// small end moments (the angle through its centroid, the checks left out,
// the sign of an angle's moments, the frame's sway not worked).
const GATE_ANGLE = {
  id: "OG-3",
  section: { kind: "angle", depth_mm: 100, width_mm: 75, thickness_mm: 8 },
  material: { grade: "S355" },
  length_mm: 2500,
  axial_kn: 60,
  method: "aisc360-lrfd",
  m_major_a_knm: 2,
  m_major_b_knm: -1,
};

/** The calc sheet's chart picture of the member open ([`pictureInks`]). */
async function sheetChart(page) {
  const img = page.locator("[data-testid=calc-sheet] img.sheet-chart").first();
  await img.waitFor({ state: "attached", timeout: 10_000 });
  return pictureInks(img);
}

/** Fails unless the sheet's chart is a real picture: drawn at least 600
 * CSS px wide at 2 device px each, shown at least 300 px wide, with ink. */
function realChart(chart, where) {
  assert.ok(chart.natural[0] >= 1200 && chart.natural[1] >= 600, `${where}: the sheet's chart is drawn ${chart.natural.join(" x ")} px`);
  assert.ok(chart.shown[0] >= 300 && chart.shown[1] >= 150, `${where}: the sheet's chart is shown ${chart.shown.join(" x ")} px`);
  assert.ok(chart.ink > 0.01, `${where}: the sheet's chart has ${(chart.ink * 100).toFixed(2)} % ink`);
}

// An invented beam-column whose titles are long: a rolled W-shape leg of a
// made-up yard portal, AISC 360-16, moments about its major axis only (so
// the minor panel assumes a uniform moment and holds the major one).
const PORTAL_LEG = {
  id: "YP-2",
  section: { kind: "catalogue", designation: "W10X49" },
  material: { grade: "A992" },
  length_mm: 4267.2,
  axial_kn: 1334.5,
  method: "aisc360-lrfd",
  m_major_a_knm: 160,
  m_major_b_knm: -80,
};

// The first member of the app's demo as a new member starts (a small
// solid bar, Euler): its two markers lie close together.
const NEW_BAR = {
  id: "NB-1",
  section: { kind: "rect", depth_mm: 100, width_mm: 60 },
  material: { fy_mpa: 275, e_mpa: 210000 },
  length_mm: 2500,
  axial_kn: 150,
  method: "euler",
};

/** What is wrong with the words of a chart (a canvas or the sheet's
 * picture): the boxes it recorded (data-text-boxes, CSS px) that leave it,
 * overlap each other, or cover a mark (data-mark-boxes). Empty when
 * nothing is. */
async function wordsClash(locator) {
  return locator.evaluate((el) => {
    const parse = (t) => (t ?? "").split(";").filter(Boolean).map((b) => b.split(",").map(Number));
    const text = parse(el.dataset.textBoxes);
    const marks = parse(el.dataset.markBoxes);
    const [w, h] = el.tagName === "IMG" ? [el.getAttribute("width"), el.getAttribute("height")].map(Number) : [el.clientWidth, el.clientHeight];
    const out = [];
    if (text.length < 3) out.push(`only ${text.length} text boxes recorded`);
    const e = 0.5;
    const overlap = (a, b) => a[0] + e < b[0] + b[2] && b[0] + e < a[0] + a[2] && a[1] + e < b[1] + b[3] && b[1] + e < a[1] + a[3];
    text.forEach((a, i) => {
      if (a[0] < -e || a[1] < -e || a[0] + a[2] > w + e || a[1] + a[3] > h + e) out.push(`box ${i} ${a} leaves the ${w} x ${h} chart`);
      text.forEach((b, j) => { if (j > i && overlap(a, b)) out.push(`boxes ${i} ${a} and ${j} ${b} overlap`); });
      marks.forEach((m, j) => { if (overlap(a, m)) out.push(`box ${i} ${a} covers mark ${j} ${m}`); });
    });
    return out;
  });
}

export function register(test, { withApp, open, OUT }) {
  for (const [label, options] of [["landscape", LANDSCAPE], ["portrait", PORTRAIT]]) {
    const { width, height } = options.viewport;
    test(`tablet-${label}-warnings-whole`, async () => {
      await withApp(`tablet-${label}-warnings-whole`, async (page, _log, context) => {
        await seedStorage(context, workspaceText([memberFile("Orchard gate", [GATE_ANGLE])]));
        await open(page);
        await page.locator(`[data-testid=member-row][data-id="${GATE_ANGLE.id}"] .row-main`).first().click();
        await page.locator("[data-testid=result-utilisation]").first().waitFor();
        const all = page.locator("#all-warnings li");
        await all.first().waitFor({ state: "attached", timeout: 10_000 });
        const total = await all.count();
        assert.ok(total >= 3, `${total} warnings: the member should have 3 or more`);
        for (const units of ["SI", "US"]) {
          if (units === "US") {
            await page.click("[data-testid=units-toggle]");
            await page.waitForFunction(() => /kip/.test(document.querySelector("[data-testid=verdict]")?.textContent ?? ""));
          }
          // The frame after the change, as the person sees it (the head is
          // fitted in a frame).
          await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
          const where = `${width} x ${height}, ${units}`;
          assert.deepEqual(await clippedWarnings(page), [], `${where}: a warning is cut`);
          const headItems = page.locator("[data-testid=result-head] [data-testid=warnings] li");
          if (label === "landscape") {
            // The warnings that fit whole in the head, then a fold that
            // shows them all; the verdict and the chart stay in view.
            const visible = await headItems.evaluateAll((els) => els.filter((e) => e.getClientRects().length > 0).length);
            const more = page.locator("[data-testid=warnings-more]");
            const inView = async (when, chart) => {
              const verdict = await placed(page, "[data-testid=verdict] .verdict");
              assert.ok(verdict?.inside && verdict.onTop, `${where}, ${when}: the verdict left the view: ${JSON.stringify(verdict)}`);
              if (chart) {
                const canvas = await placed(page, "canvas#envelope");
                assert.ok(canvas?.inside && canvas.onTop, `${where}, ${when}: the chart left the view: ${JSON.stringify(canvas)}`);
              }
              assert.equal(await page.evaluate(() => document.scrollingElement.scrollTop), 0, `${where}, ${when}: the page scrolled`);
            };
            await inView("with the warnings", true);
            await page.screenshot({ path: join(OUT, `tablet-warnings-${width}x${height}-${units}.png`) });
            if (visible < total) {
              const words = (await more.innerText()).trim();
              const none = total === 1 ? "▾ 1 warning: show it" : `▾ ${total} warnings: show them`;
              assert.equal(words, visible === 0 ? none : `▾ ${total - visible} more warning${total - visible === 1 ? "" : "s"}: show all ${total}`, where);
              // Opened: the full list in the chart's place, under the
              // verdict, which stays in view; each warning can be read whole.
              await more.click();
              assert.equal(await page.locator("canvas#envelope").isVisible(), false, `${where}: the chart gives way`);
              assert.equal(await page.locator("#all-warnings").isVisible(), true, `${where}: the full list is shown`);
              await page.screenshot({ path: join(OUT, `tablet-warnings-${width}x${height}-${units}-all.png`) });
              for (let i = 0; i < total; i += 1) {
                const item = all.nth(i);
                await item.scrollIntoViewIfNeeded();
                const whole = await item.evaluate((li) => {
                  const r = li.getBoundingClientRect();
                  const box = li.closest(".result-more").getBoundingClientRect();
                  return r.height > 0 && r.top >= box.top - 0.5 && r.bottom <= box.bottom + 0.5 && r.bottom <= window.innerHeight;
                });
                assert.ok(whole, `${where}, opened: warning ${i + 1} cannot be seen whole`);
                await inView(`opened, warning ${i + 1}`, false);
              }
              await more.click();
              await inView("closed again", true);
              assert.deepEqual(await clippedWarnings(page), [], `${where}, closed again: a warning is cut`);
            } else {
              assert.equal(await more.isVisible(), false, `${where}: the fold shows with every warning in view`);
            }
            // The check finds a cut line: the box as it was (4.2 rem,
            // scrolling) with every warning in it.
            await page.evaluate(() => {
              const list = document.querySelector("[data-testid=result-head] [data-testid=warnings]");
              const copy = list.cloneNode(false);
              for (const li of document.querySelectorAll("#all-warnings li")) copy.append(li.cloneNode(true));
              copy.style.maxHeight = "4.2rem";
              copy.style.overflow = "auto";
              copy.dataset.testid = "old-box";
              list.after(copy);
            });
            const cut = await clippedWarnings(page);
            await page.evaluate(() => document.querySelector("[data-testid=old-box]").remove());
            assert.ok(cut.some((c) => /box of|cut by ul/.test(c)), `${where}: the check did not see the old 4.2 rem box cut a warning: ${JSON.stringify(cut)}`);
            assert.deepEqual(await clippedWarnings(page), [], `${where}: a warning is cut after the check's own test`);
          } else {
            // Upright, the docked head keeps no warnings; all of them are
            // in the result under it, whole, the verdict still docked.
            assert.equal(await headItems.first().isVisible(), false, `${where}: the docked head shows warnings`);
            assert.equal(await page.locator("[data-testid=warnings-more]").isVisible(), false, `${where}: the link shows upright`);
            const last = all.last();
            await last.scrollIntoViewIfNeeded();
            assert.equal(await all.count(), total);
            for (let i = 0; i < total; i += 1) assert.ok(await all.nth(i).isVisible(), `${where}: warning ${i + 1} hidden`);
            const verdict = await placed(page, "[data-testid=verdict] .verdict");
            assert.ok(verdict?.inside, `${where}: the verdict left the view: ${JSON.stringify(verdict)}`);
            const item = await placed(page, "#all-warnings li:last-child");
            assert.ok(item?.inside && item.onTop, `${where}: the last warning is not wholly in view above the dock: ${JSON.stringify(item)}`);
            await page.screenshot({ path: join(OUT, `tablet-warnings-${width}x${height}-${units}.png`) });
          }
        }
      }, options);
    });
  }

  test("tablet-landscape-edit-in-view", async () => {
    await withApp("tablet-landscape-edit-in-view", async (page) => {
      await open(page);
      await page.locator("[data-testid=member-row]").first().click();
      await page.locator("[data-testid=result-utilisation]").first().waitFor();
      await page.locator("canvas#envelope[data-marker-px]").waitFor({ timeout: 10_000 });
      // A field near the top, one near the foot of the editor, the load.
      for (const [name, value] of [["length_mm", "3900"], ["axial_kn", "60,5"], ["length_mm", "2400"]]) {
        const { before, after } = await typeAndWatch(page, name, value);
        assert.notEqual(after.util, before.util);
        await allInView(page, name, `1180 x 820, typing in ${name}`);
      }
      const scrolled = await page.evaluate(() => document.scrollingElement.scrollTop);
      assert.equal(scrolled, 0, "the page itself did not scroll");
      await page.screenshot({ path: join(OUT, "tablet-1180x820.png") });
      // High contrast keeps the same arrangement.
      await page.locator("[data-testid=contrast-toggle]").click();
      await allInView(page, "length_mm", "1180 x 820, high contrast");
      await page.screenshot({ path: join(OUT, "tablet-1180x820-contrast.png") });
    }, LANDSCAPE);
  });

  for (const [label, options] of [["tablet-portrait", PORTRAIT], ["phone-portrait", PHONE]]) {
    const { width, height } = options.viewport;
    test(`${label}-edit-in-view`, async () => {
      await withApp(`${label}-edit-in-view`, async (page) => {
        await open(page);
        // Nothing widens the page past the screen (a wider page is zoomed
        // out and its fixed dock no longer lies where it is drawn).
        const wide = await page.evaluate(() => document.documentElement.scrollWidth);
        assert.ok(wide <= width, `${width} x ${height}: the page is ${wide} px wide`);
        await page.locator("[data-testid=member-row] .row-main").first().tap();
        await page.locator("[data-testid=result-utilisation]").first().waitFor();
        // The compact verdict is docked in view before anything is opened.
        const docked = await placed(page, "[data-testid=verdict] .verdict");
        assert.ok(docked?.inside, `${width} x ${height}: the verdict is not in view: ${JSON.stringify(docked)}`);
        assert.equal(await page.locator("canvas#envelope").isVisible(), false, "the chart waits for its tap");
        // The chart, one tap away.
        const toggle = page.locator("[data-testid=chart-toggle]");
        await toggle.tap();
        assert.equal(await toggle.getAttribute("aria-expanded"), "true");
        await page.locator("canvas#envelope[data-marker-px]").waitFor({ timeout: 10_000 });
        for (const [name, value] of [["axial_kn", "140"], ["length_mm", "3300"]]) {
          const { before, after } = await typeAndWatch(page, name, value);
          assert.notEqual(after.util, before.util);
          await allInView(page, name, `${width} x ${height}, typing in ${name}`);
        }
        // Compact: utilisation, holds or exceeds, governing mode.
        const verdict = await page.locator("[data-testid=verdict] .verdict").innerText();
        assert.match(verdict, /holds|exceeds/i, verdict);
        assert.ok((await page.locator("[data-testid=result-governing]").innerText()).trim().length > 0);
        await page.screenshot({ path: join(OUT, `${label}-${width}x${height}.png`) });
        await toggle.tap();
        assert.equal(await page.locator("canvas#envelope").isVisible(), false, "the chart folds away again");
      }, options);
    });
  }

  test("touch-sized-controls-and-numeric-keyboard", async () => {
    await withApp("touch-sized-controls-and-numeric-keyboard", async (page) => {
      await open(page);
      await page.locator("[data-testid=member-row] .row-main").first().tap();
      await page.locator("[data-testid=result-utilisation]").first().waitFor();
      await page.locator("[data-testid=chart-toggle]").tap();
      const small = await page.evaluate(() => {
        const out = [];
        const seen = (el) => {
          const r = el.getBoundingClientRect();
          const s = getComputedStyle(el);
          return r.width > 0 && r.height > 0 && s.visibility !== "hidden";
        };
        for (const el of document.querySelectorAll("button, select, input, summary, a[href]")) {
          if (!seen(el) || el.type === "hidden") continue;
          // A box inside its label: the label is what the finger hits.
          const target = el.type === "checkbox" && el.closest("label") ? el.closest("label") : el;
          const r = target.getBoundingClientRect();
          const wide = el.tagName === "INPUT" && el.type !== "checkbox" ? 44 : r.width;
          if (r.height < 43.5 || wide < 43.5) {
            out.push(`${el.tagName.toLowerCase()}[${el.name || el.dataset.testid || el.textContent.trim().slice(0, 30)}] ${Math.round(r.width)}x${Math.round(r.height)}`);
          }
        }
        return out;
      });
      assert.deepEqual(small, [], "controls smaller than 44 px");
      const keyboards = await page.evaluate(() =>
        [...document.querySelectorAll("form.editor input[type=text]")].map((i) => [i.name, i.getAttribute("inputmode")]),
      );
      const words = new Set(["id", "note", "grade", "designation"]);
      for (const [name, mode] of keyboards) {
        assert.equal(mode ?? "text", words.has(name) ? "text" : "decimal", `the field ${name} asks for the ${mode} keyboard`);
      }
      assert.ok(keyboards.some(([n]) => n === "axial_kn"), "the editor was found");
      const hover = await page.evaluate(() => {
        const rules = [];
        for (const sheet of document.styleSheets) {
          for (const r of sheet.cssRules) if (/:hover/.test(r.cssText)) rules.push(r.cssText.slice(0, 80));
        }
        return rules;
      });
      assert.deepEqual(hover, [], "nothing is shown on hover only");
    }, PORTRAIT);
  });

  for (const [label, options] of [["landscape", LANDSCAPE], ["portrait", PORTRAIT]]) {
    const { width, height } = options.viewport;
    test(`chart-words-apart-${label}`, async () => {
      await withApp(`chart-words-apart-${label}`, async (page, _log, context) => {
        await seedStorage(context, workspaceText([memberFile("Yard portal", [PORTAL_LEG, NEW_BAR])]));
        await open(page);
        if (label === "portrait") await page.click("[data-testid=chart-toggle]");
        const canvas = page.locator("canvas#envelope");
        for (const [id, kind] of [[PORTAL_LEG.id, "interaction"], [NEW_BAR.id, "slenderness"]]) {
          for (const units of ["SI", "US"]) {
            await page.locator(`[data-testid=member-row][data-id="${id}"] .row-main`).first().click();
            if (units === "US") await page.click("[data-testid=units-toggle]");
            await page.locator(`canvas#envelope[data-chart=${kind}]`).waitFor({ timeout: 15_000 });
            await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
            const where = `${id} at ${width} x ${height}, ${units}`;
            assert.deepEqual(await wordsClash(canvas), [], `${where}: the chart's words`);
            await canvas.screenshot({ path: join(OUT, `chart-words-${id}-${width}x${height}-${units}.png`) });
            await page.click("[data-testid=open-sheet]");
            const img = page.locator("[data-testid=calc-sheet] img.sheet-chart").first();
            await img.waitFor({ state: "attached" });
            assert.deepEqual(await wordsClash(img), [], `${where}: the sheet's chart's words`);
            if (label === "landscape") await img.screenshot({ path: join(OUT, `chart-words-${id}-sheet-${units}.png`) });
            await page.click("[data-testid=close-sheet]");
            if (units === "US") await page.click("[data-testid=units-toggle]");
          }
        }
      }, options);
    });
  }

  test("calc-sheet-chart-when-folded", async () => {
    await withApp("calc-sheet-chart-when-folded", async (page) => {
      await open(page);
      // Upright, the chart starts folded away.
      await page.locator("[data-testid=result-utilisation]").first().waitFor();
      assert.equal(await page.locator("[data-testid=chart-toggle]").getAttribute("aria-expanded"), "false");
      assert.equal(await page.locator("canvas#envelope").isVisible(), false, "820 x 1180: the chart starts folded");
      await page.click("[data-testid=open-sheet]");
      realChart(await sheetChart(page), "820 x 1180, chart folded");
      await page.screenshot({ path: join(OUT, "calc-sheet-chart-folded-820x1180.png"), fullPage: false });
      await page.click("[data-testid=close-sheet]");
      // Turned to landscape, the sheet opened and closed, turned back
      // upright and opened again: the chart is still whole.
      await page.setViewportSize({ width: 1180, height: 820 });
      await page.locator("canvas#envelope").waitFor({ state: "visible" });
      await page.click("[data-testid=open-sheet]");
      realChart(await sheetChart(page), "1180 x 820");
      await page.click("[data-testid=close-sheet]");
      await page.setViewportSize({ width: 820, height: 1180 });
      await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
      await page.click("[data-testid=open-sheet]");
      realChart(await sheetChart(page), "turned back to 820 x 1180");
      // Printed, the picture keeps its size.
      await page.emulateMedia({ media: "print" });
      realChart(await sheetChart(page), "printed");
      await page.emulateMedia({ media: "screen" });
    }, PORTRAIT);
  });

  test("calc-sheet-speaks-symbols-not-keys", async () => {
    await withApp("calc-sheet-speaks-symbols-not-keys", async (page) => {
      await open(page);
      for (const units of ["SI", "US"]) {
        if (units === "US") await page.click("[data-testid=units-toggle]");
        await page.click("[data-testid=open-sheet]");
        const sheet = page.locator("[data-testid=calc-sheet] > div").last();
        await sheet.locator("[data-testid=sheet-page]").first().waitFor();
        const text = await sheet.innerText();
        const key = text.match(FILE_KEY);
        assert.equal(key, null, `${units}: the calc sheet shows the file key "${key?.[0]}" in "${key ? text.slice(Math.max(0, key.index - 80), key.index + 40) : ""}"`);
        const inputs = await sheet.locator("[data-testid=sheet-inputs]").first().innerText();
        assert.match(inputs, /N_Ed\s*=\s*[\d.,]+ (kN|kip)/, `${units}: ${inputs}`);
        assert.match(inputs, /design compression/);
        if (units === "US") {
          assert.match(inputs, /L\s*=\s*[\d.]+ ft/, `US lengths in ft: ${inputs}`);
          assert.doesNotMatch(inputs, / mm\b| kN\b| MPa\b/, `US sheet shows SI units: ${inputs}`);
        } else {
          assert.match(inputs, /L\s*=\s*[\d.]+ mm/, inputs);
        }
        await page.click("[data-testid=close-sheet]");
      }
    });
  });

  test("calc-sheet-header-on-every-printed-page", async () => {
    const header = {
      sheet_job: "24-117 Ferry shed",
      sheet_prepared_by: "R. Amsel",
      sheet_checked_by: "T. Okafor",
      sheet_date: "2026-12-04",
      sheet_revision: "B",
    };
    await withApp("calc-sheet-header-on-every-printed-page", async (page) => {
      await open(page);
      const members = await page.locator("[data-testid=member-row]").count();
      await page.click("[data-testid=open-sheet]");
      const form = page.locator("[data-testid=sheet-header-form]");
      for (const [name, value] of Object.entries(header)) await form.locator(`[name=${name}]`).fill(value);
      await page.waitForFunction((j) => document.querySelector("[data-testid=sheet-job]")?.textContent === j, header.sheet_job);
      // Stored with the list, as the member file's "sheet" object.
      await page.waitForTimeout(600);
      const stored = JSON.parse(await page.evaluate((k) => localStorage.getItem(k), STORAGE_KEY));
      const sheet = stored.lists[stored.active].sheet;
      assert.deepEqual(sheet, {
        job: header.sheet_job,
        prepared_by: header.sheet_prepared_by,
        checked_by: header.sheet_checked_by,
        date: header.sheet_date,
        revision: header.sheet_revision,
      });
      // Printed: every page has the header, its number and the caution.
      await page.emulateMedia({ media: "print" });
      const pdf = await page.pdf({ format: "A4", printBackground: false });
      writeFileSync(join(OUT, "calc-sheet-header-A4.pdf"), pdf);
      const dir = mkdtempSync(join(tmpdir(), "strutline-pdf-"));
      try {
        const file = join(dir, "sheet.pdf");
        writeFileSync(file, pdf);
        const t = spawnSync("pdftotext", ["-layout", file, join(dir, "sheet.txt")], { encoding: "utf8" });
        assert.equal(t.status, 0, `pdftotext (poppler-utils) is needed: ${t.error?.message ?? t.stderr}`);
        const pages = readFileSync(join(dir, "sheet.txt"), "utf8").split("\f").filter((p) => p.trim() !== "");
        assert.ok(pages.length >= members + 1, `${pages.length} pages for a summary and ${members} members`);
        pages.forEach((p, i) => {
          for (const v of Object.values(header)) assert.ok(p.includes(v), `page ${i + 1} lacks "${v}":\n${p.slice(0, 600)}`);
          assert.match(p, new RegExp(`page ${i + 1} of ${pages.length}`), `page ${i + 1} has no "page ${i + 1} of ${pages.length}"`);
          assert.match(p, /checking aid/, `page ${i + 1} has no caution`);
        });
        // A printed page to look at.
        spawnSync("pdftoppm", ["-png", "-r", "70", "-f", "2", "-l", "2", file, join(OUT, "calc-sheet-page")]);
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
      await page.emulateMedia({ media: "screen" });
      await page.screenshot({ path: join(OUT, "calc-sheet-header.png") });
      // Still there after a reload, and in the exported member file.
      await page.reload({ waitUntil: "load" });
      await page.locator("[data-testid=caution]").first().waitFor();
      await page.click("[data-testid=open-sheet]");
      assert.equal(await page.locator("[data-testid=sheet-job]").textContent(), header.sheet_job);
      const [download] = await Promise.all([page.waitForEvent("download"), page.click("[data-testid=export-json]")]);
      const exported = JSON.parse(readFileSync(await download.path(), "utf8"));
      assert.equal(exported.sheet.checked_by, header.sheet_checked_by, "the exported member file carries the header");
    });
  });
}
