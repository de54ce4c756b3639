// Where the workbench gets reference values: first the values a saved sheet already carries (its
// pinned values), then the edition in force on this device. Every value says which edition it is from.
import type { Phase, PropertyCode, ReferenceValue } from '@/lib/reference/properties';
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';
import type { ReferenceLookup } from '@/lib/thermo/engine';
import type { EditionInUse } from './edition-source';

export interface SourcedValue {
  value: string;
  uncertainty: string | null;
  source: string;
  editionId: string;
  structure?: string;
  coordination?: number;
  scale?: string;
}

export interface ValueSource {
  /** Edition in force (or null when the device has none yet). */
  edition: EditionInUse | null;
  get(species: string, phase: Phase, property: PropertyCode, opts?: { coordination?: number }): SourcedValue | undefined;
}

function readAt(root: unknown, path: readonly (string | number)[]): unknown {
  let cur: unknown = root;
  for (const step of path) cur = cur && typeof cur === 'object' ? (cur as Record<string | number, unknown>)[step] : undefined;
  return cur;
}

function citation(v: ReferenceValue): string {
  return v.fromMemory ? `${v.source || 'no citation'} (from memory)` : v.source;
}

/** Build the value source for a sheet: its stored edition inputs first, then the edition in force. */
export function makeValueSource(edition: EditionInUse | null, stored?: { problem: unknown; inputs: readonly ResolvedInput[] } | null): ValueSource {
  const pinned = new Map<string, SourcedValue>();
  for (const input of stored?.inputs ?? []) {
    if (input.origin.type !== 'edition') continue;
    const at = readAt(stored?.problem, input.path);
    let v: SourcedValue | undefined;
    if (at && typeof at === 'object' && 'value' in at) {
      const o = at as { value: string | number; uncertainty?: string | number | null; source?: string };
      v = { value: String(o.value), uncertainty: o.uncertainty === null || o.uncertainty === undefined ? null : String(o.uncertainty), source: o.source ?? 'pinned edition value', editionId: input.origin.editionId };
    } else if (typeof at === 'string' || typeof at === 'number') {
      v = { value: String(at), uncertainty: null, source: 'pinned edition value', editionId: input.origin.editionId };
    }
    if (v) pinned.set(`${input.origin.species}|${input.origin.phase}|${input.origin.property}`, v);
  }
  const index = new Map<string, ReferenceValue[]>();
  for (const v of edition?.values ?? []) {
    const key = `${v.species}|${v.phase}|${v.property}`;
    const list = index.get(key);
    if (list) list.push(v);
    else index.set(key, [v]);
  }
  return {
    edition,
    get(species, phase, property, opts) {
      const key = `${species}|${phase}|${property}`;
      const p = pinned.get(key);
      if (p) return p;
      const list = index.get(key);
      if (!list || !edition) return undefined;
      const want = opts?.coordination;
      const v = (want !== undefined ? list.find((x) => x.coordination === want) : undefined) ?? list[0]!;
      return {
        value: v.value,
        uncertainty: v.uncertainty,
        source: citation(v),
        editionId: edition.id,
        ...(v.structure ? { structure: v.structure } : {}),
        ...(v.coordination !== undefined ? { coordination: v.coordination } : {}),
        ...(v.scale ? { scale: v.scale } : {}),
      };
    },
  };
}

export interface TracedHit {
  species: string;
  phase: Phase;
  property: PropertyCode;
  editionId: string;
  source: string;
}

/**
 * A lookup for the engine's builders that records which (species, phase, property) answered each
 * value — the cycle builder tries fallbacks, and the sheet must name the one actually used. The
 * hit's index rides on the source text and `untag` takes it off again.
 */
export function tracingLookup(values: ValueSource): { lookup: ReferenceLookup; untag(source: string | null): TracedHit | null } {
  const hits: TracedHit[] = [];
  const MARK = '\u0000#';
  const lookup: ReferenceLookup = (species, phase, property) => {
    const v = values.get(species, phase, property);
    if (!v) return undefined;
    hits.push({ species, phase, property, editionId: v.editionId, source: v.source });
    return { value: v.value, uncertainty: v.uncertainty, source: `${MARK}${hits.length - 1}` };
  };
  const untag = (source: string | null): TracedHit | null => {
    if (!source) return null;
    const i = source.lastIndexOf(MARK);
    return i < 0 ? null : (hits[Number(source.slice(i + MARK.length))] ?? null);
  };
  return { lookup, untag };
}

/** Edition species name of an ion: Ca2+, Cl-, O2-. */
export function ionSpecies(symbol: string, charge: number): string {
  const m = Math.abs(charge);
  return `${symbol}${m === 1 ? '' : m}${charge > 0 ? '+' : '-'}`;
}
