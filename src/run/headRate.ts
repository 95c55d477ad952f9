/**
 * Rate of change of the head temperature over a trailing window, by least squares on the real
 * timestamps (readings may be irregular). Invalid (NaN) readings are skipped.
 * Returns degC per minute, or NaN with fewer than two valid readings in the window.
 */
export function headRateCPerMin(timeS: ArrayLike<number>, headC: ArrayLike<number>, windowS: number): number {
  if (!(windowS > 0)) throw new RangeError('window must be > 0 s');
  const n = Math.min(timeS.length, headC.length);
  if (n === 0) return Number.NaN;
  const end = timeS[n - 1]!;
  let count = 0;
  let meanT = 0;
  let meanH = 0;
  // Two passes over the window: means first, then centred sums (avoids cancellation at large t).
  let i = n - 1;
  for (; i >= 0 && end - timeS[i]! <= windowS; i--) {
    const h = headC[i]!;
    if (Number.isNaN(h)) continue;
    count += 1;
    meanT += timeS[i]!;
    meanH += h;
  }
  if (count < 2) return Number.NaN;
  meanT /= count;
  meanH /= count;
  let sxy = 0;
  let sxx = 0;
  for (let j = i + 1; j < n; j++) {
    const h = headC[j]!;
    if (Number.isNaN(h)) continue;
    const dt = timeS[j]! - meanT;
    sxy += dt * (h - meanH);
    sxx += dt * dt;
  }
  return sxx > 0 ? (sxy / sxx) * 60 : Number.NaN;
}
