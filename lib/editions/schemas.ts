// Edition schemas as the CSV import and the routes take them. The ones the browser's forms share
// (change rows, the draft summary, the rejection reason) are in form-schemas.ts (zod/mini) and are
// handed to the routes through lib/validation/for-routes.ts; the rest are server-only, classic zod.
import { z } from 'zod';
import { PHASES, PROPERTIES, PROPERTY_CODES, type PropertyCode, type ReferenceValue } from '@/lib/reference/properties';
import { parseFormula } from '@/lib/thermo/formula';
import { forRoutes } from '@/lib/validation/for-routes';
import { convertToStoredUnit } from './convert-unit';
import * as forms from './form-schemas';
import { LIMITS, type ChangeRow } from './form-schemas';

export { CHANGE_COLUMNS, changeRowSchema, LIMITS, REQUIRED_COLUMNS, type ChangeColumn, type ChangeRow, type ChangeRowInput } from './form-schemas';

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

export const updateDraftSchema = forRoutes(forms.updateDraftSchema);
export const rejectSchema = forRoutes(forms.rejectSchema);

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
