import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { getSiteOrThrow } from '@/db/access/sites';
import { areas, users } from '@/db/schema';
import { requirePageUser } from '@/lib/auth/current';
import type { WorkbenchContext } from '@/components/sheets/workbench-context';

/**
 * What the sheet screens need from the server, rendered into the page (and so into the copy the
 * service worker keeps): who is signed in, the site's areas and people, and the unit preference.
 */
export async function loadSheetsContext(from: string): Promise<WorkbenchContext> {
  const user = await requirePageUser('site.read', from);
  const [site, siteAreas, people] = await Promise.all([
    getSiteOrThrow(user.siteId),
    db().select({ id: areas.id, name: areas.name }).from(areas).where(eq(areas.siteId, user.siteId)).orderBy(asc(areas.name)),
    db().select({ id: users.id, displayName: users.displayName, role: users.role, preferredUnit: users.preferredUnit }).from(users).where(eq(users.siteId, user.siteId)).orderBy(asc(users.displayName)),
  ]);
  const me = people.find((p) => p.id === user.userId);
  return {
    identity: { userId: user.userId, siteId: user.siteId, role: user.role, displayName: user.displayName, email: user.email, siteName: site.name },
    areas: siteAreas,
    people: people.map((p) => ({ id: p.id, displayName: p.displayName, role: p.role })),
    preferredUnit: me?.preferredUnit ?? 'kJ/mol',
  };
}
