'use client';

import { useSearchParams } from 'next/navigation';
import { BenchEntryEditor } from './bench-entry-editor';
import { BenchEntryView } from './bench-entry-view';
import { useGoTo } from './go-to';

export interface BenchEntryShellProps {
  mode: 'open' | 'new';
}

/** The client side of /bench/open?id= and /bench/new?lot=&sheet=: everything comes from the URL and the local store. */
export function BenchEntryShell({ mode }: BenchEntryShellProps) {
  const params = useSearchParams();
  const goTo = useGoTo();
  if (mode === 'open') return <BenchEntryView id={params.get('id')} />;
  const lot = params.get('lot') ?? undefined;
  return (
    <div className="space-y-4">
      <h1>New bench entry</h1>
      <p className="text-ink-soft">Kept on this device at once and synced when there is a connection.</p>
      <BenchEntryEditor defaults={{ lotRef: lot, sheetId: params.get('sheet') ?? undefined }} onSaved={(id) => goTo(`/bench/open?id=${id}`)} onCancel={() => goTo(lot ? `/bench?lot=${encodeURIComponent(lot)}` : '/bench')} />
    </div>
  );
}
