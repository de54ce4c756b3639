'use client';

import { useId, useState } from 'react';
import { getActiveStore, syncNow, useSyncState, type RejectedChange } from '@/lib/local';

export interface SyncStatusBadgeProps {
  className?: string;
}

const PHASE_TEXT: Record<string, string> = {
  idle: 'Up to date',
  pushing: 'Sending',
  pulling: 'Receiving',
  // The offline state itself is said once, by the app-wide indicator (components/pwa); here, what it means for sync.
  offline: 'sends when back online',
  signin_required: 'Sign in to sync',
  upgrade_required: 'Update needed',
  error: 'Sync paused',
};

/** Number waiting (always shown), progress "12 of 40 sent", sync now, and rejected changes with export. */
export function SyncStatusBadge({ className }: SyncStatusBadgeProps) {
  const state = useSyncState();
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const waiting = state?.waiting ?? 0;
  const busy = state?.phase === 'pushing' || state?.phase === 'pulling';
  const rejected = state?.rejected ?? [];
  return (
    <div className={className} data-testid="sync-status">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <span role="status" aria-live="polite" className="inline-flex min-h-touch items-center gap-2 rounded-md border border-rule bg-white px-3">
          <span data-testid="sync-waiting">
            {state ? `${waiting} waiting to sync` : 'Opening local store…'}
          </span>
          {state?.phase === 'pushing' && state.total > 0 ? (
            <span data-testid="sync-progress" className="text-ink-soft">
              · {state.sent} of {state.total} sent
            </span>
          ) : (
            state && <span className="text-ink-soft">· {PHASE_TEXT[state.phase]}</span>
          )}
        </span>
        <button type="button" className="btn-quiet" disabled={!state || busy} onClick={() => void syncNow()}>
          Sync now
        </button>
        {state && (rejected.length > 0 || state.awaitingReview > 0 || state.message) ? (
          <button type="button" className="btn-quiet" aria-expanded={open} aria-controls={panelId} onClick={() => setOpen((o) => !o)}>
            {rejected.length > 0 ? `${rejected.length} not accepted` : 'Details'}
          </button>
        ) : null}
      </div>
      {state?.phase === 'signin_required' ? (
        <p className="mt-1 text-sm text-ember-700">
          {state.message}{' '}
          <a className="underline" href={`/sign-in?next=${encodeURIComponent(typeof window === 'undefined' ? '/' : window.location.pathname)}`}>
            Sign in
          </a>
        </p>
      ) : state?.message && state.phase !== 'idle' ? (
        <p className="mt-1 text-sm text-ink-soft">{state.message}</p>
      ) : null}
      {open && state ? (
        <div id={panelId} className="panel mt-2 space-y-3 text-sm">
          {state.awaitingReview > 0 ? (
            <p>
              {state.awaitingReview} record{state.awaitingReview === 1 ? ' is' : 's are'} awaiting a supervisor&apos;s review of conflicting edits; they show the server&apos;s
              version until settled, and no edit is lost.
            </p>
          ) : null}
          {rejected.length > 0 ? <RejectedList rejected={rejected} /> : null}
        </div>
      ) : null}
    </div>
  );
}

function RejectedList({ rejected }: { rejected: RejectedChange[] }) {
  const [exported, setExported] = useState(false);
  const exportAll = () => {
    const blob = new Blob([JSON.stringify({ exportedAt: new Date().toISOString(), rejected }, null, 2)], { type: 'application/json' });
    const url = URL.createObjectURL(blob);
    const a = document.createElement('a');
    a.href = url;
    a.download = `rungbook-not-accepted-${new Date().toISOString().slice(0, 19).replace(/[:T]/g, '-')}.json`;
    a.click();
    URL.revokeObjectURL(url);
    setExported(true);
  };
  const dismiss = async () => {
    const store = getActiveStore();
    if (store) await store.rejected.clear();
  };
  return (
    <div>
      <h2 className="text-base">Changes the server did not accept</h2>
      <ul className="mt-2 space-y-2" data-testid="sync-rejected">
        {rejected.map((r) => (
          <li key={r.mutationId} className="rounded border border-ember-500 bg-ember-50 p-2">
            <p className="font-medium">
              {r.entity.replace('_', ' ')} {titleOf(r.content)}
            </p>
            <p>{r.reason}</p>
          </li>
        ))}
      </ul>
      <div className="mt-2 flex gap-2">
        <button type="button" className="btn-primary" onClick={exportAll}>
          Export as a file
        </button>
        <button type="button" className="btn-quiet" disabled={!exported} onClick={() => void dismiss()} title={exported ? undefined : 'Export first'}>
          Remove from this device
        </button>
      </div>
    </div>
  );
}

function titleOf(content: unknown): string {
  const c = content as { title?: string; note?: string } | null;
  if (c?.title) return `“${c.title}”`;
  if (c?.note) return `“${c.note.slice(0, 40)}”`;
  return '';
}
