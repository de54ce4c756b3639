// A small support surface on `window.rungbook.local`: read and export what waits on this device,
// save a record through the normal write path, and sync — for support staff working in the
// browser's console when a screen is broken, and for the end-to-end tests. It reaches only the
// signed-in user's own local store, exactly what this origin's pages can already do.
import { getActiveStore } from './active-store';
import type { Entity } from '@/lib/sync/protocol';
import { deleteBenchEntry, deleteSheet, newBenchEntry, newSheet, saveBenchEntry, saveSheet } from './write-records';
import { syncNow } from './sync-engine';

export const consoleApi = {
  newSheet,
  saveSheet,
  deleteSheet,
  newBenchEntry,
  saveBenchEntry,
  deleteBenchEntry,
  syncNow,
  /** One record as the device holds it (content, pending, awaitingReview, revisions). */
  async getRecord(entity: Entity, id: string) {
    return (await getActiveStore()?.tableFor(entity).get(id)) ?? null;
  },
  /** Everything waiting to sync plus the rejected list, as plain JSON. */
  async exportWaiting() {
    const store = getActiveStore();
    if (!store) return null;
    return { waiting: await store.outbox.orderBy('queuedAt').toArray(), rejected: await store.rejected.toArray() };
  },
};

export function installConsoleApi() {
  if (typeof window === 'undefined') return;
  const w = window as unknown as { rungbook?: Record<string, unknown> };
  w.rungbook = { ...(w.rungbook ?? {}), local: consoleApi };
}
