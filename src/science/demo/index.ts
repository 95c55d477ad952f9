export { createDemoStill, demoMixture } from './demoStill.ts';
export { demoChargeFor, type WrittenCharge } from './demoCharge.ts';
export type { DemoCharge, DemoStill, DemoStillOptions, DemoStillSnapshot, DemoStillState, DemoPhase } from './demoStill.ts';
export { demoCutPlan } from './demoPlan.ts';
export { demoMixtureWords } from './demoMixtureWords.ts';
