import { simulateTotalReflux, type PreparedMixture } from '../../science/index.ts';

/** One slice of the predicted run: what reaches the receiver while the head reads `headC`. */
export interface PredictedSlice {
  /** Units: degC */
  headC: number;
  /** Moles of each compound collected in this slice, in the mixture's order. Units: mol */
  moles: Float64Array;
}

export interface PredictionInput {
  mixture: PreparedMixture;
  x: readonly number[];
  /** Units: mol */
  chargeMol: number;
  /** Units: Pa */
  pressurePa: number;
  plates: number;
}

/** Words for the page: where the prediction comes from. */
export const predictionBasis = 'near-total-reflux estimate (equilibrium stages stepped up from the pot, Rayleigh balance); a real run at finite reflux separates less sharply';

/**
 * The predicted course of the run, slice by slice, lightest first. This is the one place the
 * Prepare screen gets its prediction from: today the planner's near-total-reflux estimate;
 * switch it to the column simulator (src/science/column/) once that is on main, keeping the
 * same output.
 */
export function predictDistillation({ mixture, x, chargeMol, pressurePa, plates }: PredictionInput): PredictedSlice[] {
  return simulateTotalReflux(mixture, x, chargeMol, pressurePa, plates).map((step) => ({
    headC: step.headTK - 273.15,
    moles: step.head.map((fraction) => fraction * step.moles),
  }));
}
