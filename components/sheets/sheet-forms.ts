// The typed form state of each sheet kind, kept in the sheet's problem (`problem.form`) so a saved
// sheet reopens exactly as typed: overrides with their reasons, units, the unknown, batch inputs.
import type { Sheet, SheetKind } from '@/lib/sheets/sheet-schema';
import { EMPTY_CYCLE_FORM, type CycleForm } from '@/lib/workbench/cycle-sheet';
// The other kinds' forms without their builders, which load with their panels (other-kinds.tsx).
import {
  calorimetryFormSchema,
  dissolutionFormSchema,
  EMPTY_CALORIMETRY_FORM,
  EMPTY_DISSOLUTION_FORM,
  EMPTY_REACTION_FORM,
  reactionFormSchema,
  type CalorimetryForm,
  type DissolutionForm,
  type ReactionForm,
} from '@/lib/workbench/other-forms';

export type AnyForm = { kind: 'cycle'; form: CycleForm } | { kind: 'dissolution'; form: DissolutionForm } | { kind: 'reaction'; form: ReactionForm } | { kind: 'calorimetry'; form: CalorimetryForm };

/** The form stored with a sheet, else one read back from its problem, else an empty one. */
export function formOf(kind: SheetKind, sheet: Sheet | null): AnyForm {
  const stored = (sheet?.problem as { form?: unknown; problem?: Record<string, unknown> } | null) ?? null;
  const f = stored?.form as Record<string, unknown> | undefined;
  const p = stored?.problem;
  switch (kind) {
    case 'cycle': {
      if (f && typeof f.formula === 'string') return { kind, form: { ...EMPTY_CYCLE_FORM, ...(f as Partial<CycleForm>) } };
      return { kind, form: { ...EMPTY_CYCLE_FORM, formula: typeof p?.formula === 'string' ? p.formula : '', unknown: typeof p?.unknown === 'string' ? p.unknown : null } };
    }
    case 'dissolution': {
      const parsed = dissolutionFormSchema.safeParse({ ...EMPTY_DISSOLUTION_FORM, ...f });
      return { kind, form: parsed.success ? parsed.data : { ...EMPTY_DISSOLUTION_FORM, ...(f as Partial<DissolutionForm>), formula: typeof p?.formula === 'string' ? p.formula : String(f?.formula ?? '') } };
    }
    case 'reaction': {
      const parsed = reactionFormSchema.safeParse({ ...EMPTY_REACTION_FORM, ...f });
      return { kind, form: parsed.success ? parsed.data : { ...EMPTY_REACTION_FORM, reaction: typeof p?.reaction === 'string' ? p.reaction : '' } };
    }
    case 'calorimetry': {
      const parsed = calorimetryFormSchema.safeParse({ ...EMPTY_CALORIMETRY_FORM, ...f });
      return { kind, form: parsed.success ? parsed.data : { ...EMPTY_CALORIMETRY_FORM, ...(f as Partial<CalorimetryForm>) } };
    }
  }
}
