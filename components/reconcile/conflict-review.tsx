'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { fetchConflict, resolve, type ConflictDetail, type ResolveBody } from './reconcile-api';

export interface ConflictReviewProps {
  conflictId: string;
  onSettled: () => void;
}

const FIELD_LABEL: Record<string, string> = {
  title: 'Title',
  lotRef: 'Lot / batch',
  areaId: 'Area',
  note: 'Note',
  status: 'Status',
  problem: 'Problem (inputs)',
  inputs: 'Input sources',
  pinnedEditionId: 'Pinned edition',
  deleted: 'Deleted',
  tags: 'Tags',
  sheetId: 'Sheet',
  photoIds: 'Photos',
};

/** Both versions side by side with the differing fields marked, and the ways to settle them. */
export function ConflictReview({ conflictId, onSettled }: ConflictReviewProps) {
  const qc = useQueryClient();
  const detail = useQuery({ queryKey: ['conflict', conflictId], queryFn: () => fetchConflict(conflictId) });
  const [choice, setChoice] = useState<Record<string, string>>({});
  const settle = useMutation({
    mutationFn: (body: ResolveBody) => resolve(conflictId, body),
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: ['conflicts'] });
      onSettled();
    },
  });

  if (detail.isPending) return <p className="p-4">Loading both versions…</p>;
  if (detail.isError) return <p role="alert" className="field-error p-4">{detail.error.message}</p>;
  const c = detail.data;
  const open = c.status === 'open';

  return (
    <div className="panel mt-2 space-y-4" aria-label={`Review of ${c.title}`}>
      {c.drift ? <DriftSummary c={c} /> : null}
      {!c.drift || c.versions.length > 0 ? <EditComparison c={c} choice={choice} setChoice={setChoice} open={open} /> : null}
      {settle.isError ? (
        <p role="alert" className="field-error">
          {settle.error.message}
        </p>
      ) : null}
      {open ? (
        <div className="flex flex-wrap gap-2" role="group" aria-label="Settle">
          {c.drift ? (
            <>
              <button type="button" className="btn-quiet" disabled={settle.isPending} onClick={() => settle.mutate({ action: 'keep_pinned' })}>
                Keep the pinned edition
              </button>
              <button type="button" className="btn-primary" disabled={settle.isPending} onClick={() => settle.mutate({ action: 'resolve_in_force' })}>
                Re-solve with the edition in force
              </button>
            </>
          ) : null}
          {!c.drift || c.versions.length > 0 ? (
            <>
              {c.drift ? null : (
                <button type="button" className="btn-quiet" disabled={settle.isPending} onClick={() => settle.mutate({ action: 'keep_server' })}>
                  Keep the server&apos;s version
                </button>
              )}
              {c.versions.map((v, i) => (
                <button key={v.id} type="button" className="btn-quiet" disabled={settle.isPending} onClick={() => settle.mutate({ action: 'keep_device', versionId: v.id })}>
                  Keep device version {i + 1} ({v.userName})
                </button>
              ))}
              <button
                type="button"
                className="btn-primary"
                disabled={settle.isPending || c.differences.length === 0}
                onClick={() => settle.mutate({ action: 'merge', fields: Object.fromEntries(c.differences.map((d) => [d.field, choice[d.field] ?? 'server'])) })}
              >
                Merge the chosen fields
              </button>
            </>
          ) : null}
        </div>
      ) : (
        <p className="text-sm text-ink-soft">Settled.</p>
      )}
    </div>
  );
}

function show(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'string') return v === '' ? '(empty)' : v;
  return JSON.stringify(v, null, 1);
}

function Value({ v }: { v: unknown }) {
  const text = show(v);
  if (text.length <= 120) return <span className="whitespace-pre-wrap break-words">{text}</span>;
  return (
    <details>
      <summary className="cursor-pointer">{text.slice(0, 80)}…</summary>
      <pre className="mt-1 max-h-64 overflow-auto whitespace-pre-wrap break-words text-xs">{text}</pre>
    </details>
  );
}

function EditComparison({ c, choice, setChoice, open }: { c: ConflictDetail; choice: Record<string, string>; setChoice: (f: (x: Record<string, string>) => Record<string, string>) => void; open: boolean }) {
  const differing = new Set(c.differences.map((d) => d.field));
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-ink-soft">
          {differing.size} field{differing.size === 1 ? ' differs' : 's differ'}. The record shows the server&apos;s version until you settle it.
          {open && differing.size > 0 ? ' To merge, choose a source for each differing field.' : ''}
        </caption>
        <thead>
          <tr className="border-b border-rule text-left">
            <th scope="col" className="p-2">Field</th>
            <th scope="col" className="p-2">Server&apos;s version (revision {c.server.revision})</th>
            {c.versions.map((v, i) => (
              <th key={v.id} scope="col" className="p-2">
                Device version {i + 1}: {v.userName}, {new Date(v.createdAt).toLocaleString()} (made on revision {v.baseRevision})
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {c.mergeFields.map((field) => {
            const differs = differing.has(field);
            const label = FIELD_LABEL[field] ?? field;
            return (
              <tr key={field} className={`border-b border-rule align-top ${differs ? 'bg-brine-50' : ''}`}>
                <th scope="row" className="p-2 text-left font-medium">
                  {label}
                  {differs ? <span className="ml-1 block text-xs font-semibold uppercase tracking-wide text-brine-700">differs</span> : null}
                </th>
                <td className="p-2">
                  {differs && open ? (
                    <label className="flex min-h-touch items-start gap-2">
                      <input type="radio" className="mt-1 h-5 w-5" name={`pick-${field}`} checked={(choice[field] ?? 'server') === 'server'} onChange={() => setChoice((x) => ({ ...x, [field]: 'server' }))} aria-label={`${label}: use the server's value`} />
                      <Value v={c.server.content[field]} />
                    </label>
                  ) : (
                    <Value v={c.server.content[field]} />
                  )}
                </td>
                {c.versions.map((v, i) => (
                  <td key={v.id} className="p-2">
                    {differs && open ? (
                      <label className="flex min-h-touch items-start gap-2">
                        <input type="radio" className="mt-1 h-5 w-5" name={`pick-${field}`} checked={choice[field] === v.id} onChange={() => setChoice((x) => ({ ...x, [field]: v.id }))} aria-label={`${label}: use device version ${i + 1}`} />
                        <Value v={v.content[field]} />
                      </label>
                    ) : (
                      <Value v={v.content[field]} />
                    )}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** The headline number of a solve result, found by the engine's own field names. */
function headline(result: unknown): string {
  const r = (result as { result?: Record<string, unknown> } | null)?.result;
  if (!r) return show(result).slice(0, 200);
  for (const key of ['latticeEnthalpy', 'enthalpyOfSolution', 'reactionEnthalpy', 'solvedValue']) {
    const v = r[key] as { text?: string; value?: string } | undefined;
    if (v) return `${key.replace(/([A-Z])/g, ' $1').toLowerCase()}: ${v.text ?? v.value} kJ/mol`;
  }
  return show(r).slice(0, 200);
}

function DriftSummary({ c }: { c: ConflictDetail }) {
  const d = c.drift!;
  return (
    <div className="space-y-2 text-sm">
      <p>
        This sheet was solved with a reference edition that was retired before the sheet reached the server, and its numbers differ under the edition now
        in force.
      </p>
      <dl className="grid gap-2 sm:grid-cols-2">
        <div className="rounded border border-rule p-2">
          <dt className="font-medium">With the pinned edition</dt>
          <dd>{headline(d.pinnedResult)}</dd>
        </div>
        <div className="rounded border border-rule p-2">
          <dt className="font-medium">With the edition in force</dt>
          <dd>{headline(d.inForceResult)}</dd>
        </div>
      </dl>
      {d.missing.length > 0 ? <p>The edition in force has no value for: {d.missing.join(', ')} (the pinned values are kept for those).</p> : null}
    </div>
  );
}
