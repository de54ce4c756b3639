'use client';
// The lattice-cycle workbench: formula → cycle from the values in force; every step with its value,
// uncertainty and source; overrides with a required reason; the unknown, the convention and the
// basis; the result and the ladder update as you type (no submit button).
import { useMemo, useState } from 'react';
import { Ladder } from '@/components/ladder/ladder';
import { ENERGY_BASIS_TEXT, LATTICE_CONVENTION_TEXT } from '@/lib/thermo/conventions';
import type { SolvedCycle } from '@/lib/thermo/cycle-solve';
import { switchConvention, type CycleForm, type CycleSheetBuild, type StepRow } from '@/lib/workbench/cycle-sheet';
import { errorFor } from '@/lib/workbench/field-error';
import { energyText, formatEnergy, kjToTyped, type DisplayUnit } from '@/lib/workbench/format-energy';
import { ladderGeometry } from '@/lib/workbench/ladder-geometry';
import { Field } from '@/components/ui/field';
import { ModelCheckPanel } from './model-check-panel';
import { markInput, useMarkCommit } from './perf-marks';
import { Segmented } from './segmented';

export interface CycleWorkbenchProps {
  form: CycleForm;
  onChange: (form: CycleForm) => void;
  build: CycleSheetBuild;
  unit: DisplayUnit;
  suggestions: string[];
  locked: boolean;
}

const ORIGIN_TEXT: Record<StepRow['origin'], string> = { edition: 'edition', override: 'overridden', entered: 'entered', unknown: 'unknown', missing: 'missing' };

export function CycleWorkbench({ form, onChange, build, unit, suggestions, locked }: CycleWorkbenchProps) {
  const change = (next: CycleForm) => {
    markInput();
    onChange(next);
  };
  const solved: SolvedCycle | null = build.outcome?.kind === 'cycle' ? build.outcome.result : null;
  const modelCheck = build.outcome?.kind === 'cycle' ? build.outcome.modelCheck : null;
  const geometry = useMemo(() => {
    if (!solved) return null;
    const g = ladderGeometry(solved, { convention: form.convention });
    const marked = new Set(build.rows.filter((r) => r.origin === 'override' || r.origin === 'entered').map((r) => r.key));
    return { ...g, arrows: g.arrows.map((a) => ({ ...a, overridden: marked.has(a.key) })) };
  }, [solved, form.convention, build.rows]);
  useMarkCommit(build);
  // A new sheet starts empty: the formula's hint says what to type; "required" waits for a first keystroke.
  const started = form.formula.trim() !== '';
  const formulaError = started ? errorFor(build.errors, 'formula') : undefined;
  const unknownKey = form.unknown ?? build.stepKeys.find((s) => s.key.startsWith('lattice_enthalpy:'))?.key ?? '';

  return (
    <div className="space-y-6">
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
        <Field label="Formula of the salt" error={formulaError} hint="A binary ionic compound, e.g. CaCl2, LiCl, MgCl2, KBr or CaO.">
          {(p) => (
            <>
              <input {...p} className="field-input font-medium" list="salt-suggestions" autoComplete="off" spellCheck={false} value={form.formula} disabled={locked} onChange={(e) => change({ ...form, formula: e.target.value })} />
              <datalist id="salt-suggestions">
                {suggestions.map((s) => (
                  <option key={s} value={s} />
                ))}
              </datalist>
            </>
          )}
        </Field>
        <Field label="Cation charge" error={errorFor(build.errors, 'cationCharge')} hint="Only for metals without a fixed charge.">
          {(p) => (
            <select {...p} className="field-input" value={form.cationCharge ?? ''} disabled={locked} onChange={(e) => change({ ...form, cationCharge: e.target.value ? Number(e.target.value) : null })}>
              <option value="">fixed by the metal</option>
              <option value="1">1+</option>
              <option value="2">2+</option>
              <option value="3">3+</option>
            </select>
          )}
        </Field>
      </div>

      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Solve for" error={errorFor(build.errors, 'unknown')}>
          {(p) => (
            <select {...p} className="field-input" value={unknownKey} disabled={locked || build.stepKeys.length === 0} onChange={(e) => change({ ...form, unknown: e.target.value.startsWith('lattice_enthalpy:') ? null : e.target.value })}>
              {build.stepKeys.map((s) => (
                <option key={s.key} value={s.key}>
                  {s.key.startsWith('electron_gain_enthalpy_1') ? `${s.name} (electron affinity)` : s.name}
                </option>
              ))}
            </select>
          )}
        </Field>
        <div className="flex flex-wrap gap-4">
          <Segmented
            legend="Lattice sign convention"
            name="convention"
            value={form.convention}
            disabled={locked}
            options={[
              { value: 'dissociation', label: 'Dissociation (+)' },
              { value: 'formation', label: 'Formation (−)' },
            ]}
            onChange={(v) => change(switchConvention(form, v))}
          />
        </div>
      </div>
      <Segmented
        legend="Basis of ionization energies and electron-gain enthalpies"
        name="basis"
        value={form.basis}
        disabled={locked}
        options={[
          { value: 'as-tabulated', label: 'As tabulated (0 K)' },
          { value: 'enthalpy-corrected', label: 'Corrected to 298 K (±5/2 RT)' },
        ]}
        onChange={(v) => change({ ...form, basis: v })}
      />

      <ResultPanel solved={solved} unit={unit} errors={build.errors.length} started={started} />

      <section aria-labelledby="steps-heading" className="panel overflow-x-auto">
        <h2 id="steps-heading">Steps of the cycle</h2>
        <p className="mt-1 text-sm text-ink-soft">Per mole of the species named; the coefficient says how many per formula unit. Values from the edition carry their source; an override needs a reason and travels with the sheet.</p>
        <table id="cycle-steps" className="mt-3 w-full min-w-[40rem] border-collapse text-sm">
          <caption className="sr-only">Steps of the Born–Haber cycle with values, uncertainties and sources (text alternative of the ladder)</caption>
          <thead>
            <tr className="border-b border-rule text-left text-ink-soft">
              <th scope="col" className="py-2 pr-2 font-medium">
                Step
              </th>
              <th scope="col" className="py-2 pr-2 font-medium">
                Value ({unit})
              </th>
              <th scope="col" className="py-2 pr-2 font-medium">
                Direction
              </th>
              <th scope="col" className="py-2 pr-2 font-medium">
                Source
              </th>
              <th scope="col" className="py-2 font-medium">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {build.rows.map((r) => (
              <StepRows key={r.key} row={r} form={form} unit={unit} locked={locked} errors={build.errors} onChange={change} />
            ))}
          </tbody>
        </table>
      </section>

      {geometry && solved ? (
        <section aria-labelledby="ladder-heading" className="panel">
          <h2 id="ladder-heading">Ladder</h2>
          <Ladder geometry={geometry} unit={unit} title={`Born–Haber ladder for ${solved.formula}`} describedBy="cycle-steps" />
        </section>
      ) : null}

      {form.modelCheck && modelCheck && solved ? <ModelCheckPanel check={modelCheck} unit={unit} /> : null}
      <label className="flex min-h-touch items-center gap-3 text-sm">
        <input type="checkbox" className="h-5 w-5" checked={form.modelCheck} disabled={locked} onChange={(e) => change({ ...form, modelCheck: e.target.checked })} />
        Run the model check (theoretical lattice energies from the edition’s radii, Madelung constant and density)
      </label>
    </div>
  );
}

function ResultPanel({ solved, unit, errors, started }: { solved: SolvedCycle | null; unit: DisplayUnit; errors: number; started: boolean }) {
  if (!solved && !started) {
    return (
      <section aria-labelledby="result-heading" className="panel">
        <h2 id="result-heading">Result</h2>
        <p className="mt-1 text-sm" aria-live="polite">
          Not solved yet — type the formula of the salt to begin.
        </p>
      </section>
    );
  }
  if (!solved) {
    return (
      <section aria-labelledby="result-heading" className="panel border-ember-500 bg-ember-50">
        <h2 id="result-heading">Result</h2>
        <p className="mt-1 text-sm" aria-live="polite">
          Not solved yet{errors > 0 ? ` — ${errors === 1 ? 'one message needs' : `${errors} messages need`} your attention.` : '.'}
        </p>
      </section>
    );
  }
  const lattice = solved.solvedFor.key.startsWith('lattice_enthalpy:');
  const v = lattice ? solved.latticeEnthalpy : solved.solvedFor.result;
  const isFirstEg = solved.solvedFor.key.startsWith('electron_gain_enthalpy_1:');
  return (
    <section aria-labelledby="result-heading" className="panel border-verdigris-500">
      <h2 id="result-heading">Result</h2>
      <p className="mt-1 text-ink-soft">{lattice ? `Lattice enthalpy of ${solved.formula} (${solved.convention.code})` : solved.solvedFor.name}</p>
      <p className="text-3xl font-semibold tracking-tight" aria-live="polite" data-testid="result-value">
        {energyText(v.value, unit, v.uncertainty)}
      </p>
      {isFirstEg ? <p className="text-sm">Electron affinity (the opposite sign): {energyText(`${-Number(v.value)}`, unit, v.uncertainty)}</p> : null}
      {!lattice ? (
        <p className="text-sm">
          Lattice enthalpy ({solved.convention.code}): {energyText(solved.latticeEnthalpy.value, unit, solved.latticeEnthalpy.uncertainty)}
        </p>
      ) : null}
      <dl className="mt-2 grid gap-1 text-sm text-ink-soft">
        <div>
          <dt className="inline font-medium text-ink">Convention: </dt>
          <dd className="inline">{LATTICE_CONVENTION_TEXT[solved.convention.code]}</dd>
        </div>
        <div>
          <dt className="inline font-medium text-ink">Basis: </dt>
          <dd className="inline">{ENERGY_BASIS_TEXT[solved.basis.code as keyof typeof ENERGY_BASIS_TEXT] ?? solved.basis.text}</dd>
        </div>
      </dl>
      {solved.notes.length > 0 ? (
        <ul className="mt-2 list-disc pl-5 text-sm text-ink-soft">
          {solved.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}

interface StepRowsProps {
  row: StepRow;
  form: CycleForm;
  unit: DisplayUnit;
  locked: boolean;
  errors: CycleSheetBuild['errors'];
  onChange: (form: CycleForm) => void;
}

function StepRows({ row, form, unit, locked, errors, onChange }: StepRowsProps) {
  const entry = form.entries[row.key];
  const [open, setOpen] = useState(false);
  const valueError = errorFor(errors, `entries.${row.key}.value`);
  const showEditor = !locked && row.origin !== 'unknown' && (entry !== undefined || open || row.origin === 'missing');
  const setEntry = (patch: Partial<NonNullable<typeof entry>>) => {
    const base = entry ?? { value: '', uncertainty: '', reason: '', unit };
    onChange({ ...form, entries: { ...form.entries, [row.key]: { ...base, ...patch } } });
  };
  const startOverride = () => {
    setOpen(true);
    if (!entry) {
      setEntry({ value: row.valueKj ? kjToTyped(row.valueKj, unit) : '', uncertainty: row.uncertaintyKj ? kjToTyped(row.uncertaintyKj, unit) : '', reason: '', unit });
    }
  };
  const removeOverride = () => {
    const rest = { ...form.entries };
    delete rest[row.key];
    setOpen(false);
    onChange({ ...form, entries: rest });
  };
  const value = row.valueKj === null ? null : formatEnergy(row.valueKj, unit, row.uncertaintyKj);
  return (
    <>
      <tr className={`border-b border-rule align-top ${row.origin === 'unknown' ? 'bg-verdigris-50' : ''}`} data-step={row.key}>
        <th scope="row" className="py-2 pr-2 text-left font-normal">
          <span className="font-medium">{row.name}</span>
          {row.coefficient !== '1' && row.coefficient !== '-1' ? <span className="text-ink-soft"> × {row.coefficient.replace('-', '−')}</span> : null}
          <span className="block text-xs text-ink-soft">{row.process}</span>
        </th>
        <td className="py-2 pr-2 tabular-nums">
          {row.origin === 'unknown' ? <span className="font-semibold text-verdigris-700">{value ? `${value.text} (solved)` : 'unknown'}</span> : value ? value.text : <span className="text-ember-700">no value</span>}
          {row.origin === 'override' || row.origin === 'entered' ? <span className="ml-1 rounded bg-ember-50 px-1 text-xs font-semibold text-ember-700">{ORIGIN_TEXT[row.origin]}</span> : null}
        </td>
        <td className="py-2 pr-2 text-xs">{row.direction === 'absorbs' ? '▲ absorbs' : row.direction === 'releases' ? '▼ releases' : ''}</td>
        <td className="max-w-[14rem] py-2 pr-2 text-xs text-ink-soft">{row.origin === 'unknown' ? '—' : (row.source ?? '—')}</td>
        <td className="py-1 text-right">
          {!locked && row.origin !== 'unknown' && !showEditor ? (
            <button type="button" className="btn-quiet" onClick={startOverride} aria-label={`Override ${row.name}`}>
              Override
            </button>
          ) : null}
        </td>
      </tr>
      {showEditor ? (
        <tr className="border-b border-rule bg-paper">
          <td colSpan={5} className="px-2 py-3">
            <fieldset className="grid gap-3 sm:grid-cols-[9rem_8rem_1fr_auto]" aria-label={`${row.origin === 'missing' || !row.fromEdition ? 'Value' : 'Override'} for ${row.name}`}>
              <Field label={`Value (${entry?.unit ?? unit})`} error={valueError}>
                {(p) => <input {...p} inputMode="decimal" className="field-input tabular-nums" value={entry?.value ?? ''} onChange={(e) => setEntry({ value: e.target.value })} />}
              </Field>
              <Field label="± uncertainty" error={errorFor(errors, `entries.${row.key}.uncertainty`)}>
                {(p) => <input {...p} inputMode="decimal" className="field-input tabular-nums" value={entry?.uncertainty ?? ''} onChange={(e) => setEntry({ uncertainty: e.target.value })} />}
              </Field>
              <Field label={row.fromEdition ? 'Reason for the override' : 'Source of this value'} error={errorFor(errors, `entries.${row.key}.reason`)}>
                {(p) => <input {...p} className="field-input" value={entry?.reason ?? ''} onChange={(e) => setEntry({ reason: e.target.value })} />}
              </Field>
              {row.fromEdition ? (
                <div className="flex items-end">
                  <button type="button" className="btn-quiet" onClick={removeOverride}>
                    Use the edition value
                  </button>
                </div>
              ) : null}
            </fieldset>
          </td>
        </tr>
      ) : null}
    </>
  );
}
