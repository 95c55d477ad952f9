import { describe, expect, it } from 'vitest';
import type { RunPlan } from '../../../src/run/index.ts';
import { predictOffThread, type PredictionRequest, type PredictionWorker } from '../../../src/ui/watch/predictOffThread.ts';

// A plan shaped like the app's, with invented windows (demo numbers, not data).
const plan = { windows: [{ receiver: 1, fromC: 70, toC: 80 }] } as unknown as RunPlan;
const request: PredictionRequest = { plan, charge: [{ name: 'toluene', amount: 50, unit: 'mL' }], pressurePa: 101_325, plates: 3 };

class FakeWorker implements PredictionWorker {
  onmessage: ((event: { data: RunPlan }) => void) | null = null;
  onerror: ((event: unknown) => void) | null = null;
  posted: PredictionRequest[] = [];
  isTerminated = false;
  constructor(private readonly behaviour: 'answer' | 'fail' | 'silent') {}
  postMessage(message: PredictionRequest): void {
    this.posted.push(message);
    setTimeout(() => {
      if (this.behaviour === 'answer') this.onmessage?.({ data: { ...message.plan, predicted: { time_s: [0, 60], head_c: [20, 80] } } });
      if (this.behaviour === 'fail') this.onerror?.(new Error('worker script failed'));
    }, 1);
  }
  terminate(): void {
    this.isTerminated = true;
  }
}

describe('predictOffThread', () => {
  it('gives the worker\'s plan with its prediction and ends the worker', async () => {
    const worker = new FakeWorker('answer');
    const out = await predictOffThread(request, 1000, () => worker);
    expect(out.predicted).toEqual({ time_s: [0, 60], head_c: [20, 80] });
    expect(worker.posted).toEqual([request]);
    expect(worker.isTerminated).toBe(true);
  });

  it('gives the plan unchanged when the worker fails, is too slow, or cannot start', async () => {
    const failing = new FakeWorker('fail');
    expect(await predictOffThread(request, 1000, () => failing)).toBe(plan);
    expect(failing.isTerminated).toBe(true);
    const silent = new FakeWorker('silent');
    expect(await predictOffThread(request, 20, () => silent)).toBe(plan);
    expect(silent.isTerminated).toBe(true);
    expect(await predictOffThread(request, 20, () => { throw new Error('no workers here'); })).toBe(plan);
  });
});
