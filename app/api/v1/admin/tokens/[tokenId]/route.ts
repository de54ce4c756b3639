// DELETE /api/v1/admin/tokens/:tokenId – revoke an API token (kept, marked revoked)
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { getTokenOrThrow, publicToken } from '@/db/access/tokens';
import { apiTokens } from '@/db/schema';
import { audit } from '@/lib/server/audit';
import { route } from '@/lib/server/route';

export const DELETE = route({ requires: 'site.manage' }, async ({ actor, params }) => {
  const token = await getTokenOrThrow(actor.siteId, String(params.tokenId));
  if (!token.revokedAt) {
    const revokedAt = new Date();
    await db().transaction(async (tx) => {
      await tx.update(apiTokens).set({ revokedAt }).where(eq(apiTokens.id, token.id));
      await audit(tx, actor, { action: 'token.revoked', entityType: 'api_token', entityId: token.id, before: { revokedAt: null }, after: { revokedAt } });
    });
  }
  return { token: publicToken(await getTokenOrThrow(actor.siteId, token.id)) };
});
