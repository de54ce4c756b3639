/// <reference lib="webworker" />
// Rungbook's service worker. Built by lib/ops/build-sw.ts (esbuild, then Workbox injectManifest).
import { precacheAndRoute, cleanupOutdatedCaches } from 'workbox-precaching';
import { registerRoute } from 'workbox-routing';
import { CacheFirst } from 'workbox-strategies';

declare const self: ServiceWorkerGlobalScope & { __WB_MANIFEST: { url: string; revision: string | null }[] };

cleanupOutdatedCaches();
// Hashed build assets (scripts, styles, fonts) only; never RSC payloads.
precacheAndRoute(self.__WB_MANIFEST);
registerRoute(({ url }) => url.pathname.startsWith('/_next/static/media/'), new CacheFirst({ cacheName: 'rungbook-fonts' }));

// The page announces a new version; the user decides when to reload.
self.addEventListener('message', (event) => {
  if ((event.data as { type?: string } | null)?.type === 'SKIP_WAITING') void self.skipWaiting();
});
