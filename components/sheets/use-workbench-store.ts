'use client';
// Makes sure the signed-in user's local store is open for the sheet screens. The app shell's sync
// provider opens it too and runs the sync triggers; opening is idempotent, so whichever comes first
// wins and the screen never waits on the other.
import { useEffect } from 'react';
import { openLocalStore, useLocalIdentity, useLocalStore, type LocalIdentity } from '@/lib/local';

export function useWorkbenchStore(identity: LocalIdentity) {
  const store = useLocalStore();
  const who = useLocalIdentity();
  useEffect(() => {
    void openLocalStore(identity);
  }, [identity]);
  return { ready: store !== null && who?.userId === identity.userId, who: who ?? identity };
}
