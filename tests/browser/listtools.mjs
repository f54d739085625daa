// Browser test of the list tools, registered by run.mjs: `register(test,
// helpers)`. On the demo list: order by utilisation (the stored order stays),
// filter by text and by status, pick two members, open the change form,
// refuse a bad factor, change
// their method (the utilisations shown are the command line's for the
// changed members), and undo the change in one step.

import assert from "node:assert/strict";
import { join } from "node:path";
import { cliCheck, memberFile, STORAGE_KEY, waitForText } from "./lib.mjs";

async function storedMembers(page) {
  await page.waitForTimeout(600);
  const w = JSON.parse(await page.evaluate((k) => localStorage.getItem(k), STORAGE_KEY));
  return w.lists[w.active].members;
}

/** Utilisation by id, as the command line works it (to three decimals). */
function cliUtils(members) {
  const out = {};
  for (const r of cliCheck(memberFile("list tools", members)).results) {
    out[r.id] = r.utilisation === undefined ? null : r.utilisation.toFixed(3);
  }
  return out;
}

export function register(test, { withApp, open, OUT }) {
  test("list-tools", async () => {
    await withApp("list-tools", async (page, log) => {
      await open(page);
      const rows = page.locator("[data-testid=member-row]");
      const shown = () => rows.evaluateAll((els) => els.map((e) => e.dataset.id));
      const utilOf = (id) => page.locator(`[data-testid=member-row][data-id="${id}"] [data-testid=member-utilisation]`);
      const tally = page.locator("[data-testid=list-tally]");
      const original = await storedMembers(page);
      const ids = original.map((m) => m.id);
      const before = cliUtils(original);
      await waitForText(tally, (t) => t === `Showing ${ids.length} of ${ids.length}`);
      for (const id of ids) assert.equal((await utilOf(id).textContent()).trim(), before[id] ?? "—", id);

      // Highest utilisation first; the stored order does not change.
      await page.locator("[name=list_order]").selectOption("util-down");
      const byUtil = [...ids].sort((a, b) => Number(before[b] ?? -1) - Number(before[a] ?? -1));
      await waitForText(rows.first(), () => true);
      assert.deepEqual(await shown(), byUtil);
      assert.deepEqual((await storedMembers(page)).map((m) => m.id), ids, "stored order kept");
      await page.locator("[name=list_order]").selectOption("");

      // Text (case ignored: ids, notes, sections), then status.
      await page.locator("[name=list_text]").fill("RECT");
      await waitForText(tally, (t) => t.startsWith("Showing 2 of"));
      assert.deepEqual(await shown(), ["P1", "F1"], "the two rectangular sections");
      await page.locator("[name=list_status]").selectOption("exceeds");
      await waitForText(tally, (t) => t.startsWith("Showing 0 of"));
      assert.deepEqual(await shown(), []);
      await page.locator("[name=list_status]").selectOption("holds");
      await waitForText(tally, (t) => t.startsWith("Showing 2 of"));
      assert.deepEqual(await shown(), ["P1", "F1"]);
      await page.locator("[name=list_status]").selectOption("");
      await page.locator("[name=list_text]").fill("gable");
      await waitForText(tally, (t) => t.startsWith("Showing 1 of"));
      assert.deepEqual(await shown(), ["B1"], "a note");
      await page.locator("[name=list_text]").fill("rect");
      await page.locator("[name=list_status]").selectOption("holds");
      await waitForText(tally, (t) => t.startsWith("Showing 2 of"));

      // Pick the two, then unfold the change form.
      const form = page.locator("[data-testid=list-change]");
      for (const id of ["P1", "F1"]) {
        await page.locator(`[data-testid=member-row][data-id="${id}"] [data-testid=member-pick]`).click();
      }
      await waitForText(tally, (t) => t === `Showing 2 of ${ids.length} · 2 picked`);
      await form.locator("summary").click();
      await form.locator("[name=change_method]").waitFor({ state: "visible" });

      // A bad factor is refused, naming the field; nothing changes.
      await page.locator("[name=change_method]").selectOption("euler");
      await page.locator("[name=change_k_major]").fill("0,7x");
      await page.locator("[data-testid=apply-change]").click();
      const err = await waitForText(page.locator(".list-summary [data-testid=field-error]"), (t) => t.includes("k_major"));
      assert.match(err, /k_major: must be a number/);
      assert.deepEqual(await storedMembers(page), original, "a refused change changes nothing");

      // The method changes for the two picked members only.
      await page.locator("[name=change_k_major]").fill("");
      await page.locator("[data-testid=apply-change]").click();
      const undoBar = page.locator("[data-testid=undo-bar]");
      await waitForText(undoBar, (t) => t.includes("Method set to Euler, capped at squash load for 2 members."));
      const changed = original.map((m) => (["P1", "F1"].includes(m.id) ? { ...m, method: "euler" } : m));
      assert.deepEqual(await storedMembers(page), changed);
      const after = cliUtils(changed);
      for (const id of ["P1", "F1"]) {
        assert.notEqual(after[id], before[id], `${id} utilisation changes with the method`);
        await waitForText(utilOf(id), (t) => t.trim() === after[id]);
      }
      await page.screenshot({ path: join(OUT, "list-tools.png"), fullPage: true });

      // One undo puts both back.
      await page.locator("[data-testid=undo]").click();
      for (const id of ["P1", "F1"]) await waitForText(utilOf(id), (t) => t.trim() === before[id]);
      assert.deepEqual(await storedMembers(page), original);
      await page.locator("[name=list_text]").fill("");
      await page.locator("[name=list_status]").selectOption("");
      await waitForText(tally, (t) => t === `Showing ${ids.length} of ${ids.length} · 2 picked`);
      assert.deepEqual(log.errors, []);
    });
  });
}
