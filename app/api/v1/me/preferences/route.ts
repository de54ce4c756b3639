// PATCH /api/v1/me/preferences – save the signed-in user's energy unit (kJ/mol, kcal/mol or eV)
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { AppError } from '@/lib/server/errors';
import { route } from '@/lib/server/route';

const preferencesSchema = z.object({ preferredUnit: z.enum(['kJ/mol', 'kcal/mol', 'eV']) }).strict();

export const PATCH = route({ requires: 'site.read' }, async ({ actor, body }) => {
  if (actor.kind !== 'user') throw new AppError('forbidden', 'Preferences belong to a signed-in person, not an API token.');
  const { preferredUnit } = await body(preferencesSchema);
  await db().update(users).set({ preferredUnit }).where(and(eq(users.id, actor.userId), eq(users.siteId, actor.siteId)));
  return { preferredUnit };
});
