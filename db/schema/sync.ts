import { bigint, boolean, index, int, json, mysqlEnum, mysqlTable, primaryKey, varchar } from 'drizzle-orm/mysql-core';
import { at, id, ref } from './columns';

// Synced records and the sync machinery (design.md §4). Record ids are made on devices (UUIDv7);
// ordering comes from a per-site sequence counter locked FOR UPDATE in each writing transaction,
// never from auto-increment (Galera-safe).

export const SYNC_ENTITIES = ['sheet', 'bench_entry', 'photo'] as const;
export const SHEET_KIND_VALUES = ['cycle', 'dissolution', 'reaction', 'calorimetry'] as const;
export const SHEET_STATUS_VALUES = ['draft', 'submitted', 'signed_off'] as const;

/** Columns every synced record has: the full content as accepted, and its sync bookkeeping. */
const syncColumns = () => ({
  siteId: ref('site_id').notNull(),
  authorId: ref('author_id').notNull(),
  /** The record's full content as accepted (the zod-validated JSON the device sent). */
  content: json('content').notNull(),
  /** Server counter of accepted changes to this record (sync only; not a sheet version). */
  revision: int('revision').notNull(),
  /** Site sequence number of the record's latest change-log row. */
  lastSeq: bigint('last_seq', { mode: 'number', unsigned: true }).notNull(),
  /** An open conflict or edition drift: the record keeps this version until a supervisor settles it. */
  awaitingReview: boolean('awaiting_review').notNull().default(false),
  updatedAt: at('updated_at').notNull(),
});

export const sheets = mysqlTable(
  'sheets',
  {
    id: id(),
    ...syncColumns(),
    kind: mysqlEnum('kind', SHEET_KIND_VALUES).notNull(),
    title: varchar('title', { length: 200 }).notNull(),
    lotRef: varchar('lot_ref', { length: 80 }),
    areaId: ref('area_id'),
    status: mysqlEnum('status', SHEET_STATUS_VALUES).notNull(),
    pinnedEditionId: ref('pinned_edition_id'),
    sheetVersion: int('sheet_version').notNull(),
    previousVersionId: ref('previous_version_id'),
    deleted: boolean('deleted').notNull(),
    /** The result lib/thermo computed on the server (never the client's). */
    serverResult: json('server_result'),
    /** The device's result differed from the server's (the difference is in the audit log). */
    resultDiffers: boolean('result_differs').notNull().default(false),
  },
  (t) => [index('sheets_site_seq').on(t.siteId, t.lastSeq), index('sheets_site_lot').on(t.siteId, t.lotRef)],
);

export const benchEntries = mysqlTable(
  'bench_entries',
  {
    id: id(),
    ...syncColumns(),
    lotRef: varchar('lot_ref', { length: 80 }),
    sheetId: ref('sheet_id'),
    deleted: boolean('deleted').notNull(),
  },
  (t) => [index('bench_site_seq').on(t.siteId, t.lastSeq), index('bench_site_lot').on(t.siteId, t.lotRef)],
);

/** Photo metadata (append-only); the blob is uploaded separately into object storage. */
export const photoRecords = mysqlTable(
  'photo_records',
  {
    id: id(),
    ...syncColumns(),
    benchEntryId: ref('bench_entry_id').notNull(),
    blobStoredAt: at('blob_stored_at'),
  },
  (t) => [index('photo_site_seq').on(t.siteId, t.lastSeq), index('photo_entry').on(t.benchEntryId)],
);

/** One row per site: the last sequence number handed out. Locked FOR UPDATE by every writer. */
export const syncSiteSeq = mysqlTable('sync_site_seq', {
  siteId: ref('site_id').primaryKey(),
  seq: bigint('seq', { mode: 'number', unsigned: true }).notNull(),
});

/** The change log, in commit order per site: pulls read it by cursor (seq). */
export const syncChanges = mysqlTable(
  'sync_changes',
  {
    siteId: ref('site_id').notNull(),
    seq: bigint('seq', { mode: 'number', unsigned: true }).notNull(),
    entity: mysqlEnum('entity', SYNC_ENTITIES).notNull(),
    recordId: ref('record_id').notNull(),
    revision: int('revision').notNull(),
    /** What made the change: a device mutation, a conflict opening or a resolution. */
    cause: varchar('cause', { length: 20 }).notNull(),
    mutationId: ref('mutation_id'),
    actorUserId: ref('actor_user_id'),
    /** The device whose mutation made the change (null for a conflict flag or a resolution). */
    deviceId: ref('device_id'),
    createdAt: at('created_at').notNull(),
  },
  // A mutation that changed its record has no outcome row of its own: its change-log row (cause
  // 'mutation') is the outcome, found by mutation id when the device replays it. A push whose base
  // is behind reads the record's changes since that base (was each one this device's own?).
  (t) => [primaryKey({ columns: [t.siteId, t.seq] }), index('sync_changes_mutation').on(t.mutationId), index('sync_changes_record').on(t.recordId, t.revision)],
);

/** Devices, each bound to the user who first pushed from it. */
export const syncDevices = mysqlTable(
  'sync_devices',
  {
    id: id(),
    userId: ref('user_id').notNull(),
    siteId: ref('site_id').notNull(),
    createdAt: at('created_at').notNull(),
    lastSeenAt: at('last_seen_at').notNull(),
  },
  (t) => [index('sync_devices_user').on(t.userId)],
);

/**
 * The first outcome of a mutation id, where it is not a change-log row (a conflict, a rejection, an
 * applied no-op): a replay is answered with it (duplicate). Read only by mutation id, its key.
 */
export const syncMutations = mysqlTable(
  'sync_mutations',
  {
    mutationId: varchar('mutation_id', { length: 36 }).primaryKey(),
    siteId: ref('site_id').notNull(),
    deviceId: ref('device_id').notNull(),
    userId: ref('user_id').notNull(),
    entity: mysqlEnum('entity', SYNC_ENTITIES).notNull(),
    recordId: ref('record_id').notNull(),
    status: mysqlEnum('status', ['applied', 'conflict', 'rejected']).notNull(),
    revision: int('revision'),
    conflictId: ref('conflict_id'),
    reason: json('reason'),
    createdAt: at('created_at').notNull(),
  },
);

export const syncConflicts = mysqlTable(
  'sync_conflicts',
  {
    id: id(),
    siteId: ref('site_id').notNull(),
    entity: mysqlEnum('entity', SYNC_ENTITIES).notNull(),
    recordId: ref('record_id').notNull(),
    kind: mysqlEnum('kind', ['edit', 'drift']).notNull(),
    status: mysqlEnum('status', ['open', 'resolved']).notNull(),
    /** The server's version when the conflict opened (the record keeps it meanwhile). */
    serverRevision: int('server_revision').notNull(),
    serverContent: json('server_content').notNull(),
    /** Edition drift: pinned and in-force edition ids and the results under each. */
    drift: json('drift'),
    createdAt: at('created_at').notNull(),
    notifiedAt: at('notified_at'),
    resolvedBy: ref('resolved_by'),
    resolvedAt: at('resolved_at'),
    resolution: json('resolution'),
  },
  (t) => [index('sync_conflicts_site').on(t.siteId, t.status, t.createdAt), index('sync_conflicts_record').on(t.recordId, t.status)],
);

/** Device versions that joined a conflict (the incoming edit and later edits on the same stale base). */
export const syncConflictVersions = mysqlTable(
  'sync_conflict_versions',
  {
    id: id(),
    conflictId: ref('conflict_id').notNull(),
    mutationId: ref('mutation_id').notNull(),
    deviceId: ref('device_id').notNull(),
    userId: ref('user_id').notNull(),
    baseRevision: int('base_revision').notNull(),
    content: json('content').notNull(),
    createdAt: at('created_at').notNull(),
  },
  (t) => [index('sync_conflict_versions_conflict').on(t.conflictId)],
);

/** The reconcile e-mail digest: at most one per site per 15 minutes, checked on each push. */
export const syncDigestThrottle = mysqlTable('sync_digest_throttle', {
  siteId: ref('site_id').primaryKey(),
  lastSentAt: at('last_sent_at').notNull(),
});
