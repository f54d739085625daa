// Browser test of the list tools, registered by run.mjs: `register(test,
// helpers)`. On the demo list: order by utilisation (the stored order stays),
// filter by text and by status, pick two members, open the change form,
// refuse a bad factor, change
// their method (the utilisations shown are the command line's for the
// changed members), and undo the change in one step. And the row's own
// controls (answered by the list's one click handler): a click on the row
// selects it, its pick box picks it without selecting it. And the first
// frame of a stored
// 1,000-member list, in each layout: its rows fill the list's box (it
// builds only as many as the box can show, listops::first_view_px, which
// mirrors the box's heights in style.css).

import assert from "node:assert/strict";
import { join } from "node:path";
import { cliCheck, memberFile, seedStorage, STORAGE_KEY, thousandMembers, waitForText, workspaceText } from "./lib.mjs";

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
      // The tools are folded under the list's heading until opened.
      assert.equal(await page.locator("[name=list_order]").isVisible(), false, "the tools start folded");
      await page.locator("[data-testid=list-tools-fold] > summary").click();
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
  test("row-select-and-pick", async () => {
    await withApp("row-select-and-pick", async (page, log) => {
      await open(page);
      const ids = (await storedMembers(page)).map((m) => m.id);
      const [a, b] = ids;
      const current = () =>
        page.locator("[data-testid=member-row]").evaluateAll((els) =>
          els.filter((e) => e.querySelector(".row-main").getAttribute("aria-current") === "true").map((e) => e.dataset.id),
        );
      const waitCurrent = async (id) => {
        for (let i = 0; i < 50 && (await current()).join() !== id; i += 1) await page.waitForTimeout(100);
        assert.deepEqual(await current(), [id]);
      };
      const row = (id) => page.locator(`[data-testid=member-row][data-id="${id}"]`);
      await row(b).locator(".row-main").click();
      await waitCurrent(b);
      await row(a).locator("[data-testid=member-pick]").click();
      await waitForText(page.locator("[data-testid=list-tally]"), (t) => t.endsWith("· 1 picked"));
      assert.ok(await row(a).locator("[data-testid=member-pick]").isChecked());
      assert.deepEqual(await current(), [b], "picking does not select");
      await row(a).locator(".row-id").click();
      await waitCurrent(a);
      await row(a).locator("[data-testid=member-pick]").click();
      await waitForText(page.locator("[data-testid=list-tally]"), (t) => !t.includes("picked"));
      assert.deepEqual(await current(), [a]);
      assert.deepEqual(log.errors, []);
    });
  });
  test("first-frame-fills-list-box", async () => {
    const layouts = [
      ["desktop", { viewport: { width: 1280, height: 900 } }],
      ["landscape", { viewport: { width: 1180, height: 820 }, hasTouch: true }],
      ["wide", { viewport: { width: 1920, height: 1080 } }],
      ["portrait", { viewport: { width: 820, height: 1180 }, isMobile: true, hasTouch: true }],
      ["phone", { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true }],
    ];
    for (const [name, options] of layouts) {
      await withApp(`first-frame-${name}`, async (page, log, context) => {
        await seedStorage(context, workspaceText([memberFile("Grain store (invented, 1,000 members)", thousandMembers())]));
        // At the first animation frame after the first row is in the page.
        await context.addInitScript(() => {
          const seen = new MutationObserver(() => {
            if (!document.querySelector("[data-testid=member-row]")) return;
            seen.disconnect();
            requestAnimationFrame(() => {
              const box = document.querySelector("[data-testid=member-scroll]").getBoundingClientRect();
              const rows = [...document.querySelectorAll("[data-testid=member-row]")];
              window.__firstFrame = { rows: rows.length, last: rows.at(-1).getBoundingClientRect().bottom, box: box.bottom, height: box.height };
            });
          });
          seen.observe(document, { childList: true, subtree: true });
        });
        await open(page);
        const f = await page.waitForFunction(() => window.__firstFrame).then((h) => h.jsonValue());
        log.errors.length || console.log(`     ${name}: ${f.rows} rows built, the box ${f.height.toFixed(0)} px tall`);
        assert.ok(f.height > 100, `${name}: the list's box is laid out (${f.height} px)`);
        assert.ok(f.last >= f.box, `${name}: the first frame's ${f.rows} rows end at ${f.last} px, the box at ${f.box} px`);
        assert.deepEqual(log.errors, []);
      }, options);
    }
  });

  test("list-name-and-member-actions", async () => {
    await withApp("list-name-and-member-actions", async (page, log) => {
      await open(page);
      const rows = page.locator("[data-testid=member-row]");
      const shown = () => rows.evaluateAll((els) => els.map((e) => e.dataset.id));
      const original = (await storedMembers(page)).map((m) => m.id);
      const title = page.locator("#list-title");
      const fold = page.locator("[data-testid=list-rename]");

      // The member being edited moves, is copied and is deleted from its
      // editor; a deletion can be undone.
      await rows.first().locator(".row-main").click();
      const first = original[0];
      await page.locator("[data-testid=move-member-down]").click();
      await waitForText(rows.nth(1), () => true);
      assert.deepEqual((await storedMembers(page)).map((m) => m.id).slice(0, 2), [original[1], first], "moved down");
      assert.equal(await page.locator("[data-testid=move-member-down]").getAttribute("aria-label"), `Move ${first} down`);
      await page.locator("[data-testid=move-member-up]").click();
      await page.waitForTimeout(300);
      assert.deepEqual((await storedMembers(page)).map((m) => m.id), original, "moved back up");
      await page.locator("[data-testid=duplicate-member]").click();
      await page.waitForTimeout(300);
      const copied = (await storedMembers(page)).map((m) => m.id);
      assert.equal(copied.length, original.length + 1, "copied");
      const copy = copied.find((id) => !original.includes(id));
      assert.ok(copy, "the copy has a new id");
      await page.locator("[data-testid=delete-member]").click();
      await page.waitForTimeout(300);
      assert.deepEqual((await storedMembers(page)).map((m) => m.id), original, "the copy deleted");
      await page.locator("[data-testid=undo]").click();
      await page.waitForTimeout(300);
      assert.deepEqual((await storedMembers(page)).map((m) => m.id), copied, "the deletion undone");
      assert.ok((await shown()).includes(copy));

      // Two new lists, named; the first deleted while open: the name field
      // then shows the list that is open, and typing renames that one.
      for (const name of ["List AAA", "List BBB"]) {
        await page.locator("[data-testid=new-list]").click();
        if (!(await title.isVisible())) await fold.locator("summary").click();
        await title.fill(name);
      }
      const select = page.locator("[data-testid=list-select]");
      const labelOf = async () => (await select.locator("option:checked").textContent()).trim();
      await select.selectOption({ label: "List AAA" });
      await waitForText(title, () => true);
      assert.equal(await title.inputValue(), "List AAA");
      if (!(await page.locator("[data-testid=delete-list]").isVisible())) await fold.locator("summary").click();
      await page.locator("[data-testid=delete-list]").click();
      await page.waitForTimeout(300);
      const nowOpen = await labelOf();
      assert.notEqual(nowOpen, "List AAA", "the deleted list is not open");
      if (!(await title.isVisible())) await fold.locator("summary").click();
      assert.equal(await title.inputValue(), nowOpen, "the name field shows the open list's name");
      await title.fill(`${nowOpen} renamed`);
      await page.waitForTimeout(300);
      const titles = await page.evaluate((k) => JSON.parse(localStorage.getItem(k)).lists.map((l) => l.title), STORAGE_KEY);
      assert.ok(titles.includes(`${nowOpen} renamed`), "the open list is the one renamed");
      assert.ok(!titles.includes("List AAA"), "the deleted list stays deleted");
      assert.deepEqual(log.errors, []);
    });
  });
}
