import { describe, expect, it } from 'vitest';
import { diffFields, mergeFieldByField } from './field-diff';
import { substituteEditionValues } from './edition-inputs';
import { applyOutcome, mergePulled, queueEdit, type LocalRecord, type QueuedMutation } from './local-state';
import { decideMutation } from './decide-mutation';
import { protocolProblem } from './protocol';
import type { ServerRecord } from './protocol';

const rec = (over: Partial<ServerRecord> = {}): ServerRecord => ({ entity: 'bench_entry', id: 'r', revision: 1, seq: 5, awaitingReview: false, content: { note: 'server' }, ...over });

describe('queued edits', () => {
  it('a second offline edit merges into the first: one entry, new mutation id, same base revision', () => {
    const first = queueEdit(undefined, { entity: 'sheet', recordId: 'r', content: { v: 1 } }, 3, 'm1', 't1');
    const second = queueEdit(first, { entity: 'sheet', recordId: 'r', content: { v: 2 } }, 99, 'm2', 't2');
    expect(second).toMatchObject({ mutationId: 'm2', baseRevision: 3, content: { v: 2 }, queuedAt: 't1' });
  });
});

describe('push outcomes on the device', () => {
  const sent: QueuedMutation = { mutationId: 'm1', entity: 'bench_entry', recordId: 'r', baseRevision: 1, content: { note: 'mine' }, queuedAt: 't', attempts: 0 };
  const local: LocalRecord = { entity: 'bench_entry', id: 'r', content: { note: 'mine' }, serverContent: { note: 'server' }, serverRevision: 1, serverSeq: 5, awaitingReview: false, pending: true };

  it('applied: the entry leaves the queue and the record takes the server state', () => {
    const e = applyOutcome(local, sent, sent, { mutationId: 'm1', recordId: 'r', status: 'applied', revision: 2, record: rec({ revision: 2, seq: 9, content: { note: 'mine' } }) }, 'now');
    expect(e.queued).toBeNull();
    expect(e.record).toMatchObject({ serverRevision: 2, pending: false, content: { note: 'mine' } });
  });

  it('applied while a later edit merged in flight: the later edit stays queued on the new base', () => {
    const later = { ...sent, mutationId: 'm2', content: { note: 'later' } };
    const e = applyOutcome({ ...local, content: { note: 'later' } }, later, sent, { mutationId: 'm1', recordId: 'r', status: 'applied', revision: 2, record: rec({ revision: 2, seq: 9 }) }, 'now');
    expect(e.queued).toMatchObject({ mutationId: 'm2', baseRevision: 2 });
    expect(e.record).toMatchObject({ content: { note: 'later' }, pending: true, serverRevision: 2 });
  });

  it('applied under protocol 2 without content (contentAsSent): the record takes the content this mutation sent', () => {
    const { content: _left, ...slim } = rec({ revision: 2, seq: 9 });
    const e = applyOutcome(local, sent, sent, { mutationId: 'm1', recordId: 'r', status: 'applied', revision: 2, record: { ...slim, contentAsSent: true } }, 'now');
    expect(e.queued).toBeNull();
    expect(e.record).toMatchObject({ serverRevision: 2, serverSeq: 9, pending: false, content: { note: 'mine' }, serverContent: { note: 'mine' } });
    expect(e.record).not.toHaveProperty('contentAsSent');
  });

  it('the same while a later edit merged in flight: the server copy is what was sent, the screen keeps the later edit', () => {
    const later = { ...sent, mutationId: 'm2', content: { note: 'later' } };
    const { content: _left, ...slim } = rec({ revision: 2, seq: 9 });
    const e = applyOutcome({ ...local, content: { note: 'later' } }, later, sent, { mutationId: 'm1', recordId: 'r', status: 'applied', revision: 2, record: { ...slim, contentAsSent: true } }, 'now');
    expect(e.queued).toMatchObject({ mutationId: 'm2', baseRevision: 2 });
    expect(e.record).toMatchObject({ content: { note: 'later' }, serverContent: { note: 'mine' }, pending: true });
  });

  it('rejected: kept in the rejected list with its reason, and the server version shows again', () => {
    const e = applyOutcome(local, sent, sent, { mutationId: 'm1', recordId: 'r', status: 'rejected', reason: 'no' }, 'now');
    expect(e.queued).toBeNull();
    expect(e.rejected).toMatchObject({ mutationId: 'm1', reason: 'no', content: { note: 'mine' } });
    expect(e.record).toMatchObject({ content: { note: 'server' }, pending: false });
  });

  it('retry: nothing changes except the attempt count', () => {
    const e = applyOutcome(local, sent, sent, { mutationId: 'm1', recordId: 'r', status: 'retry', reason: 'busy' }, 'now');
    expect(e.queued).toMatchObject({ mutationId: 'm1', attempts: 1 });
    expect(e.record).toBeUndefined();
  });
});

describe('pull merge', () => {
  it('an older or repeated record changes nothing; a waiting local edit stays on screen', () => {
    const held = mergePulled(undefined, rec(), false)!;
    expect(mergePulled(held, rec(), false)).toBeUndefined();
    expect(mergePulled(held, rec({ seq: 3, content: { note: 'older' } }), false)).toBeUndefined();
    const pending = { ...held, content: { note: 'typing' }, pending: true };
    expect(mergePulled(pending, rec({ seq: 8, revision: 2, content: { note: 'other device' } }), true)).toMatchObject({ content: { note: 'typing' }, serverRevision: 2, serverContent: { note: 'other device' } });
  });
});

describe('server decision', () => {
  it('equal base applies as revision + 1; a stale base or an open review conflicts; an unknown record with a base is refused', () => {
    expect(decideMutation(null, 0)).toEqual({ kind: 'apply', revision: 1 });
    expect(decideMutation({ revision: 4, awaitingReview: false }, 4)).toEqual({ kind: 'apply', revision: 5 });
    expect(decideMutation({ revision: 4, awaitingReview: false }, 3)).toEqual({ kind: 'conflict' });
    expect(decideMutation({ revision: 4, awaitingReview: true }, 4)).toEqual({ kind: 'conflict' });
    expect(decideMutation(null, 2).kind).toBe('reject');
    // Every change since the base was this device's own (a lost reply): applied on top.
    expect(decideMutation({ revision: 4, awaitingReview: false }, 2, true)).toEqual({ kind: 'apply', revision: 5 });
    // ...but never past an open review, nor from a base the server never had.
    expect(decideMutation({ revision: 4, awaitingReview: true }, 3, true)).toEqual({ kind: 'conflict' });
    expect(decideMutation({ revision: 4, awaitingReview: false }, 6, true)).toEqual({ kind: 'conflict' });
  });

  it('an old or missing protocol header is named; the current one passes', () => {
    expect(protocolProblem('1')).toBeNull();
    expect(protocolProblem(null)).toContain('(none)');
    expect(protocolProblem('0')).toContain('Reload');
    expect(protocolProblem('7')).toContain('newer');
  });
});

describe('reconcile helpers', () => {
  it('lists only the differing fields and merges the chosen ones', () => {
    const server = { title: 'a', note: 'x', lotRef: 'L1' };
    const v = { title: 'a', note: 'y', lotRef: 'L2' };
    expect(diffFields(server, [v], ['title', 'note', 'lotRef']).map((d) => d.field)).toEqual(['note', 'lotRef']);
    const merged = mergeFieldByField(server, { v1: v }, { note: 'v1', lotRef: 'server' }, ['note', 'lotRef']);
    expect(merged).toEqual({ ok: true, merged: { title: 'a', note: 'y', lotRef: 'L1' } });
    expect(mergeFieldByField(server, { v1: v }, { note: 'v9' }, ['note'])).toMatchObject({ ok: false, field: 'fields.note' });
  });

  it('re-reads edition inputs at their paths, keeping each value’s shape', () => {
    const problem = { kind: 'cycle', problem: { values: { 'ionization_energy_1:K': { value: '419', source: 'old' } }, bare: '1' } };
    const inputs = [
      { path: ['problem', 'values', 'ionization_energy_1:K'], origin: { type: 'edition' as const, editionId: 'old', species: 'K', phase: 'g' as const, property: 'ionization_energy_1' } },
      { path: ['problem', 'bare'], origin: { type: 'edition' as const, editionId: 'old', species: 'X', phase: 'g' as const, property: 'p' } },
    ];
    const out = substituteEditionValues(problem, inputs, 'new', (s) => (s === 'K' ? { value: '418.8', uncertainty: null, source: 'new' } : undefined));
    expect(out.problem).toEqual({ kind: 'cycle', problem: { values: { 'ionization_energy_1:K': { value: '418.8', uncertainty: null, source: 'new' } }, bare: '1' } });
    expect(out.inputs[0]!.origin).toMatchObject({ editionId: 'new' });
    expect(out.missing).toEqual(['X(g) p']);
    expect(problem.problem.values['ionization_energy_1:K'].value).toBe('419'); // the input is not mutated
  });
});
