// The update flow: a changed service worker waits, the page announces it, and the user's reload
// switches to it without losing what the device holds in IndexedDB.
import { readFileSync } from 'node:fs';
import { createServer, request, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';
import { test, waitForControllingWorker } from './pwa-support';

/**
 * The browser's update check for a worker bypasses Playwright's routing, so the test puts a small
 * HTTP front in front of the app: every request is passed through, except /sw.js, whose bytes the
 * test chooses (this build's worker, then a "next version" of it).
 */
async function startFront(upstream: string, worker: () => string): Promise<{ origin: string; server: Server }> {
  const target = new URL(upstream);
  const server = createServer((req, res) => {
    if (req.url?.split('?')[0] === '/sw.js') {
      res.writeHead(200, { 'Content-Type': 'application/javascript', 'Cache-Control': 'no-cache', 'Service-Worker-Allowed': '/' });
      res.end(worker());
      return;
    }
    const upstreamReq = request({ host: target.hostname, port: target.port, path: req.url, method: req.method, headers: { ...req.headers, host: target.host } }, (up) => {
      res.writeHead(up.statusCode ?? 502, up.headers);
      up.pipe(res);
    });
    upstreamReq.on('error', () => res.writeHead(502).end());
    req.pipe(upstreamReq);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { origin: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, server };
}

const banner = (page: Page) => page.getByRole('region', { name: 'New version' });

async function putProbe(page: Page, value: string) {
  await page.evaluate(
    (value) =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open('pwa-update-probe', 1);
        open.onupgradeneeded = () => open.result.createObjectStore('waiting');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const tx = open.result.transaction('waiting', 'readwrite');
          tx.objectStore('waiting').put(value, 'change-1');
          tx.oncomplete = () => (open.result.close(), resolve());
          tx.onerror = () => reject(tx.error);
        };
      }),
    value,
  );
}

function readProbe(page: Page) {
  return page.evaluate(
    () =>
      new Promise<unknown>((resolve, reject) => {
        const open = indexedDB.open('pwa-update-probe', 1);
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const get = open.result.transaction('waiting').objectStore('waiting').get('change-1');
          get.onsuccess = () => (open.result.close(), resolve(get.result));
        };
      }),
  );
}

test('a new version is announced, waits for the user, and the reload keeps data waiting on the device', async ({ browser, baseURL }) => {
  const current = readFileSync(`${process.env.NEXT_DIST_DIR ?? '.next'}/sw.js`, 'utf8');
  let served = current;
  const front = await startFront(baseURL!, () => served);
  const context = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
  const page = await context.newPage();
  try {
    await page.goto(`${front.origin}/offline`);
    await waitForControllingWorker(page);
    await expect(banner(page)).toHaveCount(0);
    await putProbe(page, 'sheet edit made offline');

    // The next deploy: the same worker with different bytes (as any rebuild gives).
    served = `${current}\n// next version ${Date.now()}\n`;
    await page.evaluate(() => navigator.serviceWorker.getRegistration().then((r) => r?.update()));

    await expect(banner(page)).toBeVisible();
    await expect(banner(page)).toContainText('A new version of Rungbook is ready.');
    const { violations } = await new AxeBuilder({ page }).include('[aria-label="New version"]').analyze();
    expect(violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
    const state = () =>
      page.evaluate(async () => {
        const r = await navigator.serviceWorker.getRegistration();
        return { waiting: !!r?.waiting, active: !!r?.active };
      });
    expect(await state()).toEqual({ waiting: true, active: true });

    // "Later" hides it; the new version keeps waiting and is announced again on the next load.
    await banner(page).getByRole('button', { name: 'Later' }).click();
    await expect(banner(page)).toHaveCount(0);
    await page.waitForTimeout(500);
    expect(await state()).toEqual({ waiting: true, active: true });
    await page.reload();
    await expect(banner(page)).toBeVisible();

    // The user reloads: SKIP_WAITING, controllerchange, one reload under the new worker.
    await page.evaluate(() => ((window as unknown as { beforeUpdate: boolean }).beforeUpdate = true));
    await Promise.all([page.waitForEvent('load'), banner(page).getByRole('button', { name: 'Reload now' }).click()]);
    expect(await page.evaluate(() => (window as unknown as { beforeUpdate?: boolean }).beforeUpdate)).toBeUndefined();
    await waitForControllingWorker(page);
    expect(await state()).toEqual({ waiting: false, active: true });
    await expect(banner(page)).toHaveCount(0);
    expect(await readProbe(page)).toBe('sheet edit made offline');
  } finally {
    await context.close();
    front.server.closeAllConnections();
    await new Promise((resolve) => front.server.close(resolve));
  }
});
