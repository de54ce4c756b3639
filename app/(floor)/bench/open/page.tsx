import { Suspense } from 'react';
import { BenchEntryShell } from '@/components/bench/bench-entry-shell';
import { BenchStoreGate } from '@/components/bench/bench-site-context';
import { loadBenchSite } from '@/components/bench/load-bench-site';

export const metadata = { title: 'Bench entry' };

// One shell for every entry: the id is read from ?id= on the device, so an entry made offline opens
// offline from the worker's stored copy of this page.
export default async function BenchEntryPage() {
  const site = await loadBenchSite('/bench/open');
  return (
    <BenchStoreGate {...site}>
      <Suspense fallback={<p className="text-ink-soft">Reading the entry…</p>}>
        <BenchEntryShell mode="open" />
      </Suspense>
    </BenchStoreGate>
  );
}
