import type { PlanAnswer, PlanMessage, PlanRequest, PlanResult } from './planRequest.ts';

/** The part of a Worker the bridge uses (a fake in tests). */
export interface WorkerLike {
  postMessage(message: PlanMessage): void;
  onmessage: ((event: { data: PlanAnswer }) => void) | null;
  onerror: ((event: { message?: string }) => void) | null;
  terminate(): void;
}

interface Job {
  request: PlanRequest;
  signal: AbortSignal;
  resolve(result: PlanResult): void;
  reject(error: Error): void;
}

function abortError(): Error {
  return new DOMException('the plan was superseded', 'AbortError');
}

/** The planning error the worker reported (bad input in plain words), as opposed to an abort. */
export class PlanningError extends Error {
  override name = 'PlanningError';
}

export function createPlanningWorker(): WorkerLike {
  return new Worker(new URL('./planning.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike;
}

/**
 * The one bridge to the planning worker: started on first use, one call at a time (a queue),
 * an AbortSignal on each call (an aborted call's answer is dropped), and the worker ended
 * after a while idle or when it fails (the next call starts a new one).
 */
export class PlanningBridge {
  readonly #makeWorker: () => WorkerLike;
  readonly #idleMs: number;
  #worker: WorkerLike | null = null;
  #queue: Job[] = [];
  #current: { id: number; job: Job } | null = null;
  #nextId = 1;
  #idleTimer: ReturnType<typeof setTimeout> | null = null;

  constructor(makeWorker: () => WorkerLike = createPlanningWorker, idleMs = 60_000) {
    this.#makeWorker = makeWorker;
    this.#idleMs = idleMs;
  }

  /** True while a worker is running (for tests and the idle clean-up). */
  get isStarted(): boolean {
    return this.#worker !== null;
  }

  plan(request: PlanRequest, signal: AbortSignal): Promise<PlanResult> {
    if (signal.aborted) return Promise.reject(abortError());
    return new Promise<PlanResult>((resolve, reject) => {
      const job: Job = { request, signal, resolve, reject };
      signal.addEventListener('abort', () => {
        this.#queue = this.#queue.filter((j) => j !== job);
        reject(abortError());
      }, { once: true });
      this.#queue.push(job);
      this.#pump();
    });
  }

  dispose(): void {
    for (const job of this.#queue) job.reject(abortError());
    this.#queue = [];
    if (this.#current) this.#current.job.reject(abortError());
    this.#current = null;
    this.#stopWorker();
  }

  #pump(): void {
    if (this.#current || this.#queue.length === 0) return;
    const job = this.#queue.shift()!;
    if (this.#idleTimer !== null) clearTimeout(this.#idleTimer);
    this.#idleTimer = null;
    const worker = this.#ensureWorker();
    const id = this.#nextId++;
    this.#current = { id, job };
    worker.postMessage({ id, request: job.request });
  }

  #ensureWorker(): WorkerLike {
    if (this.#worker) return this.#worker;
    const worker = this.#makeWorker();
    worker.onmessage = ({ data }) => this.#settle(data);
    worker.onerror = (event) => {
      const current = this.#current;
      this.#current = null;
      this.#stopWorker();
      current?.job.reject(new PlanningError(`the planner stopped: ${event.message ?? 'unknown error'}`));
      this.#pump();
    };
    this.#worker = worker;
    return worker;
  }

  #settle(answer: PlanAnswer): void {
    const current = this.#current;
    if (!current || current.id !== answer.id) return;
    this.#current = null;
    // An aborted call has already been rejected: its answer is stale and dropped.
    if (!current.job.signal.aborted) {
      if (answer.ok) current.job.resolve(answer.result);
      else current.job.reject(new PlanningError(answer.message));
    }
    if (this.#queue.length > 0) this.#pump();
    else this.#idleTimer = setTimeout(() => this.#stopWorker(), this.#idleMs);
  }

  #stopWorker(): void {
    if (this.#idleTimer !== null) clearTimeout(this.#idleTimer);
    this.#idleTimer = null;
    this.#worker?.terminate();
    this.#worker = null;
  }
}
