// The identity of a reference value across editions, and the comparison of two values.
// Pure module: runs on the server and in the browser.
import type { ReferenceValue } from '@/lib/reference/properties';

/** `species|phase|property|coordination` — one value per key in an edition. */
export function valueKey(v: Pick<ReferenceValue, 'species' | 'phase' | 'property' | 'coordination'>): string {
  return `${v.species}|${v.phase}|${v.property}|${v.coordination ?? ''}`;
}

/** The fields compared when deciding whether a value changed between editions. */
export const COMPARED_FIELDS = ['value', 'uncertainty', 'unit', 'charge', 'structure', 'scale', 'source', 'fromMemory', 'note'] as const;
export type ComparedField = (typeof COMPARED_FIELDS)[number];

/** A value in canonical form: optional fields present only when set, in a fixed order. */
export function canonicalValue(v: ReferenceValue): ReferenceValue {
  return {
    species: v.species,
    phase: v.phase,
    charge: v.charge,
    property: v.property,
    value: v.value,
    uncertainty: v.uncertainty ?? null,
    unit: v.unit,
    ...(v.coordination != null ? { coordination: v.coordination } : {}),
    ...(v.structure ? { structure: v.structure } : {}),
    ...(v.scale ? { scale: v.scale } : {}),
    source: v.source,
    fromMemory: v.fromMemory,
    ...(v.note ? { note: v.note } : {}),
  };
}

/** The fields that differ between two values with the same key (empty when equal). */
export function changedFields(a: ReferenceValue, b: ReferenceValue): ComparedField[] {
  const norm = (x: unknown) => (x === undefined || x === '' ? null : x);
  return COMPARED_FIELDS.filter((f) => norm(a[f]) !== norm(b[f]));
}

export function sameValue(a: ReferenceValue, b: ReferenceValue): boolean {
  return changedFields(a, b).length === 0;
}

/** Stable order for lists and exports: by species, phase, property, coordination. */
export function compareValues(a: ReferenceValue, b: ReferenceValue): number {
  return (
    a.species.localeCompare(b.species, 'en') ||
    a.phase.localeCompare(b.phase) ||
    a.property.localeCompare(b.property) ||
    (a.coordination ?? 0) - (b.coordination ?? 0)
  );
}
