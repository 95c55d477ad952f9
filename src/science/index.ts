// The science core's public face: units, lab pressure, compounds, phase equilibrium, planning.
export * from './units/index.ts';
export * from './pressure/index.ts';
export * from './compounds/index.ts';
export * from './vle/index.ts';
export * from './plan/index.ts';
export * from './solver/index.ts';
// The column simulator's own cut plan (what receivers collect) is not the planner's CutPlan.
export {
  constantVolatilityEquilibrium, raoultEquilibrium, simulateBatchStill, findPlateaus, APPARATUS_DEFAULTS,
  fenskeStages, estimatePlatesFromFractions, fitPlatesToHeadCurve, columnEquilibrium, preferredColumnEquilibrium, componentDataFor, heatForBoilup, predictHeadTrace,
  simulateBenchStill,
} from './column/index.ts';
export type {
  StageEquilibrium, ComponentData, ConstantVolatilityOptions, SaturationPressure, BatchStillConfig, ColumnSpec,
  PotSpec, HeadSpec, HeatStep, CutPlan as StillCutPlan, HeadTemperatureWindow, TimeCut, VolumeCut, BatchStillRun,
  BatchStillTrace, BatchStillAnnotations, ReceiverContent, Plateau, Interval, PlateEstimate, HeadCurve, PlateFit,
  SimulatorComponentData, BoilupHeatInput, ConstantBoilingVapour, BenchStillInput,
} from './column/index.ts';
