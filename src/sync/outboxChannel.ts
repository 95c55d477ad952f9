import type { OutboxChannel } from './outbox.ts';
import type { RunSyncStatus } from './syncStatus.ts';

const isStatus = (value: unknown): value is RunSyncStatus =>
  typeof value === 'object' && value !== null && typeof (value as RunSyncStatus).runId === 'string' && typeof (value as RunSyncStatus).state === 'string';

/**
 * The outbox's news between the page, other tabs and the service worker, over a
 * BroadcastChannel (which never hands a message back to its sender). Undefined where the
 * browser has none: each context then sees only its own changes until it next reads the store.
 */
export function broadcastOutboxChannel(name = 'cutbell-outbox'): OutboxChannel | undefined {
  if (typeof BroadcastChannel === 'undefined') return undefined;
  const channel = new BroadcastChannel(name);
  let isClosed = false;
  return {
    post: (status) => {
      if (!isClosed) channel.postMessage(status);
    },
    listen(listener) {
      const onMessage = (event: MessageEvent) => {
        if (isStatus(event.data)) listener(event.data);
      };
      channel.addEventListener('message', onMessage);
      return () => channel.removeEventListener('message', onMessage);
    },
    close() {
      isClosed = true;
      channel.close();
    },
  };
}
