// The run watcher against two naive peers on a seeded corpus with ground truth, and its
// throughput. Run: npx tsx bench/detector.bench.ts [runs] [seed]
import { performance } from 'node:perf_hooks';
import { sensorReadings } from '../src/science/sensorModel/index.ts';
import { analyzeReadings } from '../src/signal/index.ts';
import { scoreRun, summariseScores, truthWindows, type RunScore, type ScoredEvent, type ScoreSummary } from '../src/signal/scoring/index.ts';
import { syntheticTruth } from '../tests/support/syntheticTruth.ts';
import { makeCorpus, type CorpusRun } from './corpus.ts';
import { fixedAlarmPeer, slopePeer } from './peers.ts';

const count = Number(process.argv[2] ?? 240);
const seed = Number(process.argv[3] ?? 20251201);
const verbose = process.argv.includes('--verbose');

type Detector = { name: string; run: (r: CorpusRun) => ScoredEvent[] };
const detectors: Detector[] = [
  { name: 'run watcher', run: (r) => analyzeReadings(r.timeS, r.headC) },
  { name: 'fixed bp+3 alarm', run: (r) => fixedAlarmPeer(r.timeS, r.headC, r.boilingPointsC) },
  { name: 'moving-average slope', run: (r) => slopePeer(r.timeS, r.headC) },
];

const t0 = performance.now();
const corpus = makeCorpus(seed, count);
const buildS = (performance.now() - t0) / 1000;
const hours = corpus.reduce((sum, r) => sum + (r.timeS[r.timeS.length - 1]! - r.timeS[0]!) / 3600, 0);
const readings = corpus.reduce((sum, r) => sum + r.timeS.length, 0);
console.log(`corpus: ${corpus.length} runs, seed ${seed}, ${hours.toFixed(1)} h, ${readings} readings (built in ${buildS.toFixed(1)} s)`);
const scenarios = new Map<string, number>();
for (const r of corpus) scenarios.set(r.spec.scenario, (scenarios.get(r.spec.scenario) ?? 0) + 1);
console.log(`scenarios: ${[...scenarios].map(([k, v]) => `${k} ${v}`).join(', ')}; hand-read runs ${corpus.filter((r) => r.isHand).length}`);

const fast = (r: CorpusRun): boolean => !r.isHand && r.intervalS <= 2;
for (const detector of detectors) {
  const all: RunScore[] = [], fastScores: RunScore[] = [];
  for (const run of corpus) {
    const { alarms, plateaus } = truthWindows(run.truth, medianInterval(run.timeS), run.isHand);
    const events = detector.run(run);
    const score = scoreRun(alarms, plateaus, events);
    all.push(score);
    if (fast(run)) fastScores.push(score);
    if (verbose && detector.name === 'run watcher') explain(run, alarms, events, score);
  }
  const fastHours = corpus.filter(fast).reduce((sum, r) => sum + (r.timeS[r.timeS.length - 1]! - r.timeS[0]!) / 3600, 0);
  print(detector.name, summariseScores(all, hours), summariseScores(fastScores, fastHours));
}

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

function print(name: string, s: ScoreSummary, f: ScoreSummary): void {
  const pct = (x: number): string => (Number.isNaN(x) ? '  -  ' : x.toFixed(3));
  console.log(`\n${name}`);
  console.log(`  recall: vapour ${pct(s.recall.vapour)}  plateau ${pct(s.recall.plateau)}  breakthrough ${pct(s.recall.breakthrough)}  stall ${pct(s.recall.stall)}  sensor-fault ${pct(s.recall['sensor-fault'])}  all alarms ${pct(s.alarmRecall)}`);
  console.log(`  false alarms: ${s.falseAlarmCount} (${s.nuisanceAlarmCount} nuisance) = ${s.falseAlarmsPerHour.toFixed(3)} per hour`);
  console.log(`  breakthrough latency, all runs: median ${s.latencyMedianS.toFixed(1)} s, p90 ${s.latencyP90S.toFixed(1)} s`);
  console.log(`  readings every 2 s or faster: breakthrough recall ${pct(f.recall.breakthrough)}, latency median ${f.latencyMedianS.toFixed(1)} s, p90 ${f.latencyP90S.toFixed(1)} s`);
}

function medianInterval(timeS: Float64Array): number {
  const gaps: number[] = [];
  for (let i = 1; i < timeS.length; i++) gaps.push(timeS[i]! - timeS[i - 1]!);
  gaps.sort((a, b) => a - b);
  return gaps[gaps.length >> 1] ?? NaN;
}

function explain(run: CorpusRun, alarms: ReturnType<typeof truthWindows>['alarms'], events: ScoredEvent[], score: RunScore): void {
  const missed = Object.entries(score.truthCount).some(([k, v]) => score.hitCount[k as keyof typeof score.hitCount] < v);
  if (!missed && score.falseAlarmCount === 0) return;
  console.log(`-- ${run.id} ${run.spec.scenario} ${run.label} plates ${run.spec.plates}: missed ${missed}, false ${score.falseAlarmCount}`);
  for (const a of alarms) console.log(`   truth ${a.kind} at ${a.timeS.toFixed(0)} [${a.fromS.toFixed(0)}, ${a.toS.toFixed(0)}]`);
  for (const e of events) console.log(`   event ${e.kind} at ${e.timeS.toFixed(1)} ${e.headC.toFixed(2)}${'reason' in e ? ` ${String(e.reason)}` : ''}`);
}
