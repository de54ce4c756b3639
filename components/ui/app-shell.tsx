import Link from 'next/link';
import { can } from '@/lib/auth/permissions';
import type { UserActor } from '@/lib/auth/current';
import { WarmOfflinePages } from '@/components/pwa/warm-offline-pages';
import { SyncStatus } from '@/components/sync/sync-status';
import { RungbookMark } from './rungbook-mark';
import { NavLinks, type NavItem } from './nav-links';
import { SignOutButton } from './sign-out-button';

export interface AppShellProps {
  user: UserActor;
  siteName: string;
  children: React.ReactNode;
}

export function AppShell({ user, siteName, children }: AppShellProps) {
  const items: NavItem[] = [
    { href: '/', label: 'Today' },
    { href: '/sheets', label: 'Sheets' },
    { href: '/reference', label: 'Reference' },
    { href: '/editions', label: 'Editions' },
    { href: '/bench', label: 'Bench log' },
    ...(can(user.role, 'reconcile.resolve') ? [{ href: '/reconcile', label: 'Reconcile' }] : []),
    ...(can(user.role, 'site.manage') ? [{ href: '/admin', label: 'Admin' }] : []),
  ];
  return (
    <div className="min-h-screen lg:grid lg:grid-cols-[13rem_1fr]">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:p-2">
        Skip to content
      </a>
      <header className="border-b border-rule bg-white lg:min-h-screen lg:border-b-0 lg:border-r">
        <div className="flex items-center gap-3 px-4 py-3">
          <Link href="/" className="flex min-h-touch items-center gap-2 font-semibold tracking-tight">
            <RungbookMark />
            <span className="text-lg">Rungbook</span>
          </Link>
        </div>
        <NavLinks items={items} />
        <div className="hidden border-t border-rule px-4 py-3 text-sm lg:block">
          <p className="font-medium">{user.displayName}</p>
          <p className="text-ink-soft">
            {user.role} · {siteName}
          </p>
          <SignOutButton className="btn-quiet mt-2 w-full" />
        </div>
      </header>
      <main id="main" className="mx-auto w-full min-w-0 max-w-5xl px-4 py-6 md:px-8">
        <div className="mb-4 flex items-center justify-between text-sm text-ink-soft lg:hidden">
          <span>
            {user.displayName} · {user.role}
          </span>
          <SignOutButton className="btn-quiet" />
        </div>
        <SyncStatus identity={{ userId: user.userId, siteId: user.siteId, role: user.role, displayName: user.displayName, email: user.email, siteName }} className="mb-4" />
        {children}
      </main>
      <WarmOfflinePages owner={user.userId} />
    </div>
  );
}
