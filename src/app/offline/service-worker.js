/* global self, caches, fetch, URL */
// The app's own files kept on the tablet, so a check can be opened again with no connection: the
// saves waiting in IndexedDB then go out when the network is back. API calls are never cached here.
// The build replaces the two markers below with this build's file list and a name for it.
const SHELL_FILES = self.__SHELL_FILES__;
const CACHE = "benchpath-shell-__SHELL_VERSION__";

self.addEventListener("install", (event) => {
  event.waitUntil(
    caches
      .open(CACHE)
      .then((cache) => cache.addAll(SHELL_FILES))
      .then(() => self.skipWaiting()),
  );
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((names) => Promise.all(names.filter((name) => name.startsWith("benchpath-shell-") && name !== CACHE).map((name) => caches.delete(name))))
      .then(() => self.clients.claim()),
  );
});

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || url.pathname.startsWith("/api/")) return;
  if (request.mode === "navigate") {
    // The page from the network when there is one (a new build shows at once), else the kept one.
    event.respondWith(fetch(request).catch(() => caches.open(CACHE).then((cache) => cache.match("/"))));
    return;
  }
  event.respondWith(caches.match(request).then((kept) => kept ?? fetch(request)));
});
