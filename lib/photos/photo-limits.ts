// Limits and formats for bench photos, shared by the browser (before saving) and the server (on
// upload). Pure: no DOM, Node or database imports.

/** The image formats a bench photo may be, recognised by their content (never by name or header). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];

/** Largest upload the server accepts (bytes). The browser's resized JPEGs are far below it. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
/** Largest file the browser will try to read from the camera or disk before resizing it. */
export const PHOTO_SOURCE_MAX_BYTES = 30 * 1024 * 1024;
/** Longest edge of a photo as kept (browser resize); enough to read a gauge or a label. */
export const PHOTO_MAX_EDGE = 2048;
/** Longest edge of a thumbnail (server-made). */
export const THUMB_MAX_EDGE = 320;
/** Decoded pixels the server will process at most (a guard against decompression bombs). */
export const PHOTO_MAX_PIXELS = 40_000_000;
/** How long a signed photo URL stays valid (seconds). */
export const SIGNED_URL_SECONDS = 300;

export const PHOTO_EXTENSION: Record<PhotoType, string> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

export const formatBytes = (n: number): string => (n >= 1024 * 1024 ? `${(n / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(n / 1024))} kB`);
