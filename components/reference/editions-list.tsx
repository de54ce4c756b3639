'use client';

import { useMutation, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { postJson } from '@/components/ui/post-json';
import { type EditionInfo, formatDate, getJson } from './format';
import { StateBadge } from './state-badge';

interface ListBody {
  editions: EditionInfo[];
  people: Record<string, string>;
}

export function useEditionList() {
  return useQuery({ queryKey: ['editions', 'list'], queryFn: () => getJson<ListBody>('/api/v1/editions') });
}

/** Every edition of the site with its state; start a draft; pick two to compare. */
export function EditionsList() {
  const router = useRouter();
  const list = useEditionList();
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const start = useMutation({
    mutationFn: async () => {
      const res = await postJson<{ edition: EditionInfo }>('/api/v1/editions', { changeSummary: '' });
      if (!res.ok) throw new Error(res.message);
      return res.data.edition;
    },
    onSuccess: (e) => router.push(`/editions/${e.id}`),
  });
  const editions = list.data?.editions ?? [];
  const people = list.data?.people ?? {};
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className="btn-primary" onClick={() => start.mutate()} disabled={start.isPending}>
          Start a new draft
        </button>
        <a href="/api/v1/editions/template" className="btn-quiet" download>
          Download the CSV template
        </a>
        {start.isError ? <p role="alert" className="field-error">{(start.error as Error).message}</p> : null}
      </div>
      {list.isPending ? <p role="status">Loading editions…</p> : null}
      {list.isError ? <p role="alert" className="field-error">{(list.error as Error).message}</p> : null}
      <div className="panel overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Reference editions of this site</caption>
          <thead className="border-b border-rule text-ink-soft">
            <tr>
              <th scope="col" className="py-2 pr-3 font-medium">No.</th>
              <th scope="col" className="py-2 pr-3 font-medium">State</th>
              <th scope="col" className="py-2 pr-3 font-medium">Author</th>
              <th scope="col" className="py-2 pr-3 font-medium">Approved by</th>
              <th scope="col" className="py-2 pr-3 font-medium">Dates</th>
              <th scope="col" className="py-2 pr-3 font-medium">Values</th>
              <th scope="col" className="py-2 pr-3 font-medium">What it changes</th>
            </tr>
          </thead>
          <tbody>
            {editions.map((e) => (
              <tr key={e.id} className="border-b border-rule/60 align-top">
                <td className="py-2 pr-3">
                  <Link href={`/editions/${e.id}`} className="inline-flex min-h-touch items-center font-semibold underline">
                    No. {e.number}
                  </Link>
                </td>
                <td className="py-2 pr-3">
                  <StateBadge state={e.state} />
                </td>
                <td className="py-2 pr-3">{people[e.authorUserId] ?? '—'}</td>
                <td className="py-2 pr-3">{e.approverUserId ? (people[e.approverUserId] ?? '—') : '—'}</td>
                <td className="py-2 pr-3 text-xs text-ink-soft">
                  {e.inForceAt ? <span className="block">in force {formatDate(e.inForceAt)}</span> : <span className="block">drafted {formatDate(e.createdAt)}</span>}
                  {e.retiredAt ? <span className="block">retired {formatDate(e.retiredAt)}</span> : null}
                </td>
                <td className="py-2 pr-3 tabular-nums">{e.valueCount}</td>
                <td className="py-2 pr-3 text-xs text-ink-soft">
                  <span className="line-clamp-3">{e.changeSummary || '(no summary yet)'}</span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <form
        className="panel grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
        onSubmit={(ev) => {
          ev.preventDefault();
          if (from && to) router.push(`/editions/compare?from=${from}&to=${to}`);
        }}
      >
        <h2 className="sm:col-span-3">Compare two editions</h2>
        <EditionSelect id="compare-from" label="From" editions={editions} value={from} onChange={setFrom} />
        <EditionSelect id="compare-to" label="To" editions={editions} value={to} onChange={setTo} />
        <button type="submit" className="btn-quiet" disabled={!from || !to}>
          Compare
        </button>
      </form>
    </div>
  );
}

interface EditionSelectProps {
  id: string;
  label: string;
  editions: EditionInfo[];
  value: string;
  onChange: (id: string) => void;
}

function EditionSelect({ id, label, editions, value, onChange }: EditionSelectProps) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select id={id} className="field-input" value={value} onChange={(e) => onChange(e.target.value)} required>
        <option value="">Choose an edition</option>
        {editions.map((e) => (
          <option key={e.id} value={e.id}>
            No. {e.number} ({e.state.replace('_', ' ')})
          </option>
        ))}
      </select>
    </div>
  );
}
