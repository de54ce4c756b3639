'use client';

import { OfflineIndicator } from './offline-indicator';
import { UpdateBanner } from './update-banner';
import { useServiceWorker } from './use-service-worker';

/** Mounted once in the root layout: registers the service worker, shows updates and the offline state. */
export function PwaStatus() {
  const { state, reloadNow, later } = useServiceWorker();
  return (
    <div className="pointer-events-none fixed inset-x-0 bottom-0 z-40 flex flex-col items-center gap-2 p-3">
      <OfflineIndicator />
      <UpdateBanner state={state} onReload={reloadNow} onLater={later} />
    </div>
  );
}
