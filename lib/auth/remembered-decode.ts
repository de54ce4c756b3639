import { decode, type JWT, type JWTDecodeParams } from 'next-auth/jwt';

/**
 * next-auth's own `decode` (key derivation + JWE decryption + claim checks), remembered per cookie
 * value for a while: a device polling with the same session cookie is not decrypted again on every
 * request. Only what next-auth accepted is remembered, keyed by the whole token text and secret; expiry is
 * checked again on every use (with next-auth's 15 s clock tolerance), and the user row is still
 * read from the database on every request (see `currentUser`).
 */
export const DECODED_MAX = 500;
const DECODED_TTL_MS = 5 * 60_000;
const decoded = new Map<string, { payload: JWT; until: number }>();
export async function rememberedDecode(params: JWTDecodeParams): Promise<JWT | null> {
  const key = `${String(params.secret)}\u0000${params.salt ?? ''}\u0000${params.token ?? ''}`;
  const now = Date.now();
  const hit = decoded.get(key);
  if (hit && hit.until > now) return typeof hit.payload.exp === 'number' && hit.payload.exp * 1000 + 15_000 < now ? null : hit.payload;
  if (hit) decoded.delete(key);
  const payload = await decode(params);
  if (!payload) return null;
  if (decoded.size >= DECODED_MAX) decoded.delete(decoded.keys().next().value!);
  decoded.set(key, { payload, until: now + DECODED_TTL_MS });
  return payload;
}
