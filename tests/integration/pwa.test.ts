// The PWA's server side over real HTTP: how the worker, manifest and offline page are served, and
// what the worker built for this build precaches.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Client } from '../support/http';

// The worker of the build under test (lib/ops/build-sw.ts writes it there, then copies it to public/,
// which parallel test slots share).
const worker = readFileSync(`${process.env.NEXT_DIST_DIR ?? '.next'}/sw.js`, 'utf8');
const precached = (): string[] => {
  const urls = [...worker.matchAll(/"url":\s*"([^"]+)"/g)].map((m) => m[1]!);
  if (urls.length === 0) throw new Error('no precache manifest found in sw.js');
  return urls;
};

describe('the service worker script', () => {
  it('is served as JavaScript, never cached by the browser, and may control the whole origin', async () => {
    const res = await new Client().raw('/sw.js');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/javascript/);
    expect(res.headers.get('cache-control')).toMatch(/no-cache/);
    expect(res.headers.get('service-worker-allowed')).toBe('/');
    expect(await res.text()).toContain('rungbook-pages-');
  });

  it('precaches every script, style and font the sign-in page loads, the offline page, manifest and icons', async () => {
    const html = await (await new Client().raw('/sign-in')).text();
    const assets = [...new Set([...html.matchAll(/\/_next\/static\/[^"'\s)]+\.(?:js|css|woff2)/g)].map((m) => m[0]))];
    expect(assets.length).toBeGreaterThan(3);
    const list = precached();
    for (const a of assets) expect(list, a).toContain(a);
    expect(list).toContain('/offline');
    expect(list).toContain('/manifest.webmanifest');
    expect(list).toContain('/icons/rungbook-512.png');
    expect(list).toContain('/icons/rungbook-maskable-512.png');
  });

  it('precaches no server-rendered page, RSC payload or API answer', () => {
    for (const url of precached()) {
      expect(url, url).not.toMatch(/\.rsc$|_rsc=|^\/api\//);
      expect(['/offline', '/manifest.webmanifest'].includes(url) || url.startsWith('/_next/static/') || url.startsWith('/icons/'), url).toBe(true);
    }
  });
});

describe('the offline page', () => {
  it('is served to anyone, signed in or not, as prerendered HTML', async () => {
    const res = await new Client().raw('/offline');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/text\/html/);
    // Static: Next marks prerendered pages cacheable; a dynamic page would say no-store.
    expect(res.headers.get('cache-control') ?? '').not.toMatch(/no-store/);
    const html = await res.text();
    expect(html).toContain('This screen isn’t on this device yet');
    expect(html).toContain('rel="manifest"');
  });
});

describe('the web app manifest', () => {
  it('is public and describes an installable standalone app', async () => {
    const res = await new Client().raw('/manifest.webmanifest');
    expect(res.status).toBe(200);
    const m = (await res.json()) as { name: string; start_url: string; scope: string; display: string; icons: { src: string }[] };
    expect(m).toMatchObject({ name: 'Rungbook', start_url: '/', scope: '/', display: 'standalone' });
    for (const icon of m.icons) expect(precached(), icon.src).toContain(icon.src);
  });
});
