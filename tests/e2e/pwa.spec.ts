// The installable app and its offline shell, in Debian's chromium against the production build.
import AxeBuilder from '@axe-core/playwright';
import { expect } from '@playwright/test';
import { SHELL_PATHS } from '../../sw/protocol';
import { DEMO } from '../support/http';
import { OFFLINE_ROUTES, test, fetchOutcome, pngSize, signInThroughForm, storedPages, waitForControllingWorker, waitForStoredPages } from './pwa-support';

type ManifestIcon = { src: string; sizes: string; type: string; purpose?: string };

test('the manifest is linked from every page, valid, and every icon is a PNG of its declared size', async ({ page, request }) => {
  await page.goto('/sign-in');
  const href = await page.locator('link[rel="manifest"]').getAttribute('href');
  expect(href).toBe('/manifest.webmanifest');
  const res = await request.get(href!);
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toContain('application/manifest+json');
  const manifest = (await res.json()) as Record<string, unknown> & { icons: ManifestIcon[]; shortcuts?: { icons?: ManifestIcon[] }[] };

  expect(manifest.name).toBe('Rungbook');
  expect(manifest.short_name).toBe('Rungbook');
  expect(manifest.start_url).toBe('/');
  expect(manifest.display).toBe('standalone');
  expect(manifest.theme_color).toMatch(/^#[0-9a-f]{6}$/i);
  expect(await page.locator('meta[name="theme-color"]').getAttribute('content')).toBe(manifest.theme_color);
  expect(manifest.background_color).toMatch(/^#[0-9a-f]{6}$/i);

  const purposes = (i: ManifestIcon) => (i.purpose ?? 'any').split(' ');
  const has = (size: string, purpose: string) => manifest.icons.some((i) => i.sizes === size && purposes(i).includes(purpose) && i.type === 'image/png');
  expect(has('192x192', 'any')).toBe(true);
  expect(has('512x512', 'any')).toBe(true);
  expect(manifest.icons.some((i) => purposes(i).includes('maskable'))).toBe(true);

  const apple = await page.locator('link[rel="apple-touch-icon"]').getAttribute('href');
  const icons = [...manifest.icons, ...(manifest.shortcuts ?? []).flatMap((s) => s.icons ?? []), { src: apple!, sizes: '180x180', type: 'image/png' }];
  for (const icon of icons) {
    const r = await request.get(icon.src);
    expect(r.status(), icon.src).toBe(200);
    expect(r.headers()['content-type'], icon.src).toBe('image/png');
    const [w, h] = icon.sizes.split('x').map(Number);
    expect(pngSize(await r.body()), icon.src).toEqual({ width: w, height: h });
  }
});

test('the service worker installs, controls the page and precaches the shell, fonts and offline page', async ({ page }) => {
  await page.goto('/sign-in');
  await waitForControllingWorker(page);
  expect(new URL(await page.evaluate(() => navigator.serviceWorker.controller!.scriptURL)).pathname).toBe('/sw.js');

  const precached = await page.evaluate(async () => {
    const out: string[] = [];
    for (const name of await caches.keys()) {
      if (!name.includes('precache')) continue;
      for (const req of await (await caches.open(name)).keys()) out.push(new URL(req.url).pathname);
    }
    return out;
  });
  expect(precached).toContain('/offline');
  expect(precached).toContain('/manifest.webmanifest');
  expect(precached.some((p) => p.startsWith('/_next/static/') && p.endsWith('.woff2'))).toBe(true);
  // Every script and style this page loads is in the precache: the shell needs no network.
  const assets = await page.evaluate(() =>
    performance
      .getEntriesByType('resource')
      .map((e) => new URL(e.name))
      .filter((u) => u.pathname.startsWith('/_next/static/') && /\.(js|css|woff2)$/.test(u.pathname))
      .map((u) => u.pathname),
  );
  expect(assets.length).toBeGreaterThan(0);
  for (const a of assets) expect(precached, a).toContain(a);
});

test('Chromium finds the app installable and the manifest free of errors', async ({ page, context }) => {
  await page.goto('/sign-in');
  await waitForControllingWorker(page);
  const cdp = await context.newCDPSession(page);
  const { errors, url } = (await cdp.send('Page.getAppManifest')) as { errors: { message: string }[]; url: string };
  expect(new URL(url).pathname).toBe('/manifest.webmanifest');
  expect(errors).toEqual([]);
  const { installabilityErrors } = (await cdp.send('Page.getInstallabilityErrors')) as { installabilityErrors: { errorId: string }[] };
  // Playwright's contexts are off the record, where Chromium never offers to install; every other
  // criterion (manifest fields, icons, worker) is still checked and reported beside that one.
  expect(installabilityErrors.map((e) => e.errorId).filter((id) => id !== 'in-incognito')).toEqual([]);
});

test('signed in, the floor screens open offline from the device; an unstored screen gets the offline page', async ({ page, context }) => {
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await waitForStoredPages(page, ['/', ...OFFLINE_ROUTES.map((r) => r.path)]);

  await context.setOffline(true);
  for (const { path, heading } of OFFLINE_ROUTES) {
    const res = await page.goto(path);
    expect(res?.fromServiceWorker(), path).toBe(true);
    await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
  }
  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: 'Bench log' })).toBeVisible();
  await expect(page.getByRole('status').getByText('Offline — working from this device')).toBeVisible();

  // A client-side link offline: the router cannot get an RSC payload and falls back to a full page load.
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reference' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Reference' })).toBeVisible();
  await expect(page).toHaveURL(/\/reference$/);

  await page.goto('/');
  await expect(page.getByText(/Signed in as/)).toBeVisible();
  // A query on a stored screen falls back to the stored screen.
  await page.goto('/sheets?tab=recent');
  await expect(page.getByRole('heading', { level: 1, name: 'Sheets' })).toBeVisible();

  for (const path of ['/sheets/never-opened-here', '/reconcile', '/sign-in']) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1, name: 'This screen isn’t on this device yet' }), path).toBeVisible();
    expect(new URL(page.url()).pathname).toBe(path);
  }
  await context.setOffline(false);
});

test('an RSC payload is never answered from a cache, online or offline', async ({ page, context }) => {
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await waitForStoredPages(page, ['/sheets']);

  expect(await fetchOutcome(page, '/sheets', { RSC: '1' })).toMatch(/^answered 200 text\/x-component/);
  await context.setOffline(true);
  // Each of these URLs has an HTML copy in a cache (page cache or precache).
  for (const url of ['/sheets', '/offline', '/']) expect(await fetchOutcome(page, url, { RSC: '1' }), url).toBe('network error');
  expect(await fetchOutcome(page, '/sheets?_rsc=probe')).toBe('network error');
  expect(await fetchOutcome(page, '/sheets', { 'Next-Router-Prefetch': '1', RSC: '1' })).toBe('network error');
  await context.setOffline(false);

  const cachedTypes = await page.evaluate(async () => {
    const types = new Set<string>();
    for (const name of await caches.keys()) {
      const cache = await caches.open(name);
      for (const req of await cache.keys()) types.add((await cache.match(req))?.headers.get('content-type') ?? '');
    }
    return [...types];
  });
  expect(cachedTypes.some((t) => t.includes('text/x-component'))).toBe(false);
});

test('signing out forgets the stored pages of this device', async ({ page, context }) => {
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await waitForStoredPages(page, ['/sheets']);
  await page.getByRole('button', { name: 'Sign out' }).first().click();
  await expect(page).toHaveURL(/\/sign-in/);
  expect((await storedPages(page)).filter((p) => !p.startsWith('/__rungbook/'))).toEqual([]);

  await context.setOffline(true);
  await page.goto('/sheets');
  await expect(page.getByRole('heading', { level: 1, name: 'This screen isn’t on this device yet' })).toBeVisible();
  await context.setOffline(false);
});

test('the offline page is static, reachable signed out, and has no serious accessibility violations', async ({ page, context }) => {
  const res = await page.goto('/offline');
  expect(res?.status()).toBe(200);
  await expect(page.getByRole('heading', { level: 1, name: 'This screen isn’t on this device yet' })).toBeVisible();
  const check = async () => {
    const { violations } = await new AxeBuilder({ page }).analyze();
    return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help}`);
  };
  expect(await check()).toEqual([]);

  // And as the fallback the worker serves, with the offline indicator showing.
  await waitForControllingWorker(page);
  await context.setOffline(true);
  await page.goto('/bench/never-stored');
  await expect(page.getByRole('status').getByText('Offline — working from this device')).toBeVisible();
  expect(await check()).toEqual([]);
  // Its buttons and links are touch-sized.
  for (const box of await page.locator('main a, main button').evaluateAll((els) => els.map((e) => e.getBoundingClientRect().height))) {
    expect(box).toBeGreaterThanOrEqual(44);
  }
  await context.setOffline(false);
});

test('a record made offline opens under its stored shell, whatever its id', async ({ page, context, request }) => {
  // The shells are the workbench's and bench log's pages. One not built yet (404 here) is replaced
  // by a stand-in with the same contract (read the query on the device), so the worker's side is
  // still checked.
  const standIns: string[] = [];
  for (const path of SHELL_PATHS) {
    if ((await request.get(path, { maxRedirects: 0 })).status() !== 404) continue;
    standIns.push(path);
    await context.route(`**${path}?*`, (route) => route.fulfill({ status: 200, contentType: 'text/html; charset=utf-8', body: standInShell }));
    await context.route(`**${path}`, (route) => route.fulfill({ status: 200, contentType: 'text/html; charset=utf-8', body: standInShell }));
  }
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await waitForStoredPages(page, [...SHELL_PATHS]);
  // One copy for every id: opening records online refreshes the same entry, keyed without the query.
  await page.goto('/sheets/open?id=0193f0c2-opened-online', { waitUntil: 'load' });
  await page.waitForTimeout(500); // the worker stores the answer just after handing it over
  expect((await storedPages(page)).filter((p) => p.startsWith('/sheets/open'))).toEqual(['/sheets/open']);

  await context.setOffline(true);
  for (const path of SHELL_PATHS) {
    for (const id of ['0193f0c2-made-offline-1', '0193f0c2-made-offline-2']) {
      const url = `${path}?id=${id}`;
      const res = await page.goto(url);
      expect(res?.fromServiceWorker(), url).toBe(true);
      expect(new URL(page.url()).searchParams.get('id')).toBe(id);
      await expect(page.getByRole('heading', { level: 1, name: 'This screen isn’t on this device yet' }), url).toHaveCount(0);
      if (standIns.includes(path)) await expect(page.getByRole('heading', { level: 1, name: `Record ${id}` })).toBeVisible();
    }
  }
  await context.setOffline(false);
});

const standInShell = `<!doctype html><html lang="en"><title>Record</title><h1 id="t">Record</h1>
<script>document.getElementById('t').textContent = 'Record ' + new URLSearchParams(location.search).get('id');</script></html>`;

test('when another user signs in on the device, the previous user’s stored pages are dropped', async ({ page, context }) => {
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await waitForStoredPages(page, ['/', '/sheets']);
  // The session ends without a sign-out through the app (expired, cookies cleared); the next user
  // lands on Today and never opens Sheets online.
  await context.clearCookies();
  await signInThroughForm(page, DEMO.qcTechnician);
  const storedSheets = () =>
    page.evaluate(async () => {
      for (const name of await caches.keys()) {
        if (!name.startsWith('rungbook-pages-')) continue;
        const stored = await (await caches.open(name)).match('/sheets');
        // The page's text, as shown: the shell names the signed-in user as "name · role".
        return stored ? (new DOMParser().parseFromString(await stored.text(), 'text/html').body.textContent ?? '') : '';
      }
      return '';
    });
  await expect.poll(storedSheets, { timeout: 30_000 }).toContain('QC lab technician · technician');
  expect(await storedSheets()).not.toContain('Dissolver hall technician · technician');

  await context.setOffline(true);
  await page.goto('/sheets');
  await expect(page.getByRole('heading', { level: 1, name: 'Sheets' })).toBeVisible();
  await expect(page.getByText('QC lab technician · technician')).toBeVisible();
  await expect(page.getByText('Dissolver hall technician · technician')).toHaveCount(0);
  await context.setOffline(false);
});
