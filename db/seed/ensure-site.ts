import 'server-only';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { areas, sites, users, type Role } from '@/db/schema';
import { hashPassword } from '@/lib/auth/passwords';
import { newId } from '@/lib/ids';

/** Idempotent: returns the site's id, creating the site only when its code is new. */
export async function ensureSite(code: string, name: string): Promise<{ id: string; created: boolean }> {
  const [existing] = await db().select().from(sites).where(eq(sites.code, code));
  if (existing) return { id: existing.id, created: false };
  const id = newId();
  await db().insert(sites).values({ id, code, name, createdAt: new Date() });
  return { id, created: true };
}

export async function ensureArea(siteId: string, name: string): Promise<string> {
  const [existing] = await db().select().from(areas).where(and(eq(areas.siteId, siteId), eq(areas.name, name)));
  if (existing) return existing.id;
  const id = newId();
  await db().insert(areas).values({ id, siteId, name, createdAt: new Date() });
  return id;
}

/** Creates an active user when the e-mail is new; never changes an existing account. */
export async function ensureUser(siteId: string, u: { email: string; displayName: string; role: Role; password: string }): Promise<{ id: string; created: boolean }> {
  const [existing] = await db().select().from(users).where(eq(users.email, u.email));
  if (existing) return { id: existing.id, created: false };
  const id = newId();
  await db().insert(users).values({
    id,
    siteId,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    status: 'active',
    passwordHash: await hashPassword(u.password),
    createdAt: new Date(),
  });
  return { id, created: true };
}
