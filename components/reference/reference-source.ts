'use client';

// Where the Reference screen gets the edition in force: the device's copy in the local store
// (kept fresh by the sync engine with the ETag of GET /api/v1/editions/current), so it works
// offline. Only while the device has no copy yet (first sign-in, or a store that will not open)
// does it fetch the server's copy through TanStack Query — the same body, shown the same way.
import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useEditionInForce as useDeviceEdition } from '@/lib/local';
import type { ReferenceValue } from '@/lib/reference/properties';
import { type EditionInfo, getJson } from './format';

export interface EditionWithValues {
  edition: EditionInfo;
  values: ReferenceValue[];
}

export type EditionCopy =
  | { status: 'loading' }
  | { status: 'error'; message: string }
  | { status: 'none' }
  | { status: 'ready'; data: EditionWithValues; from: 'device' | 'server'; fetchedAt: string | null };

/** The server's copy: GET /api/v1/editions/current (null when the site has no edition in force). */
export async function loadEditionInForce(): Promise<EditionWithValues | null> {
  const res = await fetch('/api/v1/editions/current', { headers: { accept: 'application/json' } }).catch(() => null);
  if (!res) throw new Error('The edition in force is not on this device yet, and there is no connection to the server.');
  if (res.status === 404) return null;
  if (!res.ok) return getJson<EditionWithValues>('/api/v1/editions/current');
  return (await res.json()) as EditionWithValues;
}

/** The cached body, if it has the shape the endpoint serves. */
export function editionFromBody(body: unknown): EditionWithValues | null {
  if (!body || typeof body !== 'object') return null;
  const { edition, values } = body as { edition?: { id?: unknown }; values?: unknown };
  if (!edition || typeof edition.id !== 'string' || !Array.isArray(values)) return null;
  return body as EditionWithValues;
}

export function useEditionInForce(): EditionCopy {
  const cached = useDeviceEdition();
  const device = cached ? editionFromBody(cached.edition) : null;
  // Give the local store a moment to open before asking the server instead.
  const [waited, setWaited] = useState(false);
  useEffect(() => {
    const t = window.setTimeout(() => setWaited(true), 1500);
    return () => window.clearTimeout(t);
  }, []);
  const server = useQuery({
    queryKey: ['editions', 'in-force'],
    queryFn: loadEditionInForce,
    enabled: !device && (cached === null || waited),
    staleTime: 60_000,
  });
  if (device) return { status: 'ready', data: device, from: 'device', fetchedAt: cached!.fetchedAt };
  if (server.data) return { status: 'ready', data: server.data, from: 'server', fetchedAt: null };
  if (server.data === null) return { status: 'none' };
  if (server.isError) return { status: 'error', message: (server.error as Error).message };
  return { status: 'loading' };
}
