// A run record from the project's demo still (ethyl acetate from butyl acetate), with receivers
// changed at set head temperatures and each receiver's true make-up taken from the still's pot.
import { createRunHeader, toRunRecord, type RunRecord } from '../../../src/run/index.ts';
import { createDemoStill, demoMixture } from '../../../src/science/demo/index.ts';
import { analyzeReadings } from '../../../src/signal/index.ts';

export interface DemoTruth {
  receiver: number;
  volumeMl: number;
  lightMol: number;
  heavyMol: number;
}

export function demoRunRecord(changeAtC = [80, 120]): { record: RunRecord; truth: DemoTruth[]; residueMol: [number, number] } {
  const still = createDemoStill({ plates: 4 });
  const header = createRunHeader({
    id: 'demo-report',
    title: 'Demo: ethyl acetate from butyl acetate',
    startedAt: '2026-12-01T09:00:00Z',
    device: 'test',
    source: { kind: 'simulated', label: 'demo still' },
    charge: demoMixture.components.map((name, i) => ({ name, amount: demoMixture.chargeMl[i]!, unit: 'mL' as const })),
    pressurePa: 101_325,
    column: { description: 'demo column', theoretical_plates: 4 },
  });
  const times: number[] = [];
  const heads: number[] = [];
  const truth: DemoTruth[] = [{ receiver: 1, volumeMl: 0, lightMol: 0, heavyMol: 0 }];
  let state = still.state;
  let potLight = state.potMol * state.potLightFraction;
  let potHeavy = state.potMol - potLight;
  let lastMl = 0;
  for (let t = 2; t <= 6 * 3600 && state.phase !== 'dry'; t += 2) {
    state = still.step(2);
    times.push(t);
    heads.push(state.headC);
    const light = state.potMol * state.potLightFraction;
    const heavy = state.potMol - light;
    const current = truth.at(-1)!;
    current.lightMol += potLight - light;
    current.heavyMol += potHeavy - heavy;
    current.volumeMl += state.distilledMl - lastMl;
    potLight = light;
    potHeavy = heavy;
    lastMl = state.distilledMl;
    const next = changeAtC[truth.length - 1];
    if (next !== undefined && state.headC > next) {
      header.receivers.push({ receiver: truth.length + 1, time_s: t, head_c: state.headC });
      truth.push({ receiver: truth.length + 1, volumeMl: 0, lightMol: 0, heavyMol: 0 });
    }
  }
  header.events = analyzeReadings(Float64Array.from(times), Float64Array.from(heads)).map((e) => ({ time_s: e.timeS, event: e.kind, head_c: e.headC }));
  header.status = 'ended';
  header.ended_at = '2026-12-01T12:00:00Z';
  return { record: toRunRecord(header, times, heads), truth, residueMol: [potLight, potHeavy] };
}
