/**
 * Fenske's equation (Fenske, Ind. Eng. Chem. 24 (1932) 482): the number of equilibrium stages,
 * counting the pot, that gives the separation (light/heavy)_distillate over (light/heavy)_pot at
 * total reflux with constant relative volatility alpha (light over heavy).
 * Mole fractions of the two key components; any others may make up the rest.
 */
export function fenskeStages(
  distillateLight: number,
  distillateHeavy: number,
  potLight: number,
  potHeavy: number,
  alpha: number,
): number {
  for (const x of [distillateLight, distillateHeavy, potLight, potHeavy]) {
    if (!(x > 0 && x < 1)) throw new RangeError('key mole fractions must lie strictly between 0 and 1');
  }
  if (!(alpha > 1) || !Number.isFinite(alpha)) throw new RangeError('relative volatility must be > 1');
  const separation = (distillateLight / distillateHeavy) / (potLight / potHeavy);
  if (!(separation > 1)) throw new RangeError('the distillate must be richer in the light key than the pot');
  return Math.log(separation) / Math.log(alpha);
}

export interface PlateEstimate {
  /** Equilibrium stages including the pot. */
  readonly theoreticalStages: number;
  /** Theoretical plates of the column itself: stages less the pot. */
  readonly columnPlates: number;
  /** Height equivalent to a theoretical plate, when a packed height was given. Units: m. */
  readonly hetpM: number | null;
}

/**
 * Plates from the compositions of a first fraction and of the pot at that time (refractive
 * index or GC), through Fenske. Away from total reflux the column separates less than its
 * plates could, so this is a lower bound on the plates (common practice).
 */
export function estimatePlatesFromFractions(input: {
  distillateLight: number;
  distillateHeavy: number;
  potLight: number;
  potHeavy: number;
  alpha: number;
  packedHeightM?: number;
}): PlateEstimate {
  const stages = fenskeStages(input.distillateLight, input.distillateHeavy, input.potLight, input.potHeavy, input.alpha);
  const plates = stages - 1;
  let hetpM: number | null = null;
  if (input.packedHeightM !== undefined) {
    if (!(input.packedHeightM > 0)) throw new RangeError('packed height must be > 0 m');
    hetpM = plates > 0 ? input.packedHeightM / plates : null;
  }
  return { theoreticalStages: stages, columnPlates: plates, hetpM };
}
