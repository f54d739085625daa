// Browser tests of the section picker and "lightest that works",
// registered by run.mjs: `register(test, helpers)`. The app's numbers are
// compared with the command line's (`strutline check` / `strutline size`).

import assert from "node:assert/strict";
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { cliCheck, memberFile, ROOT, setField, STORAGE_KEY, waitForText, workspaceText } from "./lib.mjs";

// Invented members: two columns of a made-up greenhouse loading bay,
// S355, EN 1993-1-1, with a custom rolled I section to start from.
const COLUMNS = [
  {
    id: "GB-1",
    section: { kind: "i", depth_mm: 200, width_mm: 150, flange_mm: 10, web_mm: 7, root_radius_mm: 12 },
    material: { grade: "S355" },
    length_mm: 4200,
    axial_kn: 900,
    method: "en1993-1-1",
  },
  {
    id: "GB-2",
    section: { kind: "i", depth_mm: 240, width_mm: 200, flange_mm: 12, web_mm: 8, root_radius_mm: 15 },
    material: { grade: "S355" },
    length_mm: 5000,
    axial_kn: 1800,
    method: "en1993-1-1",
  },
];

function withSection(m, designation) {
  return { ...m, section: { kind: "catalogue", designation } };
}

function cliUtil(m) {
  const r = cliCheck(memberFile("picker", [m]));
  return r.results[0].utilisation;
}

function cliSize(members, series) {
  const dir = mkdtempSync(join(tmpdir(), "strutline-size-"));
  const file = join(dir, "members.json");
  writeFileSync(file, JSON.stringify(memberFile("size", members)));
  const cargo = process.env.STRUTLINE_CARGO || "cargo";
  const run = spawnSync(
    cargo,
    ["run", "--release", "-q", "-p", "strutline-cli", "--bin", "strutline", "--", "size", file, "--series", series, "--json"],
    { cwd: ROOT, encoding: "utf8" },
  );
  rmSync(dir, { recursive: true, force: true });
  return JSON.parse(run.stdout);
}

async function seeded(page, open, members) {
  await open(page);
  await page.evaluate(
    ([k, t]) => localStorage.setItem(k, t),
    [STORAGE_KEY, workspaceText([memberFile("Greenhouse bay", members)])],
  );
  await page.reload({ waitUntil: "load" });
  await page.locator("[data-testid=caution]").first().waitFor({ state: "visible", timeout: 15_000 });
}

const util = (page) => page.locator("[data-testid=result-utilisation]").first();

export function register(test, { withApp, open, OUT }) {
  // A proposal is worked for the member's inputs as they were: an edit
  // takes it away, so none worked for other inputs can be accepted.
  test("lightest-gone-after-edit", async () => {
    await withApp("lightest-gone-after-edit", async (page, log) => {
      await seeded(page, open, COLUMNS);
      await page.locator('[data-testid=member-row][data-id="GB-1"]').first().click();
      await page.locator('[name="section_series"]').selectOption("heb");
      await page.locator("[data-testid=lightest]").click();
      const proposal = page.locator('[data-testid=proposal][data-id="GB-1"]');
      await proposal.waitFor({ state: "visible", timeout: 10_000 });
      await setField(page, page, "axial_kn", "2200");
      await proposal.waitFor({ state: "detached", timeout: 10_000 });
      assert.equal(await page.locator("[data-testid=accept-proposal]").count(), 0, "no Accept left");
      // Worked afresh, it is for the new load.
      await page.locator("[data-testid=lightest]").click();
      await proposal.waitFor({ state: "visible", timeout: 10_000 });
      const d = (await proposal.locator("[data-testid=proposal-chosen]").textContent()).split(" — ")[0];
      await proposal.locator("[data-testid=accept-proposal]").click();
      await waitForText(page.locator('[data-testid=member-row][data-id="GB-1"] .row-detail'), (t) => t.includes(d));
      const u = Number(await util(page).textContent());
      assert.ok(u <= 1.0, `the accepted section holds 2200 kN: ${u}`);
      assert.deepEqual(log.errors, []);
    });
  });

  test("picker-search", async () => {
    await withApp("picker-search", async (page, log) => {
      await seeded(page, open, [COLUMNS[0]]);
      const before = await util(page).textContent();
      assert.equal(Number(before), Number(cliUtil(COLUMNS[0]).toFixed(3)));
      await page.locator('[name="section_search"]').fill("heb22");
      const row = page.locator('[data-testid=section-candidate][data-designation="HE 220 B"]');
      await row.waitFor({ state: "visible", timeout: 10_000 });
      const rows = await page.locator("[data-testid=section-candidate]").count();
      assert.equal(rows, 1, "heb22 should find only HE 220 B");
      const expected = cliUtil(withSection(COLUMNS[0], "HE 220 B")).toFixed(3);
      assert.ok((await row.textContent()).includes(expected), `candidate row shows ${expected}`);
      // A forgiving search across series: "203x203" finds the UC 203x203 rows only.
      await page.locator('[name="section_search"]').fill("203x203");
      await waitForText(page.locator("[data-testid=section-candidate]"), (t) => t.includes("203x203"));
      const all = await page.locator("[data-testid=section-candidate]").evaluateAll((els) => els.map((e) => e.dataset.designation));
      assert.ok(all.length > 0 && all.every((d) => d.includes("203x203")), all.join(", "));
      await page.locator('[name="section_search"]').fill("heb22");
      await row.locator("button").click();
      await waitForText(util(page), (t) => t === expected);
      assert.equal(await page.locator('[name="designation"]').inputValue(), "HE 220 B");
      assert.equal(await page.locator('[name="kind"]').inputValue(), "catalogue");
      const detail = await page.locator("[data-testid=member-row] .row-detail").first().textContent();
      assert.ok(detail.includes("HE 220 B"), detail);
      await page.screenshot({ path: join(OUT, "picker-search.png"), fullPage: true });
      assert.deepEqual(log.errors, []);
    });
  });

  test("lightest-accept", async () => {
    await withApp("lightest-accept", async (page, log) => {
      await seeded(page, open, COLUMNS);
      await page.locator('[name="section_series"]').selectOption("heb");
      await page.locator("[data-testid=lightest-all]").click();
      await page.locator("[data-testid=proposal]").first().waitFor({ state: "visible", timeout: 10_000 });
      const cli = cliSize(COLUMNS, "heb");
      const rows = cli.results || cli.proposals || cli;
      const picks = {};
      for (const c of COLUMNS) {
        const r = rows.find((x) => (x.id || x.member_id) === c.id);
        assert.ok(r, `command line sized ${c.id}: ${JSON.stringify(cli).slice(0, 300)}`);
        const d = r.chosen?.designation ?? r.designation;
        assert.ok(d, JSON.stringify(r));
        picks[c.id] = d;
        const shown = await page.locator(`[data-testid=proposal][data-id="${c.id}"] [data-testid=proposal-chosen]`).textContent();
        assert.ok(shown.startsWith(`${d} `), `${c.id}: app proposes "${shown}", command line ${d}`);
      }
      await page.screenshot({ path: join(OUT, "lightest-proposals.png"), fullPage: true });
      // Accept the first member's alone, then the rest together.
      await page.locator('[data-testid=proposal][data-id="GB-1"] [data-testid=accept-proposal]').click();
      await waitForText(page.locator('[data-testid=member-row][data-id="GB-1"] .row-detail'), (t) => t.includes(picks["GB-1"]));
      assert.equal(await page.locator("[data-testid=proposal]").count(), 1, "the accepted row leaves the table");
      await page.locator('[data-testid=proposal][data-id="GB-2"] [data-testid=accept-proposal]').click();
      for (const c of COLUMNS) {
        const row = page.locator(`[data-testid=member-row][data-id="${c.id}"]`);
        await waitForText(row.locator(".row-detail"), (t) => t.includes(picks[c.id]));
        const u = Number(await row.locator("[data-testid=member-utilisation]").textContent());
        const want = cliUtil(withSection(c, picks[c.id]));
        assert.equal(u, Number(want.toFixed(3)), `${c.id} utilisation`);
        assert.ok(want <= 1.0);
      }
      // Undo puts the last accepted member's section back.
      await page.locator("[data-testid=undo]").click();
      await waitForText(page.locator('[data-testid=member-row][data-id="GB-2"] .row-detail'), (t) => !t.includes(picks["GB-2"]));
      const d1 = await page.locator('[data-testid=member-row][data-id="GB-1"] .row-detail').textContent();
      assert.ok(d1.includes(picks["GB-1"]), d1);
      assert.deepEqual(log.errors, []);
    });
  });
}
