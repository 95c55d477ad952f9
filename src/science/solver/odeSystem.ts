/**
 * A system of ordinary differential equations dy/dt = f(t, y), as the integrator sees it.
 * The integrator knows nothing else about the model: chemistry stays on the model's side.
 */
export interface OdeSystem {
  /** Number of state variables. */
  readonly size: number;
  /** Writes f(t, y) into dydt. Must not keep or resize the arrays it is given. */
  rhs(t: number, y: Float64Array, dydt: Float64Array): void;
}

/**
 * Event (switching or stop) functions g(t, y). The integrator reports the first point where
 * any g changes sign during a step, so the caller can switch a mode or stop.
 */
export interface OdeEvents {
  /** Number of event functions (fixed for the life of the integrator). */
  readonly eventCount: number;
  /** Writes g_k(t, y) into gOut, one entry per event function. */
  events(t: number, y: Float64Array, gOut: Float64Array): void;
}
