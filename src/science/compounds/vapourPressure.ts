import type { Compound } from './compound.ts';
import type { VapourPressureCorrelation } from './vapourPressureCorrelation.ts';

const LN10 = Math.LN10;
/** Molar gas constant, CODATA 2018 (exact since the 2019 SI). Units: J/(mol K) */
export const gasConstant = 8.314462618;

function lnPInRange(v: VapourPressureCorrelation, tK: number): number {
  switch (v.kind) {
    case 'antoine-log10': return LN10 * (v.a - v.b / (tK + v.c));
    case 'antoine-ln': return v.a - v.b / (tK + v.c);
    case 'dippr101': return v.c1 + v.c2 / tK + v.c3 * Math.log(tK) + v.c4 * Math.pow(tK, v.c5);
    case 'clausius-clapeyron': return Math.log(101325) - (v.hVapJPerMol / gasConstant) * (1 / tK - 1 / v.tbK);
  }
}

/** d ln(P/Pa) / dT inside the range. Units: 1/K */
function dLnPdTInRange(v: VapourPressureCorrelation, tK: number): number {
  switch (v.kind) {
    case 'antoine-log10': return (LN10 * v.b) / ((tK + v.c) * (tK + v.c));
    case 'antoine-ln': return v.b / ((tK + v.c) * (tK + v.c));
    case 'dippr101': return -v.c2 / (tK * tK) + v.c3 / tK + v.c4 * v.c5 * Math.pow(tK, v.c5 - 1);
    case 'clausius-clapeyron': return v.hVapJPerMol / (gasConstant * tK * tK);
  }
}

/**
 * ln(Psat/Pa). Outside the correlation's range it continues along the Clausius-Clapeyron
 * line (ln P linear in 1/T) tangent at the range end, so the curve stays smooth and monotone
 * where a fitted polynomial or Antoine set could turn over.
 */
export function lnPSat(compound: Pick<Compound, 'vapourPressure'>, tK: number): number {
  const v = compound.vapourPressure;
  const end = tK < v.tMinK ? v.tMinK : tK > v.tMaxK ? v.tMaxK : tK;
  if (end === tK) return lnPInRange(v, tK);
  const slope = -end * end * dLnPdTInRange(v, end);
  return lnPInRange(v, end) + slope * (1 / tK - 1 / end);
}

/** d ln(Psat/Pa) / dT, consistent with lnPSat outside the range too. Units: 1/K */
export function dLnPSatdT(compound: Pick<Compound, 'vapourPressure'>, tK: number): number {
  const v = compound.vapourPressure;
  const end = tK < v.tMinK ? v.tMinK : tK > v.tMaxK ? v.tMaxK : tK;
  if (end === tK) return dLnPdTInRange(v, tK);
  return (end * end * dLnPdTInRange(v, end)) / (tK * tK);
}

/** Saturation (vapour) pressure at a temperature. Units: Pa. Fast; no checks (hot path). */
export function pSatPa(compound: Pick<Compound, 'vapourPressure'>, tK: number): number {
  return Math.exp(lnPSat(compound, tK));
}

/** A vapour pressure with the flags a chemist must see. */
export interface VapourPressureResult {
  pPa: number;
  /** Outside the correlation's valid range: extended by Clausius-Clapeyron. */
  isExtrapolated: boolean;
  /** Built on an estimated correlation (a user compound without data). */
  isEstimated: boolean;
}

/** Vapour pressure with range and estimate flags. Units: K in, Pa out. */
export function vapourPressure(compound: Pick<Compound, 'vapourPressure' | 'isEstimated'>, tK: number): VapourPressureResult {
  if (!(tK > 0) || !Number.isFinite(tK)) throw new RangeError(`temperature must be > 0 K (got ${tK})`);
  const v = compound.vapourPressure;
  return { pPa: pSatPa(compound, tK), isExtrapolated: tK < v.tMinK || tK > v.tMaxK, isEstimated: compound.isEstimated };
}

/** A saturation temperature with the flags a chemist must see. */
export interface SaturationTemperature {
  tK: number;
  isExtrapolated: boolean;
  isEstimated: boolean;
}

/**
 * Boiling temperature at a pressure (the inverse of pSatPa). Units: Pa in, K out.
 * Antoine sets invert exactly; DIPPR-101 by safeguarded Newton inside the range.
 */
export function tSatK(compound: Pick<Compound, 'vapourPressure' | 'isEstimated'>, pPa: number): SaturationTemperature {
  if (!(pPa > 0) || !Number.isFinite(pPa)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
  const v = compound.vapourPressure;
  const lnP = Math.log(pPa);
  const lnLow = Number.isFinite(v.tMinK) && v.tMinK > 0 ? lnPInRange(v, v.tMinK) : -Infinity;
  const lnHigh = Number.isFinite(v.tMaxK) ? lnPInRange(v, v.tMaxK) : Infinity;
  const isEstimated = compound.isEstimated;
  if (lnP < lnLow || lnP > lnHigh) {
    const end = lnP < lnLow ? v.tMinK : v.tMaxK;
    const slope = -end * end * dLnPdTInRange(v, end);
    const tK = 1 / (1 / end + (lnP - lnPInRange(v, end)) / slope);
    return { tK, isExtrapolated: true, isEstimated };
  }
  switch (v.kind) {
    case 'antoine-log10': return { tK: v.b / (v.a - lnP / LN10) - v.c, isExtrapolated: false, isEstimated };
    case 'antoine-ln': return { tK: v.b / (v.a - lnP) - v.c, isExtrapolated: false, isEstimated };
    case 'clausius-clapeyron': return { tK: 1 / (1 / v.tbK - ((lnP - Math.log(101325)) * gasConstant) / v.hVapJPerMol), isExtrapolated: false, isEstimated };
    case 'dippr101': return { tK: solveDippr(v, lnP), isExtrapolated: false, isEstimated };
  }
}

function solveDippr(v: VapourPressureCorrelation, lnP: number): number {
  let lo = v.tMinK;
  let hi = v.tMaxK;
  // Start from the straight line in 1/T between the range ends: close for every DIPPR set.
  const a = lnPInRange(v, lo);
  const b = lnPInRange(v, hi);
  let t = 1 / (1 / lo + ((lnP - a) / (b - a)) * (1 / hi - 1 / lo));
  for (let i = 0; i < 60; i++) {
    const f = lnPInRange(v, t) - lnP;
    if (Math.abs(f) < 1e-12) return t;
    if (f > 0) hi = t; else lo = t;
    let next = t - f / dLnPdTInRange(v, t);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) < 1e-10) return next;
    t = next;
  }
  return t;
}

/** Enthalpy of vaporisation from the correlation's slope, -R d lnP / d(1/T). Units: J/mol */
export function clausiusClapeyronEnthalpyJPerMol(compound: Pick<Compound, 'vapourPressure'>, tK: number): number {
  return gasConstant * tK * tK * dLnPSatdT(compound, tK);
}
