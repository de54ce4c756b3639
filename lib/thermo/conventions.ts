// Sign conventions and thermochemical basis, stated in every result.
import { GAS_CONSTANT, STANDARD_TEMPERATURE } from './constants';
import { Dec } from './decimal';

export const LATTICE_CONVENTIONS = ['dissociation', 'formation'] as const;
export type LatticeConvention = (typeof LATTICE_CONVENTIONS)[number];

export const LATTICE_CONVENTION_TEXT: Readonly<Record<LatticeConvention, string>> = {
  dissociation: 'Lattice dissociation enthalpy, MaXb(cr) → a M^z+(g) + b X^z−(g): positive.',
  formation: 'Lattice formation enthalpy, a M^z+(g) + b X^z−(g) → MaXb(cr): negative.',
};

/** Internally the engine stores the dissociation enthalpy; formation is the same number negated. */
export function latticeToConvention(dissociation: Dec, convention: LatticeConvention): Dec {
  return convention === 'dissociation' ? dissociation : dissociation.negated();
}

export function latticeFromConvention(value: Dec, convention: LatticeConvention): Dec {
  return convention === 'dissociation' ? value : value.negated();
}

export const ENERGY_BASES = ['as-tabulated', 'enthalpy-corrected'] as const;
export type EnergyBasis = (typeof ENERGY_BASES)[number];

export const ENERGY_BASIS_TEXT: Readonly<Record<EnergyBasis, string>> = {
  'as-tabulated':
    'Ionization energies and electron-gain enthalpies used as tabulated (0 K energies) in a 298 K enthalpy cycle — common practice.',
  'enthalpy-corrected':
    'Ionization energies +5/2·RT per electron removed and electron-gain enthalpies −5/2·RT per electron added (R = 8.314462618 J/(mol·K), T = 298.15 K) to put them on a 298 K enthalpy basis.',
};

/** 5/2·R·T in kJ/mol at 298.15 K (≈ 6.197 kJ/mol). */
export function fiveHalvesRT(temperature: Dec = STANDARD_TEMPERATURE): Dec {
  return new Dec(5).div(2).times(GAS_CONSTANT).times(temperature).div(1000);
}
