/**
 * Pixel ranges to leave blank where the head column holds NaN (no valid reading, a lost sensor).
 * uPlot breaks a line only at null, which a Float64Array cannot hold: at NaN the canvas drops
 * the point and the line runs straight across. Each range spans from the last valid reading
 * before a NaN run to the first valid one after it, as uPlot's own null gaps do.
 */
export function nanGaps(timeS: ArrayLike<number>, headC: ArrayLike<number>, from: number, to: number, pixelOf: (timeS: number) => number): [number, number][] {
  const gaps: [number, number][] = [];
  let i = Math.max(0, from);
  const last = Math.min(to, headC.length - 1);
  while (i <= last) {
    if (!Number.isNaN(headC[i]!)) {
      i++;
      continue;
    }
    const start = i;
    while (i <= last && Number.isNaN(headC[i]!)) i++;
    const before = start > 0 ? start - 1 : start;
    const after = i < headC.length ? i : i - 1;
    gaps.push([pixelOf(timeS[before]!), pixelOf(timeS[after]!)]);
  }
  return gaps;
}
