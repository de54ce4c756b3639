'use client';

// Where the Reference screen gets the edition in force. Today: the API, through TanStack Query.
// When the device's local store lands (lib/local), swap `loadEditionInForce` for a read of the
// device's copy; the screen only sees `useEditionInForce()` and does not change.
import { useQuery } from '@tanstack/react-query';
import type { ReferenceValue } from '@/lib/reference/properties';
import { type EditionInfo, getJson } from './format';

export interface EditionWithValues {
  edition: EditionInfo;
  values: ReferenceValue[];
}

export type EditionSource = () => Promise<EditionWithValues | null>;

/** The server's copy: GET /api/v1/editions/current (null when the site has no edition in force). */
export const loadEditionInForce: EditionSource = async () => {
  const res = await fetch('/api/v1/editions/current', { headers: { accept: 'application/json' } }).catch(() => null);
  if (!res) throw new Error('No connection to the server. Check the network and try again.');
  if (res.status === 404) return null;
  if (!res.ok) return getJson<EditionWithValues>('/api/v1/editions/current');
  return (await res.json()) as EditionWithValues;
};

export function useEditionInForce(source: EditionSource = loadEditionInForce) {
  return useQuery({ queryKey: ['editions', 'in-force'], queryFn: source, staleTime: 60_000 });
}
