// The convergence property over real HTTP (smaller than lib/sync/convergence.test.ts): three
// simulated devices — running the same pure device-side functions as lib/local — edit shared bench
// entries while their pushes are dropped, duplicated and delayed and pulls arrive late; then the
// queues drain, a supervisor settles every conflict through the API, and every device must equal
// the server with no device's last edit lost.
import fc from 'fast-check';
import { v7 } from 'uuid';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { signedIn, type Client } from '../support/http';
import { closeDb, makeSite, outcomesOf, query } from '../support/db';
import { sameJson } from '@/lib/sync/canonical-json';
import type { QueuedMutation } from '@/lib/sync/local-state';
import { SYNC_PROTOCOL, type PullResponse, type PushResponse } from '@/lib/sync/protocol';
import { SimDevice } from '@/lib/sync/testing/sim-device';

// The current protocol, as the app speaks it (version 2: outcomes leave out the content sent).
const PROTO = { 'x-rungbook-sync-protocol': String(SYNC_PROTOCOL) };
let site: Awaited<ReturnType<typeof makeSite>>;
let tech: Client;
let sup: Client;

beforeAll(async () => {
  site = await makeSite('converge');
  [tech, sup] = await Promise.all([signedIn(site.users.technician.email, site.password), signedIn(site.users.supervisor.email, site.password)]);
});
afterAll(closeDb);

const step = fc.oneof(
  { weight: 4, arbitrary: fc.record({ op: fc.constant('edit' as const), dev: fc.nat(2), rec: fc.nat(1), text: fc.string({ maxLength: 4 }) }) },
  { weight: 3, arbitrary: fc.record({ op: fc.constant('send' as const), dev: fc.nat(2) }) },
  { weight: 4, arbitrary: fc.record({ op: fc.constant('deliver' as const), pick: fc.nat(), dropReply: fc.boolean(), duplicate: fc.boolean() }) },
  { weight: 2, arbitrary: fc.record({ op: fc.constant('pull' as const), dev: fc.nat(2), late: fc.boolean() }) },
);
type Step = typeof step extends fc.Arbitrary<infer T> ? T : never;

it('three devices over a lossy network converge with the server after draining and settling', { timeout: 240_000 }, async () => {
  await fc.assert(
    fc.asyncProperty(fc.array(step, { minLength: 5, maxLength: 24 }), async (steps: Step[]) => {
      const t = new Date().toISOString();
      const recordIds = [v7(), v7()];
      const devices = [0, 1, 2].map((i) => new SimDevice(`device ${i}`, v7));
      const deviceIds = devices.map(() => v7());
      const sentContent = new Map<string, unknown>();
      let inflight: { dev: number; sent: QueuedMutation[] }[] = [];
      const latePages: { dev: number; page: PullResponse }[] = [];
      let n = 0;

      const push = async (dev: number, sent: QueuedMutation[]) => {
        for (const m of sent) sentContent.set(m.mutationId, m.content);
        const body = { deviceId: deviceIds[dev], userId: site.users.technician.id, siteId: site.siteId, mutations: sent.map(({ mutationId, entity, recordId, baseRevision, content }) => ({ mutationId, entity, recordId, baseRevision, content })) };
        const r = await tech.post<PushResponse>('/api/v1/sync/push', body, PROTO);
        expect(r.status, JSON.stringify(r.body).slice(0, 300)).toBe(200);
        return r.body.outcomes;
      };
      const pullPage = async (dev: number) => (await tech.get<PullResponse>(`/api/v1/sync/pull?cursor=${devices[dev]!.cursor}&limit=3`, PROTO)).body;

      for (const s of steps) {
        if (s.op === 'edit') {
          const id = recordIds[s.rec]!;
          devices[s.dev]!.edit('bench_entry', id, { id, note: `${s.text}#${++n}`, lotRef: null, areaId: null, tags: [], sheetId: null, photoIds: [], authorId: site.users.technician.id, deleted: false, createdAt: t, updatedAt: t });
        } else if (s.op === 'send') {
          const sent = devices[s.dev]!.batch();
          if (sent.length) inflight.push({ dev: s.dev, sent });
        } else if (s.op === 'deliver' && inflight.length) {
          const i = s.pick % inflight.length;
          const msg = inflight[i]!;
          if (!s.duplicate) inflight.splice(i, 1);
          const outcomes = await push(msg.dev, msg.sent);
          if (!s.dropReply) devices[msg.dev]!.receiveOutcomes(msg.sent, outcomes);
        } else if (s.op === 'pull') {
          const page = await pullPage(s.dev);
          if (s.late) latePages.push({ dev: s.dev, page });
          else devices[s.dev]!.receivePage(page);
        }
      }

      // Drain: late requests and pages arrive, then reliable rounds of push, settle, pull.
      for (const msg of inflight) devices[msg.dev]!.receiveOutcomes(msg.sent, await push(msg.dev, msg.sent));
      inflight = [];
      for (const p of latePages) devices[p.dev]!.receivePage(p.page);
      for (let round = 0; round < 12; round++) {
        for (const [i, d] of devices.entries()) {
          const sent = d.batch();
          if (sent.length) d.receiveOutcomes(sent, await push(i, sent));
        }
        const open = (await sup.get<{ conflicts: { id: string; recordId: string }[] }>('/api/v1/conflicts?status=open')).body.conflicts.filter((c) => recordIds.includes(c.recordId));
        for (const c of open) {
          const detail = (await sup.get<{ versions: { id: string }[] }>(`/api/v1/conflicts/${c.id}`)).body;
          const choice = round % 2 === 0 && detail.versions[0] ? { action: 'keep_device', versionId: detail.versions[0].id } : { action: 'keep_server' };
          expect((await sup.post(`/api/v1/conflicts/${c.id}/resolve`, choice)).status).toBe(200);
        }
        for (const [i, d] of devices.entries()) {
          for (;;) {
            const page = await pullPage(i);
            d.receivePage(page);
            if (!page.more) break;
          }
        }
        if (devices.every((d) => d.outbox.size === 0) && open.length === 0) break;
      }

      const server = await query<{ id: string; revision: number; content: unknown; awaiting_review: number }>('SELECT id, revision, content, awaiting_review FROM bench_entries WHERE id IN (?, ?)', recordIds);
      const versions = await query<{ record_id: string; content: unknown }>(
        'SELECT c.record_id, v.content FROM sync_conflict_versions v JOIN sync_conflicts c ON c.id = v.conflict_id WHERE c.record_id IN (?, ?)',
        recordIds,
      );
      const applied = (await outcomesOf(recordIds)).filter((o) => o.status === 'applied');
      for (const d of devices) {
        expect(d.outbox.size, `${d.name} drained`).toBe(0);
        expect(d.rejected).toEqual([]);
        for (const row of server) {
          expect(row.awaiting_review).toBe(0);
          const mine = d.records.get(row.id);
          expect(mine?.serverRevision, `${d.name} revision of ${row.id}`).toBe(row.revision);
          expect(sameJson(mine?.content, row.content), `${d.name} content of ${row.id}`).toBe(true);
        }
        for (const [id, content] of d.lastEdits) {
          const accepted = applied.some((a) => a.record_id === id && sameJson(sentContent.get(a.mutation_id), content));
          const kept = versions.some((v) => v.record_id === id && sameJson(v.content, content));
          expect(accepted || kept, `${d.name}'s last edit of ${id} was lost`).toBe(true);
        }
      }
    }),
    { numRuns: 8 },
  );
});
