// Physical constants and model parameters, each with its source.
import { Dec } from './decimal';

// CODATA 2018 exact SI defining constants.
export const ELEMENTARY_CHARGE = new Dec('1.602176634e-19'); // C
export const AVOGADRO = new Dec('6.02214076e23'); // 1/mol
// e·N_A: J per mol per eV (exact product of the two defining constants).
export const JOULE_PER_MOL_PER_EV = ELEMENTARY_CHARGE.times(AVOGADRO);
export const KJ_PER_MOL_PER_EV = JOULE_PER_MOL_PER_EV.div(1000);
// Molar gas constant R = N_A·k (CODATA 2018, exact to the digits given in the brief).
export const GAS_CONSTANT = new Dec('8.314462618'); // J/(mol·K)
export const STANDARD_TEMPERATURE = new Dec('298.15'); // K
export const ABSOLUTE_ZERO_CELSIUS = new Dec('-273.15'); // °C
// Thermochemical calorie.
export const JOULES_PER_CALORIE = new Dec('4.184');
export const JOULES_PER_KWH = new Dec('3600000');

// Float constants for the theoretical lattice models (inputs there carry 3–4 significant figures).
// Vacuum permittivity, CODATA 2018 recommended value (not exact in the 2019 SI).
export const VACUUM_PERMITTIVITY = 8.8541878128e-12; // F/m
/** N_A·e²/(4π ε0) in J·m/mol: the Coulomb energy of one mole of unit-charge pairs at 1 m. */
export const COULOMB_MOLAR = (6.02214076e23 * 1.602176634e-19 ** 2) / (4 * Math.PI * VACUUM_PERMITTIVITY);
// Kapustinskii (1956) constants as used in the brief: K = 1.2025e-4 J·m/mol, d = 3.45e-11 m.
export const KAPUSTINSKII_K = 1.2025e-4; // J·m/mol
export const KAPUSTINSKII_D = 3.45e-11; // m
// Born–Mayer repulsion range ρ, the usual 34.5 pm (same d as Kapustinskii).
export const BORN_MAYER_RHO_PM = 34.5;
// Glasser & Jenkins, J. Am. Chem. Soc. 2000, 122, 632: U = A·I·(2I/Vm)^(1/3), A = 121.39 kJ/mol·nm.
export const GLASSER_JENKINS_A = 121.39;
/** Above this the stoichiometry-specific volume equation is replaced by the A·I(2I/V)^(1/3) form. */
export const VOLUME_MODEL_HIGH_ENERGY_KJ = 5000;

/**
 * Volume-based lattice energy U = 2I(α/Vm^(1/3) + β), Vm in nm³, α in kJ/mol·nm, β in kJ/mol.
 * Jenkins, Roobottom, Passmore & Glasser, Inorg. Chem. 1999, 38, 3609 — coefficients entered
 * from memory (the paper itself was not read); keys are cation charge:anion charge magnitudes
 * with the formula type: MX (1:1), MX2 (2:1), M2X (1:2).
 */
export const VOLUME_MODEL_COEFFICIENTS: Readonly<Record<string, { alpha: number; beta: number; label: string }>> = {
  '1:1': { alpha: 117.3, beta: 51.9, label: 'MX (1:1)' },
  '2:1': { alpha: 133.5, beta: 60.9, label: 'MX2 (2:1)' },
  '1:2': { alpha: 165.3, beta: -29.8, label: 'M2X (1:2)' },
};
export const VOLUME_MODEL_COEFFICIENTS_FROM_MEMORY = true;

/**
 * Born exponents by noble-gas configuration of the ion, and the mean for mixed salts —
 * CRC Handbook, 'The Madelung constant and crystal lattice energy' (read at zanotowane.pl/1003/4411).
 */
export const BORN_EXPONENT_BY_CONFIGURATION: Readonly<Record<string, number>> = {
  He: 5,
  Ne: 7,
  Ar: 9,
  Kr: 10,
  Xe: 12,
};

/**
 * Madelung constants normalised to the nearest cation–anion distance r0 and to z+·|z−|, so that
 * U = N_A·M·z+·|z−|·e²/(4π ε0 r0) per formula unit — same CRC table as above.
 */
export const MADELUNG_CONSTANTS: Readonly<Record<string, { value: number; example: string }>> = {
  'rock salt': { value: 1.74756, example: 'NaCl' },
  'caesium chloride': { value: 1.76267, example: 'CsCl' },
  'zinc blende': { value: 1.63806, example: 'ZnS (sphalerite)' },
  wurtzite: { value: 1.64132, example: 'ZnS (wurtzite)' },
  fluorite: { value: 2.51939, example: 'CaF2' },
  'calcium chloride': { value: 2.365, example: 'CaCl2' },
  'cadmium chloride': { value: 2.244, example: 'CdCl2' },
  'cadmium iodide': { value: 2.355, example: 'CdI2' },
  rutile: { value: 2.408, example: 'TiO2' },
  cuprite: { value: 2.22124, example: 'Cu2O' },
  corundum: { value: 4.1719, example: 'Al2O3' },
  // Antifluorite (Li2O, Na2O) has the fluorite constant: same lattice with the ions swapped.
  antifluorite: { value: 2.51939, example: 'Li2O' },
};
