/** How a thermocouple on an amplifier board reports a noise-free head temperature. */
export interface SensorOptions {
  /** Seed of the noise, spikes and dropouts: the same seed gives the same readings. */
  seed: number;
  /** Nominal time between readings. Units: s (0.1 to 5 for a board). */
  intervalS: number;
  /** Timing jitter as a fraction of the interval, uniform +-. Default 0.1. */
  jitter?: number;
  /** First-order probe time constant. Units: s. Default 1. */
  lagTauS?: number;
  /** White measurement noise, standard deviation. Units: degC. Default 0.1. */
  noiseSdC?: number;
  /** Draughts in the hood: a slow correlated wander (Ornstein-Uhlenbeck), sd. Units: degC. Default 0. */
  draftSdC?: number;
  /** Correlation time of the draught wander. Units: s. Default 60. */
  draftTauS?: number;
  /** Converter step; 0 for none. Units: degC. Default 0.25. */
  quantumC?: number;
  /** Mean rate of single-reading spikes (Poisson). Units: 1/h. Default 0. */
  spikesPerHour?: number;
  /** Largest spike size, either sign. Units: degC. Default 40. */
  spikeMaxC?: number;
  /** Mean rate of short dropouts (no valid reading). Units: 1/h. Default 0. */
  dropoutsPerHour?: number;
  /** Longest short dropout. Units: s. Default 6. */
  dropoutMaxS?: number;
  /** The thermocouple opens at this time and stays open. Units: s. Default: never. */
  openFromS?: number;
  /** What an open thermocouple reads: NaN (a fault flag) or the board's full-scale value. */
  openReads?: 'nan' | 'full-scale';
  /** Full-scale reading of the board. Units: degC. Default 1023.75, the top of a 12-bit
   * 0.25 degC converter (from memory). */
  fullScaleC?: number;
  /** The board hangs at this time: every later reading repeats the value it gave then (a frozen
   * meter or converter), until the end. Units: s. Default: never. */
  stuckFromS?: number;
  /** Readings are lost (NaN) from this time ... Units: s. */
  lostFromS?: number;
  /** ... to this time. Units: s. */
  lostToS?: number;
}

/** Readings as a board reports them: NaN where it gave no valid reading. */
export interface SensorTrace {
  timeS: Float64Array;
  headC: Float64Array;
  /** Times of the injected spikes (for tests and scoring). Units: s. */
  spikeTimesS: number[];
}
