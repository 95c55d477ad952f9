export { fenskeMinimumStages, meanRelativeVolatility } from './fenske.ts';
export { estimatePlates, hetpM } from './columnPlates.ts';
export type { Packing } from './columnPlates.ts';
export { simulateTotalReflux } from './simulateTotalReflux.ts';
export type { HeadStep } from './simulateTotalReflux.ts';
export { adviseDistillation } from './advice.ts';
export type { Advice, BoilingAtLab } from './advice.ts';
export { planCuts } from './cutPlan.ts';
export type { CutPlan, CutPlanInput, PlannedFraction } from './cutPlan.ts';
