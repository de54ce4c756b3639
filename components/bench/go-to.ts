'use client';

import { useRouter } from 'next/navigation';
import { useCallback } from 'react';

/**
 * Move to another bench screen. Offline, a full page load lets the service worker answer from its
 * stored shell (a client-side navigation would need the server's payload).
 */
export function useGoTo(): (path: string) => void {
  const router = useRouter();
  return useCallback(
    (path: string) => {
      if (typeof navigator !== 'undefined' && !navigator.onLine) window.location.assign(path);
      else router.push(path);
    },
    [router],
  );
}
