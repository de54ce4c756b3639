import 'server-only';
import { pool } from '@/db/client';
import { ENTITIES, SYNC_PROTOCOL, type Entity, type PullResponse, type ServerRecord } from '@/lib/sync/protocol';
import { loadRecords, toServerRecord } from './sync-records';

/**
 * One page of the site's change log after `cursor`, as the records' newest states. The log is in
 * commit order (see SiteSequence), so a row with a smaller seq can never commit after this read:
 * the cursor returned is safe to resume from and never skips a change.
 */
export async function pullChanges(siteId: string, cursor: number, limit: number): Promise<PullResponse> {
  const conn = await pool().getConnection();
  try {
    const [rows] = await conn.query('SELECT seq, entity, record_id FROM sync_changes WHERE site_id = ? AND seq > ? ORDER BY seq LIMIT ?', [siteId, cursor, limit]);
    const changes = rows as { seq: number | string; entity: Entity; record_id: string }[];
    const order: string[] = [];
    const wanted = new Map<Entity, Set<string>>(ENTITIES.map((e) => [e, new Set<string>()]));
    for (const c of changes) {
      const key = `${c.entity}:${c.record_id}`;
      if (!wanted.get(c.entity)!.has(c.record_id)) order.push(key);
      wanted.get(c.entity)!.add(c.record_id);
    }
    const byKey = new Map<string, ServerRecord>();
    for (const entity of ENTITIES) {
      const found = await loadRecords(conn, entity, [...wanted.get(entity)!], false);
      for (const row of found.values()) if (row.siteId === siteId) byKey.set(`${entity}:${row.id}`, toServerRecord(row));
    }
    const last = changes.at(-1);
    return {
      protocol: SYNC_PROTOCOL,
      records: order.map((k) => byKey.get(k)).filter((r): r is ServerRecord => !!r),
      cursor: last ? Number(last.seq) : cursor,
      more: changes.length === limit,
    };
  } finally {
    conn.release();
  }
}
