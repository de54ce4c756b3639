// One entry point for the server and the device: validate a request, solve it, return JSON.
import * as z from '../validation/zod-mini';
import { computeBatchHeat, type BatchHeatResult } from './batch-heat';
import { reduceCalorimetryRun, type CalorimetryResult } from './calorimetry';
import { computeEnthalpyOfSolution, type DissolutionResult } from './dissolution';
import { computeReactionEnthalpy, type ReactionResult } from './reaction';
import { solveRequestSchema } from './schemas';
import { solveCycleProblem, toSolveFailure, type CycleSolveResult, type SolveFailure, type SolveOptions } from './solve-cycle';
import { ENGINE_VERSION } from './version';

export type { SolveFailure, SolveOptions } from './solve-cycle';

export type SolveResult =
  | CycleSolveResult
  | { kind: 'dissolution'; engineVersion: string; result: DissolutionResult; batchHeat: BatchHeatResult | null }
  | { kind: 'reaction'; engineVersion: string; result: ReactionResult }
  | { kind: 'calorimetry'; engineVersion: string; result: CalorimetryResult };

/**
 * Validate (throws ZodError for a malformed payload) and solve (throws ThermoInputError for input
 * that is well-formed but chemically impossible or incomplete). The result is JSON-serialisable;
 * exact decimal values are strings.
 */
export function solve(request: unknown, options: SolveOptions = {}): SolveResult {
  const req = z.parse(solveRequestSchema, request);
  switch (req.kind) {
    case 'cycle':
      return solveCycleProblem(req.problem, options);
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

/** Like `solve`, but returns field-named errors instead of throwing (for offline screens). */
export function safeSolve(request: unknown, options: SolveOptions = {}): { ok: true; value: SolveResult } | SolveFailure {
  try {
    return { ok: true, value: solve(request, options) };
  } catch (error) {
    const failure = toSolveFailure(error);
    if (failure) return failure;
    throw error;
  }
}
