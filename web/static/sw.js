// Strutline service worker: keeps the app's own files for offline use.
//
// `cargo xtask dist` replaces the two lines below: CACHE_NAME gets a
// content hash of every shipped file, PRECACHE the list of those files.
// A new build therefore has a new cache name; it installs beside the old
// one and waits until the page asks it to take over (the page posts
// {type: "activate-update"} when the person chooses to update), then
// deletes every older strutline-* cache.
const CACHE_NAME = "strutline-dev";
const PRECACHE = [];

self.addEventListener("install", (event) => {
  event.waitUntil(
    caches.open(CACHE_NAME).then((cache) =>
      cache.addAll(PRECACHE.map((path) => new Request(path, { cache: "reload" }))),
    ),
  );
});

self.addEventListener("activate", (event) => {
  event.waitUntil((async () => {
    const names = await caches.keys();
    await Promise.all(
      names
        .filter((name) => name.startsWith("strutline-") && name !== CACHE_NAME)
        .map((name) => caches.delete(name)),
    );
    await self.clients.claim();
  })());
});

// The page asks a waiting worker to take over. "activate-update" is the
// agreed message; "skip-waiting" is accepted as well.
const TAKE_OVER = ["activate-update", "skip-waiting"];

self.addEventListener("message", (event) => {
  const data = event.data;
  if (data && typeof data === "object" && TAKE_OVER.includes(data.type)) {
    self.skipWaiting();
  }
});

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin) return;
  event.respondWith(answer(request));
});

// Cache first for the app's own files, then the network. A page
// navigation that is neither cached nor reachable gets the cached shell.
async function answer(request) {
  const cache = await caches.open(CACHE_NAME);
  const navigate = request.mode === "navigate";
  const hit = await cache.match(request, { ignoreSearch: navigate });
  if (hit) return hit;
  try {
    return await fetch(request);
  } catch (error) {
    if (navigate) {
      const shell = await cache.match("./index.html");
      if (shell) return shell;
    }
    return Response.error();
  }
}
