import { APPARATUS_DEFAULTS } from './apparatusDefaults.ts';
import type { BatchStillRun } from './batchStillRun.ts';
import type { HeatStep } from './batchStillConfig.ts';
import { heatForBoilup } from './heatForBoilup.ts';
import { simulateBatchStill } from './simulateBatchStill.ts';
import type { ComponentData, StageEquilibrium } from './stageEquilibrium.ts';

/** A run of the bench still with the apparatus defaults, heated for a chosen boil-up. */
export interface BenchStillInput {
  equilibrium: StageEquilibrium;
  components: ComponentData;
  /** Units: mol */
  chargeMol: readonly number[];
  /** Units: Pa */
  pressurePa: number;
  /** Units: K */
  roomK: number;
  /** Theoretical stages above the pot. */
  plates: number;
  refluxRatio: number;
  /** Vapour reaching the head once warm, as the liquid it condenses to. Units: mL/min */
  boilupMlPerMin: number;
  /** The liquid the heat is set for (mole fractions); the charge when absent. A mantle set for
   * the heaviest component keeps the vapour coming to the end. */
  heatForX?: readonly number[];
  /** The heat schedule from the heat that gives the boil-up; steady when absent. */
  heat?: (boilupW: number) => HeatStep[];
  /** Units: s */
  durationS: number;
  /** Units: s */
  sampleIntervalS: number;
}

/**
 * The bench still run the demo, the Watch prediction, Prepare's prediction and the benchmark
 * share: heat for the boil-up (heatForBoilup, the default pot and column losses), then the
 * column simulator. Returns the run and that heat (W).
 */
export function simulateBenchStill(input: BenchStillInput): { run: BatchStillRun; heatW: number } {
  const { equilibrium, components, chargeMol, pressurePa, roomK } = input;
  const total = chargeMol.reduce((a, b) => a + b, 0);
  if (!(total > 0)) throw new RangeError('the charge must be more than nothing');
  const heatW = heatForBoilup({
    equilibrium, components, x: input.heatForX ?? chargeMol.map((n) => n / total), pressurePa, roomK,
    boilupM3PerS: (input.boilupMlPerMin * 1e-6) / 60,
    potLossWPerK: APPARATUS_DEFAULTS.lossWPerK,
    columnLossWPerK: APPARATUS_DEFAULTS.wallLossWPerK + APPARATUS_DEFAULTS.headLossWPerK,
  });
  const run = simulateBatchStill({
    equilibrium, components, chargeMol: [...chargeMol], pressurePa, roomK,
    column: { stages: input.plates, refluxRatio: input.refluxRatio },
    heat: input.heat ? input.heat(heatW) : [{ fromS: 0, heatW }],
    durationS: input.durationS, sampleIntervalS: input.sampleIntervalS,
  });
  return { run, heatW };
}
