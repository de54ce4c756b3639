// The reference values a sheet draws on: the edition in force (as cached on the device) and, for a
// saved sheet, the edition values it already carries (its pinned values re-solve the same forever).
import type { Phase, PropertyCode, ReferenceValue } from '@/lib/reference/properties';
import { lookupFromReferenceValues, type ReferenceLookup } from '@/lib/thermo/reference-lookup';

export interface EditionInUse {
  id: string;
  number: number | null;
  state: string | null;
  values: ReferenceValue[];
}

/** Read the body of GET /api/v1/editions/current as cached by the local store; null if unusable. */
export function editionFromCache(body: unknown): EditionInUse | null {
  if (!body || typeof body !== 'object') return null;
  const { edition, values } = body as { edition?: { id?: unknown; number?: unknown; state?: unknown }; values?: unknown };
  if (!edition || typeof edition.id !== 'string' || !Array.isArray(values)) return null;
  return {
    id: edition.id,
    number: typeof edition.number === 'number' ? edition.number : null,
    state: typeof edition.state === 'string' ? edition.state : null,
    values: values as ReferenceValue[],
  };
}

export function editionLabel(e: { number: number | null; id: string } | null): string {
  if (!e) return 'no edition';
  return e.number !== null ? `edition No. ${e.number}` : `edition ${e.id.slice(0, 8)}`;
}

/** Salt formulas in the edition (solids with an enthalpy of formation), for the formula suggestions. */
export function saltSuggestions(values: readonly ReferenceValue[]): string[] {
  const out = new Set<string>();
  for (const v of values) if (v.phase === 'cr' && v.property === 'enthalpy_of_formation' && v.charge === 0 && !v.species.includes('·')) out.add(v.species);
  return [...out].sort((a, b) => a.localeCompare(b));
}

export function editionLookup(edition: EditionInUse | null): ReferenceLookup | null {
  return edition ? lookupFromReferenceValues(edition.values) : null;
}

/** One value of an edition (first match), with its unit and scale, e.g. an ionic radius for CN 6. */
export function findValue(values: readonly ReferenceValue[], species: string, phase: Phase, property: PropertyCode, pick?: (v: ReferenceValue) => boolean): ReferenceValue | undefined {
  return values.find((v) => v.species === species && v.phase === phase && v.property === property && (!pick || pick(v)));
}
