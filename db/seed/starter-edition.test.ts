import { describe, expect, it } from 'vitest';
import { HYDRATION_SCALES, PHASES, PROPERTIES, type PropertyCode, type ReferenceValue } from '../../lib/reference/properties';
import { STARTER_EDITION_META, STARTER_EDITION_VALUES } from './starter-edition';

const V = STARTER_EDITION_VALUES;
const DECIMAL = /^-?\d+(\.\d+)?$/;
const EV_TO_KJ = 96.485332;

function find(species: string, phase: ReferenceValue['phase'], property: PropertyCode, coordination?: number) {
  const hits = V.filter(
    (v) => v.species === species && v.phase === phase && v.property === property && v.coordination === coordination,
  );
  expect(hits, `${species}(${phase}) ${property}`).toHaveLength(1);
  return hits[0]!;
}
const num = (species: string, phase: ReferenceValue['phase'], property: PropertyCode, coordination?: number) =>
  Number(find(species, phase, property, coordination).value);

/** Element symbols and counts of a formula such as Al2O3 (no hydrate dot). */
function parseFormula(formula: string): Array<[string, number]> {
  const out: Array<[string, number]> = [];
  for (const m of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) out.push([m[1]!, m[2] ? Number(m[2]) : 1]);
  return out;
}

/** Charge implied by an ion string such as Ca2+, Cl-, N3-; 0 for neutral species. */
function chargeOf(species: string): number {
  const m = species.match(/(\d*)([+-])$/);
  if (!m) return 0;
  const n = m[1] ? Number(m[1]) : 1;
  return m[2] === '+' ? n : -n;
}

const CATION_CHARGE: Record<string, number> = {
  Li: 1, Na: 1, K: 1, Rb: 1, Cs: 1, Ag: 1, Mg: 2, Ca: 2, Sr: 2, Ba: 2, Zn: 2, Al: 3,
};
const ANION_CHARGE: Record<string, number> = { F: -1, Cl: -1, Br: -1, I: -1, O: -2, S: -2, Se: -2, N: -3 };

const binarySalts = () =>
  [...new Set(
    V.filter((v) => v.property === 'enthalpy_of_formation' && v.phase === 'cr' && !v.species.includes('·'))
      .map((v) => v.species)
      .filter((s) => parseFormula(s).length === 2),
  )];

describe('starter edition: provenance and form', () => {
  it('every value cites a source or is flagged fromMemory (with a note saying so)', () => {
    for (const v of V) {
      if (v.fromMemory) {
        expect(v.source, `${v.species} ${v.property}`).toBe('');
        expect(v.note ?? '', `${v.species} ${v.property}`).toMatch(/from memory/i);
      } else {
        expect(v.source.trim().length, `${v.species} ${v.property}`).toBeGreaterThan(20);
      }
    }
  });

  it('has no duplicate (species, phase, property, coordination) rows', () => {
    const keys = V.map((v) => `${v.species}|${v.phase}|${v.property}|${v.coordination ?? ''}`);
    const dupes = keys.filter((k, i) => keys.indexOf(k) !== i);
    expect(dupes).toEqual([]);
  });

  it('uses the unit of the shared vocabulary, a known phase and a known property', () => {
    for (const v of V) {
      expect(Object.keys(PROPERTIES)).toContain(v.property);
      expect(PHASES).toContain(v.phase);
      expect(v.unit, `${v.species} ${v.property}`).toBe(PROPERTIES[v.property].unit);
    }
  });

  it('stores values and uncertainties as plain decimal strings', () => {
    for (const v of V) {
      expect(v.value, `${v.species} ${v.property}`).toMatch(DECIMAL);
      if (v.uncertainty !== null) {
        expect(v.uncertainty).toMatch(DECIMAL);
        expect(Number(v.uncertainty)).toBeGreaterThan(0);
      }
    }
  });

  it('gives each species the charge its formula implies', () => {
    for (const v of V) expect(v.charge, v.species).toBe(chargeOf(v.species));
  });

  it('gives ionic radii a coordination number and lattice rows a structure name', () => {
    for (const v of V.filter((x) => x.property === 'ionic_radius')) {
      expect(v.coordination, v.species).toBeGreaterThan(0);
      expect(v.charge).not.toBe(0);
    }
    for (const v of V.filter((x) => x.property === 'madelung_constant' || x.property === 'interionic_distance')) {
      expect(v.structure, v.species).toBeTruthy();
    }
    // Madelung constant and interionic distance of one salt name the same structure.
    for (const d of V.filter((x) => x.property === 'interionic_distance')) {
      expect(find(d.species, 'cr', 'madelung_constant').structure).toBe(d.structure);
    }
  });
});

describe('starter edition: chemistry rules', () => {
  it('stores electron-gain enthalpies signed: first negative for halogens, O, S, Se; later steps positive', () => {
    for (const el of ['F', 'Cl', 'Br', 'I', 'O', 'S', 'Se']) expect(num(el, 'g', 'electron_gain_enthalpy_1'), el).toBeLessThan(0);
    expect(num('N', 'g', 'electron_gain_enthalpy_1')).toBeGreaterThan(0);
    expect(num('N', 'g', 'electron_gain_enthalpy_1')).toBeLessThan(20);
    for (const v of V.filter((x) => x.property === 'electron_gain_enthalpy_2' || x.property === 'electron_gain_enthalpy_3')) {
      expect(Number(v.value), `${v.species} ${v.property}`).toBeGreaterThan(0);
      expect(v.note ?? '').toMatch(/back-calculated/);
    }
  });

  it('puts every hydration enthalpy on the one scale named in the meta, with the expected signs', () => {
    expect(HYDRATION_SCALES).toContain(STARTER_EDITION_META.hydrationScale);
    const rows = V.filter((v) => v.property === 'hydration_enthalpy');
    expect(rows.length).toBeGreaterThanOrEqual(16);
    expect(new Set(rows.map((r) => r.scale))).toEqual(new Set([STARTER_EDITION_META.hydrationScale]));
    for (const r of rows) {
      expect(r.phase).toBe('g');
      expect(r.charge).not.toBe(0);
      // On the absolute scale every ion's hydration is exothermic.
      if (STARTER_EDITION_META.hydrationScale === 'absolute') expect(Number(r.value), r.species).toBeLessThan(0);
    }
    // Higher charge, stronger hydration: the trend any one scale must show.
    expect(num('Mg2+', 'g', 'hydration_enthalpy')).toBeLessThan(num('Na+', 'g', 'hydration_enthalpy'));
    expect(num('Li+', 'g', 'hydration_enthalpy')).toBeLessThan(num('Cs+', 'g', 'hydration_enthalpy'));
  });

  it('orders successive ionization energies upward', () => {
    for (const el of Object.keys(CATION_CHARGE)) {
      const z = CATION_CHARGE[el]!;
      for (let i = 2; i <= z; i++) {
        const prev = num(el, 'g', `ionization_energy_${i - 1}` as PropertyCode);
        expect(num(el, 'g', `ionization_energy_${i}` as PropertyCode), `${el} IE${i}`).toBeGreaterThan(prev);
      }
    }
  });

  it('states aqueous-ion enthalpies on the conventional scale H+(aq) = 0', () => {
    expect(num('H+', 'aq', 'enthalpy_of_formation')).toBe(0);
    for (const v of V.filter((x) => x.phase === 'aq')) expect(v.charge, v.species).not.toBe(0);
  });
});

describe('starter edition: coverage', () => {
  it('covers at least 40 binary salts, each with enthalpy of formation and density', () => {
    const salts = binarySalts();
    expect(salts.length).toBeGreaterThanOrEqual(40);
    for (const s of salts) expect(find(s, 'cr', 'density').value, s).toMatch(DECIMAL);
    for (const s of ['AlCl3', 'Al2O3', 'ZnO', 'ZnS', 'ZnCl2', 'AgCl', 'AgBr', 'AgI', 'LiCl', 'LiBr', 'LiI', 'LiF', 'Li2O', 'Li2S', 'Li3N']) {
      expect(salts, s).toContain(s);
    }
  });

  it('covers the common chloride hydrates', () => {
    for (const h of ['CaCl2·2H2O', 'CaCl2·6H2O', 'MgCl2·6H2O', 'LiCl·H2O', 'SrCl2·6H2O', 'BaCl2·2H2O']) {
      find(h, 'cr', 'enthalpy_of_formation');
      find(h, 'cr', 'density');
    }
  });

  it('holds everything a Born–Haber cycle needs for every binary salt', () => {
    const has = (species: string, phase: ReferenceValue['phase'], property: PropertyCode) =>
      V.some((v) => v.species === species && v.phase === phase && v.property === property);
    for (const salt of binarySalts()) {
      const [[cation], [anion]] = parseFormula(salt) as [[string, number], [string, number]];
      const zc = CATION_CHARGE[cation];
      const za = ANION_CHARGE[anion];
      expect(zc, `${salt}: cation ${cation}`).toBeDefined();
      expect(za, `${salt}: anion ${anion}`).toBeDefined();
      // Cation: atomization of the element (standard state) and ionization energies up to the charge.
      expect(has(cation, 'cr', 'enthalpy_of_atomization') || has(cation, 'g', 'enthalpy_of_formation'), `${salt}: ${cation} atomization`).toBe(true);
      for (let i = 1; i <= zc!; i++) expect(has(cation, 'g', `ionization_energy_${i}` as PropertyCode), `${salt}: ${cation} IE${i}`).toBe(true);
      // Anion: a path to the gaseous atom and electron-gain enthalpies up to the charge.
      const path =
        has(anion, 'cr', 'enthalpy_of_atomization') ||
        (has(`${anion}2`, 'g', 'bond_dissociation_enthalpy') &&
          (anion === 'Br' ? has('Br2', 'l', 'enthalpy_of_vaporization') : anion === 'I' ? has('I2', 'cr', 'enthalpy_of_sublimation') : true));
      expect(path, `${salt}: path to ${anion}(g)`).toBe(true);
      expect(has(anion, 'g', 'enthalpy_of_formation'), `${salt}: ${anion}(g)`).toBe(true);
      for (let i = 1; i <= -za!; i++) expect(has(anion, 'g', `electron_gain_enthalpy_${i}` as PropertyCode), `${salt}: ${anion} EG${i}`).toBe(true);
      // Ions: Born exponents and at least one Shannon radius each.
      for (const ion of [`${cation}${zc === 1 ? '' : zc}+`, `${anion}${za === -1 ? '' : -za!}-`]) {
        expect(has(ion, 'g', 'born_exponent'), `${salt}: Born exponent of ${ion}`).toBe(true);
        expect(has(ion, 'g', 'ionic_radius'), `${salt}: radius of ${ion}`).toBe(true);
      }
    }
  });

  it('holds the aqueous ions and water for the dissolution route', () => {
    for (const ion of ['Li+', 'Na+', 'K+', 'Rb+', 'Cs+', 'Mg2+', 'Ca2+', 'Sr2+', 'Ba2+', 'Al3+', 'Zn2+', 'Ag+', 'F-', 'Cl-', 'Br-', 'I-', 'OH-']) {
      find(ion, 'aq', 'enthalpy_of_formation');
      find(ion, 'g', 'hydration_enthalpy');
    }
    expect(num('H2O', 'l', 'enthalpy_of_formation')).toBeLessThan(-280);
  });

  it('keeps fromMemory rows a minority', () => {
    const mem = V.filter((v) => v.fromMemory).length;
    expect(mem / V.length).toBeLessThan(0.3);
  });
});

describe('starter edition: spot checks against independently published values', () => {
  const close = (got: number, want: number, tol: number) => expect(Math.abs(got - want)).toBeLessThanOrEqual(tol);

  it('ionization energies', () => {
    // Molar ionization energies (kJ/mol), Wikipedia data page as reproduced in "Principles of General
    // Chemistry" v1.0, Appendix J: Li 520.2, Na 495.8, K 418.8, Mg(2nd) 1450.7, Ca(2nd) 1145.4, Al(3rd) 2744.8
    // http://webmis.highland.cc.il.us/~jsullivan/principles-of-general-chemistry-v1.0/s39_ionization_energies.html
    close(num('Li', 'g', 'ionization_energy_1'), 520.2, 0.15);
    close(num('Na', 'g', 'ionization_energy_1'), 495.8, 0.15);
    close(num('K', 'g', 'ionization_energy_1'), 418.8, 0.15);
    close(num('Mg', 'g', 'ionization_energy_2'), 1450.7, 0.15);
    close(num('Ca', 'g', 'ionization_energy_2'), 1145.4, 0.15);
    close(num('Al', 'g', 'ionization_energy_3'), 2744.8, 0.15);
    // Na first ionization energy 5.139076 eV — ChemLin "Ionization Energies of the Chemical Elements",
    // https://www.chemlin.org/chemical-elements/ionization-energies.php
    close(num('Na', 'g', 'ionization_energy_1'), 5.139076 * EV_TO_KJ, 0.1);
  });

  it('electron-gain enthalpies', () => {
    // Electron affinities 3.61272528 eV (Cl) and 3.401189824 eV (F) — pymatgen periodic_table.json,
    // a different compilation from the LibreTexts table the seed uses.
    close(num('Cl', 'g', 'electron_gain_enthalpy_1'), -3.61272528 * EV_TO_KJ, 0.01);
    close(num('F', 'g', 'electron_gain_enthalpy_1'), -3.401189824 * EV_TO_KJ, 0.01);
  });

  it('enthalpies of formation', () => {
    // CODATA Key Values (Cox, Wagman, Medvedev 1989), as reprinted at https://zanotowane.pl/1012/4706:
    // AgCl(cr) -127.01 ± 0.05; Al2O3(cr, corundum) -1675.7 ± 1.3; AlF3(cr) -1510.4 ± 1.3;
    // Ag(g) 284.9 ± 0.8; Al(g) 330.0 ± 4.0; Ag+(aq) 105.79 ± 0.08
    close(num('AgCl', 'cr', 'enthalpy_of_formation'), -127.01, 0.05);
    close(num('Al2O3', 'cr', 'enthalpy_of_formation'), -1675.7, 1.3);
    close(num('AlF3', 'cr', 'enthalpy_of_formation'), -1510.4, 1.3);
    close(num('Ag', 'cr', 'enthalpy_of_atomization'), 284.9, 0.8);
    close(num('Al', 'g', 'enthalpy_of_formation'), 330.0, 4.0);
    close(num('Ag+', 'aq', 'enthalpy_of_formation'), 105.79, 0.3);
    // Ca(g) 42.5 ± 0.2 kcal/mol, CODATA review value on the NIST Chemistry WebBook calcium page
    close(num('Ca', 'g', 'enthalpy_of_formation'), 42.5 * 4.184, 0.9);
    // OpenStax Chemistry Appendix G: BaCl2(s) -855.0, CaO(s) -634.9, Br2(g) 30.91, Br(g) 111.88
    close(num('BaCl2', 'cr', 'enthalpy_of_formation'), -855.0, 0.05);
    close(num('CaO', 'cr', 'enthalpy_of_formation'), -634.9, 0.05);
    close(num('Br2', 'l', 'enthalpy_of_vaporization'), 30.91, 0.05);
    close(num('Br', 'g', 'enthalpy_of_formation'), 111.88, 0.05);
  });

  it('bond enthalpy, lattice constants and radii', () => {
    // N≡N 945.33 ± 0.59 kJ/mol (WebElements, quoting CRC 79th ed.) against 2·ΔfH°(N, g) of the CRC table
    close(num('N2', 'g', 'bond_dissociation_enthalpy'), 2 * num('N', 'g', 'enthalpy_of_formation'), 0.6);
    // Madelung constants NaCl 1.7476, CsCl 1.7627, zinc blende 1.6381 — McGraw-Hill Dictionary of
    // Scientific and Technical Terms, "Madelung constant", as quoted at http://ed.mdict.net/k1645550.html
    close(num('NaCl', 'cr', 'madelung_constant'), 1.7476, 0.0001);
    close(num('CsCl', 'cr', 'madelung_constant'), 1.7627, 0.0001);
    close(num('ZnS', 'cr', 'madelung_constant'), 1.6381, 0.0001);
    // Ionic radii (pm) Li+ 76, Na+ 102, K+ 138, Mg2+ 72, Al3+ 54 — NCERT Chemistry XI hydration table,
    // as quoted at https://sathee.prutor.ai/slides/iitpal/chemistry-11/...states-of-matter...
    close(num('Li+', 'g', 'ionic_radius', 6), 76, 0);
    close(num('Na+', 'g', 'ionic_radius', 6), 102, 0);
    close(num('K+', 'g', 'ionic_radius', 6), 138, 0);
    close(num('Mg2+', 'g', 'ionic_radius', 6), 72, 0);
    close(num('Al3+', 'g', 'ionic_radius', 6), 54, 0.5);
  });
});
