import type { OdeEvents, OdeSystem } from './odeSystem.ts';
import { luFactorInPlace, luSolveInPlace } from './denseLu.ts';

/** What one call of `advance` did. */
export const STEP_TAKEN = 0;
export const REACHED_STOP = 1;
export const EVENT_FOUND = 2;
export type AdvanceOutcome = typeof STEP_TAKEN | typeof REACHED_STOP | typeof EVENT_FOUND;

export interface StiffIntegratorOptions {
  /** Relative tolerance on each state. */
  relTol: number;
  /** Absolute tolerance, one for all states or one per state. */
  absTol: number | Float64Array;
  /** Largest step. Units: those of t. Keeps event functions from hiding a double crossing. */
  maxStep?: number;
  /** First step; estimated from the derivative when left out. */
  initialStep?: number;
  /** Guard against a model that never lets the step grow. */
  maxStepsPerAdvance?: number;
}

// TR-BDF2: a trapezoidal stage to t + gamma h, then BDF2 over t, t + gamma h, t + h. Both stages
// share the iteration matrix I - d h J, and the method is L-stable, so stiff holdups decay
// without ringing. Bank et al., IEEE Trans. Electron Devices 32 (1985) 1992; Hosea & Shampine,
// Appl. Numer. Math. 20 (1996) 21 (from memory).
const GAMMA = 2 - Math.SQRT2;
const D = GAMMA / 2;
const BDF_Y_GAMMA = 1 / (GAMMA * (2 - GAMMA));
const BDF_Y_N = ((1 - GAMMA) * (1 - GAMMA)) / (GAMMA * (2 - GAMMA));
// Local error constant of TR-BDF2 (Bank et al. 1985, from memory), applied to h^2 times the
// second divided difference of f over the three stage points.
const ERROR_CONSTANT = (-3 * GAMMA * GAMMA + 4 * GAMMA - 2) / (12 * (2 - GAMMA));
const NEWTON_MAX_ITERATIONS = 8;
const NEWTON_TOLERANCE = 0.03;
const EVENT_TIME_TOLERANCE = 1e-9;

/**
 * Adaptive, L-stable implicit integrator (TR-BDF2) with a finite-difference Jacobian reused
 * across steps, simplified Newton, a filtered error estimate, cubic Hermite dense output and
 * sign-change events. All work arrays are allocated once, in the constructor.
 *
 * Linear invariants of the model (for example the total of each chemical component) are kept
 * to rounding: the Newton updates lie in the range of the Jacobian, whose columns the model's
 * conservation makes orthogonal to the invariant.
 */
export class StiffIntegrator {
  readonly size: number;
  /** Current time and state. Read only for callers. */
  t = 0;
  readonly y: Float64Array;
  /** Start of the last step, for interpolation over [tPrevious, t]. */
  tPrevious = 0;
  /** Flags set by the last EVENT_FOUND: 1 where that event function changed sign. */
  readonly eventFlags: Uint8Array;
  /** Counters for benchmarks and tests. */
  stats = { steps: 0, rejected: 0, newtonFailures: 0, jacobians: 0, factorisations: 0, rhsCalls: 0 };

  private readonly system: OdeSystem;
  private readonly eventSystem: OdeEvents | null;
  private readonly relTol: number;
  private readonly absTol: Float64Array;
  private readonly maxStep: number;
  private readonly maxStepsPerAdvance: number;
  private h = 0;
  private pendingRestart = true;
  private isJacobianCurrent = false;
  private isJacobianStale = true;
  private factoredStep = Number.NaN;
  private eta = 1;
  /** True when the last step's interpolant may be extrapolated as a predictor. */
  private hasHistory = false;

  private readonly f: Float64Array;
  private readonly yPrevious: Float64Array;
  private readonly fPrevious: Float64Array;
  // End of the last full step: the interpolant stays valid after an event moves t back.
  private tEnd = 0;
  private readonly yEnd: Float64Array;
  private readonly fEnd: Float64Array;
  private readonly jacobian: Float64Array;
  private readonly iterationMatrix: Float64Array;
  private readonly pivots: Int32Array;
  private readonly zGamma: Float64Array;
  private readonly fGamma: Float64Array;
  private readonly zNew: Float64Array;
  private readonly fNew: Float64Array;
  private readonly stageConstant: Float64Array;
  private readonly delta: Float64Array;
  private readonly work: Float64Array;
  private readonly gPrevious: Float64Array;
  private readonly gNew: Float64Array;
  private readonly gProbe: Float64Array;
  private readonly yProbe: Float64Array;

  constructor(system: OdeSystem, options: StiffIntegratorOptions, events?: OdeEvents) {
    const n = system.size;
    if (!(Number.isInteger(n) && n > 0)) throw new RangeError('system size must be a positive integer');
    if (!(options.relTol > 0 && options.relTol < 1)) throw new RangeError('relTol must be in (0, 1)');
    this.size = n;
    this.system = system;
    this.eventSystem = events ?? null;
    this.relTol = options.relTol;
    this.absTol = new Float64Array(n);
    if (typeof options.absTol === 'number') this.absTol.fill(options.absTol);
    else {
      if (options.absTol.length !== n) throw new RangeError('absTol must have one entry per state');
      this.absTol.set(options.absTol);
    }
    for (let i = 0; i < n; i++) if (!(this.absTol[i]! > 0)) throw new RangeError('absTol must be > 0');
    this.maxStep = options.maxStep ?? Number.POSITIVE_INFINITY;
    if (!(this.maxStep > 0)) throw new RangeError('maxStep must be > 0');
    this.h = options.initialStep ?? 0;
    this.maxStepsPerAdvance = options.maxStepsPerAdvance ?? 100_000;
    this.y = new Float64Array(n);
    this.f = new Float64Array(n);
    this.yPrevious = new Float64Array(n);
    this.fPrevious = new Float64Array(n);
    this.yEnd = new Float64Array(n);
    this.fEnd = new Float64Array(n);
    this.jacobian = new Float64Array(n * n);
    this.iterationMatrix = new Float64Array(n * n);
    this.pivots = new Int32Array(n);
    this.zGamma = new Float64Array(n);
    this.fGamma = new Float64Array(n);
    this.zNew = new Float64Array(n);
    this.fNew = new Float64Array(n);
    this.stageConstant = new Float64Array(n);
    this.delta = new Float64Array(n);
    this.work = new Float64Array(n);
    const eventCount = this.eventSystem?.eventCount ?? 0;
    this.eventFlags = new Uint8Array(eventCount);
    this.gPrevious = new Float64Array(eventCount);
    this.gNew = new Float64Array(eventCount);
    this.gProbe = new Float64Array(eventCount);
    this.yProbe = new Float64Array(n);
  }

  /** Sets the time and state (copied) and forgets the past. */
  reset(t0: number, y0: ArrayLike<number>): void {
    if (y0.length !== this.size) throw new RangeError('initial state has the wrong length');
    this.t = t0;
    this.tPrevious = t0;
    this.y.set(y0);
    this.tEnd = t0;
    this.yEnd.set(y0);
    this.pendingRestart = true;
  }

  /**
   * Call after the model changed its equations (a mode switch, a new heat input): the next
   * step re-evaluates the derivative, the events and the Jacobian at the current point.
   */
  restart(): void {
    this.pendingRestart = true;
  }

  /**
   * Takes one accepted step towards tStop (never past it). Returns REACHED_STOP when t equals
   * tStop, EVENT_FOUND when an event function changed sign (t and y are then just past the
   * crossing and eventFlags says which), otherwise STEP_TAKEN.
   */
  advance(tStop: number): AdvanceOutcome {
    if (!(tStop >= this.t)) throw new RangeError('tStop must not lie before the current time');
    if (this.pendingRestart) this.doRestart(tStop);
    if (tStop === this.t) return REACHED_STOP;
    for (let attempt = 0; attempt < this.maxStepsPerAdvance; attempt++) {
      const remaining = tStop - this.t;
      let hTry = Math.min(this.h, this.maxStep);
      const isFinal = hTry >= remaining * 0.999;
      if (isFinal) hTry = remaining;
      if (!(hTry > Math.abs(this.t) * 1e-14 + 1e-300)) {
        throw new Error(`integration failed at t=${this.t}: step size underflow`);
      }
      const outcome = this.tryStep(hTry);
      if (outcome < 0) {
        // Newton failed: a fresh Jacobian first, then a smaller step.
        this.stats.newtonFailures++;
        if (!this.isJacobianCurrent) this.isJacobianStale = true;
        else this.h = hTry * 0.25;
        continue;
      }
      const err = outcome;
      const factor = Math.min(5, Math.max(0.2, 0.9 * Math.pow(Math.max(err, 1e-10), -1 / 3)));
      if (err > 1) {
        this.stats.rejected++;
        this.h = hTry * Math.min(factor, 0.7);
        continue;
      }
      this.stats.steps++;
      this.tPrevious = this.t;
      this.yPrevious.set(this.y);
      this.fPrevious.set(this.f);
      this.t = isFinal ? tStop : this.t + hTry;
      this.y.set(this.zNew);
      this.callRhs(this.t, this.y, this.f);
      this.tEnd = this.t;
      this.yEnd.set(this.y);
      this.fEnd.set(this.f);
      this.hasHistory = true;
      this.isJacobianCurrent = false;
      // A clipped final step says nothing about the step the solution allows. Small increases
      // are skipped: the factorised iteration matrix is then reused (as Hairer's RADAU5 does).
      if (factor < 1 || (!isFinal && factor > 1.25)) this.h = hTry * factor;
      else if (!isFinal) this.h = hTry;
      if (this.eventSystem !== null && this.eventFlags.length > 0 && this.locateEvent()) {
        this.pendingRestart = true;
        return EVENT_FOUND;
      }
      if (this.t === tStop) {
        this.pendingRestart = true;
        return REACHED_STOP;
      }
      return STEP_TAKEN;
    }
    throw new Error(`integration failed at t=${this.t}: too many step attempts`);
  }

  /** Cubic Hermite interpolation of the state over the last step. tQuery in [tPrevious, t]. */
  interpolate(tQuery: number, out: Float64Array): void {
    const h = this.tEnd - this.tPrevious;
    if (h === 0) {
      out.set(this.yEnd);
      return;
    }
    const s = (tQuery - this.tPrevious) / h;
    const s2 = s * s;
    const s3 = s2 * s;
    const h00 = 2 * s3 - 3 * s2 + 1;
    const h10 = (s3 - 2 * s2 + s) * h;
    const h01 = -2 * s3 + 3 * s2;
    const h11 = (s3 - s2) * h;
    for (let i = 0; i < this.size; i++) {
      out[i] = h00 * this.yPrevious[i]! + h10 * this.fPrevious[i]! + h01 * this.yEnd[i]! + h11 * this.fEnd[i]!;
    }
  }

  private callRhs(t: number, y: Float64Array, dydt: Float64Array): void {
    this.stats.rhsCalls++;
    this.system.rhs(t, y, dydt);
  }

  private doRestart(tStop: number): void {
    this.pendingRestart = false;
    this.hasHistory = false;
    this.eta = 1;
    this.callRhs(this.t, this.y, this.f);
    this.isJacobianStale = true;
    this.isJacobianCurrent = false;
    this.tPrevious = this.t;
    this.yPrevious.set(this.y);
    this.fPrevious.set(this.f);
    this.tEnd = this.t;
    this.yEnd.set(this.y);
    this.fEnd.set(this.f);
    if (this.eventSystem !== null) this.eventSystem.events(this.t, this.y, this.gPrevious);
    if (!(this.h > 0)) {
      let rate = 0;
      for (let i = 0; i < this.size; i++) {
        const r = Math.abs(this.f[i]!) / (this.absTol[i]! + this.relTol * Math.abs(this.y[i]!));
        if (r > rate) rate = r;
      }
      const span = tStop - this.t;
      this.h = rate > 0 ? Math.min(span, 0.01 / rate) : span;
      if (!(this.h > 0)) this.h = 1e-6;
    }
  }

  private weightedNorm(v: Float64Array, reference: Float64Array): number {
    let sum = 0;
    for (let i = 0; i < this.size; i++) {
      const w = this.absTol[i]! + this.relTol * Math.abs(reference[i]!);
      const r = v[i]! / w;
      sum += r * r;
    }
    return Math.sqrt(sum / this.size);
  }

  private computeJacobian(): void {
    const n = this.size;
    const y = this.y;
    for (let j = 0; j < n; j++) {
      const yj = y[j]!;
      const scale = Math.max(Math.abs(yj), this.absTol[j]! / this.relTol);
      const step = 1.4901161193847656e-8 * scale; // sqrt(machine epsilon)
      y[j] = yj + step;
      const actualStep = y[j]! - yj;
      this.callRhs(this.t, y, this.work);
      y[j] = yj;
      for (let i = 0; i < n; i++) this.jacobian[i * n + j] = (this.work[i]! - this.f[i]!) / actualStep;
    }
    this.stats.jacobians++;
    this.isJacobianStale = false;
    this.isJacobianCurrent = true;
    this.factoredStep = Number.NaN;
  }

  private factor(h: number): boolean {
    const n = this.size;
    const dh = D * h;
    const m = this.iterationMatrix;
    for (let k = 0; k < n * n; k++) m[k] = -dh * this.jacobian[k]!;
    for (let i = 0; i < n; i++) m[i * n + i] = m[i * n + i]! + 1;
    this.stats.factorisations++;
    const ok = luFactorInPlace(m, n, this.pivots);
    this.factoredStep = ok ? h : Number.NaN;
    return ok;
  }

  /** Solves z - d h f(tz, z) = stageConstant by simplified Newton; fz gets f at the result. */
  private newton(tz: number, h: number, z: Float64Array, fz: Float64Array): boolean {
    const n = this.size;
    const dh = D * h;
    let previousNorm = 0;
    // The contraction estimate carries over from the last solve, so a good predictor can be
    // accepted after one iteration (Hairer & Wanner, Solving ODEs II, section IV.8).
    this.eta = Math.pow(Math.max(this.eta, 1e-16), 0.8);
    for (let iteration = 0; iteration < NEWTON_MAX_ITERATIONS; iteration++) {
      this.callRhs(tz, z, fz);
      for (let i = 0; i < n; i++) this.delta[i] = this.stageConstant[i]! + dh * fz[i]! - z[i]!;
      luSolveInPlace(this.iterationMatrix, n, this.pivots, this.delta);
      for (let i = 0; i < n; i++) z[i] = z[i]! + this.delta[i]!;
      const norm = this.weightedNorm(this.delta, z);
      if (!Number.isFinite(norm)) return false;
      if (iteration > 0) {
        const rate = norm / previousNorm;
        if (rate > 0.9) return false;
        this.eta = rate / (1 - rate);
      }
      if (this.eta * norm <= NEWTON_TOLERANCE || norm <= 1e-3 * NEWTON_TOLERANCE) break;
      previousNorm = norm;
      if (iteration === NEWTON_MAX_ITERATIONS - 1) return false;
    }
    // f at the solution from the stage equation itself: exact at convergence, no extra call.
    for (let i = 0; i < n; i++) fz[i] = (z[i]! - this.stageConstant[i]!) / dh;
    return true;
  }

  /** One attempt with step h: returns the weighted error (accept when <= 1), or -1. */
  private tryStep(h: number): number {
    const n = this.size;
    if (this.isJacobianStale) this.computeJacobian();
    if (this.factoredStep !== h && !this.factor(h)) return -1;
    const dh = D * h;
    const y = this.y;
    const f = this.f;
    for (let i = 0; i < n; i++) this.stageConstant[i] = y[i]! + dh * f[i]!;
    if (this.hasHistory) this.interpolate(this.t + GAMMA * h, this.zGamma);
    else for (let i = 0; i < n; i++) this.zGamma[i] = y[i]! + GAMMA * h * f[i]!;
    if (!this.newton(this.t + GAMMA * h, h, this.zGamma, this.fGamma)) return -1;
    // Predictor: the cubic Hermite through (t, y, f) and (t + gamma h, zGamma, fGamma),
    // extrapolated to t + h (s = 1 / gamma in the stage's own unit).
    const sh = 1 / GAMMA;
    const span = GAMMA * h;
    const p00 = 2 * sh ** 3 - 3 * sh ** 2 + 1;
    const p10 = (sh ** 3 - 2 * sh ** 2 + sh) * span;
    const p01 = -2 * sh ** 3 + 3 * sh ** 2;
    const p11 = (sh ** 3 - sh ** 2) * span;
    for (let i = 0; i < n; i++) {
      this.stageConstant[i] = BDF_Y_GAMMA * this.zGamma[i]! - BDF_Y_N * y[i]!;
      this.zNew[i] = p00 * y[i]! + p10 * f[i]! + p01 * this.zGamma[i]! + p11 * this.fGamma[i]!;
    }
    if (!this.newton(this.t + h, h, this.zNew, this.fNew)) return -1;
    const e = this.delta;
    for (let i = 0; i < n; i++) {
      const secondDifference = f[i]! / GAMMA - this.fGamma[i]! / (GAMMA * (1 - GAMMA)) + this.fNew[i]! / (1 - GAMMA);
      e[i] = 2 * ERROR_CONSTANT * h * secondDifference;
    }
    // Filter through (I - d h J)^-1 so stiff, fast-decaying modes do not inflate the estimate
    // (Shampine's device for implicit Runge-Kutta codes).
    luSolveInPlace(this.iterationMatrix, n, this.pivots, e);
    return this.weightedNorm(e, this.zNew);
  }

  /** Looks for sign changes over the step just taken; on one, moves t and y to just past it. */
  private locateEvent(): boolean {
    const events = this.eventSystem!;
    const count = this.eventFlags.length;
    events.events(this.t, this.y, this.gNew);
    let anyChange = false;
    for (let k = 0; k < count; k++) {
      if (changedSign(this.gPrevious[k]!, this.gNew[k]!)) anyChange = true;
    }
    if (!anyChange) {
      this.gPrevious.set(this.gNew);
      return false;
    }
    // Earliest crossing by bisection on the interpolant: the bracket [left, right] always has
    // some event changed between g(tPrevious) and g(right).
    let left = this.tPrevious;
    let right = this.t;
    const tolerance = EVENT_TIME_TOLERANCE * Math.max(1, Math.abs(this.t));
    while (right - left > tolerance) {
      const middle = 0.5 * (left + right);
      this.interpolate(middle, this.yProbe);
      events.events(middle, this.yProbe, this.gProbe);
      let changedByMiddle = false;
      for (let k = 0; k < count; k++) {
        if (changedSign(this.gPrevious[k]!, this.gProbe[k]!)) changedByMiddle = true;
      }
      if (changedByMiddle) right = middle;
      else left = middle;
    }
    if (right < this.tEnd) {
      this.interpolate(right, this.yProbe);
      events.events(right, this.yProbe, this.gProbe);
    } else {
      this.yProbe.set(this.y);
      this.gProbe.set(this.gNew);
    }
    for (let k = 0; k < count; k++) {
      this.eventFlags[k] = changedSign(this.gPrevious[k]!, this.gProbe[k]!) ? 1 : 0;
    }
    this.t = right;
    this.y.set(this.yProbe);
    this.gPrevious.set(this.gProbe);
    return true;
  }
}

function changedSign(before: number, after: number): boolean {
  return (before < 0 && after >= 0) || (before > 0 && after <= 0);
}
