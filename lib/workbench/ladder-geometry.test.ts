import { describe, expect, it } from 'vitest';
import { STARTER_EDITION_VALUES } from '@/db/seed/starter-edition';
import type { SolvedCycle } from '@/lib/thermo';
import { buildCycleSheet, EMPTY_CYCLE_FORM } from './cycle-sheet';
import { ladderGeometry, stateLabels } from './ladder-geometry';
import { makeValueSource } from './value-source';

const source = makeValueSource({ id: 'ed', number: 2, state: 'in_force', values: STARTER_EDITION_VALUES });
function solved(formula: string, convention: 'dissociation' | 'formation' = 'dissociation'): SolvedCycle {
  const b = buildCycleSheet({ ...EMPTY_CYCLE_FORM, formula, convention }, source);
  if (b.outcome?.kind !== 'cycle') throw new Error(JSON.stringify(b.errors));
  return b.outcome.result;
}

describe('ladder geometry', () => {
  it('draws to scale: each arrow’s length is its enthalpy change over the same kJ per unit', () => {
    const g = ladderGeometry(solved('MgCl2'));
    for (const a of g.arrows) {
      expect(Math.abs(Math.abs(a.yTo - a.yFrom) * g.kjPerUnit - Math.abs(Number(a.changeKj)))).toBeLessThan(1e-6);
    }
  });

  it('upward arrows absorb energy and downward ones release it; the elements sit above the salt', () => {
    const g = ladderGeometry(solved('LiCl'));
    for (const a of g.arrows) {
      if (a.direction === 'up') expect(a.yTo).toBeLessThan(a.yFrom);
      if (a.direction === 'down') expect(a.yTo).toBeGreaterThan(a.yFrom);
    }
    const ie = g.arrows.find((a) => a.key === 'ionization_energy_1:Li');
    expect(ie?.direction).toBe('up');
    const eg = g.arrows.find((a) => a.key === 'electron_gain_enthalpy_1:Cl');
    expect(eg?.direction).toBe('down');
  });

  it('the lattice arrow follows the convention: up as dissociation, down as formation', () => {
    const up = ladderGeometry(solved('KBr', 'dissociation')).arrows.find((a) => a.key === 'lattice_enthalpy:KBr');
    const down = ladderGeometry(solved('KBr', 'formation')).arrows.find((a) => a.key === 'lattice_enthalpy:KBr');
    expect(up?.direction).toBe('up');
    expect(down?.direction).toBe('down');
    expect(Number(up?.changeKj)).toBeCloseTo(-Number(down?.changeKj), 9);
    expect(up?.unknown).toBe(true);
  });

  it('labels every state around the cycle in the trade’s notation', () => {
    const labels = stateLabels(solved('CaCl2'));
    expect(labels[0]).toBe('Ca(s) + Cl₂(g)');
    expect(labels).toContain('Ca²⁺(g) + 2 Cl(g) + 2 e⁻');
    expect(labels).toContain('Ca²⁺(g) + 2 Cl⁻(g)');
    expect(labels[labels.length - 1]).toBe('CaCl₂(s)');
  });
});
