// An inline message for one place on a form: `field` names where (e.g. `formula`,
// `entries.ionization_energy_1:Ca.reason`), `message` says what is wrong in plain words.
export interface FieldError {
  field: string;
  message: string;
}

export function errorFor(errors: readonly FieldError[], field: string): string | undefined {
  return errors.find((e) => e.field === field)?.message;
}

/** Map the engine's error field names (e.g. `problem.values.x.value`, `reaction`) to form fields. */
export function engineErrors(errors: ReadonlyArray<{ field: string; message: string }>, map: (engineField: string) => string): FieldError[] {
  return errors.map((e) => ({ field: map(e.field), message: e.message }));
}
