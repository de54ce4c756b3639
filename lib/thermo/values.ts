// A value with its standard uncertainty and source, as the problem inputs carry them.
import { Dec, toDec, toUncertainty, type NumberInput } from './decimal';

export interface ValueInput {
  value: NumberInput;
  uncertainty?: NumberInput | null;
  source?: string;
}

export interface ResolvedValue {
  value: Dec;
  uncertainty: Dec | null;
  source: string | null;
}

export function resolveValue(input: unknown, field: string): ResolvedValue {
  if (input === null || typeof input !== 'object' || !('value' in input)) {
    // A bare number is accepted as a value without uncertainty.
    return { value: toDec(input, field), uncertainty: null, source: null };
  }
  const v = input as ValueInput;
  return {
    value: toDec(v.value, `${field}.value`),
    uncertainty: toUncertainty(v.uncertainty, `${field}.uncertainty`),
    source: typeof v.source === 'string' ? v.source : null,
  };
}
