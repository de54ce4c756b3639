import 'server-only';
import { createHash } from 'node:crypto';
import { pool } from '@/db/client';
import { getEditionInForce, getEditionValues } from '@/db/access/editions';
import { solveSheet } from '@/db/access/sync-drift';
import { writeRecordsWithChanges, type ChangeRow, type RecordRow } from '@/db/access/sync-records';
import { SiteSequence, withSyncTransaction } from '@/db/access/sync-sequence';
import { sheetSchema, type ResolvedInput, type Sheet, type SheetKind, type SheetStatus } from '@/lib/sheets/sheet-schema';
import { sameJson } from '@/lib/sync/canonical-json';
import { ENGINE_VERSION, molarMass, type SolveResult } from '@/lib/thermo';
import { buildCalorimetrySheet, EMPTY_CALORIMETRY_FORM, type CalorimetryForm } from '@/lib/workbench/calorimetry-sheet';
import { buildCycleSheet, EMPTY_CYCLE_FORM, type CycleForm } from '@/lib/workbench/cycle-sheet';
import { buildDissolutionSheet, EMPTY_DISSOLUTION_FORM, type DissolutionForm } from '@/lib/workbench/dissolution-sheet';
import type { EditionInUse } from '@/lib/workbench/edition-source';
import { buildReactionSheet, EMPTY_REACTION_FORM, type ReactionForm } from '@/lib/workbench/reaction-sheet';
import { makeValueSource, type ValueSource } from '@/lib/workbench/value-source';

// Demo sheets for Calder Reach Works (an invented plant, design.md §7). Each is built with the
// workbench's own pure logic against the edition in force, so its problem (with the typed form),
// inputs and their sources, pinned edition and engine version are what the workbench would save;
// the server's result is the push handler's own recompute (solveSheet). Written like synced records
// (site sequence, change log). Idempotent: ids derive from the site and a key; a sheet already
// present — as seeded, or since edited or deleted by a user — is left as it is.

interface Built {
  request: Record<string, unknown> | null;
  inputs: ResolvedInput[];
  outcome: SolveResult | null;
  editionIds: string[];
  errors: { field: string; message: string }[];
}

type DemoForm = { kind: 'cycle'; form: CycleForm } | { kind: 'dissolution'; form: DissolutionForm } | { kind: 'reaction'; form: ReactionForm } | { kind: 'calorimetry'; form: CalorimetryForm };

/** The workbench's own build of each kind (lib/workbench), as the sheet editor runs it. */
function build(f: DemoForm, values: ValueSource): Built {
  switch (f.kind) {
    case 'cycle':
      return buildCycleSheet(f.form, values);
    case 'dissolution':
      return buildDissolutionSheet(f.form, values);
    case 'reaction':
      return buildReactionSheet(f.form, values);
    case 'calorimetry':
      return buildCalorimetrySheet(f.form, values);
  }
}

interface DemoSheet {
  key: string;
  kind: SheetKind;
  title: string;
  lotRef: string | null;
  area: string;
  author: string;
  status: SheetStatus;
  signedOffBy?: string;
  note: string;
  /** What the user typed on the workbench (the calorimetry run depends on the edition). */
  form: (values: ValueSource) => DemoForm;
  createdAt: string;
  updatedAt: string;
  signedOffAt?: string;
}

const TECH = 'technician@calder-reach.test';
const QC_TECH = 'qc.technician@calder-reach.test';
const SUPERVISOR = 'supervisor@calder-reach.test';

/** A stable UUID-shaped id for a demo sheet of a site (same site and key → same id). */
function seedId(siteId: string, key: string): string {
  const h = createHash('sha256').update(`rungbook-demo-sheet:${siteId}:${key}`).digest('hex');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-a${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

/**
 * The calorimetry run of lot CR-CB-2611-12: an INVENTED run, not a measurement. 0.0500 mol of
 * CaCl2·6H2O into 100.0 g water; the temperature drop is derived from the edition's own predicted
 * enthalpy of solution of the hexahydrate (the engine reduces a 1 K trial run, and the drop is
 * scaled to the prediction and rounded to the 0.01 K of a bench thermometer), so the verdict the
 * sheet shows is the one such a run would honestly give.
 */
function calorimetryForm(values: ValueSource): CalorimetryForm {
  const sampleMassG = molarMass('CaCl2·6H2O').times('0.0500').toDecimalPlaces(3).toString();
  const trial: CalorimetryForm = { ...EMPTY_CALORIMETRY_FORM, salt: 'CaCl2', sampleMassG, waterMassG: '100.0', beforeC: '21.00', afterC: '20.00' };
  const b = buildCalorimetrySheet(trial, values);
  if (b.outcome?.kind !== 'calorimetry') throw new Error(`demo calorimetry trial does not solve: ${JSON.stringify(b.errors)}`);
  const hexa = b.outcome.result.candidates.find((c) => c.formula === 'CaCl2·6H2O');
  if (!hexa) throw new Error('the edition in force has no CaCl2·6H2O to compare with');
  // Measured ΔsolH is proportional to the drop: scale the 1 K trial to the predicted value.
  const dropK = (Number(hexa.predictedEnthalpyOfSolution) / Number(hexa.measuredEnthalpyOfSolution.value)) * 1;
  return { ...trial, afterC: (21 - Math.round(dropK * 100) / 100).toFixed(2) };
}

const DEMO_SHEETS: DemoSheet[] = [
  {
    key: 'cacl2-cycle',
    kind: 'cycle',
    title: 'CaCl2 lattice enthalpy (Born–Haber) with model check',
    lotRef: null,
    area: 'Dissolver hall',
    author: TECH,
    status: 'signed_off',
    signedOffBy: SUPERVISOR,
    note: 'Reference closure for the brine dissolver: lattice enthalpy of anhydrous flake from the edition in force, checked against the lattice-energy models.',
    form: () => ({ kind: 'cycle', form: { ...EMPTY_CYCLE_FORM, formula: 'CaCl2', modelCheck: true } }),
    createdAt: '2026-11-24T13:20:00.000Z',
    updatedAt: '2026-11-24T15:05:00.000Z',
    signedOffAt: '2026-11-24T15:05:00.000Z',
  },
  {
    key: 'cb-2611-12-batch-heat',
    kind: 'dissolution',
    title: 'Brine dissolver: batch heat of the next CaCl2 flake charge',
    lotRef: 'CR-CB-2611-12',
    area: 'Dissolver hall',
    author: TECH,
    status: 'submitted',
    note: '250 kg anhydrous flake into 1000 kg process water at 20 °C. Upper-bound temperature rise for the charge-rate decision after the 61 °C jacket reading.',
    form: () => ({ kind: 'dissolution', form: { ...EMPTY_DISSOLUTION_FORM, formula: 'CaCl2', saltMassKg: '250', waterMassKg: '1000', startTemperatureC: '20' } }),
    createdAt: '2026-11-25T07:30:00.000Z',
    updatedAt: '2026-11-25T07:48:00.000Z',
  },
  {
    key: 'cb-2611-12-calorimetry',
    kind: 'calorimetry',
    title: 'Lot CR-CB-2611-12: which form is the flake?',
    lotRef: 'CR-CB-2611-12',
    area: 'QC lab',
    author: QC_TECH,
    status: 'draft',
    note: 'Coffee-cup run, 0.0500 mol sample into 100.0 g water; the temperature fell. Demo run: its numbers are invented to match the edition’s prediction for the hexahydrate.',
    form: (v) => ({ kind: 'calorimetry', form: calorimetryForm(v) }),
    createdAt: '2026-11-25T09:10:00.000Z',
    updatedAt: '2026-11-25T09:40:00.000Z',
  },
  {
    key: 'quicklime-hcl',
    kind: 'reaction',
    title: 'Quicklime neutralised with hydrochloric acid, per 250 kg CaO',
    lotRef: null,
    area: 'Dissolver hall',
    author: TECH,
    status: 'draft',
    note: 'Heat of the neutralisation route to brine, per mole of reaction and per 250 kg charge of CaO.',
    form: () => ({ kind: 'reaction', form: { ...EMPTY_REACTION_FORM, reaction: 'CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)', batchSpecies: 'CaO(cr)', batchMassKg: '250' } }),
    createdAt: '2026-11-25T11:00:00.000Z',
    updatedAt: '2026-11-25T11:12:00.000Z',
  },
  {
    key: 'lc-2611-04-dissolution',
    kind: 'dissolution',
    title: 'Lot CR-LC-2611-04: one 25 kg drum of LiCl into 100 kg water',
    lotRef: 'CR-LC-2611-04',
    area: 'Dissolver hall',
    author: TECH,
    status: 'draft',
    note: 'Drum 4, anhydrous lithium chloride. Estimate before making up the 20 % make-up solution.',
    form: () => ({ kind: 'dissolution', form: { ...EMPTY_DISSOLUTION_FORM, formula: 'LiCl', saltMassKg: '25', waterMassKg: '100', startTemperatureC: '20' } }),
    createdAt: '2026-11-24T10:05:00.000Z',
    updatedAt: '2026-11-24T10:20:00.000Z',
  },
];

/** Adds the demo sheets that are missing; returns how many were added. */
export async function seedDemoSheets(siteId: string): Promise<number> {
  const wanted = DEMO_SHEETS.map((d) => ({ d, id: seedId(siteId, d.key) }));
  const [present] = await pool().query('SELECT id FROM sheets WHERE id IN (?)', [wanted.map((w) => w.id)]);
  const have = new Set((present as { id: string }[]).map((r) => r.id));
  if (wanted.every((w) => have.has(w.id))) return 0;

  const inForce = await getEditionInForce(siteId);
  if (!inForce) throw new Error('seed the reference editions before the demo sheets');
  const edition: EditionInUse = { id: inForce.id, number: inForce.number, state: inForce.state, values: await getEditionValues(inForce.id) };
  const values = makeValueSource(edition);
  const [userRows] = await pool().query('SELECT id, email FROM users WHERE site_id = ?', [siteId]);
  const [areaRows] = await pool().query('SELECT id, name FROM areas WHERE site_id = ?', [siteId]);
  const userId = new Map((userRows as { id: string; email: string }[]).map((u) => [u.email, u.id]));
  const areaId = new Map((areaRows as { id: string; name: string }[]).map((a) => [a.name, a.id]));
  const who = (email: string) => {
    const id = userId.get(email);
    if (!id) throw new Error(`seed the demo accounts before the demo sheets (${email} missing)`);
    return id;
  };

  return withSyncTransaction(
    () => pool().getConnection(),
    async (conn) => {
      const seq = await SiteSequence.lock(conn, siteId);
      // Read again under the site lock: a parallel seed run waits here and then adds nothing.
      const [again] = await conn.query('SELECT id FROM sheets WHERE id IN (?)', [wanted.map((w) => w.id)]);
      const already = new Set((again as { id: string }[]).map((r) => r.id));
      const rows: RecordRow[] = [];
      const changes: ChangeRow[] = [];
      for (const { d, id } of wanted) {
        if (already.has(id)) continue;
        const typed = d.form(values);
        const b = build(typed, values);
        if (!b.request || !b.outcome || b.errors.length > 0) throw new Error(`demo sheet ${d.key} does not solve with the edition in force: ${JSON.stringify(b.errors)}`);
        const author = who(d.author);
        const signer = d.signedOffBy ? who(d.signedOffBy) : null;
        // As the sheet editor saves it: the request, the kind, and the typed form (to reopen as typed).
        const content: Sheet = sheetSchema.parse({
          id,
          kind: d.kind,
          title: d.title,
          lotRef: d.lotRef,
          areaId: areaId.get(d.area) ?? null,
          note: d.note,
          status: d.status,
          problem: { ...b.request, kind: d.kind, form: typed.form },
          inputs: b.inputs,
          result: b.outcome,
          pinnedEditionId: b.editionIds[0] ?? edition.id,
          engineVersion: b.outcome.engineVersion ?? ENGINE_VERSION,
          version: 1,
          previousVersionId: null,
          authorId: author,
          signedOffBy: signer,
          signedOffAt: signer ? (d.signedOffAt ?? d.updatedAt) : null,
          deleted: false,
          createdAt: d.createdAt,
          updatedAt: d.updatedAt,
        });
        // The server's own result, exactly as the push handler stores it (never the device's).
        const solved = solveSheet(content.problem);
        const serverResult = solved.ok ? solved.value : { errors: solved.errors };
        const n = seq.next();
        rows.push({
          entity: 'sheet',
          id,
          siteId,
          authorId: author,
          content,
          revision: 1,
          lastSeq: n,
          awaitingReview: false,
          serverResult,
          resultDiffers: content.result !== null && !sameJson(content.result, serverResult),
        });
        changes.push({ seq: n, entity: 'sheet', recordId: id, revision: 1, cause: 'mutation', mutationId: null, actorUserId: signer ?? author });
      }
      return writeRecordsWithChanges(conn, seq, siteId, rows, changes);
    },
  );
}
