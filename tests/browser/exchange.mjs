// Browser tests of the exchange of member lists, the unit switch and the
// calc sheet: `node tests/browser/exchange.mjs --url URL [--only NAME]`
// against a served dist/. Each test runs in a fresh Chromium profile; a
// failing one leaves a screenshot in tests/browser/out/. The last line is
// "exchange: N passed, N failed"; the exit status is 1 when any failed.

import assert from "node:assert/strict";
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { inflateSync } from "node:zlib";
import { arg, ensureOut, firstPage, launch, STORAGE_KEY } from "./lib.mjs";

const URL_ARG = arg("--url");
if (!URL_ARG) {
  console.error("usage: node exchange.mjs --url http://127.0.0.1:PORT/ [--only NAME]");
  process.exit(2);
}
const ONLY = arg("--only");
const OUT = ensureOut();
const KN_PER_KIP = 4.4482216152605; // NIST SP 811 (2008), App. B: 1 lbf = 4.448 221 615 260 5 N

const tests = [];
const test = (name, fn) => tests.push({ name, fn });

async function withApp(name, fn) {
  const { context, close } = await launch({ acceptDownloads: true });
  const page = await firstPage(context);
  const errors = [];
  page.on("pageerror", (e) => errors.push(e.message));
  page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
  try {
    await page.goto(URL_ARG, { waitUntil: "load" });
    await page.locator("[data-testid=caution]").first().waitFor({ timeout: 15_000 });
    await fn(page);
    assert.deepEqual(errors, [], "console errors");
  } catch (e) {
    await page.screenshot({ path: join(OUT, `${name}-failed.png`), fullPage: true }).catch(() => {});
    throw e;
  } finally {
    await close();
  }
}

/** The stored workspace, once the app has saved (it waits 250 ms). */
async function stored(page) {
  await page.waitForTimeout(600);
  return JSON.parse(await page.evaluate((k) => localStorage.getItem(k), STORAGE_KEY));
}

async function download(page, testid) {
  const [d] = await Promise.all([page.waitForEvent("download"), page.click(`[data-testid=${testid}]`)]);
  return { name: d.suggestedFilename(), text: readFileSync(await d.path(), "utf8") };
}

async function importText(page, name, text) {
  await page.setInputFiles("[data-testid=import-file]", { name, mimeType: "text/plain", buffer: Buffer.from(text) });
  await page.locator("[data-testid=import-report]").waitFor();
}

/** Splits CSV text into rows of cells (quotes, doubled quotes). */
function csvRows(text) {
  const rows = [[]];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < text.length; i += 1) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') (cell += '"'), (i += 1);
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ",") rows.at(-1).push(cell), (cell = "");
    else if (c === "\n") rows.at(-1).push(cell.replace(/\r$/, "")), rows.push([]), (cell = "");
    else cell += c;
  }
  if (cell || rows.at(-1).length) rows.at(-1).push(cell);
  return rows.filter((r) => r.length > 1);
}
const csvText = (rows) =>
  rows.map((r) => r.map((c) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(",")).join("\r\n") + "\r\n";

for (const [kind, ext] of [["export-json", "json"], ["export-csv", "csv"]]) {
  test(`round-trip-${ext}`, () =>
    withApp(`round-trip-${ext}`, async (page) => {
      const before = await stored(page);
      const file = await download(page, kind);
      assert.ok(file.name.endsWith(`.${ext}`), file.name);
      await importText(page, file.name, file.text);
      assert.equal(await page.locator("[data-testid=import-report] p").count(), 1);
      await page.click("[data-testid=import-new]");
      const after = await stored(page);
      assert.equal(after.lists.length, before.lists.length + 1);
      assert.deepEqual(after.lists.at(-1).members, before.lists[before.active].members);
      assert.equal(after.active, after.lists.length - 1);
    }),
  );
}

test("csv-problems-reported", () =>
  withApp("csv-problems-reported", async (page) => {
    const before = await stored(page);
    const rows = csvRows((await download(page, "export-csv")).text);
    const header = rows[0];
    const col = header.indexOf("axial_kn");
    const lines = [header];
    for (const id of ["X1", "X2", "X3"]) {
      const r = [...rows[1]];
      r[header.indexOf("id")] = id;
      r[header.indexOf("note")] = "<b>not markup</b>";
      if (id === "X2") r[col] = "lots";
      lines.push(r);
    }
    await importText(page, "site.csv", csvText(lines));
    // The report: a summary line, then one line a problem.
    const problems = (await page.locator("[data-testid=import-report] p").allTextContents()).slice(1);
    assert.equal(problems.length, 1, problems.join("\n"));
    assert.match(problems[0], /^line 3, column axial_kn: /);
    // Nothing changed yet.
    assert.deepEqual(await stored(page), before);
    await page.screenshot({ path: join(OUT, "csv-problems.png") });
    await page.click("[data-testid=import-new]");
    const after = await stored(page);
    assert.deepEqual(after.lists.at(-1).members.map((m) => m.id), ["X1", "X3"]);
    assert.equal(after.lists.length, before.lists.length + 1);
    // The note is text, not markup.
    assert.equal(await page.locator(".pane-list b, .pane-editor b").count(), 0);
    // Merging instead renames the clashing ids and keeps the open list's members.
    await importText(page, "site.csv", csvText(lines));
    await page.click("[data-testid=import-merge]");
    const merged = await stored(page);
    assert.deepEqual(merged.lists.at(-1).members.map((m) => m.id), ["X1", "X3", "X1-2", "X3-2"]);
  }),
);

test("oversize-refused", () =>
  withApp("oversize-refused", async (page) => {
    const before = await stored(page);
    await importText(page, "big.csv", "id\n" + "x".repeat(5 * 1024 * 1024 + 10));
    assert.match(await page.locator("[data-testid=import-report]").textContent(), /over 5 MB/);
    assert.deepEqual(await stored(page), before);
  }),
);

test("units-switch", () =>
  withApp("units-switch", async (page) => {
    const before = await stored(page);
    await page.locator("[data-testid=member-row]").first().click();
    const res = page.locator("[data-testid=result-resistance]").first();
    const si = (await res.textContent()).trim();
    const kn = Number(si.match(/^(-?[\d.]+) kN$/)[1]);
    await page.click("[data-testid=units-toggle]");
    const us = (await res.textContent()).trim();
    const m = us.match(/^(-?[\d.]+) kip$/);
    assert.ok(m, us);
    const kip = Number(m[1]);
    // kN shown to 0.1 (±0.05); kip to 4 significant figures (± half a unit of the last).
    const lastKip = 10 ** (Math.floor(Math.log10(Math.abs(kip))) - 3);
    assert.ok(Math.abs(kip * KN_PER_KIP - kn) <= 0.05 + (lastKip / 2) * KN_PER_KIP, `${si} vs ${us}`);
    await page.screenshot({ path: join(OUT, "units-us.png"), fullPage: true });
    // The editor shows ft; the stored list is unchanged; the choice is kept.
    assert.equal(await page.locator("#f-length_mm ~ .unit, .input-row:has(#f-length_mm) .unit").first().textContent(), "ft");
    assert.deepEqual((await stored(page)).lists, before.lists);
    assert.equal(await page.evaluate(() => localStorage.getItem("strutline.v1.units")), "us");
    await page.reload({ waitUntil: "load" });
    await page.locator("[data-testid=member-row]").first().click();
    assert.match(await page.locator("[data-testid=result-resistance]").first().textContent(), /kip$/);
  }),
);

/** The text of a PDF written by Chromium: each font's ToUnicode map
 * applied to the hex glyph strings of its text operators. */
function pdfText(bytes) {
  const src = bytes.toString("latin1");
  // Each object's own text, from "N 0 obj" to its "endobj".
  const objects = new Map();
  for (const o of src.matchAll(/(\d+) 0 obj\b([\s\S]*?)endobj/g)) objects.set(o[1], o[2]);
  const streams = new Map();
  for (const [n, body] of objects) {
    const at = body.search(/stream\r?\n/);
    if (at < 0) continue;
    const start = body.indexOf("\n", at) + 1;
    let data = Buffer.from(body.slice(start, body.lastIndexOf("endstream")), "latin1");
    if (/FlateDecode/.test(body.slice(0, at))) {
      try {
        data = inflateSync(data);
      } catch {
        continue;
      }
    }
    streams.set(n, data.toString("latin1"));
  }
  // Font resource name -> object of its ToUnicode map, from the font objects.
  const fontMaps = new Map();
  for (const [n, body] of objects) {
    const t = body.match(/\/ToUnicode (\d+) 0 R/);
    if (t) fontMaps.set(n, t[1]);
  }
  const maps = new Map();
  for (const [font, cm] of fontMaps) {
    const text = streams.get(cm) || "";
    const map = new Map();
    for (const b of text.matchAll(/beginbfchar([\s\S]*?)endbfchar/g))
      for (const p of b[1].matchAll(/<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>/g))
        map.set(parseInt(p[1], 16), String.fromCharCode(parseInt(p[2], 16)));
    for (const b of text.matchAll(/beginbfrange([\s\S]*?)endbfrange/g))
      for (const p of b[1].matchAll(/<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>\s*<([0-9A-Fa-f]+)>/g)) {
        const [lo, hi, u] = [parseInt(p[1], 16), parseInt(p[2], 16), parseInt(p[3], 16)];
        for (let g = lo; g <= hi; g += 1) map.set(g, String.fromCharCode(u + g - lo));
      }
    maps.set(font, map);
  }
  // Resource names (/F4 -> object) from every font dictionary in the file.
  const names = new Map();
  for (const r of src.matchAll(/\/(F\w*|f\w*) (\d+) 0 R/g)) if (fontMaps.has(r[2])) names.set(r[1], r[2]);
  let out = "";
  for (const s of streams.values()) {
    let font = null;
    for (const op of s.matchAll(/\/(\w+) [\d.]+ Tf|\[((?:<[0-9A-Fa-f]*>|[-\d.\s])*)\]\s*TJ|<([0-9A-Fa-f]*)>\s*Tj/g)) {
      if (op[1]) {
        font = maps.get(names.get(op[1])) || null;
        continue;
      }
      if (!font) continue;
      const hex = (op[2] ?? op[3]).match(/<([0-9A-Fa-f]*)>/g)?.map((h) => h.slice(1, -1)) ?? [op[3]];
      for (const h of hex) for (let i = 0; i + 4 <= h.length; i += 4) out += font.get(parseInt(h.slice(i, i + 4), 16)) ?? "";
      out += " ";
    }
  }
  return out.replace(/\s+/g, " ");
}

test("calc-sheet-prints", () =>
  withApp("calc-sheet-prints", async (page) => {
    const ws = await stored(page);
    const members = ws.lists[ws.active].members;
    assert.ok(members.length >= 2, "the demo list has two members or more");
    await page.locator("[data-testid=member-row]").first().click();
    await page.click("[data-testid=open-sheet]");
    await page.locator("[data-testid=calc-sheet]").waitFor();
    assert.equal(await page.locator("[data-testid=sheet-page]").count(), members.length);
    await page.screenshot({ path: join(OUT, "calc-sheet.png"), fullPage: true });
    const pdf = await page.pdf({ format: "A4" });
    writeFileSync(join(OUT, "calc-sheet.pdf"), pdf);
    const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page(?![s\w])/g) || []).length;
    assert.ok(pages >= members.length + 1, `${pages} pages for ${members.length} members and the summary`);
    const caution = await page.locator("[data-testid=caution]").first().textContent();
    const words = caution.replace(/^⚠\s*/, "").split(/\s+/).slice(0, 8).join(" ");
    const text = pdfText(pdf);
    // Compared without white space: the PDF splits runs of text for kerning.
    const bare = (t) => t.replace(/\s+/g, "");
    assert.ok(bare(text).includes(bare(words)), `the PDF text lacks "${words}"; it begins: ${text.slice(0, 300)}`);
    const letter = await page.pdf({ format: "Letter" });
    assert.ok((letter.toString("latin1").match(/\/Type\s*\/Page(?![s\w])/g) || []).length >= members.length + 1);
  }),
);

let passed = 0;
let failed = 0;
for (const t of ONLY ? tests.filter((t) => t.name === ONLY) : tests) {
  const started = Date.now();
  try {
    await t.fn();
    passed += 1;
    console.log(`ok   ${t.name} (${Date.now() - started} ms)`);
  } catch (e) {
    failed += 1;
    console.log(`FAIL ${t.name}\n     ${String(e && e.stack ? e.stack : e).split("\n").slice(0, 10).join("\n     ")}`);
  }
}
console.log(`exchange: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
