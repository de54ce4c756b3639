'use client';
// The dissolution, reaction and calorimetry workbenches with their builders, in one module the
// sheet editor loads only for those kinds: the cycle workbench's first load stays small (no
// react-hook-form, no other panels).
import type { CalorimetryForm } from '@/lib/workbench/calorimetry-sheet';
import { buildCalorimetrySheet } from '@/lib/workbench/calorimetry-sheet';
import { buildDissolutionSheet, type DissolutionForm, type SheetBuild } from '@/lib/workbench/dissolution-sheet';
import type { DisplayUnit } from '@/lib/workbench/format-energy';
import { buildReactionSheet, type ReactionForm } from '@/lib/workbench/reaction-sheet';
import type { ValueSource } from '@/lib/workbench/value-source';
import { CalorimetryWorkbench } from './calorimetry-workbench';
import { DissolutionWorkbench } from './dissolution-workbench';
import { ReactionWorkbench } from './reaction-workbench';
import type { AnyForm } from './sheet-forms';

export type OtherForm = Exclude<AnyForm, { kind: 'cycle' }>;
export type OtherBuild =
  | { kind: 'dissolution'; b: SheetBuild }
  | { kind: 'reaction'; b: ReturnType<typeof buildReactionSheet> }
  | { kind: 'calorimetry'; b: ReturnType<typeof buildCalorimetrySheet> };

export function buildOther(form: OtherForm, values: ValueSource): OtherBuild {
  switch (form.kind) {
    case 'dissolution':
      return { kind: 'dissolution', b: buildDissolutionSheet(form.form, values) };
    case 'reaction':
      return { kind: 'reaction', b: buildReactionSheet(form.form, values) };
    case 'calorimetry':
      return { kind: 'calorimetry', b: buildCalorimetrySheet(form.form, values) };
  }
}

export interface OtherKindPanelProps {
  form: OtherForm;
  built: OtherBuild;
  onChange: (f: OtherForm) => void;
  unit: DisplayUnit;
  suggestions: string[];
  locked: boolean;
}

export function OtherKindPanel({ form, built, onChange, unit, suggestions, locked }: OtherKindPanelProps) {
  if (form.kind === 'dissolution' && built.kind === 'dissolution') {
    return <DissolutionWorkbench defaults={form.form} onChange={(f: DissolutionForm) => onChange({ kind: 'dissolution', form: f })} build={built.b} unit={unit} suggestions={suggestions} locked={locked} />;
  }
  if (form.kind === 'reaction' && built.kind === 'reaction') {
    return <ReactionWorkbench defaults={form.form} onChange={(f: ReactionForm) => onChange({ kind: 'reaction', form: f })} build={built.b} unit={unit} locked={locked} />;
  }
  if (form.kind === 'calorimetry' && built.kind === 'calorimetry') {
    return <CalorimetryWorkbench defaults={form.form} onChange={(f: CalorimetryForm) => onChange({ kind: 'calorimetry', form: f })} build={built.b} unit={unit} suggestions={suggestions} locked={locked} />;
  }
  return null;
}
