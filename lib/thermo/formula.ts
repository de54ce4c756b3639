// Small formula parser: element symbols, counts, nested parentheses, hydrate/adduct parts
// (`CaCl2·6H2O`, `CaCl2.6H2O`, `CaCl2*6H2O`) and an optional ionic charge (`Ca2+`, `SO4^2-`, `(NH4)+`).
import { ATOMIC_WEIGHTS, isKnownElement } from './atomic-weights';
import { Dec } from './decimal';
import { ThermoInputError } from './errors';

export interface ParsedFormula {
  /** The text as given (trimmed). */
  text: string;
  /** Every element with its total count over all parts (hydrate water included). */
  elements: Record<string, number>;
  /** The first part only (the salt without water of crystallisation). */
  anhydrous: Record<string, number>;
  /** Moles of H2O per formula unit written as `·nH2O`. */
  waterOfHydration: number;
  /** Other adduct parts (not water), e.g. `2NH3`. */
  otherAdducts: string[];
  /** Net charge, 0 for a neutral formula. */
  charge: number;
}

const SUBSCRIPTS: Record<string, string> = { '₀': '0', '₁': '1', '₂': '2', '₃': '3', '₄': '4', '₅': '5', '₆': '6', '₇': '7', '₈': '8', '₉': '9' };
const SUPERSCRIPTS: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁺': '+', '⁻': '-' };
const MAX_LENGTH = 200;

function normalise(text: string): string {
  let out = '';
  let inSuper = false;
  for (const ch of text) {
    const sub = SUBSCRIPTS[ch];
    const sup = SUPERSCRIPTS[ch];
    if (sub !== undefined) {
      out += sub;
      inSuper = false;
    } else if (sup !== undefined) {
      out += (inSuper ? '' : '^') + sup;
      inSuper = true;
    } else {
      out += ch === '−' || ch === '–' ? '-' : ch;
      inSuper = false;
    }
  }
  return out.replace(/\s+/g, '');
}

function splitCharge(text: string, field: string): { body: string; charge: number } {
  const match = /\^?(\d*)([+-])$/.exec(text);
  if (!match) return { body: text, charge: 0 };
  const magnitude = match[1] === '' ? 1 : Number(match[1]);
  if (!Number.isInteger(magnitude) || magnitude < 1 || magnitude > 9) {
    throw new ThermoInputError('bad_formula', field, `The charge in "${text}" is not a whole number from 1 to 9.`);
  }
  return { body: text.slice(0, match.index), charge: match[2] === '+' ? magnitude : -magnitude };
}

function addInto(target: Record<string, number>, source: Record<string, number>, factor: number): void {
  for (const [symbol, count] of Object.entries(source)) target[symbol] = (target[symbol] ?? 0) + count * factor;
}

/** Parse one part (no hydrate dot); returns element counts. */
function parseGroup(text: string, field: string): Record<string, number> {
  let pos = 0;
  const readCount = (): number => {
    const m = /^\d+/.exec(text.slice(pos));
    if (!m) return 1;
    pos += m[0].length;
    const n = Number(m[0]);
    if (n === 0) throw new ThermoInputError('bad_formula', field, `A count of zero in "${text}" is not allowed.`);
    return n;
  };
  const parseSeq = (depth: number): Record<string, number> => {
    const counts: Record<string, number> = {};
    while (pos < text.length) {
      const ch = text[pos] ?? '';
      if (ch === '(' || ch === '[') {
        pos += 1;
        const inner = parseSeq(depth + 1);
        const close = text[pos];
        if (close !== ')' && close !== ']') {
          throw new ThermoInputError('bad_formula', field, `Unclosed parenthesis in "${text}".`);
        }
        pos += 1;
        addInto(counts, inner, readCount());
      } else if (ch === ')' || ch === ']') {
        if (depth === 0) throw new ThermoInputError('bad_formula', field, `Unmatched closing parenthesis in "${text}".`);
        return counts;
      } else if (/[A-Z]/.test(ch)) {
        const m = /^[A-Z][a-z]?/.exec(text.slice(pos));
        let symbol = m ? m[0] : ch;
        // Prefer a two-letter symbol only when it exists (so "Co" is cobalt but "CO" is C + O).
        if (symbol.length === 2 && !isKnownElement(symbol) && isKnownElement(symbol[0] ?? '')) symbol = symbol[0] ?? '';
        if (!isKnownElement(symbol)) {
          throw new ThermoInputError('unknown_element', field, `"${symbol}" in "${text}" is not an element the engine knows.`);
        }
        pos += symbol.length;
        counts[symbol] = (counts[symbol] ?? 0) + readCount();
      } else {
        throw new ThermoInputError('bad_formula', field, `Unexpected "${ch}" in "${text}".`);
      }
    }
    if (depth > 0) throw new ThermoInputError('bad_formula', field, `Unclosed parenthesis in "${text}".`);
    return counts;
  };
  const counts = parseSeq(0);
  if (Object.keys(counts).length === 0) throw new ThermoInputError('bad_formula', field, `"${text}" has no elements.`);
  return counts;
}

// Parsed formulas are immutable and reused: the same few salts are parsed over and over.
const PARSE_CACHE = new Map<string, ParsedFormula>();
const PARSE_CACHE_LIMIT = 1000;

function deepFreeze(parsed: ParsedFormula): ParsedFormula {
  Object.freeze(parsed.elements);
  Object.freeze(parsed.anhydrous);
  Object.freeze(parsed.otherAdducts);
  return Object.freeze(parsed);
}

export function parseFormula(input: unknown, field = 'formula'): ParsedFormula {
  if (typeof input === 'string') {
    const hit = PARSE_CACHE.get(input);
    if (hit) return hit;
  }
  const parsed = deepFreeze(parseFormulaUncached(input, field));
  if (typeof input === 'string') {
    if (PARSE_CACHE.size >= PARSE_CACHE_LIMIT) PARSE_CACHE.clear();
    PARSE_CACHE.set(input, parsed);
  }
  return parsed;
}

function parseFormulaUncached(input: unknown, field: string): ParsedFormula {
  if (typeof input !== 'string' || input.trim() === '') {
    throw new ThermoInputError('bad_formula', field, `${field} must be a chemical formula such as CaCl2 or CaCl2·6H2O.`);
  }
  if (input.length > MAX_LENGTH) throw new ThermoInputError('bad_formula', field, `${field} is too long.`);
  const text = normalise(input.trim());
  const { body, charge } = splitCharge(text, field);
  const parts = body.split(/[·.*•]/);
  const elements: Record<string, number> = {};
  let anhydrous: Record<string, number> = {};
  let waterOfHydration = 0;
  const otherAdducts: string[] = [];
  parts.forEach((part, index) => {
    if (part === '') throw new ThermoInputError('bad_formula', field, `Empty part in "${input}".`);
    const m = /^(\d+)(?=[A-Z(\[])/.exec(part);
    const coefficient = m && index > 0 ? Number(m[1]) : 1;
    const rest = m && index > 0 ? part.slice(m[0].length) : part;
    const counts = parseGroup(rest, field);
    addInto(elements, counts, coefficient);
    if (index === 0) {
      anhydrous = counts;
    } else if (Object.keys(counts).length === 2 && counts.H === 2 && counts.O === 1) {
      waterOfHydration += coefficient;
    } else {
      otherAdducts.push(part);
    }
  });
  return { text: input.trim(), elements, anhydrous, waterOfHydration, otherAdducts, charge };
}

/** Molar mass in g/mol from IUPAC abridged atomic weights (exact decimal sum). */
const MOLAR_MASS_CACHE = new WeakMap<ParsedFormula, Dec>();

export function molarMass(formula: string | ParsedFormula, field = 'formula'): Dec {
  const parsed = typeof formula === 'string' ? parseFormula(formula, field) : formula;
  const cached = MOLAR_MASS_CACHE.get(parsed);
  if (cached) return cached;
  let total = new Dec(0);
  for (const [symbol, count] of Object.entries(parsed.elements)) {
    const weight = ATOMIC_WEIGHTS[symbol];
    if (weight === undefined) throw new ThermoInputError('unknown_element', field, `No atomic weight for ${symbol}.`);
    total = total.plus(new Dec(weight).times(count));
  }
  MOLAR_MASS_CACHE.set(parsed, total);
  return total;
}

/** Canonical text of element counts in order of appearance, e.g. {Ca:1, Cl:2} → "CaCl2". */
export function formatCounts(counts: Record<string, number>): string {
  return Object.entries(counts)
    .map(([symbol, n]) => (n === 1 ? symbol : `${symbol}${n}`))
    .join('');
}
