// Born–Haber cycle builder for binary ionic salts M_aX_b: ordered steps with coefficients, values
// from a reference lookup or the caller, and every missing value named.
import type { Phase, PropertyCode } from '../reference/properties';
import {
  ENERGY_BASES,
  fiveHalvesRT,
  latticeFromConvention,
  LATTICE_CONVENTIONS,
  type EnergyBasis,
  type LatticeConvention,
} from './conventions';
import { Dec, toDec, toUncertainty, type NumberInput } from './decimal';
import { ThermoInputError } from './errors';
import { analyzeBinarySalt, type BinarySalt } from './ion-charges';
import type { LookedUpValue, ReferenceLookup } from './reference-lookup';

export type CycleStepKind =
  | 'enthalpy_of_formation'
  | 'enthalpy_of_atomization'
  | 'ionization_energy'
  | 'bond_dissociation_enthalpy'
  | 'enthalpy_of_vaporization'
  | 'enthalpy_of_sublimation'
  | 'electron_gain_enthalpy'
  | 'lattice_enthalpy';

export interface CycleStep {
  /** Stable key, e.g. `ionization_energy_2:Ca`, `lattice_enthalpy:CaCl2`. */
  key: string;
  kind: CycleStepKind;
  /** Trade name for display, e.g. "Second ionization energy of Ca". */
  name: string;
  /** Reference property code used for the lookup; null for the lattice step (not a reference property). */
  property: PropertyCode | null;
  species: string;
  phase: Phase;
  /** The process as written per mole, e.g. "Ca⁺(g) → Ca²⁺(g) + e⁻". */
  process: string;
  /** Moles of this process per mole of salt, signed (−1 for the reversed formation and lattice steps). */
  coefficient: Dec;
  /** Per-mole value as tabulated (lattice: dissociation enthalpy, positive); null when unknown. */
  value: Dec | null;
  /** Added to `value` for the chosen basis (±5/2·RT per electron, or 0). */
  basisCorrection: Dec;
  uncertainty: Dec | null;
  source: string | null;
  /** True when the caller supplied this value (an override or an explicit value). */
  overridden: boolean;
}

export interface BornHaberCycle {
  salt: BinarySalt;
  steps: CycleStep[];
  basis: EnergyBasis;
  /** Step keys with no value, other than the unknown chosen for solving. */
  missing: string[];
  /** The step the caller asked to solve for (default the lattice step). */
  unknownKey: string;
  /** How the non-metal reaches gaseous atoms. */
  nonmetalRoute: 'bond_dissociation' | 'vaporization_then_dissociation' | 'sublimation_then_dissociation' | 'atomization';
}

export interface ExplicitValue {
  value: NumberInput | null;
  uncertainty?: NumberInput | null;
  source?: string;
}

export interface BuildCycleInput {
  formula: string;
  /** Required for metals without a fixed charge (Fe, Cu, Tl, ...). */
  cationCharge?: number;
  lookup?: ReferenceLookup;
  /** Values or overrides per step key; `value: null` clears a step. */
  values?: Record<string, ExplicitValue>;
  /** Step key to solve for; defaults to the lattice step. */
  unknown?: string;
  basis?: EnergyBasis;
  /** Sign convention of a lattice value given in `values` (default dissociation, positive). */
  latticeConvention?: LatticeConvention;
}

const ORDINAL = ['First', 'Second', 'Third'];
const SUPERSCRIPT_DIGITS: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

function ionText(symbol: string, charge: number): string {
  if (charge === 0) return symbol;
  const magnitude = Math.abs(charge);
  const digits = magnitude === 1 ? '' : String(magnitude).split('').map((d) => SUPERSCRIPT_DIGITS[d] ?? d).join('');
  return `${symbol}${digits}${charge > 0 ? '⁺' : '⁻'}`;
}

/** Gaseous diatomic non-metals; Br2 is liquid and I2 solid at 298 K; S and Se solids atomize directly. */
const DIATOMIC_GAS = new Set(['F', 'Cl', 'O', 'N']);

/** A step before its value is looked up: the fields of CycleStep that do not depend on the value. */
interface StepSpec extends Pick<CycleStep, 'key' | 'kind' | 'name' | 'property' | 'species' | 'phase' | 'process' | 'coefficient' | 'basisCorrection'> {
  /** Extra lookups tried in turn when the first finds nothing (e.g. ΔfH of the gaseous atom). */
  fallbacks?: Array<{ species: string; phase: Phase; property: PropertyCode }>;
}

function lookupSpec(spec: StepSpec, lookup: ReferenceLookup | undefined): LookedUpValue | undefined {
  if (!lookup || spec.property === null) return undefined;
  const first = lookup(spec.species, spec.phase, spec.property);
  if (first) return first;
  for (const alt of spec.fallbacks ?? []) {
    const hit = lookup(alt.species, alt.phase, alt.property);
    if (hit) return hit;
  }
  return undefined;
}

interface CycleLayout {
  head: StepSpec[];
  pathSpecs: StepSpec[];
  pathRoute: BornHaberCycle['nonmetalRoute'];
  atomizationSpec: StepSpec;
  tail: StepSpec[];
  latticeKey: string;
}

// Step layouts depend only on the salt and the basis, so they are built once and reused.
const LAYOUT_CACHE = new Map<string, CycleLayout>();

function cycleLayout(salt: BinarySalt, basis: EnergyBasis): CycleLayout {
  const cacheKey = `${salt.formula}|${salt.cation.charge}|${basis}`;
  const cached = LAYOUT_CACHE.get(cacheKey);
  if (cached) return cached;
  const { cation, anion } = salt;
  const M = cation.symbol;
  const X = anion.symbol;
  const a = new Dec(cation.count);
  const b = new Dec(anion.count);
  const half = new Dec(1).div(2);
  const rtCorrection = basis === 'enthalpy-corrected' ? fiveHalvesRT() : new Dec(0);
  const zero = new Dec(0);
  const X2 = `${X}2`;

  const head: StepSpec[] = [];
  head.push({
    key: `enthalpy_of_formation:${salt.formula}`,
    kind: 'enthalpy_of_formation',
    name: `Standard enthalpy of formation of ${salt.formula} (reversed)`,
    property: 'enthalpy_of_formation',
    species: salt.formula,
    phase: 'cr',
    process: `${salt.formula}(cr) → elements in their standard states`,
    coefficient: new Dec(-1),
    basisCorrection: zero,
  });
  head.push({
    key: `enthalpy_of_atomization:${M}`,
    kind: 'enthalpy_of_atomization',
    name: `Enthalpy of atomization of ${M}`,
    property: 'enthalpy_of_atomization',
    species: M,
    phase: 'g',
    process: `${M}(standard state) → ${M}(g)`,
    coefficient: a,
    basisCorrection: zero,
    fallbacks: [
      { species: M, phase: 'g', property: 'enthalpy_of_formation' },
      { species: M, phase: 'cr', property: 'enthalpy_of_atomization' },
      { species: M, phase: 'l', property: 'enthalpy_of_atomization' },
    ],
  });
  for (let k = 1; k <= cation.charge; k += 1) {
    head.push({
      key: `ionization_energy_${k}:${M}`,
      kind: 'ionization_energy',
      name: `${ORDINAL[k - 1] ?? `${k}th`} ionization energy of ${M}`,
      property: `ionization_energy_${k}` as PropertyCode,
      species: M,
      phase: 'g',
      process: `${ionText(M, k - 1)}(g) → ${ionText(M, k)}(g) + e⁻`,
      coefficient: a,
      basisCorrection: rtCorrection,
    });
  }

  // Non-metal to gaseous atoms along its real path, or one atomization value standing in for it.
  const atomizationSpec: StepSpec = {
    key: `enthalpy_of_atomization:${X}`,
    kind: 'enthalpy_of_atomization',
    name: `Enthalpy of atomization of ${X}`,
    property: 'enthalpy_of_atomization',
    species: X,
    phase: 'g',
    process: `${DIATOMIC_GAS.has(X) || X === 'Br' || X === 'I' ? `½ ${X2}` : X}(standard state) → ${X}(g)`,
    coefficient: b,
    basisCorrection: zero,
    fallbacks: [
      { species: X, phase: 'g', property: 'enthalpy_of_formation' },
      { species: X, phase: 'cr', property: 'enthalpy_of_atomization' },
    ],
  };
  const dissociationSpec: StepSpec = {
    key: `bond_dissociation_enthalpy:${X2}`,
    kind: 'bond_dissociation_enthalpy',
    name: `Bond dissociation enthalpy of ${X2} (298 K)`,
    property: 'bond_dissociation_enthalpy',
    species: X2,
    phase: 'g',
    process: `${X2}(g) → 2 ${X}(g)`,
    coefficient: b.times(half),
    basisCorrection: zero,
  };
  let pathSpecs: StepSpec[];
  let pathRoute: BornHaberCycle['nonmetalRoute'];
  if (DIATOMIC_GAS.has(X)) {
    pathSpecs = [dissociationSpec];
    pathRoute = 'bond_dissociation';
  } else if (X === 'Br' || X === 'I') {
    // Br2 is a liquid and I2 a solid at 298 K: first to the gas, then dissociate.
    const [kind, phase, verb] = X === 'Br' ? (['enthalpy_of_vaporization', 'l', 'vaporization'] as const) : (['enthalpy_of_sublimation', 'cr', 'sublimation'] as const);
    pathSpecs = [
      {
        key: `${kind}:${X2}`,
        kind,
        name: `Enthalpy of ${verb} of ${X2}`,
        property: kind,
        species: X2,
        phase,
        process: `${X2}(${phase}) → ${X2}(g)`,
        coefficient: b.times(half),
        basisCorrection: zero,
      },
      dissociationSpec,
    ];
    pathRoute = X === 'Br' ? 'vaporization_then_dissociation' : 'sublimation_then_dissociation';
  } else {
    pathSpecs = [];
    pathRoute = 'atomization';
  }
  const tail: StepSpec[] = [];
  const latticeKey = `lattice_enthalpy:${salt.formula}`;
  for (let k = 1; k <= -anion.charge; k += 1) {
    tail.push({
      key: `electron_gain_enthalpy_${k}:${X}`,
      kind: 'electron_gain_enthalpy',
      name: `${ORDINAL[k - 1] ?? `${k}th`} electron-gain enthalpy of ${X}`,
      property: `electron_gain_enthalpy_${k}` as PropertyCode,
      species: X,
      phase: 'g',
      process: `${ionText(X, -(k - 1))}(g) + e⁻ → ${ionText(X, -k)}(g)`,
      coefficient: b,
      basisCorrection: rtCorrection.negated(),
    });
  }
  tail.push({
    key: latticeKey,
    kind: 'lattice_enthalpy',
    name: `Lattice enthalpy of ${salt.formula}`,
    property: null,
    species: salt.formula,
    phase: 'cr',
    process: `${cation.count > 1 ? `${cation.count} ` : ''}${ionText(M, cation.charge)}(g) + ${anion.count > 1 ? `${anion.count} ` : ''}${ionText(X, anion.charge)}(g) → ${salt.formula}(cr)`,
    coefficient: new Dec(-1),
    basisCorrection: zero,
  });

  const layout: CycleLayout = { head, pathSpecs, pathRoute, atomizationSpec, tail, latticeKey };
  if (LAYOUT_CACHE.size > 500) LAYOUT_CACHE.clear();
  LAYOUT_CACHE.set(cacheKey, layout);
  return layout;
}

export function buildBornHaberCycle(input: BuildCycleInput): BornHaberCycle {
  const salt = analyzeBinarySalt(input.formula, input.cationCharge);
  const basis = input.basis ?? 'as-tabulated';
  if (!(ENERGY_BASES as readonly string[]).includes(basis)) {
    throw new ThermoInputError('out_of_range', 'basis', `basis must be one of ${ENERGY_BASES.join(', ')}.`);
  }
  const latticeConvention = input.latticeConvention ?? 'dissociation';
  if (!(LATTICE_CONVENTIONS as readonly string[]).includes(latticeConvention)) {
    throw new ThermoInputError('out_of_range', 'latticeConvention', `latticeConvention must be one of ${LATTICE_CONVENTIONS.join(', ')}.`);
  }
  const explicit = input.values ?? {};
  const X = salt.anion.symbol;
  const layout = cycleLayout(salt, basis);
  const { head, pathSpecs, atomizationSpec, tail, latticeKey } = layout;
  let pathRoute = layout.pathRoute;
  const specs: StepSpec[] = [...head];
  const hasExplicit = (key: string): boolean => Object.prototype.hasOwnProperty.call(explicit, key);
  const explicitPath = pathSpecs.some((s) => hasExplicit(s.key));
  if (explicitPath && hasExplicit(atomizationSpec.key)) {
    throw new ThermoInputError(
      'out_of_range',
      `values.${atomizationSpec.key}`,
      `Give either the atomization of ${X} or the steps of its path (${pathSpecs.map((s) => s.key).join(', ')}), not both.`,
    );
  }
  const pathResolvable = pathSpecs.length > 0 && pathSpecs.every((s) => hasExplicit(s.key) || lookupSpec(s, input.lookup) !== undefined);
  let useAtomization: boolean;
  if (pathSpecs.length === 0 || hasExplicit(atomizationSpec.key)) useAtomization = true;
  else if (explicitPath || pathResolvable) useAtomization = false;
  else useAtomization = lookupSpec(atomizationSpec, input.lookup) !== undefined;
  if (useAtomization) {
    specs.push(atomizationSpec);
    pathRoute = 'atomization';
  } else {
    specs.push(...pathSpecs);
  }

  specs.push(...tail);

  const keys = specs.map((s) => s.key);
  for (const key of Object.keys(explicit)) {
    if (!keys.includes(key)) {
      throw new ThermoInputError('unknown_property', `values.${key}`, `"${key}" is not a step of the ${salt.formula} cycle. Steps: ${keys.join(', ')}.`, keys);
    }
  }
  const unknownKey = input.unknown ?? latticeKey;
  if (!keys.includes(unknownKey)) {
    throw new ThermoInputError('unknown_property', 'unknown', `"${unknownKey}" is not a step of the ${salt.formula} cycle. Steps: ${keys.join(', ')}.`, keys);
  }

  const steps: CycleStep[] = specs.map((spec) => {
    let value: Dec | null = null;
    let uncertainty: Dec | null = null;
    let source: string | null = null;
    let overridden = false;
    const field = `values.${spec.key}`;
    if (hasExplicit(spec.key)) {
      const given = explicit[spec.key];
      overridden = true;
      if (given && given.value !== null && given.value !== undefined) {
        value = toDec(given.value, `${field}.value`);
        if (spec.kind === 'lattice_enthalpy') value = latticeFromConvention(value, latticeConvention);
        uncertainty = toUncertainty(given.uncertainty, `${field}.uncertainty`);
        source = given.source ?? 'entered by the user';
      }
    } else if (spec.key !== unknownKey) {
      const hit = lookupSpec(spec, input.lookup);
      if (hit) {
        value = toDec(hit.value, `lookup(${spec.species}, ${spec.phase}, ${spec.property ?? ''}).value`);
        uncertainty = toUncertainty(hit.uncertainty, `lookup(${spec.species}, ${spec.phase}, ${spec.property ?? ''}).uncertainty`);
        source = hit.source ?? null;
      }
    }
    if (spec.key === unknownKey) {
      value = null;
      uncertainty = null;
      source = null;
    }
    return {
      key: spec.key,
      kind: spec.kind,
      name: spec.name,
      property: spec.property,
      species: spec.species,
      phase: spec.phase,
      process: spec.process,
      coefficient: spec.coefficient,
      value,
      basisCorrection: spec.basisCorrection,
      uncertainty,
      source,
      overridden,
    };
  });
  const missing = steps.filter((s) => s.value === null && s.key !== unknownKey).map((s) => s.key);
  return { salt, steps, basis, missing, unknownKey, nonmetalRoute: pathRoute };
}
