// Cycle sheet: from what the user typed (formula, overrides with reasons, the unknown, basis,
// convention) and the reference values, build a fully explicit solve request — every value carries
// its source, so the sheet re-solves offline forever — and solve it with the engine.
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';
// The engine's modules one by one, not '@/lib/thermo/engine': this screen solves cycles only
// (`safeSolveCycle`), so it does not load the other kinds' engine code.
import { MADELUNG_CONSTANTS } from '@/lib/thermo/constants';
import { latticeToConvention, type EnergyBasis, type LatticeConvention } from '@/lib/thermo/conventions';
import { buildBornHaberCycle, type BornHaberCycle } from '@/lib/thermo/cycle';
import { isThermoInputError } from '@/lib/thermo/errors';
import { analyzeBinarySalt } from '@/lib/thermo/ion-charges';
import { safeSolveCycle } from '@/lib/thermo/solve-cycle';
import type { SolveResult } from '@/lib/thermo/engine';
import type { FieldError } from './field-error';
import { isDisplayUnit, typedToKj, type DisplayUnit } from './format-energy';
import { ionSpecies, tracingLookup, type ValueSource } from './value-source';

/** A value typed for one step: an override of the edition's value, or a value the edition lacks. */
export interface StepEntry {
  value: string;
  uncertainty: string;
  /** Why it was overridden, or where a missing value came from. Required. */
  reason: string;
  /** Unit the value was typed in. */
  unit: DisplayUnit;
}

export interface CycleForm {
  formula: string;
  /** Only for metals without a fixed charge (Fe, Cu …). */
  cationCharge: number | null;
  /** Step key to solve for; null = the lattice enthalpy. */
  unknown: string | null;
  basis: EnergyBasis;
  convention: LatticeConvention;
  entries: Record<string, StepEntry>;
  modelCheck: boolean;
}

export const EMPTY_CYCLE_FORM: CycleForm = { formula: '', cationCharge: null, unknown: null, basis: 'as-tabulated', convention: 'dissociation', entries: {}, modelCheck: true };

export type StepOrigin = 'edition' | 'override' | 'entered' | 'unknown' | 'missing';

export interface StepRow {
  key: string;
  name: string;
  process: string;
  kind: string;
  /** Per-mole value in kJ/mol (lattice: in the chosen convention); null when missing or unsolved. */
  valueKj: string | null;
  uncertaintyKj: string | null;
  source: string | null;
  origin: StepOrigin;
  reason: string | null;
  /** Moles of this process per mole of salt (signed). */
  coefficient: string;
  /** Contribution around the cycle (kJ/mol of salt), once solved. */
  contributionKj: string | null;
  direction: 'absorbs' | 'releases' | 'none' | null;
  /** True for the step the edition has a value for (so it can be overridden). */
  fromEdition: boolean;
}

export interface CycleSheetBuild {
  /** Step keys of the cycle in order (for the unknown picker), empty if the formula is not usable. */
  stepKeys: Array<{ key: string; name: string }>;
  rows: StepRow[];
  errors: FieldError[];
  /** The fully explicit request stored as the sheet's problem (null if the cycle cannot be built). */
  request: { kind: 'cycle'; problem: Record<string, unknown> } | null;
  inputs: ResolvedInput[];
  outcome: SolveResult | null;
  /** The edition ids the values came from. */
  editionIds: string[];
}

const LATTICE_PREFIX = 'lattice_enthalpy:';

function hasText(s: string | undefined | null): boolean {
  return typeof s === 'string' && s.trim() !== '';
}

/** Map an engine error field inside the cycle problem to a form field. */
function formField(engineField: string): string {
  const f = engineField.replace(/^problem\./, '');
  const m = /^values\.([^.]+)(?:\.(value|uncertainty))?/.exec(f);
  if (m) return `entries.${m[1]}.${m[2] ?? 'value'}`;
  if (f.startsWith('model')) return 'model';
  if (f === 'cationCharge' || f.startsWith('formula')) return f.startsWith('formula') ? 'formula' : 'cationCharge';
  if (f === 'unknown') return 'unknown';
  return 'formula';
}

export function buildCycleSheet(form: CycleForm, values: ValueSource): CycleSheetBuild {
  const empty: CycleSheetBuild = { stepKeys: [], rows: [], errors: [], request: null, inputs: [], outcome: null, editionIds: [] };
  const formula = form.formula.trim();
  if (!formula) return { ...empty, errors: [{ field: 'formula', message: 'Type the formula of a binary ionic compound, e.g. CaCl2 or MgO.' }] };
  const cationCharge = form.cationCharge ?? undefined;

  let salt;
  try {
    salt = analyzeBinarySalt(formula, cationCharge);
  } catch (e) {
    if (isThermoInputError(e)) return { ...empty, errors: [{ field: e.field === 'cationCharge' ? 'cationCharge' : 'formula', message: e.message }] };
    throw e;
  }

  // The steps of this cycle (no lookup): lets a stale unknown or stale entries be ignored safely.
  const skeleton = buildBornHaberCycle({ formula, cationCharge, basis: form.basis });
  const traced = tracingLookup(values);
  const errors: FieldError[] = [];
  const explicit: Record<string, { value: string; uncertainty?: string | null; source: string }> = {};
  const entryKeys = new Set<string>();

  // Which steps could come from the edition at all (path steps swap with atomization of X).
  const probe = buildBornHaberCycle({ formula, cationCharge, basis: form.basis, lookup: traced.lookup });
  const allKeys = new Set([...skeleton.steps.map((s) => s.key), ...probe.steps.map((s) => s.key)]);
  const latticeKey = `${LATTICE_PREFIX}${salt.formula}`;
  const unknown = form.unknown && allKeys.has(form.unknown) ? form.unknown : latticeKey;

  for (const [key, entry] of Object.entries(form.entries)) {
    if (!allKeys.has(key) || key === unknown) continue;
    const typedValue = hasText(entry.value);
    if (!typedValue && !hasText(entry.uncertainty)) continue;
    const unit = isDisplayUnit(entry.unit) ? entry.unit : 'kJ/mol';
    const kj = typedValue ? typedToKj(entry.value, unit) : null;
    if (!typedValue) {
      errors.push({ field: `entries.${key}.value`, message: 'Type the value, or clear the uncertainty.' });
      continue;
    }
    if (kj === null) {
      errors.push({ field: `entries.${key}.value`, message: `"${entry.value}" is not a number.` });
      continue;
    }
    let uKj: string | null = null;
    if (hasText(entry.uncertainty)) {
      uKj = typedToKj(entry.uncertainty, unit);
      if (uKj === null || uKj.startsWith('-')) {
        errors.push({ field: `entries.${key}.uncertainty`, message: 'The uncertainty must be a number, zero or more.' });
        uKj = null;
      }
    }
    if (!hasText(entry.reason)) errors.push({ field: `entries.${key}.reason`, message: 'Give the reason (or the source) for this value: it travels with the sheet.' });
    entryKeys.add(key);
    explicit[key] = { value: kj, uncertainty: uKj, source: hasText(entry.reason) ? `entered: ${entry.reason.trim()}` : 'entered' };
  }

  let cycle: BornHaberCycle;
  try {
    cycle = buildBornHaberCycle({ formula, cationCharge, basis: form.basis, latticeConvention: form.convention, lookup: traced.lookup, values: explicit, unknown });
  } catch (e) {
    if (isThermoInputError(e)) return { ...empty, stepKeys: skeleton.steps.map((s) => ({ key: s.key, name: s.name })), errors: [...errors, { field: formField(e.field), message: e.message }] };
    throw e;
  }
  const stepKeys = cycle.steps.map((s) => ({ key: s.key, name: s.name }));
  const editionIds = new Set<string>();
  const inputs: ResolvedInput[] = [];
  const requestValues: Record<string, { value: string; uncertainty: string | null; source: string }> = {};
  const rows: StepRow[] = cycle.steps.map((s) => {
    const hit = traced.untag(s.source);
    const fromEdition = hit !== null;
    const isUnknown = s.key === unknown;
    const entered = entryKeys.has(s.key);
    let origin: StepOrigin;
    if (isUnknown) origin = 'unknown';
    else if (entered) origin = 'entered';
    else if (hit) origin = 'edition';
    else origin = 'missing';
    const display = s.value === null ? null : s.kind === 'lattice_enthalpy' ? latticeToConvention(s.value, form.convention).toString() : s.value.toString();
    const source = entered ? (explicit[s.key]?.source ?? null) : (hit?.source ?? null);
    if (!isUnknown && s.value !== null && display !== null) {
      requestValues[s.key] = { value: display, uncertainty: s.uncertainty?.toString() ?? null, source: source ?? '' };
      if (entered) inputs.push({ path: ['problem', 'values', s.key], origin: { type: 'entered', note: form.entries[s.key]?.reason.trim().slice(0, 500) ?? '' } });
      else if (hit) {
        editionIds.add(hit.editionId);
        inputs.push({ path: ['problem', 'values', s.key], origin: { type: 'edition', editionId: hit.editionId, species: hit.species, phase: hit.phase, property: hit.property } });
      }
    }
    return {
      key: s.key,
      name: s.name,
      process: s.process,
      kind: s.kind,
      valueKj: isUnknown ? null : display,
      uncertaintyKj: isUnknown ? null : (s.uncertainty?.toString() ?? null),
      source,
      origin,
      reason: entered ? (form.entries[s.key]?.reason ?? null) : null,
      coefficient: s.coefficient.toString(),
      contributionKj: null,
      direction: null,
      fromEdition,
    };
  });
  // An override of a value the edition has: the row says so (the probe build shows what the edition holds).
  const editionHas = new Set(probe.steps.filter((s) => s.value !== null).map((s) => s.key));
  for (const r of rows) {
    if (r.origin === 'entered' && editionHas.has(r.key)) r.origin = 'override';
    r.fromEdition = editionHas.has(r.key);
  }
  for (const key of cycle.missing) {
    const name = cycle.steps.find((s) => s.key === key)?.name ?? key;
    errors.push({ field: `entries.${key}.value`, message: `No value for “${name}” in ${values.edition ? 'the edition in use' : 'this device’s reference data (no edition downloaded yet)'}: type one, with its source.` });
  }

  const problem: Record<string, unknown> = { formula: salt.formula, values: requestValues, basis: form.basis, convention: form.convention };
  if (form.cationCharge) problem.cationCharge = form.cationCharge;
  if (unknown !== latticeKey) problem.unknown = unknown;
  if (form.modelCheck) {
    const model = modelInputs(salt.formula, salt.cation, salt.anion, values, inputs, editionIds);
    if (model) problem.model = model;
  }
  const request = { kind: 'cycle' as const, problem };
  if (cycle.missing.length > 0) return { stepKeys, rows, errors, request, inputs, outcome: null, editionIds: [...editionIds] };

  const solved = safeSolveCycle(request);
  if (!solved.ok) {
    return { stepKeys, rows, errors: [...errors, ...solved.errors.map((e) => ({ field: formField(e.field), message: e.message }))], request, inputs, outcome: null, editionIds: [...editionIds] };
  }
  if (solved.value.kind === 'cycle') {
    const byKey = new Map(solved.value.result.steps.map((s) => [s.key, s]));
    for (const r of rows) {
      const s = byKey.get(r.key);
      if (!s) continue;
      r.contributionKj = s.contribution;
      r.direction = s.direction;
      if (r.origin === 'unknown') {
        r.valueKj = r.kind === 'lattice_enthalpy' ? solved.value.result.latticeEnthalpy.value : s.value;
        r.uncertaintyKj = r.kind === 'lattice_enthalpy' ? solved.value.result.latticeEnthalpy.uncertainty : s.uncertainty;
      }
    }
  }
  return { stepKeys, rows, errors, request, inputs, outcome: solved.value, editionIds: [...editionIds] };
}

/** Model-check inputs from the reference values: structure, Madelung constant, distance, radii (CN 6 first), density. */
function modelInputs(
  formula: string,
  cation: { symbol: string; charge: number },
  anion: { symbol: string; charge: number },
  values: ValueSource,
  inputs: ResolvedInput[],
  editionIds: Set<string>,
): Record<string, string> | null {
  const model: Record<string, string> = {};
  const take = (field: string, species: string, phase: 'cr' | 'g', property: 'madelung_constant' | 'interionic_distance' | 'ionic_radius' | 'density', coordination?: number) => {
    const v = values.get(species, phase, property, coordination ? { coordination } : undefined);
    if (!v) return undefined;
    model[field] = v.value;
    editionIds.add(v.editionId);
    inputs.push({ path: ['problem', 'model', field], origin: { type: 'edition', editionId: v.editionId, species, phase, property } });
    return v;
  };
  const m = take('madelungConstant', formula, 'cr', 'madelung_constant');
  if (m?.structure && Object.prototype.hasOwnProperty.call(MADELUNG_CONSTANTS, m.structure)) model.structure = m.structure;
  take('interionicDistancePm', formula, 'cr', 'interionic_distance');
  take('cationRadiusPm', ionSpecies(cation.symbol, cation.charge), 'g', 'ionic_radius', 6);
  take('anionRadiusPm', ionSpecies(anion.symbol, anion.charge), 'g', 'ionic_radius', 6);
  take('density', formula, 'cr', 'density');
  return Object.keys(model).length > 0 ? model : null;
}

/** When the convention flips, a typed lattice value keeps its meaning: its sign flips with it. */
export function switchConvention(form: CycleForm, convention: LatticeConvention): CycleForm {
  if (convention === form.convention) return form;
  const entries: Record<string, StepEntry> = {};
  for (const [key, e] of Object.entries(form.entries)) {
    if (key.startsWith(LATTICE_PREFIX) && e.value.trim() !== '') {
      const t = e.value.trim().replace('\u2212', '-');
      entries[key] = { ...e, value: t.startsWith('-') ? t.slice(1) : t.startsWith('+') ? `-${t.slice(1)}` : `-${t}` };
    } else entries[key] = e;
  }
  return { ...form, convention, entries };
}
