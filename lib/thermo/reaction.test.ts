// Hess's-law reaction enthalpies. Formation enthalpies:
//  [CRC-TSV] CRC 'Standard Thermodynamic Properties of Chemical Substances', CalebBell/chemicals (commit 3a75b96)
//  [CRC-ION] CRC 'Thermodynamic Properties of Aqueous Ions', CalebBell/chemicals (commit 4f55bfe)
import { describe, expect, it } from 'vitest';
import { ThermoInputError } from './errors';
import { computeReactionEnthalpy, parseReaction } from './reaction';

const DFH = {
  'CaCO3(cr)': '-1207.6', // [CRC-TSV] calcite
  'CaO(cr)': '-634.9', // [CRC-TSV]
  'CO2(g)': '-393.5', // [CRC-TSV]
  'H2O(l)': '-285.8', // [CRC-TSV]
  'HCl(aq)': '-167.2', // HCl fully dissociated: ΔfH(H⁺) + ΔfH(Cl⁻) = 0 + (−167.2) [CRC-ION]
  'CaCl2(aq)': '-877.2', // Ca²⁺ −542.8 + 2 × Cl⁻ −167.2 [CRC-ION]
  'Ca2+(aq)': '-542.8', // [CRC-ION]
  'Cl-(aq)': '-167.2', // [CRC-ION]
};

describe('reaction enthalpy by Hess’s law', () => {
  it('limestone calcination matches the textbook value', () => {
    const r = computeReactionEnthalpy({ reaction: 'CaCO3(cr) -> CaO(cr) + CO2(g)', enthalpiesOfFormation: DFH });
    // CaCO3 → CaO + CO2, ΔH = +178 kJ/mol — textbook value, from memory
    expect(Math.abs(Number(r.reactionEnthalpy.value) - 178) / 178).toBeLessThan(0.01);
  });

  it('the molecular and the ionic form of quicklime in hydrochloric acid give the same enthalpy', () => {
    const molecular = computeReactionEnthalpy({ reaction: 'CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)', enthalpiesOfFormation: DFH });
    const ionic = computeReactionEnthalpy({ reaction: 'CaO(cr) + 2 H+(aq) -> Ca2+(aq) + H2O(l)', enthalpiesOfFormation: DFH });
    expect(Number(molecular.reactionEnthalpy.value)).toBeCloseTo(Number(ionic.reactionEnthalpy.value), 9);
    expect(ionic.terms.find((t) => t.key === 'H+(aq)')?.source).toMatch(/convention/);
  });

  it('elements in their reference state count as zero', () => {
    const r = computeReactionEnthalpy({ reaction: 'Ca(cr) + Cl2(g) -> CaCl2(aq)', enthalpiesOfFormation: DFH });
    expect(Number(r.reactionEnthalpy.value)).toBeCloseTo(Number(DFH['CaCl2(aq)']), 9);
  });

  it('scales to a batch by the mass of one named species', () => {
    // Inputs from the table above; the 0.9 kJ/mol uncertainty and the 56.077 kg batch are arbitrary.
    const r = computeReactionEnthalpy({
      reaction: 'CaO(cr) + 2 HCl(aq) -> CaCl2(aq) + H2O(l)',
      enthalpiesOfFormation: { 'CaO(cr)': { value: '-634.9', uncertainty: '0.9' }, 'HCl(aq)': '-167.2', 'CaCl2(aq)': '-877.2', 'H2O(l)': '-285.8' },
      batch: { species: 'CaO(cr)', massKg: 56.077 },
    });
    const perMol = Number(r.reactionEnthalpy.value);
    const moles = Number(r.batch?.amountMol);
    expect(moles).toBeCloseTo(56077 / Number(r.batch?.molarMass), 9);
    expect(Number(r.batch?.enthalpyChangeKj.value)).toBeCloseTo(moles * perMol, 6);
    expect(Number(r.batch?.heatReleasedKj)).toBeCloseTo(-moles * perMol, 6);
    expect(Number(r.reactionEnthalpy.uncertainty)).toBeCloseTo(0.9, 9);
  });

  it('refuses an unbalanced reaction, naming the element or the charge', () => {
    const err = (text: string): ThermoInputError => {
      try {
        computeReactionEnthalpy({ reaction: text, enthalpiesOfFormation: DFH });
      } catch (e) {
        return e as ThermoInputError;
      }
      throw new Error('no error');
    };
    const cl = err('CaO(cr) + HCl(aq) -> CaCl2(aq) + H2O(l)');
    expect(cl.code).toBe('unbalanced_reaction');
    expect(cl.message).toMatch(/^(H|Cl) does not balance/);
    expect(err('Ca2+(aq) + Cl-(aq) -> CaCl2(aq)').message).toMatch(/Cl does not balance/);
    expect(err('CaO(cr) + 2 H+(aq) -> Ca2+(aq) + H2O(l) + Cl-(aq)').message).toMatch(/Cl does not balance|Charge/);
    expect(err('Ca(cr) + 2 H+(aq) -> Ca2+(aq) + H2(g) + 2 Cl-(aq)').code).toBe('unbalanced_reaction');
  });

  it('names the species whose enthalpy of formation is missing', () => {
    expect(() => computeReactionEnthalpy({ reaction: 'MgO(cr) + 2 HCl(aq) -> MgCl2(aq) + H2O(l)', enthalpiesOfFormation: DFH })).toThrow(/MgO\(cr\), MgCl2\(aq\)/);
  });

  it('needs a phase on every species and one arrow', () => {
    expect(() => parseReaction('CaO + CO2 -> CaCO3(cr)')).toThrow(/phase/);
    expect(() => parseReaction('CaO(cr) + CO2(g)')).toThrow(/arrow/);
  });
});
