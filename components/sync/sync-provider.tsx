'use client';

import { useEffect } from 'react';
import { openLocalStore, type LocalIdentity } from '@/lib/local';
import { installConsoleApi } from '@/lib/local/console-api';
import { startSyncTriggers } from '@/lib/local/sync-engine';

export interface SyncProviderProps {
  identity: LocalIdentity;
}

/**
 * Opens the signed-in user's local store (caching the identity for offline use) and starts the
 * sync triggers: now, on reconnect, every minute while online. Renders nothing.
 */
export function SyncProvider({ identity }: SyncProviderProps) {
  const key = JSON.stringify(identity);
  useEffect(() => {
    let stop: (() => void) | undefined;
    let cancelled = false;
    void openLocalStore(JSON.parse(key) as LocalIdentity).then(() => {
      if (cancelled) return;
      installConsoleApi();
      stop = startSyncTriggers();
    });
    return () => {
      cancelled = true;
      stop?.();
    };
  }, [key]);
  return null;
}
