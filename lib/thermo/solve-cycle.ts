// The cycle path of `solve()` on its own: the cycle workbench solves only cycles, so it loads this
// and not the dissolution, reaction and calorimetry code. `solve()` runs the same function for a
// cycle request, so the device's result and the server's recompute come from one code path.
import * as z from '../validation/zod-mini';
import { buildBornHaberCycle } from './cycle';
import { solveBornHaberCycle, type SolvedCycle } from './cycle-solve';
import { ThermoInputError } from './errors';
import { runModelCheck, type ModelCheckResult } from './lattice-models';
import type { ReferenceLookup } from './reference-lookup';
import { cycleRequestSchema, type CycleProblem } from './schemas';
import { ENGINE_VERSION } from './version';

export interface SolveOptions {
  /** Reference edition lookup for cycle values not given in the request. */
  lookup?: ReferenceLookup;
}

export type CycleSolveResult = { kind: 'cycle'; engineVersion: string; result: SolvedCycle; modelCheck: ModelCheckResult | null };

export interface SolveFailure {
  ok: false;
  errors: Array<{ code: string; field: string; message: string }>;
}

/** Solve a validated cycle problem (the `cycle` case of `solve()`). */
export function solveCycleProblem(p: CycleProblem, options: SolveOptions = {}): CycleSolveResult {
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

/** A thrown engine or validation error as field-named errors; null for anything else. */
export function toSolveFailure(error: unknown): SolveFailure | null {
  if (error instanceof ThermoInputError) return { ok: false, errors: [{ code: error.code, field: error.field, message: error.message }] };
  if (z.isZodError(error)) {
    return { ok: false, errors: error.issues.map((i) => ({ code: 'invalid_input', field: i.path.map(String).join('.'), message: i.message })) };
  }
  return null;
}

/** `safeSolve` for a cycle request (`{ kind: 'cycle', problem }`): same validation, same result. */
export function safeSolveCycle(request: unknown, options: SolveOptions = {}): { ok: true; value: CycleSolveResult } | SolveFailure {
  try {
    return { ok: true, value: solveCycleProblem(z.parse(cycleRequestSchema, request).problem, options) };
  } catch (error) {
    const failure = toSolveFailure(error);
    if (failure) return failure;
    throw error;
  }
}
