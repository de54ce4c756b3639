// Units accepted on import, converted to the unit each property is stored in.
import Decimal from 'decimal.js';
import { PROPERTIES, type PropertyCode } from '@/lib/reference/properties';

const D = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -30, toExpPos: 40 });

// 1 thermochemical calorie = 4.184 J exactly — the definition used by NBS/NIST thermochemical tables.
const KCAL = '4.184';
// 1 eV per particle = e·N_A = 1.602176634e-19 C × 6.02214076e23 /mol = 96.48533212331001... kJ/mol
// (both constants exact since the 2019 SI redefinition — CODATA 2018).
const EV = '96.485332123310018';

interface UnitRule {
  /** Factor to the stored unit. */
  factor: string;
  /** Named in the row's note when a value was converted. */
  label: string;
  /** Exact factors keep every digit; measured or long factors round to the input's significant figures. */
  exact: boolean;
}

/** Accepted spellings per stored unit (lower-cased, spaces removed). */
const RULES: Record<string, Record<string, UnitRule>> = {
  'kJ/mol': {
    'kj/mol': { factor: '1', label: 'kJ/mol', exact: true },
    'kjmol-1': { factor: '1', label: 'kJ/mol', exact: true },
    'j/mol': { factor: '0.001', label: 'J/mol', exact: true },
    'kcal/mol': { factor: KCAL, label: 'kcal/mol', exact: true },
    ev: { factor: EV, label: 'eV', exact: false },
  },
  pm: {
    pm: { factor: '1', label: 'pm', exact: true },
    'å': { factor: '100', label: 'Å', exact: true },
    angstrom: { factor: '100', label: 'Å', exact: true },
    nm: { factor: '1000', label: 'nm', exact: true },
  },
  'g/cm3': {
    'g/cm3': { factor: '1', label: 'g/cm3', exact: true },
    'g/cm^3': { factor: '1', label: 'g/cm3', exact: true },
    'g/ml': { factor: '1', label: 'g/mL', exact: true },
    'kg/m3': { factor: '0.001', label: 'kg/m3', exact: true },
  },
  'J/(mol·K)': {
    'j/(mol·k)': { factor: '1', label: 'J/(mol·K)', exact: true },
    'j/(mol*k)': { factor: '1', label: 'J/(mol·K)', exact: true },
    'j/(molk)': { factor: '1', label: 'J/(mol·K)', exact: true },
    'j/mol/k': { factor: '1', label: 'J/(mol·K)', exact: true },
    'cal/(mol·k)': { factor: KCAL, label: 'cal/(mol·K)', exact: true },
    'cal/(mol*k)': { factor: KCAL, label: 'cal/(mol·K)', exact: true },
    'cal/mol/k': { factor: KCAL, label: 'cal/(mol·K)', exact: true },
  },
  '1': {
    '1': { factor: '1', label: '1', exact: true },
    '': { factor: '1', label: '1', exact: true },
  },
};

export function acceptedUnits(property: PropertyCode): string[] {
  const stored = PROPERTIES[property].unit;
  return [...new Set(Object.values(RULES[stored] ?? {}).map((r) => r.label))];
}

export type ConvertResult = { ok: true; value: string; uncertainty: string | null; converted: string | null } | { ok: false; message: string };

function significantDigits(text: string): number {
  const digits = text.replace(/^[+-]/, '').replace('.', '').replace(/^0+/, '');
  return Math.max(digits.length, 1);
}

/** Plain decimal text, no exponent, no trailing "-0". */
function plain(d: Decimal): string {
  const s = d.toFixed();
  return s === '-0' ? '0' : s;
}

/**
 * Convert a decimal string given in `unit` to the stored unit of `property`. Exact factors keep
 * every digit (10.5 kcal/mol → 43.932 kJ/mol); the eV factor rounds to the input's significant figures.
 */
export function convertToStoredUnit(property: PropertyCode, unit: string, value: string, uncertainty: string | null): ConvertResult {
  const stored = PROPERTIES[property].unit;
  const rules = RULES[stored] ?? {};
  const rule = rules[unit.trim().toLowerCase().replace(/\s+/g, '')];
  if (!rule) {
    return { ok: false, message: `unit "${unit}" cannot be used for ${property}; use ${acceptedUnits(property).join(', ') || stored}` };
  }
  if (rule.factor === '1') return { ok: true, value, uncertainty, converted: null };
  const convert = (text: string) => {
    const raw = new D(text).times(rule.factor);
    return plain(rule.exact ? raw : raw.toSignificantDigits(significantDigits(text)));
  };
  return {
    ok: true,
    value: convert(value),
    uncertainty: uncertainty === null ? null : convert(uncertainty),
    converted: `converted on import from ${value} ${rule.label}${rule.exact ? '' : ', rounded to the significant figures given'}`,
  };
}
