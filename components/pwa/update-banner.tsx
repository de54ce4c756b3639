'use client';

import { useState } from 'react';
import type { UpdateState } from './use-service-worker';

export interface UpdateBannerProps {
  state: UpdateState;
  onReload: () => void | Promise<void>;
  onLater: () => void;
}

/** Announces a new version; the user picks the moment to reload (nothing waiting to sync is lost). */
export function UpdateBanner({ state, onReload, onLater }: UpdateBannerProps) {
  const [reloading, setReloading] = useState(false);
  return (
    <div role="status" aria-live="polite" className="w-full max-w-xl">
      {state === 'none' ? null : (
        <section aria-label="New version" className="panel pointer-events-auto flex flex-wrap items-center gap-3 border-l-4 border-l-brine-500 shadow-md">
          <div className="min-w-0 flex-1 text-sm">
            <p className="font-semibold">{state === 'waiting' ? 'A new version of Rungbook is ready.' : 'Rungbook was updated in another window.'}</p>
            <p className="text-ink-soft">Reload when you’re ready. Changes waiting to sync stay on this device.</p>
          </div>
          <div className="flex gap-2">
            <button type="button" className="btn-quiet" onClick={onLater} disabled={reloading}>
              Later
            </button>
            <button
              type="button"
              className="btn-primary"
              disabled={reloading}
              onClick={() => {
                setReloading(true);
                void onReload();
              }}
            >
              {reloading ? 'Reloading…' : 'Reload now'}
            </button>
          </div>
        </section>
      )}
    </div>
  );
}
