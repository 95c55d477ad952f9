export { createDemoStill, demoMixture } from './demoStill.ts';
export type { DemoStill, DemoStillOptions, DemoStillSnapshot, DemoStillState, DemoPhase } from './demoStill.ts';
export { demoCutPlan } from './demoPlan.ts';
