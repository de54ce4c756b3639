// GUM-style combination of uncorrelated standard uncertainties, and rounding of value ± u to
// justified significant figures while the exact value is kept alongside.
import { Dec } from './decimal';

export interface UncertainTerm {
  /** Sensitivity coefficient (the step's stoichiometric coefficient for a linear sum). */
  coefficient: Dec;
  uncertainty: Dec | null;
}

/** u = sqrt(Σ (c_i·u_i)²); null when no term carries an uncertainty. Terms without one count as exact. */
export function combineInQuadrature(terms: readonly UncertainTerm[]): Dec | null {
  let sum = new Dec(0);
  let any = false;
  for (const term of terms) {
    if (term.uncertainty === null) continue;
    any = true;
    sum = sum.plus(term.coefficient.times(term.uncertainty).pow(2));
  }
  return any ? sum.sqrt() : null;
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
  const exponent = uncertainty.abs().e; // power of ten of the first significant digit
  const firstDigit = uncertainty.abs().div(new Dec(10).pow(exponent)).floor().toNumber();
  const digits = firstDigit <= 2 ? 2 : 1;
  let place = exponent - (digits - 1); // decimal place (power of ten) of the last kept digit
  let roundedU = uncertainty.div(new Dec(10).pow(place)).toDecimalPlaces(0, Dec.ROUND_HALF_UP).times(new Dec(10).pow(place));
  // Rounding can carry into a new digit (e.g. 0.96 → 1.0); keep the place consistent with it.
  if (roundedU.e > exponent && digits === 1) place = roundedU.e;
  roundedU = uncertainty.div(new Dec(10).pow(place)).toDecimalPlaces(0, Dec.ROUND_HALF_UP).times(new Dec(10).pow(place));
  const decimals = Math.max(0, -place);
  const roundedV = value.div(new Dec(10).pow(place)).toDecimalPlaces(0, Dec.ROUND_HALF_EVEN).times(new Dec(10).pow(place));
  const roundedValue = roundedV.toFixed(decimals);
  const roundedUncertainty = roundedU.toFixed(decimals);
  return {
    value: value.toString(),
    uncertainty: uncertainty.toString(),
    roundedValue,
    roundedUncertainty,
    text: `${roundedValue} ± ${roundedUncertainty}`,
  };
}
