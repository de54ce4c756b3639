import { describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '@/db/seed/starter-edition';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import { pdfText } from '@/tests/e2e/workbench-support';
import { buildCycleSheet, EMPTY_CYCLE_FORM } from './cycle-sheet';
import { ladderGeometry } from './ladder-geometry';
import { renderSheetPdf, toWinAnsi } from './sheet-pdf';
import { sheetRecord } from './sheet-record';
import { makeValueSource } from './value-source';

const source = makeValueSource({ id: 'ed-2', number: 2, state: 'in_force', values: STARTER_EDITION_VALUES });

function cycleSheet(): Sheet {
  const b = buildCycleSheet({ ...EMPTY_CYCLE_FORM, formula: 'MgCl2', entries: { 'ionization_energy_1:Mg': { value: '738', uncertainty: '1', reason: 'checked against the lab copy', unit: 'kJ/mol' } } }, source);
  const now = new Date().toISOString();
  return {
    id: '01900000-0000-7000-8000-000000000001', kind: 'cycle', title: 'MgCl2 dryer feed', lotRef: 'LOT-77', areaId: null, note: 'Feed from the brine line.', status: 'signed_off',
    problem: b.request, inputs: b.inputs, result: b.outcome, pinnedEditionId: 'ed-2', engineVersion: b.outcome?.engineVersion ?? null, version: 1, previousVersionId: null,
    authorId: 'u-tech', signedOffBy: 'u-sup', signedOffAt: now, deleted: false, createdAt: now, updatedAt: now,
  };
}

describe('sheet PDF record', () => {
  it('carries inputs with sources, the override reason, the result, convention, basis, model check and sign-off as extractable text', async () => {
    const sheet = cycleSheet();
    const record = sheetRecord(sheet, { unit: 'kJ/mol', editionText: 'edition No. 2', names: { 'u-tech': 'Dissolver technician', 'u-sup': 'QC supervisor' } });
    const r = sheet.result as { kind: 'cycle'; result: Parameters<typeof ladderGeometry>[0] };
    const bytes = await renderSheetPdf(record, ladderGeometry(r.result));
    const text = await pdfText(bytes);
    for (const want of ['MgCl2 dryer feed', 'LOT-77', 'edition No. 2', 'OVERRIDE', 'checked against the lab copy', 'Lattice enthalpy', 'Convention:', 'Basis:', 'Model check', 'Signed off by QC supervisor', 'Ladder', 'Feed from the brine line.']) {
      expect(text).toContain(want);
    }
    expect(text).toMatch(/Lattice enthalpy \(dissociation\): \d[\d ]*\.\d+ ± [\d.]+ kJ\/mol/);
  });

  it('maps trade symbols to text the standard fonts can show', () => {
    expect(toWinAnsi('Ca²⁺(g) → ΔlatH −2 258 ± 3 °C')).toBe('Ca2+(g) -> DlatH -2 258 ± 3 °C');
  });
});
