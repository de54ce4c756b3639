import 'server-only';
import { pool } from '@/db/client';
import { env } from '@/lib/env';
import { sendMail } from '@/lib/mail/send-mail';
import { log } from '@/lib/server/log';
import { withSyncTransaction } from './sync-sequence';

/** At most one reconcile digest per site in this window (issue 6, part 4). */
export const DIGEST_INTERVAL_MS = 15 * 60 * 1000;

/**
 * Send the supervisors a digest of conflicts not yet announced, unless one went out in the last
 * 15 minutes. No daemon: called after each push (and pull), throttled by a database row locked
 * FOR UPDATE, so two app servers never both send. Mail failure rolls back: the next call retries.
 */
export async function maybeSendConflictDigest(siteId: string): Promise<boolean> {
  try {
    const [pending] = await pool().query("SELECT 1 FROM sync_conflicts WHERE site_id = ? AND status = 'open' AND notified_at IS NULL LIMIT 1", [siteId]);
    if ((pending as unknown[]).length === 0) return false;
    return await withSyncTransaction(
      () => pool().getConnection(),
      async (conn) => {
        const now = new Date();
        await conn.query('INSERT IGNORE INTO sync_digest_throttle (site_id, last_sent_at) VALUES (?, ?)', [siteId, new Date(0)]);
        const [t] = await conn.query('SELECT last_sent_at FROM sync_digest_throttle WHERE site_id = ? FOR UPDATE', [siteId]);
        const last = new Date((t as { last_sent_at: Date }[])[0]!.last_sent_at);
        if (now.getTime() - last.getTime() < DIGEST_INTERVAL_MS) return false;
        const [rows] = await conn.query(
          `SELECT c.id, c.kind, c.entity, c.record_id, c.created_at, s.title FROM sync_conflicts c LEFT JOIN sheets s ON s.id = c.record_id
           WHERE c.site_id = ? AND c.status = 'open' AND c.notified_at IS NULL ORDER BY c.created_at FOR UPDATE`,
          [siteId],
        );
        const conflicts = rows as { id: string; kind: 'edit' | 'drift'; entity: string; record_id: string; created_at: Date; title: string | null }[];
        if (conflicts.length === 0) return false;
        const [people] = await conn.query("SELECT email FROM users WHERE site_id = ? AND status = 'active' AND role IN ('supervisor', 'admin')", [siteId]);
        const to = (people as { email: string }[]).map((p) => p.email);
        const url = new URL('/reconcile', env().PUBLIC_URL).toString();
        const lines = conflicts.map((c) => {
          const what = c.kind === 'drift' ? 'edition drift' : 'conflicting edits';
          const name = c.title ? `sheet "${c.title}"` : c.entity.replace('_', ' ');
          return `- ${what} on ${name} (since ${new Date(c.created_at).toISOString().slice(0, 16).replace('T', ' ')} UTC)`;
        });
        await sendMail({
          to,
          subject: `Rungbook: ${conflicts.length} new item${conflicts.length === 1 ? '' : 's'} to reconcile`,
          text: `These changes are kept whole until a supervisor settles them:\n\n${lines.join('\n')}\n\nOpen the reconcile screen: ${url}\n`,
        });
        await conn.query('UPDATE sync_conflicts SET notified_at = ? WHERE id IN (?)', [now, conflicts.map((c) => c.id)]);
        await conn.query('UPDATE sync_digest_throttle SET last_sent_at = ? WHERE site_id = ?', [now, siteId]);
        return true;
      },
    );
  } catch (error) {
    log.error({ err: error, siteId }, 'reconcile digest failed; it will be tried again on the next sync');
    return false;
  }
}
