export { createDemoStill, demoMixture } from './demoStill.ts';
export type { DemoStill, DemoStillOptions, DemoStillState, DemoPhase } from './demoStill.ts';
