import 'server-only';
import { createHash } from 'node:crypto';
import { pool } from '@/db/client';
import { benchEntrySchema, type BenchEntry } from '@/lib/bench/bench-entry-schema';
import { insertChanges, upsertRecords } from './sync-records';
import { SiteSequence, withSyncTransaction } from './sync-sequence';

// The demo scenario's open conflict (design.md §7): the dissolver hall technician edited one bench
// note on two tablets while both were offline; the first edit to arrive was accepted, the second is
// kept whole for the supervisor to settle on the reconcile screen. Written as the push handler would
// write it (record, change-log rows, outcomes, conflict), with ids derived from the site, so a second
// seed run adds nothing. Call from the seed: `await seedDemoConflict(site.id)`.

const id = (siteId: string, key: string) => {
  const h = createHash('sha256').update(`rungbook-demo-sync:${siteId}:${key}`).digest('hex');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-a${h.slice(17, 20)}-${h.slice(20, 32)}`;
};

/** Seeds the open demo conflict if missing; returns whether it was added. */
export async function seedDemoConflict(siteId: string): Promise<boolean> {
  const [users] = await pool().query("SELECT id FROM users WHERE site_id = ? AND email = 'technician@calder-reach.test'", [siteId]);
  const [areas] = await pool().query("SELECT id FROM areas WHERE site_id = ? AND name = 'Dissolver hall'", [siteId]);
  const author = (users as { id: string }[])[0]?.id;
  if (!author) throw new Error('seed the demo accounts before the demo conflict');
  const areaId = (areas as { id: string }[])[0]?.id ?? null;
  const recordId = id(siteId, 'entry');
  const conflictId = id(siteId, 'conflict');

  return withSyncTransaction(
    () => pool().getConnection(),
    async (conn) => {
      const seq = await SiteSequence.lock(conn, siteId);
      const [present] = await conn.query('SELECT id FROM sync_conflicts WHERE id = ?', [conflictId]);
      if ((present as unknown[]).length) return false;
      const base: BenchEntry = benchEntrySchema.parse({
        id: recordId,
        note: 'Filter press 1: cake washed twice; filtrate slightly cloudy at the start of the second wash.',
        lotRef: 'CR-CB-2611-12',
        areaId,
        tags: ['filter'],
        sheetId: null,
        photoIds: [],
        authorId: author,
        deleted: false,
        createdAt: '2026-11-25T07:10:00.000Z',
        updatedAt: '2026-11-25T07:10:00.000Z',
      });
      const tabletA = { ...base, note: `${base.note} Cleared after 3 min; third wash not needed.`, updatedAt: '2026-11-25T08:02:00.000Z' };
      const tabletB = { ...base, note: `${base.note} Still cloudy after 5 min: third wash run, filtrate clear.`, tags: ['filter', 'rework'], updatedAt: '2026-11-25T08:05:00.000Z' };
      const now = new Date();
      const s1 = seq.next();
      const s2 = seq.next();
      const s3 = seq.next();
      await upsertRecords(conn, [{ entity: 'bench_entry', id: recordId, siteId, authorId: author, content: tabletA, revision: 2, lastSeq: s3, awaitingReview: true }], now);
      await insertChanges(
        conn,
        siteId,
        [
          { seq: s1, entity: 'bench_entry', recordId, revision: 1, cause: 'mutation', mutationId: id(siteId, 'm1'), actorUserId: author },
          { seq: s2, entity: 'bench_entry', recordId, revision: 2, cause: 'mutation', mutationId: id(siteId, 'm2'), actorUserId: author },
          { seq: s3, entity: 'bench_entry', recordId, revision: 2, cause: 'conflict', mutationId: id(siteId, 'm3'), actorUserId: author },
        ],
        now,
      );
      const deviceA = id(siteId, 'tablet-a');
      const deviceB = id(siteId, 'tablet-b');
      await conn.query('INSERT IGNORE INTO sync_devices (id, user_id, site_id, created_at, last_seen_at) VALUES ?', [[[deviceA, author, siteId, now, now], [deviceB, author, siteId, now, now]]]);
      await conn.query('INSERT INTO sync_mutations (mutation_id, site_id, device_id, user_id, entity, record_id, status, revision, conflict_id, reason, created_at) VALUES ?', [
        [
          [id(siteId, 'm1'), siteId, deviceA, author, 'bench_entry', recordId, 'applied', 1, null, null, now],
          [id(siteId, 'm2'), siteId, deviceA, author, 'bench_entry', recordId, 'applied', 2, null, null, now],
          [id(siteId, 'm3'), siteId, deviceB, author, 'bench_entry', recordId, 'conflict', null, conflictId, null, now],
        ],
      ]);
      await conn.query('INSERT INTO sync_conflicts (id, site_id, entity, record_id, kind, status, server_revision, server_content, drift, created_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)', [
        conflictId,
        siteId,
        'bench_entry',
        recordId,
        'edit',
        'open',
        2,
        JSON.stringify(tabletA),
        null,
        now,
      ]);
      await conn.query('INSERT INTO sync_conflict_versions (id, conflict_id, mutation_id, device_id, user_id, base_revision, content, created_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)', [
        id(siteId, 'v1'),
        conflictId,
        id(siteId, 'm3'),
        deviceB,
        author,
        1,
        JSON.stringify(tabletB),
        now,
      ]);
      await seq.save(conn);
      return true;
    },
  );
}
