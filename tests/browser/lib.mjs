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

/** An invented beam-column for the edit measurement of a member with
 * moments: a gallery post of a made-up cider-press house, a rolled I of
 * custom steel to EN 1993-1-1, end moments about the major axis and a
 * small uniform moment about the minor axis (the interaction chart). */
export const MOMENTS_POST = {
  id: "CP-2",
  section: { kind: "i", depth_mm: 260, width_mm: 260, flange_mm: 17.5, web_mm: 10, root_radius_mm: 24 },
  material: { fy_mpa: 355, e_mpa: 210000 },
  length_mm: 3800,
  axial_kn: 700,
  method: "en1993-1-1",
  m_major_a_knm: 45,
  m_major_b_knm: -20,
  m_minor_a_knm: 3,
  m_minor_b_knm: 3,
};

// 1,000 invented members of a made-up grain store: a mix of shapes,
// materials and methods, lengths and loads varying member by member
// (`count` of them: the start is also measured with 10,000).
export function thousandMembers(count = 1000) {
  const methods = ["en1993-1-1", "aisc360-lrfd", "aisc360-asd", "csa-s16", "perry-robertson", "secant", "euler"];
  const members = [];
  for (let i = 0; i < count; i += 1) {
    const id = `G${String(i + 1).padStart(4, "0")}`;
    const length_mm = 1500 + ((i * 37) % 4000);
    const axial_kn = 20 + ((i * 53) % 700);
    const steel = { fy_mpa: [235, 275, 355][i % 3], e_mpa: 210000 };
    const pick = i % 5;
    if (pick === 4) {
      members.push({
        id,
        section: { kind: "rect", depth_mm: 120 + (i % 6) * 20, width_mm: 100 + (i % 4) * 20 },
        material: { fc0k_mpa: 21, e005_mpa: 7400, e0mean_mpa: 11000, timber: "solid" },
        length_mm,
        axial_kn: 10 + (i % 90),
        method: "en1995-1-1",
      });
      continue;
    }
    const section = [
      { kind: "i", depth_mm: 200 + (i % 5) * 20, width_mm: 150 + (i % 3) * 25, flange_mm: 10 + (i % 4), web_mm: 6.5 + (i % 3), root_radius_mm: 12 },
      { kind: "rhs", depth_mm: 100 + (i % 4) * 20, width_mm: 100, wall_mm: 5 + (i % 3), outer_radius_mm: 10 },
      { kind: "chs", diameter_mm: 114.3 + (i % 4) * 25, wall_mm: 4 + (i % 3) },
      { kind: "round", diameter_mm: 50 + (i % 6) * 10 },
    ][pick];
    members.push({ id, section, material: steel, length_mm, axial_kn, method: methods[i % methods.length] });
  }
  return members;
}

/** Stores `text` as the workspace once per browser session of `context`
 * (a reload keeps what the app saved since). */
export async function seedStorage(context, text) {
  await context.addInitScript(
    ([key, value]) => {
      if (!sessionStorage.getItem("strutline-bench-seeded")) {
        sessionStorage.setItem("strutline-bench-seeded", "1");
        localStorage.setItem(key, value);
      }
    },
    [STORAGE_KEY, text],
  );
}

/** Opens the app and selects its first member (or the first row that
 * `row` selects), waiting for its editor and its verdict. */
export async function openForEditing(page, url, row = "[data-testid=member-row]") {
  await page.goto(url, { waitUntil: "load" });
  await page.locator(row).first().click({ timeout: 20_000 });
  await page.locator("input[name=axial_kn]").first().waitFor({ state: "visible", timeout: 10_000 });
  await page.locator("[data-testid=result-utilisation]").first().waitFor({ state: "visible", timeout: 10_000 });
}

/** Waits until the result's blocks built after the frame that shows an
 * edit (the working and What if) are in: neither is aria-busy. A test that
 * reads them after an edit waits for this, or it may read the last
 * member's. */
export async function settled(page) {
  await page.waitForFunction(
    () => ["working-block", "whatif-block"].every((t) => document.querySelector(`[data-testid=${t}]`)?.getAttribute("aria-busy") === "false"),
    null,
    { timeout: 10_000 },
  );
}

/** Runs in the page (`page.evaluate(editLoop, n)`): sets a new design load
 * in input[name=axial_kn] `n` times (input and change events, as typing
 * gives) and returns, per edit, the milliseconds until
 * [data-testid=result-utilisation] shows a new text (`dom`) and until the
 * next animation frame after that (`frame`), and the count of edits that
 * changed nothing within 2 s (`timeouts`), and until the blocks built
 * after that frame (the working and What if, aria-busy until they are in)
 * are in (`settled`). `page.evaluate(editLoop, {n, field})` edits another
 * number field the same way (an end moment). */
export const editLoop = async (arg) => {
  const n = typeof arg === "number" ? arg : arg.n;
  const field = (typeof arg === "object" && arg.field) || "axial_kn";
  const input = document.querySelector(`form.editor input[name=${field}]`) || document.querySelector(`input[name=${field}]`);
  const base = Number(String(input.value).replace(",", ".")) || 100;
  const result = () => document.querySelector("[data-testid=result-utilisation]");
  const dom = [];
  const frame = [];
  const settled = [];
  let timeouts = 0;
  const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value").set;
  const busy = () => document.querySelector("[data-testid=working-block][aria-busy=true], [data-testid=whatif-block][aria-busy=true]");
  for (let i = 0; i < n; i += 1) {
    const before = result()?.textContent ?? "";
    // Alternate above and below the starting load so the text changes.
    const value = (base * (i % 2 === 0 ? 1.1 : 0.9) + i * 0.01).toFixed(2);
    let t0 = 0;
    const t = await new Promise((resolve) => {
      let done = false;
      const finish = (changedAt) => {
        if (done) return;
        done = true;
        observer.disconnect();
        clearTimeout(timer);
        requestAnimationFrame(() => resolve({ changedAt, frameAt: performance.now() }));
      };
      const observer = new MutationObserver(() => {
        if ((result()?.textContent ?? "") !== before) finish(performance.now());
      });
      observer.observe(document.body, { childList: true, subtree: true, characterData: true });
      const timer = setTimeout(() => {
        done = true;
        observer.disconnect();
        resolve(null);
      }, 2000);
      t0 = performance.now();
      input.focus();
      setter.call(input, value);
      input.dispatchEvent(new Event("input", { bubbles: true }));
      input.dispatchEvent(new Event("change", { bubbles: true }));
      if ((result()?.textContent ?? "") !== before) finish(performance.now());
    });
    if (t === null) {
      timeouts += 1;
    } else {
      dom.push(t.changedAt - t0);
      frame.push(t.frameAt - t0);
      // The working and What if are built after the frame: the time
      // until both are in, before the next edit.
      const until = performance.now() + 2000;
      while (busy() && performance.now() < until) await new Promise((r) => setTimeout(r, 0));
      settled.push(performance.now() - t0);
    }
    // Let the page settle between edits.
    await new Promise((r) => setTimeout(r, 5));
  }
  return { dom, frame, settled, timeouts };
};

/** Runs in the page (`page.evaluate(modelEditLoop, values)`): for each of
 * `values`, sets the column-model panel's load along the length
 * (#cm-distributed) and dispatches `input` (what typing gives), waits
 * until the panel's canvas has been drawn again (its `data-drawn` counter,
 * moved by the draw effect), then one animation frame; returns the
 * milliseconds from the edit to that frame, one an edit (`times`), the
 * app's list re-check time after each (`window.strutlineRecheck`), and the
 * milliseconds from the edit until What if, worked after the frame, is in
 * (`whatif`: [data-testid=whatif-block] no longer aria-busy). */
export const modelEditLoop = async (values) => {
  const times = [];
  const recheck = [];
  const whatif = [];
  const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value").set;
  for (const value of values) {
    const el = document.getElementById("cm-distributed");
    const canvas = document.querySelector("[data-testid=cm-canvas]");
    const before = Number(canvas.dataset.drawn || 0);
    const t0 = performance.now();
    setter.call(el, value);
    el.dispatchEvent(new Event("input", { bubbles: true }));
    while (Number(canvas.dataset.drawn || 0) <= before) {
      await new Promise((r) => setTimeout(r, 0));
    }
    await new Promise((r) => requestAnimationFrame(r));
    times.push(performance.now() - t0);
    recheck.push(window.strutlineRecheck?.ms ?? NaN);
    // What if is worked after the frame: the time until it is in, before
    // the next edit.
    const block = document.querySelector("[data-testid=whatif-block]");
    while (block && block.getAttribute("aria-busy") !== "false") {
      await new Promise((r) => setTimeout(r, 0));
    }
    whatif.push(performance.now() - t0);
    await new Promise((r) => setTimeout(r, 5));
  }
  return { times, recheck, whatif };
};

/** Invented columns with a buckling model for the edit measurement, of a
 * made-up tram depot: a stepped column (HE 300 B to 6 m, HE 200 B above),
 * foot fixed about the major axis, a rigid minor-axis brace at mid-height,
 * a load along the length only (its alpha_cr scales exactly with the
 * length); and the same with springs (a sway spring at the top about the
 * major axis, the brace a spring) and loads at two levels as well. */
export function modelColumns() {
  const base = (id, extra) => ({
    id,
    section: { kind: "catalogue", designation: "HE 300 B" },
    material: { grade: "S355" },
    length_mm: 9000,
    axial_kn: 500,
    method: "en1993-1-1",
    buckling_model: {
      segments: [{ length_mm: 6000 }, { length_mm: 3000, section: { kind: "catalogue", designation: "HE 200 B" } }],
      ends: {
        a: { major: { translation: "fixed", rotation: "fixed" }, minor: { translation: "fixed", rotation: "free" } },
        b: { major: { translation: "fixed", rotation: "free" }, minor: { translation: "fixed", rotation: "free" } },
      },
      restraints: [{ at_mm: 4500, axis: "minor", translation: "fixed" }],
      distributed_kn_per_m: 1.2,
      ...extra,
    },
  });
  const sprung = base("TD-2", {
    restraints: [{ at_mm: 4500, axis: "minor", translation: 15 }],
    axial_loads: [{ at_mm: 6000, axial_kn: 380 }, { at_mm: 9000, axial_kn: 120 }],
  });
  sprung.buckling_model.ends.b.major.translation = 4;
  return [base("TD-1", {}), sprung];
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

/** What a picture on the page (an <img> locator) holds: its size as
 * decoded and as shown, the share of its pixels that differ from its
 * top-left corner's colour (`ink`), and for each [r, g, b] of `colours`
 * the count of pixels within 24 of it on every channel (`near`). */
export async function pictureInks(img, colours = []) {
  return img.evaluate(async (el, colours) => {
    await el.decode().catch(() => {});
    const c = document.createElement("canvas");
    c.width = el.naturalWidth;
    c.height = el.naturalHeight;
    const g = c.getContext("2d");
    g.drawImage(el, 0, 0);
    const d = c.width && c.height ? g.getImageData(0, 0, c.width, c.height).data : [];
    const near = colours.map(() => 0);
    let ink = 0;
    for (let i = 0; i < d.length; i += 4) {
      if (Math.abs(d[i] - d[0]) + Math.abs(d[i + 1] - d[1]) + Math.abs(d[i + 2] - d[2]) > 60) ink += 1;
      colours.forEach(([r, gr, b], k) => {
        if (Math.abs(d[i] - r) < 24 && Math.abs(d[i + 1] - gr) < 24 && Math.abs(d[i + 2] - b) < 24) near[k] += 1;
      });
    }
    const r = el.getBoundingClientRect();
    return {
      natural: [el.naturalWidth, el.naturalHeight],
      shown: [Math.round(r.width), Math.round(r.height)],
      ink: ink / Math.max(1, d.length / 4),
      near,
    };
  }, colours);
}
