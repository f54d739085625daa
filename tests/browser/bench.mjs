// Browser measurements of Strutline: `node tests/browser/bench.mjs --url
// URL --out DIR [--dist-zlib N --dist-sent N --dist-budget N --cache-name NAME]`,
// normally through `cargo xtask bench-web`. Writes DIR/web.json and
// DIR/web.md with the machine description. Every figure is what this run
// measured, met or missed; nothing is adjusted.
//
// 1. first render: navigation start to the first visible member row, in
//    a fresh profile (cold) and on reloads (warm), on the loopback link
//    and on an emulated slow mobile connection (1.6 Mbit/s down, 150 ms
//    round trip, set through the DevTools protocol), first visit and a
//    later visit from the cache;
// 2. per edit: typing a new design load into input[name=axial_kn] until
//    [data-testid=result-utilisation] shows a new text (DOM) and until the
//    next animation frame after that (frame), over 100 edits (and until the
//    working and What if, built after that frame, are in); and the same
//    for the member given end moments first, so each edit re-checks it and
//    redraws its interaction chart (both axes' curves);
//    and an edit of a column model's load along the length until its
//    buckled shapes are redrawn (the panel's canvas drawn again, then the
//    next frame), for a model whose alpha_cr scales exactly with the length
//    and one with springs (lib.mjs modelColumns, modelEditLoop);
// 3. 1,000 members: a stored workspace of 1,000 members, from the moment
//    the module is ready (mark "strutline-wasm-ready" in boot.js) until
//    the rows are in the page and the next frame has started; the same
//    window for a fresh profile (the demo workspace, nothing stored) and
//    for 10,000 stored members (`--only start-demo,start-10k`), to tell
//    the list's part from the app's fixed start.

import { spawnSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import os from "node:os";
import { join } from "node:path";
import { arg, CHROMIUM, cliCheck, firstPage, launch, memberFile, workspaceText, thousandMembers, seedStorage, openForEditing, editLoop, modelColumns, modelEditLoop } from "./lib.mjs";

const URL_ARG = arg("--url");
const OUT_DIR = arg("--out");
if (!URL_ARG || !OUT_DIR) {
  console.error("usage: node bench.mjs --url http://127.0.0.1:PORT/ --out DIR");
  process.exit(2);
}
const BASE = new URL(URL_ARG);
const DIST_ZLIB = Number(arg("--dist-zlib", "NaN"));
const DIST_SENT = Number(arg("--dist-sent", "NaN"));
const DIST_BUDGET = Number(arg("--dist-budget", "NaN"));
const CACHE_NAME = arg("--cache-name", "");
// `--only first,slow,edit,model,thousand,start-demo,start-10k,sizing`: measure only these (for a
// quick look while working; bench/web.md is written from a full run).
const ONLY = arg("--only");
const wanted = (what) => !ONLY || ONLY.split(",").includes(what);

const TARGETS = {
  first_render_ms: 1000,
  slow_cold_ms: 3500,
  slow_cached_ms: 500,
  edit_ms: 16,
  model_ms: 50,
  thousand_ms: 50,
  sizing_ms: 300,
  dist_zlib_bytes: DIST_BUDGET,
};

// The slow mobile connection, in the units of the DevTools protocol's
// Network.emulateNetworkConditions: 1.6 Mbit/s down, 150 ms added to each
// request's round trip; 750 kbit/s up (our choice: the page sends little).
const SLOW = {
  offline: false,
  latency: 150,
  downloadThroughput: 1.6e6 / 8,
  uploadThroughput: 750e3 / 8,
};

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  if (s.length === 0) return NaN;
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const quantile = (xs, q) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.min(s.length - 1, Math.floor(q * s.length))] : NaN;
};

// Runs in the page before its scripts: records when the first member row
// becomes visible, and when `want` rows are in the page, each with the
// time at the start of the next animation frame's callbacks.
function watchRows(want) {
  window.__strutlineFirstRow = null;
  window.__strutlineAllRows = null;
  const mark = (slot) => {
    const seen = performance.now();
    window[slot] = { seen };
    // performance.now() in the callback, not the callback's argument:
    // that is the frame's start, which can lie before the moment seen.
    requestAnimationFrame(() => {
      window[slot].frame = performance.now();
    });
  };
  const look = () => {
    const rows = document.querySelectorAll("[data-testid=member-row]");
    if (!window.__strutlineFirstRow && rows.length > 0 && rows[0].getBoundingClientRect().height > 0) {
      mark("__strutlineFirstRow");
    }
    // The list builds only the rows in view: it is ready when its rows
    // fill its scrolling box (or all `want` are there).
    const box = document.querySelector("[data-testid=member-scroll]");
    const last = rows[rows.length - 1];
    const filled =
      box && last && last.getBoundingClientRect().height > 0 &&
      last.getBoundingClientRect().bottom >= box.getBoundingClientRect().bottom;
    if (!window.__strutlineAllRows && (rows.length >= want || filled)) {
      mark("__strutlineAllRows");
    }
    if (window.__strutlineFirstRow && window.__strutlineAllRows) observer.disconnect();
  };
  const observer = new MutationObserver(look);
  document.addEventListener("DOMContentLoaded", () => {
    observer.observe(document.body, { childList: true, subtree: true });
    look();
  });
}

async function firstRow(page) {
  await page.waitForFunction(() => window.__strutlineFirstRow && window.__strutlineFirstRow.frame, null, {
    timeout: 20_000,
  });
  return page.evaluate(() => {
    const own = performance.getEntriesByName("strutline-first-render")[0];
    const fcp = performance.getEntriesByName("first-contentful-paint")[0];
    return {
      row_ms: window.__strutlineFirstRow.seen,
      frame_ms: window.__strutlineFirstRow.frame,
      app_mark_ms: own ? own.startTime : null,
      first_contentful_paint_ms: fcp ? fcp.startTime : null,
      mounted_ms: performance.getEntriesByName("strutline-mounted")[0]?.startTime ?? null,
    };
  });
}

async function measureFirstRender() {
  const cold = [];
  const warm = [];
  for (let run = 0; run < 3; run += 1) {
    const { context, close } = await launch();
    try {
      await context.addInitScript(watchRows, 1);
      const page = await firstPage(context);
      await page.goto(BASE.href, { waitUntil: "load" });
      cold.push(await firstRow(page));
      for (let i = 0; i < (run === 0 ? 5 : 0); i += 1) {
        await page.reload({ waitUntil: "load" });
        warm.push(await firstRow(page));
      }
    } finally {
      await close();
    }
  }
  return { cold, warm };
}

// Applies the slow connection to `page` through a DevTools protocol
// session of playwright-core (Chromium only).
async function throttle(page) {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.emulateNetworkConditions", SLOW);
  return cdp;
}

// What the page loaded: each resource's bytes over the wire and how long
// its body took to arrive.
function transfers(page) {
  return page.evaluate(() =>
    [...performance.getEntriesByType("navigation"), ...performance.getEntriesByType("resource")].map((e) => ({
      name: e.name.split("/").pop() || "/",
      encoded: e.encodedBodySize,
      transfer: e.transferSize,
      body_ms: e.responseEnd - e.responseStart,
      start_ms: e.startTime,
      end_ms: e.responseEnd,
    })),
  );
}

// First render on the slow connection: a fresh profile (first visit:
// nothing cached, no service worker), then, once the service worker has
// installed and precached the app, a new tab opening the address again
// (a later visit, answered from the cache), both throttled.
async function measureSlow() {
  const cold = [];
  const cached = [];
  let wire = null;
  for (let run = 0; run < 3; run += 1) {
    const { context, close } = await launch();
    try {
      await context.addInitScript(watchRows, 1);
      let page = await firstPage(context);
      await throttle(page);
      await page.goto(BASE.href, { waitUntil: "load", timeout: 120_000 });
      cold.push(await firstRow(page));
      if (run === 0) wire = await transfers(page);
      // The worker precaches every file before it activates.
      await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
      for (let visit = 0; visit < (run === 0 ? 3 : 1); visit += 1) {
        await page.close();
        page = await context.newPage();
        await throttle(page);
        await page.goto(BASE.href, { waitUntil: "load", timeout: 120_000 });
        const r = await firstRow(page);
        r.controlled = await page.evaluate(() => Boolean(navigator.serviceWorker.controller));
        cached.push(r);
      }
    } finally {
      await close();
    }
  }
  return { cold, cached, wire };
}

async function measureEdits(count = 100, moments = false, field = "axial_kn") {
  const { context, close } = await launch();
  try {
    const page = await firstPage(context);
    // The beam-column: the demo's steel column C1 (EN 1993-1-1), whose
    // method and material check bending (the first demo member's custom
    // timber has no bending strength).
    const row = moments ? '[data-testid=member-row][data-id="C1"]' : "[data-testid=member-row]";
    await openForEditing(page, BASE.href, row);
    if (moments) {
      // End moments about both axes: the member becomes a beam-column and
      // its chart the interaction chart, redrawn on every edit.
      const fold = page.locator("form.editor details.bending-input").first();
      if (!(await fold.evaluate((d) => d.open))) await fold.locator("summary").click();
      for (const [name, value] of [["m_major_a_knm", "2"], ["m_major_b_knm", "-1"], ["m_minor_a_knm", "0.5"]]) {
        const f = page.locator(`form.editor [name="${name}"]`).first();
        await f.fill(value);
        await f.dispatchEvent("change");
      }
      await page.locator("canvas#envelope[data-chart=interaction]").waitFor({ timeout: 10_000 });
    }
    return await page.evaluate(editLoop, { n: count, field });
  } finally {
    await close();
  }
}

// Edits of a column model's load along the length, `count` of them, on
// the invented columns of lib.mjs modelColumns (the member `id`).
async function measureModelEdits(id, count = 30) {
  const { context, close } = await launch();
  try {
    await seedStorage(context, workspaceText([memberFile("Tram depot (invented)", modelColumns())]));
    const page = await firstPage(context);
    await openForEditing(page, BASE.href, `[data-testid=member-row][data-id="${id}"]`);
    await page.locator("[data-testid=cm-canvas][data-shapes='2']").waitFor({ timeout: 10_000 });
    const values = Array.from({ length: count }, (_, i) => (1 + (i % 10) * 0.25 + i * 0.001).toFixed(3));
    return await page.evaluate(modelEditLoop, values);
  } finally {
    await close();
  }
}

const THOUSAND = memberFile("Grain store (invented, 1,000 members)", thousandMembers());

// The engine must accept every member, or the measurement means nothing.
function cliThousand() {
  try {
    const started = process.hrtime.bigint();
    const cli = cliCheck(THOUSAND);
    return {
      results: cli.results.length,
      wall_ms_including_cargo: Number(process.hrtime.bigint() - started) / 1e6,
    };
  } catch (e) {
    return { error: String(e.message || e).slice(0, 300) };
  }
}

// `text`: the stored workspace (null: a fresh profile, the demo);
// `want`: its member count (the list is ready at that many rows or when
// its rows fill the scrolling box).
async function measureThousand(text = workspaceText([THOUSAND]), want = 1000) {
  const runs = [];
  let rows = null;
  for (let run = 0; run < 3; run += 1) {
    const { context, close } = await launch();
    try {
      if (text !== null) await seedStorage(context, text);
      await context.addInitScript(watchRows, want);
      const page = await firstPage(context);
      await page.goto(BASE.href, { waitUntil: "load" });
      await page.waitForFunction(() => window.__strutlineAllRows && window.__strutlineAllRows.frame, null, {
        timeout: 30_000,
      });
      // The members after the rows in view are checked in slices after
      // the first frame: the engine's total is noted when the last is done.
      await page
        .waitForFunction((n) => window.strutlineRecheck && window.strutlineRecheck.fresh >= n, want, { timeout: 30_000 })
        .catch(() => {});
      const r = await page.evaluate(() => {
        const statuses = [...document.querySelectorAll("[data-testid=member-status]")];
        return {
          ready: performance.getEntriesByName("strutline-wasm-ready")[0]?.startTime ?? null,
          mounted: performance.getEntriesByName("strutline-mounted")[0]?.startTime ?? null,
          all_rows_seen: window.__strutlineAllRows.seen,
          frame: window.__strutlineAllRows.frame,
          rows: document.querySelectorAll("[data-testid=member-row]").length,
          // The app's own timing of its last list re-check (engine work only).
          recheck_ms: window.strutlineRecheck ? window.strutlineRecheck.ms : null,
          recheck_fresh: window.strutlineRecheck ? window.strutlineRecheck.fresh : null,
          statuses_with_text: statuses.filter((s) => (s.textContent || "").trim() !== "").length,
        };
      });
      const problem = await page.locator("[data-testid=storage-problem]").count();
      runs.push({ ...r, storage_problem: problem > 0 });
      rows = r.rows;
    } finally {
      await close();
    }
  }
  return { runs, rows };
}

// "Lightest that works" for all 1,000 members against every I/H section of
// the catalogue (265 entries; no single series has 300), timed by the app
// itself around its sizing call (`window.strutlineSizing`), median of 3.
async function measureSizing() {
  const text = workspaceText([THOUSAND]);
  const runs = [];
  const { context, close } = await launch();
  try {
    await seedStorage(context, text);
    const page = await firstPage(context);
    await page.goto(BASE.href, { waitUntil: "load" });
    await page.locator("[data-testid=member-row]").first().waitFor({ timeout: 30_000 });
    await page.locator('[name="section_shape"]').selectOption("i");
    for (let run = 0; run < 3; run += 1) {
      await page.evaluate(() => { window.strutlineSizing = null; });
      await page.locator("[data-testid=lightest-all]").click();
      await page.waitForFunction(() => window.strutlineSizing && window.strutlineSizing.members === 1000, null, {
        timeout: 60_000,
      });
      const r = await page.evaluate(() => ({
        ms: window.strutlineSizing.ms,
        members: window.strutlineSizing.members,
        proposals: document.querySelectorAll("[data-testid=proposal]").length,
      }));
      runs.push(r);
    }
  } finally {
    await close();
  }
  return runs;
}

function machine(browserVersion) {
  const cpus = os.cpus();
  return {
    cpu: cpus[0]?.model?.trim() ?? "unknown",
    logical_cpus: cpus.length,
    memory_gib: Math.round((os.totalmem() / 2 ** 30) * 10) / 10,
    os: `${os.type()} ${os.release()} ${os.arch()}`,
    node: process.version,
    browser: browserVersion,
    load_average_at_start: os.loadavg().map((x) => Math.round(x * 100) / 100),
  };
}

const fmt = (x, d = 1) => (Number.isFinite(x) ? x.toFixed(d) : "n/a");
const verdict = (x, target) => (Number.isFinite(x) ? (x <= target ? "met" : "MISSED") : "not measured");

const startedAt = new Date().toISOString();
const browserVersion = (spawnSync(CHROMIUM, ["--version"], { encoding: "utf8" }).stdout || "unknown").trim();
const host = machine(browserVersion);
console.log(`bench-web against ${BASE.href} on ${host.cpu} (${host.logical_cpus} logical CPUs)`);

const report = { started_at: startedAt, url: BASE.href, cache_name: CACHE_NAME, machine: host, targets: TARGETS, errors: {} };

if (wanted("first")) try {
  const fr = await measureFirstRender();
  report.first_render = {
    cold_runs: fr.cold,
    warm_runs: fr.warm,
    cold_median_ms: median(fr.cold.map((r) => r.frame_ms)),
    warm_median_ms: median(fr.warm.map((r) => r.frame_ms)),
  };
  console.log(`first render: cold ${fmt(report.first_render.cold_median_ms)} ms, warm ${fmt(report.first_render.warm_median_ms)} ms`);
} catch (e) {
  report.errors.first_render = String(e.message || e).split("\n")[0];
  console.log(`first render: not measured: ${report.errors.first_render}`);
}

if (wanted("slow")) try {
  const sl = await measureSlow();
  const wasm = (sl.wire || []).find((e) => e.name.endsWith(".wasm"));
  const wireBytes = (sl.wire || []).reduce((n, e) => n + e.encoded, 0);
  // The throttle must have held: the module cannot arrive faster than
  // 1.6 Mbit/s allows (a tenth of slack for timer rounding).
  const floorMs = wasm ? (wasm.encoded / SLOW.downloadThroughput) * 1000 * 0.9 : NaN;
  report.slow = {
    connection: SLOW,
    cold_runs: sl.cold,
    cached_runs: sl.cached,
    cold_median_ms: median(sl.cold.map((r) => r.frame_ms)),
    cached_median_ms: median(sl.cached.map((r) => r.frame_ms)),
    cached_all_controlled: sl.cached.every((r) => r.controlled),
    first_visit_wire_bytes: wireBytes,
    first_visit_transfers: sl.wire,
    module_body_ms: wasm ? wasm.body_ms : null,
    module_body_floor_ms: floorMs,
  };
  if (!wasm || !(wasm.body_ms >= floorMs)) {
    throw new Error(
      `the throttle did not hold: the module (${wasm?.encoded} B) arrived in ${wasm?.body_ms} ms, under the ${floorMs} ms 1.6 Mbit/s allows`,
    );
  }
  if (!report.slow.cached_all_controlled) throw new Error("a later visit was not answered by the service worker");
  console.log(
    `slow connection: first visit ${fmt(report.slow.cold_median_ms)} ms, from the cache ${fmt(report.slow.cached_median_ms)} ms (${wireBytes} B over the wire)`,
  );
} catch (e) {
  report.errors.slow = String(e.message || e).split("\n")[0];
  console.log(`slow connection: not measured: ${report.errors.slow}`);
}

if (wanted("edit")) try {
  const ed = await measureEdits(100);
  report.edit = {
    edits: ed.dom.length,
    timeouts: ed.timeouts,
    dom_median_ms: median(ed.dom),
    frame_median_ms: median(ed.frame),
    frame_p90_ms: quantile(ed.frame, 0.9),
    settled_median_ms: median(ed.settled),
    dom_samples_ms: ed.dom.map((x) => Math.round(x * 100) / 100),
  };
  console.log(`edit: DOM ${fmt(report.edit.dom_median_ms, 2)} ms, next frame ${fmt(report.edit.frame_median_ms, 2)} ms (median of ${ed.dom.length}, ${ed.timeouts} timeouts)`);
} catch (e) {
  report.errors.edit = String(e.message || e).split("\n")[0];
  console.log(`edit: not measured: ${report.errors.edit}`);
}

// The same beam-column, its end moment about the major axis edited: the
// diagram's shape changes, so both curves are worked afresh (the load's
// edit above reuses them and works only the member's point).
if (wanted("edit")) try {
  const ed = await measureEdits(100, true, "m_major_a_knm");
  report.edit_beam_column_moment = {
    edits: ed.dom.length,
    timeouts: ed.timeouts,
    dom_median_ms: median(ed.dom),
    frame_median_ms: median(ed.frame),
    frame_p90_ms: quantile(ed.frame, 0.9),
    settled_median_ms: median(ed.settled),
    dom_samples_ms: ed.dom.map((x) => Math.round(x * 100) / 100),
  };
  const b = report.edit_beam_column_moment;
  console.log(`edit of a moment, beam-column: DOM ${fmt(b.dom_median_ms, 2)} ms, next frame ${fmt(b.frame_median_ms, 2)} ms (median of ${ed.dom.length}, ${ed.timeouts} timeouts)`);
} catch (e) {
  report.errors.edit_beam_column_moment = String(e.message || e).split("\n")[0];
  console.log(`edit of a moment, beam-column: not measured: ${report.errors.edit_beam_column_moment}`);
}

if (wanted("edit")) try {
  const ed = await measureEdits(100, true);
  report.edit_beam_column = {
    edits: ed.dom.length,
    timeouts: ed.timeouts,
    dom_median_ms: median(ed.dom),
    frame_median_ms: median(ed.frame),
    frame_p90_ms: quantile(ed.frame, 0.9),
    settled_median_ms: median(ed.settled),
    dom_samples_ms: ed.dom.map((x) => Math.round(x * 100) / 100),
  };
  const b = report.edit_beam_column;
  console.log(`edit, beam-column: DOM ${fmt(b.dom_median_ms, 2)} ms, next frame ${fmt(b.frame_median_ms, 2)} ms (median of ${ed.dom.length}, ${ed.timeouts} timeouts)`);
} catch (e) {
  report.errors.edit_beam_column = String(e.message || e).split("\n")[0];
  console.log(`edit, beam-column: not measured: ${report.errors.edit_beam_column}`);
}

for (const [key, id, what] of [
  ["model_edit", "TD-1", "column model whose alpha_cr scales with the length"],
  ["model_edit_springs", "TD-2", "column model with springs and loads at levels"],
]) {
  if (!wanted("model")) break;
  try {
    const m = await measureModelEdits(id);
    report[key] = {
      member: id,
      edits: m.times.length,
      median_ms: median(m.times),
      p90_ms: quantile(m.times, 0.9),
      max_ms: Math.max(...m.times),
      samples_ms: m.times.map((x) => Math.round(x * 100) / 100),
      recheck_ms: m.recheck.map((x) => Math.round(x * 100) / 100),
      whatif_median_ms: median(m.whatif),
      whatif_samples_ms: m.whatif.map((x) => Math.round(x * 100) / 100),
    };
    const r = report[key];
    console.log(`edit, ${what}: to redrawn shape ${fmt(r.median_ms, 2)} ms (median of ${r.edits}, p90 ${fmt(r.p90_ms, 2)}, max ${fmt(r.max_ms, 2)}); What if in after ${fmt(r.whatif_median_ms, 1)} ms`);
  } catch (e) {
    report.errors[key] = String(e.message || e).split("\n")[0];
    console.log(`edit, ${what}: not measured: ${report.errors[key]}`);
  }
}

const thousandCli = wanted("thousand") ? cliThousand() : {};
if (wanted("thousand")) try {
  const th = await measureThousand();
  const toFrame = th.runs.map((r) => (r.ready === null ? NaN : r.frame - r.ready));
  const toMount = th.runs.map((r) => (r.ready === null || r.mounted === null ? NaN : r.mounted - r.ready));
  report.thousand = {
    runs: th.runs,
    rows_in_page: th.rows,
    cli: thousandCli,
    ready_to_frame_median_ms: median(toFrame),
    ready_to_mounted_median_ms: median(toMount),
    recheck_median_ms: median(th.runs.map((r) => (r.recheck_fresh === 1000 ? r.recheck_ms : NaN))),
  };
  console.log(`1,000 members: ${fmt(report.thousand.ready_to_frame_median_ms)} ms to the frame (${th.rows} rows in the page)`);
} catch (e) {
  report.errors.thousand = String(e.message || e).split("\n")[0];
  console.log(`1,000 members: not measured: ${report.errors.thousand}`);
}

// The same window for the demo workspace (a fresh profile, nothing
// stored: the app's fixed start) and for 10,000 stored members.
const startCases = [
  ["start-demo", "start_demo", "the demo workspace (fresh profile)", () => [null, 1]],
  ["start-10k", "start_10k", "10,000 members", () => [workspaceText([memberFile("Grain store (invented, 10,000 members)", thousandMembers(10_000))]), 10_000]],
];
for (const [what, key, label, make] of startCases) {
  if (!wanted(what)) continue;
  try {
    const [text, want] = make();
    const st = await measureThousand(text, want);
    report[key] = {
      runs: st.runs,
      rows_in_page: st.rows,
      ready_to_frame_median_ms: median(st.runs.map((r) => (r.ready === null ? NaN : r.frame - r.ready))),
      ready_to_mounted_median_ms: median(st.runs.map((r) => (r.ready === null || r.mounted === null ? NaN : r.mounted - r.ready))),
    };
    console.log(`${label}: ${fmt(report[key].ready_to_frame_median_ms)} ms to the frame (${st.rows} rows in the page)`);
  } catch (e) {
    report.errors[key] = String(e.message || e).split("\n")[0];
    console.log(`${label}: not measured: ${report.errors[key]}`);
  }
}

if (wanted("sizing")) try {
  const runs = await measureSizing();
  report.sizing = { runs, median_ms: median(runs.map((r) => r.ms)) };
  console.log(`sizing: ${fmt(report.sizing.median_ms)} ms for 1,000 members (median of ${runs.length})`);
} catch (e) {
  report.errors.sizing = String(e.message || e).split("\n")[0];
  console.log(`sizing: not measured: ${report.errors.sizing}`);
}

report.dist = { zlib_bytes: DIST_ZLIB, sent_bytes: DIST_SENT, budget_bytes: DIST_BUDGET };

const fr = report.first_render || {};
const sl = report.slow || {};
const ed = report.edit || {};
const eb = report.edit_beam_column || {};
const em = report.edit_beam_column_moment || {};
const me = report.model_edit || {};
const ms = report.model_edit_springs || {};
const th = report.thousand || { cli: thousandCli };
const sz = report.sizing || {};
const sd = report.start_demo || {};
const s10 = report.start_10k || {};
const lines = [
  "# Browser measurements",
  "",
  `Measured by \`cargo xtask bench-web\` on ${startedAt} (headless Chromium driven by playwright-core;`,
  "the app served from 127.0.0.1 by the xtask server). Every figure is this run's own, met or missed.",
  "",
  "## Machine",
  "",
  `- CPU: ${host.cpu}, ${host.logical_cpus} logical CPUs (shared with other work; load average at start ${host.load_average_at_start.join(", ")})`,
  `- memory: ${host.memory_gib} GiB`,
  `- system: ${host.os}`,
  `- browser: ${host.browser} (headless, --disable-gpu), node ${host.node}`,
  "",
  "## Results",
  "",
  "| measurement | result | target | verdict |",
  "| --- | --- | --- | --- |",
  `| first render, fresh profile (median of ${fr.cold_runs?.length ?? 0}) | ${fmt(fr.cold_median_ms)} ms | ≤ ${TARGETS.first_render_ms} ms | ${verdict(fr.cold_median_ms, TARGETS.first_render_ms)} |`,
  `| first render, reload (median of ${fr.warm_runs?.length ?? 0}) | ${fmt(fr.warm_median_ms)} ms | ≤ ${TARGETS.first_render_ms} ms | ${verdict(fr.warm_median_ms, TARGETS.first_render_ms)} |`,
  `| slow mobile connection, first visit: first render (fresh profile, median of ${sl.cold_runs?.length ?? 0}) | ${fmt(sl.cold_median_ms)} ms | ≤ ${TARGETS.slow_cold_ms} ms | ${verdict(sl.cold_median_ms, TARGETS.slow_cold_ms)} |`,
  `| slow mobile connection, later visit from the cache: first render (median of ${sl.cached_runs?.length ?? 0}) | ${fmt(sl.cached_median_ms)} ms | ≤ ${TARGETS.slow_cached_ms} ms | ${verdict(sl.cached_median_ms, TARGETS.slow_cached_ms)} |`,
  `| edit: recheck and redraw to next frame (median of ${ed.edits ?? 0}) | ${fmt(ed.frame_median_ms, 2)} ms (p90 ${fmt(ed.frame_p90_ms, 2)}) | ≤ ${TARGETS.edit_ms} ms | ${verdict(ed.frame_median_ms, TARGETS.edit_ms)} |`,
  `| edit: recheck until the result text changes (median) | ${fmt(ed.dom_median_ms, 2)} ms | ≤ ${TARGETS.edit_ms} ms | ${verdict(ed.dom_median_ms, TARGETS.edit_ms)} |`,
  `| edit of a beam-column: recheck and redraw of the interaction chart to next frame (median of ${eb.edits ?? 0}) | ${fmt(eb.frame_median_ms, 2)} ms (p90 ${fmt(eb.frame_p90_ms, 2)}) | ≤ ${TARGETS.edit_ms} ms | ${verdict(eb.frame_median_ms, TARGETS.edit_ms)} |`,
  `| edit of a beam-column: recheck until the result text changes (median) | ${fmt(eb.dom_median_ms, 2)} ms | ≤ ${TARGETS.edit_ms} ms | ${verdict(eb.dom_median_ms, TARGETS.edit_ms)} |`,
  `| edit of a beam-column's end moment (both curves worked afresh): to next frame (median of ${em.edits ?? 0}) | ${fmt(em.frame_median_ms, 2)} ms (p90 ${fmt(em.frame_p90_ms, 2)}) | ≤ ${TARGETS.edit_ms} ms | ${verdict(em.frame_median_ms, TARGETS.edit_ms)} |`,
  `| edit of a beam-column's end moment: recheck until the result text changes (median) | ${fmt(em.dom_median_ms, 2)} ms | ≤ ${TARGETS.edit_ms} ms | ${verdict(em.dom_median_ms, TARGETS.edit_ms)} |`,
  `| the same three edits: until the working and What if (built after the frame) are in (median) | ${fmt(ed.settled_median_ms, 1)} ms; beam-column ${fmt(eb.settled_median_ms, 1)} ms; end moment ${fmt(em.settled_median_ms, 1)} ms | (no target) | |`,
  `| edit of a column model (stepped, braced, load along the length: alpha_cr scales with length): to the redrawn buckled shapes' next frame (median of ${me.edits ?? 0}) | ${fmt(me.median_ms, 2)} ms (p90 ${fmt(me.p90_ms, 2)}) | ≤ ${TARGETS.model_ms} ms | ${verdict(me.median_ms, TARGETS.model_ms)} |`,
  `| edit of a column model with springs and loads at levels: to the redrawn buckled shapes' next frame (median of ${ms.edits ?? 0}) | ${fmt(ms.median_ms, 2)} ms (p90 ${fmt(ms.p90_ms, 2)}) | ≤ ${TARGETS.model_ms} ms | ${verdict(ms.median_ms, TARGETS.model_ms)} |`,
  `| the same two: edit until What if (worked after the frame) is in (median) | ${fmt(me.whatif_median_ms, 1)} ms; with springs ${fmt(ms.whatif_median_ms, 1)} ms | (no target) | |`,
  `| 1,000-member list: re-check of every member (engine, in the page; median of ${th.runs?.length ?? 0}) | ${fmt(th.recheck_median_ms, 2)} ms | ≤ ${TARGETS.thousand_ms} ms | ${verdict(th.recheck_median_ms, TARGETS.thousand_ms)} |`,
  `| 1,000-member list: module ready to first frame, rows in view built (median of ${th.runs?.length ?? 0}) | ${fmt(th.ready_to_frame_median_ms)} ms | ≤ ${TARGETS.thousand_ms} ms | ${verdict(th.ready_to_frame_median_ms, TARGETS.thousand_ms)} |`,
  `| lightest that works: 1,000 members against the 265 I/H sections (median of ${sz.runs?.length ?? 0}) | ${fmt(sz.median_ms)} ms | ≤ ${TARGETS.sizing_ms} ms | ${verdict(sz.median_ms, TARGETS.sizing_ms)} |`,
  `| 1,000-member list: inside start() (module ready to mounted, median) | ${fmt(th.ready_to_mounted_median_ms)} ms | (part of the above) | |`,
  `| the same window, demo workspace (fresh profile, nothing stored; median of ${sd.runs?.length ?? 0}) | ${fmt(sd.ready_to_frame_median_ms)} ms (start() ${fmt(sd.ready_to_mounted_median_ms)} ms) | (no target) | |`,
  `| the same window, 10,000 stored members (median of ${s10.runs?.length ?? 0}) | ${fmt(s10.ready_to_frame_median_ms)} ms (start() ${fmt(s10.ready_to_mounted_median_ms)} ms) | (no target) | |`,
  `| dist/ as a standard host sends it (gzip, zlib -9) | ${Number.isFinite(DIST_ZLIB) ? `${DIST_ZLIB} B (${fmt(DIST_ZLIB / 1024)} KB)` : "n/a"} | ≤ ${DIST_BUDGET} B (${fmt(DIST_BUDGET / 1024, 0)} KB) | ${verdict(DIST_ZLIB, DIST_BUDGET)} |`,
  "",
  "## How each is measured",
  "",
  "- First render: `performance.now()` when the first `[data-testid=member-row]` is laid out, taken at the",
  "  start of the next animation frame, from navigation start; a fresh browser profile each time (cold:",
  "  nothing cached, no service worker yet), and five reloads in one profile (warm: worker and cache in place).",
  "- Edit: a new design load is set in `input[name=axial_kn]` (input and change events, as typing gives);",
  "  the time until `[data-testid=result-utilisation]` shows a different text, and until the next",
  "  animation frame after that (the canvas redraw is in that frame). A headless frame clock ticks at",
  "  60 Hz, so the frame figure includes up to one frame of waiting for the clock. The beam-column rows: the",
  "  same on the demo's steel column C1 (EN 1993-1-1) given end moments about both axes (2 and -1 kNm major,",
  "  0.5 kNm minor), so each edit of its load re-checks it and redraws its interaction chart: the curves' lines do not",
  "  depend on the load and are kept (core's envelope::interaction memo), so only the member's point on each is worked.",
  "  The end-moment rows edit `m_major_a_knm` (2.2 and 1.8 kNm in turn) instead: the diagram's shape changes, so both",
  "  curves are worked afresh (per axis the top and 24 points, some three checks a point). The frame after an edit",
  "  carries the check, the verdict, the list's row, the chart and the moment diagram; the working (with the section",
  "  view) and What if are built in tasks after it, each marked aria-busy until it is in, so they are not in the frame",
  "  figures; the row after them is the time until both are in (neither `[data-testid=working-block]` nor",
  "  `[data-testid=whatif-block]` aria-busy; lib.mjs `editLoop`).",
  "- Column model: a stored list of two invented stepped columns (tests/browser/lib.mjs `modelColumns`), one",
  "  selected; its load along the length (#cm-distributed) set 30 times (an input event, as typing gives); the",
  "  time until the panel's canvas has been drawn again (its `data-drawn` counter) and the next animation frame",
  "  has started (lib.mjs `modelEditLoop`). What if is worked after that frame, so it is not in that figure;",
  "  the next row is the time until it is in (`[data-testid=whatif-block]` no longer aria-busy).",
  "- 1,000 members: a stored workspace of 1,000 invented members of five shapes and all steel and timber",
  "  methods; from the mark `strutline-wasm-ready` (the module is compiled, `start()` is about to run)",
  "  to the first animation frame after the rows in view are in the page, the list's scrolling box filled (the list",
  "  builds only the rows in view and a few beyond, listops::window; a MutationObserver notes the moment;",
  "  the time is read with performance.now() inside the next requestAnimationFrame callback). The second",
  "  row is the part spent inside the app's synchronous `start()` (load, parse, check and build the view).",
  "  The re-check row is the app's own `performance.now()` around its list re-check when all 1,000 members",
  "  are worked afresh (`window.strutlineRecheck`, set by the app after each re-check): the engine's part.",
  "  The same window is measured for the demo workspace (a fresh profile with nothing stored: the app's",
  "  fixed start, the first row's frame) and for 10,000 stored members (lib.mjs `thousandMembers(10000)`),",
  "  to tell the part that grows with the list from the part that does not.",
  "- Sizing: the same 1,000 members; the picker's shape set to I/H (every I and H section of the catalogue,",
  "  265 entries, as no single series has 300) and \"… for every member\" clicked three times in one page; the",
  "  app's own `performance.now()` around its sizing call (`window.strutlineSizing`), proposals built for all 1,000.",
  `  Rows in the page: ${th.rows_in_page ?? "n/a"}; status texts filled: ${th.runs?.[0]?.statuses_with_text ?? "n/a"};`,
  `  the command line checked ${th.cli?.results ?? "n/a"} of them${th.cli?.error ? ` (error: ${th.cli.error})` : ""}.`,
  "- Slow mobile connection: Chromium's own network emulation, set through the DevTools protocol",
  "  (`Network.emulateNetworkConditions` on a playwright-core CDP session of the page): 1.6 Mbit/s down,",
  "  150 ms added to each request's round trip, 750 kbit/s up. First visit: a fresh profile (nothing cached,",
  "  no service worker), navigation start to the first member row's next animation frame, as above. Later",
  "  visit: once the service worker is ready (it activates only after precaching every file), a new tab",
  "  opens the address again under the same emulation; every such visit must be controlled by the worker.",
  "  The run fails its own check unless the module's body took at least 90% of the time 1.6 Mbit/s allows.",
  `  Over the wire on the first visit: ${sl.first_visit_wire_bytes ?? "n/a"} B (the xtask server sends each file's zopfli \`.gz\`;`,
  `  a host gzipping at zlib -9 would send ${Number.isFinite(DIST_ZLIB) ? DIST_ZLIB : "n/a"} B for all of dist/); the module's body took ${fmt(sl.module_body_ms)} ms`,
  `  (at least ${fmt(sl.module_body_floor_ms)} ms at 1.6 Mbit/s).`,
  "  To reproduce: `cargo xtask bench-web` (this file and `bench/web.json`, whose `slow` entry holds every",
  "  run and the first visit's transfers); the connection is the `SLOW` constant of `tests/browser/bench.mjs`.",
  "- Notes taken by hand on the 1,000-member list's first frame (traces, font lookups, what was tried and",
  "  taken out) are in `bench/first-frame.md`, which this run does not rewrite.",
  "- dist/ as a standard host sends it: every file of `dist/` gzipped at zlib's best level (flate2 on zlib), or as it is",
  "  where that is not smaller (the PNG icons), summed by `cargo xtask dist`, which fails over the budget.",
  `  As \`cargo xtask serve\` sends it (each file's zopfli \`.gz\` where smaller): ${Number.isFinite(DIST_SENT) ? `${DIST_SENT} B` : "n/a"}.`,
  "",
];
for (const [k, v] of Object.entries(report.errors)) lines.push(`Not measured: ${k}: ${v}`, "");
writeFileSync(join(OUT_DIR, "web.json"), JSON.stringify(report, null, 2) + "\n");
writeFileSync(join(OUT_DIR, "web.md"), lines.join("\n"));
console.log(`wrote ${join(OUT_DIR, "web.md")}`);
