// GET|POST /api/v1/admin/users – list the site's users; invite a new one by e-mail
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { publicUser } from '@/db/access/users';
import { users } from '@/db/schema';
import { createOneTimeLink, LINK_LIFETIME_MINUTES } from '@/lib/auth/links';
import { env } from '@/lib/env';
import { newId } from '@/lib/ids';
import { sendMail } from '@/lib/mail/send-mail';
import { audit } from '@/lib/server/audit';
import { AppError } from '@/lib/server/errors';
import { enforceRateLimit } from '@/lib/server/rate-limit';
import { requireUserActor, route } from '@/lib/server/route';
import { inviteUserSchema } from '@/lib/validation/admin';

export const GET = route({ requires: 'site.manage' }, async ({ actor }) => {
  const rows = await db().select().from(users).where(eq(users.siteId, actor.siteId)).orderBy(desc(users.createdAt));
  return { users: rows.map(publicUser) };
});

export const POST = route({ requires: 'site.manage' }, async ({ actor, body }) => {
  const admin = await requireUserActor(actor);
  const input = await body(inviteUserSchema);
  await enforceRateLimit(`invite:site:${actor.siteId}`, 50, 60 * 60);
  const [existing] = await db().select({ id: users.id }).from(users).where(eq(users.email, input.email));
  if (existing) throw new AppError('conflict', `There is already an account for ${input.email}.`, { fields: [{ field: 'email', message: 'Already has an account' }] });
  const id = newId();
  await db().transaction(async (tx) => {
    await tx.insert(users).values({ id, siteId: actor.siteId, email: input.email, displayName: input.displayName, role: input.role, status: 'invited', createdAt: new Date() });
    await audit(tx, actor, { action: 'user.invited', entityType: 'user', entityId: id, after: input });
  });
  const secret = await createOneTimeLink(id, 'invitation');
  const url = `${env().PUBLIC_URL}/invitation?token=${encodeURIComponent(secret)}`;
  await sendMail({
    to: input.email,
    subject: 'You are invited to Rungbook',
    text: `${admin.displayName} invited you to Rungbook as a ${input.role}.\n\nSet your password here (the link works once, within ${LINK_LIFETIME_MINUTES.invitation / 1440} days):\n\n${url}\n`,
  });
  const [row] = await db().select().from(users).where(eq(users.id, id));
  return Response.json({ user: publicUser(row!) }, { status: 201 });
});
