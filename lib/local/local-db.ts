// The device's local store: one IndexedDB database (Dexie) per signed-in user, so a shared tablet
// never mixes two people's waiting changes. Client-only: never import from a server module.
import Dexie, { type Table } from 'dexie';
import type { BenchEntry, PhotoMeta } from '@/lib/bench/bench-entry-schema';
import type { ReferenceValue } from '@/lib/reference/properties';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { Entity } from '@/lib/sync/protocol';
import type { LocalRecord, QueuedMutation, RejectedChange } from '@/lib/sync/local-state';

/** The signed-in identity, cached after an online sign-in so screens work offline. */
export interface LocalIdentity {
  userId: string;
  siteId: string;
  role: 'technician' | 'supervisor' | 'admin';
  displayName: string;
  email: string;
  siteName?: string;
}

/** The body of GET /api/v1/editions/current: the edition's header and all its values. */
export interface EditionInForceBody {
  edition: { id: string; number: number; state: string; etag: string; changeSummary: string; inForceAt: string | null; [key: string]: unknown };
  values: ReferenceValue[];
}

/** The edition in force as last pulled (GET /api/v1/editions/current, refreshed with If-None-Match). */
export interface CachedEdition {
  key: 'current';
  etag: string | null;
  fetchedAt: string;
  /** The endpoint's JSON body as served: `edition` (id, number, …) and `values`. */
  edition: EditionInForceBody;
}

/** A photo's bytes, kept on the device until uploaded (the bench log uploads them separately). */
export interface PhotoBlob {
  id: string;
  blob: Blob;
  uploadedAt: string | null;
}

export interface MetaRow {
  key: string;
  value: unknown;
}

export type QueuedRow = QueuedMutation & { recordKey: string };

export class RungbookLocalDb extends Dexie {
  sheets!: Table<LocalRecord<Sheet>, string>;
  benchEntries!: Table<LocalRecord<BenchEntry>, string>;
  photoMeta!: Table<LocalRecord<PhotoMeta>, string>;
  photos!: Table<PhotoBlob, string>;
  /** Waiting to sync: one row per record (edits merge), ordered by when first queued. */
  outbox!: Table<QueuedRow, string>;
  /** Changes the server rejected for good, with the reason; kept until the user exports/dismisses them. */
  rejected!: Table<RejectedChange, string>;
  edition!: Table<CachedEdition, string>;
  meta!: Table<MetaRow, string>;

  constructor(readonly userId: string) {
    super(localDbName(userId));
    this.version(1).stores({
      sheets: 'id, serverSeq',
      benchEntries: 'id, serverSeq',
      photoMeta: 'id, serverSeq',
      photos: 'id',
      outbox: 'mutationId, &recordKey, queuedAt',
      rejected: 'mutationId, rejectedAt',
      edition: 'key',
      meta: 'key',
    });
  }

  tableFor(entity: Entity): Table<LocalRecord, string> {
    const t = entity === 'sheet' ? this.sheets : entity === 'bench_entry' ? this.benchEntries : this.photoMeta;
    return t as unknown as Table<LocalRecord, string>;
  }
}

export const localDbName = (userId: string) => `rungbook-${userId}`;
export const recordKey = (entity: Entity, recordId: string) => `${entity}:${recordId}`;
