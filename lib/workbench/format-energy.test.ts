import { describe, expect, it } from 'vitest';
import { energyText, formatEnergy, formatRounded, kjToTyped, parseTyped, typedToKj } from './format-energy';

describe('energy formatting', () => {
  it('groups thousands with a thin space, uses a true minus, and follows the uncertainty', () => {
    // Uncertainty to 2 significant digits when it starts with 1 or 2, else 1 (common practice, no source)
    expect(energyText('12258.4321', 'kJ/mol', '1.2')).toBe('12\u2009258.4 ± 1.2 kJ/mol');
    expect(energyText('2258.4321', 'kJ/mol', '3.1')).toBe('2258 ± 3 kJ/mol');
    expect(formatEnergy('-348.575', 'kJ/mol').text).toBe('\u2212348.6');
    expect(formatEnergy('1145.4', 'kJ/mol', null, { signed: true }).value).toBe('+1145.4');
  });

  it('converts between units exactly and back', () => {
    // 1 kcal/mol = 4.184 kJ/mol (thermochemical calorie) — common practice, no source
    expect(typedToKj('1', 'kcal/mol')).toBe('4.184');
    expect(energyText('4.184', 'kcal/mol')).toBe('1.00 kcal/mol');
    // 1 eV per formula unit = 96.485 kJ/mol — CODATA e·N_A, from memory
    expect(Number(typedToKj('1', 'eV'))).toBeCloseTo(96.4853, 3);
    expect(kjToTyped(typedToKj('171.37', 'kcal/mol')!, 'kcal/mol')).toBe('171.37');
  });

  it('reads what people type: a true minus, thin spaces; refuses what is not a number', () => {
    expect(parseTyped('\u22122\u2009258.5')).toBe('-2258.5');
    expect(parseTyped('12,5')).toBeNull();
    expect(parseTyped('')).toBeNull();
    expect(typedToKj('abc', 'kJ/mol')).toBeNull();
  });

  it('shows a rounded engine value with its uncertainty, or plain when none was given', () => {
    expect(formatRounded({ value: '184270.7634', uncertainty: null }, 0)).toBe('184\u2009271');
    expect(formatRounded({ value: '44.0389', uncertainty: '1.234' }, 1)).toBe('44.0 ± 1.2');
  });
});
