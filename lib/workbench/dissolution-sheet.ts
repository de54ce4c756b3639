// Dissolution / batch-heat sheet: the enthalpy of solution from formation enthalpies (primary
// route), its lattice + hydration decomposition (an explanation on one stated scale), and the
// batch heat with its cautions. Values come from the reference edition; every one is traced.
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';
import { analyzeBinarySalt, formatCounts, isThermoInputError, parseFormula, safeSolve, type SolveResult } from '@/lib/thermo/engine';
import { buildCycleSheet, EMPTY_CYCLE_FORM } from './cycle-sheet';
import type { FieldError } from './field-error';
import type { DissolutionForm } from './other-forms';
import { ionSpecies, makeValueSource, type ValueSource } from './value-source';

export { dissolutionFormSchema, EMPTY_DISSOLUTION_FORM, type DissolutionForm } from './other-forms';

export interface SheetBuild {
  errors: FieldError[];
  request: Record<string, unknown> | null;
  inputs: ResolvedInput[];
  outcome: SolveResult | null;
  editionIds: string[];
}

/** Normalise the hydrate dot: CaCl2.6H2O and CaCl2*6H2O are written CaCl2·6H2O in the edition. */
export function normaliseFormula(f: string): string {
  return f.trim().replace(/[.*]/g, '·').replace(/\s+/g, '');
}

function mapField(f: string): string {
  if (/^(problem\.)?(formula|ions|enthalpyOfFormation|latticeEnthalpy|hydration)/.test(f)) return 'formula';
  const m = /^batch\.(\w+)/.exec(f) ?? /^(saltMassKg|waterMassKg|startTemperatureC|heatCapacity)/.exec(f);
  if (m) return m[1] === 'heatCapacity' ? 'specificHeat' : (m[1] ?? 'formula');
  return 'formula';
}

export function buildDissolutionSheet(form: DissolutionForm, values: ValueSource): SheetBuild {
  const empty: SheetBuild = { errors: [], request: null, inputs: [], outcome: null, editionIds: [] };
  const formula = normaliseFormula(form.formula);
  if (!formula) return { ...empty, errors: [{ field: 'formula', message: 'Type the formula of the salt, e.g. CaCl2 or MgCl2·6H2O.' }] };
  let anhydrous: string;
  let water: number;
  let salt;
  try {
    const parsed = parseFormula(formula);
    anhydrous = formatCounts(parsed.anhydrous);
    water = parsed.waterOfHydration;
    if (parsed.otherAdducts.length > 0) throw new Error('adduct');
    salt = analyzeBinarySalt(anhydrous);
  } catch (e) {
    const message = isThermoInputError(e) ? e.message : `${formula} is not a binary ionic salt or one of its hydrates.`;
    return { ...empty, errors: [{ field: 'formula', message }] };
  }
  const inputs: ResolvedInput[] = [];
  const editionIds = new Set<string>();
  const errors: FieldError[] = [];
  const take = (path: (string | number)[], species: string, phase: 'cr' | 'aq' | 'l' | 'g', property: 'enthalpy_of_formation' | 'hydration_enthalpy', what: string) => {
    const v = values.get(species, phase, property);
    if (!v) {
      errors.push({ field: 'formula', message: `No ${what} in the edition in use — the sheet cannot be solved without it.` });
      return null;
    }
    editionIds.add(v.editionId);
    inputs.push({ path, origin: { type: 'edition', editionId: v.editionId, species, phase, property } });
    return v;
  };
  const fH = take(['problem', 'enthalpyOfFormation'], formula, 'cr', 'enthalpy_of_formation', `standard enthalpy of formation of ${formula}(cr)`);
  const ionList = [
    { symbol: salt.cation.symbol, charge: salt.cation.charge, count: salt.cation.count },
    { symbol: salt.anion.symbol, charge: salt.anion.charge, count: salt.anion.count },
  ];
  // The decomposition (lattice + hydration) is shown for the anhydrous salt only, on one scale.
  const hydration = water === 0 ? ionList.map((ion) => values.get(ionSpecies(ion.symbol, ion.charge), 'g', 'hydration_enthalpy')) : [];
  const hydrationUsable = hydration.length > 0 && hydration.every(Boolean) && new Set(hydration.map((h) => h?.scale ?? 'absolute')).size === 1;
  const ions = ionList.map((ion, i) => {
    const species = ionSpecies(ion.symbol, ion.charge);
    const aq = take(['problem', 'ions', i, 'enthalpyOfFormation'], species, 'aq', 'enthalpy_of_formation', `enthalpy of formation of ${species}(aq)`);
    const out: Record<string, unknown> = { species, count: ion.count, enthalpyOfFormation: aq ? { value: aq.value, uncertainty: aq.uncertainty, source: aq.source } : '0' };
    const h = hydration[i];
    if (hydrationUsable && h) {
      out.hydrationEnthalpy = { value: h.value, uncertainty: h.uncertainty, source: h.source, ...(h.scale ? { scale: h.scale } : {}) };
      editionIds.add(h.editionId);
      inputs.push({ path: ['problem', 'ions', i, 'hydrationEnthalpy'], origin: { type: 'edition', editionId: h.editionId, species, phase: 'g', property: 'hydration_enthalpy' } });
    }
    return out;
  });
  const problem: Record<string, unknown> = { formula, enthalpyOfFormation: fH ? { value: fH.value, uncertainty: fH.uncertainty, source: fH.source } : '0', ions };
  if (water > 0) {
    const w = take(['problem', 'waterEnthalpyOfFormation'], 'H2O', 'l', 'enthalpy_of_formation', 'enthalpy of formation of H2O(l)');
    if (w) problem.waterEnthalpyOfFormation = { value: w.value, uncertainty: w.uncertainty, source: w.source };
  }
  if (hydrationUsable) {
    // The lattice enthalpy for the decomposition is closed from the cycle with the same edition.
    const cycle = buildCycleSheet({ ...EMPTY_CYCLE_FORM, formula: anhydrous, modelCheck: false }, makeValueSource(values.edition));
    if (cycle.outcome?.kind === 'cycle') {
      const l = cycle.outcome.result.latticeEnthalpy;
      problem.latticeEnthalpy = { value: l.value, uncertainty: l.uncertainty, source: `closed from the ${anhydrous} Born–Haber cycle with the same edition` };
      problem.hydrationScale = hydration[0]?.scale ?? 'absolute';
      inputs.push({ path: ['problem', 'latticeEnthalpy'], origin: { type: 'entered', note: `closed from the ${anhydrous} Born–Haber cycle with the edition in use` } });
    } else {
      for (const i of ions) delete i.hydrationEnthalpy;
      for (let k = inputs.length - 1; k >= 0; k -= 1) if (inputs[k]?.path[3] === 'hydrationEnthalpy') inputs.splice(k, 1);
    }
  }
  const request: Record<string, unknown> = { kind: 'dissolution', problem };
  if (form.withBatch) {
    const batch: Record<string, unknown> = { saltMassKg: form.saltMassKg.trim(), waterMassKg: form.waterMassKg.trim(), startTemperatureC: form.startTemperatureC.trim() };
    if (form.specificHeat.trim() !== '') batch.heatCapacity = { value: form.specificHeat.trim(), appliesTo: form.heatCapacityAppliesTo };
    request.batch = batch;
  }
  if (errors.length > 0) return { errors, request, inputs, outcome: null, editionIds: [...editionIds] };
  const solved = safeSolve(request);
  if (!solved.ok) return { errors: solved.errors.map((e) => ({ field: mapField(e.field), message: e.message })), request, inputs, outcome: null, editionIds: [...editionIds] };
  return { errors: [], request, inputs, outcome: solved.value, editionIds: [...editionIds] };
}
