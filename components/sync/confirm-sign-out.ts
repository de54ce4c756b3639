'use client';

import { getActiveStore } from '@/lib/local';

/**
 * Before signing out: if changes wait to sync, say so and ask. The changes are never deleted — they
 * stay in this user's local store and sync after their next sign-in on this device.
 */
export async function confirmSignOutWithWaiting(): Promise<boolean> {
  const store = getActiveStore();
  if (!store) return true;
  const waiting = await store.outbox.count();
  if (waiting === 0) return true;
  return window.confirm(
    `${waiting} change${waiting === 1 ? '' : 's'} on this device ${waiting === 1 ? 'is' : 'are'} still waiting to sync.\n\n` +
      'They stay on this device for you and are sent after you sign in again here. Sign out anyway?',
  );
}
