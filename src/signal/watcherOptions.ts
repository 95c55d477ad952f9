/** Tuning of the run watcher. Every field has a default chosen on the benchmark (README.md). */
export interface WatcherOptions {
  /** Target mean time between false breakthrough alarms on a steady plateau (the issue allows
   * 0.05 false alarms per hour from every cause, 20 h; the CUSUM's share is 50 h). Units: h. */
  targetFalseAlarmIntervalH: number;
  /** CUSUM reference: half the shift worth detecting (truth is level + 1.0 degC). Units: degC. */
  breakthroughReferenceC: number;
  /** Smallest rise above the plateau level that may alarm (a deadband). Units: degC. */
  breakthroughMinRiseC: number;
  /** Rise above the room baseline that means vapour at the bulb. Units: degC. */
  vapourRiseC: number;
  /** Heating time with no vapour before a stall. Units: s since heat on. */
  noVapourStallS: number;
  /** Fall below the plateau (or the peak while rising) that is a stall, not a sag. Units: degC. */
  fallAwayC: number;
  /** A fall must hold this long before a stall (on-delay). Units: s. */
  fallAwayHoldS: number;
  /** Time rising without settling before a creeping stall. Units: s. */
  creepStallS: number;
  /** |slope| below which the head is steady. Units: degC/s. */
  flatSlopeCPerS: number;
  /** A steady head must last this long to be a plateau. Units: s. */
  plateauHoldS: number;
  /** Shortest gap with no valid reading that is a sensor fault. Units: s. */
  faultAfterMinS: number;
  /** Spikes rejected within a minute that make the sensor erratic. */
  erraticSpikesPerMinute: number;
  /** Readings outside this range are invalid (full-scale codes, shorts). Units: degC. */
  validMinC: number;
  validMaxC: number;
  /** Readings this far apart or more are taken as typed by hand: no spike hold. Units: s. */
  handIntervalS: number;
  /** No two alarms of one kind closer than this (last guard against chattering). Units: s. */
  minAlarmGapS: number;
}

export const defaultWatcherOptions: Readonly<WatcherOptions> = Object.freeze({
  targetFalseAlarmIntervalH: 50,
  breakthroughReferenceC: 0.5,
  breakthroughMinRiseC: 1.0,
  vapourRiseC: 6,
  noVapourStallS: 1800,
  fallAwayC: 4,
  fallAwayHoldS: 20,
  // 1200 on the synthetic corpus; in the column simulator a 0-2 plate column's climb through a
  // mixed stretch takes 20-25 min before it settles on the next component (six creeping stalls,
  // all in normal runs, at 1200 s), and 1500 s still finds the synthetic climbs that never
  // settle (their window ends 2400 s after the climb starts; 2000 s found them too).
  creepStallS: 1500,
  // 0.006 on the synthetic corpus; the column simulator's few-plate runs creep 0.5-1 degC/min
  // while the top vapour is still >= 90 % one component, and 0.015 (0.9 degC/min) lets those
  // count as plateaus (benchmark figures in README.md).
  flatSlopeCPerS: 0.015,
  plateauHoldS: 45,
  faultAfterMinS: 15,
  erraticSpikesPerMinute: 6,
  validMinC: -40,
  validMaxC: 400,
  handIntervalS: 20,
  minAlarmGapS: 90,
});

/** Defaults overlaid with `overrides`; each value checked so NaN fails too. */
export function resolveWatcherOptions(overrides: Partial<WatcherOptions> = {}): WatcherOptions {
  const options = { ...defaultWatcherOptions, ...overrides };
  for (const [name, value] of Object.entries(options)) {
    if (name === 'validMinC') continue;
    if (!(value > 0)) throw new RangeError(`watcher option ${name} must be > 0`);
  }
  if (!(options.validMaxC > options.validMinC)) throw new RangeError('validMaxC must exceed validMinC');
  return options;
}
