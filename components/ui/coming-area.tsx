export interface ComingAreaProps {
  title: string;
  purpose: string;
  status: string;
}

/** An area of the app whose screens are not in this release yet: says so plainly. */
export function ComingArea({ title, purpose, status }: ComingAreaProps) {
  return (
    <section aria-labelledby="area-title" className="space-y-4">
      <h1 id="area-title">{title}</h1>
      <p className="max-w-prose text-ink-soft">{purpose}</p>
      <p className="panel max-w-prose border-dashed text-sm">
        <strong className="font-semibold">Not in this release yet.</strong> {status}
      </p>
    </section>
  );
}
