import 'server-only';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { AppError } from '@/lib/server/errors';

/** A user of the caller's site, or 404 (another site's user is indistinguishable from none). */
export async function getUserOrThrow(siteId: string, userId: string) {
  const [row] = await db().select().from(users).where(and(eq(users.id, userId), eq(users.siteId, siteId)));
  if (!row) throw new AppError('not_found', 'No such user on this site.');
  return row;
}

export function publicUser(u: typeof users.$inferSelect) {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    status: u.status,
    lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
    createdAt: u.createdAt.toISOString(),
  };
}
