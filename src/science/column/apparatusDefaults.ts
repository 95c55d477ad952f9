/**
 * Bench-scale figures used when a column or pot description leaves them out. They are order-of-
 * magnitude estimates for a 100 mL flask, a 30 cm, 2 cm bore column and a glass still head, not
 * measurements; a lab that knows its apparatus passes its own.
 */
export const APPARATUS_DEFAULTS = {
  // ~0.15 mL per theoretical stage: packed columns hold a few mL over ~10 stages (common practice).
  stageHoldupM3: 0.15e-6,
  // Drip tip, condenser film and head: a few tenths of a mL (common practice).
  headHoldupM3: 0.2e-6,
  // ~70 g of glass and packing at 0.84 J/(g K) for glass (from memory).
  wallHeatCapacityJPerK: 60,
  // Outer area ~0.02 m^2 at ~5 W/(m^2 K) free convection, partly lagged (from memory).
  wallLossWPerK: 0.1,
  // ~30 g of glass (from memory, 0.84 J/(g K)).
  headHeatCapacityJPerK: 25,
  headLossWPerK: 0.04,
  // Film condensation coefficients are thousands of W/(m^2 K) (from memory); a few W/K over a
  // section's inner area makes a cold wall take all the vapour that reaches it.
  condensingWPerK: 3,
  // 100 mL round-bottom flask (~50 g glass) and the face of the mantle (from memory).
  flaskHeatCapacityJPerK: 60,
  lossWPerK: 0.25,
  // Never distil to dryness: stop with about half a mL left (common practice).
  residualM3: 0.5e-6,
  // Thin junction in condensing vapour: well under a second; in still air tens of seconds
  // (manufacturer figures quoted in the project's primer).
  vapourTimeS: 1,
  airTimeS: 20,
  // About 0.01 mL/min of vapour: a first trickle reaching the bulb.
  vapourSeenMolPerS: 1e-6,
} as const;

// Pot superheat relaxation: the pot boils off any heat above its bubble point within this time.
// Small against every other time in the run, large against nothing the integrator minds.
export const POT_BOILING_TIME_S = 0.25;
