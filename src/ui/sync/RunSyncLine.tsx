import { useEffect, useState } from 'preact/hooks';
import type { Outbox, RunSyncStatus } from '../../sync/index.ts';

/** One line on where a run stands with the lab server, kept current. */
export function RunSyncLine({ outbox, runId }: { outbox: Outbox; runId: string }) {
  const [status, setStatus] = useState<RunSyncStatus | null>(null);
  useEffect(() => {
    let isCurrent = true;
    void outbox.stateOf(runId).then((s) => isCurrent && setStatus((old) => old ?? s));
    const unsubscribe = outbox.subscribe((s) => s.runId === runId && setStatus(s));
    return () => {
      isCurrent = false;
      unsubscribe();
    };
  }, [outbox, runId]);
  return (
    <p class="hint" data-testid="sync-state" data-state={status?.state ?? 'none'} role="status">
      {syncWords(status)}
    </p>
  );
}

export function syncWords(status: RunSyncStatus | null): string {
  if (!status) return 'Lab server: not queued (set the server in Settings to send runs).';
  switch (status.state) {
    case 'queued':
      return 'Lab server: waiting to send.';
    case 'sending':
      return 'Lab server: sending…';
    case 'synced':
      return `Lab server: sent${status.syncedRevision > 1 ? ` (revision ${status.syncedRevision})` : ''}.`;
    case 'failed':
      return `Lab server: not sent yet: ${status.reason ?? 'unknown reason'}.${status.willRetry ? ' Will try again.' : ''}`;
  }
}
