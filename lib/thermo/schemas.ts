// Zod schemas for the problem inputs. The server validates HTTP/sync payloads with these and maps a
// ZodError to 422 naming the failing fields; numbers may arrive as JSON numbers or decimal strings.
import { z } from 'zod';
import { HYDRATION_SCALES } from '../reference/properties';
import { ENERGY_BASES, LATTICE_CONVENTIONS } from './conventions';
import { MADELUNG_CONSTANTS } from './constants';

const DECIMAL_TEXT = /^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;

/** A finite JSON number or a decimal string (no NaN, Infinity or hex). */
export const numberInputSchema = z.union([
  z.number().refine(Number.isFinite, { message: 'Must be a finite number' }),
  z.string().max(64).regex(DECIMAL_TEXT, { message: 'Must be a decimal number' }),
]);

const nonNegative = numberInputSchema.refine((v) => Number(v) >= 0, { message: 'Cannot be negative' });
const positive = numberInputSchema.refine((v) => Number(v) > 0, { message: 'Must be greater than zero' });
const aboveAbsoluteZero = numberInputSchema.refine((v) => Number(v) > -273.15, { message: 'Below absolute zero (−273.15 °C)' });

export const valueInputSchema = z.union([
  numberInputSchema,
  z.object({
    value: numberInputSchema,
    uncertainty: nonNegative.nullable().optional(),
    source: z.string().max(500).optional(),
  }),
]);

const formulaSchema = z.string().trim().min(1).max(200);

export const modelInputSchema = z.object({
  structure: z.enum(Object.keys(MADELUNG_CONSTANTS) as [string, ...string[]]).optional(),
  madelungConstant: positive.optional(),
  interionicDistancePm: positive.optional(),
  cationRadiusPm: positive.optional(),
  anionRadiusPm: positive.optional(),
  bornExponent: positive.optional(),
  density: positive.optional(),
});

export const cycleProblemSchema = z.object({
  formula: formulaSchema,
  cationCharge: z.number().int().min(1).max(3).optional(),
  values: z
    .record(
      z.string().max(100),
      z.object({ value: numberInputSchema.nullable(), uncertainty: nonNegative.nullable().optional(), source: z.string().max(500).optional() }),
    )
    .optional(),
  unknown: z.string().max(100).optional(),
  basis: z.enum(ENERGY_BASES).optional(),
  /** Convention of a lattice value given in `values` and of the output. */
  convention: z.enum(LATTICE_CONVENTIONS).optional(),
  model: modelInputSchema.optional(),
});

const hydrationValueSchema = z.union([
  numberInputSchema,
  z.object({
    value: numberInputSchema,
    uncertainty: nonNegative.nullable().optional(),
    source: z.string().max(500).optional(),
    scale: z.enum(HYDRATION_SCALES).optional(),
  }),
]);

export const dissolutionProblemSchema = z.object({
  formula: formulaSchema,
  enthalpyOfFormation: valueInputSchema,
  ions: z
    .array(
      z.object({
        species: z.string().trim().min(1).max(50),
        count: z.number().int().min(1).max(20),
        enthalpyOfFormation: valueInputSchema,
        hydrationEnthalpy: hydrationValueSchema.optional(),
      }),
    )
    .min(1)
    .max(10),
  waterEnthalpyOfFormation: valueInputSchema.optional(),
  latticeEnthalpy: valueInputSchema.optional(),
  hydrationScale: z.enum(HYDRATION_SCALES).optional(),
});

const batchFieldsSchema = z.object({
  saltMassKg: nonNegative,
  waterMassKg: positive,
  startTemperatureC: aboveAbsoluteZero,
  heatCapacity: z.object({ value: positive, appliesTo: z.enum(['water', 'solution']) }).optional(),
});

export const batchHeatProblemSchema = batchFieldsSchema
  .extend({
    formula: formulaSchema,
    enthalpyOfSolution: valueInputSchema.optional(),
    dissolution: dissolutionProblemSchema.optional(),
  })
  .refine((v) => v.enthalpyOfSolution !== undefined || v.dissolution !== undefined, {
    message: 'Give enthalpyOfSolution or the dissolution data',
    path: ['enthalpyOfSolution'],
  });

export const reactionProblemSchema = z.object({
  reaction: z.string().trim().min(3).max(500),
  enthalpiesOfFormation: z.record(z.string().max(80), valueInputSchema).optional(),
  batch: z.object({ species: z.string().trim().min(1).max(80), massKg: positive }).optional(),
});

export const calorimetryProblemSchema = z
  .object({
    sampleMassG: positive,
    sampleMassUncertaintyG: nonNegative.nullable().optional(),
    waterMassG: positive,
    heatCapacityBasis: z.enum(['solution', 'water']).optional(),
    specificHeat: positive.optional(),
    calorimeterConstant: valueInputSchema.optional(),
    temperatures: z.object({ beforeC: aboveAbsoluteZero, afterC: aboveAbsoluteZero }).optional(),
    readings: z.array(z.object({ timeS: numberInputSchema, temperatureC: aboveAbsoluteZero })).max(10000).optional(),
    mixingTimeS: numberInputSchema.optional(),
    afterPeriodStartS: numberInputSchema.optional(),
    temperatureUncertaintyK: nonNegative.nullable().optional(),
    candidates: z.array(z.object({ formula: formulaSchema, predictedEnthalpyOfSolution: valueInputSchema })).min(1).max(20),
    toleranceKjPerMol: nonNegative.optional(),
  })
  .refine((v) => v.temperatures !== undefined || (v.readings !== undefined && v.mixingTimeS !== undefined && v.afterPeriodStartS !== undefined), {
    message: 'Give temperatures (before/after) or readings with mixingTimeS and afterPeriodStartS',
    path: ['temperatures'],
  });

export const solveRequestSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('cycle'), problem: cycleProblemSchema }),
  z.object({ kind: z.literal('dissolution'), problem: dissolutionProblemSchema, batch: batchFieldsSchema.optional() }),
  z.object({ kind: z.literal('reaction'), problem: reactionProblemSchema }),
  z.object({ kind: z.literal('calorimetry'), problem: calorimetryProblemSchema }),
]);

export type CycleProblem = z.infer<typeof cycleProblemSchema>;
export type DissolutionProblem = z.infer<typeof dissolutionProblemSchema>;
export type BatchHeatProblem = z.infer<typeof batchHeatProblemSchema>;
export type ReactionProblem = z.infer<typeof reactionProblemSchema>;
export type CalorimetryProblem = z.infer<typeof calorimetryProblemSchema>;
export type SolveRequest = z.infer<typeof solveRequestSchema>;
