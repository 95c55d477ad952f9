import type { MixingRule } from '../fractionEntry.ts';

/**
 * Change of n_D with temperature for organic liquids (common practice: about -0.00045 per degC;
 * water is nearer -0.0001). Units: 1/degC
 */
export const refractiveIndexPerC = -0.00045;

/** Refractive index read at `atC` brought to 20 degC with the common-practice coefficient. */
export function refractiveIndexAt20(n: number, atC: number): number {
  if (!(n >= 1 && n < 3)) throw new RangeError(`refractive index must be between 1 and 3 (got ${n})`);
  if (!(atC > -50 && atC < 100)) throw new RangeError(`the reading temperature must be between -50 and 100 degC (got ${atC})`);
  return n - refractiveIndexPerC * (atC - 20);
}

/** Lorentz-Lorenz specific refraction term (n^2-1)/(n^2+2). */
function refraction(n: number): number {
  const n2 = n * n;
  return (n2 - 1) / (n2 + 2);
}

export interface RefractiveIndexComposition {
  /** The first component's share, clamped to [0, 1]: by volume (ideal-volume rules) or by mass (measured density). */
  fractionFirst: number;
  /** True when n lay outside the pure components' values (by more than 0.0005). */
  isOutsideRange: boolean;
}

/**
 * Volume fraction of the first component of a binary from its refractive index at 20 degC and
 * those of the pure components at 20 degC, by the given mixing rule (ideal volumes assumed:
 * near-ideal organic mixtures only; aqueous alcohols need a calibration curve).
 */
export function volumeFractionFromRefractiveIndex(n20: number, nFirst: number, nSecond: number, rule: MixingRule): RefractiveIndexComposition {
  for (const [label, v] of [['mixture', n20], ['first component', nFirst], ['second component', nSecond]] as const) {
    if (!(v >= 1 && v < 3)) throw new RangeError(`refractive index of the ${label} must be between 1 and 3 (got ${v})`);
  }
  if (!(Math.abs(nFirst - nSecond) >= 0.002)) {
    throw new RangeError(`the pure refractive indices (${nFirst}, ${nSecond}) are too close to tell the components apart`);
  }
  const phi = rule === 'lorentz-lorenz'
    ? (refraction(n20) - refraction(nSecond)) / (refraction(nFirst) - refraction(nSecond))
    : (n20 - nSecond) / (nFirst - nSecond);
  const lo = Math.min(nFirst, nSecond) - 0.0005;
  const hi = Math.max(nFirst, nSecond) + 0.0005;
  return { fractionFirst: Math.min(1, Math.max(0, phi)), isOutsideRange: n20 < lo || n20 > hi };
}

export interface PureLiquid {
  n: number;
  /** Near 20 degC. Units: kg/m^3 */
  densityKgPerM3: number;
}

/**
 * Mass fraction of the first component of a binary by Lorentz-Lorenz with the mixture's measured
 * density: specific refractions r = (n^2-1)/((n^2+2) rho) add by mass fraction, which holds for
 * non-ideal volumes too (the volume change is in the measured density). Clamped to [0, 1].
 */
export function massFractionFromLorentzLorenz(n20: number, densityKgPerM3: number, first: PureLiquid, second: PureLiquid): RefractiveIndexComposition {
  for (const [label, v] of [['mixture', n20], ['first component', first.n], ['second component', second.n]] as const) {
    if (!(v >= 1 && v < 3)) throw new RangeError(`refractive index of the ${label} must be between 1 and 3 (got ${v})`);
  }
  for (const [label, v] of [['mixture', densityKgPerM3], ['first component', first.densityKgPerM3], ['second component', second.densityKgPerM3]] as const) {
    if (!(v > 100 && v < 5000)) throw new RangeError(`density of the ${label} must be between 100 and 5000 kg/m^3 (got ${v})`);
  }
  const rFirst = refraction(first.n) / first.densityKgPerM3;
  const rSecond = refraction(second.n) / second.densityKgPerM3;
  if (!(Math.abs(rFirst - rSecond) > 1e-6)) throw new RangeError('the pure components have the same specific refraction: the refractive index cannot tell them apart');
  const w = (refraction(n20) / densityKgPerM3 - rSecond) / (rFirst - rSecond);
  return { fractionFirst: Math.min(1, Math.max(0, w)), isOutsideRange: w < -0.01 || w > 1.01 };
}
