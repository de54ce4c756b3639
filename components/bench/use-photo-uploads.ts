'use client';

import { useLiveQuery } from 'dexie-react-hooks';
import { useSyncExternalStore } from 'react';
import { getPhotoUploadProgress, subscribePhotoUploadProgress, UPLOAD_PROBLEMS_KEY, useLocalStore, type PhotoUploadProgress, type UploadProblems } from '@/lib/local';

export interface PhotoUploads extends PhotoUploadProgress {
  /** Photos whose bytes are still only on this device. */
  waiting: number;
  problems: UploadProblems;
  waitingIds: Set<string>;
}

/** Photos waiting to upload from this device, and why (storage down, offline, refused). */
export function usePhotoUploads(): PhotoUploads | undefined {
  const store = useLocalStore();
  const progress = useSyncExternalStore(subscribePhotoUploadProgress, getPhotoUploadProgress, getPhotoUploadProgress);
  const counts = useLiveQuery(async () => {
    if (!store) return undefined;
    const waiting = await store.photos.filter((p) => !p.uploadedAt).primaryKeys();
    const problems = ((await store.meta.get(UPLOAD_PROBLEMS_KEY))?.value ?? {}) as UploadProblems;
    return { waiting: waiting.length, waitingIds: new Set(waiting), problems };
  }, [store]);
  return counts ? { ...progress, ...counts } : undefined;
}
