import {
  AlarmNotifier, Alerter, ScreenWakeLock, SpeechAnnouncer, TonePlayer, browserNotifierDeps, browserWakeLockDeps, vibrator,
} from '../alerts/index.ts';
import { browserClock } from '../sensor/clock.ts';
import { createSignalWatcher, type SessionDeps } from '../session/index.ts';
import { checkStorage, idbKeyValueStore, type KeyValueStore, type StorageHealth } from '../store/index.ts';
import { labOutbox, requestBackgroundSync, type Outbox } from '../sync/index.ts';

/** The browser's adapters, made once for the app and handed down (components never build them). */
export interface AppServices {
  store: KeyValueStore;
  alerter: Alerter;
  wakeLock: ScreenWakeLock;
  notifier: AlarmNotifier;
  sessionDeps: SessionDeps;
  /** Finished runs waiting for the lab's server (src/sync/README.md). */
  outbox: Outbox;
  checkStorage(askPersist: boolean): Promise<StorageHealth>;
}

export function createBrowserServices(): AppServices {
  const store = idbKeyValueStore();
  const notifier = new AlarmNotifier(browserNotifierDeps());
  const alerter = new Alerter({ speech: new SpeechAnnouncer(), tone: new TonePlayer(), vibrate: vibrator().vibrate, notifier });
  const wakeLock = new ScreenWakeLock(browserWakeLockDeps());
  const outbox = labOutbox({
    store,
    fetch: (input, init) => fetch(input, init),
    origin: location.origin,
    nowMs: () => Date.now(),
    // Offline or the server down: where the browser can, the service worker sends the run when
    // the network is back, even if the app has been closed by then (src/sync/README.md).
    onUnreachable: () => void requestBackgroundSync(globalThis.navigator?.serviceWorker),
  });
  return {
    store,
    alerter,
    wakeLock,
    notifier,
    outbox,
    sessionDeps: {
      store,
      clock: browserClock,
      wallMs: () => Date.now(),
      alerter,
      wakeLock,
      createWatcher: createSignalWatcher,
      onFlushTimed: (start, duration, readings) => {
        performance.measure('cutbell journal flush', { start, duration, detail: { readings } });
      },
    },
    checkStorage: (askPersist) => checkStorage(globalThis.navigator?.storage, askPersist),
  };
}
