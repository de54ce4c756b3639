'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import type { ReferenceValue } from '@/lib/reference/properties';
import { type EditionInfo, formatDate, getJson, propertyLabel } from './format';
import { StateBadge } from './state-badge';

export interface ValueHistoryProps {
  species: string;
  phase: string;
  property: string;
  coordination?: string;
}

interface HistoryBody {
  key: string;
  editions: { edition: EditionInfo; value: ReferenceValue | null }[];
  events: { id: string; editionId: string; action: 'added' | 'changed' | 'removed'; origin: string; before: ReferenceValue | null; after: ReferenceValue | null; at: string; actorName: string | null }[];
}

const show = (v: ReferenceValue | null) => (v ? `${v.value}${v.uncertainty ? ` ± ${v.uncertainty}` : ''} ${v.unit === '1' ? '' : v.unit}` : '—');

/** One value across every edition of the site, and each recorded change to it. */
export function ValueHistory({ species, phase, property, coordination }: ValueHistoryProps) {
  const q = new URLSearchParams({ species, phase, property, ...(coordination ? { coordination } : {}) });
  const history = useQuery({ queryKey: ['editions', 'history', q.toString()], queryFn: () => getJson<HistoryBody>(`/api/v1/editions/history?${q.toString()}`) });
  const title = `${species} (${phase}) — ${propertyLabel(property)}${coordination ? `, CN ${coordination}` : ''}`;
  const numberOf = (id: string) => history.data?.editions.find((e) => e.edition.id === id)?.edition.number;
  return (
    <section aria-labelledby="history-title" className="space-y-4">
      <h1 id="history-title">History: {title}</h1>
      {history.isPending ? <p role="status">Loading…</p> : null}
      {history.isError ? <p role="alert" className="field-error">{(history.error as Error).message}</p> : null}
      {history.data ? (
        <>
          <div className="panel overflow-x-auto">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">The value in each edition</caption>
              <thead className="border-b border-rule text-ink-soft">
                <tr>
                  <th scope="col" className="py-2 pr-3 font-medium">Edition</th>
                  <th scope="col" className="py-2 pr-3 font-medium">State</th>
                  <th scope="col" className="py-2 pr-3 font-medium">Value</th>
                  <th scope="col" className="py-2 pr-3 font-medium">Source</th>
                </tr>
              </thead>
              <tbody>
                {history.data.editions.map(({ edition, value }) => (
                  <tr key={edition.id} className="border-b border-rule/60 align-top">
                    <td className="py-2 pr-3">
                      <Link href={`/editions/${edition.id}`} className="underline">
                        No. {edition.number}
                      </Link>
                    </td>
                    <td className="py-2 pr-3">
                      <StateBadge state={edition.state} />
                    </td>
                    <td className="py-2 pr-3 tabular-nums">{value ? show(value) : <span className="text-ink-soft">not in this edition</span>}</td>
                    <td className="py-2 pr-3 text-xs text-ink-soft">
                      {value?.fromMemory ? <strong className="mr-1 text-ember-700">from memory</strong> : null}
                      {value?.source || value?.note || ''}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="panel">
            <h2>Recorded changes</h2>
            {history.data.events.length === 0 ? <p className="text-sm text-ink-soft">No change to this value has been recorded.</p> : null}
            <ol className="mt-2 space-y-2 text-sm">
              {history.data.events.map((e) => (
                <li key={e.id} className="border-l-2 border-rule pl-3">
                  <span className="font-medium">{e.action}</span> in No. {numberOf(e.editionId) ?? '?'} ({e.origin}) · {formatDate(e.at)}
                  {e.actorName ? ` · ${e.actorName}` : ''}
                  <span className="block tabular-nums text-ink-soft">
                    {show(e.before)} → {show(e.after)}
                  </span>
                </li>
              ))}
            </ol>
          </div>
        </>
      ) : null}
    </section>
  );
}
