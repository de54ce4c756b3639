import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import * as engine from './index';
import { ENGINE_VERSION, safeSolve, solve, solveRequestSchema, ThermoInputError } from './index';

// CaCl2 inputs: ΔfH, Ca(g) — CRC 'Standard Thermodynamic Properties of Chemical Substances' (CalebBell/chemicals
// commit 3a75b96); IE1, IE2 — 'Principles of General Chemistry' Appendix J; EA of Cl — LibreTexts 'A7: Electron Affinities'.
const cycleRequest = {
  kind: 'cycle',
  problem: {
    formula: 'CaCl2',
    values: {
      'enthalpy_of_formation:CaCl2': { value: '-795.4' },
      'enthalpy_of_atomization:Ca': { value: 177.8 },
      'ionization_energy_1:Ca': { value: '589.8' },
      'ionization_energy_2:Ca': { value: '1145.4' },
      'bond_dissociation_enthalpy:Cl2': { value: '242.6' },
      'electron_gain_enthalpy_1:Cl': { value: '-348.575', uncertainty: '0.003' },
    },
    convention: 'formation',
    model: { structure: 'calcium chloride', cationRadiusPm: 100, anionRadiusPm: 181, density: 2.15 },
  },
};

describe('solve()', () => {
  it('returns JSON-serialisable results with decimal values as strings and the engine version', () => {
    const r = solve(cycleRequest);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    const json = JSON.parse(JSON.stringify(r));
    expect(json).toEqual(r);
    if (r.kind !== 'cycle') throw new Error('wrong kind');
    expect(typeof r.result.latticeEnthalpy.value).toBe('string');
    expect(Number(r.result.latticeEnthalpy.value)).toBeLessThan(0); // formation convention
    expect(r.result.convention.code).toBe('formation');
    expect(r.modelCheck?.models.length).toBeGreaterThan(0);
    expect(r.modelCheck?.cycleLatticeEnthalpy).toBeGreaterThan(0);
  });

  it('solves dissolution with a batch, reaction and calorimetry requests', () => {
    const dissolution = solve({
      kind: 'dissolution',
      problem: {
        formula: 'CaCl2',
        enthalpyOfFormation: '-795.4', // CRC-TSV (see dissolution.test.ts)
        ions: [
          { species: 'Ca2+', count: 1, enthalpyOfFormation: '-542.8' }, // CRC aqueous ions (CalebBell/chemicals)
          { species: 'Cl-', count: 2, enthalpyOfFormation: '-167.2' },
        ],
      },
      batch: { saltMassKg: '250', waterMassKg: 1000, startTemperatureC: 25 },
    });
    if (dissolution.kind !== 'dissolution') throw new Error('wrong kind');
    expect(dissolution.batchHeat?.exothermic).toBe(true);
    const reaction = solve({ kind: 'reaction', problem: { reaction: 'CaO(cr) + 2 H+(aq) -> Ca2+(aq) + H2O(l)', enthalpiesOfFormation: { 'CaO(cr)': -634.9, 'Ca2+(aq)': -542.8, 'H2O(l)': -285.8 } } });
    expect(reaction.kind).toBe('reaction');
    const calorimetry = solve({
      kind: 'calorimetry',
      problem: { sampleMassG: 5, waterMassG: 100, temperatures: { beforeC: 20, afterC: 22 }, candidates: [{ formula: 'LiBr', predictedEnthalpyOfSolution: -48.83 }] },
    });
    expect(calorimetry.kind).toBe('calorimetry');
  });

  it('a malformed payload is a ZodError naming the field', () => {
    try {
      solve({ kind: 'dissolution', problem: { formula: 'CaCl2', enthalpyOfFormation: 'NaN', ions: [] }, batch: { saltMassKg: -3, waterMassKg: 1, startTemperatureC: 20 } });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ZodError);
      const paths = (e as ZodError).issues.map((i) => i.path.join('.'));
      expect(paths).toContain('problem.enthalpyOfFormation');
      expect(paths).toContain('batch.saltMassKg');
    }
    expect(solveRequestSchema.safeParse({ kind: 'heat', problem: {} }).success).toBe(false);
    expect(solveRequestSchema.safeParse({ ...cycleRequest, problem: { ...cycleRequest.problem, cationCharge: 9 } }).success).toBe(false);
  });

  it('well-formed but impossible input is a ThermoInputError, and safeSolve returns it with the field', () => {
    expect(() => solve({ kind: 'cycle', problem: { formula: 'Na2O2' } })).toThrow(ThermoInputError);
    const r = safeSolve({ kind: 'cycle', problem: { formula: 'NaCl', values: { 'ionization_energy_9:Na': { value: 1 } } } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]?.field).toBe('values.ionization_energy_9:Na');
    const z = safeSolve({ kind: 'calorimetry', problem: { sampleMassG: 0, waterMassG: 1, candidates: [] } });
    expect(z.ok).toBe(false);
    if (!z.ok) expect(z.errors.map((e) => e.field)).toContain('problem.sampleMassG');
  });

  it('the public index exports every entry point', () => {
    for (const name of ['buildBornHaberCycle', 'solveBornHaberCycle', 'runModelCheck', 'computeEnthalpyOfSolution', 'computeBatchHeat', 'computeReactionEnthalpy', 'reduceCalorimetryRun', 'convertEnergy', 'parseFormula', 'molarMass', 'cycleProblemSchema', 'batchHeatProblemSchema', 'reactionProblemSchema', 'calorimetryProblemSchema']) {
      expect(typeof (engine as Record<string, unknown>)[name]).not.toBe('undefined');
    }
  });
});
