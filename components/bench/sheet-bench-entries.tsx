'use client';

import Link from 'next/link';
import { useBenchEntries } from '@/lib/local';
import { BenchEntryCard } from './bench-entry-card';
import { NewEntryLink } from './new-entry-link';

export interface SheetBenchEntriesProps {
  sheetId: string;
  lotRef: string | null;
}

/**
 * A sheet's bench entries, for a sheet screen to show beside the calculation (must sit under a
 * <BenchStoreGate>, which provides the site's areas and people). Reads the local store.
 */
export function SheetBenchEntries({ sheetId, lotRef }: SheetBenchEntriesProps) {
  const entries = useBenchEntries({ sheetId });
  return (
    <section aria-labelledby={`sheet-entries-${sheetId}`} className="space-y-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={`sheet-entries-${sheetId}`}>Bench entries</h2>
        <NewEntryLink lot={lotRef ?? undefined} sheetId={sheetId} className="btn-quiet">
          Add bench entry
        </NewEntryLink>
      </div>
      {entries === undefined ? (
        <p className="text-sm text-ink-soft">Reading this device’s bench log…</p>
      ) : entries.length === 0 ? (
        <p className="text-sm text-ink-soft">No bench entries for this sheet yet.</p>
      ) : (
        <ul className="space-y-2">
          {entries.map((e) => (
            <BenchEntryCard key={e.id} entry={e} />
          ))}
        </ul>
      )}
      <p className="text-sm">
        <Link href={`/bench?sheet=${sheetId}`} className="underline" prefetch={false}>
          Open in the bench log
        </Link>
      </p>
    </section>
  );
}
