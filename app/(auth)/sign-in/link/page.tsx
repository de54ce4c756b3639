import { AuthFrame } from '@/components/auth/auth-frame';
import { LinkSignIn } from '@/components/auth/link-sign-in';

export const metadata = { title: 'Sign in with a link' };
export const dynamic = 'force-dynamic';

export default async function LinkPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <AuthFrame title="Sign in with your link">
      <LinkSignIn token={token ?? ''} />
    </AuthFrame>
  );
}
