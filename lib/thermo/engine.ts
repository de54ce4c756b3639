// The Rungbook thermochemistry engine's API. Pure TypeScript: no React, Next.js, DOM, database or
// network imports — it runs on the device and on the server alike. Device code imports this module;
// `@/lib/thermo` (index.ts) is the same API plus the request schema in the form the server's HTTP
// routes take, which would load classic zod in the browser.
export { ENGINE_VERSION } from './version';
export { ThermoInputError, isThermoInputError, type ThermoErrorCode } from './errors';
export { Dec, toDec, type NumberInput } from './decimal';
export * from './constants';
export { ATOMIC_WEIGHTS, ATOMIC_WEIGHT_SOURCE, isKnownElement } from './atomic-weights';
export { parseFormula, molarMass, formatCounts, type ParsedFormula } from './formula';
export {
  analyzeBinarySalt,
  ionConfiguration,
  FIXED_CATION_CHARGES,
  ANION_CHARGES,
  MAX_CATION_CHARGE,
  type BinarySalt,
} from './ion-charges';
export * from './conventions';
export { combineInQuadrature, roundWithUncertainty, type RoundedValue, type UncertainTerm } from './uncertainty';
export { convertEnergy, toKjPerMol, fromKjPerMol, energyInAllUnits, ENERGY_UNITS, ENERGY_UNIT_NOTES, type EnergyUnit } from './units';
export { lookupFromReferenceValues, lookupFromTable, type ReferenceLookup, type LookedUpValue } from './reference-lookup';
export { buildBornHaberCycle, type BornHaberCycle, type BuildCycleInput, type CycleStep, type CycleStepKind, type ExplicitValue } from './cycle';
export { solveBornHaberCycle, solveClosure, type ClosureTerm, type SolvedCycle, type SolvedStep } from './cycle-solve';
export * from './lattice-models';
export { resolveValue, type ValueInput, type ResolvedValue } from './values';
export { computeEnthalpyOfSolution, type DissolutionInput, type DissolutionIonInput, type DissolutionResult } from './dissolution';
export { computeBatchHeat, BATCH_CAUTIONS, FLUORIDE_CAUTION, DEFAULT_SPECIFIC_HEAT, type BatchHeatInput, type BatchHeatResult } from './batch-heat';
export { parseReaction, checkBalance, computeReactionEnthalpy, isZeroByDefinition, type ReactionInput, type ReactionResult, type ParsedReaction } from './reaction';
export { reduceCalorimetryRun, DEFAULT_MATCH_TOLERANCE_KJ, type CalorimetryInput, type CalorimetryResult, type TemperatureReading } from './calorimetry';
export {
  numberInputSchema,
  valueInputSchema,
  modelInputSchema,
  cycleProblemSchema,
  dissolutionProblemSchema,
  batchHeatProblemSchema,
  reactionProblemSchema,
  calorimetryProblemSchema,
  cycleRequestSchema,
  type CycleProblem,
  type DissolutionProblem,
  type BatchHeatProblem,
  type ReactionProblem,
  type CalorimetryProblem,
  type SolveRequest,
} from './schemas';
export { solve, safeSolve, type SolveResult, type SolveOptions, type SolveFailure } from './solve';
export { safeSolveCycle, type CycleSolveResult } from './solve-cycle';
