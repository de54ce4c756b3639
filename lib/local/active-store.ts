// Which user's local store is open in this tab. Screens subscribe, so they re-render once the
// store opens (after the shell hands over the signed-in identity, or from the cached one offline).
import { newId } from '@/lib/ids';
import { RungbookLocalDb, type LocalIdentity } from './local-db';

const LAST_IDENTITY_KEY = 'rungbook.lastIdentity';

let active: RungbookLocalDb | null = null;
let identity: LocalIdentity | null = null;
const listeners = new Set<() => void>();

export function subscribeActiveStore(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
export const getActiveStore = (): RungbookLocalDb | null => active;
export const getActiveIdentity = (): LocalIdentity | null => identity;

/**
 * Open the signed-in user's store (idempotent), remember the identity for offline use and ask the
 * browser to keep the store (design.md §9: waiting changes must not be evicted).
 */
export async function openLocalStore(who: LocalIdentity): Promise<RungbookLocalDb> {
  if (active && active.userId === who.userId) {
    if (JSON.stringify(identity) !== JSON.stringify(who)) {
      identity = who;
      await active.meta.put({ key: 'identity', value: who });
      rememberIdentity(who);
    }
    return active;
  }
  active?.close();
  const store = new RungbookLocalDb(who.userId);
  await store.open();
  await store.meta.put({ key: 'identity', value: who });
  const device = await store.meta.get('deviceId');
  if (!device) await store.meta.put({ key: 'deviceId', value: newId() });
  active = store;
  identity = who;
  rememberIdentity(who);
  void requestPersistentStorage();
  for (const l of listeners) l();
  return store;
}

/** Close the tab's store (the data stays: it belongs to that user until they sync it). */
export function closeLocalStore(): void {
  active?.close();
  active = null;
  identity = null;
  for (const l of listeners) l();
}

/** The identity of the last online sign-in on this device, for offline start-up. */
export function lastIdentity(): LocalIdentity | null {
  try {
    const raw = globalThis.localStorage?.getItem(LAST_IDENTITY_KEY);
    return raw ? (JSON.parse(raw) as LocalIdentity) : null;
  } catch {
    return null;
  }
}

function rememberIdentity(who: LocalIdentity) {
  try {
    globalThis.localStorage?.setItem(LAST_IDENTITY_KEY, JSON.stringify(who));
  } catch {
    /* private mode: the identity is still in the store's meta table */
  }
}

let persistAsked = false;
async function requestPersistentStorage() {
  if (persistAsked || typeof navigator === 'undefined' || !navigator.storage?.persist) return;
  persistAsked = true;
  try {
    if (!(await navigator.storage.persisted())) await navigator.storage.persist();
  } catch {
    /* the browser may refuse; the queue is still kept as long as the browser keeps the origin's data */
  }
}

export async function deviceIdOf(store: RungbookLocalDb): Promise<string> {
  const row = await store.meta.get('deviceId');
  if (typeof row?.value === 'string') return row.value;
  const id = newId();
  await store.meta.put({ key: 'deviceId', value: id });
  return id;
}
