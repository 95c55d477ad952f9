import { describe, expect, it } from 'vitest';
import { createPlanAnswerer } from '../../../src/ui/prepare/answerPlanRequest.ts';
import type { PlanAnswer, PlanMessage, PlanRequest } from '../../../src/ui/prepare/planRequest.ts';
import { PlanningBridge, PlanningError, type WorkerLike } from '../../../src/ui/prepare/planningBridge.ts';

/** A worker in the same thread: answers each message on a later turn, counting what it saw. */
class FakeWorker implements WorkerLike {
  onmessage: ((event: { data: PlanAnswer }) => void) | null = null;
  onerror: ((event: { message?: string }) => void) | null = null;
  received: PlanMessage[] = [];
  inFlight = 0;
  maxInFlight = 0;
  isTerminated = false;
  readonly #answer = createPlanAnswerer();
  postMessage(message: PlanMessage): void {
    this.received.push(message);
    this.inFlight += 1;
    this.maxInFlight = Math.max(this.maxInFlight, this.inFlight);
    setTimeout(() => {
      this.inFlight -= 1;
      if (!this.isTerminated) this.onmessage?.({ data: this.#answer(message) });
    }, 5);
  }
  terminate(): void {
    this.isTerminated = true;
  }
}

const request: PlanRequest = {
  compounds: [{ kind: 'library', name: 'n-hexane' }, { kind: 'library', name: 'toluene' }],
  x: [0.5, 0.5], chargeMol: 0.8, pressurePa: 101325, plates: 3, heatSourceMaxK: null, windows: null,
};

function setUp() {
  const workers: FakeWorker[] = [];
  const bridge = new PlanningBridge(() => {
    const w = new FakeWorker();
    workers.push(w);
    return w;
  }, 20);
  return { bridge, workers };
}

describe('PlanningBridge', () => {
  it('starts the worker on first use only, and answers a call', async () => {
    const { bridge, workers } = setUp();
    expect(workers.length).toBe(0);
    const result = await bridge.plan(request, new AbortController().signal);
    expect(workers.length).toBe(1);
    expect(result.plan.windows.length).toBeGreaterThan(1);
    bridge.dispose();
  });

  it('sends one call at a time, in order', async () => {
    const { bridge, workers } = setUp();
    const signal = new AbortController().signal;
    const answers = await Promise.all([bridge.plan(request, signal), bridge.plan({ ...request, plates: 6 }, signal), bridge.plan({ ...request, plates: 0 }, signal)]);
    expect(workers[0]!.maxInFlight).toBe(1);
    expect(workers[0]!.received.map((m) => m.request.plates)).toEqual([3, 6, 0]);
    expect(answers.map((a) => a.plan.plates)).toEqual([3, 6, 0]);
    bridge.dispose();
  });

  it('drops an aborted call: a queued one is never sent, a sent one is rejected and its answer ignored', async () => {
    const { bridge, workers } = setUp();
    const first = new AbortController();
    const second = new AbortController();
    const sent = bridge.plan(request, first.signal);
    const queued = bridge.plan({ ...request, plates: 6 }, second.signal);
    const latest = bridge.plan({ ...request, plates: 0 }, new AbortController().signal);
    first.abort();
    second.abort();
    await expect(sent).rejects.toMatchObject({ name: 'AbortError' });
    await expect(queued).rejects.toMatchObject({ name: 'AbortError' });
    expect((await latest).plan.plates).toBe(0);
    expect(workers[0]!.received.map((m) => m.request.plates)).toEqual([3, 0]);
    bridge.dispose();
  });

  it('rejects with the planner\'s message for bad input (a PlanningError), and keeps working', async () => {
    const { bridge } = setUp();
    const signal = new AbortController().signal;
    await expect(bridge.plan({ ...request, pressurePa: 0 }, signal)).rejects.toBeInstanceOf(PlanningError);
    await expect(bridge.plan(request, signal)).resolves.toMatchObject({ model: 'unifac' });
    bridge.dispose();
  });

  it('starts a new worker after the old one failed, and ends an idle one', async () => {
    const { bridge, workers } = setUp();
    const signal = new AbortController().signal;
    const failing = bridge.plan(request, signal);
    workers[0]!.onerror?.({ message: 'out of memory' });
    await expect(failing).rejects.toThrow(/out of memory/);
    expect(workers[0]!.isTerminated).toBe(true);
    await bridge.plan(request, signal);
    expect(workers.length).toBe(2);
    await new Promise((resolve) => setTimeout(resolve, 40));
    expect(bridge.isStarted).toBe(false);
    expect(workers[1]!.isTerminated).toBe(true);
  });

  it('refuses a call whose signal is already aborted without starting a worker', async () => {
    const { bridge, workers } = setUp();
    const controller = new AbortController();
    controller.abort();
    await expect(bridge.plan(request, controller.signal)).rejects.toMatchObject({ name: 'AbortError' });
    expect(workers.length).toBe(0);
  });
});
