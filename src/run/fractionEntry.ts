/**
 * What the chemist records about each receiver after the run (the Fractions screen): the amount
 * collected and, when measured, an analysis. Kept in the run record's `fractions` field; a
 * finished run is read-only except these and its notes.
 */

/** An amount as measured: a volume read off a graduated receiver, or a weighed mass. */
export interface FractionAmount {
  value: number;
  unit: 'mL' | 'g';
}

/**
 * How a binary's composition follows from its refractive index. Both work in liquid volume
 * fraction of the pure components (ideal volumes): `volume-linear` n = sum phi_i n_i;
 * `lorentz-lorenz` (n^2-1)/(n^2+2) = sum phi_i (n_i^2-1)/(n_i^2+2).
 */
export type MixingRule = 'volume-linear' | 'lorentz-lorenz';

/** Refractive index n_D read at `at_c` degC (corrected to 20 degC in the report). Binaries only. */
export interface RefractiveIndexAnalysis {
  method: 'refractive-index';
  n: number;
  at_c: number;
  rule: MixingRule;
  /**
   * The fraction's measured density near 20 degC, when known (a weighed pipette volume). With it
   * Lorentz-Lorenz needs no ideal-volume assumption (specific refractions add by mass).
   */
  density_g_per_ml?: number | null;
}

/** GC area percentages by component name (as in the charge); taken as mass percent. */
export interface GcAreaAnalysis {
  method: 'gc-area';
  area_percent: Record<string, number>;
}

export type FractionAnalysis = RefractiveIndexAnalysis | GcAreaAnalysis;

export interface FractionEntry {
  receiver: number;
  amount: FractionAmount | null;
  analysis: FractionAnalysis | null;
}

export interface RunFractions {
  entries: FractionEntry[];
  /** Liquid left in the pot after the run. */
  residue: FractionAmount | null;
  /** Hold-up in the column, spills, evaporation: what the chemist knows went missing. */
  losses: FractionAmount | null;
  /** Packed (or indented) height of the column, for HETP. Units: m */
  packed_height_m: number | null;
}

export function emptyFractions(): RunFractions {
  return { entries: [], residue: null, losses: null, packed_height_m: null };
}
