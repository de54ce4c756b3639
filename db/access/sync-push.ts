import 'server-only';
import type { PoolConnection } from 'mysql2/promise';
import { drizzle } from 'drizzle-orm/mysql2';
import { pool } from '@/db/client';
import * as schema from '@/db/schema';
import { can } from '@/lib/auth/permissions';
import type { BenchEntry, PhotoMeta } from '@/lib/bench/bench-entry-schema';
import { newId } from '@/lib/ids';
import { audit } from '@/lib/server/audit';
import type { UserActor } from '@/lib/auth/current';
import { AppError } from '@/lib/server/errors';
import { log } from '@/lib/server/log';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import { sameJson } from '@/lib/sync/canonical-json';
import { decideMutation } from '@/lib/sync/decide-mutation';
import { ENTITY_SCHEMAS, type Entity, type Mutation, type MutationOutcome, type PushRequest } from '@/lib/sync/protocol';
import { detectDrift, EditionContext, solveSheet, type DriftInfo } from './sync-drift';
import { insertChanges, loadRecords, placeholders, toServerRecord, upsertRecords, type ChangeRow, type RecordRow } from './sync-records';
import { isTransientDbError, SiteSequence, withSyncTransaction } from './sync-sequence';

type Fields = { field: string; message: string }[];
type Prepared =
  | { m: Mutation; ok: false; reason: string; fields?: Fields }
  | { m: Mutation; ok: true; content: Record<string, unknown>; solved?: ReturnType<typeof solveSheet> };

/** Validate each mutation's content with its entity's zod schema and solve sheets — outside the transaction. */
function prepare(m: Mutation): Prepared {
  const parsed = ENTITY_SCHEMAS[m.entity].safeParse(m.content);
  if (!parsed.success) {
    const fields = parsed.error.issues.map((i) => ({ field: ['content', ...i.path.map(String)].join('.'), message: i.message }));
    return { m, ok: false, reason: `Invalid ${m.entity.replace('_', ' ')} — ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, fields };
  }
  const content = parsed.data as Record<string, unknown>;
  if (content.id !== m.recordId) return { m, ok: false, reason: 'content.id must equal recordId', fields: [{ field: 'content.id', message: 'Must equal recordId' }] };
  if (m.entity !== 'sheet') return { m, ok: true, content };
  return { m, ok: true, content, solved: solveSheet((content as Sheet).problem) };
}

interface BatchState {
  conn: PoolConnection;
  seq: SiteSequence;
  records: Map<string, RecordRow>;
  writes: Map<string, RecordRow>;
  changes: ChangeRow[];
  mutationRows: unknown[][];
  /** Mutations whose change-log row (cause 'mutation') is pending: that row is their outcome. */
  logged: Set<string>;
  conflictRows: unknown[][];
  versionRows: unknown[][];
  audits: { action: string; entityType: string; entityId: string; before?: unknown; after?: unknown }[];
  openedConflicts: number;
  deviceId: string;
}

/**
 * Apply one push batch (design.md §4): ONE transaction for the batch, each mutation decided on its
 * own (a rejected one does not undo the others), the record, its change-log row and the mutation's
 * outcome written in that transaction. See lib/sync/README.md for the savepoint strategy.
 */
export async function applyPush(actor: UserActor, req: PushRequest): Promise<MutationOutcome[]> {
  if (req.userId !== actor.userId) throw new AppError('forbidden', 'This push names another user; each device pushes only for its signed-in user.');
  if (req.siteId !== actor.siteId) throw new AppError('forbidden', "This push names another site; a device pushes only to its user's site.");
  await registerDevice(actor, req.deviceId);

  const prepared = req.mutations.map(prepare);
  const editions = new EditionContext(actor.siteId);
  // The site's areas, read only when some change names one.
  const siteAreas = prepared.some((p) => p.ok && typeof p.content.areaId === 'string') ? await loadAreaIds(actor.siteId) : new Set<string>();
  // Drift needs the editions; look them up before the transaction (read-only, cached per batch).
  const drift = new Map<string, DriftInfo | null>();
  for (const p of prepared) {
    if (!p.ok || p.m.entity !== 'sheet') continue;
    const sheet = p.content as unknown as Sheet;
    if (sheet.pinnedEditionId && !(await editions.edition(sheet.pinnedEditionId))) {
      Object.assign(p, { ok: false, reason: 'content.pinnedEditionId: no such reference edition on this site', fields: [{ field: 'content.pinnedEditionId', message: 'No such reference edition on this site' }] });
      continue;
    }
    drift.set(p.m.mutationId, await detectDrift(sheet, p.solved?.ok ? p.solved.value : { errors: p.solved?.errors }, editions));
  }

  let careful = false;
  for (;;) {
    try {
      const result = await withSyncTransaction(
        () => pool().getConnection(),
        (conn) => runBatch(conn, actor, req, prepared, drift, siteAreas, careful),
      );
      return result;
    } catch (error) {
      if (isTransient(error)) {
        return req.mutations.map((m) => ({ mutationId: m.mutationId, recordId: m.recordId, status: 'retry' as const, reason: 'The server was busy; send again.' }));
      }
      if (!careful && !(error instanceof AppError) && isDataError(error)) {
        // A write the fast path could not store: run again with a savepoint per mutation.
        log.warn({ err: error }, 'sync push: fast path failed, retrying with a savepoint per mutation');
        careful = true;
        continue;
      }
      throw error;
    }
  }
}

function isDataError(error: unknown) {
  const e = error as { sqlState?: string };
  return typeof e.sqlState === 'string' && (e.sqlState.startsWith('22') || e.sqlState.startsWith('23') || e.sqlState === 'HY000');
}
const isTransient = isTransientDbError;

/** Device → user bindings seen by this process (a binding never changes once written), with when its last-seen time was written. */
const knownDevices = new Map<string, { userId: string; seenAt: number }>();
const KNOWN_DEVICES_MAX = 10_000;

async function registerDevice(actor: UserActor, deviceId: string) {
  const now = new Date();
  const known = knownDevices.get(deviceId);
  if (known && known.userId !== actor.userId) throw new AppError('forbidden', DEVICE_TAKEN);
  if (known && now.getTime() - known.seenAt <= 60_000) return;
  const owner = async () => ((await pool().query('SELECT user_id, last_seen_at FROM sync_devices WHERE id = ?', [deviceId]))[0] as { user_id: string; last_seen_at: Date }[])[0];
  let row = await owner();
  if (!row) {
    await pool().query('INSERT IGNORE INTO sync_devices (id, user_id, site_id, created_at, last_seen_at) VALUES (?, ?, ?, ?, ?)', [deviceId, actor.userId, actor.siteId, now, now]);
    row = await owner();
  }
  if (row?.user_id !== actor.userId) throw new AppError('forbidden', DEVICE_TAKEN);
  // Last seen, to the minute (no write on every push).
  let seenAt = new Date(row.last_seen_at).getTime();
  if (now.getTime() - seenAt > 60_000) {
    await pool().query('UPDATE sync_devices SET last_seen_at = ? WHERE id = ?', [now, deviceId]);
    seenAt = now.getTime();
  }
  if (knownDevices.size >= KNOWN_DEVICES_MAX) knownDevices.delete(knownDevices.keys().next().value!);
  knownDevices.set(deviceId, { userId: row.user_id, seenAt });
}
const DEVICE_TAKEN = "This device belongs to another user's local store; a push naming another user's device is refused.";

async function loadAreaIds(siteId: string): Promise<Set<string>> {
  const [rows] = await pool().query('SELECT id FROM areas WHERE site_id = ?', [siteId]);
  return new Set((rows as { id: string }[]).map((r) => r.id));
}

async function runBatch(
  conn: PoolConnection,
  actor: UserActor,
  req: PushRequest,
  prepared: Prepared[],
  drift: Map<string, DriftInfo | null>,
  siteAreas: Set<string>,
  careful: boolean,
): Promise<MutationOutcome[]> {
  const now = new Date();
  // Lock first, then read: READ COMMITTED + the site lock means a parallel replay of the same batch
  // waits here and then sees the first one's outcomes (duplicate), never a half state.
  const seq = await SiteSequence.lock(conn, actor.siteId);

  const records = new Map<string, RecordRow>();
  for (const entity of ['sheet', 'bench_entry', 'photo'] as const) {
    const wanted = new Set<string>();
    for (const m of req.mutations) {
      if (m.entity !== entity) continue;
      wanted.add(m.recordId);
      if (entity === 'sheet') {
        const prev = (m.content as Partial<Sheet> | null)?.previousVersionId;
        if (typeof prev === 'string') wanted.add(prev);
      }
    }
    for (const [id, row] of await loadRecords(conn, entity, [...wanted], true)) records.set(`${entity}:${id}`, row);
  }
  const priorById = await priorOutcomes(conn, actor, req.mutations, records);

  const st: BatchState = { conn, seq, records, writes: new Map(), changes: [], mutationRows: [], logged: new Set(), conflictRows: [], versionRows: [], audits: [], openedConflicts: 0, deviceId: req.deviceId };
  const out: MutationOutcome[] = [];
  const inBatch = new Map<string, MutationOutcome>();

  for (const p of prepared) {
    const { m } = p;
    const first = priorById.get(m.mutationId);
    const earlier = inBatch.get(m.mutationId);
    if (earlier) {
      out.push(earlier.status === 'retry' ? earlier : { ...earlier, duplicate: true });
      continue;
    }
    if (first) {
      out.push(await duplicateOutcome(st, actor, m, first));
      continue;
    }
    let o: MutationOutcome;
    if (careful) {
      const snapshot = { seq: seq.value, records: new Map(st.records) };
      await conn.query('SAVEPOINT m');
      try {
        o = await decideOne(st, actor, p, drift.get(m.mutationId) ?? null, siteAreas);
        recordOutcome(st, actor, req.deviceId, m, o, now);
        await flush(st, actor, now);
        await conn.query('RELEASE SAVEPOINT m');
      } catch (error) {
        await conn.query('ROLLBACK TO SAVEPOINT m');
        seq.reset(snapshot.seq);
        st.records = snapshot.records;
        clearPending(st);
        o = reject(m, `The server could not store this change (${(error as Error).message.slice(0, 200)}).`);
        recordOutcome(st, actor, req.deviceId, m, o, now);
        await flush(st, actor, now);
      }
    } else {
      o = await decideOne(st, actor, p, drift.get(m.mutationId) ?? null, siteAreas);
      recordOutcome(st, actor, req.deviceId, m, o, now);
    }
    inBatch.set(m.mutationId, o);
    out.push(o);
  }
  await flush(st, actor, now);
  await seq.save(conn);
  // Attach the final record state (after every write of the batch). out[i] answers req.mutations[i].
  return out.map((o, i) => {
    if (o.status === 'retry' || o.status === 'rejected') return o;
    const key = `${req.mutations[i]!.entity}:${o.recordId}`;
    const row = st.records.get(key);
    return row ? { ...o, record: toServerRecord(row) } : o;
  });
}

/**
 * Earlier outcomes of these mutation ids (design.md §4: a replay gets the first outcome). An applied
 * mutation that changed its record is answered from its change-log row (the row the pull reads,
 * committed in the same transaction as the record); every other outcome (a conflict, a rejection,
 * an applied no-op) has its own row in sync_mutations. Read after the records: a mutation that was
 * applied left its record on the server (a delete is a tombstone; no record is ever removed), so
 * the change log is searched only for mutations whose record exists — a batch of new records reads
 * sync_mutations alone.
 *
 * Mutation ids are made on devices: should another user's device send an id already used (the same
 * UUID by accident, or on purpose), the rows of this user come first, so the honest device still
 * gets its own first outcome; only when every row belongs to someone else is the id refused.
 */
async function priorOutcomes(conn: PoolConnection, actor: UserActor, mutations: Mutation[], records: Map<string, RecordRow>): Promise<Map<string, Record<string, unknown>>> {
  const out = new Map<string, Record<string, unknown>>();
  if (mutations.length === 0) return out;
  const ids = mutations.map((m) => m.mutationId);
  const applied = mutations.filter((m) => records.has(`${m.entity}:${m.recordId}`)).map((m) => m.mutationId);
  const [rows] = await conn.execute(
    `SELECT mutation_id, site_id, user_id, entity, record_id, status, revision, conflict_id, reason, created_at, NULL AS seq FROM sync_mutations WHERE mutation_id IN (${placeholders(ids.length)})` +
      (applied.length
        ? ` UNION ALL SELECT mutation_id, site_id, actor_user_id, entity, record_id, 'applied', revision, NULL, NULL, created_at, seq FROM sync_changes WHERE mutation_id IN (${placeholders(applied.length)}) AND cause = 'mutation'`
        : ''),
    [...ids, ...applied],
  );
  // This user's rows first, then the earliest.
  const rank = (r: Record<string, unknown>) => [r.site_id === actor.siteId && r.user_id === actor.userId ? 0 : 1, new Date(r.created_at as Date).getTime(), Number(r.seq ?? Infinity)];
  const before = (a: number[], b: number[]) => {
    const i = a.findIndex((x, k) => x !== b[k]);
    return i >= 0 && a[i]! < b[i]!;
  };
  for (const r of rows as Record<string, unknown>[]) {
    const id = String(r.mutation_id);
    const held = out.get(id);
    if (!held || before(rank(r), rank(held))) out.set(id, r);
  }
  return out;
}

function recordOutcome(st: BatchState, actor: UserActor, deviceId: string, m: Mutation, o: MutationOutcome, now: Date) {
  if (o.status === 'retry') return;
  if (o.status === 'applied' && st.logged.has(m.mutationId)) return; // its change-log row is the outcome
  st.mutationRows.push([
    m.mutationId,
    actor.siteId,
    deviceId,
    actor.userId,
    m.entity,
    m.recordId,
    o.status,
    o.status === 'applied' ? o.revision : null,
    o.status === 'conflict' ? o.conflictId : null,
    o.status === 'rejected' ? JSON.stringify({ reason: o.reason, fields: o.fields ?? null }) : null,
    now,
  ]);
}

function clearPending(st: BatchState) {
  st.writes.clear();
  st.changes = [];
  st.conflictRows = [];
  st.versionRows = [];
  st.mutationRows = [];
  st.logged.clear();
  st.audits = [];
}

async function duplicateOutcome(st: BatchState, actor: UserActor, m: Mutation, first: Record<string, unknown>): Promise<MutationOutcome> {
  if ((first.site_id !== actor.siteId || first.user_id !== actor.userId)) {
    return { mutationId: m.mutationId, recordId: m.recordId, status: 'rejected', reason: 'This mutation id was already used by another device; make a new one.' };
  }
  const key = `${m.entity}:${m.recordId}`;
  const row = st.records.get(key);
  const status = first.status as 'applied' | 'conflict' | 'rejected';
  if (status === 'rejected') {
    const r = (typeof first.reason === 'string' ? JSON.parse(first.reason) : first.reason) as { reason: string; fields: Fields | null };
    return { mutationId: m.mutationId, recordId: m.recordId, duplicate: true, status, reason: r.reason, ...(r.fields ? { fields: r.fields } : {}) };
  }
  if (!row) return { mutationId: m.mutationId, recordId: m.recordId, duplicate: true, status: 'rejected', reason: 'The record of this mutation is no longer on the server.' };
  if (status === 'applied') return { mutationId: m.mutationId, recordId: m.recordId, duplicate: true, status, revision: Number(first.revision), record: toServerRecord(row) };
  return { mutationId: m.mutationId, recordId: m.recordId, duplicate: true, status, conflictId: String(first.conflict_id), record: toServerRecord(row) };
}

function reject(m: Mutation, reason: string, fields?: Fields): MutationOutcome {
  return { mutationId: m.mutationId, recordId: m.recordId, status: 'rejected', reason, ...(fields ? { fields } : {}) };
}

/** Access rules enforced on push (design.md §1, issue part 6). Returns a rejection reason or null. */
function checkAccess(actor: UserActor, entity: Entity, content: Record<string, unknown>, existing: RecordRow | undefined, previous: RecordRow | undefined, siteAreas: Set<string>): { reason: string; field?: string } | null {
  const authorId = content.authorId as string;
  if (!existing && authorId !== actor.userId) return { reason: 'A new record must name its signed-in author.', field: 'content.authorId' };
  if (existing && authorId !== existing.authorId) return { reason: 'The author of a record cannot change.', field: 'content.authorId' };
  if (existing && existing.authorId !== actor.userId && !can(actor.role, 'sheet.correct')) {
    return { reason: "You may not edit another user's record; a correction needs the sheet.correct permission (a supervisor)." };
  }
  const areaId = content.areaId as string | null | undefined;
  if (areaId && !siteAreas.has(areaId)) return { reason: 'No such area on this site.', field: 'content.areaId' };
  if (entity === 'photo' && existing && !sameJson(existing.content, content)) return { reason: 'Photo records are append-only: a saved photo is never changed.' };
  if (entity !== 'sheet') return null;
  const sheet = content as unknown as Sheet;
  const before = existing?.content as Sheet | undefined;
  if (before?.status === 'signed_off') return { reason: 'This sheet is signed off and locked; start a new version (version + 1) to change it.' };
  if (before && before.kind !== sheet.kind) return { reason: 'The kind of a sheet cannot change.', field: 'content.kind' };
  if (sheet.status === 'signed_off') {
    if (!can(actor.role, 'sheet.signoff')) return { reason: 'Signing off a sheet needs the sheet.signoff permission (a supervisor).', field: 'content.status' };
    if (sheet.authorId === actor.userId) return { reason: 'A sheet is signed off by a supervisor other than its author.', field: 'content.signedOffBy' };
    if (sheet.signedOffBy !== actor.userId) return { reason: 'signedOffBy must name the supervisor signing off (you).', field: 'content.signedOffBy' };
  }
  if (sheet.previousVersionId) {
    const prev = previous?.content as Sheet | undefined;
    if (!prev || previous?.siteId !== actor.siteId) return { reason: 'The previous version is not on the server (sync it first).', field: 'content.previousVersionId' };
    if (prev.status !== 'signed_off') return { reason: 'A new version follows only a signed-off sheet.', field: 'content.previousVersionId' };
    if (sheet.version !== prev.version + 1) return { reason: `A new version of version ${prev.version} is version ${prev.version + 1}.`, field: 'content.version' };
  }
  return null;
}

async function decideOne(st: BatchState, actor: UserActor, p: Prepared, drift: DriftInfo | null, siteAreas: Set<string>): Promise<MutationOutcome> {
  const { m } = p;
  if (!p.ok) return reject(m, p.reason, p.fields);
  const key = `${m.entity}:${m.recordId}`;
  const existing = st.records.get(key);
  if (existing && existing.siteId !== actor.siteId) return reject(m, 'No such record on this site.');
  const prevId = m.entity === 'sheet' ? (p.content as unknown as Sheet).previousVersionId : null;
  const previous = prevId ? st.records.get(`sheet:${prevId}`) : undefined;
  const denied = checkAccess(actor, m.entity, p.content, existing, previous, siteAreas);
  if (denied) return reject(m, denied.reason, denied.field ? [{ field: denied.field, message: denied.reason }] : undefined);

  if (m.entity === 'sheet') {
    const sheet = p.content as unknown as Sheet;
    if (sheet.status !== 'draft' && !sheet.deleted && p.solved && !p.solved.ok) {
      const fields = p.solved.errors.map((e) => ({ field: `content.problem.${e.field}`, message: e.message }));
      return reject(m, `A ${sheet.status.replace('_', ' ')} sheet must solve: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, fields);
    }
  }
  // The same content again (e.g. an append-only photo re-sent under a new id): nothing to change.
  if (existing && sameJson(existing.content, p.content) && !existing.awaitingReview) {
    return { mutationId: m.mutationId, recordId: m.recordId, status: 'applied', revision: existing.revision, record: toServerRecord(existing) };
  }

  const ownSinceBase = existing && !existing.awaitingReview && m.baseRevision < existing.revision ? await ownChangesSince(st, actor, m) : false;
  const decision = decideMutation(existing ? { revision: existing.revision, awaitingReview: existing.awaitingReview } : null, m.baseRevision, ownSinceBase);
  if (decision.kind === 'reject') return reject(m, decision.reason, [{ field: 'baseRevision', message: decision.reason }]);
  if (decision.kind === 'conflict') {
    const conflictId = await joinConflict(st, actor, m, existing!, p.content, 'edit', null);
    return { mutationId: m.mutationId, recordId: m.recordId, status: 'conflict', conflictId, record: toServerRecord(st.records.get(key)!) };
  }

  const seqNo = st.seq.next();
  const row: RecordRow = {
    entity: m.entity,
    id: m.recordId,
    siteId: actor.siteId,
    authorId: p.content.authorId as string,
    content: p.content,
    revision: decision.revision,
    lastSeq: seqNo,
    awaitingReview: false,
  };
  if (m.entity === 'sheet') {
    const sheet = p.content as unknown as Sheet;
    const serverResult = p.solved?.ok ? p.solved.value : { errors: p.solved?.errors ?? [] };
    row.serverResult = serverResult;
    row.resultDiffers = sheet.result !== null && sheet.result !== undefined && !sameJson(sheet.result, serverResult);
    if (row.resultDiffers) {
      log.warn({ sheetId: sheet.id, mutationId: m.mutationId }, 'sync push: the device result differs from the server result');
      st.audits.push({ action: 'sheet.result_differs', entityType: 'sheet', entityId: sheet.id, before: { deviceResult: sheet.result }, after: { serverResult } });
    }
  }
  st.records.set(key, row);
  st.writes.set(key, row);
  st.changes.push({ seq: seqNo, entity: m.entity, recordId: m.recordId, revision: row.revision, cause: 'mutation', mutationId: m.mutationId, actorUserId: actor.userId, deviceId: st.deviceId });
  st.logged.add(m.mutationId);

  // Edition drift: checked only when the pin is new or changed.
  const prevPin = (existing?.content as Sheet | undefined)?.pinnedEditionId;
  if (drift && (!existing || prevPin !== (p.content as unknown as Sheet).pinnedEditionId)) {
    const conflictId = await joinConflict(st, actor, m, row, p.content, 'drift', drift);
    return { mutationId: m.mutationId, recordId: m.recordId, status: 'applied', revision: row.revision, record: toServerRecord(st.records.get(key)!), ...{ driftConflictId: conflictId } };
  }
  return { mutationId: m.mutationId, recordId: m.recordId, status: 'applied', revision: row.revision, record: toServerRecord(row) };
}

/**
 * Was every change of this record after the mutation's base revision an accepted mutation of this
 * same device and user (decideMutation's `ownSinceBase`)? Only asked when the base is behind; the
 * record is locked FOR UPDATE, so its log cannot grow meanwhile. Changes of this batch not yet
 * written are this device's too, unless they flag a conflict or drift.
 */
async function ownChangesSince(st: BatchState, actor: UserActor, m: Mutation): Promise<boolean> {
  const pending = st.changes.filter((c) => c.recordId === m.recordId && c.entity === m.entity);
  if (pending.some((c) => c.cause !== 'mutation')) return false;
  const [rows] = await st.conn.query(
    `SELECT COUNT(*) AS n, COALESCE(SUM(cause = 'mutation' AND device_id = ? AND actor_user_id = ?), 0) AS own
     FROM sync_changes WHERE site_id = ? AND record_id = ? AND entity = ? AND revision > ?`,
    [st.deviceId, actor.userId, actor.siteId, m.recordId, m.entity, m.baseRevision],
  );
  const { n, own } = (rows as { n: number | string; own: number | string }[])[0] ?? { n: 0, own: 0 };
  return Number(n) + pending.length > 0 && Number(n) === Number(own);
}

/**
 * Open a conflict on the record (keeping the server's version, marked awaiting review) or join the
 * open one; the incoming version is kept whole in the conflict.
 */
async function joinConflict(st: BatchState, actor: UserActor, m: Mutation, server: RecordRow, incoming: Record<string, unknown>, kind: 'edit' | 'drift', drift: DriftInfo | null): Promise<string> {
  const now = new Date();
  let conflictId: string | undefined = st.conflictRows.find((c) => c[3] === m.recordId && c[5] === 'open')?.[0] as string | undefined;
  if (!conflictId) {
    const [rows] = await st.conn.query("SELECT id FROM sync_conflicts WHERE record_id = ? AND site_id = ? AND status = 'open' LIMIT 1 FOR UPDATE", [m.recordId, actor.siteId]);
    conflictId = (rows as { id: string }[])[0]?.id;
  }
  if (!conflictId) {
    conflictId = newId();
    st.conflictRows.push([conflictId, actor.siteId, m.entity, m.recordId, kind, 'open', server.revision, JSON.stringify(server.content), drift ? JSON.stringify(drift) : null, now]);
    st.openedConflicts++;
    st.audits.push({ action: kind === 'edit' ? 'sync.conflict_opened' : 'sync.drift_detected', entityType: m.entity, entityId: m.recordId, after: { conflictId, mutationId: m.mutationId, ...(drift ? { drift } : {}) } });
  }
  if (kind === 'edit') st.versionRows.push([newId(), conflictId, m.mutationId, st.deviceId, actor.userId, m.baseRevision, JSON.stringify(incoming), now]);
  if (!server.awaitingReview) {
    const seqNo = st.seq.next();
    const row = { ...server, awaitingReview: true, lastSeq: seqNo };
    const key = `${m.entity}:${m.recordId}`;
    st.records.set(key, row);
    st.writes.set(key, row);
    st.changes.push({ seq: seqNo, entity: m.entity, recordId: m.recordId, revision: row.revision, cause: kind === 'edit' ? 'conflict' : 'drift', mutationId: m.mutationId, actorUserId: actor.userId });
  }
  return conflictId;
}

async function flush(st: BatchState, actor: UserActor, now: Date) {
  const { conn } = st;
  if (st.writes.size) await upsertRecords(conn, [...st.writes.values()], now);
  if (st.changes.length) await insertChanges(conn, actor.siteId, st.changes, now);
  if (st.conflictRows.length)
    await conn.query('INSERT INTO sync_conflicts (id, site_id, entity, record_id, kind, status, server_revision, server_content, drift, created_at) VALUES ?', [st.conflictRows]);
  if (st.versionRows.length) await conn.query('INSERT INTO sync_conflict_versions (id, conflict_id, mutation_id, device_id, user_id, base_revision, content, created_at) VALUES ?', [st.versionRows]);
  if (st.mutationRows.length)
    await conn.query('INSERT INTO sync_mutations (mutation_id, site_id, device_id, user_id, entity, record_id, status, revision, conflict_id, reason, created_at) VALUES ?', [st.mutationRows]);
  if (st.audits.length) {
    const tx = drizzle(conn, { schema, mode: 'default' });
    for (const a of st.audits) await audit(tx, actor, a);
  }
  clearPending(st);
}

export type { BenchEntry, PhotoMeta };
