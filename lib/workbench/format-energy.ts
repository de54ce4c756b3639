// Numbers on screen, in the PDF and in the ladder, formatted one way. The engine works in kJ/mol;
// each user reads (and types) kJ/mol, kcal/mol or eV. Conversion is exact (decimal.js via the engine).
import { Dec } from '@/lib/thermo/decimal';
import { convertEnergy, fromKjPerMol, toKjPerMol } from '@/lib/thermo/units';

export const DISPLAY_UNITS = ['kJ/mol', 'kcal/mol', 'eV'] as const;
export type DisplayUnit = (typeof DISPLAY_UNITS)[number];

export function isDisplayUnit(u: unknown): u is DisplayUnit {
  return typeof u === 'string' && (DISPLAY_UNITS as readonly string[]).includes(u);
}

/** Decimal places shown per unit when no uncertainty says otherwise (common practice, no source). */
const DEFAULT_DECIMALS: Record<DisplayUnit, number> = { 'kJ/mol': 1, 'kcal/mol': 2, eV: 3 };

const MINUS = '\u2212';

/** Group thousands with a thin space and use a true minus sign. */
function groupDigits(fixed: string): string {
  const negative = fixed.startsWith('-');
  const body = negative ? fixed.slice(1) : fixed;
  const [int = '0', frac] = body.split('.');
  const grouped = int.length > 4 ? int.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009') : int;
  const isZero = /^[0.]*$/.test(body);
  return `${negative && !isZero ? MINUS : ''}${grouped}${frac !== undefined ? `.${frac}` : ''}`;
}

/** Decimal places that keep two significant digits of an uncertainty (1 if its first digit is 1 or 2). */
export function decimalsForUncertainty(u: Dec): number {
  if (u.isZero()) return 0;
  const exponent = Math.floor(Math.log10(u.abs().toNumber()));
  const lead = u.abs().div(new Dec(10).pow(exponent)).toNumber();
  const sig = lead < 3 ? 2 : 1; // common practice, no source
  return Math.max(0, sig - 1 - exponent);
}

export interface FormattedEnergy {
  /** e.g. "2 258.4 ± 3.1" */
  text: string;
  value: string;
  uncertainty: string | null;
  unit: DisplayUnit;
}

/**
 * Format a kJ/mol value (decimal string or number) in `unit`, with its uncertainty if given; the
 * number of decimals follows the uncertainty, else a fixed default per unit.
 */
export function formatEnergy(kjPerMol: string | number | Dec, unit: DisplayUnit, uncertaintyKj?: string | number | Dec | null, opts: { signed?: boolean } = {}): FormattedEnergy {
  const v = fromKjPerMol(new Dec(kjPerMol), unit);
  const u = uncertaintyKj === null || uncertaintyKj === undefined ? null : fromKjPerMol(new Dec(uncertaintyKj), unit).abs();
  const decimals = u && !u.isZero() ? Math.min(6, decimalsForUncertainty(u)) : DEFAULT_DECIMALS[unit];
  let value = groupDigits(v.toFixed(decimals));
  if (opts.signed && v.greaterThan(0) && !/^[0.]*$/.test(v.toFixed(decimals))) value = `+${value}`;
  const uncertainty = u && !u.isZero() ? groupDigits(u.toFixed(decimals)) : null;
  return { text: uncertainty ? `${value} ± ${uncertainty}` : value, value, uncertainty, unit };
}

/** "2 258.4 ± 3.1 kJ/mol" */
export function energyText(kjPerMol: string | number | Dec, unit: DisplayUnit, uncertaintyKj?: string | number | Dec | null, opts: { signed?: boolean } = {}): string {
  return `${formatEnergy(kjPerMol, unit, uncertaintyKj, opts).text} ${unit}`;
}

/** A plain number (not energy) with fixed decimals, grouped and with a true minus. */
export function formatNumber(value: string | number | Dec, decimals: number): string {
  return groupDigits(new Dec(value).toFixed(decimals));
}

const TYPED_NUMBER = /^\s*[+\-\u2212]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;

/** Read a number as typed (accepts a true minus and thin spaces); null when it is not a number. */
export function parseTyped(text: string): string | null {
  const cleaned = text.replace(/[\u2009\u202f ]/g, '').replace('\u2212', '-');
  if (!TYPED_NUMBER.test(cleaned)) return null;
  return cleaned.trim();
}

/** A value typed in `unit` → kJ/mol as an exact decimal string; null when not a number. */
export function typedToKj(text: string, unit: DisplayUnit): string | null {
  const clean = parseTyped(text);
  if (clean === null) return null;
  return toKjPerMol(clean, unit).toString();
}

/** A kJ/mol decimal → the user's unit, as a plain decimal string to put in an input (no grouping). */
export function kjToTyped(kj: string, unit: DisplayUnit): string {
  const v = convertEnergy(kj, 'kJ/mol', unit);
  return unit === 'kJ/mol' ? v.toString() : v.toDecimalPlaces(6).toString();
}

/**
 * A rounded engine value (value ± uncertainty) as plain text: with its uncertainty when one was
 * given (decimals follow it), else `decimals` places — never the engine's "(no uncertainty given)".
 */
export function formatRounded(v: { value: string; uncertainty: string | null }, decimals: number): string {
  if (v.uncertainty !== null && !new Dec(v.uncertainty).isZero()) {
    const d = Math.min(6, decimalsForUncertainty(new Dec(v.uncertainty)));
    return `${formatNumber(v.value, d)} ± ${formatNumber(v.uncertainty, d)}`;
  }
  return formatNumber(v.value, decimals);
}
