import { describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '@/db/seed/starter-edition';
import { solve } from '@/lib/thermo';
import { buildCycleSheet, EMPTY_CYCLE_FORM, switchConvention, type CycleForm } from './cycle-sheet';
import { makeValueSource } from './value-source';
import type { EditionInUse } from './edition-source';

const edition: EditionInUse = { id: 'ed-starter', number: 2, state: 'in_force', values: STARTER_EDITION_VALUES };
const source = makeValueSource(edition);
const form = (patch: Partial<CycleForm>): CycleForm => ({ ...EMPTY_CYCLE_FORM, ...patch });

describe('cycle sheet', () => {
  it('a salt in the edition closes with every value traced to the edition', () => {
    const b = buildCycleSheet(form({ formula: 'CaCl2' }), source);
    expect(b.errors).toEqual([]);
    expect(b.outcome?.kind).toBe('cycle');
    const lattice = b.rows.find((r) => r.key === 'lattice_enthalpy:CaCl2');
    expect(lattice?.origin).toBe('unknown');
    // CaCl2 lattice dissociation enthalpy about 2255-2260 kJ/mol — common textbook range, from memory
    expect(Number(lattice?.valueKj)).toBeGreaterThan(2200);
    expect(Number(lattice?.valueKj)).toBeLessThan(2300);
    for (const r of b.rows.filter((x) => x.origin === 'edition')) {
      expect(b.inputs.some((i) => i.path[2] === r.key && i.origin.type === 'edition')).toBe(true);
    }
  });

  it('the stored request re-solves to the same result with no reference data at all', () => {
    const b = buildCycleSheet(form({ formula: 'KBr', basis: 'enthalpy-corrected' }), source);
    expect(solve(b.request)).toEqual(b.outcome);
  });

  it('an override without a reason is named at its reason field, and the value is kept', () => {
    const key = 'ionization_energy_1:Ca';
    const b = buildCycleSheet(form({ formula: 'CaCl2', entries: { [key]: { value: '590', uncertainty: '', reason: ' ', unit: 'kJ/mol' } } }), source);
    expect(b.errors).toContainEqual({ field: `entries.${key}.reason`, message: expect.stringContaining('reason') });
    expect(b.rows.find((r) => r.key === key)?.origin).toBe('override');
    expect(b.rows.find((r) => r.key === key)?.valueKj).toBe('590');
  });

  it('solving for the electron affinity needs the lattice value, typed in the user unit', () => {
    const eg = 'electron_gain_enthalpy_1:Cl';
    const noLattice = buildCycleSheet(form({ formula: 'KCl', unknown: eg }), source);
    expect(noLattice.outcome).toBeNull();
    expect(noLattice.errors.map((e) => e.field)).toContain('entries.lattice_enthalpy:KCl.value');
    // KCl lattice enthalpy 717 kJ/mol — common textbook value, from memory; 171.37 kcal/mol = 717.0 kJ/mol
    const b = buildCycleSheet(form({ formula: 'KCl', unknown: eg, entries: { 'lattice_enthalpy:KCl': { value: '171.37', uncertainty: '', reason: 'textbook value', unit: 'kcal/mol' } } }), source);
    expect(b.errors).toEqual([]);
    const row = b.rows.find((r) => r.key === eg);
    // first electron-gain enthalpy of Cl about −349 kJ/mol — from memory
    expect(Number(row?.valueKj)).toBeGreaterThan(-380);
    expect(Number(row?.valueKj)).toBeLessThan(-320);
    expect(b.inputs.find((i) => i.path[2] === 'lattice_enthalpy:KCl')?.origin).toEqual({ type: 'entered', note: 'textbook value' });
  });

  it('switching the convention re-signs a typed lattice value so it keeps its meaning', () => {
    const f = form({ formula: 'KCl', unknown: 'electron_gain_enthalpy_1:Cl', entries: { 'lattice_enthalpy:KCl': { value: '717', uncertainty: '', reason: 'r', unit: 'kJ/mol' } } });
    const a = buildCycleSheet(f, source);
    const b = buildCycleSheet(switchConvention(f, 'formation'), source);
    const eg = (x: typeof a) => x.rows.find((r) => r.key === 'electron_gain_enthalpy_1:Cl')?.valueKj;
    expect(eg(b)).toBe(eg(a));
    expect(b.rows.find((r) => r.key === 'lattice_enthalpy:KCl')?.valueKj).toBe('-717');
  });

  it('a formula that is not a binary ionic compound is refused at the formula field', () => {
    for (const bad of ['CH4', 'Ca(NO3)2', 'NaCl2', 'Xx']) {
      const b = buildCycleSheet(form({ formula: bad }), source);
      expect(b.errors[0]?.field).toBe('formula');
      expect(b.outcome).toBeNull();
    }
  });

  it('a step the edition lacks is named at that step', () => {
    const empty = makeValueSource({ ...edition, values: STARTER_EDITION_VALUES.filter((v) => !(v.species === 'Mg' && v.property === 'ionization_energy_2')) });
    const b = buildCycleSheet(form({ formula: 'MgCl2' }), empty);
    expect(b.errors).toContainEqual({ field: 'entries.ionization_energy_2:Mg.value', message: expect.stringContaining('Second ionization energy of Mg') });
  });

  it('the model check runs from edition values and names the circularity for an oxide', () => {
    const b = buildCycleSheet(form({ formula: 'CaO' }), source);
    expect(b.outcome?.kind === 'cycle' && b.outcome.modelCheck?.models.length).toBeGreaterThan(0);
    expect(b.outcome?.kind === 'cycle' && b.outcome.modelCheck?.circularityNote).toBeTruthy();
  });
});
