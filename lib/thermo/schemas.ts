// zod/mini schemas for the problem inputs: `solve()` parses every request with them, on the device
// and on the server, and the server maps a failure to 422 naming the failing fields; numbers may
// arrive as JSON numbers or decimal strings. (zod/mini: the same parsing and messages as classic zod,
// but the device loads only the checks used here; see lib/validation/zod-mini.ts.)
import { HYDRATION_SCALES } from '../reference/properties';
import * as z from '../validation/zod-mini';
import { ENERGY_BASES, LATTICE_CONVENTIONS } from './conventions';
import { MADELUNG_CONSTANTS } from './constants';

const DECIMAL_TEXT = /^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;

/** A finite JSON number or a decimal string (no NaN, Infinity or hex). */
export const numberInputSchema = z.union([
  z.number().check(z.refine(Number.isFinite, { message: 'Must be a finite number' })),
  z.string().check(z.maxLength(64), z.regex(DECIMAL_TEXT, { message: 'Must be a decimal number' })),
]);

const nonNegative = numberInputSchema.check(z.refine((v) => Number(v) >= 0, { message: 'Cannot be negative' }));
const positive = numberInputSchema.check(z.refine((v) => Number(v) > 0, { message: 'Must be greater than zero' }));
const aboveAbsoluteZero = numberInputSchema.check(z.refine((v) => Number(v) > -273.15, { message: 'Below absolute zero (−273.15 °C)' }));
const uncertaintySchema = z.optional(z.nullable(nonNegative));
const sourceSchema = z.optional(z.string().check(z.maxLength(500)));

export const valueInputSchema = z.union([
  numberInputSchema,
  z.object({
    value: numberInputSchema,
    uncertainty: uncertaintySchema,
    source: sourceSchema,
  }),
]);

const formulaSchema = z.string().check(z.trim(), z.minLength(1), z.maxLength(200));

export const modelInputSchema = z.object({
  structure: z.optional(z.enum(Object.keys(MADELUNG_CONSTANTS) as [string, ...string[]])),
  madelungConstant: z.optional(positive),
  interionicDistancePm: z.optional(positive),
  cationRadiusPm: z.optional(positive),
  anionRadiusPm: z.optional(positive),
  bornExponent: z.optional(positive),
  density: z.optional(positive),
});

export const cycleProblemSchema = z.object({
  formula: formulaSchema,
  cationCharge: z.optional(z.number().check(z.int(), z.minimum(1), z.maximum(3))),
  values: z.optional(
    z.record(
      z.string().check(z.maxLength(100)),
      z.object({ value: z.nullable(numberInputSchema), uncertainty: uncertaintySchema, source: sourceSchema }),
    ),
  ),
  unknown: z.optional(z.string().check(z.maxLength(100))),
  basis: z.optional(z.enum(ENERGY_BASES)),
  /** Convention of a lattice value given in `values` and of the output. */
  convention: z.optional(z.enum(LATTICE_CONVENTIONS)),
  model: z.optional(modelInputSchema),
});

const hydrationValueSchema = z.union([
  numberInputSchema,
  z.object({
    value: numberInputSchema,
    uncertainty: uncertaintySchema,
    source: sourceSchema,
    scale: z.optional(z.enum(HYDRATION_SCALES)),
  }),
]);

export const dissolutionProblemSchema = z.object({
  formula: formulaSchema,
  enthalpyOfFormation: valueInputSchema,
  ions: z
    .array(
      z.object({
        species: z.string().check(z.trim(), z.minLength(1), z.maxLength(50)),
        count: z.number().check(z.int(), z.minimum(1), z.maximum(20)),
        enthalpyOfFormation: valueInputSchema,
        hydrationEnthalpy: z.optional(hydrationValueSchema),
      }),
    )
    .check(z.minLength(1), z.maxLength(10)),
  waterEnthalpyOfFormation: z.optional(valueInputSchema),
  latticeEnthalpy: z.optional(valueInputSchema),
  hydrationScale: z.optional(z.enum(HYDRATION_SCALES)),
});

const batchFieldsSchema = z.object({
  saltMassKg: nonNegative,
  waterMassKg: positive,
  startTemperatureC: aboveAbsoluteZero,
  heatCapacity: z.optional(z.object({ value: positive, appliesTo: z.enum(['water', 'solution']) })),
});

export const batchHeatProblemSchema = z
  .extend(batchFieldsSchema, {
    formula: formulaSchema,
    enthalpyOfSolution: z.optional(valueInputSchema),
    dissolution: z.optional(dissolutionProblemSchema),
  })
  .check(
    z.refine((v) => v.enthalpyOfSolution !== undefined || v.dissolution !== undefined, {
      message: 'Give enthalpyOfSolution or the dissolution data',
      path: ['enthalpyOfSolution'],
    }),
  );

export const reactionProblemSchema = z.object({
  reaction: z.string().check(z.trim(), z.minLength(3), z.maxLength(500)),
  enthalpiesOfFormation: z.optional(z.record(z.string().check(z.maxLength(80)), valueInputSchema)),
  batch: z.optional(z.object({ species: z.string().check(z.trim(), z.minLength(1), z.maxLength(80)), massKg: positive })),
});

export const calorimetryProblemSchema = z
  .object({
    sampleMassG: positive,
    sampleMassUncertaintyG: uncertaintySchema,
    waterMassG: positive,
    heatCapacityBasis: z.optional(z.enum(['solution', 'water'])),
    specificHeat: z.optional(positive),
    calorimeterConstant: z.optional(valueInputSchema),
    temperatures: z.optional(z.object({ beforeC: aboveAbsoluteZero, afterC: aboveAbsoluteZero })),
    readings: z.optional(z.array(z.object({ timeS: numberInputSchema, temperatureC: aboveAbsoluteZero })).check(z.maxLength(10000))),
    mixingTimeS: z.optional(numberInputSchema),
    afterPeriodStartS: z.optional(numberInputSchema),
    temperatureUncertaintyK: uncertaintySchema,
    candidates: z.array(z.object({ formula: formulaSchema, predictedEnthalpyOfSolution: valueInputSchema })).check(z.minLength(1), z.maxLength(20)),
    toleranceKjPerMol: z.optional(nonNegative),
  })
  .check(
    z.refine((v) => v.temperatures !== undefined || (v.readings !== undefined && v.mixingTimeS !== undefined && v.afterPeriodStartS !== undefined), {
      message: 'Give temperatures (before/after) or readings with mixingTimeS and afterPeriodStartS',
      path: ['temperatures'],
    }),
  );

/** A cycle request alone (what the cycle workbench sends): the `cycle` option of `solveRequestSchema`. */
export const cycleRequestSchema = z.object({ kind: z.literal('cycle'), problem: cycleProblemSchema });

export const solveRequestSchema = z.discriminatedUnion('kind', [
  cycleRequestSchema,
  z.object({ kind: z.literal('dissolution'), problem: dissolutionProblemSchema, batch: z.optional(batchFieldsSchema) }),
  z.object({ kind: z.literal('reaction'), problem: reactionProblemSchema }),
  z.object({ kind: z.literal('calorimetry'), problem: calorimetryProblemSchema }),
]);

export type CycleProblem = z.infer<typeof cycleProblemSchema>;
export type DissolutionProblem = z.infer<typeof dissolutionProblemSchema>;
export type BatchHeatProblem = z.infer<typeof batchHeatProblemSchema>;
export type ReactionProblem = z.infer<typeof reactionProblemSchema>;
export type CalorimetryProblem = z.infer<typeof calorimetryProblemSchema>;
export type SolveRequest = z.infer<typeof solveRequestSchema>;
