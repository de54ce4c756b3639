import 'server-only';
import type { Edition } from './editions';
import { getEditionValues } from './editions';

// The JSON body of an edition that is no longer a draft never changes, so each app server keeps
// the last few bodies in memory: a repeat GET costs one small query. Drafts are built fresh each
// time. No state is shared between servers; a cold server rebuilds on first use. Compression is
// left to the server (Next.js drops a Content-Encoding set by a route handler).
const MAX = 8;
const cache = new Map<string, Uint8Array<ArrayBuffer>>();
const utf8 = new TextEncoder();

export async function editionBody(edition: Edition, extra: Record<string, unknown> = {}): Promise<Uint8Array<ArrayBuffer>> {
  const cacheable = edition.state !== 'draft' && Object.keys(extra).length === 0;
  const key = edition.etag;
  const hit = cacheable ? cache.get(key) : undefined;
  if (hit) return hit;
  const values = await getEditionValues(edition.id);
  const body = utf8.encode(JSON.stringify({ edition, values, ...extra }));
  if (cacheable) {
    cache.set(key, body);
    if (cache.size > MAX) cache.delete(cache.keys().next().value!);
  }
  return body;
}

/** 304 when the client's If-None-Match names this edition's ETag, else the body. */
export async function editionResponse(req: Request, edition: Edition, extra: Record<string, unknown> = {}): Promise<Response> {
  const headers: Record<string, string> = { ETag: edition.etag, 'Cache-Control': 'private, no-cache', Vary: 'Accept-Encoding, Cookie' };
  if (matchesEtag(req.headers.get('if-none-match'), edition.etag)) return new Response(null, { status: 304, headers });
  const body = await editionBody(edition, extra);
  // The cached bytes go to the Response as they are (the fetch Response copies a byte body itself).
  return new Response(body, { status: 200, headers: { ...headers, 'Content-Type': 'application/json; charset=utf-8' } });
}

export function matchesEtag(header: string | null, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((t) => {
    const tag = t.trim().replace(/^W\//, '');
    return tag === '*' || tag === etag;
  });
}
