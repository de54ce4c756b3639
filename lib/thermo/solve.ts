// One entry point for the server and the device: validate a request, solve it, return JSON.
import { ZodError } from 'zod';
import { computeBatchHeat, type BatchHeatResult } from './batch-heat';
import { reduceCalorimetryRun, type CalorimetryResult } from './calorimetry';
import { buildBornHaberCycle } from './cycle';
import { solveBornHaberCycle, type SolvedCycle } from './cycle-solve';
import { computeEnthalpyOfSolution, type DissolutionResult } from './dissolution';
import { ThermoInputError } from './errors';
import { runModelCheck, type ModelCheckResult } from './lattice-models';
import { computeReactionEnthalpy, type ReactionResult } from './reaction';
import type { ReferenceLookup } from './reference-lookup';
import { solveRequestSchema } from './schemas';
import { ENGINE_VERSION } from './version';

export type SolveResult =
  | { kind: 'cycle'; engineVersion: string; result: SolvedCycle; modelCheck: ModelCheckResult | null }
  | { kind: 'dissolution'; engineVersion: string; result: DissolutionResult; batchHeat: BatchHeatResult | null }
  | { kind: 'reaction'; engineVersion: string; result: ReactionResult }
  | { kind: 'calorimetry'; engineVersion: string; result: CalorimetryResult };

export interface SolveOptions {
  /** Reference edition lookup for cycle values not given in the request. */
  lookup?: ReferenceLookup;
}

/**
 * Validate (throws ZodError for a malformed payload) and solve (throws ThermoInputError for input
 * that is well-formed but chemically impossible or incomplete). The result is JSON-serialisable;
 * exact decimal values are strings.
 */
export function solve(request: unknown, options: SolveOptions = {}): SolveResult {
  const req = solveRequestSchema.parse(request);
  switch (req.kind) {
    case 'cycle': {
      const p = req.problem;
      const cycle = buildBornHaberCycle({
        formula: p.formula,
        cationCharge: p.cationCharge,
        values: p.values,
        unknown: p.unknown,
        basis: p.basis,
        latticeConvention: p.convention,
        lookup: options.lookup,
      });
      const result = solveBornHaberCycle(cycle, p.convention ?? 'dissociation');
      const dissociation = p.convention === 'formation' ? `${-Number(result.latticeEnthalpy.value)}` : result.latticeEnthalpy.value;
      const modelCheck = p.model ? runModelCheck({ formula: p.formula, cationCharge: p.cationCharge, ...p.model, cycleLatticeEnthalpy: dissociation }) : null;
      return { kind: 'cycle', engineVersion: ENGINE_VERSION, result, modelCheck };
    }
    case 'dissolution': {
      const result = computeEnthalpyOfSolution(req.problem);
      const batchHeat = req.batch
        ? computeBatchHeat({
            formula: req.problem.formula,
            enthalpyOfSolution: { value: result.enthalpyOfSolution.value, uncertainty: result.enthalpyOfSolution.uncertainty },
            ...req.batch,
          })
        : null;
      return { kind: 'dissolution', engineVersion: ENGINE_VERSION, result, batchHeat };
    }
    case 'reaction':
      return { kind: 'reaction', engineVersion: ENGINE_VERSION, result: computeReactionEnthalpy(req.problem) };
    case 'calorimetry':
      return { kind: 'calorimetry', engineVersion: ENGINE_VERSION, result: reduceCalorimetryRun(req.problem) };
  }
}

export interface SolveFailure {
  ok: false;
  errors: Array<{ code: string; field: string; message: string }>;
}

/** Like `solve`, but returns field-named errors instead of throwing (for offline screens). */
export function safeSolve(request: unknown, options: SolveOptions = {}): { ok: true; value: SolveResult } | SolveFailure {
  try {
    return { ok: true, value: solve(request, options) };
  } catch (error) {
    if (error instanceof ThermoInputError) return { ok: false, errors: [{ code: error.code, field: error.field, message: error.message }] };
    if (error instanceof ZodError) {
      return { ok: false, errors: error.issues.map((i) => ({ code: 'invalid_input', field: i.path.map(String).join('.'), message: i.message })) };
    }
    throw error;
  }
}
