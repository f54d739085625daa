// Shared helpers of the browser tests and measurements: arguments, the
// browser launch (Debian's Chromium through playwright-core, never a
// downloaded browser), the strutline command line, and the app's agreed
// selectors.

import { spawnSync } from "node:child_process";
import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium } from "playwright-core";

export const HERE = dirname(fileURLToPath(import.meta.url));
export const ROOT = process.env.STRUTLINE_ROOT || join(HERE, "..", "..");
export const OUT = join(HERE, "out");
export const CHROMIUM = process.env.STRUTLINE_CHROMIUM || "/usr/bin/chromium";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export const STORAGE_KEY = "strutline.v1.workspace";
export const UNREADABLE_PREFIX = "strutline.v1.unreadable.";

/** `--name value` from the command line, or `fallback`. */
export function arg(name, fallback = undefined) {
  const argv = process.argv.slice(2);
  const i = argv.indexOf(name);
  if (i >= 0 && i + 1 < argv.length) return argv[i + 1];
  const eq = argv.find((a) => a.startsWith(name + "="));
  return eq ? eq.slice(name.length + 1) : fallback;
}

/** Launches Chromium with its own fresh profile directory. Returns
 * { context, close } where close() also removes the profile. */
export async function launch(options = {}) {
  const profile = mkdtempSync(join(tmpdir(), "strutline-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1280, height: 900 },
    ...options,
  });
  return {
    context,
    async close() {
      await context.close().catch(() => {});
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** The context's one page (a persistent context opens with one). */
export async function firstPage(context) {
  return context.pages()[0] || (await context.newPage());
}

export function ensureOut() {
  mkdirSync(OUT, { recursive: true });
  return OUT;
}

/** Runs `strutline check FILE --json` on a member file (object) and returns
 * the parsed `{"results": [...]}`. The exit status (1 when a member is
 * over capacity) is not an error; an unparsable output is. */
const cliCache = new Map();
export function cliCheck(memberFile) {
  const key = JSON.stringify(memberFile);
  if (!cliCache.has(key)) cliCache.set(key, cliCheckUncached(memberFile));
  return cliCache.get(key);
}

function cliCheckUncached(memberFile) {
  const dir = mkdtempSync(join(tmpdir(), "strutline-cli-"));
  const file = join(dir, "members.json");
  writeFileSync(file, JSON.stringify(memberFile, null, 2));
  const cargo = process.env.STRUTLINE_CARGO || "cargo";
  const run = spawnSync(
    cargo,
    ["run", "--release", "-q", "-p", "strutline-cli", "--bin", "strutline", "--", "check", file, "--json"],
    { cwd: ROOT, encoding: "utf8", maxBuffer: 64 * 1024 * 1024 },
  );
  rmSync(dir, { recursive: true, force: true });
  if (run.error) throw new Error(`could not run the command line: ${run.error.message}`);
  try {
    return JSON.parse(run.stdout);
  } catch {
    throw new Error(
      `the command line gave no JSON (exit ${run.status}): ${run.stderr.trim().slice(0, 2000)}`,
    );
  }
}

/** A member file holding `members`. */
export function memberFile(title, members) {
  return { format: "strutline.members", version: 1, title, members };
}

/** A workspace text as the app stores it. */
export function workspaceText(lists) {
  return JSON.stringify({ revision: 1, format: "strutline.workspace", version: 1, active: 0, lists });
}

/** Parses a utilisation as shown: "0.532", "0,532", "53.2 %". Returns
 * { value, decimals } where decimals is the number of decimals of the
 * ratio the text resolves (a percentage with one decimal resolves 3). */
export function parseUtilisation(text) {
  const t = String(text).replace(/\u00a0/g, " ").trim();
  const m = t.match(/(-?\d+(?:[.,]\d+)?)\s*(%)?/);
  if (!m) return null;
  const digits = m[1].replace(",", ".");
  const shown = (digits.split(".")[1] || "").length;
  const percent = Boolean(m[2]);
  const value = Number(digits) / (percent ? 100 : 1);
  return { value, decimals: shown + (percent ? 2 : 0) };
}

/** Sets a form field by its name: selects an option of a <select>, ticks a
 * checkbox, or types into an input. Fails naming the field when the page
 * has no such field. */
export async function setField(page, scope, name, value) {
  // A name starting with "?" is optional: it is skipped when absent.
  const optional = name.startsWith("?");
  const key = optional ? name.slice(1) : name;
  const field = scope.locator(`[name="${key}"]`).first();
  if ((await field.count()) === 0) {
    if (optional) return;
    throw new Error(`the page has no field named "${key}"`);
  }
  const tag = await field.evaluate((el) => el.tagName.toLowerCase());
  if (tag === "select") {
    await field.selectOption(String(value));
  } else if ((await field.getAttribute("type")) === "checkbox") {
    await field.setChecked(Boolean(value));
  } else {
    await field.fill(String(value));
    // Commit the value as a person leaving the field would.
    await field.dispatchEvent("change");
  }
}

/** The fields to type for a member, in the order a person would: what
 * decides which other fields exist comes first. */
export function memberFields(member) {
  const out = [["id", member.id], ["kind", member.section.kind]];
  for (const [k, v] of Object.entries(member.section)) {
    if (k !== "kind") out.push([k, v]);
  }
  out.push(["method", member.method]);
  // How the material is given, where the editor asks (grade, steel, timber).
  const mode = "grade" in member.material ? "grade" : "fc0k_mpa" in member.material ? "timber" : "steel";
  out.push(["?material_mode", mode]);
  for (const [k, v] of Object.entries(member.material)) out.push([k, v]);
  for (const k of Object.keys(member)) {
    if (!["id", "section", "material", "method", "note"].includes(k)) out.push([k, member[k]]);
  }
  return out;
}

/** Waits until `locator` has a text that `accept` takes, or throws. */
export async function waitForText(locator, accept, timeout = 10_000) {
  const end = Date.now() + timeout;
  let last = null;
  while (Date.now() < end) {
    if ((await locator.count()) > 0) {
      last = await locator.first().textContent().catch(() => null);
      if (last !== null && accept(last)) return last;
    }
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`timed out waiting for a text; last seen: ${JSON.stringify(last)}`);
}

/** Opens the app at `url` in a fresh profile (with `launchOptions`), waits
 * for it to show its caution, runs `fn(page)` and fails on any console or
 * page error; a failure leaves `OUT/<name>-failed.png`. */
export async function withOpenApp(url, name, fn, launchOptions = {}) {
  const { context, close } = await launch(launchOptions);
  const page = await firstPage(context);
  const errors = [];
  page.on("pageerror", (e) => errors.push(e.message));
  page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
  try {
    await page.goto(url, { waitUntil: "load" });
    await page.locator("[data-testid=caution]").first().waitFor({ timeout: 15_000 });
    await fn(page);
    if (errors.length) throw new Error(`console errors: ${errors.join(" | ")}`);
  } catch (e) {
    await page.screenshot({ path: join(ensureOut(), `${name}-failed.png`), fullPage: true }).catch(() => {});
    throw e;
  } finally {
    await close();
  }
}

/** Runs `tests` ({name, fn}) one after another (only the one named `only`
 * when given), prints "ok"/"FAIL" lines and "<label>: N passed, N failed",
 * and exits 1 when any failed. */
export async function runTests(label, tests, only) {
  let passed = 0;
  let failed = 0;
  for (const t of only ? tests.filter((t) => t.name === only) : tests) {
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
  console.log(`${label}: ${passed} passed, ${failed} failed`);
  process.exit(failed > 0 ? 1 : 0);
}
