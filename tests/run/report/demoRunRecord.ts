// A run record of the demo charge (ethyl acetate from butyl acetate) from the project's column
// simulator, with receivers changed at set head temperatures and each receiver's true make-up
// taken from the simulator's own receiver ledger.
import { createRunHeader, toRunRecord, type RunRecord } from '../../../src/run/index.ts';
import { columnEquilibrium, componentDataFor, heatForBoilup, molesFromAmounts, simulateBatchStill } from '../../../src/science/index.ts';
import { APPARATUS_DEFAULTS } from '../../../src/science/column/apparatusDefaults.ts';
import { demoMixture } from '../../../src/science/demo/index.ts';
import { analyzeReadings } from '../../../src/signal/index.ts';

export interface DemoTruth {
  receiver: number;
  volumeMl: number;
  lightMol: number;
  heavyMol: number;
}

export function demoRunRecord(changeAtC = [80, 120]): { record: RunRecord; truth: DemoTruth[]; residueMol: [number, number] } {
  const compounds = demoMixture.compounds;
  const equilibrium = columnEquilibrium(compounds, 'ideal');
  const components = componentDataFor(compounds);
  const chargeMol = molesFromAmounts(compounds, demoMixture.chargeMl.map((ml) => ml * 1e-6), 'volume');
  const total = chargeMol.reduce((a, b) => a + b, 0);
  const pressurePa = 101_325;
  const roomK = 294.15;
  const heatW = heatForBoilup({
    equilibrium, components, x: chargeMol.map((n) => n / total), pressurePa, roomK, boilupM3PerS: 4e-6 / 60,
    potLossWPerK: APPARATUS_DEFAULTS.lossWPerK, columnLossWPerK: APPARATUS_DEFAULTS.wallLossWPerK + APPARATUS_DEFAULTS.headLossWPerK,
  });
  const edges = [-50, ...changeAtC, 400];
  const run = simulateBatchStill({
    equilibrium, components, chargeMol, pressurePa, roomK,
    column: { stages: 4, refluxRatio: 2 },
    heat: [{ fromS: 0, heatW }],
    durationS: 6 * 3600,
    sampleIntervalS: 2,
    cutPlan: { by: 'head-temperature', windows: edges.slice(1).map((toC, i) => ({ receiver: i + 1, fromC: edges[i]!, toC })) },
  });
  const header = createRunHeader({
    id: 'demo-report',
    title: 'Demo: ethyl acetate from butyl acetate',
    startedAt: '2026-12-01T09:00:00Z',
    device: 'test',
    source: { kind: 'simulated', label: 'demo still' },
    charge: demoMixture.components.map((name, i) => ({ name, amount: demoMixture.chargeMl[i]!, unit: 'mL' as const })),
    pressurePa,
    column: { description: 'demo column', theoretical_plates: 4 },
  });
  // The chemist ends the run once the pot is nearly dry: the record stops there.
  const endIndex = run.trace.timeS.findIndex((t) => t >= (run.annotations.potDryS ?? Infinity));
  const n = endIndex < 0 ? run.trace.timeS.length : endIndex + 1;
  const times = run.trace.timeS.slice(0, n);
  const heads = run.trace.headK.slice(0, n).map((k) => k - 273.15);
  const truth: DemoTruth[] = run.receivers.map((r) => ({ receiver: r.receiver, volumeMl: r.volumeM3 * 1e6, lightMol: r.mol[0]!, heavyMol: r.mol[1]! }));
  for (const r of run.receivers.slice(1)) {
    const i = Math.max(0, times.findIndex((t) => t >= r.firstS));
    header.receivers.push({ receiver: r.receiver, time_s: times[i]!, head_c: heads[i]! });
  }
  header.events = analyzeReadings(times, heads).map((e) => ({ time_s: e.timeS, event: e.kind, head_c: e.headC }));
  header.status = 'ended';
  header.ended_at = '2026-12-01T12:00:00Z';
  // What is left drains back to the pot when the heat goes off: pot, column and head holdup.
  const left = (j: number) => run.final.potMol[j]! + run.final.columnMol[j]! + run.final.headHoldupMol[j]!;
  return { record: toRunRecord(header, times, heads), truth, residueMol: [left(0), left(1)] };
}
