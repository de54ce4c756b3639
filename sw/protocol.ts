// What the pages and the service worker agree on. No DOM or worker types here: both the app
// (components/pwa) and sw/sw.ts import this file.

export const SW_URL = '/sw.js';
export const OFFLINE_URL = '/offline';

/**
 * Shells: one page per path serves every query, read on the device — the record shells (`?id=`;
 * records made offline have no server-rendered page) and the new-record forms (`?kind=`, `?lot=`…).
 * The worker keeps one copy per path, whatever the query.
 */
export const SHELL_PATHS = ['/sheets/open', '/bench/open', '/sheets/new', '/bench/new'] as const;

/** Fetched into the page cache after sign-in, so these open offline without a prior visit. */
export const WARM_ROUTES = ['/', '/sheets', '/reference', '/bench', ...SHELL_PATHS] as const;

/** Floor screens (read from the local store) are kept for offline use; online-only screens are not. */
const OFFLINE_PREFIXES = ['/sheets', '/reference', '/bench'];

export function isOfflinePath(pathname: string): boolean {
  return pathname === '/' || OFFLINE_PREFIXES.some((p) => pathname === p || pathname.startsWith(`${p}/`));
}

/** Seen bench photos, kept for offline use; forgotten with the stored pages (sign-out, another user). */
export const PHOTOS_CACHE = 'rungbook-photos';

/** A bench photo's image (`/api/v1/photos/:id/image`, thumbnail or full). */
export function isPhotoImage(pathname: string): boolean {
  return /^\/api\/v1\/photos\/[0-9a-f-]{36}\/image$/i.test(pathname);
}

/** The cache key of a page: shells drop their query (one shell for every id), other pages keep it. */
export function pageCacheKey(url: URL): string {
  const shell = (SHELL_PATHS as readonly string[]).includes(url.pathname);
  return shell ? url.pathname : url.pathname + url.search;
}

/**
 * An RSC payload request from the Next.js router (a client navigation or a prefetch). These are
 * only ever answered by the network: a cached payload names module ids of an older build.
 */
export function isRscRequest(headers: { get(name: string): string | null }, url: URL): boolean {
  return headers.get('RSC') === '1' || headers.get('Next-Router-Prefetch') !== null || url.searchParams.has('_rsc');
}

export type PageToWorker =
  /** Sent by the update banner when the user chooses to reload. */
  | { type: 'SKIP_WAITING' }
  /**
   * Store the offline routes (plus `urls` under the same floor paths) for `owner`, the signed-in
   * user's id. A different owner than the cache's replaces every stored page first.
   */
  | { type: 'WARM_ROUTES'; owner: string; urls?: string[]; force?: boolean }
  /** Drop every stored page and seen photo (sign-out, or a different user on this device). */
  | { type: 'FORGET_PAGES' }
  | { type: 'GET_VERSION' };

export type WorkerToPage =
  | { type: 'WARMED'; owner: string; cached: string[]; failed: string[]; skipped: boolean }
  | { type: 'PAGES_FORGOTTEN' }
  | { type: 'VERSION'; build: string };
