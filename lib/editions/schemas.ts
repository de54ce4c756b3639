// zod schemas shared by the draft editor (forms), the CSV import and the route handlers.
import { z } from 'zod';
import { HYDRATION_SCALES, PHASES, PROPERTIES, PROPERTY_CODES, type PropertyCode, type ReferenceValue } from '@/lib/reference/properties';
import { parseFormula } from '@/lib/thermo/formula';
import { convertToStoredUnit } from './convert-unit';

/** The columns of a change list, in file order (our own names; see lib/editions/README.md). */
export const CHANGE_COLUMNS = [
  'action',
  'species',
  'phase',
  'charge',
  'property',
  'coordination',
  'value',
  'std_uncertainty',
  'unit',
  'structure',
  'hydration_scale',
  'source',
  'from_memory',
  'note',
] as const;
export type ChangeColumn = (typeof CHANGE_COLUMNS)[number];
/** Columns a file must have; the others may be left out (read as blank). */
export const REQUIRED_COLUMNS: ChangeColumn[] = ['action', 'species', 'phase', 'property', 'value', 'unit', 'source'];

export const LIMITS = { maxBytes: 2 * 1024 * 1024, maxRows: 10_000, text: 2000 } as const;

const DECIMAL = /^[+-]?\d+(\.\d+)?$/;
const text = (max: number) =>
  z.preprocess((v) => (v === undefined || v === null ? '' : typeof v === 'number' || typeof v === 'boolean' ? String(v) : v), z.string().max(max, `at most ${max} characters`)).transform((s) => s.trim());

const decimalText = (what: string) =>
  text(40).refine((s) => s === '' || DECIMAL.test(s), {
    message: `${what} must be a plain decimal number such as -411.2 (a dot as the decimal mark, no thousands separators or exponent)`,
  });

/** One row of a change list, as text fields (a CSV row or the editor's form). */
export const changeRowSchema = z
  .object({
    action: text(10).pipe(z.enum(['set', 'remove'], { message: 'action must be "set" or "remove"' })),
    species: text(64).pipe(z.string().min(1, 'species is required (a formula such as CaCl2, Cl- or Ca2+)')),
    phase: text(10).pipe(z.enum(PHASES, { message: `phase must be one of ${PHASES.join(', ')}` })),
    charge: text(3).refine((s) => s === '' || /^[+-]?\d$/.test(s), { message: 'charge must be a whole number from -9 to 9' }),
    property: text(40).pipe(z.enum(PROPERTY_CODES as [PropertyCode, ...PropertyCode[]], { message: 'unknown property code (see the template for the list)' })),
    coordination: text(3).refine((s) => s === '' || /^\d{1,2}$/.test(s), { message: 'coordination must be a whole number from 1 to 12' }),
    value: decimalText('value'),
    std_uncertainty: decimalText('std_uncertainty').refine((s) => !s.startsWith('-'), { message: 'std_uncertainty cannot be negative' }),
    unit: text(24),
    structure: text(60),
    hydration_scale: text(20).refine((s) => s === '' || (HYDRATION_SCALES as readonly string[]).includes(s), {
      message: `hydration_scale must be ${HYDRATION_SCALES.join(' or ')}`,
    }),
    source: text(LIMITS.text),
    from_memory: text(5).refine((s) => /^(|yes|no|true|false|1|0)$/i.test(s), { message: 'from_memory must be yes or no' }),
    note: text(LIMITS.text),
  })
  .superRefine((r, ctx) => {
    const issue = (column: ChangeColumn, message: string) => ctx.addIssue({ code: 'custom', path: [column], message });
    // The species must be a formula of known elements, and its charge must match the column.
    let formulaCharge: number | null = null;
    try {
      formulaCharge = parseFormula(r.species, 'species').charge;
    } catch (e) {
      issue('species', `unknown species "${r.species}": ${(e as Error).message}`);
    }
    const charge = r.charge === '' ? formulaCharge ?? 0 : Number(r.charge);
    if (formulaCharge !== null && charge !== formulaCharge) issue('charge', `charge ${charge} does not match the species "${r.species}" (charge ${formulaCharge})`);
    const coordination = r.coordination === '' ? null : Number(r.coordination);
    if (coordination !== null && (coordination < 1 || coordination > 12)) issue('coordination', 'coordination must be a whole number from 1 to 12');
    if (r.property === 'ionic_radius' && coordination === null) issue('coordination', 'an ionic radius needs its coordination number');
    if (r.property !== 'ionic_radius' && coordination !== null) issue('coordination', 'only ionic radii carry a coordination number');
    if (r.action === 'remove') return;
    if (r.value === '') issue('value', 'value is required for action "set"');
    const kind = PROPERTIES[r.property].kind;
    if (kind !== 'energy' && r.value.startsWith('-')) issue('value', `${r.property} cannot be negative`);
    if (r.unit === '' && PROPERTIES[r.property].unit !== '1') issue('unit', `unit is required (${PROPERTIES[r.property].unit} or a convertible unit)`);
    else if (r.value !== '' && DECIMAL.test(r.value)) {
      const conv = convertToStoredUnit(r.property, r.unit, r.value, null);
      if (!conv.ok) issue('unit', conv.message);
    }
    const fromMemory = /^(yes|true|1)$/i.test(r.from_memory);
    if (!fromMemory && r.source === '') issue('source', 'source is required: cite the table, edition and page, or set from_memory to yes');
    if (r.property === 'hydration_enthalpy' && r.hydration_scale === '') issue('hydration_scale', 'a hydration enthalpy needs its scale (conventional or absolute)');
    if (r.property !== 'hydration_enthalpy' && r.hydration_scale !== '') issue('hydration_scale', 'only hydration enthalpies carry a scale');
    if (r.property === 'madelung_constant' && r.structure === '') issue('structure', 'a Madelung constant needs its structure type');
  });
export type ChangeRowInput = z.input<typeof changeRowSchema>;
export type ChangeRow = z.output<typeof changeRowSchema>;

export type ValueChange =
  | { action: 'set'; value: ReferenceValue }
  | { action: 'remove'; key: Pick<ReferenceValue, 'species' | 'phase' | 'property' | 'coordination'> };

/** A valid row as a change in stored units (assumes `changeRowSchema` accepted it). */
export function rowToChange(r: ChangeRow): ValueChange {
  const coordination = r.coordination === '' ? undefined : Number(r.coordination);
  const key = { species: r.species, phase: r.phase, property: r.property, ...(coordination !== undefined ? { coordination } : {}) };
  if (r.action === 'remove') return { action: 'remove', key };
  const conv = convertToStoredUnit(r.property, r.unit, r.value, r.std_uncertainty === '' ? null : r.std_uncertainty);
  if (!conv.ok) throw new Error(conv.message);
  const fromMemory = /^(yes|true|1)$/i.test(r.from_memory);
  const note = [r.note, conv.converted].filter(Boolean).join('; ');
  const charge = r.charge === '' ? parseFormula(r.species).charge : Number(r.charge);
  const value: ReferenceValue = {
    species: r.species,
    phase: r.phase,
    charge,
    property: r.property,
    value: conv.value.replace(/^\+/, ''),
    uncertainty: conv.uncertainty,
    unit: PROPERTIES[r.property].unit,
    ...(coordination !== undefined ? { coordination } : {}),
    ...(r.structure ? { structure: r.structure } : {}),
    ...(r.hydration_scale ? { scale: r.hydration_scale as ReferenceValue['scale'] } : {}),
    source: r.source,
    fromMemory,
    ...(note ? { note } : {}),
  };
  return { action: 'set', value };
}

/** The editor's request: one or more change rows applied to a draft at once. */
export const applyChangesSchema = z.object({
  changes: z.array(z.record(z.string(), z.unknown())).min(1, 'send at least one change').max(LIMITS.maxRows),
  /** The draft revision the editor saw; a stale one is refused with 409 so no edit is overwritten blindly. */
  revision: z.number().int().positive().optional(),
});

export const createDraftSchema = z.object({
  changeSummary: z.string().trim().max(LIMITS.text).default(''),
});

export const updateDraftSchema = z.object({
  changeSummary: z.string().trim().min(1, 'describe what this edition changes and why').max(LIMITS.text),
});

export const rejectSchema = z.object({
  reason: z.string().trim().min(5, 'give the author a reason (at least 5 characters)').max(LIMITS.text),
});

export const diffQuerySchema = z.object({
  from: z.string().min(1, 'from: an edition id'),
  to: z.string().min(1, 'to: an edition id'),
});

export const historyQuerySchema = z.object({
  species: z.string().trim().min(1).max(64),
  phase: z.enum(PHASES),
  property: z.enum(PROPERTY_CODES as [PropertyCode, ...PropertyCode[]]),
  coordination: z.preprocess((v) => (v === '' || v === undefined ? undefined : Number(v)), z.number().int().min(1).max(12).optional()),
});
