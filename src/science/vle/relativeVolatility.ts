import type { PreparedMixture } from './prepareMixture.ts';

/**
 * Relative volatility alpha_ij = K_i / K_j at the bubble point of liquid x at pressure P.
 * Allocation-free when `scratch` (length >= 2n) is given.
 */
export function relativeVolatility(mixture: PreparedMixture, x: Float64Array, pPa: number, i: number, j: number, scratch?: Float64Array): number {
  const n = mixture.componentCount;
  if (!(i >= 0 && i < n && j >= 0 && j < n)) throw new RangeError(`component index out of range (0-${n - 1})`);
  const work = scratch ?? new Float64Array(2 * n);
  const y = work.subarray(0, n);
  const k = work.subarray(n, 2 * n);
  const tK = mixture.bubbleTInto(x, pPa, y);
  mixture.kValuesInto(x, tK, pPa, k);
  return k[i]! / k[j]!;
}
