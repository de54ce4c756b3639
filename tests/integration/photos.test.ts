// Bench photos over real HTTP against the production build, a real MariaDB and the local
// S3-compatible store (issue 7, part 2 and its bad-input cases).
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { v7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, signedIn } from '../support/http';
import { closeDb, makeSite, query } from '../support/db';
import { startFakes, stopFakes, storedKeys, storedObject } from '../e2e/bench-support';
import type { PushResponse } from '@/lib/sync/protocol';

const PROTO = { 'x-rungbook-sync-protocol': '1' };
type Site = Awaited<ReturnType<typeof makeSite>>;
type Who = { client: Client; userId: string; siteId: string; deviceId: string };

let site: Site;
let other: Site;
let tech: Who;
let sup: Who;
let stranger: Who;

async function as(s: Site, role: 'technician' | 'supervisor'): Promise<Who> {
  return { client: await signedIn(s.users[role].email, s.password), userId: s.users[role].id, siteId: s.siteId, deviceId: v7() };
}

// A camera-like JPEG carrying EXIF with a GPS position (invented coordinates).
function jpegWithLocation(width = 1200, height = 900) {
  return sharp({ create: { width, height, channels: 3, background: '#6a8f7c' } })
    .jpeg({ quality: 90 })
    .withExif({ IFD0: { Make: 'BenchCam', Model: 'T1', Software: 'test' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '53/1 28/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '2/1 14/1 9/1' } })
    .toBuffer();
}
const GPS_TAG_LE = Buffer.from([0x25, 0x88]); // EXIF tag 0x8825 (GPSInfo), little-endian
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** Push a bench entry and a photo record describing `bytes` (as a device would before uploading). */
async function photoRecord(who: Who, bytes: Buffer, contentType: 'image/jpeg' | 'image/png' | 'image/webp' = 'image/jpeg') {
  const t = new Date().toISOString();
  const entryId = v7();
  const photoId = v7();
  const entry = { id: entryId, note: 'Label on drum 4', lotRef: 'CR-LC-2611-04', areaId: null, tags: ['label'], sheetId: null, photoIds: [photoId], authorId: who.userId, deleted: false, createdAt: t, updatedAt: t };
  const photo = { id: photoId, benchEntryId: entryId, contentType, byteSize: Math.max(1, bytes.length), sha256: sha(bytes), caption: 'drum label', takenAt: t, authorId: who.userId, createdAt: t };
  const r = await who.client.post<PushResponse>(
    '/api/v1/sync/push',
    { deviceId: who.deviceId, userId: who.userId, siteId: who.siteId, mutations: [{ mutationId: v7(), entity: 'bench_entry', recordId: entryId, baseRevision: 0, content: entry }, { mutationId: v7(), entity: 'photo', recordId: photoId, baseRevision: 0, content: photo }] },
    PROTO,
  );
  expect(r.status, JSON.stringify(r.body)).toBe(200);
  expect(r.body.outcomes.map((o) => o.status)).toEqual(['applied', 'applied']);
  return photoId;
}

async function upload(who: Who, photoId: string, bytes: Buffer, type = 'image/jpeg') {
  const res = await who.client.raw(`/api/v1/photos/${photoId}`, { method: 'PUT', headers: { origin: who.client.origin, 'content-type': type }, body: new Uint8Array(bytes) });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as { error?: { code: string; message: string; fields?: { field: string }[] }; stored?: boolean; alreadyStored?: boolean } };
}

async function storedAt(photoId: string) {
  const [row] = await query<{ blob_stored_at: Date | null }>('SELECT blob_stored_at FROM photo_records WHERE id = ?', [photoId]);
  return row?.blob_stored_at ?? null;
}

beforeAll(async () => {
  site = await makeSite('photos');
  other = await makeSite('photos-other');
  tech = await as(site, 'technician');
  sup = await as(site, 'supervisor');
  stranger = await as(other, 'technician');
});
afterAll(closeDb);

describe('storing a photo', () => {
  it('strips the location and other EXIF, makes a thumbnail, and a repeat upload stores nothing twice', async () => {
    const bytes = await jpegWithLocation();
    expect((await sharp(bytes).metadata()).exif?.includes(GPS_TAG_LE)).toBe(true);
    const id = await photoRecord(tech, bytes);

    const first = await upload(tech, id, bytes);
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(await storedAt(id)).not.toBeNull();
    const keys = await storedKeys(id);
    expect(keys).toEqual([`sites/${site.siteId}/photos/${id}/photo.jpg`, `sites/${site.siteId}/photos/${id}/thumb.jpg`]);

    const stored = await storedObject(keys[0]!);
    const meta = await sharp(stored).metadata();
    expect(meta.format).toBe('jpeg');
    expect(meta.exif).toBeUndefined();
    expect(stored.includes(GPS_TAG_LE) && stored.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
    expect([meta.width, meta.height]).toEqual([1200, 900]);
    const thumb = await sharp(await storedObject(keys[1]!)).metadata();
    expect(Math.max(thumb.width!, thumb.height!)).toBe(320);

    const again = await upload(tech, id, bytes);
    expect(again.status).toBe(200);
    expect(again.body.alreadyStored).toBe(true);
    expect(await storedKeys(id)).toHaveLength(2);
    const audits = await query('SELECT id FROM audit_log WHERE action = ? AND entity_id = ?', ['photo.stored', id]);
    expect(audits).toHaveLength(1);
  });

  it('serves a photo to users of its site only: its bytes from our origin, or a short-lived signed URL for integrations', async () => {
    const bytes = await jpegWithLocation(640, 480);
    const id = await photoRecord(tech, bytes);
    expect((await upload(tech, id, bytes)).status).toBe(201);

    const mine = await sup.client.get<{ stored: boolean; url: string; thumbnailUrl: string; expiresAt: string }>(`/api/v1/photos/${id}`);
    expect(mine.status).toBe(200);
    expect(mine.body.stored).toBe(true);
    const signed = new URL(mine.body.url);
    expect(signed.origin).toBe(new URL(process.env.S3_ENDPOINT!).origin);
    expect(Number(signed.searchParams.get('X-Amz-Expires'))).toBeLessThanOrEqual(300);
    expect(signed.searchParams.get('X-Amz-Signature')).toMatch(/^[0-9a-f]{64}$/);
    expect(Date.parse(mine.body.expiresAt) - Date.now()).toBeLessThanOrEqual(300_000);
    const fetched = Buffer.from(await (await fetch(mine.body.url)).arrayBuffer());
    expect((await sharp(fetched).metadata()).exif).toBeUndefined();
    expect((await sharp(fetched).metadata()).width).toBe(640);

    // The image route answers with the bytes from our own origin (tablets never need to reach the
    // storage endpoint), the same bytes as stored, kept by the browser since they never change.
    const full = await sup.client.raw(`/api/v1/photos/${id}/image?variant=full`);
    expect(full.status).toBe(200);
    expect(full.headers.get('content-type')).toBe('image/jpeg');
    expect(full.headers.get('cache-control')).toBe('private, max-age=31536000, immutable');
    expect(Buffer.from(await full.arrayBuffer()).equals(fetched)).toBe(true);
    const thumb = await sup.client.raw(`/api/v1/photos/${id}/image?variant=thumb`);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('content-type')).toBe('image/jpeg');
    const thumbMeta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(Math.max(thumbMeta.width!, thumbMeta.height!)).toBeLessThan(640);
    expect(thumbMeta.exif).toBeUndefined();

    // A user of another site learns nothing: the same answer as for an id that does not exist.
    for (const path of [`/api/v1/photos/${id}`, `/api/v1/photos/${id}/image?variant=full`]) {
      const r = await stranger.client.get<{ error: { code: string } }>(path);
      expect(r.status, path).toBe(404);
      expect(r.body.error.code).toBe('not_found');
    }
    expect((await upload(stranger, id, bytes)).status).toBe(404);
    expect((await new Client().get(`/api/v1/photos/${id}`)).status).toBe(401);
  });

  it('takes bytes only from the photo’s author, and only bytes that match its record', async () => {
    const bytes = await jpegWithLocation(300, 200);
    const id = await photoRecord(tech, bytes);
    const bySupervisor = await upload(sup, id, bytes);
    expect(bySupervisor.status).toBe(403);
    const different = await jpegWithLocation(301, 200);
    const mismatch = await upload(tech, id, different);
    expect(mismatch.status).toBe(422);
    expect(mismatch.body.error?.fields?.[0]?.field).toBe('photo');
    expect(await storedAt(id)).toBeNull();
    expect(await storedKeys(id)).toEqual([]);
  });
});

describe('bad input: a clear error and nothing stored', () => {
  it('a file that is not a JPEG, PNG or WebP is refused by its content (415)', async () => {
    const gif = Buffer.concat([Buffer.from('GIF89a', 'latin1'), Buffer.alloc(64, 1)]);
    const id = await photoRecord(tech, gif);
    const r = await upload(tech, id, gif, 'image/jpeg');
    expect(r.status).toBe(415);
    expect(r.body.error?.message).toMatch(/GIF image.*JPEG, PNG or WebP/);
    expect(r.body.error?.fields?.[0]?.field).toBe('photo');
    expect(await storedAt(id)).toBeNull();
    expect(await storedKeys(id)).toEqual([]);
  });

  it('a file over the size limit is refused (413)', async () => {
    const big = Buffer.concat([await jpegWithLocation(64, 64), Buffer.alloc(10 * 1024 * 1024 + 10, 0)]);
    const id = await photoRecord(tech, big);
    const r = await upload(tech, id, big);
    expect(r.status).toBe(413);
    expect(r.body.error?.message).toMatch(/at most 10\.0 MB/);
    expect(await storedAt(id)).toBeNull();
    expect(await storedKeys(id)).toEqual([]);
  });

  it('a damaged image is refused (422) and a PNG that claims to be something else too', async () => {
    const good = await jpegWithLocation(400, 300);
    const damaged = Buffer.concat([good.subarray(0, 400), Buffer.alloc(800, 0x5a)]);
    const id = await photoRecord(tech, damaged);
    const r = await upload(tech, id, damaged);
    expect(r.status).toBe(422);
    expect(r.body.error?.message).toMatch(/damaged or incomplete/);
    expect(await storedAt(id)).toBeNull();
    expect(await storedKeys(id)).toEqual([]);

    const png = await sharp({ create: { width: 20, height: 20, channels: 3, background: '#123456' } }).png().toBuffer();
    const pid = await photoRecord(tech, png, 'image/webp');
    const p = await upload(tech, pid, png, 'image/webp');
    expect(p.status).toBe(422);
    expect(p.body.error?.message).toMatch(/image\/png.*image\/webp/);
  });
});

describe('object storage unavailable', () => {
  it('answers 503 and stores nothing; after storage returns the same upload arrives once', async () => {
    const bytes = await jpegWithLocation(500, 400);
    const id = await photoRecord(tech, bytes);
    await stopFakes();
    try {
      const down = await upload(tech, id, bytes);
      expect(down.status).toBe(503);
      expect(down.body.error?.message).toMatch(/stays on the device/);
      expect(await storedAt(id)).toBeNull();
    } finally {
      await startFakes();
    }
    const up = await upload(tech, id, bytes);
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect(await storedKeys(id)).toHaveLength(2);
    expect(await storedAt(id)).not.toBeNull();
  });
});
