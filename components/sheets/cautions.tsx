// The cautions shown beside a number that can hurt someone (design.md §8).
export interface CautionsProps {
  items: string[];
  warnings?: string[];
}

export function Cautions({ items, warnings = [] }: CautionsProps) {
  return (
    <aside aria-label="Cautions" className="rounded-md border-l-4 border-ember-500 bg-ember-50 p-3 text-sm">
      {warnings.length > 0 ? (
        <ul className="mb-2 space-y-1 font-semibold text-ember-700" role="alert">
          {warnings.map((w) => (
            <li key={w}>⚠ {w}</li>
          ))}
        </ul>
      ) : null}
      <p className="font-semibold">Before you act on this number</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {items.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
