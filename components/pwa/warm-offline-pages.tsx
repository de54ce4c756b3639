'use client';

import { useEffect } from 'react';
import { warmOfflinePages } from './sw-messages';

export interface WarmOfflinePagesProps {
  /** The signed-in user's id: stored pages belong to one user at a time. */
  owner: string;
}

/**
 * Mounted in the signed-in shell: once the worker is in control, it stores the offline routes for
 * this user (Today, Sheets, Reference, Bench log and the record shells).
 */
export function WarmOfflinePages({ owner }: WarmOfflinePagesProps) {
  useEffect(() => {
    if (process.env.NODE_ENV !== 'production' || !('serviceWorker' in navigator)) return;
    let cancelled = false;
    const warm = () => (!cancelled && navigator.onLine ? void warmOfflinePages(owner) : undefined);
    void navigator.serviceWorker.ready.then(() => (navigator.serviceWorker.controller ? warm() : undefined));
    // The first install claims the page a moment after `ready`; a new version empties the page cache.
    navigator.serviceWorker.addEventListener('controllerchange', warm);
    return () => {
      cancelled = true;
      navigator.serviceWorker.removeEventListener('controllerchange', warm);
    };
  }, [owner]);
  return null;
}
