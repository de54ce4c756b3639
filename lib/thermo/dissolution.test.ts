// Enthalpies of solution at infinite dilution from formation enthalpies, against the published table:
//  [PARKER] CRC Handbook 'Enthalpy of solution of electrolytes' (Parker, NSRDS-NBS 2, 1965), kJ/mol at 25 °C,
//           read at https://zanotowane.pl/1016/4239
//  [CRC-ION] CRC 'Thermodynamic Properties of Aqueous Ions' as transcribed in github.com/CalebBell/chemicals,
//           'chemicals/Electrolytes/CRC Thermodynamic Properties of Aqueous Ions.tsv' (commit 4f55bfe; J/mol)
//  [CRC-TSV] CRC 'Standard Thermodynamic Properties of Chemical Substances', CalebBell/chemicals (commit 3a75b96)
// The CRC values are given to 0.1 kJ/mol without an uncertainty; each is taken with a standard uncertainty
// of 0.05 kJ/mol (half the last digit) — common practice, no source.
import { describe, expect, it } from 'vitest';
import { computeBatchHeat } from './batch-heat';
import { computeEnthalpyOfSolution, type DissolutionInput } from './dissolution';
import { ThermoInputError } from './errors';

const u = '0.05';
const ION = {
  'Li+': { value: '-278.5', uncertainty: u }, // [CRC-ION]
  'Na+': { value: '-240.1', uncertainty: u }, // [CRC-ION]
  'Ca2+': { value: '-542.8', uncertainty: u }, // [CRC-ION]
  'Cl-': { value: '-167.2', uncertainty: u }, // [CRC-ION]
  'Br-': { value: '-121.6', uncertainty: u }, // [CRC-ION]
  'I-': { value: '-55.2', uncertainty: u }, // [CRC-ION]
};
const SOLID = {
  NaCl: '-411.2', // [CRC-TSV]
  NaBr: '-361.1', // [CRC-TSV]
  NaI: '-287.8', // [CRC-TSV]
  LiCl: '-408.6', // [CRC-TSV]
  LiBr: '-351.2', // [CRC-TSV]
  CaCl2: '-795.4', // [CRC-TSV]
};

function salt(formula: keyof typeof SOLID, cation: keyof typeof ION, anion: keyof typeof ION, anions = 1): DissolutionInput {
  return {
    formula,
    enthalpyOfFormation: { value: SOLID[formula], uncertainty: u },
    ions: [
      { species: cation, count: 1, enthalpyOfFormation: ION[cation] },
      { species: anion, count: anions, enthalpyOfFormation: ION[anion] },
    ],
  };
}

describe('enthalpy of solution at infinite dilution (primary route)', () => {
  const table: Array<[DissolutionInput, number]> = [
    [salt('NaCl', 'Na+', 'Cl-'), 3.88], // [PARKER] NaCl 3.88
    [salt('NaBr', 'Na+', 'Br-'), -0.6], // [PARKER] NaBr −0.60
    [salt('NaI', 'Na+', 'I-'), -7.53], // [PARKER] NaI −7.53
    [salt('LiCl', 'Li+', 'Cl-'), -37.03], // [PARKER] LiCl −37.03
    [salt('LiBr', 'Li+', 'Br-'), -48.83], // [PARKER] LiBr −48.83
  ];
  for (const [input, published] of table) {
    it(`${input.formula} agrees with the published table within twice its standard uncertainty`, () => {
      const r = computeEnthalpyOfSolution(input);
      const value = Number(r.enthalpyOfSolution.value);
      const ur = Number(r.enthalpyOfSolution.uncertainty);
      expect(ur).toBeGreaterThan(0);
      expect(Math.abs(value - published)).toBeLessThanOrEqual(2 * ur);
    });
  }

  it('handles a hydrate: the water of crystallisation is released as H2O(l)', () => {
    // LiCl·H2O −19.08 kJ/mol — [PARKER]; ΔfH° LiCl·H2O(cr) −712.6 kJ/mol — from memory (NBS tables);
    // ΔfH° H2O(l) −285.8 — [CRC-TSV]
    const r = computeEnthalpyOfSolution({
      formula: 'LiCl·H2O',
      enthalpyOfFormation: { value: '-712.6', uncertainty: '0.5' },
      ions: [
        { species: 'Li+', count: 1, enthalpyOfFormation: ION['Li+'] },
        { species: 'Cl-', count: 1, enthalpyOfFormation: ION['Cl-'] },
      ],
      waterEnthalpyOfFormation: { value: '-285.8', uncertainty: u },
    });
    expect(Math.abs(Number(r.enthalpyOfSolution.value) - -19.08)).toBeLessThanOrEqual(2 * Number(r.enthalpyOfSolution.uncertainty));
    expect(r.process).toMatch(/H2O\(l\)/);
  });

  it('explains it as lattice + hydration on one scale, reports the difference, and refuses mixed scales', () => {
    const input: DissolutionInput = {
      ...salt('NaCl', 'Na+', 'Cl-'),
      latticeEnthalpy: { value: '787.2', uncertainty: '1' }, // NaCl cycle in outside-checks.test.ts
      hydrationScale: 'absolute',
      ions: [
        // Absolute hydration enthalpies Na⁺ −406, Cl⁻ −367 kJ/mol (ΔhydH(H⁺) = −1091 basis) — from memory
        { species: 'Na+', count: 1, enthalpyOfFormation: ION['Na+'], hydrationEnthalpy: { value: '-406', uncertainty: '5', scale: 'absolute' } },
        { species: 'Cl-', count: 1, enthalpyOfFormation: ION['Cl-'], hydrationEnthalpy: { value: '-367', uncertainty: '5', scale: 'absolute' } },
      ],
    };
    const r = computeEnthalpyOfSolution(input);
    const primary = Number(r.enthalpyOfSolution.value);
    const explained = Number(r.explanation?.enthalpyOfSolution.value);
    expect(explained).toBeCloseTo(787.2 - 406 - 367, 9);
    expect(Number(r.explanation?.difference.value)).toBeCloseTo(primary - explained, 9);
    const mixed = structuredClone(input);
    const second = mixed.ions[1];
    if (second) second.hydrationEnthalpy = { value: '-1458', scale: 'conventional' };
    expect(() => computeEnthalpyOfSolution(mixed)).toThrow(/never mix scales/);
  });

  it('refuses ions that do not make up the salt or do not balance', () => {
    const wrong = salt('NaCl', 'Na+', 'Br-');
    expect(() => computeEnthalpyOfSolution(wrong)).toThrow(ThermoInputError);
    const unbalanced = salt('CaCl2', 'Ca2+', 'Cl-', 1);
    expect(() => computeEnthalpyOfSolution(unbalanced)).toThrow(/charges add up/);
  });
});

describe('batch heat', () => {
  const cacl2 = salt('CaCl2', 'Ca2+', 'Cl-', 2);

  it('an exothermic salt heats the batch; the default heat capacity is water only, which overstates the rise', () => {
    const r = computeBatchHeat({ formula: 'CaCl2', dissolution: cacl2, saltMassKg: 100, waterMassKg: 400, startTemperatureC: 20 });
    const dsol = Number(r.enthalpyOfSolution.value); // −81.5 from CRC ΔfH values
    const n = (100 * 1000) / Number(r.molarMass);
    expect(Number(r.heatReleasedKj.value)).toBeCloseTo(-n * dsol, 6);
    expect(Number(r.heatReleasedKwh)).toBeCloseTo((-n * dsol) / 3600, 9);
    // ΔT = Q / (m_water · 4.184 J/(g·K)) — 4.184 J/(g·K) for water, common practice, no source
    expect(Number(r.temperatureChangeK.value)).toBeCloseTo((-n * dsol * 1000) / (400_000 * 4.184), 6);
    expect(r.heatCapacityAssumption).toMatch(/overstates/);
    const wholeSolution = computeBatchHeat({
      formula: 'CaCl2', dissolution: cacl2, saltMassKg: 100, waterMassKg: 400, startTemperatureC: 20,
      heatCapacity: { value: '4.184', appliesTo: 'solution' },
    });
    expect(Number(wholeSolution.temperatureChangeK.value)).toBeLessThan(Number(r.temperatureChangeK.value));
    expect(r.cautions.join(' ')).toMatch(/upper bound/);
    expect(r.cautions.join(' ')).toMatch(/Brines boil above 100/);
    expect(r.cautions.join(' ')).toMatch(/process-safety/);
  });

  it('warns before boiling and says when the estimate reaches boiling', () => {
    // −81.5 kJ/mol: a round figure near the CaCl2 value computed above from CRC data (inputs only)
    const near = computeBatchHeat({ formula: 'CaCl2', enthalpyOfSolution: '-81.5', saltMassKg: 100, waterMassKg: 400, startTemperatureC: 80 });
    expect(Number(near.finalTemperatureC.value)).toBeGreaterThan(90);
    const boil = computeBatchHeat({ formula: 'CaCl2', enthalpyOfSolution: '-81.5', saltMassKg: 300, waterMassKg: 400, startTemperatureC: 60 });
    expect(boil.reachesBoiling).toBe(true);
    expect(boil.warnings.join(' ')).toMatch(/boiling/);
    expect(near.reachesBoiling || near.nearBoiling).toBe(true);
  });

  it('an endothermic salt cools the batch', () => {
    const r = computeBatchHeat({ formula: 'NaCl', dissolution: salt('NaCl', 'Na+', 'Cl-'), saltMassKg: 50, waterMassKg: 200, startTemperatureC: 15 });
    expect(r.exothermic).toBe(false);
    expect(Number(r.temperatureChangeK.value)).toBeLessThan(0);
    expect(r.warnings.join(' ')).toMatch(/cools/);
  });

  it('adds the hydrogen fluoride caution for fluoride salts', () => {
    // LiF 4.73 kJ/mol — [PARKER]
    const r = computeBatchHeat({ formula: 'LiF', enthalpyOfSolution: '4.73', saltMassKg: 1, waterMassKg: 100, startTemperatureC: 20 });
    expect(r.cautions.join(' ')).toMatch(/hydrogen fluoride/);
  });

  it('refuses negative masses and temperatures below absolute zero, naming the field', () => {
    const field = (fn: () => unknown): string => {
      try {
        fn();
      } catch (e) {
        return (e as ThermoInputError).field;
      }
      return '';
    };
    expect(field(() => computeBatchHeat({ formula: 'CaCl2', enthalpyOfSolution: '-81.5', saltMassKg: -1, waterMassKg: 1, startTemperatureC: 20 }))).toBe('saltMassKg');
    expect(field(() => computeBatchHeat({ formula: 'CaCl2', enthalpyOfSolution: '-81.5', saltMassKg: 1, waterMassKg: 1, startTemperatureC: -300 }))).toBe('startTemperatureC');
    expect(field(() => computeBatchHeat({ formula: 'CaCl2', enthalpyOfSolution: 'abc', saltMassKg: 1, waterMassKg: 1, startTemperatureC: 20 }))).toBe('enthalpyOfSolution');
  });
});
