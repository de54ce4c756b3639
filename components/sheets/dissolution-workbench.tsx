'use client';
// Dissolution and batch heat: ΔsolH (primary route) and its lattice + hydration decomposition;
// batch inputs; heat released, final temperature, a warning before boiling; cautions beside them.
import { dissolutionFormSchema, type DissolutionForm, type SheetBuild } from '@/lib/workbench/dissolution-sheet';
import { energyText, formatNumber, formatRounded, type DisplayUnit } from '@/lib/workbench/format-energy';
import { Cautions } from './cautions';
import { Field } from '@/components/ui/field';
import { useMarkCommit } from './perf-marks';
import { useFieldMessages, useLiveForm } from './use-live-form';

export interface DissolutionWorkbenchProps {
  defaults: DissolutionForm;
  onChange: (f: DissolutionForm) => void;
  build: SheetBuild;
  unit: DisplayUnit;
  suggestions: string[];
  locked: boolean;
}

export function DissolutionWorkbench({ defaults, onChange, build, unit, suggestions, locked }: DissolutionWorkbenchProps) {
  const form = useLiveForm(dissolutionFormSchema, defaults, onChange);
  const { register, watch } = form;
  useMarkCommit(build);
  const { err: message, waiting } = useFieldMessages(form, build.errors);
  const err = (f: keyof DissolutionForm) => message(f);
  const withBatch = watch('withBatch');
  const r = build.outcome?.kind === 'dissolution' ? build.outcome : null;
  return (
    <fieldset disabled={locked} className="space-y-6">
      <legend className="sr-only">Dissolution inputs</legend>
      <Field label="Salt (anhydrous or a hydrate)" error={err('formula')} hint="e.g. CaCl2, LiCl, MgCl2·6H2O (write the dot as . or ·)">
        {(p) => (
          <>
            <input {...p} {...register('formula')} className="field-input font-medium" list="dissolution-suggestions" autoComplete="off" spellCheck={false} />
            <datalist id="dissolution-suggestions">
              {suggestions.map((s) => (
                <option key={s} value={s} />
              ))}
            </datalist>
          </>
        )}
      </Field>
      <label className="flex min-h-touch items-center gap-3 text-sm">
        <input type="checkbox" className="h-5 w-5" {...register('withBatch')} /> Estimate the batch heat of a dissolver charge
      </label>
      {withBatch ? (
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label="Salt charged (kg)" error={err('saltMassKg')}>
            {(p) => <input {...p} {...register('saltMassKg')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Water in the vessel (kg)" error={err('waterMassKg')}>
            {(p) => <input {...p} {...register('waterMassKg')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Start temperature (°C)" error={err('startTemperatureC')}>
            {(p) => <input {...p} {...register('startTemperatureC')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Specific heat, J/(g·K)" error={err('specificHeat')} hint="Empty: 4.184 on the water alone (does not understate the rise).">
            {(p) => <input {...p} {...register('specificHeat')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Heat capacity applies to" error={err('heatCapacityAppliesTo')}>
            {(p) => (
              <select {...p} {...register('heatCapacityAppliesTo')} className="field-input">
                <option value="water">the water only</option>
                <option value="solution">the whole solution</option>
              </select>
            )}
          </Field>
        </div>
      ) : null}

      <section aria-labelledby="diss-result" className={`panel ${r ? 'border-verdigris-500' : 'border-ember-500 bg-ember-50'}`}>
        <h2 id="diss-result">Enthalpy of solution</h2>
        {r ? (
          <>
            <p className="text-3xl font-semibold tracking-tight" data-testid="result-value" aria-live="polite">
              {energyText(r.result.enthalpyOfSolution.value, unit, r.result.enthalpyOfSolution.uncertainty)}
            </p>
            <p className="text-sm text-ink-soft">{r.result.process}</p>
            <p className="text-sm text-ink-soft">{r.result.basis}</p>
            {r.result.explanation ? (
              <div className="mt-3 rounded border border-rule p-3 text-sm">
                <p className="font-medium">Why: lattice + hydration ({r.result.explanation.scale} scale)</p>
                <p className="tabular-nums">
                  {energyText(r.result.explanation.latticeEnthalpy, unit)} (lattice, dissociation) + {energyText(r.result.explanation.hydrationSum, unit)} (hydration of the ions) = {energyText(r.result.explanation.enthalpyOfSolution.value, unit)}
                </p>
                <p className="text-ink-soft">
                  Difference from the primary value: {energyText(r.result.explanation.difference.value, unit)}. {r.result.explanation.note}
                </p>
              </div>
            ) : null}
            {r.result.notes.length > 0 ? (
              <ul className="mt-2 list-disc pl-5 text-sm text-ink-soft">
                {r.result.notes.map((n) => (
                  <li key={n}>{n}</li>
                ))}
              </ul>
            ) : null}
          </>
        ) : (
          <p className="text-sm">{waiting ? 'Not solved yet — type the formula of the salt to begin.' : 'Not solved yet — see the messages above.'}</p>
        )}
      </section>

      {r?.batchHeat ? (
        <section aria-labelledby="batch-result" className="panel">
          <h2 id="batch-result">Batch heat</h2>
          <div className="mt-2 grid gap-4 sm:grid-cols-[1fr_1fr]">
            <dl className="space-y-2">
              <div>
                <dt className="text-sm text-ink-soft">{r.batchHeat.exothermic ? 'Heat released to the batch' : 'Heat taken up (the batch cools)'}</dt>
                <dd className="text-2xl font-semibold tabular-nums">
                  {formatRounded(r.batchHeat.heatReleasedKj, 0)} kJ <span className="text-base font-normal text-ink-soft">({formatNumber(r.batchHeat.heatReleasedKwh, 2)} kWh)</span>
                </dd>
              </div>
              <div>
                <dt className="text-sm text-ink-soft">Adiabatic temperature change (upper bound)</dt>
                <dd className="text-xl font-semibold tabular-nums">{formatRounded(r.batchHeat.temperatureChangeK, 1)} K</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-soft">Final temperature</dt>
                <dd className={`text-xl font-semibold tabular-nums ${r.batchHeat.reachesBoiling || r.batchHeat.nearBoiling ? 'text-ember-700' : ''}`} data-testid="final-temperature">
                  {formatRounded(r.batchHeat.finalTemperatureC, 1)} °C
                </dd>
              </div>
              <div>
                <dt className="text-sm text-ink-soft">Heat capacity assumed</dt>
                <dd className="text-sm">{r.batchHeat.heatCapacityAssumption}</dd>
              </div>
            </dl>
            <Cautions items={r.batchHeat.cautions} warnings={r.batchHeat.warnings} />
          </div>
        </section>
      ) : null}
    </fieldset>
  );
}
