'use client';

import { useSearchParams } from 'next/navigation';
import { useEffect } from 'react';
import { warmOfflinePages } from '@/components/pwa/sw-messages';
import { BenchEntryEditor } from './bench-entry-editor';
import { BenchEntryView } from './bench-entry-view';
import { useBenchSite } from './bench-site-context';
import { useGoTo } from './go-to';

export interface BenchEntryShellProps {
  mode: 'open' | 'new';
}

/**
 * The client side of /bench/open?id= and /bench/new?lot=&sheet= (also /bench/open?new=1, the same
 * form under the always-kept shell when offline): everything comes from the URL and the local store.
 */
export function BenchEntryShell({ mode }: BenchEntryShellProps) {
  const params = useSearchParams();
  const goTo = useGoTo();
  const { identity } = useBenchSite();
  useKeepBenchPagesOffline(identity.userId);
  if (mode === 'open' && !params.get('new')) return <BenchEntryView id={params.get('id')} />;
  const lot = params.get('lot') ?? undefined;
  return (
    <div className="space-y-4">
      <h1>New bench entry</h1>
      <p className="text-ink-soft">Kept on this device at once and synced when there is a connection.</p>
      <BenchEntryEditor defaults={{ lotRef: lot, sheetId: params.get('sheet') ?? undefined }} onSaved={(id) => goTo(`/bench/open?id=${id}`)} onCancel={() => goTo(lot ? `/bench?lot=${encodeURIComponent(lot)}` : '/bench')} />
    </div>
  );
}

/** Ask the service worker to keep /bench/new for this user too (the shell paths are kept already). */
export function useKeepBenchPagesOffline(owner: string) {
  useEffect(() => {
    if (process.env.NODE_ENV !== 'production' || typeof navigator === 'undefined' || !navigator.onLine) return;
    void warmOfflinePages(owner, ['/bench/new']);
  }, [owner]);
}
