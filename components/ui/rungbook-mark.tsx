/** Rungbook's mark: two rails and three rungs, the lowest one warm (the lattice step at the bottom of a ladder). */
export function RungbookMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 64 64" className={className} aria-hidden="true">
      <rect width="64" height="64" rx="14" fill="#1d554d" />
      <path d="M20 12v40M44 12v40" stroke="#f7f5f0" strokeWidth="5" strokeLinecap="round" />
      <path d="M20 20h24M20 32h24" stroke="#f7f5f0" strokeWidth="4" strokeLinecap="round" />
      <path d="M20 44h24" stroke="#e9a37f" strokeWidth="4" strokeLinecap="round" />
    </svg>
  );
}
