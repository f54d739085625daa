// The browser tests of Strutline: `node tests/browser/run.mjs --url URL
// [--only NAME]`, normally through `cargo xtask browser-test`, which
// builds dist/, serves it and passes the URL. Each test runs in a fresh
// Chromium profile; a failing test leaves a screenshot in
// tests/browser/out/. The last line is "N passed, N failed"; the exit
// status is 1 when any test failed.

import assert from "node:assert/strict";
import { register as registerPicker } from "./picker.mjs";
import { register as registerListTools } from "./listtools.mjs";
import { register as registerTablet } from "./tablet.mjs";
import { register as registerBuckling } from "./buckling.mjs";
import { register as registerBeamColumn } from "./beamcolumn.mjs";
import { register as registerDiagram } from "./diagram.mjs";
import { register as registerCurrent } from "./current.mjs";
import { readFileSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { connect } from "node:net";
import { join } from "node:path";
import { gzipSync } from "node:zlib";
import {
  arg,
  cliCheck,
  ensureOut,
  firstPage,
  launch,
  memberFields,
  memberFile,
  parseUtilisation,
  setField,
  STORAGE_KEY,
  UNREADABLE_PREFIX,
  waitForText,
} from "./lib.mjs";

const URL_ARG = arg("--url");
if (!URL_ARG) {
  console.error("usage: node run.mjs --url http://127.0.0.1:PORT/ [--only NAME]");
  process.exit(2);
}
const BASE = new URL(URL_ARG);
const ONLY = arg("--only");
// The served build directory (this run's own, from cargo xtask
// browser-test); the update test rewrites its sw.js and restores it.
const DIST = arg("--dist");
// The size budget in bytes (xtask's dist::BUDGET_BYTES, passed by cargo
// xtask browser-test), which the first visit must stay within.
const BUDGET = Number(arg("--budget", "NaN"));
const OUT = ensureOut();

// An invented member for the typing tests: a rolled I column of a
// made-up boathouse gallery, custom steel, checked to EN 1993-1-1.
const TYPED = {
  id: "BH-7",
  section: { kind: "i", depth_mm: 220, width_mm: 160, flange_mm: 11, web_mm: 7, root_radius_mm: 12 },
  material: { fy_mpa: 355, e_mpa: 210000 },
  length_mm: 3400,
  axial_kn: 640,
  method: "en1993-1-1",
};

/** Fails listing each distinct console error once, with its count. */
function assertNoErrors(errors, what = "console errors") {
  const counts = new Map();
  for (const e of errors) counts.set(e, (counts.get(e) || 0) + 1);
  const lines = [...counts].map(([e, n]) => (n > 1 ? `${n} x ${e}` : e));
  assert.ok(lines.length === 0, `${what}:\n  ${lines.join("\n  ")}`);
}

const tests = [];
function test(name, fn) {
  tests.push({ name, fn });
}

/** Opens the app in a fresh profile, recording console errors, page
 * errors and every request; `fn(page, log)` runs the test. */
async function withApp(name, fn, options = {}) {
  const { context, close } = await launch(options);
  const log = { errors: [], requests: [] };
  context.on("request", (r) => log.requests.push(r.url()));
  const page = await firstPage(context);
  page.on("console", (m) => {
    if (m.type() === "error") log.errors.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => log.errors.push(`page error: ${e.message}`));
  try {
    await fn(page, log, context);
  } catch (e) {
    await page.screenshot({ path: join(OUT, `${name}-failed.png`), fullPage: true }).catch(() => {});
    throw e;
  } finally {
    await close();
  }
}

async function open(page) {
  await page.goto(BASE.href, { waitUntil: "load" });
  await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
}

/** Types `member` into the app the way a person would. */
async function typeMember(page, member) {
  await page.locator("[data-testid=add-member]").first().click();
  for (const [name, value] of memberFields(member)) {
    await setField(page, page, name, value);
  }
  await page
    .locator(`[data-testid=member-row][data-id="${member.id}"]`)
    .first()
    .waitFor({ state: "visible", timeout: 10_000 });
}

async function selectMember(page, id) {
  const row = page.locator(`[data-testid=member-row][data-id="${id}"]`).first();
  await row.click();
}

/** Waits for the service worker to be active and to control the page. */
async function waitForWorker(page) {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller) {
      await new Promise((resolve) => {
        navigator.serviceWorker.addEventListener("controllerchange", resolve, { once: true });
        setTimeout(resolve, 10_000);
      });
    }
  });
  const controlled = await page.evaluate(() => Boolean(navigator.serviceWorker.controller));
  assert.ok(controlled, "the service worker does not control the page");
}

test("loads-clean", async () => {
  await withApp("loads-clean", async (page, log) => {
    const warnings = [];
    page.on("console", (m) => {
      if (m.type() === "warning") warnings.push(m.text());
    });
    await open(page);
    // Give late module loads, the worker and its precache time to run.
    await page.waitForLoadState("networkidle");
    await page.screenshot({ path: join(OUT, "loads-clean.png"), fullPage: true });
    assert.ok(await page.locator("[data-testid=caution]").first().isVisible(), "caution not visible");
    assert.equal(await page.locator("#boot").count(), 0, "the loading text is still there");
    assertNoErrors(log.errors);
    const foreign = log.requests.filter((u) => {
      try {
        return new URL(u).origin !== BASE.origin;
      } catch {
        return true;
      }
    });
    assert.deepEqual(foreign, [], "requests to another origin");
    assert.ok(log.requests.length > 0, "no request was seen at all");
    // What the first visit took over the wire, measured by the browser:
    // the module arrives gzip-encoded, and the bytes of everything loaded
    // (the xtask server sends each file's zopfli .gz) stay within the size
    // budget, which `cargo xtask dist` counts as a standard host would
    // send the same files (gzip at zlib's best level).
    const sizes = await page.evaluate(() =>
      [...performance.getEntriesByType("navigation"), ...performance.getEntriesByType("resource")].map((e) => ({
        name: e.name,
        encoded: e.encodedBodySize,
        decoded: e.decodedBodySize,
      })),
    );
    const wasm = sizes.find((e) => e.name.endsWith("strutline_web_bg.wasm"));
    assert.ok(wasm, `the module is not among the loaded resources: ${JSON.stringify(sizes)}`);
    assert.ok(wasm.encoded > 0 && wasm.encoded < wasm.decoded / 2, `the module was not sent compressed: ${JSON.stringify(wasm)}`);
    // index.html preloads the module (and the glue) so that its download
    // starts while the page is parsed; the glue's fetch() must be handed
    // that response, not download the module a second time, and Chromium
    // warns about a preload it could not use.
    for (const file of ["strutline_web_bg.wasm", "strutline_web.js"]) {
      const loads = sizes.filter((e) => e.name.endsWith(`/${file}`)).length;
      assert.equal(loads, 1, `the page loaded ${file} ${loads} times: ${JSON.stringify(sizes)}`);
    }
    assert.deepEqual(warnings.filter((w) => /preload/i.test(w)), [], "a preload was not used");
    const total = sizes.reduce((n, e) => n + e.encoded, 0);
    assert.ok(Number.isFinite(BUDGET) && BUDGET > 0, "no --budget given (cargo xtask browser-test passes it)");
    assert.ok(total <= BUDGET, `the first visit took ${total} B, over the ${BUDGET} B budget`);
    console.log(`     first visit: ${total} B over the wire of a ${BUDGET} B budget (module ${wasm.encoded} B of ${wasm.decoded} B)`);
  });
});

test("shell-files", async () => {
  // The shell's own files, as the server and the manifest give them.
  const get = async (path) => {
    const r = await fetch(new URL(path, BASE));
    return { status: r.status, type: r.headers.get("content-type") || "", body: Buffer.from(await r.arrayBuffer()) };
  };
  const html = await get("./");
  assert.equal(html.status, 200);
  assert.match(html.type, /^text\/html/);
  const text = html.body.toString("utf8");
  const csp = text.match(/http-equiv="Content-Security-Policy" content="([^"]+)"/)?.[1];
  assert.equal(
    csp,
    "default-src 'self'; script-src 'self' 'wasm-unsafe-eval'; style-src 'self'; " +
      "img-src 'self' data: blob:; connect-src 'self'; worker-src 'self'; manifest-src 'self'; object-src 'none'; " +
      "base-uri 'none'; form-action 'none'",
    "the Content-Security-Policy differs from the agreed one",
  );
  assert.doesNotMatch(text, /<script(?![^>]*\bsrc=)[^>]*>/, "an inline script");
  assert.doesNotMatch(text, /\son[a-z]+=/i, "an inline event handler");
  const manifest = await get("./manifest.webmanifest");
  assert.equal(manifest.status, 200);
  assert.match(manifest.type, /^application\/manifest\+json/);
  const m = JSON.parse(manifest.body.toString("utf8"));
  for (const size of ["192x192", "512x512"]) {
    const icons = m.icons.filter((i) => i.sizes === size);
    assert.ok(icons.some((i) => i.purpose.includes("maskable")), `no maskable ${size} icon`);
    const png = await get(new URL(icons[0].src, new URL("./manifest.webmanifest", BASE)).href);
    assert.equal(png.status, 200);
    assert.equal(png.type, "image/png");
    const [w, h] = [png.body.readUInt32BE(16), png.body.readUInt32BE(20)];
    assert.equal(`${w}x${h}`, size, "icon size differs from the manifest");
  }
  const wasm = await get("./strutline_web_bg.wasm");
  assert.equal(wasm.type, "application/wasm");
  const sw = (await get("./sw.js")).body.toString("utf8");
  assert.match(sw, /const CACHE_NAME = "strutline-[0-9a-f]{12}";/, "cache name not stamped");
  assert.match(sw, /"\.\/strutline_web_bg\.wasm"/, "the wasm is not precached");
  // A raw request, since URL parsing in fetch would fold the dots away.
  const raw = await new Promise((resolve, reject) => {
    const sock = connect(Number(BASE.port), BASE.hostname, () => {
      sock.end("GET /%2e%2e/Cargo.toml HTTP/1.1\r\nHost: x\r\n\r\n");
    });
    let got = "";
    sock.on("data", (d) => (got += d));
    sock.on("end", () => resolve(got));
    sock.on("error", reject);
  });
  assert.match(raw, /^HTTP\/1\.1 400 /, "a path outside dist/ was not refused");
});

test("offline-shell", async () => {
  // The shell alone, whatever the app shows: once the worker controls the
  // page, a reload with the network off still loads and compiles the
  // module from the cache, and the cache is the stamped one.
  await withApp("offline-shell", async (page, log, context) => {
    await page.goto(BASE.href, { waitUntil: "load" });
    await waitForWorker(page);
    const caches = await page.evaluate(() => caches.keys());
    const sw = await (await fetch(new URL("./sw.js", BASE))).text();
    const name = sw.match(/const CACHE_NAME = "([^"]+)";/)?.[1];
    assert.deepEqual(caches, [name], "the worker's cache is not the stamped one (or not alone)");
    await context.setOffline(true);
    await page.reload({ waitUntil: "load" });
    await page.waitForFunction(() => performance.getEntriesByName("strutline-wasm-ready").length > 0, null, {
      timeout: 15_000,
    });
    const nav = await page.evaluate(() => performance.getEntriesByType("navigation")[0].workerStart);
    assert.ok(nav > 0, "the offline navigation did not go through the worker");
    const foreign = await page.evaluate(async () => {
      // A request that is not in the cache fails offline: the worker does
      // not invent answers.
      try {
        const r = await fetch("./not-shipped.txt");
        return r.status;
      } catch {
        return "failed";
      }
    });
    assert.equal(foreign, "failed", "an uncached file was answered offline");
  });
});

test("typed-member-matches-cli", async () => {
  const cli = cliCheck(memberFile("typed", [TYPED]));
  const expected = cli.results.find((r) => r.id === TYPED.id);
  assert.ok(expected, "the command line gave no result for the member");
  await withApp("typed-member-matches-cli", async (page, log) => {
    await open(page);
    await typeMember(page, TYPED);
    await selectMember(page, TYPED.id);
    const shown = page.locator("[data-testid=result-utilisation]");
    const text = await waitForText(shown, (t) => parseUtilisation(t) !== null);
    const got = parseUtilisation(text);
    await page.screenshot({ path: join(OUT, "typed-member.png"), fullPage: true });
    assert.ok(got.decimals >= 3, `the utilisation "${text}" shows fewer than 3 decimals`);
    assert.equal(
      got.value.toFixed(3),
      expected.utilisation.toFixed(3),
      `page shows ${text}, the command line ${expected.utilisation}`,
    );
    assertNoErrors(log.errors);
  });
});

// The windowed list redraws a row when its member changes without the
// list's length or scroll changing (a rename, a new load).
test("edited-row-redrawn", async () => {
  await withApp("edited-row-redrawn", async (page, log) => {
    await open(page);
    await page.locator("[data-testid=add-member]").first().click();
    const last = page.locator("[data-testid=member-row]").last();
    const before = await last.getAttribute("data-id");
    await setField(page, page, "id", "BH-7");
    const row = page.locator('[data-testid=member-row][data-id="BH-7"]');
    await row.waitFor({ state: "visible", timeout: 10_000 });
    assert.equal((await row.locator(".row-id").textContent()).trim(), "BH-7", "the row's id text");
    assert.equal(await page.locator(`[data-testid=member-row][data-id="${before}"]`).count(), 0, `a row still shows the old id ${before}`);
    await setField(page, page, "axial_kn", "4321");
    await waitForText(row.locator(".row-detail"), (t) => t.includes("N 4321 kN"));
    assertNoErrors(log.errors);
  });
});

// Text that cannot be read withdraws the result: typed key by key, "3,5m"
// in the millimetre box passes through "3" and "3,5" (3.5 mm) on its way;
// none of those may stay checked or saved. The member keeps its value from
// before the edit, the row needs input, the text comes back in its box
// after another member is opened and after a reload. A new member needs
// its load before it is checked (it starts on a design code, not Euler).
test("unreadable-text-withdraws-result", async () => {
  await withApp("unreadable-text-withdraws-result", async (page, log) => {
    await open(page);
    const verdict = page.locator(".verdict").first();
    const util = page.locator("[data-testid=result-utilisation]").first();
    await page.locator("[data-testid=add-member]").first().click();
    await waitForText(verdict, (t) => t.includes("fix input") && t.includes("axial_kn"));
    assert.equal((await util.innerText()).trim(), "—", "a new member is not checked on a made-up load");
    await setField(page, page, "axial_kn", "150");
    await waitForText(verdict, (t) => t.includes("holds") || t.includes("exceeds"));
    assert.match(await verdict.innerText(), /EN 1993-1-1/);
    const id = await page.locator("input[name=id]").inputValue();
    const row = page.locator(`[data-testid=member-row][data-id="${id}"]`).first();
    const length = page.locator("input[name=length_mm]");
    await length.click();
    await length.fill("");
    await length.pressSequentially("3,5m", { delay: 30 });
    await waitForText(verdict, (t) => t.includes("fix input") && t.includes("3,5m"));
    assert.equal((await util.innerText()).trim(), "—", "no utilisation while the text cannot be read");
    await waitForText(row, (t) => t.includes("fix input") && t.includes("L 2500 mm"));
    await waitForText(page.locator(".list-summary").first(), (t) => t.includes("1 ✎ need input"));
    await page.locator("[data-testid=member-row]").first().click();
    await row.click();
    assert.equal(await length.inputValue(), "3,5m", "the typed text is kept");
    await page.reload();
    await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
    await row.click();
    assert.equal(await length.inputValue(), "3,5m", "the typed text is kept over a reload");
    await waitForText(verdict, (t) => t.includes("fix input"));
    await setField(page, page, "length_mm", "3500");
    await waitForText(verdict, (t) => t.includes("holds") || t.includes("exceeds"));
    await waitForText(row, (t) => t.includes("L 3500 mm"));
    // The same in the frame's G and the column model's boxes.
    await page.locator("#f-restraint_major").selectOption("frame");
    const ga = page.locator("#f-frame_major-g_a");
    await ga.fill("2x");
    await waitForText(verdict, (t) => t.includes("fix input") && t.includes("frame_major.g_a"));
    await ga.fill("2");
    // G at end B is asked for too (no G is assumed).
    await waitForText(verdict, (t) => t.includes("fix input") && t.includes("frame_major.g_b"));
    await page.locator("#f-frame_major-g_b").fill("1");
    await waitForText(verdict, (t) => t.includes("holds") || t.includes("exceeds"));
    await page.locator("[data-testid=cm-toggle]").click();
    const along = page.locator("#cm-distributed");
    await along.waitFor({ timeout: 10_000 });
    await along.fill("1,5 kN");
    await waitForText(verdict, (t) => t.includes("fix input") && t.includes("buckling_model.distributed_kn_per_m"));
    assert.equal((await util.innerText()).trim(), "—");
    await along.fill("1,5");
    await waitForText(verdict, (t) => t.includes("holds") || t.includes("exceeds"));
    assertNoErrors(log.errors);
  });
});

/** Opens the app, types and selects TYPED and waits for its chart. */
async function typedChart(page) {
  await open(page);
  await typeMember(page, TYPED);
  await selectMember(page, TYPED.id);
  const canvas = page.locator("canvas#envelope");
  await canvas.waitFor({ state: "visible", timeout: 10_000 });
  return canvas;
}

test("envelope-drawn-with-marker", async () => {
  const cli = cliCheck(memberFile("typed", [TYPED]));
  const expected = cli.results.find((r) => r.id === TYPED.id);
  assert.ok(expected, "the command line gave no result for the member");
  const governing = expected.modes.find((m) => JSON.stringify(m.mode) === JSON.stringify(expected.governing));
  assert.ok(governing, "the command line's governing mode is not among its modes");
  await withApp("envelope-drawn-with-marker", async (page, log) => {
    const canvas = await typedChart(page);
    // Wait for the marker of this member to be drawn.
    await page.waitForFunction(() => {
      const c = document.querySelector("canvas#envelope");
      return c && c.dataset.markerPx && c.dataset.markerSlenderness;
    }, null, { timeout: 10_000 });
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    await canvas.screenshot({ path: join(OUT, "envelope.png") });
    const facts = await page.evaluate(() => {
      const c = document.querySelector("canvas#envelope");
      const ctx = c.getContext("2d");
      const { width, height } = c;
      const data = ctx.getImageData(0, 0, width, height).data;
      const px = (x, y) => {
        const i = (y * width + x) * 4;
        return [data[i], data[i + 1], data[i + 2], data[i + 3]];
      };
      const bg = px(0, 0);
      const differs = (p) => Math.abs(p[0] - bg[0]) + Math.abs(p[1] - bg[1]) + Math.abs(p[2] - bg[2]) + Math.abs(p[3] - bg[3]) > 48;
      let ink = 0;
      for (let y = 0; y < height; y += 1) {
        for (let x = 0; x < width; x += 1) if (differs(px(x, y))) ink += 1;
      }
      const nums = (c.dataset.markerPx.match(/-?\d+(\.\d+)?/g) || []).map(Number);
      // data-marker-px is in CSS pixels of the canvas box; scale to its bitmap.
      const box = c.getBoundingClientRect();
      const sx = box.width > 0 ? width / box.width : 1;
      const sy = box.height > 0 ? height / box.height : 1;
      const mx = Math.round(nums[0] * sx);
      const my = Math.round(nums[1] * sy);
      let near = 0;
      let inside = mx >= 0 && my >= 0 && mx < width && my < height;
      for (let dy = -4; dy <= 4; dy += 1) {
        for (let dx = -4; dx <= 4; dx += 1) {
          const x = mx + dx;
          const y = my + dy;
          if (x >= 0 && y >= 0 && x < width && y < height && differs(px(x, y))) near += 1;
        }
      }
      return {
        width,
        height,
        ink,
        markerPx: c.dataset.markerPx,
        mx,
        my,
        inside,
        near,
        slenderness: Number(c.dataset.markerSlenderness),
      };
    });
    assert.ok(facts.ink > Math.max(500, 0.01 * facts.width * facts.height), `only ${facts.ink} drawn pixels`);
    assert.ok(facts.inside, `the marker (${facts.markerPx}) is outside the canvas`);
    assert.ok(facts.near >= 9, `little is drawn at the marker (${facts.markerPx}): ${facts.near} of 81 pixels`);
    const rel = Math.abs(facts.slenderness - governing.slenderness) / governing.slenderness;
    assert.ok(
      rel <= 0.01,
      `marker slenderness ${facts.slenderness}, the command line's governing mode ${governing.slenderness}`,
    );
    assertNoErrors(log.errors);
  });
});

test("envelope-compares-methods", async () => {
  // The typed steel I column under EN 1993-1-1: every other steel method
  // and the elastic ones apply to it, the timber method does not.
  const others = [
    ["aisc360-lrfd", "AISC 360-16 chapter E, LRFD"],
    ["aisc360-asd", "AISC 360-16 chapter E, ASD"],
    ["csa-s16", "CSA S16-19 13.3"],
    ["perry-robertson", "Perry-Robertson, initial bow"],
    ["secant", "Secant formula, eccentric load"],
    ["euler", "Euler, capped at squash load"],
  ];
  await withApp("envelope-compares-methods", async (page, log) => {
    const canvas = await typedChart(page);
    const drawn = (n) =>
      page.waitForFunction((n) => document.querySelector("canvas#envelope")?.dataset.curves === String(n), n, {
        timeout: 10_000,
      });
    const pixels = () =>
      page.evaluate(() => {
        const c = document.querySelector("canvas#envelope");
        const d = c.getContext("2d").getImageData(0, 0, c.width, c.height).data;
        let h = 0;
        for (let i = 0; i < d.length; i += 1) h = (Math.imul(h, 31) + d[i]) | 0;
        return h;
      });
    const listed = () =>
      page.evaluate(() =>
        [...document.querySelectorAll(".chart-legend li[data-method]")].map((li) => [li.dataset.method, li.textContent]),
      );
    await drawn(2);
    const before = await pixels();
    assert.deepEqual(await listed(), [], "the legend lists other methods before the option is ticked");

    const toggle = page.locator("[data-testid=toggle-compare]");
    await toggle.check();
    await drawn(2 + others.length);
    const items = await listed();
    assert.deepEqual(
      items.map(([k]) => k),
      others.map(([k]) => k),
      "the legend names each other method that applies, in order",
    );
    for (const [key, title] of others) {
      const text = items.find(([k]) => k === key)[1];
      assert.ok(text.startsWith(title), `legend item ${key}: ${text}`);
      assert.equal(/allowable/.test(text), key === "aisc360-asd", `legend item ${key}: ${text}`);
    }
    const legend = await page.locator(".chart-legend").innerText();
    assert.ok(!/EN 1995/.test(legend), "the timber method is listed for a steel member");
    assert.notEqual(await pixels(), before, "the canvas did not change when the methods were compared");
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    await canvas.screenshot({ path: join(OUT, "envelope-compare.png") });
    await page.locator("[data-testid=contrast-toggle]").click();
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    await page.locator(".chart-block").screenshot({ path: join(OUT, "envelope-compare-hc.png") });
    await page.locator("[data-testid=contrast-toggle]").click();

    await toggle.uncheck();
    await drawn(2);
    assert.deepEqual(await listed(), [], "unticking left other methods in the legend");
    assert.equal(await pixels(), before, "unticking did not restore the chart");
    assertNoErrors(log.errors);
  });
});

test("reload-keeps-list", async () => {
  await withApp("reload-keeps-list", async (page, log) => {
    await open(page);
    await typeMember(page, TYPED);
    await page.reload({ waitUntil: "load" });
    await page
      .locator(`[data-testid=member-row][data-id="${TYPED.id}"]`)
      .first()
      .waitFor({ state: "visible", timeout: 10_000 });
    const stored = await page.evaluate((k) => localStorage.getItem(k), STORAGE_KEY);
    assert.ok(stored && stored.includes(TYPED.id), "the member is not in the stored workspace");
    assertNoErrors(log.errors);
  });
});

// Another tab's save is announced: the window's listeners are set up in
// the task after the first frame (app::listen), and a save made then in
// another tab of the same browser brings the banner that asks which to keep.
test("other-tab-save-announced", async () => {
  await withApp("other-tab-save-announced", async (page, log, context) => {
    await open(page);
    await typeMember(page, TYPED);
    // The edit is saved (the stored text has the member).
    await page.waitForFunction((k) => (localStorage.getItem(k) || "").includes("BH-"), STORAGE_KEY, { timeout: 10_000 });
    const other = await context.newPage();
    await other.goto(BASE.href, { waitUntil: "load" });
    await other.evaluate((k) => {
      const w = JSON.parse(localStorage.getItem(k));
      w.revision += 5;
      w.lists[w.active].title = "Changed in another tab";
      localStorage.setItem(k, JSON.stringify(w));
    }, STORAGE_KEY);
    const banner = page.locator("[data-testid=other-tab]").first();
    await banner.waitFor({ state: "visible", timeout: 10_000 });
    assert.match(await banner.textContent(), /another tab/);
    await other.close();
    assertNoErrors(log.errors);
  });
});

test("offline-reload", async () => {
  await withApp("offline-reload", async (page, log, context) => {
    await open(page);
    await typeMember(page, TYPED);
    await waitForWorker(page);
    await context.setOffline(true);
    await page.reload({ waitUntil: "load" });
    await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
    await page
      .locator(`[data-testid=member-row][data-id="${TYPED.id}"]`)
      .first()
      .waitFor({ state: "visible", timeout: 10_000 });
    await page.screenshot({ path: join(OUT, "offline.png"), fullPage: true });
    const fromWorker = await page.evaluate(() =>
      performance.getEntriesByType("navigation").map((e) => e.workerStart > 0 || e.deliveryType === "cache"),
    );
    assert.ok(fromWorker.every(Boolean), "the offline page was not answered by the worker");
    assertNoErrors(log.errors.filter((e) => !/ERR_INTERNET_DISCONNECTED/.test(e)));
  });
});

for (const [name, broken] of [
  ["unreadable-storage-kept", '{"format":"strutline.workspace", broken'],
  // Truncated, of a future version, not ours: each kept aside and reported too.
  ["truncated-storage-kept", '{"revision":3,"format":"strutline.workspace","version":1,"active":0,"lists":[{"format":"strut'],
  ["future-storage-kept", '{"revision":1,"format":"strutline.workspace","version":7,"active":0,"lists":[]}'],
  ["foreign-storage-kept", '{"todo":["milk","eggs"]}'],
]) test(name, async () => {
  await withApp(name, async (page, log, context) => {
    // Put the broken text in place before the app's first start, once.
    await context.addInitScript(([key, text]) => {
      if (!sessionStorage.getItem("strutline-test-seeded")) {
        sessionStorage.setItem("strutline-test-seeded", "1");
        localStorage.setItem(key, text);
      }
    }, [STORAGE_KEY, broken]);
    await open(page);
    const problem = page.locator("[data-testid=storage-problem]").first();
    await problem.waitFor({ state: "visible", timeout: 10_000 });
    await page.screenshot({ path: join(OUT, `${name}.png`), fullPage: true });
    const keep = async () =>
      page.evaluate(
        ([key, prefix, text]) => {
          const keys = Object.keys(localStorage);
          return keys.some((k) => (k === key || k.startsWith(prefix)) && localStorage.getItem(k) === text);
        },
        [STORAGE_KEY, UNREADABLE_PREFIX, broken],
      );
    assert.ok(await keep(), "the unreadable text is gone from localStorage");
    // Still there after another start of the app.
    await page.reload({ waitUntil: "load" });
    await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
    assert.ok(await keep(), "the unreadable text is gone after a second start");
  });
});

test("full-storage-reported-edit-kept", async () => {
  await withApp("full-storage-reported-edit-kept", async (page, log, context) => {
    // Every write refused as a full quota would be.
    await context.addInitScript(() => {
      const original = Storage.prototype.setItem;
      Storage.prototype.setItem = function (key, value) {
        if (String(key).startsWith("strutline.v1.workspace")) {
          throw new DOMException("The quota has been exceeded.", "QuotaExceededError");
        }
        return original.call(this, key, value);
      };
    });
    await open(page);
    await page.locator("[data-testid=member-row]").first().click();
    const load = page.locator("input[name=axial_kn]");
    await load.fill("123,5");
    await page.locator("[data-testid=save-problem]").first().waitFor({ state: "visible", timeout: 10_000 });
    assert.equal(await load.inputValue(), "123,5", "the edit stays on screen");
    const row = page.locator("[data-testid=member-row]").first();
    assert.match(await row.textContent(), /123[.,]5/, "the list shows the unsaved edit");
  });
});

test("update-ready", async () => {
  assert.ok(DIST, "--dist DIR is needed to publish a new build (cargo xtask browser-test passes it)");
  const swPath = join(DIST, "sw.js");
  const original = readFileSync(swPath, "utf8");
  const originalGz = readFileSync(`${swPath}.gz`);
  const oldName = original.match(/const CACHE_NAME = "([^"]+)";/)?.[1];
  assert.ok(oldName, "sw.js has no stamped cache name");
  const newName = `${oldName}-next`;
  try {
    await withApp("update-ready", async (page, log) => {
      await open(page);
      await waitForWorker(page);
      // Publish a "new build": same files, a new cache name (and its
      // precompressed copy, which the server sends to a browser).
      const next = original.replace(`const CACHE_NAME = "${oldName}";`, `const CACHE_NAME = "${newName}";`);
      writeFileSync(swPath, next);
      writeFileSync(`${swPath}.gz`, gzipSync(next));
      await page.evaluate(async () => {
        const reg = await navigator.serviceWorker.getRegistration();
        await reg.update();
      });
      const banner = page.locator("[data-testid=update-ready]").first();
      await banner.waitFor({ state: "visible", timeout: 20_000 });
      await page.screenshot({ path: join(OUT, "update-ready.png") });
      // Until the person asks, the old worker and its cache stay.
      const before = await page.evaluate(async () => ({
        caches: await caches.keys(),
        waiting: Boolean((await navigator.serviceWorker.getRegistration()).waiting),
      }));
      assert.ok(before.waiting, "no waiting worker while the banner shows");
      assert.ok(before.caches.includes(oldName), "the old cache went before the update was applied");
      const reloaded = page.waitForEvent("load", { timeout: 20_000 });
      await banner.locator("button").first().click();
      await reloaded;
      await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
      const after = await page.evaluate(async () => {
        for (let i = 0; i < 50; i += 1) {
          const keys = await caches.keys();
          if (keys.length === 1) break;
          await new Promise((r) => setTimeout(r, 100));
        }
        return { caches: await caches.keys(), controlled: Boolean(navigator.serviceWorker.controller) };
      });
      assert.ok(after.controlled, "the page is not controlled after the update");
      assert.deepEqual(after.caches, [newName], "the old cache was not deleted, or the new one is missing");
      assertNoErrors(log.errors);
    });
  } finally {
    writeFileSync(swPath, original);
    writeFileSync(`${swPath}.gz`, originalGz);
  }
});

test("tablet-fits", async () => {
  // A portrait tablet: the viewport meta applies and nothing is wider
  // than the screen (no sideways scrolling of the page itself).
  for (const viewport of [{ width: 768, height: 1024 }, { width: 1024, height: 768 }]) {
    await withApp(`tablet-fits-${viewport.width}`, async (page) => {
      await open(page);
      await page.locator("[data-testid=add-member]").first().click();
      await page.locator("[data-testid=result-utilisation]").first().waitFor({ state: "visible", timeout: 10_000 });
      await page.screenshot({ path: join(OUT, `tablet-${viewport.width}x${viewport.height}.png`) });
      const m = await page.evaluate(() => ({
        scroll: document.scrollingElement.scrollWidth,
        client: document.scrollingElement.clientWidth,
        inner: window.innerWidth,
      }));
      assert.equal(m.inner, viewport.width, "the viewport meta did not give the device width");
      assert.ok(m.scroll <= m.client + 1, `the page is ${m.scroll} px wide on a ${m.client} px screen`);
    }, { viewport, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
  }
});

test("accessibility-axe", async () => {
  const require = createRequire(import.meta.url);
  const axeSource = readFileSync(require.resolve("axe-core/axe.min.js"), "utf8");
  // The app's policy refuses injected scripts; the test context bypasses
  // it to run axe (the app itself is tested with the policy in force above).
  await withApp("accessibility-axe", async (page) => {
    await open(page);
    await page.evaluate(axeSource);
    const check = async (state) => {
      const result = await page.evaluate(async () => {
        // eslint-disable-next-line no-undef
        const r = await axe.run(document, { resultTypes: ["violations"] });
        return r.violations.map((v) => ({
          id: v.id,
          impact: v.impact,
          help: v.help,
          nodes: v.nodes.length,
          target: v.nodes[0]?.target,
        }));
      });
      for (const v of result) {
        console.log(`    axe (${state}): ${v.impact} ${v.id} (${v.nodes}): ${v.help} ${JSON.stringify(v.target)}`);
      }
      return result.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => ({ state, ...v }));
    };
    const serious = await check("as opened");
    // Again with a new member in the editor and its result shown.
    await page.locator("[data-testid=add-member]").first().click();
    await page.locator("[data-testid=result-utilisation]").first().waitFor({ state: "visible", timeout: 10_000 });
    serious.push(...(await check("editing a new member")));
    // And with the column model open, drawn and a brace added.
    await page.locator("[data-testid=cm-toggle]").click();
    await page.locator("[data-testid=cm-canvas][data-shapes='2']").waitFor({ timeout: 10_000 });
    await page.locator("[data-testid=cm-add-brace]").click();
    await page.locator("[data-testid=cm-brace-0]").waitFor();
    serious.push(...(await check("with the column model open")));
    assert.deepEqual(serious, [], "serious or critical accessibility violations");
  }, { bypassCSP: true });
});

test("keyboard-only-member", async () => {
  const member = { ...TYPED, id: "BH-8" };
  await withApp("keyboard-only-member", async (page) => {
    await open(page);
    const active = () =>
      page.evaluate(() => {
        const el = document.activeElement;
        return el ? { testid: el.dataset?.testid || "", name: el.getAttribute("name") || "", tag: el.tagName.toLowerCase() } : null;
      });
    const tabTo = async (pred, what, limit = 150) => {
      for (let i = 0; i < limit; i += 1) {
        const a = await active();
        if (a && pred(a)) return a;
        await page.keyboard.press("Tab");
      }
      throw new Error(`Tab never reached ${what}`);
    };
    await tabTo((a) => a.testid === "add-member", "the add-member button");
    await page.keyboard.press("Enter");
    for (const [field, value] of memberFields(member)) {
      const name = field.replace(/^\?/, "");
      if (field.startsWith("?") && (await page.locator(`[name="${name}"]`).count()) === 0) continue;
      const a = await tabTo((x) => x.name === name, `the field "${name}"`);
      if (a.tag === "select") {
        // Walk the options with the arrow keys until the value is chosen.
        const options = await page.evaluate(() => [...document.activeElement.options].map((o) => o.value));
        const target = options.indexOf(String(value));
        assert.ok(target >= 0, `"${name}" has no option "${value}"`);
        await page.keyboard.press("Home");
        for (let i = 0; i < target; i += 1) await page.keyboard.press("ArrowDown");
        const chosen = await page.evaluate(() => document.activeElement.value);
        assert.equal(chosen, String(value), `could not choose "${value}" in "${name}" by keyboard`);
      } else {
        await page.keyboard.press("ControlOrMeta+A");
        await page.keyboard.type(String(value));
      }
      await page.keyboard.press("Tab");
    }
    await page
      .locator(`[data-testid=member-row][data-id="${member.id}"]`)
      .first()
      .waitFor({ state: "visible", timeout: 10_000 });
  });
});

// The section picker and "lightest that works" (tests/browser/picker.mjs).
registerPicker(test, { withApp, open, OUT });

// Order, filters, picks and the change of several members (tests/browser/listtools.mjs).
registerListTools(test, { withApp, open, OUT });

// The tablet workspace: result and chart in view while editing (tests/browser/tablet.mjs).
registerTablet(test, { withApp, open, OUT });
// Buckling lengths from the real member: the column model and frame ends.
registerBuckling(test, { withApp, open, OUT });

// A beam-column on its interaction chart (tests/browser/beamcolumn.mjs).
registerBeamColumn(test, { withApp, open, OUT });

// The moment diagram's sign as drawn, and a sign slip (tests/browser/diagram.mjs).
registerDiagram(test, { withApp, open, OUT });

// What is shown belongs to the member shown, as it stands (tests/browser/current.mjs).
registerCurrent(test, { withApp, open, OUT });

let passed = 0;
let failed = 0;
const chosen = ONLY ? tests.filter((t) => t.name === ONLY) : tests;
if (ONLY && chosen.length === 0) {
  console.error(`no test named ${ONLY}; the tests: ${tests.map((t) => t.name).join(", ")}`);
  process.exit(2);
}
console.log(`browser tests against ${BASE.href}`);
for (const t of chosen) {
  const started = Date.now();
  try {
    await t.fn();
    passed += 1;
    console.log(`ok   ${t.name} (${Date.now() - started} ms)`);
  } catch (e) {
    failed += 1;
    console.log(`FAIL ${t.name} (${Date.now() - started} ms)`);
    console.log(String(e && e.stack ? e.stack : e).split("\n").slice(0, 12).map((l) => "     " + l).join("\n"));
  }
}
console.log(`browser: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
