import { launch, firstPage, seedStorage, workspaceText, memberFile, thousandMembers } from "./lib.mjs";
const url = process.argv[2], n = Number(process.argv[3]);
const self = new Map(), total = new Map();
for (let run = 0; run < 3; run++) {
const { context, close } = await launch();
if (n > 0) await seedStorage(context, workspaceText([memberFile("x", thousandMembers(n))]));
await context.addInitScript(() => {
  const look = () => {
    const rows = document.querySelectorAll("[data-testid=member-row]");
    const box = document.querySelector("[data-testid=member-scroll]");
    const last = rows[rows.length - 1];
    if (box && last && last.getBoundingClientRect().height > 0) {
      observer.disconnect();
      requestAnimationFrame(() => { window.__done = true; });
    }
  };
  const observer = new MutationObserver(look);
  document.addEventListener("DOMContentLoaded", () => { observer.observe(document.body, { childList: true, subtree: true }); });
});
const page = await firstPage(context);
const cdp = await context.newCDPSession(page);
await cdp.send("Profiler.enable");
await cdp.send("Profiler.setSamplingInterval", { interval: 50 });
await cdp.send("Profiler.start");
await page.goto(url, { waitUntil: "commit" });
await page.waitForFunction(() => window.__done, null, { polling: "raf" });
const { profile } = await cdp.send("Profiler.stop");
await close();
const byId = new Map(profile.nodes.map((x) => [x.id, x]));
const parent = new Map();
for (const x of profile.nodes) for (const c of x.children || []) parent.set(c, x.id);
const name = (x) => x.callFrame.functionName || "(anon)";
const dt = profile.timeDeltas;
profile.samples.forEach((id, i) => {
  const ms = (dt[i + 1] ?? 0) / 1000;
  const k = name(byId.get(id));
  self.set(k, (self.get(k) || 0) + ms / 3);
  const seen = new Set();
  for (let at = id; at !== undefined; at = parent.get(at)) {
    const key = name(byId.get(at));
    if (seen.has(key)) continue;
    seen.add(key);
    total.set(key, (total.get(key) || 0) + ms / 3);
  }
});
}
const pr = (m, re) => [...m].filter(([k]) => !re || re.test(k)).sort((a, b) => b[1] - a[1]).slice(0, 45).forEach(([k, v]) => console.log(v.toFixed(1).padStart(7), k.slice(0, 150)));
console.log("== total (filtered)"); pr(total, /strutline|serde|decode|refresh|Checked|dlmalloc|hashbrown|browser|App|List|Row|Banner|mount|CompileLazy|compile|GC|program|Layout|style/i);
console.log("== self"); pr(self);
