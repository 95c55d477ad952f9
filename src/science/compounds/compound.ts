import type { VapourPressureCorrelation } from './vapourPressureCorrelation.ts';

/** Hazard notes the app turns into cautions. */
export interface Hazards {
  isPeroxideFormer: boolean;
  isToxic: boolean;
  /** The classification, e.g. "IARC group 2B", or null. */
  carcinogen: string | null;
  /** Flash point below 23 degC (GHS flammable liquid category 1 or 2, from memory). */
  isVeryFlammable: boolean;
  notes: readonly string[];
}

/** One pure compound with every value's source. All quantities SI. */
export interface Compound {
  /** Stable key: the normalised primary name. */
  id: string;
  name: string;
  synonyms: readonly string[];
  cas: string | null;
  formula: string | null;
  /** Units: kg/mol */
  molarMassKgPerMol: number | null;
  /** Liquid density near 20 degC. Units: kg/m^3 */
  liquidDensityKgPerM3: number | null;
  /** Handbook normal boiling point (at 101325 Pa). Units: K */
  normalBoilingPointK: number;
  vapourPressure: VapourPressureCorrelation;
  /** Enthalpy of vaporisation near the normal boiling point. Units: J/mol */
  enthalpyOfVaporisationJPerMol: number;
  /** Liquid heat capacity near 25 degC, or null when unknown. Units: J/(mol K) */
  liquidHeatCapacityJPerMolK: number | null;
  /** Refractive index n_D at 20 degC (dimensionless). */
  refractiveIndexD20: number | null;
  /** Units: K */
  flashPointK: number | null;
  /** Units: K */
  autoignitionK: number | null;
  hazards: Hazards;
  /** Original-UNIFAC subgroups as [subgroup id, count]; null when none are known. */
  unifacGroups: ReadonlyArray<readonly [number, number]> | null;
  /** Where each field's value came from, by field name. */
  sources: Readonly<Record<string, string>>;
  /** True when the vapour pressure (and so every result built on it) is an estimate. */
  isEstimated: boolean;
  /** Plain-words notes on what is estimated and how. */
  estimateNotes: readonly string[];
}
