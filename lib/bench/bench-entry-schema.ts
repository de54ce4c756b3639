// The synced BENCH ENTRY record (a note at the bench, tied to a lot and optionally a sheet) and the
// append-only PHOTO metadata record. Pure zod/mini, shared by the local store and the sync push handler.
// Photo blobs are not synced records: they sit in the device's `photos` table and upload separately.
import * as z from '@/lib/validation/zod-mini';
import { isoTimeSchema, recordIdSchema, refIdSchema } from '@/lib/sheets/sheet-schema';

export const benchEntrySchema = z.object({
  id: recordIdSchema,
  note: z.string().check(z.maxLength(20_000)),
  lotRef: z.nullable(z.string().check(z.trim(), z.maxLength(80))),
  areaId: z.nullable(refIdSchema),
  tags: z.array(z.string().check(z.trim(), z.minLength(1), z.maxLength(40))).check(z.maxLength(30)),
  sheetId: z.nullable(recordIdSchema),
  photoIds: z.array(recordIdSchema).check(z.maxLength(50)),
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
  byteSize: z.number().check(z.int(), z.minimum(1), z.maximum(25_000_000)),
  /** Hex SHA-256 of the blob, so an upload can be checked against what the device took. */
  sha256: z.string().check(z.regex(/^[0-9a-f]{64}$/, { message: 'Must be a lowercase hex SHA-256' })),
  caption: z.string().check(z.maxLength(500)),
  takenAt: isoTimeSchema,
  authorId: refIdSchema,
  createdAt: isoTimeSchema,
});
export type PhotoMeta = z.infer<typeof photoMetaSchema>;
