import type { StageEquilibrium } from './stageEquilibrium.ts';

/** Saturation pressure of a pure component. Units: K in, Pa out. */
export type SaturationPressure = (tK: number) => number;

/**
 * Ideal solution and ideal gas (Raoult's law): y_i P = x_i Psat_i(T). The bubble temperature
 * solves sum_i x_i Psat_i(T) = P by Newton on ln of the sum, the slope taken by a forward
 * difference so any correlation (Antoine, DIPPR-101, a table) can be passed in.
 */
export function raoultEquilibrium(pSatPa: readonly SaturationPressure[]): StageEquilibrium {
  const n = pSatPa.length;
  if (n < 1) throw new RangeError('at least one component is needed');
  return {
    componentCount: n,
    bubbleTInto(x, pPa, yOut, guessK) {
      let tK = guessK > 0 ? guessK : 350;
      const logP = Math.log(pPa);
      for (let iteration = 0; iteration < 60; iteration++) {
        let total = 0;
        let totalUp = 0;
        const dT = 1e-4 * tK;
        for (let i = 0; i < n; i++) {
          const xi = x[i]!;
          const fn = pSatPa[i]!;
          total += xi * fn(tK);
          totalUp += xi * fn(tK + dT);
        }
        if (!(total > 0 && totalUp > 0)) {
          tK *= 1.1; // far below every boiling point the sum underflows: climb back
          continue;
        }
        const residual = Math.log(total) - logP;
        const slope = (Math.log(totalUp) - Math.log(total)) / dT;
        let step = residual / slope;
        if (step > 50) step = 50; // Antoine forms misbehave far from their range
        else if (step < -50) step = -50;
        tK -= step;
        if (Math.abs(step) <= 1e-10 * tK) break;
      }
      let sum = 0;
      for (let i = 0; i < n; i++) {
        const value = x[i]! * pSatPa[i]!(tK);
        yOut[i] = value;
        sum += value;
      }
      for (let i = 0; i < n; i++) yOut[i] = yOut[i]! / sum;
      return tK;
    },
  };
}
