import type { PreparedMixture } from './prepareMixture.ts';

/** The T-x-y (and x-y) curve of a binary: x and y of the first (listed) compound. */
export interface BinaryCurve {
  x: Float64Array;
  y: Float64Array;
  /** Bubble temperature at each x. Units: K */
  tK: Float64Array;
}

/** Bubble-point sweep of a binary from x = 0 to 1 in `points` steps, each start from the last. */
export function binaryTxy(mixture: PreparedMixture, pPa: number, points = 101): BinaryCurve {
  if (mixture.componentCount !== 2) throw new RangeError(`a T-x-y curve needs two compounds (got ${mixture.componentCount})`);
  if (!(points >= 2) || !Number.isInteger(points)) throw new RangeError(`points must be an integer >= 2 (got ${points})`);
  const curve = { x: new Float64Array(points), y: new Float64Array(points), tK: new Float64Array(points) };
  const liquid = new Float64Array(2);
  const vapour = new Float64Array(2);
  let guess: number | undefined;
  for (let i = 0; i < points; i++) {
    const x1 = i / (points - 1);
    liquid[0] = x1;
    liquid[1] = 1 - x1;
    guess = mixture.bubbleTInto(liquid, pPa, vapour, guess);
    curve.x[i] = x1;
    curve.y[i] = vapour[0]!;
    curve.tK[i] = guess;
  }
  return curve;
}
