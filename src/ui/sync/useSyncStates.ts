import { useEffect, useState } from 'preact/hooks';
import type { Outbox, RunSyncStatus } from '../../sync/index.ts';

/** Each run's sync state in words, kept current from the outbox (for the Runs list). */
export function useSyncStates(outbox: Outbox): (runId: string) => string | undefined {
  const [states, setStates] = useState<ReadonlyMap<string, RunSyncStatus>>(new Map());
  useEffect(() => {
    let isLive = true;
    void outbox.list().then((all) => {
      if (isLive) setStates(new Map(all.map((s) => [s.runId, s])));
    });
    const unsubscribe = outbox.subscribe((status: RunSyncStatus) => {
      setStates((previous) => new Map(previous).set(status.runId, status));
    });
    return () => {
      isLive = false;
      unsubscribe();
    };
  }, [outbox]);
  return (runId) => {
    const status = states.get(runId);
    if (!status) return undefined;
    return status.state === 'failed' && status.reason ? `failed: ${status.reason}` : status.state;
  };
}
