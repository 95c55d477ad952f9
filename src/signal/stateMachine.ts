import { cusumThresholdForMeanTime } from './cusumThreshold.ts';
import { holdsLevel, isOutsideExpected, windowIndexAt } from './cutPlan.ts';
import { createEwRegression, ewRegressionAdd, ewRegressionEffectiveReadings, ewRegressionLevel, ewRegressionSlope, ewLevelNoisePerSd, ewSlopeNoisePerSd, restartEwRegression, type EwRegression } from './ewRegression.ts';
import type { EventKind, EventReason, WatchState } from './types.ts';
import { noClimbSag, type WatcherState } from './watcherState.ts';

/** Where the state machine raises events and changes state (the watcher). */
export interface EventSink {
  emit(timeS: number, kind: EventKind, headC: number, reason?: EventReason, receiver?: number): boolean;
  setState(state: WatchState, timeS: number): void;
}

/** Room baseline follows slow warming of the head with this time constant. Units: s. */
const BASELINE_TAU_S = 300;
/** A first reading this warm is not room temperature: laboratories are kept well below it
 * (common practice: about 18-25 degC). Units: degC. */
const HOT_START_C = 40;
/** The plateau level is the mean of its readings within 0.9 degC of it (short of the 1 degC
 * deadband, so sags and rises stay out), as the truth's level is the median of the whole steady
 * stretch; after an hour or so it turns into a follower of a long plateau's creep, with this time
 * constant. Units: s, degC. */
const LEVEL_TAU_S = 3000;
const LEVEL_TRACK_C = 0.9;
/** ... but never narrower than this many resolution steps of the readings. */
const LEVEL_TRACK_STEPS = 1.5;
/** The plateau's course (level and creep) is fitted over this time, well beyond the draughts'
 * correlation time so that it keeps their wander as wander and takes only the creep. Units: s. */
const COURSE_TAU_S = 300;
/** Past the deadband, the fast fit climbing faster than twice the steepest creep a plateau may
 * have (flatSlopeCPerS) plus six standard deviations of its own slope noise on the plateau is a
 * breakthrough without waiting for the CUSUM. Six, not four: chosen on the benchmark, the same
 * alarms as without this path and only the delay shorter. */
const CLIMB_FACTOR = 2;
const CLIMB_SLOPE_SDS = 6;
/** The CUSUM's breakthrough waits for the fast level to hold past the deadband this many
 * readings, at most this long (sensor readings). Chosen on the simulated corpus of two seeds:
 * held-out seed 7 had 11 false alarms a minute or more before a truth's window on slow rises,
 * noise peaks over the deadband; with four readings, with the charge, seed 7 false alarms
 * 32 -> 28 and 2 breakthroughs more, seed 20251201 17 -> 16 and one more; the median latency
 * 1-2.5 s longer. Three or two readings: fewer false alarms gone; on the reading itself instead
 * of the fast level, delays of half a minute on noisy slow rises. Units: readings, s. */
const RISE_HOLD_READINGS = 4;
const RISE_HOLD_MAX_S = 10;
/** The fast slope's noise is never taken below this share of what the reading noise alone gives
 * the fast fit (ewSlopeNoisePerSd): the slopes the wander band lets through are the quiet ones,
 * and with few readings in the fit (5 s apart, 0.5 degC noise) their power alone read it eight
 * times too small, and a noise peak passed for a climb. A share, not all of it: the reading noise
 * is taken from the innovations, which also hold the fit's own prediction error (1.3-2 times the
 * noise's variance at readings 1-5 s apart); in full it delayed sharp breakthroughs (synthetic
 * corpus, readings every 2 s or faster: latency p90 19.8 -> 25.8 s), at a half hardly. */
const WHITE_SLOPE_FLOOR = 0.5;
/** The smoothed head's variance about the level is averaged over this time. Units: s. */
const RESIDUAL_POWER_TAU_S = 600;
/** Squares beyond this many times the running power are clipped to it (a robust power). */
const ROBUST_CLIP = 9;
/** Offsets beyond this are sag or breakthrough, not wander. Units: degC. */
const WANDER_BAND_C = 0.6;
/** Correlation time taken for the wander (hood draughts, tens of seconds). No published
 * figure: chosen on the benchmark (draughts of 20-90 s there), trading latency for alarms. */
const WANDER_TAU_S = 40;
/** Safety factor on the long-run variance (a short, band-limited estimate runs low). */
const DIFFUSION_SAFETY = 1.5;
/** Least long-run variance assumed: a hood draught of 0.1 degC sd over 30 s. Units: degC^2 s. */
const DIFFUSION_FLOOR_C2S = 2 * 0.1 * 0.1 * 30;
/** A sag 1.5 degC below the level that lasts this long is heat too low, not a pre-cut sag. */
const LONG_SAG_C = 1.5;
const LONG_SAG_S = 480;
/** A stall is left when the head climbs this far above its lowest reading. Units: degC. */
const RECOVERY_RISE_C = 3;
const RECOVERY_HOLD_S = 30;
/** Climbing faster than this is not creeping (3.6 degC/min). Units: degC/s. */
const CREEP_MAX_C_PER_S = 0.06;
/** A plateau this far below the next main cut's window, in its component's expected plateau,
 * is that cut beginning (plateauWindowIndex): the window's own allowance (0.5 degC) and the
 * degree or so a head thermometer reads low (common practice). Further down the band it is a
 * mixed pause (simulated corpus: two such, 2.5-2.8 degC below, 3-7 minutes before the
 * component came over 90 % pure). Units: degC. */
const BELOW_WINDOW_C = 1.5;
/** Crossing a planned cut needs this margin above the window's top, held this long. */
const CUT_MARGIN_C = 0.3;
/** A plateau reached within this of the level a breakthrough left (or of the shoulder before
 * it) is a shoulder of the same climb (a few-plate column lets the head pause on its way up), not the next component: its
 * own rise raises no second alarm. Chosen on the simulated corpus; lab solvents worth
 * separating boil further apart than this. Units: degC. */
const SHOULDER_C = 3;
/** Further up, to this far above the level the last breakthrough left, a plateau that breaks
 * again within PAUSE_S of being reached is a pause of the same climb too: a component coming
 * over holds the head for its whole cut, a few-plate column's climb only stops for a minute or
 * two (in the simulated corpus, all five alarms off such plateaus, 5-7 degC up and 1.5-3.5 min
 * long, were false). A plateau that lasts longer alarms as the next component's. Chosen on the
 * simulated corpus (8 degC / 300 s takes one alarm more, still all false; kept narrower so a
 * close-boiling component's short cut still alarms). Units: degC, s. */
const PAUSE_C = 6;
const PAUSE_S = 300;
/** A shoulder the head sags on is no pause of the climb: a climb that pauses never falls back,
 * and a head that falls below its level, then climbs a deadband above it, has seen the lighter
 * component run out (the pre-cut sag). Most often the climb was an early alarm on a creeping
 * plateau (the truth's level the median of the whole stretch) and the shoulder that plateau's
 * rest: its real cut, hidden by the shoulder, was the miss beside that false alarm. The head
 * below the level by SHOULDER_SAG_C and SHOULDER_SAG_NOISE_SDS standard deviations of the fast
 * level's noise, for max(SHOULDER_SAG_HOLD_S, one reading interval). Chosen on the simulated
 * corpus: breakthrough recall alone 0.936 -> 0.952 (seed 7), 0.931 -> 0.935 (99),
 * 0.967 -> 0.971 (20251201), no false alarm more in any mode on either corpus; 0.5 degC with no
 * noise test or hold raised a noise "sag" on a 0.4 degC board (seed 99). Units: degC, s. */
const SHOULDER_SAG_C = 0.3;
const SHOULDER_SAG_NOISE_SDS = 2;
const SHOULDER_SAG_HOLD_S = 5;
const CUT_HOLD_S = 5;
/** Sparse readings hold a plateau for this many intervals at least (typed readings: steady over
 * about three readings). Three were needed to keep typed climbs apart while a restarted slow fit
 * read as steady; since it has the jump's slope, two give (simulated corpus) plateau recall
 * 0.883 -> 0.894, 2 breakthroughs more and 2 false alarms fewer, and change nothing on the
 * synthetic one (one interval: 3 false alarms more there). */
const PLATEAU_HOLD_INTERVALS = 2;
/** A sag in a climb the watcher never took for a plateau (a short cut creeping 1-2 degC/min):
 * the head falls this far below the climb's peak, for max(10 s, two readings), and comes back
 * a breakthrough's rise above that peak within 3 minutes. The pre-cut sag is 1-3 degC;
 * the depth is measured on the fast fit, which rounds a short sag's bottom off. Units: degC, s. */
const CLIMB_SAG_C = 0.8;
/** ... and never shallower than this many standard deviations of the fast level's noise: on a
 * 0.5 degC board read every 2 s that noise is 0.35-0.45 degC, and a climb pausing a minute gave a
 * noise "sag" (4 of 20 seeds in the tests' shape; none at 3 sd, the real sags still found). */
const CLIMB_SAG_NOISE_SDS = 3;
const CLIMB_SAG_HOLD_S = 10;
const CLIMB_SAG_WITHIN_S = 180;
/** With no plateau seen yet, a climb's sag counts from this long after the vapour came: the
 * arrival's overshoot (seconds) and the head's settling onto a first plateau are over, and a
 * climb that never settled (a few-plate column, or a first cut the plan announced) still ends
 * each cut in a sag. Two minutes: simulated corpus, one breakthrough more on seed 7 (every
 * column) and one false alarm fewer on seed 20251201 with the plan, no false alarm more on three
 * seeds of either corpus; 60 s, the same. Units: s. */
const SAG_AFTER_VAPOUR_S = 120;
/** A knee in a climb (watchClimbKnee): slower than 0.04 degC/s (2.4 degC/min) for a minute, then
 * within 2 minutes of the stretch's end faster than a breakthrough's 6 degC/min. Chosen on the
 * simulated corpus of two seeds (20251201 and 7), with the charge known: at 0.03 degC/s one
 * breakthrough fewer (alone, two). With the stretch at 0.03 degC/s: an exit at 0.06 degC/s made
 * two false alarms more; a stretch of 40 s changed nothing; a take-off within 1 minute lost one
 * breakthrough, within 5 minutes one too and made one false alarm. Units: degC/s, s. */
const KNEE_SLOW_C_PER_S = 0.04;
const KNEE_EXIT_C_PER_S = 0.1;
const KNEE_HOLD_S = 60;
const KNEE_WITHIN_S = 120;
/** A sag's or knee's breakthrough this soon after a climb crossed out of a main cut's window,
 * from just above it, is the rise that cut announced (isLeftMainCut). Units: s. */
const LEFT_MAIN_CUT_S = 200;
/** With no plateau seen yet, a knee counts from this long after the vapour came: the arrival's
 * slowing onto the first plateau is over by then, and a first cut that creeps from its start
 * (never a plateau) still ends in one. Three minutes: one breakthrough more on each seed, no
 * false alarm; one minute, one false alarm. Units: s. */
const KNEE_AFTER_VAPOUR_S = 180;
/** Two typed readings this close agree (watchTypedPair): half a degree, what a thermometer
 * graduated in degrees is read to by eye; and the reading step counted on top of the deadband,
 * at most a degree (the resolution estimate of a run's first readings can be the whole vapour
 * jump). Chosen on the simulated corpus: a pair within a step instead (whole degrees: 72, 73)
 * found the same breakthroughs with two false alarms more; twice the step on top, one
 * breakthrough and one false alarm fewer.
 * Units: degC. */
const TYPED_PAIR_C = 0.5;
/** After a typed reading above the pair short of a breakthrough's rise, the next one's climb must
 * be this many times that reading's before it is the cut. Chosen on the simulated corpus: held-out
 * seed 424242 gained a breakthrough hand-typed over toluene (106, 106, 107, 110), the other seeds
 * none. Asking no steepening let creeps through: three false alarms more on two seeds (one fewer
 * on a third); 1, one more; 2, none. */
const TYPED_LEAVING_RATIO = 2;
const TYPED_STEP_MAX_C = 1;
/** A typed reading this far above the last one, and this many times the climb between the two
 * before it, is a cut (watchTypedJump). Chosen on the benchmark: a typed climb through a mixed
 * stretch goes a few degrees a reading, and out of it by a few times that; a short cut ends in a
 * jump of tens of degrees. */
const TYPED_JUMP_C = 10;
const TYPED_JUMP_RATIO = 3;

/** One reading that passed the spike filter; the filters have already taken it. */
export function onAcceptedReading(s: WatcherState, timeS: number, valueC: number, dtS: number, sink: EventSink): void {
  const fastC = ewRegressionLevel(s.fast);
  switch (s.state) {
    case 'cold':
      watchForVapour(s, timeS, valueC, dtS, sink);
      break;
    case 'stalled':
      if (s.stallReason === 'no-vapour') watchForVapour(s, timeS, valueC, dtS, sink);
      else if (s.stallReason === 'creeping') watchRising(s, timeS, valueC, fastC, sink);
      else watchRecovery(s, timeS, fastC, sink);
      break;
    case 'rising':
    case 'leaving':
      watchRising(s, timeS, valueC, fastC, sink);
      break;
    case 'plateau':
      watchPlateau(s, timeS, valueC, dtS, fastC, sink);
      break;
    case 'fault':
      break;
  }
  // A planned cut is the head climbing through a window's top: between plateaus, or off a
  // plateau once the head is a breakthrough's rise above it (a window top under a steady head is
  // the plan missing the plateau the head found, not a cut). Off a plateau the cut is that
  // plateau's breakthrough: with sensor readings it is the breakthrough itself (watchPlateau,
  // which has left the plateau by now if its evidence, the CUSUM or the sharp slope, was there;
  // a noisy board's two high readings cross a window top just above the level). Typed readings
  // keep the crossing: on a few readings the CUSUM is slow.
  // Before the first plateau the head must have spent a plateau's hold in the window first:
  // vapour arriving passes through the first window in seconds, and a first plateau that
  // settles just above its window is still the first component.
  if (s.plan.length > 0 && s.receiverIndex >= 0) {
    // The lesser of the fast fit and the reading, as for the peak (watchRising): the fit
    // overshoots where a steep climb stops, by degrees, for seconds.
    const headC = Math.min(fastC, valueC);
    const window = s.plan[s.receiverIndex];
    if (window && headC < window.fromC) s.windowDwellS = 0;
    else if (window && headC < window.toC + CUT_MARGIN_C) s.windowDwellS = (s.windowDwellS ?? 0) + dtS;
    const hasSettled = Number.isFinite(s.levelC) || (s.windowDwellS ?? 0) >= Math.max(s.options.plateauHoldS, s.intervalS);
    // Sensor readings the slow fit already finds steady (a plateau candidate) are the head
    // settling, not climbing through: a top under it is the plan missing the plateau, as once it
    // is declared. (Typed readings restart the slow fit at each jump; they keep the crossing.)
    const isSettling = s.intervalS < s.options.handIntervalS && Number.isFinite(s.plateauCandidateS);
    const isClimbing = (s.state === 'rising' || s.state === 'leaving') && hasSettled && !isSettling;
    const isRisingOff = s.state === 'plateau' && s.intervalS >= s.options.handIntervalS && headC - s.levelC >= s.options.breakthroughMinRiseC;
    if (isClimbing || isRisingOff) watchPlannedCut(s, timeS, headC, sink);
    else s.cutSinceS = NaN;
    if (s.state === 'rising' || s.state === 'leaving') watchTypedCutIn(s, timeS, sink);
  }
}

/**
 * Typed readings: two that agree (watchTypedPair) where the next main cut's component holds the
 * head (plateauWindowIndex) are that cut beginning. Declaring the plateau takes two or three
 * readings more, minutes of the main cut run into the intermediate receiver.
 */
function watchTypedCutIn(s: WatcherState, timeS: number, sink: EventSink): void {
  if (!(s.intervalS >= s.options.handIntervalS)) return;
  const pairC = s.typedPairC ?? NaN;
  if (!Number.isFinite(pairC)) return;
  const index = plateauWindowIndex(s, pairC);
  if (isMainCutAhead(s, index)) raiseCutInto(s, timeS, index, pairC, sink);
}

/** A main cut's window (it names its compound) after the current receiver's. */
function isMainCutAhead(s: WatcherState, index: number): boolean {
  return index > s.receiverIndex && typeof s.plan[index]!.compound === 'string';
}

/**
 * The head has settled on the component of the main cut at `index` (plateauWindowIndex), short
 * of its window or inside it without crossing into it: that cut begins here, not when the head
 * climbs through the window ('settled' when short of it).
 */
function raiseCutInto(s: WatcherState, timeS: number, index: number, headC: number, sink: EventSink): void {
  s.receiverIndex = index;
  s.cutSinceS = NaN;
  s.windowDwellS = 0;
  const window = s.plan[index]!;
  sink.emit(timeS, 'cut', headC, headC < window.fromC ? 'settled' : undefined, window.receiver);
}

function watchForVapour(s: WatcherState, timeS: number, valueC: number, dtS: number, sink: EventSink): void {
  // A first reading hotter than any room: the run was already under way when the watching began
  // (the app opened mid-run, or the first typed reading taken after the vapour came).
  const isHotStart = Number.isNaN(s.baselineC) && valueC >= HOT_START_C;
  if (Number.isNaN(s.baselineC)) s.baselineC = valueC;
  if (isHotStart || valueC - s.baselineC >= s.options.vapourRiseC) {
    s.vapourTimeS = timeS;
    s.stallReason = null;
    s.peakC = valueC;
    s.plateauCandidateS = NaN;
    s.fallSinceS = NaN;
    s.typedPrevC = valueC;
    s.typedBeforeC = NaN;
    s.typedPairC = NaN;
    sink.setState('rising', timeS);
    // Room-temperature readings would hold the slope up long after the head has settled.
    restartSlowFit(s, timeS, valueC, dtS);
    if (s.plan.length > 0) s.receiverIndex = 0;
    sink.emit(timeS, 'vapour', valueC, undefined, s.plan[0]?.receiver);
    return;
  }
  if (valueC - s.baselineC < s.options.vapourRiseC / 2) s.baselineC += -Math.expm1(-dtS / BASELINE_TAU_S) * (valueC - s.baselineC);
}

function watchRising(s: WatcherState, timeS: number, valueC: number, fastC: number, sink: EventSink): void {
  const o = s.options;
  if (s.state !== 'stalled' && watchTypedPair(s, timeS, valueC, sink)) return;
  // The fast local-linear fit overshoots where a steep climb stops (by about slope x tau: 10
  // degC after vapour arrives in a few seconds); the reading itself does not. The lesser of the
  // two has neither the overshoot nor the noise peaks, so a fall is measured from a real top.
  s.peakC = Math.max(s.peakC, Math.min(fastC, valueC));
  const interval = s.intervalS;
  const slopeCPerS = slowSlope(s);
  const isSteady = Math.abs(slopeCPerS) <= o.flatSlopeCPerS;
  if (!isSteady) s.plateauCandidateS = NaN;
  else if (Number.isNaN(s.plateauCandidateS)) s.plateauCandidateS = timeS;
  else if (timeS - s.plateauCandidateS >= Math.max(o.plateauHoldS, PLATEAU_HOLD_INTERVALS * interval)) {
    enterPlateau(s, timeS, ewRegressionLevel(s.slow), sink);
    return;
  }
  if (holdsFor(s, timeS, fastC < s.peakC - o.fallAwayC, Math.max(o.fallAwayHoldS, 1.5 * interval))) {
    fallAway(s, timeS, fastC, sink);
    return;
  }
  if (s.state !== 'stalled' && watchClimbSag(s, timeS, valueC, fastC, sink)) return;
  if (s.state !== 'stalled' && watchClimbKnee(s, timeS, valueC, fastC, slopeCPerS, sink)) return;
  // A steep climb is a cut under way, not a creep: only time spent climbing slowly counts. A creep
  // into the charge's last plateau is the head settling onto that component (a column of a plate
  // or two takes half an hour to), not a stall, while it is there; nor is one through the mixed
  // stretch of a column too short for the charge.
  if (Number.isNaN(s.creepSinceS) || slopeCPerS > CREEP_MAX_C_PER_S) s.creepSinceS = timeS;
  if (!s.hasRaisedCreep && s.state !== 'stalled' && timeS - s.creepSinceS >= o.creepStallS && !isLastLevel(s, fastC) && !isShortColumnClimb(s, fastC)) {
    s.hasRaisedCreep = true;
    sink.setState('stalled', timeS);
    s.stallReason = 'creeping';
    sink.emit(timeS, 'stall', fastC, 'creeping');
  }
}

/**
 * Typed readings: a component whose cut lasts two readings (two or three minutes) is never held
 * long enough to be declared a plateau, yet two readings that agree and a next one a
 * breakthrough's rise above them is what the one typing sees as a cut: steady, then leaving.
 * Two agree within TYPED_PAIR_C (whole-degree readings only when equal: a climb of a degree a
 * reading is no pair); the rise is the deadband and one reading step more. The plateau rules
 * apply: none within a pause of the last breakthrough's level (two readings are always short),
 * off a mixed level or off the last one. Returns whether it raised one.
 */
function watchTypedPair(s: WatcherState, timeS: number, valueC: number, sink: EventSink): boolean {
  if (!(s.intervalS >= s.options.handIntervalS)) {
    forgetTypedReadings(s);
    return false;
  }
  const previousC = s.typedPrevC ?? NaN;
  const beforeC = s.typedBeforeC ?? NaN;
  const pairC = s.typedPairC ?? NaN;
  s.typedPrevC = valueC;
  s.typedBeforeC = previousC;
  // One reading step more than the deadband: a typed reading a step up may be rounding only.
  const riseC = s.options.breakthroughMinRiseC + typedStepC(s);
  if (watchTypedJump(s, timeS, beforeC, previousC, valueC, riseC, sink)) {
    s.typedPairC = NaN;
    return true;
  }
  // A reading below the pair that pairs with nothing is a pre-cut sag: the pair still stands
  // for the rise after it (a component read twice, one reading a degree low, then the climb).
  // A reading back at the pair's level after such a sag (65, 65.5, 64.5, 65.5) keeps it too, and
  // so does one above it short of the rise: the head beginning to leave (106, 106, 107, then 110).
  s.typedPairC = Math.abs(valueC - previousC) <= TYPED_PAIR_C ? (valueC + previousC) / 2 : valueC - pairC < riseC ? pairC : NaN;
  if (!(valueC >= pairC + riseC)) return false;
  s.typedPairC = NaN;
  // After a reading that had begun to leave, the rise must steepen (TYPED_LEAVING_RATIO): a head
  // creeping a degree or so a reading (56, 56.5, 57.5, 59) is a mixed stretch, not a cut.
  const leftC = previousC - pairC;
  if (leftC > TYPED_PAIR_C && !(valueC - previousC > TYPED_LEAVING_RATIO * leftC)) return false;
  if (!isOwnCut(s, timeS, pairC, PAUSE_C)) return false;
  raiseBreakthrough(s, timeS, pairC, valueC, sink);
  return true;
}

/** The typed readings the pair and jump rules remember: none. */
function forgetTypedReadings(s: WatcherState): void {
  s.typedPrevC = NaN;
  s.typedBeforeC = NaN;
  s.typedPairC = NaN;
}

/** A typed reading's step (its resolution, at most TYPED_STEP_MAX_C): a reading a step up may be rounding only. */
function typedStepC(s: WatcherState): number {
  return Math.min(Number.isFinite(s.resolutionC) ? s.resolutionC! : TYPED_PAIR_C, TYPED_STEP_MAX_C);
}

/**
 * Typed readings, with no plan: two readings and a jump from the second far larger than the
 * climb between them are a cut. Read by hand every minute or two, a component that comes over
 * for three or four minutes shows no two readings that agree, only two on its way and then the
 * climb to the next one: 64, 69, then 97 for methanol off water. The jump must be
 * TYPED_JUMP_C at least, TYPED_JUMP_RATIO times the climb between the two and `riseC` (the
 * deadband and a reading step); the first of the two must lie a pause (PAUSE_C) above the last
 * breakthrough's level, and the plateau rules apply to their mean (isOwnCut: with the charge,
 * none off a mixed level or the last one). A plan's windows already raise the cut where the head
 * crosses out of one. Returns whether it raised one.
 */
function watchTypedJump(s: WatcherState, timeS: number, beforeC: number, previousC: number, valueC: number, riseC: number, sink: EventSink): boolean {
  if (s.plan.length > 0 || !Number.isFinite(beforeC) || !Number.isFinite(previousC)) return false;
  const jumpC = valueC - previousC;
  if (!(jumpC >= Math.max(TYPED_JUMP_C, TYPED_JUMP_RATIO * Math.abs(previousC - beforeC), riseC))) return false;
  // A first reading still within a pause of the last breakthrough's level is that climb (55, 65,
  // then 96 off a plateau at 52.6 that broke at 54): its two readings straddle the pause's edge.
  if (beforeC < (s.brokeFromC ?? NaN) + PAUSE_C) return false;
  const levelC = (beforeC + previousC) / 2;
  if (!isOwnCut(s, timeS, levelC, PAUSE_C)) return false;
  raiseBreakthrough(s, timeS, levelC, valueC, sink);
  return true;
}

/**
 * Forgets the slow fit's readings for a clear change of course (the vapour's arrival, a jump of
 * degrees), keeping the jump itself as its slope until a second reading gives one: a fit of one
 * reading has none, and read as 0 it called every restart steady (typed readings that climb
 * 3 degC or more a reading restart it each time, and such a climb was declared a plateau).
 */
export function restartSlowFit(s: WatcherState, timeS: number, valueC: number, dtS: number): void {
  const fromC = ewRegressionLevel(s.slow);
  s.slowJumpCPerS = dtS > 0 && Number.isFinite(fromC) ? (valueC - fromC) / dtS : NaN;
  restartEwRegression(s.slow, timeS, valueC);
}

/** The slow fit's slope, or the jump that restarted it while it has one reading. Units: degC/s. */
function slowSlope(s: WatcherState): number {
  const jump = s.slowJumpCPerS ?? Number.NaN;
  return s.slow.w < 1.5 && Number.isFinite(jump) ? jump : ewRegressionSlope(s.slow);
}

function enterPlateau(s: WatcherState, timeS: number, levelC: number, sink: EventSink): void {
  // Restored states saved before brokeFromC existed carry undefined: no shoulder then.
  // Only a plateau reached straight from a breakthrough's climb can be a pause in that climb.
  if (s.state !== 'leaving') s.brokeFromC = NaN;
  s.isShoulder = levelC < (s.brokeFromC ?? NaN) + SHOULDER_C;
  // Shoulders chain: a climb that pauses every 2-3 degC is still one climb.
  if (s.isShoulder) s.brokeFromC = levelC;
  s.shoulderSagSinceS = NaN;
  s.hasShoulderSag = false;
  s.levelC = levelC;
  // The level entered is the slow fit's, an average already: it counts as the readings it is
  // worth, so the first readings after it cannot drag it up a step that the breakthrough then
  // never clears.
  s.levelCount = Math.max(1, Math.round(ewRegressionEffectiveReadings(s.slow)));
  s.course = createEwRegression(COURSE_TAU_S);
  restartEwRegression(s.course, timeS, levelC);
  s.cusumCS = 0;
  s.residualPowerC2 = NaN;
  s.fastSlopePowerC2PerS2 = NaN;
  s.sagSinceS = NaN;
  s.fallSinceS = NaN;
  s.plateauCandidateS = NaN;
  s.hasRaisedCreep = false;
  s.creepSinceS = NaN;
  s.climbSag = noClimbSag();
  forgetTypedReadings(s);
  s.kneeSinceS = NaN;
  s.riseSinceS = NaN;
  s.stallReason = null;
  sink.setState('plateau', timeS);
  let receiver: number | undefined;
  const index = s.plan.length > 0 ? plateauWindowIndex(s, levelC) : -1;
  const isCutIn = index >= 0 && isMainCutAhead(s, index);
  if (index >= 0) {
    s.receiverIndex = index;
    receiver = s.plan[index]!.receiver;
  }
  sink.emit(timeS, 'plateau', levelC, isMixedLevel(s, levelC) ? 'mixed' : undefined, receiver);
  if (isCutIn) raiseCutInto(s, timeS, index, levelC, sink);
}

/**
 * The plan's window for a plateau at `levelC`: the main cut (from the current receiver on, up
 * to the window above the level's) whose compound's expected plateau holds the level, where
 * the plan names its compounds and the charge's plateaus are known; else the window holding the
 * level, never one back. The windows are the planner's estimate of the head at total reflux, and
 * a thermometer in a real head reads a degree or so off it (bulb placement, heat lost from the
 * head), so a component's plateau can sit just outside its window: just above it, it is still
 * that cut (no silent move to the intermediate receiver, whose change the breakthrough then
 * announces); just below the next one, it is that cut beginning.
 */
function plateauWindowIndex(s: WatcherState, levelC: number): number {
  const byWindow = Math.max(s.receiverIndex, windowIndexAt(s.plan, levelC));
  const bands = s.expectedPlateaus ?? [];
  for (let k = Math.max(0, s.receiverIndex); k < s.plan.length && k <= byWindow + 1; k++) {
    const { compound, fromC } = s.plan[k]!;
    if (k > byWindow && levelC < fromC - BELOW_WINDOW_C) break;
    if (typeof compound === 'string' && bands.some((b) => b.label === compound && b.reachesPurity !== false && holdsLevel(b, levelC))) return k;
  }
  return byWindow;
}

/** A level outside every expected plateau of the charge (none known: never). */
function isMixedLevel(s: WatcherState, levelC: number): boolean {
  return isOutsideExpected(s.expectedPlateaus ?? [], levelC);
}

/**
 * A level only the charge's last plateau (the one reaching highest) can have: nothing heavier is
 * to come, so a rise off it is the head still settling onto that component, or the pot running
 * low (the falling-away stall's business), not a cut.
 */
function isLastLevel(s: WatcherState, levelC: number): boolean {
  const expected = s.expectedPlateaus ?? [];
  if (expected.length < 2) return false;
  const last = expected.reduce((a, b) => (b.toC > a.toC ? b : a));
  return holdsLevel(last, levelC) && !expected.some((p) => p !== last && holdsLevel(p, levelC));
}

/**
 * A head at a mixed level above a band the column cannot bring to purity (the charge says so):
 * the head of a column too short for the charge, passing from one component to the next as a
 * simple distillation's does, climbing steadily for half an hour or more with nothing to settle on.
 */
function isShortColumnClimb(s: WatcherState, levelC: number): boolean {
  return isMixedLevel(s, levelC) && (s.expectedPlateaus ?? []).some((p) => p.reachesPurity === false && p.fromC <= levelC);
}

/**
 * The plateau rules for a stretch the watcher never declared a plateau (a climb's sag or knee, a
 * typed pair): it raises a breakthrough of its own unless it lies within `sameClimbC` above the
 * level the last breakthrough left (the same climb), at a mixed level, at the last one, or just
 * above a main cut's window a climb has just been cut out of (isLeftMainCut).
 */
function isOwnCut(s: WatcherState, timeS: number, levelC: number, sameClimbC: number): boolean {
  return !(levelC < (s.brokeFromC ?? NaN) + sameClimbC || isMixedLevel(s, levelC) || isLastLevel(s, levelC) || isLeftMainCut(s, timeS, levelC, sameClimbC));
}

/**
 * A stretch within `sameClimbC` above the main cut's window a climb crossed out of in the last
 * LEFT_MAIN_CUT_S: the slow stretch that crossing ended (the cut announced that rise), not a cut
 * of its own. Later, the crossing was early (a head creeping over its window's top as the
 * component still comes over) and the stretch's own breakthrough is the cut.
 */
function isLeftMainCut(s: WatcherState, timeS: number, levelC: number, sameClimbC: number): boolean {
  return levelC < (s.leftMainCutC ?? NaN) + sameClimbC && timeS - (s.leftMainCutS ?? NaN) <= LEFT_MAIN_CUT_S;
}

function watchPlateau(s: WatcherState, timeS: number, valueC: number, dtS: number, fastC: number, sink: EventSink): void {
  const o = s.options;
  const residualC = valueC - s.levelC;
  // Readings in whole degrees straddle the level a step apart: the band must hold both sides.
  const trackC = Math.max(LEVEL_TRACK_C, LEVEL_TRACK_STEPS * (s.resolutionC ?? 0));
  if (Math.abs(fastC - s.levelC) < trackC) {
    // A running mean of the plateau's readings (the level is entered while the bulb still
    // settles, and typed readings are few), in a long plateau a slow follower of its creep.
    s.levelCount++;
    const gain = Math.max(1 / s.levelCount, -Math.expm1(-dtS / LEVEL_TAU_S));
    s.levelC += gain * (valueC - s.levelC);
  }
  // The wander of the smoothed head about the plateau's own course, away from sags and rises
  // (which are the signal, and would raise the threshold just when it matters). About the
  // course, not the level: a steady creep is no noise, and counted as one it raised the
  // threshold, and the delay, of exactly the plateaus that end in a slow climb.
  // States saved before the course existed carry none: it starts here then.
  s.course ??= createEwRegression(COURSE_TAU_S);
  const offsetC = fastC - plateauCourseC(s.course, timeS, s.levelC, o.flatSlopeCPerS);
  if (Math.abs(offsetC) < WANDER_BAND_C) {
    ewRegressionAdd(s.course, timeS, valueC);
    // Each square counted at most ROBUST_CLIP times the power so far (winsorised): the edges of
    // a pre-cut sag pass through the band with a steep slope, and must not raise the noise the
    // breakthrough is then measured against.
    const powerGain = -Math.expm1(-dtS / RESIDUAL_POWER_TAU_S);
    const power = Number.isNaN(s.residualPowerC2) ? offsetC * offsetC : Math.min(offsetC * offsetC, ROBUST_CLIP * s.residualPowerC2);
    s.residualPowerC2 = Number.isNaN(s.residualPowerC2) ? power : s.residualPowerC2 + powerGain * (power - s.residualPowerC2);
    const slopePower = s.fastSlopePowerC2PerS2 ?? NaN;
    const slope2 = ewRegressionSlope(s.fast) ** 2;
    const clippedSlope2 = Number.isNaN(slopePower) ? slope2 : Math.min(slope2, ROBUST_CLIP * slopePower);
    s.fastSlopePowerC2PerS2 = Number.isNaN(slopePower) ? clippedSlope2 : slopePower + powerGain * (clippedSlope2 - slopePower);
  }
  s.cusumCS = Math.max(0, s.cusumCS + (residualC - o.breakthroughReferenceC) * dtS);
  // The rise past the deadband is the lesser of the fast fit and the reading, as for the peak
  // (watchRising): a fit of few readings, typed ones above all, extrapolates its slope past the
  // last reading (a whole-degree reading of 53 read as 53.9, the plateau at 52.1).
  const riseC = Math.min(fastC, valueC) - s.levelC;
  // The CUSUM's alarm (slow rises) waits for the fast level to have held past the deadband for
  // a few readings (an on-delay): on a slow rise a noise peak crosses it first. Sharp climbs
  // and typed readings need no wait.
  if (!(fastC - s.levelC >= o.breakthroughMinRiseC)) s.riseSinceS = NaN;
  else if (Number.isNaN(s.riseSinceS ?? NaN)) s.riseSinceS = timeS;
  // Below the deadband neither detector may alarm: their tests (a Newton solve for the CUSUM's
  // threshold) are left for the few readings past it.
  if (riseC >= o.breakthroughMinRiseC && isLeavingPlateau(s, timeS)) {
    s.peakC = fastC;
    s.plateauCandidateS = NaN;
    s.fallSinceS = NaN;
    const isPause = s.levelC < (s.brokeFromC ?? NaN) + PAUSE_C && timeS - s.stateSinceS < PAUSE_S;
    if (isPause) s.brokeFromC = s.levelC;
    // A mixed stretch (its level as it stands now, refined since it was entered) ends with no
    // component's cut: the head climbs on to the next component's plateau, whose end is the cut.
    // Off the last component's plateau there is no next receiver to change to.
    if (isMixedLevel(s, s.levelC) || isLastLevel(s, s.levelC)) {
      sink.setState('leaving', timeS);
      return;
    }
    if ((s.isShoulder || isPause) && !s.hasShoulderSag) {
      // Still the climb the last alarm announced: carry on rising without a second alarm.
      sink.setState('leaving', timeS);
      return;
    }
    raiseBreakthrough(s, timeS, s.levelC, fastC, sink);
    return;
  }
  const interval = s.intervalS;
  if (holdsFor(s, timeS, fastC < s.levelC - o.fallAwayC, Math.max(o.fallAwayHoldS, 1.5 * interval))) {
    fallAway(s, timeS, fastC, sink);
    return;
  }
  if (s.isShoulder) watchShoulderSag(s, timeS, fastC);
  if (fastC < s.levelC - LONG_SAG_C) {
    if (Number.isNaN(s.sagSinceS)) s.sagSinceS = timeS;
    else if (timeS - s.sagSinceS >= LONG_SAG_S) fallAway(s, timeS, fastC, sink);
  } else {
    s.sagSinceS = NaN;
  }
}

/** Marks a shoulder the head has sagged on (SHOULDER_SAG_C): its next rise is a cut. */
function watchShoulderSag(s: WatcherState, timeS: number, fastC: number): void {
  const depthC = Math.max(SHOULDER_SAG_C, SHOULDER_SAG_NOISE_SDS * readingNoiseC(s) * ewLevelNoisePerSd(s.fast.tauS, s.intervalS));
  if (!(fastC < s.levelC - depthC)) {
    s.shoulderSagSinceS = NaN;
    return;
  }
  // States saved before the shoulder's sag existed carry none: it starts here then.
  if (Number.isNaN(s.shoulderSagSinceS ?? NaN)) s.shoulderSagSinceS = timeS;
  if (timeS - s.shoulderSagSinceS! >= Math.max(SHOULDER_SAG_HOLD_S, s.intervalS)) s.hasShoulderSag = true;
}

/**
 * Whether the head, past the deadband, is leaving the plateau: two detectors, the CUSUM on the
 * level for slow rises (after its on-delay) and the fast slope for sharp climbs, a climb far
 * steeper than any plateau creep needing no more evidence. The slope's noise is never taken
 * below a share of what the reading noise alone gives the fast fit.
 */
function isLeavingPlateau(s: WatcherState, timeS: number): boolean {
  const o = s.options;
  const whiteC2S = (Number.isNaN(s.innovationVarC2) ? 0 : s.innovationVarC2) * s.intervalS;
  const wanderC2S = Number.isNaN(s.residualPowerC2) ? 0 : DIFFUSION_SAFETY * 2 * WANDER_TAU_S * s.residualPowerC2;
  const diffusionC2S = Math.max(DIFFUSION_FLOOR_C2S, whiteC2S, wanderC2S);
  const thresholdCS = cusumThresholdForMeanTime(o.breakthroughReferenceC, diffusionC2S, o.targetFalseAlarmIntervalH * 3600);
  const riseHoldS = s.intervalS >= o.handIntervalS ? 0 : Math.min(RISE_HOLD_READINGS * s.intervalS, RISE_HOLD_MAX_S);
  if (s.cusumCS >= thresholdCS && timeS - s.riseSinceS! >= riseHoldS) return true;
  const whiteSlopeSdCPerS = readingNoiseC(s) * ewSlopeNoisePerSd(s.fast.tauS, s.intervalS);
  const slopeSdCPerS = Math.max(Math.sqrt(s.fastSlopePowerC2PerS2 ?? NaN), WHITE_SLOPE_FLOOR * whiteSlopeSdCPerS);
  return Number.isFinite(slopeSdCPerS) && ewRegressionSlope(s.fast) >= CLIMB_FACTOR * o.flatSlopeCPerS + CLIMB_SLOPE_SDS * slopeSdCPerS;
}

/** The head is leaving the plateau at `levelC`: change receivers (the next one, with a plan). */
function raiseBreakthrough(s: WatcherState, timeS: number, levelC: number, fastC: number, sink: EventSink): void {
  s.brokeFromC = levelC;
  let receiver: number | undefined;
  // A stretch never declared a plateau (a climb's sag or knee, a typed pair) is placed by its
  // level as a declared one would have been.
  if (s.plan.length > 0 && s.state !== 'plateau') s.receiverIndex = plateauWindowIndex(s, levelC);
  if (s.plan.length > 0 && s.receiverIndex + 1 < s.plan.length) {
    s.receiverIndex++;
    receiver = s.plan[s.receiverIndex]!.receiver;
  }
  sink.setState('leaving', timeS);
  sink.emit(timeS, 'breakthrough', fastC, undefined, receiver);
}

/**
 * The pre-cut sag in a climb: a short cut that creeps 1-2 degC/min is never steady enough to be
 * declared a plateau, but it still ends as the issue describes a cut, the head sagging a degree
 * or so as the lighter component runs out and then climbing as the next one arrives. A sag of
 * CLIMB_SAG_C below the climb's peak, held, then the head a breakthrough's rise above that peak
 * within CLIMB_SAG_WITHIN_S, is that stretch's breakthrough, its level the peak. Only once a
 * plateau has been seen or SAG_AFTER_VAPOUR_S after the vapour (the arrival's overshoot is no
 * cut), and with the plateau rules: none
 * within a shoulder of the last breakthrough's level, off a mixed level, or off the last one.
 * Returns whether it raised one.
 */
function watchClimbSag(s: WatcherState, timeS: number, valueC: number, fastC: number, sink: EventSink): boolean {
  if (!(Number.isFinite(s.levelC) || timeS - s.vapourTimeS >= SAG_AFTER_VAPOUR_S)) return false;
  // States saved before the sag existed carry none: it starts here then.
  const sag = (s.climbSag ??= noClimbSag());
  if (Number.isNaN(sag.fromC)) {
    // The noise's share of the depth only once the head is down by the least depth (every reading
    // of a climb passes here).
    if (!(fastC < s.peakC - CLIMB_SAG_C) || !(fastC < s.peakC - CLIMB_SAG_NOISE_SDS * readingNoiseC(s) * ewLevelNoisePerSd(s.fast.tauS, s.intervalS))) {
      sag.belowSinceS = NaN;
      return false;
    }
    if (Number.isNaN(sag.belowSinceS)) sag.belowSinceS = timeS;
    if (timeS - sag.belowSinceS >= Math.max(CLIMB_SAG_HOLD_S, 2 * s.intervalS)) {
      sag.fromC = s.peakC;
      sag.atS = timeS;
      sag.belowSinceS = NaN;
    }
    return false;
  }
  if (timeS - sag.atS > CLIMB_SAG_WITHIN_S) {
    sag.fromC = NaN;
    return false;
  }
  if (!(Math.min(fastC, valueC) >= sag.fromC + s.options.breakthroughMinRiseC)) return false;
  const levelC = sag.fromC;
  sag.fromC = NaN;
  if (!isOwnCut(s, timeS, levelC, SHOULDER_C)) return false;
  raiseBreakthrough(s, timeS, levelC, fastC, sink);
  return true;
}

/**
 * A knee in a climb: a short cut in a column of a few plates, the head slowing to a creep of a
 * degree or two a minute as a component comes over and never steady enough to be declared a
 * plateau, then climbing again at a breakthrough's pace with no sag between. A slow stretch
 * (slow fit under KNEE_SLOW_C_PER_S) held max(KNEE_HOLD_S, two intervals), then the slope past
 * KNEE_EXIT_C_PER_S with the head (the lesser of fit and reading) a breakthrough's rise above
 * the stretch's mean, is that cut's breakthrough, its level the mean. Sensor readings only
 * (typed ones have watchTypedPair), once a plateau has been seen or KNEE_AFTER_VAPOUR_S after
 * the vapour came (vapour's arrival slows onto the first plateau), with the plateau rules:
 * none within a pause of the last breakthrough's level, off a mixed level or off the last one.
 * Returns whether it raised one.
 */
function watchClimbKnee(s: WatcherState, timeS: number, valueC: number, fastC: number, slopeCPerS: number, sink: EventSink): boolean {
  if (!(Number.isFinite(s.levelC) || timeS - s.vapourTimeS >= KNEE_AFTER_VAPOUR_S) || s.intervalS >= s.options.handIntervalS) return false;
  // States saved before the knee existed carry none: it starts here then.
  const sinceS = s.kneeSinceS ?? NaN;
  if (slopeCPerS < -s.options.flatSlopeCPerS) {
    // Falling is no creep.
    s.kneeSinceS = NaN;
    return false;
  }
  if (slopeCPerS <= KNEE_SLOW_C_PER_S) {
    if (Number.isNaN(sinceS)) {
      s.kneeSinceS = timeS;
      s.kneeSumC = 0;
      s.kneeCount = 0;
    }
    s.kneeSumC = (s.kneeSumC ?? 0) + valueC;
    s.kneeCount = (s.kneeCount ?? 0) + 1;
    s.kneeEndS = NaN;
    return false;
  }
  if (Number.isNaN(sinceS)) return false;
  // The stretch has ended: it must have lasted, and the climb must take off soon after.
  if (Number.isNaN(s.kneeEndS ?? NaN)) s.kneeEndS = timeS;
  const endS = s.kneeEndS!;
  if (endS - sinceS < Math.max(KNEE_HOLD_S, 2 * s.intervalS) || timeS - endS > KNEE_WITHIN_S) {
    s.kneeSinceS = NaN;
    return false;
  }
  const levelC = s.kneeSumC! / s.kneeCount!;
  if (!(slopeCPerS > KNEE_EXIT_C_PER_S && Math.min(fastC, valueC) >= levelC + s.options.breakthroughMinRiseC)) return false;
  s.kneeSinceS = NaN;
  if (!isOwnCut(s, timeS, levelC, PAUSE_C)) return false;
  raiseBreakthrough(s, timeS, levelC, fastC, sink);
  return true;
}

/** The reading noise as the innovations of the fast fit give it (0 before any). Units: degC. */
function readingNoiseC(s: WatcherState): number {
  return Number.isNaN(s.innovationVarC2) ? 0 : Math.sqrt(s.innovationVarC2);
}

/**
 * The plateau's fitted course carried on to `timeS`. Its creep counts upward only and no faster
 * than the slope that let the plateau be declared, and the course never runs below the level:
 * a sag or a slow wander must not bend it, or the wander about it would read too small.
 * Units: degC.
 */
function plateauCourseC(course: EwRegression, timeS: number, levelC: number, flatSlopeCPerS: number): number {
  if (!(course.w > 0)) return levelC;
  const creepCPerS = Math.min(Math.max(0, ewRegressionSlope(course)), flatSlopeCPerS);
  return Math.max(levelC, ewRegressionLevel(course) + creepCPerS * (timeS - course.originS));
}

function fallAway(s: WatcherState, timeS: number, fastC: number, sink: EventSink): void {
  s.troughC = fastC;
  s.climbSag = noClimbSag();
  s.kneeSinceS = NaN;
  s.fallSinceS = NaN;
  s.sagSinceS = NaN;
  sink.setState('stalled', timeS);
  s.stallReason = 'falling-away';
  sink.emit(timeS, 'stall', fastC, 'falling-away');
}

function watchRecovery(s: WatcherState, timeS: number, fastC: number, sink: EventSink): void {
  s.troughC = Math.min(s.troughC, fastC);
  if (holdsFor(s, timeS, fastC >= s.troughC + RECOVERY_RISE_C, Math.max(RECOVERY_HOLD_S, 1.5 * s.intervalS))) {
    s.fallSinceS = NaN;
    s.stallReason = null;
    s.peakC = fastC;
    s.plateauCandidateS = NaN;
    sink.setState('rising', timeS);
  }
}

function watchPlannedCut(s: WatcherState, timeS: number, fastC: number, sink: EventSink): void {
  const window = s.plan[s.receiverIndex];
  if (window === undefined || s.receiverIndex + 1 >= s.plan.length || !(fastC >= window.toC + CUT_MARGIN_C)) {
    s.cutSinceS = NaN;
    return;
  }
  if (s.state !== 'plateau' && isLeavingNextCut(s, timeS)) {
    s.cutSinceS = NaN;
    return;
  }
  if (Number.isNaN(s.cutSinceS)) s.cutSinceS = timeS;
  // Sparse (typed) readings cannot wait for a second one: the crossing itself is the cut.
  if (timeS - s.cutSinceS < (s.intervalS >= CUT_HOLD_S ? 0 : CUT_HOLD_S)) return;
  s.cutSinceS = NaN;
  s.windowDwellS = 0;
  s.receiverIndex = Math.max(s.receiverIndex + 1, windowIndexAt(s.plan, fastC));
  const isClimbing = s.state !== 'plateau';
  if (!isClimbing) {
    // The plateau's end, announced by the plan: no breakthrough after it for the same rise.
    s.brokeFromC = s.levelC;
    s.peakC = fastC;
    s.plateauCandidateS = NaN;
    s.fallSinceS = NaN;
    sink.setState('leaving', timeS);
  }
  const isRaised = sink.emit(timeS, 'cut', fastC, undefined, s.plan[s.receiverIndex]!.receiver);
  // A climb out of a main cut's window, announced, is that cut's end (isLeftMainCut). One held
  // back as a second cut within the minute and a half announces nothing, and before any plateau
  // the head may still be settling onto the first component above a window planned under it.
  if (isClimbing && isRaised && typeof window.compound === 'string' && Number.isFinite(s.levelC)) {
    s.leftMainCutC = window.toC;
    s.leftMainCutS = timeS;
  }
}

/**
 * A stretch of the climb never declared a plateau that the next main cut's component holds
 * (plateauWindowIndex, at or beyond the window the head is crossing into), ending now: a climb's
 * sag waiting for its rise (watchClimbSag), or a slow stretch long enough to be a cut
 * (watchClimbKnee). The head is leaving that component, not arriving, and the stretch's own
 * breakthrough will name the receiver after it.
 */
function isLeavingNextCut(s: WatcherState, timeS: number): boolean {
  const isNextCut = (levelC: number): boolean => isMainCutAhead(s, plateauWindowIndex(s, levelC));
  const sag = s.climbSag;
  if (sag && Number.isFinite(sag.fromC) && timeS - sag.atS <= CLIMB_SAG_WITHIN_S && isNextCut(sag.fromC)) return true;
  const sinceS = s.kneeSinceS ?? NaN;
  if (!Number.isFinite(sinceS) || !((s.kneeCount ?? 0) > 0)) return false;
  const endS = Number.isFinite(s.kneeEndS ?? NaN) ? s.kneeEndS! : timeS;
  return endS - sinceS >= Math.max(KNEE_HOLD_S, 2 * s.intervalS) && isNextCut(s.kneeSumC! / s.kneeCount!);
}

// An on-delay: `condition` must hold from `fallSinceS` for `holdS` (one timer: the states
// that use it never need two at once).
function holdsFor(s: WatcherState, timeS: number, condition: boolean, holdS: number): boolean {
  if (!condition) {
    s.fallSinceS = NaN;
    return false;
  }
  if (Number.isNaN(s.fallSinceS)) s.fallSinceS = timeS;
  return timeS - s.fallSinceS >= holdS;
}
