// PATCH /api/v1/admin/users/:userId – change a user's role, deactivate or reactivate them
import { eq, sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { getUserOrThrow, publicUser } from '@/db/access/users';
import { users } from '@/db/schema';
import { audit } from '@/lib/server/audit';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';
import { updateUserSchema } from '@/lib/validation/admin';

export const PATCH = route({ requires: 'site.manage' }, async ({ actor, body, params }) => {
  const input = await body(updateUserSchema);
  const user = await getUserOrThrow(actor.siteId, String(params.userId));
  if (actor.kind === 'user' && user.id === actor.userId) {
    throw new AppError('conflict', 'You cannot change your own role or deactivate yourself; ask another admin.');
  }
  if (input.status === 'active' && user.status === 'invited') {
    throw new AppError('conflict', 'This user has not accepted the invitation yet.', { fields: [{ field: 'status', message: 'Invitation not accepted' }] });
  }
  const next = { role: input.role ?? user.role, status: input.status ?? user.status };
  await db().transaction(async (tx) => {
    // A new session version signs the user out everywhere: their next request is refused.
    await tx
      .update(users)
      .set({ ...next, sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(eq(users.id, user.id));
    await audit(tx, actor, { action: 'user.updated', entityType: 'user', entityId: user.id, before: { role: user.role, status: user.status }, after: next });
  });
  return { user: publicUser(await getUserOrThrow(actor.siteId, user.id)) };
});
