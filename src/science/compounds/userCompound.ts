import type { Compound } from './compound.ts';
import { normaliseName } from './normaliseName.ts';
import { pressureUnitsPa } from '../units/unitTables.ts';
import type { VapourPressureCorrelation } from './vapourPressureCorrelation.ts';

// Trouton's rule: the entropy of vaporisation at the normal boiling point is about 88 J/(mol K)
// for ordinary liquids; hydrogen-bonded liquids (water, alcohols) sit near 109 J/(mol K)
// (both from memory; textbook values, e.g. Atkins' Physical Chemistry, Trouton's rule).
export const troutonEntropyJPerMolK = 88;
export const hydrogenBondedEntropyJPerMolK = 109;

/** Antoine constants as the chemist has them: log10(P/unit) = a - b / (T/unit + c). */
export interface UserAntoine {
  a: number;
  b: number;
  c: number;
  pressureUnit: string;
  temperatureUnit: 'C' | 'K';
  /** Valid range, if the source gives it. Units: K */
  tMinK?: number;
  tMaxK?: number;
}

export interface UserCompoundInput {
  name: string;
  /** Units: K */
  normalBoilingPointK: number;
  /** Units: kg/mol */
  molarMassKgPerMol?: number;
  /** Units: kg/m^3 */
  liquidDensityKgPerM3?: number;
  /** Units: J/(mol K) */
  liquidHeatCapacityJPerMolK?: number;
  antoine?: UserAntoine;
  /** Choose the hydrogen-bonded Trouton constant (alcohols, acids, amines, water). */
  isHydrogenBonded?: boolean;
}

function antoineCorrelation(input: UserAntoine, name: string): VapourPressureCorrelation {
  const factor = pressureUnitsPa[input.pressureUnit.toLowerCase()];
  if (factor === undefined) throw new RangeError(`${name}: unknown Antoine pressure unit "${input.pressureUnit}"`);
  if (![input.a, input.b, input.c].every(Number.isFinite)) throw new RangeError(`${name}: Antoine constants must be numbers`);
  return {
    kind: 'antoine-log10',
    a: input.a + Math.log10(factor),
    b: input.b,
    c: input.temperatureUnit === 'C' ? input.c - 273.15 : input.c,
    tMinK: input.tMinK ?? 0,
    tMaxK: input.tMaxK ?? Infinity,
    source: 'Antoine constants entered by the user',
  };
}

/**
 * A compound of the chemist's own from a name and a normal boiling point (plus whatever else
 * is known). Without Antoine constants the vapour pressure is a Clausius-Clapeyron estimate
 * with a Trouton-type entropy, and the compound is flagged `isEstimated`.
 */
export function makeUserCompound(input: UserCompoundInput): Compound {
  const name = input.name.trim();
  if (normaliseName(name) === '') throw new RangeError('a compound needs a name');
  const tbK = input.normalBoilingPointK;
  if (!(tbK > 0) || !Number.isFinite(tbK)) throw new RangeError(`${name}: normal boiling point must be > 0 K`);
  if (input.molarMassKgPerMol !== undefined && !(input.molarMassKgPerMol > 0)) throw new RangeError(`${name}: molar mass must be > 0`);
  if (input.liquidDensityKgPerM3 !== undefined && !(input.liquidDensityKgPerM3 > 0)) throw new RangeError(`${name}: density must be > 0`);
  if (input.liquidHeatCapacityJPerMolK !== undefined && !(input.liquidHeatCapacityJPerMolK > 0)) throw new RangeError(`${name}: heat capacity must be > 0`);
  const entropy = input.isHydrogenBonded ? hydrogenBondedEntropyJPerMolK : troutonEntropyJPerMolK;
  const hVapJPerMol = entropy * tbK;
  const estimateNotes: string[] = [];
  let vapourPressure: VapourPressureCorrelation;
  if (input.antoine) {
    vapourPressure = antoineCorrelation(input.antoine, name);
    if (input.antoine.tMinK === undefined) estimateNotes.push('Antoine range not given: used at every temperature');
  } else {
    vapourPressure = { kind: 'clausius-clapeyron', tbK, hVapJPerMol, tMinK: 0, tMaxK: Infinity, source: `Clausius-Clapeyron estimate from the boiling point, Trouton entropy ${entropy} J/(mol K)` };
    estimateNotes.push(`vapour pressure estimated from the boiling point alone (Trouton's rule, ${entropy} J/(mol K)${input.isHydrogenBonded ? ', hydrogen-bonded' : ''}); expect errors of several degC away from 1 atm`);
  }
  const entered = 'entered by the user';
  return {
    id: `user:${normaliseName(name)}`,
    name,
    synonyms: [],
    cas: null,
    formula: null,
    molarMassKgPerMol: input.molarMassKgPerMol ?? null,
    liquidDensityKgPerM3: input.liquidDensityKgPerM3 ?? null,
    normalBoilingPointK: tbK,
    vapourPressure,
    enthalpyOfVaporisationJPerMol: hVapJPerMol,
    liquidHeatCapacityJPerMolK: input.liquidHeatCapacityJPerMolK ?? null,
    refractiveIndexD20: null,
    flashPointK: null,
    autoignitionK: null,
    hazards: { isPeroxideFormer: false, isToxic: false, carcinogen: null, isVeryFlammable: false, notes: ['hazards unknown: check the safety data sheet'] },
    unifacGroups: null,
    sources: { normalBoilingPointK: entered, vapourPressure: vapourPressure.source, enthalpyOfVaporisationJPerMol: `Trouton-type estimate, ${entropy} J/(mol K) times Tb` },
    isEstimated: input.antoine === undefined || input.antoine.tMinK === undefined,
    estimateNotes,
  };
}
