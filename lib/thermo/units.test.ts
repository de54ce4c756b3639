import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KJ_PER_MOL_PER_EV } from './constants';
import { Dec } from './decimal';
import { ThermoInputError } from './errors';
import { convertEnergy, ENERGY_UNITS } from './units';
import { roundWithUncertainty } from './uncertainty';

const value = fc
  .tuple(fc.integer({ min: -9_999_999_999, max: 9_999_999_999 }), fc.integer({ min: 0, max: 6 }))
  .map(([n, p]) => new Dec(n).div(new Dec(10).pow(p)).toString());

function agreeTo30Digits(a: Dec, b: Dec): boolean {
  if (a.isZero() || b.isZero()) return a.minus(b).abs().lte(new Dec('1e-30'));
  return a.toSignificantDigits(30).eq(b.toSignificantDigits(30));
}

describe('energy units', () => {
  it('round trips between every pair of units agree to 30 significant digits', () => {
    fc.assert(
      fc.property(value, fc.constantFrom(...ENERGY_UNITS), fc.constantFrom(...ENERGY_UNITS), (v, from, to) => {
        const molarMass = '110.98';
        const there = convertEnergy(v, from, to, molarMass);
        const back = convertEnergy(there, to, from, molarMass);
        expect(agreeTo30Digits(back, new Dec(v))).toBe(true);
      }),
    );
  });

  it('uses the thermochemical calorie and the exact CODATA 2018 eV', () => {
    // 1 cal = 4.184 J (thermochemical calorie) — common practice, no source
    expect(convertEnergy('4.184', 'kJ/mol', 'kcal/mol').eq(1)).toBe(true);
    // e = 1.602176634e-19 C and N_A = 6.02214076e23 /mol are exact (CODATA 2018, 2019 SI);
    // 1 eV per particle = 96.485 332 12... kJ/mol — 96.485307 kJ/mol quoted by ChemLin
    // ('Ionization Energies of the Chemical Elements', https://www.chemlin.org/chemical-elements/ionization-energies.php)
    expect(Math.abs(KJ_PER_MOL_PER_EV.toNumber() - 96.485307)).toBeLessThan(0.0001);
    expect(KJ_PER_MOL_PER_EV.toString()).toBe('96.4853321233100184');
  });

  it('kJ/kg goes through the molar mass', () => {
    // arbitrary value and molar mass; the check is the definition kJ/kg = kJ/mol × 1000 / M
    expect(convertEnergy('787', 'kJ/mol', 'kJ/kg', '58.44').toNumber()).toBeCloseTo((787 * 1000) / 58.44, 8);
  });

  it('refuses an unknown unit or a missing molar mass', () => {
    expect(() => convertEnergy(1, 'kJ/mol', 'BTU')).toThrow(ThermoInputError);
    expect(() => convertEnergy(1, 'kJ/mol', 'kJ/kg')).toThrow(/molar mass/);
  });
});

describe('rounding value ± u to justified figures', () => {
  it('keeps two digits of u when it starts with 1 or 2, one otherwise, and rounds the value to match', () => {
    expect(roundWithUncertainty(new Dec('2254.2345'), new Dec('1.2806')).text).toBe('2254.2 ± 1.3');
    expect(roundWithUncertainty(new Dec('3889.31'), new Dec('51.3')).text).toBe('3890 ± 50');
    expect(roundWithUncertainty(new Dec('-37.1'), new Dec('0.0866')).text).toBe('-37.10 ± 0.09');
    expect(roundWithUncertainty(new Dec('12.3456'), null).text).toMatch(/no uncertainty/);
  });

  it('keeps the exact value beside the rounded one', () => {
    fc.assert(
      fc.property(value, value.map((t) => new Dec(t).abs().plus('0.001').toString()), (v, u) => {
        const r = roundWithUncertainty(new Dec(v), new Dec(u));
        expect(new Dec(r.value).eq(v)).toBe(true);
        expect(new Dec(r.roundedValue).minus(v).abs().lte(new Dec(r.roundedUncertainty ?? 0))).toBe(true);
      }),
    );
  });
});
