import { EditionsList } from '@/components/reference/editions-list';
import { requirePageUser } from '@/lib/auth/current';

export const metadata = { title: 'Reference editions' };

export default async function EditionsPage() {
  await requirePageUser('site.read', '/editions');
  return (
    <section aria-labelledby="editions-title" className="space-y-4">
      <h1 id="editions-title">Reference editions</h1>
      <p className="max-w-prose text-ink-soft">
        One edition is in force at a time. A draft starts as a copy of it; its author submits it, and a supervisor other than the author
        approves it (it comes into force and the previous one is retired, still readable) or sends it back with a reason. Its author
        may withdraw it from review; a draft nobody needs is discarded, and stays listed and readable.
      </p>
      <EditionsList />
    </section>
  );
}
