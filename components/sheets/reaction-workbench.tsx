'use client';
// Reaction (Hess) sheet: the reaction as written, ΔrH° from formation enthalpies in the edition,
// a batch figure, and values typed (with their source) for species the edition lacks.
import { Controller } from 'react-hook-form';
import { FLUORIDE_CAUTION } from '@/lib/thermo/engine';
import { errorFor } from '@/lib/workbench/field-error';
import { energyText, formatNumber, formatRounded, type DisplayUnit } from '@/lib/workbench/format-energy';
import { reactionFormSchema, reactionTerms, type ReactionForm } from '@/lib/workbench/reaction-sheet';
import type { SheetBuild } from '@/lib/workbench/dissolution-sheet';
import { Cautions } from './cautions';
import { Field } from '@/components/ui/field';
import { useMarkCommit } from './perf-marks';
import { useFieldMessages, useLiveForm } from './use-live-form';

export interface ReactionWorkbenchProps {
  defaults: ReactionForm;
  onChange: (f: ReactionForm) => void;
  build: SheetBuild & { missing: string[] };
  unit: DisplayUnit;
  locked: boolean;
}

export function ReactionWorkbench({ defaults, onChange, build, unit, locked }: ReactionWorkbenchProps) {
  const form = useLiveForm(reactionFormSchema, defaults, onChange);
  const { register, control, watch } = form;
  useMarkCommit(build);
  const { err, waiting } = useFieldMessages(form, build.errors);
  const r = build.outcome?.kind === 'reaction' ? build.outcome.result : null;
  const parsed = reactionTerms(watch('reaction'));
  const terms = parsed ? [...parsed.reactants, ...parsed.products] : [];
  const fluorideInAcid = terms.some((t) => (t.parsed.elements.F ?? 0) > 0) && terms.some((t) => t.phase === 'aq' && (t.parsed.elements.H ?? 0) > 0 && t.parsed.charge >= 0 && !(t.parsed.elements.O && t.species === 'H2O'));
  return (
    <fieldset disabled={locked} className="space-y-6">
      <legend className="sr-only">Reaction inputs</legend>
      <Field label="Reaction" error={err('reaction')} hint="Species with their phase: (cr), (l), (g) or (aq); e.g. CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)">
        {(p) => <input {...p} {...register('reaction')} className="field-input font-medium" autoComplete="off" spellCheck={false} />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Batch: species charged" error={err('batchSpecies')} hint="Optional, e.g. CaO(cr)">
          {(p) => <input {...p} {...register('batchSpecies')} className="field-input" autoComplete="off" />}
        </Field>
        <Field label="Batch: mass charged (kg)" error={err('batchMassKg')}>
          {(p) => <input {...p} {...register('batchMassKg')} inputMode="decimal" className="field-input tabular-nums" />}
        </Field>
      </div>
      {build.missing.length > 0 ? (
        <div className="panel space-y-3">
          <h2>Values the edition lacks</h2>
          {build.missing.map((key) => (
            <div key={key} className="grid gap-3 sm:grid-cols-[10rem_1fr]">
              <Controller
                control={control}
                name={`entries.${key}.value` as 'entries'}
                render={({ field }) => (
                  <Field label={`ΔfH° of ${key} (kJ/mol)`} error={errorFor(build.errors, `entries.${key}.value`)}>
                    {(p) => <input {...p} inputMode="decimal" className="field-input" value={(field.value as unknown as string) ?? ''} onChange={field.onChange} />}
                  </Field>
                )}
              />
              <Controller
                control={control}
                name={`entries.${key}.source` as 'entries'}
                render={({ field }) => (
                  <Field label="Source of this value" error={errorFor(build.errors, `entries.${key}.source`)}>
                    {(p) => <input {...p} className="field-input" value={(field.value as unknown as string) ?? ''} onChange={field.onChange} />}
                  </Field>
                )}
              />
            </div>
          ))}
        </div>
      ) : null}
      <section aria-labelledby="rxn-result" className={`panel ${r ? 'border-verdigris-500' : 'border-ember-500 bg-ember-50'}`}>
        <h2 id="rxn-result">Reaction enthalpy</h2>
        {r ? (
          <>
            <p className="text-3xl font-semibold tracking-tight" data-testid="result-value" aria-live="polite">
              {energyText(r.reactionEnthalpy.value, unit, r.reactionEnthalpy.uncertainty)}
            </p>
            <p className="text-sm text-ink-soft">{r.basis}</p>
            <table className="mt-3 w-full border-collapse text-sm">
              <caption className="sr-only">Formation enthalpies used</caption>
              <thead>
                <tr className="border-b border-rule text-left text-ink-soft">
                  <th scope="col" className="py-2 pr-2 font-medium">
                    Species
                  </th>
                  <th scope="col" className="py-2 pr-2 font-medium">
                    ΔfH°
                  </th>
                  <th scope="col" className="py-2 font-medium">
                    Source
                  </th>
                </tr>
              </thead>
              <tbody>
                {r.terms.map((t) => (
                  <tr key={t.key} className="border-b border-rule">
                    <th scope="row" className="py-2 pr-2 text-left font-normal">
                      {t.side === 'reactant' ? 'reactant' : 'product'}: {t.coefficient !== '1' ? `${t.coefficient} ` : ''}
                      {t.key}
                    </th>
                    <td className="py-2 pr-2 tabular-nums">{energyText(t.enthalpyOfFormation, unit, t.uncertainty)}</td>
                    <td className="py-2 text-xs text-ink-soft">{t.source ?? '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            {r.batch ? (
              <p className="mt-3 text-lg font-semibold tabular-nums">
                Batch ({r.batch.massKg} kg of {r.batch.species}): {formatRounded(r.batch.enthalpyChangeKj, 0)} kJ — heat released {formatNumber(r.batch.heatReleasedKj, 0)} kJ
              </p>
            ) : null}
            <ul className="mt-2 list-disc pl-5 text-sm text-ink-soft">
              {r.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          </>
        ) : (
          <p className="text-sm">{waiting ? 'Not solved yet — write the reaction to begin.' : 'Not solved yet — see the messages above.'}</p>
        )}
      </section>
      {r?.batch || fluorideInAcid ? (
        <Cautions
          items={[
            'This is an estimate: the reaction is taken as complete and as written, at 298 K standard states.',
            "Follow the site's process-safety procedures, local codes and licensed practice.",
            ...(fluorideInAcid ? [FLUORIDE_CAUTION] : []),
          ]}
        />
      ) : null}
    </fieldset>
  );
}
