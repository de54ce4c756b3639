import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sameJson } from './canonical-json';
import type { Mutation, MutationOutcome, PullResponse } from './protocol';
import type { QueuedMutation } from './local-state';
import { MemoryServer } from './testing/memory-server';
import { SimDevice } from './testing/sim-device';

// Three devices, random edits of a few shared records, and a network that drops, duplicates and
// delays requests and replies. After the queues drain and every conflict is settled, each device
// must equal the server, and no device's last edit of a record may be lost (it is in the record's
// accepted history or kept in a conflict).

type Msg =
  | { kind: 'push'; dev: number; sent: QueuedMutation[] }
  | { kind: 'pushReply'; dev: number; sent: QueuedMutation[]; outcomes: MutationOutcome[] }
  | { kind: 'pull'; dev: number; cursor: number }
  | { kind: 'pullReply'; dev: number; page: PullResponse };

const RECORDS = ['r1', 'r2', 'r3'].map((r, i) => `0190f3a0-0000-7000-8000-00000000000${i + 1}`);

const step = fc.oneof(
  { weight: 4, arbitrary: fc.record({ op: fc.constant('edit' as const), dev: fc.nat(2), rec: fc.nat(2), value: fc.string({ maxLength: 3 }) }) },
  { weight: 3, arbitrary: fc.record({ op: fc.constant('sendPush' as const), dev: fc.nat(2) }) },
  { weight: 2, arbitrary: fc.record({ op: fc.constant('sendPull' as const), dev: fc.nat(2) }) },
  { weight: 5, arbitrary: fc.record({ op: fc.constant('deliver' as const), pick: fc.nat(), duplicate: fc.boolean() }) },
  { weight: 2, arbitrary: fc.record({ op: fc.constant('drop' as const), pick: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('resolve' as const), pick: fc.integer({ min: -1, max: 3 }) }) },
);

type Step = typeof step extends fc.Arbitrary<infer T> ? T : never;

function run(steps: Step[]) {
  let n = 0;
  const makeId = () => `0190f3a0-0000-7000-8000-${String(++n).padStart(12, '0')}`;
  const server = new MemoryServer();
  const devices = [0, 1, 2].map((i) => new SimDevice(`device ${i}`, makeId));
  let inflight: Msg[] = [];
  let counter = 0;

  const toMutations = (sent: QueuedMutation[]): Mutation[] => sent.map(({ mutationId, entity, recordId, baseRevision, content }) => ({ mutationId, entity, recordId, baseRevision, content }));
  const process = (msg: Msg) => {
    if (msg.kind === 'push') inflight.push({ kind: 'pushReply', dev: msg.dev, sent: msg.sent, outcomes: server.push(toMutations(msg.sent), devices[msg.dev]!.name) });
    else if (msg.kind === 'pull') inflight.push({ kind: 'pullReply', dev: msg.dev, page: server.pull(msg.cursor, 2) });
    else if (msg.kind === 'pushReply') devices[msg.dev]!.receiveOutcomes(msg.sent, msg.outcomes);
    else devices[msg.dev]!.receivePage(msg.page);
  };

  for (const s of steps) {
    switch (s.op) {
      case 'edit':
        devices[s.dev]!.edit('bench_entry', RECORDS[s.rec]!, { id: RECORDS[s.rec], note: `${s.value}#${++counter}` });
        break;
      case 'sendPush': {
        const sent = devices[s.dev]!.batch();
        if (sent.length) inflight.push({ kind: 'push', dev: s.dev, sent });
        break;
      }
      case 'sendPull':
        inflight.push({ kind: 'pull', dev: s.dev, cursor: devices[s.dev]!.cursor });
        break;
      case 'deliver': {
        if (!inflight.length) break;
        const i = s.pick % inflight.length;
        const msg = inflight[i]!;
        if (!s.duplicate) inflight.splice(i, 1); // a duplicate leaves a copy to be delivered again
        process(msg);
        break;
      }
      case 'drop':
        if (inflight.length) inflight.splice(s.pick % inflight.length, 1);
        break;
      case 'resolve': {
        const open = [...server.conflicts.values()].find((c) => c.open);
        if (open) server.resolve(open.id, s.pick);
        break;
      }
    }
  }

  // Drain: late messages arrive (in the order left), then reliable sync rounds until quiet.
  for (const msg of inflight) process(msg);
  inflight = [];
  for (let round = 0; round < 50; round++) {
    for (const [i, d] of devices.entries()) {
      const sent = d.batch();
      if (sent.length) d.receiveOutcomes(sent, server.push(toMutations(sent), d.name));
      void i;
    }
    for (const c of server.conflicts.values()) if (c.open) server.resolve(c.id, round % 2 === 0 ? 0 : -1);
    for (const d of devices) {
      for (;;) {
        const page = server.pull(d.cursor, 2);
        d.receivePage(page);
        if (!page.more) break;
      }
    }
    if (devices.every((d) => d.outbox.size === 0) && [...server.conflicts.values()].every((c) => !c.open)) break;
  }
  return { server, devices };
}

describe('convergence (pure protocol, in-memory server)', () => {
  it('after the queues drain and conflicts are settled, every device equals the server and no edit is lost', () => {
    fc.assert(
      fc.property(fc.array(step, { maxLength: 80 }), (steps) => {
        const { server, devices } = run(steps);
        for (const d of devices) {
          expect(d.outbox.size).toBe(0);
          expect(d.rejected).toEqual([]);
          for (const [id, rec] of server.records) {
            const mine = d.records.get(id);
            expect(mine, `${d.name} has ${id}`).toBeDefined();
            expect(mine!.serverRevision).toBe(rec.record.revision);
            expect(mine!.awaitingReview).toBe(false);
            expect(sameJson(mine!.content, rec.record.content)).toBe(true);
          }
          expect(d.records.size).toBe(server.records.size);
          // Nothing lost: each device's last edit of a record was accepted or is kept in a conflict.
          for (const [id, content] of d.lastEdits) {
            const accepted = server.records.get(id)?.history.some((h) => sameJson(h, content)) ?? false;
            const kept = [...server.conflicts.values()].some((c) => c.recordId === id && c.versions.some((v) => sameJson(v, content)));
            expect(accepted || kept, `${d.name}'s last edit of ${id} was lost`).toBe(true);
          }
        }
      }),
      { numRuns: 1000 },
    );
  });
});
