import { TokensPanel } from '@/components/admin/tokens-panel';
import { UsersPanel } from '@/components/admin/users-panel';
import { requirePageUser } from '@/lib/auth/current';

export const metadata = { title: 'Admin' };

export default async function AdminPage() {
  const user = await requirePageUser('site.manage', '/admin');
  return (
    <div className="space-y-6">
      <h1>Admin</h1>
      <UsersPanel selfId={user.userId} />
      <TokensPanel />
    </div>
  );
}
