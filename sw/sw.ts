/// <reference lib="webworker" />
// Rungbook's service worker. Built by lib/ops/build-sw.ts (esbuild, then Workbox injectManifest);
// the policy is written up in sw/README.md.
import { clientsClaim } from 'workbox-core';
import { cleanupOutdatedCaches, matchPrecache, precacheAndRoute } from 'workbox-precaching';
import { registerRoute, setCatchHandler } from 'workbox-routing';
import { ExpirationPlugin } from 'workbox-expiration';
import { CacheFirst, NetworkFirst, NetworkOnly } from 'workbox-strategies';
import type { WorkboxPlugin } from 'workbox-core/types';
import { OFFLINE_URL, PHOTOS_CACHE, WARM_ROUTES, isOfflinePath, isPhotoImage, isRscRequest, pageCacheKey, type PageToWorker, type WorkerToPage } from './protocol';

declare const self: ServiceWorkerGlobalScope & { __WB_MANIFEST: { url: string; revision: string | null }[] };
// The Next.js build id, set by lib/ops/build-sw.ts.
declare const __RUNGBOOK_BUILD__: string;

const BUILD = __RUNGBOOK_BUILD__;
// Stored pages name this build's script and style files, so they live and die with the build.
const PAGES_CACHE = `rungbook-pages-${BUILD}`;
const OWNER_KEY = '/__rungbook/pages-owner';
const WARMED_AT_KEY = '/__rungbook/warmed-at';
const REWARM_AFTER_MS = 10 * 60 * 1000;
// Server-rendered record pages are stored as they are visited; keep the most recent ones.
const MAX_STORED_PAGES = 150;
// Bench photos seen on this device (thumbnails and full images), most recently used first.
const MAX_STORED_PHOTOS = 400;

/** Everything this device keeps of the signed-in user's site: the stored pages and the seen photos. */
function forgetUserCaches(): Promise<unknown> {
  return Promise.all([caches.delete(PAGES_CACHE), caches.delete(PHOTOS_CACHE)]);
}

// A new version waits until the user chooses to reload (SKIP_WAITING); the first install takes
// control of open pages at once, so they work offline without a second visit.
clientsClaim();
cleanupOutdatedCaches();
self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches.keys().then((names) => Promise.all(names.filter((n) => n.startsWith('rungbook-pages-') && n !== PAGES_CACHE).map((n) => caches.delete(n)))),
  );
});

// 1. RSC payloads: network only, before any cache is consulted.
registerRoute(({ request, url }) => isRscRequest(request.headers, url), new NetworkOnly());

// 2. Sign-out: forget the signed-in pages of this device first (even if the server cannot be
// reached: the user asked to leave), then pass the request through untouched.
registerRoute(
  ({ url }) => url.pathname === '/api/auth/signout',
  async ({ request }) => {
    await forgetUserCaches();
    return fetch(request);
  },
  'POST',
);

// 3. The app shell: hashed scripts, styles and fonts of this build, the offline page, manifest, icons.
precacheAndRoute(self.__WB_MANIFEST);

// 4. Floor screens: network first; a good HTML answer is stored; offline, the stored copy, else the
// offline page. A redirect (e.g. to sign-in) or an error page is never stored.
const storeOnlyHtmlPages: WorkboxPlugin = {
  cacheKeyWillBeUsed: async ({ request }) => pageCacheKey(new URL(request.url)),
  cacheWillUpdate: async ({ response }) => (isStorablePage(response) ? response : null),
  cacheDidUpdate: async () => trimStoredPages(),
  handlerDidError: async ({ request }) => (await storedPage(new URL(request.url))) ?? (await offlinePage()),
};
const floorPages = new NetworkFirst({ cacheName: PAGES_CACHE, networkTimeoutSeconds: 6, plugins: [storeOnlyHtmlPages] });
registerRoute(({ request, url }) => request.mode === 'navigate' && url.origin === self.location.origin && isOfflinePath(url.pathname), floorPages);

// 5. Bench photos: a photo's bytes never change (photo records are append-only), so one seen online
// is kept and shown offline; only good answers (200) are stored, at most MAX_STORED_PHOTOS.
registerRoute(
  ({ request, url }) => request.method === 'GET' && url.origin === self.location.origin && isPhotoImage(url.pathname),
  new CacheFirst({ cacheName: PHOTOS_CACHE, plugins: [new ExpirationPlugin({ maxEntries: MAX_STORED_PHOTOS, purgeOnQuotaError: true })] }),
);

// 6. Every other navigation (sign-in, reconcile, admin, …): network only, offline page when offline.
registerRoute(({ request }) => request.mode === 'navigate', new NetworkOnly());

setCatchHandler(async ({ request }) => (request.mode === 'navigate' ? offlinePage() : Response.error()));

function isStorablePage(response: Response): boolean {
  return response.status === 200 && response.type === 'basic' && !response.redirected && (response.headers.get('content-type') ?? '').includes('text/html');
}

async function offlinePage(): Promise<Response> {
  return (await matchPrecache(OFFLINE_URL)) ?? Response.error();
}

/** A stored copy of the page, else of the same path without its query (e.g. `/sheets?tab=x`). */
async function storedPage(url: URL): Promise<Response | undefined> {
  const cache = await caches.open(PAGES_CACHE);
  return (await cache.match(pageCacheKey(url))) ?? (await cache.match(url.pathname));
}

/** Drops the oldest stored pages (keys come back in insertion order) past the cap; warm routes stay. */
async function trimStoredPages() {
  const cache = await caches.open(PAGES_CACHE);
  const keep = new Set<string>([OWNER_KEY, WARMED_AT_KEY, ...WARM_ROUTES]);
  const pages = (await cache.keys()).filter((r) => !keep.has(new URL(r.url).pathname + new URL(r.url).search));
  await Promise.all(pages.slice(0, Math.max(0, pages.length - MAX_STORED_PAGES)).map((r) => cache.delete(r)));
}

async function readText(cache: Cache, key: string): Promise<string | null> {
  const r = await cache.match(key);
  return r ? r.text() : null;
}

/** Fetch the offline routes with the user's cookies and store the good answers. */
async function warmRoutes(owner: string, extra: string[], force: boolean): Promise<WorkerToPage> {
  let cache = await caches.open(PAGES_CACHE);
  if ((await readText(cache, OWNER_KEY)) !== owner) {
    await forgetUserCaches();
    cache = await caches.open(PAGES_CACHE);
    await cache.put(OWNER_KEY, new Response(owner));
  } else if (!force && Date.now() - Number((await readText(cache, WARMED_AT_KEY)) ?? 0) < REWARM_AFTER_MS) {
    return { type: 'WARMED', owner, cached: [], failed: [], skipped: true };
  }
  const urls = new Set<string>(WARM_ROUTES);
  for (const u of extra) {
    const url = new URL(u, self.location.origin);
    if (url.origin === self.location.origin && isOfflinePath(url.pathname)) urls.add(url.pathname + url.search);
  }
  const cached: string[] = [];
  const failed: string[] = [];
  // One at a time: each is a server render, and the plant network may be thin.
  for (const path of urls) {
    try {
      const response = await fetch(path, { credentials: 'same-origin', redirect: 'manual', cache: 'no-store', headers: { Accept: 'text/html' } });
      if (!isStorablePage(response)) throw new Error(String(response.status));
      await cache.put(pageCacheKey(new URL(path, self.location.origin)), response);
      cached.push(path);
    } catch {
      failed.push(path);
    }
  }
  await cache.put(WARMED_AT_KEY, new Response(String(Date.now())));
  return { type: 'WARMED', owner, cached, failed, skipped: false };
}

self.addEventListener('message', (event) => {
  const data = event.data as PageToWorker | null;
  const reply = (message: WorkerToPage) => (event.ports[0] ? event.ports[0].postMessage(message) : event.source?.postMessage(message));
  switch (data?.type) {
    case 'SKIP_WAITING':
      void self.skipWaiting();
      break;
    case 'WARM_ROUTES':
      if (typeof data.owner === 'string' && data.owner) event.waitUntil(warmRoutes(data.owner, Array.isArray(data.urls) ? data.urls : [], data.force === true).then(reply));
      break;
    case 'FORGET_PAGES':
      event.waitUntil(forgetUserCaches().then(() => reply({ type: 'PAGES_FORGOTTEN' })));
      break;
    case 'GET_VERSION':
      reply({ type: 'VERSION', build: BUILD });
      break;
  }
});
