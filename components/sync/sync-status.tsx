'use client';

import type { LocalIdentity } from '@/lib/local';
import { SyncProvider } from './sync-provider';
import { SyncStatusBadge } from './sync-status-badge';

export interface SyncStatusProps {
  identity: LocalIdentity;
  className?: string;
}

/** What the app shell mounts: the local store for the signed-in user, its sync, and the badge. */
export function SyncStatus({ identity, className }: SyncStatusProps) {
  return (
    <>
      <SyncProvider identity={identity} />
      <SyncStatusBadge className={className} />
    </>
  );
}
