/**
 * Vapour-liquid equilibrium on one theoretical stage, as the column model needs it. The model
 * calls it once per stage per derivative evaluation, so implementations must not allocate.
 */
export interface StageEquilibrium {
  /** Number of chemical components, in the order every array uses. */
  readonly componentCount: number;
  /**
   * Bubble point of liquid x (mole fractions, summing to 1; tiny negative entries may occur
   * while an integrator probes a nearly exhausted component and must not throw) at pressure
   * pPa. Writes the equilibrium vapour mole fractions into yOut (summing to 1) and returns the
   * bubble temperature. Units: K. guessK is the last answer for this stage: a warm start.
   */
  bubbleTInto(x: Float64Array, pPa: number, yOut: Float64Array, guessK: number): number;
}

/** Per-component data the column model needs beside equilibrium. Units in each name. */
export interface ComponentData {
  /** Liquid molar volume, for volumes of holdup, charge and distillate. Units: m^3/mol. */
  readonly molarVolumeM3PerMol: ArrayLike<number>;
  /** Molar enthalpy of vaporisation, for boil-up from heat. Units: J/mol. */
  readonly hVapJPerMol: ArrayLike<number>;
  /** Liquid molar heat capacity, for warming the pot. Units: J/(mol K). */
  readonly cpLiquidJPerMolK: ArrayLike<number>;
}
