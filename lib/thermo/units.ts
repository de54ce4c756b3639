// Energy unit conversions in exact decimal arithmetic (40 significant digits).
import { JOULES_PER_CALORIE, KJ_PER_MOL_PER_EV } from './constants';
import { Dec, toDec, toDecPositive } from './decimal';
import { ThermoInputError } from './errors';

export const ENERGY_UNITS = ['kJ/mol', 'kcal/mol', 'eV', 'kJ/kg'] as const;
export type EnergyUnit = (typeof ENERGY_UNITS)[number];

export const ENERGY_UNIT_NOTES: Readonly<Record<EnergyUnit, string>> = {
  'kJ/mol': 'kilojoules per mole of formula units',
  'kcal/mol': 'thermochemical kilocalories (4.184 kJ) per mole',
  eV: 'electronvolts per formula unit (CODATA 2018 exact e and N_A)',
  'kJ/kg': 'kilojoules per kilogram of substance, via its molar mass',
};

function checkUnit(unit: unknown, field: string): EnergyUnit {
  if (typeof unit !== 'string' || !(ENERGY_UNITS as readonly string[]).includes(unit)) {
    throw new ThermoInputError('out_of_range', field, `${field} must be one of ${ENERGY_UNITS.join(', ')}.`);
  }
  return unit as EnergyUnit;
}

/** To kJ/mol. `molarMass` (g/mol) is needed only for kJ/kg. */
export function toKjPerMol(value: unknown, unit: unknown, molarMass?: unknown): Dec {
  const v = toDec(value, 'value');
  const u = checkUnit(unit, 'from');
  switch (u) {
    case 'kJ/mol':
      return v;
    case 'kcal/mol':
      return v.times(JOULES_PER_CALORIE);
    case 'eV':
      return v.times(KJ_PER_MOL_PER_EV);
    case 'kJ/kg': {
      if (molarMass === undefined) throw new ThermoInputError('out_of_range', 'molarMass', 'kJ/kg needs the molar mass.');
      return v.times(toDecPositive(molarMass, 'molarMass')).div(1000);
    }
  }
}

/** From kJ/mol. */
export function fromKjPerMol(value: unknown, unit: unknown, molarMass?: unknown): Dec {
  const v = toDec(value, 'value');
  const u = checkUnit(unit, 'to');
  switch (u) {
    case 'kJ/mol':
      return v;
    case 'kcal/mol':
      return v.div(JOULES_PER_CALORIE);
    case 'eV':
      return v.div(KJ_PER_MOL_PER_EV);
    case 'kJ/kg': {
      if (molarMass === undefined) throw new ThermoInputError('out_of_range', 'molarMass', 'kJ/kg needs the molar mass.');
      return v.times(1000).div(toDecPositive(molarMass, 'molarMass'));
    }
  }
}

export function convertEnergy(value: unknown, from: unknown, to: unknown, molarMass?: unknown): Dec {
  return fromKjPerMol(toKjPerMol(value, from, molarMass), to, molarMass);
}

/** Every unit at once, as strings, for display beside a result. */
export function energyInAllUnits(kjPerMol: Dec, molarMass?: Dec): Partial<Record<EnergyUnit, string>> {
  const out: Partial<Record<EnergyUnit, string>> = {
    'kJ/mol': kjPerMol.toString(),
    'kcal/mol': fromKjPerMol(kjPerMol, 'kcal/mol').toString(),
    eV: fromKjPerMol(kjPerMol, 'eV').toString(),
  };
  if (molarMass !== undefined) out['kJ/kg'] = fromKjPerMol(kjPerMol, 'kJ/kg', molarMass).toString();
  return out;
}
