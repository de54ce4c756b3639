import 'server-only';
import { gzipSync } from 'node:zlib';
import type { Edition } from './editions';
import { getEditionValues } from './editions';

// The JSON body of an edition that is no longer a draft never changes, so each app server keeps
// the last few bodies (and their gzip) in memory: a repeat GET costs one small query. Drafts are
// built fresh each time. No state is shared between servers; a cold server rebuilds on first use.
const MAX = 8;
const cache = new Map<string, { json: Buffer; gzip: Buffer }>();

export async function editionBody(edition: Edition, extra: Record<string, unknown> = {}): Promise<{ json: Buffer; gzip: Buffer }> {
  const cacheable = edition.state !== 'draft' && Object.keys(extra).length === 0;
  const key = `${edition.id}:${edition.revision}:${edition.state}`;
  const hit = cacheable ? cache.get(key) : undefined;
  if (hit) return hit;
  const values = await getEditionValues(edition.id);
  const json = Buffer.from(JSON.stringify({ edition, values, ...extra }));
  const body = { json, gzip: gzipSync(json, { level: 6 }) };
  if (cacheable) {
    cache.set(key, body);
    if (cache.size > MAX) cache.delete(cache.keys().next().value!);
  }
  return body;
}

/** 304 when the client's If-None-Match names this edition's ETag, else the body (gzip when accepted). */
export async function editionResponse(req: Request, edition: Edition, extra: Record<string, unknown> = {}): Promise<Response> {
  const headers: Record<string, string> = { ETag: edition.etag, 'Cache-Control': 'private, no-cache', Vary: 'Accept-Encoding, Cookie' };
  if (matchesEtag(req.headers.get('if-none-match'), edition.etag)) return new Response(null, { status: 304, headers });
  const body = await editionBody(edition, extra);
  const gz = /\bgzip\b/.test(req.headers.get('accept-encoding') ?? '');
  return new Response(new Uint8Array(gz ? body.gzip : body.json), {
    status: 200,
    headers: { ...headers, 'Content-Type': 'application/json; charset=utf-8', ...(gz ? { 'Content-Encoding': 'gzip' } : {}) },
  });
}

export function matchesEtag(header: string | null, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((t) => {
    const tag = t.trim().replace(/^W\//, '');
    return tag === '*' || tag === etag;
  });
}
