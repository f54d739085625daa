// Where the time goes: `node tests/browser/profile.mjs --url URL --case
// thousand|edit|edit-moments [--runs N] [--top N] [--save FILE]`. Records
// Chromium's own sampling profiler (the DevTools protocol's Profiler
// domain, through a playwright-core CDP session) around
//   thousand:      loading a stored workspace of 1,000 members, from the
//                  navigation until the rows in view are in the page and
//                  the next frame has started;
//   edit:          `--runs` edits of the design load of the demo's first
//                  member (a compression member), as bench.mjs times them;
//   edit-moments:  the same on a member with moments (the interaction
//                  chart is drawn on each edit); `--field m_major_a_knm`
//                  edits its end moment instead (both curves worked afresh);
//   model-edit:    `--runs` edits of the load along the length of a column
//                  model (lib.mjs modelColumns, `--member TD-1` or TD-2),
//                  as bench.mjs times them (modelEditLoop), What if included;
//   thousand-trace: the 1,000-member start as `thousand`, but through a
//                  Chromium trace (`--runs` fresh profiles, default 3):
//                  from the mark strutline-wasm-ready to the first frame
//                  after the rows in view fill the list box, the main
//                  thread's wall and CPU time (the trace's thread clock:
//                  steadier than wall time on a shared machine), the wasm
//                  functions compiled lazily on their first call, the
//                  font lookups (FontCache::GetFontPlatformData, each new
//                  family, size and weight; on Linux the first of a size
//                  asks the browser process synchronously for its render
//                  style, GetWebFontRenderStyleForStrike) and the trace
//                  events with the most time of their own. Any build will
//                  do (no names needed). `--members N` stores N members
//                  instead of 1,000 (0: nothing stored, the demo
//                  workspace of a fresh profile, ready at its first row).
//                  `--samples` adds V8's sampling profiler to the trace
//                  (every 100 µs or so) and prints, for the window only,
//                  the functions with the most time of their own and under
//                  them, the mean of the runs (names in a `--keep-names`
//                  build; the sampler inflates what it measures).
// Prints the functions with the most time of their own and the most time
// under them (self + callees). Function names are there only in a build
// that keeps them: `cargo xtask dist --keep-names` (dist-names/), served
// by any static server. A tool for looking, not a measurement: the
// figures are in bench/web.md, from bench.mjs.

import { writeFileSync } from "node:fs";
import {
  arg,
  editLoop,
  firstPage,
  modelColumns,
  modelEditLoop,
  launch,
  memberFile,
  MOMENTS_POST,
  openForEditing,
  seedStorage,
  thousandMembers,
  workspaceText,
} from "./lib.mjs";

const URL_ARG = arg("--url");
const CASE = arg("--case", "edit");
const RUNS = Number(arg("--runs", "30"));
const TOP = Number(arg("--top", "40"));
const SAVE = arg("--save");
const MEMBER = arg("--member", "TD-1");
const FIELD = arg("--field", "axial_kn");
const MEMBERS = Number(arg("--members", "1000"));
const SAMPLES = process.argv.includes("--samples");
if (!URL_ARG || !["thousand", "thousand-trace", "edit", "edit-moments", "model-edit"].includes(CASE)) {
  console.error("usage: node profile.mjs --url URL --case thousand|thousand-trace|edit|edit-moments|model-edit [--runs N] [--top N] [--save FILE] [--member ID] [--field NAME]");
  process.exit(2);
}

/** A tally of sampled time per function: `add(id, ms)` counts a sample
 * of node `id` to its own function's self time and to the total (self +
 * callees, each function once per sample) of it and its callers. */
function tally(nodes, parent, name) {
  const self = new Map();
  const total = new Map();
  const add = (id, ms) => {
    const k = name(nodes.get(id));
    self.set(k, (self.get(k) || 0) + ms);
    const seen = new Set();
    for (let at = id; at !== undefined; at = parent.get(at)) {
      const key = name(nodes.get(at));
      if (seen.has(key)) continue;
      seen.add(key);
      total.set(key, (total.get(key) || 0) + ms);
    }
  };
  return { self, total, add };
}

/** Self and total (self + callees, each function once per sample) time
 * per function, from a CDP profile. */
function summarise(profile) {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map();
  for (const n of profile.nodes) for (const c of n.children || []) parent.set(c, n.id);
  const name = (n) => {
    const f = n.callFrame;
    const file = (f.url || "").split("/").pop();
    return `${f.functionName || "(anonymous)"} ${file}${file ? `:${f.lineNumber + 1}` : ""}`;
  };
  const { self, total, add } = tally(byId, parent, name);
  const dt = profile.timeDeltas || [];
  profile.samples.forEach((id, i) => add(id, (dt[i + 1] ?? dt[i] ?? 0) / 1000));
  const span = (profile.endTime - profile.startTime) / 1000;
  return { self, total, span };
}

function print(title, map, top) {
  console.log(`\n${title}`);
  for (const [k, ms] of [...map].sort((a, b) => b[1] - a[1]).slice(0, top)) {
    console.log(`${ms.toFixed(1).padStart(9)} ms  ${k}`);
  }
}

// Runs in the page before its scripts (thousand-trace): marks
// "strutline-trace-frame" at the first animation frame after the rows in
// view fill the list's scrolling box (as bench.mjs's watchRows decides).
function markRowsFrame(want) {
  const look = () => {
    const rows = document.querySelectorAll("[data-testid=member-row]");
    const box = document.querySelector("[data-testid=member-scroll]");
    const last = rows[rows.length - 1];
    if (box && last && last.getBoundingClientRect().height > 0 &&
        (rows.length >= want || last.getBoundingClientRect().bottom >= box.getBoundingClientRect().bottom)) {
      observer.disconnect();
      requestAnimationFrame(() => {
        performance.mark("strutline-trace-frame");
        window.__strutlineTraced = true;
      });
    }
  };
  const observer = new MutationObserver(look);
  document.addEventListener("DOMContentLoaded", () => {
    observer.observe(document.body, { childList: true, subtree: true });
    look();
  });
}

/** The sampling profiler's samples of the main thread between marks `a`
 * and `b` of a trace: self and total time per function, as `summarise`. */
function windowSamples(events, a, b) {
  const profile = events.find((e) => e.name === "Profile" && e.pid === a.pid && e.tid === a.tid);
  if (!profile) return null;
  const nodes = new Map();
  const parent = new Map();
  let t = profile.args.data.startTime;
  const name = (n) => {
    const f = n.callFrame;
    const file = (f.url || "").split("/").pop();
    return `${f.functionName || "(anonymous)"} ${file}`.trim();
  };
  const { self, total, add } = tally(nodes, parent, name);
  let prev = null;
  for (const c of events.filter((e) => e.name === "ProfileChunk" && e.id === profile.id && e.pid === a.pid)) {
    const cp = c.args.data.cpuProfile || {};
    for (const n of cp.nodes || []) {
      nodes.set(n.id, n);
      if (n.parent !== undefined) parent.set(n.id, n.parent);
    }
    const deltas = c.args.data.timeDeltas || [];
    (cp.samples || []).forEach((id, i) => {
      t += deltas[i] || 0;
      // Each sample stands for the time until the next one.
      if (prev && prev.t >= a.ts && prev.t < b.ts) add(prev.id, (Math.min(t, b.ts) - prev.t) / 1000);
      prev = { id, t };
    });
  }
  return { self, total };
}

/** One traced 1,000-member start: the main thread between the marks. */
async function traceThousand() {
  const { context, close } = await launch();
  try {
    if (MEMBERS > 0) {
      await seedStorage(context, workspaceText([memberFile("Grain store (invented, 1,000 members)", thousandMembers(MEMBERS))]));
    }
    await context.addInitScript(markRowsFrame, MEMBERS > 0 ? MEMBERS : 1);
    const page = await firstPage(context);
    const cdp = await context.newCDPSession(page);
    const events = [];
    cdp.on("Tracing.dataCollected", (e) => events.push(...e.value));
    const complete = new Promise((r) => cdp.once("Tracing.tracingComplete", r));
    await cdp.send("Tracing.start", {
      traceConfig: {
        includedCategories: [
          "devtools.timeline",
          "blink.user_timing",
          "v8.wasm",
          "toplevel",
          "fonts",
          ...(SAMPLES ? ["disabled-by-default-v8.cpu_profiler", "disabled-by-default-v8.cpu_profiler.hires"] : []),
        ],
      },
      transferMode: "ReportEvents",
    });
    await page.goto(URL_ARG, { waitUntil: "load" });
    await page.waitForFunction(() => window.__strutlineTraced, null, { timeout: 30_000 });
    await cdp.send("Tracing.end");
    await complete;
    if (SAVE) writeFileSync(SAVE, JSON.stringify(events));
    const mark = (n) => events.find((e) => e.name === n && e.cat.includes("user_timing"));
    const [a, m, b] = ["strutline-wasm-ready", "strutline-mounted", "strutline-trace-frame"].map(mark);
    if (!a || !b) throw new Error("the trace has not both marks");
    const clip = (e) => Math.max(0, Math.min(e.ts + e.dur, b.ts) - Math.max(e.ts, a.ts));
    const main = events
      .filter((e) => e.pid === a.pid && e.tid === a.tid && e.ph === "X" && e.ts + e.dur > a.ts && e.ts < b.ts)
      .sort((x, y) => x.ts - y.ts || y.dur - x.dur);
    // Self time per event name (each event less the events inside it);
    // CPU time from the thread clock of the outermost events.
    const own = new Map();
    const stack = [];
    let cpu = 0;
    for (const e of main) own.set(e, clip(e));
    for (const e of main) {
      while (stack.length && stack.at(-1).ts + stack.at(-1).dur <= e.ts) stack.pop();
      if (stack.length) own.set(stack.at(-1), own.get(stack.at(-1)) - clip(e));
      else if (e.tdur !== undefined && e.dur > 0) cpu += (e.tdur * clip(e)) / e.dur;
      stack.push(e);
    }
    const byName = new Map();
    for (const [e, us] of own) byName.set(e.name, (byName.get(e.name) || 0) + us / 1000);
    const lazy = main.filter((e) => e.name === "wasm.CompileLazy");
    // A lookup calls itself once inside (the trace nests them in pairs):
    // only the outermost are counted.
    const lookups = main.filter((e) => e.name === "FontCache::GetFontPlatformData");
    const fonts = lookups.filter((e, i) => !lookups.slice(0, i).some((f) => f.ts + f.dur >= e.ts + e.dur));
    const strikes = main.filter((e) => e.name === "WebSandboxSupportLinux::GetWebFontRenderStyleForStrike");
    return {
      wall: (b.ts - a.ts) / 1000,
      mounted: m ? (m.ts - a.ts) / 1000 : NaN,
      cpu: cpu / 1000,
      lazy: lazy.length,
      // The thread time of the lazy compilation (the wall time of an event
      // also holds the waits of a loaded machine).
      lazyCpu: lazy.reduce((t, e) => t + (e.tdur ?? 0), 0) / 1000,
      fonts: fonts.length,
      fontMs: fonts.reduce((t, e) => t + clip(e), 0) / 1000,
      strikes: strikes.length,
      byName,
      samples: SAMPLES ? windowSamples(events, a, b) : null,
    };
  } finally {
    await close();
  }
}

if (CASE === "thousand-trace") {
  const runs = process.argv.includes("--runs") ? RUNS : 3;
  const all = [];
  for (let i = 0; i < runs; i += 1) {
    const r = await traceThousand();
    all.push(r);
    console.log(
      `run ${i + 1}: ready to frame ${r.wall.toFixed(1)} ms (start() ${r.mounted.toFixed(1)} ms), ` +
        `main thread CPU ${r.cpu.toFixed(1)} ms, ${r.lazy} wasm functions compiled lazily (${r.lazyCpu.toFixed(1)} ms CPU), ` +
        `${r.fonts} font lookups (${r.fontMs.toFixed(1)} ms wall, ${r.strikes} render-style calls to the browser process)`,
    );
  }
  const med = (xs) => [...xs].sort((x, y) => x - y)[Math.floor(xs.length / 2)];
  console.log(
    `median of ${runs}: ready to frame ${med(all.map((r) => r.wall)).toFixed(1)} ms, CPU ${med(all.map((r) => r.cpu)).toFixed(1)} ms, ` +
      `font lookups ${med(all.map((r) => r.fonts))} (${med(all.map((r) => r.fontMs)).toFixed(1)} ms wall)`,
  );
  const names = new Map();
  for (const r of all) for (const [k, ms] of r.byName) names.set(k, (names.get(k) || 0) + ms / runs);
  print("trace events, time of their own (mean of the runs, wall)", names, TOP);
  if (SAMPLES) {
    for (const which of ["self", "total"]) {
      const m = new Map();
      for (const r of all) for (const [k, ms] of r.samples?.[which] || []) m.set(k, (m.get(k) || 0) + ms / runs);
      print(`sampled in the window, ${which === "self" ? "time of their own" : "self + callees"} (mean of the runs)`, m, TOP);
    }
  }
  process.exit(0);
}

const { context, close } = await launch();
try {
  if (CASE === "thousand") {
    await seedStorage(context, workspaceText([memberFile("Grain store (invented, 1,000 members)", thousandMembers())]));
  } else if (CASE === "edit-moments") {
    await seedStorage(context, workspaceText([memberFile("Cider-press house (invented)", [MOMENTS_POST])]));
  } else if (CASE === "model-edit") {
    await seedStorage(context, workspaceText([memberFile("Tram depot (invented)", modelColumns())]));
  }
  const page = await firstPage(context);
  const cdp = await context.newCDPSession(page);
  await cdp.send("Profiler.enable");
  await cdp.send("Profiler.setSamplingInterval", { interval: 100 });
  let note = "";
  if (CASE === "thousand") {
    await cdp.send("Profiler.start");
    await page.goto(URL_ARG, { waitUntil: "load" });
    await page.locator("[data-testid=member-row]").first().waitFor({ timeout: 30_000 });
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => r())));
    const marks = await page.evaluate(() => ({
      ready: performance.getEntriesByName("strutline-wasm-ready")[0]?.startTime ?? null,
      mounted: performance.getEntriesByName("strutline-mounted")[0]?.startTime ?? null,
    }));
    note = `module ready at ${marks.ready?.toFixed(1)} ms, start() returned at ${marks.mounted?.toFixed(1)} ms`;
  } else if (CASE === "model-edit") {
    await openForEditing(page, URL_ARG, `[data-testid=member-row][data-id="${MEMBER}"]`);
    await page.locator("[data-testid=cm-canvas][data-shapes='2']").waitFor({ timeout: 10_000 });
    await cdp.send("Profiler.start");
    const values = Array.from({ length: RUNS }, (_, i) => (1 + (i % 10) * 0.25 + i * 0.001).toFixed(3));
    const r = await page.evaluate(modelEditLoop, values);
    const med = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    note = `${r.times.length} edits of ${MEMBER}'s model under the profiler: to the redrawn shape's frame median ${med(r.times).toFixed(2)} ms, What if in median ${med(r.whatif).toFixed(2)} ms`;
  } else {
    await openForEditing(page, URL_ARG);
    await cdp.send("Profiler.start");
    const r = await page.evaluate(editLoop, { n: RUNS, field: FIELD });
    const med = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    note = `${r.dom.length} edits under the profiler: DOM median ${med(r.dom).toFixed(2)} ms, next frame median ${med(r.frame).toFixed(2)} ms`;
  }
  const { profile } = await cdp.send("Profiler.stop");
  if (SAVE) writeFileSync(SAVE, JSON.stringify(profile));
  const s = summarise(profile);
  console.log(`${CASE}: ${note}; ${s.span.toFixed(1)} ms profiled`);
  print("self time", s.self, TOP);
  print("total time (self + callees)", s.total, TOP);
} finally {
  await close();
}
