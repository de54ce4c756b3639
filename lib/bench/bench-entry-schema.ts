// The synced BENCH ENTRY record (a note at the bench, tied to a lot and optionally a sheet) and the
// append-only PHOTO metadata record. Pure zod, shared by the local store and the sync push handler.
// Photo blobs are not synced records: they sit in the device's `photos` table and upload separately.
import { z } from 'zod';
import { isoTimeSchema, recordIdSchema, refIdSchema } from '@/lib/sheets/sheet-schema';

export const benchEntrySchema = z.object({
  id: recordIdSchema,
  note: z.string().max(20_000),
  lotRef: z.string().trim().max(80).nullable(),
  areaId: refIdSchema.nullable(),
  tags: z.array(z.string().trim().min(1).max(40)).max(30),
  sheetId: recordIdSchema.nullable(),
  photoIds: z.array(recordIdSchema).max(50),
  authorId: refIdSchema,
  deleted: z.boolean(),
  createdAt: isoTimeSchema,
  updatedAt: isoTimeSchema,
});
export type BenchEntry = z.infer<typeof benchEntrySchema>;

export const BENCH_MERGE_FIELDS = ['note', 'lotRef', 'areaId', 'tags', 'sheetId', 'photoIds', 'deleted'] as const;

/** Photo metadata: written once, never changed (a changed push is rejected for good). */
export const photoMetaSchema = z.object({
  id: recordIdSchema,
  benchEntryId: recordIdSchema,
  contentType: z.enum(['image/jpeg', 'image/png', 'image/webp']),
  byteSize: z.number().int().min(1).max(25_000_000),
  /** Hex SHA-256 of the blob, so an upload can be checked against what the device took. */
  sha256: z.string().regex(/^[0-9a-f]{64}$/, { message: 'Must be a lowercase hex SHA-256' }),
  caption: z.string().max(500),
  takenAt: isoTimeSchema,
  authorId: refIdSchema,
  createdAt: isoTimeSchema,
});
export type PhotoMeta = z.infer<typeof photoMetaSchema>;
