// Bench entries and photos through sync, over real HTTP against the production build and a real
// MariaDB (issue 7, part 3): notes conflict, photos are append-only, another's entry needs a
// supervisor, and the backup command carries the stored photos.
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import sharp from 'sharp';
import { v7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, signedIn } from '../support/http';
import { closeDb, makeSite, query } from '../support/db';
import { storedKeys, storedObject } from '../e2e/bench-support';
import type { MutationOutcome, PullResponse, PushResponse } from '@/lib/sync/protocol';

const run = promisify(execFile);
const PROTO = { 'x-rungbook-sync-protocol': '1' };
type Site = Awaited<ReturnType<typeof makeSite>>;
type Who = { client: Client; userId: string; siteId: string; deviceId: string };

let site: Site;
let tech: Who;
let tech2: Who;
let sup: Who;

async function as(s: Site, role: 'technician' | 'supervisor' | 'admin', email = s.users[role].email): Promise<Who> {
  return { client: await signedIn(email, s.password), userId: s.users[role].id, siteId: s.siteId, deviceId: v7() };
}

const now = () => new Date().toISOString();
function entry(who: Who, fields: Record<string, unknown> = {}) {
  const t = now();
  return { id: v7(), note: 'Calcium chloride brine sample drawn from tank 2', lotRef: 'CR-CB-2611-12', areaId: null, tags: ['brine'], sheetId: null, photoIds: [] as string[], authorId: who.userId, deleted: false, createdAt: t, updatedAt: t, ...fields };
}
const m = (entity: 'bench_entry' | 'photo', content: { id: string } & Record<string, unknown>, baseRevision = 0) => ({ mutationId: v7(), entity, recordId: content.id, baseRevision, content });

async function push(who: Who, mutations: unknown[]): Promise<MutationOutcome[]> {
  const r = await who.client.post<PushResponse>('/api/v1/sync/push', { deviceId: who.deviceId, userId: who.userId, siteId: who.siteId, mutations }, PROTO);
  expect(r.status, JSON.stringify(r.body)).toBe(200);
  return r.body.outcomes;
}

beforeAll(async () => {
  site = await makeSite('bench');
  tech = await as(site, 'technician');
  sup = await as(site, 'supervisor');
  // A second technician of the same site.
  const id = v7();
  const email = `technician2.${site.siteId.slice(-8)}@example.test`;
  const [hashRow] = await query<{ password_hash: string }>('SELECT password_hash FROM users WHERE id = ?', [site.users.technician.id]);
  await query("INSERT INTO users (id, site_id, email, display_name, role, status, password_hash, created_at) VALUES (?, ?, ?, 'second technician', 'technician', 'active', ?, UTC_TIMESTAMP(3))", [id, site.siteId, email, hashRow!.password_hash]);
  tech2 = { client: await signedIn(email, site.password), userId: id, siteId: site.siteId, deviceId: v7() };
});
afterAll(closeDb);

describe('bench entries sync', () => {
  it('two devices editing one note on the same revision: the second is a conflict, kept whole, nothing overwritten', async () => {
    const e = entry(tech);
    expect((await push(tech, [m('bench_entry', e)]))[0]).toMatchObject({ status: 'applied', revision: 1 });
    // The supervisor's tablet and the technician's tablet both edit revision 1.
    const bySup = { ...e, note: `${e.note}; density 1.39 g/mL at 20 °C`, updatedAt: now() };
    const byTech = { ...e, note: `${e.note}; pH 8.9`, tags: ['brine', 'ph'], updatedAt: now() };
    expect((await push(sup, [m('bench_entry', bySup, 1)]))[0]).toMatchObject({ status: 'applied', revision: 2 });
    const [clash] = await push(tech, [m('bench_entry', byTech, 1)]);
    expect(clash).toMatchObject({ status: 'conflict' });
    const [row] = await query<{ content: string | object; awaiting_review: number }>('SELECT content, awaiting_review FROM bench_entries WHERE id = ?', [e.id]);
    const content = (typeof row!.content === 'string' ? JSON.parse(row!.content) : row!.content) as { note: string };
    expect(content.note).toBe(bySup.note);
    expect(Boolean(row!.awaiting_review)).toBe(true);
    const versions = await query<{ content: string | object }>('SELECT v.content FROM sync_conflict_versions v JOIN sync_conflicts c ON c.id = v.conflict_id WHERE c.record_id = ?', [e.id]);
    expect(versions.map((v) => (typeof v.content === 'string' ? JSON.parse(v.content) : v.content) as { note: string }).map((v) => v.note)).toEqual([byTech.note]);
    // Every device of the site pulls the entry marked as awaiting review.
    const pulled = await tech2.client.get<PullResponse>('/api/v1/sync/pull?cursor=0&limit=2000', PROTO);
    expect(pulled.body.records.find((r) => r.id === e.id)).toMatchObject({ awaitingReview: true, revision: 2 });
  });

  it('another technician may not edit an entry; a supervisor may correct it', async () => {
    const e = entry(tech);
    await push(tech, [m('bench_entry', e)]);
    const [denied] = await push(tech2, [m('bench_entry', { ...e, note: 'changed by someone else', updatedAt: now() }, 1)]);
    expect(denied).toMatchObject({ status: 'rejected' });
    expect((denied as { reason: string }).reason).toMatch(/sheet\.correct/);
    const [corrected] = await push(sup, [m('bench_entry', { ...e, note: `${e.note} (tank 2, not tank 3)`, updatedAt: now() }, 1)]);
    expect(corrected).toMatchObject({ status: 'applied', revision: 2 });
  });

  it('photo records are append-only: the same record again changes nothing, a changed one is refused', async () => {
    const e = entry(tech);
    const t = now();
    const photo = { id: v7(), benchEntryId: e.id, contentType: 'image/jpeg', byteSize: 1234, sha256: 'a'.repeat(64), caption: 'tank 2 sight glass', takenAt: t, authorId: tech.userId, createdAt: t };
    e.photoIds = [photo.id];
    expect((await push(tech, [m('bench_entry', e), m('photo', photo)])).map((o) => o.status)).toEqual(['applied', 'applied']);
    const [same] = await push(tech, [m('photo', photo, 1)]);
    expect(same).toMatchObject({ status: 'applied', revision: 1 });
    const [changed] = await push(tech, [m('photo', { ...photo, caption: 'a different caption' }, 1)]);
    expect(changed).toMatchObject({ status: 'rejected' });
    expect((changed as { reason: string }).reason).toMatch(/append-only/);
    const [row] = await query<{ revision: number }>('SELECT revision FROM photo_records WHERE id = ?', [photo.id]);
    expect(row!.revision).toBe(1);
  });
});

describe('backup', () => {
  it('the backup command includes the stored photos, byte for byte', async () => {
    const bytes = await sharp({ create: { width: 200, height: 150, channels: 3, background: '#406080' } }).jpeg().toBuffer();
    const e = entry(tech);
    const t = now();
    const photo = { id: v7(), benchEntryId: e.id, contentType: 'image/jpeg', byteSize: bytes.length, sha256: createHash('sha256').update(bytes).digest('hex'), caption: '', takenAt: t, authorId: tech.userId, createdAt: t };
    e.photoIds = [photo.id];
    await push(tech, [m('bench_entry', e), m('photo', photo)]);
    const res = await tech.client.raw(`/api/v1/photos/${photo.id}`, { method: 'PUT', headers: { origin: tech.client.origin, 'content-type': 'image/jpeg' }, body: new Uint8Array(bytes) });
    expect(res.status).toBe(201);
    const keys = await storedKeys(photo.id);
    expect(keys).toHaveLength(2);

    const dir = mkdtempSync(join(tmpdir(), 'rungbook-bench-backup-'));
    try {
      await query('DELETE FROM rate_limits');
      const out = await run('node_modules/.bin/tsx', ['--conditions=react-server', 'lib/ops/backup.ts', '--out', dir]);
      expect(out.stdout).toMatch(/stored objects/);
      for (const key of keys) expect(readFileSync(join(dir, 'objects', key)).equals(await storedObject(key)), key).toBe(true);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
