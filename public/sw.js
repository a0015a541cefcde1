/*
 * Rungwise service worker, hand-written on purpose: the maintained option (@serwist/next) is not a
 * dependency here, and its build integration hooks into webpack while this app builds with Next 16's
 * default Turbopack. What we need is small: keep the app shell and the athlete's Today screen (page
 * and its API GET) available offline after one online visit.
 *
 * - /_next/static/*: content-hashed, so cache-first.
 * - Pages (navigations) and the Today API GETs: network first, falling back to the last good copy.
 * - Everything else, and every write, goes straight to the network: unsent sets wait in IndexedDB
 *   (see lib/client/offline-queue.ts), not here.
 */
const VERSION = "v1";
const STATIC_CACHE = `rungwise-static-${VERSION}`;
const PAGE_CACHE = `rungwise-pages-${VERSION}`;
const OFFLINE_PAGES = ["/today", "/history"];
const CACHED_API = [/^\/api\/v1\/me\/today$/, /^\/api\/v1\/athletes\/[0-9a-f-]{36}\/today$/];

const CACHED_PAGES = [/^\/today$/, /^\/history$/, /^\/coach\/athletes\/[0-9a-f-]{36}\/today$/];

/** Stores a page only when it is the page itself (a signed-out visit redirects to sign-in). */
async function keep(cache, path) {
  try {
    const response = await fetch(path, { credentials: "same-origin" });
    if (response.ok && !response.redirected) await cache.put(path, response);
  } catch {
    // Offline during install: the page is cached on the next online visit instead.
  }
}

self.addEventListener("install", (event) => {
  event.waitUntil(
    caches
      .open(PAGE_CACHE)
      .then((cache) => Promise.all(OFFLINE_PAGES.map((page) => keep(cache, page))))
      .then(() => self.skipWaiting()),
  );
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((keys) => Promise.all(keys.filter((k) => k.startsWith("rungwise-") && !k.endsWith(VERSION)).map((k) => caches.delete(k))))
      .then(() => self.clients.claim()),
  );
});

/** The page tells us what it loaded before we were in control, so the shell works offline at once. */
self.addEventListener("message", (event) => {
  const data = event.data;
  if (!data || data.type !== "cache-urls" || !Array.isArray(data.urls)) return;
  event.waitUntil(
    Promise.all(
      data.urls.map((href) => {
        const url = new URL(href, self.location.origin);
        if (url.origin !== self.location.origin) return undefined;
        const cacheName = url.pathname.startsWith("/_next/static/") ? STATIC_CACHE : PAGE_CACHE;
        if (cacheName === PAGE_CACHE && !CACHED_PAGES.some((p) => p.test(url.pathname))) return undefined;
        return caches.open(cacheName).then((cache) =>
          cache.match(url.href).then((hit) => hit || (cacheName === PAGE_CACHE ? keep(cache, url.pathname) : cache.add(url.href).catch(() => undefined))),
        );
      }),
    ),
  );
});

async function cacheFirst(request) {
  const hit = await caches.match(request);
  if (hit) return hit;
  const response = await fetch(request);
  if (response.ok) (await caches.open(STATIC_CACHE)).put(request, response.clone());
  return response;
}

async function networkFirst(request, fallbackPath) {
  const cache = await caches.open(PAGE_CACHE);
  try {
    const response = await fetch(request);
    // Only keep real answers for this URL (never a redirect to sign-in or an error page).
    if (response.ok && !response.redirected) cache.put(request, response.clone());
    return response;
  } catch (error) {
    const hit = (await cache.match(request)) || (await cache.match(request, { ignoreSearch: true }));
    if (hit) return hit;
    if (fallbackPath) {
      const fallback = await cache.match(fallbackPath);
      if (fallback) return fallback;
    }
    throw error;
  }
}

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin) return;
  if (url.pathname.startsWith("/_next/static/")) {
    event.respondWith(cacheFirst(request));
    return;
  }
  if (CACHED_API.some((pattern) => pattern.test(url.pathname))) {
    event.respondWith(networkFirst(request));
    return;
  }
  if (request.mode === "navigate" && CACHED_PAGES.some((pattern) => pattern.test(url.pathname))) {
    event.respondWith(networkFirst(request, OFFLINE_PAGES.includes(url.pathname) ? url.pathname : undefined));
  }
});
