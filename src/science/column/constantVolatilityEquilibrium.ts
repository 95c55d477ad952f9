import type { StageEquilibrium } from './stageEquilibrium.ts';

const GAS_CONSTANT = 8.314462618; // J/(mol K), CODATA 2018 exact value
const STANDARD_PRESSURE_PA = 101325; // normal boiling points are defined at 1 atm

export interface ConstantVolatilityOptions {
  /** Relative volatility of each component against any common reference (only ratios matter). */
  alpha: ArrayLike<number>;
  /** Normal boiling point of each component, for the temperature mapping. Units: K. */
  normalBoilingK: ArrayLike<number>;
  /** Enthalpy of vaporisation of each component, for the temperature mapping. Units: J/mol. */
  hVapJPerMol: ArrayLike<number>;
}

/**
 * Constant relative volatility: y_i = alpha_i x_i / sum_j alpha_j x_j, exactly, at every
 * temperature. The stage temperature comes from a separate, simple mapping: the ideal bubble
 * point with each pure component on the Clausius-Clapeyron line through its normal boiling
 * point, ln(Psat_i / 101325 Pa) = (hVap_i / R)(1/Tb_i - 1/T). A pure liquid therefore boils at
 * its own Tb (shifted by the pressure); mixtures boil in between. The two halves are not one
 * thermodynamic model; this is the textbook idealisation used to check Rayleigh and Fenske.
 */
export function constantVolatilityEquilibrium(options: ConstantVolatilityOptions): StageEquilibrium {
  const n = options.alpha.length;
  if (n < 1) throw new RangeError('at least one component is needed');
  if (options.normalBoilingK.length !== n || options.hVapJPerMol.length !== n) {
    throw new RangeError('alpha, normalBoilingK and hVapJPerMol need one entry per component');
  }
  const alpha = Float64Array.from(options.alpha);
  const slope = new Float64Array(n); // hVap / R. Units: K.
  const offset = new Float64Array(n); // hVap / (R Tb)
  for (let i = 0; i < n; i++) {
    const tb = options.normalBoilingK[i]!;
    const hVap = options.hVapJPerMol[i]!;
    if (!(alpha[i]! > 0)) throw new RangeError('alpha must be > 0 for every component');
    if (!(tb > 0)) throw new RangeError('normal boiling point must be > 0 K');
    if (!(hVap > 0)) throw new RangeError('enthalpy of vaporisation must be > 0 J/mol');
    slope[i] = hVap / GAS_CONSTANT;
    offset[i] = hVap / (GAS_CONSTANT * tb);
  }
  return {
    componentCount: n,
    bubbleTInto(x, pPa, yOut, guessK) {
      let sum = 0;
      for (let i = 0; i < n; i++) sum += alpha[i]! * x[i]!;
      for (let i = 0; i < n; i++) yOut[i] = (alpha[i]! * x[i]!) / sum;
      // Newton on u = 1/T for ln sum_i x_i Psat_i(u) / P = 0: the left side is a log-sum-exp of
      // lines in u, convex and falling, so Newton converges from any start after one step.
      const logPressureRatio = Math.log(pPa / STANDARD_PRESSURE_PA);
      let u = 1 / (guessK > 0 ? guessK : 350);
      for (let iteration = 0; iteration < 60; iteration++) {
        let total = 0;
        let slopeTotal = 0;
        for (let i = 0; i < n; i++) {
          const term = x[i]! * Math.exp(offset[i]! - slope[i]! * u - logPressureRatio);
          total += term;
          slopeTotal -= slope[i]! * term;
        }
        if (!(total > 0)) break;
        const step = (Math.log(total) * total) / slopeTotal;
        u -= step;
        if (Math.abs(step) <= 1e-15 * u) break;
      }
      return 1 / u;
    },
  };
}
