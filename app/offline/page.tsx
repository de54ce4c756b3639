import { RungbookMark } from '@/components/ui/rungbook-mark';
import { TryAgainButton } from '@/components/pwa/try-again-button';

export const metadata = { title: 'Offline' };
// Prerendered at build time and precached by the service worker (lib/ops/build-sw.ts).
export const dynamic = 'force-static';

const OFFLINE_SCREENS = [
  { href: '/', label: 'Today' },
  { href: '/sheets', label: 'Sheets' },
  { href: '/reference', label: 'Reference' },
  { href: '/bench', label: 'Bench log' },
];

/** Shown by the service worker for a screen this device has not stored, while there is no connection. */
export default function OfflinePage() {
  return (
    <main id="main" className="mx-auto max-w-xl space-y-6 px-4 py-12">
      <div className="flex items-center gap-3">
        <RungbookMark className="h-10 w-10" />
        <span className="text-xl font-semibold tracking-tight">Rungbook</span>
      </div>
      <div className="panel space-y-4 p-6">
        <h1>This screen isn’t on this device yet</h1>
        <p>
          There is no connection to the Rungbook server, and this screen has not been stored here. Screens you have opened while signed in
          open without a connection, and anything you record offline waits on this device until it can sync.
        </p>
        <p className="text-ink-soft">Reconcile, edition review and Admin need the server: they work again once you’re back online.</p>
        <nav aria-label="Screens that work offline">
          <ul className="grid grid-cols-2 gap-2">
            {OFFLINE_SCREENS.map((s) => (
              <li key={s.href}>
                {/* A full-page load: the service worker answers it from the device; a client-side
                    navigation would ask the server for an RSC payload first. */}
                <a href={s.href} className="btn-quiet w-full">
                  {s.label}
                </a>
              </li>
            ))}
          </ul>
        </nav>
        <TryAgainButton />
      </div>
    </main>
  );
}
