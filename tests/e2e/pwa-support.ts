// Helpers for the PWA end-to-end tests (tests/e2e/pwa*.spec.ts).
import { existsSync, readFileSync } from 'node:fs';
import { test as base, expect, type BrowserContext, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../support/http';

/**
 * Parallel test slots share public/sw.js, whose precache list names one build's files. Each context
 * is served the worker that lib/ops/build-sw.ts wrote for the build under test (same bytes it
 * copied to public/), so another slot's build cannot break this run. With one build, the two match.
 */
export async function serveOwnWorker(context: BrowserContext) {
  const own = `${process.env.NEXT_DIST_DIR ?? '.next'}/sw.js`;
  if (existsSync(own)) {
    const body = readFileSync(own, 'utf8');
    await context.route('**/sw.js', (route) =>
      route.fulfill({ status: 200, contentType: 'application/javascript', headers: { 'Cache-Control': 'no-cache', 'Service-Worker-Allowed': '/' }, body }),
    );
  }
}

export const test = base.extend({
  context: async ({ context }, provide) => {
    await serveOwnWorker(context);
    await provide(context);
  },
});

export const OFFLINE_ROUTES = [
  { path: '/sheets', heading: 'Sheets' },
  { path: '/reference', heading: 'Reference' },
  { path: '/bench', heading: 'Bench log' },
];

export async function signInThroughForm(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page).toHaveURL(/\/$/);
  await expect(page.getByText(/Signed in as/)).toBeVisible();
}

export async function waitForControllingWorker(page: Page) {
  await page.waitForFunction(() => navigator.serviceWorker?.controller?.state === 'activated', null, { timeout: 30_000 });
}

/** Paths stored in the worker's page cache (not the precache). */
export function storedPages(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const out: string[] = [];
    for (const name of await caches.keys()) {
      if (!name.startsWith('rungbook-pages-')) continue;
      const cache = await caches.open(name);
      for (const req of await cache.keys()) out.push(new URL(req.url).pathname + new URL(req.url).search);
    }
    return out;
  });
}

export async function waitForStoredPages(page: Page, paths: string[]) {
  await expect.poll(() => storedPages(page), { timeout: 30_000 }).toEqual(expect.arrayContaining(paths));
}

/** Whether a fetch from the page gets any answer (false: a network error). */
export function fetchOutcome(page: Page, url: string, headers: Record<string, string> = {}) {
  return page.evaluate(
    async ({ url, headers }) => {
      try {
        const r = await fetch(url, { headers });
        return `answered ${r.status} ${r.headers.get('content-type') ?? ''}`;
      } catch {
        return 'network error';
      }
    },
    { url, headers },
  );
}

/** Width and height from a PNG's IHDR chunk. */
export function pngSize(bytes: Buffer): { width: number; height: number } {
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  if (!bytes.subarray(0, 8).equals(signature) || bytes.toString('latin1', 12, 16) !== 'IHDR') throw new Error('not a PNG');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
