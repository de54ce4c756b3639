import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { editions, editionValueEvents, users } from '@/db/schema';
import { valueKey } from '@/lib/editions/value-key';
import type { Phase, PropertyCode, ReferenceValue } from '@/lib/reference/properties';
import { getEditionValuesByKey } from './edition-lookup';
import { publicEdition } from './editions';

/** One value's story at a site: its value in every edition, and every recorded change to it. */
export async function getValueHistory(siteId: string, q: { species: string; phase: Phase; property: PropertyCode; coordination?: number | undefined }) {
  const key = valueKey(q);
  const rows = await db().select().from(editions).where(eq(editions.siteId, siteId)).orderBy(asc(editions.number));
  const byEdition = await getEditionValuesByKey(rows.map((r) => r.id), key);
  const events = await db()
    .select({
      id: editionValueEvents.id,
      editionId: editionValueEvents.editionId,
      action: editionValueEvents.action,
      origin: editionValueEvents.origin,
      before: editionValueEvents.before,
      after: editionValueEvents.after,
      at: editionValueEvents.at,
      actorName: users.displayName,
    })
    .from(editionValueEvents)
    .leftJoin(users, eq(users.id, editionValueEvents.actorUserId))
    .where(and(eq(editionValueEvents.siteId, siteId), eq(editionValueEvents.valueKey, key)))
    .orderBy(asc(editionValueEvents.at), asc(editionValueEvents.id));
  return {
    key,
    editions: rows.map((r) => ({ edition: publicEdition(r), value: byEdition.get(r.id) ?? null })),
    events: events.map((e) => ({ ...e, before: e.before as ReferenceValue | null, after: e.after as ReferenceValue | null, at: e.at.toISOString() })),
  };
}
