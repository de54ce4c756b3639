import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '../../db/seed/starter-edition';
import type { ReferenceValue } from '../../lib/reference/properties';
import { canonicalValue, compareValues, valueKey } from '../../lib/editions/value-key';
import { Client, DEMO, signedIn, waitForMail } from '../support/http';
import { closeDb, makeSite, query } from '../support/db';

const run = promisify(execFile);

interface EditionBody {
  id: string;
  number: number;
  state: string;
  baseEditionId: string | null;
  revision: number;
  valueCount: number;
  authorUserId: string;
  approverUserId: string | null;
  rejectionReason: string | null;
  etag: string;
}
interface ErrorBody {
  error: { code: string; message: string; reason?: string; rows?: { row: number; column: string | null; message: string }[] };
}

const HEADER = 'action,species,phase,charge,property,coordination,value,std_uncertainty,unit,structure,hydration_scale,source,from_memory,note';
const csv = (...rows: string[]) => [HEADER, ...rows].join('\n') + '\n';
const SRC = 'CRC Handbook of Chemistry and Physics section 5';

/** A small starting set for a fresh site (values from the starter edition, so they are real). */
const START_ROWS = [
  `set,CaCl2,cr,0,enthalpy_of_formation,,-795.4,,kJ/mol,,,${SRC},no,`,
  `set,Ca,g,0,ionization_energy_1,,589.8,,kJ/mol,,,NIST ASD,no,`,
  `set,Cl,g,0,electron_gain_enthalpy_1,,-348.575,0.003,kJ/mol,,,LibreTexts A7,no,`,
  `set,Ca2+,g,2,ionic_radius,6,100,,pm,,,Shannon 1976,no,`,
  `set,Cl-,g,-1,hydration_enthalpy,,-367,,kJ/mol,,absolute,,yes,from memory`,
];

async function importCsv(c: Client, editionId: string, body: string | Uint8Array, mode: 'preview' | 'apply' = 'apply') {
  const res = await c.raw(`/api/v1/editions/${editionId}/import?mode=${mode}`, {
    method: 'POST',
    headers: { origin: c.origin, 'content-type': 'text/csv' },
    body: body as BodyInit,
  });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> & ErrorBody };
}

async function valuesOf(c: Client, editionId: string) {
  const r = await c.get<{ edition: EditionBody; values: ReferenceValue[] }>(`/api/v1/editions/${editionId}`);
  expect(r.status).toBe(200);
  return r.body;
}

const sorted = (v: ReferenceValue[]) => [...v].map(canonicalValue).sort(compareValues);

afterAll(closeDb);

describe('the seeded demo editions', () => {
  it('Calder Reach Works has No. 1 retired and No. 2 in force, authored by the technician and approved by the supervisor', async () => {
    const c = await signedIn(DEMO.technician);
    const r = await c.get<{ editions: EditionBody[]; people: Record<string, string> }>('/api/v1/editions');
    expect(r.status).toBe(200);
    const byNumber = Object.fromEntries(r.body.editions.map((e) => [e.number, e]));
    expect(byNumber[1]?.state).toBe('retired');
    expect(byNumber[2]?.state).toBe('in_force');
    const [tech] = await query<{ id: string }>('SELECT id FROM users WHERE email = ?', [DEMO.technician]);
    const [sup] = await query<{ id: string }>('SELECT id FROM users WHERE email = ?', [DEMO.supervisor]);
    expect(byNumber[2]!.authorUserId).toBe(tech!.id);
    expect(byNumber[2]!.approverUserId).toBe(sup!.id);
    expect(byNumber[2]!.baseEditionId).toBe(byNumber[1]!.id);
  });

  it('the edition in force in the database equals the starter data module, value for value', async () => {
    const rows = await query<Record<string, unknown>>(
      `SELECT s.formula, s.phase, s.charge, v.property, v.value, v.uncertainty, v.unit, v.coordination, v.structure, v.scale, v.source, v.from_memory, v.note
         FROM edition_values v JOIN ref_species s ON s.id = v.species_id JOIN editions e ON e.id = v.edition_id JOIN sites t ON t.id = e.site_id
        WHERE t.code = 'calder-reach' AND e.state = 'in_force'`,
    );
    const fromDb: ReferenceValue[] = rows.map((r) => ({
      species: String(r.formula),
      phase: r.phase as ReferenceValue['phase'],
      charge: Number(r.charge),
      property: r.property as ReferenceValue['property'],
      value: String(r.value),
      uncertainty: (r.uncertainty as string | null) ?? null,
      unit: String(r.unit),
      ...(r.coordination !== null ? { coordination: Number(r.coordination) } : {}),
      ...(r.structure !== null ? { structure: String(r.structure) } : {}),
      ...(r.scale !== null ? { scale: r.scale as ReferenceValue['scale'] } : {}),
      source: String(r.source),
      fromMemory: Boolean(r.from_memory),
      ...(r.note !== null ? { note: String(r.note) } : {}),
    }));
    expect(fromDb).toHaveLength(STARTER_EDITION_VALUES.length);
    expect(sorted(fromDb)).toEqual(sorted(STARTER_EDITION_VALUES));
  });

  it('every seeded value, in every seeded edition, has a citation or the "from memory" flag', async () => {
    const bad = await query<{ n: number }>(
      `SELECT COUNT(*) AS n FROM edition_values v JOIN editions e ON e.id = v.edition_id JOIN sites t ON t.id = e.site_id
        WHERE t.code = 'calder-reach' AND e.number IN (1, 2) AND TRIM(v.source) = '' AND v.from_memory = 0`,
    );
    expect(Number(bad[0]!.n)).toBe(0);
    const total = await query<{ n: number }>(
      `SELECT COUNT(*) AS n FROM edition_values v JOIN editions e ON e.id = v.edition_id JOIN sites t ON t.id = e.site_id WHERE t.code = 'calder-reach' AND e.number IN (1, 2)`,
    );
    expect(Number(total[0]!.n)).toBeGreaterThan(900);
  });

  it('the API serves the edition in force equal to the data module, with spot checks against published tables', async () => {
    const c = await signedIn(DEMO.qcTechnician);
    const r = await c.get<{ edition: EditionBody; values: ReferenceValue[] }>('/api/v1/editions/current');
    expect(r.status).toBe(200);
    expect(sorted(r.body.values)).toEqual(sorted(STARTER_EDITION_VALUES));
    const at = (species: string, phase: string, property: string, cn?: number) => {
      const v = r.body.values.find((x) => x.species === species && x.phase === phase && x.property === property && x.coordination === cn);
      expect(v, `${species} ${property}`).toBeDefined();
      return Number(v!.value);
    };
    // Na first ionization energy 5.13907696 eV = 495.85 kJ/mol — NIST Atomic Spectra Database, ionization energies
    expect(at('Na', 'g', 'ionization_energy_1')).toBeCloseTo(495.8, 1);
    // Ca first ionization energy 6.11315547 eV = 589.83 kJ/mol — NIST Atomic Spectra Database, ionization energies
    expect(at('Ca', 'g', 'ionization_energy_1')).toBeCloseTo(589.8, 1);
    // AgCl(cr) ΔfH° = −127.01 ± 0.05 kJ/mol — CODATA Key Values for Thermodynamics (Cox, Wagman, Medvedev 1989)
    expect(Math.abs(at('AgCl', 'cr', 'enthalpy_of_formation') - -127.01)).toBeLessThanOrEqual(0.05);
    // Al2O3(cr, corundum) ΔfH° = −1675.7 ± 1.3 kJ/mol — CODATA Key Values for Thermodynamics (1989)
    expect(Math.abs(at('Al2O3', 'cr', 'enthalpy_of_formation') - -1675.7)).toBeLessThanOrEqual(1.3);
    // Ca2+ effective ionic radius, CN 6: 1.00 Å — Shannon (1976), Acta Cryst. A32, 751
    expect(at('Ca2+', 'g', 'ionic_radius', 6)).toBe(100);
    // Cl- effective ionic radius, CN 6: 1.81 Å — Shannon (1976), Acta Cryst. A32, 751
    expect(at('Cl-', 'g', 'ionic_radius', 6)).toBe(181);
    // Cl electron affinity 3.612725 eV = 348.575 kJ/mol, stored signed as an electron-gain enthalpy — LibreTexts "A7: Electron Affinities"
    expect(at('Cl', 'g', 'electron_gain_enthalpy_1')).toBeCloseTo(-348.575, 3);
    // CaCl2(cr) ΔfH° = −795.4 kJ/mol — CRC Handbook, "Standard Thermodynamic Properties of Chemical Substances"
    expect(at('CaCl2', 'cr', 'enthalpy_of_formation')).toBeCloseTo(-795.4, 1);
  });

  it('the difference between No. 1 and No. 2 is the hydrates added and five ionization energies restored', async () => {
    const c = await signedIn(DEMO.technician);
    const list = (await c.get<{ editions: EditionBody[] }>('/api/v1/editions')).body.editions;
    const one = list.find((e) => e.number === 1)!;
    const two = list.find((e) => e.number === 2)!;
    const r = await c.get<{ diff: { added: { key: string }[]; removed: unknown[]; changed: { key: string; before: ReferenceValue; after: ReferenceValue; fields: string[] }[]; unchanged: number } }>(
      `/api/v1/editions/diff?from=${one.id}&to=${two.id}`,
    );
    expect(r.status).toBe(200);
    const hydrateRows = STARTER_EDITION_VALUES.filter((v) => v.species.includes('·')).length;
    expect(r.body.diff.added).toHaveLength(hydrateRows);
    expect(r.body.diff.added.every((a) => a.key.includes('·'))).toBe(true);
    expect(r.body.diff.removed).toHaveLength(0);
    expect(r.body.diff.changed.map((c) => c.key.split('|')[0]).sort()).toEqual(['Cs', 'K', 'Li', 'Na', 'Rb']);
    const li = r.body.diff.changed.find((x) => x.key.startsWith('Li|'))!;
    expect([li.before.value, li.after.value]).toEqual(['520', '520.2']);
    expect(li.fields).toContain('value');
    expect(r.body.diff.unchanged).toBe(STARTER_EDITION_VALUES.length - hydrateRows - 5);
    // The reverse direction swaps added and removed.
    const back = await c.get<{ diff: { added: unknown[]; removed: unknown[] } }>(`/api/v1/editions/diff?from=${two.id}&to=${one.id}`);
    expect(back.body.diff.removed).toHaveLength(hydrateRows);
    expect(back.body.diff.added).toHaveLength(0);
  });

  it("one value's history lists its value in every edition and each recorded change", async () => {
    const c = await signedIn(DEMO.technician);
    const r = await c.get<{ key: string; editions: { edition: EditionBody; value: ReferenceValue | null }[]; events: { action: string; origin: string }[] }>(
      '/api/v1/editions/history?species=Li&phase=g&property=ionization_energy_1',
    );
    expect(r.status).toBe(200);
    const seeded = r.body.editions.filter((e) => e.edition.number <= 2).map((e) => e.value?.value);
    expect(seeded).toEqual(['520', '520.2']);
    expect(r.body.events.map((e) => e.action)).toEqual(expect.arrayContaining(['added', 'changed']));
    const bad = await c.get<ErrorBody>('/api/v1/editions/history?species=Li&phase=plasma&property=ionization_energy_1');
    expect(bad.status).toBe(422);
  });

  it('running the seed again changes nothing', async () => {
    const count = async () =>
      query<{ e: number; v: number; ev: number }>(
        `SELECT (SELECT COUNT(*) FROM editions) AS e, (SELECT COUNT(*) FROM edition_values) AS v, (SELECT COUNT(*) FROM edition_value_events) AS ev`,
      );
    const before = await count();
    await run('node_modules/.bin/tsx', ['--conditions=react-server', 'db/seed/index.ts'], { env: process.env });
    expect(await count()).toEqual(before);
  });
});

describe('the current edition and its ETag', () => {
  it('answers 304 with no body when the ETag still matches, and 200 when it does not', async () => {
    const c = await signedIn(DEMO.technician);
    const first = await c.get('/api/v1/editions/current');
    expect(first.status).toBe(200);
    const etag = first.headers.get('etag');
    expect(etag).toMatch(/^"ed-/);
    const again = await c.raw('/api/v1/editions/current', { headers: { 'if-none-match': etag! } });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe('');
    expect(again.headers.get('etag')).toBe(etag);
    const stale = await c.raw('/api/v1/editions/current', { headers: { 'if-none-match': '"ed-something-else-r1"' } });
    expect(stale.status).toBe(200);
  });

  it('refuses anyone signed out, and another site sees only its own editions', async () => {
    expect((await new Client().get('/api/v1/editions/current')).status).toBe(401);
    const other = await makeSite('ed-iso');
    const c = await signedIn(other.users.technician.email, other.password);
    expect((await c.get('/api/v1/editions/current')).status).toBe(404);
    const demo = await signedIn(DEMO.technician);
    const id = ((await demo.get<{ edition: EditionBody }>('/api/v1/editions/current')).body.edition).id;
    expect((await c.get(`/api/v1/editions/${id}`)).status).toBe(404);
    expect((await c.get<{ editions: unknown[] }>('/api/v1/editions')).body.editions).toHaveLength(0);
  });
});

describe('the edition workflow, per role', () => {
  let site: Awaited<ReturnType<typeof makeSite>>;
  let tech: Client;
  let sup: Client;
  let sup2: Client;
  let first: EditionBody;

  beforeAll(async () => {
    site = await makeSite('ed-flow');
    tech = await signedIn(site.users.technician.email, site.password);
    sup = await signedIn(site.users.supervisor.email, site.password);
    sup2 = await signedIn(site.users.supervisor2.email, site.password);
  });

  it('a technician drafts the first edition, imports values, submits it; supervisors are e-mailed', async () => {
    const created = await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'First edition for this site.' });
    expect(created.status).toBe(201);
    first = created.body.edition;
    expect(first).toMatchObject({ number: 1, state: 'draft', baseEditionId: null, valueCount: 0 });
    const imported = await importCsv(tech, first.id, csv(...START_ROWS));
    expect(imported.status).toBe(200);
    expect(imported.body.counts).toMatchObject({ added: 5, changed: 0, removed: 0 });
    const t0 = Date.now() - 1000;
    const submitted = await tech.post<{ edition: EditionBody }>(`/api/v1/editions/${first.id}/submit`);
    expect(submitted.status).toBe(200);
    expect(submitted.body.edition.state).toBe('in_review');
    const mail = await waitForMail(site.users.supervisor.email, 'No. 1 waits for your review', t0);
    expect(mail.text).toContain('First edition for this site.');
    await waitForMail(site.users.supervisor2.email, 'No. 1 waits for your review', t0);
  });

  it('a technician approving gets 403; approving an edition not in review gets 409', async () => {
    const r = await tech.post<ErrorBody>(`/api/v1/editions/${first.id}/approve`);
    expect(r.status).toBe(403);
    expect(r.body.error.message).toMatch(/edition\.approve/);
    const draft = (await sup.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'not submitted' })).body.edition;
    const notInReview = await sup2.post<ErrorBody>(`/api/v1/editions/${draft.id}/approve`);
    expect(notInReview.status).toBe(409);
    expect(notInReview.body.error.message).toMatch(/draft/);
  });

  it('a supervisor rejects with a reason: back to draft; the author fixes, resubmits, and another supervisor approves', async () => {
    const noReason = await sup.post<ErrorBody>(`/api/v1/editions/${first.id}/reject`, { reason: '' });
    expect(noReason.status).toBe(422);
    const sentBack = Date.now() - 1000;
    const rejected = await sup.post<{ edition: EditionBody }>(`/api/v1/editions/${first.id}/reject`, { reason: 'Cite the table for the Cl- hydration enthalpy.' });
    expect(rejected.status).toBe(200);
    expect(rejected.body.edition).toMatchObject({ state: 'draft', rejectionReason: 'Cite the table for the Cl- hydration enthalpy.' });
    const toAuthor = await waitForMail(site.users.technician.email, 'No. 1 was sent back to draft', sentBack);
    expect(toAuthor.text).toContain('Cite the table for the Cl- hydration enthalpy.');
    // A rejected edition cannot be approved until it is submitted again.
    expect((await sup.post(`/api/v1/editions/${first.id}/approve`)).status).toBe(409);
    expect((await tech.post(`/api/v1/editions/${first.id}/submit`)).status).toBe(200);
    const t0 = Date.now() - 1000;
    const approved = await sup.post<{ edition: EditionBody; retired: EditionBody | null }>(`/api/v1/editions/${first.id}/approve`);
    expect(approved.status).toBe(200);
    expect(approved.body.edition.state).toBe('in_force');
    expect(approved.body.retired).toBeNull();
    const notice = await waitForMail(site.users.technician.email, 'No. 1 is now in force', t0);
    expect(notice.text).toContain('First edition for this site.');
    const current = await tech.get<{ edition: EditionBody; values: ReferenceValue[] }>('/api/v1/editions/current');
    expect(current.body.edition.id).toBe(first.id);
    expect(current.body.values).toHaveLength(5);
  });

  it('a supervisor approving their own edition gets 403 with the reason', async () => {
    const own = (await sup.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'Supervisor draft.' })).body.edition;
    expect(own.baseEditionId).toBe(first.id);
    expect((await importCsv(sup, own.id, csv(`set,Ca,g,0,ionization_energy_2,,1145.4,,kJ/mol,,,NIST ASD,no,`))).status).toBe(200);
    expect((await sup.post(`/api/v1/editions/${own.id}/submit`)).status).toBe(200);
    const r = await sup.post<ErrorBody>(`/api/v1/editions/${own.id}/approve`);
    expect(r.status).toBe(403);
    expect(r.body.error.reason).toBe('own_edition');
    expect(r.body.error.message).toMatch(/authored/);
    expect((await sup.post<ErrorBody>(`/api/v1/editions/${own.id}/reject`, { reason: 'I cannot reject my own either' })).status).toBe(403);
    // Someone else may edit nothing in it: only its author changes a draft.
    const [row] = await query<{ state: string }>('SELECT state FROM editions WHERE id = ?', [own.id]);
    expect(row!.state).toBe('in_review');
    const other = await sup2.post<{ edition: EditionBody }>(`/api/v1/editions/${own.id}/reject`, { reason: 'Not needed this month.' });
    expect(other.body.edition.state).toBe('draft');
  });

  it('approving a draft whose base is no longer in force → 409 "rebase first"; the rebase carries its changes over', async () => {
    const a = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'A: adds Cl- radius.' })).body.edition;
    const b = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'B: corrects CaCl2, removes the Ca2+ radius.' })).body.edition;
    expect(a.baseEditionId).toBe(first.id);
    expect(b.baseEditionId).toBe(first.id);
    await importCsv(tech, a.id, csv(`set,Cl-,g,-1,ionic_radius,6,181,,pm,,,Shannon 1976,no,`, `set,CaCl2,cr,0,enthalpy_of_formation,,-795.8,,kJ/mol,,,older table,no,`));
    await importCsv(tech, b.id, csv(`set,CaCl2,cr,0,enthalpy_of_formation,,-795.42,,kJ/mol,,,${SRC},no,`, `remove,Ca2+,g,2,ionic_radius,6,,,,,,,,`));
    expect((await tech.post(`/api/v1/editions/${a.id}/submit`)).status).toBe(200);
    expect((await tech.post(`/api/v1/editions/${b.id}/submit`)).status).toBe(200);
    const okA = await sup.post<{ retired: EditionBody }>(`/api/v1/editions/${a.id}/approve`);
    expect(okA.status).toBe(200);
    expect(okA.body.retired.id).toBe(first.id);

    const stale = await sup.post<ErrorBody>(`/api/v1/editions/${b.id}/approve`);
    expect(stale.status).toBe(409);
    expect(stale.body.error.reason).toBe('rebase_required');
    expect(stale.body.error.message).toMatch(/[Rr]ebase first/);
    // Only the author, or a supervisor once it is in review, may rebase.
    const rebased = await sup.post<{ edition: EditionBody; carried: number; conflicts: { key: string }[] }>(`/api/v1/editions/${b.id}/rebase`);
    expect(rebased.status).toBe(200);
    expect(rebased.body.edition.baseEditionId).toBe(a.id);
    expect(rebased.body.carried).toBe(2);
    // Both changed CaCl2: B's value is kept, and the clash is reported.
    expect(rebased.body.conflicts.map((c) => c.key)).toEqual(['CaCl2|cr|enthalpy_of_formation|']);
    const values = (await valuesOf(tech, b.id)).values;
    const keys = values.map(valueKey);
    expect(keys).toContain('Cl-|g|ionic_radius|6'); // A's addition, now in B's base
    expect(keys).not.toContain('Ca2+|g|ionic_radius|6'); // B's removal, carried over
    expect(values.find((v) => v.species === 'CaCl2')!.value).toBe('-795.42');
    const approved = await sup.post<{ edition: EditionBody; retired: EditionBody }>(`/api/v1/editions/${b.id}/approve`);
    expect(approved.status).toBe(200);
    expect(approved.body.retired.id).toBe(a.id);
    // One edition in force per site; retired ones stay readable.
    const inForce = await query<{ n: number }>("SELECT COUNT(*) AS n FROM editions WHERE site_id = ? AND state = 'in_force'", [site.siteId]);
    expect(Number(inForce[0]!.n)).toBe(1);
    const old = await valuesOf(tech, first.id);
    expect(old.edition.state).toBe('retired');
    expect(old.values).toHaveLength(5);
  });

  it('a new edition in force changes the ETag, so a device holding the old one downloads again', async () => {
    const r = await tech.get<{ edition: EditionBody }>('/api/v1/editions/current');
    const oldTag = `"ed-${first.id}-r${first.revision + 1}"`;
    const res = await tech.raw('/api/v1/editions/current', { headers: { 'if-none-match': oldTag } });
    expect(res.status).toBe(200);
    expect(res.headers.get('etag')).toBe(r.body.edition.etag);
    expect((await tech.raw('/api/v1/editions/current', { headers: { 'if-none-match': r.body.edition.etag } })).status).toBe(304);
  });

  it('records an audit entry for every value change and every workflow step', async () => {
    const rows = await query<{ action: string; n: number }>('SELECT action, COUNT(*) AS n FROM audit_log WHERE site_id = ? GROUP BY action', [site.siteId]);
    const n = Object.fromEntries(rows.map((r) => [r.action, Number(r.n)]));
    expect(n['edition.drafted']).toBeGreaterThanOrEqual(4);
    expect(n['edition.approved']).toBe(3);
    expect(n['edition.rejected']).toBe(2);
    expect(n['edition.rebased']).toBe(1);
    expect(n['edition.value_added']).toBeGreaterThanOrEqual(5);
    expect(n['edition.value_removed']).toBeGreaterThanOrEqual(1);
  });

  it('only the author changes a draft; the editor refuses a stale revision', async () => {
    const d = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: '' })).body.edition;
    const row = { action: 'set', species: 'Sr2+', phase: 'g', charge: '2', property: 'ionic_radius', coordination: '6', value: '1.18', unit: 'Å', source: 'Shannon 1976', from_memory: 'no' };
    const bySup = await sup.post<ErrorBody>(`/api/v1/editions/${d.id}/changes`, { changes: [row] });
    expect(bySup.status).toBe(403);
    const ok = await tech.post<{ edition: EditionBody; counts: Record<string, number> }>(`/api/v1/editions/${d.id}/changes`, { changes: [row], revision: d.revision });
    expect(ok.status).toBe(200);
    expect(ok.body.counts.added).toBe(1);
    const values = (await valuesOf(tech, d.id)).values;
    expect(values.find((v) => v.species === 'Sr2+')!.value).toBe('118'); // 1.18 Å × 100 pm/Å
    const stale = await tech.post<ErrorBody>(`/api/v1/editions/${d.id}/changes`, { changes: [{ ...row, value: '1.19' }], revision: d.revision });
    expect(stale.status).toBe(409);
    const badRow = await tech.post<ErrorBody>(`/api/v1/editions/${d.id}/changes`, { changes: [{ ...row, value: 'abc' }] });
    expect(badRow.status).toBe(422);
    expect(badRow.body.error.rows).toEqual([expect.objectContaining({ row: 1, column: 'value' })]);
    // An empty change summary blocks submission, naming the field.
    const submit = await tech.post<ErrorBody & { error: { fields: { field: string }[] } }>(`/api/v1/editions/${d.id}/submit`);
    expect(submit.status).toBe(422);
    expect(submit.body.error.fields[0]!.field).toBe('changeSummary');
  });

  it('its author takes an edition back out of review; a draft is discarded by its author or a supervisor, and kept readable', async () => {
    const d = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'Second thoughts.' })).body.edition;
    expect((await tech.post<{ edition: EditionBody }>(`/api/v1/editions/${d.id}/submit`)).body.edition.state).toBe('in_review');
    const bySup = await sup.post<ErrorBody>(`/api/v1/editions/${d.id}/withdraw`);
    expect(bySup.status).toBe(403);
    const back = await tech.post<{ edition: EditionBody }>(`/api/v1/editions/${d.id}/withdraw`);
    expect(back.status).toBe(200);
    expect(back.body.edition).toMatchObject({ state: 'draft', submittedAt: null });
    expect((await tech.post<ErrorBody>(`/api/v1/editions/${d.id}/withdraw`)).status).toBe(409);

    // A technician may not discard a supervisor's draft; a supervisor may discard the technician's.
    const supDraft = (await sup.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'a supervisor draft' })).body.edition;
    const notYours = await tech.post<ErrorBody>(`/api/v1/editions/${supDraft.id}/discard`);
    expect(notYours.status).toBe(403);
    expect(notYours.body.error.message).toMatch(/author.*or a supervisor/);
    const gone = await sup.post<{ edition: EditionBody }>(`/api/v1/editions/${d.id}/discard`);
    expect(gone.status).toBe(200);
    expect(gone.body.edition.state).toBe('discarded');
    const mine = await sup.post<{ edition: EditionBody }>(`/api/v1/editions/${supDraft.id}/discard`);
    expect(mine.body.edition.state).toBe('discarded');
    // Kept and readable, its number not reused; never submitted or changed again.
    const read = await tech.get<{ edition: EditionBody; values: unknown[] }>(`/api/v1/editions/${d.id}`);
    expect(read.status).toBe(200);
    expect(read.body.values.length).toBe(d.valueCount);
    const resubmit = await tech.post<ErrorBody>(`/api/v1/editions/${d.id}/submit`);
    expect(resubmit.status).toBe(409);
    expect(resubmit.body.error.message).toMatch(/discarded/);
    expect((await tech.post<ErrorBody>(`/api/v1/editions/${d.id}/discard`)).status).toBe(409);
    const next = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'after the discards' })).body.edition;
    expect(next.number).toBeGreaterThan(Math.max(d.number, supDraft.number));
    const audits = await query<{ action: string }>("SELECT action FROM audit_log WHERE entity_id = ? AND action IN ('edition.withdrawn', 'edition.discarded')", [d.id]);
    expect(audits.map((a) => a.action).sort()).toEqual(['edition.discarded', 'edition.withdrawn']);
  });
});

describe('CSV import into a draft', () => {
  let tech: Client;
  let draft: EditionBody;

  beforeAll(async () => {
    const site = await makeSite('ed-csv');
    tech = await signedIn(site.users.technician.email, site.password);
    draft = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'csv' })).body.edition;
    const r = await importCsv(tech, draft.id, csv(...START_ROWS));
    expect(r.status).toBe(200);
    draft = r.body.edition as unknown as EditionBody;
  });

  async function expectRejected(body: string | Uint8Array, row: number, column: string | null, message: RegExp) {
    const before = await valuesOf(tech, draft.id);
    const r = await importCsv(tech, draft.id, body);
    expect(r.status, JSON.stringify(r.body)).toBe(422);
    expect(r.body.error.rows).toEqual(expect.arrayContaining([expect.objectContaining({ row, column, message: expect.stringMatching(message) })]));
    const after = await valuesOf(tech, draft.id);
    expect(after.edition.revision).toBe(before.edition.revision);
    expect(sorted(after.values)).toEqual(sorted(before.values));
  }

  const good = `set,Ba2+,g,2,ionic_radius,6,135,,pm,,,Shannon 1976,no,`;

  it.each([
    ['an unknown species', `set,Xq2,cr,0,enthalpy_of_formation,,-100,,kJ/mol,,,${SRC},no,`, 'species', /unknown species/],
    ['an unknown property', `set,CaO,cr,0,lattice_thing,,-100,,kJ/mol,,,${SRC},no,`, 'property', /unknown property/],
    ['a unit that does not fit the property', `set,CaO,cr,0,enthalpy_of_formation,,-634.9,,g/cm3,,,${SRC},no,`, 'unit', /cannot be used/],
    ['a decimal comma', `set,CaO,cr,0,enthalpy_of_formation,,"-634,9",,kJ/mol,,,${SRC},no,`, 'value', /plain decimal/],
    ['text as a number', `set,CaO,cr,0,enthalpy_of_formation,,about -635,,kJ/mol,,,${SRC},no,`, 'value', /plain decimal/],
    ['a missing source', `set,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,,no,`, 'source', /source is required/],
    ['a charge that does not match the species', `set,Ca2+,g,1,ionic_radius,6,100,,pm,,,Shannon 1976,no,`, 'charge', /does not match/],
    ['a radius without its coordination', `set,Mg2+,g,2,ionic_radius,,72,,pm,,,Shannon 1976,no,`, 'coordination', /coordination/],
    ['a hydration enthalpy without a scale', `set,Na+,g,1,hydration_enthalpy,,-406,,kJ/mol,,,,yes,memo`, 'hydration_scale', /scale/],
    ['a second scale of hydration enthalpy', `set,Na+,g,1,hydration_enthalpy,,-406,,kJ/mol,,conventional,,yes,memo`, 'hydration_scale', /one scale/],
    ['a missing action', `,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,${SRC},no,`, 'action', /action/],
    ['an unknown phase', `set,CaO,solid,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,${SRC},no,`, 'phase', /phase/],
    ['removing a value the draft lacks', `remove,CaO,cr,0,enthalpy_of_formation,,,,,,,,,`, 'species', /no such value/],
  ])('%s → error by row and column, nothing applied (a good row beside it is not applied either)', async (_name, bad, column, message) => {
    await expectRejected(csv(good, bad), 3, column, message);
  });

  it('a duplicate row names the earlier row', async () => {
    await expectRejected(csv(good, good.replace('135', '136')), 3, 'species', /row 2 already/);
  });

  it('a row with the wrong number of fields', async () => {
    await expectRejected(csv(good, 'set,CaO,cr'), 3, null, /fields but the header has/);
  });

  it('a header with an unknown or a missing column', async () => {
    await expectRejected(HEADER.replace('note', 'remarks') + '\n' + good + '\n', 1, 'remarks', /unknown column/);
    await expectRejected(HEADER.replace(',source', '') + '\n' + good.replace(',Shannon 1976', '') + '\n', 1, 'source', /no "source" column/);
  });

  it('an empty file, a header with no rows, and bytes that are not UTF-8', async () => {
    await expectRejected('', 1, null, /empty/);
    await expectRejected(HEADER + '\n', 2, null, /no rows/);
    const latin1 = new Uint8Array([...new TextEncoder().encode(HEADER + '\nset,CaO,cr,0,enthalpy_of_formation,,-634.9,,kJ/mol,,,Caf'), 0xe9, 0x0a]);
    await expectRejected(latin1, 1, null, /not UTF-8/);
  });

  it('too many rows, and a file over the size limit', async () => {
    const many = Array.from({ length: 10_001 }, (_, i) => `set,Ca2+,g,2,ionic_radius,${(i % 12) + 1},100,,pm,,,S${i},no,`);
    await expectRejected(csv(...many), 10_002, null, /at most 10000/);
    const big = csv(good.replace('Shannon 1976', 'x'.repeat(1900)), ...Array.from({ length: 1200 }, () => good.replace('Shannon 1976', 'y'.repeat(1900))));
    const r = await importCsv(tech, draft.id, big);
    expect(r.status).toBe(413);
    // The same bytes sent chunked (no Content-Length) are stopped at the limit too.
    const bytes = new TextEncoder().encode(big);
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        for (let i = 0; i < bytes.length; i += 64 * 1024) controller.enqueue(bytes.slice(i, i + 64 * 1024));
        controller.close();
      },
    });
    const chunked = await tech.raw(`/api/v1/editions/${draft.id}/import?mode=apply`, {
      method: 'POST',
      headers: { origin: tech.origin, 'content-type': 'text/csv' },
      body: stream,
      duplex: 'half',
    } as RequestInit);
    expect(chunked.status).toBe(413);
  });

  it('a preview lists added, changed and removed (old → new) and applies nothing; apply then does', async () => {
    const body = csv(
      `set,CaCl2,cr,0,enthalpy_of_formation,,-795.8,,kJ/mol,,,${SRC},no,`,
      `remove,Ca2+,g,2,ionic_radius,6,,,,,,,,`,
      good,
      `set,Ca,g,0,ionization_energy_1,,589.8,,kJ/mol,,,NIST ASD,no,`,
    );
    const before = await valuesOf(tech, draft.id);
    const preview = await importCsv(tech, draft.id, body, 'preview');
    expect(preview.status).toBe(200);
    expect(preview.body.applied).toBe(false);
    expect(preview.body.counts).toEqual({ added: 1, changed: 1, removed: 1, unchanged: 1 });
    const changed = (preview.body.changes as { kind: string; before: ReferenceValue | null; after: ReferenceValue | null; row: number }[]).find((c) => c.kind === 'changed')!;
    expect([changed.row, changed.before!.value, changed.after!.value]).toEqual([2, '-795.4', '-795.8']);
    expect((await valuesOf(tech, draft.id)).edition.revision).toBe(before.edition.revision);
    const applied = await importCsv(tech, draft.id, body, 'apply');
    expect(applied.status).toBe(200);
    const after = await valuesOf(tech, draft.id);
    expect(after.edition.revision).toBe(before.edition.revision + 1);
    expect(after.values.find((v) => v.species === 'CaCl2')!.value).toBe('-795.8');
    expect(after.values.some((v) => v.species === 'Ca2+')).toBe(false);
  });

  it('accepts UTF-8 with a BOM and converts kcal/mol and eV to kJ/mol on import', async () => {
    const body = '\ufeff' + csv(
      // 1 thermochemical kcal = 4.184 kJ exactly — NIST SP 811, appendix B.8 (thermochemical calorie)
      `set,MgO,cr,0,enthalpy_of_formation,,-143.8,0.1,kcal/mol,,,test row,no,`,
      // 1 eV per particle = 96.485 332 12 kJ/mol — CODATA 2018 (e·N_A, exact since the 2019 SI)
      `set,Mg,g,0,ionization_energy_1,,7.646236,,eV,,,NIST ASD,no,`,
      `set,CaCl2·6H2O,cr,0,density,,1710,,kg/m3,,,CRC physical constants,no,`,
    );
    const r = await importCsv(tech, draft.id, body);
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    const values = (await valuesOf(tech, draft.id)).values;
    const mgo = values.find((v) => v.species === 'MgO')!;
    expect([mgo.value, mgo.uncertainty, mgo.unit]).toEqual(['-601.6592', '0.4184', 'kJ/mol']);
    expect(mgo.note).toMatch(/converted on import from -143.8 kcal\/mol/);
    const mg = values.find((v) => v.species === 'Mg')!;
    // NIST ASD: Mg 7.646236 eV = 737.7 kJ/mol (the starter edition's value)
    expect(Number(mg.value)).toBeCloseTo(737.75, 2);
    expect(values.find((v) => v.species === 'CaCl2·6H2O')!.value).toBe('1.71');
  });

  it('an exported edition imports back into a draft as all "unchanged"', async () => {
    const demo = await signedIn(DEMO.technician);
    const current = (await demo.get<{ edition: EditionBody }>('/api/v1/editions/current')).body.edition;
    const exported = await demo.raw(`/api/v1/editions/${current.id}/export`);
    expect(exported.status).toBe(200);
    expect(exported.headers.get('content-type')).toMatch(/text\/csv/);
    const text = await exported.text();
    expect(text.split('\r\n').filter(Boolean)).toHaveLength(STARTER_EDITION_VALUES.length + 1);
    const site = await makeSite('ed-roundtrip');
    const t = await signedIn(site.users.technician.email, site.password);
    const d = (await t.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'copy' })).body.edition;
    const first = await importCsv(t, d.id, text);
    expect(first.status, JSON.stringify(first.body).slice(0, 500)).toBe(200);
    expect((first.body.counts as Record<string, number>).added).toBe(STARTER_EDITION_VALUES.length);
    const again = await importCsv(t, d.id, text, 'preview');
    expect(again.body.counts).toEqual({ added: 0, changed: 0, removed: 0, unchanged: STARTER_EDITION_VALUES.length });
    expect(sorted((await valuesOf(t, d.id)).values)).toEqual(sorted(STARTER_EDITION_VALUES));
  });

  it('the template downloads and its example rows import cleanly', async () => {
    const res = await tech.raw('/api/v1/editions/template');
    expect(res.status).toBe(200);
    const text = await res.text();
    expect(text.replace(/^\ufeff/, '').split('\r\n')[0]).toBe(HEADER);
    const d = (await tech.post<{ edition: EditionBody }>('/api/v1/editions', { changeSummary: 'template' })).body.edition;
    // The template's "remove" row needs a value to remove: add it first.
    await importCsv(tech, d.id, csv(`set,CaCl2·2H2O,cr,0,density,,1.850,,g/cm3,,,CRC,no,`));
    const r = await importCsv(tech, d.id, text, 'preview');
    expect(r.status, JSON.stringify(r.body)).toBe(200);
  });
});
