// The reference-data vocabulary shared by the engine, the editions and the seed.
// Pure module: no React, Next.js, DOM or database imports.

/** Phase of a species as stored in an edition. `aq` is the standard state at infinite dilution. */
export const PHASES = ['cr', 'l', 'g', 'aq'] as const;
export type Phase = (typeof PHASES)[number];

/**
 * Property codes. Every energy is per mole of the species named (per formula unit for a salt),
 * in kJ/mol unless the unit column says otherwise.
 */
export const PROPERTIES = {
  // 298.15 K standard enthalpy of formation: solids, hydrates, gaseous atoms and ions, aqueous ions.
  enthalpy_of_formation: { label: 'Standard enthalpy of formation', unit: 'kJ/mol', kind: 'energy' },
  // Element in its standard state -> gaseous atoms, per mole of atoms formed (298.15 K).
  enthalpy_of_atomization: { label: 'Enthalpy of atomization', unit: 'kJ/mol', kind: 'energy' },
  // I2(cr) -> I2(g), per mole of I2 (298.15 K).
  enthalpy_of_sublimation: { label: 'Enthalpy of sublimation', unit: 'kJ/mol', kind: 'energy' },
  // Br2(l) -> Br2(g), per mole of Br2 (298.15 K).
  enthalpy_of_vaporization: { label: 'Enthalpy of vaporization', unit: 'kJ/mol', kind: 'energy' },
  // X2(g) -> 2 X(g) at 298.15 K (an enthalpy, not D0), per mole of bonds.
  bond_dissociation_enthalpy: { label: 'Bond dissociation enthalpy (298 K)', unit: 'kJ/mol', kind: 'energy' },
  // Tabulated ionization energies are 0 K energies: M^(n-1)+ (g) -> M^n+ (g) + e-.
  ionization_energy_1: { label: 'First ionization energy', unit: 'kJ/mol', kind: 'energy' },
  ionization_energy_2: { label: 'Second ionization energy', unit: 'kJ/mol', kind: 'energy' },
  ionization_energy_3: { label: 'Third ionization energy', unit: 'kJ/mol', kind: 'energy' },
  // Signed electron-gain enthalpies X^(n-1)- (g) + e- -> X^n- (g). The first is negative for
  // halogens, O and S; the second and third (O, S, N) are positive and back-calculated from cycles.
  electron_gain_enthalpy_1: { label: 'First electron-gain enthalpy', unit: 'kJ/mol', kind: 'energy' },
  electron_gain_enthalpy_2: { label: 'Second electron-gain enthalpy', unit: 'kJ/mol', kind: 'energy' },
  electron_gain_enthalpy_3: { label: 'Third electron-gain enthalpy', unit: 'kJ/mol', kind: 'energy' },
  // Ion(g) -> ion(aq); every value in one edition on ONE scale (see `scale`).
  hydration_enthalpy: { label: 'Enthalpy of hydration', unit: 'kJ/mol', kind: 'energy' },
  // Salt(cr) -> ions(aq) at infinite dilution (for checks; the engine derives its own).
  enthalpy_of_solution: { label: 'Enthalpy of solution (infinite dilution)', unit: 'kJ/mol', kind: 'energy' },
  // Effective ionic radius for a stated coordination number (Shannon).
  ionic_radius: { label: 'Effective ionic radius', unit: 'pm', kind: 'length' },
  // Per salt: Madelung constant of its structure type, normalised to the nearest-neighbour distance.
  madelung_constant: { label: 'Madelung constant (nearest-neighbour distance)', unit: '1', kind: 'dimensionless' },
  // Per salt: shortest cation-anion distance in the crystal.
  interionic_distance: { label: 'Nearest cation-anion distance', unit: 'pm', kind: 'length' },
  // Per ion: Born exponent by noble-gas configuration.
  born_exponent: { label: 'Born exponent', unit: '1', kind: 'dimensionless' },
  density: { label: 'Density (298 K)', unit: 'g/cm3', kind: 'density' },
  // Molar heat capacity at constant pressure, 298.15 K.
  heat_capacity: { label: 'Molar heat capacity (298 K)', unit: 'J/(mol·K)', kind: 'heat_capacity' },
} as const;

export type PropertyCode = keyof typeof PROPERTIES;
export const PROPERTY_CODES = Object.keys(PROPERTIES) as PropertyCode[];

export const HYDRATION_SCALES = ['conventional', 'absolute'] as const;
export type HydrationScale = (typeof HYDRATION_SCALES)[number];

/** One reference value as seeded, imported from CSV or shipped to devices. */
export interface ReferenceValue {
  /** Formula as written in the trade, e.g. `NaCl`, `CaCl2·6H2O`, `Cl`, `Cl-`, `Ca2+`, `Br2`. */
  species: string;
  phase: Phase;
  /** Ion charge; 0 for neutral species. */
  charge: number;
  property: PropertyCode;
  /** Decimal string, exactly as published (no float rounding). Structure names go in `structure`. */
  value: string;
  /** Standard uncertainty as a decimal string, or null when the source gives none. */
  uncertainty: string | null;
  unit: string;
  /** Coordination number, for ionic radii. */
  coordination?: number;
  /** Structure type name, for Madelung constants and interionic distances (e.g. 'rock salt'). */
  structure?: string;
  /** Scale of a hydration enthalpy. */
  scale?: HydrationScale;
  /** Precise citation: table, edition, page or address. Empty only when `fromMemory` is true. */
  source: string;
  /** True when the value was supplied from memory and not checked against a source that was read. */
  fromMemory: boolean;
  note?: string;
}
