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
  /** Boil-up wanted: vapour leaving the pot, as the liquid volume it condenses to. Units: m^3/s. */
  readonly boilupM3PerS: number;
  /** Pot's loss to the room. Units: W/K. */
  readonly potLossWPerK: number;
}

/**
 * The heat into the pot that boils off `boilupM3PerS` from the charge at its starting bubble
 * point: the vapour's enthalpy of vaporisation plus what the pot loses to the room there.
 * The simulator takes heat, not boil-up, so this is how a bench figure ("about 1 mL/min")
 * becomes its input. As the pot's bubble point rises the loss grows and the boil-up falls a
 * little at the same heat, as it does on a mantle left at one setting. Units: W.
 */
export function heatForBoilup(input: BoilupHeatInput): number {
  const c = input.equilibrium.componentCount;
  if (input.x.length !== c) throw new RangeError(`composition needs one entry per component (${c})`);
  if (!(input.boilupM3PerS >= 0)) throw new RangeError('boil-up must be >= 0');
  if (!(input.roomK > 0)) throw new RangeError('room temperature must be > 0 K');
  if (!(input.potLossWPerK >= 0)) throw new RangeError('pot heat loss must be >= 0 W/K');
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
  const boilupMolPerS = input.boilupM3PerS / volumePerMol;
  return boilupMolPerS * hVap + input.potLossWPerK * Math.max(0, bubbleK - input.roomK);
}
