'use client';
// Calorimetry sheet: a solution-calorimetry run reduced to ΔsolH, compared with the forms the
// edition knows (anhydrous and hydrates), with the verdict on which form the lot is.
import { calorimetryFormSchema, type CalorimetryForm } from '@/lib/workbench/calorimetry-sheet';
import type { SheetBuild } from '@/lib/workbench/dissolution-sheet';
import { energyText, formatNumber, formatRounded, type DisplayUnit } from '@/lib/workbench/format-energy';
import { Field } from '@/components/ui/field';
import { useMarkCommit } from './perf-marks';
import { useFieldMessages, useLiveForm } from './use-live-form';

export interface CalorimetryWorkbenchProps {
  defaults: CalorimetryForm;
  onChange: (f: CalorimetryForm) => void;
  build: SheetBuild & { candidates: string[] };
  unit: DisplayUnit;
  suggestions: string[];
  locked: boolean;
}

export function CalorimetryWorkbench({ defaults, onChange, build, unit, suggestions, locked }: CalorimetryWorkbenchProps) {
  const form = useLiveForm(calorimetryFormSchema, defaults, onChange);
  const { register, watch } = form;
  useMarkCommit(build);
  const { err: message, waiting } = useFieldMessages(form, build.errors);
  const err = (f: keyof CalorimetryForm) => message(f);
  const mode = watch('mode');
  const r = build.outcome?.kind === 'calorimetry' ? build.outcome.result : null;
  return (
    <fieldset disabled={locked} className="space-y-6">
      <legend className="sr-only">Calorimetry run</legend>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Salt the lot should be" error={err('salt')} hint="Anhydrous formula; its hydrates are compared too.">
          {(p) => (
            <>
              <input {...p} {...register('salt')} className="field-input font-medium" list="calorimetry-suggestions" autoComplete="off" spellCheck={false} />
              <datalist id="calorimetry-suggestions">
                {suggestions.map((s) => (
                  <option key={s} value={s} />
                ))}
              </datalist>
            </>
          )}
        </Field>
        <Field label="Sample mass (g)" error={err('sampleMassG')}>
          {(p) => <input {...p} {...register('sampleMassG')} inputMode="decimal" className="field-input tabular-nums" />}
        </Field>
        <Field label="Water mass (g)" error={err('waterMassG')}>
          {(p) => <input {...p} {...register('waterMassG')} inputMode="decimal" className="field-input tabular-nums" />}
        </Field>
        <Field label="Heat capacity applies to" error={err('heatCapacityBasis')}>
          {(p) => (
            <select {...p} {...register('heatCapacityBasis')} className="field-input">
              <option value="solution">the whole solution</option>
              <option value="water">the water only</option>
            </select>
          )}
        </Field>
        <Field label="Specific heat, J/(g·K)" error={err('specificHeat')} hint="Empty: 4.184">
          {(p) => <input {...p} {...register('specificHeat')} inputMode="decimal" className="field-input tabular-nums" />}
        </Field>
        <Field label="Calorimeter constant (J/K)" error={err('calorimeterConstant')} hint="Empty: none">
          {(p) => <input {...p} {...register('calorimeterConstant')} inputMode="decimal" className="field-input tabular-nums" />}
        </Field>
      </div>
      <fieldset>
        <legend className="field-label">Temperatures</legend>
        <div className="mt-1 flex flex-wrap gap-4">
          <label className="flex min-h-touch items-center gap-2 text-sm">
            <input type="radio" value="pair" className="h-5 w-5" {...register('mode')} /> Before and after
          </label>
          <label className="flex min-h-touch items-center gap-2 text-sm">
            <input type="radio" value="readings" className="h-5 w-5" {...register('mode')} /> Readings over time (extrapolated to mixing)
          </label>
        </div>
      </fieldset>
      {mode === 'pair' ? (
        <div className="grid gap-4 sm:grid-cols-3">
          <Field label="Temperature before mixing (°C)" error={err('beforeC')}>
            {(p) => <input {...p} {...register('beforeC')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Temperature after mixing (°C)" error={err('afterC')}>
            {(p) => <input {...p} {...register('afterC')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
          <Field label="Match tolerance (kJ/mol)" error={err('toleranceKjPerMol')} hint="Empty: ±3">
            {(p) => <input {...p} {...register('toleranceKjPerMol')} inputMode="decimal" className="field-input tabular-nums" />}
          </Field>
        </div>
      ) : (
        <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
          <Field label="Readings: one “time (s), temperature (°C)” per line" error={err('readings')}>
            {(p) => <textarea {...p} {...register('readings')} rows={8} className="field-input font-mono text-sm" />}
          </Field>
          <div className="space-y-4">
            <Field label="Time of mixing (s)" error={err('mixingTimeS')}>
              {(p) => <input {...p} {...register('mixingTimeS')} inputMode="decimal" className="field-input tabular-nums" />}
            </Field>
            <Field label="After-period starts (s)" error={err('afterPeriodStartS')}>
              {(p) => <input {...p} {...register('afterPeriodStartS')} inputMode="decimal" className="field-input tabular-nums" />}
            </Field>
          </div>
        </div>
      )}
      <section aria-labelledby="cal-result" className={`panel ${r ? 'border-verdigris-500' : 'border-ember-500 bg-ember-50'}`}>
        <h2 id="cal-result">Which form is the lot?</h2>
        {r ? (
          <>
            <p className="mt-1 text-xl font-semibold" data-testid="verdict" aria-live="polite">
              {r.bestMatch ? r.bestMatch.text : 'No form matches within the tolerance.'}
            </p>
            <p className="text-sm text-ink-soft">
              ΔT {formatRounded(r.temperatureChangeK, 3)} K · heat capacity {formatNumber(r.heatCapacityJPerK, 1)} J/K ({r.heatCapacityBasis}) · heat released {formatRounded(r.heatReleasedJ, 1)} J · {r.method}
            </p>
            <table className="mt-3 w-full border-collapse text-sm">
              <caption className="sr-only">Measured and predicted enthalpy of solution for each form</caption>
              <thead>
                <tr className="border-b border-rule text-left text-ink-soft">
                  <th scope="col" className="py-2 pr-2 font-medium">
                    Form
                  </th>
                  <th scope="col" className="py-2 pr-2 font-medium">
                    Measured ΔsolH
                  </th>
                  <th scope="col" className="py-2 pr-2 font-medium">
                    Predicted
                  </th>
                  <th scope="col" className="py-2 font-medium">
                    Within ±{r.toleranceKjPerMol} kJ/mol
                  </th>
                </tr>
              </thead>
              <tbody>
                {r.candidates.map((c) => (
                  <tr key={c.formula} className={`border-b border-rule ${r.bestMatch?.formula === c.formula ? 'bg-verdigris-50 font-medium' : ''}`}>
                    <th scope="row" className="py-2 pr-2 text-left font-normal">
                      {c.formula}
                      {r.bestMatch?.formula === c.formula ? ' ← best match' : ''}
                    </th>
                    <td className="py-2 pr-2 tabular-nums">{energyText(c.measuredEnthalpyOfSolution.value, unit, c.measuredEnthalpyOfSolution.uncertainty)}</td>
                    <td className="py-2 pr-2 tabular-nums">{energyText(c.predictedEnthalpyOfSolution, unit)}</td>
                    <td className="py-2">{c.withinTolerance ? '✓ yes' : '✗ no'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <ul className="mt-2 list-disc pl-5 text-sm text-ink-soft">
              {r.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          </>
        ) : (
          <p className="text-sm">{waiting ? 'Not solved yet — fill in the run above to begin.' : 'Not solved yet — see the messages above.'}</p>
        )}
      </section>
    </fieldset>
  );
}
