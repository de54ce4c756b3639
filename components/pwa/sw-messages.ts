// The page's side of sw/protocol.ts. Other features call these (e.g. the store on sign-out).
import { type PageToWorker, type WorkerToPage } from '@/sw/protocol';

/** Sends a message to the active service worker and waits for its answer (null: no worker, or no answer in time). */
export async function messageServiceWorker(message: PageToWorker, timeoutMs = 30_000): Promise<WorkerToPage | null> {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return null;
  const registration = await navigator.serviceWorker.getRegistration();
  const worker = registration?.active;
  if (!worker) return null;
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(() => resolve(null), timeoutMs);
    channel.port1.onmessage = (e: MessageEvent<WorkerToPage>) => {
      clearTimeout(timer);
      resolve(e.data);
    };
    worker.postMessage(message, [channel.port2]);
  });
}

/**
 * Stores the offline routes (and `urls`, if under /sheets, /reference or /bench) for `owner`, the
 * signed-in user's id, so they open without a connection. Cheap to call: the worker re-fetches at
 * most every ten minutes unless `force`.
 */
export function warmOfflinePages(owner: string, urls: string[] = [], force = false) {
  return messageServiceWorker({ type: 'WARM_ROUTES', owner, urls, force });
}

/** Drops every stored page of this device (the worker also does this itself on sign-out). */
export function forgetOfflinePages() {
  return messageServiceWorker({ type: 'FORGET_PAGES' });
}
