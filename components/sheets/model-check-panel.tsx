// The model check beside the cycle value: four theoretical lattice enthalpies, the gap in %, the
// flag, what it means, and the circularity note for oxides, sulfides and nitrides.
import type { ModelCheckResult } from '@/lib/thermo/engine';
import { energyText, formatNumber, type DisplayUnit } from '@/lib/workbench/format-energy';

export interface ModelCheckPanelProps {
  check: ModelCheckResult;
  unit: DisplayUnit;
}

export function ModelCheckPanel({ check, unit }: ModelCheckPanelProps) {
  const flag = check.ionicModelHolds === null ? 'No verdict' : check.ionicModelHolds ? 'Ionic model holds' : 'Ionic model in doubt';
  return (
    <section aria-labelledby="model-heading" className="panel">
      <h2 id="model-heading">Model check</h2>
      <p className="mt-1 text-sm">
        <span className={`mr-2 inline-block rounded px-2 py-0.5 text-xs font-semibold ${check.ionicModelHolds === false ? 'bg-ember-50 text-ember-700 ring-1 ring-ember-500' : 'bg-verdigris-50 text-verdigris-700 ring-1 ring-verdigris-100'}`}>
          {check.ionicModelHolds === false ? '⚠ ' : check.ionicModelHolds ? '✓ ' : ''}
          {flag}
        </span>
        {check.verdict}
      </p>
      <table className="mt-3 w-full border-collapse text-sm">
        <caption className="sr-only">Theoretical lattice enthalpies and their gap to the cycle value</caption>
        <thead>
          <tr className="border-b border-rule text-left text-ink-soft">
            <th scope="col" className="py-2 pr-2 font-medium">
              Model
            </th>
            <th scope="col" className="py-2 pr-2 font-medium">
              Lattice enthalpy
            </th>
            <th scope="col" className="py-2 font-medium">
              Gap to the cycle
            </th>
          </tr>
        </thead>
        <tbody>
          {check.cycleLatticeEnthalpy !== null ? (
            <tr className="border-b border-rule font-medium">
              <th scope="row" className="py-2 pr-2 text-left">
                Cycle (this sheet)
              </th>
              <td className="py-2 pr-2 tabular-nums">{energyText(check.cycleLatticeEnthalpy, unit)}</td>
              <td className="py-2">—</td>
            </tr>
          ) : null}
          {check.models.map((m) => (
            <tr key={m.model} className="border-b border-rule">
              <th scope="row" className="py-2 pr-2 text-left font-normal">
                {m.name}
                {m.fittedToCycleData ? <span className="block text-xs text-ink-soft">fitted to cycle data: not used for the verdict</span> : null}
              </th>
              <td className="py-2 pr-2 tabular-nums">{energyText(m.latticeEnthalpy, unit)}</td>
              <td className="py-2 tabular-nums">{m.gapPercent === null ? '—' : `${formatNumber(m.gapPercent, 1)} %`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {check.skipped.length > 0 ? (
        <ul className="mt-2 list-disc pl-5 text-sm text-ink-soft">
          {check.skipped.map((s) => (
            <li key={s.model}>
              {s.model}: not run — {s.reason}
            </li>
          ))}
        </ul>
      ) : null}
      <p className="mt-2 text-sm text-ink-soft">{check.thresholdNote}</p>
      {check.circularityNote ? (
        <p className="mt-2 rounded border border-ember-500 bg-ember-50 p-2 text-sm" role="note">
          <strong>Circularity: </strong>
          {check.circularityNote}
        </p>
      ) : null}
      <p className="mt-2 text-xs text-ink-soft">{check.note}</p>
    </section>
  );
}
