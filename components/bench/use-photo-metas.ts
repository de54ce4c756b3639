'use client';

import { useLiveQuery } from 'dexie-react-hooks';
import { useLocalStore, type PhotoMeta } from '@/lib/local';

/** The photo records (caption, type, when taken) of these ids on this device. */
export function usePhotoMetas(ids: string[]): Map<string, PhotoMeta> {
  const store = useLocalStore();
  const key = ids.join(',');
  const rows = useLiveQuery(async () => (store && ids.length ? store.photoMeta.bulkGet(ids) : []), [store, key]);
  const out = new Map<string, PhotoMeta>();
  for (const r of rows ?? []) if (r) out.set(r.id, r.content as PhotoMeta);
  return out;
}
