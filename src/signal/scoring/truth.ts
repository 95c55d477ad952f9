/**
 * Ground truth of one run, from whatever produced the noise-free head temperature (a column
 * simulator, or the synthetic profiles of the tests). Scoring derives plateau levels and
 * breakthrough times from it exactly as the benchmark defines them.
 */
export interface RunTruth {
  /** Noise-free head temperature. Units: s, degC. */
  timeS: Float64Array;
  headC: Float64Array;
  /** Intervals in which the top vapour is at least 90 % one component. Units: s. */
  purityIntervals: PurityInterval[];
  /** Moments with a known cause: vapour arrival, heat lost, pot dry, a sensor fault ... */
  events: TruthEvent[];
}

export interface PurityInterval {
  startS: number;
  endS: number;
  component: string;
}

export type TruthEvent =
  | { kind: 'vapour'; timeS: number }
  /** heat-lost and pot-dry: the moment it happens. slow-start: timeS is vapour arrival. creeping:
   * the start of a climb that never settles. */
  | { kind: 'stall'; timeS: number; cause: 'heat-lost' | 'pot-dry' | 'slow-start' | 'creeping' }
  | { kind: 'sensor-fault'; timeS: number; cause: 'open-thermocouple' | 'sensor-lost' | 'stuck' };
