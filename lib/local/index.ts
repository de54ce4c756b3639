// The local store's public interface. Screens (the workbench, the bench log, the reference
// browser) import from '@/lib/local' only — never Dexie directly — and work the same online and
// offline. Client-only: use from 'use client' components.
//
// Reading (each hook returns undefined while loading):
//   useSheets(filter?)          → LocalRecord<Sheet>[]   (newest change first; tombstones hidden)
//   useSheet(id)                → LocalRecord<Sheet> | null
//   useBenchEntries(filter?)    → LocalRecord<BenchEntry>[]
//   useBenchEntry(id)           → LocalRecord<BenchEntry> | null
//   usePhotoBlob(id)            → Blob | null
//   useEditionInForce()         → CachedEdition | null (the GET /api/v1/editions/current body, with ETag)
//   useSyncState()              → { waiting, sent, total, phase, message, rejected[], awaitingReview }
//   useLocalIdentity()          → the signed-in user, role and site (cached for offline use)
//   A LocalRecord carries `content` (what to show), `pending` (waiting to sync), `awaitingReview`
//   (a supervisor is settling a conflict: show it, and say so), `serverResult` and `resultDiffers`.
//
// Writing (validated with the shared zod schemas; a ZodError names the failing fields):
//   newSheet({ kind, title, ... }) → a draft Sheet with a device-made id and the signed-in author
//   saveSheet(sheet)            → stores it and queues ONE mutation per sheet (queued edits merge)
//   deleteSheet(id)             → tombstone
//   startNewSheetVersion(id)    → version n+1 of a signed-off (locked) sheet, linked to it
//   newBenchEntry(), saveBenchEntry(entry), deleteBenchEntry(id)
//   savePhoto(meta, blob)       → blob in the `photos` table + append-only metadata record queued
//   syncNow()                   → push the queue, pull the site's changes, refresh the edition
export { openLocalStore, closeLocalStore, lastIdentity, getActiveStore, getActiveIdentity } from './active-store';
export type { LocalIdentity, CachedEdition, EditionInForceBody, PhotoBlob } from './local-db';
export {
  useLocalStore,
  useLocalIdentity,
  useSheets,
  useSheet,
  useBenchEntries,
  useBenchEntry,
  usePhotoBlob,
  useEditionInForce,
  useSyncState,
  type SheetFilter,
  type BenchFilter,
  type SyncState,
} from './hooks';
export {
  newSheet,
  saveSheet,
  deleteSheet,
  startNewSheetVersion,
  newBenchEntry,
  saveBenchEntry,
  deleteBenchEntry,
  savePhoto,
  LocalStoreError,
} from './write-records';
export { syncNow, startSyncTriggers, type SyncPhase, type SyncProgress } from './sync-engine';
export { uploadWaitingPhotos, getPhotoUploadProgress, subscribePhotoUploadProgress, UPLOAD_PROBLEMS_KEY, type PhotoUploadProgress, type UploadProblems } from './upload-photos';
export type { LocalRecord, RejectedChange } from '@/lib/sync/local-state';
export type { Sheet, SheetKind, SheetStatus } from '@/lib/sheets/sheet-schema';
export type { BenchEntry, PhotoMeta } from '@/lib/bench/bench-entry-schema';
