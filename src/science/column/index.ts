// The batch column simulator: equilibrium interface, model, driver, cut plans, learning.
export type { StageEquilibrium, ComponentData } from './stageEquilibrium.ts';
export { constantVolatilityEquilibrium } from './constantVolatilityEquilibrium.ts';
export type { ConstantVolatilityOptions } from './constantVolatilityEquilibrium.ts';
export { raoultEquilibrium } from './raoultEquilibrium.ts';
export type { SaturationPressure } from './raoultEquilibrium.ts';
export type { BatchStillConfig, ColumnSpec, PotSpec, HeadSpec, HeatStep } from './batchStillConfig.ts';
export type { CutPlan, HeadTemperatureWindow, TimeCut, VolumeCut } from './cutPlan.ts';
export type {
  BatchStillRun,
  BatchStillTrace,
  BatchStillAnnotations,
  ReceiverContent,
  Plateau,
  Interval,
} from './batchStillRun.ts';
export { simulateBatchStill } from './simulateBatchStill.ts';
export { findPlateaus, type ConstantBoilingVapour } from './findPlateaus.ts';
export { APPARATUS_DEFAULTS } from './apparatusDefaults.ts';
export { fenskeStages, estimatePlatesFromFractions } from './fenskeStages.ts';
export type { PlateEstimate } from './fenskeStages.ts';
export { fitPlatesToHeadCurve } from './fitPlatesToHeadCurve.ts';
export type { HeadCurve, PlateFit } from './fitPlatesToHeadCurve.ts';
export { columnEquilibrium, preferredColumnEquilibrium } from './columnEquilibrium.ts';
export { componentDataFor } from './componentDataFor.ts';
export type { SimulatorComponentData } from './componentDataFor.ts';
export { heatForBoilup } from './heatForBoilup.ts';
export type { BoilupHeatInput } from './heatForBoilup.ts';
export { predictHeadTrace } from './predictHeadTrace.ts';
export { simulateBenchStill } from './simulateBenchStill.ts';
export type { BenchStillInput } from './simulateBenchStill.ts';
export type { HeadPredictionInput } from './predictHeadTrace.ts';
