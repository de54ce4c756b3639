// A private Decimal clone: 40 significant digits so unit round trips agree to 30 digits.
// The global Decimal configuration is left untouched for other modules.
import Decimal from 'decimal.js';
import { ThermoInputError } from './errors';

export const Dec = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -30, toExpPos: 40 });
export type Dec = Decimal;

/** A number as it arrives from JSON or a form: a finite JS number or a decimal string. */
export type NumberInput = number | string;

const DECIMAL_TEXT = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** Parse a number input exactly; NaN, Infinity, hex, empty text and non-numbers are refused. */
export function toDec(input: unknown, field: string): Dec {
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) {
      throw new ThermoInputError('not_a_number', field, `${field} must be a finite number, not ${String(input)}.`);
    }
    return new Dec(input);
  }
  if (typeof input === 'string') {
    const text = input.trim();
    if (!DECIMAL_TEXT.test(text)) {
      throw new ThermoInputError('not_a_number', field, `${field} must be a decimal number; "${input}" is not one.`);
    }
    return new Dec(text);
  }
  if (input instanceof Decimal) return new Dec(input);
  throw new ThermoInputError('not_a_number', field, `${field} must be a number or a decimal string.`);
}

export function toDecNonNegative(input: unknown, field: string): Dec {
  const value = toDec(input, field);
  if (value.isNegative() && !value.isZero()) {
    throw new ThermoInputError('out_of_range', field, `${field} cannot be negative.`);
  }
  return value;
}

export function toDecPositive(input: unknown, field: string): Dec {
  const value = toDec(input, field);
  if (!value.isPositive() || value.isZero()) {
    throw new ThermoInputError('out_of_range', field, `${field} must be greater than zero.`);
  }
  return value;
}

/** Optional standard uncertainty: absent/null means "not given"; a given one must be >= 0. */
export function toUncertainty(input: unknown, field: string): Dec | null {
  if (input === undefined || input === null) return null;
  return toDecNonNegative(input, field);
}

/** Decimal to a plain string for JSON (no exponent for ordinary magnitudes). */
export function decString(value: Dec): string {
  return value.toString();
}
