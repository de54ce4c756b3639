import 'server-only';
import { createHash, randomBytes } from 'node:crypto';

/** A URL-safe random secret with a readable prefix (`rbt_` tokens, `rbl_` links). */
export function newSecret(prefix: string): string {
  return `${prefix}${randomBytes(32).toString('base64url')}`;
}

/** Secrets are stored only as SHA-256: they are long and random, so a slow hash adds nothing. */
export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}
