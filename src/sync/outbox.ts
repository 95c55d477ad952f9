import type { KeyValueStore, StoreKey } from '../store/index.ts';
import { retryDelayMs } from './backoff.ts';
import type { RunSyncStatus, SyncTarget } from './syncStatus.ts';
import { uploadRun } from './uploadRun.ts';

export const outboxKey = (runId: string): StoreKey => ['outbox', runId];

export interface OutboxDeps {
  store: KeyValueStore;
  fetch: typeof fetch;
  /** The server and token now set in Settings, or null when sync is not set up. */
  target(): Promise<SyncTarget | null>;
  /** The run record as JSON text, built from the phone's journal; null when the run is not there. */
  runJson(runId: string): Promise<string | null>;
  nowMs(): number;
  /** Per-upload time limit. Units: ms */
  uploadTimeoutMs?: number;
}

type Listener = (status: RunSyncStatus) => void;

/**
 * The phone's outbox of finished runs, kept in IndexedDB under ['outbox', runId]. Each queued
 * run gets a revision number; an upload is keyed by run id and revision, so sending the same
 * one again (after a lost reply, a crash, a second tab) is harmless. The outbox only reads the
 * run's own records and writes its own entries: syncing never deletes or changes a run.
 */
export class Outbox {
  readonly #deps: OutboxDeps;
  readonly #listeners = new Set<Listener>();
  /** Read-modify-write of entries one at a time, so queueRun during an upload loses nothing. */
  #lock: Promise<unknown> = Promise.resolve();
  #flushing: Promise<void> | null = null;
  #flushAgain = false;

  constructor(deps: OutboxDeps) {
    this.#deps = deps;
  }

  /** Queues a run (when it ends, and again whenever it is amended). */
  async queueRun(runId: string): Promise<RunSyncStatus> {
    if (!runId) throw new RangeError('queueRun needs a run id');
    const queued = await this.#update(runId, (old, now) => {
      if (!old) {
        return blank(runId, now);
      }
      // The revision in hand was sent (or is on its way): the amendment goes as the next one.
      const isRevisionSent = old.state === 'sending' || old.state === 'synced' || old.syncedRevision >= old.revision;
      return {
        ...old,
        state: old.state === 'sending' ? 'sending' : 'queued',
        revision: isRevisionSent ? Math.max(old.revision, old.syncedRevision) + 1 : old.revision,
        reason: null,
        willRetry: true,
        attempts: 0,
        nextAttemptAtMs: now,
        updatedAtMs: now,
      };
    });
    return queued!;
  }

  /** Makes failed runs due now, including refused ones (after the token or server was changed). */
  async retryFailed(): Promise<void> {
    for (const status of await this.list()) {
      if (status.state !== 'failed') continue;
      await this.#update(status.runId, (old, now) =>
        old && old.state === 'failed' ? { ...old, state: 'queued', willRetry: true, reason: null, nextAttemptAtMs: now, updatedAtMs: now } : old,
      );
    }
  }

  stateOf(runId: string): Promise<RunSyncStatus | null> {
    return this.#deps.store.get<RunSyncStatus>(outboxKey(runId)).then((s) => s ?? null);
  }

  /** Every run the outbox knows, most recently changed first. */
  async list(): Promise<RunSyncStatus[]> {
    const keys = (await this.#deps.store.keys()).filter((k) => Array.isArray(k) && k[0] === 'outbox' && k.length === 2);
    const all = await this.#deps.store.getMany<RunSyncStatus>(keys);
    return all.filter((s): s is RunSyncStatus => s !== undefined).sort((a, b) => b.updatedAtMs - a.updatedAtMs);
  }

  /** Calls `listener` with each run's status whenever it changes; returns the unsubscribe. */
  subscribe(listener: Listener): () => void {
    this.#listeners.add(listener);
    return () => this.#listeners.delete(listener);
  }

  /** Earliest time an automatic retry is due, or null when nothing waits. Units: ms since 1970 */
  async nextDueMs(): Promise<number | null> {
    let next: number | null = null;
    for (const s of await this.list()) {
      if (s.state === 'synced' || !s.willRetry || s.nextAttemptAtMs === null) continue;
      next = next === null ? s.nextAttemptAtMs : Math.min(next, s.nextAttemptAtMs);
    }
    return next;
  }

  /**
   * Sends every run that is due (all waiting ones when `ignoreBackoff`, as on `online`), one at
   * a time. Concurrent calls share one pass; a call during a pass asks for one more.
   */
  flush(ignoreBackoff = false): Promise<void> {
    if (this.#flushing) {
      this.#flushAgain = true;
      return this.#flushing;
    }
    this.#flushing = (async () => {
      try {
        do {
          this.#flushAgain = false;
          await this.#pass(ignoreBackoff);
        } while (this.#flushAgain);
      } finally {
        this.#flushing = null;
      }
    })();
    return this.#flushing;
  }

  async #pass(ignoreBackoff: boolean): Promise<void> {
    const target = await this.#deps.target();
    if (!target) return;
    // A run stuck in 'sending' was cut off (tab closed mid-upload): it is simply due again.
    // Refused runs wait for retryFailed() or an amendment: trying again cannot help them.
    const waiting = (await this.list()).filter((s) => s.state !== 'synced' && (s.willRetry || s.state === 'sending'));
    const now = this.#deps.nowMs();
    for (const status of waiting.sort((a, b) => a.updatedAtMs - b.updatedAtMs)) {
      const isDue = ignoreBackoff || status.state === 'sending' || status.nextAttemptAtMs === null || status.nextAttemptAtMs <= now;
      if (isDue) await this.#send(status.runId, target);
    }
  }

  async #send(runId: string, target: SyncTarget): Promise<void> {
    // A few rounds: a conflict or an amendment during the upload sends the next revision at once.
    for (let round = 0; round < 4; round++) {
      const sending = await this.#update(runId, (old, now) =>
        old && old.state !== 'synced' ? { ...old, state: 'sending', updatedAtMs: now } : old,
      );
      if (!sending || sending.state !== 'sending') return;
      const revision = sending.revision;
      const json = await this.#deps.runJson(runId).catch(() => null);
      if (json === null) {
        await this.#fail(runId, 'the run could not be read from this phone', false, null);
        return;
      }
      const result = await uploadRun(this.#deps.fetch, target, runId, revision, json, this.#deps.uploadTimeoutMs);
      if (result.kind === 'stored') {
        const after = await this.#update(runId, (old, now) => {
          if (!old) return old;
          const syncedRevision = Math.max(old.syncedRevision, revision);
          const isNewest = old.revision <= revision;
          return {
            ...old,
            syncedRevision,
            state: isNewest ? 'synced' : 'queued',
            reason: null,
            willRetry: true,
            attempts: 0,
            nextAttemptAtMs: isNewest ? null : now,
            updatedAtMs: now,
            syncedAtMs: now,
          };
        });
        if (after?.state !== 'queued') return;
      } else if (result.kind === 'conflict') {
        await this.#update(runId, (old, now) => (old ? { ...old, revision: Math.max(old.revision, revision + 1), updatedAtMs: now } : old));
      } else {
        await this.#fail(runId, result.reason, result.kind === 'retry', result.kind === 'retry' ? result.retryAfterMs : null);
        return;
      }
    }
  }

  #fail(runId: string, reason: string, willRetry: boolean, retryAfterMs: number | null): Promise<RunSyncStatus | undefined> {
    return this.#update(runId, (old, now) => {
      if (!old) return old;
      const attempts = old.attempts + 1;
      const delay = Math.max(retryDelayMs(attempts), retryAfterMs ?? 0);
      return { ...old, state: 'failed', reason, willRetry, attempts, nextAttemptAtMs: willRetry ? now + delay : null, updatedAtMs: now };
    });
  }

  #update(
    runId: string,
    change: (old: RunSyncStatus | undefined, nowMs: number) => RunSyncStatus | undefined,
  ): Promise<RunSyncStatus | undefined> {
    const step = this.#lock.then(async () => {
      const old = await this.#deps.store.get<RunSyncStatus>(outboxKey(runId));
      const next = change(old, this.#deps.nowMs());
      if (!next || next === old) return old;
      await this.#deps.store.setMany([[outboxKey(runId), next]]);
      for (const listener of this.#listeners) listener(next);
      return next;
    });
    this.#lock = step.catch(() => undefined);
    return step;
  }
}

function blank(runId: string, now: number): RunSyncStatus {
  return {
    runId,
    state: 'queued',
    revision: 1,
    syncedRevision: 0,
    reason: null,
    willRetry: true,
    attempts: 0,
    nextAttemptAtMs: now,
    updatedAtMs: now,
    syncedAtMs: null,
  };
}
