// Builds public/sw.js after `next build`: esbuild bundles sw/sw.ts, then Workbox injects the
// precache manifest of .next/static (Turbopack builds get no service worker from webpack plugins).
import { build } from 'esbuild';
import { injectManifest } from 'workbox-build';

const dist = process.env.NEXT_DIST_DIR || '.next';
const tmp = `${dist}/sw.bundle.js`;
await build({ entryPoints: ['sw/sw.ts'], bundle: true, format: 'iife', minify: true, target: 'es2020', outfile: tmp, define: { 'process.env.NODE_ENV': '"production"' } });
const { count, size, warnings } = await injectManifest({
  swSrc: tmp,
  swDest: 'public/sw.js',
  globDirectory: dist,
  globPatterns: ['static/**/*.{js,css,woff2,svg,png}'],
  modifyURLPrefix: { 'static/': '/_next/static/' },
  maximumFileSizeToCacheInBytes: 5 * 1024 * 1024,
});
for (const w of warnings) console.warn(w);
console.log(`service worker: ${count} files precached (${Math.round(size / 1024)} kB)`);
