'use client';

import Link from 'next/link';
import type { BenchEntry, LocalRecord } from '@/lib/local';
import { BenchPhoto } from './bench-photo';
import { useBenchSite } from './bench-site-context';

export interface BenchEntryCardProps {
  entry: LocalRecord<BenchEntry>;
  sheetTitle?: string;
}

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

/** One entry in the log: the start of its note, tags, photos, who and when, and its sync state. */
export function BenchEntryCard({ entry, sheetTitle }: BenchEntryCardProps) {
  const { areas, people, identity } = useBenchSite();
  const e = entry.content;
  const author = e.authorId === identity.userId ? 'you' : (people.find((p) => p.id === e.authorId)?.displayName ?? 'another user');
  const area = e.areaId ? areas.find((a) => a.id === e.areaId)?.name : null;
  const firstLine = e.note.trim().split('\n')[0] || (e.photoIds.length ? 'Photos only' : '(empty note)');
  return (
    <li>
      <Link href={`/bench/open?id=${e.id}`} className="flex min-h-touch gap-3 rounded-md border border-rule bg-white px-3 py-2 hover:border-verdigris-500" data-entry-id={e.id}>
        {e.photoIds[0] && (
          <div className="shrink-0" aria-hidden>
            <BenchPhoto photoId={e.photoIds[0]} caption="" size="thumb" />
          </div>
        )}
        <div className="min-w-0 flex-1">
          <span className="block font-medium">{firstLine.length > 140 ? `${firstLine.slice(0, 140)}…` : firstLine}</span>
          <span className="mt-1 flex flex-wrap gap-x-3 gap-y-1 text-xs text-ink-soft">
            <span>
              {formatWhen(e.createdAt)} · {author}
            </span>
            {area && <span>{area}</span>}
            {e.photoIds.length > 0 && <span>{e.photoIds.length === 1 ? '1 photo' : `${e.photoIds.length} photos`}</span>}
            {sheetTitle && <span>on sheet “{sheetTitle}”</span>}
            {e.tags.map((t) => (
              <span key={t} className="rounded bg-paper-deep px-1.5 text-ink">
                #{t}
              </span>
            ))}
            {entry.pending && <span className="font-semibold text-brine-700">waiting to sync</span>}
            {entry.awaitingReview && <span className="font-semibold text-ember-700">conflict: awaiting a supervisor</span>}
          </span>
        </div>
      </Link>
    </li>
  );
}
