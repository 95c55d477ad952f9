// The benchmark corpus: seeded runs with ground truth. The truth source is pluggable so the
// column simulator can replace the synthetic profiles without touching the scoring.
import { createRandom, handReadings, sensorReadings, type Random, type SensorOptions } from '../src/science/sensorModel/index.ts';
import { truthWindows, type RunTruth } from '../src/signal/scoring/index.ts';
import { syntheticTruth, type SyntheticPlateau, type SyntheticProfile } from '../tests/support/syntheticTruth.ts';

export interface Component {
  name: string;
  /** Normal boiling point. Units: degC. */
  normalBoilingC: number;
}

// CRC Handbook 95th ed., normal boiling points (as copied in the shared reference table
// antoine_tb.tsv, Tb_K - 273.15).
const SOLVENTS: Record<string, Component> = {
  dichloromethane: { name: 'dichloromethane', normalBoilingC: 39.8 },
  acetone: { name: 'acetone', normalBoilingC: 56.08 },
  methanol: { name: 'methanol', normalBoilingC: 64.5 },
  hexane: { name: 'n-hexane', normalBoilingC: 68.72 },
  ethylAcetate: { name: 'ethyl acetate', normalBoilingC: 77.1 },
  water: { name: 'water', normalBoilingC: 99.97 },
  toluene: { name: 'toluene', normalBoilingC: 110.6 },
  pXylene: { name: 'p-xylene', normalBoilingC: 138.3 },
};
const MIXTURES: string[][] = [
  ['acetone', 'water'], ['methanol', 'water'], ['ethylAcetate', 'toluene'], ['hexane', 'toluene'],
  ['acetone', 'toluene'], ['dichloromethane', 'toluene'], ['toluene', 'pXylene'],
  ['acetone', 'ethylAcetate', 'toluene'], ['dichloromethane', 'hexane', 'toluene'],
  ['methanol', 'toluene', 'pXylene'], ['hexane', 'toluene', 'pXylene'],
];

/** What the corpus asks of a truth source for one run. */
export interface CorpusRunSpec {
  seed: number;
  components: Component[];
  /** Theoretical plates of the column, 0 to 12. */
  plates: number;
  /** Heat input relative to a usual setting, 0.6 to 1.4. */
  heat: number;
  pressurePa: number;
  scenario: 'normal' | 'slow-start' | 'heat-lost' | 'pot-dry' | 'creeping';
}

export interface TruthSourceResult {
  truth: RunTruth;
  /** Boiling point of each component at the run's pressure (for the fixed-alarm peer). */
  boilingPointsC: number[];
}

/** Anything that turns a spec into a noise-free run with truth (synthetic now, simulator later). */
export type TruthSource = (spec: CorpusRunSpec) => TruthSourceResult;

export interface CorpusRun {
  id: string;
  spec: CorpusRunSpec;
  truth: RunTruth;
  boilingPointsC: number[];
  timeS: Float64Array;
  headC: Float64Array;
  isHand: boolean;
  /** Nominal time between readings. Units: s. */
  intervalS: number;
  label: string;
}

// Boiling points move about 0.3-0.5 degC per kPa near one atmosphere (common practice).
const C_PER_KPA = 0.37;

/** Synthetic profiles shaped by the spec: a test generator, not a column model. */
export const syntheticTruthSource: TruthSource = (spec) => {
  const r = createRandom(spec.seed ^ 0x5eed);
  const boilingPointsC = spec.components.map((c) => c.normalBoilingC + C_PER_KPA * (spec.pressurePa / 1000 - 101.325));
  const plates = spec.plates;
  const plateaus: SyntheticPlateau[] = boilingPointsC.map((bp) => ({
    // A bulb set a little high reads below the boiling point (common practice).
    levelC: bp - 1.2 * r.uniform(),
    durationS: between(r, 600, 2000) / spec.heat,
    creepC: Math.min(1.4, 0.1 + (1.2 / (plates + 1)) * r.uniform()),
    sagC: r.uniform() < 0.6 ? between(r, 1, 3) : 0,
    sagS: between(r, 30, 90),
    riseS: (90 + 900 / (plates + 1.5)) * between(r, 0.7, 1.3) / spec.heat,
  }));
  const roomC = between(r, 17, 26);
  const slow = spec.scenario === 'slow-start';
  const profile: SyntheticProfile = {
    roomC, preWarmC: between(r, 0, 1.5),
    // Heat-up and climbing the column take minutes to over twenty; an hour is a slow start.
    vapourArrivalS: slow ? between(r, 2400, 3600) : Math.min(1500, between(r, 180, 1080) / Math.sqrt(spec.heat)),
    arrivalTauS: between(r, 4, 30), plateaus, isSlowStart: slow,
    components: spec.components.map((c) => c.name),
  };
  if (spec.scenario === 'creeping') profile.creep = { rateCPerS: between(r, 0.8, 3) / 60, durationS: between(r, 2400, 3000) };
  if (spec.scenario === 'pot-dry') profile.ending = { kind: 'pot-dry', tailS: between(r, 600, 1200), fallTauS: between(r, 150, 600) };
  if (spec.scenario === 'heat-lost') {
    const total = plateaus.reduce((sum, p) => sum + p.durationS + (p.riseS ?? 0), 0);
    profile.ending = { kind: 'heat-lost', atS: profile.vapourArrivalS + between(r, 300, 0.8 * total), tailS: between(r, 600, 1200), fallTauS: between(r, 150, 600) };
  }
  return { truth: syntheticTruth(profile), boilingPointsC };
};

/** `count` runs from `seed`, covering the variety of mixtures, columns and sensors. */
export function makeCorpus(seed: number, count: number, source: TruthSource = syntheticTruthSource): CorpusRun[] {
  const r = createRandom(seed);
  const runs: CorpusRun[] = [];
  for (let i = 0; i < count; i++) {
    const mixture = MIXTURES[Math.floor(r.uniform() * MIXTURES.length)]!;
    const u = r.uniform();
    const scenario: CorpusRunSpec['scenario'] = u < 0.08 ? 'slow-start' : u < 0.2 ? 'heat-lost' : u < 0.42 ? 'pot-dry' : u < 0.48 ? 'creeping' : 'normal';
    const spec: CorpusRunSpec = {
      seed: Math.floor(r.uniform() * 2 ** 32), components: mixture.map((m) => SOLVENTS[m]!),
      plates: Math.floor(r.uniform() * 13), heat: between(r, 0.6, 1.4), pressurePa: between(r, 85000, 103000), scenario,
    };
    const { truth, boilingPointsC } = source(spec);
    runs.push(observe(`run-${String(i).padStart(3, '0')}`, spec, truth, boilingPointsC, r));
  }
  return runs;
}

function observe(id: string, spec: CorpusRunSpec, truth: RunTruth, boilingPointsC: number[], r: Random): CorpusRun {
  if (r.uniform() < 0.15) {
    const roundToC = r.uniform() < 0.5 ? 0.5 : 1;
    const hand = handReadings(truth.timeS, truth.headC, { seed: Math.floor(r.uniform() * 2 ** 32), roundToC, startS: between(r, 0, 60) });
    return { id, spec, truth, boilingPointsC, ...hand, isHand: true, intervalS: 90, label: `hand, ${roundToC} degC` };
  }
  const intervalS = [0.1, 0.2, 0.5, 1, 2, 5][Math.floor(r.uniform() * 6)]!;
  const quantumC = r.uniform() < 0.7 ? 0.25 : 0;
  const options: SensorOptions = {
    seed: Math.floor(r.uniform() * 2 ** 32), intervalS, jitter: 0.1,
    lagTauS: between(r, 0.5, 4), noiseSdC: Math.exp(between(r, Math.log(0.05), Math.log(0.5))), quantumC,
  };
  if (r.uniform() < 0.5) {
    options.draftSdC = between(r, 0.03, 0.15);
    options.draftTauS = between(r, 20, 90);
  }
  if (r.uniform() < 0.5) options.spikesPerHour = between(r, 2, 12);
  if (r.uniform() < 0.4) options.dropoutsPerHour = between(r, 4, 20);
  let scored = truth;
  // Faults start in a quiet stretch of a plateau: truth after a fault cannot be seen.
  const quiet = truth.purityIntervals.find((p) => p.endS - p.startS > 800);
  const fault = r.uniform();
  if (quiet && fault < 0.08) {
    options.openFromS = between(r, quiet.startS + 200, quiet.endS - 500);
    options.openReads = r.uniform() < 0.5 ? 'nan' : 'full-scale';
    scored = truncateTruth(truth, options.openFromS);
    scored.events.push({ kind: 'sensor-fault', timeS: options.openFromS, cause: 'open-thermocouple' });
  } else if (quiet && fault < 0.14) {
    options.lostFromS = between(r, quiet.startS + 200, quiet.endS - 500);
    options.lostToS = options.lostFromS + between(r, 90, 240);
    scored = { ...truth, events: [...truth.events, { kind: 'sensor-fault', timeS: options.lostFromS, cause: 'sensor-lost' }] };
  } else if (fault < 0.2) {
    // A hung board, on a quiet plateau or while the head climbs at least 6 degC/min out of the
    // first breakthrough. Its own generator: the corpus's stream (and so every other run) stays
    // as it was.
    const rs = createRandom(spec.seed ^ 0x57c4);
    const climbing = steepClimbS(truth);
    const onClimb = climbing.length > 0 && (rs.uniform() < 0.5 || !quiet);
    const fromS = onClimb ? climbing[Math.floor(rs.uniform() * climbing.length)]! : quiet ? between(rs, quiet.startS + 200, quiet.endS - 500) : NaN;
    if (Number.isFinite(fromS)) {
      options.stuckFromS = fromS;
      scored = truncateTruth(truth, fromS);
      scored.events.push({ kind: 'sensor-fault', timeS: fromS, cause: 'stuck' });
    }
  }
  const trace = sensorReadings(truth.timeS, truth.headC, options);
  const label = `${intervalS} s, noise ${options.noiseSdC!.toFixed(2)}${quantumC ? ', 0.25 steps' : ''}`;
  return { id, spec, truth: scored, boilingPointsC, timeS: trace.timeS, headC: trace.headC, isHand: false, intervalS, label };
}

/** Times of the noise-free head climbing at least 0.1 degC/s after the first breakthrough, up to where that climb ends. */
function steepClimbS(truth: RunTruth): number[] {
  const climb = truthWindows(truth, 1, false).alarms.find((a) => a.kind === 'breakthrough');
  if (!climb) return [];
  const { timeS, headC } = truth;
  const times: number[] = [];
  for (let i = 2; i + 2 < timeS.length; i++) {
    if (timeS[i]! < climb.timeS) continue;
    const slope = (headC[i + 2]! - headC[i - 2]!) / (timeS[i + 2]! - timeS[i - 2]!);
    if (slope >= 0.1) times.push(timeS[i]!);
    else if (times.length > 0) break;
  }
  return times;
}

// Truth after a sensor fault cannot be seen: the scored truth stops there.
function truncateTruth(truth: RunTruth, atS: number): RunTruth {
  const n = truth.timeS.findIndex((t) => t >= atS);
  const end = n < 0 ? truth.timeS.length : n;
  return {
    timeS: truth.timeS.slice(0, end), headC: truth.headC.slice(0, end),
    purityIntervals: truth.purityIntervals.filter((p) => p.startS < atS).map((p) => ({ ...p, endS: Math.min(p.endS, atS) })),
    events: truth.events.filter((e) => e.timeS < atS || (e.kind === 'stall' && e.cause === 'slow-start')),
  };
}

function between(r: Random, lo: number, hi: number): number {
  return lo + (hi - lo) * r.uniform();
}
