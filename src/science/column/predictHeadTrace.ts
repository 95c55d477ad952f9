import type { Compound } from '../compounds/index.ts';
import type { ThermoModel } from '../vle/index.ts';
import { columnEquilibrium } from './columnEquilibrium.ts';
import { componentDataFor } from './componentDataFor.ts';
import { simulateBenchStill } from './simulateBenchStill.ts';

export interface HeadPredictionInput {
  compounds: readonly Compound[];
  /** Units: mol */
  chargeMol: readonly number[];
  /** Units: Pa */
  pressurePa: number;
  /** Theoretical stages above the pot (rounded to whole stages). */
  plates: number;
  model: ThermoModel;
  /** Distillate rate at the head once the column is warm. Units: mL/min */
  boilupMlPerMin?: number;
  refluxRatio?: number;
  /** Units: K */
  roomK?: number;
  /** Units: s */
  durationS?: number;
  /** Units: s */
  sampleIntervalS?: number;
}

/**
 * What the head thermometer should show through the run, by the column simulator with the bench
 * apparatus defaults: drawn faintly behind the live trace. Ends when the pot runs dry.
 */
export function predictHeadTrace(input: HeadPredictionInput): { time_s: number[]; head_c: number[] } {
  const { compounds, chargeMol, pressurePa } = input;
  const roomK = input.roomK ?? 294.15;
  const { run } = simulateBenchStill({
    equilibrium: columnEquilibrium(compounds, input.model), components: componentDataFor(compounds), chargeMol, pressurePa, roomK,
    plates: Math.max(0, Math.round(input.plates)), refluxRatio: input.refluxRatio ?? 2, boilupMlPerMin: input.boilupMlPerMin ?? 4,
    durationS: input.durationS ?? 8 * 3600, sampleIntervalS: input.sampleIntervalS ?? 30,
  });
  const dryS = run.annotations.potDryS ?? Infinity;
  const time_s: number[] = [];
  const head_c: number[] = [];
  run.trace.timeS.forEach((t, i) => {
    if (t > dryS) return;
    time_s.push(t);
    head_c.push(run.trace.headK[i]! - 273.15);
  });
  return { time_s, head_c };
}
