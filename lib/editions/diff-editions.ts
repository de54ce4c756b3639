// The difference between two sets of reference values (two editions, or a draft and its base).
import type { ReferenceValue } from '@/lib/reference/properties';
import { changedFields, compareValues, type ComparedField, valueKey } from './value-key';

export interface EditionDiff {
  added: { key: string; after: ReferenceValue }[];
  removed: { key: string; before: ReferenceValue }[];
  changed: { key: string; before: ReferenceValue; after: ReferenceValue; fields: ComparedField[] }[];
  unchanged: number;
}

export function indexValues(values: readonly ReferenceValue[]): Map<string, ReferenceValue> {
  const map = new Map<string, ReferenceValue>();
  for (const v of values) map.set(valueKey(v), v);
  return map;
}

/** What changes when going from `from` to `to`; each list in species order. */
export function diffEditions(from: readonly ReferenceValue[], to: readonly ReferenceValue[]): EditionDiff {
  const a = indexValues(from);
  const b = indexValues(to);
  const out: EditionDiff = { added: [], removed: [], changed: [], unchanged: 0 };
  for (const [key, after] of b) {
    const before = a.get(key);
    if (!before) out.added.push({ key, after });
    else {
      const fields = changedFields(before, after);
      if (fields.length) out.changed.push({ key, before, after, fields });
      else out.unchanged++;
    }
  }
  for (const [key, before] of a) if (!b.has(key)) out.removed.push({ key, before });
  out.added.sort((x, y) => compareValues(x.after, y.after));
  out.removed.sort((x, y) => compareValues(x.before, y.before));
  out.changed.sort((x, y) => compareValues(x.after, y.after));
  return out;
}
