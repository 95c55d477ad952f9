import type { Advice, CutPlan } from '../science/index.ts';

/** One receiver's head-temperature window as the live run uses it. Units: degC */
export interface RunWindow {
  receiver: number;
  fromC: number;
  toC: number;
  /** The compound of a main cut, or null for an intermediate cut. */
  compound: string | null;
  /** Expected volume, or null when a density is unknown. Units: mL */
  volumeMl: number | null;
}

/** The plan kept in the run record: receiver windows, the planner's advice, and its basis. */
export interface RunPlan {
  windows: RunWindow[];
  advice: Advice[];
  pressurePa: number;
  plates: number;
  /** Some result rests on an estimated property (a user compound's vapour pressure). */
  isEstimated: boolean;
  /** Where each component's (or azeotrope's) plateau can lie: a steady head outside them all is
   * a mixed fraction, and the run watcher raises no breakthrough off it. Absent in plans made
   * before it existed. Units: degC */
  expectedPlateaus?: Array<{ label: string; fromC: number; toC: number; reachesPurity?: boolean }>;
  /** The column simulator's expected head temperature through the run, drawn faintly on Watch. */
  predicted?: { time_s: number[]; head_c: number[] };
}

/** Converts the science core's cut plan to the run's plan (degC, mL) at the edge. */
export function toRunPlan(plan: CutPlan, pressurePa: number, plates: number): RunPlan {
  return {
    windows: plan.fractions.map((f) => ({
      receiver: f.receiver,
      fromC: f.fromTK - 273.15,
      toC: f.toTK - 273.15,
      compound: f.compound,
      volumeMl: Number.isFinite(f.volumeM3) ? f.volumeM3 * 1e6 : null,
    })),
    advice: plan.advice,
    pressurePa,
    plates,
    isEstimated: plan.isEstimated,
    expectedPlateaus: plan.expectedPlateaus.map((p) => ({ label: p.label, fromC: p.fromTK - 273.15, toC: p.toTK - 273.15, reachesPurity: p.reachesPurity })),
  };
}
