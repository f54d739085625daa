// Strutline boot: loads the WebAssembly module, then mounts the app.
// Kept out of index.html so that the Content-Security-Policy needs no
// inline scripts.
import init, * as app from "./strutline_web.js";

const boot = document.getElementById("boot");

function showProblem(text) {
  if (!boot) return;
  boot.replaceChildren();
  const p = document.createElement("p");
  p.className = "boot-problem";
  p.setAttribute("role", "alert");
  p.textContent = text;
  boot.append(p);
}

try {
  await init({ module_or_path: new URL("strutline_web_bg.wasm", import.meta.url) });
  if (typeof app.start !== "function") {
    throw new Error("this build has no start() entry point");
  }
  // Marks for the measurements (cargo xtask bench-web): the module is
  // ready, then the app has mounted its first view.
  performance.mark("strutline-wasm-ready");
  app.start();
  performance.mark("strutline-mounted");
  if (boot) boot.remove();
} catch (error) {
  console.error("Strutline could not start:", error);
  showProblem(
    "Strutline could not start in this browser (" + String(error && error.message || error) +
    "). It needs a browser with WebAssembly; reloading the page may help.",
  );
}

// The app registers ./sw.js itself; register here too when it has not,
// so the offline copy exists whatever the app does (registering the same
// script twice is harmless: the browser returns the same registration).
// After the first frame, as the app does: the worker's install fetches
// every file and would compete with that frame.
if ("serviceWorker" in navigator) {
  requestAnimationFrame(() => setTimeout(() => {
    navigator.serviceWorker.getRegistration("./").then((reg) => {
      if (!reg) return navigator.serviceWorker.register("./sw.js");
      return reg;
    }).catch((error) => console.warn("Strutline: no offline copy:", error));
  }, 0));
}
