// A generic stiff integrator: it knows states, derivatives and events, never chemistry.
export type { OdeSystem, OdeEvents } from './odeSystem.ts';
export { luFactorInPlace, luSolveInPlace } from './denseLu.ts';
export { StiffIntegrator, STEP_TAKEN, REACHED_STOP, EVENT_FOUND } from './stiffIntegrator.ts';
export type { StiffIntegratorOptions, AdvanceOutcome } from './stiffIntegrator.ts';
