// The bench log end to end in Debian's Chromium against the production build, a real MariaDB and
// the local S3-compatible store: a note with a photo made offline, synced, and seen on another
// device of the site; photo checks in the browser; another site denied; storage stopped mid-sync.
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';
import sharp from 'sharp';
import { DEMO } from '../support/http';
import { closeDb, makeSite, outcomesOf, query } from '../support/db';
import { startFakes, stopFakes, storedKeys, storedObject } from './bench-support';
import { serveOwnWorker, signInThroughForm, test, waitForControllingWorker, waitForStoredPages } from './pwa-support';

test.afterAll(closeDb);

const GPS_TAG_LE = Buffer.from([0x25, 0x88]); // EXIF tag 0x8825 (GPSInfo), little-endian

// A camera-like photo of a drum label, with a GPS position in its EXIF (invented coordinates).
function cameraJpeg(width = 1600, height = 1200) {
  return sharp({ create: { width, height, channels: 3, background: '#8c6f4a' } })
    .composite([{ input: { create: { width: Math.round(width / 2), height: Math.round(height / 3), channels: 3, background: '#f4f1e8' } }, top: Math.round(height / 3), left: Math.round(width / 4) }])
    .jpeg({ quality: 90 })
    .withExif({ IFD0: { Make: 'BenchCam', Model: 'T1' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '53/1 28/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '2/1 14/1 9/1' } })
    .toBuffer();
}

const unique = (prefix: string) => `${prefix}-${Date.now().toString(36).slice(-5).toUpperCase()}`;
const waiting = (page: Page) => page.getByTestId('sync-waiting');

async function fillEntry(page: Page, { lot, note, tags, photo }: { lot: string; note: string; tags: string; photo?: Buffer }) {
  await page.getByLabel('Lot', { exact: true }).fill(lot);
  await page.getByLabel('Note').fill(note);
  await page.getByLabel(/^Tags/).fill(tags);
  if (photo) {
    await page.getByLabel('Photo files').setInputFiles({ name: 'drum-label.jpg', mimeType: 'image/jpeg', buffer: photo });
    await expect(page.getByRole('img', { name: 'New photo 1' })).toBeVisible();
    await page.getByLabel('Caption of photo 1').fill('Drum 4 label');
  }
}

async function openedEntryPhotoId(page: Page): Promise<string> {
  const img = page.locator('img[data-photo-id]').first();
  await expect(img).toBeVisible();
  return (await img.getAttribute('data-photo-id'))!;
}

test('a note with a photo made offline syncs and appears, photo and all, on another device of the site', async ({ page, context, browser }) => {
  const lot = unique('CR-LC-2611');
  const note = `Drum 4 of ${lot}: label reads anhydrous LiCl, seal intact.`;
  await signInThroughForm(page, DEMO.technician);
  await waitForControllingWorker(page);
  await page.goto('/bench');
  await expect(page.getByRole('heading', { level: 1, name: 'Bench log' })).toBeVisible();
  await waitForStoredPages(page, ['/bench', '/bench/open', '/bench/new']);

  await context.setOffline(true);
  await page.getByRole('link', { name: 'New entry' }).first().click();
  await expect(page.getByRole('heading', { level: 1, name: 'New bench entry' })).toBeVisible();
  await fillEntry(page, { lot, note, tags: 'label, dissolver', photo: await cameraJpeg() });
  await page.getByRole('button', { name: 'Save entry' }).click();

  // Offline, the entry opens under the stored shell, the photo shown from this device.
  await expect(page).toHaveURL(/\/bench\/open\?id=/);
  await expect(page.getByTestId('entry-note')).toHaveText(note);
  await expect(page.getByText('Waiting to sync: this version is kept on this device')).toBeVisible();
  await expect(page.locator('img[data-photo-id]')).toHaveAttribute('data-source', 'device');
  const photoId = await openedEntryPhotoId(page);
  const entryId = new URL(page.url()).searchParams.get('id')!;
  await expect(waiting(page)).toHaveText('2 waiting to sync');
  // "Offline" is said once, by the app-wide indicator; the sync badge says what it means for sync.
  await page.getByRole('button', { name: 'Sync now' }).click();
  await expect(page.getByTestId('sync-status')).toContainText('sends when back online');
  await expect(page.getByText(/\bOffline\b/)).toHaveCount(1);

  await context.setOffline(false);
  await page.getByRole('button', { name: 'Sync now' }).click();
  await expect(waiting(page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  await expect(page.getByTestId('photo-upload-status')).toHaveCount(0, { timeout: 20_000 });

  const [row] = await query<{ note: string; blob_stored_at: Date | null }>(
    "SELECT JSON_UNQUOTE(JSON_EXTRACT(b.content, '$.note')) AS note, p.blob_stored_at FROM bench_entries b JOIN photo_records p ON p.bench_entry_id = b.id WHERE b.id = ?",
    [entryId],
  );
  expect(row?.note).toBe(note);
  expect(row?.blob_stored_at).not.toBeNull();
  const keys = await storedKeys(photoId);
  expect(keys).toHaveLength(2);
  // The stored photo carries no EXIF at all, so no location.
  const stored = await storedObject(keys.find((k) => k.includes('/photo.'))!);
  expect((await sharp(stored).metadata()).exif).toBeUndefined();
  expect(stored.includes(GPS_TAG_LE) && stored.includes(Buffer.from('Exif', 'latin1'))).toBe(false);

  // Another device of the same site: a supervisor's tablet.
  const other = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
  await serveOwnWorker(other);
  const tablet = await other.newPage();
  await signInThroughForm(tablet, DEMO.supervisor);
  await tablet.goto(`/bench?lot=${encodeURIComponent(lot)}`);
  const lotSection = tablet.getByRole('region', { name: `Lot ${lot}` });
  await expect(lotSection).toBeVisible({ timeout: 20_000 });
  await expect(lotSection.getByRole('link', { name: /Drum 4 of/ })).toBeVisible();
  await expect(lotSection.getByRole('link', { name: `Start calorimetry sheet for lot ${lot}` })).toHaveAttribute('href', `/sheets/new?kind=calorimetry&lot=${encodeURIComponent(lot)}`);
  await lotSection.getByRole('link', { name: /Drum 4 of/ }).click();
  await expect(tablet.getByTestId('entry-note')).toHaveText(note);
  const served = tablet.locator(`img[data-photo-id="${photoId}"]`);
  await expect(served).toHaveAttribute('data-source', 'server');
  await expect.poll(() => served.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBeGreaterThan(1000);
  await expect(tablet.getByText('Drum 4 label')).toBeVisible();
  // Once seen online (through the service worker), the photo shows on this tablet offline too.
  await waitForControllingWorker(tablet);
  await tablet.reload();
  await expect.poll(() => served.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBeGreaterThan(1000);
  const seenPhotos = () => tablet.evaluate(async () => ((await caches.has('rungbook-photos')) ? (await (await caches.open('rungbook-photos')).keys()).map((r) => new URL(r.url).pathname) : []));
  await expect.poll(seenPhotos).toContain(`/api/v1/photos/${photoId}/image`);
  const entryUrl = tablet.url();
  await other.setOffline(true);
  await tablet.goto(entryUrl);
  await expect(tablet.getByTestId('entry-note')).toHaveText(note);
  await expect.poll(() => served.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBeGreaterThan(1000);
  await other.setOffline(false);
  // Search finds it by a tag and by words of the note.
  await tablet.goto('/bench');
  await tablet.getByLabel('Search the bench log').fill(`#dissolver ${lot.toLowerCase()} seal`);
  await expect(tablet.getByRole('region', { name: `Lot ${lot}` })).toBeVisible();
  await tablet.getByLabel('Search the bench log').fill(`${lot} nothing-of-the-kind`);
  await expect(tablet.getByRole('region', { name: `Lot ${lot}` })).toHaveCount(0);
  // The lot's "Start calorimetry sheet" opens a new calorimetry sheet with the lot filled in.
  await tablet.goto(`/bench?lot=${encodeURIComponent(lot)}`);
  await tablet.getByRole('link', { name: `Start calorimetry sheet for lot ${lot}` }).click();
  await expect(tablet).toHaveURL(/\/sheets\/new\?kind=calorimetry&lot=/);
  await expect(tablet.getByLabel('Lot or batch reference')).toHaveValue(lot);
  // Signing out forgets the photos this tablet kept, with its stored pages.
  await tablet.getByRole('button', { name: 'Sign out' }).first().click();
  await expect(tablet).toHaveURL(/\/sign-in/);
  expect(await seenPhotos()).toEqual([]);
  await other.close();
});

test('the browser refuses a wrong type, a damaged image and a file too large, and keeps nothing', async ({ page }) => {
  await signInThroughForm(page, DEMO.qcTechnician);
  await page.goto('/bench/new?lot=CR-CB-2611-12');
  await expect(page.getByLabel('Lot', { exact: true })).toHaveValue('CR-CB-2611-12');
  const input = page.getByLabel('Photo files');
  const errors = page.getByTestId('photo-errors');

  await input.setInputFiles({ name: 'reading.pdf', mimeType: 'image/jpeg', buffer: Buffer.from('%PDF-1.7\n%binary') });
  await expect(errors).toContainText('reading.pdf: This is a PDF document, not a photo: choose a JPEG, PNG or WebP image.');
  await input.setInputFiles({ name: 'gauge.jpg', mimeType: 'image/jpeg', buffer: Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(4000, 0x37)]) });
  await expect(errors).toContainText('gauge.jpg: The image is damaged or incomplete');
  await input.setInputFiles({ name: 'huge.jpg', mimeType: 'image/jpeg', buffer: Buffer.concat([await cameraJpeg(64, 64), Buffer.alloc(31 * 1024 * 1024)]) });
  await expect(errors).toContainText(/huge\.jpg: The file is 31\.0 MB; a photo may be at most 30\.0 MB/);
  await expect(page.getByRole('list', { name: 'Photos to add' })).toHaveCount(0);

  // Saving without a note or photo names the field; nothing is queued.
  await page.getByRole('button', { name: 'Save entry' }).click();
  await expect(page.locator('#bench-note-error')).toHaveText('Write a note or add a photo');
  await expect(waiting(page)).toHaveText('0 waiting to sync');

  // The camera input asks the tablet for its rear camera; a large PNG from it is resized to a JPEG.
  const camera = page.getByLabel('Photo from the camera');
  await expect(camera).toHaveAttribute('capture', 'environment');
  await expect(camera).toHaveAttribute('accept', 'image/*');
  const png = await sharp({ create: { width: 3000, height: 1500, channels: 4, background: '#30507080' } }).png().toBuffer();
  await camera.setInputFiles({ name: 'sight-glass.png', mimeType: 'image/png', buffer: png });
  await expect(page.getByRole('list', { name: 'Photos to add' })).toContainText('2048×1024');
  await expect(errors).toHaveCount(0);
  await page.getByRole('button', { name: 'Leave out photo 1' }).click();
  await expect(page.getByRole('list', { name: 'Photos to add' })).toHaveCount(0);
  await expect(waiting(page)).toHaveText('0 waiting to sync');
});

test('a user of another site sees none of these entries and is refused the photo', async ({ page, browser }) => {
  const lot = unique('CR-CB-2611');
  await signInThroughForm(page, DEMO.technician);
  await page.goto(`/bench/new?lot=${lot}`);
  await fillEntry(page, { lot, note: `Brine density check for ${lot}`, tags: 'brine', photo: await cameraJpeg(800, 600) });
  await page.getByRole('button', { name: 'Save entry' }).click();
  await expect(page.getByTestId('entry-note')).toHaveText(`Brine density check for ${lot}`);
  const photoId = await openedEntryPhotoId(page);
  await expect(waiting(page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  await expect(page.getByTestId('photo-upload-status')).toHaveCount(0, { timeout: 20_000 });

  const elsewhere = await makeSite('bench-e2e');
  const ctx = await browser.newContext();
  const stranger = await ctx.newPage();
  await stranger.goto('/sign-in');
  await stranger.getByLabel('E-mail').fill(elsewhere.users.technician.email);
  await stranger.getByLabel('Password').fill(elsewhere.password);
  await stranger.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(stranger).toHaveURL(/\/$/);
  await stranger.goto(`/bench?q=${encodeURIComponent(lot)}`);
  await expect(stranger.getByRole('heading', { level: 1, name: 'Bench log' })).toBeVisible();
  await expect(stranger.getByText(`Nothing in the bench log matches “${lot}”.`)).toBeVisible({ timeout: 15_000 });
  for (const path of [`/api/v1/photos/${photoId}`, `/api/v1/photos/${photoId}/image?variant=full`]) {
    const r = await stranger.request.get(path, { maxRedirects: 0 });
    expect(r.status(), path).toBe(404);
  }
  await ctx.close();
});

test('storage stopped during a sync: the photo waits and retries, then everything arrives once', async ({ page }) => {
  const lot = unique('CR-LC-2611');
  await signInThroughForm(page, DEMO.technician);
  await page.goto(`/bench/new?lot=${lot}`);
  await fillEntry(page, { lot, note: `Sample jar for ${lot} weighed before the run`, tags: 'weighing', photo: await cameraJpeg(1024, 768) });

  await stopFakes();
  let restarted = false;
  try {
    await page.getByRole('button', { name: 'Save entry' }).click();
    const photoId = await openedEntryPhotoId(page);
    const entryId = new URL(page.url()).searchParams.get('id')!;
    // The records sync (the database is up); the photo's bytes wait on the device.
    await expect(waiting(page)).toHaveText('0 waiting to sync', { timeout: 20_000 });
    const status = page.getByTestId('photo-upload-status');
    await expect(status).toHaveText(/1 photo waiting to upload from this device/);
    await expect(page.getByRole('region', { name: 'Photo uploads' })).toContainText('Photo storage is unavailable right now');
    await expect(page.getByText('Waiting to upload from this device.', { exact: true })).toBeVisible();
    expect(await storedKeys(photoId).catch(() => 'storage down')).toBe('storage down');

    await startFakes();
    restarted = true;
    // No click: the retry with backoff sends it on its own.
    await expect(status).toHaveCount(0, { timeout: 45_000 });
    expect(await storedKeys(photoId)).toHaveLength(2);
    expect(await query('SELECT id FROM photo_records WHERE id = ? AND blob_stored_at IS NOT NULL', [photoId])).toHaveLength(1);
    expect(await query('SELECT id FROM bench_entries WHERE id = ?', [entryId])).toHaveLength(1);
    expect((await outcomesOf([entryId, photoId])).filter((o) => o.status === 'applied')).toHaveLength(2);
    expect(await query("SELECT id FROM audit_log WHERE action = 'photo.stored' AND entity_id = ?", [photoId])).toHaveLength(1);
    // A sync after that sends nothing again.
    await page.getByRole('button', { name: 'Sync now' }).click();
    await expect(waiting(page)).toHaveText('0 waiting to sync');
    expect(await storedKeys(photoId)).toHaveLength(2);
  } finally {
    if (!restarted) await startFakes();
  }
});

test('another technician reads an entry but may not change it; a supervisor corrects it', async ({ page, browser }) => {
  // A demo entry by the dissolver-hall technician (db/seed/bench.ts).
  await signInThroughForm(page, DEMO.qcTechnician);
  await page.goto('/bench?lot=CR-LC-2611-04');
  await page.getByRole('link', { name: /Drum 4 received/ }).click();
  await expect(page.getByTestId('entry-note')).toContainText('Label reads lithium chloride');
  await expect(page.getByText('Only its author or a supervisor may change this entry.')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Edit' })).toHaveCount(0);

  const ctx = await browser.newContext({ viewport: { width: 768, height: 1024 }, hasTouch: true });
  const sup = await ctx.newPage();
  await signInThroughForm(sup, DEMO.supervisor);
  await sup.goto('/bench?lot=CR-LC-2611-04');
  await sup.getByRole('link', { name: /Drum 4 received/ }).click();
  await expect(sup).toHaveURL(/\/bench\/open\?id=/);
  const entryId = new URL(sup.url()).searchParams.get('id')!;
  await sup.getByRole('button', { name: 'Edit' }).click();
  await expect(sup.getByText(/You are correcting an entry by Dissolver hall technician/)).toBeVisible();
  await sup.getByLabel('Note').fill('');
  await sup.getByLabel('Lot', { exact: true }).fill('');
  await sup.getByRole('button', { name: 'Save changes' }).click();
  await expect(sup.locator('#bench-lotRef-error')).toHaveText('Give the lot this entry belongs to');
  await sup.getByLabel('Lot', { exact: true }).fill('CR-LC-2611-04');
  await sup.getByLabel('Note').fill('Drum 4 received. Label reads lithium chloride, anhydrous, 25 kg net. Seal intact. (Corrected: drum 4, not drum 3.)');
  await sup.getByRole('button', { name: 'Save changes' }).click();
  await expect(sup.getByText('Saved on this device.')).toBeVisible();
  const stored = () => query<{ note: string; author_id: string; revision: number }>("SELECT JSON_UNQUOTE(JSON_EXTRACT(content, '$.note')) AS note, author_id, revision FROM bench_entries WHERE id = ?", [entryId]);
  await expect.poll(async () => (await stored())[0]?.note, { timeout: 20_000 }).toContain('(Corrected: drum 4, not drum 3.)');
  await expect(waiting(sup)).toHaveText('0 waiting to sync', { timeout: 20_000 });
  const [row] = await stored();
  expect(row?.revision).toBeGreaterThanOrEqual(2);
  const [author] = await query<{ email: string }>('SELECT email FROM users WHERE id = ?', [row!.author_id]);
  expect(author?.email).toBe(DEMO.technician);
  await ctx.close();

  // The QC technician's device gets the correction with its next sync.
  await page.getByRole('button', { name: 'Sync now' }).click();
  await expect(page.getByTestId('entry-note')).toContainText('(Corrected: drum 4, not drum 3.)', { timeout: 20_000 });
});

test('a lot lists its calorimetry run with the server’s verdict, and an entry added for the run sits under it', async ({ page }) => {
  const lot = unique('CR-LC-2611');
  await signInThroughForm(page, DEMO.qcTechnician);
  await page.goto('/bench');
  await page.waitForFunction(() => !!(window as unknown as { rungbook?: { local?: unknown } }).rungbook?.local, null, { timeout: 15_000 });
  // A calorimetry sheet saved through the same write path the workbench uses. The numbers are
  // test inputs for the engine (a 2 g sample warming 100 g of water by about 4 K), not check values.
  const sheetId = await page.evaluate(async (lotRef) => {
    const local = (window as unknown as { rungbook: { local: { newSheet(f: object): { id: string }; saveSheet(s: object): Promise<unknown>; syncNow(): Promise<void> } } }).rungbook.local;
    const sheet = local.newSheet({
      kind: 'calorimetry',
      title: `Form check ${lotRef}`,
      lotRef,
      problem: {
        kind: 'calorimetry',
        problem: { sampleMassG: '2.000', waterMassG: '100.0', temperatures: { beforeC: '20.00', afterC: '24.09' }, candidates: [{ formula: 'LiCl', predictedEnthalpyOfSolution: '-37.0' }, { formula: 'LiCl·H2O', predictedEnthalpyOfSolution: '-19.0' }] },
      },
    });
    await local.saveSheet(sheet);
    await local.syncNow();
    return sheet.id;
  }, lot);
  await expect.poll(async () => (await query('SELECT id FROM sheets WHERE id = ? AND server_result IS NOT NULL', [sheetId])).length, { timeout: 20_000 }).toBe(1);
  const [row] = await query<{ text: string }>("SELECT JSON_UNQUOTE(JSON_EXTRACT(server_result, '$.result.bestMatch.text')) AS text FROM sheets WHERE id = ?", [sheetId]);
  expect(row?.text).toBeTruthy();

  await page.goto(`/bench?lot=${encodeURIComponent(lot)}`);
  const run = page.locator(`[data-sheet-id="${sheetId}"]`);
  await expect(run.getByRole('link', { name: `Form check ${lot}`, exact: true })).toHaveAttribute('href', `/sheets/open?id=${sheetId}`);
  await expect(run).toContainText(`Verdict: ${row!.text}`, { timeout: 20_000 });
  await expect(run).not.toContainText('this device’s result');

  await run.getByRole('link', { name: `Add entry for sheet Form check ${lot}` }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'New bench entry' })).toBeVisible();
  await expect(page.getByLabel('Lot', { exact: true })).toHaveValue(lot);
  await expect(page.getByLabel(/^Sheet/)).toHaveValue(sheetId);
  await page.getByLabel('Note').fill('Bath drifted 0.02 K/min before mixing; readings kept.');
  await page.getByRole('button', { name: 'Save entry' }).click();
  await expect(page).toHaveURL(/\/bench\/open\?id=/);
  await expect(page.getByRole('link', { name: `Form check ${lot}`, exact: true })).toBeVisible();
  await page.goto(`/bench?lot=${encodeURIComponent(lot)}`);
  await expect(page.getByRole('list', { name: `Entries of sheet Form check ${lot}` }).getByRole('link', { name: /Bath drifted/ })).toBeVisible();
});

test('the bench log has no serious accessibility problems and works by keyboard', async ({ page }) => {
  await signInThroughForm(page, DEMO.supervisor);
  await page.goto('/bench');
  await expect(page.getByRole('heading', { level: 1, name: 'Bench log' })).toBeVisible();
  await expect(page.getByRole('region', { name: /^Lot / }).first()).toBeVisible({ timeout: 20_000 });
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(serious.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`)).toEqual([]);

  await page.getByLabel('Search the bench log').focus();
  await page.keyboard.type('#label');
  await expect(page.getByRole('region', { name: /^Lot / }).first()).toBeVisible();
  // Touch targets: every button and link in the log is at least 44 px tall.
  const small = await page.locator('main a.btn-quiet, main a.btn-primary, main button').evaluateAll((els) => els.map((e) => e.getBoundingClientRect()).filter((r) => r.height > 0 && r.height < 44).length);
  expect(small).toBe(0);
});
