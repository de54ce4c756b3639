// Geometry of the ladder: the Born–Haber cycle drawn to scale. Each state of the system is a rung
// at its enthalpy (elements in their standard states = 0); each step is an arrow between two rungs,
// in its own column, left to right in cycle order. Pure: the SVG component only draws this.
import type { SolvedCycle } from '@/lib/thermo/cycle-solve';
import { Dec } from '@/lib/thermo/decimal';

export interface LadderRung {
  /** Enthalpy of this state relative to the elements, kJ/mol of salt. */
  energyKj: string;
  y: number;
  x1: number;
  x2: number;
  label: string;
}

export interface LadderArrow {
  key: string;
  name: string;
  x: number;
  yFrom: number;
  yTo: number;
  /** Signed change along the arrow, kJ/mol of salt (positive = absorbs). */
  changeKj: string;
  direction: 'up' | 'down' | 'flat';
  unknown: boolean;
  overridden: boolean;
  /** Short trade label, e.g. "IE₁(Ca)" */
  short: string;
}

export interface LadderGeometry {
  width: number;
  height: number;
  rungs: LadderRung[];
  arrows: LadderArrow[];
  /** kJ/mol per drawing unit, for the scale bar. */
  kjPerUnit: number;
  scaleBarKj: number;
  scaleBarLength: number;
  top: number;
  bottom: number;
}

const SUB: Record<string, string> = { '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉' };
const SUP: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };
const sub = (s: string) => s.replace(/\d/g, (d) => SUB[d] ?? d);
const ion = (symbol: string, charge: number) => (charge === 0 ? symbol : `${symbol}${Math.abs(charge) === 1 ? '' : (SUP[String(Math.abs(charge))] ?? '')}${charge > 0 ? '⁺' : '⁻'}`);
const count = (n: Dec | number) => {
  const d = new Dec(n);
  if (d.eq(1)) return '';
  if (d.eq(0.5)) return '½ ';
  if (d.eq(1.5)) return '1½ ';
  return `${d.toString()} `;
};

/** Short trade label of a step, from its key: ΔfH, ΔatH(Ca), IE₂(Ca), D(Cl₂), ΔvapH(Br₂), EA₁(Cl) shown as ΔegH₁(Cl), U. */
export function shortLabel(key: string, convention: 'dissociation' | 'formation'): string {
  const [kind = '', species = ''] = key.split(':');
  const n = /_(\d)$/.exec(kind)?.[1];
  if (kind === 'enthalpy_of_formation') return `−ΔfH°(${sub(species)})`;
  if (kind === 'enthalpy_of_atomization') return `ΔatH(${species})`;
  if (kind.startsWith('ionization_energy')) return `IE${sub(n ?? '1')}(${species})`;
  if (kind === 'bond_dissociation_enthalpy') return `D(${sub(species)})`;
  if (kind === 'enthalpy_of_vaporization') return `ΔvapH(${sub(species)})`;
  if (kind === 'enthalpy_of_sublimation') return `ΔsubH(${sub(species)})`;
  if (kind.startsWith('electron_gain_enthalpy')) return `ΔegH${sub(n ?? '1')}(${species})`;
  if (kind === 'lattice_enthalpy') return convention === 'dissociation' ? 'ΔlatH (dissoc.)' : 'ΔlatH (form.)';
  return key;
}

/** Labels of each state around the cycle: salt, elements, then after each step in turn. */
export function stateLabels(cycle: SolvedCycle): string[] {
  const { cation, anion } = cycle;
  const a = cation.count;
  const b = anion.count;
  const X2 = sub(`${anion.symbol}2`);
  const halfB = new Dec(b).div(2);
  const std: Record<string, string> = { Cl: '(g)', F: '(g)', O: '(g)', N: '(g)', Br: '(l)', I: '(s)' };
  let metal = `${count(a)}${cation.symbol}(s)`;
  let nonmetal = anion.symbol in std ? `${count(halfB)}${X2}${std[anion.symbol]}` : `${count(b)}${anion.symbol}(s)`;
  let electrons = 0;
  const out: string[] = [];
  const text = () => `${metal} + ${nonmetal}${electrons > 0 ? ` + ${electrons} e⁻` : ''}`;
  for (const s of cycle.steps) {
    const [kind = '', sp = ''] = s.key.split(':');
    const k = Number(/_(\d)$/.exec(kind)?.[1] ?? 1);
    if (kind === 'enthalpy_of_formation') out.push(text());
    else if (kind === 'enthalpy_of_atomization' && sp === cation.symbol) {
      metal = `${count(a)}${cation.symbol}(g)`;
      out.push(text());
    } else if (kind.startsWith('ionization_energy')) {
      metal = `${count(a)}${ion(cation.symbol, k)}(g)`;
      electrons += a;
      out.push(text());
    } else if (kind === 'enthalpy_of_vaporization' || kind === 'enthalpy_of_sublimation') {
      nonmetal = `${count(halfB)}${X2}(g)`;
      out.push(text());
    } else if (kind === 'bond_dissociation_enthalpy' || kind === 'enthalpy_of_atomization') {
      nonmetal = `${count(b)}${anion.symbol}(g)`;
      out.push(text());
    } else if (kind.startsWith('electron_gain_enthalpy')) {
      nonmetal = `${count(b)}${ion(anion.symbol, -k)}(g)`;
      electrons -= b;
      out.push(text());
    } else if (kind === 'lattice_enthalpy') out.push(`${sub(cycle.formula)}(s)`);
  }
  return out;
}

/**
 * Lay out the ladder. Energies are to scale on the vertical axis (up = higher enthalpy); each rung
 * spans the two columns of the arrows that meet it.
 */
export function ladderGeometry(cycle: SolvedCycle, opts: { width?: number; height?: number; unknownKey?: string; convention?: 'dissociation' | 'formation' } = {}): LadderGeometry {
  const width = opts.width ?? 720;
  const height = opts.height ?? 520;
  const convention = opts.convention ?? cycle.convention.code;
  const top = 28;
  const bottom = height - 28;
  const left = 210;
  // Room on the right for the scale bar.
  const right = width - 34;
  const steps = cycle.steps;
  const labels = stateLabels(cycle);
  // Start at the salt (ΔfH below the elements), walk the contributions.
  const levels: Dec[] = [];
  const first = steps[0];
  let level = first ? new Dec(first.contribution).negated() : new Dec(0);
  const salt = level;
  for (const s of steps) {
    level = level.plus(new Dec(s.contribution));
    levels.push(level);
  }
  const all = [salt, ...levels, new Dec(0)].map((d) => d.toNumber());
  const max = Math.max(...all);
  const min = Math.min(...all);
  const span = max - min || 1;
  const kjPerUnit = span / (bottom - top);
  const y = (e: number) => top + ((max - e) / span) * (bottom - top);
  const columns = steps.length;
  const colWidth = (right - left) / Math.max(columns, 1);
  const arrows: LadderArrow[] = [];
  const rungs: LadderRung[] = [];
  let from = salt;
  steps.forEach((s, i) => {
    const to = levels[i]!;
    const x = left + colWidth * (i + 0.5);
    const isLattice = s.kind === 'lattice_enthalpy';
    // The lattice step closes the cycle ions → salt; in the dissociation convention it is drawn as the
    // dissociation (salt → ions, upward) with its positive value.
    const reversed = isLattice && convention === 'dissociation';
    const yFrom = y((reversed ? to : from).toNumber());
    const yTo = y((reversed ? from : to).toNumber());
    const change = reversed ? new Dec(s.contribution).negated() : new Dec(s.contribution);
    arrows.push({
      key: s.key,
      name: s.name,
      x,
      yFrom,
      yTo,
      changeKj: change.toString(),
      direction: change.isZero() ? 'flat' : change.isPositive() ? 'up' : 'down',
      unknown: s.key === (opts.unknownKey ?? cycle.solvedFor.key),
      overridden: s.overridden,
      short: shortLabel(s.key, convention),
    });
    from = to;
  });
  // Rungs: the salt, then each state after a step (the last state is the salt again).
  const saltY = y(salt.toNumber());
  rungs.push({ energyKj: salt.toString(), y: saltY, x1: left - 8, x2: right, label: labels[labels.length - 1] ?? cycle.formula });
  levels.slice(0, -1).forEach((e, i) => {
    const xa = left + colWidth * i + colWidth * 0.15;
    const xb = left + colWidth * (i + 1) + colWidth * 0.85;
    rungs.push({ energyKj: e.toString(), y: y(e.toNumber()), x1: Math.max(left - 8, xa), x2: Math.min(right, xb), label: labels[i] ?? '' });
  });
  const nice = [50, 100, 200, 250, 500, 1000, 2000, 5000];
  const scaleBarKj = nice.find((n) => n / kjPerUnit >= 40) ?? 5000;
  return { width, height, rungs, arrows, kjPerUnit, scaleBarKj, scaleBarLength: scaleBarKj / kjPerUnit, top, bottom };
}
