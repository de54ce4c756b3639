// zod/mini for the schemas that also run in the browser (the synced records, the engine's request,
// the workbench and bench forms). It parses with zod's own core, so issues, paths and messages are
// classic zod's, but it is tree-shakable, where classic zod loads whole (about 36 kB gzipped).
// Server-only schemas (routes, admin, sync messages) stay on classic zod; both mix in one schema.
//
// Use it as a namespace — `import * as z from '@/lib/validation/zod-mini'` — never re-export it as a
// value: a namespace object passed around is kept whole by the bundler (every schema kind and every
// locale, about 55 kB gzipped). Only the parts listed here reach the browser; add what a schema needs.
import type { ZodError as ClassicZodError } from 'zod';
import { config } from 'zod/mini';
import { $constructor, $ZodError, _parse, flattenError, formatError, type $ZodIssue, type $ZodType, type output } from 'zod/v4/core';
import en from 'zod/v4/locales/en.js';

// zod/mini loads no locale (its default message is "Invalid input"); classic zod loads English.
// Load English here so a field's message is the same on the device and on the server.
config(en());

export {
  array,
  boolean,
  discriminatedUnion,
  email,
  enum,
  extend,
  int,
  iso,
  literal,
  looseObject,
  maximum,
  maxLength,
  minimum,
  minLength,
  nullable,
  number,
  object,
  optional,
  pipe,
  record,
  refine,
  regex,
  string,
  superRefine,
  toLowerCase,
  transform,
  trim,
  union,
  unknown,
} from 'zod/mini';
export type { infer, input, output, ZodMiniType } from 'zod/mini';

/**
 * What `parse` throws: zod's `ZodError` as classic zod defines it (an Error with `issues`, `format`,
 * `flatten`), so the server's `instanceof ZodError` (→ 422 naming the fields) and the tests
 * recognise it, made from zod's core so the device does not load classic zod for it. zod tells its
 * errors apart by a trait named "ZodError", not by prototype, which is what lets them meet.
 * Not exported: being Error-based, its own `instanceof` accepts any Error; use `isZodError`.
 */
// As zod prints issues (a bigint as text).
const jsonReplacer = (_key: string, value: unknown) => (typeof value === 'bigint' ? value.toString() : value);
const initZodError: (inst: $ZodError, issues: $ZodIssue[]) => void = $ZodError.init;
const ThrownZodError: $constructor<ClassicZodError> = $constructor(
  'ZodError',
  (inst: ClassicZodError, issues: $ZodIssue[]) => {
    initZodError(inst, issues);
    inst.name = 'ZodError';
    const own = (key: string, value: unknown) => Object.defineProperty(inst, key, { value, configurable: true, writable: true });
    own('format', (mapper?: (issue: $ZodIssue) => unknown) => formatError(inst, mapper as never));
    own('flatten', (mapper?: (issue: $ZodIssue) => unknown) => flattenError(inst, mapper as never));
    own('addIssue', (issue: $ZodIssue) => {
      inst.issues.push(issue);
      inst.message = JSON.stringify(inst.issues, jsonReplacer, 2);
    });
    own('addIssues', (more: $ZodIssue[]) => {
      inst.issues.push(...more);
      inst.message = JSON.stringify(inst.issues, jsonReplacer, 2);
    });
    Object.defineProperty(inst, 'isEmpty', { get: () => inst.issues.length === 0, configurable: true });
  },
  undefined,
  { Parent: Error },
);

/** Parse with a schema; throws zod's `ZodError` naming every failing field. */
export const parse: <T extends $ZodType>(schema: T, value: unknown) => output<T> = _parse(ThrownZodError);

/** True for a zod validation error, classic or mini (every one carries zod's base error trait). */
export const isZodError = (error: unknown): error is $ZodError => error instanceof $ZodError;
