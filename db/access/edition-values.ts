import 'server-only';
import { createHash } from 'node:crypto';
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Db, Tx } from '@/db/client';
import { auditLog, editionValueEvents, editionValues, refProperties, refSpecies } from '@/db/schema';
import { canonicalValue, compareValues, valueKey } from '@/lib/editions/value-key';
import { newId } from '@/lib/ids';
import { PROPERTIES, PROPERTY_CODES, type ReferenceValue } from '@/lib/reference/properties';
import type { Actor } from '@/lib/server/actor';

const CHUNK = 500;
function chunks<T>(list: readonly T[], size = CHUNK): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < list.length; i += size) out.push(list.slice(i, i + size));
  return out;
}

/** Mirror the property vocabulary into ref_properties (idempotent). */
export async function ensureProperties(tx: Db | Tx): Promise<void> {
  await tx
    .insert(refProperties)
    .values(PROPERTY_CODES.map((code) => ({ code, label: PROPERTIES[code].label, unit: PROPERTIES[code].unit, kind: PROPERTIES[code].kind })))
    .onDuplicateKeyUpdate({ set: { label: sql`VALUES(label)`, unit: sql`VALUES(unit)`, kind: sql`VALUES(kind)` } });
}

/** Species ids for the values' (formula, phase, charge), creating the species that are new. */
async function speciesIds(tx: Db | Tx, values: readonly ReferenceValue[]): Promise<Map<string, string>> {
  const wanted = new Map<string, { formula: string; phase: ReferenceValue['phase']; charge: number }>();
  for (const v of values) wanted.set(`${v.species}|${v.phase}|${v.charge}`, { formula: v.species, phase: v.phase, charge: v.charge });
  const ids = new Map<string, string>();
  if (wanted.size === 0) return ids;
  const now = new Date();
  for (const part of chunks([...wanted.values()])) {
    await tx
      .insert(refSpecies)
      .values(part.map((s) => ({ id: newId(), ...s, createdAt: now })))
      .onDuplicateKeyUpdate({ set: { formula: sql`formula` } });
  }
  for (const part of chunks([...new Set([...wanted.values()].map((s) => s.formula))])) {
    const rows = await tx.select().from(refSpecies).where(inArray(refSpecies.formula, part));
    for (const r of rows) ids.set(`${r.formula}|${r.phase}|${r.charge}`, r.id);
  }
  return ids;
}

/** Insert values into an edition (keys must not be present yet). */
export async function insertValues(tx: Db | Tx, editionId: string, values: readonly ReferenceValue[]): Promise<void> {
  if (values.length === 0) return;
  const ids = await speciesIds(tx, values);
  for (const part of chunks(values)) {
    await tx.insert(editionValues).values(
      part.map((v) => ({
        id: newId(),
        editionId,
        speciesId: ids.get(`${v.species}|${v.phase}|${v.charge}`)!,
        property: v.property,
        coordination: v.coordination ?? null,
        valueKey: valueKey(v),
        value: v.value,
        uncertainty: v.uncertainty ?? null,
        unit: v.unit,
        structure: v.structure ?? null,
        scale: v.scale ?? null,
        source: v.source,
        fromMemory: v.fromMemory,
        note: v.note ?? null,
      })),
    );
  }
}

export async function deleteValues(tx: Db | Tx, editionId: string, keys: readonly string[]): Promise<void> {
  for (const part of chunks(keys)) await tx.delete(editionValues).where(and(eq(editionValues.editionId, editionId), inArray(editionValues.valueKey, part)));
}

export interface ValueEvent {
  key: string;
  action: 'added' | 'changed' | 'removed';
  before: ReferenceValue | null;
  after: ReferenceValue | null;
}

/** Record each change as a value event and an audit-log entry, in the caller's transaction. */
export async function recordValueEvents(
  tx: Db | Tx,
  siteId: string,
  editionId: string,
  events: readonly ValueEvent[],
  origin: 'editor' | 'import' | 'rebase' | 'seed',
  actor: Actor | null,
  at = new Date(),
): Promise<void> {
  const actorUserId = actor?.kind === 'user' ? actor.userId : null;
  const rows = events.map((e) => ({ id: newId(), siteId, editionId, valueKey: e.key, action: e.action, before: e.before, after: e.after, origin, actorUserId, at }));
  for (const part of chunks(rows)) {
    await tx.insert(editionValueEvents).values(part);
    if (actor) {
      await tx.insert(auditLog).values(
        part.map((r) => ({
          siteId,
          actorUserId,
          actorTokenId: actor.kind === 'token' ? actor.tokenId : null,
          action: `edition.value_${r.action}`,
          entityType: 'edition_value',
          entityId: r.id,
          before: r.before ? { editionId, key: r.valueKey, value: r.before } : null,
          after: r.after ? { editionId, key: r.valueKey, value: r.after, origin } : { editionId, key: r.valueKey, origin },
          at,
        })),
      );
    }
  }
}

/** SHA-256 over the canonical values in key order: the same values always give the same hash. */
export function contentHash(values: readonly ReferenceValue[]): string {
  const sorted = [...values].map(canonicalValue).sort(compareValues);
  return createHash('sha256').update(JSON.stringify(sorted)).digest('hex');
}
