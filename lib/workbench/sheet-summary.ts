// One line per sheet for the list and the PDF: what it is about and its headline result.
import type { Sheet } from '@/lib/sheets/sheet-schema';
import type { SolveResult } from '@/lib/thermo/engine';
import { energyText, type DisplayUnit } from './format-energy';

/** The formula, reaction or salt a sheet is about, read from its stored problem. */
export function sheetSubject(sheet: Pick<Sheet, 'problem'>): string {
  const p = (sheet.problem as { problem?: Record<string, unknown>; form?: Record<string, unknown> } | null)?.problem;
  if (!p) return '';
  if (typeof p.formula === 'string') return p.formula;
  if (typeof p.reaction === 'string') return p.reaction;
  const c = p.candidates as Array<{ formula?: string }> | undefined;
  return c?.[0]?.formula ?? '';
}

function asResult(r: unknown): SolveResult | null {
  return r && typeof r === 'object' && 'kind' in r && 'result' in r ? (r as SolveResult) : null;
}

/** The headline number of a solved sheet, in the user's unit; '' if not solved. */
export function sheetHeadline(sheet: Pick<Sheet, 'result'>, unit: DisplayUnit): string {
  const r = asResult(sheet.result);
  if (!r) return '';
  switch (r.kind) {
    case 'cycle': {
      const s = r.result.solvedFor;
      const lattice = s.key.startsWith('lattice_enthalpy:');
      const v = lattice ? r.result.latticeEnthalpy : s.result;
      return `${lattice ? 'ΔlatH' : s.name}: ${energyText(v.value, unit, v.uncertainty)}`;
    }
    case 'dissolution':
      return `ΔsolH: ${energyText(r.result.enthalpyOfSolution.value, unit, r.result.enthalpyOfSolution.uncertainty)}${r.batchHeat ? `; final ${r.batchHeat.finalTemperatureC.roundedValue} °C` : ''}`;
    case 'reaction':
      return `ΔrH°: ${energyText(r.result.reactionEnthalpy.value, unit, r.result.reactionEnthalpy.uncertainty)}`;
    case 'calorimetry':
      return r.result.bestMatch ? `Best match: ${r.result.bestMatch.formula}` : 'No match';
  }
}

/** Text searched by the list's search box. */
export function sheetSearchText(sheet: Sheet): string {
  return [sheet.title, sheet.lotRef ?? '', sheetSubject(sheet), sheet.note].join(' ').toLowerCase();
}
