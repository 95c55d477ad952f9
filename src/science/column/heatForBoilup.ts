import type { StageEquilibrium } from './stageEquilibrium.ts';
import type { ComponentData } from './stageEquilibrium.ts';

export interface BoilupHeatInput {
  readonly equilibrium: StageEquilibrium;
  readonly components: ComponentData;
  /** Charge mole fractions. */
  readonly x: ArrayLike<number>;
  readonly pressurePa: number;
  /** Units: K. */
  readonly roomK: number;
  /** Boil-up wanted: vapour reaching the still head (reflux plus distillate), as the liquid
   * volume it condenses to: what the chemist sees dripping from the condenser. Units: m^3/s. */
  readonly boilupM3PerS: number;
  /** Pot's loss to the room. Units: W/K. */
  readonly potLossWPerK: number;
  /** Column wall and still head's loss to the room together. Units: W/K. */
  readonly columnLossWPerK: number;
}

/**
 * The heat into the pot that brings `boilupM3PerS` of vapour to the still head once the column
 * is warm, at the start of the run: the vapour's enthalpy of vaporisation, plus the pot's loss
 * to the room at the charge's bubble point, plus the column's and head's losses, which a warm
 * wall makes good by condensing vapour (taken at the bubble point of the charge's first vapour,
 * a stage up). The simulator takes heat, not boil-up, so this is how a bench figure ("about
 * 1 mL/min off the condenser") becomes its input. As the pot's bubble point rises the losses
 * grow and the boil-up falls a little at the same heat, as on a mantle left at one setting.
 * Units: W.
 */
export function heatForBoilup(input: BoilupHeatInput): number {
  const c = input.equilibrium.componentCount;
  if (input.x.length !== c) throw new RangeError(`composition needs one entry per component (${c})`);
  if (!(input.boilupM3PerS >= 0)) throw new RangeError('boil-up must be >= 0');
  if (!(input.roomK > 0)) throw new RangeError('room temperature must be > 0 K');
  if (!(input.potLossWPerK >= 0)) throw new RangeError('pot heat loss must be >= 0 W/K');
  if (!(input.columnLossWPerK >= 0)) throw new RangeError('column heat loss must be >= 0 W/K');
  const x = Float64Array.from(input.x);
  const y = new Float64Array(c);
  const bubbleK = input.equilibrium.bubbleTInto(x, input.pressurePa, y, 0);
  // Vapour of composition y: its liquid volume and heat per mole, ideal mixing.
  let volumePerMol = 0;
  let hVap = 0;
  for (let i = 0; i < c; i++) {
    volumePerMol += y[i]! * input.components.molarVolumeM3PerMol[i]!;
    hVap += y[i]! * input.components.hVapJPerMol[i]!;
  }
  const topK = input.equilibrium.bubbleTInto(y, input.pressurePa, new Float64Array(c), bubbleK);
  const boilupMolPerS = input.boilupM3PerS / volumePerMol;
  return boilupMolPerS * hVap + input.potLossWPerK * Math.max(0, bubbleK - input.roomK) + input.columnLossWPerK * Math.max(0, topK - input.roomK);
}
