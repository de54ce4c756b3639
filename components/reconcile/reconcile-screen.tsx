'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { ConflictReview } from './conflict-review';
import { fetchConflicts, type ConflictSummary } from './reconcile-api';

const AGES = [
  { value: '0', label: 'Any age' },
  { value: '1', label: 'Older than 1 hour' },
  { value: '24', label: 'Older than 1 day' },
  { value: '168', label: 'Older than 1 week' },
];

const KIND_LABEL: Record<string, string> = {
  cycle: 'Lattice cycle',
  dissolution: 'Dissolution',
  reaction: 'Reaction',
  calorimetry: 'Calorimetry',
  bench_entry: 'Bench entry',
  photo: 'Photo',
};

export const recordKindOf = (c: ConflictSummary) => c.sheetKind ?? c.entity;

/** The supervisors' reconcile queue: conflicts between edits and edition drift, settled one by one. */
export function ReconcileScreen() {
  const [status, setStatus] = useState<'open' | 'resolved'>('open');
  const list = useQuery({ queryKey: ['conflicts', status], queryFn: () => fetchConflicts(status) });
  const [kind, setKind] = useState('');
  const [age, setAge] = useState('0');
  const [author, setAuthor] = useState('');
  const [selected, setSelected] = useState<string | null>(null);

  const conflicts = list.data;
  const authors = useMemo(() => {
    const m = new Map<string, string>();
    for (const c of conflicts ?? []) for (const a of c.authors) m.set(a.id, a.name);
    return [...m].sort((a, b) => a[1].localeCompare(b[1]));
  }, [conflicts]);
  const kinds = useMemo(() => [...new Set((conflicts ?? []).map(recordKindOf))].sort(), [conflicts]);
  const shown = (conflicts ?? []).filter(
    (c) =>
      (!kind || (kind === 'drift' ? c.kind === 'drift' : recordKindOf(c) === kind)) &&
      (!author || c.authors.some((a) => a.id === author)) &&
      list.dataUpdatedAt - Date.parse(c.createdAt) >= Number(age) * 3600_000,
  );

  return (
    <section aria-labelledby="reconcile-title" className="space-y-4">
      <div>
        <h1 id="reconcile-title">Reconcile</h1>
        <p className="max-w-prose text-ink-soft">
          Edits that crossed while devices were offline, and sheets whose reference edition was retired before they reached the server. Each is kept whole
          until you settle it; your decision reaches every device on its next sync.
        </p>
      </div>
      <form className="panel grid gap-3 sm:grid-cols-4" onSubmit={(e) => e.preventDefault()} aria-label="Filter the queue">
        <label className="field-label">
          Show
          <select className="field-input" value={status} onChange={(e) => (setStatus(e.target.value as 'open' | 'resolved'), setSelected(null))}>
            <option value="open">Waiting</option>
            <option value="resolved">Settled</option>
          </select>
        </label>
        <label className="field-label">
          Kind
          <select className="field-input" value={kind} onChange={(e) => setKind(e.target.value)}>
            <option value="">All kinds</option>
            <option value="drift">Edition drift only</option>
            {kinds.map((k) => (
              <option key={k} value={k}>
                {KIND_LABEL[k] ?? k}
              </option>
            ))}
          </select>
        </label>
        <label className="field-label">
          Age
          <select className="field-input" value={age} onChange={(e) => setAge(e.target.value)}>
            {AGES.map((a) => (
              <option key={a.value} value={a.value}>
                {a.label}
              </option>
            ))}
          </select>
        </label>
        <label className="field-label">
          Author
          <select className="field-input" value={author} onChange={(e) => setAuthor(e.target.value)}>
            <option value="">Anyone</option>
            {authors.map(([id, name]) => (
              <option key={id} value={id}>
                {name}
              </option>
            ))}
          </select>
        </label>
      </form>

      {list.isPending ? <p>Loading the queue…</p> : null}
      {list.isError ? (
        <p role="alert" className="field-error">
          {list.error.message}
        </p>
      ) : null}
      {conflicts && shown.length === 0 ? <p className="panel">Nothing {status === 'open' ? 'waiting' : 'settled'} matches these filters.</p> : null}
      {shown.length > 0 ? (
        <ul className="space-y-2" aria-label="Conflicts">
          {shown.map((c) => (
            <li key={c.id}>
              <button
                type="button"
                className={`panel flex w-full min-h-touch flex-wrap items-baseline justify-between gap-2 text-left hover:bg-paper-deep ${selected === c.id ? 'border-verdigris-500 ring-2 ring-verdigris-500' : ''}`}
                aria-pressed={selected === c.id}
                onClick={() => setSelected(selected === c.id ? null : c.id)}
              >
                <span>
                  <span className="font-semibold">{c.title}</span>
                  <span className="ml-2 text-sm text-ink-soft">{KIND_LABEL[recordKindOf(c)] ?? recordKindOf(c)}</span>
                </span>
                <span className="text-sm">
                  <span className="rounded border border-rule px-2 py-0.5">{c.kind === 'drift' ? 'Edition drift' : `${c.versionCount} device version${c.versionCount === 1 ? '' : 's'}`}</span>
                  <span className="ml-2 text-ink-soft">
                    {c.authors.map((a) => a.name).join(', ')} · {new Date(c.createdAt).toLocaleString()}
                  </span>
                </span>
              </button>
              {selected === c.id ? <ConflictReview conflictId={c.id} onSettled={() => setSelected(null)} /> : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
