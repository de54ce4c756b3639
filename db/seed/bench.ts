import 'server-only';
import { createHash } from 'node:crypto';
import { pool } from '@/db/client';
import { writeRecordsWithChanges, type ChangeRow, type RecordRow } from '@/db/access/sync-records';
import { SiteSequence, withSyncTransaction } from '@/db/access/sync-sequence';
import { benchEntrySchema, type BenchEntry } from '@/lib/bench/bench-entry-schema';

// Demo bench entries for Calder Reach Works (an invented plant): notes on a lithium chloride lot
// and a calcium chloride brine lot. Written like synced records (site sequence, change log), so
// every device pulls them. Idempotent: each entry has an id derived from the site and its key; an
// entry already present — as seeded, or since edited or deleted by a user — is left as it is.

interface DemoEntry {
  key: string;
  author: string;
  area: string | null;
  lotRef: string;
  note: string;
  tags: string[];
  at: string;
}

const DEMO_BENCH_ENTRIES: DemoEntry[] = [
  {
    key: 'lc-2611-04-receiving',
    author: 'technician@calder-reach.test',
    area: 'Dissolver hall',
    lotRef: 'CR-LC-2611-04',
    note: 'Drum 4 received. Label reads lithium chloride, anhydrous, 25 kg net. Seal intact; no caking felt through the liner.',
    tags: ['receiving', 'label'],
    at: '2026-11-24T07:42:00.000Z',
  },
  {
    key: 'lc-2611-04-sample',
    author: 'qc.technician@calder-reach.test',
    area: 'QC lab',
    lotRef: 'CR-LC-2611-04',
    note: 'Sample taken for the solution-calorimetry check (anhydrous or monohydrate?): 2.00 g into 100.0 g water, bath at 25.0 °C. Weighed in the glove bag; the salt picks up water within minutes in open air.',
    tags: ['calorimetry', 'sampling'],
    at: '2026-11-24T09:15:00.000Z',
  },
  {
    key: 'cb-2611-12-density',
    author: 'technician@calder-reach.test',
    area: 'Dissolver hall',
    lotRef: 'CR-CB-2611-12',
    note: 'Brine tank 2 sampled after the night charge. Hydrometer: 1.39 g/mL at 20 °C. Clear, no sediment.',
    tags: ['brine', 'density'],
    at: '2026-11-25T06:05:00.000Z',
  },
  {
    key: 'cb-2611-12-exotherm',
    author: 'supervisor@calder-reach.test',
    area: 'Dissolver hall',
    lotRef: 'CR-CB-2611-12',
    note: 'Jacket outlet reached 61 °C during the flake charge; charge rate halved as the procedure says. A batch-heat sheet for the next charge to follow.',
    tags: ['dissolver', 'exotherm'],
    at: '2026-11-25T06:40:00.000Z',
  },
];

/** A stable UUID-shaped id for a demo record of a site (same site and key → same id). */
function seedId(siteId: string, key: string): string {
  const h = createHash('sha256').update(`rungbook-demo-bench:${siteId}:${key}`).digest('hex');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-a${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

/** Adds the demo bench entries that are missing; returns how many were added. */
export async function seedBenchEntries(siteId: string): Promise<number> {
  const [userRows] = await pool().query('SELECT id, email FROM users WHERE site_id = ?', [siteId]);
  const [areaRows] = await pool().query('SELECT id, name FROM areas WHERE site_id = ?', [siteId]);
  const userId = new Map((userRows as { id: string; email: string }[]).map((u) => [u.email, u.id]));
  const areaId = new Map((areaRows as { id: string; name: string }[]).map((a) => [a.name, a.id]));

  return withSyncTransaction(
    () => pool().getConnection(),
    async (conn) => {
      const seq = await SiteSequence.lock(conn, siteId);
      const wanted = DEMO_BENCH_ENTRIES.map((d) => ({ d, id: seedId(siteId, d.key) }));
      const [present] = await conn.query('SELECT id FROM bench_entries WHERE id IN (?)', [wanted.map((w) => w.id)]);
      const have = new Set((present as { id: string }[]).map((r) => r.id));
      const rows: RecordRow[] = [];
      const changes: ChangeRow[] = [];
      for (const { d, id } of wanted) {
        const author = userId.get(d.author);
        if (have.has(id) || !author) continue;
        const content: BenchEntry = benchEntrySchema.parse({
          id,
          note: d.note,
          lotRef: d.lotRef,
          areaId: d.area ? (areaId.get(d.area) ?? null) : null,
          tags: d.tags,
          sheetId: null,
          photoIds: [],
          authorId: author,
          deleted: false,
          createdAt: d.at,
          updatedAt: d.at,
        });
        const n = seq.next();
        rows.push({ entity: 'bench_entry', id, siteId, authorId: author, content, revision: 1, lastSeq: n, awaitingReview: false });
        changes.push({ seq: n, entity: 'bench_entry', recordId: id, revision: 1, cause: 'mutation', mutationId: null, actorUserId: author });
      }
      return writeRecordsWithChanges(conn, seq, siteId, rows, changes);
    },
  );
}
