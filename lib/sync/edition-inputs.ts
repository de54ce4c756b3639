// Re-read a sheet's edition inputs from another edition (edition drift, "re-solve with the edition
// in force"). Pure: the caller passes a lookup over the edition's values.
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';

export interface EditionValueLookup {
  (species: string, phase: string, property: string): { value: string; uncertainty: string | null; source: string } | undefined;
}

export interface Substituted {
  problem: Record<string, unknown>;
  inputs: ResolvedInput[];
  /** Inputs the other edition has no value for (they keep the pinned edition's value). */
  missing: string[];
}

/**
 * Replace every `edition` input of `problem` (at its path) with the value from `lookup`, keeping the
 * shape at that path: an object `{ value, uncertainty, source }` stays an object, a bare number or
 * decimal string becomes the new decimal string.
 */
export function substituteEditionValues(problem: Record<string, unknown>, inputs: ResolvedInput[], editionId: string, lookup: EditionValueLookup): Substituted {
  const copy = structuredClone(problem);
  const missing: string[] = [];
  const nextInputs = inputs.map((input) => {
    if (input.origin.type !== 'edition') return input;
    const { species, phase, property } = input.origin;
    const hit = lookup(species, phase, property);
    if (!hit) {
      missing.push(`${species}(${phase}) ${property}`);
      return input;
    }
    const parentPath = input.path.slice(0, -1);
    const last = input.path[input.path.length - 1]!;
    let parent: unknown = copy;
    for (const step of parentPath) parent = parent && typeof parent === 'object' ? (parent as Record<string | number, unknown>)[step] : undefined;
    if (!parent || typeof parent !== 'object') {
      missing.push(`${input.path.join('.')} (no such place in the problem)`);
      return input;
    }
    const holder = parent as Record<string | number, unknown>;
    const old = holder[last];
    holder[last] = old && typeof old === 'object' ? { ...(old as object), value: hit.value, uncertainty: hit.uncertainty, source: hit.source } : hit.value;
    return { ...input, origin: { ...input.origin, editionId } };
  });
  return { problem: copy, inputs: nextInputs, missing };
}
