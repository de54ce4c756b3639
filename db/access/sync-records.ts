import 'server-only';
import type { ExecuteValues, PoolConnection } from 'mysql2/promise';
import type { BenchEntry, PhotoMeta } from '@/lib/bench/bench-entry-schema';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { Entity, ServerRecord } from '@/lib/sync/protocol';
import type { SiteSequence } from './sync-sequence';

/** A synced record row, whatever its entity (raw SQL: the push handler needs FOR UPDATE and multi-row writes). */
export interface RecordRow {
  entity: Entity;
  id: string;
  siteId: string;
  authorId: string;
  content: unknown;
  revision: number;
  lastSeq: number;
  awaitingReview: boolean;
  serverResult?: unknown;
  resultDiffers?: boolean;
}

export const TABLE: Record<Entity, string> = { sheet: 'sheets', bench_entry: 'bench_entries', photo: 'photo_records' };

const parse = (v: unknown) => (typeof v === 'string' ? (JSON.parse(v) as unknown) : v);

function fromDb(entity: Entity, r: Record<string, unknown>): RecordRow {
  return {
    entity,
    id: String(r.id),
    siteId: String(r.site_id),
    authorId: String(r.author_id),
    content: parse(r.content),
    revision: Number(r.revision),
    lastSeq: Number(r.last_seq),
    awaitingReview: Boolean(r.awaiting_review),
    ...(entity === 'sheet' ? { serverResult: parse(r.server_result) ?? null, resultDiffers: Boolean(r.result_differs) } : {}),
  };
}

/**
 * `?` placeholders for a prepared multi-row statement: `(?, ?), (?, ?)` for rows × cols, or
 * `?, ?, ?` for an IN list (cols 0). The sync writes and lookups run as prepared statements
 * (`execute`, the binary protocol): the values travel as they are, with no SQL text to escape on
 * our side and none to parse on the server's, which is most of a big batch's cost. mysql2 keeps each
 * statement per connection, LRU-bounded by the pool's `maxPreparedStatements` (db/client.ts).
 */
export function placeholders(rows: number, cols = 0): string {
  const key = `${rows}x${cols}`;
  let text = PLACEHOLDERS.get(key);
  if (!text) {
    text = cols === 0 ? Array<string>(rows).fill('?').join(', ') : Array<string>(rows).fill(`(${Array<string>(cols).fill('?').join(', ')})`).join(', ');
    if (PLACEHOLDERS.size > 2000) PLACEHOLDERS.clear();
    PLACEHOLDERS.set(key, text);
  }
  return text;
}
const PLACEHOLDERS = new Map<string, string>();

/** A prepared statement's values, row after row; undefined → NULL, as the text protocol treats it. */
function bind(rows: unknown[][]): ExecuteValues[] {
  const out: ExecuteValues[] = [];
  for (const row of rows) for (const v of row) out.push(v === undefined ? null : (v as ExecuteValues));
  return out;
}

/** Load records by id (any site: the caller refuses another site's), optionally locking them. */
export async function loadRecords(conn: PoolConnection, entity: Entity, ids: string[], forUpdate: boolean): Promise<Map<string, RecordRow>> {
  const out = new Map<string, RecordRow>();
  if (ids.length === 0) return out;
  const cols = entity === 'sheet' ? ', server_result, result_differs' : '';
  for (let i = 0; i < ids.length; i += 1000) {
    const chunk = ids.slice(i, i + 1000);
    const [rows] = await conn.execute(
      `SELECT id, site_id, author_id, content, revision, last_seq, awaiting_review${cols} FROM ${TABLE[entity]} WHERE id IN (${placeholders(chunk.length)})${forUpdate ? ' FOR UPDATE' : ''}`,
      chunk,
    );
    for (const r of rows as Record<string, unknown>[]) out.set(String(r.id), fromDb(entity, r));
  }
  return out;
}

export function toServerRecord(r: RecordRow): ServerRecord {
  return {
    entity: r.entity,
    id: r.id,
    revision: r.revision,
    seq: r.lastSeq,
    awaitingReview: r.awaitingReview,
    content: r.content,
    ...(r.entity === 'sheet' ? { serverResult: r.serverResult ?? null, resultDiffers: r.resultDiffers ?? false } : {}),
  };
}

/** Insert or replace records (one multi-row statement per entity and chunk). */
export async function upsertRecords(conn: PoolConnection, rows: RecordRow[], now: Date): Promise<void> {
  for (const entity of ['sheet', 'bench_entry', 'photo'] as const) {
    const mine = rows.filter((r) => r.entity === entity);
    for (let i = 0; i < mine.length; i += 500) {
      const chunk = mine.slice(i, i + 500);
      const common = (r: RecordRow) => [r.id, r.siteId, r.authorId, JSON.stringify(r.content), r.revision, r.lastSeq, r.awaitingReview, now];
      if (entity === 'sheet') {
        const values = chunk.map((r) => {
          const s = r.content as Sheet;
          return [...common(r), s.kind, s.title, s.lotRef, s.areaId, s.status, s.pinnedEditionId, s.version, s.previousVersionId, s.deleted, JSON.stringify(r.serverResult ?? null), r.resultDiffers ?? false];
        });
        await conn.execute(
          `INSERT INTO sheets (id, site_id, author_id, content, revision, last_seq, awaiting_review, updated_at, kind, title, lot_ref, area_id, status, pinned_edition_id, sheet_version, previous_version_id, deleted, server_result, result_differs) VALUES ${placeholders(values.length, 19)}
           ON DUPLICATE KEY UPDATE content = VALUES(content), revision = VALUES(revision), last_seq = VALUES(last_seq), awaiting_review = VALUES(awaiting_review), updated_at = VALUES(updated_at),
           kind = VALUES(kind), title = VALUES(title), lot_ref = VALUES(lot_ref), area_id = VALUES(area_id), status = VALUES(status), pinned_edition_id = VALUES(pinned_edition_id),
           sheet_version = VALUES(sheet_version), previous_version_id = VALUES(previous_version_id), deleted = VALUES(deleted), server_result = VALUES(server_result), result_differs = VALUES(result_differs)`,
          bind(values),
        );
      } else if (entity === 'bench_entry') {
        const values = chunk.map((r) => {
          const b = r.content as BenchEntry;
          return [...common(r), b.lotRef, b.sheetId, b.deleted];
        });
        await conn.execute(
          `INSERT INTO bench_entries (id, site_id, author_id, content, revision, last_seq, awaiting_review, updated_at, lot_ref, sheet_id, deleted) VALUES ${placeholders(values.length, 11)}
           ON DUPLICATE KEY UPDATE content = VALUES(content), revision = VALUES(revision), last_seq = VALUES(last_seq), awaiting_review = VALUES(awaiting_review), updated_at = VALUES(updated_at),
           lot_ref = VALUES(lot_ref), sheet_id = VALUES(sheet_id), deleted = VALUES(deleted)`,
          bind(values),
        );
      } else {
        const values = chunk.map((r) => [...common(r), (r.content as PhotoMeta).benchEntryId]);
        await conn.execute(
          `INSERT INTO photo_records (id, site_id, author_id, content, revision, last_seq, awaiting_review, updated_at, bench_entry_id) VALUES ${placeholders(values.length, 9)}
           ON DUPLICATE KEY UPDATE content = VALUES(content), revision = VALUES(revision), last_seq = VALUES(last_seq), awaiting_review = VALUES(awaiting_review), updated_at = VALUES(updated_at)`,
          bind(values),
        );
      }
    }
  }
}

export interface ChangeRow {
  seq: number;
  entity: Entity;
  recordId: string;
  revision: number;
  cause: 'mutation' | 'conflict' | 'drift' | 'resolve';
  mutationId: string | null;
  actorUserId: string | null;
  /** The device whose mutation made the change (cause 'mutation'); null otherwise. */
  deviceId?: string | null;
}

export async function insertChanges(conn: PoolConnection, siteId: string, rows: ChangeRow[], now: Date): Promise<void> {
  for (let i = 0; i < rows.length; i += 1000) {
    const chunk = rows.slice(i, i + 1000);
    const values = bind(chunk.map((c) => [siteId, c.seq, c.entity, c.recordId, c.revision, c.cause, c.mutationId, c.actorUserId, c.deviceId ?? null, now]));
    await conn.execute(`INSERT INTO sync_changes (site_id, seq, entity, record_id, revision, cause, mutation_id, actor_user_id, device_id, created_at) VALUES ${placeholders(chunk.length, 10)}`, values);
  }
}

/**
 * Write records made outside a push (the demo seeds) the way a push stores them: each record with
 * its change-log row, the site counter moved on, in the caller's transaction (which holds the
 * counter's lock). Returns how many records were written.
 */
export async function writeRecordsWithChanges(conn: PoolConnection, seq: SiteSequence, siteId: string, rows: RecordRow[], changes: ChangeRow[]): Promise<number> {
  if (rows.length === 0) return 0;
  const now = new Date();
  await upsertRecords(conn, rows, now);
  await insertChanges(conn, siteId, changes, now);
  await seq.save(conn);
  return rows.length;
}
