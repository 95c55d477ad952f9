// The run watcher against two naive peers on two seeded corpora with ground truth: runs of the
// column simulator (physical) and the synthetic profiles (a second, shape-driven corpus); and
// the watcher's throughput.
// Also the watcher told where the charge's plateaus can lie ("with charge"), and with the planner's cut plan
// for each run as well ("with plan").
// Run: npx tsx bench/detector.bench.ts [runs] [seed] [--quick] [--verbose] [--only simulated|synthetic]
//      [--options '{"flatSlopeCPerS": 0.01}'] [--explain 'with plan']
// --verbose lists the watcher's misses and false alarms run by run (false ones marked !!);
// --explain does the same for the detector named.
// The simulated corpus's truth is cached under .bench/ (first build takes a few minutes).
import { performance } from 'node:perf_hooks';
import { sensorReadings } from '../src/science/sensorModel/index.ts';
import { analyzeReadings, type WatchContext, type WatcherOptions } from '../src/signal/index.ts';
import { scoreRun, summariseScores, truthWindows, type RunScore, type ScoredEvent, type ScoreSummary } from '../src/signal/scoring/index.ts';
import { syntheticTruth } from '../tests/support/syntheticTruth.ts';
import { makeCorpus, syntheticTruthSource, type CorpusRun, type TruthSource } from './corpus.ts';
import { fixedAlarmPeer, slopePeer } from './peers.ts';
import { runPlanFor, simulatedTruthSource } from './simulatedTruth.ts';
import type { RunPlan } from '../src/run/index.ts';

const args = process.argv.slice(2);
const valued = new Set(['--only', '--options', '--explain']);
const positional = args.filter((a, i) => !a.startsWith('--') && !valued.has(args[i - 1] ?? ''));
const quick = process.argv.includes('--quick');
const count = Number(positional[0] ?? (quick ? 60 : 240));
const seed = Number(positional[1] ?? 20251201);
const explainIndex = args.indexOf('--explain');
const explained = explainIndex >= 0 ? args[explainIndex + 1] : process.argv.includes('--verbose') ? 'run watcher' : undefined;
const onlyIndex = args.indexOf('--only');
const only = onlyIndex >= 0 ? args[onlyIndex + 1] : undefined;

// --options '{"plateauHoldS": 30}' overrides watcher defaults, for tuning sweeps.
const optionsIndex = args.indexOf('--options');
const overrides = optionsIndex >= 0 ? (JSON.parse(args[optionsIndex + 1] ?? '{}') as Partial<WatcherOptions>) : {};

const SYNTHETIC = 'synthetic profiles';
// `told`: what a watcher column is told about the run (the peers are told nothing through it).
type Detector = { name: string; told?: (r: CorpusRun, corpus: string) => WatchContext; run: (r: CorpusRun, corpus: string) => ScoredEvent[] };
// 'with charge': the watcher told where the charge's plateaus can lie (the planner's expected
// plateaus for the run's compounds at its pressure, as the fixed-alarm peer is told the boiling
// points). 'with plan': that and the cut plan the app would make on Prepare for the run's charge
// (both corpora name library compounds; the charge is the simulated one's). A planned cut scores
// as the change-receiver alarm a breakthrough is.
// The synthetic profiles give every component a clean plateau whatever the column (they shape a
// trace, they do not model separation), so they are told the bands without the planner's word on
// which ones the column can bring to purity: that is a column-model prediction their truth ignores.
const bandsFor = (r: CorpusRun, corpus: string): RunPlan['expectedPlateaus'] => {
  const bands = runPlanFor(r.spec).expectedPlateaus;
  return corpus === SYNTHETIC ? bands?.map(({ label, fromC, toC }) => ({ label, fromC, toC })) : bands;
};
const watcher = (name: string, told: (r: CorpusRun, corpus: string) => WatchContext): Detector => ({
  name, told, run: (r, corpus) => analyzeReadings(r.timeS, r.headC, told(r, corpus), overrides),
});
const detectors: Detector[] = [
  watcher('run watcher', () => ({})),
  watcher('with charge', (r, corpus) => ({ expectedPlateaus: bandsFor(r, corpus) })),
  watcher('with plan', (r, corpus) => ({ plan: runPlanFor(r.spec).windows, expectedPlateaus: bandsFor(r, corpus) })),
  { name: 'fixed bp+3', run: (r) => fixedAlarmPeer(r.timeS, r.headC, r.boilingPointsC) },
  { name: 'MA slope', run: (r) => slopePeer(r.timeS, r.headC) },
];
const corpora: { name: string; source: TruthSource }[] = [
  { name: 'simulated (column simulator)', source: simulatedTruthSource },
  { name: SYNTHETIC, source: syntheticTruthSource },
].filter((c) => only === undefined || c.name.startsWith(only));

const fast = (r: CorpusRun): boolean => !r.isHand && r.intervalS <= 2;
const lengthH = (r: CorpusRun): number => (r.timeS[r.timeS.length - 1]! - r.timeS[0]!) / 3600;

const columns: { corpus: string; detector: string; all: ScoreSummary; fast: ScoreSummary; withCutIns: ScoreSummary }[] = [];
for (const corpus of corpora) {
  const t0 = performance.now();
  const runs = makeCorpus(seed, count, corpus.source);
  const buildS = (performance.now() - t0) / 1000;
  const hours = runs.reduce((sum, r) => sum + lengthH(r), 0);
  const readings = runs.reduce((sum, r) => sum + r.timeS.length, 0);
  const scenarios = new Map<string, number>();
  for (const r of runs) scenarios.set(r.spec.scenario, (scenarios.get(r.spec.scenario) ?? 0) + 1);
  const truths = new Map<string, number>();
  for (const r of runs) for (const a of truthWindows(r.truth, 1, r.isHand).alarms) truths.set(a.kind, (truths.get(a.kind) ?? 0) + 1);
  console.log(`${corpus.name}: ${runs.length} runs, seed ${seed}, ${hours.toFixed(1)} h, ${readings} readings (built in ${buildS.toFixed(1)} s)`);
  console.log(`  scenarios: ${[...scenarios].map(([k, v]) => `${k} ${v}`).join(', ')}; hand-read runs ${runs.filter((r) => r.isHand).length}`);
  console.log(`  truth alarms: ${[...truths].map(([k, v]) => `${k} ${v}`).join(', ')}`);
  const fastHours = runs.filter(fast).reduce((sum, r) => sum + lengthH(r), 0);
  for (const detector of detectors) {
    const all: RunScore[] = [], fastScores: RunScore[] = [], withCutIns: RunScore[] = [];
    for (const run of runs) {
      const { alarms, plateaus, cutIns } = truthWindows(run.truth, medianInterval(run.timeS), run.isHand);
      const events = detector.run(run, corpus.name);
      const score = scoreRun(alarms, plateaus, events);
      const withCutInsScore = scoreRun(alarms, plateaus, events, cutIns);
      all.push(score);
      withCutIns.push(withCutInsScore);
      if (fast(run)) fastScores.push(score);
      // As the plan's false-alarm row reads it: a cut into a next plateau is not false (only a
      // plan raises cuts, so the other columns score the same either way).
      if (explained === detector.name) explain(run, alarms, events, withCutInsScore, detector.told?.(run, corpus.name) ?? {});
    }
    columns.push({ corpus: corpus.name, detector: detector.name, all: summariseScores(all, hours), fast: summariseScores(fastScores, fastHours), withCutIns: summariseScores(withCutIns, hours) });
  }
}
printTable();

// Throughput: 8 h at 10 Hz.
const long = syntheticTruth({
  roomC: 21, vapourArrivalS: 900, arrivalTauS: 10, components: ['a', 'b', 'c'],
  plateaus: [{ levelC: 56, durationS: 9000, creepC: 0.4, sagC: 2, sagS: 60, riseS: 300 }, { levelC: 78, durationS: 9000, riseS: 300 }, { levelC: 100, durationS: 10000 }],
});
const trace = sensorReadings(long.timeS, long.headC, { seed: 7, intervalS: 0.1, noiseSdC: 0.2, quantumC: 0.25, spikesPerHour: 10, draftSdC: 0.1 });
const n = Math.min(288000, trace.timeS.length);
const times = trace.timeS.subarray(0, n), heads = trace.headC.subarray(0, n);
let best = Infinity;
for (let rep = 0; rep < 5; rep++) {
  const start = performance.now();
  analyzeReadings(times, heads);
  best = Math.min(best, performance.now() - start);
}
console.log(`\nthroughput: ${n} readings (8 h at 10 Hz) in ${(best / 1000).toFixed(3)} s (best of 5; target < 0.5 s), ${(n / best / 1000).toFixed(2)} M readings/s`);

function printTable(): void {
  const f3 = (x: number): string => (Number.isNaN(x) ? '-' : x.toFixed(3));
  const f1 = (x: number): string => (Number.isNaN(x) ? '-' : x.toFixed(1));
  const rows: [string, (c: (typeof columns)[number]) => string][] = [
    ['recall vapour', (c) => f3(c.all.recall.vapour)],
    ['recall plateau', (c) => f3(c.all.recall.plateau)],
    ['recall breakthrough', (c) => f3(c.all.recall.breakthrough)],
    ['recall stall', (c) => f3(c.all.recall.stall)],
    ['recall sensor-fault', (c) => f3(c.all.recall['sensor-fault'])],
    ['alarm recall (target >= 0.97)', (c) => f3(c.all.alarmRecall)],
    ['false alarms (nuisance)', (c) => `${c.all.falseAlarmCount} (${c.all.nuisanceAlarmCount})`],
    ['false alarms per hour (<= 0.05)', (c) => f3(c.all.falseAlarmsPerHour)],
    // Our addition (truthWindows): a planned cut into the next component's plateau as it begins.
    ['  the same, cuts into a next plateau not false', (c) => `${f3(c.withCutIns.falseAlarmsPerHour)} (${c.withCutIns.falseAlarmCount})`],
    ['  cuts into a next plateau raised (share)', (c) => f3(c.withCutIns.cutInRecall)],
    ['breakthrough latency median, s', (c) => f1(c.all.latencyMedianS)],
    ['breakthrough latency p90, s', (c) => f1(c.all.latencyP90S)],
    ['<= 2 s readings: breakthrough recall (>= 0.95)', (c) => f3(c.fast.recall.breakthrough)],
    ['<= 2 s readings: latency median, s (<= 20)', (c) => f1(c.fast.latencyMedianS)],
    ['<= 2 s readings: latency p90, s (<= 60)', (c) => f1(c.fast.latencyP90S)],
  ];
  const labelWidth = Math.max(...rows.map((r) => r[0].length)) + 2;
  const width = 13;
  console.log('');
  const groups = [...new Set(columns.map((c) => c.corpus))];
  console.log(''.padEnd(labelWidth) + groups.map((g) => `| ${g}`.padEnd(width * detectors.length + 2)).join(''));
  console.log(''.padEnd(labelWidth) + groups.map(() => `| ${detectors.map((d) => d.name.padEnd(width)).join('')} `).join(''));
  for (const [label, value] of rows) {
    console.log(label.padEnd(labelWidth) + groups.map((g) => `| ${columns.filter((c) => c.corpus === g).map((c) => value(c).padEnd(width)).join('')} `).join(''));
  }
}

function medianInterval(timeS: Float64Array): number {
  const gaps: number[] = [];
  for (let i = 1; i < timeS.length; i++) gaps.push(timeS[i]! - timeS[i - 1]!);
  gaps.sort((a, b) => a - b);
  return gaps[gaps.length >> 1] ?? NaN;
}

function explain(run: CorpusRun, alarms: ReturnType<typeof truthWindows>['alarms'], events: ScoredEvent[], score: RunScore, told: WatchContext): void {
  const missed = Object.entries(score.truthCount).some(([k, v]) => score.hitCount[k as keyof typeof score.hitCount] < v);
  if (!missed && score.falseAlarmCount === 0) return;
  console.log(`-- ${run.id} ${run.spec.scenario} ${run.spec.components.map((c) => c.name).join('/')} ${run.label} plates ${run.spec.plates}: missed ${missed}, false ${score.falseAlarmCount}`);
  const range = (fromC: number, toC: number): string => `${fromC.toFixed(1)}-${toC.toFixed(1)}`;
  for (const b of told.expectedPlateaus ?? []) console.log(`   band ${b.label} ${range(b.fromC, b.toC)}${b.reachesPurity === false ? ' (never 90 % pure)' : ''}`);
  for (const w of told.plan ?? []) console.log(`   window ${w.receiver} ${range(w.fromC, w.toC)} ${w.compound ?? 'intermediate'}`);
  for (const p of run.truth.purityIntervals) console.log(`   truth ${p.component} 90 % pure ${p.startS.toFixed(0)}-${p.endS.toFixed(0)}`);
  for (const a of alarms) console.log(`   truth ${a.kind} at ${a.timeS.toFixed(0)} [${a.fromS.toFixed(0)}, ${a.toS.toFixed(0)}]`);
  const falseAlarms = new Set(score.falseAlarms);
  for (const e of events) {
    const isFalse = falseAlarms.has(e);
    const receiver = 'receiver' in e && e.receiver !== undefined ? ` receiver ${String(e.receiver)}` : '';
    console.log(`   ${isFalse ? '!!' : '  '}event ${e.kind} at ${e.timeS.toFixed(1)} ${e.headC.toFixed(2)}${'reason' in e && e.reason !== undefined ? ` ${String(e.reason)}` : ''}${receiver}`);
  }
}
