/**
 * The demo still: a playback of one column-simulator run of the demo charge, ethyl acetate
 * recovered from butyl acetate (a solvent-recovery scenario of our own), or of a charge the
 * chemist prepared, read through a thermocouple board's model (probe lag, a little noise,
 * 0.25 degC converter steps).
 *
 * The run is simulated once per set of options (a few hundred ms, then memoised), on a 1 s grid
 * from heat on until well after the pot has run dry; `step(dt)` moves a playback clock along it,
 * so any time acceleration costs only interpolation. A snapshot is just the playback position
 * (and what it showed), so a reopened app carries on exactly where it was.
 *
 * Pure: time comes in as the step length; no clock is read.
 */
import { findCompound } from '../compounds/index.ts';
import { molesFromAmounts } from '../vle/index.ts';
import { columnEquilibrium, preferredColumnEquilibrium } from '../column/columnEquilibrium.ts';
import { componentDataFor } from '../column/componentDataFor.ts';
import { simulateBenchStill } from '../column/simulateBenchStill.ts';
import { createRandom } from '../sensorModel/random.ts';
import { firstOrderLag } from '../sensorModel/firstOrderLag.ts';
import { demoMixtureWords } from './demoMixtureWords.ts';

/** A charge for the still by library names: plain data, so it saves with the run. */
export interface DemoCharge {
  names: string[];
  /** Units: mol, in the order of `names` */
  chargeMol: number[];
}

export interface DemoStillOptions {
  /** What is in the pot; the demo charge when absent. */
  charge?: DemoCharge;
  /** Room temperature. Units: degC */
  roomC?: number;
  /** Lab pressure. Units: Pa */
  pressurePa?: number;
  /** Theoretical stages of the column (0 = simple distillation). */
  plates?: number;
  /** Vapour reaching the still head once the column is warm, as liquid. Units: mL/min */
  boilupMlPerMin?: number;
  /** Reflux ratio L/D at the head. */
  refluxRatio?: number;
  /** Board noise, standard deviation. Units: degC */
  noiseSdC?: number;
  /** Converter step of the board. Units: degC */
  quantumC?: number;
  /** Probe time constant. Units: s */
  probeTauS?: number;
  /** Seed of the board noise. */
  seed?: number;
}

export type DemoPhase = 'heating' | 'column' | 'distilling' | 'dry';

export interface DemoStillState {
  timeS: number;
  phase: DemoPhase;
  /** Head temperature as the board reports it (lagged, noisy, in converter steps). Units: degC */
  headC: number;
  /** Pot liquid temperature. Units: degC */
  potC: number;
  /** Pot liquid left. Units: mol */
  potMol: number;
  /** Light-component mole fraction in the pot. */
  potLightFraction: number;
  /** Distillate collected so far. Units: mL */
  distilledMl: number;
}

export const demoMixture = {
  ...demoMixtureWords,
  compounds: demoMixtureWords.components.map((name) => findCompound(name)),
};

/**
 * Everything needed to carry a demo run on after the app was closed: the playback position and
 * the options the still was made with (older snapshots have none: the demo charge).
 */
export type DemoStillSnapshot = DemoStillState & { options?: DemoStillOptions };

export interface DemoStill {
  readonly state: DemoStillState;
  /** The full internal state, to save and pass back to createDemoStill. */
  snapshot(): DemoStillSnapshot;
  /** Advances the playback by dtS seconds and returns the new state. */
  step(dtS: number): DemoStillState;
}

interface Playback {
  readonly headC: Float64Array;
  readonly potC: Float64Array;
  readonly potMol: Float64Array;
  readonly potLight: Float64Array;
  readonly distilledMl: Float64Array;
  readonly boilsS: number;
  readonly vapourS: number;
  readonly dryS: number;
}

const DURATION_S = 4 * 3600;
const cache = new Map<string, Playback>();

function simulateDemo(charge: DemoCharge | undefined, roomC: number, pressurePa: number, plates: number, boilupMlPerMin: number, reflux: number, probeTauS: number): Playback {
  const key = JSON.stringify([charge ?? null, roomC, pressurePa, plates, boilupMlPerMin, reflux, probeTauS]);
  const cached = cache.get(key);
  if (cached) return cached;
  // The demo's own charge keeps Raoult's law, as it always has; a prepared charge gets UNIFAC where it can.
  const compounds = charge ? charge.names.map((name) => findCompound(name)) : [...demoMixture.compounds];
  const equilibrium = charge ? preferredColumnEquilibrium(compounds).equilibrium : columnEquilibrium(compounds, 'ideal');
  const components = componentDataFor(compounds);
  const chargeMol = charge ? [...charge.chargeMol] : molesFromAmounts(compounds, demoMixture.chargeMl.map((ml) => ml * 1e-6), 'volume');
  const { run } = simulateBenchStill({
    equilibrium, components, chargeMol, pressurePa, roomK: roomC + 273.15,
    plates, refluxRatio: reflux, boilupMlPerMin, durationS: DURATION_S, sampleIntervalS: 1,
  });
  const t = run.trace;
  const truthC = t.headK.map((k) => k - 273.15);
  const potMol = t.potMol[0]!.map((_, i) => t.potMol.reduce((sum, series) => sum + series[i]!, 0));
  const playback: Playback = {
    headC: firstOrderLag(t.timeS, truthC, probeTauS),
    potC: t.potK.map((k) => k - 273.15),
    potMol,
    potLight: t.potMol[0]!.map((n, i) => (potMol[i]! > 0 ? n / potMol[i]! : 0)),
    distilledMl: t.distilledM3.map((m) => m * 1e6),
    boilsS: run.annotations.potBoilingS[0] ?? Infinity,
    vapourS: run.annotations.vapourArrivalS ?? Infinity,
    dryS: run.annotations.potDryS ?? Infinity,
  };
  cache.set(key, playback);
  return playback;
}

function at(series: Float64Array, tS: number): number {
  const last = series.length - 1;
  if (!(tS > 0)) return series[0]!;
  if (tS >= last) return series[last]!;
  const i = Math.floor(tS);
  return series[i]! + (tS - i) * (series[i + 1]! - series[i]!);
}

/**
 * A demo still. Resuming from a snapshot, the still is made with the snapshot's options when none
 * are given, so a reopened run plays on the same charge at the same pressure.
 */
export function createDemoStill(given: DemoStillOptions = {}, from?: DemoStillSnapshot): DemoStill {
  const options = Object.keys(given).length === 0 && from?.options ? from.options : given;
  const charge = options.charge;
  if (charge) {
    if (charge.names.length < 1 || charge.names.length !== charge.chargeMol.length) throw new RangeError('the charge needs one amount per compound');
    if (!charge.chargeMol.every((n) => n > 0)) throw new RangeError('every amount in the charge must be > 0 mol');
  }
  const roomC = options.roomC ?? 21;
  const pressurePa = options.pressurePa ?? 101_325;
  if (!(pressurePa > 0)) throw new RangeError('pressure must be > 0 Pa');
  // The simulator counts whole stages; an estimate from packing height is rarely whole.
  const plates = Math.round(options.plates ?? 4);
  if (!(plates >= 0)) throw new RangeError('plates must be >= 0');
  const boilup = options.boilupMlPerMin ?? 4;
  if (!(boilup > 0)) throw new RangeError('boil-up must be > 0 mL/min');
  const reflux = options.refluxRatio ?? 2;
  const noiseSdC = options.noiseSdC ?? 0.05;
  const quantumC = options.quantumC ?? 0.25;
  const seed = options.seed ?? 1;
  const playback = simulateDemo(charge, roomC, pressurePa, plates, boilup, reflux, options.probeTauS ?? 1);
  let timeS = from && from.timeS >= 0 ? from.timeS : 0;

  const phaseAt = (tS: number): DemoPhase =>
    tS >= playback.dryS ? 'dry' : tS >= playback.vapourS ? 'distilling' : tS >= playback.boilsS ? 'column' : 'heating';

  // Noise drawn from the time itself, so a restored playback reads exactly what it would have.
  const readingAt = (tS: number): number => {
    const noise = noiseSdC * createRandom(Math.imul(seed, 0x9e3779b1) ^ Math.round(tS * 1000)).normal();
    const value = at(playback.headC, tS) + noise;
    return quantumC > 0 ? Math.round(value / quantumC) * quantumC : value;
  };

  const current = (): DemoStillState => ({
    timeS,
    phase: phaseAt(timeS),
    headC: readingAt(timeS),
    potC: at(playback.potC, timeS),
    potMol: at(playback.potMol, timeS),
    potLightFraction: at(playback.potLight, timeS),
    distilledMl: at(playback.distilledMl, timeS),
  });

  return {
    get state() {
      return current();
    },
    snapshot: () => ({ ...current(), options }),
    step(dtS: number) {
      if (!(dtS >= 0)) throw new RangeError('time step must be >= 0 s');
      timeS += dtS;
      return current();
    },
  };
}
