'use client';

import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import type { ReferenceValue } from '@/lib/reference/properties';
import { propertyLabel } from './format';

export interface CsvImportProps {
  editionId: string;
}

interface RowError {
  row: number;
  column: string | null;
  message: string;
}
interface PlannedChange {
  row: number;
  key: string;
  kind: 'added' | 'changed' | 'removed' | 'unchanged';
  before: ReferenceValue | null;
  after: ReferenceValue | null;
}
interface ImportAnswer {
  applied: boolean;
  counts: Record<PlannedChange['kind'], number>;
  changes: PlannedChange[];
}

type Outcome = { kind: 'preview' | 'applied'; answer: ImportAnswer } | { kind: 'errors'; message: string; rows: RowError[] } | { kind: 'failed'; message: string };

async function sendFile(editionId: string, file: File, mode: 'preview' | 'apply'): Promise<Outcome> {
  let res: Response;
  try {
    res = await fetch(`/api/v1/editions/${editionId}/import?mode=${mode}`, { method: 'POST', headers: { 'Content-Type': 'text/csv' }, body: file });
  } catch {
    return { kind: 'failed', message: 'No connection to the server. Check the network and try again.' };
  }
  const data = await res.json().catch(() => null);
  if (res.ok) return { kind: mode === 'apply' ? 'applied' : 'preview', answer: data as ImportAnswer };
  if (data?.error?.rows) return { kind: 'errors', message: data.error.message, rows: data.error.rows };
  return { kind: 'failed', message: data?.error?.message ?? `The server answered ${res.status}.` };
}

const show = (v: ReferenceValue | null) => (v ? `${v.value} ${v.unit === '1' ? '' : v.unit}` : '—');

/** Import a change-list CSV into a draft: preview first (nothing applied), then apply all rows or none. */
export function CsvImport({ editionId }: CsvImportProps) {
  const id = useId();
  const qc = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  const run = async (mode: 'preview' | 'apply') => {
    if (!file) return;
    setBusy(true);
    const result = await sendFile(editionId, file, mode);
    setOutcome(result);
    setBusy(false);
    if (result.kind === 'applied') void qc.invalidateQueries({ queryKey: ['editions'] });
  };

  return (
    <section aria-labelledby={`${id}-title`} className="panel space-y-3">
      <h2 id={`${id}-title`}>Import a change list (CSV)</h2>
      <p className="text-sm text-ink-soft">
        Each row sets a value or removes one (column <code>action</code>). Every row is checked first; if any row has an error, nothing
        is applied. Energies may be given in kJ/mol, kcal/mol or eV; radii in pm or Å. UTF-8, with or without BOM; up to 10 000 rows and 2 MiB.{' '}
        <a href="/api/v1/editions/template" download className="underline">
          Download the template
        </a>
        .
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor={`${id}-file`} className="field-label">
            CSV file
          </label>
          <input
            id={`${id}-file`}
            type="file"
            accept=".csv,text/csv"
            className="field-input"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setOutcome(null);
            }}
          />
        </div>
        <button type="button" className="btn-quiet" disabled={!file || busy} onClick={() => void run('preview')}>
          Preview the changes
        </button>
        {outcome?.kind === 'preview' ? (
          <button type="button" className="btn-primary" disabled={busy} onClick={() => void run('apply')}>
            Apply {outcome.answer.counts.added + outcome.answer.counts.changed + outcome.answer.counts.removed} changes
          </button>
        ) : null}
      </div>
      {outcome?.kind === 'failed' ? <p role="alert" className="field-error">{outcome.message}</p> : null}
      {outcome?.kind === 'errors' ? (
        <div role="alert" className="space-y-2">
          <p className="field-error">{outcome.message.split(' — ')[0]}. Fix these rows and preview again:</p>
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Errors by row and column</caption>
            <thead className="border-b border-rule text-ink-soft">
              <tr>
                <th scope="col" className="py-1 pr-3 font-medium">Row</th>
                <th scope="col" className="py-1 pr-3 font-medium">Column</th>
                <th scope="col" className="py-1 pr-3 font-medium">Problem</th>
              </tr>
            </thead>
            <tbody>
              {outcome.rows.slice(0, 200).map((e, i) => (
                <tr key={i} className="border-b border-rule/60">
                  <td className="py-1 pr-3 tabular-nums">{e.row}</td>
                  <td className="py-1 pr-3">{e.column ?? '(whole row)'}</td>
                  <td className="py-1 pr-3">{e.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {outcome.rows.length > 200 ? <p className="text-sm">…and {outcome.rows.length - 200} more.</p> : null}
        </div>
      ) : null}
      {outcome?.kind === 'preview' || outcome?.kind === 'applied' ? (
        <div className="space-y-2" role="status">
          <p className="text-sm">
            {outcome.kind === 'applied' ? 'Applied to the draft: ' : 'Preview (nothing applied yet): '}
            <strong>{outcome.answer.counts.added} added</strong>, <strong>{outcome.answer.counts.changed} changed</strong>,{' '}
            <strong>{outcome.answer.counts.removed} removed</strong>, {outcome.answer.counts.unchanged} unchanged.
          </p>
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Effect of the file on the draft</caption>
            <thead className="border-b border-rule text-ink-soft">
              <tr>
                <th scope="col" className="py-1 pr-3 font-medium">Row</th>
                <th scope="col" className="py-1 pr-3 font-medium">Effect</th>
                <th scope="col" className="py-1 pr-3 font-medium">Value of</th>
                <th scope="col" className="py-1 pr-3 font-medium">Old → new</th>
              </tr>
            </thead>
            <tbody>
              {outcome.answer.changes
                .filter((c) => c.kind !== 'unchanged')
                .slice(0, 300)
                .map((c) => {
                  const v = (c.after ?? c.before)!;
                  return (
                    <tr key={c.row} className="border-b border-rule/60">
                      <td className="py-1 pr-3 tabular-nums">{c.row}</td>
                      <td className="py-1 pr-3">{c.kind}</td>
                      <td className="py-1 pr-3">
                        {v.species} ({v.phase}) · {propertyLabel(v.property)}
                        {v.coordination != null ? ` · CN ${v.coordination}` : ''}
                      </td>
                      <td className="py-1 pr-3 tabular-nums">
                        {show(c.before)} → {show(c.after)}
                      </td>
                    </tr>
                  );
                })}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
