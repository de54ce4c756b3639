// Writes through the local store: every save updates the record on the device AND queues it for
// sync in one IndexedDB transaction, so a record on screen is never missing from the queue.
import { benchEntrySchema, photoMetaSchema, type BenchEntry, type PhotoMeta } from '@/lib/bench/bench-entry-schema';
import { newId } from '@/lib/ids';
import { sheetSchema, type Sheet } from '@/lib/sheets/sheet-schema';
import { queueEdit, type LocalRecord } from '@/lib/sync/local-state';
import type { Entity } from '@/lib/sync/protocol';
import * as z from '@/lib/validation/zod-mini';
import { getActiveIdentity, getActiveStore } from './active-store';
import { recordKey, type RungbookLocalDb } from './local-db';

/** A save the device refuses before queueing (e.g. a signed-off sheet). Zod errors pass through as ZodError. */
export class LocalStoreError extends Error {
  constructor(
    readonly code: 'no_store' | 'locked' | 'not_found' | 'append_only',
    message: string,
  ) {
    super(message);
    this.name = 'LocalStoreError';
  }
}

export function requireStore(): RungbookLocalDb {
  const store = getActiveStore();
  if (!store) throw new LocalStoreError('no_store', 'The local store is not open yet (no signed-in user on this device).');
  return store;
}

const nowIso = () => new Date().toISOString();

async function writeRecord<T>(entity: Entity, content: T & { id: string }): Promise<T> {
  const store = requireStore();
  const table = store.tableFor(entity);
  await store.transaction('rw', table, store.outbox, async () => {
    const local = await table.get(content.id);
    if (entity === 'sheet' && (local?.serverContent as Sheet | null | undefined)?.status === 'signed_off') {
      throw new LocalStoreError('locked', 'This sheet is signed off and locked. Start a new version to change it.');
    }
    if (entity === 'photo' && local) throw new LocalStoreError('append_only', 'A photo record is never changed once saved.');
    const key = recordKey(entity, content.id);
    const existing = await store.outbox.where('recordKey').equals(key).first();
    const queued = queueEdit(existing, { entity, recordId: content.id, content }, local?.serverRevision ?? 0, newId(), nowIso());
    if (existing) await store.outbox.delete(existing.mutationId);
    await store.outbox.put({ ...queued, recordKey: key });
    const next: LocalRecord = local
      ? { ...local, content, pending: true }
      : { entity, id: content.id, content, serverContent: null, serverRevision: 0, serverSeq: 0, awaitingReview: false, pending: true };
    await table.put(next);
  });
  return content;
}

/** A new draft sheet with an id made on the device, authored by the signed-in user. */
export function newSheet(fields: Pick<Sheet, 'kind' | 'title'> & Partial<Sheet>): Sheet {
  const who = getActiveIdentity();
  const now = nowIso();
  return {
    id: newId(),
    lotRef: null,
    areaId: null,
    note: '',
    status: 'draft',
    problem: null,
    inputs: [],
    result: null,
    pinnedEditionId: null,
    engineVersion: null,
    version: 1,
    previousVersionId: null,
    authorId: who?.userId ?? '',
    signedOffBy: null,
    signedOffAt: null,
    deleted: false,
    createdAt: now,
    updatedAt: now,
    ...fields,
  };
}

/**
 * Save a sheet (new or edited): validated with the shared zod schema (throws ZodError naming the
 * fields), stored, and queued; edits of a sheet still waiting merge into one mutation.
 */
export async function saveSheet(sheet: Sheet): Promise<Sheet> {
  const valid: Sheet = z.parse(sheetSchema, { ...sheet, updatedAt: nowIso() });
  return writeRecord('sheet', valid);
}

/** Delete a sheet: a tombstone (deleted: true) that syncs like any edit. */
export async function deleteSheet(id: string): Promise<void> {
  const store = requireStore();
  const local = await store.sheets.get(id);
  if (!local) throw new LocalStoreError('not_found', 'No such sheet on this device.');
  await saveSheet({ ...local.content, deleted: true });
}

/** Start version n+1 of a signed-off sheet: a new draft linked to it (the signed-off one stays locked). */
export async function startNewSheetVersion(id: string): Promise<Sheet> {
  const store = requireStore();
  const local = await store.sheets.get(id);
  if (!local) throw new LocalStoreError('not_found', 'No such sheet on this device.');
  const prev = local.content;
  const next = newSheet({
    ...prev,
    id: newId(),
    status: 'draft',
    version: prev.version + 1,
    previousVersionId: prev.id,
    signedOffBy: null,
    signedOffAt: null,
    deleted: false,
  });
  return saveSheet(next);
}

export function newBenchEntry(fields: Partial<BenchEntry> = {}): BenchEntry {
  const who = getActiveIdentity();
  const now = nowIso();
  return { id: newId(), note: '', lotRef: null, areaId: null, tags: [], sheetId: null, photoIds: [], authorId: who?.userId ?? '', deleted: false, createdAt: now, updatedAt: now, ...fields };
}

export async function saveBenchEntry(entry: BenchEntry): Promise<BenchEntry> {
  const valid: BenchEntry = z.parse(benchEntrySchema, { ...entry, updatedAt: nowIso() });
  return writeRecord('bench_entry', valid);
}

export async function deleteBenchEntry(id: string): Promise<void> {
  const store = requireStore();
  const local = await store.benchEntries.get(id);
  if (!local) throw new LocalStoreError('not_found', 'No such bench entry on this device.');
  await saveBenchEntry({ ...local.content, deleted: true });
}

/**
 * Keep a photo: the blob in the `photos` table (uploaded separately by the bench log) and its
 * append-only metadata record queued for sync.
 */
export async function savePhoto(meta: PhotoMeta, blob: Blob): Promise<PhotoMeta> {
  const valid: PhotoMeta = z.parse(photoMetaSchema, meta);
  const store = requireStore();
  await store.photos.put({ id: valid.id, blob, uploadedAt: null });
  return writeRecord('photo', valid);
}
