// Closure of a Born–Haber cycle: the steps around the cycle sum to zero, so any one unknown step
// follows from the others. Exact decimal arithmetic; uncertainties combined in quadrature.
import { ENERGY_BASIS_TEXT, LATTICE_CONVENTION_TEXT, latticeToConvention, type LatticeConvention } from './conventions';
import { Dec } from './decimal';
import { ThermoInputError } from './errors';
import type { BornHaberCycle, CycleStep } from './cycle';
import { molarMass } from './formula';
import { combineInQuadrature, roundWithUncertainty, type RoundedValue } from './uncertainty';
import { energyInAllUnits } from './units';
import { ENGINE_VERSION } from './version';

export interface ClosureTerm {
  key: string;
  coefficient: Dec;
  /** Per-mole value including any basis correction; null for the unknown. */
  value: Dec | null;
  uncertainty: Dec | null;
}

/**
 * Solve Σ c_i·v_i = 0 for the single term whose value is null. Refuses no unknown or several,
 * naming them. Returns the unknown's per-mole value and its standard uncertainty
 * u = sqrt(Σ_{i≠j} (c_i·u_i)²) / |c_j|.
 */
export function solveClosure(terms: readonly ClosureTerm[], field = 'steps'): { key: string; value: Dec; uncertainty: Dec | null } {
  const unknowns = terms.map((t, i) => ({ t, i })).filter(({ t }) => t.value === null);
  if (unknowns.length === 0) {
    throw new ThermoInputError('no_unknown', field, 'Every step has a value, so there is nothing to solve for; clear the step you want to find.');
  }
  if (unknowns.length > 1) {
    const names = unknowns.map(({ t }) => t.key);
    throw new ThermoInputError(
      'too_many_unknowns',
      `${field}[${unknowns[1]?.i ?? 0}].value`,
      `A closed cycle gives only one unknown, but ${names.length} steps have no value: ${names.join(', ')}.`,
      names,
    );
  }
  const target = unknowns[0];
  if (!target) throw new ThermoInputError('no_unknown', field, 'No unknown step.');
  if (target.t.coefficient.isZero()) {
    throw new ThermoInputError('out_of_range', `${field}[${target.i}].coefficient`, 'The unknown step has a zero coefficient.');
  }
  let rest = new Dec(0);
  for (const term of terms) {
    if (term.value !== null) rest = rest.plus(term.coefficient.times(term.value));
  }
  const value = rest.negated().div(target.t.coefficient);
  const known = terms.filter((t) => t.value !== null);
  const combined = combineInQuadrature(known.map((t) => ({ coefficient: t.coefficient, uncertainty: t.uncertainty })));
  const uncertainty = combined === null ? null : combined.div(target.t.coefficient.abs());
  return { key: target.t.key, value, uncertainty };
}

export interface SolvedStep {
  key: string;
  kind: CycleStep['kind'];
  name: string;
  species: string;
  phase: string;
  process: string;
  coefficient: string;
  /** Per-mole value as tabulated (lattice: dissociation, positive). */
  value: string;
  basisCorrection: string;
  /** coefficient × (value + basisCorrection), kJ/mol of salt. */
  contribution: string;
  direction: 'absorbs' | 'releases' | 'none';
  uncertainty: string | null;
  source: string | null;
  overridden: boolean;
  solved: boolean;
}

export interface SolvedCycle {
  engineVersion: string;
  kind: 'cycle';
  formula: string;
  molarMass: string;
  cation: { symbol: string; charge: number; count: number };
  anion: { symbol: string; charge: number; count: number };
  unit: 'kJ/mol';
  basis: { code: string; text: string };
  convention: { code: LatticeConvention; text: string };
  nonmetalRoute: string;
  solvedFor: { key: string; name: string; result: RoundedValue };
  /** Lattice enthalpy in the chosen convention (solved or given). */
  latticeEnthalpy: RoundedValue & { units: Record<string, string> };
  steps: SolvedStep[];
  notes: string[];
}

export function solveBornHaberCycle(cycle: BornHaberCycle, convention: LatticeConvention = 'dissociation'): SolvedCycle {
  const terms: ClosureTerm[] = cycle.steps.map((s) => ({
    key: s.key,
    coefficient: s.coefficient,
    value: s.value === null ? null : s.value.plus(s.basisCorrection),
    uncertainty: s.uncertainty,
  }));
  const solved = solveClosure(terms);
  const index = cycle.steps.findIndex((s) => s.key === solved.key);
  const target = cycle.steps[index];
  if (!target) throw new ThermoInputError('no_unknown', 'steps', 'Unknown step not found.');
  // The closure gives value + correction; report the tabulated-basis value of the step itself.
  const solvedValue = solved.value.minus(target.basisCorrection);
  const steps: SolvedStep[] = cycle.steps.map((s) => {
    const isTarget = s.key === solved.key;
    const value = isTarget ? solvedValue : (s.value ?? new Dec(0));
    const contribution = s.coefficient.times(value.plus(s.basisCorrection));
    return {
      key: s.key,
      kind: s.kind,
      name: s.name,
      species: s.species,
      phase: s.phase,
      process: s.process,
      coefficient: s.coefficient.toString(),
      value: value.toString(),
      basisCorrection: s.basisCorrection.toString(),
      contribution: contribution.toString(),
      direction: contribution.isZero() ? 'none' : contribution.isPositive() ? 'absorbs' : 'releases',
      uncertainty: isTarget ? (solved.uncertainty?.toString() ?? null) : (s.uncertainty?.toString() ?? null),
      source: isTarget ? 'solved from the closure of the cycle' : s.source,
      overridden: s.overridden,
      solved: isTarget,
    };
  });
  const lattice = cycle.steps.find((s) => s.kind === 'lattice_enthalpy');
  const latticeDissociation = lattice && lattice.key === solved.key ? solvedValue : (lattice?.value ?? new Dec(0));
  const latticeU = lattice && lattice.key === solved.key ? solved.uncertainty : (lattice?.uncertainty ?? null);
  const latticeValue = latticeToConvention(latticeDissociation, convention);
  const mm = molarMass(cycle.salt.parsed);
  const notes: string[] = [];
  if (['O', 'S', 'Se', 'N'].includes(cycle.salt.anion.symbol)) {
    notes.push(
      `The second${cycle.salt.anion.symbol === 'N' ? ' and third' : ''} electron-gain enthalpies of ${cycle.salt.anion.symbol} cannot be measured; tabulated values are back-calculated from cycles, so this cycle is partly circular.`,
    );
  }
  const known = cycle.steps.filter((s) => s.key !== solved.key);
  const withoutU = known.filter((s) => s.uncertainty === null).map((s) => s.key);
  if (withoutU.length > 0) {
    notes.push(
      `${withoutU.length} of ${known.length} inputs carry no uncertainty (${withoutU.join(', ')}); they are treated as exact, so the stated uncertainty understates the real one.`,
    );
  }
  const stepResult = roundWithUncertainty(target.kind === 'lattice_enthalpy' ? latticeToConvention(solvedValue, convention) : solvedValue, solved.uncertainty);
  return {
    engineVersion: ENGINE_VERSION,
    kind: 'cycle',
    formula: cycle.salt.formula,
    molarMass: mm.toString(),
    cation: { symbol: cycle.salt.cation.symbol, charge: cycle.salt.cation.charge, count: cycle.salt.cation.count },
    anion: { symbol: cycle.salt.anion.symbol, charge: cycle.salt.anion.charge, count: cycle.salt.anion.count },
    unit: 'kJ/mol',
    basis: { code: cycle.basis, text: ENERGY_BASIS_TEXT[cycle.basis] },
    convention: { code: convention, text: LATTICE_CONVENTION_TEXT[convention] },
    nonmetalRoute: cycle.nonmetalRoute,
    solvedFor: { key: target.key, name: target.name, result: stepResult },
    latticeEnthalpy: { ...roundWithUncertainty(latticeValue, latticeU), units: energyInAllUnits(latticeValue, mm) as Record<string, string> },
    steps,
    notes,
  };
}
