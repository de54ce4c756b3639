// Ion charges for binary ionic compounds M_aX_b. Fixed charges only where the trade treats them as
// certain; every other metal needs the caller to state its charge (e.g. Fe³⁺ in Fe2O3).
import { ThermoInputError } from './errors';
import { parseFormula, type ParsedFormula } from './formula';

const GROUP_1 = ['Li', 'Na', 'K', 'Rb', 'Cs', 'Fr'];
const GROUP_2 = ['Be', 'Mg', 'Ca', 'Sr', 'Ba', 'Ra'];
export const FIXED_CATION_CHARGES: Readonly<Record<string, number>> = {
  ...Object.fromEntries(GROUP_1.map((s) => [s, 1])),
  ...Object.fromEntries(GROUP_2.map((s) => [s, 2])),
  Al: 3, Ga: 3, In: 3,
  Zn: 2, Cd: 2,
  Ag: 1,
};
export const ANION_CHARGES: Readonly<Record<string, number>> = {
  F: -1, Cl: -1, Br: -1, I: -1,
  O: -2, S: -2, Se: -2,
  N: -3,
};
/** Metals accepted only with a stated charge (the reference vocabulary stops at the 3rd ionization). */
export const METALS_NEEDING_STATED_CHARGE = [
  'Tl', 'Fe', 'Cu', 'Co', 'Ni', 'Mn', 'Cr', 'V', 'Ti', 'Sc', 'Y', 'La', 'Ce', 'Pb', 'Sn', 'Hg', 'Au',
  'Bi', 'Sb', 'Pd', 'Pt', 'Rh', 'Ru', 'Mo', 'W', 'Nb', 'Zr', 'Eu', 'Gd', 'Sm', 'Nd', 'Pr', 'U', 'Th',
];
export const MAX_CATION_CHARGE = 3;

/** Noble-gas configuration of the ion (for Born exponents), where it has one. */
const ION_CONFIGURATION: Readonly<Record<string, string>> = {
  Li: 'He', Be: 'He',
  Na: 'Ne', Mg: 'Ne', Al: 'Ne', F: 'Ne', O: 'Ne', N: 'Ne',
  K: 'Ar', Ca: 'Ar', Cl: 'Ar', S: 'Ar', Sc: 'Ar',
  Rb: 'Kr', Sr: 'Kr', Br: 'Kr', Se: 'Kr', Y: 'Kr',
  Cs: 'Xe', Ba: 'Xe', I: 'Xe', La: 'Xe',
};
/** Pseudo-noble-gas (d10) cations grouped with the next noble gas, as in the CRC Born-exponent table. */
const D10_CONFIGURATION: Readonly<Record<string, string>> = { Cu: 'Ar', Zn: 'Ar', Ga: 'Ar', Ag: 'Kr', Cd: 'Kr', In: 'Kr', Au: 'Xe' };

export interface BinarySalt {
  formula: string;
  parsed: ParsedFormula;
  cation: { symbol: string; charge: number; count: number; stated: boolean };
  anion: { symbol: string; charge: number; count: number };
}

export function ionConfiguration(symbol: string, charge: number): string | undefined {
  const base = ION_CONFIGURATION[symbol];
  if (base !== undefined) {
    const fixed = FIXED_CATION_CHARGES[symbol] ?? ANION_CHARGES[symbol];
    if (fixed === undefined || fixed === charge) return base;
  }
  if (D10_CONFIGURATION[symbol] !== undefined && (FIXED_CATION_CHARGES[symbol] ?? charge) === charge) {
    // Cu⁺, Zn²⁺, Ga³⁺, Ag⁺, Cd²⁺, In³⁺, Au⁺ are d10 ions.
    const d10Charge: Record<string, number> = { Cu: 1, Zn: 2, Ga: 3, Ag: 1, Cd: 2, In: 3, Au: 1 };
    if (d10Charge[symbol] === charge) return D10_CONFIGURATION[symbol];
  }
  return undefined;
}

/**
 * Identify cation, anion and charges of a binary ionic compound. Refuses hydrates, compounds of
 * more or fewer than two elements, unknown charges and charges that do not balance — each with a
 * message that says why.
 */
// Successful analyses are immutable and reused (the same salts come back again and again).
const SALT_CACHE = new Map<string, BinarySalt>();

export function analyzeBinarySalt(formula: unknown, statedCationCharge?: unknown, field = 'formula'): BinarySalt {
  const cacheKey = typeof formula === 'string' && (statedCationCharge === undefined || typeof statedCationCharge === 'number') ? `${formula}|${String(statedCationCharge)}` : null;
  const hit = cacheKey === null ? undefined : SALT_CACHE.get(cacheKey);
  if (hit) return hit;
  const salt = analyzeBinarySaltUncached(formula, statedCationCharge, field);
  if (cacheKey !== null) {
    if (SALT_CACHE.size > 1000) SALT_CACHE.clear();
    SALT_CACHE.set(cacheKey, Object.freeze(salt));
  }
  return salt;
}

function analyzeBinarySaltUncached(formula: unknown, statedCationCharge: unknown, field: string): BinarySalt {
  const parsed = parseFormula(formula, field);
  if (parsed.charge !== 0) {
    throw new ThermoInputError('not_binary_ionic', field, `${parsed.text} carries a charge; give the neutral salt.`);
  }
  if (parsed.waterOfHydration > 0 || parsed.otherAdducts.length > 0) {
    throw new ThermoInputError('not_binary_ionic', field, `${parsed.text} is a hydrate or adduct; a lattice cycle needs the anhydrous binary salt.`);
  }
  const symbols = Object.keys(parsed.anhydrous);
  if (symbols.length !== 2) {
    throw new ThermoInputError(
      'not_binary_ionic',
      field,
      `${parsed.text} has ${symbols.length} element${symbols.length === 1 ? '' : 's'}; a binary ionic compound has exactly one metal and one non-metal.`,
    );
  }
  const anionSymbol = symbols.find((s) => ANION_CHARGES[s] !== undefined);
  const cationSymbol = symbols.find((s) => s !== anionSymbol);
  if (anionSymbol === undefined || cationSymbol === undefined || ANION_CHARGES[cationSymbol] !== undefined) {
    throw new ThermoInputError(
      'not_binary_ionic',
      field,
      `${parsed.text} is not metal + one of F, Cl, Br, I, O, S, Se, N, so it is not treated as a binary ionic compound.`,
    );
  }
  const fixed = FIXED_CATION_CHARGES[cationSymbol];
  let cationCharge: number;
  let stated = false;
  if (statedCationCharge !== undefined && statedCationCharge !== null) {
    const n = typeof statedCationCharge === 'string' ? Number(statedCationCharge.trim()) : statedCationCharge;
    if (typeof n !== 'number' || !Number.isInteger(n) || n < 1) {
      throw new ThermoInputError('impossible_charge', 'cationCharge', 'The stated cation charge must be a whole number of 1 or more.');
    }
    if (fixed !== undefined && fixed !== n) {
      throw new ThermoInputError('impossible_charge', 'cationCharge', `${cationSymbol} forms only the ${fixed}+ ion in ionic salts; ${n}+ is not possible here.`);
    }
    if (n > MAX_CATION_CHARGE) {
      throw new ThermoInputError('unsupported', 'cationCharge', `A ${n}+ cation needs ionization energies beyond the third, which the reference vocabulary does not hold.`);
    }
    cationCharge = n;
    stated = fixed === undefined;
  } else if (fixed !== undefined) {
    cationCharge = fixed;
  } else {
    throw new ThermoInputError(
      'charge_not_stated',
      'cationCharge',
      `${cationSymbol} forms more than one ion; state its charge (e.g. ${cationSymbol}³⁺ for ${parsed.text}).`,
    );
  }
  const anionCharge = ANION_CHARGES[anionSymbol] ?? 0;
  const a = parsed.anhydrous[cationSymbol] ?? 0;
  const b = parsed.anhydrous[anionSymbol] ?? 0;
  if (a * cationCharge !== b * -anionCharge) {
    throw new ThermoInputError(
      'charges_do_not_balance',
      field,
      `Charges do not balance in ${parsed.text}: ${a} × ${cationSymbol}${cationCharge}+ = +${a * cationCharge} but ${b} × ${anionSymbol}${-anionCharge}− = −${b * -anionCharge}. It may hold a polyatomic ion (e.g. a peroxide) or a different cation charge.`,
    );
  }
  return {
    formula: parsed.text,
    parsed,
    cation: { symbol: cationSymbol, charge: cationCharge, count: a, stated },
    anion: { symbol: anionSymbol, charge: anionCharge, count: b },
  };
}
