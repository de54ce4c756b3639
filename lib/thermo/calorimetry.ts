// Solution-calorimetry reduction: temperature change (single pair, or fore/after-period drift lines
// extrapolated to the time of mixing), heat from the heat-capacity basis plus calorimeter constant,
// then the molar enthalpy of solution for each candidate form of the salt and the best match.
import { ABSOLUTE_ZERO_CELSIUS } from './constants';
import { Dec, toDec, toDecNonNegative, toDecPositive, toUncertainty } from './decimal';
import { ThermoInputError } from './errors';
import { molarMass, parseFormula } from './formula';
import { roundWithUncertainty, type RoundedValue } from './uncertainty';
import { resolveValue, type ValueInput } from './values';

export const DEFAULT_MATCH_TOLERANCE_KJ = new Dec(3); // kJ/mol — product default, caller-settable

export interface TemperatureReading {
  timeS: number | string;
  temperatureC: number | string;
}

export interface CalorimetryInput {
  sampleMassG: number | string;
  sampleMassUncertaintyG?: number | string | null;
  waterMassG: number | string;
  /** Heat-capacity basis: the solution (water + sample, default) or the water alone. */
  heatCapacityBasis?: 'solution' | 'water';
  /** J/(g·K); default 4.184. */
  specificHeat?: number | string;
  /** Calorimeter constant (J/K), default 0. */
  calorimeterConstant?: ValueInput | number | string;
  /** Either a before/after pair ... */
  temperatures?: { beforeC: number | string; afterC: number | string };
  /** ... or readings over time with the mixing time and the start of the after-period. */
  readings?: TemperatureReading[];
  mixingTimeS?: number | string;
  afterPeriodStartS?: number | string;
  /** Standard uncertainty of one temperature reading (K). */
  temperatureUncertaintyK?: number | string | null;
  candidates: Array<{ formula: string; predictedEnthalpyOfSolution: ValueInput | number | string }>;
  toleranceKjPerMol?: number | string;
}

export interface LineFit {
  slope: string;
  intercept: string;
  points: number;
}

function fitLine(points: Array<{ t: Dec; y: Dec }>): { slope: Dec; intercept: Dec } {
  const n = new Dec(points.length);
  let st = new Dec(0);
  let sy = new Dec(0);
  for (const p of points) {
    st = st.plus(p.t);
    sy = sy.plus(p.y);
  }
  const mt = st.div(n);
  const my = sy.div(n);
  let sxx = new Dec(0);
  let sxy = new Dec(0);
  for (const p of points) {
    sxx = sxx.plus(p.t.minus(mt).pow(2));
    sxy = sxy.plus(p.t.minus(mt).times(p.y.minus(my)));
  }
  const slope = sxx.isZero() ? new Dec(0) : sxy.div(sxx);
  return { slope, intercept: my.minus(slope.times(mt)) };
}

export interface CalorimetryResult {
  method: string;
  temperatureChangeK: RoundedValue;
  extrapolation: null | { mixingTimeS: string; foreperiod: LineFit; afterperiod: LineFit; beforeAtMixingC: string; afterAtMixingC: string };
  heatCapacityJPerK: string;
  heatCapacityBasis: string;
  /** Heat released by the dissolution into the calorimeter (J); positive = exothermic. */
  heatReleasedJ: RoundedValue;
  candidates: Array<{
    formula: string;
    molarMass: string;
    amountMol: string;
    measuredEnthalpyOfSolution: RoundedValue;
    predictedEnthalpyOfSolution: string;
    differenceKjPerMol: string;
    withinTolerance: boolean;
  }>;
  bestMatch: null | { formula: string; differenceKjPerMol: string; withinTolerance: boolean; text: string };
  toleranceKjPerMol: string;
  notes: string[];
}

export function reduceCalorimetryRun(input: CalorimetryInput): CalorimetryResult {
  const sample = toDecPositive(input.sampleMassG, 'sampleMassG');
  const uSample = toUncertainty(input.sampleMassUncertaintyG, 'sampleMassUncertaintyG');
  const water = toDecPositive(input.waterMassG, 'waterMassG');
  const cp = input.specificHeat === undefined ? new Dec('4.184') : toDecPositive(input.specificHeat, 'specificHeat');
  const basis = input.heatCapacityBasis ?? 'solution';
  if (basis !== 'solution' && basis !== 'water') {
    throw new ThermoInputError('out_of_range', 'heatCapacityBasis', 'heatCapacityBasis must be "solution" or "water".');
  }
  const calConst = input.calorimeterConstant === undefined ? { value: new Dec(0), uncertainty: null, source: null } : resolveValue(input.calorimeterConstant, 'calorimeterConstant');
  if (calConst.value.isNegative()) throw new ThermoInputError('out_of_range', 'calorimeterConstant.value', 'The calorimeter constant cannot be negative.');
  const uT = toUncertainty(input.temperatureUncertaintyK, 'temperatureUncertaintyK');
  const tolerance = input.toleranceKjPerMol === undefined ? DEFAULT_MATCH_TOLERANCE_KJ : toDecNonNegative(input.toleranceKjPerMol, 'toleranceKjPerMol');
  const checkT = (t: Dec, field: string): Dec => {
    if (t.lte(ABSOLUTE_ZERO_CELSIUS)) throw new ThermoInputError('out_of_range', field, `${field} is at or below absolute zero (−273.15 °C).`);
    return t;
  };

  let dT: Dec;
  let method: string;
  let extrapolation: CalorimetryResult['extrapolation'] = null;
  if (input.readings !== undefined) {
    if (!Array.isArray(input.readings)) throw new ThermoInputError('out_of_range', 'readings', 'readings must be a list.');
    const mix = toDec(input.mixingTimeS, 'mixingTimeS');
    const afterStart = toDec(input.afterPeriodStartS, 'afterPeriodStartS');
    if (afterStart.lt(mix)) throw new ThermoInputError('out_of_range', 'afterPeriodStartS', 'The after-period must start at or after the mixing time.');
    const pts = input.readings.map((r, i) => ({
      t: toDec(r.timeS, `readings[${i}].timeS`),
      y: checkT(toDec(r.temperatureC, `readings[${i}].temperatureC`), `readings[${i}].temperatureC`),
    }));
    const fore = pts.filter((p) => p.t.lt(mix));
    const after = pts.filter((p) => p.t.gte(afterStart));
    if (fore.length < 2) throw new ThermoInputError('not_enough_readings', 'readings', 'Need at least two readings before the mixing time for the fore-period line.');
    if (after.length < 2) throw new ThermoInputError('not_enough_readings', 'readings', 'Need at least two readings in the after-period for its line.');
    const f = fitLine(fore);
    const a = fitLine(after);
    const before = f.intercept.plus(f.slope.times(mix));
    const afterAt = a.intercept.plus(a.slope.times(mix));
    dT = afterAt.minus(before);
    method = 'Fore- and after-period drift lines (least squares) both extrapolated to the time of mixing; ΔT is their difference there.';
    extrapolation = {
      mixingTimeS: mix.toString(),
      foreperiod: { slope: f.slope.toString(), intercept: f.intercept.toString(), points: fore.length },
      afterperiod: { slope: a.slope.toString(), intercept: a.intercept.toString(), points: after.length },
      beforeAtMixingC: before.toString(),
      afterAtMixingC: afterAt.toString(),
    };
  } else if (input.temperatures !== undefined) {
    const before = checkT(toDec(input.temperatures.beforeC, 'temperatures.beforeC'), 'temperatures.beforeC');
    const afterT = checkT(toDec(input.temperatures.afterC, 'temperatures.afterC'), 'temperatures.afterC');
    dT = afterT.minus(before);
    method = 'Single before/after temperature pair (no drift correction).';
  } else {
    throw new ThermoInputError('missing_values', 'temperatures', 'Give a before/after temperature pair or readings over time.');
  }
  if (dT.isZero()) throw new ThermoInputError('out_of_range', 'temperatures', 'The temperature did not change, so no heat can be measured.');
  const uDT = uT === null ? null : uT.times(new Dec(2).sqrt());
  const massBasis = basis === 'solution' ? water.plus(sample) : water;
  const heatCapacity = massBasis.times(cp).plus(calConst.value);
  const q = heatCapacity.times(dT); // J released by the dissolution (solution warms → positive)
  // Relative standard uncertainty of q from ΔT and the calorimeter constant (uncorrelated).
  let relQ2 = new Dec(0);
  let anyU = false;
  if (uDT !== null) {
    relQ2 = relQ2.plus(uDT.div(dT).pow(2));
    anyU = true;
  }
  if (calConst.uncertainty !== null) {
    relQ2 = relQ2.plus(calConst.uncertainty.div(heatCapacity).pow(2));
    anyU = true;
  }
  const uq = anyU ? q.abs().times(relQ2.sqrt()) : null;
  if (!Array.isArray(input.candidates) || input.candidates.length === 0) {
    throw new ThermoInputError('missing_values', 'candidates', 'List at least one candidate form of the salt (anhydrous or a hydrate).');
  }
  const candidates = input.candidates.map((c, i) => {
    const parsed = parseFormula(c.formula, `candidates[${i}].formula`);
    const mm = molarMass(parsed);
    const predicted = resolveValue(c.predictedEnthalpyOfSolution, `candidates[${i}].predictedEnthalpyOfSolution`);
    const n = sample.div(mm);
    const measured = q.negated().div(n).div(1000); // kJ/mol
    let rel2 = anyU ? relQ2 : new Dec(0);
    if (uSample !== null) rel2 = rel2.plus(uSample.div(sample).pow(2));
    const um = anyU || uSample !== null ? measured.abs().times(rel2.sqrt()) : null;
    const diff = measured.minus(predicted.value);
    return {
      formula: parsed.text,
      molarMass: mm.toString(),
      amountMol: n.toString(),
      measuredEnthalpyOfSolution: roundWithUncertainty(measured, um),
      predictedEnthalpyOfSolution: predicted.value.toString(),
      differenceKjPerMol: diff.toString(),
      withinTolerance: diff.abs().lte(tolerance),
      absDiff: diff.abs(),
    };
  });
  const best = [...candidates].sort((x, y) => x.absDiff.comparedTo(y.absDiff))[0];
  const bestMatch = best
    ? {
        formula: best.formula,
        differenceKjPerMol: best.differenceKjPerMol,
        withinTolerance: best.withinTolerance,
        text: `${best.formula} matches best: measured ${best.measuredEnthalpyOfSolution.text} kJ/mol against ${best.predictedEnthalpyOfSolution} predicted (off by ${best.absDiff.toDecimalPlaces(2).toString()} kJ/mol, ${best.withinTolerance ? 'within' : 'outside'} the ±${tolerance.toString()} kJ/mol tolerance).`,
      }
    : null;
  return {
    method,
    temperatureChangeK: roundWithUncertainty(dT, uDT),
    extrapolation,
    heatCapacityJPerK: heatCapacity.toString(),
    heatCapacityBasis:
      basis === 'solution'
        ? `(water + sample) × ${cp.toString()} J/(g·K) + calorimeter constant ${calConst.value.toString()} J/K`
        : `water × ${cp.toString()} J/(g·K) + calorimeter constant ${calConst.value.toString()} J/K`,
    heatReleasedJ: roundWithUncertainty(q, uq),
    candidates: candidates.map(({ absDiff: _absDiff, ...rest }) => rest),
    bestMatch,
    toleranceKjPerMol: tolerance.toString(),
    notes: [
      'A calorimetry run measures a finite-dilution (integral) heat of solution; predicted values are at infinite dilution, so allow a few kJ/mol.',
    ],
  };
}
