import { ReferenceBrowser } from '@/components/reference/reference-browser';

export const metadata = { title: 'Reference' };

export default function ReferencePage() {
  return (
    <section aria-labelledby="reference-title" className="space-y-4">
      <h1 id="reference-title">Reference</h1>
      <p className="max-w-prose text-ink-soft">
        The approved reference values every sheet on this site is solved with. Each value names its source; values marked
        “from memory” were not checked against a printed table.
      </p>
      <ReferenceBrowser />
    </section>
  );
}
