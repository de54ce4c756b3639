'use client';
// Opens the signed-in user's local store for the sheet screens (idempotent; the app shell may
// already have opened it) and starts background sync once per tab.
import { useEffect } from 'react';
import { openLocalStore, startSyncTriggers, useLocalIdentity, useLocalStore, type LocalIdentity } from '@/lib/local';

let syncStarted = false;

export function useWorkbenchStore(identity: LocalIdentity) {
  const store = useLocalStore();
  const who = useLocalIdentity();
  useEffect(() => {
    void openLocalStore(identity).then(() => {
      if (!syncStarted) {
        syncStarted = true;
        startSyncTriggers();
      }
    });
  }, [identity]);
  return { ready: store !== null && who?.userId === identity.userId, who: who ?? identity };
}
