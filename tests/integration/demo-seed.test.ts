// The demo seed's saved sheets (design.md §7), read back over real HTTP from the production build
// and a real MariaDB after test.sh has seeded twice: each re-solves to its stored server result,
// draws its edition inputs from its pinned edition, and a further seed run adds nothing.
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { PullResponse, ServerRecord } from '@/lib/sync/protocol';
import type { ReferenceValue } from '@/lib/reference/properties';
import { ENGINE_VERSION, solve, type SolveResult } from '@/lib/thermo';
import { closeDb, query } from '../support/db';
import { DEMO, signedIn, type Client } from '../support/http';

const run = promisify(execFile);
const PROTO = { 'x-rungbook-sync-protocol': '1' };
afterAll(closeDb);

let client: Client;
let siteId: string;
let sheets: (ServerRecord & { content: Sheet })[];
const userIds = new Map<string, { email: string; role: string }>();

async function pullAll(c: Client): Promise<ServerRecord[]> {
  const records: ServerRecord[] = [];
  for (let cursor = 0; ; ) {
    const r = await c.get<PullResponse>(`/api/v1/sync/pull?cursor=${cursor}&limit=500`, PROTO);
    expect(r.status).toBe(200);
    records.push(...r.body.records);
    cursor = r.body.cursor;
    if (!r.body.more) return records;
  }
}

/** Sheets the seed wrote: their change-log rows carry no device mutation (a push always does). */
async function seededSheetIds(): Promise<string[]> {
  const rows = await query<{ record_id: string }>("SELECT DISTINCT record_id FROM sync_changes WHERE site_id = ? AND entity = 'sheet' AND mutation_id IS NULL", [siteId]);
  return rows.map((r) => r.record_id).sort();
}

const byKind = (kind: Sheet['kind']) => sheets.filter((s) => s.content.kind === kind);
const readAt = (root: unknown, path: readonly (string | number)[]) => path.reduce<unknown>((at, step) => (at && typeof at === 'object' ? (at as Record<string | number, unknown>)[step] : undefined), root);

beforeAll(async () => {
  const [site] = await query<{ id: string }>("SELECT id FROM sites WHERE code = 'calder-reach'");
  siteId = site!.id;
  for (const u of await query<{ id: string; email: string; role: string }>('SELECT id, email, role FROM users WHERE site_id = ?', [siteId])) userIds.set(u.id, u);
  client = await signedIn(DEMO.qcTechnician);
  const seeded = new Set(await seededSheetIds());
  sheets = (await pullAll(client)).filter((r) => r.entity === 'sheet' && seeded.has(r.id)) as typeof sheets;
}, 60_000);

describe('demo sheets', () => {
  it('the demo site has a few saved sheets of every kind, for both demo lots', () => {
    expect(sheets.length).toBeGreaterThanOrEqual(5);
    for (const kind of ['cycle', 'dissolution', 'reaction', 'calorimetry'] as const) expect(byKind(kind).length, kind).toBeGreaterThan(0);
    const lots = sheets.map((s) => s.content.lotRef);
    expect(lots).toContain('CR-CB-2611-12');
    expect(lots).toContain('CR-LC-2611-04');
    // Every demo sheet is authored by a demo role account of the site.
    for (const s of sheets) expect(userIds.get(s.content.authorId)?.email).toMatch(/@calder-reach\.test$/);
  });

  it('each stored result is a fresh solve of its stored problem, not flagged, with the engine version', () => {
    for (const s of sheets) {
      const fresh = solve(s.content.problem as Parameters<typeof solve>[0]);
      expect(s.serverResult, s.content.title).toEqual(fresh);
      expect(s.content.result, s.content.title).toEqual(fresh);
      expect(s.resultDiffers, s.content.title).toBe(false);
      expect(s.awaitingReview).toBe(false);
      expect(s.content.engineVersion).toBe(ENGINE_VERSION);
    }
  });

  it('each sheet is pinned to a seeded edition and its edition inputs hold that edition’s values', async () => {
    const editions = new Map<string, { number: number; values: ReferenceValue[] }>();
    for (const s of sheets) {
      const pinned = s.content.pinnedEditionId!;
      if (!editions.has(pinned)) {
        const r = await client.get<{ edition: { number: number }; values: ReferenceValue[] }>(`/api/v1/editions/${pinned}`);
        expect(r.status).toBe(200);
        editions.set(pinned, { number: r.body.edition.number, values: r.body.values });
      }
      const ed = editions.get(pinned)!;
      // No. 2 is the edition in force when test.sh seeds (db/seed/editions.ts).
      expect(ed.number).toBe(2);
      const fromEdition = s.content.inputs.filter((i) => i.origin.type === 'edition');
      // A calorimetry sheet stores its predictions as derived ('entered') inputs: the workbench's own way.
      if (s.content.kind !== 'calorimetry') expect(fromEdition.length, s.content.title).toBeGreaterThan(0);
      for (const i of fromEdition) {
        if (i.origin.type !== 'edition') continue;
        const { species, phase, property, editionId } = i.origin;
        expect(editionId).toBe(pinned);
        const v = ed.values.find((x) => x.species === species && x.phase === phase && x.property === property);
        expect(v, `${species}(${phase}) ${property}`).toBeDefined();
        const stored = readAt(s.content.problem, i.path);
        const storedValue = stored && typeof stored === 'object' ? (stored as { value: string }).value : stored;
        expect(Number(storedValue), `${s.content.title}: ${i.path.join('.')}`).toBe(Number(v!.value));
      }
    }
  });

  it('the signed-off lattice cycle names a supervisor other than its author and carries the model check', () => {
    const signed = sheets.filter((s) => s.content.status === 'signed_off');
    expect(signed.length).toBeGreaterThan(0);
    for (const s of signed) {
      expect(s.content.signedOffBy).not.toBeNull();
      expect(s.content.signedOffBy).not.toBe(s.content.authorId);
      expect(['supervisor', 'admin']).toContain(userIds.get(s.content.signedOffBy!)?.role);
    }
    const cycle = signed.find((s) => s.content.kind === 'cycle');
    const r = cycle?.serverResult as SolveResult | undefined;
    expect(r?.kind).toBe('cycle');
    expect(r?.kind === 'cycle' && r.modelCheck?.models.length).toBeGreaterThan(0);
  });

  it('the calorimetry run of lot CR-CB-2611-12 reduces to the hexahydrate', () => {
    const sheet = byKind('calorimetry').find((s) => s.content.lotRef === 'CR-CB-2611-12');
    const r = sheet?.serverResult as SolveResult | undefined;
    if (r?.kind !== 'calorimetry') throw new Error('no solved calorimetry sheet for lot CR-CB-2611-12');
    expect(r.result.bestMatch?.formula).toBe('CaCl2·6H2O');
    expect(r.result.bestMatch?.withinTolerance).toBe(true);
    expect(r.result.bestMatch?.text).toContain('CaCl2·6H2O');
    expect(userIds.get(sheet!.content.authorId)?.email).toBe(DEMO.qcTechnician);
  });

  it('no demo sheet uses an alkali-metal fluoride', () => {
    for (const s of sheets) expect(JSON.stringify(s.content.problem)).not.toMatch(/\b(Li|Na|K|Rb|Cs)F\b/);
  });

  it('a further seed run adds nothing and keeps a user’s edit of a demo sheet', async () => {
    // The author edits a draft demo sheet through sync, as the workbench would.
    const draft = sheets.find((s) => s.content.status === 'draft' && userIds.get(s.content.authorId)?.email === DEMO.technician)!;
    const author = await signedIn(DEMO.technician);
    const note = `${draft.content.note} Checked again on the next shift (${Date.now()}).`;
    const deviceId = crypto.randomUUID();
    const push = await author.post<{ outcomes: { status: string; revision?: number }[] }>(
      '/api/v1/sync/push',
      { deviceId, userId: draft.content.authorId, siteId, mutations: [{ mutationId: crypto.randomUUID(), entity: 'sheet', recordId: draft.id, baseRevision: draft.revision, content: { ...draft.content, note } }] },
      PROTO,
    );
    expect(push.status, JSON.stringify(push.body)).toBe(200);
    expect(push.body.outcomes[0]?.status).toBe('applied');

    const before = await seededSheetIds();
    const [seqBefore] = await query<{ seq: number }>('SELECT seq FROM sync_site_seq WHERE site_id = ?', [siteId]);
    const [countBefore] = await query<{ n: number }>('SELECT COUNT(*) AS n FROM sheets WHERE site_id = ?', [siteId]);
    const seed = await run('node_modules/.bin/tsx', ['--conditions=react-server', 'db/seed/index.ts']);
    expect(seed.stdout).toContain('demo sheets: 0 added');
    expect(await seededSheetIds()).toEqual(before);
    const [seqAfter] = await query<{ seq: number }>('SELECT seq FROM sync_site_seq WHERE site_id = ?', [siteId]);
    const [countAfter] = await query<{ n: number }>('SELECT COUNT(*) AS n FROM sheets WHERE site_id = ?', [siteId]);
    expect(Number(seqAfter!.seq)).toBe(Number(seqBefore!.seq));
    expect(Number(countAfter!.n)).toBe(Number(countBefore!.n));
    const [row] = await query<{ note: string; revision: number }>("SELECT JSON_UNQUOTE(JSON_EXTRACT(content, '$.note')) AS note, revision FROM sheets WHERE id = ?", [draft.id]);
    expect(row?.note).toBe(note);
    expect(Number(row?.revision)).toBe(draft.revision + 1);
  }, 120_000);
});
