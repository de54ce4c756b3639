import 'server-only';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db/client';
import { editions, editionValues, refSpecies, users } from '@/db/schema';
import type { HydrationScale, Phase, PropertyCode, ReferenceValue } from '@/lib/reference/properties';
import type { Edition } from '@/lib/editions/edition';
import { AppError } from '@/lib/server/errors';

export type EditionRow = typeof editions.$inferSelect;
export type { Edition } from '@/lib/editions/edition';

export function editionEtag(row: Pick<EditionRow, 'id' | 'revision' | 'updatedAt'>): string {
  // Every step sets updatedAt (state, summary, rejection); every value change bumps the revision.
  return `"ed-${row.id}-r${row.revision}-${row.updatedAt.getTime().toString(36)}"`;
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function publicEdition(row: EditionRow): Edition {
  return {
    id: row.id,
    siteId: row.siteId,
    number: row.number,
    state: row.state,
    baseEditionId: row.baseEditionId,
    changeSummary: row.changeSummary,
    authorUserId: row.authorUserId,
    approverUserId: row.approverUserId,
    rejectedByUserId: row.rejectedByUserId,
    rejectionReason: row.rejectionReason,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    submittedAt: iso(row.submittedAt),
    rejectedAt: iso(row.rejectedAt),
    inForceAt: iso(row.inForceAt),
    retiredAt: iso(row.retiredAt),
    revision: row.revision,
    valueCount: row.valueCount,
    contentHash: row.contentHash,
    etag: editionEtag(row),
  };
}

/** The edition in force at a site, or null when the site has none yet. */
export async function getEditionInForce(siteId: string, tx: Db | Tx = db()): Promise<(Edition & { state: 'in_force' }) | null> {
  const [row] = await tx.select().from(editions).where(and(eq(editions.siteId, siteId), eq(editions.state, 'in_force')));
  return row ? (publicEdition(row) as Edition & { state: 'in_force' }) : null;
}

/** Just the ETag of the edition in force (one narrow indexed read): the 304 path needs nothing more. */
export async function getEditionInForceEtag(siteId: string): Promise<string | null> {
  const [row] = await db()
    .select({ id: editions.id, revision: editions.revision, updatedAt: editions.updatedAt })
    .from(editions)
    .where(and(eq(editions.siteId, siteId), eq(editions.state, 'in_force')));
  return row ? editionEtag(row) : null;
}

/** An edition of the caller's site (any state — retired editions stay readable), or 404. */
export async function getEditionOrThrow(siteId: string, editionId: string, tx: Db | Tx = db()): Promise<Edition> {
  const [row] = await tx.select().from(editions).where(and(eq(editions.id, editionId), eq(editions.siteId, siteId)));
  if (!row) throw new AppError('not_found', 'No such reference edition on this site.');
  return publicEdition(row);
}

/** One stored value (joined with its species) as a ReferenceValue; absent qualifiers are left out. */
export function toReferenceValue(r: {
  species: string;
  phase: string;
  charge: number;
  property: string;
  value: string;
  uncertainty: string | null;
  unit: string;
  coordination: number | null;
  structure: string | null;
  scale: string | null;
  source: string;
  fromMemory: boolean;
  note: string | null;
}): ReferenceValue {
  return {
    species: r.species,
    phase: r.phase as Phase,
    charge: r.charge,
    property: r.property as PropertyCode,
    value: r.value,
    uncertainty: r.uncertainty,
    unit: r.unit,
    ...(r.coordination !== null ? { coordination: r.coordination } : {}),
    ...(r.structure !== null ? { structure: r.structure } : {}),
    ...(r.scale !== null ? { scale: r.scale as HydrationScale } : {}),
    source: r.source,
    fromMemory: r.fromMemory,
    ...(r.note !== null ? { note: r.note } : {}),
  };
}

/** The values of one edition as ReferenceValues (decimals as strings), in species order. */
export async function getEditionValues(editionId: string, tx: Db | Tx = db()): Promise<ReferenceValue[]> {
  const rows = await tx
    .select({
      species: refSpecies.formula,
      phase: refSpecies.phase,
      charge: refSpecies.charge,
      property: editionValues.property,
      value: editionValues.value,
      uncertainty: editionValues.uncertainty,
      unit: editionValues.unit,
      coordination: editionValues.coordination,
      structure: editionValues.structure,
      scale: editionValues.scale,
      source: editionValues.source,
      fromMemory: editionValues.fromMemory,
      note: editionValues.note,
    })
    .from(editionValues)
    .innerJoin(refSpecies, eq(refSpecies.id, editionValues.speciesId))
    .where(eq(editionValues.editionId, editionId))
    .orderBy(asc(editionValues.valueKey));
  return rows.map(toReferenceValue);
}

/** All editions of a site, newest number first. */
export async function listEditions(siteId: string): Promise<Edition[]> {
  const rows = await db().select().from(editions).where(eq(editions.siteId, siteId)).orderBy(asc(editions.number));
  return rows.map(publicEdition).reverse();
}

/** Display names for the people named on editions (author, approver, rejecter). */
export async function peopleNames(siteId: string, list: Edition[]): Promise<Record<string, string>> {
  const ids = [...new Set(list.flatMap((e) => [e.authorUserId, e.approverUserId, e.rejectedByUserId]).filter((x): x is string => !!x))];
  if (ids.length === 0) return {};
  const rows = await db().select({ id: users.id, name: users.displayName }).from(users).where(and(eq(users.siteId, siteId), inArray(users.id, ids)));
  return Object.fromEntries(rows.map((r) => [r.id, r.name]));
}
