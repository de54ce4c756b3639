// Sync over real HTTP against the production build and a real MariaDB (issue 6, parts 3–6).
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { v7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hash } from '@node-rs/argon2';
import { Client, mailTo, signedIn } from '../support/http';
import { closeDb, makeSite, outcomesOf, query, testDb } from '../support/db';
import { SiteSequence } from '@/db/access/sync-sequence';
import { insertChanges, upsertRecords } from '@/db/access/sync-records';
import { mergePulled, type LocalRecord } from '@/lib/sync/local-state';
import type { MutationOutcome, PullResponse, PushResponse, ServerRecord } from '@/lib/sync/protocol';

const PROTO = { 'x-rungbook-sync-protocol': '1' };
type Site = Awaited<ReturnType<typeof makeSite>>;
type Who = { client: Client; userId: string; siteId: string; deviceId: string };

let site: Site;
let tech: Who;
let sup: Who;
let sup2: Who;

async function as(s: Site, role: 'technician' | 'supervisor' | 'supervisor2' | 'admin'): Promise<Who> {
  const client = await signedIn(s.users[role].email, s.password);
  return { client, userId: s.users[role].id, siteId: s.siteId, deviceId: v7() };
}

const now = () => new Date().toISOString();

/**
 * A fresh account on the demo site (which has the seeded retired and in-force editions), so these
 * tests do not spend the shared demo accounts' sign-in rate limit.
 */
async function demoSiteUser(role: 'technician' | 'supervisor'): Promise<Who> {
  const [demo] = await query<{ id: string }>("SELECT id FROM sites WHERE code = 'calder-reach'");
  const id = v7();
  const email = `sync-${role}-${id.slice(-12)}@calder-reach.test`;
  await query("INSERT INTO users (id, site_id, email, display_name, role, status, password_hash, created_at) VALUES (?, ?, ?, ?, ?, 'active', ?, UTC_TIMESTAMP(3))", [
    id,
    demo!.id,
    email,
    `Sync test ${role}`,
    role,
    await hash('a-test-password'),
  ]);
  return { client: await signedIn(email, 'a-test-password'), userId: id, siteId: demo!.id, deviceId: v7() };
}

function benchEntry(who: Who, fields: Record<string, unknown> = {}) {
  const t = now();
  return { id: v7(), note: 'Dissolver 2 charge looked damp', lotRef: 'CR-0412', areaId: null, tags: ['dissolver'], sheetId: null, photoIds: [], authorId: who.userId, deleted: false, createdAt: t, updatedAt: t, ...fields };
}

// Formation enthalpies below are test inputs for the engine, not check values.
const REACTION_PROBLEM = {
  kind: 'reaction',
  problem: { reaction: 'CaO(cr) + H2O(l) -> Ca(OH)2(cr)', enthalpiesOfFormation: { 'CaO(cr)': '-634.9', 'H2O(l)': '-285.83', 'Ca(OH)2(cr)': '-985.2' } },
};

function sheet(who: Who, fields: Record<string, unknown> = {}) {
  const t = now();
  return {
    id: v7(), kind: 'reaction', title: 'Slaking heat, lot CR-0412', lotRef: 'CR-0412', areaId: null, note: '', status: 'draft',
    problem: REACTION_PROBLEM, inputs: [], result: null, pinnedEditionId: null, engineVersion: null, version: 1, previousVersionId: null,
    authorId: who.userId, signedOffBy: null, signedOffAt: null, deleted: false, createdAt: t, updatedAt: t, ...fields,
  };
}

function mutation(entity: 'sheet' | 'bench_entry', content: { id: string } & Record<string, unknown>, baseRevision = 0, mutationId = v7()) {
  return { mutationId, entity, recordId: content.id, baseRevision, content };
}

async function push(who: Who, mutations: unknown[], over: Record<string, unknown> = {}) {
  return who.client.post<PushResponse & { error?: { code: string; message: string } }>('/api/v1/sync/push', { deviceId: who.deviceId, userId: who.userId, siteId: who.siteId, mutations, ...over }, PROTO);
}

async function pushOk(who: Who, mutations: unknown[]): Promise<MutationOutcome[]> {
  const r = await push(who, mutations);
  expect(r.status, JSON.stringify(r.body)).toBe(200);
  return r.body.outcomes;
}

async function pull(who: Who, cursor = 0, limit = 500) {
  return who.client.get<PullResponse>(`/api/v1/sync/pull?cursor=${cursor}&limit=${limit}`, PROTO);
}

async function pullAll(who: Who, cursor = 0): Promise<{ records: ServerRecord[]; cursor: number }> {
  const records: ServerRecord[] = [];
  for (;;) {
    const r = await pull(who, cursor);
    expect(r.status).toBe(200);
    records.push(...r.body.records);
    cursor = r.body.cursor;
    if (!r.body.more) return { records, cursor };
  }
}

async function siteCursor(siteId: string): Promise<number> {
  const [row] = await query<{ seq: number }>('SELECT seq FROM sync_site_seq WHERE site_id = ?', [siteId]);
  return Number(row?.seq ?? 0);
}

beforeAll(async () => {
  site = await makeSite('sync');
  [tech, sup, sup2] = await Promise.all([as(site, 'technician'), as(site, 'supervisor'), as(site, 'supervisor2')]);
});
afterAll(closeDb);

describe('push: exactly once', () => {
  it('a push replayed in sequence takes effect once and the replay returns the first outcome', async () => {
    const e = benchEntry(tech);
    const m = mutation('bench_entry', e);
    const [first] = await pushOk(tech, [m]);
    expect(first).toMatchObject({ status: 'applied', revision: 1 });
    expect('duplicate' in first!).toBe(false);
    const [again] = await pushOk(tech, [m]);
    expect(again).toMatchObject({ status: 'applied', revision: 1, duplicate: true });
    const changes = await query('SELECT seq FROM sync_changes WHERE record_id = ?', [e.id]);
    expect(changes).toHaveLength(1);
    const [row] = await query<{ revision: number }>('SELECT revision FROM bench_entries WHERE id = ?', [e.id]);
    expect(row!.revision).toBe(1);
  });

  it('a push replayed in parallel takes effect once', async () => {
    const e = benchEntry(tech);
    const m = mutation('bench_entry', e);
    const replies = await Promise.all(Array.from({ length: 6 }, () => push(tech, [m])));
    for (const r of replies) expect(r.status, JSON.stringify(r.body)).toBe(200);
    const outcomes = replies.map((r) => r.body.outcomes[0]!);
    expect(outcomes.filter((o) => !('duplicate' in o))).toHaveLength(1);
    for (const o of outcomes) expect(o).toMatchObject({ status: 'applied', revision: 1 });
    expect(await query('SELECT seq FROM sync_changes WHERE record_id = ?', [e.id])).toHaveLength(1);
    expect(await outcomesOf([e.id])).toEqual([{ mutation_id: m.mutationId, record_id: e.id, status: 'applied', revision: 1 }]);
  });

  it("a mutation id another user's device sends again never takes the first device's outcome, and a replay of it still gets its own", async () => {
    const mine = benchEntry(tech);
    const m = mutation('bench_entry', mine);
    await pushOk(tech, [m]);
    // The same id on a supervisor's tablet: for the same record, and for a record of its own.
    const sameRecord = await pushOk(sup, [{ ...m, content: { ...mine, note: 'not theirs to change' }, baseRevision: 1 }]);
    expect(sameRecord[0]).toMatchObject({ status: 'rejected' });
    expect(sameRecord[0]).not.toHaveProperty('duplicate');
    const theirs = benchEntry(sup);
    const other = await pushOk(sup, [{ ...mutation('bench_entry', theirs), mutationId: m.mutationId }]);
    expect(other[0]).not.toHaveProperty('duplicate');
    // The technician's replay is still answered with the first outcome, and the entry is unchanged.
    const [again] = await pushOk(tech, [m]);
    expect(again).toMatchObject({ status: 'applied', revision: 1, duplicate: true });
    const [row] = await query<{ revision: number; content: { note: string } }>('SELECT revision, content FROM bench_entries WHERE id = ?', [mine.id]);
    expect(row).toMatchObject({ revision: 1, content: { note: mine.note } });
  });

  it('the server dropping the connection after commit, before replying: the retry applies the change exactly once', async () => {
    // Simulated honestly without a test hook in the server: a loopback proxy forwards the push to
    // the real server, waits for its full reply (so the transaction has committed) and then
    // destroys the client's socket instead of passing the reply on — to the device this is a server
    // that died after COMMIT. The device then retries the same mutation through the same proxy.
    let dropNext = false;
    const upstream = new URL(tech.client.origin);
    const proxy = http.createServer((req, res) => {
      const fwd = http.request({ host: upstream.hostname, port: upstream.port, path: req.url, method: req.method, headers: req.headers }, (up) => {
        if (dropNext && req.url?.startsWith('/api/v1/sync/push')) {
          dropNext = false;
          up.resume();
          up.on('end', () => req.socket.destroy());
          return;
        }
        res.writeHead(up.statusCode ?? 502, up.headers);
        up.pipe(res);
      });
      req.pipe(fwd);
    });
    await new Promise<void>((r) => proxy.listen(0, '127.0.0.1', r));
    try {
      const via = new Client(`http://127.0.0.1:${(proxy.address() as AddressInfo).port}`);
      expect(await via.signIn(site.users.technician.email, site.password)).toBeNull();
      const who = { ...tech, client: via };
      const e = benchEntry(tech);
      const m = mutation('bench_entry', e);
      dropNext = true;
      await expect(push(who, [m])).rejects.toThrow();
      // The change committed although the device never heard back…
      expect(await query('SELECT revision FROM bench_entries WHERE id = ?', [e.id])).toEqual([{ revision: 1 }]);
      // …and the retry is answered with the first outcome, changing nothing.
      const r = await push(who, [m]);
      expect(r.status).toBe(200);
      expect(r.body.outcomes[0]).toMatchObject({ status: 'applied', revision: 1, duplicate: true });
      expect(await query('SELECT seq FROM sync_changes WHERE record_id = ?', [e.id])).toHaveLength(1);
    } finally {
      proxy.closeAllConnections();
      await new Promise((r) => proxy.close(r));
    }
  });

  it('a poison change is recorded as rejected (naming the field) and the rest of the queue still applies', async () => {
    const good1 = benchEntry(tech);
    const poison = benchEntry(tech, { tags: 'not-a-list' });
    const good2 = benchEntry(tech);
    const pm = mutation('bench_entry', poison);
    const outcomes = await pushOk(tech, [mutation('bench_entry', good1), pm, mutation('bench_entry', good2)]);
    expect(outcomes.map((o) => o.status)).toEqual(['applied', 'rejected', 'applied']);
    const rejected = outcomes[1] as Extract<MutationOutcome, { status: 'rejected' }>;
    expect(rejected.reason).toContain('content.tags');
    expect(rejected.fields?.[0]?.field).toBe('content.tags');
    expect(await query('SELECT id FROM bench_entries WHERE id = ?', [poison.id])).toHaveLength(0);
    expect(await query("SELECT status FROM sync_mutations WHERE mutation_id = ?", [pm.mutationId])).toEqual([{ status: 'rejected' }]);
    // A replay of the poison change gets the same answer, never a different one.
    const [again] = await pushOk(tech, [pm]);
    expect(again).toMatchObject({ status: 'rejected', duplicate: true, reason: rejected.reason });
  });

  it('a malformed batch envelope is refused with 422 naming the row, and changes nothing', async () => {
    const e = benchEntry(tech);
    const before = await siteCursor(site.siteId);
    const r = await push(tech, [mutation('bench_entry', e), { mutationId: 'nope', entity: 'bench_entry', recordId: e.id, baseRevision: -1, content: {} }]);
    expect(r.status).toBe(422);
    expect(JSON.stringify(r.body)).toContain('mutations.1.mutationId');
    expect(await siteCursor(site.siteId)).toBe(before);
  });
});

describe('pull: commit order, idempotent pages', () => {
  it('a transaction that started first but commits after a later one is still delivered by the next pull', async () => {
    const c0 = (await pull(tech, await siteCursor(site.siteId))).body.cursor;
    // Writer A: its own DB connection, numbering its change with the same site counter the server uses.
    const connA = await testDb().getConnection();
    await connA.query('SET TRANSACTION ISOLATION LEVEL READ COMMITTED');
    await connA.beginTransaction();
    const seqA = await SiteSequence.lock(connA, site.siteId);
    const a = benchEntry(tech, { note: 'written by the slow transaction' });
    const aSeq = seqA.next();
    await upsertRecords(connA, [{ entity: 'bench_entry', id: a.id, siteId: site.siteId, authorId: tech.userId, content: a, revision: 1, lastSeq: aSeq, awaitingReview: false }], new Date());
    await insertChanges(connA, site.siteId, [{ seq: aSeq, entity: 'bench_entry', recordId: a.id, revision: 1, cause: 'mutation', mutationId: null, actorUserId: tech.userId }], new Date());
    await seqA.save(connA);
    // Writer B: a real push over HTTP, started after A and on another connection.
    const b = benchEntry(tech, { note: 'written by the fast transaction' });
    let bDone = false;
    const bPush = pushOk(tech, [mutation('bench_entry', b)]).then((o) => ((bDone = true), o));
    await new Promise((r) => setTimeout(r, 600));
    // B cannot number (and so cannot commit) its change before A commits: nothing new to pull yet.
    expect(bDone).toBe(false);
    const mid = await pull(tech, c0);
    expect(mid.body.records).toHaveLength(0);
    expect(mid.body.cursor).toBe(c0);
    await connA.commit();
    connA.release();
    const [bOutcome] = await bPush;
    expect(bOutcome).toMatchObject({ status: 'applied' });
    const after = await pullAll(tech, c0);
    const ids = after.records.map((r) => r.id);
    expect(ids).toEqual([a.id, b.id]);
    expect(after.records[0]!.seq).toBeLessThan(after.records[1]!.seq);
  });

  it('two raw writers: the second waits on the site counter until the first commits, so sequence order is commit order', async () => {
    const s = await makeSite('seq');
    const c1 = await testDb().getConnection();
    const c2 = await testDb().getConnection();
    try {
      await c1.beginTransaction();
      const q1 = await SiteSequence.lock(c1, s.siteId);
      const n1 = q1.next();
      await c2.beginTransaction();
      let got2: number | null = null;
      const second = SiteSequence.lock(c2, s.siteId).then((q2) => (got2 = q2.next()));
      await new Promise((r) => setTimeout(r, 400));
      expect(got2).toBeNull();
      await q1.save(c1);
      await c1.commit();
      await second;
      expect(got2).toBe(n1 + 1);
      await c2.rollback();
    } finally {
      c1.release();
      c2.release();
    }
  });

  it('pages delivered twice or out of order merge to the same state and the cursor never moves backwards', async () => {
    const s = await makeSite('pages');
    const w = await as(s, 'technician');
    const entries = Array.from({ length: 7 }, () => benchEntry(w));
    const outcomes = await pushOk(w, entries.map((e) => mutation('bench_entry', e)));
    // Edit two of them, so some records appear on more than one page.
    await pushOk(w, [mutation('bench_entry', { ...entries[0]!, note: 'edited once' }, 1), mutation('bench_entry', { ...entries[3]!, note: 'edited too' }, 1)]);
    expect(outcomes.every((o) => o.status === 'applied')).toBe(true);
    const pages: PullResponse[] = [];
    let cursor = 0;
    for (;;) {
      const p = await pull(w, cursor, 2);
      pages.push(p.body);
      expect(p.body.cursor).toBeGreaterThanOrEqual(cursor);
      cursor = p.body.cursor;
      if (!p.body.more) break;
    }
    const beyond = await pull(w, cursor + 100, 2);
    expect(beyond.body.cursor).toBe(cursor + 100);
    expect(beyond.body.records).toHaveLength(0);

    const apply = (order: PullResponse[]) => {
      const store = new Map<string, LocalRecord>();
      let at = 0;
      for (const page of order) {
        for (const r of page.records) {
          const next = mergePulled(store.get(r.id), r, false);
          if (next) store.set(r.id, next);
        }
        at = Math.max(at, page.cursor);
      }
      return { store, at };
    };
    const inOrder = apply(pages);
    const shuffled = apply([...pages].reverse().flatMap((p) => [p, p]));
    expect(shuffled.at).toBe(inOrder.at);
    expect([...shuffled.store.entries()].sort()).toEqual([...inOrder.store.entries()].sort());
    expect((inOrder.store.get(entries[0]!.id)!.content as { note: string }).note).toBe('edited once');
    expect(inOrder.store.size).toBe(7);
  });
});

describe('conflicts', () => {
  for (const order of ['A then B', 'B then A'] as const) {
    it(`two devices edit one record from the same revision (${order}): a conflict keeps both versions`, async () => {
      const devA = tech;
      const devB = { ...tech, deviceId: v7() }; // the same technician's second tablet
      const e = benchEntry(tech);
      await pushOk(devA, [mutation('bench_entry', e)]);
      const fromA = mutation('bench_entry', { ...e, note: 'edit on tablet A' }, 1);
      const fromB = mutation('bench_entry', { ...e, note: 'edit on tablet B' }, 1);
      const [firstDev, firstM, secondDev, secondM] = order === 'A then B' ? [devA, fromA, devB, fromB] : [devB, fromB, devA, fromA];
      const [o1] = await pushOk(firstDev, [firstM]);
      const [o2] = await pushOk(secondDev, [secondM]);
      expect(o1).toMatchObject({ status: 'applied', revision: 2 });
      expect(o2).toMatchObject({ status: 'conflict' });
      const conflict = o2 as Extract<MutationOutcome, { status: 'conflict' }>;
      // The record keeps the server's version (the first arrival), marked awaiting review.
      expect(conflict.record).toMatchObject({ revision: 2, awaitingReview: true });
      expect((conflict.record as { content: { note: string } }).content.note).toBe((firstM.content as unknown as { note: string }).note);
      const detail = await sup.client.get<{ server: { content: { note: string } }; versions: { content: { note: string } }[]; differences: { field: string }[] }>(`/api/v1/conflicts/${conflict.conflictId}`);
      expect(detail.status).toBe(200);
      expect(detail.body.server.content.note).toBe((firstM.content as unknown as { note: string }).note);
      expect(detail.body.versions.map((v) => v.content.note)).toEqual([(secondM.content as unknown as { note: string }).note]);
      expect(detail.body.differences.map((d) => d.field)).toEqual(['note']);
      // A later edit on the same stale base joins the same conflict.
      const [o3] = await pushOk(secondDev, [mutation('bench_entry', { ...e, note: 'second try on the stale base' }, 1)]);
      expect(o3).toMatchObject({ status: 'conflict', conflictId: conflict.conflictId });
      const again = await sup.client.get<{ versions: unknown[] }>(`/api/v1/conflicts/${conflict.conflictId}`);
      expect(again.body.versions).toHaveLength(2);
      // Every device sees the record as awaiting review.
      const pulled = (await pullAll(devA)).records.find((r) => r.id === e.id);
      expect(pulled?.awaitingReview).toBe(true);
    });
  }

  it('a reply lost on the way back, then a later edit merged on the old base: applied on top of the device’s own change, not a conflict with itself', async () => {
    const devA = { ...tech, deviceId: v7() };
    const e = benchEntry(tech);
    await pushOk(devA, [mutation('bench_entry', e)]);
    // The first edit is applied (revision 2), but its reply never reaches the tablet...
    const [lost] = await pushOk(devA, [mutation('bench_entry', { ...e, note: 'first edit' }, 1)]);
    expect(lost).toMatchObject({ status: 'applied', revision: 2 });
    // ...which merges a second edit into the queue under a new id, still on base revision 1.
    const [merged] = await pushOk(devA, [mutation('bench_entry', { ...e, note: 'first edit, then a second' }, 1)]);
    expect(merged).toMatchObject({ status: 'applied', revision: 3 });
    expect(await query('SELECT id FROM sync_conflicts WHERE record_id = ?', [e.id])).toEqual([]);
    const [row] = await query<{ revision: number; content: { note: string }; awaiting_review: number }>('SELECT revision, content, awaiting_review FROM bench_entries WHERE id = ?', [e.id]);
    expect(row).toMatchObject({ revision: 3, awaiting_review: 0 });
    expect(row!.content.note).toBe('first edit, then a second');
  });

  it('a change from another device in between still makes a stale base a conflict', async () => {
    const devA = { ...tech, deviceId: v7() };
    const devB = { ...tech, deviceId: v7() };
    const e = benchEntry(tech);
    await pushOk(devA, [mutation('bench_entry', e)]);
    await pushOk(devA, [mutation('bench_entry', { ...e, note: 'tablet A, reply lost' }, 1)]);
    await pushOk(devB, [mutation('bench_entry', { ...e, note: 'tablet B on top' }, 2)]);
    const [stale] = await pushOk(devA, [mutation('bench_entry', { ...e, note: 'tablet A merged on base 1' }, 1)]);
    expect(stale).toMatchObject({ status: 'conflict', record: { revision: 3, awaitingReview: true } });
  });

  it('a supervisor merges field by field; the result reaches devices as a new revision and is audit-logged', async () => {
    const e = benchEntry(tech, { tags: ['dissolver'] });
    await pushOk(tech, [mutation('bench_entry', e)]);
    await pushOk(tech, [mutation('bench_entry', { ...e, note: 'server note', tags: ['dissolver', 'server'] }, 1)]);
    const [c] = await pushOk({ ...tech, deviceId: v7() }, [mutation('bench_entry', { ...e, note: 'device note', tags: ['device'] }, 1)]);
    const conflictId = (c as Extract<MutationOutcome, { status: 'conflict' }>).conflictId;
    const detail = await sup.client.get<{ versions: { id: string }[] }>(`/api/v1/conflicts/${conflictId}`);
    const vId = detail.body.versions[0]!.id;
    // A technician may not resolve.
    expect((await tech.client.post(`/api/v1/conflicts/${conflictId}/resolve`, { action: 'keep_server' })).status).toBe(403);
    // A bad field is named and changes nothing.
    const bad = await sup.client.post(`/api/v1/conflicts/${conflictId}/resolve`, { action: 'merge', fields: { authorId: vId } });
    expect(bad.status).toBe(422);
    expect(JSON.stringify(bad.body)).toContain('fields.authorId');
    const ok = await sup.client.post<{ record: ServerRecord }>(`/api/v1/conflicts/${conflictId}/resolve`, { action: 'merge', fields: { note: vId, tags: 'server' } });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.record).toMatchObject({ revision: 3, awaitingReview: false });
    expect(ok.body.record.content).toMatchObject({ note: 'device note', tags: ['dissolver', 'server'] });
    const pulled = (await pullAll(tech)).records.find((r) => r.id === e.id)!;
    expect(pulled).toMatchObject({ revision: 3, awaitingReview: false });
    expect(await query("SELECT action FROM audit_log WHERE entity_id = ? AND action = 'sync.conflict_resolved'", [e.id])).toHaveLength(1);
    // Settled once: a second resolution is refused.
    expect((await sup.client.post(`/api/v1/conflicts/${conflictId}/resolve`, { action: 'keep_server' })).status).toBe(409);
    // Editing again from the new revision applies normally.
    const [after] = await pushOk(tech, [mutation('bench_entry', { ...(pulled.content as { id: string }), note: 'after the merge' }, 3)]);
    expect(after).toMatchObject({ status: 'applied', revision: 4 });
  });

  it('new conflicts send the supervisors one digest, then at most one per 15 minutes per site', async () => {
    const s = await makeSite('digest');
    const w = await as(s, 'technician');
    const start = Date.now();
    const conflictOn = async () => {
      const e = benchEntry(w);
      await pushOk(w, [mutation('bench_entry', e)]);
      await pushOk(w, [mutation('bench_entry', { ...e, note: 'one' }, 1)]);
      await pushOk({ ...w, deviceId: v7() }, [mutation('bench_entry', { ...e, note: 'two' }, 1)]);
    };
    await conflictOn();
    await new Promise((r) => setTimeout(r, 300));
    const first = (await mailTo(s.users.supervisor.email)).filter((m) => m.subject.includes('to reconcile') && Date.parse(m.receivedAt) >= start);
    expect(first).toHaveLength(1);
    expect((await mailTo(s.users.technician.email)).filter((m) => m.subject.includes('to reconcile'))).toHaveLength(0);
    await conflictOn();
    await new Promise((r) => setTimeout(r, 300));
    expect((await mailTo(s.users.supervisor.email)).filter((m) => m.subject.includes('to reconcile'))).toHaveLength(1);
    // Fifteen minutes later (moved back in the throttle row), the next push sends the waiting one.
    await query('UPDATE sync_digest_throttle SET last_sent_at = ? WHERE site_id = ?', [new Date(Date.now() - 16 * 60_000), s.siteId]);
    await pushOk(w, [mutation('bench_entry', benchEntry(w))]);
    await new Promise((r) => setTimeout(r, 300));
    const all = (await mailTo(s.users.supervisor.email)).filter((m) => m.subject.includes('to reconcile'));
    expect(all).toHaveLength(2);
    expect(all[0]!.subject).toContain('1 new item');
  });
});

describe('sheets: server recompute and access rules', () => {
  it('the server stores its own result and flags a sheet whose device result differs', async () => {
    const honest = sheet(tech);
    const wrong = sheet(tech, { result: { kind: 'reaction', result: { reactionEnthalpy: { value: '-1.0' } } } });
    const outcomes = await pushOk(tech, [mutation('sheet', honest), mutation('sheet', wrong)]);
    expect(outcomes.map((o) => o.status)).toEqual(['applied', 'applied']);
    const rows = await query<{ id: string; result_differs: number; server_result: { result: { reactionEnthalpy: { value: string } } } }>('SELECT id, result_differs, server_result FROM sheets WHERE id IN (?, ?)', [honest.id, wrong.id]);
    const byId = Object.fromEntries(rows.map((r) => [r.id, r]));
    // -985.2 − (−634.9 − 285.83) = −64.47 kJ/mol, worked by hand from the test inputs above.
    expect(byId[honest.id]!.server_result.result.reactionEnthalpy.value).toBe('-64.47');
    expect(byId[honest.id]!.result_differs).toBe(0);
    expect(byId[wrong.id]!.result_differs).toBe(1);
    expect(await query("SELECT id FROM audit_log WHERE entity_id = ? AND action = 'sheet.result_differs'", [wrong.id])).toHaveLength(1);
  });

  it('a submitted sheet that does not solve is rejected naming the engine field', async () => {
    const bad = sheet(tech, { status: 'submitted', problem: { kind: 'reaction', problem: { reaction: 'CaO + H2O -> Ca(OH)2' } } });
    const [o] = await pushOk(tech, [mutation('sheet', bad)]);
    expect(o).toMatchObject({ status: 'rejected' });
    expect((o as { reason: string }).reason).toContain('content.problem.');
  });

  it("a technician may not edit another user's record; a supervisor may correct it", async () => {
    const other = await as(site, 'admin');
    const s = sheet(other);
    await pushOk(other, [mutation('sheet', s)]);
    const [o] = await pushOk(tech, [mutation('sheet', { ...s, title: 'taken over' }, 1)]);
    expect(o).toMatchObject({ status: 'rejected' });
    expect((o as { reason: string }).reason).toContain('sheet.correct');
    const [ok] = await pushOk(sup, [mutation('sheet', { ...s, title: 'corrected by the supervisor' }, 1)]);
    expect(ok).toMatchObject({ status: 'applied', revision: 2 });
    const [spoof] = await pushOk(tech, [mutation('sheet', sheet(tech, { authorId: other.userId }))]);
    expect(spoof).toMatchObject({ status: 'rejected' });
  });

  it('sign-off needs sheet.signoff and a supervisor other than the author; a signed-off sheet is locked; a new version links to it', async () => {
    const s = sheet(sup, { status: 'submitted' });
    await pushOk(sup, [mutation('sheet', s)]);
    const signed = (by: Who) => ({ ...s, status: 'signed_off', signedOffBy: by.userId, signedOffAt: now() });
    const [byTech] = await pushOk(tech, [mutation('sheet', signed(tech), 1)]);
    expect(byTech).toMatchObject({ status: 'rejected' });
    const [byAuthor] = await pushOk(sup, [mutation('sheet', signed(sup), 1)]);
    expect(byAuthor).toMatchObject({ status: 'rejected' });
    expect((byAuthor as { reason: string }).reason).toContain('other than its author');
    const [ok] = await pushOk(sup2, [mutation('sheet', signed(sup2), 1)]);
    expect(ok).toMatchObject({ status: 'applied', revision: 2 });
    const [locked] = await pushOk(sup2, [mutation('sheet', { ...signed(sup2), note: 'late change' }, 2)]);
    expect(locked).toMatchObject({ status: 'rejected' });
    expect((locked as { reason: string }).reason).toContain('locked');
    const v2 = sheet(tech, { version: 2, previousVersionId: s.id, title: 'Slaking heat, second version' });
    const [next] = await pushOk(tech, [mutation('sheet', v2)]);
    expect(next).toMatchObject({ status: 'applied', revision: 1 });
    const [skip] = await pushOk(tech, [mutation('sheet', sheet(tech, { version: 3, previousVersionId: s.id }))]);
    expect(skip).toMatchObject({ status: 'rejected' });
  });

  it('edition drift: a sheet pinned to a retired edition whose numbers differ under the edition in force is queued for review', async () => {
    const w = await demoSiteUser('technician');
    const me = { siteId: w.siteId };
    const eds = await query<{ id: string; state: string }>("SELECT id, state FROM editions WHERE site_id = ? AND state IN ('retired', 'in_force') ORDER BY number", [me.siteId]);
    const retired = eds.find((e) => e.state === 'retired')!;
    const inForce = eds.find((e) => e.state === 'in_force')!;
    const ie = async (editionId: string) =>
      (await query<{ value: string }>("SELECT v.value FROM edition_values v JOIN ref_species s ON s.id = v.species_id WHERE v.edition_id = ? AND s.formula = 'K' AND v.property = 'ionization_energy_1'", [editionId]))[0]!.value;
    const oldIe = await ie(retired.id);
    expect(oldIe).not.toBe(await ie(inForce.id)); // the seeded editions differ here (rounded in No. 1)
    // Test inputs for a KCl cycle (not check values); only the ionization energy comes from the edition.
    const problem = {
      kind: 'cycle',
      problem: {
        formula: 'KCl',
        values: {
          'enthalpy_of_formation:KCl': { value: '-436.5' },
          'enthalpy_of_atomization:K': { value: '89.0' },
          'ionization_energy_1:K': { value: oldIe, source: 'edition No. 1' },
          'enthalpy_of_atomization:Cl': { value: '121.3' },
          'electron_gain_enthalpy_1:Cl': { value: '-349' },
        },
      },
    };
    const inputs = [{ path: ['problem', 'values', 'ionization_energy_1:K'], origin: { type: 'edition', editionId: retired.id, species: 'K', phase: 'g', property: 'ionization_energy_1' } }];
    const s = sheet(w, { kind: 'cycle', title: 'KCl cycle, pinned to No. 1', problem, inputs, pinnedEditionId: retired.id });
    const [o] = await pushOk(w, [mutation('sheet', s)]);
    expect(o).toMatchObject({ status: 'applied', revision: 1 });
    expect((o as { record: ServerRecord }).record.awaitingReview).toBe(true);
    const list = (await demoSiteUser('supervisor')).client;
    const conflicts = await list.get<{ conflicts: { id: string; recordId: string; kind: string }[] }>('/api/v1/conflicts?kind=drift');
    const drift = conflicts.body.conflicts.find((c) => c.recordId === s.id)!;
    expect(drift.kind).toBe('drift');
    // An edit made while the sheet awaits review joins the drift review as a device version.
    const [late] = await pushOk(w, [mutation('sheet', { ...s, note: 'added while awaiting review' }, 1)]);
    expect(late).toMatchObject({ status: 'conflict', conflictId: drift.id });
    const detail = await list.get<{ versions: { content: { note: string } }[]; drift: { inForceEditionId: string } }>(`/api/v1/conflicts/${drift.id}`);
    expect(detail.body.versions.map((v) => v.content.note)).toEqual(['added while awaiting review']);
    expect(detail.body.drift.inForceEditionId).toBe(inForce.id);
    const resolved = await list.post<{ record: ServerRecord }>(`/api/v1/conflicts/${drift.id}/resolve`, { action: 'resolve_in_force' });
    expect(resolved.status, JSON.stringify(resolved.body)).toBe(200);
    const content = resolved.body.record.content as { pinnedEditionId: string; problem: { problem: { values: Record<string, { value: string }> } } };
    expect(content.pinnedEditionId).toBe(inForce.id);
    expect(content.problem.problem.values['ionization_energy_1:K']!.value).toBe(await ie(inForce.id));
    expect(resolved.body.record.awaitingReview).toBe(false);
    expect(await query("SELECT id FROM audit_log WHERE entity_id = ? AND action = 'sync.drift_resolved'", [s.id])).toHaveLength(1);
  });
});

describe('access', () => {
  it('a device pushes and pulls only its own site: another site never sees, nor overwrites, these records', async () => {
    const other = await makeSite('other');
    const stranger = await as(other, 'supervisor');
    const mine = benchEntry(tech);
    await pushOk(tech, [mutation('bench_entry', mine)]);
    const theirs = await pullAll(stranger);
    expect(theirs.records.find((r) => r.id === mine.id)).toBeUndefined();
    const [o] = await pushOk(stranger, [mutation('bench_entry', { ...mine, authorId: stranger.userId, note: 'overwrite' }, 1)]);
    expect(o).toMatchObject({ status: 'rejected', reason: 'No such record on this site.' });
    const crossSite = await push(stranger, [], { siteId: site.siteId });
    expect(crossSite.status).toBe(403);
  });

  it("a push naming another user's device, or another user, is refused", async () => {
    const theirDevice = await push({ ...sup, deviceId: tech.deviceId }, [mutation('bench_entry', benchEntry(sup))]);
    expect(theirDevice.status).toBe(403);
    expect(theirDevice.body.error?.message).toContain('device');
    const asOther = await push(sup, [], { userId: tech.userId });
    expect(asOther.status).toBe(403);
  });

  it('a cross-origin push is refused and changes nothing', async () => {
    const e = benchEntry(tech);
    const r = await tech.client.post('/api/v1/sync/push', { deviceId: tech.deviceId, userId: tech.userId, siteId: tech.siteId, mutations: [mutation('bench_entry', e)] }, { ...PROTO, origin: 'https://elsewhere.example' });
    expect(r.status).toBe(403);
    expect(await query('SELECT id FROM bench_entries WHERE id = ?', [e.id])).toHaveLength(0);
  });

  it('protocol 2 answers without the content a device sent; a change the server altered, a conflict and protocol 1 get the record whole', async () => {
    const as = (v: string, deviceId = tech.deviceId) => async (mutations: unknown[]) => {
      const r = await tech.client.post<PushResponse>('/api/v1/sync/push', { deviceId, userId: tech.userId, siteId: tech.siteId, mutations }, { 'x-rungbook-sync-protocol': v });
      expect(r.status, JSON.stringify(r.body)).toBe(200);
      return r.body;
    };
    const same = benchEntry(tech);
    const altered = { ...benchEntry(tech), colour: 'not a bench-entry field' }; // dropped by the server's schema
    const v2 = await as('2')([mutation('bench_entry', same), mutation('bench_entry', altered)]);
    expect(v2.protocol).toBe(2);
    const [o1, o2] = v2.outcomes as Extract<MutationOutcome, { status: 'applied' }>[];
    expect(o1).toMatchObject({ status: 'applied', revision: 1, record: { id: same.id, revision: 1, contentAsSent: true } });
    expect(o1!.record).not.toHaveProperty('content');
    expect(o2!.record).not.toHaveProperty('contentAsSent');
    const { colour: _dropped, ...stored } = altered;
    expect((o2!.record as { content: unknown }).content).toEqual(stored);
    // What was left out is exactly what the server stored.
    const [row] = await query<{ content: unknown }>('SELECT content FROM bench_entries WHERE id = ?', [same.id]);
    expect(row!.content).toEqual(same);
    // A second tablet's stale edit meets a conflict: the answer carries the server's version.
    const stale = { ...same, note: 'edited on a stale base' };
    await as('2')([mutation('bench_entry', { ...same, note: 'the accepted edit' }, 1)]);
    const [conflict] = (await as('2', v7())([mutation('bench_entry', stale, 1)])).outcomes;
    expect(conflict).toMatchObject({ status: 'conflict', record: { content: { note: 'the accepted edit' } } });
    // Protocol 1 (an app not yet reloaded) still gets every record whole.
    const older = benchEntry(tech);
    const v1 = await as('1')([mutation('bench_entry', older)]);
    expect(v1.protocol).toBe(1);
    expect(v1.outcomes[0]).toMatchObject({ status: 'applied', record: { content: older } });
    expect(v1.outcomes[0]).not.toHaveProperty('record.contentAsSent');
  });

  it('an outdated app gets 426 on push and pull; signed out gets 401', async () => {
    const e = benchEntry(tech);
    const old = await tech.client.post('/api/v1/sync/push', { deviceId: tech.deviceId, userId: tech.userId, siteId: tech.siteId, mutations: [mutation('bench_entry', e)] }, { 'x-rungbook-sync-protocol': '0' });
    expect(old.status).toBe(426);
    expect(await query('SELECT id FROM bench_entries WHERE id = ?', [e.id])).toHaveLength(0);
    expect((await tech.client.get('/api/v1/sync/pull?cursor=0')).status).toBe(426);
    expect((await new Client().get('/api/v1/sync/pull?cursor=0', PROTO)).status).toBe(401);
  });
});
