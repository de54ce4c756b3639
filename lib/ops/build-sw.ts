// Builds public/sw.js after `next build`: esbuild bundles sw/sw.ts, then Workbox injects the
// precache manifest (Turbopack builds get no service worker from webpack plugins). See sw/README.md.
import { createHash } from 'node:crypto';
import { copyFile, readFile, readdir } from 'node:fs/promises';
import { build } from 'esbuild';
import { injectManifest } from 'workbox-build';

const dist = process.env.NEXT_DIST_DIR || '.next';
const tmp = `${dist}/sw.bundle.js`;
const md5 = (bytes: Buffer | string) => createHash('md5').update(bytes).digest('hex');

async function revisionOf(file: string, what: string): Promise<string> {
  try {
    return md5(await readFile(file));
  } catch {
    // Without these the worker would install with no offline page: stop the build instead.
    throw new Error(`build-sw: ${what} not found at ${file}; is it still a static route? Run next build first.`);
  }
}

const buildId = (await readFile(`${dist}/BUILD_ID`, 'utf8')).trim();
const icons = (await readdir('public/icons')).filter((f) => f.endsWith('.png')).sort();
const additionalManifestEntries = [
  // Prerendered at build time (app/offline is static); its HTML names this build's files.
  { url: '/offline', revision: await revisionOf(`${dist}/server/app/offline.html`, 'the offline page') },
  { url: '/manifest.webmanifest', revision: await revisionOf(`${dist}/server/app/manifest.webmanifest.body`, 'the web app manifest') },
  ...(await Promise.all(icons.map(async (f) => ({ url: `/icons/${f}`, revision: md5(await readFile(`public/icons/${f}`)) })))),
];

await build({
  entryPoints: ['sw/sw.ts'],
  bundle: true,
  format: 'iife',
  minify: true,
  target: 'es2020',
  outfile: tmp,
  define: { 'process.env.NODE_ENV': '"production"', __RUNGBOOK_BUILD__: JSON.stringify(buildId) },
});
// Written into the build folder first, then copied to public/ (served by `next start`): parallel test
// slots share public/, and their tests serve their own build's copy (tests/e2e/pwa-support.ts).
const { count, size, warnings } = await injectManifest({
  swSrc: tmp,
  swDest: `${dist}/sw.js`,
  globDirectory: dist,
  // Hashed build files only (scripts, styles, fonts); never RSC payloads or server output.
  globPatterns: ['static/**/*.{js,css,woff2,svg,png}'],
  modifyURLPrefix: { 'static/': '/_next/static/' },
  additionalManifestEntries,
  maximumFileSizeToCacheInBytes: 5 * 1024 * 1024,
});
for (const w of warnings) console.warn(w);
await copyFile(`${dist}/sw.js`, 'public/sw.js');
console.log(`service worker for build ${buildId}: ${count} files precached (${Math.round(size / 1024)} kB)`);
