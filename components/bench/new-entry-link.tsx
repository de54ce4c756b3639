'use client';

import Link from 'next/link';

export interface NewEntryLinkProps {
  lot?: string;
  sheetId?: string;
  className?: string;
  children: React.ReactNode;
  'aria-label'?: string;
}

export function newEntryQuery(lot?: string, sheetId?: string): string {
  const q = new URLSearchParams();
  if (lot) q.set('lot', lot);
  if (sheetId) q.set('sheet', sheetId);
  return q.toString();
}

/**
 * A link to /bench/new (a shell the service worker keeps). Offline it loads the whole page, which
 * the worker answers from its stored copy; the router would otherwise first try the server.
 */
export function NewEntryLink({ lot, sheetId, className, children, ...rest }: NewEntryLinkProps) {
  const q = newEntryQuery(lot, sheetId);
  return (
    <Link
      href={q ? `/bench/new?${q}` : '/bench/new'}
      className={className}
      prefetch={false}
      aria-label={rest['aria-label']}
      onClick={(e) => {
        if (navigator.onLine) return;
        e.preventDefault();
        // A full page load, so the service worker answers from its stored shell (no server payload offline).
        window.location.assign(q ? `/bench/new?${q}` : '/bench/new');
      }}
    >
      {children}
    </Link>
  );
}
