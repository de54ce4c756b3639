import 'server-only';
import { eq } from 'drizzle-orm';
import { getToken } from 'next-auth/jwt';
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { env, isSecureUrl } from '@/lib/env';
import type { Actor } from '@/lib/server/actor';
import { rememberedDecode } from './remembered-decode';
import { can, type Permission } from './permissions';

export type UserActor = Extract<Actor, { kind: 'user' }>;

/**
 * The signed-in user, checked against the database on every request: a deactivated user, a
 * changed role or a bumped session version takes effect now, not when the JWT expires.
 *
 * The session cookie is decrypted and checked (signature, expiry) with next-auth's own `getToken`,
 * the same decode `getServerSession` does; what is skipped is the rest of its session action
 * (options set-up, CSRF cookie, callbacks and re-encrypting a cookie that an App Router
 * `getServerSession` call throws away anyway). The claims are the ones the `jwt` callback in
 * `./options` writes. No `Authorization` header is passed: API tokens are handled by the route
 * wrapper, never here.
 */
export const currentUser = cache(async (): Promise<UserActor | null> => {
  const store = await cookies();
  const token = await getToken({
    req: { cookies: store, headers: {} } as unknown as Parameters<typeof getToken>[0]['req'],
    secret: env().AUTH_SECRET,
    secureCookie: isSecureUrl(),
    decode: rememberedDecode,
  });
  const id = typeof token?.uid === 'string' ? token.uid : '';
  if (!token || !id) return null;
  const [row] = await db().select().from(users).where(eq(users.id, id));
  if (!row || row.status !== 'active' || row.sessionVersion !== Number(token.sv ?? 0)) return null;
  return { kind: 'user', userId: row.id, siteId: row.siteId, role: row.role, email: row.email, displayName: row.displayName };
});

/** For server-rendered pages: sign in first, and have the permission, or be sent away. */
export async function requirePageUser(permission: Permission = 'site.read', from = '/'): Promise<UserActor> {
  const user = await currentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(from)}`);
  if (!can(user.role, permission)) redirect(`/forbidden?need=${encodeURIComponent(permission)}`);
  return user;
}
