'use client';

import { signIn } from 'next-auth/react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { FormAlert } from '@/components/ui/form-alert';

/** The link is used only when the person presses the button, so a mail scanner's visit does not spend it. */
export function LinkSignIn({ token }: { token: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(token ? null : 'This sign-in link is incomplete. Ask for a new one.');
  const [busy, setBusy] = useState(false);
  const go = async () => {
    setBusy(true);
    const result = await signIn('link', { token, redirect: false });
    setBusy(false);
    if (!result || result.error) {
      setError(result?.error && result.error !== 'CredentialsSignin' ? result.error : 'This sign-in link is not valid. Ask for a new one.');
      return;
    }
    router.replace('/');
    router.refresh();
  };
  return (
    <div className="space-y-4">
      {error ? (
        <>
          <FormAlert>{error}</FormAlert>
          <Link href="/sign-in" className="btn-quiet w-full">
            Back to sign-in
          </Link>
        </>
      ) : (
        <button type="button" className="btn-primary w-full" onClick={() => void go()} disabled={busy}>
          {busy ? 'Signing in…' : 'Sign in to Rungbook'}
        </button>
      )}
    </div>
  );
}
