import { loadSettings, type KeyValueStore } from '../store/index.ts';
import { Outbox, type OutboxChannel } from './outbox.ts';
import { broadcastOutboxChannel } from './outboxChannel.ts';
import { runJson } from './runJson.ts';
import { syncTargetFrom } from './syncTarget.ts';

export interface LabOutboxEnv {
  store: KeyValueStore;
  fetch: typeof fetch;
  /** The app's origin: the server when Settings name none. */
  origin: string;
  nowMs(): number;
  onUnreachable?(): void;
  /** Default: a BroadcastChannel shared by every tab and the service worker. */
  channel?: OutboxChannel;
}

/**
 * The outbox as both the page and the service worker build it: the server and token from the
 * stored settings, each record rebuilt from the journal, news shared over a BroadcastChannel.
 */
export function labOutbox({ store, fetch, origin, nowMs, onUnreachable, channel = broadcastOutboxChannel() }: LabOutboxEnv): Outbox {
  return new Outbox({
    store,
    fetch,
    target: async () => syncTargetFrom(await loadSettings(store), origin),
    runJson: (runId) => runJson(store, runId),
    nowMs,
    onUnreachable,
    channel,
  });
}
