/**
 * Exponentially weighted local linear regression on real timestamps: sums of weights, t, t^2,
 * y and t*y, with t measured from the latest reading so the sums never grow large (shifting the
 * origin instead of accumulating absolute times avoids cancellation after hours of readings).
 */
export interface EwRegression {
  tauS: number;
  originS: number;
  w: number;
  t: number;
  tt: number;
  y: number;
  ty: number;
}

export function createEwRegression(tauS: number): EwRegression {
  return { tauS, originS: NaN, w: 0, t: 0, tt: 0, y: 0, ty: 0 };
}

/** Adds reading (`timeS`, `valueC`); a reading is weighted exp(-age / tau). */
export function ewRegressionAdd(r: EwRegression, timeS: number, valueC: number): void {
  if (Number.isNaN(r.originS)) r.originS = timeS;
  const shiftS = timeS - r.originS;
  if (shiftS > 0) {
    const decay = Math.exp(-shiftS / r.tauS);
    r.tt = (r.tt - 2 * shiftS * r.t + shiftS * shiftS * r.w) * decay;
    r.t = (r.t - shiftS * r.w) * decay;
    r.ty = (r.ty - shiftS * r.y) * decay;
    r.y *= decay;
    r.w *= decay;
    r.originS = timeS;
  }
  r.w += 1;
  r.y += valueC;
}

/** Slope at the latest reading, or 0 with too little spread in time. Units: degC/s. */
export function ewRegressionSlope(r: EwRegression): number {
  const det = r.w * r.tt - r.t * r.t;
  // A few points packed within a fraction of a second give no slope worth trusting.
  if (!(det > 1e-9 * r.w * r.w) || r.w < 1.5) return 0;
  return (r.w * r.ty - r.t * r.y) / det;
}

/** Fitted value at the latest reading (the intercept of the local line). Units: degC. */
export function ewRegressionLevel(r: EwRegression): number {
  if (!(r.w > 0)) return NaN;
  const det = r.w * r.tt - r.t * r.t;
  if (!(det > 1e-9 * r.w * r.w) || r.w < 1.5) return r.y / r.w;
  return (r.tt * r.y - r.t * r.ty) / det;
}

/**
 * How many independent readings the fitted level is worth: for white noise its variance is that
 * of a plain mean of this many. Once the fit spans several time constants that is 0.81 x its
 * weight sum (weighted least squares with weights e^(-age/tau): the intercept's variance is
 * (X'WX)^-1 X'W^2X (X'WX)^-1, worked numerically; the test checks it by simulation).
 */
export function ewRegressionEffectiveReadings(r: EwRegression): number {
  return LEVEL_EFFECTIVE_PER_WEIGHT * r.w;
}
const LEVEL_EFFECTIVE_PER_WEIGHT = 0.81;

/**
 * Standard deviations of the fitted level and slope per unit of white reading noise, for
 * readings every `intervalS` once the fit spans several time constants. With weights q^k
 * (q = e^(-interval/tau), k readings back) the estimates' covariance is sigma^2 M^-1 N M^-1
 * (weighted least squares), M and N the weighted and squared-weighted moment matrices of k,
 * in closed form from the geometric sums sum r^k = 1/(1-r), sum k r^k = r/(1-r)^2,
 * sum k^2 r^k = r(1+r)/(1-r)^3 with r = q and q^2. Units: 1 (level), 1/s (slope).
 */
export function ewLevelNoisePerSd(tauS: number, intervalS: number): number {
  fitNoise(tauS, intervalS);
  return Math.sqrt(noise[0]!);
}
export function ewSlopeNoisePerSd(tauS: number, intervalS: number): number {
  fitNoise(tauS, intervalS);
  return Math.sqrt(noise[1]!) / intervalS;
}

/** Level and slope (per reading interval) variances into `noise`: no allocation per reading. */
const noise = new Float64Array(2);
function fitNoise(tauS: number, intervalS: number): void {
  const q = Math.exp(-intervalS / tauS), p = q * q;
  const s0 = 1 / (1 - q), s1 = q * s0 * s0, s2 = q * (1 + q) * s0 * s0 * s0;
  const u0 = 1 / (1 - p), u1 = p * u0 * u0, u2 = p * (1 + p) * u0 * u0 * u0;
  // The line y = a + b x with x = -k (the latest reading at x = 0): M = [[s0, -s1], [-s1, s2]],
  // N = [[u0, -u1], [-u1, u2]], M^-1 = [[s2, s1], [s1, s0]] / det.
  const det2 = (s0 * s2 - s1 * s1) ** 2;
  noise[0] = (s2 * s2 * u0 - 2 * s1 * s2 * u1 + s1 * s1 * u2) / det2;
  noise[1] = (s1 * s1 * u0 - 2 * s0 * s1 * u1 + s0 * s0 * u2) / det2;
}

/** Weighted mean, with no trend correction (lags a ramp, ignores nothing). Units: degC. */
export function ewRegressionMean(r: EwRegression): number {
  return r.w > 0 ? r.y / r.w : NaN;
}

/** Forgets all readings but (`timeS`, `valueC`). */
export function restartEwRegression(r: EwRegression, timeS: number, valueC: number): void {
  r.originS = timeS;
  r.w = 1;
  r.t = 0;
  r.tt = 0;
  r.y = valueC;
  r.ty = 0;
}
