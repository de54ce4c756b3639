import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { sheets } from '@/db/schema';
import { AppError } from '@/lib/server/errors';
import type { Sheet } from '@/lib/sheets/sheet-schema';

export type SheetRow = typeof sheets.$inferSelect;

/** A sheet of the caller's site (tombstones included), or 404: another site's sheet is indistinguishable from none. */
export async function getSheetOrThrow(siteId: string, sheetId: string): Promise<SheetRow & { content: Sheet }> {
  const [row] = await db().select().from(sheets).where(and(eq(sheets.id, sheetId), eq(sheets.siteId, siteId)));
  if (!row) throw new AppError('not_found', 'No such sheet on this site.');
  return row as SheetRow & { content: Sheet };
}

/** The site's sheets for online screens and reports, newest change first. */
export async function listSheets(siteId: string, opts: { lotRef?: string; includeDeleted?: boolean; limit?: number } = {}): Promise<SheetRow[]> {
  const conds = [eq(sheets.siteId, siteId)];
  if (opts.lotRef) conds.push(eq(sheets.lotRef, opts.lotRef));
  if (!opts.includeDeleted) conds.push(eq(sheets.deleted, false));
  return db().select().from(sheets).where(and(...conds)).orderBy(desc(sheets.lastSeq)).limit(opts.limit ?? 200);
}
