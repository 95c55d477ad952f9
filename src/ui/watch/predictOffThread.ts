import type { ChargeComponent, RunPlan } from '../../run/index.ts';

export interface PredictionRequest {
  plan: RunPlan;
  charge: ChargeComponent[];
  pressurePa: number;
  plates: number;
}

/** The part of a Worker this uses (a fake in tests). */
export interface PredictionWorker {
  postMessage(message: PredictionRequest): void;
  onmessage: ((event: { data: RunPlan }) => void) | null;
  onerror: ((event: unknown) => void) | null;
  terminate(): void;
}

function createPredictionWorker(): PredictionWorker {
  return new Worker(new URL('./prediction.worker.ts', import.meta.url), { type: 'module' }) as unknown as PredictionWorker;
}

/**
 * The plan with the simulator's expected head trace, computed in a worker. A prediction is a
 * help, not a condition of starting: when the worker fails or takes longer than `waitMs`, the
 * plan comes back as it was and the run starts without one.
 */
export function predictOffThread(request: PredictionRequest, waitMs = 4000, makeWorker: () => PredictionWorker = createPredictionWorker): Promise<RunPlan> {
  let worker: PredictionWorker;
  try {
    worker = makeWorker();
  } catch {
    return Promise.resolve(request.plan);
  }
  return new Promise<RunPlan>((resolve) => {
    const finish = (plan: RunPlan) => {
      clearTimeout(timer);
      worker.onmessage = null;
      worker.onerror = null;
      worker.terminate();
      resolve(plan);
    };
    const timer = setTimeout(() => finish(request.plan), waitMs);
    worker.onmessage = (event) => finish(event.data);
    worker.onerror = () => finish(request.plan);
    worker.postMessage(request);
  });
}
