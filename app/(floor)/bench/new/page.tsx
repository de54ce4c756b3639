import { Suspense } from 'react';
import { BenchEntryShell } from '@/components/bench/bench-entry-shell';
import { BenchStoreGate } from '@/components/bench/bench-site-context';
import { loadBenchSite } from '@/components/bench/load-bench-site';

export const metadata = { title: 'New bench entry' };

// ?lot= and ?sheet= prefill the entry; it is made and kept on the device, then synced.
export default async function NewBenchEntryPage() {
  const site = await loadBenchSite('/bench/new');
  return (
    <BenchStoreGate {...site}>
      <Suspense fallback={<p className="text-ink-soft">Opening the form…</p>}>
        <BenchEntryShell mode="new" />
      </Suspense>
    </BenchStoreGate>
  );
}
