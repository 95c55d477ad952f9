import type { Outbox } from './outbox.ts';

/** The Background Sync tag under which the page asks the service worker to flush the outbox. */
export const outboxSyncTag = 'cutbell-outbox';

/** The little of ServiceWorkerContainer this needs (navigator.serviceWorker in the page). */
export interface ServiceWorkerContainerLike {
  getRegistration(): Promise<object | undefined>;
}

interface SyncManagerLike {
  register(tag: string): Promise<void>;
}

/**
 * Asks the browser to wake the service worker with a `sync` event once the network is back, so
 * a run goes even if the app is closed first. Only where the browser has Background Sync
 * (Chromium; not Safari or Firefox): elsewhere, and when the request is refused, it does
 * nothing and resolves to false; the page's own triggers still send the run.
 */
export async function requestBackgroundSync(container: ServiceWorkerContainerLike | undefined): Promise<boolean> {
  const registration = await container?.getRegistration().catch(() => undefined);
  if (!registration || !('sync' in registration)) return false;
  try {
    await (registration.sync as SyncManagerLike).register(outboxSyncTag);
    return true;
  } catch {
    // No active worker yet, or Background Sync switched off in the browser's settings.
    return false;
  }
}

/**
 * The service worker's answer to a `sync` event: sends every waiting run now (the browser fires
 * the event when the network is back, so the backoff is ignored). Rejects while a run still
 * waits for a retry, which tells the browser to fire the event again later.
 */
export async function flushForBackgroundSync(outbox: Outbox): Promise<void> {
  await outbox.flush(true);
  const left = (await outbox.list()).filter((s) => s.state === 'failed' && s.willRetry);
  if (left.length > 0) {
    throw new Error(`${left.length === 1 ? 'a run still waits' : `${left.length} runs still wait`} for the lab server: ${left[0]!.reason}`);
  }
}
