// Theoretical lattice energies: Born–Landé, Born–Mayer, Kapustinskii and the volume-based
// equations of Jenkins & Glasser. FLOATING POINT on purpose: inputs (radii, distances, densities)
// carry 3–4 significant figures, so exact decimals would add nothing. Every result says so.
import {
  AVOGADRO,
  BORN_EXPONENT_BY_CONFIGURATION,
  BORN_MAYER_RHO_PM,
  COULOMB_MOLAR,
  GAS_CONSTANT,
  GLASSER_JENKINS_A,
  KAPUSTINSKII_D,
  KAPUSTINSKII_K,
  MADELUNG_CONSTANTS,
  STANDARD_TEMPERATURE,
  VOLUME_MODEL_COEFFICIENTS,
  VOLUME_MODEL_HIGH_ENERGY_KJ,
} from './constants';
import { toDec, toDecPositive } from './decimal';
import { ThermoInputError } from './errors';
import { analyzeBinarySalt, ionConfiguration, type BinarySalt } from './ion-charges';
import { molarMass } from './formula';

export const FLOATING_POINT_NOTE =
  'Theoretical lattice energies are computed in floating point: their inputs (radii, distances, densities) carry 3–4 significant figures.';
/** Gap above which the ionic (Born) model is flagged as not holding — a rule of thumb (common practice, no source). */
export const IONIC_MODEL_GAP_THRESHOLD_PERCENT = 10;

const PM = 1e-12;

/** Born–Landé: U = N_A·M·z+·|z−|·e²/(4π ε0 r0)·(1 − 1/n), kJ/mol; M normalised to r0 and z+·|z−|. */
export function bornLandeEnergy(p: { madelung: number; cationCharge: number; anionCharge: number; r0Pm: number; bornExponent: number }): number {
  return (COULOMB_MOLAR * p.madelung * p.cationCharge * Math.abs(p.anionCharge)) / (p.r0Pm * PM) * (1 - 1 / p.bornExponent) / 1000;
}

/** Born–Mayer: U = N_A·M·z+·|z−|·e²/(4π ε0 r0)·(1 − ρ/r0), kJ/mol. */
export function bornMayerEnergy(p: { madelung: number; cationCharge: number; anionCharge: number; r0Pm: number; rhoPm?: number }): number {
  const rho = p.rhoPm ?? BORN_MAYER_RHO_PM;
  return (COULOMB_MOLAR * p.madelung * p.cationCharge * Math.abs(p.anionCharge)) / (p.r0Pm * PM) * (1 - rho / p.r0Pm) / 1000;
}

/** Kapustinskii: U = K·ν·z+·|z−|/(r+ + r−)·(1 − d/(r+ + r−)), K = 1.2025e-4 J·m/mol, d = 3.45e-11 m; kJ/mol. */
export function kapustinskiiEnergy(p: { ionsPerFormulaUnit: number; cationCharge: number; anionCharge: number; radiusSumPm: number }): number {
  const r = p.radiusSumPm * PM;
  return (KAPUSTINSKII_K * p.ionsPerFormulaUnit * p.cationCharge * Math.abs(p.anionCharge)) / r * (1 - KAPUSTINSKII_D / r) / 1000;
}

/** Ionic strength factor I = ½ Σ n_i z_i² per formula unit. */
export function ionicStrengthFactor(ions: ReadonlyArray<{ count: number; charge: number }>): number {
  return ions.reduce((sum, ion) => sum + ion.count * ion.charge * ion.charge, 0) / 2;
}

/** Formula-unit volume in nm³ from molar mass (g/mol) and density (g/cm³). */
export function formulaUnitVolumeNm3(molarMassGPerMol: number, densityGPerCm3: number): number {
  return (molarMassGPerMol / (densityGPerCm3 * AVOGADRO.toNumber())) * 1e21;
}

export interface VolumeBasedResult {
  energy: number;
  form: 'stoichiometry' | 'high-energy';
  formText: string;
  volumeNm3: number;
  ionicStrength: number;
}

/**
 * Jenkins–Glasser volume-based lattice energy. U = 2I(α/V^(1/3) + β) with the coefficients for
 * MX, MX2, M2X; for other stoichiometries, or when that gives more than 5000 kJ/mol, the
 * Glasser–Jenkins form U = A·I·(2I/V)^(1/3), A = 121.39 kJ/mol·nm.
 */
export function volumeBasedEnergy(p: { cationCharge: number; cationCount: number; anionCharge: number; anionCount: number; volumeNm3: number }): VolumeBasedResult {
  const ions = [
    { count: p.cationCount, charge: p.cationCharge },
    { count: p.anionCount, charge: p.anionCharge },
  ];
  const I = ionicStrengthFactor(ions);
  const key = `${p.cationCharge}:${Math.abs(p.anionCharge)}`;
  const countsMatch =
    (key === '1:1' && p.cationCount === 1 && p.anionCount === 1) ||
    (key === '2:1' && p.cationCount === 1 && p.anionCount === 2) ||
    (key === '1:2' && p.cationCount === 2 && p.anionCount === 1);
  const coefficients = countsMatch ? VOLUME_MODEL_COEFFICIENTS[key] : undefined;
  if (coefficients) {
    const energy = 2 * I * (coefficients.alpha / Math.cbrt(p.volumeNm3) + coefficients.beta);
    if (energy <= VOLUME_MODEL_HIGH_ENERGY_KJ) {
      return {
        energy,
        form: 'stoichiometry',
        formText: `U = 2I(α/Vm^(1/3) + β), ${coefficients.label}: α = ${coefficients.alpha} kJ/mol·nm, β = ${coefficients.beta} kJ/mol (Jenkins et al. 1999; coefficients from memory)`,
        volumeNm3: p.volumeNm3,
        ionicStrength: I,
      };
    }
  }
  return {
    energy: GLASSER_JENKINS_A * I * Math.cbrt((2 * I) / p.volumeNm3),
    form: 'high-energy',
    formText: `U = A·I·(2I/Vm)^(1/3), A = ${GLASSER_JENKINS_A} kJ/mol·nm (Glasser & Jenkins 2000; intended for U > 5000 kJ/mol${coefficients ? '' : '; no MX/MX2/M2X coefficients apply to this stoichiometry'})`,
    volumeNm3: p.volumeNm3,
    ionicStrength: I,
  };
}

/**
 * Lattice energy U → lattice enthalpy ΔH_L = U + [a(n_M/2 − 2) + b(n_X/2 − 2)]RT with n = 3 for
 * monatomic ions (Jenkins 2005; as given in the CRC Handbook 'Lattice energies' table by Jenkins &
 * Roobottom). For monatomic ions this is ΔH_L = U − (a + b)·RT/2.
 */
export function latticeEnergyToEnthalpy(energy: number, cationCount: number, anionCount: number, temperature = STANDARD_TEMPERATURE.toNumber()): number {
  const RT = (GAS_CONSTANT.toNumber() * temperature) / 1000;
  const n = 3;
  return energy + (cationCount * (n / 2 - 2) + anionCount * (n / 2 - 2)) * RT;
}
export const ENTHALPY_CORRECTION_TEXT =
  'Lattice energy converted to lattice enthalpy with ΔH_L = U + [a(n_M/2 − 2) + b(n_X/2 − 2)]RT, n = 3 for monatomic ions (Jenkins 2005), T = 298.15 K.';

export interface ModelCheckInput {
  formula: string;
  cationCharge?: number;
  /** Structure type name (see MADELUNG_CONSTANTS) or an explicit Madelung constant. */
  structure?: string;
  madelungConstant?: number | string;
  /** Nearest cation–anion distance in pm; otherwise the sum of the radii is used. */
  interionicDistancePm?: number | string;
  cationRadiusPm?: number | string;
  anionRadiusPm?: number | string;
  bornExponent?: number | string;
  /** g/cm³, for the volume-based model. */
  density?: number | string;
  /** Cycle lattice enthalpy (dissociation, positive, kJ/mol) to compare with. */
  cycleLatticeEnthalpy?: number | string;
}

export interface ModelResult {
  model: 'born-lande' | 'born-mayer' | 'kapustinskii' | 'volume-based';
  name: string;
  latticeEnergy: number;
  latticeEnthalpy: number;
  /** (model − cycle)/cycle × 100 on the enthalpy basis, or null without a cycle value. */
  gapPercent: number | null;
  fittedToCycleData: boolean;
  parameters: Record<string, number | string>;
}

export interface ModelCheckResult {
  formula: string;
  arithmetic: 'floating-point';
  note: string;
  convention: string;
  enthalpyCorrection: string;
  madelungNormalisation: string;
  models: ModelResult[];
  skipped: Array<{ model: string; reason: string }>;
  cycleLatticeEnthalpy: number | null;
  ionicModelHolds: boolean | null;
  verdict: string;
  thresholdPercent: number;
  thresholdNote: string;
  circularityNote: string | null;
}

const DECIMAL_TEXT = /^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*$/;

/** Float inputs of the models: finite and > 0; same refusals as the decimal parser, without its cost. */
function positiveNumber(value: unknown, field: string): number {
  let n: number;
  if (typeof value === 'number') n = value;
  else if (typeof value === 'string' && DECIMAL_TEXT.test(value)) n = Number(value);
  else return toDecPositive(value, field).toNumber(); // raises the typed error for anything else
  if (!Number.isFinite(n)) return toDecPositive(value, field).toNumber();
  if (!(n > 0)) throw new ThermoInputError('out_of_range', field, `${field} must be greater than zero.`);
  return n;
}

function bornExponentFor(salt: BinarySalt): number | undefined {
  const c = ionConfiguration(salt.cation.symbol, salt.cation.charge);
  const x = ionConfiguration(salt.anion.symbol, salt.anion.charge);
  const nc = c ? BORN_EXPONENT_BY_CONFIGURATION[c] : undefined;
  const nx = x ? BORN_EXPONENT_BY_CONFIGURATION[x] : undefined;
  if (nc === undefined || nx === undefined) return undefined;
  return (nc + nx) / 2; // mean of the two ion types, as in the CRC table (6 for LiF)
}

export function runModelCheck(input: ModelCheckInput): ModelCheckResult {
  const salt = analyzeBinarySalt(input.formula, input.cationCharge);
  const zc = salt.cation.charge;
  const za = salt.anion.charge;
  const a = salt.cation.count;
  const b = salt.anion.count;
  const skipped: ModelCheckResult['skipped'] = [];
  const models: ModelResult[] = [];
  const cycle = input.cycleLatticeEnthalpy === undefined ? null : typeof input.cycleLatticeEnthalpy === 'number' && Number.isFinite(input.cycleLatticeEnthalpy) ? input.cycleLatticeEnthalpy : toDec(input.cycleLatticeEnthalpy, 'cycleLatticeEnthalpy').toNumber();
  if (cycle !== null && cycle <= 0) {
    throw new ThermoInputError('out_of_range', 'cycleLatticeEnthalpy', 'Give the cycle lattice enthalpy as a dissociation enthalpy (positive).');
  }
  const gap = (h: number): number | null => (cycle === null ? null : ((h - cycle) / cycle) * 100);

  const rc = input.cationRadiusPm === undefined ? undefined : positiveNumber(input.cationRadiusPm, 'cationRadiusPm');
  const ra = input.anionRadiusPm === undefined ? undefined : positiveNumber(input.anionRadiusPm, 'anionRadiusPm');
  const radiusSum = rc !== undefined && ra !== undefined ? rc + ra : undefined;
  const r0 = input.interionicDistancePm !== undefined ? positiveNumber(input.interionicDistancePm, 'interionicDistancePm') : radiusSum;
  const r0Source = input.interionicDistancePm !== undefined ? 'interionic distance given' : 'sum of the ionic radii';

  let madelung: number | undefined;
  let madelungSource = '';
  if (input.madelungConstant !== undefined) {
    madelung = positiveNumber(input.madelungConstant, 'madelungConstant');
    madelungSource = 'given';
  } else if (input.structure !== undefined) {
    const entry = MADELUNG_CONSTANTS[input.structure];
    if (!entry) {
      throw new ThermoInputError('unknown_property', 'structure', `Unknown structure type "${input.structure}". Known: ${Object.keys(MADELUNG_CONSTANTS).join(', ')}.`);
    }
    madelung = entry.value;
    madelungSource = `${input.structure} structure`;
  }
  const n = input.bornExponent !== undefined ? positiveNumber(input.bornExponent, 'bornExponent') : bornExponentFor(salt);

  if (madelung === undefined || r0 === undefined) {
    const reason = madelung === undefined ? 'no structure type or Madelung constant' : 'no interionic distance or radii';
    skipped.push({ model: 'born-lande', reason }, { model: 'born-mayer', reason });
  } else {
    if (n === undefined) {
      skipped.push({ model: 'born-lande', reason: 'no Born exponent: the ions have no noble-gas configuration; give one' });
    } else {
      if (n <= 1) throw new ThermoInputError('out_of_range', 'bornExponent', 'The Born exponent must be greater than 1.');
      const U = bornLandeEnergy({ madelung, cationCharge: zc, anionCharge: za, r0Pm: r0, bornExponent: n });
      const H = latticeEnergyToEnthalpy(U, a, b);
      models.push({ model: 'born-lande', name: 'Born–Landé', latticeEnergy: U, latticeEnthalpy: H, gapPercent: gap(H), fittedToCycleData: false, parameters: { madelung, madelungSource, r0Pm: r0, r0Source, bornExponent: n } });
    }
    if (r0 <= BORN_MAYER_RHO_PM) throw new ThermoInputError('out_of_range', 'interionicDistancePm', `The interionic distance must exceed ρ = ${BORN_MAYER_RHO_PM} pm.`);
    const U = bornMayerEnergy({ madelung, cationCharge: zc, anionCharge: za, r0Pm: r0 });
    const H = latticeEnergyToEnthalpy(U, a, b);
    models.push({ model: 'born-mayer', name: 'Born–Mayer', latticeEnergy: U, latticeEnthalpy: H, gapPercent: gap(H), fittedToCycleData: false, parameters: { madelung, madelungSource, r0Pm: r0, r0Source, rhoPm: BORN_MAYER_RHO_PM } });
  }
  if (radiusSum === undefined) {
    skipped.push({ model: 'kapustinskii', reason: 'needs the cation and anion radii' });
  } else {
    if (radiusSum <= 34.5) throw new ThermoInputError('out_of_range', 'anionRadiusPm', 'The sum of the radii must exceed d = 34.5 pm.');
    const U = kapustinskiiEnergy({ ionsPerFormulaUnit: a + b, cationCharge: zc, anionCharge: za, radiusSumPm: radiusSum });
    const H = latticeEnergyToEnthalpy(U, a, b);
    models.push({ model: 'kapustinskii', name: 'Kapustinskii', latticeEnergy: U, latticeEnthalpy: H, gapPercent: gap(H), fittedToCycleData: true, parameters: { ionsPerFormulaUnit: a + b, radiusSumPm: radiusSum, K: KAPUSTINSKII_K, d: KAPUSTINSKII_D } });
  }
  if (input.density === undefined) {
    skipped.push({ model: 'volume-based', reason: 'needs the density' });
  } else {
    const density = positiveNumber(input.density, 'density');
    const V = formulaUnitVolumeNm3(molarMass(salt.parsed).toNumber(), density);
    const vb = volumeBasedEnergy({ cationCharge: zc, cationCount: a, anionCharge: za, anionCount: b, volumeNm3: V });
    const H = latticeEnergyToEnthalpy(vb.energy, a, b);
    models.push({ model: 'volume-based', name: 'Volume-based (Jenkins–Glasser)', latticeEnergy: vb.energy, latticeEnthalpy: H, gapPercent: gap(H), fittedToCycleData: true, parameters: { volumeNm3: V, ionicStrength: vb.ionicStrength, form: vb.formText, density } });
  }

  const bornGaps = models.filter((m) => !m.fittedToCycleData && m.gapPercent !== null).map((m) => Math.abs(m.gapPercent ?? 0));
  let ionicModelHolds: boolean | null = null;
  let verdict = 'No Born–Landé or Born–Mayer comparison with a cycle value, so no verdict on the ionic model.';
  if (bornGaps.length > 0) {
    const worst = Math.max(...bornGaps);
    ionicModelHolds = worst <= IONIC_MODEL_GAP_THRESHOLD_PERCENT;
    verdict = ionicModelHolds
      ? `The ionic model holds: the Born–Landé/Born–Mayer values are within ${IONIC_MODEL_GAP_THRESHOLD_PERCENT} % of the cycle value (largest gap ${worst.toFixed(1)} %).`
      : `The ionic model does not hold well for ${salt.formula}: a Born-model value is ${worst.toFixed(1)} % from the cycle value, more than ${IONIC_MODEL_GAP_THRESHOLD_PERCENT} % — expect covalent character.`;
  }
  const circular = ['O', 'S', 'Se', 'N'].includes(salt.anion.symbol);
  return {
    formula: salt.formula,
    arithmetic: 'floating-point',
    note: FLOATING_POINT_NOTE,
    convention: 'Lattice energies and enthalpies here are dissociation values (positive).',
    enthalpyCorrection: ENTHALPY_CORRECTION_TEXT,
    madelungNormalisation: 'Madelung constants are normalised to the nearest cation–anion distance r0 and to z+·|z−| per formula unit.',
    models,
    skipped,
    cycleLatticeEnthalpy: cycle,
    ionicModelHolds,
    verdict,
    thresholdPercent: IONIC_MODEL_GAP_THRESHOLD_PERCENT,
    thresholdNote: 'The 10 % threshold is a rule of thumb (common practice, no source). Kapustinskii and the volume-based equations are fitted to cycle data, so they do not test the ionic model.',
    circularityNote: circular
      ? `For ${salt.anion.symbol}-containing salts the higher electron-gain enthalpies are back-calculated from cycles, so this check is partly circular.`
      : null,
  };
}
