// A TruthSource built on the column simulator: every corpus run is a simulateBatchStill run of
// the spec's mixture, column, heat and pressure, with ground truth from its annotations.
// Simulations cost 0.1-1 s each, so their truth is cached under .bench/ (gitignored), keyed by
// the spec and the version below.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import {
  APPARATUS_DEFAULTS, MissingUnifacDataError, componentDataFor, preferredColumnEquilibrium, findAzeotropes, findCompound, findPlateaus,
  molesFromAmounts, planCuts, simulateBenchStill, tSatK, type BatchStillRun, type Compound, type ConstantBoilingVapour,
  type HeatStep,
} from '../src/science/index.ts';
import { toRunPlan, type RunPlan } from '../src/run/index.ts';
import { createRandom } from '../src/science/sensorModel/index.ts';
import type { PurityInterval, RunTruth, TruthEvent } from '../src/signal/scoring/index.ts';
import type { CorpusRunSpec, TruthSource, TruthSourceResult } from './corpus.ts';

const VERSION = 'sim-truth-4';
const CACHE_DIR = '.bench/simulated-truth';

/** How a spec becomes a simulation: charge, reflux, boil-up and the heat schedule. */
interface SimulationPlan {
  compounds: Compound[];
  chargeMl: number[];
  refluxRatio: number;
  roomK: number;
  /** Vapour reaching the head once warm, scaled by the spec's heat. Units: mL/min. */
  boilupMlPerMin: number;
}

const runPlans = new Map<number, RunPlan>();

/**
 * The plan the app would make for a corpus run's charge on Prepare (the science core's planner,
 * UNIFAC where it can): its receiver windows and expected plateaus, as the app's plan carries
 * them to the watcher. Made once per run (keyed by its seed), as every detector column asks.
 */
export function runPlanFor(spec: CorpusRunSpec): RunPlan {
  const known = runPlans.get(spec.seed);
  if (known) return known;
  const plan = planFor(spec);
  const chargeMol = molesFromAmounts(plan.compounds, plan.chargeMl.map((ml) => ml * 1e-6), 'volume');
  const total = chargeMol.reduce((a, b) => a + b, 0);
  const input = { compounds: plan.compounds, x: chargeMol.map((n) => n / total), chargeMol: total, pPa: spec.pressurePa, plates: spec.plates };
  let cut;
  try {
    cut = planCuts({ ...input, model: 'unifac' });
  } catch (error) {
    if (!(error instanceof MissingUnifacDataError)) throw error;
    cut = planCuts({ ...input, model: 'ideal' });
  }
  const runPlan = toRunPlan(cut, spec.pressurePa, spec.plates);
  runPlans.set(spec.seed, runPlan);
  return runPlan;
}

function planFor(spec: CorpusRunSpec): SimulationPlan {
  const r = createRandom(spec.seed ^ 0x51a7);
  const compounds = spec.components.map((c) => findCompound(c.name));
  const totalMl = 25 + 35 * r.uniform();
  const weights = compounds.map(() => 0.5 + r.uniform());
  const sum = weights.reduce((a, b) => a + b, 0);
  return {
    compounds,
    chargeMl: weights.map((w) => (totalMl * w) / sum),
    refluxRatio: 1 + 4 * r.uniform(),
    roomK: 273.15 + 17 + 9 * r.uniform(),
    // 2.4-5.6 mL/min off the condenser: a brisk bench rate (common practice: 1-2 drops a second).
    boilupMlPerMin: 4 * spec.heat,
  };
}

function simulate(plan: SimulationPlan, spec: CorpusRunSpec, heat: (fullW: number) => HeatStep[], durationS: number): BatchStillRun {
  const { equilibrium } = preferredColumnEquilibrium(plan.compounds);
  const components = componentDataFor(plan.compounds);
  const chargeMol = molesFromAmounts(plan.compounds, plan.chargeMl.map((ml) => ml * 1e-6), 'volume');
  // Heat set so the heaviest component still comes over at the boil-up: a mantle turned up
  // enough for the whole run, as at the bench, so vapour never stops for want of heat alone.
  const heaviest = plan.compounds.map((c) => tSatK(c, spec.pressurePa).tK).reduce((k, t, i, all) => (t > all[k]! ? i : k), 0);
  return simulateBenchStill({
    equilibrium, components, chargeMol, pressurePa: spec.pressurePa, roomK: plan.roomK, plates: spec.plates, refluxRatio: plan.refluxRatio,
    boilupMlPerMin: plan.boilupMlPerMin, heatForX: plan.compounds.map((_, i) => (i === heaviest ? 1 : 0)), heat, durationS, sampleIntervalS: 1,
  }).run;
}

/**
 * When vapour reached the thermometer. The simulator flags it once the vapour flow into the
 * head passes its threshold (vapourSeenMolPerS), but the thinner vapour ahead of that already
 * bathes the bulb (the model weights its heat by the squared flow ratio), and in a brisk run
 * the bulb has climbed most of the way to the vapour's temperature, tens of degrees, before
 * the flag. In the model nothing else can warm the bulb: it and the head glass start at room
 * temperature and the glass is heated only by vapour condensing on it. So the first warming of
 * the noise-free reading by 1 degC above its heat-on value is the vapour at the bulb; the flag
 * when that comes first. Units: s.
 */
function vapourArrivalS(run: BatchStillRun): number | null {
  const flagS = run.annotations.vapourArrivalS;
  if (flagS === null) return null;
  const { timeS, headK } = run.trace;
  const roomK = headK[0]!;
  for (let i = 0; i < timeS.length && timeS[i]! < flagS; i++) if (headK[i]! >= roomK + 1) return timeS[i]!;
  return flagS;
}

/**
 * The azeotropes of the charge's pairs at the run's pressure, in the model the run was simulated
 * with, as vapours that come over as one component (the pair's larger part). A constant-boiling
 * mixture holds the head as steady as a pure component does, and the chemist cuts when it is
 * spent; the 90 %-one-component rule would count the methanol-toluene azeotrope (about
 * 88 mol % methanol) in some runs and not in others as the pressure moves it across 90 %.
 */
function constantBoilingVapours(compounds: readonly Compound[], pressurePa: number): ConstantBoilingVapour[] {
  const { model } = preferredColumnEquilibrium(compounds);
  const vapours: ConstantBoilingVapour[] = [];
  for (const pair of findAzeotropes(compounds, pressurePa, model)) {
    const a = compounds.findIndex((c) => c.name === pair.pair[0]);
    const b = compounds.findIndex((c) => c.name === pair.pair[1]);
    for (const azeotrope of pair.azeotropes) {
      const y = compounds.map((_, i) => (i === a ? azeotrope.x1 : i === b ? 1 - azeotrope.x1 : 0));
      vapours.push({ component: azeotrope.x1 >= 0.5 ? a : b, y });
    }
  }
  return vapours;
}

/** Noise-free truth from a run, cut at endS: purity intervals, vapour, and the stalls given. */
function truthFrom(run: BatchStillRun, plan: SimulationPlan, spec: CorpusRunSpec, endS: number, stalls: TruthEvent[], extraEvents: TruthEvent[] = []): RunTruth {
  const n = Math.min(run.trace.timeS.length, Math.floor(endS) + 1);
  const timeS = run.trace.timeS.slice(0, n);
  const headC = run.trace.headK.slice(0, n).map((k) => k - 273.15);
  const a = run.annotations;
  const cutAt = Math.min(endS, ...stalls.map((s) => s.timeS));
  const purityIntervals: PurityInterval[] = [];
  const plateaus = findPlateaus(run.trace, APPARATUS_DEFAULTS.vapourSeenMolPerS, 0.9, constantBoilingVapours(plan.compounds, spec.pressurePa));
  for (const p of plateaus) {
    // The first plateau starts as the vapour arrives: its level is the steady part after the jump.
    const startS = a.vapourArrivalS !== null && Math.abs(p.fromS - a.vapourArrivalS) < 60 ? p.fromS + 60 : p.fromS;
    const stretch = a.vapourAtHead.find((v) => v.fromS <= p.fromS + 1 && v.toS >= p.fromS);
    const stopS = Math.min(p.toS, stretch?.toS ?? p.toS, cutAt);
    if (stopS - startS >= 60) purityIntervals.push({ startS, endS: stopS, component: plan.compounds[p.component]!.name });
  }
  const events: TruthEvent[] = [...extraEvents];
  const arrivalS = vapourArrivalS(run);
  if (arrivalS !== null && arrivalS < endS) events.push({ kind: 'vapour', timeS: arrivalS });
  events.push(...stalls.filter((s) => s.timeS < endS));
  return { timeS, headC, purityIntervals, events };
}

function build(spec: CorpusRunSpec): RunTruth {
  const plan = planFor(spec);
  const r = createRandom(spec.seed ^ 0x7a11);
  const steady = (w: number): HeatStep[] => [{ fromS: 0, heatW: w }];
  // Long enough for the pot to run dry at the boil-up, with the reflux taken into account.
  const chargeMl = plan.chargeMl.reduce((a, b) => a + b, 0);
  const durationS = Math.min(8 * 3600, 1800 + (2 * chargeMl * (plan.refluxRatio + 1)) / (plan.boilupMlPerMin / 60));
  switch (spec.scenario) {
    case 'slow-start': {
      // A mantle left low: the pot barely boils for 40-60 min, then the chemist turns it up.
      const upS = 2400 + 1200 * r.uniform();
      const run = simulate(plan, spec, (w) => [{ fromS: 0, heatW: 0.15 * w }, { fromS: upS, heatW: w }], durationS + upS);
      const arrival = vapourArrivalS(run);
      const end = endBeforeDry(run, durationS + upS);
      const slow: TruthEvent[] = arrival !== null && arrival > 900 ? [{ kind: 'stall', timeS: arrival, cause: 'slow-start' }] : [];
      return truthFrom(run, plan, spec, end, [], slow);
    }
    case 'heat-lost': {
      const normal = simulate(plan, spec, steady, durationS);
      const first = normal.annotations.plateaus[0];
      if (!first) return truthFrom(normal, plan, spec, endBeforeDry(normal, durationS), []);
      const dry = normal.annotations.potDryS ?? durationS;
      const offS = first.fromS + 300 + (Math.min(dry, normal.annotations.plateaus.at(-1)!.toS) - first.fromS - 600) * r.uniform();
      const tailS = 900 + 600 * r.uniform();
      const run = simulate(plan, spec, (w) => [{ fromS: 0, heatW: w }, { fromS: offS, heatW: 0 }], offS + tailS);
      const stall = heatLostStall(offS, run.annotations.potDryS);
      return truthFrom(run, plan, spec, stall.timeS + tailS, [stall]);
    }
    case 'pot-dry': {
      const run = simulate(plan, spec, steady, durationS);
      const dry = run.annotations.potDryS;
      if (dry === null) return truthFrom(run, plan, spec, durationS, []);
      return truthFrom(run, plan, spec, Math.min(durationS, dry + 900 + 600 * r.uniform()), [{ kind: 'stall', timeS: dry, cause: 'pot-dry' }]);
    }
    default: {
      // 'normal', and 'creeping': a climb that never settles is not something this column model
      // makes on demand, so those specs run as normal runs (the synthetic corpus keeps them).
      const run = simulate(plan, spec, steady, durationS);
      return truthFrom(run, plan, spec, endBeforeDry(run, durationS), []);
    }
  }
}

/**
 * The stall a heat-lost run records: the heat going off at `offS`, unless its pot ran dry first
 * (`potDryS`). The normal run the moment is drawn from may end before its pot would run dry, and
 * a heat loss drawn after that comes when the head has already fallen away: that stall is the
 * dry pot's, at its own time.
 */
export function heatLostStall(offS: number, potDryS: number | null): TruthEvent {
  if (potDryS !== null && potDryS < offS) return { kind: 'stall', timeS: potDryS, cause: 'pot-dry' };
  return { kind: 'stall', timeS: offS, cause: 'heat-lost' };
}

// A normal run ends as the chemist stops heating, a little before the pot would run dry.
function endBeforeDry(run: BatchStillRun, durationS: number): number {
  const dry = run.annotations.potDryS;
  return dry === null ? durationS : Math.max(0, dry - 120);
}

interface CachedTruth {
  version: string;
  purityIntervals: PurityInterval[];
  events: TruthEvent[];
  /** Float32 head temperatures on the 1 s grid, base64. */
  headC: string;
}

/** The column-simulator truth source, with its disk cache. */
export const simulatedTruthSource: TruthSource = (spec) => {
  const key = createHash('sha1').update(VERSION + JSON.stringify(spec)).digest('hex').slice(0, 20);
  const path = `${CACHE_DIR}/${key}.json`;
  let truth: RunTruth;
  if (existsSync(path)) {
    const cached = JSON.parse(readFileSync(path, 'utf8')) as CachedTruth;
    const buffer = Buffer.from(cached.headC, 'base64');
    const headC = Float64Array.from(new Float32Array(buffer.buffer, buffer.byteOffset, buffer.byteLength / 4));
    truth = { timeS: Float64Array.from(headC, (_, i) => i), headC, purityIntervals: cached.purityIntervals, events: cached.events };
  } else {
    truth = build(spec);
    mkdirSync(CACHE_DIR, { recursive: true });
    const cached: CachedTruth = { version: VERSION, purityIntervals: truth.purityIntervals, events: truth.events, headC: Buffer.from(Float32Array.from(truth.headC).buffer).toString('base64') };
    writeFileSync(path, JSON.stringify(cached));
  }
  const boilingPointsC = spec.components.map((c) => tSatK(findCompound(c.name), spec.pressurePa).tK - 273.15);
  return { truth: withPreCutSags(truth, spec.seed), boilingPointsC } satisfies TruthSourceResult;
};

/**
 * The pre-cut sag the corpus asks for: as the lighter component runs out, the vapour at
 * the bulb thins for a minute or so and the head dips 1-3 degC before the next component's vapour
 * pushes it up. The column model keeps the vapour flow steady through a cut and so never sags;
 * the sag is laid on its noise-free head temperature here, as on the synthetic corpus (60 % of
 * cuts, 1-3 degC, 30-90 s, a half-sine ending where the rise begins), from the run's seed so the
 * corpus stays the same run to run. Truth is then taken from the sagged trace as from any other.
 */
function withPreCutSags(truth: RunTruth, seed: number): RunTruth {
  const r = createRandom(seed ^ 0x5a65);
  const headC = Float64Array.from(truth.headC);
  const { timeS } = truth;
  for (const interval of truth.purityIntervals) {
    const hasSag = r.uniform() < 0.6;
    const depthC = 1 + 2 * r.uniform();
    const sagS = 30 + 60 * r.uniform();
    if (!hasSag) continue;
    const inside: number[] = [];
    for (let i = 0; i < timeS.length; i++) if (timeS[i]! >= interval.startS && timeS[i]! <= interval.endS) inside.push(headC[i]!);
    if (inside.length === 0) continue;
    inside.sort((a, b) => a - b);
    const levelC = inside[inside.length >> 1]!;
    let cross = -1;
    for (let i = 0; i < timeS.length; i++) {
      if (timeS[i]! >= interval.startS && headC[i]! > levelC + 1.0) {
        cross = i;
        break;
      }
    }
    if (cross < 0) continue;
    // The rise begins at the last reading before the crossing still within 0.25 degC of the level.
    let rise = cross;
    while (rise > 0 && headC[rise - 1]! > levelC + 0.25) rise--;
    const riseS = timeS[rise]!;
    const fromS = riseS - sagS;
    if (fromS < interval.startS + 60) continue;
    for (let i = 0; i < timeS.length; i++) {
      const t = timeS[i]!;
      if (t > fromS && t < riseS) headC[i] = headC[i]! - depthC * Math.sin((Math.PI * (t - fromS)) / sagS);
    }
  }
  return { ...truth, headC };
}
