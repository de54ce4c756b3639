// The workbench's sheets against the real server: a sheet built on the device from the edition in
// force is accepted by sync push with the server's own recompute equal to the device's result, the
// sign-off rules hold, and the energy-unit preference is saved.
import { v7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../support/db';
import { Client, signedIn } from '../support/http';
import { demoSiteUser } from '../e2e/workbench-support';
import type { MutationOutcome, PushResponse } from '@/lib/sync/protocol';
import { buildCycleSheet, EMPTY_CYCLE_FORM } from '@/lib/workbench/cycle-sheet';
import { buildDissolutionSheet, EMPTY_DISSOLUTION_FORM } from '@/lib/workbench/dissolution-sheet';
import { editionFromCache } from '@/lib/workbench/edition-source';
import { makeValueSource, type ValueSource } from '@/lib/workbench/value-source';

const PROTO = { 'x-rungbook-sync-protocol': '1' };
type Who = { client: Client; userId: string; siteId: string; deviceId: string };

async function who(email: string): Promise<Who> {
  const client = await signedIn(email);
  const me = await client.get<{ userId: string; siteId: string }>('/api/v1/me');
  return { client, userId: me.body.userId, siteId: me.body.siteId, deviceId: v7() };
}

async function push(w: Who, content: Record<string, unknown>, baseRevision: number): Promise<MutationOutcome> {
  const r = await w.client.post<PushResponse>('/api/v1/sync/push', { deviceId: w.deviceId, userId: w.userId, siteId: w.siteId, mutations: [{ mutationId: v7(), entity: 'sheet', recordId: content.id, baseRevision, content }] }, PROTO);
  expect(r.status).toBe(200);
  return r.body.outcomes[0]!;
}

let tech: Who;
let sup: Who;
let qcSup: Who;
let values: ValueSource;

beforeAll(async () => {
  // Fresh accounts on the demo site: the shared demo accounts' sign-in rate limit is left alone.
  [tech, sup, qcSup] = await Promise.all([
    demoSiteUser('technician', 'Workbench API technician').then(who),
    demoSiteUser('supervisor', 'Workbench API supervisor').then(who),
    demoSiteUser('supervisor', 'Workbench API second supervisor').then(who),
  ]);
  const current = await tech.client.get('/api/v1/editions/current');
  const edition = editionFromCache(current.body);
  if (!edition) throw new Error('no edition in force on the demo site');
  values = makeValueSource(edition);
});

afterAll(closeDb);

function sheetFrom(author: Who, kind: 'cycle' | 'dissolution', b: { request: unknown; inputs: unknown[]; outcome: unknown; editionIds: string[] }, status: 'draft' | 'submitted') {
  const t = new Date().toISOString();
  return {
    id: v7(), kind, title: `Workbench integration ${kind}`, lotRef: 'CR-INT-1', areaId: null, note: '', status,
    problem: { ...(b.request as object), form: { note: 'the typed form rides along' } }, inputs: b.inputs, result: b.outcome,
    pinnedEditionId: b.editionIds[0] ?? null, engineVersion: (b.outcome as { engineVersion: string }).engineVersion, version: 1, previousVersionId: null,
    authorId: author.userId, signedOffBy: null, signedOffAt: null, deleted: false, createdAt: t, updatedAt: t,
  };
}

describe('sheets built by the workbench, pushed to the server', () => {
  it('a cycle sheet with an override is accepted, and the server’s recompute equals the device’s result', async () => {
    const b = buildCycleSheet({ ...EMPTY_CYCLE_FORM, formula: 'MgCl2', entries: { 'ionization_energy_2:Mg': { value: '1450.7', uncertainty: '0.5', reason: 'rechecked', unit: 'kJ/mol' } } }, values);
    expect(b.errors).toEqual([]);
    const o = await push(tech, sheetFrom(tech, 'cycle', b, 'submitted'), 0);
    expect(o.status).toBe('applied');
    if (o.status !== 'applied') return;
    expect(o.record?.resultDiffers).toBe(false);
    expect(o.record?.serverResult).toEqual(b.outcome);
  });

  it('a dissolution sheet with batch heat is accepted with the same result on the server', async () => {
    const b = buildDissolutionSheet({ ...EMPTY_DISSOLUTION_FORM, formula: 'LiCl', saltMassKg: '120', waterMassKg: '400' }, values);
    expect(b.errors).toEqual([]);
    const o = await push(tech, sheetFrom(tech, 'dissolution', b, 'draft'), 0);
    expect(o.status === 'applied' && o.record?.resultDiffers).toBe(false);
  });

  it('the author cannot sign off their own sheet; another supervisor can, and it is locked after', async () => {
    const b = buildCycleSheet({ ...EMPTY_CYCLE_FORM, formula: 'KBr' }, values);
    const s = sheetFrom(sup, 'cycle', b, 'submitted');
    const first = await push(sup, s, 0);
    expect(first.status).toBe('applied');
    const signed = (by: Who) => ({ ...s, status: 'signed_off', signedOffBy: by.userId, signedOffAt: new Date().toISOString() });
    const own = await push(sup, signed(sup), 1);
    expect(own.status).toBe('rejected');
    if (own.status === 'rejected') expect(own.reason).toContain('other than its author');
    const other = await push(qcSup, signed(qcSup), 1);
    expect(other.status).toBe('applied');
    const after = await push(sup, { ...signed(qcSup), note: 'a change after sign-off' }, 2);
    expect(after.status).toBe('rejected');
  });
});

describe('PATCH /api/v1/me/preferences', () => {
  it('saves the energy unit, and refuses one it does not know, naming the field', async () => {
    const ok = await tech.client.patch('/api/v1/me/preferences', { preferredUnit: 'kcal/mol' });
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ preferredUnit: 'kcal/mol' });
    const bad = await tech.client.patch<{ error: { fields?: Array<{ field: string }> } }>('/api/v1/me/preferences', { preferredUnit: 'Btu/lb' });
    expect(bad.status).toBe(422);
    expect(JSON.stringify(bad.body)).toContain('preferredUnit');
  });
});
