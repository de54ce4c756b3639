// Security headers for every response.
//
// Content Security Policy: pages are precached by the service worker for offline use, so a
// per-request nonce cannot work (the cached HTML would carry a stale nonce and every script would
// be blocked offline). Next.js inlines small bootstrap scripts whose text varies per build and
// page, so hashes cannot be listed here either. We therefore allow inline scripts from our own
// pages only ('self' + 'unsafe-inline'), never 'unsafe-eval' in production, forbid framing, plugins
// and foreign form targets, and keep every fetch on our own origin.
const isDev = process.env.NODE_ENV !== 'production';
// Bench photos are served from our own origin (GET /api/v1/photos/:id/image), so images need no
// foreign origin: 'self', data: and the blob: URLs of photos still on the device.
const csp = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${isDev ? " 'unsafe-eval'" : ''}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // Parallel test runs on one machine build into their own folders (lib/ops/test.sh).
  distDir: process.env.NEXT_DIST_DIR || '.next',
  poweredByHeader: false,
  // `npm test` runs `tsc --noEmit` over the whole project (tests included) before building, so the
  // build does not check types a second time.
  // Slot builds point at their own tsconfig so Next's edits to `include` stay out of tsconfig.json.
  typescript: { ignoreBuildErrors: true, tsconfigPath: process.env.NEXT_TSCONFIG_PATH || 'tsconfig.json' },
  typedRoutes: false,
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'Content-Security-Policy', value: csp },
          { key: 'X-Frame-Options', value: 'DENY' },
          { key: 'Referrer-Policy', value: 'same-origin' },
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Permissions-Policy', value: 'camera=(self), microphone=(), geolocation=()' },
        ],
      },
      {
        source: '/sw.js',
        headers: [
          { key: 'Cache-Control', value: 'no-cache, no-store, must-revalidate' },
          { key: 'Service-Worker-Allowed', value: '/' },
        ],
      },
    ];
  },
};

export default nextConfig;
