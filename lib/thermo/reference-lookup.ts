// Adapter from an edition's ReferenceValue list to the lookup function the builders take.
import type { Phase, PropertyCode, ReferenceValue } from '../reference/properties';
import type { NumberInput } from './decimal';

export interface LookedUpValue {
  value: NumberInput;
  uncertainty?: NumberInput | null;
  source?: string;
  fromMemory?: boolean;
}

/** `(species, phase, property) => value | undefined` — plug in any reference edition. */
export type ReferenceLookup = (species: string, phase: Phase, property: PropertyCode) => LookedUpValue | undefined;

/** Build a lookup over an edition's values; the first match wins. */
export function lookupFromReferenceValues(values: readonly ReferenceValue[]): ReferenceLookup {
  const index = new Map<string, ReferenceValue>();
  for (const v of values) {
    const key = `${v.species}|${v.phase}|${v.property}`;
    if (!index.has(key)) index.set(key, v);
  }
  return (species, phase, property) => {
    const hit = index.get(`${species}|${phase}|${property}`);
    if (!hit) return undefined;
    return {
      value: hit.value,
      uncertainty: hit.uncertainty,
      source: hit.fromMemory ? `${hit.source || 'no citation'} (from memory)` : hit.source,
      fromMemory: hit.fromMemory,
    };
  };
}

/** A lookup over a small literal table: `{ 'Ca|g|ionization_energy_1': { value: '589.8' } }`. */
export function lookupFromTable(table: Readonly<Record<string, LookedUpValue>>): ReferenceLookup {
  return (species, phase, property) => table[`${species}|${phase}|${property}`];
}
