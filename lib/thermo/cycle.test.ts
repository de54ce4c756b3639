import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { latticeFromConvention, latticeToConvention, fiveHalvesRT } from './conventions';
import { buildBornHaberCycle, type ExplicitValue } from './cycle';
import { solveBornHaberCycle, solveClosure, type ClosureTerm } from './cycle-solve';
import { Dec } from './decimal';
import { ThermoInputError } from './errors';
import { combineInQuadrature } from './uncertainty';
import { lookupFromTable } from './reference-lookup';

// Decimal strings with up to 4 decimals, as tabulated values arrive.
const decimalText = fc
  .tuple(fc.integer({ min: -99_999_999, max: 99_999_999 }), fc.integer({ min: 0, max: 4 }))
  .map(([n, places]) => new Dec(n).div(new Dec(10).pow(places)).toString());
const coefficientText = fc.constantFrom('1', '-1', '2', '0.5', '1.5', '3', '-2');

describe('closure of a cycle', () => {
  it('solving any one step from the others returns its value', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(coefficientText, decimalText), { minLength: 2, maxLength: 9 }), fc.nat(), (raw, pick) => {
        // Build a closed cycle: the last term absorbs the residual so Σ c·v = 0 exactly.
        const terms: ClosureTerm[] = raw.map(([c, v], i) => ({ key: `s${i}`, coefficient: new Dec(c), value: new Dec(v), uncertainty: null }));
        const last = terms[terms.length - 1];
        if (!last) return;
        const rest = terms.slice(0, -1).reduce((sum, t) => sum.plus(t.coefficient.times(t.value ?? 0)), new Dec(0));
        last.value = rest.negated().div(last.coefficient);
        const index = pick % terms.length;
        const target = terms[index];
        if (!target) return;
        const expected = target.value;
        const withUnknown = terms.map((t, i) => (i === index ? { ...t, value: null } : t));
        const solved = solveClosure(withUnknown);
        expect(solved.key).toBe(target.key);
        expect(solved.value.minus(expected ?? 0).abs().lte(new Dec('1e-30'))).toBe(true);
      }),
    );
  });

  it('names every unknown when more than one step has no value', () => {
    const err = (() => {
      try {
        solveClosure([
          { key: 'a', coefficient: new Dec(1), value: null, uncertainty: null },
          { key: 'b', coefficient: new Dec(1), value: new Dec(3), uncertainty: null },
          { key: 'c', coefficient: new Dec(-1), value: null, uncertainty: null },
        ]);
      } catch (e) {
        return e as ThermoInputError;
      }
      return null;
    })();
    expect(err).toBeInstanceOf(ThermoInputError);
    expect(err?.code).toBe('too_many_unknowns');
    expect(err?.details).toEqual(['a', 'c']);
    expect(err?.message).toMatch(/a, c/);
  });

  it('refuses a cycle with no unknown', () => {
    expect(() => solveClosure([{ key: 'a', coefficient: new Dec(1), value: new Dec(0), uncertainty: null }])).toThrow(/nothing to solve/);
  });

  it('the uncertainty of a one-term sum is that term’s (times its coefficient)', () => {
    fc.assert(
      fc.property(coefficientText, decimalText.map((t) => new Dec(t).abs().toString()), (c, u) => {
        const combined = combineInQuadrature([{ coefficient: new Dec(c), uncertainty: new Dec(u) }]);
        expect(combined?.eq(new Dec(c).abs().times(u))).toBe(true);
      }),
    );
  });
});

describe('lattice sign convention', () => {
  it('switching the convention is a sign flip', () => {
    fc.assert(
      fc.property(decimalText, (v) => {
        const x = new Dec(v);
        expect(latticeToConvention(x, 'formation').eq(x.negated())).toBe(true);
        expect(latticeFromConvention(latticeToConvention(x, 'formation'), 'formation').eq(x)).toBe(true);
        expect(latticeToConvention(x, 'dissociation').eq(x)).toBe(true);
      }),
    );
  });

  it('a solved cycle reports the same magnitude with opposite sign in the two conventions', () => {
    const values: Record<string, ExplicitValue> = {
      'enthalpy_of_formation:KBr': { value: '-393.8' },
      'enthalpy_of_atomization:K': { value: '89.0' },
      'ionization_energy_1:K': { value: '418.8' },
      'enthalpy_of_vaporization:Br2': { value: '30.9' },
      'bond_dissociation_enthalpy:Br2': { value: '192.9' },
      'electron_gain_enthalpy_1:Br': { value: '-324.5371' },
    };
    const cycle = buildBornHaberCycle({ formula: 'KBr', values });
    const d = solveBornHaberCycle(cycle, 'dissociation');
    const f = solveBornHaberCycle(cycle, 'formation');
    expect(new Dec(d.latticeEnthalpy.value).plus(f.latticeEnthalpy.value).isZero()).toBe(true);
    expect(d.convention.text).toMatch(/positive/);
    expect(f.convention.text).toMatch(/negative/);
  });
});

describe('cycle builder', () => {
  // Inputs only (the checks below are structural): CRC ΔfH and atom values as in outside-checks.test.ts.
  const lookup = lookupFromTable({
    'CaCl2|cr|enthalpy_of_formation': { value: '-795.4', source: 'test table' },
    'Ca|g|enthalpy_of_formation': { value: '177.8', source: 'test table' },
    'Ca|g|ionization_energy_1': { value: '589.8' },
    'Ca|g|ionization_energy_2': { value: '1145.4' },
    'Cl2|g|bond_dissociation_enthalpy': { value: '242.6' },
  });

  it('orders the steps around the cycle and names the missing ones', () => {
    const cycle = buildBornHaberCycle({ formula: 'CaCl2', lookup });
    expect(cycle.steps.map((s) => s.key)).toEqual([
      'enthalpy_of_formation:CaCl2',
      'enthalpy_of_atomization:Ca',
      'ionization_energy_1:Ca',
      'ionization_energy_2:Ca',
      'bond_dissociation_enthalpy:Cl2',
      'electron_gain_enthalpy_1:Cl',
      'lattice_enthalpy:CaCl2',
    ]);
    expect(cycle.missing).toEqual(['electron_gain_enthalpy_1:Cl']);
    expect(cycle.steps.find((s) => s.key === 'bond_dissociation_enthalpy:Cl2')?.coefficient.toString()).toBe('1');
    expect(cycle.steps.find((s) => s.key === 'electron_gain_enthalpy_1:Cl')?.coefficient.toString()).toBe('2');
    expect(() => solveBornHaberCycle(cycle)).toThrow(/electron_gain_enthalpy_1:Cl/);
  });

  it('marks overridden values and lets an atomization value stand in for the halogen path', () => {
    const cycle = buildBornHaberCycle({
      formula: 'CaCl2',
      lookup,
      values: { 'enthalpy_of_atomization:Cl': { value: '121.3' }, 'electron_gain_enthalpy_1:Cl': { value: '-348.575' } },
    });
    expect(cycle.nonmetalRoute).toBe('atomization');
    expect(cycle.steps.some((s) => s.key === 'bond_dissociation_enthalpy:Cl2')).toBe(false);
    expect(cycle.steps.find((s) => s.key === 'electron_gain_enthalpy_1:Cl')?.overridden).toBe(true);
    expect(cycle.steps.find((s) => s.key === 'ionization_energy_1:Ca')?.overridden).toBe(false);
  });

  it('follows the real path of bromine (vaporization, dissociation) and iodine (sublimation, dissociation)', () => {
    expect(buildBornHaberCycle({ formula: 'KBr' }).steps.map((s) => s.kind)).toContain('enthalpy_of_vaporization');
    expect(buildBornHaberCycle({ formula: 'NaI' }).steps.map((s) => s.kind)).toContain('enthalpy_of_sublimation');
    expect(buildBornHaberCycle({ formula: 'ZnS' }).nonmetalRoute).toBe('atomization');
  });

  it('solves for an electron-gain enthalpy when the lattice enthalpy is given', () => {
    const cycle = buildBornHaberCycle({
      formula: 'CaCl2',
      lookup,
      unknown: 'electron_gain_enthalpy_1:Cl',
      values: { 'lattice_enthalpy:CaCl2': { value: '2253.85' } },
    });
    const solved = solveBornHaberCycle(cycle);
    // Round trip: the lattice value above came from EG1(Cl) = −348.575 kJ/mol (LibreTexts 'A7: Electron
    // Affinities', https://chem.libretexts.org/Reference/Reference_Tables/Atomic_and_Molecular_Properties/A7%3A_Electron_Affinities)
    expect(new Dec(solved.solvedFor.result.value).toNumber()).toBeCloseTo(-348.575, 6);
  });

  it('applies +5/2RT per electron removed and −5/2RT per electron added on the enthalpy basis', () => {
    const values: Record<string, ExplicitValue> = { 'electron_gain_enthalpy_1:Cl': { value: '-348.575' } };
    const tab = solveBornHaberCycle(buildBornHaberCycle({ formula: 'CaCl2', lookup, values }));
    const corr = solveBornHaberCycle(buildBornHaberCycle({ formula: 'CaCl2', lookup, values, basis: 'enthalpy-corrected' }));
    // two electrons removed (+2·5/2RT) and two added (−2·5/2RT): the corrections cancel for CaCl2
    expect(new Dec(corr.latticeEnthalpy.value).eq(tab.latticeEnthalpy.value)).toBe(true);
    expect(corr.basis.code).toBe('enthalpy-corrected');
    const step = corr.steps.find((s) => s.key === 'ionization_energy_2:Ca');
    expect(new Dec(step?.basisCorrection ?? 0).eq(fiveHalvesRT())).toBe(true);
    // Electrons removed equal electrons added in a neutral salt, so the corrections sum to zero.
    const total = corr.steps.reduce((sum, s) => sum.plus(new Dec(s.coefficient).times(s.basisCorrection)), new Dec(0));
    expect(total.isZero()).toBe(true);
    // 5/2·RT is H°(298.15 K) − H°(0) of a monatomic ideal gas: Ar(g) 6.197 ± 0.001 kJ/mol —
    // CODATA Key Values for Thermodynamics (Cox, Wagman, Medvedev 1989), read at https://zanotowane.pl/1012/4706
    expect(Math.abs(fiveHalvesRT().toNumber() - 6.197)).toBeLessThanOrEqual(0.001);
  });

  it('refuses unknown step keys and bad numbers with the field named', () => {
    try {
      buildBornHaberCycle({ formula: 'CaCl2', values: { 'ionization_energy_3:Ca': { value: 1 } } });
      expect.unreachable();
    } catch (e) {
      expect((e as ThermoInputError).code).toBe('unknown_property');
      expect((e as ThermoInputError).field).toBe('values.ionization_energy_3:Ca');
    }
    try {
      buildBornHaberCycle({ formula: 'CaCl2', values: { 'ionization_energy_1:Ca': { value: 'NaN' } } });
      expect.unreachable();
    } catch (e) {
      expect((e as ThermoInputError).code).toBe('not_a_number');
      expect((e as ThermoInputError).field).toBe('values.ionization_energy_1:Ca.value');
    }
  });
});
