import type { Compound } from '../compounds/compound.ts';
import { prepareMixture } from './prepareMixture.ts';
import type { ThermoModel } from './thermoModel.ts';

/** One equilibrium result for display or the command line. */
export interface EquilibriumResult {
  /** Units: K */
  tK: number;
  /** Units: Pa */
  pPa: number;
  /** Liquid mole fractions. */
  x: number[];
  /** Vapour mole fractions. */
  y: number[];
  model: ThermoModel;
  /** True when a vapour pressure is a user estimate: every figure here then is one too. */
  isEstimated: boolean;
  /** True when a component is used outside its correlation's range (Clausius-Clapeyron). */
  isExtrapolated: boolean;
}

function isOutside(compounds: readonly Compound[], tK: number): boolean {
  return compounds.some((c) => tK < c.vapourPressure.tMinK || tK > c.vapourPressure.tMaxK);
}

function run(compounds: readonly Compound[], given: readonly number[], model: ThermoModel, solve: (m: ReturnType<typeof prepareMixture>, v: Float64Array, out: Float64Array) => [number, number], givenIsLiquid: boolean): EquilibriumResult {
  if (given.length !== compounds.length) throw new RangeError(`${compounds.length} compounds but ${given.length} fractions`);
  const mixture = prepareMixture(compounds, model);
  const v = Float64Array.from(given);
  const out = new Float64Array(compounds.length);
  const [tK, pPa] = solve(mixture, v, out);
  const other = Array.from(out);
  return { tK, pPa, x: givenIsLiquid ? [...given] : other, y: givenIsLiquid ? other : [...given], model, isEstimated: mixture.isEstimated, isExtrapolated: isOutside(compounds, tK) };
}

/** Bubble temperature of a liquid at a pressure. Units: Pa in, K out. */
export function bubbleT(compounds: readonly Compound[], x: readonly number[], pPa: number, model: ThermoModel = 'ideal'): EquilibriumResult {
  return run(compounds, x, model, (m, v, out) => [m.bubbleTInto(v, pPa, out), pPa], true);
}

/** Dew temperature of a vapour at a pressure. */
export function dewT(compounds: readonly Compound[], y: readonly number[], pPa: number, model: ThermoModel = 'ideal'): EquilibriumResult {
  return run(compounds, y, model, (m, v, out) => [m.dewTInto(v, pPa, out), pPa], false);
}

/** Bubble pressure of a liquid at a temperature. */
export function bubbleP(compounds: readonly Compound[], x: readonly number[], tK: number, model: ThermoModel = 'ideal'): EquilibriumResult {
  return run(compounds, x, model, (m, v, out) => [tK, m.bubblePInto(v, tK, out)], true);
}

/** Dew pressure of a vapour at a temperature. */
export function dewP(compounds: readonly Compound[], y: readonly number[], tK: number, model: ThermoModel = 'ideal'): EquilibriumResult {
  return run(compounds, y, model, (m, v, out) => [tK, m.dewPInto(v, tK, out)], false);
}
