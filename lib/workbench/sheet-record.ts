// The sheet as a record: every input with its source, the edition, the result with its uncertainty,
// convention and basis, the model check, notes and the sign-off. Shared by the PDF and tests.
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { SolveResult } from '@/lib/thermo/engine';
import { energyText, formatNumber, formatRounded, type DisplayUnit } from './format-energy';
import { KIND_TEXT, STATUS_TEXT } from './sheet-rules';

export interface RecordSection {
  heading: string;
  lines?: string[];
  table?: { columns: string[]; rows: string[][] };
}

export interface SheetRecord {
  title: string;
  subtitle: string;
  facts: Array<[string, string]>;
  sections: RecordSection[];
  signOff: string[];
}

export interface RecordContext {
  unit: DisplayUnit;
  /** Display names of users by id (author, signer), when known on the device. */
  names?: Record<string, string>;
  /** e.g. "edition No. 2" */
  editionText: string;
  areaName?: string | null;
}

function result(sheet: Sheet): SolveResult | null {
  const r = sheet.result as SolveResult | null;
  return r && typeof r === 'object' && 'kind' in r && 'result' in r ? r : null;
}

function reasonsByPath(sheet: Sheet): Map<string, string> {
  const m = new Map<string, string>();
  for (const i of sheet.inputs) if (i.origin.type === 'entered') m.set(i.path.join('.'), i.origin.note ?? '');
  return m;
}

export function sheetRecord(sheet: Sheet, ctx: RecordContext): SheetRecord {
  const name = (id: string | null) => (id ? (ctx.names?.[id] ?? `user ${id.slice(0, 8)}`) : '—');
  const r = result(sheet);
  const u = ctx.unit;
  const facts: Array<[string, string]> = [
    ['Kind', KIND_TEXT[sheet.kind]],
    ['Status', STATUS_TEXT[sheet.status]],
    ['Sheet version', String(sheet.version)],
    ['Lot or batch', sheet.lotRef ?? '—'],
    ['Area', ctx.areaName ?? sheet.areaId ?? '—'],
    ['Author', name(sheet.authorId)],
    ['Pinned edition', `${ctx.editionText}${sheet.pinnedEditionId ? ` (id ${sheet.pinnedEditionId})` : ''}`],
    ['Engine', sheet.engineVersion ?? '—'],
    ['Sheet id', sheet.id],
    ['Last changed', sheet.updatedAt],
  ];
  const sections: RecordSection[] = [];
  const reasons = reasonsByPath(sheet);
  if (!r) sections.push({ heading: 'Result', lines: ['The sheet does not solve yet.'] });
  else if (r.kind === 'cycle') {
    const c = r.result;
    sections.push({
      heading: 'Inputs (per mole of the species named)',
      table: {
        columns: ['Step', 'Value', 'Source'],
        rows: c.steps.map((s) => {
          const reason = reasons.get(`problem.values.${s.key}`);
          const value = s.solved ? 'solved (unknown)' : energyText(s.key.startsWith('lattice') ? (c.convention.code === 'formation' ? `${-Number(s.value)}` : s.value) : s.value, u, s.uncertainty);
          const src = s.solved ? '—' : reason !== undefined ? `OVERRIDE — reason: ${reason}` : (s.source ?? '—');
          return [s.name, value, src];
        }),
      },
    });
    const solvedLattice = c.solvedFor.key.startsWith('lattice_enthalpy:');
    const headline = solvedLattice ? c.latticeEnthalpy : c.solvedFor.result;
    sections.push({
      heading: 'Result',
      lines: [
        `${c.solvedFor.name}: ${energyText(headline.value, u, headline.uncertainty)} (standard uncertainty)`,
        `Lattice enthalpy (${c.convention.code}): ${energyText(c.latticeEnthalpy.value, u, c.latticeEnthalpy.uncertainty)}`,
        `Convention: ${c.convention.text}`,
        `Basis: ${c.basis.text}`,
        ...c.notes,
      ],
    });
    if (r.modelCheck) {
      const m = r.modelCheck;
      sections.push({
        heading: 'Model check',
        table: {
          columns: ['Model', 'Lattice enthalpy', 'Gap to cycle'],
          rows: m.models.map((x) => [x.name, energyText(x.latticeEnthalpy, u), x.gapPercent === null ? '—' : `${formatNumber(x.gapPercent, 1)} %${x.fittedToCycleData ? ' (fitted to cycle data)' : ''}`]),
        },
        lines: [m.verdict, m.thresholdNote, ...(m.circularityNote ? [m.circularityNote] : []), ...m.skipped.map((s) => `${s.model}: not run — ${s.reason}`), m.note],
      });
    }
  } else if (r.kind === 'dissolution') {
    const d = r.result;
    sections.push({ heading: 'Inputs', lines: inputLines(sheet) });
    const lines = [`Enthalpy of solution (infinite dilution): ${energyText(d.enthalpyOfSolution.value, u, d.enthalpyOfSolution.uncertainty)}`, `Process: ${d.process}`, `Basis: ${d.basis}`];
    if (d.explanation) lines.push(`Lattice + hydration (${d.explanation.scale} scale): ${energyText(d.explanation.latticeEnthalpy, u)} + ${energyText(d.explanation.hydrationSum, u)} = ${energyText(d.explanation.enthalpyOfSolution.value, u)}; ${d.explanation.note}`);
    sections.push({ heading: 'Result', lines: [...lines, ...d.notes] });
    if (r.batchHeat) {
      const b = r.batchHeat;
      sections.push({
        heading: 'Batch heat',
        lines: [
          `Heat released: ${formatRounded(b.heatReleasedKj, 0)} kJ (${formatNumber(b.heatReleasedKwh, 2)} kWh)`,
          `Adiabatic temperature change (upper bound): ${formatRounded(b.temperatureChangeK, 1)} K; final temperature ${formatRounded(b.finalTemperatureC, 1)} °C`,
          `Heat capacity assumed: ${b.heatCapacityAssumption}`,
          ...b.warnings.map((w) => `WARNING: ${w}`),
          ...b.cautions.map((c) => `CAUTION: ${c}`),
        ],
      });
    }
  } else if (r.kind === 'reaction') {
    const x = r.result;
    sections.push({
      heading: 'Inputs',
      table: { columns: ['Species', 'ΔfH°', 'Source'], rows: x.terms.map((t) => [`${t.side === 'reactant' ? 'reactant' : 'product'} ${t.coefficient} ${t.key}`, energyText(t.enthalpyOfFormation, u, t.uncertainty), t.source ?? '—']) },
    });
    const lines = [`Reaction: ${x.reaction}`, `ΔrH°: ${energyText(x.reactionEnthalpy.value, u, x.reactionEnthalpy.uncertainty)} per mole of reaction as written`, `Basis: ${x.basis}`];
    if (x.batch) lines.push(`Batch: ${x.batch.massKg} kg of ${x.batch.species}: enthalpy change ${formatRounded(x.batch.enthalpyChangeKj, 0)} kJ (heat released ${formatNumber(x.batch.heatReleasedKj, 0)} kJ)`);
    sections.push({ heading: 'Result', lines: [...lines, ...x.notes] });
  } else {
    const x = r.result;
    sections.push({ heading: 'Inputs', lines: inputLines(sheet) });
    sections.push({
      heading: 'Result',
      lines: [`Method: ${x.method}`, `Temperature change: ${formatRounded(x.temperatureChangeK, 3)} K`, `Heat capacity: ${formatNumber(x.heatCapacityJPerK, 1)} J/K (${x.heatCapacityBasis})`, `Heat released: ${formatRounded(x.heatReleasedJ, 1)} J`, ...x.notes],
      table: { columns: ['Form', 'Measured ΔsolH', 'Predicted', 'Within tolerance'], rows: x.candidates.map((c) => [c.formula, energyText(c.measuredEnthalpyOfSolution.value, u, c.measuredEnthalpyOfSolution.uncertainty), energyText(c.predictedEnthalpyOfSolution, u), c.withinTolerance ? 'yes' : 'no']) },
    });
    sections.push({ heading: 'Verdict', lines: [x.bestMatch ? x.bestMatch.text : 'No form matches.'] });
  }
  sections.push({ heading: 'Notes', lines: [sheet.note.trim() === '' ? '—' : sheet.note] });
  const signOff =
    sheet.status === 'signed_off'
      ? [`Signed off by ${name(sheet.signedOffBy)} at ${sheet.signedOffAt ?? ''}.`, 'This sheet version is locked; a later change starts a new version linked to it.']
      : [`Not signed off (status: ${STATUS_TEXT[sheet.status]}).`, 'Signed off by: ____________________   Date: ____________'];
  return { title: sheet.title, subtitle: `${KIND_TEXT[sheet.kind]} · ${ctx.editionText} · ${u}`, facts, sections, signOff };
}

/** Generic input lines: each stored input with its value, its source and where it sits in the problem. */
function inputLines(sheet: Sheet): string[] {
  return sheet.inputs.map((i) => {
    let at: unknown = sheet.problem;
    for (const step of i.path) at = at && typeof at === 'object' ? (at as Record<string | number, unknown>)[step] : undefined;
    const v = at && typeof at === 'object' && 'value' in at ? (at as { value: unknown; uncertainty?: unknown; source?: unknown }) : { value: at };
    const value = v.value === undefined ? '' : `${String(v.value)}${v.uncertainty ? ` ± ${String(v.uncertainty)}` : ''}`;
    const where = i.path.slice(1).join('.');
    const origin =
      i.origin.type === 'edition'
        ? `${i.origin.species} (${i.origin.phase}) ${i.origin.property.replace(/_/g, ' ')}, edition ${i.origin.editionId.slice(0, 8)}${typeof v.source === 'string' && v.source ? ` — ${v.source}` : ''}`
        : `entered — ${i.origin.note ?? ''}`;
    return `${where} = ${value}: ${origin}`;
  });
}
