/** What the watcher can report. `cut` is raised only with a cut plan. */
export type EventKind = 'vapour' | 'plateau' | 'breakthrough' | 'stall' | 'sensor-fault' | 'cut';

/** Detector states, in the project's vocabulary. */
export type WatchState = 'cold' | 'rising' | 'plateau' | 'leaving' | 'stalled' | 'fault';

export type StallReason = 'no-vapour' | 'falling-away' | 'creeping';
/** A plateau outside every expected plateau of the charge: a mixed stretch. */
export type PlateauReason = 'mixed';
export type FaultReason = 'no-valid-readings' | 'open-thermocouple' | 'erratic' | 'stuck';
/** A planned cut found as the head settled on the next main cut's component, short of its
 * window (the plan's estimate and the head's thermometer a degree or so apart). */
export type CutReason = 'settled';
/** Why an event was raised, where its kind alone does not say. */
export type EventReason = StallReason | FaultReason | PlateauReason | CutReason;

/** Why a reading carries no valid temperature: passed in, or found by the watcher. */
export type InvalidReason = 'missing' | 'fault-code' | 'out-of-range';

/** One receiver's head-temperature window, from the science core's planner. Units: degC. */
export interface CutWindow {
  receiver: number;
  fromC: number;
  toC: number;
  /** The compound of a main cut (an expected plateau's label), null for an intermediate cut;
   * absent where the plan does not say. */
  compound?: string | null;
}

/**
 * Where the head may hold while one component of the charge (or an azeotrope) comes over, from
 * the science core's planner. Units: degC.
 */
export interface ExpectedPlateau {
  label: string;
  fromC: number;
  toC: number;
  /** False where the column cannot bring this component over 90 % pure (the planner's estimate
   * at total reflux): a steady head in the band alone is then a mixed stretch. Absent: true. */
  reachesPurity?: boolean;
}

/** What the watcher may be told about a run: its cut plan, and where plateaus can lie. */
export interface WatchContext {
  plan?: readonly CutWindow[];
  expectedPlateaus?: readonly ExpectedPlateau[];
}

export interface WatchEvent {
  /** Time the event was raised (the latest reading). Units: s since heat on. */
  timeS: number;
  kind: EventKind;
  /** Filtered head temperature; for `plateau` its level. Units: degC. */
  headC: number;
  /** An alarm needs the chemist to act; the rest is information, shown once. */
  isAlarm: boolean;
  /** What happened, in a few words (eventWording.ts, the app's wording too). */
  message: string;
  /** What to do, in a few words (every alarm names its action). */
  action: string;
  reason?: EventReason;
  /** With a plan: the receiver to change to (breakthrough, cut) or the one collecting (plateau). */
  receiver?: number;
}
