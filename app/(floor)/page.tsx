import Link from 'next/link';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { areas } from '@/db/schema';
import { getSiteOrThrow } from '@/db/access/sites';
import { requirePageUser } from '@/lib/auth/current';
import { can } from '@/lib/auth/permissions';

export const metadata = { title: 'Today' };

export default async function TodayPage() {
  const user = await requirePageUser('site.read', '/');
  const site = await getSiteOrThrow(user.siteId);
  const siteAreas = await db().select().from(areas).where(eq(areas.siteId, user.siteId)).orderBy(asc(areas.name));
  const cards = [
    { href: '/sheets', title: 'Sheets', text: 'Close a lattice cycle, estimate batch heat, work a reaction or reduce a calorimetry run.' },
    { href: '/reference', title: 'Reference', text: 'The reference edition in force, every value with its source.' },
    { href: '/bench', title: 'Bench log', text: 'Notes and photos from the bench, by lot.' },
    ...(can(user.role, 'reconcile.resolve') ? [{ href: '/reconcile', title: 'Reconcile', text: 'Settle conflicting edits and edition drift.' }] : []),
    ...(can(user.role, 'site.manage') ? [{ href: '/admin', title: 'Admin', text: 'People, roles and API tokens of the site.' }] : []),
  ];
  return (
    <div className="space-y-6">
      <div>
        <h1>{site.name}</h1>
        <p className="text-ink-soft">
          Signed in as {user.displayName} ({user.role}).{' '}
          {siteAreas.length > 0 ? `Areas: ${siteAreas.map((a) => a.name).join(', ')}.` : 'No areas are set up yet.'}
        </p>
      </div>
      <ul className="grid gap-4 sm:grid-cols-2">
        {cards.map((c) => (
          <li key={c.href}>
            <Link href={c.href} className="panel block min-h-touch hover:border-verdigris-500">
              <h2>{c.title}</h2>
              <p className="mt-1 text-sm text-ink-soft">{c.text}</p>
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
