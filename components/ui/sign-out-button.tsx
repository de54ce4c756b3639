'use client';

import { signOut } from 'next-auth/react';
import { confirmSignOutWithWaiting } from '@/components/sync/confirm-sign-out';

export function SignOutButton({ className }: { className?: string }) {
  return (
    <button type="button" className={className} onClick={async () => (await confirmSignOutWithWaiting()) && void signOut({ callbackUrl: '/sign-in' })}>
      Sign out
    </button>
  );
}
