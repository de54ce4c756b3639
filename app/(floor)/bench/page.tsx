import { Suspense } from 'react';
import { BenchLog } from '@/components/bench/bench-log';
import { BenchStoreGate } from '@/components/bench/bench-site-context';
import { loadBenchSite } from '@/components/bench/load-bench-site';

export const metadata = { title: 'Bench log' };

// The bench log reads this device's local store (online and offline alike); the server only
// renders the shell with who is signed in and the site's areas and people.
export default async function BenchPage() {
  const site = await loadBenchSite('/bench');
  return (
    <BenchStoreGate {...site}>
      <Suspense fallback={<p className="text-ink-soft">Reading this device’s bench log…</p>}>
        <BenchLog />
      </Suspense>
    </BenchStoreGate>
  );
}
