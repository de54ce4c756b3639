// Enthalpy of solution at infinite dilution (primary route: formation enthalpies of the aqueous ions
// and the solid) and its explanation as lattice enthalpy + hydration enthalpies (one scale only).
import { Dec } from './decimal';
import { ThermoInputError } from './errors';
import { formatCounts, molarMass, parseFormula } from './formula';
import { combineInQuadrature, roundWithUncertainty, type RoundedValue } from './uncertainty';
import { resolveValue, type ValueInput } from './values';
import type { HydrationScale } from '../reference/properties';
import { HYDRATION_SCALES } from '../reference/properties';

export interface DissolutionIonInput {
  /** Ion formula with charge, e.g. `Ca2+`, `Cl-`, `SO4^2-`, `(NH4)+`. */
  species: string;
  /** Ions per formula unit of the salt. */
  count: number;
  /** Standard enthalpy of formation of the aqueous ion, kJ/mol (conventional, ΔfH(H⁺,aq) = 0). */
  enthalpyOfFormation: ValueInput | number | string;
  /** Optional hydration enthalpy of the gaseous ion, kJ/mol, for the explanation. */
  hydrationEnthalpy?: (ValueInput & { scale?: HydrationScale }) | number | string;
}

export interface DissolutionInput {
  /** The salt as dissolved, e.g. `CaCl2` or `CaCl2·6H2O`. */
  formula: string;
  /** Standard enthalpy of formation of the solid form, kJ/mol. */
  enthalpyOfFormation: ValueInput | number | string;
  ions: DissolutionIonInput[];
  /** ΔfH of H2O(l), kJ/mol; required when the formula carries water of crystallisation. */
  waterEnthalpyOfFormation?: ValueInput | number | string;
  /** Lattice dissociation enthalpy of the anhydrous salt (positive), for the explanation. */
  latticeEnthalpy?: ValueInput | number | string;
  /** Scale of every hydration enthalpy given; values on another scale are refused. */
  hydrationScale?: HydrationScale;
}

export interface DissolutionResult {
  formula: string;
  molarMass: string;
  unit: 'kJ/mol';
  basis: string;
  enthalpyOfSolution: RoundedValue;
  /** Per kg of the solid form dissolved. */
  enthalpyOfSolutionPerKg: string;
  process: string;
  explanation: null | {
    scale: HydrationScale;
    latticeEnthalpy: string;
    hydrationSum: string;
    enthalpyOfSolution: RoundedValue;
    /** primary − explanation; a data-consistency check, not a second answer. */
    difference: RoundedValue;
    consistent: boolean | null;
    note: string;
  };
  notes: string[];
}

function sameCounts(a: Record<string, number>, b: Record<string, number>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) if ((a[k] ?? 0) !== (b[k] ?? 0)) return false;
  return true;
}

export function computeEnthalpyOfSolution(input: DissolutionInput): DissolutionResult {
  const parsed = parseFormula(input.formula, 'formula');
  if (parsed.charge !== 0) throw new ThermoInputError('bad_formula', 'formula', 'Give the neutral salt, not an ion.');
  if (!Array.isArray(input.ions) || input.ions.length === 0) {
    throw new ThermoInputError('unknown_species', 'ions', 'Name the aqueous ions the salt dissolves into.');
  }
  const solid = resolveValue(input.enthalpyOfFormation, 'enthalpyOfFormation');
  const ionElements: Record<string, number> = {};
  let netCharge = 0;
  let ionSum = new Dec(0);
  const terms: Array<{ coefficient: Dec; uncertainty: Dec | null }> = [{ coefficient: new Dec(-1), uncertainty: solid.uncertainty }];
  const ions = input.ions.map((ion, i) => {
    const field = `ions[${i}]`;
    const p = parseFormula(ion.species, `${field}.species`);
    if (p.charge === 0) throw new ThermoInputError('unknown_species', `${field}.species`, `"${ion.species}" has no charge; write it as an ion, e.g. Ca2+ or Cl-.`);
    if (!Number.isInteger(ion.count) || ion.count < 1) throw new ThermoInputError('out_of_range', `${field}.count`, 'The ion count must be a whole number of 1 or more.');
    for (const [s, n] of Object.entries(p.elements)) ionElements[s] = (ionElements[s] ?? 0) + n * ion.count;
    netCharge += p.charge * ion.count;
    const dfh = resolveValue(ion.enthalpyOfFormation, `${field}.enthalpyOfFormation`);
    ionSum = ionSum.plus(dfh.value.times(ion.count));
    terms.push({ coefficient: new Dec(ion.count), uncertainty: dfh.uncertainty });
    return { ion, parsed: p, dfh, field };
  });
  if (netCharge !== 0) {
    throw new ThermoInputError('charges_do_not_balance', 'ions', `The ions' charges add up to ${netCharge > 0 ? '+' : ''}${netCharge}, not zero.`);
  }
  if (!sameCounts(ionElements, parsed.anhydrous)) {
    throw new ThermoInputError('unknown_species', 'ions', `The ions (${formatCounts(ionElements)}) do not make up ${formatCounts(parsed.anhydrous)}.`);
  }
  if (parsed.otherAdducts.length > 0) {
    throw new ThermoInputError('unsupported', 'formula', `Adducts other than water (${parsed.otherAdducts.join(', ')}) are not handled.`);
  }
  let water = new Dec(0);
  if (parsed.waterOfHydration > 0) {
    if (input.waterEnthalpyOfFormation === undefined) {
      throw new ThermoInputError('missing_values', 'waterEnthalpyOfFormation', `${parsed.text} releases ${parsed.waterOfHydration} H2O; give ΔfH of H2O(l).`);
    }
    const w = resolveValue(input.waterEnthalpyOfFormation, 'waterEnthalpyOfFormation');
    water = w.value.times(parsed.waterOfHydration);
    terms.push({ coefficient: new Dec(parsed.waterOfHydration), uncertainty: w.uncertainty });
  }
  const solution = ionSum.plus(water).minus(solid.value);
  const u = combineInQuadrature(terms);
  const mm = molarMass(parsed);
  const notes = [
    'Standard enthalpy of solution at infinite dilution, 298.15 K. Real solutions are far from infinite dilution; integral heats of solution differ.',
  ];

  let explanation: DissolutionResult['explanation'] = null;
  const anyHydration = input.ions.some((ion) => ion.hydrationEnthalpy !== undefined);
  if (input.latticeEnthalpy !== undefined && anyHydration) {
    const scale = input.hydrationScale;
    if (scale === undefined || !(HYDRATION_SCALES as readonly string[]).includes(scale)) {
      throw new ThermoInputError('mixed_scales', 'hydrationScale', 'State the hydration-enthalpy scale: conventional (H⁺ = 0) or absolute.');
    }
    const lattice = resolveValue(input.latticeEnthalpy, 'latticeEnthalpy');
    if (!lattice.value.isPositive()) {
      throw new ThermoInputError('out_of_range', 'latticeEnthalpy.value', 'Give the lattice enthalpy as a dissociation enthalpy (positive).');
    }
    let hydrationSum = new Dec(0);
    const eTerms: Array<{ coefficient: Dec; uncertainty: Dec | null }> = [{ coefficient: new Dec(1), uncertainty: lattice.uncertainty }];
    ions.forEach(({ ion, field }) => {
      if (ion.hydrationEnthalpy === undefined) {
        throw new ThermoInputError('missing_values', `${field}.hydrationEnthalpy`, `No hydration enthalpy for ${ion.species}.`);
      }
      const h = ion.hydrationEnthalpy;
      const ionScale = typeof h === 'object' && h !== null && 'scale' in h ? h.scale : undefined;
      if (ionScale !== undefined && ionScale !== scale) {
        throw new ThermoInputError('mixed_scales', `${field}.hydrationEnthalpy.scale`, `${ion.species} is on the ${ionScale} scale but the others are on the ${scale} scale; never mix scales.`);
      }
      const hv = resolveValue(h, `${field}.hydrationEnthalpy`);
      hydrationSum = hydrationSum.plus(hv.value.times(ion.count));
      eTerms.push({ coefficient: new Dec(ion.count), uncertainty: hv.uncertainty });
    });
    const explained = lattice.value.plus(hydrationSum);
    const ue = combineInQuadrature(eTerms);
    const anhydrousPrimary = parsed.waterOfHydration > 0 ? null : solution;
    const diff = anhydrousPrimary === null ? null : anhydrousPrimary.minus(explained);
    const ud = combineInQuadrature([
      { coefficient: new Dec(1), uncertainty: u },
      { coefficient: new Dec(1), uncertainty: ue },
    ]);
    explanation = {
      scale,
      latticeEnthalpy: lattice.value.toString(),
      hydrationSum: hydrationSum.toString(),
      enthalpyOfSolution: roundWithUncertainty(explained, ue),
      difference: diff === null ? roundWithUncertainty(new Dec(0), null) : roundWithUncertainty(diff, ud),
      // Within twice the combined standard uncertainty counts as consistent (common practice, no source).
      consistent: diff === null || ud === null ? null : diff.abs().lte(ud.times(2)),
      note:
        parsed.waterOfHydration > 0
          ? 'The lattice + hydration explanation is for the anhydrous salt; it is not compared with a hydrate.'
          : `Explanation only: ΔsolH ≈ ΔH_L + Σ ΔhydH on the ${scale} scale (for a neutral salt the sum is the same on either scale). The primary value above comes from formation enthalpies.`,
    };
  }
  return {
    formula: parsed.text,
    molarMass: mm.toString(),
    unit: 'kJ/mol',
    basis: 'Primary route: Σ ν·ΔfH(ion, aq) + n·ΔfH(H2O, l) − ΔfH(solid), conventional ionic values (ΔfH(H⁺, aq) = 0).',
    enthalpyOfSolution: roundWithUncertainty(solution, u),
    enthalpyOfSolutionPerKg: solution.times(1000).div(mm).toString(),
    process: `${parsed.text}(cr) → ${ions.map(({ ion }) => `${ion.count > 1 ? `${ion.count} ` : ''}${ion.species}(aq)`).join(' + ')}${parsed.waterOfHydration > 0 ? ` + ${parsed.waterOfHydration} H2O(l)` : ''}`,
    explanation,
    notes,
  };
}
