import 'server-only';
import { eq } from 'drizzle-orm';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import type { Actor } from '@/lib/server/actor';
import { authOptions } from './options';
import { can, type Permission } from './permissions';

export type UserActor = Extract<Actor, { kind: 'user' }>;

/**
 * The signed-in user, checked against the database on every request: a deactivated user, a
 * changed role or a bumped session version takes effect now, not when the JWT expires.
 */
export const currentUser = cache(async (): Promise<UserActor | null> => {
  const session = await getServerSession(authOptions());
  const id = session?.user?.id;
  if (!id) return null;
  const [row] = await db().select().from(users).where(eq(users.id, id));
  if (!row || row.status !== 'active' || row.sessionVersion !== session.user.sv) return null;
  return { kind: 'user', userId: row.id, siteId: row.siteId, role: row.role, email: row.email, displayName: row.displayName };
});

/** For server-rendered pages: sign in first, and have the permission, or be sent away. */
export async function requirePageUser(permission: Permission = 'site.read', from = '/'): Promise<UserActor> {
  const user = await currentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(from)}`);
  if (!can(user.role, permission)) redirect(`/forbidden?need=${encodeURIComponent(permission)}`);
  return user;
}
