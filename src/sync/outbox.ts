import type { KeyValueStore, StoreKey } from '../store/index.ts';
import { retryDelayMs } from './backoff.ts';
import type { RunSyncStatus, SyncTarget } from './syncStatus.ts';
import { defaultUploadTimeoutMs, uploadRun } from './uploadRun.ts';

export const outboxKey = (runId: string): StoreKey => ['outbox', runId];

/** Carries each change of a run's status between the contexts that share one outbox (tabs, the service worker). */
export interface OutboxChannel {
  post(status: RunSyncStatus): void;
  /** Returns the unsubscribe. */
  listen(listener: (status: RunSyncStatus) => void): () => void;
  /** Lets go of the channel (after which post does nothing). */
  close?(): void;
}

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
  /** Called when an upload got no answer at all (no network, server down): the page asks for Background Sync. */
  onUnreachable?(): void;
  /** Changes made by other senders arrive here and go to subscribers; this one's go out. */
  channel?: OutboxChannel;
  /** Names this sender in its claims; random when not given. */
  senderId?: string;
}

type Listener = (status: RunSyncStatus) => void;

/** Longer than any upload may take, so a live sender never loses its claim. Units: ms */
const leaseMarginMs = 60_000;

/**
 * The phone's outbox of finished runs, kept in IndexedDB under ['outbox', runId]. Each queued
 * run gets a revision number; an upload is keyed by run id and revision, so sending the same
 * one again (after a lost reply, a crash, a second sender) is harmless. The outbox only reads
 * the run's own records and writes its own entries: syncing never deletes or changes a run.
 *
 * Several senders may share the entries (the page, another tab, the service worker): every
 * change is one read-and-write transaction (KeyValueStore.update), and a sender claims a run
 * before uploading it, so two senders do not send the same run at once (src/sync/README.md).
 */
export class Outbox {
  readonly #deps: OutboxDeps;
  readonly #listeners = new Set<Listener>();
  readonly #senderId: string;
  readonly #leaseMs: number;
  readonly #stopListening: () => void;
  #flushing: Promise<void> | null = null;
  #flushAgain = false;

  constructor(deps: OutboxDeps) {
    this.#deps = deps;
    this.#senderId = deps.senderId ?? randomSenderId();
    this.#leaseMs = (deps.uploadTimeoutMs ?? defaultUploadTimeoutMs) + leaseMarginMs;
    this.#stopListening = deps.channel?.listen((status) => this.#tell(status)) ?? (() => undefined);
  }

  /** Stops hearing other senders' changes and lets go of the channel. */
  close(): void {
    this.#stopListening();
    this.#deps.channel?.close?.();
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
        // A sender's claim stays: it sends the new revision when its upload is done.
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

  /** Calls `listener` with each run's status whenever it changes (here or in another sender); returns the unsubscribe. */
  subscribe(listener: Listener): () => void {
    this.#listeners.add(listener);
    return () => this.#listeners.delete(listener);
  }

  /** Earliest time an automatic retry is due, or null when nothing waits. Units: ms since 1970 */
  async nextDueMs(): Promise<number | null> {
    let next: number | null = null;
    for (const s of await this.list()) {
      // A run another sender holds is due when its claim runs out (should that sender be gone).
      const dueMs = s.state === 'sending' ? (s.leaseUntilMs ?? 0) : s.state === 'synced' || !s.willRetry ? null : s.nextAttemptAtMs;
      if (dueMs === null) continue;
      next = next === null ? dueMs : Math.min(next, dueMs);
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
    // A run 'sending' whose claim has run out was cut off (tab closed mid-upload): it is due again.
    // Refused runs wait for retryFailed() or an amendment: trying again cannot help them.
    const waiting = (await this.list()).filter((s) => s.state !== 'synced' && (s.willRetry || s.state === 'sending'));
    const now = this.#deps.nowMs();
    for (const status of waiting.sort((a, b) => a.updatedAtMs - b.updatedAtMs)) {
      const isDue =
        status.state === 'sending'
          ? this.#canClaim(status, now)
          : ignoreBackoff || status.nextAttemptAtMs === null || status.nextAttemptAtMs <= now;
      if (isDue) await this.#send(status.runId, target);
    }
  }

  /** True when this sender may take the run: nobody else holds an unexpired claim on it. */
  #canClaim(status: RunSyncStatus, now: number): boolean {
    return status.state !== 'sending' || status.senderId === this.#senderId || !((status.leaseUntilMs ?? 0) > now);
  }

  #holds(status: RunSyncStatus): boolean {
    return status.state === 'sending' && status.senderId === this.#senderId;
  }

  async #send(runId: string, target: SyncTarget): Promise<void> {
    // A few rounds: a conflict or an amendment during the upload sends the next revision at once.
    for (let round = 0; round < 4; round++) {
      const claimed = await this.#update(runId, (old, now) =>
        old && old.state !== 'synced' && this.#canClaim(old, now)
          ? { ...old, state: 'sending', senderId: this.#senderId, leaseUntilMs: now + this.#leaseMs, updatedAtMs: now }
          : old,
      );
      if (!claimed || !this.#holds(claimed)) return;
      const revision = claimed.revision;
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
          if (old.state === 'sending' && !this.#holds(old)) {
            // Another sender took the run over after this claim ran out: its claim stands.
            return { ...old, syncedRevision, syncedAtMs: now, updatedAtMs: now };
          }
          const isNewest = old.revision <= syncedRevision;
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
            senderId: null,
            leaseUntilMs: null,
          };
        });
        if (after?.state !== 'queued') return;
      } else if (result.kind === 'conflict') {
        await this.#update(runId, (old, now) => (old ? { ...old, revision: Math.max(old.revision, revision + 1), updatedAtMs: now } : old));
      } else {
        const isRetry = result.kind === 'retry';
        await this.#fail(runId, result.reason, isRetry, isRetry ? result.retryAfterMs : null);
        if (isRetry && result.isUnreachable) this.#deps.onUnreachable?.();
        return;
      }
    }
  }

  /** Marks the run failed, unless another sender has it by now (its outcome is the newer word). */
  #fail(runId: string, reason: string, willRetry: boolean, retryAfterMs: number | null): Promise<RunSyncStatus | undefined> {
    return this.#update(runId, (old, now) => {
      if (!old || !this.#holds(old)) return old;
      const attempts = old.attempts + 1;
      const delay = Math.max(retryDelayMs(attempts), retryAfterMs ?? 0);
      return {
        ...old,
        state: 'failed',
        reason,
        willRetry,
        attempts,
        nextAttemptAtMs: willRetry ? now + delay : null,
        updatedAtMs: now,
        senderId: null,
        leaseUntilMs: null,
      };
    });
  }

  /** One read-and-write of a run's entry (a single transaction), then the news to subscribers and other senders. */
  async #update(
    runId: string,
    change: (old: RunSyncStatus | undefined, nowMs: number) => RunSyncStatus | undefined,
  ): Promise<RunSyncStatus | undefined> {
    let isChanged = false;
    const after = await this.#deps.store.update<RunSyncStatus>(outboxKey(runId), (old) => {
      const next = change(old, this.#deps.nowMs());
      isChanged = next !== undefined && next !== old;
      return next;
    });
    if (isChanged && after) {
      this.#tell(after);
      this.#deps.channel?.post(after);
    }
    return after;
  }

  #tell(status: RunSyncStatus): void {
    for (const listener of this.#listeners) listener(status);
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
    senderId: null,
    leaseUntilMs: null,
  };
}

function randomSenderId(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(8));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}
