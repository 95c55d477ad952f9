import { createEwRegression, type EwRegression } from './ewRegression.ts';
import { createSpikeFilter, type SpikeFilter } from './spikeFilter.ts';
import { createStuckReadings, type StuckReadings } from './stuckReading.ts';
import type { CutWindow, EventKind, ExpectedPlateau, FaultReason, InvalidReason, StallReason, WatchState } from './types.ts';
import type { WatcherOptions } from './watcherOptions.ts';

/** Everything the watcher knows: plain data, so it saves as JSON and restores exactly. */
export interface WatcherState {
  version: 1;
  options: WatcherOptions;
  plan: CutWindow[];
  /** Where the charge's plateaus can lie; none known: every plateau may be a component's.
   * Absent in states saved before it existed. */
  expectedPlateaus?: ExpectedPlateau[];
  state: WatchState;
  stateSinceS: number;
  stallReason: StallReason | null;
  faultReason: FaultReason | null;
  preFaultState: WatchState;
  firstTimeS: number;
  lastTimeS: number;
  lastValidS: number;
  lastAcceptedS: number;
  latestInvalid: InvalidReason | null;
  /** Running mean time between readings. Units: s. */
  intervalS: number;
  /** The last valid reading, and the smallest change ever seen between two valid in a row: the
   * readings' resolution (0.25 degC boards, whole degrees typed), for the stuck test and the
   * plateau level. Absent in older saves. Units: degC. */
  lastValidC?: number;
  resolutionC?: number;
  recoverCount: number;
  spikes: SpikeFilter;
  fast: EwRegression;
  slow: EwRegression;
  /** The jump that last restarted the slow fit, over the time it took: the fit's slope until it
   * has a second reading (NaN: not known). Absent in older saves. Units: degC/s. */
  slowJumpCPerS?: number;
  /** Running variance of one-step prediction errors of the fast filter. Units: degC^2. */
  innovationVarC2: number;
  baselineC: number;
  vapourTimeS: number;
  levelC: number;
  /** Readings averaged into the level so far. */
  levelCount: number;
  plateauCandidateS: number;
  /** Since when the head has been a breakthrough's rise above the plateau. Absent in older saves. */
  riseSinceS?: number;
  peakC: number;
  troughC: number;
  fallSinceS: number;
  sagSinceS: number;
  cusumCS: number;
  residualPowerC2: number;
  /** Mean square of the fast slope on the plateau, its noise. Absent in older saves. Units: (degC/s)^2. */
  fastSlopePowerC2PerS2?: number;
  /** The plateau's own course (level and creep), fitted to its readings near the line.
   * Absent in states saved before it existed. */
  course?: EwRegression;
  /** Level of the plateau the last breakthrough left (NaN before any). Units: degC. */
  brokeFromC: number;
  /** The top of the main cut's window a climb last crossed out of, and when (the cut that ended
   * that main cut while no plateau was declared). NaN: none. Absent in older saves. Units: degC, s. */
  leftMainCutC?: number;
  leftMainCutS?: number;
  /** The current plateau is a shoulder of the climb out of that one: it raises no breakthrough
   * unless the head sagged on it. */
  isShoulder: boolean;
  /** Since when the head has been below the shoulder's level by a sag's depth (NaN: it is not),
   * and whether it has sagged there: its next rise is a cut of its own. Absent in older saves. Units: s. */
  shoulderSagSinceS?: number;
  hasShoulderSag?: boolean;
  hasRaisedNoVapour: boolean;
  hasRaisedCreep: boolean;
  /** Since when the head has climbed slowly without settling. Units: s. */
  creepSinceS: number;
  /** A sag in a climb (climbSag in stateMachine.ts): the peak it fell from, when it was
   * confirmed, and since when the head has been below that peak by a sag's depth. NaN: none.
   * Absent in states saved before it existed. Units: degC, s. */
  climbSag?: ClimbSag;
  /** A slow stretch in a climb (watchClimbKnee in stateMachine.ts): since when the climb has
   * been slow, when it ended (NaN: not yet), and the sum and count of its readings (NaN, 0:
   * none). Absent in older saves. Units: s, degC. */
  kneeSinceS?: number;
  kneeEndS?: number;
  kneeSumC?: number;
  kneeCount?: number;
  /** Typed readings while climbing (watchTypedPair in stateMachine.ts): the last one, and the
   * mean of the last two when they agreed (NaN: they did not). Absent in older saves. Units: degC. */
  typedPrevC?: number;
  typedPairC?: number;
  /** The typed reading before `typedPrevC` while climbing (watchTypedJump). Absent in older saves. Units: degC. */
  typedBeforeC?: number;
  /** The run of identical readings (stuckReading.ts). Absent in states saved before it existed. */
  stuck?: StuckReadings;
  receiverIndex: number;
  cutSinceS: number;
  /** Time the head has spent in the current receiver's window since it was last below it.
   * Absent in older saves. Units: s. */
  windowDwellS?: number;
  lastAlarmS: Partial<Record<EventKind, number>>;
}

export interface ClimbSag {
  fromC: number;
  atS: number;
  belowSinceS: number;
}

export function noClimbSag(): ClimbSag {
  return { fromC: NaN, atS: NaN, belowSinceS: NaN };
}

export function createWatcherState(options: WatcherOptions, plan: CutWindow[], expectedPlateaus: ExpectedPlateau[] = []): WatcherState {
  return {
    version: 1, options, plan, expectedPlateaus,
    state: 'cold', stateSinceS: NaN, stallReason: null, faultReason: null, preFaultState: 'cold',
    firstTimeS: NaN, lastTimeS: NaN, lastValidS: NaN, lastAcceptedS: NaN, latestInvalid: null,
    intervalS: NaN, lastValidC: NaN, resolutionC: NaN, recoverCount: 0,
    spikes: createSpikeFilter(), fast: createEwRegression(4), slow: createEwRegression(30), slowJumpCPerS: NaN,
    innovationVarC2: NaN, baselineC: NaN, vapourTimeS: NaN, levelC: NaN, levelCount: 0, plateauCandidateS: NaN, riseSinceS: NaN,
    peakC: NaN, troughC: NaN, fallSinceS: NaN, sagSinceS: NaN, cusumCS: 0,
    residualPowerC2: NaN, fastSlopePowerC2PerS2: NaN, course: createEwRegression(300), brokeFromC: NaN, isShoulder: false, shoulderSagSinceS: NaN, hasShoulderSag: false,
    hasRaisedNoVapour: false, hasRaisedCreep: false, creepSinceS: NaN, climbSag: noClimbSag(), typedPrevC: NaN, typedPairC: NaN, typedBeforeC: NaN, kneeSinceS: NaN, kneeEndS: NaN, kneeSumC: 0, kneeCount: 0, stuck: createStuckReadings(), receiverIndex: -1, cutSinceS: NaN, windowDwellS: 0, lastAlarmS: {},
  };
}
