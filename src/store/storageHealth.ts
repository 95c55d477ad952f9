/** What the app needs from `navigator.storage` (StorageManager), injected for tests. */
export interface StorageLike {
  persist?(): Promise<boolean>;
  persisted?(): Promise<boolean>;
  estimate?(): Promise<{ usage?: number; quota?: number }>;
}

export interface StorageHealth {
  isPersistent: boolean | null;
  usageBytes: number | null;
  quotaBytes: number | null;
  /** A plain-words warning when space is short, or null. */
  warning: string | null;
}

/** Space for about 8 hours at 10 readings a second, several times over. Units: bytes */
const comfortableFreeBytes = 50 * 1024 * 1024;

/**
 * Asks the browser to keep the app's storage (Chrome decides by its own heuristics, never by a
 * prompt) and checks the quota, so the chemist hears about a full phone before a run, not during.
 */
export async function checkStorage(storage: StorageLike | undefined, askPersist: boolean): Promise<StorageHealth> {
  if (!storage) {
    return { isPersistent: null, usageBytes: null, quotaBytes: null, warning: 'This browser gives no storage information; keep the app open during a run.' };
  }
  let isPersistent: boolean | null = null;
  try {
    isPersistent = (await storage.persisted?.()) ?? null;
    if (!isPersistent && askPersist) isPersistent = (await storage.persist?.()) ?? isPersistent;
  } catch {
    isPersistent = null;
  }
  let usageBytes: number | null = null;
  let quotaBytes: number | null = null;
  try {
    const estimate = await storage.estimate?.();
    usageBytes = estimate?.usage ?? null;
    quotaBytes = estimate?.quota ?? null;
  } catch {
    // estimate() can throw in private windows; leave the figures unknown.
  }
  let warning: string | null = null;
  if (usageBytes !== null && quotaBytes !== null) {
    const free = quotaBytes - usageBytes;
    if (free < comfortableFreeBytes) {
      warning = `Storage is nearly full (${Math.max(0, Math.round(free / 1048576))} MB free). Export and delete old runs before a long run.`;
    }
  }
  if (warning === null && isPersistent === false) {
    warning = 'The browser may clear stored runs when the phone is short of space. Installing the app makes that less likely.';
  }
  return { isPersistent, usageBytes, quotaBytes, warning };
}
