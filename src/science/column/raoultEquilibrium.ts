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
  const partial = new Float64Array(n);
  return {
    componentCount: n,
    bubbleTInto(x, pPa, yOut, guessK) {
      let tK = guessK > 0 ? guessK : 350;
      const logP = Math.log(pPa);
      let sum = 0;
      for (let iteration = 0; iteration < 60; iteration++) {
        let total = 0;
        let totalUp = 0;
        const dT = 1e-4 * tK;
        for (let i = 0; i < n; i++) {
          const xi = x[i]!;
          const fn = pSatPa[i]!;
          const value = xi * fn(tK);
          partial[i] = value;
          total += value;
          totalUp += xi * fn(tK + dT);
        }
        sum = total;
        if (!(total > 0 && totalUp > 0)) {
          tK *= 1.1; // far below every boiling point the sum underflows: climb back
          continue;
        }
        const residual = Math.log(total) - logP;
        const slope = (Math.log(totalUp) - Math.log(total)) / dT;
        let step = residual / slope;
        if (step > 50) step = 50; // Antoine forms misbehave far from their range
        else if (step < -50) step = -50;
        // Converged: keep the temperature the partial pressures belong to, so y needs no
        // further calls (the step is below 1e-12 of T, quiet enough for finite-difference Jacobians).
        if (Math.abs(step) <= 1e-12 * tK) break;
        tK -= step;
      }
      for (let i = 0; i < n; i++) yOut[i] = partial[i]! / sum;
      return tK;
    },
  };
}
