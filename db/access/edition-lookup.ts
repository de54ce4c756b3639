import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import { db } from '@/db/client';
import { editionValues, refSpecies } from '@/db/schema';
import type { ReferenceValue } from '@/lib/reference/properties';
import { toReferenceValue } from './editions';

/** The value with one key in each of several editions (editionId → value). */
export async function getEditionValuesByKey(editionIds: string[], key: string): Promise<Map<string, ReferenceValue>> {
  const out = new Map<string, ReferenceValue>();
  if (editionIds.length === 0) return out;
  const rows = await db()
    .select({ editionId: editionValues.editionId, v: editionValues, s: refSpecies })
    .from(editionValues)
    .innerJoin(refSpecies, eq(refSpecies.id, editionValues.speciesId))
    .where(and(inArray(editionValues.editionId, editionIds), eq(editionValues.valueKey, key)));
  for (const { editionId, v, s } of rows) {
    out.set(editionId, toReferenceValue({ ...v, species: s.formula, phase: s.phase, charge: s.charge }));
  }
  return out;
}
