// Dissolver batch heat: heat released by dissolving a salt batch and the adiabatic temperature change.
// Exact decimal arithmetic. The default heat capacity overstates the rise on purpose (see below).
import { ABSOLUTE_ZERO_CELSIUS, JOULES_PER_KWH } from './constants';
import { Dec, toDec, toDecNonNegative, toDecPositive } from './decimal';
import { computeEnthalpyOfSolution, type DissolutionInput } from './dissolution';
import { ThermoInputError } from './errors';
import { molarMass, parseFormula } from './formula';
import { roundWithUncertainty, type RoundedValue } from './uncertainty';
import { resolveValue, type ValueInput } from './values';

export const DEFAULT_SPECIFIC_HEAT = new Dec('4.184'); // J/(g·K), water near 25 °C
export const BOILING_POINT_WATER_C = new Dec(100); // at 1 atm
export const BOILING_WARNING_MARGIN_K = new Dec(10);

export interface BatchHeatInput {
  /** Salt form charged to the dissolver, e.g. `CaCl2` or `CaCl2·2H2O`. */
  formula: string;
  /** Enthalpy of solution of that form (kJ/mol), or the data to compute it (primary route). */
  enthalpyOfSolution?: ValueInput | number | string;
  dissolution?: DissolutionInput;
  saltMassKg: number | string;
  waterMassKg: number | string;
  startTemperatureC: number | string;
  /** Specific heat in J/(g·K) and the mass it applies to; default 4.184 on the water only. */
  heatCapacity?: { value: number | string; appliesTo: 'water' | 'solution' };
}

export const BATCH_CAUTIONS = [
  'This is an estimate.',
  'The adiabatic temperature rise is an upper bound for a well-mixed batch; local hot spots can still be hotter where solid meets water.',
  'Real batches are far from infinite dilution: integral heats of solution differ from the value used here.',
  'Brines boil above 100 °C.',
  "Follow the site's process-safety procedures, local codes and licensed practice.",
];
export const FLUORIDE_CAUTION =
  'Fluoride salts: hydrogen fluoride can form in acid — a serious hazard. Keep acids away and follow the site’s HF procedures.';

export interface BatchHeatResult {
  formula: string;
  molarMass: string;
  amountMol: string;
  enthalpyOfSolution: RoundedValue;
  /** Positive = released to the batch (exothermic); negative = absorbed (the batch cools). */
  heatReleasedKj: RoundedValue;
  heatReleasedKwh: string;
  exothermic: boolean;
  heatCapacityAssumption: string;
  heatCapacityMassKg: string;
  specificHeat: string;
  temperatureChangeK: RoundedValue;
  finalTemperatureC: RoundedValue;
  reachesBoiling: boolean;
  nearBoiling: boolean;
  warnings: string[];
  cautions: string[];
}

export function computeBatchHeat(input: BatchHeatInput): BatchHeatResult {
  const parsed = parseFormula(input.formula, 'formula');
  const saltKg = toDecNonNegative(input.saltMassKg, 'saltMassKg');
  const waterKg = toDecPositive(input.waterMassKg, 'waterMassKg');
  const start = toDec(input.startTemperatureC, 'startTemperatureC');
  if (start.lte(ABSOLUTE_ZERO_CELSIUS)) {
    throw new ThermoInputError('out_of_range', 'startTemperatureC', 'The starting temperature is at or below absolute zero (−273.15 °C).');
  }
  let dsol: { value: Dec; uncertainty: Dec | null };
  if (input.enthalpyOfSolution !== undefined) {
    dsol = resolveValue(input.enthalpyOfSolution, 'enthalpyOfSolution');
  } else if (input.dissolution !== undefined) {
    const d = computeEnthalpyOfSolution(input.dissolution);
    dsol = { value: new Dec(d.enthalpyOfSolution.value), uncertainty: d.enthalpyOfSolution.uncertainty === null ? null : new Dec(d.enthalpyOfSolution.uncertainty) };
  } else {
    throw new ThermoInputError('missing_values', 'enthalpyOfSolution', 'Give the enthalpy of solution or the data to compute it.');
  }
  const mm = molarMass(parsed);
  const amount = saltKg.times(1000).div(mm);
  // Heat released to the batch: −n·ΔsolH (kJ).
  const q = amount.times(dsol.value).negated();
  const uq = dsol.uncertainty === null ? null : amount.times(dsol.uncertainty);
  let cp = DEFAULT_SPECIFIC_HEAT;
  let basisKg = waterKg;
  let assumption =
    'Default: 4.184 J/(g·K) applied to the water mass only — the salt, the water of crystallisation and the vessel are ignored, which overstates the temperature change.';
  if (input.heatCapacity !== undefined) {
    cp = toDecPositive(input.heatCapacity.value, 'heatCapacity.value');
    if (input.heatCapacity.appliesTo === 'solution') {
      basisKg = waterKg.plus(saltKg);
      assumption = `User value: ${cp.toString()} J/(g·K) applied to the whole solution (water + salt); the vessel is ignored.`;
    } else if (input.heatCapacity.appliesTo === 'water') {
      assumption = `User value: ${cp.toString()} J/(g·K) applied to the water mass only; salt and vessel are ignored.`;
    } else {
      throw new ThermoInputError('out_of_range', 'heatCapacity.appliesTo', 'heatCapacity.appliesTo must be "water" or "solution".');
    }
  }
  const heatCapacityJPerK = basisKg.times(1000).times(cp);
  const dT = q.times(1000).div(heatCapacityJPerK);
  const udT = uq === null ? null : uq.times(1000).div(heatCapacityJPerK);
  const final = start.plus(dT);
  const reachesBoiling = final.gte(BOILING_POINT_WATER_C);
  const nearBoiling = !reachesBoiling && final.gte(BOILING_POINT_WATER_C.minus(BOILING_WARNING_MARGIN_K));
  const warnings: string[] = [];
  if (reachesBoiling) {
    warnings.push(`The adiabatic final temperature (${final.toDecimalPlaces(1).toString()} °C) reaches the boiling point of water at 1 atm: boiling and spattering are possible. Brines boil above 100 °C, but do not rely on that margin.`);
  } else if (nearBoiling) {
    warnings.push(`The adiabatic final temperature (${final.toDecimalPlaces(1).toString()} °C) is within ${BOILING_WARNING_MARGIN_K.toString()} K of boiling at 1 atm.`);
  }
  if (q.isNegative()) {
    warnings.push('Dissolving this salt absorbs heat: the batch cools.');
    if (final.lt(0)) warnings.push('The estimate falls below 0 °C: ice or salt hydrates may crystallise and the estimate no longer applies.');
  }
  const cautions = [...BATCH_CAUTIONS];
  if ((parsed.elements.F ?? 0) > 0) cautions.push(FLUORIDE_CAUTION);
  return {
    formula: parsed.text,
    molarMass: mm.toString(),
    amountMol: amount.toString(),
    enthalpyOfSolution: roundWithUncertainty(dsol.value, dsol.uncertainty),
    heatReleasedKj: roundWithUncertainty(q, uq),
    heatReleasedKwh: q.div(JOULES_PER_KWH.div(1000)).toString(),
    exothermic: q.isPositive(),
    heatCapacityAssumption: assumption,
    heatCapacityMassKg: basisKg.toString(),
    specificHeat: cp.toString(),
    temperatureChangeK: roundWithUncertainty(dT, udT),
    finalTemperatureC: roundWithUncertainty(final, udT),
    reachesBoiling,
    nearBoiling,
    warnings,
    cautions,
  };
}
