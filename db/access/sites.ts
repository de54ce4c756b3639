import 'server-only';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { sites } from '@/db/schema';
import { AppError } from '@/lib/server/errors';

export async function getSiteOrThrow(siteId: string) {
  const [row] = await db().select().from(sites).where(eq(sites.id, siteId));
  if (!row) throw new AppError('not_found', 'No such site.');
  return row;
}
