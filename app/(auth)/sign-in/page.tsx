import { redirect } from 'next/navigation';
import { AuthFrame } from '@/components/auth/auth-frame';
import { SignInForm } from '@/components/auth/sign-in-form';
import { currentUser } from '@/lib/auth/current';

export const metadata = { title: 'Sign in' };
export const dynamic = 'force-dynamic';

/** Only same-site paths are followed after sign-in. */
const safeNext = (next?: string) => (next && next.startsWith('/') && !next.startsWith('//') ? next : '/');

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  if (await currentUser()) redirect(safeNext(next));
  return (
    <AuthFrame title="Sign in">
      <SignInForm next={safeNext(next)} />
    </AuthFrame>
  );
}
