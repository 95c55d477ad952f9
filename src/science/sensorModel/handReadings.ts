import { firstOrderLag } from './firstOrderLag.ts';
import { interpolateSorted } from './interpolate.ts';
import { createRandom } from './random.ts';

/** How a chemist reads a glass thermometer and types the reading in. */
export interface HandReadingOptions {
  seed: number;
  /** Shortest and longest time between readings (uniform). Units: s. Default 60 and 120. */
  minIntervalS?: number;
  maxIntervalS?: number;
  /** Rounding of the typed value. Units: degC. Default 0.5. */
  roundToC?: number;
  /** Error of reading the scale, sd. Units: degC. Default 0.15. */
  readingSdC?: number;
  /** Glass thermometer time constant in condensing vapour. Units: s. Default 10 (from memory). */
  lagTauS?: number;
  /** Time of the first reading. Units: s. Default: the first truth time. */
  startS?: number;
}

/** Typed readings at irregular times, rounded; never NaN (a person skips rather than errs). */
export function handReadings(truthTimeS: Float64Array, truthHeadC: Float64Array, options: HandReadingOptions): { timeS: Float64Array; headC: Float64Array } {
  if (truthTimeS.length === 0) throw new RangeError('truth series is empty');
  const minS = options.minIntervalS ?? 60, maxS = options.maxIntervalS ?? 120;
  if (!(minS > 0 && maxS >= minS)) throw new RangeError('hand reading intervals must satisfy 0 < min <= max');
  const roundToC = options.roundToC ?? 0.5;
  if (!(roundToC > 0)) throw new RangeError('rounding step must be > 0 degC');
  const random = createRandom(options.seed);
  const endS = truthTimeS[truthTimeS.length - 1]!;
  const times: number[] = [];
  for (let t = options.startS ?? truthTimeS[0]!; t <= endS; t += minS + (maxS - minS) * random.uniform()) times.push(t);
  const timeS = Float64Array.from(times);
  // The lag acts on the continuous truth, so it is solved on the truth grid, then read off.
  const lagged = firstOrderLag(truthTimeS, truthHeadC, options.lagTauS ?? 10);
  const headC = interpolateSorted(truthTimeS, lagged, timeS);
  const sdC = options.readingSdC ?? 0.15;
  for (let i = 0; i < headC.length; i++) headC[i] = Math.round((headC[i]! + sdC * random.normal()) / roundToC) * roundToC;
  return { timeS, headC };
}
