import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { db } from '@/db/client';
import { photoRecords } from '@/db/schema';
import { photoMetaSchema, type PhotoMeta } from '@/lib/bench/bench-entry-schema';
import { AppError } from '@/lib/server/errors';

export interface PhotoRecord {
  id: string;
  siteId: string;
  authorId: string;
  meta: PhotoMeta;
  /** When the photo's bytes reached object storage (null: only its record has synced so far). */
  blobStoredAt: Date | null;
}

/**
 * A photo record of the caller's site, or 404. Another site's photo is indistinguishable from a
 * missing one, so ids reveal nothing across sites.
 */
export async function getPhotoOrThrow(siteId: string, photoId: string): Promise<PhotoRecord> {
  const [row] = await db().select().from(photoRecords).where(and(eq(photoRecords.id, photoId), eq(photoRecords.siteId, siteId)));
  if (!row) throw new AppError('not_found', 'No such photo on this site. If it was taken on a device that has not synced yet, it arrives with its next sync.');
  const meta = photoMetaSchema.parse(typeof row.content === 'string' ? JSON.parse(row.content) : row.content);
  return { id: row.id, siteId: row.siteId, authorId: row.authorId, meta, blobStoredAt: row.blobStoredAt };
}

/** Mark the photo's bytes as stored; true if this call stored them first (a repeat upload changes nothing). */
export async function markPhotoStored(siteId: string, photoId: string, at = new Date()): Promise<boolean> {
  const [result] = await db()
    .update(photoRecords)
    .set({ blobStoredAt: at })
    .where(and(eq(photoRecords.id, photoId), eq(photoRecords.siteId, siteId), isNull(photoRecords.blobStoredAt)));
  return (result as { affectedRows?: number }).affectedRows === 1;
}
