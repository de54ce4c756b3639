import { existsSync, readFileSync } from 'node:fs';
import { expect, test as base, type Page } from '@playwright/test';
import { closeDb } from '../support/db';
import { DEMO_PASSWORD } from '../support/http';
import { demoSiteUser } from './workbench-support';

// Serve the worker built for this slot's build (parallel slots share public/sw.js).
const test = base.extend({
  context: async ({ context }, provide) => {
    const own = `${process.env.NEXT_DIST_DIR ?? '.next'}/sw.js`;
    if (existsSync(own)) {
      const body = readFileSync(own, 'utf8');
      await context.route('**/sw.js', (route) => route.fulfill({ status: 200, contentType: 'application/javascript', headers: { 'Cache-Control': 'no-cache', 'Service-Worker-Allowed': '/' }, body }));
    }
    await provide(context);
  },
});

test.afterAll(closeDb);

function storedPages(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const out: string[] = [];
    for (const name of await caches.keys()) {
      if (!name.startsWith('rungbook-pages-')) continue;
      for (const req of await (await caches.open(name)).keys()) out.push(new URL(req.url).pathname);
    }
    return out;
  });
}

test('a sheet made offline is solved, saved and reopened offline, and syncs when the device is back online', async ({ page, context }) => {
  test.setTimeout(120_000);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(await demoSiteUser('technician', 'Workbench offline technician'));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  await page.goto('/sheets');
  await page.waitForFunction(() => navigator.serviceWorker?.controller?.state === 'activated', null, { timeout: 30_000 });
  // The list asks the worker to keep the workbench page; the record shell is kept for every id.
  await expect.poll(() => storedPages(page), { timeout: 30_000 }).toEqual(expect.arrayContaining(['/sheets', '/sheets/new', '/sheets/open']));
  await page.goto('/sheets/new?kind=cycle');
  await expect(page.getByText('This device has no reference edition yet')).toHaveCount(0, { timeout: 20_000 });

  await context.setOffline(true);
  const title = `LiCl offline check ${Date.now().toString(36)}`;
  const res = await page.goto('/sheets/new?kind=cycle');
  expect(res?.fromServiceWorker()).toBe(true);
  await page.getByLabel('Title').fill(title);
  await page.getByLabel('Formula of the salt').fill('LiCl');
  await expect(page.getByTestId('result-value')).toContainText('kJ/mol');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page).toHaveURL(/\/sheets\/open\?id=[0-9a-f-]{36}$/);
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(page.getByTestId('sync-state')).toHaveText('waiting to sync');
  const solved = await page.getByTestId('result-value').textContent();

  await page.reload();
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(page.getByTestId('result-value')).toHaveText(solved!);

  await context.setOffline(false);
  await expect(page.getByTestId('sync-state')).toHaveText('synced', { timeout: 30_000 });
});
