// Reaction (Hess) sheet: ΔrH° from standard enthalpies of formation in the edition, per mole of
// reaction and for a batch. The balance is checked first, naming the element or charge.
import type { ResolvedInput } from '@/lib/sheets/sheet-schema';
import { analyzeBinarySalt, checkBalance, Dec, isThermoInputError, isZeroByDefinition, parseReaction, safeSolve, type ParsedReaction } from '@/lib/thermo/engine';
import type { SheetBuild } from './dissolution-sheet';
import { parseTyped } from './format-energy';
import type { ReactionForm } from './other-forms';
import { ionSpecies, type ValueSource } from './value-source';

export { EMPTY_REACTION_FORM, reactionFormSchema, type ReactionForm } from './other-forms';

/** The species terms of a reaction (for the entry rows), or null if it does not parse. */
export function reactionTerms(text: string): ParsedReaction | null {
  try {
    return parseReaction(text);
  } catch {
    return null;
  }
}

export function buildReactionSheet(form: ReactionForm, values: ValueSource): SheetBuild & { missing: string[] } {
  const empty = { errors: [], request: null, inputs: [], outcome: null, editionIds: [], missing: [] };
  const text = form.reaction.trim();
  if (!text) return { ...empty, errors: [{ field: 'reaction', message: 'Write the reaction, e.g. CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l).' }] };
  let parsed: ParsedReaction;
  try {
    parsed = parseReaction(text);
    checkBalance(parsed);
  } catch (e) {
    if (isThermoInputError(e)) return { ...empty, errors: [{ field: 'reaction', message: e.message }] };
    throw e;
  }
  const inputs: ResolvedInput[] = [];
  const editionIds = new Set<string>();
  const errors: { field: string; message: string }[] = [];
  const missing: string[] = [];
  const given: Record<string, unknown> = {};
  for (const t of [...parsed.reactants, ...parsed.products]) {
    if (isZeroByDefinition(t) || t.key in given) continue;
    const entry = form.entries[t.key];
    if (entry && entry.value.trim() !== '') {
      const v = parseTyped(entry.value);
      if (v === null) errors.push({ field: `entries.${t.key}.value`, message: `"${entry.value}" is not a number.` });
      else if (entry.source.trim() === '') errors.push({ field: `entries.${t.key}.source`, message: `Give the source of the value for ${t.key}.` });
      else {
        given[t.key] = { value: v, source: `entered: ${entry.source.trim()}` };
        inputs.push({ path: ['problem', 'enthalpiesOfFormation', t.key], origin: { type: 'entered', note: entry.source.trim().slice(0, 500) } });
      }
      continue;
    }
    const hit = values.get(t.species, t.phase, 'enthalpy_of_formation');
    if (hit) {
      given[t.key] = { value: hit.value, uncertainty: hit.uncertainty, source: hit.source };
      editionIds.add(hit.editionId);
      inputs.push({ path: ['problem', 'enthalpiesOfFormation', t.key], origin: { type: 'edition', editionId: hit.editionId, species: t.species, phase: t.phase, property: 'enthalpy_of_formation' } });
      continue;
    }
    // A dissolved binary salt: the sum of its aqueous ions (infinite dilution), when the edition has them.
    if (t.phase === 'aq') {
      try {
        // Strong acids HCl, HBr, HI: H⁺(aq) is zero by convention, so only the anion counts.
        const acid = /^H(Cl|Br|I)$/.exec(t.species);
        if (acid) {
          const x = values.get(`${acid[1]}-`, 'aq', 'enthalpy_of_formation');
          if (x) {
            const note = `H+(aq) (zero by convention) + ${acid[1]}-(aq) from the edition in use`;
            given[t.key] = { value: x.value, uncertainty: x.uncertainty, source: note };
            editionIds.add(x.editionId);
            inputs.push({ path: ['problem', 'enthalpiesOfFormation', t.key], origin: { type: 'edition', editionId: x.editionId, species: `${acid[1]}-`, phase: 'aq', property: 'enthalpy_of_formation' } });
            continue;
          }
        }
        const salt = analyzeBinarySalt(t.species);
        const c = values.get(ionSpecies(salt.cation.symbol, salt.cation.charge), 'aq', 'enthalpy_of_formation');
        const a = values.get(ionSpecies(salt.anion.symbol, salt.anion.charge), 'aq', 'enthalpy_of_formation');
        if (c && a) {
          const sum = new Dec(c.value).times(salt.cation.count).plus(new Dec(a.value).times(salt.anion.count));
          const note = `sum of aqueous ions ${salt.cation.count > 1 ? salt.cation.count : ''}${ionSpecies(salt.cation.symbol, salt.cation.charge)} + ${salt.anion.count > 1 ? salt.anion.count : ''}${ionSpecies(salt.anion.symbol, salt.anion.charge)} from the edition in use`;
          given[t.key] = { value: sum.toString(), source: note };
          editionIds.add(c.editionId);
          inputs.push({ path: ['problem', 'enthalpiesOfFormation', t.key], origin: { type: 'entered', note } });
          continue;
        }
      } catch {
        /* not a binary salt: fall through to "missing" */
      }
    }
    missing.push(t.key);
    errors.push({ field: `entries.${t.key}.value`, message: `No enthalpy of formation of ${t.key} in the edition in use: type one, with its source.` });
  }
  const problem: Record<string, unknown> = { reaction: text, enthalpiesOfFormation: given };
  if (form.batchSpecies.trim() !== '' || form.batchMassKg.trim() !== '') {
    if (form.batchSpecies.trim() === '') errors.push({ field: 'batchSpecies', message: 'Name the species whose mass you give, e.g. CaO(cr).' });
    else if (form.batchMassKg.trim() === '') errors.push({ field: 'batchMassKg', message: 'Type the batch mass in kg.' });
    else problem.batch = { species: form.batchSpecies.trim(), massKg: form.batchMassKg.trim() };
  }
  const request = { kind: 'reaction', problem };
  if (errors.length > 0) return { errors, request, inputs, outcome: null, editionIds: [...editionIds], missing };
  const solved = safeSolve(request);
  if (!solved.ok) {
    return { errors: solved.errors.map((e) => ({ field: e.field.includes('batch') ? (e.field.includes('mass') ? 'batchMassKg' : 'batchSpecies') : 'reaction', message: e.message })), request, inputs, outcome: null, editionIds: [...editionIds], missing };
  }
  return { errors: [], request, inputs, outcome: solved.value, editionIds: [...editionIds], missing };
}
