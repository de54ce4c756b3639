import 'server-only';
import type { PoolConnection } from 'mysql2/promise';

/**
 * The per-site sequence counter (design.md §4). `lock` takes the site's counter row FOR UPDATE
 * inside the writing transaction, so a second writer waits until the first COMMITS before it can
 * number its own changes: change-log order is commit order and a pull by cursor never skips a
 * change that committed late. No auto-increment is involved (Galera-safe: concurrent writers on two
 * nodes fail certification at commit and retry the whole transaction).
 */
export class SiteSequence {
  private current = 0;
  private start = 0;
  private constructor(readonly siteId: string) {}

  static async lock(conn: PoolConnection, siteId: string): Promise<SiteSequence> {
    const s = new SiteSequence(siteId);
    const select = async () => ((await conn.query('SELECT seq FROM sync_site_seq WHERE site_id = ? FOR UPDATE', [siteId]))[0] as { seq: number | string }[])[0];
    // The counter row is made once per site and never deleted: after this process has seen it, the
    // locking read alone is enough.
    let row = COUNTED_SITES.has(siteId) ? await select() : undefined;
    if (!row) {
      await conn.query('INSERT IGNORE INTO sync_site_seq (site_id, seq) VALUES (?, 0)', [siteId]);
      row = await select();
    }
    if (COUNTED_SITES.size >= 10_000) COUNTED_SITES.clear();
    COUNTED_SITES.add(siteId);
    s.current = s.start = Number(row?.seq ?? 0);
    return s;
  }

  next(): number {
    return ++this.current;
  }
  get value(): number {
    return this.current;
  }
  /** Roll back numbers handed out inside a savepoint that was rolled back. */
  reset(to: number) {
    this.current = to;
  }

  /** Write the counter back; call before COMMIT. */
  async save(conn: PoolConnection): Promise<void> {
    if (this.current !== this.start) await conn.query('UPDATE sync_site_seq SET seq = ? WHERE site_id = ?', [this.current, this.siteId]);
    this.start = this.current;
  }
}

/** Sites whose counter row this process has seen. */
const COUNTED_SITES = new Set<string>();

const TRANSIENT = new Set([1213, 1205, 1020]); // deadlock, lock wait timeout, record changed (Galera)

export function isTransientDbError(error: unknown): boolean {
  const e = error as { errno?: number; sqlState?: string; code?: string };
  return (e.errno !== undefined && TRANSIENT.has(e.errno)) || e.sqlState === '40001' || e.code === 'ER_LOCK_DEADLOCK';
}

/**
 * Run `work` in one READ COMMITTED transaction on its own connection; on a deadlock or Galera
 * certification failure (40001) roll back and run the WHOLE transaction again.
 */
export async function withSyncTransaction<T>(getConnection: () => Promise<PoolConnection>, work: (conn: PoolConnection) => Promise<T>, attempts = 4): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    const conn = await getConnection();
    try {
      await conn.query('SET TRANSACTION ISOLATION LEVEL READ COMMITTED');
      await conn.beginTransaction();
      const result = await work(conn);
      await conn.commit();
      return result;
    } catch (error) {
      await conn.rollback().catch(() => {});
      if (attempt < attempts && isTransientDbError(error)) {
        await new Promise((r) => setTimeout(r, 10 * attempt + Math.random() * 20));
        continue;
      }
      throw error;
    } finally {
      conn.release();
    }
  }
}
