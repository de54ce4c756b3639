// GET|POST /api/v1/admin/tokens – list the site's API tokens; create one (its secret is shown once)
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { publicToken } from '@/db/access/tokens';
import { apiTokens } from '@/db/schema';
import { newId } from '@/lib/ids';
import { audit } from '@/lib/server/audit';
import { requireUserActor, route } from '@/lib/server/route';
import { hashSecret, newSecret } from '@/lib/server/secrets';
import { createTokenSchema } from '@/lib/validation/admin';

export const GET = route({ requires: 'site.manage' }, async ({ actor }) => {
  const rows = await db().select().from(apiTokens).where(eq(apiTokens.siteId, actor.siteId)).orderBy(desc(apiTokens.createdAt));
  return { tokens: rows.map(publicToken) };
});

export const POST = route({ requires: 'site.manage' }, async ({ actor, body }) => {
  const admin = await requireUserActor(actor);
  const input = await body(createTokenSchema);
  const secret = newSecret('rbt_');
  const id = newId();
  const row = { id, siteId: actor.siteId, name: input.name, role: input.role, tokenHash: hashSecret(secret), prefix: secret.slice(0, 10), createdBy: admin.id, createdAt: new Date() };
  await db().transaction(async (tx) => {
    await tx.insert(apiTokens).values(row);
    await audit(tx, actor, { action: 'token.created', entityType: 'api_token', entityId: id, after: { name: input.name, role: input.role, prefix: row.prefix } });
  });
  return Response.json({ token: publicToken({ ...row, lastUsedAt: null, revokedAt: null }), secret }, { status: 201 });
});
