/** Head temperature against distilled volume; volumes non-decreasing. Units: m^3, K. */
export interface HeadCurve {
  readonly distilledM3: Float64Array;
  readonly headK: Float64Array;
}

export interface PlateFit {
  /** Column plates whose simulated curve fits best. */
  readonly plates: number;
  /** Root-mean-square head misfit at that number. Units: K. */
  readonly rmsK: number;
  /** Misfit for every number tried, index = plates - minPlates. Units: K. */
  readonly rmsByPlates: Float64Array;
  readonly minPlates: number;
  /** Packed height over plates, when a height was given and plates > 0. Units: m. */
  readonly hetpM: number | null;
}

/**
 * Fits the number of theoretical plates to an observed head-temperature-against-volume curve by
 * simulating the same charge and heat with 0, 1, 2, ... plates and keeping the closest. Points
 * in the first and last 3 % of the observed volume are left out: start-up and the dry pot say
 * little about plates. `simulate` is the caller's model of the run with the given plates.
 */
export function fitPlatesToHeadCurve(
  observed: HeadCurve,
  simulate: (plates: number) => HeadCurve,
  options: { minPlates?: number; maxPlates?: number; packedHeightM?: number } = {},
): PlateFit {
  const count = observed.distilledM3.length;
  if (count !== observed.headK.length) throw new RangeError('observed volumes and temperatures differ in length');
  if (count < 3) throw new RangeError('at least three observed points are needed');
  const minPlates = options.minPlates ?? 0;
  const maxPlates = options.maxPlates ?? 20;
  if (!(Number.isInteger(minPlates) && Number.isInteger(maxPlates) && minPlates >= 0 && maxPlates >= minPlates)) {
    throw new RangeError('plate range must be whole numbers with 0 <= minPlates <= maxPlates');
  }
  const finalM3 = observed.distilledM3[count - 1]!;
  if (!(finalM3 > 0)) throw new RangeError('the observed run distilled nothing');
  const rmsByPlates = new Float64Array(maxPlates - minPlates + 1);
  let best = minPlates;
  for (let plates = minPlates; plates <= maxPlates; plates++) {
    const simulated = simulate(plates);
    let sum = 0;
    let used = 0;
    for (let k = 0; k < count; k++) {
      const v = observed.distilledM3[k]!;
      const t = observed.headK[k]!;
      if (!(v > 0.03 * finalM3 && v < 0.97 * finalM3) || !Number.isFinite(t)) continue;
      const d = headAtVolume(simulated, v) - t;
      sum += d * d;
      used++;
    }
    if (used === 0) throw new RangeError('no observed points inside the distilled range');
    rmsByPlates[plates - minPlates] = Math.sqrt(sum / used);
    if (rmsByPlates[plates - minPlates]! < rmsByPlates[best - minPlates]!) best = plates;
  }
  let hetpM: number | null = null;
  if (options.packedHeightM !== undefined) {
    if (!(options.packedHeightM > 0)) throw new RangeError('packed height must be > 0 m');
    hetpM = best > 0 ? options.packedHeightM / best : null;
  }
  return { plates: best, rmsK: rmsByPlates[best - minPlates]!, rmsByPlates, minPlates, hetpM };
}

/** Head temperature where the curve first reaches volume v (last value beyond its end). */
function headAtVolume(curve: HeadCurve, v: number): number {
  const volumes = curve.distilledM3;
  const n = volumes.length;
  if (n === 0) return Number.NaN;
  if (!(volumes[n - 1]! >= v)) return curve.headK[n - 1]!;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (volumes[mid]! >= v) hi = mid;
    else lo = mid;
  }
  const v0 = volumes[lo]!;
  const v1 = volumes[hi]!;
  if (!(v1 > v0)) return curve.headK[hi]!;
  const w = Math.min(1, Math.max(0, (v - v0) / (v1 - v0)));
  return curve.headK[lo]! + w * (curve.headK[hi]! - curve.headK[lo]!);
}
