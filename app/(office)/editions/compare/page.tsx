import Link from 'next/link';
import { DiffView } from '@/components/reference/diff-view';
import { requirePageUser } from '@/lib/auth/current';

export const metadata = { title: 'Compare editions' };

export default async function CompareEditionsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser('site.read', '/editions/compare');
  const p = await searchParams;
  const from = typeof p.from === 'string' ? p.from : '';
  const to = typeof p.to === 'string' ? p.to : '';
  return (
    <section aria-labelledby="compare-title" className="space-y-4">
      <p className="text-sm">
        <Link href="/editions" className="underline">
          All editions
        </Link>
      </p>
      <h1 id="compare-title">Compare two editions</h1>
      {from && to ? <DiffView fromId={from} toId={to} /> : <p role="alert">Choose two editions on the editions page.</p>}
    </section>
  );
}
