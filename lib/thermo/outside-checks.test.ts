// Born–Haber cycles of 12 salts solved from published inputs and compared with a published table of
// lattice energies. Sources of the inputs:
//  [CRC-TSV] CRC Handbook 'Standard Thermodynamic Properties of Chemical Substances' as transcribed in
//            github.com/CalebBell/chemicals, 'chemicals/Heat Capacity/CRC Standard Thermodynamic
//            Properties of Chemical Substances.tsv' (commit 3a75b96; J/mol, read and converted to kJ/mol):
//            ΔfH° of the solids, of the gaseous atoms (= atomization enthalpies) and of Br2(g), I2(g).
//  [PGC-J]   'Principles of General Chemistry' v1.0, Appendix J 'Table of Ionization Energies' (kJ/mol),
//            http://webmis.highland.cc.il.us/~jsullivan/principles-of-general-chemistry-v1.0/s39_ionization_energies.html
//  [LT-A7]   LibreTexts Chemistry, Reference Tables 'A7: Electron Affinities' (kJ/mol),
//            https://chem.libretexts.org/Reference/Reference_Tables/Atomic_and_Molecular_Properties/A7%3A_Electron_Affinities
//  [CODATA]  CODATA Key Values for Thermodynamics (Cox, Wagman, Medvedev 1989), read at
//            https://zanotowane.pl/1012/4706 — uncertainties of Al(g), Al2O3, Ag(g), AgCl, Br(g).
// The lattice-energy table: CRC Handbook 'Lattice energies' (Jenkins & Roobottom), Table 1, U_POT from
// the Born–Fajans–Haber cycle, with ΔH_L = U_POT + [a(n_M/2 − 2) + b(n_X/2 − 2)]RT (page read at
// https://zanotowane.pl/1023/1169; its table rows were not readable there, so each value below says
// where it was read or that it is from memory).
import { describe, expect, it } from 'vitest';
import type { ReferenceValue } from '../reference/properties';
import { buildBornHaberCycle, type ExplicitValue } from './cycle';
import { solveBornHaberCycle } from './cycle-solve';
import { Dec } from './decimal';
import { latticeEnergyToEnthalpy } from './lattice-models';
import { lookupFromReferenceValues } from './reference-lookup';

type Inputs = Record<string, ExplicitValue>;
const v = (value: string, uncertainty?: string): ExplicitValue => ({ value, uncertainty: uncertainty ?? null });

// Shared inputs.
const IE = {
  Li: ['520.2'], // [PGC-J]
  Na: ['495.8'], // [PGC-J]
  K: ['418.8'], // [PGC-J]
  Mg: ['737.7', '1450.7'], // [PGC-J]
  Ca: ['589.8', '1145.4'], // [PGC-J]
  Al: ['577.5', '1816.7', '2744.8'], // [PGC-J]
  Ag: ['731.0'], // from memory (NIST ASD 7.5762 eV)
} as const;
const ATOM = {
  Li: v('159.3'), Na: v('107.5'), K: v('89.0'), Mg: v('147.1'), Ca: v('177.8'), // [CRC-TSV]
  Al: v('330.0', '4.0'), // [CRC-TSV], u from [CODATA] 330.0 ± 4.0
  Ag: v('284.9', '0.8'), // [CRC-TSV], u from [CODATA] 284.9 ± 0.8
  Cl: v('121.3'), // [CRC-TSV] Chlorine (atomic) 121300 J/mol
};
const EG1 = {
  Cl: v('-348.575', '0.003'), // [LT-A7] EA 348.575(3)
  Br: v('-324.5371', '0.0003'), // [LT-A7] EA 324.5371(3)
  O: v('-140.9760', '0.0002'), // [LT-A7] EA 140.9760(2), 16O
  I: v('-295.153'), // from memory (EA of I 3.059 eV)
};
// O⁻ + e⁻ → O²⁻ cannot be measured; textbook back-calculated values spread over roughly +750 to +850
// kJ/mol, so +844 ± 100 — from memory. Oxide checks are partly circular.
const EG2_O = v('844', '100');
const D_O2 = v('498.4'); // 2 × ΔfH°(O, g) = 2 × 249.2 [CRC-TSV]

function metal(symbol: keyof typeof IE): Inputs {
  const out: Inputs = { [`enthalpy_of_atomization:${symbol}`]: ATOM[symbol as keyof typeof ATOM] ?? v('0') };
  IE[symbol].forEach((value, i) => {
    out[`ionization_energy_${i + 1}:${symbol}`] = v(value);
  });
  return out;
}

interface Case {
  formula: string;
  values: Inputs;
  /** U_POT(BFHC) from the lattice-energy table, kJ/mol, and where it was read. */
  table: number;
}

const CASES: Case[] = [
  // NaCl 786 — quoted as 'NaCl has U = 786 kJ/mol', https://clevercalculator.com/science/lattice-energy (read)
  { formula: 'NaCl', table: 786, values: { 'enthalpy_of_formation:NaCl': v('-411.2'), ...metal('Na'), 'enthalpy_of_atomization:Cl': ATOM.Cl, 'electron_gain_enthalpy_1:Cl': EG1.Cl } },
  // KCl 715 — from memory (CRC 'Lattice energies' table)
  { formula: 'KCl', table: 715, values: { 'enthalpy_of_formation:KCl': v('-436.5'), ...metal('K'), 'enthalpy_of_atomization:Cl': ATOM.Cl, 'electron_gain_enthalpy_1:Cl': EG1.Cl } },
  // KBr 689 — from memory (CRC 'Lattice energies' table)
  {
    formula: 'KBr',
    table: 689,
    values: {
      'enthalpy_of_formation:KBr': v('-393.8'),
      ...metal('K'),
      'enthalpy_of_vaporization:Br2': v('30.9'), // ΔfH°(Br2, g) [CRC-TSV]
      'bond_dissociation_enthalpy:Br2': v('192.9'), // 2 × 111.9 − 30.9 [CRC-TSV]
      'electron_gain_enthalpy_1:Br': EG1.Br,
    },
  },
  // NaI 704 — from memory (CRC 'Lattice energies' table)
  {
    formula: 'NaI',
    table: 704,
    values: {
      'enthalpy_of_formation:NaI': v('-287.8'),
      ...metal('Na'),
      'enthalpy_of_sublimation:I2': v('62.4'), // ΔfH°(I2, g) [CRC-TSV]
      'bond_dissociation_enthalpy:I2': v('151.2'), // 2 × 106.8 − 62.4 [CRC-TSV]
      'electron_gain_enthalpy_1:I': EG1.I,
    },
  },
  // AgCl 915 — from memory (CRC 'Lattice energies' table)
  { formula: 'AgCl', table: 915, values: { 'enthalpy_of_formation:AgCl': v('-127.0', '0.05'), ...metal('Ag'), 'enthalpy_of_atomization:Cl': ATOM.Cl, 'electron_gain_enthalpy_1:Cl': EG1.Cl } },
  // MgCl2 2526 — from memory (CRC 'Lattice energies' table)
  { formula: 'MgCl2', table: 2526, values: { 'enthalpy_of_formation:MgCl2': v('-641.3'), ...metal('Mg'), 'enthalpy_of_atomization:Cl': ATOM.Cl, 'electron_gain_enthalpy_1:Cl': EG1.Cl } },
  // CaCl2 2258 — from memory (CRC 'Lattice energies' table)
  { formula: 'CaCl2', table: 2258, values: { 'enthalpy_of_formation:CaCl2': v('-795.4'), ...metal('Ca'), 'enthalpy_of_atomization:Cl': ATOM.Cl, 'electron_gain_enthalpy_1:Cl': EG1.Cl } },
  // Li2O 2799 — from memory (CRC 'Lattice energies' table)
  { formula: 'Li2O', table: 2799, values: { 'enthalpy_of_formation:Li2O': v('-597.9'), ...metal('Li'), 'bond_dissociation_enthalpy:O2': D_O2, 'electron_gain_enthalpy_1:O': EG1.O, 'electron_gain_enthalpy_2:O': EG2_O } },
  // Na2O 2481 — from memory (CRC 'Lattice energies' table)
  { formula: 'Na2O', table: 2481, values: { 'enthalpy_of_formation:Na2O': v('-414.2'), ...metal('Na'), 'bond_dissociation_enthalpy:O2': D_O2, 'electron_gain_enthalpy_1:O': EG1.O, 'electron_gain_enthalpy_2:O': EG2_O } },
  // MgO 3795 — 'MgO sits at 3795 kJ/mol', https://clevercalculator.com/science/lattice-energy (read)
  { formula: 'MgO', table: 3795, values: { 'enthalpy_of_formation:MgO': v('-601.6'), ...metal('Mg'), 'bond_dissociation_enthalpy:O2': D_O2, 'electron_gain_enthalpy_1:O': EG1.O, 'electron_gain_enthalpy_2:O': EG2_O } },
  // CaO 3414 — lattice-energy table in a public chemistry lesson on GitHub (found by text search, file id 56828952090; weak source)
  { formula: 'CaO', table: 3414, values: { 'enthalpy_of_formation:CaO': v('-634.9'), ...metal('Ca'), 'bond_dissociation_enthalpy:O2': D_O2, 'electron_gain_enthalpy_1:O': EG1.O, 'electron_gain_enthalpy_2:O': EG2_O } },
  // Al2O3 15916 — 'Al₂O₃ reaches 15,916 kJ/mol', https://clevercalculator.com/science/lattice-energy (read)
  { formula: 'Al2O3', table: 15916, values: { 'enthalpy_of_formation:Al2O3': v('-1675.7', '1.3'), ...metal('Al'), 'bond_dissociation_enthalpy:O2': D_O2, 'electron_gain_enthalpy_1:O': EG1.O, 'electron_gain_enthalpy_2:O': EG2_O } },
];

describe('Born–Haber cycles against a published table of lattice energies', () => {
  it('covers 1:1, 2:1, 1:2, 2:2 and 3:2 salts', () => {
    expect(CASES).toHaveLength(12);
  });

  for (const c of CASES) {
    it(`${c.formula}: the cycle gives the tabulated lattice energy within 1 % or within twice the combined uncertainty`, () => {
      const solved = solveBornHaberCycle(buildBornHaberCycle({ formula: c.formula, values: c.values }));
      const enthalpy = Number(solved.latticeEnthalpy.value);
      const a = solved.cation.count;
      const b = solved.anion.count;
      // Back from enthalpy to U_POT with the same Jenkins relation the table used (U = ΔH_L + (a+b)RT/2 here).
      const energy = enthalpy - (latticeEnergyToEnthalpy(0, a, b));
      const u = solved.latticeEnthalpy.uncertainty === null ? 0 : Number(solved.latticeEnthalpy.uncertainty);
      const tolerance = Math.max(0.01 * c.table, 2 * u);
      expect(Math.abs(energy - c.table)).toBeLessThanOrEqual(tolerance);
      expect(enthalpy).toBeGreaterThan(0);
    });
  }

  it('oxide results carry the circularity note', () => {
    const mgo = CASES.find((c) => c.formula === 'MgO');
    const solved = solveBornHaberCycle(buildBornHaberCycle({ formula: 'MgO', values: mgo?.values }));
    expect(solved.notes.join(' ')).toMatch(/back-calculated/);
  });
});

describe('a reference edition plugged in through the lookup', () => {
  const row = (species: string, phase: ReferenceValue['phase'], property: ReferenceValue['property'], value: string, source: string): ReferenceValue => ({
    species, phase, charge: 0, property, value, uncertainty: null, unit: 'kJ/mol', source, fromMemory: false,
  });
  const edition: ReferenceValue[] = [
    row('CaCl2', 'cr', 'enthalpy_of_formation', '-795.4', '[CRC-TSV]'),
    row('Ca', 'g', 'enthalpy_of_formation', '177.8', '[CRC-TSV]'),
    row('Ca', 'g', 'ionization_energy_1', '589.8', '[PGC-J]'),
    row('Ca', 'g', 'ionization_energy_2', '1145.4', '[PGC-J]'),
    row('Cl2', 'g', 'bond_dissociation_enthalpy', '242.6', '2 × 121.3 [CRC-TSV]'),
    row('Cl', 'g', 'electron_gain_enthalpy_1', '-348.575', '[LT-A7]'),
  ];

  it('gives the same CaCl2 lattice enthalpy as explicit values, and carries each source', () => {
    const solved = solveBornHaberCycle(buildBornHaberCycle({ formula: 'CaCl2', lookup: lookupFromReferenceValues(edition) }));
    // CaCl2 2258 (U_POT) — from memory (CRC 'Lattice energies' table); ΔH_L = U − 3RT/2
    expect(Math.abs(Number(solved.latticeEnthalpy.value) - (2258 + latticeEnergyToEnthalpy(0, 1, 2)))).toBeLessThan(22.58);
    expect(solved.steps.find((s) => s.key === 'ionization_energy_2:Ca')?.source).toBe('[PGC-J]');
    // Independent arithmetic: −ΔfH + ΔatH + IE1 + IE2 + D(Cl2) + 2·EG1, from the rows above.
    const byHand = new Dec('795.4').plus('177.8').plus('589.8').plus('1145.4').plus('242.6').plus(new Dec('-348.575').times(2));
    expect(new Dec(solved.latticeEnthalpy.value).eq(byHand)).toBe(true);
  });
});
