'use client';

import { syncNow } from '@/lib/local';
import { usePhotoUploads } from './use-photo-uploads';

/**
 * Photo bytes still only on this device, and why (the app shell's badge counts waiting changes;
 * photo uploads follow their records, so they are counted here). Renders nothing when none wait.
 */
export function BenchSyncBar() {
  const uploads = usePhotoUploads();
  if (!uploads) return null;
  const refused = Object.keys(uploads.problems).length;
  if (uploads.waiting === 0) return null;
  const retryAt = uploads.retryAt ? new Date(uploads.retryAt).toLocaleTimeString(undefined, { timeStyle: 'medium' }) : null;
  return (
    <section aria-label="Photo uploads" className="panel flex flex-wrap items-center justify-between gap-3 text-sm">
      <div>
        <p role="status" data-testid="photo-upload-status">
          {uploads.waiting} {uploads.waiting === 1 ? 'photo' : 'photos'} waiting to upload from this device
          {uploads.total > 0 && uploads.sent > 0 ? ` (${uploads.sent} of ${uploads.total} sent in this sync)` : ''}.
        </p>
        {uploads.message && (
          <p className="mt-1 text-ember-700">
            {uploads.message}
            {retryAt ? ` Trying again at ${retryAt}.` : ''}
          </p>
        )}
        {refused > 0 && <p className="mt-1 text-ember-700">{refused === 1 ? 'One photo was' : `${refused} photos were`} refused by the server; they stay on this device (see the entry).</p>}
      </div>
      <button type="button" className="btn-quiet" onClick={() => void syncNow()}>
        Send photos now
      </button>
    </section>
  );
}
