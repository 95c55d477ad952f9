import type { PreparedMixture } from '../vle/prepareMixture.ts';

/** One step of the estimated run: what comes over at the head. */
export interface HeadStep {
  /** Fraction of the charge (by moles) distilled at the end of this step. */
  distilledFraction: number;
  /** Head temperature while this step distils. Units: K */
  headTK: number;
  /** Composition of what reaches the receiver (mole fractions). */
  head: Float64Array;
  /** Moles collected in this step. Units: mol */
  moles: number;
}

/**
 * A batch distillation estimated as a slow, near-total-reflux run: the head composition is
 * found by stepping equilibrium stages up from the pot (pot + plates, each liquid the vapour
 * of the stage below, McCabe-Thiele at total reflux), and each step removes a small portion of
 * that composition from the pot (a Rayleigh-type differential balance). Real runs with a
 * finite reflux separate less sharply; the plan's windows allow for that.
 */
export function simulateTotalReflux(mixture: PreparedMixture, chargeX: readonly number[], chargeMol: number, pPa: number, plates: number, options: { steps?: number; leaveInPot?: number } = {}): HeadStep[] {
  const n = mixture.componentCount;
  const steps = options.steps ?? 200;
  // Stop with a tenth of the charge left: never distil to dryness (common practice).
  const leaveInPot = options.leaveInPot ?? 0.1;
  const stages = Math.max(1, Math.round(plates) + 1);
  const pot = Float64Array.from(chargeX);
  let potMol = chargeMol;
  const liquid = new Float64Array(n);
  const vapour = new Float64Array(n);
  const result: HeadStep[] = [];
  const dMol = (chargeMol * (1 - leaveInPot)) / steps;
  const guesses = new Float64Array(stages);
  for (let s = 0; s < steps; s++) {
    liquid.set(pot);
    let tK = 0;
    for (let stage = 0; stage < stages; stage++) {
      tK = mixture.bubbleTInto(liquid, pPa, vapour, guesses[stage]! > 0 ? guesses[stage] : undefined);
      guesses[stage] = tK;
      let sum = 0;
      for (let i = 0; i < n; i++) sum += vapour[i]!;
      for (let i = 0; i < n; i++) liquid[i] = vapour[i]! / sum;
    }
    const head = Float64Array.from(liquid);
    let newPot = 0;
    for (let i = 0; i < n; i++) {
      pot[i] = Math.max(0, pot[i]! * potMol - head[i]! * dMol);
      newPot += pot[i]!;
    }
    potMol = newPot;
    for (let i = 0; i < n; i++) pot[i] = pot[i]! / newPot;
    result.push({ distilledFraction: ((s + 1) * dMol) / chargeMol, headTK: tK, head, moles: dMol });
  }
  return result;
}
