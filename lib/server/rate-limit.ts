import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db/client';
import { AppError } from './errors';

/**
 * Fixed-window counter kept in MariaDB, so a limit holds across app servers. One statement:
 * a new window starts when the old one has ended. MariaDB evaluates the SET list left to right,
 * so both IFs below still see the old window end.
 */
export async function hitRateLimit(key: string, limit: number, windowSeconds: number): Promise<{ ok: boolean; hits: number; retryAfter: number }> {
  await db().execute(sql`
    INSERT INTO rate_limits (bucket_key, hits, window_ends_at)
    VALUES (${key}, 1, UTC_TIMESTAMP(3) + INTERVAL ${windowSeconds} SECOND)
    ON DUPLICATE KEY UPDATE
      hits = IF(window_ends_at <= UTC_TIMESTAMP(3), 1, hits + 1),
      window_ends_at = IF(window_ends_at <= UTC_TIMESTAMP(3), VALUES(window_ends_at), window_ends_at)`);
  const [rows] = (await db().execute(
    sql`SELECT hits, GREATEST(0, TIMESTAMPDIFF(SECOND, UTC_TIMESTAMP(3), window_ends_at)) AS retry FROM rate_limits WHERE bucket_key = ${key}`,
  )) as unknown as [{ hits: number; retry: number }[]];
  const row = rows[0] ?? { hits: 1, retry: windowSeconds };
  return { ok: row.hits <= limit, hits: row.hits, retryAfter: Number(row.retry) };
}

export async function enforceRateLimit(key: string, limit: number, windowSeconds: number): Promise<void> {
  const r = await hitRateLimit(key, limit, windowSeconds);
  if (!r.ok) throw new AppError('rate_limited', `Too many attempts. Try again in ${Math.max(1, r.retryAfter)} s.`, { retryAfter: r.retryAfter });
}
