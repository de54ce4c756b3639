import { headers } from 'next/headers';
import { getSiteOrThrow } from '@/db/access/sites';
import { requirePageUser } from '@/lib/auth/current';
import type { Permission } from '@/lib/auth/permissions';
import { AppShell } from './app-shell';

/** Server-side gate for every signed-in page: sign in, hold the permission, then the shell. */
export async function SignedInShell({ children, requires = 'site.read' }: { children: React.ReactNode; requires?: Permission }) {
  const path = (await headers()).get('x-rungbook-path') ?? '/';
  const user = await requirePageUser(requires, path);
  const site = await getSiteOrThrow(user.siteId);
  return (
    <AppShell user={user} siteName={site.name}>
      {children}
    </AppShell>
  );
}
