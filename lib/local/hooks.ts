'use client';
// React hooks over the local store. Every offline-capable screen reads through these (one path,
// online or offline). Like useLiveQuery, each returns `undefined` while loading or before the
// signed-in user's store is open.
import { useLiveQuery } from 'dexie-react-hooks';
import { useSyncExternalStore } from 'react';
import type { BenchEntry } from '@/lib/bench/bench-entry-schema';
import type { Sheet, SheetKind, SheetStatus } from '@/lib/sheets/sheet-schema';
import type { LocalRecord, RejectedChange } from '@/lib/sync/local-state';
import { getActiveIdentity, getActiveStore, subscribeActiveStore } from './active-store';
import type { CachedEdition, LocalIdentity, RungbookLocalDb } from './local-db';
import { getSyncProgress, subscribeSyncProgress, type SyncProgress } from './sync-engine';

/** The open store of the signed-in user, or null (server render, or not open yet). */
export function useLocalStore(): RungbookLocalDb | null {
  return useSyncExternalStore(subscribeActiveStore, getActiveStore, () => null);
}

/** The signed-in identity (cached for offline use). */
export function useLocalIdentity(): LocalIdentity | null {
  return useSyncExternalStore(subscribeActiveStore, getActiveIdentity, () => null);
}

export interface SheetFilter {
  kind?: SheetKind;
  status?: SheetStatus;
  lotRef?: string;
  areaId?: string;
  authorId?: string;
  /** Tombstones are hidden unless asked for. */
  includeDeleted?: boolean;
}

/** Sheets of the site on this device, newest change first. */
export function useSheets(filter: SheetFilter = {}): LocalRecord<Sheet>[] | undefined {
  const store = useLocalStore();
  const key = JSON.stringify(filter);
  return useLiveQuery(async () => {
    if (!store) return undefined;
    const all = await store.sheets.toArray();
    return all
      .filter((r) => matchesSheet(r.content, filter))
      .sort((a, b) => (a.content.updatedAt < b.content.updatedAt ? 1 : -1));
  }, [store, key]);
}

export function matchesSheet(s: Sheet, f: SheetFilter): boolean {
  return (
    (f.includeDeleted || !s.deleted) &&
    (!f.kind || s.kind === f.kind) &&
    (!f.status || s.status === f.status) &&
    (!f.lotRef || s.lotRef === f.lotRef) &&
    (!f.areaId || s.areaId === f.areaId) &&
    (!f.authorId || s.authorId === f.authorId)
  );
}

/** One sheet with its sync state (pending, awaitingReview, serverResult, resultDiffers); null if absent. */
export function useSheet(id: string | null | undefined): LocalRecord<Sheet> | null | undefined {
  const store = useLocalStore();
  return useLiveQuery(async () => (store && id ? ((await store.sheets.get(id)) ?? null) : undefined), [store, id]);
}

export interface BenchFilter {
  lotRef?: string;
  sheetId?: string;
  areaId?: string;
  tag?: string;
  includeDeleted?: boolean;
}

export function useBenchEntries(filter: BenchFilter = {}): LocalRecord<BenchEntry>[] | undefined {
  const store = useLocalStore();
  const key = JSON.stringify(filter);
  return useLiveQuery(async () => {
    if (!store) return undefined;
    const all = await store.benchEntries.toArray();
    return all
      .filter(({ content: e }) => (filter.includeDeleted || !e.deleted) && (!filter.lotRef || e.lotRef === filter.lotRef) && (!filter.sheetId || e.sheetId === filter.sheetId) && (!filter.areaId || e.areaId === filter.areaId) && (!filter.tag || e.tags.includes(filter.tag)))
      .sort((a, b) => (a.content.createdAt < b.content.createdAt ? 1 : -1));
  }, [store, key]);
}

export function useBenchEntry(id: string | null | undefined): LocalRecord<BenchEntry> | null | undefined {
  const store = useLocalStore();
  return useLiveQuery(async () => (store && id ? ((await store.benchEntries.get(id)) ?? null) : undefined), [store, id]);
}

/** A photo's blob kept on the device (null if not on this device). */
export function usePhotoBlob(id: string | null | undefined): Blob | null | undefined {
  const store = useLocalStore();
  return useLiveQuery(async () => (store && id ? ((await store.photos.get(id))?.blob ?? null) : undefined), [store, id]);
}

/** The edition in force as last pulled (the body of GET /api/v1/editions/current); null if never pulled. */
export function useEditionInForce(): CachedEdition | null | undefined {
  const store = useLocalStore();
  return useLiveQuery(async () => (store ? ((await store.edition.get('current')) ?? null) : undefined), [store]);
}

export interface SyncState extends SyncProgress {
  /** Changes waiting to sync on this device (always shown). */
  waiting: number;
  /** Changes the server rejected for good, kept for the user to read and export. */
  rejected: RejectedChange[];
  /** Records kept on the server's version while a supervisor reviews a conflict. */
  awaitingReview: number;
}

export function useSyncState(): SyncState | undefined {
  const store = useLocalStore();
  const progress = useSyncExternalStore(subscribeSyncProgress, getSyncProgress, getSyncProgress);
  const counts = useLiveQuery(async () => {
    if (!store) return undefined;
    const [waiting, rejected, sheets, entries] = await Promise.all([
      store.outbox.count(),
      store.rejected.orderBy('rejectedAt').toArray(),
      store.sheets.filter((r) => r.awaitingReview).count(),
      store.benchEntries.filter((r) => r.awaitingReview).count(),
    ]);
    return { waiting, rejected, awaitingReview: sheets + entries };
  }, [store]);
  return counts ? { ...progress, ...counts } : undefined;
}
