import { isAlarmKind, wordWatchEvent } from './eventWording.ts';
import { normaliseCutPlan, normaliseExpectedPlateaus } from './cutPlan.ts';
import { ewRegressionAdd, ewRegressionLevel, ewRegressionPredictionVariance, ewRegressionSlope, ewSteadyPredictionVariance, restartEwRegression } from './ewRegression.ts';
import { onAcceptedReading, restartSlowFit } from './stateMachine.ts';
import { spikeFilterPush, spikeFilterReset } from './spikeFilter.ts';
import { createStuckReadings, pushStuckReading } from './stuckReading.ts';
import { watcherStateFromJson, watcherStateToJson } from './stateJson.ts';
import type { CutWindow, EventKind, EventReason, FaultReason, InvalidReason, WatchContext, WatchEvent, WatchState } from './types.ts';
import { resolveWatcherOptions, type WatcherOptions } from './watcherOptions.ts';
import { createWatcherState, type WatcherState } from './watcherState.ts';

/** Vapour arriving has landed on the first plateau, and the watcher declared it, within this
 * (the stuck test leaves the arrival alone: a quiet board repeats one value as soon as the head
 * lands). Two minutes were too few: an arrival of 100 s on a quiet 0.25 degC board was still
 * 'rising' then, its first plateau not yet declared. Units: s. */
const ARRIVAL_S = 300;
/** Valid readings needed after a fault before the watcher trusts the sensor again. */
const RECOVER_READINGS = 3;
/** Quiet time after the last spike before an erratic sensor is trusted again. Units: s. */
const ERRATIC_CLEAR_S = 60;
/** Prediction errors beyond this are changes, not noise. Units: degC. */
const INNOVATION_CLIP_C = 2;
/** A reading this far from the slow fit restarts it. Units: degC. */
const SLOW_RESTART_C = 3;

/**
 * The run watcher: fed one reading at a time, it follows the head temperature through the
 * states cold, rising, plateau, leaving, stalled and fault, and returns the events each
 * reading raises. Work per reading is constant; `save()` gives JSON that `RunWatcher.restore`
 * resumes exactly. See README.md for the method and the thresholds.
 */
export class RunWatcher {
  private readonly s: WatcherState;
  private events: WatchEvent[] = [];
  private readonly onRelease = (timeS: number, valueC: number): void => this.accept(timeS, valueC);

  /** `context`: the run's cut plan (a list of windows), or the plan and the expected plateaus. */
  constructor(options: Partial<WatcherOptions> = {}, context: readonly CutWindow[] | WatchContext = [], state?: WatcherState) {
    const { plan = [], expectedPlateaus = [] } = Array.isArray(context) ? { plan: context as readonly CutWindow[] } : (context as WatchContext);
    this.s = state ?? createWatcherState(resolveWatcherOptions(options), normaliseCutPlan(plan), normaliseExpectedPlateaus(expectedPlateaus));
  }

  /** Resumes a watcher from `save()` output. */
  static restore(json: string): RunWatcher {
    return new RunWatcher({}, [], watcherStateFromJson(json));
  }

  /** The state as JSON text, for `RunWatcher.restore`. */
  save(): string {
    return watcherStateToJson(this.s);
  }

  get state(): WatchState {
    return this.s.state;
  }

  /** The current plateau level, NaN when none. Units: degC. */
  get plateauLevelC(): number {
    return this.s.levelC;
  }

  /**
   * One reading at `timeS` (s since heat on). `headC` NaN, or an `invalid` reason, means the
   * sensor gave no valid reading. Readings not later than the last are ignored.
   */
  push(timeS: number, headC: number, invalid?: InvalidReason): WatchEvent[] {
    const s = this.s;
    this.events = [];
    if (!Number.isFinite(timeS) || timeS <= s.lastTimeS) return this.events;
    if (Number.isNaN(s.firstTimeS)) s.firstTimeS = timeS;
    if (!Number.isNaN(s.lastTimeS)) {
      const dt = timeS - s.lastTimeS;
      // A gap (dropout) must not stretch the reading interval the thresholds scale with.
      s.intervalS = Number.isNaN(s.intervalS) ? dt : s.intervalS + 0.05 * (Math.min(dt, 3 * s.intervalS) - s.intervalS);
    }
    s.lastTimeS = timeS;
    const reason = invalid ?? (Number.isNaN(headC) ? 'missing'
      : !(headC >= s.options.validMinC && headC <= s.options.validMaxC) ? 'out-of-range' : undefined);
    if (reason !== undefined) {
      s.latestInvalid = reason;
      s.recoverCount = 0;
      this.checkTime(timeS);
      return this.events;
    }
    if (s.state === 'fault' && !this.recover(timeS, headC)) {
      s.lastValidS = timeS;
      return this.events;
    }
    const gapS = timeS - s.lastValidS;
    s.lastValidS = timeS;
    const stepC = Math.abs(headC - (s.lastValidC ?? Number.NaN));
    if (stepC > 0 && !(stepC >= (s.resolutionC ?? Number.NaN))) s.resolutionC = stepC;
    s.lastValidC = headC;
    const isHand = s.intervalS >= s.options.handIntervalS;
    // Typed readings repeat whenever the thermometer does: only an instrument can be stuck.
    if (!isHand) {
      s.stuck ??= createStuckReadings();
      const climbCPerS = ewRegressionSlope(s.fast);
      // Still rising five minutes after the vapour came (a first plateau never declared) is a
      // climb like one off a plateau: a value frozen on it is judged against the climb.
      const stuckState = s.state === 'rising' && timeS - s.vapourTimeS >= ARRIVAL_S ? 'leaving' : s.state;
      if (pushStuckReading(s.stuck, timeS, headC, stuckState, s.resolutionC ?? Number.NaN, climbCPerS, s.intervalS)) {
        this.enterFault(timeS, 'stuck', headC);
        return this.events;
      }
    }
    if (isHand) {
      this.accept(timeS, headC);
    } else {
      const windowS = Math.max(10, 10 * s.intervalS);
      if (gapS > windowS) spikeFilterReset(s.spikes);
      const forecastC = s.fast.w > 0 ? ewRegressionLevel(s.fast) + ewRegressionSlope(s.fast) * (timeS - s.fast.originS) : headC;
      spikeFilterPush(s.spikes, timeS, headC, headC - forecastC, windowS, s.options.erraticSpikesPerMinute, this.onRelease);
      const spikeTimes = s.spikes.spikeTimesS;
      if (s.state !== 'fault' && spikeTimes.length >= s.options.erraticSpikesPerMinute && timeS - spikeTimes[0]! <= 60) {
        this.enterFault(timeS, 'erratic');
      }
    }
    this.checkTime(timeS);
    return this.events;
  }

  /** The clock moved on with no reading (call it every few seconds live). */
  tick(nowS: number): WatchEvent[] {
    this.events = [];
    if (Number.isFinite(nowS) && !(nowS < this.s.lastTimeS)) this.checkTime(nowS);
    return this.events;
  }

  private faultAfterS(): number {
    const interval = Number.isNaN(this.s.intervalS) ? 1 : this.s.intervalS;
    return Math.max(this.s.options.faultAfterMinS, 6 * interval);
  }

  private checkTime(nowS: number): void {
    const s = this.s;
    if (s.state !== 'fault') {
      const since = Number.isNaN(s.lastValidS) ? s.firstTimeS : s.lastValidS;
      if (nowS - since >= this.faultAfterS()) {
        const isOpen = s.latestInvalid === 'fault-code' || s.latestInvalid === 'out-of-range';
        this.enterFault(nowS, isOpen ? 'open-thermocouple' : 'no-valid-readings');
        return;
      }
    }
    if ((s.state === 'cold') && !s.hasRaisedNoVapour && nowS >= s.options.noVapourStallS) {
      s.hasRaisedNoVapour = true;
      this.setState('stalled', nowS);
      s.stallReason = 'no-vapour';
      this.emit(nowS, 'stall', s.baselineC, 'no-vapour');
    }
  }

  private enterFault(timeS: number, reason: FaultReason, headC = Number.NaN): void {
    const s = this.s;
    s.preFaultState = s.state;
    s.faultReason = reason;
    s.recoverCount = 0;
    this.setState('fault', timeS);
    this.emit(timeS, 'sensor-fault', headC, reason);
  }

  private recover(timeS: number, valueC: number): boolean {
    const s = this.s;
    // A stuck value does not count towards trusting the sensor again; the first change does.
    if (s.faultReason === 'stuck' && valueC === s.stuck?.valueC) return false;
    s.recoverCount++;
    if (s.recoverCount < RECOVER_READINGS) return false;
    const lastSpikeS = s.spikes.spikeTimesS[s.spikes.spikeTimesS.length - 1] ?? -Infinity;
    if (s.faultReason === 'erratic' && timeS - lastSpikeS < ERRATIC_CLEAR_S) return false;
    s.state = s.preFaultState;
    s.faultReason = null;
    s.spikes.spikeTimesS.length = 0;
    spikeFilterReset(s.spikes);
    s.fallSinceS = NaN;
    s.plateauCandidateS = NaN;
    return true;
  }

  private accept(timeS: number, valueC: number): void {
    const s = this.s;
    if (s.state === 'fault') return;
    const dtS = Number.isNaN(s.lastAcceptedS) ? 0 : timeS - s.lastAcceptedS;
    s.lastAcceptedS = timeS;
    const interval = Number.isNaN(s.intervalS) ? 1 : s.intervalS;
    s.fast.tauS = Math.max(4, 1.5 * interval);
    s.slow.tauS = Math.max(30, 4 * interval);
    let isTypedJump = false;
    if (s.fast.w > 0) {
      const predicted = ewRegressionLevel(s.fast) + ewRegressionSlope(s.fast) * dtS;
      const e2 = (valueC - predicted) ** 2;
      // Only the reading noise: jumps (vapour, breakthroughs) would swamp it for hours.
      if (e2 < INNOVATION_CLIP_C * INNOVATION_CLIP_C) {
        // On the scale of a fit in full stride: a young fit (the first readings, or typed ones
        // just after a jump restarted it) extrapolates from few readings and misses by more
        // (the innovation covariance of a Kalman filter, which holds its state's uncertainty).
        // Taken as they come, the first typed readings after the vapour, whole degrees, set the
        // noise at 2 degC for an hour, and the plateau's rise alarmed only 17 degC up.
        const young = (1 + ewRegressionPredictionVariance(s.fast, dtS)) / (1 + ewSteadyPredictionVariance(s.fast.tauS, interval));
        const scaled = e2 / young;
        s.innovationVarC2 = Number.isNaN(s.innovationVarC2) ? scaled : s.innovationVarC2 + 0.02 * (scaled - s.innovationVarC2);
      }
      isTypedJump = interval >= s.options.handIntervalS && e2 > SLOW_RESTART_C * SLOW_RESTART_C;
    }
    // Typed readings: the fast fit spans 1.5 intervals, minutes, so after a jump (the vapour's
    // arrival, a cut) the readings before it would hold the fit degrees under the head for several
    // readings, and the first innovations under the clip, fixed for an hour at that gain, would be
    // that lag, not the reading noise (a room reading of 23 degC gave 1.8 degC, and the creep
    // off the plateau it found then alarmed only once the climb reached 60). The fit starts
    // again at the jump, as the slow one does.
    if (isTypedJump) restartEwRegression(s.fast, timeS, valueC);
    else ewRegressionAdd(s.fast, timeS, valueC);
    // After a clear change of course the old readings only bias the slope that says "steady".
    if (s.slow.w > 0 && Math.abs(valueC - ewRegressionLevel(s.slow)) > SLOW_RESTART_C) restartSlowFit(s, timeS, valueC, dtS);
    else ewRegressionAdd(s.slow, timeS, valueC);
    onAcceptedReading(s, timeS, valueC, Math.min(dtS, 3 * interval), this);
  }

  /** Moves to `state` (used by the state machine). */
  setState(state: WatchState, timeS: number): void {
    if (this.s.state !== state) {
      this.s.state = state;
      this.s.stateSinceS = timeS;
    }
  }

  /**
   * Raises an event. Alarms of one kind closer than `minAlarmGapS` are suppressed so no alarm
   * can chatter whatever the state machine does. Returns whether it was raised.
   */
  emit(timeS: number, kind: EventKind, headC: number, reason?: EventReason, receiver?: number): boolean {
    const s = this.s;
    const isAlarm = isAlarmKind(kind);
    if (isAlarm) {
      const last = s.lastAlarmS[kind];
      if (last !== undefined && timeS - last < s.options.minAlarmGapS) return false;
      s.lastAlarmS[kind] = timeS;
    }
    const { message, action } = wordWatchEvent(kind, headC, reason, receiver);
    const event: WatchEvent = { timeS, kind, headC, isAlarm, message, action };
    if (reason !== undefined) event.reason = reason;
    if (receiver !== undefined) event.receiver = receiver;
    this.events.push(event);
    return true;
  }
}
