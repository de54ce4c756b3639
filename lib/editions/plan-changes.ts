// Apply a validated change list to a draft's values, in memory: the preview and the new values.
// Errors that need the draft (removing a value it lacks, a duplicate key, mixing hydration scales)
// are reported by row; the caller applies nothing when there is any.
import type { ReferenceValue } from '@/lib/reference/properties';
import { indexValues } from './diff-editions';
import type { ParsedRow, RowError } from './parse-change-csv';
import { changedFields, type ComparedField, valueKey } from './value-key';

export interface PlannedChange {
  row: number;
  key: string;
  kind: 'added' | 'changed' | 'removed' | 'unchanged';
  before: ReferenceValue | null;
  after: ReferenceValue | null;
  fields: ComparedField[];
}

export type Plan = { ok: true; changes: PlannedChange[]; values: ReferenceValue[]; counts: Record<PlannedChange['kind'], number> } | { ok: false; errors: RowError[] };

export function planChanges(current: readonly ReferenceValue[], rows: readonly ParsedRow[]): Plan {
  const values = indexValues(current);
  const errors: RowError[] = [];
  const firstRow = new Map<string, number>();
  const changes: PlannedChange[] = [];
  for (const { row, change } of rows) {
    const key = change.action === 'set' ? valueKey(change.value) : valueKey(change.key);
    const earlier = firstRow.get(key);
    if (earlier !== undefined) {
      errors.push({ row, column: 'species', message: `duplicate row: row ${earlier} already changes ${describe(key)}` });
      continue;
    }
    firstRow.set(key, row);
    const before = values.get(key) ?? null;
    if (change.action === 'remove') {
      if (!before) {
        errors.push({ row, column: 'species', message: `cannot remove ${describe(key)}: the draft has no such value` });
        continue;
      }
      values.delete(key);
      changes.push({ row, key, kind: 'removed', before, after: null, fields: [] });
    } else {
      const fields = before ? changedFields(before, change.value) : [];
      values.set(key, change.value);
      changes.push({ row, key, kind: before ? (fields.length ? 'changed' : 'unchanged') : 'added', before, after: change.value, fields });
    }
  }
  // Every hydration enthalpy in one edition is on ONE scale (design.md §5).
  const scales = new Map<string, string>();
  for (const v of values.values()) if (v.property === 'hydration_enthalpy' && v.scale) scales.set(v.scale, valueKey(v));
  if (scales.size > 1) {
    for (const c of changes) {
      if (c.after?.property === 'hydration_enthalpy' && c.after.scale) {
        const other = [...scales.keys()].find((s) => s !== c.after!.scale);
        errors.push({ row: c.row, column: 'hydration_scale', message: `hydration enthalpies in one edition must share one scale: this row is ${c.after.scale}, the edition also holds ${other} values` });
      }
    }
    if (!errors.some((e) => e.column === 'hydration_scale')) {
      errors.push({ row: rows[0]?.row ?? 2, column: 'hydration_scale', message: 'after these changes the edition would mix hydration scales' });
    }
  }
  if (errors.length) return { ok: false, errors: errors.sort((a, b) => a.row - b.row) };
  const counts = { added: 0, changed: 0, removed: 0, unchanged: 0 };
  for (const c of changes) counts[c.kind]++;
  return { ok: true, changes, values: [...values.values()], counts };
}

function describe(key: string): string {
  const [species, phase, property, cn] = key.split('|');
  return `${species}(${phase}) ${property}${cn ? ` CN ${cn}` : ''}`;
}
