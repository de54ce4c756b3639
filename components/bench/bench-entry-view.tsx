'use client';

import Link from 'next/link';
import { useState } from 'react';
import { can } from '@/lib/auth/permissions';
import { deleteBenchEntry, syncNow, useBenchEntry, useSheet } from '@/lib/local';
import { formatWhen } from './bench-entry-card';
import { BenchEntryEditor } from './bench-entry-editor';
import { BenchPhoto } from './bench-photo';
import { useBenchSite } from './bench-site-context';
import { BenchSyncBar } from './bench-sync-bar';
import { useGoTo } from './go-to';
import { usePhotoMetas } from './use-photo-metas';
import { usePhotoUploads } from './use-photo-uploads';

export interface BenchEntryViewProps {
  id: string | null;
}

/** One bench entry, read from this device's store (so an entry made offline opens offline). */
export function BenchEntryView({ id }: BenchEntryViewProps) {
  const { identity, areas, people } = useBenchSite();
  const record = useBenchEntry(id);
  const sheet = useSheet(record?.content.sheetId ?? null);
  const photos = usePhotoMetas(record?.content.photoIds ?? []);
  const uploads = usePhotoUploads();
  const [editing, setEditing] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const goTo = useGoTo();

  if (!id) return <Missing text="No entry was named in the address (it needs ?id=…)." />;
  if (record === undefined) return <p className="text-ink-soft">Reading the entry from this device…</p>;
  if (record === null || record.content.deleted) return <Missing text={record ? 'This entry was deleted.' : 'This entry is not on this device yet. If it was made on another device, it arrives with the next sync.'} />;

  const e = record.content;
  const mine = e.authorId === identity.userId;
  const mayEdit = mine || can(identity.role, 'sheet.correct');
  const author = mine ? 'you' : (people.find((p) => p.id === e.authorId)?.displayName ?? 'another user');
  const area = e.areaId ? (areas.find((a) => a.id === e.areaId)?.name ?? 'an area of the site') : null;

  if (editing) {
    return (
      <div className="space-y-4">
        <h1>Edit bench entry</h1>
        {!mine && <p className="text-sm text-ink-soft">You are correcting an entry by {author} (a supervisor’s correction).</p>}
        <BenchEntryEditor existing={record} onSaved={() => (setEditing(false), setMessage('Saved on this device.'))} onCancel={() => setEditing(false)} />
      </div>
    );
  }

  return (
    <article className="space-y-5" aria-labelledby="entry-title">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="text-sm">
            <Link href={e.lotRef ? `/bench?lot=${encodeURIComponent(e.lotRef)}` : '/bench'} className="underline" prefetch={false}>
              ← Bench log{e.lotRef ? ` · lot ${e.lotRef}` : ''}
            </Link>
          </p>
          <h1 id="entry-title">Bench entry{e.lotRef ? ` · lot ${e.lotRef}` : ''}</h1>
          <p className="text-sm text-ink-soft">
            {formatWhen(e.createdAt)} by {author}
            {e.updatedAt !== e.createdAt ? ` · changed ${formatWhen(e.updatedAt)}` : ''}
            {area ? ` · ${area}` : ''}
          </p>
        </div>
        {mayEdit && (
          <div className="flex gap-2">
            <button type="button" className="btn-primary" onClick={() => setEditing(true)} disabled={record.awaitingReview}>
              Edit
            </button>
            <button type="button" className="btn-danger" onClick={() => setConfirmDelete(true)} disabled={record.awaitingReview}>
              Delete
            </button>
          </div>
        )}
      </div>

      {message && (
        <p role="status" className="text-sm text-verdigris-700">
          {message}
        </p>
      )}
      {record.pending && <p className="rounded-md border border-brine-500 bg-brine-50 px-3 py-2 text-sm">Waiting to sync: this version is kept on this device until the server accepts it.</p>}
      {record.awaitingReview && (
        <p className="rounded-md border border-ember-500 bg-ember-50 px-3 py-2 text-sm text-ember-700">
          Two edits of this entry met: the server keeps its version, shown here, until a supervisor settles the conflict. Nothing either side wrote is lost.
        </p>
      )}
      {!mayEdit && <p className="text-sm text-ink-soft">Only its author or a supervisor may change this entry.</p>}

      {confirmDelete && (
        <div role="alertdialog" aria-labelledby="delete-q" className="panel border-ember-500 space-y-3">
          <p id="delete-q">Delete this entry? Every device learns of the delete when it syncs; its photos stay in storage.</p>
          <div className="flex gap-2">
            <button
              type="button"
              className="btn-danger"
              onClick={async () => {
                await deleteBenchEntry(e.id);
                if (navigator.onLine) void syncNow();
                goTo(e.lotRef ? `/bench?lot=${encodeURIComponent(e.lotRef)}` : '/bench');
              }}
            >
              Delete entry
            </button>
            <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>
              Keep it
            </button>
          </div>
        </div>
      )}

      <section aria-label="Note" className="panel">
        {e.note.trim() ? <p className="whitespace-pre-wrap" data-testid="entry-note">{e.note}</p> : <p className="text-ink-soft">No note: photos only.</p>}
        {e.tags.length > 0 && (
          <p className="mt-3 flex flex-wrap gap-2 text-sm" aria-label="Tags">
            {e.tags.map((t) => (
              <Link key={t} href={`/bench?q=${encodeURIComponent(`#${t}`)}`} className="rounded bg-paper-deep px-2 py-1" prefetch={false}>
                #{t}
              </Link>
            ))}
          </p>
        )}
        {e.sheetId && (
          <p className="mt-3 text-sm">
            Sheet:{' '}
            <Link href={`/sheets/open?id=${e.sheetId}`} className="underline" prefetch={false}>
              {sheet?.content.title ?? 'a sheet not on this device yet'}
            </Link>
          </p>
        )}
      </section>

      <section aria-labelledby="photos-title" className="space-y-3">
        <h2 id="photos-title">Photos ({e.photoIds.length})</h2>
        {e.photoIds.length === 0 ? (
          <p className="text-sm text-ink-soft">No photos.</p>
        ) : (
          <ul className="grid gap-4 sm:grid-cols-2">
            {e.photoIds.map((pid) => (
              <li key={pid}>
                <BenchPhoto photoId={pid} caption={photos.get(pid)?.caption ?? ''} size="full" waitingUpload={uploads?.waitingIds.has(pid)} problem={uploads?.problems[pid]?.message} />
              </li>
            ))}
          </ul>
        )}
      </section>
      <BenchSyncBar />
    </article>
  );
}

function Missing({ text }: { text: string }) {
  return (
    <div className="space-y-3">
      <h1>Bench entry</h1>
      <p className="panel" role="status">
        {text}
      </p>
      <Link href="/bench" className="btn-quiet" prefetch={false}>
        Back to the bench log
      </Link>
    </div>
  );
}
