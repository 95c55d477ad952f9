import type { Compound } from '../compounds/compound.ts';
import { dLnPSatdT, gasConstant, lnPSat } from '../compounds/vapourPressure.ts';
import { ConvergenceError } from './convergenceError.ts';
import type { ThermoModel } from './thermoModel.ts';
import { prepareIdeal, prepareUnifac, type ActivityModel } from './unifacModel.ts';

/**
 * A mixture ready for repeated equilibrium calls (the column simulator's hot path): every
 * method takes and fills preallocated Float64Arrays and allocates nothing.
 * Modified Raoult's law: y_i P = x_i gamma_i Psat_i(T), ideal vapour.
 */
export interface PreparedMixture {
  readonly compounds: readonly Compound[];
  readonly model: ThermoModel;
  readonly componentCount: number;
  /** True when any vapour pressure is a user estimate. */
  readonly isEstimated: boolean;
  /** K_i = y_i/x_i at (x, T, P). */
  kValuesInto(x: Float64Array, tK: number, pPa: number, kOut: Float64Array): void;
  /** Bubble temperature of liquid x at P; writes the vapour in yOut. Units: K */
  bubbleTInto(x: Float64Array, pPa: number, yOut: Float64Array, guessTK?: number): number;
  /** Dew temperature of vapour y at P; writes the liquid in xOut. Units: K */
  dewTInto(y: Float64Array, pPa: number, xOut: Float64Array, guessTK?: number): number;
  /** Bubble pressure of liquid x at T; writes the vapour in yOut. Units: Pa */
  bubblePInto(x: Float64Array, tK: number, yOut: Float64Array): number;
  /** Dew pressure of vapour y at T; writes the liquid in xOut. Units: Pa */
  dewPInto(y: Float64Array, tK: number, xOut: Float64Array): number;
}

const maxIterations = 200;

/** Prepares compounds for equilibrium with a model. Throws MissingUnifacDataError for unknown UNIFAC pairs. */
export function prepareMixture(compounds: readonly Compound[], model: ThermoModel): PreparedMixture {
  const n = compounds.length;
  if (n === 0) throw new RangeError('a mixture needs at least one compound');
  const activity: ActivityModel = model === 'unifac' ? prepareUnifac(compounds) : prepareIdeal(n);
  const lnGamma = new Float64Array(n);
  const term = new Float64Array(n);
  const slope = new Float64Array(n);
  const xTrial = new Float64Array(n);
  const names = compounds.map((c) => c.name).join(', ');

  function describe(v: Float64Array): string {
    return Array.from(v.subarray(0, n), (value, i) => `${compounds[i]!.name}:${value.toPrecision(4)}`).join(',');
  }

  function checkComposition(v: Float64Array, what: string): void {
    if (v.length < n) throw new RangeError(`${what} needs ${n} mole fractions (${names})`);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const value = v[i]!;
      if (!(value >= 0) || !Number.isFinite(value)) throw new RangeError(`${what} mole fraction of ${compounds[i]!.name} must be >= 0 (got ${value})`);
      sum += value;
    }
    if (!(Math.abs(sum - 1) < 1e-6)) throw new RangeError(`${what} mole fractions must sum to 1 (got ${sum})`);
  }

  function checkPressure(pPa: number): void {
    if (!(pPa > 0) || !Number.isFinite(pPa)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
  }

  function checkTemperature(tK: number): void {
    if (!(tK > 0) || !Number.isFinite(tK)) throw new RangeError(`temperature must be > 0 K (got ${tK})`);
  }

  // A start for T from each compound's boiling point and Clausius-Clapeyron: allocation-free.
  function startT(v: Float64Array, pPa: number): number {
    const lnRatio = Math.log(pPa / 101325);
    let t = 0;
    for (let i = 0; i < n; i++) {
      const c = compounds[i]!;
      t += v[i]! / (1 / c.normalBoilingPointK - (gasConstant * lnRatio) / c.enthalpyOfVaporisationJPerMol);
    }
    return t;
  }

  /** Safeguarded Newton on f(T), increasing in T; `evaluate` fills f and f' via the closure state. */
  function solveT(evaluate: (tK: number) => number, derivative: () => number, t0: number, what: () => string): number {
    let lo = 0;
    let hi = Infinity;
    let t = t0;
    for (let iteration = 0; iteration < maxIterations; iteration++) {
      const f = evaluate(t);
      if (!Number.isFinite(f)) throw new ConvergenceError(`${what()}: equilibrium undefined at ${t.toFixed(2)} K`);
      if (Math.abs(f) < 1e-11) return t;
      if (f > 0) hi = t; else lo = t;
      const d = derivative();
      let step = d > 0 ? -f / d : f > 0 ? -10 : 10;
      if (step > 40) step = 40;
      if (step < -40) step = -40;
      let next = t + step;
      if (!(next > lo && next < hi)) next = Number.isFinite(hi) ? 0.5 * (lo + hi) : t + 40;
      if (next <= 0) next = 0.5 * t;
      if (Math.abs(next - t) < 1e-10 * t) return next;
      t = next;
    }
    throw new ConvergenceError(`${what()}: no convergence after ${maxIterations} iterations`);
  }

  let bubbleX: Float64Array = xTrial;
  let bubbleP = 1;
  let bubbleSum = 0;
  function bubbleResidual(tK: number): number {
    activity.lnGammaInto(bubbleX, tK, lnGamma);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      term[i] = bubbleX[i]! * Math.exp(lnGamma[i]! + lnPSat(compounds[i]!, tK));
      slope[i] = dLnPSatdT(compounds[i]!, tK);
      sum += term[i]!;
    }
    bubbleSum = sum;
    return Math.log(sum / bubbleP);
  }
  function bubbleDerivative(): number {
    let s = 0;
    for (let i = 0; i < n; i++) s += term[i]! * slope[i]!;
    return s / bubbleSum;
  }

  let dewY: Float64Array = xTrial;
  let dewX: Float64Array = xTrial;
  let dewP = 1;
  let dewSum = 0;
  // Sum of y_i P / (gamma_i Psat_i) must be 1; gamma at the latest liquid estimate (successive substitution).
  function dewResidual(tK: number): number {
    activity.lnGammaInto(dewX, tK, lnGamma);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      term[i] = (dewY[i]! * dewP) / Math.exp(lnGamma[i]! + lnPSat(compounds[i]!, tK));
      slope[i] = dLnPSatdT(compounds[i]!, tK);
      sum += term[i]!;
    }
    dewSum = sum;
    for (let i = 0; i < n; i++) dewX[i] = term[i]! / sum;
    return -Math.log(sum);
  }
  function dewDerivative(): number {
    let s = 0;
    for (let i = 0; i < n; i++) s += term[i]! * slope[i]!;
    return s / dewSum;
  }

  return {
    compounds,
    model,
    componentCount: n,
    isEstimated: compounds.some((c) => c.isEstimated),
    kValuesInto(x, tK, pPa, kOut) {
      activity.lnGammaInto(x, tK, lnGamma);
      for (let i = 0; i < n; i++) kOut[i] = Math.exp(lnGamma[i]! + lnPSat(compounds[i]!, tK)) / pPa;
    },
    bubbleTInto(x, pPa, yOut, guessTK) {
      checkComposition(x, 'liquid');
      checkPressure(pPa);
      bubbleX = x;
      bubbleP = pPa;
      const t = solveT(bubbleResidual, bubbleDerivative, guessTK !== undefined && guessTK > 0 ? guessTK : startT(x, pPa), () => `bubble point of ${describe(x)} at ${pPa.toFixed(0)} Pa`);
      bubbleResidual(t);
      for (let i = 0; i < n; i++) yOut[i] = term[i]! / bubbleSum;
      return t;
    },
    dewTInto(y, pPa, xOut, guessTK) {
      checkComposition(y, 'vapour');
      checkPressure(pPa);
      dewY = y;
      dewP = pPa;
      dewX = xOut;
      for (let i = 0; i < n; i++) xOut[i] = y[i]!;
      let t = guessTK !== undefined && guessTK > 0 ? guessTK : startT(y, pPa);
      // Outer loop: the liquid estimate changes gamma, so re-solve T until both settle.
      for (let pass = 0; pass < maxIterations; pass++) {
        for (let i = 0; i < n; i++) xTrial[i] = xOut[i]!;
        t = solveT(dewResidual, dewDerivative, t, () => `dew point of ${describe(y)} at ${pPa.toFixed(0)} Pa`);
        dewResidual(t);
        let change = 0;
        for (let i = 0; i < n; i++) change = Math.max(change, Math.abs(xOut[i]! - xTrial[i]!));
        if (model === 'ideal' || change < 1e-11) return t;
      }
      throw new ConvergenceError(`dew point of ${describe(y)} at ${pPa.toFixed(0)} Pa: liquid composition did not settle`);
    },
    bubblePInto(x, tK, yOut) {
      checkComposition(x, 'liquid');
      checkTemperature(tK);
      activity.lnGammaInto(x, tK, lnGamma);
      let p = 0;
      for (let i = 0; i < n; i++) {
        yOut[i] = x[i]! * Math.exp(lnGamma[i]! + lnPSat(compounds[i]!, tK));
        p += yOut[i]!;
      }
      for (let i = 0; i < n; i++) yOut[i] = yOut[i]! / p;
      return p;
    },
    dewPInto(y, tK, xOut) {
      checkComposition(y, 'vapour');
      checkTemperature(tK);
      for (let i = 0; i < n; i++) xOut[i] = y[i]!;
      let p = 0;
      for (let pass = 0; pass < maxIterations; pass++) {
        activity.lnGammaInto(xOut, tK, lnGamma);
        let inverse = 0;
        for (let i = 0; i < n; i++) {
          term[i] = y[i]! / Math.exp(lnGamma[i]! + lnPSat(compounds[i]!, tK));
          inverse += term[i]!;
        }
        p = 1 / inverse;
        let change = 0;
        for (let i = 0; i < n; i++) {
          const next = term[i]! * p;
          change = Math.max(change, Math.abs(next - xOut[i]!));
          xOut[i] = next;
        }
        if (change < 1e-12) return p;
      }
      throw new ConvergenceError(`dew pressure of ${describe(y)} at ${tK.toFixed(2)} K: liquid composition did not settle`);
    },
  };
}
