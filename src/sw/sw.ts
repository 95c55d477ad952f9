// The app's service worker (built by vite-plugin-pwa with strategies 'injectManifest'): the
// precached app shell for offline start, the 'prompt' update flow, and Background Sync of the
// outbox. Type-checked against tsconfig.sw.json (WebWorker, no DOM).
import { cleanupOutdatedCaches, createHandlerBoundToURL, precacheAndRoute, type PrecacheEntry } from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';
import { idbKeyValueStore } from '../store/idbKeyValueStore.ts';
import { flushForBackgroundSync, outboxSyncTag } from '../sync/backgroundSync.ts';
import { labOutbox } from '../sync/labOutbox.ts';
import type { Outbox } from '../sync/outbox.ts';
import { focusAppWindow } from './focusAppWindow.ts';

declare const self: ServiceWorkerGlobalScope & { __WB_MANIFEST: (string | PrecacheEntry)[] };

/** Background Sync's event (WICG spec); not in TypeScript's WebWorker library. */
interface SyncEvent extends ExtendableEvent {
  readonly tag: string;
  readonly lastChance: boolean;
}

// 'prompt', never skipWaiting on install: a new version waits until the page asks, which it
// does only between runs (src/ui/update/UpdateNotice.tsx).
self.addEventListener('message', (event) => {
  if ((event.data as { type?: unknown } | null)?.type === 'SKIP_WAITING') void self.skipWaiting();
});

// The build's files (vite.config.ts globPatterns), replaced at build time.
precacheAndRoute(self.__WB_MANIFEST);
cleanupOutdatedCaches();
// Screens are client-side paths: navigations get the shell. The sync API is never answered from the cache.
registerRoute(new NavigationRoute(createHandlerBoundToURL('index.html'), { denylist: [/^\/api\//] }));

let outbox: Outbox | null = null;

// The page asks for this when an upload got no answer (src/sync/backgroundSync.ts). The worker
// uses the same outbox, settings and journal in IndexedDB as the page, so it needs no page open.
self.addEventListener('sync', (event) => {
  const sync = event as SyncEvent;
  if (sync.tag !== outboxSyncTag) return;
  outbox ??= labOutbox({
    store: idbKeyValueStore(),
    fetch: (input, init) => fetch(input, init),
    origin: self.location.origin,
    nowMs: () => Date.now(),
  });
  sync.waitUntil(flushForBackgroundSync(outbox));
});

// An alarm shown while the page was hidden (src/alerts/notifications.ts): a tap brings the run
// back to the front. The alarm itself is acknowledged on the Watch screen, not here.
self.addEventListener('notificationclick', (event) => {
  event.notification.close();
  event.waitUntil(focusAppWindow(self.clients, self.registration.scope));
});
