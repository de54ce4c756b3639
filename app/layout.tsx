import type { Metadata, Viewport } from 'next';
import localFont from 'next/font/local';
import { PwaStatus } from '@/components/pwa/pwa-status';
import './globals.css';

// Inter ships with the app from an npm package; nothing is fetched from a font service.
const body = localFont({
  src: [
    { path: '../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2', style: 'normal' },
    { path: '../node_modules/@fontsource-variable/inter/files/inter-latin-ext-wght-normal.woff2', style: 'normal' },
  ],
  variable: '--font-body',
  display: 'swap',
});

export const metadata: Metadata = {
  title: { default: 'Rungbook', template: '%s · Rungbook' },
  description: 'Lattice and solution energetics for ionic-salt plants: cycles, model checks, batch heat, calorimetry.',
  applicationName: 'Rungbook',
  // iPadOS reads its home-screen icon and title from these, not from the web app manifest.
  icons: { apple: '/icons/rungbook-apple-touch-180.png' },
  appleWebApp: { capable: true, title: 'Rungbook', statusBarStyle: 'default' },
};

export const viewport: Viewport = { themeColor: '#1d554d', width: 'device-width', initialScale: 1 };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={body.variable}>
      <body className="min-h-screen font-sans">
        {children}
        <PwaStatus />
      </body>
    </html>
  );
}
