'use client';

import Link from 'next/link';
import { formatDate } from './format';
import { ReferenceTable } from './reference-table';
import { useEditionInForce } from './reference-source';

/** The Reference screen: the edition in force, searchable, with each value's source. */
export function ReferenceBrowser() {
  const q = useEditionInForce();
  if (q.status === 'loading') return <p role="status">Loading the edition in force…</p>;
  if (q.status === 'error') return <p role="alert" className="field-error">{q.message}</p>;
  if (q.status === 'none') {
    return (
      <p className="panel">
        No reference edition is in force on this site yet. <Link href="/editions" className="underline">Start a draft</Link>.
      </p>
    );
  }
  const { edition, values } = q.data;
  return (
    <div className="space-y-4">
      <div className="panel flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">Edition in force</p>
          <p className="text-xl font-semibold">No. {edition.number}</p>
          <p className="text-sm text-ink-soft">
            In force since {formatDate(edition.inForceAt)} · {edition.valueCount} values
          </p>
          <p className="text-xs text-ink-soft">
            {q.from === 'device' ? `This device’s copy, downloaded ${formatDate(q.fetchedAt)}; it works offline.` : 'Read from the server; this device keeps its own copy at its next sync.'}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link href={`/editions/${edition.id}`} className="btn-quiet">
            About this edition
          </Link>
          <Link href="/editions" className="btn-quiet">
            All editions
          </Link>
        </div>
      </div>
      <ReferenceTable values={values} caption={`Values of edition No. ${edition.number}, in force`} />
    </div>
  );
}
