import 'server-only';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { apiTokens } from '@/db/schema';
import { AppError } from '@/lib/server/errors';

export async function getTokenOrThrow(siteId: string, tokenId: string) {
  const [row] = await db().select().from(apiTokens).where(and(eq(apiTokens.id, tokenId), eq(apiTokens.siteId, siteId)));
  if (!row) throw new AppError('not_found', 'No such API token on this site.');
  return row;
}

export function publicToken(t: Omit<typeof apiTokens.$inferSelect, 'tokenHash'> & { tokenHash?: string }) {
  return {
    id: t.id,
    name: t.name,
    role: t.role,
    prefix: t.prefix,
    createdAt: t.createdAt.toISOString(),
    lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
    revokedAt: t.revokedAt?.toISOString() ?? null,
  };
}
