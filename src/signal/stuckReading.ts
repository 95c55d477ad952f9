/**
 * A reading stuck where it must move: a live thermocouple always wavers by its noise, so the
 * very same value, reading after reading, far longer than that noise allows, is a frozen meter
 * or a board repeating its last value, not a steady head. The test is a run length, set from
 * the sensor's own noise and resolution: with Gaussian noise of standard deviation sigma about
 * any level, two readings fall in one quantisation step q at most with probability
 * p = erf(q / (2 sqrt(2) sigma)) (the step centred on the level), so n identical readings in a
 * row have probability at most p^(n-1). The run that is a fault is the n with p^(n-1) below
 * the odds that keep this test to one false alarm in about a thousand hours: runs of one value
 * start at most once a reading, and readings under a second apart count as one (below).
 * Sigma comes from the steps between readings less the rounding's own share, q^2 / 12
 * (Sheppard's correction). Under half a step of noise the readings cannot show it: where the
 * head sits near the middle of a step they hold one value as long as it stays there, and as the
 * head creeps across a step they flicker and the steps overstate the noise. On such a quiet
 * board a plateau's stillness is a fault only after ten minutes as well. Quantised to steps far
 * wider than the noise (whole degrees, a board of 0.05 degC noise in 0.25 degC steps), p nears 1
 * and the test asks for hours.
 * While the head climbs off a plateau, the test is the climb itself: a head rising at r degC/s
 * steps a reading of resolution q on every q / r seconds, so the same value for as long as eight
 * such steps (and at least 10 readings and 30 s) is frozen, whatever the noise.
 */

/** What the test keeps between readings (plain data: it saves with the watcher). */
export interface StuckReadings {
  /** The watcher state the statistics below belong to; they start again when it changes. */
  state: string;
  /** The value repeated now. Units: degC. */
  valueC: number;
  /** When it first came. Units: s. */
  sinceS: number;
  /** Readings of it in a row. */
  count: number;
  /** The noise when the run began, from this stretch's readings (the quiet run cannot lower it). Units: degC. */
  sigmaC: number;
  /** Times the value has changed in this stretch: the sensor has shown that it wavers here. */
  changes: number;
  /** Sum of squared steps between readings in this stretch, and their number. Units: degC^2. */
  stepSquares: number;
  steps: number;
  /** How fast the head was climbing when the value came (the watcher's fast slope; NaN: not
   * known). Absent in older saves. Units: degC/s. */
  climbCPerS?: number;
  /** The noise of the plateau this run began on, once that plateau had shown it (NaN: it began
   * elsewhere): the board does not get quieter when the watcher's state changes, so a run that
   * began on a plateau and outlasts it is still judged by it. Absent in older saves. Units: degC. */
  runSigmaC?: number;
}

/** False stuck alarms an hour that the run length allows, on a plateau of white noise: a
 * fiftieth of the 0.05 for all alarms. */
const FALSE_PER_HOUR = 1e-3;
/** Readings closer than this are not independent (boards average over a second or so). Units: s. */
const INDEPENDENT_S = 1;
/** Noise under this share of the resolution is a quiet board: the readings cannot show it. */
const QUIET_SHARE = 0.5;
/** On a quiet board, a plateau's stillness must last this long as well. Units: s. */
const QUIET_MIN_S = 600;
/** The value must have changed this often in the stretch before its stillness means anything.
 * Ten, not twenty: a board that hung in a plateau's first minute (twenty changes take a loud
 * board read every 2 s about that long) was otherwise never judged at all. */
const MIN_CHANGES = 10;
/** Never fewer identical readings, nor a shorter time, than these. */
const MIN_READINGS = 10;
const MIN_SECONDS = 30;
/** Steps larger than this are changes of course or spikes, not noise. Units: degC. */
const NOISE_STEP_MAX_C = 1;
/** A climb the reading must follow: 6 degC/min, a breakthrough under way (a plateau creeps at
 * under 1 degC/min). Units: degC/s. */
const CLIMB_MIN_C_PER_S = 0.1;
/** Resolution steps a climbing head must have moved before its stillness is a fault. */
const CLIMB_STEPS = 8;

export function createStuckReadings(): StuckReadings {
  return { state: '', valueC: Number.NaN, sinceS: Number.NaN, count: 0, sigmaC: Number.NaN, changes: 0, stepSquares: 0, steps: 0, climbCPerS: Number.NaN, runSigmaC: Number.NaN };
}

// Abramowitz and Stegun 7.1.26 (error below 1.5e-7), enough for a run-length threshold.
function erf(x: number): number {
  const t = 1 / (1 + 0.3275911 * Math.abs(x));
  const y = 1 - ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t * Math.exp(-x * x);
  return x >= 0 ? y : -y;
}

/** The chance a run of one value may have of being noise, for readings `intervalS` apart: runs
 * start at most once a reading (once a second for faster ones), so FALSE_PER_HOUR over the
 * runs started in an hour. */
export function stuckOdds(intervalS: number): number {
  return (FALSE_PER_HOUR * Math.max(INDEPENDENT_S, Number.isFinite(intervalS) ? intervalS : INDEPENDENT_S)) / 3600;
}

/** The noise of readings in steps of `quantumC` whose steps between readings show `stepSigmaC`:
 * less the rounding's own variance q^2 / 12 (Sheppard's correction). Units: degC. */
export function noiseLessRounding(stepSigmaC: number, quantumC: number): number {
  return quantumC > 0 ? Math.sqrt(Math.max(0, stepSigmaC * stepSigmaC - (quantumC * quantumC) / 12)) : stepSigmaC;
}

/** Identical readings in a row that noise of `sigmaC` at resolution `quantumC` all but never
 * gives: p^(n-1) below `odds` (by default those for a reading a second). */
export function stuckRunLength(sigmaC: number, quantumC: number, odds = stuckOdds(INDEPENDENT_S)): number {
  if (!(sigmaC > 0) || !(quantumC > 0)) return Number.POSITIVE_INFINITY;
  const p = erf(quantumC / (2 * Math.SQRT2 * sigmaC));
  if (!(p < 1)) return Number.POSITIVE_INFINITY;
  return Math.max(MIN_READINGS, 1 + Math.ceil(Math.log(odds) / Math.log(p)));
}

/**
 * One valid reading, in watcher state `state`, with the readings' resolution (`quantumC`, the
 * smallest change the watcher has seen between two), the head's climb rate as the watcher last
 * saw it (`climbCPerS`) and the usual time between readings (`intervalS`). On a plateau the run
 * is judged against the noise, measured on the plateau itself (a climb's steps and its rounding
 * look like noise and would make a quiet plateau look frozen), where a frozen reading would hide
 * the breakthrough; while leaving a plateau, against the climb the value came in. Returns true
 * once the run is a fault. Readings closer than a second are not counted as independent (boards
 * average, so their noise is correlated over a second or so): on a plateau the run must also last
 * a second for each reading the test asks for.
 */
export function pushStuckReading(t: StuckReadings, timeS: number, valueC: number, state: string, quantumC: number, climbCPerS = Number.NaN, intervalS = Number.NaN): boolean {
  if (state !== t.state) {
    t.state = state;
    t.changes = 0;
    t.stepSquares = 0;
    t.steps = 0;
  }
  if (valueC !== t.valueC) {
    if (Number.isFinite(t.valueC)) {
      const step = Math.abs(valueC - t.valueC);
      if (step <= NOISE_STEP_MAX_C) {
        t.changes++;
        t.stepSquares += step * step;
        t.steps++;
      }
    }
    t.valueC = valueC;
    t.sinceS = timeS;
    t.count = 1;
    t.climbCPerS = climbCPerS;
    // Successive steps of white noise have variance 2 sigma^2; the identical readings count as steps of 0.
    t.sigmaC = t.steps > 0 ? Math.sqrt(t.stepSquares / t.steps / 2) : Number.NaN;
    t.runSigmaC = state === 'plateau' && t.changes >= MIN_CHANGES ? t.sigmaC : Number.NaN;
    return false;
  }
  t.count++;
  t.steps++;
  const stillS = timeS - t.sinceS;
  // Leaving a plateau only (the watcher passes a climb still 'rising' five minutes after the
  // vapour came as 'leaving'): vapour arriving lands on the first plateau within seconds, and a
  // quiet board then repeats one value at once (the climb's last rate says nothing of its end).
  if (state === 'rising') return false;
  if (state === 'leaving') {
    const climb = t.climbCPerS ?? Number.NaN;
    if (climb >= CLIMB_MIN_C_PER_S && quantumC > 0 && t.count >= MIN_READINGS && stillS >= MIN_SECONDS && climb * stillS >= CLIMB_STEPS * quantumC) return true;
  }
  // On the plateau that has shown its noise, by that noise; elsewhere (a board hung as the
  // breakthrough began, which the watcher then follows out of the plateau and onto the frozen
  // value as if it were the next one), by the noise of the plateau the run began on.
  const stepSigmaC = state === 'plateau' && t.changes >= MIN_CHANGES ? t.sigmaC : (t.runSigmaC ?? Number.NaN);
  if (!Number.isFinite(stepSigmaC)) return false;
  const sigmaC = noiseLessRounding(stepSigmaC, quantumC);
  const needed = stuckRunLength(sigmaC, quantumC, stuckOdds(intervalS));
  const isQuiet = sigmaC < QUIET_SHARE * quantumC;
  return t.count >= needed && stillS >= Math.max(isQuiet ? QUIET_MIN_S : MIN_SECONDS, needed - 1);
}
