// The change-row and review schemas shared by the draft editor and review forms (in the browser),
// the CSV import and the routes (which take them through lib/editions/schemas.ts). zod/mini: see
// lib/validation/zod-mini.ts.
import { HYDRATION_SCALES, PHASES, PROPERTIES, PROPERTY_CODES, type PropertyCode } from '@/lib/reference/properties';
import { parseFormula } from '@/lib/thermo/formula';
import * as z from '@/lib/validation/zod-mini';
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
// zod's `preprocess` is a pipe from a transform, which is how it is written here.
const text = (max: number) =>
  z.pipe(
    z.pipe(
      z.transform((v: unknown) => (v === undefined || v === null ? '' : typeof v === 'number' || typeof v === 'boolean' ? String(v) : v)),
      z.string().check(z.maxLength(max, `at most ${max} characters`)),
    ),
    z.transform((s: string) => s.trim()),
  );

const decimalText = (what: string) =>
  text(40).check(
    z.refine((s) => s === '' || DECIMAL.test(s), {
      message: `${what} must be a plain decimal number such as -411.2 (a dot as the decimal mark, no thousands separators or exponent)`,
    }),
  );

/** One row of a change list, as text fields (a CSV row or the editor's form). */
export const changeRowSchema = z
  .object({
    action: z.pipe(text(10), z.enum(['set', 'remove'], { message: 'action must be "set" or "remove"' })),
    species: z.pipe(text(64), z.string().check(z.minLength(1, 'species is required (a formula such as CaCl2, Cl- or Ca2+)'))),
    phase: z.pipe(text(10), z.enum(PHASES, { message: `phase must be one of ${PHASES.join(', ')}` })),
    charge: text(3).check(z.refine((s) => s === '' || /^[+-]?\d$/.test(s), { message: 'charge must be a whole number from -9 to 9' })),
    property: z.pipe(text(40), z.enum(PROPERTY_CODES as [PropertyCode, ...PropertyCode[]], { message: 'unknown property code (see the template for the list)' })),
    coordination: text(3).check(z.refine((s) => s === '' || /^\d{1,2}$/.test(s), { message: 'coordination must be a whole number from 1 to 12' })),
    value: decimalText('value'),
    std_uncertainty: decimalText('std_uncertainty').check(z.refine((s) => !s.startsWith('-'), { message: 'std_uncertainty cannot be negative' })),
    unit: text(24),
    structure: text(60),
    hydration_scale: text(20).check(
      z.refine((s) => s === '' || (HYDRATION_SCALES as readonly string[]).includes(s), {
        message: `hydration_scale must be ${HYDRATION_SCALES.join(' or ')}`,
      }),
    ),
    source: text(LIMITS.text),
    from_memory: text(5).check(z.refine((s) => /^(|yes|no|true|false|1|0)$/i.test(s), { message: 'from_memory must be yes or no' })),
    note: text(LIMITS.text),
  })
  .check(
    z.superRefine((r, ctx) => {
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
      // An unknown or over-long property code is already an issue of its own column; zod still runs
      // this check on the rest of the row, so nothing below may assume a known code.
      if (!Object.hasOwn(PROPERTIES, r.property)) return;
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
    }),
  );
export type ChangeRowInput = z.input<typeof changeRowSchema>;
export type ChangeRow = z.output<typeof changeRowSchema>;

export const updateDraftSchema = z.object({
  changeSummary: z.string().check(z.trim(), z.minLength(1, 'describe what this edition changes and why'), z.maxLength(LIMITS.text)),
});

export const rejectSchema = z.object({
  reason: z.string().check(z.trim(), z.minLength(5, 'give the author a reason (at least 5 characters)'), z.maxLength(LIMITS.text)),
});
