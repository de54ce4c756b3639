'use client';

import { confirmSignOutWithWaiting } from '@/components/sync/confirm-sign-out';

// next-auth's client (with its runtime helpers, about 10 kB gzipped) is needed only when someone signs
// out, so it is loaded on the click rather than with every signed-in page. The service worker
// precaches every built chunk, so this works offline as before.
async function signOutNow() {
  if (!(await confirmSignOutWithWaiting())) return;
  const { signOut } = await import('next-auth/react');
  await signOut({ callbackUrl: '/sign-in' });
}

export function SignOutButton({ className }: { className?: string }) {
  return (
    <button type="button" className={className} onClick={() => void signOutNow()}>
      Sign out
    </button>
  );
}
