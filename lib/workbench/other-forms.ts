// The typed forms of the dissolution, reaction and calorimetry sheets — what the user types, with
// its checks — and their empty forms. Kept apart from the builders (`*-sheet.ts`, which re-export
// them) because the sheet editor reads every kind's form (sheet-forms.ts) while only the kind on
// screen needs its builder: the cycle workbench does not load the other kinds' builders.
import * as z from '@/lib/validation/zod-mini';

const numberText = (label: string, check: (n: number) => boolean, message: string) =>
  z.string().check(
    z.trim(),
    z.minLength(1, { message: `Type the ${label}` }),
    z.refine((s) => Number.isFinite(Number(s)), { message: `The ${label} must be a number` }),
    z.refine((s) => check(Number(s)), { message }),
  );

export const dissolutionFormSchema = z.object({
  formula: z.string().check(z.trim(), z.minLength(1, { message: 'Type the formula of the salt, e.g. CaCl2 or MgCl2·6H2O' }), z.maxLength(60)),
  withBatch: z.boolean(),
  saltMassKg: numberText('salt mass', (n) => n >= 0, 'The salt mass cannot be negative'),
  waterMassKg: numberText('water mass', (n) => n > 0, 'The water mass must be more than zero'),
  startTemperatureC: numberText('start temperature', (n) => n > -273.15, 'Below absolute zero (−273.15 °C)'),
  /** Empty: the engine's default (4.184 J/(g·K) on the water alone, which overstates the rise). */
  specificHeat: z.string().check(z.trim(), z.refine((s) => s === '' || (Number.isFinite(Number(s)) && Number(s) > 0), { message: 'The specific heat must be a number above zero, or left empty' })),
  heatCapacityAppliesTo: z.enum(['water', 'solution']),
});
export type DissolutionForm = z.infer<typeof dissolutionFormSchema>;

export const EMPTY_DISSOLUTION_FORM: DissolutionForm = { formula: '', withBatch: true, saltMassKg: '250', waterMassKg: '1000', startTemperatureC: '25', specificHeat: '', heatCapacityAppliesTo: 'water' };

export const reactionFormSchema = z.object({
  reaction: z.string().check(z.trim(), z.minLength(1, { message: 'Write the reaction, e.g. CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)' }), z.maxLength(500)),
  batchSpecies: z.string().check(z.trim(), z.maxLength(80)),
  batchMassKg: z.string().check(z.trim(), z.refine((s) => s === '' || (Number.isFinite(Number(s)) && Number(s) > 0), { message: 'The batch mass must be a number above zero, or left empty' })),
  /** Values typed for species the edition lacks (kJ/mol), with their source. */
  entries: z.record(z.string(), z.object({ value: z.string(), source: z.string() })),
});
export type ReactionForm = z.infer<typeof reactionFormSchema>;

export const EMPTY_REACTION_FORM: ReactionForm = { reaction: '', batchSpecies: '', batchMassKg: '', entries: {} };

const positive = (label: string) =>
  z.string().check(
    z.trim(),
    z.minLength(1, { message: `Type the ${label}` }),
    z.refine((s) => Number.isFinite(Number(s)) && Number(s) > 0, { message: `The ${label} must be a number above zero` }),
  );
const temperature = (label: string) =>
  z.string().check(
    z.trim(),
    z.refine((s) => s === '' || (Number.isFinite(Number(s)) && Number(s) > -273.15), { message: `The ${label} must be a temperature in °C above −273.15` }),
  );
/** Empty, or a number the check accepts. */
const emptyOr = (check: (n: number) => boolean, message: string) =>
  z.string().check(
    z.trim(),
    z.refine((s) => s === '' || (Number.isFinite(Number(s)) && check(Number(s))), { message }),
  );

export const calorimetryFormSchema = z.object({
  salt: z.string().check(z.trim(), z.minLength(1, { message: 'Type the salt the lot should be, e.g. CaCl2' }), z.maxLength(60)),
  sampleMassG: positive('sample mass'),
  waterMassG: positive('water mass'),
  heatCapacityBasis: z.enum(['solution', 'water']),
  specificHeat: emptyOr((n) => n > 0, 'The specific heat must be a number above zero, or left empty'),
  calorimeterConstant: emptyOr((n) => n >= 0, 'The calorimeter constant must be a number, zero or more (J/K)'),
  /** 'pair': before/after temperatures; 'readings': time,temperature lines with the mixing time. */
  mode: z.enum(['pair', 'readings']),
  beforeC: temperature('temperature before'),
  afterC: temperature('temperature after'),
  readings: z.string().check(z.maxLength(200_000)),
  mixingTimeS: z.string().check(z.trim()),
  afterPeriodStartS: z.string().check(z.trim()),
  toleranceKjPerMol: emptyOr((n) => n >= 0, 'The tolerance must be a number, zero or more'),
});
export type CalorimetryForm = z.infer<typeof calorimetryFormSchema>;

export const EMPTY_CALORIMETRY_FORM: CalorimetryForm = {
  salt: '',
  sampleMassG: '',
  waterMassG: '100',
  heatCapacityBasis: 'solution',
  specificHeat: '',
  calorimeterConstant: '',
  mode: 'pair',
  beforeC: '',
  afterC: '',
  readings: '',
  mixingTimeS: '',
  afterPeriodStartS: '',
  toleranceKjPerMol: '',
};
