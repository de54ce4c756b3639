'use client';

import { createContext, useContext, useEffect, useState } from 'react';
import { openLocalStore, useLocalStore, type LocalIdentity } from '@/lib/local';

export interface BenchPerson {
  id: string;
  displayName: string;
}
export interface BenchArea {
  id: string;
  name: string;
}

export interface BenchSite {
  identity: LocalIdentity;
  areas: BenchArea[];
  people: BenchPerson[];
}

const BenchSiteContext = createContext<BenchSite | null>(null);

export function useBenchSite(): BenchSite {
  const site = useContext(BenchSiteContext);
  if (!site) throw new Error('useBenchSite outside <BenchStoreGate>');
  return site;
}

export interface BenchStoreGateProps extends BenchSite {
  children: React.ReactNode;
}

/**
 * Renders the bench screens once the signed-in user's local store is open. The app shell's sync
 * provider opens it and runs the sync triggers; opening it here as well (idempotent, same identity)
 * means a bench screen never waits on the order in which the two mount.
 */
export function BenchStoreGate({ identity, areas, people, children }: BenchStoreGateProps) {
  const store = useLocalStore();
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let cancelled = false;
    openLocalStore(identity).catch((e: unknown) => !cancelled && setError(e instanceof Error ? e.message : 'The local store could not be opened.'));
    return () => {
      cancelled = true;
    };
  }, [identity]);
  if (error) {
    return (
      <p role="alert" className="panel border-ember-500 text-ember-700">
        This device cannot open its bench log store: {error}. Nothing has been lost; reload the page to try again.
      </p>
    );
  }
  if (!store || store.userId !== identity.userId) return <p className="text-ink-soft">Opening this device&apos;s bench log…</p>;
  return <BenchSiteContext.Provider value={{ identity, areas, people }}>{children}</BenchSiteContext.Provider>;
}
