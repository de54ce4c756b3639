// GUM-style combination of uncorrelated standard uncertainties, and rounding of value ± u to
// justified significant figures while the exact value is kept alongside.
import { Dec } from './decimal';

export interface UncertainTerm {
  /** Sensitivity coefficient (the step's stoichiometric coefficient for a linear sum). */
  coefficient: Dec;
  uncertainty: Dec | null;
}

/**
 * u = sqrt(Σ (c_i·u_i)²); null when no term carries an uncertainty. Terms without one count as exact.
 * A single term is returned exactly (|c·u|); otherwise the square root is taken in floating point —
 * an uncertainty needs two significant digits, not forty.
 */
export function combineInQuadrature(terms: readonly UncertainTerm[]): Dec | null {
  let sum = new Dec(0);
  let nonZero = 0;
  let any = false;
  let last = new Dec(0);
  for (const term of terms) {
    if (term.uncertainty === null) continue;
    any = true;
    const cu = term.coefficient.times(term.uncertainty);
    if (cu.isZero()) continue;
    nonZero += 1;
    last = cu.abs();
    sum = sum.plus(cu.times(cu));
  }
  if (!any) return null;
  if (nonZero <= 1) return last;
  return new Dec(Math.sqrt(sum.toNumber()));
}

export interface RoundedValue {
  /** Exact value as computed (decimal string). */
  value: string;
  /** Exact combined standard uncertainty, or null when none was given. */
  uncertainty: string | null;
  /** Value rounded to the decimal place of the rounded uncertainty. */
  roundedValue: string;
  /** Uncertainty to 2 significant digits when its first digit is 1 or 2, else 1 (common practice, no source). */
  roundedUncertainty: string | null;
  /** Display text, e.g. "2258 ± 12". */
  text: string;
}

export function roundWithUncertainty(value: Dec, uncertainty: Dec | null, fallbackDecimals = 2): RoundedValue {
  if (uncertainty === null || uncertainty.isZero()) {
    const roundedValue = value.toDecimalPlaces(fallbackDecimals).toFixed(fallbackDecimals);
    return {
      value: value.toString(),
      uncertainty: uncertainty === null ? null : '0',
      roundedValue,
      roundedUncertainty: uncertainty === null ? null : '0',
      text: uncertainty === null ? `${roundedValue} (no uncertainty given)` : roundedValue,
    };
  }
  const u = uncertainty.abs();
  const firstDigit = Number(u.toExponential(0, Dec.ROUND_DOWN).charAt(0));
  const digits = firstDigit <= 2 ? 2 : 1;
  const roundedU = u.toSignificantDigits(digits, Dec.ROUND_HALF_UP);
  // Decimal place (power of ten) of the last kept digit; a carry (0.96 → 1) moves it with the new digit.
  const place = roundedU.e - (digits - 1) + (roundedU.e > u.e && digits === 2 ? 1 : 0);
  const decimals = Math.max(0, -place);
  const scale = place > 0 ? new Dec(10).pow(place) : null;
  const roundedV = scale ? value.div(scale).toDecimalPlaces(0, Dec.ROUND_HALF_EVEN).times(scale) : value.toDecimalPlaces(decimals, Dec.ROUND_HALF_EVEN);
  const roundedUFinal = scale ? u.div(scale).toDecimalPlaces(0, Dec.ROUND_HALF_UP).times(scale) : u.toDecimalPlaces(decimals, Dec.ROUND_HALF_UP);
  const roundedValue = roundedV.toFixed(decimals);
  const roundedUncertainty = roundedUFinal.toFixed(decimals);
  return {
    value: value.toString(),
    uncertainty: uncertainty.toString(),
    roundedValue,
    roundedUncertainty,
    text: `${roundedValue} ± ${roundedUncertainty}`,
  };
}
