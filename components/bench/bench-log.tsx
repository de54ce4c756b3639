'use client';

import Link from 'next/link';
import { useSearchParams } from 'next/navigation';
import { useMemo, useState } from 'react';
import { useBenchEntries, useSheets } from '@/lib/local';
import { BenchEntryCard } from './bench-entry-card';
import { groupBenchLog, NO_LOT, type LotGroup } from './bench-log-groups';
import { useBenchSite } from './bench-site-context';
import { BenchSyncBar } from './bench-sync-bar';
import { NewEntryLink } from './new-entry-link';

const newCalorimetryHref = (lot: string) => `/sheets/new?kind=calorimetry${lot ? `&lot=${encodeURIComponent(lot)}` : ''}`;

/** The bench log: per lot, its entries and its calorimetry sheets with their verdicts; searchable. */
export function BenchLog() {
  const params = useSearchParams();
  const { areas } = useBenchSite();
  const [query, setQuery] = useState(params.get('q') ?? '');
  const lotFilter = params.get('lot') ?? '';
  const sheetFilter = params.get('sheet') ?? '';
  const entries = useBenchEntries(sheetFilter ? { sheetId: sheetFilter } : lotFilter ? { lotRef: lotFilter } : {});
  const allSheets = useSheets();
  const loading = entries === undefined || allSheets === undefined;
  const groups = useMemo(() => {
    if (!entries || !allSheets) return [];
    const titles = new Map(allSheets.map((s) => [s.id, s.content.title]));
    const calorimetry = allSheets.filter((s) => s.content.kind === 'calorimetry' && (!lotFilter || s.content.lotRef === lotFilter) && (!sheetFilter || s.id === sheetFilter));
    return groupBenchLog(entries, calorimetry, query, { areaName: (id) => areas.find((a) => a.id === id)?.name, sheetTitle: (id) => titles.get(id) });
  }, [entries, allSheets, query, areas, lotFilter, sheetFilter]);
  const sheetTitles = useMemo(() => new Map((allSheets ?? []).map((s) => [s.id, s.content.title])), [allSheets]);
  const filteredSheet = sheetFilter ? allSheets?.find((s) => s.id === sheetFilter) : undefined;

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1>Bench log</h1>
          <p className="text-ink-soft">Notes and photos from the bench, by lot, with each lot’s calorimetry runs.</p>
        </div>
        <NewEntryLink lot={lotFilter || undefined} sheetId={sheetFilter || undefined} className="btn-primary">
          New entry
        </NewEntryLink>
      </div>
      <BenchSyncBar />
      <div role="search" className="flex flex-wrap items-end gap-3">
        <div className="min-w-64 flex-1">
          <label htmlFor="bench-search" className="field-label">
            Search the bench log
          </label>
          <input id="bench-search" type="search" className="field-input" placeholder="Lot, words of a note, #tag, area or sheet" value={query} onChange={(e) => setQuery(e.target.value)} />
        </div>
        {(lotFilter || sheetFilter) && (
          <p className="text-sm">
            Showing {sheetFilter ? `sheet “${filteredSheet?.content.title ?? sheetFilter}”` : `lot ${lotFilter}`} only ·{' '}
            <Link href="/bench" className="underline">
              show every lot
            </Link>
          </p>
        )}
      </div>
      {loading ? (
        <p className="text-ink-soft">Reading this device’s bench log…</p>
      ) : groups.length === 0 ? (
        <p className="panel text-ink-soft" role="status">
          {query ? `Nothing in the bench log matches “${query}”.` : 'No bench entries or calorimetry sheets yet. Start with “New entry”.'}
        </p>
      ) : (
        <ul className="space-y-5" aria-label="Lots">
          {groups.map((g) => (
            <LotSection key={g.lot || '(none)'} group={g} sheetTitles={sheetTitles} />
          ))}
        </ul>
      )}
    </div>
  );
}

function LotSection({ group, sheetTitles }: { group: LotGroup; sheetTitles: Map<string, string> }) {
  const headingId = `lot-${group.lot || 'none'}`.replace(/[^A-Za-z0-9_-]/g, '_');
  return (
    <li>
      <section aria-labelledby={headingId} className="panel space-y-4">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id={headingId}>{group.lot === NO_LOT ? 'No lot given' : `Lot ${group.lot}`}</h2>
          <div className="flex flex-wrap gap-2">
            <NewEntryLink lot={group.lot || undefined} className="btn-quiet" aria-label={`New entry for ${group.lot ? `lot ${group.lot}` : 'no lot'}`}>
              New entry
            </NewEntryLink>
            {group.lot !== NO_LOT && (
              <Link href={newCalorimetryHref(group.lot)} className="btn-quiet" prefetch={false} aria-label={`Start calorimetry sheet for lot ${group.lot}`}>
                Start calorimetry sheet
              </Link>
            )}
          </div>
        </div>
        {group.sheets.length > 0 && (
          <div className="space-y-3">
            <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Calorimetry runs</h3>
            <ul className="space-y-3">
              {group.sheets.map(({ sheet, verdict, entries }) => (
                <li key={sheet.id} className="rounded-md border border-rule p-3" data-sheet-id={sheet.id}>
                  <div className="flex flex-wrap items-start justify-between gap-2">
                    <div>
                      <Link href={`/sheets/open?id=${sheet.id}`} className="font-medium underline decoration-rule underline-offset-2 hover:decoration-verdigris-500" prefetch={false}>
                        {sheet.content.title}
                      </Link>
                      <span className="ml-2 text-xs text-ink-soft">{sheet.content.status.replace('_', ' ')}</span>
                      <p className={`mt-1 text-sm ${verdict.withinTolerance === false ? 'text-ember-700' : ''}`}>
                        <span className="font-semibold">Verdict:</span> {verdict.text}
                        {verdict.source === 'device' && <span className="text-ink-soft"> (this device’s result; the server recomputes it on sync)</span>}
                      </p>
                    </div>
                    <NewEntryLink lot={group.lot || undefined} sheetId={sheet.id} className="btn-quiet" aria-label={`Add entry for sheet ${sheet.content.title}`}>
                      Add entry
                    </NewEntryLink>
                  </div>
                  {entries.length > 0 ? (
                    <ul className="mt-3 space-y-2" aria-label={`Entries of sheet ${sheet.content.title}`}>
                      {entries.map((e) => (
                        <BenchEntryCard key={e.id} entry={e} />
                      ))}
                    </ul>
                  ) : (
                    <p className="mt-2 text-xs text-ink-soft">No bench entries for this run yet.</p>
                  )}
                </li>
              ))}
            </ul>
          </div>
        )}
        {group.entries.length > 0 && (
          <div className="space-y-2">
            {group.sheets.length > 0 && <h3 className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Entries</h3>}
            <ul className="space-y-2" aria-label={`Entries of ${group.lot ? `lot ${group.lot}` : 'no lot'}`}>
              {group.entries.map((e) => (
                <BenchEntryCard key={e.id} entry={e} sheetTitle={e.content.sheetId ? sheetTitles.get(e.content.sheetId) : undefined} />
              ))}
            </ul>
          </div>
        )}
      </section>
    </li>
  );
}
