import { EditionDetail } from '@/components/reference/edition-detail';
import { requirePageUser } from '@/lib/auth/current';
import { can } from '@/lib/auth/permissions';

export const metadata = { title: 'Reference edition' };

export default async function EditionPage({ params }: { params: Promise<{ editionId: string }> }) {
  const { editionId } = await params;
  const user = await requirePageUser('site.read', `/editions/${editionId}`);
  return <EditionDetail editionId={editionId} userId={user.userId} canApprove={can(user.role, 'edition.approve')} />;
}
