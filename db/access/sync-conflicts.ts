import 'server-only';
import { drizzle } from 'drizzle-orm/mysql2';
import { z } from 'zod';
import { pool } from '@/db/client';
import * as schema from '@/db/schema';
import { BENCH_MERGE_FIELDS } from '@/lib/bench/bench-entry-schema';
import type { UserActor } from '@/lib/auth/current';
import { audit } from '@/lib/server/audit';
import { AppError } from '@/lib/server/errors';
import { SHEET_MERGE_FIELDS, type Sheet } from '@/lib/sheets/sheet-schema';
import { diffFields, mergeFieldByField, type FieldDifference } from '@/lib/sync/field-diff';
import type { ConflictSummary } from '@/lib/sync/conflict-summary';
import { ENTITY_SCHEMAS, type Entity, type ResolveConflict } from '@/lib/sync/protocol';
import { EditionContext, resolveWithEdition, solveSheet, type DriftInfo } from './sync-drift';
import { insertChanges, loadRecords, toServerRecord, upsertRecords } from './sync-records';
import { SiteSequence, withSyncTransaction } from './sync-sequence';

export const conflictListQuerySchema = z.object({
  status: z.enum(['open', 'resolved']).default('open'),
  kind: z.enum(['edit', 'drift']).optional(),
  entity: z.enum(['sheet', 'bench_entry', 'photo']).optional(),
  /** A user id: conflicts where this user wrote a version (or authored the record). */
  author: z.string().max(36).optional(),
  /** Only conflicts at least this many hours old. */
  minAgeHours: z.coerce.number().min(0).max(24 * 365).optional(),
});
export type ConflictListQuery = z.infer<typeof conflictListQuerySchema>;

export type { ConflictSummary } from '@/lib/sync/conflict-summary';

const parse = (v: unknown) => (typeof v === 'string' ? (JSON.parse(v) as unknown) : v);
const MERGE_FIELDS: Record<Entity, readonly string[]> = { sheet: SHEET_MERGE_FIELDS, bench_entry: BENCH_MERGE_FIELDS, photo: [] };

function titleOf(entity: Entity, content: unknown): string {
  const c = content as Record<string, unknown>;
  if (entity === 'sheet') return String(c.title ?? 'Untitled sheet');
  if (entity === 'bench_entry') return `Bench entry${c.lotRef ? ` for lot ${String(c.lotRef)}` : ''}: ${String(c.note ?? '').slice(0, 60)}`;
  return 'Photo';
}

export async function listConflicts(siteId: string, q: ConflictListQuery & { id?: string }): Promise<ConflictSummary[]> {
  const where = ['c.site_id = ?', 'c.status = ?'];
  const params: unknown[] = [siteId, q.status];
  if (q.id) {
    where.push('c.id = ?');
    params.push(q.id);
  }
  const add = (clause: string, value: unknown) => {
    where.push(clause);
    params.push(value);
  };
  if (q.kind) add('c.kind = ?', q.kind);
  if (q.entity) add('c.entity = ?', q.entity);
  if (q.minAgeHours !== undefined) add('c.created_at <= ?', new Date(Date.now() - q.minAgeHours * 3600_000));
  const [rows] = await pool().query(`SELECT c.id, c.kind, c.status, c.entity, c.record_id, c.server_content, c.created_at FROM sync_conflicts c WHERE ${where.join(' AND ')} ORDER BY c.created_at LIMIT 500`, params);
  const list = rows as { id: string; kind: 'edit' | 'drift'; status: 'open' | 'resolved'; entity: Entity; record_id: string; server_content: unknown; created_at: Date }[];
  if (list.length === 0) return [];
  const [vrows] = await pool().query('SELECT v.conflict_id, v.user_id, u.display_name FROM sync_conflict_versions v LEFT JOIN users u ON u.id = v.user_id WHERE v.conflict_id IN (?)', [list.map((c) => c.id)]);
  const versions = vrows as { conflict_id: string; user_id: string; display_name: string | null }[];
  const authorIds = [...new Set(list.map((c) => String((parse(c.server_content) as { authorId?: string }).authorId ?? '')))];
  const [arows] = await pool().query('SELECT id, display_name FROM users WHERE site_id = ? AND id IN (?)', [siteId, authorIds.length ? authorIds : ['']]);
  const names = new Map((arows as { id: string; display_name: string }[]).map((a) => [a.id, a.display_name]));
  for (const v of versions) if (v.display_name) names.set(v.user_id, v.display_name);
  return list
    .map((c) => {
      const content = parse(c.server_content) as Record<string, unknown>;
      const ids = new Set<string>([String(content.authorId ?? ''), ...versions.filter((v) => v.conflict_id === c.id).map((v) => v.user_id)]);
      ids.delete('');
      return {
        id: c.id,
        kind: c.kind,
        status: c.status,
        entity: c.entity,
        recordId: c.record_id,
        title: titleOf(c.entity, content),
        sheetKind: c.entity === 'sheet' ? String(content.kind) : null,
        createdAt: new Date(c.created_at).toISOString(),
        authors: [...ids].map((id) => ({ id, name: names.get(id) ?? 'unknown user' })),
        versionCount: versions.filter((v) => v.conflict_id === c.id).length,
      };
    })
    .filter((c) => !q.author || c.authors.some((a) => a.id === q.author));
}

export interface ConflictDetail extends ConflictSummary {
  server: { revision: number; content: Record<string, unknown>; serverResult: unknown };
  versions: { id: string; userId: string; userName: string; baseRevision: number; createdAt: string; content: Record<string, unknown> }[];
  differences: FieldDifference[];
  mergeFields: readonly string[];
  drift: DriftInfo | null;
  resolution: unknown;
}

export async function getConflictOrThrow(siteId: string, conflictId: string): Promise<ConflictDetail> {
  const [rows] = await pool().query('SELECT * FROM sync_conflicts WHERE id = ? AND site_id = ?', [conflictId, siteId]);
  const c = (rows as Record<string, unknown>[])[0];
  if (!c) throw new AppError('not_found', 'No such conflict on this site.');
  const entity = c.entity as Entity;
  const conn = await pool().getConnection();
  let record;
  try {
    record = (await loadRecords(conn, entity, [String(c.record_id)], false)).get(String(c.record_id));
  } finally {
    conn.release();
  }
  const [vrows] = await pool().query(
    'SELECT v.id, v.user_id, v.base_revision, v.created_at, v.content, u.display_name FROM sync_conflict_versions v LEFT JOIN users u ON u.id = v.user_id WHERE v.conflict_id = ? ORDER BY v.created_at, v.id',
    [conflictId],
  );
  const versions = (vrows as Record<string, unknown>[]).map((v) => ({
    id: String(v.id),
    userId: String(v.user_id),
    userName: String(v.display_name ?? 'unknown user'),
    baseRevision: Number(v.base_revision),
    createdAt: new Date(v.created_at as Date).toISOString(),
    content: parse(v.content) as Record<string, unknown>,
  }));
  const serverContent = (record?.content ?? parse(c.server_content)) as Record<string, unknown>;
  const [summary] = await listConflictsById(siteId, conflictId, String(c.status) as 'open' | 'resolved');
  return {
    ...summary!,
    server: { revision: record?.revision ?? Number(c.server_revision), content: serverContent, serverResult: record?.serverResult ?? null },
    versions,
    differences: diffFields(serverContent, versions.map((v) => v.content), MERGE_FIELDS[entity]),
    mergeFields: MERGE_FIELDS[entity],
    drift: (parse(c.drift) as DriftInfo | null) ?? null,
    resolution: parse(c.resolution) ?? null,
  };
}

const listConflictsById = (siteId: string, id: string, status: 'open' | 'resolved') => listConflicts(siteId, { status, id });

/**
 * Settle a conflict: the chosen content becomes a new revision of the record (awaiting review
 * cleared), with its change-log row, the conflict marked resolved and an audit row — one transaction.
 * Every device gets the result on its next pull.
 */
export async function resolveConflict(actor: UserActor, conflictId: string, choice: ResolveConflict) {
  const result = await withSyncTransaction(
    () => pool().getConnection(),
    async (conn) => {
      const seq = await SiteSequence.lock(conn, actor.siteId);
      const [rows] = await conn.query('SELECT * FROM sync_conflicts WHERE id = ? AND site_id = ? FOR UPDATE', [conflictId, actor.siteId]);
      const c = (rows as Record<string, unknown>[])[0];
      if (!c) throw new AppError('not_found', 'No such conflict on this site.');
      if (c.status !== 'open') throw new AppError('conflict', 'This conflict has already been settled.');
      const entity = c.entity as Entity;
      const record = (await loadRecords(conn, entity, [String(c.record_id)], true)).get(String(c.record_id));
      if (!record || record.siteId !== actor.siteId) throw new AppError('not_found', 'The record of this conflict is not on this site.');
      const [vrows] = await conn.query('SELECT id, content FROM sync_conflict_versions WHERE conflict_id = ?', [conflictId]);
      const versions = Object.fromEntries((vrows as { id: string; content: unknown }[]).map((v) => [v.id, parse(v.content) as Record<string, unknown>]));
      const server = record.content as Record<string, unknown>;
      const isDrift = c.kind === 'drift';

      let next: Record<string, unknown>;
      let serverResult = record.serverResult;
      switch (choice.action) {
        case 'keep_server':
        case 'keep_pinned':
          if (isDrift !== (choice.action === 'keep_pinned')) throw new AppError('bad_request', `"${choice.action}" does not apply to ${isDrift ? 'edition drift' : 'conflicting edits'}.`, { fields: [{ field: 'action', message: 'Not for this kind of conflict' }] });
          next = server;
          break;
        case 'keep_device': {
          // Drift has device versions only when someone edited the sheet while it awaited review.
          if (isDrift && Object.keys(versions).length === 0) throw new AppError('bad_request', 'This edition drift has no device version to keep; keep the pinned edition or re-solve.', { fields: [{ field: 'action', message: 'Not for edition drift' }] });
          const v = versions[choice.versionId];
          if (!v) throw new AppError('validation', 'No such device version in this conflict.', { fields: [{ field: 'versionId', message: 'Not a version of this conflict' }] });
          next = { ...v, authorId: server.authorId };
          break;
        }
        case 'merge': {
          if (isDrift && Object.keys(versions).length === 0) throw new AppError('bad_request', 'This edition drift is settled by keeping the pinned edition or re-solving.', { fields: [{ field: 'action', message: 'Not for edition drift' }] });
          const merged = mergeFieldByField(server, versions, choice.fields, MERGE_FIELDS[entity]);
          if (!merged.ok) throw new AppError('validation', `${merged.field}: ${merged.message}`, { fields: [{ field: merged.field, message: merged.message }] });
          next = merged.merged;
          break;
        }
        case 'resolve_in_force': {
          if (!isDrift || entity !== 'sheet') throw new AppError('bad_request', 'Re-solving with the edition in force applies to edition drift.', { fields: [{ field: 'action', message: 'Only for edition drift' }] });
          const editions = new EditionContext(actor.siteId);
          const inForce = await editions.editionInForce();
          if (!inForce) throw new AppError('conflict', 'The site has no edition in force to re-solve with.');
          const redo = await resolveWithEdition(server as unknown as Sheet, inForce.id, editions);
          if (!redo.solved.ok) throw new AppError('validation', `The sheet does not solve with the edition in force: ${redo.solved.errors.map((e) => `${e.field}: ${e.message}`).join('; ')}`);
          next = { ...server, problem: redo.problem, inputs: redo.inputs, pinnedEditionId: inForce.id, result: redo.solved.value, engineVersion: (redo.solved.value as { engineVersion?: string }).engineVersion ?? server.engineVersion };
          break;
        }
      }
      next = { ...next, id: record.id, updatedAt: new Date().toISOString() };
      const parsed = ENTITY_SCHEMAS[entity].safeParse(next);
      if (!parsed.success) {
        const fields = parsed.error.issues.map((i) => ({ field: `merged.${i.path.join('.')}`, message: i.message }));
        throw new AppError('validation', `The settled record would be invalid — ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, { fields });
      }
      next = parsed.data as Record<string, unknown>;
      if (entity === 'sheet') {
        const solved = solveSheet((next as unknown as Sheet).problem);
        serverResult = solved.ok ? solved.value : { errors: solved.errors };
      }
      const now = new Date();
      const seqNo = seq.next();
      const row = { ...record, content: next, revision: record.revision + 1, lastSeq: seqNo, awaitingReview: false, serverResult, resultDiffers: entity === 'sheet' ? false : undefined };
      await upsertRecords(conn, [row], now);
      await insertChanges(conn, actor.siteId, [{ seq: seqNo, entity, recordId: record.id, revision: row.revision, cause: 'resolve', mutationId: null, actorUserId: actor.userId }], now);
      const resolution = { action: choice.action, ...(choice.action === 'keep_device' ? { versionId: choice.versionId } : {}), ...(choice.action === 'merge' ? { fields: choice.fields } : {}), revision: row.revision };
      await conn.query("UPDATE sync_conflicts SET status = 'resolved', resolved_by = ?, resolved_at = ?, resolution = ? WHERE id = ?", [actor.userId, now, JSON.stringify(resolution), conflictId]);
      await seq.save(conn);
      await audit(drizzle(conn, { schema, mode: 'default' }), actor, {
        action: isDrift ? 'sync.drift_resolved' : 'sync.conflict_resolved',
        entityType: entity,
        entityId: record.id,
        before: { conflictId, revision: record.revision, content: server, versions },
        after: { resolution, content: next },
      });
      return toServerRecord(row);
    },
  );
  return result;
}
