import { describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '@/db/seed/starter-edition';
import { solve } from '@/lib/thermo';
import { buildCalorimetrySheet, candidateForms, EMPTY_CALORIMETRY_FORM, parseReadings } from './calorimetry-sheet';
import { buildDissolutionSheet, EMPTY_DISSOLUTION_FORM } from './dissolution-sheet';
import { buildReactionSheet, EMPTY_REACTION_FORM } from './reaction-sheet';
import { makeValueSource } from './value-source';

const source = makeValueSource({ id: 'ed', number: 2, state: 'in_force', values: STARTER_EDITION_VALUES });

describe('dissolution sheet', () => {
  it('CaCl2 dissolves exothermically; the batch heat carries the cautions and the stored request re-solves', () => {
    const b = buildDissolutionSheet({ ...EMPTY_DISSOLUTION_FORM, formula: 'CaCl2' }, source);
    expect(b.errors).toEqual([]);
    if (b.outcome?.kind !== 'dissolution') throw new Error('not solved');
    // CaCl2 enthalpy of solution about −81 kJ/mol at infinite dilution — from memory
    expect(Number(b.outcome.result.enthalpyOfSolution.value)).toBeLessThan(-60);
    expect(b.outcome.result.explanation).not.toBeNull();
    expect(b.outcome.batchHeat?.cautions.join(' ')).toContain('upper bound');
    expect(solve(b.request)).toEqual(b.outcome);
  });

  it('a hydrate uses water of crystallisation and skips the lattice decomposition', () => {
    const b = buildDissolutionSheet({ ...EMPTY_DISSOLUTION_FORM, formula: 'CaCl2.6H2O', withBatch: false }, source);
    expect(b.errors).toEqual([]);
    expect(b.outcome?.kind === 'dissolution' && b.outcome.result.explanation).toBeNull();
  });

  it('a bad batch mass is named at its field', () => {
    const b = buildDissolutionSheet({ ...EMPTY_DISSOLUTION_FORM, formula: 'LiCl', waterMassKg: '0' }, source);
    expect(b.errors.map((e) => e.field)).toContain('waterMassKg');
  });
});

describe('reaction sheet', () => {
  it('an unbalanced reaction is refused naming the element', () => {
    const b = buildReactionSheet({ ...EMPTY_REACTION_FORM, reaction: 'CaO(cr) + HCl(aq) -> CaCl2(aq) + H2O(l)' }, source);
    expect(b.outcome).toBeNull();
    expect(b.errors[0]?.field).toBe('reaction');
    expect(b.errors[0]?.message).toMatch(/\bCl\b|\bH\b/);
  });

  it('a balanced reaction solves from the edition, an aqueous salt as the sum of its ions', () => {
    const b = buildReactionSheet({ ...EMPTY_REACTION_FORM, reaction: 'CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)', batchSpecies: 'CaO(cr)', batchMassKg: '250' }, source);
    expect(b.errors).toEqual([]);
    // CaO + 2 HCl(aq): about −193 kJ/mol — from memory (−634.9 −2(−167.2) vs −877.1 − 285.8)
    expect(b.outcome?.kind === 'reaction' && Number(b.outcome.result.reactionEnthalpy.value)).toBeLessThan(-150);
    expect(solve(b.request)).toEqual(b.outcome);
  });
});

describe('calorimetry sheet', () => {
  it('finds the hydrates of a salt in the edition', () => {
    expect(candidateForms('CaCl2', STARTER_EDITION_VALUES)).toEqual(expect.arrayContaining(['CaCl2', 'CaCl2·6H2O']));
  });

  it('names the hexahydrate for an endothermic run', () => {
    // 0.05 mol of CaCl2·6H2O (219.07 g/mol) in 100 g water; a 1.50 K drop over (110.95 g × 4.184 J/(g·K))
    // is +13.9 kJ/mol — an invented run, not a measurement
    const b = buildCalorimetrySheet({ ...EMPTY_CALORIMETRY_FORM, salt: 'CaCl2', sampleMassG: '10.954', waterMassG: '100', beforeC: '25.00', afterC: '23.50' }, source);
    expect(b.errors).toEqual([]);
    expect(b.outcome?.kind === 'calorimetry' && b.outcome.result.bestMatch?.formula).toBe('CaCl2·6H2O');
  });

  it('reads time,temperature lines and names a bad line', () => {
    expect(parseReadings('t,T\n0, 25.0\n30 25.01\n').readings).toHaveLength(2);
    expect(parseReadings('0,25\nabc def ghi\n').badLine).toBe(null);
    expect(parseReadings('0,25\n30;x\n').badLine).toBe(2);
  });
});
