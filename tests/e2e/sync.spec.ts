// Sync end to end in Debian's Chromium: offline edits, reopen, exactly-once delivery, a conflict
// between two devices settled on the reconcile screen, and refused cross-origin / cross-site pushes.
// Records are made through `window.rungbook.local` (lib/local/console-api.ts): the same write path
// (saveSheet / saveBenchEntry) the workbench and bench-log screens use, which are not built yet.
import AxeBuilder from '@axe-core/playwright';
import { expect, type BrowserContext, type Page } from '@playwright/test';
import { hash } from '@node-rs/argon2';
import { v7 } from 'uuid';
import { DEMO_PASSWORD } from '../support/http';
import { closeDb, makeSite, outcomesOf, query } from '../support/db';
import { signInThroughForm, test, waitForControllingWorker, waitForStoredPages } from './pwa-support';

type Local = {
  newBenchEntry(f: object): { id: string } & Record<string, unknown>;
  saveBenchEntry(e: object): Promise<unknown>;
  newSheet(f: object): { id: string } & Record<string, unknown>;
  saveSheet(s: object): Promise<unknown>;
  getRecord(entity: string, id: string): Promise<{ content: Record<string, unknown>; awaitingReview: boolean; serverRevision: number; pending: boolean } | null>;
  syncNow(): Promise<void>;
};
declare global {
  interface Window {
    rungbook?: { local?: Local };
  }
}

const PROTO = { 'x-rungbook-sync-protocol': '1' };

test.afterAll(closeDb);

async function localApi(page: Page) {
  await page.waitForFunction(() => !!window.rungbook?.local, null, { timeout: 15_000 });
}

const waiting = (page: Page) => page.getByTestId('sync-waiting');

/** A fresh account on the demo site, so these tests do not spend the shared demo accounts' sign-in rate limit. */
async function demoSiteUser(role: 'technician' | 'supervisor'): Promise<string> {
  const [demo] = await query<{ id: string }>("SELECT id FROM sites WHERE code = 'calder-reach'");
  const id = v7();
  const email = `sync-e2e-${role}-${id.slice(-12)}@calder-reach.test`;
  await query("INSERT INTO users (id, site_id, email, display_name, role, status, password_hash, created_at) VALUES (?, ?, ?, ?, ?, 'active', ?, UTC_TIMESTAMP(3))", [
    id,
    demo!.id,
    email,
    `Sync e2e ${role}`,
    role,
    await hash(DEMO_PASSWORD),
  ]);
  return email;
}

test('a record made and edited offline survives closing the page and syncs exactly once when back online', async ({ page, context }) => {
  await signInThroughForm(page, await demoSiteUser('technician'));
  await waitForControllingWorker(page);
  await page.goto('/bench');
  await waitForStoredPages(page, ['/bench']);
  await localApi(page);
  await expect(waiting(page)).toHaveText('0 waiting to sync');

  await context.setOffline(true);
  const id = await page.evaluate(async () => {
    const api = window.rungbook!.local!;
    const e = api.newBenchEntry({ note: 'Filter cake from dissolver 2 looked damp', lotRef: 'E2E-0412', tags: ['dissolver'] });
    await api.saveBenchEntry(e);
    await api.saveBenchEntry({ ...e, note: 'Filter cake from dissolver 2 looked damp; re-dried for 2 h' });
    return e.id;
  });
  // Two edits of one record wait as ONE change.
  await expect(waiting(page)).toHaveText('1 waiting to sync');
  await page.close();

  // Reopen while still offline: the page comes from the service worker, the change from the store.
  const again = await context.newPage();
  const res = await again.goto('/bench');
  expect(res?.fromServiceWorker()).toBe(true);
  await expect(waiting(again)).toHaveText('1 waiting to sync');
  expect(await query('SELECT id FROM bench_entries WHERE id = ?', [id])).toHaveLength(0);

  await context.setOffline(false); // the 'online' event starts a sync
  await expect(waiting(again)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  const rows = await query<{ revision: number; content: { note: string } }>('SELECT revision, content FROM bench_entries WHERE id = ?', [id]);
  expect(rows).toHaveLength(1);
  expect(rows[0]!.revision).toBe(1);
  expect(rows[0]!.content.note).toBe('Filter cake from dissolver 2 looked damp; re-dried for 2 h');
  expect(await query('SELECT seq FROM sync_changes WHERE record_id = ?', [id])).toHaveLength(1);
  expect(await outcomesOf([id])).toHaveLength(1);
  // A second sync changes nothing more.
  await again.evaluate(() => window.rungbook!.local!.syncNow());
  expect(await query('SELECT seq FROM sync_changes WHERE record_id = ?', [id])).toHaveLength(1);
});

async function device(browser: import('@playwright/test').Browser, email: string): Promise<{ ctx: BrowserContext; page: Page }> {
  const ctx = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
  const page = await ctx.newPage();
  await signInThroughForm(page, email);
  await localApi(page);
  return { ctx, page };
}

test('two devices edit one sheet offline → a conflict → a supervisor settles it → both devices converge', async ({ browser }) => {
  const technician = await demoSiteUser('technician');
  const a = await device(browser, technician);
  const b = await device(browser, technician); // the same technician's second tablet
  const title = `Slaking trial ${Date.now()}`;
  // Formation enthalpies are test inputs for the engine, not check values.
  const id = await a.page.evaluate(async (title) => {
    const api = window.rungbook!.local!;
    const s = api.newSheet({
      kind: 'reaction',
      title,
      lotRef: 'E2E-0413',
      problem: { kind: 'reaction', problem: { reaction: 'CaO(cr) + H2O(l) -> Ca(OH)2(cr)', enthalpiesOfFormation: { 'CaO(cr)': '-634.9', 'H2O(l)': '-285.83', 'Ca(OH)2(cr)': '-985.2' } } },
    });
    await api.saveSheet(s);
    await api.syncNow();
    return s.id;
  }, title);
  await expect(waiting(a.page)).toHaveText('0 waiting to sync');
  await b.page.evaluate(() => window.rungbook!.local!.syncNow());
  expect((await b.page.evaluate((id) => window.rungbook!.local!.getRecord('sheet', id), id))?.serverRevision).toBe(1);

  await a.ctx.setOffline(true);
  await b.ctx.setOffline(true);
  for (const [d, who] of [[a, 'A'], [b, 'B']] as const) {
    await d.page.evaluate(
      async ({ id, who }) => {
        const api = window.rungbook!.local!;
        const r = await api.getRecord('sheet', id);
        await api.saveSheet({ ...r!.content, title: `${r!.content.title as string} (tablet ${who})` });
      },
      { id, who },
    );
    await expect(waiting(d.page)).toHaveText('1 waiting to sync');
  }
  await a.ctx.setOffline(false);
  await expect(waiting(a.page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  await b.ctx.setOffline(false);
  await expect(waiting(b.page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  const onB = await b.page.evaluate((id) => window.rungbook!.local!.getRecord('sheet', id), id);
  expect(onB?.awaitingReview).toBe(true);
  expect(onB?.content.title).toBe(`${title} (tablet A)`);

  // The supervisor settles it on the reconcile screen, keeping tablet B's version.
  const sup = await device(browser, await demoSiteUser('supervisor'));
  await sup.page.goto('/reconcile');
  await expect(sup.page.getByRole('heading', { level: 1, name: 'Reconcile' })).toBeVisible();
  await sup.page.getByRole('button', { name: new RegExp(`${title} \\(tablet A\\)`) }).click();
  const review = sup.page.getByRole('table');
  await expect(review.getByRole('row', { name: /Title/ })).toContainText('differs');
  await expect(review).toContainText(`${title} (tablet B)`);
  const { violations } = await new AxeBuilder({ page: sup.page }).analyze();
  expect(violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
  await sup.page.getByRole('button', { name: /Keep device version 1/ }).click();
  await expect(sup.page.getByRole('button', { name: new RegExp(`${title} \\(tablet A\\)`) })).toHaveCount(0);

  for (const d of [a, b]) {
    await d.page.evaluate(() => window.rungbook!.local!.syncNow());
    const r = await d.page.evaluate((id) => window.rungbook!.local!.getRecord('sheet', id), id);
    expect(r).toMatchObject({ awaitingReview: false, serverRevision: 3, pending: false });
    expect(r?.content.title).toBe(`${title} (tablet B)`);
  }
  for (const d of [a, b, sup]) await d.ctx.close();
});

test('cross-origin and cross-site pushes are refused', async ({ page }) => {
  await signInThroughForm(page, await demoSiteUser('technician'));
  const me = (await (await page.request.get('/api/v1/me')).json()) as { userId: string; siteId: string };
  const t = new Date().toISOString();
  const entry = { id: '0190f3a0-0000-7000-8000-0000000e2e01', note: 'refused', lotRef: null, areaId: null, tags: [], sheetId: null, photoIds: [], authorId: me.userId, deleted: false, createdAt: t, updatedAt: t };
  const body = (siteId: string) => ({ deviceId: '0190f3a0-0000-7000-8000-0000000e2e02', userId: me.userId, siteId, mutations: [{ mutationId: '0190f3a0-0000-7000-8000-0000000e2e03', entity: 'bench_entry', recordId: entry.id, baseRevision: 0, content: entry }] });
  const other = await makeSite('e2e-other');

  const crossOrigin = await page.request.post('/api/v1/sync/push', { headers: { ...PROTO, origin: 'https://elsewhere.example' }, data: body(me.siteId) });
  expect(crossOrigin.status()).toBe(403);
  expect(((await crossOrigin.json()) as { error: { code: string } }).error.code).toBe('cross_origin');
  const ownOrigin = new URL(page.url()).origin;
  const crossSite = await page.request.post('/api/v1/sync/push', { headers: { ...PROTO, origin: ownOrigin }, data: body(other.siteId) });
  expect(crossSite.status()).toBe(403);
  expect(((await crossSite.json()) as { error: { message: string } }).error.message).toContain('another site');
  expect(await query('SELECT id FROM bench_entries WHERE id = ?', [entry.id])).toHaveLength(0);
});

test('a change the server refuses is shown with its reason and exported, never dropped silently', async ({ page }) => {
  await signInThroughForm(page, await demoSiteUser('technician'));
  await localApi(page);
  // A bench entry claiming another author passes the device's schema but is refused by the server.
  await page.evaluate(async () => {
    const api = window.rungbook!.local!;
    await api.saveBenchEntry(api.newBenchEntry({ note: 'claims another author', authorId: 'someone-else' }));
    await api.syncNow();
  });
  await expect(waiting(page)).toHaveText('0 waiting to sync');
  await page.getByRole('button', { name: '1 not accepted' }).click();
  await expect(page.getByTestId('sync-rejected')).toContainText('A new record must name its signed-in author.');
  const remove = page.getByRole('button', { name: 'Remove from this device' });
  await expect(remove).toBeDisabled();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export as a file' }).click()]);
  const exported = JSON.parse(await (await import('node:fs/promises')).readFile((await download.path())!, 'utf8')) as { rejected: { reason: string; content: { note: string } }[] };
  expect(exported.rejected[0]).toMatchObject({ reason: 'A new record must name its signed-in author.', content: { note: 'claims another author' } });
  await expect(remove).toBeEnabled();
  await remove.click();
  await expect(page.getByRole('button', { name: '1 not accepted' })).toHaveCount(0);
});

test('an expired session keeps the queue and asks to sign in; signing out with changes waiting warns and keeps them', async ({ page, context }) => {
  const email = await demoSiteUser('technician');
  await signInThroughForm(page, email);
  await localApi(page);
  await context.clearCookies(); // the session ends (as when it expires)
  const id = await page.evaluate(async () => {
    const api = window.rungbook!.local!;
    const e = api.newBenchEntry({ note: 'written after the session ended' });
    await api.saveBenchEntry(e);
    await api.syncNow();
    return e.id;
  });
  await expect(page.getByTestId('sync-status')).toContainText('Your session has ended');
  await expect(waiting(page)).toHaveText('1 waiting to sync');
  await expect(page.getByTestId('sync-status').getByRole('link', { name: 'Sign in' })).toBeVisible();

  await signInThroughForm(page, email);
  await expect(waiting(page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  expect(await query('SELECT revision FROM bench_entries WHERE id = ?', [id])).toEqual([{ revision: 1 }]);

  // Sign out with a change waiting: a warning; dismissing it keeps the user signed in with the change.
  await context.setOffline(true);
  await page.evaluate(async () => {
    const api = window.rungbook!.local!;
    await api.saveBenchEntry(api.newBenchEntry({ note: 'waiting at sign-out' }));
  });
  await expect(waiting(page)).toHaveText('1 waiting to sync');
  let warned = '';
  page.once('dialog', (d) => {
    warned = d.message();
    void d.dismiss();
  });
  await page.getByRole('button', { name: 'Sign out' }).first().click();
  await expect.poll(() => warned).toContain('1 change on this device is still waiting to sync');
  await expect(waiting(page)).toHaveText('1 waiting to sync');
  await context.setOffline(false);
});
