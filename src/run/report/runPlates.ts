import { fenskeMinimumStages, meanRelativeVolatility, prepareMixture, relativeVolatility, type Compound, type ThermoModel } from '../../science/index.ts';

export interface PlateFraction {
  receiver: number;
  /** Mole fractions in charge order, or null when unknown. */
  mole: readonly number[] | null;
  /** Amount of the fraction. Units: mol */
  moles: number | null;
}

export interface PlateEstimate {
  /** Equilibrium stages including the pot (Fenske). */
  stages: number;
  /** Theoretical plates of the column: stages less the pot. */
  plates: number;
  /** Packed height over plates, or null without a height. Units: m */
  hetpM: number | null;
  receiver: number;
  /** Light-component mole fraction in the cut and in the pot while it came over. */
  distillateLight: number;
  potLight: number;
  alpha: number;
}

export const plateMethod =
  'Fenske at total reflux: N = ln[(xD/(1−xD))·((1−xW)/xW)] / ln α, from the first cut of the more volatile component (xD, its analysis) ' +
  'and the pot while it came over (xW, the charge less the fractions before it and half of this one); α is the geometric mean of ' +
  'Raoult’s-law relative volatilities at xD and xW. The column’s plates are N less the pot. A column run at finite reflux has more ' +
  'plates than this, so it is a lower bound.';

/**
 * The column's theoretical plates from this run's fractions (method: `plateMethod`).
 * Returns a reason instead when the run does not allow an estimate.
 */
export function estimateRunPlates(
  compounds: readonly Compound[],
  chargeMoles: readonly number[],
  fractions: readonly PlateFraction[],
  pressurePa: number,
  packedHeightM: number | null,
  model: ThermoModel = 'ideal',
): PlateEstimate | { reason: string } {
  if (compounds.length !== 2) return { reason: 'plates are estimated for a binary charge only' };
  if (!(pressurePa > 0)) throw new RangeError(`pressure must be > 0 Pa (got ${pressurePa})`);
  if (packedHeightM !== null && !(packedHeightM > 0)) throw new RangeError(`packed height must be > 0 m (got ${packedHeightM})`);
  const light = compounds[0]!.normalBoilingPointK <= compounds[1]!.normalBoilingPointK ? 0 : 1;
  const pot = [...chargeMoles];
  for (const f of fractions) {
    if (f.mole === null || f.moles === null) return { reason: `receiver ${f.receiver} needs an amount and an analysis before the plates can be estimated` };
    const xD = f.mole[light]!;
    if (xD <= 0.5) {
      for (let i = 0; i < 2; i++) pot[i] = pot[i]! - f.moles * f.mole[i]!;
      continue;
    }
    const mid = pot.map((m, i) => m - 0.5 * f.moles! * f.mole![i]!);
    if (!(mid[0]! > 0 && mid[1]! > 0)) return { reason: 'the fractions add up to more than the charge: check the amounts' };
    const xW = mid[light]! / (mid[0]! + mid[1]!);
    if (!(xD < 0.9995)) return { reason: `receiver ${f.receiver} analyses as pure: its purity cannot bound the plates` };
    if (!(xD > xW)) return { reason: `receiver ${f.receiver} is no richer in the more volatile component than the pot: no separation to measure` };
    const mixture = prepareMixture(compounds, model);
    const at = (xLight: number) => {
      const x = new Float64Array(2);
      x[light] = xLight;
      x[1 - light] = 1 - xLight;
      return relativeVolatility(mixture, x, pressurePa, light, 1 - light);
    };
    const alpha = meanRelativeVolatility(at(xD), at(xW));
    const stages = fenskeMinimumStages(alpha, xD, xW);
    const plates = stages - 1;
    return { stages, plates, hetpM: packedHeightM !== null && plates > 0 ? packedHeightM / plates : null, receiver: f.receiver, distillateLight: xD, potLight: xW, alpha };
  }
  return { reason: 'no fraction is mostly the more volatile component' };
}
