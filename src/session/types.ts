/** A reading as the live run takes it: seconds since heat on, degC or NaN for no valid reading. */
export interface SessionReading {
  timeS: number;
  headC: number;
}

/** Anything that brings readings in: a sensor bridge, typed readings, the simulated still. */
export interface LiveSource {
  readonly kind: string;
  readonly label: string;
  /** Delivers readings in batches until stopped or the signal aborts. */
  start(onReadings: (batch: SessionReading[]) => void, signal: AbortSignal): void;
  stop(): void;
  /**
   * No reading for this long raises the sensor alarm, where the session's default (5 s) does not
   * fit: typed readings come a minute or more apart. Units: ms
   */
  readonly silenceLimitMs?: number;
  /** State saved with the run so a reopened app can carry the source on (the simulator has one). */
  snapshot?(): unknown;
}

/** What the run watcher reports (DESIGN.md event kinds). */
export interface WatcherEvent {
  time_s: number;
  event: string;
  head_c: number | null;
  [detail: string]: unknown;
}

/** The detector as the live run uses it: one reading in, zero or more events out. */
export interface RunWatcher {
  push(timeS: number, headC: number): WatcherEvent[];
  /** cold, rising, plateau, leaving, stalled or fault (DESIGN.md). */
  readonly stateName: string;
  /** The level of the plateau the head is on, when it is on one. Units: degC */
  readonly plateauC: number | null;
  toState(): unknown;
}
