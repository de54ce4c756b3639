import { AuthFrame } from '@/components/auth/auth-frame';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';

export const metadata = { title: 'Accept your invitation' };
export const dynamic = 'force-dynamic';

export default async function InvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <AuthFrame title="Set your password">
      <AcceptInvitationForm token={token ?? ''} />
    </AuthFrame>
  );
}
