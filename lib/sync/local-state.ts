// The device side of the protocol, pure: merging queued edits, applying a push outcome and merging a
// pulled record. The Dexie layer (lib/local) and the property tests both run these functions.
import type { Entity, MutationOutcome, OutcomeRecord, ServerRecord } from './protocol';

/** One record as the device holds it: what the screens show plus the server's last known state. */
export interface LocalRecord<T = unknown> {
  entity: Entity;
  id: string;
  /** What the screens show: the waiting local edit if any, else the server's version. */
  content: T;
  /** The server's version as last seen (null until accepted once): shown again if an edit is rejected. */
  serverContent: T | null;
  /** 0 until the server has accepted the record once. */
  serverRevision: number;
  serverSeq: number;
  awaitingReview: boolean;
  /** A local edit waits to sync. */
  pending: boolean;
  serverResult?: unknown;
  resultDiffers?: boolean;
}

/** An entry of the waiting-to-sync queue: at most one per record (edits merge). */
export interface QueuedMutation {
  mutationId: string;
  entity: Entity;
  recordId: string;
  baseRevision: number;
  content: unknown;
  queuedAt: string;
  attempts: number;
}

export interface RejectedChange {
  mutationId: string;
  entity: Entity;
  recordId: string;
  content: unknown;
  reason: string;
  fields?: { field: string; message: string }[];
  rejectedAt: string;
}

/**
 * Queue an edit. A second edit of a record still waiting replaces the first (full content) under a
 * NEW mutation id — the old id may already be on its way — and keeps the base revision, so a second
 * offline edit never conflicts with the first.
 */
export function queueEdit(
  existing: QueuedMutation | undefined,
  edit: { entity: Entity; recordId: string; content: unknown },
  baseRevision: number,
  mutationId: string,
  now: string,
): QueuedMutation {
  if (existing) return { ...existing, mutationId, content: edit.content, queuedAt: existing.queuedAt };
  return { mutationId, entity: edit.entity, recordId: edit.recordId, baseRevision, content: edit.content, queuedAt: now, attempts: 0 };
}

/** A push outcome's record, whole: protocol 2 leaves out the content the mutation sent (`contentAsSent`). */
export function withSentContent(r: OutcomeRecord, sent: unknown): ServerRecord {
  if (!('contentAsSent' in r)) return r;
  const { contentAsSent: _sent, ...rest } = r;
  return { ...rest, content: sent };
}

export function fromServer<T>(r: ServerRecord, pending = false, shown?: T): LocalRecord<T> {
  return {
    entity: r.entity,
    id: r.id,
    content: (pending ? shown : r.content) as T,
    serverContent: r.content as T,
    serverRevision: r.revision,
    serverSeq: r.seq,
    awaitingReview: r.awaitingReview,
    pending,
    serverResult: r.serverResult,
    resultDiffers: r.resultDiffers,
  };
}

export interface OutcomeEffect {
  /** The record to store; `null` removes it (a never-accepted record whose create was rejected). `undefined`: unchanged. */
  record?: LocalRecord | null;
  /** The queue entry to keep for the record; `null` removes it. */
  queued: QueuedMutation | null | undefined;
  rejected?: RejectedChange;
}

/**
 * Apply the outcome of a sent mutation. `current` is the record's queue entry NOW (a later edit may
 * have merged into it while the push was in flight, under another mutation id).
 */
export function applyOutcome(local: LocalRecord | undefined, current: QueuedMutation | undefined, sent: QueuedMutation, outcome: MutationOutcome, now: string): OutcomeEffect {
  const stillSame = current?.mutationId === sent.mutationId;
  switch (outcome.status) {
    case 'retry':
      return { queued: current ? { ...current, attempts: current.attempts + 1 } : undefined };
    case 'applied':
    case 'conflict': {
      const r = withSentContent(outcome.record, sent.content);
      const newer = !local || r.seq >= local.serverSeq;
      if (stillSame || !current) return { queued: stillSame ? null : undefined, record: newer ? fromServer(r) : undefined };
      // A later edit merged meanwhile: it now builds on what the server accepted (or stays on the
      // stale base and joins the conflict).
      const queued = outcome.status === 'applied' ? { ...current, baseRevision: r.revision } : current;
      return { queued, record: newer ? fromServer(r, true, local?.content ?? current.content) : undefined };
    }
    case 'rejected': {
      const rejected: RejectedChange = {
        mutationId: sent.mutationId,
        entity: sent.entity,
        recordId: sent.recordId,
        content: sent.content,
        reason: outcome.reason,
        fields: outcome.fields,
        rejectedAt: now,
      };
      if (!stillSame) return { queued: undefined, rejected };
      // Show the server's version again; the rejected content stays in the rejected list for export.
      const record = local && local.serverRevision > 0 ? { ...local, pending: false, content: local.serverContent } : null;
      return { queued: null, rejected, record };
    }
  }
}

/**
 * Merge one pulled record. Idempotent and order-free: a record older than (or as old as) the one
 * held is ignored, so pages delivered twice or out of order change nothing. A waiting local edit
 * stays on screen; only the server copy underneath moves.
 */
export function mergePulled(local: LocalRecord | undefined, incoming: ServerRecord, hasPending: boolean): LocalRecord | undefined {
  if (local && incoming.seq <= local.serverSeq) return undefined;
  return fromServer(incoming, hasPending, hasPending ? local?.content : undefined);
}
