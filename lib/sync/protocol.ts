// Rungbook sync protocol, version 1: the messages between a device and the server, as zod schemas
// and types. Pure: no React, Next.js, DOM or database imports. See lib/sync/README.md.
import equal from 'fast-deep-equal';
import { z } from 'zod';
import { benchEntrySchema, photoMetaSchema } from '@/lib/bench/bench-entry-schema';
import { recordIdSchema, refIdSchema, sheetSchema } from '@/lib/sheets/sheet-schema';

// The protocol version and its header live in protocol-version.ts, without zod: the device's sync
// engine needs them, and the messages below are classic zod (the server's route helpers take it).
export { MIN_SYNC_PROTOCOL, PROTOCOL_HEADER, protocolProblem, SYNC_PROTOCOL } from './protocol-version';

export const ENTITIES = ['sheet', 'bench_entry', 'photo'] as const;
export type Entity = (typeof ENTITIES)[number];

/** The zod schema of each entity's content, used on the device before queueing and on the server. */
export const ENTITY_SCHEMAS = { sheet: sheetSchema, bench_entry: benchEntrySchema, photo: photoMetaSchema } as const;
export type EntityContent = { sheet: z.infer<typeof sheetSchema>; bench_entry: z.infer<typeof benchEntrySchema>; photo: z.infer<typeof photoMetaSchema> };

export const MAX_BATCH = 500;

/**
 * One mutation: the record's full new content, the server revision it was made on (0 for a new
 * record) and an id made on the device (a replay of the same id is answered with its first outcome).
 * `content` is checked against the entity schema per mutation, so one bad change is rejected on its
 * own and the rest of the batch still applies.
 */
export const mutationSchema = z.object({
  mutationId: recordIdSchema,
  entity: z.enum(ENTITIES),
  recordId: recordIdSchema,
  baseRevision: z.number().int().min(0),
  content: z.unknown(),
});
export type Mutation = z.infer<typeof mutationSchema>;

export const pushRequestSchema = z.object({
  /** The device's id (one per browser profile and user); a push naming another user's device is refused. */
  deviceId: recordIdSchema,
  userId: refIdSchema,
  siteId: refIdSchema,
  mutations: z.array(mutationSchema).max(MAX_BATCH),
});
export type PushRequest = z.infer<typeof pushRequestSchema>;

/** A record as the server holds it: the device replaces its server copy with this. */
export interface ServerRecord {
  entity: Entity;
  id: string;
  revision: number;
  /** Site sequence number of the record's latest change: the newest wins on the device. */
  seq: number;
  awaitingReview: boolean;
  content: unknown;
  /** Sheets only: the result the server computed with lib/thermo, and whether the device's differed. */
  serverResult?: unknown;
  resultDiffers?: boolean;
}

/**
 * The record in a push outcome. From protocol 2 it leaves out `content` when that is exactly the
 * content this mutation sent (`contentAsSent: true`): the device already holds it, so a batch's
 * answer does not carry the batch back (see `withSentContent` in lib/sync/local-state.ts).
 */
export type OutcomeRecord = ServerRecord | (Omit<ServerRecord, 'content'> & { contentAsSent: true });

export type FinalOutcome =
  | { status: 'applied'; revision: number; record: OutcomeRecord }
  | { status: 'conflict'; conflictId: string; record: OutcomeRecord }
  | { status: 'rejected'; reason: string; fields?: { field: string; message: string }[] };

export type MutationOutcome =
  | ({ mutationId: string; recordId: string } & FinalOutcome)
  /** A replay: the first outcome, unchanged, with `duplicate: true`. */
  | ({ mutationId: string; recordId: string; duplicate: true } & FinalOutcome)
  /** Transient: nothing recorded; send the same mutation again later. */
  | { mutationId: string; recordId: string; status: 'retry'; reason: string };

/**
 * Protocol 2's push answer: each outcome's record without the content its mutation sent, where the
 * server stored exactly that content (deep equality; the server's zod parse drops unknown keys, so
 * a change it altered is answered in full).
 */
export function leaveOutSentContent(mutations: readonly Mutation[], outcomes: MutationOutcome[]): MutationOutcome[] {
  const sent = new Map(mutations.map((m) => [m.mutationId, m.content]));
  return outcomes.map((o) => {
    if (!('record' in o) || !('content' in o.record) || !sent.has(o.mutationId) || !equal(o.record.content, sent.get(o.mutationId))) return o;
    const { content: _content, ...rest } = o.record;
    return { ...o, record: { ...rest, contentAsSent: true as const } };
  });
}

export interface PushResponse {
  protocol: number;
  outcomes: MutationOutcome[];
}

export const pullQuerySchema = z.object({
  cursor: z.coerce.number().int().min(0).default(0),
  limit: z.coerce.number().int().min(1).max(2000).default(500),
});

export interface PullResponse {
  protocol: number;
  /** Records changed after the cursor (each once, in its newest state), in change-log order. */
  records: ServerRecord[];
  /** The change-log position this page reaches; send it back as `cursor`. Never moves backwards. */
  cursor: number;
  more: boolean;
}

/** Reconcile actions a supervisor can take (POST /api/v1/conflicts/:id/resolve). */
export const resolveConflictSchema = z.discriminatedUnion('action', [
  z.object({ action: z.literal('keep_server') }),
  z.object({ action: z.literal('keep_device'), versionId: refIdSchema }),
  z.object({
    action: z.literal('merge'),
    /** For each field that differs: 'server' or the id of a device version to take it from. */
    fields: z.record(z.string().max(60), z.string().max(36)),
  }),
  z.object({ action: z.literal('keep_pinned') }),
  z.object({ action: z.literal('resolve_in_force') }),
]);
export type ResolveConflict = z.infer<typeof resolveConflictSchema>;
