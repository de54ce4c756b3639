'use client';

import { useOnline } from './use-online';

export interface OfflineIndicatorProps {
  className?: string;
}

/** Says plainly that the device is offline; said in words, not by colour alone. */
export function OfflineIndicator({ className = '' }: OfflineIndicatorProps) {
  const online = useOnline();
  return (
    <div role="status" aria-live="polite" className={className}>
      {online ? null : (
        <p className="pointer-events-auto inline-flex min-h-touch items-center gap-2 rounded-full bg-ink px-4 text-sm font-medium text-paper shadow-md">
          <svg viewBox="0 0 16 16" className="h-4 w-4" aria-hidden="true">
            <path d="M2 6.5a9 9 0 0 1 12 0M4.5 9a5.5 5.5 0 0 1 7 0M2 2l12 12" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" fill="none" />
          </svg>
          Offline — working from this device
        </p>
      )}
    </div>
  );
}
