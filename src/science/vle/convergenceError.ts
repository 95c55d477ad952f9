/** A phase-equilibrium solve that failed; the message names the input that caused it. */
export class ConvergenceError extends RangeError {
  override name = 'ConvergenceError';
}
