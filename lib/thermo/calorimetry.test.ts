import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { reduceCalorimetryRun, type CalorimetryInput } from './calorimetry';
import { ThermoInputError } from './errors';
import { molarMass } from './formula';

// Predicted enthalpies of solution at infinite dilution (kJ/mol): LiBr −48.83, LiBr·H2O −23.26,
// LiBr·2H2O −9.41 — CRC 'Enthalpy of solution of electrolytes' (Parker 1965), read at https://zanotowane.pl/1016/4239
const CANDIDATES = [
  { formula: 'LiBr', predictedEnthalpyOfSolution: '-48.83' },
  { formula: 'LiBr·H2O', predictedEnthalpyOfSolution: '-23.26' },
  { formula: 'LiBr·2H2O', predictedEnthalpyOfSolution: '-9.41' },
];

/** Temperature rise a sample of `form` with enthalpy of solution `dsol` gives in the calorimeter. */
function riseFor(form: string, dsol: number, sampleG: number, waterG: number, calorimeterJPerK: number): number {
  const n = sampleG / molarMass(form).toNumber();
  return (-n * dsol * 1000) / ((waterG + sampleG) * 4.184 + calorimeterJPerK);
}

describe('calorimetry reduction', () => {
  it('names the hydrate a lot really is, how far off it is, and whether that is within tolerance', () => {
    const rise = riseFor('LiBr·H2O', -23.26, 5, 100, 40);
    const r = reduceCalorimetryRun({
      sampleMassG: 5, waterMassG: 100, calorimeterConstant: { value: 40, uncertainty: 2 },
      temperatures: { beforeC: 21.0, afterC: 21.0 + rise }, temperatureUncertaintyK: 0.005,
      candidates: CANDIDATES,
    });
    expect(r.bestMatch?.formula).toBe('LiBr·H2O');
    expect(Math.abs(Number(r.bestMatch?.differenceKjPerMol))).toBeLessThan(1e-6);
    expect(r.bestMatch?.withinTolerance).toBe(true);
    expect(r.candidates.find((c) => c.formula === 'LiBr')?.withinTolerance).toBe(false);
    expect(Number(r.candidates[0]?.measuredEnthalpyOfSolution.uncertainty)).toBeGreaterThan(0);
    expect(r.toleranceKjPerMol).toBe('3');
  });

  it('a tighter caller tolerance turns a near miss into outside tolerance', () => {
    const rise = riseFor('LiBr', -46.5, 2, 100, 0);
    const input: CalorimetryInput = { sampleMassG: 2, waterMassG: 100, temperatures: { beforeC: 20, afterC: 20 + rise }, candidates: CANDIDATES };
    expect(reduceCalorimetryRun(input).bestMatch?.withinTolerance).toBe(true);
    expect(reduceCalorimetryRun({ ...input, toleranceKjPerMol: '1' }).bestMatch?.withinTolerance).toBe(false);
  });

  it('extrapolating fore- and after-period drift lines to the mixing time recovers the jump', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -0.01, max: 0.01, noNaN: true }),
        fc.double({ min: -0.01, max: 0.01, noNaN: true }),
        fc.double({ min: 0.2, max: 5, noNaN: true }),
        (foreSlope, afterSlope, jump) => {
          const mix = 300;
          const readings = [];
          for (let t = 0; t < mix; t += 30) readings.push({ timeS: t, temperatureC: 20 + foreSlope * t });
          // the reaction period between 300 and 420 s is ignored by the fit
          for (let t = 330; t < 420; t += 30) readings.push({ timeS: t, temperatureC: 20 + jump * 0.7 });
          for (let t = 420; t <= 900; t += 30) readings.push({ timeS: t, temperatureC: 20 + foreSlope * mix + jump + afterSlope * (t - mix) });
          const r = reduceCalorimetryRun({
            sampleMassG: 1, waterMassG: 100, readings, mixingTimeS: mix, afterPeriodStartS: 420,
            candidates: [{ formula: 'LiBr', predictedEnthalpyOfSolution: '-48.83' }],
          });
          expect(Number(r.temperatureChangeK.value)).toBeCloseTo(jump, 9);
        },
      ),
      { numRuns: 50 },
    );
  });

  it('refuses too few readings, temperatures below absolute zero and a missing candidate list', () => {
    const base: CalorimetryInput = { sampleMassG: 1, waterMassG: 100, temperatures: { beforeC: 20, afterC: 21 }, candidates: CANDIDATES };
    const code = (input: CalorimetryInput): string => {
      try {
        reduceCalorimetryRun(input);
      } catch (e) {
        return `${(e as ThermoInputError).code}:${(e as ThermoInputError).field}`;
      }
      return 'ok';
    };
    expect(code({ ...base, temperatures: undefined, readings: [{ timeS: 0, temperatureC: 20 }], mixingTimeS: 10, afterPeriodStartS: 20 })).toBe('not_enough_readings:readings');
    expect(code({ ...base, temperatures: { beforeC: -280, afterC: 20 } })).toBe('out_of_range:temperatures.beforeC');
    expect(code({ ...base, candidates: [] })).toBe('missing_values:candidates');
    expect(code({ ...base, sampleMassG: -1 })).toBe('out_of_range:sampleMassG');
  });
});
