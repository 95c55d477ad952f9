/**
 * Min/max decimation for drawing a long trace: each of `buckets` equal time slices keeps its
 * lowest and highest reading, in time order, so peaks and dips survive at any zoom. A slice with
 * a missing reading keeps one NaN so the chart still shows the gap.
 * Writes into preallocated outputs (length >= 2 * buckets + 2); returns the count written.
 */
export function downsampleMinMax(
  timeS: ArrayLike<number>,
  headC: ArrayLike<number>,
  buckets: number,
  outTimeS: Float64Array,
  outHeadC: Float64Array,
): number {
  const n = Math.min(timeS.length, headC.length);
  if (!(buckets >= 1)) throw new RangeError('buckets must be >= 1');
  if (outTimeS.length < 2 * buckets + 2 || outHeadC.length < 2 * buckets + 2) throw new RangeError('output arrays too short');
  if (n <= 2 * buckets) {
    for (let i = 0; i < n; i++) {
      outTimeS[i] = timeS[i]!;
      outHeadC[i] = headC[i]!;
    }
    return n;
  }
  const t0 = timeS[0]!;
  const span = timeS[n - 1]! - t0 || 1;
  let out = 0;
  let i = 0;
  for (let b = 0; b < buckets && i < n; b++) {
    const end = t0 + (span * (b + 1)) / buckets;
    let minI = -1;
    let maxI = -1;
    let gapI = -1;
    for (; i < n && (timeS[i]! <= end || b === buckets - 1); i++) {
      const h = headC[i]!;
      if (Number.isNaN(h)) {
        if (gapI < 0) gapI = i;
        continue;
      }
      if (minI < 0 || h < headC[minI]!) minI = i;
      if (maxI < 0 || h > headC[maxI]!) maxI = i;
    }
    const picks = [minI, maxI, gapI].filter((k) => k >= 0).sort((a, c) => a - c);
    let previous = -1;
    for (const k of picks) {
      if (k === previous) continue;
      previous = k;
      outTimeS[out] = timeS[k]!;
      outHeadC[out] = headC[k]!;
      out += 1;
    }
  }
  return out;
}
