/**
 * Fenske equation: minimum number of equilibrium stages (at total reflux) to take a binary
 * from bottoms mole fraction xB to distillate mole fraction xD of the light component, at a
 * constant relative volatility alpha (Fenske, Ind. Eng. Chem. 24 (1932) 482).
 * N_min = ln[(xD/(1-xD)) ((1-xB)/xB)] / ln(alpha). The count includes the pot (reboiler).
 */
export function fenskeMinimumStages(alpha: number, xD: number, xB: number): number {
  if (!(alpha > 1) || !Number.isFinite(alpha)) throw new RangeError(`relative volatility must be > 1 (got ${alpha}); at 1 no number of plates separates`);
  if (!(xD > 0 && xD < 1)) throw new RangeError(`distillate mole fraction must be between 0 and 1 (got ${xD})`);
  if (!(xB > 0 && xB < 1)) throw new RangeError(`bottoms mole fraction must be between 0 and 1 (got ${xB})`);
  if (!(xD > xB)) throw new RangeError('the distillate must be richer in the light component than the bottoms');
  return Math.log((xD / (1 - xD)) * ((1 - xB) / xB)) / Math.log(alpha);
}

/** Geometric mean of relative volatilities at the top and bottom, as the Fenske equation uses. */
export function meanRelativeVolatility(alphaTop: number, alphaBottom: number): number {
  if (!(alphaTop > 0 && alphaBottom > 0)) throw new RangeError('relative volatilities must be > 0');
  return Math.sqrt(alphaTop * alphaBottom);
}
