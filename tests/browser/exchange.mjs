// Browser tests of the exchange of member lists (member files, JSON, and
// CSV): `node tests/browser/exchange.mjs --url URL [--only NAME]`
// against a served dist/. Each test runs in a fresh Chromium profile; a
// failing one leaves a screenshot in tests/browser/out/. The last line is
// "exchange: N passed, N failed"; the exit status is 1 when any failed.

import assert from "node:assert/strict";
import { readFileSync } from "node:fs";
import { STORAGE_KEY, arg, runTests, withOpenApp } from "./lib.mjs";

const URL_ARG = arg("--url");
if (!URL_ARG) {
  console.error("usage: node exchange.mjs --url http://127.0.0.1:PORT/ [--only NAME]");
  process.exit(2);
}
const ONLY = arg("--only");

const tests = [];
const test = (name, fn) => tests.push({ name, fn });

const withApp = (name, fn) => withOpenApp(URL_ARG, name, fn, { acceptDownloads: true });

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

test("round-trip-json", () =>
  withApp("round-trip-json", async (page) => {
    const before = await stored(page);
    const file = await download(page, "export-json");
    assert.ok(file.name.endsWith(".json"), file.name);
    await importText(page, file.name, file.text);
    assert.equal(await page.locator("[data-testid=import-report] p").count(), 1);
    await page.click("[data-testid=import-new]");
    const after = await stored(page);
    assert.equal(after.lists.length, before.lists.length + 1);
    assert.deepEqual(after.lists.at(-1).members, before.lists[before.active].members);
    assert.equal(after.active, after.lists.length - 1);
  }),
);

test("broken-file-changes-nothing", () =>
  withApp("broken-file-changes-nothing", async (page) => {
    const before = await stored(page);
    const file = await download(page, "export-json");
    const bad = JSON.parse(file.text);
    bad.members[0].length_mm = "long";
    await importText(page, "bad.json", JSON.stringify(bad));
    const report = await page.locator("[data-testid=import-report]").textContent();
    assert.match(report, new RegExp(bad.members[0].id), "the report names the member");
    assert.match(report, /expected a number, found the text "long"/, "the report says what was wrong, in words");
    assert.deepEqual(await stored(page), before, "nothing changed");
  }),
);

test("round-trip-csv", () =>
  withApp("round-trip-csv", async (page) => {
    const before = await stored(page);
    const file = await download(page, "export-csv");
    assert.ok(file.name.endsWith(".csv"), file.name);
    assert.match(file.text.split("\n")[0], /\baxial_kn\b/, "SI columns by default");
    await importText(page, file.name, file.text);
    const report = await page.locator("[data-testid=import-report]").textContent();
    assert.match(report, /no problems/, report);
    await page.click("[data-testid=import-new]");
    const after = await stored(page);
    assert.equal(after.lists.length, before.lists.length + 1);
    assert.deepEqual(after.lists.at(-1).members, before.lists[before.active].members, "the same members back");

    // With US units shown, the CSV has US columns, and reads back the same.
    await page.click("[data-testid=units-toggle]");
    const us = await download(page, "export-csv");
    const head = us.text.split("\n")[0];
    assert.match(head, /\baxial_kip\b/, head);
    assert.doesNotMatch(head, /\baxial_kn\b/, head);
    await importText(page, us.name, us.text);
    await page.click("[data-testid=import-new]");
    const again = await stored(page);
    const back = again.lists.at(-1).members;
    const orig = before.lists[before.active].members;
    assert.equal(back.length, orig.length);
    back.forEach((m, i) => {
      assert.equal(m.id, orig[i].id);
      assert.ok(Math.abs(m.axial_kn - orig[i].axial_kn) <= 1e-9 * Math.abs(orig[i].axial_kn), `${m.id}: ${m.axial_kn} kN back for ${orig[i].axial_kn}`);
      assert.ok(Math.abs(m.length_mm - orig[i].length_mm) <= 1e-9 * orig[i].length_mm, `${m.id}: ${m.length_mm} mm back for ${orig[i].length_mm}`);
    });
  }),
);

test("csv-export-asks-before-leaving-a-column-model-out", () =>
  withApp("csv-export-asks-before-leaving-a-column-model-out", async (page) => {
    // An example list whose member K1 has a column model (buckling_model),
    // which a CSV row cannot carry.
    const text = readFileSync(new URL("../../examples/tarnbeck-crane-hall.json", import.meta.url), "utf8");
    const modelled = JSON.parse(text).members.filter((m) => m.buckling_model).map((m) => m.id);
    assert.ok(modelled.length > 0, "the example has a column model");
    await importText(page, "crane.json", text);
    await page.click("[data-testid=import-new]");
    // The CSV is not written at once: the banner names what would be lost.
    let downloads = 0;
    page.on("download", () => downloads++);
    await page.click("[data-testid=export-csv]");
    const note = page.locator("[data-testid=export-note]");
    await note.waitFor();
    const said = await note.textContent();
    for (const id of modelled) assert.match(said, new RegExp(`"${id}": buckling_model`), said);
    await page.waitForTimeout(800);
    assert.equal(downloads, 0, "nothing written before the engineer says so");
    // Cancel writes nothing; asked again, "without them" writes it.
    await page.click("[data-testid=export-csv-cancel]");
    await page.waitForTimeout(300);
    assert.equal(await note.count(), 0);
    assert.equal(downloads, 0);
    await page.click("[data-testid=export-csv]");
    const file = await download(page, "export-csv-anyway");
    assert.ok(file.name.endsWith(".csv"), file.name);
    assert.doesNotMatch(file.text.split("\n")[0], /buckling_model/);
    assert.equal(await note.count(), 0, "the question goes once answered");
  }),
);

test("csv-with-errors-reported-nothing-changed", () =>
  withApp("csv-with-errors-reported-nothing-changed", async (page) => {
    const before = await stored(page);
    const csv = [
      "id,kind,diameter_mm,grade,length_mm,axial_kn,method",
      "A,round,40,S355,2000,10,euler",
      "B,round,40,S355,2000,lots,euler",
      "C,round,40,S355,2000,10,guesswork",
      "D,round,50,S355,2500,12,euler",
      "E,round,50,S355,2500,12,<b>bold</b>",
      "",
    ].join("\n");
    await importText(page, "site.csv", csv);
    const lines = await page.locator("[data-testid=import-report] p").allTextContents();
    const text = lines.join("\n");
    assert.match(text, /site\.csv: 2 members read; 3 problems/, text);
    assert.ok(lines.some((l) => /^line 3, column axial_kn: .*expected a number in kN/.test(l)), text);
    assert.ok(lines.some((l) => /^line 4, column method: .*unknown method "guesswork"/.test(l)), text);
    // A cell's text in a problem is shown as text, never made into markup.
    assert.ok(lines.some((l) => l.includes('unknown method "<b>bold</b>"')), text);
    assert.equal(await page.locator("[data-testid=import-report] b").count(), 0, "no element made from the file");
    assert.deepEqual(await stored(page), before, "nothing changed before the person chooses");
    await page.click("[data-testid=import-new]");
    const after = await stored(page);
    const taken = after.lists.at(-1);
    assert.deepEqual(taken.members.map((m) => m.id), ["A", "D"], "the valid rows are taken");
    assert.equal(taken.title, "site");
    assert.deepEqual(after.lists.slice(0, -1), before.lists, "the lists there before are untouched");
  }),
);

// Values the check refuses (a designation no catalogue holds, a negative
// load) are problems of the file, named by member and field as the
// command line names them, before anything changes.
test("value-problems-reported-before-anything-changes", () =>
  withApp("value-problems-reported-before-anything-changes", async (page) => {
    const before = await stored(page);
    const csv = [
      "id;kind;designation;grade;length_mm;axial_kn;method",
      "W1;catalogue;HE 160 A;S275;3200;150;en1993-1-1",
      "W2;catalogue;HE 888 X;S275;3200;150;en1993-1-1",
      "W3;catalogue;HE 160 A;S275;3200;-20;en1993-1-1",
      "",
    ].join("\n");
    await importText(page, "walkway.csv", csv);
    const lines = await page.locator("[data-testid=import-report] p").allTextContents();
    const text = lines.join("\n");
    assert.doesNotMatch(text, /no problems/, text);
    assert.match(text, /walkway\.csv: 3 members read; 2 problems/, text);
    assert.ok(lines.some((l) => /"W2"/.test(l) && /designation/.test(l) && /HE 888 X/.test(l)), text);
    assert.ok(lines.some((l) => /"W3"/.test(l) && /axial_kn/.test(l)), text);
    assert.deepEqual(await stored(page), before, "nothing changed before the person chooses");
  }),
);

test("csv-spreadsheet-export-us-columns", () =>
  withApp("csv-spreadsheet-export-us-columns", async (page) => {
    // As a spreadsheet in a decimal-comma locale saves it: a byte-order
    // mark, semicolons, decimal commas, feet and inches, quoted text and
    // blank trailing rows.
    const csv =
      "\ufeffid;kind;diameter_in;grade;length_ft;axial_kip;method;note\r\n" +
      'R1;round;1,5;S355;13\'-6";2,5;euler;"east bay; by the door"\r\n' +
      ";;;;;;;\r\n\r\n";
    await importText(page, "export.csv", csv);
    const report = await page.locator("[data-testid=import-report]").textContent();
    assert.match(report, /1 member read, no problems/, report);
    await page.click("[data-testid=import-new]");
    const m = (await stored(page)).lists.at(-1).members[0];
    assert.equal(m.id, "R1");
    assert.equal(m.note, "east bay; by the door");
    assert.ok(Math.abs(m.section.diameter_mm - 38.1) < 1e-9, `diameter ${m.section.diameter_mm} mm`);
    assert.ok(Math.abs(m.length_mm - 13.5 * 304.8) < 1e-9, `length ${m.length_mm} mm`);
    // 2.5 kip = 2500 lbf x 4.4482216152605 N = 11.12055403815 kN.
    assert.ok(Math.abs(m.axial_kn - 11.12055403815) < 1e-9, `load ${m.axial_kn} kN`);
  }),
);

test("markup-in-an-import-stays-text", () =>
  withApp("markup-in-an-import-stays-text", async (page) => {
    let dialogs = 0;
    page.on("dialog", (d) => ((dialogs += 1), d.dismiss()));
    const file = await download(page, "export-json");
    const f = JSON.parse(file.text);
    const evil = '<img src=x onerror="alert(1)"><script>alert(2)</script>';
    f.members = [{ ...f.members[0], id: evil, note: evil }];
    await importText(page, "evil.json", JSON.stringify(f));
    await page.click("[data-testid=import-new]");
    await page.locator("[data-testid=member-row]").first().waitFor();
    await page.waitForTimeout(500);
    assert.equal(dialogs, 0, "no script ran");
    assert.equal(await page.locator("main img[src=x], main script").count(), 0, "no element was made from the text");
    const row = await page.locator("[data-testid=member-row]").first().textContent();
    assert.ok(row.includes("<img"), "the id is shown as text");
  }),
);

test("deeply-nested-refused", () =>
  withApp("deeply-nested-refused", async (page) => {
    const before = await stored(page);
    const deep = "[".repeat(100_000) + "]".repeat(100_000);
    await importText(page, "deep.json", deep);
    assert.match(await page.locator("[data-testid=import-report]").textContent(), /deep\.json/);
    assert.deepEqual(await stored(page), before, "nothing changed");
  }),
);

test("thousands-of-members-read", () =>
  withApp("thousands-of-members-read", async (page) => {
    const before = await stored(page);
    const file = await download(page, "export-json");
    const f = JSON.parse(file.text);
    const one = f.members[0];
    f.members = Array.from({ length: 3000 }, (_, i) => ({ ...one, id: `T${i + 1}` }));
    await importText(page, "many.json", JSON.stringify(f));
    assert.match(await page.locator("[data-testid=import-report]").textContent(), /3000 members/);
    assert.deepEqual(await stored(page), before, "nothing changed before the person chooses");
  }),
);

test("oversize-refused", () =>
  withApp("oversize-refused", async (page) => {
    const before = await stored(page);
    await importText(page, "big.json", "{" + " ".repeat(5 * 1024 * 1024 + 10) + "}");
    assert.match(await page.locator("[data-testid=import-report]").textContent(), /over 5 MB/);
    assert.deepEqual(await stored(page), before);
  }),
);

await runTests("exchange", tests, ONLY);
