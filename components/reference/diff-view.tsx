'use client';

import { useQuery } from '@tanstack/react-query';
import type { ReferenceValue } from '@/lib/reference/properties';
import { type EditionInfo, getJson, propertyLabel, qualifiers } from './format';

export interface DiffViewProps {
  fromId: string;
  toId: string;
}

interface DiffBody {
  from: EditionInfo;
  to: EditionInfo;
  diff: {
    added: { key: string; after: ReferenceValue }[];
    removed: { key: string; before: ReferenceValue }[];
    changed: { key: string; before: ReferenceValue; after: ReferenceValue; fields: string[] }[];
    unchanged: number;
  };
}

const what = (v: ReferenceValue) => `${v.species} (${v.phase}) · ${propertyLabel(v.property)}${qualifiers(v) ? ` · ${qualifiers(v)}` : ''}`;
const num = (v: ReferenceValue) => `${v.value}${v.uncertainty ? ` ± ${v.uncertainty}` : ''} ${v.unit === '1' ? '' : v.unit}`;

/** What changes from one edition to another: added, changed (old → new) and removed values. */
export function DiffView({ fromId, toId }: DiffViewProps) {
  const q = useQuery({ queryKey: ['editions', 'diff', fromId, toId], queryFn: () => getJson<DiffBody>(`/api/v1/editions/diff?from=${fromId}&to=${toId}`) });
  if (q.isPending) return <p role="status">Comparing…</p>;
  if (q.isError) return <p role="alert" className="field-error">{(q.error as Error).message}</p>;
  const { from, to, diff } = q.data;
  return (
    <div className="space-y-3">
      <p className="text-sm" role="status">
        From No. {from.number} to No. {to.number}: <strong>{diff.added.length} added</strong>, <strong>{diff.changed.length} changed</strong>,{' '}
        <strong>{diff.removed.length} removed</strong>, {diff.unchanged} unchanged.
      </p>
      {diff.added.length + diff.changed.length + diff.removed.length === 0 ? <p className="text-sm text-ink-soft">The two editions hold the same values.</p> : null}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">
            Differences from edition No. {from.number} to No. {to.number}
          </caption>
          <thead className="border-b border-rule text-ink-soft">
            <tr>
              <th scope="col" className="py-2 pr-3 font-medium">Change</th>
              <th scope="col" className="py-2 pr-3 font-medium">Value of</th>
              <th scope="col" className="py-2 pr-3 font-medium">No. {from.number}</th>
              <th scope="col" className="py-2 pr-3 font-medium">No. {to.number}</th>
            </tr>
          </thead>
          <tbody>
            {diff.added.map((d) => (
              <tr key={`a-${d.key}`} className="border-b border-rule/60 align-top">
                <td className="py-2 pr-3 font-medium">+ added</td>
                <td className="py-2 pr-3">{what(d.after)}</td>
                <td className="py-2 pr-3 text-ink-soft">—</td>
                <td className="py-2 pr-3 tabular-nums">{num(d.after)}</td>
              </tr>
            ))}
            {diff.changed.map((d) => (
              <tr key={`c-${d.key}`} className="border-b border-rule/60 align-top">
                <td className="py-2 pr-3 font-medium">
                  ~ changed
                  <span className="block text-xs font-normal text-ink-soft">{d.fields.join(', ')}</span>
                </td>
                <td className="py-2 pr-3">{what(d.after)}</td>
                <td className="py-2 pr-3 tabular-nums">{num(d.before)}</td>
                <td className="py-2 pr-3 tabular-nums">{num(d.after)}</td>
              </tr>
            ))}
            {diff.removed.map((d) => (
              <tr key={`r-${d.key}`} className="border-b border-rule/60 align-top">
                <td className="py-2 pr-3 font-medium">− removed</td>
                <td className="py-2 pr-3">{what(d.before)}</td>
                <td className="py-2 pr-3 tabular-nums">{num(d.before)}</td>
                <td className="py-2 pr-3 text-ink-soft">—</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
