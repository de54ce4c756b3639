// Reaction enthalpy by Hess's law from standard enthalpies of formation, with element and charge
// balance checks and scaling to a batch by the mass of one named species.
import type { Phase } from '../reference/properties';
import { Dec, toDecPositive } from './decimal';
import { ThermoInputError } from './errors';
import { molarMass, parseFormula, type ParsedFormula } from './formula';
import type { ReferenceLookup } from './reference-lookup';
import { combineInQuadrature, roundWithUncertainty, type RoundedValue } from './uncertainty';
import { resolveValue, type ValueInput } from './values';

export interface ReactionTerm {
  coefficient: Dec;
  species: string;
  phase: Phase;
  /** `Species(phase)` — the key used for enthalpies of formation. */
  key: string;
  parsed: ParsedFormula;
}

export interface ParsedReaction {
  text: string;
  reactants: ReactionTerm[];
  products: ReactionTerm[];
}

const PHASE_ALIASES: Record<string, Phase> = { cr: 'cr', s: 'cr', c: 'cr', l: 'l', g: 'g', aq: 'aq' };

function parseTerm(raw: string, field: string): ReactionTerm {
  const text = raw.trim();
  const m = /^(\d+(?:\.\d+)?(?:\/\d+)?)?\s*(.+?)\s*\(\s*(cr|s|c|l|g|aq)\s*\)$/.exec(text);
  if (!m || !m[2] || !m[3]) {
    throw new ThermoInputError('bad_reaction', field, `"${text}" must be a species with its phase, e.g. "2 HCl(aq)" or "CaO(cr)".`);
  }
  let coefficient = new Dec(1);
  if (m[1]) {
    const [num, den] = m[1].split('/');
    coefficient = new Dec(num ?? '1').div(new Dec(den ?? '1'));
    if (coefficient.isZero()) throw new ThermoInputError('bad_reaction', field, `A zero coefficient in "${text}".`);
  }
  const phase = PHASE_ALIASES[m[3]] ?? 'cr';
  const parsed = parseFormula(m[2], field);
  return { coefficient, species: m[2], phase, key: `${m[2]}(${phase})`, parsed };
}

export function parseReaction(input: unknown, field = 'reaction'): ParsedReaction {
  if (typeof input !== 'string' || input.trim() === '' || input.length > 500) {
    throw new ThermoInputError('bad_reaction', field, 'Write the reaction as "reactants -> products", e.g. "CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)".');
  }
  const sides = input.split(/\s*(?:->|→|=)\s*/);
  if (sides.length !== 2 || !sides[0] || !sides[1]) {
    throw new ThermoInputError('bad_reaction', field, 'A reaction needs exactly one arrow (->) between reactants and products.');
  }
  const split = (side: string): string[] => side.split(/\s+\+\s+/).filter((t) => t.trim() !== '');
  const reactants = split(sides[0]).map((t, i) => parseTerm(t, `${field}.reactants[${i}]`));
  const products = split(sides[1]).map((t, i) => parseTerm(t, `${field}.products[${i}]`));
  return { text: input.trim(), reactants, products };
}

/** Refuse an unbalanced reaction, naming the element (or the charge) that does not balance. */
export function checkBalance(reaction: ParsedReaction, field = 'reaction'): void {
  const totals: Record<string, Dec> = {};
  let charge = new Dec(0);
  const add = (terms: ReactionTerm[], sign: number): void => {
    for (const t of terms) {
      for (const [symbol, n] of Object.entries(t.parsed.elements)) {
        totals[symbol] = (totals[symbol] ?? new Dec(0)).plus(t.coefficient.times(n).times(sign));
      }
      charge = charge.plus(t.coefficient.times(t.parsed.charge).times(sign));
    }
  };
  add(reaction.reactants, 1);
  add(reaction.products, -1);
  const off = Object.entries(totals).filter(([, v]) => !v.isZero());
  if (off.length > 0) {
    const [symbol, diff] = off[0] ?? ['?', new Dec(0)];
    throw new ThermoInputError(
      'unbalanced_reaction',
      field,
      `${symbol} does not balance: ${diff.abs().toString()} more on the ${diff.isPositive() ? 'reactant' : 'product'} side.`,
      off.map(([s]) => s),
    );
  }
  if (!charge.isZero()) {
    throw new ThermoInputError('unbalanced_reaction', field, `Charge does not balance: the reactant side carries ${charge.isPositive() ? '+' : ''}${charge.toString()} more than the product side.`, ['charge']);
  }
}

const DIATOMIC_GASES = new Set(['H2', 'N2', 'O2', 'F2', 'Cl2']);
const NONMETAL_SOLIDS = new Set(['C', 'S', 'Se', 'P', 'I2', 'Si', 'B']);
const LIQUID_ELEMENTS = new Set(['Br2', 'Hg']);

/** Elements in their reference state (ΔfH = 0 by definition) and H⁺(aq) (0 by convention). */
export function isZeroByDefinition(term: ReactionTerm): boolean {
  const els = Object.keys(term.parsed.elements);
  if (term.parsed.charge === 1 && els.length === 1 && els[0] === 'H' && term.parsed.elements.H === 1 && term.phase === 'aq') return true;
  if (term.parsed.charge !== 0 || els.length !== 1) return false;
  const s = term.species.trim();
  if (term.phase === 'g') return DIATOMIC_GASES.has(s);
  if (term.phase === 'l') return LIQUID_ELEMENTS.has(s);
  if (term.phase === 'cr') {
    if (NONMETAL_SOLIDS.has(s)) return true;
    // A single metal atom in the solid, e.g. Ca(cr), Mg(cr).
    return /^[A-Z][a-z]?$/.test(s) && !['H', 'N', 'O', 'F', 'Cl', 'Br', 'He', 'Ne', 'Ar', 'Kr', 'Xe', 'Hg'].includes(s);
  }
  return false;
}

export interface ReactionInput {
  reaction: string;
  /** ΔfH by `Species(phase)` key, e.g. { "HCl(aq)": { value: "-167.2", uncertainty: "0.1" } }. */
  enthalpiesOfFormation?: Record<string, ValueInput | number | string>;
  lookup?: ReferenceLookup;
  /** Scale to a batch: the mass (kg) of one named species, e.g. { species: "CaO(cr)", massKg: 250 }. */
  batch?: { species: string; massKg: number | string };
}

export interface ReactionResult {
  reaction: string;
  unit: 'kJ/mol';
  basis: string;
  reactionEnthalpy: RoundedValue;
  terms: Array<{ key: string; side: 'reactant' | 'product'; coefficient: string; enthalpyOfFormation: string; uncertainty: string | null; source: string | null }>;
  batch: null | { species: string; massKg: string; molarMass: string; amountMol: string; extentMol: string; enthalpyChangeKj: RoundedValue; heatReleasedKj: string };
  notes: string[];
}

export function computeReactionEnthalpy(input: ReactionInput): ReactionResult {
  const reaction = parseReaction(input.reaction);
  checkBalance(reaction);
  const given = input.enthalpiesOfFormation ?? {};
  const all = [
    ...reaction.reactants.map((t) => ({ t, side: 'reactant' as const, sign: new Dec(-1) })),
    ...reaction.products.map((t) => ({ t, side: 'product' as const, sign: new Dec(1) })),
  ];
  const missing: string[] = [];
  let total = new Dec(0);
  const uTerms: Array<{ coefficient: Dec; uncertainty: Dec | null }> = [];
  const terms: ReactionResult['terms'] = [];
  const notes: string[] = ['Standard reaction enthalpy at 298.15 K from standard enthalpies of formation (Hess’s law).'];
  for (const { t, side, sign } of all) {
    let value: Dec | null = null;
    let uncertainty: Dec | null = null;
    let source: string | null = null;
    if (Object.prototype.hasOwnProperty.call(given, t.key)) {
      const r = resolveValue(given[t.key], `enthalpiesOfFormation.${t.key}`);
      ({ value, uncertainty, source } = r);
    } else if (isZeroByDefinition(t)) {
      value = new Dec(0);
      source = t.parsed.charge === 1 ? 'zero by convention (H⁺, aq)' : 'element in its reference state: zero by definition';
    } else if (input.lookup) {
      const hit = input.lookup(t.species, t.phase, 'enthalpy_of_formation');
      if (hit) {
        const r = resolveValue(hit, `lookup(${t.key})`);
        ({ value, uncertainty } = r);
        source = hit.source ?? null;
      }
    }
    if (value === null) {
      missing.push(t.key);
      continue;
    }
    total = total.plus(sign.times(t.coefficient).times(value));
    uTerms.push({ coefficient: t.coefficient, uncertainty });
    terms.push({ key: t.key, side, coefficient: t.coefficient.toString(), enthalpyOfFormation: value.toString(), uncertainty: uncertainty?.toString() ?? null, source });
  }
  if (missing.length > 0) {
    throw new ThermoInputError('missing_values', 'enthalpiesOfFormation', `No enthalpy of formation for: ${missing.join(', ')}.`, missing);
  }
  const u = combineInQuadrature(uTerms);
  let batch: ReactionResult['batch'] = null;
  if (input.batch) {
    const match = all.find(({ t }) => t.key === input.batch?.species.replace(/\s+/g, '') || `${t.coefficient.eq(1) ? '' : ''}${t.key}` === input.batch?.species);
    if (!match) {
      throw new ThermoInputError('unknown_species', 'batch.species', `"${input.batch.species}" is not in the reaction. Use one of: ${all.map(({ t }) => t.key).join(', ')}.`);
    }
    const massKg = toDecPositive(input.batch.massKg, 'batch.massKg');
    const mm = molarMass(match.t.parsed);
    const amount = massKg.times(1000).div(mm);
    const extent = amount.div(match.t.coefficient);
    const change = extent.times(total);
    batch = {
      species: match.t.key,
      massKg: massKg.toString(),
      molarMass: mm.toString(),
      amountMol: amount.toString(),
      extentMol: extent.toString(),
      enthalpyChangeKj: roundWithUncertainty(change, u === null ? null : extent.times(u)),
      heatReleasedKj: change.negated().toString(),
    };
    notes.push('Batch heat assumes the named species reacts completely as written.');
  }
  return {
    reaction: reaction.text,
    unit: 'kJ/mol',
    basis: 'ΔrH° = Σ ν·ΔfH°(products) − Σ ν·ΔfH°(reactants), per mole of reaction as written.',
    reactionEnthalpy: roundWithUncertainty(total, u),
    terms,
    batch,
    notes,
  };
}
