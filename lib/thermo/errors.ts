// The one error type the engine throws for bad input. Never carries a stack to the caller's UI:
// `code` is machine-readable, `field` is a path into the input (e.g. `steps[3].value`, `saltMass`).

export type ThermoErrorCode =
  | 'not_a_number'
  | 'out_of_range'
  | 'bad_formula'
  | 'unknown_element'
  | 'not_binary_ionic'
  | 'charge_not_stated'
  | 'impossible_charge'
  | 'charges_do_not_balance'
  | 'unknown_species'
  | 'unknown_property'
  | 'missing_values'
  | 'no_unknown'
  | 'too_many_unknowns'
  | 'unbalanced_reaction'
  | 'bad_reaction'
  | 'mixed_scales'
  | 'not_enough_readings'
  | 'unsupported';

export class ThermoInputError extends Error {
  readonly code: ThermoErrorCode;
  readonly field: string;
  /** Extra names the caller may show, e.g. the step keys that are missing. */
  readonly details: readonly string[];

  constructor(code: ThermoErrorCode, field: string, message: string, details: readonly string[] = []) {
    super(message);
    this.name = 'ThermoInputError';
    this.code = code;
    this.field = field;
    this.details = details;
  }

  toJSON(): { code: ThermoErrorCode; field: string; message: string; details: readonly string[] } {
    return { code: this.code, field: this.field, message: this.message, details: this.details };
  }
}

export function isThermoInputError(value: unknown): value is ThermoInputError {
  return value instanceof ThermoInputError;
}
