// Calorimetry sheet: reduce a solution-calorimetry run to an enthalpy of solution and say which
// form the lot is (anhydrous or which hydrate), against predictions from the edition.
import type { ReferenceValue } from '@/lib/reference/properties';
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';
import { formatCounts, isThermoInputError, parseFormula, safeSolve } from '@/lib/thermo/engine';
import { buildDissolutionSheet, EMPTY_DISSOLUTION_FORM, normaliseFormula, type SheetBuild } from './dissolution-sheet';
import { calorimetryFormSchema, EMPTY_CALORIMETRY_FORM, type CalorimetryForm } from './other-forms';
import { makeValueSource, type ValueSource } from './value-source';

export { calorimetryFormSchema, EMPTY_CALORIMETRY_FORM, type CalorimetryForm } from './other-forms';

/** The salt and its hydrates that the edition has an enthalpy of formation for. */
export function candidateForms(salt: string, values: readonly ReferenceValue[]): string[] {
  const base = normaliseFormula(salt);
  const forms = values.filter((v) => v.phase === 'cr' && v.property === 'enthalpy_of_formation' && (v.species === base || v.species.startsWith(`${base}·`))).map((v) => v.species);
  return [...new Set(forms)];
}

/** Parse "time, temperature" lines (s, °C); blank lines and a header are skipped. */
export function parseReadings(text: string): { readings: Array<{ timeS: string; temperatureC: string }>; badLine: number | null } {
  const readings: Array<{ timeS: string; temperatureC: string }> = [];
  const lines = text.split(/\r?\n/);
  for (let i = 0; i < lines.length; i += 1) {
    const line = lines[i]!.trim();
    if (line === '' || /^[a-z]/i.test(line)) continue;
    const parts = line.split(/[\s,;\t]+/);
    if (parts.length !== 2 || !parts.every((p) => Number.isFinite(Number(p)))) return { readings, badLine: i + 1 };
    readings.push({ timeS: parts[0]!, temperatureC: parts[1]! });
  }
  return { readings, badLine: null };
}

export function buildCalorimetrySheet(form: CalorimetryForm, values: ValueSource): SheetBuild & { candidates: string[] } {
  const empty = { errors: [], request: null, inputs: [], outcome: null, editionIds: [], candidates: [] };
  const parsedForm = calorimetryFormSchema.safeParse(form);
  if (!parsedForm.success) return { ...empty, errors: parsedForm.error.issues.map((i) => ({ field: i.path.map(String).join('.'), message: i.message })) };
  const salt = normaliseFormula(form.salt);
  try {
    const p = parseFormula(salt);
    if (p.waterOfHydration > 0) return { ...empty, errors: [{ field: 'salt', message: `Type the anhydrous salt (${formatCounts(p.anhydrous)}); its hydrates are compared automatically.` }] };
  } catch (e) {
    return { ...empty, errors: [{ field: 'salt', message: isThermoInputError(e) ? e.message : 'Not a formula.' }] };
  }
  const candidates = candidateForms(salt, values.edition?.values ?? []);
  if (candidates.length === 0) return { ...empty, errors: [{ field: 'salt', message: `The edition in use has no enthalpy of formation for ${salt} or its hydrates.` }] };
  const inputs: ResolvedInput[] = [];
  const editionIds = new Set<string>();
  const predicted: Array<{ formula: string; predictedEnthalpyOfSolution: unknown }> = [];
  const pinnedSource = makeValueSource(values.edition);
  candidates.forEach((formula) => {
    const d = buildDissolutionSheet({ ...EMPTY_DISSOLUTION_FORM, formula, withBatch: false }, pinnedSource);
    if (d.outcome?.kind !== 'dissolution') return;
    const s = d.outcome.result.enthalpyOfSolution;
    predicted.push({ formula, predictedEnthalpyOfSolution: { value: s.value, uncertainty: s.uncertainty, source: `predicted from formation enthalpies in the edition in use` } });
    for (const id of d.editionIds) editionIds.add(id);
    inputs.push({ path: ['problem', 'candidates', predicted.length - 1, 'predictedEnthalpyOfSolution'], origin: { type: 'entered', note: `predicted for ${formula} from formation enthalpies in the edition in use` } });
  });
  const problem: Record<string, unknown> = { sampleMassG: form.sampleMassG, waterMassG: form.waterMassG, heatCapacityBasis: form.heatCapacityBasis, candidates: predicted };
  if (form.specificHeat) problem.specificHeat = form.specificHeat;
  if (form.calorimeterConstant) problem.calorimeterConstant = form.calorimeterConstant;
  if (form.toleranceKjPerMol) problem.toleranceKjPerMol = form.toleranceKjPerMol;
  const errors: { field: string; message: string }[] = [];
  if (form.mode === 'pair') {
    if (form.beforeC === '') errors.push({ field: 'beforeC', message: 'Type the temperature before mixing (°C).' });
    if (form.afterC === '') errors.push({ field: 'afterC', message: 'Type the temperature after mixing (°C).' });
    problem.temperatures = { beforeC: form.beforeC, afterC: form.afterC };
  } else {
    const { readings, badLine } = parseReadings(form.readings);
    if (badLine !== null) errors.push({ field: 'readings', message: `Line ${badLine} is not "time, temperature" (seconds, °C).` });
    else if (readings.length < 4) errors.push({ field: 'readings', message: 'Give at least two readings before mixing and two after.' });
    if (!Number.isFinite(Number(form.mixingTimeS)) || form.mixingTimeS === '') errors.push({ field: 'mixingTimeS', message: 'Type the time of mixing (s).' });
    if (!Number.isFinite(Number(form.afterPeriodStartS)) || form.afterPeriodStartS === '') errors.push({ field: 'afterPeriodStartS', message: 'Type when the after-period starts (s).' });
    problem.readings = readings;
    problem.mixingTimeS = form.mixingTimeS;
    problem.afterPeriodStartS = form.afterPeriodStartS;
  }
  const request = { kind: 'calorimetry', problem };
  if (errors.length > 0) return { errors, request, inputs, outcome: null, editionIds: [...editionIds], candidates };
  const solved = safeSolve(request);
  if (!solved.ok) {
    const map = (f: string) => {
      const k = f.replace(/^problem\./, '').split('.')[0] ?? '';
      if (k === 'temperatures') return 'afterC';
      if (k === 'candidates') return 'salt';
      return k in EMPTY_CALORIMETRY_FORM ? k : 'salt';
    };
    return { errors: solved.errors.map((e) => ({ field: map(e.field), message: e.message })), request, inputs, outcome: null, editionIds: [...editionIds], candidates };
  }
  return { errors: [], request, inputs, outcome: solved.value, editionIds: [...editionIds], candidates };
}
