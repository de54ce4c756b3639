import type { MetadataRoute } from 'next';

const ANY_SIZES = [48, 72, 96, 128, 144, 152, 192, 256, 384, 512];

// Served at /manifest.webmanifest; Next links it from every page. Colours are the paper ground
// and the verdigris of the mark (tailwind.config.ts).
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: '/',
    name: 'Rungbook',
    short_name: 'Rungbook',
    description: 'Lattice and solution energetics for ionic-salt plants: cycles, model checks, batch heat and calorimetry, on the floor and offline.',
    lang: 'en',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'any',
    background_color: '#f7f5f0',
    theme_color: '#1d554d',
    categories: ['productivity', 'utilities'],
    icons: [
      ...ANY_SIZES.map((s) => ({ src: `/icons/rungbook-${s}.png`, sizes: `${s}x${s}`, type: 'image/png', purpose: 'any' as const })),
      { src: '/icons/rungbook-maskable-192.png', sizes: '192x192', type: 'image/png', purpose: 'maskable' },
      { src: '/icons/rungbook-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
    shortcuts: [
      { name: 'Sheets', url: '/sheets', icons: [{ src: '/icons/rungbook-96.png', sizes: '96x96', type: 'image/png' }] },
      { name: 'Bench log', url: '/bench', icons: [{ src: '/icons/rungbook-96.png', sizes: '96x96', type: 'image/png' }] },
    ],
  };
}
