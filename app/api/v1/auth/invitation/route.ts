// POST /api/v1/auth/invitation – accept an invitation: set a password and activate the account
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { consumeOneTimeLink } from '@/lib/auth/links';
import { hashPassword } from '@/lib/auth/passwords';
import { audit } from '@/lib/server/audit';
import { enforceRateLimit } from '@/lib/server/rate-limit';
import { route } from '@/lib/server/route';
import { acceptInvitationSchema } from '@/lib/validation/auth';

export const POST = route({ public: true }, async ({ body, req }) => {
  const input = await body(acceptInvitationSchema);
  const ip = req.headers.get('x-forwarded-for')?.split(',')[0]?.trim() || 'local';
  await enforceRateLimit(`invitation:ip:${ip}`, 30, 15 * 60);
  const user = await consumeOneTimeLink(input.token, 'invitation');
  const passwordHash = await hashPassword(input.password);
  await db().transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, status: 'active' }).where(eq(users.id, user.id));
    await audit(tx, { kind: 'user', userId: user.id, siteId: user.siteId, role: user.role, email: user.email, displayName: user.displayName }, {
      action: 'user.invitation_accepted',
      entityType: 'user',
      entityId: user.id,
      before: { status: user.status },
      after: { status: 'active' },
    });
  });
  return { ok: true, email: user.email };
});
