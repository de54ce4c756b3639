// The device's sync engine: push the waiting queue in batches, then pull the site's changes by
// cursor, then refresh the cached edition in force. Runs on app start, on reconnect, every minute
// while online and on "sync now". Nothing waiting is ever dropped: a failed push, an expired
// session (401) or an outdated app (426) leave the queue as it is.
import { applyOutcome, mergePulled, type QueuedMutation } from '@/lib/sync/local-state';
import type { MutationOutcome, PullResponse, PushResponse } from '@/lib/sync/protocol';
import { PROTOCOL_HEADER, SYNC_PROTOCOL } from '@/lib/sync/protocol-version';
import { deviceIdOf, getActiveIdentity, getActiveStore } from './active-store';
import { recordKey, type CachedEdition, type RungbookLocalDb } from './local-db';
import { uploadWaitingPhotos } from './upload-photos';

export type SyncPhase = 'idle' | 'pushing' | 'pulling' | 'offline' | 'signin_required' | 'upgrade_required' | 'error';

export interface SyncProgress {
  phase: SyncPhase;
  /** Changes sent so far in this run, and how many were waiting when it started ("12 of 40 sent"). */
  sent: number;
  total: number;
  lastSyncAt: string | null;
  message: string | null;
}

/** Mutations per push request (the server takes up to MAX_BATCH); see perf/sync.bench.ts. */
export const PUSH_BATCH = 500;
const PULL_PAGE = 500;
const PERIOD_MS = 60_000;

let progress: SyncProgress = { phase: 'idle', sent: 0, total: 0, lastSyncAt: null, message: null };
const listeners = new Set<() => void>();
let running: Promise<void> | null = null;
let again = false;

export const getSyncProgress = (): SyncProgress => progress;
export function subscribeSyncProgress(l: () => void): () => void {
  listeners.add(l);
  return () => listeners.delete(l);
}
function setProgress(p: Partial<SyncProgress>) {
  progress = { ...progress, ...p };
  for (const l of listeners) l();
}

/** Run a sync now (single-flight: a call during a run schedules one more run after it). */
export function syncNow(): Promise<void> {
  if (running) {
    again = true;
    return running;
  }
  running = (async () => {
    try {
      do {
        again = false;
        await runOnce();
      } while (again);
    } finally {
      running = null;
    }
  })();
  return running;
}

class StopSync extends Error {
  constructor(readonly phase: SyncPhase, message: string) {
    super(message);
  }
}

async function runOnce() {
  const store = getActiveStore();
  const who = getActiveIdentity();
  if (!store || !who) return;
  try {
    // One tab at a time pushes for a user (others wait); replays would be harmless anyway.
    const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
    const work = async () => {
      await pushAll(store, who.userId, who.siteId);
      await uploadWaitingPhotos(store); // photo bytes follow their accepted records (bench log)
      await pullAll(store);
      await refreshEdition(store);
    };
    if (locks) await locks.request(`rungbook-sync-${who.userId}`, work);
    else await work();
    setProgress({ phase: 'idle', lastSyncAt: new Date().toISOString(), message: null });
    await store.meta.put({ key: 'lastSyncAt', value: new Date().toISOString() });
  } catch (error) {
    if (error instanceof StopSync) setProgress({ phase: error.phase, message: error.message });
    else if (error instanceof TypeError) setProgress({ phase: 'offline', message: 'No connection to the server; changes wait on this device.' });
    else setProgress({ phase: 'error', message: error instanceof Error ? error.message : 'Sync failed; changes wait on this device.' });
  }
}

async function send(url: string, init: RequestInit): Promise<Response> {
  const headers = new Headers(init.headers);
  headers.set(PROTOCOL_HEADER, String(SYNC_PROTOCOL));
  const res = await fetch(url, { ...init, headers, credentials: 'same-origin', cache: 'no-store' });
  if (res.status === 401) throw new StopSync('signin_required', 'Your session has ended. Sign in again; your waiting changes are kept and will sync.');
  if (res.status === 426) throw new StopSync('upgrade_required', 'This app is out of date. Reload to update; your waiting changes are kept.');
  return res;
}

async function errorMessage(res: Response): Promise<string> {
  const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
  return body?.error?.message ?? `The server answered ${res.status}.`;
}

async function pushAll(store: RungbookLocalDb, userId: string, siteId: string) {
  const deviceId = await deviceIdOf(store);
  const total = await store.outbox.count();
  setProgress({ phase: 'pushing', sent: 0, total, message: null });
  if (total === 0) return;
  const tried = new Set<string>();
  let sent = 0;
  // About ten requests per run so progress moves ("12 of 40 sent"), but never more than PUSH_BATCH.
  const size = Math.min(PUSH_BATCH, Math.max(10, Math.ceil(total / 10)));
  for (;;) {
    const batch = (await store.outbox.orderBy('queuedAt').toArray()).filter((m) => !tried.has(m.mutationId)).slice(0, size);
    if (batch.length === 0) break;
    for (const m of batch) tried.add(m.mutationId);
    const mutations = batch.map(({ mutationId, entity, recordId, baseRevision, content }) => ({ mutationId, entity, recordId, baseRevision, content }));
    const res = await send('/api/v1/sync/push', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ deviceId, userId, siteId, mutations }),
    });
    if (res.status >= 500 || res.status === 429) throw new StopSync('error', `${await errorMessage(res)} Changes wait on this device and will be sent again.`);
    if (!res.ok) throw new StopSync('error', await errorMessage(res));
    const body = (await res.json()) as PushResponse;
    await applyOutcomes(store, batch, body.outcomes);
    sent += body.outcomes.filter((o) => o.status !== 'retry').length;
    setProgress({ sent, total: Math.max(total, sent) });
  }
}

export async function applyOutcomes(store: RungbookLocalDb, batch: QueuedMutation[], outcomes: MutationOutcome[]) {
  const byId = new Map(outcomes.map((o) => [o.mutationId, o]));
  const now = new Date().toISOString();
  await store.transaction('rw', [store.sheets, store.benchEntries, store.photoMeta, store.outbox, store.rejected], async () => {
    for (const sent of batch) {
      const outcome = byId.get(sent.mutationId);
      if (!outcome) continue;
      const table = store.tableFor(sent.entity);
      const key = recordKey(sent.entity, sent.recordId);
      const current = await store.outbox.where('recordKey').equals(key).first();
      const local = await table.get(sent.recordId);
      const effect = applyOutcome(local, current, sent, outcome, now);
      if (effect.queued === null && current) await store.outbox.delete(current.mutationId);
      else if (effect.queued && current) await store.outbox.put({ ...effect.queued, recordKey: key });
      if (effect.record === null) await table.delete(sent.recordId);
      else if (effect.record) await table.put(effect.record);
      if (effect.rejected) await store.rejected.put(effect.rejected);
    }
  });
}

async function pullAll(store: RungbookLocalDb) {
  setProgress({ phase: 'pulling' });
  for (let page = 0; page < 1000; page++) {
    const cursor = Number((await store.meta.get('cursor'))?.value ?? 0);
    const res = await send(`/api/v1/sync/pull?cursor=${cursor}&limit=${PULL_PAGE}`, { method: 'GET' });
    if (!res.ok) throw new StopSync('error', await errorMessage(res));
    const body = (await res.json()) as PullResponse;
    await applyPullPage(store, body);
    if (!body.more) break;
  }
}

/** Merge one pull page; idempotent, and the cursor only ever moves forward. */
export async function applyPullPage(store: RungbookLocalDb, page: PullResponse) {
  await store.transaction('rw', [store.sheets, store.benchEntries, store.photoMeta, store.outbox, store.meta], async () => {
    for (const r of page.records) {
      const table = store.tableFor(r.entity);
      const local = await table.get(r.id);
      const pending = (await store.outbox.where('recordKey').equals(recordKey(r.entity, r.id)).count()) > 0;
      const next = mergePulled(local, r, pending);
      if (next) await table.put(next);
    }
    const cursor = Number((await store.meta.get('cursor'))?.value ?? 0);
    if (page.cursor > cursor) await store.meta.put({ key: 'cursor', value: page.cursor });
  });
}

async function refreshEdition(store: RungbookLocalDb) {
  const cached = await store.edition.get('current');
  const headers: Record<string, string> = {};
  if (cached?.etag) headers['if-none-match'] = cached.etag;
  const res = await fetch('/api/v1/editions/current', { headers, credentials: 'same-origin', cache: 'no-store' });
  if (res.status === 304 || !res.ok) return; // 404: no edition in force yet
  const edition = (await res.json()) as CachedEdition['edition'];
  await store.edition.put({ key: 'current', etag: res.headers.get('etag'), fetchedAt: new Date().toISOString(), edition });
}

/** Start the triggers: now, on reconnect, every minute while online. Returns a stop function. */
export function startSyncTriggers(): () => void {
  if (typeof window === 'undefined') return () => {};
  const onOnline = () => void syncNow();
  window.addEventListener('online', onOnline);
  const timer = window.setInterval(() => {
    if (navigator.onLine) void syncNow();
  }, PERIOD_MS);
  void syncNow();
  return () => {
    window.removeEventListener('online', onOnline);
    window.clearInterval(timer);
  };
}
