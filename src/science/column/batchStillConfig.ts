import type { ComponentData, StageEquilibrium } from './stageEquilibrium.ts';
import type { CutPlan } from './cutPlan.ts';

/** Heat into the pot from fromS on, until the next step. Units: s, W. */
export interface HeatStep {
  readonly fromS: number;
  readonly heatW: number;
}

/** The column and head. Optional figures default to the bench estimates in apparatusDefaults.ts. */
export interface ColumnSpec {
  /** Theoretical stages above the pot; 0 is simple distillation. */
  readonly stages: number;
  /** Reflux ratio L/D at the head; Infinity for total reflux (no distillate). */
  readonly refluxRatio: number;
  /** Liquid holdup of each stage. Units: m^3. */
  readonly stageHoldupM3?: number;
  /** Liquid holdup of the condenser and head, returned as reflux or sent on. Units: m^3. */
  readonly headHoldupM3?: number;
  /** Heat capacity of the whole column wall and packing. Units: J/K. */
  readonly wallHeatCapacityJPerK?: number;
  /** Heat loss of the whole column to the room; small when lagged. Units: W/K. */
  readonly wallLossWPerK?: number;
  /** Heat capacity of the still head around the thermometer. Units: J/K. */
  readonly headHeatCapacityJPerK?: number;
  /** Heat loss of the still head. Units: W/K. */
  readonly headLossWPerK?: number;
  /** Condensing vapour to wall, per column section and for the head. Units: W/K. */
  readonly condensingWPerK?: number;
}

/** The pot (flask and charge). */
export interface PotSpec {
  /** Heat capacity of the flask and the heater's hot face. Units: J/K. */
  readonly flaskHeatCapacityJPerK?: number;
  /** Heat loss of the pot to the room. Units: W/K. */
  readonly lossWPerK?: number;
  /** Liquid left when boiling stops: the pot counts as dry. Units: m^3. */
  readonly residualM3?: number;
}

/** The head thermometer's truth: what the bulb's surroundings are at, before any sensor lag. */
export interface HeadSpec {
  /** Time for the bulb region to follow condensing vapour. Units: s. */
  readonly vapourTimeS?: number;
  /** Time for it to follow the head glass when no vapour flows. Units: s. */
  readonly airTimeS?: number;
  /** Vapour flow past the bulb that counts as vapour having arrived. Units: mol/s. */
  readonly vapourSeenMolPerS?: number;
}

export interface BatchStillConfig {
  readonly equilibrium: StageEquilibrium;
  readonly components: ComponentData;
  /** Charge, per component. Units: mol. */
  readonly chargeMol: ArrayLike<number>;
  /** Pressure at the head (the lab's station pressure). Units: Pa. */
  readonly pressurePa: number;
  /** Room temperature: start of the pot, column and head, and sink of every loss. Units: K. */
  readonly roomK: number;
  readonly column: ColumnSpec;
  readonly pot?: PotSpec;
  readonly head?: HeadSpec;
  /** Heat schedule, in time order, the first step at 0 s; heatW 0 means heat off. */
  readonly heat: readonly HeatStep[];
  /** Length of the simulated run from heat on. Units: s. */
  readonly durationS: number;
  /** Interval of the output samples. Units: s. */
  readonly sampleIntervalS: number;
  readonly cutPlan?: CutPlan;
  /** Relative tolerance of the integrator; default 1e-6. */
  readonly relTol?: number;
}
