import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { getSiteOrThrow } from '@/db/access/sites';
import { areas, users } from '@/db/schema';
import { requirePageUser } from '@/lib/auth/current';
import type { BenchSite } from './bench-site-context';

/**
 * What the bench screens need from the server, rendered into the page (and so into the copy the
 * service worker keeps for this user): who is signed in, the site's areas and people.
 */
export async function loadBenchSite(from: string): Promise<BenchSite> {
  const user = await requirePageUser('site.read', from);
  const [site, siteAreas, people] = await Promise.all([
    getSiteOrThrow(user.siteId),
    db().select({ id: areas.id, name: areas.name }).from(areas).where(eq(areas.siteId, user.siteId)).orderBy(asc(areas.name)),
    db().select({ id: users.id, displayName: users.displayName }).from(users).where(eq(users.siteId, user.siteId)).orderBy(asc(users.displayName)),
  ]);
  return {
    identity: { userId: user.userId, siteId: user.siteId, role: user.role, displayName: user.displayName, email: user.email, siteName: site.name },
    areas: siteAreas,
    people,
  };
}
