'use client';

import { useEffect, useState } from 'react';
import { Workbox } from 'workbox-window';
import { SW_URL } from '@/sw/protocol';

/** none; waiting: a new version is installed and waits; elsewhere: another window already switched to it. */
export type UpdateState = 'none' | 'waiting' | 'elsewhere';

const CHECK_EVERY_MS = 30 * 60 * 1000;
const MIN_GAP_MS = 5 * 60 * 1000;
let lastCheck = 0;
let workbox: Workbox | null = null;
let reloadRequested = false;

/**
 * Registers /sw.js (production builds only: `next dev` has no worker) and follows its updates. A new
 * version never takes over on its own: the user reloads when ready. The sync queue lives in
 * IndexedDB, which a worker update does not touch.
 */
export function useServiceWorker() {
  const [state, setState] = useState<UpdateState>('none');

  useEffect(() => {
    if (!('serviceWorker' in navigator)) return;
    if (process.env.NODE_ENV !== 'production') {
      // A worker left by a production run on this origin would serve stale build files to `next dev`.
      void navigator.serviceWorker.getRegistrations().then((rs) => rs.forEach((r) => void r.unregister()));
      return;
    }
    // The first install claims the page; that is not an update and needs no reload.
    let controlled = !!navigator.serviceWorker.controller;
    const onChange = () => {
      if (reloadRequested) return window.location.reload();
      if (controlled) setState('elsewhere');
      controlled = true;
    };
    navigator.serviceWorker.addEventListener('controllerchange', onChange);

    const onWaiting = () => setState('waiting');
    if (!workbox) {
      workbox = new Workbox(SW_URL, { scope: '/' });
      lastCheck = Date.now();
      void workbox.register().catch(() => undefined);
    }
    const wb = workbox;
    wb.addEventListener('waiting', onWaiting);
    // A version that was already waiting before this page loaded.
    void navigator.serviceWorker.getRegistration().then((r) => (r?.waiting && r.active ? onWaiting() : undefined));

    // Tablets stay open for a whole shift: look for a new version now and then, and on reconnect.
    const check = () => {
      if (!navigator.onLine || document.visibilityState !== 'visible' || Date.now() - lastCheck < MIN_GAP_MS) return;
      lastCheck = Date.now();
      void wb.update().catch(() => undefined);
    };
    const timer = window.setInterval(check, CHECK_EVERY_MS);
    window.addEventListener('online', check);
    document.addEventListener('visibilitychange', check);
    return () => {
      navigator.serviceWorker.removeEventListener('controllerchange', onChange);
      wb.removeEventListener('waiting', onWaiting);
      window.clearInterval(timer);
      window.removeEventListener('online', check);
      document.removeEventListener('visibilitychange', check);
    };
  }, []);

  const reloadNow = async () => {
    if (state === 'elsewhere') return window.location.reload();
    reloadRequested = true;
    const registration = await navigator.serviceWorker.getRegistration();
    if (!registration?.waiting) return window.location.reload();
    registration.waiting.postMessage({ type: 'SKIP_WAITING' });
    // The reload follows controllerchange; if the waiting worker vanished, reload anyway.
    window.setTimeout(() => window.location.reload(), 5000);
  };

  return { state, reloadNow, later: () => setState('none') };
}
