/**
 * Mean time to a false alarm of a one-sided CUSUM run in continuous time,
 * S = max(0, integral of (x - k) dt), alarm at S >= h, when x is noise of zero mean whose
 * long-run variance is `diffusionC2S` (degC^2 s: for white noise of sd s read every dt,
 * s^2 dt; for a wander of sd s and correlation time tau, about 2 s^2 tau). This is the exit
 * time of Brownian motion with drift -k reflected at 0: E[T] = D/(2k^2) (e^a - 1 - a),
 * a = 2kh/D (Siegmund, Sequential Analysis, 1985, ch. II; the same form gives his ARL
 * approximation for the discrete CUSUM). Units: s.
 */
export function cusumMeanTimeToFalseAlarmS(referenceC: number, thresholdCS: number, diffusionC2S: number): number {
  const a = (2 * referenceC * thresholdCS) / diffusionC2S;
  return (diffusionC2S / (2 * referenceC * referenceC)) * (Math.expm1(a) - a);
}

/**
 * The CUSUM threshold h (degC s) whose mean time to a false alarm is `targetS`, for
 * reference `referenceC` (degC) and noise long-run variance `diffusionC2S` (degC^2 s).
 * Sets the alarm from the wanted time between false alarms, whatever the reading rate.
 */
export function cusumThresholdForMeanTime(referenceC: number, diffusionC2S: number, targetS: number): number {
  if (!(referenceC > 0)) throw new RangeError('CUSUM reference must be > 0 degC');
  if (!(diffusionC2S > 0)) throw new RangeError('noise variance must be > 0 degC^2 s');
  if (!(targetS > 0)) throw new RangeError('target time must be > 0 s');
  const scale = (2 * referenceC * referenceC) / diffusionC2S;
  // Solve e^a - 1 - a = scale * target for a > 0 by Newton from above (convex, increasing).
  const goal = scale * targetS;
  let a = Math.max(Math.log1p(goal), 1e-6) + 1;
  for (let i = 0; i < 30; i++) {
    const f = Math.expm1(a) - a - goal;
    const step = f / Math.expm1(a);
    a -= step;
    if (Math.abs(step) < 1e-10 * a) break;
  }
  return (a * diffusionC2S) / (2 * referenceC);
}
