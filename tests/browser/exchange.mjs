// Browser tests of the exchange of member lists (member files, JSON; the
// browser build leaves CSV to the command line to keep within its size
// budget): `node tests/browser/exchange.mjs --url URL [--only NAME]`
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
    assert.match(report, /invalid type/, "the report says what was wrong");
    assert.deepEqual(await stored(page), before, "nothing changed");
  }),
);

test("csv-points-to-the-command-line", () =>
  withApp("csv-points-to-the-command-line", async (page) => {
    const before = await stored(page);
    await importText(page, "members.csv", "id,kind,diameter_mm,grade,length_mm,axial_kn,method\nA,round,40,S355,2000,10,euler\n");
    assert.match(await page.locator("[data-testid=import-report]").textContent(), /strutline convert/);
    assert.deepEqual(await stored(page), before, "nothing changed");
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
