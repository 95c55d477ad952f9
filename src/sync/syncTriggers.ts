import type { Outbox } from './outbox.ts';

export interface SyncTriggerEnv {
  /** The page's window: fires `online`. */
  window: Pick<Window, 'addEventListener' | 'removeEventListener'>;
  /** The page's document: fires `visibilitychange`. */
  document: Pick<Document, 'addEventListener' | 'removeEventListener' | 'visibilityState'>;
  setTimeout(callback: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
  nowMs(): number;
}

/** Longest wait between automatic tries, whatever the backoff says. Units: ms */
const maxWaitMs = 15 * 60_000;

/**
 * Flushes the outbox at start-up, when the network comes back (`online`), when the page becomes
 * visible, as soon as a run is queued, and when the next backoff retry is due. Returns stop().
 * The page's triggers only; Background Sync is asked for by the outbox's onUnreachable and
 * answered in the service worker (src/sync/README.md).
 */
export function startSyncTriggers(outbox: Outbox, env: SyncTriggerEnv): () => void {
  let timer: unknown = null;
  let isStopped = false;
  let isFlushAsked = false;

  const schedule = async () => {
    if (isStopped) return;
    const dueMs = await outbox.nextDueMs().catch(() => null);
    if (timer !== null) env.clearTimeout(timer);
    timer = null;
    if (dueMs === null || isStopped) return;
    const waitMs = Math.min(maxWaitMs, Math.max(1000, dueMs - env.nowMs()));
    timer = env.setTimeout(() => {
      timer = null;
      void flush(false);
    }, waitMs);
  };
  const flush = (ignoreBackoff: boolean) =>
    outbox
      .flush(ignoreBackoff)
      .catch((error: unknown) => console.error('sync: flush failed', error))
      .then(schedule);

  const onOnline = () => void flush(true);
  const onVisibility = () => {
    if (env.document.visibilityState === 'visible') void flush(true);
  };
  const unsubscribe = outbox.subscribe((status) => {
    // A newly queued run goes now; one queued again inside a flush is picked up by that flush.
    if (status.state !== 'queued' || status.attempts !== 0 || isFlushAsked) return;
    isFlushAsked = true;
    queueMicrotask(() => {
      isFlushAsked = false;
      void flush(false);
    });
  });
  env.window.addEventListener('online', onOnline);
  env.document.addEventListener('visibilitychange', onVisibility);
  void flush(false);

  return () => {
    isStopped = true;
    unsubscribe();
    env.window.removeEventListener('online', onOnline);
    env.document.removeEventListener('visibilitychange', onVisibility);
    if (timer !== null) env.clearTimeout(timer);
  };
}
