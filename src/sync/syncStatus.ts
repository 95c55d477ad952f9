/** Where a run stands with the lab's server (one entry per run in the outbox). */
export type SyncState = 'queued' | 'sending' | 'synced' | 'failed';

export interface RunSyncStatus {
  runId: string;
  state: SyncState;
  /** The revision to send next, or the one the server holds when synced. Starts at 1. */
  revision: number;
  /** Newest revision the server has confirmed, 0 before the first. */
  syncedRevision: number;
  /** Why the last attempt failed, in words for the chemist; null otherwise. */
  reason: string | null;
  /** False when retrying cannot help until something changes (the token, the run, the server). */
  willRetry: boolean;
  /** Failed attempts since the last success. */
  attempts: number;
  /** When the next automatic attempt is due. Units: ms since 1970 */
  nextAttemptAtMs: number | null;
  /** Units: ms since 1970 */
  updatedAtMs: number;
  /** When the server last confirmed a revision. Units: ms since 1970 */
  syncedAtMs: number | null;
  /**
   * While `sending`: which sender (a tab, or the service worker) holds the run, and until when
   * its claim stands; another sender may take the run over only after that. Absent on entries
   * written before claims were kept. Units: ms since 1970
   */
  senderId?: string | null;
  leaseUntilMs?: number | null;
}

/** Where and as whom to send: the lab server's address (ending in "/") and this phone's token. */
export interface SyncTarget {
  serverUrl: string;
  token: string;
}
