/**
 * Exponentially weighted local linear regression on real timestamps: sums of weights, t, t^2,
 * y and t*y, with t measured from the latest reading so the sums never grow large (shifting the
 * origin instead of accumulating absolute times avoids cancellation after hours of readings).
 * Beside them, the squared weights' sums of 1, t and t^2, for the variance of what the fit
 * predicts (ewRegressionPredictionVariance).
 */
export interface EwRegression {
  tauS: number;
  originS: number;
  w: number;
  t: number;
  tt: number;
  y: number;
  ty: number;
  /** Sums of w^2, w^2 t and w^2 t^2. Absent in states saved before they existed. */
  w2?: number;
  t2?: number;
  tt2?: number;
}

export function createEwRegression(tauS: number): EwRegression {
  return { tauS, originS: NaN, w: 0, t: 0, tt: 0, y: 0, ty: 0, w2: 0, t2: 0, tt2: 0 };
}

/** Adds reading (`timeS`, `valueC`); a reading is weighted exp(-age / tau). */
export function ewRegressionAdd(r: EwRegression, timeS: number, valueC: number): void {
  if (Number.isNaN(r.originS)) r.originS = timeS;
  // A fit saved before the squared weights were kept: every weight taken as 1 (w^2 <= w), which
  // overstates its prediction's variance until the old readings have decayed.
  if (r.w2 === undefined || r.t2 === undefined || r.tt2 === undefined) {
    r.w2 = r.w;
    r.t2 = r.t;
    r.tt2 = r.tt;
  }
  const shiftS = timeS - r.originS;
  if (shiftS > 0) {
    const decay = Math.exp(-shiftS / r.tauS);
    r.tt = (r.tt - 2 * shiftS * r.t + shiftS * shiftS * r.w) * decay;
    r.t = (r.t - shiftS * r.w) * decay;
    r.ty = (r.ty - shiftS * r.y) * decay;
    r.y *= decay;
    r.w *= decay;
    const decay2 = decay * decay;
    r.tt2 = (r.tt2 - 2 * shiftS * r.t2 + shiftS * shiftS * r.w2) * decay2;
    r.t2 = (r.t2 - shiftS * r.w2) * decay2;
    r.w2 *= decay2;
    r.originS = timeS;
  }
  r.w += 1;
  r.y += valueC;
  r.w2 += 1;
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

/** Level and slope (per reading interval) variances and their covariance into `noise`: no
 * allocation per reading, and nothing worked again while the time constant and interval stay. */
const noise = new Float64Array(3);
let noiseTauS = Number.NaN, noiseIntervalS = Number.NaN;
function fitNoise(tauS: number, intervalS: number): void {
  if (tauS === noiseTauS && intervalS === noiseIntervalS) return;
  noiseTauS = tauS;
  noiseIntervalS = intervalS;
  const q = Math.exp(-intervalS / tauS), p = q * q;
  const s0 = 1 / (1 - q), s1 = q * s0 * s0, s2 = q * (1 + q) * s0 * s0 * s0;
  const u0 = 1 / (1 - p), u1 = p * u0 * u0, u2 = p * (1 + p) * u0 * u0 * u0;
  // The line y = a + b x with x = -k (the latest reading at x = 0): M = [[s0, -s1], [-s1, s2]],
  // N = [[u0, -u1], [-u1, u2]], M^-1 = [[s2, s1], [s1, s0]] / det.
  const det2 = (s0 * s2 - s1 * s1) ** 2;
  noise[0] = (s2 * s2 * u0 - 2 * s1 * s2 * u1 + s1 * s1 * u2) / det2;
  noise[1] = (s1 * s1 * u0 - 2 * s0 * s1 * u1 + s0 * s0 * u2) / det2;
  noise[2] = (s1 * s2 * u0 - (s1 * s1 + s0 * s2) * u1 + s0 * s1 * u2) / det2;
}

/**
 * Variance of the value the fit predicts `aheadS` after its latest reading, per unit variance of
 * white reading noise: g' M^-1 N M^-1 g with g = (1, aheadS), M and N the weighted and
 * squared-weighted moment matrices (weighted least squares; Draper & Smith, Applied Regression
 * Analysis, from memory). A fit of one reading, or of readings packed too close for a slope,
 * predicts its weighted mean: N's first entry over M's squared. A reading's prediction error then
 * has 1 + this times the noise's variance: a fit just restarted on two readings extrapolates a
 * line through them and misses the third by sqrt(6) noise sigmas (root mean square), where a
 * settled fit of a reading a second with tau 4 s misses by sqrt(1.34).
 */
export function ewRegressionPredictionVariance(r: EwRegression, aheadS: number): number {
  if (!(r.w > 0)) return Infinity;
  const w2 = r.w2 ?? r.w, t2 = r.t2 ?? r.t, tt2 = r.tt2 ?? r.tt;
  const det = r.w * r.tt - r.t * r.t;
  if (!(det > 1e-9 * r.w * r.w) || r.w < 1.5) return w2 / (r.w * r.w);
  // M^-1 g (times det): M = [[w, t], [t, tt]], M^-1 = [[tt, -t], [-t, w]] / det.
  const a = r.tt - r.t * aheadS, b = -r.t + r.w * aheadS;
  return (a * a * w2 + 2 * a * b * t2 + b * b * tt2) / (det * det);
}

/**
 * The same once the fit spans several time constants of readings every `intervalS`, one
 * interval ahead (the closed forms of fitNoise, with the level-slope covariance).
 */
export function ewSteadyPredictionVariance(tauS: number, intervalS: number): number {
  fitNoise(tauS, intervalS);
  return noise[0]! + 2 * noise[2]! + noise[1]!;
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
  r.w2 = 1;
  r.t2 = 0;
  r.tt2 = 0;
}
