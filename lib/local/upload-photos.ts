// The photo step of a sync (bench log): after the push, upload the bytes of every photo whose
// record the server has accepted but whose blob is still only on this device. Photos are
// append-only, so an upload is idempotent (PUT by photo id; a repeat is answered "already stored").
// Storage trouble (503, 5xx, no network) leaves the blob waiting and retries with a backoff;
// nothing on the device is removed. Client-only.
import type { RungbookLocalDb } from './local-db';

export interface PhotoUploadProgress {
  /** Uploads in this run, and how many were waiting when it started. */
  sent: number;
  total: number;
  /** Why uploads are waiting (storage unavailable, offline, signed out), or null. */
  message: string | null;
  /** When the next automatic retry runs (ISO), or null. */
  retryAt: string | null;
}

/** Per-photo problems the server answered for good (wrong type, too large, damaged): kept for the user. */
export const UPLOAD_PROBLEMS_KEY = 'photoUploadProblems';
export type UploadProblems = Record<string, { status: number; message: string; at: string }>;

let progress: PhotoUploadProgress = { sent: 0, total: 0, message: null, retryAt: null };
const listeners = new Set<() => void>();
let running: Promise<void> | null = null;
let retryTimer: ReturnType<typeof setTimeout> | null = null;
let failures = 0;

export const getPhotoUploadProgress = () => progress;
export function subscribePhotoUploadProgress(l: () => void): () => void {
  listeners.add(l);
  return () => listeners.delete(l);
}
function set(p: Partial<PhotoUploadProgress>) {
  progress = { ...progress, ...p };
  for (const l of listeners) l();
}

/** Upload every waiting photo once (single-flight). Never throws: problems are reported in the progress. */
export function uploadWaitingPhotos(store: RungbookLocalDb): Promise<void> {
  running ??= runUploads(store)
    .catch((error: unknown) => {
      // e.g. the store was closed by a sign-out while a retry was pending: the blobs stay in it.
      set({ message: error instanceof Error ? `Photo upload stopped: ${error.message}` : 'Photo upload stopped.', retryAt: null });
    })
    .finally(() => {
      running = null;
    });
  return running;
}

async function runUploads(store: RungbookLocalDb): Promise<void> {
  if (retryTimer) clearTimeout(retryTimer);
  retryTimer = null;
  if (!store.isOpen()) return;
  const waiting = await store.photos.filter((p) => !p.uploadedAt).toArray();
  const problems = ((await store.meta.get(UPLOAD_PROBLEMS_KEY))?.value ?? {}) as UploadProblems;
  const todo = waiting.filter((p) => !problems[p.id]);
  set({ sent: 0, total: todo.length, message: null, retryAt: null });
  let sent = 0;
  for (const photo of todo) {
    const record = await store.photoMeta.get(photo.id);
    // The record must have reached the server first (its bytes are checked against it).
    if (!record || record.serverRevision === 0) continue;
    const meta = record.content;
    let res: Response;
    try {
      res = await fetch(`/api/v1/photos/${encodeURIComponent(photo.id)}`, {
        method: 'PUT',
        headers: { 'content-type': meta.contentType },
        body: photo.blob,
        credentials: 'same-origin',
        cache: 'no-store',
      });
    } catch {
      return wait(store, 'No connection to the server; photos wait on this device and are sent again.');
    }
    if (res.ok) {
      await store.photos.update(photo.id, { uploadedAt: new Date().toISOString() });
      set({ sent: ++sent });
      continue;
    }
    const message = ((await res.json().catch(() => null)) as { error?: { message?: string } } | null)?.error?.message ?? `The server answered ${res.status}.`;
    if (res.status === 401) return wait(store, 'Your session has ended. Sign in again; photos wait on this device.', false);
    if (res.status >= 500 || res.status === 429 || res.status === 404) return wait(store, message);
    // A final answer about this photo (type, size, damaged, not its author): keep the blob, say why.
    await store.transaction('rw', store.meta, async () => {
      const now = ((await store.meta.get(UPLOAD_PROBLEMS_KEY))?.value ?? {}) as UploadProblems;
      now[photo.id] = { status: res.status, message, at: new Date().toISOString() };
      await store.meta.put({ key: UPLOAD_PROBLEMS_KEY, value: now });
    });
  }
  failures = 0;
  set({ message: null, retryAt: null });
}

/** Stop this run and try again later: 5 s, 10 s, 20 s … up to a minute. */
function wait(store: RungbookLocalDb, message: string, retry = true) {
  failures++;
  if (!retry || typeof window === 'undefined') return void set({ message, retryAt: null });
  const delay = Math.min(60_000, 5_000 * 2 ** Math.min(failures - 1, 4));
  set({ message, retryAt: new Date(Date.now() + delay).toISOString() });
  retryTimer = setTimeout(() => void uploadWaitingPhotos(store), delay);
}
